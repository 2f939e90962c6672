-- examples/chromium_groundwater.lua: chromium in groundwater across Eh.
--
--   phlox examples/chromium_groundwater.lua [OUTPUT-FOLDER]   (default: ./chromium-out)
--
-- Scenario (a setting of our own).  Groundwater below a former
-- metal-finishing site flows from an oxic recharge zone into a reducing
-- zone rich in organic matter.  Chromium leaked as chromate.  Where is
-- chromium mobile (dissolved chromate, Cr(VI)) and where does it settle as
-- Cr(III) oxide?  Where do the monitoring wells sit on the Cr-H2O map at
-- the aquifer's temperature?
--
-- What it does: the Cr-H2O potential-pH map at 12 C with its corrosion
-- domains; the groundwater (carbonate-buffered) speciated along an Eh
-- transect from +0.8 to -0.3 V at the aquifer's pH, a resumable sweep;
-- dissolved chromium and its Cr(VI) share against Eh; the monitoring wells
-- speciated and located on the map; SVG and PNG figures, CSV tables.
--
-- ILLUSTRATIVE VALUES, NOT SITE DATA: the aquifer temperature, the water's
-- carbonate and sodium, the chromium level, the pH and the wells' pH and Eh
-- are choices for the example, marked "illustrative" below.  Thermodynamic
-- values come from the library files, each with its source (phlox list Cr).
local phlox = require "phlox"
local plot = require "phlox.plot"
local export = require "phlox.export"
local sweep = require "phlox.sweep"
local common = dofile((arg[0]:match("^(.*)/") or ".") .. "/study_common.lua")

local o = common.output("chromium-out")

local T_C = 12                       -- C, a shallow aquifer (illustrative)
local CR_TOTAL = 2e-6                -- mol/kg, about 100 ug/L chromium (illustrative)
local DIC = 3e-3                     -- mol/kg dissolved inorganic carbon, as NaHCO3 (illustrative)
local PH = 7.2                       -- aquifer pH (illustrative)
local CR_ACTIVITY = 1e-6             -- dissolved Cr at a map boundary (common practice)
local WELLS = {                      -- monitoring wells: pH, Eh vs SHE (illustrative)
  { name = "MW-1 recharge", pH = 7.6, E = 0.70 },
  { name = "MW-2 plume core", pH = 7.2, E = 0.62 },
  { name = "MW-3 transition", pH = 7.0, E = 0.35 },
  { name = "MW-4 reducing zone", pH = 6.8, E = -0.15 },
}
local CR_VI = { ["CrO4^2-"] = true, ["HCrO4^-"] = true, ["Cr2O7^2-"] = true }

print("phlox " .. phlox.version .. ": chromium in groundwater across Eh (Cr-H2O)")
local lib = phlox.library { "Cr", "C", "Na" }

local map = phlox.map { library = lib, element = "Cr", T_C = T_C, activity = CR_ACTIVITY,
                        pH_range = { 4, 10 }, E_range = { -0.6, 1.2 } }
local STAMP = { "site values (temperature, water, wells) are illustrative choices, not site data" }
plot.map(map, { file = o.path("Cr-12C.svg"), stamp = STAMP })
o.wrote("Cr-12C.svg")

local function speciate(pH, E)
  return phlox.speciate { library = lib, T_C = T_C, pH = pH, E = E, activity_model = "davies",
                          totals = { Cr = CR_TOTAL, C = DIC, Na = DIC } }
end
-- Summed in a fixed (sorted) order: pairs() visits string keys in an order
-- that changes from run to run, and a floating-point sum in another order can
-- differ in its last digit, which would break byte-identical reruns.
local function cr_vi_share(r)
  local names, s = {}, 0
  for sp in pairs(r.elements.Cr.share) do if CR_VI[sp] then names[#names + 1] = sp end end
  table.sort(names)
  for _, sp in ipairs(names) do s = s + r.elements.Cr.share[sp] end
  return s
end

-- The Eh transect: a journaled sweep (rerun after a kill goes on from the journal).
local transect = sweep.product({ "E", sweep.linear(-0.3, 0.8, 45) })
local rows, failures = sweep.run(transect, function(p)
  local r, err = speciate(PH, p.E)
  if not r then return nil, err end
  return { E_V = p.E, dissolved_Cr = r.elements.Cr.dissolved, CrVI_share = cr_vi_share(r),
           provenance = r.provenance }
end, { journal = o.path("transect.journal"), label = "Eh transect" })
if #failures > 0 then error(("Eh %g V: %s"):format(failures[1].point.E, failures[1].message)) end
local xs, dis, vi = {}, {}, {}
for i, r in ipairs(rows) do xs[i], dis[i], vi[i] = r.E_V, r.dissolved_Cr, r.CrVI_share end
plot.curves({ { x = xs, y = dis, label = "dissolved Cr", chem = false } }, {
  file = o.path("Cr-dissolved-vs-Eh.svg"), title = ("Dissolved chromium against Eh, pH %g, %g °C"):format(PH, T_C),
  x = { name = "Eh", unit = "V vs SHE", min = -0.3, max = 0.8 },
  y = { name = "dissolved Cr", unit = "mol/kg", log = true },
  conditions = { T_C = T_C, pH = PH, Cr_mol_kg = CR_TOTAL, DIC_mol_kg = DIC }, stamp = STAMP,
  from = rows[1].provenance })
o.wrote("Cr-dissolved-vs-Eh.svg")
plot.curves({ { x = xs, y = vi, label = "Cr(VI) share of all Cr", chem = false } }, {
  file = o.path("Cr-VI-share-vs-Eh.png"), title = "Chromate share of the chromium",
  x = { name = "Eh", unit = "V vs SHE", min = -0.3, max = 0.8 }, y = { name = "share", min = 0, max = 1 },
  conditions = { T_C = T_C, pH = PH, Cr_mol_kg = CR_TOTAL, DIC_mol_kg = DIC }, stamp = STAMP,
  from = rows[1].provenance })
o.wrote("Cr-VI-share-vs-Eh.png")
export.csv(o.path("Eh-transect.csv"), rows, { columns = { "E_V", "dissolved_Cr", "CrVI_share" },
  conditions = { T_C = T_C, pH = PH, Cr_mol_kg = CR_TOTAL, DIC_mol_kg = DIC, activity_model = "Davies" },
  from = rows[1].provenance })
o.wrote("Eh-transect.csv")

-- Where Cr(VI) gives way to Cr(III): the first Eh from above where the
-- chromate share falls below one half.
local switch
for i = #rows, 2, -1 do
  if rows[i].CrVI_share >= 0.5 and rows[i - 1].CrVI_share < 0.5 then switch = (rows[i].E_V + rows[i - 1].E_V) / 2 end
end

-- The wells.
local wells, spec = {}, nil
for _, w in ipairs(WELLS) do
  local r, err = speciate(w.pH, w.E)
  if not r then error(w.name .. ": " .. err) end
  spec = r
  wells[#wells + 1] = { well = w.name, pH = w.pH, Eh_V = w.E, field = common.at(map, w.pH, w.E),
                        dissolved_Cr = r.elements.Cr.dissolved, CrVI_share = cr_vi_share(r) }
end
common.marked_domains(o, "Cr-domains-wells.svg", map, WELLS, STAMP)
export.csv(o.path("wells.csv"), wells, { columns = { "well", "pH", "Eh_V", "field", "dissolved_Cr", "CrVI_share" },
  conditions = { T_C = T_C, Cr_mol_kg = CR_TOTAL, DIC_mol_kg = DIC, activity_model = "Davies" }, from = spec })
o.wrote("wells.csv")
common.map_tables(o, "Cr-12C", { map }, function() return "Cr 12 C" end, { activity_Cr = CR_ACTIVITY })

print()
local names = {}
for _, f in ipairs(map.fields) do names[#names + 1] = f.species end
print(("Cr-H2O at %g C: fields %s"):format(T_C, table.concat(names, ", ")))
print(("Along the transect at pH %g: chromate gives way to Cr(III) oxide below Eh = %s V"):format(
  PH, switch and ("%.3f"):format(switch) or "(not within -0.3..0.8)"))
for k, w in ipairs(wells) do
  print(("  %d %-20s pH %.1f Eh %5.2f V -> %s; dissolved Cr %.2e mol/kg, %.0f %% as Cr(VI)"):format(
    k, w.well, w.pH, w.Eh_V, w.field, w.dissolved_Cr, 100 * w.CrVI_share))
end
common.finish(o, "aquifer temperature, water composition, chromium level, pH, the wells' pH and Eh")
