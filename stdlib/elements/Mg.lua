-- stdlib/elements/Mg.lua: magnesium, Mg2+, its hydrolysis species, periclase and brucite.
-- Data set choice (see docs/data/other-metals.md): Mg2+ with the revised-HKF row of
-- Shock and Helgeson 1988 exactly as in phlox's reference hkf/hkf_parameters.csv (high
-- confidence there); MgO and brucite from the NBS tables (one table for the oxide /
-- hydroxide pair). The SH88 dfG of Mg2+ is 0.8 kJ/mol less negative than NBS and
-- 1.4 kJ/mol less negative than CODATA: brucite solubility and E(Mg2+/Mg) carry that.
local NBS = "from memory of [NBS82]"
local CODATA = "from memory of [CODATA89]"
local RH95 = "from memory of [RH95]"
local SH88 = "from memory of [SH88] (ion tables, table no. not recalled), as in phlox's reference hkf/hkf_parameters.csv (high confidence, passes the Cp/V check)"
local BM76 = "from memory of [BM76] (I = 0, 25 C)"
local N90 = "from memory of [N90]"

return {
  element = "Mg",
  title = "Magnesium",
  units = { energy = "kJ", entropy = "J" },
  species = {
    {
      formula = "Mg(s)", model = "cp",
      G = 0, H = 0, S = 32.67,
      uncertainty = { S = 0.10 },  -- +-: from memory of Cox, Wagman and Medvedev 1989 (CODATA Key Values)
      cp = { a = 24.89, b = 0, c = 0 },
      V = 13.99,
      source = "S: " .. CODATA .. " (NBS 32.68); Cp: " .. NBS,
      quality = "high",
      note = "cp is NBS Cp at 298.15 K taken as constant. V from the density 1.738 g/cm3.",
    },
    {
      formula = "Mg^2+", model = "hkf",
      units = { energy = "cal", entropy = "cal" },
      G = -108505, H = -111367, S = -33.00,
      hkf = { a1 = -0.8217, a2 = -8.599, a3 = 8.390, a4 = -2.390,
              c1 = 20.80, c2 = -5.892, omega = 1.5372 },
      source = SH88,
      quality = "high",
      note = "published Cp -5.34 cal/(mol K), V -21.55 cm3/mol. Other tables: NBS 1982 dfG -454.8 kJ/mol; CODATA 1989 dfG -455.375 (dfH -467.0, S -137).",
    },
    {
      formula = "MgOH^+", model = "logk",
      reaction = "Mg^2+ + H2O(l) = MgOH^+ + H^+",
      logK = -11.44, dH = 66.74,
      source = "logK: " .. BM76 .. "; dH: " .. N90 .. " (15.952 kcal/mol, with the same log K)",
      quality = "medium",
    },
    {
      formula = "Mg4(OH)4^4+", model = "logk",
      reaction = "4 Mg^2+ + 4 H2O(l) = Mg4(OH)4^4+ + 4 H^+",
      logK = -39.71, estimate = "isocoulombic",
      source = BM76, quality = "low",
      note = "significant only in concentrated Mg solutions close to brucite saturation.",
    },
    {
      formula = "MgO(s,periclase)", model = "cp",
      G = -569.43, H = -601.70, S = 26.94,
      cp = { a = 37.15, b = 0, c = 0 },
      V = 11.248,
      source = NBS .. "; V: " .. RH95,
      quality = "high",
      note = "cp is NBS Cp at 298.15 K taken as constant. CODATA 1989: dfH -601.60, S 26.95 (dfG -569.31).",
    },
    {
      formula = "Mg(OH)2(s,brucite)", model = "cp",
      G = -833.51, H = -924.54, S = 63.18,
      cp = { a = 77.03, b = 0, c = 0 },
      V = 24.63,
      source = NBS .. " (also phlox's reference gibbs_25C.csv); V: " .. RH95,
      quality = "high",
      note = "cp is NBS Cp at 298.15 K taken as constant. With the SH88 Mg2+ above, log Ksp (brucite = Mg2+ + 2 OH-) = -11.39; [SM] (via Harris) -11.15; see docs/data/other-metals.md.",
    },
  },
}
