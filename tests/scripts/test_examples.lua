-- test_examples.lua: runs the README's demo study (examples/demo.lua) twice,
-- as a user would, into two temporary folders, and checks what it wrote:
--   * every promised file exists and is not empty;
--   * PNG: the signature and IHDR chunk of the PNG specification (ISO/IEC
--     15948:2004, 5.2 and 11.2.2) with the size the figure options ask for;
--   * SVG: an XML declaration first, </svg> last, and the <title>/<desc>
--     metadata naming the same fields as the exported table;
--   * PDF: the "%PDF-" header (ISO 32000-1, 7.5.2) and one page per map;
--   * CSV (RFC 4180 quoting): the provenance header, with data-file
--     checksums equal to the files' SHA-256 (S.files.sha256), the
--     caution, the expected columns and rectangular rows;
--   * the numbers: boundary slopes equal -(RT ln10/F) nH/ne of the reaction
--     printed beside them (Nernst equation), field areas tile the window,
--     the deaerated potentials lie on the hydrogen line E = -s pH - (s/2)
--     log f(H2) (SHE convention: E of H+/H2 is 0 at every T), the aerated
--     ones on the oxygen line with E0(O2/H2O) = 1.229 V at 25 C (CRC
--     Handbook, electrochemical series), neutral pH 7.00 at 25 C (pKw 13.995,
--     IAPWS R11-07);
--   * reproducibility: the two runs give byte-identical SVG, PDF, CSV and
--     JSON files (DESIGN.md: the same inputs give the same bytes).
-- Environment (tests/CMakeLists.txt): PHLOX_BIN, PHLOX_SOURCE_DIR.
local S = dofile(assert(os.getenv("PHLOX_SOURCE_DIR"), "PHLOX_SOURCE_DIR is not set (run through ctest)") .. "/tests/support/init.lua")
local check, close = S.check, S.close
local quote, read, tmpdir = S.files.quote, S.files.read, S.files.tmpdir

local BIN, SRC = assert(S.BIN, "PHLOX_BIN is not set (run through ctest)"), S.SRC
local DEMO = SRC .. "/examples/demo.lua"
local function slope(T_C) return S.chem.nernst_slope(T_C + 273.15) end

local function run(dir)
  local log = dir .. "/stdout.txt"
  local t0 = os.time()
  local code, text = S.proc.run(("%s %s %s"):format(quote(BIN), quote(DEMO), quote(dir .. "/out")), { merge = true, log = log })
  check(code == 0, ("the demo failed (exit %d):\n%s"):format(code, text))
  print(("test_examples: demo ran in about %d s"):format(os.time() - t0))
  return dir .. "/out", text
end

local dir1, dir2 = tmpdir(), tmpdir()
local function checks()
  local out1, stdout1 = run(dir1)
  local out2 = run(dir2)

  -- What the demo promises (examples/demo.lua, "Wrote ... files").
  local FILES = {
    "Cu-Cl-25C.png", "Cu-Cl-25C.svg", "Cu-Cl-90C.png", "Cu-Cl-90C.svg", "Cu-Cl-150C.png", "Cu-Cl-150C.svg",
    "Cu-Cl-panels.png", "Cu-Cl-pages.pdf", "Cu-domains-90C.png", "Cu-domains-90C.svg",
    "Cu-chloride-90C.png", "Cu-chloride-90C.svg", "Cu-dissolved.png", "Cu-dissolved.svg",
    "boundaries.csv", "fields.csv", "operating-points.csv", "dissolved-copper.csv", "study.json",
  }
  local data = {}
  for _, name in ipairs(FILES) do
    local s = read(out1 .. "/" .. name)
    check(s, "missing output " .. name)
    check(#s > 100, "output too small: " .. name .. " (" .. #s .. " bytes)")
    data[name] = s
    check(stdout1:find(name, 1, true), "the summary does not list " .. name)
  end

  -- stdout: the caution and the illustrative-values notice
  check(stdout1:find("what can form, not how fast", 1, true), "the summary prints the caution")
  check(stdout1:find("illustrative", 1, true), "the summary says which values are illustrative")

  -- PNG: signature, IHDR first, width and height (big-endian) = points x dpi / 72
  local function be32(s, i) local a, b, c, d = s:byte(i, i + 3); return ((a * 256 + b) * 256 + c) * 256 + d end
  local PNG_SIG = "\137PNG\r\n\26\n"
  for name, s in pairs(data) do
    if name:match("%.png$") then
      check(s:sub(1, 8) == PNG_SIG, name .. ": PNG signature")
      check(s:sub(13, 16) == "IHDR" and be32(s, 9) == 13, name .. ": IHDR chunk first")
      check(s:sub(-8, -5) == "IEND", name .. ": ends with IEND")
    end
  end
  -- single maps: 396 x 324 points at 150 dpi (phlox.plot defaults) -> 825 x 675 pixels
  for _, T in ipairs({ 25, 90, 150 }) do
    local s = data[("Cu-Cl-%dC.png"):format(T)]
    check(be32(s, 17) == 825 and be32(s, 21) == 675,
          ("Cu-Cl-%dC.png is %d x %d pixels"):format(T, be32(s, 17), be32(s, 21)))
  end

  -- SVG: XML declaration, root closed last, title and desc present
  for name, s in pairs(data) do
    if name:match("%.svg$") then
      check(s:sub(1, 5) == "<?xml", name .. ": starts with <?xml")
      check(s:match("</svg>%s*$"), name .. ": ends with </svg>")
      check(s:find("<svg ", 1, true) and s:find("<title>", 1, true) and s:find("<desc>", 1, true),
            name .. ": <svg>, <title> and <desc>")
      local opened = select(2, s:gsub("<svg[%s>]", ""))
      local closed = select(2, s:gsub("</svg>", ""))
      check(opened == 1 and closed == 1, name .. ": one root element")
    end
  end

  -- PDF: header, trailer, one page per temperature
  local pdf = data["Cu-Cl-pages.pdf"]
  check(pdf:sub(1, 5) == "%PDF-", "PDF header")
  check(pdf:find("%%EOF%s*$"), "PDF ends with %%EOF")
  check(pdf:match("/Count (%d+)") == "3", "PDF has 3 pages, found " .. tostring(pdf:match("/Count (%d+)")))

  -- CSV --------------------------------------------------------------------------
  local function read_csv(name, columns)
    local htext, cols, rows, nfiles = S.csv.stamped(data[name], name)
    check(htext:find("^# program: phlox "), name .. ": provenance starts with the program")
    check(htext:find("\n# script: [^\n]*demo%.lua sha256=%x+"), name .. ": script and its checksum")
    check(htext:find("what can form, not how fast", 1, true), name .. ": caution in the header")
    check(nfiles >= 3, name .. ": at least the HO, Cu and Cl files are stamped")
    check(table.concat(cols, ",") == table.concat(columns, ","), name .. ": columns are " .. table.concat(cols, ","))
    return rows
  end

  local boundaries = read_csv("boundaries.csv", { "T_C", "species_a", "species_b", "reaction", "line",
    "intercept", "slope_V_per_pH", "pH_1", "E_1", "pH_2", "E_2" })
  local fields = read_csv("fields.csv", { "T_C", "species", "kind", "domain", "area_pH_V",
    "share_percent", "quality" })
  local points = read_csv("operating-points.csv", { "T_C", "state", "pH", "E_V", "ionic_strength",
    "a_Cl", "field", "domain", "solid", "dissolved_Cu", "carrier", "carrier_share_of_dissolved" })
  read_csv("dissolved-copper.csv", { "T_C", "state", "Cl", "pH", "dissolved_Cu" })

  local coefficient = S.chem.coefficient

  -- Nernst: on an E-pH map a boundary has dE/dpH = -(RT ln10/F) nH/ne.
  local nslopes = 0
  for i, b in ipairs(boundaries) do
    local nH, ne = coefficient(b.reaction, "H^+"), coefficient(b.reaction, "e-")
    local T = tonumber(b.T_C)
    if ne == 0 then
      check(b.slope_V_per_pH == "" and b.line:match("^pH = "), ("boundary %d (%s) without electrons is vertical"):format(i, b.reaction))
    else
      close(tonumber(b.slope_V_per_pH), -slope(T) * nH / ne, 1e-9,
            ("slope of boundary %d, %s at %s C"):format(i, b.reaction, b.T_C))
      close(tonumber(b.E_1), tonumber(b.intercept) + tonumber(b.slope_V_per_pH) * tonumber(b.pH_1), 1e-9,
            ("boundary %d: first end on its line"):format(i))
      nslopes = nslopes + 1
    end
  end
  check(nslopes >= 10, "several sloped boundaries checked")

  -- Fields tile the window (14 pH units x 2.8 V) at each temperature and
  -- name the same species as the figure's <desc>.
  local area, species_at = {}, {}
  for _, f in ipairs(fields) do
    local T = tonumber(f.T_C)
    area[T] = (area[T] or 0) + tonumber(f.area_pH_V)
    species_at[T] = species_at[T] or {}
    species_at[T][#species_at[T] + 1] = f.species
  end
  for _, T in ipairs({ 25, 90, 150 }) do
    close(area[T], 14 * 2.8, 1e-9 * 39.2, ("field areas at %d C sum to the window"):format(T))
    local svg = data[("Cu-Cl-%dC.svg"):format(T)]
    local desc = {}
    for sp in svg:gmatch("\nfield: ([^\n]+)") do desc[#desc + 1] = sp end
    table.sort(desc)
    table.sort(species_at[T])
    check(table.concat(desc, " ") == table.concat(species_at[T], " "),
          ("fields at %d C: SVG %s, CSV %s"):format(T, table.concat(desc, " "), table.concat(species_at[T], " ")))
  end
  check(table.concat(species_at[25], " "):find("CuCl2^-", 1, true), "the chloro complex CuCl2^- has a field at 25 C")

  -- Operating points: potentials on the gas lines (Nernst).
  local LOG_F_H2, LOG_F_O2 = -4, -0.67       -- the demo's choices (examples/demo.lua, REDOX)
  local seen = 0
  for _, p in ipairs(points) do
    local T, pH, E = tonumber(p.T_C), tonumber(p.pH), tonumber(p.E_V)
    if p.state == "deaerated" then
      close(E, -slope(T) * pH - slope(T) / 2 * LOG_F_H2, 1e-6, ("deaerated E at %g C on the H2 line"):format(T))
      check(p.domain == "immunity" and p.field == "Cu(s)", ("deaerated water at %g C sits in Cu(s): %s"):format(T, p.field))
      seen = seen + 1
    elseif p.state == "aerated" and T == 25 then
      close(E, 1.229 - slope(T) * pH + slope(T) / 4 * LOG_F_O2, 0.002, "aerated E at 25 C on the O2 line")
      seen = seen + 1
    end
    check(tonumber(p.dissolved_Cu) > 0 and tonumber(p.dissolved_Cu) < 1e-5, "dissolved Cu below the copper offered")
  end
  check(seen == 4, "three deaerated points and the 25 C aerated point checked")

  -- JSON: neutral pH at 25 C
  local ok_json, doc = pcall(S.json.decode, data["study.json"])
  check(ok_json and type(doc) == "table", "study.json is one JSON object: " .. tostring(doc))
  local n25
  for _, m in ipairs(doc.data and doc.data.maps or {}) do
    if m.T_C == 25 then n25 = m.neutral_pH end
  end
  close(n25, 6.9975, 0.01, "neutral pH at 25 C (pKw 13.995, IAPWS R11-07)")
  check(type(doc.caution) == "string" and doc.caution ~= "" and type(doc.provenance) == "table",
        "study.json carries caution and provenance")

  -- Reproducibility: byte-identical text outputs and PDF in the two runs.
  for _, name in ipairs(FILES) do
    if not name:match("%.png$") then
      check(read(out2 .. "/" .. name) == data[name], name .. " differs between two runs")
    end
  end

end

-- The folders are removed whether the checks pass or not.
local ok, err = xpcall(checks, debug.traceback)
S.files.remove(dir1, dir2)
if not ok then error(err, 0) end
print("test_examples: all checks passed")
