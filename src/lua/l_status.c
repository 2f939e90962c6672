/* l_status.c - status codes for Lua: core.strerror(code). */
#include "core/status.h"
#include "lua/bindings.h"
#include <lauxlib.h>

static int l_strerror(lua_State *L)
{
    lua_pushstring(L, px_strerror((int)luaL_checkinteger(L, 1)));
    return 1;
}

void px_lua_open_status(lua_State *L)
{
    lua_pushcfunction(L, l_strerror);
    lua_setfield(L, -2, "strerror");
}
