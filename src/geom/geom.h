/* geom.h - plane polygon geometry, the one copy for the whole program: the
 * maps (src/diagram: areas of outlines, holes inside outlines), the figures
 * (src/render: label boxes inside fields, leader anchors) and the Lua layer
 * (phlox.locate, phlox.where, grid-map fields, colour neighbours) all call
 * these functions.  Below diagram and render, above core only: no
 * chemistry, no printing, no globals; allocation (the pole's cell heap,
 * the span's crossings) through the injectable allocator (NULL: malloc).
 *
 * A polygon is n vertices x[i], y[i], closed implicitly (the edge from
 * vertex n-1 back to vertex 0).  Simple polygons are assumed; points
 * exactly on an edge may count as inside or outside.
 *
 *   px_geom_polygon_area      signed area by the shoelace formula (Gauss's
 *                             area formula), > 0 for counter-clockwise
 *   px_geom_polygon_centroid  area centroid (same formula, first moments)
 *   px_geom_polygon_contains  even-odd crossing rule (Shimrat 1962,
 *                             Comm. ACM 5, 434, Algorithm 112)
 *   px_geom_segment_distance  distance from a point to a segment
 *   px_geom_polygon_distance  signed distance to the outline, > 0 inside
 *   px_geom_polygon_pole      pole of inaccessibility: the inside point
 *                             farthest from the outline
 *   px_geom_polygon_span      the piece of a vertical line inside the
 *                             polygon that holds a given point
 *
 * Every function is deterministic: the same input gives the same bits (the
 * sums run in a fixed order), so figures and tables built on them repeat
 * byte for byte. */
#ifndef PX_GEOM_H
#define PX_GEOM_H
#include <stddef.h>
#include "core/alloc.h"

/* Signed area: 0 for NULL arrays or n < 3. */
double px_geom_polygon_area(const double *x, const double *y, size_t n);

/* Area centroid into *cx, *cy.  PX_EINVAL for NULL arrays, n < 3 or zero
 * area (nothing written).  For a polygon that is not convex the centroid
 * may lie outside it. */
int px_geom_polygon_centroid(const double *x, const double *y, size_t n, double *cx,
                             double *cy);

/* 1 if (px, py) is inside (even-odd rule), else 0 (also for NULL, n < 3). */
int px_geom_polygon_contains(const double *x, const double *y, size_t n, double px,
                             double py);

/* Distance from (px, py) to the segment from (ax, ay) to (bx, by). */
double px_geom_segment_distance(double px, double py, double ax, double ay, double bx,
                                double by);

/* Signed distance from (px, py) to the outline: > 0 inside; NaN for NULL
 * arrays or n < 2. */
double px_geom_polygon_distance(const double *x, const double *y, size_t n, double px,
                                double py);

/* Pole of inaccessibility: an inside point whose distance to the outline is
 * within `precision` of the largest, by refining square cells kept in a
 * max-heap on the best distance a cell could still hold (concept:
 * Garcia-Castellanos and Lombardo 2007, Scottish Geographical Journal 123,
 * 227; from memory): a cell of half-size h centred at c holds no point
 * farther than d(c) + h sqrt(2) from the outline (triangle inequality).
 * The search starts from the area centroid.  *dist (may be NULL) receives
 * the point's distance.
 *   PX_OK       the point;
 *   PX_OK       also for a polygon of no width or no height (a sliver
 *               clipped to a frame edge): its box centre, distance 0;
 *   PX_ELIMIT   the heap reached PX_GEOM_POLE_MAX_CELLS and refinement
 *               stopped (a ridge of equally good points, e.g. a long
 *               rectangle, with a tiny precision): the best point found
 *               is still set;
 *   PX_EINVAL   NULL arrays or outputs, n < 3, a coordinate not finite,
 *               precision not finite and > 0, zero area (nothing written);
 *   PX_ENOMEM   the cell heap could not grow (nothing written). */
#define PX_GEOM_POLE_MAX_CELLS 20000 /* our bound on the work for one pole (no source) */
int px_geom_polygon_pole(const double *x, const double *y, size_t n, double precision,
                         const px_allocator *alloc, double *px, double *py, double *dist);

/* The interval [*lo, *hi] of the vertical line through px that lies inside
 * the polygon and holds py: the edges' crossings with the line (an edge
 * crosses when exactly one of its ends has x <= px), sorted and paired
 * bottom-up, so a polygon that is not convex gives the right piece.
 * PX_ENOTFOUND when no pair holds py (nothing written); PX_EINVAL for NULL
 * arguments or n < 3; PX_ENOMEM. */
int px_geom_polygon_span(const double *x, const double *y, size_t n, double px, double py,
                         const px_allocator *alloc, double *lo, double *hi);

#endif
