/* test_data_sandbox.c - the sandbox of element definition files.
 *
 * One test per forbidden name, tried one by one (an allow-list sandbox is
 * only as good as the list of ways out that were actually tried); the
 * helpers that are allowed do work; an endless loop is stopped by the
 * instruction budget even inside pcall; a memory bomb is stopped by the
 * allocator cap even when the file catches the failure; precompiled
 * (binary) chunks are refused.  The expected outcomes follow from the
 * sandbox's documented guarantees (docs/element-files.md, "Sandbox"). */
#include "px_test.h"
#include "core/status.h"
#include "data/data.h"
#include <lauxlib.h>
#include <lua.h>
#include <lualib.h>
#include <stdlib.h>
#include <string.h>
#include <time.h>

static int problem_has(const px_data_problems *p, const char *needle)
{
    for (size_t i = 0; i < px_data_problems_count(p); i++) {
        char buf[512];
        px_data_problem_format(px_data_problems_get(p, i), buf, sizeof buf);
        if (strstr(buf, needle)) return 1;
        print_message("  %s\n", buf);
    }
    return 0;
}

/* runs SRC, expects status ST and a problem containing NEEDLE */
static void expect(const char *src, int st, const char *needle)
{
    px_data_problems *p = px_data_problems_new();
    int got = px_data_check_buffer(NULL, src, strlen(src), "t.lua", NULL, p);
    if (got != st || !problem_has(p, needle))
        print_message("source: %s\nstatus %s, wanted %s and '%s'\n", src, px_status_name(got),
                      px_status_name(st), needle);
    assert_int_equal(got, st);
    assert_true(problem_has(p, needle));
    px_data_problems_free(p);
}

#define OK_TAIL "\nreturn { element = 'Zn', species = {} }\n"

/* each forbidden name, used the way an escape would use it, on line 1 */
static const struct {
    const char *code, *message;
} forbidden[] = {
    {"io.write('x')", "t.lua:1: undefined global 'io'"},
    {"local f = io.open('/etc/passwd')", "t.lua:1: undefined global 'io'"},
    {"os.execute('true')", "t.lua:1: undefined global 'os'"},
    {"local t = os.time()", "t.lua:1: undefined global 'os'"},
    {"os.exit(1)", "t.lua:1: undefined global 'os'"},
    {"local m = require('io')", "t.lua:1: undefined global 'require'"},
    {"local f = load('return 1')", "t.lua:1: undefined global 'load'"},
    {"local f = loadstring('return 1')", "t.lua:1: undefined global 'loadstring'"},
    {"dofile('/etc/passwd')", "t.lua:1: undefined global 'dofile'"},
    {"local f = loadfile('/etc/passwd')", "t.lua:1: undefined global 'loadfile'"},
    {"local s = string.dump(tostring)", "t.lua:1: undefined field 'string.dump'"},
    {"local s = ('x').dump", "t.lua:1: undefined field 'string.dump'"},
    {"local d = debug.getinfo(1)", "t.lua:1: undefined global 'debug'"},
    {"collectgarbage('count')", "t.lua:1: undefined global 'collectgarbage'"},
    {"local m = getmetatable('')", "t.lua:1: undefined global 'getmetatable'"},
    {"setmetatable({}, {})", "t.lua:1: undefined global 'setmetatable'"},
    {"rawset(_ENV, 'x', 1)", "t.lua:1: undefined global 'rawset'"},
    {"local g = _G", "t.lua:1: undefined global '_G'"},
    {"local g = rawget(_ENV, 'io')", "t.lua:1: undefined global 'rawget'"},
    {"local e = rawequal(1, 1)", "t.lua:1: undefined global 'rawequal'"},
    {"print('hello')", "t.lua:1: undefined global 'print'"},
    {"local p = package.loaded", "t.lua:1: undefined global 'package'"},
    {"local c = coroutine.create(tostring)", "t.lua:1: undefined global 'coroutine'"},
    {"local u = utf8.char(65)", "t.lua:1: undefined global 'utf8'"},
    {"xpcall(tostring, tostring)", "t.lua:1: undefined global 'xpcall'"},
    {"local r = math.random()", "t.lua:1: undefined field 'math.random'"},
    {"math.randomseed(1)", "t.lua:1: undefined field 'math.randomseed'"},
    {"local s = string.gsub('a', 'a', 'b')", "t.lua:1: undefined field 'string.gsub'"},
    {"local s = ('a'):find('a')", "t.lua:1: undefined field 'string.find'"},
    {"local s = string.match('a', '.')", "t.lua:1: undefined field 'string.match'"},
    {"for w in string.gmatch('a', '.') do end", "t.lua:1: undefined field 'string.gmatch'"},
    {"local m = table.move", "t.lua:1: undefined field 'table.move'"},
    {"local x = undefined_name + 1", "t.lua:1: undefined global 'undefined_name'"},
};

static void test_forbidden_names(void **state)
{
    (void)state;
    for (size_t i = 0; i < sizeof forbidden / sizeof forbidden[0]; i++) {
        char src[256];
        snprintf(src, sizeof src, "%s" OK_TAIL, forbidden[i].code);
        expect(src, PX_EDATA, forbidden[i].message);
    }
}

/* the string metatable of the sandbox state reaches only the reduced table */
static void test_string_methods_reduced(void **state)
{
    (void)state;
    expect("local s = ('ab'):upper()\nlocal r = ('ab'):rep(2)\nlocal d = ('ab').dump" OK_TAIL,
           PX_EDATA, "t.lua:3: undefined field 'string.dump'");
}

/* everything the format promises is there and works */
static void test_allowed_helpers(void **state)
{
    (void)state;
    const char *src =
        "local t = {}\n"
        "table.insert(t, string.format('%.1f', math.floor(2.7) + math.sqrt(4) + math.pi - math.pi))\n"
        "assert(t[1] == '4.0' and select('#', 1, 2) == 2 and tonumber('5') == 5)\n"
        "assert(type(next({})) == 'nil' and tostring(1) == '1' and ('x'):rep(3) == 'xxx')\n"
        "for _, v in ipairs({1}) do assert(v == 1) end\n"
        "for k in pairs({a = 1}) do assert(k == 'a') end\n"
        "assert(table.concat({'a', 'b'}, ',') == 'a,b' and string.sub('abc', 2, 2) == 'b')\n"
        "assert(string.upper('a') == 'A' and string.lower('A') == 'a' and string.len('ab') == 2)\n"
        "local ok, msg = pcall(error, 'caught')\n"
        "assert(not ok and msg == 'caught')\n"
        "local u = { table.unpack({3, 1, 2}) }; table.sort(u); assert(u[1] == 1)\n"
        "assert(table.remove(u) == 3 and math.max(1, 2) == 2 and math.huge > 1)\n"
        "x_global = 1; assert(x_global == 1)\n" /* a file's own globals are fine */
        "return { element = 'Zn', species = {} }\n";
    px_data_problems *p = px_data_problems_new();
    int st = px_data_check_buffer(NULL, src, strlen(src), "ok.lua", NULL, p);
    problem_has(p, "(print all)");
    assert_int_equal(st, PX_OK);
    assert_int_equal(px_data_problems_errors(p), 0);
    px_data_problems_free(p);
}

static double seconds(void)
{
    struct timespec ts;
    timespec_get(&ts, TIME_UTC);
    return (double)ts.tv_sec + 1e-9 * (double)ts.tv_nsec;
}

/* each source must end with "instruction budget exceeded"; prints how long */
static void expect_stopped(const char *const *src, size_t n, const char *what)
{
    for (size_t i = 0; i < n; i++) {
        double t0 = seconds();
        expect(src[i], PX_ELIMIT, "instruction budget exceeded");
        print_message("%s %zu stopped after %.3f s\n", what, i, seconds() - t0);
    }
}

static void test_budget_loops(void **state)
{
    (void)state;
    static const char *loops[] = {
        "while true do end" OK_TAIL,
        "pcall(function() while true do end end)" OK_TAIL,
        /* the handler itself loops and re-enters pcall: the re-armed hook
         * raises at its first instruction, every time, until the top */
        "local function spin() while true do end end\nwhile true do pcall(spin) end" OK_TAIL,
        "local function f() return f() end\nf()" OK_TAIL, /* endless tail call */
        "local ok = pcall(function() while true do end end)\nlocal n = 0\nfor i = 1, 10 do n = n + i end" OK_TAIL,
    };
    expect_stopped(loops, sizeof loops / sizeof loops[0], "loop");
    /* a smaller budget stops sooner; a larger one lets honest work finish */
    px_data_options o = px_data_options_default();
    o.instr_limit = 10000;
    const char *work = "local n = 0\nfor i = 1, 100000 do n = n + i end" OK_TAIL;
    assert_int_equal(px_data_check_buffer(NULL, work, strlen(work), "w.lua", &o, NULL), PX_ELIMIT);
    o.instr_limit = PX_DATA_INSTR_LIMIT_DEFAULT;
    assert_int_equal(px_data_check_buffer(NULL, work, strlen(work), "w.lua", &o, NULL), PX_OK);
}

/* Work inside C functions is charged to the same budget: each of these ran
 * for hours before the helpers were bounded (one C call, no instructions). */
static void test_budget_inside_c(void **state)
{
    (void)state;
    static const char *work[] = {
        "local s = string.rep('', math.maxinteger)" OK_TAIL,
        "local s = ('') : rep(math.maxinteger)" OK_TAIL,
        "local s = string.rep('', 1 << 40, '')" OK_TAIL,
        "local t = {} for i = 1, 1000 do t[i] = i end\nfor k = 1, 1e6 do table.sort(t) end" OK_TAIL,
        "local t = {} for i = 1, 1000 do t[i] = 'x' end\nfor k = 1, 1e6 do local s = table.concat(t) end" OK_TAIL,
        "local t = {} for i = 1, 1000 do t[i] = i end\nfor k = 1, 1e6 do table.insert(t, 1, k); table.remove(t, 1) end" OK_TAIL,
        "local s = string.rep('x', 4096)\nfor k = 1, 1e7 do local u = s:upper() end" OK_TAIL,
        "local s = string.rep('x', 4096)\nfor k = 1, 1e7 do local u = string.format('%s%s', s, s) end" OK_TAIL,
        "pcall(string.rep, '', math.maxinteger)\nlocal n = 0" OK_TAIL, /* caught: stays tripped */
    };
    expect_stopped(work, sizeof work / sizeof work[0], "C-work case");
    /* honest use of the helpers still works */
    const char *ok = "local s = string.rep('ab', 1000, ',')\nlocal t = {3, 1, 2}\ntable.sort(t)\n"
                     "local c = table.concat(t, '-')\nassert(c == '1-2-3' and #s == 2999)" OK_TAIL;
    assert_int_equal(px_data_check_buffer(NULL, ok, strlen(ok), "ok.lua", NULL, NULL), PX_OK);
}

/* Absurd but finite values are errors, each naming the field (they passed
 * `phlox check` before: logK = 1e300, Cp coefficients of 1e308, element
 * counts of 1e22). */
static void test_physical_ranges(void **state)
{
    (void)state;
#define CP_SP(extra) "return { element = 'Zn', species = { { formula = 'ZnO(s)', model = 'cp', " \
                     "G = -320.479, H = -350.46, S = 43.65, source = 'x', " extra " } } }"
    expect(CP_SP("cp = { a = 1e308 }"), PX_EDATA, "Cp(298.15 K) = 1e+308 J/(mol K) is outside the physical range");
    expect(CP_SP("cp = { a = 40, e = 1e300 }"), PX_EDATA, "is outside the physical range");
    expect(CP_SP("cp = { a = 40 }, V = 1e30"), PX_EDATA, "V = 1e+29 J/bar is outside");
    expect("return { element = 'Zn', species = { { formula = 'ZnO(s)', model = 'cp', G = -1e300, H = -350.46, "
           "S = 43.65, cp = { a = 40 }, source = 'x' } } }", PX_EDATA, "G = -1e+303 J/mol is outside the physical range");
#define LK_SP(extra) "return { element = 'Cl', species = { { formula = 'ZnCl^+', model = 'logk', " \
                     "reaction = 'Zn^2+ + Cl^- = ZnCl^+', source = 'x', " extra " } } }"
    expect(LK_SP("logK = 1e300"), PX_EDATA, "logK = 1e+300  is outside the physical range");
    expect(LK_SP("logK = 0.43, dH = 1e12"), PX_EDATA, "dH = 1e+15 J/mol is outside");
    expect(LK_SP("logK_T = { 0, 0, 0, 0, 1e30 }"), PX_EDATA, "logK_T(298.15 K)");
    expect("return { element = 'Zn', species = { { formula = 'Zn10000000000000000000000(s)', model = 'cp', "
           "G = 0, H = 0, S = 41.63, cp = { a = 25.4 }, source = 'x' } } }", PX_EDATA,
           "1e+22 atoms of Zn per formula unit (at most 1000)");
    /* a real record passes */
    const char *ok = CP_SP("cp = { a = 40.25 }");
    assert_int_equal(px_data_check_buffer(NULL, ok, strlen(ok), "ok.lua", NULL, NULL), PX_OK);
#undef CP_SP
#undef LK_SP
}

/* A wall-clock limit per file stops what the budget does not see. */
static void test_wall_clock(void **state)
{
    (void)state;
    px_data_options o = px_data_options_default();
    o.instr_limit = (unsigned long)-1 / 2; /* practically no instruction budget */
    o.wall_limit = 0.2;
    const char *spin = "while true do end" OK_TAIL;
    px_data_problems *p = px_data_problems_new();
    double t0 = seconds();
    assert_int_equal(px_data_check_buffer(NULL, spin, strlen(spin), "w.lua", &o, p), PX_ELIMIT);
    double dt = seconds() - t0;
    assert_true(problem_has(p, "wall-clock limit exceeded"));
    assert_true(dt >= 0.2 && dt < 20.0);
    px_data_problems_free(p);
}

static void test_memory_cap(void **state)
{
    (void)state;
    static const char *bombs[] = {
        "local s = 'x'\nwhile true do s = s .. s end" OK_TAIL,
        "local t = {}\nfor i = 1, 1e9 do t[i] = i end" OK_TAIL,
        "local s = string.rep('x', 1 << 30)" OK_TAIL, /* 1 GiB */
        /* caught by the file's own pcall: the cap stays tripped */
        "pcall(function() local s = 'x' while true do s = s .. s end end)" OK_TAIL,
        "local ok = pcall(string.rep, 'x', 1 << 30)" OK_TAIL,
    };
    for (size_t i = 0; i < sizeof bombs / sizeof bombs[0]; i++)
        expect(bombs[i], PX_ELIMIT, "memory limit exceeded");
    /* the cap is an option */
    px_data_options o = px_data_options_default();
    o.mem_limit = (size_t)64 << 20;
    const char *big = "local s = string.rep('x', 20 << 20)" OK_TAIL; /* 20 MiB */
    assert_int_equal(px_data_check_buffer(NULL, big, strlen(big), "b.lua", NULL, NULL), PX_ELIMIT);
    assert_int_equal(px_data_check_buffer(NULL, big, strlen(big), "b.lua", &o, NULL), PX_OK);
}

static int writer(lua_State *L, const void *p, size_t sz, void *ud)
{
    (void)L;
    luaL_Buffer *b = ud;
    luaL_addlstring(b, p, sz);
    return 0;
}

/* a precompiled chunk is refused (text-only load) */
static void test_binary_chunk_refused(void **state)
{
    (void)state;
    lua_State *L = luaL_newstate();
    assert_int_equal(luaL_loadstring(L, "return { element = 'Zn', species = {} }"), LUA_OK);
    luaL_Buffer b;
    luaL_buffinit(L, &b);
    lua_pushvalue(L, -2);
    lua_dump(L, writer, &b, 0);
    lua_pop(L, 1);
    luaL_pushresult(&b);
    size_t n;
    const char *bin = lua_tolstring(L, -1, &n);
    px_data_problems *p = px_data_problems_new();
    assert_int_equal(px_data_check_buffer(NULL, bin, n, "bin.lua", NULL, p), PX_EPARSE);
    assert_true(problem_has(p, "attempt to load a binary chunk"));
    px_data_problems_free(p);
    lua_close(L);
}

/* errors raised by the file itself keep their line; odd results are named */
static void test_runtime_errors(void **state)
{
    (void)state;
    expect("local x = 1\nerror('my own message')" OK_TAIL, PX_EDATA, "t.lua:2: my own message");
    expect("local x = nil + 1" OK_TAIL, PX_EDATA, "t.lua:1: attempt to perform arithmetic");
    expect("error({})" OK_TAIL, PX_EDATA, "error raised with a table value");
    expect("return 42", PX_EDATA, "t.lua:1: the file must return a table, not a number");
    expect("return { element = 'Zn', species = { 1, 'x' } }", PX_EDATA,
           "species: entry 1 is a number, expected a table");
    expect("return { element = 'Zn', species = { a = {} } }", PX_EDATA,
           "'species' must be a list");
    expect("return { element = 'Xx', species = {} }", PX_EDATA, "unknown element 'Xx'");
    expect("return { element = 'Zn', species = {}, extra = 1 }", PX_EDATA,
           "t.lua:1: extra: unknown field 'extra'");
    expect("return { element = 'Zn', species = {}, [1] = 2 }", PX_EDATA, "unexpected entry [1]");
    /* control characters from a file never reach the terminal raw */
    expect("error('clear\\27[2J\\7 bell')" OK_TAIL, PX_EDATA, "t.lua:1: clear\\x1b[2J\\x07 bell");
    expect("return { element = 'Zn', species = { { formula = 'Zn\\27[31m' } } }", PX_EDATA,
           "Zn\\x1b[31m");
}

/* NaN and infinities never reach a record */
static void test_non_finite(void **state)
{
    (void)state;
    expect("return { element = 'Zn', species = { { formula = 'Zn(s)', model = 'cp',\n"
           "G = 0/0, H = 0, S = 41.63, cp = { a = 25.4 }, source = 's' } } }",
           PX_EDATA, "t.lua:2: Zn(s): G: not a finite number");
    expect("return { element = 'Zn', species = { { formula = 'Zn(s)', model = 'cp',\n"
           "G = 0, H = 0, S = math.huge, cp = { a = 25.4 }, source = 's' } } }",
           PX_EDATA, "t.lua:2: Zn(s): S: not a finite number");
    expect("return { element = 'Zn', species = { { formula = 'Zn(s)', model = 'cp',\n"
           "G = 0, H = 0, S = 41.63, cp = { a = -1/0 }, source = 's' } } }",
           PX_EDATA, "t.lua:2: Zn(s): cp.a: not a finite number");
}

int main(void)
{
    const struct CMUnitTest tests[] = {
        cmocka_unit_test(test_forbidden_names),   cmocka_unit_test(test_string_methods_reduced),
        cmocka_unit_test(test_allowed_helpers),   cmocka_unit_test(test_budget_loops),
        cmocka_unit_test(test_memory_cap),        cmocka_unit_test(test_binary_chunk_refused),
        cmocka_unit_test(test_runtime_errors),    cmocka_unit_test(test_non_finite),
        cmocka_unit_test(test_budget_inside_c),   cmocka_unit_test(test_wall_clock),
        cmocka_unit_test(test_physical_ranges),
    };
    return cmocka_run_group_tests(tests, NULL, NULL);
}
