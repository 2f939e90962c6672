/* l_util.c - provenance and file helpers for Lua: core.sha256(text),
 * core.write_atomic(path, text), core.isatty(fd). */
#define _POSIX_C_SOURCE 200809L
#include "core/atomic.h"
#include "core/sha256.h"
#include "core/status.h"
#include "lua/bindings.h"
#include <lauxlib.h>
#include <string.h>
#include <unistd.h>

static int l_sha256(lua_State *L)
{
    size_t n;
    const char *s = luaL_checklstring(L, 1, &n);
    char hex[65];
    px_sha256_hex(s, n, hex);
    lua_pushstring(L, hex);
    return 1;
}

/* core.write_atomic(path, text [, replace]) -> true | nil, message
 * (replace: also replace a symbolic link or a read-only file) */
static int l_write_atomic(lua_State *L)
{
    const char *path = luaL_checkstring(L, 1);
    size_t n;
    const char *s = luaL_checklstring(L, 2, &n);
    int err = 0;
    char why[1024];
    int st = px_write_atomic_ex(path, s, n, lua_toboolean(L, 3) ? PX_WRITE_REPLACE : 0, &err, why,
                                sizeof why);
    if (st != PX_OK) {
        luaL_pushfail(L);
        if (why[0]) lua_pushstring(L, why);
        else lua_pushfstring(L, "%s: %s", path, err ? strerror(err) : px_strerror(st));
        return 2;
    }
    lua_pushboolean(L, 1);
    return 1;
}

/* core.isatty(fd) -> boolean (for progress display) */
static int l_isatty(lua_State *L)
{
    lua_pushboolean(L, isatty((int)luaL_checkinteger(L, 1)));
    return 1;
}

void px_lua_open_util(lua_State *L)
{
    static const luaL_Reg funcs[] = {
        {"sha256", l_sha256}, {"write_atomic", l_write_atomic}, {"isatty", l_isatty}, {NULL, NULL}};
    luaL_setfuncs(L, funcs, 0);
}
