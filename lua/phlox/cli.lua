--- phlox.cli: the commands of the phlox program (reaction, check, list).
-- Each takes the argument list after the command name and returns an exit
-- status: 0 success, 1 failure, 2 usage error.
local cli = {}
local commands = {}

-- `phlox COMMAND --help`: one text per command (the manual page, docs/phlox.1,
-- is checked against these by tests/packaging/check_manpage.lua).
cli.help = {
  reaction = [[
usage: phlox reaction EQUATION [--temperature C] [--pressure BAR] [--json]

Thermodynamics of one balanced reaction from the species of the library:
dG, dH, dS, log K and, when electrons take part, E (V vs SHE).  The element
files of the elements named in the equation are loaded.

  EQUATION              e.g. "Zn^2+ + 2 e- = Zn(s)" (quote it)
  -T, --temperature C   temperature in degrees C (default 25)
  -P, --pressure BAR    pressure in bar (default 1 bar up to 100 C, the
                        saturation pressure above)
  --json                one JSON object: T_K, P_bar, dG_kJ, logK, E0_V
  -h, --help            print this help
]],
  check = [[
usage: phlox check FILE...

Validates element definition files: sandbox errors, fields, units, formulas,
charges, duplicates, physical ranges, dfG/dfH/S consistency, reaction balance.  Each file
sees the built-in species and those of the files before it.  Problems go to
standard output as FILE:LINE: severity: message; exit status 1 on an error.

  FILE                  an element definition file (.lua)
  -h, --help            print this help
]],
  list = [[
usage: phlox list [ELEMENT]

Without ELEMENT, lists the elements the library has definition files for and
where each file comes from (built in, or a --path folder).  With ELEMENT,
lists the species containing it: formula, model, dfG in kJ/mol (or log K),
file:line and source.

  ELEMENT               an element symbol such as Fe (H and O allowed)
  -h, --help            print this help
]],
}

local function usage(msg)
  io.stderr:write("phlox: ", msg, "\n")
  return 2
end

local function json_number(x)
  if x == nil or x ~= x or x == math.huge or x == -math.huge then return "null" end
  return require("phlox.json").number(x)
end

-- Elements of a reaction's species, to know which files to load: the C
-- reaction parser reads the equation (core.reaction_terms).
local function elements_of(text)
  local core = require "phlox.core"
  local terms, perr = core.reaction_terms(text)
  if not terms then return nil, perr end
  local seen, list = {}, {}
  for _, term in ipairs(terms) do
    local syms = {}
    for sym in pairs(term.elements) do syms[#syms + 1] = sym end
    table.sort(syms)
    for _, sym in ipairs(syms) do
      if sym ~= "H" and sym ~= "O" and not seen[sym] then
        seen[sym] = true
        list[#list + 1] = sym
      end
    end
  end
  local elements = #list
  for _, g in ipairs(require("phlox").groups_in(text)) do list[#list + 1] = g end -- cyanide: CN.lua
  for k = 1, elements do
    local s = list[k]
    if not core.embedded_source("stdlib/elements/" .. s .. ".lua") then
      local phlox = require "phlox"
      local t = phlox.read_library_file("elements/" .. s .. ".lua")
      if not t then return nil, "no element definition file for '" .. s .. "'" end
    end
  end
  return list
end

function commands.reaction(args)
  local eq, T_C, P, as_json
  local i = 1
  while i <= #args do
    local a = args[i]
    if a == "--temperature" or a == "-T" then
      T_C = tonumber(args[i + 1]); i = i + 2
      if not T_C then return usage("--temperature needs a number (degrees C)") end
    elseif a == "--pressure" or a == "-P" then
      P = tonumber(args[i + 1]); i = i + 2
      if not P then return usage("--pressure needs a number (bar)") end
    elseif a == "--json" then
      as_json = true; i = i + 1
    elseif a:sub(1, 2) == "--" then
      return usage("reaction: unknown option '" .. a .. "'")
    elseif eq then
      return usage("reaction: give one equation (quote it)")
    else
      eq = a; i = i + 1
    end
  end
  if not eq then return usage('reaction: usage: phlox reaction "EQUATION" [--temperature C] [--pressure BAR] [--json]') end
  local phlox = require "phlox"
  local els, err = elements_of(eq)
  if not els then io.stderr:write("phlox: reaction: ", err, "\n"); return 1 end
  local ok, lib = pcall(phlox.library, els)
  if not ok then io.stderr:write("phlox: ", tostring(lib), "\n"); return 1 end
  local T = (T_C or 25) + 273.15
  local r, rerr = lib.db:reaction(eq, T, P)
  if not r then io.stderr:write("phlox: ", rerr, "\n"); return 1 end
  if as_json then
    io.write(string.format('{"T_K":%s,"P_bar":%s,"dG_kJ":%s,"logK":%s,"E0_V":%s}\n',
      json_number(r.T), json_number(r.P), json_number(r.dG and r.dG / 1000),
      json_number(r.logK), r.E and json_number(r.E) or "null"))
  else
    io.write(("%s\n"):format(r.text or eq))
    io.write(("  T = %.2f C (%.2f K), P = %.4g bar\n"):format(r.T - 273.15, r.T, r.P))
    io.write(("  dG = %.3f kJ/mol\n"):format(r.dG / 1000))
    if r.dH then io.write(("  dH = %.3f kJ/mol\n"):format(r.dH / 1000)) end
    if r.dS then io.write(("  dS = %.3f J/(mol K)\n"):format(r.dS)) end
    io.write(("  log K = %.4f\n"):format(r.logK))
    if r.E then io.write(("  E = %.4f V vs SHE (n = %g)\n"):format(r.E, r.n_e)) end
  end
  return 0
end

function commands.check(args)
  if #args == 0 then return usage("check: usage: phlox check FILE...") end
  local core = require "phlox.core"
  local ok, problems = core.check_files(args)
  local nerr, nwarn = 0, 0
  for _, p in ipairs(problems) do
    io.stdout:write(p.text, "\n")
    if p.severity == "error" then nerr = nerr + 1 else nwarn = nwarn + 1 end
  end
  io.stderr:write(("phlox check: %d file(s), %d error(s), %d warning(s)\n"):format(#args, nerr, nwarn))
  return ok and 0 or 1
end

function commands.list(args)
  local phlox = require "phlox"
  local element = args[1]
  if #args > 1 then return usage("list: usage: phlox list [ELEMENT]") end
  local els = phlox.available_elements()
  if not element then -- the elements, with where each file comes from
    for _, e in ipairs(els) do
      local _, where = phlox.read_library_file("elements/" .. e .. ".lua")
      io.write(("%-3s %s\n"):format(e, where or "?"))
    end
    io.stderr:write(("phlox list: %d elements (phlox list ELEMENT lists its species)\n"):format(#els))
    return 0
  end
  if element and not element:match("^%u%l?$") then -- a ligand group (CN): its species have no element of that name
    io.stderr:write("phlox: list: '", element, "' is a ligand group, not an element: its complexes are listed",
                    " under their metal and under each of its elements (phlox list Au, phlox list N)\n")
    return 1
  end
  if element then
    local found = false
    for _, e in ipairs(els) do if e == element then found = true end end
    if not found and element ~= "H" and element ~= "O" then
      io.stderr:write("phlox: list: no element definition file for '", element, "'\n")
      return 1
    end
  end
  local ok, lib = pcall(phlox.library, els)
  if not ok then io.stderr:write("phlox: ", tostring(lib), "\n"); return 1 end
  local text, n = lib.db:list_text(element)
  io.write(text)
  io.stderr:write(("phlox list: %d species\n"):format(n))
  return 0
end

function cli.run(name, args)
  local cmd = commands[name]
  if not cmd then return usage("unknown command '" .. tostring(name) .. "'") end
  if args[1] == "--help" or args[1] == "-h" then
    io.write(cli.help[name])
    return 0
  end
  return cmd(args)
end

-- The interactive prompt shows values with cli.show: records (tables) as
-- sorted, indented fields instead of `table: 0x...`; long lists shortened.
local SHOW_ITEMS = 12 -- entries shown per table
local SHOW_DEPTH = 2  -- nested tables shown

local function pretty(v, depth, seen, out, indent)
  local t = type(v)
  if t == "string" then out[#out + 1] = string.format("%q", v)
  elseif t == "function" then
    local name = require("phlox").help_name(v)
    out[#out + 1] = name and ("function " .. name .. " (phlox.help(" .. name .. "))") or tostring(v)
  elseif t ~= "table" then out[#out + 1] = tostring(v)
  elseif seen[v] then out[#out + 1] = "{ ... (cycle) }"
  elseif depth > SHOW_DEPTH then out[#out + 1] = "{ ... }"
  else
    seen[v] = true
    local keys = {}
    for k in pairs(v) do keys[#keys + 1] = k end
    table.sort(keys, function(a, b)
      if type(a) == type(b) and (type(a) == "number" or type(a) == "string") then return a < b end
      return type(a) == "number"
    end)
    if #keys == 0 then out[#out + 1] = "{}"; seen[v] = nil; return end
    out[#out + 1] = "{"
    local pad = indent .. "  "
    for i, k in ipairs(keys) do
      if i > SHOW_ITEMS then
        out[#out + 1] = "\n" .. pad .. ("... (%d more)"):format(#keys - SHOW_ITEMS)
        break
      end
      local key = type(k) == "string" and k:match("^[%a_][%w_]*$") and k or ("[" .. (type(k) == "string" and string.format("%q", k) or tostring(k)) .. "]")
      out[#out + 1] = "\n" .. pad .. key .. " = "
      pretty(v[k], depth + 1, seen, out, pad)
      out[#out + 1] = ","
    end
    out[#out + 1] = "\n" .. indent .. "}"
    seen[v] = nil
  end
end

function cli.pretty(v)
  local out = {}
  pretty(v, 1, {}, out, "")
  return table.concat(out)
end

function cli.show(...)
  local parts = {}
  for i = 1, select("#", ...) do parts[i] = cli.pretty((select(i, ...))) end
  io.write(table.concat(parts, "\t"), "\n")
end

cli.commands = commands
return cli
