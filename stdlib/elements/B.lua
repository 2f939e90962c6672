-- stdlib/elements/B.lua: boron.  Boric acid, borate and crystalline boric
-- acid (sassolite), for seawater alkalinity and borated reactor coolant.
--
-- Primary compilation: CODATA Key Values (Cox, Wagman and Medvedev 1989) for
-- B(cr), B(OH)3(cr) and B(OH)3(aq) (dfG derived here as dfH - T dfS); the
-- acid constant from the measured equation of Mesmer, Baes and Sweeton 1972
-- (0-300 C), checked against the NBS 1982 borate ion (pKa 9.234) and the
-- classic 25 C value 9.237.  Polyborates (B3O3(OH)4^- and others, which
-- matter above about 0.025 mol/kg B) are not included: their constants were
-- not recalled with confidence.  Every number was recalled, not read.

local CODATA = "from memory of [CODATA89] (dfH, S; dfG derived here as dfH - T dfS)"
local CODATA_U = "+-: from memory of [CODATA89]"
local NBS = "from memory of [NBS82]"
local MBS72 = "from memory of [MBS72], log K = 1573.21/T + 28.6059 + 0.012078 T - 13.2258 log10 T, 0-300 C"

return {
  element = "B",
  title = "Boron",
  units = { energy = "kJ", entropy = "J" },
  species = {
    {
      formula = "B(s)", model = "cp",
      G = 0, H = 0, S = 5.90,
      cp = { a = 11.09 },
      uncertainty = { S = 0.08 },
      source = CODATA .. " (S; " .. CODATA_U .. "); Cp at 298.15 K from " .. NBS .. ", held constant",
      quality = "high",
      note = "Crystalline (beta-rhombohedral) boron; Cp rises steeply with T (held here).",
    },
    {
      formula = "B(OH)3(s,sassolite)", model = "cp",
      G = -969.667, H = -1094.8, S = 89.95,
      cp = { a = 81.38 },
      uncertainty = { H = 0.8, S = 0.60 },
      source = CODATA .. " (" .. CODATA_U .. "); Cp at 298.15 K from " .. NBS .. ", held constant",
      quality = "high",
      note = "Crystalline boric acid H3BO3.",
    },
    {
      formula = "B(OH)3(aq)", model = "logk",
      reaction = "B(OH)3(s,sassolite) = B(OH)3(aq)",
      logK = -0.070, dH = 22.0,
      source = "derived here from " .. CODATA .. ": B(OH)3(aq) dfH -1072.8 +- 0.8 kJ/mol, S 162.4 +- 0.6 J/(mol K), with sassolite above",
      quality = "medium",
      note = "Solubility of boric acid 0.85 mol/kg at unit activity coefficient (measured about 0.88-0.92 mol/kg at 25 C, recalled). Van 't Hoff with the CODATA dissolution enthalpy; the solubility rises steeply with T.",
    },
    {
      formula = "B(OH)4^-", model = "logk",
      reaction = "B(OH)3(aq) + OH^- = B(OH)4^-",
      logK = 4.757,
      logK_T = { 28.6059, 0.012078, 1573.21, -13.2258 },
      T_range = { 273.15, 573.15 },
      source = MBS72,
      quality = "high",
      note = "With pKw this gives pKa(B(OH)3 + H2O = B(OH)4^- + H^+) = 9.24 at 25 C (Owen 1934 and Manov et al. 1944: 9.237, recalled); at 0 C 9.50 (Owen: 9.508).",
    },
  },
}
