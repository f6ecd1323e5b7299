// The four-doubles copies of column_kernels.hpp's loops, compiled apart with -mavx2
// (column_kernels_avx2.cpp); called only where the processor has AVX2. Internal to the math library.
#pragma once

#include <cstddef>

namespace isoquant::column_kernels::avx2 {

// Only whole packets: `count` a multiple of 4; the caller takes the rest in two-doubles packets.
void logs(const double* values, double* out, std::size_t count);
bool logsOfNormals(const double* values, double* out, std::size_t count);
void exps(const double* values, double* out, std::size_t count);
void expsAndExpm1s(const double* values, double* exps, double* expm1s, std::size_t count);

} // namespace isoquant::column_kernels::avx2
