// Writes a PRODFIT table row by row; shared by the tables of every form (internal to the core).
#pragma once

#include "isoquant/sheet/arguments/cells.hpp"
#include "isoquant/math/fits/fit_result.hpp"
#include "isoquant/sheet/tables/table_labels.hpp"
#include "isoquant/math/fits/translog_fit.hpp"
#include "isoquant/math/messages/text.hpp"
#include "isoquant/math/numerics/not_a_number.hpp"

#include <cmath>
#include <limits>
#include <string>

namespace isoquant {

inline Cell numberCell(double value)
{
    if (std::isfinite(value)) return value;
    return std::string(notAvailableText);
}

// Under an exact fit (zero residuals) standard errors, tests, bounds and the likelihood are
// undefined; they show "n/a" rather than the meaningless numbers rounding leaves.
class TableWriter {
public:
    TableWriter(std::size_t rows, bool exactFit) : table_(rows, tableColumns), exactFit_(exactFit) {}

    void parameterRow(const std::string& label, const ProductionFit& fit, Eigen::Index index)
    {
        const ParameterInference& inference = fit.inference;
        put(label, {inference.estimates(index), undefinedIfExact(inference.standardErrors(index)),
                    undefinedIfExact(inference.tStatistics(index)), undefinedIfExact(inference.pValues(index)),
                    undefinedIfExact(inference.lowerBounds(index)), undefinedIfExact(inference.upperBounds(index))});
    }
    void estimateRow(const std::string& label, const ParameterEstimate& estimate)
    {
        put(label, {estimate.estimate, estimate.standardError, estimate.tStatistic, estimate.pValue,
                    estimate.lowerBound, estimate.upperBound});
    }
    void valueRow(const char* label, double value) { put(label, {value}); }

    void textRow(const std::string& label, std::initializer_list<std::string> texts)
    {
        table_.set(row_, 0, label);
        std::size_t column = 1;
        for (const auto& text : texts) {
            if (!text.empty()) table_.set(row_, column, text);
            ++column;
        }
        ++row_;
    }
    void put(const std::string& label, std::initializer_list<Cell> values)
    {
        table_.set(row_, 0, label);
        std::size_t column = 1;
        for (const auto& value : values) {
            table_.set(row_, column, isNumber(value) ? numberCell(std::get<double>(value)) : value);
            ++column;
        }
        ++row_;
    }
    double undefinedIfExact(double value) const { return exactFit_ ? notANumber : value; }
    // observations, R2, adjusted R2, residual SD, [F (slopes = 0),] log-likelihood, AIC, BIC
    void fitStatisticRows(const ProductionFit& fit, bool withOverallTest)
    {
        const FitSummary& summary = fit.summary;
        valueRow(observationsLabel, static_cast<double>(summary.observations));
        valueRow(rSquaredLabel, fit.rSquared);
        valueRow(adjustedRSquaredLabel, fit.adjustedRSquared);
        valueRow(residualSdLabel, summary.residualStandardDeviation);
        if (withOverallTest)
            put(overallTestLabel,
                {Cell{}, Cell{}, undefinedIfExact(summary.fStatistic), undefinedIfExact(summary.fPValue)});
        valueRow(logLikelihoodLabel, undefinedIfExact(summary.logLikelihood));
        valueRow(aicLabel, undefinedIfExact(summary.aic));
        valueRow(bicLabel, undefinedIfExact(summary.bic));
    }
    // returns to scale (ν, se, F of ν = 1, p) and the verdict
    void returnsRows(const ReturnsToScale& returns)
    {
        put(returnsLabel, {returns.estimate, undefinedIfExact(returns.standardError),
                           undefinedIfExact(returns.fStatistic), undefinedIfExact(returns.pValue)});
        textRow(verdictLabel, {returns.verdict});
    }
    // The header: the table's title, then the column words.
    void headerRow(const char* title)
    {
        textRow(title, {columnLabels[0], columnLabels[1], columnLabels[2], columnLabels[3], columnLabels[4],
                        columnLabels[5]});
    }
    void skipRow() { ++row_; }
    CellTable finish() { return std::move(table_); }

private:
    CellTable table_;
    bool exactFit_;
    std::size_t row_ = 0;
};

// The note of the form row for a least-squares fit's status alone; empty when all is well (the
// kinds of a nonlinear fit have their notes in its table).
inline std::string fitStatusNote(const ProductionFit& fit)
{
    switch (fit.status.kind) {
    case FitStatusKind::illConditioned:
        return "note: inputs nearly collinear (scaled condition number " +
               formatNumber(std::round(fit.summary.conditionNumber / 1e9) * 1e9) + "); estimates are fragile";
    case FitStatusKind::exactFit: return "note: the fit is exact; standard errors and tests are undefined";
    default: return "";
    }
}

// Why a Wald test shows n/a under cluster errors: q restrictions, but G cluster scores that sum
// to zero carry at most G − 1 (least_squares.hpp, WaldTest).
inline std::string tooFewGroupsNote(const std::string& test, double restrictions, Eigen::Index groups)
{
    return "note: too few groups for " + test + ": its " + formatNumber(restrictions) +
           " restrictions exceed the " + std::to_string(groups - 1) + " that cluster errors on " +
           std::to_string(groups) + " groups can carry, so it is n/a";
}

// Below this mean number of rows per group, heteroskedasticity-robust errors under fixed effects
// are flagged: they are inconsistent with few periods per group (Stock and Watson, Econometrica
// 76(1), 2008); the threshold of 10 is the (common practice, no source).
inline constexpr double fewRowsPerGroup = 10.0;

// The note of the form row: the fit's status, the tests that are n/a for want of groups, and
// heteroskedasticity-robust errors under effects with few rows per group; "; " between them.
inline std::string statusNote(const ProductionFit& fit)
{
    std::string note = fitStatusNote(fit);
    auto add = [&note](const std::string& more) { note += (note.empty() ? "" : "; ") + more; };
    const FitSummary& regression = fit.summary;
    if (regression.overallTestExceedsClusters)
        add(tooFewGroupsNote(overallTestLabel, static_cast<double>(regression.overallRestrictions),
                             regression.clusterCount));
    if (fit.returns.exceedsClusters)
        add(tooFewGroupsNote(std::string("the test of ") + returnsLabel, 1.0, regression.clusterCount));
    if (fit.translog && fit.translog->cobbDouglasTest.exceedsClusters)
        add(tooFewGroupsNote(cobbDouglasTestLabel, fit.translog->cobbDouglasTest.numeratorDegreesOfFreedom,
                             regression.clusterCount));
    if (fit.panel.technicalChange && fit.panel.trendLooksLikeDates)
        add("note: the trend counts days (dates?), so technical change is per day; for years use =YEAR(date)");
    const bool heteroskedasticityRobust =
        regression.covarianceKind == CovarianceKind::hc1 || regression.covarianceKind == CovarianceKind::hc3;
    if (heteroskedasticityRobust && fit.panel.effects != EffectsKind::none && fit.panel.groups > 0) {
        const double rowsPerGroup = static_cast<double>(regression.observations) / static_cast<double>(fit.panel.groups);
        if (rowsPerGroup < fewRowsPerGroup)
            add("note: heteroskedasticity-robust errors with fixed effects: prefer cluster (" +
                formatNumber(std::round(rowsPerGroup * 10) / 10) + " rows per group; below 10 they are inconsistent)");
    }
    return note;
}

} // namespace isoquant
