-- stdlib/elements/CN.lua: cyanide, a polyatomic ligand.  CN^-, HCN(aq), the
-- cyanate it oxidises to, and the cyano complexes of Au, Ag, Cu, Zn, Ni and
-- Fe (ferro- and ferricyanide).
--
-- How the library handles a polyatomic ligand (docs/element-files.md,
-- "Polyatomic ligands"): the species of the group live in a file named after
-- the group, CN.lua, whose `element` is the group's first element (C), so the
-- membership and ligand-order checks treat them as carbon species.
-- phlox.library { "Au", "CN" } loads C.lua and N.lua (graphite and N2(g),
-- from which CN^- is formed) and then this file; phlox.map { element = "Au",
-- ligand = "CN" } keeps the C-N group intact: the ligand's species are those
-- with one N per C (CN^-, HCN(aq), OCN^-), so cyanide's slow oxidation to
-- carbonate and nitrogen species is left out, the metastable convention of
-- cyanide diagrams in hydrometallurgy.
--
-- Primary compilation: the NBS tables (Wagman et al. 1982) for CN^-, HCN,
-- OCN^- and the Au, Fe and Ni cyano complexes (their dfG, dfH and S close
-- the Gibbs-Helmholtz cycle within 0.6 kJ/mol, a check on the recall), so
-- these carry reaction enthalpies (van 't Hoff).  Zn(CN)4^2-: the log beta4
-- of Smith and Martell (read) with the NBS enthalpy.  Ag and Cu complexes: Smith
-- and Martell, Critical Stability Constants (no enthalpy recalled:
-- isocoulombic estimate); the Cu(I) values are those Penneman and Jones 1956
-- derived from their infrared measurements (abstract read, checked in
-- docs/data-checks.md).  Au(CN)4^-: the order-of-magnitude constant printed
-- in gold-processing texts (low quality; no second value found).  Every
-- number was recalled, not read ("from memory of"), unless marked read.
--
-- Caution: HCN is volatile and toxic; the diagrams say which species can
-- form, not how fast cyanide oxidises or gold dissolves.

local NBS = "from memory of [NBS82]"
local NBSD = "derived here from dfG and dfH of " .. NBS
local SM = "from memory of [SM] (I = 0, 25 C)"

-- A cyano complex of a monovalent ion with a Smith and Martell cumulative
-- constant and no recalled enthalpy (temperature by the isocoulombic
-- estimate, docs/thermo.md).
local function cyano(ion, n, charge, logbeta, note)
  local metal = ion:sub(1, -3)
  local f = metal .. "(CN)" .. n .. "^" .. charge
  return { formula = f, model = "logk", reaction = ion .. " + " .. n .. " CN^- = " .. f,
           logK = logbeta, estimate = "isocoulombic", source = SM, quality = "medium",
           note = "No dH recalled: temperature by the isocoulombic estimate." .. (note and (" " .. note) or "") }
end

local species = {
    -- ---------------------------------------------------------------- the ligand
    {
      formula = "CN^-", model = "logk",
      reaction = "C(s,graphite) + 0.5 N2(g) + 0.5 H2(g) = CN^- + H^+",
      logK = -30.203, dH = 150.6,
      source = NBSD .. ": CN^- dfG 172.4, dfH 150.6 kJ/mol, S 94.1 J/(mol K)",
      quality = "medium",
      note = "Formation from the elements; van 't Hoff with constant dH (no Cp of CN^- recalled).",
    },
    {
      formula = "HCN(aq)", model = "logk",
      reaction = "CN^- + H^+ = HCN(aq)",
      logK = 9.233, dH = -43.5,
      source = NBSD .. ": HCN(aq) dfG 119.7, dfH 107.1 kJ/mol, S 124.7 J/(mol K)",
      quality = "high",
      note = "pKa 9.23; [SM] give 9.21 and Izatt et al. 1962 measured dH of ionisation 43.6 kJ/mol (both recalled).",
    },
    {
      formula = "OCN^-", model = "logk",
      reaction = "CN^- + H2O(l) = OCN^- + H2(g)",
      logK = 5.724, dH = -10.77,
      source = NBSD .. ": OCN^- dfG -97.4, dfH -146.0 kJ/mol, S 106.7 J/(mol K)",
      quality = "medium",
      note = "Cyanate, the first oxidation product of cyanide: E0(OCN^- + 2 H^+ + 2 e- = CN^- + H2O) = -0.169 V.  Exclude it for a diagram of cyanide held unoxidised.",
    },
    -- ---------------------------------------------------------------- gold
    {
      formula = "Au(CN)2^-", model = "logk",
      reaction = "Au(s) + 2 CN^- + H^+ = Au(CN)2^- + 0.5 H2(g)",
      logK = 10.336, dH = -58.9,
      source = NBSD .. ": Au(CN)2^- dfG 285.8, dfH 242.3 kJ/mol, S 172 J/(mol K)",
      quality = "medium",
      note = "E0(Au(CN)2^-/Au) = -0.611 V (CRC -0.60).  With Au^+ of Au.lua (1.692 V) log beta2 = 38.94; [SM] give 38.3 (recalled), the literature 36.6-39.3.",
    },
    {
      formula = "Au(CN)4^-", model = "logk",
      reaction = "Au^3+ + 4 CN^- = Au(CN)4^-",
      logK = 56, estimate = "isocoulombic",
      source = "from memory of [MH06], table of stability constants of gold complexes (beta4 about 1e56)",
      quality = "low",
      note = "Gold(III) cyanide. The constant is an order-of-magnitude value (two significant figures at best) and no second published value was found. With Au^3+ of Au.lua it gives E0(Au(CN)4^- + 2 e- = Au(CN)2^- + 2 CN^-) = 0.89 V: Au(CN)4^- is stable only above the O2/H2O line in alkaline cyanide, so oxygen does not form it, as leaching practice finds (strong oxidants or anodic oxidation do). No dH recalled: temperature by the isocoulombic estimate.",
    },
    -- ---------------------------------------------------------------- silver, copper(I)
    -- Smith and Martell cumulative constants; see cyano() below
    -- ---------------------------------------------------------------- zinc, nickel
    {
      formula = "Zn(CN)4^2-", model = "logk",
      reaction = "Zn^2+ + 4 CN^- = Zn(CN)4^2-",
      logK = 19.62, dH = -106.2,
      source = "log K: [SM] (I = 0, 25 C) read in [HARVEY21], Appendix 16.12: log beta2 11.07, log K3 4.98, log K4 3.57, summed here; dH " .. NBSD .. ": Zn(CN)4^2- dfH 342.3 kJ/mol, Zn^2+ dfH -153.89, CN^- dfH 150.6",
      quality = "medium",
      note = "s5-lig (issue 13): the NBS 1982 entry (dfG 446.9 kJ/mol, log beta4 16.76, used before) is 2.9 log units below the measured I = 0 constants; OpenStax Appendix K prints 2.1e19 (19.32, read, conditions not given) and Lange's Handbook 16.7 (recalled). The reaction enthalpy is still the NBS one (van 't Hoff), the only one recalled. The change moves the Zn^2+/Zn(CN)4^2- boundary from log a(CN^-) = -4.19 to -4.91.",
    },
    {
      formula = "Ni(CN)4^2-", model = "logk",
      reaction = "Ni^2+ + 4 CN^- = Ni(CN)4^2-",
      logK = 30.12, dH = -180.6,
      source = NBSD .. ": Ni(CN)4^2- dfG 472.1, dfH 367.8 kJ/mol, S 218 J/(mol K); Ni^2+ dfG -45.6, dfH -54.0",
      quality = "medium",
      note = "[SM] 30.22 (recalled).",
    },
    -- ---------------------------------------------------------------- iron
    {
      formula = "Fe(CN)6^4-", model = "logk",
      reaction = "Fe^2+ + 6 CN^- = Fe(CN)6^4-",
      logK = 45.66, dH = -358.9,
      source = NBSD .. ": Fe(CN)6^4- dfG 694.9, dfH 455.6 kJ/mol, S 95.0 J/(mol K); Fe^2+ dfG -78.90, dfH -89.1",
      quality = "low",
      note = "Ferrocyanide.  Older compilations print log beta6 = 35 to 35.4 (recalled), which with their ferricyanide constants does not reproduce the measured ferri/ferro potential; the NBS entries do (0.358 V).  Computed with NBS Fe^2+, so with the file's Fe^2+ (Shock et al. 1997) dfG of the complex differs from NBS by 12.6 kJ/mol.",
    },
    {
      formula = "Fe(CN)6^3-", model = "logk",
      reaction = "Fe(CN)6^4- + H^+ = Fe(CN)6^3- + 0.5 H2(g)",
      logK = -6.044, dH = 106.3,
      source = NBSD .. ": Fe(CN)6^3- dfG 729.4, dfH 561.9 kJ/mol, S 270.3 J/(mol K)",
      quality = "high",
      note = "Ferricyanide, defined on ferrocyanide: E0 = 0.358 V, the CRC value.",
    },
}
table.insert(species, cyano("Ag^+", 2, "-", 20.48, "Lange's Handbook lists 21.1 (recalled)."))
table.insert(species, cyano("Cu^+", 2, "-", 24.0, "Penneman and Jones 1956 (J. Chem. Phys. 24, 293, abstract read) take the same 1e24 as the basis of their beta3 and beta4; no independent second value was found."))
table.insert(species, cyano("Cu^+", 3, "2-", 28.59, "Penneman and Jones 1956 (abstract read): 1/2.6e-29, i.e. 28.585, from their measured K3 on beta2 = 1e24."))
table.insert(species, cyano("Cu^+", 4, "3-", 30.30, "Penneman and Jones 1956 (abstract read): 1/5e-31, i.e. 30.30, from their measured K4 on beta2 = 1e24."))

return {
  element = "C",
  title = "Cyanide (C-N group ligand)",
  units = { energy = "kJ", entropy = "J" },
  species = species,
}
