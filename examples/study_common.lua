-- examples/study_common.lua: what the example studies share (loaded with
-- dofile by each of them; not a study itself): the output folder, the list
-- of files written, map tables (boundaries with their line equations,
-- fields with their corrosion domain) and the closing summary with the
-- safety caution.
local phlox = require "phlox"
local export = require "phlox.export"

local common = {}

common.CAUTION = phlox.caution
common.DOMAIN_OF_KIND = { metal = "immunity", solid = "passivation", liquid = "passivation",
                          aqueous = "corrosion", gas = "corrosion" }

--- The output folder (first script argument, else `default`), created.
-- Returns a table: out, path(name), wrote(name), written (list).
function common.output(default)
  local out = (arg and arg[1]) or default
  require("phlox").make_dir(out) -- no shell: any folder name is only a name
  local o = { out = out, written = {} }
  function o.path(name) return out .. "/" .. name end
  function o.wrote(name) o.written[#o.written + 1] = name end
  return o
end

local function zero(v) if v == 0 then return 0.0 end return v end   -- no "-0.0" in tables

--- Rows of every boundary of the maps: the species on each side, the
-- reaction, its line E = a + b pH (or pH = a), and its end points.
-- `key(map)` gives the first column's value (e.g. the temperature).
function common.boundary_rows(maps, key)
  local rows = {}
  for _, m in ipairs(maps) do
    for _, b in ipairs(m.boundaries) do
      local line
      if b.line.vertical then line = ("pH = %.3f"):format(b.line.a)
      elseif b.line.b == 0 then line = ("E = %.4f"):format(b.line.a)
      else line = ("E = %.4f %s %.4f pH"):format(b.line.a, b.line.b < 0 and "-" or "+", math.abs(b.line.b)) end
      rows[#rows + 1] = {
        map = key(m), T_C = m.conditions.T_C, species_a = b.between[1], species_b = b.between[2], reaction = b.reaction, line = line,
        intercept = zero(b.line.a), slope_V_per_pH = (not b.line.vertical) and zero(b.line.b) or nil,
        pH_1 = zero(b.x[1]), E_1 = zero(b.y[1]), pH_2 = zero(b.x[2]), E_2 = zero(b.y[2]),
      }
    end
  end
  return rows
end
common.BOUNDARY_COLUMNS = { "map", "T_C", "species_a", "species_b", "reaction", "line", "intercept",
                            "slope_V_per_pH", "pH_1", "E_1", "pH_2", "E_2" }

--- Rows of every field: species, kind, corrosion domain, area and share of
-- the window.
function common.field_rows(maps, key)
  local rows = {}
  for _, m in ipairs(maps) do
    local total = (m.x.max - m.x.min) * (m.y.max - m.y.min)
    for _, f in ipairs(m.fields) do
      rows[#rows + 1] = { map = key(m), T_C = m.conditions.T_C, window_pH_V = total, species = f.species, kind = f.kind,
                          domain = common.DOMAIN_OF_KIND[f.kind], area_pH_V = f.area,
                          share_percent = 100 * f.area / total }
    end
  end
  return rows
end
common.FIELD_COLUMNS = { "map", "T_C", "window_pH_V", "species", "kind", "domain", "area_pH_V", "share_percent" }

--- Write both tables of the maps (boundaries-NAME.csv, fields-NAME.csv).
function common.map_tables(o, name, maps, key, conditions)
  export.csv(o.path("boundaries-" .. name .. ".csv"), common.boundary_rows(maps, key),
             { columns = common.BOUNDARY_COLUMNS, conditions = conditions, from = maps })
  o.wrote("boundaries-" .. name .. ".csv")
  export.csv(o.path("fields-" .. name .. ".csv"), common.field_rows(maps, key),
             { columns = common.FIELD_COLUMNS, conditions = conditions, from = maps })
  o.wrote("fields-" .. name .. ".csv")
end

--- The species whose field covers (pH, E) on map m, or "outside".
function common.at(m, pH, E)
  return phlox.locate(m, pH, E) or "outside the window"
end

--- The corrosion domains of map m with numbered cross marks at points
-- ({ pH, E } each), saved as `name` in the output folder.  The marks' arms
-- scale with the window (1/75 of the pH range, 1/60 of the E range).
local BLACK = { 0, 0, 0 }
function common.marked_domains(o, name, m, points, stamp)
  local plot = require "phlox.plot"
  local fig = plot.domains(m, { stamp = stamp })
  local dx, dy = (m.x.max - m.x.min) / 75, (m.y.max - m.y.min) / 60
  for k, p in ipairs(points) do
    fig:line(1, { p.pH - dx, p.pH + dx }, { p.E, p.E }, BLACK, 1.4, "solid")
    fig:line(1, { p.pH, p.pH }, { p.E - dy, p.E + dy }, BLACK, 1.4, "solid")
    fig:text(1, p.pH + 1.5 * dx, p.E + 4 / 3 * dy, tostring(k), false, 9, BLACK)
  end
  local ok, err = fig:save(o.path(name), plot.defaults.dpi)
  if not ok then error(err) end
  o.wrote(name)
end

--- Closing lines: the files written, which values are illustrative, the
-- caution.
function common.finish(o, illustrative)
  print()
  print(("Wrote %d files to %s/: %s"):format(#o.written, o.out, table.concat(o.written, ", ")))
  print("Illustrative: " .. illustrative)
  print("Caution: " .. common.CAUTION)
end

return common
