-- stdlib/elements/Sr.lua: strontium, its ion and hydrolysis species.
-- Celestite and the Sr sulfate ion pair are in S.lua, strontianite and the
-- carbonate ion pairs in C.lua (ligand files), as measured solubility
-- constants with their temperature equations.
--
-- Primary compilation: CODATA Key Values (Cox, Wagman and Medvedev 1989) for
-- Sr(cr) and Sr^2+; hydrolysis from Baes and Mesmer 1976.  The solids are
-- defined by measured solubility products (Reardon and Armstrong 1987,
-- Busenberg, Plummer and Parker 1984), so dfG(Sr^2+) does not enter any
-- solubility.  Every number was recalled, not read ("from memory of").

local CODATA = "from memory of [CODATA89] (dfH, S; dfG derived here as dfH - T dfS)"
local CODATA_U = "+-: from memory of [CODATA89]"
local NBS = "from memory of [NBS82]"
local BM = "from memory of [BM76] (I = 0, 25 C)"

return {
  element = "Sr",
  title = "Strontium",
  units = { energy = "kJ", entropy = "J" },
  species = {
    {
      formula = "Sr(s)", model = "cp",
      G = 0, H = 0, S = 55.69,
      cp = { a = 26.4 },
      uncertainty = { S = 0.21 },
      source = CODATA .. " (S; " .. CODATA_U .. "); Cp at 298.15 K from " .. NBS .. ", held constant",
      quality = "high",
    },
    {
      formula = "Sr^2+", model = "logk",
      reaction = "Sr(s) + 2 H^+ = Sr^2+ + H2(g)",
      logK = 98.785, dH = -550.90,
      -- Cp: the formation reaction takes the dCp(T) of the same reaction of Ca^2+, whose
      -- HKF set is published (isocoulombic: the difference reaction keeps dCp = 0; model
      -- substance, Lindsay 1980); Ca^2+ is the model by the rule of docs/thermo.md:
      -- S -31.5 J/(mol K) is closer to Ca^2+ (-56.5) than to Mg^2+ (-137.0). Validation: docs/data-checks.md, "Single-ion heat capacities".
      estimate = { dCp = "isocoulombic", model = "Ca(s) + 2 H^+ = Ca^2+ + H2(g)" },
      source = "derived here from " .. CODATA .. ": Sr^2+ dfH -550.90 +- 0.50 kJ/mol, S -31.5 +- 2.0 J/(mol K)",
      quality = "high",
      note = "E0(Sr^2+/Sr) = -2.922 V; NBS 1982 (dfG -559.48) gives -2.899 V, the value the CRC series prints; CODATA revised dfH by 5 kJ/mol. Heat capacity: the isocoulombic estimate above (dCp of the Ca^2+ formation reaction; before it, van 't Hoff on the formation reaction implied Cp(Sr^2+) = Cp(Sr) - Cp(H2) = -2 J/(mol K) at every T). [SH88] list Cp -10.05 cal/(mol K) (recalled); an HKF record estimated from that Cp lands within 2 mV of this estimate in E0 at 25-300 C and is the documented alternative (docs/data/transition-metals.md). E0(Sr^2+/Sr) at 100/200/300 C: -2.938/-2.954/-2.955 V (-2.939/-2.962/-2.984 with dCp = 0).",
    },
    {
      formula = "SrOH^+", model = "logk",
      reaction = "Sr^2+ + H2O(l) = SrOH^+ + H^+",
      logK = -13.29, estimate = "isocoulombic",
      source = BM, quality = "medium",
      note = "No dH recalled: temperature by the isocoulombic estimate.",
    },
  },
}
