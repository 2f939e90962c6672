-- stdlib/elements/Fe.lua: iron, its ions, hydrolysis species, oxides and hydroxides.
--
-- Primary compilation (issue 13; see docs/data/transition-metals.md, "Iron"):
--   Shock et al. 1997 [SSWS97] for the ions.  Every iron solid is then tied to those
--   ions either through data that do not depend on dfG(Fe^2+) (the calorimetric NBS
--   1982 oxides, which agree with [RH95] within 3 kJ/mol) or through its measured
--   solubility against Fe^2+ (Fe(OH)2 here, siderite in C.lua, mackinawite in S.lua).
--   The NBS-1982 ion values are not used anywhere: NBS dfG(Fe^2+) = -78.90 kJ/mol is
--   12.6 kJ/mol less negative than the magnetite-solubility values (Sweeton and Baes
--   1970: E0(Fe2+/Fe) = -0.475 +- 0.010 V; Tremaine and LeBlanc 1980: -0.47 +- 0.01 V;
--   abstracts read), and a solid whose NBS dfG was derived against NBS Fe^2+ breaks
--   its measured solubility when paired with this Fe^2+ (Fe(OH)2: 1.0 log unit).
--   Mixed pairings that remain, each with the solubility it touches checked in
--   docs/data-checks.md: NBS magnetite and hematite (calorimetric) with these ions
--   (E0 of Fe2+/Fe from magnetite solubility; hematite solubility at 200 C);
--   troilite and pyrite in S.lua, on the direct reaction calorimetry of Cemic and
--   Kleppa 1988 since issue 13 (no measured solubility read; troilite is less
--   soluble than both measured mackinawite constants with this Fe^2+, as
--   tests/scripts/test_iron_sulfides.lua asserts; S.lua notes).
--   * Hydrolysis species are defined by Baes and Mesmer 1976 constants (I = 0, 25 C),
--     except Fe(OH)4^-, which is defined by the measured hematite solubility reaction
--     (Diakonov et al. 1999 at 25 C, Sergeeva et al. 1999 at 200 C; abstracts read).
-- Every number below was recalled, not read, unless its source says "read"; "from memory
-- of" marks the recalled ones.

local NBS = "from memory of [NBS82]"
local KELLEY = "cp from memory of [K60], converted from cal with 4.184"
local SHOCK97 = "from memory of [SSWS97], cation table; table no. not recalled"
local BM = "from memory of [BM76] (I = 0, 25 C)"
local DIAKONOV99 = "[DIAKONOV99] (abstract read)"
local SERGEEVA99 = "[SERGEEVA99] (Geokhimiya 37, 1218; abstract read: 0.5 Fe2O3 + OH- + 1.5 H2O = Fe(OH)4-, 200 C, saturation pressure)"
local RH95 = "from memory of [RH95]"
local NORD = "from memory of [N90]"
-- Criss-Cobble correspondence principle (ionic heat capacities from entropies):
-- mean Cp(25 C..T) of a cation on the absolute scale = alpha(T) + beta(T) S_abs(25 C),
-- S_abs = S_conv - 5.0 z cal/(mol K); on the conventional scale this is
-- alpha (1 - z) + beta S_conv, so for two cations of the same element
-- Cp(Fe3+) - Cp(Fe2+) = -alpha + beta (S(Fe3+) - S(Fe2+)).  Cation parameters for
-- 25-200 C: alpha = 50, beta = -0.63 (cal/(mol K)).
local CRISS_COBBLE = "the correspondence principle of [CC64] (cation parameters alpha = 50, " ..
                     "beta = -0.63 for 25-200 C, S_abs(H+) = -5.0 cal/(mol K), from memory)"
local CC_ALPHA_200, CC_BETA_200 = 50, -0.63          -- cal/(mol K), as above
local S_FE3, S_FE2 = -66.30, -25.30                  -- cal/(mol K), Shock et al. 1997 (records below)
local CAL = 4.184                                    -- J per cal (thermochemical)
local CC_FE3_MINUS_FE2 = (-CC_ALPHA_200 + CC_BETA_200 * (S_FE3 - S_FE2)) * CAL -- J/(mol K)
local CP_H2 = 28.836                                 -- J/(mol K), H2(g) at 25 C (CODATA, recalled)

return {
  element = "Fe",
  title = "Iron",
  units = { energy = "kJ", entropy = "J" },
  species = {
    -- metal ---------------------------------------------------------------
    {
      formula = "Fe(s)", model = "cp",
      G = 0, H = 0, S = 27.28,
      cp = { a = 14.10, b = 29.71e-3, c = 1.799e5 },
      T_range = { 298.15, 1033 },
      source = NBS .. " (S); " .. KELLEY .. " (alpha-Fe: 3.37 + 7.10e-3 T + 0.43e5/T^2 cal/(mol K))",
      quality = "high",
      note = "alpha-Fe. The polynomial gives Cp(298.15 K) = 24.98 J/(mol K) against NBS 25.10; it does not follow the magnetic Cp anomaly near the Curie point (1043 K).",
    },
    -- ions ----------------------------------------------------------------
    {
      formula = "Fe^2+", model = "hkf",
      units = { energy = "cal", entropy = "cal" },
      G = -21870, H = -22050, S = -25.30,
      hkf = { a1 = -0.7867, a2 = -9.6962, a3 = 9.5202, a4 = -2.3786,
              c1 = 14.786, c2 = -4.6437, omega = 1.4382 },
      estimated = true,
      source = SHOCK97,
      quality = "high",
      note = "Revised Fe2+ (published Cp 25 C = -7.9 cal/(mol K), V = -22.2 cm3/mol; the set reproduces both). Parameters were estimated by the paper with the [SH88] correlations. Gives E0(Fe2+/Fe) = -0.474 V. Magnetite solubility to 300 C gives -0.475 +- 0.010 V (Sweeton and Baes 1970, J. Chem. Thermodyn. 2, 479) and dfG = -88.92 +- 2.0 kJ/mol, E0 in -0.47 +- 0.01 V (Tremaine and LeBlanc 1980, J. Solution Chem. 9, 415; both abstracts read); CRC lists -0.447 V and NBS-1982 data give -0.409 V (documented spread).",
    },
    {
      formula = "Fe^3+", model = "logk",
      reaction = "2 Fe^2+ + 2 H^+ = 2 Fe^3+ + H2(g)",
      logK = -26.022, dH = 85.354,
      -- dCp of the reaction (J/(mol K)): Cp(Fe3+) - Cp(Fe2+) by the Criss-Cobble
      -- correspondence principle, twice, plus Cp of H2(g) (see CRISS_COBBLE above)
      dCp = 2 * CC_FE3_MINUS_FE2 + CP_H2,
      estimate = { dCp = "criss-cobble" },
      source = "derived here from dfG/dfH " .. SHOCK97 ..
               ": Fe3+ dfG -4120 cal/mol, dfH -11850 cal/mol, S -66.30 cal/(mol K); " ..
               "Fe2+ as above; dCp estimated with " .. CRISS_COBBLE .. " from these two entropies; " ..
               "Cp(H2,g) 28.836 J/(mol K) from memory of [CODATA89]",
      quality = "medium",
      note = "HKF parameters of Fe3+ not recalled, so the ion is defined against Fe2+ " ..
             "(logK = -2*dG/(RT ln10), dH from dfH). E0(Fe3+/Fe2+) = 0.770 V (CRC 0.771), unchanged " ..
             "by the dCp (it acts away from 25 C only). Temperature: Kirchhoff with constant dCp = " ..
             "-173.4 J/(mol K): Cp(Fe3+) - Cp(Fe2+) = -alpha + beta (S(Fe3+) - S(Fe2+)) = -50 + 0.63 x 41.0 " ..
             "= -24.2 cal/(mol K) (cation parameters for the mean over 25-200 C; the 100 and 150 C " ..
             "parameters give -23.5 and -21.8), held beyond 200 C. Trivalent ions have strongly negative " ..
             "Cp; without it (van 't Hoff only) hematite solubility to Fe3+ at 200 C came out 0.61 log " ..
             "units above the measurement of [SERGEEVA99] (docs/data-checks.md).",
    },
    -- Fe(II) hydrolysis ------------------------------------------------------
    {
      formula = "FeOH^+", model = "logk",
      reaction = "Fe^2+ + H2O(l) = FeOH^+ + H^+",
      logK = -9.5, dH = 55.23,
      source = BM .. "; dH 13.2 kcal/mol " .. NORD,
      quality = "medium",
      note = "NBS-1982 dfG(FeOH+) = -277.4 kJ/mol is not used: with NBS Fe2+ it implies log K = -6.8, far from the hydrolysis measurements.",
    },
    {
      formula = "Fe(OH)2(aq)", model = "logk",
      reaction = "Fe^2+ + 2 H2O(l) = Fe(OH)2(aq) + 2 H^+",
      logK = -20.6, estimate = "isocoulombic",
      source = BM, quality = "low",
    },
    {
      formula = "Fe(OH)3^-", model = "logk",
      reaction = "Fe^2+ + 3 H2O(l) = Fe(OH)3^- + 3 H^+",
      logK = -31.0, estimate = "isocoulombic",
      source = BM, quality = "low",
      note = "The HFeO2^- of older diagrams (same species less one H2O).",
    },
    -- Fe(III) hydrolysis -----------------------------------------------------
    {
      formula = "FeOH^2+", model = "logk",
      reaction = "Fe^3+ + H2O(l) = FeOH^2+ + H^+",
      logK = -2.19, dH = 43.51,
      source = BM .. "; dH 10.4 kcal/mol " .. NORD,
      quality = "high",
    },
    {
      formula = "Fe(OH)2^+", model = "logk",
      reaction = "Fe^3+ + 2 H2O(l) = Fe(OH)2^+ + 2 H^+",
      logK = -5.67, dH = 71.55,
      source = BM .. "; dH 17.1 kcal/mol " .. NORD,
      quality = "medium",
    },
    {
      formula = "Fe(OH)3(aq)", model = "logk",
      reaction = "Fe^3+ + 3 H2O(l) = Fe(OH)3(aq) + 3 H^+",
      logK = -13.6, estimate = "isocoulombic",
      source = NORD,
      quality = "low",
      note = "[BM76] give only an upper bound (about -12).",
    },
    {
      formula = "Fe(OH)4^-", model = "logk",
      -- the measured reaction (hematite solubility in NaOH), not the hydrolysis of Fe3+:
      -- log K and dH are then tied to what was measured at temperature.
      reaction = "0.5 Fe2O3(s,hematite) + OH^- + 1.5 H2O(l) = Fe(OH)4^-",
      logK = -7.05, dH = 38.43,
      source = "log K(25 C) derived here from dfG(Fe(OH)4^-) = -201.97 kcal/mol of " .. DIAKONOV99 ..
               " with hematite dfG -744.4 kJ/mol " .. RH95 .. " and OH^-, H2O of [SH88] as that paper used them; dH derived here (van 't Hoff through two points) from that value and log K(200 C) = -4.56 +- 0.10 of " .. SERGEEVA99,
      quality = "medium",
      note = "Hematite solubility measured to 300 C (Diakonov et al.) and at 200 C (Sergeeva et al.). dH = R ln10 (-4.56 + 7.05)/(1/298.15 - 1/473.15) = 38.43 kJ/mol; gives log K = -5.70 at 100 C and -3.82 at 300 C. The reaction keeps one negative charge on each side, so dCp is small and a constant dH is a fair description (isocoulombic form). Equivalent to log *beta4(Fe3+ + 4 H2O) = -21.36 at 25 C with this file's Fe3+ ([BM76]: -21.6, recalled). The previous record held -21.6 at every temperature, which put log K of this reaction at -14.2 at 200 C.",
    },
    {
      formula = "Fe2(OH)2^4+", model = "logk",
      reaction = "2 Fe^3+ + 2 H2O(l) = Fe2(OH)2^4+ + 2 H^+",
      logK = -2.95, dH = 56.48,
      source = BM .. "; dH 13.5 kcal/mol " .. NORD,
      quality = "medium",
    },
    {
      formula = "Fe3(OH)4^5+", model = "logk",
      reaction = "3 Fe^3+ + 4 H2O(l) = Fe3(OH)4^5+ + 4 H^+",
      logK = -6.3, estimate = "isocoulombic",
      source = BM,
      quality = "low",
    },
    -- oxides and hydroxides --------------------------------------------------
    {
      formula = "Fe3O4(s,magnetite)", model = "cp",
      G = -1015.4, H = -1118.4, S = 146.4,
      cp = { a = 143.43, b = 0, c = 0 },
      source = NBS,
      quality = "high",
      note = "cp: NBS Cp(298.15 K) only (a = Cp, b = c = 0); magnetite Cp rises steeply with T, so this underestimates Cp at high temperature.",
    },
    {
      formula = "Fe2O3(s,hematite)", model = "cp",
      G = -742.2, H = -824.2, S = 87.40,
      cp = { a = 98.28, b = 77.82e-3, c = -14.85e5 },
      T_range = { 298.15, 950 },
      source = NBS .. "; " .. KELLEY .. " (23.49 + 18.6e-3 T - 3.55e5/T^2 cal/(mol K))",
      quality = "high",
      note = "Polynomial gives Cp(298.15 K) = 104.8 J/(mol K) against NBS 103.85.",
    },
    {
      formula = "FeO(OH)(s,goethite)", model = "cp",
      G = -488.55, H = -559.3, S = 60.38,
      estimate = { Cp = "kopp" }, -- no published Cp recalled: Kopp-Neumann (docs/thermo.md)
      source = "dfH and S from memory of [RH95]; dfG derived here as dfH - T*dfS",
      quality = "low",
      note = "A dfG of -489.8 kJ/mol also comes to mind (it would fail the dfG/dfH/S cycle by 1.3 kJ/mol). Cp not recalled: Kopp-Neumann estimate (Kopp's atomic heats).",
    },
    {
      -- s5-fe (issue 13): by its measured solubility against this file's Fe^2+
      formula = "Fe(OH)2(s)", model = "logk",
      reaction = "Fe(OH)2(s) = Fe^2+ + 2 OH^-",
      logK = -15.10, dH = 16.70,
      source = "log Ksp derived here from dfG(Fe(OH)2) = -117.584 kcal/mol with Fe2+ -21.80 and OH- -37.594 " ..
               "kcal/mol of [L69], as tabulated by [BS01] (Table 2, read); dH derived here from dfH(Fe(OH)2) = " ..
               "-569.0 kJ/mol " .. NBS .. " with this file's Fe^2+ (dfH -22050 cal/mol) and the [SH88] OH^- " ..
               "(dfH -54977 cal/mol, recalled)",
      quality = "medium",
      note = "Pairing the NBS-1982 dfG (-486.5 kJ/mol, derived against NBS Fe^2+) with this file's Fe^2+ gave log Ksp = -14.09, " ..
             "1.0 above the measured solubility; the record therefore carries the solubility itself (-15.10, Smith and Martell " ..
             "-15.1; the values of that era rest on few measurements, so the two may share their data). It implies dfG = " ..
             "-492.3 kJ/mol with this file's ions. The CRC couples Fe(OH)2/Fe (-0.877 V) and Fe(OH)3/Fe(OH)2 (-0.56 V) were " ..
             "computed from the NBS-era dfG and now differ by -44 and +74 mV (docs/data-checks.md). Temperature: van 't Hoff " ..
             "with the calorimetric NBS dfH (no measured solubility at temperature read). Metastable against magnetite + " ..
             "H2 (Schikorr reaction, dG -12.8 kJ/mol at 25 C with these data), yet stable against Fe + magnetite, so at 25 C and " ..
             "1e-6 it has a field between them below the hydrogen line (tests/scripts/test_published_iron.lua). In flowing " ..
             "hydrogenated water (234 umol/kg H2) a hydrous Fe(II) oxide, not magnetite, controlled Fe(II) solubility below " ..
             "83 C (Ziemniak, Jones and Combs, J. Solution Chem., abstract read); with these data magnetite is the stable " ..
             "phase there at every temperature (log K of 3 Fe(OH)2 = Fe3O4 + H2(aq) + 2 H2O is -0.86 at 25 C against log " ..
             "m(H2) = -3.63), so the observation is read as slow magnetite formation: a diagram says what can form, not how fast.",
    },
    {
      formula = "Fe(OH)3(s)", model = "cp",
      G = -696.5, H = -823.0, S = 106.7,
      estimate = { Cp = "kopp" }, -- no published Cp recalled: Kopp-Neumann (docs/thermo.md)
      source = NBS,
      quality = "medium",
      note = "Precipitated hydroxide of the NBS tables. With the Fe3+ above it gives log K(Fe(OH)3 + 3H+ = Fe3+ + 3H2O) = 5.63; compare Fe(OH)3(am) below. Cp not recalled: Kopp-Neumann estimate (Kopp's atomic heats).",
    },
    {
      formula = "Fe(OH)3(am)", model = "logk",
      reaction = "Fe^3+ + 3 H2O(l) = Fe(OH)3(am) + 3 H^+",
      logK = -4.891, estimate = "isocoulombic",
      source = NORD .. " (ferrihydrite, Fe(OH)3 + 3H+ = Fe3+ + 3H2O, log K = 4.891)",
      quality = "medium",
      note = "Ferrihydrite; published values span about 3 to 5 with ageing and particle size.",
    },
  },
}
