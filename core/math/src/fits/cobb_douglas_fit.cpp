#include "isoquant/math/fits/cobb_douglas_fit.hpp"

#include "isoquant/math/fits/panel_summary.hpp"
#include "isoquant/math/fits/returns_to_scale.hpp"
#include "isoquant/math/messages/input_error.hpp"
#include "isoquant/math/messages/text.hpp"
#include "isoquant/math/numerics/exact_elementwise.hpp"
#include "isoquant/math/numerics/work_limits.hpp"
#include "isoquant/math/numerics/not_a_number.hpp"

#include <algorithm>
#include <cmath>
#include <limits>
#include <utility>

namespace isoquant {

namespace {

// The regression behind a Cobb-Douglas fit, its rows taken a block at a time (logs included):
//   ln Y = ln A + Σᵢ bᵢ ln xᵢ + Σⱼ cⱼ zⱼ,   or with constant returns imposed
//   ln(Y/x_k) = ln A + Σ_{i<k} bᵢ ln(xᵢ/x_k) + Σⱼ cⱼ zⱼ,  b_k = 1 − Σ_{i<k} bᵢ.
// The logs of the first pass are kept (n × (1 + slopes) doubles, the size of the data itself), so
// that the passes after the first read them instead of taking them again: the logs are most of a fit's
// time (tests/benchmarks/RESULTS.md), and the kept values are bitwise those of the first pass.
class CobbDouglasRows : public RegressionRows {
public:
    CobbDouglasRows(const ProductionData& data, bool constantReturns) : data_(data), constantReturns_(constantReturns) {}

    Eigen::Index rows() const override { return data_.output.size(); }
    Eigen::Index columns() const override { return 1 + slopes() + data_.controls.cols(); }

    void fill(Eigen::Index first, Eigen::Ref<Eigen::MatrixXd> design, Eigen::Ref<Eigen::VectorXd> response) const override
    {
        const Eigen::Index count = design.rows();
        design.col(0).setOnes();
        if (first + count <= rowsKept_ || keepLogs(first, count)) {
            response = keptLogs_.col(0).segment(first, count);
            design.middleCols(1, slopes()) = keptLogs_.block(first, 1, count, slopes());
        } else {
            Eigen::MatrixXd logs(count, 1 + slopes());
            takeLogs(first, logs);
            response = logs.col(0);
            design.middleCols(1, slopes()) = logs.rightCols(slopes());
        }
        // Without controls their matrix has no storage: a block of it would offset a null pointer.
        if (data_.controls.cols() > 0) design.rightCols(data_.controls.cols()) = data_.controls.middleRows(first, count);
    }

    // Once the first pass has kept every row's logs: the constant, the kept slopes, the controls.
    std::optional<HeldColumns> heldColumns() const override
    {
        if (rowsKept_ < rows()) return std::nullopt;
        return held();
    }

    std::optional<HeldColumns> holdRows(Eigen::Index first, Eigen::Index count) const override
    {
        if (first + count <= rowsKept_ || keepLogs(first, count)) return held();
        return std::nullopt;
    }

private:
    Eigen::Index slopes() const { return constantReturns_ ? data_.inputs.cols() - 1 : data_.inputs.cols(); }

    HeldColumns held() const
    {
        HeldColumns held;
        held.design.push_back(nullptr);
        for (Eigen::Index j = 0; j < slopes(); ++j) held.design.push_back(keptLogs_.col(1 + j).data());
        for (Eigen::Index j = 0; j < data_.controls.cols(); ++j) held.design.push_back(data_.controls.col(j).data());
        held.response = keptLogs_.col(0).data();
        return held;
    }

    // Takes the logs of rows first … first + count − 1 into the kept columns, where the first pass
    // has reached them (it takes the rows in order); false elsewhere.
    bool keepLogs(Eigen::Index first, Eigen::Index count) const
    {
        if (first != rowsKept_) return false;
        if (first == 0) keptLogs_.resize(rows(), 1 + slopes());
        takeLogs(first, keptLogs_.middleRows(first, count));
        rowsKept_ = first + count;
        return true;
    }

    // logs = [ln Y, ln x₁ … ] of rows first … first + logs.rows() − 1 (with constant returns imposed,
    // each less ln x_k), each column contiguous.
    void takeLogs(Eigen::Index first, Eigen::Ref<Eigen::MatrixXd> logs) const
    {
        const Eigen::Index count = logs.rows();
        const Eigen::Index k = data_.inputs.cols();
        exactLogs(data_.output.data() + first, &logs(0, 0), count);
        for (Eigen::Index j = 0; j < slopes(); ++j) exactLogs(&data_.inputs(first, j), &logs(0, 1 + j), count);
        if (constantReturns_) {
            Eigen::VectorXd lastLog(count);
            exactLogs(&data_.inputs(first, k - 1), lastLog.data(), count);
            logs.colwise() -= lastLog;
        }
    }

    const ProductionData& data_;
    bool constantReturns_;
    mutable Eigen::MatrixXd keptLogs_; // ln Y (or ln(Y/x_k)), then the slopes' columns
    mutable Eigen::Index rowsKept_ = 0;
};

// How the regression's parameters θ map back to β = (ln A, b₁…b_k, c₁…c_m):  β = transform·θ + offset.
struct ParameterMap {
    Eigen::MatrixXd transform;
    Eigen::VectorXd offset;
};

ParameterMap parameterMap(Eigen::Index k, Eigen::Index m, bool constantReturns)
{
    const Eigen::Index slopes = constantReturns ? k - 1 : k;
    ParameterMap map;
    map.transform = Eigen::MatrixXd::Zero(1 + k + m, 1 + slopes + m);
    map.offset = Eigen::VectorXd::Zero(1 + k + m);
    map.transform(0, 0) = 1.0;
    for (Eigen::Index j = 0; j < m; ++j) map.transform(1 + k + j, 1 + slopes + j) = 1.0;
    for (Eigen::Index i = 0; i < slopes; ++i) map.transform(1 + i, 1 + i) = 1.0;
    if (constantReturns) {
        map.transform.block(k, 1, 1, slopes).setConstant(-1.0);
        map.offset(k) = 1.0;
    }
    return map;
}

// Σ(ln Y − mean ln Y)², by two passes over Y (no vector of logs is kept).
double centredSumOfSquaresOfLogs(const Eigen::VectorXd& output)
{
    const double mean = exactLog(output.array()).mean();
    return (exactLog(output.array()) - mean).square().sum();
}

// TSS of ln Y: the regression's own when its response is ln Y with a constant column (no
// constant returns imposed, no group effects), else counted apart.
double totalSumOfSquaresOfLogs(const ProductionData& data, const ProductionFitOptions& options,
                               const LeastSquaresResult& regression)
{
    const bool responseIsLogOutput = !options.constantReturns && options.effects == EffectsKind::none;
    return responseIsLogOutput ? regression.summary.totalSumOfSquares : centredSumOfSquaresOfLogs(data.output);
}

// Names the inputs, controls, trend or period effects behind collinear design columns (in the
// panel regression's extended column space), in the user's labels.
InputError collinearityError(const ProductionData& data, bool constantReturns, EffectsKind effects,
                             const std::vector<Eigen::Index>& columns)
{
    const auto k = static_cast<Eigen::Index>(data.inputLabels.size());
    const auto m = static_cast<Eigen::Index>(data.controlLabels.size());
    const Eigen::Index slopes = constantReturns ? k - 1 : k;
    const bool hasTrend = data.panel.hasPeriods() && effects != EffectsKind::twoWay;
    bool withConstant = false;
    std::vector<std::string> names;
    std::vector<DataPart> parts;
    auto involve = [&parts](DataPart part) {
        if (std::find(parts.begin(), parts.end(), part) == parts.end()) parts.push_back(part);
    };
    for (const Eigen::Index column : columns) {
        if (column == 0) {
            withConstant = true;
        } else if (column <= slopes) {
            names.push_back(quoted(data.inputLabels[static_cast<std::size_t>(column - 1)]));
            involve(DataPart::inputs);
        } else if (column <= slopes + m) {
            names.push_back("control " + quoted(data.controlLabels[static_cast<std::size_t>(column - 1 - slopes)]));
            involve(DataPart::controls);
        } else if (hasTrend && column == 1 + slopes + m) {
            names.push_back("the trend");
            involve(DataPart::periods);
        } else if (std::find(names.begin(), names.end(), "the period effects") == names.end()) {
            names.push_back("the period effects");
            involve(DataPart::periods);
        }
    }
    const std::string note =
        constantReturns ? " (as ratios to " + quoted(data.inputLabels.back()) + ", since constant returns are imposed)" : "";
    const bool groupEffects = effects != EffectsKind::none;
    const std::string constant = groupEffects ? "the group effects" : "ln A";
    if (parts.empty()) parts.push_back(DataPart::inputs);
    if (names.empty()) return {parts, "the data cannot identify " + constant + note};
    // One column alone: with the constant, it does not vary; without it, it is 0 in every row (an
    // input of 1 in every row has the log 0; a control of zeros, or of numbers too small to scale).
    if (names.size() == 1) {
        const bool plural = names.front() == "the period effects";
        const bool tinyControl = !withConstant && parts.front() == DataPart::controls;
        return {parts, names.front() + note + (plural ? " do not vary" : " does not vary") +
                           (groupEffects ? " within any group" : "") +
                           (tinyControl ? " (numbers below 2.2e-308 count as 0)" : "") + ", so " +
                           (plural ? "they" : "it") + " cannot be told apart from " + constant};
    }
    return {parts, listOfNames(names) + (withConstant ? " together with " + constant : "") + note +
                       " are collinear (inputs taken in logs); drop one of them"};
}

// The evaluators' ln A with controls, a trend or effects (fit_result.hpp): s = ln A + Σⱼ cⱼ·z̄ⱼ
// (+ λ·(t_last − t_first) with a trend, + the last period's effect under two-way effects), where
// under effects the row-weighted mean effect m stands for ln A. In the extended columns
// [base | trend | period effects] θ = [T 0]·β + offset, so a = [Tᵀ·a_θ | t_last − t_first | 0 … 1]
// with a_θ = (1, 0 … 0, z̄₁ … z̄ₘ), its 1 at ln A replaced by m under effects.
std::optional<ShiftedLogScale> cobbDouglasShiftedScale(const ProductionData& data, const ProductionFit& fit,
                                                        const PanelRegression& run, const Eigen::MatrixXd& transform)
{
    const Eigen::Index m = data.controls.cols();
    const bool effects = run.effectsAbsorbConstant;
    if (!effects && m == 0 && !run.trendColumn) return std::nullopt;
    const Eigen::MatrixXd& covariance = fit.regressionInference.covariance;
    const Eigen::Index columns = covariance.rows();
    Eigen::VectorXd parameterWeights = Eigen::VectorXd::Zero(transform.rows());
    parameterWeights(0) = effects ? 0.0 : 1.0;
    if (m > 0) parameterWeights.tail(m) = data.controls.colwise().mean().transpose();
    Eigen::VectorXd weights = Eigen::VectorXd::Zero(columns);
    weights.head(transform.cols()) = transform.transpose() * parameterWeights;
    if (run.trendColumn) weights(*run.trendColumn) = data.panel.periods.maxCoeff() - run.trendOrigin;
    if (!run.periodValues.empty()) weights(columns - 1) = 1.0; // the last period's effect
    Eigen::MatrixXd parameterMap = Eigen::MatrixXd::Zero(transform.rows(), columns);
    parameterMap.leftCols(transform.cols()) = transform;
    const bool forPredictions = effects || run.trendColumn.has_value();
    ShiftedLogScale shifted =
        shiftedLogScale(parameterMap, weights, covariance,
                        forPredictions ? fit.panel.logScaleForPredictions : fit.logScaleAtControlMeans, forPredictions,
                        effects ? &run.meanEffect : nullptr);
    if (effects) shifted.withParameters(0) = notANumber; // ln A, the plain mean effect, has no covariance
    return shifted;
}

// λ's row of the covariance block with a trend (fit_result.hpp, TrendCovariance).
std::optional<TrendCovariance> cobbDouglasTrendCovariance(const ProductionFit& fit, const PanelRegression& run,
                                                          const Eigen::MatrixXd& transform)
{
    if (!run.trendColumn) return std::nullopt;
    const Eigen::MatrixXd& covariance = fit.regressionInference.covariance;
    const Eigen::Index trend = *run.trendColumn;
    TrendCovariance result;
    result.withParameters = transform * covariance.col(trend).head(transform.cols());
    if (run.effectsAbsorbConstant) result.withParameters(0) = notANumber;
    result.withShiftedScale = fit.shiftedScale->withColumns(trend);
    result.variance = covariance(trend, trend);
    return result;
}

} // namespace

ProductionFit fitCobbDouglas(const ProductionData& data, const ProductionFitOptions& options)
{
    const Eigen::Index n = data.output.size();
    const Eigen::Index k = data.inputs.cols();
    const Eigen::Index m = data.controls.cols();
    if (k < 1) throw InputError({DataPart::inputs}, "needs at least one column");
    requirePanelColumns(data.panel, data.output.size(), DataPart::output, options.effects, options.covariance);

    const CobbDouglasRows rows(data, options.constantReturns);
    const ParameterMap map = parameterMap(k, m, options.constantReturns);
    const Eigen::Index baseColumns = rows.columns();
    const Eigen::Index p = baseColumns + panelParameterCount(data.panel, options.effects);
    // The design is held in full with a trend or effects, or when it needs the long double route.
    const Eigen::Index trendColumns = data.panel.hasPeriods() && options.effects != EffectsKind::twoWay ? 1 : 0;
    checkDesignSize(static_cast<std::size_t>(n), static_cast<std::size_t>(baseColumns + trendColumns), DataPart::inputs,
                    "the cobb-douglas form with " + std::to_string(baseColumns + trendColumns) + " regression columns");
    if (n < p + 1) {
        const std::string groupNote = options.effects == EffectsKind::none
                                          ? ""
                                          : " (" + std::to_string(data.panel.groupLabels.size()) + " group effects included)";
        throw InputError({DataPart::output, DataPart::inputs}, "too few rows: {parts} have " + std::to_string(n) + (n == 1 ? " row" : " rows") +
                         " of data for " + std::to_string(p) + " parameters to estimate" + groupNote +
                         "; need at least " + std::to_string(p + 1));
    }
    // Compared on the data, not on TSS: the mean of equal logs need not round back exactly. The
    // search stops at the first value that differs (the second row, as a rule), not after 2n reads.
    if (std::all_of(data.output.begin(), data.output.end(), [&](double value) { return value == data.output(0); }))
        throw InputError({DataPart::output}, "every row holds the same value; there is no variation to explain");

    LeastSquaresOptions regressionOptions;
    regressionOptions.covariance = options.covariance;
    regressionOptions.confidenceLevel = options.confidenceLevel;
    regressionOptions.keepResiduals = false; // no figure reads them (fit_result.hpp)
    ProductionFit fit;
    PanelRegression run;
    try {
        run = fitPanelRegression(rows, data.panel, options.effects, regressionOptions);
    } catch (const CollinearColumns& collinear) {
        throw collinearityError(data, options.constantReturns, options.effects, collinear.columns());
    }
    const LeastSquaresResult& regression = run.regression;

    fit.form = options.form;
    fit.inputLabels = data.inputLabels;
    fit.controlLabels = data.controlLabels;
    fit.status = regression.status;
    fit.summary = regression.summary;
    fit.regressionInference = regression.inference;
    // The form's parameters come from the base columns; the trend and period effects are reported apart.
    Eigen::MatrixXd covariance = map.transform * regression.inference.covariance.topLeftCorner(baseColumns, baseColumns) *
                                 map.transform.transpose();
    if (run.effectsAbsorbConstant) {
        // ln A is the mean group effect, reported without a standard error (panel_regression.hpp).
        covariance.row(0).setConstant(notANumber);
        covariance.col(0).setConstant(notANumber);
    }
    fit.inference = inferParameters(map.transform * regression.inference.estimates.head(baseColumns) + map.offset,
                                    std::move(covariance), regression.summary.inferenceDegreesOfFreedom,
                                    options.confidenceLevel);
    const double df = regression.summary.residualDegreesOfFreedom;

    fit.rSquared = 1.0 - regression.summary.residualSumOfSquares / totalSumOfSquaresOfLogs(data, options, regression);
    fit.adjustedRSquared = 1.0 - (1.0 - fit.rSquared) * static_cast<double>(n - 1) / df;

    fit.returns = testReturnsToScale(fit, regression, k, options.constantReturns, options.confidenceLevel);
    fit.logScaleAtControlMeans = fit.inference.estimates(0);
    if (m > 0) fit.logScaleAtControlMeans += data.controls.colwise().mean().dot(fit.inference.estimates.tail(m));
    fit.smearingFactor = run.smearingFactor;
    fit.panel = summarisePanel(data.panel, options.effects, run, regression, fit.logScaleAtControlMeans);
    fit.shiftedScale = cobbDouglasShiftedScale(data, fit, run, map.transform);
    fit.trendCovariance = cobbDouglasTrendCovariance(fit, run, map.transform);
    return fit;
}

} // namespace isoquant
