/* alloc.c - default allocator and the px_alloc family (see alloc.h). */
#include "alloc.h"
#include <stdint.h>
#include <stdlib.h>
#include <string.h>

void *px_alloc(const px_allocator *a, size_t size)
{
    if (size == 0) size = 1;
    return a ? a->alloc(a->ud, size) : malloc(size);
}

void *px_calloc(const px_allocator *a, size_t n, size_t size)
{
    if (size != 0 && n > SIZE_MAX / size) return NULL;
    size_t total = n * size;
    void *p = px_alloc(a, total);
    if (p && total > 0) memset(p, 0, total);
    return p;
}

void px_free(const px_allocator *a, void *ptr)
{
    if (!ptr) return;
    if (a) a->release(a->ud, ptr);
    else free(ptr);
}
