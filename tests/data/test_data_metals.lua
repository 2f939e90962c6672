-- tests/data/test_data_metals.lua: checks of the element definition files of the "other
-- metals" (Al, Pb, Sn, Ag, Cd, Mg, Ca, Ti, Mo, Na, K) against published values held
-- outside the files.
--
-- Run from anywhere:  lua5.4 tests/data/test_data_metals.lua [reference_dir]
-- (default reference dir: tests/reference relative to the repository root).
-- Exits non-zero when a check fails.
--
-- What is checked, and against what:
--  1. structure: required fields per model, one record per formula, element and charge
--     parse, quality word, a source on every record (docs/element-files.md);
--  2. every "logk" reaction balances in elements and charge, names its species once and
--     uses only species defined in the same file or built in;
--  3. dfG = dfH - T dfS for every record that carries G, H and S, with CODATA 1989
--     element entropies (tolerance 1.5 kJ/mol; common practice, no source);
--  4. copies of reference rows: G, H, S and Cp(298.15 K) against the rows of the reference tables (tests/reference)
--     gibbs_25C.csv for the table each file says it uses; HKF parameters against
--     hkf/hkf_parameters.csv, and Cp and V at 25 C recomputed from them against the
--     published Cp and V of that table (revised HKF, Tanger and Helgeson 1988);
--  5. E of couples in standard_potentials.csv and log K of rows in log_k_25C.csv that
--     involve these metals (tolerances 10 mV and 0.2 log units; common practice, no source), and
--     a few couples and constants recalled from the CRC series and Baes and Mesmer.
-- Disagreements that are understood are listed in DOCUMENTED with the deviation they
-- show and why (docs/data/other-metals.md); such a check still fails if the deviation
-- moves by more than its tolerance.

local C = dofile((arg[0]:match("^(.*)[/\\]") or ".") .. "/common.lua")

local R = C.R / 1000            -- kJ/(mol K), CODATA 2018
local F = 96.48533212           -- kJ/(V mol), CODATA 2018
local T0 = C.T0
local LN10 = C.LN10
local RTLN10 = R * T0 * LN10    -- 5.70801 kJ/mol

local TOL_E = 0.010             -- V; common practice, no source
local TOL_LOGK = 0.2            -- common practice, no source
local TOL_CYCLE = 1.5           -- kJ/mol; common practice, no source
local TOL_CP = 1.0              -- J/(mol K), common practice, no source
local TOL_HKF_CP = 1.0          -- cal/(mol K), hkf/README.md
local TOL_HKF_V = 0.5           -- cm3/mol, hkf/README.md

-- Element entropies of the reference states per atom, J/(mol K): from memory of CODATA
-- 1989 (Cox, Wagman and Medvedev); Mo (not a CODATA key element) from the NBS tables.
local S_EL = {
  H = 130.680 / 2, O = 205.152 / 2, Al = 28.30, Pb = 64.80, Sn = 51.18, Ag = 42.55,
  Cd = 51.80, Mg = 32.67, Ca = 41.59, Ti = 30.72, Mo = 28.66, Na = 51.30, K = 64.68,
}
local S_H2 = 130.680

local FILES = { "Al", "Pb", "Sn", "Ag", "Cd", "Mg", "Ca", "Ti", "Mo", "Na", "K" }

---------------------------------------------------------------------------- paths
local script = arg and arg[0] or "tests/data/test_data_metals.lua"
local script_dir = script:match("^(.*)/[^/]*$") or "."
local root = script_dir .. "/../.."
local refdir = arg and arg[1] or (root .. "/tests/reference")

---------------------------------------------------------------------------- report
local rep = C.reporter({ PASS = "PASS  ", FAIL = "FAIL  ", DOC = "DOC   ", SKIP = "SKIP  " })
local pass, fail, doc, skip = rep.pass, rep.fail, function(msg) rep.emit("DOC", msg) end,
  function(msg) rep.emit("SKIP", msg) end

-- Sandboxed loading with an instruction budget, formula and reaction parsing and CSV
-- reading: tests/data/common.lua.
local load_definition, parse_formula, parse_reaction, read_csv =
  C.load_definition, C.parse_formula, C.parse_reaction, C.read_csv

local gibbs = read_csv(refdir .. "/gibbs_25C.csv")
local potentials = read_csv(refdir .. "/standard_potentials.csv")
local logks = read_csv(refdir .. "/log_k_25C.csv")
local hkfrows = read_csv(refdir .. "/hkf/hkf_parameters.csv")

-- gibbs_25C.csv row by species, state and table ("NBS" = Wagman et al. 1982 rows,
-- "CODATA" = Cox, Wagman and Medvedev 1989 rows, "RH" = Robie and Hemingway 1995,
-- "PW92" = Palmer and Wesolowski 1992).
local function gibbs_row(sp, state, tab)
  local key = ({ NBS = "Wagman", CODATA = "CODATA", RH = "Robie", PW92 = "Palmer and Wesolowski" })[tab]
  for _, r in ipairs(gibbs) do
    if r.species == sp and r.state == state and r.source:find(key, 1, true) then return r end
  end
  return nil
end

---------------------------------------------------------------------------- load files
local ENERGY, ENTROPY, QUALITY, MODELS = C.ENERGY, C.ENTROPY, C.QUALITY, C.MODELS

-- Species built into phlox (docs/element-files.md); G at 25 C in kJ/mol used by these checks:
-- H2O(l) from the NBS tables, OH- from the NBS row of gibbs_25C.csv.
local BUILTIN = {
  ["H2O(l)"] = -237.129, ["H^+"] = 0, ["O2(g)"] = 0, ["H2(g)"] = 0, ["e-"] = 0,
  ["OH^-"] = tonumber(gibbs_row("OH-", "aq", "NBS").dGf_kJ_mol),
}

local species = {}       -- formula -> record (with .file, .Gk, .Hk, .Sj in kJ and J)
local order = {}
for _, el in ipairs(FILES) do
  local path = root .. "/stdlib/elements/" .. el .. ".lua"
  local t, err = load_definition(path)
  if not t then
    fail(el .. ".lua loads in the sandbox: " .. tostring(err))
  else
    local ok = true
    if t.element ~= el then ok = false; fail(el .. ".lua: element field is " .. tostring(t.element)) end
    local fu = t.units or {}
    local seen = {}
    for i, sp in ipairs(t.species or {}) do
      local where = el .. ".lua species " .. i .. " (" .. tostring(sp.formula) .. ")"
      local problems = {}
      if type(sp.formula) ~= "string" then problems[#problems + 1] = "no formula" end
      if not MODELS[sp.model] then problems[#problems + 1] = "bad model" end
      if type(sp.source) ~= "string" or #sp.source < 10 then problems[#problems + 1] = "no source" end
      if sp.quality and not QUALITY[sp.quality] then problems[#problems + 1] = "bad quality" end
      if sp.formula and seen[sp.formula] then problems[#problems + 1] = "duplicate formula" end
      if sp.formula and BUILTIN[sp.formula] then problems[#problems + 1] = "redefines a built-in species" end
      if sp.model == "cp" or sp.model == "hkf" then
        for _, k in ipairs({ "G", "H", "S" }) do
          if type(sp[k]) ~= "number" then problems[#problems + 1] = "missing " .. k end
        end
      end
      if sp.model == "hkf" and not sp.hkf and not (sp.estimate and sp.estimate.Cp) then
        problems[#problems + 1] = "hkf without parameters or estimate.Cp"
      end
      if sp.model == "logk" and (type(sp.reaction) ~= "string" or type(sp.logK) ~= "number") then
        problems[#problems + 1] = "logk without reaction/logK"
      end
      if sp.formula then
        local okp, counts, charge = pcall(parse_formula, sp.formula)
        if not okp then problems[#problems + 1] = counts
        elseif not counts[el] then problems[#problems + 1] = "does not contain " .. el
        else sp._counts, sp._charge = counts, charge end
      end
      if #problems > 0 then
        ok = false; fail(where .. ": " .. table.concat(problems, ", "))
      else
        seen[sp.formula] = true
        local u = sp.units or fu
        local fe = ENERGY[u.energy or "kJ"]; local fs = ENTROPY[u.entropy or "J"]
        sp.file = el
        if sp.G then sp.Gk, sp.Hk, sp.Sj = sp.G * fe, sp.H * fe, sp.S * fs end
        if sp.dH then sp.dHk = sp.dH * fe end
        species[sp.formula] = sp
        order[#order + 1] = sp.formula
      end
    end
    if ok then pass(string.format("%s.lua: %d records load in the sandbox, fields and formulas valid (docs/element-files.md)", el, #t.species)) end
  end
end

---------------------------------------------------------------------------- G at 25 C
local FOREIGN = {  -- species of other files used by reference rows: NBS rows of gibbs_25C.csv
  ["SO4^2-"] = { "SO4-2", "aq" }, ["PbSO4(s)"] = { "PbSO4", "cr" },
  ["Cl^-"] = { "Cl-", "aq" }, ["AgCl(s)"] = { "AgCl", "cr" },
  ["CO3^2-"] = { "CO3-2", "aq" }, ["CaCO3(s,calcite)"] = { "CaCO3", "cr" },
  ["CaSO4.2H2O(s,gypsum)"] = { "CaSO4.2H2O", "cr" },
}
local ALIAS = {    -- reference-table names -> names in these files
  ["PbO(s,red)"] = "PbO(s,litharge)",
}

local resolving = {}
local function G25(f)
  f = ALIAS[f] or f
  if BUILTIN[f] then return BUILTIN[f], "builtin" end
  local sp = species[f]
  if sp then
    if sp.Gk then return sp.Gk, "mine" end
    if sp.model == "logk" then
      if sp._G then return sp._G, "mine" end
      if resolving[f] then error("reaction cycle at " .. f) end
      resolving[f] = true
      local sum, nu_self = -sp.logK * RTLN10, 0
      for _, term in ipairs(parse_reaction(sp.reaction)) do
        if term.f == f then nu_self = nu_self + term.nu
        else
          local g = G25(term.f)
          if not g then resolving[f] = nil; return nil end
          sum = sum - term.nu * g
        end
      end
      resolving[f] = nil
      sp._G = sum / nu_self
      return sp._G, "mine"
    end
  end
  local fr = FOREIGN[f]
  if fr then
    local r = gibbs_row(fr[1], fr[2], "NBS")
    if r then return tonumber(r.dGf_kJ_mol), "foreign" end
  end
  return nil
end

---------------------------------------------------------------------------- 2. reactions
for _, f in ipairs(order) do
  local sp = species[f]
  if sp.model == "logk" then
    local terms = parse_reaction(sp.reaction)
    local bal, q, self, unparsed = C.balance(terms, f)
    if unparsed[1] then error(unparsed[1].err, 0) end
    local problems = {}
    for _, term in ipairs(terms) do
      local name = term.f
      local def = BUILTIN[name] or (species[name] and species[name].file == sp.file)
      if not def then problems[#problems + 1] = name .. " not defined in " .. sp.file .. ".lua or built in" end
    end
    if self ~= 1 then problems[#problems + 1] = "species appears " .. self .. " times" end
    for el, n in pairs(bal) do
      if math.abs(n) > 1e-9 then problems[#problems + 1] = el .. " unbalanced by " .. n end
    end
    if math.abs(q) > 1e-9 then problems[#problems + 1] = "charge unbalanced by " .. q end
    if #problems > 0 then fail(f .. ": reaction '" .. sp.reaction .. "': " .. table.concat(problems, "; "))
    else pass(f .. ": reaction '" .. sp.reaction .. "' balances in elements and charge") end
  end
end

---------------------------------------------------------------------------- 3. cycle
local function dfS(sp)
  local s = sp.Sj
  for el, n in pairs(sp._counts) do
    local se = S_EL[el]
    if not se then return nil end
    s = s - n * se
  end
  return s + sp._charge / 2 * S_H2   -- conventional ionic entropies (H+ = 0)
end

for _, f in ipairs(order) do
  local sp = species[f]
  if sp.Gk then
    local ds = dfS(sp)
    local r = sp.Gk - (sp.Hk - T0 * ds / 1000)
    local msg = string.format("%s: dfG %.3f vs dfH - T dfS %.3f kJ/mol (residual %+.3f; CODATA 1989 element entropies; tol %.1f)",
      f, sp.Gk, sp.Hk - T0 * ds / 1000, r, TOL_CYCLE)
    if math.abs(r) <= TOL_CYCLE then pass(msg) else fail(msg) end
  end
end

---------------------------------------------------------------------------- 4. copies of reference rows
-- Which reference row each record is said to come from (source field of the file).
local COPIED_FROM = {
  { "Al^3+", "Al+3", "aq", "PW92" }, { "Al2O3(s,corundum)", "Al2O3", "cr", "CODATA" },
  { "Al(OH)3(s,gibbsite)", "Al(OH)3", "cr", "RH" }, { "Al(s)", "Al", "cr", "NBS", cp_only = true },
  { "Pb(s)", "Pb", "cr", "NBS", cp_only = true }, { "Pb^2+", "Pb+2", "aq", "NBS" },
  { "PbO(s,litharge)", "PbO", "cr", "NBS" }, { "PbO2(s)", "PbO2", "cr", "NBS" },
  { "Ag^+", "Ag+", "aq", "CODATA" }, { "Cd^2+", "Cd+2", "aq", "CODATA" },
  { "Mg(OH)2(s,brucite)", "Mg(OH)2", "cr", "NBS" }, { "TiO2(s,rutile)", "TiO2", "cr", "NBS" },
}
local function cp298(sp) return C.cp_poly(sp.cp, T0) end
for _, t in ipairs(COPIED_FROM) do
  local sp, row = species[t[1]], gibbs_row(t[2], t[3], t[4])
  if not sp or not row then fail("reference-row copy " .. t[1] .. ": record or reference row missing")
  else
    local tag = string.format("%s vs gibbs_25C.csv %s,%s (%s row)", t[1], t[2], t[3], t[4])
    if not t.cp_only then
      local g = G25(t[1])
      local dg = g - tonumber(row.dGf_kJ_mol)
      local msg = string.format("%s: dfG %.3f vs %.3f kJ/mol (tol 0.01)", tag, g, tonumber(row.dGf_kJ_mol))
      if math.abs(dg) <= 0.01 then pass(msg) else fail(msg) end
      if sp.model == "logk" and sp.dHk and sp.reaction:find("^" .. sp.file .. "%(s%)") then
        -- a conventional formation reaction from the element: dH is dfH
        local m4 = string.format("%s: dH of the formation reaction %.3f vs dfH %s kJ/mol (tol 0.01)", tag, sp.dHk, row.dHf_kJ_mol)
        if math.abs(sp.dHk - tonumber(row.dHf_kJ_mol)) <= 0.01 then pass(m4) else fail(m4) end
      end
      if sp.Hk then
        local okH = math.abs(sp.Hk - tonumber(row.dHf_kJ_mol)) <= 0.01
        local okS = math.abs(sp.Sj - tonumber(row.S_J_molK)) <= 0.05
        local m2 = string.format("%s: dfH %.3f vs %s, S %.2f vs %s (tol 0.01 kJ/mol, 0.05 J/(mol K))",
          tag, sp.Hk, row.dHf_kJ_mol, sp.Sj, row.S_J_molK)
        if okH and okS then pass(m2) else fail(m2) end
      end
    end
    if sp.cp and row.Cp_J_molK ~= "" then
      local c = cp298(sp)
      local m3 = string.format("%s: Cp(298.15 K) %.2f vs %s J/(mol K) (tol %.1f, common practice, no source)",
        tag, c, row.Cp_J_molK, TOL_CP)
      if math.abs(c - tonumber(row.Cp_J_molK)) <= TOL_CP then pass(m3) else fail(m3) end
    end
  end
end
-- Maier-Kelley coefficients not covered by a gibbs_25C.csv Cp: NBS Cp (from memory of
-- Wagman et al. 1982) at 298.15 K.
for _, t in ipairs({ { "CaO(s,lime)", 42.80 } }) do
  local c = cp298(species[t[1]])
  local msg = string.format("%s: Kelley Cp(298.15 K) %.2f vs NBS %.2f J/(mol K) (from memory of Wagman et al. 1982; tol %.1f)",
    t[1], c, t[2], TOL_CP)
  if math.abs(c - t[2]) <= TOL_CP then pass(msg) else fail(msg) end
end

-- HKF: parameters and G/H/S as in hkf_parameters.csv; Cp and V at 25 C recomputed.
local HKF_KEYS = C.HKF_KEYS
-- Mg^2+ keeps the SH88 parameters but takes G/H/S from CODATA 1989 (issue 13); Al^3+ keeps
-- them with G/H/S from Palmer and Wesolowski 1992.
local HKF_GHS_FROM_TABLE = { ["Na^+"] = true, ["K^+"] = true, ["Ca^2+"] = true }
for _, f in ipairs(order) do
  local sp = species[f]
  if sp.model == "hkf" and sp.hkf then
    local row
    for _, r in ipairs(hkfrows) do if r.species == f then row = r end end
    if not row then fail(f .. ": no row in hkf_parameters.csv")
    else
      local bad = {}
      for _, k in ipairs(HKF_KEYS) do
        if math.abs(sp.hkf[k] - tonumber(row[k])) > 1e-9 then bad[#bad + 1] = k end
      end
      if HKF_GHS_FROM_TABLE[f] then
        if math.abs(sp.Gk - tonumber(row.dGf_cal_mol) * 4.184e-3) > 1e-6 then bad[#bad + 1] = "G" end
        if math.abs(sp.Hk - tonumber(row.dHf_cal_mol) * 4.184e-3) > 1e-6 then bad[#bad + 1] = "H" end
        if math.abs(sp.Sj - tonumber(row.S_cal_molK) * 4.184) > 1e-6 then bad[#bad + 1] = "S" end
      end
      local msg = f .. ": HKF parameters" .. (HKF_GHS_FROM_TABLE[f] and " and G/H/S" or "") ..
        " equal the hkf_parameters.csv row (Shock and Helgeson 1988, from memory)"
      if #bad == 0 then pass(msg) else fail(msg .. ": differ in " .. table.concat(bad, ", ")) end
      -- Tanger and Helgeson 1988 at T = 298.15 K, P = Pr = 1 bar (the a3/a4 Cp term vanishes);
      -- Born functions of the HKF papers (hkf/README.md): C.hkf_cp_v_25C
      local cp, v = C.hkf_cp_v_25C(sp.hkf)
      local cpp, vp = tonumber(row.Cp_25C_cal_molK), tonumber(row.V_25C_cm3_mol)
      local m1 = string.format("%s: HKF Cp(25 C) %.2f vs published %.2f cal/(mol K) (hkf_parameters.csv; tol %.1f)", f, cp, cpp, TOL_HKF_CP)
      if math.abs(cp - cpp) <= TOL_HKF_CP then pass(m1) else fail(m1) end
      local m2 = string.format("%s: HKF V(25 C) %.2f vs published %.2f cm3/mol (hkf_parameters.csv; tol %.1f)", f, v, vp, TOL_HKF_V)
      if math.abs(v - vp) <= TOL_HKF_V then pass(m2)
      elseif f == "Al^3+" and math.abs((v - vp) - 0.64) <= 0.02 then
        doc(m2 .. ": documented failure, same as in hkf/README.md (weak recall of the published V; Al3+ HKF set marked low)")
      else fail(m2) end
    end
  end
end

---------------------------------------------------------------------------- 5. reference rows
-- Understood disagreements: deviation (computed - reference) expected, and why.
local DOCUMENTED = {
  ["Mg^2+ + 2 e- = Mg(s)"] = { dev = 0.0122, why =
    "CRC -2.372 V is not consistent with any modern dfG(Mg2+): CODATA (used since issue 13) gives -2.360, NBS -2.357 (row note), SH88 -2.3526" },
  ["MoO4^2- + 4 H2O(l) + 6 e- = Mo(s) + 8 OH^-"] = { dev = 0.140, why =
    "CRC -1.05 V follows an old dfG(MoO4^2-) near -915 kJ/mol (Latimer era); NBS 1982 -836.3 (used, and Shock et al. 1997) gives -0.910 V" },
  ["Ca(OH)2(s,portlandite) + 2 H^+ = Ca^2+ + 2 H2O(l)"] = { dev = -0.279, why =
    "SH88 Ca2+ (about CODATA) with NBS portlandite gives 22.52; NBS Ca2+ would give 22.66; R&H/CODATA-consistent portlandite not recalled" },
  ["Al(OH)3(s,gibbsite) + 3 H^+ = Al^3+ + 3 H2O(l)"] = { dev = -0.369, why =
    "Al3+ of Palmer and Wesolowski 1992 with R&H 1995 gibbsite gives their measured 7.74 (Brown and Ekberg 2016 select 7.75 +- 0.08, read); Nordstrom et al. 1990 8.11 (recalled) predates that measurement" },
  ["Mg^2+ + H2O(l) = MgOH^+ + H^+"] = { dev = -0.240, why =
    "s5-mg: Mg.lua takes the measured MgOH+ of Palmer and Wesolowski 1997 (-11.68 +- 0.05, dH 70.1 kJ/mol, dCp 0, 1-250 C; abstract read); the row is Baes and Mesmer 1976 (-11.44, recalled), the file's former value" },
  ["Al^3+ --> Al(s) (CRC)"] = { dev = -0.023, why =
    "CRC -1.662 V corresponds to dfG(Al3+) = -481 kJ/mol; Palmer and Wesolowski 1992 -487.7 (used) gives -1.685, CODATA -491.5 -1.698, NBS -485.0 -1.676" },
}

local function reaction_value(text, kind)
  local terms = parse_reaction(text)
  local dG, ne, mine_nonzero, missing = 0, 0, false, nil
  for _, term in ipairs(terms) do
    local g, how = G25(term.f)
    if g == nil then missing = term.f; break end
    if term.f == "e-" then ne = ne - term.nu end
    if how == "mine" and g ~= 0 then mine_nonzero = true end
    dG = dG + term.nu * g
  end
  if missing then return nil, "species " .. missing .. " not defined here" end
  if not mine_nonzero then return nil, "no species of these files" end
  if kind == "E" then
    if ne == 0 then return nil, "no electrons" end
    return -dG / (ne * F)
  end
  return -dG / RTLN10
end

local function compare(text, ref, kind, source, key)
  local val, why = reaction_value(text, kind)
  if val == nil then return false, why end
  local tol = kind == "E" and TOL_E or TOL_LOGK
  local unit = kind == "E" and " V" or ""
  local d = DOCUMENTED[key or text]
  local dev = val - ref
  local msg = string.format("%s %s: computed %.4f%s vs %.4f%s (%s; tol %g)", kind == "E" and "E" or "log K",
    text, val, unit, ref, unit, source, tol)
  if math.abs(dev) <= tol and not d then pass(msg)
  elseif d and math.abs(dev - d.dev) <= (kind == "E" and 0.002 or 0.02) then
    doc(msg .. string.format(": deviation %+.4f as documented: %s", dev, d.why))
  else fail(msg .. string.format(": deviation %+.4f", dev)) end
  return true
end

local MY_ELEMENTS = {}
for _, el in ipairs(FILES) do MY_ELEMENTS[el] = true end
local function touches_mine(text)
  for _, term in ipairs(parse_reaction(text)) do
    local okp, c = pcall(parse_formula, term.f)
    if okp then for el in pairs(c) do if MY_ELEMENTS[el] and el ~= "H" and el ~= "O" then return true end end end
  end
  return false
end

for _, r in ipairs(potentials) do
  if touches_mine(r.couple) then
    local done, why = compare(r.couple, tonumber(r.E0_V_SHE_25C), "E", "standard_potentials.csv: " .. r.source:sub(1, 60) .. "...")
    if not done then skip("E " .. r.couple .. ": " .. why) end
  end
end
for _, r in ipairs(logks) do
  if touches_mine(r.reaction) then
    local done, why = compare(r.reaction, tonumber(r.log10_K_25C), "K", "log_k_25C.csv: " .. r.source:sub(1, 60) .. "...")
    if not done then skip("log K " .. r.reaction .. ": " .. why) end
  end
end

-- Couples and constants recalled (not in the project's reference tables (tests/reference)).
local CRC = "from memory of the CRC Handbook electrochemical series (Vanysek)"
local RECALLED = {
  { "Pb^2+ + 2 e- = Pb(s)", -0.1262, "E", CRC },
  { "Al^3+ + 3 e- = Al(s)", -1.662, "E", CRC, key = "Al^3+ --> Al(s) (CRC)" },
  { "Ca^2+ + 2 e- = Ca(s)", -2.868, "E", CRC },
  { "Na^+ + e- = Na(s)", -2.71, "E", CRC },
  { "K^+ + e- = K(s)", -2.931, "E", CRC },
  { "Sn^4+ + 2 e- = Sn^2+", 0.151, "E", CRC },
  { "Ag2O(s) + 2 H^+ = 2 Ag^+ + H2O(l)", 2 * 6.29, "K", "from memory of Baes and Mesmer 1976 (log *Ks = 6.29 per Ag)" },
  { "Cd(OH)2(s) + 2 H^+ = Cd^2+ + 2 H2O(l)", 13.65, "K", "from memory of Baes and Mesmer 1976" },
  { "Ca(OH)2(s,portlandite) + 2 H^+ = Ca^2+ + 2 H2O(l)", 22.8, "K", "from memory of Baes and Mesmer 1976" },
  { "Al(OH)3(s,gibbsite) + 3 H^+ = Al^3+ + 3 H2O(l)", 8.11, "K", "from memory of Nordstrom et al. 1990 (ACS Symp. Ser. 416)" },
}
for _, t in ipairs(RECALLED) do
  local done, why = compare(t[1], t[2], t[3], t[4], t.key)
  if not done then fail(t[1] .. ": " .. why) end
end

---------------------------------------------------------------------------- summary
print(string.format("\n%d species in %d files; %d passed, %d failed, %d documented disagreements, %d skipped (species of other files)",
  #order, #FILES, rep.count.PASS, rep.count.FAIL, rep.count.DOC, rep.count.SKIP))
rep.finish("failed checks:", 164) -- the checks this script made on 2026-12-02; s5-mg: 165 -> 164, the MgOH+ row now a documented disagreement (not removed)
