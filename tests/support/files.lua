-- tests/support/files.lua: the file chores of the script tests.  Plain Lua 5.4
-- with a POSIX shell for folders.
--   F.read(path)      the file's bytes, or nil if it cannot be opened
--   F.slurp(path)     the same, an error naming the file if it cannot
--   F.quote(s)        s quoted for the POSIX shell ('...' with '\'' inside)
--   F.write(path, s)  write s to the file (an error if it cannot)
--   F.tmpdir([dirs])  a new empty folder with a unique name, appended to
--                     the list dirs if given (the caller removes it:
--                     os.execute("rm -rf " .. F.quote(dir)))
--   F.sha256sum(path) the file's SHA-256 by coreutils' sha256sum (a check
--                     from outside phlox)
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

function M.quote(s) return "'" .. tostring(s):gsub("'", "'\\''") .. "'" end

function M.write(path, s)
  local f = io.open(path, "wb")
  if not f then error("cannot write " .. path, 2) end
  f:write(s)
  f:close()
end

function M.tmpdir(dirs)
  local name = os.tmpname() -- creates an empty file: its unique name becomes the folder's
  os.remove(name)
  if not os.execute("mkdir -p " .. M.quote(name)) then error("cannot create " .. name, 2) end
  if dirs then dirs[#dirs + 1] = name end
  return name
end

function M.sha256sum(path)
  local h = assert(io.popen("sha256sum " .. M.quote(path)))
  local s = h:read("a")
  h:close()
  return s:match("^(%x+)")
end

return M
