#include "isoquant/math/fits/cost_share_system.hpp"

#include "isoquant/math/numerics/distributions.hpp"
#include "isoquant/math/messages/input_error.hpp"
#include "isoquant/math/fits/translog_fit.hpp"

#include <cmath>
#include <string>

namespace isoquant {

std::vector<Eigen::MatrixXd> costShareDesigns(const Eigen::MatrixXd& relativeLogPrices, const Eigen::VectorXd& logOutput,
                                              CostForm form, Eigen::Index regressors)
{
    const Eigen::Index n = logOutput.size(), reduced = relativeLogPrices.cols(); // k − 1
    std::vector<Eigen::MatrixXd> designs;
    const auto pairs = translogPairs(reduced);
    const Eigen::Index firstPair = 2 + reduced + 1, firstOutputTerm = firstPair + static_cast<Eigen::Index>(pairs.size());
    for (Eigen::Index i = 0; i < reduced; ++i) {
        Eigen::MatrixXd design = Eigen::MatrixXd::Zero(n, regressors);
        design.col(2 + i).setOnes(); // βᵢ
        if (form == CostForm::translog) {
            // ∂/∂ln w̃ᵢ of ½βᵢᵢ(ln w̃ᵢ)² is βᵢᵢ ln w̃ᵢ; of βₐ_b ln w̃ₐ ln w̃_b (a < b) the other log.
            for (std::size_t pair = 0; pair < pairs.size(); ++pair) {
                const auto [a, b] = pairs[pair];
                const Eigen::Index column = firstPair + static_cast<Eigen::Index>(pair);
                if (a == i) design.col(column) = relativeLogPrices.col(b);
                else if (b == i) design.col(column) = relativeLogPrices.col(a);
            }
            design.col(firstOutputTerm + i) = logOutput;
        }
        designs.push_back(std::move(design));
    }
    return designs;
}

namespace {

void describeSystem(LeastSquaresResult& result, const SystemFit& system, Eigen::Index n, Eigen::Index m, double level)
{
    const Eigen::Index p = system.coefficients.size();
    ParameterInference& inference = result.inference;
    FitSummary& summary = result.summary;
    inference.estimates = system.coefficients;
    inference.covariance = system.covariance;
    result.residuals = system.residuals.col(0);
    summary.observations = n;
    summary.parameters = p;
    summary.residualDegreesOfFreedom = static_cast<double>(n - p);
    summary.inferenceDegreesOfFreedom = static_cast<double>(n * m - p);
    summary.residualSumOfSquares = result.residuals.squaredNorm();
    summary.residualStandardDeviation = std::sqrt(summary.residualSumOfSquares / static_cast<double>(n));
    inference.standardErrors = system.covariance.diagonal().cwiseMax(0.0).cwiseSqrt();
    inference.tStatistics = inference.estimates.cwiseQuotient(inference.standardErrors);
    inference.degreesOfFreedom = summary.inferenceDegreesOfFreedom;
    inference.confidenceLevel = level;
    summary.logLikelihood = system.logLikelihood; // of the whole system, not of the cost equation alone
    setInformationCriteria(summary);
    const Eigen::VectorXd slopes = system.coefficients.tail(p - 1);
    const Eigen::MatrixXd slopeCovariance = system.covariance.bottomRightCorner(p - 1, p - 1);
    summary.overallRestrictions = p - 1;
    summary.fStatistic = slopes.dot(slopeCovariance.ldlt().solve(slopes)) / static_cast<double>(p - 1);
    summary.fPValue = fisherUpperPValue(summary.fStatistic, static_cast<double>(p - 1), summary.inferenceDegreesOfFreedom);
    result.interceptColumn = 0;
}

} // namespace

LeastSquaresResult fitCostShareSystem(const Eigen::MatrixXd& design, const Eigen::VectorXd& response,
                                      const Eigen::MatrixXd& relativeLogPrices, const Eigen::VectorXd& logOutput,
                                      const Eigen::MatrixXd& shares, CostForm form, double confidenceLevel)
{
    std::vector<Eigen::MatrixXd> designs{design};
    std::vector<Eigen::VectorXd> responses{response};
    for (auto& shareDesign : costShareDesigns(relativeLogPrices, logOutput, form, design.cols()))
        designs.push_back(std::move(shareDesign));
    for (Eigen::Index i = 0; i + 1 < shares.cols(); ++i) responses.push_back(shares.col(i));
    const SystemFit system = iteratedSeeminglyUnrelated(designs, responses);
    switch (system.status) {
    case SystemStatus::converged: break;
    case SystemStatus::notConverged:
        throw InputError({DataPart::shares}, "the cost and share equations did not converge in " +
                         std::to_string(system.iterations - 1) + " rounds; fit without shares");
    case SystemStatus::singularCovariance:
        throw InputError({DataPart::shares}, "a share equation fits exactly (or two equations' errors move together exactly), so "
                         "the system cannot weigh them; fit without shares");
    case SystemStatus::singularDesign:
        throw InputError({DataPart::prices}, "the cost and share terms are collinear; use fewer inputs or more varied data");
    }
    LeastSquaresResult result;
    describeSystem(result, system, response.size(), static_cast<Eigen::Index>(designs.size()), confidenceLevel);
    return result;
}

} // namespace isoquant
