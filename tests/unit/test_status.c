/* test_status.c - the status table: every code has a distinct name and a
 * message, unknown codes are reported as such, signs follow the convention. */
#include "px_test.h"
#include "core/status.h"
#include <string.h>

static void test_messages(void **state)
{
    (void)state;
    static const int codes[] = {
#define X(name, code, msg) code,
        PX_STATUS_LIST(X)
#undef X
    };
    size_t n = sizeof codes / sizeof codes[0];
    for (size_t i = 0; i < n; i++) {
        assert_string_not_equal(px_strerror(codes[i]), "unknown status");
        for (size_t j = i + 1; j < n; j++) assert_int_not_equal(codes[i], codes[j]);
    }
    assert_string_equal(px_strerror(12345), "unknown status");
    assert_string_equal(px_status_name(PX_ENOCONV), "PX_ENOCONV");
    assert_true(PX_OK == 0 && PX_ENOMEM < 0 && PX_EXTRAPOLATED > 0);
}

int main(void)
{
    const struct CMUnitTest tests[] = {cmocka_unit_test(test_messages)};
    return cmocka_run_group_tests(tests, NULL, NULL);
}
