/* grid.c - rigorous predominance maps on a grid.
 *
 * The caller's callback names the predominant species at a point (it runs
 * the full speciation solver there).  We label every node of an nx x ny
 * grid, then trace boundaries cell by cell with a many-label form of
 * marching squares (Lorensen and Cline 1987, SIGGRAPH '87, 163, in two
 * dimensions): on every grid edge whose two ends differ, the change point is
 * refined by bisection (num/num.h) to the requested tolerance and shared by the two
 * cells beside the edge; a cell with two crossings gets one segment, a
 * saddle (two labels on alternate corners) is resolved by one extra call at
 * the cell centre, and a cell with three or more labels gets a star from its
 * centre (a triple point inside the cell).  Segments with the same pair of
 * labels are chained into polylines, oriented so the lower id lies on the
 * left.  Per-field node counts, trapezoid-weighted areas, centroids and a
 * label spot (the node farthest from any other label, by a two-pass chamfer
 * distance transform, Borgefors 1986, CVGIP 34, 344) come with the map.
 *
 * A failing callback stops the map: everything allocated is freed and its
 * status is returned; no jump crosses these frames. */
#include "diagram/diagram.h"
#include "diagram/diagram_impl.h"
#include "core/status.h"
#include "num/num.h"
#include <math.h>
#include <stdlib.h>

#define GRID_MAX_NODES ((size_t)1 << 28) /* a memory guard, not a physical limit */
#define NONE ((size_t)-1)

px_diagram_grid_options px_diagram_grid_options_default(void)
{
    px_diagram_grid_options o;
    o.nx = 101;
    o.ny = 101;
    o.epsabs = 0.0;
    o.epsrel = 1e-6;
    o.max_iter = 60;
    o.alloc = NULL;
    return o;
}

void px_diagram_grid_free(px_diagram_grid *g)
{
    if (!g) return;
    const px_allocator *a = g->alloc;
    px_free(a, g->label);
    px_free(a, g->poly);
    px_free(a, g->px);
    px_free(a, g->py);
    px_free(a, g->pfail);
    px_free(a, g->field);
    px_free(a, g);
}

typedef struct seg {
    size_t p, q; /* point indices, oriented so id_a is on the left of p -> q */
    int ida, idb;
    int used;
} seg;

typedef struct gctx {
    const px_allocator *a;
    px_diagram_label_fn fn;
    void *user;
    px_diagram_grid *g;
    double *x, *y; /* points: crossings and cell centres */
    unsigned char *bad; /* per point: placed next to a negative (failed) label */
    size_t np, capx, capy, capb;
    seg *s;
    size_t ns, caps;
} gctx;

static int add_point(gctx *c, double x, double y, size_t *idx)
{
    if (px_dg_reserve(c->a, (void **)&c->x, &c->capx, c->np + 1, sizeof *c->x) ||
        px_dg_reserve(c->a, (void **)&c->y, &c->capy, c->np + 1, sizeof *c->y) ||
        px_dg_reserve(c->a, (void **)&c->bad, &c->capb, c->np + 1, sizeof *c->bad))
        return PX_ENOMEM;
    c->bad[c->np] = 0;
    c->x[c->np] = x;
    c->y[c->np] = y;
    *idx = c->np++;
    return PX_OK;
}

static int call(gctx *c, double x, double y, int *id)
{
    c->g->ncalls++;
    int st = c->fn(x, y, c->user, id);
    return st < 0 ? st : PX_OK;
}

/* One probe of the bisection along a grid edge: which side of the change
 * the point at fraction t lies on (la's side is low).  A label other than
 * la and lb at the last high point marks a third field in between. */
typedef struct edge_probe {
    gctx *c;
    double x0, y0, x1, y1;
    int la, lb, third;
    int failed; /* a probe got a negative (failed) label */
    int status; /* the label callback's failure, kept apart from the bisection's */
} edge_probe;

static int edge_side(double t, void *user, int *high)
{
    edge_probe *e = user;
    int id, st = call(e->c, e->x0 + t * (e->x1 - e->x0), e->y0 + t * (e->y1 - e->y0), &id);
    if (st) return e->status = st;
    e->failed |= id < 0;
    *high = id != e->la;
    if (*high) e->third = id != e->lb;
    return PX_OK;
}

/* Bisection (num/num.h) on the segment from (x0,y0) [label la] to (x1,y1)
 * [label lb] until it is no longer than tol in the axis's units.  A point
 * placed next to a failed (negative) label is marked bad. */
static int refine(gctx *c, double x0, double y0, int la, double x1, double y1, int lb,
                  double tol, int max_iter, size_t *idx)
{
    double lo = 0, hi = 1, len = fmax(fabs(x1 - x0), fabs(y1 - y0));
    edge_probe e = {c, x0, y0, x1, y1, la, lb, 0, la < 0 || lb < 0, PX_OK};
    px_num_root_options o = {tol / len, 0.0, 0.0, max_iter};
    int st = px_num_root_bisect(edge_side, &e, &lo, &hi, &o, NULL);
    if (e.status != PX_OK) return e.status;
    if (st == PX_ENOCONV) c->g->nmaxiter++;
    else if (st != PX_OK) return st;
    if (e.third) c->g->nthird++;
    c->g->ncross++;
    double t = 0.5 * (lo + hi);
    st = add_point(c, x0 + t * (x1 - x0), y0 + t * (y1 - y0), idx);
    if (st == PX_OK && e.failed) {
        c->bad[*idx] = 1;
        c->g->nfailcross++;
    }
    return st;
}

/* Add segment p-q separating la | lb; `side` is a point on la's side. */
static int add_seg(gctx *c, size_t p, size_t q, int la, int lb, double sx, double sy)
{
    seg s;
    s.used = 0;
    s.ida = la < lb ? la : lb;
    s.idb = la < lb ? lb : la;
    double cr = (c->x[q] - c->x[p]) * (sy - c->y[p]) - (c->y[q] - c->y[p]) * (sx - c->x[p]);
    int la_left = cr > 0;
    int a_left = (la == s.ida) ? la_left : !la_left;
    s.p = a_left ? p : q;
    s.q = a_left ? q : p;
    return PX_DG_PUSH(c->a, c->s, c->ns, c->caps, s) ? PX_ENOMEM : PX_OK;
}

static size_t id_index(const px_diagram_grid_field *f, size_t n, int id)
{
    size_t lo = 0, hi = n;
    while (lo < hi) {
        size_t m = lo + (hi - lo) / 2;
        if (f[m].id < id) lo = m + 1;
        else hi = m;
    }
    return lo;
}

/* The smaller and larger of two finite numbers, inline: the summary's loops
 * run over every node on the calling thread, and fmin is a library call. */
static inline double min2(double a, double b)
{
    return b < a ? b : a;
}

static inline double max2(double a, double b)
{
    return b > a ? b : a;
}

static int fields_summary(gctx *c, const double *xs, const double *ys)
{
    px_diagram_grid *g = c->g;
    size_t nx = g->nx, ny = g->ny, N = nx * ny;
    int st = PX_ENOMEM;
    int *ids = px_alloc(c->a, N * sizeof *ids);
    double *dist = px_alloc(c->a, N * sizeof *dist);
    if (!ids || !dist) goto done;
    /* distinct ids, kept sorted (few of them: insertion is cheap) */
    size_t nu = 0;
    for (size_t i = 0; i < N; i++) {
        int id = g->label[i];
        if (i > 0 && id == g->label[i - 1]) continue;
        size_t lo = 0, hi = nu;
        while (lo < hi) {
            size_t m = lo + (hi - lo) / 2;
            if (ids[m] < id) lo = m + 1;
            else hi = m;
        }
        if (lo < nu && ids[lo] == id) continue;
        for (size_t k = nu; k > lo; k--) ids[k] = ids[k - 1];
        ids[lo] = id;
        nu++;
    }
    g->field = px_calloc(c->a, nu, sizeof *g->field);
    if (!g->field) goto done;
    g->nfield = nu;
    for (size_t k = 0; k < nu; k++) {
        g->field[k].id = ids[k];
        g->field[k].xmin = g->field[k].ymin = INFINITY;
        g->field[k].xmax = g->field[k].ymax = -INFINITY;
    }
    double dx = xs[1] - xs[0], dy = ys[1] - ys[0], dd = hypot(dx, dy);
    for (size_t j = 0; j < ny; j++) {
        double wy = (j == 0 || j == ny - 1) ? 0.5 * dy : dy; /* trapezoid weights */
        for (size_t i = 0; i < nx; i++) {
            double wx = (i == 0 || i == nx - 1) ? 0.5 * dx : dx;
            px_diagram_grid_field *F = &g->field[id_index(g->field, nu, g->label[j * nx + i])];
            double w = wx * wy;
            F->count++;
            F->area += w;
            F->cx += w * xs[i];
            F->cy += w * ys[j];
            F->xmin = min2(F->xmin, xs[i]);
            F->xmax = max2(F->xmax, xs[i]);
            F->ymin = min2(F->ymin, ys[j]);
            F->ymax = max2(F->ymax, ys[j]);
            /* distance seed: half a step next to another label, else to the border */
            int l = g->label[j * nx + i];
            double d = min2(min2(xs[i] - xs[0], xs[nx - 1] - xs[i]),
                            min2(ys[j] - ys[0], ys[ny - 1] - ys[j]));
            if (i > 0 && g->label[j * nx + i - 1] != l) d = min2(d, 0.5 * dx);
            if (i + 1 < nx && g->label[j * nx + i + 1] != l) d = min2(d, 0.5 * dx);
            if (j > 0 && g->label[(j - 1) * nx + i] != l) d = min2(d, 0.5 * dy);
            if (j + 1 < ny && g->label[(j + 1) * nx + i] != l) d = min2(d, 0.5 * dy);
            dist[j * nx + i] = d;
        }
    }
    /* chamfer passes; distance flows only within one label */
    for (size_t j = 0; j < ny; j++)
        for (size_t i = 0; i < nx; i++) {
            size_t k = j * nx + i;
            int l = g->label[k];
            if (i > 0 && g->label[k - 1] == l) dist[k] = min2(dist[k], dist[k - 1] + dx);
            if (j > 0 && g->label[k - nx] == l) dist[k] = min2(dist[k], dist[k - nx] + dy);
            if (j > 0 && i > 0 && g->label[k - nx - 1] == l)
                dist[k] = min2(dist[k], dist[k - nx - 1] + dd);
            if (j > 0 && i + 1 < nx && g->label[k - nx + 1] == l)
                dist[k] = min2(dist[k], dist[k - nx + 1] + dd);
        }
    for (size_t j = ny; j-- > 0;)
        for (size_t i = nx; i-- > 0;) {
            size_t k = j * nx + i;
            int l = g->label[k];
            if (i + 1 < nx && g->label[k + 1] == l) dist[k] = min2(dist[k], dist[k + 1] + dx);
            if (j + 1 < ny && g->label[k + nx] == l) dist[k] = min2(dist[k], dist[k + nx] + dy);
            if (j + 1 < ny && i + 1 < nx && g->label[k + nx + 1] == l)
                dist[k] = min2(dist[k], dist[k + nx + 1] + dd);
            if (j + 1 < ny && i > 0 && g->label[k + nx - 1] == l)
                dist[k] = min2(dist[k], dist[k + nx - 1] + dd);
        }
    for (size_t k = 0; k < nu; k++) { /* best distance per field; -1: unset */
        g->field[k].cx /= g->field[k].area;
        g->field[k].cy /= g->field[k].area;
        ids[k] = -1;
    }
    /* ids[] now holds, per field, the best node index (as int is too small for
     * big grids, keep the distance in label_x temporarily) */
    for (size_t k = 0; k < nu; k++) g->field[k].label_x = -1;
    for (size_t j = 0; j < ny; j++)
        for (size_t i = 0; i < nx; i++) {
            size_t k = j * nx + i;
            px_diagram_grid_field *F = &g->field[id_index(g->field, nu, g->label[k])];
            if (dist[k] > F->label_x) {
                F->label_x = dist[k];
                F->label_y = (double)k;
            }
        }
    for (size_t k = 0; k < nu; k++) {
        size_t node = (size_t)g->field[k].label_y;
        g->field[k].label_x = xs[node % nx];
        g->field[k].label_y = ys[node / nx];
    }
    st = PX_OK;
done:
    px_free(c->a, ids);
    px_free(c->a, dist);
    return st;
}

/* Chain segments into polylines through points shared by exactly two
 * segments of the same label pair. */
static int chain(gctx *c)
{
    px_diagram_grid *g = c->g;
    int st = PX_ENOMEM;
    size_t *deg = px_calloc(c->a, c->np + 1, sizeof *deg);
    size_t *inc = NULL, *pos = NULL;
    size_t *pts = NULL;
    size_t npts = 0, cappts = 0, cappoly = 0;
    if (!deg) goto done;
    for (size_t i = 0; i < c->ns; i++) {
        deg[c->s[i].p]++;
        deg[c->s[i].q]++;
    }
    /* incidence lists: inc[pos[p] .. pos[p+1]) */
    pos = px_alloc(c->a, (c->np + 1) * sizeof *pos);
    inc = px_alloc(c->a, (2 * c->ns + 1) * sizeof *inc);
    if (!pos || !inc) goto done;
    size_t acc = 0;
    for (size_t p = 0; p < c->np; p++) {
        pos[p] = acc;
        acc += deg[p];
        deg[p] = 0;
    }
    pos[c->np] = acc;
    for (size_t i = 0; i < c->ns; i++) {
        inc[pos[c->s[i].p] + deg[c->s[i].p]++] = i;
        inc[pos[c->s[i].q] + deg[c->s[i].q]++] = i;
    }
    /* a continuation from point p along segment `from`: the one other
     * segment at p with the same pair, if p joins exactly two of that pair */
    for (int pass = 0; pass < 2; pass++) {
        for (size_t s0 = 0; s0 < c->ns; s0++) {
            if (c->s[s0].used) continue;
            /* pass 0: start only at chain ends (the tail point is not a plain join) */
            seg *S = &c->s[s0];
            size_t cnt = 0;
            for (size_t k = pos[S->p]; k < pos[S->p + 1]; k++) {
                seg *T = &c->s[inc[k]];
                if (T->ida == S->ida && T->idb == S->idb) cnt++;
            }
            if (pass == 0 && cnt == 2) continue;
            /* walk forward from S->p along q */
            size_t first = npts;
            if (PX_DG_PUSH(c->a, pts, npts, cappts, S->p)) goto done;
            size_t cur = s0, at = S->q;
            S->used = 1;
            for (;;) {
                if (PX_DG_PUSH(c->a, pts, npts, cappts, at)) goto done;
                size_t nxt = NONE, same = 0;
                for (size_t k = pos[at]; k < pos[at + 1]; k++) {
                    seg *T = &c->s[inc[k]];
                    if (T->ida != S->ida || T->idb != S->idb) continue;
                    same++;
                    if (inc[k] != cur && !T->used) nxt = inc[k];
                }
                if (same != 2 || nxt == NONE) break;
                seg *T = &c->s[nxt];
                T->used = 1;
                cur = nxt;
                at = T->p == at ? T->q : T->p;
            }
            /* segments were oriented id_a-left; the walk follows S's orientation,
             * and a plain join preserves it, so the polyline is id_a-left */
            px_diagram_polyline pl = {S->ida, S->idb, first, npts - first};
            if (PX_DG_PUSH(c->a, g->poly, g->npoly, cappoly, pl)) goto done;
        }
    }
    g->npt = npts;
    g->px = px_alloc(c->a, (npts ? npts : 1) * sizeof *g->px);
    g->py = px_alloc(c->a, (npts ? npts : 1) * sizeof *g->py);
    g->pfail = px_alloc(c->a, (npts ? npts : 1) * sizeof *g->pfail);
    if (!g->px || !g->py || !g->pfail) goto done;
    for (size_t i = 0; i < npts; i++) {
        g->px[i] = c->x[pts[i]];
        g->py[i] = c->y[pts[i]];
        g->pfail[i] = c->bad[pts[i]];
    }
    st = PX_OK;
done:
    px_free(c->a, deg);
    px_free(c->a, pos);
    px_free(c->a, inc);
    px_free(c->a, pts);
    return st;
}

int px_diagram_grid_map(const px_diagram_window *w, px_diagram_label_fn fn, void *user,
                        const px_diagram_grid_options *opt, px_diagram_grid **out)
{
    if (!out) return PX_EINVAL;
    *out = NULL;
    px_diagram_grid_options o = opt ? *opt : px_diagram_grid_options_default();
    if (!w || !fn || o.nx < 2 || o.ny < 2 || o.nx > GRID_MAX_NODES || o.ny > GRID_MAX_NODES ||
        o.nx * o.ny > GRID_MAX_NODES || !isfinite(o.epsabs) || o.epsabs < 0 ||
        !isfinite(o.epsrel) || o.epsrel < 0 || o.max_iter < 1)
        return PX_EINVAL;
    if (!isfinite(w->xmin) || !isfinite(w->xmax) || !isfinite(w->ymin) || !isfinite(w->ymax) ||
        !(w->xmin < w->xmax) || !(w->ymin < w->ymax) || !isfinite(w->xmax - w->xmin) ||
        !isfinite(w->ymax - w->ymin))
        return PX_EINVAL;
    size_t nx = o.nx, ny = o.ny, N = nx * ny;
    gctx c = {0};
    c.a = o.alloc;
    c.fn = fn;
    c.user = user;
    int st = PX_ENOMEM;
    double *xs = NULL, *ys = NULL;
    size_t *hc = NULL, *vc = NULL;
    px_diagram_grid *g = px_calloc(c.a, 1, sizeof *g);
    if (!g) goto done;
    c.g = g;
    g->alloc = c.a;
    g->nx = nx;
    g->ny = ny;
    g->window = *w;
    xs = px_alloc(c.a, nx * sizeof *xs);
    ys = px_alloc(c.a, ny * sizeof *ys);
    g->label = px_alloc(c.a, N * sizeof *g->label);
    hc = px_alloc(c.a, (nx - 1) * ny * sizeof *hc);
    vc = px_alloc(c.a, nx * (ny - 1) * sizeof *vc);
    if (!xs || !ys || !g->label || !hc || !vc) goto done;
    for (size_t i = 0; i < nx; i++)
        xs[i] = i + 1 == nx ? w->xmax : w->xmin + (w->xmax - w->xmin) * (double)i / (double)(nx - 1);
    for (size_t j = 0; j < ny; j++)
        ys[j] = j + 1 == ny ? w->ymax : w->ymin + (w->ymax - w->ymin) * (double)j / (double)(ny - 1);
    for (size_t j = 0; j < ny; j++)
        for (size_t i = 0; i < nx; i++)
            if ((st = call(&c, xs[i], ys[j], &g->label[j * nx + i]))) goto done;
    st = PX_ENOMEM;
    double tolx = fmax(o.epsabs, o.epsrel * (xs[1] - xs[0]));
    double toly = fmax(o.epsabs, o.epsrel * (ys[1] - ys[0]));
    const int *L = g->label;
    for (size_t j = 0; j < ny; j++)
        for (size_t i = 0; i + 1 < nx; i++) {
            size_t k = j * nx + i, e = j * (nx - 1) + i;
            hc[e] = NONE;
            if (L[k] != L[k + 1] &&
                (st = refine(&c, xs[i], ys[j], L[k], xs[i + 1], ys[j], L[k + 1], tolx, o.max_iter,
                             &hc[e])))
                goto done;
        }
    for (size_t j = 0; j + 1 < ny; j++)
        for (size_t i = 0; i < nx; i++) {
            size_t k = j * nx + i, e = j * nx + i;
            vc[e] = NONE;
            if (L[k] != L[k + nx] &&
                (st = refine(&c, xs[i], ys[j], L[k], xs[i], ys[j + 1], L[k + nx], toly, o.max_iter,
                             &vc[e])))
                goto done;
        }
    /* cells */
    for (size_t j = 0; j + 1 < ny; j++)
        for (size_t i = 0; i + 1 < nx; i++) {
            int lab[4] = {L[j * nx + i], L[j * nx + i + 1], L[(j + 1) * nx + i + 1],
                          L[(j + 1) * nx + i]};
            double cxs[4] = {xs[i], xs[i + 1], xs[i + 1], xs[i]};
            double cys[4] = {ys[j], ys[j], ys[j + 1], ys[j + 1]};
            size_t ex[4] = {hc[j * (nx - 1) + i], vc[j * nx + i + 1], hc[(j + 1) * (nx - 1) + i],
                            vc[j * nx + i]};
            int nc = 0, which[4];
            for (int k = 0; k < 4; k++)
                if (lab[k] != lab[(k + 1) % 4]) which[nc++] = k;
            if (nc == 0) continue;
            st = PX_OK;
            if (nc == 2) {
                int k1 = which[0], k2 = which[1];
                /* corner k1+1 .. k2 lie on one side; take corner (k1+1) */
                int cn = (k1 + 1) % 4;
                int other = lab[k1];
                st = add_seg(&c, ex[k1], ex[k2], lab[cn], other, cxs[cn], cys[cn]);
            } else if (nc == 4 && lab[0] == lab[2] && lab[1] == lab[3]) {
                int idc;
                if ((st = call(&c, 0.5 * (xs[i] + xs[i + 1]), 0.5 * (ys[j] + ys[j + 1]), &idc)))
                    goto done;
                if (idc == lab[0]) { /* corners 1 and 3 are cut off */
                    st = add_seg(&c, ex[0], ex[1], lab[1], lab[0], cxs[1], cys[1]);
                    if (!st) st = add_seg(&c, ex[2], ex[3], lab[3], lab[0], cxs[3], cys[3]);
                } else { /* corners 0 and 2 are cut off */
                    st = add_seg(&c, ex[3], ex[0], lab[0], lab[1], cxs[0], cys[0]);
                    if (!st) st = add_seg(&c, ex[1], ex[2], lab[2], lab[1], cxs[2], cys[2]);
                }
            } else { /* three or more labels: a star from the mean crossing point */
                double mx = 0, my = 0;
                for (int k = 0; k < nc; k++) {
                    mx += c.x[ex[which[k]]];
                    my += c.y[ex[which[k]]];
                }
                size_t m;
                if ((st = add_point(&c, mx / nc, my / nc, &m))) goto done;
                for (int k = 0; k < nc; k++) c.bad[m] |= c.bad[ex[which[k]]];
                for (int k = 0; k < nc && !st; k++) {
                    int e = which[k];
                    st = add_seg(&c, m, ex[e], lab[e], lab[(e + 1) % 4], cxs[e], cys[e]);
                }
            }
            if (st) goto done;
        }
    if ((st = chain(&c))) goto done;
    if ((st = fields_summary(&c, xs, ys))) goto done;
    *out = g;
    g = NULL;
    st = PX_OK;
done:
    px_diagram_grid_free(g);
    px_free(c.a, xs);
    px_free(c.a, ys);
    px_free(c.a, hc);
    px_free(c.a, vc);
    px_free(c.a, c.x);
    px_free(c.a, c.y);
    px_free(c.a, c.bad);
    px_free(c.a, c.s);
    return st;
}
