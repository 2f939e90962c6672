/* bench_db.c - adding species to the database: 16,000 species added one by
 * one (the size of a large merged library), timed per thousand, against a
 * plain reference of the previous insertion (the whole hash index rebuilt
 * after every add: quadratic) over the same formulas in the same run.
 * Prints the times and the ratio; never fails on time. */
#define _POSIX_C_SOURCE 200809L
#include "core/status.h"
#include "thermo/thermo.h"
#include <math.h>
#include <stdio.h>
#include <stdlib.h>
#include <string.h>
#include <time.h>

#define N_SPECIES 16000
#define FORMULA_LEN 48

static double now(void)
{
    struct timespec t;
    clock_gettime(CLOCK_MONOTONIC, &t);
    return (double)t.tv_sec + 1e-9 * (double)t.tv_nsec;
}

/* distinct valid formulas: alkanes C(n)H(2n+2), aqueous */
static void formula(int i, char *buf)
{
    snprintf(buf, FORMULA_LEN, "C%dH%d(aq)", i + 1, 2 * (i + 1) + 2);
}

static unsigned long fnv1a(const char *s)
{
    unsigned long h = 2166136261ul; /* FNV-1a 32-bit offset basis */
    for (; *s; s++) h = (h ^ (unsigned char)*s) * 16777619ul; /* FNV prime */
    return h;
}

/* The reference: a string table whose open-addressing index is rebuilt from
 * scratch after each insertion, as px_db_add did before. */
static double reference(char (*names)[FORMULA_LEN], int n)
{
    long *hash = NULL;
    size_t hcap = 0;
    double t0 = now();
    for (int k = 1; k <= n; k++) {
        size_t want = 16;
        while (want < 2 * (size_t)k + 1) want *= 2;
        if (want != hcap) {
            free(hash);
            hash = malloc(want * sizeof *hash);
            if (!hash) return NAN;
            hcap = want;
        }
        for (size_t i = 0; i < hcap; i++) hash[i] = -1;
        for (int i = 0; i < k; i++) {
            size_t s = fnv1a(names[i]) & (hcap - 1);
            while (hash[s] >= 0) s = (s + 1) & (hcap - 1);
            hash[s] = i;
        }
    }
    double dt = now() - t0;
    free(hash);
    return dt;
}

int main(void)
{
    static char names[N_SPECIES][FORMULA_LEN];
    for (int i = 0; i < N_SPECIES; i++) formula(i, names[i]);
    px_db *db = px_db_new();
    if (!db) return 1;
    double t0 = now(), t_prev = t0;
    for (int i = 0; i < N_SPECIES; i++) {
        px_species sp;
        memset(&sp, 0, sizeof sp);
        if (px_formula_parse(names[i], &sp.f) != PX_OK) return 1;
        sp.model = PX_MODEL_LOGK;
        sp.dGf = sp.dHf = sp.S = NAN;
        sp.source = "bench (invented species, no data)";
        int st = px_db_add(db, &sp);
        if (st != PX_OK) {
            fprintf(stderr, "bench_db: add %s: %s\n", names[i], px_strerror(st));
            return 1;
        }
        if ((i + 1) % 4000 == 0) {
            double t = now();
            printf("  species %5d-%5d: %.2f us per add\n", i - 3998, i + 1, 1e6 * (t - t_prev) / 4000);
            t_prev = t;
        }
    }
    double t_db = now() - t0;
    double t_ref = reference(names, N_SPECIES);
    printf("adding %d species: px_db_add %.3f s (parse, copy and index), "
           "reference index rebuilt per add %.3f s (index only): %.0fx\n",
           N_SPECIES, t_db, t_ref, t_ref / t_db);
    px_db_free(db);
    return 0;
}
