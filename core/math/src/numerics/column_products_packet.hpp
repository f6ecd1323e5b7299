// Sums of products of a few columns for the normal-equations route
// (isoquant/math/numerics/column_products.hpp), written once for both widths: column_products.cpp
// instantiates them with two doubles, column_products_avx2.cpp with four. Every sum has four lanes, row i of a call in lane i mod 4: with two doubles a packet
// takes lanes 0–1 over the rows, then lanes 2–3, so a lane adds the same products in the same order
// at both widths. Separate multiplies and adds only. In an unnamed namespace, so that each file has
// its own copy (see column_kernels_avx2.cpp). Internal to the math library.
#pragma once

#include "isoquant/math/numerics/column_products.hpp"

#include <Eigen/Core>

#include <cstddef>
#include <type_traits>

namespace isoquant::column_products {
namespace {

template <typename Packet> constexpr int packetSize = Eigen::internal::unpacket_traits<Packet>::size;

// Adds Σ aⱼ·a_k (k ≥ j, pairs in the order (0,0), (0,1), …, (0,w−1), (1,1), …) over rows [0, count)
// to sums; count a multiple of 4.
template <typename Packet, int width>
void addCrossProductPackets(const double* const* columns, std::size_t count, double (*sums)[lanes])
{
    using namespace Eigen::internal;
    constexpr int size = packetSize<Packet>;
    constexpr int pairs = width * (width + 1) / 2;
    for (int part = 0; part < lanes / size; ++part) {
        const int lane = part * size;
        Packet total[pairs];
        for (int t = 0; t < pairs; ++t) total[t] = ploadu<Packet>(sums[t] + lane);
        for (std::size_t i = static_cast<std::size_t>(lane); i < count; i += lanes) {
            Packet x[width];
            for (int j = 0; j < width; ++j) x[j] = ploadu<Packet>(columns[j] + i);
            int t = 0;
            for (int j = 0; j < width; ++j)
                for (int k = j; k < width; ++k, ++t) total[t] = padd(total[t], pmul(x[k], x[j]));
        }
        for (int t = 0; t < pairs; ++t) pstoreu(sums[t] + lane, total[t]);
    }
}

// rᵢ = yᵢ − Σⱼ bⱼ·xᵢⱼ (j in order) into residuals; adds Σ xⱼ·r to products[j] and Σ r² to
// squares; count a multiple of 4.
template <typename Packet, int columnCount>
void residualPackets(const double* const* design, const double* response, const double* coefficients,
                     std::size_t count, double* residuals, double (*products)[lanes], double* squares)
{
    using namespace Eigen::internal;
    constexpr int size = packetSize<Packet>;
    Packet b[columnCount];
    for (int j = 0; j < columnCount; ++j) b[j] = pset1<Packet>(coefficients[j]);
    for (int part = 0; part < lanes / size; ++part) {
        const int lane = part * size;
        Packet total[columnCount];
        for (int j = 0; j < columnCount; ++j) total[j] = ploadu<Packet>(products[j] + lane);
        Packet squareTotal = ploadu<Packet>(squares + lane);
        for (std::size_t i = static_cast<std::size_t>(lane); i < count; i += lanes) {
            Packet x[columnCount];
            for (int j = 0; j < columnCount; ++j) x[j] = ploadu<Packet>(design[j] + i);
            Packet r = ploadu<Packet>(response + i);
            for (int j = 0; j < columnCount; ++j) r = psub(r, pmul(b[j], x[j]));
            pstoreu(residuals + i, r);
            for (int j = 0; j < columnCount; ++j) total[j] = padd(total[j], pmul(x[j], r));
            squareTotal = padd(squareTotal, pmul(r, r));
        }
        for (int j = 0; j < columnCount; ++j) pstoreu(products[j] + lane, total[j]);
        pstoreu(squares + lane, squareTotal);
    }
}

// Adds Σ v to sums[0] and Σ xⱼ·v to sums[1 + j]; count a multiple of 4.
template <typename Packet, int columnCount>
void weightedPackets(const double* const* design, const double* values, std::size_t count, double (*sums)[lanes])
{
    using namespace Eigen::internal;
    constexpr int size = packetSize<Packet>;
    for (int part = 0; part < lanes / size; ++part) {
        const int lane = part * size;
        Packet total[columnCount + 1];
        for (int j = 0; j <= columnCount; ++j) total[j] = ploadu<Packet>(sums[j] + lane);
        for (std::size_t i = static_cast<std::size_t>(lane); i < count; i += lanes) {
            const Packet v = ploadu<Packet>(values + i);
            total[0] = padd(total[0], v);
            for (int j = 0; j < columnCount; ++j) total[1 + j] = padd(total[1 + j], pmul(ploadu<Packet>(design[j] + i), v));
        }
        for (int j = 0; j <= columnCount; ++j) pstoreu(sums[j] + lane, total[j]);
    }
}

// Calls kernel(std::integral_constant<int, n>()) for the run-time n in [1, maxColumns].
template <typename Kernel> void withColumnCount(int n, Kernel&& kernel)
{
    static_assert(maxColumns == 6);
    switch (n) {
    case 1: kernel(std::integral_constant<int, 1>()); break;
    case 2: kernel(std::integral_constant<int, 2>()); break;
    case 3: kernel(std::integral_constant<int, 3>()); break;
    case 4: kernel(std::integral_constant<int, 4>()); break;
    case 5: kernel(std::integral_constant<int, 5>()); break;
    case 6: kernel(std::integral_constant<int, 6>()); break;
    default: break;
    }
}

} // namespace
} // namespace isoquant::column_products
