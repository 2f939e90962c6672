-- test_stdlib_docs.lua: the generated documents are current.
--  * docs/data-sources.md lists every publication the element files cite and
--    the species that use each; every loaded species cites at least one key
--    of stdlib/bibliography.lua, every cited key has a line in
--    tests/tools/sources_def.lua, and no source text spells out a
--    publication the bibliography defines (each is defined once, there).
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
assert(#data.unmatched == 0, #data.unmatched .. " species cite no key of stdlib/bibliography.lua")
assert(#data.nouse == 0, "cited keys without a line in tests/tools/sources_def.lua: " .. table.concat(data.nouse, ", "))

-- Each publication defined once: a source text cites it by key, never by
-- its author-year text (the bibliography's `short` form, or its first
-- author and year, as the files wrote them before the keys).
local lib = phlox.library(phlox.available_elements())
local spelled = {}
for _, r in ipairs(lib:references()) do
  local first, year = r.cite:match("^([%a'%-]+),.-%((%d%d%d%d)%)")
  if first then
    spelled[#spelled + 1] = { key = r.key, text = first .. " et al. " .. year }
    spelled[#spelled + 1] = { key = r.key, text = first .. " " .. year }
  end
  if r.short ~= r.key then spelled[#spelled + 1] = { key = r.key, text = r.short } end
end
local twice = {}
for _, s in ipairs(lib:list()) do
  for _, p in ipairs(spelled) do
    if s.source:find(p.text, 1, true) then
      twice[#twice + 1] = ("%s (%s:%s): '%s' spelled out; cite [%s]"):format(s.formula, s.file or "?", s.line or "?", p.text, p.key)
    end
  end
end
for _, t in ipairs(twice) do print("  " .. t) end
assert(#twice == 0, #twice .. " source texts spell out a publication stdlib/bibliography.lua defines")
assert(data.species > 300, "too few species loaded: " .. data.species)
local want = sdefs.render(data)
local have = read(src .. "/docs/data-sources.md")
assert(have == want, "docs/data-sources.md is stale (run phlox tests/tools/data_checks.lua): " .. first_difference(have, want))
print(("docs/data-sources.md current: %d species, %d publications"):format(data.species, #lib:references()))

local cdefs = dofile(src .. "/tests/tools/checks_def.lua")
local results, summary = cdefs.run(phlox, cdefs.reference_dir(src))
local edefs = dofile(src .. "/tests/tools/estimates_def.lua")
want = cdefs.render(results, summary) .. "\n" .. edefs.render(edefs.run(phlox))
have = read(src .. "/docs/data-checks.md")
assert(have == want, "docs/data-checks.md is stale (run phlox tests/tools/data_checks.lua): " .. first_difference(have, want))
print(("docs/data-checks.md current: %d checks"):format(summary.total))
print("test_stdlib_docs: documents current")
