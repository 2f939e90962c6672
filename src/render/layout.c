/* layout.c - page geometry of a figure: the room each panel needs around
 * its plot (measured tick labels, axis and panel titles, an outside
 * legend), the plot and cell rectangles of a grid (frames line up), ticks
 * and their text, the legend's box, data-to-page mapping and fitting text
 * into the room it has (shrink, then cut with an ellipsis, never silently).
 * Measures text on the context it is given and draws nothing.  Contract in
 * layout.h; px_figure_plot_rect is public (render.h). */
#include "core/status.h"
#include "render/layout.h"
#include "render/text.h"
#include <math.h>
#include <stdio.h>
#include <string.h>

double px_foot_height(const px_figure *f)
{
    return f->n_stamp ? (double)f->n_stamp * PX_STAMP_LINE * f->ts + 6.0 * f->ts : 0.0;
}

/* The page: the figure's height, plus the stamp when it goes below. */
double px_page_height(const px_figure *f)
{
    return f->height + (f->stamp_below ? px_foot_height(f) : 0.0);
}

double px_text_w(cairo_t *m, const char *s, int chem, double size)
{
    double w, h;
    px_text_measure(m, s, chem, size, &w, &h);
    return w;
}

double px_text_h(cairo_t *m, double size)
{
    double w, h;
    px_text_measure(m, "0", 0, size, &w, &h);
    return h;
}

/* Largest size <= size (down to min) at which s fits in avail points. */
double px_fit_size(cairo_t *m, const char *s, int chem, double size, double min, double avail)
{
    double w = px_text_w(m, s, chem, size);
    if (w <= avail || w <= 0) return size;
    double fs = size * avail / w;
    return fs < min ? min : fs;
}

/* Text that fits `avail` points at `size`: s itself, or a copy in buf cut
 * at a UTF-8 character boundary and ended with an ellipsis, so text is
 * never cut off silently at the figure's edge. */
const char *px_fit_text(cairo_t *m, const char *s, int chem, double size, double avail,
                            char *buf)
{
    if (px_text_w(m, s, chem, size) <= avail) return s;
    size_t n = strlen(s);
    if (n > PX_FIT_MAX - 4) n = PX_FIT_MAX - 4;
    while (n > 0) {
        n--;
        while (n > 0 && ((unsigned char)s[n] & 0xC0) == 0x80) n--; /* continuation byte */
        memcpy(buf, s, n);
        memcpy(buf + n, "\xe2\x80\xa6", 4); /* U+2026 and the terminator */
        if (px_text_w(m, buf, chem, size) <= avail) return buf;
    }
    return buf;
}

/* Tick label text: enough decimals for the step, a true minus sign; log
 * axes show decades as 10 with a superscript exponent. */
void px_tick_text(char *buf, size_t n, double v, double step, int logaxis)
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
size_t px_axis_ticks(cairo_t *m, const px_panel *p, double ts, int yaxis, double avail,
                         double *t, double *wmax)
{
    char buf[64];
    size_t n = 0;
    double fh = px_text_h(m, PX_TICK_SIZE * ts);
    for (size_t max = PX_MAX_TICKS; max >= 2; max--) {
        n = raw_ticks(p, yaxis, max, t);
        double step = n > 1 ? t[1] - t[0] : 1, need = 0;
        *wmax = 0;
        for (size_t i = 0; i < n; i++) {
            int lg = yaxis ? p->ylog : p->xlog;
            px_tick_text(buf, sizeof buf, t[i], lg ? 0 : step, lg);
            double w = px_text_w(m, buf, 0, PX_TICK_SIZE * ts);
            *wmax = fmax(*wmax, w);
            need += (yaxis ? fh : w) + PX_TICK_SPACE * ts;
        }
        if (avail <= 0 || need <= avail || n <= 2) return n;
    }
    return n;
}

/* Legend entries: lines with a legend text, and patches. */
int px_in_legend(const px_item *it)
{
    return (it->kind == PX_ITEM_LINE && it->text) || it->kind == PX_ITEM_PATCH;
}

/* The legend's box; entries longer than `cap` points are cut (px_fit_text). */
size_t px_legend_box(cairo_t *m, const px_panel *p, double ts, double cap, double *bw,
                         double *bh, double *line)
{
    size_t count = 0;
    double wmax = 0, h = px_text_h(m, PX_LEGEND_SIZE * ts);
    for (size_t i = 0; i < p->n_items; i++)
        if (px_in_legend(&p->items[i])) {
            wmax = fmax(wmax, px_text_w(m, p->items[i].text, 0, PX_LEGEND_SIZE * ts));
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
double px_title_drop(double tick_h, double gap)
{
    return fmax(gap, tick_h / 2 + gap / 2);
}

typedef struct margins {
    double left, right, top, bottom;
} margins;

/* The room a panel needs around its plot for ticks, titles and legend. */
double px_legend_cap(double cell_w, double ts)
{
    return PX_LEGEND_MAX_FRAC * cell_w - (PX_LEGEND_SWATCH + 12) * ts;
}

static margins panel_margins(cairo_t *m, const px_panel *p, double ts, double cell_w)
{
    if (p->bare) return (margins){0, 0, 0, 0};
    double t[PX_MAX_TICKS + 8], ywmax = 0, xwmax = 0;
    size_t ny = px_axis_ticks(m, p, ts, 1, 0, t, &ywmax);
    (void)ny;
    size_t nx = px_axis_ticks(m, p, ts, 0, 0, t, &xwmax);
    char buf[64];
    double last_half = 0;
    if (nx > 0) { /* the last x tick label hangs over the right end */
        double step = nx > 1 ? t[1] - t[0] : 1;
        px_tick_text(buf, sizeof buf, t[nx - 1], p->xlog ? 0 : step, p->xlog);
        double w = px_text_w(m, buf, 0, PX_TICK_SIZE * ts);
        double frac = p->xlog ? (log10(t[nx - 1]) - log10(p->x0)) / (log10(p->x1) - log10(p->x0))
                              : (t[nx - 1] - p->x0) / (p->x1 - p->x0);
        if (frac > 0.9) last_half = w / 2;
    }
    double th = px_text_h(m, PX_TICK_SIZE * ts), ah = px_text_h(m, PX_AXIS_TITLE_SIZE * ts);
    double pad = PX_PAD * ts, gap = PX_GAP * ts;
    margins g;
    g.left = pad + (p->ylabel ? ah + gap : 0) + ywmax + gap;
    g.right = fmax(2 * pad, last_half + pad);
    g.top = p->title ? px_text_h(m, PX_PANEL_TITLE_SIZE * ts) + gap + px_title_drop(th, gap) : th / 2 + pad;
    g.bottom = gap + th + (p->xlabel ? gap + ah : 0) + pad;
    double bw, bh, line;
    if (p->legend == PX_LEGEND_OUTSIDE &&
        px_legend_box(m, p, ts, px_legend_cap(cell_w, ts), &bw, &bh, &line) > 0)
        g.right += bw + PX_LEGEND_INSET * ts;
    return g;
}

/* The plot rectangle of a panel.  In a grid every panel gets the largest
 * margins of all, so the frames line up; `alone` is a page of its own. */
px_rect px_plot_rect(const px_figure *f, cairo_t *m, int panel, int alone)
{
    double fw = f->width, fh = px_page_height(f) - px_foot_height(f);
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
    px_rect p = {c * cw + g.left, r * ch + g.top, cw - g.left - g.right, ch - g.top - g.bottom};
    if (p.w < 10) p.w = 10;
    if (p.h < 10) p.h = 10;
    return p;
}

double px_map_x(const px_panel *p, px_rect r, double x)
{
    double t = p->xlog ? (log10(x) - log10(p->x0)) / (log10(p->x1) - log10(p->x0))
                       : (x - p->x0) / (p->x1 - p->x0);
    return r.x + t * r.w;
}

double px_map_y(const px_panel *p, px_rect r, double y)
{
    double t = p->ylog ? (log10(y) - log10(p->y0)) / (log10(p->y1) - log10(p->y0))
                       : (y - p->y0) / (p->y1 - p->y0);
    return r.y + r.h - t * r.h;
}

int px_legend_rect(cairo_t *cr, const px_panel *p, double ts, px_rect r, px_rect cell, px_rect *out)
{
    double bw, bh, line, cap = px_legend_cap(cell.w, ts);
    if (!px_legend_box(cr, p, ts, cap, &bw, &bh, &line)) return 0;
    double in = PX_LEGEND_INSET * ts, bx, by;
    switch (p->legend) {
    case PX_LEGEND_TOP_LEFT: bx = r.x + in, by = r.y + in; break;
    case PX_LEGEND_BOTTOM_LEFT: bx = r.x + in, by = r.y + r.h - bh - in; break;
    case PX_LEGEND_BOTTOM_RIGHT: bx = r.x + r.w - bw - in, by = r.y + r.h - bh - in; break;
    case PX_LEGEND_OUTSIDE: bx = r.x + r.w + in, by = r.y; break;
    default: bx = r.x + r.w - bw - in, by = r.y + in; break;
    }
    *out = (px_rect){bx, by, bw, bh};
    return 1;
}


px_rect px_cell_rect(const px_figure *f, int panel, int alone)
{
    double fw = f->width, fh = px_page_height(f) - px_foot_height(f);
    if (alone) return (px_rect){0, 0, fw, fh};
    double cw = fw / f->cols, ch = fh / f->rows;
    return (px_rect){(panel % f->cols) * cw, (panel / f->cols) * ch, cw, ch};
}


int px_figure_plot_rect(const px_figure *f, int panel, double dpi, double *x, double *y, double *w,
                        double *h)
{
    if (!f || panel < 0 || panel >= f->rows * f->cols || !(dpi > 0)) return PX_EINVAL;
    cairo_t *m = px_text_scratch();
    px_rect r = px_plot_rect(f, m, panel, 0);
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
