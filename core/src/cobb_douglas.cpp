#include "isoquant/cobb_douglas.hpp"

#include <cmath>

namespace isoquant {

double CobbDouglas::output(const Eigen::VectorXd& inputs) const
{
    return std::exp(logScale + exponents.dot(inputs.array().log().matrix()));
}

double CobbDouglas::marginalProduct(const Eigen::VectorXd& inputs, Eigen::Index input) const
{
    return exponents(input) * output(inputs) / inputs(input);
}

double CobbDouglas::secondPartial(const Eigen::VectorXd& inputs, Eigen::Index first, Eigen::Index second) const
{
    const double own = first == second ? 1.0 : 0.0;
    return exponents(first) * (exponents(second) - own) * output(inputs) / (inputs(first) * inputs(second));
}

Eigen::MatrixXd CobbDouglas::hessian(const Eigen::VectorXd& inputs) const
{
    const Eigen::Index k = exponents.size();
    Eigen::MatrixXd second(k, k);
    for (Eigen::Index i = 0; i < k; ++i)
        for (Eigen::Index j = 0; j < k; ++j) second(i, j) = secondPartial(inputs, i, j);
    return second;
}

} // namespace isoquant
