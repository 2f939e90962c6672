/* atomic.c - temporary file + rename (see atomic.h).
 *
 * On Linux the data are first written to an unnamed file (O_TMPFILE) that
 * is given its temporary name only once complete, so a process killed while
 * writing leaves nothing behind; elsewhere, or where the file system refuses
 * O_TMPFILE, a named temporary file is used.
 *
 * The temporary file is created with mode 0666 (O_TMPFILE, or
 * open(O_CREAT | O_EXCL)), so the
 * kernel applies the user's umask to a new file exactly as for any other
 * program; when the target exists, the temporary file takes the target's
 * permission bits before the rename, so a 0600 file stays 0600.  A symbolic
 * link or a file the user cannot write is refused unless PX_WRITE_REPLACE is
 * given (then the link itself, not its target, is replaced).  Temporary
 * names carry the writer's process id, and a write first removes the
 * temporaries of the same target left by processes that no longer exist
 * (killed inside the write window). */
#define _GNU_SOURCE /* O_TMPFILE, linkat's AT_SYMLINK_FOLLOW */
#include "core/alloc.h"
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
    *dir = px_alloc(NULL, n + 1);
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
            char *full = px_alloc(NULL, n);
            if (!full) break;
            snprintf(full, n, "%s/%s", dir, name);
            struct stat st;
            if (lstat(full, &st) == 0 && S_ISREG(st.st_mode) && unlink(full) == 0) removed++;
            px_free(NULL, full);
        }
        closedir(d);
    }
    px_free(NULL, dir);
    return removed;
}

#define PX_TMP_NUM_LEN 48            /* room for "<pid>-<n>" */

/* <path>.phlox-tmp-<pid>-<k> */
static void tmp_name(char *buf, size_t size, const char *path, int k)
{
    snprintf(buf, size, "%s%s%ld-%d", path, PX_TMP_TAG, (long)getpid(), k);
}

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
#define PX_PROC_FD_LEN 64

/* The O_TMPFILE path (the umask applies to its 0666; MODE >= 0 is the
 * existing target's, kept): returns 0, an errno, or -1 when O_TMPFILE is
 * not available here (the caller falls back to a named file). */
static int write_unnamed(const char *path, const void *data, size_t n, int mode)
{
    char *dir;
    const char *base;
    if (split_path(path, &dir, &base) != PX_OK) return ENOMEM;
    int fd = open(dir, O_TMPFILE | O_WRONLY | O_CLOEXEC, PX_NEW_FILE_MODE);
    px_free(NULL, dir);
    if (fd < 0) return (errno == EISDIR || errno == EOPNOTSUPP || errno == EINVAL) ? -1 : errno;
    int err = 0;
    if (mode >= 0 && fchmod(fd, (mode_t)mode) != 0) err = errno;
    if (!err) err = write_all(fd, data, n);
    if (!err && fsync(fd) != 0) err = errno;
    if (!err) {
        char proc[PX_PROC_FD_LEN];
        snprintf(proc, sizeof proc, "/proc/self/fd/%d", fd);
        size_t cap = strlen(path) + sizeof PX_TMP_TAG + PX_TMP_NUM_LEN;
        char *tmp = px_alloc(NULL, cap);
        if (!tmp) err = ENOMEM;
        for (int t = 0; !err && t < PX_TMP_TRIES; t++) {
            tmp_name(tmp, cap, path, t);
            if (linkat(AT_FDCWD, proc, AT_FDCWD, tmp, AT_SYMLINK_FOLLOW) == 0) {
                if (rename(tmp, path) != 0) {
                    err = errno;
                    unlink(tmp);
                }
                break;
            }
            if (errno != EEXIST) err = errno == ENOENT ? -1 : errno; /* no /proc: fall back */
            else if (t == PX_TMP_TRIES - 1) err = EEXIST;
        }
        px_free(NULL, tmp);
    }
    close(fd);
    return err;
}
#endif

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
    int keep_mode = exists && S_ISREG(old.st_mode);
#ifdef O_TMPFILE
    int u = write_unnamed(path, data, n, keep_mode ? (int)(old.st_mode & 07777) : -1);
    if (u >= 0) {
        if (errno_out) *errno_out = u;
        return u ? PX_EIO : PX_OK;
    }
#endif
    size_t len = strlen(path);
    size_t cap = len + sizeof PX_TMP_TAG + PX_TMP_NUM_LEN;
    char *tmp = px_alloc(NULL, cap);
    if (!tmp) {
        if (errno_out) *errno_out = ENOMEM;
        return PX_ENOMEM;
    }
    int fd = -1;
    for (int k = 0; k < PX_TMP_TRIES && fd < 0; k++) {
        tmp_name(tmp, cap, path, k);
        fd = open(tmp, O_WRONLY | O_CREAT | O_EXCL | O_NOFOLLOW | O_CLOEXEC, PX_NEW_FILE_MODE);
        if (fd < 0 && errno != EEXIST) break;
    }
    if (fd < 0) {
        err = errno;
        px_free(NULL, tmp);
        if (errno_out) *errno_out = err;
        return PX_EIO;
    }
    /* an existing regular file keeps its permission bits */
    if (keep_mode && fchmod(fd, old.st_mode & 07777) != 0) err = errno;
    if (!err) err = write_all(fd, data, n);
    if (!err && fsync(fd) != 0) err = errno;
    if (close(fd) != 0 && !err) err = errno;
    if (!err && rename(tmp, path) != 0) err = errno;
    if (err) unlink(tmp);
    px_free(NULL, tmp);
    if (errno_out) *errno_out = err;
    return err ? PX_EIO : PX_OK;
}

int px_write_atomic(const char *path, const void *data, size_t n, int *errno_out)
{
    return px_write_atomic_ex(path, data, n, 0, errno_out, NULL, 0);
}
