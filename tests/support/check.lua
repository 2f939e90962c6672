-- tests/support/check.lua: the assertions every Lua test shares.  Load with
--     local T = dofile(<source dir> .. "/tests/support/check.lua")
-- (script tests: os.getenv("PHLOX_SOURCE_DIR"); data tests: the folder of
-- their own file).  Plain Lua 5.4; no phlox needed.
--   T.check(cond, msg)          error with msg at the caller's line unless cond
--   T.close(a, b, tol, what [, opt])
--                               |a - b| <= tol (absolute); a must be a number
--   T.rel(a, b, r, what [, opt])
--                               |a - b| <= r |b| (relative)
--   T.near(a, b, tol [, opt])   the test of T.close as a boolean
--     opt, a table (optional):  strict = true: |a - b| < tol (< r |b|), for
--                               a test whose bound is strict (a tolerance
--                               moved here keeps its comparison, never
--                               loosened to <=); source = where the
--                               tolerance comes from, printed beside it.
--                               Any other key is an error (a misspelt
--                               "strict" must not loosen a check).
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

local OPT = { strict = true, source = true }

-- opt checked (level: the stack level of the test's call), and strict
local function strict_of(opt, level)
  if opt == nil then return false end
  if type(opt) ~= "table" then error("tolerance options must be a table, got " .. type(opt), level + 1) end
  for k in pairs(opt) do
    if not OPT[k] then error(("unknown tolerance option %q (strict, source)"):format(tostring(k)), level + 1) end
  end
  return opt.strict == true
end

-- |d| within bound: <= bound, or < bound when strict (false on NaN)
local function within(d, bound, strict)
  if strict then return math.abs(d) < bound end
  return math.abs(d) <= bound
end

-- "(tolerance 0.005)", "(relative tolerance < 1e-09, <source>)"
local function bound_text(kind, tol, opt)
  return ("(%s%s %g%s)"):format(kind, opt and opt.strict and " <" or "", tol,
    opt and opt.source and (", " .. tostring(opt.source)) or "")
end

function M.near(a, b, tol, opt)
  local strict = strict_of(opt, 2)
  return type(a) == "number" and type(b) == "number" and within(a - b, tol, strict)
end

function M.close(a, b, tol, what, opt)
  local strict = strict_of(opt, 2)
  if not (type(a) == "number" and type(b) == "number" and within(a - b, tol, strict)) then
    error(("%s: %s vs %s %s"):format(what, num(a), num(b), bound_text("tolerance", tol, opt)), 2)
  end
end

function M.rel(a, b, r, what, opt)
  local strict = strict_of(opt, 2)
  if not (type(a) == "number" and type(b) == "number" and within(a - b, r * math.abs(b), strict)) then
    error(("%s: %s vs %s %s"):format(what, num(a), num(b), bound_text("relative tolerance", r, opt)), 2)
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
