/* equil.h - the speciation solver: a generic equilibrium system in the
 * basis-species formulation and a damped Newton-Raphson solver for it.
 *
 * The solver knows nothing of formulas, files or temperatures: the caller
 * builds a system from its species database.  A system has n basis
 * components (one basis species each: H2O, H+, e-, Ca^2+, HCO3^-, ...) and m
 * species; species 0..n-1 ARE the basis species, in component order.  Every
 * species j carries the formation reaction from the basis species
 *     sum_i nu[j][i] B_i = S_j,     log10 K_j  (at the caller's T, P),
 * its charge, phase and ion-size parameter (Angstrom, for B-dot).  One
 * constraint per component closes the system: a total (mol/kg of water), a
 * fixed log10 activity (pH, pe, a(Cl-)), a fixed gas fugacity, or charge
 * balance; the water component has no balance (1 kg of water).
 *
 * Lifecycle (GSL / KINSOL-like):
 *   px_equil_system_create  -> set species, constraints, activity model
 *   px_equil_work_create    -> caller-owned workspace (solution + scratch)
 *   px_equil_solve          -> status; warm-started from the last solution
 *   px_equil_work_get_*     -> results, statistics, failure detail
 *   px_equil_work_free, px_equil_system_free   (free(NULL) is a no-op)
 *
 * Numerical code: returns status codes from core/status.h, never prints,
 * keeps no global state (a system may be shared read-only by several
 * threads, each with its own workspace), never hands out a NaN.
 * Method and equations: docs/solver.md. */
#ifndef PX_EQUIL_H
#define PX_EQUIL_H
#include <stddef.h>
#include "core/alloc.h"
#include "core/status.h"

/* Phase of a species. */
typedef enum px_equil_phase {
    PX_EQUIL_AQ = 0,    /* aqueous solute (molal standard state) */
    PX_EQUIL_SOLID,     /* pure solid: may precipitate (saturation index) */
    PX_EQUIL_GAS,       /* ideal gas: log10 fugacity follows from mass action */
    PX_EQUIL_WATER,     /* H2O(l), the solvent (at most one, a basis species) */
    PX_EQUIL_ELECTRON   /* e-, the redox basis (activity only, log a = -pe) */
} px_equil_phase;

/* Species flags (bit set). */
#define PX_EQUIL_EXCLUDED 1u   /* left out of the system entirely */
#define PX_EQUIL_SUPPRESSED 2u /* solid: saturation index reported, never precipitates */

/* Log10 of a quantity that is exactly zero (an excluded species, or one whose
 * component has a zero total): reported instead of -inf so outputs stay finite. */
#define PX_EQUIL_LOG_ABSENT (-999.0)

/* One species as the caller describes it (copied by set_species). */
typedef struct px_equil_species {
    const double *nu; /* n_basis formation coefficients; NULL for a basis species */
    double log_k;     /* log10 K of formation at T, P; 0 for a basis species */
    double charge;    /* in elementary charges */
    px_equil_phase phase;
    double size;      /* ion-size parameter a (Angstrom) for B-dot; 0 if unknown */
    unsigned flags;   /* PX_EQUIL_EXCLUDED | PX_EQUIL_SUPPRESSED */
} px_equil_species;

/* Activity-coefficient models for aqueous species. */
typedef enum px_equil_model {
    PX_EQUIL_IDEAL = 0, /* gamma = 1 */
    PX_EQUIL_DAVIES,    /* Davies 1962 */
    PX_EQUIL_BDOT,      /* extended Debye-Hueckel with B-dot, Helgeson 1969 */
    PX_EQUIL_SIT        /* specific ion interaction theory (Brønsted-Guggenheim-Scatchard) */
} px_equil_model;

/* Neutral aqueous species. */
typedef enum px_equil_neutral {
    PX_EQUIL_NEUTRAL_UNITY = 0, /* log gamma = 0 */
    PX_EQUIL_NEUTRAL_SALTING    /* log gamma = b_neutral * I (common practice, no source) */
} px_equil_neutral;

/* Water activity. */
typedef enum px_equil_water {
    PX_EQUIL_WATER_UNITY = 0, /* a_w = 1 */
    PX_EQUIL_WATER_IDEAL      /* ln a_w = -M_w sum m_solutes (osmotic coefficient 1) */
} px_equil_water;

typedef struct px_equil_activity {
    px_equil_model model;
    double A;      /* Debye-Hueckel A, kg^0.5 mol^-0.5 (log10 scale), at T */
    double B;      /* Debye-Hueckel B, kg^0.5 mol^-0.5 per Angstrom, at T (B-dot only) */
    double bdot;   /* B-dot, kg/mol, at T (B-dot only) */
    px_equil_neutral neutral;
    double b_neutral; /* kg/mol, for PX_EQUIL_NEUTRAL_SALTING */
    px_equil_water water;
} px_equil_activity;

/* Ideal solution, unit water activity (valid input for any caller). */
px_equil_activity px_equil_activity_default(void);

/* Davies 1962 (Ion Association, Butterworths; from memory): log10 gamma =
 * -A z^2 f(I) with f(I) = sqrt(I)/(1+sqrt(I)) - 0.3 I.  The one home of the
 * equation (equil_activity.c); the solver and the exact maps both use it. */
double px_equil_davies_factor(double I);
/* log10 gamma of charge z at ionic strength I (mol/kg) with the Debye-Hueckel
 * A (log10 basis) at T; 0 for I <= 0. */
double px_equil_davies_log_gamma(double A, int z, double I);

/* Solver options. */
typedef struct px_equil_options {
    double epsabs;   /* absolute tolerance of balances, mol/kg (>= 0) */
    double epsrel;   /* relative tolerance of balances; also the absolute one, in
                        log10 units, of activity, fugacity and saturation equations */
    size_t max_iter; /* Newton iterations per active set */
    double max_step; /* largest change of a log10 unknown in one step (> 0) */
    double si_tol;   /* a solid enters when its saturation index exceeds this */
    int warm;        /* 1: start from the workspace's last solution if it has one */
} px_equil_options;

px_equil_options px_equil_options_default(void);

typedef struct px_equil_system px_equil_system;
typedef struct px_equil_work px_equil_work;

/* --- system ----------------------------------------------------------- */
int px_equil_system_create(px_equil_system **sys, size_t n_basis, size_t n_species,
                           const px_allocator *alloc);
void px_equil_system_free(px_equil_system *sys);
size_t px_equil_system_n_basis(const px_equil_system *sys);
size_t px_equil_system_n_species(const px_equil_system *sys);

/* j < n_basis: a basis species (nu must be NULL or the unit row, log_k 0). */
int px_equil_system_set_species(px_equil_system *sys, size_t j, const px_equil_species *sp);
int px_equil_system_set_log_k(px_equil_system *sys, size_t j, double log_k);
int px_equil_system_set_flags(px_equil_system *sys, size_t j, unsigned flags);

/* Constraints, one per component i (the last call for i wins). */
int px_equil_system_set_total(px_equil_system *sys, size_t i, double total);
int px_equil_system_set_log_activity(px_equil_system *sys, size_t i, double log_a);
/* Fixed pH: log a(H+) = -pH on component i.  Fixed pe: log a(e-) = -pe. */
int px_equil_system_set_ph(px_equil_system *sys, size_t i, double ph);
int px_equil_system_set_pe(px_equil_system *sys, size_t i, double pe);
/* Fixed E (V vs SHE) at T (K) on the electron component: pe = F E / (R T ln 10). */
int px_equil_system_set_eh(px_equil_system *sys, size_t i, double eh, double T);
/* Fixed log10 fugacity of gas species g, replacing the balance of component i
 * (nu[g][i] must be non-zero). */
int px_equil_system_set_fugacity(px_equil_system *sys, size_t i, size_t g, double log_f);
/* Charge balance replaces the balance of component i (typically H+). */
int px_equil_system_set_charge_balance(px_equil_system *sys, size_t i);

int px_equil_system_set_activity(px_equil_system *sys, const px_equil_activity *act);
/* SIT interaction coefficient eps(j,k) = eps(k,j), kg/mol, between species. */
int px_equil_system_set_sit(px_equil_system *sys, size_t j, size_t k, double eps);

/* --- SIT data (src/equil/equil_sit_data.c) ------------------------------ */
typedef struct px_equil_sit_entry {
    const char *ion1, *ion2; /* ASCII notation, cation first: "Na^+", "Cl^-" */
    double eps;              /* kg/mol at 25 C */
    double unc;              /* the source's +- */
    const char *source;
} px_equil_sit_entry;
/* The built-in table (count in *n).  Never NULL. */
const px_equil_sit_entry *px_equil_sit_table(size_t *n);
/* Look a pair up in either order: PX_OK or PX_ENOTFOUND. */
int px_equil_sit_lookup(const char *ion1, const char *ion2, double *eps);

/* --- workspace and solve ---------------------------------------------- */
int px_equil_work_create(px_equil_work **w, const px_equil_system *sys,
                         const px_allocator *alloc);
void px_equil_work_free(px_equil_work *w);
/* Forget the last solution: the next solve is a cold start. */
void px_equil_work_reset(px_equil_work *w);
/* Copy the solution a warm start goes on from (and the sweep predictor's
 * history, the last statistics) from src to dst, two workspaces of the
 * same system; PX_EINVAL when their sizes differ. */
int px_equil_work_copy_state(px_equil_work *dst, const px_equil_work *src);

/* PX_OK, or PX_ENOCONV (the workspace keeps which balance did not close and
 * the last residuals), PX_ESINGULAR, PX_EINVAL (incomplete or invalid
 * system), PX_ENONFINITE, PX_ERANGE.  opt may be NULL (defaults). */
int px_equil_solve(const px_equil_system *sys, px_equil_work *w,
                   const px_equil_options *opt);

typedef struct px_equil_species_result {
    double molality;     /* mol/kg (aqueous); 0 for other phases */
    double log_molality; /* PX_EQUIL_LOG_ABSENT if zero */
    double log_gamma;    /* log10 activity coefficient (aqueous); 0 otherwise */
    double log_activity; /* log10 activity; log10 fugacity for a gas; for a
                            solid, its saturation index (0 when present) */
    double si;           /* saturation index (solids), else 0 */
    double amount;       /* mol per kg of water (precipitated solids), else 0 */
} px_equil_species_result;

typedef struct px_equil_component_result {
    double total_given;  /* the constraint's total (0 if not a total) */
    double total_aq;     /* sum of nu * m over aqueous species */
    double total_solid;  /* sum of nu * n over precipitated solids */
    double residual;     /* last scaled residual of this component's equation */
    int kind;            /* the constraint kind (PX_EQUIL_C_*) */
} px_equil_component_result;

/* Constraint kinds (px_equil_component_result.kind, stats.fail_kind). */
enum {
    PX_EQUIL_C_NONE = 0, PX_EQUIL_C_TOTAL, PX_EQUIL_C_ACTIVITY,
    PX_EQUIL_C_FUGACITY, PX_EQUIL_C_CHARGE, PX_EQUIL_C_WATER,
    PX_EQUIL_C_IONIC, /* the ionic-strength equation */
    PX_EQUIL_C_SOLID, /* a solid's saturation equation */
    PX_EQUIL_C_ACTIVE_SET /* solids kept entering and leaving */
};

typedef struct px_equil_stats {
    int status;            /* of the last solve */
    size_t iterations;     /* Newton iterations, all active sets and restarts */
    size_t active_set_changes;
    size_t restarts;       /* cold restarts after a failed warm start */
    double residual_norm;  /* max scaled residual at the end */
    double ionic_strength; /* mol/kg */
    double charge_imbalance; /* sum z m, eq/kg */
    double charge_scale;   /* sum |z| m, eq/kg */
    double log_aw;         /* log10 water activity */
    size_t n_solids;       /* precipitated solids */
    /* on failure: the equation that did not close */
    int fail_kind;         /* PX_EQUIL_C_* (0 if none) */
    size_t fail_index;     /* component i, or species j for a solid */
} px_equil_stats;

int px_equil_work_get_stats(const px_equil_work *w, px_equil_stats *st);
int px_equil_work_get_species(const px_equil_work *w, size_t j, px_equil_species_result *r);
int px_equil_work_get_component(const px_equil_work *w, size_t i,
                                px_equil_component_result *r);

#endif
