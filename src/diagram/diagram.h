/* diagram.h - predominance maps, independent of chemistry.
 *
 * The caller reduces each candidate species j of a primary element to an
 * affine function of the two axes,
 *     Phi_j(x, y) = c_j + p_j x + q_j y        [J/mol per atom of the element]
 * (DESIGN.md "Predominance maps: the exact method"); the species with the
 * lowest Phi predominates.  This module offers:
 *   - exact maps: each field is the convex polygon {Phi_j <= Phi_k for all k}
 *     clipped to the window (or to a ligand field, nested mode);
 *   - rigorous grid maps: a caller's labelling callback on an nx x ny grid,
 *     boundaries traced between grid points and refined by bisection;
 *   - union of fields into outlines and corrosion domains (the plane
 *     geometry itself, areas and point in polygon, is src/geom/geom.h);
 *   - water stability lines, neutral pH and reference-electrode offsets.
 * All functions are reentrant; results depend only on the inputs (same
 * inputs, same bits).  Status codes from core/status.h. */
#ifndef PX_DIAGRAM_H
#define PX_DIAGRAM_H
#include <stddef.h>
#include "core/alloc.h"

/* ---------------------------------------------------------------- inputs */

typedef struct px_diagram_window {
    double xmin, xmax, ymin, ymax; /* finite, xmin < xmax, ymin < ymax */
} px_diagram_window;

typedef struct px_diagram_species {
    double c, p, q;    /* Phi = c + p x + q y, J/mol per atom of the element */
    int id;            /* caller's species id (two fields with one id are one species) */
    const char *label; /* borrowed, may be NULL; copied as a pointer only */
} px_diagram_species;

typedef struct px_diagram_options {
    /* Two species tie where |Phi_j - Phi_k| <= epsabs + epsrel * S, with S
     * the largest |c| + |p| max|x| + |q| max|y| of the species (the size of
     * the rounding in Phi).  Defaults: epsabs = 0 J/mol, epsrel = 1e-12. */
    double epsabs, epsrel;
    /* Geometric tolerance relative to the window diagonal: vertices closer
     * than geom_rel * diagonal are one vertex; a field whose area is below
     * geom_rel * diagonal * perimeter (a sliver or a line) is dropped.
     * Default 1e-9. */
    double geom_rel;
    const px_allocator *alloc; /* NULL: malloc/free */
} px_diagram_options;

px_diagram_options px_diagram_options_default(void);

/* Nested mode: one convex ligand field with its own candidate functions. */
typedef struct px_diagram_region {
    const double *x, *y; /* polygon vertices, n >= 3, convex, either orientation */
    size_t n;
    const px_diagram_species *sp; /* candidate species inside this region */
    size_t m;
    int id; /* caller's id of the ligand field */
} px_diagram_region;

/* --------------------------------------------------------------- outputs */

typedef struct px_diagram_field {
    int region;        /* index of the region (0 for a plain map) */
    int species;       /* index into that region's species array */
    int id;            /* the species' id */
    const char *label; /* the species' label pointer */
    int group;         /* fields of one id sharing an edge share a group:
                          the lowest field index of the set */
    size_t first, n;   /* its vertex indices: ring[first .. first+n-1], CCW */
    double area;
} px_diagram_field;

typedef struct px_diagram_boundary {
    int field_a, field_b; /* field indices, field_a < field_b */
    int id_a, id_b;       /* their species ids (always different) */
    double x0, y0, x1, y1;/* the segment */
    int vertical;         /* 1: the line is x = a (b = 0) */
    double a, b;          /* the line y = a + b x */
} px_diagram_boundary;

enum px_diagram_absence {
    PX_DIAGRAM_DOMINATED = 1, /* another species is lower everywhere */
    PX_DIAGRAM_DUPLICATE = 2, /* same Phi as an earlier species (within tolerance) */
    PX_DIAGRAM_DEGENERATE = 3 /* lowest only on a line or a point */
};

typedef struct px_diagram_absent {
    int region, species, id, reason; /* reason: enum px_diagram_absence */
} px_diagram_absent;

typedef struct px_diagram_map {
    size_t nvert;
    double *vx, *vy;            /* shared vertices (welded) */
    size_t nring;
    size_t *ring;               /* vertex indices of all fields, CCW */
    int *ring_src;              /* internal: origin of edge ring[i] -> ring[i+1] */
    size_t nfield;
    px_diagram_field *field;
    size_t nboundary;
    px_diagram_boundary *boundary;
    size_t nabsent;
    px_diagram_absent *absent;
    /* statistics */
    size_t nclip;      /* half-plane clips performed */
    size_t nunmatched; /* interior edges without a partner (0 for a clean tiling) */
    double window_area;/* area of the window (or of the regions' union) */
    double geom_eps;   /* the geometric tolerance used (geom_rel * diagonal) */
    const px_allocator *alloc;
} px_diagram_map;

/* Exact map of m species on a rectangular window.  PX_EINVAL for m == 0,
 * a bad window or any non-finite c, p, q; PX_ERANGE when Phi on the window
 * is so large (> DBL_MAX / 8) that differences would overflow; PX_ENOMEM. */
int px_diagram_map_exact(const px_diagram_window *w, const px_diagram_species *sp,
                         size_t m, const px_diagram_options *opt,
                         px_diagram_map **out);

/* Nested map: map each region with its species and join the pieces.  Pieces
 * stay separate fields (one per region and species); pieces with the same
 * species id that share an edge get one group number and no boundary
 * between them.  PX_EINVAL for a non-convex or degenerate region. */
int px_diagram_map_nested(const px_diagram_region *r, size_t nr,
                          const px_diagram_options *opt, px_diagram_map **out);

void px_diagram_map_free(px_diagram_map *map); /* NULL ok */

/* Index of the field containing (x, y) (the first in index order on a
 * shared edge), or -1 outside every field. */
int px_diagram_map_locate(const px_diagram_map *map, double x, double y);

/* Index of the species with the lowest Phi at (x, y); ties go to the lower
 * index.  m must be > 0. */
size_t px_diagram_species_argmin(const px_diagram_species *sp, size_t m,
                                 double x, double y);

/* ------------------------------------------------- outlines and domains */

typedef struct px_diagram_loop {
    int cls;          /* the class the loop bounds */
    size_t first, n;  /* vertices x[first..], y[first..] */
    double area;      /* signed: > 0 outer boundary (CCW), < 0 hole (CW) */
} px_diagram_loop;

typedef struct px_diagram_outlines {
    size_t nloop;
    px_diagram_loop *loop;
    size_t nvert;
    double *x, *y;
    const px_allocator *alloc;
} px_diagram_outlines;

/* Union of the fields of each class (field_class[f] >= 0; < 0 leaves a field
 * out) into outline loops.  Needs a clean tiling (map->nunmatched == 0),
 * else PX_EDATA. */
int px_diagram_map_union(const px_diagram_map *map, const int *field_class,
                         px_diagram_outlines **out);

enum px_diagram_kind { PX_DIAGRAM_METAL = 0, PX_DIAGRAM_SOLID = 1, PX_DIAGRAM_DISSOLVED = 2,
                       PX_DIAGRAM_SULFIDE = 3 };
enum px_diagram_domain { PX_DIAGRAM_IMMUNITY = 0, PX_DIAGRAM_PASSIVATION = 1,
                         PX_DIAGRAM_CORROSION = 2, PX_DIAGRAM_SULFIDE_FILM = 3 };

/* Corrosion domains: kind[f] (enum px_diagram_kind) for every field f;
 * metal -> immunity, solid -> passivation, dissolved -> corrosion, sulfide
 * -> sulfide film.  Loops' cls is enum px_diagram_domain. */
int px_diagram_corrosion_domains(const px_diagram_map *map, const int *kind,
                                 px_diagram_outlines **out);

void px_diagram_outlines_free(px_diagram_outlines *o); /* NULL ok */

/* ------------------------------------------------------- rigorous grids */

/* Labelling callback: set *id and return >= 0, or return a negative status
 * to abort the map (px_diagram_grid_map returns that status). */
typedef int (*px_diagram_label_fn)(double x, double y, void *user, int *id);

typedef struct px_diagram_grid_options {
    size_t nx, ny;    /* grid nodes along x and y, >= 2 each (default 101) */
    /* bisection stops when the bracket is <= max(epsabs, epsrel * step) in
     * the axis's units (defaults 0 and 1e-6), or after max_iter halvings
     * (default 60) */
    double epsabs, epsrel;
    int max_iter;
    const px_allocator *alloc;
} px_diagram_grid_options;

px_diagram_grid_options px_diagram_grid_options_default(void);

typedef struct px_diagram_polyline {
    int id_a, id_b;  /* id_a < id_b; id_a lies to the left of the direction */
    size_t first, n; /* points px[first..], py[first..] */
} px_diagram_polyline;

typedef struct px_diagram_grid_field {
    int id;
    size_t count;      /* grid nodes with this id */
    double area;       /* trapezoid-weighted node area (sums to the window) */
    double cx, cy;     /* centroid of those weights */
    double xmin, xmax, ymin, ymax; /* bounding box of its nodes */
    double label_x, label_y; /* node farthest from any other id (label spot) */
} px_diagram_grid_field;

typedef struct px_diagram_grid {
    size_t nx, ny;
    px_diagram_window window;
    int *label;        /* label[j * nx + i] at (x_i, y_j) */
    size_t npoly;
    px_diagram_polyline *poly;
    size_t npt;
    double *px, *py;
    unsigned char *pfail; /* per point: 1 if placed next to a negative label
                             (a node or bisection point the callback could not
                             label: a solver failure) */
    size_t nfield;     /* sorted by id */
    px_diagram_grid_field *field;
    /* statistics */
    size_t ncalls;     /* callback calls */
    size_t ncross;     /* refined edge crossings */
    size_t nthird;     /* bisections that met a third id (a field thinner than a step) */
    size_t nmaxiter;   /* bisections stopped by max_iter */
    size_t nfailcross; /* crossings placed next to a negative label */
    const px_allocator *alloc;
} px_diagram_grid;

int px_diagram_grid_map(const px_diagram_window *w, px_diagram_label_fn fn, void *user,
                        const px_diagram_grid_options *opt, px_diagram_grid **out);
void px_diagram_grid_free(px_diagram_grid *g); /* NULL ok */

#endif
