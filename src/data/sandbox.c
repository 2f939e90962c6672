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
 *   - names: the chunk's _ENV is a fresh table of pure helpers (see
 *     docs/element-files.md); reading any other global, or any other field of
 *     the string, table or math tables, raises "undefined ...".  The string
 *     metatable's __index is the same reduced string table.
 * The returned table is walked by pxd_read_table inside a protected call,
 * with the hook off and some headroom on the allocator. */
#include "data/data_internal.h"
#include "core/status.h"
#include <lauxlib.h>
#include <lua.h>
#include <lualib.h>
#include <stdlib.h>
#include <string.h>

#define SB_HOOK_STEP 1000          /* instructions between hook calls */
#define SB_READ_HEADROOM (1 << 20) /* bytes added to the cap for the C walk */
#define SB_CHUNKNAME "=f"          /* messages then start "f:LINE:" */

typedef struct sandbox {
    size_t used, limit;
    unsigned long count, budget;
    int time_tripped, mem_tripped;
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

static void hook(lua_State *L, lua_Debug *ar)
{
    sandbox *s = sb_of(L);
    int line = 0;
    if (lua_getinfo(L, "l", ar) && ar->currentline > 0) line = ar->currentline;
    if (line > 0) s->last_line = line;
    if (!s->time_tripped && !s->mem_tripped) {
        s->count += SB_HOOK_STEP;
        if (s->count <= s->budget) return;
        s->time_tripped = 1;
    }
    /* re-arm: fire at every instruction from now on */
    lua_sethook(L, hook, LUA_MASKCOUNT, 1);
    lua_pushfstring(L, "f:%d: %s", line,
                    s->time_tripped ? "instruction budget exceeded" : "memory limit exceeded");
    lua_error(L);
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
        if (s.time_tripped) {
            pxd_report(f, PX_DATA_ERROR, line, "", "",
                       "instruction budget exceeded (%lu Lua instructions): endless loop?",
                       s.budget);
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
