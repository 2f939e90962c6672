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

--- Figure presets: size in points, text and line scales, and the stamp
-- printed by default (the full provenance always goes into the file's
-- metadata).  Sizes are common practice for the targets (no source): a
-- journal column is about 3.3 in wide, a double column about 7 in, a 16:9
-- slide 10 x 5.625 in, a report page's text block about 6.5 in.
plot.presets = {
  column = { width = 240, height = 200, text = 0.85, line = 0.85, stamp = "short" },
  double = { width = 504, height = 360, text = 1.0, line = 1.0, stamp = "short" },
  slide = { width = 720, height = 405, text = 1.6, line = 1.6, stamp = "short", fixed = true },
  page = { width = 468, height = 351, text = 1.0, line = 1.0, stamp = "short" },
}

local STAMP_SIZE = 6.5           -- must match PX_STAMP_SIZE in src/render/draw.c
local STAMP_MARGIN = 10          -- points left free across the stamp's width
local LINE_BOUNDARY = 0.9        -- line widths, points (times the line scale)
local LINE_WATER = 1.0
local LINE_NEUTRAL = 0.8
local SMALL_TEXT = 7.0           -- water-line and neutral-pH labels (times the text scale)
local WATER_LABEL_AT = 0.88      -- water-line labels near the right end of their line
local NEUTRAL_LABEL_AT = 0.04    -- the neutral-pH label near the foot of its line
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

local SUP = { ["0"] = "⁰", ["1"] = "¹", ["2"] = "²", ["3"] = "³", ["4"] = "⁴", ["5"] = "⁵",
              ["6"] = "⁶", ["7"] = "⁷", ["8"] = "⁸", ["9"] = "⁹", ["-"] = "⁻" }

--- A number as typeset on figures: 0.01, 25, 10⁻⁶, 2.5 × 10⁻³ (true minus).
function plot.number(v)
  if type(v) ~= "number" then return tostring(v) end
  local s
  local a = math.abs(v)
  if v == 0 or (a >= 1e-2 and a < 1e5) then
    s = fmt_num(v)
  else
    local e = math.floor(math.log(a, 10) + 1e-9)
    local m = v / 10 ^ e
    if math.abs(math.abs(m) - 10) < 1e-9 then m, e = m / 10, e + 1 end
    local ms = ("%.3g"):format(m)
    local ex = tostring(e):gsub(".", SUP)
    s = (ms == "1" and "" or ms == "-1" and "-" or (ms .. " × ")) .. "10" .. ex
  end
  return (s:gsub("^%-", "−"))
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

-- Temperatures of several results: "25 °C", "25 and 150 °C", "25, 90 and 150 °C".
local function fmt_Ts(list)
  local parts = {}
  for i, t in ipairs(list) do parts[i] = (fmt_T(t):gsub(" °C$", "")) end
  if #parts == 0 then return nil end
  if #parts == 1 then return parts[1] .. " °C" end
  return table.concat(parts, ", ", 1, #parts - 1) .. " and " .. parts[#parts] .. " °C"
end

local function pressure(map)
  if map.conditions and is_num(map.conditions.P_bar) then return map.conditions.P_bar end
  if is_num(map.P) then return map.P end
end

--- A list of formulas as typeset text: "{Fe^2+}, {FeOH^+}".
function plot.formulas(list)
  local out = {}
  for i, f in ipairs(list) do out[i] = "{" .. tostring(f) .. "}" end
  return table.concat(out, ", ")
end

-- The ligand's single species over the whole map, or nil (several fields).
local function ligand_species(map)
  local lf = map.ligand_fields
  if type(lf) ~= "table" or #lf == 0 then return nil end
  for i = 2, #lf do if lf[i].species ~= lf[1].species then return nil end end
  return lf[1].species
end

-- "log a(Cl^-)" -> "log a({Cl^-})": the formula part set in chemical type.
-- A ligand axis ("log a(S)", the total activity of the ligand's dissolved
-- species) names the species when one ligand species holds the whole map,
-- else the total: "log a(ΣS)".
local function axis_name(name, map)
  if type(name) ~= "string" then return "" end
  if name:find("{", 1, true) then return name end
  local lig = name:match("^log a%((%u%l?)%)$")
  if lig and map and map.conditions and map.conditions.ligand == lig then
    local sp = ligand_species(map)
    if sp then return ("log a({%s})"):format(sp) end
    return ("log a(Σ{%s})"):format(lig)
  end
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
  local name = axis_name(y.name, map)
  if y.unit and y.unit ~= "" then return name .. " / " .. y.unit end
  return name
end

local function x_title(map)
  local x = map.x
  local name = axis_name(x.name, map)
  if x.unit and x.unit ~= "" then return name .. " / " .. x.unit end
  return name
end

-- What the map holds fixed, for its title: the ligand's total, a fixed pH
-- or E (the axes not shown).
local function fixed_text(c, map)
  if type(c) ~= "table" then return nil end
  local parts = {}
  if c.ligand and is_num(c.ligand_activity) then
    local sp = map and ligand_species(map)
    parts[#parts + 1] = sp and ("a({%s}) = %s"):format(sp, plot.number(c.ligand_activity))
      or ("a(Σ{%s}) = %s"):format(c.ligand, plot.number(c.ligand_activity))
  elseif c.ligand and is_num(c.ligand_total) then
    parts[#parts + 1] = ("{%s} %s mol/kg"):format(c.ligand, plot.number(c.ligand_total))
  end
  if is_num(c.total) and map and map.element then   -- a rigorous map's total of the element
    parts[#parts + 1] = ("{%s} %s mol/kg"):format(map.element, plot.number(c.total))
  end
  if is_num(c.pH) then parts[#parts + 1] = "pH " .. fmt_num(c.pH) end
  if is_num(c.E_V) then parts[#parts + 1] = ("E = %s V vs SHE"):format(plot.number(c.E_V)) end
  return #parts > 0 and table.concat(parts, ", ") or nil
end

--- The default title of a map: "Fe–S–H₂O at 25 °C, a(ΣS) = 10⁻³" with the
-- pressure when it is not 1 bar and what the map holds fixed (the ligand's
-- total, a fixed pH or E).
function plot.map_title(map)
  local t = fmt_T(celsius(map))
  local c = map.conditions or {}
  local lig = c.ligand
  local head = map.element and (lig and ("{%s}–{%s}–{H2O}"):format(map.element, lig)
                                or ("{%s}–{H2O}"):format(map.element)) or "map"
  local s = head .. (t and (" at " .. t) or "")
  local p = pressure(map)
  if p and math.abs(p - 1) > 1e-9 then s = s .. (", %s bar"):format(plot.number(tonumber(("%.3g"):format(p)))) end
  local fx = fixed_text(c, map)
  if fx then s = s .. ", " .. fx end
  return s
end

-- Stamp -------------------------------------------------------------------

local COND_NAMES = {
  T_C = function(v) return ("T = %s °C"):format(fmt_num(v)) end,
  P_bar = function(v) return ("P = %s bar"):format(plot.number(tonumber(("%.4g"):format(v)))) end,
  activity = function(v) return ("activity of dissolved species = %s"):format(plot.number(v)) end,
  ionic_strength = function(v) return ("I = %s mol/kg"):format(plot.number(v)) end,
  ligand = function(v) return ("ligand {%s}"):format(v) end,
  ligand_activity = function(v) return ("ligand activity = %s"):format(plot.number(v)) end,
  ligand_total = function(v) return ("ligand total = %s mol/kg"):format(plot.number(v)) end,
  total = function(v) return ("total of the element = %s mol/kg"):format(plot.number(v)) end,
  pH = function(v) return ("pH = %s"):format(fmt_num(v)) end,
  E_V = function(v) return ("E = %s V vs SHE"):format(plot.number(v)) end,
  activity_model = function(v) return ("activity model: %s"):format(v) end,
}
local COND_ORDER = { "T_C", "P_bar", "pH", "E_V", "activity", "total", "ionic_strength", "ligand",
                     "ligand_activity", "ligand_total", "activity_model" }

-- A condition key of our own naming, as text: "Zn total (mol/kg)" and
-- "NaOH_mol_kg" read as "Zn total = 10⁻⁶ mol/kg" and "NaOH = 10⁻⁴ mol/kg".
local function other_condition(k, v)
  local val = type(v) == "number" and plot.number(v) or tostring(v)
  local name, unit = k:match("^(.-)%s*%((.-)%)$")
  if name then return ("%s = %s %s"):format(name, val, unit) end
  name = k:match("^(.-)_mol_kg$")
  if name then return ("%s = %s mol/kg"):format(name:gsub("_", " "), val) end
  return (k:gsub("_", " ")) .. " = " .. val
end

local function conditions_text(c)
  if type(c) ~= "table" then return nil end
  local parts, seen = {}, {}
  for _, k in ipairs(COND_ORDER) do
    if c[k] ~= nil then
      local named = type(c[k]) == "number" or ((k == "ligand" or k == "activity_model") and type(c[k]) == "string")
      parts[#parts + 1] = named and COND_NAMES[k](c[k]) or (k .. " = " .. tostring(c[k]))
      seen[k] = true
    end
  end
  local rest = {}
  for k in pairs(c) do if not seen[k] then rest[#rest + 1] = k end end
  table.sort(rest)
  for _, k in ipairs(rest) do parts[#parts + 1] = other_condition(k, c[k]) end
  return #parts > 0 and ("conditions: " .. table.concat(parts, ", ")) or nil
end

-- The short form of the conditions: "25 °C, 1 bar, a = 10⁻⁶, I = 0".
local function conditions_short(c)
  if type(c) ~= "table" then return nil end
  local parts = {}
  if is_num(c.T_C) then parts[#parts + 1] = fmt_T(c.T_C) end
  if is_num(c.P_bar) then parts[#parts + 1] = plot.number(tonumber(("%.3g"):format(c.P_bar))) .. " bar" end
  if is_num(c.activity) then parts[#parts + 1] = "a = " .. plot.number(c.activity) end
  if is_num(c.total) then parts[#parts + 1] = "total " .. plot.number(c.total) .. " mol/kg" end
  if is_num(c.ionic_strength) then parts[#parts + 1] = "I = " .. plot.number(c.ionic_strength) .. " mol/kg" end
  if type(c.activity_model) == "string" then parts[#parts + 1] = c.activity_model end
  local known = { T_C = true, P_bar = true, activity = true, total = true, ionic_strength = true,
                  activity_model = true, ligand = true, ligand_activity = true, ligand_total = true,
                  pH = true, E_V = true }
  local rest = {}
  for k in pairs(c) do if not known[k] then rest[#rest + 1] = k end end
  table.sort(rest)
  for _, k in ipairs(rest) do parts[#parts + 1] = other_condition(k, c[k]) end
  return #parts > 0 and table.concat(parts, ", ") or nil
end

-- Pieces of a word too long for a line (a checksum on a narrow figure),
-- cut at character boundaries, so nothing is cut off with an ellipsis.
local function split_long(word, width, size)
  if core.text_width(word, size) <= width then return { word } end
  local out, cur = {}, ""
  for ch in word:gmatch(utf8.charpattern) do
    if cur ~= "" and core.text_width(cur .. ch, size) > width then out[#out + 1] = cur; cur = "" end
    cur = cur .. ch
  end
  if cur ~= "" then out[#out + 1] = cur end
  return out
end

-- Break a line at spaces so it fits `width` points at the stamp size.
local function wrap(line, width, size)
  size = size or STAMP_SIZE
  if core.text_width(line, size) <= width then return { line } end
  local out, cur = {}, ""
  local words = {}
  for word in line:gmatch("%S+") do
    for _, piece in ipairs(split_long(word, width - core.text_width("  ", size), size)) do words[#words + 1] = piece end
  end
  for _, word in ipairs(words) do
    local try = cur == "" and word or (cur .. " " .. word)
    if cur ~= "" and core.text_width(try, size) > width then
      out[#out + 1] = cur
      cur = "  " .. word
    else
      cur = try
    end
  end
  if cur ~= "" then out[#out + 1] = cur end
  return out
end

-- An extra stamp line is a string, or { full = "...", short = "..." } (the
-- short form printed on small figures; false leaves it off them).
local function line_full(l) return type(l) == "table" and tostring(l.full or l[1] or "") or tostring(l) end
local function line_short(l)
  if type(l) ~= "table" then return tostring(l) end
  if l.short == false then return nil end
  return tostring(l.short or l.full or l[1] or "")
end

-- The unwrapped full stamp: conditions, program and checksums, extra lines, caution.
local function full_lines(conditions, extra, opts)
  opts = opts or {}
  local st = provenance.stamp(conditions, opts.from)
  local lines = {}
  local c = conditions_text(conditions)
  if c then lines[#lines + 1] = c end
  local prog = "program: " .. st.program .. " (" .. st.revision .. ")"
  if st.script and not opts.no_script then
    prog = prog .. "; script: " .. st.script.file .. " sha256=" .. st.script.sha256
  end
  lines[#lines + 1] = prog
  if st.data_scope then lines[#lines + 1] = "data files: " .. st.data_scope end
  for _, d in ipairs(st.data) do lines[#lines + 1] = "data: " .. d.file .. " sha256=" .. d.sha256 end
  for _, s in ipairs(extra or {}) do lines[#lines + 1] = line_full(s) end
  lines[#lines + 1] = plot.caution
  return lines, st
end

--- The stamp lines of a figure: conditions, program and checksums, extra
-- lines, the caution; wrapped to the figure width (points) at text scale
-- `opts.text` (default 1).
function plot.stamp_lines(conditions, extra, width, opts)
  opts = opts or {}
  local ts = opts.text or 1
  local out = {}
  for _, l in ipairs((full_lines(conditions, extra, opts))) do
    for _, w in ipairs(wrap(l, width - STAMP_MARGIN * ts, STAMP_SIZE * ts)) do out[#out + 1] = w end
  end
  return out
end

--- The short stamp: the conditions in brief, the extra lines' short forms,
-- and one line naming the program, the caution and where the rest is.
function plot.stamp_short(conditions, extra, width, opts)
  opts = opts or {}
  local ts = opts.text or 1
  local lines = {}
  local c = conditions_short(conditions)
  if c then lines[#lines + 1] = c end
  for _, s in ipairs(extra or {}) do
    local t = line_short(s)
    if t and t ~= "" then lines[#lines + 1] = t end
  end
  lines[#lines + 1] = ("phlox %s · what can form, not how fast · full provenance in the file's metadata")
    :format(core.version)
  local out = {}
  for _, l in ipairs(lines) do
    for _, w in ipairs(wrap(l, width - STAMP_MARGIN * ts, STAMP_SIZE * ts)) do out[#out + 1] = w end
  end
  return out
end

-- Text of the metadata: formula braces dropped.
local plain = provenance.plain

-- Print the stamp the options ask for and put the full provenance in the
-- file's metadata.  opts.stamp: "full" | "short" | false, or a list of
-- extra lines (older form: printed in the preset's mode); opts.notes: extra
-- lines.
-- `from`: the results drawn, whose own data files are stamped (default
-- opts.from).
local function apply_stamp(fig, opts, conditions, extra, title, w, look, from)
  from = from or opts.from
  local lines = {}
  for _, l in ipairs(extra or {}) do lines[#lines + 1] = l end
  if type(opts.stamp) == "table" then for _, l in ipairs(opts.stamp) do lines[#lines + 1] = l end end
  for _, l in ipairs(opts.notes or {}) do lines[#lines + 1] = l end
  local full = full_lines(conditions, lines, { from = from, no_script = opts.no_script })
  local desc = {}
  for i, l in ipairs(full) do desc[i] = plain(l) end
  fig:meta("Title", plain(title or "phlox figure"))
  fig:meta("Description", table.concat(desc, "\n"))
  fig:meta("Software", "phlox " .. core.version .. " (" .. core.revision .. ")")
  fig:meta("Disclaimer", plot.caution)
  local mode = opts.stamp
  if mode == nil or type(mode) == "table" then mode = look.stamp end
  local out = {}
  if mode == "full" then
    out = plot.stamp_lines(conditions, lines, w, { text = look.text, no_script = opts.no_script, from = from })
    -- a preset promises its panels' size: the full stamp goes below them
    if look.name then fig:stamp_below(true) end
  elseif mode == "short" then
    out = plot.stamp_short(conditions, lines, w, { text = look.text })
  end
  for _, l in ipairs(out) do fig:stamp(l) end
end

-- Geometry helpers ---------------------------------------------------------

local function shifted(ys, offset)
  if offset == 0 then return ys end
  local out = {}
  for i, v in ipairs(ys) do out[i] = v - offset end
  return out
end

-- Where labels go is the renderer's business (src/render/draw.c places
-- every label once and fig:layout() reports it); this module only says
-- what to draw.

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

local function draw_water(fig, panel, map, win, ref, style, labelled, look)
  if not (map.water and is_pH(map.x)) then return end
  local lines = {
    { map.water.o2, "O2/H2O" },
    { map.water.h2, "H2O/H2" },
  }
  for _, l in ipairs(lines) do
    local w = l[1]
    if w then
      local function E(x) return w.a + w.b * x - ref.offset end
      local xs, ys = { win.x0, win.x1 }, { E(win.x0), E(win.x1) }
      fig:line(panel, xs, ys, style.color, style.width, style.dash, style.legend)
      if labelled then   -- along the line, placed by the renderer
        fig:line_label(panel, xs, ys, l[2], true, SMALL_TEXT * look.text, style.color, WATER_LABEL_AT)
      end
    end
  end
end

local function draw_neutral(fig, panel, map, win, look)
  local n = map.neutral_pH
  if not (n and is_pH(map.x) and n > win.x0 and n < win.x1) then return end
  local xs, ys = { n, n }, { win.y0, win.y1 }
  fig:line(panel, xs, ys, palette.neutral, LINE_NEUTRAL * look.line, "dotted")
  local t = fmt_T(celsius(map))
  local label = ("neutral pH %.2f%s"):format(n, t and (" at " .. t) or "")
  fig:line_label(panel, xs, ys, label, false, SMALL_TEXT * look.text, palette.neutral, NEUTRAL_LABEL_AT,
                 ("pH %.2f"):format(n))
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
local function draw_map(fig, panel, map, opts, win, ref, look, fills)
  fills = fills or palette.map_fills(map)
  local outline = (map.boundaries == nil or #map.boundaries == 0) and LINE_BOUNDARY * look.line or 0
  for i, f in ipairs(map.fields) do
    local label = f.species
    if opts.labels == false or f.label == false then label = nil end
    fig:polygon(panel, f.x, shifted(f.y, ref.offset), fills.fills[i], palette.ink, outline, label)
  end
  if opts.domains then draw_domain_overlay(fig, panel, map, ref, opts.domains == true and "hatch" or opts.domains) end
  for _, b in ipairs(map.boundaries or {}) do
    fig:line(panel, b.x, shifted(b.y, ref.offset), palette.ink, LINE_BOUNDARY * look.line, "solid")
  end
  draw_neutral(fig, panel, map, win, look)
  draw_water(fig, panel, map, win, ref,
             { color = palette.water, width = LINE_WATER * look.line, dash = "dashed" }, true, look)
  return fills
end

local function finish(fig, opts, d)
  if opts.pages then fig:pages(true) end
  if opts.file then
    local ok, err = fig:save(opts.file, opts.dpi or d.dpi, opts.replace)
    if not ok then error("plot: " .. err, 3) end
  end
  return fig
end

--- The look of a figure from its options: size, text and line scales,
-- stamp mode.  opts.preset names one of plot.presets; width and height
-- override its size.
function plot.look(opts)
  opts = opts or {}
  local pr = { width = plot.defaults.width, height = plot.defaults.height, text = 1, line = 1, stamp = "full" }
  if opts.preset ~= nil then
    local p = plot.presets[opts.preset]
    if not p then
      local names = {}
      for k in pairs(plot.presets) do names[#names + 1] = k end
      table.sort(names)
      error(("plot: opts.preset '%s' is not one of %s"):format(tostring(opts.preset), table.concat(names, ", ")), 3)
    end
    pr = { width = p.width, height = p.height, text = p.text, line = p.line, stamp = p.stamp,
           fixed = p.fixed, name = opts.preset }
  end
  local st = opts.stamp
  if not (st == nil or st == false or st == "full" or st == "short" or type(st) == "table") then
    error("plot: opts.stamp must be \"full\", \"short\", false or a list of extra lines", 3)
  end
  local w, h = opts.width or pr.width, opts.height or pr.height
  if not (is_num(w) and is_num(h) and w >= 50 and h >= 50) then
    error("plot: opts.width and opts.height are in points (>= 50)", 3)
  end
  pr.width, pr.height = w, h
  return pr
end

local function new_figure(look, rows, cols)
  local fig = core.figure(look.width, look.height, rows or 1, cols or 1)
  fig:scale(look.text, look.line)
  return fig
end

-- A map's stamp lines (map.stamp), each with its short form when the map
-- has one (map.stamp_short[line]), appended to extra.
local function map_notes(extra, map)
  local short = map.stamp_short or {}
  for _, l in ipairs(map.stamp or {}) do
    extra[#extra + 1] = (type(l) == "string" and short[l]) and { full = l, short = short[l] } or l
  end
end

-- The stamp lines of the potential scale: the shift, and the electrode's
-- own note (temperature correction) when it has one.
local function add_reference(extra, ref)
  if ref.offset ~= 0 then
    extra[#extra + 1] = ("potential vs %s = E(SHE) − %s V"):format(ref.name, fmt_num(ref.offset))
  end
  if ref.text then extra[#extra + 1] = ref.text end
end

-- Options of the drawing functions (the one reader, src/lua/l_opts.c):
-- one line per key; plot.map's keys are shared by domains, grid and overlay.
local FIG_OPTS = {
  file = "string",                        -- .png, .svg or .pdf
  title = "string",
  width = { "number", 50, 20000 },        -- points (figure.c limits)
  height = { "number", 50, 20000 },
  dpi = { "number", 10, 2400 },           -- PNG only
  conditions = "table",                   -- stamped under the figure
  preset = "string",                      -- one of plot.presets (column, double, slide, page)
  stamp = "boolean/full|short/strings",   -- what the figure shows ("full", "short", false) or extra lines
  notes = "table",                        -- extra stamp lines (strings, or records of phlox notes)
  from = "table",                         -- the result(s) drawn: their own data files and caveats are stamped
  no_script = "boolean",                  -- leave the script's name off the stamp
  legend = "boolean",
  replace = "boolean",                    -- also replace a symbolic link or a read-only file
}
local MAP_OPTS = {
  labels = "boolean",                     -- field labels
  water = "boolean",                      -- water stability lines
  domains = "boolean/hatch|tint",         -- corrosion domains overlay
  reference = "table/string",             -- E axis against this electrode: a name (as phlox.to_she) or {name, offset}
  reference_at_25C = "boolean",           -- the electrode is kept at room temperature
}
local MULTI_OPTS = {
  cols = { "integer", 1, 64 },
  pages = "boolean",                      -- one page per map (PDF)
  shared = "boolean",                     -- one window for all maps
  shared_fills = "boolean",               -- one colour per species across maps
  labels_of = "integer/boolean",          -- overlay: whose labels are shown
  legend_label = "function",              -- function(map, i) -> legend text
  panel_title = "function",               -- function(map, i) -> panel title
  x = "table", y = "table",               -- axis overrides
}
local function opts_spec(fname, ...)
  local t = {}
  for _, part in ipairs { FIG_OPTS, ... } do for k, v in pairs(part) do t[k] = v end end
  plot.option_specs = plot.option_specs or {}
  plot.option_specs[fname] = t
  return t
end
local PLOT_MAP_OPTS = opts_spec("plot.map", MAP_OPTS)
local PLOT_DOMAINS_OPTS = opts_spec("plot.domains", MAP_OPTS)
local PLOT_GRID_OPTS = opts_spec("plot.grid", MAP_OPTS, MULTI_OPTS)
local PLOT_OVERLAY_OPTS = opts_spec("plot.overlay", MAP_OPTS, MULTI_OPTS)
local PLOT_CURVES_OPTS = opts_spec("plot.curves", { x = "table", y = "table" })
local function read_opts(fname, spec, opts)
  if opts == nil then return {} end
  return core.options(fname, spec, opts)
end

--- A predominance map as a figure.
-- opts: file (".png", ".svg", ".pdf"), preset ("column", "double",
-- "slide", "page"; see plot.presets), width, height (points), dpi,
-- reference = { name = "SCE", offset = 0.241 }, title, domains = "hatch" |
-- "tint" (overlay of corrosion domains), labels = false, stamp = "full" |
-- "short" | false (what the figure shows; the file's metadata always holds
-- the full provenance), notes (extra stamp lines).  Returns the
-- phlox.Figure and the fill table (fills, tiers).
function plot.map(map, opts)
  opts = read_opts("plot.map", PLOT_MAP_OPTS, opts)
  plot.check_map(map, "plot.map")
  if opts.domains ~= nil and opts.domains ~= false and opts.domains ~= true and opts.domains ~= "hatch" and opts.domains ~= "tint" then
    error("plot.map: opts.domains must be \"hatch\" or \"tint\"", 2)
  end
  local ref = reference(opts, map)
  local look = plot.look(opts)
  local fig = new_figure(look)
  local win = window_of(map, ref)
  fig:axes(1, win.x0, win.x1, win.y0, win.y1)
  local title = opts.title or plot.map_title(map)
  fig:titles(1, x_title(map), y_title(map, ref), title)
  local fills = draw_map(fig, 1, map, opts, win, ref, look)
  local extra = {}
  map_notes(extra, map)
  add_reference(extra, ref)
  if fills.conflicts > 0 then
    extra[#extra + 1] = ("note: %d pairs of neighbouring fields share a lightness tier"):format(fills.conflicts)
  end
  apply_stamp(fig, opts, map.conditions, extra, title, look.width, look, map)
  return finish(fig, opts, plot.defaults), fills
end

--- Corrosion domains (immunity, passivation, corrosion) as a figure of
-- their own, with the field boundaries thin on top, water lines, neutral
-- pH and a legend.  Uses map.domains, or derives them from the field kinds
-- (see plot.domains_of).  opts as plot.map.
function plot.domains(map, opts)
  opts = read_opts("plot.domains", PLOT_DOMAINS_OPTS, opts)
  plot.check_map(map, "plot.domains")
  local ref = reference(opts, map)
  local look = plot.look(opts)
  local fig = new_figure(look)
  local win = window_of(map, ref)
  fig:axes(1, win.x0, win.x1, win.y0, win.y1)
  local title = opts.title or (plot.map_title(map):gsub("^(.-H2O})", "%1 corrosion domains", 1))
  fig:titles(1, x_title(map), y_title(map, ref), title)
  local domains, derived = plot.domains_of(map)
  local present = {}
  for _, d in ipairs(domains) do
    fig:polygon(1, d.x, shifted(d.y, ref.offset), palette.domain[d.domain], palette.ink, 0)
    present[d.domain] = true
  end
  for _, b in ipairs(map.boundaries or {}) do
    fig:line(1, b.x, shifted(b.y, ref.offset), palette.ink, 0.5 * look.line, "solid")
  end
  if opts.labels ~= false then   -- species names, small, over the domains
    for _, f in ipairs(map.fields) do
      fig:polygon(1, f.x, shifted(f.y, ref.offset), { 1, 1, 1, 0 }, palette.ink, 0, f.species)
    end
  end
  draw_neutral(fig, 1, map, win, look)
  draw_water(fig, 1, map, win, ref, { color = palette.water, width = LINE_WATER * look.line, dash = "dashed" }, true, look)
  for _, name in ipairs(DOMAINS) do
    if present[name] then fig:legend_patch(1, name, palette.domain[name], palette.ink) end
  end
  fig:legend(1, opts.legend or "outside")
  local extra = {}
  map_notes(extra, map)
  if derived then
    extra[#extra + 1] = { full = "domains from field kinds: metal = immunity, metal sulfide = sulfide film, "
      .. "other solid = passivation, dissolved or gas = corrosion", short = "domains from field kinds" }
  end
  add_reference(extra, ref)
  apply_stamp(fig, opts, map.conditions, extra, title, look.width, look, map)
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
-- "outside" (default) | "top right" | ... | false, conditions, file,
-- preset, width, height, dpi, stamp = "full" | "short" | false (or a list
-- of extra lines), notes (extra stamp lines), from (the results drawn:
-- their own data files are stamped).
function plot.curves(series, opts)
  opts = read_opts("plot.curves", PLOT_CURVES_OPTS, opts)
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
  local look = plot.look(opts)
  local fig = new_figure(look)
  fig:axes(1, x0, x1, y0, y1, ox.log, oy.log)
  local function title_of(a, default)
    local n = axis_name(a.name or default)
    if a.unit and a.unit ~= "" then n = n .. " / " .. a.unit end
    return n
  end
  fig:titles(1, title_of(ox, "x"), title_of(oy, "y"), opts.title)
  for i, s in ipairs(series) do
    local st = palette.series_style(i)
    local color, dash, width = s.color or st.color, s.style or st.dash, (s.width or 1.2) * look.line
    local legend = s.label and legend_text(s.label, s.chem) or nil
    for k, r in ipairs(runs(s.x, s.y, ox.log, oy.log)) do
      fig:line(1, r[1], r[2], color, width, dash, k == 1 and opts.legend ~= false and legend or nil)
    end
  end
  if opts.legend ~= false then fig:legend(1, opts.legend or "outside") end
  apply_stamp(fig, opts, opts.conditions, nil, opts.title, look.width, look)
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
-- shared axis ranges.  opts: cols (default: one row up to three maps, then
-- about square; with a preset, fewer when the panels would be narrower
-- than plot.grid_min_panel points at its text scale, except on a slide's
-- fixed frame), panel_title =
-- function(map, i) -> string (default: plot.map_title), pages (PDF: one
-- page per panel; cols is then ignored), and the options of plot.map
-- (preset, reference, domains, labels, file, width, height, dpi, stamp,
-- notes).  Cells left over in the last row stay blank (no empty axes).
plot.grid_min_panel = 200   -- points (common practice for a readable map panel, no source)
local GRID_FOOT = 30          -- points added under a preset's grid for the stamp
function plot.grid(maps, opts)
  opts = read_opts("plot.grid", PLOT_GRID_OPTS, opts)
  if type(maps) ~= "table" or #maps == 0 then error("plot.grid: maps must be a non-empty list", 2) end
  for i, m in ipairs(maps) do plot.check_map(m, ("plot.grid: maps[%d]"):format(i)) end
  local ref = reference(opts, maps[1])
  local n = #maps
  local look = plot.look(opts)
  -- pages: one row whatever cols says, so the PDF has one page per map and
  -- no empty page (a cols that leaves cells empty would add blank pages)
  local cols = opts.cols or (n <= 3 and n or math.ceil(math.sqrt(n)))
  if not opts.cols and look.name and not look.fixed then
    local fit = math.max(1, math.floor(look.width / (plot.grid_min_panel * look.text)))
    cols = math.min(cols, fit)
  end
  if opts.pages then cols = n end
  cols = math.max(1, math.min(cols, n))
  local rows = math.ceil(n / cols)
  local w, h
  if look.name then   -- a preset: its width; panels keep its shape unless the frame is fixed
    w = opts.width or look.width
    h = opts.height or ((look.fixed or opts.pages) and look.height
                        or rows * (w / cols) * look.height / look.width + GRID_FOOT * look.text)
  else
    w = opts.width or (plot.defaults.width * (cols > 1 and not opts.pages and 0.75 * cols or 1))
    h = opts.height or (plot.defaults.height * (rows > 1 and not opts.pages and 0.75 * rows or 1))
  end
  look.width, look.height = w, h
  local fig = new_figure(look, rows, cols)
  fig:used(n)
  local win = opts.shared == false and nil or union_window(maps, ref)
  local temps = {}
  local shared = opts.shared_fills ~= false and plot.shared_fills(maps) or {}
  local title1
  for i, m in ipairs(maps) do
    local wi = win or window_of(m, ref)
    fig:axes(i, wi.x0, wi.x1, wi.y0, wi.y1)
    local title = opts.panel_title and opts.panel_title(m, i) or plot.map_title(m)
    title1 = title1 or title
    fig:titles(i, x_title(m), y_title(m, ref), title)
    draw_map(fig, i, m, opts, wi, ref, look, shared[i])
    temps[#temps + 1] = fmt_T(celsius(m)) or "?"
  end
  local cond = {}   -- only the conditions every panel shares; titles tell the rest
  for k, v in pairs(maps[1].conditions or {}) do
    local same = true
    for i = 2, #maps do same = same and (maps[i].conditions or {})[k] == v end
    if same then cond[k] = v end
  end
  local extra = { { full = "panels at " .. table.concat(temps, ", "), short = false } }
  if shared[1] and shared[1].conflicts > 0 then
    extra[#extra + 1] = ("note: %d pairs of neighbouring fields share a lightness tier"):format(shared[1].conflicts)
  end
  map_notes(extra, maps[1])
  add_reference(extra, ref)
  apply_stamp(fig, opts, cond, extra, title1, w, look, maps)
  return finish(fig, opts, plot.defaults)
end

--- The boundaries of several maps on one plot (temperatures, ligand
-- levels), each map in its own colour and dash, with a legend.  The field
-- labels of one map (opts.labels_of, default 1; false for none) are shown.
-- opts: legend_label = function(map, i) -> string (default: map.label or
-- the temperature), water = false to leave out water lines, title, and the
-- options of plot.map.
function plot.overlay(maps, opts)
  opts = read_opts("plot.overlay", PLOT_OVERLAY_OPTS, opts)
  if type(maps) ~= "table" or #maps == 0 then error("plot.overlay: maps must be a non-empty list", 2) end
  for i, m in ipairs(maps) do plot.check_map(m, ("plot.overlay: maps[%d]"):format(i)) end
  local ref = reference(opts, maps[1])
  local look = plot.look(opts)
  local fig = new_figure(look)
  local win = union_window(maps, ref)
  fig:axes(1, win.x0, win.x1, win.y0, win.y1)
  local m1 = maps[1]
  local cond = {}   -- only the conditions all maps share; the legend tells the rest
  for k, v in pairs(m1.conditions or {}) do
    local same = true
    for i = 2, #maps do same = same and (maps[i].conditions or {})[k] == v end
    if same then cond[k] = v end
  end
  local title = opts.title
  if not title then
    local lig = (m1.conditions or {}).ligand
    local head = m1.element and (lig and ("{%s}–{%s}–{H2O}"):format(m1.element, lig) or ("{%s}–{H2O}"):format(m1.element))
    local temps, seen = {}, {}
    for _, m in ipairs(maps) do
      local t = celsius(m)
      if t and not seen[t] then seen[t] = true; temps[#temps + 1] = t end
    end
    title = (head and (head .. ": ") or "") .. "boundaries" .. (#temps > 0 and (" at " .. fmt_Ts(temps)) or "")
    local fx = fixed_text(cond, m1)
    if fx then title = title .. ", " .. fx end
  end
  fig:titles(1, x_title(m1), y_title(m1, ref), title)
  local lab = opts.labels_of == nil and 1 or opts.labels_of
  if lab and maps[lab] then
    for _, f in ipairs(maps[lab].fields) do
      fig:polygon(1, f.x, shifted(f.y, ref.offset), { 1, 1, 1, 0 }, palette.ink, 0, f.species)
    end
  end
  draw_neutral(fig, 1, m1, win, look)
  local labels = {}
  for i, m in ipairs(maps) do
    local st = palette.series_style(i)
    local label = opts.legend_label and opts.legend_label(m, i) or m.label or fmt_T(celsius(m)) or ("map " .. i)
    labels[i] = label
    local first = true
    for _, b in ipairs(m.boundaries or {}) do
      fig:line(1, b.x, shifted(b.y, ref.offset), st.color, 1.1 * look.line, st.dash, first and label or nil)
      first = false
    end
    if first then   -- no boundaries: outline the fields instead
      for _, f in ipairs(m.fields) do
        local xs, ys = { table.unpack(f.x) }, { table.unpack(shifted(f.y, ref.offset)) }
        xs[#xs + 1], ys[#ys + 1] = xs[1], ys[1]
        fig:line(1, xs, ys, st.color, 1.1 * look.line, st.dash, first and label or nil)
        first = false
      end
    end
    if opts.water ~= false then
      draw_water(fig, 1, m, win, ref, { color = st.color, width = 0.6 * look.line, dash = "dashed" }, i == 1, look)
    end
  end
  fig:legend(1, opts.legend or "outside")
  local extra = { { full = "overlaid: " .. table.concat(labels, ", "), short = false } }
  map_notes(extra, m1)
  add_reference(extra, ref)
  apply_stamp(fig, opts, cond, extra, title, look.width, look, maps)
  return finish(fig, opts, plot.defaults)
end

return plot
