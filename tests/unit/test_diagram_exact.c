/* test_diagram_exact.c - exact predominance maps (src/diagram/exact.c).
 *
 * Geometry: random (seeded) species sets must tile the window (areas sum to
 * the window area), each point must lie in the field of the species with
 * the lowest Phi there (checked against a plain argmin), triple points must
 * be shared by every field that touches them, and every boundary must
 * separate exactly the two fields it names.  Chemistry: Nernst boundaries
 * for Zn and Fe couples from tests/reference/standard_potentials.csv,
 * checked against the textbook Nernst arithmetic and slopes.  Degenerate
 * inputs: duplicates, species never stable, coincident and parallel
 * boundaries, NaN/Inf, failing allocations. */
#include "px_test.h"
#include "support/px_csv.h"
#include "support/px_alloc_fail.h"
#include "support/px_diagram_cases.h"
#include "support/px_plane.h"
#include "geom/geom.h"
#include "core/constants.h"
#include "core/status.h"
#include "diagram/diagram.h"
#include "diagram/potential.h"
#include <stdlib.h>
#include <string.h>

/* ---------------------------------------------------------------- helpers */

static px_rng rng;
static double urand(void) { return px_rng_uniform(&rng); }

/* Phi for a random but chemically shaped species: nH, ne, nu small integers */
static void random_species(px_diagram_species *sp, size_t m, unsigned long long seed)
{
    px_cases_shaped(&rng, sp, m, seed, 100);
}

static double phi(const px_diagram_species *s, double x, double y)
{
    return s->c + s->p * x + s->q * y;
}

static const px_diagram_window WIN = {0.0, 14.0, -2.0, 2.0};

/* The field whose species is sp index k, or -1. */
static int field_of_species(const px_diagram_map *m, int k)
{
    for (size_t f = 0; f < m->nfield; f++)
        if (m->field[f].species == k) return (int)f;
    return -1;
}

static int ring_has(const px_diagram_map *m, size_t f, size_t v)
{
    for (size_t i = 0; i < m->field[f].n; i++)
        if (m->ring[m->field[f].first + i] == v) return 1;
    return 0;
}

static double field_boundary_dist(const px_diagram_map *m, size_t f, double x, double y)
{
    const px_diagram_field *F = &m->field[f];
    double best = INFINITY;
    for (size_t i = 0; i < F->n; i++) {
        size_t u = m->ring[F->first + i], v = m->ring[F->first + (i + 1) % F->n];
        best = fmin(best, px_plane_seg_dist(x, y, m->vx[u], m->vy[u], m->vx[v], m->vy[v]));
    }
    return best;
}

/* All the geometric invariants of an exact map of sp[0..m-1] on w. */
static void check_map(const px_diagram_map *map, const px_diagram_species *sp, size_t m,
                      const px_diagram_window *w)
{
    double W = w->xmax - w->xmin, H = w->ymax - w->ymin, diag = hypot(W, H);
    /* 1. tiling: areas positive and summing to the window */
    double sum = 0;
    for (size_t f = 0; f < map->nfield; f++) {
        assert_true(map->field[f].area > 0);
        sum += map->field[f].area;
    }
    assert_close(sum, W * H, 1e-9, 0);
    assert_int_equal(map->nunmatched, 0);
    /* every species is either a field or listed absent, once */
    assert_int_equal(map->nfield + map->nabsent, m);
    /* 2. convex, counter-clockwise */
    for (size_t f = 0; f < map->nfield; f++) {
        const px_diagram_field *F = &map->field[f];
        for (size_t i = 0; i < F->n; i++) {
            size_t a = map->ring[F->first + i], b = map->ring[F->first + (i + 1) % F->n],
                   c = map->ring[F->first + (i + 2) % F->n];
            double cr = (map->vx[b] - map->vx[a]) * (map->vy[c] - map->vy[b]) -
                        (map->vy[b] - map->vy[a]) * (map->vx[c] - map->vx[b]);
            assert_true(cr >= -1e-9 * diag * diag);
        }
    }
    /* 3. random probes: located field == argmin, unless Phi nearly ties */
    for (int t = 0; t < 2000; t++) {
        double x = w->xmin + W * urand(), y = w->ymin + H * urand();
        size_t k = px_diagram_species_argmin(sp, m, x, y);
        double best = phi(&sp[k], x, y), second = INFINITY;
        for (size_t j = 0; j < m; j++)
            if (j != k) second = fmin(second, phi(&sp[j], x, y));
        if (second - best < 1e-6 * (fabs(best) + 1.0)) continue;
        int f = px_diagram_map_locate(map, x, y);
        assert_true(f >= 0);
        assert_int_equal(map->field[f].species, (int)k);
        int inside = 0; /* and in no other field (away from edges) */
        for (size_t g = 0; g < map->nfield; g++)
            if (field_boundary_dist(map, g, x, y) > 1e-7 * diag) {
                int in = 1;
                const px_diagram_field *G = &map->field[g];
                for (size_t i = 0; i < G->n && in; i++) {
                    size_t u = map->ring[G->first + i], v = map->ring[G->first + (i + 1) % G->n];
                    double cr = (map->vx[v] - map->vx[u]) * (y - map->vy[u]) -
                                (map->vy[v] - map->vy[u]) * (x - map->vx[u]);
                    in = cr > 0;
                }
                inside += in;
            }
        assert_true(inside <= 1);
    }
    /* 4. vertices: every field passing through a vertex has it; the field's
     *    species is lowest there (within the tie tolerance) */
    for (size_t v = 0; v < map->nvert; v++) {
        double x = map->vx[v], y = map->vy[v];
        size_t k = px_diagram_species_argmin(sp, m, x, y);
        double lo = phi(&sp[k], x, y);
        double S = 0;
        for (size_t j = 0; j < m; j++) S = fmax(S, fabs(sp[j].c) + fabs(sp[j].p) * 14 + fabs(sp[j].q) * 2);
        for (size_t f = 0; f < map->nfield; f++) {
            if (field_boundary_dist(map, f, x, y) <= 1e-9 * diag) assert_true(ring_has(map, f, v));
            if (ring_has(map, f, v))
                assert_true(phi(&sp[map->field[f].species], x, y) - lo <= 1e-9 * S);
        }
    }
    /* 5. boundaries separate exactly the two fields they name */
    for (size_t b = 0; b < map->nboundary; b++) {
        const px_diagram_boundary *B = &map->boundary[b];
        assert_true(B->field_a < B->field_b);
        assert_int_not_equal(B->id_a, B->id_b);
        double ex = B->x1 - B->x0, ey = B->y1 - B->y0, L = hypot(ex, ey);
        assert_true(L > 0);
        /* the line passes through both ends */
        if (B->vertical) {
            assert_close(B->x0, B->a, 0, 1e-9 * diag);
            assert_close(B->x1, B->a, 0, 1e-9 * diag);
        } else {
            assert_close(B->y0, B->a + B->b * B->x0, 0, 1e-9 * diag * (1 + fabs(B->b)));
            assert_close(B->y1, B->a + B->b * B->x1, 0, 1e-9 * diag * (1 + fabs(B->b)));
        }
        double mx = B->x0 + 0.5 * ex, my = B->y0 + 0.5 * ey, h = 1e-6 * diag;
        /* a probe along the segment, clear of its ends */
        if (L < 1e-4 * diag) continue;
        size_t k1 = px_diagram_species_argmin(sp, m, mx - h * ey / L, my + h * ex / L);
        size_t k2 = px_diagram_species_argmin(sp, m, mx + h * ey / L, my - h * ex / L);
        int sa = map->field[B->field_a].species, sb = map->field[B->field_b].species;
        assert_true(((int)k1 == sa && (int)k2 == sb) || ((int)k1 == sb && (int)k2 == sa));
        /* Phi of the two is equal on the segment */
        double S = fabs(sp[sa].c) + fabs(sp[sb].c) + 1e6;
        assert_close(phi(&sp[sa], mx, my), phi(&sp[sb], mx, my), 0, 1e-9 * S);
    }
}

/* -------------------------------------------------------------- geometry */

static void test_random_tilings(void **state)
{
    (void)state;
    static const size_t sizes[] = {1, 2, 3, 5, 8, 13, 30, 100};
    px_diagram_species sp[100];
    for (size_t s = 0; s < sizeof sizes / sizeof sizes[0]; s++)
        for (unsigned long long seed = 1; seed <= 12; seed++) {
            size_t m = sizes[s];
            random_species(sp, m, seed * 131 + m);
            px_diagram_map *map = NULL;
            assert_int_equal(px_diagram_map_exact(&WIN, sp, m, NULL, &map), PX_OK);
            check_map(map, sp, m, &WIN);
            px_diagram_map_free(map);
        }
}

/* Every species stable: planes tangent to the concave f = -A (x-7)^2 - B y^2
 * at random points (a tangent plane of a concave function lies above it
 * and touches it at its own point, so there it is the lowest plane). */
static void test_all_stable(void **state)
{
    (void)state;
    px_diagram_species sp[100];
    px_rng_set_state(&rng, 99);
    for (size_t j = 0; j < 100; j++) {
        double x0 = 14 * urand(), y0 = -2 + 4 * urand(), A = 1e3, B = 1e5;
        double f = -A * (x0 - 7) * (x0 - 7) - B * y0 * y0, fx = -2 * A * (x0 - 7), fy = -2 * B * y0;
        sp[j].c = f - fx * x0 - fy * y0;
        sp[j].p = fx;
        sp[j].q = fy;
        sp[j].id = (int)j;
        sp[j].label = NULL;
        /* the point of tangency itself lies in field j */
        assert_int_equal(px_diagram_species_argmin(sp, j + 1, x0, y0), j);
    }
    px_diagram_map *map = NULL;
    assert_int_equal(px_diagram_map_exact(&WIN, sp, 100, NULL, &map), PX_OK);
    assert_int_equal(map->nfield, 100);
    check_map(map, sp, 100, &WIN);
    /* union with a hole: one interior field in class 1, all others class 0
     * -> class 0 is the window minus that field: an outer loop and a hole */
    int inner = -1;
    for (size_t f = 0; f < map->nfield && inner < 0; f++) {
        int touches = 0;
        const px_diagram_field *F = &map->field[f];
        for (size_t i = 0; i < F->n; i++) {
            size_t v = map->ring[F->first + i];
            if (map->vx[v] <= WIN.xmin || map->vx[v] >= WIN.xmax || map->vy[v] <= WIN.ymin ||
                map->vy[v] >= WIN.ymax)
                touches = 1;
        }
        if (!touches) inner = (int)f;
    }
    assert_true(inner >= 0);
    int cls[100];
    for (size_t f = 0; f < 100; f++) cls[f] = (int)f == inner ? 1 : 0;
    px_diagram_outlines *o = NULL;
    assert_int_equal(px_diagram_map_union(map, cls, &o), PX_OK);
    assert_int_equal(o->nloop, 3);
    double outer = 0, hole = 0, one = 0;
    for (size_t l = 0; l < o->nloop; l++) {
        if (o->loop[l].cls == 1) one = o->loop[l].area;
        else if (o->loop[l].area > 0) outer = o->loop[l].area;
        else hole = o->loop[l].area;
    }
    assert_close(outer, 14.0 * 4.0, 1e-12, 0);
    assert_close(hole, -map->field[inner].area, 1e-9, 0);
    assert_close(one, map->field[inner].area, 1e-9, 0);
    px_diagram_outlines_free(o);
    px_diagram_map_free(map);
}

/* Small-integer coefficients: many exact duplicates, coincident and
 * parallel lines and lines through common points. */
static void test_structured_degenerate(void **state)
{
    (void)state;
    px_diagram_species sp[40];
    px_diagram_window w = {-3, 3, -3, 3};
    for (unsigned long long seed = 1; seed <= 300; seed++) {
        px_rng_set_state(&rng, seed * 7919);
        size_t m = 2 + (size_t)(urand() * 38);
        for (size_t j = 0; j < m; j++) {
            sp[j].c = (double)((int)(urand() * 5) - 2);
            sp[j].p = (double)((int)(urand() * 5) - 2);
            sp[j].q = (double)((int)(urand() * 3) - 1);
            sp[j].id = (int)j;
            sp[j].label = NULL;
        }
        px_diagram_map *map = NULL;
        assert_int_equal(px_diagram_map_exact(&w, sp, m, NULL, &map), PX_OK);
        check_map(map, sp, m, &w);
        px_diagram_map_free(map);
    }
    /* overflow guard */
    px_diagram_species big[2] = {{1e308, 0, 0, 1, NULL}, {-1e308, 0, 0, 2, NULL}};
    px_diagram_map *map = NULL;
    assert_int_equal(px_diagram_map_exact(&w, big, 2, NULL, &map), PX_ERANGE);
    assert_null(map);
}

/* Three lines through one point: Phi0 = x, Phi1 = y, Phi2 = -x - y meet at
 * (0, 0) where all three are 0; the three fields share that vertex. */
static void test_triple_point(void **state)
{
    (void)state;
    px_diagram_species sp[3] = {{0, 1, 0, 1, "a"}, {0, 0, 1, 2, "b"}, {0, -1, -1, 3, "c"}};
    px_diagram_window w = {-1, 1, -1, 1};
    px_diagram_map *map = NULL;
    assert_int_equal(px_diagram_map_exact(&w, sp, 3, NULL, &map), PX_OK);
    assert_int_equal(map->nfield, 3);
    assert_int_equal(map->nboundary, 3);
    check_map(map, sp, 3, &w);
    size_t origin = (size_t)-1;
    for (size_t v = 0; v < map->nvert; v++)
        if (fabs(map->vx[v]) < 1e-12 && fabs(map->vy[v]) < 1e-12) origin = v;
    assert_true(origin != (size_t)-1);
    for (size_t f = 0; f < 3; f++) assert_true(ring_has(map, f, origin));
    px_diagram_map_free(map);
}

/* --------------------------------------------------------------- Nernst */

/* Zn^2+ + 2 e- = Zn(s), E0 from standard_potentials.csv (CRC, -0.7618 V).
 * Phi per Zn atom with Zn(s) as the reference form (Phi = 0):
 *   Zn(s) -> Zn^2+ + 2 e-:  Phi = 2 F E0 + RT ln a - 2 F E     (nH = 0, ne = -2)
 * Nernst: the boundary is E = E0 + (RT ln10 / 2F) log a; at a = 1e-6 that is
 * E0 - 6 x 0.02958 V = E0 - 0.1775 V (textbook Nernst at 25 C). */
static void test_nernst_zinc(void **state)
{
    (void)state;
    double E0 = px_ref_E0("Zn^2+ + 2 e- = Zn(s)");
    assert_close(E0, -0.7618, 0, 1e-4); /* the row as read */
    double T = PX_TR, RT = PX_R * T, loga = -6;
    px_diagram_species sp[2] = {
        {0, 0, 0, 30, "Zn(s)"},
        {2 * PX_F * E0 + RT * PX_LN10 * loga, 0, -2 * PX_F, 31, "Zn^2+"},
    };
    px_diagram_window w = {0, 6, -1.5, 0};
    px_diagram_map *map = NULL;
    assert_int_equal(px_diagram_map_exact(&w, sp, 2, NULL, &map), PX_OK);
    check_map(map, sp, 2, &w);
    assert_int_equal(map->nboundary, 1);
    const px_diagram_boundary *B = &map->boundary[0];
    assert_int_equal(B->vertical, 0);
    assert_close(B->b, 0.0, 0, 1e-15);
    assert_close(B->a, E0 - 0.1775, 0, 1e-4);               /* textbook, 4 digits */
    assert_close(B->a, E0 - 3 * 0.05916, 0, 2e-5);          /* 0.05916 V/decade */
    assert_close(B->a, E0 + 0.5 * px_diagram_nernst_slope(T) * loga, 1e-14, 1e-14);
    /* below the line the metal, above the ion */
    int f = px_diagram_map_locate(map, 3, -1.2);
    assert_int_equal(map->field[f].id, 30);
    f = px_diagram_map_locate(map, 3, -0.5);
    assert_int_equal(map->field[f].id, 31);
    px_diagram_map_free(map);
}

/* Slopes -0.05916 nH/ne V/pH at 25 C and their scaling with T.
 * ZnO(s) + 2 H+ + 2 e- = Zn(s) + H2O, E0 = -0.4319 V (standard_potentials.csv,
 * CODATA-derived): Zn + H2O -> ZnO + 2 H+ + 2 e- has nH = ne = -2, so the
 * line is E = E0 - (RT ln10 / F) pH.
 * Fe3O4(s) + 8 H+ + 2 e- = 3 Fe^2+ + 4 H2O, E0 = 0.980 V (Pourbaix 1966 per
 * standard_potentials.csv): per Fe atom (nu = 3) with Fe^2+ as reference,
 * Phi(Fe3O4) = [2 F E0 - 8 RT ln10 pH - 2 F E] / 3 and Phi(Fe^2+) = RT ln a,
 * so E = 0.980 - 0.2366 pH - 0.0887 log a (Pourbaix 1966 prints
 * 0.980 - 0.2364 pH - 0.0886 log a with 0.0591 V per decade; from memory). */
static void test_nernst_slopes(void **state)
{
    (void)state;
    /* RT ln10 / F at 298.15 K with CODATA 2018 R and F: 0.059159 V */
    assert_close(px_diagram_nernst_slope(298.15), 0.059159, 0, 5e-7);
    /* at 100 C: 0.07404 V per decade (same formula; common practice value) */
    assert_close(px_diagram_nernst_slope(373.15), 0.07404, 0, 5e-6);

    double Ezno = px_ref_E0("ZnO(s) + 2 H^+ + 2 e- = Zn(s) + H2O(l)");
    static const double temps[] = {298.15, 373.15, 473.15};
    for (size_t t = 0; t < 3; t++) {
        double T = temps[t], s = PX_R * T * PX_LN10;
        px_diagram_species sp[2] = {{0, 0, 0, 1, "Zn"},
                                    {2 * PX_F * Ezno, -2 * s, -2 * PX_F, 2, "ZnO"}};
        px_diagram_window w = {0, 14, -2, 1};
        px_diagram_map *map = NULL;
        assert_int_equal(px_diagram_map_exact(&w, sp, 2, NULL, &map), PX_OK);
        check_map(map, sp, 2, &w);
        assert_int_equal(map->nboundary, 1);
        double slope = -px_diagram_nernst_slope(T) * (-2.0) / (-2.0);
        assert_close(map->boundary[0].b, slope, 1e-12, 0);
        assert_close(map->boundary[0].a, Ezno, 1e-12, 0);
        if (t == 0) assert_close(map->boundary[0].b, -0.05916, 0, 5e-6);
        px_diagram_map_free(map);
    }

    double Efe = px_ref_E0("Fe3O4(s) + 8 H^+ + 2 e- = 3 Fe^2+ + 4 H2O(l)");
    double s = PX_R * PX_TR * PX_LN10, loga = -6;
    px_diagram_species fe[2] = {{s * loga, 0, 0, 2, "Fe^2+"},
                                {2 * PX_F * Efe / 3, -8 * s / 3, -2 * PX_F / 3, 3, "Fe3O4"}};
    px_diagram_window w = {0, 14, -1, 1.5};
    px_diagram_map *map = NULL;
    assert_int_equal(px_diagram_map_exact(&w, fe, 2, NULL, &map), PX_OK);
    check_map(map, fe, 2, &w);
    assert_int_equal(map->nboundary, 1);
    assert_close(map->boundary[0].b, -0.2366, 0, 1e-4);
    assert_close(map->boundary[0].b, -0.2364, 0, 5e-4); /* Pourbaix's rounding */
    assert_close(map->boundary[0].a, 0.980 - 0.0887 * loga, 0, 1e-3);
    px_diagram_map_free(map);
}

/* ----------------------------------------------------------- degenerate */

static void test_degenerate(void **state)
{
    (void)state;
    px_diagram_window w = {0, 10, -1, 1};
    px_diagram_map *map = NULL;
    /* duplicates (exact, and within tolerance) keep the first */
    px_diagram_species d[4] = {{0, 0, 0, 1, "a"}, {5e4, -1e4, 0, 2, "b"},
                               {5e4, -1e4, 0, 3, "b again"}, {1e-9, 0, 0, 4, "a again"}};
    assert_int_equal(px_diagram_map_exact(&w, d, 4, NULL, &map), PX_OK);
    check_map(map, d, 4, &w);
    assert_int_equal(map->nfield, 2);
    assert_int_equal(map->nabsent, 2);
    assert_int_equal(map->absent[0].species, 2);
    assert_int_equal(map->absent[0].reason, PX_DIAGRAM_DUPLICATE);
    assert_int_equal(map->absent[1].species, 3);
    assert_int_equal(map->absent[1].reason, PX_DIAGRAM_DUPLICATE);
    assert_int_equal(map->boundary[0].vertical, 1);
    assert_close(map->boundary[0].a, 5.0, 1e-14, 0);
    px_diagram_map_free(map);

    /* never stable: far above everything; and a plane that touches the
     * envelope only along the line x = 5 (coincident boundaries) */
    px_diagram_species n[4] = {{0, 0, 0, 1, "a"}, {5e4, -1e4, 0, 2, "b"}, {1e6, 0, 0, 3, "high"},
                               {2.5e4, -5e3, 0, 4, "touch"}};
    assert_int_equal(px_diagram_map_exact(&w, n, 4, NULL, &map), PX_OK);
    check_map(map, n, 4, &w);
    assert_int_equal(map->nfield, 2);
    assert_true(field_of_species(map, 2) < 0 && field_of_species(map, 3) < 0);
    for (size_t i = 0; i < map->nabsent; i++) {
        if (map->absent[i].species == 2) assert_int_equal(map->absent[i].reason, PX_DIAGRAM_DOMINATED);
        if (map->absent[i].species == 3) assert_true(map->absent[i].reason == PX_DIAGRAM_DEGENERATE ||
                                                     map->absent[i].reason == PX_DIAGRAM_DOMINATED);
    }
    px_diagram_map_free(map);

    /* parallel boundaries: three vertical bands at x = 2 and x = 6 */
    px_diagram_species p[3] = {{0, 0, 0, 1, "a"}, {2, -1, 0, 2, "b"}, {8, -2, 0, 3, "c"}};
    assert_int_equal(px_diagram_map_exact(&w, p, 3, NULL, &map), PX_OK);
    check_map(map, p, 3, &w);
    assert_int_equal(map->nfield, 3);
    assert_int_equal(map->nboundary, 2);
    for (size_t b = 0; b < 2; b++) {
        assert_int_equal(map->boundary[b].vertical, 1);
        double x = map->boundary[b].a;
        assert_true(fabs(x - 2) < 1e-12 || fabs(x - 6) < 1e-12);
    }
    px_diagram_map_free(map);

    /* a boundary exactly on a window corner and along a window edge */
    px_diagram_species e[2] = {{0, 0, 0, 1, "a"}, {10, -1, 0, 2, "b"}}; /* x = 10: the edge */
    assert_int_equal(px_diagram_map_exact(&w, e, 2, NULL, &map), PX_OK);
    check_map(map, e, 2, &w);
    assert_int_equal(map->nfield, 1);
    px_diagram_map_free(map);
}

static void test_invalid(void **state)
{
    (void)state;
    px_diagram_map *map = (px_diagram_map *)1;
    px_diagram_species sp[2] = {{0, 0, 0, 1, NULL}, {1, 1, 1, 2, NULL}};
    px_diagram_window w = {0, 1, 0, 1};
    assert_int_equal(px_diagram_map_exact(&w, sp, 0, NULL, &map), PX_EINVAL);
    assert_null(map);
    const double bad[] = {NAN, INFINITY, -INFINITY};
    for (int i = 0; i < 3; i++) {
        for (int field = 0; field < 3; field++) {
            px_diagram_species t[2] = {sp[0], sp[1]};
            if (field == 0) t[1].c = bad[i];
            if (field == 1) t[1].p = bad[i];
            if (field == 2) t[1].q = bad[i];
            assert_int_equal(px_diagram_map_exact(&w, t, 2, NULL, &map), PX_EINVAL);
        }
        px_diagram_window bw = w;
        bw.xmax = bad[i];
        assert_int_equal(px_diagram_map_exact(&bw, sp, 2, NULL, &map), PX_EINVAL);
    }
    px_diagram_window empty = {1, 1, 0, 1}, flipped = {0, 1, 1, 0};
    assert_int_equal(px_diagram_map_exact(&empty, sp, 2, NULL, &map), PX_EINVAL);
    assert_int_equal(px_diagram_map_exact(&flipped, sp, 2, NULL, &map), PX_EINVAL);
    px_diagram_options o = px_diagram_options_default();
    o.epsrel = -1;
    assert_int_equal(px_diagram_map_exact(&w, sp, 2, &o, &map), PX_EINVAL);
    o = px_diagram_options_default();
    o.geom_rel = NAN;
    assert_int_equal(px_diagram_map_exact(&w, sp, 2, &o, &map), PX_EINVAL);
    assert_int_equal(px_diagram_map_exact(&w, sp, 2, NULL, NULL), PX_EINVAL);
    assert_int_equal(px_diagram_map_locate(NULL, 0, 0), -1);
    px_diagram_map_free(NULL);
}

/* Same inputs, same bits. */
static void test_deterministic(void **state)
{
    (void)state;
    px_diagram_species sp[60];
    random_species(sp, 60, 77);
    px_diagram_map *a = NULL, *b = NULL;
    assert_int_equal(px_diagram_map_exact(&WIN, sp, 60, NULL, &a), PX_OK);
    assert_int_equal(px_diagram_map_exact(&WIN, sp, 60, NULL, &b), PX_OK);
    assert_int_equal(a->nvert, b->nvert);
    assert_int_equal(a->nring, b->nring);
    assert_int_equal(a->nboundary, b->nboundary);
    assert_memory_equal(a->vx, b->vx, a->nvert * sizeof *a->vx);
    assert_memory_equal(a->vy, b->vy, a->nvert * sizeof *a->vy);
    assert_memory_equal(a->ring, b->ring, a->nring * sizeof *a->ring);
    assert_memory_equal(a->boundary, b->boundary, a->nboundary * sizeof *a->boundary);
    px_diagram_map_free(a);
    px_diagram_map_free(b);
}

static void test_enomem(void **state)
{
    (void)state;
    px_diagram_species sp[20];
    random_species(sp, 20, 5);
    int ok = 0;
    for (int k = 0; k < 400 && !ok; k++) {
        px_alloc_fail b;
        px_allocator al = px_alloc_fail_make(&b, k);
        px_diagram_options o = px_diagram_options_default();
        o.alloc = &al;
        px_diagram_map *map = NULL;
        int st = px_diagram_map_exact(&WIN, sp, 20, &o, &map);
        if (st == PX_OK) {
            ok = 1;
            check_map(map, sp, 20, &WIN);
            px_diagram_map_free(map);
        } else {
            assert_int_equal(st, PX_ENOMEM);
            assert_null(map);
        }
        assert_int_equal(b.live, 0); /* nothing held on either path */
    }
    assert_true(ok);
}

/* ------------------------------------------------------------- nested */

/* Ligand fields: the window split at x = 5.  With the same species on both
 * sides the pieces join into the plain map's fields; with a complex that
 * only exists on the right, new boundaries lie on x = 5. */
static void test_nested(void **state)
{
    (void)state;
    double lx[4] = {0, 5, 5, 0}, ly[4] = {-1, -1, 1, 1};
    double rx[4] = {5, 10, 10, 5}, ry[4] = {-1, -1, 1, 1};
    px_diagram_window w = {0, 10, -1, 1};
    px_diagram_species sp[3] = {{0, 0, 0, 1, "M"},
                                {2e4, 0, -2 * PX_F, 2, "M^2+"},
                                {3e4, -2 * PX_R * PX_TR * PX_LN10, -2 * PX_F, 3, "MO"}};
    px_diagram_region r[2] = {{lx, ly, 4, sp, 3, 0}, {rx, ry, 4, sp, 3, 1}};
    px_diagram_map *plain = NULL, *nest = NULL;
    assert_int_equal(px_diagram_map_exact(&w, sp, 3, NULL, &plain), PX_OK);
    assert_int_equal(px_diagram_map_nested(r, 2, NULL, &nest), PX_OK);
    assert_int_equal(nest->nunmatched, 0);
    double tot = 0;
    for (size_t f = 0; f < nest->nfield; f++) tot += nest->field[f].area;
    assert_close(tot, 20.0, 1e-9, 0);
    /* each plain field's area is the sum of its group's pieces */
    for (size_t f = 0; f < plain->nfield; f++) {
        double a = 0;
        int group = -1;
        for (size_t g = 0; g < nest->nfield; g++)
            if (nest->field[g].id == plain->field[f].id) {
                a += nest->field[g].area;
                if (group < 0) group = nest->field[g].group;
                assert_int_equal(nest->field[g].group, group); /* one group per id */
            }
        assert_close(a, plain->field[f].area, 1e-9, 0);
    }
    /* same boundaries (none on x = 5), by species pair and total length */
    double lp = 0, ln = 0;
    for (size_t b = 0; b < plain->nboundary; b++)
        lp += hypot(plain->boundary[b].x1 - plain->boundary[b].x0, plain->boundary[b].y1 - plain->boundary[b].y0);
    for (size_t b = 0; b < nest->nboundary; b++) {
        ln += hypot(nest->boundary[b].x1 - nest->boundary[b].x0, nest->boundary[b].y1 - nest->boundary[b].y0);
        assert_false(nest->boundary[b].vertical && fabs(nest->boundary[b].a - 5) < 1e-9);
    }
    assert_close(ln, lp, 1e-9, 0);
    /* merged outlines: the union by group gives one loop per plain field,
     * with the plain field's area */
    int cls[16];
    assert_true(nest->nfield <= 16);
    for (size_t g = 0; g < nest->nfield; g++) cls[g] = nest->field[g].group;
    px_diagram_outlines *ol = NULL;
    assert_int_equal(px_diagram_map_union(nest, cls, &ol), PX_OK);
    assert_int_equal(ol->nloop, plain->nfield);
    for (size_t l = 0; l < ol->nloop; l++) {
        int id = nest->field[ol->loop[l].cls].id, found = 0;
        for (size_t f = 0; f < plain->nfield; f++)
            if (plain->field[f].id == id) {
                assert_close(ol->loop[l].area, plain->field[f].area, 1e-9, 0);
                found = 1;
            }
        assert_true(found);
    }
    px_diagram_outlines_free(ol);
    px_diagram_map_free(nest);

    /* the right field has a complex ML, lowest everywhere there (the others
     * reach at most -2.8e5 J/mol in the window) */
    px_diagram_species spr[4] = {sp[0], sp[1], sp[2], {-1e6, 0, 0, 4, "ML"}};
    px_diagram_region r2[2] = {{lx, ly, 4, sp, 3, 0}, {rx, ry, 4, spr, 4, 1}};
    assert_int_equal(px_diagram_map_nested(r2, 2, NULL, &nest), PX_OK);
    assert_int_equal(nest->nunmatched, 0);
    tot = 0;
    for (size_t f = 0; f < nest->nfield; f++) tot += nest->field[f].area;
    assert_close(tot, 20.0, 1e-9, 0);
    double on5 = 0; /* boundaries on the ligand edge x = 5, between left pieces and ML */
    for (size_t b = 0; b < nest->nboundary; b++) {
        const px_diagram_boundary *B = &nest->boundary[b];
        if (B->vertical && fabs(B->a - 5) < 1e-12) {
            assert_true(B->id_a == 4 || B->id_b == 4);
            on5 += fabs(B->y1 - B->y0);
        }
    }
    int f = px_diagram_map_locate(nest, 7, 0.9);
    assert_int_equal(nest->field[f].id, 4);
    assert_int_equal(nest->field[f].region, 1);
    /* ML holds the whole right half: the edge x = 5 is covered by the left
     * pieces (M, M^2+, MO), each bordering ML */
    assert_close(on5, 2.0, 1e-9, 0);
    for (size_t g = 0; g < nest->nfield; g++)
        if (nest->field[g].region == 1) assert_int_equal(nest->field[g].id, 4);
    px_diagram_map_free(nest);
    px_diagram_map_free(plain);

    /* invalid regions */
    double cx[4] = {0, 5, 1, 5}, cy[4] = {0, 0, 1, 2}; /* not convex */
    px_diagram_region bad = {cx, cy, 4, sp, 3, 0};
    assert_int_equal(px_diagram_map_nested(&bad, 1, NULL, &nest), PX_EINVAL);
    double nx_[3] = {0, 1, NAN}, ny_[3] = {0, 0, 1};
    px_diagram_region bad2 = {nx_, ny_, 3, sp, 3, 0};
    assert_int_equal(px_diagram_map_nested(&bad2, 1, NULL, &nest), PX_EINVAL);
}

/* ------------------------------------------------- outlines and domains */

/* Zn at a = 1e-6, 25 C, E0 values from standard_potentials.csv:
 *   Zn^2+/Zn -0.7618 (CRC), ZnO/Zn -0.4319 (CODATA-derived),
 *   Zn(OH)4^2-/Zn -1.199 in base (OpenStax/CRC), moved to the acid form
 *   Zn(OH)4^2- + 4 H+ + 2 e- = Zn + 4 H2O with E0a = E0b + 2 s pKw
 *   (pKw 13.995 at 25 C, IAPWS R11-07 per water.csv).
 * Qualitative textbook shape (Pourbaix 1966 atlas, zinc; from memory): an
 * immunity domain at low E, corrosion in acid and in strong alkali, a
 * passivation domain (ZnO) between them. */
static void test_corrosion_domains(void **state)
{
    (void)state;
    double s = PX_R * PX_TR * PX_LN10, loga = -6;
    double Ezn = px_ref_E0("Zn^2+ + 2 e- = Zn(s)");
    double Ezno = px_ref_E0("ZnO(s) + 2 H^+ + 2 e- = Zn(s) + H2O(l)");
    double Ehz = px_ref_E0("Zn(OH)4^2- + 2 e- = Zn(s) + 4 OH^-") + 2 * (s / PX_F) * 13.995;
    px_diagram_species sp[4] = {
        {0, 0, 0, 0, "Zn"},
        {2 * PX_F * Ezn + s * loga, 0, -2 * PX_F, 1, "Zn^2+"},
        {2 * PX_F * Ezno, -2 * s, -2 * PX_F, 2, "ZnO"},
        {2 * PX_F * Ehz + s * loga, -4 * s, -2 * PX_F, 3, "Zn(OH)4^2-"},
    };
    px_diagram_window w = {0, 16, -2, 1};
    px_diagram_map *map = NULL;
    assert_int_equal(px_diagram_map_exact(&w, sp, 4, NULL, &map), PX_OK);
    check_map(map, sp, 4, &w);
    assert_int_equal(map->nfield, 4);
    int kind[4];
    for (size_t f = 0; f < 4; f++) {
        int id = map->field[f].id;
        kind[f] = id == 0 ? PX_DIAGRAM_METAL : (id == 2 ? PX_DIAGRAM_SOLID : PX_DIAGRAM_DISSOLVED);
    }
    px_diagram_outlines *o = NULL;
    assert_int_equal(px_diagram_corrosion_domains(map, kind, &o), PX_OK);
    double by[3] = {0, 0, 0};
    int nl[3] = {0, 0, 0};
    for (size_t l = 0; l < o->nloop; l++) {
        assert_true(o->loop[l].area > 0); /* no holes here */
        by[o->loop[l].cls] += o->loop[l].area;
        nl[o->loop[l].cls]++;
        /* the loop's stored area matches its vertices */
        assert_close(px_geom_polygon_area(o->x + o->loop[l].first, o->y + o->loop[l].first,
                                          o->loop[l].n),
                     o->loop[l].area, 1e-12, 0);
    }
    assert_int_equal(nl[PX_DIAGRAM_IMMUNITY], 1);
    assert_int_equal(nl[PX_DIAGRAM_PASSIVATION], 1);
    assert_int_equal(nl[PX_DIAGRAM_CORROSION], 2); /* acid and alkaline */
    assert_close(by[0] + by[1] + by[2], 16.0 * 3.0, 1e-9, 0);
    for (size_t f = 0; f < 4; f++)
        if (kind[f] == PX_DIAGRAM_METAL) assert_close(by[0], map->field[f].area, 1e-12, 0);
    /* ZnO/Zn^2+ boundary at pH = (2 (E_ZnO - E_Zn)/s_V - log a)/2 (Nernst) */
    double pH = (2 * (Ezno - Ezn) / (s / PX_F) - loga) / 2;
    int f1 = px_diagram_map_locate(map, pH - 0.01, 0.5), f2 = px_diagram_map_locate(map, pH + 0.01, 0.5);
    assert_int_equal(map->field[f1].id, 1);
    assert_int_equal(map->field[f2].id, 2);
    px_diagram_outlines_free(o);

    /* merging everything into one class gives the window, one loop */
    int all[4] = {0, 0, 0, 0};
    assert_int_equal(px_diagram_map_union(map, all, &o), PX_OK);
    assert_int_equal(o->nloop, 1);
    assert_close(o->loop[0].area, 48.0, 1e-12, 0);
    assert_int_equal(o->loop[0].n, 4); /* collinear points removed: a rectangle */
    px_diagram_outlines_free(o);
    int badkind[4] = {0, 1, 7, 2};
    assert_int_equal(px_diagram_corrosion_domains(map, badkind, &o), PX_EINVAL);
    px_diagram_map_free(map);
}

int main(void)
{
    const struct CMUnitTest tests[] = {
        cmocka_unit_test(test_random_tilings), cmocka_unit_test(test_all_stable),
        cmocka_unit_test(test_triple_point),   cmocka_unit_test(test_structured_degenerate),
        cmocka_unit_test(test_nernst_zinc),    cmocka_unit_test(test_nernst_slopes),
        cmocka_unit_test(test_degenerate),     cmocka_unit_test(test_invalid),
        cmocka_unit_test(test_deterministic),  cmocka_unit_test(test_enomem),
        cmocka_unit_test(test_nested),         cmocka_unit_test(test_corrosion_domains),
    };
    return cmocka_run_group_tests(tests, NULL, NULL);
}
