// The CES composite H (ces.hpp) and its derivatives over a whole column of d = ln x₁ − ln x₂
// (internal to the core): what the ces fit evaluates on every row, many times per fit.
//
// The formulas and branches are those of CesCompositeCurve (ces.cpp), K(u) = ln(δeᵘ + 1 − δ),
// u = −ρ·d, H = d·K(u)/u: for |u| ≤ 1 K = log1p(δ·expm1(u)), for |u| > 1 the log-sum-exp form,
// ∂H/∂ρ from its series for |u| < 10⁻³; H is bit for bit CesCompositeCurve::value. Each row takes
// one exp (or expm1) and one log1p, which K, π = ∂H/∂d and the derivatives share, where
// CesCompositeCurve::at takes six such calls. (Eigen's vectorised exp and log, SSE2 without AVX
// as the build compiles them, took as long per value as the C library's scalar ones: 8–10 ns.)
#pragma once

#include <Eigen/Dense>

namespace isoquant::ces_fit {

struct CesColumns {
    Eigen::ArrayXd value;       // H
    Eigen::ArrayXd byLogit;     // ∂H/∂t, δ = 1/(1 + e^(−t)): the solver's; finite even where δ rounds to 0 or 1
    Eigen::ArrayXd byWeight;    // ∂H/∂δ: inference's
    Eigen::ArrayXd byCurvature; // ∂H/∂ρ
};

// Fills `columns`, resized to the rows of logRatio.
void evaluateComposite(const Eigen::VectorXd& logRatio, double weight, double curvature, CesColumns& columns);

} // namespace isoquant::ces_fit
