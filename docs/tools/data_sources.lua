-- docs/tools/data_sources.lua: regenerate docs/data-sources.md (the
-- publications cited by stdlib/elements/*.lua and the species that use each)
-- from the element files as phlox loads them.  Run from anywhere:
--     phlox docs/tools/data_sources.lua
-- The file is written atomically (core.write_atomic).
local phlox = require "phlox"
local core = require "phlox.core"

local root = os.getenv("PHLOX_SOURCE_DIR")
if not root then
  local script = arg and arg[0] or "docs/tools/data_sources.lua"
  root = script:match("^(.*)/docs/tools/[^/]+$") or "."
end
local defs = dofile(root .. "/docs/tools/sources_def.lua")
local data = defs.collect(phlox)
local text = defs.render(data)
local ok, err = core.write_atomic(root .. "/docs/data-sources.md", text)
if not ok then error("data_sources: " .. tostring(err)) end
io.stderr:write(("docs/data-sources.md: %d species, %d unmatched\n"):format(data.species, #data.unmatched))
if #data.unmatched > 0 then
  for _, s in ipairs(data.unmatched) do io.stderr:write("  no source entry: ", s, "\n") end
  os.exit(1)
end
