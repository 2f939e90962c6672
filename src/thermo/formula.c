/* formula.c - the parser of phlox's chemical formula notation (docs/element-files.md).
 *
 *   formula := "e-" | body [charge] [state]
 *   body    := part { "*" [number] part }          hydrate water: CuSO4*5H2O
 *   part    := group { group }
 *   group   := Element [number] | "(" part ")" [number]
 *   charge  := "^" [digits] ("+" | "-")            Zn^2+, SO4^2-, HS^-
 *   state   := "(" word ["," name] ")"             aq s cr am l g; (s,calcite)
 *
 * A "(" followed by a lower-case letter opens the state, so Fe(OH)3(s) reads
 * as a group and a state.  The canonical text keeps the body as written
 * (element order is the author's), writes the charge as ^+, ^2+, ^-, ^3-,
 * drops "(aq)" from charged species (charged aqueous species carry no state)
 * and writes the electron as "e-".  Counts may be decimal (Fe0.947O(s),
 * CaSO4*0.5H2O(s)). */
#include <ctype.h>
#include <math.h>
#include <stdarg.h>
#include <stdio.h>
#include <string.h>

#include "core/status.h"
#include "thermo/thermo.h"
#include "thermo/thermo_internal.h"

#define MAX_DEPTH 8 /* nesting of parentheses */
/* atoms of one element per formula unit: a slip beyond this (common practice,
 * no source: the largest aqueous clusters hold a few hundred) */
#define MAX_COUNT 1000.0

typedef struct parser {
    const char *text; /* whole input, for messages */
    const char *p;    /* cursor */
    double counts[PX_ELEMENT_MAX + 1];
    char *msg;
    size_t msgsize;
} parser;

static int fail(parser *ps, int status, const char *fmt, ...)
{
    if (ps->msg && ps->msgsize) {
        char reason[160];
        va_list ap;
        va_start(ap, fmt);
        vsnprintf(reason, sizeof reason, fmt, ap);
        va_end(ap);
        snprintf(ps->msg, ps->msgsize, "%s at position %d in '%s'", reason,
                 (int)(ps->p - ps->text) + 1, ps->text);
    }
    return status;
}

/* Unsigned decimal number: digits [. digits].  Returns 1 if one was read. */
static int read_number(parser *ps, double *v)
{
    const char *s = ps->p;
    if (!isdigit((unsigned char)*s))
        return 0;
    double x = 0;
    while (isdigit((unsigned char)*s))
        x = 10 * x + (*s++ - '0');
    if (*s == '.' && isdigit((unsigned char)s[1])) {
        double scale = 0.1;
        s++;
        while (isdigit((unsigned char)*s)) {
            x += scale * (*s++ - '0');
            scale *= 0.1;
        }
    }
    ps->p = s;
    *v = x;
    return 1;
}

static int parse_part(parser *ps, double mult, int depth);

static int parse_group(parser *ps, double mult, int depth, int *got)
{
    const char *s = ps->p;
    *got = 0;
    if (isupper((unsigned char)*s)) {
        char sym[3] = {s[0], 0, 0};
        size_t len = 1;
        if (islower((unsigned char)s[1])) {
            sym[1] = s[1];
            len = 2;
        }
        int z = px_element_z(sym);
        if (!z)
            return fail(ps, PX_EPARSE, "unknown element '%s'", sym);
        ps->p += len;
        double n = 1;
        const char *num = ps->p;
        if (read_number(ps, &n) && !(n > 0)) {
            ps->p = num;
            return fail(ps, PX_EPARSE, "count must be positive");
        }
        ps->counts[z] += mult * n;
        *got = 1;
        return PX_OK;
    }
    if (*s == '(' && (isupper((unsigned char)s[1]) || s[1] == '(')) {
        if (depth >= MAX_DEPTH)
            return fail(ps, PX_EPARSE, "parentheses nested too deeply");
        /* parse the inside into a scratch parser, then scale by the count */
        parser inner = *ps;
        memset(inner.counts, 0, sizeof inner.counts);
        inner.p = s + 1;
        int st = parse_part(&inner, 1.0, depth + 1);
        if (st)
            return st;
        if (*inner.p != ')') {
            ps->p = inner.p;
            return fail(ps, PX_EPARSE, "expected ')'");
        }
        ps->p = inner.p + 1;
        double n = 1;
        const char *num = ps->p;
        if (read_number(ps, &n) && !(n > 0)) {
            ps->p = num;
            return fail(ps, PX_EPARSE, "count must be positive");
        }
        for (int z = 1; z <= PX_ELEMENT_MAX; z++)
            ps->counts[z] += mult * n * inner.counts[z];
        *got = 1;
        return PX_OK;
    }
    return PX_OK;
}

static int parse_part(parser *ps, double mult, int depth)
{
    int any = 0;
    for (;;) {
        int got = 0;
        int st = parse_group(ps, mult, depth, &got);
        if (st)
            return st;
        if (!got)
            break;
        any = 1;
    }
    if (!any) {
        if (*ps->p == '\0')
            return fail(ps, PX_EPARSE, "formula ends where an element was expected");
        return fail(ps, PX_EPARSE, "unexpected '%c' (expected an element symbol)", *ps->p);
    }
    return PX_OK;
}

static int is_stop(char c)
{
    return c == '\0' || c == ' ' || c == '\t' || c == '+' || c == '=' || c == '\n' ||
           c == '\r';
}

/* Parse one formula starting at text[0]; *used = characters consumed.  The
 * formula must be followed by end, white space, '+' or '='. */
int px__formula_parse_prefix(const char *text, px_formula *out, size_t *used, char *msg,
                             size_t msgsize)
{
    parser ps;
    memset(&ps, 0, sizeof ps);
    ps.text = text;
    ps.p = text;
    ps.msg = msg;
    ps.msgsize = msgsize;
    if (msg && msgsize)
        msg[0] = '\0';
    memset(out, 0, sizeof *out);

    /* the electron */
    if (text[0] == 'e' && (text[1] == '-' || (text[1] == '^' && text[2] == '-'))) {
        size_t n = text[1] == '-' ? 2 : 3;
        if (!is_stop(text[n])) {
            ps.p = text + n;
            return fail(&ps, PX_EPARSE, "unexpected text after the electron 'e-'");
        }
        strcpy(out->text, "e-");
        out->charge = -1;
        out->state = PX_STATE_E;
        *used = n;
        return PX_OK;
    }

    int st = parse_part(&ps, 1.0, 0);
    if (st)
        return st;
    /* hydrates */
    while (*ps.p == '*') {
        ps.p++;
        double n = 1;
        const char *num = ps.p;
        if (read_number(&ps, &n) && !(n > 0)) {
            ps.p = num;
            return fail(&ps, PX_EPARSE, "hydrate count must be positive");
        }
        st = parse_part(&ps, n, 0);
        if (st)
            return st;
    }
    size_t body_len = (size_t)(ps.p - text);

    /* charge */
    int charge = 0;
    if (*ps.p == '^') {
        ps.p++;
        int mag = 1;
        if (isdigit((unsigned char)*ps.p)) {
            mag = 0;
            while (isdigit((unsigned char)*ps.p)) {
                mag = 10 * mag + (*ps.p++ - '0');
                if (mag > 99)
                    return fail(&ps, PX_EPARSE, "charge too large");
            }
            if (mag == 0)
                return fail(&ps, PX_EPARSE, "charge 0 is written without '^'");
        }
        if (*ps.p == '+')
            charge = mag;
        else if (*ps.p == '-')
            charge = -mag;
        else
            return fail(&ps, PX_EPARSE, "charge needs a sign after '^' (e.g. ^2+ or ^-)");
        ps.p++;
    } else if ((*ps.p == '+' || *ps.p == '-') && !(*ps.p == '+' && ps.p[1] == ' ')) {
        if (*ps.p == '-' || isdigit((unsigned char)ps.p[1]) || ps.p[1] == '\0' ||
            ps.p[1] == '(')
            return fail(&ps, PX_EPARSE, "charge must follow '^' (write Na^+, SO4^2-)");
    }

    /* state */
    char word[8] = "";
    char name[24] = "";
    int has_state = 0;
    if (*ps.p == '(') {
        const char *open = ps.p;
        ps.p++;
        size_t k = 0;
        while (islower((unsigned char)*ps.p)) {
            if (k + 1 >= sizeof word)
                return fail(&ps, PX_EPARSE, "unknown state symbol");
            word[k++] = *ps.p++;
        }
        word[k] = '\0';
        if (*ps.p == ',') {
            ps.p++;
            size_t m = 0;
            while (*ps.p && *ps.p != ')') {
                char c = *ps.p;
                if (!(isalnum((unsigned char)c) || c == '-' || c == '_' || c == '\''))
                    return fail(&ps, PX_EPARSE, "bad character '%c' in the mineral name", c);
                if (m + 1 >= sizeof name)
                    return fail(&ps, PX_EPARSE, "mineral name too long (max %d)",
                                (int)sizeof name - 1);
                name[m++] = c;
                ps.p++;
            }
            name[m] = '\0';
            if (m == 0)
                return fail(&ps, PX_EPARSE, "empty mineral name after ','");
        }
        if (*ps.p != ')')
            return fail(&ps, PX_EPARSE, "expected ')' to close the state");
        ps.p++;
        if (!strcmp(word, "aq"))
            out->state = PX_STATE_AQ;
        else if (!strcmp(word, "s") || !strcmp(word, "cr") || !strcmp(word, "am"))
            out->state = PX_STATE_S;
        else if (!strcmp(word, "l"))
            out->state = PX_STATE_L;
        else if (!strcmp(word, "g"))
            out->state = PX_STATE_G;
        else {
            ps.p = open + 1;
            return fail(&ps, PX_EPARSE,
                        "unknown state '%s' (use aq, s, cr, am, l or g)", word);
        }
        if (name[0] && out->state != PX_STATE_S) {
            ps.p = open + 1;
            return fail(&ps, PX_EPARSE, "a mineral name is allowed only for solids");
        }
        has_state = 1;
    }
    if (!is_stop(*ps.p))
        return fail(&ps, PX_EPARSE, "unexpected '%c' after the formula", *ps.p);
    if (charge != 0 && has_state && out->state != PX_STATE_AQ)
        return fail(&ps, PX_EPARSE, "a charged species must be aqueous (no state symbol)");
    if (charge == 0 && !has_state)
        return fail(&ps, PX_EPARSE,
                    "a neutral species needs a state: (aq), (s), (cr), (am), (l) or (g)");

    /* elements, sorted by z */
    int ne = 0;
    for (int z = 1; z <= PX_ELEMENT_MAX; z++) {
        if (ps.counts[z] == 0)
            continue;
        if (ne >= PX_FORMULA_MAX_ELEM)
            return fail(&ps, PX_ERANGE, "more than %d distinct elements",
                        PX_FORMULA_MAX_ELEM);
        out->elem[ne].z = z;
        out->elem[ne].n = ps.counts[z];
        ne++;
    }
    out->n_elem = ne;
    out->charge = charge;
    if (!has_state)
        out->state = PX_STATE_AQ;
    if (name[0])
        snprintf(out->form, sizeof out->form, "%s", name);
    else if (!strcmp(word, "cr") || !strcmp(word, "am"))
        snprintf(out->form, sizeof out->form, "%s", word);

    /* canonical text */
    char canon[2 * PX_NAME_MAX];
    size_t len = 0;
    if (body_len >= PX_NAME_MAX)
        return fail(&ps, PX_ERANGE, "formula longer than %d characters", PX_NAME_MAX - 1);
    memcpy(canon, text, body_len);
    len = body_len;
    if (charge) {
        int mag = charge > 0 ? charge : -charge;
        char sign = charge > 0 ? '+' : '-';
        if (mag == 1)
            len += (size_t)snprintf(canon + len, sizeof canon - len, "^%c", sign);
        else
            len += (size_t)snprintf(canon + len, sizeof canon - len, "^%d%c", mag, sign);
    } else {
        if (name[0])
            len += (size_t)snprintf(canon + len, sizeof canon - len, "(%s,%s)", word, name);
        else
            len += (size_t)snprintf(canon + len, sizeof canon - len, "(%s)", word);
    }
    if (len >= PX_NAME_MAX)
        return fail(&ps, PX_ERANGE, "formula longer than %d characters", PX_NAME_MAX - 1);
    for (int i = 0; i < out->n_elem; i++)
        if (!(out->elem[i].n <= MAX_COUNT))
            return fail(&ps, PX_ERANGE, "%g atoms of %s per formula unit (at most %g)", out->elem[i].n,
                        px_element_symbol(out->elem[i].z), MAX_COUNT);
    memcpy(out->text, canon, len);
    out->text[len] = '\0';
    *used = (size_t)(ps.p - text);
    return PX_OK;
}

int px_formula_parse_msg(const char *text, px_formula *out, char *msg, size_t msgsize)
{
    px_formula tmp;
    if (msg && msgsize)
        msg[0] = '\0';
    if (!text || !out) {
        if (msg && msgsize)
            snprintf(msg, msgsize, "no formula given");
        return PX_EINVAL;
    }
    while (*text == ' ' || *text == '\t')
        text++;
    if (!*text) {
        if (msg && msgsize)
            snprintf(msg, msgsize, "empty formula");
        return PX_EPARSE;
    }
    size_t used = 0;
    int st = px__formula_parse_prefix(text, &tmp, &used, msg, msgsize);
    if (st)
        return st;
    const char *rest = text + used;
    while (*rest == ' ' || *rest == '\t' || *rest == '\n' || *rest == '\r')
        rest++;
    if (*rest) {
        if (msg && msgsize)
            snprintf(msg, msgsize, "unexpected text '%s' after the formula in '%s'", rest, text);
        return PX_EPARSE;
    }
    *out = tmp;
    return PX_OK;
}

int px_formula_parse(const char *text, px_formula *out)
{
    return px_formula_parse_msg(text, out, NULL, 0);
}

int px_formula_listed(const char *const *list, size_t n, const char *canonical)
{
    for (size_t i = 0; i < n; i++) {
        px_formula f;
        if (list && list[i] && px_formula_parse(list[i], &f) == PX_OK && strcmp(f.text, canonical) == 0)
            return 1;
    }
    return 0;
}
