-- test_temperature_data.lua: the temperature basis of every record, and the
-- policy for log K held at 25 C.
--  1. The basis phlox reports (species.basis) agrees with the records as
--     written in a user file read here independently (a logk record without
--     dH, logK_T or estimate is held).
--  2. A map, rigorous map, speciation, fraction or solubility curve that
--     would use a held log K away from 25 C stops by default, naming the
--     species and the two ways on; accept_held_logk = true draws it and
--     stamps the held species.
--     A held species the user excludes stops nothing and is named nowhere.
--  3. Estimated species are named with their method in the stamps; one the
--     user excludes is not named.
--  4. The standard library holds nothing from 0 to 300 C: every element's
--     records have a temperature function, and a map of every element at
--     300 C runs with the default options.
local phlox = require "phlox"
local S = dofile(assert(os.getenv("PHLOX_SOURCE_DIR"), "PHLOX_SOURCE_DIR is not set (run through ctest)") .. "/tests/support/init.lua")
local check = S.check

-- a user file with one record without temperature data (ZnOH^+ with its
-- 25 C constant from Zn.lua, dH left out on purpose: a test fixture)
local tmp = os.tmpname()
local fh = assert(io.open(tmp, "wb"))
fh:write([[
return { species = {
  { formula = "ZnOH^+", model = "logk", reaction = "Zn^2+ + H2O(l) = ZnOH^+ + H^+", logK = -8.96,
    source = "test fixture: Zn.lua's 25 C constant without its dH" },
} }
]])
fh:close()
local zn = phlox.library { "Zn", user = { tmp } }
os.remove(tmp)

-- 1. the basis read from the records
local rec = zn:species("ZnOH^+")
check(rec.basis == "held", "a logk record without dH, logK_T or estimate is held: " .. tostring(rec.basis))
check(zn:species("Zn^2+").basis == "estimated" and zn:species("Zn^2+").basis_method:find("Shock and Helgeson", 1, true),
  "Zn^2+ (HKF set from the SH88 correlations) is estimated by that method")
check(zn:species("ZnO(s,zincite)").basis == "measured", "zincite has a Cp function: measured")
local held = phlox.constant_logk(zn, { "Zn" }, 473.15)
check(table.concat(held, "|") == "ZnOH^+", "constant_logk at 200 C: " .. table.concat(held, ", "))
check(#phlox.constant_logk(zn, { "Zn" }, 298.15) == 0, "at 25 C nothing is held")

-- 2. stop by default, with the species and both ways on in the message
local function stops(fn, opts, what)
  local ok, err = pcall(fn, opts)
  check(not ok, what .. " must stop on a held log K")
  err = tostring(err)
  check(err:find("ZnOH^+", 1, true), what .. ": the message names the species: " .. err)
  check(err:find("accept_held_logk", 1, true) and err:find("user data file", 1, true),
    what .. ": the message names both ways on: " .. err)
end
stops(phlox.map, { library = zn, element = "Zn", T_C = 200 }, "phlox.map")
stops(phlox.grid_map, { library = zn, element = "Zn", T_C = 200, n = 11 }, "phlox.grid_map")
stops(phlox.speciate, { library = zn, T_C = 200, totals = { Zn = 1e-6 }, pH = 8 }, "phlox.speciate")
stops(phlox.fractions, { library = zn, element = "Zn", T_C = 150, range = { 6, 12 }, n = 7 }, "phlox.fractions")
stops(phlox.solubility, { library = zn, element = "Zn", T_C = { 25, 200 }, range = { 6, 12 }, n = 7 }, "phlox.solubility")
stops(phlox.series, { library = zn, element = "Zn", T_C = { 25, 200 } }, "phlox.series")
-- the option this policy replaced is refused with a pointer to the new one
local okr, errr = pcall(phlox.map, { library = zn, element = "Zn", T_C = 200, require_temperature_data = true })
check(not okr and tostring(errr):find("accept_held_logk", 1, true), "require_temperature_data is refused: " .. tostring(errr))
-- at 25 C nothing stops
check(pcall(phlox.map, { library = zn, element = "Zn", T_C = 25 }), "at 25 C every log K is at its own temperature")
check(phlox.speciate { library = zn, T_C = 25, totals = { Zn = 1e-6 }, pH = 8 }, "speciation at 25 C")

-- accepted: drawn, listed and stamped
local m = phlox.map { library = zn, element = "Zn", T_C = 200, accept_held_logk = true }
check(m.constant_logk and m.constant_logk[1] == "ZnOH^+", "map.constant_logk lists the held species")
local stamped = S.chem.stamp_line
check(stamped(m.stamp, "log K held at 25 °C"), "the map's stamp names the held species")
local g = phlox.grid_map { library = zn, element = "Zn", T_C = 200, n = 11, accept_held_logk = true }
check(g.constant_logk and #g.constant_logk == 1, "grid_map.constant_logk")
local sp = phlox.speciate { library = zn, T_C = 200, totals = { Zn = 1e-6 }, pH = 8, accept_held_logk = true }
check(sp and stamped(sp.stamp, "ZnOH^+"), "speciation stamps the held species")
local fr = phlox.fractions { library = zn, element = "Zn", T_C = 150, range = { 6, 12 }, n = 7, accept_held_logk = true }
check(stamped(fr.stamp, "ZnOH^+"), "fraction curves name the held species")

-- a held species the user leaves out (exclude, or a map's only list) is not
-- used, so it stops nothing and is named nowhere
local function runs(fn, opts, what)
  local ok, res = pcall(fn, opts)
  check(ok, what .. " with the held species excluded must run: " .. tostring(res))
  if ok then
    local list = res.stamp or (res[1] and res[1].stamp) or {}
    check(not stamped(list, "log K held at 25"), what .. ": no held species named")
  end
end
local EX = { "ZnOH^+" }
runs(phlox.map, { library = zn, element = "Zn", T_C = 200, exclude = EX }, "phlox.map")
runs(phlox.map, { library = zn, element = "Zn", T_C = 200, only = { "Zn(s)", "Zn^2+", "ZnO(s)", "Zn(OH)4^2-" } },
  "phlox.map (only)")
runs(phlox.grid_map, { library = zn, element = "Zn", T_C = 200, n = 11, exclude = EX }, "phlox.grid_map")
runs(phlox.speciate, { library = zn, T_C = 200, totals = { Zn = 1e-6 }, pH = 8, exclude = EX }, "phlox.speciate")
runs(phlox.fractions, { library = zn, element = "Zn", T_C = 150, range = { 6, 12 }, n = 7, exclude = EX }, "phlox.fractions")
runs(phlox.series, { library = zn, element = "Zn", T_C = { 25, 200 }, exclude = EX }, "phlox.series")
-- a name the core resolves ("ZnO(s)" is zincite) is resolved the same way
stops(phlox.map, { library = zn, element = "Zn", T_C = 200, exclude = { "ZnO(s)" } }, "phlox.map excluding another species")

-- 3. estimated species are named with their method (the stdlib's Zn(OH)3^-)
local zs = phlox.library { "Zn" }
local m2 = phlox.map { library = zs, element = "Zn", T_C = 200 }
local line = stamped(m2.stamp, "temperature dependence estimated")
check(line and line:find("isocoulombic", 1, true), "the stamp names the isocoulombic species: " .. tostring(line))
check(m2.estimated_logk and #m2.estimated_logk > 0, "map.estimated_logk")
check(not stamped(phlox.map { library = zs, element = "Zn", T_C = 25 }.stamp, "estimated"),
  "at 25 C no estimate is used")
-- a species the user excludes is not named, in maps, series and rigorous maps
check(line:find("{Zn(OH)3^-}", 1, true), "the default map names Zn(OH)3^-: " .. line)
for what, res in pairs {
  map = phlox.map { library = zs, element = "Zn", T_C = 200, exclude = { "Zn(OH)3^-" } },
  series = phlox.series { library = zs, element = "Zn", T_C = { 200, 250 }, exclude = { "Zn(OH)3^-" } }[2],
  grid = phlox.grid_map { library = zs, element = "Zn", T_C = 200, n = 11, exclude = { "Zn(OH)3^-" } },
} do
  local l = stamped(res.stamp, "temperature dependence estimated, isocoulombic")
  check(l and not l:find("Zn(OH)3^-", 1, true) and l:find("{Zn(OH)4^2-}", 1, true),
    what .. ": the excluded species is not named, the others are: " .. tostring(l))
  for _, e in ipairs(res.estimated_logk or {}) do
    check(e.formula ~= "Zn(OH)3^-", what .. ": estimated_logk lists the excluded species")
  end
end

-- 4. the standard library: nothing held anywhere from 0 to 300 C
local all = phlox.available_elements() -- the ligand groups' files (CN) too
local spec = all
check(#spec > 0 and table.concat(spec, " "):find("%f[%w]CN%f[%W]"), "available_elements lists the CN group")
local lib = phlox.library(spec)
for _, tc in ipairs { 0, 50, 100, 150, 200, 250, 300 } do
  local h = phlox.constant_logk(lib, spec, tc + 273.15)
  check(#h == 0, ("standard library at %g C holds %d species at 25 C: %s"):format(tc, #h, table.concat(h, ", ")))
end
local n = 0
for _, s in ipairs(lib:list()) do
  check(s.basis ~= "held", s.formula .. " is held")
  if s.basis == "estimated" then check(s.basis_method and #s.basis_method > 0, s.formula .. " names its method") end
  n = n + 1
end
for _, el in ipairs(all) do
  if el ~= "HO" and el ~= "H" and el ~= "O" and el ~= "CN" then -- CN: a ligand group, mapped through its metals
    local ok, err = pcall(phlox.map, { library = phlox.library { el }, element = el, T_C = 300 })
    check(ok, el .. ": a 300 C map with the default options: " .. tostring(err))
  end
end
print(("test_temperature_data: all checks passed (%d species, none held)"):format(n))
