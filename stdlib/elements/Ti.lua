-- stdlib/elements/Ti.lua: titanium and its oxides.
-- Data set choice (see docs/data/other-metals.md): the NBS tables (Wagman et al. 1982);
-- rutile is also a CODATA key value with the same numbers. The only aqueous titanium
-- species is Ti^2+ (issue 13, from the CRC standard potential): Ti3+, TiO^2+ and
-- Ti(OH)4(aq) values were not recalled with confidence, so a diagram from this file
-- shows the metal, its oxides and Ti^2+ only (titanium's passivity in water is a
-- property of the TiO2 film; the other dissolved fields are missing).
--
-- Primary compilation: NBS 1982; Ti^2+ from the CRC standard potential (no NBS value).
local NBS = "from memory of [NBS82]"
local CODATA = "from memory of [CODATA89]"
local RH95 = "from memory of [RH95]"
local K60 = "from memory of [K60]"

return {
  element = "Ti",
  title = "Titanium",
  units = { energy = "kJ", entropy = "J" },
  species = {
    {
      formula = "Ti(s)", model = "cp",
      G = 0, H = 0, S = 30.72,
      uncertainty = { S = 0.10 },  -- +-: from memory of Cox, Wagman and Medvedev 1989 (CODATA Key Values)
      cp = { a = 25.02, b = 0, c = 0 },
      V = 10.63,
      source = "S: " .. CODATA .. " (NBS 30.63); Cp: " .. NBS,
      quality = "high",
      note = "alpha (hcp) titanium. cp is NBS Cp at 298.15 K taken as constant. V from the density 4.506 g/cm3.",
    },
    {
      formula = "TiO2(s,rutile)", model = "cp",
      G = -888.8, H = -944.0, S = 50.62,
      cp = { a = 75.19, b = 1.17e-3, c = -1.820e6 },
      V = 18.82,
      T_range = { 298.15, 1800 },
      source = NBS .. " (the CODATA key value has the same dfH and S); confirmed in a CRC or OpenStax reprint (read), see phlox's reference gibbs_25C.csv; cp: " .. K60 .. "; V: " .. RH95,
      quality = "high",
      note = "cp = Kelley's 17.97 + 0.28e-3 T - 4.35e5/T^2 cal/(mol K) times 4.184; gives 55.06 at 298.15 K (NBS Cp 55.02).",
    },
    {
      formula = "TiO2(s,anatase)", model = "cp",
      G = -884.5, H = -939.7, S = 49.90,
      cp = { a = 55.48, b = 0, c = 0 },
      V = 20.52,
      source = NBS .. "; V: " .. RH95,
      quality = "medium",
      note = "metastable with respect to rutile (4.3 kJ/mol in dfG). Issue 13: the record carried dfG -883.3, dfH -938.7, S 49.92 under an NBS label; those are the [RH95] and JANAF values (recalled), 1.2 kJ/mol less stable. It now takes the NBS 1982 values like rutile, so that the anatase-rutile difference comes from one table: NBS puts anatase 4.3 kJ/mol above rutile in enthalpy, RH95/JANAF 5.3, drop-solution calorimetry 2.61 +- 0.41 (Ranade et al. 2002, Proc. Natl. Acad. Sci. 99, 6476, abstract read), so NBS is the closer. The RH95 values are an independent check (docs/data-checks.md). cp is NBS Cp at 298.15 K taken as constant.",
    },
    {
      formula = "Ti2O3(s)", model = "cp",
      G = -1434.2, H = -1520.9, S = 78.78,
      cp = { a = 97.36, b = 0, c = 0 },
      source = NBS, quality = "medium",
      note = "cp is NBS Cp at 298.15 K taken as constant.",
    },
    {
      formula = "Ti3O5(s)", model = "cp",
      G = -2317.4, H = -2459.1, S = 129.3,
      cp = { a = 154.8, b = 0, c = 0 },
      source = NBS, quality = "medium",
      note = "alpha Ti3O5. cp is NBS Cp at 298.15 K taken as constant.",
    },
    {
      formula = "TiO(s)", model = "cp",
      G = -495.0, H = -519.7, S = 50.0,
      cp = { a = 39.96, b = 0, c = 0 },
      source = NBS, quality = "medium",
      note = "alpha TiO, a non-stoichiometric phase in reality. cp is NBS Cp at 298.15 K taken as constant.",
    },
    { -- issue 13
      formula = "Ti^2+", model = "logk",
      reaction = "Ti(s) + 2 H^+ = Ti^2+ + H2(g)",
      logK = 55.105, estimate = "isocoulombic",
      source = "derived here from E0(Ti^2+/Ti) = -1.630 V, from memory of the [CRC]",
      quality = "low",
      note = "Ti^2+ reduces water; it exists only in strongly reducing acid and matters for the active dissolution of titanium. No dH recalled: temperature by the isocoulombic estimate.",
    },
  },
}
