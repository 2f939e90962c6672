/* equil_solve.c - the speciation solver: damped Newton-Raphson in the
 * basis-species formulation with an active set of solids.
 *
 * Unknowns: y_i = log10 m_i of each aqueous basis species (log10 a for the
 * electron or a gas basis), x = log10 I, and the amount n_s of every solid
 * in the active set.  Mass action gives every species from the basis:
 *     log a_j = log K_j + sum_i nu_ji log a_i,  log m_j = log a_j - log g_j(I)
 * and the equations are, per component i, one of
 *     sum_j nu_ji m_j + sum_s nu_si n_s = T_i          (mass balance)
 *     log a_i = fixed                                   (pH, pe, activity)
 *     log K_g + sum_k nu_gk log a_k = log f_g           (gas fugacity)
 *     sum_j z_j m_j = 0                                 (charge balance)
 * plus I = 1/2 sum_j z_j^2 m_j (Lewis and Randall 1921) and, for each
 * solid in the active set, SI_s = log K_s + sum_i nu_si log a_i = 0.
 * The Jacobian is analytic, including d log g / d I; the SIT sums
 * eps(j,k) m_k and the water activity are lagged one iteration (updated from
 * the last molalities, converged to the same tolerance).  Steps are limited
 * in log units and backtracked on the merit sum (R_r/scale_r)^2 (Armijo
 * rule; Dennis and Schnabel 1983, Numerical Methods for Unconstrained
 * Optimization and Nonlinear Equations, ch. 6).  Solids enter by saturation
 * index and leave when their amount turns negative.  docs/solver.md has the
 * details. */
#include "equil_internal.h"
#include "core/constants.h"
#include <float.h>
#include <math.h>
#include <stdint.h>
#include <string.h>

#define LN10 PX_LN10
/* Molar mass of water, kg/mol (IUPAC standard atomic weights:
 * 2 x 1.00794 + 15.9994 g/mol). */
#define PX_EQUIL_MW 0.01801528
/* Armijo sufficient-decrease constant (Dennis and Schnabel 1983, sec. 6.3). */
#define ARMIJO 1e-4
/* Backtracking halvings per Newton step.  Numerical choice, no source. */
#define LS_MAX 12
/* Passes of the mass-balance scaling that builds a cold-start guess.
 * Numerical choice, no source. */
#define CF_PASSES 30
/* Stop those passes when every balance is within this relative error. */
#define CF_DONE 1e-2
/* 1-D root finding in the cold start: relative tolerance, reach of the
 * bracket search (log10 units), iterations, smallest bracket.  Numerical
 * choices, no source. */
#define ONE_D_TOL 1e-3
#define LIN_SWEEPS 4
/* Sweep predictor: least cosine between successive parameter steps, and
 * the longest extrapolation relative to the last step.  Numerical choices,
 * no source. */
#define PRED_COS 0.999
#define PRED_MAX 2.0
#define ONE_D_REACH 64.0
#define ONE_D_ITER 60
#define ONE_D_DY 1e-9
/* Bounds while iterating: a transient molality far off the answer must not
 * feed back through the water activity or the lagged SIT sums (log a_w >= -1
 * is 56 mol/kg of ideal solute; |sum eps m| <= 5).  Numerical choice, no
 * source. */
#define LOG_AW_MIN (-1.0)
#define LAG_MAX 5.0
/* Pivot smaller than this times its column's largest entry = singular. */
#define PIVOT_TOL 1e-13
/* Cold-start log10 molality of H+ (pH 7) and of other free basis species
 * (electron, gas) without a better guess.  Numerical choice, no source. */
#define Y_GUESS_H (-7.0)
#define Y_GUESS_OTHER 0.0

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

/* ---------------------------------------------------------------------- */
/* problem set-up for one solve                                            */

static void fail_at(px_equil_work *w, int kind, size_t index)
{
    w->st.fail_kind = kind;
    w->st.fail_index = index;
}

/* Validates the system, finds components whose total is exactly zero (their
 * species drop out), builds the sparse rows and the column/row maps. */
static int prepare(const px_equil_system *s, px_equil_work *w)
{
    size_t nb = s->nb, ns = s->ns;
    if (w->prep_sys == s && w->prep_rev == s->rev) {
        /* same structure as last time: only the zero totals may differ */
        int same = 1;
        for (size_t i = 0; i < nb; i++) {
            int pos = w->posonly[i] && s->ckind[i] == PX_EQUIL_C_TOTAL;
            if (pos && s->cval[i] < 0.0) {
                fail_at(w, PX_EQUIL_C_TOTAL, i);
                return PX_EINVAL;
            }
            if ((pos && s->cval[i] == 0.0) != (w->cabsent[i] != 0)) same = 0;
        }
        if (same) return PX_OK;
    }
    w->prep_sys = NULL;
    for (size_t j = 0; j < ns; j++)
        if (!s->is_set[j]) {
            fail_at(w, PX_EQUIL_C_NONE, j);
            return PX_EINVAL;
        }
    for (size_t i = 0; i < nb; i++) {
        w->cabsent[i] = 0;
        int k = s->ckind[i];
        if (k == PX_EQUIL_C_NONE) {
            fail_at(w, PX_EQUIL_C_NONE, i);
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
                fail_at(w, PX_EQUIL_C_TOTAL, i);
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
                fail_at(w, PX_EQUIL_C_FUGACITY, i);
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

static size_t n_mass_rows(const px_equil_system *s, const px_equil_work *w)
{
    size_t n = 0;
    for (size_t i = 0; i < s->nb; i++)
        if (w->row[i] != SIZE_MAX && s->ckind[i] == PX_EQUIL_C_TOTAL) n++;
    return n;
}

/* ---------------------------------------------------------------------- */
/* evaluation of species, residuals and Jacobian                           */

static double clampd(double x, double lo, double hi)
{
    return x < lo ? lo : (x > hi ? hi : x);
}

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

static void evaluate(const px_equil_system *s, px_equil_work *w)
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
            w->lag_next[j] = clampd(w->lag_next[j], -LAG_MAX, LAG_MAX);
            double d = fabs(w->lag_next[j] - w->lag[j]);
            if (d > change) change = d;
        }
    }
    w->lag_change = isfinite(change) ? change : DBL_MAX;
}

/* The analytic Jacobian at the last evaluation (uses its m, c, dg). */
static void jacobian(const px_equil_system *s, px_equil_work *w)
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
static double resid_norm(const px_equil_work *w, const px_equil_options *o, size_t *worst,
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

/* ---------------------------------------------------------------------- */
/* dense LU with partial pivoting on the row-scaled Jacobian               */

static int newton_direction(px_equil_work *w)
{
    size_t N = w->nrow;
    double *A = w->J, *b = w->dx;
    size_t *p = w->perm;
    for (size_t r = 0; r < N; r++) {
        double inv = 1.0 / w->scale[r];
        for (size_t k = 0; k < N; k++) A[r * N + k] *= inv;
        b[r] = -w->R[r] * inv;
        p[r] = r;
    }
    for (size_t k = 0; k < N; k++) {
        double cmax = 0.0;
        for (size_t r = 0; r < N; r++) {
            double a = fabs(A[r * N + k]);
            if (a > cmax) cmax = a;
        }
        size_t piv = k;
        double best = fabs(A[k * N + k]);
        for (size_t r = k + 1; r < N; r++)
            if (fabs(A[r * N + k]) > best) {
                best = fabs(A[r * N + k]);
                piv = r;
            }
        if (!(best > PIVOT_TOL * cmax) || !(best > 0.0)) return PX_ESINGULAR;
        if (piv != k) {
            for (size_t c = 0; c < N; c++) {
                double t = A[k * N + c];
                A[k * N + c] = A[piv * N + c];
                A[piv * N + c] = t;
            }
            double t = b[k];
            b[k] = b[piv];
            b[piv] = t;
            size_t tp = p[k];
            p[k] = p[piv];
            p[piv] = tp;
        }
        double d = A[k * N + k];
        for (size_t r = k + 1; r < N; r++) {
            double f = A[r * N + k] / d;
            if (f == 0.0) continue;
            for (size_t c = k + 1; c < N; c++) A[r * N + c] -= f * A[k * N + c];
            b[r] -= f * b[k];
        }
    }
    for (size_t k = N; k-- > 0;) {
        double v = b[k];
        for (size_t c = k + 1; c < N; c++) v -= A[k * N + c] * b[c];
        b[k] = v / A[k * N + k];
    }
    for (size_t k = 0; k < N; k++)
        if (!isfinite(b[k])) return PX_ESINGULAR;
    return PX_OK;
}

/* ---------------------------------------------------------------------- */
/* Newton iteration for a fixed active set                                 */

static void save_state(px_equil_work *w)
{
    memcpy(w->y_save, w->y, w->nb * sizeof(double));
    for (size_t p = 0; p < w->n_active; p++) w->amt_save[w->solids[p]] = w->amt[w->solids[p]];
    w->xI_save = w->xI;
}

static void apply_step(const px_equil_system *s, px_equil_work *w, double lam)
{
    for (size_t i = 0; i < s->nb; i++) {
        size_t cc = w->col[i];
        if (cc == SIZE_MAX) continue;
        if (s->phase[i] == PX_EQUIL_WATER)
            w->y[i] = clampd(w->y_save[i] + lam * w->dx[cc], LOG_AW_MIN, 0.0);
        else
            w->y[i] = clampd(w->y_save[i] + lam * w->dx[cc], -PX_EQUIL_LM_MAX, PX_EQUIL_LM_MAX);
    }
    w->xI = clampd(w->xI_save + lam * w->dx[w->ncol], PX_EQUIL_XI_MIN, PX_EQUIL_XI_MAX);
    for (size_t p = 0; p < w->n_active; p++) {
        size_t sj = w->solids[p];
        w->amt[sj] = w->amt_save[sj] + lam * w->dx[w->ncol + 1 + p];
    }
}

static void take_lag(const px_equil_system *s, px_equil_work *w)
{
    if (s->act.model == PX_EQUIL_SIT && s->n_sit)
        memcpy(w->lag, w->lag_next, s->ns * sizeof(double));
}

static int newton(const px_equil_system *s, px_equil_work *w, const px_equil_options *o,
                  double max_step)
{
    size_t worst;
    int ok;
    evaluate(s, w);
    for (size_t it = 0;; it++) {
        w->st.residual_norm = resid_norm(w, o, &worst, &ok);
        if (ok) return PX_OK;
        if (it >= o->max_iter) {
            fail_at(w, (int)w->row_kind[worst], w->row_index[worst]);
            return PX_ENOCONV;
        }
        if (w->lag_change > o->epsrel) {
            take_lag(s, w);
            evaluate(s, w);
            w->st.residual_norm = resid_norm(w, o, &worst, &ok);
            if (ok) return PX_OK;
        }
        jacobian(s, w);
        int st = newton_direction(w);
        if (st != PX_OK) {
            fail_at(w, (int)w->row_kind[worst], w->row_index[worst]);
            return st;
        }
        double mx = 0.0;
        for (size_t k = 0; k <= w->ncol; k++)
            if (fabs(w->dx[k]) > mx) mx = fabs(w->dx[k]);
        double lam = mx > max_step ? max_step / mx : 1.0;
        double phi0 = w->phi, best_phi = DBL_MAX, best_lam = lam, last_lam = 0.0;
        int accepted = 0;
        save_state(w);
        for (int ls = 0; ls <= LS_MAX; ls++) {
            apply_step(s, w, lam);
            evaluate(s, w);
            last_lam = lam;
            if (w->phi <= (1.0 - ARMIJO * lam) * phi0) {
                accepted = 1;
                break;
            }
            if (w->phi < best_phi) {
                best_phi = w->phi;
                best_lam = lam;
            }
            lam *= 0.5;
        }
        if (!accepted && best_lam != last_lam) {
            apply_step(s, w, best_lam);
            evaluate(s, w);
        }
        w->st.iterations++;
    }
}

/* ---------------------------------------------------------------------- */
/* cold start                                                              */

static int posonly_component(const px_equil_system *s, const px_equil_work *w, size_t i)
{
    for (size_t j = 0; j < s->ns; j++)
        if (!w->sabsent[j] && s->nu[j * s->nb + i] < 0.0) return 0;
    return 1;
}

/* Solves the activity and fugacity equations (linear in y) for their own
 * components given the others, in place: Gauss-Seidel sweeps, exact after
 * one sweep unless fugacities share components. */
static void solve_linear(const px_equil_system *s, px_equil_work *w, size_t skip)
{
    size_t nb = s->nb;
    for (int sweep = 0; sweep < LIN_SWEEPS; sweep++) {
        int any = 0;
        for (size_t i = 0; i < nb; i++) {
            if (i == skip || w->row[i] == SIZE_MAX) continue;
            int kind = s->ckind[i];
            if (kind == PX_EQUIL_C_ACTIVITY) {
                double g = s->phase[i] == PX_EQUIL_AQ ? w->g[i] : 0.0;
                w->y[i] = s->cval[i] - g;
            } else if (kind == PX_EQUIL_C_FUGACITY) {
                size_t gj = s->cgas[i];
                double v = s->logk[gj], nii = 0.0;
                for (size_t q = w->nz_start[gj]; q < w->nz_start[gj + 1]; q++) {
                    size_t k = w->nz_idx[q];
                    if (k == i) {
                        nii = w->nz_val[q];
                        if (s->phase[k] == PX_EQUIL_AQ) v += nii * w->g[k];
                        continue;
                    }
                    double lak = s->phase[k] == PX_EQUIL_AQ      ? w->y[k] + w->g[k]
                                 : s->phase[k] == PX_EQUIL_WATER
                                     ? (w->col[k] != SIZE_MAX ? w->y[k] : 0.0)
                                                                 : w->y[k];
                    v += w->nz_val[q] * lak;
                }
                double yn = clampd((s->cval[i] - v) / nii, -PX_EQUIL_LM_MAX, PX_EQUIL_LM_MAX);
                if (yn != w->y[i]) any = 1;
                w->y[i] = yn;
            }
        }
        if (!any) break;
    }
}

/* Charge balance as the cold start sees it.  Formation reactions conserve
 * charge (z_j = sum_i nu_ji z_i), so sum_j z_j m_j = sum_i z_i S_i with
 * S_i = sum_j nu_ji m_j; where S_i is fixed by a total, the total stands in
 * for it.  What is left is monotone in y_c in the usual cases, unlike the
 * raw sum while the other balances are still off (a fixed Ca^2+ molality
 * makes CaOH+ outgrow OH- at high pH). */
static double charge_proxy(const px_equil_system *s, px_equil_work *w, size_t c)
{
    size_t nb = s->nb;
    double *S = w->dx; /* scratch, nb <= nmax */
    for (size_t i = 0; i < nb; i++) S[i] = 0.0;
    for (size_t j = 0; j < s->ns; j++) {
        if (w->sabsent[j] || s->phase[j] != PX_EQUIL_AQ) continue;
        for (size_t q = w->nz_start[j]; q < w->nz_start[j + 1]; q++)
            S[w->nz_idx[q]] += w->nz_val[q] * w->m[j];
    }
    double f = 0.0;
    for (size_t i = 0; i < nb; i++) {
        if (w->cabsent[i]) continue;
        double si = (i != c && s->ckind[i] == PX_EQUIL_C_TOTAL) ? s->cval[i] : S[i];
        f += s->z[i] * si;
    }
    return f;
}

/* Sets y_i, re-solves the linear equations, evaluates; returns the
 * residual of component i's equation (the charge proxy for charge balance). */
static double eval_at(const px_equil_system *s, px_equil_work *w, size_t i, double y)
{
    w->y[i] = y;
    solve_linear(s, w, i);
    evaluate(s, w);
    if (s->ckind[i] == PX_EQUIL_C_CHARGE && s->z[i] != 0.0) return charge_proxy(s, w, i);
    return w->R[w->row[i]];
}

/* Solves component i's own equation for y_i with the other unknowns held
 * (Illinois variant of regula falsi, Dowell and Jarratt 1971, BIT 11:168)
 * to a loose relative tolerance.  A mass balance is monotone in its own
 * basis species (d/dy_i = ln10 sum nu_ji^2 m_j > 0); charge balance usually
 * is.  Leaves y_i unchanged when no sign change is found. */
static void solve_1d(const px_equil_system *s, px_equil_work *w, size_t i)
{
    size_t r = w->row[i];
    double y0 = w->y[i];
    double a = y0, fa = eval_at(s, w, i, y0);
    if (fabs(fa) <= ONE_D_TOL * w->scale[r]) return;
    double b = y0, fb = fa;
    int found = 0;
    for (double step = 0.5; step <= ONE_D_REACH && !found; step *= 2.0) {
        for (int sgn = -1; sgn <= 1 && !found; sgn += 2) {
            double yt = clampd(y0 + sgn * step, -PX_EQUIL_LM_MAX, PX_EQUIL_LM_MAX);
            double ft = eval_at(s, w, i, yt);
            if ((ft < 0.0) != (fa < 0.0)) {
                b = yt;
                fb = ft;
                found = 1;
            } else if (fabs(ft) < fabs(fa)) {
                /* keep the better end as the anchor */
                a = yt;
                fa = ft;
            }
        }
    }
    if (!found) {
        eval_at(s, w, i, a);
        return;
    }
    double c = b;
    for (int it = 0; it < ONE_D_ITER; it++) {
        c = b - fb * (b - a) / (fb - fa);
        if (!(c > fmin(a, b) && c < fmax(a, b))) c = 0.5 * (a + b);
        double fc = eval_at(s, w, i, c);
        if (fabs(fc) <= ONE_D_TOL * w->scale[r] || fabs(b - a) < ONE_D_DY) break;
        if ((fc < 0.0) != (fb < 0.0)) {
            a = b;
            fa = fb;
        } else {
            fa *= 0.5;
        }
        b = c;
        fb = fc;
    }
}

/* A starting point without a previous solution: ideal activity
 * coefficients (I held at its floor), then Gauss-Seidel passes: the
 * activity and fugacity equations solved directly (linear in y), mass
 * balances of components with only positive coefficients rescaled
 * (continued-fraction-like), the others and charge balance by 1-D root
 * finding.  Newton takes it from there. */
static void cold_start(const px_equil_system *s, px_equil_work *w)
{
    size_t nb = s->nb;
    memset(w->lag, 0, s->ns * sizeof(double));
    memset(w->active, 0, s->ns);
    memset(w->amt, 0, s->ns * sizeof(double));
    w->n_active = 0;
    for (size_t i = 0; i < nb; i++) {
        double y;
        int aq = s->phase[i] == PX_EQUIL_AQ;
        switch (s->ckind[i]) {
        case PX_EQUIL_C_TOTAL:
            y = (aq && s->cval[i] > 0.0) ? log10(s->cval[i]) : (aq ? Y_GUESS_H : Y_GUESS_OTHER);
            break;
        case PX_EQUIL_C_ACTIVITY: y = s->cval[i]; break;
        default: y = aq ? Y_GUESS_H : Y_GUESS_OTHER; break;
        }
        w->y[i] = w->cabsent[i] ? PX_EQUIL_LOG_ABSENT : y;
    }
    w->xI = PX_EQUIL_XI_MIN; /* ideal: the lagged terms stay 0 too */
    for (int pass = 0; pass < CF_PASSES; pass++) {
        solve_linear(s, w, SIZE_MAX);
        evaluate(s, w);
        for (size_t i = 0; i < nb; i++) {
            size_t r = w->row[i];
            if (r == SIZE_MAX) continue;
            int kind = s->ckind[i];
            if (kind != PX_EQUIL_C_TOTAL || s->phase[i] != PX_EQUIL_AQ || s->cval[i] <= 0.0 ||
                !posonly_component(s, w, i))
                continue;
            /* rescale the basis molality so the sum matches the total, damped
             * by the mean coefficient sum nu^2 m / sum nu m */
            double sum = 0.0, sum2 = 0.0;
            for (size_t j = 0; j < s->ns; j++) {
                if (w->sabsent[j] || s->phase[j] != PX_EQUIL_AQ) continue;
                double v = s->nu[j * nb + i];
                sum += v * w->m[j];
                sum2 += v * v * w->m[j];
            }
            if (!(sum > 0.0) || !(sum2 > 0.0)) continue;
            double d = log10(s->cval[i] / sum);
            w->y[i] = clampd(w->y[i] + d * sum / sum2, -PX_EQUIL_LM_MAX, PX_EQUIL_LM_MAX);
        }
        for (size_t i = 0; i < nb; i++) {
            if (w->row[i] == SIZE_MAX) continue;
            int kind = s->ckind[i];
            if (kind == PX_EQUIL_C_CHARGE ||
                (kind == PX_EQUIL_C_TOTAL && (s->phase[i] != PX_EQUIL_AQ || s->cval[i] <= 0.0 ||
                                              !posonly_component(s, w, i))))
                solve_1d(s, w, i);
        }
        evaluate(s, w);
        double worst = 0.0;
        for (size_t r = 0; r < w->ncol; r++) {
            size_t k = w->row_kind[r];
            if (k == PX_EQUIL_C_WATER) continue;
            double e = (k == PX_EQUIL_C_TOTAL || k == PX_EQUIL_C_CHARGE)
                           ? fabs(w->R[r]) / w->scale[r] : fabs(w->R[r]);
            worst = fmax(worst, e);
        }
        if (worst < CF_DONE) break;
    }
    /* I from the ideal molalities: R_I = I - floor - 1/2 sum z^2 m; a_w
     * from its own equation R_w = log a_w + M_w sum m / ln 10 */
    double Inew = exp(LN10 * w->xI) - w->R[w->ncol];
    for (size_t i = 0; i < nb; i++)
        if (s->ckind[i] == PX_EQUIL_C_WATER && w->row[i] != SIZE_MAX)
            w->y[i] = clampd(w->y[i] - w->R[w->row[i]], LOG_AW_MIN, 0.0);
    w->xI = clampd(log10(fmax(Inew, PX_EQUIL_I_FLOOR)), PX_EQUIL_XI_MIN, PX_EQUIL_XI_MAX);
}

/* ---------------------------------------------------------------------- */
/* active set of solids                                                    */

#define PX_EQUIL_SWAP_MAX 16     /* solids tried in one phase-rule exchange */
#define PX_EQUIL_SI_ACCEPT 1e-6  /* a result with a solid above this SI is not an equilibrium */

static void activate(px_equil_work *w, size_t j)
{
    w->active[j] = 1;
    w->amt[j] = 0.0;
    w->solids[w->n_active++] = j;
}

static void deactivate(px_equil_work *w, size_t j)
{
    size_t q = 0;
    for (size_t p = 0; p < w->n_active; p++)
        if (w->solids[p] != j) w->solids[q++] = w->solids[p];
    w->n_active = q;
    w->active[j] = 0;
    w->amt[j] = 0.0;
}

/* Do solids j and k share a mass-balance component? */
static int share_component(const px_equil_system *s, const px_equil_work *w, size_t j, size_t k)
{
    for (size_t q = w->nz_start[j]; q < w->nz_start[j + 1]; q++)
        for (size_t r = w->nz_start[k]; r < w->nz_start[k + 1]; r++)
            if (w->nz_idx[q] == w->nz_idx[r] && s->ckind[w->nz_idx[q]] == PX_EQUIL_C_TOTAL) return 1;
    return 0;
}

/* The most over-saturated solid that may precipitate and is not present,
 * or SIZE_MAX.  With `blocked_too`, solids refused earlier count as well. */
static size_t most_supersaturated(const px_equil_system *s, const px_equil_work *w, double floor,
                                  int blocked_too)
{
    size_t in = SIZE_MAX;
    double best = floor;
    for (size_t j = s->nb; j < s->ns; j++) {
        if (s->phase[j] != PX_EQUIL_SOLID || w->sabsent[j] || w->active[j] ||
            (!blocked_too && w->blocked[j]) || (s->flags[j] & PX_EQUIL_SUPPRESSED))
            continue;
        if (w->la[j] > best) {
            best = w->la[j];
            in = j;
        }
    }
    return in;
}

/* Phase rule: solid `in` cannot join the solids present (the system turns
 * singular, or every mass balance already has a solid).  At equilibrium an
 * over-saturated solid displaces one that fixes the same components, so try
 * each of those in turn: drop it, take `in`, solve, and keep the swap when
 * the dropped solid ends under-saturated (Smith and Missen 1982, Chemical
 * Reaction Equilibrium Analysis, ch. 6: phase-rule exchange).  Returns
 * PX_OK after a swap, PX_ENOCONV when none works (the state is then the
 * one before the call, `in` refused). */
static int swap_in(const px_equil_system *s, px_equil_work *w, const px_equil_options *o,
                   double max_step, size_t in)
{
    size_t cand[PX_EQUIL_SWAP_MAX];
    size_t nc = 0;
    for (size_t p = 0; p < w->n_active && nc < PX_EQUIL_SWAP_MAX; p++)
        if (w->solids[p] != in && share_component(s, w, w->solids[p], in)) cand[nc++] = w->solids[p];
    if (w->active[in]) deactivate(w, in);
    for (size_t c = 0; c < nc; c++) {
        size_t k = cand[c];
        deactivate(w, k);
        activate(w, in);
        int st = newton(s, w, o, max_step);
        if (st == PX_OK && w->amt[in] >= 0.0 && !(w->la[k] > o->si_tol)) {
            w->st.active_set_changes += 2;
            return PX_OK;
        }
        deactivate(w, in);
        activate(w, k);
    }
    /* no swap: restore the solids present and refuse `in` */
    newton(s, w, o, max_step);
    w->blocked[in] = 1;
    return PX_ENOCONV;
}

static int solve_active(const px_equil_system *s, px_equil_work *w, const px_equil_options *o,
                        double max_step)
{
    size_t rounds = 0, max_rounds = 2 * s->ns + 8;
    size_t nmass = n_mass_rows(s, w);
    size_t last_added = SIZE_MAX;
    memset(w->blocked, 0, s->ns);
    for (;;) {
        int st = newton(s, w, o, max_step);
        if (st == PX_ESINGULAR && last_added != SIZE_MAX) {
            size_t added = last_added;
            last_added = SIZE_MAX;
            swap_in(s, w, o, max_step, added);
            if (++rounds > max_rounds) break;
            continue;
        }
        if (st != PX_OK) return st;
        last_added = SIZE_MAX;
        /* a solid with a negative amount leaves */
        size_t out = SIZE_MAX;
        double most = 0.0;
        for (size_t p = 0; p < w->n_active; p++) {
            size_t sj = w->solids[p];
            double tmax = 0.0;
            for (size_t q = w->nz_start[sj]; q < w->nz_start[sj + 1]; q++) {
                size_t i = w->nz_idx[q];
                if (s->ckind[i] == PX_EQUIL_C_TOTAL) tmax = fmax(tmax, fabs(s->cval[i]));
            }
            double tol = o->epsabs + o->epsrel * tmax;
            if (w->amt[sj] < -tol && w->amt[sj] < most) {
                most = w->amt[sj];
                out = sj;
            }
        }
        if (out != SIZE_MAX) {
            deactivate(w, out);
            memset(w->blocked, 0, s->ns); /* the assemblage changed: refusals are stale */
            w->st.active_set_changes++;
            if (++rounds > max_rounds) break;
            continue;
        }
        /* the most supersaturated solid enters */
        size_t in = most_supersaturated(s, w, o->si_tol, 0);
        if (in == SIZE_MAX) {
            /* never report success with an over-saturated solid */
            size_t bad = most_supersaturated(s, w, PX_EQUIL_SI_ACCEPT, 1);
            if (bad == SIZE_MAX) return PX_OK;
            fail_at(w, PX_EQUIL_C_SOLID, bad);
            return PX_ENOCONV;
        }
        if (w->n_active >= nmass) {
            swap_in(s, w, o, max_step, in);
        } else {
            activate(w, in);
            last_added = in;
            w->st.active_set_changes++;
        }
        if (++rounds > max_rounds) break;
    }
    fail_at(w, PX_EQUIL_C_ACTIVE_SET, 0);
    return PX_ENOCONV;
}

/* ---------------------------------------------------------------------- */
/* the solve                                                               */

static int state_finite(const px_equil_work *w)
{
    if (!isfinite(w->xI)) return 0;
    for (size_t i = 0; i < w->nb; i++)
        if (!isfinite(w->y[i])) return 0;
    for (size_t j = 0; j < w->ns; j++)
        if (!isfinite(w->amt[j]) || !isfinite(w->lag[j])) return 0;
    return 1;
}

static int valid_options(const px_equil_options *o)
{
    return isfinite(o->epsabs) && o->epsabs >= 0.0 && isfinite(o->epsrel) && o->epsrel >= 0.0 &&
           (o->epsabs > 0.0 || o->epsrel > 0.0) && o->max_iter > 0 && isfinite(o->max_step) &&
           o->max_step > 0.0 && isfinite(o->si_tol) && o->si_tol >= 0.0;
}

/* The constraint values as a point in parameter space (log totals, log
 * activities, log fugacities), for the sweep predictor. */
static void sweep_params(const px_equil_system *s, double *par)
{
    for (size_t i = 0; i < s->nb; i++) {
        double v = s->cval[i];
        switch (s->ckind[i]) {
        case PX_EQUIL_C_TOTAL: par[i] = v > 0.0 ? log10(v) : v; break;
        case PX_EQUIL_C_ACTIVITY:
        case PX_EQUIL_C_FUGACITY: par[i] = v; break;
        default: par[i] = 0.0; break;
        }
    }
}

/* Sweep predictor: when the constraints moved on along the line of the last
 * step (cosine > PRED_COS) and the solids stayed the same, start from the
 * linear extrapolation of the last two solutions instead of the last one
 * (first-order continuation, e.g. Allgower and Georg 1990, Numerical
 * Continuation Methods, ch. 2).  Returns 1 if it moved the start. */
static int predict(const px_equil_system *s, px_equil_work *w)
{
    if (w->hist < 2 || w->sig_p1 != w->sig_p2) return 0;
    double *par = w->dx; /* scratch */
    sweep_params(s, par);
    double dd = 0.0, pp = 0.0, dp = 0.0;
    for (size_t i = 0; i < s->nb; i++) {
        double d = par[i] - w->par_p1[i], q = w->par_p1[i] - w->par_p2[i];
        dd += d * d;
        pp += q * q;
        dp += d * q;
    }
    if (!(pp > 0.0) || !(dd > 0.0) || dp <= PRED_COS * sqrt(dd * pp)) return 0;
    double a = dp / pp;
    if (!(a > 0.0 && a <= PRED_MAX)) return 0;
    for (size_t i = 0; i < s->nb; i++)
        if (w->col[i] != SIZE_MAX)
            w->y[i] = clampd(w->y_p1[i] + a * (w->y_p1[i] - w->y_p2[i]),
                             s->phase[i] == PX_EQUIL_WATER ? LOG_AW_MIN : -PX_EQUIL_LM_MAX,
                             s->phase[i] == PX_EQUIL_WATER ? 0.0 : PX_EQUIL_LM_MAX);
    w->xI = clampd(w->xI_p1 + a * (w->xI_p1 - w->xI_p2), PX_EQUIL_XI_MIN, PX_EQUIL_XI_MAX);
    return 1;
}

/* Fills the reported quantities from the last evaluation; checks every
 * value is finite. */
static int finish(const px_equil_system *s, px_equil_work *w, int status)
{
    size_t nb = s->nb, ns = s->ns;
    double I = 0.0, q = 0.0, qs = 0.0;
    for (size_t j = 0; j < ns; j++) {
        if (s->phase[j] != PX_EQUIL_AQ || w->sabsent[j]) continue;
        I += 0.5 * s->z[j] * s->z[j] * w->m[j];
        q += s->z[j] * w->m[j];
        qs += fabs(s->z[j] * w->m[j]);
    }
    w->st.ionic_strength = I;
    w->st.charge_imbalance = q;
    w->st.charge_scale = qs;
    w->st.log_aw = 0.0;
    for (size_t i = 0; i < nb; i++)
        if (s->phase[i] == PX_EQUIL_WATER) w->st.log_aw = w->la[i];
    w->st.n_solids = w->n_active;
    for (size_t i = 0; i < nb; i++) {
        size_t r = w->row[i];
        double e = 0.0;
        if (r != SIZE_MAX && r < w->nrow) {
            int k = s->ckind[i];
            e = (k == PX_EQUIL_C_TOTAL || k == PX_EQUIL_C_CHARGE) ? w->R[r] / w->scale[r]
                                                                : w->R[r];
        }
        w->resid_comp[i] = e;
        w->ckind[i] = s->ckind[i];
        w->tot_given[i] = s->ckind[i] == PX_EQUIL_C_TOTAL ? s->cval[i] : 0.0;
        w->tot_aq[i] = w->tot_solid[i] = 0.0;
    }
    for (size_t j = 0; j < ns; j++) {
        w->phase[j] = s->phase[j];
        if (w->sabsent[j]) continue;
        for (size_t q = w->nz_start[j]; q < w->nz_start[j + 1]; q++) {
            size_t i = w->nz_idx[q];
            if (s->phase[j] == PX_EQUIL_AQ) w->tot_aq[i] += w->nz_val[q] * w->m[j];
            else if (s->phase[j] == PX_EQUIL_SOLID && w->active[j])
                w->tot_solid[i] += w->nz_val[q] * w->amt[j];
        }
    }
    int finite = isfinite(I) && isfinite(q) && isfinite(qs) && isfinite(w->st.residual_norm) &&
                 isfinite(w->st.log_aw);
    for (size_t j = 0; j < ns && finite; j++)
        finite = isfinite(w->m[j]) && isfinite(w->lm[j]) && isfinite(w->g[j]) &&
                 isfinite(w->la[j]) && isfinite(w->amt[j]);
    for (size_t i = 0; i < nb && finite; i++)
        finite = isfinite(w->resid_comp[i]) && isfinite(w->tot_aq[i]) && isfinite(w->tot_solid[i]);
    if (!finite) {
        /* never hand a NaN out: blank the results */
        for (size_t j = 0; j < ns; j++) {
            w->m[j] = w->g[j] = w->amt[j] = 0.0;
            w->lm[j] = w->la[j] = PX_EQUIL_LOG_ABSENT;
        }
        for (size_t i = 0; i < nb; i++) w->resid_comp[i] = w->tot_aq[i] = w->tot_solid[i] = 0.0;
        w->st.ionic_strength = w->st.charge_imbalance = w->st.charge_scale = 0.0;
        w->st.log_aw = 0.0;
        if (!isfinite(w->st.residual_norm)) w->st.residual_norm = DBL_MAX;
        if (status == PX_OK) status = PX_ENONFINITE;
    }
    w->st.status = status;
    w->have = status == PX_OK;
    if (w->have) {
        memcpy(w->absent_prev, w->cabsent, nb);
        /* history for the sweep predictor: this solution becomes p1 */
        size_t sig = w->n_active;
        for (size_t p = 0; p < w->n_active; p++) sig = sig * 31u + w->solids[p] + 1u;
        memcpy(w->y_p2, w->y_p1, nb * sizeof(double));
        memcpy(w->par_p2, w->par_p1, nb * sizeof(double));
        w->xI_p2 = w->xI_p1;
        w->sig_p2 = w->sig_p1;
        memcpy(w->y_p1, w->y, nb * sizeof(double));
        sweep_params(s, w->par_p1);
        w->xI_p1 = w->xI;
        w->sig_p1 = sig;
        if (w->hist < 2) w->hist++;
    } else {
        w->hist = 0;
    }
    return status;
}

int px_equil_solve(const px_equil_system *s, px_equil_work *w, const px_equil_options *opt)
{
    if (!s || !w) return PX_EINVAL;
    px_equil_options o = opt ? *opt : px_equil_options_default();
    memset(&w->st, 0, sizeof w->st);
    if (w->nb != s->nb || w->ns != s->ns || !valid_options(&o)) {
        w->st.status = PX_EINVAL;
        w->have = 0;
        return PX_EINVAL;
    }
    int st = prepare(s, w);
    if (st != PX_OK) {
        w->st.status = st;
        w->have = 0;
        return st;
    }
    int warm = o.warm && w->have && state_finite(w) &&
               memcmp(w->absent_prev, w->cabsent, s->nb) == 0;
    if (warm) {
        /* rebuild the active list (a flag may have changed since) */
        w->n_active = 0;
        for (size_t j = s->nb; j < s->ns; j++) {
            if (!w->active[j]) continue;
            if (s->phase[j] != PX_EQUIL_SOLID || w->sabsent[j] ||
                (s->flags[j] & PX_EQUIL_SUPPRESSED) || w->n_active >= n_mass_rows(s, w)) {
                w->active[j] = 0;
                w->amt[j] = 0.0;
                continue;
            }
            w->solids[w->n_active++] = j;
        }
        if (s->act.model != PX_EQUIL_SIT) memset(w->lag, 0, s->ns * sizeof(double));
        for (size_t i = 0; i < s->nb; i++)
            if (s->phase[i] == PX_EQUIL_WATER && s->act.water != PX_EQUIL_WATER_IDEAL) w->y[i] = 0.0;
        (void)predict(s, w); /* a misled start falls back to a cold one below */
        st = solve_active(s, w, &o, o.max_step);
    }
    if (!warm || st != PX_OK) {
        if (warm) w->st.restarts++;
        cold_start(s, w);
        st = solve_active(s, w, &o, o.max_step);
        if (st != PX_OK) {
            /* last resort: shorter steps, more iterations */
            px_equil_options o2 = o;
            o2.max_iter = 4 * o.max_iter;
            w->st.restarts++;
            cold_start(s, w);
            st = solve_active(s, w, &o2, 0.25 * o.max_step);
        }
    }
    if (st == PX_OK) w->st.fail_kind = 0, w->st.fail_index = 0;
    return finish(s, w, st);
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
