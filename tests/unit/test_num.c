/* test_num.c - the numerical kernels of src/num: the dense solver on a
 * table of systems with known answers (well-posed, needing pivoting,
 * ill-conditioned, singular, non-finite), and the 1-D root finders on
 * known roots and deliberate failures.
 * Known answers: small systems with a chosen x and b = A x (checked by
 * hand); the Hilbert matrix H_ij = 1/(i+j+1) with b = H 1, whose solution
 * is all ones (2-norm condition about 4.8e5 for n = 5, common knowledge,
 * no source); sqrt(2) = 1.41421356237309504880; the real root of
 * x^3 - 2x - 5 = 0 (the equation of Newton's own example of his method),
 * 2.09455148154232659148, and the fixed point of cos,
 * 0.73908513321516064166: both computed to 40 digits by bisection in
 * decimal arithmetic for this test, and checked here by their residuals
 * too. */
#include "px_test.h"
#include "core/status.h"
#include "num/num.h"
#include <string.h>

/* ---- dense solver ---------------------------------------------------- */

typedef struct lu_case {
    const char *name;
    size_t n;
    double A[9], b[3];
    double rel, abs;
    int status;
    double x[3];
    size_t bad_col;
} lu_case;

static const lu_case LU_CASES[] = {
    {"2x2 symmetric", 2, {2, 1, 1, 3}, {3, 5}, 1e-13, 0, PX_OK, {0.8, 1.4}, 0},
    {"3x3 zero first pivot", 3, {0, 2, 1, 1, 1, 1, 2, 1, 0}, {7, 6, 4}, 1e-13, 0, PX_OK, {1, 2, 3}, 0},
    {"diagonal, tiny entry kept (no absolute floor)", 2, {1e-13, 0, 0, 1}, {1, 1}, 0, 0, PX_OK, {1e13, 1}, 0},
    {"diagonal, tiny entry under the absolute floor", 2, {1e-13, 0, 0, 1}, {1, 1}, 0, 1e-12, PX_ESINGULAR, {0, 0}, 0},
    {"rank 1", 2, {1, 2, 2, 4}, {1, 2}, 1e-13, 0, PX_ESINGULAR, {0, 0}, 1},
    {"zero matrix", 2, {0, 0, 0, 0}, {1, 1}, 0, 0, PX_ESINGULAR, {0, 0}, 0},
    {"nearly dependent rows, relative test on", 2, {1, 1, 1, 1 + 1e-15}, {1, 1}, 1e-13, 0, PX_ESINGULAR, {0, 0}, 1},
};

static void test_lu_table(void **state)
{
    (void)state;
    for (size_t k = 0; k < sizeof LU_CASES / sizeof LU_CASES[0]; k++) {
        const lu_case *c = &LU_CASES[k];
        double A[9], b[3];
        size_t perm[3], bad = 99;
        memcpy(A, c->A, sizeof A);
        memcpy(b, c->b, sizeof b);
        int st = px_num_lu_solve(c->n, A, b, perm, c->rel, c->abs, &bad);
        if (st != c->status) print_error("case '%s'\n", c->name);
        assert_int_equal(st, c->status);
        if (st == PX_OK)
            for (size_t i = 0; i < c->n; i++) assert_close(b[i], c->x[i], 1e-14, 1e-14);
        else
            assert_int_equal(bad, c->bad_col);
    }
}

static void test_lu_permutation(void **state)
{
    (void)state;
    double A[9] = {0, 2, 1, 1, 1, 1, 2, 1, 0}, b[3] = {7, 6, 4};
    size_t perm[3];
    assert_int_equal(px_num_lu_solve(3, A, b, perm, 0, 0, NULL), PX_OK);
    /* partial pivoting takes the largest |a| of column 0 first: row 2 */
    assert_int_equal(perm[0], 2);
    int seen[3] = {0, 0, 0};
    for (size_t i = 0; i < 3; i++) seen[perm[i]]++;
    assert_int_equal(seen[0] + seen[1] + seen[2], 3);
    assert_true(seen[0] == 1 && seen[1] == 1 && seen[2] == 1);
}

static void test_lu_hilbert(void **state)
{
    (void)state;
    enum { N = 5 };
    double A[N * N], b[N];
    for (size_t i = 0; i < N; i++) {
        b[i] = 0;
        for (size_t j = 0; j < N; j++) {
            A[i * N + j] = 1.0 / (double)(i + j + 1);
            b[i] += A[i * N + j];
        }
    }
    assert_int_equal(px_num_lu_solve(N, A, b, NULL, 1e-13, 0, NULL), PX_OK);
    /* condition ~4.8e5 times the rounding unit 1.1e-16: ~5e-11 */
    for (size_t i = 0; i < N; i++) assert_close(b[i], 1.0, 0, 1e-9);
}

static void test_lu_nonfinite_and_args(void **state)
{
    (void)state;
    double A[4] = {1, NAN, 1, 1}, b[2] = {1, 1};
    assert_int_equal(px_num_lu_solve(2, A, b, NULL, 1e-13, 0, NULL), PX_ENONFINITE);
    double A1[4] = {1, NAN, 1, 1}, b1[2] = {1, 1};
    assert_int_equal(px_num_lu_solve(2, A1, b1, NULL, 0, 0, NULL), PX_ENONFINITE);
    assert_true(isnan(A1[1]) && b1[0] == 1); /* found before anything changed */
    double A6[4] = {INFINITY, 0, 0, 1}, b6[2] = {1, 1};
    assert_int_equal(px_num_lu_solve(2, A6, b6, NULL, 1e-13, 0, NULL), PX_ENONFINITE);
    double A2[4] = {INFINITY, 0, 0, 1}, b2[2] = {1, 1};
    assert_int_equal(px_num_lu_solve(2, A2, b2, NULL, 0, 0, NULL), PX_ENONFINITE);
    double A3[4] = {2, 0, 0, 1}, b3[2] = {NAN, 1};
    assert_int_equal(px_num_lu_solve(2, A3, b3, NULL, 0, 0, NULL), PX_ENONFINITE);
    /* overflow in the solution */
    double A4[4] = {1e-300, 0, 0, 1}, b4[2] = {1e300, 1};
    assert_int_equal(px_num_lu_solve(2, A4, b4, NULL, 0, 0, NULL), PX_ENONFINITE);
    double A5[1] = {1}, b5[1] = {1};
    assert_int_equal(px_num_lu_solve(0, A5, b5, NULL, 0, 0, NULL), PX_EINVAL);
    assert_int_equal(px_num_lu_solve(1, NULL, b5, NULL, 0, 0, NULL), PX_EINVAL);
    assert_int_equal(px_num_lu_solve(1, A5, b5, NULL, -1, 0, NULL), PX_EINVAL);
    assert_int_equal(px_num_lu_solve(1, A5, b5, NULL, 0, NAN, NULL), PX_EINVAL);
}

/* ---- root finders ---------------------------------------------------- */

static int side_sqrt2(double x, void *user, int *high)
{
    (void)user;
    *high = x * x > 2.0;
    return PX_OK;
}

static int side_fails(double x, void *user, int *high)
{
    (void)x;
    (void)user;
    *high = 0;
    return PX_EIO;
}

static void test_bisect(void **state)
{
    (void)state;
    px_num_root_options o = {1e-12, 0, 0, 100};
    px_num_root_stats st;
    double lo = 1, hi = 2;
    assert_int_equal(px_num_root_bisect(side_sqrt2, NULL, &lo, &hi, &o, &st), PX_OK);
    assert_true(hi - lo <= 1e-12);
    assert_close(0.5 * (lo + hi), 1.41421356237309504880, 0, 1e-12);
    /* 2^-40 < 1e-12 < 2^-39 */
    assert_int_equal(st.iterations, 40);
    assert_int_equal(st.evaluations, 40);
    /* the caller's cap */
    o.max_iter = 10;
    lo = 1, hi = 2;
    assert_int_equal(px_num_root_bisect(side_sqrt2, NULL, &lo, &hi, &o, &st), PX_ENOCONV);
    assert_close(hi - lo, 1.0 / 1024, 0, 0);
    assert_true(lo < 1.41421356237309504880 && hi > 1.41421356237309504880);
    assert_int_equal(st.iterations, 10);
    /* a failing probe stops it with its status */
    o.max_iter = 100;
    lo = 1, hi = 2;
    assert_int_equal(px_num_root_bisect(side_fails, NULL, &lo, &hi, &o, &st), PX_EIO);
    assert_int_equal(st.evaluations, 1);
    /* options validated before any evaluation */
    px_num_root_options bad[] = {{NAN, 0, 0, 10}, {-1, 0, 0, 10}, {0, INFINITY, 0, 10},
                                 {0, -1e-3, 0, 10}, {1e-6, 0, 0, 0}, {1e-6, 0, NAN, 10}};
    for (size_t k = 0; k < sizeof bad / sizeof bad[0]; k++) {
        lo = 1, hi = 2;
        assert_int_equal(px_num_root_bisect(side_sqrt2, NULL, &lo, &hi, &bad[k], &st), PX_EINVAL);
        assert_int_equal(st.evaluations, 0);
        assert_true(lo == 1 && hi == 2);
    }
}

static int fdf_wallis(double x, void *user, double *f, double *df)
{
    (void)user;
    *f = x * x * x - 2 * x - 5;
    *df = 3 * x * x - 2;
    return PX_OK;
}

/* x^3 - x: decreasing below 1/sqrt(3), where the finder must step up */
static int fdf_spinodal(double x, void *user, double *f, double *df)
{
    (void)user;
    *f = x * x * x - x;
    *df = 3 * x * x - 1;
    return PX_OK;
}

static int fdf_nan(double x, void *user, double *f, double *df)
{
    (void)user;
    *f = x > 2.5 ? NAN : x - 2.7;
    *df = 1;
    return PX_OK;
}

static void test_newton(void **state)
{
    (void)state;
    px_num_root_options o = {0, 1e-14, 0, 50};
    px_num_root_stats st;
    double x = 0;
    assert_int_equal(px_num_root_newton(fdf_wallis, NULL, 2, 3, 2.5, &o, &x, &st), PX_OK);
    assert_close(x, 2.09455148154232659148, 1e-15, 0);
    assert_close(x * x * x - 2 * x - 5, 0, 0, 1e-13);
    assert_true(st.iterations >= 3 && st.iterations <= 8); /* quadratic convergence */
    assert_int_equal(st.bisections, 0);
    /* a start inside the decreasing branch: bisection steps, then the root 1 */
    assert_int_equal(px_num_root_newton(fdf_spinodal, NULL, 0.1, 2, 0.3, &o, &x, &st), PX_OK);
    assert_close(x, 1.0, 1e-14, 0);
    assert_true(st.bisections >= 1);
    /* the caller's cap */
    o.max_iter = 2;
    assert_int_equal(px_num_root_newton(fdf_wallis, NULL, 2, 3, 2.9, &o, &x, &st), PX_ENOCONV);
    assert_int_equal(st.iterations, 2);
    assert_true(st.residual > 0);
    /* a non-finite value is reported, not iterated on */
    o.max_iter = 50;
    assert_int_equal(px_num_root_newton(fdf_nan, NULL, 2, 3, 2.9, &o, &x, &st), PX_ENONFINITE);
    /* bad bracket and options */
    assert_int_equal(px_num_root_newton(fdf_wallis, NULL, 3, 2, 2.5, &o, &x, &st), PX_EINVAL);
    o.epsrel = -1;
    assert_int_equal(px_num_root_newton(fdf_wallis, NULL, 2, 3, 2.5, &o, &x, &st), PX_EINVAL);
    assert_int_equal(st.evaluations, 0);
}

static int f_linear10(double x, void *user, double *f)
{
    (void)user;
    *f = x - 10;
    return PX_OK;
}

static int f_positive(double x, void *user, double *f)
{
    (void)user;
    *f = x * x + 1;
    return PX_OK;
}

static int f_dottie(double x, void *user, double *f)
{
    int *calls = user;
    if (calls) (*calls)++;
    *f = x - cos(x);
    return PX_OK;
}

/* says "good enough" at once: the caller's own residual test */
static int f_done(double x, void *user, double *f)
{
    (void)user;
    *f = x - cos(x);
    return 1;
}

static void test_search(void **state)
{
    (void)state;
    double a, fa, b, fb;
    px_num_root_stats st;
    /* -0.5, +0.5, -1, +1, ... -8, +8 (anchor: 8), -16, then +16 passes 10 */
    assert_int_equal(px_num_root_search(f_linear10, NULL, 0, -10, 0.5, 64, -300, 300, &a, &fa, &b,
                                        &fb, &st),
                     PX_OK);
    assert_close(a, 8, 0, 0);
    assert_close(b, 16, 0, 0);
    assert_true(fa < 0 && fb > 0);
    assert_int_equal(st.evaluations, 12);
    /* clamped to the allowed range: 10 is out of reach */
    assert_int_equal(px_num_root_search(f_linear10, NULL, 0, -10, 0.5, 64, -5, 5, &a, &fa, &b, &fb,
                                        &st),
                     PX_ENOTFOUND);
    assert_close(a, 5, 0, 0);
    /* no sign change at all: the best point comes back */
    assert_int_equal(px_num_root_search(f_positive, NULL, 0, 1, 0.5, 64, -300, 300, &a, &fa, &b,
                                        &fb, &st),
                     PX_ENOTFOUND);
    assert_close(a, 0, 0, 0);
    assert_close(fa, 1, 0, 0);
    assert_int_equal(px_num_root_search(f_positive, NULL, 0, 1, 0, 64, -300, 300, &a, &fa, &b, &fb,
                                        &st),
                     PX_EINVAL);
}

static void test_illinois(void **state)
{
    (void)state;
    px_num_root_options o = {1e-15, 0, 0, 100};
    px_num_root_stats st;
    double x;
    int calls = 0;
    assert_int_equal(px_num_root_illinois(f_dottie, &calls, 0, -1, 1, 1 - cos(1.0), &o, &x, &st),
                     PX_OK);
    assert_close(x, 0.73908513321516064166, 1e-15, 0);
    assert_close(x - cos(x), 0, 0, 1e-15);
    assert_int_equal(st.evaluations, calls);
    assert_true(st.iterations < 20); /* superlinear (order ~1.44, Dowell and Jarratt 1971) */
    /* a residual test */
    px_num_root_options of = {0, 0, 1e-3, 100};
    assert_int_equal(px_num_root_illinois(f_dottie, NULL, 0, -1, 1, 1 - cos(1.0), &of, &x, &st),
                     PX_OK);
    assert_true(fabs(x - cos(x)) <= 1e-3);
    /* the caller's own test, by a positive status */
    assert_int_equal(px_num_root_illinois(f_done, NULL, 0, -1, 1, 1 - cos(1.0), &o, &x, &st), PX_OK);
    assert_int_equal(st.evaluations, 1);
    /* the caller's cap */
    o.max_iter = 3;
    assert_int_equal(px_num_root_illinois(f_dottie, NULL, 0, -1, 1, 1 - cos(1.0), &o, &x, &st),
                     PX_ENOCONV);
    assert_int_equal(st.iterations, 3);
    /* not a bracket */
    o.max_iter = 100;
    assert_int_equal(px_num_root_illinois(f_dottie, NULL, 0.8, 0.8 - cos(0.8), 1, 1 - cos(1.0), &o,
                                          &x, &st),
                     PX_EINVAL);
    assert_int_equal(st.evaluations, 0);
}

int main(void)
{
    const struct CMUnitTest tests[] = {
        cmocka_unit_test(test_lu_table),    cmocka_unit_test(test_lu_permutation),
        cmocka_unit_test(test_lu_hilbert),  cmocka_unit_test(test_lu_nonfinite_and_args),
        cmocka_unit_test(test_bisect),      cmocka_unit_test(test_newton),
        cmocka_unit_test(test_search),      cmocka_unit_test(test_illinois),
    };
    return cmocka_run_group_tests(tests, NULL, NULL);
}
