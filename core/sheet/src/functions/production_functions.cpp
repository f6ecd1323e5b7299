#include "isoquant/sheet/functions/production_functions.hpp"

#include "isoquant/sheet/arguments/argument_names.hpp"
#include "isoquant/sheet/functions/form_comparison.hpp"
#include "isoquant/math/messages/input_error.hpp"
#include "isoquant/sheet/arguments/model_inputs.hpp"
#include "isoquant/sheet/arguments/numeric_range.hpp"
#include "isoquant/sheet/arguments/option_arguments.hpp"
#include "isoquant/sheet/arguments/panel_arguments.hpp"
#include "isoquant/sheet/models/production_model.hpp"
#include "isoquant/math/forms/regularity.hpp"
#include "isoquant/sheet/tables/table_labels.hpp"
#include "isoquant/math/messages/text.hpp"
#include "functions/two_halves.hpp"

#include <algorithm>
#include <cmath>

namespace isoquant {

namespace {

void requireSameRows(const NumericColumns& output, const NumericColumns& other, const std::string& name)
{
    if (other.values.rows() == output.values.rows()) return;
    std::string hint;
    if (output.hasHeader != other.hasHeader)
        hint = " (a header row of text was found in " + std::string(output.hasHeader ? "output" : name) + " only)";
    throw InputError(name + ": has " + plural(static_cast<std::size_t>(other.values.rows()), "row") + " of data but output has " +
                     plural(static_cast<std::size_t>(output.values.rows()), "row") + hint);
}

// The fitted table marks a control's row by this ending; an input so labelled would read back as one.
void refuseControlLabels(const NumericColumns& inputs)
{
    for (std::size_t column = 0; column < inputs.labels.size(); ++column) {
        const std::string& label = inputs.labels[column];
        if (endsWithIgnoringCase(label, controlSuffix))
            throw argumentError(argument::inputs,
                                "column " + std::to_string(column + 1) + " is labelled " + quoted(label) +
                                    "; the ending \"(control)\" marks controls in the table, so rename it");
    }
}

// From this many rows a column is computed on two threads where the processor has two cores or
// more: Calc recalculates an array formula on one core, and a row of marginal products costs about
// 0.2 µs in extended-precision logs (0.2 s a million rows). Below it, starting a thread (some tens
// of microseconds) would take a noticeable share of the work.
constexpr Eigen::Index twoThreadRows = 100000;

// Applies `value(bundle)` to every row; a result too large for a double is reported, not shown as inf
// (the first such row, as if the rows were taken in order). `value` must be safe to call from two
// threads at once (the technologies' const functions are: they keep no state).
template <typename Evaluate>
CellTable columnOf(const NumericColumns& bundles, Evaluate value)
{
    const Eigen::Index rows = bundles.values.rows();
    CellTable column(static_cast<std::size_t>(rows), 1);
    // Rows [first, last): each written to its own cell of `column`; returns the first row whose
    // result is not finite, or `last`.
    const auto fill = [&](Eigen::Index first, Eigen::Index last) {
        Eigen::VectorXd bundle(bundles.values.cols()); // one vector for these rows: no allocation per row
        for (Eigen::Index row = first; row < last; ++row) {
            bundle = bundles.values.row(row).transpose();
            const double result = value(bundle);
            if (!std::isfinite(result)) return row;
            column.set(static_cast<std::size_t>(row), 0, result);
        }
        return last;
    };
    const Eigen::Index unrepresentable = rows >= twoThreadRows ? fillInTwoHalves(rows, fill) : fill(0, rows);
    if (unrepresentable < rows)
        throw argumentError(argument::inputs,
                            "row " + std::to_string(static_cast<std::size_t>(unrepresentable) + bundles.firstDataRow()) +
                                " gives a result too large to represent");
    return column;
}

// A last row that holds the sum of the rows above, in output and in every input, is a totals row
// the user selected with the data (relative 1e-9: sums of typed values agree to rounding). It
// would be fitted as one more, very large plant. Needs three rows: with two, any row "sums" one.
void refuseTotalsRow(const NumericColumns& output, const Eigen::MatrixXd& inputs,
                     const std::vector<bool>* skippedRows)
{
    const Eigen::Index n = output.values.rows();
    if (n < 3) return;
    auto isTotal = [n](const Eigen::VectorXd& column) {
        const double above = column.head(n - 1).sum();
        return std::fabs(column(n - 1) - above) <= 1e-9 * std::fabs(above);
    };
    if (!isTotal(output.values.col(0))) return;
    for (Eigen::Index column = 0; column < inputs.cols(); ++column)
        if (!isTotal(inputs.col(column))) return;
    std::size_t lastRow = skippedRows ? skippedRows->size() : static_cast<std::size_t>(n);
    while (skippedRows && lastRow > 0 && (*skippedRows)[lastRow - 1]) --lastRow;
    throw InputError("row " + std::to_string(lastRow - 1 + output.firstDataRow()) +
                     " looks like a total of the rows above; leave it out of the ranges");
}

// HC3 is undefined at a row of leverage 1: the message names it in the sheet's counting (the
// regression's row `fitted`, after any dropped rows, below output's header) and, when its group
// has no other row, says so.
std::string unitLeverageMessage(Eigen::Index fitted, const std::vector<bool>& dropped, std::size_t firstDataRow,
                                const PanelColumns& panel)
{
    std::size_t dataRow = 0;
    for (Eigen::Index kept = 0;; ++dataRow) {
        const bool used = dataRow >= dropped.size() || !dropped[dataRow];
        if (used && kept++ == fitted) break;
    }
    const std::string row = "errors: row " + std::to_string(dataRow + firstDataRow) + " has leverage 1 ";
    if (panel.hasGroups()) {
        const Eigen::Index group = panel.groupOfRow[static_cast<std::size_t>(fitted)];
        if (std::count(panel.groupOfRow.begin(), panel.groupOfRow.end(), group) == 1)
            return row + "(its group has one row); hc3 is undefined here — use hc1 or cluster";
    }
    return row + "(the fit passes through it exactly); hc3 is undefined here — use hc1";
}

// The row count of the ranges once trailing rows empty in every one of them are cut: output's own
// when the ranges differ in height (the shape check names that) or nothing is to cut.
std::size_t rowsBeforeEmptyTail(const FitArguments& arguments)
{
    const std::size_t rows = arguments.output.rows();
    std::size_t filled = 0;
    for (const CellTable* range : {&arguments.output, &arguments.inputs, &arguments.controls, &arguments.groups,
                                   &arguments.trend}) {
        if (range->empty()) continue;
        if (range->rows() != rows) return rows;
        filled = std::max(filled, filledRows(*range));
    }
    return filled == 0 ? rows : filled;
}

} // namespace

FitArguments withoutTrailingEmptyRows(FitArguments arguments)
{
    const std::size_t rows = rowsBeforeEmptyTail(arguments);
    if (rows == arguments.output.rows()) return arguments;
    for (CellTable* range : {&arguments.output, &arguments.inputs, &arguments.controls, &arguments.groups,
                             &arguments.trend})
        if (!range->empty()) *range = topRows(*range, rows);
    return arguments;
}

FitInput readFitInput(const FitArguments& arguments)
{
    // Whole columns (B:B) end at their last value; only the cut ranges are copied.
    if (rowsBeforeEmptyTail(arguments) != arguments.output.rows())
        return readFitInput(withoutTrailingEmptyRows(arguments));
    FitInput input;
    ProductionFitOptions& options = input.options;
    options.form = readFormArgument(arguments.form);
    options.constantReturns = readSwitchArgument(arguments.constantReturns, argument::constantReturns);
    options.covariance = readErrorsArgument(arguments.errors);
    options.confidenceLevel = readLevelArgument(arguments.level, argument::level);
    options.effects = readEffectsArgument(arguments.effects);
    input.dropIncomplete = readSwitchArgument(arguments.incompleteRows, argument::incompleteRows);

    // Empty ranges are left to the readers below, which say so.
    std::vector<bool>& incomplete = input.incomplete;
    const bool filtering = input.dropIncomplete && !arguments.output.empty() && !arguments.inputs.empty();
    if (filtering)
        incomplete = findIncompleteRows(
            {arguments.output, arguments.inputs, arguments.controls, arguments.groups, arguments.trend});
    const std::vector<bool>* skipped = filtering ? &incomplete : nullptr;

    const NumericColumns output =
        readNumericColumns(arguments.output, argument::output, ValueRule::positive, "output", skipped);
    if (output.values.cols() != 1)
        throw argumentError(argument::output, "must be one column; it has " + std::to_string(output.values.cols()));
    NumericColumns inputs =
        readNumericColumns(arguments.inputs, argument::inputs, ValueRule::positive, "input", skipped);
    requireSameRows(output, inputs, argument::inputs);
    refuseControlLabels(inputs);
    refuseTotalsRow(output, inputs.values, skipped);

    ProductionData& data = input.data;
    input.firstDataRow = output.firstDataRow();
    data.output = output.values.col(0);
    data.inputs = std::move(inputs.values); // a million rows: a copy costs page faults, not only time
    data.inputLabels = inputs.labels;
    if (!arguments.controls.empty()) {
        NumericColumns controls =
            readNumericColumns(arguments.controls, argument::controls, ValueRule::finite, "control", skipped);
        requireSameRows(output, controls, argument::controls);
        data.controls = std::move(controls.values);
        data.controlLabels = controls.labels;
    } else {
        data.controls.resize(data.output.size(), 0);
    }
    const std::size_t dataRows = arguments.output.rows() - (output.hasHeader ? 1 : 0);
    if (!arguments.groups.empty()) readGroups(arguments.groups, dataRows, skipped, data.panel);
    if (!arguments.trend.empty()) {
        const NumericColumns trend =
            readNumericColumns(arguments.trend, argument::trend, ValueRule::finite, "trend", skipped);
        if (trend.values.cols() != 1)
            throw argumentError(argument::trend,
                                "must be one column of periods; it has " + std::to_string(trend.values.cols()));
        requireSameRows(output, trend, argument::trend);
        data.panel.periods = trend.values.col(0);
    }

    return input;
}

ProductionFit fitFromArguments(const FitArguments& arguments)
{
    const FitInput input = readFitInput(arguments);
    ProductionFit fit;
    try {
        fit = fitProduction(input.data, input.options);
    } catch (const UnitLeverage& leverage) {
        throw InputError(unitLeverageMessage(leverage.row(), input.incomplete, input.firstDataRow, input.data.panel));
    }
    fit.panel.dropsIncompleteRows = input.dropIncomplete;
    fit.panel.incompleteRowsDropped =
        static_cast<Eigen::Index>(std::count(input.incomplete.begin(), input.incomplete.end(), true));
    return fit;
}

CellTable outputColumn(const ModelTable& model, const CellTable& inputs, const Cell& mean)
{
    const ProductionModel& technology = model.production();
    double factor = 1.0;
    const bool meanOutput = readSwitchArgument(mean, argument::mean);
    if (meanOutput) {
        if (!technology.smearingFactor)
            throw argumentError(argument::mean,
                                "the model has no \"smearing factor\" row; use a PRODFIT table, or add the row "
                                "(the mean of exp(residual) of ln Y)");
        factor = *technology.smearingFactor;
    }
    const NumericColumns bundles = readModelInputs(inputs, technology);
    return underHeader(columnOf(bundles, [&](const Eigen::VectorXd& bundle) {
                           return factor * technology.technology->output(bundle);
                       }),
                       bundles, meanOutput ? "mean output" : "output");
}

namespace {

// One column of a derivative with respect to the chosen input, per row of inputs; the header is
// `heading` and the chosen input's label.
template <typename Derivative>
CellTable inputDerivativeColumn(const ModelTable& model, const CellTable& inputs, const Cell& input,
                                Derivative derivative, const std::string& heading)
{
    const ProductionModel& technology = model.production();
    const Eigen::Index chosen = readInputSelector(input, technology, argument::input);
    const NumericColumns bundles = readModelInputs(inputs, technology);
    return underHeader(columnOf(bundles, [&](const Eigen::VectorXd& bundle) {
                           return derivative(*technology.technology, bundle, chosen);
                       }),
                       bundles, heading + technology.inputLabels[static_cast<std::size_t>(chosen)]);
}

} // namespace

CellTable marginalProductColumn(const ModelTable& model, const CellTable& inputs, const Cell& input)
{
    return inputDerivativeColumn(
        model, inputs, input,
        [](const Technology& technology, const Eigen::VectorXd& bundle, Eigen::Index chosen) {
            return technology.marginalProduct(bundle, chosen);
        },
        "marginal product of ");
}

CellTable elasticityColumn(const ModelTable& model, const CellTable& inputs, const Cell& input)
{
    return inputDerivativeColumn(
        model, inputs, input,
        [](const Technology& technology, const Eigen::VectorXd& bundle, Eigen::Index chosen) {
            return technology.elasticity(bundle, chosen);
        },
        "output elasticity of ");
}

CellTable scaleColumn(const ModelTable& model, const CellTable& inputs)
{
    const ProductionModel& technology = model.production();
    if (inputs.empty()) {
        const auto scale = technology.technology->constantScaleElasticity();
        if (!scale)
            throw argumentError(argument::inputs,
                                "this model's returns to scale vary with the inputs; give a row of inputs");
        if (!std::isfinite(*scale))
            throw argumentError(argument::model, "its returns to scale are too large to represent");
        return singleCell(*scale);
    }
    const NumericColumns bundles = readModelInputs(inputs, technology);
    return underHeader(columnOf(bundles, [&](const Eigen::VectorXd& bundle) {
                           return technology.technology->scaleElasticity(bundle);
                       }),
                       bundles, "returns to scale");
}

std::string returnsVerdictCell(const ModelTable& model, const Cell& level)
{
    const double confidence = readLevelArgument(level, argument::level);
    if (const auto untested = untestedVerdict(model.cells())) return *untested;
    return returnsVerdict(model.production(), confidence);
}

CellTable regularityColumn(const ModelTable& model, const CellTable& inputs)
{
    const ProductionModel& technology = model.production();
    const NumericColumns bundles = readModelInputs(inputs, technology);
    CellTable column(static_cast<std::size_t>(bundles.values.rows()), 1);
    for (Eigen::Index row = 0; row < bundles.values.rows(); ++row)
        column.set(static_cast<std::size_t>(row), 0, regularityPhrase(
            *technology.technology, bundles.values.row(row).transpose(), technology.inputLabels));
    return underHeader(std::move(column), bundles, "regularity");
}

CellTable compareFormsTable(const CellTable& output, const CellTable& inputs, const Cell& level)
{
    FitArguments arguments;
    arguments.output = output;
    arguments.inputs = inputs;
    arguments.level = level;
    // Cut once here rather than in each of the three fits.
    return compareForms(withoutTrailingEmptyRows(std::move(arguments)));
}

} // namespace isoquant
