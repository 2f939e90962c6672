-- tests/tools/sources_def.lua: the publications the standard library's
-- element files cite, and how to recognise each in a species' `source`
-- text.  Shared by the generator of docs/data-sources.md
-- (tests/tools/data_checks.lua, which also writes docs/data-checks.md) and the test tests/scripts/test_stdlib_docs.lua.
--
-- The species lists are not written by hand: they come from the loaded
-- library (phlox.library over every element file; lib:list() gives each
-- record's source text and file).  A species may cite several publications
-- (dfG from one table, Cp from another, V from a third).  Every species must
-- match at least one entry here; the test fails otherwise, so a new citation
-- gets an entry (and a line in the document) before it can land.
--
-- API: defs.SOURCES (list), defs.match(source_text) -> list of ids,
--      defs.collect(phlox) -> data, defs.render(data) -> markdown text.

local M = {}

local function has(s, ...)
  for _, p in ipairs({ ... }) do
    if s:find(p, 1, true) then return true end
  end
  return false
end

-- id, citation, what the files take from it, matcher(source text).  The
-- citations are written from memory (authors, year, journal, volume and first
-- page as the element files give them; titles only where recalled firmly).
M.SOURCES = {
  { id = "NBS82", cite = "Wagman, D. D., Evans, W. H., Parker, V. B., Schumm, R. H., Halow, I., Bailey, S. M., Churney, K. L. and Nuttall, R. L. (1982). The NBS tables of chemical thermodynamic properties. J. Phys. Chem. Ref. Data 11, Suppl. 2.",
    use = "dfG, dfH, S and Cp at 25 C of most solids, gases and several ions; log K and dH of ions and oxyanions derived from its dfG/dfH; built-in H2O(l) at 25 C. Recalled, except a few values confirmed in a CRC or OpenStax reprint (the record says so).",
    match = function(s) return has(s, "Wagman et al. 1982", "NBS tables") end },
  { id = "CODATA89", cite = "Cox, J. D., Wagman, D. D. and Medvedev, V. A. (1989). CODATA Key Values for Thermodynamics. Hemisphere, New York.",
    use = "dfH and S of key ions, oxides and gases (dfG derived as dfH - T dfS); S of elements. A few dfH and S were read in a reprint of the CODATA table (the record says so); the rest are recalled.",
    match = function(s) return has(s, "Cox, Wagman and Medvedev 1989", "CODATA Key Values", "(CODATA)") end },
  { id = "RH95", cite = "Robie, R. A. and Hemingway, B. S. (1995). Thermodynamic properties of minerals and related substances at 298.15 K and 1 bar (10^5 pascals) pressure and at higher temperatures. U.S. Geological Survey Bulletin 2131.",
    use = "dfH, S (and dfG) of some minerals and molar volumes of minerals. Recalled.",
    match = function(s) return has(s, "Robie and Hemingway 1995") end },
  { id = "HRA91", cite = "Hemingway, B. S., Robie, R. A. and Apps, J. A. (1991). Boehmite and related phases in the system Al-H-O (American Mineralogist 76; title and pages not recalled).",
    use = "boehmite (as tabulated by Robie and Hemingway 1995). Recalled.",
    match = function(s) return has(s, "Hemingway, Robie and Apps 1991") end },
  { id = "K60", cite = "Kelley, K. K. (1960). Contributions to the data on theoretical metallurgy XIII: High-temperature heat-content, heat-capacity and entropy data for the elements and inorganic compounds. U.S. Bureau of Mines Bulletin 584.",
    use = "Maier-Kelley heat-capacity coefficients (cal, converted with 4.184) of metals, oxides and gases. Recalled; each fit was held against the NBS Cp at 25 C (docs/data/*.md).",
    match = function(s) return has(s, "Kelley 1960") end },
  { id = "HDNB78", cite = "Helgeson, H. C., Delany, J. M., Nesbitt, H. W. and Bird, D. K. (1978). Summary and critique of the thermodynamic properties of rock-forming minerals. American Journal of Science 278-A.",
    use = "Maier-Kelley heat-capacity coefficients of some minerals (sulfides, sulfates, magnesite). Recalled.",
    match = function(s) return has(s, "Helgeson, Delany, Nesbitt and Bird 1978") end },
  { id = "SH88", cite = "Shock, E. L. and Helgeson, H. C. (1988). Calculation of the thermodynamic and transport properties of aqueous species at high pressures and temperatures: Correlation algorithms for ionic species and equation of state predictions to 5 kb and 1000 C. Geochim. Cosmochim. Acta 52, 2009-2036.",
    use = "revised-HKF parameters and dfG, dfH, S of aqueous ions, recalled from the paper's tables; its correlations also estimate HKF parameters from Cp (and V) for the `estimate` records.",
    match = function(s) return has(s, "Shock and Helgeson 1988") end },
  { id = "SHS89", cite = "Shock, E. L., Helgeson, H. C. and Sverjensky, D. A. (1989). Calculation of the thermodynamic and transport properties of aqueous species at high pressures and temperatures: Standard partial molal properties of inorganic neutral species. Geochim. Cosmochim. Acta 53, 2157-2183.",
    use = "revised-HKF parameters of neutral aqueous species, recalled from the paper's tables.",
    match = function(s) return has(s, "Shock, Helgeson and Sverjensky 1989") end },
  { id = "SSWS97", cite = "Shock, E. L., Sassani, D. C., Willis, M. and Sverjensky, D. A. (1997). Inorganic species in geologic fluids: Correlations among standard molal thermodynamic properties of aqueous ions and hydroxide complexes. Geochim. Cosmochim. Acta 61, 907-950.",
    use = "Fe2+ (complete HKF set) and the dfG/dfH/S from which Fe3+ is defined. Recalled.",
    match = function(s) return has(s, "Shock, Sassani, Willis and Sverjensky 1997") end },
  { id = "IAPWS95", cite = "Wagner, W. and Pruss, A. (2002). The IAPWS formulation 1995 for the thermodynamic properties of ordinary water substance for general and scientific use. J. Phys. Chem. Ref. Data 31, 387-535.",
    use = "G(T,P) - G(Tr,Pr) of the built-in H2O(l).",
    match = function(s) return has(s, "IAPWS-95", "Wagner and Pruss 2002") end },
  { id = "BM76", cite = "Baes, C. F. and Mesmer, R. E. (1976). The Hydrolysis of Cations. Wiley, New York.",
    use = "hydrolysis constants at I = 0 and 25 C (mononuclear and polynuclear) of every metal. Recalled; the Al constants also appear in the Wikipedia table 'Hydrolysis constant' (read).",
    match = function(s) return has(s, "Baes and Mesmer 1976") end },
  { id = "N90", cite = "Nordstrom, D. K., Plummer, L. N., Langmuir, D., Busenberg, E., May, H. M., Jones, B. F. and Parkhurst, D. L. (1990). Revised chemical equilibrium data for major water-mineral reactions and their limitations. In: Chemical Modeling of Aqueous Systems II, ACS Symposium Series 416, 398-413.",
    use = "log K and dH of complexes and minerals, and dH of several hydrolysis reactions. Recalled.",
    match = function(s) return has(s, "Nordstrom, Plummer, Langmuir", "Nordstrom et al. 1990 (", "Nordstrom et al. 1990,", "Nordstrom et al. 1990)") end },
  { id = "COMPILED", cite = "I = 0 constants compiled (largely from Smith and Martell) in the aqueous data sets of the Nordstrom et al. 1990 era; the primary paper of each constant was not recalled.",
    use = "stability constants of many chloro, sulfato, carbonato and fluoro complexes and a few mineral solubility constants. Recalled; the records say that the attribution is incomplete.",
    match = function(s) return has(s, "1990-era", "compiled mineral solubility constants", "USGS compilations after Nordstrom") end },
  { id = "SM", cite = "Smith, R. M. and Martell, A. E. Critical Stability Constants, vols. 1-6. Plenum, New York (1974-1989).",
    use = "acid constants (H3PO4, HPO4^2-, HMoO4-) and copper complexes at I = 0, 25 C; also the compilation behind the Bjerrum ammine constants and many compiled constants above. Recalled.",
    match = function(s) return has(s, "Smith and Martell") end },
  { id = "PB82", cite = "Plummer, L. N. and Busenberg, E. (1982). The solubilities of calcite, aragonite and vaterite in CO2-H2O solutions between 0 and 90 C, and an evaluation of the aqueous model for the system CaCO3-CO2-H2O. Geochim. Cosmochim. Acta 46, 1011-1040.",
    use = "analytic log K(T) of calcite, aragonite, CaHCO3+ and CaCO3(aq), 0-90 C. Coefficients recalled; they reproduce the published 25 C values (abstract read, see log_k_25C.csv).",
    match = function(s) return has(s, "Plummer and Busenberg 1982") end },
  { id = "SH77", cite = "Siebert, R. M. and Hostetler, P. B. (1977). American Journal of Science 277, 697 (the magnesium bicarbonate and carbonate ion pairs, 10-90 C).",
    use = "MgHCO3+ and MgCO3(aq) log K(T), as adopted by Nordstrom et al. 1990. Recalled.",
    match = function(s) return has(s, "Siebert and Hostetler 1977") end },
  { id = "BJ41", cite = "Bjerrum, J. (1941). Metal Ammine Formation in Aqueous Solution. P. Haase and Son, Copenhagen.",
    use = "stepwise ammine constants (2 mol/L NH4NO3, 30 C; not I = 0 and 25 C, as every record says). Recalled.",
    match = function(s) return has(s, "Bjerrum 1941") end },
  { id = "CHUGHTAI68", cite = "Chughtai, A., Marshall, R. and Nancollas, G. H. (1968). J. Phys. Chem. 72, 208 (complexes in calcium phosphate solutions).",
    use = "Ca-phosphate complexes. Recalled.",
    match = function(s) return has(s, "Chughtai, Marshall and Nancollas 1968") end },
  { id = "GMB70", cite = "Gregory, T. M., Moreno, E. C. and Brown, W. E. (1970). J. Res. Natl. Bur. Stand. 74A, 461 (solubility of brushite).",
    use = "brushite solubility. Recalled.",
    match = function(s) return has(s, "Gregory, Moreno and Brown 1970") end },
  { id = "MGB77", cite = "McDowell, H., Gregory, T. M. and Brown, W. E. (1977). J. Res. Natl. Bur. Stand. 81A, 273 (solubility of hydroxyapatite).",
    use = "hydroxyapatite solubility product (recalled; an abstract read brackets it).",
    match = function(s) return has(s, "McDowell, Gregory and Brown 1977") end },
  { id = "NRIAGU72", cite = "Nriagu, J. O. (1972). Geochim. Cosmochim. Acta 36, 459 (stability of vivianite and strengite).",
    use = "strengite and vivianite solubility. Recalled.",
    match = function(s) return has(s, "Nriagu 1972") end },
  { id = "RICKARD06", cite = "Rickard, D. (2006). The solubility of FeS. Geochim. Cosmochim. Acta 70, 5779.",
    use = "mackinawite solubility. Recalled.",
    match = function(s) return has(s, "Rickard 2006") end },
  { id = "BWB00", cite = "Benning, L. G., Wilkin, R. T. and Barnes, H. L. (2000). Reaction pathways in the Fe-S system below 100 C. Chemical Geology 167, 25-51 (authors, title, journal and pages as recalled; the abstract was read).",
    use = "mackinawite solubility FeS + 2 H+ = Fe2+ + H2S(aq) from 25 to 95 C: log K = 2848.779/T - 6.347. Read in the abstract.",
    match = function(s) return has(s, "Benning, Wilkin and Barnes 2000") end },
  { id = "LUTHER96", cite = "Luther, G. W., Rickard, D. T., Theberge, S. and Olroyd, A. (1996). Determination of metal (bi)sulfide stability constants of Mn2+, Fe2+, Co2+, Ni2+, Cu2+, and Zn2+ by voltammetric methods. Environ. Sci. Technol. 30, 671-679.",
    use = "log K of Fe2+ + HS- = FeHS+ (5.07, I = 0). The abstract was read (it names the complexes); the constant is recalled.",
    match = function(s) return has(s, "Luther, Rickard, Theberge and Olroyd 1996") end },
  { id = "CC64", cite = "Criss, C. M. and Cobble, J. W. (1964). The thermodynamic properties of high temperature aqueous solutions. IV and V: Entropies of the ions up to 200 C and the correspondence principle; the calculation of ionic heat capacities up to 200 C. J. Am. Chem. Soc. 86, 5385-5390 and 5390-5393 (titles as recalled).",
    use = "estimated reaction heat capacity of Fe3+ against Fe2+ (correspondence principle, cation parameters for 25-200 C). Recalled.",
    match = function(s) return has(s, "Criss and Cobble 1964") end },
  { id = "MIGDISOV02", cite = "Migdisov, A. A., Williams-Jones, A. E., Lakshtanov, L. Z. and Alekhin, Y. V. (2002). Geochim. Cosmochim. Acta 66, 1713 (second dissociation constant of H2S).",
    use = "second dissociation constant of H2S (S^2-). Recalled.",
    match = function(s) return has(s, "Migdisov") end },
  { id = "MORRIS66", cite = "Morris, J. C. (1966). J. Phys. Chem. 70, 3798 (acid ionization constant of HOCl).",
    use = "pKa of HClO. Recalled.",
    match = function(s) return has(s, "Morris 1966") end },
  { id = "BRUNO92", cite = "Bruno, J., Wersin, P. and Stumm, W. (1992). Geochim. Cosmochim. Acta 56 (solubility of siderite at 25 C; pages not recalled).",
    use = "siderite log Ksp (as adopted by Nordstrom et al. 1990-era tables). Recalled.",
    match = function(s) return has(s, "Bruno et al. 1992") end },
  { id = "DIAKONOV99", cite = "Diakonov, I. I., Schott, J., Martin, F., Harrichourry, J.-C. and Escalier, J. (1999). Iron(III) solubility and speciation in aqueous solutions. Experimental study and modelling: part 1. Hematite solubility from 60 to 300 C in NaOH-NaCl solutions and thermodynamic properties of Fe(OH)4-(aq). Geochim. Cosmochim. Acta 63, 2247-2261.",
    use = "dfG of Fe(OH)4^- at 25 C (-201.97 kcal/mol, extrapolated from hematite solubility to 300 C). Read in the abstract.",
    match = function(s) return has(s, "Diakonov") end },
  { id = "SERGEEVA99", cite = "Sergeeva, E. I., Suleimenov, O. M., Evstigneev, A. V. and Khodakovsky, I. L. (1999). Solubility of hematite, Fe2O3(cr, alpha), at 200 C and the standard entropy of the Fe3+ ion in aqueous solution. Geokhimiya 37 (11), 1218-1229.",
    use = "log K at 200 C of hematite dissolution to Fe(OH)4^- (and to Fe3+ and FeOH2+, used as checks). Read in the abstract.",
    match = function(s) return has(s, "Sergeeva") end },
  { id = "POWELL07", cite = "Powell, K. J., Brown, P. L., Byrne, R. H., Gajda, T., Hefter, G., Sjoberg, S. and Wanner, H. (2007). Chemical speciation of environmentally significant metals with inorganic ligands. Part 2: The Cu2+-OH-, Cl-, CO32-, SO42-, and PO43- systems (IUPAC Technical Report). Pure Appl. Chem. 79, 895-950.",
    use = "log *beta2 of Cu(OH)2(aq) at I = 0, 25 C. Recalled (the abstract, read, names the species but not the constants).",
    match = function(s) return has(s, "Powell, Brown, Byrne") end },
  { id = "CRC", cite = "Vanysek, P. Electrochemical Series. In: CRC Handbook of Chemistry and Physics (CRC Press, various editions).",
    use = "standard potentials from which Cr3+, Cr2+ and Mn3+ are defined (their log K at 25 C). Recalled.",
    match = function(s) return has(s, "CRC Handbook") end },
  { id = "BPJ85", cite = "Bard, A. J., Parsons, R. and Jordan, J. (eds.) (1985). Standard Potentials in Aqueous Solution. IUPAC, Marcel Dekker, New York.",
    use = "standard potentials from which Au+, Au3+, Au(OH)3, AuCl2- and AuCl4- are defined (as printed in the CRC electrochemical series). Recalled.",
    match = function(s) return has(s, "Bard, Parsons and Jordan 1985") end },
  { id = "MBS72", cite = "Mesmer, R. E., Baes, C. F. and Sweeton, F. H. (1972). Acidity measurements at elevated temperatures. VI. Boric acid equilibria. Inorganic Chemistry 11, 537.",
    use = "log K(T) of B(OH)3 + OH- = B(OH)4-, 0-300 C. Recalled.",
    match = function(s) return has(s, "Mesmer, Baes and Sweeton 1972") end },
  { id = "RA87", cite = "Reardon, E. J. and Armstrong, D. K. (1987). Celestite (SrSO4(s)) solubility in water, seawater and NaCl solution. Geochim. Cosmochim. Acta 51, 63.",
    use = "celestite log Ksp(T) (as adopted by Nordstrom et al. 1990). Recalled.",
    match = function(s) return has(s, "Reardon and Armstrong 1987") end },
  { id = "BLOUNT77", cite = "Blount, C. W. (1977). Barite solubilities and thermodynamic quantities up to 300 C and 1400 bars. American Mineralogist 62, 942.",
    use = "barite log Ksp(T) (the fit adopted by Nordstrom et al. 1990). Recalled.",
    match = function(s) return has(s, "Blount 1977") end },
  { id = "BPP84", cite = "Busenberg, E., Plummer, L. N. and Parker, V. B. (1984). The solubility of strontianite (SrCO3) in CO2-H2O solutions between 2 and 91 C, ... Geochim. Cosmochim. Acta 48, 2021.",
    use = "strontianite log Ksp(T) and the SrHCO3+ and SrCO3(aq) constants. Recalled.",
    match = function(s) return has(s, "Busenberg, Plummer and Parker 1984") end },
  { id = "BP86", cite = "Busenberg, E. and Plummer, L. N. (1986). The solubility of BaCO3(cr) (witherite) in CO2-H2O solutions between 0 and 90 C, ... Geochim. Cosmochim. Acta 50, 2225.",
    use = "witherite log Ksp(T) and the BaHCO3+ and BaCO3(aq) constants. Recalled.",
    match = function(s) return has(s, "Busenberg and Plummer 1986") end },
  { id = "CONVENTION", cite = "Conventions of the conventional ionic standard state (all properties of H+ zero at every T and P; e- = H+ - 1/2 H2(g)).",
    use = "H+ and e-.",
    match = function(s) return has(s, "convention") end },
}

--- Ids of the SOURCES a source text cites.
function M.match(text)
  local ids = {}
  for _, src in ipairs(M.SOURCES) do
    if src.match(text or "") then ids[#ids + 1] = src.id end
  end
  return ids
end

local function file_of(s)
  local f = s.file or ""
  local base = f:match("([^/]+)%.lua$")
  return base and (base .. ".lua") or (f ~= "" and f or "built-in")
end

--- Load every element file and gather species per source.
-- Returns { species = n, files = {name = count}, by_source = {id = {file = {formulas}}},
--           counts = {id = n}, unmatched = {"formula (file)"} }
-- where the held species are listed: 200 C (away from 25 C; the basis of a
-- record does not depend on T)
local T_PROBE_K = 473.15

function M.collect(phlox)
  local lib = phlox.library(phlox.available_elements())
  local data = { species = 0, files = {}, by_source = {}, counts = {}, unmatched = {}, read = {},
                 held = {}, nheld = 0, basis = {}, estimated = {}, nocp = {} }
  local held = {}
  for _, f in ipairs(phlox.constant_logk(lib, phlox.available_elements(), T_PROBE_K)) do held[f] = true end
  for _, s in ipairs(lib:list()) do
    data.species = data.species + 1
    local file = file_of(s)
    data.files[file] = (data.files[file] or 0) + 1
    local ids = M.match(s.source)
    if #ids == 0 then data.unmatched[#data.unmatched + 1] = s.formula .. " (" .. file .. "): " .. tostring(s.source) end
    for _, id in ipairs(ids) do
      data.by_source[id] = data.by_source[id] or {}
      local t = data.by_source[id]
      t[file] = t[file] or {}
      table.insert(t[file], s.formula)
      data.counts[id] = (data.counts[id] or 0) + 1
    end
    if (s.source or ""):find("%f[%a]read%f[%A]") then
      data.read[#data.read + 1] = { formula = s.formula, file = file }
    end
    -- the temperature basis of the record (species.basis, as maps use it)
    data.basis[s.basis] = (data.basis[s.basis] or 0) + 1
    if s.basis == "estimated" then
      local m = s.basis_method or "?"
      data.estimated[m] = data.estimated[m] or {}
      data.estimated[m][file] = data.estimated[m][file] or {}
      table.insert(data.estimated[m][file], s.formula)
    elseif s.basis == "no Cp" then
      data.nocp[#data.nocp + 1] = "`" .. s.formula .. "` (" .. file .. ")"
    end
    -- a log K record with no temperature data (no dH, logK_T or estimate)
    -- keeps its 25 C value at every temperature (phlox.constant_logk)
    if held[s.formula] then
      data.held[file] = data.held[file] or {}
      table.insert(data.held[file], s.formula)
      data.nheld = data.nheld + 1
    end
  end
  return data
end

--- The markdown text of docs/data-sources.md.
function M.render(data)
  local out = {}
  local function w(...) out[#out + 1] = table.concat({ ... }) end
  w("# Sources of the standard library's data")
  w("")
  w("<!-- Generated by `phlox tests/tools/data_checks.lua` from the loaded element files")
  w("     (tests/tools/sources_def.lua holds the citations); do not edit by hand. -->")
  w("")
  w("Every thermodynamic value in `stdlib/elements/*.lua` carries its source in the")
  w("species' `source` field. This page lists the publications those fields cite and")
  w("which species use each one. The lists are generated from the library as phlox")
  w("loads it (`phlox.library` over every element file, then `lib:list()`), so they")
  w("always match the files. A species appears under every publication its source")
  w("text names (for example dfG from one table, Cp from another, V from a third).")
  w("")
  w("**Recalled, not read.** Almost every value was recalled from the publication, not")
  w("read in it; the source text then says \"from memory of\". The records that say a")
  w("value was read (in a reprint, abstract or table) are listed at the end. Check a")
  w("value against the printed source before relying on it for design work.")
  w("")
  w("The citations below are written from memory, like the values: authors, year,")
  w("journal, volume and first page as the element files give them, titles only where")
  w("recalled firmly.")
  w("")
  w("How the values compare with independent published values: docs/data-checks.md.")
  w("Data choices, derivations and known disagreements: docs/data/ligands.md,")
  w("docs/data/transition-metals.md, docs/data/other-metals.md.")
  w("")
  w("A thermodynamic diagram says what can form, not how fast. Use these data with")
  w("the applicable codes, standards and licensed engineering practice.")
  w("")
  local files = {}
  for f in pairs(data.files) do files[#files + 1] = f end
  table.sort(files)
  w(("%d species in %d files (including the built-in H/O species)."):format(data.species, #files))
  w("")
  w("| publication | species |")
  w("|---|---|")
  for _, src in ipairs(M.SOURCES) do
    if data.counts[src.id] then
      w(("| [%s](#%s) | %d |"):format(src.id, src.id:lower(), data.counts[src.id]))
    end
  end
  w("")
  for _, src in ipairs(M.SOURCES) do
    local by = data.by_source[src.id]
    if by then
      w("## ", src.id)
      w("")
      w(src.cite)
      w("")
      w("Used for: ", src.use)
      w("")
      local fl = {}
      for f in pairs(by) do fl[#fl + 1] = f end
      table.sort(fl)
      for _, f in ipairs(fl) do
        local list = {}
        for _, formula in ipairs(by[f]) do list[#list + 1] = "`" .. formula .. "`" end
        w("- ", f, " (", tostring(#by[f]), "): ", table.concat(list, ", "))
      end
      w("")
    end
  end
  local unused = {}
  for _, src in ipairs(M.SOURCES) do
    if not data.by_source[src.id] then unused[#unused + 1] = src.id end
  end
  if #unused > 0 then
    w("Listed in tests/tools/sources_def.lua but cited by no loaded species: ", table.concat(unused, ", "), ".")
    w("")
  end
  w("## Values read rather than recalled")
  w("")
  w("Species whose source text says part of the data was read (in the publication, a")
  w("reprint, an abstract or a table):")
  w("")
  if #data.read == 0 then w("none") else
    for _, s in ipairs(data.read) do w("- `", s.formula, "` (", s.file, ")") end
  end
  w("")
  w("## Temperature basis")
  w("")
  w("Every record says where its temperature dependence comes from")
  w("(`species.basis`, `phlox list`): *measured* (a published HKF set, Cp function,")
  w("reaction enthalpy or log K(T)), *estimated* by a named method (docs/thermo.md,")
  w("\"Temperature estimates\"; its errors against measured data are at the end of")
  w("docs/data-checks.md), *held* (a log K with no temperature data: maps, curves and")
  w("speciation away from 25 C stop unless `accept_held_logk = true`), or *no Cp*")
  w("(a solid, liquid or gas whose Cp is not known and taken as 0).")
  w("")
  local bases = {}
  for b, n in pairs(data.basis) do bases[#bases + 1] = ("%s %d"):format(b, n) end
  table.sort(bases)
  w(("%d species: %s."):format(data.species, table.concat(bases, ", ")))
  w("")
  local methods = {}
  for m in pairs(data.estimated) do methods[#methods + 1] = m end
  table.sort(methods)
  for _, m in ipairs(methods) do
    w("### Estimated: ", m)
    w("")
    local fs = {}
    for f in pairs(data.estimated[m]) do fs[#fs + 1] = f end
    table.sort(fs)
    for _, f in ipairs(fs) do
      local list = {}
      for _, formula in ipairs(data.estimated[m][f]) do list[#list + 1] = "`" .. formula .. "`" end
      w("- ", f, " (", tostring(#data.estimated[m][f]), "): ", table.concat(list, ", "))
    end
    w("")
  end
  w("### Held at 25 C")
  w("")
  w(("%d of %d species%s"):format(data.nheld, data.species, data.nheld > 0 and ":" or "."))
  w("")
  local hf = {}
  for f in pairs(data.held) do hf[#hf + 1] = f end
  table.sort(hf)
  for _, f in ipairs(hf) do
    local list = {}
    for _, formula in ipairs(data.held[f]) do list[#list + 1] = "`" .. formula .. "`" end
    w("- ", f, " (", tostring(#data.held[f]), "): ", table.concat(list, ", "))
  end
  if #hf > 0 then w("") end
  w("### No Cp (taken as 0)")
  w("")
  w(#data.nocp > 0 and table.concat(data.nocp, ", ") or "none")
  w("")
  if #data.unmatched > 0 then
    w("## Species whose source matches no entry")
    w("")
    for _, s in ipairs(data.unmatched) do w("- ", s) end
    w("")
  end
  return table.concat(out, "\n")
end

return M
