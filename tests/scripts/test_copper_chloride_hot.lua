-- test_copper_chloride_hot.lua (s5-cucl): Cu(I) chloride complexes at 100-300 C.
--
-- Read evidence (no measured high-temperature constant could be read):
--   Fulton et al. 2000, Chem. Phys. Lett. 330, 300 (XAFS to 325 C; abstract
--   read): linear CuCl2^- "is predominant from 100 C to 325 C in the presence
--   of excess Cl-"; "even for solutions with 2.0 m NaCl, only the dichloro
--   Cu1+ species is observed".
--   GSA 2009 annual meeting, paper 163465 (XANES; abstract read): Cu in a
--   saline ore fluid "exclusively as the linear [CuCl2]- species at all
--   temperatures above ~200 C".
-- phlox estimates CuCl3^2- by the isocoulombic method with the charge types
-- balanced by the sulfate protonation (Cl.lua; tests/tools/estimates_def.lua,
-- sulfate_step_model).  Checked here:
--   1. the chain from the element file: log K of CuCl2^- + Cl^- = CuCl3^2-
--      equals the method's formula by hand from phlox's own sulfate and water
--      constants;
--   2. the evidence for the method on the one reaction of the library where
--      two anions join into a dianion and log K(T) is measured
--      (HCO3^- + OH^- = CO3^2- + H2O, Plummer and Busenberg 1982 fit to
--      250 C): the sulfate-balanced estimate beats holding and the water-only
--      one-term form, and errs high (too much dianion), so the Cu(I) step is
--      an upper bound on that evidence;
--   3. the read finding: in 0.5 m NaCl CuCl2^- carries most dissolved Cu(I)
--      at 100, 200 and 300 C (Davies and b-dot), and in 2 m NaCl its share
--      rises with temperature.  Not asserted: CuCl2^- predominance in 2 m
--      NaCl, which phlox reaches with Davies (69 %, 85 % at 200, 300 C) but
--      not with b-dot (34 %, 44 %) - both beyond their ionic-strength range
--      (docs/data/ligands.md).
local phlox = require "phlox"
local S = dofile(assert(os.getenv("PHLOX_SOURCE_DIR"), "PHLOX_SOURCE_DIR is not set (run through ctest)") .. "/tests/support/init.lua")
local check = S.check
local TR = 298.15

local lib = phlox.library { "Cu", "Cl", "Na", "S", "C" }
local STEP = "CuCl2^- + Cl^- = CuCl3^2-"
local AUX = "SO4^2- + H2O(l) = HSO4^- + OH^-"
local rec = lib:species("CuCl3^2-")
check(rec.basis == "estimated" and rec.basis_method:find("isocoulombic", 1, true), "CuCl3^2- is flagged estimated (isocoulombic)")
check(rec.estimate_model and rec.estimate_model:find("HSO4^-", 1, true), "CuCl3^2- names its sulfate-balanced model")
check(lib:species("CuCl2^-").basis == "measured", "CuCl2^- keeps its measured dH")

-- 1
local s25 = lib:reaction(STEP, { T_C = 25 }).logK
local a25 = lib:reaction(AUX, { T_C = 25 }).logK
local step = {}
for _, tc in ipairs { 100, 200, 300 } do
  local T = tc + 273.15
  local hand = (s25 + a25) * TR / T - lib:reaction(AUX, { T_C = tc }).logK
  step[tc] = lib:reaction(STEP, { T_C = tc }).logK
  check(math.abs(step[tc] - hand) < 1e-6, ("step log K at %d C: %.4f, by hand %.4f"):format(tc, step[tc], hand))
end
check(step[100] < s25 and step[200] < step[100] and step[300] < step[200], "the step loses stability with temperature")

-- 2
local AN = "HCO3^- + OH^- = CO3^2- + H2O(l)"
check(lib:species("CO3^2-").basis == "measured" and lib:species("CO3^2-").logK_T, "CO3^2- has a measured log K(T)")
local k25 = lib:reaction(AN, { T_C = 25 }).logK
for _, tc in ipairs { 100, 150, 200, 250 } do
  local T = tc + 273.15
  local meas = lib:reaction(AN, { T_C = tc }).logK
  local iso = (k25 + a25) * TR / T - lib:reaction(AUX, { T_C = tc }).logK
  local oneterm = k25 * TR / T
  local e, e1, eh = iso - meas, oneterm - meas, k25 - meas
  io.write(("analog %d C: sulfate-balanced %+.2f, water-only one-term %+.2f, held %+.2f\n"):format(tc, e, e1, eh))
  check(e > 0 and e < e1 and e < eh, ("%d C: the sulfate-balanced estimate is the closest and errs high"):format(tc))
end

-- 3
local excl = {}
for _, r in ipairs(lib:list("Cu")) do
  if r.state == "aq" and ((r.reaction or ""):find("Cu^2+", 1, true) or r.formula == "Cu^2+") then excl[#excl + 1] = r.formula end
end
local function share(m, tc, model)
  local res = assert(phlox.speciate { library = lib, T_C = tc, totals = { Na = m, Cl = m, Cu = 1e-5 },
    basis = { Cu = "Cu^+" }, pH = 5, solids = false, exclude = excl, activity_model = model })
  return res.elements.Cu.share["CuCl2^-"] or 0
end
for _, model in ipairs { "davies", "bdot" } do
  local prev
  for _, tc in ipairs { 25, 100, 200, 300 } do
    local f05, f2 = share(0.5, tc, model), share(2.0, tc, model)
    io.write(("%s %d C: CuCl2^- %.0f %% (0.5 m NaCl), %.0f %% (2 m)\n"):format(model, tc, 100 * f05, 100 * f2))
    if tc >= 100 then check(f05 > 0.5, ("%s, 0.5 m NaCl, %d C: CuCl2^- predominant (Fulton et al. 2000)"):format(model, tc)) end
    if prev then check(f2 > prev, ("%s, 2 m NaCl: CuCl2^- share rises to %d C"):format(model, tc)) end
    prev = f2
  end
end
print("test_copper_chloride_hot: all checks passed")
