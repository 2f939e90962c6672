--- phlox: the module every study script starts with.
--    local phlox = require "phlox"
--    local lib = phlox.library { "Fe", "S" }
--    local map = phlox.map { library = lib, element = "Fe", T_C = 150, ligand = "S" }
-- It gathers the C primitives (phlox.core) and the Lua helpers of the
-- embedded library (phlox.plot, phlox.export, phlox.sweep, ...) into one
-- table.  Temperatures in user-facing options are in degrees Celsius
-- (T_C) or kelvin (T); pressures in bar (P, default 1 bar up to 100 C and
-- the saturation pressure above).
local core = require "phlox.core"
local provenance = require "phlox.provenance"

local phlox = {
  version = core.version,
  core = core,
}

local T0C = 273.15 -- K at 0 C

phlox.caution = "A thermodynamic diagram says what can form, not how fast it forms: "
  .. "passivity depends on film kinetics, alloying, flow and deposits. Use these results "
  .. "with the applicable codes, standards and licensed engineering practice."

--- The folders searched before the built-in library, in order.
function phlox.search_paths()
  return core.search_paths()
end

--- Read a library file: the user's folders first, then the embedded copy.
-- `rel` is a path relative to a library root, e.g. "elements/Zn.lua".
-- Returns text, where (the file path, or "stdlib/<rel>" when embedded).
function phlox.read_library_file(rel)
  for _, dir in ipairs(core.search_paths()) do
    local path = dir .. "/" .. rel
    local f = io.open(path, "rb")
    if f then
      local text = f:read("a")
      f:close()
      return text, path
    end
  end
  local embedded = "stdlib/" .. rel
  local text = core.embedded_source(embedded)
  if text then return text, embedded end
  return nil, "no file '" .. rel .. "' in the search path or the built-in library"
end

--- The elements whose definition files the library has (built-in and user).
function phlox.available_elements()
  local seen, list = {}, {}
  local function add(sym) if not seen[sym] then seen[sym] = true; list[#list + 1] = sym end end
  for _, path in ipairs(core.embedded_files()) do
    local sym = path:match("^stdlib/elements/(%u%l?)%.lua$")
    if sym then add(sym) end
  end
  for _, dir in ipairs(core.search_paths()) do
    local p = io.popen('ls "' .. dir .. '/elements" 2>/dev/null')
    if p then
      for name in p:lines() do
        local sym = name:match("^(%u%l?)%.lua$")
        if sym then add(sym) end
      end
      p:close()
    end
  end
  table.sort(list)
  return list
end

-- Ligand files hold the complexes and solids they form with metals, so they
-- load after the metals (definition-file format, "Where species go").
local LIGAND_ORDER = { Cl = 1, S = 2, C = 3, N = 4, P = 5, F = 6 }

local function temperature(opts, where)
  if opts.T and opts.T_C then error(where .. ": give T (K) or T_C (C), not both", 3) end
  local T = opts.T or (opts.T_C and opts.T_C + T0C) or 298.15
  if type(T) ~= "number" or T ~= T then error(where .. ": temperature must be a number", 3) end
  return T
end

local function pressure(opts, T, where)
  if opts.P ~= nil then
    if type(opts.P) ~= "number" then error(where .. ": P must be a number (bar)", 3) end
    return opts.P
  end
  local P, err = core.default_pressure(T)
  if not P then error(where .. ": " .. err, 3) end
  return P
end

--- A species library: the built-in H/O species plus the element files named.
--   phlox.library { "Fe", "Cl", user = { "my/Fe-extra.lua" } }
-- The user's folders (--path, PHLOX_PATH) override built-in element files;
-- `user` files add, replace or exclude species.  Complexes of metals that
-- are not loaded are left out.  Errors name the file, line and field.
function phlox.library(spec)
  if type(spec) == "string" then spec = { spec } end
  assert(type(spec) == "table", "phlox.library: give a list of element symbols")
  local db = core.database(spec.dielectric)
  local elements = {}
  for i, sym in ipairs(spec) do
    if type(sym) ~= "string" or not sym:match("^%u%l?$") then
      error(("phlox.library: entry %d is not an element symbol: %s"):format(i, tostring(sym)), 2)
    end
    elements[#elements + 1] = sym
  end
  local order = {}
  for _, e in ipairs(elements) do order[#order + 1] = e end
  table.sort(order, function(a, b)
    local la, lb = LIGAND_ORDER[a] or 0, LIGAND_ORDER[b] or 0
    if la ~= lb then return la < lb end
    return a < b
  end)
  local filter = { "H", "O" }
  for _, e in ipairs(elements) do filter[#filter + 1] = e end
  local files, sources = {}, {}
  local function load(rel, opts)
    local text, where = phlox.read_library_file(rel)
    if not text then error("phlox.library: " .. where, 3) end
    local ok, msg, problems = db:load(text, where, opts)
    if not ok then
      local lines = {}
      for _, p in ipairs(problems or {}) do
        if p.severity == "error" then lines[#lines + 1] = p.text end
      end
      error("phlox.library: " .. (#lines > 0 and table.concat(lines, "\n") or msg), 3)
    end
    sources[where] = provenance.record_file(where, text).sha256
    files[#files + 1] = where
  end
  load("elements/HO.lua", { elements = filter })
  for _, e in ipairs(order) do load("elements/" .. e .. ".lua", { elements = filter }) end
  for _, path in ipairs(spec.user or {}) do
    local f, err = io.open(path, "rb")
    if not f then error("phlox.library: " .. err, 2) end
    local text = f:read("a")
    f:close()
    local ok, msg = db:load(text, path, { elements = filter, user = true })
    if not ok then error("phlox.library: " .. msg, 2) end
    sources[path] = provenance.record_file(path, text).sha256
    files[#files + 1] = path
  end
  return setmetatable({ db = db, elements = elements, files = files, sources = sources }, phlox.Library)
end

phlox.Library = {}
phlox.Library.__index = phlox.Library

--- Species record (a table) by formula, or nil.
function phlox.Library:species(formula) return self.db:species(formula) end

--- All species as records, optionally only those containing an element.
function phlox.Library:list(element)
  local out = {}
  for i = 1, self.db:count() do
    local s = self.db:species(i)
    if not element or s.elements[element] then out[#out + 1] = s end
  end
  return out
end

--- Standard-state properties of a species at T (K) [and P (bar)]:
-- { G, H, S, Cp, V } in J/mol, J/(mol K), J/bar.
function phlox.Library:props(formula, opts)
  opts = opts or {}
  local T = temperature(opts, "props")
  local r, err = self.db:props(formula, T, pressure(opts, T, "props"))
  if not r then error("props: " .. err, 2) end
  return r
end

--- Reaction properties at T: { dG, dH, dS, logK, E (V vs SHE, half
-- reactions only), T, P, text }.
function phlox.Library:reaction(text, opts)
  opts = opts or {}
  local T = temperature(opts, "reaction")
  local r, err = self.db:reaction(text, T, pressure(opts, T, "reaction"))
  if not r then error(err, 2) end
  return r
end

--- Properties of water at T [and P]: density, dielectric constant,
-- Debye-Hueckel A and B, Born functions, pKw (IAPWS R11-07).
function phlox.water(opts)
  opts = opts or {}
  local T = temperature(opts, "water")
  local w, err = core.water(T, pressure(opts, T, "water"))
  if not w then error(err, 2) end
  return w
end

--- The species of `elements` (a list of symbols) whose log K has no
-- temperature data (a log K record without dH or logK_T): phlox keeps their
-- 25 C value at T.  Found numerically, by comparing log K at (T, P) with log K
-- at 25 C and 1 bar.  P defaults to max(1 bar, saturation).  Sorted formulas.
local T_REF, P_REF = 298.15, 1.0   -- K, bar: where log K records are given
local NEAR_T_REF = 0.5             -- K: closer than this to 25 C, nothing is held
local SAME_LOGK = 1e-12            -- log K this close to its 25 C value is held
-- The answer is kept per library, elements, T and P (a sweep asks the same
-- question for every ligand level); opts.cache = false recomputes it.
function phlox.constant_logk(lib, elements, T, P, opts)
  if getmetatable(lib) ~= phlox.Library then error("phlox.constant_logk: library expected", 2) end
  P = P or pressure({}, T, "phlox.constant_logk")
  local key = ("%s|%.17g|%.17g|%d"):format(table.concat(elements, ","), T, P, lib.db:count())
  local cached = lib._held and lib._held[key]
  if cached and not (opts and opts.cache == false) then return table.move(cached, 1, #cached, 1, {}) end
  local held, seen = {}, {}
  if math.abs(T - T_REF) <= NEAR_T_REF then return held end
  for _, el in ipairs(elements) do
    for _, s in ipairs(lib:list(el)) do
      if s.model == "logk" and s.reaction and not seen[s.formula] then
        seen[s.formula] = true
        local a = lib.db:reaction(s.reaction, T_REF, P_REF)
        local b = lib.db:reaction(s.reaction, T, P)
        if a and b and math.abs(a.logK - b.logK) < SAME_LOGK then held[#held + 1] = s.formula end
      end
    end
  end
  table.sort(held)
  lib._held = lib._held or {}
  lib._held[key] = table.move(held, 1, #held, 1, {})
  return held
end

-- Away from 25 C a reader must know which fields, present or missing, rest
-- on 25 C constants.  held_logk lists them, or refuses the map when
-- opts.require_temperature_data is set (before any work is done);
-- stamp_held names them in map.constant_logk and a stamp line.
local function held_logk(lib, elements, T, P, opts, where)
  local held = phlox.constant_logk(lib, elements, T, P)
  if #held > 0 and opts.require_temperature_data then
    error(("%s: require_temperature_data: no temperature data (log K held at 25 °C) for %s"):format(
      where, table.concat(held, ", ")), 3)
  end
  return held
end

local function stamp_held(m, held)
  if #held == 0 then return end
  m.constant_logk = held
  m.stamp = m.stamp or {}
  m.stamp[#m.stamp + 1] = "log K held at 25 °C (no temperature data): " .. table.concat(held, ", ")
end

local function window_of(opts, xname, yname)
  local ranges = { pH = opts.pH_range or { 0, 14 }, E = opts.E_range or { -2, 2 },
                   loga = opts.loga_range or { -8, 0 } }
  local x, y = ranges[xname], ranges[yname]
  return { x[1], x[2], y[1], y[2] }
end

--- An exact predominance map (fields as polygons, boundaries with their
-- reactions, water lines, neutral pH, corrosion domains).
--   phlox.map { library = lib, element = "Fe", T_C = 25,
--               pH_range = {0, 14}, E_range = {-2, 2}, activity = 1e-6,
--               ligand = "S", ligand_activity = 1e-3, ionic_strength = 0,
--               exclude = {"Fe3O4(s)"}, axes = {"pH", "E"} }
function phlox.map(opts)
  assert(type(opts) == "table", "phlox.map: options table expected")
  local lib = opts.library
  if getmetatable(lib) ~= phlox.Library then error("phlox.map: library = phlox.library{...} expected", 2) end
  if type(opts.element) ~= "string" then error("phlox.map: element (a symbol) expected", 2) end
  local T = temperature(opts, "phlox.map")
  local P = pressure(opts, T, "phlox.map")
  local held = held_logk(lib, { opts.element, opts.ligand }, T, P, opts, "phlox.map")
  local axes = opts.axes or { "pH", "E" }
  local copt = {
    element = opts.element, T = T, P = P, x = axes[1], y = axes[2],
    window = window_of(opts, axes[1], axes[2]),
    pH = opts.pH, E = opts.E, activity = opts.activity,
    ligand = opts.ligand, ligand_activity = opts.ligand_activity,
    gas_log_f = opts.gas_log_f, ionic_strength = opts.ionic_strength,
    exclude = opts.exclude, only = opts.only, activities = opts.activities,
  }
  local m, err = core.map(lib.db, copt)
  if not m then error(err, 2) end
  m.conditions = {
    T_C = T - T0C, P_bar = P, activity = opts.activity or 1e-6,
    ionic_strength = opts.ionic_strength or 0,
    ligand = opts.ligand, ligand_activity = opts.ligand and (opts.ligand_activity or 1e-3) or nil,
  }
  m.files = lib.files
  m.provenance = provenance.of_result(lib, { opts.element, opts.ligand }, m.conditions, opts)
  stamp_held(m, held)
  return m
end

--- Full speciation of a water.
--   phlox.speciate { library = lib, T_C = 25,
--     totals = { Ca = 1e-3, C = 2e-3 },        -- mol/kg of each element
--     pH = 8.3,                                -- fixed; omit for charge balance
--     E = 0.2 | pe = 3 | redox_gas = "O2(g)", redox_log_f = -0.68,
--     fugacities = { ["CO2(g)"] = -3.4 },      -- log10 bar, replaces that element's total
--     fixed = { ["Cl^-"] = -2 },               -- log10 activity of a basis species
--     solids = true, suppress = {...}, exclude = {...},
--     activity = "davies" | "bdot" | "ideal" | "sit" }
-- Returns a table (pH, pe, E, ionic_strength, species, elements with each
-- species' share, solids' saturation index and amount), or nil, message,
-- info when the solver does not converge.
function phlox.speciate(opts)
  assert(type(opts) == "table", "phlox.speciate: options table expected")
  local lib = opts.library
  if getmetatable(lib) ~= phlox.Library then error("phlox.speciate: library = phlox.library{...} expected", 2) end
  local T = temperature(opts, "phlox.speciate")
  local P = pressure(opts, T, "phlox.speciate")
  local copt = {}
  for k, v in pairs(opts) do copt[k] = v end
  copt.library, copt.T_C = nil, nil
  copt.T, copt.P = T, P
  local r, err, info = core.speciate(lib.db, copt)
  if not r then return nil, err, info end
  r.T_C = T - T0C
  local els = {}
  for e in pairs(opts.totals or {}) do els[#els + 1] = e end
  for _, f in ipairs({ opts.fugacities or {}, opts.fixed or {} }) do
    for formula in pairs(f) do
      for e in tostring(formula):gmatch("%u%l?") do els[#els + 1] = e end
    end
  end
  table.sort(els)
  r.provenance = provenance.of_result(lib, els, { T_C = r.T_C, P_bar = P }, opts)
  return r
end

--- A rigorous map: the speciation solver at every node of a pH-E grid
-- (mass balance of the element and of a ligand, activity coefficients,
-- solids), boundaries traced between nodes and refined by bisection.  A
-- node is marked by the element's precipitated solid, else by the
-- dissolved species holding most of it.
--   phlox.grid_map { library = lib, element = "Cu", T_C = 25, total = 1e-6,
--                    ligand = "Cl", ligand_total = 1e-2, n = 201,
--                    pH_range = {0, 14}, E_range = {-2, 2},
--                    activity = "davies", threads = 2 }
-- Returns a map table with `boundaries` (polylines between named species),
-- `fields` = {} (no polygons: draw it with phlox.plot.overlay next to an
-- exact map), `labels` (node labels), `species` and solver statistics.
function phlox.grid_map(opts)
  assert(type(opts) == "table", "phlox.grid_map: options table expected")
  local lib = opts.library
  if getmetatable(lib) ~= phlox.Library then error("phlox.grid_map: library = phlox.library{...} expected", 2) end
  local T = temperature(opts, "phlox.grid_map")
  local P = pressure(opts, T, "phlox.grid_map")
  local held = held_logk(lib, { opts.element, opts.ligand }, T, P, opts, "phlox.grid_map")
  local pr, er = opts.pH_range or { 0, 14 }, opts.E_range or { -2, 2 }
  local g, err = core.grid_map(lib.db, {
    element = opts.element, T = T, P = P, window = { pr[1], pr[2], er[1], er[2] },
    nx = opts.nx or opts.n or 101, ny = opts.ny or opts.n or 101,
    total = opts.total, ligand = opts.ligand, ligand_total = opts.ligand_total,
    activity = opts.activity, background_nacl = opts.background_nacl,
    exclude = opts.exclude, threads = opts.threads })
  if not g then error(err, 2) end
  g.fields = {}
  g.conditions = { T_C = T - T0C, P_bar = P, total = opts.total or 1e-6,
                   ligand = opts.ligand, ligand_total = opts.ligand and (opts.ligand_total or 1e-3) or nil }
  g.label = "rigorous"
  local els = { opts.element, opts.ligand or "H" }
  if opts.background_nacl then els[#els + 1] = "Na"; els[#els + 1] = "Cl" end
  g.provenance = provenance.of_result(lib, els, g.conditions, opts)
  stamp_held(g, held)
  return g
end

--- The species of the map at a point, e.g. phlox.locate(map, 7.0, -0.4).
function phlox.locate(map, x, y)
  for _, f in ipairs(map.fields) do
    local inside, n = false, #f.x
    local j = n
    for i = 1, n do
      local xi, yi, xj, yj = f.x[i], f.y[i], f.x[j], f.y[j]
      if ((yi > y) ~= (yj > y)) and (x < (xj - xi) * (y - yi) / (yj - yi) + xi) then inside = not inside end
      j = i
    end
    if inside then return f.species, f end
  end
  return nil
end

--- Reference electrodes: name -> { name, offset (V vs SHE at 25 C), source }.
function phlox.electrodes()
  local out = {}
  for _, e in ipairs(core.electrodes()) do out[e.name] = e end
  return out
end

--- A potential measured against a reference electrode, on the SHE scale.
function phlox.to_she(E_measured, electrode)
  local e = phlox.electrodes()[electrode]
  if not e then error("unknown reference electrode '" .. tostring(electrode) .. "'", 2) end
  return E_measured + e.offset
end

--- Diagrams on top of speciate and map (stdlib/phlox/diagrams.lua): which
-- field a potential measured against a reference electrode falls in, and
-- fraction and solubility curves and temperature series of maps.
--   phlox.where { map = m, pH = 5, E = -0.80, reference = "SCE" }
function phlox.where(opts) return require("phlox.diagrams").where(opts) end
function phlox.fractions(opts) return require("phlox.diagrams").fractions(opts) end
function phlox.solubility(opts) return require("phlox.diagrams").solubility(opts) end
function phlox.series(opts) return require("phlox.diagrams").series(opts) end

return phlox
