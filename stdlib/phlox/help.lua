--- phlox.help (part of `require "phlox"`): help at the prompt and in
-- scripts.
-- Adds to phlox: help (what a function does and its options with their
-- types and ranges, from the option specs every module registers; the list
-- of functions without an argument) and help_name (the documented name of a
-- function value).  The other modules (plot, export, sweep, diagrams,
-- report) are loaded on demand.
local core = require "phlox.core"
local base = require "phlox.base"
local phlox, P = base.phlox, base.P

--- Help at the prompt and in scripts: phlox.help(phlox.map) or
-- phlox.help("plot.map") prints (and returns) what the function does and its
-- options with their types and ranges; phlox.help() lists the functions.
local SUMMARY = {
  ["phlox.library"] = "phlox.library { \"Fe\", \"S\", user = {...} }: a species library from element files",
  ["phlox.map"] = "phlox.map { library = lib, element = \"Fe\", ... }: an exact predominance map",
  ["phlox.grid_map"] = "phlox.grid_map { library = lib, element = \"Cu\", ... }: a rigorous map (solver on a grid)",
  ["phlox.speciate"] = "phlox.speciate { library = lib, totals = {...}, ... }: full speciation of a water",
  ["phlox.speciate_curve"] = "phlox.speciate_curve(opts, curve): speciation along pH, a log total or a log activity (the curve driver)",
  ["phlox.water"] = "phlox.water { T_C = 25 }: properties of water (IAPWS-95, R8-97, R11-07)",
  ["phlox.constant_logk"] = "phlox.constant_logk(lib, elements, T [, P]): species whose log K is held at 25 C (T in K)",
  ["phlox.locate"] = "phlox.locate(map, x, y): the species of the map at a point",
  ["phlox.to_she"] = "phlox.to_she(E_measured, electrode): a potential on the SHE scale (electrode: SCE, Ag/AgCl, CSE or a full name)",
  ["phlox.where"] = "phlox.where { map = m, pH = 5, E = -0.8, reference = \"SCE\" }: the field a measured potential falls in",
  ["phlox.electrodes"] = "phlox.electrodes(): the reference electrodes (name -> offset, source)",
  ["phlox.make_dir"] = "phlox.make_dir(path): create a folder and its parents (no shell)",
  ["phlox.list_dir"] = "phlox.list_dir(path): sorted names in a folder (no shell)",
  ["phlox.help"] = "phlox.help(function or name): this help",
  ["Library:props"] = "lib:props(formula, { T_C = 25 }): G, H, S, Cp, V of a species",
  ["Library:reaction"] = "lib:reaction(\"A + B = C\", { T_C = 25 }): dG, dH, dS, log K, E of a reaction",
  ["plot.map"] = "plot.map(map, { file = \"fe.svg\", ... }): draw a map",
  ["plot.domains"] = "plot.domains(map, opts): draw the corrosion domains of a map",
  ["plot.grid"] = "plot.grid(maps, opts): maps side by side",
  ["plot.overlay"] = "plot.overlay(maps, opts): maps drawn over each other",
  ["plot.curves"] = "plot.curves(series, opts): curves (fractions, solubility)",
  ["export.csv"] = "export.csv(path, rows, { columns = {...} }): a CSV file with provenance",
  ["export.json"] = "export.json(path, value, opts): a JSON file with provenance",
  ["sweep.run"] = "sweep.run(points, fn, opts): fn over points, failures collected",
  ["sweep.parallel"] = "sweep.parallel(points, fn, { workers = 4 }): the same on worker processes",
  ["phlox.report"] = "phlox.report { file = \"study.html\", sections = {...} }: one self-contained HTML (and PDF) page per study",
  ["diagrams.fractions"] = "diagrams.fractions { library = lib, element = \"Zn\", ... }: distribution curves",
  ["diagrams.solubility"] = "diagrams.solubility { library = lib, element = \"Zn\", T_C = {...} }: solubility curves",
  ["diagrams.series"] = "diagrams.series { library = lib, element = \"Zn\", T_C = {...} }: maps at several temperatures",
  ["diagrams.ligand_E"] = "diagrams.ligand_E { ..., ligand = \"Cl\", pH = 5 }: E against log a(ligand)",
  ["diagrams.pH_ligand"] = "diagrams.pH_ligand { ..., ligand = \"Cl\", E = -0.5 }: log a(ligand) against pH",
}

-- every documented function by value -> its name (modules loaded on demand)
local function help_index()
  local by_fn, specs = {}, {}
  local mods = { phlox = phlox, plot = require "phlox.plot", export = require "phlox.export",
                 sweep = require "phlox.sweep", diagrams = require "phlox.diagrams",
                 report = require "phlox.report" }
  for name in pairs(SUMMARY) do
    local mod, fn = name:match("^(%w+)[%.:](.+)$")
    local t = mod == "Library" and phlox.Library or mods[mod]
    if mod == "phlox" and fn == "report" then t, fn = mods.report, "write" end
    if t and type(t[fn]) == "function" then by_fn[t[fn]] = name end
  end
  for _, m in pairs(mods) do
    for k, v in pairs(m.option_specs or {}) do specs[k] = v end
  end
  return by_fn, specs
end

function phlox.help_name(fn)
  local by_fn = help_index()
  return by_fn[fn]
end

local function range_text(e)
  if type(e) == "string" then return e end
  local t, lo, hi = e[1], e[2], e[3]
  if lo or hi then return ("%s [%g, %g]"):format(t, lo or -math.huge, hi or math.huge) end
  return t
end

function phlox.help(what)
  local by_fn, specs = help_index()
  local name = type(what) == "function" and by_fn[what] or what
  local out = {}
  if name == nil then
    out[1] = "phlox functions (phlox.help(name) for one):"
    local names = {}
    for n in pairs(SUMMARY) do names[#names + 1] = n end
    table.sort(names)
    for _, n in ipairs(names) do out[#out + 1] = "  " .. SUMMARY[n] end
  else
    if type(name) ~= "string" then core.user_error("phlox.help: a phlox function or its name expected, got " .. type(what)) end
    name = name:gsub("^phlox%.plot%.", "plot."):gsub("^phlox%.export%.", "export.")
               :gsub("^phlox%.sweep%.", "sweep."):gsub("^phlox%.diagrams%.", "diagrams.")
    if not SUMMARY[name] then
      local near = {}
      for n in pairs(SUMMARY) do if n:lower():find(name:lower(), 1, true) then near[#near + 1] = n end end
      table.sort(near)
      core.user_error(("phlox.help: no function '%s'%s"):format(name,
        #near > 0 and (" (did you mean " .. table.concat(near, ", ") .. "?)") or ""))
    end
    out[1] = SUMMARY[name]
    local spec = specs[name]
    if spec then
      out[#out + 1] = "options:"
      local keys = {}
      for k in pairs(spec) do keys[#keys + 1] = k end
      table.sort(keys)
      for _, k in ipairs(keys) do
        out[#out + 1] = ("  %-26s %s"):format(k == "*" and "[1], [2], ..." or k, range_text(spec[k]))
      end
    end
  end
  local text = table.concat(out, "\n")
  print(text)
  return text
end
