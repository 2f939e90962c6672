-- stdlib/elements/Cu.lua: copper, its ions, hydrolysis species and oxides.
--
-- Primary compilation: NBS 1982 (ions and solids); hydrolysis from Baes and Mesmer 1976,
-- Cu(OH)2(aq) from the IUPAC review (Powell et al. 2007).
--
-- Data choice (see docs/data/transition-metals.md): ions and solids from the NBS
-- tables (Wagman et al. 1982), one table for the whole system; hydrolysis from Baes
-- and Mesmer 1976, Cu(OH)2(aq) from the IUPAC review (Powell et al. 2007). No Cp is
-- recalled for Cu+ or Cu2+, so both ions are defined by their formation reaction from
-- the metal (log K = -dfG/(RT ln10), dH = dfH).
-- Every number below was recalled, not read; "from memory of" says so.

local NBS = "from memory of [NBS82]"
local KELLEY = "cp from memory of [K60], converted from cal with 4.184"
local BM = "from memory of [BM76] (I = 0, 25 C)"

return {
  element = "Cu",
  title = "Copper",
  units = { energy = "kJ", entropy = "J" },
  species = {
    {
      formula = "Cu(s)", model = "cp",
      G = 0, H = 0, S = 33.150,
      cp = { a = 22.64, b = 6.276e-3, c = 0 },
      T_range = { 298.15, 1357 },
      source = NBS .. " (S); " .. KELLEY .. " (5.41 + 1.50e-3 T cal/(mol K))",
      quality = "high",
      note = "Polynomial gives Cp(298.15 K) = 24.51 J/(mol K) against NBS 24.435.",
    },
    {
      formula = "Cu^+", model = "logk",
      reaction = "2 Cu(s) + 2 H^+ = 2 Cu^+ + H2(g)",
      logK = -17.512, dH = 143.34,
      source = "derived here from " .. NBS .. ": Cu+ dfG 49.98, dfH 71.67 kJ/mol, S 40.6 J/(mol K)",
      quality = "medium",
      note = "No Cp or complete HKF set recalled; defined by its formation reaction (log K = -2 dfG/(RT ln10)). Van 't Hoff only above 25 C.",
    },
    {
      formula = "Cu^2+", model = "logk",
      reaction = "Cu(s) + 2 H^+ = Cu^2+ + H2(g)",
      logK = -11.473, dH = 64.77,
      source = "derived here from " .. NBS .. ": Cu2+ dfG 65.49, dfH 64.77 kJ/mol, S -99.6 J/(mol K)",
      quality = "high",
      note = "E0(Cu2+/Cu) = 0.3394 V (CRC 0.3419; CODATA dfG 65.04 gives 0.3370). No Cp recalled; van 't Hoff only above 25 C.",
    },
    -- Cu(II) hydrolysis ------------------------------------------------------
    {
      formula = "CuOH^+", model = "logk",
      reaction = "Cu^2+ + H2O(l) = CuOH^+ + H^+",
      logK = -8.0, estimate = "isocoulombic",
      source = BM, quality = "medium",
      note = "IUPAC review ([POWELL07]) about -7.95, as recalled.",
    },
    {
      formula = "Cu(OH)2(aq)", model = "logk",
      reaction = "Cu^2+ + 2 H2O(l) = Cu(OH)2(aq) + 2 H^+",
      logK = -16.23, estimate = "isocoulombic",
      source = "from memory of [POWELL07] (IUPAC Technical Report, Pure Appl. Chem. 79, 895), log *beta2 at I = 0, 25 C",
      quality = "medium",
      note = "The neutral species that carries CuO's solubility at near-neutral pH at temperature. [BM76] give only a bound. No dH recalled: log K(T) is the isocoulombic estimate (estimate field). At 25 C and 1e-6 it has no field (CuO + H2O = Cu(OH)2(aq), log K -8.88 with the NBS CuO).",
    },
    {
      formula = "Cu2(OH)2^2+", model = "logk",
      reaction = "2 Cu^2+ + 2 H2O(l) = Cu2(OH)2^2+ + 2 H^+",
      logK = -10.36, estimate = "isocoulombic",
      source = BM, quality = "medium",
    },
    {
      formula = "Cu3(OH)4^2+", model = "logk",
      reaction = "3 Cu^2+ + 4 H2O(l) = Cu3(OH)4^2+ + 4 H^+",
      logK = -21.1, estimate = "isocoulombic",
      source = BM, quality = "low",
    },
    {
      formula = "Cu(OH)3^-", model = "logk",
      reaction = "Cu^2+ + 3 H2O(l) = Cu(OH)3^- + 3 H^+",
      logK = -26.9, estimate = "isocoulombic",
      source = BM, quality = "medium",
    },
    {
      formula = "Cu(OH)4^2-", model = "logk",
      reaction = "Cu^2+ + 4 H2O(l) = Cu(OH)4^2- + 4 H^+",
      logK = -39.6, estimate = "isocoulombic",
      source = BM, quality = "medium",
      note = "The CuO2^2- of older diagrams (same species less two H2O).",
    },
    -- oxides -----------------------------------------------------------------
    {
      formula = "Cu2O(s,cuprite)", model = "cp",
      G = -146.0, H = -168.6, S = 93.14,
      cp = { a = 63.64, b = 0, c = 0 },
      source = NBS,
      quality = "high",
      note = "cp: NBS Cp(298.15 K) only (a = Cp, b = c = 0).",
    },
    {
      formula = "CuO(s,tenorite)", model = "cp",
      G = -129.7, H = -157.3, S = 42.63,
      cp = { a = 42.30, b = 0, c = 0 },
      source = NBS,
      quality = "high",
      note = "cp: NBS Cp(298.15 K) only (a = Cp, b = c = 0).",
    },
  },
}
