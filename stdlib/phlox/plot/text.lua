--- phlox.plot.text: the words and numbers printed on figures.
--
-- Part of phlox.plot (stdlib/phlox/plot.lua draws; this file formats).
-- Contract (pure functions of their arguments, no drawing):
--   text.number(v)            a number as typeset: 0.01, 25, 10⁻⁶,
--                             2.5 × 10⁻³, with a true minus (plot.number)
--   text.fmt_num(v)           a plain number: integers as such, else %.4g
--   text.formulas(list)       "{Fe^2+}, {FeOH^+}" (plot.formulas)
--   text.celsius(map)         the map's temperature in °C, or nil
--   text.pressure(map)        the map's pressure in bar, or nil
--   text.fmt_T(tc)            "25 °C", "37.5 °C" (nil for nil)
--   text.fmt_Ts(list)         "25 °C", "25 and 150 °C", "25, 90 and 150 °C"
--   text.axis_name(name, map) an axis name with its formula in chemical
--                             type; a ligand axis names the ligand's one
--                             species, else the total ("log a(ΣS)")
--   text.is_potential(axis), text.is_pH(axis)
--   text.reference(opts, map) the displayed potential scale {name, offset,
--                             text}: E_ref = E_SHE − offset; an electrode
--                             name is corrected to the map's temperature
--                             (phlox.electrode_at) or refused away from
--                             25 °C; misuse raised at the user's call
--                             (error level 3)
--   text.x_title(map), text.y_title(map, ref)
--   text.fixed_text(c, map)   what a map holds fixed: ligand total or
--                             activity, the element's total, pH, E
--   text.map_title(map)       "Fe–S–H₂O at 25 °C, a(ΣS) = 10⁻³" (plot.map_title)
local is_num = require("phlox.plot.check").is_num

local text = {}

local function fmt_num(v)
  if v == math.floor(v) and math.abs(v) < 1e6 then return ("%d"):format(v) end
  local s = ("%.4g"):format(v)
  return (s:gsub("e%-0*", "e-"):gsub("e%+0*", "e"))
end

local SUP = { ["0"] = "⁰", ["1"] = "¹", ["2"] = "²", ["3"] = "³", ["4"] = "⁴", ["5"] = "⁵",
              ["6"] = "⁶", ["7"] = "⁷", ["8"] = "⁸", ["9"] = "⁹", ["-"] = "⁻" }

--- A number as typeset on figures: 0.01, 25, 10⁻⁶, 2.5 × 10⁻³ (true minus).
function text.number(v)
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
function text.formulas(list)
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
    parts[#parts + 1] = sp and ("a({%s}) = %s"):format(sp, text.number(c.ligand_activity))
      or ("a(Σ{%s}) = %s"):format(c.ligand, text.number(c.ligand_activity))
  elseif c.ligand and is_num(c.ligand_total) then
    parts[#parts + 1] = ("{%s} %s mol/kg"):format(c.ligand, text.number(c.ligand_total))
  end
  if is_num(c.total) and map and map.element then   -- a rigorous map's total of the element
    parts[#parts + 1] = ("{%s} %s mol/kg"):format(map.element, text.number(c.total))
  end
  if is_num(c.pH) then parts[#parts + 1] = "pH " .. fmt_num(c.pH) end
  if is_num(c.E_V) then parts[#parts + 1] = ("E = %s V vs SHE"):format(text.number(c.E_V)) end
  return #parts > 0 and table.concat(parts, ", ") or nil
end

--- The default title of a map: "Fe–S–H₂O at 25 °C, a(ΣS) = 10⁻³" with the
-- pressure when it is not 1 bar and what the map holds fixed (the ligand's
-- total, a fixed pH or E).
function text.map_title(map)
  local t = fmt_T(celsius(map))
  local c = map.conditions or {}
  local lig = c.ligand
  local head = map.element and (lig and ("{%s}–{%s}–{H2O}"):format(map.element, lig)
                                or ("{%s}–{H2O}"):format(map.element)) or "map"
  local s = head .. (t and (" at " .. t) or "")
  local p = pressure(map)
  if p and math.abs(p - 1) > 1e-9 then s = s .. (", %s bar"):format(text.number(tonumber(("%.3g"):format(p)))) end
  local fx = fixed_text(c, map)
  if fx then s = s .. ", " .. fx end
  return s
end

text.fmt_num, text.celsius, text.pressure, text.fmt_T, text.fmt_Ts = fmt_num, celsius, pressure, fmt_T, fmt_Ts
text.axis_name, text.is_potential, text.is_pH = axis_name, is_potential, is_pH
text.reference, text.x_title, text.y_title, text.fixed_text = reference, x_title, y_title, fixed_text

return text
