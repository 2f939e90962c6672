/* potential.h - the electrochemistry drawn on potential-pH maps: the Nernst
 * slope, the water stability lines (O2/H2O and H+/H2), neutral pH and the
 * reference electrodes (offsets vs SHE at 25 C and at T).  Implemented in
 * diagram/water.c; names keep the px_diagram_ prefix of their layer.
 * Status codes from core/status.h. */
#ifndef PX_DIAGRAM_POTENTIAL_H
#define PX_DIAGRAM_POTENTIAL_H

/* Nernst slope RT ln10 / F in V per decade (CODATA 2018 R and F). */
double px_diagram_nernst_slope(double T_K);

/* O2/H2O line: E = E0 - slope pH + (slope / 4) log fO2   [V vs SHE] */
double px_diagram_water_o2_line(double pH, double E0_V, double slope_V, double log_fO2);

/* H+/H2 line: E = -slope pH - (slope / 2) log fH2   [V vs SHE] */
double px_diagram_water_h2_line(double pH, double slope_V, double log_fH2);

/* Neutral pH = pKw / 2. */
double px_diagram_neutral_ph(double pKw);

enum px_diagram_electrode {
    PX_ELECTRODE_SHE = 0,
    PX_ELECTRODE_SCE,          /* saturated calomel */
    PX_ELECTRODE_AGCL_SAT,     /* Ag/AgCl, saturated KCl */
    PX_ELECTRODE_AGCL_3_5M,    /* Ag/AgCl, 3.5 mol/L KCl */
    PX_ELECTRODE_CSE,          /* Cu/CuSO4, saturated */
    PX_ELECTRODE_COUNT
};

typedef struct px_diagram_electrode_info {
    const char *name;
    double offset_V;  /* its potential vs SHE at 25 C */
    double dEdT_V_K;  /* isothermal temperature coefficient, V/K (NAN where not known) */
    double T_min, T_max; /* K: where the coefficient may be used */
    const char *source;  /* of the offset */
    const char *dEdT_source;
} px_diagram_electrode_info;

/* NULL for an unknown electrode. */
const px_diagram_electrode_info *px_diagram_electrode_get(int electrode);

/* E_SHE = E_ref + offset (25 C offsets).  PX_EINVAL: unknown electrode or
 * non-finite potential. */
int px_diagram_electrode_to_she(int electrode, double e_ref_V, double *e_she_V);
int px_diagram_electrode_from_she(int electrode, double e_she_V, double *e_ref_V);
/* Offset vs SHE of the electrode at T (K), the electrode itself at T:
 * offset + dEdT (T - 298.15).  PX_ERANGE outside [T_min, T_max] or without
 * a coefficient (away from 25 C); PX_EINVAL for an unknown electrode. */
int px_diagram_electrode_offset_at(int electrode, double T, double *offset_V);

#endif
