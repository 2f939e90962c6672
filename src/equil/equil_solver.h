/* equil_solver.h - what the files of the speciation solver share (private
 * to src/equil; the solver's public contract is equil.h, its state layout
 * equil_internal.h).  The solve is split by concern:
 *   equil_solve.c    px_equil_solve: warm or cold start, retries, sweep
 *                    predictor, results gathered and checked
 *   equil_work.c     workspace lifecycle, default options, result getters
 *   equil_prepare.c  the problem's structure for one solve (sparse rows,
 *                    Newton columns, absent components)
 *   equil_eval.c     species, residuals, merit and analytic Jacobian at the
 *                    current unknowns
 *   equil_newton.c   damped Newton iteration for a fixed set of solids
 *                    (row-scaled direction by num/num.h, Armijo line search)
 *   equil_cold.c     a starting point without a previous solution
 *   equil_active.c   the active set of solids (enter by saturation index,
 *                    leave on a negative amount, phase-rule exchange)
 * All functions here work on a workspace prepared for the system (w->nb,
 * w->ns match s) and return status codes of core/status.h. */
#ifndef PX_EQUIL_SOLVER_H
#define PX_EQUIL_SOLVER_H
#include "equil_internal.h"
#include "core/constants.h"

#define LN10 PX_LN10
/* Bounds while iterating: a transient molality far off the answer must not
 * feed back through the water activity (log a_w >= -1 is 56 mol/kg of ideal
 * solute).  Numerical choice, no source. */
#define LOG_AW_MIN (-1.0)

static inline double px_equil_clamp(double x, double lo, double hi)
{
    return x < lo ? lo : (x > hi ? hi : x);
}

/* Records what failed (kind PX_EQUIL_C_*, component or species index). */
static inline void px_equil_fail_at(px_equil_work *w, int kind, size_t index)
{
    w->st.fail_kind = kind;
    w->st.fail_index = index;
}

/* equil_prepare.c: validates the system, finds components whose total is
 * exactly zero (their species drop out), builds the sparse rows and the
 * column/row maps; cached per (system, revision).  PX_EINVAL with the
 * failing constraint recorded. */
int px_equil_work_prepare(const px_equil_system *s, px_equil_work *w);
/* Mass-balance rows of the prepared problem (the most solids present). */
size_t px_equil_work_n_mass_rows(const px_equil_system *s, const px_equil_work *w);

/* equil_eval.c: species, scaled residuals, merit phi and the lagged SIT
 * sums at the current unknowns (y, xI, amounts of the active solids). */
void px_equil_work_evaluate(const px_equil_system *s, px_equil_work *w);
/* The analytic Jacobian at the last evaluation (uses its m, c, dg). */
void px_equil_work_jacobian(const px_equil_system *s, px_equil_work *w);
/* Largest scaled residual and the index of the worst row; *ok when every
 * row and the lagged sums meet the tolerances of o. */
double px_equil_work_resid_norm(const px_equil_work *w, const px_equil_options *o, size_t *worst,
                                int *ok);

/* equil_newton.c: Newton iteration with the solids of the active set held;
 * steps limited to max_step log units.  PX_OK, PX_ENOCONV (max_iter),
 * PX_ESINGULAR (no direction); the worst row is recorded on failure. */
int px_equil_work_newton(const px_equil_system *s, px_equil_work *w, const px_equil_options *o,
                         double max_step);

/* equil_cold.c: a starting point from the constraints alone (no solids,
 * ideal activity coefficients first). */
void px_equil_work_cold_start(const px_equil_system *s, px_equil_work *w);

/* equil_active.c: Newton with solids entering and leaving until none is
 * over-saturated and every amount is non-negative. */
int px_equil_work_solve_active(const px_equil_system *s, px_equil_work *w,
                               const px_equil_options *o, double max_step);

#endif
