-- stdlib/elements/Au.lua: gold, its ions and its hydrated oxide.
--
-- Primary compilation: the standard potentials of Bard, Parsons and Jordan
-- 1985 (Standard Potentials in Aqueous Solution, IUPAC), as printed in the
-- CRC Handbook's electrochemical series, for Au^+, Au^3+ and Au(OH)3; the
-- metal from the NBS tables (Wagman et al. 1982).  The NBS tables list no
-- simple gold ion, so the ions are defined by their potentials.  The chloro
-- complexes are in Cl.lua, the cyano complexes in CN.lua (cyanide file).
-- Every number was recalled, not read ("from memory of").
--
-- Temperature: no reaction enthalpy of the gold ions or of Au(OH)3 is
-- recalled, so their log K is held at its 25 C value (flagged as such away
-- from 25 C); Au(CN)2^- in CN.lua carries NBS enthalpies.
--
-- Caution: gold dissolution in cyanide or chloride needs an oxidant and is
-- governed by kinetics (passivation, oxygen transport); a diagram shows
-- which species can form, not how fast.

local NBS = "from memory of [NBS82]"
local BPJ = "from memory of [BPJ85], as printed in [CRC]"

return {
  element = "Au",
  title = "Gold",
  units = { energy = "kJ", entropy = "J" },
  species = {
    {
      formula = "Au(s)", model = "cp",
      G = 0, H = 0, S = 47.40,
      cp = { a = 25.42 },
      source = NBS .. " (S, Cp at 298.15 K held constant)",
      quality = "high",
      note = "Cp(298.15 K) held constant: gold's Cp rises only about 4 % from 298 to 600 K.",
    },
    {
      formula = "Au^+", model = "logk",
      reaction = "Au(s) + H^+ = Au^+ + 0.5 H2(g)",
      logK = -28.601, estimate = "isocoulombic",
      source = "derived here from E0(Au^+/Au) = 1.692 V, " .. BPJ,
      quality = "medium",
      note = "log K = -F E0/(RT ln 10).  Au^+ disproportionates (3 Au^+ = 2 Au + Au^3+ is favoured by 0.29 V); it matters only in complexes.  No dH recalled: temperature by the isocoulombic estimate.",
    },
    {
      formula = "Au^3+", model = "logk",
      reaction = "Au(s) + 3 H^+ = Au^3+ + 1.5 H2(g)",
      logK = -75.964, estimate = "isocoulombic",
      source = "derived here from E0(Au^3+/Au) = 1.498 V, " .. BPJ,
      quality = "medium",
      note = "with Au^+ it gives E0(Au^3+/Au^+) = 1.401 V, the value printed beside it in the same table.  No dH recalled: temperature by the isocoulombic estimate.",
    },
    {
      formula = "Au(OH)3(s)", model = "logk",
      reaction = "Au(s) + 3 H2O(l) = Au(OH)3(s) + 1.5 H2(g)",
      logK = -73.530, estimate = "isocoulombic",
      source = "derived here from E0(Au(OH)3 + 3 H^+ + 3 e- = Au + 3 H2O) = 1.45 V, " .. BPJ,
      quality = "low",
      note = "Hydrated gold(III) oxide; Pourbaix 1966 prints 1.457 V for the same couple (recalled). Two decimals in the source: +-5 mV is 0.25 in this log K.  No dH recalled: temperature by the isocoulombic estimate.",
    },
  },
}
