-- stdlib/elements/Ba.lua: barium, its ion and hydrolysis species.  Barite
-- is in S.lua, witherite and the carbonate ion pairs in C.lua (ligand files),
-- as measured solubility constants with their temperature equations.
--
-- Primary compilation: the NBS tables (Wagman et al. 1982) for Ba(cr) and
-- Ba^2+ (CODATA 1989 gives no key value for barium, as recalled); hydrolysis
-- from Brown and Ekberg 2016 (read in the Wikipedia table "Hydrolysis
-- constant"; issue 13 moved BaOH^+ there from Baes and Mesmer 1976).  The NBS
-- Ba^2+ with NBS barite and the SH88 sulfate reproduces the measured barite
-- Ksp within 0.01.  Every other number was recalled, not read ("from memory
-- of").

local NBS = "from memory of [NBS82]"
local BE16 = "[BE16] (I = 0, 25 C; read)"

return {
  element = "Ba",
  title = "Barium",
  units = { energy = "kJ", entropy = "J" },
  species = {
    {
      formula = "Ba(s)", model = "cp",
      G = 0, H = 0, S = 62.8,
      cp = { a = 28.07 },
      source = NBS .. " (S; Cp at 298.15 K held constant)",
      quality = "high",
    },
    {
      formula = "Ba^2+", model = "logk",
      reaction = "Ba(s) + 2 H^+ = Ba^2+ + H2(g)",
      logK = 98.243, dH = -537.64,
      -- Cp: the formation reaction takes the dCp(T) of the same reaction of Ca^2+, whose
      -- HKF set is published (isocoulombic: the difference reaction keeps dCp = 0; model
      -- substance, Lindsay 1980); Ca^2+ is the model by the rule of docs/thermo.md:
      -- S 9.6 J/(mol K) is closer to Ca^2+ (-56.5) than to Mg^2+ (-137.0). Validation: docs/data-checks.md, "Single-ion heat capacities".
      estimate = { dCp = "isocoulombic", model = "Ca(s) + 2 H^+ = Ca^2+ + H2(g)" },
      source = "derived here from " .. NBS .. ": Ba^2+ dfG -560.77, dfH -537.64 kJ/mol, S 9.6 J/(mol K)",
      quality = "high",
      note = "E0(Ba^2+/Ba) = -2.906 V (CRC -2.912).",
    },
    {
      formula = "BaOH^+", model = "logk",
      reaction = "Ba^2+ + H2O(l) = BaOH^+ + H^+",
      logK = -13.32, estimate = "isocoulombic",
      uncertainty = { logK = 0.07 },
      source = BE16 .. " (+- 0.07)",
      quality = "medium",
      note = "No dH recalled: temperature by the isocoulombic estimate (from this 25 C value). [BM76] -13.47 and [N90] -13.47 (both read in the same table; Nordstrom et al. copy Baes and Mesmer); Brown and Ekberg re-evaluated the few measurements of this weak complex. At I = 0 BaOH^+ holds 1 % of Ba(II) at pH 11.3 (0.7 % with the Baes and Mesmer value) and 32 % at pH 13 (25 %): the ratio BaOH^+/Ba^2+ is 10^(logK + pH).",
    },
  },
}
