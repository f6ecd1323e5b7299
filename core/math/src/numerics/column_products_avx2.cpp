// Compiled with -mavx2 and without -mfma, like column_kernels_avx2.cpp and for the same reasons:
// only Eigen's packet functions of Packet4d and this file's own copies of the packet kernels are
// used here (the test column_kernels_symbols checks what this object defines).
#include "numerics/column_products_wide.hpp"

#if !defined(__AVX2__) || defined(__FMA__)
#error "column_products_avx2.cpp must be built with -mavx2 and without -mfma"
#endif

namespace isoquant::column_products::avx2 {

using Eigen::internal::Packet4d;

void addCrossProducts(const double* const* columns, int width, std::size_t count, double (*sums)[lanes])
{
    withColumnCount(width, [&](auto n) { addCrossProductPackets<Packet4d, decltype(n)::value>(columns, count, sums); });
}

void addResidualProducts(const double* const* design, int columnCount, const double* response,
                         const double* coefficients, std::size_t count, double* residuals, double (*products)[lanes],
                         double* squares)
{
    withColumnCount(columnCount, [&](auto n) {
        residualPackets<Packet4d, decltype(n)::value>(design, response, coefficients, count, residuals, products, squares);
    });
}

void addWeightedSums(const double* const* design, int columnCount, const double* values, std::size_t count,
                     double (*sums)[lanes])
{
    withColumnCount(columnCount, [&](auto n) { weightedPackets<Packet4d, decltype(n)::value>(design, values, count, sums); });
}

} // namespace isoquant::column_products::avx2
