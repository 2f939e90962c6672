/* l_fs.c - folders and files for Lua without a shell.
 *
 * Folder names come from users (--path, output folders, temporary names) and
 * may hold quotes, spaces or "$(...)": nothing here builds a command line.
 * (core.list_dir, core.wait and the worker processes are in l_proc.c.)
 *   core.make_dir(path [, parents])-> true | nil, message   (mode 0777 & ~umask)
 *   core.remove(path)              -> true | nil, message   (a file or an empty folder)
 *   core.remove_tree(path)         -> true | nil, message   (temporary folders; symlinks
 *                                     are removed, never followed)
 *   core.read_file(path)           -> text | nil, message   (regular files only,
 *                                     the element-file size cap; src/data/load.c)
 *   core.file_kind(path)           -> "file"|"dir"|"link"|"other" | nil */
#define _POSIX_C_SOURCE 200809L
#include "core/alloc.h"
#include "data/data.h"
#include "lua/bindings.h"
#include <dirent.h>
#include <errno.h>
#include <fcntl.h>
#include <stdio.h>
#include <lauxlib.h>
#include <stdlib.h>
#include <string.h>
#include <sys/stat.h>
#include <unistd.h>

#define FS_DIR_MODE 0777 /* the umask narrows it, as mkdir(1) does */
#define FS_TREE_DEPTH_MAX 64 /* folders removed below a temporary folder */

static int fail_errno(lua_State *L, const char *what, const char *path, int err)
{
    luaL_pushfail(L);
    lua_pushfstring(L, "%s '%s': %s", what, path, strerror(err));
    return 2;
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
        char *sub = px_alloc(NULL, n);
        if (!sub) {
            err = ENOMEM;
            break;
        }
        snprintf(sub, n, "%s/%s", path, e->d_name);
        err = remove_tree(sub, depth + 1);
        px_free(NULL, sub);
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
    px_free(NULL, text);
    return 1;
}

void px_lua_open_fs(lua_State *L)
{
    static const luaL_Reg funcs[] = {{"make_dir", l_make_dir},   {"remove", l_remove},
                                     {"remove_tree", l_remove_tree}, {"file_kind", l_file_kind},
                                     {"read_file", l_read_file}, {NULL, NULL}};
    luaL_setfuncs(L, funcs, 0);
}
