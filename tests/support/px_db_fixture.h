/* px_db_fixture.h - a species database and thermo workspace for the C
 * tests that need real data: the built-in species plus embedded element
 * files, shared by the tests of a group (cmocka group setup/teardown).
 *   px_test_db(files, zs, nz)        built-ins + the embedded files named in
 *                                    files (NULL-terminated), species of the
 *                                    elements zs[0..nz) only; fails the test
 *                                    on any error
 *   px_db_fixture_new(state, db)     *state = { db, ws } (R8-97 dielectric)
 *   px_db_fixture_free(state)        the group teardown
 * Needs px_test.h (cmocka) first. */
#ifndef PX_TEST_DB_FIXTURE_H
#define PX_TEST_DB_FIXTURE_H
#include "core/status.h"
#include "data/data.h"
#include <stdlib.h>

typedef struct px_db_fixture {
    px_db *db;
    px_thermo_ws *ws;
} px_db_fixture;

static inline px_db *px_test_db(const char *const *files, const int *zs, size_t nz)
{
    px_db *db = px_db_new();
    assert_non_null(db);
    assert_int_equal(px_db_add_builtins(db), PX_OK);
    px_data_options o = px_data_options_default();
    o.elements = zs;
    o.n_elements = nz;
    for (size_t i = 0; files[i]; i++) assert_int_equal(px_data_load_embedded(db, files[i], &o, NULL), PX_OK);
    return db;
}

static inline int px_db_fixture_new(void **state, px_db *db)
{
    px_db_fixture *fx = malloc(sizeof *fx);
    if (!fx) return -1;
    fx->db = db;
    fx->ws = px_thermo_ws_new(PX_DIELECTRIC_R8_97);
    *state = fx;
    return fx->ws ? 0 : -1;
}

static inline int px_db_fixture_free(void **state)
{
    px_db_fixture *fx = *state;
    px_thermo_ws_free(fx->ws);
    px_db_free(fx->db);
    free(fx);
    return 0;
}

#endif
