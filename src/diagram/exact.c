/* exact.c - exact predominance maps as a lower envelope of affine functions.
 *
 * Each candidate j has Phi_j(x, y) = c_j + p_j x + q_j y (DESIGN.md, "the
 * exact method").  Its field is {(x, y) in the domain : Phi_j <= Phi_k for
 * every k}, an intersection of half-planes and so a convex polygon; we get it
 * by clipping the domain polygon (the window, or a ligand field in nested
 * mode) by each half-plane in turn (Sutherland and Hodgman 1974, Comm. ACM
 * 17, 32, specialised to one convex polygon and one line at a time).
 *
 * Robustness: a vertex within `tol` (J/mol) of a line counts as on it, so
 * near-coincident lines and three-line points do not create slivers;
 * species with the same Phi (within tol) keep only the first; the fields
 * are then welded (vertices closer than geom_eps become one shared vertex),
 * T-junctions are split so each interior edge has exactly one partner edge in
 * the neighbouring field, and boundaries are read off the partner pairs.
 * Everything is sequential and ordered by indices, so the same inputs give
 * the same bits. */
#include "diagram/diagram.h"
#include "diagram/diagram_impl.h"
#include "geom/geom.h"
#include "core/status.h"
#include <float.h>
#include <math.h>
#include <stdlib.h>

/* A polygon vertex and the origin of the edge leaving it: src >= 0 is the
 * species k of the line Phi_j = Phi_k; src < 0 is domain edge (-1 - src). */
typedef struct cv {
    double x, y;
    int src;
} cv;

typedef struct rawpoly {
    int region, species;
    size_t first, n;
} rawpoly;

typedef struct builder {
    const px_allocator *a;
    cv *v;
    size_t nv, capv;
    rawpoly *p;
    size_t np, capp;
    px_diagram_absent *ab;
    size_t nab, capab;
    size_t nclip;
} builder;

/* Factor of geom_eps at which an edge's outside neighbour is probed. */
#define PROBE_FACTOR 16.0
/* A boundary line is reported as vertical x = a when its y coefficient,
 * scaled by the window height, is below this fraction of the x one. */
#define VERTICAL_RATIO 1e-12

px_diagram_options px_diagram_options_default(void)
{
    px_diagram_options o;
    o.epsabs = 0.0;
    o.epsrel = 1e-12;
    o.geom_rel = 1e-9;
    o.alloc = NULL;
    return o;
}

static int options_ok(const px_diagram_options *o)
{
    return isfinite(o->epsabs) && o->epsabs >= 0 && isfinite(o->epsrel) && o->epsrel >= 0 &&
           isfinite(o->geom_rel) && o->geom_rel > 0 && o->geom_rel < 1e-2;
}

static int species_ok(const px_diagram_species *sp, size_t m)
{
    if (!sp || m == 0) return 0;
    for (size_t j = 0; j < m; j++)
        if (!isfinite(sp[j].c) || !isfinite(sp[j].p) || !isfinite(sp[j].q)) return 0;
    return 1;
}

size_t px_diagram_species_argmin(const px_diagram_species *sp, size_t m, double x, double y)
{
    size_t best = 0;
    double bv = sp[0].c + sp[0].p * x + sp[0].q * y;
    for (size_t k = 1; k < m; k++) {
        double v = sp[k].c + sp[k].p * x + sp[k].q * y;
        if (v < bv) {
            bv = v;
            best = k;
        }
    }
    return best;
}

/* Keep the part of polygon `in` where dc + dp x + dq y <= tol.  Returns the
 * new vertex count (0: empty); *same = 1 when nothing was cut (out unused). */
static size_t clip(const cv *in, size_t n, double dc, double dp, double dq, double tol,
                   int src, double *d, cv *out, int *same)
{
    int any_out = 0, any_in = 0;
    for (size_t i = 0; i < n; i++) {
        d[i] = dc + dp * in[i].x + dq * in[i].y;
        if (d[i] > tol) any_out = 1;
        else any_in = 1;
    }
    *same = !any_out;
    if (!any_out) return n;
    if (!any_in) return 0;
    size_t k = 0;
    for (size_t i = 0; i < n; i++) {
        size_t i1 = i + 1 == n ? 0 : i + 1;
        double a = d[i], b = d[i1];
        int sa = a > tol ? 1 : (a < -tol ? -1 : 0);
        int sb = b > tol ? 1 : (b < -tol ? -1 : 0);
        if (sa <= 0) {
            cv v = in[i];
            if (sb > 0) {
                if (sa < 0) {
                    out[k++] = v;
                    double t = a / (a - b);
                    cv w = {in[i].x + t * (in[i1].x - in[i].x), in[i].y + t * (in[i1].y - in[i].y),
                            src};
                    out[k++] = w;
                } else {
                    v.src = src;
                    out[k++] = v;
                }
            } else {
                out[k++] = v;
            }
        } else if (sb < 0) {
            double t = a / (a - b);
            cv w = {in[i].x + t * (in[i1].x - in[i].x), in[i].y + t * (in[i1].y - in[i].y),
                    in[i].src};
            out[k++] = w;
        }
    }
    return k;
}

static void area_perimeter(const cv *v, size_t n, double *area, double *perim)
{
    double s = 0, p = 0;
    for (size_t i = 0; i < n; i++) {
        size_t i1 = i + 1 == n ? 0 : i + 1;
        s += v[i].x * v[i1].y - v[i1].x * v[i].y;
        p += hypot(v[i1].x - v[i].x, v[i1].y - v[i].y);
    }
    *area = 0.5 * s;
    *perim = p;
}

typedef struct order_key {
    double v;
    size_t k;
} order_key;

static int cmp_order(const void *pa, const void *pb)
{
    const order_key *a = pa, *b = pb;
    if (a->v < b->v) return -1;
    if (a->v > b->v) return 1;
    return (a->k > b->k) - (a->k < b->k);
}

static int push_absent(builder *B, int region, int species, int id, int reason)
{
    px_diagram_absent x = {region, species, id, reason};
    return PX_DG_PUSH(B->a, B->ab, B->nab, B->capab, x) ? PX_ENOMEM : PX_OK;
}

/* Map one domain (convex CCW polygon dom[0..nd-1], src = -1 - edge index). */
static int map_domain(builder *B, int region, const cv *dom, size_t nd,
                      const px_diagram_species *sp, size_t m, double epsabs, double epsrel,
                      double geps)
{
    int st = PX_ENOMEM;
    size_t cap = 2 * (nd + m) + 8;
    cv *b0 = px_alloc(B->a, cap * sizeof *b0);
    cv *b1 = px_alloc(B->a, cap * sizeof *b1);
    double *d = px_alloc(B->a, cap * sizeof *d);
    order_key *ord = px_alloc(B->a, m * sizeof *ord);
    if (!b0 || !b1 || !d || !ord) goto done;

    /* tolerance on Phi differences from the size of the terms */
    double X = 0, Y = 0, cx = 0, cy = 0;
    for (size_t i = 0; i < nd; i++) {
        X = fmax(X, fabs(dom[i].x));
        Y = fmax(Y, fabs(dom[i].y));
        cx += dom[i].x;
        cy += dom[i].y;
    }
    cx /= (double)nd;
    cy /= (double)nd;
    double S = 0;
    for (size_t j = 0; j < m; j++)
        S = fmax(S, fabs(sp[j].c) + fabs(sp[j].p) * X + fabs(sp[j].q) * Y);
    double tol = epsabs + epsrel * S;
    if (!(S <= DBL_MAX / 8) || !isfinite(tol)) { /* differences of Phi would overflow */
        st = PX_ERANGE;
        goto done;
    }

    /* clip first by the species lowest at the centre: fields shrink fast */
    for (size_t k = 0; k < m; k++) {
        ord[k].v = sp[k].c + sp[k].p * cx + sp[k].q * cy;
        ord[k].k = k;
    }
    qsort(ord, m, sizeof *ord, cmp_order);

    for (size_t j = 0; j < m; j++) {
        int reason = 0;
        /* quick tests on the domain's vertices: duplicate or dominated */
        for (size_t o = 0; o < m && !reason; o++) {
            size_t k = ord[o].k;
            if (k == j) continue;
            double dc = sp[j].c - sp[k].c, dp = sp[j].p - sp[k].p, dq = sp[j].q - sp[k].q;
            int all_above = 1, all_tied = 1;
            for (size_t i = 0; i < nd; i++) {
                double v = dc + dp * dom[i].x + dq * dom[i].y;
                if (!(v > tol)) all_above = 0;
                if (fabs(v) > tol) all_tied = 0;
            }
            if (all_tied && k < j) reason = PX_DIAGRAM_DUPLICATE;
            else if (all_above) reason = PX_DIAGRAM_DOMINATED;
        }
        if (reason) {
            if ((st = push_absent(B, region, (int)j, sp[j].id, reason))) goto done;
            continue;
        }
        cv *cur = b0, *nxt = b1;
        size_t n = nd;
        for (size_t i = 0; i < nd; i++) cur[i] = dom[i];
        for (size_t o = 0; o < m && n > 0; o++) {
            size_t k = ord[o].k;
            if (k == j) continue;
            if (n + 2 > cap / 2) { /* cannot happen for a convex polygon */
                st = PX_ELIMIT;
                goto done;
            }
            int same;
            size_t nn = clip(cur, n, sp[j].c - sp[k].c, sp[j].p - sp[k].p, sp[j].q - sp[k].q, tol,
                             (int)k, d, nxt, &same);
            B->nclip++;
            if (!same) {
                cv *t = cur;
                cur = nxt;
                nxt = t;
                n = nn;
            }
        }
        double area = 0, perim = 0;
        if (n >= 3) area_perimeter(cur, n, &area, &perim);
        if (n < 3 || area <= geps * perim) {
            reason = n == 0 ? PX_DIAGRAM_DOMINATED : PX_DIAGRAM_DEGENERATE;
            if ((st = push_absent(B, region, (int)j, sp[j].id, reason))) goto done;
            continue;
        }
        st = PX_ENOMEM; /* st holds push_absent's PX_OK here */
        if (px_dg_reserve(B->a, (void **)&B->v, &B->capv, B->nv + n, sizeof *B->v)) goto done;
        rawpoly rp = {region, (int)j, B->nv, n};
        if (PX_DG_PUSH(B->a, B->p, B->np, B->capp, rp)) goto done;
        for (size_t i = 0; i < n; i++) B->v[B->nv++] = cur[i];
    }
    st = PX_OK;
done:
    px_free(B->a, b0);
    px_free(B->a, b1);
    px_free(B->a, d);
    px_free(B->a, ord);
    return st;
}

/* ---------------------------------------------------------- assembly */

typedef struct wkey {
    double x, y;
    size_t i;
} wkey;

static int cmp_wkey(const void *pa, const void *pb)
{
    const wkey *a = pa, *b = pb;
    if (a->x != b->x) return a->x < b->x ? -1 : 1;
    if (a->y != b->y) return a->y < b->y ? -1 : 1;
    return (a->i > b->i) - (a->i < b->i);
}

static size_t uf_find(size_t *par, size_t i)
{
    while (par[i] != i) {
        par[i] = par[par[i]];
        i = par[i];
    }
    return i;
}

static void uf_union(size_t *par, size_t a, size_t b)
{
    a = uf_find(par, a);
    b = uf_find(par, b);
    if (a == b) return;
    if (a < b) par[b] = a;
    else par[a] = b;
}

typedef struct ekey {
    size_t lo, hi, field, pos;
    int fwd;
} ekey;

static int cmp_ekey(const void *pa, const void *pb)
{
    const ekey *a = pa, *b = pb;
    if (a->lo != b->lo) return a->lo < b->lo ? -1 : 1;
    if (a->hi != b->hi) return a->hi < b->hi ? -1 : 1;
    if (a->field != b->field) return a->field < b->field ? -1 : 1;
    return (a->pos > b->pos) - (a->pos < b->pos);
}

void px_diagram_map_free(px_diagram_map *map)
{
    if (!map) return;
    const px_allocator *a = map->alloc;
    px_free(a, map->vx);
    px_free(a, map->vy);
    px_free(a, map->ring);
    px_free(a, map->ring_src);
    px_free(a, map->field);
    px_free(a, map->boundary);
    px_free(a, map->absent);
    px_free(a, map);
}

static int field_contains(const px_diagram_map *map, size_t f, double x, double y, double eps)
{
    const px_diagram_field *F = &map->field[f];
    for (size_t i = 0; i < F->n; i++) {
        size_t u = map->ring[F->first + i], v = map->ring[F->first + (i + 1) % F->n];
        double ex = map->vx[v] - map->vx[u], ey = map->vy[v] - map->vy[u];
        double cr = ex * (y - map->vy[u]) - ey * (x - map->vx[u]);
        if (cr < -eps * hypot(ex, ey)) return 0;
    }
    return 1;
}

int px_diagram_map_locate(const px_diagram_map *map, double x, double y)
{
    if (!map || !isfinite(x) || !isfinite(y)) return -1;
    for (size_t f = 0; f < map->nfield; f++)
        if (field_contains(map, f, x, y, map->geom_eps)) return (int)f;
    return -1;
}

/* The line Phi_a - Phi_b = 0 as y = a + b x or x = a. */
static void line_from_planes(const px_diagram_species *s, const px_diagram_species *t, double W,
                             double H, px_diagram_boundary *bd)
{
    double dc = s->c - t->c, dp = s->p - t->p, dq = s->q - t->q;
    if (fabs(dq) * H <= VERTICAL_RATIO * fabs(dp) * W) {
        bd->vertical = 1;
        bd->a = -dc / dp;
        bd->b = 0;
    } else {
        bd->vertical = 0;
        bd->a = -dc / dq;
        bd->b = -dp / dq;
    }
}

static void line_from_points(double x0, double y0, double x1, double y1, double W, double H,
                             px_diagram_boundary *bd)
{
    double dx = x1 - x0, dy = y1 - y0;
    if (fabs(dx) * H <= VERTICAL_RATIO * fabs(dy) * W) {
        bd->vertical = 1;
        bd->a = 0.5 * (x0 + x1);
        bd->b = 0;
    } else {
        bd->vertical = 0;
        bd->b = dy / dx;
        bd->a = y0 - bd->b * x0;
    }
}

typedef struct domain_info {
    const cv *dom;
    size_t nd;
    const px_diagram_species *sp;
} domain_info;

static int assemble(builder *B, const domain_info *di, double geps, double W, double H,
                    double total_area, px_diagram_map **out)
{
    const px_allocator *a = B->a;
    int st = PX_ENOMEM;
    size_t N = B->nv;
    wkey *wk = NULL;
    size_t *par = NULL, *wid = NULL, *rootid = NULL;
    size_t *ring0 = NULL, *ring = NULL;
    int *src0 = NULL, *src = NULL;
    size_t nring0 = 0, capring0 = 0, nring = 0, capring = 0, capsrc0 = 0, capsrc = 0;
    size_t *fstart0 = NULL, *fn0 = NULL;
    ekey *ek = NULL;
    unsigned char *matched = NULL;
    size_t *gpar = NULL;
    px_diagram_map *map = px_calloc(a, 1, sizeof *map);
    if (!map) goto fail;
    map->alloc = a;
    map->geom_eps = geps;
    map->window_area = total_area;
    map->nclip = B->nclip;

    /* 1. weld vertices closer than geps (sorted sweep, union-find) */
    wk = px_alloc(a, (N ? N : 1) * sizeof *wk);
    par = px_alloc(a, (N ? N : 1) * sizeof *par);
    wid = px_alloc(a, (N ? N : 1) * sizeof *wid);
    rootid = px_alloc(a, (N ? N : 1) * sizeof *rootid);
    if (!wk || !par || !wid || !rootid) goto fail;
    for (size_t i = 0; i < N; i++) {
        wk[i].x = B->v[i].x;
        wk[i].y = B->v[i].y;
        wk[i].i = i;
    }
    qsort(wk, N, sizeof *wk, cmp_wkey);
    for (size_t s = 0; s < N; s++) par[s] = s; /* over sorted positions */
    for (size_t s = 0; s < N; s++)
        for (size_t t = s + 1; t < N && wk[t].x - wk[s].x <= geps; t++)
            if (fabs(wk[t].y - wk[s].y) <= geps) uf_union(par, s, t);
    size_t *pos_of = wid; /* raw index -> sorted position (reused below) */
    for (size_t s = 0; s < N; s++) pos_of[wk[s].i] = s;
    for (size_t s = 0; s < N; s++) rootid[s] = (size_t)-1;
    map->vx = px_alloc(a, (N ? N : 1) * sizeof *map->vx);
    map->vy = px_alloc(a, (N ? N : 1) * sizeof *map->vy);
    if (!map->vx || !map->vy) goto fail;
    size_t nw = 0;
    for (size_t i = 0; i < N; i++) { /* number welded vertices by first raw use */
        size_t r = uf_find(par, pos_of[i]);
        if (rootid[r] == (size_t)-1) {
            rootid[r] = nw;
            map->vx[nw] = wk[r].x;
            map->vy[nw] = wk[r].y;
            nw++;
        }
        par[pos_of[i]] = r;
    }
    for (size_t i = 0; i < N; i++) wid[i] = rootid[uf_find(par, pos_of[i])];
    map->nvert = nw;

    /* 2. rings on welded ids, consecutive duplicates removed */
    fstart0 = px_alloc(a, (B->np ? B->np : 1) * sizeof *fstart0);
    fn0 = px_alloc(a, (B->np ? B->np : 1) * sizeof *fn0);
    map->field = px_calloc(a, B->np ? B->np : 1, sizeof *map->field);
    if (!fstart0 || !fn0 || !map->field) goto fail;
    size_t nf = 0;
    for (size_t p = 0; p < B->np; p++) {
        const rawpoly *rp = &B->p[p];
        size_t start = nring0;
        for (size_t i = 0; i < rp->n; i++) {
            size_t w = wid[rp->first + i];
            int s = B->v[rp->first + i].src;
            if (nring0 > start && ring0[nring0 - 1] == w) {
                src0[nring0 - 1] = s; /* zero-length edge: keep the next one's origin */
                continue;
            }
            if (px_dg_reserve(a, (void **)&ring0, &capring0, nring0 + 1, sizeof *ring0) ||
                px_dg_reserve(a, (void **)&src0, &capsrc0, nring0 + 1, sizeof *src0))
                goto fail;
            ring0[nring0] = w;
            src0[nring0] = s;
            nring0++;
        }
        while (nring0 - start > 1 && ring0[nring0 - 1] == ring0[start]) {
            nring0--; /* closing duplicate: its outgoing edge is the first's */
        }
        size_t n = nring0 - start;
        int distinct = n >= 3;
        if (distinct) { /* reject A,B,A spikes collapsing to a line */
            double s = 0;
            for (size_t i = 0; i < n; i++) {
                size_t u = ring0[start + i], v = ring0[start + (i + 1) % n];
                s += map->vx[u] * map->vy[v] - map->vx[v] * map->vy[u];
            }
            if (!(0.5 * s > 0)) distinct = 0;
        }
        if (!distinct) {
            nring0 = start;
            const domain_info *D = &di[rp->region];
            if ((st = push_absent(B, rp->region, rp->species, D->sp[rp->species].id,
                                  PX_DIAGRAM_DEGENERATE)))
                goto fail;
            st = PX_ENOMEM;
            continue;
        }
        px_diagram_field *F = &map->field[nf];
        F->region = rp->region;
        F->species = rp->species;
        F->id = di[rp->region].sp[rp->species].id;
        F->label = di[rp->region].sp[rp->species].label;
        fstart0[nf] = start;
        fn0[nf] = n;
        nf++;
    }
    map->nfield = nf;

    /* 3. split T-junctions: a welded vertex inside an edge becomes a vertex */
    for (size_t f = 0; f < nf; f++) {
        px_diagram_field *F = &map->field[f];
        F->first = nring;
        for (size_t i = 0; i < fn0[f]; i++) {
            size_t u = ring0[fstart0[f] + i], v = ring0[fstart0[f] + (i + 1) % fn0[f]];
            int s = src0[fstart0[f] + i];
            if (px_dg_reserve(a, (void **)&ring, &capring, nring + 1, sizeof *ring) ||
                px_dg_reserve(a, (void **)&src, &capsrc, nring + 1, sizeof *src))
                goto fail;
            ring[nring] = u;
            src[nring] = s;
            nring++;
            double ux = map->vx[u], uy = map->vy[u], ex = map->vx[v] - ux, ey = map->vy[v] - uy;
            double L = hypot(ex, ey);
            double bx0 = fmin(ux, map->vx[v]) - geps, bx1 = fmax(ux, map->vx[v]) + geps;
            double by0 = fmin(uy, map->vy[v]) - geps, by1 = fmax(uy, map->vy[v]) + geps;
            size_t ins = nring;
            for (size_t w = 0; w < nw; w++) {
                if (w == u || w == v) continue;
                double wx = map->vx[w], wy = map->vy[w];
                if (wx < bx0 || wx > bx1 || wy < by0 || wy > by1) continue;
                double t = ((wx - ux) * ex + (wy - uy) * ey) / L;
                if (t <= geps || t >= L - geps) continue;
                if (fabs(ex * (wy - uy) - ey * (wx - ux)) / L > geps) continue;
                if (px_dg_reserve(a, (void **)&ring, &capring, nring + 1, sizeof *ring) ||
                    px_dg_reserve(a, (void **)&src, &capsrc, nring + 1, sizeof *src))
                    goto fail;
                /* insertion sort by t along the edge */
                size_t k = nring;
                while (k > ins) {
                    size_t z = ring[k - 1];
                    double tz = ((map->vx[z] - ux) * ex + (map->vy[z] - uy) * ey) / L;
                    if (tz <= t) break;
                    ring[k] = ring[k - 1];
                    k--;
                }
                ring[k] = w;
                nring++;
                for (size_t q = ins; q < nring; q++) src[q] = s;
            }
        }
        F->n = nring - F->first;
        double s2 = 0;
        for (size_t i = 0; i < F->n; i++) {
            size_t u = ring[F->first + i], v = ring[F->first + (i + 1) % F->n];
            s2 += map->vx[u] * map->vy[v] - map->vx[v] * map->vy[u];
        }
        F->area = 0.5 * s2;
        F->group = (int)f;
    }
    map->ring = ring;
    map->ring_src = src;
    map->nring = nring;
    ring = NULL;
    src = NULL;

    /* 4. partner edges -> boundaries; same-id partners -> groups */
    ek = px_alloc(a, (nring ? nring : 1) * sizeof *ek);
    matched = px_calloc(a, nring ? nring : 1, 1);
    gpar = px_alloc(a, (nf ? nf : 1) * sizeof *gpar);
    if (!ek || !matched || !gpar) goto fail;
    size_t ne = 0;
    for (size_t f = 0; f < nf; f++) {
        gpar[f] = f;
        const px_diagram_field *F = &map->field[f];
        for (size_t i = 0; i < F->n; i++) {
            size_t u = map->ring[F->first + i], v = map->ring[F->first + (i + 1) % F->n];
            ekey e = {u < v ? u : v, u < v ? v : u, f, F->first + i, u < v};
            ek[ne++] = e;
        }
    }
    qsort(ek, ne, sizeof *ek, cmp_ekey);
    size_t capbd = 0;
    for (size_t s = 0; s < ne;) {
        size_t t = s;
        while (t < ne && ek[t].lo == ek[s].lo && ek[t].hi == ek[s].hi) t++;
        for (size_t i = s; i < t; i++) {
            if (matched[ek[i].pos]) continue;
            for (size_t j = i + 1; j < t; j++) {
                if (matched[ek[j].pos] || ek[j].fwd == ek[i].fwd || ek[j].field == ek[i].field)
                    continue;
                matched[ek[i].pos] = matched[ek[j].pos] = 1;
                size_t f = ek[i].field, g = ek[j].field; /* f < g by the sort */
                const px_diagram_field *Ff = &map->field[f], *Fg = &map->field[g];
                if (Ff->id == Fg->id) {
                    uf_union(gpar, f, g);
                    break;
                }
                px_diagram_boundary bd;
                bd.field_a = (int)f;
                bd.field_b = (int)g;
                bd.id_a = Ff->id;
                bd.id_b = Fg->id;
                size_t pu = ek[i].pos;
                size_t nextp = pu + 1 == Ff->first + Ff->n ? Ff->first : pu + 1;
                size_t u = map->ring[pu], v = map->ring[nextp];
                bd.x0 = map->vx[u];
                bd.y0 = map->vy[u];
                bd.x1 = map->vx[v];
                bd.y1 = map->vy[v];
                if (Ff->region == Fg->region) {
                    const px_diagram_species *sp = di[Ff->region].sp;
                    line_from_planes(&sp[Ff->species], &sp[Fg->species], W, H, &bd);
                } else {
                    /* a ligand-field edge: the caller's polygon edge */
                    int sf = map->ring_src[pu];
                    int sg = map->ring_src[ek[j].pos];
                    const cv *dom = sf < 0 ? di[Ff->region].dom : di[Fg->region].dom;
                    size_t nd = sf < 0 ? di[Ff->region].nd : di[Fg->region].nd;
                    int e = sf < 0 ? -1 - sf : (sg < 0 ? -1 - sg : -1);
                    if (e >= 0)
                        line_from_points(dom[e].x, dom[e].y, dom[(e + 1) % nd].x,
                                         dom[(e + 1) % nd].y, W, H, &bd);
                    else
                        line_from_points(bd.x0, bd.y0, bd.x1, bd.y1, W, H, &bd);
                }
                if (PX_DG_PUSH(a, map->boundary, map->nboundary, capbd, bd)) goto fail;
                break;
            }
        }
        s = t;
    }
    /* interior edges left without a partner: probe the far side */
    for (size_t f = 0; f < nf; f++) {
        const px_diagram_field *F = &map->field[f];
        for (size_t i = 0; i < F->n; i++) {
            size_t pu = F->first + i;
            if (matched[pu]) continue;
            size_t u = map->ring[pu], v = map->ring[F->first + (i + 1) % F->n];
            double ex = map->vx[v] - map->vx[u], ey = map->vy[v] - map->vy[u];
            double L = hypot(ex, ey), h = PROBE_FACTOR * geps;
            double mx = 0.5 * (map->vx[u] + map->vx[v]) + h * ey / L;
            double my = 0.5 * (map->vy[u] + map->vy[v]) - h * ex / L;
            int g = px_diagram_map_locate(map, mx, my);
            if (g < 0 || (size_t)g == f) continue;
            map->nunmatched++;
        }
    }
    for (size_t f = 0; f < nf; f++) map->field[f].group = (int)uf_find(gpar, f);

    map->absent = B->ab;
    map->nabsent = B->nab;
    B->ab = NULL;
    *out = map;
    st = PX_OK;
    map = NULL;
fail:
    px_diagram_map_free(map);
    px_free(a, wk);
    px_free(a, par);
    px_free(a, wid);
    px_free(a, rootid);
    px_free(a, ring0);
    px_free(a, src0);
    px_free(a, ring);
    px_free(a, src);
    px_free(a, fstart0);
    px_free(a, fn0);
    px_free(a, ek);
    px_free(a, matched);
    px_free(a, gpar);
    return st;
}

static void builder_free(builder *B)
{
    px_free(B->a, B->v);
    px_free(B->a, B->p);
    px_free(B->a, B->ab);
}

int px_diagram_map_exact(const px_diagram_window *w, const px_diagram_species *sp, size_t m,
                         const px_diagram_options *opt, px_diagram_map **out)
{
    if (!out) return PX_EINVAL;
    *out = NULL;
    px_diagram_options o = opt ? *opt : px_diagram_options_default();
    if (!w || !options_ok(&o) || !species_ok(sp, m) || m > (size_t)INT32_MAX) return PX_EINVAL;
    if (!isfinite(w->xmin) || !isfinite(w->xmax) || !isfinite(w->ymin) || !isfinite(w->ymax) ||
        !(w->xmin < w->xmax) || !(w->ymin < w->ymax))
        return PX_EINVAL;
    double W = w->xmax - w->xmin, H = w->ymax - w->ymin;
    if (!isfinite(W) || !isfinite(H)) return PX_EINVAL;
    cv dom[4] = {{w->xmin, w->ymin, -1}, {w->xmax, w->ymin, -2},
                 {w->xmax, w->ymax, -3}, {w->xmin, w->ymax, -4}};
    double geps = o.geom_rel * hypot(W, H);
    builder B = {0};
    B.a = o.alloc;
    int st = map_domain(&B, 0, dom, 4, sp, m, o.epsabs, o.epsrel, geps);
    if (st == PX_OK) {
        domain_info di = {dom, 4, sp};
        st = assemble(&B, &di, geps, W, H, W * H, out);
    }
    builder_free(&B);
    return st;
}

int px_diagram_map_nested(const px_diagram_region *r, size_t nr, const px_diagram_options *opt,
                          px_diagram_map **out)
{
    if (!out) return PX_EINVAL;
    *out = NULL;
    px_diagram_options o = opt ? *opt : px_diagram_options_default();
    if (!r || nr == 0 || nr > (size_t)INT32_MAX || !options_ok(&o)) return PX_EINVAL;
    double xmin = INFINITY, xmax = -INFINITY, ymin = INFINITY, ymax = -INFINITY;
    size_t ntot = 0;
    for (size_t k = 0; k < nr; k++) {
        if (!r[k].x || !r[k].y || r[k].n < 3 || !species_ok(r[k].sp, r[k].m) ||
            r[k].m > (size_t)INT32_MAX || r[k].n > (size_t)INT32_MAX / 2)
            return PX_EINVAL;
        for (size_t i = 0; i < r[k].n; i++) {
            if (!isfinite(r[k].x[i]) || !isfinite(r[k].y[i])) return PX_EINVAL;
            xmin = fmin(xmin, r[k].x[i]);
            xmax = fmax(xmax, r[k].x[i]);
            ymin = fmin(ymin, r[k].y[i]);
            ymax = fmax(ymax, r[k].y[i]);
        }
        ntot += r[k].n;
    }
    double W = xmax - xmin, H = ymax - ymin;
    if (!(W > 0) || !(H > 0) || !isfinite(W) || !isfinite(H)) return PX_EINVAL;
    double geps = o.geom_rel * hypot(W, H);
    builder B = {0};
    B.a = o.alloc;
    int st = PX_ENOMEM;
    cv *doms = px_alloc(B.a, ntot * sizeof *doms);
    domain_info *di = px_alloc(B.a, nr * sizeof *di);
    if (!doms || !di) goto done;
    double total = 0;
    size_t off = 0;
    for (size_t k = 0; k < nr; k++) {
        size_t n = r[k].n;
        double s = px_geom_polygon_area(r[k].x, r[k].y, n);
        int rev = s < 0;
        cv *D = doms + off;
        for (size_t i = 0; i < n; i++) {
            size_t ii = rev ? n - 1 - i : i;
            D[i].x = r[k].x[ii];
            D[i].y = r[k].y[ii];
            D[i].src = -1 - (int)i;
        }
        /* convex, counter-clockwise, not degenerate */
        st = PX_EINVAL;
        if (!(fabs(s) > geps * hypot(W, H))) goto done;
        for (size_t i = 0; i < n; i++) {
            const cv *p0 = &D[i], *p1 = &D[(i + 1) % n], *p2 = &D[(i + 2) % n];
            double cr = (p1->x - p0->x) * (p2->y - p1->y) - (p1->y - p0->y) * (p2->x - p1->x);
            double sc = hypot(p1->x - p0->x, p1->y - p0->y) + hypot(p2->x - p1->x, p2->y - p1->y);
            if (cr < -geps * sc) goto done;
        }
        di[k].dom = D;
        di[k].nd = n;
        di[k].sp = r[k].sp;
        total += fabs(s);
        off += n;
        st = map_domain(&B, (int)k, D, n, r[k].sp, r[k].m, o.epsabs, o.epsrel, geps);
        if (st) goto done;
    }
    st = assemble(&B, di, geps, W, H, total, out);
done:
    builder_free(&B);
    px_free(B.a, doms);
    px_free(B.a, di);
    return st;
}
