/* l_diagram.c - predominance maps for Lua: core.map(db, opts) builds an
 * exact element map (src/diagram/emap.h) and returns it as the plain map
 * table that phlox.plot draws and phlox.export writes (docs/figures.md).
 * Also the reference electrodes and the Nernst slope. */
#include "core/status.h"
#include "diagram/diagram.h"
#include "diagram/potential.h"
#include "diagram/emap.h"
#include "diagram/rmap.h"
#include "lua/bindings.h"
#include "water/water.h"
#include "lua/practice.h"
#include <lauxlib.h>
#include <math.h>
#include <stdlib.h>
#include <string.h>

int px_lua_check_database(lua_State *L, int arg, px_db **db, px_thermo_ws **ws);

static const char *const axis_names[] = {"pH", "E", "loga", NULL};
static const char *const kind_names[] = {"metal", "solid", "aqueous", "gas", "liquid"};

/* Ranges of the options (the Lua layer, stdlib/phlox/maps.lua, checks the same
 * quantities in the user's units). */
#define MAP_ACT_MIN 1e-300  /* an activity is positive */
#define MAP_ACT_MAX 10.0    /* common practice, no source: above 10 no activity model holds */
#define MAP_I_MAX 0.5       /* mol/kg: Davies equation, stated range I <= 0.5 (Davies 1962, from memory of Stumm and Morgan, Aquatic Chemistry) */
#define MAP_LOGF_MIN -300.0 /* log10 fugacity/bar: below double precision's reach */
#define MAP_LOGF_MAX 3.0    /* log10 bar: 1000 bar, the water model's top (water.h PX_WATER_PMAX) */
#define MAP_COORD_MAX 1e3   /* |pH|, |E/V|, |log a| of a window or fixed coordinate: a guard */
#define GRID_NODES_MAX 4001 /* nodes per axis: a memory and time guard, not a physical limit */
#define GRID_TOTAL_MAX 20.0 /* mol/kg: common practice, no source (beyond any salt's solubility) */
#define GRID_NACL_MAX 6.1   /* mol/kg: halite saturation at 25 C (from memory of the CRC Handbook) */

static const px_lua_opt map_opts[] = {
    {"element", "string", 0, 0},
    {"T", "number", PX_WATER_TMIN, PX_WATER_TMAX},
    {"P", "number", 0, PX_WATER_PMAX},
    {"x", "pH|E|loga", 0, 0},
    {"y", "pH|E|loga", 0, 0},
    {"window", "numbers", -MAP_COORD_MAX, MAP_COORD_MAX},
    {"pH", "number", -MAP_COORD_MAX, MAP_COORD_MAX},
    {"E", "number", -MAP_COORD_MAX, MAP_COORD_MAX},
    {"activity", "number", MAP_ACT_MIN, MAP_ACT_MAX},
    {"ligand", "string", 0, 0},
    {"ligand_activity", "number", MAP_ACT_MIN, MAP_ACT_MAX},
    {"gas_log_f", "number", MAP_LOGF_MIN, MAP_LOGF_MAX},
    {"ionic_strength", "number", 0, MAP_I_MAX},
    {"exclude", "strings", 0, 0},
    {"only", "strings", 0, 0},
    {"activities", "map", MAP_ACT_MIN, MAP_ACT_MAX},
    {"ligand_redox", "table", 0, 0}, /* {N = "full" | "kept" | form} (l_practice.c) */
    {NULL, NULL, 0, 0}};

static const px_lua_opt grid_opts[] = {
    {"element", "string", 0, 0},
    {"T", "number", PX_WATER_TMIN, PX_WATER_TMAX},
    {"P", "number", 0, PX_WATER_PMAX},
    {"window", "numbers", -MAP_COORD_MAX, MAP_COORD_MAX},
    {"nx", "integer", 2, GRID_NODES_MAX},
    {"ny", "integer", 2, GRID_NODES_MAX},
    {"total", "number", MAP_ACT_MIN, GRID_TOTAL_MAX},
    {"ligand", "string", 0, 0},
    {"ligand_total", "number", MAP_ACT_MIN, GRID_TOTAL_MAX},
    {"activity_model", "ideal|davies|bdot|sit", 0, 0},
    {"background_nacl", "number", 0, GRID_NACL_MAX},
    {"exclude", "strings", 0, 0},
    {"threads", "integer", 1, PX_RMAP_MAX_THREADS},
    {"ligand_redox", "table", 0, 0},
    {"allow_inhibited", "boolean", 0, 0}, /* let inhibited solids precipitate */
    {NULL, NULL, 0, 0}};

/* a number option already checked by the option reader */
static double optnum(lua_State *L, int t, const char *k, double dflt)
{
    lua_getfield(L, t, k);
    double v = lua_isnil(L, -1) ? dflt : lua_tonumber(L, -1);
    lua_pop(L, 1);
    return v;
}

/* A list option of strings (checked by the option reader: every entry is a
 * string, so no lua_tostring converts a number in place) -> array in a
 * userdata box left on the stack, which keeps the list (and so the strings)
 * alive. */
static const char **optlist(lua_State *L, int t, const char *k, size_t *n)
{
    *n = 0;
    if (lua_getfield(L, t, k) != LUA_TTABLE) {
        lua_pop(L, 1);
        return NULL;
    }
    size_t len = lua_rawlen(L, -1);
    const char **v = lua_newuserdatauv(L, (len ? len : 1) * sizeof *v, 1);
    lua_pushvalue(L, -2);
    lua_setiuservalue(L, -2, 1); /* keep the strings alive with the box */
    for (size_t i = 0; i < len; i++) {
        if (lua_rawgeti(L, -2, (lua_Integer)i + 1) != LUA_TSTRING)
            luaL_error(L, "option '%s'[%d] must be a string", k, (int)i + 1);
        v[i] = lua_tostring(L, -1);
        lua_pop(L, 1);
    }
    lua_remove(L, -2);
    *n = len;
    return v;
}

/* window {xmin, xmax, ymin, ymax}: four numbers, each pair increasing */
static void optwindow(lua_State *L, int t, const char *fname, px_diagram_window *win)
{
    if (lua_getfield(L, t, "window") == LUA_TTABLE) {
        double w[4];
        if (lua_rawlen(L, -1) != 4) px_lua_user_error(L, "%s: option 'window' must hold 4 numbers", fname);
        for (int i = 0; i < 4; i++) {
            lua_rawgeti(L, -1, i + 1);
            w[i] = lua_tonumber(L, -1);
            lua_pop(L, 1);
        }
        if (!(w[0] < w[1] && w[2] < w[3]))
            px_lua_user_error(L, "%s: option 'window' = {xmin, xmax, ymin, ymax} needs xmin < xmax and ymin < ymax", fname);
        *win = (px_diagram_window){w[0], w[1], w[2], w[3]};
    }
    lua_pop(L, 1);
}

static void push_xy(lua_State *L, const double *x, const double *y, size_t n, const size_t *idx)
{
    lua_createtable(L, (int)n, 0);
    for (size_t i = 0; i < n; i++) {
        lua_pushnumber(L, x[idx ? idx[i] : i]);
        lua_rawseti(L, -2, (lua_Integer)i + 1);
    }
    lua_setfield(L, -2, "x");
    lua_createtable(L, (int)n, 0);
    for (size_t i = 0; i < n; i++) {
        lua_pushnumber(L, y[idx ? idx[i] : i]);
        lua_rawseti(L, -2, (lua_Integer)i + 1);
    }
    lua_setfield(L, -2, "y");
}

static void setnum(lua_State *L, const char *k, double v)
{
    if (isfinite(v)) {
        lua_pushnumber(L, v);
        lua_setfield(L, -2, k);
    }
}

static void push_axis(lua_State *L, const char *k, int axis, double lo, double hi, const char *lig)
{
    lua_createtable(L, 0, 4);
    if (axis == PX_AXIS_LOGA) lua_pushfstring(L, "log a(%s)", lig ? lig : "L");
    else lua_pushstring(L, axis_names[axis]);
    lua_setfield(L, -2, "name");
    if (axis == PX_AXIS_E) {
        lua_pushliteral(L, "V");
        lua_setfield(L, -2, "unit");
    }
    lua_pushnumber(L, lo);
    lua_setfield(L, -2, "min");
    lua_pushnumber(L, hi);
    lua_setfield(L, -2, "max");
    lua_setfield(L, -2, k);
}

/* core.map(db, opts) -> map table | nil, message */
static int l_map(lua_State *L)
{
    px_db *db;
    px_thermo_ws *ws;
    px_lua_check_database(L, 1, &db, &ws);
    px_lua_opts_check(L, 2, "core.map", map_opts);
    lua_settop(L, 2);
    px_emap_options o = px_emap_options_default();
    if (lua_getfield(L, 2, "element") != LUA_TSTRING) px_lua_user_error(L, "core.map: element (a symbol) is required");
    const char *element = lua_tostring(L, -1);
    lua_pop(L, 1); /* still referenced by opts */
    o.T = optnum(L, 2, "T", o.T);
    o.P = optnum(L, 2, "P", o.P);
    lua_getfield(L, 2, "x");
    o.xaxis = (px_emap_axis)luaL_checkoption(L, -1, "pH", axis_names);
    lua_getfield(L, 2, "y");
    o.yaxis = (px_emap_axis)luaL_checkoption(L, -1, "E", axis_names);
    lua_pop(L, 2);
    optwindow(L, 2, "core.map", &o.window);
    o.pH = optnum(L, 2, "pH", o.pH);
    o.E = optnum(L, 2, "E", o.E);
    o.activity = optnum(L, 2, "activity", o.activity);
    o.ligand_activity = optnum(L, 2, "ligand_activity", o.ligand_activity);
    o.gas_log_f = optnum(L, 2, "gas_log_f", o.gas_log_f);
    o.ionic_strength = optnum(L, 2, "ionic_strength", 0);
    lua_getfield(L, 2, "ligand");
    o.ligand = lua_tostring(L, -1);
    lua_pop(L, 1);
    o.exclude = optlist(L, 2, "exclude", &o.n_exclude);
    o.only = optlist(L, 2, "only", &o.n_only);
    px_lua_ligand_states(L, 2, "phlox.map", &o.ligands);
    /* per-species activities: {["Fe^2+"] = 1e-5, ...} sorted for determinism */
    if (lua_getfield(L, 2, "activities") == LUA_TTABLE) {
        size_t n = 0;
        lua_pushnil(L);
        while (lua_next(L, -2)) {
            n++;
            lua_pop(L, 1);
        }
        const char **names = lua_newuserdatauv(L, (n ? n : 1) * sizeof *names, 0);
        double *vals = lua_newuserdatauv(L, (n ? n : 1) * sizeof *vals, 0);
        size_t k = 0;
        lua_pushnil(L);
        while (lua_next(L, -4)) { /* keys are strings (checked): never converted in place */
            names[k] = lua_tostring(L, -2);
            vals[k++] = lua_tonumber(L, -1);
            lua_pop(L, 1);
        }
        o.act_species = names;
        o.act_values = vals;
        o.n_act = k;
    }

    px_emap *m;
    char msg[512];
    int st = px_emap_build(ws, db, element, &o, &m, msg, sizeof msg);
    if (st != PX_OK) {
        luaL_pushfail(L);
        lua_pushfstring(L, "map of %s: %s", element, msg[0] ? msg : px_strerror(st));
        lua_pushstring(L, px_status_name(st));
        return 3;
    }
    const px_diagram_map *dm = m->map;
    lua_createtable(L, 0, 16);
    px_lua_setstr(L, "element", element);
    setnum(L, "T", o.T);
    setnum(L, "P", o.P);
    push_axis(L, "x", o.xaxis, o.window.xmin, o.window.xmax, o.ligand);
    push_axis(L, "y", o.yaxis, o.window.ymin, o.window.ymax, o.ligand);
    /* fields: one per joined outline (pieces of a species across ligand
     * fields are joined in the core, src/diagram/emap.c) */
    lua_createtable(L, (int)m->n_outline, 0);
    for (size_t i = 0; i < m->n_outline; i++) {
        const px_emap_outline *ol = &m->outline[i];
        const px_emap_field *info = &m->info[ol->piece];
        lua_createtable(L, 0, 6);
        px_lua_setstr(L, "species", px_db_get(db, (size_t)info->species)->f.text);
        px_lua_setstr(L, "kind", kind_names[info->kind]);
        lua_pushstring(L, px_lua_domain_name(px_emap_domain(&px_db_get(db, (size_t)info->species)->f,
                                                            px_element_z(element))));
        lua_setfield(L, -2, "domain");
        if (info->ligand >= 0) {
            px_lua_setstr(L, "ligand", px_db_get(db, (size_t)info->ligand)->f.text);
        }
        push_xy(L, m->joined->x + ol->first, m->joined->y + ol->first, ol->n, NULL);
        setnum(L, "area", ol->area);
        lua_rawseti(L, -2, (lua_Integer)i + 1);
    }
    lua_setfield(L, -2, "fields");
    /* boundaries */
    lua_createtable(L, (int)dm->nboundary, 0);
    for (size_t b = 0; b < dm->nboundary; b++) {
        const px_diagram_boundary *bd = &dm->boundary[b];
        lua_createtable(L, 0, 6);
        lua_createtable(L, 2, 0);
        lua_pushstring(L, px_db_get(db, (size_t)bd->id_a)->f.text);
        lua_rawseti(L, -2, 1);
        lua_pushstring(L, px_db_get(db, (size_t)bd->id_b)->f.text);
        lua_rawseti(L, -2, 2);
        lua_setfield(L, -2, "between");
        double bx[2] = {bd->x0, bd->x1}, by[2] = {bd->y0, bd->y1};
        push_xy(L, bx, by, 2, NULL);
        lua_createtable(L, 0, 3);
        setnum(L, "a", bd->a);
        setnum(L, "b", bd->b);
        lua_pushboolean(L, bd->vertical);
        lua_setfield(L, -2, "vertical");
        lua_setfield(L, -2, "line");
        px_lua_setstr(L, "reaction", m->bnd[b].reaction);
        lua_rawseti(L, -2, (lua_Integer)b + 1);
    }
    lua_setfield(L, -2, "boundaries");
    /* species that never predominate */
    lua_createtable(L, (int)m->n_absent, 0);
    for (size_t i = 0; i < m->n_absent; i++) {
        lua_pushstring(L, px_db_get(db, (size_t)m->absent[i])->f.text);
        lua_rawseti(L, -2, (lua_Integer)i + 1);
    }
    lua_setfield(L, -2, "absent");
    lua_createtable(L, (int)m->n_ligand_absent, 0); /* ligand species never predominating */
    for (size_t i = 0; i < m->n_ligand_absent; i++) {
        lua_pushstring(L, px_db_get(db, (size_t)m->ligand_absent[i])->f.text);
        lua_rawseti(L, -2, (lua_Integer)i + 1);
    }
    lua_setfield(L, -2, "ligand_absent");
    /* ligand fields */
    if (m->ligand_map) {
        const px_diagram_map *lm = m->ligand_map;
        lua_createtable(L, (int)lm->nfield, 0);
        for (size_t f = 0; f < lm->nfield; f++) {
            lua_createtable(L, 0, 3);
            px_lua_setstr(L, "species", px_db_get(db, (size_t)m->ligand_species[f])->f.text);
            push_xy(L, lm->vx, lm->vy, lm->field[f].n, lm->ring + lm->field[f].first);
            lua_rawseti(L, -2, (lua_Integer)f + 1);
        }
        lua_setfield(L, -2, "ligand_fields");
    }
    /* water lines (E = a + b pH) and neutral pH, on pH-E maps */
    setnum(L, "nernst_slope", m->nernst_slope);
    setnum(L, "pKw", m->pKw);
    if (isfinite(m->pKw)) setnum(L, "neutral_pH", m->pKw / 2);
    if (o.xaxis == PX_AXIS_PH && o.yaxis == PX_AXIS_E && isfinite(m->E0_o2)) {
        lua_createtable(L, 0, 2);
        lua_createtable(L, 0, 2);
        setnum(L, "a", m->E0_o2);
        setnum(L, "b", -m->nernst_slope);
        lua_setfield(L, -2, "o2");
        lua_createtable(L, 0, 2);
        setnum(L, "a", 0.0);
        setnum(L, "b", -m->nernst_slope);
        lua_setfield(L, -2, "h2");
        lua_setfield(L, -2, "water");
    }
    /* corrosion domains */
    const px_diagram_outlines *dom = m->domains;
    lua_createtable(L, (int)dom->nloop, 0);
    for (size_t i = 0; i < dom->nloop; i++) {
        const px_diagram_loop *lp = &dom->loop[i];
        lua_createtable(L, 0, 5);
        px_lua_setstr(L, "domain", px_lua_domain_name(lp->cls));
        push_xy(L, dom->x + lp->first, dom->y + lp->first, lp->n, NULL);
        setnum(L, "area", fabs(lp->area));
        lua_pushboolean(L, lp->area < 0);
        lua_setfield(L, -2, "hole");
        lua_rawseti(L, -2, (lua_Integer)i + 1);
    }
    lua_setfield(L, -2, "domains");
    lua_pushinteger(L, (lua_Integer)dm->nunmatched);
    lua_setfield(L, -2, "unmatched_edges");
    {
        int zs[2] = {px_element_z(element), o.ligand ? px_element_z(o.ligand) : 0};
        px_lua_push_ligand_text(L, &o.ligands, zs, 2, zs[0]);
    }
    px_emap_free(m);
    return 1;
}

/* core.grid_map(db, opts) -> rigorous map table | nil, message
 * opts: element, T, P, window {pHmin, pHmax, Emin, Emax}, nx, ny, total,
 * ligand, ligand_total, activity_model ("ideal"|"davies"|"bdot"), background_nacl,
 * exclude {...}.  The table has fields (species, count, area, label_x,
 * label_y), boundaries (between, x, y polylines), the node labels (labels:
 * nx*ny indices into `species`, row by row from the lowest E; 0 where the
 * solver failed) and statistics. */
static int l_grid_map(lua_State *L)
{
    static const char *const models[] = {"ideal", "davies", "bdot", "sit", NULL};
    px_db *db;
    px_thermo_ws *ws;
    px_lua_check_database(L, 1, &db, &ws);
    px_lua_opts_check(L, 2, "core.grid_map", grid_opts);
    lua_settop(L, 2);
    px_rmap_options o = px_rmap_options_default();
    if (lua_getfield(L, 2, "element") != LUA_TSTRING)
        px_lua_user_error(L, "core.grid_map: element (a symbol) is required");
    const char *element = lua_tostring(L, -1);
    lua_pop(L, 1);
    o.T = optnum(L, 2, "T", o.T);
    o.P = optnum(L, 2, "P", o.P);
    optwindow(L, 2, "core.grid_map", &o.window);
    o.grid.nx = (size_t)optnum(L, 2, "nx", (double)o.grid.nx);
    o.grid.ny = (size_t)optnum(L, 2, "ny", (double)o.grid.ny);
    o.total = optnum(L, 2, "total", o.total);
    o.ligand_total = optnum(L, 2, "ligand_total", o.ligand_total);
    o.background_na_cl = optnum(L, 2, "background_nacl", 0);
    o.threads = (int)optnum(L, 2, "threads", 1);
    lua_getfield(L, 2, "ligand");
    o.ligand = lua_tostring(L, -1);
    lua_pop(L, 1);
    lua_getfield(L, 2, "activity_model");
    int model = luaL_checkoption(L, -1, "davies", models);
    lua_pop(L, 1);
    o.model = (px_equil_model)model; /* same order as px_equil_model */
    o.exclude = optlist(L, 2, "exclude", &o.n_exclude);
    px_lua_ligand_states(L, 2, "phlox.grid_map", &o.ligands);
    lua_getfield(L, 2, "allow_inhibited");
    o.allow_inhibited = lua_toboolean(L, -1);
    lua_pop(L, 1);

    px_diagram_grid *g;
    px_rmap_stats stats;
    char msg[512] = "";
    int st = px_rmap_build(ws, db, element, &o, &g, &stats, msg, sizeof msg);
    if (st != PX_OK) {
        luaL_pushfail(L);
        lua_pushfstring(L, "grid map of %s: %s", element, msg[0] ? msg : px_strerror(st));
        return 2;
    }
    lua_createtable(L, 0, 12);
    px_lua_setstr(L, "element", element);
    setnum(L, "T", o.T);
    setnum(L, "P", o.P);
    push_axis(L, "x", PX_AXIS_PH, o.window.xmin, o.window.xmax, NULL);
    push_axis(L, "y", PX_AXIS_E, o.window.ymin, o.window.ymax, NULL);
    lua_pushinteger(L, (lua_Integer)g->nx);
    lua_setfield(L, -2, "nx");
    lua_pushinteger(L, (lua_Integer)g->ny);
    lua_setfield(L, -2, "ny");
    lua_pushinteger(L, (lua_Integer)stats.solves);
    lua_setfield(L, -2, "solves");
    lua_pushinteger(L, (lua_Integer)stats.failures);
    lua_setfield(L, -2, "failures");
    lua_pushinteger(L, (lua_Integer)stats.cold_retries);
    lua_setfield(L, -2, "cold_retries");
    setnum(L, "ionic_strength_max", stats.I_max);
    {
        int zs[2] = {px_element_z(element), o.ligand ? px_element_z(o.ligand) : 0};
        px_lua_push_ligand_text(L, &o.ligands, zs, 2, zs[0]);
    }
    lua_newtable(L); /* where the solver failed (first few), for diagnosis */
    for (size_t k = 0; k < stats.failures && k < PX_RMAP_FAIL_KEEP; k++) {
        lua_createtable(L, 2, 0);
        lua_pushnumber(L, stats.fail_x[k]);
        lua_rawseti(L, -2, 1);
        lua_pushnumber(L, stats.fail_y[k]);
        lua_rawseti(L, -2, 2);
        lua_rawseti(L, -2, (lua_Integer)k + 1);
    }
    lua_setfield(L, -2, "failed_at");
    /* species list (field order) and fields */
    lua_createtable(L, (int)g->nfield, 0); /* species */
    lua_createtable(L, (int)g->nfield, 0); /* fields */
    int nf = 0;
    for (size_t f = 0; f < g->nfield; f++) {
        const px_diagram_grid_field *gf = &g->field[f];
        if (gf->id < 0) continue;
        const char *name = px_db_get(db, (size_t)gf->id)->f.text;
        nf++;
        lua_pushstring(L, name);
        lua_rawseti(L, -3, nf);
        lua_createtable(L, 0, 8);
        px_lua_setstr(L, "species", name);
        lua_pushinteger(L, (lua_Integer)gf->count);
        lua_setfield(L, -2, "count");
        setnum(L, "area", gf->area);
        setnum(L, "label_x", gf->label_x);
        setnum(L, "label_y", gf->label_y);
        setnum(L, "cx", gf->cx);
        setnum(L, "cy", gf->cy);
        lua_rawseti(L, -2, nf);
    }
    lua_setfield(L, -3, "fields");
    lua_setfield(L, -2, "species");
    /* node labels as indices into `species` (0 = no convergence) */
    lua_getfield(L, -1, "species");
    int sidx = lua_gettop(L);
    lua_createtable(L, (int)(g->nx * g->ny), 0);
    for (size_t k = 0; k < g->nx * g->ny; k++) {
        int id = g->label[k], v = 0;
        if (id >= 0) {
            const char *name = px_db_get(db, (size_t)id)->f.text;
            for (int q = 1; q <= nf && !v; q++) {
                lua_rawgeti(L, sidx, q);
                if (strcmp(lua_tostring(L, -1), name) == 0) v = q;
                lua_pop(L, 1);
            }
        }
        lua_pushinteger(L, v);
        lua_rawseti(L, -2, (lua_Integer)k + 1);
    }
    lua_setfield(L, -3, "labels");
    lua_pop(L, 1); /* species */
    /* boundaries */
    lua_createtable(L, (int)g->npoly, 0);
    for (size_t b = 0; b < g->npoly; b++) {
        const px_diagram_polyline *pl = &g->poly[b];
        lua_createtable(L, 0, 3);
        lua_createtable(L, 2, 0);
        lua_pushstring(L, pl->id_a >= 0 ? px_db_get(db, (size_t)pl->id_a)->f.text : "?");
        lua_rawseti(L, -2, 1);
        lua_pushstring(L, pl->id_b >= 0 ? px_db_get(db, (size_t)pl->id_b)->f.text : "?");
        lua_rawseti(L, -2, 2);
        lua_setfield(L, -2, "between");
        push_xy(L, g->px + pl->first, g->py + pl->first, pl->n, NULL);
        int through = pl->id_a < 0 || pl->id_b < 0;
        for (size_t k = 0; k < pl->n; k++) through |= g->pfail[pl->first + k];
        lua_pushboolean(L, through);
        lua_setfield(L, -2, "through_failed");
        if (through) { /* which points sit next to a failed solve */
            lua_createtable(L, (int)pl->n, 0);
            for (size_t k = 0; k < pl->n; k++) {
                lua_pushboolean(L, pl->id_a < 0 || pl->id_b < 0 || g->pfail[pl->first + k]);
                lua_rawseti(L, -2, (lua_Integer)k + 1);
            }
            lua_setfield(L, -2, "failed_points");
        }
        lua_rawseti(L, -2, (lua_Integer)b + 1);
    }
    lua_setfield(L, -2, "boundaries");
    lua_pushinteger(L, (lua_Integer)g->ncalls);
    lua_setfield(L, -2, "calls");
    px_diagram_grid_free(g);
    return 1;
}

/* core.electrodes() -> { {name, offset, dEdT, T_min, T_max, source, dEdT_source}, ... } (index 1 = SHE) */
static int l_electrodes(lua_State *L)
{
    lua_newtable(L);
    for (int i = 0; i < PX_ELECTRODE_COUNT; i++) {
        const px_diagram_electrode_info *e = px_diagram_electrode_get(i);
        if (!e) continue;
        lua_createtable(L, 0, 4);
        px_lua_setstr(L, "name", e->name);
        lua_pushnumber(L, e->offset_V);
        lua_setfield(L, -2, "offset");
        setnum(L, "dEdT", e->dEdT_V_K);
        setnum(L, "T_min", e->T_min);
        setnum(L, "T_max", e->T_max);
        px_lua_setstr(L, "source", e->source ? e->source : "");
        px_lua_setstr(L, "dEdT_source", e->dEdT_source ? e->dEdT_source : "");
        lua_rawseti(L, -2, i + 1);
    }
    return 1;
}

/* core.electrode_offset(index, T) -> offset (V vs SHE at T) | nil, message */
static int l_electrode_offset(lua_State *L)
{
    int i = (int)luaL_checkinteger(L, 1) - 1;
    double T = luaL_checknumber(L, 2), off;
    const px_diagram_electrode_info *e = px_diagram_electrode_get(i);
    if (!e) return luaL_argerror(L, 1, "no such electrode");
    int st = px_diagram_electrode_offset_at(i, T, &off);
    if (st != PX_OK) {
        luaL_pushfail(L);
        lua_pushfstring(L, "no temperature coefficient of the %s electrode at %f C (known from %f to %f C)", e->name,
                        T - 273.15, e->T_min - 273.15, e->T_max - 273.15);
        return 2;
    }
    lua_pushnumber(L, off);
    return 1;
}

static int l_nernst_slope(lua_State *L)
{
    lua_pushnumber(L, px_diagram_nernst_slope(luaL_checknumber(L, 1)));
    return 1;
}

void px_lua_open_diagram(lua_State *L)
{
    static const luaL_Reg funcs[] = {
        {"map", l_map}, {"grid_map", l_grid_map}, {"electrodes", l_electrodes}, {"electrode_offset", l_electrode_offset}, {"nernst_slope", l_nernst_slope}, {NULL, NULL}};
    luaL_setfuncs(L, funcs, 0);
}
