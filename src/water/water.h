/* water.h - properties of liquid water for aqueous thermodynamics.
 *
 * The solvent model under every aqueous calculation in phlox: density and
 * molar thermodynamic properties from the IAPWS-95 Helmholtz formulation
 * (IAPWS R6-95(2018); Wagner and Pruss 2002, J. Phys. Chem. Ref. Data 31,
 * 387), the saturation curve from the same formulation (phase-equilibrium
 * condition), the static dielectric constant (IAPWS R8-97; Fernandez et al.
 * 1997, J. Phys. Chem. Ref. Data 26, 1125) with the Born functions Q, Y, X,
 * the Debye-Hueckel A and B parameters, and the ionization constant of water
 * (IAPWS R11-07; Bandura and Lvov 2006, J. Phys. Chem. Ref. Data 35, 15) for
 * checks.
 *
 * Working range of px_water_state_eval / px_water_density: 273.15 K (0 C,
 * metastable by 0.01 K) to 623.15 K, from the saturation pressure (liquid
 * side; any P >= psat(T), so 1 bar is fine below 100 C) to 1000 bar.
 * Outside: PX_ERANGE.  Non-finite input or a NULL output pointer: PX_EINVAL.
 * Every function is reentrant, never prints, and writes its outputs only on
 * success.
 *
 * The core API is the first block; the blocks marked "added" are
 * additions of the water module (Helmholtz derivatives, properties at (T, rho),
 * the full saturation state, solver options), used by the tests and useful for
 * checks. */
#ifndef PX_WATER_H
#define PX_WATER_H
#include "core/status.h" /* PX_OK, PX_EINVAL, PX_ERANGE, ... */

/* ---- core API ------------------------------------------------ */

typedef enum { PX_DIELECTRIC_R8_97 = 0, PX_DIELECTRIC_JN91 = 1 } px_dielectric_model;
/* PX_DIELECTRIC_JN91 (Johnson and Norton 1991) is NOT implemented: the
 * coefficients recalled for it did not reproduce the published 25 C values
 * (see docs/water.md); px_water_state_eval returns PX_EINVAL for it. */

typedef struct px_water_state {
    double T, P;             /* K, bar (inputs) */
    double rho;              /* kg/m3, liquid (or compressed) water */
    double drho_dT, drho_dP; /* kg/m3/K at constant P, kg/m3/bar at constant T */
    double G, H, S, Cp, V;   /* molar, IAPWS-95 reference state (u=s=0 for the liquid at the
                                triple point): J/mol, J/mol, J/(mol K), J/(mol K), J/bar */
    double eps, deps_dT, deps_dP, d2eps_dT2; /* static dielectric constant and derivatives
                                                (T derivatives at constant P, P at constant T) */
    double Q, Y, X;          /* Born functions: Q = eps^-2 deps/dP [1/bar], Y = eps^-2 deps/dT [1/K],
                                X = eps^-2 [d2eps/dT2 - (2/eps)(deps/dT)^2] [1/K^2] */
    double A_gamma;          /* Debye-Hueckel A, log10 basis, (kg/mol)^1/2 */
    double B_gamma;          /* Debye-Hueckel B, (kg/mol)^1/2 per Angstrom */
    double dA_dT, dB_dT;     /* at constant P, per K */
} px_water_state;

int px_water_state_eval(double T_K, double P_bar, px_dielectric_model m, px_water_state *out);
int px_water_psat(double T_K, double *P_bar);                 /* saturation pressure */
int px_water_sat_liquid_density(double T_K, double *rho);
int px_water_density(double T_K, double P_bar, double *rho);  /* liquid, robust root solve */
int px_water_pressure(double T_K, double rho, double *P_bar);
int px_water_dielectric(double T_K, double rho, double *eps); /* R8-97 */
int px_water_pkw(double T_K, double rho, double *pKw);        /* IAPWS R11-07, for checks */

/* Range: 273.15 K (0 C, metastable by 0.01 K) to 623.15 K, from saturation pressure
   (P >= psat(T)) to 1000 bar; outside: PX_ERANGE. */
#define PX_WATER_TMIN 273.15
#define PX_WATER_TMAX 623.15
#define PX_WATER_PMAX 1000.0

/* ---- added: constants of the formulations ------------------------------- */

#define PX_WATER_TC 647.096     /* K, critical temperature (IAPWS R6-95) */
#define PX_WATER_RHOC 322.0     /* kg/m3, critical density (IAPWS R6-95) */
#define PX_WATER_R 461.51805    /* J/(kg K), specific gas constant of IAPWS-95 (R6-95) */
#define PX_WATER_M 18.015268e-3 /* kg/mol, molar mass used by IAPWS (R6-95, R11-07) */

/* Relative tolerance of the "P >= psat(T)" check, so a pressure that is the
 * saturation pressure computed elsewhere (other software, rounded tables)
 * is accepted; the liquid is then metastable by at most this much, which
 * IAPWS-95 describes smoothly.  Choice of this module, no source. */
#define PX_WATER_PSAT_RTOL 1e-6

/* Wider temperature limits of the formula-level functions below (they take
 * (T, rho) and are used for the published check values):
 *   saturation (px_water_psat, px_water_sat_liquid_density, px_water_saturation):
 *     273.15 K .. PX_WATER_SAT_TMAX (Newton on the phase-equilibrium condition is
 *     reliable to within about 1 K of the critical point; choice of this module)
 *   px_water_pressure, px_water_helmholtz_eval, px_water_props_eval:
 *     PX_WATER_TMIN .. 1273.15 K, 0 < rho <= 1400 kg/m3 (IAPWS-95 range of validity
 *     in T; the density bound keeps to the region of the release's check values)
 *   px_water_dielectric: 238 K .. 1273.15 K (R8-97 range 238-873 K; the release
 *     states extrapolation to 1200 K is reasonable), 0 < rho <= 1400 kg/m3
 *   px_water_pkw: 273.15 K .. 1073.15 K, 0 < rho <= 1250 kg/m3 (R11-07 range) */
#define PX_WATER_SAT_TMAX 646.0
#define PX_WATER_EOS_TMAX 1273.15
#define PX_WATER_RHOMAX 1400.0

/* ---- added: IAPWS-95 dimensionless Helmholtz energy ---------------------- */

/* phi = f/(RT) = phi0(delta, tau) + phir(delta, tau), delta = rho/rhoc,
 * tau = Tc/T; _d, _t are partial derivatives by delta and tau. */
typedef struct px_water_helmholtz {
    double delta, tau;
    double phi0, phi0_d, phi0_dd, phi0_t, phi0_tt, phi0_dt;
    double phir, phir_d, phir_dd, phir_t, phir_tt, phir_dt;
} px_water_helmholtz;
int px_water_helmholtz_eval(double T_K, double rho, px_water_helmholtz *out);

/* Specific properties at (T, rho) from IAPWS-95 (SI per kg; P in bar). */
typedef struct px_water_props {
    double T, rho, P;         /* K, kg/m3, bar */
    double u, h, s, g;        /* J/kg, J/kg, J/(kg K), J/kg */
    double cv, cp, w;         /* J/(kg K), J/(kg K), m/s */
    double dP_drho, dP_dT;    /* bar/(kg/m3) at constant T, bar/K at constant rho */
} px_water_props;
int px_water_props_eval(double T_K, double rho, px_water_props *out);

/* Saturation state at T: pressure (bar), liquid and vapour densities (kg/m3);
 * any of the output pointers except one may be NULL (at least one non-NULL). */
int px_water_saturation(double T_K, double *P_bar, double *rho_liq, double *rho_vap);

/* ---- added: solver options and statistics for the density root ---------- */

typedef struct px_water_options {
    double epsrel;  /* converged when the Newton step is <= epsrel * rho; that step is
                       applied, so the error is of the order of its square (default 1e-12) */
    int max_iter;   /* iteration cap (default 50) */
} px_water_options;
px_water_options px_water_options_default(void);

typedef struct px_water_stats {
    int iter;        /* iterations used */
    int bisections;  /* safeguard steps taken instead of Newton steps */
    double residual; /* |P(rho) - P| / P at the last evaluated point (before the final step) */
} px_water_stats;

/* px_water_density with explicit options; stats may be NULL.  Range as
 * px_water_density. */
int px_water_density_opt(double T_K, double P_bar, const px_water_options *opt,
                         double *rho, px_water_stats *stats);

#endif
