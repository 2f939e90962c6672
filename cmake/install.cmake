# install.cmake - what `cmake --install` puts where, and the Debian package
# (`cpack -G DEB` in the build folder).  Included from CMakeLists.txt after
# the targets exist.
#
#   bin/phlox                                   the program
#   lib*/libphlox-{core,data,render}.so.*, .a   the C libraries
#   include/phlox/*.h                           the C API (<phlox/phlox.h>)
#   lib*/pkgconfig/phlox.pc, phlox-core.pc      pkg-config
#   lib*/cmake/phlox/                           find_package(phlox)
#   lib*/lua/5.4/phlox.so                       the module for stock lua5.4
#   share/phlox/elements/*.lua                  the element library (readable
#                                               copy of what is embedded)
#   share/phlox/lua-stubs/                      LuaLS annotations of the API
#   share/man/man1/phlox.1                      the manual page
#   share/bash-completion/completions/phlox     bash completion
#   share/doc/phlox/                            README, LICENSE, docs/
include(GNUInstallDirs)
include(CMakePackageConfigHelpers)

set(PHLOX_LUA_CMOD_DIR ${CMAKE_INSTALL_LIBDIR}/lua/5.4 CACHE STRING
    "Where the Lua C module phlox.so goes, relative to the prefix (on Debian's lua5.4 cpath when the prefix is /usr or /usr/local)")
set(PHLOX_DATA_DIR ${CMAKE_INSTALL_DATADIR}/phlox)

install(TARGETS phlox RUNTIME DESTINATION ${CMAKE_INSTALL_BINDIR} COMPONENT runtime)
install(TARGETS ${PHLOX_LIBRARY_TARGETS} EXPORT phloxTargets
        RUNTIME DESTINATION ${CMAKE_INSTALL_BINDIR}
        LIBRARY DESTINATION ${CMAKE_INSTALL_LIBDIR} NAMELINK_COMPONENT dev
        ARCHIVE DESTINATION ${CMAKE_INSTALL_LIBDIR} COMPONENT dev)
install(FILES ${PHLOX_PUBLIC_HEADER_FILES} DESTINATION ${CMAKE_INSTALL_INCLUDEDIR}/phlox)
install(TARGETS phlox_lua_module LIBRARY DESTINATION ${PHLOX_LUA_CMOD_DIR})
install(DIRECTORY ${CMAKE_SOURCE_DIR}/stdlib/elements/ DESTINATION ${PHLOX_DATA_DIR}/elements
        FILES_MATCHING PATTERN "*.lua")
install(DIRECTORY ${CMAKE_SOURCE_DIR}/docs/lua-stubs/ DESTINATION ${PHLOX_DATA_DIR}/lua-stubs
        FILES_MATCHING PATTERN "*.lua")
install(FILES ${CMAKE_SOURCE_DIR}/docs/phlox.1 DESTINATION ${CMAKE_INSTALL_MANDIR}/man1)
install(FILES ${CMAKE_SOURCE_DIR}/completion/phlox.bash
        DESTINATION ${CMAKE_INSTALL_DATADIR}/bash-completion/completions RENAME phlox)
install(DIRECTORY docs/ DESTINATION ${CMAKE_INSTALL_DOCDIR}
        PATTERN "lua-stubs" EXCLUDE PATTERN "phlox.1" EXCLUDE)
install(FILES README.md LICENSE DESTINATION ${CMAKE_INSTALL_DOCDIR})

# --- pkg-config ----------------------------------------------------------------
file(RELATIVE_PATH PHLOX_PC_TO_PREFIX /prefix/${CMAKE_INSTALL_LIBDIR}/pkgconfig /prefix)
string(REGEX REPLACE "/$" "" PHLOX_PC_TO_PREFIX "${PHLOX_PC_TO_PREFIX}")
configure_file(${CMAKE_SOURCE_DIR}/cmake/phlox.pc.in ${CMAKE_BINARY_DIR}/phlox.pc @ONLY)
configure_file(${CMAKE_SOURCE_DIR}/cmake/phlox-core.pc.in ${CMAKE_BINARY_DIR}/phlox-core.pc @ONLY)
install(FILES ${CMAKE_BINARY_DIR}/phlox.pc ${CMAKE_BINARY_DIR}/phlox-core.pc
        DESTINATION ${CMAKE_INSTALL_LIBDIR}/pkgconfig)

# --- CMake package: find_package(phlox) -> phlox::core, phlox::data, ... ------
set(PHLOX_CMAKE_DIR ${CMAKE_INSTALL_LIBDIR}/cmake/phlox)
install(EXPORT phloxTargets NAMESPACE phlox:: DESTINATION ${PHLOX_CMAKE_DIR})
configure_package_config_file(${CMAKE_SOURCE_DIR}/cmake/phloxConfig.cmake.in
  ${CMAKE_BINARY_DIR}/phloxConfig.cmake INSTALL_DESTINATION ${PHLOX_CMAKE_DIR})
write_basic_package_version_file(${CMAKE_BINARY_DIR}/phloxConfigVersion.cmake
  VERSION ${PROJECT_VERSION} COMPATIBILITY SameMinorVersion)
install(FILES ${CMAKE_BINARY_DIR}/phloxConfig.cmake ${CMAKE_BINARY_DIR}/phloxConfigVersion.cmake
        DESTINATION ${PHLOX_CMAKE_DIR})

# --- the Debian package (cpack -G DEB) -----------------------------------------
set(CPACK_GENERATOR DEB)
set(CPACK_PACKAGE_NAME phlox)
set(CPACK_PACKAGE_VERSION ${PROJECT_VERSION})
set(CPACK_PACKAGE_CONTACT "phlox maintainers <phlox@invalid>")
set(CPACK_PACKAGE_DESCRIPTION_SUMMARY
    "aqueous speciation and potential-pH (predominance) diagrams")
set(CPACK_DEBIAN_PACKAGE_DESCRIPTION
"aqueous speciation and potential-pH (predominance) diagrams
 phlox computes which form a metal takes in water (metal, oxide or hydroxide
 film, dissolved ion or complex) against electrode potential, pH and
 temperature (25 to 300 C): potential-pH maps with immunity, passivation and
 corrosion domains, speciation with activity coefficients and solids, and
 figures and tables stamped with their provenance.  A study is a Lua script.
 .
 This package holds the phlox program, the C libraries and headers, the Lua
 module for lua5.4, the element library, the manual page and bash completion.
 .
 A thermodynamic diagram says what can form, not how fast it forms.")
set(CPACK_DEBIAN_PACKAGE_SECTION science)
set(CPACK_DEBIAN_PACKAGE_PRIORITY optional)
set(CPACK_DEBIAN_FILE_NAME DEB-DEFAULT)
# Depends: computed by dpkg-shlibdeps from every installed ELF file
# (libc6, liblua5.4-0, libcairo2, ...), plus the interpreter the module is for.
set(CPACK_DEBIAN_PACKAGE_SHLIBDEPS ON)
set(CPACK_DEBIAN_PACKAGE_RECOMMENDS "lua5.4, fonts-dejavu-core")
set(CPACK_DEBIAN_COMPRESSION_TYPE gzip)
set(CPACK_PACKAGING_INSTALL_PREFIX /usr)
set(CPACK_STRIP_FILES OFF)
include(CPack)
