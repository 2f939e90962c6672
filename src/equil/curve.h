/* curve.h - curve drivers over the speciation of speciate.h: the fraction
 * (distribution) and solubility curves of phlox.diagrams.
 *
 * A curve varies one option of a px_spec_options along a list of values:
 * the fixed pH, the log10 total of one element, or the log10 fixed activity
 * of one basis species.  By default each point is built and solved anew
 * from the options (a cold start: a point's result does not depend on the
 * points before it, so a curve and a single speciation at that x agree to
 * the bit); with `warm` a point starts from the last one's solution.  A point whose solve fails (or whose result lacks the curve's
 * element) is retried, when asked, with the element's total multiplied by
 * retry_factor, up to `retries` times: the dissolved total over a solid
 * does not depend on how much solid there is, so less of it is as good an
 * answer and easier to reach.
 *
 * The driver never prints: every point goes to the caller's visitor with
 * its solved system (valid during the visit only) or the failure's status
 * and message.  Returns PX_OK once every point is visited; PX_EINVAL (msg
 * says why) when the curve names no total or fixed species of the options;
 * a build failure's status and message (misuse: a species or element the
 * database lacks; the points before it were visited); PX_ENOMEM; or the
 * visitor's non-zero return, which stops the sweep. */
#ifndef PX_CURVE_H
#define PX_CURVE_H
#include "equil/speciate.h"

typedef enum {
    PX_CURVE_PH = 0,   /* x is the fixed pH (the options' ph_mode becomes fixed) */
    PX_CURVE_LOG_TOTAL, /* x is log10 of the total of element `name` (mol/kg) */
    PX_CURVE_LOG_A     /* x is the log10 fixed activity of basis species `name` */
} px_curve_var;

typedef struct px_curve {
    px_curve_var var;
    const char *name;     /* LOG_TOTAL: an element of the totals; LOG_A: a fixed species */
    const double *x;      /* the values along the curve */
    size_t n;
    const char *element;  /* the element each point's result must hold (one of the totals) */
    int retries;          /* further tries of a failing point (0: none) */
    double retry_factor;  /* the element's total is multiplied by this before each retry */
    int warm;             /* 1: each point starts from the last point's solution (the same
                           * system, one constraint changed; a failure falls back to the
                           * cold build and its retries): fewer iterations, results equal
                           * to the solver's tolerance but not to the bit */
} px_curve;

typedef struct px_curve_point {
    size_t i;             /* 0-based index along x */
    double x;
    double total;         /* the element's total after the last try (multiplied once
                           * more after a failing last try, as the retry count says) */
    int retries;          /* failing tries at this point */
    int status;           /* PX_OK, or the last try's failure (PX_ENOTFOUND: element missing) */
    const px_spec *spec;  /* the solved system when status is PX_OK, else NULL */
    const char *message;  /* the failure's detail ("" on success) */
} px_curve_point;

typedef int (*px_curve_visit)(void *ud, const px_curve_point *p);

/* Run the curve: base options (not changed), the curve, the visitor.
 * *retries (may be NULL) receives the failing tries over all points. */
int px_curve_run(px_thermo_ws *ws, const px_db *db, const px_spec_options *base, const px_curve *c,
                 px_curve_visit visit, void *ud, size_t *retries, char *msg, size_t msglen);

#endif
