/* render.h - figures for phlox: predominance maps, curve plots and
 * multi-panel grids, drawn with cairo to PNG, SVG or PDF.
 *
 * A figure is plain data (the model): panels on a grid, each with axes,
 * filled polygons (fields) with chemical labels, polylines, text and legend
 * entries, plus stamp lines at the foot.  px_figure_save() lays it out and
 * draws it; the output format follows the file extension.  Identical figures
 * give identical SVG and PDF bytes (no timestamps; PDF dates are pinned).
 *
 * Units: figure sizes in points (1/72 in); PNG pixels = points x dpi / 72.
 * Coordinates of items are data coordinates of their panel. */
#ifndef PX_RENDER_H
#define PX_RENDER_H
#include <stddef.h>

typedef struct px_rgba {
    double r, g, b, a; /* 0..1 */
} px_rgba;

typedef enum px_dash {
    PX_DASH_SOLID = 0,
    PX_DASH_DASHED,
    PX_DASH_DOTTED,
    PX_DASH_DASHDOT
} px_dash;

typedef enum px_format { PX_FORMAT_PNG = 0, PX_FORMAT_SVG, PX_FORMAT_PDF } px_format;

typedef struct px_figure px_figure;

/* A figure of width x height points with rows x cols panels.  NULL when out
 * of memory or the arguments are not sensible. */
px_figure *px_figure_new(double width, double height, int rows, int cols);
void px_figure_free(px_figure *fig); /* NULL is fine */

/* Panel (0-based, row-major) axes: data window and log flags. */
int px_figure_axes(px_figure *fig, int panel, double x0, double x1, double y0, double y1,
                   int xlog, int ylog);
/* Axis titles and panel title (each may be NULL).  Text follows the label
 * notation of px_text (see text.h): chemical formulas in `{...}`. */
int px_figure_titles(px_figure *fig, int panel, const char *xlabel, const char *ylabel,
                     const char *title);

/* A filled field with an optional chemical label (e.g. "Fe(OH)3(s)").  The
 * label goes at (lx, ly) when both are finite, else at the polygon's pole of
 * inaccessibility; it shrinks to fit and is led out by a line when the field
 * is too thin. */
int px_figure_polygon(px_figure *fig, int panel, const double *x, const double *y, size_t n,
                      px_rgba fill, px_rgba stroke, double stroke_width, const char *label,
                      double lx, double ly);
/* A polyline; `legend` (may be NULL) adds a legend entry. */
int px_figure_line(px_figure *fig, int panel, const double *x, const double *y, size_t n,
                   px_rgba color, double width, px_dash dash, const char *legend);
/* Text at data coordinates; chem != 0 renders it as a chemical formula. */
int px_figure_text(px_figure *fig, int panel, double x, double y, const char *text, int chem,
                   double size, px_rgba color);
/* A line of the stamp at the foot of the figure (conditions, checksums). */
int px_figure_stamp(px_figure *fig, const char *text);

/* PDF only: put each panel on a page of its own (full page size). */
int px_figure_page_per_panel(px_figure *fig, int on);

/* The format for a file name by its extension (.png .svg .pdf), or -1. */
int px_format_from_path(const char *path);
/* Draw and write atomically (temporary file, then rename).  dpi only
 * matters for PNG (72 gives one pixel per point). */
int px_figure_save(const px_figure *fig, const char *path, double dpi);
/* Draw into memory: *out (malloc'd, caller frees) and *n bytes. */
int px_figure_render(const px_figure *fig, px_format fmt, double dpi, unsigned char **out,
                     size_t *n);
/* The panel's plot rectangle in output units (points, or pixels for PNG at
 * dpi) after layout, for tests that probe pixels. */
int px_figure_plot_rect(const px_figure *fig, int panel, double dpi, double *x, double *y,
                        double *w, double *h);

/* Nice tick positions for [a, b]: at most max_ticks values, steps 1, 2 or 5
 * times a power of ten; returns how many were written. */
size_t px_ticks_linear(double a, double b, size_t max_ticks, double *ticks);
/* Decades (and 2, 5 between when there are few) for a log axis, a, b > 0. */
size_t px_ticks_log(double a, double b, size_t max_ticks, double *ticks);

/* Point-in-polygon (even-odd) and the pole of inaccessibility (the interior
 * point farthest from the edges, to precision `tol`), for label placement. */
int px_polygon_contains(const double *x, const double *y, size_t n, double px, double py);
int px_polygon_pole(const double *x, const double *y, size_t n, double tol, double *px,
                    double *py, double *dist);

#endif
