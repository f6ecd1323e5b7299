#include "isoquant/math/forms/cost_duality.hpp"

#include <cmath>
#include <iomanip>
#include <limits>
#include <sstream>

namespace isoquant {

namespace {

std::optional<double> finiteOrNothing(double value)
{
    if (!std::isfinite(value)) return std::nullopt;
    return value;
}

std::string listed(const std::vector<std::string>& names)
{
    std::string text;
    for (std::size_t i = 0; i < names.size(); ++i)
        text += (i == 0 ? "" : i + 1 == names.size() ? " and " : ", ") + names[i];
    return text;
}

// Relative to the size of the shares, a cost elasticity this close to 1 counts as 1: a typed model
// of constant returns written with 15 digits (common practice, no source).
constexpr double unitElasticityTolerance = 1e-12;

} // namespace

Eigen::MatrixXd scaledCostHessian(const Eigen::VectorXd& shares, const Eigen::MatrixXd& interactions)
{
    Eigen::MatrixXd scaled = interactions + shares * shares.transpose();
    scaled.diagonal() -= shares;
    return scaled;
}

double demandFromAllen(double allen, double secondShare) { return secondShare * allen; }

std::optional<double> costPriceElasticity(const Eigen::VectorXd& shares, const Eigen::MatrixXd& interactions,
                                          Eigen::Index first, Eigen::Index second, PriceElasticityKind kind)
{
    const Eigen::MatrixXd scaled = scaledCostHessian(shares, interactions);
    auto demand = [&](Eigen::Index i, Eigen::Index j) -> std::optional<double> {
        if (shares(i) == 0) return std::nullopt;
        return finiteOrNothing(scaled(i, j) / shares(i));
    };
    switch (kind) {
    case PriceElasticityKind::demand: return demand(first, second);
    case PriceElasticityKind::allen:
        if (shares(first) == 0 || shares(second) == 0) return std::nullopt;
        return finiteOrNothing(scaled(first, second) / (shares(first) * shares(second)));
    case PriceElasticityKind::morishima: {
        const auto cross = demand(first, second), own = demand(second, second);
        if (!cross || !own) return std::nullopt;
        return finiteOrNothing(*cross - *own);
    }
    }
    return std::nullopt;
}

std::string costRegularityPhrase(const Eigen::VectorXd& shares, const Eigen::MatrixXd& interactions,
                                 const std::vector<std::string>& labels, const CostRegularityOptions& options)
{
    std::vector<std::string> notPositive;
    for (Eigen::Index i = 0; i < shares.size(); ++i)
        if (!(shares(i) > 0)) notPositive.push_back(labels[static_cast<std::size_t>(i)]);
    const Eigen::MatrixXd scaled = scaledCostHessian(shares, interactions);
    if (!scaled.allFinite()) return "cannot be judged: the shares are too large to represent";
    std::string phrase;
    if (!notPositive.empty())
        phrase = (notPositive.size() == 1 ? "fitted share of " : "fitted shares of ") + listed(notPositive) +
                 (notPositive.size() == 1 ? " is" : " are") + " not positive";
    const Eigen::SelfAdjointEigenSolver<Eigen::MatrixXd> eigen(scaled, Eigen::EigenvaluesOnly);
    const double largest = eigen.eigenvalues().maxCoeff();
    if (largest > options.zeroTolerance * std::max(scaled.cwiseAbs().maxCoeff(), 1.0))
        phrase += std::string(phrase.empty() ? "" : "; ") +
                  "cost not concave in prices (the Hessian of cost in the prices is not negative semidefinite)";
    return phrase.empty() ? "regular" : phrase;
}

CostRegularityTally tallyCostRegularity(const Eigen::MatrixXd& fittedShares, const Eigen::MatrixXd& interactions,
                                        const std::vector<std::string>& labels)
{
    CostRegularityTally tally;
    for (Eigen::Index row = 0; row < fittedShares.rows(); ++row) {
        const std::string phrase = costRegularityPhrase(fittedShares.row(row).transpose(), interactions, labels);
        if (phrase == "regular") continue;
        if (tally.irregularRows++ == 0) {
            tally.firstRow = row;
            tally.firstPhrase = phrase;
        }
    }
    return tally;
}

EfficientScale efficientScaleOfLogQuadratic(double elasticityAtUnitOutput, double elasticitySlope)
{
    if (elasticitySlope > 0) {
        const double logOutput = (1.0 - elasticityAtUnitOutput) / elasticitySlope;
        const double output = std::exp(logOutput);
        if (std::isfinite(output) && output >= std::numeric_limits<double>::min()) return {output, ""};
        std::ostringstream where;
        where << std::setprecision(6) << logOutput;
        return {std::nullopt, "No efficient scale a cell can hold: average cost is lowest where ln(output) = " +
                                  where.str()};
    }
    if (elasticitySlope < 0) return {std::nullopt, averageCostHasMaximum};
    if (std::fabs(elasticityAtUnitOutput - 1.0) <= unitElasticityTolerance) return {std::nullopt, averageCostFlat};
    return {std::nullopt, elasticityAtUnitOutput < 1 ? averageCostFallsForever : averageCostRisesForever};
}

} // namespace isoquant
