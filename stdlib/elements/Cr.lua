-- stdlib/elements/Cr.lua: chromium, its ions, chromate species, hydrolysis species, oxide.
--
-- Data choice (see docs/data/transition-metals.md): Cr^3+ and Cr^2+ from the CRC
-- electrochemical series (their dfG agree with Shock et al. 1997 Cr3+ to 0.2 kJ/mol);
-- the enthalpy of Cr^3+ follows from that dfG and the Shock et al. 1997 entropy, so its
-- couples move with temperature; Cr^2+ has no recalled S, so its enthalpy and entropy come
-- from the isocoulombic estimate against the Co3+/Co2+ couple (flagged estimated);
-- Cr(VI) species and Cr2O3 from the NBS tables (Wagman et al. 1982); Cr(III)
-- hydrolysis from Baes and Mesmer 1976; amorphous Cr(OH)3 from the solubility study of
-- Rai, Sass and Moore 1987 (metastable; eskolaite is the default solid). No Cp is
-- recalled for any aqueous Cr species, so all are defined by reactions. Every number
-- below was recalled, not read.

local NBS = "from memory of [NBS82]"
local KELLEY = "cp from memory of [K60], converted from cal with 4.184"
local CRC = "from memory of [CRC]"
local SHOCK97 = "from memory of [SSWS97], cation table"
local BM = "from memory of [BM76] (I = 0, 25 C)"

return {
  element = "Cr",
  title = "Chromium",
  units = { energy = "kJ", entropy = "J" },
  species = {
    {
      formula = "Cr(s)", model = "cp",
      G = 0, H = 0, S = 23.77,
      cp = { a = 24.43, b = 9.874e-3, c = -3.682e5 },
      T_range = { 298.15, 1800 },
      source = NBS .. " (S); " .. KELLEY .. " (5.84 + 2.36e-3 T - 0.88e5/T^2 cal/(mol K))",
      quality = "high",
      note = "Polynomial gives Cp(298.15 K) = 23.24 J/(mol K) against NBS 23.35.",
    },
    {
      formula = "Cr^3+", model = "logk",
      reaction = "2 Cr(s) + 6 H^+ = 2 Cr^3+ + 3 H2(g)",
      logK = 75.457, dH = -511.37,
      source = "log K derived here from E0(Cr3+/Cr) = -0.744 V " .. CRC ..
               " (log K = 6 F E0/(RT ln10)); dH = 2 dfH(Cr3+), dfH derived here from that dfG and S(Cr3+) = -73.5 cal/(mol K) = -307.5 J/(mol K) " .. SHOCK97,
      quality = "medium",
      note = "dfG = -215.35 kJ/mol; Shock et al. 1997 give -51500 cal/mol = -215.48 kJ/mol (as recalled). dfS = S - S(Cr,s) + 1.5 S(H2,g) = -135.27 J/(mol K), so dfH = dfG + T dfS = -255.69 kJ/mol (-61.11 kcal/mol; a dfH near -61.2 kcal/mol also comes to mind for that table, a weak recall, within 0.4 kJ). Reaction entropy of the record -270.5 J/K. No Cp recalled for Cr3+ (and the HKF estimate path needs |Z| <= 2), so dCp = 0 (van 't Hoff): the error this leaves is small beside the 25 C hold it replaces (that hold implied a reaction entropy of +1445 J/K).",
    },
    {
      formula = "Cr^2+", model = "logk",
      reaction = "2 Cr^3+ + H2(g) = 2 Cr^2+ + 2 H^+",
      logK = -13.759,
      estimate = { method = "isocoulombic", model = "2 Co^3+ + H2(g) = 2 Co^2+ + 2 H^+" },
      source = "derived here from E0(Cr3+/Cr2+) = -0.407 V " .. CRC .. "; dH, S and Cp by the isocoulombic estimate (Gu, Gammons and Bloom 1994) with the Co3+/Co2+ couple of Co.lua as model reaction",
      quality = "medium",
      note = "Gives E0(Cr2+/Cr) = -0.913 V, as the CRC series lists. dfG = -176.08 kJ/mol (from the two CRC potentials). No S of Cr2+ is recalled and NBS 1982 gives only dfH = -143.5 kJ/mol (recalled), which with that dfG would need S = +3 J/(mol K), 100-140 above every other divalent 3d ion: the two do not belong together, so neither the NBS dfH nor an S is used. The temperature function is the isocoulombic estimate with a model reaction of the same charge type (Cr3+ + Co2+ = Cr2+ + Co3+ taken with dS = dCp = 0): S(Cr2+) - S(Cr3+) = S(Co2+) - S(Co3+) = 193.5 J/(mol K) (NBS 1982 Co ions), so S(Cr2+) = -114.0 J/(mol K) and dfH = -178.22 kJ/mol (closes dfG = dfH - T dfS with S(Cr,s) 23.77 and S(H2,g) 130.68 within 0.002 kJ/mol). The Fe3+/Fe2+ couple (Shock et al. 1997, 171.3 J/(mol K)) would be the closer model, but its Fe2+ has HKF parameters from correlations, which the method refuses as a model; it would give dE/dT 0.23 mV/K lower (60 mV at 300 C). Before this record had a model its couple kept dS = 0 (E(Cr3+/Cr2+) fixed at -0.407 V at every temperature).",
    },
    -- Cr(III) hydrolysis -----------------------------------------------------
    {
      formula = "CrOH^2+", model = "logk",
      reaction = "Cr^3+ + H2O(l) = CrOH^2+ + H^+",
      logK = -4.0, estimate = "isocoulombic",
      source = BM, quality = "medium",
    },
    {
      formula = "Cr(OH)2^+", model = "logk",
      reaction = "Cr^3+ + 2 H2O(l) = Cr(OH)2^+ + 2 H^+",
      logK = -9.7, estimate = "isocoulombic",
      source = BM, quality = "low",
    },
    {
      formula = "Cr(OH)3(aq)", model = "logk",
      reaction = "Cr^3+ + 3 H2O(l) = Cr(OH)3(aq) + 3 H^+",
      logK = -18.0, estimate = "isocoulombic",
      source = BM, quality = "low",
    },
    {
      formula = "Cr(OH)4^-", model = "logk",
      reaction = "Cr^3+ + 4 H2O(l) = Cr(OH)4^- + 4 H^+",
      logK = -27.4, estimate = "isocoulombic",
      source = BM, quality = "low",
      note = "The CrO2^- of older diagrams (same species less two H2O).",
    },
    {
      formula = "Cr2(OH)2^4+", model = "logk",
      reaction = "2 Cr^3+ + 2 H2O(l) = Cr2(OH)2^4+ + 2 H^+",
      logK = -5.06, estimate = "isocoulombic",
      source = BM, quality = "low",
    },
    {
      formula = "Cr3(OH)4^5+", model = "logk",
      reaction = "3 Cr^3+ + 4 H2O(l) = Cr3(OH)4^5+ + 4 H^+",
      logK = -8.15, estimate = "isocoulombic",
      source = BM, quality = "low",
    },
    -- Cr(VI) -----------------------------------------------------------------
    {
      formula = "CrO4^2-", model = "logk",
      reaction = "Cr(s) + 4 H2O(l) = CrO4^2- + 2 H^+ + 3 H2(g)",
      logK = -38.677, dH = 262.17,
      -- Cp: the formation reaction takes the dCp(T) of the same reaction of SO4^2-, whose
      -- HKF set is published (isocoulombic: the difference reaction keeps dCp = 0; model
      -- substance, Lindsay 1980); SO4^2- is the model by the rule of docs/thermo.md:
      -- S 50.21 J/(mol K) is closer to SO4^2- (18.8) than to CO3^2- (-49.3). Validation: docs/data-checks.md, "Single-ion heat capacities".
      estimate = { dCp = "isocoulombic", model = "S(s,rhombic) + 4 H2O(l) = SO4^2- + 2 H^+ + 3 H2(g)" },
      source = "derived here from " .. NBS .. ": CrO4^2- dfG -727.75, dfH -881.15 kJ/mol, S 50.21 J/(mol K)",
      quality = "high",
      note = "No Cp recalled; defined by its formation reaction, with the isocoulombic heat capacity above (dCp of the SO4^2- formation reaction).",
    },
    {
      formula = "HCrO4^-", model = "logk",
      reaction = "CrO4^2- + H^+ = HCrO4^-",
      logK = 6.473, dH = 2.95,
      source = "derived here from " .. NBS .. ": HCrO4^- dfG -764.7, dfH -878.2 kJ/mol, S 184.1 J/(mol K)",
      quality = "medium",
      note = "Measured pKa of HCrO4- is about 6.5 (6.51 as recalled), within 0.04.",
    },
    {
      formula = "Cr2O7^2-", model = "logk",
      reaction = "2 HCrO4^- = Cr2O7^2- + H2O(l)",
      logK = 1.547, dH = -19.73,
      source = "derived here from " .. NBS .. ": Cr2O7^2- dfG -1301.1, dfH -1490.3 kJ/mol, S 261.9 J/(mol K)",
      quality = "high",
      note = "Measured dimerisation constants are about 1.5 (recalled), within 0.05.",
    },
    -- oxide ------------------------------------------------------------------
    {
      formula = "Cr2O3(s,eskolaite)", model = "cp",
      G = -1058.1, H = -1139.7, S = 81.2,
      cp = { a = 118.74, b = 0, c = 0 },
      source = NBS,
      quality = "high",
      note = "cp: NBS Cp(298.15 K) only (a = Cp, b = c = 0). The stable Cr(III) solid and the default of every map; the hydrated oxide of the Pourbaix-era diagrams (dfG(Cr(OH)3) about -900 kJ/mol, behind the CRC -1.48 V of Cr(OH)3/Cr) is not used: it would be 5 log units less soluble than the measured amorphous solid below (docs/data).",
    },
    { -- issue 13
      formula = "Cr(OH)3(am)", model = "logk",
      reaction = "Cr(OH)3(am) + 3 H^+ = Cr^3+ + 3 H2O(l)",
      logK = 9.76,
      estimate = { method = "isocoulombic", model = "0.5 Cr2O3(s,eskolaite) + 3 H^+ = Cr^3+ + 1.5 H2O(l)" },
      source = "from memory of [RSM87] (solubility of freshly precipitated Cr(OH)3 at pH 3.8-14, 0.01 M NaClO4; abstract read at OSTI 6772597, the constant recalled)",
      quality = "low",
      note = "Amorphous Cr(III) hydroxide, the solid that precipitates from water at 25 C and stays amorphous (134 days in the paper). Metastable: 2.40 log units more soluble than 0.5 Cr2O3(s,eskolaite) (7.36 with the file's data), so an exact map draws it only when eskolaite is excluded (exclude = {\"Cr2O3(s,eskolaite)\"}, which the map's stamp names). No dH measured: temperature by the isocoulombic estimate with the eskolaite solubility as model reaction (Cr(OH)3(am) = 0.5 Cr2O3 + 1.5 H2O(l) taken with dS = dCp = 0; the S and Cp this implies for the solid, 145 and 172 J/(mol K), carry those of the 1.5 H2O(l) and are not the solid's own). With the file's Cr(VI) it gives E(CrO4^2-/Cr(OH)3) = -0.065 V against the CRC -0.13 V (docs/data/transition-metals.md).",
    },
  },
}
