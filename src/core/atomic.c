/* atomic.c - temporary file + rename (see atomic.h). */
#define _POSIX_C_SOURCE 200809L
#include "core/atomic.h"
#include "core/status.h"
#include <errno.h>
#include <stdio.h>
#include <stdlib.h>
#include <string.h>
#include <sys/stat.h>
#include <unistd.h>

#define PX_TMP_SUFFIX ".tmp-XXXXXX"
#define PX_FILE_MODE 0644 /* mkstemp makes 0600; results are meant to be shared */

int px_write_atomic(const char *path, const void *data, size_t n, int *errno_out)
{
    int err = 0;
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
    const char *p = data;
    size_t left = n;
    while (!err && left > 0) {
        ssize_t w = write(fd, p, left);
        if (w < 0) {
            if (errno == EINTR) continue;
            err = errno;
            break;
        }
        p += w;
        left -= (size_t)w;
    }
    if (!err && fsync(fd) != 0) err = errno;
    if (close(fd) != 0 && !err) err = errno;
    if (!err && rename(tmp, path) != 0) err = errno;
    if (err) unlink(tmp);
    free(tmp);
    if (errno_out) *errno_out = err;
    return err ? PX_EIO : PX_OK;
}
