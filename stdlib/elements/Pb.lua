-- stdlib/elements/Pb.lua: lead, Pb2+, its hydrolysis species and the lead oxides.
-- Data set choice (see docs/data/other-metals.md): one table for the whole Pb-O-H
-- system, the NBS tables (Wagman et al. 1982), so that oxide solubilities and the
-- PbO2/Pb2+ couple stay consistent; hydrolysis constants from Baes and Mesmer 1976.
-- Pb(IV) appears only in the solids PbO2 and Pb3O4 (no Pb4+ aqueous ion).
-- No complete HKF set is recalled for Pb2+, so it is defined by its conventional
-- formation reaction (log K = -dfG/(RT ln 10), dH = dfH).
--
-- Primary compilation: NBS 1982 (ions and solids); hydrolysis from Baes and Mesmer 1976.
local NBS = "from memory of [NBS82]"
local CODATA = "from memory of [CODATA89]"
local K60 = "from memory of [K60]"
local BM76 = "from memory of [BM76] (I = 0, 25 C)"

return {
  element = "Pb",
  title = "Lead",
  units = { energy = "kJ", entropy = "J" },
  species = {
    {
      formula = "Pb(s)", model = "cp",
      G = 0, H = 0, S = 64.80,
      cp = { a = 23.56, b = 9.75e-3, c = 0 },
      V = 18.27,
      T_range = { 273.15, 600.61 },
      source = "S: " .. CODATA .. " (NBS 64.81); cp: " .. K60,
      quality = "high",
      note = "cp = Kelley's 5.63 + 2.33e-3 T cal/(mol K) times 4.184; gives 26.46 at 298.15 K (NBS Cp 26.44). Melts at 600.61 K. V from the density 11.34 g/cm3.",
    },
    {
      formula = "Pb^2+", model = "logk",
      reaction = "Pb(s) + 2 H^+ = Pb^2+ + H2(g)",
      logK = 4.280, dH = -1.7,
      -- Cp: the formation reaction takes the dCp(T) of the same reaction of Ca^2+, whose
      -- HKF set is published (isocoulombic: the difference reaction keeps dCp = 0; model
      -- substance, Lindsay 1980); Ca^2+ is the model by the rule of docs/thermo.md:
      -- S 10.5 J/(mol K) is closer to Ca^2+ (-56.5) than to Mg^2+ (-137.0). Validation: docs/data-checks.md, "Single-ion heat capacities".
      estimate = { dCp = "isocoulombic", model = "Ca(s) + 2 H^+ = Ca^2+ + H2(g)" },
      source = "derived here from " .. NBS .. ": dfG -24.43, dfH -1.7 kJ/mol, S 10.5 J/(mol K)",
      quality = "high",
      note = "conventional formation reaction, log K = 24.43/5.70801. Heat capacity: the isocoulombic estimate above (dCp of the Ca^2+ formation reaction; before it, van 't Hoff with constant dH took Cp(Pb2+) = Cp(Pb) - Cp(H2)). CODATA 1989 gives dfG -24.238, dfH 0.92, S 18.5 (0.03 log units in log K).",
    },
    {
      formula = "PbOH^+", model = "logk",
      reaction = "Pb^2+ + H2O(l) = PbOH^+ + H^+",
      logK = -7.71, estimate = "isocoulombic",
      source = BM76, quality = "medium",
    },
    {
      formula = "Pb(OH)2(aq)", model = "logk",
      reaction = "Pb^2+ + 2 H2O(l) = Pb(OH)2(aq) + 2 H^+",
      logK = -17.12, estimate = "isocoulombic",
      source = BM76, quality = "medium",
    },
    {
      formula = "Pb(OH)3^-", model = "logk",
      reaction = "Pb^2+ + 3 H2O(l) = Pb(OH)3^- + 3 H^+",
      logK = -28.06, estimate = "isocoulombic",
      source = BM76, quality = "medium",
      note = "also written HPbO2^- in older diagrams (same species, minus one H2O).",
    },
    {
      formula = "Pb2OH^3+", model = "logk",
      reaction = "2 Pb^2+ + H2O(l) = Pb2OH^3+ + H^+",
      logK = -6.36, estimate = "isocoulombic",
      source = BM76, quality = "medium",
    },
    {
      formula = "Pb3(OH)4^2+", model = "logk",
      reaction = "3 Pb^2+ + 4 H2O(l) = Pb3(OH)4^2+ + 4 H^+",
      logK = -23.88, estimate = "isocoulombic",
      source = BM76, quality = "medium",
    },
    {
      formula = "Pb4(OH)4^4+", model = "logk",
      reaction = "4 Pb^2+ + 4 H2O(l) = Pb4(OH)4^4+ + 4 H^+",
      logK = -20.88, estimate = "isocoulombic",
      source = BM76, quality = "medium",
    },
    {
      formula = "Pb6(OH)8^4+", model = "logk",
      reaction = "6 Pb^2+ + 8 H2O(l) = Pb6(OH)8^4+ + 8 H^+",
      logK = -43.61, estimate = "isocoulombic",
      source = BM76, quality = "medium",
    },
    {
      formula = "PbO(s,litharge)", model = "cp",
      G = -188.93, H = -218.99, S = 66.5,
      cp = { a = 45.81, b = 0, c = 0 },
      source = NBS, quality = "high",
      note = "red, tetragonal PbO. cp is NBS Cp at 298.15 K taken as constant (b = c = 0).",
    },
    {
      formula = "PbO(s,massicot)", model = "cp",
      G = -187.89, H = -217.32, S = 68.70,
      cp = { a = 45.77, b = 0, c = 0 },
      source = NBS, quality = "high",
      note = "yellow, orthorhombic PbO, metastable at 25 C (1.04 kJ/mol above litharge). cp is NBS Cp at 298.15 K taken as constant.",
    },
    {
      formula = "PbO2(s)", model = "cp",
      G = -217.33, H = -277.4, S = 68.6,
      cp = { a = 64.64, b = 0, c = 0 },
      source = NBS .. "; dfG/dfH/S confirmed in a CRC or OpenStax reprint (read), see phlox's reference gibbs_25C.csv",
      quality = "high",
      note = "beta-PbO2 (plattnerite), the Pb(IV) oxide of the lead-acid battery. cp is NBS Cp at 298.15 K taken as constant.",
    },
    {
      formula = "Pb3O4(s,minium)", model = "cp",
      G = -601.2, H = -718.4, S = 211.3,
      cp = { a = 146.9, b = 0, c = 0 },
      source = NBS, quality = "medium",
      note = "red lead, Pb(II)2Pb(IV)O4. cp is NBS Cp at 298.15 K taken as constant.",
    },
  },
}
