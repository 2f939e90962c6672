/* bench_water.c - cost of px_water_state_eval at fresh (T, P) points.
 *
 * Times px_water_state_eval (analytic Helmholtz derivatives, Newton density
 * root, analytic first derivatives of eps, one central difference for
 * d2eps/dT2) over N distinct (T, P) points spread over the working range,
 * and compares it in the same run with a plain reference that computes the
 * same quantities the textbook way: only the value of the Helmholtz function
 * f(T, rho), pressure by a central difference in rho, density by the secant
 * method, S, Cp, (drho/dT)_P, (drho/dP)_T and the eps derivatives all by
 * central differences of repeated density solves.  Prints microseconds per
 * call, the ratio, and the largest differences between the two (they must
 * agree to the differencing error, ~1e-6). */
#include "water/water.h"
#include "../tests/support/px_rng.h"
#include <math.h>
#include <stdint.h>
#include <stdio.h>
#include <time.h>

#define N_POINTS 2000

static double now(void)
{
    struct timespec ts;
    timespec_get(&ts, TIME_UTC);
    return ts.tv_sec + 1e-9 * ts.tv_nsec;
}


/* ---- the plain reference ---------------------------------------------- */

/* f(T, rho) in J/kg from the Helmholtz function's value only. */
static double helm_f(double T, double rho)
{
    px_water_helmholtz h;
    if (px_water_helmholtz_eval(T, rho, &h) != PX_OK) return NAN;
    return PX_WATER_R * T * (h.phi0 + h.phir);
}

/* P = rho^2 (df/drho)_T, central difference; Pa. */
static double plain_P(double T, double rho)
{
    double h = 1e-5 * rho;
    return rho * rho * (helm_f(T, rho + h) - helm_f(T, rho - h)) / (2 * h);
}

/* Secant method on P(rho) = P from 1000 and 1001 kg/m3. */
static double plain_rho(double T, double P_bar)
{
    double P = P_bar * 1e5, x0 = 1000.0, x1 = 1001.0;
    double f0 = plain_P(T, x0) - P, f1 = plain_P(T, x1) - P;
    for (int i = 0; i < 100 && fabs(x1 - x0) > 1e-10 * x1; i++) {
        double x2 = x1 - f1 * (x1 - x0) / (f1 - f0);
        x0 = x1;
        f0 = f1;
        x1 = x2;
        f1 = plain_P(T, x1) - P;
    }
    return x1;
}

static double plain_s(double T, double rho) /* s = -(df/dT)_rho */
{
    double h = 1e-3;
    return -(helm_f(T + h, rho) - helm_f(T - h, rho)) / (2 * h);
}

static double plain_eps(double T, double rho)
{
    double e = NAN;
    px_water_dielectric(T, rho, &e);
    return e;
}

typedef struct plain_state {
    double rho, drho_dT, drho_dP, S, Cp, eps, deps_dT, deps_dP, d2eps_dT2, X;
} plain_state;

static void plain_eval(double T, double P, plain_state *o)
{
    const double hT = 0.05, hP = 0.05;
    double r = plain_rho(T, P), rp = plain_rho(T + hT, P), rm = plain_rho(T - hT, P);
    double rpp = plain_rho(T, P + hP), rpm = plain_rho(T, P - hP);
    double M = PX_WATER_M;
    o->rho = r;
    o->drho_dT = (rp - rm) / (2 * hT);
    o->drho_dP = (rpp - rpm) / (2 * hP);
    o->S = M * plain_s(T, r);
    o->Cp = M * T * (plain_s(T + hT, rp) - plain_s(T - hT, rm)) / (2 * hT);
    double e = plain_eps(T, r), ep = plain_eps(T + hT, rp), em = plain_eps(T - hT, rm);
    o->eps = e;
    o->deps_dT = (ep - em) / (2 * hT);
    o->deps_dP = (plain_eps(T, rpp) - plain_eps(T, rpm)) / (2 * hP);
    o->d2eps_dT2 = (ep - 2 * e + em) / (hT * hT);
    o->X = (o->d2eps_dT2 - 2 / e * o->deps_dT * o->deps_dT) / (e * e);
}

static double rel(double a, double b) { return fabs(a - b) / fabs(b); }

int main(void)
{
    static double Ts[N_POINTS], Ps[N_POINTS];
    px_rng rng; /* deterministic points (tests/support/px_rng.h) */
    px_rng_seed(&rng, 20240611u);
    for (int i = 0; i < N_POINTS; i++) { /* T uniform, P between psat+1 and 1000 bar */
        double T = PX_WATER_TMIN + (PX_WATER_TMAX - PX_WATER_TMIN) * px_rng_uniform(&rng), ps;
        if (px_water_psat(T, &ps) != PX_OK) return 1;
        Ts[i] = T;
        Ps[i] = fmax(ps, 1.0) + 1.0 + (PX_WATER_PMAX - 2.0 - fmax(ps, 1.0)) * px_rng_uniform(&rng);
    }

    double sink = 0;
    px_water_state s;
    double t0 = now();
    for (int i = 0; i < N_POINTS; i++) {
        if (px_water_state_eval(Ts[i], Ps[i], PX_DIELECTRIC_R8_97, &s) != PX_OK) {
            printf("bench_water: px_water_state_eval failed at %g K %g bar\n", Ts[i], Ps[i]);
            return 1;
        }
        sink += s.X;
    }
    double t_fast = (now() - t0) / N_POINTS;

    const int n_plain = N_POINTS / 10; /* the plain reference is slow */
    plain_state p;
    double dr = 0, dcp = 0, deps = 0, dx = 0, dy = 0;
    t0 = now();
    for (int i = 0; i < n_plain; i++) {
        plain_eval(Ts[i], Ps[i], &p);
        sink += p.X;
    }
    double t_plain = (now() - t0) / n_plain;
    for (int i = 0; i < n_plain; i++) {
        plain_eval(Ts[i], Ps[i], &p);
        px_water_state_eval(Ts[i], Ps[i], PX_DIELECTRIC_R8_97, &s);
        dr = fmax(dr, rel(p.rho, s.rho));
        dcp = fmax(dcp, rel(p.Cp, s.Cp));
        deps = fmax(deps, rel(p.eps, s.eps));
        dy = fmax(dy, rel(p.deps_dT, s.deps_dT));
        dx = fmax(dx, rel(p.X, s.X));
    }

    printf("bench_water: px_water_state_eval over %d fresh (T, P) points, 273-623 K, psat-1000 bar\n",
           N_POINTS);
    printf("  px_water_state_eval        %9.2f us/call\n", 1e6 * t_fast);
    printf("  plain finite differences   %9.2f us/call (%d points)\n", 1e6 * t_plain, n_plain);
    printf("  ratio plain/px_water       %9.1f\n", t_plain / t_fast);
    printf("  largest relative difference plain vs px_water: rho %.1e, Cp %.1e, eps %.1e, "
           "deps/dT %.1e, X %.1e\n", dr, dcp, deps, dy, dx);
    printf("  (checksum %.6g)\n", sink);
    return 0;
}
