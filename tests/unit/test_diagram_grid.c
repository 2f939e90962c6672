/* test_diagram_grid.c - rigorous grid maps (src/diagram/grid.c).
 *
 * The callback is the plain argmin of Phi, so the exact map of the same set
 * is the independent answer (DESIGN.md: the two methods must agree where
 * their assumptions coincide): node labels must equal the exact field, every
 * traced point must lie within one grid cell of the exact boundary of the
 * same pair, and every bisection crossing on a grid edge must lie within the
 * requested tolerance of the exact line.  Also: node counts and areas, a
 * failing callback, saddles, bad input. */
#include "px_test.h"
#include "support/px_diagram_cases.h"
#include "support/px_plane.h"
#include "core/constants.h"
#include "core/status.h"
#include "diagram/diagram.h"
#include "diagram/potential.h"
#include <stdlib.h>

typedef struct argmin_ctx {
    const px_diagram_species *sp;
    size_t m;
    long calls, fail_after;
} argmin_ctx;

static int argmin_label(double x, double y, void *user, int *id)
{
    argmin_ctx *c = user;
    if (c->fail_after >= 0 && c->calls >= c->fail_after) return PX_ENOCONV;
    c->calls++;
    *id = c->sp[px_diagram_species_argmin(c->sp, c->m, x, y)].id;
    return PX_OK;
}

static px_rng rng;

static void random_species(px_diagram_species *sp, size_t m, unsigned long long seed)
{
    px_cases_shaped(&rng, sp, m, seed, 100);
}

static const px_diagram_species *by_id(const px_diagram_species *sp, size_t m, int id)
{
    for (size_t j = 0; j < m; j++)
        if (sp[j].id == id) return &sp[j];
    return NULL;
}

static void compare(const px_diagram_species *sp, size_t m, const px_diagram_window *w,
                    size_t nx, size_t ny)
{
    px_diagram_map *ex = NULL;
    px_diagram_grid *g = NULL;
    assert_int_equal(px_diagram_map_exact(w, sp, m, NULL, &ex), PX_OK);
    argmin_ctx c = {sp, m, 0, -1};
    px_diagram_grid_options o = px_diagram_grid_options_default();
    o.nx = nx;
    o.ny = ny;
    o.epsrel = 1e-7;
    assert_int_equal(px_diagram_grid_map(w, argmin_label, &c, &o, &g), PX_OK);
    assert_int_equal((long)g->ncalls, c.calls);
    double dx = (w->xmax - w->xmin) / (double)(nx - 1), dy = (w->ymax - w->ymin) / (double)(ny - 1);
    double cell = hypot(dx, dy);
    /* node labels equal the exact map's field */
    size_t total = 0;
    double area = 0;
    for (size_t k = 0; k < g->nfield; k++) {
        total += g->field[k].count;
        area += g->field[k].area;
    }
    assert_int_equal(total, nx * ny);
    assert_close(area, (w->xmax - w->xmin) * (w->ymax - w->ymin), 1e-12, 0);
    for (size_t j = 0; j < ny; j += 3)
        for (size_t i = 0; i < nx; i += 3) {
            double x = w->xmin + dx * (double)i, y = w->ymin + dy * (double)j;
            int f = px_diagram_map_locate(ex, x, y);
            assert_true(f >= 0);
            const px_diagram_species *s1 = by_id(sp, m, g->label[j * nx + i]);
            const px_diagram_species *s2 = &sp[ex->field[f].species];
            /* equal, or tied at that node */
            double p1 = s1->c + s1->p * x + s1->q * y, p2 = s2->c + s2->p * x + s2->q * y;
            assert_true(s1 == s2 || fabs(p1 - p2) <= 1e-9 * (fabs(p1) + 1));
        }
    /* every traced point within one cell of the exact boundary of its pair;
     * crossings on grid lines within the bisection tolerance of the line */
    size_t nchecked = 0, nthin = 0;
    for (size_t l = 0; l < g->npoly; l++) {
        const px_diagram_polyline *P = &g->poly[l];
        const px_diagram_species *a = by_id(sp, m, P->id_a), *b = by_id(sp, m, P->id_b);
        assert_non_null(a);
        assert_non_null(b);
        assert_true(P->id_a < P->id_b);
        for (size_t i = 0; i < P->n; i++) {
            double x = g->px[P->first + i], y = g->py[P->first + i];
            double best = INFINITY;
            for (size_t k = 0; k < ex->nboundary; k++) {
                const px_diagram_boundary *B = &ex->boundary[k];
                if ((B->id_a == P->id_a && B->id_b == P->id_b) ||
                    (B->id_a == P->id_b && B->id_b == P->id_a))
                    best = fmin(best, px_plane_seg_dist(x, y, B->x0, B->y0, B->x1, B->y1));
            }
            if (!(best <= cell)) {
                /* a field thinner than a step can fall between the nodes: the
                 * grid then shows A|B where the exact map has A|C|B.  Allowed
                 * only when bisection met that third field and an exact field
                 * of another id lies within one cell. */
                assert_true(g->nthird > 0);
                double near = INFINITY;
                for (size_t k = 0; k < ex->nboundary; k++) {
                    const px_diagram_boundary *B = &ex->boundary[k];
                    int other = (B->id_a != P->id_a && B->id_a != P->id_b) ||
                                (B->id_b != P->id_a && B->id_b != P->id_b);
                    if (other) near = fmin(near, px_plane_seg_dist(x, y, B->x0, B->y0, B->x1, B->y1));
                }
                assert_true(near <= cell);
                nthin++;
            }
            /* on a grid line: a bisection crossing.  Where the ids one
             * bracket width either side are exactly a and b (no third field
             * in between), the exact line must be within half the bracket. */
            double fi = (x - w->xmin) / dx, fj = (y - w->ymin) / dy;
            double dphi = (a->c - b->c) + (a->p - b->p) * x + (a->q - b->q) * y;
            int on_h = fabs(fj - nearbyint(fj)) < 1e-9, on_v = fabs(fi - nearbyint(fi)) < 1e-9;
            if (on_h != on_v) {
                double h = on_h ? o.epsrel * dx : o.epsrel * dy;
                double x1 = on_h ? x - h : x, y1 = on_h ? y : y - h;
                double x2 = on_h ? x + h : x, y2 = on_h ? y : y + h;
                int i1 = sp[px_diagram_species_argmin(sp, m, x1, y1)].id;
                int i2 = sp[px_diagram_species_argmin(sp, m, x2, y2)].id;
                if ((i1 == a->id && i2 == b->id) || (i1 == b->id && i2 == a->id)) {
                    double g1 = on_h ? a->p - b->p : a->q - b->q;
                    double err = fabs(dphi / g1); /* distance along the edge to the line */
                    assert_true(err <= 0.5 * h * (1 + 1e-6) + 1e-12);
                    nchecked++;
                }
            }
        }
    }
    if (ex->nboundary > 0) assert_true(nchecked > 0);
    assert_true(nthin <= g->npt / 10); /* the exception stays an exception */
    /* node-count areas agree with the exact areas to within a band of one
     * cell along each field's perimeter */
    for (size_t f = 0; f < ex->nfield; f++) {
        double per = 0;
        const px_diagram_field *F = &ex->field[f];
        for (size_t i = 0; i < F->n; i++) {
            size_t u = ex->ring[F->first + i], v = ex->ring[F->first + (i + 1) % F->n];
            per += hypot(ex->vx[v] - ex->vx[u], ex->vy[v] - ex->vy[u]);
        }
        double ga = 0;
        for (size_t k = 0; k < g->nfield; k++)
            if (g->field[k].id == F->id) {
                ga = g->field[k].area;
                /* the label spot carries the field's own label */
                int id;
                argmin_ctx c2 = {sp, m, 0, -1};
                argmin_label(g->field[k].label_x, g->field[k].label_y, &c2, &id);
                assert_int_equal(id, F->id);
            }
        assert_true(fabs(ga - F->area) <= per * cell);
    }
    px_diagram_grid_free(g);
    px_diagram_map_free(ex);
}

static void test_grid_vs_exact(void **state)
{
    (void)state;
    px_diagram_species sp[40];
    px_diagram_window w = {0, 14, -2, 2};
    for (unsigned long long seed = 1; seed <= 8; seed++) {
        size_t m = 5 + (size_t)(seed * 4);
        random_species(sp, m, seed);
        compare(sp, m, &w, 61, 47);
    }
}

/* Zn^2+/Zn horizontal Nernst line at a = 1e-6: E0 - 0.1775 V (textbook, as
 * in test_diagram_exact); the bisection crossing lands on it within the
 * tolerance on every vertical grid edge. */
static void test_grid_nernst(void **state)
{
    (void)state;
    double E0 = -0.7618; /* standard_potentials.csv, CRC */
    px_diagram_species sp[2] = {{0, 0, 0, 30, "Zn"},
                                {2 * PX_F * E0 + PX_R * PX_TR * PX_LN10 * -6, 0, -2 * PX_F, 31, "Zn^2+"}};
    px_diagram_window w = {0, 6, -1.5, 0};
    argmin_ctx c = {sp, 2, 0, -1};
    px_diagram_grid_options o = px_diagram_grid_options_default();
    o.nx = 7;
    o.ny = 16;
    o.epsabs = 1e-9;
    o.epsrel = 0;
    px_diagram_grid *g = NULL;
    assert_int_equal(px_diagram_grid_map(&w, argmin_label, &c, &o, &g), PX_OK);
    assert_int_equal(g->npoly, 1);
    assert_int_equal(g->poly[0].n, 7);
    for (size_t i = 0; i < g->poly[0].n; i++) {
        assert_close(g->py[i], E0 - 0.1775, 0, 1e-4);
        assert_close(g->py[i], E0 - 3 * px_diagram_nernst_slope(PX_TR), 0, 1e-9);
    }
    /* id_a (30, the metal, below) lies on the left of the direction: so the
     * polyline runs from high x to low x */
    assert_true(g->px[0] > g->px[6]);
    px_diagram_grid_free(g);
    compare(sp, 2, &w, 31, 31);
}

/* Three lines through one point inside a cell: a star from the cell centre. */
static void test_grid_triple(void **state)
{
    (void)state;
    px_diagram_species sp[3] = {{0, 1, 0, 1, "a"}, {0, 0, 1, 2, "b"}, {0, -1, -1, 3, "c"}};
    px_diagram_window w = {-1.05, 0.95, -1.05, 0.95}; /* (0,0) inside a cell */
    compare(sp, 3, &w, 21, 21);
    argmin_ctx c = {sp, 3, 0, -1};
    px_diagram_grid_options o = px_diagram_grid_options_default();
    o.nx = o.ny = 21;
    px_diagram_grid *g = NULL;
    assert_int_equal(px_diagram_grid_map(&w, argmin_label, &c, &o, &g), PX_OK);
    assert_int_equal(g->npoly, 3); /* three polylines meeting at one point */
    assert_int_equal(g->nfield, 3);
    px_diagram_grid_free(g);
}

/* A saddle: id = sign(x y); the cell centre call decides the connection. */
static int saddle_label(double x, double y, void *user, int *id)
{
    (void)user;
    *id = x * y >= 0 ? 1 : 2;
    return PX_OK;
}

static void test_grid_saddle(void **state)
{
    (void)state;
    px_diagram_window w = {-1, 1, -1, 1};
    px_diagram_grid_options o = px_diagram_grid_options_default();
    o.nx = o.ny = 4; /* the centre cell straddles (0, 0) */
    px_diagram_grid *g = NULL;
    assert_int_equal(px_diagram_grid_map(&w, saddle_label, NULL, &o, &g), PX_OK);
    assert_int_equal(g->nfield, 2);
    size_t pts = 0;
    for (size_t l = 0; l < g->npoly; l++) pts += g->poly[l].n;
    assert_true(g->npoly >= 2);
    assert_true(pts >= 4);
    px_diagram_grid_free(g);
}

static void test_grid_failure(void **state)
{
    (void)state;
    px_diagram_species sp[10];
    random_species(sp, 10, 3);
    px_diagram_window w = {0, 14, -2, 2};
    px_diagram_grid_options o = px_diagram_grid_options_default();
    o.nx = 30;
    o.ny = 30;
    /* fail during node labelling, and during bisection */
    static const long when[] = {0, 1, 450, 899, 900, 905, 1000};
    for (size_t k = 0; k < sizeof when / sizeof when[0]; k++) {
        argmin_ctx c = {sp, 10, 0, when[k]};
        px_diagram_grid *g = (px_diagram_grid *)1;
        assert_int_equal(px_diagram_grid_map(&w, argmin_label, &c, &o, &g), PX_ENOCONV);
        assert_null(g); /* and ASan finds no leak */
    }
    argmin_ctx c = {sp, 10, 0, -1};
    px_diagram_grid *g = NULL;
    o.nx = 1;
    assert_int_equal(px_diagram_grid_map(&w, argmin_label, &c, &o, &g), PX_EINVAL);
    o.nx = 30;
    o.epsrel = NAN;
    assert_int_equal(px_diagram_grid_map(&w, argmin_label, &c, &o, &g), PX_EINVAL);
    o = px_diagram_grid_options_default();
    assert_int_equal(px_diagram_grid_map(&w, NULL, &c, &o, &g), PX_EINVAL);
    px_diagram_window bad = {0, NAN, 0, 1};
    assert_int_equal(px_diagram_grid_map(&bad, argmin_label, &c, &o, &g), PX_EINVAL);
    px_diagram_grid_free(NULL);
}

/* Two fields split at x = 0.5, and a disk around (0.5, 0.5) where the
 * callback cannot label (a solver failure, id -1). */
static int hole_label(double x, double y, void *user, int *id)
{
    (void)user;
    *id = hypot(x - 0.5, y - 0.5) < 0.1 ? -1 : x < 0.5 ? 1 : 2;
    return 0;
}

static void test_grid_unlabelled(void **state)
{
    (void)state;
    px_diagram_window w = {0, 1, 0, 1};
    px_diagram_grid_options o = px_diagram_grid_options_default();
    o.nx = 21;
    o.ny = 21;
    px_diagram_grid *g = NULL;
    assert_int_equal(px_diagram_grid_map(&w, hole_label, NULL, &o, &g), PX_OK);
    assert_true(g->nfailcross > 0);
    size_t flagged = 0, clean = 0;
    for (size_t l = 0; l < g->npoly; l++) {
        const px_diagram_polyline *pl = &g->poly[l];
        for (size_t k = 0; k < pl->n; k++) {
            size_t i = pl->first + k;
            double r = hypot(g->px[i] - 0.5, g->py[i] - 0.5);
            /* flagged exactly where a crossing was bracketed next to the hole
             * (within a cell diagonal of it); the 1-2 line far away is clean */
            if (g->pfail[i]) {
                flagged++;
                assert_true(r < 0.1 + 0.05 * sqrt(2.0) + 1e-9);
            } else if (pl->id_a == 1 && pl->id_b == 2) {
                clean++;
                assert_true(r > 0.1 - 1e-9);
            }
        }
    }
    assert_true(flagged > 0);
    assert_true(clean > 10);
    px_diagram_grid_free(g);
}

int main(void)
{
    const struct CMUnitTest tests[] = {
        cmocka_unit_test(test_grid_vs_exact), cmocka_unit_test(test_grid_nernst),
        cmocka_unit_test(test_grid_triple),   cmocka_unit_test(test_grid_saddle),
        cmocka_unit_test(test_grid_failure),  cmocka_unit_test(test_grid_unlabelled),
    };
    return cmocka_run_group_tests(tests, NULL, NULL);
}
