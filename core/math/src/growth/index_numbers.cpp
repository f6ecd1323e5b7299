#include "isoquant/math/growth/index_numbers.hpp"

#include <cmath>

namespace isoquant {

namespace {

// ln Σᵢ wᵢ·exp(aᵢ) over the items with wᵢ > 0, shifted by the largest aᵢ so that a quantity
// relative too large (or small) for a double still gives a finite link when the link is finite.
double logWeightedSumOfExponentials(const Eigen::VectorXd& weights, const Eigen::VectorXd& logTerms)
{
    double largest = -INFINITY;
    for (Eigen::Index i = 0; i < weights.size(); ++i)
        if (weights(i) > 0) largest = std::max(largest, logTerms(i));
    double sum = 0;
    for (Eigen::Index i = 0; i < weights.size(); ++i)
        if (weights(i) > 0) sum += weights(i) * std::exp(logTerms(i) - largest);
    return largest + std::log(sum);
}

} // namespace

double logQuantityLink(IndexFormula formula, const Eigen::VectorXd& previousQuantities,
                       const Eigen::VectorXd& currentQuantities, const Eigen::VectorXd& previousShares,
                       const Eigen::VectorXd& currentShares)
{
    const Eigen::VectorXd logRelatives =
        currentQuantities.array().log() - previousQuantities.array().log();
    const auto laspeyres = [&] { return logWeightedSumOfExponentials(previousShares, logRelatives); };
    const auto paasche = [&] { return -logWeightedSumOfExponentials(currentShares, -logRelatives); };
    switch (formula) {
    case IndexFormula::tornqvist: return 0.5 * (previousShares + currentShares).dot(logRelatives);
    case IndexFormula::laspeyres: return laspeyres();
    case IndexFormula::paasche: return paasche();
    case IndexFormula::fisher: return 0.5 * (laspeyres() + paasche());
    }
    return NAN;
}

Eigen::VectorXd chainedLogQuantityIndex(IndexFormula formula, const Eigen::MatrixXd& quantities,
                                        const Eigen::MatrixXd& shares)
{
    Eigen::VectorXd logIndex = Eigen::VectorXd::Zero(quantities.rows());
    for (Eigen::Index period = 1; period < quantities.rows(); ++period)
        logIndex(period) = logIndex(period - 1) +
                           logQuantityLink(formula, quantities.row(period - 1).transpose(),
                                           quantities.row(period).transpose(), shares.row(period - 1).transpose(),
                                           shares.row(period).transpose());
    return logIndex;
}

} // namespace isoquant
