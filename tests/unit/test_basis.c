/* test_basis.c - formation reactions over a basis, checked against reactions
 * balanced by hand (textbook stoichiometry). */
#include "px_test.h"
#include "core/status.h"
#include "thermo/basis.h"
#include <string.h>

enum { H = 1, C = 6, O = 8, S = 16, CL = 17, ZN = 30 };

static px_formula mk(const char *text, int charge, int n, const int *z, const double *cnt)
{
    px_formula f;
    memset(&f, 0, sizeof f);
    strncpy(f.text, text, sizeof f.text - 1);
    f.charge = charge;
    f.n_elem = n;
    for (int i = 0; i < n; i++) {
        f.elem[i].z = z[i];
        f.elem[i].n = cnt[i];
    }
    return f;
}

static void test_zinc_species(void **state)
{
    (void)state;
    px_formula h2o = mk("H2O(l)", 0, 2, (int[]){H, O}, (double[]){2, 1});
    px_formula hp = mk("H^+", 1, 1, (int[]){H}, (double[]){1});
    px_formula el = mk("e-", -1, 0, NULL, NULL);
    px_formula zn2 = mk("Zn^2+", 2, 1, (int[]){ZN}, (double[]){1});
    px_formula cl = mk("Cl^-", -1, 1, (int[]){CL}, (double[]){1});
    const px_formula *basis[] = {&h2o, &hp, &el, &zn2, &cl};
    double nu[5];

    /* ZnO(s) + 2 H+ = Zn2+ + H2O  ->  ZnO = Zn2+ + H2O - 2 H+ */
    px_formula zno = mk("ZnO(s)", 0, 2, (int[]){O, ZN}, (double[]){1, 1});
    assert_int_equal(px_basis_formation(basis, 5, &zno, nu, NULL, 0), PX_OK);
    assert_close(nu[0], 1, 0, 1e-12);
    assert_close(nu[1], -2, 0, 1e-12);
    assert_close(nu[2], 0, 0, 1e-12);
    assert_close(nu[3], 1, 0, 1e-12);

    /* Zn(s) = Zn2+ + 2 e- */
    px_formula zn = mk("Zn(s)", 0, 1, (int[]){ZN}, (double[]){1});
    assert_int_equal(px_basis_formation(basis, 5, &zn, nu, NULL, 0), PX_OK);
    assert_close(nu[2], 2, 0, 1e-12);
    assert_close(nu[3], 1, 0, 1e-12);

    /* Zn(OH)4^2- = Zn2+ + 4 H2O - 4 H+ */
    px_formula zoh4 = mk("Zn(OH)4^2-", -2, 3, (int[]){H, O, ZN}, (double[]){4, 4, 1});
    assert_int_equal(px_basis_formation(basis, 5, &zoh4, nu, NULL, 0), PX_OK);
    assert_close(nu[0], 4, 0, 1e-12);
    assert_close(nu[1], -4, 0, 1e-12);
    assert_close(nu[3], 1, 0, 1e-12);

    /* ZnCl4^2- = Zn2+ + 4 Cl- */
    px_formula zcl4 = mk("ZnCl4^2-", -2, 2, (int[]){CL, ZN}, (double[]){4, 1});
    assert_int_equal(px_basis_formation(basis, 5, &zcl4, nu, NULL, 0), PX_OK);
    assert_close(nu[4], 4, 0, 1e-12);

    /* O2(g) = 2 H2O - 4 H+ - 4 e-  (water oxidation written backwards) */
    px_formula o2 = mk("O2(g)", 0, 1, (int[]){O}, (double[]){2});
    assert_int_equal(px_basis_formation(basis, 5, &o2, nu, NULL, 0), PX_OK);
    assert_close(nu[0], 2, 0, 1e-12);
    assert_close(nu[1], -4, 0, 1e-12);
    assert_close(nu[2], -4, 0, 1e-12);
}

static void test_sulfur_switch(void **state)
{
    (void)state;
    /* SO4^2- over the basis {H2O, H+, e-, HS-}: SO4^2- + 9 H+ + 8 e- = HS- + 4 H2O */
    px_formula h2o = mk("H2O(l)", 0, 2, (int[]){H, O}, (double[]){2, 1});
    px_formula hp = mk("H^+", 1, 1, (int[]){H}, (double[]){1});
    px_formula el = mk("e-", -1, 0, NULL, NULL);
    px_formula hs = mk("HS^-", -1, 2, (int[]){H, S}, (double[]){1, 1});
    px_formula so4 = mk("SO4^2-", -2, 2, (int[]){O, S}, (double[]){4, 1});
    const px_formula *basis[] = {&h2o, &hp, &el, &hs};
    double nu[4];
    assert_int_equal(px_basis_formation(basis, 4, &so4, nu, NULL, 0), PX_OK);
    assert_close(nu[0], 4, 0, 1e-12);
    assert_close(nu[1], -9, 0, 1e-12);
    assert_close(nu[2], -8, 0, 1e-12);
    assert_close(nu[3], 1, 0, 1e-12);
}

static void test_errors(void **state)
{
    (void)state;
    px_formula h2o = mk("H2O(l)", 0, 2, (int[]){H, O}, (double[]){2, 1});
    px_formula hp = mk("H^+", 1, 1, (int[]){H}, (double[]){1});
    px_formula oh = mk("OH^-", -1, 2, (int[]){H, O}, (double[]){1, 1});
    px_formula el = mk("e-", -1, 0, NULL, NULL);
    px_formula co2 = mk("CO2(aq)", 0, 2, (int[]){C, O}, (double[]){1, 2});
    char msg[128];
    double nu[4];
    /* target element missing from the basis */
    const px_formula *b1[] = {&h2o, &hp, &el};
    assert_int_equal(px_basis_formation(b1, 3, &co2, nu, msg, sizeof msg), PX_EINVAL);
    assert_non_null(strstr(msg, "CO2(aq)"));
    /* dependent basis: H2O, H+, OH- span only H, O, charge with a dependency */
    const px_formula *b2[] = {&h2o, &hp, &oh};
    assert_int_equal(px_basis_formation(b2, 3, &h2o, nu, msg, sizeof msg), PX_ESINGULAR);
    /* wrong size */
    const px_formula *b3[] = {&h2o, &hp};
    assert_int_equal(px_basis_formation(b3, 2, &h2o, nu, msg, sizeof msg), PX_ESINGULAR);
    assert_int_equal(px_basis_formation(NULL, 2, &h2o, nu, msg, sizeof msg), PX_EINVAL);
}

int main(void)
{
    const struct CMUnitTest tests[] = {
        cmocka_unit_test(test_zinc_species),
        cmocka_unit_test(test_sulfur_switch),
        cmocka_unit_test(test_errors),
    };
    return cmocka_run_group_tests(tests, NULL, NULL);
}
