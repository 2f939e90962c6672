/* curve.c - the curve driver of curve.h: one speciation per point along x,
 * each built anew (or, warm, the last point's system with the varied
 * constraint changed), failing points retried with a smaller total of the
 * curve's element.  Never prints; see curve.h for the contract. */
#include "equil/curve.h"
#include "core/status.h"
#include <math.h>
#include <string.h>

static int index_of(const char *const *names, size_t n, const char *name)
{
    for (size_t k = 0; name && k < n; k++)
        if (strcmp(names[k], name) == 0) return (int)k;
    return -1;
}

/* Does the solved system hold element z among its elements? */
static int holds_element(const px_spec *s, int z)
{
    size_t ne = px_spec_n_elements(s);
    for (size_t k = 0; k < ne; k++) {
        px_spec_element_result e;
        if (px_spec_element(s, k, &e) == PX_OK && e.z == z) return 1;
    }
    return 0;
}

/* The cold path of a point: built anew, retried with less of the element.
 * Returns a build failure's status (the sweep stops), else PX_OK with
 * p->status, p->retries, p->total and *out (the solved system or NULL). */
static int solve_point(px_thermo_ws *ws, const px_db *db, px_spec_options *o, const px_curve *c, int el,
                       int var, int z, double total, px_spec **out, px_curve_point *p, size_t *failed,
                       char *detail, size_t dlen, char *msg, size_t msglen)
{
    double put = total;
    px_spec *s = NULL;
    for (int t = 0; t <= c->retries; t++) {
        if (var != el || c->var != PX_CURVE_LOG_TOTAL) o->total[el] = put;
        else put = o->total[el]; /* the varied total is the element's own */
        int st = px_spec_build(ws, db, o, &s, msg, msglen);
        if (st != PX_OK) return st;
        st = px_spec_solve(s, &o->solver, detail, dlen);
        if (st == PX_OK && !holds_element(s, z)) {
            st = PX_ENOTFOUND;
            detail[0] = '\0';
        }
        p->status = st;
        if (st == PX_OK) break;
        px_spec_free(s);
        s = NULL;
        put *= c->retry_factor;
        p->retries++;
        (*failed)++;
    }
    p->total = put;
    *out = s;
    return PX_OK;
}

/* The warm path: the last point's system with the varied constraint set
 * to x, solved from its last solution. */
static int warm_step(px_spec *s, const px_db *db, const px_curve *c, int var, const px_spec_options *o,
                     double x, char *detail, size_t dlen, int z)
{
    int st = c->var == PX_CURVE_PH          ? px_spec_set_pH(s, x)
             : c->var == PX_CURVE_LOG_TOTAL ? px_spec_set_total(s, (size_t)var, pow(10.0, x))
                                            : px_spec_set_fixed(s, db, c->name, x);
    if (st != PX_OK) return st;
    px_equil_options wo = o->solver;
    wo.warm = 1;
    st = px_spec_solve(s, &wo, detail, dlen);
    if (st == PX_OK && !holds_element(s, z)) st = PX_ENOTFOUND;
    return st;
}

int px_curve_run(px_thermo_ws *ws, const px_db *db, const px_spec_options *base, const px_curve *c,
                 px_curve_visit visit, void *ud, size_t *retries, char *msg, size_t msglen)
{
    if (msg && msglen) msg[0] = '\0';
    if (retries) *retries = 0;
    if (!ws || !db || !base || !c || !visit || (c->n && !c->x) || c->retries < 0)
        return PX_EINVAL;
    px_spec_options o = *base;
    int el = index_of(o.element, o.n_totals, c->element);
    if (el < 0) return px_fail(msg, msglen, PX_EINVAL, "the curve's element %s has no total", c->element ? c->element : "(none)");
    int z = px_element_z(c->element);
    int var = -1;
    if (c->var == PX_CURVE_LOG_TOTAL) {
        var = index_of(o.element, o.n_totals, c->name);
        if (var < 0) return px_fail(msg, msglen, PX_EINVAL, "the curve varies the total of %s, which has none", c->name ? c->name : "(none)");
    } else if (c->var == PX_CURVE_LOG_A) {
        var = index_of(o.fixed, o.n_fixed, c->name);
        if (var < 0) return px_fail(msg, msglen, PX_EINVAL, "the curve varies the activity of %s, which is not fixed", c->name ? c->name : "(none)");
    } else if (c->var == PX_CURVE_PH) {
        o.ph_mode = PX_SPEC_PH_FIXED;
    } else {
        return PX_EINVAL;
    }
    const double total = base->total[el];
    size_t failed = 0;
    char detail[512];
    px_spec *prev = NULL; /* warm: the last point's solved system, at the given total */
    for (size_t i = 0; i < c->n; i++) {
        double x = c->x[i];
        if (c->var == PX_CURVE_PH) o.pH = x;
        else if (c->var == PX_CURVE_LOG_TOTAL) o.total[var] = pow(10.0, x);
        else o.fixed_log_a[var] = x;
        px_curve_point p = {i, x, total, 0, PX_OK, NULL, ""};
        px_spec *s = NULL;
        if (prev && warm_step(prev, db, c, var, &o, x, detail, sizeof detail, z) == PX_OK) {
            s = prev; /* solved from the last point */
            prev = NULL;
        } else {
            px_spec_free(prev);
            prev = NULL;
            int st = solve_point(ws, db, &o, c, el, var, z, total, &s, &p, &failed, detail, sizeof detail, msg, msglen);
            if (st != PX_OK) {
                if (retries) *retries = failed;
                return st;
            }
        }
        p.spec = s;
        p.message = p.status == PX_OK ? "" : detail;
        int vst = visit(ud, &p);
        if (c->warm && p.status == PX_OK && p.retries == 0) prev = s;
        else px_spec_free(s);
        if (vst != 0) {
            px_spec_free(prev);
            if (retries) *retries = failed;
            return vst;
        }
    }
    px_spec_free(prev);
    if (retries) *retries = failed;
    return PX_OK;
}
