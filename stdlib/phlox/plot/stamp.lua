--- phlox.plot.stamp: the stamp under a figure and its file's metadata.
--
-- Part of phlox.plot (stdlib/phlox/plot.lua draws; this file writes the
-- provenance text).  Every figure carries the conditions, the program and
-- its revision, the script and the data files with their checksums
-- (phlox.provenance), the caveats of the results drawn and the safety
-- caution; the file's metadata always holds the full text.
-- Contract:
--   stamp.caution             the one-line caution (plot.caution)
--   stamp.stamp_lines(conditions, extra, width, opts)
--                             the full stamp wrapped to `width` points at
--                             text scale opts.text (plot.stamp_lines)
--   stamp.stamp_short(conditions, extra, width, opts)
--                             the short stamp: conditions in brief, the
--                             extra lines' short forms, one line naming the
--                             program, the caution and where the rest is
--                             (plot.stamp_short)
--   stamp.apply_stamp(fig, opts, conditions, extra, title, w, look, from)
--                             prints the stamp opts.stamp asks for ("full",
--                             "short", false, or extra lines in the look's
--                             mode) and writes Title, Description, Software
--                             and Disclaimer into the file's metadata
--   stamp.map_notes(extra, map)   appends map.stamp (with map.stamp_short)
--   stamp.add_reference(extra, ref)  appends the potential scale's lines
-- An extra line is a string or { full = "...", short = "..." | false }.
-- Text widths are measured as the renderer sets them (core.text_width).
local core = require "phlox.core"
local provenance = require "phlox.provenance"
local text = require "phlox.plot.text"
local is_num = require("phlox.plot.check").is_num
local fmt_num, fmt_T = text.fmt_num, text.fmt_T

local stamp = {}

stamp.caution = "Equilibrium thermodynamics: shows what can form, not how fast."

local STAMP_SIZE = 6.5           -- must match PX_STAMP_SIZE in src/render/layout.h
local STAMP_MARGIN = 10          -- points left free across the stamp's width

local COND_NAMES = {
  T_C = function(v) return ("T = %s °C"):format(fmt_num(v)) end,
  P_bar = function(v) return ("P = %s bar"):format(text.number(tonumber(("%.4g"):format(v)))) end,
  activity = function(v) return ("activity of dissolved species = %s"):format(text.number(v)) end,
  ionic_strength = function(v) return ("I = %s mol/kg"):format(text.number(v)) end,
  ligand = function(v) return ("ligand {%s}"):format(v) end,
  ligand_activity = function(v) return ("ligand activity = %s"):format(text.number(v)) end,
  ligand_total = function(v) return ("ligand total = %s mol/kg"):format(text.number(v)) end,
  total = function(v) return ("total of the element = %s mol/kg"):format(text.number(v)) end,
  pH = function(v) return ("pH = %s"):format(fmt_num(v)) end,
  E_V = function(v) return ("E = %s V vs SHE"):format(text.number(v)) end,
  activity_model = function(v) return ("activity model: %s"):format(v) end,
}
local COND_ORDER = { "T_C", "P_bar", "pH", "E_V", "activity", "total", "ionic_strength", "ligand",
                     "ligand_activity", "ligand_total", "activity_model" }

-- A condition key of our own naming, as text: "Zn total (mol/kg)" and
-- "NaOH_mol_kg" read as "Zn total = 10⁻⁶ mol/kg" and "NaOH = 10⁻⁴ mol/kg".
local function other_condition(k, v)
  local val = type(v) == "number" and text.number(v) or tostring(v)
  local name, unit = k:match("^(.-)%s*%((.-)%)$")
  if name then return ("%s = %s %s"):format(name, val, unit) end
  name = k:match("^(.-)_mol_kg$")
  if name then return ("%s = %s mol/kg"):format(name:gsub("_", " "), val) end
  return (k:gsub("_", " ")) .. " = " .. val
end

local function conditions_text(c)
  if type(c) ~= "table" then return nil end
  local parts, seen = {}, {}
  for _, k in ipairs(COND_ORDER) do
    if c[k] ~= nil then
      local named = type(c[k]) == "number" or ((k == "ligand" or k == "activity_model") and type(c[k]) == "string")
      parts[#parts + 1] = named and COND_NAMES[k](c[k]) or (k .. " = " .. tostring(c[k]))
      seen[k] = true
    end
  end
  local rest = {}
  for k in pairs(c) do if not seen[k] then rest[#rest + 1] = k end end
  table.sort(rest)
  for _, k in ipairs(rest) do parts[#parts + 1] = other_condition(k, c[k]) end
  return #parts > 0 and ("conditions: " .. table.concat(parts, ", ")) or nil
end

-- The short form of the conditions: "25 °C, 1 bar, a = 10⁻⁶, I = 0".
local function conditions_short(c)
  if type(c) ~= "table" then return nil end
  local parts = {}
  if is_num(c.T_C) then parts[#parts + 1] = fmt_T(c.T_C) end
  if is_num(c.P_bar) then parts[#parts + 1] = text.number(tonumber(("%.3g"):format(c.P_bar))) .. " bar" end
  if is_num(c.activity) then parts[#parts + 1] = "a = " .. text.number(c.activity) end
  if is_num(c.total) then parts[#parts + 1] = "total " .. text.number(c.total) .. " mol/kg" end
  if is_num(c.ionic_strength) then parts[#parts + 1] = "I = " .. text.number(c.ionic_strength) .. " mol/kg" end
  if type(c.activity_model) == "string" then parts[#parts + 1] = c.activity_model end
  local known = { T_C = true, P_bar = true, activity = true, total = true, ionic_strength = true,
                  activity_model = true, ligand = true, ligand_activity = true, ligand_total = true,
                  pH = true, E_V = true }
  local rest = {}
  for k in pairs(c) do if not known[k] then rest[#rest + 1] = k end end
  table.sort(rest)
  for _, k in ipairs(rest) do parts[#parts + 1] = other_condition(k, c[k]) end
  return #parts > 0 and table.concat(parts, ", ") or nil
end

-- Pieces of a word too long for a line (a checksum on a narrow figure),
-- cut at character boundaries, so nothing is cut off with an ellipsis.
local function split_long(word, width, size)
  if core.text_width(word, size) <= width then return { word } end
  local out, cur = {}, ""
  for ch in word:gmatch(utf8.charpattern) do
    if cur ~= "" and core.text_width(cur .. ch, size) > width then out[#out + 1] = cur; cur = "" end
    cur = cur .. ch
  end
  if cur ~= "" then out[#out + 1] = cur end
  return out
end

-- Break a line at spaces so it fits `width` points at the stamp size.
local function wrap(line, width, size)
  size = size or STAMP_SIZE
  if core.text_width(line, size) <= width then return { line } end
  local out, cur = {}, ""
  local words = {}
  for word in line:gmatch("%S+") do
    for _, piece in ipairs(split_long(word, width - core.text_width("  ", size), size)) do words[#words + 1] = piece end
  end
  for _, word in ipairs(words) do
    local try = cur == "" and word or (cur .. " " .. word)
    if cur ~= "" and core.text_width(try, size) > width then
      out[#out + 1] = cur
      cur = "  " .. word
    else
      cur = try
    end
  end
  if cur ~= "" then out[#out + 1] = cur end
  return out
end

-- An extra stamp line is a string, or { full = "...", short = "..." } (the
-- short form printed on small figures; false leaves it off them).
local function line_full(l) return type(l) == "table" and tostring(l.full or l[1] or "") or tostring(l) end
local function line_short(l)
  if type(l) ~= "table" then return tostring(l) end
  if l.short == false then return nil end
  return tostring(l.short or l.full or l[1] or "")
end

-- The unwrapped full stamp: conditions, program and checksums, extra lines, caution.
local function full_lines(conditions, extra, opts)
  opts = opts or {}
  local st = provenance.stamp(conditions, opts.from)
  local lines = {}
  local c = conditions_text(conditions)
  if c then lines[#lines + 1] = c end
  local prog = "program: " .. st.program .. " (" .. st.revision .. ")"
  if st.script and not opts.no_script then
    prog = prog .. "; script: " .. st.script.file .. " sha256=" .. st.script.sha256
  end
  lines[#lines + 1] = prog
  if st.data_scope then lines[#lines + 1] = "data files: " .. st.data_scope end
  for _, d in ipairs(st.data) do lines[#lines + 1] = "data: " .. d.file .. " sha256=" .. d.sha256 end
  for _, s in ipairs(extra or {}) do lines[#lines + 1] = line_full(s) end
  lines[#lines + 1] = stamp.caution
  return lines, st
end

--- The stamp lines of a figure: conditions, program and checksums, extra
-- lines, the caution; wrapped to the figure width (points) at text scale
-- `opts.text` (default 1).
function stamp.stamp_lines(conditions, extra, width, opts)
  opts = opts or {}
  local ts = opts.text or 1
  local out = {}
  for _, l in ipairs((full_lines(conditions, extra, opts))) do
    for _, w in ipairs(wrap(l, width - STAMP_MARGIN * ts, STAMP_SIZE * ts)) do out[#out + 1] = w end
  end
  return out
end

--- The short stamp: the conditions in brief, the extra lines' short forms,
-- and one line naming the program, the caution and where the rest is.
function stamp.stamp_short(conditions, extra, width, opts)
  opts = opts or {}
  local ts = opts.text or 1
  local lines = {}
  local c = conditions_short(conditions)
  if c then lines[#lines + 1] = c end
  for _, s in ipairs(extra or {}) do
    local t = line_short(s)
    if t and t ~= "" then lines[#lines + 1] = t end
  end
  lines[#lines + 1] = ("phlox %s · what can form, not how fast · full provenance in the file's metadata")
    :format(core.version)
  local out = {}
  for _, l in ipairs(lines) do
    for _, w in ipairs(wrap(l, width - STAMP_MARGIN * ts, STAMP_SIZE * ts)) do out[#out + 1] = w end
  end
  return out
end

-- Text of the metadata: formula braces dropped.
local plain = provenance.plain

-- Print the stamp the options ask for and put the full provenance in the
-- file's metadata.  opts.stamp: "full" | "short" | false, or a list of
-- extra lines (older form: printed in the preset's mode); opts.notes: extra
-- lines.
-- `from`: the results drawn, whose own data files are stamped (default
-- opts.from).
function stamp.apply_stamp(fig, opts, conditions, extra, title, w, look, from)
  from = from or opts.from
  local lines = {}
  for _, l in ipairs(extra or {}) do lines[#lines + 1] = l end
  if type(opts.stamp) == "table" then for _, l in ipairs(opts.stamp) do lines[#lines + 1] = l end end
  for _, l in ipairs(opts.notes or {}) do lines[#lines + 1] = l end
  local full = full_lines(conditions, lines, { from = from, no_script = opts.no_script })
  local desc = {}
  for i, l in ipairs(full) do desc[i] = plain(l) end
  fig:meta("Title", plain(title or "phlox figure"))
  fig:meta("Description", table.concat(desc, "\n"))
  fig:meta("Software", "phlox " .. core.version .. " (" .. core.revision .. ")")
  fig:meta("Disclaimer", stamp.caution)
  local mode = opts.stamp
  if mode == nil or type(mode) == "table" then mode = look.stamp end
  local out = {}
  if mode == "full" then
    out = stamp.stamp_lines(conditions, lines, w, { text = look.text, no_script = opts.no_script, from = from })
    -- a preset promises its panels' size: the full stamp goes below them
    if look.name then fig:stamp_below(true) end
  elseif mode == "short" then
    out = stamp.stamp_short(conditions, lines, w, { text = look.text })
  end
  for _, l in ipairs(out) do fig:stamp(l) end
end

-- A map's stamp lines (map.stamp), each with its short form when the map
-- has one (map.stamp_short[line]), appended to extra.
function stamp.map_notes(extra, map)
  local short = map.stamp_short or {}
  for _, l in ipairs(map.stamp or {}) do
    extra[#extra + 1] = (type(l) == "string" and short[l]) and { full = l, short = short[l] } or l
  end
end

-- The stamp lines of the potential scale: the shift, and the electrode's
-- own note (temperature correction) when it has one.
function stamp.add_reference(extra, ref)
  if ref.offset ~= 0 then
    extra[#extra + 1] = ("potential vs %s = E(SHE) − %s V"):format(ref.name, fmt_num(ref.offset))
  end
  if ref.text then extra[#extra + 1] = ref.text end
end

return stamp
