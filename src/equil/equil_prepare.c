/* equil_prepare.c - the structure of one solve, from the system:
 *   - every species' coefficients set, every component constrained, a
 *     fugacity constraint on a gas species that contains the component
 *     (else PX_EINVAL, the constraint recorded by px_equil_fail_at);
 *   - components with only positive coefficients and a total of exactly 0
 *     are absent: their species drop out (a negative total is PX_EINVAL);
 *   - the sparse formation rows (nz_*), restricted to Newton columns (jz_*)
 *     and to mass-balance rows (rz_*);
 *   - the Newton column and row of each component (a fixed activity, an
 *     absent component and a non-ideal water activity have none), then the
 *     ionic-strength row.
 * Cached: a second call for the same system and revision only checks the
 * absent pattern. */
#include "equil_solver.h"
#include <stdint.h>


/* Validates the system, finds components whose total is exactly zero (their
 * species drop out), builds the sparse rows and the column/row maps. */
int px_equil_work_prepare(const px_equil_system *s, px_equil_work *w)
{
    size_t nb = s->nb, ns = s->ns;
    if (w->prep_sys == s && w->prep_rev == s->rev) {
        /* same structure as last time: only the zero totals may differ */
        int same = 1;
        for (size_t i = 0; i < nb; i++) {
            int pos = w->posonly[i] && s->ckind[i] == PX_EQUIL_C_TOTAL;
            if (pos && s->cval[i] < 0.0) {
                px_equil_fail_at(w, PX_EQUIL_C_TOTAL, i);
                return PX_EINVAL;
            }
            if ((pos && s->cval[i] == 0.0) != (w->cabsent[i] != 0)) same = 0;
        }
        if (same) return PX_OK;
    }
    w->prep_sys = NULL;
    for (size_t j = 0; j < ns; j++)
        if (!s->is_set[j]) {
            px_equil_fail_at(w, PX_EQUIL_C_NONE, j);
            return PX_EINVAL;
        }
    for (size_t i = 0; i < nb; i++) {
        w->cabsent[i] = 0;
        int k = s->ckind[i];
        if (k == PX_EQUIL_C_NONE) {
            px_equil_fail_at(w, PX_EQUIL_C_NONE, i);
            return PX_EINVAL;
        }
        w->posonly[i] = 0;
        if (s->phase[i] == PX_EQUIL_AQ) {
            int posonly = 1;
            for (size_t j = 0; j < ns; j++) {
                if (s->flags[j] & PX_EQUIL_EXCLUDED) continue;
                if (s->nu[j * nb + i] < 0.0) posonly = 0;
            }
            w->posonly[i] = (unsigned char)posonly;
            if (k != PX_EQUIL_C_TOTAL) continue;
            if (posonly && s->cval[i] < 0.0) {
                px_equil_fail_at(w, PX_EQUIL_C_TOTAL, i);
                return PX_EINVAL; /* no positive molalities can add up */
            }
            if (posonly && s->cval[i] == 0.0) w->cabsent[i] = 1;
        }
    }
    size_t nnz = 0;
    for (size_t j = 0; j < ns; j++) {
        w->sabsent[j] = (s->flags[j] & PX_EQUIL_EXCLUDED) ? 1 : 0;
        w->nz_start[j] = nnz;
        for (size_t i = 0; i < nb; i++) {
            double v = s->nu[j * nb + i];
            if (v == 0.0) continue;
            if (w->cabsent[i]) w->sabsent[j] = 1;
            w->nz_idx[nnz] = i;
            w->nz_val[nnz] = v;
            nnz++;
        }
    }
    w->nz_start[ns] = nnz;
    for (size_t i = 0; i < nb; i++) {
        if (s->ckind[i] == PX_EQUIL_C_FUGACITY) {
            size_t g = s->cgas[i];
            if (s->phase[g] != PX_EQUIL_GAS || w->sabsent[g] || s->nu[g * nb + i] == 0.0) {
                px_equil_fail_at(w, PX_EQUIL_C_FUGACITY, i);
                return PX_EINVAL;
            }
        }
    }
    size_t nc = 0;
    for (size_t i = 0; i < nb; i++) {
        /* a fixed activity is substituted, not solved for: no column, no row */
        if (w->cabsent[i] || s->ckind[i] == PX_EQUIL_C_ACTIVITY ||
            (s->ckind[i] == PX_EQUIL_C_WATER && s->act.water != PX_EQUIL_WATER_IDEAL)) {
            w->col[i] = w->row[i] = SIZE_MAX;
            continue;
        }
        w->col[i] = w->row[i] = nc;
        w->row_kind[nc] = (size_t)s->ckind[i];
        w->row_index[nc] = i;
        nc++;
    }
    w->ncol = nc;
    /* the nonzero coefficients of each species that have a Newton column */
    size_t nj = 0;
    for (size_t j = 0; j < ns; j++) {
        w->jz_start[j] = nj;
        for (size_t q = w->nz_start[j]; q < w->nz_start[j + 1]; q++) {
            size_t cc = w->col[w->nz_idx[q]];
            if (cc == SIZE_MAX) continue;
            w->jz_col[nj] = cc;
            w->jz_val[nj] = w->nz_val[q];
            nj++;
        }
    }
    w->jz_start[ns] = nj;
    /* and those that enter a mass-balance row */
    size_t nr = 0;
    for (size_t j = 0; j < ns; j++) {
        w->rz_start[j] = nr;
        for (size_t q = w->nz_start[j]; q < w->nz_start[j + 1]; q++) {
            size_t i = w->nz_idx[q];
            if (w->row[i] == SIZE_MAX || s->ckind[i] != PX_EQUIL_C_TOTAL) continue;
            w->rz_row[nr] = w->row[i];
            w->rz_val[nr] = w->nz_val[q];
            nr++;
        }
    }
    w->rz_start[ns] = nr;
    w->row_kind[nc] = PX_EQUIL_C_IONIC;
    w->row_index[nc] = 0;
    w->prep_sys = s;
    w->prep_rev = s->rev;
    return PX_OK;
}

size_t px_equil_work_n_mass_rows(const px_equil_system *s, const px_equil_work *w)
{
    size_t n = 0;
    for (size_t i = 0; i < s->nb; i++)
        if (w->row[i] != SIZE_MAX && s->ckind[i] == PX_EQUIL_C_TOTAL) n++;
    return n;
}
