"""test_report_browser.py - phlox.report's HTML page opened in a real
browser (Debian's chromium, headless), and its PDF read back.

Run by ctest as: /usr/bin/python3 test_report_browser.py <path of phlox>.
Exit code 77 (ctest: skipped) only when chromium is not installed; sh
.ci/install-deps installs it.

Checks, each with an outside reference:
  * chromium parses the page (--dump-dom) into a DOM that holds one inline
    <svg> per figure, the tables, the caution and the provenance, and
    nothing that loads a resource: no src attribute, no link or script
    element, no href other than a fragment inside the page;
  * chromium's log (stderr) reports no resource that failed to load;
  * chromium's screenshot (decoded here with zlib, tests/ref/pngdecode.py)
    is not blank and shows the map's field fills in their palette colours,
    so the inline SVG was drawn, not only parsed;
  * the PDF starts with "%PDF-" and has one /Type /Page per text page and
    figure (ISO 32000-1, 7.7.3.3), and its document information carries the
    title and the caution.
"""
import os
import re
import shutil
import subprocess
import sys
import tempfile

from pngdecode import decode_png
from refcheck import check, finish, run_lua

PHLOX = sys.argv[1]
WIDTH, HEIGHT = 800, 1600   # screenshot size, CSS pixels at scale 1


DRIVER = r"""
local phlox = require "phlox"
local plot = require "phlox.plot"
local json = require "phlox.json"
local D = assert(os.getenv("REPORT_OUT")) .. "/"
local lib = phlox.library { "Fe" }
local m = phlox.map { library = lib, element = "Fe", T_C = 25 }
local f1, fills = plot.map(m, { preset = "page" })
local f2 = plot.domains(m, { preset = "page" })
local rows = {}
for _, f in ipairs(m.fields) do rows[#rows + 1] = { "{" .. f.species .. "}", f.area } end
local r = phlox.report {
  file = D .. "study.html", pdf = D .. "study.pdf",
  title = "Iron in water: {Fe}–{H2O} at 25 °C",
  summary = "A test report of the map of iron.",
  sections = {
    { heading = "Map", text = "The map and its corrosion domains.",
      figures = { { figure = f1, caption = "predominance" }, { figure = f2, caption = "domains" } } },
    { heading = "Fields", tables = { { caption = "areas", columns = { "species", "area" }, rows = rows } } },
  },
  notes = { "a data note" },
}
local out = { fills = {}, counts = r }
for i, f in ipairs(m.fields) do out.fills[f.species] = fills.fills[i] end
print(json.encode(out))
"""


def main():
    chromium = shutil.which("chromium") or shutil.which("chromium-browser")
    if not chromium:
        print("SKIP: chromium is not installed (sh .ci/install-deps installs Debian's chromium)")
        sys.exit(77)
    work = tempfile.mkdtemp(prefix="phlox-report-")
    try:
        info = run_lua(PHLOX, DRIVER, work, {"REPORT_OUT": work})
        check(info["counts"]["figures"] == 2 and info["counts"]["tables"] == 1, "report counts %r" % info["counts"])
        page = os.path.join(work, "study.html")
        url = "file://" + page
        flags = ["--headless", "--no-sandbox", "--disable-gpu", "--no-first-run",
                 "--disable-background-networking", "--disable-component-update", "--disable-sync",
                 "--force-device-scale-factor=1", "--hide-scrollbars", "--enable-logging=stderr", "--v=0"]

        def run(extra, name):
            profile = tempfile.mkdtemp(dir=work, prefix="profile-")
            p = subprocess.run([chromium] + flags + ["--user-data-dir=" + profile] + extra + [url],
                               capture_output=True, text=True, timeout=120)
            check(p.returncode == 0, "chromium %s exit %d: %s" % (name, p.returncode, p.stderr[-500:]))
            for bad in ("ERR_FILE_NOT_FOUND", "Failed to load resource", "net::ERR_"):
                check(bad not in p.stderr, "chromium %s log reports %r" % (name, bad))
            return p.stdout

        dom = run(["--dump-dom"], "dump-dom")
        check(dom.count("<svg") == 2, "two inline SVG figures in the DOM, found %d" % dom.count("<svg"))
        check("<table" in dom and "<caption>Table 1" in dom, "the table is in the DOM")
        check("what can form, not how fast" in dom, "the caution is in the DOM")
        check("codes, standards and licensed engineering practice" in dom, "the caution defers to codes and practice")
        check("sha256=" in dom and "stdlib/elements/Fe.lua" in dom, "provenance with checksums in the DOM")
        check("Fe<sub>2</sub>O<sub>3</sub>" in dom, "formulas typeset in the table")
        check(not re.search(r"\ssrc\s*=", dom), "no src attribute (nothing loaded from outside the page)")
        check(not re.search(r"<(link|script)\b", dom), "no link or script element")
        hrefs = re.findall(r'href="([^"]*)"', dom)
        check(all(h.startswith("#") for h in hrefs), "only in-page hrefs: %r" % [h for h in hrefs if not h.startswith("#")][:3])

        shot = os.path.join(work, "shot.png")
        run(["--screenshot=" + shot, "--window-size=%d,%d" % (WIDTH, HEIGHT)], "screenshot")
        img = decode_png(open(shot, "rb").read())
        w, h, bpp, rows = img
        check((w, h) == (WIDTH, HEIGHT), "screenshot size %dx%d" % (w, h))
        colours = {}
        nonwhite = 0
        for row in rows:
            for x in range(0, w * bpp, bpp):
                px = row[x:x + 3]
                if px != b"\xff\xff\xff":
                    nonwhite += 1
                    colours[px] = colours.get(px, 0) + 1
        check(nonwhite > 0.1 * w * h, "screenshot not blank: %.1f %% non-white" % (100.0 * nonwhite / (w * h)))
        # the big fields' fills appear as flat areas (sRGB, within 2 levels)
        for species in ("Fe(s)", "Fe2O3(s,hematite)", "Fe^2+"):
            want = tuple(round(c * 255) for c in info["fills"][species][:3])
            count = sum(n for px, n in colours.items() if all(abs(a - b) <= 2 for a, b in zip(px, want)))
            check(count > 2000, "fill of %s %s drawn in the browser: %d pixels" % (species, want, count))

        pdf = open(os.path.join(work, "study.pdf"), "rb").read()
        check(pdf.startswith(b"%PDF-"), "PDF header")
        pages = len(re.findall(rb"/Type\s*/Page(?!s)", pdf))
        check(pages == info["counts"]["pdf_pages"] and pages >= 3,
              "PDF pages: %d, report says %d (text pages and two figures)" % (pages, info["counts"]["pdf_pages"]))
        check(b"/Title" in pdf and b"/Subject" in pdf, "PDF document information")
    finally:
        shutil.rmtree(work, ignore_errors=True)
    finish("test_report_browser")


main()
