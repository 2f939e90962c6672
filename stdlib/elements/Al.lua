-- stdlib/elements/Al.lua: aluminium, its ion, hydrolysis species, oxide and hydroxides.
-- Data set choice (see docs/data/other-metals.md): the solids are calorimetric (corundum from
-- the CODATA key values, Cox, Wagman and Medvedev 1989; gibbsite and boehmite from Robie and
-- Hemingway 1995); Al3+ is the value Palmer and Wesolowski 1992 recommend from their measured
-- gibbsite solubility with that gibbsite; Al(OH)4- is the measured gibbsite solubility in
-- base (Wesolowski 1992); the other hydrolysis constants are the critical selection of Brown
-- and Ekberg 2016 (I = 0, read), written against Al3+. Values are recalled, not read, unless
-- the source says "(read)".
--
-- Primary compilation: the measured gibbsite solubility set of Oak Ridge (Palmer and
-- Wesolowski 1992, acid; Wesolowski 1992, base) on Robie and Hemingway 1995 gibbsite.
-- Issue 13: CODATA Al3+ (-491.5 kJ/mol) with this gibbsite gave log *Ks 8.41 against the
-- measured 7.74 and an aluminate 0.5 too stable at 25-100 C. Moving Al3+ (dfG -487.7, inside
-- the CODATA uncertainty, which rests on S = -325 +- 10 J/(mol K)) rather than gibbsite keeps
-- the calorimetric solids (third-law S, gibbsite/corundum/boehmite relations) and the
-- measured dH of dissolution; it is what the measurers themselves recommend.
local NBS = "from memory of [NBS82]"
local CODATA = "[CODATA89]"
local RH95 = "from memory of [RH95]"
local K60 = "from memory of [K60]"
local BM76 = "from memory of [BM76] (I = 0, 25 C)"
local N90 = "from memory of [N90]"
local BE16 = "[BE16] (I = 0, 25 C; read)"
local PW92 = "[PW92] (abstract read)"
local WES92 = "[WES92] (abstract read)"

return {
  element = "Al",
  title = "Aluminium",
  units = { energy = "kJ", entropy = "J" },
  species = {
    {
      formula = "Al(s)", model = "cp",
      G = 0, H = 0, S = 28.30,
      cp = { a = 20.67, b = 12.38e-3, c = 0 },
      V = 9.999,
      T_range = { 273.15, 933.47 },
      source = "S: from memory of " .. CODATA .. "; cp: " .. K60,
      quality = "high",
      note = "cp = Kelley's 4.94 + 2.96e-3 T cal/(mol K) times 4.184; gives 24.36 at 298.15 K (NBS Cp 24.35). V from the density 2.699 g/cm3.",
    },
    {
      formula = "Al^3+", model = "hkf",
      G = -487.7, H = -540.9, S = -346.15,
      uncertainty = { G = 1.5 },  -- +-: [PW92] (abstract read)
      hkf = { a1 = -3.3802, a2 = -17.0104, a3 = 14.5797, a4 = -2.0758,
              c1 = 10.7, c2 = -8.06, omega = 2.8711 },
      source = "G, H: " .. PW92 .. ", recommended from the measured gibbsite solubility (dG of Al(OH)3 + 3 H+ = Al3+ + 3 H2O -44.2 +- 0.3 kJ/mol at 25 C), which implies the gibbsite dfG of this file (note); S derived here from G and H with CODATA element entropies. HKF parameters: from memory of [SH88], as in phlox's reference hkf/hkf_parameters.csv",
      quality = "medium",
      note = "The paper's dfG(Al3+) -487.7 + 3 x (-237.129) + 44.2 = -1154.9 kJ/mol is the gibbsite of this file, so Al3+ and gibbsite reproduce the measured log *Ks 7.74. Other tables: CODATA 1989 dfG -491.507, dfH -538.4 +- 1.5, S -325 +- 10 (used here before issue 13; gave log *Ks 8.41); NBS 1982 -485.0, -531, -321.7; SH88 -483.7. The S here (-346) is 2 sigma below CODATA's; dfH 1.7 sigma. HKF parameters LOW: they reproduce the published Cp (-32.5 cal/(mol K)) but give V = -44.66 vs the weakly recalled -45.3 cm3/mol.",
    },
    {
      formula = "AlOH^2+", model = "logk",
      reaction = "Al^3+ + H2O(l) = AlOH^2+ + H^+",
      logK = -4.98, dH = 48.07,
      uncertainty = { logK = 0.02 },
      source = "logK: " .. BE16 .. " (+- 0.02); dH: " .. N90 .. " (11.49 kcal/mol)",
      quality = "high",
      note = "[BM76] -4.97 (read in the same table); [N90] list log K -5.00 with this dH.",
    },
    {
      formula = "Al(OH)2^+", model = "logk",
      reaction = "Al^3+ + 2 H2O(l) = Al(OH)2^+ + 2 H^+",
      logK = -10.63, estimate = "isocoulombic",
      uncertainty = { logK = 0.09 },
      source = BE16 .. " (+- 0.09)",
      quality = "medium",
      note = "no reaction enthalpy recalled. [BM76] -9.3 (read in the same table), [N90] -10.1 (recalled), Hummel and Thoenen 2023 -10.63 (read, same table, adopting Brown and Ekberg): the intermediate species are hard to measure; the later evaluations rest on more data.",
    },
    {
      formula = "Al(OH)3(aq)", model = "logk",
      reaction = "Al^3+ + 3 H2O(l) = Al(OH)3(aq) + 3 H^+",
      logK = -15.66, estimate = "isocoulombic",
      uncertainty = { logK = 0.23 },
      source = BE16 .. " (+- 0.23)",
      quality = "low",
      note = "no reaction enthalpy recalled. [BM76] -15.0 (read in the same table; given with a large uncertainty), Hummel and Thoenen 2023 -15.99 +- 0.23 (read, same table), [N90] -16.9 (recalled).",
    },
    {
      formula = "Al(OH)4^-", model = "logk",
      -- the measured reaction (gibbsite solubility in base), not the hydrolysis of Al3+
      reaction = "Al(OH)3(s,gibbsite) + OH^- = Al(OH)4^-",
      logK = -1.143,
      -- log K = k0 + k2/T + k3 log10 T: Kirchhoff's law with constant dCp from the 25 C values
      logK_T = { -48.97745, 0, 1129.6147, 17.800309 },
      uncertainty = { logK = 0.006 },
      source = WES92 .. ": log K -1.143 +- 0.006, dH 22.5 +- 0.3 kJ/mol, dCp 148 +- 6 J/(mol K) at 25 C (the paper gives the reverse reaction), measured 0-100 C; logK_T is Kirchhoff's law with these three numbers, derived here",
      quality = "high",
      note = "Measured 0-100 C; above 100 C the constant dCp is an extrapolation (the paper's own fit has 8 parameters, not in the abstract). With this file's Al3+ and gibbsite it gives log *beta4 (Al3+ + 4 H2O = Al(OH)4- + 4 H+) = -22.87 at 25 C: [BE16] -22.91 +- 0.10 and [BM76] -23.0 (both read in the Wikipedia table 'Hydrolysis constant'), [N90] -22.7 (recalled). It also gives dfG(Al(OH)4-) = -1305.7 kJ/mol with the SH88 OH-: NBS 1982 -1305.3 (recalled).",
    },
    {
      formula = "Al2(OH)2^4+", model = "logk",
      reaction = "2 Al^3+ + 2 H2O(l) = Al2(OH)2^4+ + 2 H^+",
      logK = -7.62, estimate = "isocoulombic",
      uncertainty = { logK = 0.11 },
      source = BE16 .. " (+- 0.11)",
      quality = "medium",
      note = "[BM76] -7.7 (read in the same table).",
    },
    {
      formula = "Al3(OH)4^5+", model = "logk",
      reaction = "3 Al^3+ + 4 H2O(l) = Al3(OH)4^5+ + 4 H^+",
      logK = -14.06, estimate = "isocoulombic",
      uncertainty = { logK = 0.22 },
      source = BE16 .. " (+- 0.22)",
      quality = "medium",
      note = "[BM76] -13.94, Hummel and Thoenen 2023 -13.90 +- 0.12 (both read in the same table).",
    },
    {
      formula = "Al13O4(OH)24^7+", model = "logk",
      reaction = "13 Al^3+ + 28 H2O(l) = Al13O4(OH)24^7+ + 32 H^+",
      logK = -100.03, estimate = "isocoulombic",
      uncertainty = { logK = 0.09 },
      source = BE16 .. " (+- 0.09)",
      quality = "medium",
      note = "the Keggin-type tridecamer; forms slowly on partial neutralisation of concentrated Al solutions. [BM76] -98.73 (read in the same table).",
    },
    {
      formula = "Al2O3(s,corundum)", model = "cp",
      G = -1582.257, H = -1675.7, S = 50.92,
      cp = { a = 114.77, b = 12.80e-3, c = -3.5438e6 },
      V = 25.575,
      T_range = { 298.15, 1800 },
      source = "G, H, S: " .. CODATA .. " (dfH and S read in a CODATA-table reprint; NBS 1982 has the same values); cp: " .. K60 .. "; V: " .. RH95,
      quality = "high",
      note = "cp = Kelley's 27.43 + 3.06e-3 T - 8.47e5/T^2 cal/(mol K) times 4.184; gives 78.72 at 298.15 K (NBS Cp 79.04).",
    },
    {
      formula = "Al(OH)3(s,gibbsite)", model = "cp",
      G = -1154.9, H = -1293.1, S = 68.44,
      cp = { a = 91.7, b = 0, c = 0 },
      V = 31.956,
      source = RH95,
      quality = "medium",
      note = "cp is Cp at 298.15 K taken as constant (R&H give a polynomial that is not recalled). Gibbsite solubility: with this file's Al3+ (the value [PW92] derived from this very G) log *Ks = 7.74, the measured value; [BE16] select 7.75 +- 0.08 (read); [N90] use 8.11 (recalled), which is older solubility work.",
    },
    {
      formula = "AlO(OH)(s,boehmite)", model = "cp",
      G = -918.4, H = -996.4, S = 37.19,
      cp = { a = 65.6, b = 0, c = 0 },
      V = 19.535,
      source = RH95 .. " (values of [HRA91])",
      quality = "low",
      note = "Cp at 298.15 K recalled weakly, taken as constant. With these values boehmite + water is 0.6 kJ/mol below gibbsite at 25 C, inside the combined uncertainty (about 2 kJ/mol); in nature gibbsite is the stable phase at 25 C. Exclude boehmite for 25 C diagrams if gibbsite is wanted. With this file's Al3+ log *Ks = 7.63 (AlO(OH) + 3 H+ = Al3+ + 2 H2O); [BE16] select 7.69 +- 0.15 (read).",
    },
    {
      formula = "Al(OH)3(am)", model = "logk",
      reaction = "Al^3+ + 3 H2O(l) = Al(OH)3(am) + 3 H^+",
      logK = -10.8, dH = 110.88,
      source = N90 .. " (dissolution log K 10.8, dH -26.5 kcal/mol, reversed here)",
      quality = "low",
      note = "amorphous, freshly precipitated hydroxide; solubility depends on age and particle size.",
    },
  },
}
