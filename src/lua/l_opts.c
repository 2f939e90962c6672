/* l_opts.c - the one option reader of phlox's public functions.
 *
 * Every public function, in C or in Lua, names the keys it accepts with a
 * type and, for numbers, a range: an unknown key is an error that names the
 * function, the key and the nearest valid key; a value of the wrong type or
 * out of range is an error that names the option and what was expected.
 * Errors are raised at the first frame of the user's own code (the first Lua
 * function that is not an embedded phlox module), so the message points at
 * the line of the study script that made the call, however many phlox
 * layers lie in between.
 *
 * Types (px_lua_opt.type, or the first item of a Lua spec entry):
 *   number integer string boolean table function any
 *   strings (list of strings)   numbers (list of numbers)
 *   map (string -> number)      "a|b|c" (one of these strings)
 * Alternatives are joined by '/', e.g. "boolean/string".  Numbers must be
 * finite and within [lo, hi]; the range applies to list and map values too.
 *
 * Lua: core.options(fname, spec, opts [, extra_level]) checks OPTS against
 * SPEC = { key = "type" | {"type", lo, hi, "help text"}, ... }; the key "*"
 * gives the type of positional entries (opts[1], opts[2], ...), which are
 * refused otherwise.  core.user_error(msg) raises MSG at the user's line. */
#include "lua/bindings.h"
#include "embed/embedded.h"
#include <lauxlib.h>
#include <math.h>
#include <stdarg.h>
#include <stdio.h>
#include <string.h>

#define OPT_NEAR_MAX 3     /* edits beyond which no key is suggested */
#define OPT_NAME_MAX 64    /* longest key compared for the suggestion */

/* The message prefix "file:line:" of the first frame of user code. */
void px_lua_push_user_where(lua_State *L)
{
    lua_Debug ar;
    for (int level = 1; lua_getstack(L, level, &ar); level++) {
        if (!lua_getinfo(L, "Sl", &ar) || ar.currentline <= 0) continue;
        if (ar.source[0] == '@' && px_embedded_find(ar.source + 1)) continue;
        lua_pushfstring(L, "%s:%d: ", ar.short_src, ar.currentline);
        return;
    }
    lua_pushliteral(L, "");
}

int px_lua_user_error(lua_State *L, const char *fmt, ...)
{
    va_list ap;
    px_lua_push_user_where(L);
    va_start(ap, fmt);
    lua_pushvfstring(L, fmt, ap);
    va_end(ap);
    lua_concat(L, 2);
    return lua_error(L);
}

/* Edit distance (Levenshtein), letters compared case-insensitively with a
 * case change costing nothing: "T_c" is 0 from "T_C". */
static int distance(const char *a, const char *b)
{
    size_t la = strlen(a), lb = strlen(b);
    if (la > OPT_NAME_MAX || lb > OPT_NAME_MAX) return OPT_NEAR_MAX + 1;
    int row[OPT_NAME_MAX + 1];
    for (size_t j = 0; j <= lb; j++) row[j] = (int)j;
    for (size_t i = 1; i <= la; i++) {
        int diag = row[0];
        row[0] = (int)i;
        for (size_t j = 1; j <= lb; j++) {
            int up = row[j];
            char ca = a[i - 1], cb = b[j - 1];
            if (ca >= 'A' && ca <= 'Z') ca = (char)(ca - 'A' + 'a');
            if (cb >= 'A' && cb <= 'Z') cb = (char)(cb - 'A' + 'a');
            int best = diag + (ca != cb);
            if (row[j] + 1 < best) best = row[j] + 1;
            if (row[j - 1] + 1 < best) best = row[j - 1] + 1;
            row[j] = best;
            diag = up;
        }
    }
    return row[lb];
}

/* Is TYPE (one alternative, length N) the name T? */
/* distance, but a key that begins a valid one ("activity" of
 * "activity_model", a renamed option) counts as near */
static int nearness(const char *key, const char *cand)
{
    int d = distance(key, cand);
    size_t n = strlen(key);
    if (d > OPT_NEAR_MAX && n >= 3 && strncmp(cand, key, n) == 0) d = OPT_NEAR_MAX;
    return d;
}

/* Tie-break between keys at the same distance: the longer common
 * subsequence ("TC" is nearer "T_C" than "T"). */
static int common(const char *a, const char *b)
{
    size_t la = strlen(a), lb = strlen(b);
    if (la > OPT_NAME_MAX || lb > OPT_NAME_MAX) return 0;
    int row[OPT_NAME_MAX + 1] = {0};
    for (size_t i = 1; i <= la; i++) {
        int diag = 0;
        for (size_t j = 1; j <= lb; j++) {
            int up = row[j];
            int ca = a[i - 1] | 0x20, cb = b[j - 1] | 0x20; /* ASCII letters, any case */
            row[j] = ca == cb ? diag + 1 : (row[j] > row[j - 1] ? row[j] : row[j - 1]);
            diag = up;
        }
    }
    return row[lb];
}

/* is CAND (at distance D) a better suggestion for KEY than BEST (at BD)? */
static int better(const char *key, const char *cand, int d, const char *best, int bd)
{
    if (d != bd) return d < bd;
    if (!best) return 1;
    int cc = common(key, cand), cb = common(key, best);
    if (cc != cb) return cc > cb;
    return strcmp(cand, best) < 0;
}

static int is(const char *type, size_t n, const char *t)
{
    return strlen(t) == n && memcmp(type, t, n) == 0;
}

static const char *num_text(char *buf, size_t n, double v)
{
    snprintf(buf, n, "%.6g", v);
    return buf;
}

/* Does the value at IDX satisfy one alternative?  Returns 1, or 0 with a
 * reason pushed (a string starting "must be ..."), or 2 when it is the right
 * type but wrong (reason pushed). */
static int check_one(lua_State *L, int idx, const char *alt, size_t n, double lo, double hi);

static int check_number(lua_State *L, int idx, int integer, double lo, double hi)
{
    char a[32], b[32], c[32];
    if (lua_type(L, idx) != LUA_TNUMBER) return 0;
    double v = lua_tonumber(L, idx);
    if (v != v) {
        lua_pushliteral(L, "must be a number, got nan");
        return 2;
    }
    if (integer && !lua_isinteger(L, idx) && (v != floor(v) || !isfinite(v))) {
        lua_pushfstring(L, "must be a whole number, got %s", num_text(a, sizeof a, v));
        return 2;
    }
    if (!(v >= lo && v <= hi) || (!isfinite(v) && isfinite(lo) && isfinite(hi))) {
        lua_pushfstring(L, "= %s is out of range [%s, %s]", num_text(a, sizeof a, v),
                        num_text(b, sizeof b, lo), num_text(c, sizeof c, hi));
        return 2;
    }
    return 1;
}

/* each element of the list at IDX is checked with check_one(ELEM) */
static int check_list(lua_State *L, int idx, const char *elem, double lo, double hi, int map)
{
    if (lua_type(L, idx) != LUA_TTABLE) return 0;
    idx = lua_absindex(L, idx);
    if (!map) {
        lua_Integer len = (lua_Integer)lua_rawlen(L, idx), count = 0;
        lua_pushnil(L);
        while (lua_next(L, idx)) {
            lua_pop(L, 1);
            if (!(lua_isinteger(L, -1) && lua_tointeger(L, -1) >= 1 && lua_tointeger(L, -1) <= len)) {
                lua_pop(L, 1);
                lua_pushliteral(L, "must be a list (keys 1, 2, ... only)");
                return 2;
            }
            count++;
        }
        if (count != len) {
            lua_pushliteral(L, "must be a list without holes");
            return 2;
        }
        for (lua_Integer i = 1; i <= len; i++) {
            lua_rawgeti(L, idx, i);
            int r = check_one(L, -1, elem, strlen(elem), lo, hi);
            if (r != 1) {
                if (r == 0)
                    lua_pushfstring(L, "[%I] must be a %s, got %s", i, elem, luaL_typename(L, -1));
                else
                    lua_pushfstring(L, "[%I] %s", i, lua_tostring(L, -1));
                return 2;
            }
            lua_pop(L, 1);
        }
        return 1;
    }
    lua_pushnil(L);
    while (lua_next(L, idx)) {
        if (lua_type(L, -2) != LUA_TSTRING) {
            lua_pop(L, 2);
            lua_pushliteral(L, "must map names to numbers (a key is not a string)");
            return 2;
        }
        int r = check_one(L, -1, elem, strlen(elem), lo, hi);
        if (r != 1) {
            if (r == 0)
                lua_pushfstring(L, "['%s'] must be a %s, got %s", lua_tostring(L, -2), elem,
                                luaL_typename(L, -1));
            else
                lua_pushfstring(L, "['%s'] %s", lua_tostring(L, -3), lua_tostring(L, -1));
            return 2;
        }
        lua_pop(L, 1);
    }
    return 1;
}

static int check_one(lua_State *L, int idx, const char *alt, size_t n, double lo, double hi)
{
    idx = lua_absindex(L, idx);
    int t = lua_type(L, idx);
    if (memchr(alt, '|', n)) { /* one of the listed words */
        if (t != LUA_TSTRING) return 0;
        size_t l;
        const char *s = lua_tolstring(L, idx, &l);
        for (const char *p = alt, *end = alt + n; p < end;) {
            const char *bar = memchr(p, '|', (size_t)(end - p));
            size_t w = bar ? (size_t)(bar - p) : (size_t)(end - p);
            if (w == l && memcmp(p, s, l) == 0) return 1;
            p += w + 1;
        }
        lua_pushfstring(L, "must be one of %s, got '%s'", lua_pushlstring(L, alt, n), s);
        lua_remove(L, -2);
        return 2;
    }
    if (is(alt, n, "any")) return t != LUA_TNIL;
    if (is(alt, n, "number")) return check_number(L, idx, 0, lo, hi);
    if (is(alt, n, "integer")) return check_number(L, idx, 1, lo, hi);
    if (is(alt, n, "string")) return t == LUA_TSTRING;
    if (is(alt, n, "boolean")) return t == LUA_TBOOLEAN;
    if (is(alt, n, "table")) return t == LUA_TTABLE;
    if (is(alt, n, "function")) return t == LUA_TFUNCTION;
    if (is(alt, n, "strings")) return check_list(L, idx, "string", lo, hi, 0);
    if (is(alt, n, "numbers")) return check_list(L, idx, "number", lo, hi, 0);
    if (is(alt, n, "map")) return check_list(L, idx, "number", lo, hi, 1);
    return luaL_error(L, "option reader: unknown type '%s'", lua_pushlstring(L, alt, n));
}

static const char *type_words(lua_State *L, const char *type)
{
    luaL_Buffer b;
    luaL_buffinit(L, &b);
    for (const char *p = type; *p; p++) {
        if (*p == '/') luaL_addstring(&b, " or ");
        else luaL_addchar(&b, *p);
    }
    luaL_pushresult(&b);
    const char *s = lua_tostring(L, -1);
    if (strcmp(s, "strings") == 0) s = "a list of strings";
    else if (strcmp(s, "numbers") == 0) s = "a list of numbers";
    else if (strcmp(s, "map") == 0) s = "a table of name = number";
    else if (strchr(s, '|')) s = lua_pushfstring(L, "one of %s", s);
    else s = lua_pushfstring(L, "a %s", s);
    return s;
}

/* Checks the value at IDX against TYPE; raises naming FNAME, WHAT
 * ("option" or "argument") and KEY. */
static void check_value_as(lua_State *L, int idx, const char *fname, const char *what,
                           const char *key, const char *type, double lo, double hi)
{
    idx = lua_absindex(L, idx);
    if (lua_isnil(L, idx)) return;
    int top = lua_gettop(L);
    for (const char *p = type; *p;) {
        const char *slash = strchr(p, '/');
        size_t n = slash ? (size_t)(slash - p) : strlen(p);
        int r = check_one(L, idx, p, n, lo, hi);
        if (r == 1) {
            lua_settop(L, top);
            return;
        }
        if (r == 2) {
            const char *why = lua_tostring(L, -1);
            px_lua_user_error(L, "%s: %s '%s'%s%s", fname, what, key, why[0] == '[' ? "" : " ", why);
        }
        lua_settop(L, top);
        p += n + (slash != NULL);
    }
    const char *want = type_words(L, type);
    char vb[32];
    if (lua_type(L, idx) == LUA_TSTRING)
        px_lua_user_error(L, "%s: %s '%s' must be %s, got string '%s'", fname, what, key, want,
                          lua_tostring(L, idx));
    if (lua_type(L, idx) == LUA_TNUMBER)
        px_lua_user_error(L, "%s: %s '%s' must be %s, got number %s", fname, what, key, want,
                          num_text(vb, sizeof vb, lua_tonumber(L, idx)));
    px_lua_user_error(L, "%s: %s '%s' must be %s, got %s", fname, what, key, want, luaL_typename(L, idx));
}

void px_lua_opt_check_value(lua_State *L, int idx, const char *fname, const char *key,
                            const char *type, double lo, double hi)
{
    check_value_as(L, idx, fname, "option", key, type, lo, hi);
}

static void unknown_key(lua_State *L, const char *fname, const char *key, const char *best)
{
    if (best)
        px_lua_user_error(L, "%s: unknown option '%s' (did you mean '%s'?)", fname, key, best);
    px_lua_user_error(L, "%s: unknown option '%s'", fname, key);
}

void px_lua_opts_check(lua_State *L, int idx, const char *fname, const px_lua_opt *spec)
{
    if (lua_type(L, idx) != LUA_TTABLE)
        px_lua_user_error(L, "%s: options table expected, got %s", fname, luaL_typename(L, idx));
    idx = lua_absindex(L, idx);
    lua_pushnil(L);
    while (lua_next(L, idx)) {
        lua_pop(L, 1);
        if (lua_type(L, -1) != LUA_TSTRING) {
            if (lua_type(L, -1) == LUA_TNUMBER)
                px_lua_user_error(L, "%s: unexpected positional entry [%s] (options are name = value)",
                                  fname, luaL_tolstring(L, -1, NULL));
            px_lua_user_error(L, "%s: option keys must be names, got a %s key", fname,
                              luaL_typename(L, -1));
        }
        const char *key = lua_tostring(L, -1);
        const px_lua_opt *o = spec;
        while (o->name && strcmp(o->name, key) != 0) o++;
        if (!o->name) {
            const char *best = NULL;
            int bd = OPT_NEAR_MAX + 1;
            for (o = spec; o->name; o++) {
                int d = nearness(key, o->name);
                if (d <= OPT_NEAR_MAX && better(key, o->name, d, best, bd)) bd = d, best = o->name;
            }
            unknown_key(L, fname, key, best);
        }
        lua_pushvalue(L, -1);
        lua_rawget(L, idx);
        px_lua_opt_check_value(L, -1, fname, key, o->type, o->lo, o->hi);
        lua_pop(L, 1);
    }
}

/* a Lua spec entry at the top -> type, lo, hi (strings anchored in SPEC) */
static const char *spec_entry(lua_State *L, double *lo, double *hi)
{
    *lo = -HUGE_VAL;
    *hi = HUGE_VAL;
    if (lua_type(L, -1) == LUA_TSTRING) return lua_tostring(L, -1);
    if (lua_type(L, -1) != LUA_TTABLE) luaL_error(L, "option spec: entries are \"type\" or {\"type\", lo, hi}");
    lua_rawgeti(L, -1, 1);
    const char *t = lua_tostring(L, -1);
    lua_pop(L, 1); /* anchored in the spec table */
    if (!t) luaL_error(L, "option spec: entries are \"type\" or {\"type\", lo, hi}");
    lua_rawgeti(L, -1, 2);
    if (lua_isnumber(L, -1)) *lo = lua_tonumber(L, -1);
    lua_rawgeti(L, -2, 3);
    if (lua_isnumber(L, -1)) *hi = lua_tonumber(L, -1);
    lua_pop(L, 2);
    return t;
}

/* core.options(fname, spec, opts) -> opts (raises on any misuse) */
static int l_options(lua_State *L)
{
    const char *fname = luaL_checkstring(L, 1);
    luaL_checktype(L, 2, LUA_TTABLE);
    if (lua_type(L, 3) != LUA_TTABLE)
        px_lua_user_error(L, "%s: options table expected, got %s", fname, luaL_typename(L, 3));
    lua_settop(L, 3);
    lua_pushnil(L);
    while (lua_next(L, 3)) {
        /* key at -2, value at -1 */
        double lo, hi;
        if (lua_type(L, -2) == LUA_TSTRING) {
            const char *key = lua_tostring(L, -2);
            if (lua_getfield(L, 2, key) == LUA_TNIL || strcmp(key, "*") == 0) {
                const char *best = NULL;
                int bd = OPT_NEAR_MAX + 1;
                lua_pushnil(L);
                while (lua_next(L, 2)) {
                    lua_pop(L, 1);
                    if (lua_type(L, -1) != LUA_TSTRING || strcmp(lua_tostring(L, -1), "*") == 0) continue;
                    int d = nearness(key, lua_tostring(L, -1));
                    if (d <= OPT_NEAR_MAX && better(key, lua_tostring(L, -1), d, best, bd))
                        bd = d, best = lua_tostring(L, -1);
                }
                unknown_key(L, fname, key, best);
            }
            const char *type = spec_entry(L, &lo, &hi);
            px_lua_opt_check_value(L, -2, fname, key, type, lo, hi);
            lua_pop(L, 1);
        } else if (lua_isinteger(L, -2) && lua_getfield(L, 2, "*") != LUA_TNIL) {
            const char *type = spec_entry(L, &lo, &hi);
            const char *key = lua_pushfstring(L, "[%I]", lua_tointeger(L, -3));
            check_value_as(L, -3, fname, "entry", key, type, lo, hi);
            lua_pop(L, 2);
        } else {
            if (lua_type(L, -1) == LUA_TNIL && lua_isinteger(L, -3)) lua_pop(L, 1); /* the missing "*" */
            if (lua_type(L, -2) == LUA_TNUMBER)
                px_lua_user_error(L, "%s: unexpected positional entry %s (options are name = value)",
                                  fname, luaL_tolstring(L, -2, NULL));
            px_lua_user_error(L, "%s: option keys must be names, got a %s key", fname,
                              luaL_typename(L, -2));
        }
        lua_pop(L, 1);
    }
    return 1;
}

/* core.user_error(message) raises MESSAGE at the line of the user's code. */
static int l_user_error(lua_State *L)
{
    return px_lua_user_error(L, "%s", luaL_checkstring(L, 1));
}

/* core.check_value(fname, key, value, type [, lo, hi]) for a positional
 * argument read with the same rules. */
static int l_check_value(lua_State *L)
{
    const char *fname = luaL_checkstring(L, 1), *key = luaL_checkstring(L, 2);
    const char *type = luaL_checkstring(L, 4);
    double lo = luaL_optnumber(L, 5, -HUGE_VAL), hi = luaL_optnumber(L, 6, HUGE_VAL);
    if (lua_isnil(L, 3)) px_lua_user_error(L, "%s: argument '%s' is required (%s)", fname, key, type_words(L, type));
    check_value_as(L, 3, fname, "argument", key, type, lo, hi);
    lua_settop(L, 3);
    return 1;
}

void px_lua_open_opts(lua_State *L)
{
    static const luaL_Reg funcs[] = {{"options", l_options},
                                     {"user_error", l_user_error},
                                     {"check_value", l_check_value},
                                     {NULL, NULL}};
    luaL_setfuncs(L, funcs, 0);
}
