/* outline.c - union of map fields into class outlines; corrosion domains.
 *
 * The fields of an exact map tile the window with shared vertices and
 * partner edges (exact.c).  The union of the fields of one class is bounded
 * by the edges whose partner belongs to another class (or that lie on the
 * window): drop every partner pair inside a class and chain what is left
 * into loops, turning at each vertex to the first edge clockwise from the
 * way back (the face-tracing rule of planar maps), so two pieces touching at
 * one vertex give two loops.  Outer loops come out counter-clockwise, holes
 * clockwise.
 *
 * Corrosion domains merge fields by the species' kind (Pourbaix 1966, Atlas
 * of Electrochemical Equilibria, ch. 1; from memory): metal stable ->
 * immunity, a solid oxide, hydroxide or salt -> passivation (possible, film
 * permitting), a dissolved species -> corrosion.  A thermodynamic domain
 * says what can form, not how fast. */
#include "diagram/diagram.h"
#include "diagram/diagram_impl.h"
#include "geom/geom.h"
#include "core/status.h"
#include <math.h>
#include <stdlib.h>

typedef struct oedge {
    size_t u, v; /* directed u -> v */
    int cls;
    int used;
} oedge;

typedef struct pkey {
    size_t lo, hi, idx;
} pkey;

static int cmp_pkey(const void *pa, const void *pb)
{
    const pkey *a = pa, *b = pb;
    if (a->lo != b->lo) return a->lo < b->lo ? -1 : 1;
    if (a->hi != b->hi) return a->hi < b->hi ? -1 : 1;
    return (a->idx > b->idx) - (a->idx < b->idx);
}

static int cmp_out(const void *pa, const void *pb)
{
    const oedge *a = pa, *b = pb;
    if (a->u != b->u) return a->u < b->u ? -1 : 1;
    if (a->cls != b->cls) return a->cls < b->cls ? -1 : 1;
    return (a->v > b->v) - (a->v < b->v);
}

void px_diagram_outlines_free(px_diagram_outlines *o)
{
    if (!o) return;
    px_free(o->alloc, o->loop);
    px_free(o->alloc, o->x);
    px_free(o->alloc, o->y);
    px_free(o->alloc, o);
}

/* clockwise angle from direction (ax, ay) to (bx, by), in (0, 2 pi] */
static double cw_angle(double ax, double ay, double bx, double by)
{
    double t = atan2(ax * by - ay * bx, ax * bx + ay * by); /* ccw angle in (-pi, pi] */
    double cw = -t;
    if (cw <= 0) cw += 2 * 3.14159265358979323846;
    return cw;
}

int px_diagram_map_union(const px_diagram_map *map, const int *field_class,
                         px_diagram_outlines **out)
{
    if (!out) return PX_EINVAL;
    *out = NULL;
    if (!map || !field_class) return PX_EINVAL;
    if (map->nunmatched) return PX_EDATA;
    const px_allocator *a = map->alloc;
    int st = PX_ENOMEM;
    size_t ne = 0;
    for (size_t f = 0; f < map->nfield; f++)
        if (field_class[f] >= 0) ne += map->field[f].n;
    oedge *e = px_alloc(a, (ne ? ne : 1) * sizeof *e);
    pkey *k = px_alloc(a, (map->nring ? map->nring : 1) * sizeof *k);
    int *ecls = px_alloc(a, (map->nring ? map->nring : 1) * sizeof *ecls);
    unsigned char *drop = px_calloc(a, map->nring ? map->nring : 1, 1);
    size_t *start = px_alloc(a, (map->nvert + 1) * sizeof *start);
    size_t caploop = 0, nvid = 0, capvid = 0;
    size_t *vid = NULL;
    px_diagram_outlines *o = px_calloc(a, 1, sizeof *o);
    if (o) o->alloc = a; /* before any failure: px_diagram_outlines_free releases through it */
    if (!e || !k || !ecls || !drop || !start || !o) goto done;

    /* cancel partner pairs inside one class */
    size_t nk = 0;
    for (size_t f = 0; f < map->nfield; f++) {
        const px_diagram_field *F = &map->field[f];
        for (size_t i = 0; i < F->n; i++) {
            size_t u = map->ring[F->first + i], v = map->ring[F->first + (i + 1) % F->n];
            ecls[F->first + i] = field_class[f];
            pkey p = {u < v ? u : v, u < v ? v : u, F->first + i};
            k[nk++] = p;
        }
    }
    qsort(k, nk, sizeof *k, cmp_pkey);
    for (size_t s = 0; s < nk;) {
        size_t t = s;
        while (t < nk && k[t].lo == k[s].lo && k[t].hi == k[s].hi) t++;
        for (size_t i = s; i < t; i++)
            for (size_t j = i + 1; j < t; j++)
                if (!drop[k[i].idx] && !drop[k[j].idx] && ecls[k[i].idx] == ecls[k[j].idx] &&
                    map->ring[k[i].idx] != map->ring[k[j].idx]) {
                    drop[k[i].idx] = drop[k[j].idx] = 1;
                    break;
                }
        s = t;
    }
    ne = 0;
    for (size_t f = 0; f < map->nfield; f++) {
        const px_diagram_field *F = &map->field[f];
        if (field_class[f] < 0) continue;
        for (size_t i = 0; i < F->n; i++) {
            if (drop[F->first + i]) continue;
            oedge x = {map->ring[F->first + i], map->ring[F->first + (i + 1) % F->n],
                       field_class[f], 0};
            e[ne++] = x;
        }
    }
    qsort(e, ne, sizeof *e, cmp_out);
    for (size_t v = 0, i = 0; v <= map->nvert; v++) {
        while (i < ne && e[i].u < v) i++;
        start[v] = i;
    }

    /* chain loops (vertex indices first, coordinates at the end) */
    const double *X = map->vx, *Y = map->vy;
    double geps = map->geom_eps;
    for (size_t s = 0; s < ne; s++) {
        if (e[s].used) continue;
        size_t first = nvid, cur = s, guard = 0;
        for (;;) {
            e[cur].used = 1;
            size_t u = e[cur].u, v = e[cur].v;
            if (PX_DG_PUSH(a, vid, nvid, capvid, u)) goto done;
            if (++guard > ne) {
                st = PX_EDATA;
                goto done;
            }
            /* next: unused outgoing edge of v, same class, first clockwise from v->u */
            size_t best = (size_t)-1;
            double ba = INFINITY;
            for (size_t c = start[v]; c < start[v + 1]; c++) {
                if ((e[c].used && c != s) || e[c].cls != e[s].cls) continue;
                double ang = cw_angle(X[u] - X[v], Y[u] - Y[v], X[e[c].v] - X[v], Y[e[c].v] - Y[v]);
                if (ang < ba) {
                    ba = ang;
                    best = c;
                }
            }
            if (best == (size_t)-1) { /* open chain: the tiling is broken */
                st = PX_EDATA;
                goto done;
            }
            if (best == s) break; /* closed */
            cur = best;
        }
        /* drop vertices that lie on the segment joining their neighbours */
        size_t n = nvid - first;
        for (int changed = 1; changed && n > 3;) {
            changed = 0;
            for (size_t i = 0; i < n && n > 3; i++) {
                size_t p0 = vid[first + (i + n - 1) % n], p1 = vid[first + i],
                       p2 = vid[first + (i + 1) % n];
                double ex = X[p2] - X[p0], ey = Y[p2] - Y[p0], L = hypot(ex, ey);
                double cr = ex * (Y[p1] - Y[p0]) - ey * (X[p1] - X[p0]);
                double t = (ex * (X[p1] - X[p0]) + ey * (Y[p1] - Y[p0])) / (L * L);
                if (L > 0 && fabs(cr) <= geps * L && t > 0 && t < 1) {
                    for (size_t q = first + i; q + 1 < first + n; q++) vid[q] = vid[q + 1];
                    n--;
                    changed = 1;
                }
            }
        }
        nvid = first + n;
        px_diagram_loop L = {e[s].cls, first, n, 0.0}; /* area once the points are out */
        if (PX_DG_PUSH(a, o->loop, o->nloop, caploop, L)) goto done;
    }
    o->nvert = nvid;
    o->x = px_alloc(a, (nvid ? nvid : 1) * sizeof *o->x);
    o->y = px_alloc(a, (nvid ? nvid : 1) * sizeof *o->y);
    if (!o->x || !o->y) goto done;
    for (size_t i = 0; i < nvid; i++) {
        o->x[i] = X[vid[i]];
        o->y[i] = Y[vid[i]];
    }
    for (size_t l = 0; l < o->nloop; l++) {
        px_diagram_loop *lp = &o->loop[l];
        lp->area = px_geom_polygon_area(o->x + lp->first, o->y + lp->first, lp->n);
    }
    *out = o;
    st = PX_OK;
done:
    if (st != PX_OK) px_diagram_outlines_free(o);
    px_free(a, e);
    px_free(a, k);
    px_free(a, ecls);
    px_free(a, drop);
    px_free(a, start);
    px_free(a, vid);
    return st;
}

int px_diagram_corrosion_domains(const px_diagram_map *map, const int *kind,
                                 px_diagram_outlines **out)
{
    if (!out) return PX_EINVAL;
    *out = NULL;
    if (!map || !kind) return PX_EINVAL;
    int *cls = px_alloc(map->alloc, (map->nfield ? map->nfield : 1) * sizeof *cls);
    if (!cls) return PX_ENOMEM;
    int st = PX_OK;
    for (size_t f = 0; f < map->nfield && st == PX_OK; f++) {
        switch (kind[f]) {
        case PX_DIAGRAM_METAL: cls[f] = PX_DIAGRAM_IMMUNITY; break;
        case PX_DIAGRAM_SOLID: cls[f] = PX_DIAGRAM_PASSIVATION; break;
        case PX_DIAGRAM_DISSOLVED: cls[f] = PX_DIAGRAM_CORROSION; break;
        case PX_DIAGRAM_SULFIDE: cls[f] = PX_DIAGRAM_SULFIDE_FILM; break;
        default: st = PX_EINVAL;
        }
    }
    if (st == PX_OK) st = px_diagram_map_union(map, cls, out);
    px_free(map->alloc, cls);
    return st;
}
