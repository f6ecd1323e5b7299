// Whether a technology is regular at a bundle: every marginal product positive and the function
// quasi-concave (convex isoquants), judged by the bordered Hessian.
//
// Bordered Hessian B = [[0, ∇Yᵀ], [∇Y, ∇²Y]]; with D_r the leading principal minor of order r+1
// (the border and the first r inputs), Y is quasi-concave near x when (−1)ʳ·D_r > 0 for r = 2…k
// (the minors alternate in sign, starting positive at r = 2). The minors are formed from
// Bᵢⱼ·xᵢ·xⱼ/Y (a congruence by diag(1, x)/√Y, which keeps every sign) so that their size does not
// depend on the units: the border becomes the elasticities εᵢ.
#pragma once

#include "isoquant/math/forms/technology.hpp"

#include <string>
#include <vector>

namespace isoquant {

struct RegularityOptions {
    // A minor counts as 0 (neither sign: quasi-concave but not strictly, as with linear isoquants)
    // when |D_r| ≤ this·(max |Bᵢⱼ| of the scaled minor)^(r+1) (common practice, no source).
    double zeroTolerance = 1e-10;
};

// "regular", or what fails, in words: e.g. "marginal product of capital is not positive" or
// "not quasi-concave: the isoquant of labour and capital bends the wrong way".
std::string regularityPhrase(const Technology& technology, const Eigen::VectorXd& inputs,
                             const std::vector<std::string>& inputLabels, const RegularityOptions& options = {});

} // namespace isoquant
