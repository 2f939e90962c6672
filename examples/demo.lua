-- examples/demo.lua: a complete phlox study, run by the README's set-up line.
--
--   phlox examples/demo.lua [OUTPUT-FOLDER]        (default: ./demo-out)
--
-- Scenario.  Copper heat-exchanger tubes in a district-heating network.  The
-- loop is topped up with make-up water that carries chloride.  Where do
-- copper metal, cuprite (Cu2O), tenorite (CuO), the copper ions and the
-- chloro complexes predominate at 25 C (cold make-up water), 90 C (supply
-- line) and 150 C (a pressurised primary circuit)?  Where do two operating
-- states of the water sit on those maps, and how much copper can the water
-- hold in solution as it heats up?
--
-- What the study does, in order:
--   1. loads the Cu, Cl and Na definition files of the standard library;
--   2. speciates the loop water (NaCl with a little NaOH) at each temperature,
--      air-saturated and deaerated, with phlox.speciate: pH at temperature,
--      potential, dissolved copper and the species that carry it;
--   3. maps Cu with chloride at 25, 90 and 150 C (exact potential-pH maps),
--      and locates the operating points on them;
--   4. draws the maps (PNG, SVG), a three-panel figure (PNG) and a PDF with
--      one page per temperature, the corrosion domains at 90 C with the
--      operating points marked, the boundaries at three chloride levels, and
--      dissolved copper against temperature (a sweep);
--   5. exports the boundary reactions with their line equations, the field
--      areas per temperature, the operating points and the sweep (CSV), and
--      the whole study (JSON), each with its provenance stamp;
--   6. prints a short summary and the safety caution.
--
-- ILLUSTRATIVE CHOICES, NOT DATA.  The numbers of the scenario marked
-- "illustrative" below (chloride level, alkalisation, oxygen and hydrogen
-- levels, temperatures) were chosen to make a readable example; they are not
-- measurements of any plant.  The thermodynamic values come from the
-- standard library files, each with its source (phlox list Cu).
local phlox = require "phlox"
local plot = require "phlox.plot"
local export = require "phlox.export"
local sweep = require "phlox.sweep"

local OUT = (arg and arg[1]) or "demo-out"
phlox.make_dir(OUT) -- no shell: any folder name is only a name
local function path(name) return OUT .. "/" .. name end

-- The scenario ---------------------------------------------------------------

local TEMPS = { 25, 90, 150 }        -- C: make-up, supply, primary circuit (illustrative)
local PLACES = { [25] = "make-up water", [90] = "supply line", [150] = "primary circuit" }
local CL = 1e-2                      -- mol/kg chloride, about 350 mg/L (illustrative)
local CL_LEVELS = { 1e-3, 1e-2, 1e-1 } -- chloride levels compared at 90 C (illustrative)
local NAOH = 1e-4                    -- mol/kg NaOH over the NaCl: alkalised water (illustrative)
local CU_TOTAL = 1e-5                -- mol/kg copper offered by the tube wall; what cannot
                                     -- dissolve stays solid (illustrative; ample, since
                                     -- the dissolved copper stays below 1e-6 mol/kg)
local SI_TOL = 1e-6                  -- a solid with SI above this is supersaturated: the
                                     -- result is not an equilibrium and the study stops
local CU_ACTIVITY = 1e-6             -- activity of dissolved Cu species at a map boundary
                                     -- (the usual corrosion convention; common practice)
local REDOX = {                      -- two states of the loop water
  { key = "aerated", label = "air-saturated", gas = "O2(g)", log_f = -0.67,
    why = "O2 of air at 1 atm, 0.21 bar" },
  { key = "deaerated", label = "deaerated", gas = "H2(g)", log_f = -4,
    why = "a trace of hydrogen, 1e-4 bar (illustrative)" },
}
-- Chloride is treated as conservative: its oxidation to hypochlorite,
-- chlorate or perchlorate is left out of the maps (those fields would appear
-- at high potential at equilibrium, but the reactions are slow in water;
-- common practice, no source).
local CL_OXIDISED = { "Cl2(g)", "Cl2(aq)", "HClO(aq)", "ClO^-", "HClO2(aq)", "ClO2^-",
                      "ClO3^-", "ClO4^-" }
local WINDOW = { pH = { 0, 14 }, E = { -1.2, 1.6 } }

print(("phlox %s: copper tubing in a district-heating loop with chloride in the make-up water")
  :format(phlox.version))
print("Scenario values marked 'illustrative' in examples/demo.lua are choices for the example, not data.")

local lib = phlox.library { "Cu", "Cl", "Na" }

-- Small helpers --------------------------------------------------------------

local function zero(v) if v == 0 then return 0.0 end return v end   -- no "-0.0" in tables

local DOMAIN_OF_KIND = { metal = "immunity", solid = "passivation", liquid = "passivation",
                         aqueous = "corrosion", gas = "corrosion" }

local function field_of(map, species)
  for _, f in ipairs(map.fields) do if f.species == species then return f end end
end

local function window_area(map) return (map.x.max - map.x.min) * (map.y.max - map.y.min) end

-- The dissolved species carrying most of an element, and its share.
local function main_carrier(result, element)
  local best, share
  for sp, s in pairs(result.elements[element].share) do
    local rec = lib:species(sp)
    if rec and rec.state == "aq" and (not share or s > share or (s == share and sp < best)) then
      best, share = sp, s
    end
  end
  return best, share
end

local function solid_present(result, element)
  local best, amount
  for _, s in ipairs(result.species) do
    if s.phase == "solid" and (s.amount or 0) > 0 and lib:species(s.formula).elements[element] then
      if not amount or s.amount > amount then best, amount = s.formula, s.amount end
    end
  end
  return best
end

-- 1. The loop water at temperature (speciation) --------------------------------

-- Every result is checked before use: no solid may be supersaturated, and
-- some copper solid must remain (the water is in equilibrium with the wall).
local speciation_provenance   -- the files, conditions and options of the speciations
local function speciate(T_C, redox, cl)
  local r, err = phlox.speciate {
    library = lib, T_C = T_C,
    totals = { Na = cl + NAOH, Cl = cl, Cu = CU_TOTAL },
    redox_gas = redox.gas, redox_log_f = redox.log_f,
    activity_model = "davies",
  }
  if not r then return nil, err end
  speciation_provenance = r.provenance
  for _, s in ipairs(r.species) do
    if s.phase == "solid" and s.si > SI_TOL then
      return nil, ("%s is supersaturated (SI %.3g) at %g C, %s, Cl %g: not an equilibrium")
        :format(s.formula, s.si, T_C, redox.label, cl)
    end
  end
  if not solid_present(r, "Cu") then
    return nil, ("no copper solid left at %g C, %s, Cl %g: raise CU_TOTAL"):format(T_C, redox.label, cl)
  end
  return r
end

local points = {}   -- operating points: one per temperature and redox state
for _, T in ipairs(TEMPS) do
  for _, redox in ipairs(REDOX) do
    local r, err = speciate(T, redox, CL)
    if not r then error(("speciation at %g C, %s: %s"):format(T, redox.label, err)) end
    local carrier, share = main_carrier(r, "Cu")
    points[#points + 1] = {
      T_C = T + 0.0, state = redox.key, pH = r.pH, E_V = r.E, ionic_strength = r.ionic_strength,
      dissolved_Cu = r.elements.Cu.dissolved, carrier = carrier,
      carrier_share_of_dissolved = share * r.elements.Cu.total / r.elements.Cu.dissolved,
      solid = solid_present(r, "Cu"), a_Cl = nil,
    }
    for _, s in ipairs(r.species) do
      if s.formula == "Cl^-" then points[#points].a_Cl = 10 ^ s.log_activity end
    end
  end
end

-- 2. The maps ---------------------------------------------------------------

local function cu_map(T_C, cl)
  local m = phlox.map {
    library = lib, element = "Cu", T_C = T_C, ligand = "Cl", ligand_activity = cl,
    activity = CU_ACTIVITY, exclude = CL_OXIDISED,
    pH_range = WINDOW.pH, E_range = WINDOW.E,
  }
  m.label = ("a(Cl⁻) = %g"):format(cl)
  return m
end

local maps = {}
for i, T in ipairs(TEMPS) do maps[i] = cu_map(T, CL) end

-- Where each operating point sits.
for _, p in ipairs(points) do
  for i, T in ipairs(TEMPS) do
    if T == p.T_C then
      local sp, f = phlox.locate(maps[i], p.pH, p.E_V)
      p.field = sp or "outside the window"
      p.domain = f and DOMAIN_OF_KIND[f.kind] or ""
    end
  end
end

-- Copper species whose temperature dependence is not measured: estimated by a
-- named method (docs/thermo.md, "Temperature estimates"), read from each
-- record's temperature basis.  Checked on every copper species of the
-- library, shown or not: an estimated species can gain or lose a field
-- through its estimate alone.
local estimated_list = {}
for _, rec in ipairs(lib:list("Cu")) do
  if rec.basis == "estimated" then
    estimated_list[#estimated_list + 1] = rec.formula .. " (" .. rec.basis_method .. ")"
  end
end
table.sort(estimated_list)

-- 3. Figures ------------------------------------------------------------------

local written = {}
local function wrote(name) written[#written + 1] = name end

local STAMP = { "scenario values (chloride, temperatures) are illustrative choices, not plant data",
                "chloride oxidation ({ClO^-}, {ClO3^-}, {ClO4^-}, {Cl2}) left out: slow in water" }

for i, T in ipairs(TEMPS) do
  for _, ext in ipairs({ "png", "svg" }) do
    local name = ("Cu-Cl-%dC.%s"):format(T, ext)
    plot.map(maps[i], { file = path(name), stamp = STAMP })
    wrote(name)
  end
end

local function panel_title(m)
  local t = ("{Cu}–{Cl}–{H2O}, %d °C"):format(m.conditions.T_C)
  if m.conditions.P_bar > 1.0001 then t = t .. (", %.2f bar"):format(m.conditions.P_bar) end
  return t
end
plot.grid(maps, { file = path("Cu-Cl-panels.png"), cols = 3, panel_title = panel_title, stamp = STAMP })
wrote("Cu-Cl-panels.png")
plot.grid(maps, { file = path("Cu-Cl-pages.pdf"), pages = true, panel_title = panel_title, stamp = STAMP })
wrote("Cu-Cl-pages.pdf")

-- Corrosion domains at the supply temperature, with the operating points.
local SUPPLY = 2                           -- index of 90 C in TEMPS
local dom_stamp = { STAMP[1] }
local marks = {}
for _, p in ipairs(points) do
  if p.T_C == TEMPS[SUPPLY] then marks[#marks + 1] = p end
end
for k, p in ipairs(marks) do
  dom_stamp[#dom_stamp + 1] = ("%s: loop water %s, pH %.2f, E %.3f V vs SHE (speciated)")
    :format(string.char(64 + k), p.state, p.pH, p.E_V)
end
for _, ext in ipairs({ "png", "svg" }) do
  local name = ("Cu-domains-%dC.%s"):format(TEMPS[SUPPLY], ext)
  local fig = plot.domains(maps[SUPPLY], { stamp = dom_stamp })
  local dx, dy = 0.16, 0.045            -- half-size of the cross, pH units and V
  for k, p in ipairs(marks) do
    fig:line(1, { p.pH - dx, p.pH + dx }, { p.E_V - dy, p.E_V + dy }, { 0, 0, 0 }, 1.4, "solid")
    fig:line(1, { p.pH - dx, p.pH + dx }, { p.E_V + dy, p.E_V - dy }, { 0, 0, 0 }, 1.4, "solid")
    fig:text(1, p.pH + 0.25, p.E_V - 0.12, string.char(64 + k), false, 10, { 0, 0, 0 })
  end
  local ok, err = fig:save(path(name), plot.defaults.dpi)
  if not ok then error(err) end
  wrote(name)
end

-- How the boundaries move with chloride, at the supply temperature.
local by_cl = {}
for i, cl in ipairs(CL_LEVELS) do by_cl[i] = cu_map(TEMPS[SUPPLY], cl) end
for _, ext in ipairs({ "png", "svg" }) do
  local name = ("Cu-chloride-%dC.%s"):format(TEMPS[SUPPLY], ext)
  plot.overlay(by_cl, {
    file = path(name), labels_of = 3, water = false,
    title = ("{Cu}–{Cl}–{H2O} at %d °C: three chloride levels"):format(TEMPS[SUPPLY]),
    stamp = { STAMP[1], "field labels: a(Cl⁻) = 0.1" },
  })
  wrote(name)
end

-- 4. Dissolved copper against temperature (a sweep) ---------------------------

local T_SWEEP = sweep.linear(25, 150, 26)
local cases = sweep.product({ "state", { 1, 2 } }, { "cl", CL_LEVELS }, { "T_C", T_SWEEP })
local results, failures = sweep.run(cases, function(c)
  local r, err = speciate(c.T_C, REDOX[c.state], c.cl)
  if not r then return nil, err end
  return { T_C = c.T_C, state = REDOX[c.state].key, Cl = c.cl, pH = r.pH,
           dissolved_Cu = r.elements.Cu.dissolved }
end, { label = "dissolved copper" })
if #failures > 0 then
  for _, f in ipairs(failures) do io.stderr:write("sweep point ", f.index, ": ", f.message, "\n") end
  error(("%d of %d speciations failed"):format(#failures, #cases))
end

local series = {}
for s, redox in ipairs(REDOX) do
  for _, cl in ipairs(CL_LEVELS) do
    local xs, ys = {}, {}
    for _, r in ipairs(results) do
      if r.state == redox.key and r.Cl == cl then xs[#xs + 1], ys[#ys + 1] = r.T_C, r.dissolved_Cu end
    end
    series[#series + 1] = { x = xs, y = ys, label = ("%s, Cl %g"):format(redox.key, cl),
                            style = ({ "solid", "dashed" })[s] }
  end
end
for _, ext in ipairs({ "png", "svg" }) do
  local name = "Cu-dissolved." .. ext
  plot.curves(series, {
    file = path(name), title = "Dissolved copper in equilibrium with the tube wall",
    x = { name = "T", unit = "°C", min = 25, max = 150 },
    y = { name = "dissolved Cu", unit = "mol/kg", log = true },
    conditions = { NaOH_mol_kg = NAOH, Cu_offered_mol_kg = CU_TOTAL, activity_model = "Davies" },
    from = speciation_provenance,
    stamp = { STAMP[1], "Cl: total chloride, mol/kg (NaCl)",
              "aerated: " .. REDOX[1].why .. "; deaerated: " .. REDOX[2].why },
  })
  wrote(name)
end

-- 5. Tables -------------------------------------------------------------------

local boundary_rows, field_rows = {}, {}
for _, m in ipairs(maps) do
  local T = m.conditions.T_C
  for _, b in ipairs(m.boundaries) do
    local line
    if b.line.vertical then
      line = ("pH = %.3f"):format(b.line.a)
    elseif b.line.b == 0 then
      line = ("E = %.4f"):format(b.line.a)
    else
      line = ("E = %.4f %s %.4f pH"):format(b.line.a, b.line.b < 0 and "-" or "+", math.abs(b.line.b))
    end
    boundary_rows[#boundary_rows + 1] = {
      T_C = T, species_a = b.between[1], species_b = b.between[2], reaction = b.reaction,
      line = line, intercept = zero(b.line.a), slope_V_per_pH = (not b.line.vertical) and zero(b.line.b) or nil,
      pH_1 = zero(b.x[1]), E_1 = zero(b.y[1]), pH_2 = zero(b.x[2]), E_2 = zero(b.y[2]),
    }
  end
  local total = window_area(m)
  for _, f in ipairs(m.fields) do
    field_rows[#field_rows + 1] = {
      T_C = T, species = f.species, kind = f.kind, domain = DOMAIN_OF_KIND[f.kind],
      area_pH_V = f.area, share_percent = 100 * f.area / total,
      quality = lib:species(f.species).quality,
    }
  end
end

local conditions = { activity_Cu = CU_ACTIVITY, a_Cl = CL, ionic_strength = 0 }
export.csv(path("boundaries.csv"), boundary_rows, {
  columns = { "T_C", "species_a", "species_b", "reaction", "line", "intercept", "slope_V_per_pH",
              "pH_1", "E_1", "pH_2", "E_2" },
  conditions = conditions, from = maps,
})
wrote("boundaries.csv")
export.csv(path("fields.csv"), field_rows, {
  columns = { "T_C", "species", "kind", "domain", "area_pH_V", "share_percent", "quality" },
  conditions = conditions, from = maps,
})
wrote("fields.csv")
export.csv(path("operating-points.csv"), points, {
  columns = { "T_C", "state", "pH", "E_V", "ionic_strength", "a_Cl", "field", "domain",
              "solid", "dissolved_Cu", "carrier", "carrier_share_of_dissolved" },
  conditions = { Cl_mol_kg = CL, NaOH_mol_kg = NAOH, Cu_offered_mol_kg = CU_TOTAL,
                 activity_model = "Davies" },
  from = speciation_provenance,
})
wrote("operating-points.csv")
export.csv(path("dissolved-copper.csv"), results, {
  columns = { "T_C", "state", "Cl", "pH", "dissolved_Cu" },
  conditions = { NaOH_mol_kg = NAOH, Cu_offered_mol_kg = CU_TOTAL, activity_model = "Davies" },
  from = speciation_provenance,
})
wrote("dissolved-copper.csv")

local per_T = {}
for i, m in ipairs(maps) do
  local fields = {}
  for _, f in ipairs(m.fields) do fields[#fields + 1] = { species = f.species, kind = f.kind, area = f.area } end
  per_T[i] = {
    T_C = m.conditions.T_C, P_bar = m.conditions.P_bar, neutral_pH = m.neutral_pH,
    nernst_slope_V = m.nernst_slope, water = m.water, fields = fields, absent = m.absent,
  }
end
export.json(path("study.json"), {
  scenario = {
    text = "copper tubing in a district-heating loop; chloride from the make-up water",
    illustrative = { temperatures_C = TEMPS, Cl_mol_kg = CL, Cl_levels_compared = CL_LEVELS,
                     NaOH_mol_kg = NAOH, Cu_offered_mol_kg = CU_TOTAL,
                     H2_log_f_deaerated = REDOX[2].log_f },
    conventions = { Cu_activity_at_boundaries = CU_ACTIVITY, O2_log_f_aerated = REDOX[1].log_f,
                    left_out = CL_OXIDISED },
  },
  maps = per_T,
  operating_points = points,
  temperature_estimated = estimated_list,
}, { conditions = conditions, from = { maps, speciation_provenance } })
wrote("study.json")

-- 6. Summary ---------------------------------------------------------------------

print()
print(("Maps: Cu with chloride at a(Cl-) = %g, dissolved Cu at activity %g, pH %g-%g, E %g to %g V vs SHE.")
  :format(CL, CU_ACTIVITY, WINDOW.pH[1], WINDOW.pH[2], WINDOW.E[1], WINDOW.E[2]))
for _, m in ipairs(maps) do
  local dom = { immunity = 0, passivation = 0, corrosion = 0 }
  local names = {}
  for _, f in ipairs(m.fields) do
    dom[DOMAIN_OF_KIND[f.kind]] = dom[DOMAIN_OF_KIND[f.kind]] + f.area
    names[#names + 1] = f.species
  end
  local total = window_area(m)
  print(("  %3d C (%s, %.3g bar, neutral pH %.2f): immunity %.0f %%, passivation %.0f %%, corrosion %.0f %% of the window")
    :format(m.conditions.T_C, PLACES[m.conditions.T_C], m.conditions.P_bar, m.neutral_pH,
            100 * dom.immunity / total, 100 * dom.passivation / total, 100 * dom.corrosion / total))
  print("        fields: " .. table.concat(names, ", "))
end
local chl = {}
for i, m in ipairs(by_cl) do
  local f = field_of(m, "CuCl2^-")
  chl[i] = ("%.1f %%"):format(f and 100 * f.area / window_area(m) or 0)
end
print(("  CuCl2^- field at %d C for a(Cl-) = %s: %s of the window")
  :format(TEMPS[SUPPLY], table.concat(CL_LEVELS, ", "), table.concat(chl, ", ")))

print()
print(("Loop water (NaCl %g mol/kg + NaOH %g mol/kg, Davies activities), speciated:"):format(CL, NAOH))
for _, p in ipairs(points) do
  print(("  %3d C %-10s pH %5.2f  E %6.3f V  -> %s (%s); dissolved Cu %.2e mol/kg, mostly %s")
    :format(p.T_C, p.state, p.pH, p.E_V, p.field, p.domain, p.dissolved_Cu, p.carrier))
end
if #estimated_list > 0 then
  print()
  print("Data note: no measured temperature data in the library for " .. table.concat(estimated_list, ", ")
    .. "; their temperature dependence is estimated by the method named.")
  print("  The alkaline dissolved fields (present or absent) and the dissolved copper of the aerated")
  print("  water at 90 and 150 C rest on those estimates.")
end

print()
print(("Wrote %d files to %s/:"):format(#written, OUT))
print("  " .. table.concat(written, " "))
print()
print("Caution: " .. phlox.caution)
