#!/bin/sh
# The Debian package: `cpack -G DEB` in the build folder, then
#  - its Depends, computed by dpkg-shlibdeps, name the C library, Lua and cairo;
#  - it holds the program, the libraries, headers, pkg-config file, CMake
#    package, the Lua module, the element library, the man page, the bash
#    completion and the editor stubs, all under /usr;
#  - unpacked into a scratch root (dpkg-deb -x), its phlox runs and prints
#    what the build's phlox prints, and the stock lua5.4 loads its module.
. "$(dirname "$0")/common.sh"
S=$(scratch deb)
(cd "$PHLOX_BUILD_DIR" && cpack -G DEB -B "$S/out" >"$S/cpack.log" 2>&1) ||
    { cat "$S/cpack.log"; fail "cpack -G DEB"; }
deb=$(ls "$S"/out/*.deb)
[ -f "$deb" ] || fail "no .deb written"
note "built $(basename "$deb") ($(du -k "$deb" | cut -f1) kB)"

depends=$(dpkg-deb -f "$deb" Depends)
note "Depends: $depends"
for d in libc6 liblua5.4-0 libcairo2; do
    echo "$depends" | grep -q "\b$d\b" || fail "Depends lacks $d"
done
[ "$(dpkg-deb -f "$deb" Package)" = phlox ] || fail "package name"
[ "$(dpkg-deb -f "$deb" Version)" = "$("$PHLOX_BIN" --version | sed 's/^phlox \([^ ]*\).*/\1/')" ] ||
    fail "package version differs from phlox --version"

dpkg-deb -c "$deb" | awk '{print $6}' | sed 's|^\./|/|' >"$S/contents"
lib=/usr/$PHLOX_LIBDIR
mod=/usr/$PHLOX_LUA_CMOD_DIR
for f in /usr/bin/phlox $lib/libphlox-core.so.0 $lib/libphlox-data.so.0 \
    $lib/libphlox-render.so.0 $lib/libphlox-core.a /usr/include/phlox/phlox.h \
    $lib/pkgconfig/phlox.pc $lib/cmake/phlox/phloxConfig.cmake $mod/phlox.so \
    /usr/share/phlox/elements/Fe.lua /usr/share/man/man1/phlox.1 \
    /usr/share/bash-completion/completions/phlox /usr/share/phlox/lua-stubs/phlox.lua \
    /usr/share/doc/phlox/README.md; do
    grep -qx -- "$f" "$S/contents" || fail "the package lacks $f"
done
if grep -v '^/usr/' "$S/contents" | grep -v '^/$' | grep -q .; then fail "files outside /usr"; fi
note "contents: $(wc -l <"$S/contents") entries, all under /usr"

R=$S/root
dpkg-deb -x "$deb" "$R"
eq="Zn^2+ + 2 e- = Zn(s)"
got=$("$R/usr/bin/phlox" reaction "$eq" --temperature 150 --json) ||
    fail "the packaged phlox does not run"
want=$("$PHLOX_BIN" reaction "$eq" --temperature 150 --json)
[ "$got" = "$want" ] || fail "packaged phlox prints $got, the build's $want"
note "packaged phlox: $got"
# Debian's lua5.4 looks in /usr/lib/lua/5.4 (and the multiarch folder) for
# C modules; here, in the root.
case $mod in
    /usr/lib/lua/5.4 | /usr/lib/*-linux-gnu/lua/5.4) ;;
    *) fail "the module goes to $mod, not on Debian's lua5.4 cpath" ;;
esac
out=$(LUA_CPATH="$R$mod/?.so" stock_lua -e \
    'local phlox = require "phlox"; print(phlox.library{"Zn"}:reaction("Zn^2+ + 2 e- = Zn(s)", {T_C = 150}).logK)') ||
    fail "lua5.4 cannot load the packaged module"
echo "$want" | grep -q "\"logK\":$(printf '%.4f' "$out")" ||
    awk -v a="$out" -v w="$want" 'BEGIN { sub(/.*"logK":/, "", w); sub(/[,}].*/, "", w); d = a - w; if (d < 0) d = -d; exit !(d < 1e-9) }' ||
    fail "packaged module gives log K $out, phlox $want"
note "packaged module under lua5.4: log K(150 C) = $out"
groff -man -Tutf8 -P-cbu "$R/usr/share/man/man1/phlox.1" 2>&1 | grep -q "^CAUTION" || fail "the packaged man page does not render"
