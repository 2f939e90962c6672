--- phlox.notes (part of `require "phlox"`): what a reader must know about
-- a result, as stamp lines and notes.
-- Temperature basis: every record says whether its temperature function is
-- measured, estimated (with the method) or held at 25 C (species.basis,
-- set by the core).  Adds to phlox: constant_logk and estimated_species
-- (the held and estimated species of some elements at T), temperature_notes
-- (the stop on a held constant, and the stamp lines naming the held and
-- estimated species of a result's own system), held_stamp_line,
-- activity_ranges and activity_range (the activity models' ranges, warned
-- once on stderr beyond them), sour_caution, merge_notes (the notes of
-- several results, each once).
-- Shares (P): held_logk (the notes of one result at T, errors at the
-- caller's line), stamp_held (writes them into a result), add_note (a
-- caveat into t.notes, t.stamp and the provenance), warn_once,
-- note_activity, note_sour, note_list, note_ligands.
local core = require "phlox.core"
local provenance = require "phlox.provenance"
local base = require "phlox.base"
local phlox, P = base.phlox, base.P
local options, LIM, spec, check_library =
  P.options, P.LIM, P.spec, P.check_library

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
  "(phlox --path DIR; docs/element-files.md), or leave the species out (exclude)"
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

-- The species a result's system keeps after the user's `exclude` list (and
-- a map's `only` list of species of `element`), as a lazy set of formulas
-- for temperature_notes (looked up per formula); nil when neither list is
-- given.  Names resolve as the core resolves them ("ZnO(s)" is the
-- library's one ZnO solid); a name that resolves to nothing is left for
-- the core to report.
local function user_species(lib, opts, element)
  local out, keep = {}, nil
  for _, n in ipairs(opts and opts.exclude or {}) do
    local s = lib:species(n)
    if s then out[s.formula] = true end
  end
  if opts and opts.only and element then
    keep = {}
    for _, n in ipairs(opts.only) do
      local s = lib:species(n)
      if s then keep[s.formula] = true end
    end
  end
  if not next(out) and not keep then return nil end
  return setmetatable({}, { __index = function(_, f)
    if out[f] then return false end
    if keep and not keep[f] then
      local s = lib:species(f)
      if s and s.elements[element] then return false end
    end
    return true
  end })
end

-- The set of formulas a predominance map weighed: its fields, the
-- candidates that never predominate (absent) and the ligand's own species.
local function map_species(m)
  local set = {}
  for _, f in ipairs(m.fields or {}) do set[f.species] = true end
  for _, f in ipairs(m.ligand_fields or {}) do set[f.species] = true end
  for _, n in ipairs(m.absent or {}) do set[n] = true end
  for _, n in ipairs(m.ligand_absent or {}) do set[n] = true end
  return set
end

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

-- for the other modules of phlox (stdlib/phlox/base.lua)
P.held_logk, P.stamp_held, P.add_note, P.warn_once, P.note_activity, P.note_sour, P.note_list, P.note_ligands =
  held_logk, stamp_held, add_note, warn_once, note_activity, note_sour, note_list, note_ligands
P.user_species, P.map_species = user_species, map_species
