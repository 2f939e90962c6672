/* geom.c - polygon helpers for label placement: point in polygon (even-odd
 * rule) and the pole of inaccessibility, the interior point farthest from
 * the boundary (concept: Garcia-Castellanos and Lombardo 2007, Scottish
 * Geographical Journal 123, 227), found by refining square cells kept in a
 * max-heap keyed by the best distance a cell could still contain. */
#include "core/alloc.h"
#include "core/status.h"
#include "render/render.h"
#include <math.h>
#include <stdlib.h>

#define PX_POLE_MAX_CELLS 20000 /* bound on the work for one label */
#define PX_SQRT2 1.41421356237309504880

int px_polygon_contains(const double *x, const double *y, size_t n, double px, double py)
{
    int in = 0;
    for (size_t i = 0, j = n - 1; i < n; j = i++) {
        if (((y[i] > py) != (y[j] > py)) &&
            (px < (x[j] - x[i]) * (py - y[i]) / (y[j] - y[i]) + x[i]))
            in = !in;
    }
    return in;
}

/* Signed distance: positive inside. */
static double sdist(const double *x, const double *y, size_t n, double px, double py)
{
    double best = INFINITY;
    for (size_t i = 0, j = n - 1; i < n; j = i++) {
        double dx = x[i] - x[j], dy = y[i] - y[j];
        double len2 = dx * dx + dy * dy;
        double t = len2 > 0 ? ((px - x[j]) * dx + (py - y[j]) * dy) / len2 : 0.0;
        if (t < 0) t = 0;
        if (t > 1) t = 1;
        double ex = x[j] + t * dx - px, ey = y[j] + t * dy - py;
        double d = sqrt(ex * ex + ey * ey);
        if (d < best) best = d;
    }
    return px_polygon_contains(x, y, n, px, py) ? best : -best;
}

typedef struct cell {
    double cx, cy, h, d, max;
} cell;

static void heap_push(cell *heap, size_t *n, cell c)
{
    size_t i = (*n)++;
    heap[i] = c;
    while (i > 0) {
        size_t p = (i - 1) / 2;
        if (heap[p].max >= heap[i].max) break;
        cell t = heap[p];
        heap[p] = heap[i];
        heap[i] = t;
        i = p;
    }
}

static cell heap_pop(cell *heap, size_t *n)
{
    cell top = heap[0];
    heap[0] = heap[--(*n)];
    size_t i = 0;
    for (;;) {
        size_t l = 2 * i + 1, r = l + 1, m = i;
        if (l < *n && heap[l].max > heap[m].max) m = l;
        if (r < *n && heap[r].max > heap[m].max) m = r;
        if (m == i) break;
        cell t = heap[m];
        heap[m] = heap[i];
        heap[i] = t;
        i = m;
    }
    return top;
}

static cell mkcell(const double *x, const double *y, size_t n, double cx, double cy, double h)
{
    cell c = {cx, cy, h, sdist(x, y, n, cx, cy), 0};
    c.max = c.d + h * PX_SQRT2;
    return c;
}

int px_polygon_pole(const double *x, const double *y, size_t n, double tol, double *px,
                    double *py, double *dist)
{
    if (!x || !y || n < 3 || !(tol > 0) || !px || !py) return PX_EINVAL;
    double x0 = x[0], x1 = x[0], y0 = y[0], y1 = y[0];
    for (size_t i = 1; i < n; i++) {
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
    cell *heap = px_alloc(NULL, sizeof(cell) * (PX_POLE_MAX_CELLS + 8));
    if (!heap) return PX_ENOMEM;
    size_t nh = 0;
    double h = size / 2;
    for (double cx = x0; cx < x1; cx += size)
        for (double cy = y0; cy < y1; cy += size)
            if (nh < PX_POLE_MAX_CELLS) heap_push(heap, &nh, mkcell(x, y, n, cx + h, cy + h, h));
    /* Start from the area centroid, a good first guess for convex fields. */
    double a = 0, cxs = 0, cys = 0;
    for (size_t i = 0, j = n - 1; i < n; j = i++) {
        double f = x[j] * y[i] - x[i] * y[j];
        a += f;
        cxs += (x[j] + x[i]) * f;
        cys += (y[j] + y[i]) * f;
    }
    cell best = a != 0 ? mkcell(x, y, n, cxs / (3 * a), cys / (3 * a), 0)
                       : mkcell(x, y, n, 0.5 * (x0 + x1), 0.5 * (y0 + y1), 0);
    while (nh > 0) {
        cell c = heap_pop(heap, &nh);
        if (c.d > best.d) best = c;
        if (c.max - best.d <= tol) continue;
        double hh = c.h / 2;
        if (nh + 4 > PX_POLE_MAX_CELLS) continue;
        heap_push(heap, &nh, mkcell(x, y, n, c.cx - hh, c.cy - hh, hh));
        heap_push(heap, &nh, mkcell(x, y, n, c.cx + hh, c.cy - hh, hh));
        heap_push(heap, &nh, mkcell(x, y, n, c.cx - hh, c.cy + hh, hh));
        heap_push(heap, &nh, mkcell(x, y, n, c.cx + hh, c.cy + hh, hh));
    }
    px_free(NULL, heap);
    *px = best.cx;
    *py = best.cy;
    if (dist) *dist = best.d;
    return PX_OK;
}
