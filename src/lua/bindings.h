/* bindings.h - the binding files that make up "phlox.core".
 *
 * Each px_lua_open_* adds its functions and metatables (named phlox.<Type>)
 * to the table on top of the stack and leaves the stack as it found it.
 * Bindings stay thin: check arguments, call the C core, convert results;
 * misuse raises, an expected numerical failure returns nil, message, info. */
#ifndef PX_BINDINGS_H
#define PX_BINDINGS_H
#include <lua.h>

typedef void (*px_lua_opener)(lua_State *L);
extern const px_lua_opener px_lua_openers[]; /* NULL-terminated */

void px_lua_open_status(lua_State *L);
void px_lua_open_util(lua_State *L);
void px_lua_open_render(lua_State *L);
void px_lua_open_thermo(lua_State *L);
void px_lua_open_diagram(lua_State *L);
void px_lua_open_equil(lua_State *L);
void px_lua_open_practice(lua_State *L);
void px_lua_open_proc(lua_State *L);

#endif
