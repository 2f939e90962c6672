-- test_temperature_data.lua: maps away from 25 C name the species whose log K
-- has no temperature data (held at 25 C), and refuse to be drawn when the
-- study asks for temperature data everywhere (require_temperature_data).
-- Reference: which records lack temperature data is read from the element
-- files themselves (a logk record without dH or logK_T), independently of
-- the numerical test phlox uses.
local phlox = require "phlox"
local S = dofile(assert(os.getenv("PHLOX_SOURCE_DIR"), "PHLOX_SOURCE_DIR is not set (run through ctest)") .. "/tests/support/init.lua")
local check = S.check

local zn = phlox.library { "Zn" }

-- the records of Zn.lua with no temperature data, read from the file itself
-- (a data-only Lua table, evaluated here with an empty environment): model
-- "logk" with neither dH nor logK_T
local src = assert(os.getenv("PHLOX_SOURCE_DIR"), "PHLOX_SOURCE_DIR not set")
local fh = assert(io.open(src .. "/stdlib/elements/Zn.lua", "rb"))
local chunk = assert(load(fh:read("a"), "=Zn.lua", "t", {}))
fh:close()
local expected = {}
for _, r in ipairs(chunk().species) do
  if r.model == "logk" and r.dH == nil and r.logK_T == nil then expected[#expected + 1] = r.formula end
end
table.sort(expected)
check(#expected >= 3, "Zn.lua should have log K records without temperature data, found " .. #expected)

-- 1. the numerical detection agrees with the records
local held = phlox.constant_logk(zn, { "Zn" }, 473.15)
check(table.concat(held, "|") == table.concat(expected, "|"),
  "constant_logk at 200 C: got " .. table.concat(held, ", ") .. "; records say " .. table.concat(expected, ", "))
check(#phlox.constant_logk(zn, { "Zn" }, 298.15) == 0, "at 25 C nothing is held")

-- 2. exact map at 200 C: listed and stamped
local m = phlox.map { library = zn, element = "Zn", T_C = 200, activity = 1e-6 }
check(m.constant_logk and table.concat(m.constant_logk, "|") == table.concat(expected, "|"), "map.constant_logk")
local stamped = false
for _, line in ipairs(m.stamp or {}) do stamped = stamped or line:find("log K held at 25", 1, true) ~= nil end
check(stamped, "the map's stamp names the held species")

-- 3. require_temperature_data refuses the map and names the species
local ok, err = pcall(phlox.map, { library = zn, element = "Zn", T_C = 200, require_temperature_data = true })
check(not ok, "require_temperature_data must refuse a 200 C zinc map")
check(tostring(err):find("phlox.map", 1, true) and tostring(err):find("Zn(OH)2(aq)", 1, true),
  "the message names the function and a species: " .. tostring(err))
-- at 25 C the same request is fine
check(pcall(phlox.map, { library = zn, element = "Zn", T_C = 25, require_temperature_data = true }),
  "at 25 C every log K is at its own temperature")
-- an element whose records all carry temperature data passes at 200 C
-- (B.lua: borate from a measured log K(T), boric acid with a dissolution dH;
-- Ti.lua no longer qualifies since issue 13 added Ti^2+ from a 25 C potential)
local bo = phlox.library { "B" }
check(#phlox.constant_logk(bo, { "B" }, 473.15) == 0, "B.lua: every record has temperature data")
check(pcall(phlox.map, { library = bo, element = "B", T_C = 200, require_temperature_data = true }),
  "a B map at 200 C needs no 25 C constant")
local ti = phlox.library { "Ti" }
local held_ti = phlox.constant_logk(ti, { "Ti" }, 473.15)
check(#held_ti == 1 and held_ti[1] == "Ti^2+", "Ti.lua: only Ti^2+ is held at 25 C")

-- 4. rigorous maps: stamped too, and refused before any solve
local g = phlox.grid_map { library = zn, element = "Zn", T_C = 200, n = 11 }
check(g.constant_logk and #g.constant_logk == #expected, "grid_map.constant_logk")
local ok2, err2 = pcall(phlox.grid_map, { library = zn, element = "Zn", T_C = 200, n = 11,
                                          require_temperature_data = true })
check(not ok2 and tostring(err2):find("phlox.grid_map", 1, true), "grid_map refuses: " .. tostring(err2))

-- 5. a ligand's held species count too (Cl.lua's FeCl^+ in an Fe-Cl map)
local fecl = phlox.library { "Fe", "Cl" }
local mf = phlox.map { library = fecl, element = "Fe", ligand = "Cl", ligand_activity = 0.1, T_C = 150 }
local has = false
for _, f in ipairs(mf.constant_logk or {}) do has = has or f == "FeCl^+" end
check(has, "FeCl^+ (Cl.lua, no temperature data) is named in an Fe-Cl map at 150 C")
-- 6. fraction and solubility curves: stamped, and refused on request
local fr = phlox.fractions { library = zn, element = "Zn", T_C = 150, range = { 6, 12 }, n = 7 }
check(fr.stamp and fr.stamp[1]:find("Zn(OH)2(aq)", 1, true), "fraction curves at 150 C name the held species")
local ok3, err3 = pcall(phlox.fractions, { library = zn, element = "Zn", T_C = 150, range = { 6, 12 }, n = 7,
                                           require_temperature_data = true })
check(not ok3 and tostring(err3):find("require_temperature_data", 1, true), "fractions refuse: " .. tostring(err3))
local ok4, err4 = pcall(phlox.solubility, { library = zn, element = "Zn", T_C = { 25, 200 }, range = { 6, 12 }, n = 7,
                                            require_temperature_data = true })
check(not ok4 and tostring(err4):find("Zn(OH)2(aq)", 1, true), "solubility refuses: " .. tostring(err4))
print("test_temperature_data: all checks passed")
