/* equil_eval.c - the equations at the current unknowns (header of
 * equil_solve.c: y, log10 I, amounts of the active solids):
 *   - activity coefficients (equil_activity.c), activities and molalities
 *     of every species by mass action, with d log m / d log10 I;
 *   - residuals R and their scales, per row: mass balance (R = sum - T),
 *     charge balance, ionic strength, water activity, gas fugacity, one row
 *     per active solid (R = SI); the merit phi = sum (R/scale)^2;
 *   - the lagged SIT sums for the next iteration and how far they moved;
 *   - the analytic Jacobian of those rows (px_equil_work_jacobian);
 *   - the convergence test (px_equil_work_resid_norm): mass, charge and
 *     ionic-strength rows relative to their scale (epsrel + epsabs/scale),
 *     the others absolute (epsrel), and the lagged sums within epsrel. */
#include "equil_solver.h"
#include <float.h>
#include <math.h>
#include <stdint.h>
#include <string.h>

/* Molar mass of water, kg/mol (IUPAC standard atomic weights:
 * 2 x 1.00794 + 15.9994 g/mol). */
#define PX_EQUIL_MW 0.01801528
/* Bound on the lagged SIT sums while iterating (|sum eps m| <= 5).
 * Numerical choice, no source. */
#define LAG_MAX 5.0

/* Adds t * (d log m_j / d u) to Jacobian row r (u: the Newton unknowns). */
static inline void jac_add(const px_equil_work *w, size_t N, size_t r, size_t j, double t)
{
    double *Jr = w->J + r * N;
    for (size_t q = w->jz_start[j]; q < w->jz_start[j + 1]; q++) Jr[w->jz_col[q]] += t * w->jz_val[q];
    Jr[w->ncol] += t * w->c[j];
}

/* Adds d(log a_j)/du of species j (any phase) to row r, for log equations. */
static void jac_add_log(const px_equil_system *s, const px_equil_work *w, size_t N,
                        size_t r, size_t j)
{
    double *Jr = w->J + r * N;
    for (size_t q = w->nz_start[j]; q < w->nz_start[j + 1]; q++) {
        size_t i = w->nz_idx[q];
        size_t cc = w->col[i];
        if (cc == SIZE_MAX) continue; /* fixed activity or absent: a constant */
        Jr[cc] += w->nz_val[q];
        if (s->phase[i] == PX_EQUIL_AQ) Jr[w->ncol] += w->nz_val[q] * w->dg[i];
    }
}

void px_equil_work_evaluate(const px_equil_system *s, px_equil_work *w)
{
    size_t nb = s->nb, ns = s->ns, nc = w->ncol;
    size_t N = nc + 1 + w->n_active;
    w->nrow = N;
    double I = exp(LN10 * w->xI);
    px_equil_gamma(s, w->sabsent, I, s->act.model == PX_EQUIL_SIT ? w->lag : NULL, w->g,
                   w->dg);
    double *la = w->la, *lm = w->lm, *m = w->m, *g = w->g, *dg = w->dg;
    for (size_t i = 0; i < nb; i++) {
        if (w->cabsent[i]) {
            la[i] = PX_EQUIL_LOG_ABSENT;
            continue;
        }
        if (s->ckind[i] == PX_EQUIL_C_ACTIVITY) {
            la[i] = s->cval[i];
            w->y[i] = s->phase[i] == PX_EQUIL_AQ ? s->cval[i] - g[i] : s->cval[i];
            continue;
        }
        switch (s->phase[i]) {
        case PX_EQUIL_AQ: la[i] = w->y[i] + g[i]; break;
        case PX_EQUIL_WATER: la[i] = w->col[i] != SIZE_MAX ? w->y[i] : 0.0; break;
        default: la[i] = w->y[i]; break;
        }
    }
    for (size_t j = 0; j < ns; j++) {
        m[j] = 0.0;
        w->c[j] = 0.0;
        if (w->sabsent[j]) {
            lm[j] = PX_EQUIL_LOG_ABSENT;
            if (j >= nb) la[j] = PX_EQUIL_LOG_ABSENT;
            continue;
        }
        if (j >= nb) {
            double v = s->logk[j];
            for (size_t q = w->nz_start[j]; q < w->nz_start[j + 1]; q++)
                v += w->nz_val[q] * la[w->nz_idx[q]];
            la[j] = v;
        }
        if (s->phase[j] == PX_EQUIL_AQ) {
            double l = la[j] - g[j];
            if (l > PX_EQUIL_LM_MAX) l = PX_EQUIL_LM_MAX;
            lm[j] = l;
            m[j] = exp(LN10 * l);
            /* c_j = d log m_j / d log10 I: through the activity coefficients
             * of the basis species solved for, and its own */
            if (j >= nb) {
                double cj = -dg[j];
                for (size_t q = w->nz_start[j]; q < w->nz_start[j + 1]; q++) {
                    size_t i = w->nz_idx[q];
                    if (s->phase[i] == PX_EQUIL_AQ && w->col[i] != SIZE_MAX)
                        cj += w->nz_val[q] * dg[i];
                }
                w->c[j] = cj;
            } else if (w->col[j] == SIZE_MAX) {
                w->c[j] = -dg[j]; /* fixed activity: log m = log a - log g */
            }
        } else {
            lm[j] = PX_EQUIL_LOG_ABSENT;
        }
    }
    /* residuals */
    double *R = w->R, *sc = w->scale;
    for (size_t r = 0; r < N; r++) {
        R[r] = 0.0;
        sc[r] = 0.0;
    }
    size_t rc = SIZE_MAX, rI = nc;
    for (size_t i = 0; i < nb; i++) {
        size_t r = w->row[i];
        if (r == SIZE_MAX) continue;
        if (s->ckind[i] == PX_EQUIL_C_TOTAL) {
            R[r] = -s->cval[i];
            sc[r] = fabs(s->cval[i]);
        } else if (s->ckind[i] == PX_EQUIL_C_CHARGE) {
            rc = r;
        }
    }
    R[rI] = I - PX_EQUIL_I_FLOOR;
    sc[rI] = I;
    size_t rw = SIZE_MAX;
    for (size_t i = 0; i < nb; i++)
        if (s->ckind[i] == PX_EQUIL_C_WATER && w->row[i] != SIZE_MAX) {
            rw = w->row[i];
            /* log a_w = -M_w sum m / ln 10: osmotic coefficient 1 (Robinson
             * and Stokes 1959, Electrolyte Solutions, ch. 2 definition) */
            R[rw] = w->y[i];
            sc[rw] = 1.0;
        }
    for (size_t j = 0; j < ns; j++) {
        if (w->sabsent[j] || s->phase[j] != PX_EQUIL_AQ) continue;
        double mj = m[j];
        for (size_t q = w->rz_start[j]; q < w->rz_start[j + 1]; q++) {
            size_t r = w->rz_row[q];
            double v = w->rz_val[q] * mj;
            R[r] += v;
            sc[r] += fabs(v);
        }
        if (rw != SIZE_MAX) {
            R[rw] += PX_EQUIL_MW / LN10 * mj;
        }
        double z = s->z[j];
        if (z != 0.0) {
            if (rc != SIZE_MAX) {
                R[rc] += z * mj;
                sc[rc] += fabs(z) * mj;
            }
            R[rI] -= 0.5 * z * z * mj;
            sc[rI] += 0.5 * z * z * mj;
        }
    }
    for (size_t p = 0; p < w->n_active; p++) {
        size_t sj = w->solids[p];
        double n = w->amt[sj];
        for (size_t q = w->nz_start[sj]; q < w->nz_start[sj + 1]; q++) {
            size_t i = w->nz_idx[q];
            size_t r = w->row[i];
            if (r == SIZE_MAX || s->ckind[i] != PX_EQUIL_C_TOTAL) continue;
            double v = w->nz_val[q];
            R[r] += v * n;
            sc[r] += fabs(v * n);
        }
        size_t r = nc + 1 + p;
        R[r] = la[sj];
        sc[r] = 1.0;
        w->row_kind[r] = PX_EQUIL_C_SOLID;
        w->row_index[r] = sj;
    }
    for (size_t i = 0; i < nb; i++) {
        size_t r = w->row[i];
        if (r == SIZE_MAX) continue;
        if (s->ckind[i] == PX_EQUIL_C_FUGACITY) {
            size_t gj = s->cgas[i];
            R[r] = la[gj] - s->cval[i];
            sc[r] = 1.0;
        }
    }
    double phi = 0.0;
    for (size_t r = 0; r < N; r++) {
        if (!(sc[r] > DBL_MIN)) sc[r] = DBL_MIN;
        double e = R[r] / sc[r];
        phi += e * e;
    }
    w->phi = isfinite(phi) ? phi : DBL_MAX;
    /* lagged quantities */
    double change = 0.0;
    if (s->act.model == PX_EQUIL_SIT && s->n_sit) {
        px_equil_sit_sum(s, m, w->lag_next);
        for (size_t j = 0; j < ns; j++) {
            w->lag_next[j] = px_equil_clamp(w->lag_next[j], -LAG_MAX, LAG_MAX);
            double d = fabs(w->lag_next[j] - w->lag[j]);
            if (d > change) change = d;
        }
    }
    w->lag_change = isfinite(change) ? change : DBL_MAX;
}

/* The analytic Jacobian at the last evaluation (uses its m, c, dg). */
void px_equil_work_jacobian(const px_equil_system *s, px_equil_work *w)
{
    size_t nb = s->nb, ns = s->ns, nc = w->ncol, N = w->nrow;
    double *J = w->J;
    memset(J, 0, N * N * sizeof(double));
    size_t rc = SIZE_MAX, rI = nc, rw = SIZE_MAX;
    for (size_t i = 0; i < nb; i++) {
        size_t r = w->row[i];
        if (r == SIZE_MAX) continue;
        switch (s->ckind[i]) {
        case PX_EQUIL_C_CHARGE: rc = r; break;
        case PX_EQUIL_C_WATER:
            rw = r;
            J[r * N + w->col[i]] += 1.0;
            break;
        case PX_EQUIL_C_FUGACITY: jac_add_log(s, w, N, r, s->cgas[i]); break;
        default: break;
        }
    }
    for (size_t j = 0; j < ns; j++) {
        if (w->sabsent[j] || s->phase[j] != PX_EQUIL_AQ) continue;
        double t = LN10 * w->m[j];
        for (size_t q = w->rz_start[j]; q < w->rz_start[j + 1]; q++)
            jac_add(w, N, w->rz_row[q], j, t * w->rz_val[q]);
        if (rw != SIZE_MAX) jac_add(w, N, rw, j, PX_EQUIL_MW * w->m[j]);
        double z = s->z[j];
        if (z != 0.0) {
            if (rc != SIZE_MAX) jac_add(w, N, rc, j, t * z);
            jac_add(w, N, rI, j, -0.5 * t * z * z);
        }
    }
    J[rI * N + nc] += LN10 * exp(LN10 * w->xI);
    for (size_t p = 0; p < w->n_active; p++) {
        size_t sj = w->solids[p], cs = nc + 1 + p;
        for (size_t q = w->nz_start[sj]; q < w->nz_start[sj + 1]; q++) {
            size_t r = w->row[w->nz_idx[q]];
            if (r == SIZE_MAX || s->ckind[w->nz_idx[q]] != PX_EQUIL_C_TOTAL) continue;
            J[r * N + cs] += w->nz_val[q];
        }
        jac_add_log(s, w, N, nc + 1 + p, sj);
    }
}

/* max scaled residual; index of the worst row */
double px_equil_work_resid_norm(const px_equil_work *w, const px_equil_options *o, size_t *worst,
                         int *ok)
{
    double nrm = 0.0;
    *ok = 1;
    *worst = 0;
    for (size_t r = 0; r < w->nrow; r++) {
        size_t k = w->row_kind[r];
        double e, tol;
        if (k == PX_EQUIL_C_TOTAL || k == PX_EQUIL_C_CHARGE || k == PX_EQUIL_C_IONIC) {
            e = fabs(w->R[r]) / w->scale[r];
            tol = o->epsrel + o->epsabs / w->scale[r];
        } else {
            e = fabs(w->R[r]);
            tol = o->epsrel;
        }
        if (!(e <= tol)) *ok = 0;
        if (!(e <= nrm)) {
            nrm = e;
            *worst = r;
        }
    }
    if (!(w->lag_change <= o->epsrel)) *ok = 0;
    return nrm;
}
