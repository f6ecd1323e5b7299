#include "isoquant/math/numerics/column_products.hpp"

#include "numerics/column_products_packet.hpp"
#include "numerics/column_products_wide.hpp"

namespace isoquant::column_products {

namespace {

using Eigen::internal::Packet2d;

// How many leading rows (whole packets of four) the AVX2 copy takes: all it can where the processor
// has it and the caller did not ask for two doubles; none otherwise.
std::size_t wideShare(std::size_t count, column_kernels::Width kernelWidth)
{
#if defined(ISOQUANT_HAVE_AVX2_KERNELS)
    if (kernelWidth != column_kernels::Width::twoDoubles && column_kernels::fourDoublesAvailable())
        return count - count % lanes;
#else
    (void)count;
    (void)kernelWidth;
#endif
    return 0;
}

} // namespace

void addCrossProducts(const double* const* columns, int width, std::size_t count, double (*sums)[lanes],
                      column_kernels::Width kernelWidth)
{
    const std::size_t packed = count - count % lanes;
    const std::size_t wide = wideShare(count, kernelWidth);
#if defined(ISOQUANT_HAVE_AVX2_KERNELS)
    if (wide > 0) avx2::addCrossProducts(columns, width, wide, sums);
#endif
    if (wide == 0)
        withColumnCount(width, [&](auto n) { addCrossProductPackets<Packet2d, decltype(n)::value>(columns, packed, sums); });
    for (std::size_t i = packed; i < count; ++i) {
        const std::size_t lane = i % lanes;
        int t = 0;
        for (int j = 0; j < width; ++j)
            for (int k = j; k < width; ++k, ++t) sums[t][lane] += columns[k][i] * columns[j][i];
    }
}

void addResidualProducts(const double* const* design, int columnCount, const double* response,
                         const double* coefficients, std::size_t count, double* residuals, double (*products)[lanes],
                         double (&squares)[lanes], column_kernels::Width kernelWidth)
{
    const std::size_t packed = count - count % lanes;
    const std::size_t wide = wideShare(count, kernelWidth);
#if defined(ISOQUANT_HAVE_AVX2_KERNELS)
    if (wide > 0) avx2::addResidualProducts(design, columnCount, response, coefficients, wide, residuals, products, squares);
#endif
    if (wide == 0)
        withColumnCount(columnCount, [&](auto n) {
            residualPackets<Packet2d, decltype(n)::value>(design, response, coefficients, packed, residuals, products,
                                                          squares);
        });
    for (std::size_t i = packed; i < count; ++i) {
        const std::size_t lane = i % lanes;
        double r = response[i];
        for (int j = 0; j < columnCount; ++j) r -= coefficients[j] * design[j][i];
        residuals[i] = r;
        for (int j = 0; j < columnCount; ++j) products[j][lane] += design[j][i] * r;
        squares[lane] += r * r;
    }
}

void addWeightedSums(const double* const* design, int columnCount, const double* values, std::size_t count,
                     double (*sums)[lanes], column_kernels::Width kernelWidth)
{
    const std::size_t packed = count - count % lanes;
    const std::size_t wide = wideShare(count, kernelWidth);
#if defined(ISOQUANT_HAVE_AVX2_KERNELS)
    if (wide > 0) avx2::addWeightedSums(design, columnCount, values, wide, sums);
#endif
    if (wide == 0)
        withColumnCount(columnCount,
                        [&](auto n) { weightedPackets<Packet2d, decltype(n)::value>(design, values, packed, sums); });
    for (std::size_t i = packed; i < count; ++i) {
        const std::size_t lane = i % lanes;
        sums[0][lane] += values[i];
        for (int j = 0; j < columnCount; ++j) sums[1 + j][lane] += design[j][i] * values[i];
    }
}

} // namespace isoquant::column_products
