# The math layer links alone: every function of namespace isoquant that libisoquant_math.a calls
# is defined in it. The include folders keep sheet headers out of the math sources, but a
# declaration in a math header whose definition sits in the sheet library would still build, as
# long as every program also links the sheet layer (the form's option word once did).
#   cmake -DNM=<nm> -DLIBRARY=<libisoquant_math.a> -P math_layer_closed.cmake
execute_process(COMMAND ${NM} --extern-only ${LIBRARY} OUTPUT_VARIABLE symbols RESULT_VARIABLE status)
if(NOT status EQUAL 0)
  message(FATAL_ERROR "${NM} failed on ${LIBRARY}")
endif()
string(REPLACE "\n" ";" lines "${symbols}")
set(defined "")
set(needed "")
foreach(line IN LISTS lines)
  # Itanium names of namespace isoquant: _ZN8isoquant… (also const members: _ZNK8isoquant…).
  if(line MATCHES "^ *([0-9a-f]+ )?([A-Za-z]) (_ZNK?8isoquant[^ ]*)$")
    if(CMAKE_MATCH_2 STREQUAL "U")
      list(APPEND needed "${CMAKE_MATCH_3}")
    else()
      list(APPEND defined "${CMAKE_MATCH_3}")
    endif()
  endif()
endforeach()
list(LENGTH defined definedCount)
if(definedCount EQUAL 0)
  message(FATAL_ERROR "no isoquant symbol defined in ${LIBRARY}")
endif()
list(REMOVE_DUPLICATES needed)
list(REMOVE_ITEM needed ${defined})
if(needed)
  list(JOIN needed "\n  " missing)
  message(FATAL_ERROR "the math layer calls isoquant functions it does not define (c++filt names them):\n  ${missing}")
endif()
message(STATUS "the math layer defines every isoquant symbol it uses (${definedCount} defined)")
