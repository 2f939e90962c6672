-- tests/tools/sources_def.lua: what the standard library takes from each
-- publication it cites.  Shared by the generator of docs/data-sources.md
-- (tests/tools/data_checks.lua, which also writes docs/data-checks.md) and the test tests/scripts/test_stdlib_docs.lua.
--
-- The citations are not here: each publication is defined once, in
-- stdlib/bibliography.lua, and element files cite it by key ("[NBS82]").
-- The species lists are not written by hand either: they come from the
-- loaded library (lib:list() gives each record's `refs`, lib:references()
-- the citations).  A species may cite several publications (dfG from one
-- table, Cp from another, V from a third).  Every species must cite at least
-- one key, and every cited key needs a line here saying what the files take
-- from it; the test fails otherwise.
--
-- API: defs.USES (list of {id, use}), defs.collect(phlox) -> data,
--      defs.render(data) -> markdown text.

local M = {}

-- key, what the files take from it; in the order the document lists them
M.USES = {
  { id = "NBS82", use = "dfG, dfH, S and Cp at 25 C of most solids, gases and several ions; log K and dH of ions and oxyanions derived from its dfG/dfH; built-in H2O(l) at 25 C. Recalled, except a few values confirmed in a CRC or OpenStax reprint (the record says so)." },
  { id = "CODATA89", use = "dfH and S of key ions, oxides and gases (dfG derived as dfH - T dfS); S of elements. A few dfH and S were read in a reprint of the CODATA table (the record says so); the rest are recalled." },
  { id = "RH95", use = "dfH, S (and dfG) of some minerals and molar volumes of minerals. Recalled." },
  { id = "HRA91", use = "boehmite (as tabulated by Robie and Hemingway 1995). Recalled." },
  { id = "PW92", use = "dfG and dfH of Al3+ (the paper's recommended values from its measured gibbsite solubility, abstract read; S derived)." },
  { id = "WES92", use = "log K, dH and dCp of gibbsite + OH- = Al(OH)4- at 25 C, measured 0-100 C (abstract read)." },
  { id = "K60", use = "Maier-Kelley heat-capacity coefficients (cal, converted with 4.184) of metals, oxides and gases. Recalled; each fit was held against the NBS Cp at 25 C (docs/data/*.md)." },
  { id = "HDNB78", use = "Maier-Kelley heat-capacity coefficients of some minerals (sulfides, sulfates, magnesite). Recalled." },
  { id = "SH88", use = "revised-HKF parameters and dfG, dfH, S of aqueous ions, recalled from the paper's tables; its correlations also estimate HKF parameters from Cp (and V) for the `estimate` records." },
  { id = "SHS89", use = "revised-HKF parameters of neutral aqueous species, recalled from the paper's tables." },
  { id = "SSWS97", use = "Fe2+ (complete HKF set) and the dfG/dfH/S from which Fe3+ is defined. Recalled." },
  { id = "IAPWS95", use = "G(T,P) - G(Tr,Pr) of the built-in H2O(l)." },
  { id = "BM76", use = "hydrolysis constants at I = 0 and 25 C (mononuclear and polynuclear) of every metal but Al and Ba. Recalled; the Al and Ba constants also appear in the Wikipedia table 'Hydrolysis constant' (read)." },
  { id = "BE16", use = "Al and Ba hydrolysis constants at I = 0, 25 C, with their +- (read in the Wikipedia table 'Hydrolysis constant')." },
  { id = "STIPP93", use = "otavite (CdCO3) solubility product from its measured solubility. Recalled." },
  { id = "PG02", use = "malachite solubility constant and dfH from solubility measured at 15-65 C (abstract read)." },
  { id = "N90", use = "log K and dH of complexes and minerals, and dH of several hydrolysis reactions. Recalled." },
  { id = "COMPILED", use = "stability constants of many chloro, sulfato, carbonato and fluoro complexes and a few mineral solubility constants. Recalled; the records say that the attribution is incomplete." },
  { id = "SM", use = "acid constants (H3PO4, HPO4^2-, HMoO4-) and copper complexes at I = 0, 25 C; also the compilation behind the Bjerrum ammine constants and many compiled constants above. Recalled." },
  { id = "PB82", use = "analytic log K(T) of calcite, aragonite, CaHCO3+ and CaCO3(aq), 0-90 C. Coefficients recalled; they reproduce the published 25 C values (abstract read, see log_k_25C.csv)." },
  { id = "SH77", use = "MgHCO3+ and MgCO3(aq) log K(T), as adopted by Nordstrom et al. 1990. Recalled." },
  { id = "BJ41", use = "stepwise ammine constants (2 mol/L NH4NO3, 30 C; not I = 0 and 25 C, as every record says). Recalled." },
  { id = "CHUGHTAI68", use = "Ca-phosphate complexes. Recalled." },
  { id = "GMB70", use = "brushite solubility. Recalled." },
  { id = "MGB77", use = "hydroxyapatite solubility product (recalled; an abstract read brackets it)." },
  { id = "NRIAGU72", use = "strengite and vivianite solubility. Recalled." },
  { id = "RICKARD06", use = "mackinawite solubility at 25 C (log K*sp 3.5 +- 0.25). Recalled." },
  { id = "BWB00", use = "mackinawite solubility 25-95 C (log K = 2848.779/T - 6.347), the second source and temperature check of the mackinawite record. Read in the abstract." },
  { id = "LUTHER96", use = "log K of Fe2+ + HS- = FeHS+ (5.07, I = 0). The abstract was read (it names the complexes); the constant is recalled." },
  { id = "CC64", use = "estimated reaction heat capacity of Fe3+ against Fe2+ (correspondence principle, cation parameters for 25-200 C). Recalled." },
  { id = "MIGDISOV02", use = "second dissociation constant of H2S (S^2-). Recalled." },
  { id = "MORRIS66", use = "pKa of HClO. Recalled." },
  { id = "BRUNO92", use = "siderite log Ksp at 25 C, -10.8 +- 0.2 (abstract read), cited beside the record's own source." },
  -- s5-fe (issue 13)
  { id = "BDH09", use = "siderite log Ksp as a function of temperature, 25-250 C (the paper's four-term fit, abstract read)." },
  { id = "L69", use = "dfG of Fe(OH)2(s) and of the Fe2+ and OH- it was paired with, giving the record's log Ksp (read as tabulated by Boyd and Scott 2001)." },
  { id = "BS01", use = "the table (read) through which the Langmuir 1969 dfG of Fe(OH)2(s) is cited." },
  { id = "DIAKONOV99", use = "dfG of Fe(OH)4^- at 25 C (-201.97 kcal/mol, extrapolated from hematite solubility to 300 C). Read in the abstract." },
  { id = "SERGEEVA99", use = "log K at 200 C of hematite dissolution to Fe(OH)4^- (and to Fe3+ and FeOH2+, used as checks). Read in the abstract." },
  { id = "RSM87", use = "solubility constant of amorphous Cr(OH)3 (Cr.lua). Abstract read (OSTI 6772597); the constant recalled." },
  { id = "NEA05NI", use = "Cp at 25 C of Ni^2+ (selected -46 +- 10 J/(mol K)), the input of its HKF estimate. Recalled." },
  { id = "POWELL05", use = "log beta of HgCl2(aq), Hg(OH)Cl(aq) and Hg(OH)2(aq) with their +- (read in the abstract of the summary, Aust. J. Chem. 2004, doi:10.1071/CH04063); HgCl^+, HgCl3^- and HgCl4^2- recalled." },
  { id = "ANDERSSON08", use = "Henry constant of Hg(0) and its temperature dependence at 25 C, from which Hg(aq) is defined (read in Sander's table)." },
  { id = "MH06", use = "the order-of-magnitude stability constant of Au(CN)4^-. Recalled." },
  { id = "OPENSTAX", use = "standard potentials read in its Appendix L (a reprint of the CRC series): NiO2/Ni^2+." },
  { id = "POWELL07", use = "log *beta2 of Cu(OH)2(aq) at I = 0, 25 C. Recalled (the abstract, read, names the species but not the constants)." },
  { id = "CRC", use = "standard potentials from which Cr3+, Cr2+ and Mn3+ are defined (their log K at 25 C). Recalled." },
  { id = "BPJ85", use = "standard potentials from which Au+, Au3+, Au(OH)3, AuCl2- and AuCl4- are defined (as printed in the CRC electrochemical series). Recalled." },
  { id = "MBS72", use = "log K(T) of B(OH)3 + OH- = B(OH)4-, 0-300 C. Recalled." },
  { id = "RA87", use = "celestite log Ksp(T) (as adopted by Nordstrom et al. 1990). Recalled." },
  { id = "BLOUNT77", use = "barite log Ksp(T) (the fit adopted by Nordstrom et al. 1990). Recalled." },
  { id = "BPP84", use = "strontianite log Ksp(T) and the SrHCO3+ and SrCO3(aq) constants. Recalled." },
  { id = "BP86", use = "witherite log Ksp(T) and the BaHCO3+ and BaCO3(aq) constants. Recalled." },
  { id = "CONVENTION", use = "H+ and e-." },
  -- s5-solids (issue 13)
  { id = "BC87", use = "the measured MoS2-Mo-H2S-H2 equilibrium at 569-1277 K (dfG equation of MoS2, abstract read), which supports the fluorine-calorimetric molybdenite of Robie and Hemingway 1995." },
  { id = "BP96", use = "log Ksp and dH of K-jarosite, measured at 4-35 C (abstract read)." },
  { id = "TSIV", use = "third-law enthalpies of formation of pyrrhotite Fe0.875S from five equilibrium studies (table Fe.37 read), averaged here for Fe7S8." },
  { id = "AT94", use = "vivianite solubility product and its temperature function, measured 5-90 C (abstract read)." },
  { id = "BZ23", use = "dfG of greenockite (CdS) recommended from its measured solubility product (abstract read)." },
  { id = "GS92", use = "standard entropy of monoclinic pyrrhotite Fe7S8 (adiabatic calorimetry). Recalled." },
  -- s5-lig (issue 13)
  { id = "HARVEY21", use = "stepwise ammine constants of Ni, Zn, Co(20 C) and Cd at I = 0, 25 C (Smith and Martell, read in its Appendix 16.12), summed to the cumulative log beta of N.lua; log beta4 of Zn(CN)4^2- (CN.lua)." },
  { id = "LM07", use = "log beta_n(T) of PbCl+, PbCl2(aq) and PbCl3-, 15-300 C, I = 0 (equations read in the abstract)." },
  { id = "BS82", use = "log beta1 and log beta2 of the lead carbonato complexes PbCO3(aq) and Pb(CO3)2^2- at 25 C and I = 0.3 (NaClO4), taken to I = 0 with the Davies equation (abstract read)." },
  { id = "PW97", use = "log K, dH and dCp (0) of Mg^2+ + H2O = MgOH^+ + H^+ at I = 0, measured 1-250 C (abstract read)." },
  -- s5-fes2 (issue 13)
  { id = "CK88", use = "dfH of troilite (FeS) and pyrite (FeS2) by high-temperature direct reaction calorimetry (abstract read); with the adiabatic entropies, the dfG of both." },
}

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
                 held = {}, nheld = 0, basis = {}, estimated = {}, nocp = {}, refs = {}, nouse = {} }
  for _, r in ipairs(lib:references()) do data.refs[r.key] = r end
  local use = {}
  for _, u in ipairs(M.USES) do use[u.id] = true end
  for k in pairs(data.refs) do
    if not use[k] then data.nouse[#data.nouse + 1] = k end
  end
  table.sort(data.nouse)
  local held = {}
  for _, f in ipairs(phlox.constant_logk(lib, phlox.available_elements(), T_PROBE_K)) do held[f] = true end
  for _, s in ipairs(lib:list()) do
    data.species = data.species + 1
    local file = file_of(s)
    data.files[file] = (data.files[file] or 0) + 1
    local ids = s.refs
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
  w("Each publication is defined once, in stdlib/bibliography.lua, and the element")
  w("files cite it by key (\"from memory of [NBS82]\"); the citations below are")
  w("printed from there. They are written from memory, like the values: authors,")
  w("year, journal, volume and first page, titles only where recalled firmly.")
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
  for _, src in ipairs(M.USES) do
    if data.counts[src.id] then
      w(("| [%s](#%s) %s | %d |"):format(src.id, src.id:lower(), data.refs[src.id].short, data.counts[src.id]))
    end
  end
  w("")
  for _, src in ipairs(M.USES) do
    local by = data.by_source[src.id]
    if by then
      w("## ", src.id)
      w("")
      w(data.refs[src.id].cite)
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
  for _, src in ipairs(M.USES) do
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
    w("## Species whose source cites no key")
    w("")
    for _, s in ipairs(data.unmatched) do w("- ", s) end
    w("")
  end
  return table.concat(out, "\n")
end

return M
