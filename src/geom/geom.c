/* geom.c - plane polygon geometry (contract and sources in geom.h). */
#include "geom/geom.h"
#include "core/status.h"
#include <math.h>
#include <stdint.h>
#include <stdlib.h>
#include <string.h>

#define PX_GEOM_SQRT2 1.41421356237309504880 /* half-diagonal of a unit half-size cell */

/* The shoelace sums over the edges k -> k + 1 (mod n), starting at edge
 * `first` (0: the closing edge n-1 -> 0 last; n - 1: it first): twice the
 * signed area and, when wanted, the first moments times six times the area.
 * Floating-point sums depend on their order, so each caller keeps one
 * order for good: the area starts at edge 0 (as the map outlines and the
 * rigorous maps' field areas always have), the centroid at the closing edge
 * (as the figures' label anchors always have). */
static double shoelace(const double *x, const double *y, size_t n, size_t first, double *mx,
                       double *my)
{
    double s = 0, sx = 0, sy = 0;
    for (size_t m = 0, k = first; m < n; m++, k = k + 1 == n ? 0 : k + 1) {
        size_t k1 = k + 1 == n ? 0 : k + 1;
        double c = x[k] * y[k1] - x[k1] * y[k];
        s += c;
        sx += (x[k] + x[k1]) * c;
        sy += (y[k] + y[k1]) * c;
    }
    if (mx) *mx = sx;
    if (my) *my = sy;
    return s;
}

double px_geom_polygon_area(const double *x, const double *y, size_t n)
{
    if (!x || !y || n < 3) return 0.0;
    return 0.5 * shoelace(x, y, n, 0, NULL, NULL);
}

int px_geom_polygon_centroid(const double *x, const double *y, size_t n, double *cx, double *cy)
{
    if (!x || !y || n < 3 || !cx || !cy) return PX_EINVAL;
    double sx, sy, s = shoelace(x, y, n, n - 1, &sx, &sy);
    if (s == 0 || !isfinite(s)) return PX_EINVAL;
    *cx = sx / (3 * s); /* centroid = first moment / (6 area), with s = 2 area */
    *cy = sy / (3 * s);
    return PX_OK;
}

int px_geom_polygon_contains(const double *x, const double *y, size_t n, double px, double py)
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

/* Squared distance from (px, py) to the segment a-b. */
static double seg_dist2(double px, double py, double ax, double ay, double bx, double by)
{
    double ex = bx - ax, ey = by - ay, L2 = ex * ex + ey * ey;
    double t = L2 > 0 ? ((px - ax) * ex + (py - ay) * ey) / L2 : 0;
    if (t < 0) t = 0;
    if (t > 1) t = 1;
    double dx = ax + t * ex - px, dy = ay + t * ey - py;
    return dx * dx + dy * dy;
}

double px_geom_segment_distance(double px, double py, double ax, double ay, double bx, double by)
{
    return sqrt(seg_dist2(px, py, ax, ay, bx, by));
}

double px_geom_polygon_distance(const double *x, const double *y, size_t n, double px, double py)
{
    if (!x || !y || n < 2) return NAN;
    double best = INFINITY;
    for (size_t i = 0, j = n - 1; i < n; j = i++) {
        double d = seg_dist2(px, py, x[j], y[j], x[i], y[i]);
        if (d < best) best = d;
    }
    double d = sqrt(best);
    return px_geom_polygon_contains(x, y, n, px, py) ? d : -d;
}

/* ------------------------------------------------ pole of inaccessibility */

typedef struct cell {
    double x, y, h, d, max; /* centre, half-size, distance, bound */
} cell;

static cell make_cell(const double *x, const double *y, size_t n, double cx, double cy, double h)
{
    cell c = {cx, cy, h, px_geom_polygon_distance(x, y, n, cx, cy), 0};
    c.max = c.d + h * PX_GEOM_SQRT2;
    return c;
}

/* A binary max-heap on cell.max, of at most PX_GEOM_POLE_MAX_CELLS cells;
 * grown on the allocator. */
typedef struct heap {
    cell *c;
    size_t n, cap;
    const px_allocator *al;
} heap;

static int heap_push(heap *h, cell c)
{
    if (h->n == h->cap) {
        size_t nc = h->cap ? 2 * h->cap : 64;
        if (nc > PX_GEOM_POLE_MAX_CELLS) nc = PX_GEOM_POLE_MAX_CELLS;
        cell *q = px_alloc(h->al, nc * sizeof *q);
        if (!q) return -1;
        if (h->n) memcpy(q, h->c, h->n * sizeof *q);
        px_free(h->al, h->c);
        h->c = q;
        h->cap = nc;
    }
    size_t i = h->n++;
    h->c[i] = c;
    while (i > 0) {
        size_t p = (i - 1) / 2;
        if (h->c[p].max >= h->c[i].max) break;
        cell t = h->c[p];
        h->c[p] = h->c[i];
        h->c[i] = t;
        i = p;
    }
    return 0;
}

static cell heap_pop(heap *h)
{
    cell *c = h->c, top = c[0];
    size_t n = --h->n;
    c[0] = c[n];
    size_t i = 0;
    for (;;) {
        size_t l = 2 * i + 1, r = l + 1, m = i;
        if (l < n && c[l].max > c[m].max) m = l;
        if (r < n && c[r].max > c[m].max) m = r;
        if (m == i) break;
        cell t = c[m];
        c[m] = c[i];
        c[i] = t;
        i = m;
    }
    return top;
}

int px_geom_polygon_pole(const double *x, const double *y, size_t n, double precision,
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
    double size = fmin(x1 - x0, y1 - y0);
    if (!(size > 0)) {
        *px = 0.5 * (x0 + x1);
        *py = 0.5 * (y0 + y1);
        if (dist) *dist = 0;
        return PX_OK;
    }
    double gx, gy;
    if (px_geom_polygon_centroid(x, y, n, &gx, &gy) != PX_OK) return PX_EINVAL;
    heap H = {NULL, 0, 0, alloc};
    int st = PX_ENOMEM, limited = 0;
    double h = size / 2;
    for (double cx = x0; cx < x1; cx += size)
        for (double cy = y0; cy < y1; cy += size) {
            if (H.n >= PX_GEOM_POLE_MAX_CELLS) {
                limited = 1;
                continue;
            }
            if (heap_push(&H, make_cell(x, y, n, cx + h, cy + h, h))) goto done;
        }
    cell best = make_cell(x, y, n, gx, gy, 0);
    while (H.n > 0) {
        cell c = heap_pop(&H);
        if (c.d > best.d) best = c;
        if (c.max - best.d <= precision) continue;
        if (H.n + 4 > PX_GEOM_POLE_MAX_CELLS) {
            limited = 1;
            continue;
        }
        double q = c.h / 2;
        if (heap_push(&H, make_cell(x, y, n, c.x - q, c.y - q, q)) ||
            heap_push(&H, make_cell(x, y, n, c.x + q, c.y - q, q)) ||
            heap_push(&H, make_cell(x, y, n, c.x - q, c.y + q, q)) ||
            heap_push(&H, make_cell(x, y, n, c.x + q, c.y + q, q)))
            goto done;
    }
    *px = best.x;
    *py = best.y;
    if (dist) *dist = best.d;
    st = limited ? PX_ELIMIT : PX_OK;
done:
    px_free(alloc, H.c);
    return st;
}

/* ------------------------------------------------------- vertical spans */

static int cmp_double(const void *a, const void *b)
{
    double u = *(const double *)a, v = *(const double *)b;
    return (u > v) - (u < v);
}

int px_geom_polygon_span(const double *x, const double *y, size_t n, double px, double py,
                         const px_allocator *alloc, double *lo, double *hi)
{
    if (!x || !y || n < 3 || !lo || !hi) return PX_EINVAL;
    double *ys = px_alloc(alloc, n * sizeof *ys);
    if (!ys) return PX_ENOMEM;
    size_t m = 0;
    for (size_t i = 0; i < n; i++) {
        size_t j = i + 1 == n ? 0 : i + 1;
        double x1 = x[i], y1 = y[i], x2 = x[j], y2 = y[j];
        if ((x1 <= px) != (x2 <= px)) ys[m++] = y1 + (y2 - y1) * (px - x1) / (x2 - x1);
    }
    qsort(ys, m, sizeof *ys, cmp_double);
    int st = PX_ENOTFOUND;
    for (size_t k = 0; k + 1 < m; k += 2)
        if (ys[k] <= py && py <= ys[k + 1]) {
            *lo = ys[k];
            *hi = ys[k + 1];
            st = PX_OK;
            break;
        }
    px_free(alloc, ys);
    return st;
}
