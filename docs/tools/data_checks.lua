-- docs/tools/data_checks.lua: regenerate docs/data-checks.md, the table of
-- every check of the standard library against published values (the check
-- definitions live in docs/tools/checks_def.lua, shared with the test
-- tests/scripts/test_stdlib_values.lua).  Run from anywhere:
--     phlox docs/tools/data_checks.lua
-- Reference values are read from <repo>/../shared/reference.  The file is
-- written atomically (core.write_atomic).  Exits 1 if any check fails.
local phlox = require "phlox"
local core = require "phlox.core"

local root = os.getenv("PHLOX_SOURCE_DIR")
if not root then
  local script = arg and arg[0] or "docs/tools/data_checks.lua"
  root = script:match("^(.*)/docs/tools/[^/]+$") or "."
end
local defs = dofile(root .. "/docs/tools/checks_def.lua")
local results, summary = defs.run(phlox, defs.reference_dir(root))
local ok, err = core.write_atomic(root .. "/docs/data-checks.md", defs.render(results, summary))
if not ok then error("data_checks: " .. tostring(err)) end
io.stderr:write(("docs/data-checks.md: %d checks, %d pass, %d known differences, %d fail\n"):format(
  summary.total, summary.pass, summary.known, summary.fail))
if summary.fail > 0 then os.exit(1) end
