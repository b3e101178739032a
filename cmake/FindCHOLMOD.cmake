# Finds CHOLMOD and defines the imported target SuiteSparse::CHOLMOD.
# SuiteSparse >= 7 ships a CMake config; Debian 12's 5.12 ships neither a
# config nor a .pc file, so fall back to locating the header and libraries.
find_package(CHOLMOD CONFIG QUIET)
if(TARGET SuiteSparse::CHOLMOD)
  set(CHOLMOD_FOUND TRUE)
  return()
endif()

find_path(CHOLMOD_INCLUDE_DIR cholmod.h PATH_SUFFIXES suitesparse)
find_library(CHOLMOD_LIBRARY cholmod)
find_library(SUITESPARSECONFIG_LIBRARY suitesparseconfig)

include(FindPackageHandleStandardArgs)
find_package_handle_standard_args(CHOLMOD
  REQUIRED_VARS CHOLMOD_LIBRARY SUITESPARSECONFIG_LIBRARY CHOLMOD_INCLUDE_DIR)

if(CHOLMOD_FOUND AND NOT TARGET SuiteSparse::CHOLMOD)
  add_library(SuiteSparse::CHOLMOD UNKNOWN IMPORTED)
  set_target_properties(SuiteSparse::CHOLMOD PROPERTIES
    IMPORTED_LOCATION "${CHOLMOD_LIBRARY}"
    INTERFACE_INCLUDE_DIRECTORIES "${CHOLMOD_INCLUDE_DIR}"
    INTERFACE_LINK_LIBRARIES "${SUITESPARSECONFIG_LIBRARY}")
endif()
mark_as_advanced(CHOLMOD_INCLUDE_DIR CHOLMOD_LIBRARY SUITESPARSECONFIG_LIBRARY)
