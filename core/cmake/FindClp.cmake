# Finds COIN-OR Clp (Debian: coinor-libclp-dev) and defines the imported target Clp::Clp.
#
# Only libClp and libCoinUtils are linked, found by name, not pkg-config's whole list (which adds
# ClpSolver, bz2, z, lapack and blas): the add-in then needs exactly the two libraries LibreOffice
# Calc's own solver already loads on Debian (coinor-libclp1, coinor-libcoinutils3v5).
find_path(Clp_INCLUDE_DIR ClpSimplex.hpp PATH_SUFFIXES coin coin-or DOC "Folder of ClpSimplex.hpp")
find_library(Clp_LIBRARY Clp DOC "COIN-OR Clp library")
find_library(Clp_COINUTILS_LIBRARY CoinUtils DOC "COIN-OR CoinUtils library, which Clp builds on")

include(FindPackageHandleStandardArgs)
find_package_handle_standard_args(Clp REQUIRED_VARS Clp_LIBRARY Clp_COINUTILS_LIBRARY Clp_INCLUDE_DIR)

if(Clp_FOUND AND NOT TARGET Clp::Clp)
  add_library(Clp::CoinUtils UNKNOWN IMPORTED)
  set_target_properties(Clp::CoinUtils PROPERTIES IMPORTED_LOCATION "${Clp_COINUTILS_LIBRARY}"
                                                  INTERFACE_INCLUDE_DIRECTORIES "${Clp_INCLUDE_DIR}")
  add_library(Clp::Clp UNKNOWN IMPORTED)
  set_target_properties(Clp::Clp PROPERTIES IMPORTED_LOCATION "${Clp_LIBRARY}"
                                            INTERFACE_INCLUDE_DIRECTORIES "${Clp_INCLUDE_DIR}"
                                            INTERFACE_LINK_LIBRARIES Clp::CoinUtils)
endif()
mark_as_advanced(Clp_INCLUDE_DIR Clp_LIBRARY Clp_COINUTILS_LIBRARY)
