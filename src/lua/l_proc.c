/* l_proc.c - process and file helpers for sweeps (src/core/proc.h):
 *   core.fork() -> pid, to_fd, from_fd     a worker (pid 0 in the worker), dies with us
 *   core.exit_now(code)                    leave a forked worker at once
 *   core.wait(pid) -> exit code (128 + signal when killed)
 *   core.kill(pid)                                     SIGKILL a worker we started
 *   core.fd_write(fd, text) -> true | nil, message
 *   core.fd_read(fds) -> k, bytes ("" at end of file)  first readable of fds[k]
 *   core.fd_close(fd)
 *   core.getpid(), core.getppid()
 *   core.append_sync(path, text) -> true | nil, message   durable append
 *   core.truncate(path, size) -> true | nil, message
 *   core.list_dir(path) -> sorted names | nil, message
 *   core.monotonic() -> seconds of a monotonic clock (benchmarks, progress) */
#define _POSIX_C_SOURCE 200809L
#include "core/proc.h"
#include "core/status.h"
#include "lua/bindings.h"
#include <lauxlib.h>
#include <signal.h>
#include <stdlib.h>
#include <string.h>
#include <time.h>
#include <unistd.h>

#define PX_READ_CHUNK 65536
#define PX_MAX_FDS 4096

static int push_fail(lua_State *L, const char *what, int st, int err)
{
    luaL_pushfail(L);
    lua_pushfstring(L, "%s: %s", what, err ? strerror(err) : px_strerror(st));
    return 2;
}

/* core.fork() -> pid, to_fd, from_fd (pid 0 in the worker) | nil, message */
static int l_fork(lua_State *L)
{
    pid_t pid;
    int to, from, err = 0;
    int st = px_proc_fork(&pid, &to, &from, &err);
    if (st != PX_OK) return push_fail(L, "core.fork", st, err);
    lua_pushinteger(L, (lua_Integer)pid);
    lua_pushinteger(L, to);
    lua_pushinteger(L, from);
    return 3;
}

/* core.exit_now([code]) leaves a forked worker at once */
static int l_exit_now(lua_State *L)
{
    px_proc_exit((int)luaL_optinteger(L, 1, 0));
    return 0;
}

/* core.wait(pid) -> exit code (128 + signal when killed) | nil, message */
static int l_wait(lua_State *L)
{
    int code = 0, err = 0;
    int st = px_proc_wait((pid_t)luaL_checkinteger(L, 1), &code, &err);
    if (st != PX_OK) return push_fail(L, "core.wait", st, err);
    lua_pushinteger(L, code);
    return 1;
}

/* core.kill(pid) -> boolean (SIGKILL to a worker this process started) */
static int l_kill(lua_State *L)
{
    lua_Integer pid = luaL_checkinteger(L, 1);
    luaL_argcheck(L, pid > 1, 1, "not a worker's process id");
    lua_pushboolean(L, kill((pid_t)pid, SIGKILL) == 0);
    return 1;
}

/* core.fd_write(fd, text) -> true | nil, message */
static int l_fd_write(lua_State *L)
{
    int fd = (int)luaL_checkinteger(L, 1);
    size_t n;
    const char *s = luaL_checklstring(L, 2, &n);
    int err = 0;
    int st = px_fd_write_all(fd, s, n, &err);
    if (st != PX_OK) return push_fail(L, "core.fd_write", st, err);
    lua_pushboolean(L, 1);
    return 1;
}

/* core.fd_read({fd...}) -> k, bytes ("" at end of file) | nil, message */
static int l_fd_read(lua_State *L)
{
    luaL_checktype(L, 1, LUA_TTABLE);
    lua_Integer n = luaL_len(L, 1);
    luaL_argcheck(L, n >= 1 && n < PX_MAX_FDS, 1, "need 1 or more file descriptors");
    int *fds = lua_newuserdatauv(L, (size_t)n * sizeof *fds, 0);
    for (lua_Integer i = 1; i <= n; i++) {
        lua_rawgeti(L, 1, i);
        fds[i - 1] = (int)luaL_checkinteger(L, -1);
        lua_pop(L, 1);
    }
    luaL_Buffer b;
    char *buf = luaL_buffinitsize(L, &b, PX_READ_CHUNK);
    size_t which = 0, got = 0;
    int err = 0;
    int st = px_fd_poll_read(fds, (size_t)n, buf, PX_READ_CHUNK, &which, &got, &err);
    if (st != PX_OK) return push_fail(L, "core.fd_read", st, err);
    luaL_pushresultsize(&b, got);
    lua_pushinteger(L, (lua_Integer)which + 1);
    lua_insert(L, -2);
    return 2;
}

/* core.fd_close(fd) */
static int l_fd_close(lua_State *L)
{
    close((int)luaL_checkinteger(L, 1));
    return 0;
}

/* core.getpid() -> process id */
static int l_getpid(lua_State *L)
{
    lua_pushinteger(L, (lua_Integer)getpid());
    return 1;
}

/* core.getppid() -> parent process id */
static int l_getppid(lua_State *L)
{
    lua_pushinteger(L, (lua_Integer)getppid());
    return 1;
}

/* core.append_sync(path, text) -> true | nil, message (appended and synced) */
static int l_append_sync(lua_State *L)
{
    const char *path = luaL_checkstring(L, 1);
    size_t n;
    const char *s = luaL_checklstring(L, 2, &n);
    int err = 0;
    int st = px_file_append_sync(path, s, n, &err);
    if (st != PX_OK) return push_fail(L, path, st, err);
    lua_pushboolean(L, 1);
    return 1;
}

/* core.truncate(path, size) -> true | nil, message */
static int l_truncate(lua_State *L)
{
    const char *path = luaL_checkstring(L, 1);
    lua_Integer len = luaL_checkinteger(L, 2);
    luaL_argcheck(L, len >= 0, 2, "size must be >= 0");
    int err = 0;
    int st = px_file_truncate(path, (size_t)len, &err);
    if (st != PX_OK) return push_fail(L, path, st, err);
    lua_pushboolean(L, 1);
    return 1;
}

/* core.list_dir(path) -> {name...} sorted | nil, message */
static int l_list_dir(lua_State *L)
{
    const char *path = luaL_checkstring(L, 1);
    char **names = NULL;
    size_t n = 0;
    int err = 0;
    int st = px_dir_list(path, &names, &n, &err);
    if (st != PX_OK) return push_fail(L, path, st, err);
    lua_createtable(L, (int)n, 0);
    for (size_t i = 0; i < n; i++) {
        lua_pushstring(L, names[i]);
        lua_rawseti(L, -2, (lua_Integer)i + 1);
    }
    px_dir_list_free(names, n);
    return 1;
}

/* core.monotonic() -> seconds of a monotonic clock */
static int l_monotonic(lua_State *L)
{
    struct timespec t;
    clock_gettime(CLOCK_MONOTONIC, &t);
    lua_pushnumber(L, (lua_Number)t.tv_sec + 1e-9 * (lua_Number)t.tv_nsec);
    return 1;
}

void px_lua_open_proc(lua_State *L)
{
    static const luaL_Reg funcs[] = {
        {"fork", l_fork},           {"exit_now", l_exit_now}, {"wait", l_wait}, {"kill", l_kill},
        {"fd_write", l_fd_write},   {"fd_read", l_fd_read}, {"fd_close", l_fd_close},
        {"getpid", l_getpid},       {"getppid", l_getppid}, {"append_sync", l_append_sync},
        {"truncate", l_truncate},   {"list_dir", l_list_dir}, {"monotonic", l_monotonic},
        {NULL, NULL}};
    luaL_setfuncs(L, funcs, 0);
}
