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

#define PX_RMAP_MAX_THREADS 64

/* Where a map's time went, for benchmarks: wall seconds of each phase on
 * the calling thread and CPU seconds of each worker thread.  Filled only
 * when px_rmap_options.profile points here; the map never depends on it. */
typedef struct px_rmap_profile {
    int threads;
    double wall_setup;  /* systems of the extra threads (serial) */
    double wall_nodes;  /* phase 1: grid nodes (parallel) */
    double wall_edges;  /* listing crossing edges and saddle cells (serial) */
    double wall_refine; /* phase 2: bisections and saddle centres (parallel) */
    double wall_merge;  /* probe table and statistics (serial) */
    double wall_trace;  /* the tracer: segments, chains, fields (serial) */
    size_t chunks;                       /* jobs of phase 1 (row chunks) */
    size_t edges, edge_jobs;             /* crossing edges and saddle centres; their jobs */
    size_t missed;                       /* points the tracer had to solve itself (0 expected) */
    double job_max_rows, job_max_edges;  /* CPU seconds of the longest job of each phase */
    double cpu[PX_RMAP_MAX_THREADS];     /* CPU seconds of each worker in both phases */
    size_t jobs[PX_RMAP_MAX_THREADS];    /* jobs each worker took */
} px_rmap_profile;

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
    int threads;              /* worker threads for nodes and bisections (default 1) */
    px_ligand_states ligands; /* ligand oxidation states kept (practice's default) */
    int allow_inhibited;      /* 1: inhibited solids may precipitate (thermo/practice.h) */
    px_rmap_profile *profile; /* NULL, or filled with the phase timings */
    /* Every allocation of the build (its work arrays, the speciation
     * systems, and the grid unless grid.alloc names another); NULL:
     * malloc/free.  With threads > 1 it is called from several threads at
     * once, so it must be thread-safe. */
    const px_allocator *alloc;
} px_rmap_options;

px_rmap_options px_rmap_options_default(void);

typedef struct px_rmap_stats {
    size_t solves, failures; /* nodes where the solver did not converge: id -1 */
    size_t cold_retries;     /* warm starts that ended over-saturated, solved again cold */
    double I_max;            /* largest ionic strength of a converged solve, mol/kg */
#define PX_RMAP_FAIL_KEEP 8
    double fail_x[PX_RMAP_FAIL_KEEP], fail_y[PX_RMAP_FAIL_KEEP]; /* first failing points */
} px_rmap_stats;

/* Field ids of the grid are database indices (-1: no convergence).  The
 * work is cut into jobs (chunks of grid rows, then the bisection of each
 * crossing edge and the centre of each saddle cell) that threads take from
 * a shared counter, one equilibrium system per thread (the core is
 * reentrant); each job starts its solver cold and keeps its own
 * statistics, so the map and the statistics are the same bytes for any
 * thread count and any run. */
int px_rmap_build(px_thermo_ws *ws, const px_db *db, const char *element, const px_rmap_options *o,
                  px_diagram_grid **out, px_rmap_stats *stats, char *msg, size_t msglen);

#endif
