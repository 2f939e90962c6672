/* l_equil.c - speciation for Lua: core.speciate(db, opts) builds the
 * equilibrium system from the species database (src/equil/speciate.h),
 * solves it and returns every species' molality, activity coefficient and
 * activity, the saturation index and amount of every solid, each element's
 * distribution, pH, pe, E, ionic strength and the solver statistics.  A solve
 * that does not converge returns nil, message, info (which equation did not
 * close); misuse raises.  core.curve(db, opts, curve) runs the curve driver
 * (src/equil/curve.h) over the same options and returns one such result
 * (or message) per point. */
#include "core/constants.h"
#include "core/status.h"
#include "equil/curve.h"
#include "equil/speciate.h"
#include "lua/bindings.h"
#include "water/water.h"
#include "lua/practice.h"
#include <lauxlib.h>
#include <math.h>
#include <string.h>

int px_lua_check_database(lua_State *L, int arg, px_db **db, px_thermo_ws **ws);

/* Ranges (the option reader checks them before anything is read) */
#define SPEC_TOTAL_MAX 20.0    /* mol/kg: common practice, no source (beyond any salt's solubility) */
#define SPEC_PH_MIN -3.0       /* common practice, no source: concentrated acids reach about -1 */
#define SPEC_PH_MAX 17.0       /* common practice, no source: pKw is 14.9 at 0 C (IAPWS R11-07) */
#define SPEC_E_MAX 5.0         /* V: common practice, no source (beyond any aqueous couple) */
#define SPEC_PE_MAX 100.0      /* pe = E F/(RT ln 10): 5 V at 0 C is 92 */
#define SPEC_LOG_MIN -300.0    /* log10 fugacity or activity: below double precision's reach */
#define SPEC_LOGF_MAX 3.0      /* log10 bar: 1000 bar, the water model's top (water.h) */
#define SPEC_LOGA_MAX 1.0      /* log10 activity: common practice, no source */
#define SPEC_ITER_MAX 100000   /* a time guard */
#define CURVE_RETRIES_MAX 10   /* tries of a failing curve point: common practice, no source */

static const px_lua_opt speciate_opts[] = {
    {"T", "number", PX_WATER_TMIN, PX_WATER_TMAX},
    {"P", "number", 0, PX_WATER_PMAX},
    {"totals", "map", 0, SPEC_TOTAL_MAX},
    {"basis", "table", 0, 0},
    {"pH", "number", SPEC_PH_MIN, SPEC_PH_MAX},
    {"E", "number", -SPEC_E_MAX, SPEC_E_MAX},
    {"pe", "number", -SPEC_PE_MAX, SPEC_PE_MAX},
    {"redox_gas", "string", 0, 0},
    {"redox_log_f", "number", SPEC_LOG_MIN, SPEC_LOGF_MAX},
    {"fugacities", "map", SPEC_LOG_MIN, SPEC_LOGF_MAX},
    {"fixed", "map", SPEC_LOG_MIN, SPEC_LOGA_MAX},
    {"solids", "boolean", 0, 0},
    {"suppress", "strings", 0, 0},
    {"exclude", "strings", 0, 0},
    {"activity_model", "ideal|davies|bdot|sit", 0, 0},
    {"max_iter", "integer", 1, SPEC_ITER_MAX},
    {"ligand_redox", "table", 0, 0},         /* {N = "full" | "kept" | form, ...} (l_practice.c) */
    {"allow_inhibited", "boolean", 0, 0},    /* let inhibited solids precipitate */
    {NULL, NULL, 0, 0}};

/* a number option already checked by the option reader */
static double optnum(lua_State *L, int t, const char *k, double dflt, int *given)
{
    int ty = lua_getfield(L, t, k);
    double v = dflt;
    if (ty != LUA_TNIL) {
        v = lua_tonumber(L, -1);
        if (given) *given = 1;
    }
    lua_pop(L, 1);
    return v;
}

/* {key = number} option, sorted by key for determinism, into names/values. */
static size_t optmap(lua_State *L, int t, const char *k, const char **names, double *vals, size_t max)
{
    if (lua_getfield(L, t, k) != LUA_TTABLE) {
        lua_pop(L, 1);
        return 0;
    }
    size_t n = 0;
    lua_pushnil(L);
    while (lua_next(L, -2)) {
        if (n >= max) px_lua_user_error(L, "speciate: option '%s' has more than %d entries", k, (int)max);
        names[n] = lua_tostring(L, -2); /* anchored in the option table */
        vals[n++] = lua_tonumber(L, -1);
        lua_pop(L, 1);
    }
    lua_pop(L, 1);
    for (size_t i = 1; i < n; i++) /* insertion sort by name */
        for (size_t j = i; j > 0 && strcmp(names[j - 1], names[j]) > 0; j--) {
            const char *tn = names[j];
            names[j] = names[j - 1];
            names[j - 1] = tn;
            double tv = vals[j];
            vals[j] = vals[j - 1];
            vals[j - 1] = tv;
        }
    return n;
}

static size_t optlist(lua_State *L, int t, const char *k, const char **out, size_t max)
{
    if (lua_getfield(L, t, k) != LUA_TTABLE) {
        lua_pop(L, 1);
        return 0;
    }
    size_t n = lua_rawlen(L, -1);
    if (n > max) px_lua_user_error(L, "speciate: option '%s' has more than %d entries", k, (int)max);
    for (size_t i = 0; i < n; i++) { /* strings (checked): anchored in the option table */
        lua_rawgeti(L, -1, (lua_Integer)i + 1);
        out[i] = lua_tostring(L, -1);
        lua_pop(L, 1);
    }
    lua_pop(L, 1);
    return n;
}

static void setnum(lua_State *L, const char *k, double v)
{
    lua_pushnumber(L, v);
    lua_setfield(L, -2, k);
}

static const char *const models[] = {"ideal", "davies", "bdot", "sit", NULL};

/* The options table at index 2 (checked by the option reader) into *po;
 * the strings stay anchored in that table. */
static void read_spec_options(lua_State *L, px_spec_options *po)
{
    px_spec_options o = px_spec_options_default();
    o.T = optnum(L, 2, "T", o.T, NULL);
    o.P = optnum(L, 2, "P", o.P, NULL);
    o.n_totals = optmap(L, 2, "totals", o.element, o.total, PX_SPEC_MAX_ITEMS - 3);
    if (o.n_totals == 0) px_lua_user_error(L, "speciate: totals = {Element = mol/kg, ...} is required");
    if (lua_getfield(L, 2, "basis") == LUA_TTABLE) {
        lua_pushnil(L);
        while (lua_next(L, -2)) {
            if (lua_type(L, -2) != LUA_TSTRING || lua_type(L, -1) != LUA_TSTRING)
                px_lua_user_error(L, "speciate: option 'basis' must map element symbols to species formulas");
            lua_pop(L, 1);
        }
        for (size_t k = 0; k < o.n_totals; k++) {
            lua_getfield(L, -1, o.element[k]);
            o.basis[k] = lua_tostring(L, -1); /* a string or NULL; anchored in basis */
            lua_pop(L, 1);
        }
    }
    lua_pop(L, 1);
    int given = 0;
    o.pH = optnum(L, 2, "pH", o.pH, &given);
    o.ph_mode = given ? PX_SPEC_PH_FIXED : PX_SPEC_PH_CHARGE;
    given = 0;
    o.E = optnum(L, 2, "E", 0, &given);
    if (given) o.redox_mode = PX_SPEC_REDOX_E;
    given = 0;
    o.pe = optnum(L, 2, "pe", 0, &given);
    if (given) {
        if (o.redox_mode != PX_SPEC_REDOX_NONE) px_lua_user_error(L, "speciate: give E or pe, not both");
        o.redox_mode = PX_SPEC_REDOX_PE;
    }
    lua_getfield(L, 2, "redox_gas");
    if (!lua_isnil(L, -1)) {
        if (o.redox_mode != PX_SPEC_REDOX_NONE)
            px_lua_user_error(L, "speciate: give one redox constraint (E, pe or redox_gas)");
        o.redox_gas = luaL_checkstring(L, -1);
        o.redox_mode = PX_SPEC_REDOX_GAS;
        o.redox_log_f = optnum(L, 2, "redox_log_f", 0, NULL);
    }
    lua_pop(L, 1);
    o.n_gases = optmap(L, 2, "fugacities", o.gas, o.gas_log_f, PX_SPEC_MAX_ITEMS);
    o.n_fixed = optmap(L, 2, "fixed", o.fixed, o.fixed_log_a, PX_SPEC_MAX_ITEMS);
    lua_getfield(L, 2, "solids");
    o.solids = lua_isnil(L, -1) ? 1 : lua_toboolean(L, -1);
    lua_pop(L, 1);
    o.n_suppress = optlist(L, 2, "suppress", o.suppress, PX_SPEC_MAX_ITEMS);
    o.n_exclude = optlist(L, 2, "exclude", o.exclude, PX_SPEC_MAX_ITEMS);
    lua_getfield(L, 2, "activity_model");
    o.model = (px_equil_model)luaL_checkoption(L, -1, "davies", models);
    lua_pop(L, 1);
    o.solver.max_iter = (size_t)optnum(L, 2, "max_iter", (double)o.solver.max_iter, NULL);
    px_lua_ligand_states(L, 2, "phlox.speciate", &o.ligands);
    lua_getfield(L, 2, "allow_inhibited");
    o.allow_inhibited = lua_toboolean(L, -1);
    lua_pop(L, 1);
    *po = o;
}

/* The result table of a solved system (see the file's head). */
static void push_spec_result(lua_State *L, px_db *db, const px_spec_options *o, const px_spec *s)
{
    static const char *const phases[] = {"aqueous", "solid", "gas", "water", "electron"};
    px_equil_stats stats;
    px_equil_work_get_stats(s->work, &stats);
    size_t m = s->n_species;
    lua_createtable(L, 0, 16);
    setnum(L, "T", o->T);
    setnum(L, "P", o->P);
    setnum(L, "pH", px_spec_pH(s));
    double pe, E;
    if (px_spec_redox_state(s, &pe, &E) == PX_OK) {
        setnum(L, "pe", pe);
        setnum(L, "E", E);
    }
    setnum(L, "ionic_strength", stats.ionic_strength);
    setnum(L, "charge_imbalance", stats.charge_imbalance);
    setnum(L, "log_aw", stats.log_aw);
    setnum(L, "iterations", (double)stats.iterations);
    setnum(L, "residual", stats.residual_norm);
    px_lua_setstr(L, "activity_model", models[o->model]);
    if (o->model == PX_EQUIL_SIT) {
        setnum(L, "sit_pairs", (double)s->sit_pairs);
        setnum(L, "sit_missing", (double)s->sit_missing);
    }
    {
        int zs[PX_SPEC_MAX_ITEMS];
        for (size_t k = 0; k < o->n_totals; k++) zs[k] = px_element_z(o->element[k]);
        if (s->redox) px_lua_push_ligand_text(L, &o->ligands, zs, o->n_totals, 0);
    }
    /* solids kept from precipitating because practice finds them inhibited */
    lua_newtable(L);
    int ninh = 0;
    for (size_t j = 0; j < m; j++) {
        const px_species *sp = px_db_get(db, (size_t)s->db_index[j]);
        if (!o->allow_inhibited && o->solids && px_inhibited_at(&sp->f, o->T)) {
            lua_pushstring(L, sp->f.text);
            lua_rawseti(L, -2, ++ninh);
        }
    }
    lua_setfield(L, -2, "inhibited");
    /* species and solids */
    lua_createtable(L, (int)m, 0);
    int ns = 0;
    for (size_t j = 0; j < m; j++) {
        const px_species *sp = px_db_get(db, (size_t)s->db_index[j]);
        px_equil_species_result r;
        px_equil_work_get_species(s->work, j, &r);
        if (sp->f.state == PX_STATE_E || sp->f.state == PX_STATE_L) continue;
        lua_createtable(L, 0, 8);
        px_lua_setstr(L, "formula", sp->f.text);
        int ph = sp->f.state == PX_STATE_S ? 1 : sp->f.state == PX_STATE_G ? 2 : 0;
        px_lua_setstr(L, "phase", phases[ph]);
        if (ph == 0) {
            setnum(L, "molality", r.molality);
            setnum(L, "log_molality", r.log_molality);
            setnum(L, "log_gamma", r.log_gamma);
            setnum(L, "log_activity", r.log_activity);
        } else if (ph == 1) {
            setnum(L, "si", r.si);
            setnum(L, "amount", r.amount);
        } else {
            setnum(L, "log_fugacity", r.log_activity);
        }
        lua_rawseti(L, -2, ++ns);
    }
    lua_setfield(L, -2, "species");
    /* each element's distribution: share of its total per species */
    size_t ne = px_spec_n_elements(s);
    lua_createtable(L, 0, (int)ne);
    for (size_t k = 0; k < ne; k++) {
        px_spec_element_result e;
        px_spec_element(s, k, &e);
        lua_createtable(L, 0, 3);
        setnum(L, "total", e.total);
        setnum(L, "dissolved", e.dissolved);
        setnum(L, "solid", e.solid);
        lua_newtable(L);
        for (size_t j = 0; j < m; j++) {
            double share = px_spec_element_share(s, k, j);
            if (isnan(share)) continue;
            lua_pushnumber(L, share);
            lua_setfield(L, -2, px_db_get(db, (size_t)s->db_index[j])->f.text);
        }
        lua_setfield(L, -2, "share");
        lua_setfield(L, -2, px_element_symbol(e.z));
    }
    lua_setfield(L, -2, "elements");
}


static int l_speciate(lua_State *L)
{
    px_db *db;
    px_thermo_ws *ws;
    px_lua_check_database(L, 1, &db, &ws);
    px_lua_opts_check(L, 2, "core.speciate", speciate_opts);
    lua_settop(L, 2);
    px_spec_options o;
    read_spec_options(L, &o);
    px_spec *s;
    char msg[512];
    int st = px_spec_build(ws, db, &o, &s, msg, sizeof msg);
    if (st != PX_OK) return px_lua_user_error(L, "speciate: %s", msg[0] ? msg : px_strerror(st));
    st = px_spec_solve(s, &o.solver, msg, sizeof msg);
    if (st != PX_OK) {
        px_equil_stats stats;
        px_equil_work_get_stats(s->work, &stats);
        luaL_pushfail(L);
        lua_pushfstring(L, "speciate: %s", msg);
        lua_createtable(L, 0, 4);
        px_lua_setstr(L, "status", px_status_name(st));
        setnum(L, "iterations", (double)stats.iterations);
        setnum(L, "residual", stats.residual_norm);
        lua_pushinteger(L, stats.fail_kind);
        lua_setfield(L, -2, "fail_kind");
        px_spec_free(s);
        return 3;
    }
    push_spec_result(L, db, &o, s);
    px_spec_free(s);
    return 1;
}

/* core.curve(db, opts, curve): the curve driver (src/equil/curve.h) over
 * the options of core.speciate.  curve = { var = "pH" | "log_total" |
 * "log_a", name = element or species varied, x = {...}, element = symbol,
 * retries = 0, retry_factor = 0.1, warm = false }.  Returns a list with one entry per x:
 * { r = <core.speciate's result> } or { err = message }, each with `total`
 * (the element's total after the last try) and `retries`; then the
 * failing tries of all points. */
static const px_lua_opt curve_opts[] = {
    {"var", "pH|log_total|log_a", 0, 0},
    {"name", "string", 0, 0},
    {"x", "numbers", -HUGE_VAL, HUGE_VAL},
    {"element", "string", 0, 0},
    {"retries", "integer", 0, CURVE_RETRIES_MAX},
    {"retry_factor", "number", 0, 1},
    {"warm", "boolean", 0, 0},
    {NULL, NULL, 0, 0}};

typedef struct curve_ud {
    lua_State *L;
    px_db *db;
    const px_spec_options *o;
    int out;    /* stack index of the result list */
    int raised; /* an error object is on the stack */
} curve_ud;

/* Protected: (ud, point, list) -> list[i] = entry. */
static int curve_push_point(lua_State *L)
{
    const curve_ud *u = lua_touserdata(L, 1);
    const px_curve_point *p = lua_touserdata(L, 2);
    lua_createtable(L, 0, 4);
    if (p->status == PX_OK) {
        push_spec_result(L, u->db, u->o, p->spec);
        lua_setfield(L, -2, "r");
    } else {
        lua_pushfstring(L, "speciate: %s", p->message);
        lua_setfield(L, -2, "err");
        px_lua_setstr(L, "status", px_status_name(p->status));
    }
    setnum(L, "total", p->total);
    lua_pushinteger(L, p->retries);
    lua_setfield(L, -2, "retries");
    lua_rawseti(L, 3, (lua_Integer)p->i + 1);
    return 0;
}

static int curve_visit(void *ud, const px_curve_point *p)
{
    curve_ud *u = ud;
    lua_State *L = u->L;
    lua_pushcfunction(L, curve_push_point);
    lua_pushlightuserdata(L, u);
    lua_pushlightuserdata(L, (void *)p);
    lua_pushvalue(L, u->out);
    if (lua_pcall(L, 3, 0, 0) != LUA_OK) {
        u->raised = 1;
        return PX_ENOMEM; /* stops the sweep; the error is raised below */
    }
    return 0;
}

static int l_curve(lua_State *L)
{
    static const char *const vars[] = {"pH", "log_total", "log_a", NULL};
    px_db *db;
    px_thermo_ws *ws;
    px_lua_check_database(L, 1, &db, &ws);
    px_lua_opts_check(L, 2, "core.speciate", speciate_opts);
    px_lua_opts_check(L, 3, "core.curve", curve_opts);
    lua_settop(L, 3);
    px_spec_options o;
    read_spec_options(L, &o);
    px_curve c = {0};
    lua_getfield(L, 3, "var");
    c.var = (px_curve_var)luaL_checkoption(L, -1, "pH", vars);
    lua_getfield(L, 3, "name");
    c.name = lua_tostring(L, -1); /* anchored in the curve table */
    lua_getfield(L, 3, "element");
    c.element = luaL_checkstring(L, -1);
    lua_getfield(L, 3, "retries");
    c.retries = (int)luaL_optinteger(L, -1, 0);
    lua_getfield(L, 3, "retry_factor");
    c.retry_factor = luaL_optnumber(L, -1, 1);
    lua_getfield(L, 3, "warm");
    c.warm = lua_toboolean(L, -1);
    lua_pop(L, 6);
    lua_getfield(L, 3, "x");
    size_t n = lua_istable(L, -1) ? lua_rawlen(L, -1) : 0;
    double *x = lua_newuserdatauv(L, (n ? n : 1) * sizeof *x, 0); /* freed by the collector */
    for (size_t i = 0; i < n; i++) {
        lua_rawgeti(L, -2, (lua_Integer)i + 1);
        x[i] = lua_tonumber(L, -1);
        lua_pop(L, 1);
    }
    c.x = x;
    c.n = n;
    lua_createtable(L, (int)n, 0);
    curve_ud u = {L, db, &o, lua_gettop(L), 0};
    size_t retried = 0;
    char msg[512];
    int st = px_curve_run(ws, db, &o, &c, curve_visit, &u, &retried, msg, sizeof msg);
    if (u.raised) return lua_error(L);
    if (st != PX_OK) return px_lua_user_error(L, "speciate: %s", msg[0] ? msg : px_strerror(st));
    lua_pushinteger(L, (lua_Integer)retried);
    return 2;
}

void px_lua_open_equil(lua_State *L)
{
    lua_pushcfunction(L, l_speciate);
    lua_setfield(L, -2, "speciate");
    lua_pushcfunction(L, l_curve);
    lua_setfield(L, -2, "curve");
}
