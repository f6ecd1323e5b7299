#include "isoquant/sheet/functions/cost_functions.hpp"
#include "isoquant/sheet/arguments/argument_names.hpp"
#include "isoquant/sheet/tables/cost_table.hpp"

#include "isoquant/sheet/models/cost_model.hpp"
#include "isoquant/sheet/arguments/decision_arguments.hpp"
#include "isoquant/sheet/functions/decision_functions.hpp"
#include "isoquant/sheet/functions/frontier_functions.hpp"
#include "isoquant/math/messages/input_error.hpp"
#include "isoquant/sheet/arguments/numeric_range.hpp"
#include "isoquant/sheet/arguments/option_arguments.hpp"
#include "isoquant/sheet/arguments/panel_arguments.hpp"
#include "isoquant/sheet/arguments/period_range.hpp"
#include "isoquant/sheet/arguments/incomplete_rows.hpp"
#include "isoquant/sheet/models/production_model.hpp"
#include "isoquant/sheet/tables/table_labels.hpp"
#include "isoquant/math/messages/text.hpp"

#include <algorithm>
#include <cmath>

namespace isoquant {

namespace {

std::string rowsText(Eigen::Index rows) { return plural(static_cast<std::size_t>(rows), "row"); }

void requireSameRows(const NumericColumns& cost, const NumericColumns& other, const std::string& name)
{
    if (other.values.rows() != cost.values.rows())
        throw InputError(name + ": has " + rowsText(other.values.rows()) + " of data but cost has " +
                         rowsText(cost.values.rows()));
}

NumericColumns readOneColumn(const CellTable& range, const std::string& name, ValueRule rule = ValueRule::positive,
                             const std::vector<bool>* skippedRows = nullptr)
{
    NumericColumns column = readNumericColumns(range, name, rule, name, skippedRows);
    if (column.values.cols() != 1)
        throw InputError(name + ": must be one column; it has " + std::to_string(column.values.cols()));
    return column;
}

CostForm readCostForm(const Cell& cell)
{
    return readChoice<CostForm>(cell, argument::form, "a cost form",
                                {{"cobb-douglas", CostForm::cobbDouglas}, {"translog", CostForm::translog}},
                                CostForm::cobbDouglas);
}

void refuseReservedLabels(const std::vector<std::string>& labels, const std::string& argumentName)
{
    for (std::size_t column = 0; column < labels.size(); ++column) {
        const std::string& label = labels[column];
        if (label.find('*') != std::string::npos || equalsIgnoringCase(label, costConstantLabel) ||
            equalsIgnoringCase(label, costOutputLabel) || equalsIgnoringCase(label, formLabel))
            throw argumentError(
                argumentName,
                "column " + std::to_string(column + 1) + " is labelled " + quoted(label) +
                    "; the cost table uses \"constant\", \"output\", \"form\" and \"*\" itself, so rename it");
    }
}

// One column per price, as many rows as cost, each row summing to 1 within 0.01 (rescaled to 1,
// as PRODINDEX does; the same tolerance).
Eigen::MatrixXd readCostShares(const CellTable& range, const NumericColumns& cost, Eigen::Index prices,
                               const std::vector<bool>* skippedRows)
{
    const NumericColumns shares = readNumericColumns(range, argument::shares, ValueRule::finite, "share", skippedRows);
    if (shares.values.cols() != prices)
        throw argumentError(argument::shares, "has " + std::to_string(shares.values.cols()) +
                                                  " columns but input prices has " + std::to_string(prices) +
                                                  "; give one share column per price, in the same order");
    requireSameRows(cost, shares, argument::shares);
    Eigen::MatrixXd rescaled = shares.values;
    for (Eigen::Index row = 0; row < rescaled.rows(); ++row)
        for (Eigen::Index column = 0; column < prices; ++column)
            if (rescaled(row, column) < 0)
                throw argumentError(argument::shares,
                                    "row " + std::to_string(static_cast<std::size_t>(row) + shares.firstDataRow()) +
                                        ", column " + std::to_string(column + 1) + " is " +
                                        formatNumber(rescaled(row, column)) + "; a cost share cannot be negative");
    for (Eigen::Index row = 0; row < rescaled.rows(); ++row) {
        const double sum = rescaled.row(row).sum();
        if (!(std::fabs(sum - 1) <= shareSumTolerance * (1 + 1e-6)))
            throw argumentError(
                argument::shares,
                "row " + std::to_string(static_cast<std::size_t>(row) + shares.firstDataRow()) +
                    ": the shares sum to " + formatNumber(sum) +
                    "; each row's cost shares must sum to 1 within 0.01 (0.99 to 1.01; fractions, not percent)");
        rescaled.row(row) /= sum;
    }
    return rescaled;
}

} // namespace

namespace {

// `incomplete rows`: every row with a blank or text cell in any range (a blank in groups) is left
// out, as PRODFIT does.
std::vector<bool> findIncompleteCostRows(const CostFitArguments& arguments)
{
    std::vector<bool> incomplete = findIncompleteRowsIn({{&arguments.cost, argument::cost},
                                                         {&arguments.output, argument::output},
                                                         {&arguments.shares, argument::shares}});
    const std::vector<bool> panel =
        findIncompleteRows({arguments.cost, arguments.prices, arguments.controls, arguments.groups, arguments.trend,
                            argument::cost, argument::inputPrices});
    for (std::size_t row = 0; row < incomplete.size(); ++row) incomplete[row] = incomplete[row] || panel[row];
    if (std::all_of(incomplete.begin(), incomplete.end(), [](bool flag) { return flag; }))
        throw argumentError(argument::incompleteRows, "every row has a blank or text cell; no row is left to fit");
    return incomplete;
}

// Controls, groups and the trend, as PRODFIT reads them.
void readCostPanel(const CostFitArguments& arguments, const NumericColumns& cost, const std::vector<bool>* skipped,
                   CostData& data)
{
    if (!arguments.controls.empty()) {
        const NumericColumns controls =
            readNumericColumns(arguments.controls, argument::controls, ValueRule::finite, "control", skipped);
        requireSameRows(cost, controls, argument::controls);
        refuseReservedLabels(controls.labels, argument::controls);
        data.controls = controls.values;
        data.controlLabels = controls.labels;
    } else {
        data.controls.resize(cost.values.rows(), 0);
    }
    const std::size_t dataRows = arguments.cost.rows() - (cost.hasHeader ? 1 : 0);
    if (!arguments.groups.empty()) readGroups(arguments.groups, dataRows, skipped, data.panel);
    if (!arguments.trend.empty()) {
        const NumericColumns trend = readOneColumn(arguments.trend, argument::trend, ValueRule::finite, skipped);
        requireSameRows(cost, trend, argument::trend);
        data.panel.periods = trend.values.col(0);
    }
}

CostFitOptions readCostFitOptions(const CostFitArguments& arguments)
{
    CostFitOptions options;
    options.form = readCostForm(arguments.form);
    options.covariance = readErrorsArgument(arguments.errors);
    options.confidenceLevel = readLevelArgument(arguments.level, argument::level);
    options.effects = readEffectsArgument(arguments.effects);
    if (!isOmitted(arguments.inefficiency)) {
        options.inefficiency = readInefficiencyArgument(arguments.inefficiency);
        if (options.covariance != CovarianceKind::classical)
            throw argumentError(argument::errors,
                                "a cost frontier's standard errors come from its likelihood (the observed "
                                "information); leave errors empty or \"classical\"");
        if (!arguments.shares.empty())
            throw argumentError(argument::shares,
                                "not available with a cost frontier, which is fitted to the cost equation "
                                "alone; leave shares empty, or inefficiency empty for the cost and share system");
    }
    if (!arguments.shares.empty() && options.covariance != CovarianceKind::classical)
        throw argumentError(argument::errors,
                            "with shares the system is fitted by iterated GLS, whose errors are classical; "
                            "leave errors empty or fit without shares");
    return options;
}

} // namespace

CostFit costFitFromArguments(const CostFitArguments& arguments)
{
    const CostFitOptions options = readCostFitOptions(arguments);
    const bool dropIncomplete = readSwitchArgument(arguments.incompleteRows, argument::incompleteRows);
    std::vector<bool> incomplete;
    if (dropIncomplete && !arguments.cost.empty()) incomplete = findIncompleteCostRows(arguments);
    const std::vector<bool>* skipped = dropIncomplete ? &incomplete : nullptr;

    const NumericColumns cost = readOneColumn(arguments.cost, argument::cost, ValueRule::positive, skipped);
    const NumericColumns output = readOneColumn(arguments.output, argument::output, ValueRule::positive, skipped);
    requireSameRows(cost, output, argument::output);
    const NumericColumns prices =
        readNumericColumns(arguments.prices, argument::inputPrices, ValueRule::positive, "input", skipped);
    requireSameRows(cost, prices, argument::inputPrices);
    refuseReservedLabels(prices.labels, argument::inputPrices);

    CostData data;
    data.cost = cost.values.col(0);
    data.output = output.values.col(0);
    data.prices = prices.values;
    data.priceLabels = prices.labels;
    if (!arguments.shares.empty()) data.shares = readCostShares(arguments.shares, cost, prices.values.cols(), skipped);
    readCostPanel(arguments, cost, skipped, data);
    try {
        CostFit fit = fitCost(data, options);
        fit.firstDataRow = cost.firstDataRow();
        if (fit.regularity.firstRow) // counted among the kept rows; named among all
            fit.regularity.firstRow =
                static_cast<Eigen::Index>(dataRowOfKept(static_cast<std::size_t>(*fit.regularity.firstRow), incomplete));
        fit.dropsIncompleteRows = dropIncomplete;
        fit.incompleteRowsDropped = static_cast<std::size_t>(std::count(incomplete.begin(), incomplete.end(), true));
        return fit;
    } catch (const UnitLeverage& leverage) { // HC3's e²/(1 − h)² is 0/0 at that row
        const std::size_t row = dataRowOfKept(static_cast<std::size_t>(leverage.row()), incomplete);
        throw argumentError(argument::errors,
                            "row " + std::to_string(row + cost.firstDataRow()) +
                                " has leverage 1 (the fit passes through it exactly); hc3 is undefined here — use hc1");
    }
}

namespace {

double costFigure(const CostModel& model, double level, const Eigen::VectorXd& prices, CostMeasure measure)
{
    switch (measure) {
    case CostMeasure::total: return std::exp(model.logCost(level, prices));
    case CostMeasure::marginal: return model.costElasticity(level, prices) * std::exp(model.logCost(level, prices)) / level;
    case CostMeasure::average: return std::exp(model.logCost(level, prices)) / level;
    case CostMeasure::costElasticity: return model.costElasticity(level, prices);
    case CostMeasure::returnsToScale: return 1.0 / model.costElasticity(level, prices);
    }
    return std::nan("");
}

} // namespace

Eigen::MatrixXd readPriceRows(const CellTable& range, Eigen::Index outputs, Eigen::Index inputs,
                              const std::string& outputArgument)
{
    if (outputs == 1) return readPrices(range, argument::inputPrices, inputs).transpose();
    const NumericColumns prices = readNumericColumns(range, argument::inputPrices, ValueRule::positive, "price");
    if (prices.values.cols() != inputs)
        throw argumentError(argument::inputPrices, "has " + std::to_string(prices.values.cols()) +
                                                       " columns, but the model has " + std::to_string(inputs) +
                                                       " prices; give one column per input");
    if (prices.values.rows() != 1 && prices.values.rows() != outputs)
        throw argumentError(argument::inputPrices, "has " + rowsText(prices.values.rows()) + " of data but " +
                                                       outputArgument + " has " + rowsText(outputs) +
                                                       "; give one row of prices per output, or one row for all");
    return prices.values;
}

CellTable costModelColumn(const CellTable& model, const CellTable& target, const CellTable& prices, const Cell& what)
{
    const CostModel cost = readCostModel(model);
    const CostMeasure measure = readCostMeasure(what);
    const NumericColumns outputs = readOneColumn(target, argument::targetOutput);
    const Eigen::Index n = outputs.values.rows();
    const Eigen::MatrixXd priceRows = readPriceRows(prices, n, cost.prices.size(), argument::targetOutput);
    CellTable column(static_cast<std::size_t>(n), 1);
    for (Eigen::Index row = 0; row < n; ++row) {
        const Eigen::VectorXd rowPrices = priceRows.row(priceRows.rows() == 1 ? 0 : row).transpose();
        const double figure = costFigure(cost, outputs.values(row, 0), rowPrices, measure);
        if (!std::isfinite(figure))
            throw argumentError(argument::targetOutput,
                                "row " + std::to_string(static_cast<std::size_t>(row) + outputs.firstDataRow()) +
                                    " gives a result that cannot be represented");
        column.set(static_cast<std::size_t>(row), 0, figure);
    }
    return column;
}


namespace {

// PRODCOST over a production model, one least-cost plan per output (costCell); a row without an
// answer shows its sentence, a message names its row.
CellTable productionCostColumn(const ModelTable& model, const CellTable& target, const CellTable& prices, const Cell& what)
{
    const NumericColumns outputs = readOneColumn(target, argument::targetOutput);
    const Eigen::Index n = outputs.values.rows();
    const auto inputs = static_cast<Eigen::Index>(model.production().inputLabels.size());
    const Eigen::MatrixXd priceRows = readPriceRows(prices, n, inputs, argument::targetOutput);
    CellTable column(static_cast<std::size_t>(n), 1);
    for (Eigen::Index row = 0; row < n; ++row) {
        CellTable rowPrices(1, static_cast<std::size_t>(inputs));
        for (Eigen::Index i = 0; i < inputs; ++i)
            rowPrices.set(0, static_cast<std::size_t>(i), priceRows(priceRows.rows() == 1 ? 0 : row, i));
        try {
            column.set(static_cast<std::size_t>(row), 0, costCell(model, outputs.values(row, 0), rowPrices, what).at(0, 0));
        } catch (const InputError& error) {
            const std::string argument = "target output: ", message = sheetMessage(error);
            if (message.compare(0, argument.size(), argument) != 0) throw;
            throw InputError(argument + "row " + std::to_string(static_cast<std::size_t>(row) + outputs.firstDataRow()) +
                             ": " + message.substr(argument.size()));
        }
    }
    return column;
}

} // namespace

CellTable costColumn(const ModelTable& model, const CellTable& target, const CellTable& prices, const Cell& what)
{
    if (isCostModel(model.cells())) return costModelColumn(model.cells(), target, prices, what);
    if (target.rows() == 1 && target.columns() == 1) return costCell(model, target.at(0, 0), prices, what);
    return productionCostColumn(model, target, prices, what);
}

} // namespace isoquant
