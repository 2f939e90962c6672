/* atomic.h - write a whole file atomically: a temporary file in the same
 * folder, flushed, then renamed over the target, so a reader never sees a
 * half-written table or figure and a failed run leaves the old file. */
#ifndef PX_ATOMIC_H
#define PX_ATOMIC_H
#include <stddef.h>

#define PX_WRITE_REPLACE 1 /* replace a symbolic link or a read-only file */

/* Writes DATA to PATH.  A new file gets 0666 less the umask; an existing one
 * keeps its permission bits.  Without PX_WRITE_REPLACE a symbolic link, a
 * non-regular file or a read-only file at PATH is refused (PX_EINVAL, WHY
 * says which).  Temporary files of the same target left by dead processes
 * are removed first.  Returns PX_OK, PX_EINVAL, PX_ENOMEM or PX_EIO (errno
 * in *errno_out, which may be NULL). */
int px_write_atomic_ex(const char *path, const void *data, size_t n, int flags, int *errno_out,
                       char *why, size_t whysize);
/* The same with flags 0 and no WHY. */
int px_write_atomic(const char *path, const void *data, size_t n, int *errno_out);
/* Removes PATH's temporaries left by processes that no longer exist;
 * returns how many. */
int px_atomic_clean_stale(const char *path);

#endif
