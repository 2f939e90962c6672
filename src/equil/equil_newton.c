/* equil_newton.c - damped Newton-Raphson for a fixed active set.
 * Each iteration: converged rows end it (PX_OK); max_iter iterations end
 * it with PX_ENOCONV; lagged SIT sums that moved more than epsrel are taken
 * first and the rows re-tested; then the direction from the row-scaled
 * Jacobian (PX_ESINGULAR when there is none), scaled so no log unknown
 * moves more than max_step, and backtracked by halving until the merit
 * sum (R/scale)^2 falls by the Armijo rule (Dennis and Schnabel 1983,
 * Numerical Methods for Unconstrained Optimization and Nonlinear
 * Equations, ch. 6); after LS_MAX halvings without it, the best step seen
 * is kept.  In the solver's last try (w->xi_apart) the step length is set
 * by the basis unknowns alone and log I's step is clipped to max_step by
 * itself: I = 1/2 sum z^2 m linearised about a state rich in a polynuclear
 * ion (Al13O4(OH)24^7+: z^2 = 49, 13 Al) predicts a negative I whenever that
 * ion must fall by decades, so log I's Newton component is huge, shortens
 * every step to nothing, and log I runs to its floor where the iteration
 * stalls.  Unknowns stay inside their bounds (log m within
 * +-PX_EQUIL_LM_MAX, log a_w in [LOG_AW_MIN, 0], log I within its
 * limits).  On failure the worst row is recorded (px_equil_fail_at). */
#include "equil_solver.h"
#include "num/num.h"
#include <float.h>
#include <math.h>
#include <stdint.h>
#include <string.h>

/* Armijo sufficient-decrease constant (Dennis and Schnabel 1983, sec. 6.3). */
#define ARMIJO 1e-4
/* Backtracking halvings per Newton step.  Numerical choice, no source. */
#define LS_MAX 12
/* Pivot smaller than this times its column's largest entry = singular. */
#define PIVOT_TOL 1e-13

/* Newton direction: solves (D J) dx = -D R with D = diag(1/scale), the
 * row-scaled Jacobian, by the core's dense solver; any failure (singular
 * pivot, non-finite step) is PX_ESINGULAR to the active-set logic. */
static int newton_direction(px_equil_work *w)
{
    size_t N = w->nrow;
    double *A = w->J, *b = w->dx;
    for (size_t r = 0; r < N; r++) {
        double inv = 1.0 / w->scale[r];
        for (size_t k = 0; k < N; k++) A[r * N + k] *= inv;
        b[r] = -w->R[r] * inv;
    }
    int st = px_num_lu_solve(N, A, b, w->perm, PIVOT_TOL, 0.0, NULL);
    return st == PX_OK ? PX_OK : PX_ESINGULAR;
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
            w->y[i] = px_equil_clamp(w->y_save[i] + lam * w->dx[cc], LOG_AW_MIN, 0.0);
        else
            w->y[i] = px_equil_clamp(w->y_save[i] + lam * w->dx[cc], -PX_EQUIL_LM_MAX, PX_EQUIL_LM_MAX);
    }
    w->xI = px_equil_clamp(w->xI_save + lam * w->dx[w->ncol], PX_EQUIL_XI_MIN, PX_EQUIL_XI_MAX);
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

int px_equil_work_newton(const px_equil_system *s, px_equil_work *w, const px_equil_options *o,
                  double max_step)
{
    size_t worst;
    int ok;
    px_equil_work_evaluate(s, w);
    for (size_t it = 0;; it++) {
        w->st.residual_norm = px_equil_work_resid_norm(w, o, &worst, &ok);
        if (ok) return PX_OK;
        if (it >= o->max_iter) {
            px_equil_fail_at(w, (int)w->row_kind[worst], w->row_index[worst]);
            return PX_ENOCONV;
        }
        if (w->lag_change > o->epsrel) {
            take_lag(s, w);
            px_equil_work_evaluate(s, w);
            w->st.residual_norm = px_equil_work_resid_norm(w, o, &worst, &ok);
            if (ok) return PX_OK;
        }
        px_equil_work_jacobian(s, w);
        int st = newton_direction(w);
        if (st != PX_OK) {
            px_equil_fail_at(w, (int)w->row_kind[worst], w->row_index[worst]);
            return st;
        }
        /* the largest log step sets the step length; with xi_apart, log I
         * is left out of it and clipped on its own (a per-unknown bound:
         * numerical choice, no source) */
        size_t nlim = w->xi_apart ? w->ncol : w->ncol + 1;
        double mx = 0.0;
        for (size_t k = 0; k < nlim; k++)
            if (fabs(w->dx[k]) > mx) mx = fabs(w->dx[k]);
        double lam = mx > max_step ? max_step / mx : 1.0;
        if (w->xi_apart)
            w->dx[w->ncol] = px_equil_clamp(w->dx[w->ncol], -max_step / lam, max_step / lam);
        double phi0 = w->phi, best_phi = DBL_MAX, best_lam = lam, last_lam = 0.0;
        int accepted = 0;
        save_state(w);
        for (int ls = 0; ls <= LS_MAX; ls++) {
            apply_step(s, w, lam);
            px_equil_work_evaluate(s, w);
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
            px_equil_work_evaluate(s, w);
        }
        w->st.iterations++;
    }
}
