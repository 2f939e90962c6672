-- tests/support/files.lua: the file chores of the script tests, through
-- what phlox itself exposes (phlox.core: make_dir, remove_tree, sha256) so
-- no test builds a shell line for them.  Plain Lua 5.4 for read, slurp,
-- write and quote; the rest needs the phlox program (script tests).
--   F.read(path)      the file's bytes, or nil if it cannot be opened
--   F.slurp(path)     the same, an error naming the file if it cannot
--   F.quote(s)        s quoted for the POSIX shell ('...' with '\'' inside),
--                     for the command lines of S.proc.run
--   F.write(path, s)  write s to the file (an error if it cannot)
--   F.mkdir(path)     create the folder and its missing parents (an error
--                     naming it if it cannot)
--   F.tmpdir([dirs])  a new empty folder with a unique name, appended to
--                     the list dirs if given (the caller removes it with
--                     F.remove)
--   F.remove(...)     remove each path given, a folder with all it holds;
--                     a path that does not exist is passed over (rm -rf)
--   F.sha256(path)    the file's SHA-256 in hex by core.sha256 (checked
--                     against the FIPS 180-4 examples by unit.test_sha256)
local M = {}

local function core()
  local ok, c = pcall(require, "phlox.core")
  if not ok then error("tests/support/files.lua: this helper needs the phlox program (phlox.core)", 3) end
  return c
end

function M.read(path)
  local f = io.open(path, "rb")
  if not f then return nil end
  local s = f:read("a")
  f:close()
  return s
end

function M.slurp(path)
  local s = M.read(path)
  if not s then error("cannot read " .. path, 2) end
  return s
end

function M.quote(s) return "'" .. tostring(s):gsub("'", "'\\''") .. "'" end

function M.write(path, s)
  local f = io.open(path, "wb")
  if not f then error("cannot write " .. path, 2) end
  f:write(s)
  f:close()
end

function M.mkdir(path)
  local ok, err = core().make_dir(path, true)
  if not ok then error(err, 2) end
end

function M.tmpdir(dirs)
  local name = os.tmpname() -- creates an empty file: its unique name becomes the folder's
  os.remove(name)
  local ok, err = core().make_dir(name)
  if not ok then error(err, 2) end
  if dirs then dirs[#dirs + 1] = name end
  return name
end

function M.remove(...)
  local c = core()
  for i = 1, select("#", ...) do
    local path = select(i, ...)
    if c.file_kind(path) then
      local ok, err = c.remove_tree(path)
      if not ok then error(err, 2) end
    end
  end
end

function M.sha256(path)
  return core().sha256(M.slurp(path))
end

return M
