/* num.h - small numerical kernels shared by the core: one dense linear
 * solver and the one-dimensional root finders.  No allocation, no printing,
 * no globals; every function returns a status of core/status.h.
 *
 * Dense solve (lu.c)
 *   px_num_lu_solve solves A x = b for a square n x n row-major A by
 *   Gaussian elimination with partial (row) pivoting (Golub and Van Loan
 *   2013, Matrix Computations, 4th ed., alg. 3.4.1), in place: A is
 *   overwritten by its upper factor, b by the solution x.
 *   A pivot is refused (the matrix is taken as singular) when it is zero,
 *   not a number, below `pivot_abs` in magnitude, or not above `pivot_rel`
 *   times the largest magnitude in its column of the partly reduced matrix
 *   (0 switches either test off).  Errors: PX_EINVAL (n == 0, NULL
 *   arrays, negative or NaN thresholds), PX_ENONFINITE (an entry of A or b
 *   is Inf or NaN, or the solution overflowed), PX_ESINGULAR (a pivot
 *   refused; its column in *bad_col when bad_col is not NULL).  With the
 *   relative test on, a non-finite entry is found when elimination reaches
 *   its column: a pivot refused in an earlier column comes first.
 *   Non-finite input never comes back as PX_OK.
 *   perm (n entries, may be NULL) receives the row order: row k of the
 *   factor is row perm[k] of the input.
 *
 * Root finding (root.c), after the GSL contract: the caller brackets the
 * root, passes epsabs/epsrel (validated before any evaluation: finite,
 * >= 0, not both 0) and its own max_iter (>= 1), and reads the statistics
 * (iterations, evaluations, bisections, last residual) whatever the
 * status.  Convergence in x: |b - a| <= epsabs + epsrel min(|a|, |b|) for
 * a bracket, |step| <= epsabs + epsrel |x| for Newton (both tolerances 0:
 * run to max_iter unless a root is hit exactly).  Callbacks return a
 * status; a negative one stops the search and is returned as is (a caller
 * that must tell it from the finder's own PX_ENOCONV keeps it in its user
 * data).
 *   px_num_root_bisect       a change of a discrete answer (a label, a
 *                            side) between lo and hi: bisection.
 *   px_num_root_newton       a root of an increasing f on [lo, hi]: Newton
 *                            kept inside a shrinking bracket, bisection
 *                            where a step leaves it.
 *   px_num_root_search       widen steps around x0 until f changes sign.
 *   px_num_root_illinois     a sign change of f in [a, b]: Illinois
 *                            regula falsi, with an optional residual test.
 */
#ifndef PX_NUM_H
#define PX_NUM_H
#include <stddef.h>

int px_num_lu_solve(size_t n, double *A, double *b, size_t *perm, double pivot_rel,
                    double pivot_abs, size_t *bad_col);

typedef struct px_num_root_options {
    double epsabs;   /* absolute tolerance in x */
    double epsrel;   /* relative tolerance in x */
    double ftol;     /* illinois only: also stop when |f| <= ftol (0: only at f = 0) */
    int max_iter;    /* iterations at most (>= 1) */
} px_num_root_options;

typedef struct px_num_root_stats {
    int iterations;  /* iterations done */
    int evaluations; /* calls of the function */
    int bisections;  /* steps that fell back to bisection */
    double residual; /* |f| at the last evaluation (NaN before any) */
} px_num_root_stats;

/* Validates the options (PX_OK or PX_EINVAL). */
int px_num_root_options_check(const px_num_root_options *o);

/* side(x) sets *high to 0 where x is on lo's side, 1 on hi's.  Bisects while
 * the bracket is wider than the tolerance; returns the bracket in *lo, *hi
 * (the caller takes its midpoint).  PX_ENOCONV when max_iter bisections did
 * not reach the tolerance (the bracket is then the last one). */
typedef int (*px_num_side_fn)(double x, void *user, int *high);
int px_num_root_bisect(px_num_side_fn side, void *user, double *lo, double *hi,
                       const px_num_root_options *o, px_num_root_stats *st);

/* fdf(x) gives f and its derivative df.  f is increasing on the branch
 * sought; a point with df <= 0 is taken to lie below the root (a region
 * that the branch does not reach, e.g. a spinodal).  Starts at x0 (inside
 * (lo, hi), else the midpoint); PX_OK with *x on a step below the
 * tolerance, an exact zero, or a collapsed bracket; PX_ENOCONV after
 * max_iter; PX_ENONFINITE when f or df is not finite. */
typedef int (*px_num_fdf_fn)(double x, void *user, double *f, double *df);
int px_num_root_newton(px_num_fdf_fn fdf, void *user, double lo, double hi, double x0,
                       const px_num_root_options *o, double *x, px_num_root_stats *st);

/* f(x) gives f.  From x0 (with f0 = f(x0)) tries x0 -+ step, doubling step
 * up to `reach`, each point clamped to [xmin, xmax]; the first point where
 * f changes sign gives the bracket [*a, *b] (with *fa, *fb), *a being the
 * point with the smallest |f| seen before.  PX_ENOTFOUND when no sign
 * change is found (*a, *fa: the smallest |f| seen). */
typedef int (*px_num_f_fn)(double x, void *user, double *f);
int px_num_root_search(px_num_f_fn f, void *user, double x0, double f0, double step,
                       double reach, double xmin, double xmax, double *a, double *fa,
                       double *b, double *fb, px_num_root_stats *st);

/* Illinois regula falsi (Dowell and Jarratt 1971, BIT 11:168) on [a, b]
 * with f(a) = fa, f(b) = fb of opposite signs (else PX_EINVAL).  Stops when
 * at a new point |f| <= ftol, or f returned a positive status (the point
 * passes the caller's own residual test), or the bracket before that point
 * was within the tolerance; *x is the last point evaluated (callers that
 * keep state in f rely on that).  PX_ENOCONV after max_iter iterations
 * (*x: the last point). */
int px_num_root_illinois(px_num_f_fn f, void *user, double a, double fa, double b, double fb,
                         const px_num_root_options *o, double *x, px_num_root_stats *st);

#endif
