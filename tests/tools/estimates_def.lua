-- tests/tools/estimates_def.lua: validation of the temperature-estimation
-- methods (docs/thermo.md, "Temperature estimates") against the species of
-- the standard library that DO have measured temperature data.  Shared by
-- the generator of docs/data-checks.md (tests/tools/data_checks.lua), the
-- staleness test (tests/scripts/test_stdlib_docs.lua) and the test of the
-- documented errors (tests/scripts/test_temperature_estimates.lua).
--
-- For each reaction, the "measured" log K at 100, 200 and 300 C is what the
-- library computes from its measured data (an HKF set, an analytic log K(T)
-- or a reaction enthalpy with van 't Hoff); each method then starts from the
-- same log K at 25 C and its error is estimate - measured:
--   held          log K kept at its 25 C value (what phlox did before)
--   one-term      log K(T) = log K(25 C) 298.15/T on the reaction as written
--   isocoulombic  the same on the reaction made isocoulombic with the water
--                 ionisation (px_isocoulombic_logK; Gu, Gammons and Bloom 1994)
--   HKF (SH88)    only for reactions whose product is an HKF species with
--                 published parameters: the product's parameters re-derived by
--                 the Shock and Helgeson 1988 correlations from its S, Cp and V
--                 at 25 C (px_hkf_estimate), the other species unchanged.
-- API: M.run(phlox) -> rows, summary;  M.render(rows, summary) -> markdown;
--      M.DOCUMENTED: the summary as documented (docs/thermo.md), checked by
--      tests/scripts/test_temperature_estimates.lua.
local M = {}

local T0C = 273.15
local TR = 298.15
local R_GAS = 8.314462618   -- J/(mol K), CODATA 2018
local LN10 = math.log(10)
M.TEMPS = { 100, 200, 300 }  -- C (1 bar at 100 C... psat above: phlox's default pressure)
M.METHODS = { "held", "one-term", "isocoulombic", "HKF (SH88)" }
-- (the Kopp-Neumann methods, M.KOPP_METHODS, are summarised in sum too)

-- Reactions of HKF species (no logk record of their own) with measured
-- temperature dependence through their published HKF sets; the product is
-- the species the HKF re-estimate replaces.
M.HKF_REACTIONS = {
  { "CO2(aq) + H2O(l) = HCO3^- + H^+", "HCO3^-", "carbonate, first dissociation" },
  { "H2S(aq) = HS^- + H^+", "HS^-", "sulfide, first dissociation" },
  { "NH4^+ = NH3(aq) + H^+", "NH3(aq)", "ammonium" },
  { "HSO4^- = SO4^2- + H^+", "SO4^2-", "bisulfate" },
  { "HCO3^- + H^+ = CO2(aq) + H2O(l)", "CO2(aq)", "carbonate, first association" },
}

local function kind_of(rec)
  if rec.logK_T then return "logK_T" end
  return "dH"
end

local function class_of(rx)
  local left, right = rx:match("^(.-) = (.*)$")
  if right:find("%(s") or left:find("%(s") then return "solid" end
  if right:find("H^+", 1, true) and left:find("H2O(l)", 1, true) then return "hydrolysis" end
  if right:find("H^+", 1, true) or left:find("H^+", 1, true) then return "acid-base" end
  return "complex"
end

-- every library reaction with measured temperature data, no electrons or gases
local function collect(phlox, lib)
  local out = {}
  for _, s in ipairs(lib:list()) do
    if s.model == "logk" and s.basis == "measured" and s.reaction
       and not s.reaction:find("e-", 1, true) and not s.reaction:find("(g)", 1, true) then
      out[#out + 1] = { reaction = s.reaction, species = s.formula, basis = s.logK_T and "logK_T" or "dH",
                        file = s.file, Tmax = s.Tmax }
    end
  end
  table.sort(out, function(a, b) return a.reaction < b.reaction end)
  for _, h in ipairs(M.HKF_REACTIONS) do
    out[#out + 1] = { reaction = h[1], species = h[2], basis = "HKF", hkf = true, label = h[3],
                      Tmax = lib:species(h[2]).Tmax }
  end
  return out
end

-- Kopp-Neumann validation: solids with published Cp functions, their Cp
-- re-estimated (a) from Kopp's atomic heats alone and (b) from a component
-- with a published Cp (oxide, anhydrous salt or elements) plus Kopp's heats
-- for the rest.  The error is G(estimate) - G(published) at T, in log K
-- units per formula unit (dG/(RT ln10)), as it moves a boundary.
M.KOPP_PAIRS = {
  { "Mg(OH)2(s,brucite)", { ["MgO(s,periclase)"] = 1 } },
  { "Ca(OH)2(s,portlandite)", { ["CaO(s,lime)"] = 1 } },
  { "Al(OH)3(s,gibbsite)", { ["Al2O3(s,corundum)"] = 0.5 } },
  { "AlO(OH)(s,boehmite)", { ["Al2O3(s,corundum)"] = 0.5 } },
  { "NaOH(s)", { ["Na2O(s)"] = 0.5 } },
  { "CaSO4*2H2O(s,gypsum)", { ["CaSO4(s,anhydrite)"] = 1 } },
  { "CuSO4*5H2O(s,chalcanthite)", { ["CuSO4(s,chalcocyanite)"] = 1 } },
  { "ZnSO4*7H2O(s,goslarite)", { ["ZnSO4(s,zincosite)"] = 1 } },
  { "MgCO3(s,magnesite)", { ["MgO(s,periclase)"] = 1 } },
  { "MnCO3(s,rhodochrosite)", { ["MnO(s,manganosite)"] = 1 } },
  { "ZnCO3(s,smithsonite)", { ["ZnO(s,zincite)"] = 1 } },
  { "PbCO3(s,cerussite)", { ["PbO(s,litharge)"] = 1 } },
  { "CuO(s,tenorite)", { ["Cu(s)"] = 1 } },
  { "Cu2O(s,cuprite)", { ["Cu(s)"] = 2 } },
  { "FeS(s,troilite)", { ["Fe(s)"] = 1, ["S(s,rhombic)"] = 1 } },
  { "ZnS(s,sphalerite)", { ["Zn(s)"] = 1, ["S(s,rhombic)"] = 1 } },
  { "PbS(s,galena)", { ["Pb(s)"] = 1, ["S(s,rhombic)"] = 1 } },
  { "NiS(s,millerite)", { ["Ni(s)"] = 1, ["S(s,rhombic)"] = 1 } },
  { "Cu2S(s,chalcocite)", { ["Cu(s)"] = 2, ["S(s,rhombic)"] = 1 } },
  { "FeS2(s,pyrite)", { ["Fe(s)"] = 1, ["S(s,rhombic)"] = 2 } },
  { "AgCl(s,chlorargyrite)", { ["Ag(s)"] = 1 } },
  { "NaCl(s,halite)", { ["Na(s)"] = 1 } },
}
M.KOPP_METHODS = { "Kopp atoms", "Kopp + component", "Cp = 0" }

local function lua_str(x) return ("%q"):format(x) end

local function kopp_file(lib, pairs_, mode)
  local with_from = mode == "Kopp + component"
  local out = { "return { units = { energy = \"J\", entropy = \"J\" }, species = {" }
  for _, pr in ipairs(pairs_) do
    local r = lib:species(pr[1])
    local from = {}
    if with_from then
      local keys = {}
      for k in pairs(pr[2]) do keys[#keys + 1] = k end
      table.sort(keys)
      for _, k in ipairs(keys) do from[#from + 1] = ("[%s] = %.17g"):format(lua_str(k), pr[2][k]) end
    end
    out[#out + 1] = ("{ formula = %s, model = \"cp\", G = %.17g, H = %.17g, S = %.17g, V = %.17g,"):format(
      lua_str(pr[1]), r.dfG, r.dfH, r.S, lib:props(pr[1], { T = TR, P = 1 }).V * 10)
    if mode == "Cp = 0" then
      out[#out + 1] = "  known_mismatch = \"validation copy\", source = \"validation copy\" },"
    else
      out[#out + 1] = ("  estimate = { Cp = \"kopp\", from = { %s } }, known_mismatch = \"validation copy\", source = \"validation copy\" },"):format(
        table.concat(from, ", "))
    end
  end
  out[#out + 1] = "} }"
  return table.concat(out, "\n")
end

-- the pairs whose solid and components are cp records with published Cp
-- functions in the library (the data move: a solid redefined by a measured
-- Ksp is a logk record and drops out)
local function kopp_pairs(lib)
  local function published(f)
    local r = lib:species(f)
    return r and r.model == "cp" and r.basis == "measured"
  end
  local out = {}
  for _, pr in ipairs(M.KOPP_PAIRS) do
    local ok = published(pr[1])
    for k in pairs(pr[2]) do ok = ok and published(k) end
    if ok then out[#out + 1] = pr end
  end
  return out
end

local function run_kopp(phlox, lib)
  local pairs_ok = kopp_pairs(lib)
  local libs = {}
  for i, mode in ipairs(M.KOPP_METHODS) do
    local path = os.tmpname()
    local fh = assert(io.open(path, "wb"))
    fh:write(kopp_file(lib, pairs_ok, mode))
    fh:close()
    local ok, l = pcall(phlox.library, { user = { path }, table.unpack(phlox.available_elements()) })
    os.remove(path)
    if not ok then error("estimates: Kopp validation copies: " .. tostring(l)) end
    libs[i] = l
  end
  local rows, sum = {}, {}
  for _, m in ipairs(M.KOPP_METHODS) do
    sum[m] = {}
    for _, tc in ipairs(M.TEMPS) do sum[m][tc] = { n = 0, abs = 0, max = 0 } end
  end
  for _, pr in ipairs(pairs_ok) do
    local r = { formula = pr[1], from = pr[2], cp25 = lib:props(pr[1], { T = TR, P = 1 }).Cp, est = {}, err = {} }
    for i, m in ipairs(M.KOPP_METHODS) do
      local rec = libs[i]:species(pr[1])
      if rec.basis ~= (m == "Cp = 0" and "no Cp" or "estimated") then
        error("estimates: " .. pr[1] .. " copy has basis " .. tostring(rec.basis))
      end
      r.est[m] = libs[i]:props(pr[1], { T = TR, P = 1 }).Cp
      r.err[m] = {}
      for _, tc in ipairs(M.TEMPS) do
        local T = tc + T0C
        local dG = libs[i]:props(pr[1], { T = T }).G - lib:props(pr[1], { T = T }).G
        local e = dG / (R_GAS * T * LN10)
        r.err[m][tc] = e
        local s = sum[m][tc]
        s.n, s.abs, s.max = s.n + 1, s.abs + math.abs(e), math.max(s.max, math.abs(e))
      end
    end
    rows[#rows + 1] = r
  end
  for _, m in ipairs(M.KOPP_METHODS) do
    for _, tc in ipairs(M.TEMPS) do sum[m][tc].mean = sum[m][tc].abs / sum[m][tc].n end
  end
  return rows, sum
end

-- HKF correlations per species: every HKF species with published parameters
-- and a charge the correlations cover (-2..+2), its parameters re-derived
-- from its own S, Cp and V at 25 C; error = (G_est - G_rec)/(RT ln10), the
-- error in log K of any reaction that forms one of it.  Left out: H^+ (zero
-- by convention) and the species phlox's omega intercepts were derived
-- from (docs/thermo.md, "HKF estimation"), which agree by construction.
M.HKF_INTERCEPT_SPECIES = { ["H^+"] = true, ["O2(aq)"] = true, ["H2(aq)"] = true, ["HSO4^-"] = true,
  ["H2PO4^-"] = true, ["HPO4^2-"] = true, ["NH4^+"] = true, ["Fe^2+"] = true }
M.HKF_SPECIES_METHOD = "HKF (SH88), per species"

local function run_hkf_species(lib)
  local rows, sum = {}, {}
  for _, tc in ipairs(M.TEMPS) do sum[tc] = { n = 0, abs = 0, max = 0 } end
  for _, s in ipairs(lib:list()) do
    if s.model == "hkf" and not s.estimated and math.abs(s.charge) <= 2
       and not M.HKF_INTERCEPT_SPECIES[s.formula] then
      local r = { formula = s.formula, err = {} }
      for _, tc in ipairs(M.TEMPS) do
        local T = tc + T0C
        local ge, gr = lib.db:hkf_reestimate(s.formula, T)
        if not ge then error("estimates: " .. s.formula .. ": " .. tostring(gr)) end
        local e = (ge - gr) / (R_GAS * T * LN10)
        r.err[tc] = e
        local m = sum[tc]
        m.n, m.abs, m.max = m.n + 1, m.abs + math.abs(e), math.max(m.max, math.abs(e))
      end
      rows[#rows + 1] = r
    end
  end
  for _, tc in ipairs(M.TEMPS) do sum[tc].mean = sum[tc].abs / sum[tc].n end
  return rows, sum
end

-- Single-ion heat capacities (issue 12): an ion with a measured dfH but no
-- heat capacity of its own, defined by its formation reaction from the
-- elements (Co(s) + 2 H^+ = Co^2+ + H2(g)).  Every ion of the library whose
-- heat capacity is measured and whose formation reaction phlox can write is
-- redefined that way from its own 25 C log K and dH (a validation copy, a
-- user file) and evaluated by
--   dCp = 0          van 't Hoff on the formation reaction (what the ions
--                    without Cp had before)
--   model ion        estimate = { dCp = "isocoulombic", model = <the same
--                    reaction of another measured ion> }: the C code's
--                    isocoulombic dCp (model substance, Lindsay 1980); the
--                    model by the rule below, never the ion itself
--   Criss-Cobble     (cations only) Kirchhoff with the constant dCp of the
--                    Criss and Cobble 1964 mean ionic heat capacity, cation
--                    class, as tests/scripts/test_divalent_ion_methods.lua
-- The error is (G(estimate) - G(record))/(RT ln10) of the ion, in log K of
-- any reaction forming one of it; a row is compared only where the ion's
-- record and the model's data are valid.
-- The rule: the model is a measured ion of the same charge and kind (metal
-- cation; oxyanion without H; oxyanion with H) whose S at 25 C is closest
-- (the Born coefficient omega, which dominates the heat capacity of an ion
-- at high temperature, is linear in S in the Shock and Helgeson 1988
-- correlation, docs/thermo.md).  A measured ion: an HKF record with a
-- published set, or a logk record with a fitted log K(T) from such ions.
M.ION_METHODS = { "dCp = 0", "model ion", "Criss-Cobble" }
M.ION_TARGETS = {
  { ion = "Ca^2+", rx = "Ca(s) + 2 H^+ = Ca^2+ + H2(g)", kind = "metal cation" },
  { ion = "Mg^2+", rx = "Mg(s) + 2 H^+ = Mg^2+ + H2(g)", kind = "metal cation" },
  { ion = "Na^+", rx = "Na(s) + H^+ = Na^+ + 0.5 H2(g)", kind = "metal cation" },
  { ion = "K^+", rx = "K(s) + H^+ = K^+ + 0.5 H2(g)", kind = "metal cation" },
  { ion = "SO4^2-", rx = "S(s,rhombic) + 2 O2(g) + H2(g) = SO4^2- + 2 H^+", kind = "oxyanion" },
  { ion = "CO3^2-", rx = "C(s,graphite) + 1.5 O2(g) + H2(g) = CO3^2- + 2 H^+", kind = "oxyanion" },
  { ion = "NO3^-", rx = "0.5 N2(g) + 1.5 O2(g) + 0.5 H2(g) = NO3^- + H^+", kind = "oxyanion" },
  { ion = "HSO4^-", rx = "S(s,rhombic) + 2 O2(g) + H2(g) = HSO4^- + H^+", kind = "acid oxyanion" },
  { ion = "HCO3^-", rx = "C(s,graphite) + 1.5 O2(g) + H2(g) = HCO3^- + H^+", kind = "acid oxyanion" },
  -- the HKF estimates from a published Cp at 25 C (Shock et al. 1997 and
  -- reviews): a reference of lower rank, targets only, never models
  { ion = "Fe^2+", rx = "Fe(s) + 2 H^+ = Fe^2+ + H2(g)", kind = "metal cation", secondary = true },
  { ion = "Ni^2+", rx = "Ni(s) + 2 H^+ = Ni^2+ + H2(g)", kind = "metal cation", secondary = true },
  { ion = "Zn^2+", rx = "Zn(s) + 2 H^+ = Zn^2+ + H2(g)", kind = "metal cation", secondary = true },
  { ion = "Mn^2+", rx = "Mn(s) + 2 H^+ = Mn^2+ + H2(g)", kind = "metal cation", secondary = true },
}
local CAL = 4.184
-- Criss and Cobble 1964, cation class (alpha, beta in cal/(mol K)), from
-- memory: 25-100 C and 25-200 C means, the latter held above 200 C (as
-- tests/scripts/test_divalent_ion_methods.lua and Fe.lua)
M.CC_CATION = { [100] = { 46, -0.55 }, [200] = { 50, -0.63 }, [300] = { 50, -0.63 } }

-- the kind of an ion for the rule: "metal cation", "oxyanion", "acid oxyanion"
function M.ion_kind(formula, charge)
  if charge > 0 then return "metal cation" end
  local body = formula:gsub("%^.*$", "")
  if body:find("O", 1, true) then return body:find("H", 1, true) and "acid oxyanion" or "oxyanion" end
  return "anion"
end

-- the measured ion of the same charge and kind whose S at 25 C is closest
-- to S25 (nil if none); candidates: M.ION_TARGETS without secondary ones
function M.ion_model(lib, charge, kind, S25, skip)
  local best, d
  for _, t in ipairs(M.ION_TARGETS) do
    local sp = lib:species(t.ion)
    if not t.secondary and t.ion ~= skip and sp and sp.charge == charge and t.kind == kind
       and sp.basis == "measured" and (sp.model == "hkf" or sp.logK_T) then
      local dd = math.abs(lib:props(t.ion, { T = TR, P = 1 }).S - S25)
      if not d or dd < d then best, d = t, dd end
    end
  end
  return best
end

-- the model reaction for ion with formation reaction rx: the model ion's
-- formation reaction as the target tables write it
local function ion_copy_lib(phlox, ion, rx, k25, dH, model)
  local path = os.tmpname()
  local fh = assert(io.open(path, "wb"))
  local est = model and ("estimate = { dCp = \"isocoulombic\", model = %s }, "):format(lua_str(model)) or ""
  fh:write(("return { units = { energy = \"J\" }, species = { { formula = %s, model = \"logk\", reaction = %s, "
    .. "logK = %.17g, dH = %.17g, %ssource = \"validation copy\" } } }\n"):format(lua_str(ion), lua_str(rx), k25, dH, est))
  fh:close()
  local ok, l = pcall(phlox.library, { user = { path }, table.unpack(phlox.available_elements()) })
  os.remove(path)
  if not ok then error("estimates: ion copy of " .. ion .. ": " .. tostring(l)) end
  return l
end

local function run_ions(phlox, lib)
  local rows, sum = {}, {}
  for _, t in ipairs(M.ION_TARGETS) do
    local sp = lib:species(t.ion)
    local r25 = assert(lib:reaction(t.rx, { T = TR, P = 1 }))
    local S25 = lib:props(t.ion, { T = TR, P = 1 }).S
    local m = M.ion_model(lib, sp.charge, t.kind, S25, t.ion)
    local row = { ion = t.ion, kind = t.kind, charge = sp.charge, secondary = t.secondary, rx = t.rx,
                  model = m and m.ion, model_rx = m and m.rx, err = {} }
    local libs = { ["dCp = 0"] = ion_copy_lib(phlox, t.ion, t.rx, r25.logK, r25.dH) }
    if m then libs["model ion"] = ion_copy_lib(phlox, t.ion, t.rx, r25.logK, r25.dH, m.rx) end
    local Tmax = math.min(sp.Tmax or math.huge, m and lib:species(m.ion).Tmax or math.huge)
    for _, meth in ipairs(M.ION_METHODS) do row.err[meth] = {} end
    for _, tc in ipairs(M.TEMPS) do
      local T = tc + T0C
      if T <= Tmax + 1e-6 then
        local g_ref = lib:props(t.ion, { T = T }).G
        local k = R_GAS * T * LN10
        for meth, l in pairs(libs) do
          local cp = l:species(t.ion)
          if cp.basis ~= (meth == "dCp = 0" and "measured" or "estimated") then
            error("estimates: " .. t.ion .. " copy (" .. meth .. ") has basis " .. tostring(cp.basis))
          end
          row.err[meth][tc] = (l:props(t.ion, { T = T }).G - g_ref) / k
        end
        if sp.charge > 0 then
          -- Criss-Cobble: conventional mean Cp = alpha (1 - z) + beta S (cal), constant dCp
          local a, b = M.CC_CATION[tc][1], M.CC_CATION[tc][2]
          local z = sp.charge
          local rest = 0 -- Cp at 25 C of the other species of the formation reaction
          for term in (t.rx:gsub(" = ", " + ") .. " + "):gmatch("(.-) %+ ") do
            local nu, f = term:match("^([%d.]+) (.+)$")
            nu, f = tonumber(nu) or 1, f or term
            if f ~= t.ion and f ~= "H^+" then
              local side = t.rx:match("^(.-) = "):find(f, 1, true) and -1 or 1
              rest = rest + side * nu * lib:props(f, { T = TR, P = 1 }).Cp
            end
          end
          local dcp = (a * (1 - z) + b * S25 / CAL) * CAL + rest
          local g_vant = libs["dCp = 0"]:props(t.ion, { T = T }).G
          local dG = dcp * ((T - TR) - T * math.log(T / TR))
          row.err["Criss-Cobble"][tc] = (g_vant + dG - g_ref) / k
        end
      end
    end
    rows[#rows + 1] = row
  end
  -- mean and max |error| by (charge, kind) and method, primary references only
  for _, row in ipairs(rows) do
    if not row.secondary then
      local key = ("%+d %s"):format(row.charge, row.kind)
      for _, meth in ipairs(M.ION_METHODS) do
        for _, tc in ipairs(M.TEMPS) do
          local e = row.err[meth][tc]
          if e then
            local name = key .. ": " .. meth
            sum[name] = sum[name] or {}
            for _, tt in ipairs(M.TEMPS) do sum[name][tt] = sum[name][tt] or { n = 0, abs = 0, max = 0 } end
            local s = sum[name][tc]
            s.n, s.abs, s.max = s.n + 1, s.abs + math.abs(e), math.max(s.max, math.abs(e))
          end
        end
      end
    end
  end
  for _, byT in pairs(sum) do
    for _, s in pairs(byT) do s.mean = s.n > 0 and s.abs / s.n or 0 end
  end
  return rows, sum
end

-- The library's ions with an isocoulombic dCp and the model ion the rule
-- picks for each (tests/scripts/test_ion_heat_capacity.lua checks that the
-- element files name it).
function M.library_ion_models(lib)
  local out = {}
  for _, s in ipairs(lib:list()) do
    if s.basis_method and s.basis_method:find("model substance", 1, true) then
      local S25 = lib:props(s.formula, { T = TR, P = 1 }).S
      local m = M.ion_model(lib, s.charge, M.ion_kind(s.formula, s.charge), S25)
      local named
      for term in (s.estimate_model:gsub(" = ", " + ") .. " + "):gmatch("(.-) %+ ") do
        local f = term:match("^[%d.]+ (.+)$") or term
        local sp = lib:species(f)
        if f ~= "H^+" and sp and sp.charge ~= 0 then named = f end
      end
      out[#out + 1] = { species = s.formula, S = S25, model = s.estimate_model, named = named,
                        rule = m and m.ion, file = s.file }
    end
  end
  return out
end

-- Isocoulombic estimates with a MODEL REACTION (docs/thermo.md, "Model
-- reactions"): the complex's reaction R minus a reaction M of the same charge
-- type with measured data, R - M + n W made isocoulombic.  Two rules choose M:
--   same type    another complex of the library of the same ligand and the
--                same charges (metal charge, ligand charge and number), with
--                measured data valid to 300 C; of several, the one whose
--                log K at 25 C is closest to R's; never a reaction sharing
--                R's product (leave-one-out)
--   ligand acid  nu times the protonation of R's one ligand L, H^+ + L = HL,
--                where HL and L have measured data (M.LIGAND_ACIDS)
-- Each estimate comes from a validation copy of the species (a user file,
-- the species redefined with its 25 C log K and the model), evaluated by the
-- C code (px_isocoulombic_logK's model form).
M.MODEL_METHODS = { "model: same type", "model: ligand acid" }
M.MODEL_TMIN = 573.15 -- K: a model's data must reach 300 C
M.LIGAND_ACIDS = {
  ["F^-"] = "H^+ + F^- = HF(aq)",
  ["SO4^2-"] = "H^+ + SO4^2- = HSO4^-",
  ["CO3^2-"] = "H^+ + CO3^2- = HCO3^-",
  ["HCO3^-"] = "H^+ + HCO3^- = CO2(aq) + H2O(l)",
  ["H2PO4^-"] = "H^+ + H2PO4^- = H3PO4(aq)",
  ["NH3(aq)"] = "H^+ + NH3(aq) = NH4^+",
  ["HS^-"] = "H^+ + HS^- = H2S(aq)",
}

-- the parts of a complexation "M + nu L = ML": metal, ligand, nu, product
local function complex_parts(lib, rx)
  local left, right = rx:match("^(.-) = (.*)$")
  if not left or right:find(" + ", 1, true) then return nil end
  local terms = {}
  for term in (left .. " + "):gmatch("(.-) %+ ") do
    local nu, f = term:match("^(%d+) (.+)$")
    terms[#terms + 1] = { nu = tonumber(nu) or 1, f = f or term }
  end
  if #terms ~= 2 then return nil end
  local function z(f) local sp = lib:species(f); return sp and sp.charge end
  local a, b = terms[1], terms[2]
  if not z(a.f) or not z(b.f) then return nil end
  -- the metal: the cation (or the first, ammines: the charged one)
  if z(b.f) > z(a.f) then a, b = b, a end
  if a.nu ~= 1 then return nil end
  return { metal = a.f, zm = z(a.f), ligand = b.f, zl = z(b.f), nu = b.nu, product = right }
end

-- every species of reaction text rx has measured temperature data
local function all_measured(lib, rx)
  for term in (rx:gsub(" = ", " + ") .. " + "):gmatch("(.-) %+ ") do
    local f = term:match("^[%d/.]+ (.+)$") or term
    local sp = lib:species(f)
    if f ~= "H2O(l)" and not (sp and sp.basis == "measured") then return false end
  end
  return true
end

local function model_of(rule, lib, r, parts, measured)
  local m, rank = M.model_choice(rule, lib, r, parts, measured)
  if m and all_measured(lib, m) then return m, rank end
  return nil
end

function M.model_choice(rule, lib, r, parts, measured)
  if rule == "model: ligand acid" then
    local acid = M.LIGAND_ACIDS[parts.ligand]
    if not acid then return nil end
    local lft, rgt = acid:match("^(.-) = (.*)$")
    if parts.nu == 1 then return acid end
    local function times(side)
      local out = {}
      for term in (side .. " + "):gmatch("(.-) %+ ") do
        local nu, f = term:match("^(%d+) (.+)$")
        out[#out + 1] = ("%d %s"):format((tonumber(nu) or 1) * parts.nu, f or term)
      end
      return table.concat(out, " + ")
    end
    return times(lft) .. " = " .. times(rgt)
  end
  local best, rank, dist
  for _, o in ipairs(measured) do
    local q = o.parts
    if o ~= r and q.product ~= parts.product and q.zm == parts.zm and q.zl == parts.zl
       and q.nu == parts.nu and q.ligand == parts.ligand and (o.Tmax or math.huge) >= M.MODEL_TMIN
       and all_measured(lib, o.reaction) then
      local d = math.abs(o.logK25 - r.logK25)
      if not dist or d < dist then best, rank, dist = o.reaction, 1, d end
    end
  end
  return best, rank
end

-- s5-cucl: the second rule, where no complex of the same type qualifies.  A
-- complex M + nu L = ML (nu >= 2) whose step ML' + L = ML joins two
-- monovalent anions into a divalent one (ML' = M + (nu-1) L with measured
-- data; the metal cancels in R - M and is not asked to be measured) is
-- balanced by charge type with the sulfate protonation, whose
-- species carry SH88 HKF sets regressed on measured data:
--   R - M = ML' + L + SO4^2- + H2O(l) = ML + HSO4^- + OH^-   (n = 0), i.e.
--   M = metal + (nu-1) L + HSO4^- + OH^- = ML' + SO4^2- + H2O(l).
-- Evidence: M.SULFATE_ANALOG (docs/data/ligands.md, Cu(I) chloride).
M.SULFATE_ANALOG = "HCO3^- + OH^- = CO3^2- + H2O(l)"  -- two anions join, logK_T measured to 250 C
function M.sulfate_step_model(lib, parts)
  if parts.nu < 2 or parts.zl ~= -1 then return nil end
  local prod = lib:species(parts.product)
  if not prod or prod.charge ~= -2 then return nil end
  local lower_lhs = parts.nu == 2 and ("%s + %s"):format(parts.metal, parts.ligand)
    or ("%s + %d %s"):format(parts.metal, parts.nu - 1, parts.ligand)
  for _, o in ipairs(lib:list()) do
    if o.model == "logk" and o.reaction and o.charge == -1 and o.basis == "measured"
       and o.reaction == lower_lhs .. " = " .. o.formula then
      -- the metal cancels in R - M (the loader's own criterion); the rest must be measured
      local m = ("%s + HSO4^- + OH^- = %s + SO4^2- + H2O(l)"):format(lower_lhs, o.formula)
      if all_measured(lib, ("%s + HSO4^- + OH^- = %s + SO4^2- + H2O(l)"):format(parts.ligand, o.formula)) then
        return m
      end
    end
  end
  return nil
end

M.SULFATE_AUX = "SO4^2- + H2O(l) = HSO4^- + OH^-"
M.SULFATE_TEMPS = { 100, 150, 200, 250, 300 }
-- the evidence for the sulfate rule: M.SULFATE_ANALOG by each method, within
-- its species' declared range (estimate - measured, log K); and the steps the
-- library estimates with it (log K, no measured value)
function M.sulfate_analog(lib)
  local function K(rx, tc) return assert(lib.db:reaction(rx, tc + T0C)).logK end
  local a25 = assert(lib.db:reaction(M.SULFATE_AUX, TR, 1.0)).logK
  local r25 = assert(lib.db:reaction(M.SULFATE_ANALOG, TR, 1.0))
  local tmax = math.huge
  for _, f in ipairs { "HCO3^-", "OH^-", "CO3^2-" } do tmax = math.min(tmax, lib:species(f).Tmax or math.huge) end
  local out = { reaction = M.SULFATE_ANALOG, logK25 = r25.logK, rows = {}, steps = {} }
  for _, tc in ipairs(M.SULFATE_TEMPS) do
    local T = tc + T0C
    if T <= tmax + 1e-6 then
      local meas = K(M.SULFATE_ANALOG, tc)
      out.rows[#out.rows + 1] = { T_C = tc, meas = meas, held = r25.logK - meas,
        water = r25.logK * TR / T - meas,
        sulfate = (r25.logK + a25) * TR / T - K(M.SULFATE_AUX, tc) - meas,
        vanthoff = r25.logK - r25.dH / (R_GAS * LN10) * (1 / T - 1 / TR) - meas }
    end
  end
  for _, x in ipairs { { "CuCl3^2-", "CuCl2^- + Cl^- = CuCl3^2-" }, { "AgCl3^2-", "AgCl2^- + Cl^- = AgCl3^2-" } } do
    if lib:species(x[1]) then
      local st = { species = x[1], reaction = x[2], logK = {} }
      for _, tc in ipairs { 25, 100, 200, 300 } do st.logK[tc] = K(x[2], tc) end
      out.steps[#out.steps + 1] = st
    end
  end
  return out
end

-- The rule applied to the library: every estimated complex (a logk record
-- with the isocoulombic estimate whose reaction is "M + nu L = ML") and the
-- model the "same type" rule picks for it (nil: none qualifies, the water
-- ionisation alone).  tests/scripts/test_temperature_estimates.lua checks
-- that the element files name exactly these models.
function M.library_models(lib, measured)
  local out = {}
  for _, s in ipairs(lib:list()) do
    if s.model == "logk" and s.basis == "estimated" and s.reaction
       and not s.reaction:find("H2O(l)", 1, true) and not s.reaction:find("H^+", 1, true)
       and not s.reaction:find("(s", 1, true) and not s.reaction:find("e-", 1, true) then
      local parts = complex_parts(lib, s.reaction)
      if parts then
        local k25 = assert(lib.db:reaction(s.reaction, TR, 1.0)).logK
        local mrx = model_of("model: same type", lib, { logK25 = k25 }, parts, measured)
        if not mrx then mrx = M.sulfate_step_model(lib, parts) end
        out[#out + 1] = { species = s.formula, reaction = s.reaction, model = mrx, file = s.file }
      end
    end
  end
  return out
end

-- mean abs. errors of the summed entries: mean, and base_mean and
-- held_mean where those sums were kept (0 without entries)
local function finish_means(sum, methods)
  for _, m in ipairs(methods) do
    for _, tc in ipairs(M.TEMPS) do
      local s = sum[m][tc]
      local function mean(x) return s.n > 0 and (x or 0) / s.n or 0 end
      s.mean = mean(s.abs)
      if s.base then s.base_mean, s.held_mean = mean(s.base), mean(s.held) end
    end
  end
end

local function run_models(phlox, lib, rows)
  local measured = {}
  for _, r in ipairs(rows) do
    if not r.hkf and r.class == "complex" then
      r.parts = complex_parts(lib, r.reaction)
      if r.parts then measured[#measured + 1] = r end
    end
  end
  local sum = {}
  for _, m in ipairs(M.MODEL_METHODS) do
    sum[m] = {}
    for _, tc in ipairs(M.TEMPS) do sum[m][tc] = { n = 0, abs = 0, max = 0, base = 0 } end
  end
  for _, r in ipairs(measured) do
    r.model = {}
    for _, m in ipairs(M.MODEL_METHODS) do
      local mrx, rank = model_of(m, lib, r, r.parts, measured)
      if mrx then
        local path = os.tmpname()
        local fh = assert(io.open(path, "wb"))
        fh:write(("return { species = { { formula = %s, model = \"logk\", reaction = %s, logK = %.17g,\n"
          .. "  estimate = { method = \"isocoulombic\", model = %s }, source = \"validation copy\" } } }\n"):format(
          lua_str(r.species), lua_str(r.reaction), r.logK25, lua_str(mrx)))
        fh:close()
        local ok, l = pcall(phlox.library, { user = { path }, table.unpack(phlox.available_elements()) })
        os.remove(path)
        if not ok then error("estimates: model copy of " .. r.species .. ": " .. tostring(l)) end
        r.model[m] = { reaction = mrx, err = {}, rank = rank }
        for _, tc in ipairs(M.TEMPS) do
          if r.meas[tc] then
            local k, why = l.db:reaction(r.reaction, tc + T0C)
            if not k then error("estimates: model copy of " .. r.species .. " at " .. tc .. " C: " .. tostring(why)) end
            local e = k.logK - r.meas[tc]
            r.model[m].err[tc] = e
            local s = sum[m][tc]
            s.n, s.abs, s.max = s.n + 1, s.abs + math.abs(e), math.max(s.max, math.abs(e))
            s.base = s.base + math.abs(r.err["isocoulombic"][tc])
            s.held = (s.held or 0) + math.abs(r.err["held"][tc])
          end
        end
      end
    end
  end
  finish_means(sum, M.MODEL_METHODS)
  return measured, sum
end

-- Higher hydrolysis steps (a second or later OH^-, or an OH^- added to a
-- neutral species or solid): the rows of the table above of that kind, and
-- one reference read for this purpose, gibbsite + OH^- = Al(OH)4^- at 50
-- and 100 C (Wesolowski 1992, abstract read: tests/tools/checks_def.lua,
-- wes92_logK), each method started from the paper's own 25 C value.
M.NIO_REACTION = "NiO(s,bunsenite) + H2O(l) = Ni(OH)2(aq)"
M.HIGHER_EXTERNAL = { reaction = "Al(OH)3(s,gibbsite) + OH^- = Al(OH)4^-", temps = { 50, 100 } }
function M.higher_hydrolysis(lib, rows)
  local out = { rows = {}, external = {} }
  for _, r in ipairs(rows) do
    local nw = tonumber(r.reaction:match("(%d+) H2O%(l%) = ")) or 1
    if (r.class == "hydrolysis" and nw >= 2 and not r.reaction:find("^2 ")) or r.reaction:find("+ OH^- =", 1, true) then
      out.rows[#out.rows + 1] = r
    end
  end
  local checks = dofile((debug.getinfo(1, "S").source:match("^@(.*)[/\\]") or ".") .. "/checks_def.lua")
  local k25 = checks.wes92_logK(TR)
  for _, tc in ipairs(M.HIGHER_EXTERNAL.temps) do
    local T = tc + T0C
    local meas = checks.wes92_logK(T)
    local iso, n = lib.db:isocoulombic(M.HIGHER_EXTERNAL.reaction, k25, T)
    out.external[#out.external + 1] = { tc = tc, meas = meas, n = n, held = k25 - meas, iso = iso - meas,
      source = checks.WES92 }
  end
  out.logK25 = k25
  return out
end

function M.run(phlox)
  local lib = phlox.library(phlox.available_elements())
  local rows = collect(phlox, lib)
  local sum = {}
  for _, m in ipairs(M.METHODS) do
    sum[m] = {}
    for _, tc in ipairs(M.TEMPS) do sum[m][tc] = { n = 0, abs = 0, max = 0 } end
  end
  for _, r in ipairs(rows) do
    local k25 = lib.db:reaction(r.reaction, TR, 1.0)
    if not k25 then error("estimates: " .. r.reaction .. " does not evaluate at 25 C") end
    r.logK25 = k25.logK
    r.class = class_of(r.reaction)
    r.meas, r.err = {}, {}
    for _, m in ipairs(M.METHODS) do r.err[m] = {} end
    r.n = select(2, lib.db:isocoulombic(r.reaction, r.logK25, TR))
    for _, tc in ipairs(M.TEMPS) do
      local T = tc + T0C
      -- beyond the record's declared range (a fit to 100 C, say) its value is
      -- an extrapolation, not measured data: no comparison there
      if T > (r.Tmax or math.huge) + 1e-6 then goto continue end
      local meas = assert(lib.db:reaction(r.reaction, T)).logK
      r.meas[tc] = meas
      local iso, n = lib.db:isocoulombic(r.reaction, r.logK25, T)
      if not iso then error("estimates: " .. r.reaction .. ": " .. tostring(n)) end
      r.err["held"][tc] = r.logK25 - meas
      r.err["one-term"][tc] = r.logK25 * TR / T - meas
      r.err["isocoulombic"][tc] = iso - meas
      if r.hkf then
        local rec = lib:species(r.species)
        local nu = 1
        if r.reaction:match("^(.-) = "):find(r.species, 1, true) then nu = -1 end
        local Ge, Gr = lib.db:hkf_reestimate(r.species, T)
        if Ge and not rec.estimated then
          -- log K changes by -nu dG/(RT ln10) when the product's G changes by dG
          r.err["HKF (SH88)"][tc] = -nu * (Ge - Gr) / (R_GAS * T * LN10)
        end
      end
      for _, m in ipairs(M.METHODS) do
        local e = r.err[m][tc]
        if e then
          local s = sum[m][tc]
          s.n, s.abs, s.max = s.n + 1, s.abs + math.abs(e), math.max(s.max, math.abs(e))
          -- by reaction class and whether water ionisations were added
          local key = r.class .. (r.n == 0 and ", n = 0" or ", n != 0")
          sum.by = sum.by or {}
          sum.by[key] = sum.by[key] or {}
          sum.by[key][m] = sum.by[key][m] or { n = 0, abs = 0 }
          if tc == 300 then
            local c = sum.by[key][m]
            c.n, c.abs = c.n + 1, c.abs + math.abs(e)
          end
        end
      end
      ::continue::
    end
  end
  finish_means(sum, M.METHODS)
  sum.kopp_rows, sum.kopp = run_kopp(phlox, lib)
  sum.hkf_rows, sum[M.HKF_SPECIES_METHOD] = run_hkf_species(lib)
  sum.model_rows, sum.model = run_models(phlox, lib, rows)
  sum.library_models = M.library_models(lib, sum.model_rows)
  sum.sulfate_analog = M.sulfate_analog(lib)
  sum.higher = M.higher_hydrolysis(lib, rows)
  sum.ion_rows, sum.ion = run_ions(phlox, lib)
  for k, v in pairs(sum.ion) do sum[k] = v end
  sum.ion_library = M.library_ion_models(lib)
  sum.nio = {}
  for _, tc in ipairs({ 150, 200, 250, 300 }) do
    sum.nio[#sum.nio + 1] = { tc = tc, logK = assert(lib:reaction(M.NIO_REACTION, { T_C = tc })).logK }
  end
  for _, m in ipairs(M.MODEL_METHODS) do sum[m] = sum.model[m] end
  for _, m in ipairs(M.KOPP_METHODS) do sum[m] = sum.kopp[m] end
  return rows, sum
end

-- The summary as documented in docs/thermo.md ("Temperature estimates"):
-- mean and maximum |estimate - measured| in log K, per method and
-- temperature.  tests/scripts/test_temperature_estimates.lua recomputes
-- them; a change in the data or the code that moves one by more than
-- M.DOC_MARGIN fails and the documentation has to be revisited.  Kopp rows:
-- G error of a solid in log K units per formula unit (run_kopp).
M.DOC_MARGIN = 0.005
M.DOCUMENTED = {
  ["held"] = { [100] = { mean = 1.086, max = 12.638 }, [200] = { mean = 2.106, max = 23.256 }, [300] = { mean = 2.856, max = 30.168 } },
  ["one-term"] = { [100] = { mean = 1.312, max = 7.685 }, [200] = { mean = 2.475, max = 14.141 }, [300] = { mean = 3.294, max = 18.345 } },
  ["isocoulombic"] = { [100] = { mean = 0.791, max = 5.603 }, [200] = { mean = 1.794, max = 11.312 }, [300] = { mean = 3.205, max = 16.376 } },
  ["HKF (SH88)"] = { [100] = { mean = 0.004, max = 0.008 }, [200] = { mean = 0.026, max = 0.045 }, [300] = { mean = 0.084, max = 0.182 } },
  ["HKF (SH88), per species"] = { [100] = { mean = 0.005, max = 0.014 }, [200] = { mean = 0.030, max = 0.080 }, [300] = { mean = 0.083, max = 0.182 } },
  ["Kopp atoms"] = { [100] = { mean = 0.006, max = 0.019 }, [200] = { mean = 0.022, max = 0.074 }, [300] = { mean = 0.042, max = 0.140 } },
  ["Kopp + component"] = { [100] = { mean = 0.006, max = 0.035 }, [200] = { mean = 0.022, max = 0.139 }, [300] = { mean = 0.044, max = 0.262 } },
  ["model: same type"] = { [100] = { mean = 0.307, max = 0.900 }, [200] = { mean = 0.537, max = 1.655 }, [300] = { mean = 1.065, max = 3.605 } },
  ["model: ligand acid"] = { [100] = { mean = 1.053, max = 2.443 }, [200] = { mean = 2.599, max = 6.240 }, [300] = { mean = 4.449, max = 10.952 } },
  ["Cp = 0"] = { [100] = { mean = 0.112, max = 0.464 }, [200] = { mean = 0.441, max = 1.825 }, [300] = { mean = 0.834, max = 3.449 } },
  -- single-ion heat capacities (run_ions; error in G of the ion, log K units)
  ["+1 metal cation: Criss-Cobble"] = { [100] = { mean = 0.091, max = 0.097 }, [200] = { mean = 0.390, max = 0.408 }, [300] = { mean = 0.705, max = 0.738 } },
  ["+1 metal cation: dCp = 0"] = { [100] = { mean = 0.021, max = 0.041 }, [200] = { mean = 0.085, max = 0.165 }, [300] = { mean = 0.161, max = 0.278 } },
  ["+1 metal cation: model ion"] = { [100] = { mean = 0.042, max = 0.043 }, [200] = { mean = 0.171, max = 0.173 }, [300] = { mean = 0.323, max = 0.325 } },
  ["+2 metal cation: Criss-Cobble"] = { [100] = { mean = 0.149, max = 0.164 }, [200] = { mean = 0.580, max = 0.650 }, [300] = { mean = 0.908, max = 1.043 } },
  ["+2 metal cation: dCp = 0"] = { [100] = { mean = 0.017, max = 0.029 }, [200] = { mean = 0.115, max = 0.167 }, [300] = { mean = 0.403, max = 0.501 } },
  ["+2 metal cation: model ion"] = { [100] = { mean = 0.024, max = 0.024 }, [200] = { mean = 0.105, max = 0.106 }, [300] = { mean = 0.196, max = 0.197 } },
  ["-1 acid oxyanion: dCp = 0"] = { [100] = { mean = 0.121, max = 0.134 }, [200] = { mean = 0.539, max = 0.581 }, [300] = { mean = 1.322, max = 1.398 } },
  ["-1 acid oxyanion: model ion"] = { [100] = { mean = 0.025, max = 0.028 }, [200] = { mean = 0.083, max = 0.088 }, [300] = { mean = 0.153, max = 0.159 } },
  ["-1 oxyanion: dCp = 0"] = { [100] = { mean = 0.152, max = 0.152 }, [200] = { mean = 0.622, max = 0.622 }, [300] = { mean = 1.424, max = 1.424 } },
  ["-2 oxyanion: dCp = 0"] = { [100] = { mean = 0.446, max = 0.485 }, [200] = { mean = 1.833, max = 1.999 } },
  ["-2 oxyanion: model ion"] = { [100] = { mean = 0.079, max = 0.081 }, [200] = { mean = 0.332, max = 0.337 } },
}

local function f2(x) return x and ("%+.2f"):format(x) or "" end

-- mean and max abs. error per method and temperature, one table
local function summary_table(w, sum, methods, what, numfmt)
  w("| method | T (°C) | " .. what .. " | mean abs. error | max abs. error |")
  w("|---|---|---|---|---|")
  local row = "| %s | %d | %d | " .. numfmt .. " | " .. numfmt .. " |"
  for _, m in ipairs(methods) do
    for _, tc in ipairs(M.TEMPS) do
      local s = sum[m][tc]
      w(row:format(m, tc, s.n, s.mean, s.max))
    end
  end
  w("")
end

function M.render(rows, sum)
  local out = {}
  local function w(...) out[#out + 1] = table.concat({ ... }) end
  w("## Temperature estimates against measured data")
  w("")
  w("<!-- Generated from tests/tools/estimates_def.lua. -->")
  w("")
  w("Every reaction of the standard library with measured temperature data (a")
  w("reaction enthalpy or an analytic log K(T); no electrons or gases), and five")
  w("reactions of HKF species with published parameters, evaluated at 100, 200 and")
  w("300 °C from their measured data and by each estimation method from the same")
  w("log K at 25 °C. Entries are estimate − measured in log K. *held*: the 25 °C")
  w("constant; *one-term*: log K·298.15/T on the reaction as written;")
  w("*isocoulombic*: the same on the reaction balanced with n water ionisations")
  w("(column n; docs/thermo.md); *HKF*: the product's HKF parameters re-derived by")
  w("the Shock and Helgeson 1988 correlations (HKF rows only). \"dH\" rows are")
  w("themselves a constant-enthalpy van 't Hoff extrapolation of a measured 25 °C")
  w("enthalpy, so above about 150 °C they are a weaker reference than the HKF and")
  w("logK_T rows. A record is compared only within its declared temperature range")
  w("(\"–\" beyond it: a fit to 100 °C is not measured data at 300 °C).")
  w("")
  summary_table(w, sum, M.METHODS, "reactions", "%.2f")
  w("Mean abs. error at 300 °C by reaction class (n = water ionisations the")
  w("isocoulombic form adds; with n = 0 it equals the one-term column):")
  w("")
  w("| class | reactions | held | one-term | isocoulombic |")
  w("|---|---|---|---|---|")
  local keys = {}
  for k in pairs(sum.by) do keys[#keys + 1] = k end
  table.sort(keys)
  for _, k in ipairs(keys) do
    local b = sum.by[k]
    if b.held.n > 0 then
      w(("| %s | %d | %.2f | %.2f | %.2f |"):format(k, b.held.n, b.held.abs / b.held.n,
        b["one-term"].abs / b["one-term"].n, b.isocoulombic.abs / b.isocoulombic.n))
    end
  end
  w("")
  w("| reaction | data | class | n | log K 25 °C | measured 100/200/300 | held | one-term | isocoulombic | HKF |")
  w("|---|---|---|---|---|---|---|---|---|---|")
  for _, r in ipairs(rows) do
    local function three(m)
      local e = r.err[m]
      if not e[100] then return "" end
      return ("%s %s %s"):format(f2(e[100]) , e[200] and f2(e[200]) or "–", e[300] and f2(e[300]) or "–")
    end
    local function m3(tc) return r.meas[tc] and ("%.2f"):format(r.meas[tc]) or "–" end
    w(("| `%s` | %s | %s | %d | %.2f | %s %s %s | %s | %s | %s | %s |"):format(r.reaction, r.basis, r.class,
      r.n, r.logK25, m3(100), m3(200), m3(300), three("held"), three("one-term"),
      three("isocoulombic"), three("HKF (SH88)")))
  end
  w("")
  w("### Isocoulombic estimates with a model reaction (complexes)")
  w("")
  w("Every complex \"M + ν L = ML\" above with a 25 °C log K and measured data,")
  w("estimated again with a *model reaction* M of the same charge type that has")
  w("measured data, subtracted before the water ionisations are added")
  w("(R − M + n W; docs/thermo.md, \"Model reactions\"). *model: same type*: a")
  w("complex of the same ligand, metal charge and ligand number with measured")
  w("data valid to 300 °C; of several, the one whose log K at 25 °C is closest")
  w("(never one sharing the product). *model: ligand acid*: ν times the")
  w("protonation H⁺ + L = HL of the ligand. *water only* is the isocoulombic")
  w("column above on the same reactions, *held* the 25 °C constant.")
  w("")
  w("| method | T (°C) | reactions | mean abs. error | max abs. error | water only, mean | held, mean |")
  w("|---|---|---|---|---|---|---|")
  for _, m in ipairs(M.MODEL_METHODS) do
    for _, tc in ipairs(M.TEMPS) do
      local s = sum[m][tc]
      w(("| %s | %d | %d | %.2f | %.2f | %.2f | %.2f |"):format(m, tc, s.n, s.mean, s.max, s.base_mean, s.held_mean))
    end
  end
  w("")
  w("| reaction | model: same type | error 100/200/300 | model: ligand acid | error 100/200/300 |")
  w("|---|---|---|---|---|")
  for _, r in ipairs(sum.model_rows) do
    local cells = {}
    for _, m in ipairs(M.MODEL_METHODS) do
      local x = r.model and r.model[m]
      if x and x.err[100] then
        cells[#cells + 1] = ("`%s` | %s %s %s"):format(x.reaction, f2(x.err[100]),
          x.err[200] and f2(x.err[200]) or "–", x.err[300] and f2(x.err[300]) or "–")
      else
        cells[#cells + 1] = x and ("`%s` | – – –"):format(x.reaction) or "none | "
      end
    end
    w(("| `%s` | %s |"):format(r.reaction, table.concat(cells, " | ")))
  end
  w("")
  w("The library applies the *same type* rule where it finds a model (the element")
  w("files name it; tests/scripts/test_temperature_estimates.lua checks that they")
  w("name exactly the rule's choice); the other estimated complexes keep the water")
  w("ionisation alone:")
  w("")
  w("| species | reaction | model reaction |")
  w("|---|---|---|")
  for _, x in ipairs(sum.library_models) do
    w(("| `%s` | `%s` | %s |"):format(x.species, x.reaction, x.model and ("`" .. x.model .. "`") or "none (water ionisation only)"))
  end
  w("")
  local sa = sum.sulfate_analog
  w("Where no complex of the same type has measured data and the step joins two")
  w("monovalent anions into a dianion (CuCl3²⁻, AgCl3²⁻), the model balances the")
  w("charge types with the sulfate protonation, `" .. M.SULFATE_AUX .. "`")
  w("(docs/thermo.md). The one reaction of the library of that type with measured")
  w(("log K(T), `%s` (log K %.2f at 25 °C), within its range, estimate − measured:"):format(sa.reaction, sa.logK25))
  w("")
  w("| T (°C) | measured | held | water ionisation only (one-term) | sulfate-balanced | van 't Hoff, measured ΔrH° at 25 °C |")
  w("|---|---|---|---|---|---|")
  for _, r in ipairs(sa.rows) do
    w(("| %d | %.2f | %s | %s | %s | %s |"):format(r.T_C, r.meas, f2(r.held), f2(r.water), f2(r.sulfate), f2(r.vanthoff)))
  end
  w("")
  local all_high = #sa.rows > 0
  for _, r in ipairs(sa.rows) do
    for _, k in ipairs { "held", "water", "sulfate", "vanthoff" } do all_high = all_high and r[k] > 0 end
  end
  w((all_high and "Every method errs high (too much dianion). " or "") .. "The steps estimated this way, log K")
  w("at 25/100/200/300 °C:")
  w("")
  w("| species | step | log K |")
  w("|---|---|---|")
  for _, st in ipairs(sa.steps) do
    w(("| `%s` | `%s` | %.2f %.2f %.2f %.2f |"):format(st.species, st.reaction, st.logK[25], st.logK[100], st.logK[200], st.logK[300]))
  end
  w("")
  w("### Higher hydrolysis steps")
  w("")
  w("The rows above that add a second or later OH⁻ (or an OH⁻ to a neutral species")
  w("or a solid), errors in log K at 100/200/300 °C:")
  w("")
  w("| reaction | data | n | held | isocoulombic |")
  w("|---|---|---|---|---|")
  for _, r in ipairs(sum.higher.rows) do
    local function three(m)
      local e = r.err[m]
      if not e[100] then return "– – –" end
      return ("%s %s %s"):format(f2(e[100]), e[200] and f2(e[200]) or "–", e[300] and f2(e[300]) or "–")
    end
    w(("| `%s` | %s | %d | %s | %s |"):format(r.reaction, r.basis, r.n, three("held"), three("isocoulombic")))
  end
  w("")
  w(("and a measured reference read for this purpose, `%s` (log K %.3f at 25 °C; %s),"):format(
    M.HIGHER_EXTERNAL.reaction, sum.higher.logK25, sum.higher.external[1].source))
  w("each method started from the paper's 25 °C value:")
  w("")
  w("| T (°C) | measured log K | n | held | isocoulombic |")
  w("|---|---|---|---|---|")
  for _, x in ipairs(sum.higher.external) do
    w(("| %d | %.3f | %d | %s | %s |"):format(x.tc, x.meas, x.n, f2(x.held), f2(x.iso)))
  end
  w("")
  w("**Thin margin: NiO at 150–300 °C.** With the estimated Ni(OH)2(aq)")
  w("(isocoulombic, n = 0: log K·T constant from its 25 °C value) the neutral")
  w("species alone holds log m(Ni) = log K of")
  local t = {}
  for _, x in ipairs(sum.nio) do t[#t + 1] = ("%.2f at %d °C"):format(x.logK, x.tc) end
  w(("`%s`: %s;"):format(M.NIO_REACTION, table.concat(t, ", ")))
  w("above −6 NiO would lose its field on 10⁻⁶ maps. Since Ni²⁺ has a heat")
  w("capacity of its own (HKF estimate from the NEA-TDB Cp°, issue 12) these stay")
  w("below −6 and NiO keeps its field (tests/scripts/test_nickel_hot.lua); with")
  w("Ni²⁺ from van 't Hoff only they were −6.03 to −5.57 at 150–300 °C and NiO had")
  w("no field from 200 °C on. The margin rests on the Baes and Mesmer log *β₂ of")
  w("−19 (uncertain by about one unit) and its isocoulombic extrapolation.")
  w("Published NiO solubility work (Tremaine and Leblanc 1980, J. Solution Chem.")
  w("9, 415 as cited in the issue; a reference list read here cites them in")
  w("J. Chem. Thermodyn., p. 521; the ORNL solubility studies of Palmer,")
  w("Bénézeth, Wesolowski et al.) reports much lower solubilities at high")
  w("temperature, but no published value could be read for this work (the")
  w("abstracts found give no numbers), so no solubility check was added; the")
  w("Ni/NiO boundary at 309 °C (high_temperature.csv) is the high-temperature")
  w("nickel check that could be read. The higher-hydrolysis rows above show the")
  w("estimate is not reliable for these steps either way: it falls short of the")
  w("measured rise of aluminate and Fe(OH)2⁺.")
  w("")
  w("### Single-ion heat capacities (ions defined by a formation reaction)")
  w("")
  w("An ion with a measured ΔfH° but no heat capacity of its own is defined by its")
  w("formation reaction from the elements (Co(s) + 2 H⁺ = Co²⁺ + H₂(g)). Every ion")
  w("below whose heat capacity is measured is redefined that way from its own 25 °C")
  w("log K and ΔrH° and evaluated again: *dCp = 0*: van 't Hoff on the formation")
  w("reaction (what the ions without Cp had before); *model ion*: the reaction takes")
  w("the ΔrCp°(T) of the same reaction of another measured ion, the reaction minus")
  w("the model being isocoulombic with ΔrCp° = 0 (`estimate = { dCp = \"isocoulombic\",")
  w("model = ... }`, docs/thermo.md); the model is the measured ion of the same")
  w("charge and kind whose S° is closest (never the ion itself); *Criss-Cobble*:")
  w("constant ΔrCp° from the mean ionic heat capacity of the cation class (Criss and")
  w("Cobble 1964, recalled parameters). Entries are (G(estimate) − G(record))/(RT ln 10)")
  w("of the ion at 100/200/300 °C, the error in log K of any reaction forming one of")
  w("it (for a divalent cation 0.1 is 3.7, 4.7 and 5.7 mV in E°(M²⁺/M)); \"–\" where")
  w("the ion's record or the model's data end (CO₃²⁻: 250 °C). Rows marked ² compare")
  w("with HKF estimates from a published Cp° at 25 °C, a reference of lower rank, and")
  w("are left out of the summary.")
  w("")
  local names = {}
  for k in pairs(sum.ion) do names[#names + 1] = k end
  table.sort(names)
  w("| class: method | T (°C) | ions | mean abs. error | max abs. error |")
  w("|---|---|---|---|---|")
  for _, k in ipairs(names) do
    for _, tc in ipairs(M.TEMPS) do
      local s = sum.ion[k][tc]
      if s.n > 0 then w(("| %s | %d | %d | %.3f | %.3f |"):format(k, tc, s.n, s.mean, s.max)) end
    end
  end
  w("")
  w("| ion | kind | model ion | dCp = 0 100/200/300 | model ion 100/200/300 | Criss-Cobble 100/200/300 |")
  w("|---|---|---|---|---|---|")
  for _, r in ipairs(sum.ion_rows) do
    local function three(m)
      local e = r.err[m]
      if not e[100] then return "" end
      return ("%+.3f %s %s"):format(e[100], e[200] and ("%+.3f"):format(e[200]) or "–",
        e[300] and ("%+.3f"):format(e[300]) or "–")
    end
    w(("| `%s`%s | %s | %s | %s | %s | %s |"):format(r.ion, r.secondary and "²" or "", r.kind,
      r.model and ("`" .. r.model .. "`") or "none", three("dCp = 0"), three("model ion"), three("Criss-Cobble")))
  end
  w("")
  w("The library applies *model ion* where the table shows it beats *dCp = 0*")
  w("(divalent metal cations and oxyanions; not to monovalent cations, where it")
  w("loses), with the rule's model (tests/scripts/test_ion_heat_capacity.lua checks")
  w("the element files against the rule):")
  w("")
  w("| ion | S° 25 °C, J/(mol K) | model reaction | rule picks |")
  w("|---|---|---|---|")
  for _, x in ipairs(sum.ion_library) do
    w(("| `%s` | %.1f | `%s` | `%s` |"):format(x.species, x.S, x.model, tostring(x.rule)))
  end
  w("")
  w("### HKF correlations, species by species")
  w("")
  w("Every HKF species with published parameters and a charge the correlations")
  w("cover, its parameters re-derived by the Shock and Helgeson 1988 correlations")
  w("from its own S°, Cp° and V° at 25 °C; the entry is (G(estimate) − G(published))/")
  w("(RT ln 10), the error in log K of any reaction forming one of the species.")
  w("Left out: H⁺ and the species the ω intercepts were derived from (docs/thermo.md).")
  w("")
  summary_table(w, sum, { M.HKF_SPECIES_METHOD }, "species", "%.3f")
  w("| species | 100 °C | 200 °C | 300 °C |")
  w("|---|---|---|---|")
  for _, r in ipairs(sum.hkf_rows) do
    w(("| `%s` | %+.3f | %+.3f | %+.3f |"):format(r.formula, r.err[100], r.err[200], r.err[300]))
  end
  w("")
  w("### Kopp-Neumann heat capacities of solids")
  w("")
  w("Solids with a published Cp function, their Cp re-estimated by Kopp-Neumann")
  w("additivity (docs/thermo.md): *Kopp atoms* sums Kopp's atomic heat capacities;")
  w("*Kopp + component* adds to a component with a published Cp function (an oxide,")
  w("the anhydrous salt, or the elements) Kopp's heats for the atoms it lacks. The")
  w("error is G(estimate) − G(published) at T in log K units per formula unit,")
  w("ΔG/(RT ln 10). *Cp = 0* is what phlox took before for solids without Cp.")
  w("")
  summary_table(w, sum, M.KOPP_METHODS, "solids", "%.3f")
  w("| solid | component | Cp 25 °C published | Kopp atoms | Kopp + component | error Kopp atoms 100/200/300 | error Kopp + component 100/200/300 | error Cp = 0 100/200/300 |")
  w("|---|---|---|---|---|---|---|---|")
  for _, r in ipairs(sum.kopp_rows) do
    local keys = {}
    for k, v in pairs(r.from) do keys[#keys + 1] = (v == 1 and "" or ("%g "):format(v)) .. k end
    table.sort(keys)
    local function three(m)
      return ("%+.3f %+.3f %+.3f"):format(r.err[m][100], r.err[m][200], r.err[m][300])
    end
    w(("| `%s` | %s | %.1f | %.1f | %.1f | %s | %s | %s |"):format(r.formula, table.concat(keys, " + "), r.cp25,
      r.est["Kopp atoms"], r.est["Kopp + component"], three("Kopp atoms"), three("Kopp + component"), three("Cp = 0")))
  end
  w("")
  return table.concat(out, "\n")
end

return M
