/* practice.h - the chemistry that practice keeps out of an equilibrium
 * calculation on purpose, in one place for every entry point (exact maps,
 * rigorous maps, curves, speciation):
 *
 *   - ligand oxidation states: nitrogen stays ammonia/ammonium and carbon
 *     stays carbonate unless the user allows full redox for that ligand
 *     (docs/solver.md "What practice keeps out");
 *   - kinetically inhibited solids: phases that do not precipitate at low
 *     temperature on the time scale of a plant or a laboratory (dolomite,
 *     magnesite, quartz), kept out of precipitation, never out of the
 *     saturation indices.
 *
 * The rule for a species: with H at +1, O at -2 and every pinned ligand at
 * its kept oxidation state, the oxidation state left for the remaining
 * elements must be one they take in their own species (made of the element,
 * H and O only) in the database; with several remaining elements, their sum
 * must lie in the range those states allow.  A species made of pinned
 * ligands only must balance exactly. */
#ifndef PX_PRACTICE_H
#define PX_PRACTICE_H
#include "thermo/thermo.h"
#include <stddef.h>

#define PX_LIGAND_RULES_MAX 8

typedef struct px_ligand_rule {
    int z;            /* the ligand element */
    int full;         /* 1: full redox equilibrium (every oxidation state) */
    double ox;        /* the kept oxidation state when !full */
    const char *form; /* its name, e.g. "ammonia/ammonium" (static string) */
} px_ligand_rule;

typedef struct px_ligand_states {
    size_t n;
    px_ligand_rule rule[PX_LIGAND_RULES_MAX];
} px_ligand_states;

/* Practice's defaults: N kept as ammonia/ammonium (-3), C as carbonate
 * (+4), S in full redox (sulfide to sulfate). */
px_ligand_states px_ligand_states_default(void);
/* Set one ligand: setting "full", "kept" (practice's form) or a form name
 * ("ammonia", "nitrate", "carbonate", "sulfate", "sulfide").  PX_EINVAL
 * for an element or setting not known; msg names it. */
int px_ligand_states_set(px_ligand_states *ls, const char *element, const char *setting, char *msg,
                         size_t msglen);
/* 1 if species f is allowed under ls; elements equal to skip_z (a map's own
 * element, 0 for none) are never pinned. */
int px_ligand_allows(const px_ligand_states *ls, const px_db *db, const px_formula *f, int skip_z);
/* One line naming the rules of the elements z[0..nz-1] that have one, e.g.
 * "N as ammonia/ammonium only (-3); S full redox".  Empty if none. */
void px_ligand_states_describe(const px_ligand_states *ls, const int *z, size_t nz, int skip_z, char *buf,
                               size_t n);

/* Kinetically inhibited solids (cited list in practice.c). */
typedef struct px_inhibited_solid {
    const char *mineral; /* the form name in a formula, e.g. "dolomite" */
    double T_max;        /* K: inhibited below this temperature */
    const char *source;
} px_inhibited_solid;
const px_inhibited_solid *px_inhibited_solids(size_t *n);
/* The entry that keeps solid f from precipitating at T, or NULL. */
const px_inhibited_solid *px_inhibited_at(const px_formula *f, double T);

#endif
