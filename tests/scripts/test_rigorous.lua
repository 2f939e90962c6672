-- test_rigorous.lua: rigorous maps (the speciation solver at every grid
-- node) agree with exact maps where their assumptions coincide: one
-- element, no ligand, ideal activities, the element's total equal to the
-- exact map's activity of dissolved species.  "Agree" means every node's
-- label is the exact map's species at that node or at a neighbouring node
-- (within one grid cell), since the rigorous map sums all dissolved species
-- while the exact one compares them one at a time (DESIGN.md: "The two
-- methods must agree where their assumptions coincide").
local phlox = require "phlox"
local S = dofile(assert(os.getenv("PHLOX_SOURCE_DIR"), "PHLOX_SOURCE_DIR is not set (run through ctest)") .. "/tests/support/init.lua")
local check = S.check

local function compare(elements, element, T_C, nx, ny)
  local lib = phlox.library(elements)
  local T = T_C + 273.15
  local P = phlox.core.default_pressure(T)
  local g, err = phlox.core.grid_map(lib.db, { element = element, T = T, P = P, nx = nx, ny = ny,
                                               total = 1e-6, activity_model = "ideal", window = { 0, 14, -2, 2 } })
  check(g, "grid map failed: " .. tostring(err))
  check(g.failures == 0, g.failures .. " nodes did not converge")
  local m = phlox.map { library = lib, element = element, T_C = T_C, activity = 1e-6 }
  local dx, dy = 14 / (nx - 1), 4 / (ny - 1)
  local agree, near, n = 0, 0, 0
  for j = 0, ny - 1 do
    for i = 0, nx - 1 do
      local x, y = i * dx, -2 + j * dy
      local lab = g.species[g.labels[j * nx + i + 1]]
      n = n + 1
      if lab == phlox.locate(m, x, y) then
        agree = agree + 1
      else
        local found = false
        for a = -1, 1 do
          for b = -1, 1 do
            local px, py = math.min(14, math.max(0, x + a * dx)), math.min(2, math.max(-2, y + b * dy))
            if phlox.locate(m, px, py) == lab then found = true end
          end
        end
        check(found, ("%s at %d C: node pH %.2f E %.3f is %s, exact map has %s, not within one cell")
              :format(element, T_C, x, y, tostring(lab), tostring(phlox.locate(m, x, y))))
        near = near + 1
      end
    end
  end
  -- every species with a sizeable exact field shows in the rigorous map
  for _, f in ipairs(m.fields) do
    if f.area > 4 * dx * dy then
      local seen = false
      for _, s in ipairs(g.species) do seen = seen or s == f.species end
      check(seen, element .. ": " .. f.species .. " missing from the rigorous map")
    end
  end
  io.write(("%s %d C: %d nodes, %d identical, %d within one cell, %d solver calls\n")
           :format(element, T_C, n, agree, near, g.calls))
  check(agree / n > 0.9, "labels mostly identical")
end

compare({ "Zn" }, "Zn", 25, 57, 41)

-- the same map on two and three threads: the same bytes (labels, boundary
-- points, statistics), as determinism promises; every job starts its solver
-- cold and the tracer reads the labels the jobs found (rmap.h)
local cl = phlox.library { "Cu", "Cl" }
local o = { element = "Cu", T = 298.15, P = 1, nx = 61, ny = 41, total = 1e-6, ligand = "Cl", ligand_total = 1e-2 }
local g1 = assert(phlox.core.grid_map(cl.db, o))
check(g1.failures == 0, "Cu-Cl rigorous map converges everywhere")
for _, threads in ipairs { 2, 3 } do
  o.threads = threads
  local g2 = assert(phlox.core.grid_map(cl.db, o))
  local on = (" on 1 and %d threads"):format(threads)
  for k = 1, #g1.labels do
    check(g1.species[g1.labels[k]] == g2.species[g2.labels[k]], "node " .. k .. " differs" .. on)
  end
  for _, key in ipairs { "solves", "failures", "cold_retries", "ionic_strength_max" } do
    check(g1[key] == g2[key], key .. ": " .. tostring(g1[key]) .. " vs " .. tostring(g2[key]) .. on)
  end
  check(#g1.boundaries == #g2.boundaries, "as many boundary polylines" .. on)
  for b = 1, #g1.boundaries do
    local p1, p2 = g1.boundaries[b], g2.boundaries[b]
    check(#p1.x == #p2.x, "boundary " .. b .. ": as many points" .. on)
    for k = 1, #p1.x do
      check(p1.x[k] == p2.x[k] and p1.y[k] == p2.y[k],
            ("boundary %d point %d: (%.17g, %.17g) vs (%.17g, %.17g)%s"):format(b, k, p1.x[k], p1.y[k], p2.x[k], p2.y[k], on))
    end
  end
end
local cucl = false
for _, s in ipairs(g1.species) do cucl = cucl or s:find("^CuCl") ~= nil end
check(cucl, "a copper chloro complex predominates somewhere at 1e-2 mol/kg chloride")
compare({ "Cu" }, "Cu", 25, 57, 41)
compare({ "Zn" }, "Zn", 200, 43, 31)
-- the Lua wrapper: a map table that phlox.plot can overlay on the exact map
local gm = phlox.grid_map { library = cl, element = "Cu", T_C = 25, total = 1e-6, ligand = "Cl",
                            ligand_total = 1e-2, n = 41, threads = 2 }
check(#gm.boundaries > 0 and gm.failures == 0 and #gm.fields > 0, "phlox.grid_map result")
-- its fields are the nodes' cells joined per species: every node lies in
-- the field of its own label
for j = 0, gm.ny - 1 do
  for i = 0, gm.nx - 1 do
    local x = gm.x.min + i * (gm.x.max - gm.x.min) / (gm.nx - 1)
    local y = gm.y.min + j * (gm.y.max - gm.y.min) / (gm.ny - 1)
    -- nodes on the window's edge sit on their cell's outline: probe just inside
    x = math.min(math.max(x, gm.x.min + 1e-9), gm.x.max - 1e-9)
    y = math.min(math.max(y, gm.y.min + 1e-9), gm.y.max - 1e-9)
    local want = gm.species[gm.labels[j * gm.nx + i + 1]]
    check(phlox.locate(gm, x, y) == want, ("node (%d, %d) lies in the field of %s"):format(i, j, tostring(want)))
  end
end
for _, b in ipairs(gm.boundaries) do check(#b.x == #b.y and #b.x >= 2, "boundary polyline") end
local exact = phlox.map { library = cl, element = "Cu", T_C = 25, ligand = "Cl", ligand_activity = 1e-2 }
-- water lines and neutral pH from the same records as the exact map's
S.close(gm.water.o2.a, exact.water.o2.a, 1e-12, "rigorous map O2 line intercept", { strict = true })
S.close(gm.water.o2.b, exact.water.o2.b, 1e-12, "rigorous map O2 line slope", { strict = true })
S.close(gm.neutral_pH, exact.neutral_pH, 1e-12, "rigorous map neutral pH", { strict = true })
local svg = require("phlox.plot").overlay({ exact, gm }):render("svg")
check(svg:find("<svg", 1, true) and svg:find("rigorous", 1, true), "overlay of exact and rigorous maps")
print("test_rigorous: all checks passed")
