/* test_emap.c - element maps from the embedded standard library, checked in
 * C against the Nernst equation (E = E0 + (RT ln10 / 2F) log a for
 * Zn2+/Zn: 0.1775 V below E0 at a = 1e-6, textbook) and the tiling rules;
 * and a failing allocation-free misuse path. */
#include "px_test.h"
#include "core/constants.h"
#include "core/status.h"
#include "data/data.h"
#include "diagram/emap.h"
#include <string.h>

static px_db *zinc_db(void)
{
    static const int zs[] = {1, 8, 30};
    px_db *db = px_db_new();
    assert_non_null(db);
    assert_int_equal(px_db_add_builtins(db), PX_OK);
    px_data_options o = px_data_options_default();
    o.elements = zs;
    o.n_elements = 3;
    assert_int_equal(px_data_load_embedded(db, "HO", &o, NULL), PX_OK);
    assert_int_equal(px_data_load_embedded(db, "Zn", &o, NULL), PX_OK);
    return db;
}

static void test_zinc_map(void **state)
{
    (void)state;
    px_db *db = zinc_db();
    px_thermo_ws *ws = px_thermo_ws_new(PX_DIELECTRIC_R8_97);
    px_emap_options o = px_emap_options_default();
    px_emap *m;
    char msg[256];
    assert_int_equal(px_emap_build(ws, db, "Zn", &o, &m, msg, sizeof msg), PX_OK);

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
    px_thermo_ws_free(ws);
    px_db_free(db);
}

int main(void)
{
    const struct CMUnitTest tests[] = {cmocka_unit_test(test_zinc_map)};
    return cmocka_run_group_tests(tests, NULL, NULL);
}
