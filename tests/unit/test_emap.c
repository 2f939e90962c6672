/* test_emap.c - element maps from the embedded standard library, checked in
 * C against the Nernst equation (E = E0 + (RT ln10 / 2F) log a for
 * Zn2+/Zn: 0.1775 V below E0 at a = 1e-6, textbook) and the tiling rules;
 * and a failing allocation-free misuse path; every allocation of a map
 * build failing in turn (tests/support/px_alloc_fail.h). */
#include "px_test.h"
#include "support/px_alloc_fail.h"
#include "support/px_db_fixture.h"
#include "core/constants.h"
#include "core/status.h"
#include "data/data.h"
#include "diagram/emap.h"
#include <stdlib.h>
#include <string.h>

/* Built-ins, water and Zn, shared by every test of the group. */
static int setup(void **state)
{
    static const char *const files[] = {"HO", "Zn", NULL};
    static const int zs[] = {1, 8, 30};
    return px_db_fixture_new(state, px_test_db(files, zs, sizeof zs / sizeof zs[0]));
}

/* The zinc map with options o. */
static px_emap *zinc_map(const px_db_fixture *fx, const px_emap_options *o)
{
    px_emap *m = NULL;
    char msg[256];
    assert_int_equal(px_emap_build(fx->ws, fx->db, "Zn", o, &m, msg, sizeof msg), PX_OK);
    return m;
}

static void test_zinc_map(void **state)
{
    const px_db_fixture *fx = *state;
    px_db *db = fx->db;
    px_thermo_ws *ws = fx->ws;
    px_emap_options o = px_emap_options_default();
    px_emap *m = zinc_map(fx, &o);
    char msg[256];

    px_reaction r;
    px_reaction_result rr;
    assert_int_equal(px_reaction_parse_balanced("Zn^2+ + 2 e- = Zn(s)", &r, NULL, 0), PX_OK);
    assert_int_equal(px_reaction_props(ws, db, &r, o.T, o.P, &rr), PX_OK);
    double slope = PX_R * o.T * PX_LN10 / PX_F;
    int found = 0;
    for (size_t b = 0; b < m->map->nboundary; b++) {
        const char *a = px_db_get(db, (size_t)m->bnd[b].a)->f.text;
        const char *c = px_db_get(db, (size_t)m->bnd[b].b)->f.text;
        if ((!strcmp(a, "Zn^2+") && !strcmp(c, "Zn(s)")) || (!strcmp(c, "Zn^2+") && !strcmp(a, "Zn(s)"))) {
            found = 1;
            assert_close(m->map->boundary[b].a, rr.E + 0.5 * slope * -6.0, 0, 1e-9);
            assert_close(m->map->boundary[b].b, 0.0, 0, 1e-12);
            assert_string_equal(m->bnd[b].reaction, "Zn^2+ + 2 e- = Zn(s)");
        }
    }
    assert_true(found);
    /* joined outlines and domains both tile the 14 x 4 window */
    double area = 0, dom = 0;
    for (size_t i = 0; i < m->n_outline; i++) area += m->outline[i].area;
    for (size_t i = 0; i < m->domains->nloop; i++) dom += m->domains->loop[i].area;
    assert_close(area, 56.0, 1e-9, 0);
    assert_close(dom, 56.0, 1e-9, 0);
    assert_close(m->E0_o2, 1.229, 0, 1e-3); /* O2/H2O, CRC Handbook */
    assert_close(m->nernst_slope, 0.05916, 0, 1e-5);
    px_emap_free(m);

    /* misuse: unknown element and a log a axis without a ligand */
    assert_int_equal(px_emap_build(ws, db, "Xx", &o, &m, msg, sizeof msg), PX_EINVAL);
    assert_non_null(strstr(msg, "Xx"));
    o.xaxis = PX_AXIS_LOGA;
    assert_int_equal(px_emap_build(ws, db, "Zn", &o, &m, msg, sizeof msg), PX_EINVAL);
    px_emap_free(NULL);
}

/* Every allocation of the map build failing in turn: PX_ENOMEM, nothing
 * held (ASan reports any leak), and PX_OK only once none fails, with the
 * same map as with malloc. */
static void test_alloc_failure(void **state)
{
    const px_db_fixture *fx = *state;
    px_emap_options o = px_emap_options_default();
    px_emap *ref = zinc_map(fx, &o);
    int done = 0;
    for (long nth = 0; nth < 5000 && !done; nth++) {
        px_alloc_fail f;
        px_allocator al = px_alloc_fail_make(&f, nth);
        o.alloc = &al;
        px_emap *m = NULL;
        char msg[256];
        int st = px_emap_build(fx->ws, fx->db, "Zn", &o, &m, msg, sizeof msg);
        if (st == PX_OK) { /* only when no allocation failed: a failure is never swallowed */
            assert_true(f.left >= 0);
            done = 1;
            assert_int_equal(m->map->nfield, ref->map->nfield);
            assert_int_equal(m->map->nboundary, ref->map->nboundary);
            px_emap_free(m);
        } else {
            assert_int_equal(st, PX_ENOMEM);
            assert_null(m);
        }
        assert_int_equal(f.live, 0);
    }
    assert_true(done);
    px_emap_free(ref);
}

int main(void)
{
    const struct CMUnitTest tests[] = {cmocka_unit_test(test_zinc_map), cmocka_unit_test(test_alloc_failure)};
    return cmocka_run_group_tests(tests, setup, px_db_fixture_free);
}
