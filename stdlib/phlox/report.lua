--- phlox.report: one self-contained page per study.
--
--   phlox.report {
--     file = "out/study.html",          -- the HTML page (required, ".html")
--     pdf = "out/study.pdf",            -- optional: the same content as a PDF
--     title = "Copper tubing in a district-heating loop",
--     summary = "..." or { "paragraph", ... },
--     sections = {
--       { heading = "Maps", text = "..." or { ... },
--         figures = { { figure = fig, caption = "..." }, ... },   -- phlox.Figure (phlox.plot)
--         tables = { { caption = "...", columns = { "T / °C", "pH" }, rows = { { 25, 7.0 }, ... } } } },
--     },
--     notes = { "data note", ... },     -- data notes: sources, held log K, estimates
--     conditions = { T_C = 25, ... },   -- optional: listed with the provenance
--   }
--
-- The HTML page holds everything itself: the figures as inline SVG (no
-- file or network resource), the tables, the data notes, the provenance
-- (program, script and data files with their SHA-256) and the caution that
-- a diagram says what can form, not how fast, and defers to the applicable
-- codes, standards and licensed engineering practice.  The PDF holds the
-- same text on A4 pages, drawn by the figure renderer (cairo), followed by
-- one page per figure.  Formulas in braces ("{Fe^2+}") are typeset in both.
-- Both files are written atomically; equal inputs give equal bytes.
local core = require "phlox.core"
local provenance = require "phlox.provenance"

local report = {}

local A4_W, A4_H = 595.28, 841.89   -- points (ISO 216 A4, 210 x 297 mm)
local MARGIN = 56                   -- points: about 2 cm
local SIZE = { title = 16, heading = 12, text = 9.5, table = 8, small = 7.5 }
local LEADING = 1.4                 -- line height, times the font size
local INK, GREY = { 0, 0, 0 }, { 0.35, 0.35, 0.35 }

local function fail(msg) error("phlox.report: " .. msg, 3) end

-- Options ------------------------------------------------------------------

local function paragraphs(v, what)
  if v == nil then return {} end
  if type(v) == "string" then return { v } end
  if type(v) ~= "table" then fail(what .. " must be a string or a list of strings") end
  for i, p in ipairs(v) do
    if type(p) ~= "string" then fail(("%s[%d] must be a string"):format(what, i)) end
  end
  return v
end

-- the options (the one reader, src/lua/l_opts.c): one line per key
local REPORT_OPTS = {
  file = "string",                        -- the HTML page (required, ".html")
  pdf = "string",                         -- the same content as a PDF
  title = "string",
  summary = "string/strings",             -- a paragraph or a list of them
  sections = "table",                     -- { heading, text, figures, tables }, ...
  notes = "table",                        -- data notes
  conditions = "table",                   -- listed with the provenance
  replace = "boolean",                    -- also replace a symbolic link or a read-only file
}
report.option_specs = { ["phlox.report"] = REPORT_OPTS }

local function check(opts)
  core.options("phlox.report", REPORT_OPTS, opts)
  if type(opts.file) ~= "string" or not opts.file:match("%.html?$") then fail("file = \"name.html\" expected") end
  if opts.pdf ~= nil and (type(opts.pdf) ~= "string" or not opts.pdf:match("%.pdf$")) then
    fail("pdf must be a file name ending in .pdf")
  end
  if type(opts.title) ~= "string" or opts.title == "" then fail("title (a string) expected") end
  local sections = opts.sections or {}
  if type(sections) ~= "table" then fail("sections must be a list") end
  for i, s in ipairs(sections) do
    local where = ("sections[%d]"):format(i)
    if type(s) ~= "table" or type(s.heading) ~= "string" then fail(where .. ".heading (a string) expected") end
    paragraphs(s.text, where .. ".text")
    for k, f in ipairs(s.figures or {}) do
      if type(f) ~= "table" or getmetatable(f.figure) == nil or type(f.figure.render) ~= "function" then
        fail(("%s.figures[%d].figure must be a figure (what phlox.plot returns)"):format(where, k))
      end
    end
    for k, t in ipairs(s.tables or {}) do
      local tw = ("%s.tables[%d]"):format(where, k)
      if type(t) ~= "table" or type(t.columns) ~= "table" or type(t.rows) ~= "table" then
        fail(tw .. " needs columns and rows lists")
      end
      for r, row in ipairs(t.rows) do
        if type(row) ~= "table" or #row ~= #t.columns then
          fail(("%s.rows[%d] needs %d cells (one per column)"):format(tw, r, #t.columns))
        end
      end
    end
  end
  paragraphs(opts.notes, "notes")
  return sections
end

-- Text ----------------------------------------------------------------------

local function cell_text(v)
  if type(v) == "number" then
    if v == math.floor(v) and math.abs(v) < 1e15 then return ("%d"):format(v) end
    return (("%.6g"):format(v))
  end
  return tostring(v)
end

local function esc(s)
  return (s:gsub("[&<>\"]", { ["&"] = "&amp;", ["<"] = "&lt;", [">"] = "&gt;", ['"'] = "&quot;" }))
end

-- HTML of plain text with formulas in braces, typeset as the figures do
-- (core.text_runs: subscript counts, superscript charges).
local function html(s)
  local out = {}
  local pos = 1
  while true do
    local a, b, f = s:find("{([^{}]*)}", pos)
    out[#out + 1] = esc(s:sub(pos, (a or #s + 1) - 1))
    if not a then break end
    for _, r in ipairs(core.text_runs(f, true)) do
      local t = esc(r.text)
      out[#out + 1] = r.kind == "sub" and ("<sub>" .. t .. "</sub>") or r.kind == "sup" and ("<sup>" .. t .. "</sup>") or t
    end
    pos = b + 1
  end
  return table.concat(out)
end

local function plain(s) return (s:gsub("[{}]", "")) end

-- The figure's SVG for inline use: no XML prolog, and its ids (glyphs,
-- clips, surfaces) prefixed so several figures on one page do not share them.
local function inline_svg(fig, k)
  local svg = assert(fig:render("svg"))
  svg = svg:gsub("^%s*<%?xml.-%?>%s*", "")
  local p = ("f%d-"):format(k)
  svg = svg:gsub('id="', 'id="' .. p):gsub('href="#', 'href="#' .. p):gsub("url%(#", "url(#" .. p)
  return svg
end

local CSS = [[
body { font-family: "DejaVu Sans", sans-serif; color: #111; margin: 0; background: #fff; }
main { max-width: 52rem; margin: 0 auto; padding: 1.5rem; line-height: 1.45; }
h1 { font-size: 1.6rem; margin: 0 0 0.3rem; }
h2 { font-size: 1.2rem; margin: 1.6rem 0 0.4rem; border-bottom: 1px solid #ccc; }
.meta { color: #555; font-size: 0.85rem; }
.caution { border-left: 4px solid #a05a00; background: #fbf3e6; padding: 0.6rem 0.9rem; }
figure { margin: 1rem 0; }
figure svg { max-width: 100%; height: auto; display: block; }
figcaption { font-size: 0.9rem; color: #333; }
table { border-collapse: collapse; margin: 0.8rem 0; font-size: 0.85rem; }
th, td { border: 1px solid #bbb; padding: 0.2rem 0.5rem; text-align: left; }
th { background: #eee; }
td.num { text-align: right; font-variant-numeric: tabular-nums; }
code { font-size: 0.8rem; word-break: break-all; }
]]

-- The provenance rows: program, script, data files, conditions.
local function provenance_rows(conditions)
  local st = provenance.stamp(conditions)
  local rows = { { "program", st.program } }
  if st.script then rows[#rows + 1] = { "script", st.script.file .. "  sha256=" .. st.script.sha256 } end
  for _, d in ipairs(st.data) do rows[#rows + 1] = { "data", d.file .. "  sha256=" .. d.sha256 } end
  local keys = {}
  for k in pairs(conditions or {}) do keys[#keys + 1] = k end
  table.sort(keys)
  for _, k in ipairs(keys) do rows[#rows + 1] = { "condition", k .. " = " .. cell_text(conditions[k]) } end
  return rows
end

local function write_html(opts, sections, caution)
  local h = {}
  local function w(s) h[#h + 1] = s end
  w('<!DOCTYPE html>\n<html lang="en">\n<head>\n<meta charset="utf-8">\n')
  w('<meta name="generator" content="phlox ' .. esc(core.version) .. '">\n')
  w("<title>" .. esc(plain(opts.title)) .. "</title>\n<style>\n" .. CSS .. "</style>\n</head>\n<body>\n<main>\n")
  w("<h1>" .. html(opts.title) .. "</h1>\n")
  w('<p class="meta">Study report written by phlox ' .. esc(core.version) .. ".</p>\n")
  w('<p class="caution"><strong>Caution.</strong> ' .. html(caution) .. "</p>\n")
  for _, p in ipairs(paragraphs(opts.summary)) do w("<p>" .. html(p) .. "</p>\n") end
  local nfig, ntab = 0, 0
  for _, s in ipairs(sections) do
    w("<section>\n<h2>" .. html(s.heading) .. "</h2>\n")
    for _, p in ipairs(paragraphs(s.text)) do w("<p>" .. html(p) .. "</p>\n") end
    for _, f in ipairs(s.figures or {}) do
      nfig = nfig + 1
      w('<figure id="figure-' .. nfig .. '">\n' .. inline_svg(f.figure, nfig) .. "\n")
      w("<figcaption>Figure " .. nfig .. (f.caption and (". " .. html(f.caption)) or "") .. "</figcaption>\n</figure>\n")
    end
    for _, t in ipairs(s.tables or {}) do
      ntab = ntab + 1
      w("<table>\n<caption>Table " .. ntab .. (t.caption and (". " .. html(t.caption)) or "") .. "</caption>\n<thead><tr>")
      for _, c in ipairs(t.columns) do w("<th>" .. html(tostring(c)) .. "</th>") end
      w("</tr></thead>\n<tbody>\n")
      for _, row in ipairs(t.rows) do
        w("<tr>")
        for _, v in ipairs(row) do
          w((type(v) == "number" and '<td class="num">' or "<td>") .. html(cell_text(v)) .. "</td>")
        end
        w("</tr>\n")
      end
      w("</tbody>\n</table>\n")
    end
    w("</section>\n")
  end
  local notes = paragraphs(opts.notes)
  if #notes > 0 then
    w("<section>\n<h2>Data notes</h2>\n<ul>\n")
    for _, n in ipairs(notes) do w("<li>" .. html(n) .. "</li>\n") end
    w("</ul>\n</section>\n")
  end
  w("<section>\n<h2>Provenance</h2>\n<table>\n<tbody>\n")
  for _, r in ipairs(provenance_rows(opts.conditions)) do
    w("<tr><th>" .. esc(r[1]) .. "</th><td><code>" .. esc(r[2]) .. "</code></td></tr>\n")
  end
  w("</tbody>\n</table>\n</section>\n</main>\n</body>\n</html>\n")
  local ok, err = core.write_atomic(opts.file, table.concat(h), opts.replace)
  if not ok then fail(err) end
  return nfig, ntab
end

-- PDF: A4 text pages drawn with the figure renderer, then the figures -------

local function pdf_pages(opts, sections, caution)
  local pages, fig, y = {}, nil, 0
  local width = A4_W - 2 * MARGIN
  local function new_page()
    fig = core.figure(A4_W, A4_H, 1, 1)
    fig:bare(1)
    fig:axes(1, 0, A4_W, A4_H, 0)   -- data units: points from the top left
    pages[#pages + 1] = fig
    y = MARGIN
    fig:text(1, MARGIN, A4_H - MARGIN / 2, ("%s · page %d"):format(plain(opts.title), #pages), false, SIZE.small, GREY)
  end
  local function room(h) if y + h > A4_H - MARGIN then new_page() end end
  local function line(text, size, color, indent)
    room(size * LEADING)
    y = y + size * LEADING
    fig:text(1, MARGIN + (indent or 0), y - size * 0.3, text, false, size, color or INK)
  end
  local function para(text, size, color, indent)
    size = size or SIZE.text
    local cur = ""
    for word in text:gmatch("%S+") do
      local try = cur == "" and word or (cur .. " " .. word)
      if cur ~= "" and core.text_width(try, size) > width - (indent or 0) then
        line(cur, size, color, indent)
        cur = word
      else
        cur = try
      end
    end
    if cur ~= "" then line(cur, size, color, indent) end
    y = y + size * 0.5
  end
  local function heading(text) room(SIZE.heading * 4); y = y + SIZE.heading * 0.6; line(text, SIZE.heading) end
  local function tbl(columns, rows, caption)
    local size = SIZE.table
    local function widths(sz)
      local ws, total = {}, 0
      for c, name in ipairs(columns) do
        local m = core.text_width(tostring(name), sz)
        for _, r in ipairs(rows) do m = math.max(m, core.text_width(cell_text(r[c]), sz)) end
        ws[c] = m + 10
        total = total + ws[c]
      end
      return ws, total
    end
    local ws, total = widths(size)
    if total > width then size = size * width / total; ws, total = widths(size) end
    if caption then para(caption, SIZE.text) end
    local function row(cells, color)
      room(size * LEADING)
      y = y + size * LEADING
      local x = MARGIN
      for c, v in ipairs(cells) do
        fig:text(1, x, y - size * 0.3, cell_text(v), false, size, color or INK)
        x = x + ws[c]
      end
    end
    row(columns, GREY)
    fig:line(1, { MARGIN, MARGIN + total }, { y + 2, y + 2 }, GREY, 0.5, "solid")
    for _, r in ipairs(rows) do row(r) end
    y = y + size
  end
  new_page()
  y = y + SIZE.title * 0.4
  para(opts.title, SIZE.title)
  para("Study report written by phlox " .. core.version .. ".", SIZE.small, GREY)
  para("Caution. " .. caution, SIZE.text, { 0.45, 0.25, 0 })
  for _, p in ipairs(paragraphs(opts.summary)) do para(p) end
  local figures, nfig, ntab = {}, 0, 0
  for _, s in ipairs(sections) do
    heading(s.heading)
    for _, p in ipairs(paragraphs(s.text)) do para(p) end
    for _, f in ipairs(s.figures or {}) do
      nfig = nfig + 1
      figures[nfig] = f.figure
      para(("Figure %d%s (on a page of its own at the end)"):format(nfig, f.caption and (". " .. f.caption) or ""))
    end
    for _, t in ipairs(s.tables or {}) do
      ntab = ntab + 1
      tbl(t.columns, t.rows, ("Table %d%s"):format(ntab, t.caption and (". " .. t.caption) or ""))
    end
  end
  local notes = paragraphs(opts.notes)
  if #notes > 0 then
    heading("Data notes")
    for _, n in ipairs(notes) do para("• " .. n) end
  end
  heading("Provenance")
  for _, r in ipairs(provenance_rows(opts.conditions)) do para(r[1] .. ": " .. r[2], SIZE.small) end
  local first = pages[1]
  local desc = {}
  for _, r in ipairs(provenance_rows(opts.conditions)) do desc[#desc + 1] = r[1] .. ": " .. r[2] end
  first:meta("Title", plain(opts.title))
  first:meta("Description", table.concat(desc, "\n"))
  first:meta("Disclaimer", plain(caution))
  local all = {}
  for _, p in ipairs(pages) do all[#all + 1] = p end
  for _, f in ipairs(figures) do all[#all + 1] = f end
  local ok, err = core.pdf_pages(opts.pdf, all)
  if not ok then fail(err) end
  return #pages, #figures
end

--- Write the report; returns { figures, tables, pdf_pages } (counts).
function report.write(opts)
  local sections = check(opts)
  local caution = require("phlox").caution
  local nfig, ntab = write_html(opts, sections, caution)
  local out = { figures = nfig, tables = ntab }
  if opts.pdf then
    local text_pages, fig_pages = pdf_pages(opts, sections, caution)
    out.pdf_pages = text_pages + fig_pages
  end
  return out
end

return report
