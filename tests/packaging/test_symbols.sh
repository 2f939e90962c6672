#!/bin/sh
# Symbol policy of the shared libraries: each exports exactly the px_
# functions its public headers declare, and nothing else; the Lua module
# exports only its luaopen_ functions.  The declared names are read here
# from the preprocessed installed headers (the compiler's view), not from
# the version scripts the build generated from the source headers.
. "$(dirname "$0")/common.sh"
B=$PHLOX_BUILD_DIR
inc=$B/include
declared() { # functions declared by <phlox/$1.h> ... (preprocessed)
    for h in "$@"; do echo "#include <phlox/$h.h>"; done |
        $PHLOX_CC -std=c11 -E -P -I"$inc" -x c - |
        grep -o '\bpx_[a-z0-9_]*[[:space:]]*(' | sed 's/[[:space:]]*($//' |
        grep -v '^px_lua_opener$' | sort -u
}
exported() { nm -D --defined-only "$1" | awk '{print $3}' | sort -u; }

core_h="status alloc constants atomic sha256 geom water species thermo basis equil speciate diagram potential emap rmap"
# A header of a later layer includes the earlier layers' headers: its own
# functions are the difference.
declared $core_h >"$B/sym-core.txt"
declared $core_h data | comm -23 - "$B/sym-core.txt" >"$B/sym-data.txt"
declared $core_h render | comm -23 - "$B/sym-core.txt" >"$B/sym-render.txt"

for layer in core data render; do
    lib=$B/libphlox-$layer.so
    [ -f "$lib" ] || fail "$lib was not built"
    exported "$lib" >"$B/sym-$layer-exported.txt"
    n_decl=$(wc -l <"$B/sym-$layer.txt")
    n_exp=$(wc -l <"$B/sym-$layer-exported.txt")
    [ "$n_decl" -gt 0 ] || fail "no functions found in the $layer headers"
    extra=$(comm -13 "$B/sym-$layer.txt" "$B/sym-$layer-exported.txt")
    missing=$(comm -23 "$B/sym-$layer.txt" "$B/sym-$layer-exported.txt")
    [ -z "$extra" ] || fail "libphlox-$layer.so exports symbols its headers do not declare: $extra"
    [ -z "$missing" ] || fail "libphlox-$layer.so does not define functions its headers declare: $missing"
    note "libphlox-$layer.so: $n_exp exported = $n_decl declared"
done
# no internal symbol leaks (spot checks of names the layers share privately)
for s in px_embedded_find px_embedded_files px_lua_open_thermo luaopen_phlox_core; do
    for layer in core data render; do
        exported "$B/libphlox-$layer.so" | grep -qx "$s" && fail "$s is exported by libphlox-$layer.so"
    done
done
mod=$B/lua-module/phlox.so
[ "$(exported "$mod" | tr '\n' ' ')" = "luaopen_phlox luaopen_phlox_core " ] ||
    fail "phlox.so exports more than its luaopen_ functions: $(exported "$mod" | tr '\n' ' ')"
# The module takes the Lua API from the interpreter (Debian Lua policy).
if readelf -d "$mod" | grep NEEDED | grep -q liblua; then fail "phlox.so links liblua"; fi
# The core layer needs neither Lua nor cairo.
if readelf -d "$B/libphlox-core.so" | grep NEEDED | grep -Eq 'liblua|libcairo'; then
    fail "libphlox-core.so links Lua or cairo"
fi
note "phlox.so exports luaopen_phlox, luaopen_phlox_core only"
