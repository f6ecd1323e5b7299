// The CES composite H (ces.hpp) and its derivatives over a whole column of d = ln x₁ − ln x₂: what
// the ces fit evaluates on every row, many times per fit.
//
// The formulas and branches are those of CesCompositeCurve (ces.cpp), K(u) = ln(δeᵘ + 1 − δ),
// u = −ρ·d, H = d·K(u)/u: for |u| ≤ 1 K = log1p(δ·expm1(u)), for |u| > 1 the log-sum-exp form,
// ∂H/∂ρ from its series for |u| < 10⁻³. At an interior δ each row takes one expm1 (|u| ≤ 1, by its
// series) or one exp (|u| > 1), and one log1p, shared by K, π = ∂H/∂d and the derivatives, in
// packets of four rows where the processor has AVX2, else two (numerics/column_kernels_packet.hpp:
// Eigen's packet exp and log, the rounding of 1 + x undone to first order for log1p, no fused
// multiply-adds, so both widths give the same bits; a packet whose rows all have |u| ≤ 1 takes no
// exp; d/u = −1/ρ is taken once, not per row).
// Each value is within a few units in the last place of the same formulas in long double
// (tests/unit/test_ces_columns.cpp); CesCompositeCurve takes six scalar calls a row instead.
// Where δ is 0 or 1, or so near that δ(1 − δ) is subnormal, the rows go through CesCompositeCurve
// itself (its forms handle the infinite logs). A subnormal ρ is taken as 0 (the columns' values
// differ from ρ = 0's by a relative O(ρ·d) < 1e-290).
#pragma once

#include "isoquant/math/numerics/column_kernels.hpp"

#include <Eigen/Dense>

#include <array>

namespace isoquant {

struct CesColumns {
    Eigen::ArrayXd value;       // H
    Eigen::ArrayXd byLogit;     // ∂H/∂t, δ = 1/(1 + e^(−t)): the solver's; finite even where δ rounds to 0 or 1
    Eigen::ArrayXd byWeight;    // ∂H/∂δ: inference's
    Eigen::ArrayXd byCurvature; // ∂H/∂ρ
};

// Fills `columns`, resized to the rows of logRatio. `width` is for the tests, as in column_kernels.hpp.
void evaluateComposite(const Eigen::VectorXd& logRatio, double weight, double curvature, CesColumns& columns,
                       column_kernels::Width width = column_kernels::Width::automatic);

// The thirteen sums the ces fit's Gauss–Newton steps take over the rows, with g = ∂H/∂t,
// c = ∂H/∂ρ, l = b + H (b = ln x₂) and r the residuals, in this order:
//   Σg, Σc, Σl, Σg², Σcg, Σlg, Σc², Σlc, Σl², Σr, Σgr, Σcr, Σlr.
// One pass over the rows; each sum in four lanes (row i in lane i mod 4), the lanes added as
// (0 + 1) + (2 + 3), so both widths give the same bits. `width` is for the tests.
inline constexpr int cesNormalSumCount = 13;
std::array<double, cesNormalSumCount> cesNormalSums(const CesColumns& columns, const Eigen::VectorXd& logSecond,
                                                    const Eigen::VectorXd& residuals,
                                                    column_kernels::Width width = column_kernels::Width::automatic);

} // namespace isoquant
