--- phlox.sweep: ranges of conditions as plain arrays and iterators, their
-- products, and deterministic shards so a batch scheduler (a job array, GNU
-- parallel) can split one sweep over many processes or machines:
--   PHLOX_SHARD=3/8 phlox study.lua   runs the 3rd of 8 shards (1-based)
-- A sweep given a journal (opts.journal = "out/study.journal") commits each
-- finished point durably; a rerun skips the finished points, a shard run
-- writes its own journal, and `phlox merge study.lua` joins the shards'
-- journals into what a serial run returns (docs/scale-out.md).
local core = require "phlox.core"
local provenance = require "phlox.provenance"

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

-- sweep.run without journal or workers: fn's results as they are.
-- Shows progress on a terminal (stderr), stays quiet in CI (CI set) or when
-- opts.quiet.
local function run_plain(points, fn, opts)
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
-- them) as a Lua chunk.  %.17g round-trips every double exactly; a float
-- that prints like an integer gets ".0" so it reads back as a float, and
-- NaN keeps its sign bit, so a result read back formats to the same bytes.
local NAN_TEXT = string.format("%.17g", 0 / 0)       -- this platform's 0/0
local function float_text(v)
  if v ~= v then
    return (string.format("%.17g", v) == NAN_TEXT) and "(0/0)" or "(-(0/0))"
  elseif v == math.huge then return "1e999"
  elseif v == -math.huge then return "-1e999" end
  local s = string.format("%.17g", v)
  if not s:find("[.eEn]") then s = s .. ".0" end
  return s
end

local function serialise(v, out, where)
  local t = type(v)
  if t == "number" then
    out[#out + 1] = math.type(v) == "integer" and string.format("%d", v) or float_text(v)
  elseif t == "string" then out[#out + 1] = string.format("%q", v)
  elseif t == "boolean" or t == "nil" then out[#out + 1] = tostring(v)
  elseif t == "table" then
    local keys = {}
    for k in pairs(v) do keys[#keys + 1] = k end
    table.sort(keys, provenance.key_order)
    out[#out + 1] = "{"
    for _, k in ipairs(keys) do
      out[#out + 1] = "["
      serialise(k, out, where)
      out[#out + 1] = "]="
      serialise(v[k], out, where)
      out[#out + 1] = ","
    end
    out[#out + 1] = "}"
  else
    error(("%s: results must be numbers, strings, booleans or tables, not %s"):format(where, t), 0)
  end
end

local function encode(v, where)
  local out = { "return " }
  serialise(v, out, where)
  return table.concat(out)
end

local function decode(text, where)
  local chunk, err = load(text, "=" .. where, "t", {})
  if not chunk then error(where .. ": unreadable record: " .. err, 0) end
  return chunk()
end

-- Journal ------------------------------------------------------------------
-- A journal is a text file: a header naming what the results depend on
-- (script, every input file read so far, the points), then one record per
-- finished point, appended and fsync'd:
--   point <index> <bytes> <sha256 of the payload>\n<payload>\n
-- A record cut short by a crash fails its length or checksum and is dropped
-- (with everything after it) when the sweep resumes.
local MAGIC = "phlox sweep journal 1"
local HEADER_END = "."

local function header_lines(points, label)
  local lines = { MAGIC }
  local st = provenance.stamp()
  if st.script then lines[#lines + 1] = ("script %s %s"):format(st.script.file, st.script.sha256) end
  for _, d in ipairs(provenance.inputs()) do lines[#lines + 1] = ("input %s %s"):format(d.file, d.sha256) end
  lines[#lines + 1] = ("points %d %s"):format(#points, core.sha256(encode(points, label)))
  lines[#lines + 1] = HEADER_END
  return lines
end

local function record_text(k, payload)
  return ("point %d %d %s\n%s\n"):format(k, #payload, core.sha256(payload), payload)
end

-- Parse records from text starting at pos; calls on_record(k, payload) for
-- each whole, checked record; returns the position after the last good one.
local function parse_records(text, pos, on_record)
  while true do
    local k, len, sum, body = text:match("^point (%d+) (%d+) (%x+)\n()", pos)
    if not k then return pos end
    len = tonumber(len)
    local payload = text:sub(body, body + len - 1)
    if #payload ~= len or text:sub(body + len, body + len) ~= "\n" or core.sha256(payload) ~= sum then
      return pos
    end
    on_record(tonumber(k), payload)
    pos = body + len + 1
  end
end

local function read_file(path)
  local f = io.open(path, "rb")
  if not f then return nil end
  local s = f:read("a")
  f:close()
  return s
end

-- Compare a journal's header with the expected lines; on a mismatch, a
-- message naming what changed.
local function check_header(text, expected, path)
  local lines, pos = {}, 1
  while true do
    local line, nxt = text:match("^([^\n]*)\n()", pos)
    if not line then break end
    lines[#lines + 1] = line
    pos = nxt
    if line == HEADER_END then break end
  end
  if lines[1] ~= MAGIC then
    return nil, ("%s is not a phlox sweep journal (first line %q)"):format(path, lines[1] or "")
  end
  if lines[#lines] ~= HEADER_END then return nil, path .. ": the journal's header is cut short" end
  local function index(list)
    local t = {}
    for i = 2, #list - 1 do
      local kind, name, rest = list[i]:match("^(%S+) (%S+) (.*)$")
      if kind then t[kind .. " " .. name] = rest end
    end
    return t
  end
  local was, now = index(lines), index(expected)
  local changes = {}
  for key, v in pairs(now) do
    if was[key] == nil then changes[#changes + 1] = key .. " (not read when the journal was written)"
    elseif was[key] ~= v then changes[#changes + 1] = key .. " (its SHA-256 changed)" end
  end
  for key in pairs(was) do
    if now[key] == nil then changes[#changes + 1] = key .. " (read then, not now)" end
  end
  for key, v in pairs(now) do
    if key:match("^points ") and was[key] ~= v then changes[#changes + 1] = "the sweep's points" end
  end
  if #changes > 0 then
    table.sort(changes)
    return nil, ("%s was written for other inputs: %s changed since. Its results do not "
      .. "belong to this study: remove the journal (and its .shard-* files) to start again"):format(
      path, table.concat(changes, "; "))
  end
  return pos
end

-- Read a journal: done[k] = payload.  Returns the byte length of its good
-- part and the whole length (they differ after a torn last record), or nil
-- when the file does not exist; raises when it belongs to other inputs.
local function read_journal(path, expected, done, where)
  local text = read_file(path)
  if not text then return nil end
  local pos, err = check_header(text, expected, path)
  if not pos then error(where .. ": " .. err, 0) end
  local good = parse_records(text, pos, function(k, payload) done[k] = payload end)
  return good - 1, #text
end

local function open_journal(path, expected, done, where, readonly)
  local good, size = read_journal(path, expected, done, where)
  if readonly then return end
  if not good then
    local ok, err = core.append_sync(path, table.concat(expected, "\n") .. "\n")
    if not ok then error(where .. ": cannot write the journal: " .. err, 0) end
  elseif good < size then -- a record torn by a crash: drop it before appending
    local ok, err = core.truncate(path, good)
    if not ok then error(where .. ": cannot repair the journal: " .. err, 0) end
  end
end

-- Worker processes ------------------------------------------------------------
-- Workers are forked at the sweep call: each shares everything this process
-- has loaded (element files parsed once, the libraries, fn itself).  The
-- parent hands out one point index at a time over a pipe (dynamic work
-- sharing); the worker answers with the point's record.  Workers die with
-- the parent (Linux parent-death signal, and a parent check between
-- points) and write no files of their own.

local function worker_loop(points, fn, rfd, wfd, parent, where)
  local buf = ""
  local function next_line()
    while true do
      local line, rest = buf:match("^([^\n]*)\n(.*)$")
      if line then buf = rest; return line end
      local _, chunk = core.fd_read({ rfd })
      if not chunk or chunk == "" then return nil end
      buf = buf .. chunk
    end
  end
  local ok, err = pcall(function()
    while true do
      local line = next_line()
      if not line or line == "end" then break end
      local k = math.tointeger(tonumber(line))
      if not k or not points[k] then error(where .. ": worker got a bad point index " .. line, 0) end
      local r, msg = fn(points[k])
      local payload = encode({ r = r, m = r == nil and (msg ~= nil and tostring(msg) or false) or nil },
                             ("%s point %d"):format(where, k))
      if core.getppid() ~= parent then core.exit_now(1) end -- orphaned: stop
      if not core.fd_write(wfd, record_text(k, payload)) then core.exit_now(1) end
    end
  end)
  if not ok then
    io.stderr:write("phlox: ", tostring(err), "\n")
    core.exit_now(1)
  end
  core.exit_now(0)
end

-- Run the points of `todo` (indices) on n workers; on_record(k, payload)
-- for each finished point, in the order they finish.
local function run_workers(points, fn, todo, n, on_record, where, show, label)
  local workers = {}
  local function stop_all()
    for _, w in ipairs(workers) do
      if w.to then core.fd_close(w.to); w.to = nil end
      if w.from then core.fd_close(w.from); w.from = nil end
      if w.pid then core.kill(w.pid); core.wait(w.pid); w.pid = nil end
    end
  end
  n = math.min(n, #todo)
  local parent = core.getpid()
  for i = 1, n do
    local pid, to, from = core.fork()
    if not pid then stop_all(); error(where .. ": cannot start worker " .. i .. ": " .. tostring(to), 0) end
    if pid == 0 then -- the worker: drop the earlier workers' pipes, serve points
      for _, w in ipairs(workers) do core.fd_close(w.to); core.fd_close(w.from) end
      worker_loop(points, fn, from, to, parent, where)
    end
    workers[i] = { pid = pid, to = to, from = from, buf = "", id = i }
  end
  local nxt, done, total = 1, 0, #todo
  local function feed(w)
    if nxt <= total then
      w.busy = todo[nxt]
      nxt = nxt + 1
      if not core.fd_write(w.to, w.busy .. "\n") then w.busy = nil end -- worker gone: seen at EOF
    elseif w.to then
      w.busy = nil
      core.fd_write(w.to, "end\n")
      core.fd_close(w.to)
      w.to = nil
    end
  end
  for _, w in ipairs(workers) do feed(w) end
  local failed
  while true do
    local open, fds = {}, {}
    for _, w in ipairs(workers) do
      if w.from then open[#open + 1] = w; fds[#fds + 1] = w.from end
    end
    if #open == 0 then break end
    local i, chunk = core.fd_read(fds)
    if not i then failed = chunk; break end
    local w = open[i]
    if chunk == "" then
      core.fd_close(w.from)
      w.from = nil
      if w.busy then
        failed = ("worker %d stopped while on point %d"):format(w.id, w.busy)
        break
      end
    else
      w.buf = w.buf .. chunk
      local pos = parse_records(w.buf, 1, function(k, payload)
        if k ~= w.busy then error(("%s: worker %d answered point %d, not %s"):format(where, w.id, k, tostring(w.busy)), 0) end
        on_record(k, payload)
        done = done + 1
        if show then io.stderr:write(("\r%s %d/%d"):format(label, done, total)) end
        feed(w)
      end)
      w.buf = w.buf:sub(pos)
    end
  end
  if failed then stop_all(); error(where .. ": " .. failed .. " (finished points are kept in the journal, if any)", 0) end
  for _, w in ipairs(workers) do
    local code = core.wait(w.pid)
    w.pid = nil
    if code ~= 0 then failed = failed or ("worker %d exited with status %s"):format(w.id, tostring(code)) end
  end
  if show then io.stderr:write("\n") end
  if failed then error(where .. ": " .. failed, 0) end
end

-- The sweep engine ------------------------------------------------------------

local function shard_spec()
  local spec = os.getenv("PHLOX_SHARD")
  if not spec or spec == "" then return nil end
  local i, n = spec:match("^(%d+)/(%d+)$")
  i, n = tonumber(i), tonumber(n)
  if not (i and n and i >= 1 and i <= n) then
    error("PHLOX_SHARD must look like 3/8 (shard 3 of 8), not " .. spec, 0)
  end
  return math.tointeger(i), math.tointeger(n)
end

local function shard_path(journal, i, n) return ("%s.shard-%d-of-%d"):format(journal, i, n) end

local function split_path(path)
  local dir, base = path:match("^(.*)/([^/]+)$")
  if not dir then return ".", path end
  return dir == "" and "/" or dir, base
end

-- Merge mode: fold the shard journals of `journal` into done[].
local function fold_shards(journal, expected, done, where)
  local dir, base = split_path(journal)
  local names, err = core.list_dir(dir)
  if not names then error(where .. ": cannot list the shard journals: " .. err, 0) end
  local shards, count = {}, nil
  local pattern = "^" .. base:gsub("[%^%$%(%)%%%.%[%]%*%+%-%?]", "%%%0") .. "%.shard%-(%d+)%-of%-(%d+)$"
  for _, name in ipairs(names) do
    local i, n = name:match(pattern)
    if i then
      i, n = math.tointeger(tonumber(i)), math.tointeger(tonumber(n))
      if count and n ~= count then
        error(("%s: shard journals of %s split the sweep %d and %d ways; keep one set"):format(where, journal, count, n), 0)
      end
      count = n
      shards[i] = dir .. "/" .. name
    end
  end
  if not count then return false end
  local missing = {}
  for i = 1, count do if not shards[i] then missing[#missing + 1] = i end end
  if #missing > 0 then
    error(("%s: no journal from shard(s) %s of %d (%s); run them first"):format(where,
      table.concat(missing, ", "), count, shard_path(journal, missing[1], count)), 0)
  end
  for i = 1, count do read_journal(shards[i], expected, done, where) end
  return count
end

-- opts: journal, workers, quiet, label.  Returns results, failures.
local function execute(points, fn, opts, where)
  local label = opts.label or "sweep"
  local nworkers = opts.workers or 1
  if math.type(nworkers) ~= "integer" or nworkers < 1 then error(where .. ": workers must be an integer >= 1", 3) end
  local journal = opts.journal
  if journal == nil and (nworkers == 1 or #points < 2) then return run_plain(points, fn, opts) end
  if journal ~= nil and type(journal) ~= "string" then error(where .. ": journal must be a file path", 3) end
  local show = not opts.quiet and not os.getenv("CI") and core.isatty and core.isatty(2)

  local done = {}
  local path, shard_i, shard_n
  if journal then
    local expected = header_lines(points, where)
    path = journal
    if os.getenv("PHLOX_MERGE") then
      local n = fold_shards(journal, expected, done, where)
      read_journal(journal, expected, done, where)
      local missing
      for k = 1, #points do if not done[k] then missing = k; break end end
      if missing then
        error(("%s: point %d has no result in %s%s; run the shards (phlox --shard I/N) to the end first"):format(
          where, missing, journal, n and (" or its " .. n .. " shard journals") or ""), 0)
      end
      if n then -- one merged journal, records in point order: later runs read it alone
        local parts = { table.concat(expected, "\n"), "\n" }
        for k = 1, #points do parts[#parts + 1] = record_text(k, done[k]) end
        local ok, err = core.write_atomic(journal, table.concat(parts))
        if not ok then error(where .. ": cannot write the merged journal: " .. err, 0) end
      end
    else
      open_journal(journal, expected, done, where, true)
      local complete = true
      for k = 1, #points do if not done[k] then complete = false; break end end
      shard_i, shard_n = shard_spec()
      if shard_i and not complete then
        path = shard_path(journal, shard_i, shard_n)
        done = {}
        open_journal(path, expected, done, where, false)
      elseif not complete then
        open_journal(path, expected, done, where, false)
      end
    end
  end

  local todo = {}
  for k = 1, #points do
    if not done[k] and (not shard_i or (k - shard_i) % shard_n == 0) then todo[#todo + 1] = k end
  end
  local function on_record(k, payload)
    if path then
      local ok, err = core.append_sync(path, record_text(k, payload))
      if not ok then error(where .. ": cannot append to the journal: " .. err, 0) end
    end
    done[k] = payload
  end
  if #todo > 0 then
    if nworkers > 1 and #todo > 1 then
      run_workers(points, fn, todo, nworkers, on_record, where, show, label)
    else
      for i, k in ipairs(todo) do
        local r, msg = fn(points[k])
        on_record(k, encode({ r = r, m = r == nil and (msg ~= nil and tostring(msg) or false) or nil },
                            ("%s point %d"):format(where, k)))
        if show then io.stderr:write(("\r%s %d/%d%s"):format(label, i, #todo, i == #todo and "\n" or "")) end
      end
    end
  end
  if shard_i then
    io.stderr:write(("phlox: shard %d/%d of %s: %d points in %s; when every shard has run: phlox merge %s\n"):format(
      shard_i, shard_n, label, #todo, path, tostring(rawget(_G, "arg") and arg[0] or "SCRIPT")))
    os.exit(0, true) -- the rest of the script needs every shard: it runs in the merge
  end
  local results, failures = {}, {}
  for k = 1, #points do
    local rec = decode(done[k], ("%s point %d"):format(where, k))
    results[k] = rec.r
    if rec.r == nil then
      failures[#failures + 1] = { index = k, point = points[k], message = rec.m or nil }
    end
  end
  return results, failures
end

-- the options of sweep.run and sweep.parallel (the one reader, src/lua/l_opts.c)
local RUN_OPTS = {
  quiet = "boolean",                      -- no progress display
  label = "string",                       -- progress label
  workers = { "integer", 1, 256 },        -- worker processes (1: none)
  journal = "string",                     -- a file: finished points are kept, a rerun skips them
}
sweep.option_specs = { ["sweep.run"] = RUN_OPTS, ["sweep.parallel"] = RUN_OPTS }

local function checked(points, fn, opts, where)
  core.check_value(where, "points", points, "table")
  core.check_value(where, "fn", fn, "function")
  return core.options(where, RUN_OPTS, opts or {})
end

--- Run fn(point) over the points; returns the results in point order and
-- the failures ({ index, point, message }: fn returned nil, message).
-- opts.quiet, opts.label (progress on a terminal), opts.workers (several
-- processes, see sweep.parallel), opts.journal (a file: finished points are
-- committed there and a rerun skips them; with PHLOX_SHARD=i/n this process
-- runs shard i into <journal>.shard-i-of-n and exits; `phlox merge` joins
-- them).  With a journal or workers, results must be plain data (numbers,
-- strings, booleans, tables of them).
function sweep.run(points, fn, opts)
  return execute(points, fn, checked(points, fn, opts, "sweep.run"), "sweep.run")
end

--- sweep.run on opts.workers worker processes (default 1), forked here:
-- they share what this process has loaded and take points one at a time.
-- Results and failures come back in point order, bit for bit as sweep.run
-- returns them.
function sweep.parallel(points, fn, opts)
  return execute(points, fn, checked(points, fn, opts, "sweep.parallel"), "sweep.parallel")
end

return sweep
