-- stdlib/elements/Cd.lua: cadmium, Cd2+, its hydrolysis species, CdO and Cd(OH)2.
-- Data set choice (see docs/data/other-metals.md): Cd2+ and CdO from the CODATA key
-- values (Cox, Wagman and Medvedev 1989); Cd(OH)2 from the NBS tables (NBS and CODATA
-- agree on Cd2+ and CdO within 0.12 kJ/mol). Hydrolysis from Baes and Mesmer 1976.
-- No complete HKF set is recalled for Cd2+, so it is defined by its conventional
-- formation reaction (log K = -dfG/(RT ln 10), dH = dfH).
--
-- Primary compilation: CODATA 1989 (Cd^2+, CdO); NBS 1982 for Cd(OH)2, which CODATA does
-- not cover (the two tables agree on Cd^2+ and CdO within 0.12 kJ/mol; the Cd(OH)2
-- solubility check passes). Hydrolysis from Baes and Mesmer 1976.
local NBS = "from memory of [NBS82]"
local CODATA = "[CODATA89]"
local BM76 = "from memory of [BM76] (I = 0, 25 C)"

return {
  element = "Cd",
  title = "Cadmium",
  units = { energy = "kJ", entropy = "J" },
  species = {
    {
      formula = "Cd(s)", model = "cp",
      G = 0, H = 0, S = 51.80,
      cp = { a = 25.98, b = 0, c = 0 },
      V = 13.00,
      T_range = { 273.15, 594.22 },
      source = "S: from memory of " .. CODATA .. " (NBS 51.76); Cp: " .. NBS,
      quality = "high",
      note = "cp is NBS Cp at 298.15 K taken as constant. Melts at 594.22 K. V from the density 8.65 g/cm3.",
    },
    {
      formula = "Cd^2+", model = "logk",
      reaction = "Cd(s) + 2 H^+ = Cd^2+ + H2(g)",
      logK = 13.618, dH = -75.92,
      -- Cp: the formation reaction takes the dCp(T) of the same reaction of Ca^2+, whose
      -- HKF set is published (isocoulombic: the difference reaction keeps dCp = 0; model
      -- substance, Lindsay 1980); Ca^2+ is the model by the rule of docs/thermo.md:
      -- S -72.8 J/(mol K) is closer to Ca^2+ (-56.5) than to Mg^2+ (-137.0). Validation: docs/data-checks.md, "Single-ion heat capacities".
      estimate = { dCp = "isocoulombic", model = "Ca(s) + 2 H^+ = Ca^2+ + H2(g)" },
      source = "derived here from " .. CODATA .. ": dfH -75.92 kJ/mol and S -72.8 J/(mol K) read in a CODATA-table reprint, dfG -77.733 derived (phlox's reference gibbs_25C.csv)",
      quality = "high",
      note = "conventional formation reaction, log K = 77.733/5.70801. Heat capacity: the isocoulombic estimate above (dCp of the Ca^2+ formation reaction; before it, van 't Hoff with constant dH took Cp(Cd2+) = Cp(Cd) - Cp(H2)). NBS 1982: dfG -77.612, dfH -75.90, S -73.2.",
    },
    {
      formula = "CdOH^+", model = "logk",
      reaction = "Cd^2+ + H2O(l) = CdOH^+ + H^+",
      logK = -10.08, estimate = "isocoulombic",
      source = BM76, quality = "medium",
    },
    {
      formula = "Cd(OH)2(aq)", model = "logk",
      reaction = "Cd^2+ + 2 H2O(l) = Cd(OH)2(aq) + 2 H^+",
      logK = -20.35, estimate = "isocoulombic",
      source = BM76, quality = "medium",
    },
    {
      formula = "Cd(OH)3^-", model = "logk",
      reaction = "Cd^2+ + 3 H2O(l) = Cd(OH)3^- + 3 H^+",
      logK = -33.3, estimate = "isocoulombic",
      source = BM76, quality = "medium",
    },
    {
      formula = "Cd(OH)4^2-", model = "logk",
      reaction = "Cd^2+ + 4 H2O(l) = Cd(OH)4^2- + 4 H^+",
      logK = -47.35, estimate = "isocoulombic",
      source = BM76, quality = "medium",
    },
    {
      formula = "Cd2OH^3+", model = "logk",
      reaction = "2 Cd^2+ + H2O(l) = Cd2OH^3+ + H^+",
      logK = -9.39, estimate = "isocoulombic",
      source = BM76, quality = "medium",
    },
    {
      formula = "Cd4(OH)4^4+", model = "logk",
      reaction = "4 Cd^2+ + 4 H2O(l) = Cd4(OH)4^4+ + 4 H^+",
      logK = -32.85, estimate = "isocoulombic",
      source = BM76, quality = "medium",
    },
    {
      formula = "CdO(s,monteponite)", model = "cp",
      G = -228.66, H = -258.35, S = 54.8,
      uncertainty = { H = 0.40, S = 1.5 },  -- +-: from memory of Cox, Wagman and Medvedev 1989 (CODATA Key Values)
      cp = { a = 43.43, b = 0, c = 0 },
      source = "dfH and S from memory of " .. CODATA .. ", dfG derived here (dfH - T dfS, CODATA element entropies); Cp: " .. NBS,
      quality = "high",
      note = "cp is NBS Cp at 298.15 K taken as constant. NBS 1982: dfG -228.7, dfH -258.2, S 54.8.",
    },
    {
      formula = "Cd(OH)2(s)", model = "cp",
      G = -473.6, H = -560.7, S = 96,
      estimate = { Cp = "kopp" }, -- no published Cp recalled: Kopp-Neumann (docs/thermo.md)
      source = NBS, quality = "medium",
      note = "precipitated (beta) Cd(OH)2. No heat capacity recalled: Cp by Kopp-Neumann additivity (Kopp's atomic heats, an estimate). Gives log K(Cd(OH)2 + 2 H+ = Cd2+ + 2 H2O) = 13.73 with CODATA Cd2+ (Baes and Mesmer: 13.65, recalled).",
    },
  },
}
