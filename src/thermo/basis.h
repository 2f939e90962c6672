/* basis.h - formation reactions from a set of basis species.
 *
 * Every species can be written as a linear combination of basis species
 * (e.g. H2O(l), H^+, e-, Zn^2+, Cl^-): the coefficients balance each element
 * and the charge.  The speciation solver and the predominance maps both work
 * with these formation reactions; switching the basis (Zn^2+ -> Zn(s), or
 * HS^- -> SO4^2- inside another ligand field) is a new solve. */
#ifndef PX_BASIS_H
#define PX_BASIS_H
#include "thermo/species.h"
#include <stddef.h>

#define PX_BASIS_MAX 32 /* basis species in one system */

/* Coefficients nu[0..nb-1] with  target = sum_i nu[i] basis[i]  (elements
 * and charge balanced).  The basis must span its own elements and charge
 * exactly once: as many basis species as distinct elements + 1 (charge),
 * linearly independent.  Errors: PX_EINVAL (bad arguments, or the target has
 * an element no basis species has: the message names it), PX_ESINGULAR (the
 * basis is not independent or not square; the message says which).  msg may
 * be NULL. */
int px_basis_formation(const px_formula *const *basis, size_t nb, const px_formula *target,
                       double *nu, char *msg, size_t msglen);

#endif
