-- Test fixture (deliberately bad): a reaction with one chloride too many (line 8).
return {
  element = "Cl",
  species = {
    {
      formula = "ZnCl^+",
      model = "logk",
      reaction = "Zn^2+ + 2 Cl^- = ZnCl^+",
      logK = 0.43,
      source = "from memory of Nordstrom et al. 1990, ACS Symp. Ser. 416",
    },
  },
}
