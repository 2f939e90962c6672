/* root.c - one-dimensional root finders with the GSL-like contract of
 * num.h: bracket given by the caller, tolerances validated before any
 * evaluation, caller's iteration cap, statistics always filled. */
#include "num/num.h"
#include "core/status.h"
#include <math.h>

int px_num_root_options_check(const px_num_root_options *o)
{
    if (!o || !isfinite(o->epsabs) || o->epsabs < 0.0 || !isfinite(o->epsrel) ||
        o->epsrel < 0.0 || !(o->ftol >= 0.0) || o->max_iter < 1)
        return PX_EINVAL;
    return PX_OK;
}

static void stats_clear(px_num_root_stats *st)
{
    st->iterations = st->evaluations = st->bisections = 0;
    st->residual = NAN;
}

/* Is the bracket [a, b] (either order) within the tolerance? */
static int bracket_done(double a, double b, const px_num_root_options *o)
{
    return fabs(b - a) <= o->epsabs + o->epsrel * fmin(fabs(a), fabs(b));
}

static double clamp(double x, double lo, double hi)
{
    return x < lo ? lo : (x > hi ? hi : x);
}

int px_num_root_bisect(px_num_side_fn side, void *user, double *lo, double *hi,
                       const px_num_root_options *o, px_num_root_stats *st)
{
    px_num_root_stats dummy;
    if (!st) st = &dummy;
    stats_clear(st);
    if (!side || !lo || !hi || px_num_root_options_check(o) != PX_OK) return PX_EINVAL;
    double a = *lo, b = *hi;
    while (!bracket_done(a, b, o)) {
        if (st->iterations >= o->max_iter) {
            *lo = a;
            *hi = b;
            return PX_ENOCONV;
        }
        double t = 0.5 * (a + b);
        int high = 0, s = side(t, user, &high);
        st->evaluations++;
        if (s < 0) return s;
        if (high) b = t;
        else a = t;
        st->iterations++;
        st->bisections++;
    }
    *lo = a;
    *hi = b;
    return PX_OK;
}

int px_num_root_newton(px_num_fdf_fn fdf, void *user, double lo, double hi, double x0,
                       const px_num_root_options *o, double *x, px_num_root_stats *st)
{
    px_num_root_stats dummy;
    if (!st) st = &dummy;
    stats_clear(st);
    if (!fdf || !x || px_num_root_options_check(o) != PX_OK || !(lo < hi)) return PX_EINVAL;
    double xc = (x0 > lo && x0 < hi) ? x0 : 0.5 * (lo + hi);
    for (int it = 1; it <= o->max_iter; it++) {
        double f, df;
        st->iterations = it;
        int s = fdf(xc, user, &f, &df);
        st->evaluations++;
        if (s < 0) return s;
        if (!(isfinite(f) && isfinite(df))) return PX_ENONFINITE;
        st->residual = fabs(f);
        double xn;
        int newton = 0;
        if (df <= 0) {
            lo = xc; /* off the increasing branch: the root lies above */
            xn = 0.5 * (lo + hi);
        } else {
            if (f < 0) lo = xc;
            else if (f > 0) hi = xc;
            else {
                *x = xc;
                return PX_OK;
            }
            double step = -f / df;
            if (fabs(step) <= o->epsabs + o->epsrel * fabs(xc)) { /* may be below 1 ulp */
                *x = xc + step;
                return PX_OK;
            }
            xn = xc + step;
            newton = 1;
            if (!(xn > lo && xn < hi)) {
                xn = 0.5 * (lo + hi);
                newton = 0;
            }
        }
        if (!newton) st->bisections++;
        xc = xn;
        if (bracket_done(lo, hi, o)) { /* bracket collapsed (bisection only) */
            *x = 0.5 * (lo + hi);
            return PX_OK;
        }
    }
    *x = xc;
    return PX_ENOCONV;
}

int px_num_root_search(px_num_f_fn f, void *user, double x0, double f0, double step,
                       double reach, double xmin, double xmax, double *a, double *fa,
                       double *b, double *fb, px_num_root_stats *st)
{
    px_num_root_stats dummy;
    if (!st) st = &dummy;
    stats_clear(st);
    if (!f || !a || !fa || !b || !fb || !(step > 0.0) || !(reach >= step) || !(xmin <= xmax))
        return PX_EINVAL;
    double xa = x0, fxa = f0;
    st->residual = fabs(f0);
    for (; step <= reach; step *= 2.0) {
        st->iterations++;
        for (int sgn = -1; sgn <= 1; sgn += 2) {
            double xt = clamp(x0 + sgn * step, xmin, xmax), ft;
            int s = f(xt, user, &ft);
            st->evaluations++;
            if (s < 0) return s;
            st->residual = fabs(ft);
            if ((ft < 0.0) != (fxa < 0.0)) {
                *a = xa;
                *fa = fxa;
                *b = xt;
                *fb = ft;
                return PX_OK;
            }
            if (fabs(ft) < fabs(fxa)) {
                /* keep the better end as the anchor */
                xa = xt;
                fxa = ft;
            }
        }
    }
    *a = xa;
    *fa = fxa;
    return PX_ENOTFOUND;
}

int px_num_root_illinois(px_num_f_fn f, void *user, double a, double fa, double b, double fb,
                         const px_num_root_options *o, double *x, px_num_root_stats *st)
{
    px_num_root_stats dummy;
    if (!st) st = &dummy;
    stats_clear(st);
    if (!f || !x || px_num_root_options_check(o) != PX_OK) return PX_EINVAL;
    if (!((fa < 0.0) != (fb < 0.0))) return PX_EINVAL; /* not a bracket */
    double c = b;
    for (int it = 0; it < o->max_iter; it++) {
        st->iterations = it + 1;
        c = b - fb * (b - a) / (fb - fa);
        if (!(c > fmin(a, b) && c < fmax(a, b))) {
            c = 0.5 * (a + b);
            st->bisections++;
        }
        double fc;
        int s = f(c, user, &fc);
        st->evaluations++;
        if (s < 0) return s;
        st->residual = fabs(fc);
        if (s > 0 || fabs(fc) <= o->ftol || bracket_done(a, b, o)) {
            *x = c;
            return PX_OK;
        }
        if ((fc < 0.0) != (fb < 0.0)) {
            a = b;
            fa = fb;
        } else {
            fa *= 0.5; /* Illinois: halve the value kept at the stale end */
        }
        b = c;
        fb = fc;
    }
    *x = c;
    return PX_ENOCONV;
}
