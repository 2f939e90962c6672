/* layout.h - private to src/render: the page layout shared by the drawing
 * files.  What lives where:
 *   layout.c    page geometry: margins from measured tick labels and
 *               titles, plot and cell rectangles, ticks and their text,
 *               legend box, data-to-page mapping, text fitting;
 *   labelbox.c  the record of placed text boxes (px_lrec) and the overlap
 *               tests every placement uses;
 *   labels.c    placement of in-plot labels (field labels inside or led
 *               out, labels along lines, given texts);
 *   draw.c      cairo drawing of a page in that layout, and
 *               px_figure_layout() (the same boxes, handed to callers);
 *   backend.c   surfaces per format, PNG/PDF metadata, finish and save;
 *   svgpass.c   the rewriting passes over cairo's SVG bytes.
 * Every placement is computed once, here, and recorded as a px_label_box;
 * nothing else models the layout a second time.  Sizes in points at text
 * scale 1; font sizes and text distances scale with the figure's text scale,
 * strokes of the frame and ticks with its line scale.  Out of memory never
 * stops a drawing: px_lrec_add and px_labels_place mark the record failed
 * (px_figure_layout reports PX_ENOMEM). */
#ifndef PX_RENDER_LAYOUT_H
#define PX_RENDER_LAYOUT_H
#include "render/figure_priv.h"
#include <cairo.h>
#include <stddef.h>

/* Layout in points at text scale 1 (common practice for report figures,
 * no source). */
#define PX_PAD 4.0            /* between the figure's edge (or cell) and text */
#define PX_GAP 3.0            /* between tick labels, axis titles and the frame */
#define PX_STAMP_LINE 8.5     /* stamp line height */
#define PX_STAMP_SIZE 6.5     /* stamp font size (shrinks to fit the width) */
#define PX_STAMP_MIN 4.0      /* smallest stamp font size */
#define PX_TICK_SIZE 8.5      /* tick label font size */
#define PX_AXIS_TITLE_SIZE 9.5
#define PX_PANEL_TITLE_SIZE 10.0
#define PX_TITLE_MIN 6.5      /* titles shrink to fit down to this size */
#define PX_LABEL_MAX 9.5      /* field label sizes tried, largest first */
#define PX_LABEL_MIN 5.5
#define PX_LABEL_STEP 0.5
#define PX_LABEL_EASY 0.75    /* vertical labels only below this fraction of the largest size */
#define PX_LEAD_STEP 14.0     /* lead-out label distance steps, points */
#define PX_LEAD_RINGS 12      /* distance steps tried */
#define PX_TICK_LEN 4.0
#define PX_FRAME_WIDTH 0.8
#define PX_MAX_TICKS 9
#define PX_TICK_SPACE 6.0     /* least space between neighbouring tick labels */
#define PX_LEGEND_SIZE 7.5
#define PX_LEGEND_SWATCH 18.0 /* legend sample length */
#define PX_LEGEND_INSET 6.0   /* legend box distance from the frame */
#define PX_LEGEND_MAX_FRAC 0.35 /* widest legend, fraction of the panel's cell */
#define PX_HALO_WIDTH 2.2     /* light outline behind labels in the plot */
#define PX_HALO_ALPHA 0.75
#define PX_INSET 1.5          /* labels keep this far inside the frame (beyond the halo) */
#define PX_ASCENT 0.8         /* baseline below a text box's top, fraction of its height */
#define PX_CANDIDATES 14      /* label spots tried per field: a grid this many on a side */
#define PX_LINE_SPOTS 41      /* spots tried along a line for its label */
#define PX_LINE_SHRINK 0.8    /* line labels shrink down to this fraction of their size */
#define PX_PI 3.14159265358979323846
#define PX_FIT_MAX 512        /* longest text px_fit_text cuts (bytes of its buffer) */

typedef struct px_rect {
    double x, y, w, h;
} px_rect;

/* The boxes placed so far (the layout), see render.h. */
typedef struct px_lrec {
    px_label_box *b;
    size_t n, cap;
    int failed; /* out of memory: nothing more is recorded */
} px_lrec;

/* ---- labelbox.c: the record and overlap tests ---- */
/* A box of w along the text direction and h across it, centred on (cx, cy),
 * at `angle` degrees counter-clockwise (page y points down). */
px_label_box px_box_make(px_label_kind kind, int panel, long item, double size, double angle,
                         double cx, double cy, double w, double h);
/* Append a box with a copy of text; NULL (and r->failed) when out of memory. */
px_label_box *px_lrec_add(px_lrec *r, px_label_box b, const char *text);
void px_lrec_free(px_lrec *r);
/* Record an axis-aligned text box with its top left at (x, y). */
void px_lrec_rect(px_lrec *r, px_label_kind kind, int panel, const char *text, double size,
                  double x, double y, double w, double h);
int px_box_in_rect(const px_label_box *b, px_rect r);
/* Is the box clear of every placed box from `first` on and of their leaders? */
int px_box_clear(const px_lrec *r, size_t first, const px_label_box *b);
/* Do the segments ab and cd cross (proper crossing)? */
double px_seg_seg_cross(double ax, double ay, double bx, double by, double cx, double cy,
                        double dx, double dy);
/* Does the segment touch the box (cross an edge or lie inside)? */
int px_seg_hits_box(const px_label_box *b, double x0, double y0, double x1, double y1);
/* The end of a leader on its label's box: the nearest point of the box. */
void px_leader_end(const px_label_box *b, double *ex, double *ey);

/* ---- layout.c: page geometry ---- */
double px_foot_height(const px_figure *f);  /* the stamp's height */
double px_page_height(const px_figure *f);  /* the figure, plus the stamp when below */
double px_text_w(cairo_t *m, const char *s, int chem, double size);
double px_text_h(cairo_t *m, double size);
/* Largest size <= size (down to min) at which s fits in avail points. */
double px_fit_size(cairo_t *m, const char *s, int chem, double size, double min, double avail);
/* s, or a copy in buf[PX_FIT_MAX] cut with an ellipsis to fit avail points. */
const char *px_fit_text(cairo_t *m, const char *s, int chem, double size, double avail, char *buf);
void px_tick_text(char *buf, size_t n, double v, double step, int logaxis);
/* Ticks whose labels fit along avail points (<= 0: no limit); *wmax the widest. */
size_t px_axis_ticks(cairo_t *m, const px_panel *p, double ts, int yaxis, double avail, double *t,
                     double *wmax);
int px_in_legend(const px_item *it);
size_t px_legend_box(cairo_t *m, const px_panel *p, double ts, double cap, double *bw, double *bh,
                     double *line);
double px_legend_cap(double cell_w, double ts);
double px_title_drop(double tick_h, double gap);
/* The plot rectangle of a panel (in a grid the frames line up); alone: a page of its own. */
px_rect px_plot_rect(const px_figure *f, cairo_t *m, int panel, int alone);
px_rect px_cell_rect(const px_figure *f, int panel, int alone);
/* Where the legend goes, or 0 when there is none. */
int px_legend_rect(cairo_t *cr, const px_panel *p, double ts, px_rect r, px_rect cell, px_rect *out);
double px_map_x(const px_panel *p, px_rect r, double x);
double px_map_y(const px_panel *p, px_rect r, double y);

/* ---- labels.c ---- */
void px_labels_place(cairo_t *cr, const px_figure *f, int panel, px_rect r, size_t first, px_lrec *lr);

/* ---- draw.c ---- */
/* One page: every panel (only_panel < 0) or one alone, and the stamp;
 * rec (may be NULL) receives the boxes placed. */
void px_draw_page(cairo_t *cr, const px_figure *f, int only_panel, px_lrec *rec);

#endif
