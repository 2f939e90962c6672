-- examples/ammonia_leach.lua: nickel and cobalt in an ammoniacal leach.
--
--   phlox examples/ammonia_leach.lua [OUTPUT-FOLDER [WORKERS]]   (default: ./leach-out, 1)
--
-- Scenario (a setting of our own).  A pilot circuit leaches a reduced
-- nickel-cobalt ore with an ammonia-ammonium solution under air at 25 to
-- 50 C.  Where do the nickel and cobalt ammines predominate against the
-- metals, their oxides and hydroxides, and how does that change with the
-- ammonia level?  How are the dissolved metals shared among their ammines
-- across the pH of the leach?
--
-- What it does: Ni-N-H2O and Co-N-H2O potential-pH maps at two
-- temperatures and three ammonia levels, run as a resumable sweep (a
-- journal in the output folder: kill the study and run it again, it goes
-- on where it stopped; WORKERS > 1 uses several processes); a panel figure
-- of both metals; distribution curves of Ni and Co among their species
-- against pH; SVG and PNG figures, CSV tables.
--
-- ILLUSTRATIVE VALUES, NOT PLANT DATA: temperatures, ammonia levels, metal
-- concentrations and the leach pH range are choices for the example,
-- marked "illustrative" below.  Thermodynamic values come from the library
-- files, each with its source (phlox list Ni; phlox list Co; phlox list N).
local phlox = require "phlox"
local plot = require "phlox.plot"
local export = require "phlox.export"
local sweep = require "phlox.sweep"
local common = dofile((arg[0]:match("^(.*)/") or ".") .. "/study_common.lua")

local o = common.output("leach-out")
local WORKERS = math.tointeger(tonumber(arg[2] or "1")) or 1

local METALS = { "Ni", "Co" }
local TEMPS = { 25, 50 }                    -- C (illustrative)
local NH3_LEVELS = { 0.01, 0.3, 3 }         -- activity of total ammonia N at the boundaries (illustrative)
local METAL_ACTIVITY = 1e-2                 -- dissolved metal at a boundary: a leach liquor, not the
                                            -- 1e-6 corrosion convention (illustrative)
local N_TOTAL = 3.0                         -- mol/kg ammonia + ammonium for the curves (illustrative)
local METAL_TOTAL = 1e-3                    -- mol/kg Ni or Co for the curves (illustrative)
-- Nitrogen is held in its -3 state: nitrate, nitrite and N2 would form at
-- equilibrium but the reactions are slow in a leach (common practice, no source).
local N_OXIDISED = { "N2(g)", "N2(aq)", "NO3^-", "NO2^-", "HNO2(aq)", "NO(g)" }
local WINDOW = { pH = { 4, 13 }, E = { -1.0, 1.2 } }

print("phlox " .. phlox.version .. ": nickel and cobalt in an ammoniacal leach (Ni-N-H2O, Co-N-H2O)")
local libs = { Ni = phlox.library { "Ni", "N" }, Co = phlox.library { "Co", "N" } }

-- The maps: a sweep of metal x temperature x ammonia level, one SVG each.
local points = sweep.product({ "metal", METALS }, { "T_C", TEMPS }, { "nh3", NH3_LEVELS })
local function map_of(p)
  local m = phlox.map { library = libs[p.metal], element = p.metal, T_C = p.T_C, ligand = "N",
    ligand_activity = p.nh3, activity = METAL_ACTIVITY, exclude = N_OXIDISED,
    pH_range = WINDOW.pH, E_range = WINDOW.E }
  m.label = ("%g °C, a(N) %g"):format(p.T_C, p.nh3)
  return m
end
local STAMP = { "temperatures, ammonia and metal levels are illustrative choices, not plant data",
                "nitrogen held at -3 (nitrate, nitrite, N2 left out: slow)" }
local results, failures = sweep.parallel(points, function(p)
  local m = map_of(p)
  local name = ("%s-N-%dC-a%g.svg"):format(p.metal, p.T_C, p.nh3)
  plot.map(m, { file = o.path(name), stamp = STAMP })
  local ammines, area = {}, 0
  for _, f in ipairs(m.fields) do
    if f.species:find("NH3", 1, true) then ammines[#ammines + 1] = f.species; area = area + f.area end
  end
  return { metal = p.metal, T_C = p.T_C, a_N = p.nh3, file = name, fields = #m.fields,
           ammine_fields = table.concat(ammines, " "), ammine_share_percent = 100 * area / ((WINDOW.pH[2] - WINDOW.pH[1]) * (WINDOW.E[2] - WINDOW.E[1])),
           provenance = m.provenance }
end, { workers = WORKERS, journal = o.path("maps.journal"), label = "leach maps" })
if #failures > 0 then error(("map %d: %s"):format(failures[1].index, failures[1].message)) end
for _, r in ipairs(results) do o.wrote(r.file) end
local from = {}
for k, r in ipairs(results) do from[k] = r.provenance end
export.csv(o.path("maps.csv"), results, {
  columns = { "metal", "T_C", "a_N", "fields", "ammine_fields", "ammine_share_percent", "file" },
  conditions = { metal_activity = METAL_ACTIVITY }, from = from })
o.wrote("maps.csv")

-- Both metals at 50 C and the middle ammonia level, side by side, and their tables.
local pair = { map_of { metal = "Ni", T_C = 50, nh3 = NH3_LEVELS[2] }, map_of { metal = "Co", T_C = 50, nh3 = NH3_LEVELS[2] } }
plot.grid(pair, { file = o.path("Ni-Co-50C.png"), cols = 2, stamp = STAMP,
                  panel_title = function(m) return ("{%s}–{N}–{H2O}, 50 °C"):format(m.element) end })
o.wrote("Ni-Co-50C.png")
common.map_tables(o, "Ni-Co-50C", pair, function(m) return m.element end, { metal_activity = METAL_ACTIVITY })

-- Distribution among the ammines against pH (no solids: the liquor).
local rows, curves = {}, {}
for _, el in ipairs(METALS) do
  local fr = phlox.fractions { library = libs[el], element = el, T_C = 25, x = "pH", range = { 6, 12 }, n = 61,
    total = METAL_TOTAL, totals = { N = N_TOTAL }, exclude = N_OXIDISED, E = 0.0 }
  local name = el .. "-ammines-25C.svg"
  require("phlox.diagrams").plot(fr, { file = o.path(name), stamp = { STAMP[1] } })
  o.wrote(name)
  for _, s in ipairs(fr.series) do
    local top, at = 0, nil
    for i, y in ipairs(s.y) do if y and y > top then top, at = y, fr.x[i] end end
    rows[#rows + 1] = { metal = el, species = s.species, max_share = top, at_pH = at }
  end
  curves[#curves + 1] = fr
end
export.csv(o.path("ammine-shares.csv"), rows, { columns = { "metal", "species", "max_share", "at_pH" },
  conditions = { T_C = 25, N_total_mol_kg = N_TOTAL, metal_total_mol_kg = METAL_TOTAL, E_V = 0.0 },
  from = curves })
o.wrote("ammine-shares.csv")

print()
for _, r in ipairs(results) do
  print(("%s %2d C a(N) %-5g: %d fields, ammines over %4.1f %% of the window: %s"):format(
    r.metal, r.T_C, r.a_N, r.fields, r.ammine_share_percent, r.ammine_fields))
end
for _, r in ipairs(rows) do
  print(("%s: %s reaches %.0f %% of the dissolved metal at pH %.1f (25 C)"):format(r.metal, r.species, 100 * r.max_share, r.at_pH))
end
common.finish(o, "temperatures, ammonia levels, metal concentrations, potential of the curves")
