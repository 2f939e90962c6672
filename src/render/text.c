/* text.c - text in figures, including chemical formulas in phlox notation
 * drawn the way chemists typeset them: "Fe(OH)3(s)" as Fe(OH)₃(s),
 * "SO4^2-" as SO₄²⁻, "CuSO4*5H2O(s)" as CuSO₄·5H₂O(s), "e-" as e⁻.  Counts
 * after an element or a closing parenthesis are subscripts, a charge after
 * '^' is a superscript with a true minus sign, '*' is the hydrate dot, and a
 * trailing state such as (s), (aq) or (s,calcite) is set in normal type.
 * Plain text may carry formulas in braces: "{Fe^2+} at 25 °C". */
#include "core/alloc.h"
#include "render/render.h"
#include "render/text.h"
#include "core/status.h"
#include <ctype.h>
#include <math.h>
#include <stdio.h>
#include <stdlib.h>
#include <string.h>

#define PX_SCRIPT_SCALE 0.68 /* size of sub- and superscripts relative to text */
#define PX_SUB_DROP 0.22     /* subscript baseline shift, fraction of size */
#define PX_SUP_RISE 0.42     /* superscript baseline shift, fraction of size */
#define PX_RUN_MAX 96

typedef enum { RUN_NORMAL, RUN_SUB, RUN_SUP } run_kind;
typedef struct {
    run_kind kind;
    char text[PX_RUN_MAX * 3 + 1];
} run;

/* Length of a trailing state suffix "(s)", "(aq)", "(s,calcite)" ..., or 0. */
static size_t state_suffix(const char *s, size_t n)
{
    static const char *const states[] = {"aq", "s", "cr", "am", "l", "g"};
    if (n < 3 || s[n - 1] != ')') return 0;
    size_t open = n - 1;
    while (open > 0 && s[open] != '(') open--;
    if (s[open] != '(') return 0;
    const char *in = s + open + 1;
    size_t len = n - 1 - (open + 1);
    for (size_t k = 0; k < sizeof states / sizeof states[0]; k++) {
        size_t sl = strlen(states[k]);
        if (len >= sl && strncmp(in, states[k], sl) == 0 && (len == sl || in[sl] == ','))
            return n - open;
    }
    return 0;
}

static void append(run *runs, int *nr, run_kind kind, const char *utf8)
{
    if (*nr == 0 || runs[*nr - 1].kind != kind) {
        if (*nr >= PX_RUN_MAX) return;
        runs[*nr].kind = kind;
        runs[*nr].text[0] = '\0';
        (*nr)++;
    }
    run *r = &runs[*nr - 1];
    if (strlen(r->text) + strlen(utf8) < sizeof r->text) strcat(r->text, utf8);
}

static int split_chem(const char *s, run *runs)
{
    int nr = 0;
    size_t n = strlen(s);
    size_t st = state_suffix(s, n);
    size_t body = n - st;
    char prev = 0;
    int after_dot = 0; /* digits right after '*' are a coefficient, not a count */
    for (size_t i = 0; i < body; i++) {
        char c = s[i], one[2] = {c, 0};
        if (c == '^') { /* charge: the rest of the body is superscript */
            for (size_t k = i + 1; k < body; k++) {
                if (s[k] == '-') append(runs, &nr, RUN_SUP, "\xe2\x88\x92"); /* U+2212 */
                else {
                    char o[2] = {s[k], 0};
                    append(runs, &nr, RUN_SUP, o);
                }
            }
            break;
        }
        if (c == '*') {
            append(runs, &nr, RUN_NORMAL, "\xc2\xb7"); /* U+00B7 middle dot */
            after_dot = 1;
            prev = c;
            continue;
        }
        if (isdigit((unsigned char)c) && !after_dot &&
            (isalpha((unsigned char)prev) || prev == ')' || prev == ']' ||
             (isdigit((unsigned char)prev) && nr > 0 && runs[nr - 1].kind == RUN_SUB) ||
             prev == '.'))
            append(runs, &nr, RUN_SUB, one);
        else if (c == '-' && i == body - 1 && (prev == 'e' || isalpha((unsigned char)prev)))
            append(runs, &nr, RUN_SUP, "\xe2\x88\x92");
        else if (c == '+' && i == body - 1)
            append(runs, &nr, RUN_SUP, "+");
        else {
            if (!isdigit((unsigned char)c)) after_dot = 0;
            append(runs, &nr, RUN_NORMAL, one);
        }
        prev = c;
    }
    if (st) append(runs, &nr, RUN_NORMAL, s + body);
    return nr;
}

static void set_font(cairo_t *cr, double size)
{
    cairo_select_font_face(cr, PX_FONT_FAMILY, CAIRO_FONT_SLANT_NORMAL, CAIRO_FONT_WEIGHT_NORMAL);
    cairo_set_font_size(cr, size);
}

/* Runs of a text: chem text is one formula; plain text may hold formulas
 * in braces, "{Fe^2+} at 25 °C" (braces not drawn). */
static int split_text(const char *text, int chem, run *runs)
{
    if (chem) return split_chem(text, runs);
    int nr = 0;
    char seg[PX_RUN_MAX * 3 + 1];
    const char *s = text;
    while (*s && nr < PX_RUN_MAX) {
        const char *open = strchr(s, '{');
        const char *close = open ? strchr(open + 1, '}') : NULL;
        size_t plain = open && close ? (size_t)(open - s) : strlen(s);
        if (plain > 0) {
            size_t k = plain < sizeof seg - 1 ? plain : sizeof seg - 1;
            memcpy(seg, s, k);
            seg[k] = '\0';
            append(runs, &nr, RUN_NORMAL, seg);
        }
        if (!(open && close)) break;
        size_t k = (size_t)(close - open - 1);
        if (k > sizeof seg - 1) k = sizeof seg - 1;
        memcpy(seg, open + 1, k);
        seg[k] = '\0';
        run sub[PX_RUN_MAX];
        int ns = split_chem(seg, sub);
        for (int i = 0; i < ns; i++) append(runs, &nr, sub[i].kind, sub[i].text);
        s = close + 1;
    }
    return nr;
}

/* A run's font size and baseline shift at text size `size`; sets the font
 * on cr and returns the run's advance. */
static double run_metrics(cairo_t *cr, const run *r, double size, double *fs, double *dy)
{
    *fs = r->kind == RUN_NORMAL ? size : size * PX_SCRIPT_SCALE;
    *dy = r->kind == RUN_SUB ? size * PX_SUB_DROP : r->kind == RUN_SUP ? -size * PX_SUP_RISE : 0.0;
    set_font(cr, *fs);
    cairo_text_extents_t te;
    cairo_text_extents(cr, r->text, &te);
    return te.x_advance;
}

/* Walk the runs; draw = 0 measures, 1 shows the text, 2 adds its outline to
 * the path; returns the advance width. */
static double layout(cairo_t *cr, const char *text, int chem, double size, double x, double y,
                     int draw)
{
    run runs[PX_RUN_MAX];
    int nr = split_text(text, chem, runs);
    double adv = 0.0;
    for (int i = 0; i < nr; i++) {
        double fs, dy, w = run_metrics(cr, &runs[i], size, &fs, &dy);
        if (draw) {
            cairo_move_to(cr, x + adv, y + dy);
            if (draw == 2) cairo_text_path(cr, runs[i].text);
            else cairo_show_text(cr, runs[i].text);
        }
        adv += w;
    }
    return adv;
}

void px_text_measure(cairo_t *cr, const char *text, int chem, double size, double *w, double *h)
{
    *w = layout(cr, text, chem, size, 0, 0, 0);
    set_font(cr, size);
    cairo_font_extents_t fe;
    cairo_font_extents(cr, &fe);
    *h = fe.ascent + fe.descent;
}

/* ---- SVG text (see text.h) ---- */

static const cairo_user_data_key_t sink_key; /* its address names the sink on a context */

/* The marker's colour: red 1 %, green and blue the element number's two
 * base-100 digits in whole percent, opacity 0.01; cairo writes it as
 * "fill:rgb(1%,G%,B%);fill-opacity:0.01;" (whole numbers, kept by the
 * rounding pass). */
#define PX_TEXT_MARK_RED 0.01
#define PX_TEXT_MARK_ALPHA 0.01
static const char mark_head[] = "fill:rgb(1%,";
static const char mark_tail[] = "%);fill-opacity:0.01;";

void px_strbuf_put(px_strbuf *b, const char *s, size_t k)
{
    if (b->failed) return;
    if (b->n + k + 1 > b->cap) {
        size_t cap = b->cap ? b->cap : 1024;
        while (cap < b->n + k + 1) cap *= 2;
        char *d = px_realloc(NULL, b->s, b->cap, cap);
        if (!d) {
            b->failed = 1;
            return;
        }
        b->s = d;
        b->cap = cap;
    }
    memcpy(b->s + b->n, s, k);
    b->n += k;
    b->s[b->n] = '\0';
}

static void sk_put(px_text_sink *k, const char *s, size_t n) { px_strbuf_put(&k->b, s, n); }

static void sk_str(px_text_sink *k, const char *s) { sk_put(k, s, strlen(s)); }

/* A number with at most three decimals, trailing zeros dropped (as the
 * rounding pass leaves cairo's numbers). */
static void sk_num(px_text_sink *k, double v)
{
    char b[48];
    if (!isfinite(v)) v = 0;
    int w = snprintf(b, sizeof b, "%.3f", v);
    while (w > 0 && b[w - 1] == '0') w--;
    if (w > 0 && b[w - 1] == '.') w--;
    if (w == 2 && b[0] == '-' && b[1] == '0') b[0] = '0', w = 1; /* "-0" */
    sk_put(k, b, (size_t)w);
}

static void sk_attr(px_text_sink *k, const char *name, double v)
{
    sk_str(k, " ");
    sk_str(k, name);
    sk_str(k, "=\"");
    sk_num(k, v);
    sk_str(k, "\"");
}

static void sk_colour(px_text_sink *k, const char *name, double r, double g, double b, double a)
{
    char c[64];
    snprintf(c, sizeof c, " %s=\"#%02x%02x%02x\"", name, (unsigned)lround(fmin(fmax(r, 0), 1) * 255),
             (unsigned)lround(fmin(fmax(g, 0), 1) * 255), (unsigned)lround(fmin(fmax(b, 0), 1) * 255));
    sk_str(k, c);
    if (a < 1) {
        snprintf(c, sizeof c, " %s-opacity=\"", name);
        sk_str(k, c);
        sk_num(k, a);
        sk_str(k, "\"");
    }
}

static void sk_xml(px_text_sink *k, const char *s)
{
    for (; *s; s++) {
        if (*s == '&') sk_str(k, "&amp;");
        else if (*s == '<') sk_str(k, "&lt;");
        else if (*s == '>') sk_str(k, "&gt;");
        else if ((unsigned char)*s >= 0x20) sk_put(k, s, 1);
    }
}

/* One <text> for the text at (x, y) in user space (any rotation goes to a
 * transform), each run a <tspan> at the position cairo laid it out; then
 * the marker in its place.  halo: the stroke's width and colour, or NULL. */
static void svg_text(cairo_t *cr, px_text_sink *k, const char *text, int chem, double size,
                     double x, double y, const double *halo)
{
    if (k->count >= PX_TEXT_MARK_MAX) k->over = 1;
    if (k->b.failed || k->over) return;
    size_t *at = px_realloc(NULL, k->at, k->at ? (size_t)(k->count + 1) * sizeof *at : 0,
                            (size_t)(k->count + 2) * sizeof *at);
    if (!at) {
        k->b.failed = 1;
        return;
    }
    k->at = at;
    k->at[k->count] = k->b.n;
    cairo_matrix_t m;
    cairo_get_matrix(cr, &m);
    int plain = m.xx == 1 && m.yy == 1 && m.xy == 0 && m.yx == 0;
    double ox = plain ? m.x0 : 0, oy = plain ? m.y0 : 0; /* device offset of a pure translation */
    sk_str(k, "<text xml:space=\"preserve\" font-family=\"" PX_FONT_FAMILY "\"");
    sk_attr(k, "font-size", size);
    double r = 0, g = 0, b = 0, a = 1;
    cairo_pattern_get_rgba(cairo_get_source(cr), &r, &g, &b, &a);
    sk_colour(k, "fill", r, g, b, a);
    if (halo) {
        sk_colour(k, "stroke", halo[1], halo[2], halo[3], halo[4]);
        sk_attr(k, "stroke-width", halo[0]);
        sk_str(k, " stroke-linejoin=\"round\" paint-order=\"stroke\"");
    }
    if (!plain) {
        sk_str(k, " transform=\"matrix(");
        const double v[6] = {m.xx, m.yx, m.xy, m.yy, m.x0, m.y0};
        for (int i = 0; i < 6; i++) {
            if (i) sk_str(k, ",");
            sk_num(k, v[i]);
        }
        sk_str(k, ")\"");
    }
    sk_str(k, ">");
    run runs[PX_RUN_MAX];
    int nr = split_text(text, chem, runs);
    double adv = 0.0;
    for (int i = 0; i < nr; i++) {
        double fs, dy, w = run_metrics(cr, &runs[i], size, &fs, &dy);
        sk_str(k, "<tspan");
        sk_attr(k, "x", ox + x + adv);
        sk_attr(k, "y", oy + y + dy);
        if (runs[i].kind != RUN_NORMAL) sk_attr(k, "font-size", fs);
        sk_str(k, ">");
        sk_xml(k, runs[i].text);
        sk_str(k, "</tspan>");
        adv += w;
    }
    sk_str(k, "</text>");
    if (k->b.failed) return;
    k->at[++k->count] = k->b.n;
    /* the marker: the text's box, so it shares the text's clip */
    set_font(cr, size);
    cairo_font_extents_t fe;
    cairo_font_extents(cr, &fe);
    int id = k->count - 1;
    cairo_save(cr);
    cairo_new_path(cr);
    cairo_set_source_rgba(cr, PX_TEXT_MARK_RED, (id / 100) / 100.0, (id % 100) / 100.0,
                          PX_TEXT_MARK_ALPHA);
    cairo_rectangle(cr, x, y - fe.ascent, adv > 0 ? adv : size * 0.01, fe.ascent + fe.descent);
    cairo_fill(cr);
    cairo_restore(cr);
}

void px_text_sink_attach(cairo_t *cr, px_text_sink *sink)
{
    cairo_set_user_data(cr, &sink_key, sink, NULL);
}

void px_text_sink_free(px_text_sink *sink)
{
    if (!sink) return;
    px_free(NULL, sink->b.s);
    px_free(NULL, sink->at);
    *sink = (px_text_sink){0};
}

/* Two whole-percent digits "D" or "DD" at s, followed by `end`; -1 if not. */
static int mark_digits(const unsigned char *s, size_t n, size_t *i, char end)
{
    int v = 0, nd = 0;
    while (*i < n && s[*i] >= '0' && s[*i] <= '9' && nd < 3) v = v * 10 + (s[(*i)++] - '0'), nd++;
    if (nd == 0 || nd > 2 || *i >= n || s[*i] != end) return -1;
    (*i)++;
    return v;
}

int px_text_sink_splice(const px_text_sink *sink, const unsigned char *svg, size_t n,
                        unsigned char **out, size_t *nout)
{
    *out = NULL;
    *nout = 0;
    if (sink->over) return PX_ELIMIT;
    if (sink->b.failed) return PX_ENOMEM;
    size_t cap = n + sink->b.n + 1, o = 0, from = 0;
    unsigned char *d = px_alloc(NULL, cap);
    if (!d) return PX_ENOMEM;
    const size_t hl = sizeof mark_head - 1, tl = sizeof mark_tail - 1;
    for (size_t i = 0; i + hl < n;) {
        const unsigned char *h = memchr(svg + i, 'f', n - i);
        if (!h) break;
        i = (size_t)(h - svg);
        if (n - i < hl || memcmp(svg + i, mark_head, hl) != 0) {
            i++;
            continue;
        }
        size_t j = i + hl;
        int hi = mark_digits(svg, n, &j, '%');
        int lo = hi >= 0 && j < n && svg[j] == ',' ? (j++, mark_digits(svg, n, &j, '%')) : -1;
        if (lo < 0 || j < 1 || n - (j - 1) < tl || memcmp(svg + j - 1, mark_tail, tl) != 0) {
            i++;
            continue;
        }
        int id = hi * 100 + lo;
        /* the element around it: from its '<' to its "/>" */
        size_t s0 = i;
        while (s0 > from && svg[s0] != '<') s0--;
        const unsigned char *e = svg + j;
        while ((size_t)(e - svg) + 1 < n && !(e[0] == '/' && e[1] == '>')) e++;
        if (svg[s0] != '<' || (size_t)(e - svg) + 1 >= n || id >= sink->count) {
            px_free(NULL, d);
            return PX_EIO;
        }
        size_t s1 = (size_t)(e - svg) + 2;
        memcpy(d + o, svg + from, s0 - from);
        o += s0 - from;
        size_t el = sink->at[id + 1] - sink->at[id];
        if (o + el + (n - s1) + 1 > cap) { /* a marker is shorter than its element */
            size_t old = cap;
            cap = o + el + (n - s1) + 1 + sink->b.n;
            unsigned char *g = px_realloc(NULL, d, old, cap);
            if (!g) {
                px_free(NULL, d);
                return PX_ENOMEM;
            }
            d = g;
        }
        memcpy(d + o, sink->b.s + sink->at[id], el);
        o += el;
        from = i = s1;
    }
    memcpy(d + o, svg + from, n - from);
    o += n - from;
    *out = d;
    *nout = o;
    return PX_OK;
}

void px_text_draw(cairo_t *cr, const char *text, int chem, double size, double x, double y)
{
    px_text_sink *k = cairo_get_user_data(cr, &sink_key);
    if (k) svg_text(cr, k, text, chem, size, x, y, NULL);
    else layout(cr, text, chem, size, x, y, 1);
}

void px_text_draw_halo(cairo_t *cr, const char *text, int chem, double size, double x, double y,
                       double halo_width, double r, double g, double b, double a)
{
    px_text_sink *k = cairo_get_user_data(cr, &sink_key);
    if (k) {
        const double halo[5] = {halo_width, r, g, b, a};
        svg_text(cr, k, text, chem, size, x, y, halo);
        return;
    }
    cairo_save(cr);
    cairo_new_path(cr);
    layout(cr, text, chem, size, x, y, 2);
    cairo_set_source_rgba(cr, r, g, b, a);
    cairo_set_line_width(cr, halo_width);
    cairo_set_line_join(cr, CAIRO_LINE_JOIN_ROUND);
    cairo_set_dash(cr, NULL, 0, 0);
    cairo_stroke(cr);
    cairo_restore(cr);
    layout(cr, text, chem, size, x, y, 1); /* real text on top: stays text in PDF */
}

void px_text_draw_vertical(cairo_t *cr, const char *text, double size, double x, double y)
{
    double w, h;
    px_text_measure(cr, text, 0, size, &w, &h);
    cairo_save(cr);
    cairo_translate(cr, x, y);
    cairo_rotate(cr, -1.5707963267948966); /* -pi/2 */
    px_text_draw(cr, text, 0, size, -w / 2, h / 3);
    cairo_restore(cr);
}

void px_text_prepare(cairo_t *cr)
{
    /* Unhinted advances: the same widths on every surface and scale, so
     * layout in points does not depend on the output format or dpi. */
    cairo_font_options_t *fo = cairo_font_options_create();
    cairo_font_options_set_hint_metrics(fo, CAIRO_HINT_METRICS_OFF);
    cairo_set_font_options(cr, fo);
    cairo_font_options_destroy(fo);
}

cairo_t *px_text_scratch(void)
{
    cairo_surface_t *s = cairo_image_surface_create(CAIRO_FORMAT_ARGB32, 1, 1);
    cairo_t *cr = cairo_create(s); /* holds its own reference to s */
    cairo_surface_destroy(s);
    px_text_prepare(cr);
    return cr; /* on failure an inert context in an error state */
}

double px_text_width(const char *text, int chem, double size)
{
    if (!text || !(size > 0 && size < 200)) return -1;
    cairo_t *cr = px_text_scratch();
    double w, h;
    px_text_measure(cr, text, chem, size, &w, &h);
    int ok = cairo_status(cr) == CAIRO_STATUS_SUCCESS;
    cairo_destroy(cr);
    return ok ? w : -1;
}

int px_text_runs(const char *text, int chem, void (*emit)(void *user, int kind, const char *s),
                 void *user)
{
    if (!text || !emit) return 0;
    run runs[PX_RUN_MAX];
    int nr = split_text(text, chem, runs);
    for (int i = 0; i < nr; i++)
        emit(user, runs[i].kind == RUN_SUB ? 1 : runs[i].kind == RUN_SUP ? 2 : 0, runs[i].text);
    return nr;
}
