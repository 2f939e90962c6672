--- phlox.diagrams: the other diagrams practitioners draw, on top of
-- phlox.speciate and phlox.map:
--   fractions   share of an element among its species against pH, log total
--               ligand or log a(ligand) (distribution curves)
--   solubility  total dissolved element in equilibrium with its stable solid
--               against pH, one curve per temperature
--   series      exact E-pH maps at several temperatures (plot.grid, plot.overlay)
--   ligand_E, pH_ligand
--               predominance maps on E vs log a(ligand) and log a(ligand) vs pH
--   where       which field a potential measured against a reference
--               electrode falls in
-- Curve results carry `series` ready for phlox.plot.curves and `axes` for its
-- opts; diagrams.plot(result, opts) draws them.
--
-- A thermodynamic diagram says what can form, not how fast it forms (see
-- phlox.caution).
local phlox = require "phlox"
local sweep = require "phlox.sweep"
local core = require "phlox.core"
local provenance = require "phlox.provenance"
local P = require("phlox.base").P -- user_species, map_species (stdlib/phlox/notes.lua)

local diagrams = {}

local T0C = 273.15 -- K at 0 C

local function fail(where, msg) core.user_error(where .. ": " .. msg) end

-- Option specs (the one reader, src/lua/l_opts.c): one line per key.  The
-- options passed through to phlox.speciate or phlox.map keep that
-- function's types and ranges.
local function spec(fname, from, keys, own)
  local t = {}
  for _, k in ipairs(keys) do t[k] = assert(phlox.option_specs[from][k], k) end
  for k, v in pairs(own) do t[k] = v end
  phlox.option_specs[fname] = t
  return t
end
local function map_keys(but)
  local keys = {}
  for k in pairs(phlox.option_specs["phlox.map"]) do if not but[k] then keys[#keys + 1] = k end end
  table.sort(keys)
  return keys
end
local CURVE_OWN = {
  library = "table", element = "string",
  range = "numbers",                      -- {from, to} of x
  n = { "integer", 2, 100001 },           -- points along x
  total = { "number", 1e-300, 20 },       -- mol/kg of the element
  totals = { "map", 0, 20 },              -- other elements, mol/kg
  solids = "boolean",                     -- let solids precipitate
  accept_held_logk = "boolean",           -- use log K held at 25 C away from 25 C (stamped)
  require_temperature_data = "boolean",   -- gone: phlox.temperature_notes says to use accept_held_logk
}

local function library_of(opts, where)
  if type(opts) ~= "table" then fail(where, "options table expected") end
  if getmetatable(opts.library) ~= phlox.Library then fail(where, "library = phlox.library{...} expected") end
  if type(opts.element) ~= "string" then fail(where, "element (a symbol) expected") end
  return opts.library
end

local function range_points(opts, where, default)
  local r = opts.range or default
  if type(r) ~= "table" or type(r[1]) ~= "number" or type(r[2]) ~= "number" or not (r[1] < r[2]) then
    fail(where, "range = {from, to} with from < to expected")
  end
  local n = opts.n or 121
  if math.type(n) ~= "integer" or n < 2 then fail(where, "n must be an integer >= 2") end
  return sweep.linear(r[1], r[2], n)
end

-- The options of phlox.speciate that pass through unchanged.
local PASS = { "T", "T_C", "P", "E", "pe", "redox_gas", "redox_log_f", "fugacities", "basis",
               "suppress", "exclude", "max_iter", "ligand_redox", "allow_inhibited",
               "accept_held_logk", "activity_model" }

-- A curve's stamp: its own held-constant and estimate lines, then the
-- caveats of its solves (phlox.merge_notes).
local function curve_stamp(notes, held)
  local out = {}
  for _, l in ipairs(held or {}) do out[#out + 1] = l end
  for _, l in ipairs(phlox.merge_notes(notes, { held = true, estimated = true })) do out[#out + 1] = l end
  return out
end

local function base_speciate(opts)
  local s = { library = opts.library }
  for _, k in ipairs(PASS) do s[k] = opts[k] end
  -- Textbook distribution and solubility diagrams are drawn at infinite
  -- dilution; a fixed pH imposes no charge balance, so an ionic strength
  -- would only count the ions given (add counter-ions to `totals` and set
  -- activity_model = "davies" or "bdot" when it matters).
  s.activity_model = opts.activity_model or "ideal"
  return s
end

local function copy(t)
  local o = {}
  for k, v in pairs(t or {}) do o[k] = v end
  return o
end

-- A curve's own provenance: the files defining species of its element,
-- ligand and the other totals, with its conditions and options.
local function curve_provenance(lib, opts, ligand, conditions)
  local els = { opts.element }
  if ligand then els[#els + 1] = ligand end
  for e in pairs(opts.totals or {}) do els[#els + 1] = e end
  return provenance.of_result(lib, els, conditions, opts)
end

local function T_C_of(opts)
  if opts.T then return opts.T - T0C end
  return opts.T_C or 25
end

-- Stamp lines naming, for temperatures other than 25 C, the species whose
-- log K stays at its 25 C value and those whose temperature dependence is
-- estimated (with the method), of the result's own system: the species made
-- of `elements` (with H and O), and once the work is done, of those only
-- that its solves held (`species`, a set of formulas: see system_species).
-- A held species stops the work unless opts.accept_held_logk is true (call
-- it before the work is done).
local function held_stamp(lib, elements, temps, opts, where, species)
  local tk = {}
  for i, tc in ipairs(temps) do tk[i] = tc + T0C end
  local ok, held, _, lines = pcall(phlox.temperature_notes, lib, elements, tk, opts, where, nil, species)
  if not ok then error(held, 0) end
  if #lines == 0 then return nil end
  return lines, held
end

-- The species the systems of a curve's solves held (each r.species), as a
-- set of formulas: `points` lists lists of phlox.speciate_curve points.
local function system_species(points)
  local set = {}
  for _, list in ipairs(points) do
    for _, p in ipairs(list) do
      for _, sp in ipairs(p.r and p.r.species or {}) do set[sp.formula] = true end
    end
  end
  return set
end

--- Fraction (distribution) curves: the share of `element` among its
-- species.
--   diagrams.fractions { library = lib, element = "Zn", T_C = 25,
--     x = "pH",            -- or "log_total" (of `ligand`) or "log_a" (of `ligand_species`)
--     range = {2, 14}, n = 121,
--     total = 1e-6,        -- mol/kg of the element
--     pH = 6,              -- fixed pH when x is not pH
--     ligand = "Cl", ligand_species = "Cl^-",
--     totals = { Na = 0.1 },                  -- other elements, mol/kg
--     solids = false,      -- true lets solids precipitate (their share counts)
--     min_share = 0.01,    -- species never reaching this share are left out
--     activity_model = "ideal",  -- or "davies", "bdot", "sit"
--     E = ..., pe = ..., fixed = {...}, exclude = {...}, ... (as phlox.speciate) }
-- Returns { x = {...}, series = { { species, label, x, y }, ... }, axes =
-- { x = {...}, y = {...} }, omitted = { {species, max_share} }, failures =
-- { {x, message} }, conditions, stats = { solves, seconds } }.  y is false
-- at a point where the solver did not converge (plot.curves breaks the line
-- there).
local FRACTIONS_OPTS = spec("diagrams.fractions", "phlox.speciate", PASS, {
  x = "pH|log_total|log_a",               -- what runs along x
  pH = { "number", -3, 17 },              -- fixed pH when x is not pH
  ligand = "string",                      -- ligand element (x = "log_total")
  ligand_species = "string",              -- ligand basis species (x = "log_a")
  fixed = { "map", -300, 1 },             -- log10 activity of basis species
  min_share = { "number", 0, 1 },         -- species below this share are left out
})
for k, v in pairs(CURVE_OWN) do FRACTIONS_OPTS[k] = v end
function diagrams.fractions(opts)
  local where = "diagrams.fractions"
  core.options(where, FRACTIONS_OPTS, opts)
  local lib = library_of(opts, where)
  local el = opts.element
  local xkind = opts.x or "pH"
  if xkind ~= "pH" and xkind ~= "log_total" and xkind ~= "log_a" then
    fail(where, "x must be \"pH\", \"log_total\" or \"log_a\"")
  end
  if xkind ~= "pH" and type(opts.pH) ~= "number" then fail(where, "a fixed pH is needed when x is " .. xkind) end
  if xkind == "log_total" and type(opts.ligand) ~= "string" then fail(where, "x = \"log_total\" needs ligand = \"Cl\" (an element)") end
  if xkind == "log_a" and type(opts.ligand_species) ~= "string" then
    fail(where, "x = \"log_a\" needs ligand_species = \"Cl^-\" (a basis species)")
  end
  local lig_el = opts.ligand
  if xkind == "log_a" and not lig_el then
    local rec = lib:species(opts.ligand_species)
    if not rec then fail(where, "no species " .. opts.ligand_species .. " in the library") end
    for e in pairs(rec.elements) do
      if e ~= "H" and e ~= "O" then lig_el = e end
    end
    if not lig_el then fail(where, "ligand_species has no element other than H and O") end
  end
  local total = opts.total or 1e-6
  if type(total) ~= "number" or not (total > 0) then fail(where, "total must be a positive number (mol/kg)") end
  local xs = range_points(opts, where, xkind == "pH" and { 0, 14 } or { -6, 0 })
  local min_share = opts.min_share or 0.01

  local base = base_speciate(opts)
  base.solids = opts.solids == true
  base.totals = copy(opts.totals)
  base.totals[el] = total
  base.fixed = copy(opts.fixed)
  local curve = { var = xkind, x = xs, element = el }
  if xkind ~= "pH" then
    base.pH = opts.pH
    if xkind == "log_total" then
      curve.name = opts.ligand
      base.totals[opts.ligand] = 1 -- placeholder: the driver sets 10^x at each point
    else
      -- the ligand element joins with its species as basis; the fixed
      -- activity replaces its balance (the total given is a placeholder)
      curve.name = opts.ligand_species
      base.fixed[opts.ligand_species] = 0 -- placeholder: x at each point
      base.totals[lig_el] = base.totals[lig_el] or 1e-3
      base.basis = copy(opts.basis)
      base.basis[lig_el] = opts.ligand_species
    end
  end
  -- the curve's system is that of its solves
  local system = phlox.system_elements(lib, base)
  held_stamp(lib, system, { T_C_of(opts) }, opts, where, P.user_species(lib, opts)) -- stops before the work
  local shares, failures, notes = {}, {}, {}
  local t0 = os.clock()
  local points = phlox.speciate_curve(base, curve)
  local held = held_stamp(lib, system, { T_C_of(opts) }, opts, where, system_species { points })
  for i, x in ipairs(xs) do
    local r, err = points[i].r, points[i].err
    if r then notes[#notes + 1] = { notes = r.notes, activity = r.activity } end
    if r and r.elements[el] then
      shares[i] = r.elements[el].share
    else
      failures[#failures + 1] = { x = x, message = err or ("no " .. el .. " in the result") }
    end
  end
  local seconds = os.clock() - t0

  -- species in order of the x where they first reach their largest share
  local maxes, at = {}, {}
  for i = 1, #xs do
    for sp, v in pairs(shares[i] or {}) do
      if not maxes[sp] or v > maxes[sp] then maxes[sp], at[sp] = v, i end
    end
  end
  local names, omitted = {}, {}
  for sp, v in pairs(maxes) do
    if v >= min_share then names[#names + 1] = sp else omitted[#omitted + 1] = { species = sp, max_share = v } end
  end
  table.sort(names, function(a, b) if at[a] ~= at[b] then return at[a] < at[b] end return a < b end)
  table.sort(omitted, function(a, b) return a.species < b.species end)
  local series = {}
  for _, sp in ipairs(names) do
    local y = {}
    for i = 1, #xs do y[i] = shares[i] and (shares[i][sp] or 0) or false end
    series[#series + 1] = { species = sp, label = sp, x = xs, y = y }
  end

  local conditions = { T_C = T_C_of(opts), [el .. " total (mol/kg)"] = total, pH = xkind ~= "pH" and opts.pH or nil,
                       activity_model = base.activity_model }
  local xname = xkind == "pH" and "pH"
    or xkind == "log_total" and ("log total {" .. opts.ligand .. "} / (mol/kg)")
    or ("log a({" .. opts.ligand_species .. "})")
  local ligand_text
  if opts.ligand and xkind ~= "log_total" and opts.totals and type(opts.totals[opts.ligand]) == "number" then
    ligand_text = ("{%s} %s mol/kg"):format(opts.ligand, require("phlox.plot").number(opts.totals[opts.ligand]))
  end
  local result = {
    element = el, x = xs, series = series, omitted = omitted, failures = failures, ligand_text = ligand_text,
    axes = { x = { name = xname, min = xs[1], max = xs[#xs] },
             y = { name = "fraction of {" .. el .. "}", min = 0, max = 1 } },
    conditions = conditions,
    provenance = curve_provenance(lib, opts, lig_el, conditions),
    stamp = curve_stamp(notes, held), stamp_short = held and held.short or nil,
    stats = { solves = #xs, seconds = seconds },
  }
  result.provenance.notes = result.stamp
  return result
end

local RETRIES = 3        -- smaller totals tried when a solve fails
local RETRY_FACTOR = 0.1

--- Solubility curves: total dissolved element in equilibrium with its
-- stable solid against pH, one series per temperature.
--   diagrams.solubility { library = lib, element = "Zn", T_C = {25, 150, 300},
--     range = {4, 14}, n = 121,
--     total = 1,           -- mol/kg put in: large, so a solid is stable
--     totals = {...}, E = ..., activity_model = "ideal", suppress = {...}, ... }
-- Returns { x, series = { { label = "25 °C", T_C, x, y, solids }, ... },
-- axes (y logarithmic), failures, conditions, stats }.  y[i] is the
-- dissolved total (mol/kg of the element); it is false where no solid is
-- stable (all of `total` dissolves: raise total) or the solver failed.
-- solids[i] names the solid(s) present.  A point where the solver fails is
-- retried with a tenth, a hundredth and a thousandth of `total` (the
-- dissolved total over a solid does not depend on the solid's amount);
-- stats.retries counts them.
local SOLUBILITY_OPTS = spec("diagrams.solubility", "phlox.speciate", PASS, {
  T_C = "number/numbers",                 -- one temperature or a list, degrees C
  fixed = { "map", -300, 1 },             -- log10 activity of basis species
})
for k, v in pairs(CURVE_OWN) do SOLUBILITY_OPTS[k] = v end
SOLUBILITY_OPTS.solids = nil              -- solids are the point here
function diagrams.solubility(opts)
  local where = "diagrams.solubility"
  core.options(where, SOLUBILITY_OPTS, opts)
  local lib = library_of(opts, where)
  local el = opts.element
  if opts.T then fail(where, "give temperatures as T_C = {25, 150, ...}") end
  local temps = opts.T_C or { 25 }
  if type(temps) == "number" then temps = { temps } end
  for _, tc in ipairs(temps) do
    if type(tc) ~= "number" then fail(where, "T_C must list numbers") end
  end
  local sys_opts = copy(opts)   -- the curves' system is that of their solves
  sys_opts.totals = copy(opts.totals)
  sys_opts.totals[el] = 1
  local system = phlox.system_elements(lib, sys_opts)
  held_stamp(lib, system, temps, opts, where, P.user_species(lib, opts)) -- stops before the work
  local solved = {}
  local total = opts.total or 1
  if type(total) ~= "number" or not (total > 0) then fail(where, "total must be a positive number (mol/kg)") end
  local xs = range_points(opts, where, { 0, 14 })
  local base = base_speciate(opts)
  base.T_C = nil
  base.solids = true
  local series, failures, retried, notes = {}, {}, 0, {}
  local t0 = os.clock()
  for _, tc in ipairs(temps) do
    local y, solids = {}, {}
    local s = copy(base)
    s.T_C = tc
    s.pH = xs[1] -- the driver sets each x
    s.totals = copy(opts.totals)
    s.totals[el] = total
    s.fixed = copy(opts.fixed)
    -- The dissolved total in equilibrium with a solid does not depend on
    -- how much solid there is, so when the solver fails with a large
    -- excess of solid the point is retried with less of it.
    local points, tries = phlox.speciate_curve(s, { var = "pH", x = xs, element = el,
                                                     retries = RETRIES, retry_factor = RETRY_FACTOR })
    retried = retried + tries
    solved[#solved + 1] = points
    for i, pH in ipairs(xs) do
      local r, err, put = points[i].r, points[i].err, points[i].total
      if r then notes[#notes + 1] = { notes = r.notes, activity = r.activity } end
      local e = r and r.elements[el]
      y[i], solids[i] = false, false
      if not e then
        failures[#failures + 1] = { T_C = tc, x = pH, message = err or ("no " .. el .. " in the result") }
      elseif not (e.solid > 0) then
        if put < total then
          failures[#failures + 1] = { T_C = tc, x = pH, message = ("the solver failed with %g mol/kg and no solid "
            .. "is stable with %g mol/kg"):format(total, put) }
        end
      else
        y[i] = e.dissolved
        local present = {}
        for _, sp in ipairs(r.species) do
          if sp.phase == "solid" and (sp.amount or 0) > 0 then present[#present + 1] = sp.formula end
        end
        table.sort(present)
        solids[i] = table.concat(present, " + ")
      end
    end
    series[#series + 1] = { label = ("%g °C"):format(tc), T_C = tc, x = xs, y = y, solids = solids, chem = false }
  end
  local held = held_stamp(lib, system, temps, opts, where, system_species(solved))
  local result = {
    element = el, x = xs, series = series, failures = failures,
    axes = { x = { name = "pH", min = xs[1], max = xs[#xs] },
             y = { name = "dissolved {" .. el .. "}", unit = "mol/kg", log = true } },
    conditions = { [el .. " put in (mol/kg)"] = total, activity_model = base.activity_model },
    provenance = curve_provenance(lib, opts, nil, { [el .. " put in (mol/kg)"] = total, T_C = temps }),
    stamp = curve_stamp(notes, held), stamp_short = held and held.short or nil,
    stats = { points = #xs * #temps, retries = retried, seconds = os.clock() - t0 },
  }
  result.provenance.notes = result.stamp
  return result
end

--- Draw a fractions or solubility result with phlox.plot.curves; opts are
-- plot.curves' (file, title, legend, ...), merged over the result's axes.
function diagrams.plot(result, opts)
  local plot = require "phlox.plot"
  opts = copy(opts)
  opts.x = opts.x or result.axes.x
  opts.y = opts.y or result.axes.y
  if not opts.conditions then
    local c = {}
    for k, v in pairs(result.conditions or {}) do
      if k ~= "activity_model" then c[k] = v end
    end
    opts.conditions = c
  end
  local title = opts.title
  if not title and result.element then
    local temps, seen = {}, {}
    for _, s in ipairs(result.series) do
      if s.T_C and not seen[s.T_C] then seen[s.T_C] = true; temps[#temps + 1] = ("%g"):format(s.T_C) end
    end
    if #temps == 0 and result.conditions and result.conditions.T_C then
      temps[1] = ("%g"):format(result.conditions.T_C)
    end
    local at = #temps == 0 and "" or #temps == 1 and (" at " .. temps[1] .. " °C")
      or (" at " .. table.concat(temps, ", ", 1, #temps - 1) .. " and " .. temps[#temps] .. " °C")
    local c = result.conditions or {}
    local fixed = {}
    if c.pH then fixed[#fixed + 1] = ("pH %g"):format(c.pH) end
    if result.ligand_text then fixed[#fixed + 1] = result.ligand_text end
    title = ((#result.series > 0 and result.series[1].solids) and ("{%s} solubility"):format(result.element)
      or ("{%s} species fractions"):format(result.element)) .. at
      .. (#fixed > 0 and (", " .. table.concat(fixed, ", ")) or "")
  end
  opts.title = title
  if type(opts.stamp) ~= "table" and not opts.notes and result.stamp and #result.stamp > 0 then
    local short = result.stamp_short or {}
    local notes = {}
    for i, l in ipairs(result.stamp) do notes[i] = short[l] and { full = l, short = short[l] } or l end
    opts.notes = notes
  end
  opts.from = opts.from or result
  return plot.curves(result.series, opts)
end

--- Exact E-pH maps of one element at several temperatures, for plot.grid
-- and plot.overlay.
--   diagrams.series { library = lib, element = "Zn", T_C = {25, 150, 300},
--                     ... any other phlox.map option }
-- Each map gets label "150 °C".  At T other than 25 °C, a map lists the
-- species that keep their 25 °C log K (records without dH or logK_T) in
-- map.constant_logk; every map of the series names them in a stamp line
-- (plot.grid and plot.overlay stamp the first map's lines).
local SERIES_OPTS = spec("diagrams.series", "phlox.map", map_keys { T_C = true, T = true }, {
  T_C = "numbers",                        -- temperatures, degrees C
})
function diagrams.series(opts)
  local where = "diagrams.series"
  core.options(where, SERIES_OPTS, opts)
  local lib = library_of(opts, where)
  if opts.T then fail(where, "give temperatures as T_C = {25, 150, ...}") end
  local temps = opts.T_C
  if type(temps) ~= "table" or #temps == 0 then fail(where, "T_C = {25, 150, ...} expected") end
  local maps = {}
  for i, tc in ipairs(temps) do
    if type(tc) ~= "number" then fail(where, "T_C must list numbers") end
    local o = copy(opts)
    o.T_C = tc
    local ok, m = pcall(phlox.map, o)
    if not ok then fail(where, ("at %g °C: %s"):format(tc, tostring(m))) end
    m.label = ("%g °C"):format(tc)   -- phlox.map set m.constant_logk
    maps[i] = m
  end
  -- plot.grid and plot.overlay stamp the first map's lines: every map
  -- carries the note for the whole series
  local weighed = {}   -- the species any of the maps weighed
  for _, m in ipairs(maps) do
    for f in pairs(P.map_species(m)) do weighed[f] = true end
  end
  local stamp = held_stamp(lib, { opts.element, opts.ligand }, temps, opts, where, weighed)
  if stamp then
    for _, m in ipairs(maps) do
      m.stamp = m.stamp or {}
      for k = #m.stamp, 1, -1 do -- the single-map notes are replaced by the series ones
        if m.stamp[k]:find("^log K held at 25") or m.stamp[k]:find("^temperature dependence estimated") then
          table.remove(m.stamp, k)
        end
      end
      m.stamp_short = m.stamp_short or {}
      for _, l in ipairs(stamp) do
        m.stamp[#m.stamp + 1] = l
        m.stamp_short[l] = stamp.short[l]
      end
    end
  end
  return maps
end

-- Default log a(ligand) window of the ligand maps: dilute to about the
-- activity of a saturated salt solution (common practice, no source).
local LOGA_RANGE = { -4, 1 }

local LIGAND_E_OPTS = spec("diagrams.ligand_E", "phlox.map", map_keys { axes = true }, {})
local PH_LIGAND_OPTS = spec("diagrams.pH_ligand", "phlox.map", map_keys { axes = true }, {})

-- A predominance map with log a(ligand) on an axis (diagrams.ligand_E and
-- diagrams.pH_ligand): `fixed` is the option held fixed (pH or E), stored
-- in the map's conditions as `cond`; `missing` says it is needed.
local function ligand_map(where, opts_spec, opts, axes, fixed, cond, missing)
  core.options(where, opts_spec, opts)
  library_of(opts, where)
  if type(opts.ligand) ~= "string" then fail(where, "ligand (an element symbol) expected") end
  if type(opts[fixed]) ~= "number" then fail(where, missing) end
  local o = copy(opts)
  o.loga_range = o.loga_range or LOGA_RANGE
  o.axes = axes
  local m = phlox.map(o)
  m.conditions[cond] = opts[fixed]
  m.conditions.ligand_activity = nil -- it is an axis
  return m
end

--- Predominance map on E (y) against log a(ligand) (x) at a fixed pH.
--   diagrams.ligand_E { library = lib, element = "Zn", ligand = "Cl", pH = 5,
--                       loga_range = {-4, 1}, E_range = {-1.5, 1.5}, ... }
function diagrams.ligand_E(opts)
  return ligand_map("diagrams.ligand_E", LIGAND_E_OPTS, opts, { "loga", "E" }, "pH", "pH", "a fixed pH is needed")
end

--- Predominance map on log a(ligand) (y) against pH (x) at a fixed E (V vs SHE).
--   diagrams.pH_ligand { library = lib, element = "Zn", ligand = "Cl", E = -0.5, ... }
function diagrams.pH_ligand(opts)
  return ligand_map("diagrams.pH_ligand", PH_LIGAND_OPTS, opts, { "pH", "loga" }, "E", "E_V",
                    "a fixed E (V vs SHE) is needed")
end

-- Short names of the electrodes (phlox.electrode_names).
diagrams.electrode_names = phlox.electrode_names

--- The reference electrode record for a short or full name.
function diagrams.electrode(name) return phlox.electrode(name) end

--- Which field of a map a measured potential falls in.
--   diagrams.where { map = m, pH = 5, E = -0.80, reference = "SCE" }
-- `map` has E on its y axis and pH (give pH) or log a(ligand) (give loga)
-- on x.  `reference` is a short name (SHE, SCE, Ag/AgCl, Ag/AgCl 3.5M,
-- CSE) or a full name of phlox.electrodes(); default SHE.  On a map at
-- another temperature the offset is corrected with the electrode's
-- temperature coefficient where it is known (phlox.electrode_at), else the
-- call needs reference_at_25C = true (an external electrode kept at room
-- temperature; the thermal junction potential is not included).
-- Returns { species, kind, E_SHE, E_measured, reference = {name, offset,
-- source}, field, E_range = {lo, hi} (the field's extent in E at that
-- x), margin = {below, above} in V } or nil, message outside the window.
local WHERE_OPTS = spec("phlox.where", "phlox.map", {}, {
  map = "table",                          -- phlox.map{...} with E on y
  pH = { "number", -1e3, 1e3 },           -- x on a pH-E map
  loga = { "number", -1e3, 1e3 },         -- x on a log a-E map
  x = { "number", -1e3, 1e3 },            -- the same, by its axis name
  E = { "number", -5, 5 },                -- the measured potential, V
  reference = "string",                   -- electrode, short or full name (SHE)
  reference_at_25C = "boolean",           -- the electrode is kept at room temperature
})
function diagrams.where(opts)
  local where = "phlox.where"
  core.options(where, WHERE_OPTS, opts)
  if type(opts.map) ~= "table" then fail(where, "map = phlox.map{...} expected") end
  local m = opts.map
  if not (m.y and m.y.name == "E") then fail(where, "the map needs E on its y axis") end
  local x
  if m.x.name == "pH" then
    x = opts.pH
    if type(x) ~= "number" then fail(where, "pH (a number) expected") end
  else
    x = opts.loga or opts.x
    if type(x) ~= "number" then fail(where, "loga (the x value, a number) expected") end
  end
  if type(opts.E) ~= "number" then fail(where, "E (the measured potential, V) expected") end
  local e = phlox.electrode_at(opts.reference or "SHE", m.T, opts.reference_at_25C, where)
  local E = opts.E + e.offset -- E_SHE = E_ref + offset
  if x < m.x.min or x > m.x.max or E < m.y.min or E > m.y.max then
    return nil, ("(%g, %.4f V vs SHE) is outside the map's window"):format(x, E)
  end
  local sp, field = phlox.locate(m, x, E)
  if not sp then return nil, ("no field at (%g, %.4f V vs SHE)"):format(x, E) end
  -- the E interval of the field on the vertical line at x that holds E
  -- (src/geom: crossings paired bottom-up, right for fields not convex)
  local lo, hi = core.polygon_span(field.x, field.y, x, E)
  return {
    species = sp, kind = field.kind, field = field, E_SHE = E, E_measured = opts.E,
    reference = { name = e.name, offset = e.offset, source = e.source, valid = e.valid, text = e.text },
    E_range = lo and { lo, hi } or nil,
    margin = lo and { E - lo, hi - E } or nil,
  }
end

return diagrams
