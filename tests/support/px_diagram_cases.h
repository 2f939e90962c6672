/* px_diagram_cases.h - seeded species sets for the map tests and
 * benchmarks (tests/unit/test_diagram_*.c, bench/bench_diagram.c), drawn
 * from px_rng.h so a failing case can be replayed.
 *   px_cases_shaped(r, sp, m, seed, id0)
 *       m species with Phi = c + p pH + q E shaped like chemistry: nH and
 *       ne small integers in -4..4 per 1..3 atoms, c within +-2e5 J/mol per
 *       atom; ids id0, id0 + 1, ...  Seeds r with px_rng_seed(seed).
 *   px_cases_tangent(r, sp, m, id0)
 *       m planes tangent to the concave f = -A (x - 7)^2 - B y^2 at random
 *       points of [0, 14] x [-2, 2]: each plane is lowest at its own point
 *       of tangency, so every species has a field (a Voronoi-like map).
 *       Draws from r as it is. */
#ifndef PX_TEST_DIAGRAM_CASES_H
#define PX_TEST_DIAGRAM_CASES_H
#include "core/constants.h"
#include "diagram/diagram.h"
#include "px_rng.h"
#include <stddef.h>

static inline void px_cases_shaped(px_rng *r, px_diagram_species *sp, size_t m,
                                   unsigned long long seed, int id0)
{
    px_rng_seed(r, seed);
    double s = PX_R * PX_TR * PX_LN10;
    for (size_t j = 0; j < m; j++) {
        int nH = (int)(px_rng_uniform(r) * 9) - 4, ne = (int)(px_rng_uniform(r) * 9) - 4,
            nu = 1 + (int)(px_rng_uniform(r) * 3);
        sp[j].c = (px_rng_uniform(r) - 0.5) * 4.0e5 / nu;
        sp[j].p = nH * s / nu;
        sp[j].q = ne * PX_F / nu;
        sp[j].id = id0 + (int)j;
        sp[j].label = NULL;
    }
}

static inline void px_cases_tangent(px_rng *r, px_diagram_species *sp, size_t m, int id0)
{
    const double A = 1e3, B = 1e5;
    for (size_t j = 0; j < m; j++) {
        double x0 = 14 * px_rng_uniform(r), y0 = -2 + 4 * px_rng_uniform(r);
        double f = -A * (x0 - 7) * (x0 - 7) - B * y0 * y0;
        double fx = -2 * A * (x0 - 7), fy = -2 * B * y0;
        sp[j].c = f - fx * x0 - fy * y0;
        sp[j].p = fx;
        sp[j].q = fy;
        sp[j].id = id0 + (int)j;
        sp[j].label = NULL;
    }
}

#endif
