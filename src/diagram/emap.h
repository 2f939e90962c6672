/* emap.h - element maps: the chemistry side of the exact predominance map.
 *
 * For a primary element M (and optionally one ligand element L at a fixed
 * total activity), every species of M in the database is written as a
 * formation reaction from the basis {H2O(l), H^+, e-, M_ref, L_k} and reduced
 * to its transformed Gibbs energy per atom of M,
 *   Phi_j = [dG_j + RT ln a_j + nH RT ln10 pH + ne F E - nL RT ln a_L] / nM
 * (DESIGN.md "Predominance maps: the exact method"), an affine function of
 * the axes (pH, E or log a(L)).  With a ligand, L's own predominance map is
 * drawn first on the same axes; M is then mapped inside each ligand field
 * with that field's ligand species L_k in the basis, and the pieces joined
 * (px_diagram_map_nested). */
#ifndef PX_EMAP_H
#define PX_EMAP_H
#include "diagram/diagram.h"
#include "thermo/thermo.h"
#include "thermo/practice.h"

typedef enum px_emap_axis { PX_AXIS_PH = 0, PX_AXIS_E = 1, PX_AXIS_LOGA = 2 } px_emap_axis;

typedef enum px_emap_kind {
    PX_EMAP_METAL = 0, /* the element itself (immunity) */
    PX_EMAP_SOLID,     /* oxides, hydroxides, salts (passivation) */
    PX_EMAP_AQUEOUS,   /* dissolved (corrosion) */
    PX_EMAP_GAS,
    PX_EMAP_LIQUID
} px_emap_kind;

#define PX_EMAP_DEFAULT_ACTIVITY 1e-6 /* corrosion convention, common practice */
#define PX_EMAP_DEFAULT_LIGAND 1e-3

typedef struct px_emap_options {
    double T, P;                  /* K, bar */
    px_emap_axis xaxis, yaxis;    /* default pH, E */
    px_diagram_window window;     /* in axis units (pH, V, log10 a) */
    double pH, E;                 /* fixed values of an axis not shown */
    double activity;              /* dissolved species of M (molality if I > 0) */
    double ligand_activity;       /* total of L, on the log a(L) axis it varies */
    double gas_log_f;             /* log10 fugacity of gaseous species */
    double ionic_strength;        /* > 0: Davies activity coefficients at T */
    const char *ligand;           /* ligand element symbol ("Cl"), or a group whose
                                     first element stands for it ("CN"), or NULL */
    const char *const *exclude;   /* formulas left out (metastable maps) */
    size_t n_exclude;
    const char *const *only;      /* if n_only > 0: just these species of M */
    size_t n_only;
    const char *const *act_species; /* per-species activities */
    const double *act_values;
    size_t n_act;
    px_ligand_states ligands;     /* ligand oxidation states kept (practice's default) */
    const px_allocator *alloc;    /* every allocation of the map (NULL: malloc/free) */
} px_emap_options;

px_emap_options px_emap_options_default(void);

typedef struct px_emap_field {
    long species;  /* db index */
    long ligand;   /* db index of the ligand field's species, -1 without ligand */
    px_emap_kind kind;
} px_emap_field;

typedef struct px_emap_boundary {
    long a, b;          /* db indices */
    char reaction[256]; /* balanced, integer coefficients, electrons on the left */
} px_emap_boundary;

/* A species' field as drawn: the pieces of one species that share edges
 * across ligand fields joined into one outline (map->field pieces keep the
 * per-ligand-field detail). */
typedef struct px_emap_outline {
    int piece;         /* a representative piece: map->field[piece], info[piece] */
    size_t first, n;   /* vertices joined->x[first..], joined->y[first..] */
    double area;       /* outline area minus its holes */
} px_emap_outline;

typedef struct px_emap {
    px_diagram_map *map;      /* geometry; field[i] <-> info[i], boundary[i] <-> bnd[i] */
    px_diagram_outlines *joined; /* loops of the joined fields (holes included) */
    px_emap_outline *outline;    /* the outer loops, one per drawn field */
    size_t n_outline;
    px_diagram_outlines *domains; /* immunity, passivation, corrosion (loop cls) */
    px_emap_field *info;
    px_emap_boundary *bnd;
    px_diagram_map *ligand_map; /* L's own map (NULL without ligand) */
    long *ligand_species;       /* db index per ligand-map field */
    long *absent;               /* db indices of candidates that never predominate */
    size_t n_absent;
    long *ligand_absent;        /* db indices of ligand candidates absent from the ligand map */
    size_t n_ligand_absent;
    size_t n_candidates;
    double nernst_slope;        /* RT ln10 / F at T, V */
    double E0_o2;               /* E of O2(g) + 4 H+ + 4 e- = 2 H2O(l) at T, P, V vs SHE */
    double pKw;                 /* from the database's H2O, H+, OH- at T, P */
    char error[256];
    const px_allocator *alloc;  /* the options' allocator, for px_emap_free */
} px_emap;

/* Build the map.  On failure returns a status and, if out_msg is given,
 * a message naming what failed (species, basis, range). */
int px_emap_build(px_thermo_ws *ws, const px_db *db, const char *element,
                  const px_emap_options *opt, px_emap **out, char *msg, size_t msglen);
void px_emap_free(px_emap *m); /* NULL ok */

/* Corrosion domain (enum px_diagram_domain) of a field of species f on a
 * map of element z: the element itself, solid or liquid -> immunity; a
 * solid with sulfur and no oxygen (a metal sulfide) -> sulfide film;
 * other solids and liquids -> passivation; dissolved or gas -> corrosion.
 * The one rule: phlox.plot asks it through core.domain_of. */
int px_emap_domain(const px_formula *f, int z);


#endif
