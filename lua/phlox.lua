--- phlox: the module every study script starts with.
--    local phlox = require "phlox"
--    local lib = phlox.library { "Fe", "S" }
--    local map = phlox.map { library = lib, element = "Fe", T_C = 150, ligand = "S" }
-- It gathers the C primitives (phlox.core) and the Lua helpers of the
-- embedded library (phlox.plot, phlox.export, phlox.sweep, ...) into one
-- table.  Temperatures in user-facing options are in degrees Celsius
-- (T_C) or kelvin (T); pressures in bar (P, default 1 bar up to 100 C and
-- the saturation pressure above).
-- The table is filled by the modules of stdlib/phlox/ named in
-- stdlib/phlox/base.lua, one concern each (options, library, notes,
-- speciation, maps, electrodes, help); this file loads them in order and
-- adds the caution and the diagrams and report entry points.
local base = require "phlox.base"
local phlox = base.phlox

require "phlox.options"
require "phlox.library"
require "phlox.notes"
require "phlox.speciation"
require "phlox.maps"
require "phlox.electrodes"
require "phlox.help"

phlox.caution = "A thermodynamic diagram says what can form, not how fast it forms: "
  .. "passivity depends on film kinetics, alloying, flow and deposits. Use these results "
  .. "with the applicable codes, standards and licensed engineering practice."

--- Diagrams on top of speciate and map (stdlib/phlox/diagrams.lua): which
-- field a potential measured against a reference electrode falls in, and
-- fraction and solubility curves and temperature series of maps.
--   phlox.where { map = m, pH = 5, E = -0.80, reference = "SCE" }
function phlox.where(opts) return require("phlox.diagrams").where(opts) end
function phlox.fractions(opts) return require("phlox.diagrams").fractions(opts) end
function phlox.solubility(opts) return require("phlox.diagrams").solubility(opts) end
function phlox.series(opts) return require("phlox.diagrams").series(opts) end

--- A study report: one self-contained HTML page (figures as inline SVG,
-- tables, data notes, provenance, the caution) and optionally a PDF of the
-- same.  Options (see stdlib/phlox/report.lua and docs/figures.md): file
-- (".html"), pdf (".pdf"), title, summary, sections = { { heading, text,
-- figures = { { figure, caption } }, tables = { { caption, columns, rows } } } },
-- notes, conditions.
function phlox.report(opts) return require("phlox.report").write(opts) end

return phlox
