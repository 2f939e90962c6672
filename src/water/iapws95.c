/* iapws95.c - the IAPWS-95 Helmholtz formulation for ordinary water.
 *
 * Water's specific Helmholtz energy is f(rho, T) = R T [phi0(delta, tau) +
 * phir(delta, tau)] with delta = rho/rhoc and tau = Tc/T: an ideal-gas part
 * phi0 and a 56-term residual part phir (IAPWS R6-95(2018), "Revised Release
 * on the IAPWS Formulation 1995 for the Thermodynamic Properties of Ordinary
 * Water Substance for General and Scientific Use"; Wagner and Pruss 2002,
 * J. Phys. Chem. Ref. Data 31, 387).  Every thermodynamic property follows
 * from phi and its first and second derivatives (release Tables 3 to 5).
 *
 * This file evaluates phi0 and phir with their derivatives, solves
 * P(rho, T) = P for the liquid root (Newton safeguarded by a shrinking
 * bracket), and solves the saturation condition (equal pressure and equal
 * Gibbs energy of the two phases; Newton in the two reduced densities, the
 * formulation of Akasaka 2008, J. Therm. Sci. Technol. 3, 442 - from memory)
 * from the auxiliary equations of Wagner and Pruss 1993 (J. Phys. Chem. Ref.
 * Data 22, 783; IAPWS supplementary release on saturation properties 1992).
 *
 * Coefficients: from memory of IAPWS R6-95(2018) Tables 1 and 2, each one
 * compared digit by digit with the tables carried by the Debian package
 * python3-iapws 1.5.3 (iapws/iapws95.py, class IAPWS95) - see
 * tests/ref/test_water_iapws.py, which repeats that comparison. */
#include "water/water_internal.h"
#include "core/status.h"
#include "num/num.h"
#include <math.h>

/* ---- ideal-gas part: IAPWS R6-95(2018) Table 1 (from memory, checked) ---- */
/* n1, n2 are the 2018 values that make u = s = 0 for the saturated liquid
 * at the triple point. */
static const double IG_N1 = -8.3204464837497;
static const double IG_N2 = 6.6832105275932;
static const double IG_N3 = 3.00632;
static const double IG_N[5] = {0.012436, 0.97315, 1.2795, 0.96956, 0.24873};
static const double IG_GAMMA[5] = {1.28728967, 3.53734222, 7.74073708, 9.24437796,
                                   27.5075105};

/* ---- residual part: IAPWS R6-95(2018) Table 2 (from memory, checked) ----- */
/* Terms 1-7: n delta^d tau^t; t is a multiple of 1/8, stored as 8 t. */
static const double R_N1[7] = {0.12533547935523e-1, 0.78957634722828e1,
                               -0.87803203303561e1, 0.31802509345418,
                               -0.26145533859358,   -0.78199751687981e-2,
                               0.88089493102134e-2};
static const int R_D1[7] = {1, 1, 1, 2, 2, 3, 4};
static const int R_T8[7] = {-4, 7, 8, 4, 6, 3, 8}; /* t = -0.5 .. 1 in eighths */

/* Terms 8-51: n delta^d tau^t exp(-delta^c). */
#define R_NEXP 44
static const double R_N2[R_NEXP] = {
    -0.66856572307965,    0.20433810950965,     -0.66212605039687e-4,
    -0.19232721156002,    -0.25709043003438,    0.16074868486251,
    -0.40092828925807e-1, 0.39343422603254e-6,  -0.75941377088144e-5,
    0.56250979351888e-3,  -0.15608652257135e-4, 0.11537996422951e-8,
    0.36582165144204e-6,  -0.13251180074668e-11, -0.62639586912454e-9,
    -0.10793600908932,    0.17611491008752e-1,  0.22132295167546,
    -0.40247669763528,    0.58083399985759,     0.49969146990806e-2,
    -0.31358700712549e-1, -0.74315929710341,    0.47807329915480,
    0.20527940895948e-1,  -0.13636435110343,    0.14180634400617e-1,
    0.83326504880713e-2,  -0.29052336009585e-1, 0.38615085574206e-1,
    -0.20393486513704e-1, -0.16554050063734e-2, 0.19955571979541e-2,
    0.15870308324157e-3,  -0.16388568342530e-4, 0.43613615723811e-1,
    0.34994005463765e-1,  -0.76788197844621e-1, 0.22446277332006e-1,
    -0.62689710414685e-4, -0.55711118565645e-9, -0.19905718354408,
    0.31777497330738,     -0.11841182425981};
static const int R_C2[R_NEXP] = {1, 1, 1, 1, 1, 1, 1, 1, 1, 1, 1, 1, 1, 1, 1,
                                 2, 2, 2, 2, 2, 2, 2, 2, 2, 2, 2, 2, 2, 2, 2,
                                 2, 2, 2, 2, 2, 3, 3, 3, 3, 4, 6, 6, 6, 6};
static const int R_D2[R_NEXP] = {1, 1, 1, 2, 2, 3, 4, 4, 5, 7, 9, 10, 11, 13, 15,
                                 1, 2, 2, 2, 3, 4, 4, 4, 5, 6, 6, 7, 9, 9, 9,
                                 9, 9, 10, 10, 12, 3, 4, 4, 5, 14, 3, 6, 6, 6};
static const int R_T2[R_NEXP] = {4, 6, 12, 1, 5, 4, 2, 13, 9, 3, 4, 11, 4, 13, 1,
                                 7, 1, 9, 10, 10, 3, 7, 10, 10, 6, 10, 10, 1, 2, 3,
                                 4, 8, 6, 9, 8, 16, 22, 23, 23, 10, 50, 44, 46, 50};

/* Terms 52-54: Gaussian bell terms n delta^d tau^t exp(-alpha (delta-eps)^2
 * - beta (tau-gamma)^2), d = 3, eps = 1, alpha = 20 for all three. */
static const double R_N3[3] = {-0.31306260323435e2, 0.31546140237781e2,
                               -0.25213154341695e4};
static const int R_T3[3] = {0, 1, 4};
static const double R_BETA3[3] = {150.0, 150.0, 250.0};
static const double R_GAMMA3[3] = {1.21, 1.21, 1.25};
static const double R_ALPHA3 = 20.0;
static const double R_EPS3 = 1.0;
static const int R_D3 = 3;

/* Terms 55-56: non-analytic terms n Delta^b delta psi (critical region). */
static const double R_N4[2] = {-0.14874640856724, 0.31806110878444};
static const double R_A4[2] = {3.5, 3.5};
static const double R_B4[2] = {0.85, 0.95};
static const double R_BB4[2] = {0.2, 0.2};   /* B */
static const double R_C4[2] = {28.0, 32.0};  /* C */
static const double R_DD4[2] = {700.0, 800.0}; /* D */
static const double R_AA4[2] = {0.32, 0.32}; /* A */
static const double R_BETA4[2] = {0.3, 0.3}; /* beta */

/* ---- auxiliary saturation equations (Wagner and Pruss 1993; IAPWS
 * supplementary release on saturation properties 1992), from memory,
 * checked against python3-iapws IAPWS95._Pv/_rhoL/_rhoG ----------------- */
static const double AUX_PC = 22.064e6; /* Pa, critical pressure (IAPWS R6-95) */
static const double AUX_A[6] = {-7.85951783, 1.84408259, -11.7866497, 22.6807411,
                                -15.9618719, 1.80122502};
static const double AUX_B[6] = {1.99274064, 1.09965342, -0.510839303, -1.75493479,
                                -45.5170352, -6.74694450e5};
static const double AUX_C[6] = {-2.03150240, -2.68302940, -5.38626492, -17.2991605,
                                -44.7586581, -63.9201063};

/* Ideal-gas part and derivatives: IAPWS R6-95 Table 4. */
void px_water_phi0_eval(double delta, double tau, px_water_helmholtz *h)
{
    double phi = log(delta) + IG_N1 + IG_N2 * tau + IG_N3 * log(tau);
    double phit = IG_N2 + IG_N3 / tau;
    double phitt = -IG_N3 / (tau * tau);
    for (int i = 0; i < 5; i++) {
        double e = exp(-IG_GAMMA[i] * tau);
        double ome = -expm1(-IG_GAMMA[i] * tau); /* 1 - e, accurate */
        phi += IG_N[i] * log(ome);
        phit += IG_N[i] * IG_GAMMA[i] * (1.0 / ome - 1.0);
        phitt -= IG_N[i] * IG_GAMMA[i] * IG_GAMMA[i] * e / (ome * ome);
    }
    h->delta = delta;
    h->tau = tau;
    h->phi0 = phi;
    h->phi0_d = 1.0 / delta;
    h->phi0_dd = -1.0 / (delta * delta);
    h->phi0_t = phit;
    h->phi0_tt = phitt;
    h->phi0_dt = 0.0;
}

/* Residual part and derivatives: IAPWS R6-95 Table 5 (derivative formulas of
 * the four kinds of terms). */
void px_water_phir_eval(double delta, double tau, px_water_helmholtz *h)
{
    double dpow[16], tpow[51], t8pow[13];
    dpow[0] = 1.0;
    for (int k = 1; k < 16; k++) dpow[k] = dpow[k - 1] * delta;
    tpow[0] = 1.0;
    for (int k = 1; k < 51; k++) tpow[k] = tpow[k - 1] * tau;
    double t8 = sqrt(sqrt(sqrt(tau))); /* tau^(1/8) */
    t8pow[4] = 1.0;                   /* index k+4 holds tau^(k/8), k = -4..8 */
    for (int k = 1; k <= 8; k++) t8pow[4 + k] = t8pow[3 + k] * t8;
    for (int k = 1; k <= 4; k++) t8pow[4 - k] = t8pow[5 - k] / t8;

    /* Sums before the common division by delta, tau (see the return block). */
    double s = 0, sd = 0, sdd = 0, st = 0, stt = 0, sdt = 0;

    for (int i = 0; i < 7; i++) {
        double d = R_D1[i], t = R_T8[i] / 8.0;
        double v = R_N1[i] * dpow[R_D1[i]] * t8pow[4 + R_T8[i]];
        s += v;
        sd += v * d;
        sdd += v * d * (d - 1.0);
        st += v * t;
        stt += v * t * (t - 1.0);
        sdt += v * d * t;
    }

    double ec[7]; /* exp(-delta^c) for c = 1, 2, 3, 4, 6 */
    ec[1] = exp(-delta);
    ec[2] = exp(-dpow[2]);
    ec[3] = exp(-dpow[3]);
    ec[4] = exp(-dpow[4]);
    ec[6] = exp(-dpow[6]);
    ec[0] = ec[5] = 0.0;
    for (int i = 0; i < R_NEXP; i++) {
        int c = R_C2[i];
        double d = R_D2[i], t = R_T2[i], dc = c * dpow[c];
        double v = R_N2[i] * dpow[R_D2[i]] * tpow[R_T2[i]] * ec[c];
        double a = d - dc;
        s += v;
        sd += v * a;
        sdd += v * (a * (a - 1.0) - c * dc);
        st += v * t;
        stt += v * t * (t - 1.0);
        sdt += v * a * t;
    }

    double phir = s, phir_d = sd / delta, phir_dd = sdd / (delta * delta);
    double phir_t = st / tau, phir_tt = stt / (tau * tau), phir_dt = sdt / (delta * tau);

    for (int i = 0; i < 3; i++) {
        double dd = delta - R_EPS3, tt = tau - R_GAMMA3[i];
        double t = R_T3[i];
        double e = exp(-R_ALPHA3 * dd * dd - R_BETA3[i] * tt * tt);
        double v = R_N3[i] * dpow[R_D3] * tpow[R_T3[i]] * e;
        double fd = R_D3 / delta - 2.0 * R_ALPHA3 * dd;        /* d ln(v)/d delta */
        double ft = t / tau - 2.0 * R_BETA3[i] * tt;           /* d ln(v)/d tau */
        phir += v;
        phir_d += v * fd;
        phir_dd += v * (fd * fd - R_D3 / (delta * delta) - 2.0 * R_ALPHA3);
        phir_t += v * ft;
        phir_tt += v * (ft * ft - t / (tau * tau) - 2.0 * R_BETA3[i]);
        phir_dt += v * fd * ft;
    }

    for (int i = 0; i < 2; i++) {
        double a = R_A4[i], b = R_B4[i], B = R_BB4[i], C = R_C4[i], D = R_DD4[i];
        double A = R_AA4[i], beta = R_BETA4[i];
        double dm1 = delta - 1.0, tm1 = tau - 1.0, sq = dm1 * dm1;
        double p1 = 1.0 / (2.0 * beta);
        /* s^(p1-1), s^(a-1), s^(2 p1 - 1): all exponents positive */
        double sp1m1 = sq > 0 ? pow(sq, p1 - 1.0) : 0.0;
        double sam1 = sq > 0 ? pow(sq, a - 1.0) : 0.0;
        double theta = -tm1 + A * sq * sp1m1;     /* (1 - tau) + A s^(1/(2 beta)) */
        double Delta = theta * theta + B * sq * sam1;
        double psi = exp(-C * sq - D * tm1 * tm1);
        double q1 = A * theta * (2.0 / beta) * sp1m1 + 2.0 * B * a * sam1;
        double Dd = dm1 * q1;                     /* dDelta/ddelta */
        double Ddd = q1 + 4.0 * B * a * (a - 1.0) * sam1 +
                     2.0 * A * A / (beta * beta) * sq * sp1m1 * sp1m1 +
                     A * theta * (4.0 / beta) * (p1 - 1.0) * sp1m1;
        double Db = pow(Delta, b);
        double Db1 = pow(Delta, b - 1.0);
        double Db2 = Db1 / Delta;
        double Dbd = b * Db1 * Dd;
        double Dbdd = b * (Db1 * Ddd + (b - 1.0) * Db2 * Dd * Dd);
        double Dbt = -2.0 * theta * b * Db1;
        double Dbtt = 2.0 * b * Db1 + 4.0 * theta * theta * b * (b - 1.0) * Db2;
        double Dbdt = -A * b * (2.0 / beta) * Db1 * dm1 * sp1m1 -
                      2.0 * theta * b * (b - 1.0) * Db2 * Dd;
        double psid = -2.0 * C * dm1 * psi;
        double psidd = (2.0 * C * sq - 1.0) * 2.0 * C * psi;
        double psit = -2.0 * D * tm1 * psi;
        double psitt = (2.0 * D * tm1 * tm1 - 1.0) * 2.0 * D * psi;
        double psidt = 4.0 * C * D * dm1 * tm1 * psi;
        double n = R_N4[i];
        phir += n * Db * delta * psi;
        phir_d += n * (Db * (psi + delta * psid) + Dbd * delta * psi);
        phir_dd += n * (Db * (2.0 * psid + delta * psidd) + 2.0 * Dbd * (psi + delta * psid) +
                        Dbdd * delta * psi);
        phir_t += n * delta * (Dbt * psi + Db * psit);
        phir_tt += n * delta * (Dbtt * psi + 2.0 * Dbt * psit + Db * psitt);
        phir_dt += n * (Db * (psit + delta * psidt) + delta * Dbd * psit +
                        Dbt * (psi + delta * psid) + Dbdt * delta * psi);
    }

    h->delta = delta;
    h->tau = tau;
    h->phir = phir;
    h->phir_d = phir_d;
    h->phir_dd = phir_dd;
    h->phir_t = phir_t;
    h->phir_tt = phir_tt;
    h->phir_dt = phir_dt;
}

/* Pressure and its first derivatives: IAPWS R6-95 Table 3 (p) and its
 * differentiation. */
void px_water_pvt_eval(double T, double rho, px_water_pvt *out)
{
    px_water_helmholtz h;
    double delta = rho / PX_WATER_RHOC, tau = PX_WATER_TC / T;
    px_water_phir_eval(delta, tau, &h);
    double dpd = delta * h.phir_d;
    out->P = rho * PX_WATER_R * T * (1.0 + dpd);
    out->dP_drho = PX_WATER_R * T * (1.0 + 2.0 * dpd + delta * delta * h.phir_dd);
    out->dP_dT = rho * PX_WATER_R * (1.0 + dpd - delta * tau * h.phir_dt);
}

/* ln(psat/pc) = (Tc/T) sum a_i theta^e_i: Wagner and Pruss 1993, eq. 2.5. */
double px_water_psat_aux(double T)
{
    double th = 1.0 - T / PX_WATER_TC;
    double sth = sqrt(th);
    double th3 = th * th * th;
    double sum = AUX_A[0] * th + AUX_A[1] * th * sth + AUX_A[2] * th3 + AUX_A[3] * th3 * sth +
                 AUX_A[4] * th3 * th + AUX_A[5] * th3 * th3 * th * sth;
    return AUX_PC * exp(PX_WATER_TC / T * sum);
}

/* rho'/rhoc = 1 + sum b_i theta^(k_i/3): Wagner and Pruss 1993, eq. 2.6. */
double px_water_rhol_aux(double T)
{
    double th = 1.0 - T / PX_WATER_TC;
    double c = cbrt(th); /* theta^(1/3) */
    double c2 = c * c, c5 = c2 * c2 * c, c16 = pow(c, 16.0), c43 = pow(c, 43.0),
           c110 = pow(c, 110.0);
    return PX_WATER_RHOC * (1.0 + AUX_B[0] * c + AUX_B[1] * c2 + AUX_B[2] * c5 +
                            AUX_B[3] * c16 + AUX_B[4] * c43 + AUX_B[5] * c110);
}

/* ln(rho''/rhoc) = sum c_i theta^(k_i/6): Wagner and Pruss 1993, eq. 2.7. */
double px_water_rhov_aux(double T)
{
    double th = 1.0 - T / PX_WATER_TC;
    double s = pow(th, 1.0 / 6.0);
    double s2 = s * s, s4 = s2 * s2, s8 = s4 * s4;
    double sum = AUX_C[0] * s2 + AUX_C[1] * s4 + AUX_C[2] * s8 + AUX_C[3] * pow(s, 18.0) +
                 AUX_C[4] * pow(s, 37.0) + AUX_C[5] * pow(s, 71.0);
    return PX_WATER_RHOC * exp(sum);
}

/* Saturation: equal pressure and Gibbs energy in both phases, written in the
 * reduced densities as J(dL) = J(dV), K(dL) = K(dV) with J = d(1 + d phir_d),
 * K = d phir_d + phir + ln d (Akasaka 2008), solved by Newton from the
 * auxiliary densities. */
#define SAT_MAX_ITER 50     /* iteration cap; 4-6 are typical (choice, no source) */
#define SAT_EPSREL 1e-12    /* stop when both relative steps are below this */
int px_water_sat_solve(double T, double *P_pa, double *rho_l, double *rho_v)
{
    double tau = PX_WATER_TC / T;
    double dl = px_water_rhol_aux(T) / PX_WATER_RHOC;
    double dv = px_water_rhov_aux(T) / PX_WATER_RHOC;
    if (!(isfinite(dl) && isfinite(dv) && dl > dv && dv > 0)) return PX_EINVAL;
    for (int it = 0; it < SAT_MAX_ITER; it++) {
        px_water_helmholtz hl, hv;
        px_water_phir_eval(dl, tau, &hl);
        px_water_phir_eval(dv, tau, &hv);
        double jl = dl * (1.0 + dl * hl.phir_d), jv = dv * (1.0 + dv * hv.phir_d);
        double kl = dl * hl.phir_d + hl.phir + log(dl), kv = dv * hv.phir_d + hv.phir + log(dv);
        double jdl = 1.0 + 2.0 * dl * hl.phir_d + dl * dl * hl.phir_dd;
        double jdv = 1.0 + 2.0 * dv * hv.phir_d + dv * dv * hv.phir_dd;
        double kdl = 2.0 * hl.phir_d + dl * hl.phir_dd + 1.0 / dl;
        double kdv = 2.0 * hv.phir_d + dv * hv.phir_dd + 1.0 / dv;
        double det = jdv * kdl - jdl * kdv;
        if (!isfinite(det) || det == 0.0) return PX_ENOCONV;
        double stepl = ((kv - kl) * jdv - (jv - jl) * kdv) / det;
        double stepv = ((kv - kl) * jdl - (jv - jl) * kdl) / det;
        double ndl = dl + stepl, ndv = dv + stepv;
        if (!(isfinite(ndl) && isfinite(ndv) && ndv > 0 && ndl > ndv)) return PX_ENOCONV;
        dl = ndl;
        dv = ndv;
        if (fabs(stepl) <= SAT_EPSREL * dl && fabs(stepv) <= SAT_EPSREL * dv) {
            /* The pressure is taken on the vapour side: on the liquid side
             * 1 + delta phir_d is a difference of numbers near 1 that cancel
             * to ~1e-6 at low T, which leaves ~1e-8 relative noise in P. */
            px_water_helmholtz h;
            px_water_phir_eval(dv, tau, &h);
            double rl = dl * PX_WATER_RHOC;
            double p = dv * PX_WATER_RHOC * PX_WATER_R * T * (1.0 + dv * h.phir_d);
            if (!isfinite(p) || p <= 0) return PX_ENOCONV;
            if (P_pa) *P_pa = p;
            if (rho_l) *rho_l = rl;
            if (rho_v) *rho_v = dv * PX_WATER_RHOC;
            return PX_OK;
        }
    }
    return PX_ENOCONV;
}

px_water_options px_water_options_default(void)
{
    px_water_options o = {1e-12, 50};
    return o;
}

/* Liquid root of P(rho) = P_pa at fixed T: Newton's method kept inside
 * [lo, hi] (num/num.h, px_num_root_newton), which shrinks with every
 * evaluation (a point with P < P_pa on the mechanically stable branch, or
 * any point with dP/drho <= 0, i.e. inside the spinodal, is a lower bound;
 * a stable point with P > P_pa is an upper bound).  A Newton step leaving
 * the bracket is replaced by bisection. */
#define DENS_LO_FACTOR 0.8 /* lower bound: 0.8 x the saturated-liquid density
                              (choice of this module: below every liquid root
                              for P >= psat and T <= 646 K) */
typedef struct dens_ctx {
    double T, P_pa;
} dens_ctx;

static int dens_fdf(double rho, void *user, double *f, double *df)
{
    const dens_ctx *c = user;
    px_water_pvt p;
    px_water_pvt_eval(c->T, rho, &p);
    *f = p.P - c->P_pa;
    *df = p.dP_drho;
    return PX_OK;
}

int px_water_density_solve(double T, double P_pa, double guess, const px_water_options *opt,
                           double *rho, px_water_stats *stats)
{
    px_water_options o = opt ? *opt : px_water_options_default();
    if (!(o.epsrel > 0 && o.epsrel < 1e-2) || o.max_iter < 1) return PX_EINVAL;
    double rl = px_water_rhol_aux(T);
    if (!isfinite(rl)) rl = PX_WATER_RHOC;
    double lo = DENS_LO_FACTOR * rl, hi = PX_WATER_RHOMAX;
    double x = (guess > lo && guess < hi) ? guess : rl;
    dens_ctx c = {T, P_pa};
    px_num_root_options ro = {0.0, o.epsrel, 0.0, o.max_iter};
    px_num_root_stats rs;
    double r;
    int st = px_num_root_newton(dens_fdf, &c, lo, hi, x, &ro, &r, &rs);
    if (st == PX_OK) *rho = r;
    if ((st == PX_OK || st == PX_ENOCONV) && stats)
        *stats = (px_water_stats){rs.iterations, rs.bisections, rs.residual / P_pa};
    return st;
}
