/* bindings.h - the binding files that make up "phlox.core".
 *
 * Each px_lua_open_* adds its functions and metatables (named phlox.<Type>)
 * to the table on top of the stack and leaves the stack as it found it.
 * Bindings stay thin: check arguments, call the C core, convert results;
 * misuse raises, an expected numerical failure returns nil, message, info. */
#ifndef PX_BINDINGS_H
#define PX_BINDINGS_H
#include <lua.h>
#include <math.h>

typedef void (*px_lua_opener)(lua_State *L);
extern const px_lua_opener px_lua_openers[]; /* NULL-terminated */

void px_lua_open_status(lua_State *L);
void px_lua_open_util(lua_State *L);
void px_lua_open_render(lua_State *L);
void px_lua_open_thermo(lua_State *L);
void px_lua_open_diagram(lua_State *L);
void px_lua_open_equil(lua_State *L);
void px_lua_open_opts(lua_State *L);
void px_lua_open_fs(lua_State *L);
void px_lua_open_geom(lua_State *L);

/* Reads the point lists at stack indices ax, ay (tables of numbers of one
 * length) into a box pushed on the stack (it lives until the call returns;
 * lua_settop() first so it sits above the arguments).  Misuse raises an
 * argument error.  Returns the number of points. */
size_t px_lua_check_points(lua_State *L, int ax, int ay, double **x, double **y);

/* The option reader (l_opts.c).  A function's options are a NULL-terminated
 * array, one line per key:
 *     static const px_lua_opt map_opts[] = {
 *         {"T", "number", PX_WATER_TMIN, PX_WATER_TMAX},
 *         {"exclude", "strings", 0, 0}, ..., {NULL, NULL, 0, 0}};
 * Types: number integer string boolean table function any strings numbers
 * map, "a|b|c" for one of these words, alternatives joined by '/'.  lo and
 * hi bound numbers (and list or map values); give -HUGE_VAL, HUGE_VAL for
 * none.  Errors are raised at the user's script line. */
typedef struct px_lua_opt {
    const char *name;
    const char *type;
    double lo, hi;
} px_lua_opt;
#define PX_OPT_ANY_NUMBER (-HUGE_VAL), HUGE_VAL
void px_lua_opts_check(lua_State *L, int idx, const char *fname, const px_lua_opt *spec);
void px_lua_opt_check_value(lua_State *L, int idx, const char *fname, const char *key,
                            const char *type, double lo, double hi);
/* pushes "file:line: " of the first frame of user code (not an embedded module) */
void px_lua_push_user_where(lua_State *L);
int px_lua_user_error(lua_State *L, const char *fmt, ...);
/* t[key] = s for the table on top of the stack (s copied; NULL pushes nil) */
static inline void px_lua_setstr(lua_State *L, const char *key, const char *s)
{
    lua_pushstring(L, s);
    lua_setfield(L, -2, key);
}
void px_lua_open_practice(lua_State *L);
void px_lua_open_proc(lua_State *L);

#endif
