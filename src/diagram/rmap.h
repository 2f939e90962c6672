/* rmap.h - rigorous predominance maps: the full speciation solver at every
 * node of a pH-E grid (mass balance of the element and of a ligand,
 * activity coefficients, solids), boundaries traced between nodes and
 * refined by bisection (px_diagram_grid_map).  A node is marked by the
 * stable solid of the element where one precipitates (the one holding most
 * of the element), else by the aqueous species with the largest share of
 * the element. */
#ifndef PX_RMAP_H
#define PX_RMAP_H
#include "diagram/diagram.h"
#include "equil/speciate.h"

typedef struct px_rmap_options {
    double T, P;
    px_diagram_window window; /* pH, E (V vs SHE) */
    px_diagram_grid_options grid;
    double total;             /* mol/kg of the element */
    const char *ligand;       /* or NULL */
    double ligand_total;      /* mol/kg */
    px_equil_model model;     /* activity model (Davies by default) */
    double background_na_cl;  /* mol/kg of NaCl background electrolyte (0: none) */
    const char *const *exclude;
    size_t n_exclude;
    int threads;              /* worker threads for the grid nodes (default 1) */
    px_ligand_states ligands; /* ligand oxidation states kept (practice's default) */
    int allow_inhibited;      /* 1: inhibited solids may precipitate (thermo/practice.h) */
} px_rmap_options;

px_rmap_options px_rmap_options_default(void);

typedef struct px_rmap_stats {
    size_t solves, failures; /* nodes where the solver did not converge: id -1 */
    size_t cold_retries;     /* warm starts that ended over-saturated, solved again cold */
    double I_max;            /* largest ionic strength of a converged solve, mol/kg */
#define PX_RMAP_FAIL_KEEP 8
    double fail_x[PX_RMAP_FAIL_KEEP], fail_y[PX_RMAP_FAIL_KEEP]; /* first failing points */
} px_rmap_stats;

#define PX_RMAP_MAX_THREADS 64

/* Field ids of the grid are database indices (-1: no convergence).  With
 * threads > 1 the grid nodes are solved in bands of rows, one equilibrium
 * system per thread (the core is reentrant); boundary refinement then runs
 * on the calling thread.  The result does not depend on the thread count
 * except through warm-start paths (same labels; crossing points agree to
 * the bisection tolerance). */
int px_rmap_build(px_thermo_ws *ws, const px_db *db, const char *element, const px_rmap_options *o,
                  px_diagram_grid **out, px_rmap_stats *stats, char *msg, size_t msglen);

#endif
