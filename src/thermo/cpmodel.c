/* cpmodel.c - standard properties of solids, liquids and gases from a
 * heat-capacity polynomial Cp = a + bT + c/T^2 + d/sqrt(T) + eT^2 (the
 * Maier and Kelley 1932 form a + bT + c/T^2 with two further terms),
 * integrated exactly from Tr = 298.15 K:
 *   H(T) - H(Tr) = int Cp dT,  S(T) - S(Tr) = int Cp/T dT,
 *   G(T) = dfG - S(Tr)(T - Tr) + int Cp dT - T int Cp/T dT.
 * Pressure: a gas's standard state is the ideal gas at 1 bar at every P (no
 * pressure term); a condensed phase adds V (P - Pr) with a constant molar
 * volume (incompressible, no thermal expansion), so V(P - Pr) adds to G and H. */
#include <math.h>

#include "core/constants.h"
#include "core/status.h"
#include "thermo/thermo.h"

int px_cp_props(const px_species *sp, double T, double P, px_thermo_props *out)
{
    if (!sp || !out || !(T > 0) || !isfinite(P))
        return PX_EINVAL;
    if (!isfinite(sp->dGf) || !isfinite(sp->S))
        return PX_EDATA;
    const px_cp_params *c = &sp->cp;
    const double Tr = PX_TR;
    double sT = sqrt(T), sTr = sqrt(Tr);
    /* int_Tr^T Cp dT */
    double dH = c->a * (T - Tr) + c->b / 2 * (T * T - Tr * Tr) - c->c * (1 / T - 1 / Tr) +
                2 * c->d * (sT - sTr) + c->e / 3 * (T * T * T - Tr * Tr * Tr);
    /* int_Tr^T Cp/T dT */
    double dS = c->a * log(T / Tr) + c->b * (T - Tr) - c->c / 2 * (1 / (T * T) - 1 / (Tr * Tr)) -
                2 * c->d * (1 / sT - 1 / sTr) + c->e / 2 * (T * T - Tr * Tr);
    double vterm = 0, V = 0;
    if (sp->f.state != PX_STATE_G) {
        V = c->V;
        vterm = V * (P - PX_PR);
    }
    out->G = sp->dGf - sp->S * (T - Tr) + dH - T * dS + vterm;
    out->S = sp->S + dS;
    out->H = (isfinite(sp->dHf) ? sp->dHf : NAN) + dH + vterm;
    out->Cp = c->a + c->b * T + c->c / (T * T) + c->d / sT + c->e * T * T;
    out->V = V;
    if (!isfinite(out->G) || !isfinite(out->S) || !isfinite(out->Cp))
        return PX_ENONFINITE;
    return PX_OK;
}
