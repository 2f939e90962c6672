--- phlox.electrodes (part of `require "phlox"`): reference electrodes and
-- potentials measured against them.
-- Adds to phlox: electrodes (the core's records by name), electrode_names
-- (short names used on site), electrode (a record by short or full name;
-- errors name the known ones), electrode_at (the offset at T, corrected
-- with the electrode's temperature coefficient inside its range, refused
-- outside it unless the electrode is kept at 25 C; the text goes to the
-- provenance) and to_she (a measured potential on the SHE scale).
local core = require "phlox.core"
local provenance = require "phlox.provenance"
local base = require "phlox.base"
local phlox, P = base.phlox, base.P
local T0C, COORD, spec, temperature =
  P.T0C, P.COORD, P.spec, P.temperature

--- Reference electrodes: name -> { name, offset (V vs SHE at 25 C), dEdT
-- (V/K, the electrode at the test temperature), T_min, T_max (K, where
-- dEdT is used), source, dEdT_source }.
function phlox.electrodes()
  local out = {}
  for i, e in ipairs(core.electrodes()) do e.index = i; out[e.name] = e end
  return out
end

-- Short names used on site for the electrodes of phlox.electrodes().
phlox.electrode_names = {
  SHE = "standard hydrogen electrode",
  SCE = "saturated calomel (Hg/Hg2Cl2, saturated KCl)",
  ["Ag/AgCl"] = "Ag/AgCl, saturated KCl",
  ["Ag/AgCl sat"] = "Ag/AgCl, saturated KCl",
  ["Ag/AgCl 3.5M"] = "Ag/AgCl, 3.5 mol/L KCl",
  CSE = "Cu/CuSO4, saturated",
  ["Cu/CuSO4"] = "Cu/CuSO4, saturated",
}

--- The reference electrode record for a short or full name (errors name
-- the known ones).
function phlox.electrode(name)
  local all = phlox.electrodes()
  local e = all[name] or all[phlox.electrode_names[name] or ""]
  if not e then
    local known = {}
    for k in pairs(phlox.electrode_names) do known[#known + 1] = k end
    table.sort(known)
    core.user_error(("unknown reference electrode '%s' (known: %s, or the full names of phlox.electrodes())")
          :format(tostring(name), table.concat(known, ", ")))
  end
  return e
end

--- The offset (V vs SHE) of an electrode at temperature T (K) and a record
-- of how it was found: { name, offset, T, corrected, valid, text }.
-- Between T_min and T_max the 25 °C offset is corrected with the
-- electrode's temperature coefficient (its source in the text); elsewhere
-- it refuses, unless at_25C is set (the electrode kept at room temperature
-- outside the hot test, thermal junction potential not included).
function phlox.electrode_at(name, T, at_25C, where)
  where = where or "phlox.electrode_at"
  local e = phlox.electrode(name)
  T = T or 298.15
  local info = { name = e.name, T = T, source = e.source }
  if math.abs(T - 298.15) <= 0.5 or e.offset == 0 and e.dEdT == 0 then
    info.offset, info.valid = e.offset, true
    info.text = ("potentials vs %s: offset %.4f V vs SHE (%s)"):format(e.name, e.offset, e.source)
  elseif at_25C then
    info.offset, info.valid = e.offset, false
    info.text = ("potentials vs %s kept at 25 °C (reference_at_25C): offset %.4f V, not corrected to %.1f °C; "
      .. "the thermal junction potential is not included"):format(e.name, e.offset, T - T0C)
  else
    local off, err = core.electrode_offset(e.index, T)
    if not off then
      core.user_error(("%s: %s; the offset is not valid at %.1f °C (give reference_at_25C = true for an electrode kept "
        .. "at room temperature)"):format(where, (err:gsub("(%d+%.%d)%d+", "%1")), T - T0C))
    end
    info.offset, info.valid, info.corrected = off, true, true
    info.text = ("potentials vs %s at %.1f °C: offset %.4f V = %.4f V at 25 °C %+.3g mV/K (%s)"):format(
      e.name, T - T0C, off, e.offset, e.dEdT * 1e3, e.dEdT_source)
  end
  if e.offset ~= 0 then provenance.record_note(info.text) end
  return info
end

--- A potential measured against a reference electrode, on the SHE scale.
--   phlox.to_she(-0.45, "SCE")                  -- 25 °C
--   phlox.to_she(-0.45, "SCE", { T_C = 50 })    -- corrected with dE/dT
--   phlox.to_she(-0.45, "SCE", { T_C = 200, reference_at_25C = true })
-- Returns E_SHE and the record of phlox.electrode_at.
local TO_SHE_OPTS = spec("phlox.to_she", {
  reference_at_25C = "boolean",               -- the electrode is kept at room temperature
}, true)
function phlox.to_she(E_measured, electrode, opts)
  core.check_value("phlox.to_she", "E_measured", E_measured, "number", -COORD, COORD)
  core.check_value("phlox.to_she", "electrode", electrode, "string")
  opts = phlox.options("phlox.to_she", TO_SHE_OPTS, opts)
  local T = temperature(opts, "phlox.to_she")
  local info = phlox.electrode_at(electrode, T, opts.reference_at_25C, "phlox.to_she")
  return E_measured + info.offset, info
end
