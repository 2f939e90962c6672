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

void *px_realloc(const px_allocator *a, void *ptr, size_t old, size_t size)
{
    if (size == 0) size = 1;
    if (!a) return realloc(ptr, size);
    void *p = a->alloc(a->ud, size);
    if (!p) return NULL;
    if (ptr) {
        memcpy(p, ptr, old < size ? old : size);
        a->release(a->ud, ptr);
    }
    return p;
}

void *px_grow(const px_allocator *a, void *ptr, size_t *cap, size_t need, size_t elem, size_t first)
{
    if (need <= *cap) return ptr;
    size_t nc = *cap ? *cap : (first ? first : 1);
    while (nc < need) {
        if (nc > SIZE_MAX / 2) return NULL;
        nc *= 2;
    }
    if (elem && nc > SIZE_MAX / elem) return NULL;
    void *p = px_realloc(a, ptr, *cap * elem, nc * elem);
    if (p) *cap = nc;
    return p;
}

char *px_strdup(const px_allocator *a, const char *s)
{
    size_t n = strlen(s) + 1;
    char *d = px_alloc(a, n);
    if (d) memcpy(d, s, n);
    return d;
}

void px_free(const px_allocator *a, void *ptr)
{
    if (!ptr) return;
    if (a) a->release(a->ud, ptr);
    else free(ptr);
}
