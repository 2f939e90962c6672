/* practice.h - helpers of l_practice.c shared by the map and speciation
 * bindings. */
#ifndef PX_LUA_PRACTICE_H
#define PX_LUA_PRACTICE_H
#include "thermo/practice.h"
#include <lua.h>
#include <stddef.h>

/* Read opts.ligand_redox of the table at t into ls (defaults first); raises
 * on misuse, naming `where`. */
void px_lua_ligand_states(lua_State *L, int t, const char *where, px_ligand_states *ls);
/* Set field "ligand_states" (the stamp text) of the table on top, if any
 * rule applies to the elements z[0..nz-1]. */
void px_lua_push_ligand_text(lua_State *L, const px_ligand_states *ls, const int *z, size_t nz, int skip_z);
/* "immunity", "passivation", "corrosion", "sulfide film" */
const char *px_lua_domain_name(int domain);

#endif
