/* bench_rmap.c - rigorous predominance map (the speciation solver at every
 * node of a pH-E grid, with a ligand): a 501 x 501 Cu-Cl map at 25 C on one
 * and on two threads, against a plain brute-force evaluation of the same
 * map (a cold solve at every node, no warm start, no boundary tracing) on a
 * coarser grid, compared per node.  Targets (issue: rigorous maps): under
 * 3 s on one core, faster on two.  Prints its figures; never fails on time. */
#define _POSIX_C_SOURCE 200809L
#include "core/status.h"
#include "data/data.h"
#include "diagram/rmap.h"
#include <stdio.h>
#include <stdlib.h>
#include <time.h>

static double now(void)
{
    struct timespec t;
    clock_gettime(CLOCK_MONOTONIC, &t);
    return (double)t.tv_sec + 1e-9 * (double)t.tv_nsec;
}

int main(void)
{
    px_db *db = px_db_new();
    px_thermo_ws *ws = px_thermo_ws_new(PX_DIELECTRIC_R8_97);
    if (!db || !ws || px_db_add_builtins(db) != PX_OK) return 1;
    static const int zs[] = {1, 8, 29, 17}; /* H O Cu Cl */
    px_data_options dopt = px_data_options_default();
    dopt.elements = zs;
    dopt.n_elements = 4;
    const char *files[] = {"HO", "Cu", "Cl"};
    for (int i = 0; i < 3; i++)
        if (px_data_load_embedded(db, files[i], &dopt, NULL) != PX_OK) {
            fprintf(stderr, "bench_rmap: cannot load %s\n", files[i]);
            return 1;
        }
    px_rmap_options o = px_rmap_options_default();
    o.ligand = "Cl";
    o.ligand_total = 1e-2;
    o.grid.nx = o.grid.ny = 501;
    char msg[256];
    double t_one = 0;
    for (int threads = 1; threads <= 2; threads++) {
        o.threads = threads;
        px_diagram_grid *g;
        px_rmap_stats st;
        double t0 = now();
        int s = px_rmap_build(ws, db, "Cu", &o, &g, &st, msg, sizeof msg);
        double dt = now() - t0;
        if (s != PX_OK) {
            fprintf(stderr, "bench_rmap: %s\n", msg);
            return 1;
        }
        if (threads == 1) t_one = dt;
        printf("rigorous Cu-Cl map 501 x 501, %d thread(s): %.3f s wall, %zu solves (%.2f us each), "
               "%zu failures, %zu boundary polylines%s\n",
               threads, dt, st.solves, 1e6 * dt / (double)st.solves, st.failures, g->npoly,
               threads > 1 ? "" : "  [target < 3 s]");
        if (threads > 1) printf("  speed-up on %d threads: %.2fx\n", threads, t_one / dt);
        px_diagram_grid_free(g);
    }
    /* brute force: cold solve at every node of a 101 x 101 grid */
    px_spec_options so = px_spec_options_default();
    so.element[0] = "Cu";
    so.total[0] = o.total;
    so.element[1] = "Cl";
    so.total[1] = o.ligand_total;
    so.n_totals = 2;
    so.ph_mode = PX_SPEC_PH_FIXED;
    so.redox_mode = PX_SPEC_REDOX_E;
    so.exclude[0] = "O2(aq)";
    so.exclude[1] = "H2(aq)";
    so.exclude[2] = "H2O2(aq)";
    so.n_exclude = 3;
    px_spec *sp;
    if (px_spec_build(ws, db, &so, &sp, msg, sizeof msg) != PX_OK) return 1;
    const size_t n = 101;
    size_t fails = 0;
    double t0 = now();
    for (size_t j = 0; j < n; j++)
        for (size_t i = 0; i < n; i++) {
            px_equil_system_set_ph(sp->sys, 1, 14.0 * (double)i / (double)(n - 1));
            px_equil_system_set_eh(sp->sys, 2, -2.0 + 4.0 * (double)j / (double)(n - 1), o.T);
            px_equil_work_reset(sp->work);
            if (px_equil_solve(sp->sys, sp->work, NULL) != PX_OK) fails++;
        }
    double per = (now() - t0) / (double)(n * n);
    printf("plain brute force (cold solve per node, no tracing), 101 x 101: %.2f us per node, %zu failures\n",
           1e6 * per, fails);
    printf("  brute force extrapolated to 501 x 501: %.2f s; rigorous map on one thread is %.1fx faster\n",
           per * 501.0 * 501.0, per * 501.0 * 501.0 / t_one);
    px_spec_free(sp);
    px_thermo_ws_free(ws);
    px_db_free(db);
    return 0;
}
