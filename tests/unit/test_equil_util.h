/* test_equil_util.h - helpers shared by the speciation-solver tests: a
 * small system builder that remembers the stoichiometry (so a test can
 * add species up to each component's total on its own), reference values
 * read through tests/support/px_csv.h, and the totals check run
 * after every solve. */
#ifndef TEST_EQUIL_UTIL_H
#define TEST_EQUIL_UTIL_H
#include "px_test.h"
#include "support/px_csv.h"
#include "equil/equil.h"
#include <stdarg.h>
#include <stdlib.h>
#include <string.h>

#define TB_MAXB 12
#define TB_MAXS 64
#define END (-1)

typedef struct tb {
    px_equil_system *s;
    px_equil_work *w;
    size_t nb, ns, n;
    double nu[TB_MAXS][TB_MAXB];
    double z[TB_MAXS];
    int phase[TB_MAXS];
} tb;

static inline void tb_init(tb *t, size_t nb, size_t ns)
{
    memset(t, 0, sizeof *t);
    assert_true(nb <= TB_MAXB && ns <= TB_MAXS);
    t->nb = nb;
    t->ns = ns;
    assert_int_equal(px_equil_system_create(&t->s, nb, ns, NULL), PX_OK);
}

static inline void tb_done(tb *t)
{
    px_equil_work_free(t->w);
    px_equil_system_free(t->s);
    t->w = NULL;
    t->s = NULL;
}

/* Adds the next species: log K of formation, charge, phase, ion size, then
 * (basis index, coefficient) pairs ending with END.  Basis species (the
 * first nb) take no pairs. */
static inline size_t tb_add(tb *t, double logk, double z, px_equil_phase ph, double size, ...)
{
    size_t j = t->n++;
    assert_true(j < t->ns);
    double *nu = t->nu[j];
    va_list ap;
    va_start(ap, size);
    for (;;) {
        int i = va_arg(ap, int);
        if (i < 0) break;
        double v = va_arg(ap, double);
        assert_true((size_t)i < t->nb);
        nu[i] += v;
    }
    va_end(ap);
    if (j < t->nb) nu[j] = 1.0;
    t->z[j] = z;
    t->phase[j] = (int)ph;
    px_equil_species d = {j < t->nb ? NULL : nu, logk, z, ph, size, 0};
    assert_int_equal(px_equil_system_set_species(t->s, j, &d), PX_OK);
    return j;
}

static inline int tb_solve(tb *t, const px_equil_options *o)
{
    if (!t->w) assert_int_equal(px_equil_work_create(&t->w, t->s, NULL), PX_OK);
    return px_equil_solve(t->s, t->w, o);
}

static inline px_equil_species_result tb_sp(const tb *t, size_t j)
{
    px_equil_species_result r;
    assert_int_equal(px_equil_work_get_species(t->w, j, &r), PX_OK);
    return r;
}

static inline double tb_ph(const tb *t, size_t h)
{
    return -tb_sp(t, h).log_activity;
}

/* Sum of nu * m (+ nu * n for solids) over species for component i, as the
 * test computes it itself, with the sum of absolute terms for scale. */
static inline double tb_sum(const tb *t, size_t i, double *scale)
{
    double sum = 0.0, sc = 0.0;
    for (size_t j = 0; j < t->n; j++) {
        px_equil_species_result r = tb_sp(t, j);
        double q = t->phase[j] == PX_EQUIL_AQ ? r.molality
                   : t->phase[j] == PX_EQUIL_SOLID ? r.amount : 0.0;
        sum += t->nu[j][i] * q;
        sc += fabs(t->nu[j][i] * q);
    }
    if (scale) *scale = sc;
    return sum;
}

/* Species add up to each component's total to 1e-10 relative (the project's
 * requirement; the solver's own tolerance is 1e-12); every output finite;
 * charge balance closes where it was asked for. */
static inline void tb_check(const tb *t)
{
    for (size_t i = 0; i < t->nb; i++) {
        px_equil_component_result c;
        assert_int_equal(px_equil_work_get_component(t->w, i, &c), PX_OK);
        if (c.kind == PX_EQUIL_C_TOTAL) {
            double sc, sum = tb_sum(t, i, &sc);
            double ref = fmax(fabs(c.total_given), sc);
            if (!(fabs(sum - c.total_given) <= 1e-10 * ref)) {
                print_error("component %zu: species add up to %.15g, total %.15g\n", i, sum,
                            c.total_given);
                fail();
            }
            assert_close(c.total_aq + c.total_solid, c.total_given, 1e-10, 1e-10 * ref);
        }
        if (c.kind == PX_EQUIL_C_CHARGE) {
            double q = 0.0, qs = 0.0;
            for (size_t j = 0; j < t->n; j++) {
                if (t->phase[j] != PX_EQUIL_AQ) continue;
                double m = tb_sp(t, j).molality;
                q += t->z[j] * m;
                qs += fabs(t->z[j] * m);
            }
            assert_true(fabs(q) <= 1e-10 * qs);
        }
    }
    for (size_t j = 0; j < t->n; j++) {
        px_equil_species_result r = tb_sp(t, j);
        assert_true(isfinite(r.molality) && isfinite(r.log_molality) && isfinite(r.log_gamma) &&
                    isfinite(r.log_activity) && isfinite(r.si) && isfinite(r.amount));
    }
}

/* --- reference values (tests/support/px_csv.h) -------------------------- */

/* log10 K of a reaction: px_ref_logk (tests/support/px_csv.h). */

/* The first row of a reference file that `pick` accepts, column `valcol`. */
static inline double ref_pick(const char *file, const char *valcol,
                              int (*pick)(const px_csv_row *hdr, const px_csv_row *r,
                                          const void *key),
                              const void *key)
{
    FILE *fp = px_ref_open(file);
    px_csv_row hdr, r;
    double v = NAN;
    assert_true(px_csv_next(fp, &hdr));
    int cv = px_csv_col(&hdr, valcol);
    while (px_csv_next(fp, &r))
        if (r.n > cv && pick(&hdr, &r, key)) {
            v = strtod(r.f[cv], NULL);
            break;
        }
    fclose(fp);
    if (!isfinite(v)) print_error("no matching row in %s\n", file);
    assert_true(isfinite(v));
    return v;
}

typedef struct water_key {
    const char *group, *quantity;
    double t_c;
} water_key;

static inline int pick_water(const px_csv_row *hdr, const px_csv_row *r, const void *key)
{
    const water_key *k = key;
    int cg = px_csv_col(hdr, "group"), ct = px_csv_col(hdr, "t_C"), cq = px_csv_col(hdr, "quantity");
    return r->n > cq && strcmp(r->f[cg], k->group) == 0 &&
           fabs(strtod(r->f[ct], NULL) - k->t_c) < 1e-9 && strcmp(r->f[cq], k->quantity) == 0;
}

/* A value of water.csv: group, t_C and quantity select the row. */
static inline double ref_water(const char *group, double t_c, const char *quantity)
{
    water_key k = {group, quantity, t_c};
    return ref_pick("water.csv", "value", pick_water, &k);
}

static inline int pick_dh(const px_csv_row *hdr, const px_csv_row *r, const void *key)
{
    int ct = px_csv_col(hdr, "t_C"), cs = px_csv_col(hdr, "source");
    return r->n > cs && fabs(strtod(r->f[ct], NULL) - *(const double *)key) < 1e-9 &&
           strncmp(r->f[cs], "computed here: A, B", 19) == 0;
}

/* Debye-Hueckel A (log10, kg^0.5 mol^-0.5) of debye_huckel.csv, the row
 * computed from IAPWS at saturation ("computed here: A, B ..."). */
static inline double ref_dh_a(double t_c)
{
    return ref_pick("debye_huckel.csv", "A_log10_kg05_mol-05", pick_dh, &t_c);
}

#endif
