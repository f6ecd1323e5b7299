#include "isoquant/math/forms/translog.hpp"

#include "isoquant/math/numerics/exact_elementwise.hpp"

#include <cmath>

namespace isoquant {

namespace {

Eigen::VectorXd logsOf(const Eigen::VectorXd& inputs) { return exactLog(inputs.array()).matrix(); }

} // namespace

long double Translog::extendedLogOutput(const Eigen::VectorXd& logInputs) const
{
    long double sum = logScale;
    for (Eigen::Index i = 0; i < logInputs.size(); ++i) {
        sum += static_cast<long double>(firstOrder(i)) * logInputs(i);
        for (Eigen::Index j = 0; j < logInputs.size(); ++j)
            sum += 0.5L * interactions(i, j) * static_cast<long double>(logInputs(i)) * logInputs(j);
    }
    return sum;
}

double Translog::logOutput(const Eigen::VectorXd& inputs) const
{
    return static_cast<double>(extendedLogOutput(logsOf(inputs)));
}

double Translog::output(const Eigen::VectorXd& inputs) const
{
    return static_cast<double>(std::exp(extendedLogOutput(logsOf(inputs))));
}

double Translog::elasticity(const Eigen::VectorXd& inputs, Eigen::Index input) const
{
    return firstOrder(input) + interactions.row(input).dot(logsOf(inputs));
}

double Translog::marginalProduct(const Eigen::VectorXd& inputs, Eigen::Index input) const
{
    const Eigen::VectorXd logs = logsOf(inputs);
    return scaledExponential(firstOrder(input) + interactions.row(input).dot(logs),
                             extendedLogOutput(logs) - logs(input));
}

double Translog::scaleElasticity(const Eigen::VectorXd& inputs) const
{
    return firstOrder.sum() + (interactions * logsOf(inputs)).sum();
}

double Translog::secondPartial(const Eigen::VectorXd& inputs, Eigen::Index first, Eigen::Index second) const
{
    const Eigen::VectorXd logs = logsOf(inputs);
    const Eigen::VectorXd elasticities = firstOrder + interactions * logs;
    return secondPartialFromElasticities(extendedLogOutput(logs), inputs, first, second, elasticities(first),
                                         elasticities(second), interactions(first, second));
}

std::optional<double> Translog::constantScaleElasticity() const
{
    if ((interactions.rowwise().sum().array() != 0).any()) return std::nullopt;
    return firstOrder.sum();
}

} // namespace isoquant
