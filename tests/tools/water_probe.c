/* water_probe.c - a tiny command-line probe of the water module, for
 * tests/ref/test_water_iapws.py (comparison with python3-iapws).  Not part
 * of the phlox program and not installed.
 *
 * Reads one request per line on stdin and answers one line on stdout: the
 * status code followed by the values, each printed with %.17g so the
 * comparison sees the full double.
 *   state T P      rho drho_dT drho_dP G H S Cp V eps deps_dT deps_dP
 *                  d2eps_dT2 Q Y X A_gamma B_gamma dA_dT dB_dT
 *   density T P    rho
 *   sat T          P_bar rho_liq rho_vap
 *   props T rho    P_bar u h s g cv cp w
 *   helm T rho     phi0 phi0_d phi0_dd phi0_t phi0_tt phi0_dt
 *                  phir phir_d phir_dd phir_t phir_tt phir_dt
 *   eps T rho      eps
 *   pkw T rho      pKw
 * Units as in src/water/water.h (K, bar, kg/m3, J/mol, J/kg). */
#include "water/water.h"
#include <stdio.h>
#include <string.h>

static void put(int rc, const double *v, int n)
{
    printf("%d", rc);
    for (int i = 0; i < n && rc == PX_OK; i++) printf(" %.17g", v[i]);
    printf("\n");
}

int main(void)
{
    char line[512], cmd[32];
    double a, b;
    while (fgets(line, sizeof line, stdin)) {
        int n = sscanf(line, "%31s %lf %lf", cmd, &a, &b);
        if (n < 2) {
            printf("%d\n", PX_EINVAL);
            continue;
        }
        if (!strcmp(cmd, "state") && n == 3) {
            px_water_state s;
            int rc = px_water_state_eval(a, b, PX_DIELECTRIC_R8_97, &s);
            double v[] = {s.rho, s.drho_dT, s.drho_dP, s.G, s.H, s.S, s.Cp, s.V, s.eps,
                          s.deps_dT, s.deps_dP, s.d2eps_dT2, s.Q, s.Y, s.X, s.A_gamma,
                          s.B_gamma, s.dA_dT, s.dB_dT};
            put(rc, v, (int)(sizeof v / sizeof v[0]));
        } else if (!strcmp(cmd, "density") && n == 3) {
            double r = 0;
            int rc = px_water_density(a, b, &r);
            put(rc, &r, 1);
        } else if (!strcmp(cmd, "sat")) {
            double v[3] = {0};
            int rc = px_water_saturation(a, &v[0], &v[1], &v[2]);
            put(rc, v, 3);
        } else if (!strcmp(cmd, "props") && n == 3) {
            px_water_props p;
            int rc = px_water_props_eval(a, b, &p);
            double v[] = {p.P, p.u, p.h, p.s, p.g, p.cv, p.cp, p.w};
            put(rc, v, 8);
        } else if (!strcmp(cmd, "helm") && n == 3) {
            px_water_helmholtz h;
            int rc = px_water_helmholtz_eval(a, b, &h);
            double v[] = {h.phi0, h.phi0_d, h.phi0_dd, h.phi0_t, h.phi0_tt, h.phi0_dt,
                          h.phir, h.phir_d, h.phir_dd, h.phir_t, h.phir_tt, h.phir_dt};
            put(rc, v, 12);
        } else if (!strcmp(cmd, "eps") && n == 3) {
            double e = 0;
            int rc = px_water_dielectric(a, b, &e);
            put(rc, &e, 1);
        } else if (!strcmp(cmd, "pkw") && n == 3) {
            double k = 0;
            int rc = px_water_pkw(a, b, &k);
            put(rc, &k, 1);
        } else {
            printf("%d\n", PX_EINVAL);
        }
    }
    return 0;
}
