/* equil_activity.c - activity coefficients of aqueous species as functions
 * of the ionic strength I, with their derivatives d log10(gamma)/d log10(I)
 * for the solver's Jacobian.
 *
 *   Davies:  log g = -A z^2 ( sqrt(I)/(1+sqrt(I)) - 0.3 I )
 *            (Davies 1962, Ion Association, Butterworths; from memory)
 *   B-dot:   log g = -A z^2 sqrt(I)/(1 + a B sqrt(I)) + Bdot I
 *            (Helgeson 1969, Am. J. Sci. 267:729-804)
 *   SIT:     log g = -z^2 D + sum_k eps(j,k) m_k,  D = A sqrt(I)/(1 + 1.5 sqrt(I))
 *            (Brønsted 1922; Guggenheim and Turgeon 1955; Scatchard 1936;
 *             as used in Grenthe, Plyasunov and Spahiu 1997, NEA-TDB guidelines)
 * Neutral species: 0, or b I (the "salting-out" rule, common practice, no
 * source).  The sum over eps(j,k) m_k is lagged by the solver (evaluated
 * from the previous iterate); the I-dependent part enters the Jacobian. */
#include "equil_internal.h"
#include <math.h>

/* Davies 1962 (Ion Association): coefficient of the linear term. */
#define PX_DAVIES_LINEAR 0.3
/* SIT: B a_j = 1.5 kg^0.5 mol^-0.5 for every ion at 25 C (Scatchard 1936;
 * Grenthe, Plyasunov and Spahiu 1997, NEA-TDB guidelines; from memory). */
#define PX_SIT_BA 1.5
#define LN10 2.302585092994045684

double px_equil_davies_factor(double I)
{
    double s = sqrt(I);
    return s / (1.0 + s) - PX_DAVIES_LINEAR * I;
}

double px_equil_davies_log_gamma(double A, int z, double I)
{
    if (!(I > 0)) return 0.0;
    return -A * z * z * px_equil_davies_factor(I);
}

void px_equil_gamma(const px_equil_system *sys, const unsigned char *absent,
                    double I, const double *lag, double *g, double *dg)
{
    const px_equil_activity *a = &sys->act;
    double s = sqrt(I);
    /* the I-dependent factors shared by all ions of a model */
    double fd = px_equil_davies_factor(I);
    double dfd = LN10 * (s / (2.0 * (1.0 + s) * (1.0 + s)) - PX_DAVIES_LINEAR * I);
    double ds = 1.0 + PX_SIT_BA * s;
    double fs = a->A * s / ds, dfs = a->A * LN10 * s * 0.5 / (ds * ds);
    for (size_t j = 0; j < sys->ns; j++) {
        g[j] = 0.0;
        dg[j] = 0.0;
        if (sys->phase[j] != PX_EQUIL_AQ || (absent && absent[j])) continue;
        double z = sys->z[j], z2 = z * z;
        if (z == 0.0) {
            if (a->neutral == PX_EQUIL_NEUTRAL_SALTING) {
                g[j] = a->b_neutral * I;
                dg[j] = a->b_neutral * I * LN10;
            }
        } else {
            switch (a->model) {
            case PX_EQUIL_DAVIES:
                /* d/dlog10 I of sqrt(I)/(1+sqrt(I)) = ln10 sqrt(I) / (2 (1+sqrt(I))^2) */
                g[j] = -a->A * z2 * fd;
                dg[j] = -a->A * z2 * dfd;
                break;
            case PX_EQUIL_BDOT: {
                double d = 1.0 + sys->size[j] * a->B * s;
                g[j] = -a->A * z2 * s / d + a->bdot * I;
                dg[j] = LN10 * (-a->A * z2 * s * 0.5 / (d * d) + a->bdot * I);
                break;
            }
            case PX_EQUIL_SIT:
                g[j] = -z2 * fs;
                dg[j] = -z2 * dfs;
                break;
            default: break;
            }
        }
        if (lag) g[j] += lag[j];
    }
}

void px_equil_sit_sum(const px_equil_system *sys, const double *m, double *out)
{
    for (size_t j = 0; j < sys->ns; j++) out[j] = 0.0;
    for (size_t p = 0; p < sys->n_sit; p++) {
        size_t j = sys->sit_j[p], k = sys->sit_k[p];
        out[j] += sys->sit_eps[p] * m[k];
        if (k != j) out[k] += sys->sit_eps[p] * m[j];
    }
}
