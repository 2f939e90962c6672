-- test_ion_heat_capacity.lua: the isocoulombic heat capacity of an ion
-- defined by its formation reaction (estimate = { dCp = "isocoulombic",
-- model = ... }; docs/thermo.md, "Isocoulombic heat capacity").
--  1. By hand: the reaction R keeps its 25 C log K and dH, and its dCp(T) is
--     that of the model reaction M, so for Co^2+ (R: Co(s) + 2 H^+ = Co^2+ +
--     H2(g), M: the same reaction of Mg^2+, an SH88 HKF set) at T:
--       G(Co2+) = dfG - S(T - Tr) + Phi(Mg2+) + Phi(Co,s) - Phi(Mg,s),
--       Phi(x) = G_x(T) - G_x(Tr) + S_x(Tr)(T - Tr)  (the Cp integrals of x),
--     and Cp(Co2+) = Cp(Mg2+) + Cp(Co,s) - Cp(Mg,s), S = -dG/dT.
--  2. The library: the ions the method is applied to are tagged estimated
--     with the method's name in lib:list() and in `phlox list`, and each
--     names the model ion of the documented rule (tests/tools/estimates_def.lua,
--     M.library_ion_models: same charge and kind, closest S at 25 C).
--  3. Refused: a model whose net positive ionic charge differs from the
--     reaction's (the difference would need water ionisations: not
--     isocoulombic) and a model resting on an estimated ion.
-- The validation against ions with measured heat capacities is the table of
-- docs/data-checks.md (estimates_def.lua), checked by test_temperature_estimates.lua.
local phlox = require "phlox"
local S = dofile(assert(os.getenv("PHLOX_SOURCE_DIR"), "PHLOX_SOURCE_DIR is not set (run through ctest)") .. "/tests/support/init.lua")
local check, close = S.check, S.close
local TR = 298.15

-- 1
local lib = phlox.library { "Co" }
check(lib:species("Mg^2+") ~= nil, "a Co library loads Mg for the model of Co^2+ (lib.model_elements)")
local function phi(f, T)
  local a, b = lib:props(f, { T = T }), lib:props(f, { T = TR, P = 1 })
  return a.G - b.G + b.S * (T - TR)
end
local co25 = lib:props("Co^2+", { T = TR, P = 1 })
for _, tc in ipairs { 100, 200, 300 } do
  local T = tc + 273.15
  local p = lib:props("Co^2+", { T = T })
  local g = co25.G - co25.S * (T - TR) + phi("Mg^2+", T) + phi("Co(s)", T) - phi("Mg(s)", T)
  close(p.G, g, 1e-6 * math.abs(g), ("Co^2+ G at %d C vs the isocoulombic dCp by hand, J/mol"):format(tc))
  local cp = lib:props("Mg^2+", { T = T }).Cp + lib:props("Co(s)", { T = T }).Cp - lib:props("Mg(s)", { T = T }).Cp
  close(p.Cp, cp, 1e-6 * math.abs(cp), ("Co^2+ Cp at %d C = Cp(Mg2+) + Cp(Co) - Cp(Mg), J/(mol K)"):format(tc))
  local h, P = 0.01, 100 -- bar: liquid water from 100 to 300 C
  local s = -(lib:props("Co^2+", { T = T + h, P = P }).G - lib:props("Co^2+", { T = T - h, P = P }).G) / (2 * h)
  close(lib:props("Co^2+", { T = T, P = P }).S, s, 1e-4 * math.max(1, math.abs(s)),
    ("Co^2+ S = -dG/dT at %d C, 100 bar, J/(mol K)"):format(tc))
  local gl = lib:species("Co^2+")
  check(gl.basis == "estimated", "Co^2+ is estimated")
end

-- 2
local all = phlox.library(phlox.available_elements())
local defs = dofile(S.SRC .. "/tests/tools/estimates_def.lua")
local applied = defs.library_ion_models(all)
local want = { ["Co^2+"] = "Co", ["Sn^2+"] = "Sn", ["Hg^2+"] = "Hg", ["Hg2^2+"] = "Hg", ["Ba^2+"] = "Ba",
               ["CrO4^2-"] = "Cr", ["MoO4^2-"] = "Mo", ["MnO4^2-"] = "Mn" }
local seen = 0
for _, x in ipairs(applied) do
  check(x.named ~= nil and x.named == x.rule, ("%s: element file's model ion %s, the rule picks %s"):format(
    x.species, tostring(x.named), tostring(x.rule)))
  if want[x.species] then seen = seen + 1 end
end
check(seen == 8, "the eight ions carry the isocoulombic heat capacity: " .. seen)
for f, el in pairs(want) do
  local code, out = S.proc.run(S.files.quote(S.BIN) .. " list " .. el)
  check(code == 0, "phlox list " .. el .. " runs")
  local line
  for l in out:gmatch("[^\n]+") do
    if l:sub(1, #f + 1) == f .. " " then line = l end
  end
  check(line and line:find("[estimated: isocoulombic heat capacity, model substance (Lindsay 1980); model reaction", 1, true),
    "phlox list tags " .. f .. ": " .. tostring(line))
end

-- 3
local dir = S.files.tmpdir()
local function user(body)
  local path = dir .. "/u.lua"
  S.files.write(path, body)
  return pcall(phlox.library, { "Co", "Ni", user = { path } })
end
local ok, l = user([[return { species = { { formula = "Co^2+", model = "logk", reaction = "Co(s) + 2 H^+ = Co^2+ + H2(g)",
  logK = 9.53, dH = -58.2, source = "test",
  estimate = { dCp = "isocoulombic", model = "Mg(s) + 2 H2O(l) = Mg^2+ + 2 OH^- + H2(g)" } } } }]])
check(ok, "the user file loads (the model is checked when evaluated): " .. tostring(l))
local ok2, why = pcall(l.props, l, "Co^2+", { T_C = 200 })
check(not ok2 and tostring(why):find("same ionic charge", 1, true),
  "a model that is not of the reaction's charge type is refused: " .. tostring(why))
ok, l = user([[return { species = { { formula = "Co^2+", model = "logk", reaction = "Co(s) + 2 H^+ = Co^2+ + H2(g)",
  logK = 9.53, dH = -58.2, source = "test",
  estimate = { dCp = "isocoulombic", model = "Ni(s) + 2 H^+ = Ni^2+ + H2(g)" } } } }]])
check(ok and l:species("Ni^2+").basis == "estimated", "Ni^2+ carries an estimate (the case needs it)")
ok2, why = pcall(l.props, l, "Co^2+", { T_C = 200 })
check(not ok2 and tostring(why):find("no measured temperature data", 1, true),
  "a model resting on an estimated ion is refused: " .. tostring(why))
os.execute("rm -rf " .. S.files.quote(dir))
print("test_ion_heat_capacity: all checks passed")
