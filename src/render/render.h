/* render.h - figures for phlox: predominance maps, curve plots and
 * multi-panel grids, drawn with cairo to PNG, SVG or PDF.
 *
 * A figure is plain data (the model): panels on a grid, each with axes,
 * filled polygons (fields) with chemical labels, polylines, text and legend
 * entries, plus stamp lines at the foot.  px_figure_save() lays it out and
 * draws it; the output format follows the file extension.  Identical figures
 * give identical SVG and PDF bytes (no timestamps; PDF dates are pinned).
 * Margins follow the measured tick labels and titles, so no text is cut off
 * at the figure's edges.  SVG output writes text as SVG <text> (or as
 * glyph outlines, px_figure_svg_text) and also carries the figure's words
 * as an SVG <title> and <desc> (panel titles, axis titles, field labels in
 * phlox notation, legend entries, stamp) for search, screen readers and
 * tests.
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

/* Where a panel's legend goes: a corner inside the plot, or outside to the
 * right of it (the plot narrows to make room). */
typedef enum px_legend_place {
    PX_LEGEND_TOP_RIGHT = 0,
    PX_LEGEND_TOP_LEFT,
    PX_LEGEND_BOTTOM_LEFT,
    PX_LEGEND_BOTTOM_RIGHT,
    PX_LEGEND_OUTSIDE
} px_legend_place;

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
/* Hatching: parallel lines `spacing` points apart at `angle` degrees
 * (counter-clockwise from the x axis), clipped to the polygon; no fill. */
int px_figure_hatch(px_figure *fig, int panel, const double *x, const double *y, size_t n,
                    px_rgba color, double width, double spacing, double angle);
/* A legend entry with a filled swatch (outlined in `stroke`; hatch > 0 adds
 * hatching in the stroke colour that many points apart at `angle` degrees,
 * as px_figure_hatch). */
int px_figure_legend_patch(px_figure *fig, int panel, const char *text, px_rgba fill,
                           px_rgba stroke, double hatch, double angle);
/* The panel's legend position (default PX_LEGEND_TOP_RIGHT). */
int px_figure_legend_place(px_figure *fig, int panel, px_legend_place where);
/* A line of the stamp at the foot of the figure (conditions, checksums). */
int px_figure_stamp(px_figure *fig, const char *text);
/* The stamp goes below the figure's height (the page grows by it) instead
 * of taking room from the panels; off by default. */
int px_figure_stamp_below(px_figure *fig, int on);

/* Scale every font size (tick labels, titles, field labels, legend, stamp)
 * by `text` and the frame and tick strokes by `line` (presets for a journal
 * column, a slide, ...); both in [0.3, 4], default 1. */
int px_figure_scale(px_figure *fig, double text, double line);
/* Only the first n panels are drawn (a grid of 3 maps on 2 x 2 leaves the
 * fourth cell blank, with no axes); default all. */
int px_figure_panels_used(px_figure *fig, int n);
/* A text placed along a polyline (data coordinates of the panel) by the
 * layout: rotated to the line's direction, on either side of it, at the
 * clear spot nearest the fraction `at` (0..1) of its length, shrinking to
 * 80 % of `size` if it must, then trying the shorter `alt` (may be NULL);
 * left out (the layout says so) when no spot is clear.  The line itself is
 * drawn by px_figure_line. */
int px_figure_line_label(px_figure *fig, int panel, const double *x, const double *y, size_t n,
                         const char *text, const char *alt, int chem, double size, px_rgba color,
                         double at);
/* File metadata, one value per key (set again to replace): SVG <metadata>,
 * PDF document information (Title, Subject = Description + Disclaimer,
 * Keywords), PNG text chunks (tEXt, or iTXt when not ASCII).  Keys are
 * 1-79 printable ASCII characters (PNG keyword rules), e.g. "Title",
 * "Description", "Software", "Disclaimer". */
int px_figure_meta(px_figure *fig, const char *key, const char *text);

/* What the layout placed: every piece of text with its box.  Kinds: */
typedef enum px_label_kind {
    PX_LABEL_FIELD = 0, /* a field label inside its field */
    PX_LABEL_LEADER,    /* a field label led out by a line (anchor ax, ay) */
    PX_LABEL_LINE,      /* a px_figure_line_label */
    PX_LABEL_TEXT,      /* a px_figure_text */
    PX_LABEL_LEGEND,    /* a legend box (inside or outside the plot) */
    PX_LABEL_TICK,
    PX_LABEL_AXIS,      /* axis title */
    PX_LABEL_TITLE,     /* panel title */
    PX_LABEL_STAMP      /* a stamp line (panel -1) */
} px_label_kind;

typedef struct px_label_box {
    px_label_kind kind;
    int panel;     /* 0-based, -1 for the stamp */
    long item;     /* index of the item in its panel (in the order added), or -1 */
    char *text;    /* owned by the layout */
    int placed;    /* 0: no clear spot, not drawn (line labels only) */
    double size;   /* font size, points */
    double angle;  /* degrees counter-clockwise from the x axis */
    double qx[4], qy[4];  /* the box's corners, points from the top left of the figure */
    double ax, ay; /* leader anchor (PX_LABEL_LEADER) */
} px_label_box;

/* The layout of the whole figure as drawn (not page_per_panel): boxes in
 * *out (caller frees with px_figure_layout_free). */
int px_figure_layout(const px_figure *fig, px_label_box **out, size_t *n);
void px_figure_layout_free(px_label_box *boxes, size_t n);

/* A panel without frame, ticks or titles: its items only, on the whole
 * cell (pages of text, e.g. a report's; give it axes 0..width, height..0
 * so data units are points from the top left). */
int px_figure_bare(px_figure *fig, int panel, int on);
/* Several figures as the pages of one PDF, each page the size of its
 * figure; document information from the first figure's metadata.  Written
 * atomically. */
int px_figures_save_pdf(const px_figure *const *figs, size_t n, const char *path);
/* The runs of a text as figures typeset it (see text.h): kind 0 normal,
 * 1 subscript, 2 superscript, each run's UTF-8 text to `emit`.  Returns
 * the number of runs. */
int px_text_runs(const char *text, int chem, void (*emit)(void *user, int kind, const char *s),
                 void *user);

/* Output through the former paths, kept as the reference the benchmark
 * and tests compare with: PNG by cairo's writer (slower, compresses harder;
 * the same pixels and text chunks) and SVG numbers rounded by strtod and
 * printf (the same bytes).  Off by default. */
int px_figure_reference_output(px_figure *fig, int on);

/* How SVG output writes text: as SVG <text> elements in the font the
 * layout measured with (the default; small files, searchable, drawn by the
 * viewer's copy of the font), or as cairo's glyph outlines (the same
 * look everywhere, about eight times the bytes). */
typedef enum px_svg_text { PX_SVG_TEXT_TEXT = 0, PX_SVG_TEXT_OUTLINE } px_svg_text;
int px_figure_svg_text(px_figure *fig, px_svg_text mode);

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

/* Advance width in points of text at `size` as figures lay it out (chem as
 * in px_figure_text), for wrapping stamp lines; -1 on bad input. */
double px_text_width(const char *text, int chem, double size);

/* Nice tick positions for [a, b]: at most max_ticks values, steps 1, 2 or 5
 * times a power of ten; returns how many were written. */
size_t px_ticks_linear(double a, double b, size_t max_ticks, double *ticks);
/* Decades (and 2, 5 between when there are few) for a log axis, a, b > 0. */
size_t px_ticks_log(double a, double b, size_t max_ticks, double *ticks);

#endif
