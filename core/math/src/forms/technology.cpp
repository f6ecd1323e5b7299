#include "isoquant/math/forms/technology.hpp"

#include <cmath>

namespace isoquant {

Eigen::VectorXd Technology::gradient(const Eigen::VectorXd& inputs) const
{
    Eigen::VectorXd marginalProducts(inputCount());
    for (Eigen::Index i = 0; i < inputCount(); ++i) marginalProducts(i) = marginalProduct(inputs, i);
    return marginalProducts;
}

Eigen::MatrixXd Technology::hessian(const Eigen::VectorXd& inputs) const
{
    const Eigen::Index k = inputCount();
    Eigen::MatrixXd second(k, k);
    for (Eigen::Index i = 0; i < k; ++i)
        for (Eigen::Index j = i; j < k; ++j) second(i, j) = second(j, i) = secondPartial(inputs, i, j);
    return second;
}

double Technology::scaledExponential(double coefficient, long double logMagnitude)
{
    if (coefficient == 0) return 0.0;
    // Within |L| ≤ 4000, e^L and c·e^L (|c| from 5e-324 to 2e308) are normal long doubles, far from
    // overflow and underflow (about e^±11356), so the product is formed directly: one extended log
    // a value fewer, and the same extended precision before the one rounding to double.
    constexpr long double directLimit = 4000;
    if (std::fabs(logMagnitude) <= directLimit)
        return static_cast<double>(static_cast<long double>(coefficient) * std::exp(logMagnitude));
    const long double magnitude = std::exp(std::log(std::fabs(static_cast<long double>(coefficient))) + logMagnitude);
    return std::copysign(static_cast<double>(magnitude), coefficient);
}

double Technology::secondPartialFromElasticities(long double logOutput, const Eigen::VectorXd& inputs,
                                                 Eigen::Index first, Eigen::Index second, double firstElasticity,
                                                 double secondElasticity, double elasticityDerivative)
{
    const double own = first == second ? secondElasticity : 0.0;
    const long double logDenominator =
        std::log(static_cast<long double>(inputs(first))) + std::log(static_cast<long double>(inputs(second)));
    return scaledExponential(firstElasticity * secondElasticity + elasticityDerivative - own,
                             logOutput - logDenominator);
}

} // namespace isoquant
