-- tests/data/common.lua: helpers shared by the data checks tests/data/test_data_*.lua.
-- Not a test itself (ctest registers only test_*.lua). Each check script loads it with
--     local C = dofile((arg[0]:match("^(.*)[/\\]") or ".") .. "/common.lua")
-- Plain Lua 5.4, independent of phlox's C loader, so the checks and phlox can check
-- each other. What the scripts check, and against which numbers, stays in the scripts.

local M = {}
local SUP = (debug.getinfo(1, "S").source:match("^@(.*)[/\\]") or ".") .. "/../support/"

---------------------------------------------------------------------------- constants
local K = dofile(SUP .. "chem.lua")
M.R, M.F, M.T0, M.LN10 = K.R, K.F, K.T0, K.LN10 -- CODATA 2018 (tests/support/chem.lua)
M.CAL = 4.184             -- J per thermochemical calorie

-- Unit words of docs/element-files.md to kJ (energy) and J/(mol K) (entropy).
M.ENERGY = { kJ = 1, J = 1e-3, kcal = 4.184, cal = 4.184e-3 }
M.ENTROPY = { J = 1, cal = 4.184 }
M.MODELS = { cp = true, hkf = true, logk = true }
M.QUALITY = { high = true, medium = true, low = true }
M.STATES = { aq = true, s = true, cr = true, am = true, l = true, g = true }
M.HKF_KEYS = { "a1", "a2", "a3", "a4", "c1", "c2", "omega" }

---------------------------------------------------------------------------- reporting
-- A reporter prints one line per result, prefixed by labels[status], and counts them;
-- near(a, b, tol): |a - b| <= tol for two numbers (tests/support/check.lua).
local T = dofile(SUP .. "check.lua")
M.reporter, M.near = T.reporter, T.near

---------------------------------------------------------------------------- sandbox
-- Element files are data: they run with the pure helpers docs/element-files.md promises and a
-- bounded instruction count, and must return a table.
function M.sandbox_env()
  return {
    math = math,
    string = { format = string.format, sub = string.sub, upper = string.upper,
               lower = string.lower, rep = string.rep },
    table = { insert = table.insert, concat = table.concat },
    pairs = pairs, ipairs = ipairs, tonumber = tonumber, tostring = tostring,
    type = type, error = error,
  }
end

function M.load_definition(path)
  local fh = io.open(path, "r")
  if not fh then return nil, "cannot open " .. path end
  local text = fh:read("a"); fh:close()
  local chunk, err = load(text, "@" .. path, "t", M.sandbox_env())
  if not chunk then return nil, err end
  local co = coroutine.create(chunk)
  debug.sethook(co, function() error("instruction budget exceeded") end, "", 1000000)
  local ok, res = coroutine.resume(co)
  if not ok then return nil, res end
  if type(res) ~= "table" then return nil, "file does not return a table" end
  return res
end

---------------------------------------------------------------------------- CSV
-- The shared reader of tests/support/csv.lua (RFC 4180 quoting).
local CSV = dofile(SUP .. "csv.lua")
M.csv_split = CSV.split

-- Rows of a CSV file with a header line, each a table keyed by the header names.
M.read_csv = CSV.rows

---------------------------------------------------------------------------- formulas
-- Split a trailing state group off a formula: "AlO(OH)(s,boehmite)" -> "AlO(OH)", "s".
-- The group counts as a state when it is a state word alone or one followed by a
-- comma and a name; otherwise the formula is returned whole with state nil.
function M.split_state(f)
  local last = f:match("%(([^()]*)%)$")
  if last then
    local st = last:match("^(%a+)")
    if st and M.STATES[st] and (last == st or last:sub(#st + 1, #st + 1) == ",")
       and #f > #last + 2 then
      return f:sub(1, #f - #last - 2), st
    end
  end
  return f, nil
end

-- Element counts, charge and state of a formula in phlox notation ("Al13O4(OH)24^7+",
-- "AlO(OH)(s,boehmite)", "CaSO4*2H2O(s,gypsum)", "e-"). Hydrate parts may be joined by
-- "*" or "."; state is "aq" for an ion without a state group. Raises an error on
-- text it cannot read.
function M.parse_formula(f)
  if f == "e-" then return {}, -1, "e" end
  local body, state = M.split_state(f)
  local charge = 0
  local core, q, sign = body:match("^(.-)%^(%d*)([%+%-])$")
  if core then
    charge = (tonumber(q) or 1) * (sign == "+" and 1 or -1)
    body = core
    state = state or "aq"
  end
  local counts = {}
  local function add(into, el, n) into[el] = (into[el] or 0) + n end
  local function parse_group(s, pos, depth)
    local grp = {}
    while pos <= #s do
      local c = s:sub(pos, pos)
      if c == "(" then
        local inner; inner, pos = parse_group(s, pos + 1, depth + 1)
        local d = s:match("^%d+", pos); local m = tonumber(d) or 1
        pos = pos + (d and #d or 0)
        for el, n in pairs(inner) do add(grp, el, n * m) end
      elseif c == ")" then
        if depth == 0 then error("unbalanced parenthesis in formula " .. f) end
        return grp, pos + 1
      else
        local el = s:match("^%u%l?", pos)
        if not el then error("bad formula '" .. f .. "' at '" .. s:sub(pos) .. "'") end
        pos = pos + #el
        local d = s:match("^%d+", pos); local m = tonumber(d) or 1
        pos = pos + (d and #d or 0)
        add(grp, el, m)
      end
    end
    if depth > 0 then error("unbalanced parenthesis in formula " .. f) end
    return grp, pos
  end
  for part in body:gmatch("[^%*%.]+") do
    local mult, rest = part:match("^(%d+)(.*)$")
    mult = tonumber(mult) or 1; rest = rest or part
    local grp = parse_group(rest, 1, 0)
    for el, n in pairs(grp) do add(counts, el, n * mult) end
  end
  return counts, charge, state
end

---------------------------------------------------------------------------- reactions
-- "a A + b B = c C + d D" -> list of { f = formula, nu = signed coefficient } in text
-- order, reactants negative. Raises an error on text it cannot read.
function M.parse_reaction(text)
  local lhs, rhs = text:match("^(.-)%s+=%s+(.-)$")
  if not lhs then error("no ' = ' in reaction " .. text) end
  local terms = {}
  local function side(s, sign)
    for term in (s .. " + "):gmatch("(.-)%s+%+%s+") do
      term = term:match("^%s*(.-)%s*$")
      local k, f = term:match("^(%d*%.?%d*)%s+(%S+)$")
      if not (k and tonumber(k)) then k, f = "1", term:match("^(%S+)$") end
      if not f then error("cannot read term '" .. term .. "' in " .. text) end
      terms[#terms + 1] = { nu = sign * tonumber(k), f = f }
    end
  end
  side(lhs, -1); side(rhs, 1)
  return terms
end

-- Net element counts and charge of a reaction (products minus reactants), how often
-- the formula self appears in it, and the terms whose formula does not parse
-- ({ f = formula, err = message }, left out of the sums).
function M.balance(terms, self)
  local bal, q, n_self, unparsed = {}, 0, 0, {}
  for _, t in ipairs(terms) do
    if t.f == self then n_self = n_self + 1 end
    local ok, comp, chg = pcall(M.parse_formula, t.f)
    if not ok then unparsed[#unparsed + 1] = { f = t.f, err = comp }
    else
      for el, n in pairs(comp) do bal[el] = (bal[el] or 0) + t.nu * n end
      q = q + t.nu * chg
    end
  end
  return bal, q, n_self, unparsed
end

---------------------------------------------------------------------------- heat capacity
-- Maier-Kelley style polynomial of docs/element-files.md (a + b T + c/T^2 + d/sqrt(T) + e T^2).
function M.cp_poly(c, T)
  return c.a + (c.b or 0) * T + (c.c or 0) / T ^ 2 + (c.d or 0) / math.sqrt(T) + (c.e or 0) * T ^ 2
end

-- Revised HKF (Tanger and Helgeson 1988) Cp in cal/(mol K) and V in cm3/mol at 25 C,
-- 1 bar, from a record's hkf parameters in the papers' units, with the Born functions
-- Q = 5.903e-7 /bar and X = -3.09e-7 /K^2 as quoted in the HKF papers (the c1, c2 were
-- regressed with these; tests/reference/hkf/README.md). theta = 228 K, psi = 2600 bar
-- (Tanger and Helgeson 1988). At P = Pr the a3/a4 Cp term vanishes.
M.HKF_THETA, M.HKF_PSI = 228, 2600
M.BORN_Q, M.BORN_X = 5.903e-7, -3.09e-7
function M.hkf_cp_v_25C(h)
  local T, P = M.T0, 1
  local theta, psi = M.HKF_THETA, M.HKF_PSI
  local a1, a2, a3, a4 = h.a1 / 10, h.a2 * 100, h.a3, h.a4 * 1e4
  local c1, c2, w = h.c1, h.c2 * 1e4, h.omega * 1e5
  local V = (a1 + a2 / (psi + P) + (a3 + a4 / (psi + P)) / (T - theta) - w * M.BORN_Q) * 41.84
  local Cp = c1 + c2 / (T - theta) ^ 2 + w * T * M.BORN_X
  return Cp, V
end

return M
