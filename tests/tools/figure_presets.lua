-- figure_presets.lua: the preset pictures of docs/figures.md, drawn by phlox.
--   ./build/phlox tests/tools/figure_presets.lua     (from the repository root)
-- Writes docs/figures/preset-<name>.png: the Fe–H2O map at 25 °C (standard
-- library data) at each preset of phlox.plot, at a pixel width near 500.
local phlox = require "phlox"
local plot = require "phlox.plot"
local lib = phlox.library { "Fe" }
local m = phlox.map { library = lib, element = "Fe", T_C = 25 }
local DPI = { column = 144, double = 72, slide = 54, page = 84 }   -- pixel widths 480, 504, 540, 546
for name in pairs(plot.presets) do
  plot.map(m, { preset = name, file = ("docs/figures/preset-%s.png"):format(name), dpi = DPI[name] or 72 })
end
local series = require("phlox.diagrams").series { library = lib, element = "Fe", T_C = { 25, 150, 250 } }
plot.grid(series, { preset = "column", file = "docs/figures/grid-column.png", dpi = 96 })
