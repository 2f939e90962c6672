--- phlox.palette: the colours of phlox figures, designed in CIE L*C*h
-- (lightness, chroma, hue angle) and converted to sRGB.
--
-- Design (our own):
--  * The kind of a field sets its hue family: dissolved (aqueous) fields are
--    blue, solids ochre, metals neutral grey, gases violet, liquids teal.
--    Blue against ochre stays distinct for the common colour-vision
--    deficiencies (they confuse red with green, which we never pair).
--  * Lightness is a separate cue: four tiers of L* (94, 84, 74, 64), and
--    neighbouring fields always get different tiers (a graph colouring of
--    the fields' adjacency), so a greyscale print still separates every pair
--    of neighbours by at least 10 units of L*.
--  * Lines are dark (L* <= 45) so they read over any fill; water lines and
--    the neutral-pH marker differ from boundaries by dash pattern too.
--
-- Formulas: CIE L*a*b* <-> XYZ (CIE 15:2004, section 8.2.1, D65 white
-- Xn = 0.95047, Yn = 1, Zn = 1.08883); XYZ <-> linear sRGB and the sRGB
-- transfer function (IEC 61966-2-1:1999, section 5.2 and 5.3, as in
-- Stokes et al. 1996, "A Standard Default Color Space for the Internet").
-- Colours are rounded to 8 bits (k/255) so a PNG pixel equals the fill.

local core = require "phlox.core"
local palette = {}

local XN, YN, ZN = 0.95047, 1.0, 1.08883       -- D65 reference white (CIE 15:2004)
local EPS = 216 / 24389                         -- (6/29)^3, CIE 15:2004
local KAPPA = 24389 / 27                        -- (29/3)^3, CIE 15:2004

-- sRGB transfer function (IEC 61966-2-1): linear <-> encoded
local function encode(c)
  if c <= 0.0031308 then return 12.92 * c end
  return 1.055 * c ^ (1 / 2.4) - 0.055
end
local function decode(v)
  if v <= 0.04045 then return v / 12.92 end
  return ((v + 0.055) / 1.055) ^ 2.4
end

--- CIE L*a*b* (D65) -> sRGB in 0..1 (not clipped) and whether it is in gamut.
function palette.lab_to_srgb(L, a, b)
  local fy = (L + 16) / 116
  local fx, fz = fy + a / 500, fy - b / 200
  local function finv(t)
    local t3 = t * t * t
    if t3 > EPS then return t3 end
    return (116 * t - 16) / KAPPA
  end
  local X, Y, Z = XN * finv(fx), YN * (L > KAPPA * EPS and fy ^ 3 or L / KAPPA), ZN * finv(fz)
  -- IEC 61966-2-1 XYZ -> linear sRGB matrix
  local rl = 3.2406 * X - 1.5372 * Y - 0.4986 * Z
  local gl = -0.9689 * X + 1.8758 * Y + 0.0415 * Z
  local bl = 0.0557 * X - 0.2040 * Y + 1.0570 * Z
  local inside = rl >= 0 and rl <= 1 and gl >= 0 and gl <= 1 and bl >= 0 and bl <= 1
  local function clip(c) return math.min(1, math.max(0, c)) end
  return encode(clip(rl)), encode(clip(gl)), encode(clip(bl)), inside
end

--- CIE L* (0..100) of an sRGB colour {r, g, b} in 0..1: relative luminance
-- Y from the linearised channels (IEC 61966-2-1 matrix, middle row), then
-- L* = 116 f(Y/Yn) - 16 (CIE 15:2004).
function palette.lightness(c)
  local Y = 0.2126 * decode(c[1]) + 0.7152 * decode(c[2]) + 0.0722 * decode(c[3])
  if Y > EPS then return 116 * Y ^ (1 / 3) - 16 end
  return KAPPA * Y
end

local function q8(v) return math.floor(v * 255 + 0.5) / 255 end

--- sRGB colour {r, g, b} (8-bit steps) for lightness L*, chroma C*, hue h
-- (degrees); chroma is reduced until the colour fits the sRGB gamut.
function palette.lch(L, C, h)
  local rad = math.rad(h)
  local lo, hi = 0, C
  local r, g, b, ok = palette.lab_to_srgb(L, C * math.cos(rad), C * math.sin(rad))
  if not ok then   -- bisect on chroma for the most saturated colour in gamut
    for _ = 1, 30 do
      local mid = (lo + hi) / 2
      local _, _, _, inside = palette.lab_to_srgb(L, mid * math.cos(rad), mid * math.sin(rad))
      if inside then lo = mid else hi = mid end
    end
    r, g, b = palette.lab_to_srgb(L, lo * math.cos(rad), lo * math.sin(rad))
  end
  return { q8(r), q8(g), q8(b) }
end

-- Field families: hue angle (degrees) and chroma of each kind of field.
-- `drift`: hue change per tier, so two fields of one kind in different
-- tiers also differ in hue (sky -> ultramarine, ochre -> rust).
palette.kinds = {
  aqueous = { hue = 250, chroma = 26, drift = 4,  name = "dissolved" },
  solid   = { hue = 78,  chroma = 34, drift = -5, name = "solid" },
  metal   = { hue = 265, chroma = 4,  drift = 0,  name = "metal" },
  gas     = { hue = 310, chroma = 24, drift = 4,  name = "gas" },
  liquid  = { hue = 192, chroma = 22, drift = -4, name = "liquid" },
}

--- Lightness tiers, lightest first; neighbours never share a tier.
palette.tiers = { 94, 84, 74, 64 }
palette.MIN_NEIGHBOUR_DL = 10   -- smallest L* step between tiers (design value)

--- Fill colour of a field of `kind` in lightness tier `tier` (1..4).
function palette.field(kind, tier)
  local k = palette.kinds[kind]
  if not k then error(("palette: unknown field kind '%s'"):format(tostring(kind)), 2) end
  local L = palette.tiers[tier]
  if not L then error(("palette: tier must be 1..%d"):format(#palette.tiers), 2) end
  return palette.lch(L, k.chroma, k.hue + k.drift * (tier - 1))
end

-- Lines and marks (all dark, so they read over every fill).
palette.ink = palette.lch(18, 2, 265)           -- boundaries, frame-like
palette.water = palette.lch(38, 40, 262)        -- water stability lines (dashed)
palette.neutral = palette.lch(45, 0, 0)         -- neutral pH at T (dotted)
palette.label = palette.lch(12, 0, 0)

-- Corrosion domains: fills far apart in lightness and hue; sulfide films
-- (not passivation: they do not protect against hydrogen uptake) a dull
-- olive between passivation and corrosion in lightness.
palette.domain = {
  immunity    = palette.lch(92, 10, 240),
  passivation = palette.lch(80, 30, 85),
  corrosion   = palette.lch(64, 32, 335),
  ["sulfide film"] = palette.lch(56, 28, 125),
}
palette.domain_ink = palette.lch(25, 10, 335)   -- hatching of overlaid domains

-- Series of lines (curves, overlaid maps): colour and dash both change, so
-- no entry depends on colour alone.
local SERIES = {
  { 35, 45, 262, "solid" }, { 55, 60, 60, "dashed" }, { 40, 45, 320, "dashdot" },
  { 50, 35, 190, "dotted" }, { 25, 0, 0, "dashed" }, { 50, 55, 25, "dashdot" },
  { 45, 40, 140, "solid" }, { 60, 50, 95, "dotted" },
}
palette.series = {}
for i, s in ipairs(SERIES) do
  palette.series[i] = { color = palette.lch(s[1], s[2], s[3]), dash = s[4] }
end

--- The i-th series style {color, dash} (cycles).
function palette.series_style(i)
  return palette.series[(i - 1) % #palette.series + 1]
end

-- Geometry for neighbour detection -------------------------------------

-- Is (px, py) within tol of the polygon's outline (the distance of
-- src/geom, phlox.core.polygon_distance)?
local function on_boundary(px, py, xs, ys, tol)
  return math.abs(core.polygon_distance(xs, ys, px, py)) <= tol
end

-- Do polygons A and B share a stretch of boundary (not just a corner)?
-- Counts edge midpoints and vertices of each lying on the other.
local function share_edge(A, B, tol)
  local hits = 0
  for _, P in ipairs({ { A, B }, { B, A } }) do
    local p, q = P[1], P[2]
    local n = #p.x
    for i = 1, n do
      local j = i % n + 1
      local mx, my = (p.x[i] + p.x[j]) / 2, (p.y[i] + p.y[j]) / 2
      local len = math.abs(p.x[j] - p.x[i]) + math.abs(p.y[j] - p.y[i])
      if len > tol and on_boundary(mx, my, q.x, q.y, tol) then return true end
      if on_boundary(p.x[i], p.y[i], q.x, q.y, tol) then hits = hits + 1 end
    end
  end
  return hits >= 3
end

--- Neighbour sets of the fields: adj[i][j] = true when fields i and j share
-- a boundary (listed in map.boundaries or found geometrically).
function palette.neighbours(fields, boundaries, xr, yr)
  local adj, index = {}, {}
  for i, f in ipairs(fields) do
    adj[i] = {}
    index[f.species] = i
  end
  for _, b in ipairs(boundaries or {}) do
    local i, j = index[b.between and b.between[1]], index[b.between and b.between[2]]
    if i and j and i ~= j then adj[i][j], adj[j][i] = true, true end
  end
  -- tolerance: a small fraction of the window, in each axis's units
  local scale = math.max(xr or 1, yr or 1)
  local tol = 1e-6 * scale
  for i = 1, #fields do
    for j = i + 1, #fields do
      if not adj[i][j] and share_edge(fields[i], fields[j], tol) then
        adj[i][j], adj[j][i] = true, true
      end
    end
  end
  return adj
end

--- Lightness tiers for fields given their neighbour sets: DSatur colouring
-- (Brelaz 1979, Comm. ACM 22, 251) with #palette.tiers colours, ties
-- broken by larger area, then name, so the result is deterministic and the
-- largest fields get the lightest tiers.  Returns tiers and the number of
-- neighbour pairs that had to share a tier (0 unless a map needs more than
-- four lightness tiers).
function palette.assign_tiers(fields, adj)
  local n, ntiers = #fields, #palette.tiers
  local tier, conflicts = {}, 0
  local function area(i) return fields[i].area or 0 end
  for _ = 1, n do
    local best, bsat, bdeg
    for i = 1, n do
      if not tier[i] then
        local seen, sat, deg = {}, 0, 0
        for j in pairs(adj[i]) do
          deg = deg + 1
          if tier[j] and not seen[tier[j]] then seen[tier[j]] = true; sat = sat + 1 end
        end
        local better = not best or sat > bsat or (sat == bsat and (deg > bdeg or (deg == bdeg and
          (area(i) > area(best) or (area(i) == area(best) and
            tostring(fields[i].species) < tostring(fields[best].species))))))
        if better then best, bsat, bdeg = i, sat, deg end
      end
    end
    local used = {}
    for j in pairs(adj[best]) do if tier[j] then used[tier[j]] = (used[tier[j]] or 0) + 1 end end
    local pick, fewest = nil, math.huge
    for t = 1, ntiers do
      if not used[t] then pick = t; break end
      if used[t] < fewest then pick, fewest = t, used[t] end
    end
    if used[pick] then conflicts = conflicts + used[pick] end
    tier[best] = pick
  end
  return tier, conflicts
end

--- Fill colours for a map's fields: { fills = {...}, tiers = {...},
-- neighbours = adj, conflicts = k }, in the order of map.fields.
function palette.map_fills(map)
  local fields = map.fields or {}
  local xr = map.x and (map.x.max - map.x.min) or 1
  local yr = map.y and (map.y.max - map.y.min) or 1
  local adj = palette.neighbours(fields, map.boundaries, math.abs(xr), math.abs(yr))
  local tiers, conflicts = palette.assign_tiers(fields, adj)
  local fills = {}
  for i, f in ipairs(fields) do fills[i] = palette.field(f.kind or "aqueous", tiers[i]) end
  return { fills = fills, tiers = tiers, neighbours = adj, conflicts = conflicts }
end

return palette
