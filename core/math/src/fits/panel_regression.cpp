#include "isoquant/math/fits/panel_regression.hpp"

#include "fits/mean_effect_inference.hpp"

#include "isoquant/math/messages/input_error.hpp"
#include "isoquant/math/numerics/work_limits.hpp"
#include "isoquant/math/numerics/not_a_number.hpp"

#include <algorithm>
#include <cmath>
#include <limits>
#include <utility>

namespace isoquant {

namespace {

// A column that is constant within every group is zero after demeaning, up to the rounding of the
// group means (about n·ε of the column's size); what is left below this fraction of the column's
// norm is that rounding, not variation, and the column counts as absorbed by the group effects.
// Real within variation, however small against the levels (years 2015–2022: 1e-3), is far above.
constexpr double withinVariationTolerance = 1e-11;

// Means of the columns of `values` within each group: row g holds group g's means.
Eigen::MatrixXd groupMeans(const Eigen::MatrixXd& values, const std::vector<Eigen::Index>& groupOfRow,
                           Eigen::Index groups)
{
    Eigen::MatrixXd sums = Eigen::MatrixXd::Zero(groups, values.cols());
    Eigen::VectorXd counts = Eigen::VectorXd::Zero(groups);
    for (Eigen::Index i = 0; i < values.rows(); ++i) {
        const Eigen::Index g = groupOfRow[static_cast<std::size_t>(i)];
        sums.row(g) += values.row(i);
        counts(g) += 1.0;
    }
    return counts.cwiseInverse().asDiagonal() * sums;
}

Eigen::MatrixXd withinGroups(const Eigen::MatrixXd& values, const Eigen::MatrixXd& means,
                             const std::vector<Eigen::Index>& groupOfRow)
{
    Eigen::MatrixXd demeaned = values;
    for (Eigen::Index i = 0; i < values.rows(); ++i) demeaned.row(i) -= means.row(groupOfRow[static_cast<std::size_t>(i)]);
    return demeaned;
}

std::vector<double> distinctPeriods(const Eigen::VectorXd& periods)
{
    std::vector<double> values(periods.data(), periods.data() + periods.size());
    std::sort(values.begin(), values.end());
    values.erase(std::unique(values.begin(), values.end()), values.end());
    return values;
}

// One column per period after the first: 1 in the rows of that period.
Eigen::MatrixXd periodDummies(const Eigen::VectorXd& periods, const std::vector<double>& values)
{
    Eigen::MatrixXd dummies = Eigen::MatrixXd::Zero(periods.size(), static_cast<Eigen::Index>(values.size()) - 1);
    for (Eigen::Index i = 0; i < periods.size(); ++i) {
        const auto position = std::lower_bound(values.begin(), values.end(), periods(i)) - values.begin();
        if (position > 0) dummies(i, position - 1) = 1.0;
    }
    return dummies;
}

// The regression run, with the constant put back as column 0 (the mean group effect, without a
// variance): the form's parameter map then applies unchanged.
LeastSquaresResult withConstantColumn(const LeastSquaresResult& run, double meanEffect)
{
    const Eigen::Index p = run.summary.parameters + 1;
    auto prepend = [](const Eigen::VectorXd& values, double first) {
        Eigen::VectorXd extended(values.size() + 1);
        extended << first, values;
        return extended;
    };
    LeastSquaresResult extended = run;
    extended.summary.parameters = p;
    extended.summary.absorbedParameters = run.summary.absorbedParameters - 1; // the constant is now a column
    extended.interceptColumn = 0;
    const ParameterInference& slopes = run.inference;
    ParameterInference& inference = extended.inference;
    inference.estimates = prepend(slopes.estimates, meanEffect);
    inference.standardErrors = prepend(slopes.standardErrors, notANumber);
    inference.tStatistics = prepend(slopes.tStatistics, notANumber);
    inference.pValues = prepend(slopes.pValues, notANumber);
    inference.lowerBounds = prepend(slopes.lowerBounds, notANumber);
    inference.upperBounds = prepend(slopes.upperBounds, notANumber);
    inference.covariance = Eigen::MatrixXd::Zero(p, p);
    inference.covariance.bottomRightCorner(p - 1, p - 1) = slopes.covariance;
    return extended;
}

// The overall F of a two-way run tests its first `slopes` columns (inputs and controls), the
// period effects kept, as under the other kinds of effects.
void testSlopesOnly(LeastSquaresResult& run, Eigen::Index slopes)
{
    FitSummary& summary = run.summary;
    summary.overallRestrictions = slopes;
    summary.overallTestExceedsClusters = false;
    if (slopes == 0) {
        summary.fStatistic = notANumber;
        summary.fPValue = notANumber;
        return;
    }
    Eigen::MatrixXd restrictions = Eigen::MatrixXd::Zero(slopes, summary.parameters);
    restrictions.leftCols(slopes).setIdentity();
    const WaldTest test = testLinearRestrictions(run, restrictions, Eigen::VectorXd::Zero(slopes));
    summary.fStatistic = test.fStatistic;
    summary.fPValue = test.pValue;
    summary.overallTestExceedsClusters = test.exceedsClusters;
}

} // namespace

std::string effectsWord(EffectsKind effects)
{
    switch (effects) {
    case EffectsKind::none: return "none";
    case EffectsKind::fixed: return "fixed";
    case EffectsKind::twoWay: return "two-way";
    }
    return "none";
}

Eigen::Index panelParameterCount(const PanelColumns& panel, EffectsKind effects)
{
    Eigen::Index count = 0;
    if (panel.hasPeriods() && effects != EffectsKind::twoWay) count += 1;
    if (effects == EffectsKind::twoWay) count += static_cast<Eigen::Index>(distinctPeriods(panel.periods).size()) - 1;
    if (effects != EffectsKind::none) count += static_cast<Eigen::Index>(panel.groupLabels.size()) - 1;
    return count;
}

namespace {

// The extended design of a panel regression held in full: the base columns, then the trend (its
// origin and column recorded in `result`) or the period dummies (the periods and first column).
std::pair<Eigen::MatrixXd, Eigen::VectorXd> extendedDesign(const RegressionRows& base, const PanelColumns& panel,
                                                           EffectsKind effects, Eigen::Index n, PanelRegression& result)
{
    Eigen::MatrixXd extended(n, base.columns());
    Eigen::VectorXd response(n);
    base.fill(0, extended, response);
    auto append = [&extended](const Eigen::MatrixXd& columns) {
        Eigen::MatrixXd wider(extended.rows(), extended.cols() + columns.cols());
        wider << extended, columns;
        extended = std::move(wider);
    };
    if (panel.hasPeriods() && effects != EffectsKind::twoWay) {
        result.trendOrigin = panel.periods.minCoeff();
        if (panel.periods.maxCoeff() == result.trendOrigin)
            throw InputError({DataPart::periods}, "every row holds the same period; a trend needs at least two different periods");
        result.trendColumn = extended.cols();
        append((panel.periods.array() - result.trendOrigin).matrix());
    }
    if (effects == EffectsKind::twoWay) {
        result.periodValues = distinctPeriods(panel.periods);
        if (result.periodValues.size() < 2)
            throw InputError({DataPart::periods}, "every row holds the same period; \"two-way\" effects need at least two periods");
        result.firstPeriodColumn = extended.cols();
        const auto later = static_cast<std::size_t>(result.periodValues.size() - 1);
        checkDesignSize(static_cast<std::size_t>(n), static_cast<std::size_t>(extended.cols()) + later, DataPart::periods,
                        "two-way effects with " + groupedCount(later + 1) + " periods",
                        "use a trend instead of two-way effects, or fewer periods");
        append(periodDummies(panel.periods, result.periodValues));
    }
    return {std::move(extended), std::move(response)};
}

} // namespace

PanelRegression fitPanelRegression(const RegressionRows& base, const PanelColumns& panel, EffectsKind effects,
                                   LeastSquaresOptions options)
{
    PanelRegression result;
    result.baseColumns = base.columns();
    result.effectsAbsorbConstant = effects != EffectsKind::none;
    const Eigen::Index n = base.rows();
    const auto groups = static_cast<Eigen::Index>(panel.groupLabels.size());
    if (options.covariance == CovarianceKind::cluster) options.clusters = panel.groupOfRow;
    options.sumExpResiduals = true; // for the smearing factor, while the residuals are in cache
    // The mean effect's inference reads the within run's residuals; they are dropped after it when
    // the caller keeps none.
    const bool keepResiduals = options.keepResiduals;
    if (effects != EffectsKind::none) options.keepResiduals = true;

    LeastSquaresResult run;
    auto fitRows = [&](const RegressionRows& rows) {
        try {
            run = fitLeastSquares(rows, result.effectsAbsorbConstant ? std::nullopt : std::optional<Eigen::Index>(0),
                                  options);
        } catch (const CollinearColumns& collinear) {
            std::vector<Eigen::Index> columns = collinear.columns();
            if (result.effectsAbsorbConstant) {
                for (auto& column : columns) ++column;
                columns.insert(columns.begin(), 0);
            }
            throw CollinearPanelColumns(columns);
        }
    };
    Eigen::MatrixXd columnMeans;
    Eigen::VectorXd responseMeans;
    // Without a trend or effects the base rows are the regression: they are never held in full.
    if (!panel.hasPeriods() && effects == EffectsKind::none) {
        fitRows(base);
    } else {
        auto [extended, response] = extendedDesign(base, panel, effects, n, result);

        if (result.effectsAbsorbConstant) {
            const Eigen::MatrixXd slopes = extended.rightCols(extended.cols() - 1);
            columnMeans = groupMeans(slopes, panel.groupOfRow, groups);
            responseMeans = groupMeans(response, panel.groupOfRow, groups).col(0);
            const Eigen::MatrixXd runDesign = withinGroups(slopes, columnMeans, panel.groupOfRow);
            const Eigen::VectorXd runResponse = withinGroups(response, responseMeans, panel.groupOfRow).col(0);
            for (Eigen::Index j = 0; j < runDesign.cols(); ++j)
                if (runDesign.col(j).norm() <= withinVariationTolerance * slopes.col(j).norm())
                    throw CollinearPanelColumns({0, j + 1});
            options.absorbedParameters = groups;
            // The clusters are the groups: the group effects beyond the mean are nested in them.
            if (options.covariance == CovarianceKind::cluster) options.absorbedNestedInClusters = groups - 1;
            Eigen::VectorXd groupSizes = Eigen::VectorXd::Zero(groups);
            for (const Eigen::Index g : panel.groupOfRow) groupSizes(g) += 1.0;
            options.absorbedLeverage.resize(n);
            for (Eigen::Index i = 0; i < n; ++i) options.absorbedLeverage(i) = 1.0 / groupSizes(panel.groupOfRow[static_cast<std::size_t>(i)]);
            fitRows(MatrixRows(runDesign, runResponse));
            result.meanEffect = meanEffectInference(runDesign, slopes.colwise().mean().transpose(), response.mean(), run,
                                                    options);
        } else {
            fitRows(MatrixRows(extended, response));
        }
    }

    if (effects == EffectsKind::twoWay) testSlopesOnly(run, result.baseColumns - 1);
    if (result.effectsAbsorbConstant) {
        result.groupEffects = responseMeans - columnMeans * run.inference.estimates;
        result.withinRSquared = run.summary.rSquared; // uncentred R² of the demeaned response
        result.regression = withConstantColumn(run, result.groupEffects.mean());
    } else {
        result.regression = std::move(run);
    }
    const Eigen::VectorXd& coefficients = result.regression.inference.estimates;
    if (result.trendColumn)
        result.latestPeriodShift = coefficients(*result.trendColumn) * (panel.periods.maxCoeff() - result.trendOrigin);
    if (effects == EffectsKind::twoWay)
        result.latestPeriodShift = coefficients(result.firstPeriodColumn + static_cast<Eigen::Index>(result.periodValues.size()) - 2);
    result.smearingFactor = result.regression.sumOfExpResiduals / static_cast<double>(n);
    if (!keepResiduals) result.regression.residuals = Eigen::VectorXd();
    return result;
}

} // namespace isoquant
