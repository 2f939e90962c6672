--- phlox.base: the table `require "phlox"` returns, and the private
-- helpers the modules that fill it share.  Part of `require "phlox"`, not a
-- module for studies.
--
-- lua/phlox.lua loads, in this order, each adding its functions to the
-- phlox table and its helpers that others use to P:
--   phlox.options     option reader, units and ranges, T and P of a call
--   phlox.library     library files and folders, phlox.library, Library
--                     methods, phlox.water
--   phlox.notes       temperature basis (held, estimated), stamp lines and
--                     notes of results, activity ranges, sour caution
--   phlox.speciation  phlox.speciate, phlox.speciate_curve
--   phlox.maps        phlox.map, phlox.grid_map, phlox.grid_fields, phlox.locate
--   phlox.electrodes  reference electrodes, phlox.to_she
--   phlox.help        phlox.help
-- None of them requires "phlox" (it is not loaded yet); they take the table
-- from here.  P holds only what another module uses; each module's
-- contract at its top says what it adds to both.
local core = require "phlox.core"

local base = {
  phlox = {
    version = core.version,
    core = core,
  },
  P = {},
}
return base
