/* l_thermo.c - the species database for Lua: core.database() returns a
 * phlox.Database userdata (a px_db plus its evaluation workspace) with
 * methods to load element definition files, look species up, and evaluate
 * standard-state properties, reactions and water at (T, P).  Also
 * core.formula(), core.default_pressure(), core.check_files().
 * Thin: argument checks, one call into the core, conversion of results. */
#include "core/status.h"
#include "data/data.h"
#include "lua/bindings.h"
#include "thermo/thermo.h"
#include "water/water.h"
#include <lauxlib.h>
#include <math.h>
#include <limits.h>
#include <stdio.h>
#include <stdlib.h>
#include <string.h>

#define DB_MT "phlox.Database"
#define PX_MSG 512

typedef struct {
    px_db *db;
    px_thermo_ws *ws;
} ldb;

static ldb *checkdb(lua_State *L)
{
    ldb *u = luaL_checkudata(L, 1, DB_MT);
    if (!u->db) luaL_error(L, "attempt to use a closed database");
    return u;
}

static int db_gc(lua_State *L)
{
    ldb *u = luaL_checkudata(L, 1, DB_MT);
    px_thermo_ws_free(u->ws);
    px_db_free(u->db);
    u->ws = NULL;
    u->db = NULL;
    return 0;
}

/* core.database([dielectric]) -> Database with the built-in species */
static int l_database(lua_State *L)
{
    static const char *const models[] = {"fernandez", "johnson-norton", NULL};
    int model = luaL_checkoption(L, 1, "fernandez", models);
    ldb *u = lua_newuserdatauv(L, sizeof *u, 0);
    u->db = NULL;
    u->ws = NULL;
    luaL_setmetatable(L, DB_MT);
    u->db = px_db_new();
    u->ws = px_thermo_ws_new(model == 0 ? PX_DIELECTRIC_R8_97 : PX_DIELECTRIC_JN91);
    if (!u->db || !u->ws) return luaL_error(L, "database: out of memory");
    int st = px_db_add_builtins(u->db);
    if (st == PX_OK) st = px_data_cite_builtins(u->db);
    if (st != PX_OK) return luaL_error(L, "database: built-in species: %s", px_strerror(st));
    return 1;
}

static void push_problems(lua_State *L, const px_data_problems *p)
{
    size_t n = px_data_problems_count(p);
    lua_createtable(L, (int)n, 0);
    char line[1024];
    for (size_t i = 0; i < n; i++) {
        const px_data_problem *pr = px_data_problems_get(p, i);
        px_data_problem_format(pr, line, sizeof line);
        lua_createtable(L, 0, 6);
        px_lua_setstr(L, "text", line);
        px_lua_setstr(L, "severity", pr->severity == PX_DATA_ERROR ? "error" : "warning");
        px_lua_setstr(L, "file", pr->file);
        lua_pushinteger(L, pr->line);
        lua_setfield(L, -2, "line");
        px_lua_setstr(L, "species", pr->species);
        px_lua_setstr(L, "message", pr->message);
        lua_rawseti(L, -2, (lua_Integer)i + 1);
    }
}

/* Element list option {"Fe", "Cl"} -> atomic numbers (in a userdata box). */
static int *opt_elements(lua_State *L, int idx, size_t *n)
{
    *n = 0;
    if (lua_getfield(L, idx, "elements") != LUA_TTABLE) {
        lua_pop(L, 1);
        return NULL;
    }
    /* the raw length: a __len metamethod could claim any size (a negative
     * one wrapped to a huge size_t) */
    size_t len = lua_rawlen(L, -1);
    if (len > PX_ELEMENT_MAX)
        px_lua_user_error(L, "load: option 'elements' lists %d entries (at most %d elements exist)",
                          (int)(len > INT_MAX ? INT_MAX : len), PX_ELEMENT_MAX);
    int *z = lua_newuserdatauv(L, (len ? len : 1) * sizeof *z, 0);
    for (size_t i = 0; i < len; i++) {
        const char *sym = lua_rawgeti(L, -2, (lua_Integer)i + 1) == LUA_TSTRING ? lua_tostring(L, -1) : NULL;
        if (!sym || !(z[i] = px_element_z(sym)))
            px_lua_user_error(L, "load: option 'elements'[%d]: unknown element '%s'", (int)i + 1,
                              sym ? sym : luaL_typename(L, -1));
        lua_pop(L, 1);
    }
    lua_remove(L, -2); /* the list; the box stays on the stack */
    *n = len;
    return z;
}

/* db:load(text, name [, {elements = {...}, user = bool}])
 *   -> true, problems | nil, message, problems */
static int db_load(lua_State *L)
{
    ldb *u = checkdb(L);
    size_t len;
    const char *text = luaL_checklstring(L, 2, &len);
    const char *name = luaL_checkstring(L, 3);
    lua_settop(L, 4);
    px_data_options o = px_data_options_default();
    int user = 0;
    static const px_lua_opt load_opts[] = {{"elements", "strings", 0, 0}, {"user", "boolean", 0, 0},
                                           {NULL, NULL, 0, 0}};
    if (!lua_isnil(L, 4)) px_lua_opts_check(L, 4, "Database:load", load_opts);
    if (lua_istable(L, 4)) {
        o.elements = opt_elements(L, 4, &o.n_elements);
        lua_getfield(L, 4, "user");
        user = lua_toboolean(L, -1);
        lua_pop(L, 1);
    }
    px_data_problems *p = px_data_problems_new();
    if (!p) return luaL_error(L, "load: out of memory");
    int st = user ? px_data_merge_user_buffer(u->db, text, len, name, &o, p)
                  : px_data_load_buffer(u->db, text, len, name, &o, p);
    if (st != PX_OK) {
        luaL_pushfail(L);
        char line[1024] = "";
        size_t n = px_data_problems_count(p);
        for (size_t i = 0; i < n; i++) { /* the first error is the message */
            const px_data_problem *pr = px_data_problems_get(p, i);
            if (pr->severity == PX_DATA_ERROR) {
                px_data_problem_format(pr, line, sizeof line);
                break;
            }
        }
        if (!line[0]) snprintf(line, sizeof line, "%s: %s", name, px_strerror(st));
        lua_pushstring(L, line);
        push_problems(L, p);
        px_data_problems_free(p);
        return 3;
    }
    lua_pushboolean(L, 1);
    push_problems(L, p);
    px_data_problems_free(p);
    return 2;
}

static void push_formula(lua_State *L, const px_formula *f)
{
    static const char *const states[] = {"aq", "s", "l", "g", "e"};
    lua_createtable(L, 0, 8);
    px_lua_setstr(L, "formula", f->text);
    lua_pushinteger(L, f->charge);
    lua_setfield(L, -2, "charge");
    px_lua_setstr(L, "state", states[f->state]);
    px_lua_setstr(L, "form", f->form);
    lua_createtable(L, 0, f->n_elem);
    for (int i = 0; i < f->n_elem; i++) {
        lua_pushnumber(L, f->elem[i].n);
        lua_setfield(L, -2, px_element_symbol(f->elem[i].z));
    }
    lua_setfield(L, -2, "elements");
    double mm = px_formula_molar_mass(f);
    if (isfinite(mm)) {
        lua_pushnumber(L, mm);
        lua_setfield(L, -2, "molar_mass");
    }
}

static void setnum(lua_State *L, const char *k, double v)
{
    if (isfinite(v)) {
        lua_pushnumber(L, v);
        lua_setfield(L, -2, k);
    }
}

static void push_species(lua_State *L, const px_species *sp, long index)
{
    static const char *const models[] = {"hkf", "cp", "logk", "water"};
    push_formula(L, &sp->f);
    lua_pushinteger(L, index + 1);
    lua_setfield(L, -2, "index");
    px_lua_setstr(L, "model", models[sp->model]);
    setnum(L, "dfG", sp->dGf);
    setnum(L, "dfH", sp->dHf);
    setnum(L, "S", sp->S);
    if (sp->model == PX_MODEL_LOGK) {
        px_lua_setstr(L, "reaction", sp->logk.reaction);
        setnum(L, "logK25", sp->logk.logK25);
        setnum(L, "dH", sp->logk.dH); /* J/mol, absent if not given */
        if (sp->logk.dCp != 0) setnum(L, "dCp", sp->logk.dCp); /* J/(mol K), constant */
        if (sp->logk.analytic) {
            lua_pushboolean(L, 1);
            lua_setfield(L, -2, "logK_T");
        }
        if (sp->logk.model[0]) {
            lua_pushstring(L, sp->logk.model); /* the isocoulombic model reaction (log K or dCp) */
            lua_setfield(L, -2, "estimate_model");
        }
    }
    px_lua_setstr(L, "source", sp->source ? sp->source : "");
    lua_newtable(L); /* the keys the source cites, in order, each once */
    {
        char key[PX_REF_KEY_MAX];
        size_t pos = 0;
        lua_Integer n = 0;
        while (px_ref_next(sp->source, &pos, key)) {
            int seen = 0;
            for (lua_Integer i = 1; i <= n && !seen; i++) {
                lua_rawgeti(L, -1, i);
                seen = strcmp(lua_tostring(L, -1), key) == 0;
                lua_pop(L, 1);
            }
            if (seen) continue;
            lua_pushstring(L, key);
            lua_rawseti(L, -2, ++n);
        }
    }
    lua_setfield(L, -2, "refs");
    if (sp->file) {
        px_lua_setstr(L, "file", sp->file);
        lua_pushinteger(L, sp->line);
        lua_setfield(L, -2, "line");
    }
    px_lua_setstr(L, "quality", sp->quality);
    lua_pushboolean(L, sp->estimated);
    lua_setfield(L, -2, "estimated");
    /* temperature basis: measured, estimated (by basis_method), held, no Cp */
    px_lua_setstr(L, "basis", px_tbasis_name(sp->tbasis));
    if (sp->tmethod[0]) {
        px_lua_setstr(L, "basis_method", sp->tmethod);
    }
    setnum(L, "Tmin", sp->Tmin);
    setnum(L, "Tmax", sp->Tmax);
    /* the source's +- (internal units), only the ones given */
    lua_createtable(L, 0, 4);
    setnum(L, "G", sp->unc.G); /* setnum skips NAN */
    setnum(L, "H", sp->unc.H);
    setnum(L, "S", sp->unc.S);
    setnum(L, "logK", sp->unc.logK);
    lua_setfield(L, -2, "uncertainty");
}

static const px_species *checkspecies(lua_State *L, ldb *u, int arg, long *index)
{
    const char *name = luaL_checkstring(L, arg);
    long i;
    char why[512];
    if (px_db_resolve(u->db, name, &i, why, sizeof why) != PX_OK) luaL_error(L, "%s", why);
    if (index) *index = i;
    return px_db_get(u->db, (size_t)i);
}

/* db:species(formula | index) -> table | nil */
static int db_species(lua_State *L)
{
    ldb *u = checkdb(L);
    long i;
    if (lua_type(L, 2) == LUA_TNUMBER) i = (long)luaL_checkinteger(L, 2) - 1;
    else if (px_db_resolve(u->db, luaL_checkstring(L, 2), &i, NULL, 0) != PX_OK) i = -1;
    const px_species *sp = i >= 0 ? px_db_get(u->db, (size_t)i) : NULL;
    if (!sp) {
        lua_pushnil(L);
        return 1;
    }
    push_species(L, sp, i);
    return 1;
}

static int db_count(lua_State *L)
{
    ldb *u = checkdb(L);
    lua_pushinteger(L, (lua_Integer)px_db_count(u->db));
    return 1;
}

static int db_remove(lua_State *L)
{
    ldb *u = checkdb(L);
    int st = px_db_remove(u->db, luaL_checkstring(L, 2));
    lua_pushboolean(L, st == PX_OK);
    return 1;
}

/* T (K) and P (bar, default: px_thermo_default_pressure).  Returns 0, or
 * pushes nil, message and returns 2 (an expected failure: out of range). */
static int checkTP(lua_State *L, int iT, int iP, double *T, double *P)
{
    *T = luaL_checknumber(L, iT);
    if (!isfinite(*T) || *T <= 0) return px_lua_user_error(L, "temperature must be a finite number of kelvin, got %f", *T);
    if (!lua_isnoneornil(L, iP)) {
        double p = luaL_checknumber(L, iP);
        if (!(p > 0 && p <= PX_WATER_PMAX))
            return px_lua_user_error(L, "pressure %f bar is out of range (0, %f]", p, PX_WATER_PMAX);
    }
    if (lua_isnoneornil(L, iP)) {
        int st = px_thermo_default_pressure(*T, P);
        if (st != PX_OK) {
            luaL_pushfail(L);
            lua_pushfstring(L, "T = %f K (%f C): %s (the water model covers %f to %f C)", *T,
                            *T - 273.15, px_strerror(st), PX_WATER_TMIN - 273.15, PX_WATER_TMAX - 273.15);
            return 2;
        }
    } else {
        *P = luaL_checknumber(L, iP);
    }
    return 0;
}

/* db:props(formula, T [, P]) -> {G, H, S, Cp, V} | nil, message */
static int db_props(lua_State *L)
{
    ldb *u = checkdb(L);
    const px_species *sp = checkspecies(L, u, 2, NULL);
    double T, P;
    if (checkTP(L, 3, 4, &T, &P)) return 2;
    px_thermo_props pr;
    int st = px_thermo_species_props(u->ws, u->db, sp, T, P, &pr);
    if (st != PX_OK) {
        luaL_pushfail(L);
        lua_pushfstring(L, "%s: %s", px_strerror(st), px_thermo_ws_error(u->ws));
        return 2;
    }
    lua_createtable(L, 0, 7);
    setnum(L, "G", pr.G);
    setnum(L, "H", pr.H);
    setnum(L, "S", pr.S);
    setnum(L, "Cp", pr.Cp);
    setnum(L, "V", pr.V);
    lua_pushnumber(L, T);
    lua_setfield(L, -2, "T");
    lua_pushnumber(L, P);
    lua_setfield(L, -2, "P");
    return 1;
}

/* db:reaction(text, T [, P]) -> {dG, dH, dS, logK, E, n_e, T, P, text} | nil, message */
static int db_reaction(lua_State *L)
{
    ldb *u = checkdb(L);
    const char *text = luaL_checkstring(L, 2);
    double T, P;
    if (checkTP(L, 3, 4, &T, &P)) return 2;
    px_reaction r;
    char msg[PX_MSG];
    int st = px_reaction_parse_balanced(text, &r, msg, sizeof msg);
    if (st != PX_OK) {
        luaL_pushfail(L);
        lua_pushfstring(L, "reaction '%s': %s", text, msg);
        return 2;
    }
    for (int i = 0; i < r.n; i++) { /* "ZnO(s)" stands for the only solid of that formula */
        long k;
        char why[512];
        if (r.sp[i].state == PX_STATE_E) continue;
        if (px_db_resolve(u->db, r.sp[i].text, &k, why, sizeof why) != PX_OK) {
            luaL_pushfail(L);
            lua_pushfstring(L, "reaction '%s': %s", text, why);
            return 2;
        }
        r.sp[i] = px_db_get(u->db, (size_t)k)->f;
    }
    px_reaction_result pr;
    st = px_reaction_props(u->ws, u->db, &r, T, P, &pr);
    if (st != PX_OK) {
        luaL_pushfail(L);
        lua_pushfstring(L, "reaction '%s' at %f K, %f bar: %s: %s", text, T, P, px_strerror(st),
                        px_thermo_ws_error(u->ws));
        return 2;
    }
    lua_createtable(L, 0, 10);
    setnum(L, "dG", pr.dG);
    setnum(L, "dH", pr.dH);
    setnum(L, "dS", pr.dS);
    setnum(L, "dCp", pr.dCp);
    setnum(L, "dV", pr.dV);
    setnum(L, "logK", pr.logK);
    lua_pushnumber(L, pr.n_e);
    lua_setfield(L, -2, "n_e");
    setnum(L, "E", pr.E);
    lua_pushnumber(L, T);
    lua_setfield(L, -2, "T");
    lua_pushnumber(L, P);
    lua_setfield(L, -2, "P");
    char canon[PX_MSG];
    if (px_reaction_format(&r, canon, sizeof canon) == PX_OK) {
        px_lua_setstr(L, "text", canon);
    }
    return 1;
}

/* db:isocoulombic(reaction, logK25, T [, P]) -> log K, n | nil, message: the
 * one-term isocoulombic estimate of a reaction's log K at T from its 25 C
 * value (px_isocoulombic_logK); n = water ionisations added. */
static int db_isocoulombic(lua_State *L)
{
    ldb *u = checkdb(L);
    const char *text = luaL_checkstring(L, 2);
    double logK25 = luaL_checknumber(L, 3);
    double T, P;
    if (checkTP(L, 4, 5, &T, &P)) return 2;
    px_reaction r;
    char msg[PX_MSG];
    if (px_reaction_parse_balanced(text, &r, msg, sizeof msg) != PX_OK)
        return luaL_error(L, "isocoulombic: reaction '%s': %s", text, msg);
    double logK, n;
    int st = px_isocoulombic_logK(u->ws, u->db, &r, logK25, T, P, &logK);
    if (st != PX_OK) {
        luaL_pushfail(L);
        lua_pushfstring(L, "%s: %s", px_strerror(st), px_thermo_ws_error(u->ws));
        return 2;
    }
    px_reaction_isocoulombic_n(&r, &n);
    lua_pushnumber(L, logK);
    lua_pushnumber(L, n);
    return 2;
}

/* db:hkf_reestimate(formula, T [, P]) -> G_estimated, G_record | nil, message:
 * an HKF species' G at T from parameters re-derived by the Shock and
 * Helgeson 1988 correlations (px_hkf_estimate) from its own S and its Cp and
 * V at 25 C (papers' Born constants), for validating the correlations. */
static int db_hkf_reestimate(lua_State *L)
{
    ldb *u = checkdb(L);
    const px_species *sp = checkspecies(L, u, 2, NULL);
    if (sp->model != PX_MODEL_HKF) return luaL_error(L, "hkf_reestimate: %s is not an HKF species", sp->f.text);
    double T, P;
    if (checkTP(L, 3, 4, &T, &P)) return 2;
    px_water_state w25;
    px_hkf_papers_water_25C(&w25);
    px_thermo_props p25;
    int st = px_hkf_props(&sp->hkf, sp->f.charge, sp->dGf, sp->dHf, sp->S, &w25, &w25, 0, &p25);
    px_species est = *sp; /* borrows the strings of sp: not added to any db */
    memset(&est.hkf, 0, sizeof est.hkf);
    if (st == PX_OK) st = px_hkf_estimate(&est, p25.Cp, p25.V * 10.0 /* J/bar -> cm3/mol */);
    double Ge = NAN, Gr = NAN;
    if (st == PX_OK) st = px_thermo_species_G(u->ws, u->db, &est, T, P, &Ge);
    if (st == PX_OK) st = px_thermo_species_G(u->ws, u->db, sp, T, P, &Gr);
    if (st != PX_OK) {
        luaL_pushfail(L);
        lua_pushfstring(L, "%s: %s: %s", sp->f.text, px_strerror(st), px_thermo_ws_error(u->ws));
        return 2;
    }
    lua_pushnumber(L, Ge);
    lua_pushnumber(L, Gr);
    return 2;
}

/* db:references() -> { {key =, short =, cite =}, ... }: the publications
 * the loaded records cite, in the order they were first cited */
static int db_references(lua_State *L)
{
    ldb *u = checkdb(L);
    size_t n = px_db_ref_count(u->db);
    lua_createtable(L, (int)n, 0);
    for (size_t i = 0; i < n; i++) {
        const px_ref *r = px_db_ref_get(u->db, i);
        lua_createtable(L, 0, 3);
        px_lua_setstr(L, "key", r->key);
        px_lua_setstr(L, "short", r->short_text);
        px_lua_setstr(L, "cite", r->cite);
        lua_rawseti(L, -2, (lua_Integer)i + 1);
    }
    return 1;
}

/* db:list_text([element]) -> the `phlox list` text */
static int db_list_text(lua_State *L)
{
    ldb *u = checkdb(L);
    const char *el = luaL_optstring(L, 2, NULL);
    FILE *f = tmpfile();
    if (!f) return luaL_error(L, "list: cannot create a temporary file");
    size_t n = px_data_list_write(u->db, el, f);
    long len = ftell(f);
    rewind(f);
    luaL_Buffer b;
    char *p = luaL_buffinitsize(L, &b, len > 0 ? (size_t)len : 1);
    size_t got = len > 0 ? fread(p, 1, (size_t)len, f) : 0;
    fclose(f);
    luaL_pushresultsize(&b, got);
    lua_pushinteger(L, (lua_Integer)n);
    return 2;
}

/* core.water(T [, P [, dielectric]]) -> table of the water state */
static int l_water(lua_State *L)
{
    static const char *const models[] = {"fernandez", "johnson-norton", NULL};
    double T, P;
    if (checkTP(L, 1, 2, &T, &P)) return 2;
    int model = luaL_checkoption(L, 3, "fernandez", models);
    px_water_state w;
    int st = px_water_state_eval(T, P, model == 0 ? PX_DIELECTRIC_R8_97 : PX_DIELECTRIC_JN91, &w);
    if (st != PX_OK) {
        luaL_pushfail(L);
        lua_pushfstring(L, "water at %f K, %f bar: %s", T, P, px_strerror(st));
        return 2;
    }
    lua_createtable(L, 0, 16);
    setnum(L, "T", w.T);
    setnum(L, "P", w.P);
    setnum(L, "rho", w.rho);
    setnum(L, "eps", w.eps);
    setnum(L, "A", w.A_gamma);
    setnum(L, "B", w.B_gamma);
    setnum(L, "Q", w.Q);
    setnum(L, "Y", w.Y);
    setnum(L, "X", w.X);
    setnum(L, "G", w.G);
    setnum(L, "S", w.S);
    setnum(L, "Cp", w.Cp);
    double pkw;
    if (px_water_pkw(T, w.rho, &pkw) == PX_OK) setnum(L, "pKw", pkw);
    return 1;
}

/* A function of T (K) giving a pressure (bar), as (P) or (nil, message). */
static int push_pressure_of_T(lua_State *L, int (*fn)(double, double *), const char *what)
{
    double T = luaL_checknumber(L, 1), P;
    int st = fn(T, &P);
    if (st != PX_OK) {
        luaL_pushfail(L);
        lua_pushfstring(L, "%s at %f K: %s", what, T, px_strerror(st));
        return 2;
    }
    lua_pushnumber(L, P);
    return 1;
}

/* core.psat(T) -> bar | nil, message */
static int l_psat(lua_State *L)
{
    return push_pressure_of_T(L, px_water_psat, "saturation pressure");
}

/* core.default_pressure(T) -> bar (1 bar, or psat above the boiling point) */
static int l_default_pressure(lua_State *L)
{
    return push_pressure_of_T(L, px_thermo_default_pressure, "default pressure");
}

/* core.formula(text) -> table | nil, message */
static int l_formula(lua_State *L)
{
    px_formula f;
    char msg[PX_MSG];
    int st = px_formula_parse_msg(luaL_checkstring(L, 1), &f, msg, sizeof msg);
    if (st != PX_OK) {
        luaL_pushfail(L);
        lua_pushstring(L, msg);
        return 2;
    }
    push_formula(L, &f);
    return 1;
}

/* core.reaction_terms(text) -> {{formula, charge, state, elements, nu}...} | nil, message:
 * the species of a reaction as the C parser reads it (balance not checked) */
static int l_reaction_terms(lua_State *L)
{
    px_reaction r;
    char msg[PX_MSG];
    if (px_reaction_parse(luaL_checkstring(L, 1), &r, msg, sizeof msg) != PX_OK) {
        luaL_pushfail(L);
        lua_pushstring(L, msg);
        return 2;
    }
    lua_createtable(L, r.n, 0);
    for (int i = 0; i < r.n; i++) {
        push_formula(L, &r.sp[i]);
        lua_pushnumber(L, r.nu[i]);
        lua_setfield(L, -2, "nu");
        lua_rawseti(L, -2, i + 1);
    }
    return 1;
}

/* core.ligand_order() -> {"Cl", "S", ...}: the ligand files in load order */
static int l_ligand_order(lua_State *L)
{
    lua_newtable(L);
    for (size_t i = 0; px_data_ligand_z(i); i++) {
        lua_pushstring(L, px_element_symbol(px_data_ligand_z(i)));
        lua_rawseti(L, -2, (lua_Integer)i + 1);
    }
    return 1;
}

/* core.check_files({path...}) -> ok, {problem...} */
static int l_check_files(lua_State *L)
{
    luaL_checktype(L, 1, LUA_TTABLE);
    size_t n = (size_t)luaL_len(L, 1);
    const char **paths = lua_newuserdatauv(L, (n ? n : 1) * sizeof *paths, 0);
    for (size_t i = 0; i < n; i++) {
        lua_rawgeti(L, 1, (lua_Integer)i + 1);
        paths[i] = luaL_checkstring(L, -1);
        lua_pop(L, 1); /* the string stays alive in the argument table */
    }
    px_data_problems *p = px_data_problems_new();
    if (!p) return luaL_error(L, "check: out of memory");
    int st = px_data_check_files(paths, n, NULL, p);
    lua_pushboolean(L, st == PX_OK);
    push_problems(L, p);
    px_data_problems_free(p);
    return 2;
}

/* core.limits: the ranges the entry points accept (stdlib/phlox/options.lua reads them) */
static void push_limits(lua_State *L)
{
    static const struct {
        const char *name;
        double value;
    } limits[] = {{"T_min", PX_WATER_TMIN}, {"T_max", PX_WATER_TMAX}, {"P_max", PX_WATER_PMAX},
                  {"file_max", (double)PX_DATA_FILE_MAX}};
    lua_createtable(L, 0, 4);
    for (size_t i = 0; i < sizeof limits / sizeof limits[0]; i++) {
        lua_pushnumber(L, limits[i].value);
        lua_setfield(L, -2, limits[i].name);
    }
    lua_setfield(L, -2, "limits");
}

void px_lua_open_thermo(lua_State *L)
{
    static const luaL_Reg methods[] = {
        {"isocoulombic", db_isocoulombic}, {"hkf_reestimate", db_hkf_reestimate},
        {"load", db_load},       {"species", db_species}, {"count", db_count},
        {"remove", db_remove},   {"props", db_props},     {"reaction", db_reaction},
        {"list_text", db_list_text}, {"references", db_references}, {NULL, NULL}};
    static const luaL_Reg funcs[] = {
        {"database", l_database}, {"water", l_water},         {"psat", l_psat},
        {"default_pressure", l_default_pressure}, {"formula", l_formula},
        {"reaction_terms", l_reaction_terms}, {"ligand_order", l_ligand_order},
        {"check_files", l_check_files}, {NULL, NULL}};
    luaL_newmetatable(L, DB_MT);
    luaL_newlib(L, methods);
    lua_setfield(L, -2, "__index");
    lua_pushcfunction(L, db_gc);
    lua_setfield(L, -2, "__gc");
    lua_pushcfunction(L, db_gc);
    lua_setfield(L, -2, "__close");
    lua_pop(L, 1);
    luaL_setfuncs(L, funcs, 0);
    push_limits(L);
}

/* For other binding files (maps, speciation): the db and workspace behind
 * a phlox.Database argument. */
int px_lua_check_database(lua_State *L, int arg, px_db **db, px_thermo_ws **ws)
{
    ldb *u = luaL_checkudata(L, arg, DB_MT);
    if (!u->db) return luaL_error(L, "attempt to use a closed database");
    *db = u->db;
    *ws = u->ws;
    return 0;
}
