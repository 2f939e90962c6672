--- phlox.json: a deterministic JSON encoder for exported results.
-- Object keys are sorted; numbers use the shortest %.Ng (N = 15..17) that
-- reads back to the same double, so equal inputs give byte-equal files.
-- NaN and infinities have no JSON form and raise an error naming the path.
local json = {}

local escapes = {
  ['"'] = '\\"', ['\\'] = '\\\\', ['\b'] = '\\b', ['\f'] = '\\f',
  ['\n'] = '\\n', ['\r'] = '\\r', ['\t'] = '\\t',
}

local function encode_string(s)
  return '"' .. s:gsub('[%c"\\]', function(c)
    return escapes[c] or string.format("\\u%04x", c:byte())
  end) .. '"'
end

--- Shortest decimal text that reads back to the same double.
function json.number(x, path)
  if x ~= x or x == math.huge or x == -math.huge then
    error(("json: non-finite number at %s"):format(path or "?"), 0)
  end
  if math.type(x) == "integer" then return string.format("%d", x) end
  if x == math.floor(x) and math.abs(x) < 2^53 then return string.format("%.1f", x) end
  for digits = 15, 17 do
    local s = string.format("%." .. digits .. "g", x)
    if tonumber(s) == x then return s end
  end
  return string.format("%.17g", x)
end

local function is_array(t)
  local n = #t
  local count = 0
  for _ in pairs(t) do count = count + 1 end
  return count == n, n
end

local function encode(v, indent, depth, path, out, open)
  local tv = type(v)
  if v == nil or v == json.null then
    out[#out + 1] = "null"
  elseif tv == "boolean" then
    out[#out + 1] = tostring(v)
  elseif tv == "number" then
    out[#out + 1] = json.number(v, path)
  elseif tv == "string" then
    out[#out + 1] = encode_string(v)
  elseif tv == "table" then
    -- a table that contains itself would never finish: an error naming both places
    if open[v] then error(("json: cycle: %s contains %s again"):format(path, open[v]), 0) end
    open[v] = path
    local arr, n = is_array(v)
    local nl = indent and ("\n" .. string.rep(indent, depth + 1)) or ""
    local close = indent and ("\n" .. string.rep(indent, depth)) or ""
    if arr and (n > 0 or next(v) == nil and getmetatable(v) ~= json.object_mt) then
      out[#out + 1] = "["
      for i = 1, n do
        if i > 1 then out[#out + 1] = "," end
        out[#out + 1] = nl
        encode(v[i], indent, depth + 1, path .. "[" .. i .. "]", out, open)
      end
      out[#out + 1] = (n > 0 and close or "") .. "]"
    else
      local keys = {}
      for k in pairs(v) do
        if type(k) ~= "string" then
          error(("json: non-string key %s at %s"):format(tostring(k), path), 0)
        end
        keys[#keys + 1] = k
      end
      table.sort(keys)
      out[#out + 1] = "{"
      for i, k in ipairs(keys) do
        if i > 1 then out[#out + 1] = "," end
        out[#out + 1] = nl .. encode_string(k) .. (indent and ": " or ":")
        encode(v[k], indent, depth + 1, path .. "." .. k, out, open)
      end
      out[#out + 1] = (#keys > 0 and close or "") .. "}"
    end
    open[v] = nil
  else
    error(("json: cannot encode a %s at %s"):format(tv, path), 0)
  end
end

json.null = setmetatable({}, { __tostring = function() return "null" end })
json.object_mt = {}

--- An empty table that encodes as {} rather than [].
function json.object(t) return setmetatable(t or {}, json.object_mt) end

--- Encode a value; opts.indent (string) pretty-prints.
function json.encode(v, opts)
  local out = {}
  encode(v, opts and opts.indent, 0, "$", out, {})
  return table.concat(out)
end

return json
