/* test_atomic.c - atomic file writes (src/core/atomic.c): the umask decides
 * a new file's mode, an existing file keeps its mode, symbolic links and
 * read-only files are refused unless replacing is asked for, and temporary
 * files left by a killed writer are removed by the next write. */
#define _POSIX_C_SOURCE 200809L
#include "px_test.h"
#include "core/atomic.h"
#include "core/status.h"
#include <stdlib.h>
#include <string.h>
#include <sys/stat.h>
#include <sys/wait.h>
#include <unistd.h>

static char dir[64];

static int setup(void **state)
{
    (void)state;
    snprintf(dir, sizeof dir, "/tmp/px-atomic-XXXXXX");
    return mkdtemp(dir) ? 0 : -1;
}

static int teardown(void **state)
{
    (void)state;
    static const char *const names[] = {"new", "kept", "link", "target", "ro", "stale", NULL};
    char p[128];
    for (int i = 0; names[i]; i++) {
        snprintf(p, sizeof p, "%s/%s", dir, names[i]);
        unlink(p);
    }
    rmdir(dir);
    return 0;
}

static mode_t mode_of(const char *path)
{
    struct stat st;
    assert_int_equal(lstat(path, &st), 0);
    return st.st_mode & 07777;
}

static char *slurp(const char *path)
{
    static char buf[256];
    FILE *f = fopen(path, "rb");
    assert_non_null(f);
    size_t n = fread(buf, 1, sizeof buf - 1, f);
    fclose(f);
    buf[n] = '\0';
    return buf;
}

static void test_modes(void **state)
{
    (void)state;
    char p[128];
    snprintf(p, sizeof p, "%s/new", dir);
    mode_t old = umask(077);
    assert_int_equal(px_write_atomic(p, "a", 1, NULL), PX_OK);
    assert_int_equal(mode_of(p), 0600); /* 0666 less the umask, not a forced 0644 */
    unlink(p);
    umask(022);
    assert_int_equal(px_write_atomic(p, "a", 1, NULL), PX_OK);
    assert_int_equal(mode_of(p), 0644);
    /* an existing 0600 file stays 0600 (it was widened to 0644) */
    snprintf(p, sizeof p, "%s/kept", dir);
    assert_int_equal(px_write_atomic(p, "a", 1, NULL), PX_OK);
    assert_int_equal(chmod(p, 0600), 0);
    assert_int_equal(px_write_atomic(p, "bb", 2, NULL), PX_OK);
    assert_int_equal(mode_of(p), 0600);
    assert_string_equal(slurp(p), "bb");
    umask(old);
}

static void test_symlink_refused(void **state)
{
    (void)state;
    char link[128], target[128], why[512];
    snprintf(link, sizeof link, "%s/link", dir);
    snprintf(target, sizeof target, "%s/target", dir);
    assert_int_equal(px_write_atomic(target, "keep", 4, NULL), PX_OK);
    assert_int_equal(symlink(target, link), 0);
    assert_int_equal(px_write_atomic_ex(link, "x", 1, 0, NULL, why, sizeof why), PX_EINVAL);
    assert_non_null(strstr(why, "symbolic link"));
    assert_string_equal(slurp(target), "keep");
    /* asked to replace: the link itself becomes a file, the target is untouched */
    assert_int_equal(px_write_atomic_ex(link, "x", 1, PX_WRITE_REPLACE, NULL, why, sizeof why), PX_OK);
    struct stat st;
    assert_int_equal(lstat(link, &st), 0);
    assert_true(S_ISREG(st.st_mode));
    assert_string_equal(slurp(target), "keep");
}

static void test_read_only_refused(void **state)
{
    (void)state;
    char p[128], why[512];
    snprintf(p, sizeof p, "%s/ro", dir);
    assert_int_equal(px_write_atomic(p, "old", 3, NULL), PX_OK);
    assert_int_equal(chmod(p, 0444), 0);
    if (geteuid() != 0) { /* root may write anything: access() says yes */
        assert_int_equal(px_write_atomic_ex(p, "new", 3, 0, NULL, why, sizeof why), PX_EINVAL);
        assert_non_null(strstr(why, "read-only"));
        assert_string_equal(slurp(p), "old");
    }
    assert_int_equal(px_write_atomic_ex(p, "new", 3, PX_WRITE_REPLACE, NULL, why, sizeof why), PX_OK);
    assert_string_equal(slurp(p), "new");
    assert_int_equal(mode_of(p), 0444);
}

static void test_stale_temporaries(void **state)
{
    (void)state;
    pid_t child = fork(); /* a process id that is surely dead afterwards */
    if (child == 0) _exit(0);
    assert_true(child > 0);
    waitpid(child, NULL, 0);
    char p[128], dead[192], live[192];
    snprintf(p, sizeof p, "%s/stale", dir);
    snprintf(dead, sizeof dead, "%s.phlox-tmp-%ld-0", p, (long)child);
    snprintf(live, sizeof live, "%s.phlox-tmp-%ld-77", p, (long)getpid());
    FILE *f = fopen(dead, "w");
    fclose(f);
    f = fopen(live, "w");
    fclose(f);
    assert_int_equal(px_write_atomic(p, "z", 1, NULL), PX_OK);
    assert_int_not_equal(access(dead, F_OK), 0); /* the killed writer's file is gone */
    assert_int_equal(access(live, F_OK), 0);     /* a live writer's is left alone */
    unlink(live);
}

int main(void)
{
    const struct CMUnitTest tests[] = {
        cmocka_unit_test(test_modes), cmocka_unit_test(test_symlink_refused),
        cmocka_unit_test(test_read_only_refused), cmocka_unit_test(test_stale_temporaries)};
    return cmocka_run_group_tests(tests, setup, teardown);
}
