// Where a technology reaches a given output along a line through input space: the amount of one
// input with the others held (an isoquant point), or the factor scaling a whole bundle onto the
// isoquant. Both are roots of an output that rises along the line, searched in logarithms.
#pragma once

#include "isoquant/technology.hpp"

#include <optional>

namespace isoquant {

// xⱼ > 0 with f(x₁…xⱼ…x_k) = e^logLevel, the other inputs as in `bundle`; empty when output does
// not reach the level (or passes it only outside 1e-300…1e300) as xⱼ grows or shrinks from its
// value in `bundle`. Where output is not monotone in xⱼ, the root nearest that value on the side
// the level lies.
std::optional<double> amountForLevel(const Technology& technology, Eigen::VectorXd bundle, Eigen::Index solved,
                                     double logLevel);

// t > 0 with f(t·bundle) = e^logLevel, under the same rules.
std::optional<double> scaleForLevel(const Technology& technology, const Eigen::VectorXd& bundle, double logLevel);

} // namespace isoquant
