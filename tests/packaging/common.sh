# common.sh - shared by the packaging tests (sourced).  Environment from
# tests/packaging/CMakeLists.txt: PHLOX_BUILD_DIR, PHLOX_SOURCE_DIR,
# PHLOX_BIN, PHLOX_CC, PHLOX_SANITIZE (ON/OFF), PHLOX_LIBDIR, PHLOX_LUA_CMOD_DIR
# (install folders relative to the prefix).
set -eu

fail() { echo "FAIL: $*" >&2; exit 1; }
note() { echo "-- $*"; }

# A fresh scratch folder of this test inside the build folder.
scratch() {
    d="$PHLOX_BUILD_DIR/packaging-scratch/$1"
    rm -rf "$d"
    mkdir -p "$d"
    echo "$d"
}

# Install the build into PREFIX (what `cmake --install` does for a user).
install_to() {
    cmake --install "$PHLOX_BUILD_DIR" --prefix "$1" >"$1.install.log" 2>&1 ||
        { cat "$1.install.log" >&2; fail "cmake --install into $1"; }
}

# Flags a program built here needs when the libraries carry sanitizers.
if [ "${PHLOX_SANITIZE:-OFF}" = ON ]; then
    SAN_FLAGS="-fsanitize=address,undefined"
    # A sanitized Lua module loaded into the stock interpreter needs the ASan
    # runtime first.  LeakSanitizer is off there: when lua5.4 closes, it
    # unloads phlox.so and the sanitizer runtime's own start-up allocations
    # made through it can no longer be traced (the same code is leak-checked
    # through the phlox program by the other tests).
    LUA_SAN_ENV="LD_PRELOAD=$($PHLOX_CC -print-file-name=libasan.so) ASAN_OPTIONS=detect_leaks=0"
else
    SAN_FLAGS=""
    LUA_SAN_ENV=""
fi

# Run the stock lua5.4 with the environment of a sanitized build.
stock_lua() {
    env $LUA_SAN_ENV lua5.4 "$@"
}

# The value of a "name = value" line of the C example's output.
value_of() { sed -n "s/^$2 = //p" "$1"; }
