#include "isoquant/sheet/tables/fit_table.hpp"

#include "isoquant/sheet/arguments/argument_names.hpp"
#include "isoquant/sheet/tables/form_tables.hpp"
#include "isoquant/math/messages/input_error.hpp"
#include "isoquant/math/messages/text.hpp"
#include "isoquant/sheet/tables/table_labels.hpp"
#include "tables/panel_rows.hpp"
#include "tables/table_writer.hpp"

#include <cmath>
#include <string_view>

namespace isoquant {

namespace {

// A row label as PRODSTAT compares it: without surrounding spaces, and "R²" read as "R2" (the
// superscript is what a user types who copies the label from a report).
std::string comparableLabel(std::string_view label)
{
    const auto first = label.find_first_not_of(" \t\u00a0");
    if (first == std::string_view::npos) return "";
    label = label.substr(first, label.find_last_not_of(" \t\u00a0") - first + 1);
    std::string result(label);
    for (std::size_t at = result.find("\u00b2"); at != std::string::npos; at = result.find("\u00b2", at))
        result.replace(at, std::string("\u00b2").size(), "2");
    return result;
}

// The labels of the table's rows, for a message: "'ln A', 'L', 'C', 'observations', …".
std::string rowLabelList(const CellTable& table)
{
    std::string list;
    for (std::size_t row = 1; row < table.rows(); ++row)
        if (table.isText(row, 0) && !table.text(row, 0).empty())
            list += (list.empty() ? "" : ", ") + quoted(table.text(row, 0));
    return list;
}

std::size_t findRow(const CellTable& table, const std::string& typed)
{
    const std::string wanted = comparableLabel(typed);
    for (std::size_t row = 0; row < table.rows(); ++row) {
        if (!table.isText(row, 0)) continue;
        const std::string label = comparableLabel(table.text(row, 0));
        if (equalsIgnoringCase(label, wanted) || equalsIgnoringCase(label, wanted + controlSuffix)) return row;
    }
    if (equalsIgnoringCase(wanted, "F")) return findRow(table, overallTestLabel);
    throw argumentError(argument::rowLabel,
                        quoted(typed) + " is not a row of the table; its rows are " + rowLabelList(table));
}

} // namespace

std::size_t fitTableRows(std::size_t inputs, std::size_t controls)
{
    return inputs + controls + 15 + (controls > 0 ? 1 : 0);
}

std::size_t fitTableRows(const ProductionFit& fit)
{
    return fitTableRows(fit.inputLabels.size(), fit.controlLabels.size()) +
           panelRowCount(fit.panel, productionPanelLabels);
}

CellTable fitTable(const ProductionFit& fit)
{
    if (fit.form == ProductionForm::ces) return cesFitTable(fit);
    if (fit.form == ProductionForm::translog) return translogFitTable(fit);
    const std::size_t k = fit.inputLabels.size();
    const std::size_t m = fit.controlLabels.size();
    TableWriter writer(fitTableRows(fit), fit.status.is(FitStatusKind::exactFit));
    writer.headerRow(cobbDouglasTitle);
    writer.parameterRow(logScaleLabel, fit, 0);
    for (std::size_t i = 0; i < k; ++i) writer.parameterRow(fit.inputLabels[i], fit, static_cast<Eigen::Index>(1 + i));
    for (std::size_t j = 0; j < m; ++j)
        writer.parameterRow(fit.controlLabels[j] + controlSuffix, fit, static_cast<Eigen::Index>(1 + k + j));
    writer.skipRow();

    const FitSummary& regression = fit.summary;
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
    writePanelRows(writer, fit.panel, productionPanelLabels);
    return writer.finish();
}

Cell lookUpFitTable(const CellTable& table, const Cell& rowLabel, const Cell& columnLabel)
{
    if (!isText(rowLabel) || std::get<std::string>(rowLabel).empty())
        throw argumentError(argument::rowLabel,
                            "give the label of a row of the table, such as \"R2\" or an input's label");
    const std::size_t row = findRow(table, std::get<std::string>(rowLabel));

    std::size_t column = 1;
    if (isText(columnLabel) && !std::get<std::string>(columnLabel).empty()) {
        const std::string wanted = comparableLabel(std::get<std::string>(columnLabel));
        column = tableColumns;
        for (std::size_t c = 0; c < columnLabels.size(); ++c)
            if (equalsIgnoringCase(wanted, columnLabels[c])) column = 1 + c;
        if (column == tableColumns)
            throw argumentError(argument::columnLabel,
                                quoted(wanted) +
                                    " is not a column; use value, std. error, t, p-value, lower bound or upper bound");
    } else if (!isEmpty(columnLabel) && !isText(columnLabel)) {
        throw argumentError(argument::columnLabel, "give a column's label, such as \"p-value\"");
    } else if (table.isEmpty(row, 1)) {
        column = 3; // rows that hold only a test statistic
    }
    return table.at(row, column);
}

namespace {

// A table's header row: a title, then a word over every column (a range that starts one row lower
// starts with a row of numbers).
bool startsWithHeader(const CellTable& table)
{
    if (table.rows() < 2 || table.columns() < 2) return false;
    for (std::size_t column = 0; column < table.columns(); ++column)
        if (!table.isText(0, column) || table.text(0, column).empty()) return false;
    return true;
}

} // namespace

Cell tableValue(const CellTable& table, const Cell& rowLabel, const Cell& columnLabel)
{
    if (!startsWithHeader(table))
        throw argumentError(argument::table, "give the whole table, its header row included (such as $I$1:$O$17 for a "
                                             "PRODFIT of two inputs)");
    if (!isText(columnLabel) || std::get<std::string>(columnLabel).empty())
        return lookUpFitTable(table, rowLabel, columnLabel);
    if (!isText(rowLabel) || std::get<std::string>(rowLabel).empty())
        return lookUpFitTable(table, rowLabel, Cell{}); // the row label's own message
    const std::size_t row = findRow(table, std::get<std::string>(rowLabel));
    const std::string wanted = comparableLabel(std::get<std::string>(columnLabel));
    std::string known;
    for (std::size_t column = 1; column < table.columns(); ++column) {
        if (!table.isText(0, column) || table.text(0, column).empty()) continue;
        if (equalsIgnoringCase(comparableLabel(table.text(0, column)), wanted)) return table.at(row, column);
        known += (known.empty() ? "" : ", ") + quoted(table.text(0, column));
    }
    throw argumentError(argument::columnLabel,
                        quoted(wanted) + " is not a column of the table; its columns are " + known);
}

} // namespace isoquant
