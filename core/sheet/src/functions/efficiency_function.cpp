#include "isoquant/sheet/functions/frontier_functions.hpp"

#include "isoquant/sheet/arguments/argument_names.hpp"
#include "isoquant/math/numerics/exact_elementwise.hpp"
#include "isoquant/math/messages/input_error.hpp"
#include "isoquant/sheet/arguments/model_inputs.hpp"
#include "isoquant/sheet/arguments/numeric_range.hpp"
#include "isoquant/sheet/arguments/option_arguments.hpp"
#include "isoquant/sheet/models/frontier_model.hpp"
#include "isoquant/math/frontier/cost_frontier.hpp"
#include "isoquant/math/messages/text.hpp"

#include <cmath>
#include <vector>

namespace isoquant {

namespace {

enum class EfficiencyMeasure { efficiency, inefficiency, lowerBound, upperBound };

EfficiencyMeasure readWhatArgument(const Cell& cell)
{
    return readChoice<EfficiencyMeasure>(cell, argument::what, "a measure",
                                         {{"efficiency", EfficiencyMeasure::efficiency},
                                          {"inefficiency", EfficiencyMeasure::inefficiency},
                                          {"lower bound", EfficiencyMeasure::lowerBound},
                                          {"upper bound", EfficiencyMeasure::upperBound}},
                                         EfficiencyMeasure::efficiency);
}

const char* measureTitle(EfficiencyMeasure measure)
{
    switch (measure) {
    case EfficiencyMeasure::efficiency: return "efficiency";
    case EfficiencyMeasure::inefficiency: return "inefficiency";
    case EfficiencyMeasure::lowerBound: return "efficiency lower bound";
    case EfficiencyMeasure::upperBound: return "efficiency upper bound";
    }
    return "efficiency";
}

// The model's columns, inputs then controls, by header label when the range has a header row and
// the model names its inputs; else in the table's order.
Eigen::MatrixXd modelColumns(const NumericColumns& read, const FrontierModel& model)
{
    std::vector<std::string> wanted = model.inputLabels;
    wanted.insert(wanted.end(), model.controlLabels.begin(), model.controlLabels.end());
    const bool named = model.inputLabels.front() != "input 1";
    if (!read.hasHeader || !named) {
        if (read.values.cols() != static_cast<Eigen::Index>(wanted.size()))
            throw argumentError(argument::inputs, "has " + std::to_string(read.values.cols()) +
                                                      " columns but the model has " + std::to_string(wanted.size()) +
                                                      " (its inputs, then its controls)");
        return read.values;
    }
    Eigen::MatrixXd ordered(read.values.rows(), static_cast<Eigen::Index>(wanted.size()));
    for (std::size_t i = 0; i < wanted.size(); ++i) {
        Eigen::Index found = -1;
        for (std::size_t column = 0; column < read.labels.size(); ++column)
            if (equalsIgnoringCase(read.labels[column], wanted[i])) found = static_cast<Eigen::Index>(column);
        if (found < 0)
            throw argumentError(argument::inputs, "no column is headed " + quoted(wanted[i]) + ", a term of the model");
        ordered.col(static_cast<Eigen::Index>(i)) = read.values.col(found);
    }
    return ordered;
}

void requirePositiveInputs(const Eigen::MatrixXd& values, Eigen::Index inputs, std::size_t firstDataRow)
{
    for (Eigen::Index column = 0; column < inputs; ++column)
        for (Eigen::Index row = 0; row < values.rows(); ++row)
            if (!(values(row, column) > 0))
                throw argumentError(argument::inputs,
                                    "row " + std::to_string(static_cast<std::size_t>(row) + firstDataRow) + ", input " +
                                        std::to_string(column + 1) + " is " + formatNumber(values(row, column)) +
                                        "; logs need positive values");
}

double measureOf(EfficiencyMeasure measure, const TruncatedNormal& conditional, double level)
{
    switch (measure) {
    case EfficiencyMeasure::efficiency: return expectedEfficiency(conditional);
    case EfficiencyMeasure::inefficiency: return expectedInefficiency(conditional);
    case EfficiencyMeasure::lowerBound: return efficiencyLowerBound(conditional, level);
    case EfficiencyMeasure::upperBound: return efficiencyUpperBound(conditional, level);
    }
    return std::nan("");
}

// E[exp(−u)|ε] and the rest, or 1 (0 for inefficiency) where σᵤ = 0: no inefficiency.
CellTable measureColumn(EfficiencyMeasure measure, const std::vector<TruncatedNormal>& conditionals,
                        double inefficiencySd, double level)
{
    CellTable column(conditionals.size(), 1);
    for (std::size_t row = 0; row < conditionals.size(); ++row) {
        double value = measure == EfficiencyMeasure::inefficiency ? 0.0 : 1.0;
        if (inefficiencySd > 0) value = measureOf(measure, conditionals[row], level);
        column.set(row, 0, value);
    }
    return column;
}

// PRODEFFICIENCY on a cost frontier: `output` holds cost, `inputs` the output, the prices in
// PRODCOSTFIT's order, then its controls; ε = ln C − c(y, w, z), u given ε from cost_frontier.hpp.
CellTable costEfficiencyColumn(const CellTable& model, const CellTable& output, const CellTable& inputs,
                               EfficiencyMeasure measure)
{
    const CostFrontierModel frontier = readCostFrontierModel(model);
    const NumericColumns cost = readNumericColumns(output, argument::output, ValueRule::positive, "cost");
    if (cost.values.cols() != 1)
        throw argumentError(argument::output,
                            "must be one column, the cost of each row; it has " + std::to_string(cost.values.cols()));
    const NumericColumns read = readNumericColumns(inputs, argument::inputs, ValueRule::finite, "input");
    if (read.values.rows() != cost.values.rows())
        throw argumentError(argument::inputs, "has " + std::to_string(read.values.rows()) +
                                                  " rows of data but output has " + std::to_string(cost.values.rows()));
    const auto k = static_cast<Eigen::Index>(frontier.cost.priceLabels.size());
    const auto m = static_cast<Eigen::Index>(frontier.cost.controlLabels.size());
    if (read.values.cols() != 1 + k + m)
        throw argumentError(argument::inputs,
                            "has " + std::to_string(read.values.cols()) + " columns, but a cost frontier needs " +
                                std::to_string(1 + k + m) + ": the output column, then the " + std::to_string(k) +
                                " price columns in PRODCOSTFIT's order" +
                                (m > 0 ? ", then its " + plural(static_cast<std::size_t>(m), "control") : ""));
    requirePositiveInputs(read.values, 1 + k, read.firstDataRow());
    std::vector<TruncatedNormal> conditionals;
    for (Eigen::Index row = 0; row < read.values.rows(); ++row) {
        const double fitted =
            frontier.cost.logCostAt(read.values(row, 0), read.values.row(row).segment(1, k).transpose(),
                                    read.values.row(row).tail(m).transpose());
        conditionals.push_back(costInefficiencyGivenResidual(
            frontier.distribution, std::log(cost.values(row, 0)) - fitted, frontier.noiseSd, frontier.inefficiencySd));
    }
    CellTable column = measureColumn(measure, conditionals, frontier.inefficiencySd,
                                     frontier.confidenceLevel);
    return underHeader(std::move(column), cost, std::string("cost ") + measureTitle(measure));
}

} // namespace

CellTable efficiencyColumn(const CellTable& model, const CellTable& output, const CellTable& inputs, const Cell& what)
{
    const EfficiencyMeasure measure = readWhatArgument(what);
    if (isCostModel(model)) return costEfficiencyColumn(model, output, inputs, measure);
    const FrontierModel frontier = readFrontierModel(model);
    const NumericColumns produced = readNumericColumns(output, argument::output, ValueRule::positive, "output");
    if (produced.values.cols() != 1)
        throw argumentError(argument::output, "must be one column; it has " + std::to_string(produced.values.cols()));
    const NumericColumns read = readNumericColumns(inputs, argument::inputs, ValueRule::finite, "input");
    if (read.values.rows() != produced.values.rows())
        throw argumentError(argument::inputs, "has " + std::to_string(read.values.rows()) +
                                                  " rows of data but output has " +
                                                  std::to_string(produced.values.rows()));
    const Eigen::MatrixXd columns = modelColumns(read, frontier);
    const auto k = static_cast<Eigen::Index>(frontier.inputLabels.size());
    requirePositiveInputs(columns, k, read.firstDataRow());
    const Eigen::MatrixXd design = frontierDesign(frontier.form, columns.leftCols(k), columns.rightCols(columns.cols() - k));
    const Eigen::VectorXd residuals =
        exactLog(produced.values.col(0).array()).matrix() - design * frontier.coefficients;

    std::vector<TruncatedNormal> conditionals;
    for (Eigen::Index row = 0; row < residuals.size(); ++row)
        conditionals.push_back(
            inefficiencyGivenResidual(frontier.distribution, residuals(row), frontier.noiseSd, frontier.inefficiencySd));
    CellTable column = measureColumn(measure, conditionals, frontier.inefficiencySd,
                                     frontier.confidenceLevel);
    return underHeader(std::move(column), produced, measureTitle(measure));
}

} // namespace isoquant
