-- stdlib/elements/Mo.lua: molybdenum, its oxides, molybdate and hydrogen molybdate.
-- Data set choice (see docs/data/other-metals.md): the NBS tables (Wagman et al. 1982)
-- for the metal, MoO2, MoO3 and MoO4^2-. No HKF set is recalled for MoO4^2-, so it is
-- defined by its conventional formation reaction (log K = -dfG/(RT ln 10), dH = dfH).
-- Left out: H2MoO4(aq) (second protonation constant not recalled with confidence),
-- polymolybdates (Mo7O24^6-, Mo8O26^4-), Mo(V) species and Mo(III) hydrolysis; Mo^3+
-- itself is defined from the CRC standard potential (issue 13).
--
-- Primary compilation: NBS 1982; Mo^3+ from the CRC standard potential (no NBS value).
local NBS = "from memory of [NBS82]"

return {
  element = "Mo",
  title = "Molybdenum",
  units = { energy = "kJ", entropy = "J" },
  species = {
    {
      formula = "Mo(s)", model = "cp",
      G = 0, H = 0, S = 28.66,
      cp = { a = 24.06, b = 0, c = 0 },
      V = 9.39,
      source = NBS,
      quality = "high",
      note = "cp is NBS Cp at 298.15 K taken as constant. V from the density 10.22 g/cm3.",
    },
    {
      formula = "MoO2(s)", model = "cp",
      G = -533.0, H = -588.94, S = 46.28,
      cp = { a = 55.98, b = 0, c = 0 },
      source = NBS, quality = "medium",
      note = "cp is NBS Cp at 298.15 K taken as constant.",
    },
    {
      formula = "MoO3(s)", model = "cp",
      G = -668.02, H = -745.09, S = 77.74,
      cp = { a = 74.98, b = 0, c = 0 },
      source = NBS, quality = "medium",
      note = "cp is NBS Cp at 298.15 K taken as constant.",
    },
    {
      formula = "MoO4^2-", model = "logk",
      reaction = "Mo(s) + 2 O2(g) + H2(g) = MoO4^2- + 2 H^+",
      logK = 146.513, dH = -997.9,
      -- Cp: the formation reaction takes the dCp(T) of the same reaction of SO4^2-, whose
      -- HKF set is published (isocoulombic: the difference reaction keeps dCp = 0; model
      -- substance, Lindsay 1980); SO4^2- is the model by the rule of docs/thermo.md:
      -- S 27.2 J/(mol K) is closer to SO4^2- (18.8) than to CO3^2- (-49.3). Validation: docs/data-checks.md, "Single-ion heat capacities".
      estimate = { dCp = "isocoulombic", model = "S(s,rhombic) + 2 O2(g) + H2(g) = SO4^2- + 2 H^+" },
      source = "derived here from " .. NBS .. ": dfG -836.3, dfH -997.9 kJ/mol, S 27.2 J/(mol K)",
      quality = "medium",
      note = "conventional formation reaction, log K = 836.3/5.70801. Shock et al. 1997 list about -199.9 kcal/mol (-836.4 kJ/mol) for dfG (recalled). Older tables (Latimer) carry about -915 kJ/mol; the CRC couple MoO4^2-/Mo (-1.05 V) follows those (this file gives -0.910 V). Heat capacity: the isocoulombic estimate above (dCp of the SO4^2- formation reaction).",
    },
    {
      formula = "HMoO4^-", model = "logk",
      reaction = "MoO4^2- + H^+ = HMoO4^-",
      logK = 4.24, estimate = "isocoulombic",
      source = "from memory of [SM] (I = 0, 25 C)",
      quality = "low",
      note = "published values at various ionic strengths spread from about 3.5 to 4.3; at millimolar Mo and low pH polymolybdates (not included) dominate.",
    },
    { -- issue 13
      formula = "Mo^3+", model = "logk",
      reaction = "Mo(s) + 3 H^+ = Mo^3+ + 1.5 H2(g)",
      logK = 10.142, estimate = "isocoulombic",
      source = "derived here from E0(Mo^3+/Mo) = -0.200 V, from memory of the [CRC]",
      quality = "low",
      note = "Molybdenum(III) in strong acid; no hydrolysis constants recalled. No dH recalled: temperature by the isocoulombic estimate.",
    },
  },
}
