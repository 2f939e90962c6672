#!/bin/sh
# The Lua module from the stock lua5.4 interpreter against a scratch install:
#  - `lua5.4 -e 'local phlox = require "phlox"'` finds it through LUA_CPATH;
#  - a short study (study.lua, with its published checks) runs through the
#    stock interpreter and prints what the phlox program prints for it;
#  - once `require "phlox"` has found the module, its built-in parts cannot
#    be replaced from the user's folders (phlox/plot.lua, phlox/core.lua,
#    phlox/sweep/init.lua on LUA_PATH are ignored); element files can
#    (PHLOX_PATH), as in the phlox program.  (The name "phlox" itself is
#    resolved by the interpreter's own package.path before any module runs.)
. "$(dirname "$0")/common.sh"
S=$(scratch lua-module)
P=$S/prefix
install_to "$P"
export LUA_CPATH="$P/$PHLOX_LUA_CMOD_DIR/?.so"
mkdir -p "$S/user/phlox/sweep" "$S/stock" "$S/prog" "$S/elem/elements"
echo 'error("a user folder replaced the built-in phlox.plot")' >"$S/user/phlox/plot.lua"
echo 'error("a user folder replaced the built-in phlox.core")' >"$S/user/phlox/core.lua"
echo 'error("a user folder replaced the built-in phlox.sweep")' >"$S/user/phlox/sweep/init.lua"
export LUA_PATH="$S/user/?.lua;$S/user/?/init.lua"

stock_lua -e 'local phlox = require "phlox"; assert(type(phlox.library) == "function"); require "phlox.sweep"' ||
    fail "lua5.4 -e 'local phlox = require \"phlox\"' failed"
where=$(stock_lua -e 'print(package.searchpath("phlox", package.cpath))')
[ "$where" = "$P/$PHLOX_LUA_CMOD_DIR/phlox.so" ] || fail "phlox found at $where"
note "require \"phlox\" from lua5.4: $where"

study=$PHLOX_SOURCE_DIR/tests/packaging/study.lua
(cd "$S" && stock_lua "$study" "$S/stock") >"$S/stock.out" || fail "the study failed under lua5.4"
(cd "$S" && "$P/bin/phlox" "$study" "$S/prog") >"$S/prog.out" || fail "the study failed under phlox"
cat "$S/stock.out"
diff "$S/stock.out" "$S/prog.out" || fail "lua5.4 and phlox print different results"
cmp -s "$S/stock/Zn-25C.svg" "$S/prog/Zn-25C.svg" || fail "lua5.4 and phlox draw different figures"
note "the study prints the same under lua5.4 and phlox; same SVG bytes"

# Element files follow PHLOX_PATH: a user's Zn.lua that is broken on
# purpose must be the one read.
echo 'return { element = "Zn", species = 1 }' >"$S/elem/elements/Zn.lua"
if PHLOX_PATH="$S/elem" stock_lua -e 'require("phlox").library { "Zn" }' 2>"$S/elem.err"; then
    fail "PHLOX_PATH element file was not read by the module"
fi
grep -q "$S/elem/elements/Zn.lua" "$S/elem.err" || { cat "$S/elem.err"; fail "the error does not name the user's file"; }
note "PHLOX_PATH element files override the built-in ones in the module too"
