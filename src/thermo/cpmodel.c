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
#include <stdio.h>

#include "core/constants.h"
#include "core/status.h"
#include "thermo/thermo.h"

/* Kopp's rule atomic heat capacities of elements in solids, cal/(g-atom K):
 * from memory of Kopp 1865 (Phil. Trans. R. Soc. London 155, 71) as tabulated
 * in Perry's Chemical Engineers' Handbook ("Kopp's rule"); x PX_CAL. */
#define KOPP_C 1.8
#define KOPP_H 2.3
#define KOPP_B 2.7
#define KOPP_SI 3.8
#define KOPP_O 4.0
#define KOPP_F 5.0
#define KOPP_P 5.4
#define KOPP_S 5.4
#define KOPP_OTHER 6.2
/* a component may hold this much more of an element than the species
 * (rounding of decimal counts) */
#define KOPP_COUNT_TOL 1e-9

double px_kopp_atomic_cp(int z)
{
    double cal;
    switch (z) {
    case 6: cal = KOPP_C; break;
    case 1: cal = KOPP_H; break;
    case 5: cal = KOPP_B; break;
    case 14: cal = KOPP_SI; break;
    case 8: cal = KOPP_O; break;
    case 9: cal = KOPP_F; break;
    case 15: cal = KOPP_P; break;
    case 16: cal = KOPP_S; break;
    default:
        if (z < 1 || z > PX_ELEMENT_MAX)
            return NAN;
        cal = KOPP_OTHER;
    }
    return cal * PX_CAL;
}

int px_cp_kopp(const px_formula *f, int n, const px_formula *comp, const double *nu,
               const px_cp_params *comp_cp, px_cp_params *out, char *msg, size_t msgsize)
{
    if (!f || !out || n < 0 || (n > 0 && (!comp || !nu || !comp_cp)))
        return PX_EINVAL;
    if (msg && msgsize)
        msg[0] = '\0';
    if (f->charge != 0) {
        if (msg)
            snprintf(msg, msgsize, "%s: Kopp-Neumann additivity is for neutral solids", f->text);
        return PX_EDATA;
    }
    double rest[PX_ELEMENT_MAX + 1] = {0};
    for (int j = 0; j < f->n_elem; j++)
        rest[f->elem[j].z] += f->elem[j].n;
    double a = 0, b = 0, c = 0, d = 0, e = 0;
    for (int i = 0; i < n; i++) {
        if (!(nu[i] > 0) || !isfinite(nu[i])) {
            if (msg)
                snprintf(msg, msgsize, "%s: amount of %s must be positive", f->text, comp[i].text);
            return PX_EDATA;
        }
        for (int j = 0; j < comp[i].n_elem; j++)
            rest[comp[i].elem[j].z] -= nu[i] * comp[i].elem[j].n;
        /* Kopp-Neumann: Cp of the compound = sum of its components' Cp */
        a += nu[i] * comp_cp[i].a;
        b += nu[i] * comp_cp[i].b;
        c += nu[i] * comp_cp[i].c;
        d += nu[i] * comp_cp[i].d;
        e += nu[i] * comp_cp[i].e;
    }
    for (int z = 1; z <= PX_ELEMENT_MAX; z++) {
        if (rest[z] < -KOPP_COUNT_TOL) {
            if (msg)
                snprintf(msg, msgsize, "%s: the components hold %g more %s than the species",
                         f->text, -rest[z], px_element_symbol(z));
            return PX_EDATA;
        }
        if (rest[z] > KOPP_COUNT_TOL) /* the remainder: Kopp's atomic heats (Kopp 1865) */
            a += rest[z] * px_kopp_atomic_cp(z);
    }
    out->a = a;
    out->b = b;
    out->c = c;
    out->d = d;
    out->e = e;
    return PX_OK;
}

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
