--- phlox.export: tables to CSV and JSON, written atomically, each with the
-- provenance stamp (program, script and data checksums, conditions) and the
-- safety caution.
local core = require "phlox.core"
local json = require "phlox.json"
local provenance = require "phlox.provenance"

local export = {}

local CAUTION = "thermodynamic equilibrium: says what can form, not how fast; "
  .. "defer to the applicable codes, standards and licensed engineering practice"

local function cell(v, col)
  if type(v) == "number" then
    return json.number(v, "column " .. col)
  elseif v == nil then
    return ""
  end
  local s = tostring(v)
  if s:find('[,"\n\r]') then s = '"' .. s:gsub('"', '""') .. '"' end
  return s
end

--- Write rows (a sequence of tables keyed by column name) as CSV.
-- opts.columns: the column order (required); opts.conditions: stamped;
-- opts.from: the results the rows come from (a result or a list): their
-- own data files, conditions, options and caveats (stamp lines, as "# note:"
-- lines) are stamped; without it, every input and caveat of the run, the
-- data files marked as such.
function export.csv(path, rows, opts)
  assert(type(path) == "string", "export.csv: path must be a string")
  assert(type(rows) == "table", "export.csv: rows must be a table")
  local columns = assert(opts and opts.columns, "export.csv: opts.columns is required")
  local lines = provenance.comment_lines(provenance.stamp(opts.conditions, opts.from))
  lines[#lines + 1] = "# " .. CAUTION
  local head = {}
  for i, c in ipairs(columns) do head[i] = cell(c, c) end
  lines[#lines + 1] = table.concat(head, ",")
  for r, row in ipairs(rows) do
    local out = {}
    for i, c in ipairs(columns) do out[i] = cell(row[c], c .. " row " .. r) end
    lines[#lines + 1] = table.concat(out, ",")
  end
  local ok, err = core.write_atomic(path, table.concat(lines, "\n") .. "\n")
  if not ok then error("export.csv: " .. err, 2) end
  return path
end

--- Write a value as JSON: { provenance = ..., caution = ..., data = value }.
-- opts.conditions, opts.from as export.csv (notes in provenance.notes).
function export.json(path, value, opts)
  assert(type(path) == "string", "export.json: path must be a string")
  local doc = {
    provenance = provenance.stamp(opts and opts.conditions, opts and opts.from),
    caution = CAUTION,
    data = value,
  }
  local ok, err = core.write_atomic(path, json.encode(doc, { indent = "  " }) .. "\n")
  if not ok then error("export.json: " .. err, 2) end
  return path
end

export.caution = CAUTION
return export
