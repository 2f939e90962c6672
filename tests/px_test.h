/* px_test.h - shared helpers for the cmocka unit tests.
 *
 * cmocka 1.1.5 (Debian 12) has no double equality assertion and its float
 * one casts to float, so closeness is checked here once: |a-b| <= abs or
 * |a-b| <= rel*|b|, with a message that prints both values. */
#ifndef PX_TEST_H
#define PX_TEST_H
#include <math.h>
#include <setjmp.h>
#include <stdarg.h>
#include <stddef.h>
#include <stdint.h>
#include <stdio.h>
#include <cmocka.h>

static inline void px_assert_close_impl(double a, double b, double rel, double abs_tol,
                                        const char *ea, const char *eb,
                                        const char *file, int line)
{
    double d = fabs(a - b);
    if (!(isfinite(a) && isfinite(b)) || (d > abs_tol && d > rel * fabs(b))) {
        print_error("%s = %.12g is not close to %s = %.12g (diff %.3g, rel %.3g, abs %.3g)\n",
                    ea, a, eb, b, d, rel, abs_tol);
        _fail(file, line);
    }
}
#define assert_close(a, b, rel, abs_tol) \
    px_assert_close_impl((a), (b), (rel), (abs_tol), #a, #b, __FILE__, __LINE__)

/* Open a check-value file of tests/reference (PHLOX_REFERENCE_DIR, set by
 * tests/CMakeLists.txt) for reading; a missing or unreadable file fails the
 * test with the file's full name, never a bare assertion. */
#ifdef PHLOX_REFERENCE_DIR
static inline FILE *px_ref_open_impl(const char *rel, const char *file, int line)
{
    char path[1024];
    snprintf(path, sizeof path, "%s/%s", PHLOX_REFERENCE_DIR, rel);
    FILE *fp = fopen(path, "r");
    if (!fp) {
        print_error("cannot open reference file %s\n", path);
        _fail(file, line);
    }
    return fp;
}
#define px_ref_open(rel) px_ref_open_impl((rel), __FILE__, __LINE__)
#endif

#endif
