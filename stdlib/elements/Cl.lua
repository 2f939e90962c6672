-- stdlib/elements/Cl.lua: chlorine. Chloride and the chlorine oxidation states
-- (Cl2, hypochlorite, chlorite, chlorate, perchlorate), chloro complexes of the
-- metals and the common chloride salts.
--
-- Primary compilation: NBS 1982 for the chlorine redox species (Cl2, ClO^-, HClO2,
-- ClO2^-, ClO3^-, ClO4^-); Cl^- is the SH88 HKF row, whose dfG (-131.29 kJ/mol) agrees
-- with CODATA 1989 (-131.22) within 0.07 kJ/mol. Chloro complexes: Smith and Martell /
-- Nordstrom et al. 1990 constants at I = 0 (each record names its source).
--
-- Data sets: Cl^- carries the revised-HKF parameters of Shock and Helgeson 1988
-- (recalled from the paper). The
-- oxychlorine species are written as reactions whose log K and dH are derived
-- here from NBS 1982 dfG/dfH (the arithmetic is in docs/data/ligands.md).
-- Chloro complexes: stability constants at I = 0, 25 C. Almost every value was
-- recalled, not read: "from memory of" says so. docs/data/ligands.md lists what
-- was left out and the known disagreements.

local NBS = "from memory of [NBS82]"
local NBS_DERIVED = "derived here from dfG and dfH of " .. NBS
local CODATA = "from memory of [CODATA89]"
local SH88 = "from memory of [SH88], ion tables (table no. not recalled)"
local KELLEY = "Cp: from memory of [K60], Maier-Kelley coefficients in cal converted x 4.184"
local N90 = "from memory of [N90]"
local COMPILED = "from memory of [COMPILED]"
local SM = "from memory of [SM] (I = 0, 25 C)"
local POWELL05 = "[POWELL05], the Hg2+-Cl-, OH- systems (I = 0, 25 C)"
local POWELL05_READ = POWELL05 .. "; value and +- read in the abstract of its summary (Aust. J. Chem. 2004, doi:10.1071/CH04063)"
local LM07 = "[LM07], log beta_n(T) = A + B T + D log10 T read in the abstract (fit of 15-45 C measurements with Seward 1984 to 300 C; I = 0)"
local CAL = { energy = "cal", entropy = "cal" }
local KCAL = { energy = "kcal" }

return {
  element = "Cl",
  title = "Chlorine",
  units = { energy = "kJ", entropy = "J" },
  species = {
    -- ---------------------------------------------------------------- own species
    {
      formula = "Cl^-", model = "hkf", units = CAL,
      G = -31379, H = -39933, S = 13.56,
      hkf = { a1 = 4.032, a2 = 4.801, a3 = 5.563, a4 = -2.847, c1 = -4.40, c2 = -5.714, omega = 1.456 },
      source = SH88, quality = "high",
      note = "regressed on experimental data in SH88; published Cp 25 C -29.44 cal/(mol K), V 17.79 cm3/mol",
    },
    {
      formula = "Cl2(g)", model = "cp",
      G = 0, H = 0, S = 223.081,
      uncertainty = { S = 0.010 },  -- +-: from memory of Cox, Wagman and Medvedev 1989 (CODATA Key Values)
      cp = { a = 37.028, b = 0.669e-3, c = -2.845e5 },
      T_range = { 273.15, 1500 },
      source = CODATA .. " (S); " .. KELLEY .. " (8.85 + 0.16e-3 T - 0.68e5/T^2 cal)",
      quality = "high",
      note = "Cp(298.15) from the fit 34.03 J/(mol K) vs NBS 33.907",
    },
    {
      formula = "Cl2(aq)", model = "logk",
      reaction = "Cl2(g) = Cl2(aq)", logK = -1.216, dH = -23.4,
      source = NBS_DERIVED .. " Cl2(aq) (6.94, -23.4 kJ/mol; S 121 J/(mol K))",
      quality = "medium",
      note = "Henry constant about 0.061 mol/(kg bar); Cl2(aq) hydrolyses to HClO + Cl^- + H^+ (log K about -3.4)",
    },
    {
      formula = "ClO^-", model = "logk",
      reaction = "Cl^- + 0.5 O2(g) = ClO^-", logK = -16.543, dH = 60.06,
      source = NBS_DERIVED .. " ClO^- (-36.8, -107.1) and Cl^- (-131.228, -167.159)",
      quality = "medium",
    },
    {
      formula = "HClO(aq)", model = "logk",
      reaction = "ClO^- + H^+ = HClO(aq)", logK = 7.537, dH = -13.8,
      source = "log K from memory of [MORRIS66], pKa 7.537 at 25 C; dH " .. NBS_DERIVED .. " HClO(aq) (-120.9) and ClO^- (-107.1)",
      quality = "high",
      note = "NBS dfG values give log K 7.551",
    },
    {
      formula = "ClO2^-", model = "logk",
      reaction = "Cl^- + O2(g) = ClO2^-", logK = -26.003, dH = 100.66,
      source = NBS_DERIVED .. " ClO2^- (17.2, -66.5; S 101.3) and Cl^-",
      quality = "medium",
    },
    {
      formula = "HClO2(aq)", model = "logk",
      reaction = "ClO2^- + H^+ = HClO2(aq)", logK = 1.980, dH = 14.6,
      source = NBS_DERIVED .. " HClO2(aq) (5.9, -51.9; S 188.3) and ClO2^-",
      quality = "medium",
      note = "pKa of chlorous acid in the literature about 1.96",
    },
    {
      formula = "ClO3^-", model = "logk",
      reaction = "Cl^- + 1.5 O2(g) = ClO3^-", logK = -21.597, dH = 63.19,
      source = NBS_DERIVED .. " ClO3^- (-7.95, -103.97; S 162.3) and Cl^-",
      quality = "medium",
    },
    {
      formula = "ClO4^-", model = "logk",
      reaction = "Cl^- + 2 O2(g) = ClO4^-", logK = -21.498, dH = 37.83,
      source = NBS_DERIVED .. " ClO4^- (-8.52, -129.33; S 182.0) and Cl^-",
      quality = "medium",
      note = "perchlorate is kinetically inert: its field on a diagram is reached only electrochemically",
    },

    -- ---------------------------------------------------------------- chloro complexes (log K of the formation reaction, I = 0, 25 C)
    { formula = "FeCl^+", model = "logk", reaction = "Fe^2+ + Cl^- = FeCl^+", logK = 0.14, estimate = { method = "isocoulombic", model = "Cu^2+ + Cl^- = CuCl^+" },
      source = N90, quality = "low", note = "weak ion pair; dH not recalled" },
    { formula = "FeCl^2+", model = "logk", reaction = "Fe^3+ + Cl^- = FeCl^2+", logK = 1.48, dH = 5.6, units = KCAL,
      source = N90, quality = "medium" },
    { formula = "FeCl2^+", model = "logk", reaction = "Fe^3+ + 2 Cl^- = FeCl2^+", logK = 2.13, estimate = "isocoulombic",
      source = N90, quality = "low", note = "dH not recalled" },
    { formula = "FeCl3(aq)", model = "logk", reaction = "Fe^3+ + 3 Cl^- = FeCl3(aq)", logK = 1.13, estimate = "isocoulombic",
      source = N90, quality = "low", note = "dH not recalled" },

    { formula = "CuCl^+", model = "logk", reaction = "Cu^2+ + Cl^- = CuCl^+", logK = 0.43, dH = 8.65, units = KCAL,
      source = COMPILED, quality = "low" },
    { formula = "CuCl2(aq)", model = "logk", reaction = "Cu^2+ + 2 Cl^- = CuCl2(aq)", logK = 0.16, dH = 10.56, units = KCAL,
      source = COMPILED, quality = "low" },
    { formula = "CuCl3^-", model = "logk", reaction = "Cu^2+ + 3 Cl^- = CuCl3^-", logK = -2.29, dH = 13.69, units = KCAL,
      source = COMPILED, quality = "low" },
    { formula = "CuCl4^2-", model = "logk", reaction = "Cu^2+ + 4 Cl^- = CuCl4^2-", logK = -4.59, dH = 17.78, units = KCAL,
      source = COMPILED, quality = "low" },
    { formula = "CuCl2^-", model = "logk", reaction = "Cu^+ + 2 Cl^- = CuCl2^-", logK = 5.50, dH = -0.42, units = KCAL,
      source = SM .. "; dH " .. COMPILED, quality = "medium",
      note = "the dominant Cu(I) species in chloride brines; CuCl(aq) left out (beta1 not recalled with confidence)" },
    -- s5-cucl: the step CuCl2^- + Cl^- = CuCl3^2- joins two anions into a dianion; with the recalled
    -- dH (+0.26 kcal, against -0.42 for CuCl2^-) van 't Hoff raised its log K from 0.20 (25 C) to 0.44
    -- (300 C), against read XAFS/XANES abstracts (docs/data/ligands.md). No measured high-temperature
    -- constant could be read: isocoulombic estimate with the charge types balanced by the sulfate
    -- protonation (R - M = CuCl2^- + Cl^- + SO4^2- + H2O = CuCl3^2- + HSO4^- + OH^-), the model
    -- resting on CuCl2^- (dH) and the SH88 HKF sets of SO4^2-, HSO4^-, OH^- (docs/thermo.md).
    { formula = "CuCl3^2-", model = "logk", reaction = "Cu^+ + 3 Cl^- = CuCl3^2-", logK = 5.70,
      estimate = { method = "isocoulombic", model = "Cu^+ + 2 Cl^- + HSO4^- + OH^- = CuCl2^- + SO4^2- + H2O(l)" },
      source = SM, quality = "medium",
      note = "25 C log K only; the recalled dH (+0.26 kcal, " .. COMPILED .. ") is not used: see docs/data/ligands.md, Cu(I) chloride" },

    { formula = "ZnCl^+", model = "logk", reaction = "Zn^2+ + Cl^- = ZnCl^+", logK = 0.43, dH = 7.79, units = KCAL,
      source = COMPILED, quality = "low", note = "Zn-Cl constants are poorly agreed in the literature" },
    { formula = "ZnCl2(aq)", model = "logk", reaction = "Zn^2+ + 2 Cl^- = ZnCl2(aq)", logK = 0.45, dH = 8.5, units = KCAL,
      source = COMPILED, quality = "low" },
    { formula = "ZnCl3^-", model = "logk", reaction = "Zn^2+ + 3 Cl^- = ZnCl3^-", logK = 0.5, dH = 9.56, units = KCAL,
      source = COMPILED, quality = "low" },
    { formula = "ZnCl4^2-", model = "logk", reaction = "Zn^2+ + 4 Cl^- = ZnCl4^2-", logK = 0.2, dH = 10.96, units = KCAL,
      source = COMPILED, quality = "low" },

    { formula = "AgCl(aq)", model = "logk", reaction = "Ag^+ + Cl^- = AgCl(aq)", logK = 3.27, dH = -2.68, units = KCAL,
      source = COMPILED, quality = "medium" },
    { formula = "AgCl2^-", model = "logk", reaction = "Ag^+ + 2 Cl^- = AgCl2^-", logK = 5.27, dH = -3.93, units = KCAL,
      source = COMPILED, quality = "medium", note = "OpenStax App. K gives 1.8e5 (5.26)" },
    { formula = "AgCl3^2-", model = "logk", reaction = "Ag^+ + 3 Cl^- = AgCl3^2-", logK = 5.29, estimate = { method = "isocoulombic", model = "Ag^+ + 2 Cl^- + HSO4^- + OH^- = AgCl2^- + SO4^2- + H2O(l)" },
      source = COMPILED, quality = "low", note = "dH not recalled" },
    { formula = "AgCl4^3-", model = "logk", reaction = "Ag^+ + 4 Cl^- = AgCl4^3-", logK = 5.51, estimate = "isocoulombic",
      source = COMPILED, quality = "low", note = "dH not recalled" },

    { formula = "CdCl^+", model = "logk", reaction = "Cd^2+ + Cl^- = CdCl^+", logK = 1.98, dH = 0.59, units = KCAL,
      source = COMPILED, quality = "medium" },
    { formula = "CdCl2(aq)", model = "logk", reaction = "Cd^2+ + 2 Cl^- = CdCl2(aq)", logK = 2.6, dH = 1.24, units = KCAL,
      source = COMPILED, quality = "medium" },
    { formula = "CdCl3^-", model = "logk", reaction = "Cd^2+ + 3 Cl^- = CdCl3^-", logK = 2.4, dH = 3.9, units = KCAL,
      source = COMPILED, quality = "low" },

    -- Pb(II) chloro complexes (s5-lig, issue 13): the thermodynamic (I = 0)
    -- log beta_n(T) of Luo and Millero 2007, fitted to their spectrophotometric
    -- measurements (15-45 C, I = 0-6 m) together with Seward 1984 (to 300 C);
    -- equations read in the abstract, coefficients as printed (rounded: the
    -- 0.031 T term alone carries +-0.15 at 25 C, so the 25 C values 1.58, 2.11
    -- and 1.80 are the equations', not the paper's table).  They replace the
    -- compiled set (1.6, 1.8, 1.7 with recalled dH), whose van 't Hoff
    -- extrapolation gave log beta2 2.1 at 200 C against 4.2 measured.  The
    -- spread of published 25 C constants (0.1-0.9, docs/data-checks.md) is
    -- larger than the difference between the sets at 25 C.
    { formula = "PbCl^+", model = "logk", reaction = "Pb^2+ + Cl^- = PbCl^+", logK = 1.5799,
      logK_T = { 44.82, 0.031, 0, -21.21, 0 }, T_range = { 288.15, 573.15 },
      uncertainty = { logK = 0.05 },  -- +-: the fit's standard error, read in the abstract
      source = LM07, quality = "medium" },
    { formula = "PbCl2(aq)", model = "logk", reaction = "Pb^2+ + 2 Cl^- = PbCl2(aq)", logK = 2.1143,
      logK_T = { 61.42, 0.046, 0, -29.51, 0 }, T_range = { 288.15, 573.15 },
      uncertainty = { logK = 0.08 },
      source = LM07, quality = "medium" },
    { formula = "PbCl3^-", model = "logk", reaction = "Pb^2+ + 3 Cl^- = PbCl3^-", logK = 1.8042,
      logK_T = { 107.97, 0.071, 0, -51.46, 0 }, T_range = { 288.15, 573.15 },
      uncertainty = { logK = 0.10 },
      source = LM07, quality = "medium" },
    { formula = "PbCl4^2-", model = "logk", reaction = "Pb^2+ + 4 Cl^- = PbCl4^2-", logK = 1.38, dH = 3.53, units = KCAL,
      source = COMPILED, quality = "low",
      note = "not in the Luo and Millero 2007 set (which has no fourth complex): the compiled constant and dH, so its 25 C value and its temperature dependence are not consistent with PbCl3^- above; minor below about 1 mol/kg chloride" },

    { formula = "MnCl^+", model = "logk", reaction = "Mn^2+ + Cl^- = MnCl^+", logK = 0.61, estimate = { method = "isocoulombic", model = "Cu^2+ + Cl^- = CuCl^+" },
      source = COMPILED, quality = "low", note = "dH not recalled" },
    { formula = "NiCl^+", model = "logk", reaction = "Ni^2+ + Cl^- = NiCl^+", logK = 0.40, estimate = { method = "isocoulombic", model = "Cu^2+ + Cl^- = CuCl^+" },
      source = COMPILED, quality = "low", note = "dH not recalled; outer-sphere pair, literature 0.1-0.6" },

    -- ---------------------------------------------------------------- chloride salts
    {
      formula = "AgCl(s,chlorargyrite)", model = "cp",
      G = -109.765, H = -127.01, S = 96.25,
      uncertainty = { H = 0.05, S = 0.20 },  -- +-: from memory of Cox, Wagman and Medvedev 1989 (CODATA Key Values)
      cp = { a = 50.79 }, V = 25.73,
      source = CODATA .. " (dfH, S; dfG derived dfH - T dfS); Cp 298 constant from " .. NBS,
      quality = "high",
      note = "Cp held at its 25 C value (temperature coefficients not recalled); V from memory of [RH95]",
    },
    {
      formula = "CuCl(s,nantokite)", model = "cp",
      G = -119.86, H = -137.2, S = 86.2, cp = { a = 48.5 },
      source = NBS, quality = "medium",
      note = "Cp held at its 25 C value (recalled, medium); corrosion product of copper in chloride water",
    },
    {
      formula = "PbCl2(s,cotunnite)", model = "cp",
      G = -314.10, H = -359.41, S = 136.0,
      estimate = { Cp = "kopp" }, -- no published Cp recalled: Kopp-Neumann (docs/thermo.md)
      source = NBS, quality = "medium",
      note = "Cp not recalled: Kopp-Neumann estimate (Kopp's atomic heats)",
    },
    {
      formula = "NaCl(s,halite)", model = "cp",
      G = -384.138, H = -411.153, S = 72.13,
      cp = { a = 50.50 }, V = 27.015,
      source = NBS .. "; V from memory of [RH95]", quality = "high",
      note = "Cp held at its 25 C value",
    },
    {
      formula = "KCl(s,sylvite)", model = "cp",
      G = -409.14, H = -436.747, S = 82.59,
      cp = { a = 51.30 }, V = 37.524,
      source = NBS .. "; V from memory of [RH95]", quality = "high",
      note = "Cp held at its 25 C value",
    },
    -- ---------------------------------------------------------------- mercury and gold (issue 13)
    {
      formula = "Hg2Cl2(s,calomel)", model = "cp",
      G = -210.725, H = -265.37, S = 191.6,
      cp = { a = 102.0 },
      uncertainty = { H = 0.40, S = 0.8 },
      source = "from memory of [CODATA89], CODATA Key Values (dfH, S and their +-; dfG derived here as dfH - T dfS); Cp at 298.15 K from " .. NBS .. ", held constant",
      quality = "high",
      note = "Calomel electrode: E0(Hg2Cl2 + 2 e- = 2 Hg + 2 Cl^-) = 0.2680 V with CODATA Cl^-, 0.2687 V with the file's SH88 Cl^-; measured 0.26808 V (recalled).",
    },
    {
      formula = "AuCl2^-", model = "logk",
      reaction = "Au(s) + 2 Cl^- + H^+ = AuCl2^- + 0.5 H2(g)",
      logK = -19.507, estimate = "isocoulombic",
      source = "derived here from E0(AuCl2^- + e- = Au + 2 Cl^-) = 1.154 V, from memory of [BPJ85] (Standard Potentials in Aqueous Solution) as printed in the CRC series",
      quality = "medium",
      note = "With AuCl4^- below it gives E0(AuCl4^-/AuCl2^-) = 0.926 V, the value printed beside it. No dH recalled: temperature by the isocoulombic estimate.",
    },
    {
      formula = "AuCl4^-", model = "logk",
      reaction = "Au(s) + 4 Cl^- + 3 H^+ = AuCl4^- + 1.5 H2(g)",
      logK = -50.812, estimate = "isocoulombic",
      source = "derived here from E0(AuCl4^- + 3 e- = Au + 4 Cl^-) = 1.002 V, from memory of [BPJ85] (Standard Potentials in Aqueous Solution) as printed in the CRC series",
      quality = "medium",
      note = "No dH recalled: temperature by the isocoulombic estimate.",
    },
    -- Hg(II) chloro complexes (issue 13): Powell et al. 2005, the IUPAC
    -- critical review, one compilation with Hg(OH)2(aq) in Hg.lua.  The
    -- review gives reaction enthalpies, but they were not recalled: the
    -- temperature dependence is the isocoulombic estimate (flagged in stamps).
    { formula = "HgCl^+", model = "logk", reaction = "Hg^2+ + Cl^- = HgCl^+", logK = 7.31,
      uncertainty = { logK = 0.04 },  -- +-: from memory of Powell et al. 2005
      estimate = { method = "isocoulombic", model = "Cu^2+ + Cl^- = CuCl^+" },
      source = "from memory of " .. POWELL05, quality = "high",
      note = "[SM] 7.30 (recalled). No dH recalled: temperature by the isocoulombic estimate with the model the library's rule picks (docs/thermo.md)." },
    { formula = "HgCl2(aq)", model = "logk", reaction = "Hg^2+ + 2 Cl^- = HgCl2(aq)", logK = 14.00,
      uncertainty = { logK = 0.07 },
      estimate = { method = "isocoulombic", model = "Cu^2+ + 2 Cl^- = CuCl2(aq)" },
      source = POWELL05_READ, quality = "high",
      note = "The dominant Hg(II) species in fresh and condensate waters with chloride, pH below about 7. No dH recalled: temperature by the isocoulombic estimate." },
    { formula = "HgCl3^-", model = "logk", reaction = "Hg^2+ + 3 Cl^- = HgCl3^-", logK = 14.925,
      estimate = { method = "isocoulombic", model = "Cu^2+ + 3 Cl^- = CuCl3^-" },
      source = "from memory of " .. POWELL05 .. " (log K3 0.925 on beta2)", quality = "medium",
      note = "[SM] 15.0 (recalled). No dH recalled: temperature by the isocoulombic estimate." },
    { formula = "HgCl4^2-", model = "logk", reaction = "Hg^2+ + 4 Cl^- = HgCl4^2-", logK = 15.535,
      estimate = { method = "isocoulombic", model = "Cu^2+ + 4 Cl^- = CuCl4^2-" },
      source = "from memory of " .. POWELL05 .. " (log K4 0.61 on beta3)", quality = "medium",
      note = "Dominant in seawater and brines. [SM] 15.6 (recalled). No dH recalled: temperature by the isocoulombic estimate." },
    { formula = "Hg(OH)Cl(aq)", model = "logk", reaction = "Hg^2+ + Cl^- + H2O(l) = Hg(OH)Cl(aq) + H^+", logK = 4.27,
      uncertainty = { logK = 0.35 },
      estimate = "isocoulombic",
      source = POWELL05_READ, quality = "medium",
      note = "Mixed hydroxo-chloro complex, important near pH 7 in chloride waters. No second published value recalled. No dH recalled: temperature by the isocoulombic estimate." },
  },
}
