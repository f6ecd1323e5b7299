#include "isoquant/math/forms/cobb_douglas.hpp"

#include <cmath>

namespace isoquant {

namespace {

// Sums of logs and their exponentials are formed in extended precision: exp(L) carries a relative
// error of about |L|·ε, which for bundles near 1e±300 (|L| ≈ 700) would cost three digits in double.
// With `chosen`, ln x_chosen is also handed back in `chosenLog`, so that a caller needing it does
// not take that (slow, extended) log twice: a column of marginal products is mostly these logs.
long double extendedLogOutput(const CobbDouglas& technology, const Eigen::VectorXd& inputs, Eigen::Index chosen = -1,
                              long double* chosenLog = nullptr)
{
    long double sum = technology.logScale;
    for (Eigen::Index i = 0; i < inputs.size(); ++i) {
        const long double logInput = std::log(static_cast<long double>(inputs(i)));
        if (i == chosen) *chosenLog = logInput;
        sum += static_cast<long double>(technology.exponents(i)) * logInput;
    }
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
    long double logInput = 0;
    const long double logOutput = extendedLogOutput(*this, inputs, input, &logInput);
    return scaledExponential(exponents(input), logOutput - logInput);
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
