/* dielectric.c - static dielectric constant of water, IAPWS R8-97.
 *
 * The Harris-Alder g-factor g(rho, T) carries the orientational correlation
 * of the water dipoles; with the molecular dipole moment mu and mean
 * polarizability alpha it gives eps through a Kirkwood-Froehlich type
 * equation (IAPWS R8-97, "Release on the Static Dielectric Constant of
 * Ordinary Water Substance for Temperatures from 238 K to 873 K and
 * Pressures up to 1000 MPa"; Fernandez, Goodwin, Lemmon, Levelt Sengers and
 * Williams 1997, J. Phys. Chem. Ref. Data 26, 1125):
 *
 *   g = 1 + sum_h N_h delta^i_h (Tc/T)^j_h + N12 delta (T/228 K - 1)^-1.2
 *   A = NA mu^2 rho g / (M eps0 k T),  B = NA alpha rho / (3 M eps0)
 *   eps = [1 + A + 5B + sqrt(9 + 2A + 18B + A^2 + 10AB + 9B^2)] / [4(1 - B)]
 *
 * The partial derivatives at constant rho and at constant T are analytic
 * here; water.c combines them with (d rho/d T)_P and (d rho/d P)_T.
 *
 * The constants NA, k, eps0 are the 1986 CODATA values that belong to the
 * formulation (as printed in R8-97); they are part of the fitted correlation
 * and are NOT replaced by CODATA 2018 (k alone changed by 6.5e-6 relative,
 * which would shift eps by about that much and break the release's check
 * values). */
#include "water/water_internal.h"
#include <math.h>

/* IAPWS R8-97 coefficients N_h, i_h, j_h (from memory of the release;
 * compared digit by digit with python3-iapws 1.5.3 _iapws._Dielectric). */
static const double DE_N[12] = {0.978224486826,    -0.957771379375,  0.237511794148,
                                0.714692244396,    -0.298217036956,  -0.108863472196,
                                0.949327488264e-1, -0.980469816509e-2, 0.165167634970e-4,
                                0.937359795772e-4, -0.12317921872e-9, 0.196096504426e-2};
static const double DE_I[11] = {1, 1, 1, 2, 3, 3, 4, 5, 6, 7, 10};
static const double DE_J[11] = {0.25, 1, 2.5, 1.5, 1.5, 2.5, 2, 2, 5, 0.5, 10};
static const double DE_T228 = 228.0;  /* K, R8-97 eq. 4 */
static const double DE_EXP12 = -1.2;  /* R8-97 eq. 4 */

/* R8-97 constants (1986 values that belong to the formulation; from memory of
 * the release, compared with python3-iapws _iapws._Dielectric). */
static const double DE_NA = 6.0221367e23;     /* 1/mol */
static const double DE_K = 1.380658e-23;      /* J/K */
static const double DE_EPS0 = 8.854187817e-12; /* C^2/(J m) */
static const double DE_MU = 6.138e-30;        /* C m, dipole moment */
static const double DE_ALPHA = 1.636e-40;     /* C^2/(J m^2), mean polarizability */
static const double DE_M = 0.018015268;       /* kg/mol */

void px_water_eps_eval(double T, double rho, double *eps, double *eps_T, double *eps_rho)
{
    double delta = rho / PX_WATER_RHOC, tr = PX_WATER_TC / T;
    double g = 1.0, g_T = 0.0, g_d = 0.0; /* g and partials by T and delta */
    for (int h = 0; h < 11; h++) {
        double term = DE_N[h] * pow(delta, DE_I[h]) * pow(tr, DE_J[h]);
        g += term;
        g_T -= term * DE_J[h] / T;          /* d (Tc/T)^j / dT = -j (Tc/T)^j / T */
        g_d += term * DE_I[h] / delta;
    }
    double x = T / DE_T228 - 1.0;
    double t12 = DE_N[11] * delta * pow(x, DE_EXP12);
    g += t12;
    g_T += t12 * DE_EXP12 / (x * DE_T228);
    g_d += t12 / delta;

    double cA = DE_NA * DE_MU * DE_MU / (DE_M * DE_EPS0 * DE_K);
    double cB = DE_NA * DE_ALPHA / (3.0 * DE_M * DE_EPS0);
    double A = cA * rho * g / T;
    double B = cB * rho;
    double S = sqrt(9.0 + 2.0 * A + 18.0 * B + A * A + 10.0 * A * B + 9.0 * B * B);
    double den = 4.0 * (1.0 - B);
    double e = (1.0 + A + 5.0 * B + S) / den;
    if (eps) *eps = e;
    if (eps_T || eps_rho) {
        double e_A = (1.0 + (2.0 + 2.0 * A + 10.0 * B) / (2.0 * S)) / den;
        double e_B = (5.0 + (18.0 + 10.0 * A + 18.0 * B) / (2.0 * S)) / den + e / (1.0 - B);
        double A_T = cA * rho * (g_T / T - g / (T * T));
        double A_rho = cA * (g + delta * g_d) / T; /* d(rho g)/drho = g + rho g_rho */
        if (eps_T) *eps_T = e_A * A_T;
        if (eps_rho) *eps_rho = e_A * A_rho + e_B * cB;
    }
}
