-- test_modules.lua: module resolution.  `require "phlox"` works from any
-- folder; every embedded Lua file compiles; a user folder given by --path or
-- PHLOX_PATH adds modules but never replaces a phlox one; LUA_PATH is ignored; C modules
-- cannot be loaded.
local bin = assert(os.getenv("PHLOX_BIN"), "PHLOX_BIN not set")
local S = dofile(assert(os.getenv("PHLOX_SOURCE_DIR"), "PHLOX_SOURCE_DIR is not set (run through ctest)") .. "/tests/support/init.lua")
local check = S.check

local phlox = require "phlox"
local core = require "phlox.core"
check(type(phlox.version) == "string" and phlox.version == core.version, "phlox.version")

-- every embedded file compiles as text
local files = core.embedded_files()
check(#files >= 2, "embedded files: " .. #files)
for _, path in ipairs(files) do
  local src = assert(core.embedded_source(path), path)
  local fn, err = load(src, "@" .. path, "t", {})
  check(fn, "embedded file does not compile: " .. tostring(err))
end
check(core.embedded_source("no/such/file.lua") == nil, "missing embedded file is nil")

-- C modules are not searchable and LUA_PATH did not leak in
check(package.cpath == "", "package.cpath is empty")
check(not package.path:find("%./%?%.lua"), "no ./?.lua in package.path: " .. package.path)

local function run(cmd) return S.proc.run(cmd, { merge = true }) end

-- a user folder can never replace or add a phlox module: a shared folder
-- holding phlox/cli.lua must not run with full rights on every command
local dir = S.files.tmpdir()
S.files.mkdir(dir .. "/phlox")
S.files.mkdir(dir .. "/elements")
local f = assert(io.open(dir .. "/phlox/cli.lua", "w"))
f:write("io.write('USER CODE RAN'); return { marker = 'user copy' }\n"); f:close()
f = assert(io.open(dir .. "/phlox/extra.lua", "w")); f:write("return 1\n"); f:close()
f = assert(io.open(dir .. "/mymod.lua", "w")); f:write("return { mine = true }\n"); f:close()
local code, out = run(string.format("%q --path %q -e \"io.write(tostring(require('phlox.cli').marker))\"", bin, dir))
check(code == 0 and out == "nil", "--path must not replace phlox.cli: " .. out)
code, out = run(string.format("PHLOX_PATH=%q %q -e \"io.write(tostring(require('phlox.cli').marker))\"", dir, bin))
check(code == 0 and out == "nil", "PHLOX_PATH must not replace phlox.cli: " .. out)
code, out = run(string.format("%q --path %q list Zn", bin, dir))
check(code == 0 and not out:find("USER CODE RAN"), "a command must not run the user's phlox/cli.lua: " .. out)
code, out = run(string.format("%q --path %q -e \"require('phlox.extra')\"", bin, dir))
check(code == 1 and out:find("reserved for the built-in library", 1, true), "phlox.* names are reserved: " .. out)
-- user modules of other names are found
code, out = run(string.format("%q --path %q -e \"io.write(tostring(require('mymod').mine))\"", bin, dir))
check(code == 0 and out == "true", "user module through --path: " .. out)

-- LUA_PATH is ignored: a module only reachable through it is not found
f = assert(io.open(dir .. "/onlyvialuapath.lua", "w")); f:write("return 1\n"); f:close()
code, out = run(string.format("LUA_PATH=%q %q -e \"require('onlyvialuapath')\"", dir .. "/?.lua", bin))
check(code == 1 and out:find("module 'onlyvialuapath' not found"), "LUA_PATH must be ignored: " .. out)

-- library files (element definitions) are read from the user folder first
f = assert(io.open(dir .. "/elements/Xx.lua", "w")); f:write("return { element = 'Xx' }\n"); f:close()
code, out = run(string.format("%q --path %q -e \"local t, w = require('phlox').read_library_file('elements/Xx.lua'); io.write(w)\"", bin, dir))
check(code == 0 and out == dir .. "/elements/Xx.lua", "user element file found: " .. out)

S.files.remove(dir)
print("test_modules: all checks passed")
