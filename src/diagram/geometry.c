/* geometry.c - plane polygon helpers for maps and label placement.
 *
 * Area by the shoelace formula (Gauss's area formula), point in polygon by
 * the even-odd crossing rule (Shimrat 1962, Comm. ACM 5, 434, Algorithm 112),
 * signed distance to the outline, and the pole of inaccessibility: the
 * inside point farthest from the outline.  Iterative grid refinement as in
 * Garcia-Castellanos and Lombardo 2007 (Scottish Geographical Journal 123,
 * 227; from memory), made a branch-and-bound: square cells are refined in
 * order of the best distance they could still contain, since a cell of
 * half-size h centred at c holds no point farther than d(c) + h sqrt(2) from
 * the outline (triangle inequality), and a cell whose bound is within
 * `precision` of the best found is not refined. */
#include "diagram/diagram.h"
#include "diagram/diagram_impl.h"
#include "core/status.h"
#include <math.h>

double px_diagram_polygon_area(const double *x, const double *y, size_t n)
{
    if (!x || !y || n < 3) return 0.0;
    double s = 0;
    for (size_t i = 0; i < n; i++) {
        size_t i1 = i + 1 == n ? 0 : i + 1;
        s += x[i] * y[i1] - x[i1] * y[i];
    }
    return 0.5 * s;
}

int px_diagram_polygon_contains(const double *x, const double *y, size_t n, double px,
                                double py)
{
    if (!x || !y || n < 3) return 0;
    int in = 0;
    for (size_t i = 0, j = n - 1; i < n; j = i++) {
        if ((y[i] > py) != (y[j] > py)) {
            double xc = x[i] + (py - y[i]) * (x[j] - x[i]) / (y[j] - y[i]);
            if (px < xc) in = !in;
        }
    }
    return in;
}

static double seg_dist2(double px, double py, double ax, double ay, double bx, double by)
{
    double ex = bx - ax, ey = by - ay, L2 = ex * ex + ey * ey;
    double t = L2 > 0 ? ((px - ax) * ex + (py - ay) * ey) / L2 : 0;
    if (t < 0) t = 0;
    if (t > 1) t = 1;
    double dx = ax + t * ex - px, dy = ay + t * ey - py;
    return dx * dx + dy * dy;
}

double px_diagram_polygon_distance(const double *x, const double *y, size_t n, double px,
                                   double py)
{
    if (!x || !y || n < 2) return NAN;
    double best = INFINITY;
    for (size_t i = 0, j = n - 1; i < n; j = i++) {
        double d = seg_dist2(px, py, x[j], y[j], x[i], y[i]);
        if (d < best) best = d;
    }
    double d = sqrt(best);
    return px_diagram_polygon_contains(x, y, n, px, py) ? d : -d;
}

typedef struct cell {
    double x, y, h, d, max;
} cell;

static cell make_cell(const double *x, const double *y, size_t n, double cx, double cy, double h)
{
    cell c;
    c.x = cx;
    c.y = cy;
    c.h = h;
    c.d = px_diagram_polygon_distance(x, y, n, cx, cy);
    c.max = c.d + h * 1.4142135623730951; /* sqrt(2): half-diagonal of the cell */
    return c;
}

/* binary max-heap on cell.max; ties broken by position for determinism */
static int cell_less(const cell *a, const cell *b)
{
    if (a->max != b->max) return a->max < b->max;
    if (a->x != b->x) return a->x > b->x;
    return a->y > b->y;
}

static int heap_push(const px_allocator *al, cell **h, size_t *n, size_t *cap, cell c)
{
    if (px_dg_reserve(al, (void **)h, cap, *n + 1, sizeof **h)) return -1;
    size_t i = (*n)++;
    (*h)[i] = c;
    while (i > 0) {
        size_t p = (i - 1) / 2;
        if (!cell_less(&(*h)[p], &(*h)[i])) break;
        cell t = (*h)[p];
        (*h)[p] = (*h)[i];
        (*h)[i] = t;
        i = p;
    }
    return 0;
}

static cell heap_pop(cell *h, size_t *n)
{
    cell top = h[0];
    h[0] = h[--(*n)];
    size_t i = 0;
    for (;;) {
        size_t l = 2 * i + 1, r = l + 1, m = i;
        if (l < *n && cell_less(&h[m], &h[l])) m = l;
        if (r < *n && cell_less(&h[m], &h[r])) m = r;
        if (m == i) break;
        cell t = h[m];
        h[m] = h[i];
        h[i] = t;
        i = m;
    }
    return top;
}

/* Bound on the number of cells examined (a safety net: the bound converges
 * long before for any precision above 1e-12 of the polygon size). */
#define POLE_MAX_CELLS 1000000

int px_diagram_polygon_pole(const double *x, const double *y, size_t n, double precision,
                            const px_allocator *alloc, double *px, double *py, double *dist)
{
    if (!x || !y || n < 3 || !px || !py || !(precision > 0) || !isfinite(precision))
        return PX_EINVAL;
    double x0 = INFINITY, x1 = -INFINITY, y0 = INFINITY, y1 = -INFINITY;
    for (size_t i = 0; i < n; i++) {
        if (!isfinite(x[i]) || !isfinite(y[i])) return PX_EINVAL;
        x0 = fmin(x0, x[i]);
        x1 = fmax(x1, x[i]);
        y0 = fmin(y0, y[i]);
        y1 = fmax(y1, y[i]);
    }
    double A = px_diagram_polygon_area(x, y, n);
    if (!(fabs(A) > 0)) return PX_EINVAL;
    double w = x1 - x0, hgt = y1 - y0, size = fmin(w, hgt);
    if (!(size > 0)) return PX_EINVAL;
    double h = size / 2;
    cell *heap = NULL;
    size_t nh = 0, cap = 0, examined = 0;
    int st = PX_ENOMEM;
    /* first guess: the area centroid, then the box centre */
    double cx = 0, cy = 0;
    for (size_t i = 0; i < n; i++) {
        size_t i1 = i + 1 == n ? 0 : i + 1;
        double cr = x[i] * y[i1] - x[i1] * y[i];
        cx += (x[i] + x[i1]) * cr;
        cy += (y[i] + y[i1]) * cr;
    }
    cx /= 6 * A;
    cy /= 6 * A;
    cell best = make_cell(x, y, n, cx, cy, 0);
    cell box = make_cell(x, y, n, x0 + w / 2, y0 + hgt / 2, 0);
    if (box.d > best.d) best = box;
    for (double cxx = x0; cxx < x1; cxx += size)
        for (double cyy = y0; cyy < y1; cyy += size)
            if (heap_push(alloc, &heap, &nh, &cap, make_cell(x, y, n, cxx + h, cyy + h, h)))
                goto done;
    while (nh > 0) {
        cell c = heap_pop(heap, &nh);
        if (c.d > best.d) best = c;
        if (c.max - best.d <= precision) continue;
        if (++examined > POLE_MAX_CELLS) break;
        double q = c.h / 2;
        cell k[4] = {make_cell(x, y, n, c.x - q, c.y - q, q), make_cell(x, y, n, c.x + q, c.y - q, q),
                     make_cell(x, y, n, c.x - q, c.y + q, q), make_cell(x, y, n, c.x + q, c.y + q, q)};
        for (int i = 0; i < 4; i++)
            if (heap_push(alloc, &heap, &nh, &cap, k[i])) goto done;
    }
    *px = best.x;
    *py = best.y;
    if (dist) *dist = best.d;
    st = examined > POLE_MAX_CELLS ? PX_ELIMIT : PX_OK;
done:
    px_free(alloc, heap);
    return st;
}
