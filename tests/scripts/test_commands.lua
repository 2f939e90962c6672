-- test_commands.lua: the reaction, check and list commands as a user runs
-- them.  Published values: E0(Zn2+/Zn) = -0.7618 V and E0(Fe3+/Fe2+) =
-- 0.771 V (CRC Handbook electrochemical series, from memory; tests/reference); the
-- Nernst slope of a one-electron couple changes with T as RT ln10/F.
local bin = assert(os.getenv("PHLOX_BIN"), "PHLOX_BIN not set")
local fixtures = assert(os.getenv("PHLOX_TEST_FIXTURES"), "PHLOX_TEST_FIXTURES not set")
local S = dofile(assert(os.getenv("PHLOX_SOURCE_DIR"), "PHLOX_SOURCE_DIR is not set (run through ctest)") .. "/tests/support/init.lua")
local check, close = S.check, S.close
local LT = { strict = true } -- the bounds below are strict (|a - b| < tol)

local function run(args) return S.proc.run(("%q %s"):format(bin, args)) end

local JSON = S.json
-- a number of the one JSON object the command printed (nil if absent or null)
local function num(json, key)
  local ok, doc = pcall(JSON.decode, json)
  check(ok and type(doc) == "table", "output is one JSON object: " .. tostring(doc) .. "\n" .. json)
  return math.type(doc[key]) and doc[key] or nil
end

-- --json: the documented keys, E0 against the handbook
local code, out = run([[reaction "Zn^2+ + 2 e- = Zn(s)" --json]])
check(code == 0, "reaction --json exit " .. tostring(code))
for _, k in ipairs { "T_K", "P_bar", "dG_kJ", "logK", "E0_V" } do
  check(num(out, k), "key " .. k .. " in " .. out)
end
close(num(out, "E0_V"), -0.7618, 0.005, "E0 Zn2+/Zn (CRC) in " .. out, LT)
check(num(out, "T_K") == 298.15 and num(out, "P_bar") == 1, "default T and P: " .. out)
-- dG = -n F E0 (definition)
local F = S.chem.F
close(num(out, "dG_kJ"), -2 * F * num(out, "E0_V") / 1000, 1e-6, "dG = -nFE (kJ/mol)", LT)

-- no electrons: E0 is null
code, out = run([[reaction "H2O(l) = H^+ + OH^-" --json]])
check(code == 0 and JSON.decode(out).E0_V == JSON.null, "E0 null without electrons: " .. out)
close(num(out, "logK"), -13.995, 0.03, "log Kw at 25 C vs IAPWS R11-07 in " .. out, LT)

-- temperature and the saturation pressure above 100 C
code, out = run([[reaction "Fe^3+ + e- = Fe^2+" --temperature 200 --json]])
check(code == 0 and num(out, "T_K") == 473.15, "T option: " .. out)
close(num(out, "P_bar"), 15.55, 0.05, "psat at 200 C, bar (IAPWS-95: 1.5549 MPa) in " .. out, LT)
code, out = run([[reaction "Fe^3+ + e- = Fe^2+" --temperature 150 --pressure 50 --json]])
check(code == 0 and num(out, "P_bar") == 50, "pressure option: " .. out)

-- the plain text form names the quantities and units
code, out = run([[reaction "Fe^3+ + e- = Fe^2+"]])
check(code == 0 and out:find("log K =") and out:find("V vs SHE"), "text output: " .. out)
close(tonumber(out:match("E = ([-%d.]+) V")), 0.771, 0.005, "E0 Fe3+/Fe2+ (CRC) in " .. out, LT)

-- errors: not balanced, unknown species, out of range, usage
local err
code, out, err = run([[reaction "Zn^2+ + e- = Zn(s)"]])
check(code == 1 and err:find("does not balance") and err:find("charge"), "unbalanced: " .. err)
code, out, err = run([[reaction "Zn^2+ + 2 e- = Zn(s)" --temperature 400]])
check(code == 1 and err:find("range"), "out of range: " .. err)
code, out, err = run([[--no-such]])
check(code == 2, "usage error")
code, out, err = run([[reaction]])
check(code == 2 and err:find("usage"), "reaction without an equation: " .. err)

-- check: a good fixture passes, a fixture with a sign slip fails with file:line
code, out, err = run(("check %q"):format(fixtures .. "/elements/good_Zn.lua"))
check(code == 0, "check good fixture: " .. out .. err)
code, out, err = run(("check %q"):format(fixtures .. "/elements/bad_sign.lua"))
check(code == 1 and out:find("bad_sign.lua:%d+:"), "check bad fixture: " .. out .. err)

-- list: species with model and source
code, out = run("list Zn")
check(code == 0 and out:find("Zn^2+", 1, true) and out:find("from memory of", 1, true), "list Zn: " .. out)
-- list without an element: the elements and where each file comes from
code, out, err = run("list")
check(code == 0 and out:find("\nZn  stdlib/elements/Zn.lua\n", 1, true) and err:find("elements"), "list: " .. out)
-- COMMAND --help: usage on standard output, exit 0, for every command
for _, cmd in ipairs { "reaction", "check", "list" } do
  code, out = run(cmd .. " --help")
  check(code == 0 and out:find("usage: phlox " .. cmd, 1, true), cmd .. " --help: " .. out)
end
-- phlox.help names the options of a function, with types and ranges
code, out = run([[-e "require('phlox').help(require('phlox').map)"]])
check(code == 0 and out:find("ionic_strength%s+number %[0, 0.5%]"), "phlox.help(phlox.map): " .. out)
code, out = run([[-e "require('phlox').help('plot.map')"]])
check(code == 0 and out:find("dpi%s+number"), "phlox.help('plot.map'): " .. out)
code, out, err = run([[-e "require('phlox').help('mapp')"]])
check(code == 1 and err:find("no function 'mapp'", 1, true), "phlox.help of an unknown name: " .. err)
-- the prompt shows records as fields, not table: 0x...
local pretty = require("phlox.cli").pretty
local shown = pretty({ b = 2, a = { 1, "x" } })
check(shown == '{\n  a = {\n    [1] = 1,\n    [2] = "x",\n  },\n  b = 2,\n}', "pretty: " .. shown)
check(not pretty(require("phlox").water {}):find("table: 0x", 1, true), "pretty water record")

code, out, err = run("list Xx")
check(code == 1 and err:find("Xx"), "list unknown element: " .. err)
print("test_commands: all checks passed")
