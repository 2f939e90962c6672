-- stdlib/elements/Hg.lua: mercury, its ions, hydrolysis species and oxide.
--
-- Primary compilation: CODATA Key Values (Cox, Wagman and Medvedev 1989) for
-- Hg(l), Hg(g), Hg^2+, Hg2^2+ and HgO; dfG derived here as dfH - T dfS with
-- the CODATA entropies of the elements.  Hydrolysis: Baes and Mesmer 1976.
-- Calomel (Hg2Cl2) is in Cl.lua, mercurous sulfate and the sulfides in S.lua,
-- with the same compilation.  The CODATA set reproduces the measured
-- calomel and mercurous sulfate electrode potentials (0.2680 V, 0.6127 V).
-- Every number was recalled, not read ("from memory of").
--
-- Temperature: the ions are defined by their formation reactions from the
-- metal with the CODATA dfH (van 't Hoff); no Cp of the ions is recalled.
--
-- Caution: mercury is toxic; diagrams say what can form, not how fast.

local CODATA = "from memory of [CODATA89] (dfH, S; dfG derived here as dfH - T dfS)"
local CODATA_U = "+-: from memory of [CODATA89]"
local NBS = "from memory of [NBS82]"
local BM = "from memory of [BM76] (I = 0, 25 C)"

return {
  element = "Hg",
  title = "Mercury",
  units = { energy = "kJ", entropy = "J" },
  species = {
    {
      formula = "Hg(l)", model = "cp",
      G = 0, H = 0, S = 75.90,
      cp = { a = 27.98 },
      T_range = { 273.15, 629.88 },
      uncertainty = { S = 0.12 },
      source = CODATA .. " (S; " .. CODATA_U .. "); Cp at 298.15 K from " .. NBS .. ", held constant",
      quality = "high",
      note = "Liquid to its normal boiling point (629.88 K). Cp of liquid mercury falls by about 1 % from 298 to 450 K.",
    },
    {
      formula = "Hg(g)", model = "cp",
      G = 31.842, H = 61.38, S = 174.971,
      cp = { a = 20.786 },
      uncertainty = { H = 0.04, S = 0.005 },
      source = CODATA .. " (" .. CODATA_U .. "); Cp = 5R/2 (monatomic ideal gas)",
      quality = "high",
      note = "log10 of the vapour pressure over Hg(l) at 25 C: -5.578 bar (0.264 Pa), the measured 0.26 Pa.",
    },
    {
      formula = "Hg^2+", model = "logk",
      reaction = "Hg(l) + 2 H^+ = Hg^2+ + H2(g)",
      logK = -28.848, dH = 170.21,
      source = "derived here from " .. CODATA .. ": Hg^2+ dfH 170.21 +- 0.20 kJ/mol, S -36.19 +- 0.80 J/(mol K)",
      quality = "high",
      note = "E0(Hg^2+/Hg) = 0.8533 V (CRC 0.851).",
    },
    {
      formula = "Hg2^2+", model = "logk",
      reaction = "2 Hg(l) + 2 H^+ = Hg2^2+ + H2(g)",
      logK = -26.904, dH = 166.87,
      source = "derived here from " .. CODATA .. ": Hg2^2+ dfH 166.87 +- 0.50 kJ/mol, S 65.74 +- 0.80 J/(mol K)",
      quality = "high",
      note = "E0(Hg2^2+/Hg) = 0.7958 V (CRC 0.7973).",
    },
    {
      formula = "HgOH^+", model = "logk",
      reaction = "Hg^2+ + H2O(l) = HgOH^+ + H^+",
      logK = -3.40, estimate = "isocoulombic",
      source = BM, quality = "medium",
      note = "No dH recalled: temperature by the isocoulombic estimate.",
    },
    {
      formula = "Hg(OH)2(aq)", model = "logk",
      reaction = "Hg^2+ + 2 H2O(l) = Hg(OH)2(aq) + 2 H^+",
      logK = -6.17, estimate = "isocoulombic",
      source = BM, quality = "medium",
      note = "The dominant dissolved Hg(II) species from pH 3 to 12. No dH recalled: temperature by the isocoulombic estimate.",
    },
    {
      formula = "HgO(s,montroydite)", model = "cp",
      G = -58.522, H = -90.79, S = 70.25,
      cp = { a = 44.06 },
      uncertainty = { H = 0.12, S = 0.30 },
      source = CODATA .. " (" .. CODATA_U .. "); Cp at 298.15 K from " .. NBS .. ", held constant",
      quality = "high",
      note = "Red HgO. HgO + 2 H^+ = Hg^2+ + H2O: log K 2.44, Baes and Mesmer 2.44 (recalled).",
    },
  },
}
