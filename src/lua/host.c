/* host.c - interpreter set-up: libraries, module search order, protected
 * calls with tracebacks (see host.h). */
#include "lua/host.h"
#include "embed/embedded.h"
#include <lauxlib.h>
#include <lualib.h>
#include <string.h>

/* Message handler: add a traceback to string errors (after lua.c msghandler). */
static int msghandler(lua_State *L)
{
    const char *msg = lua_tostring(L, 1);
    if (msg == NULL) {
        if (luaL_callmeta(L, 1, "__tostring") && lua_type(L, -1) == LUA_TSTRING)
            return 1;
        msg = lua_pushfstring(L, "(error object is a %s value)", luaL_typename(L, 1));
    }
    luaL_traceback(L, L, msg, 1);
    return 1;
}

int px_host_docall(lua_State *L, int nargs, int nres)
{
    int base = lua_gettop(L) - nargs;
    lua_pushcfunction(L, msghandler);
    lua_insert(L, base);
    int status = lua_pcall(L, nargs, nres, base);
    lua_remove(L, base);
    return status;
}

/* Searcher for the embedded library: module "a.b" is looked up as
 * lua/a/b.lua, lua/a/b/init.lua, then stdlib/a/b.lua. */
static int embedded_searcher(lua_State *L)
{
    const char *name = luaL_checkstring(L, 1);
    static const char *const patterns[] = {"lua/%s.lua", "lua/%s/init.lua", "stdlib/%s.lua"};
    luaL_Buffer tried;
    luaL_buffinit(L, &tried);
    for (size_t i = 0; i < sizeof patterns / sizeof patterns[0]; i++) {
        const char *rel = luaL_gsub(L, name, ".", "/");
        const char *path = lua_pushfstring(L, patterns[i], rel);
        const px_embedded_file *f = px_embedded_find(path);
        if (f) {
            const char *chunkname = lua_pushfstring(L, "@%s", path);
            if (luaL_loadbufferx(L, f->data, f->size, chunkname, "t") != LUA_OK)
                return luaL_error(L, "error loading embedded module '%s':\n\t%s", name,
                                  lua_tostring(L, -1));
            lua_pushstring(L, path);
            return 2;
        }
        lua_pushfstring(L, "\n\tno embedded file '%s'", path);
        lua_remove(L, -2); /* path */
        lua_remove(L, -2); /* rel */
        luaL_addvalue(&tried);
    }
    luaL_pushresult(&tried);
    return 1;
}

/* `phlox` and `phlox.*` are reserved for the built-in library: a user folder
 * adds modules of other names but can never replace or extend these (a shared
 * folder holding phlox/cli.lua would otherwise run with full rights on every
 * command).  Placed after the embedded searcher, before the user folders. */
static int reserved_searcher(lua_State *L)
{
    const char *name = luaL_checkstring(L, 1);
    if (strcmp(name, "phlox") == 0 || strncmp(name, "phlox.", 6) == 0)
        return luaL_error(L, "module '%s' not found: the names phlox and phlox.* are reserved "
                             "for the built-in library (user folders cannot add or replace them)",
                          name);
    lua_pushliteral(L, "\n\tnot a reserved phlox module");
    return 1;
}

/* package.path from the user folders: DIR/?.lua;DIR/?/init.lua for each. */
static void set_package_paths(lua_State *L, const char *const *paths, size_t n)
{
    luaL_Buffer b;
    lua_getglobal(L, "package");
    luaL_buffinit(L, &b);
    for (size_t i = 0; i < n; i++) {
        if (i) luaL_addchar(&b, ';');
        lua_pushfstring(L, "%s/?.lua;%s/?/init.lua", paths[i], paths[i]);
        luaL_addvalue(&b);
    }
    luaL_pushresult(&b);
    lua_setfield(L, -2, "path");
    lua_pushliteral(L, "");
    lua_setfield(L, -2, "cpath");

    /* searchers: preload, embedded, the reserved-name guard, then the
     * Lua-file searcher over the user folders. */
    lua_getfield(L, -1, "searchers");
    lua_createtable(L, 4, 0);
    lua_rawgeti(L, -2, 1); /* the preload searcher */
    lua_rawseti(L, -2, 1);
    lua_pushcfunction(L, embedded_searcher);
    lua_rawseti(L, -2, 2);
    lua_pushcfunction(L, reserved_searcher);
    lua_rawseti(L, -2, 3);
    lua_rawgeti(L, -2, 2); /* the Lua-file searcher over package.path */
    lua_rawseti(L, -2, 4);
    lua_setfield(L, -3, "searchers");
    lua_pop(L, 2); /* old searchers, package */

    lua_getfield(L, LUA_REGISTRYINDEX, LUA_PRELOAD_TABLE);
    lua_pushcfunction(L, luaopen_phlox_core);
    lua_setfield(L, -2, "phlox.core");
    lua_pop(L, 1);

    lua_createtable(L, (int)n, 0);
    for (size_t i = 0; i < n; i++) {
        lua_pushstring(L, paths[i]);
        lua_rawseti(L, -2, (lua_Integer)i + 1);
    }
    lua_setfield(L, LUA_REGISTRYINDEX, PX_HOST_PATHS_KEY);
}

static int host_init(lua_State *L)
{
    const char *const *paths = (const char *const *)lua_touserdata(L, 1);
    size_t n = (size_t)lua_tointeger(L, 2);
    /* Ignore LUA_PATH, LUA_CPATH and LUA_INIT (see lua.c). */
    lua_pushboolean(L, 1);
    lua_setfield(L, LUA_REGISTRYINDEX, "LUA_NOENV");
    luaL_openlibs(L);
    set_package_paths(L, paths, n);
    return 0;
}

lua_State *px_host_new(const char *const *user_paths, size_t n)
{
    lua_State *L = luaL_newstate();
    if (!L) return NULL;
    lua_pushcfunction(L, host_init);
    lua_pushlightuserdata(L, (void *)user_paths);
    lua_pushinteger(L, (lua_Integer)n);
    if (lua_pcall(L, 2, 0, 0) != LUA_OK) {
        lua_close(L);
        return NULL;
    }
    return L;
}

int px_host_require(lua_State *L, const char *name)
{
    lua_getglobal(L, "require");
    lua_pushstring(L, name);
    return px_host_docall(L, 1, 1);
}
