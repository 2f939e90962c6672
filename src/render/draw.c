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
#define PX_MARGIN_LEFT 56.0
#define PX_MARGIN_RIGHT 14.0
#define PX_MARGIN_TOP 22.0
#define PX_MARGIN_BOTTOM 38.0
#define PX_STAMP_LINE 9.0     /* stamp line height */
#define PX_STAMP_SIZE 6.5     /* stamp font size */
#define PX_TICK_SIZE 8.5      /* tick label font size */
#define PX_AXIS_TITLE_SIZE 9.5
#define PX_PANEL_TITLE_SIZE 10.0
#define PX_LABEL_MAX 9.5      /* field label sizes tried, largest first */
#define PX_LABEL_MIN 5.5
#define PX_LABEL_STEP 0.5
#define PX_TICK_LEN 4.0
#define PX_MAX_TICKS 9
#define PX_LEGEND_SIZE 7.5
#define PX_PDF_FIXED_DATE "2000-01-01T00:00:00Z" /* pinned: same input, same bytes */

typedef struct rect {
    double x, y, w, h;
} rect;

static double foot_height(const px_figure *f)
{
    return f->n_stamp ? (double)f->n_stamp * PX_STAMP_LINE + 6.0 : 0.0;
}

static rect plot_rect(const px_figure *f, int panel, int alone)
{
    double fw = f->width, fh = f->height - foot_height(f);
    double cw = alone ? fw : fw / f->cols, ch = alone ? fh : fh / f->rows;
    int r = alone ? 0 : panel / f->cols, c = alone ? 0 : panel % f->cols;
    rect p = {c * cw + PX_MARGIN_LEFT, r * ch + PX_MARGIN_TOP,
              cw - PX_MARGIN_LEFT - PX_MARGIN_RIGHT, ch - PX_MARGIN_TOP - PX_MARGIN_BOTTOM};
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

/* Tick label text: enough decimals for the step, a true minus sign. */
static void tick_text(char *buf, size_t n, double v, double step, int logaxis)
{
    char tmp[48];
    if (logaxis) {
        double e = log10(v);
        if (fabs(e - round(e)) < 1e-9) snprintf(tmp, sizeof tmp, "1e%d", (int)round(e));
        else snprintf(tmp, sizeof tmp, "%g", v);
    } else {
        int dec = 0;
        double s = fabs(step);
        while (dec < 6 && fabs(s * pow(10, dec) - round(s * pow(10, dec))) > 1e-6) dec++;
        snprintf(tmp, sizeof tmp, "%.*f", dec, v);
    }
    if (tmp[0] == '-') snprintf(buf, n, "\xe2\x88\x92%s", tmp + 1);
    else snprintf(buf, n, "%s", tmp);
}

static void draw_axes(cairo_t *cr, const px_panel *p, rect r)
{
    double t[PX_MAX_TICKS + 8];
    char buf[64];
    cairo_set_source_rgb(cr, 0, 0, 0);
    cairo_set_line_width(cr, 0.8);
    set_dash(cr, PX_DASH_SOLID, 1);
    cairo_rectangle(cr, r.x, r.y, r.w, r.h);
    cairo_stroke(cr);
    /* x ticks */
    size_t n = p->xlog ? px_ticks_log(p->x0, p->x1, PX_MAX_TICKS, t)
                       : px_ticks_linear(p->x0, p->x1, PX_MAX_TICKS, t);
    double step = n > 1 ? t[1] - t[0] : 1;
    for (size_t i = 0; i < n; i++) {
        double x = map_x(p, r, t[i]);
        cairo_move_to(cr, x, r.y + r.h);
        cairo_line_to(cr, x, r.y + r.h - PX_TICK_LEN);
        cairo_stroke(cr);
        tick_text(buf, sizeof buf, t[i], step, p->xlog);
        double w, h;
        px_text_measure(cr, buf, 0, PX_TICK_SIZE, &w, &h);
        px_text_draw(cr, buf, 0, PX_TICK_SIZE, x - w / 2, r.y + r.h + 3 + h * 0.8);
    }
    n = p->ylog ? px_ticks_log(p->y0, p->y1, PX_MAX_TICKS, t)
                : px_ticks_linear(p->y0, p->y1, PX_MAX_TICKS, t);
    step = n > 1 ? t[1] - t[0] : 1;
    for (size_t i = 0; i < n; i++) {
        double y = map_y(p, r, t[i]);
        cairo_move_to(cr, r.x, y);
        cairo_line_to(cr, r.x + PX_TICK_LEN, y);
        cairo_stroke(cr);
        tick_text(buf, sizeof buf, t[i], step, p->ylog);
        double w, h;
        px_text_measure(cr, buf, 0, PX_TICK_SIZE, &w, &h);
        px_text_draw(cr, buf, 0, PX_TICK_SIZE, r.x - 4 - w, y + h * 0.3);
    }
    double w, h;
    if (p->xlabel) {
        px_text_measure(cr, p->xlabel, 0, PX_AXIS_TITLE_SIZE, &w, &h);
        px_text_draw(cr, p->xlabel, 0, PX_AXIS_TITLE_SIZE, r.x + r.w / 2 - w / 2,
                     r.y + r.h + 26);
    }
    if (p->ylabel) px_text_draw_vertical(cr, p->ylabel, PX_AXIS_TITLE_SIZE, r.x - 42, r.y + r.h / 2);
    if (p->title) {
        px_text_measure(cr, p->title, 0, PX_PANEL_TITLE_SIZE, &w, &h);
        px_text_draw(cr, p->title, 0, PX_PANEL_TITLE_SIZE, r.x + r.w / 2 - w / 2, r.y - 7);
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

static void draw_field_label(cairo_t *cr, const px_panel *p, rect r, const px_item *it)
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
            px_text_draw(cr, it->text, 1, s, cx - w / 2, cy + h * 0.3);
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
    double ox = cx + (cx < r.x + r.w / 2 ? 16 : -16 - w);
    double oy = cy + (cy < r.y + r.h / 2 ? 16 : -10);
    ox = fmin(fmax(ox, r.x + 2), r.x + r.w - w - 2);
    oy = fmin(fmax(oy, r.y + h), r.y + r.h - 2);
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

static void draw_legend(cairo_t *cr, const px_panel *p, rect r)
{
    size_t count = 0;
    double wmax = 0, w, h = 0;
    for (size_t i = 0; i < p->n_items; i++)
        if (p->items[i].kind == PX_ITEM_LINE && p->items[i].text) {
            px_text_measure(cr, p->items[i].text, 0, PX_LEGEND_SIZE, &w, &h);
            wmax = fmax(wmax, w);
            count++;
        }
    if (!count) return;
    double line = h + 2, bw = wmax + 30, bh = (double)count * line + 6;
    double bx = r.x + r.w - bw - 6, by = r.y + 6;
    cairo_set_source_rgba(cr, 1, 1, 1, 0.85);
    cairo_rectangle(cr, bx, by, bw, bh);
    cairo_fill_preserve(cr);
    cairo_set_source_rgb(cr, 0.4, 0.4, 0.4);
    cairo_set_line_width(cr, 0.5);
    set_dash(cr, PX_DASH_SOLID, 1);
    cairo_stroke(cr);
    size_t k = 0;
    for (size_t i = 0; i < p->n_items; i++) {
        const px_item *it = &p->items[i];
        if (it->kind != PX_ITEM_LINE || !it->text) continue;
        double y = by + 3 + line * ((double)k + 0.5);
        set_rgba(cr, it->color);
        cairo_set_line_width(cr, it->width);
        set_dash(cr, it->dash, it->width);
        cairo_move_to(cr, bx + 4, y);
        cairo_line_to(cr, bx + 22, y);
        cairo_stroke(cr);
        cairo_set_source_rgb(cr, 0, 0, 0);
        px_text_draw(cr, it->text, 0, PX_LEGEND_SIZE, bx + 26, y + h * 0.3);
        k++;
    }
}

static void draw_panel(cairo_t *cr, const px_panel *p, rect r)
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
    for (size_t i = 0; i < p->n_items; i++) { /* labels and text on top */
        const px_item *it = &p->items[i];
        if (it->kind == PX_ITEM_POLYGON && it->text) draw_field_label(cr, p, r, it);
        else if (it->kind == PX_ITEM_TEXT) {
            set_rgba(cr, it->color);
            double w, h;
            px_text_measure(cr, it->text, it->chem, it->width, &w, &h);
            double x = map_x(p, r, it->lx), y = map_y(p, r, it->ly);
            x = fmin(fmax(x, r.x + 1), r.x + r.w - w - 1); /* keep inside the plot */
            px_text_draw(cr, it->text, it->chem, it->width, x, y);
        }
    }
    draw_legend(cr, p, r);
    cairo_restore(cr);
    draw_axes(cr, p, r);
}

static void draw_stamp(cairo_t *cr, const px_figure *f)
{
    cairo_set_source_rgb(cr, 0.3, 0.3, 0.3);
    double y0 = f->height - foot_height(f) + 3;
    for (size_t k = 0; k < f->n_stamp; k++)
        px_text_draw(cr, f->stamp[k], 0, PX_STAMP_SIZE, 6, y0 + PX_STAMP_LINE * ((double)k + 1) - 2);
}

static void draw_page(cairo_t *cr, const px_figure *f, int only_panel)
{
    cairo_set_source_rgb(cr, 1, 1, 1);
    cairo_paint(cr);
    if (only_panel >= 0) draw_panel(cr, &f->panels[only_panel], plot_rect(f, only_panel, 1));
    else
        for (int i = 0; i < f->rows * f->cols; i++) draw_panel(cr, &f->panels[i], plot_rect(f, i, 0));
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
    rect r = plot_rect(f, panel, 0);
    double s = dpi / 72.0;
    *x = r.x * s;
    *y = r.y * s;
    *w = r.w * s;
    *h = r.h * s;
    return PX_OK;
}
