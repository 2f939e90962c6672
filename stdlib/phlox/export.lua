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
  -- a text cell a spreadsheet would run as a formula (= + - @, or a tab or
  -- CR before one) gets a leading apostrophe, the spreadsheets' own
  -- "this is text" mark, and is quoted (OWASP, "CSV Injection")
  if s:find("^[=+%-@\t\r]") then s = "'" .. s end
  if s:find('[,"\n\r\'\t]') then s = '"' .. s:gsub('"', '""') .. '"' end
  return s
end

local CSV_OPTS = {
  columns = "strings",                    -- the column order (required)
  conditions = "table",                   -- stamped in the header
  from = "table",                         -- the result(s) whose caveats become notes
  replace = "boolean",                    -- also replace a symbolic link or a read-only file
}
local JSON_OPTS = {
  conditions = "table",                   -- stamped in the provenance
  from = "table",                         -- the result(s) whose caveats are recorded
  replace = "boolean",
}
export.option_specs = { ["export.csv"] = CSV_OPTS, ["export.json"] = JSON_OPTS }
--- Write rows (a sequence of tables keyed by column name) as CSV.
-- opts.columns: the column order (required); opts.conditions: stamped;
-- opts.from: the results the rows come from (a result or a list): their
-- own data files, conditions, options and caveats (stamp lines, as "# note:"
-- lines) are stamped; without it, every input and caveat of the run, the
-- data files marked as such.
function export.csv(path, rows, opts)
  core.check_value("export.csv", "path", path, "string")
  core.check_value("export.csv", "rows", rows, "table")
  core.check_value("export.csv", "opts", opts, "table")
  core.options("export.csv", CSV_OPTS, opts)
  local columns = opts.columns
  if not columns then core.user_error("export.csv: opts.columns is required") end
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
  local ok, err = core.write_atomic(path, table.concat(lines, "\n") .. "\n", opts.replace)
  if not ok then core.user_error("export.csv: " .. err) end
  return path
end

--- Write a value as JSON: { provenance = ..., caution = ..., data = value }.
-- opts.conditions, opts.from as export.csv (notes in provenance.notes).
function export.json(path, value, opts)
  core.check_value("export.json", "path", path, "string")
  if opts ~= nil then core.options("export.json", JSON_OPTS, opts) end
  local doc = {
    provenance = provenance.stamp(opts and opts.conditions, opts and opts.from),
    caution = CAUTION,
    data = value,
  }
  local okj, text = pcall(json.encode, doc, { indent = "  " })
  if not okj then core.user_error("export.json: " .. tostring(text)) end
  local ok, err = core.write_atomic(path, text .. "\n", opts and opts.replace)
  if not ok then core.user_error("export.json: " .. err) end
  return path
end

export.caution = CAUTION
return export
