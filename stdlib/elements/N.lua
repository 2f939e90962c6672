-- stdlib/elements/N.lua: nitrogen. Ammonia/ammonium, dinitrogen, nitrite,
-- nitrous acid, nitrate, nitric oxide; ammine complexes of the metals.
--
-- Primary compilation: NBS 1982 for the nitrogen redox species (NO2^-, HNO2, NO, N2(aq),
-- N2O); NH3(aq), NH4^+ and NO3^- carry SH88/SHS89 HKF sets whose 25 C values follow
-- CODATA 1989 (NBS dfG(NO3^-) is 2.1 kJ/mol apart: docs/data/ligands.md). Ammine
-- constants: Smith and Martell at I = 0 and 25 C for every metal (issue 13; the
-- Ni, Zn, Co and Cd sets were Bjerrum's 2 mol/L NH4NO3, 30 C constants until s5-lig).
--
-- Data sets: NH3(aq), NH4^+ and NO3^- carry the revised-HKF parameters of Shock
-- and Helgeson 1988 / Shock, Helgeson and Sverjensky 1989 (as recalled in the
-- project reference table tests/reference/hkf). NO2^- is an HKF estimate from
-- NBS 1982 values. Gases: CODATA 1989 where there is a key value, NBS otherwise.
-- Ammine complexes: cumulative constants at I = 0 (Smith and Martell; the Ni, Zn,
-- Co and Cd steps read in the reprint of Harvey's Analytical Chemistry 2.1,
-- Appendix 16.12). J. Bjerrum's classic sets (2 mol/L NH4NO3, 30 C) are higher by
-- 0.1-0.7 and are kept only as checks in another medium (docs/data-checks.md).
-- Nearly every other number was recalled, not read ("from memory of").
--
-- Caution: nitrogen redox (N2 / NO3^- / NH4^+) is very slow without microbes;
-- N2 is the thermodynamically stable form over most of the water field, which a
-- diagram shows but water rarely reaches.

local NBS = "from memory of [NBS82]"
local NBS_DERIVED = "derived here from dfG and dfH of " .. NBS
local CODATA = "from memory of [CODATA89] (dfH, S; dfG derived here as dfH - T dfS)"
local SH88 = "from memory of [SH88], ion tables (table no. not recalled)"
local SHS89 = "from memory of [SHS89], neutral species (table no. not recalled)"
local KELLEY = "Cp: from memory of [K60], Maier-Kelley coefficients in cal converted x 4.184"
local BJERRUM = "from memory of J. [BJ41] (2 mol/L NH4NO3, 30 C), as reproduced in [SM]"
local SM = "from memory of [SM] (I = 0, 25 C)"
local BJ_NOTE = "Bjerrum's medium is 2 mol/L NH4NO3 at 30 C, not I = 0 and 25 C; for a neutral ligand the medium effect is modest but real (a few tenths per step); dH not recalled (temperature: isocoulombic estimate)"
local CAL = { energy = "cal", entropy = "cal" }

local function ammine(metal, charge, n, logbeta, quality, src, note)
  local ion = metal .. "^" .. charge
  local f
  if n == 1 then f = metal .. "NH3^" .. charge else f = metal .. "(NH3)" .. n .. "^" .. charge end
  local lhs = ion .. " + " .. (n == 1 and "" or (n .. " ")) .. "NH3(aq)"
  -- no dH recalled for any ammine step: temperature by the one-term isocoulombic
  -- estimate (M^z+ + n NH3 = M(NH3)n^z+ is already isocoulombic; docs/thermo.md)
  return { formula = f, model = "logk", reaction = lhs .. " = " .. f, logK = logbeta,
           estimate = "isocoulombic",
           source = src or BJERRUM, quality = quality or "medium", note = note or BJ_NOTE }
end

local species = {
  -- ---------------------------------------------------------------- own species
  {
    formula = "NH3(aq)", model = "hkf", units = CAL,
    G = -6383, H = -19440, S = 25.77,
    hkf = { a1 = 5.0911, a2 = 2.797, a3 = 8.6248, a4 = -2.8946, c1 = 20.3, c2 = -1.17, omega = -0.05 },
    source = SHS89, quality = "medium",
    note = "published Cp (17.9 cal/(mol K)) and V (24.4 cm3/mol) recalled weakly; cycle closes to 55 cal/mol",
  },
  {
    formula = "NH4^+", model = "hkf", units = CAL,
    G = -18990, H = -31850, S = 26.57,
    hkf = { a1 = 3.8763, a2 = 2.3448, a3 = 8.5605, a4 = -2.8759, c1 = 17.45, c2 = -0.21, omega = 0.1502 },
    source = SH88, quality = "high",
    note = "pKa(NH4^+) from these dfG 9.24 (Bates and Pinching 1949: 9.245)",
  },
  {
    formula = "NH3(g)", model = "cp",
    G = -16.407, H = -45.94, S = 192.77,
    uncertainty = { H = 0.35, S = 0.05 },  -- +-: from memory of Cox, Wagman and Medvedev 1989 (CODATA Key Values)
    cp = { a = 29.748, b = 25.104e-3, c = -1.548e5 },
    source = CODATA .. "; " .. KELLEY .. " (7.11 + 6.00e-3 T - 0.37e5/T^2 cal)",
    quality = "high",
    note = "the Cp fit gives 35.49 J/(mol K) at 298.15 K vs NBS 35.06 (1.2 % high)",
  },
  {
    formula = "N2(g)", model = "cp",
    G = 0, H = 0, S = 191.61,
    cp = { a = 28.577, b = 3.766e-3, c = -0.502e5 },
    source = "S from memory of [CODATA89]; " .. KELLEY .. " (6.83 + 0.90e-3 T - 0.12e5/T^2 cal)",
    quality = "high",
  },
  {
    formula = "N2(aq)", model = "logk",
    reaction = "N2(g) = N2(aq)", logK = -3.276, dH = -10.54,
    source = NBS_DERIVED .. " N2(aq) (18.7, -10.54; S 95.8)",
    quality = "medium",
    note = "Henry constant about 6.3e-4 mol/(kg bar)",
  },
  {
    formula = "NO3^-", model = "hkf", units = CAL,
    G = -26507, H = -49429, S = 35.12,
    hkf = { a1 = 7.3161, a2 = 6.7824, a3 = -4.6838, a4 = -3.0594, c1 = 7.70, c2 = -6.725, omega = 1.0977 },
    source = SH88, quality = "high",
    note = "dfG -110.91 kJ/mol (CODATA -110.79; NBS -108.74: the NBS value is 2 kJ/mol more positive)",
  },
  {
    formula = "NO2^-", model = "hkf",
    G = -32.2, H = -104.6, S = 123.0,
    estimate = { Cp = -97.5 },
    source = NBS .. " (dfG, dfH, S and Cp 25 C); HKF parameters estimated by the loader ([SH88] correlations)",
    quality = "medium",
    note = "V not recalled, so the volume terms are zero: poor at high pressure. NBS dfG is consistent with NBS NO3^- (-108.74); with the SH88 NO3^- above the NO3^-/NO2^- couple moves by 11 mV",
  },
  {
    formula = "HNO2(aq)", model = "logk",
    reaction = "NO2^- + H^+ = HNO2(aq)", logK = 3.224, dH = -14.6,
    source = NBS_DERIVED .. " HNO2(aq) (-50.6, -119.2; S 135.6) and NO2^-",
    quality = "medium",
    note = "literature pKa 3.15 ([SM]) to 3.35",
  },
  {
    formula = "NO(g)", model = "cp",
    G = 86.55, H = 90.25, S = 210.761,
    cp = { a = 29.414, b = 3.849e-3, c = -0.586e5 },
    source = NBS .. "; " .. KELLEY .. " (7.03 + 0.92e-3 T - 0.14e5/T^2 cal)",
    quality = "high",
  },
}

-- ---------------------------------------------------------------- ammine complexes: cumulative log beta_n
-- Ni, Zn, Co, Cd (s5-lig, issue 13): the stepwise log K of Smith and Martell at
-- I = 0 and 25 C (Co at 20 C), read in the reprint of [HARVEY21], Appendix 16.12,
-- summed here to cumulative log beta.  They replace Bjerrum's 2 mol/L NH4NO3,
-- 30 C sets (log beta_max Ni 8.74, Zn 9.46, Co 5.11, Cd 7.12), which are higher
-- by 0.1 (first step) to 0.7 (sixth) and are now checks in another medium only.
local SM_READ = "[SM] (I = 0, 25 C), stepwise log K read in [HARVEY21], Appendix 16.12 (Formation Constants), summed here"
local sets = {
  { "Ni", "2+", { 2.72, 2.17, 1.66, 1.12, 0.67, -0.03 } },
  { "Zn", "2+", { 2.21, 2.29, 2.36, 2.03 } },
  { "Co", "2+", { 1.99, 1.51, 0.93, 0.64, 0.06, -0.73 } },
  { "Cd", "2+", { 2.55, 2.01, 1.34, 0.84 } },
}
local SM_NOTE = "I = 0; [BJ41] (2 mol/L NH4NO3, 30 C) gives higher values; no dH recalled (temperature: isocoulombic estimate)"
for _, s in ipairs(sets) do
  local lb = 0
  for n, lk in ipairs(s[3]) do
    lb = lb + lk
    local q = "medium"
    if s[1] == "Co" and n >= 5 then q = "low" end
    local src, note = SM_READ, SM_NOTE
    if s[1] == "Co" then
      src = "[SM] (I = 0, 20 C for Co(II), as printed), stepwise log K read in [HARVEY21], Appendix 16.12 (Formation Constants), summed here"
      note = "measured at 20 C (the table's only Co(II) set), used as the 25 C value; " .. SM_NOTE
    end
    -- round the running sum to the table's two decimals
    table.insert(species, ammine(s[1], s[2], n, math.floor(lb * 100 + 0.5) / 100, q, src, note))
  end
end
-- Cu(II) ammines at I = 0 and 25 C (issue 13: Bjerrum's 2 mol/L NH4NO3, 30 C
-- set, log beta 4.31, 7.98, 11.02, 13.32, was used as if at I = 0).
local CU_I0 = "I = 0, 25 C; [BJ41] (2 mol/L NH4NO3, 30 C) gives higher values, log beta4 13.32; no dH recalled"
for n, lb in ipairs({ 4.04, 7.47, 10.27, 11.75 }) do
  table.insert(species, ammine("Cu", "2+", n, lb, "medium", SM, CU_I0))
end
table.insert(species, ammine("Cu", "2+", 5, 11.29, "low",
  "derived here: log beta4 = 11.75 (" .. SM .. ") plus log K5 = -0.46 (" .. BJERRUM .. ")",
  "Cu(NH3)5^2+ forms only in concentrated ammonia. The fifth step is Bjerrum's (his medium), added to the I = 0 beta4: for a neutral ligand the medium shifts one step by a few tenths. No dH recalled"))
table.insert(species, ammine("Cu", "+", 1, 5.93, "low", SM, "dH not recalled"))
table.insert(species, ammine("Cu", "+", 2, 10.86, "medium", SM, "dominant Cu(I) species in ammoniacal leach liquors; dH not recalled"))
table.insert(species, ammine("Ag", "+", 1, 3.31, "medium", SM, "dH not recalled"))
table.insert(species, ammine("Ag", "+", 2, 7.22, "medium", "[SM] (I = 0, 25 C), log K1 3.31 and log K2 3.91 read in [HARVEY21], Appendix 16.12, summed here",
  "recalled before as 7.23; OpenStax App. K gives 1.7e7 (7.23); dH not recalled"))

return {
  element = "N",
  title = "Nitrogen",
  units = { energy = "kJ", entropy = "J" },
  species = species,
}
