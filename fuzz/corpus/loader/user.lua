-- Test fixture: a user override file (no element; exclude list; a replaced
-- species with the NBS values instead of the CODATA ones).
return {
  exclude = { "ZnO(s)" },
  species = {
    {
      formula = "Zn^2+", model = "hkf",
      G = -147.06, H = -153.89, S = -112.1,
      estimate = { Cp = 46 },
      source = "from memory of Wagman et al. 1982, NBS tables",
    },
  },
}
