-- tests/tools/data_checks.lua: regenerate the two generated documents of the
-- standard library:
--   docs/data-checks.md   every check against published values (definitions:
--                         tests/tools/checks_def.lua, shared with the test
--                         tests/scripts/test_stdlib_values.lua), then the
--                         validation of the temperature estimates
--                         (tests/tools/estimates_def.lua)
--   docs/data-sources.md  the publications cited by stdlib/elements/*.lua and
--                         the species that use each (tests/tools/sources_def.lua)
-- Run from anywhere:   phlox tests/tools/data_checks.lua
-- Reference values are read from <repo>/tests/reference.  Files are
-- written atomically (core.write_atomic).  Exits 1 if a check fails or a
-- species cites no listed publication (the documents are written anyway).
local phlox = require "phlox"
local core = require "phlox.core"

local root = os.getenv("PHLOX_SOURCE_DIR")
if not root then
  local script = arg and arg[0] or "tests/tools/data_checks.lua"
  root = script:match("^(.*)/tests/tools/[^/]+$") or "."
end

local function write(rel, text)
  local ok, err = core.write_atomic(root .. "/" .. rel, text)
  if not ok then error("data_checks: " .. rel .. ": " .. tostring(err)) end
end

local checks = dofile(root .. "/tests/tools/checks_def.lua")
local results, summary = checks.run(phlox, checks.reference_dir(root))
local estimates = dofile(root .. "/tests/tools/estimates_def.lua")
write("docs/data-checks.md", checks.render(results, summary) .. "\n" .. estimates.render(estimates.run(phlox)))
io.stderr:write(("docs/data-checks.md: %d checks, %d pass, %d known differences, %d fail\n"):format(
  summary.total, summary.pass, summary.known, summary.fail))

local sources = dofile(root .. "/tests/tools/sources_def.lua")
local data = sources.collect(phlox)
write("docs/data-sources.md", sources.render(data))
io.stderr:write(("docs/data-sources.md: %d species, %d without a listed publication\n"):format(data.species, #data.unmatched))
for _, s in ipairs(data.unmatched) do io.stderr:write("  no source entry: ", s, "\n") end

if summary.fail > 0 or #data.unmatched > 0 then os.exit(1) end
