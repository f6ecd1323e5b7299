#include "isoquant/sheet/functions/frontier_functions.hpp"

#include "isoquant/sheet/arguments/argument_names.hpp"
#include "isoquant/math/numerics/exact_elementwise.hpp"
#include "isoquant/math/messages/input_error.hpp"
#include "isoquant/sheet/arguments/model_inputs.hpp"
#include "isoquant/sheet/arguments/numeric_range.hpp"
#include "isoquant/sheet/arguments/option_arguments.hpp"
#include "isoquant/sheet/models/frontier_model.hpp"
#include "isoquant/math/messages/text.hpp"

#include <cmath>

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

} // namespace

CellTable efficiencyColumn(const CellTable& model, const CellTable& output, const CellTable& inputs, const Cell& what)
{
    const FrontierModel frontier = readFrontierModel(model);
    const EfficiencyMeasure measure = readWhatArgument(what);
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

    CellTable column(static_cast<std::size_t>(residuals.size()), 1);
    for (Eigen::Index row = 0; row < residuals.size(); ++row) {
        double value = measure == EfficiencyMeasure::inefficiency ? 0.0 : 1.0; // σᵤ = 0: no inefficiency
        if (frontier.inefficiencySd > 0)
            value = measureOf(measure, inefficiencyGivenResidual(frontier.distribution, residuals(row), frontier.noiseSd,
                                                                 frontier.inefficiencySd),
                              frontier.confidenceLevel);
        column.set(static_cast<std::size_t>(row), 0, value);
    }
    return underHeader(std::move(column), produced, measureTitle(measure));
}

} // namespace isoquant
