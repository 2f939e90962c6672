/* proc.c - worker processes, durable appends, folder listing, clocks (see proc.h). */
#define _POSIX_C_SOURCE 200809L
#define _DEFAULT_SOURCE /* DT_* and d_type where present; harmless elsewhere */
#include "core/alloc.h"
#include "core/proc.h"
#include "core/status.h"
#include <dirent.h>
#include <errno.h>
#include <fcntl.h>
#include <poll.h>
#include <signal.h>
#include <stdio.h>
#include <stdlib.h>
#include <string.h>
#include <sys/stat.h>
#include <sys/wait.h>
#include <time.h>
#include <unistd.h>
#ifdef __linux__
#include <sys/prctl.h>
#endif

#define PX_FILE_MODE 0644
#define PX_WORKER_ORPHANED 1

static int fail_errno(int *errno_out, int e, int status)
{
    if (errno_out) *errno_out = e;
    return status;
}

static int set_cloexec(int fd, int on)
{
    int flags = fcntl(fd, F_GETFD);
    if (flags < 0) return -1;
    flags = on ? (flags | FD_CLOEXEC) : (flags & ~FD_CLOEXEC);
    return fcntl(fd, F_SETFD, flags);
}

int px_proc_fork(pid_t *pid, int *to_fd, int *from_fd, int *errno_out)
{
    int down[2], up[2]; /* parent -> worker, worker -> parent */
    if (pipe(down) != 0) return fail_errno(errno_out, errno, PX_EIO);
    if (pipe(up) != 0) {
        int e = errno;
        close(down[0]);
        close(down[1]);
        return fail_errno(errno_out, e, PX_EIO);
    }
    for (int i = 0; i < 2; i++) {
        set_cloexec(down[i], 1);
        set_cloexec(up[i], 1);
    }
    pid_t parent = getpid();
    /* A worker that dies must not kill us through SIGPIPE when we hand it
     * its next point: the write fails with EPIPE and the sweep reports it. */
    signal(SIGPIPE, SIG_IGN);
    fflush(NULL);
    pid_t p = fork();
    if (p < 0) {
        int e = errno;
        close(down[0]);
        close(down[1]);
        close(up[0]);
        close(up[1]);
        return fail_errno(errno_out, e, PX_EIO);
    }
    if (p == 0) {
#ifdef __linux__
        prctl(PR_SET_PDEATHSIG, SIGKILL);
#endif
        if (getppid() != parent) _exit(PX_WORKER_ORPHANED); /* parent already gone */
        signal(SIGPIPE, SIG_DFL);
        close(down[1]);
        close(up[0]);
        int devnull = open("/dev/null", O_WRONLY);
        if (devnull >= 0) {
            dup2(devnull, STDOUT_FILENO);
            close(devnull);
        }
        *pid = 0;
        *to_fd = up[1];
        *from_fd = down[0];
        return PX_OK;
    }
    close(down[0]);
    close(up[1]);
    *pid = p;
    *to_fd = down[1];
    *from_fd = up[0];
    return PX_OK;
}

void px_proc_exit(int code)
{
    fflush(NULL);
    _exit(code);
}

int px_proc_wait(pid_t pid, int *code, int *errno_out)
{
    int st;
    while (waitpid(pid, &st, 0) < 0) {
        if (errno != EINTR) return fail_errno(errno_out, errno, PX_EIO);
    }
    if (WIFEXITED(st)) *code = WEXITSTATUS(st);
    else if (WIFSIGNALED(st)) *code = 128 + WTERMSIG(st);
    else *code = -1;
    return PX_OK;
}

int px_fd_write_all(int fd, const void *data, size_t n, int *errno_out)
{
    const char *p = data;
    while (n > 0) {
        ssize_t w = write(fd, p, n);
        if (w < 0) {
            if (errno == EINTR) continue;
            return fail_errno(errno_out, errno, PX_EIO);
        }
        p += w;
        n -= (size_t)w;
    }
    return PX_OK;
}

int px_fd_poll_read(const int *fds, size_t n, char *buf, size_t cap, size_t *which,
                    size_t *got, int *errno_out)
{
    struct pollfd *pf = px_calloc(NULL, n ? n : 1, sizeof *pf);
    if (!pf) return fail_errno(errno_out, ENOMEM, PX_ENOMEM);
    for (size_t i = 0; i < n; i++) {
        pf[i].fd = fds[i];
        pf[i].events = POLLIN;
    }
    int st = PX_OK;
    for (;;) {
        int r = poll(pf, (nfds_t)n, -1);
        if (r < 0) {
            if (errno == EINTR) continue;
            st = fail_errno(errno_out, errno, PX_EIO);
            break;
        }
        size_t i = 0;
        while (i < n && !(pf[i].revents & (POLLIN | POLLHUP | POLLERR))) i++;
        if (i == n) continue;
        ssize_t k;
        do k = read(fds[i], buf, cap);
        while (k < 0 && errno == EINTR);
        if (k < 0) {
            st = fail_errno(errno_out, errno, PX_EIO);
            break;
        }
        *which = i;
        *got = (size_t)k;
        break;
    }
    px_free(NULL, pf);
    return st;
}

/* Sync the folder holding path, so a newly created entry survives a crash. */
static void sync_parent(const char *path)
{
    const char *slash = strrchr(path, '/');
    char *dir = NULL;
    if (!slash) dir = px_strdup(NULL, ".");
    else if (slash == path) dir = px_strdup(NULL, "/");
    else {
        dir = px_alloc(NULL, (size_t)(slash - path) + 1);
        if (dir) {
            memcpy(dir, path, (size_t)(slash - path));
            dir[slash - path] = '\0';
        }
    }
    if (!dir) return;
    int fd = open(dir, O_RDONLY);
    if (fd >= 0) {
        fsync(fd); /* best effort: some file systems refuse fsync on folders */
        close(fd);
    }
    px_free(NULL, dir);
}

int px_file_append_sync(const char *path, const void *data, size_t n, int *errno_out)
{
    int created = access(path, F_OK) != 0;
    int fd = open(path, O_WRONLY | O_APPEND | O_CREAT, PX_FILE_MODE);
    if (fd < 0) return fail_errno(errno_out, errno, PX_EIO);
    int st = px_fd_write_all(fd, data, n, errno_out);
    if (st == PX_OK && fsync(fd) != 0) st = fail_errno(errno_out, errno, PX_EIO);
    if (close(fd) != 0 && st == PX_OK) st = fail_errno(errno_out, errno, PX_EIO);
    if (st == PX_OK && created) sync_parent(path);
    return st;
}

int px_file_truncate(const char *path, size_t len, int *errno_out)
{
    int fd = open(path, O_WRONLY);
    if (fd < 0) return fail_errno(errno_out, errno, PX_EIO);
    int st = PX_OK;
    if (ftruncate(fd, (off_t)len) != 0 || fsync(fd) != 0) st = fail_errno(errno_out, errno, PX_EIO);
    close(fd);
    return st;
}

static int cmp_names(const void *a, const void *b)
{
    return strcmp(*(char *const *)a, *(char *const *)b);
}

void px_dir_list_free(char **names, size_t count)
{
    for (size_t i = 0; i < count; i++) px_free(NULL, names[i]);
    px_free(NULL, names);
}

int px_dir_list(const char *path, char ***names, size_t *count, int *errno_out)
{
    DIR *d = opendir(path);
    if (!d) return fail_errno(errno_out, errno, PX_EIO);
    char **list = NULL;
    size_t n = 0, cap = 0;
    struct dirent *e;
    for (;;) {
        errno = 0;
        e = readdir(d);
        if (!e) break;
        if (strcmp(e->d_name, ".") == 0 || strcmp(e->d_name, "..") == 0) continue;
        if (n == cap) {
            size_t nc = cap ? 2 * cap : 16;
            char **nl = px_realloc(NULL, list, cap * sizeof *nl, nc * sizeof *nl);
            if (!nl) goto nomem;
            list = nl;
            cap = nc;
        }
        list[n] = px_strdup(NULL, e->d_name);
        if (!list[n]) goto nomem;
        n++;
    }
    if (errno != 0) {
        int err = errno;
        closedir(d);
        px_dir_list_free(list, n);
        return fail_errno(errno_out, err, PX_EIO);
    }
    closedir(d);
    if (n > 1) qsort(list, n, sizeof *list, cmp_names);
    *names = list;
    *count = n;
    return PX_OK;
nomem:
    closedir(d);
    px_dir_list_free(list, n);
    return fail_errno(errno_out, ENOMEM, PX_ENOMEM);
}

static double seconds(clockid_t id)
{
    struct timespec t;
    if (clock_gettime(id, &t) != 0) return 0;
    return (double)t.tv_sec + 1e-9 * (double)t.tv_nsec;
}

double px_clock_wall(void)
{
    return seconds(CLOCK_MONOTONIC);
}

double px_clock_thread_cpu(void)
{
    return seconds(CLOCK_THREAD_CPUTIME_ID);
}
