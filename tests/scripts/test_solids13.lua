-- test_solids13.lua: the solids revised or added in issue 13 (s5-solids):
-- monoclinic pyrrhotite Fe7S8 between troilite and pyrite, molybdenite,
-- greenockite and jarosite against the measurements they were changed for,
-- and the white/gray tin transition after the white-tin entropy moved to
-- NBS 1982.  Source beside each check.
local phlox = require "phlox"
local S = dofile(assert(os.getenv("PHLOX_SOURCE_DIR"), "PHLOX_SOURCE_DIR is not set (run through ctest)") .. "/tests/support/init.lua")
local check, close = S.check, S.close

local R_LN10 = 8.314462618 * math.log(10)   -- J/(mol K), CODATA 2018

-- 1. Pyrrhotite between troilite and pyrite.  In the Fe-S system the
--    sulfidation sequence with rising sulfur activity is troilite (FeS),
--    pyrrhotite (Fe1-xS; monoclinic Fe7S8 at low temperature), pyrite
--    (from memory of the Fe-S phase relations of the ore-mineral literature:
--    pyrite + monoclinic pyrrhotite is a common low-temperature assemblage),
--    and the pyrrhotite field widens as temperature rises.  Written with
--    H2S(g)/H2(g), so that rhombic sulfur (stable only to 368 K) is not needed:
--    at each boundary log(pH2S/pH2) = -log K.
--    Issue 13 (s5-fes2): with troilite and pyrite on the calorimetry of
--    Cemic and Kleppa 1988 (read) and Fe7S8 on the mean third-law dfH (IVTANTHERMO
--    table Fe.37, read), the Fe7S8 field opens near 107 C and widens on
--    heating; at 25 C it is closed by 1.2 log units, i.e. Fe7S8 would need
--    6 kJ/mol more stability, half of the +-12 to +-25 kJ/mol its equilibrium
--    values carry (docs/data/ligands.md).  Asserted: the field at 130 and 200 C,
--    its widening, and that the 25 C miss stays inside that uncertainty.
local lib = phlox.library { "Fe", "S" }
local R_LN10_T25 = R_LN10 * 298.15 / 1000   -- kJ/mol per log unit at 25 C
local U_FE7S8 = 12                           -- kJ/mol, the smallest +- of Fe7S8 (the record's note, from TSIV table Fe.37)
local width = {}
for _, t in ipairs({ 25, 100, 130, 200 }) do
  local tr_po = -lib:reaction("7 FeS(s,troilite) + H2S(g) = Fe7S8(s,pyrrhotite) + H2(g)", { T_C = t }).logK
  local po_py = -lib:reaction("Fe7S8(s,pyrrhotite) + 6 H2S(g) = 7 FeS2(s,pyrite) + 6 H2(g)", { T_C = t }).logK / 6
  local tr_py = -lib:reaction("FeS(s,troilite) + H2S(g) = FeS2(s,pyrite) + H2(g)", { T_C = t }).logK
  if t >= 130 then
    check(tr_po < tr_py and tr_py < po_py,
          ("%g C: troilite/pyrrhotite at log(H2S/H2) %.3f below troilite/pyrite %.3f below pyrrhotite/pyrite %.3f"):format(t, tr_po, tr_py, po_py))
  end
  width[#width + 1] = po_py - tr_po
end
check(width[2] > width[1] and width[3] > width[2] and width[4] > width[3],
      ("the pyrrhotite field widens with temperature: %.3f, %.3f, %.3f, %.3f log units at 25, 100, 130, 200 C"):format(width[1], width[2], width[3], width[4]))
-- a shift d (kJ/mol) of Fe7S8 moves the width by -(7/6) d / (RT ln 10)
check(width[1] > -(7 / 6) * U_FE7S8 / R_LN10_T25,
      ("pyrrhotite field at 25 C %.2f log units: closed by less than Fe7S8's +-%g kJ/mol can move it"):format(width[1], U_FE7S8))
-- a field wider than 2 log units at 25 C would mean Fe7S8 is taken far more
-- stable than its tabulated dfH allows (common practice, no source)
check(width[1] < 2, ("pyrrhotite field at 25 C %.2f log units, under 2"):format(width[1]))

-- 2. Molybdenite against the measured Mo-MoS2-H2S-H2 equilibrium
--    (Bartovska and Cerny 1987, abstract read: dG = -390100 + 176.7 T J/mol
--    for Mo + S2(g) = MoS2, 569-1277 K).  At 25 C it is an extrapolation
--    (+-1 log unit); the former NBS molybdenite missed it by 5.6.
local mo = phlox.library { "Mo", "S" }
local dG_S2 = 128600 - 298.15 * (228.167 - 2 * 32.054)   -- CODATA 1989 S2(g), recalled
local logK_meas = -(-390100 + 176.7 * 298.15 + dG_S2) / (R_LN10 * 298.15)
local logK = mo:reaction("Mo(s) + 2 S(s,rhombic) = MoS2(s,molybdenite)").logK
close(logK, logK_meas, 1.0, "MoS2 formation log K against the extrapolated equilibrium of Bartovska and Cerny 1987")

-- 3. Greenockite against the crystalline-CdS solubility of Wang and Tessier
--    1999 (abstract read: CdS + H+ = Cd2+ + HS-, log K -14.82 +- 0.03); the
--    former NBS solid gave -15.90.  Bazarkina et al. 2023 (the record's
--    source) and this study differ by 0.2.
local cd = phlox.library { "Cd", "S" }
close(cd:reaction("CdS(s,greenockite) + H^+ = Cd^2+ + HS^-").logK, -14.82, 0.3,
      "CdS solubility product against Wang and Tessier 1999")

-- 4. Jarosite: Baron and Palmer 1996 (abstract read) measured log Ksp -11.0
--    +- 0.3 at 25 C and dH -45 +- 5 kJ/mol over 4-35 C; at 35 C the van 't
--    Hoff value must stay inside their stated uncertainty of the slope.
local ja = phlox.library { "Fe", "K", "S" }
local JA = "KFe3(SO4)2(OH)6(s,jarosite) + 6 H^+ = K^+ + 3 Fe^3+ + 2 SO4^2- + 6 H2O(l)"
close(ja:reaction(JA).logK, -11.0, 0.3, "jarosite log Ksp at 25 C (Baron and Palmer 1996)")
local k35 = ja:reaction(JA, { T_C = 35 }).logK
local expect35 = -11.0 + 45000 / R_LN10 * (1 / 308.15 - 1 / 298.15)
close(k35, expect35, 5000 / R_LN10 * (1 / 298.15 - 1 / 308.15) + 0.01, "jarosite log Ksp at 35 C within the paper's +-5 kJ/mol on dH")

-- 5. White/gray tin: log K = 0 at the measured 13.2 C (286.35 K; from memory
--    of the CRC Handbook) with both tins now from NBS 1982.
local sn = phlox.library { "Sn" }
close(sn:reaction("Sn(s) = Sn(s,gray)", { T_C = 13.2 }).logK, 0, 0.02, "white/gray tin transition at 13.2 C")

