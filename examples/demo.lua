-- demo.lua: the README's demo study (replaced by a full study as the
-- diagram and figure modules land).
local phlox = require "phlox"
print(("phlox %s: demo study"):format(phlox.version))
print(phlox.caution)
