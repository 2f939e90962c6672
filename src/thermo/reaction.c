/* reaction.c - chemical reactions written in phlox notation:
 * "2 H^+ + 2 e- = H2(g)".  A reaction is a list of species with signed
 * stoichiometric coefficients (reactants negative, products positive).
 * Coefficients are integers, decimals (0.5) or fractions (1/2).  The balance
 * check sums every element and the charge over both sides and names what
 * does not balance ("O: left 4, right 3"). */
#include <ctype.h>
#include <math.h>
#include <stdarg.h>
#include <stdio.h>
#include <string.h>

#include "core/status.h"
#include "thermo/thermo.h"
#include "thermo/thermo_internal.h"

/* a coefficient larger than this, or smaller than its inverse, is a slip,
 * not chemistry (common practice, no source: balanced reactions of the trade
 * need tens at most, and fractions like 1/2 or 1/6); in this range the
 * formatter's "%.6g" never writes an exponent */
#define PX_REACTION_COEF_MAX 1e4
/* longest coefficient text: "%.0f" of DBL_MAX is 309 digits */
#define PX_REACTION_NUM_MAX 320
#define BALANCE_TOL 1e-9 /* atoms; coefficients are small rationals */

static int rfail(char *msg, size_t msgsize, int status, const char *fmt, ...)
{
    if (msg && msgsize) {
        va_list ap;
        va_start(ap, fmt);
        vsnprintf(msg, msgsize, fmt, ap);
        va_end(ap);
    }
    return status;
}

static const char *skip_ws(const char *s)
{
    while (*s == ' ' || *s == '\t' || *s == '\n' || *s == '\r')
        s++;
    return s;
}

/* coefficient: digits[.digits][/digits]; returns chars used (0 if none) */
static size_t read_coef(const char *s, double *v)
{
    const char *p = s;
    if (!isdigit((unsigned char)*p) && !(*p == '.' && isdigit((unsigned char)p[1])))
        return 0;
    double x = 0;
    while (isdigit((unsigned char)*p))
        x = 10 * x + (*p++ - '0');
    if (*p == '.') {
        double sc = 0.1;
        p++;
        while (isdigit((unsigned char)*p)) {
            x += sc * (*p++ - '0');
            sc *= 0.1;
        }
    }
    if (*p == '/' && isdigit((unsigned char)p[1])) {
        double d = 0;
        p++;
        while (isdigit((unsigned char)*p))
            d = 10 * d + (*p++ - '0');
        if (d == 0)
            return (size_t)-1;
        x /= d;
    }
    *v = x;
    return (size_t)(p - s);
}

static int add_term(px_reaction *r, const px_formula *f, double nu, char *msg, size_t msgsize)
{
    for (int i = 0; i < r->n; i++)
        if (!strcmp(r->sp[i].text, f->text)) {
            r->nu[i] += nu;
            return PX_OK;
        }
    if (r->n >= PX_REACTION_MAX)
        return rfail(msg, msgsize, PX_ERANGE, "more than %d species in the reaction",
                     PX_REACTION_MAX);
    r->sp[r->n] = *f;
    r->nu[r->n] = nu;
    r->n++;
    return PX_OK;
}

int px_reaction_parse(const char *text, px_reaction *out, char *msg, size_t msgsize)
{
    if (msg && msgsize)
        msg[0] = '\0';
    if (!text || !out)
        return rfail(msg, msgsize, PX_EINVAL, "no reaction given");
    px_reaction r;
    memset(&r, 0, sizeof r);
    const char *p = skip_ws(text);
    int side = 0; /* 0 left, 1 right */
    int expect_term = 1;
    int nterms[2] = {0, 0};
    while (*p) {
        if (!expect_term) {
            if (*p == '+') {
                p = skip_ws(p + 1);
                expect_term = 1;
                continue;
            }
            if (*p == '=') {
                if (side == 1)
                    return rfail(msg, msgsize, PX_EPARSE, "more than one '=' in '%s'", text);
                side = 1;
                p = skip_ws(p + 1);
                expect_term = 1;
                continue;
            }
            return rfail(msg, msgsize, PX_EPARSE,
                         "expected '+' or '=' at position %d in '%s'", (int)(p - text) + 1,
                         text);
        }
        if (*p == '=' && nterms[side] == 0)
            return rfail(msg, msgsize, PX_EPARSE, "a side of '%s' has no species", text);
        if (*p == '=' || *p == '+')
            return rfail(msg, msgsize, PX_EPARSE,
                         "a species is missing before '%c' at position %d in '%s'", *p,
                         (int)(p - text) + 1, text);
        double coef = 1;
        size_t k = read_coef(p, &coef);
        if (k == (size_t)-1)
            return rfail(msg, msgsize, PX_EPARSE, "division by zero in a coefficient in '%s'",
                         text);
        if (k) {
            if (!(coef > 0))
                return rfail(msg, msgsize, PX_EPARSE,
                             "coefficient must be positive at position %d in '%s'",
                             (int)(p - text) + 1, text);
            if (!(coef <= PX_REACTION_COEF_MAX))
                return rfail(msg, msgsize, PX_ERANGE,
                             "coefficient %g at position %d in '%s' is larger than %g",
                             coef, (int)(p - text) + 1, text, PX_REACTION_COEF_MAX);
            /* and smaller than 1/COEF_MAX is a slip too (found by fuzz_reaction:
             * "1/8888220 O^+" formatted as 1.12508e-07, which the grammar cannot read) */
            if (!(coef >= 1.0 / PX_REACTION_COEF_MAX))
                return rfail(msg, msgsize, PX_ERANGE,
                             "coefficient %g at position %d in '%s' is smaller than %g",
                             coef, (int)(p - text) + 1, text, 1.0 / PX_REACTION_COEF_MAX);
            p = skip_ws(p + k);
        }
        px_formula f;
        size_t used = 0;
        char fmsg[200];
        int st = px__formula_parse_prefix(p, &f, &used, fmsg, sizeof fmsg);
        if (st)
            return rfail(msg, msgsize, st, "species %d of '%s': %s", nterms[0] + nterms[1] + 1,
                         text, fmsg);
        st = add_term(&r, &f, side == 0 ? -coef : coef, msg, msgsize);
        if (st)
            return st;
        nterms[side]++;
        p = skip_ws(p + used);
        expect_term = 0;
    }
    if (expect_term)
        return rfail(msg, msgsize, PX_EPARSE, "reaction '%s' ends where a species was expected",
                     text);
    if (side == 0)
        return rfail(msg, msgsize, PX_EPARSE, "reaction '%s' has no '='", text);
    /* drop species netted to zero */
    int m = 0;
    for (int i = 0; i < r.n; i++)
        if (fabs(r.nu[i]) > BALANCE_TOL) {
            r.sp[m] = r.sp[i];
            r.nu[m] = r.nu[i];
            m++;
        }
    r.n = m;
    if (r.n == 0)
        return rfail(msg, msgsize, PX_EPARSE, "reaction '%s' cancels to nothing", text);
    /* the same range after netting: repeated terms add up (found by
     * fuzz_reaction: ten thousand H2(g) written as many terms) */
    for (int i = 0; i < r.n; i++)
        if (!(fabs(r.nu[i]) <= PX_REACTION_COEF_MAX && fabs(r.nu[i]) >= 1.0 / PX_REACTION_COEF_MAX))
            return rfail(msg, msgsize, PX_ERANGE, "the terms of %s in '%s' add up to %g, outside [%g, %g]",
                         r.sp[i].text, text, fabs(r.nu[i]), 1.0 / PX_REACTION_COEF_MAX,
                         PX_REACTION_COEF_MAX);
    /* a species on both sides nets out: a side may end up empty (found by
     * fuzz/fuzz_reaction.c: "0.5 H3(g) = H3(g) + 0.5 e-") */
    int has_left = 0, has_right = 0;
    for (int i = 0; i < r.n; i++) {
        has_left |= r.nu[i] < 0;
        has_right |= r.nu[i] > 0;
    }
    if (!has_left || !has_right)
        return rfail(msg, msgsize, PX_EPARSE, "reaction '%s' has no species left on one side once "
                                              "species on both sides cancel", text);
    *out = r;
    return PX_OK;
}

/* appends to BUF (SIZE bytes) at offset LEN, never past the end; returns
 * the length the text would have (so truncation is len >= size) */
static size_t append(char *buf, size_t size, size_t len, const char *fmt, ...)
{
    va_list ap;
    va_start(ap, fmt);
    int n = len < size ? vsnprintf(buf + len, size - len, fmt, ap) : vsnprintf(NULL, 0, fmt, ap);
    va_end(ap);
    return len + (n > 0 ? (size_t)n : 0);
}

static void fmt_num(char *b, size_t n, double x)
{
    if (fabs(x - round(x)) < 1e-9)
        snprintf(b, n, "%.0f", round(x));
    else
        snprintf(b, n, "%.6g", x);
}

int px_reaction_balance(const px_reaction *r, char *msg, size_t msgsize)
{
    if (msg && msgsize)
        msg[0] = '\0';
    if (!r)
        return PX_EINVAL;
    /* collect every element present */
    int zs[PX_REACTION_MAX * PX_FORMULA_MAX_ELEM];
    int nz = 0;
    for (int i = 0; i < r->n; i++)
        for (int j = 0; j < r->sp[i].n_elem; j++) {
            int z = r->sp[i].elem[j].z, seen = 0;
            for (int k = 0; k < nz; k++)
                if (zs[k] == z)
                    seen = 1;
            if (!seen)
                zs[nz++] = z;
        }
    /* sort by z for a stable message */
    for (int a = 1; a < nz; a++)
        for (int b = a; b > 0 && zs[b - 1] > zs[b]; b--) {
            int t = zs[b];
            zs[b] = zs[b - 1];
            zs[b - 1] = t;
        }
    int bad = 0;
    size_t len = 0;
    for (int k = 0; k <= nz; k++) {
        double left = 0, right = 0;
        for (int i = 0; i < r->n; i++) {
            double amount = k < nz ? px_formula_count(&r->sp[i], zs[k]) : r->sp[i].charge;
            if (r->nu[i] < 0)
                left += -r->nu[i] * amount;
            else
                right += r->nu[i] * amount;
        }
        if (fabs(left - right) > BALANCE_TOL) {
            bad = 1;
            if (msg && msgsize && len < msgsize) {
                char a[32], b[32];
                fmt_num(a, sizeof a, left);
                fmt_num(b, sizeof b, right);
                len = append(msg, msgsize, len, "%s%s: left %s, right %s", len ? "; " : "",
                             k < nz ? px_element_symbol(zs[k]) : "charge", a, b);
            }
        }
    }
    return bad ? PX_EBALANCE : PX_OK;
}

int px_reaction_parse_balanced(const char *text, px_reaction *out, char *msg, size_t msgsize)
{
    px_reaction r;
    int st = px_reaction_parse(text, &r, msg, msgsize);
    if (st)
        return st;
    char bmsg[256];
    st = px_reaction_balance(&r, bmsg, sizeof bmsg);
    if (st)
        return rfail(msg, msgsize, st, "'%s' does not balance: %s", text, bmsg);
    *out = r;
    return PX_OK;
}

double px_reaction_electrons(const px_reaction *r)
{
    double n = 0;
    for (int i = 0; r && i < r->n; i++)
        if (r->sp[i].state == PX_STATE_E)
            n -= r->nu[i];
    return n;
}

int px_reaction_format(const px_reaction *r, char *buf, size_t bufsize)
{
    if (!r || !buf || !bufsize)
        return PX_EINVAL;
    size_t len = 0;
    buf[0] = '\0';
    for (int side = 0; side < 2; side++) {
        int first = 1;
        if (side == 1)
            len = append(buf, bufsize, len, " =");
        for (int i = 0; i < r->n; i++) {
            double nu = side == 0 ? -r->nu[i] : r->nu[i];
            if (nu <= 0)
                continue;
            /* "%.0f" of a coefficient of 1e300 is 301 digits: format it in
             * place, never through a small fixed buffer */
            char c[PX_REACTION_NUM_MAX] = "";
            if (fabs(nu - 1) > 1e-12) fmt_num(c, sizeof c, nu);
            len = append(buf, bufsize, len, "%s%s%s%s", first ? (side ? " " : "") : " + ", c,
                         c[0] ? " " : "", r->sp[i].text);
            first = 0;
        }
    }
    return len < bufsize ? PX_OK : PX_ERANGE;
}
