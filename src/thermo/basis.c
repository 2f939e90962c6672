/* basis.c - solve for formation-reaction coefficients over a basis (see
 * basis.h): a small dense linear system, elements and charge as rows,
 * solved by the core's dense solver (num/num.h). */
#include "thermo/basis.h"
#include "core/status.h"
#include "num/num.h"
#include <math.h>
#include <stdio.h>
#include <string.h>

#define PX_BASIS_ROWS (PX_BASIS_MAX + 1)
#define PX_BASIS_PIVOT_EPS 1e-12    /* relative pivot below which the basis is dependent */
#define PX_BASIS_RESIDUAL_EPS 1e-9  /* max element/charge mismatch after the solve */

static int row_of(const int *zs, int nz, int z)
{
    for (int i = 0; i < nz; i++)
        if (zs[i] == z) return i;
    return -1;
}

static double count_of(const px_formula *f, int z)
{
    for (int i = 0; i < f->n_elem; i++)
        if (f->elem[i].z == z) return f->elem[i].n;
    return 0.0;
}

int px_basis_formation(const px_formula *const *basis, size_t nb, const px_formula *target,
                       double *nu, char *msg, size_t msglen)
{
    char dummy[8];
    if (!msg) {
        msg = dummy;
        msglen = sizeof dummy;
    }
    msg[0] = '\0';
    if (!basis || !target || !nu || nb == 0 || nb > PX_BASIS_MAX) {
        snprintf(msg, msglen, "invalid basis (%zu species, at most %d)", nb, PX_BASIS_MAX);
        return PX_EINVAL;
    }
    /* Rows: distinct elements of the basis, then charge. */
    int zs[PX_BASIS_ROWS];
    int nz = 0;
    for (size_t j = 0; j < nb; j++) {
        if (!basis[j]) return PX_EINVAL;
        for (int e = 0; e < basis[j]->n_elem; e++)
            if (row_of(zs, nz, basis[j]->elem[e].z) < 0) {
                if (nz >= PX_BASIS_MAX) return PX_EINVAL;
                zs[nz++] = basis[j]->elem[e].z;
            }
    }
    for (int e = 0; e < target->n_elem; e++)
        if (row_of(zs, nz, target->elem[e].z) < 0) {
            snprintf(msg, msglen, "%s has an element (Z=%d) that no basis species has",
                     target->text, target->elem[e].z);
            return PX_EINVAL;
        }
    int nrow = nz + 1;
    if ((size_t)nrow != nb) {
        snprintf(msg, msglen, "basis of %zu species for %d elements and charge: need %d", nb, nz,
                 nrow);
        return PX_ESINGULAR;
    }
    double a[PX_BASIS_ROWS * PX_BASIS_ROWS], x[PX_BASIS_ROWS];
    for (int r = 0; r < nrow; r++) {
        for (size_t j = 0; j < nb; j++)
            a[r * nrow + (int)j] = r < nz ? count_of(basis[j], zs[r]) : (double)basis[j]->charge;
        x[r] = r < nz ? count_of(target, zs[r]) : (double)target->charge;
    }
    int n = nrow;
    size_t bad = 0;
    int st = px_num_lu_solve((size_t)n, a, x, NULL, 0.0, PX_BASIS_PIVOT_EPS, &bad);
    if (st == PX_ESINGULAR) {
        snprintf(msg, msglen, "basis species are not independent (%s)", basis[bad]->text);
        return PX_ESINGULAR;
    }
    if (st != PX_OK && st != PX_ENONFINITE) return st;
    for (int j = 0; j < n; j++) {
        nu[j] = x[j];
        if (fabs(nu[j]) < PX_BASIS_RESIDUAL_EPS) nu[j] = 0.0; /* no -0 or 1e-17 noise */
        if (!isfinite(nu[j])) return PX_ENONFINITE;
    }
    /* Verify the balance (guards against an ill-conditioned basis). */
    for (int r = 0; r < nrow; r++) {
        double s = 0.0, want = r < nz ? count_of(target, zs[r]) : (double)target->charge;
        for (size_t j = 0; j < nb; j++)
            s += nu[j] * (r < nz ? count_of(basis[j], zs[r]) : (double)basis[j]->charge);
        if (fabs(s - want) > PX_BASIS_RESIDUAL_EPS) {
            snprintf(msg, msglen, "%s does not balance over the basis", target->text);
            return PX_ESINGULAR;
        }
    }
    return PX_OK;
}
