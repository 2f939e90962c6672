/* speciate.h - speciation of a water from the species database: builds the
 * generic equilibrium system of equil.h (basis H2O(l), H^+, e- and one
 * aqueous basis species per element), evaluates every log K at (T, P),
 * applies the user's constraints and solves.
 *
 * Redox: with a fixed E, pe or redox-gas fugacity every species takes part;
 * without one, species whose formation from the basis needs electrons are
 * left out, so each element stays in the oxidation state of its basis
 * species (documented in docs/solver.md). */
#ifndef PX_SPECIATE_H
#define PX_SPECIATE_H
#include "equil/equil.h"
#include "thermo/thermo.h"
#include "thermo/practice.h"

typedef enum { PX_SPEC_PH_CHARGE = 0, PX_SPEC_PH_FIXED } px_spec_ph;
typedef enum { PX_SPEC_REDOX_NONE = 0, PX_SPEC_REDOX_E, PX_SPEC_REDOX_PE, PX_SPEC_REDOX_GAS } px_spec_redox;

#define PX_SPEC_MAX_ITEMS 32

/* The basis of every px_spec system, in this order (component index and
 * system species index alike): H2O(l), H^+, e-, then one basis species per
 * element in the order of the options' totals. */
enum { PX_SPEC_BASIS_WATER = 0, PX_SPEC_BASIS_H = 1, PX_SPEC_BASIS_E = 2, PX_SPEC_BASIS_ELEMENTS = 3 };

typedef struct px_spec_options {
    double T, P;                    /* K, bar */
    size_t n_totals;
    const char *element[PX_SPEC_MAX_ITEMS]; /* element symbols */
    double total[PX_SPEC_MAX_ITEMS];        /* mol/kg */
    const char *basis[PX_SPEC_MAX_ITEMS];    /* optional basis species per element (NULL: chosen) */
    px_spec_ph ph_mode;
    double pH;
    px_spec_redox redox_mode;
    double E, pe;                   /* V vs SHE; pe */
    const char *redox_gas;          /* "O2(g)" or "H2(g)" with redox_log_f */
    double redox_log_f;
    size_t n_gases;                 /* fixed gas fugacities replacing an element's balance */
    const char *gas[PX_SPEC_MAX_ITEMS];
    double gas_log_f[PX_SPEC_MAX_ITEMS];
    size_t n_fixed;                 /* fixed activities of basis species (replacing a balance) */
    const char *fixed[PX_SPEC_MAX_ITEMS];
    double fixed_log_a[PX_SPEC_MAX_ITEMS];
    int solids;                     /* 1: solids may precipitate; 0: all suppressed */
    size_t n_suppress, n_exclude;
    const char *suppress[PX_SPEC_MAX_ITEMS]; /* solids never precipitated (metastable) */
    const char *exclude[PX_SPEC_MAX_ITEMS];  /* species left out entirely */
    px_equil_model model;           /* activity model (A, B, B-dot from T) */
    px_ligand_states ligands;       /* ligand oxidation states kept (thermo/practice.h) */
    int allow_inhibited;            /* 1: inhibited solids (practice.h) may precipitate */
    px_equil_options solver;
    const px_allocator *alloc;      /* every allocation of the px_spec (NULL: malloc/free) */
} px_spec_options;

px_spec_options px_spec_options_default(void);

/* One speciation problem: the system, its workspace and the db index of
 * every system species (caller frees with px_spec_free). */
typedef struct px_spec {
    px_equil_system *sys;
    px_equil_work *work;
    size_t n_species, n_basis;
    long *db_index;   /* system species -> db index */
    double *nu;       /* n_species x n_basis formation coefficients */
    int *elem_z;      /* component i -> element (0 for H2O, H+, e-) */
    int redox;        /* electrons take part */
    double T;         /* K, of the last px_spec_build or px_spec_set_TP */
    size_t sit_pairs, sit_missing; /* SIT: cation-anion pairs with an eps, and without (eps 0) */
    const px_allocator *alloc;     /* the options' allocator, for px_spec_free */
    char error[512];
} px_spec;

/* Build the system at (T, P).  Errors (PX_ENOTFOUND, PX_EINVAL, ...) leave a
 * message naming the element, species or constraint in msg. */
int px_spec_build(px_thermo_ws *ws, const px_db *db, const px_spec_options *o, px_spec **out,
                  char *msg, size_t msglen);
/* Re-evaluate every log K and the activity parameters at a new (T, P),
 * keeping the last solution as a warm start. */
int px_spec_set_TP(px_spec *s, px_thermo_ws *ws, const px_db *db, double T, double P, px_equil_model model,
                   char *msg, size_t msglen);
int px_spec_solve(px_spec *s, const px_equil_options *opt, char *msg, size_t msglen);
/* Change one constraint of a built system, keeping its last solution as a
 * warm start (solve with opt.warm = 1): the fixed pH (PX_EINVAL when the
 * system balances charge instead), the total of element k of the options'
 * totals, or the fixed log10 activity of basis species `species`
 * (PX_EINVAL when it is not a fixed basis species of the system). */
int px_spec_set_pH(px_spec *s, double pH);
int px_spec_set_total(px_spec *s, size_t k, double total);
int px_spec_set_fixed(px_spec *s, const px_db *db, const char *species, double log_a);
void px_spec_free(px_spec *s); /* NULL ok */

/* Results of a solved problem, read without knowing the basis layout. */
/* pH = -log10 a(H^+). */
double px_spec_pH(const px_spec *s);
/* pe = -log10 a(e-) and E = pe RT ln10 / F (V vs SHE, at s->T).  PX_EINVAL
 * if electrons take no part (s->redox == 0). */
int px_spec_redox_state(const px_spec *s, double *pe, double *E);
/* The elements of the problem (the options' totals), k = 0 .. n-1. */
size_t px_spec_n_elements(const px_spec *s);
typedef struct px_spec_element_result {
    int z;                  /* atomic number */
    double total;           /* dissolved + solid, mol/kg */
    double dissolved, solid; /* mol/kg */
} px_spec_element_result;
int px_spec_element(const px_spec *s, size_t k, px_spec_element_result *out);
/* Share of element k's total held by system species j: nu m / total (or
 * nu n / total for a precipitated solid); NAN if the species holds none of
 * the element, has no amount, or the total is not positive. */
double px_spec_element_share(const px_spec *s, size_t k, size_t j);

/* Helgeson 1969 B-dot (kg/mol) for NaCl-dominated solutions at T (K),
 * interpolated in his table; NAN outside 0-300 C. */
double px_spec_bdot(double T);
/* Ion-size parameter (Angstrom) used for B-dot by charge (common practice,
 * no source: 4 A for |z| = 1, 5 for 2, 6 for 3, 7 beyond; 0 for neutral). */
double px_spec_ion_size(int charge);

#endif
