-- stdlib/elements/Ni.lua: nickel, its ion, hydrolysis species, oxides and hydroxide.
--
-- Data choice (see docs/data/transition-metals.md): primary compilation the NBS tables
-- (Wagman et al. 1982) for the ion and the solids; hydrolysis from Baes and Mesmer 1976;
-- the heat capacity of Ni^2+ from the NEA-TDB nickel review (HKF estimate from it).
-- Numbers are recalled ("from memory of") unless a source says read.

local NBS = "from memory of [NBS82]"
local KELLEY = "cp from memory of [K60], converted from cal with 4.184"
local BM = "from memory of [BM76] (I = 0, 25 C)"
local NEA = "from memory of [NEA05NI], selected value"

return {
  element = "Ni",
  title = "Nickel",
  units = { energy = "kJ", entropy = "J" },
  species = {
    {
      formula = "Ni(s)", model = "cp",
      G = 0, H = 0, S = 29.87,
      cp = { a = 16.99, b = 29.46e-3, c = 0 },
      T_range = { 298.15, 631 },
      source = NBS .. " (S); " .. KELLEY .. " (4.06 + 7.04e-3 T cal/(mol K), below the Curie point)",
      quality = "high",
      note = "Polynomial gives Cp(298.15 K) = 25.77 J/(mol K) against NBS 26.07.",
    },
    {
      formula = "Ni^2+", model = "hkf",
      G = -45.6, H = -54.0, S = -128.9,
      estimate = { Cp = -46 },
      source = NBS .. "; Cp -46 +- 10 J/(mol K) " .. NEA,
      quality = "medium",
      note = "E0(Ni2+/Ni) = -0.236 V; the CRC series lists -0.257 V. HKF parameters not recalled as a set: estimated by the loader from S and Cp ([SH88] correlations). Shock et al. 1997 list Cp -11.6 cal/(mol K) = -48.5 J/(mol K) (recalled), inside the NEA uncertainty. V not recalled: volume terms zero (poor at high pressure). Before issue 12 the ion was defined by its formation reaction from Ni(s) with van 't Hoff only (dCp of Ni(OH)2 dissolution +69 J/(mol K) against about 0 measured).",
    },
    {
      formula = "NiOH^+", model = "logk",
      reaction = "Ni^2+ + H2O(l) = NiOH^+ + H^+",
      logK = -9.86, estimate = "isocoulombic",
      source = BM, quality = "medium",
    },
    {
      formula = "Ni(OH)2(aq)", model = "logk",
      reaction = "Ni^2+ + 2 H2O(l) = Ni(OH)2(aq) + 2 H^+",
      logK = -19.0, estimate = "isocoulombic",
      source = BM, quality = "low",
    },
    {
      formula = "Ni(OH)3^-", model = "logk",
      reaction = "Ni^2+ + 3 H2O(l) = Ni(OH)3^- + 3 H^+",
      logK = -30.0, estimate = "isocoulombic",
      source = BM, quality = "low",
    },
    {
      formula = "Ni2OH^3+", model = "logk",
      reaction = "2 Ni^2+ + H2O(l) = Ni2OH^3+ + H^+",
      logK = -10.7, estimate = "isocoulombic",
      source = BM, quality = "low",
    },
    {
      formula = "Ni4(OH)4^4+", model = "logk",
      reaction = "4 Ni^2+ + 4 H2O(l) = Ni4(OH)4^4+ + 4 H^+",
      logK = -27.74, estimate = "isocoulombic",
      source = BM, quality = "medium",
    },
    {
      formula = "NiO(s,bunsenite)", model = "cp",
      G = -211.7, H = -239.7, S = 37.99,
      cp = { a = 44.31, b = 0, c = 0 },
      source = NBS,
      quality = "medium",
      note = "cp: NBS Cp(298.15 K) only (a = Cp, b = c = 0); NiO has a magnetic Cp anomaly near 525 K that this ignores.",
    },
    {
      formula = "Ni(OH)2(s)", model = "cp",
      G = -447.2, H = -529.7, S = 88,
      estimate = { Cp = "kopp" }, -- no published Cp recalled: Kopp-Neumann (docs/thermo.md)
      source = NBS,
      quality = "medium",
      note = "Other compilations: dfH -538, S 79. Gives log K(Ni(OH)2 + 2H+ = Ni2+ + 2H2O) = 12.73; crystalline beta-Ni(OH)2 measured 11.67 +- 0.20 (ORNL; see docs). Cp not recalled: Kopp-Neumann estimate (Kopp's atomic heats).",
    },
    { -- issue 13: the higher oxide the published data allow
      formula = "NiO2(s)", model = "logk",
      reaction = "Ni^2+ + 2 H2O(l) = NiO2(s) + 4 H^+ + 2 e-",
      logK = -53.855, estimate = "isocoulombic",
      source = "derived here from E0(NiO2 + 4 H^+ + 2 e- = Ni^2+ + 2 H2O) = 1.593 V, [OPENSTAX] Appendix L Table L1 (read; values taken from the series of [CRC]): log K = -2 x 1.593 / 0.0591593",
      quality = "low",
      note = "Nickel(IV) oxide, the end member of the higher nickel oxo compounds: measured potentials of the charged nickel electrode behave as Ni(II)/Ni(IV) solid solutions and the beta-Ni(OH)2/beta-NiOOH system with z(Ni) < 3 as metastable (Balej and Divisek 1993, Ber. Bunsenges. Phys. Chem. 97, 929, abstract read), so no beta-NiOOH record: no dfG for it was read or is recalled with confidence. With the file's NiO its field lies 4 mV below the O2/H2O line at 25 C and above it at 100-300 C, i.e. where water itself is oxidised: it marks the nickel-electrode region, not a corrosion product of aerated water; kept in by default. The CRC alkaline couple NiO2/Ni(OH)2 (0.490 V, recalled) is 0.10 V above what this value and the NBS Ni(OH)2 give. No dH: temperature by the isocoulombic estimate.",
    },
  },
}
