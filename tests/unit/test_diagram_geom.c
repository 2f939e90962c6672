/* test_diagram_geom.c - polygon helpers (src/diagram/geometry.c).
 *
 * Known answers from plane geometry: shoelace areas of a square and a
 * 3-4-5 triangle; the pole of inaccessibility of a rectangle is its centre
 * (distance half the short side) and of a triangle its incentre (distance
 * the inradius, r = area / semi-perimeter: 1 at (1, 1) for the 3-4-5
 * right triangle); for an L-shape the pole is held against a plain dense
 * search in the same run. */
#include "px_test.h"
#include "core/status.h"
#include "diagram/diagram.h"

static void test_area_contains(void **state)
{
    (void)state;
    double sx[4] = {0, 1, 1, 0}, sy[4] = {0, 0, 1, 1};
    assert_close(px_diagram_polygon_area(sx, sy, 4), 1.0, 0, 1e-15);
    double rx[4] = {0, 0, 1, 1}, ry[4] = {0, 1, 1, 0}; /* clockwise */
    assert_close(px_diagram_polygon_area(rx, ry, 4), -1.0, 0, 1e-15);
    double tx[3] = {0, 4, 0}, ty[3] = {0, 0, 3};
    assert_close(px_diagram_polygon_area(tx, ty, 3), 6.0, 0, 1e-15);
    assert_true(px_diagram_polygon_contains(sx, sy, 4, 0.5, 0.5));
    assert_false(px_diagram_polygon_contains(sx, sy, 4, 1.5, 0.5));
    assert_true(px_diagram_polygon_contains(tx, ty, 3, 1, 1));
    assert_false(px_diagram_polygon_contains(tx, ty, 3, 3, 2));
    /* non-convex: an L; the notch is outside */
    double lx[6] = {0, 4, 4, 1, 1, 0}, ly[6] = {0, 0, 1, 1, 4, 4};
    assert_true(px_diagram_polygon_contains(lx, ly, 6, 0.5, 3));
    assert_false(px_diagram_polygon_contains(lx, ly, 6, 3, 3));
    assert_close(px_diagram_polygon_distance(lx, ly, 6, 0.5, 3), 0.5, 0, 1e-15);
    assert_close(px_diagram_polygon_distance(lx, ly, 6, 3, 3), -2.0, 0, 1e-15);
    assert_close(px_diagram_polygon_area(NULL, ly, 6), 0, 0, 0);
}

static void test_pole(void **state)
{
    (void)state;
    double x, y, d;
    double rx[4] = {0, 4, 4, 0}, ry[4] = {0, 0, 2, 2};
    /* the best points form a segment (x in [1, 3], y = 1): every cell on it
     * stays a candidate, so ask for a label-sized precision */
    assert_int_equal(px_diagram_polygon_pole(rx, ry, 4, 1e-4, NULL, &x, &y, &d), PX_OK);
    assert_close(d, 1.0, 0, 1e-4);
    assert_close(y, 1.0, 0, 1e-4);
    assert_true(x >= 1.0 - 1e-4 && x <= 3.0 + 1e-4); /* any point of the mid segment */
    double tx[3] = {0, 4, 0}, ty[3] = {0, 0, 3};
    assert_int_equal(px_diagram_polygon_pole(tx, ty, 3, 1e-7, NULL, &x, &y, &d), PX_OK);
    assert_close(d, 1.0, 0, 1e-7);
    assert_close(x, 1.0, 0, 1e-4);
    assert_close(y, 1.0, 0, 1e-4);
    /* L-shape against a plain dense search */
    double lx[6] = {0, 4, 4, 1.5, 1.5, 0}, ly[6] = {0, 0, 1.5, 1.5, 4, 4};
    assert_int_equal(px_diagram_polygon_pole(lx, ly, 6, 1e-6, NULL, &x, &y, &d), PX_OK);
    double best = -1;
    for (int i = 0; i <= 800; i++)
        for (int j = 0; j <= 800; j++) {
            double v = px_diagram_polygon_distance(lx, ly, 6, 4.0 * i / 800, 4.0 * j / 800);
            if (v > best) best = v;
        }
    assert_true(d >= best - 1e-6);
    assert_true(d <= best + 4.0 / 800); /* the dense search is one step coarse */
    assert_close(px_diagram_polygon_distance(lx, ly, 6, x, y), d, 0, 1e-12);
    /* bad input */
    double nx[3] = {0, 1, NAN};
    assert_int_equal(px_diagram_polygon_pole(nx, ty, 3, 1e-6, NULL, &x, &y, &d), PX_EINVAL);
    assert_int_equal(px_diagram_polygon_pole(tx, ty, 3, 0, NULL, &x, &y, &d), PX_EINVAL);
    assert_int_equal(px_diagram_polygon_pole(tx, ty, 2, 1e-3, NULL, &x, &y, &d), PX_EINVAL);
    double fx[3] = {0, 1, 2}, fy[3] = {0, 1, 2}; /* zero area */
    assert_int_equal(px_diagram_polygon_pole(fx, fy, 3, 1e-3, NULL, &x, &y, &d), PX_EINVAL);
}

int main(void)
{
    const struct CMUnitTest tests[] = {
        cmocka_unit_test(test_area_contains),
        cmocka_unit_test(test_pole),
    };
    return cmocka_run_group_tests(tests, NULL, NULL);
}
