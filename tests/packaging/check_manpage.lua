-- check_manpage.lua - docs/phlox.1 against the program: the options,
-- commands and environment of `phlox --help`, each command's options in
-- `phlox COMMAND --help`, the version, and the sections a manual page needs.
-- Run by the phlox program (ctest packaging.manpage); PHLOX_BIN and
-- PHLOX_SOURCE_DIR come from the environment.
local bin = assert(os.getenv("PHLOX_BIN"), "PHLOX_BIN not set")
local src = assert(os.getenv("PHLOX_SOURCE_DIR"), "PHLOX_SOURCE_DIR not set")
local S = dofile(src .. "/tests/support/init.lua")
local soft = S.soft() -- every mismatch is listed, then the test fails
local check = soft.check
local function run(cmd)
  local code, text = S.proc.run(cmd, { merge = true })
  return text, code
end
local function sorted_keys(t)
  local out = {}
  for k in pairs(t) do out[#out + 1] = k end
  table.sort(out)
  return out
end

local f = assert(io.open(src .. "/docs/phlox.1", "rb"))
local man = f:read("a")
f:close()

-- Split the page into sections (.SH NAME) and turn roff into plain words:
-- "\-" is "-", font escapes go.
local function plain(s)
  return (s:gsub("\\%-", "-"):gsub("\\f[BIRP]", ""):gsub("\\%(de", "°"):gsub("\\%(dq", '"'))
end
local sections, order = {}, {}
local cur
for line in man:gmatch("[^\n]*") do
  local name = line:match('^%.SH%s+"?([^"]+)"?')
  if name then
    cur = name
    sections[cur] = {}
    order[#order + 1] = cur
  elseif cur and not line:match("^%.\\\"") then
    table.insert(sections[cur], plain(line))
  end
end
for _, need in ipairs { "NAME", "SYNOPSIS", "DESCRIPTION", "COMMANDS", "OPTIONS", "ENVIRONMENT",
                        "FILES", "EXIT STATUS", "CAUTION" } do
  check(sections[need], "docs/phlox.1 has no section " .. need)
end
local function text_of(sec) return table.concat(sections[sec] or {}, "\n") end

-- Options written in a text: "-e", "--path", "--path=DIR" -> "--path".
local function options_in(text)
  local set = {}
  for opt in text:gmatch("%f[%w%-](%-%-?[%a][%w%-]*)") do set[opt] = true end
  if text:find("%f[%S]%-%-%f[%s]") then set["--"] = true end
  return set
end
local function same_sets(a, b, what_a, what_b)
  for _, k in ipairs(sorted_keys(a)) do check(b[k], k .. " is in " .. what_a .. " but not in " .. what_b) end
  for _, k in ipairs(sorted_keys(b)) do check(a[k], k .. " is in " .. what_b .. " but not in " .. what_a) end
end

-- phlox --help: its sections "commands:", "options:", "environment:".
local help, code = run(bin .. " --help")
check(code == 0, "phlox --help exits with " .. tostring(code))
local blocks, bname = {}, "head"
for line in help:gmatch("[^\n]*") do
  local h = line:match("^(%a[%a ]*):$")
  if h then bname = h; blocks[bname] = {} else
    blocks[bname] = blocks[bname] or {}
    table.insert(blocks[bname], line)
  end
end
local help_opts_text = table.concat(blocks.options or {}, "\n")
-- option names only from the start of each help line (descriptions mention others)
local help_opts = {}
for line in help_opts_text:gmatch("[^\n]+") do
  local lead = line:match("^  (%-[^%s].-)%s%s") or line:match("^  (%-%S*)$")
  if lead then for opt in pairs(options_in(lead)) do help_opts[opt] = true end end
end
local man_opts = {}
for _, line in ipairs(sections.OPTIONS or {}) do
  if line:match("^%.B") then for opt in pairs(options_in(line)) do man_opts[opt] = true end end
end
check(next(help_opts), "no options found in phlox --help")
same_sets(help_opts, man_opts, "phlox --help", "the OPTIONS of docs/phlox.1")

local help_cmds, man_cmds = {}, {}
for line in table.concat(blocks.commands or {}, "\n"):gmatch("[^\n]+") do
  local c = line:match("^  (%l+)%f[%s\0]")
  if c then help_cmds[c] = true end
end
for _, line in ipairs(sections.COMMANDS or {}) do
  local c = line:match('^%.BI?%s+"?(%l+)[%s"]')
  if c then man_cmds[c] = true end
end
check(next(help_cmds), "no commands found in phlox --help")
same_sets(help_cmds, man_cmds, "phlox --help", "the COMMANDS of docs/phlox.1")

-- Each command's own help: exit 0, a usage line, and its options in the page.
local cmd_text = text_of("COMMANDS")
for _, c in ipairs(sorted_keys(help_cmds)) do
  for _, flag in ipairs { "--help", "-h" } do
    local out, rc = run(bin .. " " .. c .. " " .. flag)
    check(rc == 0, ("phlox %s %s exits with %s"):format(c, flag, tostring(rc)))
    check(out:find("^usage: phlox " .. c), ("phlox %s %s prints no usage line"):format(c, flag))
    for line in out:gmatch("[^\n]+") do
      local lead = line:match("^  (%-[^%s].-)%s%s") or line:match("^  (%-%S*)$")
      if lead then
        for opt in pairs(options_in(lead)) do
          if opt ~= "-h" and opt ~= "--help" then
            check(cmd_text:find(opt, 1, true), ("%s of phlox %s --help is not in the COMMANDS of docs/phlox.1"):format(opt, c))
          end
        end
      end
    end
  end
end

-- Environment variables: those of --help are described in the page.
local env_text = text_of("ENVIRONMENT")
local n_env = 0
for var in table.concat(blocks.environment or {}, "\n"):gmatch("%f[%w](PHLOX_[%u_]+)") do
  n_env = n_env + 1
  check(env_text:find(var, 1, true), var .. " of phlox --help is not in the ENVIRONMENT of docs/phlox.1")
end
check(n_env > 0, "phlox --help names no environment variable")
for var in env_text:gmatch("%f[%w](PHLOX_[%u_]+)") do
  check(help:find(var, 1, true), var .. " of docs/phlox.1 is not in phlox --help")
end

-- Version of the page header.
local version = run(bin .. " --version"):match("^phlox (%S+)")
check(man:find('%.TH PHLOX 1 "[^"]*" "phlox ' .. version:gsub("%p", "%%%0") .. '"'),
  "the .TH line of docs/phlox.1 does not carry phlox " .. tostring(version))

-- Exit statuses named in the page are those main.c uses.
local main = assert(io.open(src .. "/src/cli/main.c")):read("a")
for name, num in main:gmatch("#define PX_EXIT_(%u+) (%d+)") do
  check(text_of("EXIT STATUS"):find("\n%.B " .. num .. "\n") or text_of("EXIT STATUS"):find("^%.B " .. num .. "\n"),
    ("exit status %s (PX_EXIT_%s) is not in docs/phlox.1"):format(num, name))
end

-- The caution reaches the page.
check(text_of("CAUTION"):find("what can form, not how fast", 1, true), "the caution is missing")

-- The page renders without groff warnings.
local warn = run("groff -man -Tutf8 -ww -z " .. src .. "/docs/phlox.1")
check(warn == "", "groff warns about docs/phlox.1: " .. warn)

soft.finish("mismatch(es) between docs/phlox.1 and the program")
print(("docs/phlox.1 agrees with phlox --help: %d options, %d commands"):format(
  #sorted_keys(help_opts), #sorted_keys(help_cmds)))
