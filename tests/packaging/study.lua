-- study.lua - a short study run twice by tests/packaging/test_lua_module.sh:
-- through the stock lua5.4 interpreter with the installed module, and
-- through the phlox program.  It prints its results; the two runs must print
-- the same lines.  Checks against published values are asserted here.
local phlox = require "phlox"
local plot = require "phlox.plot"
local out = arg and arg[1]
assert(out, "usage: study.lua OUTPUT-FOLDER")

local lib = phlox.library { "Zn" }

-- E0 of Zn^2+ + 2 e- = Zn(s) at 25 C, tests/reference/standard_potentials.csv:
-- CRC Electrochemical Series -0.7618 V (the row's note: NBS 1982 -0.7621,
-- CODATA -0.7628 V; the spread of the compilations, 1.5 mV, is the tolerance).
local E0_REF, E0_TOL = -0.7618, 0.0015
local r = assert(lib:reaction("Zn^2+ + 2 e- = Zn(s)", { T_C = 25 }))
assert(math.abs(r.E - E0_REF) <= E0_TOL, ("E0 %.4f V, published %.4f V"):format(r.E, E0_REF))
print(("E0(Zn^2+/Zn, 25 C) = %.6f V"):format(r.E))
local r150 = assert(lib:reaction("Zn^2+ + 2 e- = Zn(s)", { T_C = 150 }))
print(("log K(150 C) = %.6f"):format(r150.logK))

-- The immunity boundary at pH 5 and a(Zn^2+) = 1e-6 lies at the Nernst
-- potential E0 + (RT ln10 / 2F) log10(1e-6) (Nernst equation; CRC E0 as above,
-- RT ln10/F = 0.059159 V at 25 C from CODATA 2018 R and F).
local ACT = 1e-6
local map = phlox.map { library = lib, element = "Zn", T_C = 25, activity = ACT }
local lo, hi = -1.5, -0.5
assert(phlox.locate(map, 5, lo) == "Zn(s)" and phlox.locate(map, 5, hi) == "Zn^2+",
  "at pH 5 the map must go from Zn(s) to Zn^2+ between -1.5 and -0.5 V")
for _ = 1, 40 do
  local mid = (lo + hi) / 2
  if phlox.locate(map, 5, mid) == "Zn(s)" then lo = mid else hi = mid end
end
local nernst = E0_REF + 0.059159 / 2 * math.log(ACT, 10)
assert(math.abs(lo - nernst) <= E0_TOL, ("boundary %.4f V, Nernst %.4f V"):format(lo, nernst))
print(("Zn(s)/Zn^2+ at pH 5, a = 1e-6: %.5f V (Nernst with CRC E0: %.5f V)"):format(lo, nernst))

-- A figure through cairo, inside the module.
local fig = out .. "/Zn-25C.svg"
plot.map(map, { file = fig })
local f = assert(io.open(fig, "rb"), "no figure written")
local svg = f:read("a")
f:close()
assert(svg:find("<svg", 1, true) and svg:find("Zn", 1, true), "the figure is not an SVG of the zinc map")
print("figure: " .. #map.fields .. " fields")

-- A speciation.
local s = assert(phlox.speciate { library = lib, T_C = 150, totals = { Zn = 1e-5 }, pH = 9, solids = false })
local names = {}
for name in pairs(s.species or {}) do names[#names + 1] = name end
table.sort(names)
print("speciation species: " .. #names)
print("version " .. phlox.version)
