-- examples/lead_water_main.lua: lead pipe in a drinking-water main.
--
--   phlox examples/lead_water_main.lua [OUTPUT-FOLDER]   (default: ./lead-out)
--
-- Scenario (a setting of our own).  An old town district is still served
-- through lead service pipes.  The utility can raise the pH and the
-- dissolved inorganic carbon (DIC) of the water.  Which lead solids can form
-- on the pipe wall - cerussite, litharge, plattnerite (PbO2) under a
-- chlorine residual - and how much lead can the water hold in equilibrium
-- with them, against pH, for three DIC levels?
--
-- What it does: Pb-C-H2O potential-pH maps at 15 C for three carbonate
-- levels (one figure overlaying them); lead solubility against pH at three
-- DIC levels (closed system, Davies activities); the treated water
-- speciated and located on the map; SVG and PNG figures, CSV tables.
--
-- Phosphate: utilities also dose orthophosphate against lead.  The library
-- holds no lead phosphate solid or complex yet (docs/data/ligands.md), so
-- this study cannot show that effect and does not pretend to: with
-- phosphate, the dissolved lead can be lower than shown here.
--
-- ILLUSTRATIVE VALUES, NOT UTILITY DATA: temperature, DIC levels, pH range,
-- potential and the treated water are choices for the example, marked
-- "illustrative" below.  Thermodynamic values come from the library files,
-- each with its source (phlox list Pb; phlox list C).
local phlox = require "phlox"
local plot = require "phlox.plot"
local export = require "phlox.export"
local common = dofile((arg[0]:match("^(.*)/") or ".") .. "/study_common.lua")

local o = common.output("lead-out")

local T_C = 15                         -- C, water in a buried main (illustrative)
local DIC_LEVELS = { 5e-4, 2e-3, 5e-3 } -- mol/kg DIC, 6 to 60 mg C/L (illustrative)
local PB_ACTIVITY = 1e-7               -- dissolved lead at a map boundary, about 20 ug/L (illustrative)
local PB_PUT_IN = 1e-4                 -- mol/kg lead offered by the pipe for the curves (ample, illustrative)
local E_WATER = 0.45                   -- V vs SHE, water without a chlorine residual (illustrative)
local TREATED = { pH = 7.8, DIC = 2e-3, E = E_WATER } -- the treated water (illustrative)
local WINDOW = { pH = { 5, 11 }, E = { -0.8, 1.4 } }

print("phlox " .. phlox.version .. ": lead pipe in a drinking-water main (Pb-C-H2O)")
local lib = phlox.library { "Pb", "C", "Na" }

local maps = {}
for i, c in ipairs(DIC_LEVELS) do
  maps[i] = phlox.map { library = lib, element = "Pb", T_C = T_C, ligand = "C", ligand_activity = c,
                        activity = PB_ACTIVITY, pH_range = WINDOW.pH, E_range = WINDOW.E }
  maps[i].label = ("a(C) = %g"):format(c)
end
local STAMP = { "DIC levels, temperature and water are illustrative choices, not utility data",
                "no lead phosphate data in the library: orthophosphate dosing not shown" }
plot.map(maps[2], { file = o.path("Pb-C-15C.svg"), stamp = STAMP })
o.wrote("Pb-C-15C.svg")
plot.map(maps[2], { file = o.path("Pb-C-15C.png"), stamp = STAMP })
o.wrote("Pb-C-15C.png")
plot.overlay(maps, { file = o.path("Pb-C-DIC-levels.svg"), labels_of = 2, water = false,
                     title = "{Pb}–{C}–{H2O} at 15 °C: three carbonate levels", stamp = STAMP })
o.wrote("Pb-C-DIC-levels.svg")
common.map_tables(o, "Pb-C", maps, function(m) return ("a(C) %g"):format(m.conditions.ligand_activity) end,
                  { T_C = T_C, activity_Pb = PB_ACTIVITY })

-- Solubility against pH, one curve per DIC level (NaHCO3 as the carbonate).
local diagrams = require "phlox.diagrams"
local series, rows, curves = {}, {}, {}
for i, dic in ipairs(DIC_LEVELS) do
  local s = diagrams.solubility { library = lib, element = "Pb", T_C = { T_C }, range = { 6, 10.5 }, n = 46,
    total = PB_PUT_IN, totals = { C = dic, Na = dic }, E = E_WATER, activity_model = "davies" }
  local c = s.series[1]
  c.label = ("DIC %g mol/kg"):format(dic)
  c.style = ({ "solid", "dashed", "dotted" })[i]
  series[#series + 1] = c
  curves[#curves + 1] = s
  for k, pH in ipairs(s.x) do
    rows[#rows + 1] = { DIC = dic, pH = pH, dissolved_Pb = c.y[k] or nil, solids = c.solids[k] or "" }
  end
end
plot.curves(series, { file = o.path("Pb-solubility.svg"), title = "Lead in equilibrium with the pipe wall, 15 °C",
  x = { name = "pH", min = 6, max = 10.5 }, y = { name = "dissolved Pb", unit = "mol/kg", log = true },
  conditions = { T_C = T_C, E_V = E_WATER, Pb_offered_mol_kg = PB_PUT_IN }, stamp = STAMP, from = curves })
o.wrote("Pb-solubility.svg")
export.csv(o.path("Pb-solubility.csv"), rows, { columns = { "DIC", "pH", "dissolved_Pb", "solids" },
  conditions = { T_C = T_C, E_V = E_WATER, Pb_offered_mol_kg = PB_PUT_IN, activity_model = "Davies" },
  from = curves })
o.wrote("Pb-solubility.csv")

-- The treated water.
local r, err = phlox.speciate { library = lib, T_C = T_C, pH = TREATED.pH, E = TREATED.E, activity_model = "davies",
                                totals = { Pb = PB_PUT_IN, C = TREATED.DIC, Na = TREATED.DIC } }
if not r then error("treated water: " .. err) end
local solid = "none"
for _, s in ipairs(r.species) do
  if s.phase == "solid" and (s.amount or 0) > 0 then solid = s.formula end
end
local PB_MOLAR_MASS = 207.2            -- g/mol (IUPAC standard atomic weight)
local state = { { pH = TREATED.pH, E_V = TREATED.E, DIC = TREATED.DIC, field = common.at(maps[2], TREATED.pH, TREATED.E),
                  solid = solid, dissolved_Pb = r.elements.Pb.dissolved,
                  dissolved_Pb_ug_per_kg = r.elements.Pb.dissolved * PB_MOLAR_MASS * 1e6 } }
export.csv(o.path("treated-water.csv"), state, {
  columns = { "pH", "E_V", "DIC", "field", "solid", "dissolved_Pb", "dissolved_Pb_ug_per_kg" },
  conditions = { T_C = T_C, activity_model = "Davies" }, from = r })
o.wrote("treated-water.csv")

print()
for _, m in ipairs(maps) do
  local names = {}
  for _, f in ipairs(m.fields) do names[#names + 1] = f.species end
  print(("a(C) %-6g: fields %s"):format(m.conditions.ligand_activity, table.concat(names, ", ")))
end
for _, c in ipairs(series) do
  local lo, at = math.huge, nil
  for k, y in ipairs(c.y) do if y and y < lo then lo, at = y, c.x[k] end end
  print(("%s: least dissolved lead %.2e mol/kg (%.1f ug/kg) at pH %.1f"):format(c.label, lo, lo * PB_MOLAR_MASS * 1e6, at))
end
local s = state[1]
print(("Treated water pH %.1f, DIC %g: %s on the map, solid %s, dissolved Pb %.1f ug/kg"):format(
  s.pH, s.DIC, s.field, s.solid, s.dissolved_Pb_ug_per_kg))
print("Phosphate: not modelled (no lead phosphate data in the library); orthophosphate dosing can lower these values.")
common.finish(o, "temperature, DIC levels, potential, the treated water's pH and DIC")
