--- phlox: the module every study script starts with.
--  local phlox = require "phlox"
-- It gathers the C primitives (phlox.core) and the Lua helpers of the
-- embedded library into one table.
local core = require "phlox.core"

local phlox = {
  version = core.version,
  core = core,
}

--- The folders searched before the built-in library, in order.
function phlox.search_paths()
  return core.search_paths()
end

--- Read a library file: the user's folders first, then the embedded copy.
-- `rel` is a path relative to a library root, e.g. "elements/Zn.lua".
-- Returns text, where (the file path, or "stdlib/<rel>" when embedded).
function phlox.read_library_file(rel)
  for _, dir in ipairs(core.search_paths()) do
    local path = dir .. "/" .. rel
    local f = io.open(path, "rb")
    if f then
      local text = f:read("a")
      f:close()
      return text, path
    end
  end
  local embedded = "stdlib/" .. rel
  local text = core.embedded_source(embedded)
  if text then return text, embedded end
  return nil, "no file '" .. rel .. "' in the search path or the built-in library"
end

phlox.caution = "A thermodynamic diagram says what can form, not how fast it forms: "
  .. "passivity depends on film kinetics, alloying, flow and deposits. Use these results "
  .. "with the applicable codes, standards and licensed engineering practice."

return phlox
