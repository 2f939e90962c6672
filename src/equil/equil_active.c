/* equil_active.c - the active set of solids.  Repeats Newton
 * (equil_newton.c) for the solids present and then changes the set:
 *   - a solid whose amount is below -(epsabs + epsrel T) (T: the largest
 *     total of its components) leaves, the most negative first;
 *   - else the most over-saturated solid (SI > si_tol) that may form
 *     enters; when every mass balance already has a solid, or Newton turns
 *     singular with the newcomer, it displaces one that shares a component
 *     if that one then ends under-saturated (phase-rule exchange, Smith and
 *     Missen 1982), else it is refused for this solve;
 *   - PX_OK when no solid is left to change, unless one is over-saturated
 *     by more than PX_EQUIL_SI_ACCEPT (then PX_ENOCONV: never a false
 *     equilibrium); PX_ENOCONV after 2 ns + 8 rounds (kind
 *     PX_EQUIL_C_ACTIVE_SET); Newton's failures otherwise.
 * Counts changes in w->st.active_set_changes. */
#include "equil_solver.h"
#include <math.h>
#include <stdint.h>
#include <string.h>

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
        int st = px_equil_work_newton(s, w, o, max_step);
        if (st == PX_OK && w->amt[in] >= 0.0 && !(w->la[k] > o->si_tol)) {
            w->st.active_set_changes += 2;
            return PX_OK;
        }
        deactivate(w, in);
        activate(w, k);
    }
    /* no swap: restore the solids present and refuse `in` */
    px_equil_work_newton(s, w, o, max_step);
    w->blocked[in] = 1;
    return PX_ENOCONV;
}

int px_equil_work_solve_active(const px_equil_system *s, px_equil_work *w, const px_equil_options *o,
                        double max_step)
{
    size_t rounds = 0, max_rounds = 2 * s->ns + 8;
    size_t nmass = px_equil_work_n_mass_rows(s, w);
    size_t last_added = SIZE_MAX;
    memset(w->blocked, 0, s->ns);
    for (;;) {
        int st = px_equil_work_newton(s, w, o, max_step);
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
            px_equil_fail_at(w, PX_EQUIL_C_SOLID, bad);
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
    px_equil_fail_at(w, PX_EQUIL_C_ACTIVE_SET, 0);
    return PX_ENOCONV;
}
