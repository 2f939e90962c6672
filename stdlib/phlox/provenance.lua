--- phlox.provenance: what produced a result.  Every exported table and
-- figure carries the program version, the SHA-256 of the study script and of
-- each definition file used, and the conditions, so a reader can tell
-- whether two results come from the same inputs.  No timestamps: equal
-- inputs give equal bytes.
local core = require "phlox.core"

local provenance = {}
local data_files = {}   -- path -> sha256, filled by the library loader
local notes, noted = {}, {} -- caveats of this run's results, in order

--- Record a definition file (or any input) that a result depends on.
function provenance.record_file(path, text)
  data_files[path] = core.sha256(text)
end

--- Record a caveat that changes a result (stamp line of a map, a grid map
-- or a speciation): exported files of the run carry it unless they name
-- the results they come from.
function provenance.record_note(text)
  if noted[text] then return end
  noted[text] = true
  notes[#notes + 1] = text
end

--- The caveats of `from` (a result or a list of results with `stamp`
-- lines), or every caveat recorded in this run.
function provenance.notes(from)
  if from == nil then
    local out = {}
    for i, n in ipairs(notes) do out[i] = n end
    return out
  end
  local list = (from.stamp or from.notes or from.fields or from.species) and { from } or from
  local out, seen = {}, {}
  for _, r in ipairs(list) do
    for _, line in ipairs(r.stamp or {}) do
      if not seen[line] then seen[line] = true; out[#out + 1] = line end
    end
  end
  return out
end

--- The current stamp: a plain table (stable key order when JSON-encoded).
function provenance.stamp(conditions, from)
  local files = {}
  for path, sum in pairs(data_files) do files[#files + 1] = { file = path, sha256 = sum } end
  table.sort(files, function(a, b) return a.file < b.file end)
  local script
  local name = rawget(_G, "arg") and arg[0]
  if name then
    local f = io.open(name, "rb")
    if f then
      script = { file = name, sha256 = core.sha256(f:read("a")) }
      f:close()
    end
  end
  return {
    program = "phlox " .. core.version,
    script = script,
    data = files,
    conditions = conditions,
    notes = provenance.notes(from),
  }
end

--- The stamp as comment lines ("# key: value") for CSV and text outputs.
function provenance.comment_lines(stamp, prefix)
  prefix = prefix or "# "
  local lines = { prefix .. "program: " .. stamp.program }
  if stamp.script then
    lines[#lines + 1] = prefix .. "script: " .. stamp.script.file .. " sha256=" .. stamp.script.sha256
  end
  for _, d in ipairs(stamp.data) do
    lines[#lines + 1] = prefix .. "data: " .. d.file .. " sha256=" .. d.sha256
  end
  if stamp.conditions then
    local keys = {}
    for k in pairs(stamp.conditions) do keys[#keys + 1] = k end
    table.sort(keys)
    for _, k in ipairs(keys) do
      lines[#lines + 1] = prefix .. "condition: " .. k .. " = " .. tostring(stamp.conditions[k])
    end
  end
  for _, n in ipairs(stamp.notes or {}) do lines[#lines + 1] = prefix .. "note: " .. n end
  return lines
end

return provenance
