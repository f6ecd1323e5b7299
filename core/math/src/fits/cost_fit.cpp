#include "isoquant/math/fits/cost_fit.hpp"

#include "fits/cost_regression.hpp"
#include "isoquant/math/fits/panel_summary.hpp"
#include "isoquant/math/numerics/not_a_number.hpp"
#include "isoquant/math/numerics/distributions.hpp"
#include "isoquant/math/numerics/parameter_inference.hpp"
#include "isoquant/math/numerics/exact_elementwise.hpp"
#include "isoquant/math/messages/input_error.hpp"
#include "isoquant/math/fits/cost_share_system.hpp"
#include "isoquant/math/frontier/cost_frontier.hpp"
#include "isoquant/math/messages/text.hpp"
#include "isoquant/math/fits/translog_fit.hpp"
#include "isoquant/math/numerics/work_limits.hpp"
#include "isoquant/math/fits/returns_to_scale.hpp"

#include <algorithm>
#include <cmath>
#include <limits>

namespace isoquant {

std::vector<std::string> costSecondOrderLabels(const std::vector<std::string>& priceLabels)
{
    std::vector<std::string> labels{"output*output"};
    for (const auto& [i, j] : translogPairs(static_cast<Eigen::Index>(priceLabels.size())))
        labels.push_back(translogPairLabel(priceLabels, i, j));
    for (const auto& label : priceLabels) labels.push_back(label + "*output");
    return labels;
}

Eigen::Index priceOutputStart(Eigen::Index prices) { return 3 + prices + prices * (prices + 1) / 2; }

namespace {

ParameterEstimate inferenceOf(double value, double variance, double degreesOfFreedom, double level)
{
    ParameterEstimate estimate;
    estimate.estimate = value;
    estimate.standardError = std::sqrt(std::max(variance, 0.0));
    estimate.tStatistic = value / estimate.standardError;
    estimate.pValue = studentTwoSidedPValue(estimate.tStatistic, degreesOfFreedom);
    const double critical = studentCriticalValue(level, degreesOfFreedom);
    estimate.lowerBound = value - critical * estimate.standardError;
    estimate.upperBound = value + critical * estimate.standardError;
    return estimate;
}

// As inferParameters, but a negative variance (rounding in the share system) counts as 0.
void setParameters(ProductionFit& summary, const Eigen::VectorXd& theta, const Eigen::MatrixXd& covariance,
                   double degreesOfFreedom, double level)
{
    const Eigen::Index p = theta.size();
    ParameterInference& inference = summary.inference;
    inference.estimates = theta;
    inference.covariance = covariance;
    inference.degreesOfFreedom = degreesOfFreedom;
    inference.confidenceLevel = level;
    inference.standardErrors.resize(p);
    inference.tStatistics.resize(p);
    inference.pValues.resize(p);
    inference.lowerBounds.resize(p);
    inference.upperBounds.resize(p);
    for (Eigen::Index i = 0; i < p; ++i) {
        const ParameterEstimate one = inferenceOf(theta(i), covariance(i, i), degreesOfFreedom, level);
        inference.standardErrors(i) = one.standardError;
        inference.tStatistics(i) = one.tStatistic;
        inference.pValues(i) = one.pValue;
        inference.lowerBounds(i) = one.lowerBound;
        inference.upperBounds(i) = one.upperBound;
    }
}

// `parameters` counts σᵥ and σᵤ for a frontier.
void requireCostData(const CostData& data, Eigen::Index parameters, bool frontier)
{
    const Eigen::Index n = data.cost.size();
    if (data.prices.cols() < 1) throw InputError({DataPart::prices}, "needs at least one column");
    if (n < parameters + 1)
        throw InputError({DataPart::cost, DataPart::output, DataPart::prices},
                         "too few rows: {parts} have " + std::to_string(n) + " rows of data for " +
                         std::to_string(parameters) + " parameters to estimate" +
                         (frontier ? " (with noise SD and inefficiency SD)" : "") + "; need at least " +
                         std::to_string(parameters + 1));
    if (data.output.maxCoeff() == data.output.minCoeff())
        throw InputError({DataPart::output}, "every row holds the same value; a cost function needs varied output");
}

} // namespace

namespace {

// ε at the sample means of the logs as gᵀθ (cost_fit.hpp).
Eigen::RowVectorXd elasticityGradient(const CostFit& fit, Eigen::Index parameters)
{
    const Eigen::Index k = static_cast<Eigen::Index>(fit.priceLabels.size());
    Eigen::RowVectorXd gradient = Eigen::RowVectorXd::Zero(parameters);
    gradient(1) = 1.0;
    if (fit.form == CostForm::translog) {
        gradient(2 + k) = fit.meanLogOutput;
        gradient.segment(priceOutputStart(k), k) = fit.meanLogPrices.transpose();
    }
    return gradient;
}

// y* where ε = 1 at the mean log prices, for a translog whose ε rises with output (β_yy > 0).
std::optional<ParameterEstimate> efficientScaleOf(const CostFit& fit, double degreesOfFreedom, double level)
{
    if (fit.form != CostForm::translog) return std::nullopt; // θ has no β_yy
    const Eigen::Index k = static_cast<Eigen::Index>(fit.priceLabels.size());
    const Eigen::VectorXd& theta = fit.summary.inference.estimates;
    const double curvature = theta(2 + k);
    if (!(curvature > 0)) return std::nullopt;
    const double logScale = (1.0 - theta(1) - theta.segment(priceOutputStart(k), k).dot(fit.meanLogPrices)) / curvature;
    Eigen::RowVectorXd gradient = Eigen::RowVectorXd::Zero(theta.size()); // of ln y*
    gradient(1) = -1.0 / curvature;
    gradient(2 + k) = -logScale / curvature;
    gradient.segment(priceOutputStart(k), k) = -fit.meanLogPrices.transpose() / curvature;
    const ParameterEstimate logEstimate =
        inferenceOf(logScale, varianceOfCombination(gradient.transpose(), fit.summary.inference.covariance),
                    degreesOfFreedom, level);
    ParameterEstimate scale;
    scale.estimate = std::exp(logScale);
    scale.standardError = scale.estimate * logEstimate.standardError;
    scale.tStatistic = scale.pValue = std::nan(""); // y* = 0 is no hypothesis anyone holds
    scale.lowerBound = std::exp(logEstimate.lowerBound); // bounds of ln y*, taken back: always positive
    scale.upperBound = std::exp(logEstimate.upperBound);
    return scale;
}

void setReturnsToScale(CostFit& fit, double degreesOfFreedom, double level)
{
    const Eigen::RowVectorXd gradient = elasticityGradient(fit, fit.summary.inference.estimates.size());
    const double variance = varianceOfCombination(gradient.transpose(), fit.summary.inference.covariance);
    fit.costElasticity = inferenceOf(gradient.dot(fit.summary.inference.estimates), variance, degreesOfFreedom, level);
    const double elasticity = fit.costElasticity.estimate;
    ReturnsToScale& returns = fit.summary.returns;
    returns.estimate = 1.0 / elasticity;
    returns.standardError = fit.costElasticity.standardError / (elasticity * elasticity);
    const bool testable = !fit.summary.status.is(FitStatusKind::exactFit);
    const double deviation = (elasticity - 1.0) / fit.costElasticity.standardError;
    returns.fStatistic = testable ? deviation * deviation : std::nan("");
    // F(1, ∞) is χ²(1)/1: the Wald test of a maximum-likelihood fit.
    const double pValue = std::isinf(degreesOfFreedom) ? chiSquaredUpperPValue(returns.fStatistic, 1.0)
                                                       : fisherUpperPValue(returns.fStatistic, 1.0, degreesOfFreedom);
    returns.pValue = testable ? pValue : std::nan("");
    returns.verdict = classifyReturnsToScale(returns.estimate, returns.pValue, level, false);
}

// sᵢ = βᵢ + Σⱼ βᵢⱼ ln wⱼ + βᵢ_y ln y at every row, from θ in table order.
CostRegularityTally regularityOf(const CostFit& fit, const CostData& data)
{
    const Eigen::Index k = data.prices.cols();
    const Eigen::VectorXd& theta = fit.summary.inference.estimates;
    Eigen::MatrixXd interactions = Eigen::MatrixXd::Zero(k, k);
    Eigen::VectorXd byOutput = Eigen::VectorXd::Zero(k);
    if (fit.form == CostForm::translog) {
        Eigen::Index at = 3 + k;
        for (const auto& [i, j] : translogPairs(k)) interactions(i, j) = interactions(j, i) = theta(at++);
        byOutput = theta.segment(priceOutputStart(k), k);
    }
    const Eigen::MatrixXd logPrices = exactLog(data.prices.array()).matrix();
    Eigen::MatrixXd shares = logPrices * interactions + exactLog(data.output.array()).matrix() * byOutput.transpose();
    shares.rowwise() += theta.segment(2, k).transpose();
    return tallyCostRegularity(shares, interactions, data.priceLabels);
}

// The frontier's β and the covariance of β, from the mirrored fit (cost_frontier.hpp).
CostFrontierPart fitFrontierPart(const NormalisedRegression& normalised, const LeastSquaresResult& regression,
                                 InefficiencyDistribution distribution, double level)
{
    CostFrontierPart part;
    part.mirrored = fitMirroredCostFrontier(normalised.design, normalised.response, regression.inference.estimates, distribution);
    part.scales = frontierScaleEstimates(part.mirrored, level);
    return part;
}

} // namespace

namespace {

// The combinations a cost fit does not offer (cost_fit.hpp), and the panel columns' checks.
void requireCostOptions(const CostData& data, const CostFitOptions& options)
{
    requirePanelColumns(data.panel, data.cost.size(), DataPart::cost, options.effects, options.covariance);
    const bool shares = data.shares.size() != 0;
    if (options.inefficiency) {
        if (shares)
            throw InputError({DataPart::shares, DataPart::inefficiency},
                             "{0}: a cost frontier is fitted to the cost equation alone; leave {0} empty, or "
                             "{1} empty for the cost and share system");
        for (const auto& [given, part] : {std::pair{data.panel.hasGroups(), DataPart::groups},
                                          std::pair{options.effects != EffectsKind::none, DataPart::effects},
                                          std::pair{data.panel.hasPeriods(), DataPart::periods}})
            if (given)
                throw InputError({part, DataPart::inefficiency},
                                 "{0}: not available with a cost frontier, which takes controls but no panel options "
                                 "(its inefficiency would mix with group effects or a trend); leave {0} empty");
    }
    if (shares && options.effects != EffectsKind::none)
        throw InputError({DataPart::effects, DataPart::shares},
                         "{0}: not available with {1}: the share equations would need group effects of their own; fit "
                         "without {1} for effects");
}

// θ's covariance T·V·Tᵀ; under effects the constant (the mean group effect) has none
// (panel_regression.hpp): its row and column read NaN, set after the product so that they stay
// out of every other entry.
Eigen::MatrixXd parameterCovariance(const Eigen::MatrixXd& map, const Eigen::MatrixXd& covariance, bool effects)
{
    Eigen::MatrixXd mapped = map * covariance * map.transpose();
    if (effects) {
        mapped.row(0).setConstant(notANumber);
        mapped.col(0).setConstant(notANumber);
    }
    return mapped;
}

// R² and R̄² of ln C, the constant at the controls' means and the panel's account.
void describeCostFit(CostFit& fit, const CostData& data, const CostFitOptions& options, const PanelRegression& run)
{
    ProductionFit& summary = fit.summary;
    const LeastSquaresResult& regression = run.regression;
    const Eigen::Index n = data.cost.size();
    const Eigen::VectorXd logCost = exactLog(data.cost.array()).matrix();
    const double totalSquares = (logCost.array() - logCost.mean()).square().sum();
    summary.rSquared = 1.0 - regression.summary.residualSumOfSquares / totalSquares;
    summary.adjustedRSquared =
        1.0 - (1.0 - summary.rSquared) * static_cast<double>(n - 1) / regression.summary.residualDegreesOfFreedom;
    const Eigen::Index m = data.controls.cols();
    summary.controlLabels = data.controlLabels;
    summary.logScaleAtControlMeans = summary.inference.estimates(0);
    if (m > 0)
        summary.logScaleAtControlMeans += data.controls.colwise().mean().dot(summary.inference.estimates.tail(m));
    if (!fit.frontier)
        summary.panel = summarisePanel(data.panel, options.effects, run, regression, summary.logScaleAtControlMeans);
}

// The evaluators' constant with controls, a trend or effects (fit_result.hpp): s = β₀ + Σⱼ cⱼ·z̄ⱼ
// (+ λ·(t_last − t_first) with a trend, + the last period's effect under two-way effects), where
// under effects the row-weighted mean group effect m stands for β₀. θ = T·b + t₀ on the
// regression's first columns, so on all of them (the trend's or the period effects', a frontier's
// σᵥ and σᵤ after) a = [Tᵀ·a_θ | Δt at the trend | 0 … 1 at the last period | 0], a_θ =
// (1, 0 … 0, z̄₁ … z̄ₘ) with its 1 at β₀ replaced by m under effects, and θ's map is [T 0].
std::optional<ShiftedLogScale> costShiftedScale(const CostFit& fit, const CostData& data, const PanelRegression& run,
                                                const Eigen::MatrixXd& map, const Eigen::MatrixXd& covariance)
{
    const Eigen::Index m = data.controls.cols();
    const bool effects = run.effectsAbsorbConstant;
    if (!effects && m == 0 && !run.trendColumn) return std::nullopt;
    Eigen::VectorXd parameterWeights = Eigen::VectorXd::Zero(map.rows());
    parameterWeights(0) = effects ? 0.0 : 1.0;
    if (m > 0) parameterWeights.tail(m) = data.controls.colwise().mean().transpose();
    Eigen::VectorXd weights = Eigen::VectorXd::Zero(covariance.rows());
    weights.head(map.cols()) = map.transpose() * parameterWeights;
    if (run.trendColumn) weights(*run.trendColumn) = data.panel.periods.maxCoeff() - run.trendOrigin;
    if (!run.periodValues.empty()) weights(covariance.rows() - 1) = 1.0; // the last period's effect
    Eigen::MatrixXd parameterMap = Eigen::MatrixXd::Zero(map.rows(), covariance.rows());
    parameterMap.leftCols(map.cols()) = map;
    const bool forPredictions = effects || run.trendColumn.has_value();
    ShiftedLogScale shifted = shiftedLogScale(
        parameterMap, weights, covariance,
        forPredictions ? fit.summary.panel.logScaleForPredictions : fit.summary.logScaleAtControlMeans,
        forPredictions, effects ? &run.meanEffect : nullptr);
    if (effects) shifted.withParameters(0) = notANumber; // β₀, the plain mean effect, has no covariance
    return shifted;
}

} // namespace

CostFit fitCost(const CostData& data, const CostFitOptions& options)
{
    const Eigen::Index k = data.prices.cols();
    const bool translog = options.form == CostForm::translog;
    const Eigen::Index formColumns = k + 1 + (translog ? 1 + k * (k - 1) / 2 + (k - 1) : 0);
    const Eigen::Index regressors = formColumns + data.controls.cols();
    const bool frontier = options.inefficiency.has_value();
    requireCostOptions(data, options);
    requireCostData(data, regressors + panelParameterCount(data.panel, options.effects) + (frontier ? 2 : 0), frontier);
    checkDesignSize(static_cast<std::size_t>(data.cost.size()), static_cast<std::size_t>(regressors), DataPart::prices,
                    translog ? "the translog cost form" : "the Cobb-Douglas cost form");
    const NormalisedRegression normalised = normalisedRegression(data, options.form);
    const PanelRegression run = runCostRegression(normalised, data, options);
    const LeastSquaresResult& regression = run.regression;

    CostFit fit;
    fit.form = options.form;
    fit.priceLabels = data.priceLabels;
    ProductionFit& summary = fit.summary;
    summary.status = regression.status;
    summary.summary = regression.summary;
    summary.residuals = regression.residuals;
    const auto [map, shift] = restoredParameters(options.form, k, formColumns, data.controls.cols());
    double degreesOfFreedom = regression.summary.inferenceDegreesOfFreedom;
    Eigen::VectorXd coefficients = regression.inference.estimates.head(regressors);
    Eigen::MatrixXd covariance = regression.inference.covariance.topLeftCorner(regressors, regressors);
    if (frontier) {
        if (summary.status.is(FitStatusKind::exactFit))
            throw InputError({DataPart::inefficiency}, "{0}: the cost function fits every row exactly, which "
                                                         "leaves no noise for a frontier; leave {0} empty");
        fit.frontier = fitFrontierPart(normalised, regression, *options.inefficiency, options.confidenceLevel);
        coefficients = -fit.frontier->mirrored.coefficients;
        covariance = fit.frontier->mirrored.covariance.topLeftCorner(regressors, regressors);
        degreesOfFreedom = std::numeric_limits<double>::infinity(); // the normal: maximum likelihood
    }
    setParameters(summary, map * coefficients + shift,
                  parameterCovariance(map, covariance, options.effects != EffectsKind::none), degreesOfFreedom,
                  options.confidenceLevel);
    describeCostFit(fit, data, options, run);
    summary.shiftedScale = costShiftedScale(
        fit, data, run, map, frontier ? fit.frontier->mirrored.covariance : regression.inference.covariance);
    // Duan: mean of exp(residual of ln C); none for a frontier, whose cost is the least, not a median.
    summary.smearingFactor = frontier ? std::nan("") : run.smearingFactor;

    fit.meanLogOutput = exactLog(data.output.array()).mean();
    fit.meanLogPrices = exactLog(data.prices.array()).matrix().colwise().mean().transpose();
    setReturnsToScale(fit, degreesOfFreedom, options.confidenceLevel);
    fit.efficientScale = efficientScaleOf(fit, degreesOfFreedom, options.confidenceLevel);
    fit.regularity = regularityOf(fit, data);
    return fit;
}

} // namespace isoquant
