/* px_alloc_fail.h - an allocator for the C tests that fails at the Nth
 * allocation and counts the blocks still held, so a test can walk every
 * allocation of a path, check the status is PX_ENOMEM and that nothing
 * leaks (ASan reports the rest).
 *   px_alloc_fail f; px_allocator a = px_alloc_fail_init(&f, nth);
 *   ... pass &a ...; f.live == 0 once everything is freed; f.countdown >= 0
 *   when no allocation failed (the path needs fewer than nth + 1). */
#ifndef PX_TEST_ALLOC_FAIL_H
#define PX_TEST_ALLOC_FAIL_H
#include "core/alloc.h"
#include <stdlib.h>

typedef struct px_alloc_fail {
    long countdown; /* the allocation that meets 0 fails */
    long live;      /* blocks allocated and not yet released */
} px_alloc_fail;

static void *px_alloc_fail_alloc(void *ud, size_t n)
{
    px_alloc_fail *f = ud;
    if (f->countdown-- == 0) return NULL;
    void *p = malloc(n);
    if (p) f->live++;
    return p;
}

static void px_alloc_fail_release(void *ud, void *p)
{
    px_alloc_fail *f = ud;
    f->live--;
    free(p);
}

static inline px_allocator px_alloc_fail_init(px_alloc_fail *f, long nth)
{
    f->countdown = nth;
    f->live = 0;
    px_allocator a = {px_alloc_fail_alloc, px_alloc_fail_release, f};
    return a;
}

#endif
