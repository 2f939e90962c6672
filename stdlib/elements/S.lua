-- stdlib/elements/S.lua: sulfur. Sulfide (H2S, HS^-, S^2-), elemental sulfur,
-- sulfite, thiosulfate, sulfate; metal sulfides, sulfate complexes and sulfate
-- salts.
--
-- Data sets: HS^-, H2S(aq), SO4^2- and HSO4^- carry the revised-HKF parameters
-- of Shock and Helgeson 1988 / Shock, Helgeson and Sverjensky 1989 (as recalled
-- in the project's reference table tests/reference/hkf, with its caveats).
-- Gases: CODATA 1989 key values. Sulfite species: reactions with log K and dH
-- derived here from NBS 1982. Solids: NBS 1982 dfG/dfH/S unless noted; they are
-- consistent with NBS/CODATA metal ions (see docs/data/ligands.md about Fe^2+).
-- Complexes: stability constants at I = 0, 25 C. Nearly every number was
-- recalled, not read ("from memory of").
-- Solids (issue 13, s5-solids): NBS 1982 remains the primary compilation of
-- the metal sulfides and sulfates, except where a measurement read for the
-- independent checks contradicted it: molybdenite (Robie and Hemingway 1995,
-- fluorine calorimetry), greenockite (dfG from its measured solubility) and
-- jarosite (measured log Ksp); monoclinic pyrrhotite Fe7S8 is derived from
-- tabulated third-law enthalpies. docs/data/ligands.md lists each check.
-- Iron sulfides (issue 13, s5-fes2): troilite and pyrite take their dfH from
-- one calorimetric study (Cemic and Kleppa 1988, direct reaction calorimetry)
-- and their entropies from adiabatic calorimetry; mackinawite keeps its
-- measured solubility constant. tests/scripts/test_iron_sulfides.lua asserts
-- their physical order with the Fe^2+ of Fe.lua.

local NBS = "from memory of [NBS82]"
local NBS_DERIVED = "derived here from dfG and dfH of " .. NBS
local CODATA = "from memory of [CODATA89] (dfH, S; dfG derived here as dfH - T dfS)"
local SH88 = "from memory of [SH88], ion tables (table no. not recalled)"
local SHS89 = "from memory of [SHS89], neutral species (table no. not recalled)"
local KELLEY = "Cp: from memory of [K60], Maier-Kelley coefficients in cal converted x 4.184"
local HDNB = "Cp: from memory of [HDNB78], Maier-Kelley coefficients in cal converted x 4.184"
local RH95 = "from memory of [RH95]"
local N90 = "from memory of [N90]"
local COMPILED = "from memory of [COMPILED]"
local CAL = { energy = "cal", entropy = "cal" }
local KCAL = { energy = "kcal" }

return {
  element = "S",
  title = "Sulfur",
  units = { energy = "kJ", entropy = "J" },
  species = {
    -- ---------------------------------------------------------------- reduced sulfur
    {
      formula = "H2S(aq)", model = "hkf", units = CAL,
      G = -6673, H = -9001, S = 30.0,
      hkf = { a1 = 6.5097, a2 = 6.7724, a3 = 5.9646, a4 = -3.056, c1 = 32.3, c2 = 4.73, omega = -0.1 },
      source = SHS89, quality = "medium",
      note = "CAVEAT (reference README): dfG, dfH and S do not close the cycle (dfH - T dfS gives about -6350 cal/mol, 324 cal off); dfH or S mis-recalled (S near 31.1 would close it); treat dfH and S as low. dfG supported by pK1 = 6.99. Parameters pass the Cp/V check.",
    },
    {
      formula = "HS^-", model = "hkf", units = CAL,
      G = 2860, H = -3850, S = 16.3,
      hkf = { a1 = 5.0119, a2 = 4.9799, a3 = 3.4765, a4 = -2.9849, c1 = 3.42, c2 = -6.27, omega = 1.441 },
      source = SH88, quality = "medium",
      note = "published Cp recalled weakly (-22.2 cal/(mol K)); V 20.65 cm3/mol",
    },
    {
      formula = "S^2-", model = "logk",
      reaction = "HS^- = S^2- + H^+", logK = -17.4, estimate = "isocoulombic",
      source = "from memory of [MIGDISOV02], pK2 of H2S about 17.4 at 25 C",
      quality = "low",
      note = "CONTROVERSY: the second dissociation constant of H2S is poorly known. Older tables (NBS 1982 dfG(S^2-) = 85.8 kJ/mol; [N90]) give pK2 about 12.9; spectroscopic work since the 1980s gives 17 to 19 (Schoonen and Barnes 1988 about 18.5; Meyer et al. 1983 about 19). S^2- is never a major species below pH 14 with any of the modern values. dH not recalled (log K held constant). Do not use S^2- based solubility products with this value: sulfide minerals here are defined by dfG.",
    },
    {
      formula = "S(s,rhombic)", model = "cp",
      G = 0, H = 0, S = 32.054,
      uncertainty = { S = 0.050 },  -- +-: from memory of Cox, Wagman and Medvedev 1989 (CODATA Key Values)
      cp = { a = 14.979, b = 26.108e-3 },
      T_range = { 273.15, 368.3 },
      source = "from memory of [CODATA89], CODATA Key Values (S); " .. KELLEY .. " (3.58 + 6.24e-3 T cal)",
      quality = "high",
      note = "rhombic sulfur turns monoclinic at 368.3 K and melts near 388 K; no data above that here. Cp(298.15) from the fit 22.76 vs NBS 22.64",
    },
    {
      formula = "H2S(g)", model = "cp",
      G = -33.443, H = -20.6, S = 205.81,
      uncertainty = { H = 0.5, S = 0.05 },  -- +-: from memory of Cox, Wagman and Medvedev 1989 (CODATA Key Values)
      cp = { a = 32.677, b = 12.385e-3, c = -1.925e5 },
      source = CODATA .. "; " .. KELLEY .. " (7.81 + 2.96e-3 T - 0.46e5/T^2 cal)",
      quality = "high",
      note = "Henry constant with H2S(aq) above: log K = -0.97 (literature about -0.99)",
    },

    -- ---------------------------------------------------------------- sulfite, thiosulfate
    {
      formula = "SO2(g)", model = "cp",
      G = -300.095, H = -296.81, S = 248.223,
      uncertainty = { H = 0.20, S = 0.050 },  -- +-: from memory of Cox, Wagman and Medvedev 1989 (CODATA Key Values)
      cp = { a = 46.191, b = 7.866e-3, c = -7.699e5 },
      source = CODATA .. "; " .. KELLEY .. " (11.04 + 1.88e-3 T - 1.84e5/T^2 cal)",
      quality = "high",
    },
    {
      formula = "SO2(aq)", model = "logk",
      reaction = "SO2(g) = SO2(aq)", logK = 0.084, dH = -26.15,
      source = NBS_DERIVED .. " SO2(aq) (-300.676, -322.980) and SO2(g) (-300.194, -296.830)",
      quality = "medium",
      note = "Henry constant about 1.2 mol/(kg bar)",
    },
    {
      formula = "HSO3^-", model = "logk",
      reaction = "SO2(aq) + H2O(l) = HSO3^- + H^+", logK = -1.765, dH = -17.41,
      source = NBS_DERIVED .. " HSO3^- (-527.73, -626.22), SO2(aq) and H2O(l)",
      quality = "medium",
      note = "Goldberg and Parker 1985 (J. Res. NBS 90:341) give pK1 about 1.86 (recalled)",
    },
    {
      formula = "SO3^2-", model = "logk",
      reaction = "HSO3^- = SO3^2- + H^+", logK = -7.223, dH = -9.28,
      source = NBS_DERIVED .. " SO3^2- (-486.5, -635.5) and HSO3^-",
      quality = "medium",
      note = "literature pK2 7.17-7.22",
    },
    {
      formula = "S2O3^2-", model = "logk",
      reaction = "SO3^2- + S(s,rhombic) = S2O3^2-", logK = 6.307, dH = -16.8,
      source = NBS_DERIVED .. " S2O3^2- (-522.5, -652.3) and SO3^2-",
      quality = "medium",
      note = "metastable intermediate; its field matters only when kinetics keep it (e.g. pitting of stainless steel)",
    },

    -- ---------------------------------------------------------------- sulfate
    {
      formula = "SO4^2-", model = "hkf", units = CAL,
      G = -177930, H = -217400, S = 4.50,
      hkf = { a1 = 8.3014, a2 = -1.9846, a3 = -6.2122, a4 = -2.697, c1 = 1.64, c2 = -17.998, omega = 3.1463 },
      source = SH88, quality = "medium",
      note = "published Cp -64.38 cal/(mol K); V recall wavered between 12.92 and 13.88 cm3/mol (reference README)",
    },
    {
      formula = "HSO4^-", model = "hkf", units = CAL,
      G = -180630, H = -212500, S = 30.0,
      hkf = { a1 = 6.9788, a2 = 9.259, a3 = 2.1108, a4 = -3.1618, c1 = 20.0961, c2 = -1.955, omega = 1.1748 },
      source = SH88, quality = "medium",
      note = "log K(HSO4^- = SO4^2- + H^+) from these dfG: -1.98 ([N90]: -1.988)",
    },

    -- ---------------------------------------------------------------- metal sulfides
    {
      formula = "FeS(s,troilite)", model = "cp",
      G = -102.875, H = -102.59, S = 60.29, cp = { a = 50.54 }, V = 18.20,
      uncertainty = { H = 0.20 },  -- +-: [CK88] (read)
      T_range = { 273.15, 411 },
      source = "dfH: [CK88] (read: -102.59 +- 0.20 kJ/mol, high-temperature direct reaction calorimetry); S: " .. NBS ..
               " (60.29, adiabatic calorimetry; 60.33 read in the Knunyants Chemical Encyclopedia); dfG derived here as dfH - T dfS " ..
               "with Fe 27.28 and S 32.054; Cp " .. NBS .. "; V " .. RH95,
      quality = "medium",
      note = "Troilite is the stoichiometric end member of the pyrrhotite group (Fe(1-x)S, x = 0 to 0.125); " ..
             "the library's pyrrhotite, and the iron sulfide of a sour-corrosion map from pH 7.4 at 25 C and " ..
             "1e-6 iron (the edge FeS + H+ = FeHS+ sets). Monoclinic pyrrhotite Fe7S8 has its own record (issue 13, below). " ..
             "Lambda transition at 411 K not modelled; Cp held at its 25 C value (NBS 50.54 J/(mol K)). " ..
             "Issue 13 (s5-fes2): troilite and pyrite take their dfH from one calorimetric study, [CK88], in place of NBS 1982 " ..
             "(troilite -100.0, pyrite -178.2), so that the FeS/FeS2 step and both solubilities rest on one measurement. " ..
             "With the Shock et al. 1997 Fe^2+ of Fe.lua, log K(FeS + 2 H+ = Fe2+ + H2S(aq)) = 2.90 (NBS troilite: 3.33), " ..
             "below both measured mackinawite constants (3.5 +- 0.25, [RICKARD06]; 3.21, [BWB00]) as mackinawite's " ..
             "metastability requires; the NBS troilite was less stable than the [BWB00] mackinawite. No measured troilite " ..
             "or pyrrhotite solubility at I = 0 could be read (a 50 C study at I = 1 M, abstract read, prints no constant)",
    },
    {
      formula = "FeS(s,mackinawite)", model = "logk",
      reaction = "FeS(s,mackinawite) + 2 H^+ = Fe^2+ + H2S(aq)", logK = 3.5, estimate = "isocoulombic",
      uncertainty = { logK = 0.25 },  -- +-: from memory of Rickard 2006
      source = "from memory of [RICKARD06], log K*sp = 3.5 +- 0.25 " ..
               "for FeS(m) + 2 H+ = Fe2+ + H2S(aq)",
      quality = "medium",
      note = "The first iron sulfide to form in sour corrosion and in sediments; metastable against troilite " ..
             "(pyrrhotite) and pyrite. Second source, read: [BWB00] (abstract) fit " ..
             "log K = 2848.779/T - 6.347 to measured solubility at 25-95 C (3.21 at 25 C, 1.39 at 95 C). Its " ..
             "slope (dH = -54.5 kJ/mol) is not used: it is 25 kJ/mol more exothermic than troilite's " ..
             "calorimetric dissolution enthalpy (-27.3 kJ/mol with these files and the [CK88] troilite), which would make the metastable " ..
             "phase the stable one above about 40 C and the only FeS of every map at 100-300 C, contrary to its " ..
             "observed transformation to pyrrhotite and pyrite on heating. The isocoulombic estimate keeps " ..
             "mackinawite above troilite's solubility at every temperature (known differences against the fit, " ..
             "docs/data-checks.md). Disordered (nanoparticulate) mackinawite is more soluble, 4.87 +- 0.27 " ..
             "(Wolthers, Charlet and Rickard 2005, abstract read). The previous record was this constant written " ..
             "with HS^- (-3.5).",
    },
    {
      formula = "Fe7S8(s,pyrrhotite)", model = "cp",
      G = -771.45, H = -760.0, S = 485.8,
      uncertainty = { H = 12 },  -- +-: the smallest of the five third-law values' +- (1.5 per Fe0.875S, TSIV table Fe.37, read) times 8
      estimate = { Cp = "kopp", from = { ["FeS(s,troilite)"] = 7 } },
      T_range = { 273.15, 527 },
      source = "dfH: derived here from the third-law dfH of Fe0.875S, -96.0, -94.1, -94.9, -94.8 and -95.2 kJ/mol from five equilibrium studies " ..
               "(H2S/FeCl2 at 617-706 K, sulfur-activity and SO2/O2 cells to 1305 K), as tabulated in [TSIV] table Fe.37 (read): mean -95.0 per Fe0.875S, " ..
               "times 8; S: from memory of [GS92] (monoclinic Fe7S8, adiabatic calorimetry); dfG derived here as dfH - T dfS with Fe 27.28 and S 32.054; " ..
               "Cp: Kopp-Neumann estimate from troilite (7 FeS) plus Kopp's atomic heat of S",
      quality = "low",
      note = "Issue 13: monoclinic pyrrhotite (Fe7S8 = Fe0.875S, 4C), the pyrrhotite of low-temperature ores and of sour service above about 100 C; " ..
             "it turns hexagonal near 527 K (the T_range). The same table lists calorimetric values -93.1 and -92.1 (+-3.0); the equilibrium values " ..
             "carry +-1.5 to +-3.1 each, i.e. +-12 to +-25 kJ/mol for Fe7S8. Issue 13 (s5-fes2): with troilite and pyrite on the calorimetry of [CK88], " ..
             "7 FeS + S = Fe7S8 lies at log a(S) = -8.99 and Fe7S8 + 6 S = 7 FeS2 at -10.21 at 25 C, so troilite turns to pyrite directly (at -10.04) " ..
             "and Fe7S8 has no 25 C field; it needs 6.0 kJ/mol more stability (dfG -777.4 or below), half its smallest uncertainty, and the most precise " ..
             "equilibrium value (-96.0 +- 1.5 per Fe0.875S) would give it. On heating the field opens near 107 C and widens (dS of the first step +32, " ..
             "of the second -308 J/(mol K)), as in the Fe-S phase diagram, where monoclinic pyrrhotite + pyrite is a common assemblage. With the former NBS " ..
             "troilite and pyrite the 25 C field was 0.44 log units wide. Whether Fe7S8 has a 25 C field is therefore not resolved by the data (its edges are " ..
             "uncertain by more than a factor of 10 in H2S activity). Measured Cp of Fe0.9S (6.171 R at 298.15 K per Fe0.9S: Gronvold, Stolen, Labban and Westrum 1991, J. Chem. Thermodyn. 23, 261, abstract read) is 8 % above " ..
             "the Kopp-Neumann value per mole of S.",
    },
    {
      formula = "FeS2(s,pyrite)", model = "cp",
      G = -160.174, H = -171.64, S = 52.93,
      uncertainty = { H = 0.93, S = 0.2 },  -- +-: H [CK88] (read); S the IVTANTHERMO pyrite page (read)
      cp = { a = 74.810, b = 5.523e-3, c = -12.761e5 }, V = 23.94,
      source = "dfH: [CK88] (read: -171.64 +- 0.93 kJ/mol, high-temperature direct reaction calorimetry); S: " .. NBS ..
               " (52.93, the adiabatic calorimetry of Gronvold and Westrum 1962, +-0.2 J/(mol K), as [TSIV] states on its pyrite page, read); " ..
               "dfG derived here as dfH - T dfS with Fe 27.28 and S 32.054; " .. HDNB .. " (17.88 + 1.32e-3 T - 3.05e5/T^2 cal); V " .. RH95,
      quality = "medium",
      note = "Issue 13 (s5-fes2): dfH from [CK88] in place of NBS 1982 (-178.2, dfG -166.9), which made pyrite 6.6 kJ/mol (1.15 log units) " ..
             "too stable; [RH95] adopt about -171.5 and dfG -160.2 (recalled), within the calorimetric +-0.93 of this record. " ..
             "Pyrite's solubility is not measurable at 25 C, so no solubility checks its pairing with the Shock et al. 1997 Fe^2+; " ..
             "the FeS/FeS2 step (FeS + S = FeS2, dH -69.05 kJ/mol) rests on one calorimetric study",
    },
    {
      formula = "CuS(s,covellite)", model = "cp",
      G = -53.6, H = -53.1, S = 66.5,
      cp = { a = 44.350, b = 11.046e-3 }, V = 20.42,
      source = NBS .. "; " .. HDNB .. " (10.6 + 2.64e-3 T cal); V " .. RH95, quality = "medium",
    },
    {
      formula = "Cu2S(s,chalcocite)", model = "cp",
      G = -86.2, H = -79.5, S = 120.9, cp = { a = 76.32 }, V = 27.475,
      T_range = { 273.15, 376 },
      source = NBS .. "; V " .. RH95, quality = "medium",
      note = "low chalcocite; transition at 376 K; Cp held at its 25 C value",
    },
    {
      formula = "ZnS(s,sphalerite)", model = "cp",
      G = -201.29, H = -205.98, S = 57.7,
      cp = { a = 50.877, b = 5.188e-3, c = -5.690e5 }, V = 23.83,
      source = NBS .. "; " .. HDNB .. " (12.16 + 1.24e-3 T - 1.36e5/T^2 cal); V " .. RH95, quality = "high",
    },
    {
      formula = "NiS(s,millerite)", model = "cp",
      G = -79.5, H = -82.0, S = 52.97, cp = { a = 47.11 },
      source = NBS .. " (NiS cr)", quality = "medium",
      note = "Cp held at its 25 C value",
    },
    {
      formula = "MnS(s,alabandite)", model = "cp",
      G = -218.4, H = -214.2, S = 78.2, cp = { a = 49.96 }, V = 21.46,
      source = NBS .. " (MnS green); V " .. RH95, quality = "medium",
      note = "Cp held at its 25 C value",
    },
    {
      formula = "PbS(s,galena)", model = "cp",
      G = -98.7, H = -100.4, S = 91.2,
      cp = { a = 44.476, b = 16.778e-3 }, V = 31.49,
      source = NBS .. "; " .. HDNB .. " (10.63 + 4.01e-3 T cal, recall medium); V " .. RH95, quality = "high",
    },
    {
      formula = "Ag2S(s,acanthite)", model = "cp",
      G = -40.67, H = -32.59, S = 144.01, cp = { a = 76.53 }, V = 34.19,
      T_range = { 273.15, 450 },
      source = NBS .. " (Ag2S alpha); V " .. RH95, quality = "high",
      note = "acanthite turns to argentite at about 450 K; Cp held at its 25 C value",
    },
    {
      formula = "CdS(s,greenockite)", model = "cp",
      G = -151.5, H = -156.9, S = 64.9, V = 29.93,
      uncertainty = { G = 0.3 },
      estimate = { Cp = "kopp" }, -- no published Cp recalled: Kopp-Neumann (docs/thermo.md)
      source = "dfG: [BZ23] (abstract read), recommended from the greenockite solubility product measured in strongly acid solution, 25-80 C; S: " .. NBS .. "; dfH derived here as dfG + T dfS with that S; V " .. RH95,
      quality = "medium",
      note = "Issue 13: was NBS 1982 (dfG -156.5, dfH -161.9 kJ/mol): with the file's CODATA Cd^2+ and SH88 HS^- that made CdS + H+ = Cd2+ + HS- -15.90, 1.1 log units below the crystalline CdS measured by in-situ dialysis, -14.82 +- 0.03 (Wang and Tessier 1999, Environ. Sci. Technol. 33, 4270, abstract read); the recommended dfG here gives -15.02 (docs/data-checks.md). Fresh precipitates are more soluble still (-14.15 and -14.40, same paper). Cp not recalled: Kopp-Neumann estimate (Kopp's atomic heats)",
    },
    {
      formula = "MoS2(s,molybdenite)", model = "cp",
      G = -262.8, H = -271.8, S = 62.59, cp = { a = 63.55 }, V = 32.02,
      uncertainty = { H = 4.9 },  -- +-: from memory of Robie and Hemingway 1995
      source = RH95 .. " (dfH from fluorine-combustion calorimetry, S; dfG derived here as dfH - T dfS with Mo 28.66 and S 32.054); Cp at 298.15 K from " .. NBS .. "; V " .. RH95 .. "; supported by the measured MoS2-Mo-H2S-H2 equilibrium of [BC87] (abstract read)",
      quality = "medium",
      note = "Issue 13: was NBS 1982 (dfG -225.9, dfH -235.1 kJ/mol), 37 kJ/mol less stable. The equilibrium Mo-MoS2-H2S-H2 measured at 569-1277 K gives dfG(Mo + S2(g) = MoS2) = -390100 + 176.7 T J/mol for well-crystalline MoS2, 'in excellent agreement' with fluorine calorimetry (Bartovska and Cerny 1987, abstract read); carried to 25 C with the CODATA S2(g) it gives dfG about -258 kJ/mol, 5 kJ/mol from the value here and 32 from NBS (docs/data-checks.md). The NBS value rests on older oxygen-combustion work. Cp held at its 25 C value",
    },
    {
      formula = "SnS(s,herzenbergite)", model = "cp",
      G = -98.3, H = -100.0, S = 77.0,
      estimate = { Cp = "kopp" }, -- no published Cp recalled: Kopp-Neumann (docs/thermo.md)
      source = NBS, quality = "low",
      note = "Cp not recalled: Kopp-Neumann estimate (Kopp's atomic heats)",
    },

    -- ---------------------------------------------------------------- sulfate complexes (formation reactions, I = 0, 25 C)
    { formula = "NaSO4^-", model = "logk", reaction = "Na^+ + SO4^2- = NaSO4^-", logK = 0.70, dH = 1.12, units = KCAL,
      source = N90, quality = "medium" },
    { formula = "KSO4^-", model = "logk", reaction = "K^+ + SO4^2- = KSO4^-", logK = 0.85, dH = 2.25, units = KCAL,
      source = N90, quality = "medium" },
    { formula = "MgSO4(aq)", model = "logk", reaction = "Mg^2+ + SO4^2- = MgSO4(aq)", logK = 2.37, dH = 4.55, units = KCAL,
      source = N90, quality = "medium" },
    { formula = "CaSO4(aq)", model = "logk", reaction = "Ca^2+ + SO4^2- = CaSO4(aq)", logK = 2.30, dH = 1.65, units = KCAL,
      source = N90, quality = "medium" },
    { formula = "FeSO4(aq)", model = "logk", reaction = "Fe^2+ + SO4^2- = FeSO4(aq)", logK = 2.25, dH = 3.23, units = KCAL,
      source = N90, quality = "medium" },
    { formula = "FeSO4^+", model = "logk", reaction = "Fe^3+ + SO4^2- = FeSO4^+", logK = 4.04, dH = 3.91, units = KCAL,
      source = N90, quality = "medium" },
    { formula = "Fe(SO4)2^-", model = "logk", reaction = "Fe^3+ + 2 SO4^2- = Fe(SO4)2^-", logK = 5.38, dH = 4.60, units = KCAL,
      source = N90, quality = "medium" },
    { formula = "AlSO4^+", model = "logk", reaction = "Al^3+ + SO4^2- = AlSO4^+", logK = 3.5, dH = 2.29, units = KCAL,
      source = N90, quality = "medium" },
    { formula = "Al(SO4)2^-", model = "logk", reaction = "Al^3+ + 2 SO4^2- = Al(SO4)2^-", logK = 5.0, dH = 3.11, units = KCAL,
      source = N90, quality = "medium" },
    { formula = "MnSO4(aq)", model = "logk", reaction = "Mn^2+ + SO4^2- = MnSO4(aq)", logK = 2.25, dH = 3.37, units = KCAL,
      source = N90, quality = "medium" },
    { formula = "ZnSO4(aq)", model = "logk", reaction = "Zn^2+ + SO4^2- = ZnSO4(aq)", logK = 2.37, dH = 1.36, units = KCAL,
      source = COMPILED, quality = "medium" },
    { formula = "Zn(SO4)2^2-", model = "logk", reaction = "Zn^2+ + 2 SO4^2- = Zn(SO4)2^2-", logK = 3.28, estimate = "isocoulombic",
      source = COMPILED, quality = "low", note = "dH not recalled" },
    { formula = "CuSO4(aq)", model = "logk", reaction = "Cu^2+ + SO4^2- = CuSO4(aq)", logK = 2.31, dH = 1.22, units = KCAL,
      source = COMPILED, quality = "medium" },
    { formula = "CdSO4(aq)", model = "logk", reaction = "Cd^2+ + SO4^2- = CdSO4(aq)", logK = 2.46, dH = 1.08, units = KCAL,
      source = COMPILED, quality = "medium" },
    { formula = "PbSO4(aq)", model = "logk", reaction = "Pb^2+ + SO4^2- = PbSO4(aq)", logK = 2.75, estimate = { method = "isocoulombic", model = "Mg^2+ + SO4^2- = MgSO4(aq)" },
      source = COMPILED, quality = "low", note = "dH not recalled" },
    { formula = "NiSO4(aq)", model = "logk", reaction = "Ni^2+ + SO4^2- = NiSO4(aq)", logK = 2.29, estimate = { method = "isocoulombic", model = "Ca^2+ + SO4^2- = CaSO4(aq)" },
      source = COMPILED, quality = "low", note = "dH not recalled; [SM] list about 2.3" },
    { formula = "AgSO4^-", model = "logk", reaction = "Ag^+ + SO4^2- = AgSO4^-", logK = 1.29, dH = 1.49, units = KCAL,
      source = COMPILED, quality = "low" },

    -- ---------------------------------------------------------------- bisulfide complexes (I = 0, 25 C)
    {
      formula = "FeHS^+", model = "logk",
      reaction = "Fe^2+ + HS^- = FeHS^+", logK = 5.07, estimate = "isocoulombic",
      source = "from memory of [LUTHER96] (the abstract, read, names the FeSH+ and Fe2(SH)3+ complexes " ..
               "but its constants were not in the excerpt): " ..
               "thermodynamic constant (I = 0) log K = 5.07 +- 0.09, as recalled",
      quality = "low",
      note = "The iron(II) bisulfide complex of sour and anoxic waters (written FeSH+ in the voltammetric literature). " ..
             "Luther's earlier seawater work gives log K = 5.5 (NSF award OCE-9314349 abstract, read; a constant in " ..
             "seawater, not I = 0). dH not known: isocoulombic estimate (Fe^2+ + HS^- + H2O = FeHS^+ + H^+ + OH^-). " ..
             "Fe2(HS)^3+ (log K about 10-11) is left out: it matters only at Fe(II) well above 1e-6. Checks: " ..
             "docs/data-checks.md",
    },

    -- ---------------------------------------------------------------- sulfate salts
    {
      formula = "CaSO4(s,anhydrite)", model = "logk",
      reaction = "CaSO4(s,anhydrite) = Ca^2+ + SO4^2-",
      logK = -4.36, logK_T = { 197.52, 0, -8669.8, -69.835 },
      T_range = { 273.15, 373.15 },
      source = N90 .. ", analytic log K(T) of the measured solubility", quality = "high",
      note = "Issue 13: was NBS 1982 dfG with the SH88 ions (log Ksp -4.31). Defined by the measured solubility product so that ions and solid cannot come from different tables. With the gypsum equation below the gypsum-anhydrite transition in water falls at 58 C.",
    },
    {
      formula = "CaSO4*2H2O(s,gypsum)", model = "logk",
      reaction = "CaSO4*2H2O(s,gypsum) = Ca^2+ + SO4^2- + 2 H2O(l)",
      logK = -4.58, logK_T = { 68.2401, 0, -3221.51, -25.0627 },
      T_range = { 273.15, 373.15 },
      source = N90 .. ", analytic log K(T) of the measured solubility", quality = "high",
      note = "Issue 13: was NBS 1982 gypsum with the SH88 ions (log Ksp -4.515, solubility 18 mmol/kg against 15.1-15.4 measured). The equation gives -4.581 at 25 C.",
    },
    {
      formula = "MgSO4*7H2O(s,epsomite)", model = "cp",
      G = -2871.5, H = -3388.71, S = 372,
      estimate = { Cp = "kopp" }, -- no published Cp recalled: Kopp-Neumann (docs/thermo.md)
      source = NBS, quality = "medium",
      note = "Cp not recalled: Kopp-Neumann estimate (Kopp's atomic heats)",
    },
    {
      formula = "CuSO4(s,chalcocyanite)", model = "cp",
      G = -661.8, H = -771.36, S = 109, cp = { a = 100.0 },
      source = NBS, quality = "medium", note = "Cp held at its 25 C value",
    },
    {
      formula = "CuSO4*5H2O(s,chalcanthite)", model = "cp",
      G = -1879.745, H = -2279.65, S = 300.4, cp = { a = 280 },
      source = NBS, quality = "high", note = "Cp held at its 25 C value",
    },
    {
      formula = "Cu4(SO4)(OH)6(s,brochantite)", model = "logk",
      reaction = "Cu4(SO4)(OH)6(s,brochantite) + 6 H^+ = 4 Cu^2+ + SO4^2- + 6 H2O(l)", logK = 15.34, estimate = "isocoulombic",
      source = "from memory of [COMPILED] (a mineral solubility constant; attribution not recalled)",
      quality = "low",
      note = "independently recalled dfG of brochantite about -1818 kJ/mol reproduces this log K with NBS ions; the common green patina of copper in sulfate-bearing air; dH not recalled",
    },
    {
      formula = "ZnSO4(s,zincosite)", model = "cp",
      G = -871.5, H = -982.8, S = 110.5, cp = { a = 99.2 },
      source = NBS, quality = "medium", note = "Cp held at its 25 C value",
    },
    {
      formula = "ZnSO4*7H2O(s,goslarite)", model = "cp",
      G = -2562.67, H = -3077.75, S = 388.7, cp = { a = 380 },
      source = NBS, quality = "medium", note = "Cp held at its 25 C value",
    },
    {
      formula = "FeSO4*7H2O(s,melanterite)", model = "logk",
      reaction = "FeSO4*7H2O(s,melanterite) = Fe^2+ + SO4^2- + 7 H2O(l)", logK = -2.209, dH = 4.91, units = KCAL,
      source = N90, quality = "medium",
      note = "written by log K because NBS dfG(melanterite) -2509.87 with NBS dfG(Fe^2+) -78.90 gives -4.65, far from the measured solubility (see docs/data/ligands.md on Fe^2+)",
    },
    {
      formula = "PbSO4(s,anglesite)", model = "cp",
      G = -813.14, H = -919.94, S = 148.57, cp = { a = 103.207 }, V = 47.95,
      source = NBS .. "; V " .. RH95, quality = "high", note = "Cp held at its 25 C value",
    },
    {
      formula = "Ag2SO4(s)", model = "cp",
      G = -618.41, H = -715.88, S = 200.4, cp = { a = 131.38 },
      source = NBS, quality = "high", note = "Cp held at its 25 C value",
    },
    {
      formula = "NiSO4*6H2O(s,retgersite)", model = "cp",
      G = -2224.95, H = -2682.8, S = 334.35,
      estimate = { Cp = "kopp" }, -- no published Cp recalled: Kopp-Neumann (docs/thermo.md)
      source = NBS .. " (alpha, tetragonal)", quality = "low",
      note = "S recalled weakly; Cp not recalled: Kopp-Neumann estimate (Kopp's atomic heats)",
    },
    {
      formula = "Na2SO4(s,thenardite)", model = "cp",
      G = -1270.16, H = -1387.08, S = 149.58, cp = { a = 128.2 },
      source = NBS, quality = "medium",
      note = "recalled dfG/dfH/S close the cycle only to 0.8 kJ/mol; Cp held at its 25 C value",
    },
    {
      formula = "Na2SO4*10H2O(s,mirabilite)", model = "cp",
      G = -3646.85, H = -4327.26, S = 592.0,
      estimate = { Cp = "kopp" }, -- no published Cp recalled: Kopp-Neumann (docs/thermo.md)
      T_range = { 273.15, 305.5 },
      source = NBS, quality = "medium",
      note = "recalled values close the cycle only to 0.9 kJ/mol; dehydrates at 32.4 C; Cp not recalled",
    },
    {
      formula = "K2SO4(s,arcanite)", model = "logk",
      reaction = "K2SO4(s,arcanite) = 2 K^+ + SO4^2-", logK = -1.776, estimate = "isocoulombic",
      source = "from memory of [COMPILED] (a mineral solubility constant, in USGS compilations after [N90]; primary paper not recalled)",
      quality = "medium",
      note = "written by log K: NBS 1982 arcanite (-1321.37, -1437.79, 175.56; cycle off by 1.3 kJ/mol) is consistent with NBS K^+ (-283.27) but gives -2.10 with SH88/CODATA K^+ (-282.5), which the K file is expected to carry; dH not recalled",
    },
    {
      formula = "KFe3(SO4)2(OH)6(s,jarosite)", model = "logk",
      reaction = "KFe3(SO4)2(OH)6(s,jarosite) + 6 H^+ = K^+ + 3 Fe^3+ + 2 SO4^2- + 6 H2O(l)", logK = -11.0, dH = -45,
      uncertainty = { logK = 0.3 },
      T_range = { 277.15, 308.15 },
      source = "[BP96] (abstract read): log Ksp -11.0 +- 0.3 at 25 C and dH -45 +- 5 kJ/mol from the solubility of a near-ideal synthetic jarosite measured at 4-35 C",
      quality = "medium",
      note = "Issue 13: was " .. N90 .. " (log K -9.21, dH -31.28 kcal/mol), 1.8 log units more soluble; published jarosite constants spread over seven orders of magnitude (the paper's introduction, read), and this is a direct measurement at equilibrium (3-4 months). The paper also gives dfG -3309.8 +- 1.7 kJ/mol, dS -350 +- 40 J/(mol K) and dCp -2.1 +- 0.2 kJ/(mol K) over 4-35 C; the dCp is not used (van 't Hoff with the 25 C dH), since carried beyond 35 C it would change dH by 2 kJ/mol per kelvin. T_range is the measured 4-35 C: above it the constant is an extrapolation (van 't Hoff), and the estimate validation of docs/data-checks.md does not use it there.",
    },
    {
      formula = "KAl3(SO4)2(OH)6(s,alunite)", model = "logk",
      reaction = "KAl3(SO4)2(OH)6(s,alunite) + 6 H^+ = K^+ + 3 Al^3+ + 2 SO4^2- + 6 H2O(l)", logK = -1.4, dH = -50.25, units = KCAL,
      source = N90, quality = "medium",
    },
    -- ---------------------------------------------------------------- mercury (issue 13: CODATA, as Hg.lua)
    {
      formula = "Hg2SO4(s)", model = "cp",
      G = -625.780, H = -743.09, S = 200.70,
      cp = { a = 131.96 },
      uncertainty = { H = 0.40, S = 0.20 },
      source = CODATA .. " (+- from the same); Cp at 298.15 K from " .. NBS .. ", held constant",
      quality = "high",
      note = "Mercurous sulfate electrode: E0(Hg2SO4 + 2 e- = 2 Hg + SO4^2-) = 0.6127 V with CODATA SO4^2-, 0.6150 V with the file's SH88 SO4^2-; measured 0.6125 V (recalled).",
    },
    {
      formula = "HgS(s,cinnabar)", model = "cp",
      G = -50.6, H = -58.2, S = 82.4,
      cp = { a = 48.41 },
      source = NBS .. " (Cp at 298.15 K held constant)",
      quality = "medium",
      note = "NBS solid with the CODATA Hg^2+ of Hg.lua: NBS dfG(Hg^2+) is 0.27 kJ/mol lower (0.05 in log K), inside the spread of cinnabar solubility data.",
    },
    -- ---------------------------------------------------------------- strontium and barium sulfates (scaling)
    {
      formula = "SrSO4(s,celestite)", model = "logk",
      reaction = "SrSO4(s,celestite) = Sr^2+ + SO4^2-",
      logK = -6.63,
      logK_T = { -14805.9622, -2.4660924, 756968.533, 5436.3588, -40553604.0 },
      T_range = { 273.15, 373.15 },
      source = "from memory of [RA87], analytic log K(T) as adopted by " .. N90,
      quality = "high",
      note = "Measured solubility product (the equation gives -6.632 at 25 C); range 0-100 C taken conservatively.",
    },
    {
      formula = "SrSO4(aq)", model = "logk",
      reaction = "Sr^2+ + SO4^2- = SrSO4(aq)",
      logK = 2.29, dH = 2.08, units = KCAL,
      source = N90, quality = "medium",
    },
    {
      formula = "BaSO4(s,barite)", model = "logk",
      reaction = "BaSO4(s,barite) = Ba^2+ + SO4^2-",
      logK = -9.97,
      logK_T = { 136.035, 0, -7680.41, -48.595 },
      T_range = { 273.15, 373.15 },
      source = N90 .. ", analytic log K(T) after [BLOUNT77]",
      quality = "high",
      note = "Gives -9.970 at 25 C; NBS barite with NBS Ba^2+ and SH88 SO4^2- gives -9.97 too. Range 0-100 C taken conservatively (Blount measured to higher T).",
    },
  },
}
