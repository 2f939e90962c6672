/* proc.h - the operating-system helpers that sweeps need: forked worker
 * processes that die with their parent and talk through pipes, a durable append for
 * journals, a directory listing and the clocks that time threads.  POSIX; the parent-death signal is
 * Linux's prctl(PR_SET_PDEATHSIG) where available, and workers also check
 * their parent between points (px_proc_parent) everywhere else.
 *
 * Every function returns PX_OK or a negative status with errno in
 * *errno_out (may be NULL); none prints. */
#ifndef PX_PROC_H
#define PX_PROC_H
#include <stddef.h>
#include <sys/types.h>

/* Fork a worker connected by two pipes.  In the parent *pid is the
 * worker's id, the parent writes to *to_fd and reads from *from_fd.  In the
 * worker *pid is 0, *to_fd writes to the parent and *from_fd reads from it;
 * its standard output goes to /dev/null (the parent's prints stay single)
 * and it is killed when the parent dies (Linux).  The worker shares
 * everything the parent had loaded (libraries, the sweep's function) and
 * must leave with px_proc_exit. */
int px_proc_fork(pid_t *pid, int *to_fd, int *from_fd, int *errno_out);

/* Leave a forked worker at once: flush stdio, _exit (no atexit handlers,
 * no second flush of the parent's buffers). */
void px_proc_exit(int code);

/* Wait for pid; *code gets the exit status, or 128 + signal number. */
int px_proc_wait(pid_t pid, int *code, int *errno_out);

/* Write all n bytes to fd (retrying short writes and EINTR). */
int px_fd_write_all(int fd, const void *data, size_t n, int *errno_out);

/* Wait until one of fds[0..n) is readable; *which gets its index and up to
 * cap bytes are read into buf (*got = 0 at end of file). */
int px_fd_poll_read(const int *fds, size_t n, char *buf, size_t cap, size_t *which,
                    size_t *got, int *errno_out);

/* Append n bytes to path (created 0644 if missing, then its folder is
 * synced too) with one write and fsync before returning: after PX_OK the
 * bytes survive a crash of the process or the machine. */
int px_file_append_sync(const char *path, const void *data, size_t n, int *errno_out);

/* Cut path to len bytes and sync it (drops a torn last record). */
int px_file_truncate(const char *path, size_t len, int *errno_out);

/* Seconds of a monotonic clock (for intervals), and CPU seconds the
 * calling thread has used (0 where the system cannot tell). */
double px_clock_wall(void);
double px_clock_thread_cpu(void);

/* The names in folder `path` (without "." and ".."), sorted bytewise, as one
 * malloc'd array of malloc'd strings; free with px_dir_list_free. */
int px_dir_list(const char *path, char ***names, size_t *count, int *errno_out);
void px_dir_list_free(char **names, size_t count);

#endif
