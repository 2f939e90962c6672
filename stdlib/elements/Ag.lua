-- stdlib/elements/Ag.lua: silver, Ag+, its hydroxo complexes and Ag2O.
-- Data set choice (see docs/data/other-metals.md): Ag+ from the CODATA key values
-- (Cox, Wagman and Medvedev 1989); Ag2O from the NBS tables (no CODATA value; the two
-- tables agree on Ag+ to 0.01 kJ/mol). Hydrolysis from Baes and Mesmer 1976.
-- Ag(II) and Ag(III) species (Ag2+, AgO, Ag2O3) are left out: values not recalled.
local NBS = "from memory of [NBS82]"
local CODATA = "[CODATA89]"
local BM76 = "from memory of [BM76] (I = 0, 25 C)"

return {
  element = "Ag",
  title = "Silver",
  units = { energy = "kJ", entropy = "J" },
  species = {
    {
      formula = "Ag(s)", model = "cp",
      G = 0, H = 0, S = 42.55,
      uncertainty = { S = 0.20 },  -- +-: from memory of Cox, Wagman and Medvedev 1989 (CODATA Key Values)
      cp = { a = 25.35, b = 0, c = 0 },
      V = 10.27,
      source = "S: from memory of " .. CODATA .. " (NBS 42.55); Cp: " .. NBS,
      quality = "high",
      note = "cp is NBS Cp at 298.15 K (25.351) taken as constant. V from the density 10.50 g/cm3.",
    },
    {
      formula = "Ag^+", model = "hkf",
      G = 77.096, H = 105.79, S = 73.45,
      uncertainty = { H = 0.08, S = 0.40 },  -- +-: from memory of Cox, Wagman and Medvedev 1989 (CODATA Key Values)
      estimate = { Cp = 21.8, V = -0.8 },
      source = "G, H, S: " .. CODATA .. " (dfH and S read in a CODATA-table reprint; dfG = dfH - T dfS, as in phlox's reference gibbs_25C.csv). Cp: " .. NBS .. ". V: from memory of [SH88] (weak)",
      quality = "medium",
      note = "G/H/S high; HKF parameters estimated by the loader from Cp and V ([SH88] correlations). NBS 1982: dfG 77.107, dfH 105.579, S 72.68.",
    },
    {
      formula = "AgOH(aq)", model = "logk",
      reaction = "Ag^+ + H2O(l) = AgOH(aq) + H^+",
      logK = -12.0, estimate = "isocoulombic",
      source = BM76, quality = "medium",
    },
    {
      formula = "Ag(OH)2^-", model = "logk",
      reaction = "Ag^+ + 2 H2O(l) = Ag(OH)2^- + 2 H^+",
      logK = -24.0, estimate = "isocoulombic",
      source = BM76, quality = "medium",
    },
    {
      formula = "Ag2O(s)", model = "cp",
      G = -11.20, H = -31.05, S = 121.3,
      cp = { a = 65.86, b = 0, c = 0 },
      T_range = { 273.15, 450 },
      source = NBS, quality = "high",
      note = "cp is NBS Cp at 298.15 K taken as constant. Ag2O decomposes to Ag + O2 above about 460 K in air. With CODATA Ag+ it gives log K(0.5 Ag2O + H+ = Ag+ + 0.5 H2O) = 6.28 (Baes and Mesmer: 6.29, recalled).",
    },
  },
}
