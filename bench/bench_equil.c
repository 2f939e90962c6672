/* bench_equil.c - speed of the speciation solver on an Fe-S-C-Cl-Na-H2O
 * system of 41 species with two possible solids (siderite, ferrihydrite),
 * swept over a pH-pe grid at fixed totals: warm-started solves per second
 * (each point starts from its neighbour's solution) and cold-start solves per
 * second, compared in the same run with a plain reference solve of the same
 * equations (bench/ref_equil.py: SciPy's root finder, via /usr/bin/python3)
 * on a subset of the points; the report gives the speed ratio and the
 * largest difference between the two answers.
 *
 * DATA: values marked CSV come from tests/reference/log_k_25C.csv
 * (its source beside each); "memory" values are recalled with the source
 * named; values marked DEMO are INVENTED FOR THE BENCHMARK, NOT DATA: they
 * only give the system a realistic shape and must never be used for chemistry. */
#define _POSIX_C_SOURCE 200809L
#include "equil/equil.h"
#include <math.h>
#include <stdio.h>
#include <stdlib.h>
#include <string.h>
#include <time.h>

enum { W, H, E, FE, SO4, C, CL, NA, NB };
#define NS 41
#define NMAX NS

typedef struct spec {
    const char *name;
    double logk, z;
    px_equil_phase ph;
    double size;
    double nu[NB];
} spec;

/* log K(Fe3+/Fe2+) from E0 = 0.771 V (from memory of the CRC Handbook
 * electrochemical series): Fe2+ - e- = Fe3+, log K = -0.771/0.059159 */
#define LK_FE3 (-13.033)
#define LK_CO3 (-10.329) /* HCO3- = CO3 2- + H+, memory: Plummer & Busenberg 1982 */

static const spec species[NS] = {
    /* basis; ion sizes (Angstrom) from memory of Kielland 1937 */
    {"H2O", 0, 0, PX_EQUIL_WATER, 0, {0}},
    {"H+", 0, 1, PX_EQUIL_AQ, 9.0, {0}},
    {"e-", 0, -1, PX_EQUIL_ELECTRON, 0, {0}},
    {"Fe2+", 0, 2, PX_EQUIL_AQ, 6.0, {0}},
    {"SO4-2", 0, -2, PX_EQUIL_AQ, 4.0, {0}},
    {"HCO3-", 0, -1, PX_EQUIL_AQ, 4.0, {0}},
    {"Cl-", 0, -1, PX_EQUIL_AQ, 3.0, {0}},
    {"Na+", 0, 1, PX_EQUIL_AQ, 4.0, {0}},
    /* acid-base */
    {"OH-", -13.995, -1, PX_EQUIL_AQ, 3.5, {[W] = 1, [H] = -1}},               /* CSV */
    {"CO2(aq)", 6.352, 0, PX_EQUIL_AQ, 0, {[C] = 1, [H] = 1, [W] = -1}},       /* CSV */
    {"CO3-2", LK_CO3, -2, PX_EQUIL_AQ, 4.5, {[C] = 1, [H] = -1}},              /* memory */
    {"HSO4-", 1.988, -1, PX_EQUIL_AQ, 4.0, {[SO4] = 1, [H] = 1}},              /* memory: Nordstrom et al. 1990 */
    /* sulfide from sulfate: SO4 2- + 10 H+ + 8 e- = H2S + 4 H2O */
    {"H2S(aq)", 41.0, 0, PX_EQUIL_AQ, 0, {[SO4] = 1, [H] = 10, [E] = 8, [W] = -4}}, /* DEMO */
    {"HS-", 41.0 - 6.99, -1, PX_EQUIL_AQ, 3.5, {[SO4] = 1, [H] = 9, [E] = 8, [W] = -4}}, /* DEMO + CSV pKa */
    {"S-2", 41.0 - 6.99 - 17.0, -2, PX_EQUIL_AQ, 5.0, {[SO4] = 1, [H] = 8, [E] = 8, [W] = -4}}, /* DEMO */
    /* iron(II) */
    {"FeOH+", -9.5, 1, PX_EQUIL_AQ, 4.0, {[FE] = 1, [W] = 1, [H] = -1}},       /* CSV */
    {"Fe(OH)2(aq)", -20.6, 0, PX_EQUIL_AQ, 0, {[FE] = 1, [W] = 2, [H] = -2}},  /* DEMO */
    {"Fe(OH)3-", -31.0, -1, PX_EQUIL_AQ, 4.0, {[FE] = 1, [W] = 3, [H] = -3}},  /* DEMO */
    {"FeCl+", 0.14, 1, PX_EQUIL_AQ, 4.0, {[FE] = 1, [CL] = 1}},                /* DEMO */
    {"FeSO4(aq)", 2.25, 0, PX_EQUIL_AQ, 0, {[FE] = 1, [SO4] = 1}},             /* DEMO */
    {"FeHCO3+", 2.0, 1, PX_EQUIL_AQ, 4.0, {[FE] = 1, [C] = 1}},                /* DEMO */
    {"FeCO3(aq)", 4.38 + LK_CO3, 0, PX_EQUIL_AQ, 0, {[FE] = 1, [C] = 1, [H] = -1}}, /* DEMO */
    {"FeHS+", 5.6 + 41.0 - 6.99, 1, PX_EQUIL_AQ, 4.0,
     {[FE] = 1, [SO4] = 1, [H] = 9, [E] = 8, [W] = -4}},                        /* DEMO */
    /* iron(III) */
    {"Fe3+", LK_FE3, 3, PX_EQUIL_AQ, 9.0, {[FE] = 1, [E] = -1}},               /* memory */
    {"FeOH2+", LK_FE3 - 2.19, 2, PX_EQUIL_AQ, 5.0, {[FE] = 1, [E] = -1, [W] = 1, [H] = -1}}, /* CSV */
    {"Fe(OH)2+", LK_FE3 - 5.67, 1, PX_EQUIL_AQ, 5.4, {[FE] = 1, [E] = -1, [W] = 2, [H] = -2}}, /* CSV */
    {"Fe(OH)3(aq)", LK_FE3 - 12.0, 0, PX_EQUIL_AQ, 0, {[FE] = 1, [E] = -1, [W] = 3, [H] = -3}}, /* DEMO */
    {"Fe(OH)4-", LK_FE3 - 21.6, -1, PX_EQUIL_AQ, 5.4, {[FE] = 1, [E] = -1, [W] = 4, [H] = -4}}, /* DEMO */
    {"Fe2(OH)2+4", 2 * LK_FE3 - 2.95, 4, PX_EQUIL_AQ, 5.5,
     {[FE] = 2, [E] = -2, [W] = 2, [H] = -2}},                                  /* CSV */
    {"FeCl^2+", LK_FE3 + 1.48, 2, PX_EQUIL_AQ, 5.0, {[FE] = 1, [E] = -1, [CL] = 1}}, /* CSV */
    {"FeCl2^+", LK_FE3 + 2.13, 1, PX_EQUIL_AQ, 5.0, {[FE] = 1, [E] = -1, [CL] = 2}}, /* DEMO */
    {"FeSO4+", LK_FE3 + 4.04, 1, PX_EQUIL_AQ, 5.0, {[FE] = 1, [E] = -1, [SO4] = 1}}, /* DEMO */
    /* sodium and chloride */
    {"NaCl(aq)", -0.5, 0, PX_EQUIL_AQ, 0, {[NA] = 1, [CL] = 1}},               /* DEMO */
    {"NaSO4-", 0.7, -1, PX_EQUIL_AQ, 5.4, {[NA] = 1, [SO4] = 1}},              /* DEMO */
    {"NaCO3-", 1.27 + LK_CO3, -1, PX_EQUIL_AQ, 5.4, {[NA] = 1, [C] = 1, [H] = -1}}, /* DEMO */
    {"NaHCO3(aq)", -0.25, 0, PX_EQUIL_AQ, 0, {[NA] = 1, [C] = 1}},             /* DEMO */
    {"HCl(aq)", -0.7, 0, PX_EQUIL_AQ, 0, {[H] = 1, [CL] = 1}},                 /* DEMO */
    /* dissolved gases: 2 H2O - 4 H+ - 4 e- = O2(aq); 2 H+ + 2 e- = H2(aq) */
    {"O2(aq)", -86.0, 0, PX_EQUIL_AQ, 0, {[W] = 2, [H] = -4, [E] = -4}},       /* DEMO */
    {"H2(aq)", -3.1, 0, PX_EQUIL_AQ, 0, {[H] = 2, [E] = 2}},                   /* DEMO */
    /* solids: siderite FeCO3 = Fe2+ + CO3 2-, log Ks = -10.68 (CSV);
     * ferrihydrite Fe(OH)3 + 3 H+ = Fe3+ + 3 H2O, log K 4.891 (CSV) */
    {"siderite", 10.68 + LK_CO3, 0, PX_EQUIL_SOLID, 0, {[FE] = 1, [C] = 1, [H] = -1}},
    {"ferrihydrite", LK_FE3 - 4.891, 0, PX_EQUIL_SOLID, 0, {[FE] = 1, [E] = -1, [W] = 3, [H] = -3}},
};

static const double totals[NB] = {[FE] = 1e-3, [SO4] = 1e-3, [C] = 5e-3, [CL] = 1e-2, [NA] = 1e-2};

/* CPU time of this process: the machine is shared, and "solves per second
 * on one core" is what the figure means. */
static double now(void)
{
    struct timespec ts;
    clock_gettime(CLOCK_PROCESS_CPUTIME_ID, &ts);
    return ts.tv_sec + 1e-9 * ts.tv_nsec;
}

static int build(px_equil_system **sys)
{
    int st = px_equil_system_create(sys, NB, NS, NULL);
    if (st) return st;
    for (size_t j = 0; j < NS; j++) {
        px_equil_species d = {j < NB ? NULL : species[j].nu, species[j].logk, species[j].z,
                              species[j].ph, species[j].size, 0};
        if ((st = px_equil_system_set_species(*sys, j, &d))) return st;
    }
    for (size_t i = FE; i < NB; i++) px_equil_system_set_total(*sys, i, totals[i]);
    px_equil_activity a = px_equil_activity_default();
    a.model = PX_EQUIL_DAVIES;
    a.A = 0.5098; /* debye_huckel.csv, 25 C */
    a.water = PX_EQUIL_WATER_IDEAL;
    return px_equil_system_set_activity(*sys, &a);
}

/* Grid point k of a serpentine walk over pH 2..12 (npH points) and pe
 * across the stability field of water: pe = -pH + f * 20.78, f = 0.05..0.95
 * (20.78 = log K of 2 H2O = O2(g) + 4 H+ + 4 e-, /4, from E0 = 1.229 V, from
 * memory of the CRC Handbook).  Outside it the fixed pe would demand
 * mol/kg amounts of dissolved H2 or O2. */
static void grid_point(int k, int npH, int npe, double *ph, double *pe)
{
    int r = k / npH, c = k % npH;
    if (r % 2) c = npH - 1 - c;
    *ph = 2.0 + 10.0 * c / (npH - 1);
    *pe = -*ph + 20.78 * (0.05 + 0.9 * (r % npe) / (npe - 1));
}

int main(int argc, char **argv)
{
    (void)argc;
    (void)argv;
    px_equil_system *sys = NULL;
    px_equil_work *w = NULL;
    if (build(&sys) || px_equil_work_create(&w, sys, NULL)) {
        fprintf(stderr, "bench_equil: cannot build the system\n");
        return 1;
    }
    const int npH = 201, npe = 221, npts = npH * npe;
    /* warm-started sweep, three times (the machine is shared: report the
     * best and the median run) */
    int fails = 0;
    size_t iters = 0, solid_pts = 0;
    double tr[3];
    for (int rep = 0; rep < 3; rep++) {
        fails = 0;
        iters = solid_pts = 0;
        px_equil_work_reset(w);
        double t0 = now();
        for (int k = 0; k < npts; k++) {
            double ph, pe;
            grid_point(k, npH, npe, &ph, &pe);
            px_equil_system_set_ph(sys, H, ph);
            px_equil_system_set_pe(sys, E, pe);
            if (px_equil_solve(sys, w, NULL) != PX_OK) fails++;
            px_equil_stats st;
            px_equil_work_get_stats(w, &st);
            iters += st.iterations;
            solid_pts += st.n_solids > 0;
        }
        tr[rep] = now() - t0;
    }
    double tmin = fmin(tr[0], fmin(tr[1], tr[2])), tmax = fmax(tr[0], fmax(tr[1], tr[2]));
    double tw = tr[0] + tr[1] + tr[2] - tmin - tmax; /* the median */
    double warm_rate = npts / tw;
    printf("bench_equil: %d species, %d basis, 2 possible solids, Davies, %d grid points\n", NS, NB,
           npts);
    printf("  (rates per CPU-second of one core)\n");
    printf("  warm-started: %.0f solves/s median of 3 runs, best %.0f (%.2f us/solve, %.2f Newton "
           "iterations/solve, %d failures, %zu points with a solid)\n",
           warm_rate, npts / tmin, 1e6 * tw / npts, (double)iters / npts, fails, solid_pts);
    /* cold starts on every 10th point */
    int ncold = 0, cfails = 0;
    iters = 0;
    double t0 = now();
    for (int k = 0; k < npts; k += 10, ncold++) {
        double ph, pe;
        grid_point(k, npH, npe, &ph, &pe);
        px_equil_system_set_ph(sys, H, ph);
        px_equil_system_set_pe(sys, E, pe);
        px_equil_work_reset(w);
        if (px_equil_solve(sys, w, NULL) != PX_OK) cfails++;
        px_equil_stats st;
        px_equil_work_get_stats(w, &st);
        iters += st.iterations;
    }
    double tc = now() - t0;
    printf("  cold start:   %.0f solves/s (%.2f us/solve, %.2f Newton iterations/solve, %d "
           "failures)\n",
           ncold / tc, 1e6 * tc / ncold, (double)iters / ncold, cfails);

    /* The C solver on exactly the reference's points (one pH row, warm-
     * started along it, as the reference is), CPU time like the reference's
     * process_time, repeated for a measurable time. */
    const int nref = 201, row_reps = 50;
    clock_t c_row = clock();
    for (int r = 0; r < row_reps; r++) {
        px_equil_work_reset(w);
        for (int k = 0; k < nref; k++) {
            double ph = 2.0 + 10.0 * k / (nref - 1), pe = 10.39 - ph;
            px_equil_system_set_ph(sys, H, ph);
            px_equil_system_set_pe(sys, E, pe);
            px_equil_solve(sys, w, NULL);
        }
    }
    double row_rate = (double)(row_reps * nref) / ((double)(clock() - c_row) / CLOCKS_PER_SEC);
    printf("  the reference's points (one pH row, warm-started): %.0f solves per CPU-second\n", row_rate);

    /* reference: the same equations solved by SciPy on a row of the grid */
    const char *py = "/usr/bin/python3";
    char script[1024];
    snprintf(script, sizeof script, "%s/bench/ref_equil.py", PHLOX_SOURCE_DIR);
    char jpath[] = "/tmp/bench_equil_XXXXXX";
    int fd = mkstemp(jpath);
    FILE *fp = fd >= 0 ? fdopen(fd, "w") : NULL;
    if (!fp) {
        printf("  reference: cannot write a temporary file; ratio not measured\n");
    } else {
        fprintf(fp, "{\"nb\": %d, \"A\": 0.5098, \"species\": [\n", NB);
        for (size_t j = 0; j < NS; j++) {
            fprintf(fp, " {\"logk\": %.17g, \"z\": %g, \"phase\": %d, \"nu\": [", species[j].logk,
                    species[j].z, (int)species[j].ph);
            for (int i = 0; i < NB; i++)
                fprintf(fp, "%s%g", i ? ", " : "", j < NB ? (double)(i == (int)j) : species[j].nu[i]);
            fprintf(fp, "]}%s\n", j + 1 < NS ? "," : "");
        }
        fprintf(fp, "], \"totals\": [");
        for (int i = 0; i < NB; i++) fprintf(fp, "%s%.17g", i ? ", " : "", totals[i]);
        fprintf(fp, "], \"points\": [\n");
        /* one pH row at pe 4, from the C solver, with its answers */
        px_equil_work_reset(w);
        for (int k = 0; k < nref; k++) {
            double ph = 2.0 + 10.0 * k / (nref - 1), pe = 10.39 - ph; /* mid-field */
            px_equil_system_set_ph(sys, H, ph);
            px_equil_system_set_pe(sys, E, pe);
            px_equil_solve(sys, w, NULL);
            fprintf(fp, " {\"ph\": %.17g, \"pe\": %.17g, \"la\": [", ph, pe);
            for (size_t j = 0; j < NS; j++) {
                px_equil_species_result r;
                px_equil_work_get_species(w, j, &r);
                fprintf(fp, "%s%.17g", j ? ", " : "", r.log_activity);
            }
            fprintf(fp, "], \"lm\": [");
            for (size_t j = 0; j < NS; j++) {
                px_equil_species_result r;
                px_equil_work_get_species(w, j, &r);
                fprintf(fp, "%s%.17g", j ? ", " : "", r.log_molality);
            }
            px_equil_stats st;
            px_equil_work_get_stats(w, &st);
            fprintf(fp, "], \"I\": %.17g, \"solids\": [", st.ionic_strength);
            int first = 1;
            for (size_t j = NB; j < NS; j++) {
                px_equil_species_result r;
                px_equil_work_get_species(w, j, &r);
                if (species[j].ph == PX_EQUIL_SOLID && r.amount > 0) {
                    fprintf(fp, "%s%zu", first ? "" : ", ", j);
                    first = 0;
                }
            }
            fprintf(fp, "]}%s\n", k + 1 < nref ? "," : "");
        }
        fprintf(fp, "]}\n");
        fclose(fp);
        char cmd[2300];
        snprintf(cmd, sizeof cmd, "%s %s %s check 2>&1", py, script, jpath);
        FILE *pc = popen(cmd, "r"); /* the analytic Jacobian against central differences */
        char cline[512];
        while (pc && fgets(cline, sizeof cline, pc)) printf("  reference says: %s", cline);
        if (pc) pclose(pc);
        snprintf(cmd, sizeof cmd, "%s %s %s 2>&1", py, script, jpath);
        FILE *pp = popen(cmd, "r");
        double ref_rate = 0.0, dev = -1.0;
        int nok = 0, nall = 0;
        char line[512];
        while (pp && fgets(line, sizeof line, pp)) {
            if (sscanf(line, "REF %lf %lf %d %d", &ref_rate, &dev, &nok, &nall) == 4) continue;
            printf("  reference says: %s", line);
        }
        int rc = pp ? pclose(pp) : -1;
        remove(jpath);
        if (rc != 0 || ref_rate <= 0.0) {
            printf("  reference: %s did not run (exit %d); ratio not measured\n", script, rc);
        } else {
            printf("  reference (SciPy root 'hybr', vectorised residual, analytic Jacobian, warm-started "
                   "along pH at pe = 10.39 - pH): %.0f solves/s, %d/%d converged, max |d log a| vs this "
                   "solver %.2e\n",
                   ref_rate, nok, nall, dev);
            printf("  ratio on the same points (this solver / reference): %.0fx (target 100x)\n",
                   row_rate / ref_rate);
            printf("  ratio whole grid warm-started (median) / reference: %.0fx\n", warm_rate / ref_rate);
        }
    }
    px_equil_work_free(w);
    px_equil_system_free(sys);
    return fails || cfails ? 1 : 0;
}
