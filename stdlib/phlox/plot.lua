--- phlox.plot: publication figures from plain Lua tables.
--
-- Draws predominance maps (potential-pH and other two-variable maps),
-- corrosion-domain maps, curve plots (fractions, solubility), multi-panel
-- grids and overlays of several maps, through the figure renderer of
-- phlox.core (cairo; PNG, SVG or PDF by file extension).  It knows nothing
-- of the chemistry code: everything comes in a MAP TABLE (see
-- docs/figures.md for the format) or a list of series.
--
--   local plot = require "phlox.plot"
--   plot.map(map, { file = "Fe.pdf" })
--
-- Every figure carries a stamp: the conditions, the program version, the
-- checksums of the data files (phlox.provenance) and the safety caution.
local core = require "phlox.core"
local palette = require "phlox.palette"
local provenance = require "phlox.provenance"

local plot = {}

plot.caution = "Equilibrium thermodynamics: shows what can form, not how fast."
plot.defaults = {
  width = 396, height = 324,     -- points: 5.5 x 4.5 in, a report column
  dpi = 150,                     -- PNG only
}

local STAMP_SIZE = 6.5           -- must match PX_STAMP_SIZE in src/render/draw.c
local STAMP_MARGIN = 10          -- points left free across the stamp's width
local LINE_BOUNDARY = 0.9        -- line widths, points
local LINE_WATER = 1.0
local LINE_NEUTRAL = 0.8
local SMALL_TEXT = 7.0           -- water-line and neutral-pH labels
local KINDS = { aqueous = true, solid = true, gas = true, metal = true, liquid = true }
local DOMAINS = { "immunity", "passivation", "sulfide film", "corrosion" }
local DOMAIN_OK = { immunity = true, passivation = true, corrosion = true, ["sulfide film"] = true }

-- Argument checking ------------------------------------------------------

local function fail(where, msg) error(("%s: %s"):format(where, msg), 3) end

local function is_num(v) return type(v) == "number" and v == v and v ~= math.huge and v ~= -math.huge end

local function check_points(where, what, t, min_n)
  if type(t) ~= "table" or type(t.x) ~= "table" or type(t.y) ~= "table" then
    fail(where, what .. " needs x and y lists")
  end
  if #t.x ~= #t.y then fail(where, what .. ": x and y differ in length") end
  if #t.x < min_n then fail(where, ("%s: needs at least %d points"):format(what, min_n)) end
  for i = 1, #t.x do
    if not (is_num(t.x[i]) and is_num(t.y[i])) then
      fail(where, ("%s: point %d is not a pair of finite numbers"):format(what, i))
    end
  end
end

local function check_axis(where, name, a)
  if type(a) ~= "table" then fail(where, "map." .. name .. " must be a table") end
  if not (is_num(a.min) and is_num(a.max) and a.max > a.min) then
    fail(where, ("map.%s needs finite min < max"):format(name))
  end
end

--- Check a map table; raises an error naming the offending field.
function plot.check_map(map, where)
  where = where or "plot"
  if type(map) ~= "table" then fail(where, "map must be a table") end
  check_axis(where, "x", map.x)
  check_axis(where, "y", map.y)
  if type(map.fields) ~= "table" then fail(where, "map.fields must be a list") end
  for i, f in ipairs(map.fields) do
    local what = ("map.fields[%d]"):format(i)
    if type(f.species) ~= "string" then fail(where, what .. ".species must be a string") end
    if f.kind ~= nil and not KINDS[f.kind] then
      fail(where, ("%s.kind '%s' is not aqueous, solid, gas, metal or liquid"):format(what, tostring(f.kind)))
    end
    check_points(where, what, f, 3)
  end
  for i, b in ipairs(map.boundaries or {}) do check_points(where, ("map.boundaries[%d]"):format(i), b, 2) end
  for i, d in ipairs(map.domains or {}) do
    local what = ("map.domains[%d]"):format(i)
    if not DOMAIN_OK[d.domain] then
      fail(where, what .. ".domain must be immunity, passivation, sulfide film or corrosion")
    end
    check_points(where, what, d, 3)
  end
  if map.water ~= nil then
    for _, k in ipairs({ "o2", "h2" }) do
      local w = map.water[k]
      if w ~= nil and not (is_num(w.a) and is_num(w.b)) then
        fail(where, ("map.water.%s needs numbers a and b (E = a + b pH)"):format(k))
      end
    end
  end
  if map.neutral_pH ~= nil and not is_num(map.neutral_pH) then fail(where, "map.neutral_pH must be a number") end
  return map
end

-- Text helpers -----------------------------------------------------------

local function fmt_num(v)
  if v == math.floor(v) and math.abs(v) < 1e6 then return ("%d"):format(v) end
  local s = ("%.4g"):format(v)
  return (s:gsub("e%-0*", "e-"):gsub("e%+0*", "e"))
end

local function celsius(map)
  if map.conditions and is_num(map.conditions.T_C) then return map.conditions.T_C end
  if is_num(map.T) then return map.T - 273.15 end
end

local function fmt_T(tc)
  if not tc then return nil end
  local r = math.floor(tc * 10 + 0.5) / 10
  if r == math.floor(r) then return ("%d °C"):format(r) end
  return ("%.1f °C"):format(r)
end

local function pressure(map)
  if map.conditions and is_num(map.conditions.P_bar) then return map.conditions.P_bar end
  if is_num(map.P) then return map.P end
end

-- "log a(Cl^-)" -> "log a({Cl^-})": the formula part set in chemical type.
local function axis_name(name)
  if type(name) ~= "string" then return "" end
  if name:find("{", 1, true) then return name end
  return (name:gsub("^(log%s+[amfp])%((.+)%)$", "%1({%2})"))
end

local function is_potential(axis)
  return axis and (axis.name == "E" or axis.name == "Eh")
end

local function is_pH(axis) return axis and axis.name == "pH" end

-- The displayed potential scale: E_ref = E_SHE - offset.  A name (the
-- names of phlox.to_she: "SCE", "Ag/AgCl", ... or a full name) is corrected
-- to the map's temperature with the electrode's coefficient, or refused
-- away from 25 °C (opts.reference_at_25C keeps the 25 °C offset for an
-- electrode outside the hot test); { name, offset } is the user's own.
local function reference(opts, map)
  local ref = opts.reference
  if ref == nil then return { name = "SHE", offset = 0 } end
  if map and not is_potential(map.y) then
    error("plot: opts.reference needs a potential (E) y axis", 3)
  end
  if type(ref) == "string" or (type(ref) == "table" and type(ref.name) == "string" and ref.offset == nil) then
    local name = type(ref) == "string" and ref or ref.name
    local T = map and (map.T or (map.conditions and map.conditions.T_C and map.conditions.T_C + 273.15))
    local info = require("phlox").electrode_at(name, T, opts.reference_at_25C, "plot: reference")
    return { name = name, offset = info.offset, text = info.text }
  end
  if type(ref) ~= "table" or type(ref.name) ~= "string" or not is_num(ref.offset) then
    error("plot: opts.reference must be an electrode name (\"SCE\", \"Ag/AgCl\", ...) or "
      .. "{ name = \"SCE\", offset = <E of the electrode vs SHE, V> }", 3)
  end
  return { name = ref.name, offset = ref.offset,
           text = ("potentials vs %s: offset %s V given by the user (valid at the temperature it was measured)")
             :format(ref.name, fmt_num(ref.offset)) }
end

local function y_title(map, ref)
  local y = map.y
  if is_potential(y) then
    return ("%s / %s vs %s"):format(y.name, y.unit or "V", ref.name)
  end
  local name = axis_name(y.name)
  if y.unit and y.unit ~= "" then return name .. " / " .. y.unit end
  return name
end

local function x_title(map)
  local x = map.x
  local name = axis_name(x.name)
  if x.unit and x.unit ~= "" then return name .. " / " .. x.unit end
  return name
end

--- The default title of a map: "Fe–H₂O at 25 °C" (and the pressure when
-- it is not 1 bar).
function plot.map_title(map)
  local t = fmt_T(celsius(map))
  local lig = map.conditions and map.conditions.ligand
  local head = map.element and (lig and ("{%s}–{%s}–{H2O}"):format(map.element, lig)
                                or ("{%s}–{H2O}"):format(map.element)) or "map"
  local s = head .. (t and (" at " .. t) or "")
  local p = pressure(map)
  if p and math.abs(p - 1) > 1e-9 then s = s .. (", %s bar"):format(fmt_num(p)) end
  return s
end

-- Stamp -------------------------------------------------------------------

local COND_NAMES = {
  T_C = function(v) return ("T = %s °C"):format(fmt_num(v)) end,
  P_bar = function(v) return ("P = %s bar"):format(fmt_num(v)) end,
  activity = function(v) return ("activity of dissolved species = %s"):format(fmt_num(v)) end,
  ionic_strength = function(v) return ("I = %s mol/kg"):format(fmt_num(v)) end,
  ligand = function(v) return ("ligand %s"):format(v) end,
  ligand_activity = function(v) return ("ligand activity = %s"):format(fmt_num(v)) end,
}
local COND_ORDER = { "T_C", "P_bar", "activity", "ionic_strength", "ligand", "ligand_activity" }

local function conditions_text(c)
  if type(c) ~= "table" then return nil end
  local parts, seen = {}, {}
  for _, k in ipairs(COND_ORDER) do
    if c[k] ~= nil then
      local named = type(c[k]) == "number" or (k == "ligand" and type(c[k]) == "string")
      parts[#parts + 1] = named and COND_NAMES[k](c[k]) or (k .. " = " .. tostring(c[k]))
      seen[k] = true
    end
  end
  local rest = {}
  for k in pairs(c) do if not seen[k] then rest[#rest + 1] = k end end
  table.sort(rest)
  for _, k in ipairs(rest) do
    local v = c[k]
    parts[#parts + 1] = k .. " = " .. (type(v) == "number" and fmt_num(v) or tostring(v))
  end
  return #parts > 0 and ("conditions: " .. table.concat(parts, ", ")) or nil
end

-- Break a line at spaces so it fits `width` points at the stamp size.
local function wrap(line, width)
  if core.text_width(line, STAMP_SIZE) <= width then return { line } end
  local out, cur = {}, ""
  for word in line:gmatch("%S+") do
    local try = cur == "" and word or (cur .. " " .. word)
    if cur ~= "" and core.text_width(try, STAMP_SIZE) > width then
      out[#out + 1] = cur
      cur = "  " .. word
    else
      cur = try
    end
  end
  if cur ~= "" then out[#out + 1] = cur end
  return out
end

--- The stamp lines of a figure: conditions, program and checksums, extra
-- lines, the caution; wrapped to the figure width.
function plot.stamp_lines(conditions, extra, width, opts)
  opts = opts or {}
  local st = provenance.stamp(conditions)
  local lines = {}
  local c = conditions_text(conditions)
  if c then lines[#lines + 1] = c end
  local prog = "program: " .. st.program
  if st.script and not opts.no_script then
    prog = prog .. "; script: " .. st.script.file .. " sha256=" .. st.script.sha256
  end
  lines[#lines + 1] = prog
  for _, d in ipairs(st.data) do lines[#lines + 1] = "data: " .. d.file .. " sha256=" .. d.sha256 end
  for _, s in ipairs(extra or {}) do lines[#lines + 1] = tostring(s) end
  lines[#lines + 1] = plot.caution
  local out = {}
  for _, l in ipairs(lines) do
    for _, w in ipairs(wrap(l, width - STAMP_MARGIN)) do out[#out + 1] = w end
  end
  return out
end

local function add_stamp(fig, lines)
  for _, l in ipairs(lines) do fig:stamp(l) end
end

-- Geometry helpers ---------------------------------------------------------

local function shifted(ys, offset)
  if offset == 0 then return ys end
  local out = {}
  for i, v in ipairs(ys) do out[i] = v - offset end
  return out
end

-- Small labels (water lines, neutral pH) go where they keep clear of the
-- field labels, which the renderer puts near each field's pole of
-- inaccessibility.  Work in a frame where the plot is about `aspect` wide
-- and 1 high, as the renderer sees it.
local PLOT_MARGIN_W, PLOT_MARGIN_H = 70, 100   -- rough room for axes and stamp, points

local function frame(win, fig_w, fig_h)
  local aspect = math.max(fig_w - PLOT_MARGIN_W, 50) / math.max(fig_h - PLOT_MARGIN_H, 50)
  local sx, sy = aspect / (win.x1 - win.x0), 1 / (win.y1 - win.y0)
  return function(x, y) return (x - win.x0) * sx, (y - win.y0) * sy end,
         math.max(fig_h - PLOT_MARGIN_H, 50),   -- points per frame unit
         function(fx, fy) return win.x0 + fx / sx, win.y0 + fy / sy end,
         aspect
end

-- Field labels: the renderer (src/render/draw.c) sets a label at the given
-- point if it fits at 9.5 down to 5.5 pt, and otherwise leads it out with a
-- line from the field's centroid to a box 16 pt right or left and 16 pt
-- below or 10 pt above.  These must match its constants.
local LABEL_MIN, LEADER_SIZE = 5.5, 6.5
local LEADER_DX, LEADER_DY_DOWN, LEADER_DY_UP = 16, 16, 10

local function seg_dist(px, py, ax, ay, bx, by)
  local dx, dy = bx - ax, by - ay
  local l2 = dx * dx + dy * dy
  local t = l2 > 0 and math.max(0, math.min(1, ((px - ax) * dx + (py - ay) * dy) / l2)) or 0
  local ex, ey = ax + t * dx - px, ay + t * dy - py
  return math.sqrt(ex * ex + ey * ey)
end

local function inside(xs, ys, x, y)   -- even-odd rule
  local c, n = false, #xs
  local j = n
  for i = 1, n do
    if ((ys[i] > y) ~= (ys[j] > y)) and (x < (xs[j] - xs[i]) * (y - ys[i]) / (ys[j] - ys[i]) + xs[i]) then
      c = not c
    end
    j = i
  end
  return c
end

local function edge_dist(xs, ys, x, y)
  local d, n = math.huge, #xs
  for i = 1, n do
    local j = i % n + 1
    d = math.min(d, seg_dist(x, y, xs[i], ys[i], xs[j], ys[j]))
  end
  return d
end

local function centroid(xs, ys)
  local a, gx, gy, n = 0, 0, 0, #xs
  for i = 1, n do
    local j = i % n + 1
    local c = xs[i] * ys[j] - xs[j] * ys[i]
    a, gx, gy = a + c, gx + (xs[i] + xs[j]) * c, gy + (ys[i] + ys[j]) * c
  end
  if a == 0 then return nil end
  return gx / (3 * a), gy / (3 * a)
end

-- The label point of a field (frame units): among the points nearly as
-- deep inside as the pole of inaccessibility (80 % of its depth), the one
-- nearest the centroid.  A long strip has a ridge of equally deep points,
-- and the pole alone may sit at one end of it; this picks the middle.
local function label_point(xs, ys)
  local ok, px, py, depth = pcall(core.polygon_pole, xs, ys, 1e-3)
  if not ok then return nil end
  local gx, gy = centroid(xs, ys)
  if not gx then return px, py end
  local x0, x1, y0, y1 = math.huge, -math.huge, math.huge, -math.huge
  for i = 1, #xs do
    x0, x1 = math.min(x0, xs[i]), math.max(x1, xs[i])
    y0, y1 = math.min(y0, ys[i]), math.max(y1, ys[i])
  end
  local bx, by = px, py
  local best = (px - gx) ^ 2 + (py - gy) ^ 2
  local N = 24
  for i = 0, N do
    for j = 0, N do
      local x, y = x0 + (x1 - x0) * i / N, y0 + (y1 - y0) * j / N
      local d2 = (x - gx) ^ 2 + (y - gy) ^ 2
      if d2 < best and inside(xs, ys, x, y) and edge_dist(xs, ys, x, y) >= 0.8 * depth then
        bx, by, best = x, y, d2
      end
    end
  end
  return bx, by
end

-- Does a w x h box centred at (x, y) fit in the polygon (the renderer's
-- nine-point test)?
local function box_fits(xs, ys, x, y, w, h)
  for i = -1, 1 do
    for j = -1, 1 do
      if not inside(xs, ys, x + i * w / 2, y + j * h / 2) then return false end
    end
  end
  return true
end

-- Label points (data units, for fig:polygon) and the spots other labels
-- must keep clear of (frame units): each placed label, and the box of each
-- led-out label.
local function field_labels(map, win, ref, to_frame, from_frame, unit, aspect)
  local poles, points = {}, {}
  for k, f in ipairs(map.fields) do
    local xs, ys = {}, {}
    for i = 1, #f.x do
      local x = math.min(math.max(f.x[i], win.x0), win.x1)
      local y = math.min(math.max(f.y[i] - ref.offset, win.y0), win.y1)
      xs[i], ys[i] = to_frame(x, y)
    end
    local lx, ly = label_point(xs, ys)
    if lx then
      local dx, dy = from_frame(lx, ly)
      points[k] = { dx, dy + ref.offset }
      local w = (core.text_width(f.species, LABEL_MIN, true) + 2) / unit
      local h = LABEL_MIN * 1.2 / unit
      if box_fits(xs, ys, lx, ly, w, h) then
        poles[#poles + 1] = { lx, ly }
      else   -- led out from the centroid (or the label point), as the renderer does
        local cx, cy = centroid(xs, ys)
        if not (cx and inside(xs, ys, cx, cy)) then cx, cy = lx, ly end
        local lw, lh = core.text_width(f.species, LEADER_SIZE, true) / unit, LEADER_SIZE * 1.2 / unit
        local ox = cx < aspect / 2 and cx + LEADER_DX / unit or cx - LEADER_DX / unit - lw
        local base = cy > 0.5 and cy - LEADER_DY_DOWN / unit or cy + LEADER_DY_UP / unit
        for q = 0, 4 do poles[#poles + 1] = { ox + lw * q / 4, base + 0.35 * lh } end
      end
    end
  end
  return poles, points
end

-- What small labels (water lines, neutral pH) must keep clear of, and the
-- field label points.
local function placement(map, win, ref, cell_w, cell_h)
  local to_frame, unit, from_frame, aspect = frame(win, cell_w, cell_h)
  local poles, points = field_labels(map, win, ref, to_frame, from_frame, unit, aspect)
  local n = map.neutral_pH
  if n and is_pH(map.x) and n > win.x0 and n < win.x1 then   -- keep labels off the dotted line
    for k = 0, 10 do
      local fx, fy = to_frame(n, win.y0 + (win.y1 - win.y0) * k / 10)
      poles[#poles + 1] = { fx, fy }
    end
  end
  return { to_frame = to_frame, unit = unit, poles = poles, label_points = points }
end

-- Of the candidate boxes {x, y, w, h} (frame units, (x, y) the lower left),
-- the one whose centre is farthest from every pole.
local function clearest(cands, poles)
  local best, bscore
  for _, c in ipairs(cands) do
    local cx, cy = c[1] + c[3] / 2, c[2] + c[4] / 2
    local score = math.huge
    for _, p in ipairs(poles) do
      -- distance measured in label sizes, so wide labels keep wider berth
      local dx, dy = (cx - p[1]) / (c[3] / 2 + 0.08), (cy - p[2]) / (c[4] / 2 + 0.04)
      score = math.min(score, dx * dx + dy * dy)
    end
    if not bscore or score > bscore then best, bscore = c, score end
  end
  return best
end

local function window_of(map, ref)
  return { x0 = map.x.min, x1 = map.x.max, y0 = map.y.min - ref.offset, y1 = map.y.max - ref.offset }
end

-- Union of the maps' windows (shared axis ranges).
local function union_window(maps, ref)
  local w
  for _, m in ipairs(maps) do
    local v = window_of(m, ref)
    if not w then
      w = v
    else
      w = { x0 = math.min(w.x0, v.x0), x1 = math.max(w.x1, v.x1),
            y0 = math.min(w.y0, v.y0), y1 = math.max(w.y1, v.y1) }
    end
  end
  return w
end

-- Domains: given, or derived field by field when absent, by the rule of
-- the map core (core.domain_of, src/diagram/emap.c): the element itself ->
-- immunity; a metal sulfide -> sulfide film; other solids and liquids ->
-- passivation; dissolved and gas -> corrosion.  A field whose species is
-- not a formula (a hand-made table) goes by its kind: metal -> immunity,
-- solid or liquid -> passivation, else corrosion.
local KIND_DOMAIN = { metal = "immunity", solid = "passivation", liquid = "passivation" }
local function domain_of_field(map, f)
  if f.domain then return f.domain end
  if map.element then
    local ok, d = pcall(core.domain_of, f.species, map.element)
    if ok then return d end
  end
  return KIND_DOMAIN[f.kind] or "corrosion"
end

function plot.domains_of(map)
  if map.domains then return map.domains, false end
  local out = {}
  for _, f in ipairs(map.fields) do
    out[#out + 1] = { domain = domain_of_field(map, f), x = f.x, y = f.y }
  end
  return out, true
end

-- Hatching of overlaid domains: corrosion dense at 45°, passivation
-- sparse at -45°, sulfide film horizontal, immunity bare.
local DOMAIN_HATCH = {
  corrosion = { spacing = 3.5, angle = 45, width = 0.5 },
  passivation = { spacing = 6, angle = -45, width = 0.4 },
  ["sulfide film"] = { spacing = 4.5, angle = 0, width = 0.5 },
}

-- Drawing a map into a panel -------------------------------------------------

local function draw_water(fig, panel, map, win, ref, style, labelled, place)
  if not (map.water and is_pH(map.x)) then return end
  local lines = {
    { map.water.o2, "O2/H2O" },
    { map.water.h2, "H2O/H2" },
  }
  for _, l in ipairs(lines) do
    local w = l[1]
    if w then
      local function E(x) return w.a + w.b * x - ref.offset end
      fig:line(panel, { win.x0, win.x1 }, { E(win.x0), E(win.x1) }, style.color, style.width,
               style.dash, style.legend)
      if labelled and place then
        local tw = core.text_width(l[2], SMALL_TEXT, true) / place.unit
        local th = SMALL_TEXT * 1.2 / place.unit
        local cands = {}
        for k = 1, 40 do   -- along the line, just above it, inside the window
          local x = win.x0 + (win.x1 - win.x0) * (0.02 + 0.96 * (k - 1) / 39)
          local y = E(x) + 0.012 * (win.y1 - win.y0)
          local fx, fy = place.to_frame(x, y)
          local x_end = place.to_frame(win.x1, y)
          if fx + tw < x_end - 0.01 and fy > 0.03 and fy + th < 0.97 then
            cands[#cands + 1] = { fx, fy, tw, th, x = x, y = y }
          end
        end
        local c = clearest(cands, place.poles)
        if c then fig:text(panel, c.x, c.y, l[2], true, SMALL_TEXT, style.color) end
      end
    end
  end
end

local function draw_neutral(fig, panel, map, win, place)
  local n = map.neutral_pH
  if not (n and is_pH(map.x) and n > win.x0 and n < win.x1) then return end
  fig:line(panel, { n, n }, { win.y0, win.y1 }, palette.neutral, LINE_NEUTRAL, "dotted")
  local t = fmt_T(celsius(map))
  local label = ("neutral pH %.2f%s"):format(n, t and (" at " .. t) or "")
  local dx = 0.018 * (win.x1 - win.x0)
  local x, y = n + dx, win.y0 + 0.02 * (win.y1 - win.y0)
  if place then   -- right or left of the line, at the foot or the top
    local tw = core.text_width(label, SMALL_TEXT) / place.unit
    local th = SMALL_TEXT * 1.2 / place.unit
    local cands = {}
    for _, yy in ipairs({ win.y0 + 0.02 * (win.y1 - win.y0), win.y1 - 0.06 * (win.y1 - win.y0) }) do
      local fx, fy = place.to_frame(n, yy)
      local x_end = place.to_frame(win.x1, yy)
      if fx + 0.02 + tw < x_end then cands[#cands + 1] = { fx + 0.02, fy, tw, th, x = n + dx, y = yy } end
      if fx - 0.02 - tw > 0 then
        cands[#cands + 1] = { fx - 0.02 - tw, fy, tw, th, x = n - dx - tw * (win.x1 - win.x0) / x_end, y = yy }
      end
    end
    local c = clearest(cands, place.poles)
    if c then
      x, y = c.x, c.y
      for k = 0, 4 do   -- later labels keep off this one
        place.poles[#place.poles + 1] = { c[1] + c[3] * k / 4, c[2] + c[4] / 2 }
      end
    end
  end
  fig:text(panel, x, y, label, false, SMALL_TEXT, palette.neutral)
end

local function draw_domain_overlay(fig, panel, map, ref, mode)
  local domains = plot.domains_of(map)
  local present = {}
  for _, d in ipairs(domains) do
    local ys = shifted(d.y, ref.offset)
    present[d.domain] = true
    if mode == "tint" then
      local c = palette.domain[d.domain]
      fig:polygon(panel, d.x, ys, { c[1], c[2], c[3], 0.45 }, palette.domain_ink, 0)
    else
      local h = DOMAIN_HATCH[d.domain]
      if h then fig:hatch(panel, d.x, ys, palette.domain_ink, h.width, h.spacing, h.angle) end
    end
  end
  for _, name in ipairs(DOMAINS) do
    if present[name] then
      if mode == "tint" then
        local c = palette.domain[name]
        fig:legend_patch(panel, name, { c[1], c[2], c[3], 0.45 }, palette.domain_ink)
      else
        local h = DOMAIN_HATCH[name]
        fig:legend_patch(panel, name, { 1, 1, 1 }, palette.domain_ink, h and h.spacing or 0,
                         h and h.angle or 0)
      end
    end
  end
  fig:legend(panel, "outside")
end

-- Fields, boundaries, water, neutral pH and (optionally) domains of one map.
local function draw_map(fig, panel, map, opts, win, ref, cell_w, cell_h, fills)
  fills = fills or palette.map_fills(map)
  local outline = (map.boundaries == nil or #map.boundaries == 0) and LINE_BOUNDARY or 0
  local place = placement(map, win, ref, cell_w, cell_h)
  for i, f in ipairs(map.fields) do
    local label = f.species
    if opts.labels == false then label = nil end
    local lp = place.label_points[i] or {}
    fig:polygon(panel, f.x, shifted(f.y, ref.offset), fills.fills[i], palette.ink, outline, label,
                lp[1], lp[2] and lp[2] - ref.offset)
  end
  if opts.domains then draw_domain_overlay(fig, panel, map, ref, opts.domains == true and "hatch" or opts.domains) end
  for _, b in ipairs(map.boundaries or {}) do
    fig:line(panel, b.x, shifted(b.y, ref.offset), palette.ink, LINE_BOUNDARY, "solid")
  end
  draw_neutral(fig, panel, map, win, place)
  draw_water(fig, panel, map, win, ref,
             { color = palette.water, width = LINE_WATER, dash = "dashed" }, true, place)
  return fills
end

local function finish(fig, opts, d)
  if opts.pages then fig:pages(true) end
  if opts.file then
    local ok, err = fig:save(opts.file, opts.dpi or d.dpi)
    if not ok then error("plot: " .. err, 3) end
  end
  return fig
end

local function size(opts)
  local w, h = opts.width or plot.defaults.width, opts.height or plot.defaults.height
  if not (is_num(w) and is_num(h) and w >= 50 and h >= 50) then
    error("plot: opts.width and opts.height are in points (>= 50)", 3)
  end
  return w, h
end

--- A predominance map as a figure.
-- opts: file (".png", ".svg", ".pdf"), width, height (points), dpi,
-- reference = { name = "SCE", offset = 0.241 }, title, domains = "hatch" |
-- "tint" (overlay of corrosion domains), labels = false, stamp (extra
-- lines).  Returns the phlox.Figure and the fill table (fills, tiers).
function plot.map(map, opts)
  opts = opts or {}
  plot.check_map(map, "plot.map")
  if opts.domains ~= nil and opts.domains ~= false and opts.domains ~= true and opts.domains ~= "hatch" and opts.domains ~= "tint" then
    error("plot.map: opts.domains must be \"hatch\" or \"tint\"", 2)
  end
  local ref = reference(opts, map)
  local w, h = size(opts)
  local fig = core.figure(w, h, 1, 1)
  local win = window_of(map, ref)
  fig:axes(1, win.x0, win.x1, win.y0, win.y1)
  fig:titles(1, x_title(map), y_title(map, ref), opts.title or plot.map_title(map))
  local fills = draw_map(fig, 1, map, opts, win, ref, w, h)
  local extra = {}
  for _, s in ipairs(map.stamp or {}) do extra[#extra + 1] = s end
  for _, s in ipairs(opts.stamp or {}) do extra[#extra + 1] = s end
  if ref.offset ~= 0 then
    extra[#extra + 1] = ("potential vs %s = E(SHE) - %s V"):format(ref.name, fmt_num(ref.offset))
  end
  if ref.text then extra[#extra + 1] = ref.text end
  if fills.conflicts > 0 then
    extra[#extra + 1] = ("note: %d pairs of neighbouring fields share a lightness tier"):format(fills.conflicts)
  end
  add_stamp(fig, plot.stamp_lines(map.conditions, extra, w))
  return finish(fig, opts, plot.defaults), fills
end

--- Corrosion domains (immunity, passivation, corrosion) as a figure of
-- their own, with the field boundaries thin on top, water lines, neutral
-- pH and a legend.  Uses map.domains, or derives them from the field kinds
-- (see plot.domains_of).  opts as plot.map.
function plot.domains(map, opts)
  opts = opts or {}
  plot.check_map(map, "plot.domains")
  local ref = reference(opts, map)
  local w, h = size(opts)
  local fig = core.figure(w, h, 1, 1)
  local win = window_of(map, ref)
  fig:axes(1, win.x0, win.x1, win.y0, win.y1)
  local t = fmt_T(celsius(map))
  local title = opts.title or ((map.element and ("{%s}: corrosion domains"):format(map.element) or "corrosion domains")
    .. (t and (" at " .. t) or ""))
  fig:titles(1, x_title(map), y_title(map, ref), title)
  local domains, derived = plot.domains_of(map)
  local present = {}
  for _, d in ipairs(domains) do
    fig:polygon(1, d.x, shifted(d.y, ref.offset), palette.domain[d.domain], palette.ink, 0)
    present[d.domain] = true
  end
  for _, b in ipairs(map.boundaries or {}) do
    fig:line(1, b.x, shifted(b.y, ref.offset), palette.ink, 0.5, "solid")
  end
  local place = placement(map, win, ref, w - 80, h)   -- the legend sits outside
  if opts.labels ~= false then   -- species names, small, over the domains
    for i, f in ipairs(map.fields) do
      local lp = place.label_points[i] or {}
      fig:polygon(1, f.x, shifted(f.y, ref.offset), { 1, 1, 1, 0 }, palette.ink, 0, f.species,
                  lp[1], lp[2] and lp[2] - ref.offset)
    end
  end
  draw_neutral(fig, 1, map, win, place)
  draw_water(fig, 1, map, win, ref, { color = palette.water, width = LINE_WATER, dash = "dashed" }, true, place)
  for _, name in ipairs(DOMAINS) do
    if present[name] then fig:legend_patch(1, name, palette.domain[name], palette.ink) end
  end
  fig:legend(1, opts.legend or "outside")
  local extra = {}
  for _, s in ipairs(map.stamp or {}) do extra[#extra + 1] = s end
  for _, s in ipairs(opts.stamp or {}) do extra[#extra + 1] = s end
  if derived then
    extra[#extra + 1] = "domains from field kinds: metal = immunity, metal sulfide = sulfide film, "
      .. "other solid = passivation, dissolved or gas = corrosion"
  end
  if ref.offset ~= 0 then
    extra[#extra + 1] = ("potential vs %s = E(SHE) - %s V"):format(ref.name, fmt_num(ref.offset))
  end
  if ref.text then extra[#extra + 1] = ref.text end
  add_stamp(fig, plot.stamp_lines(map.conditions, extra, w))
  return finish(fig, opts, plot.defaults)
end

-- Curves ---------------------------------------------------------------------

local function range_of(series, key, log, pad_frac)
  local lo, hi = math.huge, -math.huge
  for _, s in ipairs(series) do
    for _, v in ipairs(s[key]) do
      if is_num(v) and (not log or v > 0) then lo, hi = math.min(lo, v), math.max(hi, v) end
    end
  end
  if lo > hi then return nil end
  if lo == hi then
    if log then return lo / 10, hi * 10 end
    return lo - 1, hi + 1
  end
  if log then   -- whole decades
    return 10 ^ math.floor(math.log(lo, 10) + 1e-9), 10 ^ math.ceil(math.log(hi, 10) - 1e-9)
  end
  local pad = (pad_frac or 0) * (hi - lo)
  return lo - pad, hi + pad
end

-- Runs of consecutive drawable points (finite, and > 0 on a log axis).
local function runs(xs, ys, xlog, ylog)
  local out, cx, cy = {}, {}, {}
  local function flush()
    if #cx >= 2 then out[#out + 1] = { cx, cy } end
    cx, cy = {}, {}
  end
  for i = 1, #xs do
    local x, y = xs[i], ys[i]
    if is_num(x) and is_num(y) and (not xlog or x > 0) and (not ylog or y > 0) then
      cx[#cx + 1], cy[#cy + 1] = x, y
    else
      flush()
    end
  end
  flush()
  return out
end

local function legend_text(label, chem)
  if chem == false or label:find("[%s{]") then return label end
  return "{" .. label .. "}"
end

--- Curve plots (fractions, solubility, ...).
-- series = { { x = {...}, y = {...}, label = "Fe^2+", style = "solid" |
-- "dashed" | "dotted" | "dashdot", color = {r,g,b}, width = 1.2,
-- chem = false }, ... }.  Labels without spaces are set as formulas.
-- opts: x = { name, unit, min, max, log }, y = { ... }, title, legend =
-- "outside" (default) | "top right" | ... | false, conditions, stamp, file,
-- width, height, dpi.
function plot.curves(series, opts)
  opts = opts or {}
  if type(series) ~= "table" or #series == 0 then error("plot.curves: series must be a non-empty list", 2) end
  local ox, oy = opts.x or {}, opts.y or {}
  for i, s in ipairs(series) do
    if type(s.x) ~= "table" or type(s.y) ~= "table" or #s.x ~= #s.y then
      error(("plot.curves: series[%d] needs x and y lists of equal length"):format(i), 2)
    end
  end
  local x0, x1 = ox.min, ox.max
  if not (x0 and x1) then
    local a, b = range_of(series, "x", ox.log)
    if not a then error("plot.curves: no drawable x values", 2) end
    x0, x1 = x0 or a, x1 or b
  end
  local y0, y1 = oy.min, oy.max
  if not (y0 and y1) then
    local a, b = range_of(series, "y", oy.log, 0.03)
    if not a then error("plot.curves: no drawable y values (all <= 0 on a log axis?)", 2) end
    y0, y1 = y0 or a, y1 or b
  end
  local w, h = size(opts)
  local fig = core.figure(w, h, 1, 1)
  fig:axes(1, x0, x1, y0, y1, ox.log, oy.log)
  local function title_of(a, default)
    local n = axis_name(a.name or default)
    if a.unit and a.unit ~= "" then n = n .. " / " .. a.unit end
    return n
  end
  fig:titles(1, title_of(ox, "x"), title_of(oy, "y"), opts.title)
  for i, s in ipairs(series) do
    local st = palette.series_style(i)
    local color, dash, width = s.color or st.color, s.style or st.dash, s.width or 1.2
    local legend = s.label and legend_text(s.label, s.chem) or nil
    for k, r in ipairs(runs(s.x, s.y, ox.log, oy.log)) do
      fig:line(1, r[1], r[2], color, width, dash, k == 1 and opts.legend ~= false and legend or nil)
    end
  end
  if opts.legend ~= false then fig:legend(1, opts.legend or "outside") end
  add_stamp(fig, plot.stamp_lines(opts.conditions, opts.stamp, w))
  return finish(fig, opts, plot.defaults)
end

-- Grids and overlays ------------------------------------------------------------

--- Fills shared by several maps: one lightness tier per species across all
-- of them, so a species keeps its colour from panel to panel.  The
-- neighbour graph is the union of the maps' graphs (species by name).
-- Returns a list of fill tables (as palette.map_fills gives), one per map.
function plot.shared_fills(maps)
  local all, index, adj = {}, {}, {}
  for _, m in ipairs(maps) do
    for _, f in ipairs(m.fields) do
      local k = index[f.species]
      if not k then
        all[#all + 1] = { species = f.species, kind = f.kind, area = 0 }
        k = #all
        index[f.species], adj[k] = k, {}
      end
      all[k].area = all[k].area + (f.area or 0)
    end
  end
  local per_map = {}
  for mi, m in ipairs(maps) do
    local fills = palette.map_fills(m)
    for i, nb in pairs(fills.neighbours) do
      for j in pairs(nb) do
        local a, b = index[m.fields[i].species], index[m.fields[j].species]
        if a ~= b then adj[a][b], adj[b][a] = true, true end
      end
    end
    per_map[mi] = fills
  end
  local tiers, conflicts = palette.assign_tiers(all, adj)
  for mi, m in ipairs(maps) do
    local fills = per_map[mi]
    for i, f in ipairs(m.fields) do
      local t = tiers[index[f.species]]
      fills.tiers[i] = t
      fills.fills[i] = palette.field(f.kind or "aqueous", t)
    end
    fills.conflicts = conflicts
  end
  return per_map
end

--- Several maps as panels of one figure (e.g. a temperature sweep), on
-- shared axis ranges.  opts: cols (default: about square), panel_title =
-- function(map, i) -> string (default: temperature and pressure), pages
-- (PDF: one page per panel; cols is then ignored), and the options of plot.map (reference,
-- domains, labels, file, width, height, dpi, stamp).
function plot.grid(maps, opts)
  opts = opts or {}
  if type(maps) ~= "table" or #maps == 0 then error("plot.grid: maps must be a non-empty list", 2) end
  for i, m in ipairs(maps) do plot.check_map(m, ("plot.grid: maps[%d]"):format(i)) end
  local ref = reference(opts, maps[1])
  local n = #maps
  -- pages: one row whatever cols says, so the PDF has one page per map and
  -- no empty page (a cols that leaves cells empty would add blank pages)
  local cols = (opts.pages and n) or opts.cols or math.ceil(math.sqrt(n))
  local rows = math.ceil(n / cols)
  local w = opts.width or (plot.defaults.width * (cols > 1 and not opts.pages and 0.75 * cols or 1))
  local h = opts.height or (plot.defaults.height * (rows > 1 and not opts.pages and 0.75 * rows or 1))
  local fig = core.figure(w, h, rows, cols)
  local win = opts.shared == false and nil or union_window(maps, ref)
  local temps = {}
  local shared = opts.shared_fills ~= false and plot.shared_fills(maps) or {}
  for i, m in ipairs(maps) do
    local wi = win or window_of(m, ref)
    fig:axes(i, wi.x0, wi.x1, wi.y0, wi.y1)
    local title = opts.panel_title and opts.panel_title(m, i) or plot.map_title(m)
    fig:titles(i, x_title(m), y_title(m, ref), title)
    if opts.pages then   -- each page shows one panel at the full page size
      draw_map(fig, i, m, opts, wi, ref, w, h, shared[i])
    else
      draw_map(fig, i, m, opts, wi, ref, w / cols, h / rows, shared[i])
    end
    temps[#temps + 1] = fmt_T(celsius(m)) or "?"
  end
  local cond = {}   -- only the conditions every panel shares; titles tell the rest
  for k, v in pairs(maps[1].conditions or {}) do
    local same = true
    for i = 2, #maps do same = same and (maps[i].conditions or {})[k] == v end
    if same then cond[k] = v end
  end
  local extra = { "panels at " .. table.concat(temps, ", ") }
  if shared[1] and shared[1].conflicts > 0 then
    extra[#extra + 1] = ("note: %d pairs of neighbouring fields share a lightness tier"):format(shared[1].conflicts)
  end
  for _, s in ipairs(maps[1].stamp or {}) do extra[#extra + 1] = s end
  for _, s in ipairs(opts.stamp or {}) do extra[#extra + 1] = s end
  if ref.offset ~= 0 then
    extra[#extra + 1] = ("potential vs %s = E(SHE) - %s V"):format(ref.name, fmt_num(ref.offset))
  end
  if ref.text then extra[#extra + 1] = ref.text end
  add_stamp(fig, plot.stamp_lines(cond, extra, w))
  return finish(fig, opts, plot.defaults)
end

--- The boundaries of several maps on one plot (temperatures, ligand
-- levels), each map in its own colour and dash, with a legend.  The field
-- labels of one map (opts.labels_of, default 1; false for none) are shown.
-- opts: legend_label = function(map, i) -> string (default: map.label or
-- the temperature), water = false to leave out water lines, title, and the
-- options of plot.map.
function plot.overlay(maps, opts)
  opts = opts or {}
  if type(maps) ~= "table" or #maps == 0 then error("plot.overlay: maps must be a non-empty list", 2) end
  for i, m in ipairs(maps) do plot.check_map(m, ("plot.overlay: maps[%d]"):format(i)) end
  local ref = reference(opts, maps[1])
  local w, h = size(opts)
  local fig = core.figure(w, h, 1, 1)
  local win = union_window(maps, ref)
  fig:axes(1, win.x0, win.x1, win.y0, win.y1)
  local m1 = maps[1]
  local title = opts.title or ((m1.element and ("{%s}–{H2O}: "):format(m1.element) or "") .. "overlaid boundaries")
  fig:titles(1, x_title(m1), y_title(m1, ref), title)
  local lab = opts.labels_of == nil and 1 or opts.labels_of
  local place = placement(maps[lab or 1] or m1, win, ref, w - 80, h)
  if lab and maps[lab] then
    for i, f in ipairs(maps[lab].fields) do
      local lp = place.label_points[i] or {}
      fig:polygon(1, f.x, shifted(f.y, ref.offset), { 1, 1, 1, 0 }, palette.ink, 0, f.species,
                  lp[1], lp[2] and lp[2] - ref.offset)
    end
  end
  draw_neutral(fig, 1, m1, win, place)
  local labels = {}
  for i, m in ipairs(maps) do
    local st = palette.series_style(i)
    local label = opts.legend_label and opts.legend_label(m, i) or m.label or fmt_T(celsius(m)) or ("map " .. i)
    labels[i] = label
    local first = true
    for _, b in ipairs(m.boundaries or {}) do
      fig:line(1, b.x, shifted(b.y, ref.offset), st.color, 1.1, st.dash, first and label or nil)
      first = false
    end
    if first then   -- no boundaries: outline the fields instead
      for _, f in ipairs(m.fields) do
        local xs, ys = { table.unpack(f.x) }, { table.unpack(shifted(f.y, ref.offset)) }
        xs[#xs + 1], ys[#ys + 1] = xs[1], ys[1]
        fig:line(1, xs, ys, st.color, 1.1, st.dash, first and label or nil)
        first = false
      end
    end
    if opts.water ~= false then
      draw_water(fig, 1, m, win, ref, { color = st.color, width = 0.6, dash = "dashed" }, i == 1, place)
    end
  end
  fig:legend(1, opts.legend or "outside")
  local extra = { "overlaid: " .. table.concat(labels, ", ") }
  for _, s in ipairs(m1.stamp or {}) do extra[#extra + 1] = s end
  for _, s in ipairs(opts.stamp or {}) do extra[#extra + 1] = s end
  if ref.offset ~= 0 then
    extra[#extra + 1] = ("potential vs %s = E(SHE) - %s V"):format(ref.name, fmt_num(ref.offset))
  end
  if ref.text then extra[#extra + 1] = ref.text end
  local cond = {}   -- only the conditions all maps share; the legend tells the rest
  for k, v in pairs(m1.conditions or {}) do
    local same = true
    for i = 2, #maps do same = same and (maps[i].conditions or {})[k] == v end
    if same then cond[k] = v end
  end
  add_stamp(fig, plot.stamp_lines(cond, extra, w))
  return finish(fig, opts, plot.defaults)
end

return plot
