/* draw.c - layout and drawing of a figure with cairo, and the output
 * back end (surface by format, finish, status checked once at the end, as
 * cairo errors are sticky).  The only file of phlox that calls cairo drawing
 * functions, with text.c for text. */
#include "core/atomic.h"
#include "core/status.h"
#include "render/figure_priv.h"
#include "render/text.h"
#include <cairo-pdf.h>
#include <cairo-svg.h>
#include <cairo.h>
#include <math.h>
#include <stdio.h>
#include <stdlib.h>
#include <string.h>

/* Layout in points (common practice for report figures, no source). */
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
#define PX_LEAD_DX 16.0       /* lead-out label offset steps, points */
#define PX_LEAD_DY 12.0
#define PX_TICK_LEN 4.0
#define PX_MAX_TICKS 9
#define PX_TICK_SPACE 6.0     /* least space between neighbouring tick labels */
#define PX_LEGEND_SIZE 7.5
#define PX_LEGEND_SWATCH 18.0 /* legend sample length */
#define PX_LEGEND_INSET 6.0   /* legend box distance from the frame */
#define PX_LEGEND_MAX_FRAC 0.35 /* widest legend, fraction of the panel's cell */
#define PX_HALO_WIDTH 2.2     /* light outline behind labels in the plot */
#define PX_HALO_ALPHA 0.75
#define PX_ASCENT 0.8         /* baseline below a text box's top, fraction of its height */
#define PX_PDF_FIXED_DATE "2000-01-01T00:00:00Z" /* pinned: same input, same bytes */

typedef struct rect {
    double x, y, w, h;
} rect;

static double foot_height(const px_figure *f)
{
    return f->n_stamp ? (double)f->n_stamp * PX_STAMP_LINE + 6.0 : 0.0;
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
static size_t axis_ticks(cairo_t *m, const px_panel *p, int yaxis, double avail, double *t,
                         double *wmax)
{
    char buf[64];
    size_t n = 0;
    double fh = text_h(m, PX_TICK_SIZE);
    for (size_t max = PX_MAX_TICKS; max >= 2; max--) {
        n = raw_ticks(p, yaxis, max, t);
        double step = n > 1 ? t[1] - t[0] : 1, need = 0;
        *wmax = 0;
        for (size_t i = 0; i < n; i++) {
            int lg = yaxis ? p->ylog : p->xlog;
            tick_text(buf, sizeof buf, t[i], lg ? 0 : step, lg);
            double w = text_w(m, buf, 0, PX_TICK_SIZE);
            *wmax = fmax(*wmax, w);
            need += (yaxis ? fh : w) + PX_TICK_SPACE;
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
static size_t legend_box(cairo_t *m, const px_panel *p, double cap, double *bw, double *bh,
                         double *line)
{
    size_t count = 0;
    double wmax = 0, h = text_h(m, PX_LEGEND_SIZE);
    for (size_t i = 0; i < p->n_items; i++)
        if (in_legend(&p->items[i])) {
            wmax = fmax(wmax, text_w(m, p->items[i].text, 0, PX_LEGEND_SIZE));
            count++;
        }
    wmax = fmin(wmax, cap);
    *line = h + 2;
    *bw = wmax + PX_LEGEND_SWATCH + 12;
    *bh = (double)count * *line + 6;
    return count;
}

typedef struct margins {
    double left, right, top, bottom;
} margins;

/* The room a panel needs around its plot for ticks, titles and legend. */
static double legend_cap(double cell_w)
{
    return PX_LEGEND_MAX_FRAC * cell_w - PX_LEGEND_SWATCH - 12;
}

static margins panel_margins(cairo_t *m, const px_panel *p, double cell_w)
{
    double t[PX_MAX_TICKS + 8], ywmax = 0, xwmax = 0;
    size_t ny = axis_ticks(m, p, 1, 0, t, &ywmax);
    (void)ny;
    size_t nx = axis_ticks(m, p, 0, 0, t, &xwmax);
    char buf[64];
    double last_half = 0;
    if (nx > 0) { /* the last x tick label hangs over the right end */
        double step = nx > 1 ? t[1] - t[0] : 1;
        tick_text(buf, sizeof buf, t[nx - 1], p->xlog ? 0 : step, p->xlog);
        double w = text_w(m, buf, 0, PX_TICK_SIZE);
        double frac = p->xlog ? (log10(t[nx - 1]) - log10(p->x0)) / (log10(p->x1) - log10(p->x0))
                              : (t[nx - 1] - p->x0) / (p->x1 - p->x0);
        if (frac > 0.9) last_half = w / 2;
    }
    double th = text_h(m, PX_TICK_SIZE), ah = text_h(m, PX_AXIS_TITLE_SIZE);
    margins g;
    g.left = PX_PAD + (p->ylabel ? ah + PX_GAP : 0) + ywmax + PX_GAP;
    g.right = fmax(2 * PX_PAD, last_half + PX_PAD);
    g.top = p->title ? text_h(m, PX_PANEL_TITLE_SIZE) + 2 * PX_GAP : th / 2 + PX_PAD;
    g.bottom = PX_GAP + th + (p->xlabel ? PX_GAP + ah : 0) + PX_PAD;
    double bw, bh, line;
    if (p->legend == PX_LEGEND_OUTSIDE && legend_box(m, p, legend_cap(cell_w), &bw, &bh, &line) > 0)
        g.right += bw + PX_LEGEND_INSET;
    return g;
}

/* The plot rectangle of a panel.  In a grid every panel gets the largest
 * margins of all, so the frames line up; `alone` is a page of its own. */
static rect plot_rect_m(const px_figure *f, cairo_t *m, int panel, int alone)
{
    double fw = f->width, fh = f->height - foot_height(f);
    double cw = alone ? fw : fw / f->cols, ch = alone ? fh : fh / f->rows;
    int r = alone ? 0 : panel / f->cols, c = alone ? 0 : panel % f->cols;
    margins g = panel_margins(m, &f->panels[panel], cw);
    if (!alone)
        for (int i = 0; i < f->rows * f->cols; i++) {
            margins o = panel_margins(m, &f->panels[i], cw);
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
    double a = angle * 3.14159265358979323846 / 180.0;
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

static void draw_axes(cairo_t *cr, const px_panel *p, rect r, rect cell)
{
    double t[PX_MAX_TICKS + 8], wmax;
    char buf[64];
    cairo_set_source_rgb(cr, 0, 0, 0);
    cairo_set_line_width(cr, 0.8);
    set_dash(cr, PX_DASH_SOLID, 1);
    cairo_rectangle(cr, r.x, r.y, r.w, r.h);
    cairo_stroke(cr);
    double th = text_h(cr, PX_TICK_SIZE), ah = text_h(cr, PX_AXIS_TITLE_SIZE);
    size_t n = axis_ticks(cr, p, 0, r.w, t, &wmax);
    double step = n > 1 ? t[1] - t[0] : 1;
    for (size_t i = 0; i < n; i++) {
        double x = map_x(p, r, t[i]);
        cairo_move_to(cr, x, r.y + r.h);
        cairo_line_to(cr, x, r.y + r.h - PX_TICK_LEN);
        cairo_stroke(cr);
        tick_text(buf, sizeof buf, t[i], p->xlog ? 0 : step, p->xlog);
        double w = text_w(cr, buf, 0, PX_TICK_SIZE);
        px_text_draw(cr, buf, 0, PX_TICK_SIZE, x - w / 2, r.y + r.h + PX_GAP + th * PX_ASCENT);
    }
    n = axis_ticks(cr, p, 1, r.h, t, &wmax);
    step = n > 1 ? t[1] - t[0] : 1;
    for (size_t i = 0; i < n; i++) {
        double y = map_y(p, r, t[i]);
        cairo_move_to(cr, r.x, y);
        cairo_line_to(cr, r.x + PX_TICK_LEN, y);
        cairo_stroke(cr);
        tick_text(buf, sizeof buf, t[i], p->ylog ? 0 : step, p->ylog);
        double w = text_w(cr, buf, 0, PX_TICK_SIZE);
        px_text_draw(cr, buf, 0, PX_TICK_SIZE, r.x - PX_GAP - w, y + th * 0.3);
    }
    char cut[PX_FIT_MAX];
    if (p->xlabel) {
        double avail = cell.w - 2 * PX_PAD;
        double s = fit_size(cr, p->xlabel, 0, PX_AXIS_TITLE_SIZE, PX_TITLE_MIN, avail);
        const char *t = fit_text(cr, p->xlabel, 0, s, avail, cut);
        double w = text_w(cr, t, 0, s);
        double x = fmin(fmax(r.x + r.w / 2 - w / 2, cell.x + PX_PAD), cell.x + cell.w - PX_PAD - w);
        px_text_draw(cr, t, 0, s, x, r.y + r.h + 2 * PX_GAP + th + ah * PX_ASCENT);
    }
    if (p->ylabel) {
        double avail = fmin(r.h + r.y - cell.y - PX_PAD, cell.h - 2 * PX_PAD);
        double s = fit_size(cr, p->ylabel, 0, PX_AXIS_TITLE_SIZE, PX_TITLE_MIN, avail);
        px_text_draw_vertical(cr, fit_text(cr, p->ylabel, 0, s, avail, cut), s,
                              r.x - 2 * PX_GAP - wmax - ah / 2, r.y + r.h / 2);
    }
    if (p->title) {
        double avail = cell.w - 2 * PX_PAD;
        double s = fit_size(cr, p->title, 0, PX_PANEL_TITLE_SIZE, PX_TITLE_MIN, avail);
        const char *t = fit_text(cr, p->title, 0, s, avail, cut);
        double w = text_w(cr, t, 0, s);
        double x = fmin(fmax(r.x + r.w / 2 - w / 2, cell.x + PX_PAD), cell.x + cell.w - PX_PAD - w);
        px_text_draw(cr, t, 0, s, x, r.y - PX_GAP - text_h(cr, s) * 0.25);
    }
}

/* Does a w x h box centred at (cx, cy) lie inside the polygon? */
static int box_inside(const double *x, const double *y, size_t n, double cx, double cy, double w,
                      double h)
{
    for (int i = -1; i <= 1; i++)
        for (int j = -1; j <= 1; j++)
            if (!px_polygon_contains(x, y, n, cx + i * w / 2, cy + j * h / 2)) return 0;
    return 1;
}

#define PX_PLACED_MAX 64 /* lead-out label boxes remembered per panel */
typedef struct placed_boxes {
    rect box[PX_PLACED_MAX];
    int n;
} placed_boxes;

static int overlaps(rect a, rect b)
{
    return a.x < b.x + b.w && b.x < a.x + a.w && a.y < b.y + b.h && b.y < a.y + a.h;
}

static void draw_field_label(cairo_t *cr, const px_panel *p, rect r, const px_item *it,
                             placed_boxes *placed)
{
    size_t n = it->n;
    double *dx = malloc(n * sizeof *dx), *dy = malloc(n * sizeof *dy);
    if (!dx || !dy) {
        free(dx);
        free(dy);
        return;
    }
    for (size_t i = 0; i < n; i++) { /* device coordinates, clipped to the plot */
        dx[i] = fmin(fmax(map_x(p, r, it->x[i]), r.x), r.x + r.w);
        dy[i] = fmin(fmax(map_y(p, r, it->y[i]), r.y), r.y + r.h);
    }
    double cx, cy, dist = 0;
    if (isfinite(it->lx) && isfinite(it->ly)) {
        cx = map_x(p, r, it->lx);
        cy = map_y(p, r, it->ly);
    } else if (px_polygon_pole(dx, dy, n, 0.5, &cx, &cy, &dist) != PX_OK) {
        free(dx);
        free(dy);
        return;
    }
    cairo_set_source_rgb(cr, 0.08, 0.08, 0.1);
    for (double s = PX_LABEL_MAX; s >= PX_LABEL_MIN; s -= PX_LABEL_STEP) {
        double w, h;
        px_text_measure(cr, it->text, 1, s, &w, &h);
        if (box_inside(dx, dy, n, cx, cy, w + 2, h)) {
            px_text_draw_halo(cr, it->text, 1, s, cx - w / 2, cy + h * 0.3, PX_HALO_WIDTH, 1, 1, 1,
                              PX_HALO_ALPHA);
            free(dx);
            free(dy);
            return;
        }
    }
    /* Tall and narrow: set the label vertically (reads bottom to top). */
    for (double s = PX_LABEL_MAX; s >= PX_LABEL_MIN; s -= PX_LABEL_STEP) {
        double w, h;
        px_text_measure(cr, it->text, 1, s, &w, &h);
        if (box_inside(dx, dy, n, cx, cy, h, w + 2)) {
            cairo_save(cr);
            cairo_translate(cr, cx, cy);
            cairo_rotate(cr, -1.5707963267948966); /* -pi/2 */
            px_text_draw_halo(cr, it->text, 1, s, -w / 2, h * 0.3, PX_HALO_WIDTH, 1, 1, 1,
                              PX_HALO_ALPHA);
            cairo_restore(cr);
            free(dx);
            free(dy);
            return;
        }
    }
    /* Too thin: lead the label out with a line from the field's centroid
     * (the pole of a thin strip sits at an arbitrary end of it). */
    double a = 0, gx = 0, gy = 0;
    for (size_t i = 0, j = n - 1; i < n; j = i++) {
        double c = dx[j] * dy[i] - dx[i] * dy[j];
        a += c;
        gx += (dx[j] + dx[i]) * c;
        gy += (dy[j] + dy[i]) * c;
    }
    if (a != 0 && px_polygon_contains(dx, dy, n, gx / (3 * a), gy / (3 * a))) {
        cx = gx / (3 * a);
        cy = gy / (3 * a);
    }
    double w, h;
    px_text_measure(cr, it->text, 1, PX_LABEL_MIN + 1, &w, &h);
    /* Candidate spots around the anchor, towards the roomier side first;
     * the first that clears the labels already led out wins. */
    double sx = cx < r.x + r.w / 2 ? 1 : -1, sy = cy < r.y + r.h / 2 ? 1 : -1;
    static const double step[][2] = {{1, 1}, {1, 2.4}, {1, -1}, {2.2, 1}, {1, 3.8}, {2.2, -1},
                                     {1, -2.4}, {2.2, 2.4}, {3.4, 1}, {2.2, -2.4}, {3.4, -1}, {1, 5.2}};
    double ox = 0, oy = 0;
    for (size_t k = 0; k < sizeof step / sizeof step[0]; k++) {
        double tx = cx + sx * PX_LEAD_DX * step[k][0] - (sx < 0 ? w : 0);
        double ty = cy + sy * PX_LEAD_DY * step[k][1];
        tx = fmin(fmax(tx, r.x + 2), r.x + r.w - w - 2);
        ty = fmin(fmax(ty, r.y + h), r.y + r.h - 2);
        rect b = {tx - 1, ty - h * 0.85, w + 2, h};
        int clear = 1;
        for (int q = 0; q < placed->n && clear; q++) clear = !overlaps(b, placed->box[q]);
        if (k == 0 || clear) {
            ox = tx;
            oy = ty;
        }
        if (clear) break;
    }
    if (placed->n < PX_PLACED_MAX) placed->box[placed->n++] = (rect){ox - 1, oy - h * 0.85, w + 2, h};
    cairo_set_line_width(cr, 0.5);
    set_dash(cr, PX_DASH_SOLID, 1);
    cairo_move_to(cr, cx, cy);
    cairo_line_to(cr, ox + (ox > cx ? 0 : w), oy - h * 0.3);
    cairo_stroke(cr);
    cairo_arc(cr, cx, cy, 1.1, 0, 6.283185307179586);
    cairo_fill(cr);
    cairo_set_source_rgba(cr, 1, 1, 1, 0.8);
    cairo_rectangle(cr, ox - 1, oy - h * 0.85, w + 2, h);
    cairo_fill(cr);
    cairo_set_source_rgb(cr, 0.08, 0.08, 0.1);
    px_text_draw(cr, it->text, 1, PX_LABEL_MIN + 1, ox, oy);
    free(dx);
    free(dy);
}

static void draw_swatch(cairo_t *cr, const px_item *it, double x, double y)
{
    if (it->kind == PX_ITEM_LINE) {
        set_rgba(cr, it->color);
        cairo_set_line_width(cr, it->width);
        set_dash(cr, it->dash, it->width);
        cairo_move_to(cr, x, y);
        cairo_line_to(cr, x + PX_LEGEND_SWATCH, y);
        cairo_stroke(cr);
        return;
    }
    rect b = {x, y - 3.5, PX_LEGEND_SWATCH, 7};
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

static void draw_legend(cairo_t *cr, const px_panel *p, rect r, rect cell)
{
    double bw, bh, line, cap = legend_cap(cell.w);
    char cut[PX_FIT_MAX];
    if (!legend_box(cr, p, cap, &bw, &bh, &line)) return;
    double h = text_h(cr, PX_LEGEND_SIZE), bx, by;
    switch (p->legend) {
    case PX_LEGEND_TOP_LEFT: bx = r.x + PX_LEGEND_INSET, by = r.y + PX_LEGEND_INSET; break;
    case PX_LEGEND_BOTTOM_LEFT: bx = r.x + PX_LEGEND_INSET, by = r.y + r.h - bh - PX_LEGEND_INSET; break;
    case PX_LEGEND_BOTTOM_RIGHT:
        bx = r.x + r.w - bw - PX_LEGEND_INSET, by = r.y + r.h - bh - PX_LEGEND_INSET;
        break;
    case PX_LEGEND_OUTSIDE: bx = r.x + r.w + PX_LEGEND_INSET, by = r.y; break;
    default: bx = r.x + r.w - bw - PX_LEGEND_INSET, by = r.y + PX_LEGEND_INSET; break;
    }
    cairo_set_source_rgba(cr, 1, 1, 1, 0.88);
    cairo_rectangle(cr, bx, by, bw, bh);
    cairo_fill_preserve(cr);
    cairo_set_source_rgb(cr, 0.4, 0.4, 0.4);
    cairo_set_line_width(cr, 0.5);
    set_dash(cr, PX_DASH_SOLID, 1);
    cairo_stroke(cr);
    size_t k = 0;
    for (size_t i = 0; i < p->n_items; i++) {
        const px_item *it = &p->items[i];
        if (!in_legend(it)) continue;
        double y = by + 3 + line * ((double)k + 0.5);
        draw_swatch(cr, it, bx + 4, y);
        cairo_set_source_rgb(cr, 0, 0, 0);
        px_text_draw(cr, fit_text(cr, it->text, 0, PX_LEGEND_SIZE, cap, cut), 0, PX_LEGEND_SIZE,
                     bx + PX_LEGEND_SWATCH + 8, y + h * 0.3);
        k++;
    }
}

static void draw_panel(cairo_t *cr, const px_panel *p, rect r, rect cell)
{
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
    placed_boxes placed;
    placed.n = 0;
    for (size_t i = 0; i < p->n_items; i++) { /* labels and text on top */
        const px_item *it = &p->items[i];
        if (it->kind == PX_ITEM_POLYGON && it->text) draw_field_label(cr, p, r, it, &placed);
        else if (it->kind == PX_ITEM_TEXT) {
            set_rgba(cr, it->color);
            double w, h;
            px_text_measure(cr, it->text, it->chem, it->width, &w, &h);
            double x = map_x(p, r, it->lx), y = map_y(p, r, it->ly);
            x = fmin(fmax(x, r.x + 1), r.x + r.w - w - 1); /* keep inside the plot */
            y = fmin(fmax(y, r.y + h * PX_ASCENT + 1), r.y + r.h - h * 0.25 - 1);
            px_text_draw_halo(cr, it->text, it->chem, it->width, x, y, PX_HALO_WIDTH, 1, 1, 1,
                              PX_HALO_ALPHA);
        }
    }
    if (p->legend != PX_LEGEND_OUTSIDE) draw_legend(cr, p, r, cell);
    cairo_restore(cr);
    if (p->legend == PX_LEGEND_OUTSIDE) draw_legend(cr, p, r, cell);
    draw_axes(cr, p, r, cell);
}

static void draw_stamp(cairo_t *cr, const px_figure *f)
{
    cairo_set_source_rgb(cr, 0.3, 0.3, 0.3);
    double y0 = f->height - foot_height(f) + 3;
    for (size_t k = 0; k < f->n_stamp; k++) {
        char cut[PX_FIT_MAX];
        double avail = f->width - 2 * PX_PAD;
        double s = fit_size(cr, f->stamp[k], 0, PX_STAMP_SIZE, PX_STAMP_MIN, avail);
        px_text_draw(cr, fit_text(cr, f->stamp[k], 0, s, avail, cut), 0, s, PX_PAD,
                     y0 + PX_STAMP_LINE * ((double)k + 1) - 2);
    }
}

static rect cell_rect(const px_figure *f, int panel, int alone)
{
    double fw = f->width, fh = f->height - foot_height(f);
    if (alone) return (rect){0, 0, fw, fh};
    double cw = fw / f->cols, ch = fh / f->rows;
    return (rect){(panel % f->cols) * cw, (panel / f->cols) * ch, cw, ch};
}

static void draw_page(cairo_t *cr, const px_figure *f, int only_panel)
{
    cairo_set_source_rgb(cr, 1, 1, 1);
    cairo_paint(cr);
    if (only_panel >= 0)
        draw_panel(cr, &f->panels[only_panel], plot_rect_m(f, cr, only_panel, 1),
                   cell_rect(f, only_panel, 1));
    else
        for (int i = 0; i < f->rows * f->cols; i++)
            draw_panel(cr, &f->panels[i], plot_rect_m(f, cr, i, 0), cell_rect(f, i, 0));
    draw_stamp(cr, f);
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
        if (i + klen < m->n && memcmp(m->data + i, key, klen) == 0 &&
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
        } else {
            out[o++] = m->data[i++];
        }
    }
    free(m->data);
    m->data = out;
    m->n = o;
    m->cap = o;
    return PX_OK;
}

/* cairo writes SVG coordinates with up to six decimals ("1.671875"); a
 * thousandth of a point (0.35 um) is far below what any screen or printer
 * shows, so numbers with more decimals are rounded to three and their
 * trailing zeros dropped.  Run on cairo's output only, before the <title>
 * and <desc> are inserted, so no text is touched. */
#define PX_SVG_DECIMALS 3
static int svg_compact(membuf *m)
{
    unsigned char *out = malloc(m->n + 1);
    if (!out) return PX_ENOMEM;
    size_t o = 0;
    for (size_t i = 0; i < m->n;) {
        unsigned char c = m->data[i];
        int starts = (c >= '0' && c <= '9') &&
                     (i == 0 || !((m->data[i - 1] >= '0' && m->data[i - 1] <= '9') ||
                                  (m->data[i - 1] >= 'a' && m->data[i - 1] <= 'z') ||
                                  (m->data[i - 1] >= 'A' && m->data[i - 1] <= 'Z') ||
                                  m->data[i - 1] == '.' || m->data[i - 1] == '_' || m->data[i - 1] == '#'));
        if (!starts) {
            out[o++] = m->data[i++];
            continue;
        }
        size_t j = i;
        while (j < m->n && m->data[j] >= '0' && m->data[j] <= '9') j++;
        size_t dot = j, k = j;
        if (k < m->n && m->data[k] == '.') {
            k++;
            while (k < m->n && m->data[k] >= '0' && m->data[k] <= '9') k++;
        }
        int is_name = k < m->n && ((m->data[k] >= 'a' && m->data[k] <= 'z') || (m->data[k] >= 'A' && m->data[k] <= 'Z'));
        if (k - dot - 1 <= PX_SVG_DECIMALS || dot == k || is_name) { /* short, integer or part of a name */
            memcpy(out + o, m->data + i, k - i);
            o += k - i;
            i = k;
            continue;
        }
        char num[64], txt[64];
        size_t len = k - i < sizeof num - 1 ? k - i : sizeof num - 1;
        memcpy(num, m->data + i, len);
        num[len] = '\0';
        int neg = i > 0 && m->data[i - 1] == '-';
        int w = snprintf(txt, sizeof txt, "%.*f", PX_SVG_DECIMALS, strtod(num, NULL));
        while (w > 0 && txt[w - 1] == '0') w--;
        if (w > 0 && txt[w - 1] == '.') w--;
        if (neg && w == 1 && txt[0] == '0') o--; /* "-0.0001" -> "0", not "-0" */
        memcpy(out + o, txt, (size_t)w); /* never longer than the input */
        o += (size_t)w;
        i = k;
    }
    free(m->data);
    m->data = out;
    m->n = o;
    m->cap = o;
    return PX_OK;
}

/* The figure's words for SVG: cairo draws glyphs as paths, so without this
 * an SVG says nothing a search, a screen reader or a test can find.  One
 * <title> (the first panel title) and one <desc> with a line per panel
 * title, axis title, field label (phlox notation), legend entry, text and
 * stamp line, XML-escaped, inserted after the root element's start tag. */
typedef struct sbuf {
    char *s;
    size_t n, cap;
    int failed;
} sbuf;

static void sb_put(sbuf *b, const char *s, size_t k)
{
    if (b->failed) return;
    if (b->n + k + 1 > b->cap) {
        size_t cap = b->cap ? b->cap : 1024;
        while (cap < b->n + k + 1) cap *= 2;
        char *d = realloc(b->s, cap);
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

static void sb_str(sbuf *b, const char *s) { sb_put(b, s, strlen(s)); }

static void sb_xml(sbuf *b, const char *s)
{
    for (; *s; s++) {
        switch (*s) {
        case '&': sb_str(b, "&amp;"); break;
        case '<': sb_str(b, "&lt;"); break;
        case '>': sb_str(b, "&gt;"); break;
        case '"': sb_str(b, "&quot;"); break;
        case '{': case '}': break; /* formula markup of plain text */
        default:
            if ((unsigned char)*s >= 0x20 || *s == '\n' || *s == '\t') sb_put(b, s, 1);
        }
    }
}

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
    for (int i = 0; i < f->rows * f->cols && !title; i++) title = f->panels[i].title;
    sb_str(&b, "\n<title>");
    sb_xml(&b, title ? title : "phlox figure");
    sb_str(&b, "</title>\n<desc>\n");
    for (int i = 0; i < f->rows * f->cols; i++) {
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
    free(m->data);
    m->data = out;
    m->n += b.n;
    m->cap = m->n;
    return PX_OK;
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
                                       (int)lround(f->height * scale));
        break;
    case PX_FORMAT_SVG:
        s = cairo_svg_surface_create_for_stream(mem_write, &m, f->width, f->height);
        break;
    case PX_FORMAT_PDF:
        s = cairo_pdf_surface_create_for_stream(mem_write, &m, f->width, f->height);
        cairo_pdf_surface_set_metadata(s, CAIRO_PDF_METADATA_CREATE_DATE, PX_PDF_FIXED_DATE);
        cairo_pdf_surface_set_metadata(s, CAIRO_PDF_METADATA_MOD_DATE, PX_PDF_FIXED_DATE);
        cairo_pdf_surface_set_metadata(s, CAIRO_PDF_METADATA_CREATOR, "phlox");
        break;
    default: return PX_EINVAL;
    }
    cairo_t *cr = cairo_create(s);
    px_text_prepare(cr);
    cairo_scale(cr, scale, scale);
    if (fmt == PX_FORMAT_PDF && f->page_per_panel) {
        for (int i = 0; i < f->rows * f->cols; i++) {
            draw_page(cr, f, i);
            cairo_show_page(cr);
        }
    } else {
        draw_page(cr, f, -1);
    }
    cairo_status_t cst = cairo_status(cr);
    cairo_destroy(cr);
    if (fmt == PX_FORMAT_PNG && cst == CAIRO_STATUS_SUCCESS) {
        cairo_surface_flush(s);
        cst = cairo_surface_write_to_png_stream(s, mem_write, &m);
    }
    cairo_surface_finish(s);
    if (cst == CAIRO_STATUS_SUCCESS) cst = cairo_surface_status(s);
    cairo_surface_destroy(s);
    if (cst != CAIRO_STATUS_SUCCESS || m.failed) {
        free(m.data);
        return m.failed || cst == CAIRO_STATUS_NO_MEMORY ? PX_ENOMEM : PX_EIO;
    }
    if (fmt == PX_FORMAT_SVG) {
        int st = svg_renumber(&m);
        if (st == PX_OK) st = svg_compact(&m);
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
