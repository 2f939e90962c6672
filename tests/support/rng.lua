-- tests/support/rng.lua: the seeded random numbers of the Lua tests, so a
-- failing random case can be replayed.  A linear congruential generator
-- with the constants of the ISO C standard's example rand() (ISO/IEC
-- 9899:2011, 7.22.2.2: multiplier 1103515245, increment 12345), modulo
-- 2^31.  Plain Lua 5.4 (integers are 64-bit: the product cannot overflow).
--   R.new(seed) -> next      next() returns the next number in [0, 1)
local M = {}

function M.new(seed)
  local s = seed
  return function()
    s = (s * 1103515245 + 12345) % 2147483648
    return s / 2147483648
  end
end

return M
