/* test_diagram_water.c - water stability lines, neutral pH and reference
 * electrodes (src/diagram/water.c).
 *
 * Checks: the textbook 25 C lines E = 1.229 - 0.05916 pH (O2/H2O) and
 * E = -0.05916 pH (H+/H2) at unit fugacity, with E0 read from
 * tests/reference/standard_potentials.csv; the fugacity terms (Nernst);
 * neutral pH from pKw in water.csv (IAPWS R11-07); reference-electrode
 * offsets against the values in the task's cited sources and the ordering
 * the Nernst equation demands for Ag/AgCl. */
#include "px_test.h"
#include "support/px_csv.h"
#include "core/constants.h"
#include "core/status.h"
#include "diagram/diagram.h"
#include "diagram/potential.h"
#include <stdlib.h>
#include <string.h>

static void test_water_lines(void **state)
{
    (void)state;
    double E0 = px_ref_E0("O2(g) + 4 H^+ + 4 e- = 2 H2O(l)");
    assert_close(E0, 1.229, 0, 1e-9);
    double s = px_diagram_nernst_slope(PX_TR);
    for (double pH = 0; pH <= 14; pH += 0.5) {
        /* textbook lines at 25 C, 1 bar O2 / H2 (Nernst, 0.05916 V per pH) */
        assert_close(px_diagram_water_o2_line(pH, E0, s, 0), 1.229 - 0.05916 * pH, 0, 1e-5);
        assert_close(px_diagram_water_h2_line(pH, s, 0), -0.05916 * pH, 0, 1e-5);
    }
    /* at pH 7: 0.815 V and -0.414 V (common textbook values) */
    assert_close(px_diagram_water_o2_line(7, E0, s, 0), 0.815, 0, 5e-4);
    assert_close(px_diagram_water_h2_line(7, s, 0), -0.414, 0, 5e-4);
    /* fugacity terms: (s/4) log fO2 and -(s/2) log fH2 */
    assert_close(px_diagram_water_o2_line(0, E0, s, -0.68), E0 - 0.17 * s, 1e-14, 0);
    assert_close(px_diagram_water_h2_line(0, s, -2), s, 1e-14, 0);
    /* the lines stay 1.229 V apart at any pH and follow T through s */
    double s100 = px_diagram_nernst_slope(373.15);
    assert_close(px_diagram_water_o2_line(10, E0, s100, 0) - px_diagram_water_h2_line(10, s100, 0),
                 E0, 1e-14, 0);
    assert_close(px_diagram_water_h2_line(1, s100, 0) / px_diagram_water_h2_line(1, s, 0),
                 373.15 / 298.15, 1e-14, 0);
}

static void test_neutral_ph(void **state)
{
    (void)state;
    /* pKw at 25 C, 0.1 MPa: 13.995 (IAPWS R11-07, water.csv) -> 6.9975 */
    assert_close(px_diagram_neutral_ph(13.995), 6.9975, 0, 1e-12);
    /* Kw of pure water rises with T; 0 C pKw 14.9467 (water.csv, computed) */
    assert_true(px_diagram_neutral_ph(14.9467) > px_diagram_neutral_ph(13.995));
}

static void test_electrodes(void **state)
{
    (void)state;
    /* offsets vs SHE at 25 C (sources in water.c; the task's values) */
    static const struct { int e; double v; } want[] = {
        {PX_ELECTRODE_SHE, 0.0},        {PX_ELECTRODE_SCE, 0.241},
        {PX_ELECTRODE_AGCL_SAT, 0.197}, {PX_ELECTRODE_AGCL_3_5M, 0.205},
        {PX_ELECTRODE_CSE, 0.316},
    };
    for (size_t i = 0; i < sizeof want / sizeof want[0]; i++) {
        const px_diagram_electrode_info *e = px_diagram_electrode_get(want[i].e);
        assert_non_null(e);
        assert_close(e->offset_V, want[i].v, 0, 1e-12);
        assert_non_null(e->source);
        assert_true(strlen(e->source) > 10);
        double she, back;
        assert_int_equal(px_diagram_electrode_to_she(want[i].e, -0.5, &she), PX_OK);
        assert_close(she, -0.5 + want[i].v, 0, 1e-15);
        assert_int_equal(px_diagram_electrode_from_she(want[i].e, she, &back), PX_OK);
        assert_close(back, -0.5, 0, 1e-15);
    }
    /* Nernst for AgCl + e- = Ag + Cl-: more chloride, lower potential, so
     * E(sat. KCl) < E(3.5 M KCl) < E0 (a = 1, 0.22233 V, CRC via csv) */
    double E0 = px_ref_E0("AgCl(s) + e- = Ag(s) + Cl^-");
    assert_true(px_diagram_electrode_get(PX_ELECTRODE_AGCL_SAT)->offset_V <
                px_diagram_electrode_get(PX_ELECTRODE_AGCL_3_5M)->offset_V);
    assert_true(px_diagram_electrode_get(PX_ELECTRODE_AGCL_3_5M)->offset_V < E0);
    /* a steel potential of -0.85 V vs Cu/CuSO4 is -0.534 V vs SHE */
    double she;
    assert_int_equal(px_diagram_electrode_to_she(PX_ELECTRODE_CSE, -0.85, &she), PX_OK);
    assert_close(she, -0.534, 0, 1e-12);
    /* bad input */
    assert_null(px_diagram_electrode_get(-1));
    assert_null(px_diagram_electrode_get(PX_ELECTRODE_COUNT));
    assert_int_equal(px_diagram_electrode_to_she(99, 0, &she), PX_EINVAL);
    assert_int_equal(px_diagram_electrode_to_she(PX_ELECTRODE_SCE, NAN, &she), PX_EINVAL);
    assert_int_equal(px_diagram_electrode_from_she(PX_ELECTRODE_SCE, INFINITY, &she), PX_EINVAL);
    assert_int_equal(px_diagram_electrode_to_she(PX_ELECTRODE_SCE, 0, NULL), PX_EINVAL);
}

int main(void)
{
    const struct CMUnitTest tests[] = {
        cmocka_unit_test(test_water_lines),
        cmocka_unit_test(test_neutral_ph),
        cmocka_unit_test(test_electrodes),
    };
    return cmocka_run_group_tests(tests, NULL, NULL);
}
