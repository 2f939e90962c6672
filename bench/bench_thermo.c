/* bench_thermo.c - speed of standard Gibbs energies at a new (T, P).
 *
 * 1. A database of 200 species (179 HKF incl. H^+, 17 CP incl. H2(g), 3
 *    reaction-defined, H2O(l) and e-) is
 *    evaluated at 500 different (T, P) points with px_thermo_eval_all (one
 *    water solve per point, cached in the workspace) and with a plain
 *    reference that evaluates the water state for every species (what a
 *    straightforward implementation does).  Target: under 50 us per point.
 * 2. log K of H2O(l) = H^+ + OH^- at 10,000 temperatures (0-350 C, default
 *    pressure), with the workspace and with the plain reference.
 * The HKF parameters are the OH^-, Na^+, Cl^-, ... sets of SH88 (as in
 * tests/reference/hkf), repeated under made-up formula texts: only the
 * arithmetic matters here.  Both methods must give the same numbers. */
#include <math.h>
#include <stdio.h>
#include <string.h>
#include <time.h>

#include "core/constants.h"
#include "core/status.h"
#include "thermo/thermo.h"

static double now(void)
{
    struct timespec ts;
    timespec_get(&ts, TIME_UTC); /* C11 */
    return ts.tv_sec + 1e-9 * ts.tv_nsec;
}

/* a few SH88 parameter sets (cal, printed scaling): dG, S, a1..a4, c1, c2, omega, Z */
static const double sets[][10] = {
    {-37595, -2.56, 1.2527, 0.0738, 1.8423, -2.7821, 4.15, -10.346, 1.7246, -1},  /* OH- */
    {-62591, 13.96, 1.839, -2.285, 3.256, -2.726, 18.18, -2.981, 0.3306, 1},      /* Na+ */
    {-31379, 13.56, 4.032, 4.801, 5.563, -2.847, -4.40, -5.714, 1.456, -1},       /* Cl- */
    {-108505, -33.0, -0.8217, -8.599, 8.390, -2.390, 20.80, -5.892, 1.5372, 2},   /* Mg2+ */
    {-177930, 4.50, 8.3014, -1.9846, -6.2122, -2.697, 1.64, -17.998, 3.1463, -2}, /* SO4 2- */
    {-92250, 28.1, 6.2466, 7.4698, 2.8, -3.0879, 40.0, 8.8, -0.02, 0},            /* CO2(aq) */
};

static void hkf_from_set(px_species *s, const double *v)
{
    s->model = PX_MODEL_HKF;
    s->dGf = v[0] * PX_CAL;
    s->dHf = NAN;
    s->S = v[1] * PX_CAL;
    s->hkf.a1 = v[2] * 0.1 * PX_CAL;
    s->hkf.a2 = v[3] * 1e2 * PX_CAL;
    s->hkf.a3 = v[4] * PX_CAL;
    s->hkf.a4 = v[5] * 1e4 * PX_CAL;
    s->hkf.c1 = v[6] * PX_CAL;
    s->hkf.c2 = v[7] * 1e4 * PX_CAL;
    s->hkf.omega = v[8] * 1e5 * PX_CAL;
}

static int charge_suffix(char *buf, size_t n, int z)
{
    if (z == 0)
        return snprintf(buf, n, "(aq)");
    int m = z > 0 ? z : -z;
    if (m == 1)
        return snprintf(buf, n, "^%c", z > 0 ? '+' : '-');
    return snprintf(buf, n, "^%d%c", m, z > 0 ? '+' : '-');
}

static px_db *build_db(void)
{
    px_db *db = px_db_new();
    px_db_add_builtins(db);
    px_species s;
    px_species_init(&s);
    s.source = (char *)"benchmark";
    /* H^+, OH^-, H2(g) under their real names for the log K benchmark */
    strcpy(s.f.text, "H^+");
    s.model = PX_MODEL_HKF;
    s.dGf = 0;
    s.S = 0;
    px_db_add(db, &s);
    strcpy(s.f.text, "OH^-");
    hkf_from_set(&s, sets[0]);
    px_db_add(db, &s);
    px_species_init(&s);
    s.source = (char *)"benchmark";
    strcpy(s.f.text, "H2(g)");
    s.model = PX_MODEL_CP;
    s.dGf = 0;
    s.dHf = 0;
    s.S = 130.684;
    s.cp.a = 27.28;
    s.cp.b = 3.2635e-3;
    s.cp.c = 0.50208e5;
    px_db_add(db, &s);
    for (int i = 0; (int)px_db_count(db) < 181; i++) { /* HKF, made-up texts */
        const double *v = sets[i % 6];
        px_species_init(&s);
        s.source = (char *)"benchmark";
        char q[16];
        charge_suffix(q, sizeof q, (int)v[9]);
        snprintf(s.f.text, sizeof s.f.text, "C%dH%dO%d%s", i + 1, i + 2, i % 7 + 1, q);
        hkf_from_set(&s, v);
        px_db_add(db, &s);
    }
    for (int i = 0; i < 15; i++) { /* CP solids */
        px_species_init(&s);
        s.source = (char *)"benchmark";
        snprintf(s.f.text, sizeof s.f.text, "Si%dO%d(s)", i + 1, 2 * i + 2);
        s.model = PX_MODEL_CP;
        s.dGf = -856.3e3 * (i + 1);
        s.dHf = -910.7e3 * (i + 1);
        s.S = 41.46 * (i + 1);
        s.cp.a = 46.9 * (i + 1);
        s.cp.b = 34.3e-3;
        s.cp.c = -11.3e5;
        s.cp.V = 2.269;
        px_db_add(db, &s);
    }
    for (int i = 0; i < 3; i++) { /* reaction-defined */
        px_species_init(&s);
        s.source = (char *)"benchmark";
        s.model = PX_MODEL_LOGK;
        int j = 6 * i; /* HKF species j has the OH^- set, charge -1 */
        snprintf(s.f.text, sizeof s.f.text, "C%dH%dO%dNa(aq)", j + 1, j + 2, j % 7 + 1);
        snprintf(s.logk.reaction, sizeof s.logk.reaction, "C%dH%dO%d^- + Na^+ = %s", j + 1,
                 j + 2, j % 7 + 1, s.f.text);
        s.logk.logK25 = 0.5;
        s.logk.dH = 4000;
        px_db_add(db, &s);
    }
    /* Na^+ for the reactions above */
    px_species_init(&s);
    s.source = (char *)"benchmark";
    strcpy(s.f.text, "Na^+");
    hkf_from_set(&s, sets[1]);
    px_db_add(db, &s);
    /* fill to exactly 200 with CP gases */
    for (int i = 0; (int)px_db_count(db) < 200; i++) {
        px_species_init(&s);
        s.source = (char *)"benchmark";
        snprintf(s.f.text, sizeof s.f.text, "N%dO%d(g)", i + 1, i + 3);
        s.model = PX_MODEL_CP;
        s.dGf = 1000.0 * i;
        s.S = 200;
        s.cp.a = 30;
        px_db_add(db, &s);
    }
    return db;
}

/* the plain reference: a water solve for every species that needs one */
static int plain_G(const px_db *db, px_thermo_ws *scratch, const px_species *sp, double T,
                   double P, double *G)
{
    if (sp->model == PX_MODEL_HKF) {
        px_water_state w, wr;
        int st = px_water_state_eval(T, P, PX_DIELECTRIC_R8_97, &w);
        if (!st)
            st = px_water_state_eval(PX_TR, PX_PR, PX_DIELECTRIC_R8_97, &wr);
        if (!st)
            st = px_hkf_G(&sp->hkf, sp->f.charge, sp->dGf, sp->S, &w, &wr, G);
        return st;
    }
    if (sp->model == PX_MODEL_WATER || sp->model == PX_MODEL_LOGK ||
        sp->f.state == PX_STATE_E) {
        /* fresh workspace: no cache carried between species */
        px_thermo_ws *ws = px_thermo_ws_new(PX_DIELECTRIC_R8_97);
        int st = px_thermo_species_G(ws, db, sp, T, P, G);
        px_thermo_ws_free(ws);
        return st;
    }
    (void)scratch;
    px_thermo_props p;
    int st = px_cp_props(sp, T, P, &p);
    *G = p.G;
    return st;
}

int main(void)
{
    px_db *db = build_db();
    size_t n = px_db_count(db);
    if (n != 200) {
        fprintf(stderr, "bench_thermo: database has %zu species\n", n);
        return 1;
    }
    px_thermo_ws *ws = px_thermo_ws_new(PX_DIELECTRIC_R8_97);
    double G[200], Gp[200];
    const int npts = 500;
    double maxdiff = 0;
    /* warm up the reference state */
    px_thermo_eval_all(ws, db, 300, 10, G);

    /* the machine is shared: best of 5 rounds */
    double t_cached = 1e30, t_water = 1e30, t0;
    for (int round = 0; round < 5; round++) {
        t0 = now();
        for (int k = 0; k < npts; k++) {
            double T = 280 + 300.0 * k / npts + 0.01 * round, P = 100 + 0.5 * k;
            if (px_thermo_eval_all(ws, db, T, P, G)) {
                fprintf(stderr, "eval_all: %s\n", px_thermo_ws_error(ws));
                return 1;
            }
        }
        double t = (now() - t0) / npts;
        t_cached = t < t_cached ? t : t_cached;
        t0 = now();
        for (int k = 0; k < npts; k++) { /* the water solve alone */
            px_water_state w;
            double T = 280 + 300.0 * k / npts + 0.01 * round, P = 100 + 0.5 * k;
            if (px_water_state_eval(T, P, PX_DIELECTRIC_R8_97, &w))
                return 1;
        }
        t = (now() - t0) / npts;
        t_water = t < t_water ? t : t_water;
    }

    t0 = now();
    for (int k = 0; k < npts; k += 5) {
        double T = 280 + 300.0 * k / npts, P = 100 + 0.5 * k;
        for (size_t i = 0; i < n; i++)
            if (plain_G(db, ws, px_db_get(db, i), T, P, &Gp[i]))
                return 1;
    }
    double t_plain = (now() - t0) / (npts / 5);
    for (int k = 0; k < npts; k += 50) { /* same numbers */
        double T = 280 + 300.0 * k / npts, P = 100 + 0.5 * k;
        px_thermo_eval_all(ws, db, T, P, G);
        for (size_t i = 0; i < n; i++) {
            plain_G(db, ws, px_db_get(db, i), T, P, &Gp[i]);
            double d = fabs(G[i] - Gp[i]);
            if (d > maxdiff)
                maxdiff = d;
        }
    }
    printf("200 species at a new (T,P): cached workspace %.2f us (of which the water solve "
           "%.2f us), plain %.2f us, ratio %.1f (target < 50 us); max |dG| %.3g J/mol\n",
           1e6 * t_cached, 1e6 * t_water, 1e6 * t_plain, t_plain / t_cached, maxdiff);

    /* log K at 10,000 temperatures */
    px_reaction r;
    char msg[128];
    if (px_reaction_parse_balanced("H2O(l) = H^+ + OH^-", &r, msg, sizeof msg))
        return 1;
    const int nT = 10000;
    double sum = 0;
    t0 = now();
    for (int k = 0; k < nT; k++) {
        double T = 273.15 + 350.0 * k / (nT - 1), P, lk;
        if (px_thermo_default_pressure(T, &P) || px_reaction_logK(ws, db, &r, T, P, &lk)) {
            fprintf(stderr, "logK at %g K: %s\n", T, px_thermo_ws_error(ws));
            return 1;
        }
        sum += lk;
    }
    double t_lk = now() - t0;
    double sum_plain = 0;
    t0 = now();
    for (int k = 0; k < nT; k++) {
        double T = 273.15 + 350.0 * k / (nT - 1), P, g = 0, gi;
        px_thermo_default_pressure(T, &P);
        for (int i = 0; i < r.n; i++) {
            if (plain_G(db, ws, px_db_find(db, r.sp[i].text), T, P, &gi))
                return 1;
            g += r.nu[i] * gi;
        }
        sum_plain += -g / (PX_R * T * PX_LN10);
    }
    double t_lk_plain = now() - t0;
    printf("log K of H2O(l) = H^+ + OH^- at %d temperatures (incl. psat): workspace %.1f ms "
           "(%.2f us each), plain %.1f ms, ratio %.1f; mean log K %.6f / %.6f\n",
           nT, 1e3 * t_lk, 1e6 * t_lk / nT, 1e3 * t_lk_plain, t_lk_plain / t_lk, sum / nT,
           sum_plain / nT);
    px_thermo_ws_free(ws);
    px_db_free(db);
    return maxdiff < 1e-6 && fabs(sum - sum_plain) < 1e-6 * nT ? 0 : 1;
}
