-- test_studies.lua: runs the example studies of examples/ (besides the demo,
-- which test_examples.lua checks) as a user would, into temporary folders,
-- and checks what they wrote:
--   * every file the summary lists exists and is not trivially small; the
--     summary prints which values are illustrative and the caution;
--   * every CSV starts with the provenance of its own results (program,
--     source revision, script, each data file with a SHA-256 equal to that
--     of the file in the tree) and the caution, then rectangular rows;
--   * every SVG carries the caution in its <desc> and writes its coordinates
--     with at most three decimals (compact; 0.001 pt), PNG files the PNG
--     signature (ISO/IEC 15948:2004, 5.2);
--   * every map boundary has the Nernst slope dE/dpH = -(RT ln10/F) nH/ne of
--     the reaction printed beside it (CODATA 2018 R and F), and each map's
--     fields tile its window;
--   * every study, run again into a fresh folder, writes the same bytes in
--     every file (Lua visits string keys in an order that changes between
--     runs: a sum in that order once broke this);
--   * the leach study, a resumable sweep on two worker processes, rerun in
--     the same folder on one process, rewrites the same bytes; the gold
--     study, rerun in its folder, rewrites every file (PNG too) byte for byte;
--   * the gold study's Au(s)/Au(CN)2^- boundaries at 25 C against the
--     published E0 (-0.60 V, from memory of the CRC electrochemical series
--     after Bard, Parsons and Jordan 1985) with the Nernst terms of each
--     map's activities, tolerance 0.02 V (two decimals in the source, medium
--     confidence; the library's NBS data give -0.611 V), and its HCN share
--     crossing one half at pKa 9.21 (from memory of Smith and Martell),
--     tolerance 0.05 (high confidence); its tables stamp CN.lua, where the
--     gold cyanide complexes are defined.
-- Environment (tests/CMakeLists.txt): PHLOX_BIN, PHLOX_SOURCE_DIR.
local S = dofile(assert(os.getenv("PHLOX_SOURCE_DIR"), "PHLOX_SOURCE_DIR is not set (run through ctest)") .. "/tests/support/init.lua")
local BIN, SRC, check = assert(S.BIN, "PHLOX_BIN is not set (run through ctest)"), S.SRC, S.check
local q, read = S.files.quote, S.files.read

local STUDIES = {
  { script = "geothermal_steel.lua", min_files = 9, maps = true },
  { script = "ammonia_leach.lua", min_files = 19, maps = true, args = { "2" } },
  { script = "chromium_groundwater.lua", min_files = 8, maps = true },
  { script = "lead_water_main.lua", min_files = 8, maps = true },
  { script = "gold_cyanide.lua", min_files = 11, maps = true, rerun = true },
}
local AU_CN2_E0 = -0.60     -- V: from memory of the CRC electrochemical series (Bard, Parsons and Jordan 1985)
local HCN_PKA = 9.21        -- from memory of Smith and Martell, Critical Stability Constants (I = 0, 25 C)

-- The gold study's anchors (published values above).
local function gold_anchors(dir)
  local h, _, rows = S.csv.stamped(read(dir .. "/boundaries-Au-CN.csv"), "boundaries-Au-CN.csv")
  check(h:find("\n# data: stdlib/elements/CN.lua sha256=%x+"), "boundaries-Au-CN.csv stamps CN.lua")
  local a_au = tonumber(h:match("\n# condition: activity_Au = ([^\n]+)"))
  check(a_au, "boundaries-Au-CN.csv: activity_Au condition")
  local n = 0
  for _, b in ipairs(rows) do
    if tonumber(b.T_C) == 25 and b.reaction == "Au(CN)2^- + e- = Au(s) + 2 CN^-" then
      local a_cn = tonumber(b.map:match("a%(CN%) ([%d.e+-]+)"))
      local want = AU_CN2_E0 + S.chem.nernst_slope(298.15) * math.log(a_au / a_cn ^ 2, 10)
      S.close(tonumber(b.intercept), want, 0.02, "Au(s)/Au(CN)2^- boundary of " .. b.map)
      n = n + 1
    end
  end
  check(n == 3, "three 25 C gold boundaries checked, got " .. n)
  local _, _, share = S.csv.stamped(read(dir .. "/HCN-share.csv"), "HCN-share.csv")
  local cross
  for i = 2, #share do
    local a, b = share[i - 1], share[i]
    if tonumber(a.T_C) == 25 and tonumber(b.T_C) == 25 and tonumber(a.HCN_share) >= 0.5 and tonumber(b.HCN_share) < 0.5 then
      local ya, yb = tonumber(a.HCN_share), tonumber(b.HCN_share)
      cross = tonumber(a.pH) + (tonumber(b.pH) - tonumber(a.pH)) * (ya - 0.5) / (ya - yb)
    end
  end
  check(cross, "HCN share crosses one half at 25 C")
  S.close(cross, HCN_PKA, 0.05, "pH of half HCN at 25 C (pKa)")
end

local function read_csv(text, name)
  local h, _, rows, nfiles = S.csv.stamped(text, name)
  check(h:find("^# program: phlox "), name .. ": provenance starts with the program")
  check(h:find("\n# revision: ", 1, true), name .. ": the source revision")
  check(h:find("\n# script: [^\n]*%.lua sha256=%x+"), name .. ": script and its checksum")
  check(h:find("what can form, not how fast", 1, true), name .. ": caution")
  check(not h:find("every input read by this run", 1, true), name .. ": stamps its own results' files")
  check(nfiles >= 2, name .. ": at least HO.lua and the metal's file")
  return rows
end

local dirs = {}
local function run(study, dir, extra)
  local args = { q(BIN), q(SRC .. "/examples/" .. study.script), q(dir) }
  for _, a in ipairs(extra or study.args or {}) do args[#args + 1] = q(a) end
  local log = dir .. ".log"
  local code, out = S.proc.run(table.concat(args, " "), { merge = true, log = log })
  check(code == 0, study.script .. " failed:\n" .. out)
  return out
end

local function checks()
  for _, study in ipairs(STUDIES) do
    local dir = os.tmpname()
    os.remove(dir)
    dirs[#dirs + 1] = dir
    local t0 = os.time()
    local out = run(study, dir)
    print(("test_studies: %s ran in about %d s"):format(study.script, os.time() - t0))
    check(out:find("Illustrative: ", 1, true), study.script .. ": says which values are illustrative")
    check(out:find("what can form, not how fast", 1, true), study.script .. ": prints the caution")
    local list = out:match("Wrote %d+ files to [^\n]-/: ([^\n]+)")
    check(list, study.script .. ": lists the files it wrote")
    local files = {}
    for name in list:gmatch("[^,%s]+") do files[#files + 1] = name end
    check(#files >= study.min_files, ("%s: %d files, expected %d"):format(study.script, #files, study.min_files))
    local nernst, tiled = 0, 0
    for _, name in ipairs(files) do
      local s = read(dir .. "/" .. name)
      check(s and #s > 200, study.script .. ": missing or tiny output " .. name)
      if name:match("%.svg$") then
        local desc = s:match("<desc>(.-)</desc>") or ""
        check(desc:find("what can form, not how fast", 1, true), name .. ": the caution in the SVG <desc>")
        local drawing = s:gsub("<desc>.-</desc>", ""):gsub("<title>.-</title>", ""):gsub("<metadata.-</metadata>", "")
          :gsub(">[^<]*</tspan>", "></tspan>") -- the words of <text>, not its coordinates
        check(not drawing:find("%d%.%d%d%d%d"), name .. ": coordinates carry at most three decimals (0.001 pt)")
      elseif name:match("%.png$") then
        check(s:sub(1, 8) == "\137PNG\r\n\26\n", name .. ": PNG signature")
      elseif name:match("%.csv$") then
        local rows = read_csv(s, name)
        if name:match("^boundaries%-") then
          for i, b in ipairs(rows) do
            local want = S.chem.boundary_slope(b.reaction, tonumber(b.T_C))
            if want then
              S.close(tonumber(b.slope_V_per_pH), want, 1e-9,
                      ("%s row %d (%s): slope vs Nernst, V per pH"):format(name, i, b.reaction), { strict = true })
              nernst = nernst + 1
            end
          end
        elseif name:match("^fields%-") then
          local area, window = {}, {}
          for _, f in ipairs(rows) do
            area[f.map] = (area[f.map] or 0) + tonumber(f.area_pH_V)
            window[f.map] = tonumber(f.window_pH_V)
          end
          for m, a in pairs(area) do
            S.close(a, window[m], 1e-9 * window[m], ("%s: summed field area of %s vs its window"):format(name, m),
                    { strict = true, source = "1e-9 of the window" })
            tiled = tiled + 1
          end
        end
      end
    end
    check(nernst >= 3 and tiled >= 1, study.script .. ": Nernst slopes and tiling checked")
    if study.script == "gold_cyanide.lua" then gold_anchors(dir) end
    do -- the same study again in a fresh folder (no journal to resume from): the same bytes, every file
      local dir2 = os.tmpname()
      os.remove(dir2)
      dirs[#dirs + 1] = dir2
      run(study, dir2)
      for _, name in ipairs(files) do
        check(read(dir2 .. "/" .. name) == read(dir .. "/" .. name),
              study.script .. ": " .. name .. " differs between two fresh runs")
      end
    end
    if study.rerun then -- the same study in the same folder: the same bytes, every file
      local before = {}
      for _, name in ipairs(files) do before[name] = read(dir .. "/" .. name) end
      run(study, dir)
      for _, name in ipairs(files) do
        check(read(dir .. "/" .. name) == before[name], study.script .. ": " .. name .. " differs on the rerun")
      end
    end
    if study.script == "ammonia_leach.lua" then -- resume on one worker: same bytes
      local before = {}
      for _, name in ipairs(files) do before[name] = read(dir .. "/" .. name) end
      run(study, dir, { "1" })
      for _, name in ipairs(files) do
        check(read(dir .. "/" .. name) == before[name] or name:match("%.png$"), name .. " differs on the rerun")
      end
    end
  end
end

local ok, err = xpcall(checks, debug.traceback)
for _, d in ipairs(dirs) do S.files.remove(d, d .. ".log") end
if not ok then error(err, 0) end
print("test_studies: all checks passed")
