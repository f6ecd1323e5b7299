// The curvature of a technology at one input bundle in dimensionless form, and what its signs say:
// returns to one input, and whether two inputs are technical complements or substitutes.
//
// With Y = f(x), fᵢ = ∂Y/∂xᵢ and fᵢⱼ = ∂²Y/∂xᵢ∂xⱼ:
//   eᵢ  = xᵢ·fᵢ / Y          (output elasticities; ν = Σ eᵢ is the local returns to scale)
//   Sᵢⱼ = xᵢ·xⱼ·fᵢⱼ / Y      (the Hessian scaled the same way)
// Both are free of the units of output and inputs, so the formulas built on them neither overflow
// nor lose digits where Y or x are very large or very small.
#pragma once

#include "isoquant/math/forms/technology.hpp"

#include <Eigen/Dense>

#include <string>

namespace isoquant {

struct LocalShape {
    Eigen::VectorXd elasticities; // eᵢ
    Eigen::MatrixXd scaledHessian; // Sᵢⱼ
    double scale() const { return elasticities.sum(); }
};

// May hold non-finite entries where a derivative overflows (the solvers test for that).
LocalShape localShape(const Technology& technology, const Eigen::VectorXd& bundle);
// The same, but every entry finite, or InputError naming `place` (e.g. "inputs: row 3").
LocalShape checkedLocalShape(const Technology& technology, const Eigen::VectorXd& bundle, const std::string& place);
bool isFinite(const LocalShape& shape);

// Signs are judged on dimensionless ratios: an elasticity of a marginal product, xⱼ·fᵢⱼ/fᵢ = Sᵢⱼ/eᵢ,
// within ±curvatureTolerance of 0 counts as 0. The exact rule: |Sᵢⱼ| ≤ 1e-10·|eᵢ|. Sums of a few
// terms of order 1 in double precision carry rounding near 1e-15, so a true 0 (a Cobb-Douglas
// exponent of exactly 1, say) is not reported as a sign, while any real curvature is.
inline constexpr double curvatureTolerance = 1e-10;

enum class CurvatureSign { negative, zero, positive };
CurvatureSign curvatureSign(double scaledSecond, double elasticity);

// PRODINPUTRETURNS: "diminishing", "constant" or "increasing" by the sign of fᵢᵢ, or a sentence
// saying the marginal product is not positive (an uneconomic region).
std::string inputReturnsWord(const LocalShape& shape, Eigen::Index input);

// PRODPAIR: "complements", "substitutes" or "independent" by the sign of fᵢⱼ (technical
// complements: more of one raises the marginal product of the other).
std::string inputPairWord(const LocalShape& shape, Eigen::Index first, Eigen::Index second);

} // namespace isoquant
