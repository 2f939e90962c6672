-- test_temperature_estimates.lua: the temperature-estimation methods.
--  1. The isocoulombic estimate on cases computable by hand:
--     a) Zn^2+ + H2O(l) = ZnOH^+ + H^+ is isocoulombic as written (n = 0):
--        log K(T) = log K(25 C) 298.15/T exactly;
--     b) Ag^+ + Cl^- = AgCl(aq) takes one water ionisation (n = 1):
--        log K(T) = [log K(25 C) + log Kw(25 C)] 298.15/T - log Kw(T), with
--        Kw from IAPWS R11-07 (tests/reference/water.csv, python3-iapws);
--        phlox's own Kw (HKF H^+/OH^- with IAPWS-95 water) agrees with R11-07
--        within 0.03 (docs/thermo.md), so the tolerance is 0.03 + 0.03.
--  1c. The model-reaction form by hand: NiCl^+ with the model
--     Cu^2+ + Cl^- = CuCl^+ (R - M = Ni^2+ + CuCl^+ = NiCl^+ + Cu^2+, n = 0):
--     log K(T) = [log K_R(25 C) - log K_M(25 C)] 298.15/T + log K_M(T), with
--     log K_M(T) by van 't Hoff from the CuCl^+ record's measured dH;
--     a library without Cu loads Cu for the model (lib.model_elements); the
--     element files name exactly the models of the documented rule
--     (estimates_def.library_models); a model with an estimated species and a
--     malformed model are refused.
--  2. The validation table of docs/data-checks.md (tests/tools/estimates_def.lua)
--     recomputed: each method's mean and maximum error at 100, 200 and 300 C
--     (isocoulombic, HKF correlations, Kopp-Neumann and the baselines) must
--     stay within estimates_def.DOC_MARGIN of the values documented in
--     docs/thermo.md.
--  3. Kopp-Neumann by hand: Kopp's atomic heats (Kopp 1865, as tabulated in
--     Perry's handbook, from memory: H 2.3, O 4.0, others 6.2 cal/(g-atom K))
--     give Ni(OH)2(s) 6.2 + 2 x 4.0 + 2 x 2.3 = 18.8 cal/(mol K).
local phlox = require "phlox"
local S = dofile(assert(os.getenv("PHLOX_SOURCE_DIR"), "PHLOX_SOURCE_DIR is not set (run through ctest)") .. "/tests/support/init.lua")
local check, close = S.check, S.close
local LT = { strict = true } -- the bounds below are strict (|a - b| < tol)
local src = S.SRC

local lib = phlox.library { "Zn", "Ag", "Cl" }
local TR = 298.15

-- 1a
for _, tc in ipairs { 100, 200, 300 } do
  local T = tc + 273.15
  local k, n = lib.db:isocoulombic("Zn^2+ + H2O(l) = ZnOH^+ + H^+", -8.96, T)
  check(n == 0, "ZnOH^+ hydrolysis is isocoulombic as written")
  close(k, -8.96 * TR / T, 1e-9, ("ZnOH^+ log K at %d C vs log K(25 C) 298.15/T"):format(tc), LT)
end

-- 1b: pKw of R11-07 along saturation (tests/reference/water.csv)
local pKw = {}
for _, r in ipairs(S.csv.reference("water.csv")) do
  if r.group == "saturation_liquid_computed" and r.quantity == "pKw" then pKw[tonumber(r.t_C)] = tonumber(r.value) end
end
check(pKw[25] and pKw[300], "pKw rows in water.csv")
local TOL_KW = 0.03 + 0.03 -- phlox Kw vs R11-07 at T and at 25 C (docs/thermo.md)
for _, tc in ipairs { 100, 200, 300 } do
  local T = tc + 273.15
  local k, n = lib.db:isocoulombic("Ag^+ + Cl^- = AgCl(aq)", 3.27, T)
  check(n == 1, "AgCl(aq) formation takes one water ionisation, got " .. tostring(n))
  local hand = (3.27 - pKw[25]) * TR / T + pKw[tc]
  close(k, hand, TOL_KW, ("AgCl(aq) log K at %d C: phlox vs by hand"):format(tc),
        { strict = true, source = "TOL_KW: phlox Kw vs R11-07 at T and at 25 C, docs/thermo.md" })
end
-- the species evaluated through its record gives the same log K as the function
local zlib = phlox.library { "Zn" }
local rec = zlib:species("Zn(OH)3^-")
check(rec.basis == "estimated" and rec.basis_method:find("isocoulombic", 1, true), "Zn(OH)3^- is an isocoulombic estimate")
for _, tc in ipairs { 100, 300 } do
  local T = tc + 273.15
  local a = zlib:reaction(rec.reaction, { T = T }).logK
  local b = zlib.db:isocoulombic(rec.reaction, rec.logK25, T)
  close(a, b, 1e-9, ("Zn(OH)3^- log K at %d C: record vs function"):format(tc), LT)
  -- H, S, Cp of the record are consistent with G: -dG/dT = S (central difference)
  local h, P = 0.01, 100 -- K, bar (fixed, liquid to 300 C: the default pressure jumps at 100 C)
  local g1 = zlib:props("Zn(OH)3^-", { T = T - h, P = P }).G
  local g2 = zlib:props("Zn(OH)3^-", { T = T + h, P = P }).G
  local p = zlib:props("Zn(OH)3^-", { T = T, P = P })
  close(-(g2 - g1) / (2 * h), p.S, 0.05, ("Zn(OH)3^- at %d C: -dG/dT (central difference) vs S, J/(mol K)"):format(tc), LT)
end

-- 1c
do
  local R_LN10 = 8.314462618 * math.log(10)
  local nlib = phlox.library { "Ni", "Cl" }
  -- Cu for the NiCl^+ model, and then S for the sulfate-balanced model of CuCl3^2- (s5-cucl)
  -- (S in turn names CaSO4(aq) as the model of NiSO4(aq): Ca)
  local me = {}
  for _, e in ipairs(nlib.model_elements or {}) do me[e] = true end
  check(me.Cu and me.S and me.Ca and #nlib.model_elements == 3,
        "Ni + Cl library loads Cu for the NiCl^+ model (and S, Ca for CuCl3^2-'s): " .. table.concat(nlib.model_elements or {}, ","))
  check(#nlib.elements == 2, "model elements are not listed as the library's elements")
  local rec = nlib:species("NiCl^+")
  check(rec.estimate_model == "Cu^2+ + Cl^- = CuCl^+", "NiCl^+ model: " .. tostring(rec.estimate_model))
  local m = nlib:species("CuCl^+")
  check(m.basis == "measured" and m.dH, "CuCl^+ has a measured dH")
  for _, tc in ipairs { 25, 100, 200, 300 } do
    local T = tc + 273.15
    local km = m.logK25 - m.dH / R_LN10 * (1 / T - 1 / TR)
    local hand = (rec.logK25 - m.logK25) * TR / T + km
    local got = nlib:reaction(rec.reaction, { T = T }).logK
    close(got, hand, 1e-9, ("NiCl^+ log K at %d C: phlox vs by hand"):format(tc), LT)
  end
  -- S = -dG/dT of the record holds with the model too
  local h, P = 0.01, 100
  local T = 473.15
  local g1 = nlib:props("NiCl^+", { T = T - h, P = P }).G
  local g2 = nlib:props("NiCl^+", { T = T + h, P = P }).G
  local p = nlib:props("NiCl^+", { T = T, P = P })
  close(-(g2 - g1) / (2 * h), p.S, 0.05, "NiCl^+ at 200 C: -dG/dT (central difference) vs S, J/(mol K)", LT)
  -- refusals: a model with an estimated species; a model that does not balance
  local function user(text)
    local path = os.tmpname()
    local fh = assert(io.open(path, "wb")); fh:write(text); fh:close()
    local ok, l = pcall(phlox.library, { "Ni", "Cl", "Zn", user = { path } })
    os.remove(path)
    return ok, l
  end
  local ok, l = user([[return { species = { { formula = "NiCl^+", model = "logk", reaction = "Ni^2+ + Cl^- = NiCl^+",
    logK = 0.40, source = "test", estimate = { method = "isocoulombic", model = "Zn^2+ + 3 H2O(l) = Zn(OH)3^- + 3 H^+" } } } }]])
  check(ok, "a library with a user model loads: " .. tostring(l))
  local k, why = l.db:reaction("Ni^2+ + Cl^- = NiCl^+", 473.15)
  check(not k and tostring(why):find("no measured temperature data", 1, true), "estimated model refused: " .. tostring(why))
  -- an estimated species that cancels once the model's logk species are
  -- written as their formation reactions does not enter the model's dG(T):
  -- Zn^2+ (HKF estimate) in Zn^2+ + Cl^- = ZnCl^+ (measured dH) is accepted,
  -- and the result is the hand formula with the model's van 't Hoff log K
  ok, l = user([[return { species = { { formula = "NiCl^+", model = "logk", reaction = "Ni^2+ + Cl^- = NiCl^+",
    logK = 0.40, source = "test", estimate = { method = "isocoulombic", model = "Zn^2+ + Cl^- = ZnCl^+" } } } }]])
  check(ok, "a library with a cancelling model loads: " .. tostring(l))
  check(l:species("Zn^2+").basis == "estimated", "Zn^2+ is an HKF estimate (the case tested)")
  local zm = l:species("ZnCl^+")
  for _, tc in ipairs { 100, 300 } do
    local T = tc + 273.15
    local km = zm.logK25 - zm.dH / R_LN10 * (1 / T - 1 / TR)
    local hand = (0.40 - zm.logK25) * TR / T + km
    local got = l:reaction("Ni^2+ + Cl^- = NiCl^+", { T = T }).logK
    close(got, hand, 1e-9, ("NiCl^+ log K on the ZnCl^+ model at %d C: phlox vs by hand"):format(tc), LT)
  end
  -- ...but where it does not cancel, the model is refused even though every
  -- species written in it is measured (ZnCl^+ rests on Zn^2+)
  ok, l = user([[return { species = { { formula = "NiCl^+", model = "logk", reaction = "Ni^2+ + Cl^- = NiCl^+",
    logK = 0.40, source = "test", estimate = { method = "isocoulombic", model = "Zn(s) + Cl^- + 2 H^+ = ZnCl^+ + H2(g)" } } } }]])
  check(ok, "a library with a non-cancelling model loads: " .. tostring(l))
  k, why = l.db:reaction("Ni^2+ + Cl^- = NiCl^+", 473.15)
  check(not k and tostring(why):find("Zn^2+ has no measured temperature data", 1, true),
    "model resting on an estimated ion refused: " .. tostring(why))
  ok, l = user([[return { species = { { formula = "NiCl^+", model = "logk", reaction = "Ni^2+ + Cl^- = NiCl^+",
    logK = 0.40, source = "test", estimate = { method = "isocoulombic", model = "Cu^2+ + Cl^- = CuCl2(aq)" } } } }]])
  check(not ok and tostring(l):find("estimate.model", 1, true), "unbalanced model refused: " .. tostring(l))
  ok, l = user([[return { species = { { formula = "NiCl^+", model = "logk", reaction = "Ni^2+ + Cl^- = NiCl^+",
    logK = 0.40, source = "test", estimate = { method = "isocoulombic" } } } }]])
  check(not ok and tostring(l):find("estimate.model", 1, true), "table form without a model refused: " .. tostring(l))
end

-- 2
local defs = dofile(src .. "/tests/tools/estimates_def.lua")
local rows, sum = defs.run(phlox)
check(#rows > 50, "validation set too small: " .. #rows)
local bad = {}
for m, byT in pairs(defs.DOCUMENTED) do
  for tc, d in pairs(byT) do
    local s = sum[m][tc]
    for _, q in ipairs { "mean", "max" } do
      if not S.near(s[q], d[q], defs.DOC_MARGIN) then
        bad[#bad + 1] = ("%s at %d C: %s %s, documented %s (tolerance %g, estimates_def.DOC_MARGIN)"):format(
          m, tc, q, tostring(s[q]), tostring(d[q]), defs.DOC_MARGIN)
      end
    end
  end
end
check(next(defs.DOCUMENTED), "documented errors missing")
for m in pairs(defs.DOCUMENTED) do check(sum[m], "no recomputed summary for " .. m) end
-- the element files follow the documented model rule, species by species
check(#sum.library_models >= 8, "estimated complexes of the library: " .. #sum.library_models)
local all = phlox.library(phlox.available_elements())
for _, x in ipairs(sum.library_models) do
  local rec = all:species(x.species)
  check(rec.estimate_model == x.model, ("%s: element file names model %s, the rule picks %s"):format(
    x.species, tostring(rec.estimate_model), tostring(x.model)))
end
check(#bad == 0, "validation table moved from docs/thermo.md (update the docs):\n  " .. table.concat(bad, "\n  "))
-- 3
local ni = phlox.library { "Ni" }
local rec = ni:species("Ni(OH)2(s)")
check(rec.basis == "estimated" and rec.basis_method:find("Kopp", 1, true), "Ni(OH)2(s): Kopp-Neumann estimate")
for _, T in ipairs { 298.15, 573.15 } do
  local cp = ni:props("Ni(OH)2(s)", { T = T }).Cp
  close(cp, 18.8 * 4.184, 1e-9, ("Ni(OH)2(s) Cp at %g K vs Kopp-Neumann by hand, J/(mol K)"):format(T), LT)
end
print(("test_temperature_estimates: all checks passed (%d reactions, %d solids)"):format(#rows, #sum.kopp_rows))
