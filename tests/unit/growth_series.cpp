#include "growth_series.hpp"

#include <cmath>
#include <stdexcept>
#include <string>

namespace isoquant::testing {

Eigen::MatrixXd wanderingQuantities(std::mt19937& engine, Eigen::Index periods, Eigen::Index inputs)
{
    std::normal_distribution<double> step(0.0, 0.08);
    Eigen::MatrixXd logQuantities(periods, inputs);
    for (Eigen::Index i = 0; i < inputs; ++i) {
        logQuantities(0, i) = std::log(100.0);
        for (Eigen::Index t = 1; t < periods; ++t) logQuantities(t, i) = logQuantities(t - 1, i) + step(engine);
    }
    return logQuantities.array().exp();
}

Eigen::MatrixXd driftingShares(std::mt19937& engine, Eigen::Index periods, Eigen::Index inputs)
{
    std::uniform_real_distribution<double> start(0.5, 1.5);
    std::normal_distribution<double> step(0.0, 0.05);
    Eigen::MatrixXd weights(periods, inputs);
    for (Eigen::Index i = 0; i < inputs; ++i) {
        weights(0, i) = start(engine);
        for (Eigen::Index t = 1; t < periods; ++t) weights(t, i) = weights(t - 1, i) * std::exp(step(engine));
    }
    for (Eigen::Index t = 0; t < periods; ++t) weights.row(t) /= weights.row(t).sum();
    return weights;
}

Eigen::VectorXd productivityPath(std::mt19937& engine, Eigen::Index periods)
{
    std::normal_distribution<double> step(0.01, 0.02);
    Eigen::VectorXd path(periods);
    path(0) = 0;
    for (Eigen::Index t = 1; t < periods; ++t) path(t) = path(t - 1) + step(engine);
    return path;
}

Eigen::VectorXd outputOf(const Technology& technology, const Eigen::VectorXd& logProductivity,
                         const Eigen::MatrixXd& quantities)
{
    Eigen::VectorXd output(quantities.rows());
    for (Eigen::Index t = 0; t < quantities.rows(); ++t)
        output(t) = std::exp(logProductivity(t) + technology.logOutput(quantities.row(t).transpose()));
    return output;
}

CellTable typedCobbDouglas(double logScale, const Eigen::VectorXd& exponents, const std::vector<std::string>& labels)
{
    CellTable model(static_cast<std::size_t>(exponents.size()) + 2, 2);
    model.set(0, 0, std::string("form"));
    model.set(0, 1, std::string("cobb-douglas"));
    model.set(1, 0, std::string("ln A"));
    model.set(1, 1, logScale);
    for (Eigen::Index i = 0; i < exponents.size(); ++i) {
        model.set(static_cast<std::size_t>(i) + 2, 0, labels.at(static_cast<std::size_t>(i)));
        model.set(static_cast<std::size_t>(i) + 2, 1, exponents(i));
    }
    return model;
}

double TranslogStandIn::logOutput(const Eigen::VectorXd& inputs) const
{
    const Eigen::VectorXd logs = inputs.array().log();
    return constant_ + linear_.dot(logs) + 0.5 * logs.dot(quadratic_ * logs);
}

double TranslogStandIn::output(const Eigen::VectorXd& inputs) const { return std::exp(logOutput(inputs)); }

double TranslogStandIn::marginalProduct(const Eigen::VectorXd& inputs, Eigen::Index input) const
{
    return elasticity(inputs, input) * output(inputs) / inputs(input);
}

double TranslogStandIn::elasticity(const Eigen::VectorXd& inputs, Eigen::Index input) const
{
    return linear_(input) + quadratic_.row(input).dot(inputs.array().log().matrix());
}

double TranslogStandIn::scaleElasticity(const Eigen::VectorXd& inputs) const
{
    double sum = 0;
    for (Eigen::Index i = 0; i < inputCount(); ++i) sum += elasticity(inputs, i);
    return sum;
}

double TranslogStandIn::secondPartial(const Eigen::VectorXd&, Eigen::Index, Eigen::Index) const
{
    throw std::logic_error("TranslogStandIn::secondPartial is not used by the growth tests");
}

} // namespace isoquant::testing
