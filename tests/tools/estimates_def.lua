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
  for _, m in ipairs(M.METHODS) do
    for _, tc in ipairs(M.TEMPS) do
      local s = sum[m][tc]
      s.mean = s.n > 0 and s.abs / s.n or 0
    end
  end
  sum.kopp_rows, sum.kopp = run_kopp(phlox, lib)
  sum.hkf_rows, sum[M.HKF_SPECIES_METHOD] = run_hkf_species(lib)
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
  ["held"] = { [100] = { mean = 0.965, max = 7.403 }, [200] = { mean = 1.827, max = 13.623 }, [300] = { mean = 2.427, max = 17.673 } },
  ["one-term"] = { [100] = { mean = 1.351, max = 7.685 }, [200] = { mean = 2.503, max = 14.141 }, [300] = { mean = 3.267, max = 18.345 } },
  ["isocoulombic"] = { [100] = { mean = 0.742, max = 3.399 }, [200] = { mean = 1.691, max = 5.459 }, [300] = { mean = 3.082, max = 8.782 } },
  ["HKF (SH88)"] = { [100] = { mean = 0.004, max = 0.008 }, [200] = { mean = 0.026, max = 0.045 }, [300] = { mean = 0.084, max = 0.182 } },
  ["HKF (SH88), per species"] = { [100] = { mean = 0.005, max = 0.014 }, [200] = { mean = 0.030, max = 0.080 }, [300] = { mean = 0.083, max = 0.182 } },
  ["Kopp atoms"] = { [100] = { mean = 0.006, max = 0.019 }, [200] = { mean = 0.022, max = 0.074 }, [300] = { mean = 0.042, max = 0.140 } },
  ["Kopp + component"] = { [100] = { mean = 0.006, max = 0.035 }, [200] = { mean = 0.022, max = 0.139 }, [300] = { mean = 0.044, max = 0.262 } },
  ["Cp = 0"] = { [100] = { mean = 0.112, max = 0.464 }, [200] = { mean = 0.441, max = 1.825 }, [300] = { mean = 0.834, max = 3.449 } },
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
