/* draw.c - cairo drawing of a figure page in the layout of layout.c and
 * labels.c: fills, hatching, outlines and lines clipped to the plot, the
 * recorded labels over a light halo, leaders, legends, frame, ticks,
 * titles and the stamp; px_figure_layout() runs the same drawing on a
 * scratch context and hands back the recorded boxes.  With text.c, the only
 * file that calls cairo drawing functions.  Output surfaces are backend.c's.
 * Contract in layout.h (px_draw_page) and render.h (px_figure_layout). */
#include "core/alloc.h"
#include "core/status.h"
#include "render/layout.h"
#include "render/text.h"
#include <math.h>
#include <stdlib.h>
#include <string.h>

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

static void path_of(cairo_t *cr, const px_panel *p, px_rect r, const px_item *it, int close)
{
    cairo_new_path(cr);
    for (size_t i = 0; i < it->n; i++) {
        double x = px_map_x(p, r, it->x[i]), y = px_map_y(p, r, it->y[i]);
        if (i == 0) cairo_move_to(cr, x, y);
        else cairo_line_to(cr, x, y);
    }
    if (close) cairo_close_path(cr);
}

/* Parallel lines over the box, `spacing` apart at `angle` degrees, anchored
 * at the page origin so neighbouring hatched areas line up; the caller has
 * set the clip. */
static void hatch_box(cairo_t *cr, px_rect b, double spacing, double angle)
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

static void draw_axes(cairo_t *cr, const px_figure *f, int panel, px_rect r, px_rect cell, px_lrec *rec)
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
    double th = px_text_h(cr, tsz), ah = px_text_h(cr, asz);
    px_rect xb[2];
    int nx_boxes = 0;
    size_t n = px_axis_ticks(cr, p, ts, 0, r.w, t, &wmax);
    double step = n > 1 ? t[1] - t[0] : 1;
    for (size_t i = 0; i < n; i++) {
        double x = px_map_x(p, r, t[i]);
        cairo_move_to(cr, x, r.y + r.h);
        cairo_line_to(cr, x, r.y + r.h - PX_TICK_LEN * ts);
        cairo_stroke(cr);
        px_tick_text(buf, sizeof buf, t[i], p->xlog ? 0 : step, p->xlog);
        double w = px_text_w(cr, buf, 0, tsz);
        px_text_draw(cr, buf, 0, tsz, x - w / 2, r.y + r.h + gap + th * PX_ASCENT);
        px_lrec_rect(rec, PX_LABEL_TICK, panel, buf, tsz, x - w / 2, r.y + r.h + gap, w, th);
        if (nx_boxes < 2 && (i == 0 || i + 1 == n)) xb[nx_boxes++] = (px_rect){x - w / 2, r.y + r.h + gap, w, th};
    }
    n = px_axis_ticks(cr, p, ts, 1, r.h, t, &wmax);
    step = n > 1 ? t[1] - t[0] : 1;
    for (size_t i = 0; i < n; i++) {
        double y = px_map_y(p, r, t[i]);
        cairo_move_to(cr, r.x, y);
        cairo_line_to(cr, r.x + PX_TICK_LEN * ts, y);
        cairo_stroke(cr);
        px_tick_text(buf, sizeof buf, t[i], p->ylog ? 0 : step, p->ylog);
        double w = px_text_w(cr, buf, 0, tsz);
        /* at the corner the first x tick label may reach under the lowest
         * y tick label: that one is left out (the tick stays) */
        int clash = 0;
        for (int q = 0; q < nx_boxes && !clash; q++)
            clash = xb[q].x < r.x - gap && xb[q].x + xb[q].w > r.x - gap - w &&
                    xb[q].y < y + th * 0.3 - th * PX_ASCENT + th;
        if (clash) continue;
        px_text_draw(cr, buf, 0, tsz, r.x - gap - w, y + th * 0.3);
        px_lrec_rect(rec, PX_LABEL_TICK, panel, buf, tsz, r.x - gap - w, y + th * 0.3 - th * PX_ASCENT,
                 w, th);
    }
    char cut[PX_FIT_MAX];
    if (p->xlabel) {
        double avail = cell.w - 2 * pad;
        double s = px_fit_size(cr, p->xlabel, 0, asz, PX_TITLE_MIN * ts, avail);
        const char *tx = px_fit_text(cr, p->xlabel, 0, s, avail, cut);
        double w = px_text_w(cr, tx, 0, s), hh = px_text_h(cr, s);
        double x = fmin(fmax(r.x + r.w / 2 - w / 2, cell.x + pad), cell.x + cell.w - pad - w);
        double base = r.y + r.h + 2 * gap + th + ah * PX_ASCENT;
        px_text_draw(cr, tx, 0, s, x, base);
        px_lrec_rect(rec, PX_LABEL_AXIS, panel, tx, s, x, base - hh * PX_ASCENT, w, hh);
    }
    if (p->ylabel) {
        double avail = fmin(r.h + r.y - cell.y - pad, cell.h - 2 * pad);
        double s = px_fit_size(cr, p->ylabel, 0, asz, PX_TITLE_MIN * ts, avail);
        const char *tx = px_fit_text(cr, p->ylabel, 0, s, avail, cut);
        double cx = r.x - 2 * gap - wmax - ah / 2, cy = r.y + r.h / 2;
        px_text_draw_vertical(cr, tx, s, cx, cy);
        double w = px_text_w(cr, tx, 0, s), hh = px_text_h(cr, s);
        /* px_text_draw_vertical puts the baseline h/3 right of the centre */
        px_lrec_add(rec, px_box_make(PX_LABEL_AXIS, panel, -1, s, 90, cx + hh / 3 - hh * PX_ASCENT + hh / 2,
                              cy, w, hh), tx);
    }
    if (p->title) {
        double tsz2 = PX_PANEL_TITLE_SIZE * ts;
        double avail = cell.w - 2 * pad;
        double s = px_fit_size(cr, p->title, 0, tsz2, PX_TITLE_MIN * ts, avail);
        const char *tx = px_fit_text(cr, p->title, 0, s, avail, cut);
        double w = px_text_w(cr, tx, 0, s), hh = px_text_h(cr, s);
        double x = fmin(fmax(r.x + r.w / 2 - w / 2, cell.x + pad), cell.x + cell.w - pad - w);
        double base = r.y - px_title_drop(th, gap) - hh * (1 - PX_ASCENT);
        px_text_draw(cr, tx, 0, s, x, base);
        px_lrec_rect(rec, PX_LABEL_TITLE, panel, tx, s, x, base - hh * PX_ASCENT, w, hh);
    }
}


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
    px_leader_end(b, &ex, &ey);
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
    px_rect b = {x, y - 3.5 * ts, PX_LEGEND_SWATCH * ts, 7 * ts};
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
static void draw_legend(cairo_t *cr, const px_panel *p, double ts, px_rect b, px_rect cell)
{
    double bw, bh, line, cap = px_legend_cap(cell.w, ts);
    char cut[PX_FIT_MAX];
    px_legend_box(cr, p, ts, cap, &bw, &bh, &line);
    double lsz = PX_LEGEND_SIZE * ts, h = px_text_h(cr, lsz);
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
        if (!px_in_legend(it)) continue;
        double y = b.y + 3 * ts + line * ((double)k + 0.5);
        draw_swatch(cr, it, b.x + 4 * ts, y, ts);
        cairo_set_source_rgb(cr, 0, 0, 0);
        px_text_draw(cr, px_fit_text(cr, it->text, 0, lsz, cap, cut), 0, lsz,
                     b.x + (PX_LEGEND_SWATCH + 8) * ts, y + h * 0.3);
        k++;
    }
}

static void draw_panel(cairo_t *cr, const px_figure *f, int panel, px_rect r, px_rect cell, px_lrec *rec)
{
    const px_panel *p = &f->panels[panel];
    double ts = f->ts;
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
    px_lrec local = {0};
    px_lrec *lr = rec ? rec : &local;
    size_t first = lr->n; /* this panel's first in-plot box */
    px_rect lb;
    int has_legend = px_legend_rect(cr, p, ts, r, cell, &lb);
    if (has_legend) px_lrec_rect(lr, PX_LABEL_LEGEND, panel, "legend", PX_LEGEND_SIZE * ts, lb.x, lb.y, lb.w, lb.h);
    if (has_legend && p->legend == PX_LEGEND_OUTSIDE) first = lr->n; /* not an obstacle inside */
    px_labels_place(cr, f, panel, r, first, lr);
    /* drawing, in the order placed */
    for (size_t k = first; k < lr->n; k++) {
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
    if (!rec) px_lrec_free(&local);
}

static void draw_stamp(cairo_t *cr, const px_figure *f, px_lrec *rec)
{
    cairo_set_source_rgb(cr, 0.3, 0.3, 0.3);
    double ts = f->ts, y0 = px_page_height(f) - px_foot_height(f) + 3 * ts;
    for (size_t k = 0; k < f->n_stamp; k++) {
        char cut[PX_FIT_MAX];
        double avail = f->width - 2 * PX_PAD * ts;
        double s = px_fit_size(cr, f->stamp[k], 0, PX_STAMP_SIZE * ts, PX_STAMP_MIN * ts, avail);
        const char *t = px_fit_text(cr, f->stamp[k], 0, s, avail, cut);
        double base = y0 + PX_STAMP_LINE * ts * ((double)k + 1) - 2 * ts;
        px_text_draw(cr, t, 0, s, PX_PAD * ts, base);
        double hh = px_text_h(cr, s);
        /* stamp lines are set closer than their font's full height; the box
         * is the line's share, so neighbouring lines do not count as overlaps */
        double lh = fmin(hh, PX_STAMP_LINE * ts);
        px_lrec_rect(rec, PX_LABEL_STAMP, -1, t, s, PX_PAD * ts, base - lh * PX_ASCENT,
                 px_text_w(cr, t, 0, s), lh);
    }
}

void px_draw_page(cairo_t *cr, const px_figure *f, int only_panel, px_lrec *rec)
{
    cairo_set_source_rgb(cr, 1, 1, 1);
    cairo_paint(cr);
    if (only_panel >= 0)
        draw_panel(cr, f, only_panel, px_plot_rect(f, cr, only_panel, 1), px_cell_rect(f, only_panel, 1),
                   rec);
    else
        for (int i = 0; i < f->used; i++)
            draw_panel(cr, f, i, px_plot_rect(f, cr, i, 0), px_cell_rect(f, i, 0), rec);
    draw_stamp(cr, f, rec);
}

int px_figure_layout(const px_figure *f, px_label_box **out, size_t *n)
{
    if (!f || !out || !n) return PX_EINVAL;
    *out = NULL;
    *n = 0;
    cairo_t *m = px_text_scratch();
    px_lrec rec = {0};
    px_draw_page(m, f, -1, &rec);
    int ok = cairo_status(m) == CAIRO_STATUS_SUCCESS && !rec.failed;
    cairo_destroy(m);
    if (!ok) {
        px_lrec_free(&rec);
        return PX_ENOMEM;
    }
    *out = rec.b;
    *n = rec.n;
    return PX_OK;
}

void px_figure_layout_free(px_label_box *b, size_t n)
{
    for (size_t i = 0; b && i < n; i++) px_free(NULL, b[i].text);
    px_free(NULL, b);
}
