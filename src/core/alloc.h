/* alloc.h - an injectable allocator for the C core.
 *
 * Objects that allocate take a const px_allocator * (NULL means the C
 * library's malloc/free), so tests can make the Nth allocation fail and check
 * that nothing leaks and the status is PX_ENOMEM. */
#ifndef PX_ALLOC_H
#define PX_ALLOC_H
#include <stddef.h>

typedef struct px_allocator {
    void *(*alloc)(void *ud, size_t size);
    void (*release)(void *ud, void *ptr);
    void *ud;
} px_allocator;

void *px_alloc(const px_allocator *a, size_t size);
void *px_calloc(const px_allocator *a, size_t n, size_t size);
void px_free(const px_allocator *a, void *ptr);

#endif
