/* atomic.h - write a whole file atomically: a temporary file in the same
 * folder, flushed, then renamed over the target, so a reader never sees a
 * half-written table or figure and a failed run leaves the old file. */
#ifndef PX_ATOMIC_H
#define PX_ATOMIC_H
#include <stddef.h>

/* Returns PX_OK or PX_EIO; on failure errno_out (may be NULL) gets errno. */
int px_write_atomic(const char *path, const void *data, size_t n, int *errno_out);

#endif
