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

-- The one option reader (src/lua/l_opts.c): each public function lists its
-- keys next to it, one line per key: name = "type" or {"type", lo, hi}.
-- Unknown keys, wrong types and values out of range are errors at the
-- caller's line.  See DEVELOPERS.md, "Options".
local options = core.options
local LIM = core.limits
local T_OPTS = {
  T = { "number", LIM.T_min, LIM.T_max },                 -- K
  T_C = { "number", LIM.T_min - T0C, LIM.T_max - T0C },   -- degrees C
  P = { "number", 1e-6, LIM.P_max },                      -- bar
}
-- Ranges in the user's units (the C bindings check the same):
local ACT = { 1e-300, 10 }   -- an activity: positive; above 10 no model holds (common practice, no source)
local I_MAX = 0.5            -- mol/kg: Davies equation, stated range (Davies 1962, from memory of Stumm and Morgan)
local COORD = 1e3            -- |pH|, |E| (V), |log a| of a window: a guard
local TOTAL_MAX = 20         -- mol/kg: common practice, no source
phlox.option_specs = {}      -- function name -> spec (phlox.help lists them)
local function spec(fname, t, with_T)
  if with_T then for k, v in pairs(T_OPTS) do t[k] = v end end
  phlox.option_specs[fname] = t
  return t
end
phlox.options = function(fname, sp, opts)
  if opts == nil then opts = {} end
  return options(fname, sp, opts)
end

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
    if core.file_kind(path) then
      -- regular files only, at most the element-file size cap (src/data/load.c)
      local text, err = core.read_file(path)
      if not text then return nil, err end
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
    for _, name in ipairs(core.list_dir(dir .. "/elements") or {}) do -- opendir, no shell
      local sym = name:match("^(%u%l?)%.lua$")
      if sym then add(sym) end
    end
  end
  table.sort(list)
  return list
end

--- Folders without a shell (opendir and mkdir in C, src/lua/l_fs.c): names
-- with quotes, spaces or "$(...)" are only names.
--   phlox.make_dir("out/figures")   -- with its parents; mode 0777 less the umask
--   phlox.list_dir("out")           -- sorted names, or nil, message
function phlox.make_dir(path)
  core.check_value("phlox.make_dir", "path", path, "string")
  local ok, err = core.make_dir(path, true)
  if not ok then core.user_error("phlox.make_dir: " .. err) end
  return path
end

function phlox.list_dir(path)
  core.check_value("phlox.list_dir", "path", path, "string")
  return core.list_dir(path)
end

-- Ligand files hold the complexes and solids they form with metals, so they
-- load after the metals (definition-file format, "Where species go"), in
-- the order `phlox check` holds them to (core.ligand_order, src/data/check.c).
local LIGAND_ORDER = {}
for i, sym in ipairs(core.ligand_order()) do LIGAND_ORDER[sym] = i end
-- Polyatomic ligands (docs/element-files.md): a group file
-- stdlib/elements/<group>.lua, loaded after the element files of its
-- elements, which a library naming the group loads too.
local LIGAND_GROUPS = { CN = { "C", "N" } }
local GROUP_NAMES = {}
for g in pairs(LIGAND_GROUPS) do GROUP_NAMES[#GROUP_NAMES + 1] = g end
table.sort(GROUP_NAMES)

--- The ligand groups whose formula appears in a text, in name order:
-- phlox.groups_in("Au(CN)2^- + e- = Au(s) + 2 CN^-") -> { "CN" }.  A group
-- name followed by a lower-case letter is another symbol ("CNo" is not CN).
function phlox.groups_in(text)
  local out = {}
  for _, g in ipairs(GROUP_NAMES) do
    for rest in text:gmatch(g .. "(.?)") do
      if not rest:match("%l") then out[#out + 1] = g; break end
    end
  end
  return out
end

-- The element symbols of a ligand ("Cl" -> {"Cl"}, "CN" -> {"C", "N"}).
local function ligand_elements(ligand)
  local out = {}
  if type(ligand) == "string" then
    for sym in ligand:gmatch("%u%l?") do out[#out + 1] = sym end
  end
  return out
end

local function temperature(opts, where)
  if opts.T and opts.T_C then core.user_error(where .. ": give T (K) or T_C (C), not both") end
  return opts.T or (opts.T_C and opts.T_C + T0C) or 298.15
end

local function pressure(opts, T, where)
  if opts.P ~= nil then return opts.P end
  local P, err = core.default_pressure(T)
  if not P then core.user_error(where .. ": " .. err) end
  return P
end

local function check_library(where, lib)
  if getmetatable(lib) ~= phlox.Library then
    core.user_error(where .. ": library = phlox.library{...} expected, got " .. type(lib))
  end
end


--- A species library: the built-in H/O species plus the element files named.
--   phlox.library { "Fe", "Cl", user = { "my/Fe-extra.lua" } }
-- The user's folders (--path, PHLOX_PATH) override built-in element files;
-- `user` files add, replace or exclude species.  Complexes of metals that
-- are not loaded are left out.  Errors name the file, line and field.
local LIBRARY_OPTS = spec("phlox.library", {
  ["*"] = "string",                     -- element symbols, {"Fe", "S"}
  user = "strings",                     -- user files that add, replace or exclude species
  dielectric = "fernandez|johnson-norton", -- water's dielectric constant: Fernandez et al. 1997 (IAPWS R8-97) or Johnson and Norton 1991
})
local library_build
function phlox.library(spec_)
  local spec = spec_
  if type(spec) == "string" then spec = { spec } end
  if type(spec) ~= "table" then core.user_error("phlox.library: give a list of element symbols, got " .. type(spec)) end
  options("phlox.library", LIBRARY_OPTS, spec)
  return library_build(spec, {})
end

-- the library of spec, with the element files of model_elements loaded too
-- (for isocoulombic model reactions only; not in lib.elements)
function library_build(spec, model_elements)
  local db = core.database(spec.dielectric)
  local elements, groups, listed = {}, {}, {}
  local function add_element(sym)
    if not listed[sym] then listed[sym] = true; elements[#elements + 1] = sym end
  end
  for i, sym in ipairs(spec) do
    if type(sym) == "string" and LIGAND_GROUPS[sym] then
      groups[#groups + 1] = sym
      for _, e in ipairs(LIGAND_GROUPS[sym]) do add_element(e) end
    elseif type(sym) ~= "string" or not sym:match("^%u%l?$") then
      core.user_error(("phlox.library: entry %d is not an element symbol or a ligand group (%s): '%s'"):format(
        i, table.concat(GROUP_NAMES, ", "), tostring(sym)))
    else
      add_element(sym)
    end
  end
  local order = {}
  for _, e in ipairs(elements) do order[#order + 1] = e end
  for _, e in ipairs(model_elements) do -- loaded for model reactions only
    if not listed[e] then order[#order + 1] = e end
  end
  table.sort(order, function(a, b)
    local la, lb = LIGAND_ORDER[a] or 0, LIGAND_ORDER[b] or 0
    if la ~= lb then return la < lb end
    return a < b
  end)
  local filter = { "H", "O" }
  for _, e in ipairs(order) do filter[#filter + 1] = e end
  local files, sources = {}, {}
  local function load(rel, opts)
    local text, where = phlox.read_library_file(rel)
    if not text then core.user_error("phlox.library: " .. where) end
    local ok, msg, problems = db:load(text, where, opts)
    if not ok then
      local lines = {}
      for _, p in ipairs(problems or {}) do
        if p.severity == "error" then lines[#lines + 1] = p.text end
      end
      core.user_error("phlox.library: " .. (#lines > 0 and table.concat(lines, "\n") or msg))
    end
    sources[where] = provenance.record_file(where, text).sha256
    files[#files + 1] = where
  end
  load("elements/HO.lua", { elements = filter })
  for _, e in ipairs(order) do load("elements/" .. e .. ".lua", { elements = filter }) end
  for _, g in ipairs(groups) do load("elements/" .. g .. ".lua", { elements = filter }) end
  for _, path in ipairs(spec.user or {}) do
    local text, err = core.read_file(path) -- regular files only, size cap
    if not text then core.user_error("phlox.library: " .. err) end
    local ok, msg = db:load(text, path, { elements = filter, user = true })
    if not ok then core.user_error("phlox.library: " .. msg) end
    sources[path] = provenance.record_file(path, text).sha256
    files[#files + 1] = path
  end
  local lib = setmetatable({ db = db, elements = elements, files = files, sources = sources }, phlox.Library)
  -- an isocoulombic model reaction (docs/element-files.md) may name another
  -- metal's complex: its element files are loaded too (lib.model_elements)
  local extra = phlox.model_elements(lib, filter)
  if #extra > 0 then
    local more = {}
    for _, e in ipairs(model_elements) do more[#more + 1] = e end
    for _, e in ipairs(extra) do more[#more + 1] = e end
    return library_build(spec, more)
  end
  if #model_elements > 0 then lib.model_elements = model_elements end
  return lib
end

--- Elements (not in `loaded`) of species that the isocoulombic model
--  reactions of lib's species name but lib lacks; sorted, {} if none.
function phlox.model_elements(lib, loaded)
  local have, want, out = {}, {}, {}
  for _, e in ipairs(loaded) do have[e] = true end
  for _, s in ipairs(lib:list()) do
    if s.estimate_model then
      for term in (s.estimate_model:gsub(" = ", " + ") .. " + "):gmatch("(.-) %+ ") do
        local f = term:match("^[%d/.]+ (.+)$") or term
        if f ~= "e-" and not lib:species(f) then
          for sym in f:gsub("%^.*$", ""):gsub("%(.-%)", ""):gmatch("%u%l?") do
            if not have[sym] and not want[sym] then want[sym] = true; out[#out + 1] = sym end
          end
        end
      end
    end
  end
  table.sort(out)
  return out
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

--- The publications the loaded records cite, each once: a list of
--- { key = "NBS82", short = "Wagman et al. 1982", cite = "<full citation>" }
--- in the order first cited.  A record's `source` names them as "[KEY]" and
--- its `refs` lists the keys.
function phlox.Library:references() return self.db:references() end

-- props and reaction: one argument (a formula or an equation) and T, P options
local function at_TP(lib, method, what, arg, opts)
  local fname = "Library:" .. method
  check_library(fname, lib)
  core.check_value(fname, what, arg, "string")
  opts = phlox.options(fname, phlox.option_specs[fname], opts)
  local T = temperature(opts, fname)
  local r, err = lib.db[method](lib.db, arg, T, pressure(opts, T, fname))
  if not r then core.user_error(fname .. ": " .. err) end
  return r
end

spec("Library:props", {}, true)
--- Standard-state properties of a species at T (K) [and P (bar)]:
-- { G, H, S, Cp, V } in J/mol, J/(mol K), J/bar.
function phlox.Library:props(formula, opts) return at_TP(self, "props", "formula", formula, opts) end

spec("Library:reaction", {}, true)
--- Reaction properties at T: { dG, dH, dS, logK, E (V vs SHE, half
-- reactions only), T, P, text }.
function phlox.Library:reaction(text, opts) return at_TP(self, "reaction", "equation", text, opts) end

--- Properties of water at T [and P]: density, dielectric constant,
-- Debye-Hueckel A and B, Born functions, pKw (IAPWS R11-07).
local WATER_OPTS = spec("phlox.water", {}, true)
function phlox.water(opts)
  opts = phlox.options("phlox.water", WATER_OPTS, opts)
  local T = temperature(opts, "phlox.water")
  local w, err = core.water(T, pressure(opts, T, "phlox.water"))
  if not w then core.user_error("phlox.water: " .. err) end
  return w
end

local T_REF = 298.15               -- K: where log K records are given
local NEAR_T_REF = 0.5             -- K: closer than this to 25 C, nothing is held
local function made_of(s, only)
  if not only then return true end
  for el in pairs(s.elements) do
    if el ~= "H" and el ~= "O" and not only[el] then return false end
  end
  return true
end

-- The records of a library whose basis is not "measured", gathered once per
-- library (a sweep asks the same question for every point); rebuilt if the
-- species count changes (db:remove, db:load) or when fresh is true.
local basis_cache = setmetatable({}, { __mode = "k" })
local function unmeasured(lib, fresh)
  local n = lib.db:count()
  local c = basis_cache[lib]
  if c and c.n == n and not fresh then return c.recs end
  local recs = {}
  for i = 1, n do
    local s = lib.db:species(i)
    if s.basis ~= "measured" then recs[#recs + 1] = s end
  end
  basis_cache[lib] = { n = n, recs = recs }
  return recs
end

local function basis_list(lib, elements, T, basis, opts)
  local out = {}
  if math.abs(T - T_REF) <= NEAR_T_REF then return out end
  local only = opts and opts.only
  local wanted = {}
  for _, el in ipairs(elements) do wanted[el] = true end
  for _, s in ipairs(unmeasured(lib, opts and opts.cache == false)) do
    local has = false
    for el in pairs(s.elements) do has = has or wanted[el] == true end
    if has and s.basis == basis and made_of(s, only) then out[#out + 1] = s end
  end
  table.sort(out, function(a, b) return a.formula < b.formula end)
  return out
end

--- The species of `elements` (a list of symbols) whose log K has no
-- temperature data (a log K record without dH, logK_T or an estimate): phlox
-- keeps their 25 C value at T.  Read from each record's temperature basis
-- (species.basis == "held", set by the core from the record's fields).
-- Empty within 0.5 K of 25 C.  Sorted formulas.  P is accepted for
-- compatibility and not used (the basis does not depend on P).  opts
-- (optional): only = a set of element symbols (species with any other
-- element besides H and O are left out); cache = false re-reads the records
-- (otherwise they are gathered once per library).
local BASIS_OPTS = {
  only = "table",                             -- a set of element symbols
  cache = "boolean",                          -- false: re-read the records
}
spec("phlox.constant_logk", BASIS_OPTS)
spec("phlox.estimated_species", BASIS_OPTS)
local function check_basis_args(fname, lib, elements, T, P, opts)
  check_library(fname, lib)
  core.check_value(fname, "elements", elements, "strings")
  core.check_value(fname, "T (K)", T, "number", LIM.T_min, LIM.T_max)
  if P ~= nil then core.check_value(fname, "P (bar)", P, "number", 1e-6, LIM.P_max) end
  if opts ~= nil then options(fname, BASIS_OPTS, opts) end
end
function phlox.constant_logk(lib, elements, T, P, opts)
  check_basis_args("phlox.constant_logk", lib, elements, T, P, opts)
  local held = {}
  for _, s in ipairs(basis_list(lib, elements, T, "held", opts)) do held[#held + 1] = s.formula end
  return held
end

--- The species of `elements` whose temperature dependence is estimated by a
-- named method (species.basis == "estimated"): { { formula, method }, ... }
-- sorted by formula; empty within 0.5 K of 25 C; opts as for constant_logk.
function phlox.estimated_species(lib, elements, T, opts)
  check_basis_args("phlox.estimated_species", lib, elements, T, nil, opts)
  local out = {}
  for _, s in ipairs(basis_list(lib, elements, T, "estimated", opts)) do
    out[#out + 1] = { formula = s.formula, method = s.basis_method or "?" }
  end
  return out
end

local STOP_HINT = "pass accept_held_logk = true to use the 25 °C constants anyway (the stamp names them), " ..
  "or give temperature data (dH, logK_T, or estimate = \"isocoulombic\") for them in a user data file " ..
  "(phlox --path DIR; docs/element-files.md)"
--- Away from 25 C a reader must know which fields rest on 25 C constants or
-- on estimated temperature functions.  phlox.temperature_notes checks the
-- species of `elements` at every temperature of `temps` (K): a species held
-- at its 25 C log K stops the work (before any is done) unless
-- opts.accept_held_logk is true; it returns the held formulas, the estimated
-- { formula, method } and the stamp lines naming both.  `elements` are the
-- elements of the result's own system (an entry may be a ligand group, "CN"
-- for C and N); only species made of them (with H and O) are named, unless
-- `only` (a set of symbols) says otherwise: a species of another element
-- that a loaded file defines is not part of the result.  `species` (a set
-- of formulas, optional): the species the result's system holds, once it
-- is known (a speciation's r.species); no other is named.
function phlox.temperature_notes(lib, elements, temps, opts, where, only, species)
  if opts and opts.require_temperature_data ~= nil then
    error(("%s: require_temperature_data is gone: stopping on a log K held at 25 °C is now the default; " ..
      "pass accept_held_logk = true to accept such constants"):format(where), 0)
  end
  local els, set = {}, {}
  for _, e in ipairs(elements) do
    for sym in tostring(e):gmatch("%u%l?") do
      if not set[sym] then set[sym] = true; els[#els + 1] = sym end
    end
  end
  elements, only = els, only or set
  local held, est, hseen, eseen, at = {}, {}, {}, {}, {}
  for _, T in ipairs(temps) do
    for _, f in ipairs(phlox.constant_logk(lib, elements, T, nil, { only = only })) do
      if not species or species[f] then -- in the system
        if not hseen[f] then hseen[f] = true; held[#held + 1] = f end
        at[#at + 1] = T
      end
    end
    for _, e in ipairs(phlox.estimated_species(lib, elements, T, { only = only })) do
      if not eseen[e.formula] and (not species or species[e.formula]) then
        eseen[e.formula] = true; est[#est + 1] = e
      end
    end
  end
  table.sort(held)
  table.sort(est, function(a, b) return a.formula < b.formula end)
  if #held > 0 and not (opts and opts.accept_held_logk) then
    error(("%s: no temperature data for %s: its log K would be held at the 25 °C value at %g °C. Either %s"):format(
      where, table.concat(held, ", "), at[1] - 273.15, STOP_HINT), 0)
  end
  -- lines.short[line]: the short form printed by short stamps (phlox.plot)
  local lines = { short = {} }
  if #held > 0 then
    local text, short = phlox.held_stamp_line(held)
    lines[#lines + 1] = text
    lines.short[text] = short
  end
  if #est > 0 then
    local by, order = {}, {}
    for _, e in ipairs(est) do
      if not by[e.method] then by[e.method] = {}; order[#order + 1] = e.method end
      table.insert(by[e.method], "{" .. e.formula .. "}")
    end
    for _, m in ipairs(order) do
      local text = ("temperature dependence estimated, %s: %s"):format(m, table.concat(by[m], ", "))
      lines[#lines + 1] = text
      lines.short[text] = ("temperature dependence of %d species estimated (%s)"):format(#by[m], m)
    end
  end
  return held, est, lines
end

-- The notes of one map at T; errors name the caller.
local function held_logk(lib, elements, T, opts, where, only, species)
  local ok, held, est, lines = pcall(phlox.temperature_notes, lib, elements, { T }, opts, where, only, species)
  if not ok then error(held, 3) end
  return { held = held, estimated = est, lines = lines }
end

local add_note -- defined below

--- The stamp line naming species whose log K is held at 25 C (each formula
-- typeset) and its short form (printed by short stamps, phlox.plot).
function phlox.held_stamp_line(held)
  local f = {}
  for i, s in ipairs(held) do f[i] = "{" .. s .. "}" end
  return "log K held at 25 °C (no temperature data): " .. table.concat(f, ", "),
         ("log K of %d species held at 25 °C (no temperature data)"):format(#held)
end

-- map.constant_logk (held species, accepted), map.estimated_logk ({ formula,
-- method }) and their stamp lines (with short forms), as notes with keys
-- "held" and "estimated"
local function stamp_held(m, notes)
  if #notes.held > 0 then m.constant_logk = notes.held end
  if #notes.estimated > 0 then m.estimated_logk = notes.estimated end
  for _, l in ipairs(notes.lines) do
    add_note(m, l:find("^log K held") and "held" or "estimated", l, notes.lines.short[l])
  end
end

-- What practice keeps out, and every caveat that changes a result, as
-- stamp lines.  A result carries them in `stamp` (plot stamps, curve
-- stamps) and `notes` ({key, text}); provenance records them for CSV and
-- JSON files (phlox.export).  Warnings also go to stderr, once per text.

--- Ranges of ionic strength (mol/kg) where each activity model is used.
phlox.activity_ranges = {
  ideal = { max = 10 ^ -2.3, source = "from memory of Stumm and Morgan, Aquatic Chemistry, 3rd ed. (1996), "
    .. "table 3.3: the Debye-Hückel limiting law to I = 10^-2.3; unit activity coefficients are no better" },
  davies = { max = 0.5, source = "from memory of Stumm and Morgan, Aquatic Chemistry, 3rd ed. (1996), table 3.3 "
    .. "(Davies equation, I < 0.5)" },
  bdot = { max = 1.0, source = "common practice, no source" },
  sit = { max = 3.5, source = "from memory of Grenthe, Plyasunov and Spahiu 1997, NEA-TDB guidelines "
    .. "(specific ion interaction theory to about I = 3.5 mol/kg)" },
}

local warned = {}
local function warn_once(text, key)
  key = key or text
  if warned[key] then return end
  warned[key] = true
  io.stderr:write("phlox: warning: ", text, "\n")
end

-- `short`: the line's short form for short stamps (map.stamp_short[text]).
function add_note(t, key, text, short)
  t.notes = t.notes or {}
  t.stamp = t.stamp or {}
  if short then
    t.stamp_short = t.stamp_short or {}
    t.stamp_short[text] = short
  end
  for _, n in ipairs(t.notes) do if n.text == text then return end end
  t.notes[#t.notes + 1] = { key = key, text = text }
  t.stamp[#t.stamp + 1] = text
  provenance.record_note(text)
end

--- The activity model at ionic strength I (mol/kg): { model, ionic_strength,
-- max, in_range, source, text }; a model used beyond its range is warned
-- about once on stderr.
function phlox.activity_range(model, I)
  local r = phlox.activity_ranges[model]
  if not r then core.user_error("phlox.activity_range: unknown activity model '" .. tostring(model) .. "'") end
  local info = { model = model, ionic_strength = I, max = r.max, in_range = I <= r.max, source = r.source }
  info.text = ("activity model %s, ionic strength %.3g mol/kg (used to %g mol/kg: %s)"):format(model, I, r.max, r.source)
  if not info.in_range then
    info.warning = ("%s activity coefficients at ionic strength %.3g mol/kg, beyond the model's range "
      .. "(%g mol/kg: %s): results are indicative"):format(model, I, r.max, r.source)
    warn_once(info.warning, "range " .. model)
  end
  return info
end

local function note_activity(t, model, I)
  local a = phlox.activity_range(model, I)
  t.activity = a
  add_note(t, "activity", a.warning and ("WARNING: " .. a.warning) or a.text)
end

--- The sour-service caution, on every output where H2S or HS^- is part of
-- a map or a speciation.
phlox.sour_caution = "sour service: H2S/HS- present; this diagram does not show hydrogen uptake, "
  .. "sulfide stress cracking or hydrogen-induced cracking: defer to the applicable sour-service standards"
local SULFIDE = { ["H2S(aq)"] = true, ["HS^-"] = true, ["S^2-"] = true, ["H2S(g)"] = true }

local function note_sour(t, names)
  for _, n in ipairs(names) do
    if SULFIDE[n] then
      add_note(t, "sour", phlox.sour_caution)
      warn_once(phlox.sour_caution)
      return
    end
  end
end

--- The stamp lines of several results (the solves of a curve or a sweep):
-- each caveat once, skipping the keys in `skip`; the activity line of the
-- largest ionic strength first.
function phlox.merge_notes(results, skip)
  local out, seen, worst = {}, {}, nil
  for _, r in ipairs(results) do
    for _, n in ipairs(r.notes or {}) do
      if n.key == "activity" then
        if r.activity and (not worst or r.activity.ionic_strength > worst.ionic_strength) then worst = r.activity end
      elseif not (skip and skip[n.key]) and not seen[n.text] then
        seen[n.text] = true
        out[#out + 1] = n.text
      end
    end
  end
  if worst then
    table.insert(out, 1, (worst.warning and ("WARNING: " .. worst.warning) or worst.text) .. " (the largest of these results)")
  end
  return out
end

-- A note naming species: each formula in braces, so figures typeset it
-- (provenance.plain drops the braces for tables and terminals).
local function note_list(t, key, what, list)
  if list and #list > 0 then
    local f = {}
    for i, s in ipairs(list) do f[i] = "{" .. tostring(s) .. "}" end
    add_note(t, key, what .. ": " .. table.concat(f, ", "))
  end
end

local function note_ligands(t, text)
  if text then add_note(t, "ligands", "ligand oxidation states: " .. text) end
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
--               exclude = {"Fe3O4(s)"}, axes = {"pH", "E"},
--               ligand_redox = { N = "full", S = "sulfate" } }
-- ligand_redox: per ligand "full" (true), "kept" (false) or a form name
-- (docs/solver.md "What practice keeps out"; N and C kept, S full by
-- default).  The map's `stamp` and `notes` carry every caveat.
local MAP_OPTS = spec("phlox.map", {
  library = "table",                          -- phlox.library{...}
  element = "string",                         -- the element mapped, "Fe"
  axes = "strings",                           -- {"pH", "E"} (default), {"loga", "E"}, {"pH", "loga"}
  pH_range = { "numbers", -COORD, COORD },    -- {0, 14}
  E_range = { "numbers", -COORD, COORD },     -- V vs SHE, {-2, 2}
  loga_range = { "numbers", -COORD, COORD },  -- log a(ligand), {-8, 0}
  pH = { "number", -COORD, COORD },           -- fixed pH (when pH is not an axis)
  E = { "number", -COORD, COORD },            -- fixed E (when E is not an axis)
  activity = { "number", ACT[1], ACT[2] },    -- activity of each dissolved species of the element (1e-6)
  ligand = "string",                          -- a ligand element, "S"
  ligand_activity = { "number", ACT[1], ACT[2] }, -- total ligand activity (1e-3)
  gas_log_f = { "number", -300, 3 },          -- log10 fugacity (bar) of gases
  ionic_strength = { "number", 0, I_MAX },    -- mol/kg, Davies correction
  exclude = "strings",                        -- species left out
  only = "strings",                           -- only these species
  activities = { "map", ACT[1], ACT[2] },     -- per species activity, {["Fe^2+"] = 1e-5}
  accept_held_logk = "boolean",               -- use log K held at 25 C away from 25 C (stamped)
  require_temperature_data = "boolean",       -- gone: phlox.temperature_notes says to use accept_held_logk
  ligand_redox = "table",                     -- {N = "full" | "kept" | form name}
}, true)
local function check_window(where, opts, key)
  local r = opts[key]
  if r ~= nil and not (#r == 2 and r[1] < r[2]) then
    core.user_error(("%s: option '%s' must be {from, to} with from < to"):format(where, key))
  end
end
function phlox.map(opts)
  options("phlox.map", MAP_OPTS, opts)
  local lib = opts.library
  check_library("phlox.map", lib)
  if type(opts.element) ~= "string" then core.user_error("phlox.map: element (a symbol) is required") end
  for _, k in ipairs { "pH_range", "E_range", "loga_range" } do check_window("phlox.map", opts, k) end
  local T = temperature(opts, "phlox.map")
  local P = pressure(opts, T, "phlox.map")
  -- the map uses species of its element and ligand elements only (with H, O):
  -- a species of another element in a ligand's file is not part of it
  local held_of, made_of_set = { opts.element }, { [opts.element] = true }
  for _, e in ipairs(ligand_elements(opts.ligand)) do held_of[#held_of + 1] = e; made_of_set[e] = true end
  local held = held_logk(lib, held_of, T, opts, "phlox.map", made_of_set)
  local axes = opts.axes or { "pH", "E" }
  local copt = {
    element = opts.element, T = T, P = P, x = axes[1], y = axes[2],
    window = window_of(opts, axes[1], axes[2]),
    pH = opts.pH, E = opts.E, activity = opts.activity,
    ligand = opts.ligand, ligand_activity = opts.ligand_activity,
    gas_log_f = opts.gas_log_f, ionic_strength = opts.ionic_strength,
    exclude = opts.exclude, only = opts.only, activities = opts.activities,
    ligand_redox = opts.ligand_redox,
  }
  local m, err = core.map(lib.db, copt)
  if not m then core.user_error(err) end
  note_ligands(m, m.ligand_states)
  note_list(m, "exclude", "left out by the user (exclude)", opts.exclude)
  note_list(m, "only", "only these species of " .. opts.element .. " (only)", opts.only)
  if (opts.ionic_strength or 0) > 0 then note_activity(m, "davies", opts.ionic_strength) end
  local names = {}
  for _, f in ipairs(m.ligand_fields or {}) do names[#names + 1] = f.species end
  for _, f in ipairs(m.fields) do names[#names + 1] = f.species end
  note_sour(m, names)
  m.conditions = {
    T_C = T - T0C, P_bar = P, activity = opts.activity or 1e-6,
    ionic_strength = opts.ionic_strength or 0,
    ligand = opts.ligand, ligand_activity = opts.ligand and (opts.ligand_activity or 1e-3) or nil,
  }
  m.files = lib.files
  -- a ligand group (CN) stamps the files of its elements: its complexes live there
  local els = { opts.element }
  for _, e in ipairs(LIGAND_GROUPS[opts.ligand] or { opts.ligand }) do els[#els + 1] = e end
  m.provenance = provenance.of_result(lib, els, m.conditions, opts)
  stamp_held(m, held)
  m.provenance.notes = m.stamp   -- the caveats travel with the provenance (into sweep results)
  return m
end

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
  held_logk(lib, els, T, opts, "phlox.speciate", only) -- stops before the work
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
  held_logk(lib, els, T, opts, where, only) -- stops before the work
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

--- A rigorous map: the speciation solver at every node of a pH-E grid
-- (mass balance of the element and of a ligand, activity coefficients,
-- solids), boundaries traced between nodes and refined by bisection.  A
-- node is marked by the element's precipitated solid, else by the
-- dissolved species holding most of it.
--   phlox.grid_map { library = lib, element = "Cu", T_C = 25, total = 1e-6,
--                    ligand = "Cl", ligand_total = 1e-2, n = 201,
--                    pH_range = {0, 14}, E_range = {-2, 2},
--                    activity_model = "davies", threads = 2,
--                    ligand_redox = {...}, allow_inhibited = false,
--                    failed_boundaries = false }  -- draw boundaries next to failed solves
-- Returns a map table with `boundaries` (polylines between named species),
-- `fields` (the nodes' cells joined per species, their steps smoothed, so
-- phlox.plot.map fills them like an exact map; see phlox.grid_fields),
-- `water` and `neutral_pH`, `labels` (node labels), `species` and solver
-- statistics.
local GRID_MAP_OPTS = spec("phlox.grid_map", {
  library = "table",                          -- phlox.library{...}
  element = "string",                         -- the element mapped
  total = { "number", ACT[1], TOTAL_MAX },    -- mol/kg of the element (1e-6)
  ligand = "string",                          -- a ligand element
  ligand_total = { "number", ACT[1], TOTAL_MAX }, -- mol/kg of the ligand (1e-3)
  n = { "integer", 2, 4001 },                 -- nodes per axis (101)
  nx = { "integer", 2, 4001 },                -- nodes along pH
  ny = { "integer", 2, 4001 },                -- nodes along E
  pH_range = { "numbers", -COORD, COORD },    -- {0, 14}
  E_range = { "numbers", -COORD, COORD },     -- {-2, 2}
  activity_model = "ideal|davies|bdot|sit",   -- activity coefficients (davies)
  background_nacl = { "number", 0, 6.1 },     -- mol/kg NaCl (halite saturation, from memory of the CRC Handbook)
  exclude = "strings",                        -- species left out
  threads = { "integer", 1, 64 },             -- worker threads
  accept_held_logk = "boolean",               -- use log K held at 25 C away from 25 C (stamped)
  require_temperature_data = "boolean",       -- gone: phlox.temperature_notes says to use accept_held_logk
  ligand_redox = "table",                     -- as phlox.map
  allow_inhibited = "boolean",                -- let kinetically inhibited solids precipitate
  failed_boundaries = "boolean",              -- draw boundaries next to failed solves
}, true)
function phlox.grid_map(opts)
  options("phlox.grid_map", GRID_MAP_OPTS, opts)
  local lib = opts.library
  check_library("phlox.grid_map", lib)
  if type(opts.element) ~= "string" then core.user_error("phlox.grid_map: element (a symbol) is required") end
  for _, k in ipairs { "pH_range", "E_range" } do check_window("phlox.grid_map", opts, k) end
  if LIGAND_GROUPS[opts.ligand] then
    core.user_error(("phlox.grid_map: ligand = %q is a ligand group: the rigorous solver balances elements, not groups; draw it with phlox.map"):format(opts.ligand))
  end
  local T = temperature(opts, "phlox.grid_map")
  local P = pressure(opts, T, "phlox.grid_map")
  -- the grid's system: the element, the ligand and a NaCl background
  local held_of = { opts.element, opts.ligand }
  if opts.background_nacl then held_of[#held_of + 1] = "Na"; held_of[#held_of + 1] = "Cl" end
  local held = held_logk(lib, held_of, T, opts, "phlox.grid_map")
  local pr, er = opts.pH_range or { 0, 14 }, opts.E_range or { -2, 2 }
  local g, err = core.grid_map(lib.db, {
    element = opts.element, T = T, P = P, window = { pr[1], pr[2], er[1], er[2] },
    nx = opts.nx or opts.n or 101, ny = opts.ny or opts.n or 101,
    total = opts.total, ligand = opts.ligand, ligand_total = opts.ligand_total,
    activity_model = opts.activity_model, background_nacl = opts.background_nacl,
    exclude = opts.exclude, threads = opts.threads,
    ligand_redox = opts.ligand_redox, allow_inhibited = opts.allow_inhibited })
  if not g then core.user_error(err) end
  g.fields = phlox.grid_fields(g)
  for _, f in ipairs(g.fields) do   -- the kind, as exact maps name it
    local rec = lib:species(f.species)
    local st, only = rec and rec.state, true
    for e in pairs(rec and rec.elements or {}) do only = only and e == opts.element end
    f.kind = st == "s" and (only and "metal" or "solid") or st == "g" and "gas" or st == "l" and "liquid" or "aqueous"
  end
  -- water lines and neutral pH at T, as exact maps carry them
  local o2 = lib.db:reaction("O2(g) + 4 H^+ + 4 e- = 2 H2O(l)", T, P)
  local kw = lib.db:reaction("H2O(l) = H^+ + OH^-", T, P)
  local slope = core.nernst_slope(T)
  if o2 and o2.E then g.water = { o2 = { a = o2.E, b = -slope }, h2 = { a = 0, b = -slope } } end
  if kw and kw.logK then g.neutral_pH = -kw.logK / 2 end
  note_ligands(g, g.ligand_states)
  note_list(g, "exclude", "left out by the user (exclude)", opts.exclude)
  note_activity(g, opts.activity_model or "davies", g.ionic_strength_max or 0)
  if g.failures > 0 then
    -- a boundary placed next to a point without a solution (a failed node,
    -- or a bisection point) is a guess: left out unless the user asks for it
    local kept, dropped = {}, 0
    for _, b in ipairs(g.boundaries) do
      if not b.through_failed or opts.failed_boundaries then kept[#kept + 1] = b
      else -- keep the runs of points away from the failures
        local run = { between = b.between, x = {}, y = {} }
        for k = 1, #b.x do
          if b.failed_points[k] then
            dropped = dropped + 1
            if #run.x >= 2 then kept[#kept + 1] = run end
            run = { between = b.between, x = {}, y = {} }
          else
            run.x[#run.x + 1], run.y[#run.y + 1] = b.x[k], b.y[k]
          end
        end
        if #run.x >= 2 then kept[#kept + 1] = run end
      end
    end
    g.boundaries = kept
    add_note(g, "failed", ("the solver failed at %d of %d solves; %s"):format(g.failures, g.solves,
      opts.failed_boundaries and "boundaries next to them drawn on request (failed_boundaries = true)"
      or ("%d boundary points next to them left out (failed_boundaries = true draws them)"):format(dropped)))
  end
  -- the grid keeps no ligand species: sulfide takes part unless sulfur
  -- is pinned to sulfate (the C rule's own description says which)
  local st = g.ligand_states or ""
  if opts.ligand == "S" and (st:find("S full redox", 1, true) or st:find("S as sulfide", 1, true)) then
    note_sour(g, { "HS^-" })
  end
  g.conditions = { T_C = T - T0C, P_bar = P, total = opts.total or 1e-6,
                   ligand = opts.ligand, ligand_total = opts.ligand and (opts.ligand_total or 1e-3) or nil }
  g.label = "rigorous"
  local els = { opts.element, opts.ligand or "H" }
  if opts.background_nacl then els[#els + 1] = "Na"; els[#els + 1] = "Cl" end
  g.provenance = provenance.of_result(lib, els, g.conditions, opts)
  stamp_held(g, held)
  g.provenance.notes = g.stamp
  return g
end

--- Field polygons of a rigorous map: each node stands for the cell of the
-- grid around it (half a step each way, clipped to the window); cells with
-- one label are joined and their outline traced counter-clockwise, its
-- steps smoothed (below).  A
-- species in several separate pieces gives several fields; an enclosed
-- hole is left to the field drawn inside it.  Nodes where the solver
-- failed (label 0) belong to no field.
function phlox.grid_fields(g)
  local nx, ny, lab = g.nx, g.ny, g.labels
  local x0, x1, y0, y1 = g.x.min, g.x.max, g.y.min, g.y.max
  local function X(i) return math.min(math.max(x0 + (i - 0.5) * (x1 - x0) / (nx - 1), x0), x1) end
  local function Y(j) return math.min(math.max(y0 + (j - 0.5) * (y1 - y0) / (ny - 1), y0), y1) end
  local function L(i, j)   -- node label, 0-based indices; -1 outside
    if i < 0 or j < 0 or i >= nx or j >= ny then return -1 end
    return lab[j * nx + i + 1]
  end
  -- Corner positions, smoothed: a corner where exactly two labels meet
  -- along a line of cell edges (not on the window's edge, not diagonal)
  -- moves halfway towards the mean of its two neighbours on that line, twice
  -- (Laplacian smoothing, as discussed by Taubin 1995, "A signal processing
  -- approach to fair surface design", SIGGRAPH '95), so the cells' steps
  -- become slopes.  Every field uses the same corner positions, so the
  -- fields still tile the window without gaps.
  local SMOOTH_STEPS, SMOOTH_FACTOR = 2, 0.5   -- our choice (common practice, no source)
  local PX, PY = {}, {}
  local function key(i, j) return i * (ny + 1) + j end
  for i = 0, nx do for j = 0, ny do PX[key(i, j)], PY[key(i, j)] = X(i), Y(j) end end
  local links = {}
  for i = 1, nx - 1 do
    for j = 1, ny - 1 do
      local a, b, c, d = L(i - 1, j - 1), L(i, j - 1), L(i - 1, j), L(i, j)   -- below left, below right, above left, above right
      local nb = {}
      if b ~= d then nb[#nb + 1] = key(i + 1, j) end   -- edge to the right
      if a ~= c then nb[#nb + 1] = key(i - 1, j) end   -- to the left
      if c ~= d then nb[#nb + 1] = key(i, j + 1) end   -- upwards
      if a ~= b then nb[#nb + 1] = key(i, j - 1) end   -- downwards
      local labels = {}
      for _, v in ipairs({ a, b, c, d }) do labels[v] = true end
      local count = 0
      for _ in pairs(labels) do count = count + 1 end
      if #nb == 2 and count == 2 then links[key(i, j)] = nb end
    end
  end
  for _ = 1, SMOOTH_STEPS do
    local nxp, nyp = {}, {}
    for k, nb in pairs(links) do
      local mx, my = (PX[nb[1]] + PX[nb[2]]) / 2, (PY[nb[1]] + PY[nb[2]]) / 2
      nxp[k], nyp[k] = PX[k] + SMOOTH_FACTOR * (mx - PX[k]), PY[k] + SMOOTH_FACTOR * (my - PY[k])
    end
    for k in pairs(nxp) do PX[k], PY[k] = nxp[k], nyp[k] end
  end
  -- directed cell edges with the species on their left, keyed by start vertex
  -- (vertex (i, j) is the corner below and left of node (i, j))
  local fields = {}
  for sp = 1, #g.species do
    local out, count = {}, 0
    local function add(a, b, c, d)
      local k = a * (ny + 1) + b
      out[k] = out[k] or {}
      out[k][#out[k] + 1] = { c, d }
      count = count + 1
    end
    for j = 0, ny - 1 do
      for i = 0, nx - 1 do
        if L(i, j) == sp then
          if L(i, j - 1) ~= sp then add(i, j, i + 1, j) end          -- bottom, left to right
          if L(i + 1, j) ~= sp then add(i + 1, j, i + 1, j + 1) end  -- right, upwards
          if L(i, j + 1) ~= sp then add(i + 1, j + 1, i, j + 1) end  -- top, right to left
          if L(i - 1, j) ~= sp then add(i, j + 1, i, j) end          -- left, downwards
        end
      end
    end
    while count > 0 do
      local start
      for j = 0, ny do
        for i = 0, nx do
          local e = out[i * (ny + 1) + j]
          if e and #e > 0 then start = { i, j }; break end
        end
        if start then break end
      end
      local xs, ys = {}, {}
      local ci, cj, pdx, pdy = start[1], start[2], nil, nil
      repeat
        local e = out[ci * (ny + 1) + cj]
        local pick = 1
        if #e > 1 and pdx then   -- a corner shared diagonally: turn left first
          for q, t in ipairs(e) do
            local dx, dy = t[1] - ci, t[2] - cj
            if pdx * dy - pdy * dx > 0 then pick = q end
          end
        end
        local t = table.remove(e, pick)
        count = count - 1
        local dx, dy = t[1] - ci, t[2] - cj
        if not (pdx == dx and pdy == dy) or links[key(ci, cj)] then
          xs[#xs + 1], ys[#ys + 1] = PX[key(ci, cj)], PY[key(ci, cj)]
        end
        ci, cj, pdx, pdy = t[1], t[2], dx, dy
      until ci == start[1] and cj == start[2]
      local a = core.polygon_area(xs, ys)   -- signed, src/geom
      if a > 0 and #xs >= 3 then   -- outer outlines run counter-clockwise
        fields[#fields + 1] = { species = g.species[sp], kind = "aqueous", x = xs, y = ys, area = a }
      end
    end
  end
  table.sort(fields, function(p, q) return p.area > q.area end)
  local labelled = {}   -- one label per species, on its largest piece
  for _, f in ipairs(fields) do
    if labelled[f.species] then f.label = false else labelled[f.species] = true end
  end
  return fields
end

--- The species of the map at a point, e.g. phlox.locate(map, 7.0, -0.4).
function phlox.locate(map, x, y)
  core.check_value("phlox.locate", "map", map, "table")
  if type(map.fields) ~= "table" then core.user_error("phlox.locate: a map (phlox.map{...}) expected") end
  core.check_value("phlox.locate", "x", x, "number", -COORD, COORD)
  core.check_value("phlox.locate", "y", y, "number", -COORD, COORD)
  local k = core.locate(map.fields, x, y)   -- even-odd rule, src/geom
  if k then return map.fields[k].species, map.fields[k] end
  return nil
end

--- Reference electrodes: name -> { name, offset (V vs SHE at 25 C), dEdT
-- (V/K, the electrode at the test temperature), T_min, T_max (K, where
-- dEdT is used), source, dEdT_source }.
function phlox.electrodes()
  local out = {}
  for i, e in ipairs(core.electrodes()) do e.index = i; out[e.name] = e end
  return out
end

-- Short names used on site for the electrodes of phlox.electrodes().
phlox.electrode_names = {
  SHE = "standard hydrogen electrode",
  SCE = "saturated calomel (Hg/Hg2Cl2, saturated KCl)",
  ["Ag/AgCl"] = "Ag/AgCl, saturated KCl",
  ["Ag/AgCl sat"] = "Ag/AgCl, saturated KCl",
  ["Ag/AgCl 3.5M"] = "Ag/AgCl, 3.5 mol/L KCl",
  CSE = "Cu/CuSO4, saturated",
  ["Cu/CuSO4"] = "Cu/CuSO4, saturated",
}

--- The reference electrode record for a short or full name (errors name
-- the known ones).
function phlox.electrode(name)
  local all = phlox.electrodes()
  local e = all[name] or all[phlox.electrode_names[name] or ""]
  if not e then
    local known = {}
    for k in pairs(phlox.electrode_names) do known[#known + 1] = k end
    table.sort(known)
    core.user_error(("unknown reference electrode '%s' (known: %s, or the full names of phlox.electrodes())")
          :format(tostring(name), table.concat(known, ", ")))
  end
  return e
end

--- The offset (V vs SHE) of an electrode at temperature T (K) and a record
-- of how it was found: { name, offset, T, corrected, valid, text }.
-- Between T_min and T_max the 25 °C offset is corrected with the
-- electrode's temperature coefficient (its source in the text); elsewhere
-- it refuses, unless at_25C is set (the electrode kept at room temperature
-- outside the hot test, thermal junction potential not included).
function phlox.electrode_at(name, T, at_25C, where)
  where = where or "phlox.electrode_at"
  local e = phlox.electrode(name)
  T = T or 298.15
  local info = { name = e.name, T = T, source = e.source }
  if math.abs(T - 298.15) <= 0.5 or e.offset == 0 and e.dEdT == 0 then
    info.offset, info.valid = e.offset, true
    info.text = ("potentials vs %s: offset %.4f V vs SHE (%s)"):format(e.name, e.offset, e.source)
  elseif at_25C then
    info.offset, info.valid = e.offset, false
    info.text = ("potentials vs %s kept at 25 °C (reference_at_25C): offset %.4f V, not corrected to %.1f °C; "
      .. "the thermal junction potential is not included"):format(e.name, e.offset, T - T0C)
  else
    local off, err = core.electrode_offset(e.index, T)
    if not off then
      core.user_error(("%s: %s; the offset is not valid at %.1f °C (give reference_at_25C = true for an electrode kept "
        .. "at room temperature)"):format(where, (err:gsub("(%d+%.%d)%d+", "%1")), T - T0C))
    end
    info.offset, info.valid, info.corrected = off, true, true
    info.text = ("potentials vs %s at %.1f °C: offset %.4f V = %.4f V at 25 °C %+.3g mV/K (%s)"):format(
      e.name, T - T0C, off, e.offset, e.dEdT * 1e3, e.dEdT_source)
  end
  if e.offset ~= 0 then provenance.record_note(info.text) end
  return info
end

--- A potential measured against a reference electrode, on the SHE scale.
--   phlox.to_she(-0.45, "SCE")                  -- 25 °C
--   phlox.to_she(-0.45, "SCE", { T_C = 50 })    -- corrected with dE/dT
--   phlox.to_she(-0.45, "SCE", { T_C = 200, reference_at_25C = true })
-- Returns E_SHE and the record of phlox.electrode_at.
local TO_SHE_OPTS = spec("phlox.to_she", {
  reference_at_25C = "boolean",               -- the electrode is kept at room temperature
}, true)
function phlox.to_she(E_measured, electrode, opts)
  core.check_value("phlox.to_she", "E_measured", E_measured, "number", -COORD, COORD)
  core.check_value("phlox.to_she", "electrode", electrode, "string")
  opts = phlox.options("phlox.to_she", TO_SHE_OPTS, opts)
  local T = temperature(opts, "phlox.to_she")
  local info = phlox.electrode_at(electrode, T, opts.reference_at_25C, "phlox.to_she")
  return E_measured + info.offset, info
end

--- Help at the prompt and in scripts: phlox.help(phlox.map) or
-- phlox.help("plot.map") prints (and returns) what the function does and its
-- options with their types and ranges; phlox.help() lists the functions.
local SUMMARY = {
  ["phlox.library"] = "phlox.library { \"Fe\", \"S\", user = {...} }: a species library from element files",
  ["phlox.map"] = "phlox.map { library = lib, element = \"Fe\", ... }: an exact predominance map",
  ["phlox.grid_map"] = "phlox.grid_map { library = lib, element = \"Cu\", ... }: a rigorous map (solver on a grid)",
  ["phlox.speciate"] = "phlox.speciate { library = lib, totals = {...}, ... }: full speciation of a water",
  ["phlox.speciate_curve"] = "phlox.speciate_curve(opts, curve): speciation along pH, a log total or a log activity (the curve driver)",
  ["phlox.water"] = "phlox.water { T_C = 25 }: properties of water (IAPWS-95, R8-97, R11-07)",
  ["phlox.constant_logk"] = "phlox.constant_logk(lib, elements, T [, P]): species whose log K is held at 25 C (T in K)",
  ["phlox.locate"] = "phlox.locate(map, x, y): the species of the map at a point",
  ["phlox.to_she"] = "phlox.to_she(E_measured, electrode): a potential on the SHE scale (electrode: SCE, Ag/AgCl, CSE or a full name)",
  ["phlox.where"] = "phlox.where { map = m, pH = 5, E = -0.8, reference = \"SCE\" }: the field a measured potential falls in",
  ["phlox.electrodes"] = "phlox.electrodes(): the reference electrodes (name -> offset, source)",
  ["phlox.make_dir"] = "phlox.make_dir(path): create a folder and its parents (no shell)",
  ["phlox.list_dir"] = "phlox.list_dir(path): sorted names in a folder (no shell)",
  ["phlox.help"] = "phlox.help(function or name): this help",
  ["Library:props"] = "lib:props(formula, { T_C = 25 }): G, H, S, Cp, V of a species",
  ["Library:reaction"] = "lib:reaction(\"A + B = C\", { T_C = 25 }): dG, dH, dS, log K, E of a reaction",
  ["plot.map"] = "plot.map(map, { file = \"fe.svg\", ... }): draw a map",
  ["plot.domains"] = "plot.domains(map, opts): draw the corrosion domains of a map",
  ["plot.grid"] = "plot.grid(maps, opts): maps side by side",
  ["plot.overlay"] = "plot.overlay(maps, opts): maps drawn over each other",
  ["plot.curves"] = "plot.curves(series, opts): curves (fractions, solubility)",
  ["export.csv"] = "export.csv(path, rows, { columns = {...} }): a CSV file with provenance",
  ["export.json"] = "export.json(path, value, opts): a JSON file with provenance",
  ["sweep.run"] = "sweep.run(points, fn, opts): fn over points, failures collected",
  ["sweep.parallel"] = "sweep.parallel(points, fn, { workers = 4 }): the same on worker processes",
  ["phlox.report"] = "phlox.report { file = \"study.html\", sections = {...} }: one self-contained HTML (and PDF) page per study",
  ["diagrams.fractions"] = "diagrams.fractions { library = lib, element = \"Zn\", ... }: distribution curves",
  ["diagrams.solubility"] = "diagrams.solubility { library = lib, element = \"Zn\", T_C = {...} }: solubility curves",
  ["diagrams.series"] = "diagrams.series { library = lib, element = \"Zn\", T_C = {...} }: maps at several temperatures",
  ["diagrams.ligand_E"] = "diagrams.ligand_E { ..., ligand = \"Cl\", pH = 5 }: E against log a(ligand)",
  ["diagrams.pH_ligand"] = "diagrams.pH_ligand { ..., ligand = \"Cl\", E = -0.5 }: log a(ligand) against pH",
}

-- every documented function by value -> its name (modules loaded on demand)
local function help_index()
  local by_fn, specs = {}, {}
  local mods = { phlox = phlox, plot = require "phlox.plot", export = require "phlox.export",
                 sweep = require "phlox.sweep", diagrams = require "phlox.diagrams",
                 report = require "phlox.report" }
  for name in pairs(SUMMARY) do
    local mod, fn = name:match("^(%w+)[%.:](.+)$")
    local t = mod == "Library" and phlox.Library or mods[mod]
    if mod == "phlox" and fn == "report" then t, fn = mods.report, "write" end
    if t and type(t[fn]) == "function" then by_fn[t[fn]] = name end
  end
  for _, m in pairs(mods) do
    for k, v in pairs(m.option_specs or {}) do specs[k] = v end
  end
  return by_fn, specs
end

function phlox.help_name(fn)
  local by_fn = help_index()
  return by_fn[fn]
end

local function range_text(e)
  if type(e) == "string" then return e end
  local t, lo, hi = e[1], e[2], e[3]
  if lo or hi then return ("%s [%g, %g]"):format(t, lo or -math.huge, hi or math.huge) end
  return t
end

function phlox.help(what)
  local by_fn, specs = help_index()
  local name = type(what) == "function" and by_fn[what] or what
  local out = {}
  if name == nil then
    out[1] = "phlox functions (phlox.help(name) for one):"
    local names = {}
    for n in pairs(SUMMARY) do names[#names + 1] = n end
    table.sort(names)
    for _, n in ipairs(names) do out[#out + 1] = "  " .. SUMMARY[n] end
  else
    if type(name) ~= "string" then core.user_error("phlox.help: a phlox function or its name expected, got " .. type(what)) end
    name = name:gsub("^phlox%.plot%.", "plot."):gsub("^phlox%.export%.", "export.")
               :gsub("^phlox%.sweep%.", "sweep."):gsub("^phlox%.diagrams%.", "diagrams.")
    if not SUMMARY[name] then
      local near = {}
      for n in pairs(SUMMARY) do if n:lower():find(name:lower(), 1, true) then near[#near + 1] = n end end
      table.sort(near)
      core.user_error(("phlox.help: no function '%s'%s"):format(name,
        #near > 0 and (" (did you mean " .. table.concat(near, ", ") .. "?)") or ""))
    end
    out[1] = SUMMARY[name]
    local spec = specs[name]
    if spec then
      out[#out + 1] = "options:"
      local keys = {}
      for k in pairs(spec) do keys[#keys + 1] = k end
      table.sort(keys)
      for _, k in ipairs(keys) do
        out[#out + 1] = ("  %-26s %s"):format(k == "*" and "[1], [2], ..." or k, range_text(spec[k]))
      end
    end
  end
  local text = table.concat(out, "\n")
  print(text)
  return text
end

--- Diagrams on top of speciate and map (stdlib/phlox/diagrams.lua): which
-- field a potential measured against a reference electrode falls in, and
-- fraction and solubility curves and temperature series of maps.
--   phlox.where { map = m, pH = 5, E = -0.80, reference = "SCE" }
function phlox.where(opts) return require("phlox.diagrams").where(opts) end
function phlox.fractions(opts) return require("phlox.diagrams").fractions(opts) end
function phlox.solubility(opts) return require("phlox.diagrams").solubility(opts) end
function phlox.series(opts) return require("phlox.diagrams").series(opts) end

--- A study report: one self-contained HTML page (figures as inline SVG,
-- tables, data notes, provenance, the caution) and optionally a PDF of the
-- same.  Options (see stdlib/phlox/report.lua and docs/figures.md): file
-- (".html"), pdf (".pdf"), title, summary, sections = { { heading, text,
-- figures = { { figure, caption } }, tables = { { caption, columns, rows } } } },
-- notes, conditions.
function phlox.report(opts) return require("phlox.report").write(opts) end

return phlox
