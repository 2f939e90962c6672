--- phlox.plot.geometry: where things are on a figure's axes.
--
-- Part of phlox.plot (stdlib/phlox/plot.lua draws; this file answers the
-- questions about coordinates it needs).  Where labels go is not here:
-- the renderer (src/render) places every label once and fig:layout()
-- reports it; polygon geometry proper (areas, point in polygon, distances)
-- is src/geom, through phlox.core.
-- Contract (pure functions, no drawing):
--   geometry.shifted(ys, offset)      ys − offset (the same table for 0)
--   geometry.window_of(map, ref)      {x0, x1, y0, y1}: the map's window on
--                                     the displayed potential scale
--   geometry.union_window(maps, ref)  the union of several maps' windows
--   geometry.domains_of(map)          the corrosion domains {domain, x, y}
--                                     of a map, and whether they were
--                                     derived: map.domains as given, else
--                                     field by field by the map core's rule
--                                     (core.domain_of, src/diagram/emap.c),
--                                     a hand-made field by its kind
--                                     (plot.domains_of)
--   geometry.range_of(series, key, log, pad_frac)
--                                     lo, hi of the drawable values of a
--                                     curve plot's axis (whole decades on a
--                                     log axis), or nil
--   geometry.runs(xs, ys, xlog, ylog) the runs of consecutive drawable
--                                     points (finite, > 0 on a log axis)
local core = require "phlox.core"
local is_num = require("phlox.plot.check").is_num

local geometry = {}

local function shifted(ys, offset)
  if offset == 0 then return ys end
  local out = {}
  for i, v in ipairs(ys) do out[i] = v - offset end
  return out
end

local function window_of(map, ref)
  return { x0 = map.x.min, x1 = map.x.max, y0 = map.y.min - ref.offset, y1 = map.y.max - ref.offset }
end

-- Union of the maps' windows (shared axis ranges).
local function union_window(maps, ref)
  local w
  for _, m in ipairs(maps) do
    local v = window_of(m, ref)
    if not w then
      w = v
    else
      w = { x0 = math.min(w.x0, v.x0), x1 = math.max(w.x1, v.x1),
            y0 = math.min(w.y0, v.y0), y1 = math.max(w.y1, v.y1) }
    end
  end
  return w
end

-- Domains: given, or derived field by field when absent, by the rule of
-- the map core (core.domain_of, src/diagram/emap.c): the element itself ->
-- immunity; a metal sulfide -> sulfide film; other solids and liquids ->
-- passivation; dissolved and gas -> corrosion.  A field whose species is
-- not a formula (a hand-made table) goes by its kind: metal -> immunity,
-- solid or liquid -> passivation, else corrosion.
local KIND_DOMAIN = { metal = "immunity", solid = "passivation", liquid = "passivation" }
local function domain_of_field(map, f)
  if f.domain then return f.domain end
  if map.element then
    local ok, d = pcall(core.domain_of, f.species, map.element)
    if ok then return d end
  end
  return KIND_DOMAIN[f.kind] or "corrosion"
end

function geometry.domains_of(map)
  if map.domains then return map.domains, false end
  local out = {}
  for _, f in ipairs(map.fields) do
    out[#out + 1] = { domain = domain_of_field(map, f), x = f.x, y = f.y }
  end
  return out, true
end

local function range_of(series, key, log, pad_frac)
  local lo, hi = math.huge, -math.huge
  for _, s in ipairs(series) do
    for _, v in ipairs(s[key]) do
      if is_num(v) and (not log or v > 0) then lo, hi = math.min(lo, v), math.max(hi, v) end
    end
  end
  if lo > hi then return nil end
  if lo == hi then
    if log then return lo / 10, hi * 10 end
    return lo - 1, hi + 1
  end
  if log then   -- whole decades
    return 10 ^ math.floor(math.log(lo, 10) + 1e-9), 10 ^ math.ceil(math.log(hi, 10) - 1e-9)
  end
  local pad = (pad_frac or 0) * (hi - lo)
  return lo - pad, hi + pad
end

-- Runs of consecutive drawable points (finite, and > 0 on a log axis).
local function runs(xs, ys, xlog, ylog)
  local out, cx, cy = {}, {}, {}
  local function flush()
    if #cx >= 2 then out[#out + 1] = { cx, cy } end
    cx, cy = {}, {}
  end
  for i = 1, #xs do
    local x, y = xs[i], ys[i]
    if is_num(x) and is_num(y) and (not xlog or x > 0) and (not ylog or y > 0) then
      cx[#cx + 1], cy[#cy + 1] = x, y
    else
      flush()
    end
  end
  flush()
  return out
end

geometry.shifted, geometry.window_of, geometry.union_window = shifted, window_of, union_window
geometry.range_of, geometry.runs = range_of, runs

return geometry
