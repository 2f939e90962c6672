/* test_equil_sweep.c - robustness of the speciation solver: 10,000 random
 * valid cases of a Na-Ca-Cl-C-S(VI)-H2O system with calcite and gypsum
 * (seeded generator, so every run solves the same cases), totals from
 * 1e-12 to 1 mol/kg (and exact zeros), pH 0-14 or charge balance, fixed
 * pCO2, every activity model, warm and cold starts.  Zero failures and zero
 * NaNs allowed; every solve's species must add up to its totals to 1e-10
 * relative (tb_check).  A separate executable so the main suite stays quick.
 *
 * "Valid": a fixed pCO2 is combined with charge balance (with a fixed pH
 * it can ask for 10^6 mol/kg of carbonate, which no solution holds). */
#include "test_equil_util.h"
#include "support/px_rng.h"

/* see test_equil.c for the sources of these constants */
#define LOGK_HCO3_CO3 (-10.329) /* from memory of Plummer and Busenberg 1982 */
#define LOGK_CAHCO3 1.106       /* from memory of Plummer and Busenberg 1982 */
#define LOGK_CASO4 2.30         /* from memory of Nordstrom et al. 1990 */
#define LOGK_HSO4 1.988         /* from memory of Nordstrom et al. 1990 */

enum { W, H, C, CA, NA, CL, SO4, NBASIS };

/* the shared seeded generator (tests/support/px_rng.h) */
static double uni(px_rng *r) { return px_rng_uniform(r); }

static void build(tb *t, size_t *co2g)
{
    double kw = px_ref_logk("H2O(l) = H^+ + OH^-");
    double k1 = px_ref_logk("CO2(aq) + H2O(l) = HCO3^- + H^+");
    double kh = px_ref_logk("CO2(g) = CO2(aq)");
    tb_init(t, NBASIS, 18);
    tb_add(t, 0, 0, PX_EQUIL_WATER, 0, END);
    tb_add(t, 0, 1, PX_EQUIL_AQ, 9.0, END);   /* H+; sizes from memory of Kielland 1937 */
    tb_add(t, 0, -1, PX_EQUIL_AQ, 4.0, END);  /* HCO3- */
    tb_add(t, 0, 2, PX_EQUIL_AQ, 6.0, END);   /* Ca2+ */
    tb_add(t, 0, 1, PX_EQUIL_AQ, 4.0, END);   /* Na+ */
    tb_add(t, 0, -1, PX_EQUIL_AQ, 3.0, END);  /* Cl- */
    tb_add(t, 0, -2, PX_EQUIL_AQ, 4.0, END);  /* SO4 2- */
    tb_add(t, kw, -1, PX_EQUIL_AQ, 3.5, W, 1.0, H, -1.0, END);
    tb_add(t, -k1, 0, PX_EQUIL_AQ, 0, C, 1.0, H, 1.0, W, -1.0, END);
    tb_add(t, LOGK_HCO3_CO3, -2, PX_EQUIL_AQ, 4.5, C, 1.0, H, -1.0, END);
    *co2g = tb_add(t, -k1 - kh, 0, PX_EQUIL_GAS, 0, C, 1.0, H, 1.0, W, -1.0, END);
    tb_add(t, px_ref_logk("Ca^2+ + CO3^2- = CaCO3(aq)") + LOGK_HCO3_CO3, 0, PX_EQUIL_AQ, 0, CA, 1.0,
           C, 1.0, H, -1.0, END);
    tb_add(t, LOGK_CAHCO3, 1, PX_EQUIL_AQ, 4.0, CA, 1.0, C, 1.0, END);
    tb_add(t, px_ref_logk("Ca^2+ + H2O(l) = CaOH^+ + H^+"), 1, PX_EQUIL_AQ, 4.0, CA, 1.0, W, 1.0, H,
           -1.0, END);
    tb_add(t, LOGK_CASO4, 0, PX_EQUIL_AQ, 0, CA, 1.0, SO4, 1.0, END);
    tb_add(t, LOGK_HSO4, -1, PX_EQUIL_AQ, 4.0, SO4, 1.0, H, 1.0, END);
    tb_add(t, -px_ref_logk("CaCO3(s,calcite) = Ca^2+ + CO3^2-") + LOGK_HCO3_CO3, 0, PX_EQUIL_SOLID, 0,
           CA, 1.0, C, 1.0, H, -1.0, END);
    tb_add(t, -px_ref_logk("CaSO4.2H2O(s,gypsum) = Ca^2+ + SO4^2- + 2 H2O(l)"), 0, PX_EQUIL_SOLID, 0,
           CA, 1.0, SO4, 1.0, W, 2.0, END);
    /* SIT pairs from the built-in table (by species index) */
    const struct { size_t a, b; const char *na, *nb; } pairs[] = {
        {NA, CL, "Na^+", "Cl^-"}, {H, CL, "H^+", "Cl^-"}, {NA, 7, "Na^+", "OH^-"},
        {CA, CL, "Ca^2+", "Cl^-"}, {NA, C, "Na^+", "HCO3^-"}, {NA, 9, "Na^+", "CO3^2-"},
        {NA, SO4, "Na^+", "SO4^2-"}};
    for (size_t k = 0; k < sizeof pairs / sizeof pairs[0]; k++) {
        double e;
        assert_int_equal(px_equil_sit_lookup(pairs[k].na, pairs[k].nb, &e), PX_OK);
        assert_int_equal(px_equil_system_set_sit(t->s, pairs[k].a, pairs[k].b, e), PX_OK);
    }
}

static double rand_total(px_rng *r)
{
    if (uni(r) < 0.05) return 0.0;
    return pow(10.0, -12.0 + 12.0 * uni(r));
}

static void test_random_cases(void **state)
{
    (void)state;
    tb t;
    size_t g;
    build(&t, &g);
    px_rng r;
    px_rng_set_state(&r, 0x9E3779B97F4A7C15ULL); /* the cases this test has always solved */
    const int ncase = 10000;
    int fails = 0;
    size_t iters = 0, restarts = 0, with_solid = 0;
    for (int k = 0; k < ncase; k++) {
        px_equil_activity a = px_equil_activity_default();
        a.model = (px_equil_model)(uni(&r) * 4.0);
        a.A = 0.5098;   /* debye_huckel.csv, 25 C */
        a.B = 0.3284;   /* debye_huckel.csv, 25 C */
        a.bdot = 0.041; /* from memory of Helgeson 1969 */
        a.water = uni(&r) < 0.5 ? PX_EQUIL_WATER_IDEAL : PX_EQUIL_WATER_UNITY;
        a.neutral = uni(&r) < 0.5 ? PX_EQUIL_NEUTRAL_SALTING : PX_EQUIL_NEUTRAL_UNITY;
        a.b_neutral = 0.1; /* common practice, no source */
        assert_int_equal(px_equil_system_set_activity(t.s, &a), PX_OK);
        px_equil_system_set_total(t.s, CA, rand_total(&r));
        px_equil_system_set_total(t.s, NA, rand_total(&r));
        px_equil_system_set_total(t.s, CL, rand_total(&r));
        px_equil_system_set_total(t.s, SO4, rand_total(&r));
        double u = uni(&r);
        if (u < 0.4) {
            px_equil_system_set_ph(t.s, H, 14.0 * uni(&r));
            px_equil_system_set_total(t.s, C, rand_total(&r));
        } else if (u < 0.7) {
            px_equil_system_set_charge_balance(t.s, H);
            px_equil_system_set_total(t.s, C, rand_total(&r));
        } else {
            px_equil_system_set_charge_balance(t.s, H);
            px_equil_system_set_fugacity(t.s, C, g, -5.0 + 5.0 * uni(&r));
        }
        if (uni(&r) < 0.5 && t.w) px_equil_work_reset(t.w);
#ifdef SWEEP_ONLY /* debugging aid: -DSWEEP_ONLY=k solves case k alone, cold */
        if (k != SWEEP_ONLY) continue;
        if (t.w) px_equil_work_reset(t.w);
        fprintf(stderr, "model %d water %d neutral %d u %.3f\n", a.model, a.water, a.neutral, u);
#endif
        int st = tb_solve(&t, NULL);
        if (st != PX_OK) {
            fails++;
            px_equil_stats s;
            px_equil_work_get_stats(t.w, &s);
            print_error("case %d: %s (fail kind %d index %zu, residual %.3g)\n", k,
                        px_strerror(st), s.fail_kind, s.fail_index, s.residual_norm);
            continue;
        }
        tb_check(&t);
        px_equil_stats s;
        px_equil_work_get_stats(t.w, &s);
        iters += s.iterations;
        restarts += s.restarts;
        with_solid += s.n_solids > 0;
    }
    print_message("%d cases: %d failures, %.2f iterations per solve, %zu cold restarts, %zu with "
                  "a solid\n",
                  ncase, fails, (double)iters / ncase, restarts, with_solid);
    assert_int_equal(fails, 0);
    tb_done(&t);
}

int main(void)
{
    const struct CMUnitTest tests[] = {cmocka_unit_test(test_random_cases)};
    return cmocka_run_group_tests(tests, NULL, NULL);
}
