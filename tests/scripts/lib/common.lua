-- tests/scripts/lib/common.lua: helpers the script tests share (loaded with
-- dofile(PHLOX_SOURCE_DIR .. "/tests/scripts/lib/common.lua"); not a test
-- itself: ctest runs tests/scripts/*.lua only).
local t = {}

t.BIN = assert(os.getenv("PHLOX_BIN"), "PHLOX_BIN is not set (run through ctest)")
t.SRC = assert(os.getenv("PHLOX_SOURCE_DIR"), "PHLOX_SOURCE_DIR is not set (run through ctest)")
t.R, t.F = 8.314462618, 96485.33212 -- CODATA 2018

function t.check(cond, msg) if not cond then error(msg, 2) end end

--- a word for sh: 'text' with ' escaped
function t.quote(s) return "'" .. tostring(s):gsub("'", "'\\''") .. "'" end

function t.read(p)
  local f = io.open(p, "rb")
  if not f then return nil end
  local s = f:read("a")
  f:close()
  return s
end

function t.write(p, s)
  local f = assert(io.open(p, "wb"))
  f:write(s)
  f:close()
end

--- a new empty folder (its name from os.tmpname); listed in `dirs` if given
function t.tmpdir(dirs)
  local name = os.tmpname()   -- creates an empty file; use its unique name for a folder
  os.remove(name)
  t.check(require("phlox.core").make_dir(name), "cannot create " .. name) -- no shell
  if dirs then dirs[#dirs + 1] = name end
  return name
end

--- the SHA-256 of a file by coreutils' sha256sum (a check outside phlox)
function t.sha256sum(p)
  local h = io.popen("sha256sum " .. t.quote(p))
  local s = h:read("a")
  h:close()
  return s:match("^(%x+)")
end

--- one CSV line (RFC 4180 quoting) -> cells
function t.parse_csv_line(line)
  local cells, i, n = {}, 1, #line
  while i <= n + 1 do
    if line:sub(i, i) == '"' then
      local buf, j = {}, i + 1
      while true do
        local c = line:sub(j, j)
        t.check(c ~= "", "unterminated quote in: " .. line)
        if c == '"' then
          if line:sub(j + 1, j + 1) == '"' then buf[#buf + 1] = '"'; j = j + 2
          else j = j + 1; break end
        else buf[#buf + 1] = c; j = j + 1 end
      end
      cells[#cells + 1] = table.concat(buf)
      t.check(line:sub(j, j) == "," or j > n, "text after a closing quote in: " .. line)
      i = j + 1
    else
      local j = line:find(",", i, true) or (n + 1)
      cells[#cells + 1] = line:sub(i, j - 1)
      i = j + 1
    end
  end
  return cells
end

--- A stamped CSV file's text -> its "#" header (one string), column
-- names and rows (tables by column name); checks that the rows are
-- rectangular and that every data file's SHA-256 in the header equals
-- sha256sum's of the file under PHLOX_SOURCE_DIR.  Returns also the
-- number of data files stamped.
function t.read_csv(text, name)
  local lines = {}
  for l in text:gmatch("([^\n]*)\n") do lines[#lines + 1] = l end
  local k, header = 1, {}
  while lines[k] and lines[k]:sub(1, 1) == "#" do header[#header + 1] = lines[k]; k = k + 1 end
  local htext = table.concat(header, "\n")
  local nfiles = 0
  for file, sum in htext:gmatch("# data: (%S+) sha256=(%x+)") do
    nfiles = nfiles + 1
    t.check(#sum == 64, name .. ": sha256 of " .. file .. " has 64 hex digits")
    local real = t.SRC .. "/" .. file   -- embedded copies are recorded as stdlib/...
    t.check(t.sha256sum(real) == sum, name .. ": checksum of " .. file .. " differs from sha256sum")
  end
  t.check(lines[k], name .. ": no column line after the header")
  local cols = t.parse_csv_line(lines[k])
  local rows = {}
  for i = k + 1, #lines do
    local cells = t.parse_csv_line(lines[i])
    t.check(#cells == #cols, ("%s line %d has %d cells, not %d"):format(name, i, #cells, #cols))
    local row = {}
    for c, v in ipairs(cells) do row[cols[c]] = v end
    rows[#rows + 1] = row
  end
  t.check(#rows > 0, name .. ": has rows")
  return htext, cols, rows, nfiles
end

--- Coefficient of a species in "a A + b B = c C": positive on the left.
function t.coefficient(reaction, species)
  local lhs, rhs = reaction:match("^(.-) = (.*)$")
  local total = 0
  for side, sign in pairs({ [lhs] = 1, [rhs] = -1 }) do
    for term in (side .. " + "):gmatch("(.-) %+ ") do
      local n, f = term:match("^(%d+) (.+)$")
      if not n then n, f = 1, term end
      if f == species then total = total + sign * tonumber(n) end
    end
  end
  return total
end

--- Nernst: on an E-pH map a boundary has dE/dpH = -(RT ln10/F) nH/ne.
function t.nernst_slope(reaction, T_C)
  local nH, ne = t.coefficient(reaction, "H^+"), t.coefficient(reaction, "e-")
  if ne == 0 then return nil end
  return -t.R * (T_C + 273.15) * math.log(10) / t.F * nH / ne
end

return t
