/* read.c - copy the table an element file returned into C records.
 *
 * Runs inside a protected call in the (already finished) sandbox state: only
 * raw table reads, no metamethods, no file code.  Every field is checked for
 * its name (unknown fields are errors, with a "did you mean" for a case slip),
 * its type and its range, and every value is converted to the internal SI
 * units of species.h here, once:
 *   energies (G, H, dH): kJ x 1000, J x 1, kcal x 4184, cal x 4.184 -> J/mol
 *   entropies (S): J x 1, cal x 4.184 -> J/(mol K)
 *   HKF parameters, printed scaling in calories (Shock and Helgeson 1988
 *     tables; tests/reference/hkf/README.md): a1 x 0.1, a2 x 1e2,
 *     a3 x 1, a4 x 1e4, c1 x 1, c2 x 1e4, omega x 1e5, then x 4.184 J/cal
 *   molar volume V: cm3/mol x 0.1 -> J/bar
 * Host memory failures set f->oom and raise, so the sandbox can tell them
 * from data errors. */
#include "core/alloc.h"
#include "data/data_internal.h"
#include "core/constants.h"
#include "core/status.h"
#include <lauxlib.h>
#include <lua.h>
#include <math.h>
#include <stdlib.h>
#include <string.h>
#include <ctype.h>

/* HKF printed-scaling factors (raw = printed x factor), Shock and Helgeson
 * 1988 table headers, as listed in tests/reference/hkf/README.md */
#define HKF_A1_SCALE 1e-1
#define HKF_A2_SCALE 1e2
#define HKF_A3_SCALE 1.0
#define HKF_A4_SCALE 1e4
#define HKF_C1_SCALE 1.0
#define HKF_C2_SCALE 1e4
#define HKF_OMEGA_SCALE 1e5
/* below this a T_range bound is suspected to be in degrees Celsius
 * (common practice, no source: no aqueous model here goes below 273 K) */
#define TRANGE_SUSPECT_K 200.0

static const char *const file_fields[] = {"element", "title", "units", "T_range", "note",
                                          "references", "sources", "species", "exclude", NULL};
static const char *const species_fields[] = {
    "formula", "model",    "G",        "H",      "S",        "cp",     "V",
    "T_range", "source",   "quality",  "note",   "hkf",      "estimated", "estimate",
    "reaction", "logK",    "dH",       "logK_T", "units",    "uncertainty",
    "known_mismatch", "dCp", NULL};
/* fields that belong to one model only */
static const char *const cp_only[] = {"cp", "V", NULL};
static const char *const logk_only[] = {"reaction", "logK", "dH", "logK_T", "dCp", NULL};
/* HKF fields the other models may not carry (logk and cp have their own 'estimate') */
static const char *const hkf_fields[] = {"hkf", "estimated", NULL};
/* temperature-estimation methods of a logk species (docs/thermo.md) */
#define LOGK_METHOD_ISOCOULOMBIC "isocoulombic"
#define LOGK_METHOD_MAX 32
/* the estimation method of a logk species' constant dCp (docs/thermo.md) */
#define LOGK_CP_METHOD_CRISS_COBBLE "criss-cobble"
#define LOGK_CP_METHOD_ISOCOULOMBIC "isocoulombic" /* dCp(T) of a model reaction */
#define CP_METHOD_KOPP "kopp" /* Kopp-Neumann additivity of a solid's Cp */
static const char *const ghs[] = {"G", "H", "S", NULL};

static int in_list(const char *const *list, const char *s)
{
    for (; *list; list++)
        if (strcmp(*list, s) == 0) return 1;
    return 0;
}

static int same_nocase(const char *a, const char *b)
{
    for (; *a && *b; a++, b++)
        if (tolower((unsigned char)*a) != tolower((unsigned char)*b)) return 0;
    return *a == *b;
}

static const char *case_match(const char *const *list, const char *s)
{
    for (; *list; list++)
        if (same_nocase(*list, s)) return *list;
    return NULL;
}

typedef struct ctx {
    lua_State *L;
    pxd_file *f;
    pxd_entry *e; /* NULL for file-level fields */
} ctx;

static void oom(ctx *c)
{
    c->f->oom = 1;
    luaL_error(c->L, "out of memory");
}

#define REPORT(c, sev, field, ...)                                                     \
    do {                                                                               \
        if ((c)->e) pxd_report_entry((c)->f, (c)->e, (sev), (field), __VA_ARGS__);   \
        else pxd_report((c)->f, (sev), pxd_toplevel_line((c)->f, (field)), "", (field), \
                        __VA_ARGS__);                                                  \
        if ((c)->f->oom) oom(c);                                                       \
    } while (0)

/* pushes t[key] (raw), returns its type */
static int rawfield(lua_State *L, int t, const char *key)
{
    lua_pushstring(L, key);
    return lua_rawget(L, t);
}

/* describes a key found by lua_next without converting it in place */
static void key_text(lua_State *L, int k, char *buf, size_t n)
{
    if (lua_type(L, k) == LUA_TSTRING) snprintf(buf, n, "%s", lua_tostring(L, k));
    else if (lua_type(L, k) == LUA_TNUMBER) snprintf(buf, n, "[%g]", lua_tonumber(L, k));
    else snprintf(buf, n, "(%s key)", luaL_typename(L, k));
}

/* every key of table T must be a string in ALLOWED; errors name PREFIX.key */
static void check_keys(ctx *c, int t, const char *const *allowed, const char *prefix)
{
    lua_State *L = c->L;
    lua_pushnil(L);
    while (lua_next(L, t)) {
        char key[80], field[128];
        key_text(L, -2, key, sizeof key);
        snprintf(field, sizeof field, "%s%s%s", prefix, *prefix ? "." : "", key);
        if (lua_type(L, -2) != LUA_TSTRING) {
            REPORT(c, PX_DATA_ERROR, prefix, "unexpected entry %s (fields are name = value)", key);
        } else if (!in_list(allowed, key)) {
            const char *m = case_match(allowed, key);
            if (m) REPORT(c, PX_DATA_ERROR, field, "unknown field '%s' (did you mean '%s'?)", key, m);
            else REPORT(c, PX_DATA_ERROR, field, "unknown field '%s'", key);
        }
        lua_pop(L, 1);
    }
}

/* number at t[key]: 1 valid (stored in *out x factor), 0 absent, -1 bad */
static int get_num(ctx *c, int t, const char *key, const char *field, double factor, double *out)
{
    lua_State *L = c->L;
    int ty = rawfield(L, t, key);
    int r = 0;
    if (ty == LUA_TNUMBER) {
        double v = lua_tonumber(L, -1);
        if (!isfinite(v)) {
            REPORT(c, PX_DATA_ERROR, field, "not a finite number");
            r = -1;
        } else {
            *out = v * factor;
            r = 1;
        }
    } else if (ty != LUA_TNIL) {
        REPORT(c, PX_DATA_ERROR, field, "expected a number, got %s", lua_typename(L, ty));
        r = -1;
    }
    lua_pop(L, 1);
    return r;
}

/* string at t[key] copied into buf (n bytes): 1, 0 absent, -1 bad */
static int get_str(ctx *c, int t, const char *key, const char *field, char *buf, size_t n)
{
    lua_State *L = c->L;
    int ty = rawfield(L, t, key);
    int r = 0;
    if (ty == LUA_TSTRING) {
        size_t l;
        const char *s = lua_tolstring(L, -1, &l);
        if (l >= n || strlen(s) != l) {
            REPORT(c, PX_DATA_ERROR, field, "text too long (at most %zu bytes) or contains NUL",
                   n - 1);
            r = -1;
        } else {
            memcpy(buf, s, l + 1);
            r = 1;
        }
    } else if (ty != LUA_TNIL) {
        REPORT(c, PX_DATA_ERROR, field, "expected a string, got %s", lua_typename(L, ty));
        r = -1;
    }
    lua_pop(L, 1);
    return r;
}

/* t[key] as a table pushed on the stack: 1 (pushed), 0 absent, -1 bad (nothing pushed) */
static int get_table(ctx *c, int t, const char *key, const char *field)
{
    int ty = rawfield(c->L, t, key);
    if (ty == LUA_TTABLE) return 1;
    lua_pop(c->L, 1);
    if (ty == LUA_TNIL) return 0;
    REPORT(c, PX_DATA_ERROR, field, "expected a table, got %s", lua_typename(c->L, ty));
    return -1;
}

static int energy_factor(const char *u, double *out)
{
    if (strcmp(u, "kJ") == 0) *out = PXD_KJ;
    else if (strcmp(u, "J") == 0) *out = 1.0;
    else if (strcmp(u, "kcal") == 0) *out = PXD_KCAL;
    else if (strcmp(u, "cal") == 0) *out = PX_CAL;
    else return 0;
    return 1;
}

static int entropy_factor(const char *u, double *out)
{
    if (strcmp(u, "J") == 0) *out = 1.0;
    else if (strcmp(u, "cal") == 0) *out = PX_CAL;
    else return 0;
    return 1;
}

/* units = { energy = ..., entropy = ... } at t (if present) */
static void read_units(ctx *c, int t, double *eu, double *su)
{
    if (get_table(c, t, "units", "units") != 1) return;
    int u = lua_gettop(c->L);
    static const char *const unit_fields[] = {"energy", "entropy", NULL};
    check_keys(c, u, unit_fields, "units");
    char buf[16];
    if (get_str(c, u, "energy", "units.energy", buf, sizeof buf) == 1 && !energy_factor(buf, eu))
        REPORT(c, PX_DATA_ERROR, "units.energy", "unknown energy unit '%s' (kJ, J, kcal or cal)", buf);
    if (get_str(c, u, "entropy", "units.entropy", buf, sizeof buf) == 1 && !entropy_factor(buf, su))
        REPORT(c, PX_DATA_ERROR, "units.entropy",
               "unknown entropy unit '%s' (J or cal, per mol and K)", buf);
    lua_pop(c->L, 1);
}

/* T_range = { lo, hi } in K */
static void read_trange(ctx *c, int t, double *lo, double *hi)
{
    if (get_table(c, t, "T_range", "T_range") != 1) return;
    lua_State *L = c->L;
    int r = lua_gettop(L);
    double v[2];
    int ok = lua_rawlen(L, r) == 2;
    for (int i = 0; ok && i < 2; i++) {
        ok = lua_rawgeti(L, r, i + 1) == LUA_TNUMBER && isfinite(v[i] = lua_tonumber(L, -1));
        lua_pop(L, 1);
    }
    if (!ok) {
        REPORT(c, PX_DATA_ERROR, "T_range", "expected { Tmin, Tmax } in kelvin");
    } else if (!(v[0] > 0 && v[0] < v[1])) {
        REPORT(c, PX_DATA_ERROR, "T_range", "need 0 < Tmin < Tmax (kelvin), got { %g, %g }", v[0],
               v[1]);
    } else {
        if (v[0] < TRANGE_SUSPECT_K)
            REPORT(c, PX_DATA_WARNING, "T_range",
                   "Tmin = %g K is very low: T_range is in kelvin, not degrees Celsius", v[0]);
        *lo = v[0];
        *hi = v[1];
    }
    lua_pop(L, 1);
}

static void forbid(ctx *c, int t, const char *const *fields, const char *model)
{
    for (; *fields; fields++) {
        int ty = rawfield(c->L, t, *fields);
        lua_pop(c->L, 1);
        if (ty != LUA_TNIL)
            REPORT(c, PX_DATA_ERROR, *fields, "field '%s' does not belong to model '%s'", *fields,
                   model);
    }
}

static void require_num(ctx *c, int t, const char *key, double factor, double *out, int *has,
                        const char *model)
{
    int r = get_num(c, t, key, key, factor, out);
    *has = r == 1;
    if (r == 0) REPORT(c, PX_DATA_ERROR, key, "missing required field '%s' (model '%s')", key, model);
}

/* cp estimate = { Cp = "kopp", from = { ["NiO(s)"] = 1, ... } } (docs/element-files.md);
 * returns 1 if a valid estimate was read */
static int read_cp_estimate(ctx *c, int t, pxd_entry *e)
{
    int re = get_table(c, t, "estimate", "estimate");
    if (re != 1) return 0;
    lua_State *L = c->L;
    int p = lua_gettop(L);
    static const char *const k[] = {"Cp", "from", NULL};
    check_keys(c, p, k, "estimate");
    int ok = 1;
    char method[16];
    int rm = get_str(c, p, "Cp", "estimate.Cp", method, sizeof method);
    if (rm == 0) {
        REPORT(c, PX_DATA_ERROR, "estimate.Cp", "name the method: estimate = { Cp = \"%s\", from = {...} }",
               CP_METHOD_KOPP);
        ok = 0;
    } else if (rm == 1 && strcmp(method, CP_METHOD_KOPP) != 0) {
        REPORT(c, PX_DATA_ERROR, "estimate.Cp", "unknown estimation method '%s' (model 'cp' knows \"%s\")",
               method, CP_METHOD_KOPP);
        ok = 0;
    } else if (rm < 0) {
        ok = 0;
    }
    int rf = get_table(c, p, "from", "estimate.from");
    if (rf == 1) {
        int q = lua_gettop(L);
        lua_pushnil(L);
        while (lua_next(L, q)) {
            if (lua_type(L, -2) != LUA_TSTRING || lua_type(L, -1) != LUA_TNUMBER ||
                !(lua_tonumber(L, -1) > 0) || !isfinite(lua_tonumber(L, -1)) ||
                lua_rawlen(L, -2) >= PXD_RAW_MAX) {
                REPORT(c, PX_DATA_ERROR, "estimate.from",
                       "expected { [\"formula\"] = amount > 0, ... }, e.g. { [\"NiO(s)\"] = 1 }");
                ok = 0;
            } else if (e->n_kopp == PXD_KOPP_MAX) {
                REPORT(c, PX_DATA_ERROR, "estimate.from", "at most %d components", PXD_KOPP_MAX);
                ok = 0;
            } else {
                /* insert sorted by formula text: the sum does not depend on table order */
                const char *name = lua_tostring(L, -2);
                int i = e->n_kopp++;
                while (i > 0 && strcmp(e->kopp_from[i - 1], name) > 0) {
                    memcpy(e->kopp_from[i], e->kopp_from[i - 1], PXD_RAW_MAX);
                    e->kopp_nu[i] = e->kopp_nu[i - 1];
                    i--;
                }
                snprintf(e->kopp_from[i], PXD_RAW_MAX, "%s", name);
                e->kopp_nu[i] = lua_tonumber(L, -1);
            }
            lua_pop(L, 1);
        }
        lua_pop(L, 1);
    } else if (rf < 0) {
        ok = 0;
    }
    lua_pop(L, 1);
    return ok;
}

static void read_cp(ctx *c, int t, pxd_entry *e, double eu, double su)
{
    px_species *sp = &e->sp;
    forbid(c, t, hkf_fields, "cp");
    forbid(c, t, logk_only, "cp");
    require_num(c, t, "G", eu, &sp->dGf, &e->has_G, "cp");
    require_num(c, t, "H", eu, &sp->dHf, &e->has_H, "cp");
    require_num(c, t, "S", su, &sp->S, &e->has_S, "cp");
    int r = get_table(c, t, "cp", "cp");
    if (r == 1) {
        int p = lua_gettop(c->L);
        static const char *const cp_fields[] = {"a", "b", "c", "d", "e", NULL};
        check_keys(c, p, cp_fields, "cp");
        if (get_num(c, p, "a", "cp.a", 1.0, &sp->cp.a) == 0)
            REPORT(c, PX_DATA_ERROR, "cp", "missing 'a' (Cp = a + b T + c/T^2 + d/sqrt(T) + e T^2)");
        get_num(c, p, "b", "cp.b", 1.0, &sp->cp.b);
        get_num(c, p, "c", "cp.c", 1.0, &sp->cp.c);
        get_num(c, p, "d", "cp.d", 1.0, &sp->cp.d);
        get_num(c, p, "e", "cp.e", 1.0, &sp->cp.e);
        lua_pop(c->L, 1);
    }
    int has_estimate = rawfield(c->L, t, "estimate") != LUA_TNIL;
    lua_pop(c->L, 1);
    e->want_kopp = read_cp_estimate(c, t, e);
    if (r == 1 && has_estimate) {
        REPORT(c, PX_DATA_ERROR, "estimate", "give either a published 'cp' or an estimate, not both");
        e->want_kopp = 0;
    } else if (r == 0 && !has_estimate) {
        REPORT(c, PX_DATA_WARNING, "cp",
               "no heat capacity given: Cp is taken as 0 (G(T) then follows S alone; "
               "or estimate = { Cp = \"%s\", from = {...} })", CP_METHOD_KOPP);
    }
    double V;
    if (get_num(c, t, "V", "V", 1.0, &V) == 1) {
        if (V < 0) REPORT(c, PX_DATA_ERROR, "V", "a molar volume must be positive (cm3/mol)");
        sp->cp.V = V * PXD_CM3_TO_J_PER_BAR;
    }
}

static void read_hkf(ctx *c, int t, pxd_entry *e, double eu, double su)
{
    px_species *sp = &e->sp;
    forbid(c, t, cp_only, "hkf");
    forbid(c, t, logk_only, "hkf");
    require_num(c, t, "G", eu, &sp->dGf, &e->has_G, "hkf");
    require_num(c, t, "H", eu, &sp->dHf, &e->has_H, "hkf");
    require_num(c, t, "S", su, &sp->S, &e->has_S, "hkf");
    int rh = get_table(c, t, "hkf", "hkf");
    if (rh == 1) {
        int p = lua_gettop(c->L);
        static const char *const k[] = {"a1", "a2", "a3", "a4", "c1", "c2", "omega", NULL};
        static const double scale[] = {HKF_A1_SCALE, HKF_A2_SCALE, HKF_A3_SCALE, HKF_A4_SCALE,
                                       HKF_C1_SCALE, HKF_C2_SCALE, HKF_OMEGA_SCALE};
        double *dst[] = {&sp->hkf.a1, &sp->hkf.a2, &sp->hkf.a3, &sp->hkf.a4,
                         &sp->hkf.c1, &sp->hkf.c2, &sp->hkf.omega};
        check_keys(c, p, k, "hkf");
        for (int i = 0; k[i]; i++) {
            char field[16];
            snprintf(field, sizeof field, "hkf.%s", k[i]);
            if (get_num(c, p, k[i], field, scale[i] * PX_CAL, dst[i]) == 0)
                REPORT(c, PX_DATA_ERROR, field, "missing HKF parameter '%s'", k[i]);
        }
        lua_pop(c->L, 1);
    }
    int ty = rawfield(c->L, t, "estimated");
    if (ty == LUA_TBOOLEAN) sp->estimated = lua_toboolean(c->L, -1);
    else if (ty != LUA_TNIL)
        REPORT(c, PX_DATA_ERROR, "estimated", "expected true or false, got %s", lua_typename(c->L, ty));
    lua_pop(c->L, 1);
    int re = get_table(c, t, "estimate", "estimate");
    if (re == 1) {
        int p = lua_gettop(c->L);
        static const char *const k[] = {"Cp", "V", NULL};
        check_keys(c, p, k, "estimate");
        e->est_V = NAN;
        int rc = get_num(c, p, "Cp", "estimate.Cp", 1.0, &e->est_Cp);
        if (rc == 0)
            REPORT(c, PX_DATA_ERROR, "estimate.Cp",
                   "an HKF estimate needs Cp at 25 C (J/(mol K)); without it use model 'logk'");
        int rv = get_num(c, p, "V", "estimate.V", 1.0, &e->est_V);
        if (rv == 0)
            REPORT(c, PX_DATA_WARNING, "estimate.V",
                   "no volume: a1..a4 are set to zero (fine at saturation pressure, poor at high pressure)");
        e->want_estimate = rc == 1 && rv >= 0;
        lua_pop(c->L, 1);
    }
    if (rh == 1 && re == 1)
        REPORT(c, PX_DATA_ERROR, "estimate", "give either published 'hkf' parameters or an 'estimate', not both");
    else if (rh == 0 && re == 0)
        REPORT(c, PX_DATA_ERROR, "hkf", "missing 'hkf' parameters (or an 'estimate = { Cp = ..., V = ... }')");
}

static void read_logk(ctx *c, int t, pxd_entry *e, double eu)
{
    px_species *sp = &e->sp;
    static const char *const cp_table[] = {"cp", NULL};
    forbid(c, t, cp_table, "logk");
    forbid(c, t, hkf_fields, "logk");
    double V;
    if (get_num(c, t, "V", "V", 1.0, &V) == 1) { /* kept in cp.V for reference */
        sp->cp.V = V * PXD_CM3_TO_J_PER_BAR;
        REPORT(c, PX_DATA_WARNING, "V", "V is not used by model 'logk' (kept, but G(T,P) ignores it)");
    }
    forbid(c, t, ghs, "logk");
    sp->dGf = sp->dHf = sp->S = NAN;
    sp->logk.dH = NAN;
    int r = get_str(c, t, "reaction", "reaction", sp->logk.reaction, sizeof sp->logk.reaction);
    if (r == 0) REPORT(c, PX_DATA_ERROR, "reaction", "missing required field 'reaction' (model 'logk')");
    int rk = get_num(c, t, "logK", "logK", 1.0, &e->logK_given);
    e->has_logK = rk == 1;
    if (rk == 1) sp->logk.logK25 = e->logK_given;
    get_num(c, t, "dH", "dH", eu, &sp->logk.dH);
    int rt = get_table(c, t, "logK_T", "logK_T");
    if (rt == 1) {
        lua_State *L = c->L;
        int p = lua_gettop(L);
        size_t n = lua_rawlen(L, p);
        int ok = n >= 1 && n <= 5;
        size_t count = 0;
        lua_pushnil(L);
        while (lua_next(L, p)) {
            count++;
            lua_pop(L, 1);
        }
        ok = ok && count == n;
        for (size_t i = 0; ok && i < n; i++) {
            ok = lua_rawgeti(L, p, (lua_Integer)i + 1) == LUA_TNUMBER &&
                 isfinite(sp->logk.k[i] = lua_tonumber(L, -1));
            lua_pop(L, 1);
        }
        if (!ok) {
            REPORT(c, PX_DATA_ERROR, "logK_T",
                   "expected a list of 1 to 5 numbers { k0, k1, k2, k3, k4 }: "
                   "log K = k0 + k1 T + k2/T + k3 log10 T + k4/T^2");
        } else {
            sp->logk.analytic = 1;
            e->has_logK_T = 1;
        }
        lua_pop(L, 1);
    }
    if (rk == 0 && rt == 0)
        REPORT(c, PX_DATA_ERROR, "logK", "missing 'logK' (log K at 25 C) or 'logK_T'");
    if (rt == 1 && !isnan(sp->logk.dH))
        REPORT(c, PX_DATA_WARNING, "dH", "dH is not used when logK_T is given");
    /* dCp: constant reaction heat capacity, always J/(mol K), only with dH */
    int rcp = get_num(c, t, "dCp", "dCp", 1.0, &sp->logk.dCp);
    if (rcp == 1 && (rt == 1 || isnan(sp->logk.dH))) {
        REPORT(c, PX_DATA_ERROR, "dCp",
               "dCp (J/(mol K)) extends a measured dH (Kirchhoff); give it with 'dH', not %s",
               rt == 1 ? "with 'logK_T'" : "alone");
        sp->logk.dCp = 0;
    }
    char method[LOGK_METHOD_MAX] = "";
    char model[sizeof sp->logk.model] = "";
    int ty = rawfield(c->L, t, "estimate");
    lua_pop(c->L, 1);
    int rm = 0;
    if (ty == LUA_TTABLE) {
        /* estimate = { method = "isocoulombic", model = "<reaction>" }
         * or estimate = { dCp = "criss-cobble" } (with dH and dCp)
         * or estimate = { dCp = "isocoulombic", model = "<reaction>" } (with dH) */
        get_table(c, t, "estimate", "estimate");
        int p = lua_gettop(c->L);
        static const char *const k[] = {"method", "model", "dCp", NULL};
        check_keys(c, p, k, "estimate");
        char cpm[LOGK_METHOD_MAX] = "";
        int rc = get_str(c, p, "dCp", "estimate.dCp", cpm, sizeof cpm);
        /* estimate = { dCp = "isocoulombic", model = "<reaction>" }: the
         * reaction's dCp(T) is the model reaction's (docs/thermo.md) */
        int iso_cp = rc == 1 && !strcmp(cpm, LOGK_CP_METHOD_ISOCOULOMBIC);
        if (iso_cp) {
            if (rcp == 1)
                REPORT(c, PX_DATA_ERROR, "estimate.dCp",
                       "with estimate = { dCp = \"%s\" } the reaction's dCp is the model reaction's "
                       "at every T: drop 'dCp'", LOGK_CP_METHOD_ISOCOULOMBIC);
            else if (rt == 1 || isnan(sp->logk.dH))
                REPORT(c, PX_DATA_ERROR, "estimate.dCp",
                       "estimate = { dCp = \"%s\" } extends a measured dH: give 'dH' (not %s)",
                       LOGK_CP_METHOD_ISOCOULOMBIC, rt == 1 ? "'logK_T'" : "log K alone");
            else
                sp->logk.cp_estimate = PX_LOGK_CP_EST_ISOCOULOMBIC;
        } else if (rc == 1) {
            if (strcmp(cpm, LOGK_CP_METHOD_CRISS_COBBLE) != 0)
                REPORT(c, PX_DATA_ERROR, "estimate.dCp",
                       "unknown estimation method '%s' for dCp (model 'logk' knows \"%s\" and \"%s\")",
                       cpm, LOGK_CP_METHOD_CRISS_COBBLE, LOGK_CP_METHOD_ISOCOULOMBIC);
            else if (rcp != 1 || sp->logk.dCp == 0)
                REPORT(c, PX_DATA_ERROR, "estimate.dCp",
                       "estimate = { dCp = \"%s\" } names how the record's 'dCp' was obtained: "
                       "give dH and the estimated dCp (J/(mol K))", LOGK_CP_METHOD_CRISS_COBBLE);
            else
                sp->logk.cp_estimate = PX_LOGK_CP_EST_CRISS_COBBLE;
        }
        rm = get_str(c, p, "method", "estimate.method", method, sizeof method);
        if (rm == 0 && rc == 1) {
            /* only dCp is estimated: log K at 25 C and dH are published */
        } else if (rm == 0)
            REPORT(c, PX_DATA_ERROR, "estimate.method",
                   "name the method: estimate = { method = \"%s\", model = \"<reaction>\" } "
                   "(estimate = { Cp = ..., V = ... } is for model 'hkf')",
                   LOGK_METHOD_ISOCOULOMBIC);
        int rmod = get_str(c, p, "model", "estimate.model", model, sizeof model);
        if (rmod == 1 && rm == 0 && rc == 1 && !iso_cp) {
            REPORT(c, PX_DATA_ERROR, "estimate.model",
                   "a model reaction belongs to estimate.method = \"%s\" or estimate.dCp = \"%s\", "
                   "not to a \"%s\" dCp", LOGK_METHOD_ISOCOULOMBIC, LOGK_CP_METHOD_ISOCOULOMBIC, cpm);
        } else if (rmod == 1) {
            px_reaction mr;
            char msg[200];
            int mok = 1;
            if (px_reaction_parse_balanced(model, &mr, msg, sizeof msg) != PX_OK) {
                REPORT(c, PX_DATA_ERROR, "estimate.model", "model reaction '%s': %s", model, msg);
                mok = 0;
            } else {
                for (int i = 0; i < mr.n; i++)
                    if (!strcmp(mr.sp[i].text, sp->f.text)) {
                        REPORT(c, PX_DATA_ERROR, "estimate.model",
                               "the model reaction must not contain the species itself (%s)",
                               sp->f.text);
                        mok = 0;
                    }
            }
            if (!mok)
                rm = -1;
            if (iso_cp && rm == 0) {
                if (mok && sp->logk.cp_estimate == PX_LOGK_CP_EST_ISOCOULOMBIC)
                    memcpy(sp->logk.model, model, sizeof model);
                else
                    sp->logk.cp_estimate = PX_LOGK_CP_EST_NONE;
            }
        } else if (rmod == 0 && rm == 1) {
            REPORT(c, PX_DATA_ERROR, "estimate.model",
                   "the table form names a model reaction with measured temperature data: "
                   "model = \"<reaction>\" (or write estimate = \"%s\")",
                   LOGK_METHOD_ISOCOULOMBIC);
            rm = -1;
        } else if (rmod == 0 && iso_cp) {
            REPORT(c, PX_DATA_ERROR, "estimate.model",
                   "estimate = { dCp = \"%s\" } takes the dCp of a model reaction with measured data: "
                   "add model = \"<reaction>\"", LOGK_CP_METHOD_ISOCOULOMBIC);
            sp->logk.cp_estimate = PX_LOGK_CP_EST_NONE;
        } else if (rmod == -1) {
            rm = -1;
            sp->logk.cp_estimate = PX_LOGK_CP_EST_NONE;
        }
        lua_pop(c->L, 1);
    } else {
        rm = get_str(c, t, "estimate", "estimate", method, sizeof method);
    }
    if (rm == 1) {
        if (strcmp(method, LOGK_METHOD_ISOCOULOMBIC) != 0)
            REPORT(c, PX_DATA_ERROR, "estimate",
                   "unknown estimation method '%s' (model 'logk' knows \"%s\")", method,
                   LOGK_METHOD_ISOCOULOMBIC);
        else if (rt == 1 || !isnan(sp->logk.dH))
            REPORT(c, PX_DATA_ERROR, "estimate",
                   "an estimate stands in for missing temperature data: this species has %s; "
                   "drop the estimate",
                   rt == 1 ? "logK_T" : "dH");
        else {
            sp->logk.estimate = PX_LOGK_EST_ISOCOULOMBIC;
            memcpy(sp->logk.model, model, sizeof model);
        }
    }
}

/* uncertainty = { G, H, S, logK }: the source's +-, in the species' units */
static void read_uncertainty(ctx *c, int t, double eu, double su, px_uncertainty *u)
{
    if (get_table(c, t, "uncertainty", "uncertainty") != 1) return;
    int p = lua_gettop(c->L);
    static const char *const k[] = {"G", "H", "S", "logK", NULL};
    double *dst[] = {&u->G, &u->H, &u->S, &u->logK};
    const double factor[] = {eu, eu, su, 1.0};
    check_keys(c, p, k, "uncertainty");
    for (int i = 0; k[i]; i++) {
        char field[24];
        double v;
        snprintf(field, sizeof field, "uncertainty.%s", k[i]);
        if (get_num(c, p, k[i], field, factor[i], &v) == 1) {
            if (v < 0) REPORT(c, PX_DATA_ERROR, field, "an uncertainty must not be negative");
            else *dst[i] = v;
        }
    }
    lua_pop(c->L, 1);
}

static void read_species(ctx *c, int t, int index)
{
    lua_State *L = c->L;
    pxd_file *f = c->f;
    pxd_entry *grown = px_grow(NULL, f->e, &f->cap, f->n + 1, sizeof *grown, 32);
    if (!grown) oom(c);
    f->e = grown;
    pxd_entry *e = &f->e[f->n++];
    memset(e, 0, sizeof *e);
    e->index = index;
    e->sp.dGf = e->sp.dHf = e->sp.S = NAN;
    e->sp.logk.dH = NAN;
    e->sp.unc.G = e->sp.unc.H = e->sp.unc.S = e->sp.unc.logK = NAN;
    e->sp.Tmin = f->Tmin;
    e->sp.Tmax = f->Tmax;
    c->e = e;

    /* formula first: it names the species in every later problem */
    int ty = rawfield(L, t, "formula");
    if (ty == LUA_TSTRING && lua_rawlen(L, -1) < PXD_RAW_MAX)
        snprintf(e->raw, sizeof e->raw, "%s", lua_tostring(L, -1));
    else
        snprintf(e->raw, sizeof e->raw, "#%d", index);
    lua_pop(L, 1);
    pxd_locate_species(f, e);
    e->sp.line = pxd_species_line(f, e);
    char fmsg[200];
    e->sp.file = pxd_strdup(f->name);
    if (!e->sp.file) oom(c);
    if (ty == LUA_TNIL) REPORT(c, PX_DATA_ERROR, "formula", "missing required field 'formula'");
    else if (ty != LUA_TSTRING)
        REPORT(c, PX_DATA_ERROR, "formula", "expected a string, got %s", lua_typename(L, ty));
    else if (e->raw[0] == '#')
        REPORT(c, PX_DATA_ERROR, "formula", "formula too long (at most %d bytes)", PXD_RAW_MAX - 1);
    else if (px_formula_parse_msg(e->raw, &e->sp.f, fmsg, sizeof fmsg) != PX_OK)
        REPORT(c, PX_DATA_ERROR, "formula", "malformed formula '%s': %s (see docs/element-files.md, Formulas)",
               e->raw, fmsg);
    else
        e->formula_ok = 1;

    check_keys(c, t, species_fields, "");

    double eu = f->e_unit, su = f->s_unit;
    read_units(c, t, &eu, &su);
    read_trange(c, t, &e->sp.Tmin, &e->sp.Tmax);

    char buf[16];
    int rm = get_str(c, t, "model", "model", buf, sizeof buf);
    if (rm == 0) {
        REPORT(c, PX_DATA_ERROR, "model", "missing required field 'model' (cp, hkf or logk)");
    } else if (rm == 1) {
        if (strcmp(buf, "cp") == 0) {
            e->sp.model = PX_MODEL_CP;
            read_cp(c, t, e, eu, su);
        } else if (strcmp(buf, "hkf") == 0) {
            e->sp.model = PX_MODEL_HKF;
            read_hkf(c, t, e, eu, su);
        } else if (strcmp(buf, "logk") == 0) {
            e->sp.model = PX_MODEL_LOGK;
            read_logk(c, t, e, eu);
        } else {
            REPORT(c, PX_DATA_ERROR, "model", "unknown model '%s' (cp, hkf or logk)", buf);
        }
    }

    /* the source: required, any length */
    ty = rawfield(L, t, "source");
    if (ty == LUA_TSTRING) {
        const char *s = lua_tostring(L, -1);
        size_t k = strspn(s, " \t\r\n");
        if (s[k] == '\0') REPORT(c, PX_DATA_ERROR, "source", "the source must not be empty");
        e->sp.source = pxd_strdup(s);
        if (!e->sp.source) oom(c);
    } else if (ty == LUA_TNIL) {
        REPORT(c, PX_DATA_ERROR, "source",
               "missing required field 'source' (the publication, or \"from memory of <publication>\")");
    } else {
        REPORT(c, PX_DATA_ERROR, "source", "expected a string, got %s", lua_typename(L, ty));
    }
    lua_pop(L, 1);
    if (!e->sp.source && !(e->sp.source = pxd_strdup(""))) oom(c);

    if (get_str(c, t, "quality", "quality", e->sp.quality, sizeof e->sp.quality) == 1 &&
        strcmp(e->sp.quality, "high") && strcmp(e->sp.quality, "medium") &&
        strcmp(e->sp.quality, "low")) {
        REPORT(c, PX_DATA_ERROR, "quality", "quality must be \"high\", \"medium\" or \"low\", not \"%s\"",
               e->sp.quality);
        e->sp.quality[0] = '\0';
    }
    ty = rawfield(L, t, "note");
    if (ty != LUA_TNIL && ty != LUA_TSTRING)
        REPORT(c, PX_DATA_ERROR, "note", "expected a string, got %s", lua_typename(L, ty));
    lua_pop(L, 1);
    read_uncertainty(c, t, eu, su, &e->sp.unc);
    ty = rawfield(L, t, "known_mismatch");
    if (ty == LUA_TSTRING && lua_rawlen(L, -1) > 0) e->known_mismatch = 1;
    else if (ty != LUA_TNIL)
        REPORT(c, PX_DATA_ERROR, "known_mismatch", "expected a non-empty string saying why");
    lua_pop(L, 1);
    c->e = NULL;
}

/* The line of the key NAME inside the `sources` table (the table's line if
 * not found). */
static int source_key_line(const pxd_file *f, const char *key)
{
    int from = pxd_toplevel_line(f, "sources");
    size_t n = strlen(key);
    for (size_t i = 0; i < f->ntok; i++) {
        const pxd_tok *t = &f->tok[i];
        if (t->kind == PXD_TOK_NAME && t->line >= from && t->len == n &&
            memcmp(f->text + t->start, key, n) == 0)
            return t->line;
    }
    return from;
}

int pxd_ref_cmp(const void *a, const void *b)
{
    return strcmp(((const pxd_ref *)a)->key, ((const pxd_ref *)b)->key);
}

static int valid_key(const char *k)
{
    size_t n = strlen(k);
    if (n == 0 || n >= PX_REF_KEY_MAX || !isupper((unsigned char)k[0])) return 0;
    for (size_t i = 0; i < n; i++)
        if (!isalnum((unsigned char)k[i]) && k[i] != '_') return 0;
    return 1;
}

/* sources = { KEY = "citation" | { cite = "...", short = "..." }, ... } */
static void read_sources(ctx *c, int top)
{
    lua_State *L = c->L;
    pxd_file *f = c->f;
    if (get_table(c, top, "sources", "sources") != 1) return;
    int p = lua_gettop(L);
    size_t n = 0;
    lua_pushnil(L);
    while (lua_next(L, p)) {
        n++;
        lua_pop(L, 1);
    }
    f->refs = px_calloc(NULL, n ? n : 1, sizeof *f->refs);
    if (!f->refs) oom(c);
    lua_pushnil(L);
    while (lua_next(L, p)) {
        char field[PX_REF_KEY_MAX + 16];
        const char *key = lua_type(L, -2) == LUA_TSTRING ? lua_tostring(L, -2) : NULL;
        if (!key || !valid_key(key)) {
            char kt[64];
            key_text(L, -2, kt, sizeof kt);
            REPORT(c, PX_DATA_ERROR, "sources",
                   "bad key %s: a key starts with an upper-case letter, then letters, digits or '_' "
                   "(at most %d characters), as in sources = { SMITH1990 = \"...\" }",
                   kt, PX_REF_KEY_MAX - 1);
            lua_pop(L, 1);
            continue;
        }
        snprintf(field, sizeof field, "sources.%s", key);
        const char *cite = NULL, *shrt = NULL;
        if (lua_type(L, -1) == LUA_TSTRING) {
            cite = lua_tostring(L, -1);
        } else if (lua_type(L, -1) == LUA_TTABLE) {
            static const char *const k[] = {"cite", "short", NULL};
            check_keys(c, lua_gettop(L), k, field);
            if (rawfield(L, lua_gettop(L), "cite") == LUA_TSTRING) cite = lua_tostring(L, -1);
            lua_pop(L, 1); /* the string stays alive: the table holds it */
            if (rawfield(L, lua_gettop(L), "short") == LUA_TSTRING) shrt = lua_tostring(L, -1);
            lua_pop(L, 1);
        }
        if (!cite || !*cite) {
            pxd_report(f, PX_DATA_ERROR, source_key_line(f, key), "", field,
                       "expected the citation: a non-empty string, or { cite = \"...\", short = \"...\" }");
        } else {
            pxd_ref *r = &f->refs[f->n_refs++];
            snprintf(r->key, sizeof r->key, "%s", key);
            r->cite = pxd_strdup(cite);
            r->short_text = pxd_strdup(shrt && *shrt ? shrt : key);
            r->line = source_key_line(f, key);
            if (!r->cite || !r->short_text) oom(c);
        }
        lua_pop(L, 1);
    }
    lua_pop(L, 1);
    qsort(f->refs, f->n_refs, sizeof *f->refs, pxd_ref_cmp);
}

int pxd_read_table(lua_State *L)
{
    pxd_file *f = lua_touserdata(L, lua_upvalueindex(1));
    ctx c = {L, f, NULL};
    const int top = 1;
    check_keys(&c, top, file_fields, "");
    /* a bibliography: `sources` without element or species */
    int has_src = rawfield(L, top, "sources") != LUA_TNIL;
    int has_el = rawfield(L, top, "element") != LUA_TNIL;
    int has_sp = rawfield(L, top, "species") != LUA_TNIL;
    lua_pop(L, 3);
    f->bibliography = has_src && !has_el && !has_sp;
    read_sources(&c, top);
    if (f->bibliography) return 0;

    /* element */
    int r = get_str(&c, top, "element", "element", f->element, sizeof f->element);
    if (r == 1) {
        if (strcmp(f->element, "HO") == 0) f->element_ho = 1;
        else if ((f->element_z = px_element_z(f->element)) == 0)
            REPORT(&c, PX_DATA_ERROR, "element", "unknown element '%s'", f->element);
    } else if (r == 0 && !f->opt->user_file) {
        REPORT(&c, PX_DATA_ERROR, "element", "missing required field 'element'");
    }
    if (r != 1) f->element[0] = '\0';

    int ty = rawfield(L, top, "title");
    if (ty != LUA_TNIL && ty != LUA_TSTRING)
        REPORT(&c, PX_DATA_ERROR, "title", "expected a string, got %s", lua_typename(L, ty));
    lua_pop(L, 1);
    ty = rawfield(L, top, "note");
    if (ty != LUA_TNIL && ty != LUA_TSTRING)
        REPORT(&c, PX_DATA_ERROR, "note", "expected a string, got %s", lua_typename(L, ty));
    lua_pop(L, 1);
    if (get_table(&c, top, "references", "references") == 1) {
        int p = lua_gettop(L);
        lua_pushnil(L);
        while (lua_next(L, p)) {
            if (lua_type(L, -1) != LUA_TSTRING || lua_type(L, -2) != LUA_TNUMBER) {
                REPORT(&c, PX_DATA_ERROR, "references", "expected a list of strings");
                lua_pop(L, 2);
                break;
            }
            lua_pop(L, 1);
        }
        lua_pop(L, 1);
    }

    read_units(&c, top, &f->e_unit, &f->s_unit);
    read_trange(&c, top, &f->Tmin, &f->Tmax);

    /* exclude (user override files only) */
    r = get_table(&c, top, "exclude", "exclude");
    if (r == 1) {
        int p = lua_gettop(L);
        if (!f->opt->user_file)
            REPORT(&c, PX_DATA_ERROR, "exclude",
                   "'exclude' is only allowed in a user override file");
        size_t n = lua_rawlen(L, p);
        for (size_t i = 1; i <= n; i++) {
            if (lua_rawgeti(L, p, (lua_Integer)i) != LUA_TSTRING || lua_rawlen(L, -1) >= PXD_RAW_MAX) {
                REPORT(&c, PX_DATA_ERROR, "exclude", "entry %zu: expected a formula string", i);
            } else {
                if (f->n_ex == f->cap_ex) {
                    size_t cap = f->cap_ex ? 2 * f->cap_ex : 16;
                    pxd_exclude *x = px_realloc(NULL, f->ex, f->cap_ex * sizeof *x, cap * sizeof *x);
                    if (!x) oom(&c);
                    f->ex = x;
                    f->cap_ex = cap;
                }
                pxd_exclude *x = &f->ex[f->n_ex++];
                snprintf(x->raw, sizeof x->raw, "%s", lua_tostring(L, -1));
                x->line = pxd_string_line(f, x->raw, 0, -1);
            }
            lua_pop(L, 1);
        }
        lua_pop(L, 1);
    }

    /* species */
    r = get_table(&c, top, "species", "species");
    if (r == 0 && !(f->opt->user_file && f->n_ex > 0))
        REPORT(&c, PX_DATA_ERROR, "species", "missing required field 'species'");
    if (r != 1) return 0;
    f->has_species = 1;
    int p = lua_gettop(L);
    size_t n = lua_rawlen(L, p), count = 0;
    lua_pushnil(L);
    while (lua_next(L, p)) {
        count++;
        lua_pop(L, 1);
    }
    if (count != n)
        REPORT(&c, PX_DATA_ERROR, "species",
               "'species' must be a list { {...}, {...} } without named entries or holes");
    if (n == 0) REPORT(&c, PX_DATA_WARNING, "species", "the file defines no species");
    for (size_t i = 1; i <= n; i++) {
        if (lua_rawgeti(L, p, (lua_Integer)i) == LUA_TTABLE) {
            read_species(&c, lua_gettop(L), (int)i);
        } else {
            REPORT(&c, PX_DATA_ERROR, "species", "entry %zu is a %s, expected a table", i,
                   luaL_typename(L, -1));
        }
        lua_pop(L, 1);
    }
    lua_pop(L, 1);
    return 0;
}
