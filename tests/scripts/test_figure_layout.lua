-- test_figure_layout.lua: every diagram kind at every figure preset (and a
-- map with the full stamp at each), checked
-- from the layout the renderer computed (fig:layout(), the boxes it drew):
--   * no two labels overlap (field labels, led-out labels, labels along
--     lines, texts, legends, ticks, axis titles, titles, stamp lines);
--   * no label inside the plot leaves the plot area, and no text leaves the
--     figure;
--   * every field with room for its label has it inside, every other
--     visible field has one led out, and every line label found a place.
-- The geometry checks here are written independently of src/render/labels.c:
-- overlap by separating axes, room by the field's inscribed circle (the
-- pole of inaccessibility) holding the label's box at the smallest size.
-- "Room" is a sufficient condition, common practice for label placement
-- (no source).  The maps use the standard library's data.
local phlox = require "phlox"
local plot = require "phlox.plot"
local diagrams = require "phlox.diagrams"
local core = require "phlox.core"

local S = dofile(assert(os.getenv("PHLOX_SOURCE_DIR"), "PHLOX_SOURCE_DIR is not set (run through ctest)") .. "/tests/support/init.lua")
local soft = S.soft() -- every layout problem is listed, then the test fails
local check, failures = soft.check, soft.failures

local LABEL_MIN = 5.5      -- smallest field label size at text scale 1 (docs/figures.md)
local HEIGHT_PER_SIZE = 1.17 -- DejaVu Sans ascent + descent per point of size (font metrics)
local EPS = 1e-6           -- points: boxes that only touch do not overlap

-- separating axis test for two convex quadrilaterals
local function overlap(a, b)
  for _, q in ipairs({ a, b }) do
    for k = 1, 4 do
      local k2 = k % 4 + 1
      local nx, ny = -(q.y[k2] - q.y[k]), q.x[k2] - q.x[k]
      local a0, a1, b0, b1 = math.huge, -math.huge, math.huge, -math.huge
      for i = 1, 4 do
        local da, db = a.x[i] * nx + a.y[i] * ny, b.x[i] * nx + b.y[i] * ny
        a0, a1 = math.min(a0, da), math.max(a1, da)
        b0, b1 = math.min(b0, db), math.max(b1, db)
      end
      local tol = EPS * math.sqrt(nx * nx + ny * ny)
      if a1 <= b0 + tol or b1 <= a0 + tol then return false end
    end
  end
  return true
end

local function inside_rect(b, x, y, w, h)
  for i = 1, 4 do
    if b.x[i] < x - EPS or b.x[i] > x + w + EPS or b.y[i] < y - EPS or b.y[i] > y + h + EPS then return false end
  end
  return true
end

local IN_PLOT = { field = true, leader = true, line = true, text = true }

-- The fields of a map in points, clipped to the window.
local function field_points(f, win, r)
  local xs, ys = {}, {}
  for i = 1, #f.x do
    local x = math.min(math.max(f.x[i], win.x0), win.x1)
    local y = math.min(math.max(f.y[i], win.y0), win.y1)
    xs[i] = r[1] + (x - win.x0) / (win.x1 - win.x0) * r[3]
    ys[i] = r[2] + r[4] - (y - win.y0) / (win.y1 - win.y0) * r[4]
  end
  return xs, ys
end

local function area(xs, ys) return math.abs(core.polygon_area(xs, ys)) end   -- src/geom

-- what: a name for messages; fig: the figure; look: plot.look's table (text scale);
-- panels: { { map = m, win = {x0, x1, y0, y1} }, ... } for map figures
local function check_figure(what, fig, look, panels)
  local boxes = fig:layout()
  -- the page's size as written (a full stamp below a preset adds height)
  local W, H = fig:render("svg"):match('<svg[^>]-width="([%d.]+)p?t?"[^>]-height="([%d.]+)p?t?"')
  W, H = tonumber(W), tonumber(H)
  local rects = {}
  for p = 1, #(panels or { 1 }) do rects[p] = { fig:plot_rect(p) } end
  local drawn = {}
  for _, b in ipairs(boxes) do
    if b.placed then drawn[#drawn + 1] = b
    else check(b.kind ~= "line", ("%s: line label '%s' found no place"):format(what, b.text)) end
  end
  for _, b in ipairs(drawn) do
    check(inside_rect(b, 0, 0, W, H),
          ("%s: %s '%s' leaves the figure"):format(what, b.kind, b.text))
    local r = rects[b.panel]
    if IN_PLOT[b.kind] and r then
      check(inside_rect(b, r[1], r[2], r[3], r[4]), ("%s: %s '%s' leaves the plot area"):format(what, b.kind, b.text))
    end
  end
  for i = 1, #drawn do
    for j = i + 1, #drawn do
      local a, b = drawn[i], drawn[j]
      check(not overlap(a, b), ("%s: %s '%s' overlaps %s '%s'"):format(what, a.kind, a.text, b.kind, b.text))
    end
  end
  local n_field = 0
  for p, pan in ipairs(panels or {}) do
    local labels = {}
    for _, b in ipairs(drawn) do
      if b.panel == p and (b.kind == "field" or b.kind == "leader") then
        labels[b.text] = labels[b.text] or {}
        labels[b.text][b.kind] = true
      end
    end
    for _, f in ipairs(pan.map.fields) do
      if f.label ~= false then
        local xs, ys = field_points(f, pan.win, rects[p])
        if area(xs, ys) > 1 then
          local got = labels[f.species]
          check(got, ("%s: field %s (panel %d) has no label"):format(what, f.species, p))
          local size = LABEL_MIN * look.text
          local w = core.text_width(f.species, size, true) + 2 * look.text
          local h = size * HEIGHT_PER_SIZE
          local _, _, depth = core.polygon_pole(xs, ys, 0.25)
          -- the inscribed circle holds the box, and the box stays inside the frame's halo margin
          local room = depth >= math.sqrt(w * w + h * h) / 2 + 3 * look.text
          if room then
            n_field = n_field + 1
            check(got and got.field, ("%s: field %s (panel %d) has room but its label is led out"):format(what, f.species, p))
          end
        end
      end
    end
  end
  return #drawn, n_field
end

local lib = phlox.library { "Fe", "S", "Zn", "Cl" }
local fe = phlox.map { library = lib, element = "Fe", T_C = 25 }
local fes = phlox.map { library = lib, element = "Fe", T_C = 25, ligand = "S", ligand_activity = 1e-3 }
local rig = phlox.grid_map { library = lib, element = "Fe", T_C = 25, n = 61 }
local zncl = diagrams.ligand_E { library = lib, element = "Zn", ligand = "Cl", pH = 5 }
local fr = diagrams.fractions { library = lib, element = "Zn", T_C = 25, n = 57 }
local so = diagrams.solubility { library = lib, element = "Zn", T_C = { 25, 150 }, n = 29 }
local series = diagrams.series { library = lib, element = "Fe", T_C = { 25, 150, 250 } }

local function win_of(m) return { x0 = m.x.min, x1 = m.x.max, y0 = m.y.min, y1 = m.y.max } end
local union = win_of(series[1])
for _, m in ipairs(series) do
  local w = win_of(m)
  union = { x0 = math.min(union.x0, w.x0), x1 = math.max(union.x1, w.x1),
            y0 = math.min(union.y0, w.y0), y1 = math.max(union.y1, w.y1) }
end

local names = {}
for k in pairs(plot.presets) do names[#names + 1] = k end
table.sort(names)
check(#names >= 4, "four presets at least")
local total, with_room = 0, 0
for _, preset in ipairs(names) do
  local o = { preset = preset }
  local function one(what, fig, panels)
    local n, r = check_figure(preset .. " " .. what, fig, plot.look(o), panels)
    total, with_room = total + n, with_room + r
  end
  one("exact map", plot.map(fe, o), { { map = fe, win = win_of(fe) } })
  one("exact map with ligand", plot.map(fes, o), { { map = fes, win = win_of(fes) } })
  one("rigorous map", plot.map(rig, o), { { map = rig, win = win_of(rig) } })
  local full = plot.map(fe, { preset = preset, stamp = "full" })
  one("exact map with the full stamp", full, { { map = fe, win = win_of(fe) } })
  for _, b in ipairs(full:layout()) do   -- long checksums are wrapped, not cut off
    check(not (b.kind == "stamp" and b.text:find("…", 1, true)), preset .. ": stamp line cut: " .. b.text)
  end
  one("ligand-axis map", plot.map(zncl, o), { { map = zncl, win = win_of(zncl) } })
  one("fraction curves", diagrams.plot(fr, o))
  one("solubility curves", diagrams.plot(so, o))
  one("domains", plot.domains(fe, o), { { map = fe, win = win_of(fe) } })
  local g = plot.grid(series, o)
  local panels = {}
  for i, m in ipairs(series) do panels[i] = { map = m, win = union } end
  one("grid", g, panels)
  -- the grid of three draws three panels, no empty fourth one
  local desc = g:render("svg"):match("<desc>(.-)</desc>")
  check(not desc:find("panel 4", 1, true), preset .. " grid: a fourth panel is drawn")
end

-- the layout checks can fail: two labels forced onto one spot are reported
local fig = core.figure(200, 150)
fig:axes(1, 0, 1, 0, 1)
fig:text(1, 0.5, 0.5, "first", false, 9)
fig:text(1, 0.5, 0.5, "second", false, 9)
local before = #failures
check_figure("self-test", fig, { text = 1 })
check(#failures > before, "the overlap check finds two texts at one spot")
if #failures > before then for k = #failures, before + 1, -1 do table.remove(failures, k) end end

soft.finish("layout problems")
print(("test_figure_layout: %d presets x 9 figures, %d text boxes, %d fields with room, no overlaps")
  :format(#names, total, with_room))
