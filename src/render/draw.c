/* draw.c - layout and drawing of a figure with cairo, and the output
 * back end (surface by format, finish, status checked once at the end, as
 * cairo errors are sticky).  The only file of phlox that calls cairo drawing
 * functions, with text.c for text.
 *
 * Every piece of text is placed once, here: field labels (inside their
 * field, horizontal or vertical, else led out by a line), labels along
 * lines (water lines, neutral pH), texts, legends, ticks, titles and the
 * stamp.  Each placement is recorded as a box (px_label_box); later labels
 * keep clear of the recorded ones, and px_figure_layout() hands the same
 * boxes to callers and tests, so nothing models the layout a second time. */
#include "core/atomic.h"
#include "core/status.h"
#include "geom/geom.h"
#include "render/figure_priv.h"
#include "render/png.h"
#include "render/text.h"
#include <cairo-pdf.h>
#include <cairo-svg.h>
#include <cairo.h>
#include <math.h>
#include <stdio.h>
#include <stdlib.h>
#include <string.h>

/* Layout in points at text scale 1 (common practice for report figures,
 * no source); font sizes and text distances scale with the figure's text
 * scale, strokes of the frame and ticks with its line scale. */
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
#define PX_PDF_FIXED_DATE "2000-01-01T00:00:00Z" /* pinned: same input, same bytes */

typedef struct rect {
    double x, y, w, h;
} rect;

/* The boxes placed so far (the layout), see render.h. */
typedef struct lrec {
    px_label_box *b;
    size_t n, cap;
    int failed;
} lrec;

static char *dup_text(const char *s)
{
    size_t n = strlen(s) + 1;
    char *d = malloc(n);
    if (d) memcpy(d, s, n);
    return d;
}

/* A box of w along the text direction and h across it, centred on (cx, cy),
 * at `angle` degrees counter-clockwise (page y points down). */
static px_label_box make_box(px_label_kind kind, int panel, long item, double size, double angle,
                             double cx, double cy, double w, double h)
{
    px_label_box b;
    memset(&b, 0, sizeof b);
    b.kind = kind;
    b.panel = panel;
    b.item = item;
    b.placed = 1;
    b.size = size;
    b.angle = angle;
    double a = angle * PX_PI / 180.0;
    double ux = cos(a), uy = -sin(a), vx = sin(a), vy = cos(a);
    static const double su[4] = {-1, 1, 1, -1}, sv[4] = {-1, -1, 1, 1};
    for (int k = 0; k < 4; k++) {
        b.qx[k] = cx + su[k] * ux * w / 2 + sv[k] * vx * h / 2;
        b.qy[k] = cy + su[k] * uy * w / 2 + sv[k] * vy * h / 2;
    }
    b.ax = b.ay = NAN;
    return b;
}

static px_label_box *rec_add(lrec *r, px_label_box b, const char *text)
{
    if (!r || r->failed) return NULL;
    if (r->n == r->cap) {
        size_t cap = r->cap ? 2 * r->cap : 64;
        px_label_box *d = realloc(r->b, cap * sizeof *d);
        if (!d) {
            r->failed = 1;
            return NULL;
        }
        r->b = d;
        r->cap = cap;
    }
    b.text = dup_text(text ? text : "");
    if (!b.text) {
        r->failed = 1;
        return NULL;
    }
    r->b[r->n] = b;
    return &r->b[r->n++];
}

static void rec_free(lrec *r)
{
    for (size_t i = 0; i < r->n; i++) free(r->b[i].text);
    free(r->b);
    r->b = NULL;
    r->n = r->cap = 0;
}

/* Record an axis-aligned text box with its top left at (x, y). */
static void rec_rect(lrec *r, px_label_kind kind, int panel, const char *text, double size,
                     double x, double y, double w, double h)
{
    rec_add(r, make_box(kind, panel, -1, size, 0, x + w / 2, y + h / 2, w, h), text);
}

/* Separating axis test of two convex quadrilaterals (touching is apart). */
static int quads_overlap(const double *ax, const double *ay, const double *bx, const double *by)
{
    for (int s = 0; s < 2; s++) {
        const double *px = s ? bx : ax, *py = s ? by : ay;
        for (int k = 0; k < 4; k++) {
            double nx = -(py[(k + 1) % 4] - py[k]), ny = px[(k + 1) % 4] - px[k];
            double a0 = INFINITY, a1 = -INFINITY, b0 = INFINITY, b1 = -INFINITY;
            for (int q = 0; q < 4; q++) {
                double da = ax[q] * nx + ay[q] * ny, db = bx[q] * nx + by[q] * ny;
                a0 = fmin(a0, da), a1 = fmax(a1, da), b0 = fmin(b0, db), b1 = fmax(b1, db);
            }
            double eps = 1e-9 * (fabs(a0) + fabs(a1) + fabs(b0) + fabs(b1) + 1);
            if (a1 <= b0 + eps || b1 <= a0 + eps) return 0;
        }
    }
    return 1;
}

static int box_in_rect(const px_label_box *b, rect r)
{
    for (int k = 0; k < 4; k++)
        if (b->qx[k] < r.x || b->qx[k] > r.x + r.w || b->qy[k] < r.y || b->qy[k] > r.y + r.h)
            return 0;
    return 1;
}

static int seg_hits_box(const px_label_box *b, double x0, double y0, double x1, double y1);

/* The end of a leader on its label's box: the nearest point of the box. */
static void leader_end(const px_label_box *b, double *ex, double *ey)
{
    *ex = fmin(fmax(b->ax, b->qx[0]), b->qx[1]);
    *ey = fmin(fmax(b->ay, b->qy[0]), b->qy[2]);
}

/* Is the box clear of every in-plot box of the panel recorded from `first`
 * on, and of their leader lines? */
static int box_clear(const lrec *r, size_t first, const px_label_box *b)
{
    for (size_t i = first; r && i < r->n; i++) {
        const px_label_box *o = &r->b[i];
        if (!o->placed) continue;
        if (quads_overlap(b->qx, b->qy, o->qx, o->qy)) return 0;
        if (o->kind == PX_LABEL_LEADER) {
            double ex, ey;
            leader_end(o, &ex, &ey);
            if (seg_hits_box(b, o->ax, o->ay, ex, ey)) return 0;
        }
    }
    return 1;
}

static double seg_seg_cross(double ax, double ay, double bx, double by, double cx, double cy,
                            double dx, double dy)
{
    double d1 = (bx - ax) * (cy - ay) - (by - ay) * (cx - ax);
    double d2 = (bx - ax) * (dy - ay) - (by - ay) * (dx - ax);
    double d3 = (dx - cx) * (ay - cy) - (dy - cy) * (ax - cx);
    double d4 = (dx - cx) * (by - cy) - (dy - cy) * (bx - cx);
    return ((d1 > 0) != (d2 > 0)) && ((d3 > 0) != (d4 > 0));
}

/* Does the segment touch the box (cross an edge or lie inside)? */
static int seg_hits_box(const px_label_box *b, double x0, double y0, double x1, double y1)
{
    for (int k = 0; k < 4; k++)
        if (seg_seg_cross(x0, y0, x1, y1, b->qx[k], b->qy[k], b->qx[(k + 1) % 4],
                          b->qy[(k + 1) % 4]))
            return 1;
    return px_geom_polygon_contains(b->qx, b->qy, 4, x0, y0);
}

static double foot_height(const px_figure *f)
{
    return f->n_stamp ? (double)f->n_stamp * PX_STAMP_LINE * f->ts + 6.0 * f->ts : 0.0;
}

/* The page: the figure's height, plus the stamp when it goes below. */
static double page_height(const px_figure *f)
{
    return f->height + (f->stamp_below ? foot_height(f) : 0.0);
}

static double text_w(cairo_t *m, const char *s, int chem, double size)
{
    double w, h;
    px_text_measure(m, s, chem, size, &w, &h);
    return w;
}

static double text_h(cairo_t *m, double size)
{
    double w, h;
    px_text_measure(m, "0", 0, size, &w, &h);
    return h;
}

/* Largest size <= size (down to min) at which s fits in avail points. */
static double fit_size(cairo_t *m, const char *s, int chem, double size, double min, double avail)
{
    double w = text_w(m, s, chem, size);
    if (w <= avail || w <= 0) return size;
    double fs = size * avail / w;
    return fs < min ? min : fs;
}

/* Text that fits `avail` points at `size`: s itself, or a copy in buf cut
 * at a UTF-8 character boundary and ended with an ellipsis, so text is
 * never cut off silently at the figure's edge. */
#define PX_FIT_MAX 512
static const char *fit_text(cairo_t *m, const char *s, int chem, double size, double avail,
                            char *buf)
{
    if (text_w(m, s, chem, size) <= avail) return s;
    size_t n = strlen(s);
    if (n > PX_FIT_MAX - 4) n = PX_FIT_MAX - 4;
    while (n > 0) {
        n--;
        while (n > 0 && ((unsigned char)s[n] & 0xC0) == 0x80) n--; /* continuation byte */
        memcpy(buf, s, n);
        memcpy(buf + n, "\xe2\x80\xa6", 4); /* U+2026 and the terminator */
        if (text_w(m, buf, chem, size) <= avail) return buf;
    }
    return buf;
}

/* Tick label text: enough decimals for the step, a true minus sign; log
 * axes show decades as 10 with a superscript exponent. */
static void tick_text(char *buf, size_t n, double v, double step, int logaxis)
{
    static const char *const sup[] = {"\xe2\x81\xb0", "\xc2\xb9", "\xc2\xb2", "\xc2\xb3",
                                      "\xe2\x81\xb4", "\xe2\x81\xb5", "\xe2\x81\xb6",
                                      "\xe2\x81\xb7", "\xe2\x81\xb8", "\xe2\x81\xb9"};
    char tmp[48];
    if (logaxis) {
        double e = log10(v);
        if (fabs(e - round(e)) < 1e-9 && fabs(e) < 1000) {
            int k = (int)round(e);
            char digits[16];
            snprintf(digits, sizeof digits, "%d", k < 0 ? -k : k);
            snprintf(buf, n, "10%s", k < 0 ? "\xe2\x81\xbb" : ""); /* U+207B superscript minus */
            for (const char *d = digits; *d; d++)
                if (strlen(buf) + 4 < n) strcat(buf, sup[*d - '0']);
            return;
        }
        snprintf(tmp, sizeof tmp, "%g", v);
    } else {
        int dec = 0;
        double s = fabs(step);
        while (dec < 6 && fabs(s * pow(10, dec) - round(s * pow(10, dec))) > 1e-6) dec++;
        snprintf(tmp, sizeof tmp, "%.*f", dec, v);
    }
    if (tmp[0] == '-') snprintf(buf, n, "\xe2\x88\x92%s", tmp + 1);
    else snprintf(buf, n, "%s", tmp);
}

static size_t raw_ticks(const px_panel *p, int yaxis, size_t max, double *t)
{
    if (yaxis) return p->ylog ? px_ticks_log(p->y0, p->y1, max, t) : px_ticks_linear(p->y0, p->y1, max, t);
    return p->xlog ? px_ticks_log(p->x0, p->x1, max, t) : px_ticks_linear(p->x0, p->x1, max, t);
}

/* Ticks whose labels fit along `avail` points without touching (avail <= 0:
 * no limit); *wmax is the widest label. */
static size_t axis_ticks(cairo_t *m, const px_panel *p, double ts, int yaxis, double avail,
                         double *t, double *wmax)
{
    char buf[64];
    size_t n = 0;
    double fh = text_h(m, PX_TICK_SIZE * ts);
    for (size_t max = PX_MAX_TICKS; max >= 2; max--) {
        n = raw_ticks(p, yaxis, max, t);
        double step = n > 1 ? t[1] - t[0] : 1, need = 0;
        *wmax = 0;
        for (size_t i = 0; i < n; i++) {
            int lg = yaxis ? p->ylog : p->xlog;
            tick_text(buf, sizeof buf, t[i], lg ? 0 : step, lg);
            double w = text_w(m, buf, 0, PX_TICK_SIZE * ts);
            *wmax = fmax(*wmax, w);
            need += (yaxis ? fh : w) + PX_TICK_SPACE * ts;
        }
        if (avail <= 0 || need <= avail || n <= 2) return n;
    }
    return n;
}

/* Legend entries: lines with a legend text, and patches. */
static int in_legend(const px_item *it)
{
    return (it->kind == PX_ITEM_LINE && it->text) || it->kind == PX_ITEM_PATCH;
}

/* The legend's box; entries longer than `cap` points are cut (fit_text). */
static size_t legend_box(cairo_t *m, const px_panel *p, double ts, double cap, double *bw,
                         double *bh, double *line)
{
    size_t count = 0;
    double wmax = 0, h = text_h(m, PX_LEGEND_SIZE * ts);
    for (size_t i = 0; i < p->n_items; i++)
        if (in_legend(&p->items[i])) {
            wmax = fmax(wmax, text_w(m, p->items[i].text, 0, PX_LEGEND_SIZE * ts));
            count++;
        }
    wmax = fmin(wmax, cap);
    *line = h + 2 * ts;
    *bw = wmax + (PX_LEGEND_SWATCH + 12) * ts;
    *bh = (double)count * *line + 6 * ts;
    return count;
}

/* The gap under a panel title: clear of the top y tick label, which
 * reaches half its height above the frame. */
static double title_drop(double tick_h, double gap)
{
    return fmax(gap, tick_h / 2 + gap / 2);
}

typedef struct margins {
    double left, right, top, bottom;
} margins;

/* The room a panel needs around its plot for ticks, titles and legend. */
static double legend_cap(double cell_w, double ts)
{
    return PX_LEGEND_MAX_FRAC * cell_w - (PX_LEGEND_SWATCH + 12) * ts;
}

static margins panel_margins(cairo_t *m, const px_panel *p, double ts, double cell_w)
{
    if (p->bare) return (margins){0, 0, 0, 0};
    double t[PX_MAX_TICKS + 8], ywmax = 0, xwmax = 0;
    size_t ny = axis_ticks(m, p, ts, 1, 0, t, &ywmax);
    (void)ny;
    size_t nx = axis_ticks(m, p, ts, 0, 0, t, &xwmax);
    char buf[64];
    double last_half = 0;
    if (nx > 0) { /* the last x tick label hangs over the right end */
        double step = nx > 1 ? t[1] - t[0] : 1;
        tick_text(buf, sizeof buf, t[nx - 1], p->xlog ? 0 : step, p->xlog);
        double w = text_w(m, buf, 0, PX_TICK_SIZE * ts);
        double frac = p->xlog ? (log10(t[nx - 1]) - log10(p->x0)) / (log10(p->x1) - log10(p->x0))
                              : (t[nx - 1] - p->x0) / (p->x1 - p->x0);
        if (frac > 0.9) last_half = w / 2;
    }
    double th = text_h(m, PX_TICK_SIZE * ts), ah = text_h(m, PX_AXIS_TITLE_SIZE * ts);
    double pad = PX_PAD * ts, gap = PX_GAP * ts;
    margins g;
    g.left = pad + (p->ylabel ? ah + gap : 0) + ywmax + gap;
    g.right = fmax(2 * pad, last_half + pad);
    g.top = p->title ? text_h(m, PX_PANEL_TITLE_SIZE * ts) + gap + title_drop(th, gap) : th / 2 + pad;
    g.bottom = gap + th + (p->xlabel ? gap + ah : 0) + pad;
    double bw, bh, line;
    if (p->legend == PX_LEGEND_OUTSIDE &&
        legend_box(m, p, ts, legend_cap(cell_w, ts), &bw, &bh, &line) > 0)
        g.right += bw + PX_LEGEND_INSET * ts;
    return g;
}

/* The plot rectangle of a panel.  In a grid every panel gets the largest
 * margins of all, so the frames line up; `alone` is a page of its own. */
static rect plot_rect_m(const px_figure *f, cairo_t *m, int panel, int alone)
{
    double fw = f->width, fh = page_height(f) - foot_height(f);
    double cw = alone ? fw : fw / f->cols, ch = alone ? fh : fh / f->rows;
    int r = alone ? 0 : panel / f->cols, c = alone ? 0 : panel % f->cols;
    margins g = panel_margins(m, &f->panels[panel], f->ts, cw);
    if (!alone)
        for (int i = 0; i < f->used; i++) {
            margins o = panel_margins(m, &f->panels[i], f->ts, cw);
            g.left = fmax(g.left, o.left);
            g.right = fmax(g.right, o.right);
            g.top = fmax(g.top, o.top);
            g.bottom = fmax(g.bottom, o.bottom);
        }
    rect p = {c * cw + g.left, r * ch + g.top, cw - g.left - g.right, ch - g.top - g.bottom};
    if (p.w < 10) p.w = 10;
    if (p.h < 10) p.h = 10;
    return p;
}

static double map_x(const px_panel *p, rect r, double x)
{
    double t = p->xlog ? (log10(x) - log10(p->x0)) / (log10(p->x1) - log10(p->x0))
                       : (x - p->x0) / (p->x1 - p->x0);
    return r.x + t * r.w;
}

static double map_y(const px_panel *p, rect r, double y)
{
    double t = p->ylog ? (log10(y) - log10(p->y0)) / (log10(p->y1) - log10(p->y0))
                       : (y - p->y0) / (p->y1 - p->y0);
    return r.y + r.h - t * r.h;
}

static void set_rgba(cairo_t *cr, px_rgba c)
{
    cairo_set_source_rgba(cr, c.r, c.g, c.b, c.a);
}

static void set_dash(cairo_t *cr, px_dash d, double w)
{
    double u = w < 0.8 ? 0.8 : w;
    double dashed[] = {5 * u, 3 * u}, dotted[] = {u, 2 * u}, dashdot[] = {6 * u, 2.5 * u, u, 2.5 * u};
    switch (d) {
    case PX_DASH_DASHED: cairo_set_dash(cr, dashed, 2, 0); break;
    case PX_DASH_DOTTED: cairo_set_dash(cr, dotted, 2, 0); break;
    case PX_DASH_DASHDOT: cairo_set_dash(cr, dashdot, 4, 0); break;
    default: cairo_set_dash(cr, NULL, 0, 0); break;
    }
}

static void path_of(cairo_t *cr, const px_panel *p, rect r, const px_item *it, int close)
{
    cairo_new_path(cr);
    for (size_t i = 0; i < it->n; i++) {
        double x = map_x(p, r, it->x[i]), y = map_y(p, r, it->y[i]);
        if (i == 0) cairo_move_to(cr, x, y);
        else cairo_line_to(cr, x, y);
    }
    if (close) cairo_close_path(cr);
}

/* Parallel lines over the box, `spacing` apart at `angle` degrees, anchored
 * at the page origin so neighbouring hatched areas line up; the caller has
 * set the clip. */
static void hatch_box(cairo_t *cr, rect b, double spacing, double angle)
{
    double a = angle * PX_PI / 180.0;
    double dx = cos(a), dy = -sin(a);  /* along the lines (page y points down) */
    double nx = -dy, ny = dx;          /* across them */
    double s0 = INFINITY, s1 = -INFINITY, l0 = INFINITY, l1 = -INFINITY;
    double cx[4] = {b.x, b.x + b.w, b.x, b.x + b.w}, cy[4] = {b.y, b.y, b.y + b.h, b.y + b.h};
    for (int k = 0; k < 4; k++) {
        double s = cx[k] * nx + cy[k] * ny, l = cx[k] * dx + cy[k] * dy;
        s0 = fmin(s0, s), s1 = fmax(s1, s), l0 = fmin(l0, l), l1 = fmax(l1, l);
    }
    cairo_new_path(cr);
    for (double s = floor(s0 / spacing) * spacing; s <= s1; s += spacing) {
        cairo_move_to(cr, s * nx + l0 * dx, s * ny + l0 * dy);
        cairo_line_to(cr, s * nx + l1 * dx, s * ny + l1 * dy);
    }
    cairo_stroke(cr);
}

static void draw_axes(cairo_t *cr, const px_figure *f, int panel, rect r, rect cell, lrec *rec)
{
    const px_panel *p = &f->panels[panel];
    double ts = f->ts;
    double t[PX_MAX_TICKS + 8], wmax;
    char buf[64];
    double tsz = PX_TICK_SIZE * ts, asz = PX_AXIS_TITLE_SIZE * ts, gap = PX_GAP * ts;
    double pad = PX_PAD * ts;
    cairo_set_source_rgb(cr, 0, 0, 0);
    cairo_set_line_width(cr, PX_FRAME_WIDTH * f->ls);
    set_dash(cr, PX_DASH_SOLID, 1);
    cairo_rectangle(cr, r.x, r.y, r.w, r.h);
    cairo_stroke(cr);
    double th = text_h(cr, tsz), ah = text_h(cr, asz);
    rect xb[2];
    int nx_boxes = 0;
    size_t n = axis_ticks(cr, p, ts, 0, r.w, t, &wmax);
    double step = n > 1 ? t[1] - t[0] : 1;
    for (size_t i = 0; i < n; i++) {
        double x = map_x(p, r, t[i]);
        cairo_move_to(cr, x, r.y + r.h);
        cairo_line_to(cr, x, r.y + r.h - PX_TICK_LEN * ts);
        cairo_stroke(cr);
        tick_text(buf, sizeof buf, t[i], p->xlog ? 0 : step, p->xlog);
        double w = text_w(cr, buf, 0, tsz);
        px_text_draw(cr, buf, 0, tsz, x - w / 2, r.y + r.h + gap + th * PX_ASCENT);
        rec_rect(rec, PX_LABEL_TICK, panel, buf, tsz, x - w / 2, r.y + r.h + gap, w, th);
        if (nx_boxes < 2 && (i == 0 || i + 1 == n)) xb[nx_boxes++] = (rect){x - w / 2, r.y + r.h + gap, w, th};
    }
    n = axis_ticks(cr, p, ts, 1, r.h, t, &wmax);
    step = n > 1 ? t[1] - t[0] : 1;
    for (size_t i = 0; i < n; i++) {
        double y = map_y(p, r, t[i]);
        cairo_move_to(cr, r.x, y);
        cairo_line_to(cr, r.x + PX_TICK_LEN * ts, y);
        cairo_stroke(cr);
        tick_text(buf, sizeof buf, t[i], p->ylog ? 0 : step, p->ylog);
        double w = text_w(cr, buf, 0, tsz);
        /* at the corner the first x tick label may reach under the lowest
         * y tick label: that one is left out (the tick stays) */
        int clash = 0;
        for (int q = 0; q < nx_boxes && !clash; q++)
            clash = xb[q].x < r.x - gap && xb[q].x + xb[q].w > r.x - gap - w &&
                    xb[q].y < y + th * 0.3 - th * PX_ASCENT + th;
        if (clash) continue;
        px_text_draw(cr, buf, 0, tsz, r.x - gap - w, y + th * 0.3);
        rec_rect(rec, PX_LABEL_TICK, panel, buf, tsz, r.x - gap - w, y + th * 0.3 - th * PX_ASCENT,
                 w, th);
    }
    char cut[PX_FIT_MAX];
    if (p->xlabel) {
        double avail = cell.w - 2 * pad;
        double s = fit_size(cr, p->xlabel, 0, asz, PX_TITLE_MIN * ts, avail);
        const char *tx = fit_text(cr, p->xlabel, 0, s, avail, cut);
        double w = text_w(cr, tx, 0, s), hh = text_h(cr, s);
        double x = fmin(fmax(r.x + r.w / 2 - w / 2, cell.x + pad), cell.x + cell.w - pad - w);
        double base = r.y + r.h + 2 * gap + th + ah * PX_ASCENT;
        px_text_draw(cr, tx, 0, s, x, base);
        rec_rect(rec, PX_LABEL_AXIS, panel, tx, s, x, base - hh * PX_ASCENT, w, hh);
    }
    if (p->ylabel) {
        double avail = fmin(r.h + r.y - cell.y - pad, cell.h - 2 * pad);
        double s = fit_size(cr, p->ylabel, 0, asz, PX_TITLE_MIN * ts, avail);
        const char *tx = fit_text(cr, p->ylabel, 0, s, avail, cut);
        double cx = r.x - 2 * gap - wmax - ah / 2, cy = r.y + r.h / 2;
        px_text_draw_vertical(cr, tx, s, cx, cy);
        double w = text_w(cr, tx, 0, s), hh = text_h(cr, s);
        /* px_text_draw_vertical puts the baseline h/3 right of the centre */
        rec_add(rec, make_box(PX_LABEL_AXIS, panel, -1, s, 90, cx + hh / 3 - hh * PX_ASCENT + hh / 2,
                              cy, w, hh), tx);
    }
    if (p->title) {
        double tsz2 = PX_PANEL_TITLE_SIZE * ts;
        double avail = cell.w - 2 * pad;
        double s = fit_size(cr, p->title, 0, tsz2, PX_TITLE_MIN * ts, avail);
        const char *tx = fit_text(cr, p->title, 0, s, avail, cut);
        double w = text_w(cr, tx, 0, s), hh = text_h(cr, s);
        double x = fmin(fmax(r.x + r.w / 2 - w / 2, cell.x + pad), cell.x + cell.w - pad - w);
        double base = r.y - title_drop(th, gap) - hh * (1 - PX_ASCENT);
        px_text_draw(cr, tx, 0, s, x, base);
        rec_rect(rec, PX_LABEL_TITLE, panel, tx, s, x, base - hh * PX_ASCENT, w, hh);
    }
}

/* ---- field labels ---------------------------------------------------- */

/* A panel's geometry for placing labels: the plot, the usable area inside
 * the frame, and the segments of its drawn lines in points. */
typedef struct pgeom {
    const px_figure *f;
    const px_panel *p;
    int panel;
    rect r, inner;
    double *sx0, *sy0, *sx1, *sy1;
    size_t nseg;
    size_t first; /* first in-plot box of this panel in the recorder */
} pgeom;

static int segs_init(pgeom *g)
{
    size_t n = 0;
    for (size_t i = 0; i < g->p->n_items; i++)
        if (g->p->items[i].kind == PX_ITEM_LINE) n += g->p->items[i].n - 1;
    g->nseg = 0;
    g->sx0 = malloc((n ? n : 1) * 4 * sizeof(double));
    if (!g->sx0) return PX_ENOMEM;
    g->sy0 = g->sx0 + n, g->sx1 = g->sy0 + n, g->sy1 = g->sx1 + n;
    for (size_t i = 0; i < g->p->n_items; i++) {
        const px_item *it = &g->p->items[i];
        if (it->kind != PX_ITEM_LINE) continue;
        for (size_t k = 0; k + 1 < it->n; k++) {
            g->sx0[g->nseg] = map_x(g->p, g->r, it->x[k]);
            g->sy0[g->nseg] = map_y(g->p, g->r, it->y[k]);
            g->sx1[g->nseg] = map_x(g->p, g->r, it->x[k + 1]);
            g->sy1[g->nseg] = map_y(g->p, g->r, it->y[k + 1]);
            g->nseg++;
        }
    }
    return PX_OK;
}

static int lines_crossing(const pgeom *g, const px_label_box *b)
{
    int c = 0;
    for (size_t s = 0; s < g->nseg; s++)
        if (seg_hits_box(b, g->sx0[s], g->sy0[s], g->sx1[s], g->sy1[s])) c++;
    return c;
}

/* Is the box inside the polygon (corners inside, no edge crossing it)?
 * *clear receives the least distance from the box's corners and centre
 * region to the polygon's edges (a measure of breathing room). */
static int box_in_poly(const double *x, const double *y, size_t n, const px_label_box *b,
                       double *clear)
{
    for (int k = 0; k < 4; k++)
        if (!px_geom_polygon_contains(x, y, n, b->qx[k], b->qy[k])) return 0;
    double c = INFINITY;
    for (size_t i = 0, j = n - 1; i < n; j = i++) {
        for (int k = 0; k < 4; k++)
            if (seg_seg_cross(x[j], y[j], x[i], y[i], b->qx[k], b->qy[k], b->qx[(k + 1) % 4],
                              b->qy[(k + 1) % 4]))
                return 0;
        for (int k = 0; k < 4; k++)
            c = fmin(c, px_geom_segment_distance(b->qx[k], b->qy[k], x[j], y[j], x[i], y[i]));
    }
    *clear = c;
    return 1;
}

/* Place a field's label inside it: sizes from large to small, horizontal
 * first (vertical only for a tall field once horizontal would need a small
 * size); among the spots where the box fits, fewest drawn lines crossed,
 * then the most room (capped), then nearest the field's centroid. */
static int place_inside(cairo_t *cr, const pgeom *g, long item, const double *x, const double *y,
                        size_t n, double gx, double gy, double px, double py, lrec *rec)
{
    const px_item *it = &g->p->items[item];
    double ts = g->f->ts;
    double x0 = INFINITY, x1 = -INFINITY, y0 = INFINITY, y1 = -INFINITY;
    for (size_t i = 0; i < n; i++)
        x0 = fmin(x0, x[i]), x1 = fmax(x1, x[i]), y0 = fmin(y0, y[i]), y1 = fmax(y1, y[i]);
    double easy = PX_LABEL_MAX * PX_LABEL_EASY;
    /* passes: horizontal at the easy sizes, vertical at those, then both
     * at the small sizes; within a pass, a spot crossing no drawn line wins
     * at any size, else the largest size that fits */
    for (int pass = 0; pass < 3; pass++) {
        int have_fallback = 0;
        px_label_box fallback;
        memset(&fallback, 0, sizeof fallback);
        for (double s0 = PX_LABEL_MAX; s0 >= PX_LABEL_MIN - 1e-9; s0 -= PX_LABEL_STEP) {
            if ((pass < 2) != (s0 >= easy - 1e-9)) continue;
            double s = s0 * ts, w, h;
            px_text_measure(cr, it->text, 1, s, &w, &h);
            for (int vert = 0; vert < 2; vert++) {
                if ((pass == 0 && vert) || (pass == 1 && !vert)) continue;
                double bw = w + 2 * ts, bh = h;
                if ((vert ? bw : bh) > y1 - y0 || (vert ? bh : bw) > x1 - x0) continue;
                int found = 0, best_cross = 0;
                double best_score = INFINITY;
                px_label_box best;
                for (int c = -2; c < PX_CANDIDATES * PX_CANDIDATES; c++) {
                    double cx, cy;
                    if (c == -2) cx = gx, cy = gy;
                    else if (c == -1) cx = px, cy = py;
                    else {
                        cx = x0 + (x1 - x0) * ((c % PX_CANDIDATES) + 0.5) / PX_CANDIDATES;
                        cy = y0 + (y1 - y0) * ((double)(c / PX_CANDIDATES) + 0.5) / PX_CANDIDATES;
                    }
                    if (!isfinite(cx) || !isfinite(cy)) continue;
                    px_label_box b = make_box(PX_LABEL_FIELD, g->panel, item, s, vert ? 90 : 0,
                                              cx, cy, bw, bh);
                    double clear;
                    if (!box_in_rect(&b, g->inner) || !box_in_poly(x, y, n, &b, &clear) ||
                        !box_clear(rec, g->first, &b))
                        continue;
                    int cross = lines_crossing(g, &b);
                    double room = fmin(clear, 0.6 * h);
                    double score = cross * 1e6 - 10 * room + hypot(cx - gx, cy - gy);
                    if (score < best_score) best_score = score, best = b, found = 1, best_cross = cross;
                }
                if (!found) continue;
                if (best_cross == 0) {
                    rec_add(rec, best, it->text);
                    return 1;
                }
                if (!have_fallback) fallback = best, have_fallback = 1;
            }
        }
        if (have_fallback) {
            rec_add(rec, fallback, it->text);
            return 1;
        }
    }
    return 0;
}

/* Is a led-out label's box inside the frame and clear of the placed labels,
 * and does its leader from (ax, ay) run through none of them? */
static int leader_clear(const pgeom *g, const lrec *rec, px_label_box *b, double ax, double ay)
{
    if (!box_in_rect(b, g->inner) || !box_clear(rec, g->first, b)) return 0;
    b->ax = ax, b->ay = ay;
    double ex, ey;
    leader_end(b, &ex, &ey);
    for (size_t q = g->first; rec && q < rec->n; q++)
        if (rec->b[q].placed && seg_hits_box(&rec->b[q], ax, ay, ex, ey)) return 0;
    return 1;
}

/* Lead a label out of a field too small for it: spots around the anchor at
 * growing distances, towards the roomier side first; the first clear one
 * inside the frame wins, else the clear spot nearest the anchor anywhere in
 * the plot (at the leader size, then the smallest), else one beside it. */
static void place_leader(cairo_t *cr, const pgeom *g, long item, double ax, double ay, lrec *rec)
{
    const px_item *it = &g->p->items[item];
    double ts = g->f->ts, s = (PX_LABEL_MIN + 1) * ts, w, h;
    px_text_measure(cr, it->text, 1, s, &w, &h);
    double bw = w + 2 * ts, bh = h;
    rect in = g->inner;
    double sx = ax < in.x + in.w / 2 ? 1 : -1, sy = ay < in.y + in.h / 2 ? 1 : -1;
    static const double dir[][2] = {{1, 1}, {1, -1}, {1, 0}, {0, 1}, {-1, 1}, {0, -1},
                                    {-1, -1}, {-1, 0}, {2, 1}, {2, -1}, {-2, 1}, {-2, -1},
                                    {1, 2}, {1, -2}, {-1, 2}, {-1, -2}};
    px_label_box best;
    int have = 0;
    for (int d = 1; d <= PX_LEAD_RINGS && !have; d++)
        for (size_t k = 0; k < sizeof dir / sizeof dir[0] && !have; k++) {
            double ox = sx * dir[k][0] * PX_LEAD_STEP * ts * d, oy = sy * dir[k][1] * PX_LEAD_STEP * ts * d * 0.7;
            double cx = ax + ox + (ox > 0 ? bw / 2 : ox < 0 ? -bw / 2 : 0);
            double cy = ay + oy + (oy > 0 ? bh / 2 : oy < 0 ? -bh / 2 : 0);
            px_label_box b = make_box(PX_LABEL_LEADER, g->panel, item, s, 0, cx, cy, bw, bh);
            if (!leader_clear(g, rec, &b, ax, ay)) continue;
            best = b, have = 1;
        }
    for (int shrink = 0; shrink < 2 && !have; shrink++) { /* anywhere in the plot, nearest first */
        if (shrink) {
            s = PX_LABEL_MIN * ts;
            px_text_measure(cr, it->text, 1, s, &w, &h);
            bw = w + 2 * ts, bh = h;
        }
        double bestd = INFINITY;
        for (int i = 0; i <= PX_CANDIDATES * 2; i++)
            for (int j = 0; j <= PX_CANDIDATES * 2; j++) {
                double cx = in.x + bw / 2 + (in.w - bw) * i / (PX_CANDIDATES * 2.0);
                double cy = in.y + bh / 2 + (in.h - bh) * j / (PX_CANDIDATES * 2.0);
                double d = hypot(cx - ax, cy - ay);
                if (d >= bestd) continue;
                px_label_box b = make_box(PX_LABEL_LEADER, g->panel, item, s, 0, cx, cy, bw, bh);
                if (!leader_clear(g, rec, &b, ax, ay)) continue;
                best = b, have = 1, bestd = d;
            }
    }
    if (!have) { /* nothing clear: beside the anchor, kept inside the frame */
        double cx = fmin(fmax(ax + sx * (PX_LEAD_STEP * ts + bw / 2), in.x + bw / 2), in.x + in.w - bw / 2);
        double cy = fmin(fmax(ay + sy * PX_LEAD_STEP * ts, in.y + bh / 2), in.y + in.h - bh / 2);
        best = make_box(PX_LABEL_LEADER, g->panel, item, s, 0, cx, cy, bw, bh);
    }
    best.ax = ax;
    best.ay = ay;
    rec_add(rec, best, it->text);
}

/* The anchor of a leader: the field's centroid when inside it, else its pole. */
static void field_geometry(const pgeom *g, const px_item *it, double *x, double *y, double *gx,
                           double *gy, double *px, double *py)
{
    size_t n = it->n;
    for (size_t i = 0; i < n; i++) { /* points, clipped to the plot */
        x[i] = fmin(fmax(map_x(g->p, g->r, it->x[i]), g->r.x), g->r.x + g->r.w);
        y[i] = fmin(fmax(map_y(g->p, g->r, it->y[i]), g->r.y), g->r.y + g->r.h);
    }
    double dist;
    int st = px_geom_polygon_pole(x, y, n, 0.5, NULL, px, py, &dist);
    if (st != PX_OK && st != PX_ELIMIT) *px = *py = NAN; /* ELIMIT: the best point found */
    if (isfinite(it->lx) && isfinite(it->ly)) { /* a label point given by the caller */
        *px = map_x(g->p, g->r, it->lx);
        *py = map_y(g->p, g->r, it->ly);
    }
    double cx, cy;
    if (px_geom_polygon_centroid(x, y, n, &cx, &cy) == PX_OK &&
        px_geom_polygon_contains(x, y, n, cx, cy)) {
        *gx = cx;
        *gy = cy;
    } else {
        *gx = *px;
        *gy = *py;
    }
}

/* ---- labels along lines ---------------------------------------------- */

static void place_line_label(cairo_t *cr, const pgeom *g, long item, lrec *rec)
{
    const px_item *it = &g->p->items[item];
    size_t n = it->n;
    double *x = malloc(2 * n * sizeof *x);
    if (!x) {
        if (rec) rec->failed = 1;
        return;
    }
    double *y = x + n, len = 0;
    for (size_t i = 0; i < n; i++) {
        x[i] = map_x(g->p, g->r, it->x[i]);
        y[i] = map_y(g->p, g->r, it->y[i]);
        if (i) len += hypot(x[i] - x[i - 1], y[i] - y[i - 1]);
    }
    int done = 0;
    for (int pass = 0; pass < (it->alt ? 4 : 3) && !done && len > 0; pass++) {
        const char *txt = pass < 3 ? it->text : it->alt;
        double f = pass < 3 ? 1.0 - 0.1 * pass : PX_LINE_SHRINK;
        double s = it->width * f, w, h;
        px_text_measure(cr, txt, it->chem, s, &w, &h);
        double bw = w + 2 * g->f->ts, bh = h;
        /* spots ordered by distance from the preferred fraction */
        for (int k = 0; k < 2 * PX_LINE_SPOTS && !done; k++) {
            int step = (k + 1) / 2, sign = k % 2 ? 1 : -1;
            double t = it->at + sign * step / (double)(PX_LINE_SPOTS - 1);
            if (t < 0 || t > 1) continue;
            double target = t * len, acc = 0;
            size_t seg = 0;
            while (seg + 2 < n && acc + hypot(x[seg + 1] - x[seg], y[seg + 1] - y[seg]) < target) {
                acc += hypot(x[seg + 1] - x[seg], y[seg + 1] - y[seg]);
                seg++;
            }
            double dx = x[seg + 1] - x[seg], dy = y[seg + 1] - y[seg], sl = hypot(dx, dy);
            if (sl <= 0) continue;
            double u = fmin(fmax((target - acc) / sl, 0), 1);
            double mx = x[seg] + u * dx, my = y[seg] + u * dy;
            double ang = atan2(-dy, dx) * 180 / PX_PI; /* counter-clockwise, page y down */
            if (ang > 90.0001) ang -= 180;
            if (ang <= -90.0001) ang += 180;
            double a = ang * PX_PI / 180, nx = sin(a), ny = cos(a); /* below the text */
            for (int side = -1; side <= 1 && !done; side += 2) { /* above the line first */
                double off = side * (bh / 2 + 1.0 * g->f->ts);
                px_label_box b = make_box(PX_LABEL_LINE, g->panel, item, s, ang, mx + nx * off,
                                          my + ny * off, bw, bh);
                if (!box_in_rect(&b, g->inner) || !box_clear(rec, g->first, &b)) continue;
                rec_add(rec, b, txt);
                done = 1;
            }
        }
    }
    if (!done) { /* no clear spot: recorded as left out, not drawn */
        px_label_box b = make_box(PX_LABEL_LINE, g->panel, item, it->width, 0, NAN, NAN, 0, 0);
        b.placed = 0;
        rec_add(rec, b, it->text);
    }
    free(x);
}

/* Draw a recorded in-plot text box over a light halo. */
static void draw_box_text(cairo_t *cr, const px_label_box *b, int chem, px_rgba color)
{
    double w, h;
    px_text_measure(cr, b->text, chem, b->size, &w, &h);
    double cx = (b->qx[0] + b->qx[2]) / 2, cy = (b->qy[0] + b->qy[2]) / 2;
    cairo_save(cr);
    cairo_translate(cr, cx, cy);
    cairo_rotate(cr, -b->angle * PX_PI / 180);
    set_rgba(cr, color);
    px_text_draw_halo(cr, b->text, chem, b->size, -w / 2, h * 0.3, PX_HALO_WIDTH, 1, 1, 1,
                      PX_HALO_ALPHA);
    cairo_restore(cr);
}

static void draw_leader(cairo_t *cr, const px_label_box *b, double ts)
{
    double w, h;
    px_text_measure(cr, b->text, 1, b->size, &w, &h);
    double x0 = b->qx[0], y0 = b->qy[0], bw = b->qx[1] - b->qx[0], bh = b->qy[2] - b->qy[0];
    double ex, ey;
    leader_end(b, &ex, &ey);
    cairo_set_source_rgb(cr, 0.08, 0.08, 0.1);
    cairo_set_line_width(cr, 0.5 * ts);
    set_dash(cr, PX_DASH_SOLID, 1);
    cairo_move_to(cr, b->ax, b->ay);
    cairo_line_to(cr, ex, ey);
    cairo_stroke(cr);
    cairo_arc(cr, b->ax, b->ay, 1.1 * ts, 0, 2 * PX_PI);
    cairo_fill(cr);
    cairo_set_source_rgba(cr, 1, 1, 1, 0.8);
    cairo_rectangle(cr, x0, y0, bw, bh);
    cairo_fill(cr);
    cairo_set_source_rgb(cr, 0.08, 0.08, 0.1);
    px_text_draw(cr, b->text, 1, b->size, x0 + (bw - w) / 2, y0 + bh * PX_ASCENT);
}

static void draw_swatch(cairo_t *cr, const px_item *it, double x, double y, double ts)
{
    if (it->kind == PX_ITEM_LINE) {
        set_rgba(cr, it->color);
        cairo_set_line_width(cr, it->width);
        set_dash(cr, it->dash, it->width);
        cairo_move_to(cr, x, y);
        cairo_line_to(cr, x + PX_LEGEND_SWATCH * ts, y);
        cairo_stroke(cr);
        return;
    }
    rect b = {x, y - 3.5 * ts, PX_LEGEND_SWATCH * ts, 7 * ts};
    cairo_rectangle(cr, b.x, b.y, b.w, b.h);
    set_rgba(cr, it->fill);
    cairo_fill(cr);
    set_dash(cr, PX_DASH_SOLID, 1);
    set_rgba(cr, it->color);
    if (it->spacing > 0) {
        cairo_save(cr);
        cairo_rectangle(cr, b.x, b.y, b.w, b.h);
        cairo_clip(cr);
        cairo_set_line_width(cr, 0.6);
        hatch_box(cr, b, it->spacing, it->angle);
        cairo_restore(cr);
    }
    cairo_set_line_width(cr, it->width);
    cairo_rectangle(cr, b.x, b.y, b.w, b.h);
    cairo_stroke(cr);
}

/* Where the legend goes (box in points), or 0 when there is none. */
static int legend_rect(cairo_t *cr, const px_panel *p, double ts, rect r, rect cell, rect *out)
{
    double bw, bh, line, cap = legend_cap(cell.w, ts);
    if (!legend_box(cr, p, ts, cap, &bw, &bh, &line)) return 0;
    double in = PX_LEGEND_INSET * ts, bx, by;
    switch (p->legend) {
    case PX_LEGEND_TOP_LEFT: bx = r.x + in, by = r.y + in; break;
    case PX_LEGEND_BOTTOM_LEFT: bx = r.x + in, by = r.y + r.h - bh - in; break;
    case PX_LEGEND_BOTTOM_RIGHT: bx = r.x + r.w - bw - in, by = r.y + r.h - bh - in; break;
    case PX_LEGEND_OUTSIDE: bx = r.x + r.w + in, by = r.y; break;
    default: bx = r.x + r.w - bw - in, by = r.y + in; break;
    }
    *out = (rect){bx, by, bw, bh};
    return 1;
}

static void draw_legend(cairo_t *cr, const px_panel *p, double ts, rect b, rect cell)
{
    double bw, bh, line, cap = legend_cap(cell.w, ts);
    char cut[PX_FIT_MAX];
    legend_box(cr, p, ts, cap, &bw, &bh, &line);
    double lsz = PX_LEGEND_SIZE * ts, h = text_h(cr, lsz);
    cairo_set_source_rgba(cr, 1, 1, 1, 0.88);
    cairo_rectangle(cr, b.x, b.y, b.w, b.h);
    cairo_fill_preserve(cr);
    cairo_set_source_rgb(cr, 0.4, 0.4, 0.4);
    cairo_set_line_width(cr, 0.5);
    set_dash(cr, PX_DASH_SOLID, 1);
    cairo_stroke(cr);
    size_t k = 0;
    for (size_t i = 0; i < p->n_items; i++) {
        const px_item *it = &p->items[i];
        if (!in_legend(it)) continue;
        double y = b.y + 3 * ts + line * ((double)k + 0.5);
        draw_swatch(cr, it, b.x + 4 * ts, y, ts);
        cairo_set_source_rgb(cr, 0, 0, 0);
        px_text_draw(cr, fit_text(cr, it->text, 0, lsz, cap, cut), 0, lsz,
                     b.x + (PX_LEGEND_SWATCH + 8) * ts, y + h * 0.3);
        k++;
    }
}

static void draw_panel(cairo_t *cr, const px_figure *f, int panel, rect r, rect cell, lrec *rec)
{
    const px_panel *p = &f->panels[panel];
    double ts = f->ts, ins = (PX_HALO_WIDTH / 2 + PX_INSET) * ts;
    cairo_save(cr);
    cairo_rectangle(cr, r.x, r.y, r.w, r.h);
    cairo_clip(cr);
    cairo_set_line_join(cr, CAIRO_LINE_JOIN_ROUND);
    for (size_t i = 0; i < p->n_items; i++) { /* fills first */
        const px_item *it = &p->items[i];
        if (it->kind != PX_ITEM_POLYGON) continue;
        path_of(cr, p, r, it, 1);
        set_rgba(cr, it->fill);
        cairo_fill(cr);
    }
    for (size_t i = 0; i < p->n_items; i++) { /* hatching over the fills */
        const px_item *it = &p->items[i];
        if (it->kind != PX_ITEM_HATCH) continue;
        cairo_save(cr);
        path_of(cr, p, r, it, 1);
        cairo_clip(cr);
        set_rgba(cr, it->color);
        cairo_set_line_width(cr, it->width);
        set_dash(cr, PX_DASH_SOLID, it->width);
        hatch_box(cr, r, it->spacing, it->angle);
        cairo_restore(cr);
    }
    for (size_t i = 0; i < p->n_items; i++) { /* then outlines and lines */
        const px_item *it = &p->items[i];
        if (it->kind == PX_ITEM_POLYGON && it->width > 0) {
            path_of(cr, p, r, it, 1);
            set_rgba(cr, it->color);
            cairo_set_line_width(cr, it->width);
            set_dash(cr, PX_DASH_SOLID, it->width);
            cairo_stroke(cr);
        } else if (it->kind == PX_ITEM_LINE) {
            path_of(cr, p, r, it, 0);
            set_rgba(cr, it->color);
            cairo_set_line_width(cr, it->width);
            set_dash(cr, it->dash, it->width);
            cairo_stroke(cr);
        }
    }
    /* Placement: the legend inside the plot, given texts, field labels
     * inside their fields, led-out labels, then labels along lines; each
     * keeps clear of those before it. */
    lrec local = {0};
    lrec *lr = rec ? rec : &local;
    pgeom g = {f, p, panel, r, {r.x + ins, r.y + ins, r.w - 2 * ins, r.h - 2 * ins}, NULL, NULL,
               NULL, NULL, 0, lr->n};
    rect lb;
    int has_legend = legend_rect(cr, p, ts, r, cell, &lb);
    if (has_legend) rec_rect(lr, PX_LABEL_LEGEND, panel, "legend", PX_LEGEND_SIZE * ts, lb.x, lb.y, lb.w, lb.h);
    if (has_legend && p->legend == PX_LEGEND_OUTSIDE) g.first = lr->n; /* not an obstacle inside */
    for (size_t i = 0; i < p->n_items; i++) {
        const px_item *it = &p->items[i];
        if (it->kind != PX_ITEM_TEXT) continue;
        double w, h;
        px_text_measure(cr, it->text, it->chem, it->width, &w, &h);
        double x = map_x(p, r, it->lx), y = map_y(p, r, it->ly);
        x = fmin(fmax(x, g.inner.x), g.inner.x + g.inner.w - w); /* keep inside the plot */
        y = fmin(fmax(y, g.inner.y + h * PX_ASCENT), g.inner.y + g.inner.h - h * (1 - PX_ASCENT));
        rec_add(lr, make_box(PX_LABEL_TEXT, panel, (long)i, it->width, 0, x + w / 2,
                             y - h * PX_ASCENT + h / 2, w, h), it->text);
    }
    int st = segs_init(&g);
    size_t cap = 0;
    for (size_t i = 0; i < p->n_items; i++) cap = p->items[i].n > cap ? p->items[i].n : cap;
    double *px = st == PX_OK ? malloc((cap ? cap : 1) * 2 * sizeof *px) : NULL;
    char *led = px ? calloc(p->n_items ? p->n_items : 1, 1) : NULL;
    size_t *order = led ? malloc((p->n_items ? p->n_items : 1) * sizeof *order) : NULL;
    if (order) {
        /* larger fields choose first */
        size_t no = 0;
        for (size_t i = 0; i < p->n_items; i++)
            if (p->items[i].kind == PX_ITEM_POLYGON && p->items[i].text) order[no++] = i;
        double *area = malloc((no ? no : 1) * sizeof *area);
        if (area) {
            for (size_t k = 0; k < no; k++) {
                const px_item *it = &p->items[order[k]];
                for (size_t q = 0; q < it->n; q++) {
                    px[q] = map_x(p, r, it->x[q]);
                    px[cap + q] = map_y(p, r, it->y[q]);
                }
                area[k] = fabs(px_geom_polygon_area(px, px + cap, it->n));
            }
            for (size_t a = 1; a < no; a++) /* insertion sort, stable */
                for (size_t b = a; b > 0 && area[b] > area[b - 1]; b--) {
                    double t = area[b]; area[b] = area[b - 1]; area[b - 1] = t;
                    size_t o = order[b]; order[b] = order[b - 1]; order[b - 1] = o;
                }
            free(area);
        }
        for (size_t k = 0; k < no; k++) {
            const px_item *it = &p->items[order[k]];
            double gx, gy, qx, qy;
            field_geometry(&g, it, px, px + cap, &gx, &gy, &qx, &qy);
            if (!place_inside(cr, &g, (long)order[k], px, px + cap, it->n, gx, gy, qx, qy, lr))
                led[order[k]] = 1;
        }
        for (size_t k = 0; k < no; k++) {
            if (!led[order[k]]) continue;
            const px_item *it = &p->items[order[k]];
            double gx, gy, qx, qy;
            field_geometry(&g, it, px, px + cap, &gx, &gy, &qx, &qy);
            if (fabs(px_geom_polygon_area(px, px + cap, it->n)) <= 0 || !isfinite(gx))
                continue; /* not visible */
            place_leader(cr, &g, (long)order[k], gx, gy, lr);
        }
        for (size_t i = 0; i < p->n_items; i++)
            if (p->items[i].kind == PX_ITEM_LINE_LABEL) place_line_label(cr, &g, (long)i, lr);
    } else if (rec) {
        rec->failed = 1;
    }
    free(order);
    free(led);
    free(px);
    free(g.sx0);
    /* drawing, in the order placed */
    for (size_t k = g.first; k < lr->n; k++) {
        const px_label_box *b = &lr->b[k];
        if (b->panel != panel || !b->placed || b->item < 0) continue;
        const px_item *it = &p->items[b->item];
        if (b->kind == PX_LABEL_LEADER) draw_leader(cr, b, ts);
        else if (b->kind == PX_LABEL_FIELD) draw_box_text(cr, b, 1, (px_rgba){0.08, 0.08, 0.1, 1});
        else draw_box_text(cr, b, it->chem, it->color);
    }
    if (has_legend && p->legend != PX_LEGEND_OUTSIDE) draw_legend(cr, p, ts, lb, cell);
    cairo_restore(cr);
    if (has_legend && p->legend == PX_LEGEND_OUTSIDE) draw_legend(cr, p, ts, lb, cell);
    if (!p->bare) draw_axes(cr, f, panel, r, cell, lr);
    if (!rec) rec_free(&local);
}

static void draw_stamp(cairo_t *cr, const px_figure *f, lrec *rec)
{
    cairo_set_source_rgb(cr, 0.3, 0.3, 0.3);
    double ts = f->ts, y0 = page_height(f) - foot_height(f) + 3 * ts;
    for (size_t k = 0; k < f->n_stamp; k++) {
        char cut[PX_FIT_MAX];
        double avail = f->width - 2 * PX_PAD * ts;
        double s = fit_size(cr, f->stamp[k], 0, PX_STAMP_SIZE * ts, PX_STAMP_MIN * ts, avail);
        const char *t = fit_text(cr, f->stamp[k], 0, s, avail, cut);
        double base = y0 + PX_STAMP_LINE * ts * ((double)k + 1) - 2 * ts;
        px_text_draw(cr, t, 0, s, PX_PAD * ts, base);
        double hh = text_h(cr, s);
        /* stamp lines are set closer than their font's full height; the box
         * is the line's share, so neighbouring lines do not count as overlaps */
        double lh = fmin(hh, PX_STAMP_LINE * ts);
        rec_rect(rec, PX_LABEL_STAMP, -1, t, s, PX_PAD * ts, base - lh * PX_ASCENT,
                 text_w(cr, t, 0, s), lh);
    }
}

static rect cell_rect(const px_figure *f, int panel, int alone)
{
    double fw = f->width, fh = page_height(f) - foot_height(f);
    if (alone) return (rect){0, 0, fw, fh};
    double cw = fw / f->cols, ch = fh / f->rows;
    return (rect){(panel % f->cols) * cw, (panel / f->cols) * ch, cw, ch};
}

static void draw_page(cairo_t *cr, const px_figure *f, int only_panel, lrec *rec)
{
    cairo_set_source_rgb(cr, 1, 1, 1);
    cairo_paint(cr);
    if (only_panel >= 0)
        draw_panel(cr, f, only_panel, plot_rect_m(f, cr, only_panel, 1), cell_rect(f, only_panel, 1),
                   rec);
    else
        for (int i = 0; i < f->used; i++)
            draw_panel(cr, f, i, plot_rect_m(f, cr, i, 0), cell_rect(f, i, 0), rec);
    draw_stamp(cr, f, rec);
}

int px_figure_layout(const px_figure *f, px_label_box **out, size_t *n)
{
    if (!f || !out || !n) return PX_EINVAL;
    *out = NULL;
    *n = 0;
    cairo_t *m = px_text_scratch();
    lrec rec = {0};
    draw_page(m, f, -1, &rec);
    int ok = cairo_status(m) == CAIRO_STATUS_SUCCESS && !rec.failed;
    cairo_destroy(m);
    if (!ok) {
        rec_free(&rec);
        return PX_ENOMEM;
    }
    *out = rec.b;
    *n = rec.n;
    return PX_OK;
}

void px_figure_layout_free(px_label_box *b, size_t n)
{
    for (size_t i = 0; b && i < n; i++) free(b[i].text);
    free(b);
}

int px_format_from_path(const char *path)
{
    size_t n = path ? strlen(path) : 0;
    if (n >= 4 && strcmp(path + n - 4, ".png") == 0) return PX_FORMAT_PNG;
    if (n >= 4 && strcmp(path + n - 4, ".svg") == 0) return PX_FORMAT_SVG;
    if (n >= 4 && strcmp(path + n - 4, ".pdf") == 0) return PX_FORMAT_PDF;
    return -1;
}

typedef struct membuf {
    unsigned char *data;
    size_t n, cap;
    int failed;
} membuf;

static cairo_status_t mem_write(void *closure, const unsigned char *data, unsigned int len)
{
    membuf *m = closure;
    if (m->n + len > m->cap) {
        size_t cap = m->cap ? m->cap : 65536;
        while (cap < m->n + len) cap *= 2;
        unsigned char *d = realloc(m->data, cap);
        if (!d) {
            m->failed = 1;
            return CAIRO_STATUS_WRITE_ERROR;
        }
        m->data = d;
        m->cap = cap;
    }
    memcpy(m->data + m->n, data, len);
    m->n += len;
    return CAIRO_STATUS_SUCCESS;
}

/* Replace a buffer's bytes by a rewritten copy of n bytes (the rewriting
 * passes below build `out` from m->data, then hand it over here). */
static int mem_replace(membuf *m, unsigned char *out, size_t n)
{
    free(m->data);
    m->data = out;
    m->n = n;
    m->cap = n;
    return PX_OK;
}

/* cairo names SVG groups "surfaceN" from a process-wide counter, so the
 * second identical figure of a run would differ in those names.  Renumber
 * them by first appearance (1, 2, ...) so identical inputs give identical
 * bytes whatever was drawn before. */
#define PX_SVG_MAX_SURFACES 256
static int svg_renumber(membuf *m)
{
    static const char key[] = "surface";
    const size_t klen = sizeof key - 1;
    unsigned long seen[PX_SVG_MAX_SURFACES];
    size_t nseen = 0;
    unsigned char *out = malloc(m->n + 1);
    if (!out) return PX_ENOMEM;
    size_t o = 0;
    for (size_t i = 0; i < m->n;) {
        if (m->data[i] == 's' && i + klen < m->n && memcmp(m->data + i, key, klen) == 0 &&
            m->data[i + klen] >= '0' && m->data[i + klen] <= '9') {
            size_t j = i + klen;
            unsigned long v = 0;
            while (j < m->n && m->data[j] >= '0' && m->data[j] <= '9' && v < 100000000UL)
                v = v * 10 + (unsigned long)(m->data[j++] - '0');
            size_t k = 0;
            while (k < nseen && seen[k] != v) k++;
            if (k == nseen) {
                if (nseen == PX_SVG_MAX_SURFACES) {
                    free(out);
                    return PX_ELIMIT;
                }
                seen[nseen++] = v;
            }
            char num[32];
            int len = snprintf(num, sizeof num, "%zu", k + 1);
            size_t need = o + klen + (size_t)len + (m->n - j) + 1;
            if (need > m->n + 1) { /* renumbering never lengthens much; grow if it does */
                unsigned char *g = realloc(out, need + 64);
                if (!g) {
                    free(out);
                    return PX_ENOMEM;
                }
                out = g;
            }
            memcpy(out + o, key, klen);
            memcpy(out + o + klen, num, (size_t)len);
            o += klen + (size_t)len;
            i = j;
        } else { /* copy up to the next 's' in one go */
            const unsigned char *nx = memchr(m->data + i + 1, 's', m->n - i - 1);
            size_t stop = nx ? (size_t)(nx - m->data) : m->n;
            memcpy(out + o, m->data + i, stop - i);
            o += stop - i;
            i = stop;
        }
    }
    return mem_replace(m, out, o);
}

/* cairo writes SVG coordinates with up to six decimals ("1.671875"); a
 * thousandth of a point (0.35 um) is far below what any screen or printer
 * shows, so numbers with more decimals are rounded to three and their
 * trailing zeros dropped.  Run on cairo's output only, before the <title>
 * and <desc> are inserted, so no text is touched.  Two implementations of
 * the same rounding: svg_round_text rounds the digits as text (the output
 * path), svg_round_strtod by strtod and printf (the former path, kept as
 * the reference the benchmark and tests compare with); both give the same
 * bytes. */
#define PX_SVG_DECIMALS 3

/* Round the decimal number s[0..len) (digits, '.', digits; more than
 * PX_SVG_DECIMALS decimals) into txt; returns its length, or -1 on an exact
 * tie (...5000), where the binary value decides the rounding as printf does. */
static int svg_round_text(const unsigned char *s, size_t len, char *txt, size_t cap)
{
    size_t dot = 0;
    while (dot < len && s[dot] != '.') dot++;
    size_t keep = dot + 1 + PX_SVG_DECIMALS; /* digits kept, with the dot */
    if (dot >= len || keep >= len || keep + 2 > cap) return -1;
    int up = s[keep] > '5';
    if (s[keep] == '5') {
        size_t k = keep + 1;
        while (k < len && s[k] == '0') k++;
        if (k == len) return -1;
        up = 1;
    }
    memcpy(txt, s, keep);
    size_t w = keep;
    if (up) { /* carry from the last kept digit leftwards, over the dot */
        size_t k = keep;
        int carry = 1;
        while (carry && k-- > 0) {
            if (txt[k] == '.') continue;
            if (txt[k] == '9') txt[k] = '0';
            else txt[k]++, carry = 0;
        }
        if (carry) { /* 999.9996 -> 1000.000 */
            memmove(txt + 1, txt, w);
            txt[0] = '1';
            w++;
        }
    }
    while (w > 0 && txt[w - 1] == '0') w--;
    if (w > 0 && txt[w - 1] == '.') w--;
    return (int)w;
}

static int svg_round_strtod(const unsigned char *s, size_t len, char *txt, size_t cap)
{
    char num[64];
    if (len > sizeof num - 1) len = sizeof num - 1;
    memcpy(num, s, len);
    num[len] = '\0';
    int w = snprintf(txt, cap, "%.*f", PX_SVG_DECIMALS, strtod(num, NULL));
    while (w > 0 && txt[w - 1] == '0') w--;
    if (w > 0 && txt[w - 1] == '.') w--;
    return w;
}

static int is_digit(unsigned char c) { return c >= '0' && c <= '9'; }
static int is_alpha(unsigned char c) { return (c >= 'a' && c <= 'z') || (c >= 'A' && c <= 'Z'); }

static int svg_compact(membuf *m, int reference)
{
    unsigned char *out = malloc(m->n + 1);
    if (!out) return PX_ENOMEM;
    size_t o = 0;
    for (size_t i = 0; i < m->n;) {
        unsigned char c = m->data[i];
        int starts = is_digit(c) &&
                     (i == 0 || !(is_digit(m->data[i - 1]) || is_alpha(m->data[i - 1]) ||
                                  m->data[i - 1] == '.' || m->data[i - 1] == '_' || m->data[i - 1] == '#'));
        if (!starts) {
            out[o++] = m->data[i++];
            continue;
        }
        size_t j = i;
        while (j < m->n && is_digit(m->data[j])) j++;
        size_t dot = j, k = j;
        if (k < m->n && m->data[k] == '.') {
            k++;
            while (k < m->n && is_digit(m->data[k])) k++;
        }
        int is_name = k < m->n && is_alpha(m->data[k]);
        if (k - dot - 1 <= PX_SVG_DECIMALS || dot == k || is_name) { /* short, integer or part of a name */
            memcpy(out + o, m->data + i, k - i);
            o += k - i;
            i = k;
            continue;
        }
        char txt[64];
        int w = -1;
        if (!reference && k - i < sizeof txt - 2) w = svg_round_text(m->data + i, k - i, txt, sizeof txt);
        if (w < 0) w = svg_round_strtod(m->data + i, k - i, txt, sizeof txt);
        int neg = i > 0 && m->data[i - 1] == '-';
        if (neg && w == 1 && txt[0] == '0') o--; /* "-0.0001" -> "0", not "-0" */
        memcpy(out + o, txt, (size_t)w); /* never longer than the input */
        o += (size_t)w;
        i = k;
    }
    return mem_replace(m, out, o);
}

/* The figure's words for SVG, whole and in phlox notation (with glyph
 * outlines the file's only words) for a search, a screen reader or a test.  One
 * <title> (the first panel title) and one <desc> with a line per panel
 * title, axis title, field label (phlox notation), legend entry, text and
 * stamp line, XML-escaped, inserted after the root element's start tag. */
typedef px_strbuf sbuf;

static void sb_put(sbuf *b, const char *s, size_t k) { px_strbuf_put(b, s, k); }

static void sb_str(sbuf *b, const char *s) { sb_put(b, s, strlen(s)); }

/* XML-escaped text; the braces of formula markup are dropped unless `raw`
 * (metadata holds the text as given). */
static void sb_xml_text(sbuf *b, const char *s, int raw)
{
    for (; *s; s++) {
        switch (*s) {
        case '&': sb_str(b, "&amp;"); break;
        case '<': sb_str(b, "&lt;"); break;
        case '>': sb_str(b, "&gt;"); break;
        case '"': sb_str(b, "&quot;"); break;
        case '{': case '}':
            if (raw) sb_put(b, s, 1);
            break;
        default:
            if ((unsigned char)*s >= 0x20 || *s == '\n' || *s == '\t') sb_put(b, s, 1);
        }
    }
}

static void sb_xml(sbuf *b, const char *s) { sb_xml_text(b, s, 0); }
static void sb_xml_raw(sbuf *b, const char *s) { sb_xml_text(b, s, 1); }

static void sb_line(sbuf *b, const char *what, const char *text)
{
    sb_str(b, what);
    sb_str(b, ": ");
    sb_xml(b, text);
    sb_str(b, "\n");
}

static int svg_describe(membuf *m, const px_figure *f)
{
    sbuf b = {0};
    const char *title = NULL;
    for (int i = 0; i < f->used && !title; i++) title = f->panels[i].title;
    sb_str(&b, "\n<title>");
    sb_xml(&b, title ? title : "phlox figure");
    sb_str(&b, "</title>\n<desc>\n");
    for (int i = 0; i < f->used; i++) {
        const px_panel *p = &f->panels[i];
        char head[32];
        snprintf(head, sizeof head, "panel %d", i + 1);
        sb_line(&b, head, p->title ? p->title : "");
        if (p->xlabel) sb_line(&b, "x axis", p->xlabel);
        if (p->ylabel) sb_line(&b, "y axis", p->ylabel);
        for (size_t k = 0; k < p->n_items; k++) {
            const px_item *it = &p->items[k];
            if (!it->text) continue;
            sb_line(&b, it->kind == PX_ITEM_POLYGON ? "field" : it->kind == PX_ITEM_TEXT ? "text" : "legend",
                    it->text);
        }
    }
    for (size_t k = 0; k < f->n_stamp; k++) sb_line(&b, "stamp", f->stamp[k]);
    sb_str(&b, "</desc>");
    if (f->n_meta) { /* the file's metadata: the full provenance, whatever the stamp shows */
        sb_str(&b, "\n<metadata id=\"phlox\">\n");
        for (size_t k = 0; k < f->n_meta; k++) {
            sb_str(&b, "<phlox:entry xmlns:phlox=\"urn:phlox:figure\" key=\"");
            sb_xml_raw(&b, f->meta_key[k]);
            sb_str(&b, "\">");
            sb_xml_raw(&b, f->meta_val[k]);
            sb_str(&b, "</phlox:entry>\n");
        }
        sb_str(&b, "</metadata>");
    }
    if (b.failed) {
        free(b.s);
        return PX_ENOMEM;
    }
    /* after the '>' that closes "<svg ...": attribute values hold no '>' */
    unsigned char *root = NULL;
    for (size_t i = 0; i + 4 < m->n; i++)
        if (memcmp(m->data + i, "<svg", 4) == 0) {
            root = m->data + i;
            break;
        }
    unsigned char *gt = root ? memchr(root, '>', m->n - (size_t)(root - m->data)) : NULL;
    if (!gt) {
        free(b.s);
        return PX_EIO;
    }
    size_t at = (size_t)(gt - m->data) + 1;
    unsigned char *out = malloc(m->n + b.n);
    if (!out) {
        free(b.s);
        return PX_ENOMEM;
    }
    memcpy(out, m->data, at);
    memcpy(out + at, b.s, b.n);
    memcpy(out + at + b.n, m->data + at, m->n - at);
    free(b.s);
    return mem_replace(m, out, m->n + b.n);
}

static const char *meta_get(const px_figure *f, const char *key)
{
    for (size_t k = 0; k < f->n_meta; k++)
        if (strcmp(f->meta_key[k], key) == 0) return f->meta_val[k];
    return NULL;
}

/* PDF document information: Title, Subject (Description, then Disclaimer),
 * Keywords. */
static void pdf_metadata(cairo_surface_t *s, const px_figure *f)
{
    const char *t = meta_get(f, "Title"), *d = meta_get(f, "Description");
    const char *c = meta_get(f, "Disclaimer"), *k = meta_get(f, "Keywords");
    if (t) cairo_pdf_surface_set_metadata(s, CAIRO_PDF_METADATA_TITLE, t);
    if (k) cairo_pdf_surface_set_metadata(s, CAIRO_PDF_METADATA_KEYWORDS, k);
    if (d || c) {
        sbuf b = {0};
        if (d) sb_str(&b, d);
        if (d && c) sb_str(&b, "\n");
        if (c) sb_str(&b, c);
        if (!b.failed) cairo_pdf_surface_set_metadata(s, CAIRO_PDF_METADATA_SUBJECT, b.s);
        free(b.s);
    }
}

/* A PDF surface writing to m, first page the figure's size: pinned dates
 * (same input, same bytes), creator, the figure's metadata. */
static cairo_surface_t *pdf_surface(membuf *m, const px_figure *f)
{
    cairo_surface_t *s = cairo_pdf_surface_create_for_stream(mem_write, m, f->width, page_height(f));
    cairo_pdf_surface_set_metadata(s, CAIRO_PDF_METADATA_CREATE_DATE, PX_PDF_FIXED_DATE);
    cairo_pdf_surface_set_metadata(s, CAIRO_PDF_METADATA_MOD_DATE, PX_PDF_FIXED_DATE);
    cairo_pdf_surface_set_metadata(s, CAIRO_PDF_METADATA_CREATOR, "phlox");
    pdf_metadata(s, f);
    return s;
}

/* Finish and destroy the surface; on any failure (cst, the surface's own
 * sticky status, or m running out of memory) free m's bytes. */
static int finish_surface(cairo_surface_t *s, cairo_status_t cst, membuf *m)
{
    cairo_surface_finish(s);
    if (cst == CAIRO_STATUS_SUCCESS) cst = cairo_surface_status(s);
    cairo_surface_destroy(s);
    if (cst != CAIRO_STATUS_SUCCESS || m->failed) {
        free(m->data);
        m->data = NULL;
        return m->failed || cst == CAIRO_STATUS_NO_MEMORY ? PX_ENOMEM : PX_EIO;
    }
    return PX_OK;
}

/* The former PNG path: cairo's writer, then the figure's metadata as text
 * chunks inserted right after IHDR. */
#define PX_PNG_IHDR_END 33 /* 8-byte signature + IHDR (4 + 4 + 13 + 4) */
static int png_text_chunks(membuf *m, const px_figure *f)
{
    if (!f->n_meta) return PX_OK;
    if (m->n < PX_PNG_IHDR_END || memcmp(m->data + 12, "IHDR", 4) != 0) return PX_EIO;
    const char *const *keys = (const char *const *)f->meta_key;
    const char *const *vals = (const char *const *)f->meta_val;
    unsigned char *out = malloc(m->n + px_png_text_size(keys, vals, f->n_meta));
    if (!out) return PX_ENOMEM;
    memcpy(out, m->data, PX_PNG_IHDR_END);
    size_t o = PX_PNG_IHDR_END + px_png_text(out + PX_PNG_IHDR_END, keys, vals, f->n_meta);
    memcpy(out + o, m->data + PX_PNG_IHDR_END, m->n - PX_PNG_IHDR_END);
    o += m->n - PX_PNG_IHDR_END;
    return mem_replace(m, out, o);
}

/* The image surface as PNG by png.c, metadata included. */
static int png_write(cairo_surface_t *s, membuf *m, const px_figure *f)
{
    cairo_surface_flush(s);
    const unsigned char *pix = cairo_image_surface_get_data(s);
    if (!pix || cairo_image_surface_get_format(s) != CAIRO_FORMAT_ARGB32) return PX_EIO;
    return px_png_encode(pix, cairo_image_surface_get_width(s), cairo_image_surface_get_height(s),
                         cairo_image_surface_get_stride(s), (const char *const *)f->meta_key,
                         (const char *const *)f->meta_val, f->n_meta, &m->data, &m->n);
}

int px_figure_render(const px_figure *f, px_format fmt, double dpi, unsigned char **out, size_t *n)
{
    if (!f || !out || !n || !(dpi >= 10 && dpi <= 2400)) return PX_EINVAL;
    *out = NULL;
    *n = 0;
    membuf m = {0};
    cairo_surface_t *s;
    double scale = fmt == PX_FORMAT_PNG ? dpi / 72.0 : 1.0;
    switch (fmt) {
    case PX_FORMAT_PNG:
        s = cairo_image_surface_create(CAIRO_FORMAT_ARGB32, (int)lround(f->width * scale),
                                       (int)lround(page_height(f) * scale));
        break;
    case PX_FORMAT_SVG:
        s = cairo_svg_surface_create_for_stream(mem_write, &m, f->width, page_height(f));
        break;
    case PX_FORMAT_PDF: s = pdf_surface(&m, f); break;
    default: return PX_EINVAL;
    }
    cairo_t *cr = cairo_create(s);
    px_text_prepare(cr);
    px_text_sink sink = {0};
    if (fmt == PX_FORMAT_SVG && f->svg_text == PX_SVG_TEXT_TEXT) px_text_sink_attach(cr, &sink);
    cairo_scale(cr, scale, scale);
    if (fmt == PX_FORMAT_PDF && f->page_per_panel) {
        for (int i = 0; i < f->used; i++) {
            draw_page(cr, f, i, NULL);
            cairo_show_page(cr);
        }
    } else {
        draw_page(cr, f, -1, NULL);
    }
    cairo_status_t cst = cairo_status(cr);
    cairo_destroy(cr);
    int pst = PX_OK;
    if (fmt == PX_FORMAT_PNG && cst == CAIRO_STATUS_SUCCESS) {
        if (f->reference_output) {
            cairo_surface_flush(s);
            cst = cairo_surface_write_to_png_stream(s, mem_write, &m);
        } else {
            pst = png_write(s, &m, f);
        }
    }
    int fst = finish_surface(s, cst, &m);
    if (fst != PX_OK || pst != PX_OK) {
        px_text_sink_free(&sink);
        if (fst == PX_OK) free(m.data);
        return fst != PX_OK ? fst : pst;
    }
    if (fmt == PX_FORMAT_PNG && f->reference_output) {
        int st = png_text_chunks(&m, f);
        if (st != PX_OK) {
            free(m.data);
            return st;
        }
    }
    if (fmt == PX_FORMAT_SVG) {
        int st = svg_renumber(&m);
        if (st == PX_OK) st = svg_compact(&m, f->reference_output);
        if (st == PX_OK && f->svg_text == PX_SVG_TEXT_TEXT) { /* after rounding: text is not numbers */
            unsigned char *t;
            size_t nt;
            st = px_text_sink_splice(&sink, m.data, m.n, &t, &nt);
            if (st == PX_OK) {
                free(m.data);
                m.data = t, m.n = nt, m.cap = nt;
            }
        }
        px_text_sink_free(&sink);
        if (st == PX_OK) st = svg_describe(&m, f);
        if (st != PX_OK) {
            free(m.data);
            return st;
        }
    }
    *out = m.data;
    *n = m.n;
    return PX_OK;
}

int px_figure_save(const px_figure *f, const char *path, double dpi)
{
    int fmt = px_format_from_path(path);
    if (fmt < 0) return PX_EINVAL;
    unsigned char *data;
    size_t n;
    int st = px_figure_render(f, (px_format)fmt, dpi, &data, &n);
    if (st != PX_OK) return st;
    st = px_write_atomic(path, data, n, NULL);
    free(data);
    return st;
}

int px_figures_save_pdf(const px_figure *const *figs, size_t n, const char *path)
{
    if (!figs || n == 0 || !path) return PX_EINVAL;
    for (size_t i = 0; i < n; i++)
        if (!figs[i]) return PX_EINVAL;
    membuf m = {0};
    cairo_surface_t *s = pdf_surface(&m, figs[0]);
    cairo_t *cr = cairo_create(s);
    px_text_prepare(cr);
    for (size_t i = 0; i < n; i++) {
        cairo_pdf_surface_set_size(s, figs[i]->width, page_height(figs[i]));
        draw_page(cr, figs[i], -1, NULL);
        cairo_show_page(cr);
    }
    cairo_status_t cst = cairo_status(cr);
    cairo_destroy(cr);
    int st = finish_surface(s, cst, &m);
    if (st != PX_OK) return st;
    st = px_write_atomic(path, m.data, m.n, NULL);
    free(m.data);
    return st;
}

int px_figure_plot_rect(const px_figure *f, int panel, double dpi, double *x, double *y, double *w,
                        double *h)
{
    if (!f || panel < 0 || panel >= f->rows * f->cols || !(dpi > 0)) return PX_EINVAL;
    cairo_t *m = px_text_scratch();
    rect r = plot_rect_m(f, m, panel, 0);
    int ok = cairo_status(m) == CAIRO_STATUS_SUCCESS;
    cairo_destroy(m);
    if (!ok) return PX_ENOMEM;
    double s = dpi / 72.0;
    *x = r.x * s;
    *y = r.y * s;
    *w = r.w * s;
    *h = r.h * s;
    return PX_OK;
}
