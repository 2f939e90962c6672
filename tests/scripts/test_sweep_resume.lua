-- test_sweep_resume.lua: a journaled sweep (phlox.sweep, opts.journal)
-- killed at random moments resumes to the same bytes as a run never
-- interrupted.  The study (tests/fixtures/sweep_study.lua) writes 24 SVG
-- maps inside the sweep and a CSV and JSON summary after it.
--   * kill -9 of the parent of a parallel sweep (3 random moments), then a
--     run to the end: every output equals the clean run's bytes; after each
--     kill no worker survives (they die with the parent) and no temporary
--     or part file is left;
--   * the same with a serial sweep (kill -9, then SIGTERM);
--   * kill -9 of one worker: the parent stops with a message naming it, the
--     journal keeps the finished points, a rerun ends identical;
--   * a record cut short (a crash inside a write) is dropped and redone;
--   * an edited script or element file makes the rerun refuse the journal
--     with a message naming what changed (SHA-256 in the journal header).
-- The random moments come from a seed printed at the start (PHLOX_TEST_SEED
-- repeats a run).  Environment (tests/CMakeLists.txt): PHLOX_BIN,
-- PHLOX_SOURCE_DIR.
local core = require "phlox.core"

local S = dofile(assert(os.getenv("PHLOX_SOURCE_DIR"), "PHLOX_SOURCE_DIR is not set (run through ctest)") .. "/tests/support/init.lua")
local BIN, SRC, check = assert(S.BIN, "PHLOX_BIN is not set (run through ctest)"), S.SRC, S.check
local q, read, write = S.files.quote, S.files.read, S.files.write
local STUDY = SRC .. "/tests/fixtures/sweep_study.lua"
local POINTS = 24

local seed = tonumber(os.getenv("PHLOX_TEST_SEED") or "") or os.time()
local random = S.rng.new(seed)
print("test_sweep_resume: seed " .. seed)

local dirs = {}
local function tmpdir() return S.files.tmpdir(dirs) end

-- Run the study to the end; returns ok, output.
local function run(dir, workers, extra, script)
  local log = dir .. ".log"
  local code, out = S.proc.run(("%s %s %s %s %s"):format(q(BIN), extra or "", q(script or STUDY), q(dir),
    tostring(workers or 1)), { merge = true, log = log })
  return code == 0, out
end

-- Start the study, wait `delay` seconds, send `sig` to the parent (or to
-- its first worker with target = "worker"); returns the exit status text.
local function run_killed(dir, workers, delay, sig, target)
  local log = dir .. ".log"
  local kill
  if target == "worker" then -- the workers are the parent's children
    kill = ("w=$(ps -o pid= --ppid $p | head -n 1); [ -n \"$w\" ] && kill -%s $w"):format(sig)
  else
    kill = ("kill -%s $p"):format(sig)
  end
  local cmd = ("%s %s %s %d > %s 2>&1 & p=$!; sleep %.3f; %s 2>/dev/null; wait $p; echo $? > %s"):format(
    q(BIN), q(STUDY), q(dir), workers, q(log), delay, kill, q(dir .. ".status"))
  S.proc.run(cmd)
  return (read(dir .. ".status") or "?"):gsub("%s+$", ""), read(log) or ""
end

-- Processes whose command line names `dir` (the study's workers carry it).
local function alive_with(dir)
  local found = {}
  for _, name in ipairs(assert(core.list_dir("/proc"))) do
    if name:match("^%d+$") then
      local cmd = read("/proc/" .. name .. "/cmdline")
      if cmd and cmd:find(dir, 1, true) and cmd:find("sweep_study", 1, true) then found[#found + 1] = name end
    end
  end
  return found
end

local function no_survivors(dir, what)
  local left
  for _ = 1, 50 do   -- up to 5 s for the kernel to reap them
    left = alive_with(dir)
    if #left == 0 then return end
    S.proc.run("sleep 0.1")
  end
  error(what .. ": processes still running after their parent died: " .. table.concat(left, " "))
end

local function journal_points(dir)
  local text = read(dir .. "/study.journal") or ""
  local seen, n = {}, 0
  for k in text:gmatch("\npoint (%d+) ") do
    check(not seen[k], "point " .. k .. " committed twice")
    seen[k] = true
    n = n + 1
  end
  return n
end

local function no_temporaries(dir, what)
  for _, name in ipairs(assert(core.list_dir(dir))) do
    check(not name:find(".tmp-", 1, true) and not name:find("^part"), what .. ": left behind " .. name)
  end
end

local function same_outputs(clean, dir, what)
  local a, b = assert(core.list_dir(clean)), assert(core.list_dir(dir))
  check(table.concat(a, " ") == table.concat(b, " "),
        ("%s: files differ:\n  clean:   %s\n  resumed: %s"):format(what, table.concat(a, " "), table.concat(b, " ")))
  local n = 0
  for _, name in ipairs(a) do
    if name ~= "study.journal" then
      check(read(clean .. "/" .. name) == read(dir .. "/" .. name), what .. ": " .. name .. " differs from the clean run")
      n = n + 1
    end
  end
  check(n == POINTS + 2, what .. ": " .. n .. " outputs compared")
end

local function checks()
  local clean = tmpdir()
  local ok, out = run(clean, 1)
  check(ok, "the clean run failed:\n" .. out)
  check(journal_points(clean) == POINTS, "the clean run committed every point")

  -- Kill -9 (and TERM) at random moments, resume, compare.
  local function scenario(name, workers, kills)
    local dir = tmpdir()
    local last = 0
    for i, k in ipairs(kills) do
      local delay = 0.15 + random() * 1.2
      local status, log = run_killed(dir, workers, delay, k.sig, k.target)
      local n = journal_points(dir)
      print(("test_sweep_resume: %s, %s %s after %.2f s: exit %s, %d/%d points committed"):format(
        name, k.sig, k.target or "parent", delay, status, n, POINTS))
      check(n >= last, name .. ": the journal lost points")
      last = n
      if k.target == "worker" and status ~= "0" then
        check(log:find("worker %d+ stopped while on point %d+") or log:find("worker %d+ exited"),
              name .. ": the parent names the dead worker:\n" .. log)
      end
      no_survivors(dir, ("%s, kill %d"):format(name, i))
      no_temporaries(dir, name)
    end
    local ok2, out2 = run(dir, workers)
    check(ok2, name .. ": the resumed run failed:\n" .. out2)
    check(journal_points(dir) == POINTS, name .. ": every point committed once")
    no_temporaries(dir, name)
    same_outputs(clean, dir, name)
    return dir
  end
  scenario("parallel sweep", 2, { { sig = "KILL" }, { sig = "KILL" }, { sig = "KILL" } })
  local serial = scenario("serial sweep", 1, { { sig = "KILL" }, { sig = "KILL" }, { sig = "TERM" } })
  scenario("a worker killed", 2, { { sig = "KILL", target = "worker" }, { sig = "KILL" } })

  -- A torn last record: cut the journal inside its last record and rerun.
  local j = serial .. "/study.journal"
  local text = read(j)
  write(j, text:sub(1, #text - 40))
  check(journal_points(serial) == POINTS, "the torn record's header line is still there")
  local ok3, out3 = run(serial, 1)
  check(ok3, "rerun after a torn record failed:\n" .. out3)
  check(journal_points(serial) == POINTS and #read(j) == #text, "the torn record was dropped and redone")
  same_outputs(clean, serial, "torn record")

  -- Changed inputs: the journal is refused, naming what changed.
  local work = tmpdir()
  local script = work .. "/study.lua"
  write(script, read(STUDY))
  S.files.mkdir(work .. "/lib/elements")
  write(work .. "/lib/elements/Ni.lua", read(SRC .. "/stdlib/elements/Ni.lua"))
  local out4 = work .. "/out"
  S.files.mkdir(out4)
  local function small(extra)
    local log = work .. "/log"
    local code = S.proc.run(("%s --path %s %s %s 1 Ni"):format(q(BIN), q(work .. "/lib"), q(script), q(out4)),
                            { merge = true, log = log })
    return code == 0, read(log) or ""
  end
  local ok5, log5 = small()
  check(ok5, "the small study failed:\n" .. log5)
  write(work .. "/lib/elements/Ni.lua", read(work .. "/lib/elements/Ni.lua") .. "\n-- edited\n")
  local ok6, log6 = small()
  check(not ok6, "a rerun with an edited element file must refuse the journal")
  check(log6:find("input " .. work .. "/lib/elements/Ni.lua (its SHA-256 changed)", 1, true)
        and log6:find("remove the journal", 1, true), "the message names the edited element file:\n" .. log6)
  write(work .. "/lib/elements/Ni.lua", read(SRC .. "/stdlib/elements/Ni.lua"))
  local ok7, log7 = small()
  check(ok7, "with the element file restored the journal is accepted again:\n" .. log7)
  write(script, read(script) .. "\n-- edited\n")
  local ok8, log8 = small()
  check(not ok8 and log8:find("script " .. script .. " (its SHA-256 changed)", 1, true),
        "an edited script is named:\n" .. log8)
end

local ok, err = xpcall(checks, debug.traceback)
for _, d in ipairs(dirs) do S.files.remove(d, d .. ".log", d .. ".status") end
if not ok then error(err, 0) end
print("test_sweep_resume: all checks passed")
