-- test_support.lua: the shared test helpers of tests/support (check, soft
-- checks, CSV, JSON, seeded random numbers, constants and map look-ups,
-- files, running programs) on inputs with known answers, including
-- malformed ones, so a helper that stops failing cannot hide a test's
-- failure.  Sources: the examples of RFC 4180 (sec. 2, rules 5-7) and of
-- RFC 8259 (sec. 13), both from memory of the RFCs; the generator's first
-- value computed by hand from its recurrence.
local SUP = assert(os.getenv("PHLOX_SOURCE_DIR"), "PHLOX_SOURCE_DIR is not set (run through ctest)")
            .. "/tests/support/"
local T = dofile(SUP .. "check.lua")
local CSV = dofile(SUP .. "csv.lua")
local JSON = dofile(SUP .. "json.lua")
local RNG = dofile(SUP .. "rng.lua")
local K = dofile(SUP .. "chem.lua")
local check = T.check

-- check, close, rel, near: pass and fail where they should, NaN never passes
check(pcall(T.close, 1.0, 1.05, 0.1, "close"), "close passes inside the tolerance")
check(not pcall(T.close, 1.0, 1.2, 0.1, "close"), "close fails outside")
check(not pcall(T.close, 0 / 0, 0, 1, "close"), "close fails on NaN")
check(not pcall(T.close, nil, 0, 1, "close"), "close fails on nil")
check(pcall(T.rel, 105, 100, 0.06, "rel") and not pcall(T.rel, 107, 100, 0.06, "rel"), "rel")
check(T.near(1, 1 + 1e-12, 1e-9) and not T.near(1, 2, 0.5), "near")
-- strict bounds: on the bound itself (|1 - 1.5| = 0.5, 0.5 x 100 = 50, all
-- exact in binary) <= passes and < fails; a misspelt option is refused
check(pcall(T.close, 1, 1.5, 0.5, "close") and not pcall(T.close, 1, 1.5, 0.5, "close", { strict = true }),
      "close: strict excludes the bound")
check(pcall(T.close, 1, 1.25, 0.5, "close", { strict = true }), "close: strict passes inside")
check(pcall(T.rel, 150, 100, 0.5, "rel") and not pcall(T.rel, 150, 100, 0.5, "rel", { strict = true })
      and pcall(T.rel, 140, 100, 0.5, "rel", { strict = true }), "rel: strict excludes the bound")
check(T.near(1, 1.5, 0.5) and not T.near(1, 1.5, 0.5, { strict = true }), "near: strict excludes the bound")
check(not T.near(0 / 0, 0, 1, { strict = true }) and not pcall(T.close, 0 / 0, 0, 1, "close", { strict = true }),
      "strict: NaN never passes")
check(not pcall(T.close, 1, 1, 0.5, "close", { stirct = true }) and not pcall(T.near, 1, 1, 0.5, "strict")
      and not pcall(T.rel, 1, 1, 0.5, "rel", { strcit = true }), "unknown or misshapen options are refused")
local ok, err = pcall(T.close, 1, 2, 0.5, "the thing", { strict = true, source = "from the test's note" })
check(not ok and tostring(err):find("the thing: 1 vs 2 (tolerance < 0.5, from the test's note)", 1, true),
      "message names what, both values, the strict tolerance and its source: " .. tostring(err))
ok, err = pcall(T.rel, 1, 2, 0.25, "ratio")
check(not ok and tostring(err):find("ratio: 1 vs 2 (relative tolerance 0.25)", 1, true), "rel message: " .. tostring(err))
ok, err = pcall(T.check, false, "the message")
check(not ok and tostring(err):find("the message", 1, true), "check raises the message")

-- CSV (RFC 4180 sec. 2: rule 6, commas in quotes; rule 7, "" for a quote)
local f = CSV.split('"aaa","b,bb","c""cc",,x')
check(#f == 5 and f[1] == "aaa" and f[2] == "b,bb" and f[3] == 'c"cc' and f[4] == "" and f[5] == "x",
      "split: " .. table.concat(f or {}, "|"))
check(CSV.split("") and #CSV.split("") == 1, "an empty line is one empty field")
check(not CSV.split('a,"b'), "an unterminated quote is refused")
check(not CSV.split('a,"b"c'), "text after a closing quote is refused")
local header, rows = CSV.parse('name,value\r\n"x, y",1\r\n\r\n"multi\nline",2\n')
check(#header == 2 and #rows == 2, "parse: header and two rows (blank line skipped)")
check(rows[1].name == "x, y" and rows[1].value == "1" and rows[2].name == "multi\nline", "parse: fields")
check(not pcall(CSV.read, SUP .. "no-such-file.csv"), "a missing file is an error")
check(#CSV.rows(SUP .. "../reference/standard_potentials.csv") == #CSV.reference("standard_potentials.csv")
      and CSV.reference("standard_potentials.csv")[1].couple, "rows and reference read the same rows")
local v, src = CSV.ref_value("standard_potentials.csv", "couple", "2 H^+ + 2 e- = H2(g)", "E0_V_SHE_25C")
check(v == 0 and src:find("hydrogen electrode", 1, true), "ref_value reads the SHE row")
check(not pcall(CSV.ref_value, "standard_potentials.csv", "couple", "no such couple", "E0_V_SHE_25C"),
      "ref_value fails on a missing row")

-- JSON (RFC 8259 sec. 13 example, shortened)
local doc = JSON.decode([[
{ "Image": { "Width": 800, "Height": 600, "Title": "View from 15th Floor",
    "Thumbnail": { "Url": "http://www.example.com/image/481989943", "Height": 125, "Width": 100 },
    "Animated" : false, "IDs": [116, 943, 234, 38793] } }]])
check(doc.Image.Width == 800 and doc.Image.Thumbnail.Height == 125 and doc.Image.Animated == false,
      "JSON object members")
check(#doc.Image.IDs == 4 and doc.Image.IDs[4] == 38793, "JSON array")
local s = JSON.decode('["a\\"b\\\\c\\/\\n\\u00e9\\ud834\\udd1e", -0.5e-3, null, true]')
check(s[1] == 'a"b\\c/\n\u{e9}\u{1d11e}', "JSON string escapes and a surrogate pair")
check(s[2] == -0.5e-3 and s[3] == JSON.null and s[4] == true, "JSON number, null, true")
for _, bad in ipairs { "{", "[1,]", '{"a" 1}', '"\\x"', "01", "1 2", '"\\ud834"', "nul", "" } do
  check(not pcall(JSON.decode, bad), "malformed JSON refused: " .. bad)
end

-- seeded random numbers: replayable, in [0, 1), first value by hand:
-- (12345 * 1103515245 + 12345) mod 2^31 = 1406932606
local a, b = RNG.new(12345), RNG.new(12345)
check(a() == 1406932606 / 2147483648, "first value of seed 12345")
b()
local lo, hi = 1, 0
for _ = 1, 10000 do
  local x = b()
  check(x == a(), "the same seed replays the same sequence")
  lo, hi = math.min(lo, x), math.max(hi, x)
end
check(lo >= 0 and hi < 1 and lo < 0.01 and hi > 0.99, "values cover [0, 1)")
-- chem: the Nernst slope at 25 C is 59.16 mV per decade (textbook value,
-- e.g. Bard and Faulkner 2001, Electrochemical Methods, 2nd ed., from memory)
T.close(K.nernst_slope(298.15), 0.05916, 1e-5, "Nernst slope at 25 C")
local map = { boundaries = { { between = { "A", "B" } }, { between = { "C", "B" } } },
              fields = { { area = 1.5 }, { area = 2.5 } } }
check(K.boundary(map, "B", "C") == map.boundaries[2], "boundary in either order")
check(not pcall(K.boundary, map, "A", "C"), "a missing boundary is an error")
check(K.area_sum(map) == 4, "area sum")
local fmap = { fields = { { species = "A", area = 1 }, { species = "B(s)", area = 2 } } }
check(K.fields(fmap)["B(s)"] == fmap.fields[2] and K.fields(fmap).C == nil, "fields by species")
check(K.stamp_line({ "a: x", "b: y.z" }, "y.z") == "b: y.z" and K.stamp_line({ "a: xyz" }, "x.z") == nil
      and K.stamp_line(nil, "a") == nil, "stamp_line finds plain text")
-- Zn(OH)2(s) + 2 H^+ + 2 e- = Zn(s) + 2 H2O(l): nH = 2, ne = 2, so the
-- boundary falls by one Nernst slope per pH unit
check(K.coefficient("Zn(OH)2(s) + 2 H^+ + 2 e- = Zn(s) + 2 H2O(l)", "H^+") == 2
      and K.coefficient("Zn(OH)2(s) + 2 H^+ + 2 e- = Zn(s) + 2 H2O(l)", "H2O(l)") == -2
      and K.coefficient("Zn^2+ + 2 e- = Zn(s)", "H^+") == 0, "reaction coefficients")
T.close(K.boundary_slope("Zn(OH)2(s) + 2 H^+ + 2 e- = Zn(s) + 2 H2O(l)", 25), -K.nernst_slope(298.15), 1e-15,
        "boundary slope")
check(K.boundary_slope("Zn^2+ + 2 OH^- = Zn(OH)2(s)", 25) == nil, "no electrons: no E-pH slope")
-- files: read, slurp, quote, tmpdir, mkdir, remove, sha256
local FL = dofile(SUP .. "files.lua")
check(FL.quote("a'b") == "'a'\\''b'", "shell quoting: " .. FL.quote("a'b"))
local d = FL.tmpdir()
local fh = assert(io.open(d .. "/x.txt", "wb")); fh:write("bytes\0\n"); fh:close()
check(FL.read(d .. "/x.txt") == "bytes\0\n" and FL.slurp(d .. "/x.txt") == "bytes\0\n", "read and slurp")
check(FL.read(d .. "/missing") == nil and not pcall(FL.slurp, d .. "/missing"), "a missing file")
FL.write(d .. "/abc.txt", "abc")
-- SHA-256("abc") of FIPS 180-2, appendix B.1 (from memory of the standard)
check(FL.sha256(d .. "/abc.txt") == "ba7816bf8f01cfea414140de5dae2223b00361a396177a9cb410ff61f20015ad",
      "sha256 of 'abc'")
local dirs = {}
local d2 = FL.tmpdir(dirs)
check(dirs[1] == d2, "tmpdir lists the folder")
FL.mkdir(d2 .. "/a b/it's")
FL.write(d2 .. "/a b/it's/f", "x")
check(FL.read(d2 .. "/a b/it's/f") == "x", "mkdir makes the parents too (names with a space and a quote)")
FL.remove(d2, d2 .. "/no-such-file")
check(FL.read(d2 .. "/a b/it's/f") == nil and not io.open(d2), "remove takes the whole folder, skips what is missing")
-- a stamped CSV: header, columns, rows; a ragged row is refused
local okst, h, cols, srows, nf = pcall(CSV.stamped, "# program: x\na,b\n1,2\n3,4\n", "t.csv")
check(okst and h == "# program: x" and #cols == 2 and #srows == 2 and srows[2].b == "4" and nf == 0,
      "stamped CSV: " .. tostring(h))
check(not pcall(CSV.stamped, "# x\na,b\n1\n", "t.csv"), "a ragged stamped CSV is refused")
check(not pcall(CSV.cells, 'a,"b'), "cells raises on a malformed line")
FL.remove(d)

-- soft checks go on after a failure and raise at the end
local sc = T.soft()
check(sc.check(true, "fine") and not sc.check(false, "first") and #sc.failures == 1
      and sc.failures[1] == "first", "soft check records the failure")
check(pcall(T.soft().finish, "problems"), "finish without failures passes")
local okf, errf = pcall(sc.finish, "problems")
check(not okf and tostring(errf):find("1 problems", 1, true), "finish raises the count: " .. tostring(errf))

-- proc: exit codes, the two output streams, stdin, merge, a kept log
local PR = dofile(SUP .. "proc.lua")
local code, out, err = PR.run("printf out; printf err >&2; exit 3")
check(code == 3 and out == "out" and err == "err", ("run: %s %q %q"):format(code, out, err))
code, out = PR.run("cat; printf err >&2", { stdin = "in\0put", merge = true })
check(code == 0 and out == "in\0puterr", "run with stdin and merged streams: " .. out)
code, out = PR.run("cat")
check(code == 0 and out == "", "stdin is empty unless given")
code = PR.run("kill -9 $$")
check(code == 128 + 9, "a signal's exit code is 128 + its number: " .. code)
local logf = os.tmpname()
code, out = PR.run("printf logged", { log = logf })
check(code == 0 and out == "logged" and FL.read(logf) == "logged", "run keeps its log")
os.remove(logf)

-- init.lua gathers them all
local S = dofile(SUP .. "init.lua")
check(S.check and S.close and S.rel and S.near and S.csv.split and S.json.decode and S.rng.new
      and S.chem.nernst_slope and S.files.slurp and S.proc.run and S.soft and S.reporter, "init.lua gathers every helper")
print("test_support: all checks passed")
