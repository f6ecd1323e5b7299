#include "isoquant/sheet/functions/growth_functions.hpp"

#include "isoquant/sheet/arguments/argument_names.hpp"
#include "isoquant/math/growth/growth_accounting.hpp"
#include "isoquant/sheet/tables/growth_table.hpp"
#include "isoquant/math/growth/index_numbers.hpp"
#include "isoquant/math/messages/input_error.hpp"
#include "isoquant/sheet/arguments/option_arguments.hpp"
#include "isoquant/sheet/arguments/model_inputs.hpp"
#include "isoquant/sheet/arguments/numeric_range.hpp"
#include "isoquant/sheet/arguments/period_range.hpp"
#include "isoquant/sheet/models/production_model.hpp"
#include "isoquant/math/messages/text.hpp"

#include <cmath>
#include <optional>

namespace isoquant {

namespace {

enum class GrowthMethod { tornqvist, fixed };

// "tornqvist" may also be written with its ö.
GrowthMethod readGrowthMethod(const Cell& cell)
{
    return readChoice<GrowthMethod>(cell, argument::method, "a method",
                                    {{"tornqvist", GrowthMethod::tornqvist},
                                     {"törnqvist", GrowthMethod::tornqvist, false},
                                     {"fixed", GrowthMethod::fixed}},
                                    GrowthMethod::tornqvist);
}

IndexFormula readIndexFormula(const Cell& cell)
{
    return readChoice<IndexFormula>(cell, argument::method, "an index method",
                                    {{"tornqvist", IndexFormula::tornqvist},
                                     {"törnqvist", IndexFormula::tornqvist, false},
                                     {"laspeyres", IndexFormula::laspeyres},
                                     {"paasche", IndexFormula::paasche},
                                     {"fisher", IndexFormula::fisher}},
                                    IndexFormula::tornqvist);
}

double readIndexBase(const Cell& cell)
{
    if (isOmitted(cell)) return 1;
    if (isNumber(cell)) {
        const double base = std::get<double>(cell);
        if (std::isfinite(base) && base > 0) return base;
    }
    throw argumentError(argument::base,
                        describe(cell) + " is not a base value; give a positive number such as 1 or 100");
}

void requireColumns(const NumericColumns& columns, const std::string& argument, std::size_t wanted,
                    const std::string& wantedWhat)
{
    const auto have = static_cast<std::size_t>(columns.values.cols());
    if (have != wanted)
        throw InputError(argument + ": has " + plural(have, "column") + " but " + wantedWhat + " " +
                         std::to_string(wanted));
}

// Columns that line up by position must carry the same labels where both ranges have a header:
// shares or a model listed in another order would otherwise weigh the wrong input, silently.
void requireSameLabels(const std::string& argument, const std::string& ownNoun, const std::vector<std::string>& own,
                       const std::string& referenceNoun, const std::vector<std::string>& reference)
{
    for (std::size_t i = 0; i < own.size() && i < reference.size(); ++i)
        if (!equalsIgnoringCase(own[i], reference[i]))
            throw InputError(argument + ": " + ownNoun + " " + std::to_string(i + 1) + " is " + quoted(own[i]) +
                             " but " + referenceNoun + " " + std::to_string(i + 1) + " is " + quoted(reference[i]) +
                             "; give them the same labels, in the same order");
}

// The model reader names its argument "model"; in PRODGROWTH the model is the argument "weights".
ProductionModel readModelArgument(const ModelTable& range, const std::string& argument)
{
    try {
        return range.production();
    } catch (const InputError& error) {
        const std::string message = sheetMessage(error);
        const std::string prefix = "model:";
        if (argument != "model" && message.rfind(prefix, 0) == 0)
            throw InputError(argument + ":" + message.substr(prefix.size()));
        throw;
    }
}

bool holdsModel(const CellTable& weights)
{
    if (weights.columns() < 2 || weights.rows() < 2) return false;
    bool anyLabel = false;
    for (std::size_t row = 1; row < weights.rows(); ++row) {
        if (weights.isNumber(row, 0)) return false;
        anyLabel = anyLabel || (weights.isText(row, 0) && !weights.text(row, 0).empty());
    }
    return anyLabel;
}

struct PeriodWeights {
    Eigen::MatrixXd values;              // one row per period, one column per input
    std::vector<std::string> labels;     // the model's input labels, or the shares' header
    bool fromModel = false;
    bool labelled = false;               // labels came from a model or a header row
    std::optional<ProductionForm> form;  // the model's form
};

PeriodWeights readWeights(const CellTable& weights, const NumericColumns& inputs)
{
    PeriodWeights result;
    const auto k = static_cast<std::size_t>(inputs.values.cols());
    if (holdsModel(weights)) {
        const ProductionModel model = readModelArgument(weights, argument::weights);
        if (model.inputLabels.size() != k)
            throw argumentError(argument::weights, "the model has " + plural(model.inputLabels.size(), "input") +
                                                       " but inputs has " + plural(k, "column"));
        if (inputs.hasHeader) requireSameLabels("weights", "the model's input", model.inputLabels, "inputs column", inputs.labels);
        result.values = periodElasticities(*model.technology, inputs.values);
        result.labels = model.inputLabels;
        result.fromModel = result.labelled = true;
        result.form = model.form;
        return result;
    }
    NumericColumns shares = readPeriodColumns(weights, argument::weights, PeriodValueRule::nonNegative, "input");
    shares.rowNames = inputs.rowNames;
    requireColumns(shares, argument::weights, k, "inputs has");
    requireSamePeriods(inputs, argument::inputs, shares, argument::weights);
    if (inputs.hasHeader && shares.hasHeader) requireShareLabels("weights", shares.labels, "inputs column", inputs.labels);
    result.values = sharesRescaledToOne(shares, argument::weights);
    result.labels = shares.labels;
    result.labelled = shares.hasHeader;
    return result;
}

Eigen::MatrixXd intervalWeights(const PeriodWeights& weights, GrowthMethod method)
{
    if (method == GrowthMethod::tornqvist) return tornqvistIntervalWeights(weights.values);
    if (!weights.fromModel)
        throw argumentError(argument::method,
                            "\"fixed\" uses a model's constant elasticities; with cost shares as weights use "
                            "\"tornqvist\"");
    if (weights.form != ProductionForm::cobbDouglas)
        throw argumentError(argument::method,
                            "\"fixed\" needs elasticities that are the same in every period (a cobb-douglas "
                            "model); this model is " +
                                formWord(*weights.form) + ", so use \"tornqvist\"");
    // A Cobb-Douglas model's elasticities are its exponents, the same in every period's row.
    return weights.values.bottomRows(weights.values.rows() - 1);
}

// ν of every interval must be positive: the contributions divide by it.
void requirePositiveScale(const Eigen::MatrixXd& weights, const NumericColumns& inputs)
{
    for (Eigen::Index interval = 0; interval < weights.rows(); ++interval) {
        const double scale = weights.row(interval).sum();
        if (!(scale > 0) || !std::isfinite(scale))
            throw argumentError(argument::weights,
                                "from " + periodPlace(inputs, interval) + " to " + periodPlace(inputs, interval + 1) +
                                    " the elasticities sum to " + formatNumber(scale) +
                                    "; the decomposition divides by this returns to scale, so it must be positive");
    }
}

void requireFinite(const GrowthAccount& account, const NumericColumns& inputs)
{
    for (std::size_t interval = 0; interval < account.periods.size(); ++interval) {
        const GrowthComponents& period = account.periods[interval];
        if (!std::isfinite(period.output) || !period.inputs.allFinite() || !std::isfinite(period.scaleEffect) ||
            !std::isfinite(period.productivity))
            throw argumentError(argument::weights, periodPlace(inputs, static_cast<Eigen::Index>(interval) + 1) +
                                                       " gives a result too large to represent");
    }
    if (!std::isfinite(account.total.productivity) || !account.total.inputs.allFinite())
        throw argumentError(argument::weights, "the total over all periods is too large to represent");
}

// PRODTFP's periods: λ·(tᵢ − t_last) for every row, moving the model's ln A (that of the latest
// period) to the row's own period.
Eigen::VectorXd periodShifts(const ProductionModel& model, const CellTable& periods, Eigen::Index rows)
{
    if (model.hasPeriodEffects)
        throw argumentError(argument::periods,
                            "the model has period effects (\"two-way\"), which its table does not hold; "
                            "fit a trend instead, or leave periods out");
    if (!model.technicalChange)
        throw argumentError(argument::periods,
                            "the model has no trend (no \"technical change per period\" row), so every row "
                            "has the same technology; leave periods out");
    if (!model.latestPeriod)
        throw argumentError(argument::periods,
                            "the model has no \"latest period\" row, the period its ln A refers to; refit it "
                            "with PRODFIT, or add the row after an empty row");
    const NumericColumns read = readNumericColumns(periods, argument::periods, ValueRule::finite, "period");
    if (read.values.cols() != 1)
        throw argumentError(argument::periods, "must be one column; it has " + std::to_string(read.values.cols()));
    if (read.values.rows() != rows)
        throw argumentError(argument::periods, "has " + plural(static_cast<std::size_t>(read.values.rows()), "row") +
                                                   " of data but output has " +
                                                   plural(static_cast<std::size_t>(rows), "row"));
    return *model.technicalChange * (read.values.col(0).array() - *model.latestPeriod);
}

} // namespace

CellTable productivityColumn(const ModelTable& model, const CellTable& output, const CellTable& inputs,
                             const CellTable& periods)
{
    const ProductionModel technology = readModelArgument(model, argument::model);
    const NumericColumns observed = readNumericColumns(output, argument::output, ValueRule::positive, "output");
    if (observed.values.cols() != 1)
        throw argumentError(argument::output, "must be one column; it has " + std::to_string(observed.values.cols()));
    const NumericColumns bundles = readModelInputs(inputs, technology);
    if (bundles.values.rows() != observed.values.rows())
        throw argumentError(argument::inputs, "has " + plural(static_cast<std::size_t>(bundles.values.rows()), "row") +
                                                  " of data but output has " +
                                                  plural(static_cast<std::size_t>(observed.values.rows()), "row"));

    const Eigen::VectorXd shifts =
        periods.empty() ? Eigen::VectorXd() : periodShifts(technology, periods, observed.values.rows());
    const Eigen::VectorXd levels =
        productivityLevels(*technology.technology, observed.values.col(0), bundles.values, shifts);
    CellTable column(static_cast<std::size_t>(levels.size()), 1);
    for (Eigen::Index row = 0; row < levels.size(); ++row) {
        if (!std::isfinite(levels(row)) || levels(row) == 0)
            throw argumentError(argument::inputs,
                                "row " + std::to_string(static_cast<std::size_t>(row) + bundles.firstDataRow()) +
                                    " gives a productivity too large or too small to represent");
        column.set(static_cast<std::size_t>(row), 0, levels(row));
    }
    return underHeader(std::move(column), observed, "TFP");
}

CellTable growthAccountTable(const CellTable& output, const CellTable& inputs, const CellTable& weights,
                             const Cell& method, const CellTable& periods)
{
    const GrowthMethod chosen = readGrowthMethod(method);
    const NumericColumns observed = readPeriodColumns(output, argument::output, PeriodValueRule::positive, "output");
    if (observed.values.cols() != 1)
        throw argumentError(argument::output, "must be one column; it has " + std::to_string(observed.values.cols()));
    if (observed.values.rows() < 2) throw argumentError(argument::output, "growth needs at least 2 periods; it has 1");
    NumericColumns quantities = readPeriodColumns(inputs, argument::inputs, PeriodValueRule::positive, "input");
    requireSamePeriods(observed, argument::output, quantities, argument::inputs);
    const std::vector<Cell> names =
        periods.empty() ? std::vector<Cell>{} : readPeriodNames(periods, observed, argument::output);
    for (const Cell& name : names) quantities.rowNames.push_back(periodNameText(name));

    const PeriodWeights periodWeights = readWeights(weights, quantities);
    const Eigen::MatrixXd interval = intervalWeights(periodWeights, chosen);
    requirePositiveScale(interval, quantities);
    const GrowthAccount account = accountForGrowth(observed.values.col(0), quantities.values, interval);
    requireFinite(account, quantities);
    const bool inputsNamed = quantities.hasHeader || !periodWeights.labelled;
    return growthTable(account, inputsNamed ? quantities.labels : periodWeights.labels, names);
}

CellTable quantityIndexColumn(const CellTable& quantities, const CellTable& shares, const Cell& method,
                              const Cell& base, const CellTable& periods)
{
    const IndexFormula formula = readIndexFormula(method);
    const double baseValue = readIndexBase(base);
    NumericColumns amounts = readPeriodColumns(quantities, argument::quantities, PeriodValueRule::positive, "item");
    if (!periods.empty())
        for (const Cell& name : readPeriodNames(periods, amounts, argument::quantities))
            amounts.rowNames.push_back(periodNameText(name));
    NumericColumns weights = readPeriodColumns(shares, argument::shares, PeriodValueRule::nonNegative, "item");
    weights.rowNames = amounts.rowNames;
    requireColumns(weights, argument::shares, static_cast<std::size_t>(amounts.values.cols()), "quantities has");
    requireSamePeriods(amounts, argument::quantities, weights, argument::shares);
    if (amounts.hasHeader && weights.hasHeader)
        requireShareLabels("shares", weights.labels, "quantities column", amounts.labels);
    const Eigen::MatrixXd rescaled = sharesRescaledToOne(weights, argument::shares);

    const Eigen::VectorXd logIndex = chainedLogQuantityIndex(formula, amounts.values, rescaled);
    CellTable column(static_cast<std::size_t>(logIndex.size()), 1);
    for (Eigen::Index period = 0; period < logIndex.size(); ++period) {
        // base·exp(0) is the base exactly in the first period.
        const double value = baseValue * std::exp(logIndex(period));
        if (!std::isfinite(value) || value == 0)
            throw argumentError(argument::quantities,
                                periodPlace(amounts, period) + ": the index is too large or too small to represent");
        column.set(static_cast<std::size_t>(period), 0, value);
    }
    return underHeader(std::move(column), amounts, "quantity index");
}

} // namespace isoquant
