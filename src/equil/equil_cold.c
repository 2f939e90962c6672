/* equil_cold.c - a starting point without a previous solution.
 * Every basis unknown gets a guess from its constraint (log of the total,
 * the fixed activity, else pH 7 or 0), the solids leave, I sits at its
 * floor (ideal activity coefficients, lagged sums 0).  Then up to
 * CF_PASSES Gauss-Seidel passes: the activity and fugacity equations are
 * solved directly (linear in y), mass balances of components with only
 * positive coefficients are rescaled (continued-fraction-like), the other
 * mass balances and charge balance are solved one unknown at a time by a
 * bracketed 1-D root finder (num/num.h); the passes stop when every row is
 * within CF_DONE.  Last, I and the water activity take the values their
 * own equations give.  The result is only a start: Newton takes it from
 * there, and nothing here fails (a component whose equation cannot be
 * bracketed keeps its best value). */
#include "equil_solver.h"
#include "num/num.h"
#include <math.h>
#include <stdint.h>
#include <string.h>

/* Passes of the mass-balance scaling that builds a cold-start guess.
 * Numerical choice, no source. */
#define CF_PASSES 30
/* Stop those passes when every balance is within this relative error. */
#define CF_DONE 1e-2
/* Gauss-Seidel sweeps of the linear (activity, fugacity) equations.
 * Numerical choice, no source. */
#define LIN_SWEEPS 4
/* 1-D root finding in the cold start: relative residual tolerance, first
 * step and reach of the bracket search (log10 units), iterations, smallest
 * bracket.  Numerical choices, no source. */
#define ONE_D_TOL 1e-3
#define ONE_D_STEP 0.5
#define ONE_D_REACH 64.0
#define ONE_D_ITER 60
#define ONE_D_DY 1e-9
/* Cold-start log10 molality of H+ (pH 7) and of other free basis species
 * (electron, gas) without a better guess.  Numerical choice, no source. */
#define Y_GUESS_H (-7.0)
#define Y_GUESS_OTHER 0.0

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
                double yn = px_equil_clamp((s->cval[i] - v) / nii, -PX_EQUIL_LM_MAX, PX_EQUIL_LM_MAX);
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
    px_equil_work_evaluate(s, w);
    if (s->ckind[i] == PX_EQUIL_C_CHARGE && s->z[i] != 0.0) return charge_proxy(s, w, i);
    return w->R[w->row[i]];
}

/* Component i's own equation as a function of y_i for the root finder; a
 * positive return says the residual passes ONE_D_TOL times its row's
 * current scale. */
typedef struct one_d {
    const px_equil_system *s;
    px_equil_work *w;
    size_t i, r;
} one_d;

static int one_d_eval(double y, void *user, double *f)
{
    one_d *c = user;
    *f = eval_at(c->s, c->w, c->i, y);
    return fabs(*f) <= ONE_D_TOL * c->w->scale[c->r] ? 1 : PX_OK;
}

/* Solves component i's own equation for y_i with the other unknowns held
 * (bracket search, then Illinois regula falsi: num/num.h) to a loose
 * relative tolerance.  A mass balance is monotone in its own basis species
 * (d/dy_i = ln10 sum nu_ji^2 m_j > 0); charge balance usually is.  Leaves
 * y_i at the best point seen when no sign change is found.  The workspace
 * is left evaluated at the last point tried. */
static void solve_1d(const px_equil_system *s, px_equil_work *w, size_t i)
{
    one_d c = {s, w, i, w->row[i]};
    double y0 = w->y[i];
    double a, fa = eval_at(s, w, i, y0), b, fb, y;
    if (fabs(fa) <= ONE_D_TOL * w->scale[c.r]) return;
    if (px_num_root_search(one_d_eval, &c, y0, fa, ONE_D_STEP, ONE_D_REACH, -PX_EQUIL_LM_MAX,
                           PX_EQUIL_LM_MAX, &a, &fa, &b, &fb, NULL) != PX_OK) {
        eval_at(s, w, i, a);
        return;
    }
    px_num_root_options o = {ONE_D_DY, 0.0, 0.0, ONE_D_ITER};
    (void)px_num_root_illinois(one_d_eval, &c, a, fa, b, fb, &o, &y, NULL);
}

/* A starting point without a previous solution: ideal activity
 * coefficients (I held at its floor), then Gauss-Seidel passes: the
 * activity and fugacity equations solved directly (linear in y), mass
 * balances of components with only positive coefficients rescaled
 * (continued-fraction-like), the others and charge balance by 1-D root
 * finding.  Newton takes it from there. */
void px_equil_work_cold_start(const px_equil_system *s, px_equil_work *w)
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
        px_equil_work_evaluate(s, w);
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
            w->y[i] = px_equil_clamp(w->y[i] + d * sum / sum2, -PX_EQUIL_LM_MAX, PX_EQUIL_LM_MAX);
        }
        for (size_t i = 0; i < nb; i++) {
            if (w->row[i] == SIZE_MAX) continue;
            int kind = s->ckind[i];
            if (kind == PX_EQUIL_C_CHARGE ||
                (kind == PX_EQUIL_C_TOTAL && (s->phase[i] != PX_EQUIL_AQ || s->cval[i] <= 0.0 ||
                                              !posonly_component(s, w, i))))
                solve_1d(s, w, i);
        }
        px_equil_work_evaluate(s, w);
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
            w->y[i] = px_equil_clamp(w->y[i] - w->R[w->row[i]], LOG_AW_MIN, 0.0);
    w->xI = px_equil_clamp(log10(fmax(Inew, PX_EQUIL_I_FLOOR)), PX_EQUIL_XI_MIN, PX_EQUIL_XI_MAX);
}
