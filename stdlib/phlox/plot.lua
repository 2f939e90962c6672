--- phlox.plot: publication figures from plain Lua tables.
--
-- Draws predominance maps (potential-pH and other two-variable maps),
-- corrosion-domain maps, curve plots (fractions, solubility), multi-panel
-- grids and overlays of several maps, through the figure renderer of
-- phlox.core (cairo; PNG, SVG or PDF by file extension).  It knows nothing
-- of the chemistry code: everything comes in a MAP TABLE (see
-- docs/figures.md for the format) or a list of series.
--
--   local plot = require "phlox.plot"
--   plot.map(map, { file = "Fe.pdf" })
--
-- Every figure carries a stamp: the conditions, the program version, the
-- checksums of the data files (phlox.provenance) and the safety caution.
--
-- Contract (each returns the phlox.Figure, saved when opts.file is given;
-- misuse is an error at the user's call; options are read by the one
-- option reader, plot.option_specs):
--   plot.map(map, opts)        a predominance map; also returns its fills
--   plot.domains(map, opts)    its corrosion domains as a figure of their own
--   plot.curves(series, opts)  curve plots (fractions, solubility, ...)
--   plot.grid(maps, opts)      several maps as panels on shared axes
--   plot.overlay(maps, opts)   the boundaries of several maps on one plot
--   plot.shared_fills(maps)    one fill per species across several maps
--   plot.look(opts)            size, text and line scales, stamp mode
--   plot.presets, plot.defaults, plot.grid_min_panel
--
-- The module is split by concern; each part states its contract at its top:
--   stdlib/phlox/plot.lua           drawing: maps, domains, curves, grids,
--                                   overlays (this file), presets and looks
--   stdlib/phlox/plot/check.lua     argument checks and option specs
--   stdlib/phlox/plot/text.lua      numbers, titles, the potential scale
--   stdlib/phlox/plot/stamp.lua     the stamp and the file's metadata
--   stdlib/phlox/plot/geometry.lua  windows, domains, curve ranges
-- Their public functions are published here under their old names
-- (plot.check_map, plot.number, plot.formulas, plot.map_title,
-- plot.stamp_lines, plot.stamp_short, plot.domains_of, plot.option_specs,
-- plot.caution).
local core = require "phlox.core"
local palette = require "phlox.palette"
local check = require "phlox.plot.check"
local text = require "phlox.plot.text"
local stamp = require "phlox.plot.stamp"
local geometry = require "phlox.plot.geometry"

local plot = {}

plot.caution = stamp.caution

plot.defaults = {
  width = 396, height = 324,     -- points: 5.5 x 4.5 in, a report column
  dpi = 150,                     -- PNG only
}

--- Figure presets: size in points, text and line scales, and the stamp
-- printed by default (the full provenance always goes into the file's
-- metadata).  Sizes are common practice for the targets (no source): a
-- journal column is about 3.3 in wide, a double column about 7 in, a 16:9
-- slide 10 x 5.625 in, a report page's text block about 6.5 in.
plot.presets = {
  column = { width = 240, height = 200, text = 0.85, line = 0.85, stamp = "short" },
  double = { width = 504, height = 360, text = 1.0, line = 1.0, stamp = "short" },
  slide = { width = 720, height = 405, text = 1.6, line = 1.6, stamp = "short", fixed = true },
  page = { width = 468, height = 351, text = 1.0, line = 1.0, stamp = "short" },
}

local LINE_BOUNDARY = 0.9        -- line widths, points (times the line scale)
local LINE_WATER = 1.0
local LINE_NEUTRAL = 0.8
local SMALL_TEXT = 7.0           -- water-line and neutral-pH labels (times the text scale)
local WATER_LABEL_AT = 0.88      -- water-line labels near the right end of their line
local NEUTRAL_LABEL_AT = 0.04    -- the neutral-pH label near the foot of its line
local DOMAINS = { "immunity", "passivation", "sulfide film", "corrosion" }

-- Parts published under their old names -----------------------------------

plot.check_map = check.check_map
plot.option_specs = check.option_specs
plot.number, plot.formulas, plot.map_title = text.number, text.formulas, text.map_title
plot.stamp_lines, plot.stamp_short = stamp.stamp_lines, stamp.stamp_short
plot.domains_of = geometry.domains_of

local is_num, read_opts = check.is_num, check.read_opts
local fmt_T, fmt_Ts, celsius = text.fmt_T, text.fmt_Ts, text.celsius
local axis_name, is_pH, reference = text.axis_name, text.is_pH, text.reference
local x_title, y_title, fixed_text = text.x_title, text.y_title, text.fixed_text
local apply_stamp, map_notes, add_reference = stamp.apply_stamp, stamp.map_notes, stamp.add_reference
local shifted, window_of, union_window = geometry.shifted, geometry.window_of, geometry.union_window
local range_of, runs = geometry.range_of, geometry.runs

-- Where labels go is the renderer's business (src/render/labels.c places
-- every label once and fig:layout() reports it); this module only says
-- what to draw.

-- Hatching of overlaid domains: corrosion dense at 45°, passivation
-- sparse at -45°, sulfide film horizontal, immunity bare.
local DOMAIN_HATCH = {
  corrosion = { spacing = 3.5, angle = 45, width = 0.5 },
  passivation = { spacing = 6, angle = -45, width = 0.4 },
  ["sulfide film"] = { spacing = 4.5, angle = 0, width = 0.5 },
}

-- Drawing a map into a panel -------------------------------------------------

local function draw_water(fig, panel, map, win, ref, style, labelled, look)
  if not (map.water and is_pH(map.x)) then return end
  local lines = {
    { map.water.o2, "O2/H2O" },
    { map.water.h2, "H2O/H2" },
  }
  for _, l in ipairs(lines) do
    local w = l[1]
    if w then
      local function E(x) return w.a + w.b * x - ref.offset end
      local xs, ys = { win.x0, win.x1 }, { E(win.x0), E(win.x1) }
      fig:line(panel, xs, ys, style.color, style.width, style.dash, style.legend)
      if labelled then   -- along the line, placed by the renderer
        fig:line_label(panel, xs, ys, l[2], true, SMALL_TEXT * look.text, style.color, WATER_LABEL_AT)
      end
    end
  end
end

local function draw_neutral(fig, panel, map, win, look)
  local n = map.neutral_pH
  if not (n and is_pH(map.x) and n > win.x0 and n < win.x1) then return end
  local xs, ys = { n, n }, { win.y0, win.y1 }
  fig:line(panel, xs, ys, palette.neutral, LINE_NEUTRAL * look.line, "dotted")
  local t = fmt_T(celsius(map))
  local label = ("neutral pH %.2f%s"):format(n, t and (" at " .. t) or "")
  fig:line_label(panel, xs, ys, label, false, SMALL_TEXT * look.text, palette.neutral, NEUTRAL_LABEL_AT,
                 ("pH %.2f"):format(n))
end

local function draw_domain_overlay(fig, panel, map, ref, mode)
  local domains = plot.domains_of(map)
  local present = {}
  for _, d in ipairs(domains) do
    local ys = shifted(d.y, ref.offset)
    present[d.domain] = true
    if mode == "tint" then
      local c = palette.domain[d.domain]
      fig:polygon(panel, d.x, ys, { c[1], c[2], c[3], 0.45 }, palette.domain_ink, 0)
    else
      local h = DOMAIN_HATCH[d.domain]
      if h then fig:hatch(panel, d.x, ys, palette.domain_ink, h.width, h.spacing, h.angle) end
    end
  end
  for _, name in ipairs(DOMAINS) do
    if present[name] then
      if mode == "tint" then
        local c = palette.domain[name]
        fig:legend_patch(panel, name, { c[1], c[2], c[3], 0.45 }, palette.domain_ink)
      else
        local h = DOMAIN_HATCH[name]
        fig:legend_patch(panel, name, { 1, 1, 1 }, palette.domain_ink, h and h.spacing or 0,
                         h and h.angle or 0)
      end
    end
  end
  fig:legend(panel, "outside")
end

-- Fields, boundaries, water, neutral pH and (optionally) domains of one map.
local function draw_map(fig, panel, map, opts, win, ref, look, fills)
  fills = fills or palette.map_fills(map)
  local outline = (map.boundaries == nil or #map.boundaries == 0) and LINE_BOUNDARY * look.line or 0
  for i, f in ipairs(map.fields) do
    local label = f.species
    if opts.labels == false or f.label == false then label = nil end
    fig:polygon(panel, f.x, shifted(f.y, ref.offset), fills.fills[i], palette.ink, outline, label)
  end
  if opts.domains then draw_domain_overlay(fig, panel, map, ref, opts.domains == true and "hatch" or opts.domains) end
  for _, b in ipairs(map.boundaries or {}) do
    fig:line(panel, b.x, shifted(b.y, ref.offset), palette.ink, LINE_BOUNDARY * look.line, "solid")
  end
  draw_neutral(fig, panel, map, win, look)
  draw_water(fig, panel, map, win, ref,
             { color = palette.water, width = LINE_WATER * look.line, dash = "dashed" }, true, look)
  return fills
end

local function finish(fig, opts, d)
  if opts.pages then fig:pages(true) end
  if opts.file then
    local ok, err = fig:save(opts.file, opts.dpi or d.dpi, opts.replace)
    if not ok then error("plot: " .. err, 3) end
  end
  return fig
end

--- The look of a figure from its options: size, text and line scales,
-- stamp mode.  opts.preset names one of plot.presets; width and height
-- override its size.
function plot.look(opts)
  opts = opts or {}
  local pr = { width = plot.defaults.width, height = plot.defaults.height, text = 1, line = 1, stamp = "full" }
  if opts.preset ~= nil then
    local p = plot.presets[opts.preset]
    if not p then
      local names = {}
      for k in pairs(plot.presets) do names[#names + 1] = k end
      table.sort(names)
      error(("plot: opts.preset '%s' is not one of %s"):format(tostring(opts.preset), table.concat(names, ", ")), 3)
    end
    pr = { width = p.width, height = p.height, text = p.text, line = p.line, stamp = p.stamp,
           fixed = p.fixed, name = opts.preset }
  end
  local st = opts.stamp
  if not (st == nil or st == false or st == "full" or st == "short" or type(st) == "table") then
    error("plot: opts.stamp must be \"full\", \"short\", false or a list of extra lines", 3)
  end
  local w, h = opts.width or pr.width, opts.height or pr.height
  if not (is_num(w) and is_num(h) and w >= 50 and h >= 50) then
    error("plot: opts.width and opts.height are in points (>= 50)", 3)
  end
  pr.width, pr.height = w, h
  return pr
end

local function new_figure(look, rows, cols)
  local fig = core.figure(look.width, look.height, rows or 1, cols or 1)
  fig:scale(look.text, look.line)
  return fig
end

local PLOT_MAP_OPTS = check.option_specs["plot.map"]
local PLOT_DOMAINS_OPTS = check.option_specs["plot.domains"]
local PLOT_GRID_OPTS = check.option_specs["plot.grid"]
local PLOT_OVERLAY_OPTS = check.option_specs["plot.overlay"]
local PLOT_CURVES_OPTS = check.option_specs["plot.curves"]

--- A predominance map as a figure.
-- opts: file (".png", ".svg", ".pdf"), preset ("column", "double",
-- "slide", "page"; see plot.presets), width, height (points), dpi,
-- reference = { name = "SCE", offset = 0.241 }, title, domains = "hatch" |
-- "tint" (overlay of corrosion domains), labels = false, stamp = "full" |
-- "short" | false (what the figure shows; the file's metadata always holds
-- the full provenance), notes (extra stamp lines).  Returns the
-- phlox.Figure and the fill table (fills, tiers).
function plot.map(map, opts)
  opts = read_opts("plot.map", PLOT_MAP_OPTS, opts)
  plot.check_map(map, "plot.map")
  if opts.domains ~= nil and opts.domains ~= false and opts.domains ~= true and opts.domains ~= "hatch" and opts.domains ~= "tint" then
    error("plot.map: opts.domains must be \"hatch\" or \"tint\"", 2)
  end
  local ref = reference(opts, map)
  local look = plot.look(opts)
  local fig = new_figure(look)
  local win = window_of(map, ref)
  fig:axes(1, win.x0, win.x1, win.y0, win.y1)
  local title = opts.title or plot.map_title(map)
  fig:titles(1, x_title(map), y_title(map, ref), title)
  local fills = draw_map(fig, 1, map, opts, win, ref, look)
  local extra = {}
  map_notes(extra, map)
  add_reference(extra, ref)
  if fills.conflicts > 0 then
    extra[#extra + 1] = ("note: %d pairs of neighbouring fields share a lightness tier"):format(fills.conflicts)
  end
  apply_stamp(fig, opts, map.conditions, extra, title, look.width, look, map)
  return finish(fig, opts, plot.defaults), fills
end

--- Corrosion domains (immunity, passivation, corrosion) as a figure of
-- their own, with the field boundaries thin on top, water lines, neutral
-- pH and a legend.  Uses map.domains, or derives them from the field kinds
-- (see plot.domains_of).  opts as plot.map.
function plot.domains(map, opts)
  opts = read_opts("plot.domains", PLOT_DOMAINS_OPTS, opts)
  plot.check_map(map, "plot.domains")
  local ref = reference(opts, map)
  local look = plot.look(opts)
  local fig = new_figure(look)
  local win = window_of(map, ref)
  fig:axes(1, win.x0, win.x1, win.y0, win.y1)
  local title = opts.title or (plot.map_title(map):gsub("^(.-H2O})", "%1 corrosion domains", 1))
  fig:titles(1, x_title(map), y_title(map, ref), title)
  local domains, derived = plot.domains_of(map)
  local present = {}
  for _, d in ipairs(domains) do
    fig:polygon(1, d.x, shifted(d.y, ref.offset), palette.domain[d.domain], palette.ink, 0)
    present[d.domain] = true
  end
  for _, b in ipairs(map.boundaries or {}) do
    fig:line(1, b.x, shifted(b.y, ref.offset), palette.ink, 0.5 * look.line, "solid")
  end
  if opts.labels ~= false then   -- species names, small, over the domains
    for _, f in ipairs(map.fields) do
      fig:polygon(1, f.x, shifted(f.y, ref.offset), { 1, 1, 1, 0 }, palette.ink, 0, f.species)
    end
  end
  draw_neutral(fig, 1, map, win, look)
  draw_water(fig, 1, map, win, ref, { color = palette.water, width = LINE_WATER * look.line, dash = "dashed" }, true, look)
  for _, name in ipairs(DOMAINS) do
    if present[name] then fig:legend_patch(1, name, palette.domain[name], palette.ink) end
  end
  fig:legend(1, opts.legend or "outside")
  local extra = {}
  map_notes(extra, map)
  if derived then
    extra[#extra + 1] = { full = "domains from field kinds: metal = immunity, metal sulfide = sulfide film, "
      .. "other solid = passivation, dissolved or gas = corrosion", short = "domains from field kinds" }
  end
  add_reference(extra, ref)
  apply_stamp(fig, opts, map.conditions, extra, title, look.width, look, map)
  return finish(fig, opts, plot.defaults)
end

-- Curves ---------------------------------------------------------------------

local function legend_text(label, chem)
  if chem == false or label:find("[%s{]") then return label end
  return "{" .. label .. "}"
end

--- Curve plots (fractions, solubility, ...).
-- series = { { x = {...}, y = {...}, label = "Fe^2+", style = "solid" |
-- "dashed" | "dotted" | "dashdot", color = {r,g,b}, width = 1.2,
-- chem = false }, ... }.  Labels without spaces are set as formulas.
-- opts: x = { name, unit, min, max, log }, y = { ... }, title, legend =
-- "outside" (default) | "top right" | ... | false, conditions, file,
-- preset, width, height, dpi, stamp = "full" | "short" | false (or a list
-- of extra lines), notes (extra stamp lines), from (the results drawn:
-- their own data files are stamped).
function plot.curves(series, opts)
  opts = read_opts("plot.curves", PLOT_CURVES_OPTS, opts)
  if type(series) ~= "table" or #series == 0 then error("plot.curves: series must be a non-empty list", 2) end
  local ox, oy = opts.x or {}, opts.y or {}
  for i, s in ipairs(series) do
    if type(s.x) ~= "table" or type(s.y) ~= "table" or #s.x ~= #s.y then
      error(("plot.curves: series[%d] needs x and y lists of equal length"):format(i), 2)
    end
  end
  local x0, x1 = ox.min, ox.max
  if not (x0 and x1) then
    local a, b = range_of(series, "x", ox.log)
    if not a then error("plot.curves: no drawable x values", 2) end
    x0, x1 = x0 or a, x1 or b
  end
  local y0, y1 = oy.min, oy.max
  if not (y0 and y1) then
    local a, b = range_of(series, "y", oy.log, 0.03)
    if not a then error("plot.curves: no drawable y values (all <= 0 on a log axis?)", 2) end
    y0, y1 = y0 or a, y1 or b
  end
  local look = plot.look(opts)
  local fig = new_figure(look)
  fig:axes(1, x0, x1, y0, y1, ox.log, oy.log)
  local function title_of(a, default)
    local n = axis_name(a.name or default)
    if a.unit and a.unit ~= "" then n = n .. " / " .. a.unit end
    return n
  end
  fig:titles(1, title_of(ox, "x"), title_of(oy, "y"), opts.title)
  for i, s in ipairs(series) do
    local st = palette.series_style(i)
    local color, dash, width = s.color or st.color, s.style or st.dash, (s.width or 1.2) * look.line
    local legend = s.label and legend_text(s.label, s.chem) or nil
    for k, r in ipairs(runs(s.x, s.y, ox.log, oy.log)) do
      fig:line(1, r[1], r[2], color, width, dash, k == 1 and opts.legend ~= false and legend or nil)
    end
  end
  if opts.legend ~= false then fig:legend(1, opts.legend or "outside") end
  apply_stamp(fig, opts, opts.conditions, nil, opts.title, look.width, look)
  return finish(fig, opts, plot.defaults)
end

-- Grids and overlays ------------------------------------------------------------

--- Fills shared by several maps: one lightness tier per species across all
-- of them, so a species keeps its colour from panel to panel.  The
-- neighbour graph is the union of the maps' graphs (species by name).
-- Returns a list of fill tables (as palette.map_fills gives), one per map.
function plot.shared_fills(maps)
  local all, index, adj = {}, {}, {}
  for _, m in ipairs(maps) do
    for _, f in ipairs(m.fields) do
      local k = index[f.species]
      if not k then
        all[#all + 1] = { species = f.species, kind = f.kind, area = 0 }
        k = #all
        index[f.species], adj[k] = k, {}
      end
      all[k].area = all[k].area + (f.area or 0)
    end
  end
  local per_map = {}
  for mi, m in ipairs(maps) do
    local fills = palette.map_fills(m)
    for i, nb in pairs(fills.neighbours) do
      for j in pairs(nb) do
        local a, b = index[m.fields[i].species], index[m.fields[j].species]
        if a ~= b then adj[a][b], adj[b][a] = true, true end
      end
    end
    per_map[mi] = fills
  end
  local tiers, conflicts = palette.assign_tiers(all, adj)
  for mi, m in ipairs(maps) do
    local fills = per_map[mi]
    for i, f in ipairs(m.fields) do
      local t = tiers[index[f.species]]
      fills.tiers[i] = t
      fills.fills[i] = palette.field(f.kind or "aqueous", t)
    end
    fills.conflicts = conflicts
  end
  return per_map
end

--- Several maps as panels of one figure (e.g. a temperature sweep), on
-- shared axis ranges.  opts: cols (default: one row up to three maps, then
-- about square; with a preset, fewer when the panels would be narrower
-- than plot.grid_min_panel points at its text scale, except on a slide's
-- fixed frame), panel_title =
-- function(map, i) -> string (default: plot.map_title), pages (PDF: one
-- page per panel; cols is then ignored), and the options of plot.map
-- (preset, reference, domains, labels, file, width, height, dpi, stamp,
-- notes).  Cells left over in the last row stay blank (no empty axes).
plot.grid_min_panel = 200   -- points (common practice for a readable map panel, no source)
local GRID_FOOT = 30          -- points added under a preset's grid for the stamp
function plot.grid(maps, opts)
  opts = read_opts("plot.grid", PLOT_GRID_OPTS, opts)
  if type(maps) ~= "table" or #maps == 0 then error("plot.grid: maps must be a non-empty list", 2) end
  for i, m in ipairs(maps) do plot.check_map(m, ("plot.grid: maps[%d]"):format(i)) end
  local ref = reference(opts, maps[1])
  local n = #maps
  local look = plot.look(opts)
  -- pages: one row whatever cols says, so the PDF has one page per map and
  -- no empty page (a cols that leaves cells empty would add blank pages)
  local cols = opts.cols or (n <= 3 and n or math.ceil(math.sqrt(n)))
  if not opts.cols and look.name and not look.fixed then
    local fit = math.max(1, math.floor(look.width / (plot.grid_min_panel * look.text)))
    cols = math.min(cols, fit)
  end
  if opts.pages then cols = n end
  cols = math.max(1, math.min(cols, n))
  local rows = math.ceil(n / cols)
  local w, h
  if look.name then   -- a preset: its width; panels keep its shape unless the frame is fixed
    w = opts.width or look.width
    h = opts.height or ((look.fixed or opts.pages) and look.height
                        or rows * (w / cols) * look.height / look.width + GRID_FOOT * look.text)
  else
    w = opts.width or (plot.defaults.width * (cols > 1 and not opts.pages and 0.75 * cols or 1))
    h = opts.height or (plot.defaults.height * (rows > 1 and not opts.pages and 0.75 * rows or 1))
  end
  look.width, look.height = w, h
  local fig = new_figure(look, rows, cols)
  fig:used(n)
  local win = opts.shared == false and nil or union_window(maps, ref)
  local temps = {}
  local shared = opts.shared_fills ~= false and plot.shared_fills(maps) or {}
  local title1
  for i, m in ipairs(maps) do
    local wi = win or window_of(m, ref)
    fig:axes(i, wi.x0, wi.x1, wi.y0, wi.y1)
    local title = opts.panel_title and opts.panel_title(m, i) or plot.map_title(m)
    title1 = title1 or title
    fig:titles(i, x_title(m), y_title(m, ref), title)
    draw_map(fig, i, m, opts, wi, ref, look, shared[i])
    temps[#temps + 1] = fmt_T(celsius(m)) or "?"
  end
  local cond = {}   -- only the conditions every panel shares; titles tell the rest
  for k, v in pairs(maps[1].conditions or {}) do
    local same = true
    for i = 2, #maps do same = same and (maps[i].conditions or {})[k] == v end
    if same then cond[k] = v end
  end
  local extra = { { full = "panels at " .. table.concat(temps, ", "), short = false } }
  if shared[1] and shared[1].conflicts > 0 then
    extra[#extra + 1] = ("note: %d pairs of neighbouring fields share a lightness tier"):format(shared[1].conflicts)
  end
  map_notes(extra, maps[1])
  add_reference(extra, ref)
  apply_stamp(fig, opts, cond, extra, title1, w, look, maps)
  return finish(fig, opts, plot.defaults)
end

--- The boundaries of several maps on one plot (temperatures, ligand
-- levels), each map in its own colour and dash, with a legend.  The field
-- labels of one map (opts.labels_of, default 1; false for none) are shown.
-- opts: legend_label = function(map, i) -> string (default: map.label or
-- the temperature), water = false to leave out water lines, title, and the
-- options of plot.map.
function plot.overlay(maps, opts)
  opts = read_opts("plot.overlay", PLOT_OVERLAY_OPTS, opts)
  if type(maps) ~= "table" or #maps == 0 then error("plot.overlay: maps must be a non-empty list", 2) end
  for i, m in ipairs(maps) do plot.check_map(m, ("plot.overlay: maps[%d]"):format(i)) end
  local ref = reference(opts, maps[1])
  local look = plot.look(opts)
  local fig = new_figure(look)
  local win = union_window(maps, ref)
  fig:axes(1, win.x0, win.x1, win.y0, win.y1)
  local m1 = maps[1]
  local cond = {}   -- only the conditions all maps share; the legend tells the rest
  for k, v in pairs(m1.conditions or {}) do
    local same = true
    for i = 2, #maps do same = same and (maps[i].conditions or {})[k] == v end
    if same then cond[k] = v end
  end
  local title = opts.title
  if not title then
    local lig = (m1.conditions or {}).ligand
    local head = m1.element and (lig and ("{%s}–{%s}–{H2O}"):format(m1.element, lig) or ("{%s}–{H2O}"):format(m1.element))
    local temps, seen = {}, {}
    for _, m in ipairs(maps) do
      local t = celsius(m)
      if t and not seen[t] then seen[t] = true; temps[#temps + 1] = t end
    end
    title = (head and (head .. ": ") or "") .. "boundaries" .. (#temps > 0 and (" at " .. fmt_Ts(temps)) or "")
    local fx = fixed_text(cond, m1)
    if fx then title = title .. ", " .. fx end
  end
  fig:titles(1, x_title(m1), y_title(m1, ref), title)
  local lab = opts.labels_of == nil and 1 or opts.labels_of
  if lab and maps[lab] then
    for _, f in ipairs(maps[lab].fields) do
      fig:polygon(1, f.x, shifted(f.y, ref.offset), { 1, 1, 1, 0 }, palette.ink, 0, f.species)
    end
  end
  draw_neutral(fig, 1, m1, win, look)
  local labels = {}
  for i, m in ipairs(maps) do
    local st = palette.series_style(i)
    local label = opts.legend_label and opts.legend_label(m, i) or m.label or fmt_T(celsius(m)) or ("map " .. i)
    labels[i] = label
    local first = true
    for _, b in ipairs(m.boundaries or {}) do
      fig:line(1, b.x, shifted(b.y, ref.offset), st.color, 1.1 * look.line, st.dash, first and label or nil)
      first = false
    end
    if first then   -- no boundaries: outline the fields instead
      for _, f in ipairs(m.fields) do
        local xs, ys = { table.unpack(f.x) }, { table.unpack(shifted(f.y, ref.offset)) }
        xs[#xs + 1], ys[#ys + 1] = xs[1], ys[1]
        fig:line(1, xs, ys, st.color, 1.1 * look.line, st.dash, first and label or nil)
        first = false
      end
    end
    if opts.water ~= false then
      draw_water(fig, 1, m, win, ref, { color = st.color, width = 0.6 * look.line, dash = "dashed" }, i == 1, look)
    end
  end
  fig:legend(1, opts.legend or "outside")
  local extra = { { full = "overlaid: " .. table.concat(labels, ", "), short = false } }
  map_notes(extra, m1)
  add_reference(extra, ref)
  apply_stamp(fig, opts, cond, extra, title, look.width, look, maps)
  return finish(fig, opts, plot.defaults)
end

return plot
