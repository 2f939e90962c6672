-- tests/support/proc.lua: running a program as a user would, for the
-- script tests that check the command line, studies and workers.  Plain
-- Lua 5.4 (os.execute, a POSIX shell).
--   P.run(cmd [, opts]) -> code, out, err
--       runs the shell command line cmd (build it with S.files.quote) with
--       standard input from opts.stdin (a text) or else /dev/null; code is
--       the exit status (128 + the signal's number when a signal ended it,
--       as a shell reports it), out and err the standard output and error.
--       opts.merge: standard error goes into out (err is "").
--       opts.log: out is kept in this file (not removed), for a test that
--       reads it again or leaves it for a person to read.
local M = {}

local F = dofile((debug.getinfo(1, "S").source:match("^@(.*)[/\\]") or ".") .. "/files.lua")
local quote = F.quote

local function take(path, keep)
  local s = F.read(path) or ""
  if not keep then os.remove(path) end
  return s
end

function M.run(cmd, opts)
  opts = opts or {}
  local out = opts.log or os.tmpname()
  local err = not opts.merge and os.tmpname() or nil
  local inp
  if opts.stdin then
    inp = os.tmpname()
    local f = assert(io.open(inp, "wb"))
    f:write(opts.stdin)
    f:close()
  end
  -- braces: the redirections apply to the whole line, lists and pipes too
  local line = ("{ %s\n} > %s %s < %s"):format(cmd, quote(out), err and ("2> " .. quote(err)) or "2>&1",
                                          inp and quote(inp) or "/dev/null")
  local _, how, n = os.execute(line)
  if inp then os.remove(inp) end
  local code = how == "exit" and n or 128 + n
  return code, take(out, opts.log ~= nil), err and take(err) or ""
end

return M
