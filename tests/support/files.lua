-- tests/support/files.lua: the file chores of the script tests.  Plain Lua 5.4
-- with a POSIX shell for folders.
--   F.read(path)      the file's bytes, or nil if it cannot be opened
--   F.slurp(path)     the same, an error naming the file if it cannot
--   F.quote(s)        s quoted for the POSIX shell ('...' with '\'' inside)
--   F.tmpdir()        a new empty folder with a unique name (the caller
--                     removes it: os.execute("rm -rf " .. F.quote(dir)))
local M = {}

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

function M.quote(s) return "'" .. s:gsub("'", "'\\''") .. "'" end

function M.tmpdir()
  local name = os.tmpname() -- creates an empty file: its unique name becomes the folder's
  os.remove(name)
  if not os.execute("mkdir -p " .. M.quote(name)) then error("cannot create " .. name, 2) end
  return name
end

return M
