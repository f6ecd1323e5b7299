#include "fits/ces_inference.hpp"

#include "isoquant/math/fits/returns_to_scale.hpp"
#include "isoquant/math/numerics/distributions.hpp"
#include "isoquant/math/numerics/exact_elementwise.hpp"
#include "isoquant/math/numerics/least_squares.hpp"
#include "isoquant/math/numerics/not_a_number.hpp"

#include <cmath>
#include <limits>

namespace isoquant::ces_fit {

namespace {

// Why there is no test at the point kept; empty when there is one.
std::string untestedReason(FitStatusKind kind)
{
    switch (kind) {
    case FitStatusKind::ok:
    case FitStatusKind::illConditioned:
    case FitStatusKind::exactFit: return "";
    case FitStatusKind::boundary: return "boundary";
    case FitStatusKind::notConverged:
    case FitStatusKind::stopped:
    case FitStatusKind::notIdentified: break;
    }
    return convergenceWord(kind);
}

// The solver's status, made notIdentified where JᵀJ is singular at a converged interior optimum
// (the sum of squares is flat along some direction, so the optimum is not unique) and boundary
// where it converged on the edge.
FitStatus statusAt(FitStatus status, const CesDetails& details, const ParameterInference& inference)
{
    if (!status.is(FitStatusKind::ok)) return status; // notConverged or stopped
    if (details.boundary != CesBoundary::none)
        status.kind = FitStatusKind::boundary;
    else if (!inference.covariance.allFinite())
        status.kind = FitStatusKind::notIdentified;
    return status;
}

// σ = 1/(1+ρ) with se(σ) = se(ρ)/(1+ρ)² (delta method). σ is decreasing in ρ, so its bounds are
// the bounds of ρ transformed: [1/(1+ρ_high), 1/(1+ρ_low)], the upper one infinite (shown "n/a")
// when ρ_low ≤ −1. Where δ is 0 or 1, ρ is not identified and neither is σ.
void setSubstitution(CesDetails& details, const ParameterInference& inference)
{
    if (details.boundary == CesBoundary::firstInputOnly || details.boundary == CesBoundary::secondInputOnly) {
        details.substitutionElasticity = details.substitutionStandardError = notANumber;
        details.substitutionLowerBound = details.substitutionUpperBound = notANumber;
        return;
    }
    const double onePlusCurvature = 1 + inference.estimates(2);
    details.substitutionElasticity = 1 / onePlusCurvature;
    details.substitutionStandardError = inference.standardErrors(2) / (onePlusCurvature * onePlusCurvature);
    const double low = inference.lowerBounds(2);
    const double high = inference.upperBounds(2);
    details.substitutionLowerBound = 1 / (1 + high);
    details.substitutionUpperBound =
        low > -1 ? 1 / (1 + low) : (std::isnan(low) ? notANumber : std::numeric_limits<double>::infinity());
}

// The solver's summary (n, p, RSS, n − p, s) completed with TSS and R² of ln Y about its mean and
// the Gaussian likelihood; the ces has no overall F.
FitSummary summaryOf(const CesLogs& logs, const Eigen::VectorXd& residuals)
{
    FitSummary summary = nonlinearSummary(residuals, parameterCount);
    const auto n = static_cast<double>(summary.observations);
    summary.totalSumOfSquares = (logs.logOutput.array() - logs.logOutput.mean()).square().sum();
    summary.rSquared = 1.0 - summary.residualSumOfSquares / summary.totalSumOfSquares;
    summary.adjustedRSquared = 1.0 - (1.0 - summary.rSquared) * (n - 1) / summary.residualDegreesOfFreedom;
    summary.fStatistic = notANumber;
    summary.fPValue = notANumber;
    setGaussianLikelihood(summary);
    return summary;
}

// ν tested against 1 by F = ((ν−1)/se(ν))² on F(1, n−4); without a test the verdict says why.
void setReturns(ProductionFit& fit, const std::string& untested, double level)
{
    ReturnsToScale& returns = fit.returns;
    returns.estimate = fit.inference.estimates(3);
    returns.standardError = fit.inference.standardErrors(3);
    const double distance = (returns.estimate - 1) / returns.standardError;
    const bool exact = fit.status.is(FitStatusKind::exactFit);
    returns.fStatistic = exact ? notANumber : distance * distance;
    returns.pValue = fisherUpperPValue(returns.fStatistic, 1, fit.summary.residualDegreesOfFreedom);
    returns.verdict = untested.empty() ? classifyReturnsToScale(returns.estimate, returns.pValue, level, false)
                                       : untestedVerdictPrefix + untested + ")";
}

} // namespace

ProductionFit reportAt(const ProductionData& data, const CesModel& model, const CesLogs& logs, const Eigen::Vector4d& raw,
                       CesDetails details, FitStatus solverStatus, const ProductionFitOptions& options,
                       double rankTolerance)
{
    ProductionFit fit;
    RawEvaluation evaluation = evaluateRaw(logs, raw, model.evaluatedAt(raw(1), raw(2)));
    fit.residuals = std::move(evaluation.residuals);
    fit.inference = nonlinearInference(std::move(evaluation.jacobian), fit.residuals, raw, options.confidenceLevel, rankTolerance);
    fit.status = statusAt(std::move(solverStatus), details, fit.inference);
    // At a boundary or away from an identified optimum the classical standard errors mean nothing.
    const std::string untested = untestedReason(fit.status.kind);
    if (!untested.empty()) {
        ParameterInference& inference = fit.inference;
        for (Eigen::VectorXd* column : {&inference.standardErrors, &inference.tStatistics, &inference.pValues,
                                        &inference.lowerBounds, &inference.upperBounds})
            column->setConstant(notANumber);
        inference.covariance.setConstant(notANumber);
    }
    fit.summary = summaryOf(logs, fit.residuals);
    const bool exact = std::sqrt(fit.summary.residualSumOfSquares) <=
                       LeastSquaresOptions{}.perfectFitTolerance * logs.logOutput.norm();
    if (exact && fit.status.is(FitStatusKind::ok)) fit.status.kind = FitStatusKind::exactFit;

    fit.form = ProductionForm::ces;
    fit.inputLabels = data.inputLabels;
    fit.rSquared = fit.summary.rSquared;
    fit.adjustedRSquared = fit.summary.adjustedRSquared;
    fit.logScaleAtControlMeans = raw(0);
    fit.smearingFactor = meanOfExactExps(fit.residuals); // Duan: mean of exp(residual of ln Y)
    setSubstitution(details, fit.inference);
    fit.ces = std::make_shared<CesDetails>(std::move(details));
    setReturns(fit, untested, options.confidenceLevel);
    return fit;
}

} // namespace isoquant::ces_fit
