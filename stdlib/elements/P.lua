-- stdlib/elements/P.lua: phosphorus. Orthophosphoric acid and its anions,
-- calcium and magnesium phosphate complexes, and the common phosphate minerals
-- (apatite, brushite, strengite, vivianite).
--
-- Vivianite (issue 13, s5-solids): the measured solubility product 5-90 C of [AT94].
-- Primary compilation: Smith and Martell (Critical Stability Constants, I = 0) for the
-- acid constants, with NBS 1982 enthalpies; H2PO4^- and HPO4^2- carry the SH88 values;
-- the minerals are defined by their measured solubility products (each record names it).
--
-- Data sets: H2PO4^- carries revised-HKF parameters of Shock and Helgeson 1988
-- as recalled in the project reference table tests/reference/hkf (its c2 was
-- reconstructed there from the published Cp, see the note). HPO4^2- uses the
-- same table's dfG/dfH/S with loader-estimated HKF parameters, because the
-- recalled c1/c2 fail the Cp check. H3PO4 and PO4^3- are written as acid-base
-- reactions (Smith and Martell constants, NBS 1982 enthalpies). Nearly every
-- number was recalled, not read.

local NBS = "from memory of [NBS82]"
local SH88 = "from memory of [SH88], ion tables (table no. not recalled)"
local SM = "from memory of [SM] (I = 0, 25 C)"
local CAP = "from memory of [CHUGHTAI68] as compiled in [COMPILED]"
local MGP = "from memory of [COMPILED]"
local NRIAGU = "from memory of [NRIAGU72], solubility of strengite and vivianite"
local CAL = { energy = "cal", entropy = "cal" }
local KCAL = { energy = "kcal" }

return {
  element = "P",
  title = "Phosphorus",
  units = { energy = "kJ", entropy = "J" },
  species = {
    {
      formula = "H2PO4^-", model = "hkf", units = CAL,
      G = -270140, H = -309820, S = 21.6,
      hkf = { a1 = 6.4875, a2 = 8.0594, a3 = 2.5823, a4 = -3.1122, c1 = 14.0435, c2 = -4.4605, omega = 1.3003 },
      source = SH88 .. "; c2 RECONSTRUCTED in that table from the SH88 c2-Cp correlation and the recalled published Cp (-7.0 cal/(mol K))",
      quality = "medium",
      note = "check c2 against the paper before high-temperature use",
    },
    {
      formula = "HPO4^2-", model = "hkf", units = CAL,
      G = -260310, H = -308815, S = -8.0,
      estimate = { Cp = -243.9, V = 5.4 },  -- J/(mol K) and cm3/mol (estimate is always in J)
      source = SH88 .. " (dfG, dfH, S); estimate Cp = -58.3 cal/(mol K) = -243.9 J/(mol K) and V = 5.4 cm3/mol are the published 25 C values as recalled in that table's README (weak)",
      quality = "low",
      note = "the recalled HKF set fails the Cp check (c1 repeats the omega digits), so the loader estimates the parameters from Cp, V, S and charge. log K(H2PO4^- = HPO4^2- + H^+) from these dfG -7.21 ([SM] 7.20)",
    },
    {
      formula = "PO4^3-", model = "logk",
      reaction = "HPO4^2- = PO4^3- + H^+", logK = -12.35, dH = 14.74,
      source = SM .. " (log K); dH derived here from dfH of HPO4^2- (-1292.14) and PO4^3- (-1277.4), " .. NBS,
      quality = "medium",
      note = "NBS dfG values give -12.34",
    },
    {
      formula = "H3PO4(aq)", model = "logk",
      reaction = "H2PO4^- + H^+ = H3PO4(aq)", logK = 2.148, dH = 7.95,
      source = SM .. " (log K); dH derived here from dfH of H2PO4^- (-1296.29) and H3PO4(aq) (-1288.34), " .. NBS,
      quality = "high",
    },

    -- ---------------------------------------------------------------- complexes
    { formula = "CaHPO4(aq)", model = "logk", reaction = "Ca^2+ + HPO4^2- = CaHPO4(aq)", logK = 2.739, dH = 3.3, units = KCAL,
      source = CAP, quality = "medium" },
    { formula = "CaPO4^-", model = "logk", reaction = "Ca^2+ + PO4^3- = CaPO4^-", logK = 6.459, dH = 3.1, units = KCAL,
      source = CAP, quality = "medium" },
    { formula = "CaH2PO4^+", model = "logk", reaction = "Ca^2+ + H2PO4^- = CaH2PO4^+", logK = 1.408, dH = 3.4, units = KCAL,
      source = CAP, quality = "medium" },
    { formula = "MgHPO4(aq)", model = "logk", reaction = "Mg^2+ + HPO4^2- = MgHPO4(aq)", logK = 2.87, dH = 3.3, units = KCAL,
      source = MGP, quality = "medium" },
    { formula = "MgPO4^-", model = "logk", reaction = "Mg^2+ + PO4^3- = MgPO4^-", logK = 6.589, dH = 3.1, units = KCAL,
      source = MGP, quality = "medium" },
    { formula = "MgH2PO4^+", model = "logk", reaction = "Mg^2+ + H2PO4^- = MgH2PO4^+", logK = 1.513, dH = 3.4, units = KCAL,
      source = MGP, quality = "medium" },

    -- ---------------------------------------------------------------- minerals
    { formula = "Ca5(PO4)3OH(s,hydroxyapatite)", model = "logk",
      reaction = "Ca5(PO4)3OH(s,hydroxyapatite) = 5 Ca^2+ + 3 PO4^3- + OH^-", logK = -58.5, estimate = "isocoulombic",
      source = "from memory of [MGB77]; the abstract of 'Studies on the incongruent solubility of hydroxyapatite' (scilit.com, read) brackets the product between 1e-57 and 1e-60",
      quality = "low",
      note = "apatite dissolves incongruently and its solubility depends on surface phases; dH not recalled" },
    { formula = "CaHPO4*2H2O(s,brushite)", model = "logk",
      reaction = "CaHPO4*2H2O(s,brushite) = Ca^2+ + HPO4^2- + 2 H2O(l)", logK = -6.59, estimate = "isocoulombic",
      source = "from memory of [GMB70]",
      quality = "medium", note = "metastable with respect to apatite but nucleates first at pH below about 6; dH not recalled" },
    { formula = "FePO4*2H2O(s,strengite)", model = "logk",
      reaction = "FePO4*2H2O(s,strengite) = Fe^3+ + PO4^3- + 2 H2O(l)", logK = -26.4, estimate = "isocoulombic",
      source = NRIAGU, quality = "medium", note = "dH not recalled" },
    { formula = "Fe3(PO4)2*8H2O(s,vivianite)", model = "logk",
      reaction = "Fe3(PO4)2*8H2O(s,vivianite) = 3 Fe^2+ + 2 PO4^3- + 8 H2O(l)", logK = -35.767,
      logK_T = { 234.205, 0, -12242.6, -92.510 }, T_range = { 278.15, 363.15 },
      uncertainty = { logK = 0.076 },
      source = "[AT94] (abstract read): pKsp = -234.205 + 12242.6/T + 92.510 log10 T measured at 5-90 C, log Ksp -35.767 +- 0.076 at 25 C",
      quality = "medium",
      note = "Issue 13 (s5-solids): was " .. NRIAGU .. " (log Ksp -36.0, held by the isocoulombic estimate); the measured equation also gives the temperature dependence (dH 5.05 kJ/mol, dCp -769 J/(mol K) at 25 C, from the same abstract). Outside 5-90 C it is an extrapolation." },
  },
}
