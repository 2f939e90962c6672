-- test_names.lua: species names as people write them (issue 13).  A solid
-- written without its mineral name ("ZnO(s)") stands for the library's only
-- solid of that formula; two polymorphs make it an error that lists both;
-- a name in `exclude`, `only`, `suppress` or `activities` that matches no
-- species is an error with a hint, never silently ignored.
local phlox = require "phlox"
local S = dofile(assert(os.getenv("PHLOX_SOURCE_DIR"), "PHLOX_SOURCE_DIR is not set (run through ctest)") .. "/tests/support/init.lua")
local check = S.check
local function fails_with(f, pattern, what)
  local ok, err = pcall(f)
  check(not ok, what .. ": expected an error")
  check(tostring(err):find(pattern, 1, true), what .. ": message was: " .. tostring(err))
end

local lib = phlox.library { "Zn", "Pb" }

-- reactions: "ZnO(s)" is zincite; the text reports the species used
local r = lib:reaction("ZnO(s) + 2 H^+ = Zn^2+ + H2O(l)")
check(r.text:find("ZnO(s,zincite)", 1, true), "reaction text: " .. r.text)
local r2 = lib:reaction("ZnO(s,zincite) + 2 H^+ = Zn^2+ + H2O(l)")
check(r.logK == r2.logK, "ZnO(s) and ZnO(s,zincite) are the same species")
fails_with(function() return lib:reaction("PbO(s) + 2 H^+ = Pb^2+ + H2O(l)") end,
  "PbO(s): 2 solids have this formula: did you mean PbO(s,litharge) or PbO(s,massicot)?", "ambiguous PbO(s)")
fails_with(function() return lib:reaction("ZnO(aq) + 2 H^+ = Zn^2+ + H2O(l)") end,
  "did you mean ZnO(s,zincite)?", "ZnO(aq)")
check(lib:props("ZnO(s)").G == lib:props("ZnO(s,zincite)").G, "props by generic name")

-- exact maps: exclude by generic name removes zincite's field
local function has_field(m, name) return S.chem.fields(m)[name] ~= nil end
local m = phlox.map { library = lib, element = "Zn", activity = 1e-3 }
check(has_field(m, "ZnO(s,zincite)"), "zincite has a field at 25 C, a = 1e-3")
local mx = phlox.map { library = lib, element = "Zn", activity = 1e-3, exclude = { "ZnO(s)" } }
check(not has_field(mx, "ZnO(s,zincite)"), "exclude = {'ZnO(s)'} removes zincite")
fails_with(function() return phlox.map { library = lib, element = "Pb", exclude = { "PbO(s)" } } end,
  "exclude: PbO(s): 2 solids have this formula", "ambiguous exclude")
fails_with(function() return phlox.map { library = lib, element = "Zn", exclude = { "Zn(OH)2(s,zincit)" } } end,
  "exclude: Zn(OH)2(s,zincit): not in the loaded data", "misspelt exclude")
fails_with(function() return phlox.map { library = lib, element = "Zn", exclude = { "Fe3O4(s)" } } end,
  "is its element loaded?", "exclude of an element not loaded")
fails_with(function() return phlox.map { library = lib, element = "Zn", activities = { ["Zn^3+"] = 1e-4 } } end,
  "activities: Zn^3+: not in the loaded data", "activity of a species that does not exist")
fails_with(function() return phlox.map { library = lib, element = "Zn", only = { "zn^2+" } } end,
  "did you mean Zn^2+?", "letter case")

-- speciation: exclude and suppress are checked the same way
fails_with(function() return phlox.speciate { library = lib, totals = { Zn = 1e-4 }, pH = 9, exclude = { "ZnO(s,zincit)" } } end,
  "exclude: ZnO(s,zincit): not in the loaded data: did you mean ZnO(s,zincite)?", "speciate exclude")
fails_with(function() return phlox.speciate { library = lib, totals = { Pb = 1e-4 }, pH = 9, suppress = { "PbO(s)" } } end,
  "suppress: PbO(s): 2 solids", "speciate suppress")
local a = phlox.speciate { library = lib, totals = { Zn = 1e-2 }, pH = 9 }
local b = phlox.speciate { library = lib, totals = { Zn = 1e-2 }, pH = 9, suppress = { "ZnO(s)" } }
local function amount(res, name)
  for _, s in ipairs(res.species) do if s.formula == name then return s.amount or 0 end end
  return 0
end
check(amount(a, "ZnO(s,zincite)") > 0, "zincite precipitates from 0.01 mol/kg Zn at pH 9")
check(amount(b, "ZnO(s,zincite)") == 0, "suppress = {'ZnO(s)'} keeps zincite dissolved")
print("test_names: all checks passed")
