"""test_plot_svg.py - phlox.plot figures checked from outside phlox.

Run by ctest as: /usr/bin/python3 test_plot_svg.py <path of phlox>.
The map is the invented test geometry (not data) of
tests/scripts/test_plot.lua, read from between its BEGIN/END TEST MAP marks.

Checks, each with an outside reference:
  * SVG is well-formed XML (Python's xml.etree parser) and its <desc> names
    every field in phlox notation; field labels are <text> with their
    sub- and superscripts; fig:svg_text("outline") still gives glyph paths.
  * Two runs in separate processes give byte-identical SVG and PDF.
  * PDF starts with "%PDF-" (ISO 32000-1, 7.5.2) and a grid saved with
    pages = true has one /Type /Page object per panel.
  * PNG decoded here with zlib (PNG spec, ISO/IEC 15948: IHDR, filters 0-4),
    not with cairo: the requested pixel size; colours at hand-picked points
    well inside each field equal the palette's fill; a pixel on the O2/H2O
    water line has the line's colour.
  * Greyscale legibility: CIE L* of the probed fills, computed here from
    sRGB (IEC 61966-2-1:1999 transfer function and luminance row; CIE
    15:2004 L* = 116 f(Y/Yn) - 16), differs by >= 9 between every pair of
    neighbouring fields (palette design: 10, less 8-bit rounding).
  * Nothing is cut off: the outermost pixels of every figure are white.
  * The full provenance is in every file's metadata whatever the figure
    prints: PNG text chunks (tEXt, iTXt; PNG spec 11.3.4) each with a
    CRC-32 that zlib computes here, placed before the image data; SVG
    <metadata>; PDF document information /Title and /Subject (ISO 32000-1,
    14.3.3; text strings in UTF-16BE with a byte order mark, 7.9.2.2).
    stamp = false prints no stamp line, "short" prints no checksums.
"""
import os
import re
import shutil
import struct
import sys
import tempfile
import xml.etree.ElementTree as ET
import zlib

from pngdecode import decode_png
from refcheck import check, finish, run_lua

PHLOX = sys.argv[1]
HERE = os.path.dirname(os.path.abspath(__file__))
TEST_LUA = os.path.join(HERE, "..", "scripts", "test_plot.lua")
DPI = 144


def map_block():
    text = open(TEST_LUA, encoding="utf-8").read()
    m = re.search(r"-- BEGIN TEST MAP\n(.*?)-- END TEST MAP", text, re.S)
    assert m, "test map block not found in " + TEST_LUA
    return m.group(1)


DRIVER = r"""
local plot = require "phlox.plot"
local palette = require "phlox.palette"
local json = require "phlox.json"
local D = assert(os.getenv("PLOT_OUT")) .. "/"
local map = test_map()
local fig, fills = plot.map(map, { file = D .. "m.png", dpi = %(dpi)d })
plot.map(map, { file = D .. "m.svg" })
plot.map(map, { file = D .. "m.pdf" })
plot.map(map, { file = D .. "short.svg", preset = "column" })
plot.map(map, { file = D .. "none.svg", stamp = false })
plot.map(map, { file = D .. "none.png", stamp = false, dpi = 72 })
plot.domains(map, { file = D .. "d.png", dpi = 72 })
plot.overlay({ test_map(25), test_map(200) }, { file = D .. "o.png", dpi = 72 })
local maps = { test_map(25), test_map(100), test_map(200), test_map(300) }
plot.grid(maps, { file = D .. "g.pdf", pages = true })
plot.grid(maps, { file = D .. "g.png", dpi = 72 })
-- a figure built to crowd the edges: long title, log axis, long tick labels
local xs, ys = {}, {}
for i = 0, 50 do xs[#xs + 1] = -1000 + 40 * i; ys[#ys + 1] = 10 ^ (-12 + i * 12 / 50) end
plot.curves({ { x = xs, y = ys, label = "Fe(OH)3(s) and a rather long legend entry" } },
  { x = { name = "a long x axis title that goes on / arbitrary unit" },
    y = { name = "solubility", unit = "mol/kg", log = true },
    title = "A deliberately long title that would run past both edges of a narrow figure",
    width = 240, height = 200, file = D .. "c.png", dpi = 72 })
fig:svg_text("outline")
fig:save(D .. "outline.svg")
local x, y, w, h = fig:plot_rect(1, %(dpi)d)
local out = { rect = { x, y, w, h }, fills = {}, water = palette.water,
              window = { map.x.min, map.x.max, map.y.min, map.y.max } }
for i, f in ipairs(map.fields) do out.fills[f.species] = fills.fills[i] end
print(json.encode(out))
"""


def run_driver(out_dir, work):
    return run_lua(PHLOX, map_block() + DRIVER % {"dpi": DPI}, work, {"PLOT_OUT": out_dir})


def pixel(img, x, y):
    w, h, bpp, rows = img
    x, y = int(x), int(y)
    return tuple(rows[y][x * bpp:x * bpp + 3])


def lstar(rgb):
    """CIE L* of an 8-bit sRGB colour (IEC 61966-2-1; CIE 15:2004)."""
    def lin(v):
        v = v / 255.0
        return v / 12.92 if v <= 0.04045 else ((v + 0.055) / 1.055) ** 2.4
    r, g, b = (lin(c) for c in rgb)
    y = 0.2126 * r + 0.7152 * g + 0.0722 * b
    return 116 * y ** (1 / 3) - 16 if y > (6 / 29) ** 3 else (29 / 3) ** 3 * y


def white_border(img, name, k=2):
    w, h, _, _ = img
    bad = 0
    for x in range(w):
        for y in list(range(k)) + list(range(h - k, h)):
            if pixel(img, x, y) != (255, 255, 255):
                bad += 1
    for y in range(h):
        for x in list(range(k)) + list(range(w - k, w)):
            if pixel(img, x, y) != (255, 255, 255):
                bad += 1
    check(bad == 0, "%s: %d non-white pixels within %d px of the edge (cut-off text?)" % (name, bad, k))


def main():
    work = tempfile.mkdtemp(prefix="phlox-plot-")
    try:
        a, b = os.path.join(work, "a"), os.path.join(work, "b")
        os.mkdir(a)
        os.mkdir(b)
        info = run_driver(a, work)
        run_driver(b, work)
        species = re.findall(r'species = "([^"]+)"', map_block())
        check(len(species) == 5, "five fields in the test map")

        # SVG: well-formed, the figure's words in <title>/<desc>
        svg_ns = "{http://www.w3.org/2000/svg}"
        root = ET.parse(os.path.join(a, "m.svg")).getroot()
        check(root.tag == svg_ns + "svg", "SVG root element")
        desc = root.find(svg_ns + "desc")
        title = root.find(svg_ns + "title")
        check(title is not None and title.text == "M–H2O at 25 °C", "SVG title: %r" % (title.text if title is not None else None))
        text = desc.text if desc is not None else ""
        for s in species:
            check(("field: %s\n" % s) in text, "SVG desc names field %s" % s)
        check("Equilibrium thermodynamics: shows what can form, not how fast." in text, "caution in SVG")

        # SVG text as <text>: each field label typeset as chemists write
        # formulas (IUPAC Green Book, 3rd ed., 2.10: counts as right
        # subscripts, charges as right superscripts), with a minus sign
        # U+2212; the runs are written out here by hand from that rule.
        typeset = {
            "M(s)": [("M(s)", 0)],
            "M^2+": [("M", 0), ("2+", 1)],
            "M(OH)2(s)": [("M(OH)", 0), ("2", -1), ("(s)", 0)],
            "MO4^-": [("MO", 0), ("4", -1), ("\u2212", 1)],
            "MH2(g)": [("MH", 0), ("2", -1), ("(g)", 0)],
        }
        check(sorted(typeset) == sorted(species), "typeset runs written for every field")
        texts = list(root.iter(svg_ns + "text"))
        check(len(texts) > 10, "SVG labels are <text> elements (%d)" % len(texts))
        check(b"<symbol" not in open(os.path.join(a, "m.svg"), "rb").read(), "no glyph outlines in text SVG")
        check(all(t.get("font-family") == "DejaVu Sans" for t in texts), "text in the layout's font")
        check(any(t.get("paint-order") == "stroke" and t.get("stroke") == "#ffffff" for t in texts),
              "label halo: a white stroke painted under the text")

        def runs_of(t):
            base = float(t.get("font-size"))
            out = []
            for sp in t.findall(svg_ns + "tspan"):
                fs = float(sp.get("font-size", base))
                out.append((sp.text or "", float(sp.get("y")), fs))
            return base, out

        for sp, want in typeset.items():
            found = False
            for t in texts:
                base, got = runs_of(t)
                if [g[0] for g in got] != [w[0] for w in want]:
                    continue
                y0 = next(g[1] for g, w in zip(got, want) if w[1] == 0)
                ok = True
                for g, w in zip(got, want):
                    if w[1] == 0:
                        ok &= g[2] == base and abs(g[1] - y0) < 1e-9
                    else:  # smaller, and below (sub) or above (sup) the baseline; SVG y grows down
                        ok &= g[2] < base and (g[1] - y0) * -w[1] > 0
                found |= ok
            check(found, "field %s drawn as <text> with its sub- and superscripts" % sp)

        # the glyph-outline path, still selectable: no <text>, glyphs as paths
        out_svg = open(os.path.join(a, "outline.svg"), "rb").read()
        ET.fromstring(out_svg)
        check(b"<text" not in out_svg and b"<symbol" in out_svg, "fig:svg_text('outline') draws glyph outlines")
        check(len(out_svg) > 3 * os.path.getsize(os.path.join(a, "m.svg")), "outline SVG is the larger one")

        # determinism across processes
        for f in ("m.svg", "outline.svg", "m.pdf", "g.pdf"):
            same = open(os.path.join(a, f), "rb").read() == open(os.path.join(b, f), "rb").read()
            check(same, "%s identical in two runs" % f)

        # PDF
        pdf = open(os.path.join(a, "m.pdf"), "rb").read()
        check(pdf.startswith(b"%PDF-"), "PDF header")
        g = open(os.path.join(a, "g.pdf"), "rb").read()
        pages = len(re.findall(rb"/Type\s*/Page(?!s)", g))
        check(pages == 4, "grid PDF has one page per panel (4), found %d" % pages)

        # PNG: size, probes, luminance of neighbours
        img = decode_png(open(os.path.join(a, "m.png"), "rb").read())
        check((img[0], img[1]) == (round(396 * DPI / 72), round(324 * DPI / 72)),
              "PNG size %dx%d at %d dpi" % (img[0], img[1], DPI))
        rx, ry, rw, rh = info["rect"]
        x0, x1, y0, y1 = info["window"]

        def to_px(x, y):
            return rx + (x - x0) / (x1 - x0) * rw, ry + rh - (y - y0) / (y1 - y0) * rh

        # points well inside each field, away from labels and lines (chosen
        # by hand from the invented geometry)
        probes = {"M(s)": (12.5, -1.35), "M^2+": (0.6, 0.6), "M(OH)2(s)": (13.3, 0.0),
                  "MO4^-": (13.0, 1.8), "MH2(g)": (0.4, -1.46)}
        seen = {}
        for s, (x, y) in probes.items():
            px = pixel(img, *to_px(x, y))
            want = tuple(round(c * 255) for c in info["fills"][s][:3])
            seen[s] = px
            check(all(abs(p - q) <= 1 for p, q in zip(px, want)),
                  "fill of %s at pH %g, E %g: got %s want %s" % (s, x, y, px, want))
        neighbours = [("M(s)", "M^2+"), ("M(s)", "M(OH)2(s)"), ("M^2+", "M(OH)2(s)"),
                      ("M^2+", "MO4^-"), ("M(OH)2(s)", "MO4^-"), ("M(s)", "MH2(g)")]
        for s, t in neighbours:
            dl = abs(lstar(seen[s]) - lstar(seen[t]))
            check(dl >= 9.0, "ΔL* between %s and %s is %.2f (want >= 9)" % (s, t, dl))
            print("ΔL* %-10s %-10s %5.2f" % (s, t, dl))

        # the O2/H2O line near its left end (on the first dash): some pixel
        # in a short vertical run has the line's colour
        slope = -0.05916  # ln(10) RT/F at 298.15 K, rounded; the line is 2 px wide
        wx = 0.12
        px, py = to_px(wx, 1.229 + slope * wx)
        want = tuple(round(c * 255) for c in info["water"][:3])
        hits = [pixel(img, px, py + d) for d in range(-3, 4)]
        check(any(all(abs(p - q) <= 2 for p, q in zip(h, want)) for h in hits),
              "water line colour %s not found near (%d, %d): %s" % (want, px, py, hits))

        # nothing cut off at the edges
        white_border(img, "map")
        for f in ("d.png", "o.png", "g.png", "c.png"):
            white_border(decode_png(open(os.path.join(a, f), "rb").read()), f)
        # metadata: full provenance in every format, whatever is printed
        png = open(os.path.join(a, "none.png"), "rb").read()
        pos, texts, order = 8, {}, []
        while pos < len(png):
            n, kind = struct.unpack(">I4s", png[pos:pos + 8])
            body = png[pos + 8:pos + 8 + n]
            crc = struct.unpack(">I", png[pos + 8 + n:pos + 12 + n])[0]
            check(crc == zlib.crc32(kind + body) & 0xffffffff, "PNG %s chunk CRC" % kind.decode())
            order.append(kind)
            if kind == b"tEXt":
                key, val = body.split(b"\0", 1)
                texts[key.decode("latin-1")] = val.decode("latin-1")
            elif kind == b"iTXt":
                key, rest = body.split(b"\0", 1)
                check(rest[0:2] == b"\0\0", "iTXt uncompressed")
                lang, rest = rest[2:].split(b"\0", 1)
                tkey, val = rest.split(b"\0", 1)
                texts[key.decode("latin-1")] = val.decode("utf-8")
            pos += 12 + n
        check(order[0] == b"IHDR" and order.index(b"tEXt") < order.index(b"IDAT"), "text chunks before the image data")
        d = texts.get("Description", "")
        for want in ("conditions: T = 25 °C", "program: phlox", "invented test geometry, not data",
                     "Equilibrium thermodynamics: shows what can form, not how fast."):
            check(want in d, "PNG Description holds %r" % want)
        check(texts.get("Title") == "M–H2O at 25 °C", "PNG Title %r" % texts.get("Title"))
        check(texts.get("Software", "").startswith("phlox "), "PNG Software")
        for name, printed in (("m.svg", "full"), ("short.svg", "short"), ("none.svg", "none")):
            root = ET.parse(os.path.join(a, name)).getroot()
            meta = root.find(svg_ns + "metadata")
            entries = {e.get("key"): e.text for e in meta} if meta is not None else {}
            check("program: phlox" in entries.get("Description", "") and
                  "invented test geometry, not data" in entries.get("Description", ""),
                  "%s: full provenance in <metadata>" % name)
            stamp = [l for l in root.find(svg_ns + "desc").text.splitlines() if l.startswith("stamp: ")]
            if printed == "none":
                check(stamp == [], "stamp = false prints nothing: %r" % stamp)
            elif printed == "short":
                check(stamp and not any("program: phlox" in l for l in stamp), "short stamp: no checksum lines")
                check(any("not how fast" in l for l in stamp), "short stamp keeps the caution")
            else:
                check(any("program: phlox" in l for l in stamp), "full stamp printed by default")

        def pdf_info(key):
            m = re.search(rb"/" + key + rb"\s*(<[0-9A-Fa-f]+>|\((?:[^()\\]|\\.)*\))", pdf)
            if not m:
                return None
            v = m.group(1)
            if v.startswith(b"<"):
                raw = bytes.fromhex(v[1:-1].decode())
                return raw[2:].decode("utf-16-be") if raw[:2] == b"\xfe\xff" else raw.decode("latin-1")
            return v[1:-1].decode("latin-1")
        check(pdf_info(b"Title") == "M–H2O at 25 °C", "PDF /Title %r" % pdf_info(b"Title"))
        subj = pdf_info(b"Subject") or ""
        check("program: phlox" in subj and "not how fast" in subj, "PDF /Subject holds the provenance")
    finally:
        shutil.rmtree(work, ignore_errors=True)
    finish("test_plot_svg")


main()
