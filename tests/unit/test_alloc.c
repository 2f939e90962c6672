/* test_alloc.c - the injectable allocator's helpers (src/core/alloc.h):
 * px_grow keeps the array when there is room, doubles it (from `first`)
 * when not, keeps the contents, refuses sizes that overflow size_t and
 * leaves the array and its capacity untouched when the allocator fails. */
#include "px_test.h"
#include "support/px_alloc_fail.h"
#include "core/alloc.h"
#include <stdint.h>
#include <string.h>

static void test_grow(void **state)
{
    (void)state;
    size_t cap = 0;
    int *v = px_grow(NULL, NULL, &cap, 1, sizeof *v, 4);
    assert_non_null(v);
    assert_int_equal(cap, 4); /* the first capacity */
    for (int i = 0; i < 4; i++) v[i] = i;
    assert_ptr_equal(px_grow(NULL, v, &cap, 4, sizeof *v, 4), v); /* room: the same array */
    v = px_grow(NULL, v, &cap, 5, sizeof *v, 4);
    assert_non_null(v);
    assert_int_equal(cap, 8); /* doubled */
    for (int i = 0; i < 4; i++) assert_int_equal(v[i], i);
    v = px_grow(NULL, v, &cap, 100, sizeof *v, 4);
    assert_int_equal(cap, 128); /* doubled until it holds `need` */
    for (int i = 0; i < 4; i++) assert_int_equal(v[i], i);
    /* overflow: refused, the array and capacity untouched */
    size_t before = cap;
    assert_null(px_grow(NULL, v, &cap, SIZE_MAX / 2 + 2, sizeof *v, 4));
    assert_int_equal(cap, before);
    assert_null(px_grow(NULL, v, &cap, SIZE_MAX / sizeof *v, sizeof *v * 2, 4));
    assert_int_equal(cap, before);
    px_free(NULL, v);

    /* a failing allocator: NULL, nothing held, the old array still usable */
    px_alloc_fail f;
    px_allocator a = px_alloc_fail_make(&f, 1);
    cap = 0;
    int *w = px_grow(&a, NULL, &cap, 3, sizeof *w, 2);
    assert_non_null(w);
    assert_int_equal(cap, 4);
    w[3] = 7;
    assert_null(px_grow(&a, w, &cap, 5, sizeof *w, 2));
    assert_int_equal(cap, 4);
    assert_int_equal(w[3], 7);
    px_free(&a, w);
    assert_int_equal(f.live, 0);
}

int main(void)
{
    const struct CMUnitTest tests[] = {cmocka_unit_test(test_grow)};
    return cmocka_run_group_tests(tests, NULL, NULL);
}
