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
      source = "derived here from " .. CODATA .. ": Sr^2+ dfH -550.90 +- 0.50 kJ/mol, S -31.5 +- 2.0 J/(mol K)",
      quality = "high",
      note = "E0(Sr^2+/Sr) = -2.922 V; NBS 1982 (dfG -559.48) gives -2.899 V, the value the CRC series prints; CODATA revised dfH by 5 kJ/mol. No heat capacity of its own: van 't Hoff on the formation reaction implies Cp(Sr^2+) = Cp(Sr) - Cp(H2) = -2 J/(mol K) at every T. [SH88] list Cp -10.05 cal/(mol K) (recalled); the HKF record estimated from it (+27 mV in E0 at 300 C) waits for the NiSO4(aq) model of S.lua, which is the SrSO4(aq) pair (docs/data/transition-metals.md).",
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
