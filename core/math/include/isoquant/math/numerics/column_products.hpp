// Sums of products of a few columns over a block of rows, for the normal-equations route of the
// least-squares factor (normal_equations_factor.cpp): the Gram matrix of [X y], and the refinement's
// residuals with Xᵀr, Σr² and Σ xⱼ·e^r. One pass over the block forms every sum, four doubles a step
// where the processor has AVX2 (column_products_avx2.cpp), else two.
//
// Why both widths give the same bits: each sum has four lanes, row i of a call in lane i mod 4 at
// either width (column_products_packet.hpp), with separate multiplies and adds (the AVX2 copy is
// built without -mfma), and the last count mod 4 rows are added to lanes 0, 1, 2 one double at a
// time with the same operations. The caller adds a sum's lanes as laneTotal does
// (tests/unit/test_column_products.cpp).
#pragma once

#include "isoquant/math/numerics/column_kernels.hpp"

#include <cstddef>

namespace isoquant::column_products {

inline constexpr int lanes = 4;
// The most columns the kernels take (the Cobb-Douglas fit's constant, three or four logs and the
// response); wider designs keep Eigen's products (normal_equations_factor.cpp).
inline constexpr int maxColumns = 6;

// (l₀ + l₁) + (l₂ + l₃).
inline double laneTotal(const double (&sum)[lanes]) { return (sum[0] + sum[1]) + (sum[2] + sum[3]); }

// Adds Σ aⱼ·a_k over rows [0, count) for every pair k ≥ j of the `width` columns (each a pointer to
// the block's first row; width ≤ maxColumns) to sums, pairs in the order (0,0), (0,1), …, (0,w−1),
// (1,1), …: width·(width + 1)/2 of them.
void addCrossProducts(const double* const* columns, int width, std::size_t count, double (*sums)[lanes],
                      column_kernels::Width kernelWidth = column_kernels::Width::automatic);

// rᵢ = yᵢ − Σⱼ bⱼ·xᵢⱼ over rows [0, count), the terms subtracted in column order, into residuals;
// adds Σ xⱼ·r to products[j] (j < columnCount ≤ maxColumns) and Σ r² to squares.
void addResidualProducts(const double* const* design, int columnCount, const double* response,
                         const double* coefficients, std::size_t count, double* residuals, double (*products)[lanes],
                         double (&squares)[lanes], column_kernels::Width kernelWidth = column_kernels::Width::automatic);

// Adds Σ v to sums[0] and Σ xⱼ·v to sums[1 + j] (j < columnCount ≤ maxColumns) over rows [0, count).
void addWeightedSums(const double* const* design, int columnCount, const double* values, std::size_t count,
                     double (*sums)[lanes], column_kernels::Width kernelWidth = column_kernels::Width::automatic);

} // namespace isoquant::column_products
