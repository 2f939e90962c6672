-- test_provenance.lua: every result carries its own provenance.  Two
-- results made in one run list only the definition files that define their
-- species (a zinc figure made after a copper map does not list Cu.lua or
-- Cl.lua); the checksums equal the SHA-256 of the files in the tree
-- (S.files.sha256; the digest itself is checked by unit.test_sha256); figures,
-- CSV and JSON carry the program version and the source revision the
-- binary was built from (the `git describe` of the tree at configure time,
-- or a note that it was not built from a git checkout), as `phlox
-- --version` prints it.  Environment: PHLOX_BIN, PHLOX_SOURCE_DIR.
local phlox = require "phlox"
local plot = require "phlox.plot"
local export = require "phlox.export"
local core = require "phlox.core"

local S = dofile(assert(os.getenv("PHLOX_SOURCE_DIR"), "PHLOX_SOURCE_DIR is not set (run through ctest)") .. "/tests/support/init.lua")
local BIN, SRC, check = assert(S.BIN, "PHLOX_BIN is not set (run through ctest)"), S.SRC, S.check
local q, read, sha256 = S.files.quote, S.files.read, S.files.sha256
local function names(files)
  local t = {}
  for _, d in ipairs(files) do t[#t + 1] = d.file end
  return table.concat(t, " ")
end

-- The revision: "git <describe>" or the fallback note; --version agrees.
check(core.revision:match("^git %x+") or core.revision:match("^git v?[%w%.%-]+$")
      or core.revision == "not built from a git checkout", "revision: " .. core.revision)
local _, version = S.proc.run(q(BIN) .. " --version")
check(version:find("phlox " .. core.version .. " (" .. core.revision .. ";", 1, true), "--version: " .. version)

local copper = phlox.library { "Cu", "Cl" }
local zinc = phlox.library { "Zn" }
local cu = phlox.map { library = copper, element = "Cu", T_C = 90, ligand = "Cl", ligand_activity = 1e-2 }
local zn = phlox.map { library = zinc, element = "Zn", T_C = 25, exclude = { "ZnO(s)" } }
-- S.lua: CuCl3^2- is estimated with a model reaction of sulfate species (Cl.lua)
check(names(cu.provenance.files) == "stdlib/elements/Cl.lua stdlib/elements/Cu.lua stdlib/elements/HO.lua stdlib/elements/S.lua",
      "copper map files: " .. names(cu.provenance.files))
check(names(zn.provenance.files) == "stdlib/elements/HO.lua stdlib/elements/Zn.lua",
      "zinc map files: " .. names(zn.provenance.files))
check(zn.provenance.conditions.T_C == 25 and zn.provenance.options.exclude[1] == "ZnO(s)"
      and zn.provenance.options.library == nil, "the zinc map keeps its conditions and options")
for _, d in ipairs(cu.provenance.files) do
  check(d.sha256 == sha256(SRC .. "/" .. d.file), d.file .. ": checksum differs from the file's SHA-256")
end

-- One library, several results: each lists the files of its own elements.
local both = phlox.library { "Cu", "Zn", "Cl" }
local zn_only = phlox.map { library = both, element = "Zn" }
check(names(zn_only.provenance.files) == "stdlib/elements/HO.lua stdlib/elements/Zn.lua",
      "Zn map from a Cu-Zn-Cl library: " .. names(zn_only.provenance.files))
local zn_cl = phlox.map { library = both, element = "Zn", ligand = "Cl" }
check(names(zn_cl.provenance.files) == "stdlib/elements/Cl.lua stdlib/elements/HO.lua stdlib/elements/Zn.lua",
      "Zn-Cl map: " .. names(zn_cl.provenance.files))
local sp = assert(phlox.speciate { library = both, totals = { Cu = 1e-6 }, pH = 6 })
check(names(sp.provenance.files) == "stdlib/elements/Cu.lua stdlib/elements/HO.lua",
      "Cu speciation: " .. names(sp.provenance.files))
local fr = phlox.fractions { library = both, element = "Zn", n = 5 }
check(names(fr.provenance.files) == "stdlib/elements/HO.lua stdlib/elements/Zn.lua",
      "Zn fractions: " .. names(fr.provenance.files))

-- Outputs: the zinc figure and table name Zn.lua, not Cu.lua or Cl.lua.
local dir = S.files.tmpdir()
local ok, err = pcall(function()
  plot.map(zn, { file = dir .. "/zn.svg" })
  local svg = read(dir .. "/zn.svg")
  local desc = svg:match("<desc>(.-)</desc>")
  check(desc:find("elements/Zn.lua", 1, true) and desc:find("elements/HO.lua", 1, true), "zinc SVG names its files")
  check(not desc:find("elements/Cu.lua", 1, true) and not desc:find("elements/Cl.lua", 1, true),
        "zinc SVG lists no copper or chloride file:\n" .. desc)
  check(desc:find(core.revision, 1, true), "the SVG stamp carries the source revision")
  plot.map(cu, { file = dir .. "/cu.svg" })
  check(read(dir .. "/cu.svg"):match("<desc>(.-)</desc>"):find("elements/Cl.lua", 1, true), "copper SVG names Cl.lua")

  export.csv(dir .. "/zn.csv", { { a = 1 } }, { columns = { "a" }, from = zn })
  local csv = read(dir .. "/zn.csv")
  check(csv:find("# revision: " .. core.revision, 1, true), "CSV revision line")
  check(csv:find("# data: stdlib/elements/Zn.lua sha256=" .. sha256(SRC .. "/stdlib/elements/Zn.lua"), 1, true),
        "CSV names Zn.lua with its checksum")
  check(not csv:find("Cu.lua", 1, true) and not csv:find("Cl.lua", 1, true), "zinc CSV lists no copper file")
  check(csv:find("# option: exclude = {ZnO(s)}", 1, true), "CSV lists the map's options:\n" .. csv)

  -- several results: the union of their files
  export.json(dir .. "/both.json", { 1 }, { from = { cu, zn } })
  local js = read(dir .. "/both.json")
  for _, f in ipairs({ "Cl", "Cu", "HO", "Zn" }) do
    check(js:find("stdlib/elements/" .. f .. ".lua", 1, true), "JSON of two results names " .. f .. ".lua")
  end
  check(js:find('"revision"', 1, true), "JSON carries the revision")

  -- a result's caveats travel with its provenance (e.g. through a sweep's
  -- journal): a table citing only the provenance still carries the notes
  local hot = phlox.map { library = zinc, element = "Zn", T_C = 150 }
  check(#(hot.provenance.notes or {}) > 0, "a 150 C zinc map has caveats (log K held at 25 C)")
  export.csv(dir .. "/hot.csv", { { a = 1 } }, { columns = { "a" }, from = { hot.provenance } })
  local hot_csv = read(dir .. "/hot.csv")
  local plain_note = hot.provenance.notes[1]:gsub("[{}]", "")
  check(hot_csv:find("# note: " .. plain_note, 1, true), "the note reaches the CSV:\n" .. hot_csv)
  check(not hot_csv:find("[{}]"), "CSV notes are plain text (no typesetting braces):\n" .. hot_csv)
  check(not hot_csv:find("Cu.lua", 1, true), "and only the zinc files")

  -- no result named: every input of the run, and the stamp says so
  export.csv(dir .. "/all.csv", { { a = 1 } }, { columns = { "a" } })
  local all = read(dir .. "/all.csv")
  check(all:find("# data files: every input read by this run", 1, true) and all:find("Cu.lua", 1, true)
        and all:find("Zn.lua", 1, true), "a table with no result named stamps every input, marked")
end)
S.files.remove(dir)
if not ok then error(err, 0) end

-- An estimate rests on its model reaction's records: a result lists the
-- files of those too.  Cr^2+ is estimated with the Co^3+/Co^2+ couple of
-- Co.lua (docs/data/transition-metals.md), so a chromium map at 150 C lists
-- Co.lua; and in general every model species' file of every estimated
-- species of the result's element is listed (read from the records).
local chromium = phlox.library { "Cr" }
local hot_cr = phlox.map { library = chromium, element = "Cr", T_C = 150 }
local listed = names(hot_cr.provenance.files)
check(listed:find("Co.lua", 1, true), "a Cr map lists Co.lua, the file of its model reaction: " .. listed)
for _, lib_el in ipairs { { chromium, "Cr", hot_cr }, { copper, "Cu", phlox.map { library = copper, element = "Cu",
    ligand = "Cl", T_C = 150 } } } do
  local lib, el, m = lib_el[1], lib_el[2], lib_el[3]
  local files = names(m.provenance.files)
  for _, sp in ipairs(lib:list()) do
    if sp.estimate_model and sp.elements[el] then
      for _, t in ipairs(core.reaction_terms(sp.estimate_model)) do
        local rec = t.state ~= "e" and lib:species(t.formula)
        if rec and rec.file then
          check(files:find(rec.file, 1, true), ("%s map: %s (model of %s) is in %s, which is not listed: %s"):format(
            el, t.formula, sp.formula, rec.file, files))
        end
      end
    end
  end
end
print("test_provenance: all checks passed")
