/* text.h - private: all text drawing of the render module lives in text.c,
 * so a richer text layer can replace cairo's toy text API in one place. */
#ifndef PX_RENDER_TEXT_H
#define PX_RENDER_TEXT_H
#include <cairo.h>

#define PX_FONT_FAMILY "DejaVu Sans" /* Debian fonts-dejavu-core */

/* Width and height (ascent + descent) of text at size; chem renders a
 * chemical formula (subscript counts, superscript charges, state). */
void px_text_measure(cairo_t *cr, const char *text, int chem, double size, double *w,
                     double *h);
/* Draw with the left end of the baseline at (x, y). */
void px_text_draw(cairo_t *cr, const char *text, int chem, double size, double x, double y);
/* Draw rotated by -90 degrees (for the y axis title), centred on (x, y). */
void px_text_draw_vertical(cairo_t *cr, const char *text, double size, double x, double y);

#endif
