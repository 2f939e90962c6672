-- stdlib/elements/Mg.lua: magnesium, Mg2+, its hydrolysis species, periclase and brucite.
-- Primary compilation: CODATA Key Values (Cox, Wagman and Medvedev 1989) for Mg(cr), Mg2+
-- and MgO; the NBS tables (Wagman et al. 1982) for brucite, which CODATA does not cover.
-- Mg2+ takes the CODATA dfG/dfH/S with the revised-HKF parameters (a1..a4, c1, c2, omega)
-- of Shock and Helgeson 1988 for its temperature dependence (issue 13: it was the complete
-- SH88 row, whose dfG is 1.4 kJ/mol less negative than CODATA; brucite solubility and
-- epsomite were 0.16-0.24 log units off the measured values). CODATA Mg2+ with NBS brucite
-- reproduces the measured brucite solubility (log Ksp -11.15); see docs/data/other-metals.md.
-- Hydrolysis: MgOH^+ from the measurement of Palmer and Wesolowski 1997 (log K, dH and
-- dCp 0 to 250 C, abstract read); Mg4(OH)4^4+ from Baes and Mesmer 1976 (no other source),
-- isocoulombic in temperature.
local NBS = "from memory of [NBS82]"
local CODATA = "from memory of [CODATA89]"
local RH95 = "from memory of [RH95]"
local SH88 = "from memory of [SH88] (ion tables, table no. not recalled), as in phlox's reference hkf/hkf_parameters.csv (high confidence, passes the Cp/V check)"
local BM76 = "from memory of [BM76] (I = 0, 25 C)"

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
      G = -455.375, H = -467.0, S = -137.0,
      uncertainty = { H = 0.6, S = 4 },  -- +-: from memory of Cox, Wagman and Medvedev 1989 (CODATA Key Values)
      hkf = { a1 = -0.8217, a2 = -8.599, a3 = 8.390, a4 = -2.390,
              c1 = 20.80, c2 = -5.892, omega = 1.5372 },
      source = "G, H, S: " .. CODATA .. " (dfG = dfH - T dfS with the CODATA S of Mg(cr) and H2(g)). HKF parameters: " .. SH88,
      quality = "high",
      note = "issue 13: G/H/S were SH88's -108505 cal/mol, -111367 cal/mol, -33.00 cal/(mol K) (-453.985 kJ/mol, -465.96 kJ/mol, -138.07 J/(mol K)); NBS 1982 dfG -454.8 kJ/mol. The SH88 a1..omega were regressed with SH88's S; the 1.07 J/(mol K) difference in S moves G(300 C) by 0.3 kJ/mol (0.03 in log K). Published Cp -5.34 cal/(mol K), V -21.55 cm3/mol.",
    },
    {
      formula = "MgOH^+", model = "logk",
      reaction = "Mg^2+ + H2O(l) = MgOH^+ + H^+",
      logK = -11.68, dH = 70.1, dCp = 0,
      uncertainty = { logK = 0.05 },  -- +-: [PW97] (abstract read); dH +- 1.2 kJ/mol
      source = "[PW97] (abstract read): measured potentiometrically at 1-250 C, extrapolated to I = 0; log K -11.68 +- 0.05, dH 70.1 +- 1.2 kJ/mol, dS 11 +- 4 J/(mol K), dCp 0 at 25 C (log K linear in 1/T over 1-250 C), exactly as printed",
      quality = "high",
      note = "s5-mg (issues 12, 13): measured temperature function replaces [BM76] -11.44 (recalled) with the dH of [N90] 66.74 kJ/mol (recalled): -0.24 at 25 C, -0.12 at 100 C, within 0.03 at 200-250 C. 250-300 C is the paper's own linear fit carried 50 K beyond its range (its density model to 550 C is not in the abstract). Only 4 % of the Mg could be hydrolysed before brucite precipitated: MgOH^+ is minor wherever brucite is stable; at pH 10 and 25 C it holds 2.0 % of 1 umol/kg Mg(II) (3.4 % with the former constant; Davies, phlox).",
    },
    {
      formula = "Mg4(OH)4^4+", model = "logk",
      reaction = "4 Mg^2+ + 4 H2O(l) = Mg4(OH)4^4+ + 4 H^+",
      logK = -39.71, estimate = "isocoulombic",
      source = BM76, quality = "low",
      note = "significant only in concentrated Mg solutions close to brucite saturation. The only Mg species kept from [BM76]: no second source and no measured temperature data; its temperature basis is the isocoulombic estimate (one term, docs/thermo.md). [PW97] measured MgOH^+ alone (the first 4 % of hydrolysis, dilute Mg), so the tetramer constant, which rests on concentrated Mg solutions, is not tied to the MgOH^+ constant it now sits beside (reasoning here).",
    },
    {
      formula = "MgO(s,periclase)", model = "cp",
      G = -569.31, H = -601.60, S = 26.95,
      uncertainty = { H = 0.3, S = 0.15 },  -- +-: from memory of Cox, Wagman and Medvedev 1989 (CODATA Key Values)
      cp = { a = 37.15, b = 0, c = 0 },
      V = 11.248,
      source = "G, H, S: " .. CODATA .. " (dfG = dfH - T dfS); Cp: " .. NBS .. "; V: " .. RH95,
      quality = "high",
      note = "cp is NBS Cp at 298.15 K taken as constant. NBS 1982: dfG -569.43, dfH -601.70, S 26.94 (issue 13: the file used NBS; CODATA is now the primary compilation).",
    },
    {
      formula = "Mg(OH)2(s,brucite)", model = "cp",
      G = -833.51, H = -924.54, S = 63.18,
      cp = { a = 77.03, b = 0, c = 0 },
      V = 24.63,
      source = NBS .. " (also phlox's reference gibbs_25C.csv); V: " .. RH95,
      quality = "high",
      note = "cp is NBS Cp at 298.15 K taken as constant. CODATA 1989 has no brucite. With the CODATA Mg2+ above, log Ksp (brucite = Mg2+ + 2 OH-) = -11.13 ([SM] via Harris: -11.15); with the SH88 Mg2+ it was -11.39 (see docs/data/other-metals.md).",
    },
  },
}
