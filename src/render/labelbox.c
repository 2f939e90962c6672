/* labelbox.c - the record of placed text boxes (px_lrec) and the tests
 * every placement uses against it: quadrilateral overlap by separating
 * axes, box inside a rectangle, segment crossing a box, a box clear of the
 * placed boxes and their leader lines.  Boxes may be rotated (line labels,
 * vertical field labels); each carries its four corners.  Contract in
 * layout.h; the box type in render.h (px_label_box). */
#include "core/alloc.h"
#include "geom/geom.h"
#include "render/layout.h"
#include "render/render.h"
#include <math.h>
#include <stdlib.h>
#include <string.h>

/* A box of w along the text direction and h across it, centred on (cx, cy),
 * at `angle` degrees counter-clockwise (page y points down). */
px_label_box px_box_make(px_label_kind kind, int panel, long item, double size, double angle,
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

px_label_box *px_lrec_add(px_lrec *r, px_label_box b, const char *text)
{
    if (!r || r->failed) return NULL;
    {
        px_label_box *d = px_grow(NULL, r->b, &r->cap, r->n + 1, sizeof *d, 64);
        if (!d) {
            r->failed = 1;
            return NULL;
        }
        r->b = d;
    }
    b.text = px_strdup(NULL, text ? text : "");
    if (!b.text) {
        r->failed = 1;
        return NULL;
    }
    r->b[r->n] = b;
    return &r->b[r->n++];
}

void px_lrec_free(px_lrec *r)
{
    for (size_t i = 0; i < r->n; i++) px_free(NULL, r->b[i].text);
    px_free(NULL, r->b);
    r->b = NULL;
    r->n = r->cap = 0;
}

/* Record an axis-aligned text box with its top left at (x, y). */
void px_lrec_rect(px_lrec *r, px_label_kind kind, int panel, const char *text, double size,
                     double x, double y, double w, double h)
{
    px_lrec_add(r, px_box_make(kind, panel, -1, size, 0, x + w / 2, y + h / 2, w, h), text);
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

int px_box_in_rect(const px_label_box *b, px_rect r)
{
    for (int k = 0; k < 4; k++)
        if (b->qx[k] < r.x || b->qx[k] > r.x + r.w || b->qy[k] < r.y || b->qy[k] > r.y + r.h)
            return 0;
    return 1;
}

int px_seg_hits_box(const px_label_box *b, double x0, double y0, double x1, double y1);

/* The end of a leader on its label's box: the nearest point of the box. */
void px_leader_end(const px_label_box *b, double *ex, double *ey)
{
    *ex = fmin(fmax(b->ax, b->qx[0]), b->qx[1]);
    *ey = fmin(fmax(b->ay, b->qy[0]), b->qy[2]);
}

/* Is the box clear of every in-plot box of the panel recorded from `first`
 * on, and of their leader lines? */
int px_box_clear(const px_lrec *r, size_t first, const px_label_box *b)
{
    for (size_t i = first; r && i < r->n; i++) {
        const px_label_box *o = &r->b[i];
        if (!o->placed) continue;
        if (quads_overlap(b->qx, b->qy, o->qx, o->qy)) return 0;
        if (o->kind == PX_LABEL_LEADER) {
            double ex, ey;
            px_leader_end(o, &ex, &ey);
            if (px_seg_hits_box(b, o->ax, o->ay, ex, ey)) return 0;
        }
    }
    return 1;
}

double px_seg_seg_cross(double ax, double ay, double bx, double by, double cx, double cy,
                            double dx, double dy)
{
    double d1 = (bx - ax) * (cy - ay) - (by - ay) * (cx - ax);
    double d2 = (bx - ax) * (dy - ay) - (by - ay) * (dx - ax);
    double d3 = (dx - cx) * (ay - cy) - (dy - cy) * (ax - cx);
    double d4 = (dx - cx) * (by - cy) - (dy - cy) * (bx - cx);
    return ((d1 > 0) != (d2 > 0)) && ((d3 > 0) != (d4 > 0));
}

/* Does the segment touch the box (cross an edge or lie inside)? */
int px_seg_hits_box(const px_label_box *b, double x0, double y0, double x1, double y1)
{
    for (int k = 0; k < 4; k++)
        if (px_seg_seg_cross(x0, y0, x1, y1, b->qx[k], b->qy[k], b->qx[(k + 1) % 4],
                          b->qy[(k + 1) % 4]))
            return 1;
    return px_geom_polygon_contains(b->qx, b->qy, 4, x0, y0);
}
