-- stdlib/elements/K.lua: potassium as background electrolyte: K+, KOH(aq), the metal and
-- KOH(s). Ion pairs and salts with ligands are in the ligand files. K+ uses the
-- revised-HKF row of Shock and Helgeson 1988 exactly as in phlox's reference
-- hkf/hkf_parameters.csv; KOH(s) from the NBS tables. K2O is left out (values not
-- recalled consistently).
--
-- Primary compilation: CODATA 1989 for K^+ (through the SH88 row, whose 25 C dfG agrees
-- with CODATA within 0.05 kJ/mol); NBS 1982 for KOH(s).
local NBS = "from memory of [NBS82]"
local CODATA = "from memory of [CODATA89]"
local SH88 = "from memory of [SH88] (ion tables, table no. not recalled), as in phlox's reference hkf/hkf_parameters.csv (high confidence, passes the Cp/V check)"
local BM76 = "from memory of [BM76] (I = 0, 25 C)"

return {
  element = "K",
  title = "Potassium",
  units = { energy = "kJ", entropy = "J" },
  species = {
    {
      formula = "K(s)", model = "cp",
      G = 0, H = 0, S = 64.68,
      uncertainty = { S = 0.20 },  -- +-: from memory of Cox, Wagman and Medvedev 1989 (CODATA Key Values)
      cp = { a = 29.58, b = 0, c = 0 },
      T_range = { 273.15, 336.53 },
      source = "S: " .. CODATA .. " (NBS 64.18); Cp: " .. NBS,
      quality = "high",
      note = "reacts violently with water; listed for completeness of the element. cp is NBS Cp at 298.15 K taken as constant. Melts at 336.53 K.",
    },
    {
      formula = "K^+", model = "hkf",
      units = { energy = "cal", entropy = "cal" },
      G = -67510, H = -60270, S = 24.15,
      hkf = { a1 = 3.559, a2 = -1.473, a3 = 5.435, a4 = -2.712,
              c1 = 7.40, c2 = -1.791, omega = 0.1927 },
      source = SH88,
      quality = "high",
      note = "published Cp 1.98 cal/(mol K), V 9.06 cm3/mol. NBS 1982 dfG -283.27 kJ/mol (SH88: -282.462; CODATA 1989 about -282.5).",
    },
    {
      formula = "KOH(aq)", model = "logk",
      reaction = "K^+ + H2O(l) = KOH(aq) + H^+",
      logK = -14.46, estimate = "isocoulombic",
      source = BM76, quality = "low",
      note = "a weak ion pair; matters only in concentrated KOH or at high temperature, where this 25 C constant is not enough.",
    },
    {
      formula = "KOH(s)", model = "cp",
      G = -379.08, H = -424.764, S = 78.9,
      cp = { a = 64.9, b = 0, c = 0 },
      T_range = { 273.15, 516 },
      source = NBS, quality = "high",
      note = "cp is NBS Cp at 298.15 K taken as constant; the transition near 516 K and melting at 679 K are not represented.",
    },
  },
}
