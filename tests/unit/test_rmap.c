/* test_rmap.c - rigorous maps (src/diagram/rmap.c) give the same bytes on
 * any thread count and on every run: node labels, boundary points and
 * polylines, fields, tracer counters and the solver statistics
 * (determinism is a promise of phlox: a rerun writes identical files).
 * Maps: Cu with chloride at 25 C (the benchmark's system, smaller grid) and
 * Zn at 200 C and 50 bar, each on 1, 2 and 3 threads and once more on 2.  The labels
 * themselves are checked against exact maps in tests/scripts/test_rigorous.lua;
 * here the check is that the work split leaves no trace. */
#include "px_test.h"
#include "support/px_db_fixture.h"
#include "core/status.h"
#include "data/data.h"
#include "diagram/rmap.h"
#include "support/px_alloc_fail.h"
#include <pthread.h>
#include <stdlib.h>
#include <string.h>

typedef struct map_run {
    px_diagram_grid *g;
    px_rmap_stats st;
} map_run;

/* With chloride the S file is loaded too, as phlox.library does
 * (lib.model_elements): the isocoulombic model reactions of CuCl3^2- and
 * AgCl3^2- (Cl.lua) name HSO4^- and SO4^2-. */
static px_db *load(const char *element, const char *ligand)
{
    const int with_s = ligand && strcmp(ligand, "Cl") == 0;
    const int zs[5] = {1, 8, px_element_z(element), ligand ? px_element_z(ligand) : 0, px_element_z("S")};
    const char *const files[] = {"HO", element, ligand, with_s ? "S" : NULL, NULL}; /* no ligand: ends at element */
    return px_test_db(files, zs, ligand ? (with_s ? 5 : 4) : 3);
}

static map_run run(px_thermo_ws *ws, const px_db *db, const char *element, px_rmap_options o, int threads,
                   px_rmap_profile *prof)
{
    map_run r;
    char msg[256] = "";
    o.threads = threads;
    o.profile = prof;
    int st = px_rmap_build(ws, db, element, &o, &r.g, &r.st, msg, sizeof msg);
    if (st != PX_OK) print_error("%s\n", msg);
    assert_int_equal(st, PX_OK);
    return r;
}

/* Every member that reaches an output, compared bit for bit (memcmp on
 * doubles: -0.0 and 0.0 or two NaN payloads would count as different). */
static void assert_same(const map_run *a, const map_run *b, const char *what)
{
    const px_diagram_grid *x = a->g, *y = b->g;
    if (x->nx != y->nx || x->ny != y->ny || x->npt != y->npt || x->npoly != y->npoly || x->nfield != y->nfield) {
        print_error("%s: sizes differ (%zu points, %zu polylines, %zu fields vs %zu, %zu, %zu)\n", what, x->npt,
                    x->npoly, x->nfield, y->npt, y->npoly, y->nfield);
        fail();
    }
    for (size_t k = 0; k < x->nx * x->ny; k++)
        if (x->label[k] != y->label[k]) {
            print_error("%s: node %zu labelled %d vs %d\n", what, k, x->label[k], y->label[k]);
            fail();
        }
    for (size_t k = 0; k < x->npt; k++)
        if (memcmp(&x->px[k], &y->px[k], sizeof(double)) || memcmp(&x->py[k], &y->py[k], sizeof(double)) ||
            x->pfail[k] != y->pfail[k]) {
            print_error("%s: boundary point %zu at (%.17g, %.17g) vs (%.17g, %.17g)\n", what, k, x->px[k], x->py[k],
                        y->px[k], y->py[k]);
            fail();
        }
    for (size_t k = 0; k < x->npoly; k++) {
        const px_diagram_polyline *p = &x->poly[k], *q = &y->poly[k];
        assert_true(p->id_a == q->id_a && p->id_b == q->id_b && p->first == q->first && p->n == q->n);
    }
    for (size_t k = 0; k < x->nfield; k++) {
        const px_diagram_grid_field *f = &x->field[k], *h = &y->field[k];
        assert_int_equal(f->id, h->id);
        assert_int_equal(f->count, h->count);
        double fd[] = {f->area, f->cx, f->cy, f->xmin, f->xmax, f->ymin, f->ymax, f->label_x, f->label_y};
        double hd[] = {h->area, h->cx, h->cy, h->xmin, h->xmax, h->ymin, h->ymax, h->label_x, h->label_y};
        assert_memory_equal(fd, hd, sizeof fd);
    }
    assert_int_equal(x->ncalls, y->ncalls);
    assert_int_equal(x->ncross, y->ncross);
    assert_int_equal(x->nthird, y->nthird);
    assert_int_equal(x->nmaxiter, y->nmaxiter);
    assert_int_equal(x->nfailcross, y->nfailcross);
    const px_rmap_stats *s = &a->st, *t = &b->st;
    if (s->solves != t->solves || s->failures != t->failures || s->cold_retries != t->cold_retries ||
        memcmp(&s->I_max, &t->I_max, sizeof s->I_max)) {
        print_error("%s: statistics differ: %zu solves, %zu failures, %zu cold retries, I_max %.17g vs %zu, %zu, "
                    "%zu, %.17g\n",
                    what, s->solves, s->failures, s->cold_retries, s->I_max, t->solves, t->failures,
                    t->cold_retries, t->I_max);
        fail();
    }
    size_t nf = s->failures < PX_RMAP_FAIL_KEEP ? s->failures : PX_RMAP_FAIL_KEEP;
    assert_memory_equal(s->fail_x, t->fail_x, nf * sizeof *s->fail_x);
    assert_memory_equal(s->fail_y, t->fail_y, nf * sizeof *s->fail_y);
}

static void check_threads(const char *element, const char *ligand, double T, double P, size_t nx, size_t ny)
{
    px_db *db = load(element, ligand);
    px_thermo_ws *ws = px_thermo_ws_new(PX_DIELECTRIC_R8_97);
    assert_non_null(ws);
    px_rmap_options o = px_rmap_options_default();
    o.T = T;
    o.P = P;
    o.ligand = ligand;
    o.ligand_total = 1e-2;
    o.grid.nx = nx;
    o.grid.ny = ny;
    px_rmap_profile prof[3];
    map_run one = run(ws, db, element, o, 1, &prof[0]);
    /* a map worth the name: several fields and boundaries between them */
    assert_true(one.g->nfield >= 3);
    assert_true(one.g->npoly >= 2);
    assert_true(one.g->ncross > 0);
    assert_true(one.st.solves >= nx * ny + one.g->ncross);
    map_run two = run(ws, db, element, o, 2, &prof[1]);
    map_run three = run(ws, db, element, o, 3, &prof[2]);
    map_run again = run(ws, db, element, o, 2, NULL);
    char what[64];
    snprintf(what, sizeof what, "%s 1 vs 2 threads", element);
    assert_same(&one, &two, what);
    snprintf(what, sizeof what, "%s 1 vs 3 threads", element);
    assert_same(&one, &three, what);
    snprintf(what, sizeof what, "%s two runs on 2 threads", element);
    assert_same(&two, &again, what);
    /* every job ran once, whoever took it: row chunks, then groups of
     * crossing edges and saddle centres (at least one per crossing); the
     * tracer found every label it asked for */
    for (int k = 0; k < 3; k++) {
        size_t jobs = 0;
        assert_int_equal(prof[k].threads, k + 1);
        for (int t = 0; t < prof[k].threads; t++) jobs += prof[k].jobs[t];
        assert_int_equal(jobs, prof[k].chunks + prof[k].edge_jobs);
        assert_true(prof[k].edges >= one.g->ncross && prof[k].edge_jobs <= prof[k].edges);
        assert_int_equal(prof[k].edges, prof[0].edges);
        assert_int_equal(prof[k].missed, 0);
    }
    px_diagram_grid_free(one.g);
    px_diagram_grid_free(two.g);
    px_diagram_grid_free(three.g);
    px_diagram_grid_free(again.g);
    px_thermo_ws_free(ws);
    px_db_free(db);
}

static void test_copper_chloride(void **state)
{
    (void)state;
    check_threads("Cu", "Cl", 298.15, 1.0, 61, 41);
}

static void test_zinc_hot(void **state)
{
    (void)state;
    check_threads("Zn", NULL, 473.15, 50.0, 43, 31); /* liquid: above saturation (15.5 bar) */
}

/* Fewer rows than threads, and the smallest grid: still one map. */
static void test_tiny_grids(void **state)
{
    (void)state;
    px_db *db = load("Cu", NULL);
    px_thermo_ws *ws = px_thermo_ws_new(PX_DIELECTRIC_R8_97);
    px_rmap_options o = px_rmap_options_default();
    o.grid.nx = 9;
    o.grid.ny = 2;
    map_run a = run(ws, db, "Cu", o, 1, NULL), b = run(ws, db, "Cu", o, 5, NULL);
    assert_same(&a, &b, "Cu 9 x 2 on 1 and 5 threads");
    px_diagram_grid_free(a.g);
    px_diagram_grid_free(b.g);
    /* a grid the tracer refuses is refused on any thread count */
    o.grid.ny = 1;
    o.threads = 3;
    px_diagram_grid *g = NULL;
    px_rmap_stats st;
    assert_int_equal(px_rmap_build(ws, db, "Cu", &o, &g, &st, NULL, 0), PX_EINVAL);
    assert_null(g);
    px_thermo_ws_free(ws);
    px_db_free(db);
}

/* Cu with 0.01 mol/kg chloride on an nx by ny grid. */
static px_rmap_options cu_cl(size_t nx, size_t ny)
{
    px_rmap_options o = px_rmap_options_default();
    o.ligand = "Cl";
    o.ligand_total = 1e-2;
    o.grid.nx = nx;
    o.grid.ny = ny;
    return o;
}

/* Every allocation of a build goes through px_rmap_options.alloc: failing
 * the Nth one gives PX_ENOMEM with nothing leaked, never a map missing a
 * part; once none fails, the map is the one built with malloc. */
static void test_alloc_failure(void **state)
{
    (void)state;
    px_db *db = load("Cu", "Cl");
    px_thermo_ws *ws = px_thermo_ws_new(PX_DIELECTRIC_R8_97);
    px_rmap_options o = cu_cl(9, 7);
    map_run plain = run(ws, db, "Cu", o, 1, NULL);
    int succeeded = 0;
    for (long nth = 0; nth < 5000 && !succeeded; nth++) {
        px_alloc_fail f;
        px_allocator al = px_alloc_fail_make(&f, nth);
        o.alloc = &al;
        o.threads = 1; /* px_alloc_fail is not thread-safe */
        map_run r = {NULL, {0}};
        char msg[256] = "";
        int st = px_rmap_build(ws, db, "Cu", &o, &r.g, &r.st, msg, sizeof msg);
        assert_true(st == PX_OK || st == PX_ENOMEM);
        if (st == PX_OK) { /* only when no allocation failed: a failure is never swallowed */
            assert_true(f.left >= 0);
            assert_true(f.live > 0); /* the grid came from the allocator */
            assert_same(&plain, &r, "Cu 9 x 7 with and without the allocator");
            succeeded = 1;
        } else {
            assert_null(r.g);
        }
        px_diagram_grid_free(r.g);
        assert_int_equal(f.live, 0); /* every allocation released */
    }
    assert_true(succeeded);
    px_diagram_grid_free(plain.g);
    px_thermo_ws_free(ws);
    px_db_free(db);
}

/* A thread-safe counting allocator: the workers' allocations (bisection
 * points) go through it too, and the map stays the same bytes. */
typedef struct counted {
    pthread_mutex_t mu;
    long calls, live;
} counted;

static void *counted_alloc(void *ud, size_t n)
{
    counted *c = ud;
    void *p = malloc(n);
    pthread_mutex_lock(&c->mu);
    c->calls++;
    if (p) c->live++;
    pthread_mutex_unlock(&c->mu);
    return p;
}

static void counted_release(void *ud, void *p)
{
    counted *c = ud;
    if (!p) return;
    pthread_mutex_lock(&c->mu);
    c->live--;
    pthread_mutex_unlock(&c->mu);
    free(p);
}

static void test_alloc_threads(void **state)
{
    (void)state;
    px_db *db = load("Cu", "Cl");
    px_thermo_ws *ws = px_thermo_ws_new(PX_DIELECTRIC_R8_97);
    px_rmap_options o = cu_cl(31, 21);
    map_run plain = run(ws, db, "Cu", o, 1, NULL);
    counted c = {PTHREAD_MUTEX_INITIALIZER, 0, 0};
    px_allocator al = {counted_alloc, counted_release, &c};
    o.alloc = &al;
    for (int threads = 1; threads <= 3; threads++) {
        map_run r = run(ws, db, "Cu", o, threads, NULL);
        assert_same(&plain, &r, "Cu 31 x 21 through a counting allocator");
        px_diagram_grid_free(r.g);
        assert_int_equal(c.live, 0);
    }
    assert_true(c.calls > 0);
    px_diagram_grid_free(plain.g);
    px_thermo_ws_free(ws);
    px_db_free(db);
}

int main(void)
{
    const struct CMUnitTest tests[] = {cmocka_unit_test(test_copper_chloride), cmocka_unit_test(test_zinc_hot),
                                       cmocka_unit_test(test_tiny_grids), cmocka_unit_test(test_alloc_failure),
                                       cmocka_unit_test(test_alloc_threads)};
    return cmocka_run_group_tests(tests, NULL, NULL);
}
