/* test_geom.c - plane polygon geometry (src/geom/geom.h).
 *
 * Known answers from plane geometry: shoelace areas of a square and a
 * 3-4-5 triangle; the centroid of a triangle is the mean of its vertices;
 * the pole of inaccessibility of a rectangle is its centre (distance half
 * the short side) and of a triangle its incentre (distance the inradius,
 * r = area / semi-perimeter: 1 at (1, 1) for the 3-4-5 right triangle); for
 * an L of arms 2 wide the largest inscribed circle sits in the corner, centre
 * (r, r) with r = sqrt(2) (2 - r); for another L the pole is held against a
 * plain dense search in the same run.  Spans: a U-shaped polygon cut by a
 * vertical line through both arms gives two pieces. */
#include "px_test.h"
#include "core/status.h"
#include "geom/geom.h"
#include "support/px_alloc_fail.h"

static void test_area_contains(void **state)
{
    (void)state;
    double sx[4] = {0, 1, 1, 0}, sy[4] = {0, 0, 1, 1};
    assert_close(px_geom_polygon_area(sx, sy, 4), 1.0, 0, 1e-15);
    double rx[4] = {0, 0, 1, 1}, ry[4] = {0, 1, 1, 0}; /* clockwise */
    assert_close(px_geom_polygon_area(rx, ry, 4), -1.0, 0, 1e-15);
    double tx[3] = {0, 4, 0}, ty[3] = {0, 0, 3};
    assert_close(px_geom_polygon_area(tx, ty, 3), 6.0, 0, 1e-15);
    assert_true(px_geom_polygon_contains(sx, sy, 4, 0.5, 0.5));
    assert_false(px_geom_polygon_contains(sx, sy, 4, 1.5, 0.5));
    assert_true(px_geom_polygon_contains(tx, ty, 3, 1, 1));
    assert_false(px_geom_polygon_contains(tx, ty, 3, 3, 2));
    assert_false(px_geom_polygon_contains(NULL, ty, 3, 1, 1));
    /* non-convex: an L; the notch is outside */
    double lx[6] = {0, 4, 4, 1, 1, 0}, ly[6] = {0, 0, 1, 1, 4, 4};
    assert_true(px_geom_polygon_contains(lx, ly, 6, 0.5, 3));
    assert_false(px_geom_polygon_contains(lx, ly, 6, 3, 3));
    assert_close(px_geom_polygon_distance(lx, ly, 6, 0.5, 3), 0.5, 0, 1e-15);
    assert_close(px_geom_polygon_distance(lx, ly, 6, 3, 3), -2.0, 0, 1e-15);
    assert_close(px_geom_polygon_area(NULL, ly, 6), 0, 0, 0);
    assert_true(isnan(px_geom_polygon_distance(lx, ly, 1, 0, 0)));
}

static void test_centroid_segment(void **state)
{
    (void)state;
    double tx[3] = {0, 4, 0}, ty[3] = {0, 0, 3}, cx, cy;
    assert_int_equal(px_geom_polygon_centroid(tx, ty, 3, &cx, &cy), PX_OK);
    assert_close(cx, 4.0 / 3, 0, 1e-15);
    assert_close(cy, 1.0, 0, 1e-15);
    /* an L of two unit-width arms of area 4 and 3: the moments add */
    double lx[6] = {0, 4, 4, 1, 1, 0}, ly[6] = {0, 0, 1, 1, 4, 4};
    assert_int_equal(px_geom_polygon_centroid(lx, ly, 6, &cx, &cy), PX_OK);
    assert_close(cx, (4 * 2.0 + 3 * 0.5) / 7, 0, 1e-15);
    assert_close(cy, (4 * 0.5 + 3 * 2.5) / 7, 0, 1e-15);
    double fx[3] = {0, 1, 2}, fy[3] = {0, 1, 2}; /* zero area */
    assert_int_equal(px_geom_polygon_centroid(fx, fy, 3, &cx, &cy), PX_EINVAL);
    assert_int_equal(px_geom_polygon_centroid(tx, ty, 2, &cx, &cy), PX_EINVAL);
    /* distance to a segment: square foot inside, nearest end outside */
    assert_close(px_geom_segment_distance(0, 1, -1, 0, 1, 0), 1.0, 0, 1e-15);
    assert_close(px_geom_segment_distance(4, 4, -1, 0, 1, 0), 5.0, 0, 1e-15);
    assert_close(px_geom_segment_distance(3, 4, 0, 0, 0, 0), 5.0, 0, 1e-15);
}

static void test_pole(void **state)
{
    (void)state;
    double x, y, d;
    double rx[4] = {0, 4, 4, 0}, ry[4] = {0, 0, 2, 2};
    /* the best points form a segment (x in [1, 3], y = 1): every cell on it
     * stays a candidate, so a label-sized precision ends ... */
    assert_int_equal(px_geom_polygon_pole(rx, ry, 4, 1e-2, NULL, &x, &y, &d), PX_OK);
    assert_close(d, 1.0, 0, 1e-2);
    assert_close(y, 1.0, 0, 1e-2);
    assert_true(x >= 1.0 - 1e-2 && x <= 3.0 + 1e-2); /* any point of the mid segment */
    /* ... and a tiny one runs out of cells, the best point still set */
    x = y = d = NAN;
    assert_int_equal(px_geom_polygon_pole(rx, ry, 4, 1e-6, NULL, &x, &y, &d), PX_ELIMIT);
    assert_close(d, 1.0, 0, 1e-4);
    assert_close(y, 1.0, 0, 1e-4);
    double tx[3] = {0, 4, 0}, ty[3] = {0, 0, 3};
    assert_int_equal(px_geom_polygon_pole(tx, ty, 3, 1e-7, NULL, &x, &y, &d), PX_OK);
    assert_close(d, 1.0, 0, 1e-7);
    assert_close(x, 1.0, 0, 1e-4);
    assert_close(y, 1.0, 0, 1e-4);
    /* L of arms 2 wide: r = 2 sqrt(2) / (1 + sqrt(2)) at (r, r) */
    double ax[6] = {0, 10, 10, 2, 2, 0}, ay[6] = {0, 0, 2, 2, 10, 10};
    assert_int_equal(px_geom_polygon_pole(ax, ay, 6, 1e-5, NULL, &x, &y, &d), PX_OK);
    assert_true(px_geom_polygon_contains(ax, ay, 6, x, y));
    assert_close(d, 2 * sqrt(2) / (1 + sqrt(2)), 0, 1e-4);
    assert_close(x, d, 0, 1e-3);
    assert_close(y, d, 0, 1e-3);
    /* L-shape against a plain dense search */
    double lx[6] = {0, 4, 4, 1.5, 1.5, 0}, ly[6] = {0, 0, 1.5, 1.5, 4, 4};
    assert_int_equal(px_geom_polygon_pole(lx, ly, 6, 1e-6, NULL, &x, &y, &d), PX_OK);
    double best = -1;
    for (int i = 0; i <= 800; i++)
        for (int j = 0; j <= 800; j++) {
            double v = px_geom_polygon_distance(lx, ly, 6, 4.0 * i / 800, 4.0 * j / 800);
            if (v > best) best = v;
        }
    assert_true(d >= best - 1e-6);
    assert_true(d <= best + 4.0 / 800); /* the dense search is one step coarse */
    assert_close(px_geom_polygon_distance(lx, ly, 6, x, y), d, 0, 1e-12);
    /* a sliver of no height (a field clipped to a frame edge): its box centre */
    double sx[4] = {0, 2, 4, 1}, sy[4] = {3, 3, 3, 3};
    assert_int_equal(px_geom_polygon_pole(sx, sy, 4, 1e-3, NULL, &x, &y, &d), PX_OK);
    assert_close(x, 2.0, 0, 0);
    assert_close(y, 3.0, 0, 0);
    assert_close(d, 0.0, 0, 0);
    /* bad input */
    double nx[3] = {NAN, 1, 0};
    assert_int_equal(px_geom_polygon_pole(nx, ty, 3, 1e-6, NULL, &x, &y, &d), PX_EINVAL);
    assert_int_equal(px_geom_polygon_pole(tx, ty, 3, 0, NULL, &x, &y, &d), PX_EINVAL);
    assert_int_equal(px_geom_polygon_pole(tx, ty, 3, INFINITY, NULL, &x, &y, &d), PX_EINVAL);
    assert_int_equal(px_geom_polygon_pole(tx, ty, 2, 1e-3, NULL, &x, &y, &d), PX_EINVAL);
    double fx[3] = {0, 1, 2}, fy[3] = {0, 1, 2}; /* zero area */
    assert_int_equal(px_geom_polygon_pole(fx, fy, 3, 1e-3, NULL, &x, &y, &d), PX_EINVAL);
}

/* Every allocation failure of the pole's cell heap comes back as PX_ENOMEM
 * with nothing held; with enough allocations the answer equals the one on
 * the C library's allocator. */
static void test_pole_enomem(void **state)
{
    (void)state;
    double lx[6] = {0, 4, 4, 1.5, 1.5, 0}, ly[6] = {0, 0, 1.5, 1.5, 4, 4};
    double x0, y0, d0, x, y, d;
    assert_int_equal(px_geom_polygon_pole(lx, ly, 6, 1e-6, NULL, &x0, &y0, &d0), PX_OK);
    int ok = 0;
    for (long k = 0; k < 100 && !ok; k++) {
        px_alloc_fail f;
        px_allocator al = px_alloc_fail_make(&f, k);
        int st = px_geom_polygon_pole(lx, ly, 6, 1e-6, &al, &x, &y, &d);
        assert_int_equal(f.live, 0);
        if (st == PX_OK) {
            ok = 1;
            assert_true(x == x0 && y == y0 && d == d0);
        } else {
            assert_int_equal(st, PX_ENOMEM);
        }
    }
    assert_true(ok);
}

static void test_span(void **state)
{
    (void)state;
    /* a U: arms x in [0, 1] and [3, 4] from y = 1 to 4, joined below y = 1 */
    double ux[8] = {0, 4, 4, 3, 3, 1, 1, 0}, uy[8] = {0, 0, 4, 4, 1, 1, 4, 4};
    double lo = NAN, hi = NAN;
    assert_int_equal(px_geom_polygon_span(ux, uy, 8, 0.5, 2, NULL, &lo, &hi), PX_OK);
    assert_close(lo, 0.0, 0, 0);
    assert_close(hi, 4.0, 0, 0);
    /* through the gap: only the base, y in [0, 1] */
    assert_int_equal(px_geom_polygon_span(ux, uy, 8, 2, 0.5, NULL, &lo, &hi), PX_OK);
    assert_close(lo, 0.0, 0, 0);
    assert_close(hi, 1.0, 0, 0);
    assert_int_equal(px_geom_polygon_span(ux, uy, 8, 2, 2, NULL, &lo, &hi), PX_ENOTFOUND);
    assert_int_equal(px_geom_polygon_span(ux, uy, 8, 5, 2, NULL, &lo, &hi), PX_ENOTFOUND);
    /* a sloped edge: the triangle (0,0) (4,0) (0,3) at x = 2 spans y in [0, 1.5] */
    double tx[3] = {0, 4, 0}, ty[3] = {0, 0, 3};
    assert_int_equal(px_geom_polygon_span(tx, ty, 3, 2, 1, NULL, &lo, &hi), PX_OK);
    assert_close(lo, 0.0, 0, 0);
    assert_close(hi, 1.5, 0, 1e-15);
    assert_int_equal(px_geom_polygon_span(tx, ty, 2, 2, 1, NULL, &lo, &hi), PX_EINVAL);
    px_alloc_fail f;
    px_allocator al = px_alloc_fail_make(&f, 0);
    assert_int_equal(px_geom_polygon_span(tx, ty, 3, 2, 1, &al, &lo, &hi), PX_ENOMEM);
    assert_int_equal(f.live, 0);
}

int main(void)
{
    const struct CMUnitTest tests[] = {
        cmocka_unit_test(test_area_contains), cmocka_unit_test(test_centroid_segment),
        cmocka_unit_test(test_pole),          cmocka_unit_test(test_pole_enomem),
        cmocka_unit_test(test_span),
    };
    return cmocka_run_group_tests(tests, NULL, NULL);
}
