#include "isoquant/math/fits/translog_fit.hpp"

#include "isoquant/math/numerics/work_limits.hpp"

#include "isoquant/math/numerics/exact_elementwise.hpp"
#include "isoquant/math/messages/input_error.hpp"
#include "isoquant/math/messages/text.hpp"
#include "isoquant/math/fits/returns_to_scale.hpp"

#include <algorithm>
#include <cmath>

namespace isoquant {

std::vector<std::pair<Eigen::Index, Eigen::Index>> translogPairs(Eigen::Index inputs)
{
    std::vector<std::pair<Eigen::Index, Eigen::Index>> pairs;
    for (Eigen::Index i = 0; i < inputs; ++i)
        for (Eigen::Index j = i; j < inputs; ++j) pairs.emplace_back(i, j);
    return pairs;
}

std::string translogPairLabel(const std::vector<std::string>& labels, Eigen::Index first, Eigen::Index second)
{
    return labels[static_cast<std::size_t>(first)] + "*" + labels[static_cast<std::size_t>(second)];
}

Eigen::MatrixXd translogDesign(const Eigen::MatrixXd& logInputs, const Eigen::MatrixXd& controls)
{
    const Eigen::Index k = logInputs.cols();
    const auto pairs = translogPairs(k);
    const auto q = static_cast<Eigen::Index>(pairs.size());
    Eigen::MatrixXd design(logInputs.rows(), 1 + k + q + controls.cols());
    design.col(0).setOnes();
    design.middleCols(1, k) = logInputs;
    for (Eigen::Index c = 0; c < q; ++c) {
        const auto [i, j] = pairs[static_cast<std::size_t>(c)];
        // ½βᵢᵢ(ln xᵢ)² and, for i < j, ½(βᵢⱼ + βⱼᵢ)·ln xᵢ·ln xⱼ = βᵢⱼ·ln xᵢ·ln xⱼ
        design.col(1 + k + c) = ((i == j ? 0.5 : 1.0) * logInputs.col(i).array() * logInputs.col(j).array()).matrix();
    }
    design.rightCols(controls.cols()) = controls;
    return design;
}

namespace {

std::vector<std::string> termLabels(const ProductionData& data)
{
    const auto k = static_cast<Eigen::Index>(data.inputLabels.size());
    std::vector<std::string> labels{"ln A"};
    for (const auto& label : data.inputLabels) labels.push_back(quoted(label));
    for (const auto& [i, j] : translogPairs(k)) labels.push_back(quoted(translogPairLabel(data.inputLabels, i, j)));
    for (const auto& label : data.controlLabels) labels.push_back("control " + quoted(label));
    return labels;
}

InputError collinearTerms(const ProductionData& data, const std::vector<Eigen::Index>& columns)
{
    const std::vector<std::string> labels = termLabels(data);
    const auto firstControl = static_cast<Eigen::Index>(labels.size() - data.controlLabels.size());
    std::vector<std::string> names;
    std::vector<DataPart> parts;
    for (const Eigen::Index column : columns) {
        if (column > 0) names.push_back(labels[static_cast<std::size_t>(column)]);
        const DataPart part = column >= firstControl ? DataPart::controls : DataPart::inputs;
        if (std::find(parts.begin(), parts.end(), part) == parts.end()) parts.push_back(part);
    }
    // One term alone (with ln A, or 0 in every row): say so rather than list one name as collinear.
    if (names.size() == 1)
        return {parts, "the translog term " + names.front() + " does not vary, so it cannot be told apart from ln A"};
    if (std::find(columns.begin(), columns.end(), Eigen::Index{0}) != columns.end()) names.insert(names.begin(), "ln A");
    return {parts, "the translog terms " + listOfNames(names) +
                       " are collinear (inputs taken in logs); use fewer inputs or more varied data"};
}

// A column that does not vary: named before the terms it makes collinear (an input's log, square
// and products, all at once).
void requireVariation(const Eigen::MatrixXd& columns, const std::vector<std::string>& labels, DataPart part,
                      const std::string& prefix)
{
    for (Eigen::Index j = 0; j < columns.cols(); ++j)
        if (columns.rows() > 0 && columns.col(j).maxCoeff() == columns.col(j).minCoeff())
            throw InputError({part}, prefix + quoted(labels[static_cast<std::size_t>(j)]) +
                                         " does not vary, so it cannot be told apart from ln A");
}

void requireTranslogData(const ProductionData& data, const ProductionFitOptions& options)
{
    if (data.inputs.cols() < 1) throw InputError({DataPart::inputs}, "needs at least one column");
    if (options.constantReturns)
        throw InputError({DataPart::constantReturns}, "cannot be imposed on the translog form; leave the argument empty");
    for (std::size_t column = 0; column < data.inputLabels.size(); ++column)
        if (data.inputLabels[column].find('*') != std::string::npos)
            throw InputError({DataPart::inputs}, "column " + std::to_string(column + 1) + " is labelled " +
                             quoted(data.inputLabels[column]) +
                             "; the translog table joins labels with \"*\", so rename it");
    if (data.output.maxCoeff() == data.output.minCoeff())
        throw InputError({DataPart::output}, "every row holds the same value; there is no variation to explain");
}

} // namespace

Eigen::MatrixXd translogElasticityGradients(Eigen::Index k, Eigen::Index parameters, const Eigen::VectorXd& logs)
{
    Eigen::MatrixXd gradients = Eigen::MatrixXd::Zero(k + 1, parameters);
    for (Eigen::Index i = 0; i < k; ++i) gradients(i, 1 + i) = 1.0;
    Eigen::Index column = 1 + k;
    for (const auto& [i, j] : translogPairs(k)) {
        gradients(i, column) += logs(j);
        if (i != j) gradients(j, column) += logs(i);
        ++column;
    }
    gradients.row(k) = gradients.topRows(k).colwise().sum();
    return gradients;
}

ProductionFit fitTranslog(const ProductionData& data, const ProductionFitOptions& options)
{
    requireTranslogData(data, options);
    const Eigen::Index n = data.output.size();
    const Eigen::Index k = data.inputs.cols();
    const Eigen::Index m = data.controls.cols();
    const auto pairs = translogPairs(k);
    const auto q = static_cast<Eigen::Index>(pairs.size());
    const Eigen::Index p = 1 + k + q + m;
    if (n < p + 1)
        throw InputError({DataPart::output, DataPart::inputs}, "too few rows: {parts} have " + std::to_string(n) + " rows of data for " +
                         std::to_string(p) + " parameters of the translog form; need at least " + std::to_string(p + 1));

    checkDesignSize(static_cast<std::size_t>(n), static_cast<std::size_t>(p), DataPart::inputs,
                    "the translog form of " + std::to_string(k) + (k == 1 ? " input" : " inputs"));
    requireVariation(data.inputs, data.inputLabels, DataPart::inputs, "");
    requireVariation(data.controls, data.controlLabels, DataPart::controls, "control ");
    const Eigen::MatrixXd logs = exactLog(data.inputs.array()).matrix();
    const Eigen::MatrixXd design = translogDesign(logs, data.controls);

    LeastSquaresOptions regressionOptions;
    regressionOptions.covariance = options.covariance;
    regressionOptions.confidenceLevel = options.confidenceLevel;
    ProductionFit fit;
    LeastSquaresResult regression;
    try {
        regression = fitLeastSquares(design, exactLog(data.output.array()).matrix(), 0, regressionOptions);
    } catch (const CollinearColumns& collinear) {
        throw collinearTerms(data, collinear.columns());
    }
    fit.form = ProductionForm::translog;
    fit.inputLabels = data.inputLabels;
    fit.controlLabels = data.controlLabels;
    fit.status = regression.status;
    fit.inference = regression.inference;
    fit.summary = regression.summary;
    fit.residuals = regression.residuals;
    fit.rSquared = regression.summary.rSquared;
    fit.adjustedRSquared = regression.summary.adjustedRSquared;
    fit.logScaleAtControlMeans = fit.inference.estimates(0);
    fit.smearingFactor = meanOfExactExps(fit.residuals); // Duan: mean of exp(residual of ln Y)
    if (m > 0) fit.logScaleAtControlMeans += data.controls.colwise().mean().dot(fit.inference.estimates.tail(m));
    if (m > 0) {
        // s = ln A + Σⱼ cⱼ·z̄ⱼ on the regression's own columns (fit_result.hpp), a = (1, 0 …, z̄).
        Eigen::VectorXd weights = Eigen::VectorXd::Zero(p);
        weights(0) = 1.0;
        weights.tail(m) = data.controls.colwise().mean().transpose();
        fit.shiftedScale = shiftedLogScale(Eigen::MatrixXd::Identity(p, p), weights, fit.inference.covariance,
                                           fit.logScaleAtControlMeans, false);
    }

    auto details = std::make_shared<TranslogDetails>();
    details->meanLogInputs = logs.colwise().mean().transpose();
    const Eigen::MatrixXd gradients = translogElasticityGradients(k, p, details->meanLogInputs);
    const Eigen::VectorXd values = gradients * fit.inference.estimates;
    const Eigen::MatrixXd covariance = gradients * fit.inference.covariance * gradients.transpose();
    const Eigen::VectorXd errors = covariance.diagonal().cwiseSqrt();
    details->elasticities = inferParameters(values.head(k), covariance.topLeftCorner(k, k),
                                            regression.summary.residualDegreesOfFreedom, options.confidenceLevel);

    Eigen::MatrixXd interactionsZero = Eigen::MatrixXd::Zero(q, p);
    interactionsZero.middleCols(1 + k, q).setIdentity();
    details->cobbDouglasTest = testLinearRestrictions(regression, interactionsZero, Eigen::VectorXd::Zero(q));
    fit.translog = details;

    const bool testable = !regression.status.is(FitStatusKind::exactFit);
    const WaldTest scaleTest = testLinearRestrictions(regression, gradients.bottomRows(1), Eigen::VectorXd::Ones(1));
    fit.returns.estimate = values(k);
    fit.returns.standardError = errors(k);
    fit.returns.fStatistic = testable ? scaleTest.fStatistic : std::nan("");
    fit.returns.pValue = testable ? scaleTest.pValue : std::nan("");
    fit.returns.verdict =
        classifyReturnsToScale(fit.returns.estimate, fit.returns.pValue, options.confidenceLevel, false);
    return fit;
}

} // namespace isoquant
