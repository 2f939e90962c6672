-- stdlib/elements/Na.lua: sodium as background electrolyte: Na+, NaOH(aq), the metal,
-- Na2O and NaOH(s). Ion pairs and salts with ligands (NaCl(aq), NaSO4^-, ...) are in the
-- ligand files. Na+ uses the revised-HKF row of Shock and Helgeson 1988 exactly as in
-- phlox's reference hkf/hkf_parameters.csv; the solids come from the NBS tables.
--
-- Primary compilation: CODATA 1989 for Na^+ (through the SH88 row, whose 25 C dfG agrees
-- with CODATA within 0.05 kJ/mol); NBS 1982 for the solids.
local NBS = "from memory of [NBS82]"
local CODATA = "from memory of [CODATA89]"
local SH88 = "from memory of [SH88] (ion tables, table no. not recalled), as in phlox's reference hkf/hkf_parameters.csv (high confidence, passes the Cp/V check)"
local BM76 = "from memory of [BM76] (I = 0, 25 C)"

return {
  element = "Na",
  title = "Sodium",
  units = { energy = "kJ", entropy = "J" },
  species = {
    {
      formula = "Na(s)", model = "cp",
      G = 0, H = 0, S = 51.30,
      cp = { a = 28.24, b = 0, c = 0 },
      V = 23.75,
      T_range = { 273.15, 370.87 },
      source = "S: " .. CODATA .. " (NBS 51.21); Cp: " .. NBS,
      quality = "high",
      note = "reacts violently with water; listed for completeness of the element. cp is NBS Cp at 298.15 K taken as constant. Melts at 370.87 K. V from the density 0.968 g/cm3.",
    },
    {
      formula = "Na^+", model = "hkf",
      units = { energy = "cal", entropy = "cal" },
      G = -62591, H = -57433, S = 13.96,
      hkf = { a1 = 1.839, a2 = -2.285, a3 = 3.256, a4 = -2.726,
              c1 = 18.18, c2 = -2.981, omega = 0.3306 },
      source = SH88,
      quality = "high",
      note = "published Cp 9.06 cal/(mol K), V -1.11 cm3/mol. NBS 1982 dfG -261.905 kJ/mol (SH88: -261.881).",
    },
    {
      formula = "NaOH(aq)", model = "logk",
      reaction = "Na^+ + H2O(l) = NaOH(aq) + H^+",
      logK = -14.18, estimate = "isocoulombic",
      source = BM76, quality = "low",
      note = "a weak ion pair; matters only in concentrated NaOH or at high temperature, where this 25 C constant is not enough.",
    },
    {
      formula = "Na2O(s)", model = "cp",
      G = -375.46, H = -414.22, S = 75.06,
      cp = { a = 69.12, b = 0, c = 0 },
      source = NBS, quality = "high",
      note = "cp is NBS Cp at 298.15 K taken as constant. Hydrates violently to NaOH in water.",
    },
    {
      formula = "NaOH(s)", model = "cp",
      G = -379.494, H = -425.609, S = 64.455,
      cp = { a = 59.54, b = 0, c = 0 },
      T_range = { 273.15, 566 },
      source = NBS, quality = "high",
      note = "cp is NBS Cp at 298.15 K taken as constant; a solid-solid transition near 566 K and melting at 596 K are not represented.",
    },
  },
}
