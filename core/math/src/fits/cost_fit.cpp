#include "isoquant/math/fits/cost_fit.hpp"

#include "isoquant/math/numerics/distributions.hpp"
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

namespace {

// The regression run: ln(C/w_k) on the normalised terms, and the names of its columns.
struct NormalisedRegression {
    Eigen::MatrixXd design;
    Eigen::VectorXd response;
    std::vector<std::string> termNames;
    Eigen::MatrixXd relativeLogPrices; // ln(wᵢ/w_k), i < k: the share equations' terms
    Eigen::VectorXd logOutput;
};

NormalisedRegression normalisedRegression(const CostData& data, CostForm form)
{
    const Eigen::Index n = data.cost.size();
    const Eigen::Index k = data.prices.cols();
    const Eigen::MatrixXd logPrices = exactLog(data.prices.array()).matrix();
    const Eigen::VectorXd logOutput = exactLog(data.output.array()).matrix();
    const Eigen::MatrixXd relative = logPrices.leftCols(k - 1).colwise() - logPrices.col(k - 1); // ln(wᵢ/w_k)
    const auto lastLabel = data.priceLabels.back();
    NormalisedRegression regression;
    regression.relativeLogPrices = relative;
    regression.logOutput = logOutput;
    regression.response = exactLog(data.cost.array()).matrix() - logPrices.col(k - 1);
    std::vector<Eigen::VectorXd> columns{Eigen::VectorXd::Ones(n), logOutput};
    regression.termNames = {"the constant", "ln output"};
    for (Eigen::Index i = 0; i + 1 < k; ++i) {
        columns.push_back(relative.col(i));
        regression.termNames.push_back("ln(" + data.priceLabels[static_cast<std::size_t>(i)] + "/" + lastLabel + ")");
    }
    if (form == CostForm::translog) {
        columns.push_back(0.5 * logOutput.cwiseProduct(logOutput));
        regression.termNames.push_back("(ln output)²");
        for (const auto& [i, j] : translogPairs(k - 1)) {
            columns.push_back((i == j ? 0.5 : 1.0) * relative.col(i).cwiseProduct(relative.col(j)));
            regression.termNames.push_back(regression.termNames[static_cast<std::size_t>(2 + i)] + "·" +
                                           regression.termNames[static_cast<std::size_t>(2 + j)]);
        }
        for (Eigen::Index i = 0; i + 1 < k; ++i) {
            columns.push_back(relative.col(i).cwiseProduct(logOutput));
            regression.termNames.push_back(regression.termNames[static_cast<std::size_t>(2 + i)] + "·ln output");
        }
    }
    regression.design.resize(n, static_cast<Eigen::Index>(columns.size()));
    for (std::size_t c = 0; c < columns.size(); ++c) regression.design.col(static_cast<Eigen::Index>(c)) = columns[c];
    return regression;
}

// θ = T·b + t₀ (cost_fit.hpp): the full form's parameters from the regression's.
std::pair<Eigen::MatrixXd, Eigen::VectorXd> restoredParameters(CostForm form, Eigen::Index k, Eigen::Index regressors)
{
    const bool translog = form == CostForm::translog;
    const Eigen::Index pairsAll = k * (k + 1) / 2;
    const Eigen::Index parameters = 2 + k + (translog ? 1 + pairsAll + k : 0);
    Eigen::MatrixXd map = Eigen::MatrixXd::Zero(parameters, regressors);
    Eigen::VectorXd shift = Eigen::VectorXd::Zero(parameters);
    map(0, 0) = map(1, 1) = 1.0;
    for (Eigen::Index i = 0; i + 1 < k; ++i) {
        map(2 + i, 2 + i) = 1.0;
        map(2 + k - 1, 2 + i) = -1.0; // β_k = 1 − Σ_{i<k} βᵢ
    }
    shift(2 + k - 1) = 1.0;
    if (!translog) return {map, shift};
    const Eigen::Index yyRow = 2 + k, yyColumn = 2 + (k - 1);
    map(yyRow, yyColumn) = 1.0;
    const auto reducedPairs = translogPairs(k - 1);
    auto reducedColumn = [&](Eigen::Index i, Eigen::Index j) {
        const auto at = std::find(reducedPairs.begin(), reducedPairs.end(), std::make_pair(std::min(i, j), std::max(i, j)));
        return yyColumn + 1 + static_cast<Eigen::Index>(at - reducedPairs.begin());
    };
    Eigen::Index row = yyRow + 1;
    for (const auto& [i, j] : translogPairs(k)) {
        if (j < k - 1) {
            map(row, reducedColumn(i, j)) = 1.0;
        } else if (i < k - 1) { // β_ik = −Σ_{j<k} βᵢⱼ
            for (Eigen::Index other = 0; other + 1 < k; ++other) map(row, reducedColumn(i, other)) -= 1.0;
        } else { // β_kk = Σ_{i,j<k} βᵢⱼ
            for (Eigen::Index a = 0; a + 1 < k; ++a)
                for (Eigen::Index b = 0; b + 1 < k; ++b) map(row, reducedColumn(a, b)) += 1.0;
        }
        ++row;
    }
    const Eigen::Index outputTerms = yyColumn + 1 + static_cast<Eigen::Index>(reducedPairs.size());
    for (Eigen::Index i = 0; i + 1 < k; ++i) {
        map(row + i, outputTerms + i) = 1.0;
        map(row + k - 1, outputTerms + i) = -1.0; // β_ky = −Σ_{i<k} βᵢ_y
    }
    return {map, shift};
}

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
        gradient.tail(k) = fit.meanLogPrices.transpose();
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
    const double logScale = (1.0 - theta(1) - theta.tail(k).dot(fit.meanLogPrices)) / curvature;
    Eigen::RowVectorXd gradient = Eigen::RowVectorXd::Zero(theta.size()); // of ln y*
    gradient(1) = -1.0 / curvature;
    gradient(2 + k) = -logScale / curvature;
    gradient.tail(k) = -fit.meanLogPrices.transpose() / curvature;
    const ParameterEstimate logEstimate =
        inferenceOf(logScale, (gradient * fit.summary.inference.covariance * gradient.transpose())(0, 0), degreesOfFreedom, level);
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
    const double variance = (gradient * fit.summary.inference.covariance * gradient.transpose())(0, 0);
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
        byOutput = theta.tail(k);
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

CostFit fitCost(const CostData& data, const CostFitOptions& options)
{
    const Eigen::Index k = data.prices.cols();
    const bool translog = options.form == CostForm::translog;
    const Eigen::Index regressors = k + 1 + (translog ? 1 + k * (k - 1) / 2 + (k - 1) : 0);
    const bool frontier = options.inefficiency.has_value();
    requireCostData(data, regressors + (frontier ? 2 : 0), frontier);
    if (frontier && data.shares.size() != 0)
        throw InputError({DataPart::shares, DataPart::inefficiency},
                         "{0}: a cost frontier is fitted to the cost equation alone; leave {0} empty, or "
                         "{1} empty for the cost and share system");
    const Eigen::Index n = data.cost.size();
    checkDesignSize(static_cast<std::size_t>(n), static_cast<std::size_t>(regressors), DataPart::prices,
                    translog ? "the translog cost form" : "the Cobb-Douglas cost form");
    const NormalisedRegression normalised = normalisedRegression(data, options.form);

    LeastSquaresOptions regressionOptions;
    regressionOptions.covariance = options.covariance;
    regressionOptions.confidenceLevel = options.confidenceLevel;
    CostFit fit;
    fit.form = options.form;
    fit.priceLabels = data.priceLabels;
    ProductionFit& summary = fit.summary;
    LeastSquaresResult regression;
    try {
        if (data.shares.size() == 0)
            regression = fitLeastSquares(normalised.design, normalised.response, 0, regressionOptions);
        else
            regression = fitCostShareSystem(normalised.design, normalised.response, normalised.relativeLogPrices,
                                            normalised.logOutput, data.shares, options.form, options.confidenceLevel);
    } catch (const CollinearColumns& collinear) {
        std::vector<std::string> names;
        for (const Eigen::Index column : collinear.columns())
            names.push_back(normalised.termNames[static_cast<std::size_t>(column)]);
        throw InputError({DataPart::prices},
                         "the cost terms " + listOfNames(names) +
                             " are collinear (prices divided by the last one, in logs); use fewer inputs or more varied data");
    }
    summary.status = regression.status;
    summary.summary = regression.summary;
    summary.residuals = regression.residuals;
    const auto [map, shift] = restoredParameters(options.form, k, regressors);
    double degreesOfFreedom = regression.summary.inferenceDegreesOfFreedom;
    Eigen::VectorXd coefficients = regression.inference.estimates;
    Eigen::MatrixXd covariance = regression.inference.covariance;
    if (frontier) {
        if (summary.status.is(FitStatusKind::exactFit))
            throw InputError({DataPart::inefficiency}, "{0}: the cost function fits every row exactly, which "
                                                         "leaves no noise for a frontier; leave {0} empty");
        fit.frontier = fitFrontierPart(normalised, regression, *options.inefficiency, options.confidenceLevel);
        coefficients = -fit.frontier->mirrored.coefficients;
        covariance = fit.frontier->mirrored.covariance.topLeftCorner(regressors, regressors);
        degreesOfFreedom = std::numeric_limits<double>::infinity(); // the normal: maximum likelihood
    }
    setParameters(summary, map * coefficients + shift, map * covariance * map.transpose(), degreesOfFreedom,
                  options.confidenceLevel);
    const Eigen::VectorXd logCost = exactLog(data.cost.array()).matrix();
    const double totalSquares = (logCost.array() - logCost.mean()).square().sum();
    summary.rSquared = 1.0 - regression.summary.residualSumOfSquares / totalSquares;
    summary.adjustedRSquared = 1.0 - (1.0 - summary.rSquared) * static_cast<double>(n - 1) /
                                         regression.summary.residualDegreesOfFreedom;
    // Duan: mean of exp(residual of ln C); none for a frontier, whose cost is the least, not a median.
    summary.smearingFactor = frontier ? std::nan("") : regression.residuals.array().exp().mean();

    fit.meanLogOutput = exactLog(data.output.array()).mean();
    fit.meanLogPrices = exactLog(data.prices.array()).matrix().colwise().mean().transpose();
    setReturnsToScale(fit, degreesOfFreedom, options.confidenceLevel);
    fit.efficientScale = efficientScaleOf(fit, degreesOfFreedom, options.confidenceLevel);
    fit.regularity = regularityOf(fit, data);
    return fit;
}

} // namespace isoquant
