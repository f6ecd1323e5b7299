// ln Σ exp(vᵢ) without overflow: the largest term is taken out first.
#pragma once

#include <Eigen/Dense>

#include <cmath>

namespace isoquant {

inline double logSumExp(const Eigen::ArrayXd& logTerms)
{
    const double largest = logTerms.maxCoeff();
    if (!std::isfinite(largest)) return largest;
    return largest + std::log((logTerms - largest).exp().sum());
}

} // namespace isoquant
