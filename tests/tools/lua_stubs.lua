-- lua_stubs.lua - editor completion for the Lua API: annotation stubs in
-- the format of the Lua language server (LuaLS: ---@meta, ---@class,
-- ---@field, ---@param, ---@return), generated from the code itself.
--
--   phlox tests/tools/lua_stubs.lua DIR            write DIR/phlox.lua, DIR/phlox/*.lua
--   phlox tests/tools/lua_stubs.lua --check DIR    fail if a public function has no
--                                                  stub or a stub is stale
--
-- What it reads: every public module (require'd here) and the metatables
-- phlox.<Type> of the C bindings.  For a Lua function: its parameter names
-- (debug.getlocal), the "---" comment above it, and the option keys its body
-- reads from an options table (`opts.key`) or its comment shows
-- (`{ key = ...`).  For a C function: the signature comment in src/lua/*.c
-- ("/* core.water(T [, P]) -> table */"), else the manual's (docs/lua-api.md).  Types are guessed from names
-- (T_C: number, file: string, library: phlox.Library) and are `any`
-- otherwise.  docs/lua-stubs is installed as share/phlox/lua-stubs: add it to
-- the language server's workspace.library.
local core = require "phlox.core"

local MODULES = { "phlox", "phlox.plot", "phlox.export", "phlox.sweep", "phlox.diagrams",
                  "phlox.palette", "phlox.json", "phlox.provenance", "phlox.report", "phlox.core" }
-- phlox.cli is the phlox program's command runner, not a module for studies.

local args = { ... }
local check = args[1] == "--check"
local dir = check and args[2] or args[1]
assert(dir, "usage: phlox lua_stubs.lua [--check] DIR")

local src_root = os.getenv("PHLOX_SOURCE_DIR") or "."

local read = dofile((debug.getinfo(1, "S").source:match("^@(.*)[/\\]") or ".")
                   .. "/../support/files.lua").read -- the file's bytes, or nil

local function lines_of(text)
  local t = {}
  for l in (text .. "\n"):gmatch("([^\n]*)\n") do t[#t + 1] = l end
  return t
end

-- Source lines of a Lua function's chunk (embedded files are named "@lua/...").
local source_cache = {}
local function source_lines(chunkname)
  if source_cache[chunkname] == nil then
    local path = chunkname:sub(2)
    local text = core.embedded_source(path) or read(src_root .. "/" .. path)
    source_cache[chunkname] = text and lines_of(text) or false
  end
  return source_cache[chunkname] or nil
end

-- C signature comments: "core.name(args) -> result" and "obj:name(args) -> result".
local c_sigs = {}
do
  for _, name in ipairs(core.list_dir(src_root .. "/src/lua") or {}) do
    local text = name:match("%.c$") and read(src_root .. "/src/lua/" .. name) or ""
    for recv, sep, name, params, rest in text:gmatch("/%*%s*(%a+)([%.:])([%a_][%w_]*)(%b())([^\n]*)") do
      local ret = rest:match("^%s*%->%s*(.-)%s*%*?/?%s*$")
      local key = (recv == "core" and "core." or "method:") .. name
      if sep == "." and recv ~= "core" then key = nil end
      if key and not c_sigs[key] then c_sigs[key] = { params = params:sub(2, -2), ret = ret } end
    end
  end
  -- then the manual's signatures (docs/lua-api.md: `fig:axes(panel, ...)`,
  -- `core.ticks(a, b [, n, log])`, `plot.grid(maps, opts) → fig`)
  local manual = read(src_root .. "/docs/lua-api.md") or ""
  for recv, sep, name, params, ret in manual:gmatch("`(%a+)([%.:])([%a_][%w_]*)(%b())([^`]*)`") do
    local key = (sep == "." and recv == "core" and "core." or sep == ":" and "method:" or nil)
    if key and not c_sigs[key .. name] then
      c_sigs[key .. name] = { params = params:sub(2, -2), ret = ret:match("^%s*→%s*(.-)%s*$") }
    end
  end
end

local TYPES = {
  T = "number", T_C = "number", P = "number", pH = "number", E = "number", pe = "number",
  x = "number", y = "number", dpi = "number", width = "number", height = "number",
  n = "integer", threads = "integer", total = "number", ligand_total = "number",
  ligand_activity = "number", ionic_strength = "number", size = "number", panel = "integer",
  file = "string", path = "string", text = "string", name = "string", element = "string",
  ligand = "string", formula = "string", title = "string", format = "string", rel = "string",
  library = "phlox.Library", lib = "phlox.Library", db = "phlox.Database", map = "table",
  fig = "phlox.Figure", opts = "table", spec = "table|string",
  pH_range = "number[]", E_range = "number[]", T_range = "number[]", axes = "string[]",
  exclude = "string[]", suppress = "string[]", only = "string[]", user = "string[]",
  totals = "table<string, number>", fixed = "table<string, number>",
  fugacities = "table<string, number>", solids = "boolean", json = "boolean",
}
local function type_of(name) return TYPES[name] or "any" end

local function sorted_keys(t)
  local k = {}
  for key in pairs(t) do if type(key) == "string" then k[#k + 1] = key end end
  table.sort(k)
  return k
end

local function lua_type(v)
  local t = type(v)
  if t == "number" then return math.type(v) == "integer" and "integer" or "number" end
  if t == "table" then return "table" end
  return t
end

-- The "--" comment block right above a function's first line.
local function doc_of(info)
  local ls = source_lines(info.source)
  if not ls then return {} end
  local out = {}
  local i = info.linedefined - 1
  while i >= 1 and ls[i]:match("^%s*%-%-") do
    table.insert(out, 1, (ls[i]:gsub("^%s*%-%-%-?%s?", "")))
    i = i - 1
  end
  return out
end

-- Keys read from an options parameter in the body, and shown in the comment.
local function option_keys(info, pname, doc)
  local keys = {}
  local ls = source_lines(info.source)
  if ls then
    for i = info.linedefined, info.lastlinedefined do
      for k in ls[i]:gmatch("%f[%w_]" .. pname .. "%.([%a_][%w_]*)") do keys[k] = true end
      for k in ls[i]:gmatch("%f[%w_]" .. pname .. '%[%"([%a_][%w_]*)%"%]') do keys[k] = true end
      -- the helpers temperature(opts, ...) and pressure(opts, ...) (stdlib/phlox/options.lua)
      if ls[i]:find("temperature(" .. pname .. ",", 1, true) then keys.T, keys.T_C = true, true end
      if ls[i]:find("pressure(" .. pname .. ",", 1, true) then keys.P = true end
    end
  end
  -- keys at the first level of the tables the comment's examples pass
  -- (`phlox.map { library = lib, totals = { Zn = 1e-5 } }` gives library
  -- and totals, not Zn)
  local text = table.concat(doc, "\n")
  local depth, i = 0, 1
  while i <= #text do
    local c = text:sub(i, i)
    if c == "{" then
      depth = depth + 1
    elseif c == "}" then
      depth = math.max(depth - 1, 0)
    elseif depth == 1 and c:match("[%a_]") and text:sub(i - 1, i - 1):match("^[%s{,]?$") then
      local k, eq = text:match("^([%a_][%w_]*)(%s*=)", i)
      if k and text:sub(i + #k + #eq, i + #k + #eq) ~= "=" then keys[k] = true end
      i = i + (k and #k or 1) - 1
    end
    i = i + 1
  end
  return keys
end

-- A parameter the body treats as optional (`x or`, `x == nil`, `if x then`).
local function optional_param(info, pname)
  local ls = source_lines(info.source)
  if not ls then return false end
  local pats = { "%f[%w_]" .. pname .. "%s+or%f[^%w_]", "%f[%w_]" .. pname .. "%s*[=~]=%s*nil",
                 "not%s+" .. pname .. "%f[^%w_]", "if%s+" .. pname .. "%s+then", "type%(" .. pname .. "%)%s*==%s*\"nil\"" }
  for i = info.linedefined, info.lastlinedefined do
    for _, p in ipairs(pats) do if ls[i]:find(p) then return true end end
  end
  return false
end

local KEYWORDS = {}
for w in ("and break do else elseif end false for function goto if in local nil not or repeat "
          .. "return then true until while"):gmatch("%a+") do KEYWORDS[w] = true end

local OPTION_PARAMS = { opts = true, spec = true, options = true, o = true, style = true }

-- Stub of one function; `owner` is "phlox.plot" or "phlox.Library" (method).
local function function_stub(out, owner, name, f, method, classes)
  local info = debug.getinfo(f, "Su")
  if info.what == "C" then
    local sig = c_sigs[(method and "method:" or "core.") .. name]
    out[#out + 1] = "--- " .. (sig and ("(C) %s%s%s(%s)%s"):format(owner, method and ":" or ".", name,
      sig.params, sig.ret and (" -> " .. sig.ret) or "") or "(C function; no signature in src/lua or docs/lua-api.md)")
    local params = {}
    if sig then
      local optional = false
      local function param(pname, opt)
        if KEYWORDS[pname] then pname = "on" end -- fig:pages(true): a literal, not a name
        params[#params + 1] = pname
        out[#out + 1] = ("---@param %s%s %s"):format(pname, opt and "?" or "", type_of(pname))
      end
      -- "a, b [, c, d]": a bracket makes what follows it optional
      for piece in (sig.params .. ","):gmatch("([^,]*),") do
        local pre, post = piece:match("^([^%[]*)%[?(.*)$")
        local pname = pre:match("([%a_][%w_]*)")
        if pname then param(pname, optional) end
        if piece:find("[", 1, true) then optional = true end
        if not pname then
          pname = post:match("([%a_][%w_]*)")
          if pname then param(pname, true) end
        end
      end
      if sig.ret then out[#out + 1] = "---@return any # " .. sig.ret end
    else
      params[1] = "..."
      out[#out + 1] = "---@param ... any"
      out[#out + 1] = "---@return any"
    end
    out[#out + 1] = ("function %s%s%s(%s) end"):format(owner, method and ":" or ".", name, table.concat(params, ", "))
    out[#out + 1] = ""
    return
  end
  local doc = doc_of(info)
  for _, l in ipairs(doc) do out[#out + 1] = "--- " .. l end
  local params = {}
  for i = 1, info.nparams do
    local pname = debug.getlocal(f, i)
    if not (method and i == 1 and pname == "self") then
      params[#params + 1] = pname
      local ty = type_of(pname)
      if OPTION_PARAMS[pname] then
        local keys = sorted_keys(option_keys(info, pname, doc))
        if #keys > 0 then
          local cname = owner .. "." .. name .. "." .. pname
          classes[#classes + 1] = { name = cname, keys = keys }
          ty = cname .. (pname == "spec" and "|string[]|string" or "")
        end
      end
      out[#out + 1] = ("---@param %s%s %s"):format(pname, optional_param(info, pname) and "?" or "", ty)
    end
  end
  if info.isvararg then
    params[#params + 1] = "..."
    out[#out + 1] = "---@param ... any"
  end
  out[#out + 1] = "---@return any"
  out[#out + 1] = ("function %s%s%s(%s) end"):format(owner, method and ":" or ".", name, table.concat(params, ", "))
  out[#out + 1] = ""
end

local function class_stubs(out, classes)
  for _, c in ipairs(classes) do
    out[#out + 1] = "---@class " .. c.name
    for _, k in ipairs(c.keys) do out[#out + 1] = ("---@field %s? %s"):format(k, type_of(k)) end
    out[#out + 1] = ""
  end
end

-- A class (method table) of a module, such as phlox.Library, or a C
-- metatable phlox.<Type>.
local function class_block(out, cname, methods, classes)
  out[#out + 1] = "---@class " .. cname
  out[#out + 1] = cname .. " = {}"
  out[#out + 1] = ""
  for _, m in ipairs(sorted_keys(methods)) do
    if type(methods[m]) == "function" and not m:match("^__") then
      function_stub(out, cname, m, methods[m], true, classes)
    end
  end
end

local files = {}   -- relative path -> text
local listed = {}  -- "phlox.plot.map" -> true: every public function

for _, modname in ipairs(MODULES) do
  local mod = require(modname)
  local out, classes = {}, {}
  out[#out + 1] = "---@meta"
  out[#out + 1] = "-- Generated by tests/tools/lua_stubs.lua from the code; do not edit."
  out[#out + 1] = "-- " .. modname .. " (phlox " .. core.version .. ")"
  out[#out + 1] = ""
  out[#out + 1] = "---@class " .. modname
  local tables = {}
  for _, k in ipairs(sorted_keys(mod)) do
    local v = mod[k]
    if type(v) ~= "function" then
      local ty = lua_type(v)
      if modname == "phlox" and k == "core" then ty = "phlox.core" end
      if type(v) == "table" and rawget(v, "__index") == v then ty = modname .. "." .. k; tables[#tables + 1] = k end
      out[#out + 1] = ("---@field %s %s"):format(k, ty)
    end
  end
  local var = modname:gsub("%.", "_")
  out[#out + 1] = ("local %s = {}"):format(var)
  out[#out + 1] = ""
  local body = {}
  for _, k in ipairs(sorted_keys(mod)) do
    if type(mod[k]) == "function" then
      function_stub(body, var, k, mod[k], false, classes)
      listed[modname .. "." .. k] = true
    end
  end
  for _, k in ipairs(tables) do
    class_block(body, modname .. "." .. k, mod[k], classes)
    for m, f in pairs(mod[k]) do
      if type(f) == "function" and not m:match("^__") then listed[modname .. "." .. k .. ":" .. m] = true end
    end
  end
  if modname == "phlox.core" then -- the C types behind the core functions
    local reg = debug.getregistry()
    for _, tname in ipairs(sorted_keys(reg)) do
      local mt = reg[tname]
      if tname:match("^phlox%.%u") and type(mt) == "table" then
        local methods = type(mt.__index) == "table" and mt.__index or mt
        class_block(body, tname, methods, classes)
        for m, f in pairs(methods) do
          if type(f) == "function" and not m:match("^__") then listed[tname .. ":" .. m] = true end
        end
      end
    end
  end
  class_stubs(out, classes)
  for _, l in ipairs(body) do out[#out + 1] = l end
  out[#out + 1] = "return " .. var
  files[modname:gsub("%.", "/") .. ".lua"] = table.concat(out, "\n") .. "\n"
end

if not check then
  assert(core.make_dir(dir .. "/phlox", true))
  for _, rel in ipairs(sorted_keys(files)) do
    assert(core.write_atomic(dir .. "/" .. rel, files[rel]))
  end
  print(("wrote %d stub files for %d functions to %s"):format(#sorted_keys(files), #sorted_keys(listed), dir))
  return
end

-- --check: every public function has a stub in DIR, and DIR is current.
local problems = {}
local stubbed = {}
for rel in pairs(files) do
  local text = read(dir .. "/" .. rel)
  if not text then
    problems[#problems + 1] = "missing stub file " .. rel
  else
    local modname = rel:gsub("%.lua$", ""):gsub("/", ".")
    local var = modname:gsub("%.", "_")
    for owner, sep, name in text:gmatch("\nfunction ([%w_%.]+)([%.:])([%w_]+)%(") do
      local full = (owner == var and modname or owner) .. sep .. name
      stubbed[full] = true
    end
    if text ~= files[rel] then problems[#problems + 1] = "stale: " .. rel end
    local ok, err = load(text, "=" .. rel, "t", {})
    if not ok then problems[#problems + 1] = "not valid Lua: " .. err end
  end
end
for _, name in ipairs(sorted_keys(listed)) do
  if not stubbed[name] then table.insert(problems, 1, "no stub for " .. name) end
end
for _, name in ipairs(sorted_keys(stubbed)) do
  if not listed[name] then table.insert(problems, 1, "stub of a function that does not exist: " .. name) end
end
if #problems > 0 then
  error(table.concat(problems, "\n") .. "\nregenerate: ./build/phlox tests/tools/lua_stubs.lua docs/lua-stubs", 0)
end
print(("%d public functions, each with a current stub in %s"):format(#sorted_keys(listed), dir))
