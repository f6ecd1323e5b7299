#include "isoquant/math/forms/cobb_douglas.hpp"

#include <cmath>

namespace isoquant {

namespace {

// Sums of logs and their exponentials are formed in extended precision: exp(L) carries a relative
// error of about |L|·ε, which for bundles near 1e±300 (|L| ≈ 700) would cost three digits in double.
long double extendedLogOutput(const CobbDouglas& technology, const Eigen::VectorXd& inputs)
{
    long double sum = technology.logScale;
    for (Eigen::Index i = 0; i < inputs.size(); ++i)
        sum += static_cast<long double>(technology.exponents(i)) * std::log(static_cast<long double>(inputs(i)));
    return sum;
}

} // namespace

double CobbDouglas::logOutput(const Eigen::VectorXd& inputs) const
{
    return static_cast<double>(extendedLogOutput(*this, inputs));
}

double CobbDouglas::output(const Eigen::VectorXd& inputs) const
{
    return static_cast<double>(std::exp(extendedLogOutput(*this, inputs)));
}

double CobbDouglas::marginalProduct(const Eigen::VectorXd& inputs, Eigen::Index input) const
{
    return scaledExponential(exponents(input),
                             extendedLogOutput(*this, inputs) - std::log(static_cast<long double>(inputs(input))));
}

double CobbDouglas::secondPartial(const Eigen::VectorXd& inputs, Eigen::Index first, Eigen::Index second) const
{
    const double own = first == second ? 1.0 : 0.0;
    const long double logDenominator =
        std::log(static_cast<long double>(inputs(first))) + std::log(static_cast<long double>(inputs(second)));
    return scaledExponential(exponents(first) * (exponents(second) - own),
                             extendedLogOutput(*this, inputs) - logDenominator);
}

} // namespace isoquant
