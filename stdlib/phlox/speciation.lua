--- phlox.speciation (part of `require "phlox"`): speciation of a water and
-- along a curve.
-- Adds to phlox: system_elements (the elements of a speciation's system),
-- speciate (one solve by core.speciate; nil, message, info when it does not
-- converge), speciate_curve (the C curve driver, src/equil/curve.h: the
-- driver of diagrams.fractions and diagrams.solubility).  Every result
-- carries its stamp and notes (activity model and range, ligand oxidation
-- states, inhibited, suppressed and excluded species, the estimated and
-- held species its system holds, the sour caution) and, for speciate, its
-- provenance.  A constant held at 25 C stops the work before it is done,
-- unless accept_held_logk is true.
local core = require "phlox.core"
local provenance = require "phlox.provenance"
local base = require "phlox.base"
local phlox, P = base.phlox, base.P
local T0C, options, TOTAL_MAX, spec, temperature, pressure, check_library, held_logk, stamp_held, add_note, note_activity, note_sour, note_list, note_ligands =
  P.T0C, P.options, P.TOTAL_MAX, P.spec, P.temperature, P.pressure, P.check_library, P.held_logk, P.stamp_held, P.add_note, P.note_activity, P.note_sour, P.note_list, P.note_ligands
local user_species = P.user_species

-- The elements a speciation involves: those of totals, fugacities and fixed
-- (each a symbol or a formula); the held-species check looks at species made
-- of these (with H and O) only.
local speciation_elements
--- The elements (besides H and O) of the system a speciation with these
-- options (those of phlox.speciate) contains: those of totals, and of the
-- species of fugacities and fixed; sorted.  Its stamps name the estimated
-- and held species made of these (with H and O) only.
function phlox.system_elements(lib, opts)
  check_library("phlox.system_elements", lib)
  core.check_value("phlox.system_elements", "opts", opts, "table")
  return (speciation_elements(lib, opts))
end
function speciation_elements(lib, opts)
  local set, out = { H = true, O = true }, {}
  local function add_formula(f)
    local rec = lib:species(f)
    for el in pairs(rec and rec.elements or {}) do set[el] = true end
  end
  for k in pairs(type(opts.totals) == "table" and opts.totals or {}) do set[k] = true end
  for k in pairs(type(opts.fugacities) == "table" and opts.fugacities or {}) do add_formula(k) end
  for k in pairs(type(opts.fixed) == "table" and opts.fixed or {}) do add_formula(k) end
  for el in pairs(set) do
    if el ~= "H" and el ~= "O" then out[#out + 1] = el end
  end
  table.sort(out)
  return out, set
end

-- The options of phlox.speciate (documented at the function below).
local SPECIATE_OPTS = spec("phlox.speciate", {
  library = "table",                          -- phlox.library{...}
  totals = { "map", 0, TOTAL_MAX },           -- mol/kg of each element, {Ca = 1e-3}
  basis = "table",                            -- basis species per element, {C = "HCO3^-"}
  pH = { "number", -3, 17 },                  -- fixed pH; omit for charge balance (common practice, no source)
  E = { "number", -5, 5 },                    -- V vs SHE
  pe = { "number", -100, 100 },               -- pe = E F / (RT ln 10)
  redox_gas = "string",                       -- "O2(g)": redox set by a gas fugacity
  redox_log_f = { "number", -300, 3 },        -- its log10 fugacity (bar)
  fugacities = { "map", -300, 3 },            -- log10 bar, {["CO2(g)"] = -3.4}
  fixed = { "map", -300, 1 },                 -- log10 activity of a basis species
  solids = "boolean",                         -- let solids precipitate (default true)
  suppress = "strings",                       -- solids never precipitated (metastable)
  exclude = "strings",                        -- species left out
  activity_model = "ideal|davies|bdot|sit",   -- activity coefficients (davies)
  max_iter = { "integer", 1, 100000 },        -- solver iterations
  ligand_redox = "table",                     -- {N = "full" | "kept" | form name}, as phlox.map
  allow_inhibited = "boolean",                -- let kinetically inhibited solids precipitate
  accept_held_logk = "boolean",               -- use log K held at 25 C away from 25 C (stamped)
  require_temperature_data = "boolean",       -- gone: phlox.temperature_notes says to use accept_held_logk
}, true)
-- The stamp lines and notes of a core.speciate result r at T (K), as
-- phlox.speciate gives them; sys: the system's elements (speciation_setup)
-- for the held and estimated species, of which r names those its system
-- holds (r.species).
local function speciation_notes(r, opts, T, sys)
  r.T_C = T - T0C
  note_activity(r, r.activity_model, r.ionic_strength)
  if r.activity_model == "sit" then
    add_note(r, "sit", ("SIT interaction coefficients at 25 °C (NEA-TDB table, src/equil/equil_sit_data.c): "
      .. "%d ion pairs with one, %d without (taken as 0)"):format(r.sit_pairs, r.sit_missing))
  end
  if r.pe then note_ligands(r, r.ligand_states)
  else add_note(r, "ligands", "no redox constraint: every element stays in the oxidation state of its basis species") end
  if #r.inhibited > 0 then
    add_note(r, "inhibited", "kept from precipitating as kinetically inhibited (docs/solver.md; allow_inhibited = true "
      .. "lets them in; saturation indices still given): " .. table.concat(r.inhibited, ", "))
  end
  if opts.allow_inhibited then
    add_note(r, "inhibited", "kinetically inhibited solids allowed to precipitate (allow_inhibited = true)")
  end
  if opts.solids == false then add_note(r, "solids", "no solid may precipitate (solids = false)") end
  note_list(r, "suppress", "kept from precipitating by the user (suppress)", opts.suppress)
  note_list(r, "exclude", "left out by the user (exclude)", opts.exclude)
  local in_system = {}
  for _, sp in ipairs(r.species) do in_system[sp.formula] = true end
  stamp_held(r, held_logk(sys.lib, sys.els, T, opts, sys.where, sys.only, in_system))
  local names = {}
  for _, sp in ipairs(r.species) do
    if (sp.molality or 0) > 0 then names[#names + 1] = sp.formula end
  end
  note_sour(r, names)
end

-- The checked options of phlox.speciate for core.speciate or core.curve:
-- the library, the copy passed to C, T (K), P (bar), and the elements
-- for held_logk (called by the public function itself: its errors name
-- the caller's line).
local function speciation_setup(opts, where)
  options(where, SPECIATE_OPTS, opts)
  local lib = opts.library
  check_library(where, lib)
  local T = temperature(opts, where)
  local P = pressure(opts, T, where)
  local els, only = speciation_elements(lib, opts)
  local copt = {}
  for k, v in pairs(opts) do copt[k] = v end
  copt.library, copt.T_C, copt.accept_held_logk, copt.require_temperature_data = nil, nil, nil, nil
  copt.T, copt.P = T, P
  return lib, copt, T, P, els, only
end

--- Full speciation of a water.
--   phlox.speciate { library = lib, T_C = 25,
--     T = 298.15, P = 1,                       -- instead of T_C: K; bar (default core.default_pressure(T))
--     totals = { Ca = 1e-3, C = 2e-3 },        -- mol/kg of each element
--     pH = 8.3,                                -- fixed; omit for charge balance
--     E = 0.2 | pe = 3 | redox_gas = "O2(g)", redox_log_f = -0.68,
--     fugacities = { ["CO2(g)"] = -3.4 },      -- log10 bar, replaces that element's total
--     fixed = { ["Cl^-"] = -2 },               -- log10 activity of a basis species
--     solids = true, suppress = {...}, exclude = {...},
--     activity_model = "davies" | "bdot" | "ideal" | "sit",
--     ligand_redox = { N = "full" },           -- as phlox.map
--     allow_inhibited = true }                 -- let dolomite, magnesite, quartz in
-- Returns a table (pH, pe, E, ionic_strength, species, elements with each
-- species' share, solids' saturation index and amount), or nil, message,
-- info when the solver does not converge.
function phlox.speciate(opts)
  local lib, copt, T, P, els, only = speciation_setup(opts, "phlox.speciate")
  held_logk(lib, els, T, opts, "phlox.speciate", only, user_species(lib, opts)) -- stops before the work
  local r, err, info = core.speciate(lib.db, copt)
  if not r then return nil, err, info end
  speciation_notes(r, opts, T, { lib = lib, els = els, only = only, where = "phlox.speciate" })
  local els = {}
  for e in pairs(opts.totals or {}) do els[#els + 1] = e end
  for _, f in ipairs({ opts.fugacities or {}, opts.fixed or {} }) do
    for formula in pairs(f) do
      for e in tostring(formula):gmatch("%u%l?") do els[#els + 1] = e end
    end
  end
  table.sort(els)
  r.provenance = provenance.of_result(lib, els, { T_C = r.T_C, P_bar = P }, opts)
  r.provenance.notes = r.stamp
  return r
end

local CURVE_VARY = { pH = function(x) return { pH = x } end,
                     log_total = function(x, name) return { totals = { [name] = 10 ^ x } } end,
                     log_a = function(x, name) return { fixed = { [name] = x } } end }
--- Speciation along a curve, one solve per value of x, by the C curve
-- driver (src/equil/curve.h): the driver of diagrams.fractions and
-- diagrams.solubility.
--   phlox.speciate_curve(opts, curve)
-- opts: phlox.speciate's, with the varied total or fixed activity present
-- (any value).  curve: var ("pH", "log_total" or "log_a"), name (the
-- element or fixed species varied), x (the values), element (every
-- point's result must hold it), retries and retry_factor (a failing point
-- is tried again with the element's total times retry_factor), warm (true:
-- each point starts from the last one's solution; fewer iterations, the
-- same results to the solver's tolerance but not to the bit).  Returns a
-- list, one entry per x: r (as phlox.speciate, without provenance) or err
-- (the message), each with total (the element's total after the last try)
-- and retries; and the number of failing tries.
function phlox.speciate_curve(opts, curve)
  local where = "phlox.speciate"
  local lib, copt, T, _, els, only = speciation_setup(opts, where)
  held_logk(lib, els, T, opts, where, only, user_species(lib, opts)) -- stops before the work
  core.check_value("phlox.speciate_curve", "curve", curve, "table")
  local vary = CURVE_VARY[curve.var]
  if not vary then core.user_error("phlox.speciate_curve: curve.var must be \"pH\", \"log_total\" or \"log_a\"") end
  core.check_value("phlox.speciate_curve", "curve.x", curve.x, "numbers")
  -- each varied value meets phlox.speciate's range, as a single call would:
  -- the points before the first that does not are solved, then its error
  -- is raised (what a loop of phlox.speciate calls would do)
  local bad
  for i, x in ipairs(curve.x) do
    local ok, err = pcall(options, where, SPECIATE_OPTS, vary(x, curve.name))
    if not ok then
      if i == 1 then error(err, 0) end
      bad = { at = i, err = err }
      break
    end
  end
  local run = curve
  if bad then
    run = {}
    for k, v in pairs(curve) do run[k] = v end
    run.x = table.move(curve.x, 1, bad.at - 1, 1, {})
  end
  local points, retried = core.curve(lib.db, copt, run)
  for _, p in ipairs(points) do
    if p.r then speciation_notes(p.r, opts, T, { lib = lib, els = els, only = only, where = where }) end
  end
  if bad then error(bad.err, 0) end
  return points, retried
end
