#include "isoquant/math/growth/growth_accounting.hpp"

#include <cmath>

namespace isoquant {

namespace {

// r = g_Y − Σᵢ cᵢ − s: computed the same way in every row, so each row adds up to rounding.
double residual(const GrowthComponents& components)
{
    return components.output - components.inputs.sum() - components.scaleEffect;
}

} // namespace

Eigen::MatrixXd periodElasticities(const Technology& technology, const Eigen::MatrixXd& inputs)
{
    Eigen::MatrixXd elasticities(inputs.rows(), inputs.cols());
    for (Eigen::Index period = 0; period < inputs.rows(); ++period) {
        const Eigen::VectorXd bundle = inputs.row(period).transpose();
        for (Eigen::Index i = 0; i < inputs.cols(); ++i) elasticities(period, i) = technology.elasticity(bundle, i);
    }
    return elasticities;
}

Eigen::MatrixXd tornqvistIntervalWeights(const Eigen::MatrixXd& periodWeights)
{
    const Eigen::Index intervals = periodWeights.rows() - 1;
    return 0.5 * (periodWeights.topRows(intervals) + periodWeights.bottomRows(intervals));
}

GrowthAccount accountForGrowth(const Eigen::VectorXd& output, const Eigen::MatrixXd& inputs,
                               const Eigen::MatrixXd& intervalWeights)
{
    const Eigen::Index k = inputs.cols();
    GrowthAccount account;
    account.total.inputs = Eigen::VectorXd::Zero(k);
    for (Eigen::Index interval = 0; interval + 1 < output.size(); ++interval) {
        const Eigen::VectorXd inputGrowth =
            (inputs.row(interval + 1).array().log() - inputs.row(interval).array().log()).transpose();
        const Eigen::VectorXd weights = intervalWeights.row(interval).transpose();
        const double scale = weights.sum();

        GrowthComponents period;
        period.output = std::log(output(interval + 1)) - std::log(output(interval));
        period.inputs = (weights / scale).cwiseProduct(inputGrowth);
        period.scaleEffect = (scale - 1) * period.inputs.sum();
        period.productivity = residual(period);
        account.periods.push_back(period);

        account.total.inputs += period.inputs;
        account.total.scaleEffect += period.scaleEffect;
    }
    account.total.output = std::log(output(output.size() - 1)) - std::log(output(0));
    account.total.productivity = residual(account.total);
    return account;
}

Eigen::VectorXd productivityLevels(const Technology& technology, const Eigen::VectorXd& output,
                                   const Eigen::MatrixXd& inputs, const Eigen::VectorXd& logScaleShifts)
{
    Eigen::VectorXd levels(output.size());
    for (Eigen::Index row = 0; row < output.size(); ++row) {
        const double shift = logScaleShifts.size() > 0 ? logScaleShifts(row) : 0.0;
        levels(row) = std::exp(std::log(output(row)) - technology.logOutput(inputs.row(row).transpose()) - shift);
    }
    return levels;
}

} // namespace isoquant
