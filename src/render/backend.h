/* backend.h - private to src/render: the memory buffer the output back end
 * (backend.c) writes cairo's streams into, and the SVG rewriting passes
 * (svgpass.c) that run over it.  Each pass returns PX_OK with the buffer
 * replaced by its rewritten copy, or a failure status with the buffer as it
 * was (the caller frees it). */
#ifndef PX_RENDER_BACKEND_H
#define PX_RENDER_BACKEND_H
#include "render/figure_priv.h"
#include <cairo.h>
#include <stddef.h>

typedef struct px_membuf {
    unsigned char *data;
    size_t n, cap;
    int failed; /* a write ran out of memory */
} px_membuf;

/* cairo write callback appending to a px_membuf (closure). */
cairo_status_t px_mem_write(void *closure, const unsigned char *data, unsigned int len);
/* Replace m's bytes by out[0..n) (taken over); PX_OK. */
int px_mem_replace(px_membuf *m, unsigned char *out, size_t n);

/* surfaceN ids renumbered by first appearance (same input, same bytes). */
int px_svg_renumber(px_membuf *m);
/* Coordinates with more than PX_SVG_DECIMALS decimals rounded; reference:
 * the strtod/printf implementation. */
int px_svg_compact(px_membuf *m, int reference);
/* <title>, <desc> and <metadata> of the figure after the root's start tag. */
int px_svg_describe(px_membuf *m, const px_figure *f);

#endif
