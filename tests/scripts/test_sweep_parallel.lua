-- test_sweep_parallel.lua: a sweep split over worker processes gives the
-- same results, in the same order, as the same sweep in one process (the
-- reproducibility promise of DESIGN.md: same inputs, same bits).
local phlox = require "phlox"
local sweep = require "phlox.sweep"
local lib = phlox.library { "Zn" }
local points = sweep.product({ "T_C", { 25, 150 } }, { "pH", sweep.linear(4, 12, 9) })
local function fn(p)
  local r, err = phlox.speciate { library = lib, T_C = p.T_C, totals = { Zn = 1e-4 }, pH = p.pH }
  if not r then return nil, err end
  return { pH = p.pH, T_C = p.T_C, dissolved = r.elements.Zn.dissolved, I = r.ionic_strength }
end
local par, pfail = sweep.parallel(points, fn, { workers = 3 })
local seq, sfail = sweep.run(points, fn, { quiet = true })
assert(#par == #seq and #par == 18, "result count: " .. #par)
for k = 1, #seq do
  for key, v in pairs(seq[k]) do
    assert(par[k][key] == v, ("point %d %s: %s vs %s"):format(k, key, tostring(par[k][key]), tostring(v)))
  end
end
assert(#pfail == #sfail, "failures differ")
print("test_sweep_parallel: all checks passed")
