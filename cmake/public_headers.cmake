# public_headers.cmake - the installed C API, produced from the module
# headers under src/ at configure time (the sources keep their
# "core/status.h"-style includes; the installed copies say <phlox/status.h>).
#
#   phlox_public_headers(OUT_DIR <dir> MAP_PREFIX <var>
#                        HEADERS <src-rel>=<name> ...)
#
# writes <dir>/phlox/<name>.h for each src/<src-rel>, rewriting every
# include of another public header into <phlox/<name>.h>.  A public header
# that includes a private one (or a quoted header outside the list) stops
# the configuration: the installed tree must be self-contained.  Also
# writes <dir>/phlox/phlox.h (the umbrella header) and, for each layer,
# the list of function names its headers declare (the symbols its shared
# library exports; see phlox_export_map).
#
# Files are rewritten only when their content changes, and CMake re-runs
# when a source header changes.

function(_phlox_strip_comments text out)
  set(result "")
  while(TRUE)
    string(FIND "${text}" "/*" start)
    if(start EQUAL -1)
      string(APPEND result "${text}")
      break()
    endif()
    string(SUBSTRING "${text}" 0 ${start} head)
    string(APPEND result "${head} ")
    string(SUBSTRING "${text}" ${start} -1 text)
    string(FIND "${text}" "*/" stop)
    if(stop EQUAL -1)
      message(FATAL_ERROR "unterminated comment in a public header")
    endif()
    math(EXPR stop "${stop} + 2")
    string(SUBSTRING "${text}" ${stop} -1 text)
  endwhile()
  # line comments
  string(REGEX REPLACE "//[^\n]*" "" result "${result}")
  set(${out} "${result}" PARENT_SCOPE)
endfunction()

# The px_ functions a header declares (comments and macro bodies removed).
function(phlox_header_functions file out)
  file(READ "${file}" text)
  _phlox_strip_comments("${text}" text)
  # drop preprocessor lines (macros may mention px_ names); keep continued
  # lines out too by removing backslash-newline first
  string(REGEX REPLACE "\\\\\n" " " text "${text}")
  string(REGEX REPLACE "(^|\n)[ \t]*#[^\n]*" "\\1" text "${text}")
  string(REGEX MATCHALL "px_[a-z0-9_]+[ \t\n]*\\(" calls "${text}")
  set(names)
  foreach(c ${calls})
    string(REGEX REPLACE "[ \t\n]*\\($" "" n "${c}")
    list(APPEND names ${n})
  endforeach()
  # typedef'd function pointers "(*px_name)" are not functions
  string(REGEX MATCHALL "\\(\\*[ \t]*px_[a-z0-9_]+" fptrs "${text}")
  foreach(p ${fptrs})
    string(REGEX REPLACE "^\\(\\*[ \t]*" "" p "${p}")
    list(REMOVE_ITEM names ${p})
  endforeach()
  list(REMOVE_DUPLICATES names)
  set(${out} ${names} PARENT_SCOPE)
endfunction()

function(_phlox_write_if_changed path content)
  if(EXISTS "${path}")
    file(READ "${path}" old)
    if(old STREQUAL content)
      return()
    endif()
  endif()
  file(WRITE "${path}.tmp" "${content}")
  file(RENAME "${path}.tmp" "${path}")
endfunction()

# phlox_public_headers(OUT_DIR dir SOURCE_DIR src HEADERS rel=name...)
# Sets PHLOX_PUBLIC_HEADER_FILES (generated paths) in the caller.
function(phlox_public_headers)
  cmake_parse_arguments(A "" "OUT_DIR;SOURCE_DIR;UMBRELLA_EXTRA" "HEADERS" ${ARGN})
  set(dir "${A_OUT_DIR}/phlox")
  file(MAKE_DIRECTORY "${dir}")
  # map "core/status.h" -> "status"
  set(rels)
  foreach(pair ${A_HEADERS})
    string(REPLACE "=" ";" kv "${pair}")
    list(GET kv 0 rel)
    list(GET kv 1 name)
    list(APPEND rels "${rel}")
    set(_name_${rel} "${name}")
  endforeach()
  set(files)
  set(umbrella_includes "")
  foreach(rel ${rels})
    set(name "${_name_${rel}}")
    set(src "${A_SOURCE_DIR}/${rel}")
    set_property(DIRECTORY APPEND PROPERTY CMAKE_CONFIGURE_DEPENDS "${src}")
    file(READ "${src}" text)
    string(REGEX MATCHALL "#include[ \t]+\"[^\"]+\"" quoted "${text}")
    foreach(inc ${quoted})
      string(REGEX REPLACE "#include[ \t]+\"([^\"]+)\"" "\\1" target "${inc}")
      if(NOT DEFINED _name_${target})
        message(FATAL_ERROR "public header src/${rel} includes \"${target}\", which is "
                            "not public: the installed headers would not be self-contained. "
                            "Add it to PHLOX_PUBLIC_HEADERS or drop the include.")
      endif()
      string(REPLACE "${inc}" "#include <phlox/${_name_${target}}.h>" text "${text}")
    endforeach()
    # C++ callers: C linkage for the declarations, after the last #include
    # (system headers stay outside) and before the include guard's #endif.
    string(REGEX MATCHALL "#include[^\n]*\n" incs "${text}")
    if(NOT incs) # no includes: after the include guard's #define
      string(REGEX MATCH "#define[^\n]*\n" incs "${text}")
    endif()
    list(GET incs -1 last_inc)
    string(FIND "${text}" "${last_inc}" at REVERSE)
    string(LENGTH "${last_inc}" len)
    math(EXPR at "${at} + ${len}")
    string(SUBSTRING "${text}" 0 ${at} head)
    string(SUBSTRING "${text}" ${at} -1 tail)
    string(FIND "${tail}" "#endif" end_at REVERSE)
    if(end_at EQUAL -1)
      message(FATAL_ERROR "public header src/${rel} has no closing #endif")
    endif()
    string(SUBSTRING "${tail}" 0 ${end_at} body)
    string(SUBSTRING "${tail}" ${end_at} -1 closing)
    set(text "${head}\n#ifdef __cplusplus\nextern \"C\" {\n#endif\n${body}\n#ifdef __cplusplus\n}\n#endif\n${closing}")
    set(text "/* Installed copy of src/${rel} (generated by cmake/public_headers.cmake). */\n${text}")
    _phlox_write_if_changed("${dir}/${name}.h" "${text}")
    list(APPEND files "${dir}/${name}.h")
    string(APPEND umbrella_includes "#include <phlox/${name}.h>\n")
  endforeach()
  set(umbrella "/* phlox.h - the whole C API of phlox in one include (generated by
 * cmake/public_headers.cmake).  Link with `pkg-config --libs phlox`.
 * The core (status, water, thermo, equil, diagram) needs neither Lua nor
 * cairo; data.h (element files, read in a sandboxed Lua state) is in
 * libphlox-data, render.h (cairo figures) in libphlox-render. */
#ifndef PHLOX_PHLOX_H
#define PHLOX_PHLOX_H
${umbrella_includes}${A_UMBRELLA_EXTRA}#endif
")
  _phlox_write_if_changed("${dir}/phlox.h" "${umbrella}")
  list(APPEND files "${dir}/phlox.h")
  set(PHLOX_PUBLIC_HEADER_FILES ${files} PARENT_SCOPE)
endfunction()

# phlox_export_map(OUT file SOURCE_DIR src HEADERS rel...): a GNU ld version
# script exporting exactly the functions the headers declare (and EXTRA
# names), everything else local.  Sets <OUT_VAR> to the exported names.
function(phlox_export_map)
  cmake_parse_arguments(A "" "OUT;SOURCE_DIR;OUT_VAR" "HEADERS;EXTRA" ${ARGN})
  set(all ${A_EXTRA})
  foreach(rel ${A_HEADERS})
    phlox_header_functions("${A_SOURCE_DIR}/${rel}" names)
    list(APPEND all ${names})
  endforeach()
  list(REMOVE_DUPLICATES all)
  list(SORT all)
  set(body "/* Generated by cmake/public_headers.cmake: the public API, nothing else. */\n{\n  global:\n")
  foreach(n ${all})
    string(APPEND body "    ${n};\n")
  endforeach()
  string(APPEND body "  local:\n    *;\n};\n")
  _phlox_write_if_changed("${A_OUT}" "${body}")
  if(A_OUT_VAR)
    set(${A_OUT_VAR} ${all} PARENT_SCOPE)
  endif()
endfunction()
