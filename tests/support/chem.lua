-- tests/support/chem.lua: what the tests compute on their own, apart from
-- phlox's C constants (so a wrong constant in the core shows), and look-ups
-- in the maps phlox returns.  Plain Lua 5.4.
--   K.R, K.F, K.T0, K.LN10    CODATA 2018 gas and Faraday constants,
--                             298.15 K, ln 10
--   K.nernst_slope(T)         RT ln10 / F in V per decade at T in kelvin
--                             (Nernst equation)
--   K.coefficient(reaction, species)
--                             the coefficient of a species in "a A + b B =
--                             c C" (positive on the left, 0 if absent)
--   K.boundary_slope(reaction, T_C)
--                             dE/dpH of an E-pH boundary: -(RT ln10/F)
--                             nH/ne (Nernst); nil without electrons
--   K.boundary(map, a, b)     the boundary between species a and b (either
--                             order); an error naming both if there is none
--   K.area_sum(map)           the summed area of the map's fields
--   K.fields(map)             the map's fields by species name
--   K.stamp_line(lines, text) the first line of a stamp (a list of lines)
--                             holding text (plain), or nil
local M = {}

M.R = 8.314462618   -- J/(mol K), CODATA 2018
M.F = 96485.33212   -- C/mol, CODATA 2018
M.T0 = 298.15       -- K, reference temperature
M.LN10 = math.log(10)

function M.nernst_slope(T) return M.R * T * M.LN10 / M.F end

function M.coefficient(reaction, species)
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

function M.boundary_slope(reaction, T_C)
  local nH, ne = M.coefficient(reaction, "H^+"), M.coefficient(reaction, "e-")
  if ne == 0 then return nil end
  return -M.R * (T_C + 273.15) * math.log(10) / M.F * nH / ne
end

function M.boundary(map, a, b)
  for _, bd in ipairs(map.boundaries) do
    if (bd.between[1] == a and bd.between[2] == b) or (bd.between[1] == b and bd.between[2] == a) then
      return bd
    end
  end
  error("no boundary between " .. a .. " and " .. b, 2)
end

function M.area_sum(map)
  local t = 0
  for _, f in ipairs(map.fields) do t = t + f.area end
  return t
end

function M.fields(map)
  local set = {}
  for _, f in ipairs(map.fields) do set[f.species] = f end
  return set
end

function M.stamp_line(lines, text)
  for _, l in ipairs(lines or {}) do
    if l:find(text, 1, true) then return l end
  end
  return nil
end

return M
