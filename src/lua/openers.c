/* openers.c - the list of binding files registered into "phlox.core". */
#include "lua/bindings.h"

const px_lua_opener px_lua_openers[] = {
    px_lua_open_status,
    px_lua_open_util,
    px_lua_open_render,
    px_lua_open_thermo,
    px_lua_open_diagram,
    px_lua_open_equil,
    px_lua_open_opts,
    px_lua_open_fs,
    px_lua_open_geom,
    px_lua_open_practice,
    px_lua_open_proc,
    0};
