/* module.c - phlox as a C module of the stock Lua 5.4 interpreter:
 * `local phlox = require "phlox"` loads phlox.so, whose luaopen_phlox
 * returns the same table the phlox program's `require "phlox"` gives.
 *
 * The module carries the library (lua/ and stdlib/, embedded at build time),
 * so it needs no files beside it.  Every built-in module named "phlox" or
 * "phlox.*" is registered in package.preload, which `require` consults
 * before package.path: a file phlox/plot.lua in the user's folders cannot
 * replace the built-in one.  Element files follow the phlox program's rule:
 * folders named in PHLOX_PATH (':'-separated) are searched before the
 * built-in element library. */
#include "embed/embedded.h"
#include "lua/host.h"
#include <lauxlib.h>
#include <stdlib.h>
#include <string.h>

#define PX_MODULE_PATH_ENV "PHLOX_PATH"

/* Loader of one embedded file; upvalue 1 is its index in px_embedded_files. */
static int load_embedded_module(lua_State *L)
{
    lua_Integer i = lua_tointeger(L, lua_upvalueindex(1));
    const px_embedded_file *f = &px_embedded_files[i];
    lua_pushfstring(L, "@%s", f->path);
    if (luaL_loadbufferx(L, f->data, f->size, lua_tostring(L, -1), "t") != LUA_OK)
        return lua_error(L);
    lua_pushvalue(L, 1); /* module name, as require passes it */
    lua_pushstring(L, f->path);
    lua_call(L, 2, 1);
    return 1;
}

/* "lua/phlox/cli.lua" -> "phlox.cli", "stdlib/phlox/plot.lua" -> "phlox.plot",
 * "lua/phlox.lua" -> "phlox"; anything else (element files) -> no name. */
static int module_name(lua_State *L, const char *path)
{
    static const char *const roots[] = {"lua/", "stdlib/"};
    for (size_t r = 0; r < sizeof roots / sizeof roots[0]; r++) {
        size_t n = strlen(roots[r]);
        if (strncmp(path, roots[r], n) != 0) continue;
        const char *rel = path + n;
        size_t len = strlen(rel);
        if (len < 5 || strcmp(rel + len - 4, ".lua") != 0) return 0;
        if (strncmp(rel, "phlox/", 6) != 0 && strcmp(rel, "phlox.lua") != 0) return 0;
        lua_pushlstring(L, rel, len - 4);
        luaL_gsub(L, lua_tostring(L, -1), "/", ".");
        lua_remove(L, -2);
        return 1;
    }
    return 0;
}

/* PHLOX_PATH folders as the host's list of user folders (what
 * core.search_paths() returns), unless a host has set one already. */
static void set_user_paths(lua_State *L)
{
    if (lua_getfield(L, LUA_REGISTRYINDEX, PX_HOST_PATHS_KEY) == LUA_TTABLE) {
        lua_pop(L, 1);
        return;
    }
    lua_pop(L, 1);
    lua_newtable(L);
    const char *env = getenv(PX_MODULE_PATH_ENV);
    lua_Integer n = 0;
    while (env && *env) {
        const char *end = strchr(env, ':');
        size_t len = end ? (size_t)(end - env) : strlen(env);
        if (len > 0) {
            lua_pushlstring(L, env, len);
            lua_rawseti(L, -2, ++n);
        }
        env = end ? end + 1 : NULL;
    }
    lua_setfield(L, LUA_REGISTRYINDEX, PX_HOST_PATHS_KEY);
}

int luaopen_phlox(lua_State *L)
{
    set_user_paths(L);
    lua_getglobal(L, "package");
    if (lua_getfield(L, -1, "preload") != LUA_TTABLE)
        return luaL_error(L, "phlox: package.preload is missing");
    lua_pushcfunction(L, luaopen_phlox_core);
    lua_setfield(L, -2, "phlox.core");
    /* stdlib/ first, then lua/ over it: the order the phlox program's
     * embedded searcher prefers. */
    for (int pass = 0; pass < 2; pass++) {
        const char *root = pass == 0 ? "stdlib/" : "lua/";
        for (size_t i = 0; i < px_embedded_count; i++) {
            const char *path = px_embedded_files[i].path;
            if (strncmp(path, root, strlen(root)) != 0 || !module_name(L, path)) continue;
            lua_pushinteger(L, (lua_Integer)i);
            lua_pushcclosure(L, load_embedded_module, 1);
            lua_setfield(L, -3, lua_tostring(L, -2));
            lua_pop(L, 1); /* name */
        }
    }
    /* The module itself: run the preloaded "phlox" loader. */
    lua_getfield(L, -1, "phlox");
    lua_remove(L, -2); /* preload */
    lua_remove(L, -2); /* package */
    lua_pushliteral(L, "phlox");
    lua_call(L, 1, 1);
    return 1;
}
