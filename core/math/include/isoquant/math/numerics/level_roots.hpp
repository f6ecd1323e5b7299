// Where a technology reaches a given output along a line through input space: the amount of one
// input with the others held (an isoquant point), or the factor scaling a whole bundle onto the
// isoquant. Both are roots along the line, searched in logarithms.
#pragma once

#include "isoquant/math/forms/technology.hpp"

#include <optional>

namespace isoquant {

// xⱼ > 0 with f(x₁…xⱼ…x_k) = e^logLevel, the other inputs as in `bundle` (its xⱼ is not read);
// empty when no xⱼ in 1e-300…1e300 gives the level. The whole range is searched, split where output
// turns (where ∂ln Y/∂ln xⱼ changes sign) into pieces on which it is monotone in xⱼ. Of several
// roots, the smallest xⱼ at which output rises through the level (a positive marginal product) is
// returned; only where output reaches the level solely while falling in xⱼ, the smallest such xⱼ.
std::optional<double> amountForLevel(const Technology& technology, Eigen::VectorXd bundle, Eigen::Index solved,
                                     double logLevel);

// t > 0 with f(t·bundle) = e^logLevel, under the same rules.
std::optional<double> scaleForLevel(const Technology& technology, const Eigen::VectorXd& bundle, double logLevel);

} // namespace isoquant
