-- stdlib/elements/Mn.lua: manganese, its ions, oxyanions, hydrolysis species, oxides.
--
-- Data choice (see docs/data/transition-metals.md): ions, oxyanions and solids from the
-- NBS tables (Wagman et al. 1982); hydrolysis from Baes and Mesmer 1976. Mn^3+ is
-- defined by the CRC Mn3+/Mn2+ potential; its enthalpy and entropy come from the
-- isocoulombic estimate against the Co3+/Co2+ couple (flagged estimated). Mn^2+ and
-- MnO4^- have an NBS Cp and use the HKF estimation path; MnO4^2- has none and is
-- defined by its formation reaction. Every number below was recalled, not read.

local NBS = "from memory of [NBS82]"
local KELLEY = "cp from memory of [K60], converted from cal with 4.184"
local BM = "from memory of [BM76] (I = 0, 25 C)"

return {
  element = "Mn",
  title = "Manganese",
  units = { energy = "kJ", entropy = "J" },
  species = {
    {
      formula = "Mn(s)", model = "cp",
      G = 0, H = 0, S = 32.01,
      cp = { a = 23.85, b = 14.14e-3, c = -1.569e5 },
      T_range = { 298.15, 990 },
      source = NBS .. " (S); " .. KELLEY .. " (alpha-Mn: 5.70 + 3.38e-3 T - 0.375e5/T^2 cal/(mol K))",
      quality = "high",
      note = "Polynomial gives Cp(298.15 K) = 26.30 J/(mol K) against NBS 26.32.",
    },
    {
      formula = "Mn^2+", model = "hkf",
      G = -228.1, H = -220.75, S = -73.6,
      estimate = { Cp = 50 },
      source = NBS .. " (dfG, dfH, S and Cp)",
      quality = "high",
      note = "HKF parameters not recalled; estimated by the loader from Cp. V not recalled: volume terms zero (poor at high pressure).",
    },
    {
      formula = "Mn^3+", model = "logk",
      reaction = "2 Mn^2+ + 2 H^+ = 2 Mn^3+ + H2(g)",
      logK = -52.113,
      estimate = { method = "isocoulombic", model = "2 Co^2+ + 2 H^+ = 2 Co^3+ + H2(g)" },
      source = "derived here from E0(Mn3+/Mn2+) = 1.5415 V, from memory of [CRC] (log K = -2 F E0/(RT ln10)); dH, S and Cp by the isocoulombic estimate (Gu, Gammons and Bloom 1994) with the Co2+/Co3+ couple of Co.lua as model reaction",
      quality = "low",
      note = "Disproportionates to Mn2+ and MnO2 except in strong acid. dfG = -79.37 kJ/mol. No dfH or S of Mn3+ is recalled from any table, so the temperature function is the isocoulombic estimate with a model reaction of the same charge type (Mn2+ + Co3+ = Mn3+ + Co2+ taken with dS = dCp = 0): S(Mn3+) = S(Mn2+) - 193.5 = -267.1 J/(mol K) and dfH = -110.22 kJ/mol at 25 C (closes dfG = dfH - T dfS with S(Mn,s) 32.01 and S(H2,g) 130.68 to the 0.12 kJ/mol of the NBS Mn2+ itself). Before the model the couple kept dS = 0 (E fixed at 1.5415 V at every temperature); now it rises by 1.33 mV/K (1.641, 1.774 and 1.907 V at 100, 200 and 300 C), as the Fe3+/Fe2+ couple does (1.10 mV/K with the Shock et al. 1997 ions of Fe.lua).",
    },
    {
      formula = "MnO4^-", model = "hkf",
      G = -447.2, H = -541.4, S = 191.2,
      estimate = { Cp = -82.0 },
      source = NBS .. " (dfG, dfH, S and Cp)",
      quality = "high",
      note = "HKF parameters not recalled; estimated by the loader from Cp. V not recalled.",
    },
    {
      formula = "MnO4^2-", model = "logk",
      reaction = "Mn(s) + 4 H2O(l) = MnO4^2- + 2 H^+ + 3 H2(g)",
      logK = -78.454, dH = 490.32,
      -- Cp: the formation reaction takes the dCp(T) of the same reaction of SO4^2-, whose
      -- HKF set is published (isocoulombic: the difference reaction keeps dCp = 0; model
      -- substance, Lindsay 1980); SO4^2- is the model by the rule of docs/thermo.md:
      -- S 59 J/(mol K) is closer to SO4^2- (18.8) than to CO3^2- (-49.3). Validation: docs/data-checks.md, "Single-ion heat capacities".
      estimate = { dCp = "isocoulombic", model = "S(s,rhombic) + 4 H2O(l) = SO4^2- + 2 H^+ + 3 H2(g)" },
      source = "derived here from " .. NBS .. ": MnO4^2- dfG -500.7, dfH -653 kJ/mol, S 59 J/(mol K)",
      quality = "medium",
      note = "No Cp recalled; defined by its formation reaction, with the isocoulombic heat capacity above (dCp of the SO4^2- formation reaction). E0(MnO4-/MnO4^2-) = 0.554 V (CRC 0.558).",
    },
    -- Mn(II) hydrolysis ------------------------------------------------------
    {
      formula = "MnOH^+", model = "logk",
      reaction = "Mn^2+ + H2O(l) = MnOH^+ + H^+",
      logK = -10.59, dH = 60.25,
      source = BM .. "; dH 14.4 kcal/mol from memory of [N90]",
      quality = "medium",
    },
    {
      formula = "Mn(OH)2(aq)", model = "logk",
      reaction = "Mn^2+ + 2 H2O(l) = Mn(OH)2(aq) + 2 H^+",
      logK = -22.2, estimate = "isocoulombic",
      source = BM, quality = "low",
    },
    {
      formula = "Mn(OH)3^-", model = "logk",
      reaction = "Mn^2+ + 3 H2O(l) = Mn(OH)3^- + 3 H^+",
      logK = -34.8, estimate = "isocoulombic",
      source = BM, quality = "low",
      note = "The HMnO2^- of older diagrams (same species less one H2O).",
    },
    {
      formula = "Mn(OH)4^2-", model = "logk",
      reaction = "Mn^2+ + 4 H2O(l) = Mn(OH)4^2- + 4 H^+",
      logK = -48.3, estimate = "isocoulombic",
      source = BM, quality = "low",
    },
    {
      formula = "Mn2OH^3+", model = "logk",
      reaction = "2 Mn^2+ + H2O(l) = Mn2OH^3+ + H^+",
      logK = -10.56, estimate = "isocoulombic",
      source = BM, quality = "low",
    },
    {
      formula = "Mn2(OH)3^+", model = "logk",
      reaction = "2 Mn^2+ + 3 H2O(l) = Mn2(OH)3^+ + 3 H^+",
      logK = -23.9, estimate = "isocoulombic",
      source = BM, quality = "low",
    },
    -- oxides and hydroxide ---------------------------------------------------
    {
      formula = "MnO(s,manganosite)", model = "cp",
      G = -362.90, H = -385.22, S = 59.71,
      cp = { a = 46.48, b = 8.117e-3, c = -3.682e5 },
      T_range = { 298.15, 1800 },
      source = NBS .. "; " .. KELLEY .. " (11.11 + 1.94e-3 T - 0.88e5/T^2 cal/(mol K))",
      quality = "high",
      note = "Polynomial gives Cp(298.15 K) = 44.76 J/(mol K) against NBS 45.44.",
    },
    {
      formula = "Mn3O4(s,hausmannite)", model = "cp",
      G = -1283.2, H = -1387.8, S = 155.6,
      cp = { a = 139.66, b = 0, c = 0 },
      source = NBS,
      quality = "medium",
      note = "OpenStax prints dfH -1378.83. cp: NBS Cp(298.15 K) only (a = Cp, b = c = 0).",
    },
    {
      formula = "Mn2O3(s,bixbyite)", model = "cp",
      G = -881.1, H = -959.0, S = 110.5,
      cp = { a = 107.65, b = 0, c = 0 },
      source = NBS,
      quality = "medium",
      note = "cp: NBS Cp(298.15 K) only (a = Cp, b = c = 0).",
    },
    {
      formula = "MnO2(s,pyrolusite)", model = "cp",
      G = -465.14, H = -520.03, S = 53.05,
      cp = { a = 69.45, b = 10.21e-3, c = -16.23e5 },
      T_range = { 298.15, 780 },
      source = NBS .. "; " .. KELLEY .. " (16.60 + 2.44e-3 T - 3.88e5/T^2 cal/(mol K))",
      quality = "high",
      note = "Polynomial gives Cp(298.15 K) = 54.24 J/(mol K) against NBS 54.14.",
    },
    {
      formula = "Mn(OH)2(am)", model = "cp",
      G = -615.0, H = -695.4, S = 99.2,
      estimate = { Cp = "kopp" }, -- no published Cp recalled: Kopp-Neumann (docs/thermo.md)
      source = NBS,
      quality = "medium",
      note = "Amorphous precipitate as listed in the source (not crystalline pyrochroite). Cp not recalled: Kopp-Neumann estimate (Kopp's atomic heats).",
    },
    { -- issue 13
      formula = "Mn(OH)2(s,pyrochroite)", model = "logk",
      reaction = "Mn(OH)2(s,pyrochroite) + 2 H^+ = Mn^2+ + 2 H2O(l)",
      logK = 15.2, estimate = "isocoulombic",
      source = BM,
      quality = "medium",
      note = "Crystalline Mn(OH)2. The NBS amorphous solid above gives 15.30 with the file's Mn^2+: the two differ by less than the scatter of the measurements. No dH recalled: temperature by the isocoulombic estimate.",
    },
  },
}
