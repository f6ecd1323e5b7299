// The four-doubles copies of column_products.hpp's kernels, compiled apart with -mavx2
// (column_products_avx2.cpp); called only where the processor has AVX2, for whole packets (`count` a
// multiple of 4). Internal to the math library.
#pragma once

#include "numerics/column_products_packet.hpp"

#include <cstddef>

namespace isoquant::column_products::avx2 {

void addCrossProducts(const double* const* columns, int width, std::size_t count, double (*sums)[lanes]);
void addResidualProducts(const double* const* design, int columnCount, const double* response,
                         const double* coefficients, std::size_t count, double* residuals, double (*products)[lanes],
                         double* squares);
void addWeightedSums(const double* const* design, int columnCount, const double* values, std::size_t count,
                     double (*sums)[lanes]);

} // namespace isoquant::column_products::avx2
