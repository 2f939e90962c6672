--- phlox.maps (part of `require "phlox"`): predominance maps.
-- Adds to phlox: map (an exact map by half-planes, core.map), grid_map (a
-- rigorous map: the solver on a grid, core.grid_map, boundaries next to
-- failed solves left out unless asked for), grid_fields (a rigorous map's
-- node cells joined into field polygons, their steps smoothed) and locate
-- (the species of a map at a point, src/geom).  Every map carries its
-- conditions, files, provenance, stamp and notes (ligand oxidation states,
-- user exclusions, activity model, the estimated and held species of its
-- element and ligand, the sour caution).  A constant held at 25 C stops
-- the work before it is done, unless accept_held_logk is true.
local core = require "phlox.core"
local provenance = require "phlox.provenance"
local base = require "phlox.base"
local phlox, P = base.phlox, base.P
local T0C, options, ACT, I_MAX, COORD, TOTAL_MAX, spec, temperature, pressure, check_library, LIGAND_GROUPS, ligand_elements, held_logk, stamp_held, add_note, note_activity, note_sour, note_list, note_ligands =
  P.T0C, P.options, P.ACT, P.I_MAX, P.COORD, P.TOTAL_MAX, P.spec, P.temperature, P.pressure, P.check_library, P.LIGAND_GROUPS, P.ligand_elements, P.held_logk, P.stamp_held, P.add_note, P.note_activity, P.note_sour, P.note_list, P.note_ligands
local user_species, map_species = P.user_species, P.map_species

local function window_of(opts, xname, yname)
  local ranges = { pH = opts.pH_range or { 0, 14 }, E = opts.E_range or { -2, 2 },
                   loga = opts.loga_range or { -8, 0 } }
  local x, y = ranges[xname], ranges[yname]
  return { x[1], x[2], y[1], y[2] }
end

--- An exact predominance map (fields as polygons, boundaries with their
-- reactions, water lines, neutral pH, corrosion domains).
--   phlox.map { library = lib, element = "Fe", T_C = 25,
--               pH_range = {0, 14}, E_range = {-2, 2}, activity = 1e-6,
--               ligand = "S", ligand_activity = 1e-3, ionic_strength = 0,
--               exclude = {"Fe3O4(s)"}, axes = {"pH", "E"},
--               ligand_redox = { N = "full", S = "sulfate" } }
-- ligand_redox: per ligand "full" (true), "kept" (false) or a form name
-- (docs/solver.md "What practice keeps out"; N and C kept, S full by
-- default).  The map's `stamp` and `notes` carry every caveat.
local MAP_OPTS = spec("phlox.map", {
  library = "table",                          -- phlox.library{...}
  element = "string",                         -- the element mapped, "Fe"
  axes = "strings",                           -- {"pH", "E"} (default), {"loga", "E"}, {"pH", "loga"}
  pH_range = { "numbers", -COORD, COORD },    -- {0, 14}
  E_range = { "numbers", -COORD, COORD },     -- V vs SHE, {-2, 2}
  loga_range = { "numbers", -COORD, COORD },  -- log a(ligand), {-8, 0}
  pH = { "number", -COORD, COORD },           -- fixed pH (when pH is not an axis)
  E = { "number", -COORD, COORD },            -- fixed E (when E is not an axis)
  activity = { "number", ACT[1], ACT[2] },    -- activity of each dissolved species of the element (1e-6)
  ligand = "string",                          -- a ligand element, "S"
  ligand_activity = { "number", ACT[1], ACT[2] }, -- total ligand activity (1e-3)
  gas_log_f = { "number", -300, 3 },          -- log10 fugacity (bar) of gases
  ionic_strength = { "number", 0, I_MAX },    -- mol/kg, Davies correction
  exclude = "strings",                        -- species left out
  only = "strings",                           -- only these species
  activities = { "map", ACT[1], ACT[2] },     -- per species activity, {["Fe^2+"] = 1e-5}
  accept_held_logk = "boolean",               -- use log K held at 25 C away from 25 C (stamped)
  require_temperature_data = "boolean",       -- gone: phlox.temperature_notes says to use accept_held_logk
  ligand_redox = "table",                     -- {N = "full" | "kept" | form name}
}, true)
local function check_window(where, opts, key)
  local r = opts[key]
  if r ~= nil and not (#r == 2 and r[1] < r[2]) then
    core.user_error(("%s: option '%s' must be {from, to} with from < to"):format(where, key))
  end
end
function phlox.map(opts)
  options("phlox.map", MAP_OPTS, opts)
  local lib = opts.library
  check_library("phlox.map", lib)
  if type(opts.element) ~= "string" then core.user_error("phlox.map: element (a symbol) is required") end
  for _, k in ipairs { "pH_range", "E_range", "loga_range" } do check_window("phlox.map", opts, k) end
  local T = temperature(opts, "phlox.map")
  local P = pressure(opts, T, "phlox.map")
  -- the map uses species of its element and ligand elements only (with H, O):
  -- a species of another element in a ligand's file is not part of it
  local held_of, made_of_set = { opts.element }, { [opts.element] = true }
  for _, e in ipairs(ligand_elements(opts.ligand)) do held_of[#held_of + 1] = e; made_of_set[e] = true end
  -- a held species the user left out (exclude, only) does not stop the map
  held_logk(lib, held_of, T, opts, "phlox.map", made_of_set, user_species(lib, opts, opts.element))
  local axes = opts.axes or { "pH", "E" }
  local copt = {
    element = opts.element, T = T, P = P, x = axes[1], y = axes[2],
    window = window_of(opts, axes[1], axes[2]),
    pH = opts.pH, E = opts.E, activity = opts.activity,
    ligand = opts.ligand, ligand_activity = opts.ligand_activity,
    gas_log_f = opts.gas_log_f, ionic_strength = opts.ionic_strength,
    exclude = opts.exclude, only = opts.only, activities = opts.activities,
    ligand_redox = opts.ligand_redox,
  }
  local m, err = core.map(lib.db, copt)
  if not m then core.user_error(err) end
  note_ligands(m, m.ligand_states)
  note_list(m, "exclude", "left out by the user (exclude)", opts.exclude)
  note_list(m, "only", "only these species of " .. opts.element .. " (only)", opts.only)
  if (opts.ionic_strength or 0) > 0 then note_activity(m, "davies", opts.ionic_strength) end
  local names = {}
  for _, f in ipairs(m.ligand_fields or {}) do names[#names + 1] = f.species end
  for _, f in ipairs(m.fields) do names[#names + 1] = f.species end
  note_sour(m, names)
  m.conditions = {
    T_C = T - T0C, P_bar = P, activity = opts.activity or 1e-6,
    ionic_strength = opts.ionic_strength or 0,
    ligand = opts.ligand, ligand_activity = opts.ligand and (opts.ligand_activity or 1e-3) or nil,
  }
  m.files = lib.files
  -- a ligand group (CN) stamps the files of its elements: its complexes live there
  local els = { opts.element }
  for _, e in ipairs(LIGAND_GROUPS[opts.ligand] or { opts.ligand }) do els[#els + 1] = e end
  m.provenance = provenance.of_result(lib, els, m.conditions, opts)
  -- the stamp names the held and estimated species the map weighed
  stamp_held(m, held_logk(lib, held_of, T, opts, "phlox.map", made_of_set, map_species(m)))
  m.provenance.notes = m.stamp   -- the caveats travel with the provenance (into sweep results)
  return m
end

--- A rigorous map: the speciation solver at every node of a pH-E grid
-- (mass balance of the element and of a ligand, activity coefficients,
-- solids), boundaries traced between nodes and refined by bisection.  A
-- node is marked by the element's precipitated solid, else by the
-- dissolved species holding most of it.
--   phlox.grid_map { library = lib, element = "Cu", T_C = 25, total = 1e-6,
--                    ligand = "Cl", ligand_total = 1e-2, n = 201,
--                    pH_range = {0, 14}, E_range = {-2, 2},
--                    activity_model = "davies", threads = 2,
--                    ligand_redox = {...}, allow_inhibited = false,
--                    failed_boundaries = false }  -- draw boundaries next to failed solves
-- Returns a map table with `boundaries` (polylines between named species),
-- `fields` (the nodes' cells joined per species, their steps smoothed, so
-- phlox.plot.map fills them like an exact map; see phlox.grid_fields),
-- `water` and `neutral_pH`, `labels` (node labels), `species` and solver
-- statistics.
local GRID_MAP_OPTS = spec("phlox.grid_map", {
  library = "table",                          -- phlox.library{...}
  element = "string",                         -- the element mapped
  total = { "number", ACT[1], TOTAL_MAX },    -- mol/kg of the element (1e-6)
  ligand = "string",                          -- a ligand element
  ligand_total = { "number", ACT[1], TOTAL_MAX }, -- mol/kg of the ligand (1e-3)
  n = { "integer", 2, 4001 },                 -- nodes per axis (101)
  nx = { "integer", 2, 4001 },                -- nodes along pH
  ny = { "integer", 2, 4001 },                -- nodes along E
  pH_range = { "numbers", -COORD, COORD },    -- {0, 14}
  E_range = { "numbers", -COORD, COORD },     -- {-2, 2}
  activity_model = "ideal|davies|bdot|sit",   -- activity coefficients (davies)
  background_nacl = { "number", 0, 6.1 },     -- mol/kg NaCl (halite saturation, from memory of the CRC Handbook)
  exclude = "strings",                        -- species left out
  threads = { "integer", 1, 64 },             -- worker threads
  accept_held_logk = "boolean",               -- use log K held at 25 C away from 25 C (stamped)
  require_temperature_data = "boolean",       -- gone: phlox.temperature_notes says to use accept_held_logk
  ligand_redox = "table",                     -- as phlox.map
  allow_inhibited = "boolean",                -- let kinetically inhibited solids precipitate
  failed_boundaries = "boolean",              -- draw boundaries next to failed solves
}, true)
function phlox.grid_map(opts)
  options("phlox.grid_map", GRID_MAP_OPTS, opts)
  local lib = opts.library
  check_library("phlox.grid_map", lib)
  if type(opts.element) ~= "string" then core.user_error("phlox.grid_map: element (a symbol) is required") end
  for _, k in ipairs { "pH_range", "E_range" } do check_window("phlox.grid_map", opts, k) end
  if LIGAND_GROUPS[opts.ligand] then
    core.user_error(("phlox.grid_map: ligand = %q is a ligand group: the rigorous solver balances elements, not groups; draw it with phlox.map"):format(opts.ligand))
  end
  local T = temperature(opts, "phlox.grid_map")
  local P = pressure(opts, T, "phlox.grid_map")
  -- the grid's system: the element, the ligand and a NaCl background
  local held_of = { opts.element, opts.ligand }
  if opts.background_nacl then held_of[#held_of + 1] = "Na"; held_of[#held_of + 1] = "Cl" end
  -- the solver's system: these elements' species less the user's exclude list
  local held = held_logk(lib, held_of, T, opts, "phlox.grid_map", nil, user_species(lib, opts))
  local pr, er = opts.pH_range or { 0, 14 }, opts.E_range or { -2, 2 }
  local g, err = core.grid_map(lib.db, {
    element = opts.element, T = T, P = P, window = { pr[1], pr[2], er[1], er[2] },
    nx = opts.nx or opts.n or 101, ny = opts.ny or opts.n or 101,
    total = opts.total, ligand = opts.ligand, ligand_total = opts.ligand_total,
    activity_model = opts.activity_model, background_nacl = opts.background_nacl,
    exclude = opts.exclude, threads = opts.threads,
    ligand_redox = opts.ligand_redox, allow_inhibited = opts.allow_inhibited })
  if not g then core.user_error(err) end
  g.fields = phlox.grid_fields(g)
  for _, f in ipairs(g.fields) do   -- the kind, as exact maps name it
    local rec = lib:species(f.species)
    local st, only = rec and rec.state, true
    for e in pairs(rec and rec.elements or {}) do only = only and e == opts.element end
    f.kind = st == "s" and (only and "metal" or "solid") or st == "g" and "gas" or st == "l" and "liquid" or "aqueous"
  end
  -- water lines and neutral pH at T, as exact maps carry them
  local o2 = lib.db:reaction("O2(g) + 4 H^+ + 4 e- = 2 H2O(l)", T, P)
  local kw = lib.db:reaction("H2O(l) = H^+ + OH^-", T, P)
  local slope = core.nernst_slope(T)
  if o2 and o2.E then g.water = { o2 = { a = o2.E, b = -slope }, h2 = { a = 0, b = -slope } } end
  if kw and kw.logK then g.neutral_pH = -kw.logK / 2 end
  note_ligands(g, g.ligand_states)
  note_list(g, "exclude", "left out by the user (exclude)", opts.exclude)
  note_activity(g, opts.activity_model or "davies", g.ionic_strength_max or 0)
  if g.failures > 0 then
    -- a boundary placed next to a point without a solution (a failed node,
    -- or a bisection point) is a guess: left out unless the user asks for it
    local kept, dropped = {}, 0
    for _, b in ipairs(g.boundaries) do
      if not b.through_failed or opts.failed_boundaries then kept[#kept + 1] = b
      else -- keep the runs of points away from the failures
        local run = { between = b.between, x = {}, y = {} }
        for k = 1, #b.x do
          if b.failed_points[k] then
            dropped = dropped + 1
            if #run.x >= 2 then kept[#kept + 1] = run end
            run = { between = b.between, x = {}, y = {} }
          else
            run.x[#run.x + 1], run.y[#run.y + 1] = b.x[k], b.y[k]
          end
        end
        if #run.x >= 2 then kept[#kept + 1] = run end
      end
    end
    g.boundaries = kept
    add_note(g, "failed", ("the solver failed at %d of %d solves; %s"):format(g.failures, g.solves,
      opts.failed_boundaries and "boundaries next to them drawn on request (failed_boundaries = true)"
      or ("%d boundary points next to them left out (failed_boundaries = true draws them)"):format(dropped)))
  end
  -- the grid keeps no ligand species: sulfide takes part unless sulfur
  -- is pinned to sulfate (the C rule's own description says which)
  local st = g.ligand_states or ""
  if opts.ligand == "S" and (st:find("S full redox", 1, true) or st:find("S as sulfide", 1, true)) then
    note_sour(g, { "HS^-" })
  end
  g.conditions = { T_C = T - T0C, P_bar = P, total = opts.total or 1e-6,
                   ligand = opts.ligand, ligand_total = opts.ligand and (opts.ligand_total or 1e-3) or nil }
  g.label = "rigorous"
  local els = { opts.element, opts.ligand or "H" }
  if opts.background_nacl then els[#els + 1] = "Na"; els[#els + 1] = "Cl" end
  g.provenance = provenance.of_result(lib, els, g.conditions, opts)
  stamp_held(g, held)
  g.provenance.notes = g.stamp
  return g
end

--- Field polygons of a rigorous map: each node stands for the cell of the
-- grid around it (half a step each way, clipped to the window); cells with
-- one label are joined and their outline traced counter-clockwise, its
-- steps smoothed (below).  A
-- species in several separate pieces gives several fields; an enclosed
-- hole is left to the field drawn inside it.  Nodes where the solver
-- failed (label 0) belong to no field.
function phlox.grid_fields(g)
  local nx, ny, lab = g.nx, g.ny, g.labels
  local x0, x1, y0, y1 = g.x.min, g.x.max, g.y.min, g.y.max
  local function X(i) return math.min(math.max(x0 + (i - 0.5) * (x1 - x0) / (nx - 1), x0), x1) end
  local function Y(j) return math.min(math.max(y0 + (j - 0.5) * (y1 - y0) / (ny - 1), y0), y1) end
  local function L(i, j)   -- node label, 0-based indices; -1 outside
    if i < 0 or j < 0 or i >= nx or j >= ny then return -1 end
    return lab[j * nx + i + 1]
  end
  -- Corner positions, smoothed: a corner where exactly two labels meet
  -- along a line of cell edges (not on the window's edge, not diagonal)
  -- moves halfway towards the mean of its two neighbours on that line, twice
  -- (Laplacian smoothing, as discussed by Taubin 1995, "A signal processing
  -- approach to fair surface design", SIGGRAPH '95), so the cells' steps
  -- become slopes.  Every field uses the same corner positions, so the
  -- fields still tile the window without gaps.
  local SMOOTH_STEPS, SMOOTH_FACTOR = 2, 0.5   -- our choice (common practice, no source)
  local PX, PY = {}, {}
  local function key(i, j) return i * (ny + 1) + j end
  for i = 0, nx do for j = 0, ny do PX[key(i, j)], PY[key(i, j)] = X(i), Y(j) end end
  local links = {}
  for i = 1, nx - 1 do
    for j = 1, ny - 1 do
      local a, b, c, d = L(i - 1, j - 1), L(i, j - 1), L(i - 1, j), L(i, j)   -- below left, below right, above left, above right
      local nb = {}
      if b ~= d then nb[#nb + 1] = key(i + 1, j) end   -- edge to the right
      if a ~= c then nb[#nb + 1] = key(i - 1, j) end   -- to the left
      if c ~= d then nb[#nb + 1] = key(i, j + 1) end   -- upwards
      if a ~= b then nb[#nb + 1] = key(i, j - 1) end   -- downwards
      local labels = {}
      for _, v in ipairs({ a, b, c, d }) do labels[v] = true end
      local count = 0
      for _ in pairs(labels) do count = count + 1 end
      if #nb == 2 and count == 2 then links[key(i, j)] = nb end
    end
  end
  for _ = 1, SMOOTH_STEPS do
    local nxp, nyp = {}, {}
    for k, nb in pairs(links) do
      local mx, my = (PX[nb[1]] + PX[nb[2]]) / 2, (PY[nb[1]] + PY[nb[2]]) / 2
      nxp[k], nyp[k] = PX[k] + SMOOTH_FACTOR * (mx - PX[k]), PY[k] + SMOOTH_FACTOR * (my - PY[k])
    end
    for k in pairs(nxp) do PX[k], PY[k] = nxp[k], nyp[k] end
  end
  -- directed cell edges with the species on their left, keyed by start vertex
  -- (vertex (i, j) is the corner below and left of node (i, j))
  local fields = {}
  for sp = 1, #g.species do
    local out, count = {}, 0
    local function add(a, b, c, d)
      local k = a * (ny + 1) + b
      out[k] = out[k] or {}
      out[k][#out[k] + 1] = { c, d }
      count = count + 1
    end
    for j = 0, ny - 1 do
      for i = 0, nx - 1 do
        if L(i, j) == sp then
          if L(i, j - 1) ~= sp then add(i, j, i + 1, j) end          -- bottom, left to right
          if L(i + 1, j) ~= sp then add(i + 1, j, i + 1, j + 1) end  -- right, upwards
          if L(i, j + 1) ~= sp then add(i + 1, j + 1, i, j + 1) end  -- top, right to left
          if L(i - 1, j) ~= sp then add(i, j + 1, i, j) end          -- left, downwards
        end
      end
    end
    while count > 0 do
      local start
      for j = 0, ny do
        for i = 0, nx do
          local e = out[i * (ny + 1) + j]
          if e and #e > 0 then start = { i, j }; break end
        end
        if start then break end
      end
      local xs, ys = {}, {}
      local ci, cj, pdx, pdy = start[1], start[2], nil, nil
      repeat
        local e = out[ci * (ny + 1) + cj]
        local pick = 1
        if #e > 1 and pdx then   -- a corner shared diagonally: turn left first
          for q, t in ipairs(e) do
            local dx, dy = t[1] - ci, t[2] - cj
            if pdx * dy - pdy * dx > 0 then pick = q end
          end
        end
        local t = table.remove(e, pick)
        count = count - 1
        local dx, dy = t[1] - ci, t[2] - cj
        if not (pdx == dx and pdy == dy) or links[key(ci, cj)] then
          xs[#xs + 1], ys[#ys + 1] = PX[key(ci, cj)], PY[key(ci, cj)]
        end
        ci, cj, pdx, pdy = t[1], t[2], dx, dy
      until ci == start[1] and cj == start[2]
      local a = core.polygon_area(xs, ys)   -- signed, src/geom
      if a > 0 and #xs >= 3 then   -- outer outlines run counter-clockwise
        fields[#fields + 1] = { species = g.species[sp], kind = "aqueous", x = xs, y = ys, area = a }
      end
    end
  end
  table.sort(fields, function(p, q) return p.area > q.area end)
  local labelled = {}   -- one label per species, on its largest piece
  for _, f in ipairs(fields) do
    if labelled[f.species] then f.label = false else labelled[f.species] = true end
  end
  return fields
end

--- The species of the map at a point, e.g. phlox.locate(map, 7.0, -0.4).
function phlox.locate(map, x, y)
  core.check_value("phlox.locate", "map", map, "table")
  if type(map.fields) ~= "table" then core.user_error("phlox.locate: a map (phlox.map{...}) expected") end
  core.check_value("phlox.locate", "x", x, "number", -COORD, COORD)
  core.check_value("phlox.locate", "y", y, "number", -COORD, COORD)
  local k = core.locate(map.fields, x, y)   -- even-odd rule, src/geom
  if k then return map.fields[k].species, map.fields[k] end
  return nil
end
