#include "fits/cost_regression.hpp"

#include "isoquant/math/fits/cost_share_system.hpp"
#include "isoquant/math/fits/translog_fit.hpp"
#include "isoquant/math/messages/input_error.hpp"
#include "isoquant/math/messages/text.hpp"
#include "isoquant/math/numerics/exact_elementwise.hpp"

#include <algorithm>

namespace isoquant {

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
    regression.formColumns = static_cast<Eigen::Index>(columns.size());
    for (Eigen::Index j = 0; j < data.controls.cols(); ++j) {
        columns.push_back(data.controls.col(j));
        regression.termNames.push_back("control " + quoted(data.controlLabels[static_cast<std::size_t>(j)]));
    }
    regression.design.resize(n, static_cast<Eigen::Index>(columns.size()));
    for (std::size_t c = 0; c < columns.size(); ++c) regression.design.col(static_cast<Eigen::Index>(c)) = columns[c];
    return regression;
}

// θ = T·b + t₀ (cost_fit.hpp): the full form's parameters from the regression's.
namespace {

std::pair<Eigen::MatrixXd, Eigen::VectorXd> formParameters(CostForm form, Eigen::Index k, Eigen::Index regressors)
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
        const auto at =
            std::find(reducedPairs.begin(), reducedPairs.end(), std::make_pair(std::min(i, j), std::max(i, j)));
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

} // namespace

std::pair<Eigen::MatrixXd, Eigen::VectorXd> restoredParameters(CostForm form, Eigen::Index k, Eigen::Index formColumns,
                                                               Eigen::Index controls)
{
    const auto [formMap, formShift] = formParameters(form, k, formColumns);
    Eigen::MatrixXd map = Eigen::MatrixXd::Zero(formMap.rows() + controls, formColumns + controls);
    map.topLeftCorner(formMap.rows(), formColumns) = formMap;
    map.bottomRightCorner(controls, controls).setIdentity();
    Eigen::VectorXd shift = Eigen::VectorXd::Zero(map.rows());
    shift.head(formShift.size()) = formShift;
    return {map, shift};
}

namespace {

// Names the terms behind collinear columns of the panel regression's column space: the form's
// terms and controls, then the trend or the period effects; under effects column 0 stands for the
// group effects.
InputError collinearTerms(const NormalisedRegression& normalised, const std::vector<Eigen::Index>& columns,
                          bool effects, bool trend)
{
    std::vector<std::string> names;
    std::vector<DataPart> parts;
    auto involve = [&](const std::string& name, DataPart part) {
        if (std::find(names.begin(), names.end(), name) == names.end()) names.push_back(name);
        if (std::find(parts.begin(), parts.end(), part) == parts.end()) parts.push_back(part);
    };
    const auto base = static_cast<Eigen::Index>(normalised.termNames.size());
    bool withConstant = false;
    for (const Eigen::Index column : columns) {
        if (column == 0)
            withConstant = true;
        else if (column < normalised.formColumns)
            involve(normalised.termNames[static_cast<std::size_t>(column)], DataPart::prices);
        else if (column < base)
            involve(normalised.termNames[static_cast<std::size_t>(column)], DataPart::controls);
        else if (column == base && trend)
            involve("the trend", DataPart::periods);
        else
            involve("the period effects", DataPart::periods);
    }
    if (parts.empty()) parts.push_back(DataPart::prices);
    const std::string constant = effects ? "the group effects" : "the constant";
    // One term alone: with the constant, it does not vary; without it, it is 0 in every row (a
    // price equal to the last one in every row, a control of zeros or of numbers too small to scale).
    if (names.size() == 1)
        return {parts, names.front() + " does not vary" + (effects ? " within any group" : "") +
                           (!withConstant && parts.front() == DataPart::controls ? " (numbers below 2.2e-308 count as 0)" : "") +
                           ", so it cannot be told apart from " + constant};
    if (withConstant) names.push_back(constant);
    return {parts,
            "the cost terms " + listOfNames(names) +
                " are collinear (prices divided by the last one, in logs); use fewer inputs or controls, or more "
                "varied data"};
}

// The cost and share system; a trend is one more column of the cost equation, t − t_first.
PanelRegression runShareSystem(const NormalisedRegression& normalised, const CostData& data,
                               const CostFitOptions& options)
{
    PanelRegression run;
    run.baseColumns = normalised.design.cols();
    Eigen::MatrixXd design = normalised.design;
    if (data.panel.hasPeriods()) {
        run.trendOrigin = data.panel.periods.minCoeff();
        if (data.panel.periods.maxCoeff() == run.trendOrigin)
            throw InputError({DataPart::periods},
                             "every row holds the same period; a trend needs at least two different periods");
        run.trendColumn = design.cols();
        design.conservativeResize(Eigen::NoChange, design.cols() + 1);
        design.col(*run.trendColumn) = (data.panel.periods.array() - run.trendOrigin).matrix();
    }
    run.regression = fitCostShareSystem(design, normalised.response, normalised.relativeLogPrices, normalised.logOutput,
                                        data.shares, options.form, options.confidenceLevel);
    if (run.trendColumn)
        run.latestPeriodShift =
            run.regression.inference.estimates(*run.trendColumn) * (data.panel.periods.maxCoeff() - run.trendOrigin);
    run.smearingFactor = meanOfExactExps(run.regression.residuals);
    return run;
}

} // namespace

PanelRegression runCostRegression(const NormalisedRegression& normalised, const CostData& data,
                                  const CostFitOptions& options)
{
    try {
        if (data.shares.size() != 0) return runShareSystem(normalised, data, options);
        LeastSquaresOptions regressionOptions;
        regressionOptions.covariance = options.covariance;
        regressionOptions.confidenceLevel = options.confidenceLevel;
        return fitPanelRegression(MatrixRows(normalised.design, normalised.response), data.panel, options.effects,
                                  regressionOptions);
    } catch (const CollinearColumns& collinear) {
        throw collinearTerms(normalised, collinear.columns(), options.effects != EffectsKind::none,
                             data.panel.hasPeriods() && options.effects != EffectsKind::twoWay);
    }
}

} // namespace isoquant
