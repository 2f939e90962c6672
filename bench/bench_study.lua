-- bench_study.lua: the 240-map study of issue 17 - 8 temperatures x 6
-- chloride levels x 5 metals, one exact potential-pH map and one SVG each -
-- timed as a user runs it: one process, then sweep.parallel on 2 worker
-- processes, then 2 workers writing PNG as well; each on the figure output
-- path and on the former one (fig:reference_output: cairo's PNG writer,
-- SVG numbers rounded by strtod/printf) in the same run, and the SVG study
-- with text as glyph outlines (fig:svg_text "outline") against SVG <text>.  First the cost of
-- one map and one figure by each path.  Prints wall and CPU times (the
-- machine may be loaded: CPU / 2 is the wall time on 2 idle cores) and the
-- ratios; targets (issue 17, on 2 cores): under 1 s with SVG, under 3 s
-- with PNG.  Also times the part of a map spent
-- finding the species whose log K is held at 25 C (phlox.constant_logk),
-- uncached against the cached lookup maps now use.  Never fails on time.
-- Run on a release build: ctest --test-dir build-rel -L bench -V
local phlox = require "phlox"
local plot = require "phlox.plot"
local sweep = require "phlox.sweep"
local core = require "phlox.core"

local OUT = arg[1]
local MODE = arg[2]   -- set when the study reruns itself as a timed child
local METALS = { "Cu", "Zn", "Ni", "Co", "Fe" }
local TEMPS = { 25, 50, 75, 100, 150, 200, 250, 300 }
local LEVELS = sweep.log(1e-4, 1e1, 6)
local DPI = 150   -- plot.map's default

-- the shared helpers of the tests (tests/support: files, processes)
local S = dofile((arg[0]:match("^(.*)[/\\]") or ".") .. "/../tests/support/init.lua")
local q = S.files.quote

-- CPU seconds of this process and of its reaped children (the forked
-- workers): utime, stime, cutime, cstime of /proc/self/stat (proc(5)), in
-- clock ticks of 1/100 s (sysconf(_SC_CLK_TCK) on Linux); os.clock alone
-- where /proc is missing (it misses the workers).
local function cpu_all()
  local f = io.open("/proc/self/stat")
  if not f then return os.clock(), false end
  local s = f:read("a")
  f:close()
  local rest = s:match("%) (.*)$")
  local v = {}
  for w in rest:gmatch("%S+") do v[#v + 1] = w end
  -- fields after the command: 3 state ... 14 utime 15 stime 16 cutime 17 cstime
  local t = 0
  for k = 12, 15 do t = t + tonumber(v[k]) end
  return t / 100, true
end

-- One figure saved: path "new" the output path, "ref" the former one
-- (cairo's PNG writer, SVG numbers by strtod/printf), "outline" the output
-- path with SVG text as glyph outlines.
local function save(m, file, path)
  local fig = plot.map(m, {})
  if path == "ref" then fig:reference_output(true) end
  if path == "outline" then fig:svg_text("outline") end
  local ok, err = fig:save(file, DPI)
  assert(ok, err)
end

if MODE then -- the study itself: a child process so each run starts cold
  local fmt, workers, path = MODE:match("^(%a+):(%d):(%a+)$")
  local libs = {}
  for _, el in ipairs(METALS) do libs[el] = phlox.library { el, "Cl" } end
  local points = sweep.product({ "el", METALS }, { "T_C", TEMPS }, { "a", LEVELS })
  local res, fails = sweep.parallel(points, function(p)
    local m = phlox.map { library = libs[p.el], element = p.el, T_C = p.T_C, ligand = "Cl", ligand_activity = p.a }
    local base = ("%s/%s-%d-%d"):format(OUT, p.el, p.T_C, math.floor(math.log(p.a, 10) + 0.5))
    save(m, base .. ".svg", path)
    if fmt == "png" then save(m, base .. ".png", path) end
    return #m.fields
  end, { workers = tonumber(workers), quiet = true })
  assert(#fails == 0 and #res == 240, "the study failed: " .. tostring(fails[1] and fails[1].message))
  print(("CPU %.3f"):format((cpu_all())))
  return
end

-- The driver.
local dir = S.files.tmpdir()
local bin = arg[-1]
local function timed(mode)
  local t0 = core.monotonic()
  local code, out, err = S.proc.run(("%s %s %s %s"):format(q(bin), q(arg[0]), q(dir), mode))
  assert(code == 0, "the " .. mode .. " run failed:\n" .. err)
  return core.monotonic() - t0, tonumber(out:match("CPU ([%d%.]+)"))
end

-- Per figure, in this process: the map alone, then one figure saved as SVG
-- and as PNG by each path (CPU time, after one warm-up figure of each).
local culib = phlox.library { "Cu", "Cl" }
local m = phlox.map { library = culib, element = "Cu", T_C = 150, ligand = "Cl", ligand_activity = 1e-2 }
local NF = 20
local function per(fn)
  fn()
  local c0 = os.clock()
  for _ = 1, NF do fn() end
  return (os.clock() - c0) / NF
end
local cmap = per(function() phlox.map { library = culib, element = "Cu", T_C = 150, ligand = "Cl", ligand_activity = 1e-2 } end)
local function size_of(file)
  local f = assert(io.open(file, "rb"))
  local n = #f:read("a")
  f:close()
  return n
end
local c, one = {}, {}
for _, fmt in ipairs { "svg", "png" } do
  for _, path in ipairs { "new", "ref", "outline" } do
    if fmt == "svg" or path ~= "outline" then
      c[fmt .. path] = per(function() save(m, dir .. "/one." .. fmt, path) end)
      one[fmt .. path] = size_of(dir .. "/one." .. fmt)
    end
  end
end
print(("per figure (Cu-Cl, 150 C; CPU): map %.2f ms; SVG %.2f ms (former path %.2f ms, %.2fx); "
  .. "PNG at %d dpi %.2f ms (former path %.2f ms, %.2fx)"):format(1e3 * cmap, 1e3 * c.svgnew, 1e3 * c.svgref,
  c.svgref / c.svgnew, DPI, 1e3 * c.pngnew, 1e3 * c.pngref, c.pngref / c.pngnew))
print(("per SVG figure: text as <text> %.2f ms, %.1f kB; as glyph outlines %.2f ms, %.1f kB (%.2fx the time, %.1fx the bytes)")
  :format(1e3 * c.svgnew, one.svgnew / 1024, 1e3 * c.svgoutline, one.svgoutline / 1024, c.svgoutline / c.svgnew,
    one.svgoutline / one.svgnew))

-- the study's SVG files: how many, and their mean size in bytes
local function svg_files()
  local bytes, n = 0, 0
  for _, name in ipairs(core.list_dir(dir)) do
    if name:match("%.svg$") and name ~= "one.svg" then
      bytes, n = bytes + size_of(dir .. "/" .. name), n + 1
    end
  end
  return n, bytes / math.max(n, 1)
end
local runs, sizes = {}, {}
for _, mode in ipairs { "svg:1:new", "svg:2:outline", "svg:2:new", "svg:2:ref", "png:2:new", "png:2:ref" } do
  local wall, cpu = timed(mode)
  runs[mode] = { wall = wall, cpu = cpu }
  if mode:match("^svg:2") then sizes[mode] = { svg_files() } end
end
S.files.remove(dir)
local function line(what, mode, ref, target)
  local r, o = runs[mode], runs[ref]
  print(("%s: wall %.2f s, CPU %.2f s (CPU / 2 cores %.2f s)%s%s"):format(what, r.wall, r.cpu, r.cpu / 2,
    o and ("; former path CPU %.2f s (%.2fx)"):format(o.cpu, o.cpu / r.cpu) or "",
    target and ("  [target < %s s]"):format(target) or ""))
end
line("240-map study, one SVG each, 1 process", "svg:1:new")
line("240-map study, one SVG each, 2 workers", "svg:2:new", "svg:2:ref", 1)
local o, t = runs["svg:2:outline"], runs["svg:2:new"]
print(("240-map study, one SVG each, 2 workers, text as glyph outlines: wall %.2f s, CPU %.2f s (CPU / 2 cores %.2f s); "
  .. "SVG <text> takes %.2fx less CPU"):format(o.wall, o.cpu, o.cpu / 2, o.cpu / t.cpu))
line("240-map study with PNG too, 2 workers", "png:2:new", "png:2:ref", 3)
local n, avg = table.unpack(sizes["svg:2:new"])
local _, avg_out = table.unpack(sizes["svg:2:outline"])
print(("the wall times count this machine's load; CPU / 2 is the wall time on 2 idle cores. "
  .. "SVG size: %d files, %.0f kB each on average with <text>, %.0f kB with glyph outlines (%.1fx)")
  :format(n, avg / 1024, avg_out / 1024, avg_out / avg))

-- The held-at-25-C lookup of one map, uncached (every call evaluates each
-- log K species' reaction at 25 C and at T) against the cache.
local lib = phlox.library { "Fe", "Cl" }
local N = 20
local t0 = core.monotonic()
for i = 1, N do phlox.constant_logk(lib, { "Fe", "Cl" }, 423.15 + i * 1e-6, nil, { cache = false }) end
local tu = (core.monotonic() - t0) / N
t0 = core.monotonic()
for _ = 1, N do phlox.constant_logk(lib, { "Fe", "Cl" }, 423.15) end
local tc = (core.monotonic() - t0) / N
t0 = core.monotonic()
for _ = 1, N do phlox.map { library = lib, element = "Fe", T_C = 150, ligand = "Cl" } end
local tm = (core.monotonic() - t0) / N
print(("held-log-K lookup per map (Fe-Cl, 150 C): uncached %.2f ms, cached %.3f ms (%.0fx); a whole map now %.2f ms"):format(
  1e3 * tu, 1e3 * tc, tu / tc, 1e3 * tm))
