/* px_plane.h - plain plane geometry that the map tests check the library's
 * maps against, written apart from src/geom so the two can check each other.
 *   px_plane_seg_dist(px, py, ax, ay, bx, by)
 *       Euclidean distance from the point (px, py) to the segment from
 *       (ax, ay) to (bx, by) (a degenerate segment is its point). */
#ifndef PX_TEST_PLANE_H
#define PX_TEST_PLANE_H
#include <math.h>

static inline double px_plane_seg_dist(double px, double py, double ax, double ay, double bx,
                                       double by)
{
    double ex = bx - ax, ey = by - ay, L2 = ex * ex + ey * ey;
    double t = L2 > 0 ? ((px - ax) * ex + (py - ay) * ey) / L2 : 0;
    t = t < 0 ? 0 : (t > 1 ? 1 : t);
    return hypot(ax + t * ex - px, ay + t * ey - py);
}

#endif
