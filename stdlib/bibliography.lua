-- stdlib/bibliography.lua: every publication the standard library cites,
-- each defined once.  Element files cite a publication by its key in
-- brackets inside a species' `source` text, and say there whether the value
-- was recalled ("from memory of [NBS82] (S)") or read ("[DIAKONOV99],
-- abstract read").  The loader checks every key against this table (or the
-- file's own `sources` table); `phlox list`, lib:references() and
-- docs/data-sources.md print the citations from here.
--
-- The citations themselves are written from memory: authors, year, journal,
-- volume and first page as recalled, titles only where recalled firmly.
-- `short` is the author-year form used where space is short.

return {
  title = "Publications cited by the standard library",
  sources = {
    NBS82 = {
      short = "NBS tables (Wagman et al. 1982)",
      cite = "Wagman, D. D., Evans, W. H., Parker, V. B., Schumm, R. H., Halow, I., Bailey, S. M., Churney, K. L. and Nuttall, R. L. (1982). The NBS tables of chemical thermodynamic properties. J. Phys. Chem. Ref. Data 11, Suppl. 2.",
    },
    CODATA89 = {
      short = "CODATA key values (Cox et al. 1989)",
      cite = "Cox, J. D., Wagman, D. D. and Medvedev, V. A. (1989). CODATA Key Values for Thermodynamics. Hemisphere, New York.",
    },
    RH95 = {
      short = "Robie and Hemingway 1995",
      cite = "Robie, R. A. and Hemingway, B. S. (1995). Thermodynamic properties of minerals and related substances at 298.15 K and 1 bar (10^5 pascals) pressure and at higher temperatures. U.S. Geological Survey Bulletin 2131.",
    },
    HRA91 = {
      short = "Hemingway et al. 1991",
      cite = "Hemingway, B. S., Robie, R. A. and Apps, J. A. (1991). Boehmite and related phases in the system Al-H-O (American Mineralogist 76; title and pages not recalled).",
    },
    PW92 = {
      short = "Palmer and Wesolowski 1992",
      cite = "Palmer, D. A. and Wesolowski, D. J. (1992). Aluminum speciation and equilibria in aqueous solution: II. The solubility of gibbsite in acidic sodium chloride solutions from 30 to 70 C. Geochim. Cosmochim. Acta 56, 1093-1111 (abstract read at OSTI 7235603).",
    },
    WES92 = {
      short = "Wesolowski 1992",
      cite = "Wesolowski, D. J. (1992). Aluminum speciation and equilibria in aqueous solution: I. The solubility of gibbsite in the system Na-K-Cl-OH-Al(OH)4 from 0 to 100 C. Geochim. Cosmochim. Acta 56, 1065 (abstract read at OSTI 7278378, which names neither author nor volume and page: those are recalled).",
    },
    K60 = {
      short = "Kelley 1960",
      cite = "Kelley, K. K. (1960). Contributions to the data on theoretical metallurgy XIII: High-temperature heat-content, heat-capacity and entropy data for the elements and inorganic compounds. U.S. Bureau of Mines Bulletin 584.",
    },
    HDNB78 = {
      short = "Helgeson et al. 1978",
      cite = "Helgeson, H. C., Delany, J. M., Nesbitt, H. W. and Bird, D. K. (1978). Summary and critique of the thermodynamic properties of rock-forming minerals. American Journal of Science 278-A.",
    },
    SH88 = {
      short = "Shock and Helgeson 1988",
      cite = "Shock, E. L. and Helgeson, H. C. (1988). Calculation of the thermodynamic and transport properties of aqueous species at high pressures and temperatures: Correlation algorithms for ionic species and equation of state predictions to 5 kb and 1000 C. Geochim. Cosmochim. Acta 52, 2009-2036.",
    },
    SHS89 = {
      short = "Shock et al. 1989",
      cite = "Shock, E. L., Helgeson, H. C. and Sverjensky, D. A. (1989). Calculation of the thermodynamic and transport properties of aqueous species at high pressures and temperatures: Standard partial molal properties of inorganic neutral species. Geochim. Cosmochim. Acta 53, 2157-2183.",
    },
    SSWS97 = {
      short = "Shock et al. 1997",
      cite = "Shock, E. L., Sassani, D. C., Willis, M. and Sverjensky, D. A. (1997). Inorganic species in geologic fluids: Correlations among standard molal thermodynamic properties of aqueous ions and hydroxide complexes. Geochim. Cosmochim. Acta 61, 907-950.",
    },
    IAPWS95 = {
      short = "Wagner and Pruss 2002",
      cite = "Wagner, W. and Pruss, A. (2002). The IAPWS formulation 1995 for the thermodynamic properties of ordinary water substance for general and scientific use. J. Phys. Chem. Ref. Data 31, 387-535.",
    },
    BM76 = {
      short = "Baes and Mesmer 1976",
      cite = "Baes, C. F. and Mesmer, R. E. (1976). The Hydrolysis of Cations. Wiley, New York.",
    },
    BE16 = {
      short = "Brown and Ekberg 2016",
      cite = "Brown, P. L. and Ekberg, C. (2016). Hydrolysis of Metal Ions. Wiley-VCH, Weinheim (the Al and Ba constants read in the Wikipedia table 'Hydrolysis constant', which also lists the Baes and Mesmer 1976 and Hummel and Thoenen 2023 values).",
    },
    STIPP93 = {
      short = "Stipp et al. 1993",
      cite = "Stipp, S. L., Parks, G. A., Nordstrom, D. K. and Leckie, J. O. Solubility-product constant and thermodynamic properties for synthetic otavite, CdCO3(s), and aqueous association constants for the Cd(II)-CO2-H2O system. Geochim. Cosmochim. Acta (1992 or 1993; volume and pages not recalled).",
    },
    PG02 = {
      short = "Preis and Gamsjaeger 2002",
      cite = "Preis, W. and Gamsjaeger, H. (2002). Solid-solute phase equilibria in aqueous solution. XVI. Thermodynamic properties of malachite and azurite - predominance diagrams for the system Cu2+-H2O-CO2. J. Chem. Thermodyn. (doi 10.1006/jcht.2002.0928; abstract read).",
    },
    N90 = {
      short = "Nordstrom et al. 1990",
      cite = "Nordstrom, D. K., Plummer, L. N., Langmuir, D., Busenberg, E., May, H. M., Jones, B. F. and Parkhurst, D. L. (1990). Revised chemical equilibrium data for major water-mineral reactions and their limitations. In: Chemical Modeling of Aqueous Systems II, ACS Symposium Series 416, 398-413.",
    },
    COMPILED = {
      short = "compiled I = 0 constants (Nordstrom et al. 1990 era)",
      cite = "I = 0 constants compiled (largely from Smith and Martell) in the aqueous data sets of the Nordstrom et al. 1990 era; the primary paper of each constant was not recalled.",
    },
    SM = {
      short = "Smith and Martell 1974-1989",
      cite = "Smith, R. M. and Martell, A. E. Critical Stability Constants, vols. 1-6. Plenum, New York (1974-1989).",
    },
    PB82 = {
      short = "Plummer and Busenberg 1982",
      cite = "Plummer, L. N. and Busenberg, E. (1982). The solubilities of calcite, aragonite and vaterite in CO2-H2O solutions between 0 and 90 C, and an evaluation of the aqueous model for the system CaCO3-CO2-H2O. Geochim. Cosmochim. Acta 46, 1011-1040.",
    },
    SH77 = {
      short = "Siebert and Hostetler 1977",
      cite = "Siebert, R. M. and Hostetler, P. B. (1977). American Journal of Science 277, 697 (the magnesium bicarbonate and carbonate ion pairs, 10-90 C).",
    },
    BJ41 = {
      short = "Bjerrum 1941",
      cite = "Bjerrum, J. (1941). Metal Ammine Formation in Aqueous Solution. P. Haase and Son, Copenhagen.",
    },
    CHUGHTAI68 = {
      short = "Chughtai et al. 1968",
      cite = "Chughtai, A., Marshall, R. and Nancollas, G. H. (1968). J. Phys. Chem. 72, 208 (complexes in calcium phosphate solutions).",
    },
    GMB70 = {
      short = "Gregory et al. 1970",
      cite = "Gregory, T. M., Moreno, E. C. and Brown, W. E. (1970). J. Res. Natl. Bur. Stand. 74A, 461 (solubility of brushite).",
    },
    MGB77 = {
      short = "McDowell et al. 1977",
      cite = "McDowell, H., Gregory, T. M. and Brown, W. E. (1977). J. Res. Natl. Bur. Stand. 81A, 273 (solubility of hydroxyapatite).",
    },
    NRIAGU72 = {
      short = "Nriagu 1972",
      cite = "Nriagu, J. O. (1972). Geochim. Cosmochim. Acta 36, 459 (stability of vivianite and strengite).",
    },
    RICKARD06 = {
      short = "Rickard 2006",
      cite = "Rickard, D. (2006). The solubility of FeS. Geochim. Cosmochim. Acta 70, 5779.",
    },
    BWB00 = {
      short = "Benning et al. 2000",
      cite = "Benning, L. G., Wilkin, R. T. and Barnes, H. L. (2000). Reaction pathways in the Fe-S system below 100 C. Chemical Geology 167, 25-51 (authors, title, journal and pages as recalled; the abstract was read).",
    },
    LUTHER96 = {
      short = "Luther et al. 1996",
      cite = "Luther, G. W., Rickard, D. T., Theberge, S. and Olroyd, A. (1996). Determination of metal (bi)sulfide stability constants of Mn2+, Fe2+, Co2+, Ni2+, Cu2+, and Zn2+ by voltammetric methods. Environ. Sci. Technol. 30, 671-679.",
    },
    CC64 = {
      short = "Criss and Cobble 1964",
      cite = "Criss, C. M. and Cobble, J. W. (1964). The thermodynamic properties of high temperature aqueous solutions. IV and V: Entropies of the ions up to 200 C and the correspondence principle; the calculation of ionic heat capacities up to 200 C. J. Am. Chem. Soc. 86, 5385-5390 and 5390-5393 (titles as recalled).",
    },
    MIGDISOV02 = {
      short = "Migdisov et al. 2002",
      cite = "Migdisov, A. A., Williams-Jones, A. E., Lakshtanov, L. Z. and Alekhin, Y. V. (2002). Geochim. Cosmochim. Acta 66, 1713 (second dissociation constant of H2S).",
    },
    MORRIS66 = {
      short = "Morris 1966",
      cite = "Morris, J. C. (1966). J. Phys. Chem. 70, 3798 (acid ionization constant of HOCl).",
    },
    BRUNO92 = {
      short = "Bruno et al. 1992",
      cite = "Bruno, J., Wersin, P. and Stumm, W. (1992). Geochim. Cosmochim. Acta 56 (solubility of siderite at 25 C; pages not recalled).",
    },
    DIAKONOV99 = {
      short = "Diakonov et al. 1999",
      cite = "Diakonov, I. I., Schott, J., Martin, F., Harrichourry, J.-C. and Escalier, J. (1999). Iron(III) solubility and speciation in aqueous solutions. Experimental study and modelling: part 1. Hematite solubility from 60 to 300 C in NaOH-NaCl solutions and thermodynamic properties of Fe(OH)4-(aq). Geochim. Cosmochim. Acta 63, 2247-2261.",
    },
    SERGEEVA99 = {
      short = "Sergeeva et al. 1999",
      cite = "Sergeeva, E. I., Suleimenov, O. M., Evstigneev, A. V. and Khodakovsky, I. L. (1999). Solubility of hematite, Fe2O3(cr, alpha), at 200 C and the standard entropy of the Fe3+ ion in aqueous solution. Geokhimiya 37 (11), 1218-1229.",
    },
    RSM87 = {
      short = "Rai, Sass and Moore 1987",
      cite = "Rai, D., Sass, B. M. and Moore, D. A. (1987). Chromium(III) hydrolysis constants and solubility of chromium(III) hydroxide. Inorganic Chemistry 26, 345.",
    },
    NEA05NI = {
      short = "Gamsjaeger et al. 2005 (NEA-TDB nickel)",
      cite = "Gamsjaeger, H., Bugajski, J., Gajda, T., Lemire, R. J. and Preis, W. (2005). Chemical Thermodynamics of Nickel. Chemical Thermodynamics vol. 6, OECD Nuclear Energy Agency / Elsevier, Amsterdam.",
    },
    POWELL05 = {
      short = "Powell et al. 2005",
      cite = "Powell, K. J., Brown, P. L., Byrne, R. H., Gajda, T., Hefter, G., Sjoberg, S. and Wanner, H. (2005). Chemical speciation of environmentally significant heavy metals with inorganic ligands. Part 1: The Hg2+-Cl-, OH-, CO32-, SO42-, and PO43- aqueous systems (IUPAC Technical Report). Pure Appl. Chem. 77, 739-800.",
    },
    ANDERSSON08 = {
      short = "Andersson et al. 2008",
      cite = "Andersson, M. E., Gaardfeldt, K., Waengberg, I. and Stroemberg, D. (2008). Determination of Henry's law constant for elemental mercury. Chemosphere 73, 587-592; as tabulated in Sander, R. (2023). Compilation of Henry's law constants (version 5.0.0) for water as solvent. Atmos. Chem. Phys. 23, 10901-12440.",
    },
    MH06 = {
      short = "Marsden and House 2006",
      cite = "Marsden, J. O. and House, C. I. (2006). The Chemistry of Gold Extraction, 2nd ed. Society for Mining, Metallurgy and Exploration, Littleton.",
    },
    OPENSTAX = {
      short = "OpenStax Chemistry 2e (Flowers et al. 2019)",
      cite = "Flowers, P., Theopold, K., Langley, R. and Robinson, W. R. (2019). Chemistry 2e. OpenStax, Houston. Appendices K (solubility products) and L (standard electrode potentials, reprinted from the CRC Handbook series).",
    },
    POWELL07 = {
      short = "Powell et al. 2007",
      cite = "Powell, K. J., Brown, P. L., Byrne, R. H., Gajda, T., Hefter, G., Sjoberg, S. and Wanner, H. (2007). Chemical speciation of environmentally significant metals with inorganic ligands. Part 2: The Cu2+-OH-, Cl-, CO32-, SO42-, and PO43- systems (IUPAC Technical Report). Pure Appl. Chem. 79, 895-950.",
    },
    CRC = {
      short = "Vanysek, CRC Handbook",
      cite = "Vanysek, P. Electrochemical Series. In: CRC Handbook of Chemistry and Physics (CRC Press, various editions).",
    },
    BPJ85 = {
      short = "Bard, Parsons and Jordan 1985",
      cite = "Bard, A. J., Parsons, R. and Jordan, J. (eds.) (1985). Standard Potentials in Aqueous Solution. IUPAC, Marcel Dekker, New York.",
    },
    MBS72 = {
      short = "Mesmer et al. 1972",
      cite = "Mesmer, R. E., Baes, C. F. and Sweeton, F. H. (1972). Acidity measurements at elevated temperatures. VI. Boric acid equilibria. Inorganic Chemistry 11, 537.",
    },
    RA87 = {
      short = "Reardon and Armstrong 1987",
      cite = "Reardon, E. J. and Armstrong, D. K. (1987). Celestite (SrSO4(s)) solubility in water, seawater and NaCl solution. Geochim. Cosmochim. Acta 51, 63.",
    },
    BLOUNT77 = {
      short = "Blount 1977",
      cite = "Blount, C. W. (1977). Barite solubilities and thermodynamic quantities up to 300 C and 1400 bars. American Mineralogist 62, 942.",
    },
    BPP84 = {
      short = "Busenberg et al. 1984",
      cite = "Busenberg, E., Plummer, L. N. and Parker, V. B. (1984). The solubility of strontianite (SrCO3) in CO2-H2O solutions between 2 and 91 C, ... Geochim. Cosmochim. Acta 48, 2021.",
    },
    BP86 = {
      short = "Busenberg and Plummer 1986",
      cite = "Busenberg, E. and Plummer, L. N. (1986). The solubility of BaCO3(cr) (witherite) in CO2-H2O solutions between 0 and 90 C, ... Geochim. Cosmochim. Acta 50, 2225.",
    },
    -- s5-solids (issue 13: independent checks of solids, pyrrhotite, molybdenite, jarosite)
    BC87 = {
      short = "Bartovska and Cerny 1987",
      cite = "Bartovska, L. and Cerny, C. (1987). The influence of the structure of molybdenum disulphide on its reactivity. Collect. Czech. Chem. Commun. 52, 678-685 (abstract read at cccc.uochb.cas.cz).",
    },
    BP96 = {
      short = "Baron and Palmer 1996",
      cite = "Baron, D. and Palmer, C. D. (1996). Solubility of jarosite at 4-35 C. Geochim. Cosmochim. Acta 60, 185-195 (abstract and introduction read).",
    },
    TSIV = {
      short = "Gurvich et al., IVTANTHERMO tables",
      cite = "Gurvich, L. V., Veyts, I. V. et al. Thermodynamic Properties of Individual Substances (IVTANTHERMO), iron section as published online by ChemNet, Moscow State University (www.chem.msu.ru/rus/tsiv/Fe/; table Fe.37, 'choice of the enthalpy of formation of Fe0.875S', read; editors and edition not shown there).",
    },
    GS92 = {
      short = "Gronvold and Stolen 1992",
      cite = "Gronvold, F. and Stolen, S. (1992). Thermodynamics of iron sulfides II. Heat capacity and thermodynamic properties of FeS and of Fe0.875S at temperatures from 298.15 K to 1000 K (title recalled in part). J. Chem. Thermodyn. 24, 913 (recalled).",
    },
    BZ23 = {
      short = "Bazarkina et al. 2023",
      cite = "Bazarkina, E. F., Zotov, A. V., Chareev, D. A., Truche, L. and Tarnopolskaya, M. E. (2023). Cadmium behavior in sulfur-bearing aqueous environments: insight from CdS solubility measurements at 25-80 C. Geology of Ore Deposits 65, 28-43 (abstract read).",
    },
    AT94 = {
      short = "Al-Borno and Tomson 1994",
      cite = "Al-Borno, A. and Tomson, M. B. (1994). The temperature dependence of the solubility product constant of vivianite. Geochim. Cosmochim. Acta 58, 5373 (abstract read at discovery.researcher.life, which does not show authors or journal: those are recalled).",
    },
    -- s5-fe (issue 13): iron solids by their measured solubility
    BDH09 = {
      short = "Benezeth et al. 2009",
      cite = "Benezeth, P., Dandurand, J. L. and Harrichoury, J. C. (2009). Solubility product of siderite (FeCO3) as a function of temperature (25-250 C). Chemical Geology 265, 3-12.",
    },
    L69 = {
      short = "Langmuir 1969",
      cite = "Langmuir, D. (1969). The Gibbs free energies of substances in the system Fe-O2-H2O-CO2 at 25 C. U.S. Geological Survey Professional Paper 650-B (pages not recalled).",
    },
    BS01 = {
      short = "Boyd and Scott 2001",
      cite = "Boyd, T. and Scott, S. D. (2001). Microbial and hydrothermal aspects of ferric oxyhydroxides and ferrosic hydroxides: the example of Franklin Seamount, Western Woodlark Basin, Papua New Guinea. Geochemical Transactions 2, 45 (authors recalled; Table 2 read: Gibbs energies of iron oxyhydroxides after several compilations).",
    },
    -- s5-lig (issue 13): sources read for the complex and ion-pair records
    HARVEY21 = {
      short = "Harvey, Analytical Chemistry 2.1",
      cite = "Harvey, D. (2021). Analytical Chemistry 2.1, Appendix 16.12: Formation Constants (LibreTexts, chem.libretexts.org). Stepwise and cumulative constants of metal-ligand complexes taken from Martell, A. E. and Smith, R. M., Critical Stability Constants, vols. 1-4 (Plenum, 1976); 25 C and zero ionic strength unless the table says otherwise.",
    },
    LM07 = {
      short = "Luo and Millero 2007",
      cite = "Luo, Y. and Millero, F. J. (2007). Stability constants for the formation of lead chloride complexes as a function of temperature and ionic strength. Geochim. Cosmochim. Acta 71, 326-334.",
    },
    -- s5-fes2 (issue 13): the iron sulfides on one calorimetric basis
    CK88 = {
      short = "Cemic and Kleppa 1988",
      cite = "Cemic, L. and Kleppa, O. J. (1988). High temperature calorimetry of sulfide systems III. Standard enthalpies of formation of phases in the systems Fe-Cu-S and Co-S. Phys. Chem. Minerals 16, 172-179 (abstract read at rd.springer.com: troilite -102.59 +- 0.20, pyrite -171.64 +- 0.93 kJ/mol, direct reaction calorimetry at 700-1021 K).",
    },
    -- s5-mg (issues 12, 13): Mg hydrolysis by measurement; cerussite evidence
    BS82 = {
      short = "Bilinski and Schindler 1982",
      cite = "Bilinski, H. and Schindler, P. (1982). Solubility and equilibrium constants of lead in carbonate solutions (25 C, I = 0.3 mol dm-3). Geochim. Cosmochim. Acta 46, 921-928 (abstract read: td.alljournals.com.cn).",
    },
    PW97 = {
      short = "Palmer and Wesolowski 1997",
      cite = "Palmer, D. A. and Wesolowski, D. J. (1997). Potentiometric measurements of the first hydrolysis quotient of magnesium(II) to 250 C and 5 molal ionic strength (NaCl). J. Solution Chem. 26(2), 217-232 (abstract read: acnpsearch.tweb-dev.unibo.it, ISI record).",
    },
    CONVENTION = {
      short = "standard-state convention",
      cite = "Conventions of the conventional ionic standard state (all properties of H+ zero at every T and P; e- = H+ - 1/2 H2(g)).",
    },
  },
}
