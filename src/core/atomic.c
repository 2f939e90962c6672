/* atomic.c - temporary file + rename (see atomic.h).
 *
 * The temporary file is created with open(O_CREAT | O_EXCL, 0666), so the
 * kernel applies the user's umask to a new file exactly as for any other
 * program; when the target exists, the temporary file takes the target's
 * permission bits before the rename, so a 0600 file stays 0600.  A symbolic
 * link or a file the user cannot write is refused unless PX_WRITE_REPLACE is
 * given (then the link itself, not its target, is replaced).  Temporary
 * names carry the writer's process id, and a write first removes the
 * temporaries of the same target left by processes that no longer exist
 * (killed inside the write window). */
#define _POSIX_C_SOURCE 200809L
#include "core/atomic.h"
#include "core/status.h"
#include <dirent.h>
#include <errno.h>
#include <fcntl.h>
#include <signal.h>
#include <stdio.h>
#include <stdlib.h>
#include <string.h>
#include <sys/stat.h>
#include <unistd.h>

#define PX_TMP_TAG ".phlox-tmp-" /* <target>.phlox-tmp-<pid>-<n> */
#define PX_NEW_FILE_MODE 0666     /* narrowed by the umask, as for any new file */
#define PX_TMP_TRIES 100

static void set_why(char *why, size_t size, const char *fmt, const char *path)
{
    if (why && size) snprintf(why, size, fmt, path);
}

/* the folder and base name of PATH (DIR is "." when there is no slash) */
static int split_path(const char *path, char **dir, const char **base)
{
    const char *slash = strrchr(path, '/');
    size_t n = slash ? (size_t)(slash - path) : 1;
    *dir = malloc(n + 1);
    if (!*dir) return PX_ENOMEM;
    if (slash) {
        memcpy(*dir, path, n);
        if (n == 0) (*dir)[n++] = '/';
    } else {
        (*dir)[0] = '.';
    }
    (*dir)[n] = '\0';
    *base = slash ? slash + 1 : path;
    return PX_OK;
}

int px_atomic_clean_stale(const char *path)
{
    char *dir;
    const char *base;
    if (split_path(path, &dir, &base) != PX_OK) return 0;
    size_t blen = strlen(base), tlen = strlen(PX_TMP_TAG);
    int removed = 0;
    DIR *d = opendir(dir);
    if (d) {
        struct dirent *e;
        while ((e = readdir(d)) != NULL) {
            const char *name = e->d_name;
            if (strncmp(name, base, blen) != 0 || strncmp(name + blen, PX_TMP_TAG, tlen) != 0) continue;
            char *end;
            long pid = strtol(name + blen + tlen, &end, 10);
            if (end == name + blen + tlen || *end != '-' || pid <= 0) continue;
            if (kill((pid_t)pid, 0) == 0 || errno != ESRCH) continue; /* alive, or not ours to judge */
            size_t n = strlen(dir) + strlen(name) + 2;
            char *full = malloc(n);
            if (!full) break;
            snprintf(full, n, "%s/%s", dir, name);
            struct stat st;
            if (lstat(full, &st) == 0 && S_ISREG(st.st_mode) && unlink(full) == 0) removed++;
            free(full);
        }
        closedir(d);
    }
    free(dir);
    return removed;
}

int px_write_atomic_ex(const char *path, const void *data, size_t n, int flags, int *errno_out,
                       char *why, size_t whysize)
{
    int err = 0;
    if (why && whysize) why[0] = '\0';
    if (errno_out) *errno_out = 0;
    struct stat old;
    int exists = lstat(path, &old) == 0;
    if (exists && !(flags & PX_WRITE_REPLACE)) {
        if (S_ISLNK(old.st_mode)) {
            set_why(why, whysize, "%s is a symbolic link: refusing to replace it (ask to replace it, "
                                  "or write to the link's target)", path);
            return PX_EINVAL;
        }
        if (!S_ISREG(old.st_mode)) {
            set_why(why, whysize, "%s exists and is not a regular file", path);
            return PX_EINVAL;
        }
        if (access(path, W_OK) != 0) {
            set_why(why, whysize, "%s is read-only: refusing to replace it (ask to replace it)", path);
            return PX_EINVAL;
        }
    }
    px_atomic_clean_stale(path);
    size_t len = strlen(path);
    size_t cap = len + sizeof PX_TMP_TAG + 48;
    char *tmp = malloc(cap);
    if (!tmp) {
        if (errno_out) *errno_out = ENOMEM;
        return PX_ENOMEM;
    }
    int fd = -1;
    for (int k = 0; k < PX_TMP_TRIES && fd < 0; k++) {
        snprintf(tmp, cap, "%s%s%ld-%d", path, PX_TMP_TAG, (long)getpid(), k);
        fd = open(tmp, O_WRONLY | O_CREAT | O_EXCL | O_NOFOLLOW | O_CLOEXEC, PX_NEW_FILE_MODE);
        if (fd < 0 && errno != EEXIST) break;
    }
    if (fd < 0) {
        err = errno;
        free(tmp);
        if (errno_out) *errno_out = err;
        return PX_EIO;
    }
    /* an existing regular file keeps its permission bits */
    if (exists && S_ISREG(old.st_mode) && fchmod(fd, old.st_mode & 07777) != 0) err = errno;
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

int px_write_atomic(const char *path, const void *data, size_t n, int *errno_out)
{
    return px_write_atomic_ex(path, data, n, 0, errno_out, NULL, 0);
}
