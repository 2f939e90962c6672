/* text.h - private: all text drawing of the render module lives in text.c,
 * so a richer text layer can replace cairo's toy text API in one place. */
#ifndef PX_RENDER_TEXT_H
#define PX_RENDER_TEXT_H
#include <cairo.h>

#define PX_FONT_FAMILY "DejaVu Sans" /* Debian fonts-dejavu-core */

/* Width and height (ascent + descent) of text at size; chem renders a
 * chemical formula (subscript counts, superscript charges, state); plain
 * text may hold formulas in braces, "{Fe^2+} at 25 °C". */
void px_text_measure(cairo_t *cr, const char *text, int chem, double size, double *w,
                     double *h);
/* Unhinted font metrics on cr (call once per context before measuring). */
void px_text_prepare(cairo_t *cr);
/* A 1 x 1 image context for measuring text outside drawing; destroy it. */
cairo_t *px_text_scratch(void);
/* Draw with the left end of the baseline at (x, y). */
void px_text_draw(cairo_t *cr, const char *text, int chem, double size, double x, double y);
/* Draw over a halo: the glyph outlines stroked `halo_width` wide in the
 * colour (r, g, b, a) first, so text stays legible over lines and hatching. */
void px_text_draw_halo(cairo_t *cr, const char *text, int chem, double size, double x, double y,
                       double halo_width, double r, double g, double b, double a);
/* SVG text: while a sink is attached to cr, the drawing calls write each
 * text as one SVG <text> element (a <tspan> per run, the halo as a stroke
 * painted first) into the sink, and draw in its place a marker: the text's
 * box filled in a colour that carries the element's number (PX_TEXT_MARK_*),
 * which px_text_sink_splice replaces by the element in cairo's SVG, so the
 * text keeps its place in the drawing order and its clip. */
#define PX_TEXT_MARK_MAX 10000 /* elements a figure can hold (two 2-digit colour channels) */
/* A growable NUL-terminated string; `failed` once memory ran out. */
typedef struct px_strbuf {
    char *s;
    size_t n, cap;
    int failed;
} px_strbuf;
void px_strbuf_put(px_strbuf *b, const char *s, size_t k);
typedef struct px_text_sink {
    px_strbuf b;    /* the elements, one after another */
    size_t *at;     /* start of element k in b.s; at[count] = b.n */
    int count, over; /* over: more texts than PX_TEXT_MARK_MAX */
} px_text_sink;
void px_text_sink_attach(cairo_t *cr, px_text_sink *sink);
void px_text_sink_free(px_text_sink *sink);
/* Replace the markers in the SVG text svg[0..n) by their elements: a new
 * buffer in *out (free it); PX_OK, PX_ENOMEM, PX_ELIMIT (more texts than
 * PX_TEXT_MARK_MAX), or PX_EIO when a marker names no element. */
int px_text_sink_splice(const px_text_sink *sink, const unsigned char *svg, size_t n,
                        unsigned char **out, size_t *nout);
/* Draw rotated by -90 degrees (for the y axis title), centred on (x, y). */
void px_text_draw_vertical(cairo_t *cr, const char *text, double size, double x, double y);

#endif
