/* rmap.c - rigorous maps: the speciation solver as the labelling callback
 * of the grid tracer (see rmap.h).  Each solve starts warm from the last
 * one; a failed warm start is retried cold before the node is given up. */
#include "diagram/rmap.h"
#include "core/constants.h"
#include "core/status.h"
#include <math.h>
#include <pthread.h>
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

typedef struct band {
    rctx c;
    px_rmap_stats stats;
    const px_diagram_window *w;
    size_t nx, ny, j0, j1;
    int *labels;
    int st;
} band;

/* One thread: the rows j0..j1-1, snaking so each solve starts next to the
 * last one. */
static void *band_run(void *arg)
{
    band *b = arg;
    b->c.stats = &b->stats;
    for (size_t j = b->j0; j < b->j1 && b->st == 0; j++)
        for (size_t k = 0; k < b->nx && b->st == 0; k++) {
            size_t i = (j - b->j0) % 2 ? b->nx - 1 - k : k;
            b->st = label_node(node(b->w->xmin, b->w->xmax, i, b->nx),
                               node(b->w->ymin, b->w->ymax, j, b->ny), &b->c,
                               &b->labels[j * b->nx + i]);
        }
    return NULL;
}

typedef struct lookup {
    rctx *c;
    const px_diagram_window *w;
    size_t nx, ny;
    const int *labels;
} lookup;

/* Labels of grid nodes come from the threads; other points are solved. */
static int lookup_or_solve(double x, double y, void *user, int *id)
{
    lookup *l = user;
    double fi = (x - l->w->xmin) / (l->w->xmax - l->w->xmin) * (double)(l->nx - 1);
    double fj = (y - l->w->ymin) / (l->w->ymax - l->w->ymin) * (double)(l->ny - 1);
    long i = lround(fi), j = lround(fj);
    if (i >= 0 && j >= 0 && (size_t)i < l->nx && (size_t)j < l->ny &&
        node(l->w->xmin, l->w->xmax, (size_t)i, l->nx) == x &&
        node(l->w->ymin, l->w->ymax, (size_t)j, l->ny) == y) {
        *id = l->labels[(size_t)j * l->nx + (size_t)i];
        return 0;
    }
    return label_node(x, y, l->c, id);
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
    size_t nx = o->grid.nx, ny = o->grid.ny;
    if (nt == 1 || nx < 2 || ny < (size_t)nt) {
        st = px_diagram_grid_map(&o->window, label_node, &c, &o->grid, out);
    } else {
        band bands[PX_RMAP_MAX_THREADS];
        pthread_t tid[PX_RMAP_MAX_THREADS];
        int *labels = malloc(nx * ny * sizeof *labels);
        int started = 0;
        st = labels ? PX_OK : PX_ENOMEM;
        memset(bands, 0, sizeof bands);
        for (int t = 0; t < nt && st == PX_OK; t++) { /* systems built here: thermo is not shared */
            bands[t].c = c;
            bands[t].w = &o->window;
            bands[t].nx = nx;
            bands[t].ny = ny;
            bands[t].j0 = ny * (size_t)t / (size_t)nt;
            bands[t].j1 = ny * (size_t)(t + 1) / (size_t)nt;
            bands[t].labels = labels;
            if (t > 0) st = px_spec_build(ws, db, &so, &bands[t].c.s, msg, msglen);
        }
        for (int t = 0; t < nt && st == PX_OK; t++, started++)
            if (pthread_create(&tid[t], NULL, band_run, &bands[t]) != 0) st = PX_ENOMEM;
        for (int t = 0; t < started; t++) pthread_join(tid[t], NULL);
        for (int t = 0; t < nt; t++) {
            if (st == PX_OK && bands[t].st != 0) st = bands[t].st;
            stats->solves += bands[t].stats.solves;
            for (size_t k = 0; k < bands[t].stats.failures && stats->failures + k < PX_RMAP_FAIL_KEEP; k++) {
                stats->fail_x[stats->failures + k] = bands[t].stats.fail_x[k];
                stats->fail_y[stats->failures + k] = bands[t].stats.fail_y[k];
            }
            stats->failures += bands[t].stats.failures;
            stats->cold_retries += bands[t].stats.cold_retries;
            if (bands[t].stats.I_max > stats->I_max) stats->I_max = bands[t].stats.I_max;
            if (t > 0) px_spec_free(bands[t].c.s);
        }
        if (st == PX_OK) {
            lookup l = {&c, &o->window, nx, ny, labels};
            st = px_diagram_grid_map(&o->window, lookup_or_solve, &l, &o->grid, out);
        }
        free(labels);
    }
    if (st != PX_OK && msg && msglen && !msg[0])
        snprintf(msg, msglen, "grid map of %s: %s", element, px_strerror(st));
    px_spec_free(s);
    return st;
}
