/* px_alloc_fail.h - an injectable allocator (core/alloc.h) for the C tests
 * that fails from the Nth allocation on and counts the blocks still held,
 * so a test can walk N = 0, 1, 2, ... through every failure path and check
 * the status is PX_ENOMEM and nothing leaks (ASan reports a leak too).
 *   px_alloc_fail f; px_allocator a = px_alloc_fail_make(&f, n);
 *   ... f.live == 0 after the object is freed */
#ifndef PX_TEST_ALLOC_FAIL_H
#define PX_TEST_ALLOC_FAIL_H
#include <stdlib.h>
#include "core/alloc.h"

typedef struct px_alloc_fail {
    long left; /* allocations still granted; then every one fails */
    long live; /* blocks handed out and not yet released */
} px_alloc_fail;

static inline void *px_alloc_fail_alloc(void *ud, size_t n)
{
    px_alloc_fail *f = ud;
    if (f->left-- <= 0) return NULL;
    void *p = malloc(n);
    if (p) f->live++;
    return p;
}

static inline void px_alloc_fail_release(void *ud, void *p)
{
    px_alloc_fail *f = ud;
    if (p) f->live--;
    free(p);
}

static inline px_allocator px_alloc_fail_make(px_alloc_fail *f, long granted)
{
    f->left = granted;
    f->live = 0;
    px_allocator a = {px_alloc_fail_alloc, px_alloc_fail_release, f};
    return a;
}

#endif
