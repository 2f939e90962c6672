/* sandbox.c - run an untrusted element definition file.
 *
 * Each file gets its own lua_State, closed before the loader returns, so
 * nothing a file does can reach another file, the user's script or the
 * shared string metatable of the main interpreter.  The guarantees:
 *   - text only: luaL_loadbufferx mode "t" refuses precompiled chunks;
 *   - memory: a counting allocator refuses to hold more than opt->mem_limit
 *     bytes; once it has refused, the instruction hook raises at every
 *     instruction, so a file cannot catch the failure and go on;
 *   - time: a count hook adds up VM instructions; past opt->instr_limit it
 *     re-arms itself to fire on every instruction, so the file's own pcall
 *     cannot swallow the error (each handler's next instruction raises it
 *     again until it reaches the loader);
 *   - work inside C: the count hook sees Lua instructions only, so every
 *     helper that can loop inside C (string.rep, string.format, the case
 *     and sub functions, table.concat, table.sort, table.insert, remove and
 *     unpack) is wrapped: before it runs, its work (bytes to produce,
 *     elements to move or compare) is charged to the same budget, and a
 *     call that would overrun it fails before it starts
 *     (`string.rep("", math.maxinteger)` is refused at once);
 *   - wall clock: the hook and every charged call also check a per-file
 *     wall-clock limit (opt->wall_limit seconds), for work nobody counted;
 *   - names: the chunk's _ENV is a fresh table of pure helpers (see
 *     docs/element-files.md); reading any other global, or any other field of
 *     the string, table or math tables, raises "undefined ...".  The string
 *     metatable's __index is the same reduced string table.
 * The returned table is walked by pxd_read_table inside a protected call,
 * with the hook off and some headroom on the allocator. */
#define _POSIX_C_SOURCE 200809L
#include "data/data_internal.h"
#include "core/status.h"
#include <lauxlib.h>
#include <lua.h>
#include <lualib.h>
#include <math.h>
#include <stdint.h>
#include <stdlib.h>
#include <string.h>
#include <time.h>

#define SB_HOOK_STEP 1000          /* instructions between hook calls */
#define SB_READ_HEADROOM (1 << 20) /* bytes added to the cap for the C walk */
#define SB_CHUNKNAME "=f"          /* messages then start "f:LINE:" */

typedef struct sandbox {
    size_t used, limit;
    unsigned long count, budget;
    double deadline; /* CLOCK_MONOTONIC seconds */
    int time_tripped, mem_tripped, wall_tripped;
    int last_line; /* line seen by the last hook call (for memory errors) */
    lua_State *L;
} sandbox;

static void hook(lua_State *L, lua_Debug *ar);

static void *sb_alloc(void *ud, void *ptr, size_t osize, size_t nsize)
{
    sandbox *s = ud;
    size_t old = ptr ? osize : 0;
    if (nsize == 0) {
        free(ptr);
        s->used -= old;
        return NULL;
    }
    if (nsize > old && nsize - old > s->limit - s->used) {
        s->mem_tripped = 1;
        /* lua_sethook may be called at any time (manual, lua_sethook) */
        if (s->L) lua_sethook(s->L, hook, LUA_MASKCOUNT, 1);
        return NULL;
    }
    void *p = realloc(ptr, nsize);
    if (p) s->used = s->used - old + nsize;
    return p;
}

static sandbox *sb_of(lua_State *L)
{
    void *ud;
    lua_getallocf(L, &ud);
    return ud;
}

static double now(void)
{
    struct timespec ts;
    clock_gettime(CLOCK_MONOTONIC, &ts);
    return (double)ts.tv_sec + 1e-9 * (double)ts.tv_nsec;
}

static const char *trip_message(const sandbox *s)
{
    return s->wall_tripped ? "wall-clock limit exceeded"
           : s->time_tripped ? "instruction budget exceeded"
                             : "memory limit exceeded";
}

static void hook(lua_State *L, lua_Debug *ar)
{
    sandbox *s = sb_of(L);
    int line = 0;
    if (lua_getinfo(L, "l", ar) && ar->currentline > 0) line = ar->currentline;
    if (line > 0) s->last_line = line;
    if (!s->time_tripped && !s->mem_tripped) {
        s->count += SB_HOOK_STEP;
        if (now() > s->deadline) s->wall_tripped = 1;
        if (s->count <= s->budget && !s->wall_tripped) return;
        s->time_tripped = 1;
    }
    /* re-arm: fire at every instruction from now on */
    lua_sethook(L, hook, LUA_MASKCOUNT, 1);
    lua_pushfstring(L, "f:%d: %s", line, trip_message(s));
    lua_error(L);
}

/* ---- bounded helpers ----------------------------------------------------- */

/* Charges WORK units (bytes or elements; one unit ~ one VM instruction) to
 * the budget; raises, and trips the sandbox, if it would overrun. */
static void charge(lua_State *L, double work, const char *name)
{
    sandbox *s = sb_of(L);
    if (!(work >= 0)) work = HUGE_VAL;
    if (!s->time_tripped && !s->mem_tripped) {
        if (work <= (double)(s->budget - (s->count < s->budget ? s->count : s->budget)) &&
            now() <= s->deadline) {
            s->count += (unsigned long)work;
            return;
        }
        if (now() > s->deadline) s->wall_tripped = 1;
        s->time_tripped = 1;
    }
    lua_sethook(L, hook, LUA_MASKCOUNT, 1);
    luaL_where(L, 1);
    lua_pushfstring(L, "%s (in %s)", trip_message(s), name);
    lua_concat(L, 2);
    lua_error(L);
}

static double len_of(lua_State *L, int i)
{
    size_t n = 0;
    if (lua_type(L, i) == LUA_TSTRING) lua_tolstring(L, i, &n);
    return (double)n;
}

/* The work a helper will do, from its arguments (before it runs), in units
 * of about one VM instruction's time (measured roughly on string.rep and
 * memcpy; common practice, no source: only the order of magnitude matters). */
#define SB_BYTES_PER_UNIT 16.0 /* bytes copied or converted per unit */
#define SB_REPS_PER_UNIT 16.0  /* iterations of string.rep's loop per unit */
#define SB_CALL_UNITS 8.0      /* a call that makes a new string or moves elements */

static double work_rep(lua_State *L)
{
    double n = lua_isnumber(L, 2) ? lua_tonumber(L, 2) : 0;
    if (n <= 0) return SB_CALL_UNITS;
    double bytes = n * (len_of(L, 1) + len_of(L, 3));
    sandbox *s = sb_of(L);
    /* a result larger than the memory left is refused by the allocator
     * before the loop starts: let the memory cap name it */
    if (bytes > (double)(s->limit - s->used)) return SB_CALL_UNITS;
    /* the loop runs n times even for "" */
    return SB_CALL_UNITS + n / SB_REPS_PER_UNIT + bytes / SB_BYTES_PER_UNIT;
}

static double work_strings(lua_State *L)
{
    double w = SB_CALL_UNITS;
    for (int i = 1; i <= lua_gettop(L); i++) w += len_of(L, i) / SB_BYTES_PER_UNIT;
    return w;
}

static double work_concat(lua_State *L)
{
    if (lua_type(L, 1) != LUA_TTABLE) return 1;
    double i = lua_isnumber(L, 3) ? lua_tonumber(L, 3) : 1;
    double j = lua_isnumber(L, 4) ? lua_tonumber(L, 4) : (double)lua_rawlen(L, 1);
    return SB_CALL_UNITS + (j >= i ? (j - i + 1) * (1.0 + len_of(L, 2) / SB_BYTES_PER_UNIT) : 0);
}

static double work_sort(lua_State *L)
{
    double n = lua_type(L, 1) == LUA_TTABLE ? (double)lua_rawlen(L, 1) : 0;
    return SB_CALL_UNITS + (n > 1 ? n * log2(n) + n : 0);
}

static double work_length(lua_State *L)
{
    return SB_CALL_UNITS + (lua_type(L, 1) == LUA_TTABLE ? (double)lua_rawlen(L, 1) : 0);
}

static double work_unpack(lua_State *L)
{
    double i = lua_isnumber(L, 2) ? lua_tonumber(L, 2) : 1;
    double j = lua_isnumber(L, 3) ? lua_tonumber(L, 3)
               : lua_type(L, 1) == LUA_TTABLE ? (double)lua_rawlen(L, 1) : 0;
    return SB_CALL_UNITS + (j >= i ? j - i + 1 : 0);
}

typedef double (*work_fn)(lua_State *L);

/* upvalues: the library function, the work estimator (light userdata), the name */
static int bounded(lua_State *L)
{
    work_fn w = (work_fn)(uintptr_t)lua_touserdata(L, lua_upvalueindex(2));
    charge(L, w(L), lua_tostring(L, lua_upvalueindex(3)));
    lua_pushvalue(L, lua_upvalueindex(1));
    lua_insert(L, 1);
    lua_call(L, lua_gettop(L) - 1, LUA_MULTRET);
    return lua_gettop(L);
}

static const struct {
    const char *lib, *name;
    work_fn work;
} bounded_helpers[] = {
    {"string", "rep", work_rep},       {"string", "format", work_strings},
    {"string", "lower", work_strings}, {"string", "upper", work_strings},
    {"string", "sub", work_strings},   {"table", "concat", work_concat},
    {"table", "sort", work_sort},      {"table", "insert", work_length},
    {"table", "remove", work_length},  {"table", "unpack", work_unpack},
};

/* replaces the helpers of the copied table at T (of library LIB) by bounded ones */
static void bound_helpers(lua_State *L, int t, const char *lib)
{
    t = lua_absindex(L, t);
    for (size_t i = 0; i < sizeof bounded_helpers / sizeof bounded_helpers[0]; i++) {
        if (strcmp(bounded_helpers[i].lib, lib) != 0) continue;
        lua_getfield(L, t, bounded_helpers[i].name);
        lua_pushlightuserdata(L, (void *)(uintptr_t)bounded_helpers[i].work);
        lua_pushfstring(L, "%s.%s", lib, bounded_helpers[i].name);
        lua_pushcclosure(L, bounded, 3);
        lua_setfield(L, t, bounded_helpers[i].name);
    }
}

/* __index of _ENV and of the helper tables: every miss is an error */
static int strict_index(lua_State *L)
{
    const char *prefix = lua_tostring(L, lua_upvalueindex(1));
    if (lua_type(L, 2) == LUA_TSTRING)
        return luaL_error(L, "undefined %s '%s%s' (not available in element files)",
                          *prefix ? "field" : "global", prefix, lua_tostring(L, 2));
    return luaL_error(L, "undefined %s with a %s key", *prefix ? "field" : "global",
                      luaL_typename(L, 2));
}

static void set_strict(lua_State *L, int t, const char *prefix)
{
    t = lua_absindex(L, t);
    lua_createtable(L, 0, 1);
    lua_pushstring(L, prefix);
    lua_pushcclosure(L, strict_index, 1);
    lua_setfield(L, -2, "__index");
    lua_setmetatable(L, t);
}

/* new table on the stack with the listed fields of the table at LIB */
static void copy_fields(lua_State *L, int lib, const char *const *names, const char *prefix)
{
    lib = lua_absindex(L, lib);
    lua_newtable(L);
    for (; *names; names++) {
        lua_getfield(L, lib, *names);
        lua_setfield(L, -2, *names);
    }
    set_strict(L, -1, prefix);
}

static const char *const base_names[] = {"assert", "error",    "ipairs", "next",
                                         "pairs",  "pcall",    "select", "tonumber",
                                         "tostring", "type",   NULL};
static const char *const string_names[] = {"format", "len", "lower", "rep", "sub", "upper", NULL};
static const char *const table_names[] = {"concat", "insert", "remove", "sort", "unpack", NULL};
/* math without random/randomseed: files must be deterministic */
static const char *const math_names[] = {
    "abs", "ceil", "cos",  "deg",  "exp",   "floor", "fmod", "huge", "log",        "max",
    "maxinteger", "min", "mininteger", "modf", "pi", "rad", "sin", "sqrt", "tan", "tointeger",
    "type", "ult", "acos", "asin", "atan", NULL};

/* Protected: builds the environment table and leaves it on the stack. */
static int build_env(lua_State *L)
{
    luaL_requiref(L, "_G", luaopen_base, 0);
    luaL_requiref(L, "string", luaopen_string, 0);
    luaL_requiref(L, "table", luaopen_table, 0);
    luaL_requiref(L, "math", luaopen_math, 0);
    /* stack: base string table math */
    lua_newtable(L); /* env */
    for (const char *const *n = base_names; *n; n++) {
        lua_getfield(L, 1, *n);
        lua_setfield(L, -2, *n);
    }
    copy_fields(L, 2, string_names, "string.");
    bound_helpers(L, -1, "string");
    /* strings index the reduced table, never the full library */
    lua_pushliteral(L, "");
    if (lua_getmetatable(L, -1)) {
        lua_pushvalue(L, -3);
        lua_setfield(L, -2, "__index");
        lua_pop(L, 1);
    }
    lua_pop(L, 1);
    lua_setfield(L, -2, "string");
    copy_fields(L, 3, table_names, "table.");
    bound_helpers(L, -1, "table");
    lua_setfield(L, -2, "table");
    copy_fields(L, 4, math_names, "math.");
    lua_setfield(L, -2, "math");
    set_strict(L, -1, "");
    return 1;
}

/* "f:12: message" -> line 12, pointer to "message" */
static const char *split_position(const char *msg, int *line)
{
    *line = 0;
    if (!msg) return "error object is not a string";
    if (strncmp(msg, "f:", 2) == 0) {
        char *end;
        long l = strtol(msg + 2, &end, 10);
        if (end != msg + 2 && *end == ':') {
            *line = (int)(l > 0 && l < 1000000000L ? l : 0);
            msg = end + 1;
            while (*msg == ' ') msg++;
        }
    }
    return msg;
}

void pxd_sandbox_run(pxd_file *f)
{
    sandbox s = {0};
    s.limit = f->opt->mem_limit;
    s.budget = f->opt->instr_limit;
    s.deadline = now() + f->opt->wall_limit;
    lua_State *L = lua_newstate(sb_alloc, &s);
    if (!L) {
        pxd_report(f, PX_DATA_ERROR, 0, "", "", "cannot create the sandbox (memory limit too small?)");
        f->status = PX_ELIMIT;
        return;
    }
    s.L = L;

    int line = 0;
    lua_pushcfunction(L, build_env);
    if (lua_pcall(L, 0, 1, 0) != LUA_OK) {
        pxd_report(f, PX_DATA_ERROR, 0, "", "", "cannot build the sandbox environment: %s",
                   lua_tostring(L, -1) ? lua_tostring(L, -1) : "?");
        f->status = PX_ELIMIT;
        goto done;
    }
    /* stack: env */
    int st = luaL_loadbufferx(L, f->text, f->len, SB_CHUNKNAME, "t");
    if (st != LUA_OK) {
        const char *m = split_position(lua_tostring(L, -1), &line);
        if (st == LUA_ERRMEM) {
            pxd_report(f, PX_DATA_ERROR, line, "", "", "memory limit exceeded while parsing");
            f->status = PX_ELIMIT;
        } else {
            pxd_report(f, PX_DATA_ERROR, line, "", "", "syntax error: %s", m);
            f->status = PX_EPARSE;
        }
        goto done;
    }
    lua_pushvalue(L, -2);
    lua_setupvalue(L, -2, 1); /* _ENV of the main chunk */
    lua_sethook(L, hook, LUA_MASKCOUNT, SB_HOOK_STEP);
    st = lua_pcall(L, 0, 1, 0);
    lua_sethook(L, NULL, 0, 0);
    if (st != LUA_OK || s.time_tripped || s.mem_tripped) {
        const char *m = split_position(st != LUA_OK && lua_type(L, -1) == LUA_TSTRING
                                           ? lua_tostring(L, -1)
                                           : NULL,
                                       &line);
        if (s.wall_tripped) {
            pxd_report(f, PX_DATA_ERROR, line, "", "", "wall-clock limit exceeded (%g s)",
                       f->opt->wall_limit);
            f->status = PX_ELIMIT;
        } else if (s.time_tripped) {
            /* a helper that would overrun the budget says which (charge()) */
            const char *in = m ? strstr(m, "(in ") : NULL;
            pxd_report(f, PX_DATA_ERROR, line, "", "",
                       "instruction budget exceeded (%lu Lua instructions or units of work)%s%s",
                       s.budget, in ? " " : ": endless loop?", in ? in : "");
            f->status = PX_ELIMIT;
        } else if (s.mem_tripped) {
            if (line <= 0) line = s.last_line;
            pxd_report(f, PX_DATA_ERROR, line, "", "",
                       "memory limit exceeded (%zu bytes)%s", s.limit,
                       line > 0 ? " (line approximate)" : "");
            f->status = PX_ELIMIT;
        } else if (st == LUA_ERRRUN && lua_type(L, -1) != LUA_TSTRING) {
            pxd_report(f, PX_DATA_ERROR, 0, "", "", "error raised with a %s value",
                       luaL_typename(L, -1));
        } else {
            pxd_report(f, PX_DATA_ERROR, line, "", "", "%s", m);
        }
        goto done;
    }
    if (!lua_istable(L, -1)) {
        pxd_report(f, PX_DATA_ERROR, pxd_toplevel_line(f, "return"), "", "",
                   "the file must return a table, not a %s", luaL_typename(L, -1));
        goto done;
    }
    /* walk the table in C, protected; the file's code no longer runs */
    s.limit = s.used + SB_READ_HEADROOM;
    lua_pushlightuserdata(L, f);
    lua_pushcclosure(L, pxd_read_table, 1);
    lua_insert(L, -2);
    st = lua_pcall(L, 1, 0, 0);
    if (st != LUA_OK) {
        if (f->oom) {
            f->status = PX_ENOMEM;
        } else {
            const char *m = lua_tostring(L, -1);
            pxd_report(f, PX_DATA_ERROR, 0, "", "", "cannot read the returned table: %s",
                       m ? m : "?");
            if (st == LUA_ERRMEM) f->status = PX_ELIMIT;
        }
    }
done:
    lua_close(L);
}
