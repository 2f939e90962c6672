-- test_stdlib_docs.lua: the generated documents are current.
--  * docs/data-sources.md lists every publication the element files cite and
--    the species that use each; every loaded species must match at least one
--    entry of tests/tools/sources_def.lua.
--  * docs/data-checks.md is the table of tests/tools/checks_def.lua's checks
--    followed by the validation of the temperature estimates (estimates_def.lua).
-- Both are regenerated here in memory and compared with the committed files.
-- If this test fails after a change to stdlib/elements, the checks or the
-- source list, run
--     phlox tests/tools/data_checks.lua
-- (it writes both) and commit the two documents.
local src = assert(os.getenv("PHLOX_SOURCE_DIR"), "PHLOX_SOURCE_DIR not set")
local phlox = require "phlox"

local S = dofile(src .. "/tests/support/init.lua")
local read = S.files.slurp

local function first_difference(a, b)
  local la, lb, n = {}, {}, 0
  for l in (a .. "\n"):gmatch("(.-)\n") do la[#la + 1] = l end
  for l in (b .. "\n"):gmatch("(.-)\n") do lb[#lb + 1] = l end
  for i = 1, math.max(#la, #lb) do
    if la[i] ~= lb[i] then
      n = i
      return ("line %d:\n  committed: %s\n  generated: %s"):format(n, tostring(la[i]), tostring(lb[i]))
    end
  end
  return "no difference"
end

local sdefs = dofile(src .. "/tests/tools/sources_def.lua")
local data = sdefs.collect(phlox)
for _, s in ipairs(data.unmatched) do print("no source entry for: " .. s) end
assert(#data.unmatched == 0, #data.unmatched .. " species cite no publication listed in tests/tools/sources_def.lua")
assert(data.species > 300, "too few species loaded: " .. data.species)
local want = sdefs.render(data)
local have = read(src .. "/docs/data-sources.md")
assert(have == want, "docs/data-sources.md is stale (run phlox tests/tools/data_checks.lua): " .. first_difference(have, want))
print(("docs/data-sources.md current: %d species, %d publications"):format(data.species, #sdefs.SOURCES))

local cdefs = dofile(src .. "/tests/tools/checks_def.lua")
local results, summary = cdefs.run(phlox, cdefs.reference_dir(src))
local edefs = dofile(src .. "/tests/tools/estimates_def.lua")
want = cdefs.render(results, summary) .. "\n" .. edefs.render(edefs.run(phlox))
have = read(src .. "/docs/data-checks.md")
assert(have == want, "docs/data-checks.md is stale (run phlox tests/tools/data_checks.lua): " .. first_difference(have, want))
print(("docs/data-checks.md current: %d checks"):format(summary.total))
print("test_stdlib_docs: documents current")
