--- phlox.plot.check: the argument checks of the figure functions.
--
-- Part of phlox.plot (stdlib/phlox/plot.lua draws; this file only checks).
-- Contract:
--   check.is_num(v)           true for a finite number (not NaN, not ±Inf)
--   check.check_map(map, where)
--                             checks a MAP TABLE (docs/figures.md): axes x
--                             and y with finite min < max, fields with a
--                             species name, a known kind and >= 3 finite
--                             points, boundaries (>= 2 points), domains
--                             (immunity, passivation, sulfide film or
--                             corrosion; >= 3 points), water lines (numbers
--                             a, b) and neutral_pH.  Returns the map; raises
--                             "<where>: <what is wrong>" at the level of
--                             the caller's caller (error level 3: the user's
--                             call of plot.map and friends).  Published as
--                             plot.check_map.
--   check.option_specs        the option specs of the drawing functions by
--                             name ("plot.map", "plot.domains", "plot.grid",
--                             "plot.overlay", "plot.curves"), one line per key
--                             with its type and range, as the one option
--                             reader (core.options, src/lua/l_opts.c) wants
--                             them; published as plot.option_specs.
--   check.read_opts(fname, spec, opts)
--                             opts read through core.options ({} for nil):
--                             an unknown key or a wrong type is an error at
--                             the user's script line.
-- No drawing, no text formatting, no state.
local core = require "phlox.core"

local check = {}

local KINDS = { aqueous = true, solid = true, gas = true, metal = true, liquid = true }
local DOMAIN_OK = { immunity = true, passivation = true, corrosion = true, ["sulfide film"] = true }

local function fail(where, msg) error(("%s: %s"):format(where, msg), 3) end

local function is_num(v) return type(v) == "number" and v == v and v ~= math.huge and v ~= -math.huge end
check.is_num = is_num

local function check_points(where, what, t, min_n)
  if type(t) ~= "table" or type(t.x) ~= "table" or type(t.y) ~= "table" then
    fail(where, what .. " needs x and y lists")
  end
  if #t.x ~= #t.y then fail(where, what .. ": x and y differ in length") end
  if #t.x < min_n then fail(where, ("%s: needs at least %d points"):format(what, min_n)) end
  for i = 1, #t.x do
    if not (is_num(t.x[i]) and is_num(t.y[i])) then
      fail(where, ("%s: point %d is not a pair of finite numbers"):format(what, i))
    end
  end
end

local function check_axis(where, name, a)
  if type(a) ~= "table" then fail(where, "map." .. name .. " must be a table") end
  if not (is_num(a.min) and is_num(a.max) and a.max > a.min) then
    fail(where, ("map.%s needs finite min < max"):format(name))
  end
end

--- Check a map table; raises an error naming the offending field.
function check.check_map(map, where)
  where = where or "plot"
  if type(map) ~= "table" then fail(where, "map must be a table") end
  check_axis(where, "x", map.x)
  check_axis(where, "y", map.y)
  if type(map.fields) ~= "table" then fail(where, "map.fields must be a list") end
  for i, f in ipairs(map.fields) do
    local what = ("map.fields[%d]"):format(i)
    if type(f.species) ~= "string" then fail(where, what .. ".species must be a string") end
    if f.kind ~= nil and not KINDS[f.kind] then
      fail(where, ("%s.kind '%s' is not aqueous, solid, gas, metal or liquid"):format(what, tostring(f.kind)))
    end
    check_points(where, what, f, 3)
  end
  for i, b in ipairs(map.boundaries or {}) do check_points(where, ("map.boundaries[%d]"):format(i), b, 2) end
  for i, d in ipairs(map.domains or {}) do
    local what = ("map.domains[%d]"):format(i)
    if not DOMAIN_OK[d.domain] then
      fail(where, what .. ".domain must be immunity, passivation, sulfide film or corrosion")
    end
    check_points(where, what, d, 3)
  end
  if map.water ~= nil then
    for _, k in ipairs({ "o2", "h2" }) do
      local w = map.water[k]
      if w ~= nil and not (is_num(w.a) and is_num(w.b)) then
        fail(where, ("map.water.%s needs numbers a and b (E = a + b pH)"):format(k))
      end
    end
  end
  if map.neutral_pH ~= nil and not is_num(map.neutral_pH) then fail(where, "map.neutral_pH must be a number") end
  return map
end

-- Options of the drawing functions (the one reader, src/lua/l_opts.c):
-- one line per key; plot.map's keys are shared by domains, grid and overlay.
local FIG_OPTS = {
  file = "string",                        -- .png, .svg or .pdf
  title = "string",
  width = { "number", 50, 20000 },        -- points (figure.c limits)
  height = { "number", 50, 20000 },
  dpi = { "number", 10, 2400 },           -- PNG only
  conditions = "table",                   -- stamped under the figure
  preset = "string",                      -- one of plot.presets (column, double, slide, page)
  stamp = "boolean/full|short/strings",   -- what the figure shows ("full", "short", false) or extra lines
  notes = "table",                        -- extra stamp lines (strings, or records of phlox notes)
  from = "table",                         -- the result(s) drawn: their own data files and caveats are stamped
  no_script = "boolean",                  -- leave the script's name off the stamp
  legend = "boolean",
  replace = "boolean",                    -- also replace a symbolic link or a read-only file
}
local MAP_OPTS = {
  labels = "boolean",                     -- field labels
  water = "boolean",                      -- water stability lines
  domains = "boolean/hatch|tint",         -- corrosion domains overlay
  reference = "table/string",             -- E axis against this electrode: a name (as phlox.to_she) or {name, offset}
  reference_at_25C = "boolean",           -- the electrode is kept at room temperature
}
local MULTI_OPTS = {
  cols = { "integer", 1, 64 },
  pages = "boolean",                      -- one page per map (PDF)
  shared = "boolean",                     -- one window for all maps
  shared_fills = "boolean",               -- one colour per species across maps
  labels_of = "integer/boolean",          -- overlay: whose labels are shown
  legend_label = "function",              -- function(map, i) -> legend text
  panel_title = "function",               -- function(map, i) -> panel title
  x = "table", y = "table",               -- axis overrides
}
check.option_specs = {}
local function opts_spec(fname, ...)
  local t = {}
  for _, part in ipairs { FIG_OPTS, ... } do for k, v in pairs(part) do t[k] = v end end
  check.option_specs[fname] = t
  return t
end
opts_spec("plot.map", MAP_OPTS)
opts_spec("plot.domains", MAP_OPTS)
opts_spec("plot.grid", MAP_OPTS, MULTI_OPTS)
opts_spec("plot.overlay", MAP_OPTS, MULTI_OPTS)
opts_spec("plot.curves", { x = "table", y = "table" })

function check.read_opts(fname, spec, opts)
  if opts == nil then return {} end
  return core.options(fname, spec, opts)
end

return check
