-- stdlib/elements/Sn.lua: tin, Sn2+ (and, with caution, Sn4+), Sn(II) hydrolysis species,
-- tin oxides and Sn(OH)2.
-- Data set choice (see docs/data/other-metals.md): the NBS tables (Wagman et al. 1982)
-- for the whole Sn-O-H system, for internal consistency. CODATA 1989 key values for SnO
-- and SnO2 are 4-5 kJ/mol less negative (documented, not used). Sn(II) hydrolysis from
-- Baes and Mesmer 1976. No HKF set is recalled for the tin ions, so they are defined by
-- their conventional formation reactions (log K = -dfG/(RT ln 10), dH = dfH).
-- Aqueous Sn(IV) hydroxo species (Sn(OH)4(aq), Sn(OH)5^-, Sn(OH)6^2-) are left out: no
-- constants recalled with confidence.
--
-- Primary compilation: NBS 1982 (ions and solids); Sn(II) hydrolysis from Baes and Mesmer 1976.
local NBS = "from memory of [NBS82]"
local CODATA = "from memory of [CODATA89]"
local RH95 = "from memory of [RH95]"
local BM76 = "from memory of [BM76] (I = 0, 25 C)"

return {
  element = "Sn",
  title = "Tin",
  units = { energy = "kJ", entropy = "J" },
  species = {
    {
      formula = "Sn(s)", model = "cp",
      G = 0, H = 0, S = 51.55,
      cp = { a = 26.99, b = 0, c = 0 },
      V = 16.29,
      T_range = { 273.15, 505.08 },
      source = "S and Cp: " .. NBS .. " ([CODATA89] S 51.18, recalled, not used: issue 13 took NBS, the table of gray tin, Sn^2+ and the oxides, so that the white/gray tin entropy difference comes from one table)",
      quality = "high",
      note = "white (beta) tin, the reference state; below 286.4 K gray tin is stable but the change is slow. cp is NBS Cp at 298.15 K taken as constant. Melts at 505.08 K. V from the density 7.287 g/cm3.",
    },
    {
      formula = "Sn(s,gray)", model = "cp",
      G = 0.13, H = -2.09, S = 44.14,
      cp = { a = 25.77, b = 0, c = 0 },
      source = NBS, quality = "medium",
      note = "alpha (gray) tin. cp is NBS Cp at 298.15 K taken as constant.",
    },
    {
      formula = "Sn^2+", model = "logk",
      reaction = "Sn(s) + 2 H^+ = Sn^2+ + H2(g)",
      logK = 4.765, dH = -8.8,
      -- Cp: the formation reaction takes the dCp(T) of the same reaction of Ca^2+, whose
      -- HKF set is published (isocoulombic: the difference reaction keeps dCp = 0; model
      -- substance, Lindsay 1980); Ca^2+ is the model by the rule of docs/thermo.md:
      -- S -17 J/(mol K) is closer to Ca^2+ (-56.5) than to Mg^2+ (-137.0). Validation: docs/data-checks.md, "Single-ion heat capacities".
      estimate = { dCp = "isocoulombic", model = "Ca(s) + 2 H^+ = Ca^2+ + H2(g)" },
      source = "derived here from " .. NBS .. ": dfG -27.2, dfH -8.8 kJ/mol, S -17 J/(mol K)",
      quality = "medium",
      note = "conventional formation reaction, log K = 27.2/5.70801. Gives E(Sn2+/Sn) = -0.141 V; CRC lists -0.1375. CODATA 1989 gives dfH -8.9, S -16.7 (recalled). Heat capacity: the isocoulombic estimate above (dCp of the Ca^2+ formation reaction).",
    },
    {
      formula = "Sn^4+", model = "logk",
      reaction = "Sn(s) + 4 H^+ = Sn^4+ + 2 H2(g)",
      logK = -0.438, dH = 30.5,
      source = "derived here from " .. NBS .. ": dfG 2.5, dfH 30.5 kJ/mol, S -117 J/(mol K)",
      quality = "low",
      note = "CAUTION: the free Sn4+ ion does not persist in water (it hydrolyses and precipitates SnO2 except in strong complexing acid); these are hypothetical-ion values. E(Sn4+/Sn2+) from them is 0.154 V (CRC: 0.151).",
    },
    {
      formula = "SnOH^+", model = "logk",
      reaction = "Sn^2+ + H2O(l) = SnOH^+ + H^+",
      logK = -3.40, estimate = "isocoulombic",
      source = BM76, quality = "medium",
    },
    {
      formula = "Sn(OH)2(aq)", model = "logk",
      reaction = "Sn^2+ + 2 H2O(l) = Sn(OH)2(aq) + 2 H^+",
      logK = -7.06, estimate = "isocoulombic",
      source = BM76, quality = "medium",
    },
    {
      formula = "Sn(OH)3^-", model = "logk",
      reaction = "Sn^2+ + 3 H2O(l) = Sn(OH)3^- + 3 H^+",
      logK = -16.61, estimate = "isocoulombic",
      source = BM76, quality = "medium",
    },
    {
      formula = "Sn2(OH)2^2+", model = "logk",
      reaction = "2 Sn^2+ + 2 H2O(l) = Sn2(OH)2^2+ + 2 H^+",
      logK = -4.77, estimate = "isocoulombic",
      source = BM76, quality = "low",
    },
    {
      formula = "Sn3(OH)4^2+", model = "logk",
      reaction = "3 Sn^2+ + 4 H2O(l) = Sn3(OH)4^2+ + 4 H^+",
      logK = -6.88, estimate = "isocoulombic",
      source = BM76, quality = "medium",
    },
    {
      formula = "SnO(s)", model = "cp",
      G = -256.9, H = -285.8, S = 56.5,
      cp = { a = 44.31, b = 0, c = 0 },
      source = NBS, quality = "medium",
      note = "cp is NBS Cp at 298.15 K taken as constant. CODATA 1989 (recalled): dfH -280.71, S 57.17, so dfG about -251.9: 5 kJ/mol less stable than NBS. Not used, to keep the Sn system in one table.",
    },
    {
      formula = "SnO2(s,cassiterite)", model = "cp",
      G = -519.6, H = -580.7, S = 52.3,
      cp = { a = 52.59, b = 0, c = 0 },
      V = 21.55,
      source = NBS .. "; V: " .. RH95,
      quality = "medium",
      note = "cp is NBS Cp at 298.15 K taken as constant. CODATA 1989 (recalled): dfH -577.63, S 49.04, so dfG about -515.8. Not used, to keep the Sn system in one table.",
    },
    {
      formula = "Sn(OH)2(s)", model = "cp",
      G = -491.6, H = -561.1, S = 155,
      estimate = { Cp = "kopp" }, -- no published Cp recalled: Kopp-Neumann (docs/thermo.md)
      source = NBS, quality = "low",
      note = "precipitated Sn(OH)2 (hydrous SnO). No heat capacity recalled: Cp by Kopp-Neumann additivity (Kopp's atomic heats, an estimate). SnO + H2O(l) is 2.4 kJ/mol more stable.",
    },
  },
}
