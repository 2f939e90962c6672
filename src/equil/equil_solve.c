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
 * details; equil_solver.h lists the files of the solver by concern.  This
 * file holds the solve itself: validation, warm start (with the sweep
 * predictor) or cold start, the retries, and the results gathered and
 * checked finite. */
#include "equil_solver.h"
#include <float.h>
#include <math.h>
#include <stdint.h>
#include <string.h>

/* Sweep predictor: least cosine between successive parameter steps, and
 * the longest extrapolation relative to the last step.  Numerical choices,
 * no source. */
#define PRED_COS 0.999
#define PRED_MAX 2.0

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
            w->y[i] = px_equil_clamp(w->y_p1[i] + a * (w->y_p1[i] - w->y_p2[i]),
                             s->phase[i] == PX_EQUIL_WATER ? LOG_AW_MIN : -PX_EQUIL_LM_MAX,
                             s->phase[i] == PX_EQUIL_WATER ? 0.0 : PX_EQUIL_LM_MAX);
    w->xI = px_equil_clamp(w->xI_p1 + a * (w->xI_p1 - w->xI_p2), PX_EQUIL_XI_MIN, PX_EQUIL_XI_MAX);
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
    int st = px_equil_work_prepare(s, w);
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
                (s->flags[j] & PX_EQUIL_SUPPRESSED) || w->n_active >= px_equil_work_n_mass_rows(s, w)) {
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
        st = px_equil_work_solve_active(s, w, &o, o.max_step);
    }
    if (!warm || st != PX_OK) {
        if (warm) w->st.restarts++;
        px_equil_work_cold_start(s, w);
        st = px_equil_work_solve_active(s, w, &o, o.max_step);
        if (st != PX_OK) {
            /* last resort: shorter steps, more iterations */
            px_equil_options o2 = o;
            o2.max_iter = 4 * o.max_iter;
            w->st.restarts++;
            px_equil_work_cold_start(s, w);
            st = px_equil_work_solve_active(s, w, &o2, 0.25 * o.max_step);
        }
        if (st != PX_OK) {
            /* then: log I's step limited apart from the others
             * (equil_newton.c), taken only where both tries above failed
             * so that every solve they close stays as it was */
            w->st.restarts++;
            w->xi_apart = 1;
            px_equil_work_cold_start(s, w);
            st = px_equil_work_solve_active(s, w, &o, o.max_step);
            w->xi_apart = 0;
        }
    }
    if (st == PX_OK) w->st.fail_kind = 0, w->st.fail_index = 0;
    return finish(s, w, st);
}
