-- examples/geothermal_steel.lua: carbon steel in a sour geothermal brine.
--
--   phlox examples/geothermal_steel.lua [OUTPUT-FOLDER]    (default: ./geothermal-out)
--
-- Scenario (a setting of our own).  A binary-cycle geothermal plant draws a
-- sodium chloride brine carrying hydrogen sulfide through carbon-steel
-- casing and surface piping: 250 C in the reservoir, 150 C at the heat
-- exchanger outlet before reinjection, 25 C in a cooled sample line.  Which
-- iron phases can form on the steel - iron sulfides (troilite, pyrite),
-- magnetite, hematite - and where does the brine sit on the Fe-S-H2O maps?
--
-- What it does: Fe-S-H2O potential-pH maps at the three temperatures, the
-- corrosion domains at 150 C, the boundaries at three sulfide levels at
-- 150 C, the brine speciated at each temperature and located on its map;
-- SVG and PNG figures, CSV tables of boundaries, fields and brine states.
--
-- ILLUSTRATIVE VALUES, NOT FIELD DATA: the brine composition (NaCl, total
-- sulfide, pH, hydrogen level) and the temperatures are choices for the
-- example, marked "illustrative" below.  Thermodynamic values come from the
-- library files, each with its source (phlox list Fe; phlox list S).
local phlox = require "phlox"
local plot = require "phlox.plot"
local export = require "phlox.export"
local plain = require("phlox.provenance").plain -- stamp lines as plain text
local common = dofile((arg[0]:match("^(.*)/") or ".") .. "/study_common.lua")

local o = common.output("geothermal-out")

local TEMPS = { 25, 150, 250 }          -- C: sample line, exchanger outlet, reservoir (illustrative)
local PLACE = { [25] = "cooled sample line", [150] = "exchanger outlet", [250] = "reservoir" }
local S_ACTIVITY = 1e-3                 -- activity of dissolved sulfide at the boundaries (illustrative, ~34 mg/L H2S)
local S_LEVELS = { 1e-5, 1e-3, 1e-1 }   -- sulfide levels compared at 150 C (illustrative)
local FE_ACTIVITY = 1e-6                -- dissolved Fe at a boundary: the corrosion convention (common practice)
local BRINE = { NaCl = 0.5, S = 1e-3, Fe = 1e-5, pH = 5.6, log_f_H2 = -2.5 }
                                        -- mol/kg, pH at temperature, log10 f(H2)/bar (illustrative)
local WINDOW = { pH = { 2, 12 }, E = { -1.2, 1.0 } }

print("phlox " .. phlox.version .. ": carbon steel in a sour geothermal brine (Fe-S-H2O)")
local lib = phlox.library { "Fe", "S", "Cl", "Na" }

local function fe_map(T_C, aS)
  local m = phlox.map { library = lib, element = "Fe", T_C = T_C, ligand = "S", ligand_activity = aS,
                        activity = FE_ACTIVITY, pH_range = WINDOW.pH, E_range = WINDOW.E }
  m.label = ("a(S) = %g"):format(aS)
  return m
end

local maps = {}
for i, T in ipairs(TEMPS) do maps[i] = fe_map(T, S_ACTIVITY) end
local STAMP = { "brine and sulfide levels are illustrative choices, not field data" }
for i, T in ipairs(TEMPS) do
  local name = ("Fe-S-%dC"):format(T)
  plot.map(maps[i], { file = o.path(name .. ".svg"), stamp = STAMP })
  o.wrote(name .. ".svg")
end
plot.map(maps[3], { file = o.path("Fe-S-250C.png"), stamp = STAMP })
o.wrote("Fe-S-250C.png")
plot.domains(maps[2], { file = o.path("Fe-S-domains-150C.svg"), stamp = STAMP })
o.wrote("Fe-S-domains-150C.svg")
local by_s = {}
for i, a in ipairs(S_LEVELS) do by_s[i] = fe_map(150, a) end
plot.overlay(by_s, { file = o.path("Fe-S-sulfide-150C.svg"), labels_of = 2, water = false,
                     title = "{Fe}–{S}–{H2O} at 150 °C: three sulfide levels", stamp = STAMP })
o.wrote("Fe-S-sulfide-150C.svg")

-- The brine at each temperature: speciated (B-dot activities, common
-- practice for NaCl brines), then located on its map.
local states, spec = {}, nil
for i, T in ipairs(TEMPS) do
  local r, err = phlox.speciate { library = lib, T_C = T, pH = BRINE.pH, redox_gas = "H2(g)",
    redox_log_f = BRINE.log_f_H2, activity_model = "bdot",
    totals = { Na = BRINE.NaCl, Cl = BRINE.NaCl, S = BRINE.S, Fe = BRINE.Fe } }
  if not r then error(("brine at %d C: %s"):format(T, err)) end
  spec = r
  local solid = "none"
  for _, s in ipairs(r.species) do
    if s.phase == "solid" and (s.amount or 0) > 0 and s.formula:find("Fe") then solid = s.formula end
  end
  local field = common.at(maps[i], r.pH, r.E)
  local f = nil
  for _, x in ipairs(maps[i].fields) do if x.species == field then f = x end end
  states[#states + 1] = { T_C = T, place = PLACE[T], pH = r.pH, E_V = r.E, ionic_strength = r.ionic_strength,
                          field = field, domain = f and common.DOMAIN_OF_KIND[f.kind] or "",
                          solid = solid, dissolved_Fe = r.elements.Fe.dissolved }
end

-- Tables: the three temperatures, plus the two other sulfide levels at 150 C.
local key = function(m) return ("%g C, a(S) %g"):format(m.conditions.T_C, m.conditions.ligand_activity) end
local all = { maps[1], maps[2], maps[3], by_s[1], by_s[3] }
common.map_tables(o, "Fe-S", all, key, { activity_Fe = FE_ACTIVITY })
export.csv(o.path("brine-states.csv"), states, {
  columns = { "T_C", "place", "pH", "E_V", "ionic_strength", "field", "domain", "solid", "dissolved_Fe" },
  conditions = { NaCl_mol_kg = BRINE.NaCl, S_mol_kg = BRINE.S, Fe_mol_kg = BRINE.Fe,
                 log_f_H2 = BRINE.log_f_H2, activity_model = "B-dot" },
  from = spec })
o.wrote("brine-states.csv")

print()
for i, s in ipairs(states) do
  local names = {}
  for _, f in ipairs(maps[i].fields) do names[#names + 1] = f.species end
  print(("%3d C (%s): fields %s"):format(s.T_C, s.place, table.concat(names, ", ")))
  print(("      brine pH %.2f, E %.3f V vs SHE -> %s (%s); solid formed: %s; dissolved Fe %.2e mol/kg")
    :format(s.pH, s.E_V, s.field, s.domain, s.solid, s.dissolved_Fe))
end
for _, m in ipairs(maps) do
  for _, line in ipairs(m.stamp or {}) do print(("%g C: %s"):format(m.conditions.T_C, plain(line))) end
end
common.finish(o, "brine composition, sulfide levels, pH, hydrogen level and temperatures")
