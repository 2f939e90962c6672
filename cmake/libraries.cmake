# libraries.cmake - the phlox libraries by layer (included from CMakeLists.txt).
#
#   phlox-core    src/core src/num src/geom src/water src/thermo src/equil
#                 src/diagram
#                 (needs only libm and threads: no Lua, no cairo)
#   phlox-data    src/data (element files are Lua tables, read in a sandboxed
#                 Lua state) and the embedded library (src/embed: the index of
#                 lua/ and stdlib/ compiled in, below both data and the
#                 bindings): links liblua and phlox-core
#   phlox-render  src/render: links cairo and phlox-core
#   phlox_lua     src/lua: the bindings "phlox.core" and the host interpreter
#                 (static only; inside the phlox program and the Lua module)
#
# Each layer is compiled once (position-independent objects) and archived as
# lib<name>.a and linked as lib<name>.so.<version>.  The shared libraries
# export exactly the functions their public headers declare
# (PHLOX_PUBLIC_HEADERS; a GNU ld version script generated from the headers,
# everything else local), checked by the test packaging.symbols.
# phloxcore keeps its old meaning: every layer in one static library, for the
# phlox program, the unit tests and the benchmarks.
include(GNUInstallDirs)
include(${CMAKE_SOURCE_DIR}/cmake/public_headers.cmake)

option(PHLOX_SHARED "Build the shared libraries (libphlox-*.so)" ON)

set(PHLOX_SOVERSION 0)

# Public headers: src/<rel> installed as <phlox/<name>.h>, by layer.
set(PHLOX_PUBLIC_HEADERS_core
    core/status.h=status core/alloc.h=alloc core/constants.h=constants
    core/atomic.h=atomic core/sha256.h=sha256
    water/water.h=water
    thermo/species.h=species thermo/thermo.h=thermo thermo/basis.h=basis
    thermo/practice.h=practice
    equil/equil.h=equil equil/speciate.h=speciate
    diagram/diagram.h=diagram diagram/potential.h=potential diagram/emap.h=emap
    diagram/rmap.h=rmap geom/geom.h=geom)
set(PHLOX_PUBLIC_HEADERS_data data/data.h=data)
set(PHLOX_PUBLIC_HEADERS_render render/render.h=render)
set(PHLOX_PUBLIC_HEADERS ${PHLOX_PUBLIC_HEADERS_core} ${PHLOX_PUBLIC_HEADERS_data}
                         ${PHLOX_PUBLIC_HEADERS_render})

set(PHLOX_PUBLIC_INCLUDE_DIR ${CMAKE_BINARY_DIR}/include)
configure_file(${CMAKE_SOURCE_DIR}/cmake/phlox_version.h.in
               ${PHLOX_PUBLIC_INCLUDE_DIR}/phlox/version.h @ONLY)
phlox_public_headers(OUT_DIR ${PHLOX_PUBLIC_INCLUDE_DIR} SOURCE_DIR ${CMAKE_SOURCE_DIR}/src
                     HEADERS ${PHLOX_PUBLIC_HEADERS}
                     UMBRELLA_EXTRA "#include <phlox/version.h>\n")
list(APPEND PHLOX_PUBLIC_HEADER_FILES ${PHLOX_PUBLIC_INCLUDE_DIR}/phlox/version.h)

file(GLOB PHLOX_SOURCES_core CONFIGURE_DEPENDS
     ${CMAKE_SOURCE_DIR}/src/core/*.c ${CMAKE_SOURCE_DIR}/src/num/*.c
     ${CMAKE_SOURCE_DIR}/src/geom/*.c
     ${CMAKE_SOURCE_DIR}/src/water/*.c
     ${CMAKE_SOURCE_DIR}/src/thermo/*.c ${CMAKE_SOURCE_DIR}/src/equil/*.c
     ${CMAKE_SOURCE_DIR}/src/diagram/*.c)
file(GLOB PHLOX_SOURCES_data CONFIGURE_DEPENDS ${CMAKE_SOURCE_DIR}/src/data/*.c
     ${CMAKE_SOURCE_DIR}/src/embed/*.c)
list(APPEND PHLOX_SOURCES_data ${PHLOX_EMBED_C})
file(GLOB PHLOX_SOURCES_render CONFIGURE_DEPENDS ${CMAKE_SOURCE_DIR}/src/render/*.c)
file(GLOB PHLOX_SOURCES_lua CONFIGURE_DEPENDS ${CMAKE_SOURCE_DIR}/src/lua/*.c)

set(PHLOX_LAYER_DEPS_core Threads::Threads m)
set(PHLOX_LAYER_DEPS_data PkgConfig::LUA)
set(PHLOX_LAYER_DEPS_render PkgConfig::CAIRO)
set(PHLOX_LAYER_DEPS_lua PkgConfig::LUA PkgConfig::CAIRO)

foreach(layer core data render lua)
  add_library(phlox_${layer}_obj OBJECT ${PHLOX_SOURCES_${layer}})
  set_target_properties(phlox_${layer}_obj PROPERTIES POSITION_INDEPENDENT_CODE ON)
  target_include_directories(phlox_${layer}_obj PUBLIC ${CMAKE_SOURCE_DIR}/src
                                                       ${CMAKE_BINARY_DIR}/generated)
  target_link_libraries(phlox_${layer}_obj PUBLIC ${PHLOX_LAYER_DEPS_${layer}})
endforeach()

# Static and shared libraries of the three C layers.
set(PHLOX_LIBRARY_TARGETS)
foreach(layer core data render)
  add_library(phlox_${layer}_static STATIC $<TARGET_OBJECTS:phlox_${layer}_obj>)
  set_target_properties(phlox_${layer}_static PROPERTIES OUTPUT_NAME phlox-${layer})
  target_include_directories(phlox_${layer}_static INTERFACE
    $<BUILD_INTERFACE:${PHLOX_PUBLIC_INCLUDE_DIR}>
    $<INSTALL_INTERFACE:${CMAKE_INSTALL_INCLUDEDIR}>)
  add_library(phlox::${layer}_static ALIAS phlox_${layer}_static)
  set_target_properties(phlox_${layer}_static PROPERTIES EXPORT_NAME ${layer}_static)
  list(APPEND PHLOX_LIBRARY_TARGETS phlox_${layer}_static)
  if(PHLOX_SHARED)
    set(map ${CMAKE_BINARY_DIR}/generated/phlox-${layer}.map)
    set(rels)
    foreach(pair ${PHLOX_PUBLIC_HEADERS_${layer}})
      string(REGEX REPLACE "=.*" "" rel "${pair}")
      list(APPEND rels ${rel})
    endforeach()
    phlox_export_map(OUT ${map} SOURCE_DIR ${CMAKE_SOURCE_DIR}/src HEADERS ${rels}
                     OUT_VAR PHLOX_EXPORTS_${layer})
    add_library(phlox_${layer} SHARED $<TARGET_OBJECTS:phlox_${layer}_obj>)
    set_target_properties(phlox_${layer} PROPERTIES
      OUTPUT_NAME phlox-${layer} EXPORT_NAME ${layer}
      VERSION ${PROJECT_VERSION} SOVERSION ${PHLOX_SOVERSION}
      LINK_DEPENDS ${map})
    target_link_options(phlox_${layer} PRIVATE "LINKER:--version-script=${map}"
                                               "LINKER:--no-undefined")
    target_include_directories(phlox_${layer} INTERFACE
      $<BUILD_INTERFACE:${PHLOX_PUBLIC_INCLUDE_DIR}>
      $<INSTALL_INTERFACE:${CMAKE_INSTALL_INCLUDEDIR}>)
    add_library(phlox::${layer} ALIAS phlox_${layer})
    list(APPEND PHLOX_LIBRARY_TARGETS phlox_${layer})
  endif()
endforeach()
target_link_libraries(phlox_core_static INTERFACE Threads::Threads m)
target_link_libraries(phlox_data_static INTERFACE phlox_core_static PkgConfig::LUA)
target_link_libraries(phlox_render_static INTERFACE phlox_core_static PkgConfig::CAIRO)
if(PHLOX_SHARED)
  target_link_libraries(phlox_core PRIVATE Threads::Threads m)
  target_link_libraries(phlox_data PUBLIC phlox_core PRIVATE PkgConfig::LUA m)
  target_link_libraries(phlox_render PUBLIC phlox_core PRIVATE PkgConfig::CAIRO m)
endif()

# Everything in one static library (the phlox program, tests, benchmarks).
add_library(phloxcore STATIC $<TARGET_OBJECTS:phlox_core_obj> $<TARGET_OBJECTS:phlox_data_obj>
                             $<TARGET_OBJECTS:phlox_render_obj> $<TARGET_OBJECTS:phlox_lua_obj>)
target_include_directories(phloxcore PUBLIC ${CMAKE_SOURCE_DIR}/src
                                            ${CMAKE_BINARY_DIR}/generated)
target_link_libraries(phloxcore PUBLIC PkgConfig::LUA PkgConfig::CAIRO Threads::Threads m)

# The Lua C module for the stock interpreter: `require "phlox"` loads
# phlox.so (luaopen_phlox in src/lua/module.c).  It carries every layer and
# the embedded library, links cairo but not liblua (the interpreter provides
# the Lua API, as Debian's Lua policy asks), and exports only its luaopen_
# functions.
set(PHLOX_MODULE_MAP ${CMAKE_BINARY_DIR}/generated/phlox-module.map)
file(WRITE ${PHLOX_MODULE_MAP}.in
     "/* Generated by cmake/libraries.cmake. */\n{\n  global:\n    luaopen_phlox;\n    luaopen_phlox_core;\n  local:\n    *;\n};\n")
configure_file(${PHLOX_MODULE_MAP}.in ${PHLOX_MODULE_MAP} COPYONLY)
add_library(phlox_lua_module MODULE $<TARGET_OBJECTS:phlox_core_obj> $<TARGET_OBJECTS:phlox_data_obj>
                                    $<TARGET_OBJECTS:phlox_render_obj> $<TARGET_OBJECTS:phlox_lua_obj>)
set_target_properties(phlox_lua_module PROPERTIES OUTPUT_NAME phlox PREFIX ""
                      LIBRARY_OUTPUT_DIRECTORY ${CMAKE_BINARY_DIR}/lua-module
                      LINK_DEPENDS ${PHLOX_MODULE_MAP})
target_link_libraries(phlox_lua_module PRIVATE PkgConfig::CAIRO Threads::Threads m)
target_link_options(phlox_lua_module PRIVATE "LINKER:--version-script=${PHLOX_MODULE_MAP}")
