--- phlox.library (part of `require "phlox"`): where element files come
-- from and how a species library is built from them.
-- Adds to phlox: search_paths, read_library_file (the user's folders, then
-- the embedded copy), available_elements, make_dir and list_dir (no shell),
-- groups_in (ligand groups named in a text), library (H/O, the element
-- files in ligand order, group files, user files; the element files an
-- isocoulombic model reaction names), model_elements, the Library
-- metatable (species, list, references, props, reaction) and water.
-- Errors name the file, line and field (the loader's problems) or the
-- option.  The ligand load order is the core's (core.ligand_order).
-- Shares (P): LIGAND_GROUPS (group -> its elements), ligand_elements(ligand)
-- (the element symbols of a ligand or group).
local core = require "phlox.core"
local provenance = require "phlox.provenance"
local base = require "phlox.base"
local phlox, P = base.phlox, base.P
local options, spec, temperature, pressure, check_library =
  P.options, P.spec, P.temperature, P.pressure, P.check_library

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

-- (the ligand groups, CN, are defined below; available_elements lists them too)
local LIGAND_GROUP_FILES = { CN = true }

--- The elements (and ligand groups, such as CN) whose definition files the
--- library has (built-in and user): every name phlox.library accepts.
function phlox.available_elements()
  local seen, list = {}, {}
  local function add(sym)
    if (sym:match("^%u%l?$") or LIGAND_GROUP_FILES[sym]) and not seen[sym] then
      seen[sym] = true
      list[#list + 1] = sym
    end
  end
  for _, path in ipairs(core.embedded_files()) do
    local sym = path:match("^stdlib/elements/(%u%w?)%.lua$")
    if sym then add(sym) end
  end
  for _, dir in ipairs(core.search_paths()) do
    for _, name in ipairs(core.list_dir(dir .. "/elements") or {}) do -- opendir, no shell
      local sym = name:match("^(%u%w?)%.lua$")
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
local LIGAND_GROUPS = { CN = { "C", "N" } } -- keep LIGAND_GROUP_FILES above in step
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
      if not listed[sym] then -- a group named twice loads once, as elements do
        listed[sym] = true
        groups[#groups + 1] = sym
      end
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
    if s.estimate_model then -- read by the C reaction parser (core.reaction_terms)
      for _, t in ipairs(core.reaction_terms(s.estimate_model) or {}) do
        if t.state ~= "e" and not lib:species(t.formula) then
          local syms = {}
          for sym in pairs(t.elements) do syms[#syms + 1] = sym end
          table.sort(syms)
          for _, sym in ipairs(syms) do
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

-- for the other modules of phlox (stdlib/phlox/base.lua)
P.LIGAND_GROUPS, P.ligand_elements =
  LIGAND_GROUPS, ligand_elements
