-- tests/support/json.lua: a JSON reader (RFC 8259) for the tests, so they
-- check what phlox writes by its structure instead of by text patterns.
--   J.decode(text) -> value      objects and arrays become tables (arrays
--                                1-based), null becomes J.null, numbers Lua
--                                numbers; malformed text is an error naming
--                                the byte offset
-- Plain Lua 5.4.
local M = {}
M.null = setmetatable({}, { __tostring = function() return "null" end })

local ESC = { ['"'] = '"', ["\\"] = "\\", ["/"] = "/", b = "\b", f = "\f", n = "\n", r = "\r", t = "\t" }

function M.decode(text)
  local pos = 1
  local function fail(msg) error(("JSON at byte %d: %s"):format(pos, msg), 0) end
  local function ws() pos = text:find("[^ \t\r\n]", pos) or (#text + 1) end
  local value
  local function str()
    pos = pos + 1 -- opening quote
    local buf = {}
    while true do
      local c = text:sub(pos, pos)
      if c == "" then fail("unterminated string") end
      if c == '"' then pos = pos + 1; return table.concat(buf) end
      if c:byte() < 0x20 then fail("control character in a string") end
      if c == "\\" then
        local e = text:sub(pos + 1, pos + 1)
        if ESC[e] then buf[#buf + 1] = ESC[e]; pos = pos + 2
        elseif e == "u" then
          local hex = text:match("^%x%x%x%x", pos + 2) or fail("bad \\u escape")
          local cp = tonumber(hex, 16)
          pos = pos + 6
          if cp >= 0xD800 and cp <= 0xDBFF then -- a surrogate pair (RFC 8259 sec. 7)
            local lo = text:match("^\\u(%x%x%x%x)", pos)
            local l = lo and tonumber(lo, 16)
            if not (l and l >= 0xDC00 and l <= 0xDFFF) then fail("lone surrogate") end
            cp = 0x10000 + (cp - 0xD800) * 0x400 + (l - 0xDC00)
            pos = pos + 6
          end
          buf[#buf + 1] = utf8.char(cp)
        else fail("bad escape") end
      else buf[#buf + 1] = c; pos = pos + 1 end
    end
  end
  -- the members of an object or array, after its opening bracket
  local function items(close, member)
    local t = {}
    pos = pos + 1
    ws()
    if text:sub(pos, pos) == close then pos = pos + 1; return t end
    while true do
      member(t)
      ws()
      local d = text:sub(pos, pos)
      if d == close then pos = pos + 1; return t end
      if d ~= "," then fail("',' or '" .. close .. "' expected") end
      pos = pos + 1
    end
  end
  local function member(t)
    ws()
    if text:sub(pos, pos) ~= '"' then fail("object key expected") end
    local k = str()
    ws()
    if text:sub(pos, pos) ~= ":" then fail("':' expected") end
    pos = pos + 1
    t[k] = value()
  end
  local function element(t) t[#t + 1] = value() end
  function value()
    ws()
    local c = text:sub(pos, pos)
    if c == "{" then return items("}", member)
    elseif c == "[" then return items("]", element)
    elseif c == '"' then return str()
    elseif text:find("^true", pos) then pos = pos + 4; return true
    elseif text:find("^false", pos) then pos = pos + 5; return false
    elseif text:find("^null", pos) then pos = pos + 4; return M.null
    else
      local num = text:match("^-?%d+%.?%d*[eE]?[-+]?%d*", pos)
      if not num or not num:match("^-?0[%.eE]") and num:match("^-?0%d") or not tonumber(num) then
        fail("value expected")
      end
      pos = pos + #num
      return tonumber(num)
    end
  end
  local v = value()
  ws()
  if pos <= #text then fail("text after the value") end
  return v
end

return M
