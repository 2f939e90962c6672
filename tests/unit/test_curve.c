/* test_curve.c - the curve driver (src/equil/curve.h): an aluminium
 * fraction curve against pH whose Al^3+/AlOH^2+ crossing sits at -log *K1
 * of the reference table (Baes and Mesmer 1976, log_k_25C.csv), each point
 * equal to the bit to a single speciation at that pH (cold start); the
 * retry policy (the element's total times the factor at each failing try);
 * misuse; a visitor that stops; and every allocation failing in turn
 * (nothing leaks, the status is PX_ENOMEM). */
#include "px_test.h"
#include "support/px_alloc_fail.h"
#include "support/px_db_fixture.h"
#include "support/px_csv.h"
#include "core/status.h"
#include "data/data.h"
#include "equil/curve.h"
#include <math.h>
#include <stdlib.h>
#include <string.h>

#define NPTS 41


/* Built-ins, water and Al, shared by every test of the group. */
static int setup(void **state)
{
    static const char *const files[] = {"HO", "Al", NULL};
    static const int zs[] = {1, 8, 13};
    return px_db_fixture_new(state, px_test_db(files, zs, sizeof zs / sizeof zs[0]));
}

/* Al at 1e-9 mol/kg (no solid), ideal activities: textbook distribution
 * curves are drawn at infinite dilution (phlox.diagrams does the same). */
static px_spec_options al_options(void)
{
    px_spec_options o = px_spec_options_default();
    o.n_totals = 1;
    o.element[0] = "Al";
    o.total[0] = 1e-9;
    o.solids = 0;
    o.model = PX_EQUIL_IDEAL;
    o.ph_mode = PX_SPEC_PH_FIXED;
    return o;
}

/* share of species `name` of the element in a solved system (0 if none) */
static double share_of(const px_spec *s, const px_db *db, const char *name)
{
    for (size_t j = 0; j < s->n_species; j++)
        if (strcmp(px_db_get(db, (size_t)s->db_index[j])->f.text, name) == 0) {
            double v = px_spec_element_share(s, 0, j);
            return isnan(v) ? 0 : v;
        }
    return 0;
}

typedef struct seen {
    const px_db *db;
    size_t n, stop_at;
    double a[NPTS], b[NPTS]; /* shares of Al^3+ and AlOH^2+ */
    int status[NPTS], retries[NPTS];
    double total[NPTS];
    size_t iterations; /* Newton iterations of all points */
} seen;

static int record(void *ud, const px_curve_point *p)
{
    seen *v = ud;
    assert_true(p->i == v->n && p->i < NPTS);
    v->status[p->i] = p->status;
    v->retries[p->i] = p->retries;
    v->total[p->i] = p->total;
    if (p->status == PX_OK) {
        assert_non_null(p->spec);
        px_equil_stats stats;
        px_equil_work_get_stats(p->spec->work, &stats);
        v->iterations += stats.iterations;
        v->a[p->i] = share_of(p->spec, v->db, "Al^3+");
        v->b[p->i] = share_of(p->spec, v->db, "AlOH^2+");
    } else {
        assert_null(p->spec);
        assert_true(p->message != NULL);
    }
    v->n++;
    return v->stop_at && v->n == v->stop_at ? PX_ELIMIT : 0;
}

static void test_fraction_curve(void **state)
{
    const px_db_fixture *fx = *state;
    px_db *db = fx->db;
    px_thermo_ws *ws = fx->ws;
    px_spec_options o = al_options();
    double x[NPTS];
    for (int i = 0; i < NPTS; i++) x[i] = 3.0 + 4.0 * i / (NPTS - 1);
    px_curve c = {PX_CURVE_PH, NULL, x, NPTS, "Al", 0, 1, 0};
    seen v = {db, 0, 0, {0}, {0}, {0}, {0}, {0}, 0};
    size_t retried = 99;
    char msg[256];
    assert_int_equal(px_curve_run(ws, db, &o, &c, record, &v, &retried, msg, sizeof msg), PX_OK);
    assert_int_equal(v.n, NPTS);
    assert_int_equal(retried, 0);
    /* Al^3+ = AlOH^2+ where pH = -log *K1: log_k_25C.csv (Baes and Mesmer
     * 1976 as tabulated, high confidence: +-0.02, the reference README) */
    double k1 = px_ref_logk("Al^3+ + H2O(l) = AlOH^2+ + H^+");
    double cross = NAN;
    for (int i = 0; i + 1 < NPTS && isnan(cross); i++) {
        assert_int_equal(v.status[i], PX_OK);
        double r1 = log10(v.a[i] / v.b[i]), r2 = log10(v.a[i + 1] / v.b[i + 1]);
        if ((r1 >= 0) != (r2 >= 0)) cross = x[i] - r1 * (x[i + 1] - x[i]) / (r2 - r1);
    }
    assert_close(cross, -k1, 0, 0.02);
    /* a point of the curve is a single speciation at that pH, to the bit */
    for (int i = 0; i < NPTS; i += 10) {
        px_spec_options one = o;
        one.pH = x[i];
        px_spec *s;
        assert_int_equal(px_spec_build(ws, db, &one, &s, msg, sizeof msg), PX_OK);
        assert_int_equal(px_spec_solve(s, &one.solver, msg, sizeof msg), PX_OK);
        assert_true(share_of(s, db, "Al^3+") == v.a[i] && share_of(s, db, "AlOH^2+") == v.b[i]);
        px_spec_free(s);
    }
}

/* Warm starts, where they pay (1e-3 mol/kg Al with its solids, Davies
 * activities: each cold start searches the solid's active set again): the
 * same shares to the solver's tolerance (relative 1e-12 on balances,
 * px_equil_options_default; 1e-8 allowed on a share), fewer Newton
 * iterations than cold starts. */
static void test_warm_start(void **state)
{
    const px_db_fixture *fx = *state;
    px_db *db = fx->db;
    px_thermo_ws *ws = fx->ws;
    px_spec_options o = al_options();
    o.total[0] = 1e-3;
    o.solids = 1;
    o.model = PX_EQUIL_DAVIES;
    double x[NPTS];
    for (int i = 0; i < NPTS; i++) x[i] = 3.0 + 4.0 * i / (NPTS - 1);
    px_curve c = {PX_CURVE_PH, NULL, x, NPTS, "Al", 0, 1, 0};
    seen cold = {db, 0, 0, {0}, {0}, {0}, {0}, {0}, 0}, warm = cold;
    char msg[256];
    assert_int_equal(px_curve_run(ws, db, &o, &c, record, &cold, NULL, msg, sizeof msg), PX_OK);
    c.warm = 1;
    assert_int_equal(px_curve_run(ws, db, &o, &c, record, &warm, NULL, msg, sizeof msg), PX_OK);
    assert_int_equal(warm.n, NPTS);
    for (int i = 0; i < NPTS; i++) {
        assert_int_equal(warm.status[i], PX_OK);
        assert_close(warm.a[i], cold.a[i], 1e-8, 1e-15);
        assert_close(warm.b[i], cold.b[i], 1e-8, 1e-15);
    }
    assert_true(warm.iterations < cold.iterations);
}

/* Every try fails (1 mol/kg of Al with its solids, one iteration allowed
 * and a relative balance tolerance of 1e-20, below the rounding of a sum of
 * doubles (DBL_EPSILON = 2.2e-16), which no path reaches, the warm steps of
 * px_spec_solve's continuation in the totals included (at 1e-15 some tries
 * close through the solver's fallbacks), so that no try converges whatever
 * the element file's constants): each point is tried 1 + retries times,
 * the total multiplied by the factor after each failure, as
 * phlox.diagrams.solubility documents. */
static void test_retry_policy(void **state)
{
    const px_db_fixture *fx = *state;
    px_db *db = fx->db;
    px_thermo_ws *ws = fx->ws;
    px_spec_options o = al_options();
    o.total[0] = 1;
    o.solids = 1;
    o.solver.max_iter = 1;
    o.solver.epsabs = 1e-300;
    o.solver.epsrel = 1e-20;
    /* pH 6 included: at 1 mol/kg with the Al13 polymer of the Al data it
     * converges from a cold start only by the solver's last try (log I's
     * step apart) and the step-halving continuation (docs/solver.md) */
    double x[4] = {4, 5, 6, 7};
    px_curve c = {PX_CURVE_PH, NULL, x, 4, "Al", 3, 0.1, 0};
    seen v = {db, 0, 0, {0}, {0}, {0}, {0}, {0}, 0};
    size_t retried = 0;
    char msg[256];
    assert_int_equal(px_curve_run(ws, db, &o, &c, record, &v, &retried, msg, sizeof msg), PX_OK);
    assert_int_equal(v.n, 4);
    assert_int_equal(retried, 16);
    double put = 1;
    for (int k = 0; k < 4; k++) put *= 0.1;
    for (int i = 0; i < 4; i++) {
        assert_true(v.status[i] != PX_OK);
        assert_int_equal(v.retries[i], 4);
        assert_true(v.total[i] == put);
    }
    /* with enough iterations the first try holds: no retry */
    o.solver = px_equil_options_default();
    memset(&v, 0, sizeof v);
    v.db = db;
    assert_int_equal(px_curve_run(ws, db, &o, &c, record, &v, &retried, msg, sizeof msg), PX_OK);
    assert_int_equal(retried, 0);
    for (int i = 0; i < 4; i++) assert_true(v.status[i] == PX_OK && v.total[i] == 1);
}

static void test_misuse_and_stop(void **state)
{
    const px_db_fixture *fx = *state;
    px_db *db = fx->db;
    px_thermo_ws *ws = fx->ws;
    px_spec_options o = al_options();
    double x[3] = {4, 5, 6};
    char msg[256];
    seen v = {db, 0, 0, {0}, {0}, {0}, {0}, {0}, 0};
    px_curve c = {PX_CURVE_PH, NULL, x, 3, "Fe", 0, 1, 0};
    assert_int_equal(px_curve_run(ws, db, &o, &c, record, &v, NULL, msg, sizeof msg), PX_EINVAL);
    assert_non_null(strstr(msg, "Fe"));
    c.element = "Al";
    c.var = PX_CURVE_LOG_A;
    c.name = "Cl^-";
    assert_int_equal(px_curve_run(ws, db, &o, &c, record, &v, NULL, msg, sizeof msg), PX_EINVAL);
    assert_non_null(strstr(msg, "Cl^-"));
    c.var = PX_CURVE_LOG_TOTAL;
    c.name = "Na";
    assert_int_equal(px_curve_run(ws, db, &o, &c, record, &v, NULL, msg, sizeof msg), PX_EINVAL);
    assert_int_equal(v.n, 0);
    c.var = PX_CURVE_PH;
    v.stop_at = 2;
    assert_int_equal(px_curve_run(ws, db, &o, &c, record, &v, NULL, msg, sizeof msg), PX_ELIMIT);
    assert_int_equal(v.n, 2);
    /* a build failure (a species the database lacks) stops with its message */
    o.n_exclude = 1;
    o.exclude[0] = "Fe^2+";
    v.n = 0;
    v.stop_at = 0;
    assert_int_equal(px_curve_run(ws, db, &o, &c, record, &v, NULL, msg, sizeof msg), PX_ENOTFOUND);
    assert_non_null(strstr(msg, "Fe^2+"));
    assert_int_equal(v.n, 0);
}

/* --- allocation failures -------------------------------------------------- */

static void test_alloc_failure(void **state)
{
    const px_db_fixture *fx = *state;
    px_db *db = fx->db;
    px_thermo_ws *ws = fx->ws;
    double x[2] = {4, 6};
    px_curve c = {PX_CURVE_PH, NULL, x, 2, "Al", 1, 0.1, 1}; /* warm: the kept system is freed too */
    int succeeded = 0;
    for (long nth = 0; nth < 400 && !succeeded; nth++) {
        px_alloc_fail f;
        px_allocator al = px_alloc_fail_make(&f, nth);
        px_spec_options o = al_options();
        o.alloc = &al;
        seen v = {db, 0, 0, {0}, {0}, {0}, {0}, {0}, 0};
        char msg[256];
        int st = px_curve_run(ws, db, &o, &c, record, &v, NULL, msg, sizeof msg);
        assert_true(st == PX_OK || st == PX_ENOMEM);
        assert_int_equal(f.live, 0); /* every allocation released */
        if (st == PX_OK) { /* only when no allocation failed: a failure is never swallowed */
            assert_true(f.left >= 0);
            assert_int_equal(v.n, 2);
            succeeded = 1;
        }
    }
    assert_true(succeeded);
}

int main(void)
{
    const struct CMUnitTest tests[] = {
        cmocka_unit_test(test_fraction_curve),
        cmocka_unit_test(test_warm_start),
        cmocka_unit_test(test_retry_policy),
        cmocka_unit_test(test_misuse_and_stop),
        cmocka_unit_test(test_alloc_failure),
    };
    return cmocka_run_group_tests(tests, setup, px_db_fixture_free);
}
