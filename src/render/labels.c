/* labels.c - placement of a panel's in-plot labels, once, into the box
 * record (px_lrec): given texts at their points; field labels inside their
 * field (sizes from large to small, horizontal before vertical, fewest
 * drawn lines crossed, most room, nearest the centroid), larger fields
 * first; labels of fields too small led out by a line to a clear spot;
 * labels along lines at the spot nearest their preferred fraction.  Each
 * keeps clear of the boxes placed before it.  Draws nothing: draw.c draws
 * the recorded boxes, px_figure_layout hands them to callers.  Contract in
 * layout.h. */
#include "core/alloc.h"
#include "core/status.h"
#include "geom/geom.h"
#include "render/layout.h"
#include "render/text.h"
#include <math.h>
#include <stdlib.h>
#include <string.h>

/* ---- field labels ---------------------------------------------------- */

/* A panel's geometry for placing labels: the plot, the usable area inside
 * the frame, and the segments of its drawn lines in points. */
typedef struct pgeom {
    const px_figure *f;
    const px_panel *p;
    int panel;
    px_rect r, inner;
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
    g->sx0 = px_alloc(NULL, (n ? n : 1) * 4 * sizeof(double));
    if (!g->sx0) return PX_ENOMEM;
    g->sy0 = g->sx0 + n, g->sx1 = g->sy0 + n, g->sy1 = g->sx1 + n;
    for (size_t i = 0; i < g->p->n_items; i++) {
        const px_item *it = &g->p->items[i];
        if (it->kind != PX_ITEM_LINE) continue;
        for (size_t k = 0; k + 1 < it->n; k++) {
            g->sx0[g->nseg] = px_map_x(g->p, g->r, it->x[k]);
            g->sy0[g->nseg] = px_map_y(g->p, g->r, it->y[k]);
            g->sx1[g->nseg] = px_map_x(g->p, g->r, it->x[k + 1]);
            g->sy1[g->nseg] = px_map_y(g->p, g->r, it->y[k + 1]);
            g->nseg++;
        }
    }
    return PX_OK;
}

static int lines_crossing(const pgeom *g, const px_label_box *b)
{
    int c = 0;
    for (size_t s = 0; s < g->nseg; s++)
        if (px_seg_hits_box(b, g->sx0[s], g->sy0[s], g->sx1[s], g->sy1[s])) c++;
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
            if (px_seg_seg_cross(x[j], y[j], x[i], y[i], b->qx[k], b->qy[k], b->qx[(k + 1) % 4],
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
                        size_t n, double gx, double gy, double px, double py, px_lrec *rec)
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
                    px_label_box b = px_box_make(PX_LABEL_FIELD, g->panel, item, s, vert ? 90 : 0,
                                              cx, cy, bw, bh);
                    double clear;
                    if (!px_box_in_rect(&b, g->inner) || !box_in_poly(x, y, n, &b, &clear) ||
                        !px_box_clear(rec, g->first, &b))
                        continue;
                    int cross = lines_crossing(g, &b);
                    double room = fmin(clear, 0.6 * h);
                    double score = cross * 1e6 - 10 * room + hypot(cx - gx, cy - gy);
                    if (score < best_score) best_score = score, best = b, found = 1, best_cross = cross;
                }
                if (!found) continue;
                if (best_cross == 0) {
                    px_lrec_add(rec, best, it->text);
                    return 1;
                }
                if (!have_fallback) fallback = best, have_fallback = 1;
            }
        }
        if (have_fallback) {
            px_lrec_add(rec, fallback, it->text);
            return 1;
        }
    }
    return 0;
}

/* Is a led-out label's box inside the frame and clear of the placed labels,
 * and does its leader from (ax, ay) run through none of them? */
static int leader_clear(const pgeom *g, const px_lrec *rec, px_label_box *b, double ax, double ay)
{
    if (!px_box_in_rect(b, g->inner) || !px_box_clear(rec, g->first, b)) return 0;
    b->ax = ax, b->ay = ay;
    double ex, ey;
    px_leader_end(b, &ex, &ey);
    for (size_t q = g->first; rec && q < rec->n; q++)
        if (rec->b[q].placed && px_seg_hits_box(&rec->b[q], ax, ay, ex, ey)) return 0;
    return 1;
}

/* A led-out label's candidate box: strict, its leader must run clear too
 * (leader_clear); else only the box must be clear of the placed labels. */
static int lead_ok(const pgeom *g, const px_lrec *rec, px_label_box *b, double ax, double ay, int strict)
{
    if (strict) return leader_clear(g, rec, b, ax, ay);
    return px_box_in_rect(b, g->inner) && px_box_clear(rec, g->first, b);
}

/* Spots around the anchor (ax, ay) at growing distances, towards the roomier
 * side first: the first acceptable box of size bw x bh, or 0. */
static int lead_rings(const pgeom *g, const px_lrec *rec, long item, double s, double bw, double bh,
                      double ax, double ay, int strict, px_label_box *best)
{
    static const double dir[][2] = {{1, 1}, {1, -1}, {1, 0}, {0, 1}, {-1, 1}, {0, -1},
                                    {-1, -1}, {-1, 0}, {2, 1}, {2, -1}, {-2, 1}, {-2, -1},
                                    {1, 2}, {1, -2}, {-1, 2}, {-1, -2}};
    double ts = g->f->ts;
    px_rect in = g->inner;
    double sx = ax < in.x + in.w / 2 ? 1 : -1, sy = ay < in.y + in.h / 2 ? 1 : -1;
    for (int d = 1; d <= PX_LEAD_RINGS; d++)
        for (size_t k = 0; k < sizeof dir / sizeof dir[0]; k++) {
            double ox = sx * dir[k][0] * PX_LEAD_STEP * ts * d, oy = sy * dir[k][1] * PX_LEAD_STEP * ts * d * 0.7;
            double cx = ax + ox + (ox > 0 ? bw / 2 : ox < 0 ? -bw / 2 : 0);
            double cy = ay + oy + (oy > 0 ? bh / 2 : oy < 0 ? -bh / 2 : 0);
            px_label_box b = px_box_make(PX_LABEL_LEADER, g->panel, item, s, 0, cx, cy, bw, bh);
            if (lead_ok(g, rec, &b, ax, ay, strict)) {
                *best = b;
                return 1;
            }
        }
    return 0;
}

/* Anywhere in the plot on a grid, nearest the anchor first: the acceptable box, or 0. */
static int lead_grid(const pgeom *g, const px_lrec *rec, long item, double s, double bw, double bh,
                     double ax, double ay, int strict, px_label_box *best)
{
    px_rect in = g->inner;
    double bestd = INFINITY;
    int have = 0;
    for (int i = 0; i <= PX_CANDIDATES * 2; i++)
        for (int j = 0; j <= PX_CANDIDATES * 2; j++) {
            double cx = in.x + bw / 2 + (in.w - bw) * i / (PX_CANDIDATES * 2.0);
            double cy = in.y + bh / 2 + (in.h - bh) * j / (PX_CANDIDATES * 2.0);
            double d = hypot(cx - ax, cy - ay);
            if (d >= bestd) continue;
            px_label_box b = px_box_make(PX_LABEL_LEADER, g->panel, item, s, 0, cx, cy, bw, bh);
            if (!lead_ok(g, rec, &b, ax, ay, strict)) continue;
            *best = b, have = 1, bestd = d;
        }
    return have;
}

/* Lead a label out of a field too small for it: spots around the anchor at
 * growing distances, towards the roomier side first; the first clear one
 * inside the frame wins, else the clear spot nearest the anchor anywhere in
 * the plot (at the leader size, then the smallest). When no leader line can
 * run clear of the placed labels (a crowded corner), the same search for a
 * box that is clear while its line crosses a label (a crossed line is
 * legible, two labels on one spot are not); else one beside the anchor. */
static void place_leader(cairo_t *cr, const pgeom *g, long item, double ax, double ay, px_lrec *rec)
{
    const px_item *it = &g->p->items[item];
    double ts = g->f->ts, s = (PX_LABEL_MIN + 1) * ts, w, h;
    px_text_measure(cr, it->text, 1, s, &w, &h);
    double bw = w + 2 * ts, bh = h;
    px_rect in = g->inner;
    px_label_box best;
    int have = lead_rings(g, rec, item, s, bw, bh, ax, ay, 1, &best);
    if (!have) have = lead_grid(g, rec, item, s, bw, bh, ax, ay, 1, &best);
    if (!have) {
        s = PX_LABEL_MIN * ts;
        px_text_measure(cr, it->text, 1, s, &w, &h);
        bw = w + 2 * ts, bh = h;
        have = lead_grid(g, rec, item, s, bw, bh, ax, ay, 1, &best) ||
               lead_rings(g, rec, item, s, bw, bh, ax, ay, 0, &best) ||
               lead_grid(g, rec, item, s, bw, bh, ax, ay, 0, &best);
    }
    if (!have) { /* nothing clear: beside the anchor, kept inside the frame */
        double sx = ax < in.x + in.w / 2 ? 1 : -1, sy = ay < in.y + in.h / 2 ? 1 : -1;
        double cx = fmin(fmax(ax + sx * (PX_LEAD_STEP * ts + bw / 2), in.x + bw / 2), in.x + in.w - bw / 2);
        double cy = fmin(fmax(ay + sy * PX_LEAD_STEP * ts, in.y + bh / 2), in.y + in.h - bh / 2);
        best = px_box_make(PX_LABEL_LEADER, g->panel, item, s, 0, cx, cy, bw, bh);
    }
    best.ax = ax;
    best.ay = ay;
    px_lrec_add(rec, best, it->text);
}

/* The anchor of a leader: the field's centroid when inside it, else its pole. */
static void field_geometry(const pgeom *g, const px_item *it, double *x, double *y, double *gx,
                           double *gy, double *px, double *py)
{
    size_t n = it->n;
    for (size_t i = 0; i < n; i++) { /* points, clipped to the plot */
        x[i] = fmin(fmax(px_map_x(g->p, g->r, it->x[i]), g->r.x), g->r.x + g->r.w);
        y[i] = fmin(fmax(px_map_y(g->p, g->r, it->y[i]), g->r.y), g->r.y + g->r.h);
    }
    double dist;
    int st = px_geom_polygon_pole(x, y, n, 0.5, NULL, px, py, &dist);
    if (st != PX_OK && st != PX_ELIMIT) *px = *py = NAN; /* ELIMIT: the best point found */
    if (isfinite(it->lx) && isfinite(it->ly)) { /* a label point given by the caller */
        *px = px_map_x(g->p, g->r, it->lx);
        *py = px_map_y(g->p, g->r, it->ly);
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

static void place_line_label(cairo_t *cr, const pgeom *g, long item, px_lrec *rec)
{
    const px_item *it = &g->p->items[item];
    size_t n = it->n;
    double *x = px_alloc(NULL, 2 * n * sizeof *x);
    if (!x) {
        if (rec) rec->failed = 1;
        return;
    }
    double *y = x + n, len = 0;
    for (size_t i = 0; i < n; i++) {
        x[i] = px_map_x(g->p, g->r, it->x[i]);
        y[i] = px_map_y(g->p, g->r, it->y[i]);
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
                px_label_box b = px_box_make(PX_LABEL_LINE, g->panel, item, s, ang, mx + nx * off,
                                          my + ny * off, bw, bh);
                if (!px_box_in_rect(&b, g->inner) || !px_box_clear(rec, g->first, &b)) continue;
                px_lrec_add(rec, b, txt);
                done = 1;
            }
        }
    }
    if (!done) { /* no clear spot: recorded as left out, not drawn */
        px_label_box b = px_box_make(PX_LABEL_LINE, g->panel, item, it->width, 0, NAN, NAN, 0, 0);
        b.placed = 0;
        px_lrec_add(rec, b, it->text);
    }
    px_free(NULL, x);
}


/* Place a panel's in-plot labels after the boxes recorded so far (the
 * legend): given texts, field labels inside their fields, led-out labels,
 * then labels along lines; each keeps clear of those before it and of the
 * boxes from `first` on.  Out of memory marks the record failed. */
void px_labels_place(cairo_t *cr, const px_figure *f, int panel, px_rect r, size_t first, px_lrec *lr)
{
    const px_panel *p = &f->panels[panel];
    double ins = (PX_HALO_WIDTH / 2 + PX_INSET) * f->ts;
    pgeom g = {f, p, panel, r, {r.x + ins, r.y + ins, r.w - 2 * ins, r.h - 2 * ins}, NULL, NULL,
               NULL, NULL, 0, first};
    for (size_t i = 0; i < p->n_items; i++) {
        const px_item *it = &p->items[i];
        if (it->kind != PX_ITEM_TEXT) continue;
        double w, h;
        px_text_measure(cr, it->text, it->chem, it->width, &w, &h);
        double x = px_map_x(p, r, it->lx), y = px_map_y(p, r, it->ly);
        x = fmin(fmax(x, g.inner.x), g.inner.x + g.inner.w - w); /* keep inside the plot */
        y = fmin(fmax(y, g.inner.y + h * PX_ASCENT), g.inner.y + g.inner.h - h * (1 - PX_ASCENT));
        px_lrec_add(lr, px_box_make(PX_LABEL_TEXT, panel, (long)i, it->width, 0, x + w / 2,
                             y - h * PX_ASCENT + h / 2, w, h), it->text);
    }
    int st = segs_init(&g);
    size_t cap = 0;
    for (size_t i = 0; i < p->n_items; i++) cap = p->items[i].n > cap ? p->items[i].n : cap;
    double *px = st == PX_OK ? px_alloc(NULL, (cap ? cap : 1) * 2 * sizeof *px) : NULL;
    char *led = px ? px_calloc(NULL, p->n_items ? p->n_items : 1, 1) : NULL;
    size_t *order = led ? px_alloc(NULL, (p->n_items ? p->n_items : 1) * sizeof *order) : NULL;
    if (order) {
        /* larger fields choose first */
        size_t no = 0;
        for (size_t i = 0; i < p->n_items; i++)
            if (p->items[i].kind == PX_ITEM_POLYGON && p->items[i].text) order[no++] = i;
        double *area = px_alloc(NULL, (no ? no : 1) * sizeof *area);
        if (area) {
            for (size_t k = 0; k < no; k++) {
                const px_item *it = &p->items[order[k]];
                for (size_t q = 0; q < it->n; q++) {
                    px[q] = px_map_x(p, r, it->x[q]);
                    px[cap + q] = px_map_y(p, r, it->y[q]);
                }
                area[k] = fabs(px_geom_polygon_area(px, px + cap, it->n));
            }
            for (size_t a = 1; a < no; a++) /* insertion sort, stable */
                for (size_t b = a; b > 0 && area[b] > area[b - 1]; b--) {
                    double t = area[b]; area[b] = area[b - 1]; area[b - 1] = t;
                    size_t o = order[b]; order[b] = order[b - 1]; order[b - 1] = o;
                }
            px_free(NULL, area);
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
    } else {
        lr->failed = 1;
    }
    px_free(NULL, order);
    px_free(NULL, led);
    px_free(NULL, px);
    px_free(NULL, g.sx0);
}
