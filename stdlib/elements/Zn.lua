-- stdlib/elements/Zn.lua: zinc, its ion, hydrolysis species, oxide and hydroxide.
--
-- Primary compilation: CODATA 1989 (Zn^2+, ZnO); hydrolysis and epsilon-Zn(OH)2 from
-- Baes and Mesmer 1976, written against Zn^2+.
--
-- Data choice (see docs/data/transition-metals.md): Zn^2+ and ZnO from the CODATA key
-- values (Cox, Wagman and Medvedev 1989), which supersede the NBS-1982 ZnO; hydrolysis
-- from Baes and Mesmer 1976. Every number below was recalled, not read.

local NBS = "from memory of [NBS82]"
local CODATA = "from memory of [CODATA89]: dfH and S; dfG as dfH - T*dfS (reproduces the tabulated dfG)"
local KELLEY = "cp from memory of [K60], converted from cal with 4.184"
local BM = "from memory of [BM76] (I = 0, 25 C)"

return {
  element = "Zn",
  title = "Zinc",
  units = { energy = "kJ", entropy = "J" },
  species = {
    {
      formula = "Zn(s)", model = "cp",
      G = 0, H = 0, S = 41.63,
      cp = { a = 22.38, b = 10.04e-3, c = 0 },
      T_range = { 298.15, 692.68 },
      source = NBS .. " (S); " .. KELLEY .. " (5.35 + 2.40e-3 T cal/(mol K))",
      quality = "high",
      note = "Polynomial gives Cp(298.15 K) = 25.37 J/(mol K) against NBS 25.40. Melts at 692.68 K.",
    },
    {
      formula = "Zn^2+", model = "hkf",
      G = -147.203, H = -153.39, S = -109.8,
      uncertainty = { H = 0.20, S = 0.5 },  -- +-: from memory of Cox, Wagman and Medvedev 1989 (CODATA Key Values)
      estimate = { Cp = 46 },
      source = CODATA .. "; Cp " .. NBS,
      quality = "high",
      note = "HKF parameters not recalled as a set (only a1, a2); estimated by the loader from Cp. V not recalled: volume terms zero (poor at high pressure). NBS-1982 gives dfG -147.06, dfH -153.89, S -112.1.",
    },
    -- hydrolysis -------------------------------------------------------------
    {
      formula = "ZnOH^+", model = "logk",
      reaction = "Zn^2+ + H2O(l) = ZnOH^+ + H^+",
      logK = -8.96, dH = 56.07,
      source = BM .. "; dH 13.4 kcal/mol from memory of [N90]",
      quality = "medium",
    },
    {
      formula = "Zn(OH)2(aq)", model = "logk",
      reaction = "Zn^2+ + 2 H2O(l) = Zn(OH)2(aq) + 2 H^+",
      logK = -16.9, estimate = "isocoulombic",
      source = BM, quality = "medium",
    },
    {
      formula = "Zn(OH)3^-", model = "logk",
      reaction = "Zn^2+ + 3 H2O(l) = Zn(OH)3^- + 3 H^+",
      logK = -28.4, estimate = "isocoulombic",
      source = BM, quality = "medium",
      note = "The HZnO2^- of older diagrams (same species less one H2O).",
    },
    {
      formula = "Zn(OH)4^2-", model = "logk",
      reaction = "Zn^2+ + 4 H2O(l) = Zn(OH)4^2- + 4 H^+",
      logK = -41.2, estimate = "isocoulombic",
      source = BM, quality = "medium",
      note = "The ZnO2^2- of older diagrams. With the Zn2+ above it gives E0(Zn(OH)4^2-/Zn) = -1.200 V (OpenStax/CRC -1.199).",
    },
    {
      formula = "Zn2OH^3+", model = "logk",
      reaction = "2 Zn^2+ + H2O(l) = Zn2OH^3+ + H^+",
      logK = -9.0, estimate = "isocoulombic",
      source = BM, quality = "low",
    },
    -- oxide and hydroxide ----------------------------------------------------
    {
      formula = "ZnO(s,zincite)", model = "cp",
      G = -320.479, H = -350.46, S = 43.65,
      uncertainty = { H = 0.27, S = 0.40 },  -- +-: from memory of Cox, Wagman and Medvedev 1989 (CODATA Key Values)
      cp = { a = 48.99, b = 5.10e-3, c = -9.12e5 },
      T_range = { 298.15, 1600 },
      source = CODATA .. "; " .. KELLEY .. " (11.71 + 1.22e-3 T - 2.18e5/T^2 cal/(mol K))",
      quality = "high",
      note = "Polynomial gives Cp(298.15 K) = 40.25 J/(mol K), equal to NBS 40.25. NBS-1982 dfG -318.30 is superseded.",
    },
    {
      formula = "Zn(OH)2(s,epsilon)", model = "logk",
      reaction = "Zn^2+ + 2 H2O(l) = Zn(OH)2(s,epsilon) + 2 H^+",
      logK = -11.38, estimate = "isocoulombic",
      source = BM .. " (log *Ks10 of epsilon-Zn(OH)2 = 11.38)",
      quality = "low",
      note = "Slightly more soluble than ZnO (11.19 from the CODATA values above), as expected.",
    },
  },
}
