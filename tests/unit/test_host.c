/* test_host.c - the embedded interpreter: the embedded file index, module
 * search order, protected calls with tracebacks. */
#include "px_test.h"
#include "embed/embedded.h"
#include "lua/host.h"
#include <lauxlib.h>
#include <string.h>

static void test_embedded_index(void **state)
{
    (void)state;
    const px_embedded_file *f = px_embedded_find("lua/phlox.lua");
    assert_non_null(f);
    assert_true(f->size > 0);
    assert_int_equal(f->data[f->size], '\0'); /* generator appends a NUL */
    assert_null(px_embedded_find("lua/none.lua"));
    for (size_t i = 1; i < px_embedded_count; i++) /* sorted, unique */
        assert_true(strcmp(px_embedded_files[i - 1].path, px_embedded_files[i].path) < 0);
}

static void test_require_and_errors(void **state)
{
    (void)state;
    const char *paths[] = {"/nonexistent-phlox-dir"};
    lua_State *L = px_host_new(paths, 1);
    assert_non_null(L);
    assert_int_equal(px_host_require(L, "phlox"), LUA_OK);
    assert_int_equal(lua_type(L, -1), LUA_TTABLE);
    lua_pop(L, 1);

    /* a failing chunk leaves "chunk:line: message" plus a traceback */
    const char *code = "local t = nil\nreturn t.field";
    assert_int_equal(luaL_loadbufferx(L, code, strlen(code), "=probe", "t"), LUA_OK);
    assert_int_not_equal(px_host_docall(L, 0, 0), LUA_OK);
    const char *msg = lua_tostring(L, -1);
    assert_non_null(strstr(msg, "probe:2:"));
    assert_non_null(strstr(msg, "stack traceback"));
    lua_pop(L, 1);

    /* a missing module names the folders and the embedded places tried */
    assert_int_not_equal(px_host_require(L, "no.such.module"), LUA_OK);
    msg = lua_tostring(L, -1);
    assert_non_null(strstr(msg, "/nonexistent-phlox-dir/no/such/module.lua"));
    assert_non_null(strstr(msg, "no embedded file 'lua/no/such/module.lua'"));
    assert_int_equal(lua_gettop(L), 1);
    lua_close(L);
}

int main(void)
{
    const struct CMUnitTest tests[] = {
        cmocka_unit_test(test_embedded_index),
        cmocka_unit_test(test_require_and_errors),
    };
    return cmocka_run_group_tests(tests, NULL, NULL);
}
