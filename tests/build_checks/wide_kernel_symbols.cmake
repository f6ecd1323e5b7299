# The AVX2 copies of the column kernels (core/math/src/numerics/column_kernels_avx2.cpp), of the
# normal equations' sums of products (numerics/column_products_avx2.cpp) and of the CES composite's
# rows (core/math/src/forms/ces_rows_avx2.cpp) must define
# nothing but its own functions: an inline function of Eigen or the standard library emitted there
# would carry AVX2 code under a name the rest of the library shares, and the linker could keep that
# copy for callers on processors without AVX2.
#   cmake -DNM=<nm> -DOBJECTS=<objects> -P wide_kernel_symbols.cmake
execute_process(COMMAND ${NM} --defined-only --extern-only --demangle ${OBJECTS}
                OUTPUT_VARIABLE symbols RESULT_VARIABLE status)
if(NOT status EQUAL 0)
  message(FATAL_ERROR "${NM} failed on ${OBJECTS}")
endif()
string(REPLACE "\n" ";" lines "${symbols}")
set(own 0)
foreach(line IN LISTS lines)
  if(line MATCHES "^[0-9a-f]+ [A-Za-z] (.*)$")
    if(CMAKE_MATCH_1 MATCHES "^isoquant::(column_kernels|column_products|ces_rows)::avx2::")
      math(EXPR own "${own} + 1")
    else()
      message(FATAL_ERROR "the AVX2 object defines a symbol that is not its own: ${CMAKE_MATCH_1}")
    endif()
  endif()
endforeach()
if(own EQUAL 0)
  message(FATAL_ERROR "no isoquant::column_kernels::avx2 or ces_rows::avx2 function found in ${OBJECTS}")
endif()
message(STATUS "the AVX2 object defines ${own} symbols, all its own")
