/* atomic.c - temporary file + rename (see atomic.h).  On Linux the data
 * are first written to an unnamed file (O_TMPFILE) that is given its
 * temporary name only once complete, so a process killed while writing
 * leaves nothing behind; elsewhere, or where the file system refuses
 * O_TMPFILE, a named temporary file (mkstemp) is used. */
#define _GNU_SOURCE /* O_TMPFILE, linkat's AT_SYMLINK_FOLLOW */
#include "core/atomic.h"
#include "core/status.h"
#include <errno.h>
#include <fcntl.h>
#include <stdio.h>
#include <stdlib.h>
#include <string.h>
#include <sys/stat.h>
#include <unistd.h>

#define PX_TMP_SUFFIX ".tmp-XXXXXX"
#define PX_FILE_MODE 0644 /* mkstemp makes 0600; results are meant to be shared */

static int write_all(int fd, const void *data, size_t n)
{
    const char *p = data;
    while (n > 0) {
        ssize_t w = write(fd, p, n);
        if (w < 0) {
            if (errno == EINTR) continue;
            return errno;
        }
        p += w;
        n -= (size_t)w;
    }
    return 0;
}

#ifdef O_TMPFILE
#define PX_TMP_NAME_TRIES 100
#define PX_PROC_FD_LEN 64

/* The O_TMPFILE path: returns 0, an errno, or -1 when O_TMPFILE is not
 * available here (the caller falls back to mkstemp). */
static int write_unnamed(const char *path, const void *data, size_t n)
{
    const char *slash = strrchr(path, '/');
    size_t dlen = slash ? (size_t)(slash - path) : 1;
    char *dir = malloc(dlen + 1);
    if (!dir) return ENOMEM;
    if (slash) memcpy(dir, slash == path ? "/" : path, slash == path ? 1 : dlen);
    else dir[0] = '.';
    dir[slash == path ? 1 : dlen] = '\0';
    int fd = open(dir, O_TMPFILE | O_WRONLY, PX_FILE_MODE);
    free(dir);
    if (fd < 0) return (errno == EISDIR || errno == EOPNOTSUPP || errno == EINVAL) ? -1 : errno;
    int err = 0;
    if (fchmod(fd, PX_FILE_MODE) != 0) err = errno; /* O_TMPFILE applies the umask */
    if (!err) err = write_all(fd, data, n);
    if (!err && fsync(fd) != 0) err = errno;
    if (!err) {
        char proc[PX_PROC_FD_LEN];
        snprintf(proc, sizeof proc, "/proc/self/fd/%d", fd);
        size_t len = strlen(path);
        char *tmp = malloc(len + sizeof PX_TMP_SUFFIX);
        if (!tmp) err = ENOMEM;
        for (int t = 0; !err && t < PX_TMP_NAME_TRIES; t++) {
            snprintf(tmp, len + sizeof PX_TMP_SUFFIX, "%s.tmp-%06x", path,
                     (unsigned)((unsigned)getpid() * 2654435761u + (unsigned)t * 40503u) & 0xffffffu);
            if (linkat(AT_FDCWD, proc, AT_FDCWD, tmp, AT_SYMLINK_FOLLOW) == 0) {
                if (rename(tmp, path) != 0) {
                    err = errno;
                    unlink(tmp);
                }
                break;
            }
            if (errno != EEXIST) err = errno == ENOENT ? -1 : errno; /* no /proc: fall back */
            else if (t == PX_TMP_NAME_TRIES - 1) err = EEXIST;
        }
        free(tmp);
    }
    close(fd);
    return err;
}
#endif

int px_write_atomic(const char *path, const void *data, size_t n, int *errno_out)
{
    int err = 0;
#ifdef O_TMPFILE
    err = write_unnamed(path, data, n);
    if (err >= 0) {
        if (errno_out) *errno_out = err;
        return err ? PX_EIO : PX_OK;
    }
    err = 0;
#endif
    size_t len = strlen(path);
    char *tmp = malloc(len + sizeof PX_TMP_SUFFIX);
    if (!tmp) {
        if (errno_out) *errno_out = ENOMEM;
        return PX_ENOMEM;
    }
    memcpy(tmp, path, len);
    memcpy(tmp + len, PX_TMP_SUFFIX, sizeof PX_TMP_SUFFIX);
    int fd = mkstemp(tmp);
    if (fd < 0) {
        err = errno;
        free(tmp);
        if (errno_out) *errno_out = err;
        return PX_EIO;
    }
    if (fchmod(fd, PX_FILE_MODE) != 0) err = errno;
    if (!err) err = write_all(fd, data, n);
    if (!err && fsync(fd) != 0) err = errno;
    if (close(fd) != 0 && !err) err = errno;
    if (!err && rename(tmp, path) != 0) err = errno;
    if (err) unlink(tmp);
    free(tmp);
    if (errno_out) *errno_out = err;
    return err ? PX_EIO : PX_OK;
}
