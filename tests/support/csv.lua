-- tests/support/csv.lua: CSV reading (RFC 4180 quoting: a field in double
-- quotes may hold commas and "" for a quote)
-- for every Lua test.  Plain Lua 5.4.  Load with dofile(<this file's path>).
--   C.split(line)                  fields of one line, or nil, message for a
--                                  malformed line (unterminated quote, text
--                                  after a closing quote)
--   C.parse(text)                  header, rows: rows keyed by the header's
--                                  names; blank lines skipped, CR LF accepted,
--                                  a quoted field may span lines
--   C.read(path)                   the same from a file; a missing file is an
--                                  error naming it
--   C.rows(path)                   the rows of C.read alone
--   C.reference(name [, dir])      C.read of tests/reference/<name> (dir: the
--                                  reference folder, default from
--                                  PHLOX_SOURCE_DIR)
--   C.cells(line)                  C.split, raising the message on a
--                                  malformed line
--   C.stamped(text, name)          a CSV file phlox wrote: its "#" header
--                                  (one string), column names and rows (by
--                                  column name); raises unless the rows are
--                                  rectangular and every data file's SHA-256
--                                  in the header equals the SHA-256 of the
--                                  file under PHLOX_SOURCE_DIR (files.lua,
--                                  F.sha256: needs phlox); also returns
--                                  the number of data files stamped
--   C.ref_value(name, keycol, key, valcol [, dir])
--                                  tonumber(valcol) of the first row whose
--                                  keycol equals key, and that row's source;
--                                  an error naming file and key if none
local M = {}

function M.split(line)
  local cells, i, n = {}, 1, #line
  while i <= n + 1 do
    if line:sub(i, i) == '"' then
      local buf, j = {}, i + 1
      while true do
        local c = line:sub(j, j)
        if c == "" then return nil, "unterminated quote in: " .. line end
        if c == '"' then
          if line:sub(j + 1, j + 1) == '"' then buf[#buf + 1] = '"'; j = j + 2
          else j = j + 1; break end
        else buf[#buf + 1] = c; j = j + 1 end
      end
      cells[#cells + 1] = table.concat(buf)
      if not (line:sub(j, j) == "," or j > n) then
        return nil, "text after a closing quote in: " .. line
      end
      i = j + 1
    else
      local j = line:find(",", i, true) or (n + 1)
      cells[#cells + 1] = line:sub(i, j - 1)
      i = j + 1
    end
  end
  return cells
end

function M.cells(line)
  local cells, err = M.split(line)
  if not cells then error(err, 2) end
  return cells
end

function M.stamped(text, name)
  local F = dofile((debug.getinfo(1, "S").source:match("^@(.*)[/\\]") or ".") .. "/files.lua")
  local src = assert(os.getenv("PHLOX_SOURCE_DIR"), "PHLOX_SOURCE_DIR is not set (run through ctest)")
  local function check(cond, msg) if not cond then error(msg, 3) end end
  local lines = {}
  for l in text:gmatch("([^\n]*)\n") do lines[#lines + 1] = l end
  local k, header = 1, {}
  while lines[k] and lines[k]:sub(1, 1) == "#" do header[#header + 1] = lines[k]; k = k + 1 end
  local htext = table.concat(header, "\n")
  local nfiles = 0
  for file, sum in htext:gmatch("# data: (%S+) sha256=(%x+)") do
    nfiles = nfiles + 1
    check(#sum == 64, name .. ": sha256 of " .. file .. " has 64 hex digits")
    -- embedded copies are recorded as stdlib/...: the file in the tree
    check(F.sha256(src .. "/" .. file) == sum, name .. ": checksum of " .. file .. " differs from the file's SHA-256")
  end
  check(lines[k], name .. ": no column line after the header")
  local cols, err = M.split(lines[k])
  check(cols, name .. ": " .. tostring(err))
  local rows = {}
  for i = k + 1, #lines do
    local cells, e = M.split(lines[i])
    check(cells, name .. ": " .. tostring(e))
    check(#cells == #cols, ("%s line %d has %d cells, not %d"):format(name, i, #cells, #cols))
    local row = {}
    for c, v in ipairs(cells) do row[cols[c]] = v end
    rows[#rows + 1] = row
  end
  check(#rows > 0, name .. ": has rows")
  return htext, cols, rows, nfiles
end

function M.parse(text)
  local rows, header, fields, field = {}, nil, {}, {}
  local i, n, inq = 1, #text, false
  local function end_field() fields[#fields + 1] = table.concat(field); field = {} end
  local function end_row()
    end_field()
    if not header then header = fields
    elseif #fields > 1 or fields[1] ~= "" then -- a blank line is no row
      local r = {}
      for k, h in ipairs(header) do r[h] = fields[k] end
      rows[#rows + 1] = r
    end
    fields = {}
  end
  while i <= n do
    local c = text:sub(i, i)
    if inq then
      if c == '"' then
        if text:sub(i + 1, i + 1) == '"' then field[#field + 1] = '"'; i = i + 1 else inq = false end
      else field[#field + 1] = c end
    elseif c == '"' then inq = true
    elseif c == "," then end_field()
    elseif c == "\n" then end_row()
    elseif c ~= "\r" then field[#field + 1] = c end
    i = i + 1
  end
  if #field > 0 or #fields > 0 then end_row() end
  return header or {}, rows
end

function M.read(path)
  local fh = io.open(path, "rb")
  if not fh then error("cannot open reference file " .. path, 2) end
  local text = fh:read("a")
  fh:close()
  return M.parse(text)
end

function M.rows(path)
  local _, rows = M.read(path)
  return rows
end

local function refdir(dir)
  return dir or ((os.getenv("PHLOX_SOURCE_DIR") or ".") .. "/tests/reference")
end

function M.reference(name, dir)
  return M.rows(refdir(dir) .. "/" .. name)
end

function M.ref_value(name, keycol, key, valcol, dir)
  for _, r in ipairs(M.reference(name, dir)) do
    if r[keycol] == key then return tonumber(r[valcol]), r.source end
  end
  error("no reference row " .. key .. " in " .. name, 2)
end

return M
