/* l_geom.c - the plane geometry of src/geom/geom.h for Lua, and the one
 * reader of (xs, ys) point lists shared by the bindings.
 *
 *   core.polygon_area(xs, ys)             signed area, > 0 counter-clockwise
 *   core.polygon_distance(xs, ys, x, y)   signed distance to the outline
 *   core.polygon_pole(xs, ys [, tol])     x, y, distance of the pole of
 *                                         inaccessibility (tol default 1e-3)
 *   core.polygon_span(xs, ys, x, y)       lo, hi: the piece of the vertical
 *                                         line at x inside the polygon that
 *                                         holds y; nil when none does
 *   core.locate(fields, x, y)             index of the first field (a list
 *                                         of {x = {...}, y = {...}}) that
 *                                         holds the point, or nil
 * phlox.locate, phlox.where, phlox.grid_fields and the palette's neighbour
 * test are built on these; misuse is raised, as everywhere in the core. */
#include "core/status.h"
#include "geom/geom.h"
#include "lua/bindings.h"
#include <lauxlib.h>

size_t px_lua_check_points(lua_State *L, int ax, int ay, double **x, double **y)
{
    luaL_checktype(L, ax, LUA_TTABLE);
    luaL_checktype(L, ay, LUA_TTABLE);
    lua_Integer n = luaL_len(L, ax);
    luaL_argcheck(L, luaL_len(L, ay) == n, ay, "x and y must have the same length");
    double *buf = lua_newuserdatauv(L, 2 * (size_t)(n > 0 ? n : 1) * sizeof(double), 0);
    for (lua_Integer i = 1; i <= n; i++) {
        lua_rawgeti(L, ax, i);
        lua_rawgeti(L, ay, i);
        if (!lua_isnumber(L, -2) || !lua_isnumber(L, -1))
            luaL_argerror(L, ax, "points must be numbers");
        buf[i - 1] = lua_tonumber(L, -2);
        buf[n + i - 1] = lua_tonumber(L, -1);
        lua_pop(L, 2);
    }
    *x = buf;
    *y = buf + n;
    return (size_t)n;
}

/* core.polygon_area(xs, ys) -> signed area, > 0 counter-clockwise */
static int l_polygon_area(lua_State *L)
{
    double *x, *y;
    lua_settop(L, 2);
    size_t n = px_lua_check_points(L, 1, 2, &x, &y);
    lua_pushnumber(L, px_geom_polygon_area(x, y, n));
    return 1;
}

/* core.polygon_distance(xs, ys, x, y) -> signed distance to the outline, > 0 inside */
static int l_polygon_distance(lua_State *L)
{
    double *x, *y;
    lua_settop(L, 4);
    double px = luaL_checknumber(L, 3), py = luaL_checknumber(L, 4);
    size_t n = px_lua_check_points(L, 1, 2, &x, &y);
    lua_pushnumber(L, px_geom_polygon_distance(x, y, n, px, py));
    return 1;
}

/* core.polygon_pole(xs, ys [, tol]) -> x, y, distance of the pole of inaccessibility */
static int l_polygon_pole(lua_State *L)
{
    double *x, *y, px, py, d;
    lua_settop(L, 3);
    size_t n = px_lua_check_points(L, 1, 2, &x, &y);
    int st = px_geom_polygon_pole(x, y, n, luaL_optnumber(L, 3, 1e-3), NULL, &px, &py, &d);
    if (st != PX_OK && st != PX_ELIMIT) /* ELIMIT: the best point found is set */
        return luaL_error(L, "polygon_pole: %s", px_strerror(st));
    lua_pushnumber(L, px);
    lua_pushnumber(L, py);
    lua_pushnumber(L, d);
    return 3;
}

/* core.polygon_span(xs, ys, x, y) -> lo, hi | nil: the piece inside on the line at x, holding y */
static int l_polygon_span(lua_State *L)
{
    double *x, *y, lo, hi;
    lua_settop(L, 4);
    double px = luaL_checknumber(L, 3), py = luaL_checknumber(L, 4);
    size_t n = px_lua_check_points(L, 1, 2, &x, &y);
    int st = px_geom_polygon_span(x, y, n, px, py, NULL, &lo, &hi);
    if (st == PX_ENOTFOUND || st == PX_EINVAL) return 0; /* no piece holds the point */
    if (st != PX_OK) return luaL_error(L, "polygon_span: %s", px_strerror(st));
    lua_pushnumber(L, lo);
    lua_pushnumber(L, hi);
    return 2;
}

/* core.locate(fields, x, y) -> index of the first field that holds the point | nil */
static int l_locate(lua_State *L)
{
    lua_settop(L, 3);
    luaL_checktype(L, 1, LUA_TTABLE);
    double px = luaL_checknumber(L, 2), py = luaL_checknumber(L, 3);
    lua_Integer nf = luaL_len(L, 1);
    for (lua_Integer k = 1; k <= nf; k++) {
        lua_rawgeti(L, 1, k);         /* 4: the field */
        if (!lua_istable(L, 4)) return luaL_error(L, "locate: fields[%d] is not a table", (int)k);
        lua_getfield(L, 4, "x");      /* 5 */
        lua_getfield(L, 4, "y");      /* 6 */
        if (!lua_istable(L, 5) || !lua_istable(L, 6))
            return luaL_error(L, "locate: fields[%d] needs x and y lists", (int)k);
        double *x, *y;
        size_t n = px_lua_check_points(L, 5, 6, &x, &y);
        int in = px_geom_polygon_contains(x, y, n, px, py);
        lua_settop(L, 3);
        if (in) {
            lua_pushinteger(L, k);
            return 1;
        }
    }
    return 0;
}

void px_lua_open_geom(lua_State *L)
{
    static const luaL_Reg funcs[] = {
        {"polygon_area", l_polygon_area}, {"polygon_distance", l_polygon_distance},
        {"polygon_pole", l_polygon_pole}, {"polygon_span", l_polygon_span},
        {"locate", l_locate}, {NULL, NULL}};
    luaL_setfuncs(L, funcs, 0);
}
