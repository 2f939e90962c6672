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

/* Terms of the HKF G shared by every species at one (T, P). */
typedef struct px__hkf_common {
    double T, dT, c1f, dP, lnP, invTt, c2H, c2S, inv, invr, Yr;
    px_hkf_gfun g, gr;
    int ok;
} px__hkf_common;
void px__hkf_common_init(const px_water_state *w, const px_water_state *wr,
                         const px_hkf_gfun *g, const px_hkf_gfun *gr, px__hkf_common *c);
int px__hkf_G_common(const px_hkf_params *p, int charge, double dGf, double S,
                     const px__hkf_common *c, double *G);

#endif
