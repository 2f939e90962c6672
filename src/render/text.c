/* text.c - text in figures, including chemical formulas in phlox notation
 * drawn the way chemists typeset them: "Fe(OH)3(s)" as Fe(OH)₃(s),
 * "SO4^2-" as SO₄²⁻, "CuSO4*5H2O(s)" as CuSO₄·5H₂O(s), "e-" as e⁻.  Counts
 * after an element or a closing parenthesis are subscripts, a charge after
 * '^' is a superscript with a true minus sign, '*' is the hydrate dot, and a
 * trailing state such as (s), (aq) or (s,calcite) is set in normal type. */
#include "render/text.h"
#include <ctype.h>
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

/* Walk the runs; draw when `draw` is set; return the advance width. */
static double layout(cairo_t *cr, const char *text, int chem, double size, double x, double y,
                     int draw)
{
    run runs[PX_RUN_MAX];
    int nr;
    if (chem) nr = split_chem(text, runs);
    else {
        nr = 1;
        runs[0].kind = RUN_NORMAL;
        strncpy(runs[0].text, text, sizeof runs[0].text - 1);
        runs[0].text[sizeof runs[0].text - 1] = '\0';
    }
    double adv = 0.0;
    for (int i = 0; i < nr; i++) {
        double fs = runs[i].kind == RUN_NORMAL ? size : size * PX_SCRIPT_SCALE;
        double dy = runs[i].kind == RUN_SUB ? size * PX_SUB_DROP
                    : runs[i].kind == RUN_SUP ? -size * PX_SUP_RISE : 0.0;
        set_font(cr, fs);
        cairo_text_extents_t te;
        cairo_text_extents(cr, runs[i].text, &te);
        if (draw) {
            cairo_move_to(cr, x + adv, y + dy);
            cairo_show_text(cr, runs[i].text);
        }
        adv += te.x_advance;
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

void px_text_draw(cairo_t *cr, const char *text, int chem, double size, double x, double y)
{
    layout(cr, text, chem, size, x, y, 1);
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
