--- phlox.options (part of `require "phlox"`): the one option reader and
-- the units and ranges every public function checks its arguments with.
-- Adds to phlox: option_specs (function name -> its option spec, what
-- phlox.help lists), options(fname, spec, opts).
-- Shares (P): T0C (K at 0 C); options (core.options); LIM (core.limits);
-- ACT, I_MAX, COORD, TOTAL_MAX (ranges in the user's units, each with its
-- source); spec(fname, t, with_T) (registers a function's option spec,
-- with the T, T_C and P keys when with_T); temperature(opts, where) (K from
-- T or T_C, 25 C by default); pressure(opts, T, where) (bar: P, else
-- core.default_pressure); check_library(where, lib) (a phlox.library or
-- an error at the caller's line).
local core = require "phlox.core"
local base = require "phlox.base"
local phlox, P = base.phlox, base.P

local T0C = 273.15 -- K at 0 C

-- The one option reader (src/lua/l_opts.c): each public function lists its
-- keys next to it, one line per key: name = "type" or {"type", lo, hi}.
-- Unknown keys, wrong types and values out of range are errors at the
-- caller's line.  See DEVELOPERS.md, "Options".
local options = core.options
local LIM = core.limits
local T_OPTS = {
  T = { "number", LIM.T_min, LIM.T_max },                 -- K
  T_C = { "number", LIM.T_min - T0C, LIM.T_max - T0C },   -- degrees C
  P = { "number", 1e-6, LIM.P_max },                      -- bar
}
-- Ranges in the user's units (the C bindings check the same):
local ACT = { 1e-300, 10 }   -- an activity: positive; above 10 no model holds (common practice, no source)
local I_MAX = 0.5            -- mol/kg: Davies equation, stated range (Davies 1962, from memory of Stumm and Morgan)
local COORD = 1e3            -- |pH|, |E| (V), |log a| of a window: a guard
local TOTAL_MAX = 20         -- mol/kg: common practice, no source
phlox.option_specs = {}      -- function name -> spec (phlox.help lists them)
local function spec(fname, t, with_T)
  if with_T then for k, v in pairs(T_OPTS) do t[k] = v end end
  phlox.option_specs[fname] = t
  return t
end
phlox.options = function(fname, sp, opts)
  if opts == nil then opts = {} end
  return options(fname, sp, opts)
end

local function temperature(opts, where)
  if opts.T and opts.T_C then core.user_error(where .. ": give T (K) or T_C (C), not both") end
  return opts.T or (opts.T_C and opts.T_C + T0C) or 298.15
end

local function pressure(opts, T, where)
  if opts.P ~= nil then return opts.P end
  local P, err = core.default_pressure(T)
  if not P then core.user_error(where .. ": " .. err) end
  return P
end

local function check_library(where, lib)
  if getmetatable(lib) ~= phlox.Library then
    core.user_error(where .. ": library = phlox.library{...} expected, got " .. type(lib))
  end
end

-- for the other modules of phlox (stdlib/phlox/base.lua)
P.T0C, P.options, P.LIM, P.ACT, P.I_MAX, P.COORD, P.TOTAL_MAX, P.spec, P.temperature, P.pressure, P.check_library =
  T0C, options, LIM, ACT, I_MAX, COORD, TOTAL_MAX, spec, temperature, pressure, check_library
