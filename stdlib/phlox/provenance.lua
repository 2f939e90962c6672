--- phlox.provenance: what produced a result.  Every map, curve, speciation
-- and table carries its own provenance (result.provenance = { files =
-- { {file, sha256}, ... }, conditions, options }): the definition files that
-- define its species, not every file the run happened to load.  Stamps add
-- the program version, the source revision it was built from and the
-- SHA-256 of the study script.  No timestamps: equal inputs give equal bytes.
local core = require "phlox.core"

local provenance = {}
local inputs = {}   -- path -> sha256: every input this process has read
local notes, noted = {}, {} -- caveats of this run's results, in order

--- Record an input file (the library loader calls this for each element
-- file); returns { file = path, sha256 = ... }.  Every input read feeds the
-- journal key of resumable sweeps (phlox.sweep).
function provenance.record_file(path, text)
  local sum = core.sha256(text)
  inputs[path] = sum
  return { file = path, sha256 = sum }
end

local function sorted_files(map)
  local files = {}
  for path, sum in pairs(map) do files[#files + 1] = { file = path, sha256 = sum } end
  table.sort(files, function(a, b) return a.file < b.file end)
  return files
end

--- Every input this process has read, sorted by path.
function provenance.inputs() return sorted_files(inputs) end

--- Record a caveat that changes a result (stamp line of a map, a grid map
-- or a speciation): exported files of the run carry it unless they name
-- the results they come from.
function provenance.record_note(text)
  if noted[text] then return end
  noted[text] = true
  notes[#notes + 1] = text
end

-- Plain copy of user options (numbers, strings, booleans and tables of
-- them); the library and functions are left out.
local function plain(v, depth)
  local t = type(v)
  if t == "number" or t == "string" or t == "boolean" then return v end
  if t ~= "table" or depth > 4 or getmetatable(v) ~= nil then return nil end
  local out = {}
  for k, x in pairs(v) do
    if type(k) == "string" or math.type(k) == "integer" then out[k] = plain(x, depth + 1) end
  end
  return out
end

--- The provenance of a result built from `lib` (a phlox.Library) for the
-- elements named (H and O always count): the files that define a species
-- made only of those elements and the files of the species their
-- isocoulombic model reactions name (an estimate rests on those records
-- too: CuCl3^2- on S.lua's sulfate), with their checksums, plus the
-- conditions and a plain copy of the options.
function provenance.of_result(lib, elements, conditions, options)
  local allowed, key = { H = true, O = true }, {}
  for _, e in ipairs(elements) do
    if e then allowed[e] = true end
  end
  for e in pairs(allowed) do key[#key + 1] = e end
  table.sort(key)
  key = table.concat(key, ",")
  lib._files_for = lib._files_for or {}
  local files = lib._files_for[key]
  if not files then
    local used = {}
    for i = 1, lib.db:count() do
      local s = lib.db:species(i)
      local ok = true
      for e in pairs(s.elements) do
        if not allowed[e] then ok = false; break end
      end
      if ok and s.file and lib.sources[s.file] then
        used[s.file] = lib.sources[s.file]
        for _, t in ipairs(s.estimate_model and core.reaction_terms(s.estimate_model) or {}) do
          local m = t.state ~= "e" and lib:species(t.formula)
          if m and m.file and lib.sources[m.file] then used[m.file] = lib.sources[m.file] end
        end
      end
    end
    files = sorted_files(used)
    lib._files_for[key] = files
  end
  local opts
  if options then
    opts = plain(options, 0) or {}
    opts.library = nil
  end
  return { files = files, conditions = conditions, options = opts }
end

-- The results named by `from`: a result (a map, curve or speciation, with
-- .provenance or .stamp), a provenance record (with .files) or a list of
-- them, nested lists flattened.  Returns the results and the provenance
-- records.
local function flatten(from, results, recs)
  results, recs = results or {}, recs or {}
  if type(from) ~= "table" then return results, recs end
  if from.provenance == nil and from[1] == nil and type(from.files) == "table"
     and type(from.files[1] or {}) == "table" then
    recs[#recs + 1] = from
  elseif from.provenance or from.stamp or from.notes or from.fields or from.species then
    results[#results + 1] = from
    if from.provenance then recs[#recs + 1] = from.provenance end
  else
    for _, x in ipairs(from) do flatten(x, results, recs) end
  end
  return results, recs
end

local function records(from) return select(2, flatten(from)) end

--- A stamp line as plain text: the braces that mark formulas for
-- typesetting in figures are dropped (tables, JSON, terminals).
function provenance.plain(s) return (tostring(s):gsub("[{}]", "")) end
local plain = provenance.plain

--- The caveats of `from` (a result or a list of results with `stamp`
-- lines, or provenance records with `notes`), or every caveat recorded in
-- this run, as plain text.
function provenance.notes(from)
  if from == nil then
    local out = {}
    for i, n in ipairs(notes) do out[i] = plain(n) end
    return out
  end
  local results, recs = flatten(from)
  local out, seen = {}, {}
  local function add(list)
    for _, line in ipairs(list or {}) do
      line = plain(line)
      if not seen[line] then seen[line] = true; out[#out + 1] = line end
    end
  end
  for _, r in ipairs(results) do add(r.stamp) end
  for _, r in ipairs(recs) do add(r.notes) end
  return out
end

local script_cache = {}
local function script_stamp()
  local name = rawget(_G, "arg") and arg[0]
  if not name then return nil end
  if script_cache[name] == nil then
    local f = io.open(name, "rb")
    if f then
      script_cache[name] = { file = name, sha256 = core.sha256(f:read("a")) }
      f:close()
    else
      script_cache[name] = false
    end
  end
  return script_cache[name] or nil
end

--- A stamp: a plain table (stable key order when JSON-encoded).
--   provenance.stamp(conditions, from)
-- `from` names the results the output shows (a result, its provenance or a
-- list of them): their files are stamped, and their options.  Without it,
-- the stamp lists every input this run has read and says so (data_scope).
function provenance.stamp(conditions, from)
  local recs = records(from)
  local data, scope, options
  if #recs > 0 then
    local union = {}
    for _, r in ipairs(recs) do
      for _, d in ipairs(r.files or {}) do union[d.file] = d.sha256 end
    end
    data = sorted_files(union)
    if #recs == 1 then options = recs[1].options end
  else
    data = provenance.inputs()
    scope = "every input read by this run (no result named)"
  end
  return {
    program = "phlox " .. core.version,
    revision = core.revision,
    script = script_stamp(),
    data = data,
    data_scope = scope,
    conditions = conditions or (#recs == 1 and recs[1].conditions) or nil,
    options = options,
    notes = provenance.notes(from),
  }
end

--- The order of table keys in stamps and journals: numbers first, then
-- strings, each ascending.
function provenance.key_order(a, b)
  if type(a) == type(b) then return a < b end
  return type(a) == "number"
end

local function compact(v)
  if type(v) ~= "table" then return tostring(v) end
  local keys = {}
  for k in pairs(v) do keys[#keys + 1] = k end
  table.sort(keys, provenance.key_order)
  local parts = {}
  for _, k in ipairs(keys) do
    parts[#parts + 1] = (math.type(k) == "integer" and "" or (tostring(k) .. "=")) .. compact(v[k])
  end
  return "{" .. table.concat(parts, ", ") .. "}"
end

local function sorted_pairs_lines(t, prefix, word, lines)
  if not t then return end
  local keys = {}
  for k in pairs(t) do keys[#keys + 1] = k end
  table.sort(keys, function(a, b) return tostring(a) < tostring(b) end)
  for _, k in ipairs(keys) do
    lines[#lines + 1] = prefix .. word .. ": " .. tostring(k) .. " = " .. compact(t[k])
  end
end

--- The stamp as comment lines ("# key: value") for CSV and text outputs.
function provenance.comment_lines(stamp, prefix)
  prefix = prefix or "# "
  local lines = { prefix .. "program: " .. stamp.program }
  if stamp.revision then lines[#lines + 1] = prefix .. "revision: " .. stamp.revision end
  if stamp.script then
    lines[#lines + 1] = prefix .. "script: " .. stamp.script.file .. " sha256=" .. stamp.script.sha256
  end
  if stamp.data_scope then lines[#lines + 1] = prefix .. "data files: " .. stamp.data_scope end
  for _, d in ipairs(stamp.data) do
    lines[#lines + 1] = prefix .. "data: " .. d.file .. " sha256=" .. d.sha256
  end
  sorted_pairs_lines(stamp.conditions, prefix, "condition", lines)
  sorted_pairs_lines(stamp.options, prefix, "option", lines)
  for _, n in ipairs(stamp.notes or {}) do lines[#lines + 1] = prefix .. "note: " .. n end
  return lines
end

return provenance
