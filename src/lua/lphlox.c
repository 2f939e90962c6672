/* lphlox.c - the C module "phlox.core": the thin bindings every other Lua
 * module of phlox builds on.  Each binding file adds its functions to this
 * table through a px_lua_open_* function listed in bindings.h. */
#include "lua/bindings.h"
#include "embed/embedded.h"
#include "lua/host.h"
#include "px_version.h"
#include <lauxlib.h>

/* core.embedded_files() -> sequence of embedded paths, sorted. */
static int l_embedded_files(lua_State *L)
{
    lua_createtable(L, (int)px_embedded_count, 0);
    for (size_t i = 0; i < px_embedded_count; i++) {
        lua_pushstring(L, px_embedded_files[i].path);
        lua_rawseti(L, -2, (lua_Integer)i + 1);
    }
    return 1;
}

/* core.embedded_source(path) -> source text, or nil. */
static int l_embedded_source(lua_State *L)
{
    const px_embedded_file *f = px_embedded_find(luaL_checkstring(L, 1));
    if (!f) {
        lua_pushnil(L);
        return 1;
    }
    lua_pushlstring(L, f->data, f->size);
    return 1;
}

/* core.search_paths() -> copy of the user folders, in search order. */
static int l_search_paths(lua_State *L)
{
    lua_newtable(L);
    if (lua_getfield(L, LUA_REGISTRYINDEX, PX_HOST_PATHS_KEY) != LUA_TTABLE) {
        lua_pop(L, 1);
        return 1;
    }
    lua_Integer n = luaL_len(L, -1);
    for (lua_Integer i = 1; i <= n; i++) {
        lua_rawgeti(L, -1, i);
        lua_rawseti(L, -3, i);
    }
    lua_pop(L, 1);
    return 1;
}

static const luaL_Reg core_funcs[] = {
    {"embedded_files", l_embedded_files},
    {"embedded_source", l_embedded_source},
    {"search_paths", l_search_paths},
    {NULL, NULL}};

int luaopen_phlox_core(lua_State *L)
{
    luaL_newlib(L, core_funcs);
    lua_pushliteral(L, PHLOX_VERSION);
    lua_setfield(L, -2, "version");
    lua_pushliteral(L, PHLOX_REVISION);
    lua_setfield(L, -2, "revision");
    for (const px_lua_opener *o = px_lua_openers; *o; o++) (*o)(L);
    return 1;
}
