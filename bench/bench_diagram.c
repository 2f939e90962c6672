/* bench_diagram.c - timing of exact and rigorous-grid predominance maps.
 *
 * 1. Exact map of 100 random but chemically shaped species (seeded: Phi with
 *    small integer nH, ne and atoms per formula), against a plain brute-force
 *    map of the same species: argmin of Phi at every node of a 500 x 500
 *    grid.  Target: under 2 ms per exact map.
 * 2. Rigorous grid map, 500 x 500 nodes, callback = argmin of Phi (cheap),
 *    against the same brute-force grid evaluation.
 * Prints figures and ratios; build with -DCMAKE_BUILD_TYPE=Release. */
#define _POSIX_C_SOURCE 200809L /* clock_gettime */
#include "core/constants.h"
#include "core/status.h"
#include "diagram/diagram.h"
#include <math.h>
#include <stdio.h>
#include <time.h>
#include "../tests/support/px_diagram_cases.h"

#define NSPECIES 100
#define NGRID 500
#define SEED 20261201ULL

static double now(void)
{
    struct timespec t;
    clock_gettime(CLOCK_MONOTONIC, &t);
    return (double)t.tv_sec + 1e-9 * (double)t.tv_nsec;
}

static px_rng rng;

static void make_species(px_diagram_species *sp, size_t m, unsigned long long seed)
{
    px_cases_shaped(&rng, sp, m, seed, 0);
}

/* Worst case: every species stable (tangent planes of a concave function,
 * tests/support/px_diagram_cases.h): all 100 fields exist. */
static void make_all_stable(px_diagram_species *sp, size_t m, unsigned long long seed)
{
    px_rng_seed(&rng, seed);
    px_cases_tangent(&rng, sp, m, 0);
}

typedef struct ctx {
    const px_diagram_species *sp;
    size_t m;
} ctx;

static int label(double x, double y, void *user, int *id)
{
    const ctx *c = user;
    *id = c->sp[px_diagram_species_argmin(c->sp, c->m, x, y)].id;
    return PX_OK;
}

/* the plain reference: argmin at every node */
static long brute(const px_diagram_species *sp, size_t m, const px_diagram_window *w, size_t n)
{
    long sum = 0;
    for (size_t j = 0; j < n; j++)
        for (size_t i = 0; i < n; i++) {
            double x = w->xmin + (w->xmax - w->xmin) * (double)i / (double)(n - 1);
            double y = w->ymin + (w->ymax - w->ymin) * (double)j / (double)(n - 1);
            sum += (long)px_diagram_species_argmin(sp, m, x, y);
        }
    return sum;
}

int main(void)
{
    px_diagram_species sp[NSPECIES];
    px_diagram_window w = {0.0, 14.0, -2.0, 2.0};
    ctx c = {sp, NSPECIES};

    /* 1. exact maps over 20 seeds, best and mean time per map */
    int reps = 50;
    double tmin = INFINITY, tsum = 0;
    size_t nf = 0, nmaps = 0;
    for (unsigned long long seed = SEED; seed < SEED + 20; seed++) {
        make_species(sp, NSPECIES, seed);
        for (int r = 0; r < reps; r++) {
            px_diagram_map *map = NULL;
            double t0 = now();
            int st = px_diagram_map_exact(&w, sp, NSPECIES, NULL, &map);
            double t = now() - t0;
            if (st != PX_OK) {
                printf("exact map failed: %s\n", px_strerror(st));
                return 1;
            }
            if (r == 0) nf += map->nfield;
            px_diagram_map_free(map);
            tmin = fmin(tmin, t);
            tsum += t;
            nmaps++;
        }
    }
    double texact = tsum / (double)nmaps;
    make_species(sp, NSPECIES, SEED);
    double t0 = now();
    long chk = 0;
    int breps = 5;
    for (int r = 0; r < breps; r++) chk += brute(sp, NSPECIES, &w, NGRID);
    double tbrute = (now() - t0) / breps;
    printf("exact map, %d species: mean %.3f ms, best %.3f ms per map (%zu maps, %.1f fields per map; target < 2 ms)\n",
           NSPECIES, 1e3 * texact, 1e3 * tmin, nmaps, (double)nf / 20.0);
    printf("brute-force argmin grid %dx%d, same species: %.3f ms (checksum %ld)\n", NGRID, NGRID,
           1e3 * tbrute, chk);
    printf("ratio brute-force grid / exact map: %.1f\n", tbrute / texact);

    /* 1b. worst case: all 100 species stable */
    double tall = INFINITY, tallsum = 0;
    size_t nall = 0;
    make_all_stable(sp, NSPECIES, SEED);
    for (int r = 0; r < reps; r++) {
        px_diagram_map *map = NULL;
        t0 = now();
        int st = px_diagram_map_exact(&w, sp, NSPECIES, NULL, &map);
        double t = now() - t0;
        if (st != PX_OK) {
            printf("exact map failed: %s\n", px_strerror(st));
            return 1;
        }
        nall = map->nfield;
        px_diagram_map_free(map);
        tall = fmin(tall, t);
        tallsum += t;
    }
    t0 = now();
    for (int r = 0; r < breps; r++) chk += brute(sp, NSPECIES, &w, NGRID);
    double tbrute2 = (now() - t0) / breps;
    printf("exact map, all species stable (%zu fields): mean %.3f ms, best %.3f ms per map\n", nall,
           1e3 * tallsum / reps, 1e3 * tall);
    printf("ratio brute-force grid / exact map (all stable): %.1f\n", tbrute2 / (tallsum / reps));
    make_species(sp, NSPECIES, SEED);

    /* 2. rigorous grid, 500 x 500, cheap callback */
    px_diagram_grid_options o = px_diagram_grid_options_default();
    o.nx = o.ny = NGRID;
    px_diagram_grid *g = NULL;
    int greps = 3;
    double tg = INFINITY;
    for (int r = 0; r < greps; r++) {
        t0 = now();
        int st = px_diagram_grid_map(&w, label, &c, &o, &g);
        double t = now() - t0;
        if (st != PX_OK) {
            printf("grid map failed: %s\n", px_strerror(st));
            return 1;
        }
        tg = fmin(tg, t);
        if (r + 1 < greps) {
            px_diagram_grid_free(g);
            g = NULL;
        }
    }
    printf("rigorous grid %dx%d (callback = argmin of %d): %.1f ms, %zu callback calls, %zu crossings, %zu polylines, %zu fields\n",
           NGRID, NGRID, NSPECIES, 1e3 * tg, g->ncalls, g->ncross, g->npoly, g->nfield);
    printf("ratio rigorous grid / brute-force grid: %.2f\n", tg / tbrute);
    px_diagram_grid_free(g);
    return 0;
}
