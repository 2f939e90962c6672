/* host.h - the embedded Lua interpreter that runs phlox study scripts.
 *
 * px_host_new() builds a lua_State with the standard libraries, the C module
 * "phlox.core" and deterministic module resolution: package.path holds only
 * the user's folders (LUA_PATH and friends are ignored), C modules cannot be
 * loaded, and after the user's folders comes the library embedded in the
 * binary (lua/ and stdlib/).  Chunks run in protected mode with a traceback
 * handler, as lua.c does. */
#ifndef PX_HOST_H
#define PX_HOST_H
#include <lua.h>
#include <stddef.h>

/* The registry key holding the list of user folders (a Lua sequence). */
#define PX_HOST_PATHS_KEY "phlox.paths"

/* A new interpreter; user_paths (n of them, searched first, in order) may be
 * NULL.  Returns NULL when memory runs out. */
lua_State *px_host_new(const char *const *user_paths, size_t n);

/* Run the chunk on top of the stack with nargs arguments below it, in
 * protected mode with a traceback; on error the message (with traceback) is
 * left on the stack and LUA_ERR* returned. */
int px_host_docall(lua_State *L, int nargs, int nres);

/* Load a module the way `require` does and leave it on the stack. */
int px_host_require(lua_State *L, const char *name);

/* luaopen function of the C module "phlox.core". */
int luaopen_phlox_core(lua_State *L);

#endif
