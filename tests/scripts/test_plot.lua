-- test_plot.lua: phlox.plot and phlox.palette on a hand-made map table.
-- The map below is INVENTED TEST GEOMETRY, NOT DATA: a made-up metal "M"
-- with field shapes drawn by hand to exercise the renderer (neighbours of
-- the same kind, a thin gas sliver, all five field kinds but liquid).
-- tests/ref/test_plot_svg.py reads the block between the BEGIN/END marks.
local plot = require "phlox.plot"
local palette = require "phlox.palette"
local core = require "phlox.core"
local S = dofile(assert(os.getenv("PHLOX_SOURCE_DIR"), "PHLOX_SOURCE_DIR is not set (run through ctest)") .. "/tests/support/init.lua")
local check, close = S.check, S.close

-- BEGIN TEST MAP
-- Nernst slope ln(10) R T / F at 298.15 K from CODATA 2018 R and F; the
-- water lines use E(O2/H2O) = 1.229 V at pH 0 (from memory of Bard, Parsons
-- and Jordan 1985, Standard Potentials in Aqueous Solution) only to place
-- dashed lines on the invented map.
local SLOPE = math.log(10) * 8.314462618 * 298.15 / 96485.33212 -- self-contained: test_plot_svg.py runs this block alone
local function test_map(T_C)
  T_C = T_C or 25
  local s = SLOPE * (T_C + 273.15) / 298.15
  return {
    element = "M", label = ("%d °C"):format(T_C),
    T = T_C + 273.15, P = 1.0,
    x = { name = "pH", min = 0, max = 14 },
    y = { name = "E", unit = "V", min = -1.5, max = 2.0 },
    fields = {
      { species = "M(s)", kind = "metal",
        x = { 3, 14, 14, 8, 0, 0 }, y = { -1.5, -1.5, -0.955, -0.6, -0.6, -1.3 } },
      { species = "M^2+", kind = "aqueous",
        x = { 0, 8, 8, 0 }, y = { -0.6, -0.6, 0.5, 0.9 } },
      { species = "M(OH)2(s)", kind = "solid",
        x = { 8, 14, 14, 8 }, y = { -0.6, -0.955, 0.15, 0.5 } },
      { species = "MO4^-", kind = "aqueous",
        x = { 0, 8, 14, 14, 0 }, y = { 0.9, 0.5, 0.15, 2.0, 2.0 } },
      { species = "MH2(g)", kind = "gas",
        x = { 0, 3, 0 }, y = { -1.5, -1.5, -1.3 } },
    },
    boundaries = {
      { between = { "M^2+", "M(s)" }, x = { 0, 8 }, y = { -0.6, -0.6 } },
      { between = { "M(OH)2(s)", "M(s)" }, x = { 8, 14 }, y = { -0.6, -0.955 } },
      { between = { "M^2+", "M(OH)2(s)" }, x = { 8, 8 }, y = { -0.6, 0.5 } },
      { between = { "M^2+", "MO4^-" }, x = { 0, 8 }, y = { 0.9, 0.5 } },
      { between = { "M(OH)2(s)", "MO4^-" }, x = { 8, 14 }, y = { 0.5, 0.15 } },
      { between = { "MH2(g)", "M(s)" }, x = { 0, 3 }, y = { -1.3, -1.5 } },
    },
    water = { o2 = { a = 1.229, b = -s }, h2 = { a = 0, b = -s } },
    neutral_pH = 7.0,
    conditions = { T_C = T_C, P_bar = 1, activity = 1e-6, ionic_strength = 0 },
    stamp = { "invented test geometry, not data" },
  }
end
-- END TEST MAP

local dir = S.files.tmpdir()
local slurp = S.files.slurp

-- palette: CIE L* of sRGB primaries and white (sRGB red L* = 53.24,
-- green 87.73, blue 32.30: from memory of B. Lindbloom's published sRGB to
-- Lab tables, D65); the formulas are CIE 15:2004 and IEC 61966-2-1.
close(palette.lightness({ 1, 1, 1 }), 100, 1e-6, "L* of white")
close(palette.lightness({ 0, 0, 0 }), 0, 1e-9, "L* of black")
close(palette.lightness({ 1, 0, 0 }), 53.24, 0.02, "L* of sRGB red")
close(palette.lightness({ 0, 1, 0 }), 87.73, 0.02, "L* of sRGB green")
close(palette.lightness({ 0, 0, 1 }), 32.30, 0.02, "L* of sRGB blue")
-- grey round trip Lab -> sRGB -> L*: the IEC matrix has four decimals, so
-- a grey comes back within about 2e-3 of its L*
for _, L in ipairs({ 20, 50, 64, 94 }) do
  local r, g, b = palette.lab_to_srgb(L, 0, 0)
  close(palette.lightness({ r, g, b }), L, 5e-3, "round trip of L* " .. L)
end
-- every field colour is an 8-bit sRGB triple with the tier's lightness
-- (within the 8-bit rounding: half a step moves L* by < 0.3 here)
for kind in pairs(palette.kinds) do
  for t, L in ipairs(palette.tiers) do
    local c = palette.field(kind, t)
    for k = 1, 3 do
      check(c[k] >= 0 and c[k] <= 1, ("%s tier %d: channel %d in [0, 1]"):format(kind, t, k))
      close(c[k] * 255, math.floor(c[k] * 255 + 0.5), 1e-9, ("%s tier %d: channel %d x 255 is 8-bit"):format(kind, t, k))
    end
    close(palette.lightness(c), L, 0.3, ("%s tier %d: L*"):format(kind, t))
  end
end

-- neighbours of the test map and their tiers: ΔL* >= 9.4 between every
-- pair of neighbours (design 10, less 8-bit rounding)
local map = test_map()
local fills = palette.map_fills(map)
local adj = fills.neighbours
local idx = {}
for i, f in ipairs(map.fields) do idx[f.species] = i end
check(adj[idx["M^2+"]][idx["MO4^-"]] and adj[idx["M(s)"]][idx["MH2(g)"]], "neighbours from boundaries")
check(not adj[idx["M^2+"]][idx["MH2(g)"]], "MH2(g) and M^2+ only meet at a corner")
-- geometry alone (no boundaries list) finds the same neighbour pairs
local bare = test_map(); bare.boundaries = nil
local adj2 = palette.neighbours(bare.fields, nil, 14, 3.5)
for i = 1, #map.fields do
  for j = 1, #map.fields do
    check((adj[i][j] or false) == (adj2[i][j] or false),
          ("geometric neighbours differ for %s / %s"):format(map.fields[i].species, map.fields[j].species))
  end
end
check(fills.conflicts == 0, "four tiers suffice")
for i in pairs(adj) do
  for j in pairs(adj[i]) do
    local dl = math.abs(palette.lightness(fills.fills[i]) - palette.lightness(fills.fills[j]))
    check(dl >= 9.4, ("ΔL* %.2f between %s and %s"):format(dl, map.fields[i].species, map.fields[j].species))
  end
end
-- five mutually adjacent regions (a wheel) need a fifth tier: the
-- conflict is counted, not hidden
local wheel = { { species = "c" } }
local wadj = { {} }
for i = 2, 6 do wheel[i] = { species = "s" .. i }; wadj[i] = {} end
for i = 2, 6 do
  wadj[1][i], wadj[i][1] = true, true
  local j = i == 6 and 2 or i + 1
  wadj[i][j], wadj[j][i] = true, true
end
local _, wc = palette.assign_tiers(wheel, wadj)
check(wc == 0, "an odd wheel (W5) is 4-colourable")
local k5, k5adj = {}, {}
for i = 1, 5 do k5[i] = { species = "k" .. i }; k5adj[i] = {} end
for i = 1, 5 do for j = 1, 5 do if i ~= j then k5adj[i][j] = true end end end
local _, kc = palette.assign_tiers(k5, k5adj)
check(kc == 1, "K5 needs five colours: one conflict reported, got " .. kc)

-- a map in all three formats; PNG size from the IHDR chunk (PNG spec,
-- ISO/IEC 15948 section 11.2.2: width and height big-endian at byte 16)
local fig = plot.map(map, { file = dir .. "/m.png", dpi = 144, width = 396, height = 324 })
local png = slurp(dir .. "/m.png")
check(png:sub(1, 8) == "\137PNG\r\n\26\n", "PNG signature")
local pw, ph = string.unpack(">I4I4", png, 17)
check(pw == 792 and ph == 648, ("PNG is %dx%d, want 792x648"):format(pw, ph))
plot.map(map, { file = dir .. "/m.svg" })
local svg = slurp(dir .. "/m.svg")
for _, f in ipairs(map.fields) do
  check(svg:find("field: " .. f.species, 1, true), "SVG desc names the field " .. f.species)
end
check(svg:find("y axis: E / V vs SHE", 1, true) and svg:find("x axis: pH", 1, true), "axis titles")
check(svg:find(plot.caution, 1, true), "caution in the stamp")
check(svg:find("invented test geometry, not data", 1, true), "extra stamp line")
check(svg:find("T = 25 °C", 1, true) and svg:find("I = 0 mol/kg", 1, true), "conditions in the stamp")
check(svg:find("program: phlox " .. core.version, 1, true), "program version in the stamp")
check(svg:find("neutral pH 7.00 at 25 °C", 1, true), "neutral pH label")
-- the words drawn as SVG <text> (not only named in <desc>): the drawing
-- without <desc>, <title> and <metadata>, each <text> as its runs joined
do
  local drawing = svg:gsub("<desc>.-</desc>", ""):gsub("<title>.-</title>", ""):gsub("<metadata.-</metadata>", "")
  local words = {}
  for body in drawing:gmatch("<text[^>]*>(.-)</text>") do words[#words + 1] = body:gsub("<[^>]*>", "") end
  local drawn = "\n" .. table.concat(words, "\n") .. "\n"
  check(drawn:find("\nE / V vs SHE\n", 1, true) and drawn:find("\npH\n", 1, true), "axis titles drawn as <text>")
  check(drawn:find("neutral pH 7.00 at 25 °C", 1, true), "neutral pH label drawn as <text>")
  check(drawn:find(plot.caution, 1, true), "caution drawn as <text>")
  check(drawn:find("program: phlox " .. core.version, 1, true), "program version drawn as <text>")
  -- drawing order kept: the water lines (dashed) come before the labels over them
  local line_at = drawing:find("stroke-dasharray", 1, true)
  local label_at = drawing:find('paint-order="stroke"', 1, true)
  check(line_at and label_at and line_at < label_at, "labels with halos drawn after the lines")
  check(not drawing:find("<symbol", 1, true), "no glyph outlines in the default SVG")
end
plot.map(map, { file = dir .. "/m.pdf" })
check(slurp(dir .. "/m.pdf"):sub(1, 5) == "%PDF-", "PDF header")
-- identical inputs, identical bytes (two separate figures)
local a = plot.map(map):render("svg")
local b = plot.map(test_map()):render("svg")
check(a == b, "SVG bytes differ between identical renders")
check(plot.map(map):render("pdf") == plot.map(map):render("pdf"), "PDF bytes differ")

-- reference electrode: the axis and the window shift by the offset
local ref = { name = "SCE", offset = 0.241 }   -- offset given by the user; any number works here
local s2 = plot.map(map, { reference = ref }):render("svg")
check(s2:find("y axis: E / V vs SCE", 1, true), "axis names the reference electrode")
check(s2:find("potential vs SCE = E(SHE) − 0.241 V", 1, true), "stamp states the shift")
check(not pcall(plot.map, map, { reference = { name = "no such electrode" } }), "unknown reference name")
-- by name, the same names as phlox.to_she: 25 °C offset, corrected with the
-- electrode's dE/dT within its range, refused beyond (issue 14 item 7)
local phlox = require "phlox"
local s3 = plot.map(map, { reference = "SCE" }):render("svg")
check(s3:find("potential vs SCE = E(SHE) − 0.241 V", 1, true), "named reference at 25 °C")
local E50 = phlox.to_she(0, "SCE", { T_C = 50 })
local s4 = plot.map(test_map(50), { reference = "SCE" }):render("svg")
check(s4:find(("potential vs SCE = E(SHE) − %.4g V"):format(E50), 1, true), "named reference corrected to 50 °C")
check(not pcall(plot.map, test_map(200), { reference = "SCE" }), "SCE refused at 200 °C")
check(plot.map(test_map(200), { reference = "SCE", reference_at_25C = true }):render("svg")
  :find("kept at 25 °C", 1, true), "electrode kept at 25 °C is stamped")

-- domains: own figure and overlays
local d = plot.domains(map):render("svg")
for _, name in ipairs({ "immunity", "passivation", "corrosion" }) do
  check(d:find("legend: " .. name, 1, true), "domain legend " .. name)
end
check(d:find("domains from field kinds", 1, true), "derived domains are stated")
check(plot.map(map, { domains = "hatch" }):render("svg"):find("legend: corrosion", 1, true), "hatch overlay legend")
check(plot.map(map, { domains = "tint" }):render("svg"):find("legend: passivation", 1, true), "tint overlay legend")

-- grid: one PDF page per panel (count /Type /Page objects, not /Pages)
local maps = { test_map(25), test_map(100), test_map(200), test_map(300) }
plot.grid(maps, { file = dir .. "/g.pdf", pages = true })
local pdf = slurp(dir .. "/g.pdf")
local pages = 0
for tail in pdf:gmatch("/Type%s*/Page(.)") do if tail ~= "s" then pages = pages + 1 end end
check(pages == 4, "one page per panel, got " .. pages)
-- cols that would leave an empty cell (3 maps, 2 columns) must not add a
-- blank page
plot.grid({ maps[1], maps[2], maps[3] }, { file = dir .. "/g3.pdf", pages = true, cols = 2 })
local pages3 = 0
for tail in slurp(dir .. "/g3.pdf"):gmatch("/Type%s*/Page(.)") do if tail ~= "s" then pages3 = pages3 + 1 end end
check(pages3 == 3, "three panels with cols = 2: three pages, got " .. pages3)
local gs = plot.grid(maps):render("svg")
check(gs:find("panel 4: {M}–{H2O} at 300 °C", 1, true) == nil and gs:find("panel 4: M–H2O at 300 °C", 1, true),
      "per-panel titles")
check(gs:find("panels at 25 °C, 100 °C, 200 °C, 300 °C", 1, true), "grid stamp lists the temperatures")

-- overlay: a legend entry per map
local ov = plot.overlay({ test_map(25), test_map(150) }):render("svg")
check(ov:find("legend: 25 °C", 1, true) and ov:find("legend: 150 °C", 1, true), "overlay legend")

-- curves: log axis drops non-positive values without failing
local xs, y1, y2 = {}, {}, {}
for i = 0, 70 do
  local pH = i / 5
  xs[#xs + 1] = pH
  y1[#y1 + 1] = 1 / (1 + 10 ^ (pH - 7))
  y2[#y2 + 1] = pH == 7 and 0 or 1 - y1[#y1]
end
local c = plot.curves({ { x = xs, y = y1, label = "HA" }, { x = xs, y = y2, label = "A^-" } },
                      { x = { name = "pH" }, y = { name = "fraction", log = true, min = 1e-6, max = 1 },
                        file = dir .. "/c.png", dpi = 72 })
local cs = c:render("svg")
check(cs:find("legend: HA", 1, true) and cs:find("legend: A^-", 1, true), "curve legend (braces stripped)")
local cpng = slurp(dir .. "/c.png")
check(select(1, string.unpack(">I4", cpng, 17)) == 396, "curve PNG width at 72 dpi")

-- misuse raises with the offending field named
local bad = test_map(); bad.fields[2].kind = "plasma"
local ok, err = pcall(plot.map, bad)
check(not ok and err:find("map.fields[2].kind", 1, true), "bad kind: " .. tostring(err))
bad = test_map(); bad.fields[1].y[2] = 0 / 0
ok, err = pcall(plot.map, bad)
check(not ok and err:find("map.fields[1]: point 2", 1, true), "NaN vertex: " .. tostring(err))
bad = test_map(); bad.y.max = bad.y.min
ok, err = pcall(plot.map, bad)
check(not ok and err:find("map.y", 1, true), "empty y range: " .. tostring(err))
check(not pcall(plot.curves, {}), "no series")
-- titles say what the figure is: ligand and its total, fixed pH or E, temperature
local lm = test_map(90)
lm.conditions.ligand, lm.conditions.ligand_activity, lm.conditions.pH = "S", 1e-3, 5
check(plot.map_title(lm) == "{M}–{S}–{H2O} at 90 °C, a(Σ{S}) = 10⁻³, pH 5", plot.map_title(lm))
lm.ligand_fields = { { species = "HS^-" } }
lm.conditions.pH, lm.conditions.E_V = nil, -0.5
check(plot.map_title(lm) == "{M}–{S}–{H2O} at 90 °C, a({HS^-}) = 10⁻³, E = −0.5 V vs SHE", plot.map_title(lm))
check(plot.number(2.5e-3) == "2.5 × 10⁻³" and plot.number(-0.25) == "−0.25" and plot.number(1e-6) == "10⁻⁶",
      "typeset numbers")
ok, err = pcall(plot.map, map, { stamp = "tiny" })
check(not ok and err:find("option 'stamp' must be", 1, true), "bad stamp mode: " .. tostring(err))
ok, err = pcall(plot.map, map, { preset = "poster" })
check(not ok and err:find("column, double, page, slide", 1, true), "unknown preset names the presets: " .. tostring(err))
-- presets: size and scaled text (the stamp's first line at the preset's size)
for name, p in pairs(plot.presets) do
  local f = plot.map(map, { preset = name })
  local W, H = f:render("svg"):match('width="([%d.]+)p?t?" height="([%d.]+)p?t?"')
  check(tonumber(W) == p.width and tonumber(H) == p.height, name .. " preset size " .. tostring(W) .. " x " .. tostring(H))
  for _, b in ipairs(f:layout()) do
    if b.kind == "title" then
      check(b.size < 10 * p.text or S.near(b.size, 10 * p.text, 1e-9, { strict = true }),
            ("%s title size %s at most %s (tolerance < 1e-9)"):format(name, b.size, 10 * p.text))
    end
    if b.kind == "tick" then close(b.size, 8.5 * p.text, 1e-9, name .. " tick label size", { strict = true }) end
  end
end
check(not pcall(plot.map, map, { file = dir .. "/m.jpg" }), "unknown extension")

require("phlox.core").remove_tree(dir)
print("test_plot: ok")
