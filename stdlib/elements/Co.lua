-- stdlib/elements/Co.lua: cobalt, its ions, hydrolysis species, oxides and hydroxide.
--
-- Data choice (see docs/data/transition-metals.md): ions and solids from the NBS tables
-- (Wagman et al. 1982); hydrolysis from Baes and Mesmer 1976. No Cp is recalled for the
-- ions, so they are defined by formation reactions.
-- Every number below was recalled, not read; "from memory of" says so.

local NBS = "from memory of [NBS82]"
local KELLEY = "cp from memory of [K60], converted from cal with 4.184"
local BM = "from memory of [BM76] (I = 0, 25 C)"

return {
  element = "Co",
  title = "Cobalt",
  units = { energy = "kJ", entropy = "J" },
  species = {
    {
      formula = "Co(s)", model = "cp",
      G = 0, H = 0, S = 30.04,
      cp = { a = 19.75, b = 17.99e-3, c = 0 },
      T_range = { 298.15, 700 },
      source = NBS .. " (S); " .. KELLEY .. " (4.72 + 4.30e-3 T cal/(mol K), hcp Co)",
      quality = "high",
      note = "Polynomial gives Cp(298.15 K) = 25.11 J/(mol K) against NBS 24.81.",
    },
    {
      formula = "Co^2+", model = "logk",
      reaction = "Co(s) + 2 H^+ = Co^2+ + H2(g)",
      logK = 9.530, dH = -58.2,
      -- Cp: the formation reaction takes the dCp(T) of the same reaction of Mg^2+, whose
      -- HKF set is published (isocoulombic: the difference reaction keeps dCp = 0; model
      -- substance, Lindsay 1980); Mg^2+ is the model by the rule of docs/thermo.md:
      -- S -113 J/(mol K) is closer to Mg^2+ (-137.0) than to Ca^2+ (-56.5). Validation: docs/data-checks.md, "Single-ion heat capacities".
      estimate = { dCp = "isocoulombic", model = "Mg(s) + 2 H^+ = Mg^2+ + H2(g)" },
      source = "derived here from " .. NBS .. ": Co2+ dfG -54.4, dfH -58.2 kJ/mol, S -113 J/(mol K)",
      quality = "medium",
      note = "E0(Co2+/Co) = -0.282 V (CRC -0.28). No Cp recalled: the heat capacity is the isocoulombic estimate above.",
    },
    {
      formula = "Co^3+", model = "logk",
      reaction = "2 Co^2+ + 2 H^+ = 2 Co^3+ + H2(g)",
      logK = -66.013, dH = 300.4,
      source = "derived here from " .. NBS .. ": Co3+ dfG 134, dfH 92 kJ/mol, S -305 J/(mol K)",
      quality = "low",
      note = "Hypothetical-ion data in the source. E0(Co3+/Co2+) = 1.953 V (CRC series 1.92).",
    },
    {
      formula = "CoOH^+", model = "logk",
      reaction = "Co^2+ + H2O(l) = CoOH^+ + H^+",
      logK = -9.65, estimate = "isocoulombic",
      source = BM, quality = "medium",
    },
    {
      formula = "Co(OH)2(aq)", model = "logk",
      reaction = "Co^2+ + 2 H2O(l) = Co(OH)2(aq) + 2 H^+",
      logK = -18.8, estimate = "isocoulombic",
      source = BM, quality = "low",
    },
    {
      formula = "Co(OH)3^-", model = "logk",
      reaction = "Co^2+ + 3 H2O(l) = Co(OH)3^- + 3 H^+",
      logK = -31.5, estimate = "isocoulombic",
      source = BM, quality = "low",
    },
    {
      formula = "Co(OH)4^2-", model = "logk",
      reaction = "Co^2+ + 4 H2O(l) = Co(OH)4^2- + 4 H^+",
      logK = -46.3, estimate = "isocoulombic",
      source = BM, quality = "low",
    },
    {
      formula = "CoO(s)", model = "cp",
      G = -214.20, H = -237.94, S = 52.97,
      cp = { a = 55.23, b = 0, c = 0 },
      source = NBS,
      quality = "high",
      note = "cp: NBS Cp(298.15 K) only (a = Cp, b = c = 0).",
    },
    {
      formula = "Co(OH)2(s)", model = "cp",
      G = -454.3, H = -539.7, S = 79,
      estimate = { Cp = "kopp" }, -- no published Cp recalled: Kopp-Neumann (docs/thermo.md)
      source = NBS,
      quality = "low",
      note = "Pink form. Cp not recalled: Kopp-Neumann estimate (Kopp's atomic heats).",
    },
    {
      formula = "Co3O4(s)", model = "cp",
      G = -774.0, H = -891.0, S = 102.5,
      cp = { a = 123.4, b = 0, c = 0 },
      source = NBS,
      quality = "medium",
      known_mismatch = "dfG, dfH and S recalled from NBS 1982 miss the cycle by 1.64 kJ/mol; one of them is mis-recalled (probably S); check against the printed table",
      note = "dfG, dfH and S miss the cycle dfG = dfH - T*dfS by 1.6 kJ/mol (one of them is mis-recalled, probably S). cp: NBS Cp(298.15 K) only.",
    },
    { -- issue 13
      formula = "Co(OH)3(s)", model = "logk",
      reaction = "Co(OH)2(s) + OH^- = Co(OH)3(s) + e-",
      logK = -2.874, estimate = "isocoulombic",
      source = "derived here from E0(Co(OH)3 + e- = Co(OH)2 + OH^-) = 0.17 V, from memory of the [CRC]",
      quality = "low",
      note = "Cobalt(III) hydroxide (CoOOH.H2O) on the file's NBS Co(OH)2. Pourbaix 1966 prints 1.005 - 0.0591 pH for the same couple (recalled), 7 mV from this. Two decimals in the source. No dH recalled: temperature by the isocoulombic estimate.",
    },
  },
}
