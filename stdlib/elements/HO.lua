-- stdlib/elements/HO.lua: the built-in hydrogen and oxygen species.
-- H2O(l) itself is built into the C core (IAPWS-95 model, NBS 1982 dfG/dfH/S);
-- the electron e- is a convention (e- = H^+ - 1/2 H2(g)).  Everything else
-- about H and O is here.  Values carry their sources; "from memory of" means
-- recalled, not read.  Aqueous HKF rows are those of
-- tests/reference/hkf/hkf_parameters.csv with confidence high or medium
-- (checked there against their published Cp and V at 25 C).
--
-- Primary compilation: NBS 1982 for H2O(l), H2O(g), H2O2 and the gases; OH^- and the
-- dissolved gases carry the SH88/SHS89 HKF sets.
return {
  element = "HO",
  title = "Hydrogen and oxygen (built-in aqueous and gas species)",
  units = { energy = "kJ", entropy = "J" },
  species = {
    {
      formula = "H^+", model = "hkf",
      units = { energy = "cal", entropy = "cal" },
      G = 0, H = 0, S = 0,
      hkf = { a1 = 0, a2 = 0, a3 = 0, a4 = 0, c1 = 0, c2 = 0, omega = 0 },
      source = "[CONVENTION]: all properties of H+ are zero at every T and P",
      quality = "high",
    },
    {
      formula = "OH^-", model = "hkf",
      units = { energy = "cal", entropy = "cal" },
      G = -37595, H = -54977, S = -2.56,
      hkf = { a1 = 1.2527, a2 = 0.0738, a3 = 1.8423, a4 = -2.7821,
              c1 = 4.15, c2 = -10.346, omega = 1.7246 },
      source = "from memory of [SH88]",
      quality = "high",
      note = "reproduces its published Cp (-32.79 cal/mol/K) and V (-4.18 cm3/mol) at 25 C; pKw(T) with IAPWS-95 water within 0.03 of IAPWS R11-07 to 300 C",
    },
    {
      formula = "O2(aq)", model = "hkf",
      units = { energy = "cal", entropy = "cal" },
      G = 3954, H = -2900, S = 26.04,
      hkf = { a1 = 5.7889, a2 = 6.3536, a3 = 3.2528, a4 = -3.0417,
              c1 = 35.353, c2 = 8.3726, omega = -0.3943 },
      source = "from memory of [SHS89]; c2 reconstructed from the [SH88] c2-Cp correlation",
      quality = "medium",
      note = "c2 is derived, not recalled ([SH88] c2-Cp correlation); published Cp and V recalled weakly",
    },
    {
      formula = "H2(aq)", model = "hkf",
      units = { energy = "cal", entropy = "cal" },
      G = 4236, H = -1000, S = 13.8,
      hkf = { a1 = 5.1427, a2 = 4.7758, a3 = 3.8729, a4 = -2.9764,
              c1 = 27.6251, c2 = 5.093, omega = -0.209 },
      source = "from memory of [SHS89]",
      quality = "medium",
    },
    {
      formula = "H2O2(aq)", model = "logk",
      reaction = "O2(g) + H2(g) = H2O2(aq)",
      logK = 23.481, dH = -191.17,
      source = "derived here from [NBS82], from memory: dfG(H2O2,aq) = -134.03 kJ/mol, dfH = -191.17 kJ/mol (log K = -dfG/(RT ln 10)); van 't Hoff with constant dH",
      quality = "medium",
      note = "no HKF parameters recalled for H2O2(aq). NBS S = 143.9 J/(mol K) is consistent with dH and log K within 0.3 J/(mol K). E(O2/H2O2) = 0.695 V at 25 C as in the CRC series",
    },
    {
      formula = "O2(g)", model = "cp",
      G = 0, H = 0, S = 205.138,
      cp = { a = 29.957, b = 4.184e-3, c = -1.6736e5 },
      T_range = { 298.15, 3000 },
      source = "G, H, S: from memory of [NBS82]; cp: from memory of [K60]: 7.16 + 1.00e-3 T - 0.40e5/T^2 cal/(mol K), x 4.184",
      quality = "high",
    },
    {
      formula = "H2(g)", model = "cp",
      G = 0, H = 0, S = 130.684,
      cp = { a = 27.280, b = 3.2635e-3, c = 0.50208e5 },
      T_range = { 298.15, 3000 },
      source = "G, H, S: from memory of [NBS82]; cp: from memory of [K60]: 6.52 + 0.78e-3 T + 0.12e5/T^2 cal/(mol K), x 4.184",
      quality = "high",
    },
    {
      formula = "H2O(g)", model = "cp",
      G = -228.572, H = -241.818, S = 188.825,
      cp = { a = 30.543, b = 10.293e-3, c = 0 },
      T_range = { 298.15, 2750 },
      source = "G, H, S: from memory of [NBS82]; cp: from memory of [K60]: 7.30 + 2.46e-3 T cal/(mol K), x 4.184",
      quality = "high",
      note = "ideal gas at 1 bar; Cp(298.15) from the polynomial 33.61 vs NBS 33.58 J/(mol K)",
    },
  },
}
