-- test_stdlib_check.lua: every standard-library element file passes
-- `phlox check` (the sandboxed loader's structural, unit, membership,
-- balance and Gibbs-Helmholtz checks; docs/element-files.md, "Checks").
-- The files are checked together in load order (the built-in H/O file,
-- the metals, then the ligands Cl S C N P F, then ligand groups such as
-- CN), so reactants defined in earlier
-- files resolve.  Warnings are allowed and listed; any error fails the test.
local bin = assert(os.getenv("PHLOX_BIN"), "PHLOX_BIN not set")
local src = assert(os.getenv("PHLOX_SOURCE_DIR"), "PHLOX_SOURCE_DIR not set")
local dir = src .. "/stdlib/elements"
local S = dofile(src .. "/tests/support/init.lua")

local LIGANDS = { "Cl", "S", "C", "N", "P", "F" }
local is_ligand = {}
for _, l in ipairs(LIGANDS) do is_ligand[l] = true end

-- every element file in the folder (a new file cannot be forgotten)
local present = {}
for _, name in ipairs(assert(require("phlox.core").list_dir(dir))) do
  local sym = name:match("^(%u%a?)%.lua$")
  if sym then present[sym] = true end
end
assert(present.HO, "stdlib/elements/HO.lua missing")

local order = { "HO" }
local metals = {}
-- polyatomic ligand groups (CN.lua: two capitals) load after the ligands,
-- as phlox.library loads them
local groups = {}
for sym in pairs(present) do
  if sym:match("^%u%u$") and sym ~= "HO" then groups[#groups + 1] = sym
  elseif sym ~= "HO" and not is_ligand[sym] then metals[#metals + 1] = sym end
end
table.sort(metals)
table.sort(groups)
for _, m in ipairs(metals) do order[#order + 1] = m end
for _, l in ipairs(LIGANDS) do
  assert(present[l], "ligand file missing: " .. l .. ".lua")
  order[#order + 1] = l
end
for _, g in ipairs(groups) do order[#order + 1] = g end
local n_files = 0
for _ in pairs(present) do n_files = n_files + 1 end
assert(#order == n_files, ("ordered %d files of %d"):format(#order, n_files))

local args = {}
for _, sym in ipairs(order) do args[#args + 1] = string.format("%q", dir .. "/" .. sym .. ".lua") end
local code, out = S.proc.run(string.format("%q check %s", bin, table.concat(args, " ")), { merge = true })

local warnings, errors = {}, {}
for line in out:gmatch("[^\n]+") do
  if line:find(": warning: ", 1, true) then warnings[#warnings + 1] = line
  elseif not line:find("^phlox check: ") then errors[#errors + 1] = line end
end
print(("phlox check over %d files (%s)"):format(#order, table.concat(order, " ")))
print(("%d warning(s):"):format(#warnings))
for _, w in ipairs(warnings) do print("  " .. w) end
local summary = out:match("phlox check: [^\n]+")
print(summary or "(no summary line)")
if #errors > 0 then
  for _, e in ipairs(errors) do print("ERROR: " .. e) end
end
assert(code == 0, "phlox check exited with " .. tostring(code))
assert(#errors == 0, #errors .. " error line(s)")
assert(summary and summary:find((" %d file%%(s%%), 0 error%%(s%%)"):format(#order)), "unexpected summary: " .. tostring(summary))

-- the check can fail: a copy of Zn.lua with a sign slip in S of Zn(s) must be rejected
local text = S.files.slurp(dir .. "/Zn.lua")
local bad, n = text:gsub("S = 41%.63", "S = -41.63", 1)
assert(n == 1, "Zn.lua: S = 41.63 not found (update this mutation)")
local tmp = os.tmpname() .. "-Zn.lua"
S.files.write(tmp, bad)
local code2, out2 = S.proc.run(string.format("%q check %q", bin, tmp), { merge = true })
os.remove(tmp)
assert(code2 ~= 0 and out2:find("Zn(s): S", 1, true), "mutated Zn.lua was not rejected:\n" .. out2)
print("mutation (Zn(s) S = -41.63) rejected as expected")
print("test_stdlib_check: all files pass")
