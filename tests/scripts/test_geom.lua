-- test_geom.lua: the plane geometry of src/geom as phlox.core offers it to
-- the Lua layer (phlox.locate, phlox.where's E_range, the rigorous maps'
-- field areas, the palette's neighbour test).  Known answers from plane
-- geometry: a unit square's area is 1 (clockwise -1); the distance from a
-- point to a square's outline is the distance to its nearest side; a
-- U-shaped polygon cut by a vertical line through an arm gives the arm's
-- height, through the gap only the base.  The C functions themselves are
-- tested in tests/unit/test_geom.c; here the bindings and the Lua callers.
local S = dofile(os.getenv("PHLOX_SOURCE_DIR") .. "/tests/support/init.lua")
local check, close = S.check, S.close
local core = require "phlox.core"
local phlox = require "phlox"

-- areas and signed distances
local sx, sy = { 0, 1, 1, 0 }, { 0, 0, 1, 1 }
close(core.polygon_area(sx, sy), 1, 1e-15, "unit square area")
close(core.polygon_area({ 0, 0, 1, 1 }, { 0, 1, 1, 0 }), -1, 1e-15, "clockwise square area")
close(core.polygon_distance(sx, sy, 0.25, 0.5), 0.25, 1e-15, "distance inside")
close(core.polygon_distance(sx, sy, 2, 0.5), -1, 1e-15, "distance outside")

-- the pole of a 4 x 2 rectangle lies on its mid line, 1 from the long sides
local px, py, d = core.polygon_pole({ 0, 4, 4, 0 }, { 0, 0, 2, 2 }, 1e-3)
close(py, 1, 1e-3, "pole y")
close(d, 1, 1e-3, "pole distance")
check(px >= 1 - 1e-3 and px <= 3 + 1e-3, "pole x on the mid segment: " .. px)

-- spans of a U: arms x in [0, 1] and [3, 4] up to y = 4, base below y = 1
local ux, uy = { 0, 4, 4, 3, 3, 1, 1, 0 }, { 0, 0, 4, 4, 1, 1, 4, 4 }
local lo, hi = core.polygon_span(ux, uy, 0.5, 2)
check(lo == 0 and hi == 4, ("span through an arm: %s %s"):format(lo, hi))
lo, hi = core.polygon_span(ux, uy, 2, 0.5)
check(lo == 0 and hi == 1, ("span through the gap: %s %s"):format(lo, hi))
check(core.polygon_span(ux, uy, 2, 2) == nil, "no span in the gap above the base")

-- locate: the first field that holds the point, nil outside every field
local fields = { { species = "A", x = ux, y = uy }, { species = "B", x = { 1, 3, 3, 1 }, y = { 1, 1, 4, 4 } } }
check(core.locate(fields, 0.5, 2) == 1, "point in the U's arm")
check(core.locate(fields, 2, 2) == 2, "point in the gap (field B)")
check(core.locate(fields, 5, 2) == nil, "point outside both")
local map = { x = { min = 0, max = 4 }, y = { min = 0, max = 4 }, fields = fields }
local sp, f = phlox.locate(map, 2, 2)
check(sp == "B" and f == fields[2], "phlox.locate returns the species and its field")
check(phlox.locate(map, 5, 5) == nil, "phlox.locate outside")

-- misuse is an error, not a wrong answer
check(not pcall(core.polygon_area, { 0, 1 }, { 0 }), "x and y of different lengths")
check(not pcall(core.locate, { { x = { 0, 1, 1 } } }, 0, 0), "a field without y")
check(not pcall(core.polygon_pole, { 0, 1, 2 }, { 0, 1, 2 }), "pole of a polygon of zero area")

print("test_geom: ok")
