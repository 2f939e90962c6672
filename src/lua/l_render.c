/* l_render.c - figures for Lua: core.figure(w, h, rows, cols) returns a
 * phlox.Figure userdata whose methods add panels' content and save it.
 * Panels are 1-based here, as Lua users expect. */
#include "core/alloc.h"
#include "core/atomic.h"
#include "core/status.h"
#include "lua/bindings.h"
#include "render/render.h"
#include <lauxlib.h>
#include <math.h>
#include <stdlib.h>
#include <string.h>

#define FIGURE_MT "phlox.Figure"

typedef struct {
    px_figure *fig; /* NULL once closed */
} lfigure;

static px_figure *checkfig(lua_State *L)
{
    lfigure *u = luaL_checkudata(L, 1, FIGURE_MT);
    if (!u->fig) luaL_error(L, "attempt to use a closed figure");
    return u->fig;
}

static int checkpanel(lua_State *L, int arg)
{
    return (int)luaL_checkinteger(L, arg) - 1;
}

static int status_error(lua_State *L, int st, const char *what)
{
    if (st == PX_OK) return 0;
    return luaL_error(L, "%s: %s", what, px_strerror(st));
}

static px_rgba checkcolor(lua_State *L, int arg)
{
    px_rgba c = {0, 0, 0, 1};
    luaL_checktype(L, arg, LUA_TTABLE);
    double *v[4] = {&c.r, &c.g, &c.b, &c.a};
    for (int i = 0; i < 4; i++) {
        int t = lua_rawgeti(L, arg, i + 1);
        if (t == LUA_TNUMBER) *v[i] = lua_tonumber(L, -1);
        else if (!(t == LUA_TNIL && i == 3)) luaL_argerror(L, arg, "colour must be {r, g, b [, a]} in 0..1");
        lua_pop(L, 1);
    }
    return c;
}

/* Two equal-length number arrays -> malloc'd copies (in a userdata box so
 * an error in between leaks nothing). */
static int l_figure(lua_State *L)
{
    double w = luaL_checknumber(L, 1), h = luaL_checknumber(L, 2);
    int rows = (int)luaL_optinteger(L, 3, 1), cols = (int)luaL_optinteger(L, 4, 1);
    lfigure *u = lua_newuserdatauv(L, sizeof *u, 0);
    u->fig = NULL; /* closed until the figure exists */
    luaL_setmetatable(L, FIGURE_MT);
    u->fig = px_figure_new(w, h, rows, cols);
    if (!u->fig) return luaL_error(L, "figure: bad size or panel grid (%f x %f, %d x %d)", w, h, rows, cols);
    return 1;
}

static int f_axes(lua_State *L)
{
    px_figure *f = checkfig(L);
    int st = px_figure_axes(f, checkpanel(L, 2), luaL_checknumber(L, 3), luaL_checknumber(L, 4),
                            luaL_checknumber(L, 5), luaL_checknumber(L, 6), lua_toboolean(L, 7),
                            lua_toboolean(L, 8));
    status_error(L, st, "figure:axes");
    return 0;
}

/* The (fig, panel, xs, ys, ...) head of the drawing methods with nargs
 * arguments: the stack is set to nargs first so the points box goes above
 * every argument. */
static size_t checkpanelpoints(lua_State *L, int nargs, int *panel, double **x, double **y)
{
    lua_settop(L, nargs);
    *panel = checkpanel(L, 2);
    return px_lua_check_points(L, 3, 4, x, y);
}

static int f_titles(lua_State *L)
{
    px_figure *f = checkfig(L);
    int st = px_figure_titles(f, checkpanel(L, 2), luaL_optstring(L, 3, NULL),
                              luaL_optstring(L, 4, NULL), luaL_optstring(L, 5, NULL));
    status_error(L, st, "figure:titles");
    return 0;
}

static int f_polygon(lua_State *L)
{
    px_figure *f = checkfig(L);
    int panel;
    double *x, *y;
    size_t n = checkpanelpoints(L, 10, &panel, &x, &y);
    px_rgba fill = checkcolor(L, 5), stroke = checkcolor(L, 6);
    double width = luaL_optnumber(L, 7, 0.6);
    const char *label = luaL_optstring(L, 8, NULL);
    double lx = luaL_optnumber(L, 9, NAN), ly = luaL_optnumber(L, 10, NAN);
    status_error(L, px_figure_polygon(f, panel, x, y, n, fill, stroke, width, label, lx, ly),
                 "figure:polygon");
    return 0;
}

static int f_line(lua_State *L)
{
    static const char *const dashes[] = {"solid", "dashed", "dotted", "dashdot", NULL};
    px_figure *f = checkfig(L);
    lua_settop(L, 8); /* the points box goes above every argument */
    int panel = checkpanel(L, 2);
    double *x, *y;
    size_t n = px_lua_check_points(L, 3, 4, &x, &y);
    px_rgba c = checkcolor(L, 5);
    double width = luaL_optnumber(L, 6, 1.0);
    int dash = luaL_checkoption(L, 7, "solid", dashes);
    const char *legend = luaL_optstring(L, 8, NULL);
    status_error(L, px_figure_line(f, panel, x, y, n, c, width, (px_dash)dash, legend), "figure:line");
    return 0;
}

static int f_text(lua_State *L)
{
    px_figure *f = checkfig(L);
    int st = px_figure_text(f, checkpanel(L, 2), luaL_checknumber(L, 3), luaL_checknumber(L, 4),
                            luaL_checkstring(L, 5), lua_toboolean(L, 6), luaL_optnumber(L, 7, 8.0),
                            lua_isnoneornil(L, 8) ? (px_rgba){0, 0, 0, 1} : checkcolor(L, 8));
    status_error(L, st, "figure:text");
    return 0;
}

/* fig:hatch(panel, xs, ys, colour [, width, spacing, angle]) */
static int f_hatch(lua_State *L)
{
    px_figure *f = checkfig(L);
    lua_settop(L, 8); /* the points box goes above every argument */
    int panel = checkpanel(L, 2);
    double *x, *y;
    size_t n = px_lua_check_points(L, 3, 4, &x, &y);
    px_rgba c = checkcolor(L, 5);
    double width = luaL_optnumber(L, 6, 0.5), spacing = luaL_optnumber(L, 7, 5.0);
    double angle = luaL_optnumber(L, 8, 45.0);
    status_error(L, px_figure_hatch(f, panel, x, y, n, c, width, spacing, angle), "figure:hatch");
    return 0;
}

/* fig:legend_patch(panel, text, fill [, stroke [, hatch [, angle]]]) */
static int f_legend_patch(lua_State *L)
{
    px_figure *f = checkfig(L);
    int panel = checkpanel(L, 2);
    const char *text = luaL_checkstring(L, 3);
    px_rgba fill = checkcolor(L, 4);
    px_rgba stroke = lua_isnoneornil(L, 5) ? (px_rgba){0.3, 0.3, 0.3, 1} : checkcolor(L, 5);
    double hatch = luaL_optnumber(L, 6, 0), angle = luaL_optnumber(L, 7, 45.0);
    status_error(L, px_figure_legend_patch(f, panel, text, fill, stroke, hatch, angle),
                 "figure:legend_patch");
    return 0;
}

/* fig:legend(panel, where): "top right" (default), "top left", "bottom left",
 * "bottom right" or "outside" (right of the plot). */
static int f_legend(lua_State *L)
{
    static const char *const places[] = {"top right", "top left", "bottom left", "bottom right",
                                         "outside", NULL};
    px_figure *f = checkfig(L);
    int panel = checkpanel(L, 2);
    int where = luaL_checkoption(L, 3, "top right", places);
    status_error(L, px_figure_legend_place(f, panel, (px_legend_place)where), "figure:legend");
    return 0;
}

static int f_stamp(lua_State *L)
{
    px_figure *f = checkfig(L);
    status_error(L, px_figure_stamp(f, luaL_checkstring(L, 2)), "figure:stamp");
    return 0;
}

static int f_pages(lua_State *L)
{
    px_figure *f = checkfig(L);
    status_error(L, px_figure_page_per_panel(f, lua_toboolean(L, 2)), "figure:pages");
    return 0;
}

/* fig:save(path [, dpi [, replace]]) -> true | nil, message
 * (replace: also replace a symbolic link or a read-only file) */
static int f_save(lua_State *L)
{
    px_figure *f = checkfig(L);
    const char *path = luaL_checkstring(L, 2);
    double dpi = luaL_optnumber(L, 3, 150);
    int fmt = px_format_from_path(path);
    luaL_argcheck(L, fmt >= 0, 2, "file name must end in .png, .svg or .pdf");
    unsigned char *data;
    size_t n;
    int st = px_figure_render(f, (px_format)fmt, dpi, &data, &n);
    int err = 0;
    char why[1024] = "";
    if (st == PX_OK) {
        st = px_write_atomic_ex(path, data, n, lua_toboolean(L, 4) ? PX_WRITE_REPLACE : 0, &err, why,
                                sizeof why);
        px_free(NULL, data);
    }
    if (st != PX_OK) {
        luaL_pushfail(L);
        if (why[0]) lua_pushstring(L, why);
        else lua_pushfstring(L, "%s: %s", path, err ? strerror(err) : px_strerror(st));
        return 2;
    }
    lua_pushboolean(L, 1);
    return 1;
}

/* fig:render(format [, dpi]) -> bytes (for tests and pipelines) */
static int f_render(lua_State *L)
{
    static const char *const fmts[] = {"png", "svg", "pdf", NULL};
    px_figure *f = checkfig(L);
    int fmt = luaL_checkoption(L, 2, NULL, fmts);
    unsigned char *data;
    size_t n;
    int st = px_figure_render(f, (px_format)fmt, luaL_optnumber(L, 3, 72), &data, &n);
    if (st != PX_OK) {
        luaL_pushfail(L);
        lua_pushstring(L, px_strerror(st));
        return 2;
    }
    lua_pushlstring(L, (const char *)data, n);
    px_free(NULL, data);
    return 1;
}

static int f_plot_rect(lua_State *L)
{
    px_figure *f = checkfig(L);
    double x, y, w, h;
    status_error(L, px_figure_plot_rect(f, checkpanel(L, 2), luaL_optnumber(L, 3, 72), &x, &y, &w, &h),
                 "figure:plot_rect");
    lua_pushnumber(L, x);
    lua_pushnumber(L, y);
    lua_pushnumber(L, w);
    lua_pushnumber(L, h);
    return 4;
}

/* fig:scale(text, line): font sizes and frame strokes (presets) */
static int f_scale(lua_State *L)
{
    px_figure *f = checkfig(L);
    status_error(L, px_figure_scale(f, luaL_checknumber(L, 2), luaL_optnumber(L, 3, 1.0)),
                 "figure:scale (text and line scale in [0.3, 4])");
    return 0;
}

/* fig:stamp_below([on]): the stamp adds to the height */
static int f_stamp_below(lua_State *L)
{
    px_figure *f = checkfig(L);
    status_error(L, px_figure_stamp_below(f, lua_isnone(L, 2) || lua_toboolean(L, 2)), "figure:stamp_below");
    return 0;
}

/* fig:reference_output([on]): PNG by cairo's writer and SVG numbers by
 * strtod/printf, the former paths (for the benchmark's comparison) */
static int f_reference_output(lua_State *L)
{
    px_figure *f = checkfig(L);
    status_error(L, px_figure_reference_output(f, lua_isnone(L, 2) || lua_toboolean(L, 2)),
                 "figure:reference_output");
    return 0;
}

/* fig:svg_text("text" | "outline"): how SVG output writes text */
static int f_svg_text(lua_State *L)
{
    px_figure *f = checkfig(L);
    static const char *const modes[] = {"text", "outline", NULL};
    int k = luaL_checkoption(L, 2, NULL, modes);
    status_error(L, px_figure_svg_text(f, k == 1 ? PX_SVG_TEXT_OUTLINE : PX_SVG_TEXT_TEXT),
                 "figure:svg_text");
    return 0;
}

/* fig:used(n): only the first n panels are drawn */
static int f_used(lua_State *L)
{
    px_figure *f = checkfig(L);
    status_error(L, px_figure_panels_used(f, (int)luaL_checkinteger(L, 2)), "figure:used");
    return 0;
}

/* fig:line_label(panel, xs, ys, text [, chem, size, colour, at, alt]) */
static int f_line_label(lua_State *L)
{
    px_figure *f = checkfig(L);
    int panel;
    double *x, *y;
    size_t n = checkpanelpoints(L, 10, &panel, &x, &y);
    const char *text = luaL_checkstring(L, 5);
    int chem = lua_toboolean(L, 6);
    double size = luaL_optnumber(L, 7, 7.0);
    px_rgba c = lua_isnil(L, 8) ? (px_rgba){0, 0, 0, 1} : checkcolor(L, 8);
    double at = luaL_optnumber(L, 9, 0.5);
    const char *alt = luaL_optstring(L, 10, NULL);
    status_error(L, px_figure_line_label(f, panel, x, y, n, text, alt, chem, size, c, at),
                 "figure:line_label");
    return 0;
}

/* fig:meta(key, text): file metadata (SVG, PDF, PNG text chunks) */
static int f_meta(lua_State *L)
{
    px_figure *f = checkfig(L);
    status_error(L, px_figure_meta(f, luaL_checkstring(L, 2), luaL_checkstring(L, 3)),
                 "figure:meta (key: 1-79 printable ASCII characters)");
    return 0;
}

/* fig:layout() -> { {kind, panel (1-based, 0 = stamp), item, text, placed,
 * size, angle, x = {4 corners}, y = {...}, ax, ay}, ... } as drawn */
static int f_layout(lua_State *L)
{
    static const char *const kinds[] = {"field", "leader", "line", "text", "legend",
                                        "tick", "axis", "title", "stamp"};
    px_figure *f = checkfig(L);
    px_label_box *b;
    size_t n;
    status_error(L, px_figure_layout(f, &b, &n), "figure:layout");
    lua_createtable(L, (int)n, 0);
    for (size_t i = 0; i < n; i++) {
        lua_createtable(L, 0, 12);
        px_lua_setstr(L, "kind", kinds[b[i].kind]);
        lua_pushinteger(L, b[i].panel + 1);
        lua_setfield(L, -2, "panel");
        if (b[i].item >= 0) {
            lua_pushinteger(L, b[i].item + 1);
            lua_setfield(L, -2, "item");
        }
        px_lua_setstr(L, "text", b[i].text);
        lua_pushboolean(L, b[i].placed);
        lua_setfield(L, -2, "placed");
        lua_pushnumber(L, b[i].size);
        lua_setfield(L, -2, "size");
        lua_pushnumber(L, b[i].angle);
        lua_setfield(L, -2, "angle");
        for (int c = 0; c < 2; c++) {
            lua_createtable(L, 4, 0);
            for (int k = 0; k < 4; k++) {
                lua_pushnumber(L, c ? b[i].qy[k] : b[i].qx[k]);
                lua_rawseti(L, -2, k + 1);
            }
            lua_setfield(L, -2, c ? "y" : "x");
        }
        if (b[i].kind == PX_LABEL_LEADER) {
            lua_pushnumber(L, b[i].ax);
            lua_setfield(L, -2, "ax");
            lua_pushnumber(L, b[i].ay);
            lua_setfield(L, -2, "ay");
        }
        lua_rawseti(L, -2, (lua_Integer)i + 1);
    }
    px_figure_layout_free(b, n);
    return 1;
}

/* fig:bare(panel [, on]): no frame, ticks or titles */
static int f_bare(lua_State *L)
{
    px_figure *f = checkfig(L);
    status_error(L, px_figure_bare(f, checkpanel(L, 2), lua_isnone(L, 3) || lua_toboolean(L, 3)),
                 "figure:bare");
    return 0;
}

/* core.pdf_pages(path, {fig, ...}) -> true | nil, message: one PDF, a page per figure */
static int l_pdf_pages(lua_State *L)
{
    const char *path = luaL_checkstring(L, 1);
    luaL_checktype(L, 2, LUA_TTABLE);
    lua_Integer n = luaL_len(L, 2);
    luaL_argcheck(L, n >= 1 && n <= 10000, 2, "one figure at least");
    const px_figure **figs = lua_newuserdatauv(L, (size_t)n * sizeof *figs, 0);
    for (lua_Integer i = 1; i <= n; i++) {
        lua_rawgeti(L, 2, i);
        lfigure *u = luaL_testudata(L, -1, FIGURE_MT);
        if (!u || !u->fig) luaL_argerror(L, 2, "a list of open figures expected");
        figs[i - 1] = u->fig;
        lua_pop(L, 1);
    }
    int st = px_figures_save_pdf(figs, (size_t)n, path);
    if (st != PX_OK) {
        luaL_pushfail(L);
        lua_pushfstring(L, "%s: %s", path, px_strerror(st));
        return 2;
    }
    lua_pushboolean(L, 1);
    return 1;
}

static void emit_run(void *user, int kind, const char *s)
{
    static const char *const kinds[] = {"normal", "sub", "sup"};
    lua_State *L = user;
    lua_createtable(L, 0, 2);
    px_lua_setstr(L, "kind", kinds[kind]);
    px_lua_setstr(L, "text", s);
    lua_rawseti(L, -2, (lua_Integer)luaL_len(L, -2) + 1);
}

/* core.text_runs(text [, chem]) -> { {kind = "normal"|"sub"|"sup", text}, ... }
 * as figures typeset it (formulas in braces, or all of it when chem) */
static int l_text_runs(lua_State *L)
{
    const char *text = luaL_checkstring(L, 1);
    int chem = lua_toboolean(L, 2);
    lua_newtable(L);
    px_text_runs(text, chem, emit_run, L);
    return 1;
}

static int f_close(lua_State *L)
{
    lfigure *u = luaL_checkudata(L, 1, FIGURE_MT);
    px_figure_free(u->fig);
    u->fig = NULL;
    return 0;
}

static int l_ticks(lua_State *L)
{
    double t[64];
    double a = luaL_checknumber(L, 1), b = luaL_checknumber(L, 2);
    size_t max = (size_t)luaL_optinteger(L, 3, 8);
    luaL_argcheck(L, max >= 2 && max <= 64, 3, "between 2 and 64 ticks");
    size_t n = lua_toboolean(L, 4) ? px_ticks_log(a, b, max, t) : px_ticks_linear(a, b, max, t);
    lua_createtable(L, (int)n, 0);
    for (size_t i = 0; i < n; i++) {
        lua_pushnumber(L, t[i]);
        lua_rawseti(L, -2, (lua_Integer)i + 1);
    }
    return 1;
}

/* core.text_width(text, size [, chem]) -> points, as figures measure it */
static int l_text_width(lua_State *L)
{
    const char *text = luaL_checkstring(L, 1);
    double size = luaL_checknumber(L, 2);
    luaL_argcheck(L, size > 0 && size < 200, 2, "font size must be in (0, 200) points");
    double w = px_text_width(text, lua_toboolean(L, 3), size);
    if (w < 0) return luaL_error(L, "text_width: cannot measure text");
    lua_pushnumber(L, w);
    return 1;
}

void px_lua_open_render(lua_State *L)
{
    static const luaL_Reg methods[] = {
        {"axes", f_axes},   {"titles", f_titles}, {"polygon", f_polygon},
        {"line", f_line},   {"text", f_text},     {"stamp", f_stamp},
        {"pages", f_pages}, {"save", f_save},     {"render", f_render},
        {"plot_rect", f_plot_rect}, {"close", f_close}, {"hatch", f_hatch},
        {"legend_patch", f_legend_patch}, {"legend", f_legend}, {"scale", f_scale},
        {"used", f_used}, {"line_label", f_line_label}, {"meta", f_meta},
        {"layout", f_layout}, {"bare", f_bare},
        {"stamp_below", f_stamp_below}, {"reference_output", f_reference_output},
        {"svg_text", f_svg_text}, {NULL, NULL}};
    static const luaL_Reg funcs[] = {
        {"figure", l_figure}, {"ticks", l_ticks}, {"text_width", l_text_width},
        {"pdf_pages", l_pdf_pages}, {"text_runs", l_text_runs}, {NULL, NULL}};
    luaL_newmetatable(L, FIGURE_MT);
    luaL_newlib(L, methods);
    lua_setfield(L, -2, "__index");
    lua_pushcfunction(L, f_close);
    lua_setfield(L, -2, "__gc");
    lua_pushcfunction(L, f_close);
    lua_setfield(L, -2, "__close");
    lua_pop(L, 1);
    luaL_setfuncs(L, funcs, 0);
}
