-- test_cli.lua: the phlox program's command line, run as a user would:
-- exit statuses, messages, script arguments, the version and help texts.
local bin = assert(os.getenv("PHLOX_BIN"), "PHLOX_BIN not set")

local function tmpname(suffix)
  return os.tmpname() .. (suffix or "")
end

local S = dofile(assert(os.getenv("PHLOX_SOURCE_DIR"), "PHLOX_SOURCE_DIR is not set (run through ctest)") .. "/tests/support/init.lua")

-- Run phlox with a shell-quoted argument string; returns status, stdout, stderr.
local function run(args, stdin_text)
  return S.proc.run(string.format("%q %s", bin, args), { stdin = stdin_text })
end
local check = S.check

-- --version prints the version and exits 0
local st, out = run("--version")
check(st == 0, "--version exit " .. st)
check(out:match("^phlox %d+%.%d+%.%d+"), "--version output: " .. out)

-- --help names the commands and the caution
st, out = run("--help")
check(st == 0 and out:find("reaction") and out:find("check") and out:find("list"), "help text")
check(out:find("what can form, not how fast"), "help carries the safety caution")

-- an unknown option is a usage error (2) with a message on stderr
local err
st, out, err = run("--no-such-option")
check(st == 2, "unknown option exit " .. st)
check(err:find("unknown option '%-%-no%-such%-option'"), "unknown option message: " .. err)

-- an option missing its argument is a usage error
st, out, err = run("-e")
check(st == 2 and err:find("needs an argument"), "-e without code")

-- -e runs code; several -e run in order
st, out = run([[-e "io.write('a')" -e "io.write('b')"]])
check(st == 0 and out == "ab", "-e order: " .. out)

-- a runtime error: file:line: message, a traceback, exit status 1
local script = tmpname(".lua")
local f = assert(io.open(script, "w"))
f:write("local x = 1\nlocal function g() error('deliberate failure') end\ng()\n")
f:close()
st, out, err = run(string.format("%q", script))
check(st == 1, "error exit " .. st)
check(err:find(script:gsub("%p", "%%%0") .. ":2: deliberate failure", 1, false), "file:line message: " .. err)
check(err:find("stack traceback"), "traceback printed")
os.remove(script)

-- a syntax error is reported with file and line, exit 1
script = tmpname(".lua")
f = assert(io.open(script, "w")); f:write("local a = \nlocal = 3\n"); f:close()
st, out, err = run(string.format("%q", script))
check(st == 1 and err:find(":2:"), "syntax error with line: " .. err)
os.remove(script)

-- a missing script file fails with a message naming it
st, out, err = run("/nonexistent/study.lua")
check(st == 1 and err:find("/nonexistent/study.lua"), "missing script: " .. err)

-- script arguments reach the script as `arg` and as `...`
script = tmpname(".lua")
f = assert(io.open(script, "w"))
f:write("local a, b = ...\nio.write(arg[0] == ", string.format("%q", script),
        " and 'ok0' or 'bad0', ' ', arg[1], ' ', arg[2], ' ', a, ' ', b, ' ', #arg)\n")
f:close()
st, out = run(string.format("%q alpha 'be ta'", script))
check(st == 0 and out == "ok0 alpha be ta alpha be ta 2", "script args: " .. out)
os.remove(script)

-- with no arguments and standard input not a terminal, the script is read from stdin
st, out = run("", "io.write(6 * 7)")
check(st == 0 and out == "42", "stdin script: " .. out)

-- an unknown command word is taken as a script file name (and is missing)
st = run("no-such-command")
check(st == 1, "unknown word is a (missing) script")

print("test_cli: all checks passed")
