/* species.h - the species record and the species database shared by the
 * thermodynamic core, the definition-file loader and the solvers.
 *
 * Internal units (DESIGN.md): K, bar, J/mol, J/(mol K), mol/kg.  Every unit
 * conversion from a definition file (kJ, cal, the HKF papers' printed
 * scaling) happens once, in the loader, before a record reaches this struct.
 *
 * Gibbs energies at T and P are apparent Gibbs energies of formation
 * (Benson-Helgeson convention): dGf at 298.15 K, 1 bar plus the species' own
 * G(T,P) - G(298.15 K, 1 bar). */
#ifndef PX_SPECIES_H
#define PX_SPECIES_H
#include <stddef.h>

#define PX_FORMULA_MAX_ELEM 10 /* distinct elements in one formula */
#define PX_NAME_MAX 64         /* bytes of a formula as written, with NUL */
#define PX_ELEMENT_MAX 118     /* highest atomic number known */

typedef enum px_state {
    PX_STATE_AQ = 0, /* aqueous (hypothetical 1 molal standard state) */
    PX_STATE_S,      /* pure solid; px_formula.form says cr, am or a mineral */
    PX_STATE_L,      /* pure liquid */
    PX_STATE_G,      /* ideal gas at 1 bar */
    PX_STATE_E       /* the electron, e- (no state symbol) */
} px_state;

typedef struct px_elem_count {
    int z;    /* atomic number, 1..PX_ELEMENT_MAX */
    double n; /* atoms per formula unit (hydrates may be fractional) */
} px_elem_count;

typedef struct px_formula {
    char text[PX_NAME_MAX]; /* canonical text, e.g. "Fe(OH)3(s)", "Zn^2+" */
    int n_elem;
    px_elem_count elem[PX_FORMULA_MAX_ELEM]; /* sorted by z */
    int charge;
    px_state state;
    char form[24]; /* "", "cr", "am" or a mineral name ("calcite") */
} px_formula;

typedef enum px_model {
    PX_MODEL_HKF = 0, /* revised HKF (Tanger and Helgeson 1988) */
    PX_MODEL_CP,      /* heat-capacity polynomial, integrated exactly */
    PX_MODEL_LOGK,    /* defined by a formation reaction and its log K(T) */
    PX_MODEL_WATER    /* H2O(l) from IAPWS-95 (built in) */
} px_model;

typedef struct px_hkf_params { /* SI: the papers' values x PX_CAL, unscaled */
    double a1; /* J/(mol bar) */
    double a2; /* J/mol */
    double a3; /* J K/(mol bar) */
    double a4; /* J K/mol */
    double c1; /* J/(mol K) */
    double c2; /* J K/mol */
    double omega; /* J/mol, conventional Born coefficient at Tr, Pr */
} px_hkf_params;

/* Where a Cp polynomial comes from when it is not a published fit. */
typedef enum px_cp_estimate {
    PX_CP_EST_NONE = 0, /* a published Cp function (or none: Cp = 0) */
    PX_CP_EST_KOPP      /* Kopp-Neumann additivity (px_cp_kopp) */
} px_cp_estimate;

/* Cp = a + b T + c / T^2 + d / sqrt(T) + e T^2  [J/(mol K)], valid to Tmax. */
typedef struct px_cp_params {
    double a, b, c, d, e;
    double V; /* molar volume, J/bar (= 0.1 x cm3/mol); 0 if unknown */
    px_cp_estimate estimate;
} px_cp_params;

/* How log K of a formation reaction depends on T when no measured function
 * is given (docs/thermo.md, "Temperature estimates"). */
typedef enum px_logk_estimate {
    PX_LOGK_EST_NONE = 0,    /* measured dH or logK_T, or else held at 25 C */
    PX_LOGK_EST_ISOCOULOMBIC /* one-term isocoulombic extrapolation (Gu et al. 1994),
                                with a model reaction when px_logk_params.model is set */
} px_logk_estimate;

/* Where a constant reaction heat capacity px_logk_params.dCp comes from. */
typedef enum px_logk_cp_estimate {
    PX_LOGK_CP_EST_NONE = 0,     /* published (or no dCp: 0) */
    PX_LOGK_CP_EST_CRISS_COBBLE, /* ionic heat capacities by the correspondence principle
                                    (Criss and Cobble 1964) */
    PX_LOGK_CP_EST_ISOCOULOMBIC  /* no constant dCp: dCp(T) of the model reaction
                                    px_logk_params.model, R - M isocoulombic with
                                    dCp(R - M) = 0 (model substance, Lindsay 1980) */
} px_logk_cp_estimate;

/* log K of the formation reaction (the species is the reaction's product):
 *   analytic: log K = k[0] + k[1] T + k[2]/T + k[3] log10 T + k[4]/T^2
 *   otherwise: van 't Hoff from logK25 and dH (J/mol), constant dH, or with
 *   dCp != 0 Kirchhoff with constant dCp (J/(mol K)) from logK25, dH at Tr;
 *   estimate = ISOCOULOMBIC (no dH, not analytic): px_isocoulombic_logK, on
 *   the reaction minus the model reaction when model is not empty;
 *   cp_estimate = ISOCOULOMBIC (with dH, dCp 0): logK25 and dH at Tr, and
 *   the reaction's dCp(T) that of the model reaction (docs/thermo.md). */
typedef struct px_logk_params {
    char reaction[256]; /* e.g. "Zn^2+ + Cl^- = ZnCl^+" */
    double logK25;
    double dH; /* J/mol; NAN if unknown (then log K is held constant) */
    double dCp; /* J/(mol K), constant dCp of the reaction with dH; 0 if not given */
    px_logk_cp_estimate cp_estimate; /* how dCp was obtained */
    int analytic;
    double k[5];
    px_logk_estimate estimate;
    char model[256]; /* isocoulombic model reaction with measured data, "" if none
                        (estimate = ISOCOULOMBIC or cp_estimate = ISOCOULOMBIC) */
} px_logk_params;

/* Where a species' temperature dependence comes from (px_species_tbasis). */
typedef enum px_tbasis {
    PX_TBASIS_MEASURED = 0, /* published data: HKF set, Cp function, dH, log K(T) */
    PX_TBASIS_ESTIMATED,    /* a named estimation method (px_species.tmethod) */
    PX_TBASIS_HELD,         /* log K with no temperature data: held at 25 C */
    PX_TBASIS_NO_CP         /* solid/liquid/gas without Cp: Cp taken as 0 */
} px_tbasis;

/* Published uncertainties (the source's +-), internal units; NAN where the
 * file gives none.  Kept for propagating boundary uncertainties. */
typedef struct px_uncertainty {
    double G, H; /* J/mol */
    double S;    /* J/(mol K) */
    double logK; /* log10 units, of the logk reaction as written */
} px_uncertainty;

typedef struct px_species {
    px_formula f;
    px_model model;
    double dGf; /* J/mol at Tr, Pr (NAN if the model derives it) */
    double dHf; /* J/mol (NAN if unknown) */
    double S;   /* J/(mol K), third-law or conventional for ions (NAN if unknown) */
    px_hkf_params hkf;
    px_cp_params cp;
    px_logk_params logk;
    px_uncertainty unc; /* +- of G, H, S, log K; NAN if not given */
    double Tmin, Tmax; /* declared valid range, K */
    int estimated;     /* HKF parameters from correlations, not regressed */
    px_tbasis tbasis;  /* set by px_db_add from the fields above (px_species_tbasis) */
    char tmethod[64];  /* the estimation method's name when tbasis is ESTIMATED, else "" */
    char quality[16];  /* "high", "medium", "low" or "" */
    char *source;      /* owned, never NULL once loaded */
    char *file;        /* definition file (owned), NULL for built-ins */
    int line;          /* line in that file, 0 if unknown */
} px_species;

#endif
