#include "isoquant/math/numerics/parameter_inference.hpp"

#include "isoquant/math/numerics/distributions.hpp"

#include <cmath>

namespace isoquant {

ParameterEstimate ParameterInference::at(Eigen::Index index) const
{
    return {estimates(index),    standardErrors(index), tStatistics(index),
            pValues(index),      lowerBounds(index),    upperBounds(index)};
}

ParameterInference inferParameters(Eigen::VectorXd estimates, Eigen::MatrixXd covariance, double degreesOfFreedom,
                                   double confidenceLevel)
{
    ParameterInference inference;
    inference.estimates = std::move(estimates);
    inference.covariance = std::move(covariance);
    inference.degreesOfFreedom = degreesOfFreedom;
    inference.confidenceLevel = confidenceLevel;
    const Eigen::Index p = inference.estimates.size();
    inference.standardErrors = inference.covariance.diagonal().cwiseSqrt();
    inference.tStatistics = inference.estimates.cwiseQuotient(inference.standardErrors);
    inference.pValues.resize(p);
    for (Eigen::Index j = 0; j < p; ++j)
        inference.pValues(j) = studentTwoSidedPValue(inference.tStatistics(j), degreesOfFreedom);
    const double critical = studentCriticalValue(confidenceLevel, degreesOfFreedom);
    inference.lowerBounds = inference.estimates - critical * inference.standardErrors;
    inference.upperBounds = inference.estimates + critical * inference.standardErrors;
    return inference;
}

double gaussianLogLikelihood(double residualSumOfSquares, double observations)
{
    const double pi = 3.14159265358979323846;
    return -observations / 2.0 * (std::log(2.0 * pi) + std::log(residualSumOfSquares / observations) + 1.0);
}

void setGaussianLikelihood(FitSummary& summary)
{
    summary.logLikelihood =
        gaussianLogLikelihood(summary.residualSumOfSquares, static_cast<double>(summary.observations));
    setInformationCriteria(summary);
}

void setInformationCriteria(FitSummary& summary)
{
    const auto n = static_cast<double>(summary.observations);
    const auto p = static_cast<double>(summary.parameters + summary.absorbedParameters);
    summary.aic = -2.0 * summary.logLikelihood + 2.0 * p;
    summary.bic = -2.0 * summary.logLikelihood + p * std::log(n);
}

double varianceOfCombination(const Eigen::VectorXd& gradient, const Eigen::MatrixXd& covariance)
{
    double variance = 0;
    for (Eigen::Index i = 0; i < gradient.size(); ++i)
        for (Eigen::Index j = 0; j < gradient.size(); ++j)
            if (gradient(i) != 0 && gradient(j) != 0) variance += gradient(i) * covariance(i, j) * gradient(j);
    return variance;
}

} // namespace isoquant
