/* equil_work.c - the solver's workspace: default options, creation (every
 * array sized once for the system: nb basis species, ns species, Newton
 * systems up to 2 nb + 1), release, reset (forget the warm-start state),
 * and the getters of the last solve's results.  Allocation goes through the
 * caller's px_allocator (NULL: malloc); a failed allocation frees what was
 * made and returns PX_ENOMEM.  Contract in equil.h. */
#include "equil_solver.h"
#include <stdint.h>
#include <string.h>

static const px_allocator *work_alloc(const px_equil_work *w)
{
    return w->has_alloc ? &w->alloc : NULL;
}

px_equil_options px_equil_options_default(void)
{
    px_equil_options o;
    o.epsabs = 0.0;
    o.epsrel = 1e-12;
    o.max_iter = 200;
    o.max_step = 2.0;
    o.si_tol = 1e-9;
    o.warm = 1;
    return o;
}

/* ---------------------------------------------------------------------- */
/* workspace lifecycle                                                     */

void px_equil_work_free(px_equil_work *w)
{
    if (!w) return;
    const px_allocator *a = work_alloc(w);
    void *arrs[] = {w->y, w->amt, w->active, w->lag, w->absent_prev, w->cabsent, w->posonly,
                    w->sabsent, w->blocked, w->col, w->row, w->solids, w->nz_start,
                    w->nz_idx, w->nz_val, w->jz_start, w->jz_col, w->jz_val,
                    w->rz_start, w->rz_row, w->rz_val, w->y_p1, w->y_p2, w->par_p1, w->par_p2, w->g, w->dg, w->la, w->lm, w->m, w->c,
                    w->lag_next, w->R, w->scale, w->J, w->dx, w->perm, w->row_kind,
                    w->row_index, w->y_save, w->amt_save, w->resid_comp,
                    w->tot_given, w->tot_aq, w->tot_solid, w->ckind, w->phase};
    for (size_t k = 0; k < sizeof arrs / sizeof arrs[0]; k++) px_free(a, arrs[k]);
    px_free(a, w);
}

int px_equil_work_create(px_equil_work **out, const px_equil_system *s,
                         const px_allocator *alloc)
{
    if (!out) return PX_EINVAL;
    *out = NULL;
    if (!s) return PX_EINVAL;
    size_t nb = s->nb, ns = s->ns, nmax = 2 * nb + 1;
    if (nmax > SIZE_MAX / (nmax * sizeof(double))) return PX_EINVAL;
    px_equil_work *w = px_calloc(alloc, 1, sizeof *w);
    if (!w) return PX_ENOMEM;
    if (alloc) {
        w->alloc = *alloc;
        w->has_alloc = 1;
    }
    w->nb = nb;
    w->ns = ns;
    w->nmax = nmax;
#define ALLOC(p, n, t) (w->p = px_calloc(alloc, (n), sizeof(t)))
    int ok = ALLOC(y, nb, double) && ALLOC(amt, ns, double) && ALLOC(active, ns, unsigned char) &&
             ALLOC(lag, ns, double) && ALLOC(absent_prev, nb, unsigned char) &&
             ALLOC(cabsent, nb, unsigned char) && ALLOC(posonly, nb, unsigned char) && ALLOC(sabsent, ns, unsigned char) &&
             ALLOC(blocked, ns, unsigned char) && ALLOC(col, nb, size_t) &&
             ALLOC(row, nb, size_t) && ALLOC(solids, nb + 1, size_t) &&
             ALLOC(nz_start, ns + 1, size_t) && ALLOC(nz_idx, ns * nb, size_t) &&
             ALLOC(nz_val, ns * nb, double) && ALLOC(jz_start, ns + 1, size_t) &&
             ALLOC(jz_col, ns * nb, size_t) && ALLOC(jz_val, ns * nb, double) &&
             ALLOC(rz_start, ns + 1, size_t) && ALLOC(rz_row, ns * nb, size_t) &&
             ALLOC(rz_val, ns * nb, double) && ALLOC(y_p1, nb, double) &&
             ALLOC(y_p2, nb, double) && ALLOC(par_p1, nb, double) && ALLOC(par_p2, nb, double) && ALLOC(g, ns, double) && ALLOC(dg, ns, double) &&
             ALLOC(la, ns, double) && ALLOC(lm, ns, double) && ALLOC(m, ns, double) &&
             ALLOC(c, ns, double) && ALLOC(lag_next, ns, double) && ALLOC(R, nmax, double) &&
             ALLOC(scale, nmax, double) && ALLOC(J, nmax * nmax, double) &&
             ALLOC(dx, nmax, double) && ALLOC(perm, nmax, size_t) &&
             ALLOC(row_kind, nmax, size_t) && ALLOC(row_index, nmax, size_t) &&
             ALLOC(y_save, nb, double) && ALLOC(amt_save, ns, double) &&
             ALLOC(resid_comp, nb, double) && ALLOC(tot_given, nb, double) &&
             ALLOC(tot_aq, nb, double) && ALLOC(tot_solid, nb, double) &&
             ALLOC(ckind, nb, int) && ALLOC(phase, ns, int);
#undef ALLOC
    if (!ok) {
        px_equil_work_free(w);
        return PX_ENOMEM;
    }
    for (size_t j = 0; j < ns; j++) w->lm[j] = PX_EQUIL_LOG_ABSENT;
    *out = w;
    return PX_OK;
}

void px_equil_work_reset(px_equil_work *w)
{
    if (w) {
        w->have = 0;
        w->hist = 0;
        w->prep_sys = NULL;
    }
}

int px_equil_work_copy_state(px_equil_work *dst, const px_equil_work *src)
{
    if (!dst || !src || dst->nb != src->nb || dst->ns != src->ns) return PX_EINVAL;
    if (dst == src) return PX_OK;
    size_t nb = src->nb, ns = src->ns;
    dst->have = src->have;
    dst->xI = src->xI;
    memcpy(dst->y, src->y, nb * sizeof(double));
    memcpy(dst->amt, src->amt, ns * sizeof(double));
    memcpy(dst->active, src->active, ns);
    memcpy(dst->lag, src->lag, ns * sizeof(double));
    memcpy(dst->absent_prev, src->absent_prev, nb);
    dst->hist = src->hist;
    memcpy(dst->y_p1, src->y_p1, nb * sizeof(double));
    memcpy(dst->y_p2, src->y_p2, nb * sizeof(double));
    memcpy(dst->par_p1, src->par_p1, nb * sizeof(double));
    memcpy(dst->par_p2, src->par_p2, nb * sizeof(double));
    dst->xI_p1 = src->xI_p1;
    dst->xI_p2 = src->xI_p2;
    dst->sig_p1 = src->sig_p1;
    dst->sig_p2 = src->sig_p2;
    dst->st = src->st;
    return PX_OK;
}

/* ---------------------------------------------------------------------- */
/* results                                                                 */

int px_equil_work_get_stats(const px_equil_work *w, px_equil_stats *st)
{
    if (!w || !st) return PX_EINVAL;
    *st = w->st;
    return PX_OK;
}

int px_equil_work_get_species(const px_equil_work *w, size_t j, px_equil_species_result *r)
{
    if (!w || !r || j >= w->ns) return PX_EINVAL;
    memset(r, 0, sizeof *r);
    if (w->sabsent[j]) {
        r->log_activity = PX_EQUIL_LOG_ABSENT;
        r->log_molality = PX_EQUIL_LOG_ABSENT;
        return PX_OK;
    }
    r->log_activity = w->la[j];
    r->log_molality = PX_EQUIL_LOG_ABSENT;
    if (w->phase[j] == PX_EQUIL_AQ) {
        r->molality = w->m[j];
        r->log_molality = w->lm[j];
        r->log_gamma = w->g[j];
    } else if (w->phase[j] == PX_EQUIL_SOLID) {
        r->si = w->la[j];
        r->amount = w->active[j] ? w->amt[j] : 0.0;
    }
    return PX_OK;
}

int px_equil_work_get_component(const px_equil_work *w, size_t i, px_equil_component_result *r)
{
    if (!w || !r || i >= w->nb) return PX_EINVAL;
    memset(r, 0, sizeof *r);
    r->total_given = w->tot_given[i];
    r->total_aq = w->tot_aq[i];
    r->total_solid = w->tot_solid[i];
    r->residual = w->resid_comp[i];
    r->kind = w->ckind[i];
    return PX_OK;
}
