-- test_sweep_shards.lua: a real sweep split into shards run through GNU
-- parallel (Debian package `parallel`, installed by .ci/install-deps), then
-- joined by `phlox merge`, writes exactly what a serial run writes:
--   * three shards (PHLOX_SHARD={}/3, two at a time) each write the SVG maps
--     of their points and their own journal, and stop before the summary;
--   * `phlox merge` writes the summary CSV and JSON without computing a
--     point; every file equals the serial run's, byte for byte, and so does
--     the merged journal (the serial run's records are in point order too);
--   * a merge with a shard missing refuses, naming the shard.
-- Environment (tests/CMakeLists.txt): PHLOX_BIN, PHLOX_SOURCE_DIR.
local core = require "phlox.core"

local S = dofile(assert(os.getenv("PHLOX_SOURCE_DIR"), "PHLOX_SOURCE_DIR is not set (run through ctest)") .. "/tests/support/init.lua")
local BIN, SRC, check = assert(S.BIN, "PHLOX_BIN is not set (run through ctest)"), S.SRC, S.check
local q, read = S.files.quote, S.files.read
local STUDY = SRC .. "/tests/fixtures/sweep_study.lua"
local POINTS = 24

local dirs = {}
local function tmpdir() return S.files.tmpdir(dirs) end

local function sh(cmd, log)
  local code, out = S.proc.run(cmd, { merge = true, log = log })
  return code == 0, out
end

local function checks()
  check(S.proc.run("command -v parallel") == 0, "GNU parallel is missing: run sh .ci/install-deps")
  local serial, sharded = tmpdir(), tmpdir()
  local ok, log = sh(("%s %s %s 1"):format(q(BIN), q(STUDY), q(serial)), serial .. ".log")
  check(ok, "the serial run failed:\n" .. log)

  ok, log = sh(("parallel --will-cite --halt now,fail=1 -j 2 'PHLOX_SHARD={}/3 %s %s %s 1' ::: 1 2 3"):format(
    BIN, STUDY, sharded), sharded .. ".log")
  check(ok, "the shards failed under GNU parallel:\n" .. log)
  for i = 1, 3 do
    check(log:find(("shard %d/3 of maps: 8 points in [^\n]*study%%.journal%%.shard%%-%d%%-of%%-3"):format(i, i)),
          "shard " .. i .. " reports its points and journal:\n" .. log)
  end
  check(not read(sharded .. "/summary.csv"), "a shard stops before the summary (it has a third of the results)")

  ok, log = sh(("%s merge %s %s 1"):format(q(BIN), q(STUDY), q(sharded)), sharded .. ".merge.log")
  check(ok, "phlox merge failed:\n" .. log)

  local names = {}
  for _, n in ipairs(assert(core.list_dir(sharded))) do
    if not n:find("%.shard%-%d+%-of%-%d+$") then names[#names + 1] = n end
  end
  local want = assert(core.list_dir(serial))
  check(table.concat(names, " ") == table.concat(want, " "), "merged files:\n  " .. table.concat(names, " ")
    .. "\nserial files:\n  " .. table.concat(want, " "))
  check(#want == POINTS + 3, "24 maps, summary.csv, summary.json and the journal")
  for _, n in ipairs(want) do
    check(read(serial .. "/" .. n) == read(sharded .. "/" .. n), n .. ": the merged output differs from the serial run")
  end

  -- A missing shard: the merge refuses and names it.
  local partial = tmpdir()
  ok, log = sh(("parallel --will-cite -j 2 '%s --shard {}/3 %s %s 1' ::: 1 2"):format(BIN, STUDY, partial), partial .. ".log")
  check(ok, "shards 1 and 2 failed:\n" .. log)
  ok, log = sh(("%s merge %s %s 1"):format(q(BIN), q(STUDY), q(partial)), partial .. ".merge.log")
  check(not ok and log:find("no journal from shard(s) 3 of 3", 1, true), "a merge without shard 3 names it:\n" .. log)
  check(not read(partial .. "/summary.csv"), "a refused merge writes no summary")
end

local ok, err = xpcall(checks, debug.traceback)
for _, d in ipairs(dirs) do S.files.remove(d, d .. ".log", d .. ".merge.log") end
if not ok then error(err, 0) end
print("test_sweep_shards: all checks passed")
