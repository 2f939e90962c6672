/* test_practice.c - the rules of src/thermo/practice.c on the embedded
 * standard library: ligand oxidation states by formal oxidation state (IUPAC
 * rules: H +1, O -2), the inhibited-solid list, the corrosion domain of a
 * field (src/diagram/emap.c) and the reference-electrode temperature range
 * (src/diagram/water.c). */
#include "px_test.h"
#include "support/px_db_fixture.h"
#include "core/constants.h"
#include "core/status.h"
#include "data/data.h"
#include "diagram/emap.h"
#include "diagram/potential.h"
#include "thermo/practice.h"
#include <string.h>

static px_db *library(void)
{
    static const int zs[] = {1, 6, 7, 8, 12, 16, 20, 26, 29};
    static const char *const files[] = {"HO", "Cu", "Fe", "Mg", "Ca", "S", "C", "N", NULL};
    return px_test_db(files, zs, sizeof zs / sizeof zs[0]);
}

static int allowed(const px_ligand_states *ls, const px_db *db, const char *formula, int skip)
{
    const px_species *sp = px_db_find(db, formula);
    assert_non_null(sp);
    return px_ligand_allows(ls, db, &sp->f, skip);
}

static void test_ligand_states(void **state)
{
    (void)state;
    px_db *db = library();
    px_ligand_states ls = px_ligand_states_default();
    /* ammonia kept: N at -3 in NH4+, NH3 and the copper ammines (Cu +1, +2) */
    assert_true(allowed(&ls, db, "NH4^+", 0));
    assert_true(allowed(&ls, db, "Cu(NH3)4^2+", 29));
    assert_true(allowed(&ls, db, "Cu(NH3)2^+", 29));
    assert_false(allowed(&ls, db, "N2(g)", 0));   /* N 0 */
    assert_false(allowed(&ls, db, "NO3^-", 0));   /* N +5 */
    /* carbonate kept: C +4 with Fe +2, Mg and Ca +2 (two metals: a range) */
    assert_true(allowed(&ls, db, "HCO3^-", 0));
    assert_true(allowed(&ls, db, "FeCO3(s,siderite)", 26));
    assert_true(allowed(&ls, db, "CaMg(CO3)2(s,dolomite)", 0));
    assert_false(allowed(&ls, db, "CH4(g)", 0));  /* C -4 */
    assert_false(allowed(&ls, db, "CO(g)", 0));   /* C +2 */
    /* sulfur in full redox by default; pinned to sulfate, FeS would need Fe -6 */
    assert_true(allowed(&ls, db, "FeS(s,troilite)", 26));
    char msg[256];
    assert_int_equal(px_ligand_states_set(&ls, "S", "sulfate", msg, sizeof msg), PX_OK);
    assert_false(allowed(&ls, db, "FeS(s,troilite)", 26));
    assert_false(allowed(&ls, db, "HS^-", 0));
    assert_true(allowed(&ls, db, "CaSO4*2H2O(s,gypsum)", 0));
    /* a map of nitrogen itself is never pinned */
    assert_true(allowed(&ls, db, "N2(g)", 7));
    assert_int_equal(px_ligand_states_set(&ls, "N", "full", msg, sizeof msg), PX_OK);
    assert_true(allowed(&ls, db, "N2(g)", 0));
    assert_int_equal(px_ligand_states_set(&ls, "Cl", "full", msg, sizeof msg), PX_EINVAL);
    assert_true(strstr(msg, "Cl") != NULL);
    assert_int_equal(px_ligand_states_set(&ls, "C", "graphite", msg, sizeof msg), PX_EINVAL);
    char text[256];
    int zs[] = {29, 7, 6};
    px_ligand_states d = px_ligand_states_default();
    px_ligand_states_describe(&d, zs, 3, 29, text, sizeof text);
    assert_string_equal(text, "N as ammonia/ammonium only (-3); C as carbonate only (+4)");
    px_db_free(db);
}

static void test_inhibited_and_domains(void **state)
{
    (void)state;
    px_db *db = library();
    const px_species *dol = px_db_find(db, "CaMg(CO3)2(s,dolomite)");
    assert_non_null(px_inhibited_at(&dol->f, 298.15));
    assert_null(px_inhibited_at(&dol->f, 150.0 + PX_T0C));
    assert_null(px_inhibited_at(&px_db_find(db, "CaCO3(s,calcite)")->f, 298.15));
    size_t n;
    const px_inhibited_solid *v = px_inhibited_solids(&n);
    for (size_t i = 0; i < n; i++) assert_true(strlen(v[i].source) > 20);
    static const struct { const char *f; int z, d; } dom[] = {
        {"Fe(s)", 26, PX_DIAGRAM_IMMUNITY},          {"Fe3O4(s,magnetite)", 26, PX_DIAGRAM_PASSIVATION},
        {"FeS(s,troilite)", 26, PX_DIAGRAM_SULFIDE_FILM}, {"FeS2(s,pyrite)", 26, PX_DIAGRAM_SULFIDE_FILM},
        {"Cu2S(s,chalcocite)", 29, PX_DIAGRAM_SULFIDE_FILM}, {"CuSO4(s,chalcocyanite)", 29, PX_DIAGRAM_PASSIVATION},
        {"Fe^2+", 26, PX_DIAGRAM_CORROSION},         {"FeCO3(s,siderite)", 26, PX_DIAGRAM_PASSIVATION},
    };
    for (size_t i = 0; i < sizeof dom / sizeof dom[0]; i++)
        assert_int_equal(px_emap_domain(&px_db_find(db, dom[i].f)->f, dom[i].z), dom[i].d);
    px_db_free(db);
}

static void test_electrode_range(void **state)
{
    (void)state;
    double off;
    assert_int_equal(px_diagram_electrode_offset_at(PX_ELECTRODE_SHE, 573.15, &off), PX_OK);
    assert_true(off == 0.0);
    assert_int_equal(px_diagram_electrode_offset_at(PX_ELECTRODE_SCE, 298.15, &off), PX_OK);
    assert_close(off, 0.241, 0, 1e-15);
    /* linear in T inside 0-60 C, with the sign of the coefficient */
    double a, b;
    assert_int_equal(px_diagram_electrode_offset_at(PX_ELECTRODE_SCE, 313.15, &a), PX_OK);
    assert_int_equal(px_diagram_electrode_offset_at(PX_ELECTRODE_SCE, 328.15, &b), PX_OK);
    assert_true(a < 0.241 && b < a);
    assert_close(b - a, a - 0.241, 0, 1e-12);
    assert_int_equal(px_diagram_electrode_offset_at(PX_ELECTRODE_CSE, 323.15, &a), PX_OK);
    assert_true(a > 0.316);
    for (int e = PX_ELECTRODE_SCE; e < PX_ELECTRODE_COUNT; e++)
        assert_int_equal(px_diagram_electrode_offset_at(e, 423.15, &off), PX_ERANGE);
    assert_int_equal(px_diagram_electrode_offset_at(PX_ELECTRODE_COUNT, 298.15, &off), PX_EINVAL);
}

int main(void)
{
    const struct CMUnitTest tests[] = {cmocka_unit_test(test_ligand_states), cmocka_unit_test(test_inhibited_and_domains),
                                       cmocka_unit_test(test_electrode_range)};
    return cmocka_run_group_tests(tests, NULL, NULL);
}
