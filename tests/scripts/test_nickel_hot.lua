-- test_nickel_hot.lua: physical checks of the nickel maps at 200-300 C and an
-- activity of 1e-6 (the convention of published potential-pH diagrams for
-- corrosion).
--
-- NiO keeps a field at 200, 250 and 300 C, and an alkaline dissolved field
-- (Ni(OH)3^-) exists at 300 C.  Published: above about 195 C (468 K) the
-- anhydrous oxide controls the nickel solubility in hot water (KAPL study of
-- NiO in sodium phosphate solutions at 290-560 K, J. Solution Chem.; OSTI
-- 5818578, abstract read), and Ni(s) and NiO(s) share a boundary in
-- hydrogenated water up to 309 C (Corrosion Science 2008, abstract read;
-- checked as a log K in tests/reference/high_temperature.csv), so NiO is a
-- stable phase there; its solubility rises again in alkaline solution as
-- Ni(OH)3^- (Swaddle and Wong 1978, Can. J. Chem. 56, 363, abstract read:
-- Ni(OH)2 dissolves as Ni(OH)3^- under alkaline hydrothermal conditions).
-- Before Ni^2+ had a heat capacity of its own (issue 12), NiO lost its field
-- at 1e-6 from 200 C on: Ni(OH)2(aq) took it.
local phlox = require "phlox"
local S = dofile(assert(os.getenv("PHLOX_SOURCE_DIR"), "PHLOX_SOURCE_DIR is not set (run through ctest)") .. "/tests/support/init.lua")
local check = S.check

local ACTIVITY = 1e-6 -- published diagrams' convention (common practice)
local PH_MAX = 14     -- the default window

local lib = phlox.library { "Ni" }
local function fields(T_C)
  local m = phlox.map { library = lib, element = "Ni", T_C = T_C, activity = ACTIVITY }
  local set = {}
  for _, f in ipairs(m.fields) do
    local lo, hi = math.huge, -math.huge
    for _, x in ipairs(f.x) do lo, hi = math.min(lo, x), math.max(hi, x) end
    set[f.species] = { lo = lo, hi = hi }
  end
  return set
end

for _, T in ipairs { 200, 250, 300 } do
  local set = fields(T)
  local nio = set["NiO(s,bunsenite)"]
  check(nio, ("NiO must keep a field at %d C and 1e-6"):format(T))
  io.write(("Ni %d C: NiO field pH %.2f-%.2f\n"):format(T, nio.lo, nio.hi))
end

local set = fields(300)
local anion = set["Ni(OH)3^-"]
check(anion and anion.hi >= PH_MAX - 1e-9, "Ni(OH)3^- must reach pH 14 at 300 C and 1e-6")
-- the NiO/Ni(OH)3^- line is vertical: pH = log a - log K(NiO + 2 H2O = Ni(OH)3^- + H^+)
local k = lib:reaction("NiO(s,bunsenite) + 2 H2O(l) = Ni(OH)3^- + H^+", { T_C = 300 }).logK
local ph = math.log(ACTIVITY, 10) - k
S.close(anion.lo, ph, 0.02, "the NiO/Ni(OH)3^- boundary at 300 C: map against log K")
-- and it lies on the alkaline side of neutral (pKw/2 = 5.65 at 300 C)
local pkw = -lib:reaction("H2O(l) = H^+ + OH^-", { T_C = 300 }).logK
check(ph > pkw / 2, ("NiO/Ni(OH)3^- at pH %.2f must be alkaline (neutral %.2f at 300 C)"):format(ph, pkw / 2))
print(("test_nickel_hot: NiO keeps its field at 200-300 C; NiO/Ni(OH)3^- at pH %.2f at 300 C"):format(ph))
