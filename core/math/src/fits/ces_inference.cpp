#include "fits/ces_inference.hpp"

#include "isoquant/math/numerics/distributions.hpp"
#include "isoquant/math/numerics/least_squares.hpp"
#include "isoquant/math/fits/returns_to_scale.hpp"
#include "isoquant/math/numerics/not_a_number.hpp"
#include "fits/fit_inference.hpp"


#include <cmath>
#include <limits>

namespace isoquant {

std::string cesStatusWord(NonlinearStatus status)
{
    switch (status) {
    case NonlinearStatus::converged: return convergedText;
    case NonlinearStatus::evaluationLimit: return "not converged";
    case NonlinearStatus::stopped: return "stopped";
    case NonlinearStatus::notIdentified: return "not identified";
    }
    return "stopped";
}

namespace ces_fit {

namespace {

// Why there is no test at the point kept; empty when there is one.
std::string untestedReason(const CesDetails& details)
{
    if (details.convergence != NonlinearStatus::converged) return cesStatusWord(details.convergence);
    if (details.boundary != CesBoundary::none) return "boundary";
    return "";
}

// σ = 1/(1+ρ) with se(σ) = se(ρ)/(1+ρ)² (delta method). σ is decreasing in ρ, so its bounds are
// the bounds of ρ transformed: [1/(1+ρ_high), 1/(1+ρ_low)], the upper one infinite (shown "n/a")
// when ρ_low ≤ −1. Where δ is 0 or 1, ρ is not identified and neither is σ.
void setSubstitution(CesDetails& details, const ProductionFit& fit)
{
    if (details.boundary == CesBoundary::firstInputOnly || details.boundary == CesBoundary::secondInputOnly) {
        details.substitutionElasticity = details.substitutionStandardError = notANumber;
        details.substitutionLowerBound = details.substitutionUpperBound = notANumber;
        return;
    }
    const double onePlusCurvature = 1 + fit.estimates(2);
    details.substitutionElasticity = 1 / onePlusCurvature;
    details.substitutionStandardError = fit.standardErrors(2) / (onePlusCurvature * onePlusCurvature);
    const double low = fit.lowerBounds(2);
    const double high = fit.upperBounds(2);
    details.substitutionLowerBound = 1 / (1 + high);
    details.substitutionUpperBound =
        low > -1 ? 1 / (1 + low) : (std::isnan(low) ? notANumber : std::numeric_limits<double>::infinity());
}

void setSummary(ProductionFit& fit, const CesLogs& logs, const NonlinearInference& inference, double level)
{
    LeastSquaresResult& summary = fit.regression;
    const Eigen::Index n = logs.logOutput.size();
    const double df = inference.residualDegreesOfFreedom;
    const double rss = inference.residualSumOfSquares;
    summary.coefficients = fit.estimates;
    summary.standardErrors = inference.standardErrors;
    summary.covariance = inference.covariance;
    summary.observations = n;
    summary.parameters = parameterCount;
    summary.residualDegreesOfFreedom = df;
    summary.residualSumOfSquares = rss;
    summary.totalSumOfSquares = (logs.logOutput.array() - logs.logOutput.mean()).square().sum();
    summary.rSquared = 1.0 - rss / summary.totalSumOfSquares;
    summary.adjustedRSquared = 1.0 - (1.0 - summary.rSquared) * static_cast<double>(n - 1) / df;
    summary.residualStandardDeviation = inference.residualStandardDeviation;
    summary.fStatistic = notANumber;
    summary.fPValue = notANumber;
    const LikelihoodCriteria likelihood =
        gaussianLikelihood(rss, static_cast<double>(n), static_cast<double>(parameterCount));
    summary.logLikelihood = likelihood.logLikelihood;
    summary.aic = likelihood.aic;
    summary.bic = likelihood.bic;
    summary.interceptColumn = 0;
    summary.confidenceLevel = level;
    const bool exact = std::sqrt(rss) <= LeastSquaresOptions{}.perfectFitTolerance * logs.logOutput.norm();
    summary.status = exact ? FitStatus::perfectFit : FitStatus::ok;
    fit.status = summary.status;
    fit.rSquared = summary.rSquared;
    fit.adjustedRSquared = summary.adjustedRSquared;
}

// ν tested against 1 by F = ((ν−1)/se(ν))² on F(1, n−4); without a test the verdict says why.
void setReturns(ProductionFit& fit, const std::string& untested, double level)
{
    ReturnsToScale& returns = fit.returns;
    returns.estimate = fit.estimates(3);
    returns.standardError = fit.standardErrors(3);
    const double distance = (returns.estimate - 1) / returns.standardError;
    const bool exact = fit.status == FitStatus::perfectFit;
    returns.fStatistic = exact ? notANumber : distance * distance;
    returns.pValue = fisherUpperPValue(returns.fStatistic, 1, fit.regression.residualDegreesOfFreedom);
    returns.verdict = untested.empty() ? classifyReturnsToScale(returns.estimate, returns.pValue, level, false)
                                       : untestedVerdictPrefix + untested + ")";
}

} // namespace

ProductionFit reportAt(const ProductionData& data, const CesLogs& logs, const Eigen::Vector4d& raw, CesDetails details,
                       const ProductionFitOptions& options, double rankTolerance)
{
    const Eigen::VectorXd residuals = rawResiduals(logs, raw);
    NonlinearInference inference = nonlinearInference(rawJacobian(logs, raw, WeightColumn::byWeight), residuals, raw,
                                                      options.confidenceLevel, rankTolerance);
    // JᵀJ singular at an interior optimum: the sum of squares is flat along some direction, so the
    // optimum is not unique; reported as such, not as converged.
    if (details.convergence == NonlinearStatus::converged && details.boundary == CesBoundary::none &&
        !inference.covariance.allFinite())
        details.convergence = NonlinearStatus::notIdentified;
    // At a boundary or away from an identified optimum the classical standard errors mean nothing.
    const std::string untested = untestedReason(details);
    if (!untested.empty()) {
        for (Eigen::VectorXd* column : {&inference.standardErrors, &inference.tStatistics, &inference.pValues,
                                        &inference.lowerBounds, &inference.upperBounds})
            column->setConstant(notANumber);
        inference.covariance.setConstant(notANumber);
    }

    ProductionFit fit;
    fit.form = ProductionForm::ces;
    fit.inputLabels = data.inputLabels;
    setParameterInference(fit, raw, inference);
    fit.logScaleAtControlMeans = raw(0);
    fit.smearingFactor = residuals.array().exp().mean(); // Duan: mean of exp(residual of ln Y)
    setSummary(fit, logs, inference, options.confidenceLevel);
    fit.regression.residuals = residuals;
    setSubstitution(details, fit);
    fit.ces = std::make_shared<CesDetails>(std::move(details));
    setReturns(fit, untested, options.confidenceLevel);
    return fit;
}

} // namespace ces_fit

} // namespace isoquant
