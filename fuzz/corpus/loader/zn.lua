-- Test fixture (phlox unit tests): a small, valid zinc file.
-- Values: CODATA key values (Cox, Wagman and Medvedev 1989) and the NBS
-- tables (Wagman et al. 1982), as rows of tests/reference/gibbs_25C.csv
-- (recalled there, "from memory of"); the constant Cp values are the 25 C
-- Cp of the NBS tables used as a one-term polynomial, for testing only.
local nbs = "from memory of Wagman et al. 1982, NBS tables (J. Phys. Chem. Ref. Data 11 Suppl. 2)"
local codata = "from memory of Cox, Wagman and Medvedev 1989, CODATA Key Values"

return {
  element = "Zn",
  title = "Zinc (test fixture)",
  units = { energy = "kJ", entropy = "J" },
  species = {
    {
      formula = "Zn(s)", model = "cp",
      G = 0, H = 0, S = 41.63,
      cp = { a = 25.40 },
      V = 9.16,
      T_range = { 273.15, 692.68 },
      source = nbs, quality = "high",
    },
    {
      formula = "Zn^2+", model = "hkf",
      G = -147.203, H = -153.39, S = -109.8,
      estimate = { Cp = 46 },
      source = codata .. "; Cp from " .. nbs,
    },
    {
      formula = "ZnO(s)", model = "cp",
      G = -320.479, H = -350.46, S = 43.65,
      cp = { a = 40.25 },
      source = codata,
      note = "zincite",
    },
  },
}
