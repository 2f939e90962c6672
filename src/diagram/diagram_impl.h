/* diagram_impl.h - private helpers shared by the diagram module's files:
 * growable arrays on the injectable allocator (which has no realloc). */
#ifndef PX_DIAGRAM_IMPL_H
#define PX_DIAGRAM_IMPL_H
#include <stdint.h>
#include <string.h>
#include "core/alloc.h"

/* Make room for `need` elements of `size` bytes in *p (capacity *cap).
 * Returns 0 or -1 (out of memory; *p unchanged). */
static inline int px_dg_reserve(const px_allocator *a, void **p, size_t *cap, size_t need,
                                size_t size)
{
    if (need <= *cap) return 0;
    size_t nc = *cap ? *cap : 16;
    while (nc < need) {
        if (nc > SIZE_MAX / 2 / size) return -1;
        nc *= 2;
    }
    void *q = px_alloc(a, nc * size);
    if (!q) return -1;
    if (*p && *cap) memcpy(q, *p, *cap * size);
    px_free(a, *p);
    *p = q;
    *cap = nc;
    return 0;
}

#define PX_DG_PUSH(a, arr, n, cap, val)                                               \
    (px_dg_reserve((a), (void **)&(arr), &(cap), (n) + 1, sizeof *(arr)) ? -1         \
                                                                          : ((arr)[(n)++] = (val), 0))

#endif
