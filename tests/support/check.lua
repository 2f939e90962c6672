-- tests/support/check.lua: the assertions every Lua test shares.  Load with
--     local T = dofile(<source dir> .. "/tests/support/check.lua")
-- (script tests: os.getenv("PHLOX_SOURCE_DIR"); data tests: the folder of
-- their own file).  Plain Lua 5.4; no phlox needed.
--   T.check(cond, msg)          error with msg at the caller's line unless cond
--   T.close(a, b, tol, what)    |a - b| <= tol (absolute); a must be a number
--   T.rel(a, b, r, what)        |a - b| <= r |b| (relative)
--   T.near(a, b, tol)           the test of T.close as a boolean
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

return M
