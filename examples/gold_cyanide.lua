-- examples/gold_cyanide.lua: gold in cyanide, a carbon-in-leach circuit and
-- its hot elution column.
--
--   phlox examples/gold_cyanide.lua [OUTPUT-FOLDER]   (default: ./gold-out)
--
-- Scenario (a setting of our own).  A carbon-in-leach (CIL) plant leaches a
-- free-milling gold ore in a train of agitated tanks with lime and sodium
-- cyanide; the loaded carbon is stripped in a hot caustic-cyanide elution
-- column.  At which potentials and pH can gold dissolve as Au(CN)2^- at the
-- plant's three cyanide set points, where does the free cyanide turn into
-- volatile HCN, and how do both move from the leach (25 C) to the elution
-- column (90 C)?
--
-- What it does: Au-CN-H2O potential-pH maps (cyanide held unoxidised, the
-- usual convention of leaching diagrams: cyanate left out) at 25 and 90 C
-- for three cyanide levels, one grid figure and the 25 C map with the tanks
-- marked on its domains; the Au(CN)2^-/Au equilibrium potential against pH
-- for every level and both temperatures, beside the O2/H2O line in air,
-- computed from the library's reactions; the share of free cyanide present
-- as HCN against pH; the tanks located on the map; SVG and PNG figures, CSV
-- tables and a JSON summary, each with its provenance.
--
-- ILLUSTRATIVE VALUES, NOT PLANT DATA: the cyanide set points, the gold in
-- solution, the temperatures, the tanks' pH and potential are choices for
-- the example, marked "illustrative" below.  Thermodynamic values come from
-- the library files, each with its source (phlox list Au; phlox list C).
--
-- Caution: a diagram shows which species can form, not how fast.  Gold
-- leaching is governed by oxygen transport and surface passivation; the
-- Au(III) field at the top of the maps rests on an order-of-magnitude
-- constant (CN.lua: Au(CN)4^-); HCN is volatile and toxic.
local phlox = require "phlox"
local plot = require "phlox.plot"
local export = require "phlox.export"
local provenance = require "phlox.provenance"
local common = dofile((arg[0]:match("^(.*)/") or ".") .. "/study_common.lua")

local o = common.output("gold-out")

local NACN_MOLAR_MASS = 49.007          -- g/mol NaCN (IUPAC standard atomic weights)
local CYANIDE = { 2e-3, 6e-3, 2e-2 }    -- mol/kg total cyanide, about 100, 300, 1000 mg/L NaCN (illustrative)
local T_LEACH, T_ELUTION = 25, 90       -- C: leach tanks and elution column (illustrative)
local AU_ACTIVITY = 5e-6                -- dissolved gold at a map boundary, about 1 mg/L (illustrative)
local P_O2 = 0.21                       -- bar, oxygen in air at 1 atm (common practice, no source)
local WINDOW = { pH = { 6, 14 }, E = { -1.0, 1.4 } }
local TANKS = {                         -- pH and platinum-electrode potential vs SHE (illustrative)
  { name = "Leach tank 1", pH = 10.8, E = 0.10 },
  { name = "CIL tank 6", pH = 10.3, E = 0.02 },
  { name = "Leach feed, lime short", pH = 8.8, E = 0.15 },
}
local STAMP = { "cyanide levels, gold in solution, temperatures and tanks are illustrative choices, not plant data" }
local CYANATE = { "OCN^-" }

print("phlox " .. phlox.version .. ": gold in cyanide, a carbon-in-leach circuit (Au-CN-H2O)")
local lib = phlox.library { "Au", "CN" }

-- 1. The maps: two temperatures x three cyanide levels.
local maps, by_key = {}, {}
for _, T_C in ipairs({ T_LEACH, T_ELUTION }) do
  for _, cn in ipairs(CYANIDE) do
    local m = phlox.map { library = lib, element = "Au", ligand = "CN", ligand_activity = cn, T_C = T_C,
                          activity = AU_ACTIVITY, exclude = CYANATE, pH_range = WINDOW.pH, E_range = WINDOW.E }
    m.label = ("%g C, a(CN) %g"):format(T_C, cn)
    maps[#maps + 1] = m
    by_key[m.label] = m
  end
end
local function key(m) return m.label end
plot.grid(maps, { file = o.path("Au-CN-maps.svg"), cols = 3, stamp = STAMP,
                  title = "{Au}–{CN}–{H2O}: 25 and 90 °C, three cyanide levels",
                  panel_title = function(m) return ("%g °C, a(CN) = %g"):format(m.conditions.T_C, m.conditions.ligand_activity) end })
o.wrote("Au-CN-maps.svg")
local main = by_key[("%g C, a(CN) %g"):format(T_LEACH, CYANIDE[2])]
plot.map(main, { file = o.path("Au-CN-25C.svg"), stamp = STAMP })
o.wrote("Au-CN-25C.svg")
common.marked_domains(o, "Au-CN-25C-tanks.png", main, TANKS, STAMP)
common.map_tables(o, "Au-CN", maps, key, { activity_Au = AU_ACTIVITY })

-- 2. Curves from the library's reactions.  In the window of the maps the
-- free cyanide is CN^- or HCN(aq) (pKa from the library at T); the gold
-- couple's Nernst equation with a(CN^-) = total x the CN^- share:
--   E = E0 + (RT ln10/F) [log a(Au(CN)2^-) - 2 log a(CN^-)]
-- (the same line the maps draw as the Au(s)/Au(CN)2^- boundary).
local AU_COUPLE = "Au(CN)2^- + e- = Au(s) + 2 CN^-"
local HCN_ACID = "HCN(aq) = CN^- + H^+"
local O2_COUPLE = "O2(g) + 4 H^+ + 4 e- = 2 H2O(l)"
local PH = {}
for i = 0, 80 do PH[#PH + 1] = 6 + i * 0.1 end
local constants, curve_rows, hcn_rows = {}, {}, {}
local gold_series, hcn_series = {}, {}
local style = { "solid", "dashed", "dotted" }
for ti, T_C in ipairs({ T_LEACH, T_ELUTION }) do
  local au = lib:reaction(AU_COUPLE, { T_C = T_C })
  local pKa = -lib:reaction(HCN_ACID, { T_C = T_C }).logK
  local o2 = lib:reaction(O2_COUPLE, { T_C = T_C })
  local slope = by_key[("%g C, a(CN) %g"):format(T_C, CYANIDE[1])].nernst_slope -- RT ln10/F at T (V)
  constants[#constants + 1] = { T_C = T_C, E0_Au_CN2_V = au.E, pKa_HCN = pKa, E0_O2_V = o2.E, nernst_slope_V = slope }
  local hx, hy = {}, {}
  for _, pH in ipairs(PH) do
    local share_hcn = 1 / (1 + 10 ^ (pH - pKa))
    hx[#hx + 1], hy[#hy + 1] = pH, share_hcn
    hcn_rows[#hcn_rows + 1] = { T_C = T_C, pH = pH, HCN_share = share_hcn }
  end
  hcn_series[#hcn_series + 1] = { x = hx, y = hy, label = ("%g °C (pKa %.2f)"):format(T_C, pKa), style = style[ti], chem = false }
  for ci, cn in ipairs(CYANIDE) do
    local ex, ey = {}, {}
    for _, pH in ipairs(PH) do
      local a_cn = cn / (1 + 10 ^ (pKa - pH))
      local E = au.E + slope * (math.log(AU_ACTIVITY, 10) - 2 * math.log(a_cn, 10))
      ex[#ex + 1], ey[#ey + 1] = pH, E
      curve_rows[#curve_rows + 1] = { T_C = T_C, cyanide_mol_kg = cn, pH = pH, E_Au_V = E,
                                      E_O2_air_V = o2.E - slope * pH + slope / 4 * math.log(P_O2, 10) }
    end
    gold_series[#gold_series + 1] = { x = ex, y = ey, style = style[ci], chem = false,
      label = ("%g °C, %g mol/kg CN"):format(T_C, cn), color = ti == 1 and { 0.05, 0.25, 0.6 } or { 0.7, 0.2, 0.1 } }
  end
  local ox, oy = {}, {}
  for _, pH in ipairs(PH) do ox[#ox + 1], oy[#oy + 1] = pH, o2.E - slope * pH + slope / 4 * math.log(P_O2, 10) end
  gold_series[#gold_series + 1] = { x = ox, y = oy, style = "dashdot", chem = false, color = { 0.35, 0.35, 0.35 },
                                    label = ("O2/H2O in air, %g °C"):format(T_C) }
end
local curve_prov = provenance.of_result(lib, { "Au", "C", "N" },
  { activity_Au = AU_ACTIVITY, P_O2_bar = P_O2 }, { exclude = CYANATE })
plot.curves(gold_series, { file = o.path("Au-dissolution-potential.svg"),
  title = "Gold dissolves above these potentials, a({Au(CN)2^-}) = 5e-6",
  x = { name = "pH", min = 6, max = 14 }, y = { name = "E", unit = "V vs SHE", min = -1.0, max = 1.0 },
  conditions = { activity_Au = AU_ACTIVITY, P_O2_bar = P_O2 }, stamp = STAMP, from = curve_prov })
o.wrote("Au-dissolution-potential.svg")
plot.curves(hcn_series, { file = o.path("HCN-share.svg"), title = "Free cyanide present as HCN(aq)",
  x = { name = "pH", min = 6, max = 14 }, y = { name = "HCN share", min = 0, max = 1 },
  stamp = STAMP, from = curve_prov })
o.wrote("HCN-share.svg")
export.csv(o.path("Au-dissolution-potential.csv"), curve_rows,
  { columns = { "T_C", "cyanide_mol_kg", "pH", "E_Au_V", "E_O2_air_V" },
    conditions = { activity_Au = AU_ACTIVITY, P_O2_bar = P_O2 }, from = curve_prov })
o.wrote("Au-dissolution-potential.csv")
export.csv(o.path("HCN-share.csv"), hcn_rows, { columns = { "T_C", "pH", "HCN_share" }, from = curve_prov })
o.wrote("HCN-share.csv")

-- 3. The tanks on the 25 C map at the middle cyanide level.
local tanks = {}
for k, t in ipairs(TANKS) do
  local c = constants[1]
  local a_cn = CYANIDE[2] / (1 + 10 ^ (c.pKa_HCN - t.pH))
  local E_au = c.E0_Au_CN2_V + c.nernst_slope_V * (math.log(AU_ACTIVITY, 10) - 2 * math.log(a_cn, 10))
  tanks[k] = { tank = t.name, pH = t.pH, E_V = t.E, field = common.at(main, t.pH, t.E),
               driving_force_V = t.E - E_au, HCN_share = 1 / (1 + 10 ^ (t.pH - c.pKa_HCN)) }
end
export.csv(o.path("tanks.csv"), tanks, { columns = { "tank", "pH", "E_V", "field", "driving_force_V", "HCN_share" },
  conditions = { T_C = T_LEACH, cyanide_mol_kg = CYANIDE[2], activity_Au = AU_ACTIVITY }, from = { main, curve_prov } })
o.wrote("tanks.csv")

-- 4. A JSON summary: constants at both temperatures, the fields of every map.
local fields = {}
for _, m in ipairs(maps) do
  local names = {}
  for _, f in ipairs(m.fields) do names[#names + 1] = f.species end
  fields[#fields + 1] = { map = m.label, T_C = m.conditions.T_C, cyanide = m.conditions.ligand_activity, fields = names }
end
export.json(o.path("summary.json"), { constants = constants, maps = fields, tanks = tanks },
  { conditions = { activity_Au = AU_ACTIVITY, cyanide_levels_mol_kg = CYANIDE }, from = { maps, curve_prov } })
o.wrote("summary.json")

print()
for _, c in ipairs(constants) do
  print(("%g C: E0(Au(CN)2^-/Au) = %.4f V, pKa(HCN) = %.2f"):format(c.T_C, c.E0_Au_CN2_V, c.pKa_HCN))
end
for _, f in ipairs(fields) do print(("%-22s fields %s"):format(f.map, table.concat(f.fields, ", "))) end
for _, cn in ipairs(CYANIDE) do
  print(("cyanide %g mol/kg (%.0f mg/L NaCN, illustrative)"):format(cn, cn * NACN_MOLAR_MASS * 1e3))
end
for k, t in ipairs(tanks) do
  print(("  %d %-36s pH %.1f E %5.2f V -> %s; %+.2f V above Au(CN)2^-/Au; %.0f %% of free cyanide as HCN"):format(
    k, t.tank, t.pH, t.E_V, t.field, t.driving_force_V, 100 * t.HCN_share))
end
common.finish(o, "cyanide set points, gold in solution, temperatures, the tanks' pH and potential")
