/* lu.c - dense linear solve by Gaussian elimination with partial pivoting
 * (Golub and Van Loan 2013, Matrix Computations, 4th ed., alg. 3.4.1); the
 * contract is in num.h. */
#include "num/num.h"
#include "core/status.h"
#include <math.h>

int px_num_lu_solve(size_t n, double *A, double *b, size_t *perm, double pivot_rel,
                    double pivot_abs, size_t *bad_col)
{
    if (n == 0 || !A || !b || !(pivot_rel >= 0.0) || !(pivot_abs >= 0.0)) return PX_EINVAL;
    /* Non-finite entries: with the relative test on, the column scans below
     * find them (an entry that is Inf or NaN stays so under elimination,
     * which only subtracts); without it, one pass first. */
    for (size_t r = 0; r < n; r++) {
        if (!isfinite(b[r])) return PX_ENONFINITE;
        if (!(pivot_rel > 0.0))
            for (size_t c = 0; c < n; c++)
                if (!isfinite(A[r * n + c])) return PX_ENONFINITE;
    }
    if (perm)
        for (size_t r = 0; r < n; r++) perm[r] = r;
    for (size_t k = 0; k < n; k++) {
        double cmax = 0.0;
        if (pivot_rel > 0.0)
            for (size_t r = 0; r < n; r++) {
                double a = fabs(A[r * n + k]);
                if (!isfinite(a)) return PX_ENONFINITE;
                if (a > cmax) cmax = a;
            }
        size_t piv = k;
        double best = fabs(A[k * n + k]);
        for (size_t r = k + 1; r < n; r++)
            if (fabs(A[r * n + k]) > best) {
                best = fabs(A[r * n + k]);
                piv = r;
            }
        int refused = !(best > 0.0) || best < pivot_abs ||
                      (pivot_rel > 0.0 && !(best > pivot_rel * cmax));
        if (refused) {
            if (bad_col) *bad_col = k;
            return PX_ESINGULAR;
        }
        if (piv != k) {
            for (size_t c = 0; c < n; c++) {
                double t = A[k * n + c];
                A[k * n + c] = A[piv * n + c];
                A[piv * n + c] = t;
            }
            double t = b[k];
            b[k] = b[piv];
            b[piv] = t;
            if (perm) {
                size_t tp = perm[k];
                perm[k] = perm[piv];
                perm[piv] = tp;
            }
        }
        double d = A[k * n + k];
        for (size_t r = k + 1; r < n; r++) {
            double f = A[r * n + k] / d;
            if (f == 0.0) continue;
            for (size_t c = k + 1; c < n; c++) A[r * n + c] -= f * A[k * n + c];
            b[r] -= f * b[k];
        }
    }
    for (size_t k = n; k-- > 0;) {
        double v = b[k];
        for (size_t c = k + 1; c < n; c++) v -= A[k * n + c] * b[c];
        b[k] = v / A[k * n + k];
    }
    for (size_t k = 0; k < n; k++)
        if (!isfinite(b[k])) return PX_ENONFINITE;
    return PX_OK;
}
