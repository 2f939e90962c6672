-- test_system_notes.lua: every result names exactly the estimated (and
-- accepted held) species of its own system, in its stamp, its CSV and JSON
-- provenance: a library of Fe, S and Cu at 150 C, where the S file defines
-- copper sulfate minerals with estimated temperature functions.
--  1. A speciation of Fe and S (sulfur as sulfate, no redox constraint)
--     names the estimated species among those its system holds (r.species)
--     and no other: no copper mineral, no sulfide, no Fe(III) species.
--  2. Fraction and solubility curves name those of their solves' systems.
--  3. Maps and series of maps name the estimated species made of their
--     element and ligand (with H and O): Fe and S species, no Cu species.
--  4. A NaCl background of a rigorous map brings its species in.
-- The expected sets are read here from the records (species.basis, the
-- core's temperature basis), not from the code that writes the stamps.
local phlox = require "phlox"
local export = require "phlox.export"
local S = dofile(assert(os.getenv("PHLOX_SOURCE_DIR"), "PHLOX_SOURCE_DIR is not set (run through ctest)") .. "/tests/support/init.lua")
local check = S.check

local T_C = 150
local lib = phlox.library { "Fe", "S", "Cu" }

-- the species named by the "temperature dependence estimated" lines
local function named(stamp)
  local out = {}
  for _, l in ipairs(stamp or {}) do
    if l:find("^temperature dependence estimated") then
      for f in l:gmatch("{(.-)}") do out[#out + 1] = f end
    end
  end
  table.sort(out)
  return out
end

-- the estimated records whose every element is in `set` (H and O allowed)
-- and that hold one of `any`, optionally only those in `species`
local function expected(set, any, species)
  local out = {}
  for _, s in ipairs(lib:list()) do
    local ok, has = s.basis == "estimated", false
    for el in pairs(s.elements) do
      if el ~= "H" and el ~= "O" and not set[el] then ok = false end
      if any[el] then has = true end
    end
    if ok and has and (not species or species[s.formula]) then out[#out + 1] = s.formula end
  end
  table.sort(out)
  return out
end

local function same(got, want, what)
  check(table.concat(got, "|") == table.concat(want, "|"),
    ("%s names %s, expected %s"):format(what, table.concat(got, ", "), table.concat(want, ", ")))
end

local function no_copper(list, what)
  for _, f in ipairs(list) do check(not f:find("Cu", 1, true), what .. " names a copper species: " .. f) end
end

-- the library does define estimated copper sulfate species: the case the test is about
local cu_s = expected({ Cu = true, S = true }, { Cu = true })
local has_cu_sulfate = false
for _, f in ipairs(cu_s) do if lib:species(f).elements.S then has_cu_sulfate = true end end
check(has_cu_sulfate, "the library has an estimated copper sulfate species: " .. table.concat(cu_s, ", "))

local FE_S = { Fe = true, S = true }

-- 1. speciation
local r = assert(phlox.speciate { library = lib, T_C = T_C, totals = { Fe = 1e-5, S = 1e-3 }, pH = 7 })
local in_system = {}
for _, sp in ipairs(r.species) do in_system[sp.formula] = true end
local want = expected(FE_S, FE_S, in_system)
check(#want > 0, "the speciation's system holds estimated species")
same(named(r.stamp), want, "speciate stamp")
same(named(r.provenance.notes), want, "speciate provenance")
no_copper(named(r.stamp), "speciate")
check(not in_system["Fe^3+"] and not in_system["S^2-"], "no redox constraint: no Fe(III), no sulfide in the system")

-- the CSV and JSON files carry the same lines
local dir = S.files.tmpdir()
local csv = dir .. "/sp.csv"
export.csv(csv, { { x = 1 } }, { columns = { "x" }, from = r })
local text = S.files.read(csv)
check(text:find("temperature dependence estimated", 1, true), "the CSV stamp has the estimate lines")
check(not text:find("Cu", 1, true), "the CSV names no copper species")
for _, f in ipairs(want) do
  check(text:find(f, 1, true), "the CSV names " .. f)
end
local json = dir .. "/sp.json"
export.json(json, { x = 1 }, { from = r })
local jt = S.files.read(json)
check(not jt:find("Cu", 1, true), "the JSON names no copper species")
for _, f in ipairs(want) do check(jt:find(f, 1, true), "the JSON names " .. f) end

-- 2. curves
local fr = phlox.fractions { library = lib, element = "Fe", T_C = T_C, range = { 4, 10 }, n = 3,
                             totals = { S = 1e-3 } }
same(named(fr.stamp), want, "fractions stamp")
same(named(fr.provenance.notes), want, "fractions provenance")
local so = phlox.solubility { library = lib, element = "Fe", T_C = { T_C }, range = { 6, 10 }, n = 3,
                              totals = { S = 1e-3 } }
same(named(so.stamp), want, "solubility stamp")
no_copper(named(so.stamp), "solubility")

-- 3. maps: the species of Fe with the S ligand (H and O), whatever state
local want_map = expected(FE_S, FE_S)
local m = phlox.map { library = lib, element = "Fe", T_C = T_C, ligand = "S" }
same(named(m.stamp), want_map, "map stamp")
local series = phlox.series { library = lib, element = "Fe", T_C = { 25, T_C }, ligand = "S" }
for i, sm in ipairs(series) do
  same(named(sm.stamp), want_map, "series map " .. i)
  no_copper(named(sm.stamp), "series map " .. i)
end

-- 4. a rigorous map with a NaCl background names Na and Cl species too
local nacl = phlox.library { "Fe", "Na", "Cl" }
local g = phlox.grid_map { library = nacl, element = "Fe", T_C = T_C, n = 5, background_nacl = 0.1 }
local want_g = {}
for _, s in ipairs(nacl:list()) do
  local ok = s.basis == "estimated"
  for el in pairs(s.elements) do
    if el ~= "H" and el ~= "O" and el ~= "Fe" and el ~= "Na" and el ~= "Cl" then ok = false end
  end
  local only_ho = true
  for el in pairs(s.elements) do if el ~= "H" and el ~= "O" then only_ho = false end end
  if ok and not only_ho then want_g[#want_g + 1] = s.formula end
end
table.sort(want_g)
same(named(g.stamp), want_g, "grid map with a NaCl background")

print("system notes: ok")
