/* rmap.c - rigorous maps: the speciation solver labels the grid's nodes
 * and the bisection points of its boundaries on one or more threads, then
 * the grid tracer reads those labels (see rmap.h).  Each solve starts warm
 * from the last one of its job; a failed warm start is retried cold before
 * the point is given up. */
#include "diagram/rmap.h"
#include "core/alloc.h"
#include "core/constants.h"
#include "core/proc.h"
#include "core/status.h"
#include <math.h>
#include <pthread.h>
#include <stdatomic.h>
#include <stdio.h>
#include <stdlib.h>
#include <string.h>

#define PX_RMAP_DEFAULT_TOTAL 1e-6 /* mol/kg: the corrosion convention, common practice */

px_rmap_options px_rmap_options_default(void)
{
    px_rmap_options o;
    memset(&o, 0, sizeof o);
    o.T = PX_TR;
    o.P = PX_PR;
    o.window = (px_diagram_window){0.0, 14.0, -2.0, 2.0};
    o.grid = px_diagram_grid_options_default();
    o.total = PX_RMAP_DEFAULT_TOTAL;
    o.ligand_total = 1e-3;
    o.model = PX_EQUIL_DAVIES;
    o.threads = 1;
    o.ligands = px_ligand_states_default();
    return o;
}

typedef struct rctx {
    px_spec *s;
    const px_db *db;
    int zM;
    double T;
    size_t comp; /* component of the element */
    px_equil_options sopt;
    px_rmap_stats *stats;
} rctx;

#define PX_RMAP_SI_TOL 1e-6 /* a solid above this saturation index is over-saturated */

/* Is any solid that is allowed to precipitate over-saturated? */
static int supersaturated(const rctx *c)
{
    for (size_t j = c->s->n_basis; j < c->s->n_species; j++) {
        const px_species *sp = px_db_get(c->db, (size_t)c->s->db_index[j]);
        if (sp->f.state != PX_STATE_S) continue;
        px_equil_species_result r;
        if (px_equil_work_get_species(c->s->work, j, &r) == PX_OK && r.si > PX_RMAP_SI_TOL) return 1;
    }
    return 0;
}

static int label_node(double x, double y, void *user, int *id)
{
    rctx *c = user;
    int st = px_equil_system_set_ph(c->s->sys, 1, x);
    if (st == PX_OK) st = px_equil_system_set_eh(c->s->sys, 2, y, c->T);
    if (st != PX_OK) return st; /* misuse: abort the map */
    c->stats->solves++;
    st = px_equil_solve(c->s->sys, c->s->work, &c->sopt);
    if (st == PX_OK && supersaturated(c)) {
        /* a warm start can keep a solid that the new node no longer
         * favours while another is over-saturated: solve again cold */
        c->stats->cold_retries++;
        px_equil_work_reset(c->s->work);
        st = px_equil_solve(c->s->sys, c->s->work, &c->sopt);
    }
    if (st != PX_OK) {
        px_equil_work_reset(c->s->work);
        st = px_equil_solve(c->s->sys, c->s->work, &c->sopt);
    }
    if (st != PX_OK) { /* last resort: continuation in the totals */
        c->stats->cold_retries++;
        st = px_spec_solve(c->s, &c->sopt, NULL, 0);
    }
    if (st != PX_OK) {
        if (c->stats->failures < PX_RMAP_FAIL_KEEP) {
            c->stats->fail_x[c->stats->failures] = x;
            c->stats->fail_y[c->stats->failures] = y;
        }
        c->stats->failures++;
        px_equil_work_reset(c->s->work);
        *id = -1;
        return 0;
    }
    px_equil_stats es;
    if (px_equil_work_get_stats(c->s->work, &es) == PX_OK && es.ionic_strength > c->stats->I_max)
        c->stats->I_max = es.ionic_strength;
    size_t nb = c->s->n_basis;
    long best_solid = -1, best_aq = -1;
    double amt_solid = 0, amt_aq = 0;
    for (size_t j = 0; j < c->s->n_species; j++) {
        double nu = c->s->nu[j * nb + c->comp];
        if (!(nu > 0)) continue;
        px_equil_species_result r;
        px_equil_work_get_species(c->s->work, j, &r);
        const px_species *sp = px_db_get(c->db, (size_t)c->s->db_index[j]);
        if (sp->f.state == PX_STATE_S) {
            if (r.amount * nu > amt_solid) {
                amt_solid = r.amount * nu;
                best_solid = c->s->db_index[j];
            }
        } else if (sp->f.state == PX_STATE_AQ && r.molality * nu > amt_aq) {
            amt_aq = r.molality * nu;
            best_aq = c->s->db_index[j];
        }
    }
    *id = (int)(best_solid >= 0 ? best_solid : best_aq);
    return 0;
}

/* Grid node coordinates, exactly as px_diagram_grid_map computes them. */
static double node(double lo, double hi, size_t i, size_t n)
{
    return i + 1 == n ? hi : lo + (hi - lo) * (double)i / (double)(n - 1);
}

/* Work is cut into jobs whose results do not depend on which thread runs
 * them or when: every job starts its solver cold (px_equil_work_reset)
 * and warm-starts only from its own earlier solves, and keeps its own
 * statistics, merged in job order.  So 1, 2 or N threads give the same
 * bytes.  Jobs are handed out from an atomic counter (dynamic sharing:
 * rows near a boundary cost more solves, so fixed halves leave a thread
 * idle).  Phase 1: the grid's rows, a chunk at a time, snaking within the
 * chunk.  Phase 2: the bisection of every grid edge whose ends differ,
 * repeating exactly the midpoints the grid tracer will ask for (same
 * arithmetic as px_diagram_grid_map's refinement), and the centre of every
 * saddle cell; the tracer then finds every label in a table and solves
 * nothing.  The edges of one pair of labels, sorted by row then column,
 * follow their boundary, so a job takes a few consecutive ones and each
 * bisection starts warm from the last point of the one before. */
#define PX_RMAP_ROW_CHUNK 4  /* rows per job: one cold start per chunk, common practice, no source */
#define PX_RMAP_EDGE_CHUNK 8 /* edges per job (about 160 solves), common practice, no source */

typedef struct probe {
    double x, y;
    int id;
    size_t job; /* the job that solved it: ties resolved by job order */
} probe;

typedef struct edge_job {
    double x0, y0, x1, y1, tol; /* a saddle centre: (x0, y0) alone, tol < 0 */
    int la, lb;
    size_t i, j; /* lower-left node; sort key with the pair */
    int dir;     /* 0: along x, 1: along y, 2: saddle centre */
} edge_job;

typedef struct edge_range {
    size_t first, n; /* edges of one phase-2 job */
} edge_range;

typedef struct shared {
    const px_diagram_window *w;
    size_t nx, ny, nchunks;
    int *labels;
    atomic_size_t next; /* the next job of the running phase */
    atomic_int stop;    /* a worker failed: the others stop */
    int phase;          /* 1: rows, 2: edges and saddle centres */
    const edge_job *edges;
    const edge_range *ranges;
    size_t nranges;
    px_rmap_stats *jstats; /* per job: the row chunks, then the edges */
    int max_iter;
    const px_allocator *a; /* px_rmap_options.alloc (called from every worker thread) */
} shared;

typedef struct worker {
    rctx c;
    shared *sh;
    probe *pr; /* the bisection points this thread solved */
    size_t npr, cappr;
    size_t jobs;
    double cpu;        /* seconds of CPU over the parallel phases */
    double job_max[2]; /* seconds of CPU of the longest job of each phase */
    int st;
} worker;

static int keep_probe(worker *w, double x, double y, int id, size_t job)
{
    if (w->npr == w->cappr) {
        size_t nc = w->cappr ? 2 * w->cappr : 256;
        probe *p = px_realloc(w->sh->a, w->pr, w->cappr * sizeof *p, nc * sizeof *p);
        if (!p) return PX_ENOMEM;
        w->pr = p;
        w->cappr = nc;
    }
    w->pr[w->npr++] = (probe){x, y, id, job};
    return PX_OK;
}

/* The bisection of px_diagram_grid_map (grid.c, refine), point for point;
 * a saddle job solves its one point. */
static int edge_run(worker *w, const edge_job *e, size_t job)
{
    if (e->tol < 0) {
        int id, st = label_node(e->x0, e->y0, &w->c, &id);
        return st != PX_OK ? st : keep_probe(w, e->x0, e->y0, id, job);
    }
    double lo = 0, hi = 1, len = fmax(fabs(e->x1 - e->x0), fabs(e->y1 - e->y0));
    int it = 0;
    while ((hi - lo) * len > e->tol) {
        if (it++ >= w->sh->max_iter) break;
        double t = 0.5 * (lo + hi);
        double x = e->x0 + t * (e->x1 - e->x0), y = e->y0 + t * (e->y1 - e->y0);
        int id, st = label_node(x, y, &w->c, &id);
        if (st != PX_OK) return st;
        if ((st = keep_probe(w, x, y, id, job)) != PX_OK) return st;
        if (id == e->la) lo = t;
        else hi = t;
    }
    return PX_OK;
}

static int row_run(worker *w, size_t chunk)
{
    shared *sh = w->sh;
    size_t j0 = chunk * PX_RMAP_ROW_CHUNK;
    size_t j1 = j0 + PX_RMAP_ROW_CHUNK < sh->ny ? j0 + PX_RMAP_ROW_CHUNK : sh->ny;
    for (size_t j = j0; j < j1; j++)
        for (size_t k = 0; k < sh->nx; k++) {
            size_t i = (j - j0) % 2 ? sh->nx - 1 - k : k;
            int st = label_node(node(sh->w->xmin, sh->w->xmax, i, sh->nx), node(sh->w->ymin, sh->w->ymax, j, sh->ny),
                                &w->c, &sh->labels[j * sh->nx + i]);
            if (st != PX_OK) return st;
        }
    return PX_OK;
}

/* Take jobs of the running phase until none is left. */
static void *worker_run(void *arg)
{
    worker *w = arg;
    shared *sh = w->sh;
    double c0 = px_clock_thread_cpu();
    int rows = sh->phase == 1;
    size_t njobs = rows ? sh->nchunks : sh->nranges;
    while (w->st == PX_OK && !atomic_load(&sh->stop)) {
        size_t k = atomic_fetch_add(&sh->next, 1);
        if (k >= njobs) break;
        size_t job = rows ? k : sh->nchunks + k;
        w->c.stats = &sh->jstats[job];
        px_equil_work_reset(w->c.s->work); /* a cold start: the job's result is its own */
        double cj = px_clock_thread_cpu();
        if (rows) w->st = row_run(w, k);
        for (size_t e = 0; !rows && e < sh->ranges[k].n && w->st == PX_OK; e++)
            w->st = edge_run(w, &sh->edges[sh->ranges[k].first + e], job);
        w->job_max[!rows] = fmax(w->job_max[!rows], px_clock_thread_cpu() - cj);
        w->jobs++;
        if (w->st != PX_OK) atomic_store(&sh->stop, 1);
    }
    w->cpu += px_clock_thread_cpu() - c0;
    return NULL;
}

/* Run one phase on nt threads (the calling thread is worker 0); PX_ENOMEM if
 * a thread cannot start (the ones started are joined). */
static int run_phase(worker *ws, int nt)
{
    pthread_t tid[PX_RMAP_MAX_THREADS];
    int started = 1, st = PX_OK;
    atomic_store(&ws[0].sh->next, 0);
    for (int t = 1; t < nt; t++, started++)
        if (pthread_create(&tid[t], NULL, worker_run, &ws[t]) != 0) {
            st = PX_ENOMEM;
            atomic_store(&ws[0].sh->stop, 1);
            break;
        }
    worker_run(&ws[0]);
    for (int t = 1; t < started; t++) pthread_join(tid[t], NULL);
    for (int t = 0; t < nt && st == PX_OK; t++)
        if (ws[t].st != PX_OK) st = ws[t].st;
    return st;
}

static int push_edge(const px_allocator *a, edge_job **e, size_t *cnt, size_t *cap, edge_job j)
{
    if (*cnt == *cap) {
        size_t nc = *cap ? 2 * *cap : 256;
        edge_job *p = px_realloc(a, *e, *cap * sizeof *p, nc * sizeof *p);
        if (!p) return PX_ENOMEM;
        *e = p;
        *cap = nc;
    }
    (*e)[(*cnt)++] = j;
    return PX_OK;
}

/* The grid edges whose end labels differ, with the tracer's tolerances,
 * and the centres of saddle cells (two labels on alternate corners). */
static int crossing_edges(const shared *sh, const px_diagram_grid_options *g, edge_job **out, size_t *n)
{
    size_t nx = sh->nx, ny = sh->ny, cnt = 0, cap = 0;
    edge_job *e = NULL;
    const px_diagram_window *w = sh->w;
    double tolx = fmax(g->epsabs, g->epsrel * (node(w->xmin, w->xmax, 1, nx) - node(w->xmin, w->xmax, 0, nx)));
    double toly = fmax(g->epsabs, g->epsrel * (node(w->ymin, w->ymax, 1, ny) - node(w->ymin, w->ymax, 0, ny)));
    const int *L = sh->labels;
    int st = PX_OK;
    for (int dir = 0; dir < 2 && st == PX_OK; dir++)
        for (size_t j = 0; j + (size_t)dir < ny && st == PX_OK; j++)
            for (size_t i = 0; i + 1 - (size_t)dir < nx && st == PX_OK; i++) {
                size_t k = j * nx + i, k2 = dir ? k + nx : k + 1;
                if (L[k] == L[k2]) continue;
                double x0 = node(w->xmin, w->xmax, i, nx), y0 = node(w->ymin, w->ymax, j, ny);
                double x1 = dir ? x0 : node(w->xmin, w->xmax, i + 1, nx);
                double y1 = dir ? node(w->ymin, w->ymax, j + 1, ny) : y0;
                st = push_edge(sh->a, &e, &cnt, &cap, (edge_job){x0, y0, x1, y1, dir ? toly : tolx, L[k], L[k2], i, j, dir});
            }
    for (size_t j = 0; j + 1 < ny && st == PX_OK; j++)
        for (size_t i = 0; i + 1 < nx && st == PX_OK; i++) {
            size_t k = j * nx + i;
            if (L[k] == L[k + 1] || L[k] != L[k + nx + 1] || L[k + 1] != L[k + nx]) continue;
            double x = 0.5 * (node(w->xmin, w->xmax, i, nx) + node(w->xmin, w->xmax, i + 1, nx));
            double y = 0.5 * (node(w->ymin, w->ymax, j, ny) + node(w->ymin, w->ymax, j + 1, ny));
            st = push_edge(sh->a, &e, &cnt, &cap, (edge_job){x, y, x, y, -1, L[k], L[k + 1], i, j, 2});
        }
    if (st != PX_OK) {
        px_free(sh->a, e);
        return st;
    }
    *out = e;
    *n = cnt;
    return PX_OK;
}

/* The pair of labels of an edge, lower first. */
static void pair_of(const edge_job *e, int *lo, int *hi)
{
    *lo = e->la < e->lb ? e->la : e->lb;
    *hi = e->la < e->lb ? e->lb : e->la;
}

/* Edges by pair of labels, then row, column and direction (saddle centres
 * last): a total order, so the jobs do not depend on the sort. */
static int edge_cmp(const void *pa, const void *pb)
{
    const edge_job *a = pa, *b = pb;
    int a0, a1, b0, b1;
    pair_of(a, &a0, &a1);
    pair_of(b, &b0, &b1);
    if ((a->dir == 2) != (b->dir == 2)) return a->dir == 2 ? 1 : -1;
    if (a0 != b0) return a0 < b0 ? -1 : 1;
    if (a1 != b1) return a1 < b1 ? -1 : 1;
    if (a->j != b->j) return a->j < b->j ? -1 : 1;
    if (a->i != b->i) return a->i < b->i ? -1 : 1;
    return a->dir - b->dir;
}

/* Sort the edges and cut them into jobs: up to PX_RMAP_EDGE_CHUNK edges of
 * one pair each, every saddle centre a job of its own. */
static int edge_jobs(const px_allocator *a, edge_job *e, size_t n, edge_range **out, size_t *nr)
{
    qsort(e, n, sizeof *e, edge_cmp);
    edge_range *r = px_alloc(a, (n ? n : 1) * sizeof *r);
    if (!r) return PX_ENOMEM;
    size_t m = 0;
    for (size_t k = 0; k < n; k++) {
        int p0, p1, q0, q1, join = 0;
        if (m > 0 && e[k].dir != 2 && r[m - 1].n < PX_RMAP_EDGE_CHUNK) {
            pair_of(&e[k - 1], &p0, &p1);
            pair_of(&e[k], &q0, &q1);
            join = p0 == q0 && p1 == q1;
        }
        if (join) r[m - 1].n++;
        else r[m++] = (edge_range){k, 1};
    }
    *out = r;
    *nr = m;
    return PX_OK;
}

/* Labels at bisection points, by the exact bits of (x, y). */
typedef struct probe_table {
    probe *slot;
    unsigned char *used;
    size_t cap;
} probe_table;

static size_t probe_hash(double x, double y, size_t cap)
{
    unsigned long long a, b;
    memcpy(&a, &x, sizeof a);
    memcpy(&b, &y, sizeof b);
    unsigned long long h = a * 0x9E3779B97F4A7C15ull ^ (b + 0x632BE59BD9B4E019ull + (a << 6)); /* golden-ratio mixing */
    h ^= h >> 29;
    return (size_t)h & (cap - 1);
}

/* A point solved twice (by two jobs) keeps the first job's label. */
static int table_build(const px_allocator *a, probe_table *t, const worker *ws, int nt)
{
    size_t n = 0;
    for (int k = 0; k < nt; k++) n += ws[k].npr;
    t->cap = 16;
    while (t->cap < 2 * n + 1) t->cap *= 2;
    t->slot = px_alloc(a, t->cap * sizeof *t->slot);
    t->used = px_calloc(a, t->cap, 1);
    if (!t->slot || !t->used) return PX_ENOMEM;
    for (int k = 0; k < nt; k++)
        for (size_t i = 0; i < ws[k].npr; i++) {
            const probe *p = &ws[k].pr[i];
            size_t s = probe_hash(p->x, p->y, t->cap);
            while (t->used[s] && !(t->slot[s].x == p->x && t->slot[s].y == p->y)) s = (s + 1) & (t->cap - 1);
            if (t->used[s] && t->slot[s].job <= p->job) continue;
            t->used[s] = 1;
            t->slot[s] = *p;
        }
    return PX_OK;
}

static int table_find(const probe_table *t, double x, double y, int *id)
{
    if (!t->cap) return 0;
    size_t s = probe_hash(x, y, t->cap);
    while (t->used[s]) {
        if (t->slot[s].x == x && t->slot[s].y == y) {
            *id = t->slot[s].id;
            return 1;
        }
        s = (s + 1) & (t->cap - 1);
    }
    return 0;
}

typedef struct lookup {
    rctx *c;
    const px_diagram_window *w;
    size_t nx, ny;
    const double *xs, *ys; /* the nodes' coordinates */
    const int *labels;
    const probe_table *probes;
    size_t next, ni, nj; /* the tracer asks for the nodes in order: the one expected */
    size_t solved; /* points the tables missed (none expected) */
} lookup;

/* Labels of grid nodes, bisection points and saddle centres come from the
 * jobs; a point they missed is solved cold (so still independent of the
 * threads). */
static int lookup_or_solve(double x, double y, void *user, int *id)
{
    lookup *l = user;
    if (l->nj < l->ny && l->xs[l->ni] == x && l->ys[l->nj] == y) {
        *id = l->labels[l->next++];
        if (++l->ni == l->nx) {
            l->ni = 0;
            l->nj++;
        }
        return 0;
    }
    double fi = (x - l->w->xmin) / (l->w->xmax - l->w->xmin) * (double)(l->nx - 1);
    double fj = (y - l->w->ymin) / (l->w->ymax - l->w->ymin) * (double)(l->ny - 1);
    long i = lround(fi), j = lround(fj);
    if (i >= 0 && j >= 0 && (size_t)i < l->nx && (size_t)j < l->ny && l->xs[i] == x && l->ys[j] == y) {
        *id = l->labels[(size_t)j * l->nx + (size_t)i];
        return 0;
    }
    if (table_find(l->probes, x, y, id)) return 0;
    l->solved++;
    px_equil_work_reset(l->c->s->work);
    return label_node(x, y, l->c, id);
}

/* Statistics of the jobs, in job order. */
static void merge_stats(px_rmap_stats *to, const px_rmap_stats *from)
{
    for (size_t k = 0; k < from->failures && to->failures + k < PX_RMAP_FAIL_KEEP; k++) {
        to->fail_x[to->failures + k] = from->fail_x[k];
        to->fail_y[to->failures + k] = from->fail_y[k];
    }
    to->solves += from->solves;
    to->failures += from->failures;
    to->cold_retries += from->cold_retries;
    if (from->I_max > to->I_max) to->I_max = from->I_max;
}

#define PX_RMAP_MAX_NODES ((size_t)1 << 28) /* grid.c's memory guard, not a physical limit */

/* The grid options px_diagram_grid_map accepts (it refuses the others
 * before calling back). */
static int grid_ok(const px_diagram_window *w, const px_diagram_grid_options *g)
{
    return g->nx >= 2 && g->ny >= 2 && g->nx <= PX_RMAP_MAX_NODES / g->ny && isfinite(g->epsabs) &&
           g->epsabs >= 0 && isfinite(g->epsrel) && g->epsrel >= 0 && g->max_iter >= 1 && isfinite(w->xmin) &&
           isfinite(w->xmax) && isfinite(w->ymin) && isfinite(w->ymax) && w->xmin < w->xmax && w->ymin < w->ymax &&
           isfinite(w->xmax - w->xmin) && isfinite(w->ymax - w->ymin);
}

/* Both phases and the tracer on nt threads (worker 0 is the calling one
 * and uses the system s; the others build their own: thermo is not
 * shared). */
static int build_threads(px_thermo_ws *ws, const px_db *db, const px_spec_options *so, rctx *c, const px_rmap_options *o,
                         int nt, px_diagram_grid **out, px_rmap_stats *stats, px_rmap_profile *prof, char *msg,
                         size_t msglen)
{
    double t0 = px_clock_wall(), t1 = t0, t2 = t0, t3 = t0, t4 = t0, t5 = t0;
    px_diagram_grid_options gopt = o->grid; /* the grid from the map's allocator unless it names its own */
    if (!gopt.alloc) gopt.alloc = o->alloc;
    const px_diagram_grid_options *grid = &gopt;
    worker ws_[PX_RMAP_MAX_THREADS];
    shared sh;
    memset(ws_, 0, sizeof ws_);
    memset(&sh, 0, sizeof sh);
    size_t nx = o->grid.nx, ny = o->grid.ny;
    sh.w = &o->window;
    sh.nx = nx;
    sh.ny = ny;
    sh.nchunks = (ny + PX_RMAP_ROW_CHUNK - 1) / PX_RMAP_ROW_CHUNK;
    sh.max_iter = o->grid.max_iter;
    sh.a = o->alloc;
    atomic_init(&sh.next, 0);
    atomic_init(&sh.stop, 0);
    sh.labels = px_alloc(sh.a, nx * ny * sizeof *sh.labels);
    sh.jstats = px_calloc(sh.a, sh.nchunks, sizeof *sh.jstats);
    int st = sh.labels && sh.jstats ? PX_OK : PX_ENOMEM;
    int built = 0;
    for (int t = 0; t < nt && st == PX_OK; t++, built++) {
        ws_[t].c = *c;
        ws_[t].sh = &sh;
        if (t > 0) st = px_spec_build(ws, db, so, &ws_[t].c.s, msg, msglen);
    }
    t1 = px_clock_wall();
    sh.phase = 1;
    if (st == PX_OK) st = run_phase(ws_, nt);
    t2 = px_clock_wall();
    edge_job *edges = NULL;
    edge_range *ranges = NULL;
    size_t nedges = 0;
    if (st == PX_OK) st = crossing_edges(&sh, &o->grid, &edges, &nedges);
    if (st == PX_OK) st = edge_jobs(sh.a, edges, nedges, &ranges, &sh.nranges);
    if (st == PX_OK) {
        px_rmap_stats *js = px_realloc(sh.a, sh.jstats, sh.nchunks * sizeof *js, (sh.nchunks + sh.nranges) * sizeof *js);
        if (js) {
            sh.jstats = js;
            memset(js + sh.nchunks, 0, sh.nranges * sizeof *js);
        } else {
            st = PX_ENOMEM;
        }
    }
    sh.edges = edges;
    sh.ranges = ranges;
    sh.phase = 2;
    t3 = px_clock_wall();
    if (st == PX_OK) st = run_phase(ws_, nt);
    t4 = px_clock_wall();
    probe_table probes = {0};
    if (st == PX_OK) st = table_build(sh.a, &probes, ws_, nt);
    for (size_t k = 0; st == PX_OK && k < sh.nchunks + sh.nranges; k++) merge_stats(stats, &sh.jstats[k]);
    size_t missed = 0;
    double *xs = px_alloc(sh.a, nx * sizeof *xs), *ys = px_alloc(sh.a, ny * sizeof *ys);
    if (st == PX_OK && (!xs || !ys)) st = PX_ENOMEM;
    if (st == PX_OK) {
        px_rmap_stats tail;
        memset(&tail, 0, sizeof tail);
        rctx c0 = *c;
        c0.stats = &tail;
        for (size_t i = 0; i < nx; i++) xs[i] = node(o->window.xmin, o->window.xmax, i, nx);
        for (size_t j = 0; j < ny; j++) ys[j] = node(o->window.ymin, o->window.ymax, j, ny);
        lookup l = {&c0, &o->window, nx, ny, xs, ys, sh.labels, &probes, 0, 0, 0, 0};
        t5 = px_clock_wall();
        st = px_diagram_grid_map(&o->window, lookup_or_solve, &l, grid, out);
        merge_stats(stats, &tail);
        missed = l.solved;
    }
    double t6 = px_clock_wall();
    if (prof) {
        prof->threads = nt;
        prof->wall_setup = t1 - t0;
        prof->wall_nodes = t2 - t1;
        prof->wall_edges = t3 - t2;
        prof->wall_refine = t4 - t3;
        prof->wall_merge = t5 - t4;
        prof->wall_trace = t6 - t5;
        prof->edges = nedges;
        prof->edge_jobs = sh.nranges;
        prof->chunks = sh.nchunks;
        prof->missed = missed;
        prof->job_max_rows = prof->job_max_edges = 0;
        for (int t = 0; t < nt; t++) {
            prof->cpu[t] = ws_[t].cpu;
            prof->jobs[t] = ws_[t].jobs;
            prof->job_max_rows = fmax(prof->job_max_rows, ws_[t].job_max[0]);
            prof->job_max_edges = fmax(prof->job_max_edges, ws_[t].job_max[1]);
        }
    }
    for (int t = 1; t < built; t++) px_spec_free(ws_[t].c.s);
    for (int t = 0; t < nt; t++) px_free(sh.a, ws_[t].pr);
    px_free(sh.a, probes.slot);
    px_free(sh.a, probes.used);
    px_free(sh.a, edges);
    px_free(sh.a, ranges);
    px_free(sh.a, xs);
    px_free(sh.a, ys);
    px_free(sh.a, sh.jstats);
    px_free(sh.a, sh.labels);
    return st;
}

int px_rmap_build(px_thermo_ws *ws, const px_db *db, const char *element, const px_rmap_options *o,
                  px_diagram_grid **out, px_rmap_stats *stats, char *msg, size_t msglen)
{
    if (!ws || !db || !element || !o || !out || !stats) return PX_EINVAL;
    memset(stats, 0, sizeof *stats);
    px_spec_options so = px_spec_options_default();
    so.T = o->T;
    so.P = o->P;
    so.n_totals = 0;
    so.element[so.n_totals] = element;
    so.total[so.n_totals++] = o->total;
    if (o->ligand) {
        so.element[so.n_totals] = o->ligand;
        so.total[so.n_totals++] = o->ligand_total;
    }
    if (o->background_na_cl > 0) {
        if (!o->ligand || strcmp(o->ligand, "Cl") != 0) {
            so.element[so.n_totals] = "Cl";
            so.total[so.n_totals++] = o->background_na_cl;
        }
        so.element[so.n_totals] = "Na";
        so.total[so.n_totals++] = o->background_na_cl;
    }
    so.ph_mode = PX_SPEC_PH_FIXED;
    so.pH = 0.5 * (o->window.xmin + o->window.xmax);
    so.redox_mode = PX_SPEC_REDOX_E;
    so.E = 0.5 * (o->window.ymin + o->window.ymax);
    so.model = o->model;
    so.ligands = o->ligands;
    so.allow_inhibited = o->allow_inhibited;
    so.alloc = o->alloc;
    /* Dissolved O2, H2 and H2O2 have no mass balance (water is the
     * solvent), so outside water's stability field at a fixed E their
     * molalities have no bound; the exact map leaves them out too (they are
     * not species of the element), and so does the rigorous one. */
    static const char *const water_redox[] = {"O2(aq)", "H2(aq)", "H2O2(aq)"};
    for (size_t i = 0; i < sizeof water_redox / sizeof water_redox[0]; i++)
        if (px_db_find(db, water_redox[i])) so.exclude[so.n_exclude++] = water_redox[i];
    for (size_t i = 0; i < o->n_exclude && so.n_exclude < PX_SPEC_MAX_ITEMS; i++)
        so.exclude[so.n_exclude++] = o->exclude[i];
    px_spec *s;
    int st = px_spec_build(ws, db, &so, &s, msg, msglen);
    if (st != PX_OK) return st;
    rctx c = {s, db, px_element_z(element), o->T, 3, px_equil_options_default(), stats};
    c.sopt.warm = 1;
    int nt = o->threads < 1 ? 1 : o->threads > PX_RMAP_MAX_THREADS ? PX_RMAP_MAX_THREADS : o->threads;
    if (!grid_ok(&o->window, &o->grid)) { /* refused there, with its status */
        px_diagram_grid_options gopt = o->grid;
        if (!gopt.alloc) gopt.alloc = o->alloc;
        st = px_diagram_grid_map(&o->window, label_node, &c, &gopt, out);
    } else {
        st = build_threads(ws, db, &so, &c, o, nt, out, stats, o->profile, msg, msglen);
    }
    if (st != PX_OK && msg && msglen && !msg[0])
        snprintf(msg, msglen, "grid map of %s: %s", element, px_strerror(st));
    px_spec_free(s);
    return st;
}
