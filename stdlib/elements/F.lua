-- stdlib/elements/F.lua: fluorine. Fluoride, hydrofluoric acid, bifluoride;
-- fluoro complexes (Al, Fe, Mg, Ca, Na, Mn) and fluorite.
--
-- Primary compilation: Nordstrom et al. 1990 (ACS Symp. Ser. 416) for every constant;
-- F^- is the SH88 HKF row.
--
-- Data sets: F^- carries the revised-HKF parameters of Shock and Helgeson 1988
-- (recalled from the paper). Everything
-- else is a formation constant at I = 0, 25 C, mostly from Nordstrom et al.
-- 1990. Nearly every number was recalled, not read ("from memory of").
-- F2(g) is left out on purpose: it cannot exist in contact with water.

local SH88 = "from memory of [SH88], ion tables (table no. not recalled)"
local N90 = "from memory of [N90]"
local COMPILED = "from memory of [COMPILED]"
local CAL = { energy = "cal", entropy = "cal" }
local KCAL = { energy = "kcal" }

return {
  element = "F",
  title = "Fluorine",
  units = { energy = "kJ", entropy = "J" },
  species = {
    {
      formula = "F^-", model = "hkf", units = CAL,
      G = -67340, H = -80150, S = -3.15,
      hkf = { a1 = 0.687, a2 = 1.3588, a3 = 7.6033, a4 = -2.8352, c1 = 4.46, c2 = -7.488, omega = 1.787 },
      source = SH88, quality = "high",
      note = "dfG -281.75 kJ/mol, close to CODATA (-281.52); NBS 1982 (-278.79) is 3 kJ/mol more positive",
    },
    { formula = "HF(aq)", model = "logk", reaction = "H^+ + F^- = HF(aq)", logK = 3.18, dH = 3.18, units = KCAL,
      source = N90, quality = "high", note = "NBS dfG values give 3.16" },
    { formula = "HF2^-", model = "logk", reaction = "H^+ + 2 F^- = HF2^-", logK = 3.76, dH = 4.55, units = KCAL,
      source = N90, quality = "medium" },

    { formula = "AlF^2+", model = "logk", reaction = "Al^3+ + F^- = AlF^2+", logK = 7.0, dH = 1.06, units = KCAL,
      source = N90, quality = "medium" },
    { formula = "AlF2^+", model = "logk", reaction = "Al^3+ + 2 F^- = AlF2^+", logK = 12.7, dH = 1.98, units = KCAL,
      source = N90, quality = "medium" },
    { formula = "AlF3(aq)", model = "logk", reaction = "Al^3+ + 3 F^- = AlF3(aq)", logK = 16.8, dH = 2.16, units = KCAL,
      source = N90, quality = "medium" },
    { formula = "AlF4^-", model = "logk", reaction = "Al^3+ + 4 F^- = AlF4^-", logK = 19.4, dH = 2.2, units = KCAL,
      source = N90, quality = "medium" },
    { formula = "FeF^2+", model = "logk", reaction = "Fe^3+ + F^- = FeF^2+", logK = 6.2, dH = 2.7, units = KCAL,
      source = N90, quality = "medium" },
    { formula = "FeF2^+", model = "logk", reaction = "Fe^3+ + 2 F^- = FeF2^+", logK = 10.8, dH = 4.8, units = KCAL,
      source = N90, quality = "medium" },
    { formula = "FeF3(aq)", model = "logk", reaction = "Fe^3+ + 3 F^- = FeF3(aq)", logK = 14.0, dH = 5.4, units = KCAL,
      source = N90, quality = "medium" },
    { formula = "FeF^+", model = "logk", reaction = "Fe^2+ + F^- = FeF^+", logK = 1.0, estimate = { method = "isocoulombic", model = "Ca^2+ + F^- = CaF^+" },
      source = COMPILED, quality = "low", note = "dH not recalled" },
    { formula = "MgF^+", model = "logk", reaction = "Mg^2+ + F^- = MgF^+", logK = 1.82, dH = 3.2, units = KCAL,
      source = N90, quality = "medium" },
    { formula = "CaF^+", model = "logk", reaction = "Ca^2+ + F^- = CaF^+", logK = 0.94, dH = 4.12, units = KCAL,
      source = N90, quality = "medium" },
    { formula = "NaF(aq)", model = "logk", reaction = "Na^+ + F^- = NaF(aq)", logK = -0.24, estimate = "isocoulombic",
      source = COMPILED, quality = "low", note = "very weak ion pair; dH not recalled" },
    { formula = "MnF^+", model = "logk", reaction = "Mn^2+ + F^- = MnF^+", logK = 0.84, estimate = { method = "isocoulombic", model = "Ca^2+ + F^- = CaF^+" },
      source = COMPILED, quality = "low", note = "dH not recalled" },

    { formula = "CaF2(s,fluorite)", model = "logk", reaction = "CaF2(s,fluorite) = Ca^2+ + 2 F^-",
      logK = -10.6, dH = 4.69, units = KCAL, V = 24.542,
      source = N90 .. "; V from memory of [RH95]", quality = "medium",
      note = "defined by log K: NBS 1982 dfG(CaF2) -1167.3 kJ/mol with CODATA ions gives about -9.0, inconsistent; older value -10.96 (Nordstrom and Jenne 1977)" },
  },
}
