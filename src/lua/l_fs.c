/* l_fs.c - folders, files and worker processes for Lua without a shell.
 *
 * Folder names come from users (--path, output folders, temporary names) and
 * may hold quotes, spaces or "$(...)": nothing here builds a command line.
 *   core.list_dir(path)            -> sorted names | nil, message
 *   core.make_dir(path [, parents])-> true | nil, message   (mode 0777 & ~umask)
 *   core.remove(path)              -> true | nil, message   (a file or an empty folder)
 *   core.remove_tree(path)         -> true | nil, message   (temporary folders; symlinks
 *                                     are removed, never followed)
 *   core.read_file(path)           -> text | nil, message   (regular files only,
 *                                     the element-file size cap; src/data/load.c)
 *   core.file_kind(path)           -> "file"|"dir"|"link"|"other" | nil
 *   core.spawn(argv [, env [, null_stdout]]) -> pid | nil, message  (posix_spawnp)
 *   core.wait(pid)                 -> exited normally (boolean), code */
#define _POSIX_C_SOURCE 200809L
#include "data/data.h"
#include "lua/bindings.h"
#include <dirent.h>
#include <errno.h>
#include <fcntl.h>
#include <stdio.h>
#include <lauxlib.h>
#include <spawn.h>
#include <stdlib.h>
#include <string.h>
#include <sys/stat.h>
#include <sys/wait.h>
#include <unistd.h>

extern char **environ;

#define FS_DIR_MODE 0777 /* the umask narrows it, as mkdir(1) does */
#define FS_ARGV_MAX 4096 /* words of a spawned command line */
#define FS_TREE_DEPTH_MAX 64 /* folders removed below a temporary folder */

static int fail_errno(lua_State *L, const char *what, const char *path, int err)
{
    luaL_pushfail(L);
    lua_pushfstring(L, "%s '%s': %s", what, path, strerror(err));
    return 2;
}

static int cmp_str(const void *a, const void *b)
{
    return strcmp(*(const char *const *)a, *(const char *const *)b);
}

static int l_list_dir(lua_State *L)
{
    const char *path = luaL_checkstring(L, 1);
    DIR *d = opendir(path);
    if (!d) return fail_errno(L, "cannot list", path, errno);
    lua_newtable(L);
    int n = 0;
    struct dirent *e;
    while ((e = readdir(d)) != NULL) {
        if (strcmp(e->d_name, ".") == 0 || strcmp(e->d_name, "..") == 0) continue;
        lua_pushstring(L, e->d_name);
        lua_rawseti(L, -2, ++n);
    }
    closedir(d);
    /* sort the names in C (deterministic order, any locale) */
    const char **v = lua_newuserdatauv(L, (size_t)(n ? n : 1) * sizeof *v, 0);
    for (int i = 0; i < n; i++) {
        lua_rawgeti(L, -2, i + 1);
        v[i] = lua_tostring(L, -1);
        lua_pop(L, 1); /* anchored in the table */
    }
    qsort(v, (size_t)n, sizeof *v, cmp_str);
    lua_createtable(L, n, 0);
    for (int i = 0; i < n; i++) {
        lua_pushstring(L, v[i]);
        lua_rawseti(L, -2, i + 1);
    }
    return 1;
}

static int l_make_dir(lua_State *L)
{
    size_t len;
    const char *path = luaL_checklstring(L, 1, &len);
    int parents = lua_toboolean(L, 2);
    if (len == 0) return fail_errno(L, "cannot create folder", path, ENOENT);
    char *buf = lua_newuserdatauv(L, len + 1, 0);
    memcpy(buf, path, len + 1);
    for (size_t i = 1; parents && i < len; i++) { /* each ancestor in turn */
        if (buf[i] != '/') continue;
        buf[i] = '\0';
        if (mkdir(buf, FS_DIR_MODE) != 0 && errno != EEXIST) return fail_errno(L, "cannot create folder", buf, errno);
        buf[i] = '/';
    }
    if (mkdir(buf, FS_DIR_MODE) != 0) {
        struct stat st;
        int err = errno;
        if (!(err == EEXIST && parents && stat(buf, &st) == 0 && S_ISDIR(st.st_mode)))
            return fail_errno(L, "cannot create folder", path, err);
    }
    lua_pushboolean(L, 1);
    return 1;
}

static int l_remove(lua_State *L)
{
    const char *path = luaL_checkstring(L, 1);
    struct stat st;
    if (lstat(path, &st) != 0) return fail_errno(L, "cannot remove", path, errno);
    if ((S_ISDIR(st.st_mode) ? rmdir(path) : unlink(path)) != 0)
        return fail_errno(L, "cannot remove", path, errno);
    lua_pushboolean(L, 1);
    return 1;
}

/* removes PATH and, for a folder, everything under it; symlinks are removed,
 * never followed.  0 or an errno. */
static int remove_tree(const char *path, int depth)
{
    struct stat st;
    if (lstat(path, &st) != 0) return errno;
    if (!S_ISDIR(st.st_mode)) return unlink(path) == 0 ? 0 : errno;
    if (depth > FS_TREE_DEPTH_MAX) return ELOOP;
    DIR *d = opendir(path);
    if (!d) return errno;
    int err = 0;
    struct dirent *e;
    while (!err && (e = readdir(d)) != NULL) {
        if (strcmp(e->d_name, ".") == 0 || strcmp(e->d_name, "..") == 0) continue;
        size_t n = strlen(path) + strlen(e->d_name) + 2;
        char *sub = malloc(n);
        if (!sub) {
            err = ENOMEM;
            break;
        }
        snprintf(sub, n, "%s/%s", path, e->d_name);
        err = remove_tree(sub, depth + 1);
        free(sub);
    }
    closedir(d);
    if (!err && rmdir(path) != 0) err = errno;
    return err;
}

static int l_remove_tree(lua_State *L)
{
    const char *path = luaL_checkstring(L, 1);
    int err = remove_tree(path, 0);
    if (err) return fail_errno(L, "cannot remove", path, err);
    lua_pushboolean(L, 1);
    return 1;
}

static int l_file_kind(lua_State *L)
{
    struct stat st;
    if (lstat(luaL_checkstring(L, 1), &st) != 0) {
        lua_pushnil(L);
        return 1;
    }
    lua_pushstring(L, S_ISREG(st.st_mode) ? "file" : S_ISDIR(st.st_mode) ? "dir"
                      : S_ISLNK(st.st_mode) ? "link" : "other");
    return 1;
}

static int l_read_file(lua_State *L)
{
    const char *path = luaL_checkstring(L, 1);
    char *text, msg[256];
    size_t len;
    int st = px_data_read_file(path, &text, &len, msg, sizeof msg);
    if (st != 0) {
        luaL_pushfail(L);
        lua_pushfstring(L, "%s: %s", path, msg);
        return 2;
    }
    lua_pushlstring(L, text, len);
    free(text);
    return 1;
}

/* a NULL-terminated array of the strings of the list at IDX, in a userdata */
static char **string_array(lua_State *L, int idx, size_t extra, size_t *n)
{
    *n = lua_rawlen(L, idx);
    if (*n > FS_ARGV_MAX) luaL_error(L, "spawn: more than %d words", FS_ARGV_MAX);
    char **v = lua_newuserdatauv(L, (*n + extra + 1) * sizeof *v, 0);
    for (size_t i = 0; i < *n; i++) {
        if (lua_rawgeti(L, idx, (lua_Integer)i + 1) != LUA_TSTRING)
            luaL_error(L, "spawn: word %d is not a string", (int)i + 1);
        v[i] = (char *)lua_tostring(L, -1);
        lua_pop(L, 1); /* anchored in the list */
    }
    v[*n] = NULL;
    return v;
}

static int l_spawn(lua_State *L)
{
    luaL_checktype(L, 1, LUA_TTABLE);
    size_t n;
    char **argv = string_array(L, 1, 0, &n);
    if (n == 0) return luaL_error(L, "spawn: empty command");
    /* environment: ours, with the names of ENV (a {NAME = value} table) replaced */
    size_t ne = 0;
    while (environ[ne]) ne++;
    size_t nadd = 0;
    if (lua_istable(L, 2)) {
        lua_pushnil(L);
        while (lua_next(L, 2)) {
            nadd++;
            lua_pop(L, 1);
        }
    }
    char **envp = lua_newuserdatauv(L, (ne + nadd + 1) * sizeof *envp, 0);
    size_t k = 0;
    for (size_t i = 0; i < ne; i++) {
        const char *eq = strchr(environ[i], '=');
        int replaced = 0;
        if (eq && lua_istable(L, 2)) {
            lua_pushlstring(L, environ[i], (size_t)(eq - environ[i]));
            replaced = lua_rawget(L, 2) != LUA_TNIL;
            lua_pop(L, 1);
        }
        if (!replaced) envp[k++] = environ[i];
    }
    if (lua_istable(L, 2)) {
        lua_pushnil(L);
        while (lua_next(L, 2)) {
            if (lua_type(L, -2) != LUA_TSTRING || lua_type(L, -1) != LUA_TSTRING)
                return luaL_error(L, "spawn: environment entries are NAME = \"value\" strings");
            lua_pop(L, 1);
        }
    }
    /* keep the NAME=value strings alive in a table */
    lua_newtable(L);
    int keep = lua_gettop(L);
    if (lua_istable(L, 2)) {
        int m = 0;
        lua_pushnil(L);
        while (lua_next(L, 2)) {
            envp[k++] = (char *)lua_pushfstring(L, "%s=%s", lua_tostring(L, -2), lua_tostring(L, -1));
            lua_rawseti(L, keep, ++m);
            lua_pop(L, 1);
        }
    }
    envp[k] = NULL;
    posix_spawn_file_actions_t fa;
    posix_spawn_file_actions_init(&fa);
    if (lua_toboolean(L, 3)) posix_spawn_file_actions_addopen(&fa, 1, "/dev/null", O_WRONLY, 0);
    pid_t pid;
    int err = posix_spawnp(&pid, argv[0], &fa, NULL, argv, envp);
    posix_spawn_file_actions_destroy(&fa);
    if (err != 0) return fail_errno(L, "cannot start", argv[0], err);
    lua_pushinteger(L, (lua_Integer)pid);
    return 1;
}

static int l_wait(lua_State *L)
{
    pid_t pid = (pid_t)luaL_checkinteger(L, 1);
    int status;
    pid_t r;
    do r = waitpid(pid, &status, 0);
    while (r < 0 && errno == EINTR);
    if (r < 0) return fail_errno(L, "cannot wait for", lua_tostring(L, 1), errno);
    lua_pushboolean(L, WIFEXITED(status));
    lua_pushinteger(L, WIFEXITED(status) ? WEXITSTATUS(status) : WIFSIGNALED(status) ? WTERMSIG(status) : -1);
    return 2;
}

void px_lua_open_fs(lua_State *L)
{
    static const luaL_Reg funcs[] = {{"list_dir", l_list_dir}, {"make_dir", l_make_dir},
                                     {"remove", l_remove},     {"remove_tree", l_remove_tree}, {"file_kind", l_file_kind},
                                     {"read_file", l_read_file}, {"spawn", l_spawn},
                                     {"wait", l_wait},         {NULL, NULL}};
    luaL_setfuncs(L, funcs, 0);
}
