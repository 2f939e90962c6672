/* water.c - the public water functions: range checks, the liquid state at
 * (T, P), Born functions, Debye-Hueckel parameters and the ionization
 * constant.
 *
 * px_water_state_eval solves IAPWS-95 for the liquid density at (T, P),
 * takes the molar G, H, S, Cp, V from the Helmholtz derivatives, the static
 * dielectric constant from IAPWS R8-97 with its derivatives at constant P
 * (first derivatives analytic through (d rho/d T)_P and (d rho/d P)_T; the
 * second temperature derivative by a central difference of the analytic
 * first derivative over T +- 0.01 K at constant P), the Born functions
 * Q, Y, X (Helgeson and Kirkham 1974, Am. J. Sci. 274, 1089; definitions as
 * in Tanger and Helgeson 1988) and the Debye-Hueckel A and B from the
 * limiting law with CODATA 2018 constants.
 *
 * Molar properties use the IAPWS-95 gas constant and molar mass (R_w = R M,
 * 8.3143714 J/(mol K)), not CODATA's R: they belong to the formulation. */
#include "water/water_internal.h"
#include "core/constants.h"
#include "core/status.h"
#include <math.h>
#include <stddef.h>

#define PA_PER_BAR 1e5
#define PX_PI 3.14159265358979323846

/* Step of the central difference for d2eps/dT2 at constant P (K).  Truncation
 * error ~ h^2/6 times the third derivative and round-off ~ 1e-15/h relative
 * both stay far below the formulation's uncertainty; choice of this module,
 * checked in tests/unit/test_water.c against Richardson-extrapolated
 * differences of eps over 0.1 and 0.05 K (1e-6 relative). */
#define EPS_FD_STEP 0.01

/* Margin on the auxiliary psat equation: above (1 + margin) psat_aux the
 * pressure is certainly above the IAPWS-95 saturation pressure, so the
 * phase-equilibrium solve is skipped (the auxiliary equation agrees with
 * IAPWS-95 to better than 1e-4 relative over 273-623 K, checked in the unit
 * test; margin is a choice of this module). */
#define PSAT_AUX_MARGIN 1e-3

/* IAPWS R11-07 (Bandura and Lvov 2006) coefficients (from memory of the
 * release; compared with python3-iapws _iapws._Kw). */
static const double KW_N = 6.0;
static const double KW_ALPHA[3] = {-0.864671, 8659.19, -22786.2};
static const double KW_BETA[3] = {0.642044, -56.8534, -0.375754};
static const double KW_GAMMA[4] = {6.141500e-1, 4.825133e4, -6.770793e4, 1.010210e7};
static const double KW_TMIN = 273.15, KW_TMAX = 1073.15, KW_RHOMAX = 1250.0;

static const double DE_TMIN = 238.0; /* K, lower limit of IAPWS R8-97 */

static int finite2(double a, double b) { return isfinite(a) && isfinite(b); }

/* P >= psat(T) within PX_WATER_PSAT_RTOL (T already in range). */
static int check_psat(double T, double P_bar)
{
    double pa = px_water_psat_aux(T) / PA_PER_BAR;
    if (P_bar >= pa * (1.0 + PSAT_AUX_MARGIN)) return PX_OK;
    double ps;
    int rc = px_water_sat_solve(T, &ps, NULL, NULL);
    if (rc != PX_OK) return rc;
    return P_bar >= ps / PA_PER_BAR * (1.0 - PX_WATER_PSAT_RTOL) ? PX_OK : PX_ERANGE;
}

static int check_TP(double T, double P_bar)
{
    if (!finite2(T, P_bar)) return PX_EINVAL;
    if (T < PX_WATER_TMIN || T > PX_WATER_TMAX) return PX_ERANGE;
    if (P_bar <= 0 || P_bar > PX_WATER_PMAX) return PX_ERANGE;
    return check_psat(T, P_bar);
}

static int check_Trho(double T, double rho, double tmin, double tmax, double rhomax)
{
    if (!finite2(T, rho)) return PX_EINVAL;
    if (T < tmin || T > tmax || rho <= 0 || rho > rhomax) return PX_ERANGE;
    return PX_OK;
}

int px_water_density_opt(double T_K, double P_bar, const px_water_options *opt, double *rho,
                         px_water_stats *stats)
{
    if (!rho) return PX_EINVAL;
    int rc = check_TP(T_K, P_bar);
    if (rc != PX_OK) return rc;
    double r;
    rc = px_water_density_solve(T_K, P_bar * PA_PER_BAR, 0.0, opt, &r, stats);
    if (rc != PX_OK) return rc;
    if (!isfinite(r)) return PX_ENONFINITE;
    *rho = r;
    return PX_OK;
}

int px_water_density(double T_K, double P_bar, double *rho)
{
    return px_water_density_opt(T_K, P_bar, NULL, rho, NULL);
}

int px_water_saturation(double T_K, double *P_bar, double *rho_liq, double *rho_vap)
{
    if (!P_bar && !rho_liq && !rho_vap) return PX_EINVAL;
    if (!isfinite(T_K)) return PX_EINVAL;
    if (T_K < PX_WATER_TMIN || T_K > PX_WATER_SAT_TMAX) return PX_ERANGE;
    double p, rl, rv;
    int rc = px_water_sat_solve(T_K, &p, &rl, &rv);
    if (rc != PX_OK) return rc;
    if (P_bar) *P_bar = p / PA_PER_BAR;
    if (rho_liq) *rho_liq = rl;
    if (rho_vap) *rho_vap = rv;
    return PX_OK;
}

int px_water_psat(double T_K, double *P_bar)
{
    if (!P_bar) return PX_EINVAL;
    return px_water_saturation(T_K, P_bar, NULL, NULL);
}

int px_water_sat_liquid_density(double T_K, double *rho)
{
    if (!rho) return PX_EINVAL;
    return px_water_saturation(T_K, NULL, rho, NULL);
}

int px_water_helmholtz_eval(double T_K, double rho, px_water_helmholtz *out)
{
    if (!out) return PX_EINVAL;
    int rc = check_Trho(T_K, rho, PX_WATER_TMIN, PX_WATER_EOS_TMAX, PX_WATER_RHOMAX);
    if (rc != PX_OK) return rc;
    px_water_helmholtz h;
    double delta = rho / PX_WATER_RHOC, tau = PX_WATER_TC / T_K;
    px_water_phi0_eval(delta, tau, &h);
    px_water_phir_eval(delta, tau, &h);
    const double v[] = {h.phi0, h.phi0_d, h.phi0_dd, h.phi0_t, h.phi0_tt,
                        h.phir, h.phir_d, h.phir_dd, h.phir_t, h.phir_tt, h.phir_dt};
    for (size_t i = 0; i < sizeof v / sizeof v[0]; i++)
        if (!isfinite(v[i])) return PX_ENONFINITE; /* e.g. exactly at the critical point */
    *out = h;
    return PX_OK;
}

/* Specific properties from phi: IAPWS R6-95 Table 3. */
int px_water_props_eval(double T_K, double rho, px_water_props *out)
{
    if (!out) return PX_EINVAL;
    px_water_helmholtz h;
    int rc = px_water_helmholtz_eval(T_K, rho, &h);
    if (rc != PX_OK) return rc;
    const double R = PX_WATER_R, T = T_K, d = h.delta, t = h.tau;
    double dpd = d * h.phir_d;
    double pr = 1.0 + 2.0 * dpd + d * d * h.phir_dd;  /* (dP/drho)_T / (R T) */
    double pt = 1.0 + dpd - d * t * h.phir_dt;         /* (dP/dT)_rho / (rho R) */
    double ctt = -t * t * (h.phi0_tt + h.phir_tt);     /* cv / R */
    px_water_props p;
    p.T = T;
    p.rho = rho;
    p.P = rho * R * T * (1.0 + dpd) / PA_PER_BAR;
    p.u = R * T * t * (h.phi0_t + h.phir_t);
    p.h = R * T * (1.0 + t * (h.phi0_t + h.phir_t) + dpd);
    p.s = R * (t * (h.phi0_t + h.phir_t) - h.phi0 - h.phir);
    p.g = R * T * (1.0 + h.phi0 + h.phir + dpd);
    p.cv = R * ctt;
    p.cp = R * (ctt + pt * pt / pr);
    double w2 = R * T * (pr + pt * pt / ctt);
    p.w = w2 > 0 ? sqrt(w2) : NAN;
    p.dP_drho = R * T * pr / PA_PER_BAR;
    p.dP_dT = rho * R * pt / PA_PER_BAR;
    const double v[] = {p.P, p.u, p.h, p.s, p.g, p.cv, p.cp, p.w, p.dP_drho, p.dP_dT};
    for (size_t i = 0; i < sizeof v / sizeof v[0]; i++)
        if (!isfinite(v[i])) return PX_ENONFINITE;
    *out = p;
    return PX_OK;
}

int px_water_pressure(double T_K, double rho, double *P_bar)
{
    if (!P_bar) return PX_EINVAL;
    int rc = check_Trho(T_K, rho, PX_WATER_TMIN, PX_WATER_EOS_TMAX, PX_WATER_RHOMAX);
    if (rc != PX_OK) return rc;
    px_water_pvt p;
    px_water_pvt_eval(T_K, rho, &p);
    if (!isfinite(p.P)) return PX_ENONFINITE;
    *P_bar = p.P / PA_PER_BAR;
    return PX_OK;
}

int px_water_dielectric(double T_K, double rho, double *eps)
{
    if (!eps) return PX_EINVAL;
    int rc = check_Trho(T_K, rho, DE_TMIN, PX_WATER_EOS_TMAX, PX_WATER_RHOMAX);
    if (rc != PX_OK) return rc;
    double e;
    px_water_eps_eval(T_K, rho, &e, NULL, NULL);
    if (!isfinite(e)) return PX_ENONFINITE;
    *eps = e;
    return PX_OK;
}

/* pKw = -2n[log10(1+Q) - Q/(Q+1) rho (b0 + b1/T + b2 rho)] + pKwG + 2 log10(Mw/1000),
 * Q = rho exp(a0 + a1/T + a2 rho^(2/3)/T^2), rho in g/cm3: IAPWS R11-07 eqs. 1-3. */
int px_water_pkw(double T_K, double rho, double *pKw)
{
    if (!pKw) return PX_EINVAL;
    int rc = check_Trho(T_K, rho, KW_TMIN, KW_TMAX, KW_RHOMAX);
    if (rc != PX_OK) return rc;
    double T = T_K, r = rho / 1000.0; /* g/cm3 */
    double Q = r * exp(KW_ALPHA[0] + KW_ALPHA[1] / T + KW_ALPHA[2] * cbrt(r * r) / (T * T));
    double pkg = KW_GAMMA[0] + KW_GAMMA[1] / T + KW_GAMMA[2] / (T * T) +
                 KW_GAMMA[3] / (T * T * T);
    double v = -2.0 * KW_N *
                   (log10(1.0 + Q) - Q / (Q + 1.0) * r * (KW_BETA[0] + KW_BETA[1] / T +
                                                          KW_BETA[2] * r)) +
               pkg + 2.0 * log10(PX_WATER_M); /* Mw/1000 in kg/mol */
    if (!isfinite(v)) return PX_ENONFINITE;
    *pKw = v;
    return PX_OK;
}

/* Liquid at (T, P): density, its derivatives, and eps with its derivatives
 * at constant P (chain rule through rho(T, P)). */
typedef struct liquid_point {
    double rho, drho_dT, drho_dP; /* kg/m3, per K, per bar */
    double eps, deps_dT, deps_dP;
} liquid_point;

static int liquid_eval(double T, double P_pa, double guess, liquid_point *lp)
{
    double rho;
    int rc = px_water_density_solve(T, P_pa, guess, NULL, &rho, NULL);
    if (rc != PX_OK) return rc;
    px_water_pvt p;
    px_water_pvt_eval(T, rho, &p);
    if (!(p.dP_drho > 0)) return PX_ENOCONV; /* not on the stable liquid branch */
    double e, e_T, e_r;
    px_water_eps_eval(T, rho, &e, &e_T, &e_r);
    lp->rho = rho;
    lp->drho_dT = -p.dP_dT / p.dP_drho;          /* (drho/dT)_P = -(dP/dT)_rho/(dP/drho)_T */
    lp->drho_dP = PA_PER_BAR / p.dP_drho;        /* (drho/dP)_T per bar */
    lp->eps = e;
    lp->deps_dT = e_T + e_r * lp->drho_dT;
    lp->deps_dP = e_r * lp->drho_dP;
    return PX_OK;
}

int px_water_state_eval(double T_K, double P_bar, px_dielectric_model m, px_water_state *out)
{
    if (!out) return PX_EINVAL;
    if (m != PX_DIELECTRIC_R8_97) return PX_EINVAL; /* JN91 not implemented: docs/water.md */
    int rc = check_TP(T_K, P_bar);
    if (rc != PX_OK) return rc;
    const double T = T_K, P_pa = P_bar * PA_PER_BAR;

    liquid_point c, lo, hi;
    rc = liquid_eval(T, P_pa, 0.0, &c);
    if (rc != PX_OK) return rc;
    const double h = EPS_FD_STEP;
    rc = liquid_eval(T + h, P_pa, c.rho + c.drho_dT * h, &hi);
    if (rc != PX_OK) return rc;
    rc = liquid_eval(T - h, P_pa, c.rho - c.drho_dT * h, &lo);
    if (rc != PX_OK) return rc;

    px_water_props pr;
    rc = px_water_props_eval(T, c.rho, &pr);
    if (rc != PX_OK) return rc;

    px_water_state s;
    s.T = T;
    s.P = P_bar;
    s.rho = c.rho;
    s.drho_dT = c.drho_dT;
    s.drho_dP = c.drho_dP;
    s.G = pr.g * PX_WATER_M;
    s.H = pr.h * PX_WATER_M;
    s.S = pr.s * PX_WATER_M;
    s.Cp = pr.cp * PX_WATER_M;
    s.V = PX_WATER_M / c.rho * PA_PER_BAR; /* m3/mol x Pa/bar = J/bar */

    s.eps = c.eps;
    s.deps_dT = c.deps_dT;
    s.deps_dP = c.deps_dP;
    s.d2eps_dT2 = (hi.deps_dT - lo.deps_dT) / (2.0 * h);
    double ie2 = 1.0 / (c.eps * c.eps);
    /* Born functions: Helgeson and Kirkham 1974; Tanger and Helgeson 1988 eqs. for Q, Y, X */
    s.Q = ie2 * s.deps_dP;
    s.Y = ie2 * s.deps_dT;
    s.X = ie2 * (s.d2eps_dT2 - 2.0 / c.eps * s.deps_dT * s.deps_dT);

    /* Debye-Hueckel limiting law (e.g. Robinson and Stokes 1959):
     *   B = sqrt(2 NA e^2 rho_w / (eps0 eps k T))       [1/m (kg/mol)^1/2]
     *   A = B e^2 / (8 pi eps0 eps k T ln 10)            [(kg/mol)^1/2]   */
    double ekt = PX_EPS0 * c.eps * PX_KB * T;
    double bsi = sqrt(2.0 * PX_NA * PX_QE * PX_QE * c.rho / ekt);
    s.B_gamma = bsi * 1e-10; /* per Angstrom */
    s.A_gamma = bsi * PX_QE * PX_QE / (8.0 * PX_PI * ekt * PX_LN10);
    double dlnB = 0.5 * (c.drho_dT / c.rho - c.deps_dT / c.eps - 1.0 / T);
    double dlnA = dlnB - c.deps_dT / c.eps - 1.0 / T;
    s.dB_dT = s.B_gamma * dlnB;
    s.dA_dT = s.A_gamma * dlnA;

    const double v[] = {s.rho, s.drho_dT, s.drho_dP, s.G, s.H, s.S, s.Cp, s.V, s.eps,
                        s.deps_dT, s.deps_dP, s.d2eps_dT2, s.Q, s.Y, s.X, s.A_gamma,
                        s.B_gamma, s.dA_dT, s.dB_dT};
    for (size_t i = 0; i < sizeof v / sizeof v[0]; i++)
        if (!isfinite(v[i])) return PX_ENONFINITE;
    *out = s;
    return PX_OK;
}
