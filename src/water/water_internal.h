/* water_internal.h - private interface between the files of src/water/.
 *
 * Not installed, not for other modules: iapws95.c (Helmholtz function,
 * density root, saturation), dielectric.c (IAPWS R8-97) and water.c (the
 * public functions, range checks, Debye-Hueckel and Born functions). */
#ifndef PX_WATER_INTERNAL_H
#define PX_WATER_INTERNAL_H
#include "water/water.h"

/* IAPWS-95 ideal-gas part phi0 and residual part phir with their first and
 * second derivatives; fills the phi0* or phir* fields of h (and delta, tau). */
void px_water_phi0_eval(double delta, double tau, px_water_helmholtz *h);
void px_water_phir_eval(double delta, double tau, px_water_helmholtz *h);

/* Pressure (Pa) and its derivatives at (T, rho) from the residual part only. */
typedef struct px_water_pvt {
    double P;        /* Pa */
    double dP_drho;  /* Pa/(kg/m3) at constant T */
    double dP_dT;    /* Pa/K at constant rho */
} px_water_pvt;
void px_water_pvt_eval(double T, double rho, px_water_pvt *out);

/* Auxiliary saturation equations (IAPWS supplementary release on saturation
 * properties, 1992; Wagner and Pruss 1993): starting values only. */
double px_water_psat_aux(double T);      /* Pa */
double px_water_rhol_aux(double T);      /* kg/m3 */
double px_water_rhov_aux(double T);      /* kg/m3 */

/* Saturation state by the equal-pressure, equal-Gibbs-energy condition.
 * No range check (caller's job); PX_ENOCONV if Newton fails. */
int px_water_sat_solve(double T, double *P_pa, double *rho_l, double *rho_v);

/* Liquid density root of P(T, rho) = P_pa from a starting guess (<= 0: the
 * auxiliary saturated-liquid density).  No range check. */
int px_water_density_solve(double T, double P_pa, double guess, const px_water_options *opt,
                           double *rho, px_water_stats *stats);

/* IAPWS R8-97 static dielectric constant and its partial derivatives at
 * constant rho (eps_T, 1/K) and at constant T (eps_rho, per kg/m3); the
 * derivative pointers may be NULL. */
void px_water_eps_eval(double T, double rho, double *eps, double *eps_T, double *eps_rho);

#endif
