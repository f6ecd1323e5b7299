#include "isoquant/sheet/functions/cost_decisions.hpp"

#include "functions/cost_model_bounds.hpp"
#include "functions/delta_method.hpp"
#include "functions/plan_gradients.hpp"
#include "isoquant/sheet/arguments/argument_names.hpp"
#include "isoquant/sheet/functions/production_functions.hpp"
#include "isoquant/sheet/functions/cost_functions.hpp"
#include "isoquant/sheet/models/cost_model.hpp"
#include "isoquant/sheet/arguments/decision_arguments.hpp"
#include "isoquant/sheet/functions/decision_functions.hpp"
#include "isoquant/math/messages/input_error.hpp"
#include "isoquant/math/forms/local_shape.hpp"
#include "isoquant/math/forms/cost_duality.hpp"
#include "isoquant/sheet/arguments/model_inputs.hpp"
#include "isoquant/sheet/arguments/numeric_range.hpp"
#include "isoquant/sheet/arguments/option_arguments.hpp"
#include "isoquant/sheet/models/production_model.hpp"
#include "isoquant/math/forms/substitution_elasticity.hpp"
#include "isoquant/math/messages/text.hpp"

#include <cmath>
#include <vector>

namespace isoquant {

namespace {

// sᵢ = βᵢ + Σⱼ βᵢⱼ ln wⱼ + βᵢ_y ln y: the gradient of ln C in ln w.
Eigen::VectorXd fittedShares(const CostModel& cost, double output, const Eigen::VectorXd& prices)
{
    const Eigen::VectorXd logPrices = prices.array().log().matrix();
    return cost.prices + cost.priceInteractions * logPrices + cost.priceOutput * std::log(output);
}

// An input of a cost model by its number or its price row's label (as readInputSelector).
Eigen::Index readPriceSelector(const Cell& selector, const CostModel& cost, const std::string& argument)
{
    return readLabelSelector(selector, cost.priceLabels, argument);
}

PriceElasticityKind readPriceElasticityKind(const Cell& cell)
{
    return readChoice<PriceElasticityKind>(cell, argument::kind, "a kind",
                                           {{"demand", PriceElasticityKind::demand},
                                            {"allen", PriceElasticityKind::allen},
                                            {"morishima", PriceElasticityKind::morishima}},
                                           PriceElasticityKind::demand);
}

CellTable rowTable(const Eigen::VectorXd& values)
{
    CellTable row(1, static_cast<std::size_t>(values.size()));
    for (Eigen::Index i = 0; i < values.size(); ++i) row.set(0, static_cast<std::size_t>(i), values(i));
    return row;
}

CellTable costModelLeastCost(const CellTable& model, const Cell& target, const CellTable& priceRange)
{
    const CostModel cost = readCostModel(model);
    const double level = readPositiveNumber(target, argument::targetOutput);
    const Eigen::VectorXd prices = readPrices(priceRange, argument::inputPrices, cost.prices.size());
    const Eigen::VectorXd shares = fittedShares(cost, level, prices);
    for (Eigen::Index i = 0; i < shares.size(); ++i)
        if (!(shares(i) > 0))
            return singleCell("No least-cost plan: the fitted share of " + quoted(cost.priceLabels[static_cast<std::size_t>(i)]) +
                              " is not positive at this output and these prices (the cost model is not regular here)");
    // xᵢ = sᵢ·C/wᵢ, in logs so that only an amount that itself overflows is refused.
    const double logCost = cost.logCost(level, prices);
    Eigen::VectorXd amounts(shares.size());
    for (Eigen::Index i = 0; i < shares.size(); ++i) {
        amounts(i) = std::exp(std::log(shares(i)) + logCost - std::log(prices(i)));
        if (!std::isfinite(amounts(i)) || amounts(i) == 0)
            throw argumentError(argument::targetOutput, "the plan is not representable: the amount of " +
                                                            quoted(cost.priceLabels[static_cast<std::size_t>(i)]) +
                                                            " is beyond what a cell holds");
    }
    return rowTable(amounts);
}

} // namespace

CellTable leastCostAnyRow(const ModelTable& model, const Cell& target, const CellTable& prices)
{
    if (isCostModel(model.cells())) return costModelLeastCost(model.cells(), target, prices);
    return leastCostRow(model, target, prices);
}

namespace {

// Grid of ln y for a production model's efficient scale: outputs from 1e-9 to 1e9, steps of
// ln 10 / 4 (the range and step: common practice, no source; a plan outside it is not sought).
constexpr double lowestLogOutput = -9 * 2.302585092994046, highestLogOutput = 9 * 2.302585092994046;
constexpr int gridSteps = 72;
constexpr int bisections = 80; // halves a step of 0.58 in ln y to below 1e-16 relative

// ε of the least-cost plan for output e^logOutput; empty where there is none (no solution, or a
// plan beyond what a cell holds at the ends of the grid).
std::optional<double> planElasticity(const ModelTable& model, double logOutput, const CellTable& prices)
{
    try {
        const CellTable figure = costCell(model, Cell(std::exp(logOutput)), prices, Cell(std::string("cost elasticity")));
        if (!figure.isNumber(0, 0) || !std::isfinite(figure.number(0, 0))) return std::nullopt;
        return figure.number(0, 0);
    } catch (const InputError&) {
        return std::nullopt;
    }
}

CellTable productionEfficientScale(const ModelTable& model, const CellTable& priceRange)
{
    const ProductionModel& production = model.production();
    const Eigen::VectorXd prices =
        readPrices(priceRange, argument::inputPrices, static_cast<Eigen::Index>(production.inputLabels.size()));
    if (const auto scale = production.technology->constantScaleElasticity())
        return singleCell(efficientScaleOfLogQuadratic(1.0 / *scale, 0.0).whyNone);
    const CellTable priceRow = rowTable(prices);
    std::optional<std::pair<double, double>> previous; // ln y and ε − 1
    bool anyBelow = false, anyAbove = false;
    for (int step = 0; step <= gridSteps; ++step) {
        const double logOutput = lowestLogOutput + (highestLogOutput - lowestLogOutput) * step / gridSteps;
        const auto elasticity = planElasticity(model, logOutput, priceRow);
        if (!elasticity) { previous.reset(); continue; }
        const double gap = *elasticity - 1.0;
        anyBelow |= gap < 0;
        anyAbove |= gap > 0;
        if (previous && previous->second < 0 && gap >= 0) { // ε crosses 1 from below: average cost's minimum
            double low = previous->first, high = logOutput;
            for (int halving = 0; halving < bisections && high - low > 1e-15 * std::max(1.0, std::fabs(low)); ++halving) {
                const double middle = 0.5 * (low + high);
                const auto atMiddle = planElasticity(model, middle, priceRow);
                if (!atMiddle) break;
                (*atMiddle < 1.0 ? low : high) = middle;
            }
            return singleCell(std::exp(0.5 * (low + high)));
        }
        previous = std::make_pair(logOutput, gap);
    }
    const std::string searched = " (outputs from 1e-9 to 1e9 searched)";
    if (anyBelow && anyAbove) return singleCell(std::string(averageCostHasMaximum) + searched);
    if (anyBelow) return singleCell(std::string(averageCostFallsForever) + searched);
    if (anyAbove) return singleCell(std::string(averageCostRisesForever) + searched);
    return singleCell("No efficient scale: no least-cost plan could be found at these prices" + searched);
}

// The word's figure of a production model's y* on the log scale (y* > 0), d ln y*/dθ by the implicit
// function theorem at the least-cost plan of y* (plan_gradients.hpp). Without a block the words
// answer that message first, whatever the form; then the value route's sentences stand (no y* for a
// form of constant scale elasticity, or none found).
CellTable productionEfficientScaleWithBounds(const ModelTable& model, const CellTable& priceRange,
                                             delta_method::Statistic statistic)
{
    const auto read = delta_method::readBoundsModel(model, statistic, argument::what, delta_method::FormsAnswered::all);
    const CellTable scale = productionEfficientScale(model, priceRange);
    if (!scale.isNumber(0, 0)) return scale;
    const Eigen::VectorXd prices = readPrices(priceRange, argument::inputPrices, read.technology->inputCount());
    const Eigen::VectorXd amounts =
        delta_method::planNumbers(leastCostRow(model, Cell(scale.number(0, 0)), rowTable(prices)), prices.size());
    const delta_method::Linearised logScale{scale.number(0, 0),
                                            delta_method::efficientScaleLogGradient(read, amounts, prices), true};
    const double result = delta_method::answer(logScale, read, statistic, 0);
    if (!std::isfinite(result)) throw argumentError(argument::inputPrices, "give a result too large to represent");
    return singleCell(result);
}

} // namespace

CellTable efficientScaleCell(const ModelTable& model, const CellTable& priceRange, const Cell& what)
{
    const auto statistic = delta_method::readWhat(what, false);
    const bool bounds = statistic != delta_method::Statistic::value;
    if (!isCostModel(model.cells()))
        return bounds ? productionEfficientScaleWithBounds(model, priceRange, statistic)
                      : productionEfficientScale(model, priceRange);
    const CostModel cost = readCostModel(model.cells());
    const Eigen::VectorXd prices = readPrices(priceRange, argument::inputPrices, cost.prices.size());
    // ε(y) = a + b·ln y with a = β_y + Σᵢ βᵢ_y ln wᵢ, b = β_yy
    const double atUnitOutput = cost.output + cost.priceOutput.dot(prices.array().log().matrix());
    const EfficientScale scale = efficientScaleOfLogQuadratic(atUnitOutput, cost.outputSquared);
    // Without a block the words answer that message, whatever the form: no guess.
    if (bounds) requireCostBlock(cost, argument::what, statistic);
    if (!scale.output) return singleCell(scale.whyNone);
    if (!bounds) return singleCell(*scale.output);
    return singleCell(efficientScaleWithBounds(cost, prices, *scale.output, statistic));
}

namespace {

std::string undefinedElasticity() { return "elasticity undefined here: a cost share is 0, or the substitution matrix is singular"; }

Cell productionPriceElasticity(const ModelTable& model, const ProductionModel& production, double level,
                               const Eigen::VectorXd& prices, Eigen::Index i, Eigen::Index j, PriceElasticityKind kind,
                               const std::string& place)
{
    const CellTable plan = leastCostRow(model, Cell(level), rowTable(prices));
    if (plan.isText(0, 0)) return plan.at(0, 0);
    Eigen::VectorXd amounts(prices.size());
    for (Eigen::Index input = 0; input < prices.size(); ++input) amounts(input) = plan.number(0, static_cast<std::size_t>(input));
    const LocalShape shape = checkedLocalShape(*production.technology, amounts, place);
    // Morishima from PRODSUBSTITUTION's formula; demand ηᵢⱼ = sⱼσᵢⱼ with sⱼ the plan's cost share.
    const auto value = substitutionElasticity(
        shape, i, j, kind == PriceElasticityKind::morishima ? SubstitutionKind::morishima : SubstitutionKind::allen);
    if (!value) return Cell(undefinedElasticity());
    if (kind != PriceElasticityKind::demand) return Cell(*value);
    const double share = prices(j) * amounts(j) / prices.dot(amounts);
    return Cell(demandFromAllen(*value, share));
}

} // namespace

CellTable priceElasticityColumn(const ModelTable& model, const CellTable& outputRange, const CellTable& priceRange,
                                const Cell& first, const Cell& second, const Cell& kind)
{
    const bool costModel = isCostModel(model.cells());
    const CostModel cost = costModel ? readCostModel(model.cells()) : CostModel{};
    const ProductionModel production = costModel ? ProductionModel{} : model.production();
    Eigen::Index i = 0, j = 0;
    if (costModel) {
        i = readPriceSelector(first, cost, argument::firstInput);
        j = readPriceSelector(second, cost, argument::secondInput);
    } else {
        i = readInputSelector(first, production, argument::firstInput);
        j = readInputSelector(second, production, argument::secondInput);
    }
    const PriceElasticityKind chosen = readPriceElasticityKind(kind);
    if (chosen == PriceElasticityKind::morishima && i == j)
        throw argumentError(argument::secondInput,
                            "is the same input as input i; the Morishima elasticity needs two different inputs");
    const NumericColumns outputs = readNumericColumns(outputRange, argument::output, ValueRule::positive, "output");
    if (outputs.values.cols() != 1)
        throw argumentError(argument::output, "must be one column; it has " + std::to_string(outputs.values.cols()));
    const Eigen::Index n = outputs.values.rows();
    const auto k = costModel ? cost.prices.size() : static_cast<Eigen::Index>(production.inputLabels.size());
    const Eigen::MatrixXd priceRows = readPriceRows(priceRange, n, k, argument::output);
    CellTable column(static_cast<std::size_t>(n), 1);
    for (Eigen::Index row = 0; row < n; ++row) {
        const std::string place = "output: row " + std::to_string(static_cast<std::size_t>(row) + outputs.firstDataRow());
        const Eigen::VectorXd prices = priceRows.row(priceRows.rows() == 1 ? 0 : row).transpose();
        const double level = outputs.values(row, 0);
        Cell result;
        if (costModel) {
            const auto value = costPriceElasticity(fittedShares(cost, level, prices), cost.priceInteractions, i, j, chosen);
            result = value ? Cell(*value) : Cell(undefinedElasticity());
        } else {
            result = productionPriceElasticity(model, production, level, prices, i, j, chosen, place);
        }
        column.set(static_cast<std::size_t>(row), 0, std::move(result));
    }
    return column;
}

CellTable regularityAnyColumn(const ModelTable& model, const CellTable& rows)
{
    if (!isCostModel(model.cells())) return regularityColumn(model, rows);
    const CostModel cost = readCostModel(model.cells());
    const NumericColumns values = readNumericColumns(rows, argument::inputs, ValueRule::positive, "column");
    const Eigen::Index k = cost.prices.size();
    if (values.values.cols() != k + 1)
        throw argumentError(argument::inputs,
                            "has " + std::to_string(values.values.cols()) +
                                " columns; with a cost model give the output and then one price per input (" +
                                std::to_string(k + 1) + " columns)");
    CellTable column(static_cast<std::size_t>(values.values.rows()), 1);
    for (Eigen::Index row = 0; row < values.values.rows(); ++row) {
        const double level = values.values(row, 0);
        const Eigen::VectorXd prices = values.values.row(row).tail(k).transpose();
        column.set(static_cast<std::size_t>(row), 0,
                   costRegularityPhrase(fittedShares(cost, level, prices), cost.priceInteractions, cost.priceLabels));
    }
    return underHeader(std::move(column), values, "regularity");
}

} // namespace isoquant
