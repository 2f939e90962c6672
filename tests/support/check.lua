-- tests/support/check.lua: the assertions every Lua test shares.  Load with
--     local T = dofile(<source dir> .. "/tests/support/check.lua")
-- (script tests: os.getenv("PHLOX_SOURCE_DIR"); data tests: the folder of
-- their own file).  Plain Lua 5.4; no phlox needed.
--   T.check(cond, msg)          error with msg at the caller's line unless cond
--   T.close(a, b, tol, what)    |a - b| <= tol (absolute); a must be a number
--   T.rel(a, b, r, what)        |a - b| <= r |b| (relative)
--   T.near(a, b, tol)           the test of T.close as a boolean
--   T.soft() -> s               checks that go on after a failure:
--                               s.check(cond, msg) records msg unless cond,
--                               s.failures the list so far, s.finish(what)
--                               prints each as "FAIL: msg" on stderr and
--                               raises "<n> <what>" if there is any
--   T.reporter(labels) -> r     the data checks' log: r.emit(status, msg)
--                               prints labels[status] .. msg and counts it
--                               in r.count[status]; r.pass, r.fail,
--                               r.check(ok, msg); r.finish([header]) exits
--                               1 (listing the FAIL messages under header,
--                               if given) when any failed, else 0
-- A NaN never passes.  Messages print both numbers and the tolerance.
local M = {}

local function num(x)
  return type(x) == "number" and ("%.10g"):format(x) or tostring(x)
end

function M.check(cond, msg)
  if not cond then error(msg, 2) end
  return cond
end

function M.near(a, b, tol)
  return type(a) == "number" and type(b) == "number" and math.abs(a - b) <= tol
end

function M.close(a, b, tol, what)
  if not M.near(a, b, tol) then
    error(("%s: %s vs %s (tolerance %g)"):format(what, num(a), num(b), tol), 2)
  end
end

function M.rel(a, b, r, what)
  if not (type(a) == "number" and type(b) == "number" and math.abs(a - b) <= r * math.abs(b)) then
    error(("%s: %s vs %s (relative tolerance %g)"):format(what, num(a), num(b), r), 2)
  end
end

function M.soft()
  local s = { failures = {} }
  function s.check(cond, msg)
    if not cond then s.failures[#s.failures + 1] = msg end
    return cond
  end
  function s.finish(what)
    if #s.failures == 0 then return end
    for _, f in ipairs(s.failures) do io.stderr:write("FAIL: ", f, "\n") end
    error(("%d %s"):format(#s.failures, what), 2)
  end
  return s
end

function M.reporter(labels)
  local r = { count = {}, failures = {} }
  for status in pairs(labels) do r.count[status] = 0 end
  function r.emit(status, msg)
    r.count[status] = r.count[status] + 1
    if status == "FAIL" then r.failures[#r.failures + 1] = msg end
    print(labels[status] .. msg)
  end
  function r.pass(msg) r.emit("PASS", msg) end
  function r.fail(msg) r.emit("FAIL", msg) end
  function r.check(ok, msg) r.emit(ok and "PASS" or "FAIL", msg) end
  -- min_pass: the number of checks the script is known to make; fewer
  -- passing checks mean some stopped matching their data (a lost check is a
  -- failure too: once a change of citation text silently dropped 80).
  function r.finish(header, min_pass)
    if min_pass and (r.count.PASS or 0) < min_pass then
      r.count.FAIL = r.count.FAIL + 1
      r.failures[#r.failures + 1] = ("only %d checks passed, expected at least %d: find which checks stopped "
        .. "running (or, if checks were removed on purpose, lower the floor with the reason)"):format(r.count.PASS or 0, min_pass)
      print("FAIL  " .. r.failures[#r.failures])
    end
    if r.count.FAIL > 0 then
      if header then
        print(header)
        for _, m in ipairs(r.failures) do print("  " .. m) end
      end
      os.exit(1)
    end
    os.exit(0)
  end
  return r
end

return M
