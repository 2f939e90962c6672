-- stdlib/elements/C.lua: carbon. Inorganic carbon (CO2, HCO3^-, CO3^2-),
-- methane, carbon monoxide and graphite; carbonate and bicarbonate complexes of
-- the metals; carbonate minerals.
--
-- Primary compilation: Nordstrom et al. 1990 (ACS Symp. Ser. 416), the evaluated
-- aqueous carbonate constants, which adopt Plummer and Busenberg 1982 for the
-- CO2-H2O-CaCO3 system (CO3^2- is defined by that K2 equation; the SH88/SHS89 HKF sets
-- of CO2(aq) and HCO3^- reproduce K1 and KH). Solids without an evaluated constant
-- (smithsonite, cerussite, rhodochrosite) are NBS 1982 solids on
-- the metal file's ion: rhodochrosite and cerussite then miss the measured solubility
-- by +0.51 and +0.33 (known differences, docs/data-checks.md). Otavite is the measured
-- solubility constant of Stipp et al. (NBS otavite missed it by 0.9), malachite that of
-- Preis and Gamsjaeger 2002 (NBS malachite was 9.7 kJ/mol less stable).
--
-- Data sets: CO2(aq), HCO3^- and CO3^2- carry the revised-HKF parameters of
-- Shock and Helgeson 1988 / Shock, Helgeson and Sverjensky 1989 (as recalled in
-- the project reference table tests/reference/hkf). Gases: CODATA 1989 key
-- values where there is one, NBS 1982 otherwise. Calcite, aragonite and the
-- Ca-carbonate ion pairs use the analytic log K(T) of Plummer and Busenberg 1982
-- (valid 0-90 C). Other minerals: NBS 1982 or Robie and Hemingway 1995.
-- Complexes: I = 0, 25 C. Nearly every number was recalled, not read.

local NBS = "from memory of [NBS82]"
local NBS_DERIVED = "derived here from dfG and dfH of " .. NBS
local CODATA = "from memory of [CODATA89] (dfH, S; dfG derived here as dfH - T dfS)"
local SH88 = "from memory of [SH88], ion tables (table no. not recalled)"
local SHS89 = "from memory of [SHS89], neutral species (table no. not recalled)"
local KELLEY = "Cp: from memory of [K60], Maier-Kelley coefficients in cal converted x 4.184"
local HDNB = "Cp: from memory of [HDNB78], Maier-Kelley coefficients in cal converted x 4.184"
local RH95 = "from memory of [RH95]"
local PB82 = "[PB82], analytic log K(T), 0-90 C; coefficients from memory (they reproduce the published 25 C values)"
local N90 = "from memory of [N90]"
local SIEBERT = "from memory of [SH77] as adopted by [N90]"
local COMPILED = "from memory of [COMPILED]"
local SM = "from memory of [SM] (I = 0, 25 C)"
-- the lead carbonato complexes as one set from one measurement (issue 13)
local PBCO3 = "[BS82] (abstract read: constants at I = 0.3, NaClO4, 25 C), taken to I = 0 with the Davies equation (derived here)"
local CAL = { energy = "cal", entropy = "cal" }
local KCAL = { energy = "kcal" }

return {
  element = "C",
  title = "Carbon",
  units = { energy = "kJ", entropy = "J" },
  species = {
    -- ---------------------------------------------------------------- inorganic carbon
    {
      formula = "CO2(aq)", model = "hkf", units = CAL,
      G = -92250, H = -98900, S = 28.1,
      hkf = { a1 = 6.2466, a2 = 7.4698, a3 = 2.8, a4 = -3.0879, c1 = 40.0, c2 = 8.8, omega = -0.02 },
      source = SHS89, quality = "high",
      note = "published Cp 58.1 cal/(mol K), V 32.8 cm3/mol; a3 printed to one decimal in the source as recalled",
    },
    {
      formula = "HCO3^-", model = "hkf", units = CAL,
      G = -140282, H = -164898, S = 23.53,
      hkf = { a1 = 7.5621, a2 = 1.1505, a3 = 1.2346, a4 = -2.8266, c1 = 12.9395, c2 = -4.7579, omega = 1.2733 },
      source = SH88, quality = "high",
      note = "log K(CO2(aq) + H2O = HCO3^- + H^+) from these dfG: -6.34 ([PB82]: -6.352)",
    },
    {
      formula = "CO3^2-", model = "logk",
      reaction = "HCO3^- = CO3^2- + H^+",
      logK = -10.329,
      logK_T = { -107.8871, -0.03252849, 5151.79, 38.92561, -563713.9 },
      T_range = { 273.15, 523.15 },
      source = "from memory of [PB82], fitted equation for the second dissociation constant of carbonic acid, 0-250 C",
      quality = "high",
      note = "Replaces the SH88 revised-HKF set (G -126191, H -161385 cal/mol, S -11.95 cal/(mol K); a1..omega 2.8524, -3.9844, 6.4142, -2.6143, -3.3206, -17.1917, 3.3914, from memory of SH88), which gives the same log K2 at 25 C (-10.33) but 0.19/0.31/0.40 above the measured K2 at 150/200/250 C (docs/data-checks.md); the fitted equation follows the measurements.",
    },
    {
      formula = "CO2(g)", model = "cp",
      G = -394.373, H = -393.51, S = 213.785,
      uncertainty = { H = 0.13, S = 0.010 },  -- +-: from memory of Cox, Wagman and Medvedev 1989 (CODATA Key Values)
      cp = { a = 44.225, b = 8.786e-3, c = -8.619e5 },
      source = CODATA .. "; " .. KELLEY .. " (10.57 + 2.10e-3 T - 2.06e5/T^2 cal)",
      quality = "high",
      note = "Henry constant with CO2(aq) above: log K = -1.471 ([PB82]: -1.468)",
    },
    {
      formula = "CO(g)", model = "cp",
      G = -137.168, H = -110.53, S = 197.660,
      uncertainty = { H = 0.17, S = 0.004 },  -- +-: from memory of Cox, Wagman and Medvedev 1989 (CODATA Key Values)
      cp = { a = 28.409, b = 4.100e-3, c = -0.460e5 },
      source = CODATA .. "; " .. KELLEY .. " (6.79 + 0.98e-3 T - 0.11e5/T^2 cal)",
      quality = "high",
    },
    {
      formula = "CH4(g)", model = "cp",
      G = -50.72, H = -74.81, S = 186.264,
      cp = { a = 23.640, b = 47.865e-3, c = -1.925e5 },
      source = NBS .. "; " .. KELLEY .. " (5.65 + 11.44e-3 T - 0.46e5/T^2 cal)",
      quality = "high",
      note = "the Cp fit gives 35.75 J/(mol K) at 298.15 K vs NBS 35.31 (1.2 % high; fit made for 298-1500 K)",
    },
    {
      formula = "CH4(aq)", model = "logk",
      reaction = "CH4(g) = CH4(aq)", logK = -2.871, dH = -14.23,
      source = NBS_DERIVED .. " CH4(aq) (-34.33, -89.04; S 83.7) and CH4(g)",
      quality = "medium",
      note = "Henry constant about 1.35e-3 mol/(kg bar); methane is reduced far below its equilibrium with CO2 only by microbes: a diagram shows CH4 fields that abiotic water rarely reaches",
    },
    {
      formula = "C(s,graphite)", model = "cp",
      G = 0, H = 0, S = 5.74,
      uncertainty = { S = 0.10 },  -- +-: from memory of Cox, Wagman and Medvedev 1989 (CODATA Key Values)
      cp = { a = 16.862, b = 4.770e-3, c = -8.535e5 },
      source = "S from memory of [CODATA89]; " .. KELLEY .. " (4.03 + 1.14e-3 T - 2.04e5/T^2 cal)",
      quality = "high",
      note = "the Cp fit gives 8.68 J/(mol K) at 298.15 K vs NBS 8.517 (2 % high)",
    },

    -- ---------------------------------------------------------------- carbonate and bicarbonate complexes
    { formula = "CaHCO3^+", model = "logk", reaction = "Ca^2+ + HCO3^- = CaHCO3^+",
      logK = 1.106, logK_T = { 1209.120, 0.31294, -34765.05, -478.782, 0 }, T_range = { 273.15, 363.15 },
      uncertainty = { logK = 0.07 },  -- +-: read in the abstract of [PB82] (1.11 +- 0.07)
      source = PB82, quality = "high" },
    { formula = "CaCO3(aq)", model = "logk", reaction = "Ca^2+ + CO3^2- = CaCO3(aq)",
      logK = 3.224, logK_T = { -1228.732, -0.299440, 35512.75, 485.818, 0 }, T_range = { 273.15, 363.15 },
      uncertainty = { logK = 0.14 },  -- +-: read in the abstract of [PB82]
      source = PB82, quality = "high", note = "stated 3.22 +- 0.14" },
    { formula = "MgHCO3^+", model = "logk", reaction = "Mg^2+ + HCO3^- = MgHCO3^+",
      logK = 1.07, logK_T = { -59.215, 0, 2537.455, 20.92298, 0 }, T_range = { 273.15, 363.15 },
      source = SIEBERT, quality = "medium", note = "dH 0.79 kcal/mol at 25 C" },
    { formula = "MgCO3(aq)", model = "logk", reaction = "Mg^2+ + CO3^2- = MgCO3(aq)",
      logK = 2.98, logK_T = { 0.9910, 0.00667, 0, 0, 0 }, T_range = { 273.15, 363.15 },
      source = SIEBERT, quality = "medium", note = "dH 2.713 kcal/mol at 25 C" },
    { formula = "NaCO3^-", model = "logk", reaction = "Na^+ + CO3^2- = NaCO3^-", logK = 1.27, dH = 8.91, units = KCAL,
      source = N90, quality = "medium" },
    { formula = "NaHCO3(aq)", model = "logk", reaction = "Na^+ + HCO3^- = NaHCO3(aq)", logK = -0.25, estimate = "isocoulombic",
      source = N90, quality = "medium", note = "dH not recalled" },
    { formula = "FeHCO3^+", model = "logk", reaction = "Fe^2+ + HCO3^- = FeHCO3^+", logK = 2.0, estimate = "isocoulombic",
      source = COMPILED, quality = "low", note = "dH not recalled" },
    { formula = "MnHCO3^+", model = "logk", reaction = "Mn^2+ + HCO3^- = MnHCO3^+", logK = 1.95, estimate = "isocoulombic",
      source = COMPILED, quality = "low", note = "dH not recalled" },
    { formula = "ZnCO3(aq)", model = "logk", reaction = "Zn^2+ + CO3^2- = ZnCO3(aq)", logK = 5.3, estimate = "isocoulombic",
      source = COMPILED, quality = "low", note = "dH not recalled" },
    { formula = "ZnHCO3^+", model = "logk", reaction = "Zn^2+ + HCO3^- = ZnHCO3^+", logK = 2.1, estimate = "isocoulombic",
      source = COMPILED, quality = "low", note = "dH not recalled" },
    { formula = "CuCO3(aq)", model = "logk", reaction = "Cu^2+ + CO3^2- = CuCO3(aq)", logK = 6.73, estimate = "isocoulombic",
      source = SM, quality = "medium", note = "dH not recalled" },
    { formula = "Cu(CO3)2^2-", model = "logk", reaction = "Cu^2+ + 2 CO3^2- = Cu(CO3)2^2-", logK = 9.83, estimate = "isocoulombic",
      source = SM, quality = "medium", note = "dH not recalled" },
    { formula = "PbCO3(aq)", model = "logk", reaction = "Pb^2+ + CO3^2- = PbCO3(aq)", logK = 6.47, estimate = "isocoulombic",
      source = PBCO3, quality = "low",
      note = "log beta1 5.40 at I = 0.3; Davies log g(Pb2+) = log g(CO3 2-) = -0.537 (A 0.509), so 5.40 + 2 x 0.537 = 6.47 at I = 0 (derived here). Agrees with the IUPAC selection (Powell et al. 2009, 6.45 +- 0.05, recalled). Was 7.24 (compiled I = 0 constant of the older data sets, recalled), 0.8 stronger than both. dH not known" },
    { formula = "Pb(CO3)2^2-", model = "logk", reaction = "Pb^2+ + 2 CO3^2- = Pb(CO3)2^2-", logK = 9.93, estimate = "isocoulombic",
      source = PBCO3, quality = "low",
      note = "log beta2 8.86 at I = 0.3; + log g(Pb(CO3)2 2-) - log g(Pb2+) - 2 log g(CO3 2-) = 2 x 0.537 (Davies, A 0.509): 9.93 at I = 0 (derived here). Was 10.64 (compiled, recalled). dH not known" },

    -- ---------------------------------------------------------------- carbonate minerals
    { formula = "CaCO3(s,calcite)", model = "logk", reaction = "CaCO3(s,calcite) = Ca^2+ + CO3^2-",
      logK = -8.480, logK_T = { -171.9065, -0.077993, 2839.319, 71.595, 0 }, T_range = { 273.15, 363.15 }, V = 36.934,
      source = PB82 .. "; V " .. RH95, quality = "high",
      note = "stated -8.480 +- 0.020; defined by log K so that it is consistent with whichever Ca^2+ data the Ca file carries. Beyond 90 C the equation is an extrapolation" },
    { formula = "CaCO3(s,aragonite)", model = "logk", reaction = "CaCO3(s,aragonite) = Ca^2+ + CO3^2-",
      logK = -8.336, logK_T = { -171.9773, -0.077993, 2903.293, 71.595, 0 }, T_range = { 273.15, 363.15 }, V = 34.15,
      source = PB82 .. "; V " .. RH95, quality = "high" },
    { formula = "CaMg(CO3)2(s,dolomite)", model = "logk", reaction = "CaMg(CO3)2(s,dolomite) = Ca^2+ + Mg^2+ + 2 CO3^2-",
      logK = -17.09, dH = -9.436, units = KCAL, V = 64.34,
      source = N90 .. " (ordered dolomite); V " .. RH95, quality = "medium",
      note = "disordered dolomite about -16.54; dolomite does not precipitate at 25 C on human time scales" },
    {
      formula = "MgCO3(s,magnesite)", model = "logk",
      reaction = "MgCO3(s,magnesite) = Mg^2+ + CO3^2-",
      logK = -8.029, dH = -6.169, units = KCAL,
      source = N90, quality = "medium",
      note = "Issue 13: was [RH95] magnesite with the SH88 Mg^2+ (log Ksp -8.32), which made ordered dolomite metastable against calcite + magnesite above about 70 C; defined now, like dolomite, by the [N90] constant (dolomite = calcite + magnesite: log K -0.58 at 25 C, falling with T)",
    },
    -- s5-fe (issue 13): siderite by its measured solubility product, 25-250 C
    { formula = "FeCO3(s,siderite)", model = "logk", reaction = "FeCO3(s,siderite) = Fe^2+ + CO3^2-",
      logK = -10.898,
      -- log K = a + b T + c/T + d log10 T (T in K), the paper's fit to its measurements at 25-250 C
      logK_T = { 175.568, 0.0139, -6738.483, -67.898 },
      V = 29.378,
      source = "[BDH09] (abstract read: log Ksp = 175.568 + 0.0139 T - 6738.483/T - 67.898 log10 T, " ..
               "natural siderite in 0.1 mol/kg NaCl extrapolated to I = 0, 25-250 C; dfG -680.71 +- 2 kJ/mol); " ..
               "25 C value as [BRUNO92] (-10.8 +- 0.2, abstract read); V " .. RH95, quality = "high",
      note = "Gives -10.90 at 25 C, -11.93 at 100 C, -13.72 at 200 C, -14.63 at 250 C (dH -15.7 kJ/mol at 25 C); " ..
             "above 250 C the fit is extrapolated (-15.50 at 300 C). Other measurements at 25 C: -10.9 (Silva, Liu and " ..
             "Millero 2002, J. Solution Chem. 31, 97, abstract read), [BRUNO92] -10.8 +- 0.2; [SM] give -10.68 (Harris " ..
             "App. F); precipitated siderite about -10.45. The previous record (-10.89, van 't Hoff with dH -2.48 kcal/mol, " ..
             "from memory of [N90]) put log Ksp at -11.56 at 200 C, 2.2 above the measurement. Defined by log K " ..
             "because dfG(Fe^2+) differs between data sets by 12 kJ/mol (docs/data/transition-metals.md, Iron)" },
    {
      formula = "MnCO3(s,rhodochrosite)", model = "cp",
      G = -816.7, H = -894.1, S = 85.8, cp = { a = 81.5 }, V = 31.075,
      source = NBS .. "; V " .. RH95, quality = "medium",
      note = "log Ksp with NBS ions -10.65; literature -10.4 to -11.13 ([N90] list -11.13): uncertain by about 0.5; Cp held at its 25 C value",
    },
    {
      formula = "ZnCO3(s,smithsonite)", model = "cp",
      G = -731.52, H = -812.78, S = 82.4, cp = { a = 79.71 }, V = 28.275,
      source = NBS .. "; V " .. RH95, quality = "medium",
      note = "log Ksp with NBS ions -9.93 ([SM] -10.00); Cp held at its 25 C value",
    },
    {
      formula = "CdCO3(s,otavite)", model = "logk",
      reaction = "CdCO3(s,otavite) = Cd^2+ + CO3^2-",
      logK = -12.1, dH = -2.44, V = 34.30,
      uncertainty = { logK = 0.1 },
      source = "log K: from memory of [STIPP93] (measured solubility of synthetic otavite, +- 0.1; their dfG -674.7 kJ/mol); dH " .. NBS_DERIVED .. " Cd^2+ (-75.90), CO3^2- (-677.14) and CdCO3 (-750.6); V " .. RH95,
      quality = "medium",
      note = "issue 13: NBS otavite (dfG -669.4) with the Cd^2+ of Cd.lua gave log Ksp -11.16, 0.9 above the measured value; the measured constant is kept (it is also the value Nordstrom et al. 1990 list, recalled). Temperature: van 't Hoff with the NBS reaction enthalpy",
    },
    {
      formula = "PbCO3(s,cerussite)", model = "cp",
      G = -625.5, H = -699.1, S = 131.0, cp = { a = 87.4 }, V = 40.59,
      source = NBS .. "; V " .. RH95, quality = "medium",
      note = "log Ksp with NBS ions -12.83; literature about -13.13 (recalled); Cp held at its 25 C value",
    },
    {
      formula = "Cu2CO3(OH)2(s,malachite)", model = "logk",
      reaction = "Cu2CO3(OH)2(s,malachite) + 4 H^+ = 2 Cu^2+ + CO2(g) + 3 H2O(l)",
      logK = 12.68, dH = -54.1,
      uncertainty = { logK = 0.2 },
      source = "[PG02] (abstract read): log *Kps0 = 6.34 +- 0.10 for 0.5 malachite + 2 H+ = Cu2+ + 0.5 CO2(g) + 1.5 H2O (I = 0, 25 C; doubled here), dfG -903.3 +- 1.2, dfH -1067.1 +- 3.4 kJ/mol, S 166.3 J/(mol K); dH derived here from that dfH with the CODATA Cu2+ (64.9), CO2(g) (-393.51) and H2O (-285.83) that reproduce the paper's dfG and log K",
      quality = "medium",
      note = "issue 13: measured solubility (15-65 C, perchlorate media, extrapolated to I = 0). The NBS 1982 malachite (dfG -893.6, dfH -1051.4, S 186.2, used before) is 9.7 kJ/mol less stable and gave log K 14.22 here; the paper confirms the calorimetric S (166.3) and recommends a new dfH. Azurite (dfG -1434.2 kJ/mol in the same paper) is not yet in the library",
    },
    -- ---------------------------------------------------------------- strontium and barium carbonates (scaling)
    {
      formula = "SrCO3(s,strontianite)", model = "logk",
      reaction = "SrCO3(s,strontianite) = Sr^2+ + CO3^2-",
      logK = -9.271,
      logK_T = { 155.0305, 0, -7239.594, -56.58638 },
      T_range = { 273.15, 363.15 },
      source = "from memory of [BPP84], analytic log K(T), 2-91 C",
      quality = "high",
    },
    {
      formula = "SrHCO3^+", model = "logk",
      reaction = "Sr^2+ + HCO3^- = SrHCO3^+",
      logK = 1.18, logK_T = { -3.248, 0.014867 },
      T_range = { 273.15, 363.15 },
      source = "from memory of [BPP84]",
      quality = "medium",
    },
    {
      formula = "SrCO3(aq)", model = "logk",
      reaction = "Sr^2+ + CO3^2- = SrCO3(aq)",
      logK = 2.81, logK_T = { -1.019, 0.012826 },
      T_range = { 273.15, 363.15 },
      source = "from memory of [BPP84]",
      quality = "medium",
    },
    {
      formula = "BaCO3(s,witherite)", model = "logk",
      reaction = "BaCO3(s,witherite) = Ba^2+ + CO3^2-",
      logK = -8.562,
      logK_T = { 607.642, 0.121098, -20011.25, -236.4948 },
      T_range = { 273.15, 363.15 },
      source = "from memory of [BP86], analytic log K(T), 5-90 C",
      quality = "high",
    },
    {
      formula = "BaHCO3^+", model = "logk",
      reaction = "Ba^2+ + HCO3^- = BaHCO3^+",
      logK = 0.982, logK_T = { -3.0938, 0.013669 },
      T_range = { 273.15, 363.15 },
      source = "from memory of [BP86]",
      quality = "medium",
    },
    {
      formula = "BaCO3(aq)", model = "logk",
      reaction = "Ba^2+ + CO3^2- = BaCO3(aq)",
      logK = 2.71, logK_T = { 0.113, 0.008721 },
      T_range = { 273.15, 363.15 },
      source = "from memory of [BP86]",
      quality = "medium",
    },
  },
}
