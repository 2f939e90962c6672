-- stdlib/elements/Hg.lua: mercury, its ions, hydrolysis species and oxide.
--
-- Primary compilation: CODATA Key Values (Cox, Wagman and Medvedev 1989) for
-- Hg(l), Hg(g), Hg^2+, Hg2^2+ and HgO; dfG derived here as dfH - T dfS with
-- the CODATA entropies of the elements.  Hg(II) complexes: the IUPAC
-- critical review of Powell et al. 2005 (Pure Appl. Chem. 77, 739) for
-- Hg(OH)2(aq) and the chloro complexes (those in Cl.lua); HgOH^+ from Baes
-- and Mesmer 1976, which Powell et al. confirm.  Dissolved elemental mercury,
-- Hg(aq): the Henry constant of Andersson et al. 2008 with its measured
-- temperature dependence.  Calomel (Hg2Cl2) and the Hg(II) chloro complexes
-- are in Cl.lua, mercurous sulfate and the sulfides in S.lua.  The CODATA set reproduces the measured
-- calomel and mercurous sulfate electrode potentials (0.2680 V, 0.6127 V).
-- Every number was recalled, not read ("from memory of").
--
-- Temperature: the ions are defined by their formation reactions from the
-- metal with the CODATA dfH (van 't Hoff); no Cp of the ions is recalled.
-- Hg(aq): measured enthalpy of solution (van 't Hoff).  Hydrolysis and the
-- chloro complexes: no enthalpy recalled, isocoulombic estimates (flagged).
--
-- Caution: mercury is toxic; diagrams say what can form, not how fast.

local CODATA = "from memory of [CODATA89] (dfH, S; dfG derived here as dfH - T dfS)"
local CODATA_U = "+-: from memory of [CODATA89]"
local NBS = "from memory of [NBS82]"
local BM = "from memory of [BM76] (I = 0, 25 C)"
local POWELL = "[POWELL05] (I = 0, 25 C)"
-- Henry constant of Hg(0): Sander 2023 (Atmos. Chem. Phys. 23, 10901),
-- compilation of Henry's law constants, entry for mercury (read):
-- Hcp = 1.3e-3 mol/(m3 Pa) and d ln Hcp/d(1/T) = 2600 K at 298.15 K for
-- Andersson et al. 2008 and the JPL evaluation (Burkholder et al. 2019);
-- Sanemasa 1975 (Bull. Chem. Soc. Jpn. 48, 1795, abstract read) 1.3e-3 and
-- 2500 K, measured at 5-60 C, heat of solution -5.3 kcal/mol.
-- K(Hg(g) = Hg(aq)) in mol/(kg bar) = Hcp * 1e5 Pa/bar / rho, rho = 997.05
-- kg/m3 (IAPWS-95 at 25 C, 1 bar): log K = log10(1.3e-3 * 100.296) = -0.8848;
-- dH = -R * 2600 K = -21.62 kJ/mol.
local HENRY = "derived here from [ANDERSSON08]: Hcp 1.3e-3 mol/(m3 Pa), d ln Hcp/d(1/T) = 2600 K at 298.15 K, read in the table of Sander 2023 cited there; molar to molal with the water density 997.05 kg/m3"

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
      -- Cp: the formation reaction takes the dCp(T) of the same reaction of Ca^2+, whose
      -- HKF set is published (isocoulombic: the difference reaction keeps dCp = 0; model
      -- substance, Lindsay 1980); Ca^2+ is the model by the rule of docs/thermo.md:
      -- S -36.19 J/(mol K) is closer to Ca^2+ (-56.5) than to Mg^2+ (-137.0). Validation: docs/data-checks.md, "Single-ion heat capacities".
      estimate = { dCp = "isocoulombic", model = "Ca(s) + 2 H^+ = Ca^2+ + H2(g)" },
      source = "derived here from " .. CODATA .. ": Hg^2+ dfH 170.21 +- 0.20 kJ/mol, S -36.19 +- 0.80 J/(mol K)",
      quality = "high",
      note = "E0(Hg^2+/Hg) = 0.8533 V (CRC 0.851).",
    },
    {
      formula = "Hg2^2+", model = "logk",
      reaction = "2 Hg(l) + 2 H^+ = Hg2^2+ + H2(g)",
      logK = -26.904, dH = 166.87,
      -- Cp: the formation reaction takes the dCp(T) of the same reaction of Ca^2+, whose
      -- HKF set is published (isocoulombic: the difference reaction keeps dCp = 0; model
      -- substance, Lindsay 1980); Ca^2+ is the model by the rule of docs/thermo.md:
      -- S 65.74 J/(mol K) is closer to Ca^2+ (-56.5) than to Mg^2+ (-137.0). Validation: docs/data-checks.md, "Single-ion heat capacities".
      estimate = { dCp = "isocoulombic", model = "Ca(s) + 2 H^+ = Ca^2+ + H2(g)" },
      source = "derived here from " .. CODATA .. ": Hg2^2+ dfH 166.87 +- 0.50 kJ/mol, S 65.74 +- 0.80 J/(mol K)",
      quality = "high",
      note = "E0(Hg2^2+/Hg) = 0.7958 V (CRC 0.7973).",
    },
    {
      formula = "HgOH^+", model = "logk",
      reaction = "Hg^2+ + H2O(l) = HgOH^+ + H^+",
      logK = -3.40, estimate = "isocoulombic",
      source = BM, quality = "medium",
      note = "Powell et al. 2005 (IUPAC) select the same -3.40 (recalled). No dH recalled: temperature by the isocoulombic estimate.",
    },
    {
      formula = "Hg(OH)2(aq)", model = "logk",
      reaction = "Hg^2+ + 2 H2O(l) = Hg(OH)2(aq) + 2 H^+",
      logK = -5.98, estimate = "isocoulombic",
      uncertainty = { logK = 0.06 },
      source = POWELL .. "; value and +- read in the abstract of its summary (Aust. J. Chem. 2004, doi:10.1071/CH04063)",
      quality = "high",
      note = "The dominant dissolved Hg(II) species from pH 3 to 12 without chloride. [BM76] give -6.17 (recalled); with CODATA HgO the IUPAC value gives HgO solubility 2.9e-4 mol/kg against about 2.5e-4 in handbooks, the Baes and Mesmer value 1.9e-4 (docs/data-checks.md). No dH recalled: temperature by the isocoulombic estimate.",
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
    {
      formula = "Hg(aq)", model = "logk",
      reaction = "Hg(g) = Hg(aq)",
      logK = -0.8848, dH = -21.62,
      T_range = { 273.15, 333.15 },
      source = HENRY,
      quality = "medium",
      note = "Dissolved elemental mercury (condensates, scrubber and process waters). With Hg(g) over Hg(l) it gives the solubility of the liquid metal, 3.3e-7 mol/kg (66 ug/kg) at 25 C; Clever, Johnson and Derrick 1985 recommend Hcp 1.1e-3 (0.07 lower in log K). dH is measured (Sanemasa 1975: -5.3 kcal/mol, 5-60 C); Glew and Hames 1971 and Clever et al. 1985 give a steeper slope (4800-5700 K), 0.4 lower in log K at 60 C (docs/data-checks.md). Constant dH above 60 C is an extrapolation.",
    },
  },
}
