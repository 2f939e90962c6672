/* main.c - the phlox program: runs study scripts, one-line chunks, the
 * interactive prompt and the commands (reaction, check, list).  It only
 * wires: options are parsed here, everything else lives in the library and
 * in the embedded Lua module phlox.cli. */
#define _POSIX_C_SOURCE 200809L /* setenv */
#include "core/alloc.h"
#include "lua/host.h"
#include "px_version.h"
#include <lauxlib.h>
#include <lualib.h>
#include <stdio.h>
#include <stdlib.h>
#include <string.h>
#include <unistd.h>

#define PX_EXIT_OK 0
#define PX_EXIT_ERROR 1 /* a script or command failed */
#define PX_EXIT_USAGE 2 /* the command line is wrong */
#define PX_MAX_PATHS 64 /* user folders from --path and PHLOX_PATH */
#define PX_LINE_MAX 4096

static const char *const commands[] = {"reaction", "check", "list", NULL};

static void usage(FILE *out)
{
    fputs("usage: phlox [options] [SCRIPT.lua [args...]]\n"
          "       phlox [options] -e CODE\n"
          "       phlox [options] COMMAND [args...]\n"
          "\n"
          "Runs an aqueous speciation study written in Lua. With no script on a\n"
          "terminal, starts an interactive prompt; SCRIPT '-' reads standard input.\n"
          "\n"
          "commands:\n"
          "  reaction EQUATION [--temperature C] [--pressure BAR] [--json]\n"
          "                       thermodynamics of a reaction (dG, dH, dS, log K, E)\n"
          "  check FILE...        validate element definition files\n"
          "  list [ELEMENT]       species in the library (with state, model, source)\n"
          "  merge SCRIPT.lua [args...]\n"
          "                       run SCRIPT with its sweeps taken from the shard\n"
          "                       journals of earlier --shard runs: writes what a\n"
          "                       serial run writes\n"
          "  (phlox COMMAND --help describes a command)\n"
          "\n"
          "options:\n"
          "  -e CODE              run CODE (may be given more than once)\n"
          "  -i                   enter the interactive prompt after the script\n"
          "  -p, --path DIR       search DIR for modules and element files before the\n"
          "                       built-in library (repeatable; PHLOX_PATH also adds\n"
          "                       ':'-separated folders, after the --path ones)\n"
          "  --shard I/N          run shard I of N of the script's sweeps (1-based;\n"
          "                       also PHLOX_SHARD=I/N), then stop; see merge\n"
          "  -v, --version        print the version and source revision\n"
          "  -h, --help           print this help\n"
          "  --                   end of options (the next argument is the script)\n"
          "\n"
          "environment:\n"
          "  PHLOX_PATH           ':'-separated folders searched after the --path ones\n"
          "  PHLOX_SHARD          I/N: as --shard\n"
          "\n"
          "A thermodynamic diagram says what can form, not how fast it forms.\n",
          out);
}

static void report(lua_State *L, int status)
{
    if (status != LUA_OK) {
        const char *msg = lua_tostring(L, -1);
        fprintf(stderr, "phlox: %s\n", msg ? msg : "(error object is not a string)");
        fflush(stderr);
        lua_pop(L, 1);
    }
}

static int dochunk(lua_State *L, int status)
{
    if (status == LUA_OK) status = px_host_docall(L, 0, 0);
    report(L, status);
    return status;
}

/* Script arguments as the global `arg` (arg[0] the script, arg[1..] the
 * rest, arg[-1] the program), as the Lua standalone interpreter does. */
static void create_arg_table(lua_State *L, char **argv, int argc, int script)
{
    lua_createtable(L, argc - script - 1, script + 1);
    for (int i = 0; i < argc; i++) {
        lua_pushstring(L, argv[i]);
        lua_rawseti(L, -2, i - script);
    }
    lua_setglobal(L, "arg");
}

static int run_script(lua_State *L, const char *fname, char **argv, int argc, int script)
{
    if (strcmp(fname, "-") == 0) fname = NULL;
    int status = luaL_loadfilex(L, fname, "t");
    if (status == LUA_OK) {
        int n = argc - script - 1;
        luaL_checkstack(L, n + 3, "too many arguments to script");
        for (int i = script + 1; i < argc; i++) lua_pushstring(L, argv[i]);
        status = px_host_docall(L, n, 0);
    }
    report(L, status);
    return status;
}

static int run_command(lua_State *L, char **argv, int argc, int cmd)
{
    int status = px_host_require(L, "phlox.cli");
    if (status != LUA_OK) {
        report(L, status);
        return PX_EXIT_ERROR;
    }
    lua_getfield(L, -1, "run");
    lua_remove(L, -2);
    lua_pushstring(L, argv[cmd]);
    lua_createtable(L, argc - cmd - 1, 0);
    for (int i = cmd + 1; i < argc; i++) {
        lua_pushstring(L, argv[i]);
        lua_rawseti(L, -2, i - cmd);
    }
    status = px_host_docall(L, 2, 1);
    if (status != LUA_OK) {
        report(L, status);
        return PX_EXIT_ERROR;
    }
    int code = (int)luaL_optinteger(L, -1, PX_EXIT_OK);
    lua_pop(L, 1);
    return code;
}

/* Is the chunk just incomplete (more lines needed)? (after lua.c) */
static int incomplete(lua_State *L, int status)
{
    static const char eof_mark[] = "<eof>";
    if (status == LUA_ERRSYNTAX) {
        size_t lmsg;
        const char *msg = lua_tolstring(L, -1, &lmsg);
        size_t lmark = sizeof eof_mark - 1;
        if (lmsg >= lmark && strcmp(msg + lmsg - lmark, eof_mark) == 0) {
            lua_pop(L, 1);
            return 1;
        }
    }
    return 0;
}

/* The interactive prompt: each line is tried as an expression first (so
 * `1 + 1` prints 2), then as a statement; incomplete chunks continue. */
static void repl(lua_State *L)
{
    char line[PX_LINE_MAX];
    fputs("phlox " PHLOX_VERSION " (Lua " LUA_VERSION_MAJOR "." LUA_VERSION_MINOR
          "); ctrl-D to leave\n",
          stdout);
    for (;;) {
        fputs("phlox> ", stdout);
        fflush(stdout);
        if (!fgets(line, sizeof line, stdin)) break;
        lua_pushstring(L, line);
        for (;;) {
            const char *code = lua_tostring(L, -1);
            const char *ret = lua_pushfstring(L, "return %s;", code);
            int status = luaL_loadbufferx(L, ret, strlen(ret), "=stdin", "t");
            lua_remove(L, -2); /* the "return" text */
            if (status != LUA_OK) {
                lua_pop(L, 1);
                status = luaL_loadbufferx(L, code, strlen(code), "=stdin", "t");
            }
            if (incomplete(L, status)) {
                fputs("   >> ", stdout);
                fflush(stdout);
                if (!fgets(line, sizeof line, stdin)) {
                    lua_pop(L, 1);
                    fputc('\n', stdout);
                    return;
                }
                lua_pushstring(L, line);
                lua_concat(L, 2);
                continue;
            }
            lua_remove(L, -2); /* the source text */
            int base = lua_gettop(L);
            if (status == LUA_OK) status = px_host_docall(L, 0, LUA_MULTRET);
            if (status == LUA_OK) {
                int n = lua_gettop(L) - base + 1;
                if (n > 0) { /* records shown as fields, not table: 0x... (phlox.cli show) */
                    if (px_host_require(L, "phlox.cli") == LUA_OK && lua_istable(L, -1)) {
                        lua_getfield(L, -1, "show");
                        lua_remove(L, -2);
                    } else {
                        lua_pop(L, 1);
                        lua_getglobal(L, "print");
                    }
                    lua_insert(L, -(n + 1));
                    status = px_host_docall(L, n, 0);
                }
            }
            report(L, status);
            lua_settop(L, base - 1);
            break;
        }
    }
    fputc('\n', stdout);
}

static int is_command(const char *s)
{
    for (const char *const *c = commands; *c; c++)
        if (strcmp(s, *c) == 0) return 1;
    return 0;
}

int main(int argc, char **argv)
{
    const char *paths[PX_MAX_PATHS];
    size_t npaths = 0;
    const char *chunks[PX_MAX_PATHS];
    size_t nchunks = 0;
    int interactive = 0, script = 0, i;

    for (i = 1; i < argc; i++) {
        const char *a = argv[i];
        if (strcmp(a, "--") == 0) {
            i++;
            break;
        } else if (strcmp(a, "-h") == 0 || strcmp(a, "--help") == 0) {
            usage(stdout);
            return PX_EXIT_OK;
        } else if (strcmp(a, "-v") == 0 || strcmp(a, "--version") == 0) {
            printf("phlox %s (%s; Lua %s.%s)\n", PHLOX_VERSION, PHLOX_REVISION,
                   LUA_VERSION_MAJOR, LUA_VERSION_MINOR);
            return PX_EXIT_OK;
        } else if (strcmp(a, "-i") == 0) {
            interactive = 1;
        } else if (strcmp(a, "-e") == 0 || strcmp(a, "-p") == 0 || strcmp(a, "--path") == 0) {
            if (i + 1 >= argc) {
                fprintf(stderr, "phlox: option '%s' needs an argument\n", a);
                usage(stderr);
                return PX_EXIT_USAGE;
            }
            const char **list = a[1] == 'e' ? chunks : paths;
            size_t *n = a[1] == 'e' ? &nchunks : &npaths;
            if (*n >= PX_MAX_PATHS) {
                fprintf(stderr, "phlox: too many '%s' options (at most %d)\n", a, PX_MAX_PATHS);
                return PX_EXIT_USAGE;
            }
            list[(*n)++] = argv[++i];
        } else if (strcmp(a, "--shard") == 0 || strncmp(a, "--shard=", 8) == 0) {
            const char *spec = a[7] == '=' ? a + 8 : (i + 1 < argc ? argv[++i] : NULL);
            int si = 0, sn = 0, used = 0;
            if (!spec || sscanf(spec, "%d/%d%n", &si, &sn, &used) != 2 || spec[used] != '\0' ||
                si < 1 || sn < 1 || si > sn) {
                fprintf(stderr, "phlox: --shard wants I/N with 1 <= I <= N (e.g. --shard 3/8), got '%s'\n",
                        spec ? spec : "");
                return PX_EXIT_USAGE;
            }
            setenv("PHLOX_SHARD", spec, 1); /* read by phlox.sweep, inherited by workers */
        } else if (strncmp(a, "--path=", 7) == 0) {
            if (npaths >= PX_MAX_PATHS) {
                fprintf(stderr, "phlox: too many '--path' options (at most %d)\n", PX_MAX_PATHS);
                return PX_EXIT_USAGE;
            }
            paths[npaths++] = a + 7;
        } else if (a[0] == '-' && a[1] != '\0') {
            fprintf(stderr, "phlox: unknown option '%s'\n", a);
            usage(stderr);
            return PX_EXIT_USAGE;
        } else {
            break;
        }
    }
    script = i < argc ? i : 0;

    /* PHLOX_PATH folders come after the --path ones. */
    char *envcopy = NULL;
    const char *env = getenv("PHLOX_PATH");
    if (env && *env) {
        envcopy = px_alloc(NULL, strlen(env) + 1);
        if (!envcopy) {
            fputs("phlox: out of memory\n", stderr);
            return PX_EXIT_ERROR;
        }
        strcpy(envcopy, env);
        for (char *tok = strtok(envcopy, ":"); tok && npaths < PX_MAX_PATHS; tok = strtok(NULL, ":"))
            paths[npaths++] = tok;
    }

    lua_State *L = px_host_new(paths, npaths);
    if (!L) {
        fputs("phlox: cannot create the Lua state (out of memory)\n", stderr);
        px_free(NULL, envcopy);
        return PX_EXIT_ERROR;
    }
    int code = PX_EXIT_OK;
    create_arg_table(L, argv, argc, script);
    for (size_t k = 0; k < nchunks && code == PX_EXIT_OK; k++) {
        int st = luaL_loadbufferx(L, chunks[k], strlen(chunks[k]), "=(command line)", "t");
        if (dochunk(L, st) != LUA_OK) code = PX_EXIT_ERROR;
    }
    if (code == PX_EXIT_OK && script && strcmp(argv[script], "merge") == 0) {
        /* phlox merge SCRIPT args: the script runs with its sweeps read from
         * the shard journals (phlox.sweep, PHLOX_MERGE) */
        if (script + 1 < argc && (strcmp(argv[script + 1], "--help") == 0 ||
                                  strcmp(argv[script + 1], "-h") == 0)) {
            fputs("usage: phlox merge SCRIPT.lua [args...]\n"
                  "\n"
                  "Runs SCRIPT with its journaled sweeps taken from the shard journals that\n"
                  "earlier runs with --shard I/N (or PHLOX_SHARD=I/N) wrote: nothing is\n"
                  "computed again, and the script writes exactly what a serial run writes.\n"
                  "A shard missing or unfinished stops the merge and is named.\n"
                  "\n"
                  "  SCRIPT.lua [args...]  the study and its arguments, as the shards ran it\n"
                  "  -h, --help            print this help\n",
                  stdout);
        } else if (script + 1 >= argc) {
            fputs("phlox: merge needs the study script: phlox merge SCRIPT.lua [args...]\n", stderr);
            code = PX_EXIT_USAGE;
        } else {
            setenv("PHLOX_MERGE", "1", 1);
            script++;
            create_arg_table(L, argv, argc, script);
            if (run_script(L, argv[script], argv, argc, script) != LUA_OK) code = PX_EXIT_ERROR;
        }
    } else if (code == PX_EXIT_OK && script) {
        if (is_command(argv[script]))
            code = run_command(L, argv, argc, script);
        else if (run_script(L, argv[script], argv, argc, script) != LUA_OK)
            code = PX_EXIT_ERROR;
    }
    if (code == PX_EXIT_OK &&
        (interactive || (!script && nchunks == 0 && isatty(STDIN_FILENO))))
        repl(L);
    else if (code == PX_EXIT_OK && !script && nchunks == 0) {
        /* Not a terminal and nothing to run: read the script from stdin. */
        if (run_script(L, "-", argv, argc, argc - 1) != LUA_OK) code = PX_EXIT_ERROR;
    }
    lua_close(L);
    px_free(NULL, envcopy);
    return code;
}
