-- tests/support/init.lua: every shared Lua test helper in one table.  A
-- script test starts with
--     local S = dofile(os.getenv("PHLOX_SOURCE_DIR") .. "/tests/support/init.lua")
-- and takes what it needs (tests/scripts/test_support.lua checks them):
--     S.check, S.close, S.rel, S.near,    check.lua
--     S.soft, S.reporter
--     S.csv, S.json, S.rng, S.chem        csv.lua, json.lua, rng.lua, chem.lua
--     S.files, S.proc                     files.lua, proc.lua
--     S.BIN, S.SRC                        PHLOX_BIN (nil if unset) and the
--                                         source tree (PHLOX_SOURCE_DIR, else
--                                         found from this file's place)
local dir = debug.getinfo(1, "S").source:match("^@(.*)[/\\]") or "."
local S = {}
for k, v in pairs(dofile(dir .. "/check.lua")) do S[k] = v end
for _, name in ipairs { "csv", "json", "rng", "chem", "files", "proc" } do S[name] = dofile(dir .. "/" .. name .. ".lua") end
S.BIN = os.getenv("PHLOX_BIN")
S.SRC = os.getenv("PHLOX_SOURCE_DIR") or (dir .. "/../..")
return S
