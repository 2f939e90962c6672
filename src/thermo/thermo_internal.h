/* thermo_internal.h - declarations shared by the files of src/thermo/ only
 * (not part of the public interface). */
#ifndef PX_THERMO_INTERNAL_H
#define PX_THERMO_INTERNAL_H
#include <stddef.h>

#include "thermo/thermo.h"

/* Parse one formula at the start of text; *used = characters consumed. */
int px__formula_parse_prefix(const char *text, px_formula *out, size_t *used, char *msg,
                             size_t msgsize);

/* Generation counter of db (changes on every modification). */
unsigned long px__db_generation(const px_db *db);
/* Index of sp inside db's array, -1 if sp is not one of db's records. */
long px__db_index_of(const px_db *db, const px_species *sp);

/* HKF G with the g-function at T,P and at Tr,Pr precomputed (hot path). */
int px__hkf_G_fast(const px_hkf_params *p, int charge, double dGf, double S,
                   const px_water_state *w, const px_water_state *wr, const px_hkf_gfun *g,
                   const px_hkf_gfun *gr, double *G);

#endif
