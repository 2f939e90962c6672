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
/* Draw rotated by -90 degrees (for the y axis title), centred on (x, y). */
void px_text_draw_vertical(cairo_t *cr, const char *text, double size, double x, double y);

#endif
