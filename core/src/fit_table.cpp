#include "isoquant/fit_table.hpp"

#include "isoquant/form_tables.hpp"
#include "isoquant/input_error.hpp"
#include "isoquant/text.hpp"
#include "isoquant/table_labels.hpp"
#include "table_writer.hpp"

#include <cmath>

namespace isoquant {

namespace {

std::size_t findRow(const CellTable& table, const std::string& wanted)
{
    for (std::size_t row = 0; row < table.rows(); ++row) {
        if (!table.isText(row, 0)) continue;
        const std::string& label = table.text(row, 0);
        if (equalsIgnoringCase(label, wanted) || equalsIgnoringCase(label, wanted + controlSuffix)) return row;
    }
    if (equalsIgnoringCase(wanted, "F")) return findRow(table, overallTestLabel);
    throw InputError("row label: " + quoted(wanted) + " is not a row of the table");
}

// Rows of the estimation options (groups, effects, trend, incomplete rows), in table order; a
// trend adds two: technical change per period and latest period.
std::size_t optionRows(const PanelSummary& panel)
{
    const bool effects = panel.effects != EffectsKind::none;
    return (panel.groups > 0 ? 2 : 0) + (effects ? 1 : 0) + (panel.effects == EffectsKind::twoWay ? 1 : 0) +
           (panel.technicalChange ? 2 : 0) + (panel.shiftsLogScale ? 1 : 0) + (panel.dropsIncompleteRows ? 1 : 0);
}

void writeOptionRows(TableWriter& writer, const PanelSummary& panel)
{
    if (panel.groups > 0) {
        writer.valueRow(groupsLabel, static_cast<double>(panel.groups));
        writer.textRow(effectsLabel, {effectsWord(panel.effects)});
    }
    if (panel.effects != EffectsKind::none) writer.valueRow(withinRSquaredLabel, panel.withinRSquared);
    if (panel.effects == EffectsKind::twoWay) writer.valueRow(periodsLabel, static_cast<double>(panel.periods.size()));
    if (panel.technicalChange) {
        const ParameterEstimate& change = *panel.technicalChange;
        writer.put(technicalChangeLabel,
                   {change.estimate, writer.undefinedIfExact(change.standardError),
                    writer.undefinedIfExact(change.tStatistic), writer.undefinedIfExact(change.pValue),
                    writer.undefinedIfExact(change.lowerBound), writer.undefinedIfExact(change.upperBound)});
    }
    if (panel.shiftsLogScale) writer.valueRow(predictionScaleLabel, panel.logScaleForPredictions);
    if (panel.technicalChange) writer.valueRow(latestPeriodLabel, panel.latestPeriod);
    if (panel.dropsIncompleteRows) writer.valueRow(droppedRowsLabel, static_cast<double>(panel.incompleteRowsDropped));
}

} // namespace

std::size_t fitTableRows(std::size_t inputs, std::size_t controls)
{
    return inputs + controls + 15 + (controls > 0 ? 1 : 0);
}

std::size_t fitTableRows(const ProductionFit& fit)
{
    return fitTableRows(fit.inputLabels.size(), fit.controlLabels.size()) + optionRows(fit.panel);
}

CellTable fitTable(const ProductionFit& fit)
{
    if (fit.form == ProductionForm::ces) return cesFitTable(fit);
    if (fit.form == ProductionForm::translog) return translogFitTable(fit);
    const std::size_t k = fit.inputLabels.size();
    const std::size_t m = fit.controlLabels.size();
    TableWriter writer(fitTableRows(fit), fit.status == FitStatus::perfectFit);
    writer.textRow(headerLabels[0], {headerLabels[1], headerLabels[2], headerLabels[3], headerLabels[4],
                                     headerLabels[5], headerLabels[6]});
    writer.parameterRow(logScaleLabel, fit, 0);
    for (std::size_t i = 0; i < k; ++i) writer.parameterRow(fit.inputLabels[i], fit, static_cast<Eigen::Index>(1 + i));
    for (std::size_t j = 0; j < m; ++j)
        writer.parameterRow(fit.controlLabels[j] + controlSuffix, fit, static_cast<Eigen::Index>(1 + k + j));
    writer.skipRow();

    const LeastSquaresResult& regression = fit.regression;
    writer.valueRow(observationsLabel, static_cast<double>(regression.observations));
    writer.valueRow(rSquaredLabel, fit.rSquared);
    writer.valueRow(adjustedRSquaredLabel, fit.adjustedRSquared);
    writer.valueRow(residualSdLabel, regression.residualStandardDeviation);
    writer.put(overallTestLabel, {Cell{}, Cell{}, writer.undefinedIfExact(regression.fStatistic),
                                  writer.undefinedIfExact(regression.fPValue)});
    writer.valueRow(logLikelihoodLabel, writer.undefinedIfExact(regression.logLikelihood));
    writer.valueRow(aicLabel, writer.undefinedIfExact(regression.aic));
    writer.valueRow(bicLabel, writer.undefinedIfExact(regression.bic));
    const ReturnsToScale& returns = fit.returns;
    if (returns.imposed)
        writer.put(returnsLabel, {returns.estimate, std::string(imposedText)});
    else
        writer.put(returnsLabel, {returns.estimate, writer.undefinedIfExact(returns.standardError),
                                  writer.undefinedIfExact(returns.fStatistic), writer.undefinedIfExact(returns.pValue)});
    writer.textRow(verdictLabel, {returns.verdict});
    writer.textRow(formLabel, {formWord(fit.form), statusNote(fit)});
    if (m > 0) writer.valueRow(controlMeansLabel, fit.logScaleAtControlMeans);
    writer.valueRow(smearingLabel, fit.smearingFactor);
    writeOptionRows(writer, fit.panel);
    return writer.finish();
}

Cell lookUpFitTable(const CellTable& table, const Cell& rowLabel, const Cell& columnLabel)
{
    if (!isText(rowLabel) || std::get<std::string>(rowLabel).empty())
        throw InputError("row label: give the label of a row of the table, such as \"R2\" or an input's label");
    const std::size_t row = findRow(table, std::get<std::string>(rowLabel));

    std::size_t column = 1;
    if (isText(columnLabel) && !std::get<std::string>(columnLabel).empty()) {
        const std::string& wanted = std::get<std::string>(columnLabel);
        column = headerLabels.size();
        for (std::size_t c = 1; c < headerLabels.size(); ++c)
            if (equalsIgnoringCase(wanted, headerLabels[c])) column = c;
        if (column == headerLabels.size())
            throw InputError("column label: " + quoted(wanted) +
                             " is not a column; use estimate, std. error, t, p-value, low or high");
    } else if (!isEmpty(columnLabel) && !isText(columnLabel)) {
        throw InputError("column label: give a column's label, such as \"p-value\"");
    } else if (table.isEmpty(row, 1)) {
        column = 3; // rows that hold only a test statistic
    }
    return table.at(row, column);
}

} // namespace isoquant
