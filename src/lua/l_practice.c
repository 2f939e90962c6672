/* l_practice.c - what practice keeps out of a calculation (src/thermo/
 * practice.h) for Lua: the `ligand_redox` option shared by core.map,
 * core.grid_map and core.speciate, the stamp text of the ligand oxidation
 * states, the list of inhibited solids and the corrosion domain of a field
 * (the rule of src/diagram/emap.c, so phlox.plot never re-models it). */
#include "core/status.h"
#include "diagram/diagram.h"
#include "diagram/emap.h"
#include "lua/bindings.h"
#include "lua/practice.h"
#include <lauxlib.h>
#include <string.h>

static const char *const domain_names[] = {"immunity", "passivation", "corrosion", "sulfide film"};

const char *px_lua_domain_name(int domain)
{
    return domain >= 0 && domain <= PX_DIAGRAM_SULFIDE_FILM ? domain_names[domain] : "?";
}

void px_lua_ligand_states(lua_State *L, int t, const char *where, px_ligand_states *ls)
{
    *ls = px_ligand_states_default();
    int ty = lua_getfield(L, t, "ligand_redox");
    if (ty == LUA_TNIL) {
        lua_pop(L, 1);
        return;
    }
    if (ty != LUA_TTABLE)
        px_lua_user_error(L, "%s: option 'ligand_redox' must be a table { N = \"full\" | \"kept\" | form, ... }", where);
    lua_pushnil(L);
    while (lua_next(L, -2)) {
        if (lua_type(L, -2) != LUA_TSTRING)
            px_lua_user_error(L, "%s: ligand_redox keys are element symbols (N, C, S)", where);
        const char *el = lua_tostring(L, -2), *setting;
        if (lua_type(L, -1) == LUA_TBOOLEAN) setting = lua_toboolean(L, -1) ? "full" : "kept";
        else if (lua_type(L, -1) == LUA_TSTRING) setting = lua_tostring(L, -1);
        else setting = NULL;
        char msg[256];
        if (!setting || px_ligand_states_set(ls, el, setting, msg, sizeof msg) != PX_OK)
            px_lua_user_error(L, "%s: %s", where,
                       setting ? msg : "ligand_redox values are true (full redox), false (kept) or a form name");
        lua_pop(L, 1);
    }
    lua_pop(L, 1);
}

void px_lua_push_ligand_text(lua_State *L, const px_ligand_states *ls, const int *z, size_t nz, int skip_z)
{
    char buf[512];
    px_ligand_states_describe(ls, z, nz, skip_z, buf, sizeof buf);
    if (buf[0]) {
        px_lua_setstr(L, "ligand_states", buf);
    }
}

/* core.domain_of(formula, element) -> domain ("immunity", "passivation", "corrosion" or "sulfide film") */
static int l_domain_of(lua_State *L)
{
    px_formula f;
    const char *text = luaL_checkstring(L, 1);
    int z = px_element_z(luaL_checkstring(L, 2));
    if (px_formula_parse(text, &f) != PX_OK) return luaL_error(L, "domain_of: cannot read formula '%s'", text);
    lua_pushstring(L, px_lua_domain_name(px_emap_domain(&f, z)));
    return 1;
}

/* core.inhibited_solids() -> { {mineral, T_max (K), source}, ... } */
static int l_inhibited_solids(lua_State *L)
{
    size_t n;
    const px_inhibited_solid *v = px_inhibited_solids(&n);
    lua_createtable(L, (int)n, 0);
    for (size_t i = 0; i < n; i++) {
        lua_createtable(L, 0, 3);
        px_lua_setstr(L, "mineral", v[i].mineral);
        lua_pushnumber(L, v[i].T_max);
        lua_setfield(L, -2, "T_max");
        px_lua_setstr(L, "source", v[i].source);
        lua_rawseti(L, -2, (lua_Integer)i + 1);
    }
    return 1;
}

void px_lua_open_practice(lua_State *L)
{
    static const luaL_Reg funcs[] = {{"domain_of", l_domain_of}, {"inhibited_solids", l_inhibited_solids}, {NULL, NULL}};
    luaL_setfuncs(L, funcs, 0);
}
