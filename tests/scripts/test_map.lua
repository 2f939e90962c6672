-- test_map.lua: exact predominance maps built from the standard library,
-- checked against hand calculation with the Nernst equation (E = E0 +
-- (RT ln10 / nF) log a; textbook), the water lines of any electrochemistry
-- text (E = 1.229 - 0.05916 pH, E = -0.05916 pH at 25 C, 1 bar) and the
-- geometry rules of a map (fields tile the window, boundaries separate the
-- two fields they name).
local phlox = require "phlox"
local S = dofile(assert(os.getenv("PHLOX_SOURCE_DIR"), "PHLOX_SOURCE_DIR is not set (run through ctest)") .. "/tests/support/init.lua")
local check, close = S.check, S.close
local K = S.chem
local slope = K.nernst_slope

local lib = phlox.library { "Zn" }
local m = phlox.map { library = lib, element = "Zn", T_C = 25 }

-- tiling: areas add up to the window (14 pH units x 4 V)
local total = 0
for _, f in ipairs(m.fields) do total = total + f.area end
close(total, 56, 56e-9, "field areas sum to the window")
check(m.unmatched_edges == 0, "every interior edge has a partner")

local function boundary(a, b) return K.boundary(m, a, b) end

-- Zn2+/Zn at a(Zn2+) = 1e-6: E = E0 - 6 x 0.029580 V = E0 - 0.1775 V (Nernst)
local E0 = lib:reaction("Zn^2+ + 2 e- = Zn(s)", { T_C = 25 }).E
close(E0, -0.7618, 0.005, "E0 Zn2+/Zn vs CRC Handbook electrochemical series (from memory; tests/reference/standard_potentials.csv)")
local bd = boundary("Zn^2+", "Zn(s)")
check(not bd.line.vertical and bd.line.b == 0, "Zn2+/Zn is horizontal")
close(bd.line.a, E0 - 3 * slope(298.15), 1e-9, "Zn2+/Zn line at E0 - 0.1775 V")
close(3 * slope(298.15), 0.17748, 5e-5, "6 x 0.02958 V")
check(bd.reaction == "Zn^2+ + 2 e- = Zn(s)", "boundary reaction text: " .. bd.reaction)

-- slopes: -0.05916 nH/ne V per pH at 25 C
local b2 = boundary("Zn(OH)2(aq)", "Zn(s)")
close(b2.line.b, -slope(298.15) * 2 / 2, 1e-9, "Zn(OH)2(aq)/Zn slope (2 H+, 2 e-)")
local b4 = boundary("Zn(OH)4^2-", "Zn(s)")
close(b4.line.b, -slope(298.15) * 4 / 2, 1e-9, "Zn(OH)4^2-/Zn slope (4 H+, 2 e-)")
close(slope(298.15), 0.05916, 5e-6, "Nernst slope at 25 C")

-- each boundary separates exactly its two fields: probe both sides of its midpoint
for _, bd in ipairs(m.boundaries) do
  local mx, my = (bd.x[1] + bd.x[2]) / 2, (bd.y[1] + bd.y[2]) / 2
  local dx, dy = bd.x[2] - bd.x[1], bd.y[2] - bd.y[1]
  local len = math.sqrt(dx * dx + dy * dy)
  local nx, ny = -dy / len * 1e-4, dx / len * 1e-4
  local s1 = phlox.locate(m, mx + nx, my + ny)
  local s2 = phlox.locate(m, mx - nx, my - ny)
  check((s1 == bd.between[1] and s2 == bd.between[2]) or (s1 == bd.between[2] and s2 == bd.between[1]),
        ("boundary %s|%s separates %s and %s"):format(bd.between[1], bd.between[2], tostring(s1), tostring(s2)))
end

-- queries: which species at (pH, E)
check(phlox.locate(m, 2, -1.5) == "Zn(s)", "immunity at pH 2, -1.5 V")
check(phlox.locate(m, 2, 0.0) == "Zn^2+", "Zn2+ at pH 2, 0 V")

-- water lines and neutral pH at 25 C
close(m.water.o2.a, 1.229, 0.001, "O2/H2O at pH 0 (textbook 1.229 V)")
close(m.water.o2.b, -0.05916, 1e-5, "water line slope")
check(m.water.h2.a == 0, "H+/H2 is 0 V at pH 0 at every T (SHE convention)")
close(m.neutral_pH, 7.0, 0.01, "neutral pH at 25 C (pKw 13.995, IAPWS R11-07)")

-- domains: immunity, corrosion (and passivation when a solid shows) add up to the window
local dom = 0
for _, d in ipairs(m.domains) do dom = dom + (d.hole and -d.area or d.area) end
close(dom, 56, 56e-9, "corrosion domains tile the window")

-- temperature: slopes scale with T (RT ln10 / F)
local m200 = phlox.map { library = lib, element = "Zn", T_C = 200 }
for _, bd in ipairs(m200.boundaries) do
  if bd.between[1] == "Zn(s)" or bd.between[2] == "Zn(s)" then
    local other = bd.between[1] == "Zn(s)" and bd.between[2] or bd.between[1]
    local nH = ({ ["Zn^2+"] = 0, ["Zn(OH)2(aq)"] = 2, ["Zn(OH)3^-"] = 3, ["Zn(OH)4^2-"] = 4 })[other]
    if nH then close(bd.line.b, -slope(473.15) * nH / 2, 1e-9, "slope at 200 C for " .. other) end
  end
end
close(m200.water.o2.b, -slope(473.15), 1e-12, "water line slope at 200 C")
-- species with an estimated temperature function are named at 200 C
-- (Zn(OH)2(aq) has a log K from Baes and Mesmer 1976 without a reaction
-- enthalpy in Zn.lua: isocoulombic estimate), and ZnOH^+ (which has a
-- measured dH) is not; nothing of the standard library is held
local est = {}
for _, e in ipairs(m200.estimated_logk or {}) do est[#est + 1] = e.formula end
est = table.concat(est, " ")
check(est:find("Zn(OH)2(aq)", 1, true) and not est:find("ZnOH^+", 1, true), "estimated note: " .. est)
check(m200.constant_logk == nil, "nothing of Zn.lua is held at 25 C")
check(m.estimated_logk == nil, "no estimate note at 25 C")

-- a map with a ligand: Fe with dissolved sulfur at 1e-3
local fs = phlox.map { library = phlox.library { "Fe", "S" }, element = "Fe", T_C = 25, ligand = "S" }
total = 0
for _, f in ipairs(fs.fields) do total = total + f.area end
close(total, 56, 56e-9, "Fe-S map tiles the window")
check(fs.unmatched_edges == 0, "Fe-S map: no unmatched edges")
local pyrite = false
for _, f in ipairs(fs.fields) do pyrite = pyrite or f.species:find("^FeS2") ~= nil end
check(pyrite, "pyrite has a field in the Fe-S map at 25 C")

-- misuse is reported clearly
local ok, err = pcall(phlox.map, { library = lib, element = "Xx" })
check(not ok and err:find("Xx"), "unknown element: " .. tostring(err))
ok, err = pcall(phlox.map, { library = lib, element = "Zn", T_C = 400 })
check(not ok and err:find("range"), "temperature out of range: " .. tostring(err))
print("test_map: all checks passed")
