--- phlox.sweep: ranges of conditions as plain arrays and iterators, their
-- products, and deterministic shards so a batch scheduler (a job array, GNU
-- parallel) can split one sweep over many processes or machines:
--   PHLOX_SHARD=3/8 phlox study.lua   runs the 3rd of 8 shards (1-based)
local sweep = {}

--- n evenly spaced values from a to b inclusive.
function sweep.linear(a, b, n)
  assert(type(a) == "number" and type(b) == "number", "sweep.linear: a and b must be numbers")
  assert(math.type(n) == "integer" and n >= 1, "sweep.linear: n must be an integer >= 1")
  local t = {}
  if n == 1 then return { a } end
  for i = 0, n - 1 do t[i + 1] = a + (b - a) * i / (n - 1) end
  t[n] = b
  return t
end

--- n values from a to b (both > 0) evenly spaced in log10.
function sweep.log(a, b, n)
  assert(type(a) == "number" and a > 0 and type(b) == "number" and b > 0,
         "sweep.log: a and b must be positive numbers")
  local la, lb = math.log(a, 10), math.log(b, 10)
  local t = sweep.linear(la, lb, n)
  for i = 1, #t do t[i] = 10 ^ t[i] end
  t[1], t[#t] = a, b
  return t
end

--- Cartesian product of named ranges, in the order given; the last name
-- varies fastest.  sweep.product({"T", {25, 100}}, {"pH", {4, 7}})
-- -> { {T=25,pH=4}, {T=25,pH=7}, {T=100,pH=4}, {T=100,pH=7} }
function sweep.product(...)
  local axes = { ... }
  for i, ax in ipairs(axes) do
    assert(type(ax) == "table" and type(ax[1]) == "string" and type(ax[2]) == "table",
           ("sweep.product: argument %d must be {name, values}"):format(i))
  end
  local points = {}
  local function rec(k, cur)
    if k > #axes then
      local p = {}
      for name, v in pairs(cur) do p[name] = v end
      points[#points + 1] = p
      return
    end
    for _, v in ipairs(axes[k][2]) do
      cur[axes[k][1]] = v
      rec(k + 1, cur)
    end
    cur[axes[k][1]] = nil
  end
  rec(1, {})
  return points
end

--- The points of shard i of n (1-based, round-robin, so every shard gets a
-- similar mix).  Without arguments, reads PHLOX_SHARD=i/n (all points if
-- unset).
function sweep.shard(points, i, n)
  if i == nil then
    local spec = os.getenv("PHLOX_SHARD")
    if not spec or spec == "" then return points end
    i, n = spec:match("^(%d+)/(%d+)$")
    i, n = tonumber(i), tonumber(n)
    assert(i and n and i >= 1 and i <= n, "PHLOX_SHARD must look like 3/8 (shard 3 of 8)")
  end
  assert(math.type(i) == "integer" and math.type(n) == "integer" and i >= 1 and i <= n,
         "sweep.shard: need 1 <= i <= n")
  local out = {}
  for k = i, #points, n do out[#out + 1] = points[k] end
  return out
end

--- Run fn(point) over the points; returns the results in point order.
-- Shows progress on a terminal (stderr), stays quiet in CI (CI set) or when
-- opts.quiet.  fn may return nil, message to record a failure; failures are
-- collected in the second result rather than stopping the sweep.
local RUN_OPTS = {
  quiet = "boolean",                      -- no progress display
  label = "string",                       -- progress label
}
local PARALLEL_OPTS = {
  quiet = "boolean", label = "string",
  workers = { "integer", 1, 256 },        -- worker processes (1: none)
}
sweep.option_specs = { ["sweep.run"] = RUN_OPTS, ["sweep.parallel"] = PARALLEL_OPTS }
function sweep.run(points, fn, opts)
  local core = require "phlox.core"
  core.check_value("sweep.run", "points", points, "table")
  core.check_value("sweep.run", "fn", fn, "function")
  opts = core.options("sweep.run", RUN_OPTS, opts or {})
  local show = not opts.quiet and not os.getenv("CI") and core.isatty and core.isatty(2)
  local results, failures = {}, {}
  local n = #points
  for k, p in ipairs(points) do
    local r, msg = fn(p)
    if r == nil then failures[#failures + 1] = { index = k, point = p, message = msg } end
    results[k] = r
    if show and (k == n or k % math.max(1, n // 100) == 0) then
      io.stderr:write(("\r%s %d/%d"):format(opts.label or "sweep", k, n))
      if k == n then io.stderr:write("\n") end
    end
  end
  return results, failures
end

-- Serialise plain results (numbers, strings, booleans, nested tables of
-- them) as a Lua chunk; %.17g round-trips every double exactly.
local function serialise(v, out)
  local t = type(v)
  if t == "number" then
    if math.type(v) == "integer" then out[#out + 1] = string.format("%d", v)
    elseif v ~= v then out[#out + 1] = "0/0"
    elseif v == math.huge then out[#out + 1] = "1/0"
    elseif v == -math.huge then out[#out + 1] = "-1/0"
    else out[#out + 1] = string.format("%.17g", v) end
  elseif t == "string" then out[#out + 1] = string.format("%q", v)
  elseif t == "boolean" or t == "nil" then out[#out + 1] = tostring(v)
  elseif t == "table" then
    local keys = {}
    for k in pairs(v) do keys[#keys + 1] = k end
    table.sort(keys, function(a, b)
      if type(a) == type(b) then return a < b end
      return type(a) == "number"
    end)
    out[#out + 1] = "{"
    for _, k in ipairs(keys) do
      out[#out + 1] = "["
      serialise(k, out)
      out[#out + 1] = "]="
      serialise(v[k], out)
      out[#out + 1] = ","
    end
    out[#out + 1] = "}"
  else
    error("sweep.parallel: results must be numbers, strings, booleans or tables, not " .. t, 0)
  end
end

-- the worker's temporary folder and its part files, without a shell
local function remove_tree(core, dir)
  for _, name in ipairs(core.list_dir(dir) or {}) do core.remove(dir .. "/" .. name) end
  core.remove(dir)
end

--- Run fn over the points on several worker processes (the study script is
-- started again once per worker with PHLOX_SHARD=i/n; each worker runs its
-- shard, writes its results and exits), then return the results in point
-- order, exactly as sweep.run would.  opts.workers (default 1: no workers),
-- opts.quiet.  One parallel sweep per script; the script must reach the
-- sweep.parallel call deterministically (the workers rerun it from the top).
function sweep.parallel(points, fn, opts)
  local core = require "phlox.core"
  core.check_value("sweep.parallel", "points", points, "table")
  core.check_value("sweep.parallel", "fn", fn, "function")
  opts = core.options("sweep.parallel", PARALLEL_OPTS, opts or {})
  local spec, dir = os.getenv("PHLOX_SHARD"), os.getenv("PHLOX_SHARD_DIR")
  if spec and dir then -- worker
    local i, n = spec:match("^(%d+)/(%d+)$")
    i, n = tonumber(i), tonumber(n)
    local mine = sweep.shard(points, i, n)
    local res, fails = sweep.run(mine, fn, { quiet = true })
    local out = { "return " }
    serialise({ results = res, n = #mine, failures = fails }, out)
    local ok, err = core.write_atomic(("%s/part-%d"):format(dir, i), table.concat(out))
    if not ok then io.stderr:write("phlox: sweep.parallel worker: ", err, "\n"); os.exit(1, true) end
    os.exit(0, true) -- close the Lua state first (frees everything)
  end
  local n = opts.workers or 1
  if n == 1 or #points < 2 then return sweep.run(points, fn, opts) end
  local script = rawget(_G, "arg") and arg[0]
  assert(script and script ~= "-", "sweep.parallel: workers need a study script file (not -e or stdin)")
  local dir = os.tmpname()
  os.remove(dir)
  local made, merr = core.make_dir(dir)
  if not made then core.user_error("sweep.parallel: " .. merr) end
  -- the same program, options, script and arguments, started directly
  -- (posix_spawn: no shell sees the folder or script names)
  local lo = 0
  while arg[lo - 1] do lo = lo - 1 end
  local words = {}
  for k = lo, #arg do words[#words + 1] = arg[k] end
  local pids, codes = {}, {}
  for i = 1, n do
    local pid, err = core.spawn(words, { PHLOX_SHARD = ("%d/%d"):format(i, n), PHLOX_SHARD_DIR = dir }, true)
    if not pid then
      for _, p in ipairs(pids) do core.wait(p) end
      remove_tree(core, dir)
      core.user_error("sweep.parallel: " .. err)
    end
    pids[i] = pid
  end
  for i = 1, n do
    local exited, code = core.wait(pids[i])
    codes[i] = exited and code or ("signal " .. tostring(code))
  end
  local results, failures = {}, {}
  for i = 1, n do
    local f = io.open(("%s/part-%d"):format(dir, i), "rb")
    if not f then
      remove_tree(core, dir)
      core.user_error(("sweep.parallel: worker %d of %d wrote nothing (exit %s)"):format(i, n, tostring(codes[i])))
    end
    local part = assert(load(f:read("a"), "=part", "t", {}))()
    f:close()
    for k = 1, part.n do results[i + (k - 1) * n] = part.results[k] end
    for _, fl in ipairs(part.failures) do
      fl.index = i + (fl.index - 1) * n
      failures[#failures + 1] = fl
    end
  end
  table.sort(failures, function(a, b) return a.index < b.index end)
  remove_tree(core, dir)
  return results, failures
end

return sweep
