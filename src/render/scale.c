/* scale.c - tick positions for linear and log axes (pure math, no cairo).
 * Steps are 1, 2 or 5 times a power of ten, the usual "nice numbers"
 * of chart axes (Heckbert 1990, "Nice numbers for graph labels", Graphics
 * Gems). */
#include "render/render.h"
#include <math.h>

#define PX_TICK_EPS 1e-9 /* relative slack so end points count as ticks */

static size_t fill(double a, double step, double b, size_t max, double *t)
{
    double k0 = ceil(a / step - PX_TICK_EPS), k1 = floor(b / step + PX_TICK_EPS);
    size_t n = 0;
    for (double k = k0; k <= k1 && n < max; k += 1.0) {
        double v = k * step;
        t[n++] = fabs(v) < step * PX_TICK_EPS ? 0.0 : v;
    }
    return n;
}

size_t px_ticks_linear(double a, double b, size_t max_ticks, double *ticks)
{
    static const double mant[] = {1.0, 2.0, 5.0};
    if (!(isfinite(a) && isfinite(b)) || max_ticks < 2 || !ticks) return 0;
    if (a > b) {
        double t = a;
        a = b;
        b = t;
    }
    if (b - a <= 0.0) {
        ticks[0] = a;
        return 1;
    }
    double range = b - a;
    double e = floor(log10(range / (double)max_ticks)) - 1.0;
    for (int iter = 0; iter < 8; iter++, e += 1.0) {
        for (size_t m = 0; m < sizeof mant / sizeof mant[0]; m++) {
            double step = mant[m] * pow(10.0, e);
            double count = floor(b / step + PX_TICK_EPS) - ceil(a / step - PX_TICK_EPS) + 1.0;
            if (count <= (double)max_ticks) return fill(a, step, b, max_ticks, ticks);
        }
    }
    ticks[0] = a;
    ticks[1] = b;
    return 2;
}

size_t px_ticks_log(double a, double b, size_t max_ticks, double *ticks)
{
    if (!(a > 0 && b > 0 && isfinite(a) && isfinite(b)) || max_ticks < 2 || !ticks) return 0;
    if (a > b) {
        double t = a;
        a = b;
        b = t;
    }
    double la = log10(a), lb = log10(b);
    double decades = floor(lb + PX_TICK_EPS) - ceil(la - PX_TICK_EPS) + 1.0;
    /* Every k-th decade so that at most max_ticks remain. */
    double every = decades > (double)max_ticks ? ceil(decades / (double)max_ticks) : 1.0;
    size_t n = 0;
    if (lb - la <= 2.0 + PX_TICK_EPS) { /* two decades or less: 1, 2, 5 in each */
        static const double sub[] = {1.0, 2.0, 5.0};
        for (double d = floor(la) ; d <= ceil(lb) && n < max_ticks; d += 1.0)
            for (size_t s = 0; s < 3 && n < max_ticks; s++) {
                double v = sub[s] * pow(10.0, d);
                if (v >= a * (1 - PX_TICK_EPS) && v <= b * (1 + PX_TICK_EPS)) ticks[n++] = v;
            }
        return n;
    }
    for (double d = ceil(la - PX_TICK_EPS); d <= lb + PX_TICK_EPS && n < max_ticks; d += every)
        ticks[n++] = pow(10.0, d);
    return n;
}
