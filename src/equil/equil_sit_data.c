/* equil_sit_data.c - a small table of specific ion interaction (SIT)
 * coefficients eps(cation, anion) at 25 C, for the common background
 * electrolytes NaCl, NaClO4 and KNO3 and the ions H+, OH- met in them.
 *
 * Every value is recalled, not read: "from memory of" the ion interaction
 * coefficient table (Appendix B) of the NEA Chemical Thermodynamics series
 * (Grenthe et al. 1992, Chemical Thermodynamics of Uranium; repeated in
 * Guillaumont et al. 2003 and later volumes), which lists eps in kg/mol with
 * the uncertainty given here.  Pairs I could not recall with confidence are
 * left out.  The caller copies the pairs it needs into a system with
 * px_equil_system_set_sit(); the solver itself never reads this table. */
#include "equil.h"
#include <string.h>

#define NEA_TDB "from memory of NEA-TDB ion interaction coefficients (Grenthe et al. 1992, Appendix B; Guillaumont et al. 2003)"

static const px_equil_sit_entry table[] = {
    /* NaCl medium */
    {"Na^+", "Cl^-", 0.03, 0.01, NEA_TDB},
    {"H^+", "Cl^-", 0.12, 0.01, NEA_TDB},
    {"Na^+", "OH^-", 0.04, 0.01, NEA_TDB},
    {"K^+", "Cl^-", 0.00, 0.01, NEA_TDB},
    {"Ca^2+", "Cl^-", 0.14, 0.01, NEA_TDB},
    {"Mg^2+", "Cl^-", 0.19, 0.02, NEA_TDB},
    /* NaClO4 medium */
    {"Na^+", "ClO4^-", 0.01, 0.01, NEA_TDB},
    {"H^+", "ClO4^-", 0.14, 0.02, NEA_TDB},
    {"Ca^2+", "ClO4^-", 0.27, 0.03, NEA_TDB},
    {"Mg^2+", "ClO4^-", 0.33, 0.03, NEA_TDB},
    /* KNO3 medium */
    {"K^+", "NO3^-", -0.11, 0.04, NEA_TDB},
    {"H^+", "NO3^-", 0.07, 0.01, NEA_TDB},
    {"K^+", "OH^-", 0.09, 0.01, NEA_TDB},
    {"Na^+", "NO3^-", -0.04, 0.03, NEA_TDB},
    /* anions often met in these media, with Na+ */
    {"Na^+", "HCO3^-", 0.00, 0.02, NEA_TDB},
    {"Na^+", "CO3^2-", -0.08, 0.03, NEA_TDB},
    {"Na^+", "SO4^2-", -0.12, 0.06, NEA_TDB},
};

const px_equil_sit_entry *px_equil_sit_table(size_t *n)
{
    if (n) *n = sizeof table / sizeof table[0];
    return table;
}

int px_equil_sit_lookup(const char *ion1, const char *ion2, double *eps)
{
    if (!ion1 || !ion2 || !eps) return PX_EINVAL;
    for (size_t k = 0; k < sizeof table / sizeof table[0]; k++) {
        if ((strcmp(table[k].ion1, ion1) == 0 && strcmp(table[k].ion2, ion2) == 0) ||
            (strcmp(table[k].ion1, ion2) == 0 && strcmp(table[k].ion2, ion1) == 0)) {
            *eps = table[k].eps;
            return PX_OK;
        }
    }
    return PX_ENOTFOUND;
}
