-- test_export.lua: JSON encoding (RFC 8259 grammar), CSV quoting (RFC 4180),
-- atomic writes with provenance, and sweep ranges/products/shards.
local json = require "phlox.json"
local export = require "phlox.export"
local sweep = require "phlox.sweep"
local core = require "phlox.core"
local S = dofile(assert(os.getenv("PHLOX_SOURCE_DIR"), "PHLOX_SOURCE_DIR is not set (run through ctest)") .. "/tests/support/init.lua")
local check = S.check

-- JSON: sorted keys, escapes (RFC 8259 section 7), shortest round-trip numbers
check(json.encode({ b = 1, a = "q\"\\\n\1" }) == '{"a":"q\\"\\\\\\n\\u0001","b":1}', "json escapes")
check(json.encode({ 0.1, 1 / 3, 1e300, -2.5, 3 }) == "[0.1,0.333333333333333,1e+300,-2.5,3]"
      or json.encode({ 0.1, 1 / 3, 1e300, -2.5, 3 }) == "[0.1,0.3333333333333333,1e+300,-2.5,3]",
      "json numbers: " .. json.encode({ 0.1, 1 / 3, 1e300, -2.5, 3 }))
for _, x in ipairs({ 0.1, 1 / 3, math.pi, 6.02214076e23, 2^-1074, 123456.789 }) do
  check(tonumber(json.number(x)) == x, "round trip of " .. x)
end
check(json.encode(json.object()) == "{}" and json.encode({}) == "[]", "empty object/array")
check(not pcall(json.encode, { x = 0 / 0 }), "NaN must not encode")
local ok, err = pcall(json.encode, { y = { 1, math.huge } })
check(not ok and err:find("%$%.y%[2%]"), "error names the path: " .. tostring(err))

-- sweeps
local l = sweep.linear(25, 300, 12)
check(#l == 12 and l[1] == 25 and l[12] == 300, "linear")
S.close(l[2], 50, 1e-12, "linear: second point", { strict = true })
local g = sweep.log(1e-6, 1, 7)
check(#g == 7 and g[1] == 1e-6 and g[7] == 1, "log")
S.close(g[4] / 1e-3, 1, 1e-12, "log: fourth point / 1e-3", { strict = true })
local pts = sweep.product({ "T", { 25, 100, 200 } }, { "pH", { 4, 7 } })
check(#pts == 6 and pts[1].T == 25 and pts[1].pH == 4 and pts[2].pH == 7 and pts[3].T == 100, "product order")
local seen = {}
for i = 1, 4 do
  for _, p in ipairs(sweep.shard(pts, i, 4)) do
    local key = p.T .. "/" .. p.pH
    check(not seen[key], "point in two shards")
    seen[key] = true
  end
end
local count = 0
for _ in pairs(seen) do count = count + 1 end
check(count == 6, "shards cover every point")
check(not pcall(sweep.shard, pts, 5, 4), "shard index out of range")
local res, fails = sweep.run(pts, function(p) if p.pH == 7 then return nil, "odd" end return p.T end, { quiet = true })
check(res[1] == 25 and res[2] == nil and #fails == 3 and fails[1].message == "odd", "sweep.run")

-- CSV export: provenance, caution, RFC 4180 quoting, atomic (no temp left)
local dir = S.files.tmpdir()
local path = dir .. "/t.csv"
export.csv(path, { { name = 'a,"b"', x = 0.5 }, { name = "c", x = 2 } },
           { columns = { "name", "x" }, conditions = { T_C = 25 } })
local text = S.files.slurp(path)
check(text:find("# program: phlox " .. core.version, 1, true), "csv provenance")
check(text:find("# condition: T_C = 25", 1, true), "csv conditions")
check(text:find("not how fast", 1, true), "csv caution")
check(text:find('\nname,x\n"a,""b""",0.5\nc,2\n', 1, true), "csv body: " .. text)
local listing = table.concat(core.list_dir(dir), ",")
check(listing == "t.csv", "no temporary file left: " .. listing)
-- the same inputs give the same bytes
export.csv(dir .. "/u.csv", { { name = 'a,"b"', x = 0.5 }, { name = "c", x = 2 } },
           { columns = { "name", "x" }, conditions = { T_C = 25 } })
check(S.files.slurp(dir .. "/u.csv") == text, "deterministic csv")
-- writing into a missing folder fails loudly and leaves nothing
check(not pcall(export.csv, dir .. "/missing/x.csv", {}, { columns = { "a" } }), "csv to a missing folder")
core.remove_tree(dir)
print("test_export: all checks passed")
