/* alloc.h - the injectable allocator of phlox's C code: every allocation
 * of src/ (but for the Lua states' own allocators and memory the C library
 * hands out, such as readdir's) goes through these functions.
 *
 * Objects that allocate take a const px_allocator * (NULL means the C
 * library's malloc/free), so tests can make the Nth allocation fail and check
 * that nothing leaks and the status is PX_ENOMEM.  Code without an object
 * to carry an allocator passes NULL.  Memory from px_alloc(a, ...) is freed
 * with px_free(a, ...); with a == NULL it is the C library's. */
#ifndef PX_ALLOC_H
#define PX_ALLOC_H
#include <stddef.h>

typedef struct px_allocator {
    void *(*alloc)(void *ud, size_t size);
    void (*release)(void *ud, void *ptr);
    void *ud;
} px_allocator;

void *px_alloc(const px_allocator *a, size_t size);
/* n * size bytes, zeroed; NULL when the product overflows. */
void *px_calloc(const px_allocator *a, size_t n, size_t size);
/* Resize ptr (of `old` bytes, NULL for none) to `size` bytes, keeping the
 * first min(old, size); NULL on failure, ptr then untouched. */
void *px_realloc(const px_allocator *a, void *ptr, size_t old, size_t size);
/* Room for `need` elements of `elem` bytes in the array ptr holding *cap:
 * ptr itself if *cap >= need, else the array moved to double the capacity
 * (at least `first`, at least need) with *cap updated; NULL on failure or
 * overflow, ptr and *cap then untouched (amortised doubling: the usual
 * growth rule of dynamic arrays, common practice, no source). */
void *px_grow(const px_allocator *a, void *ptr, size_t *cap, size_t need, size_t elem, size_t first);
/* A copy of the string s. */
char *px_strdup(const px_allocator *a, const char *s);
void px_free(const px_allocator *a, void *ptr);

#endif
