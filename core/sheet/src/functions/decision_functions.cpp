#include "isoquant/sheet/functions/decision_functions.hpp"

#include "isoquant/sheet/arguments/argument_names.hpp"
#include "isoquant/math/forms/ces.hpp"
#include "isoquant/math/decisions/ces_closed_forms.hpp"
#include "isoquant/math/forms/cobb_douglas.hpp"
#include "isoquant/sheet/arguments/decision_arguments.hpp"
#include "isoquant/math/forms/homogeneous_cost.hpp"
#include "isoquant/math/messages/input_error.hpp"
#include "isoquant/math/numerics/level_roots.hpp"
#include "isoquant/math/forms/local_shape.hpp"
#include "isoquant/sheet/arguments/model_inputs.hpp"
#include "isoquant/sheet/arguments/numeric_range.hpp"
#include "isoquant/math/decisions/numerical_decisions.hpp"
#include "isoquant/sheet/models/production_model.hpp"
#include "isoquant/math/forms/substitution_elasticity.hpp"
#include "isoquant/math/messages/text.hpp"

#include <cmath>
#include <limits>
#include <optional>
#include <utility>

namespace isoquant {

namespace {

std::string inputName(const ProductionModel& model, Eigen::Index input)
{
    return quoted(model.inputLabels[static_cast<std::size_t>(input)]);
}

std::string labelOf(const ProductionModel& model, Eigen::Index input)
{
    return model.inputLabels[static_cast<std::size_t>(input)];
}

std::string secondPartialTitle(const ProductionModel& model, Eigen::Index i, Eigen::Index j)
{
    if (i == j) return "second derivative in " + labelOf(model, i);
    return "cross derivative in " + labelOf(model, i) + " and " + labelOf(model, j);
}

std::string rowPlace(const NumericColumns& rows, Eigen::Index row, const std::string& argument)
{
    return argument + ": row " + std::to_string(static_cast<std::size_t>(row) + rows.firstDataRow());
}

// One cell per row of bundles: `evaluate(bundle, place)` gives a number or a text; a number too
// large to represent is reported, never shown as inf.
template <typename Evaluate>
CellTable perBundle(const NumericColumns& bundles, Evaluate evaluate)
{
    CellTable column(static_cast<std::size_t>(bundles.values.rows()), 1);
    Eigen::VectorXd bundle(bundles.values.cols()); // one vector for every row: no allocation per row
    for (Eigen::Index row = 0; row < bundles.values.rows(); ++row) {
        const std::string place = rowPlace(bundles, row, argument::inputs);
        bundle = bundles.values.row(row).transpose();
        Cell result = evaluate(bundle, place);
        if (isNumber(result) && !std::isfinite(std::get<double>(result)))
            throw InputError(place + " gives a result too large to represent");
        column.set(static_cast<std::size_t>(row), 0, std::move(result));
    }
    return column;
}

// The second of two selected inputs, which must differ from the first, `i`.
Eigen::Index readOtherInput(Eigen::Index i, const Cell& second, const ProductionModel& model,
                            const std::string& firstName, const std::string& secondName)
{
    const Eigen::Index j = readInputSelector(second, model, secondName);
    if (i == j)
        throw InputError(secondName + ": is the same input as " + firstName + " (" + inputName(model, i) +
                         "); give two different inputs");
    return j;
}

std::string undefinedText(const std::string& what, const std::string& why) { return what + " undefined here: " + why; }

// The closed form where the model has one (Cobb-Douglas; CES once its technology class is read
// from cells), else empty and the numerical solve is used.
std::optional<HomogeneousCost> closedFormCost(const ProductionModel& model, const Eigen::VectorXd& prices)
{
    // CES inside its closed form's domain; at its edges (ρ = 0, −1, δ at 0 or 1) the numerical solve.
    if (const auto* ces = dynamic_cast<const Ces*>(model.technology.get())) {
        const CesParameters parameters{std::exp(ces->logScale), ces->weight, ces->curvature, ces->returnsToScale};
        if (cesParameterProblem(parameters).empty()) return cesCost(parameters, Eigen::Vector2d(prices(0), prices(1)));
        return std::nullopt;
    }
    const auto* cobbDouglas = dynamic_cast<const CobbDouglas*>(model.technology.get());
    if (!cobbDouglas) return std::nullopt;
    for (Eigen::Index i = 0; i < cobbDouglas->exponents.size(); ++i)
        if (!(cobbDouglas->exponents(i) > 0))
            throw argumentError(argument::model,
                                "the exponent of " + inputName(model, i) + " is " +
                                    formatNumber(cobbDouglas->exponents(i)) +
                                    "; more of that input never raises output, so no plan with a positive amount of it "
                                    "is best (every exponent must be positive)");
    return cobbDouglasCost(*cobbDouglas, prices);
}

// A figure shown from a plan must be a normal double, between 2.2e-308 and 1.8e308: below that a
// double keeps too few digits (6e-323 has 4 bits) to be an answer. Else the level asked for is
// beyond what doubles hold, and the message names the figure.
void requireInRange(double value, const std::string& what, const std::string& argument)
{
    if (std::isnan(value) || value < 0)
        throw InputError(argument + ": " + what + " is not a number that can be represented");
    if (std::isinf(value))
        throw InputError(argument + ": the plan is not representable: " + what +
                         " would exceed " + localDecimal("1.8e308") + ", the largest number a cell holds");
    if (value < std::numeric_limits<double>::min())
        throw InputError(argument + ": the plan is not representable: " + what +
                         " would be below " + localDecimal("2.2e-308") + ", the smallest number a cell holds at full precision");
}

// The amounts and the output of a plan, which every decision shows or rests on.
void requireRepresentable(const ProductionPlan& plan, const ProductionModel& model, const std::string& argument)
{
    for (Eigen::Index i = 0; i < plan.inputs.size(); ++i)
        requireInRange(plan.inputs(i), "the amount of " + inputName(model, i), argument);
    requireInRange(plan.output, "the output", argument);
}

// The figure PRODCOST shows, and its name in a message.
std::pair<double, std::string> costFigure(const ProductionPlan& plan, CostMeasure measure, double level)
{
    switch (measure) {
    case CostMeasure::marginal: return {plan.marginalCost, "the marginal cost"};
    case CostMeasure::average: return {plan.cost / level, "the average cost"};
    // ε = ∂ln C/∂ln y = MC·y/C; returns to scale 1/ε
    case CostMeasure::costElasticity: return {plan.marginalCost * level / plan.cost, "the cost elasticity"};
    case CostMeasure::returnsToScale: return {plan.cost / (plan.marginalCost * level), "the returns to scale"};
    case CostMeasure::total: break;
    }
    return {plan.cost, "the cost"};
}

CellTable rowOf(const Eigen::VectorXd& values)
{
    CellTable row(1, static_cast<std::size_t>(values.size()));
    for (Eigen::Index i = 0; i < values.size(); ++i) row.set(0, static_cast<std::size_t>(i), values(i));
    return row;
}

// Runs a decision: its plan laid out, or the reason there is none (its status) in a single cell.
template <typename Solve, typename Layout>
CellTable decided(Solve solve, Layout layout)
{
    const ProductionPlan plan = solve();
    if (!plan.solved()) return singleCell(plan.status.reason);
    return layout(plan);
}

// Under decreasing returns a profit maximum always exists, but where the price barely covers
// the cost its output can be a speck (4.8e-17 hours of labour): below a millionth of one unit of
// output the plan is reported as producing nothing (the threshold: common practice, no source).
constexpr double negligibleOutput = 1e-6;

ProductionPlan withoutNegligibleSize(ProductionPlan plan)
{
    if (!plan.solved() || !(plan.output < negligibleOutput)) return plan;
    // Three significant digits: the size is read, not computed with.
    return noPlan("No profitable size: producing nothing is best at these prices (the best output, " +
                  formatNumber(plan.output, 3) + ", is below a millionth of one unit)");
}

struct DecisionSetup {
    ProductionModel model;
    Eigen::VectorXd prices;
};

DecisionSetup readDecision(const ModelTable& model, const CellTable& prices, const std::string& pricesName)
{
    DecisionSetup setup{model.production(), {}};
    setup.prices = readPrices(prices, pricesName, static_cast<Eigen::Index>(setup.model.inputLabels.size()));
    return setup;
}

ProductionPlan leastCostOf(const DecisionSetup& setup, double target)
{
    if (const auto cost = closedFormCost(setup.model, setup.prices)) return leastCostPlan(*cost, target);
    return solveLeastCost(*setup.model.technology, target, setup.prices);
}

} // namespace

CellTable secondPartialColumn(const ModelTable& model, const CellTable& inputs, const Cell& first, const Cell& second)
{
    const ProductionModel& technology = model.production();
    const Eigen::Index i = readInputSelector(first, technology, argument::firstInput);
    const Eigen::Index j = isOmitted(second) ? i : readInputSelector(second, technology, argument::secondInput);
    const NumericColumns bundles = readModelInputs(inputs, technology);
    return underHeader(perBundle(bundles, [&](const Eigen::VectorXd& bundle, const std::string&) {
        return Cell(technology.technology->secondPartial(bundle, i, j));
    }),
                       bundles, secondPartialTitle(technology, i, j));
}

CellTable inputReturnsColumn(const ModelTable& model, const CellTable& inputs, const Cell& input)
{
    const ProductionModel& technology = model.production();
    const Eigen::Index chosen = readInputSelector(input, technology, argument::input);
    const NumericColumns bundles = readModelInputs(inputs, technology);
    return underHeader(perBundle(bundles, [&](const Eigen::VectorXd& bundle, const std::string& place) {
        return Cell(inputReturnsWord(checkedLocalShape(*technology.technology, bundle, place), chosen));
    }),
                       bundles, "returns to " + labelOf(technology, chosen));
}

CellTable inputPairColumn(const ModelTable& model, const CellTable& inputs, const Cell& first, const Cell& second)
{
    const ProductionModel& technology = model.production();
    const Eigen::Index i = readInputSelector(first, technology, argument::firstInput);
    const Eigen::Index j = readOtherInput(i, second, technology, argument::firstInput, argument::secondInput);
    const NumericColumns bundles = readModelInputs(inputs, technology);
    return underHeader(perBundle(bundles, [&](const Eigen::VectorXd& bundle, const std::string& place) {
        return Cell(inputPairWord(checkedLocalShape(*technology.technology, bundle, place), i, j));
    }),
                       bundles, labelOf(technology, i) + " with " + labelOf(technology, j));
}

CellTable technicalRateColumn(const ModelTable& model, const CellTable& inputs, const Cell& first, const Cell& second)
{
    const ProductionModel& technology = model.production();
    const Eigen::Index i = readInputSelector(first, technology, argument::firstInput);
    const Eigen::Index j = readOtherInput(i, second, technology, argument::firstInput, argument::secondInput);
    const NumericColumns bundles = readModelInputs(inputs, technology);
    return underHeader(perBundle(bundles, [&](const Eigen::VectorXd& bundle, const std::string&) {
        // fᵢ/fⱼ = (eᵢ/xᵢ)/(eⱼ/xⱼ), from the elasticities so that Y cancels before it can overflow.
        const double ei = technology.technology->elasticity(bundle, i);
        const double ej = technology.technology->elasticity(bundle, j);
        if (ej == 0)
            return Cell(undefinedText("rate", "the marginal product of " + inputName(technology, j) + " is 0"));
        return Cell(ei / ej * (bundle(j) / bundle(i)));
    }),
                       bundles, "MRTS of " + labelOf(technology, i) + " for " + labelOf(technology, j));
}

CellTable substitutionColumn(const ModelTable& model, const CellTable& inputs, const Cell& first, const Cell& second,
                             const Cell& kind)
{
    const ProductionModel& technology = model.production();
    const Eigen::Index i = readInputSelector(first, technology, argument::firstInput);
    const Eigen::Index j = readOtherInput(i, second, technology, argument::firstInput, argument::secondInput);
    const SubstitutionKind chosen = readSubstitutionKind(kind);
    const NumericColumns bundles = readModelInputs(inputs, technology);
    return underHeader(perBundle(bundles, [&](const Eigen::VectorXd& bundle, const std::string& place) {
        const auto value =
            substitutionElasticity(checkedLocalShape(*technology.technology, bundle, place), i, j, chosen);
        if (!value)
            return Cell(undefinedText("elasticity", "a marginal product is 0, or the isoquant is straight or "
                                                    "not curved at this bundle"));
        return Cell(*value);
    }),
                       bundles, "elasticity of substitution, " + labelOf(technology, i) + " and " + labelOf(technology, j));
}

CellTable leastCostRow(const ModelTable& model, const Cell& target, const CellTable& prices)
{
    const DecisionSetup setup = readDecision(model, prices, argument::inputPrices);
    const double level = readPositiveNumber(target, argument::targetOutput);
    return decided([&] { return leastCostOf(setup, level); },
                   [&](const ProductionPlan& plan) {
                       requireRepresentable(plan, setup.model, argument::targetOutput);
                       return rowOf(plan.inputs);
                   });
}

CellTable costCell(const ModelTable& model, const Cell& target, const CellTable& prices, const Cell& what)
{
    const DecisionSetup setup = readDecision(model, prices, argument::inputPrices);
    const double level = readPositiveNumber(target, argument::targetOutput);
    const CostMeasure measure = readCostMeasure(what);
    return decided([&] { return leastCostOf(setup, level); },
                   [&](const ProductionPlan& plan) {
                       requireRepresentable(plan, setup.model, argument::targetOutput);
                       const auto [figure, what] = costFigure(plan, measure, level);
                       requireInRange(figure, what, argument::targetOutput);
                       return singleCell(figure);
                   });
}

CellTable budgetRow(const ModelTable& model, const Cell& budget, const CellTable& prices)
{
    const DecisionSetup setup = readDecision(model, prices, argument::inputPrices);
    const double spending = readPositiveNumber(budget, argument::budget);
    return decided(
        [&] {
            if (const auto cost = closedFormCost(setup.model, setup.prices)) return budgetPlan(*cost, spending);
            return solveBudget(*setup.model.technology, spending, setup.prices);
        },
        [&](const ProductionPlan& plan) {
            requireRepresentable(plan, setup.model, argument::budget);
            Eigen::VectorXd row(plan.inputs.size() + 1);
            row << plan.inputs, plan.output;
            return rowOf(row);
        });
}

CellTable profitRow(const ModelTable& model, const Cell& outputPrice, const CellTable& inputPrices)
{
    const DecisionSetup setup = readDecision(model, inputPrices, argument::inputPrices);
    const double price = readPositiveNumber(outputPrice, argument::outputPrice);
    return decided(
        [&] {
            if (const auto cost = closedFormCost(setup.model, setup.prices))
                return withoutNegligibleSize(profitPlan(*cost, price));
            return withoutNegligibleSize(solveProfit(*setup.model.technology, price, setup.prices));
        },
        [&](const ProductionPlan& plan) {
            requireRepresentable(plan, setup.model, argument::outputPrice);
            const double profit = price * plan.output - plan.cost;
            if (!std::isfinite(profit))
                throw argumentError(argument::outputPrice, "the answer is too large to represent");
            Eigen::VectorXd row(plan.inputs.size() + 2);
            row << plan.inputs, plan.output, profit;
            return rowOf(row);
        });
}

CellTable isoquantColumn(const ModelTable& model, const Cell& level, const CellTable& values, const Cell& first,
                         const Cell& second)
{
    const ProductionModel& technology = model.production();
    const auto k = static_cast<Eigen::Index>(technology.inputLabels.size());
    if (k < 2) throw argumentError(argument::model, "an isoquant needs a model of at least two inputs");
    const Eigen::Index i = isOmitted(first) ? 0 : readInputSelector(first, technology, argument::firstInput);
    const Eigen::Index j = isOmitted(second)
                               ? (i == 0 ? 1 : 0)
                               : readOtherInput(i, second, technology, argument::firstInput, argument::secondInput);
    const double logLevel = std::log(readPositiveNumber(level, argument::outputLevel));

    const std::string argument = "values of input i";
    Eigen::MatrixXd bundles;
    NumericColumns read;
    if (values.columns() == 1) {
        if (k != 2)
            throw InputError(argument + ": the model has " + std::to_string(k) +
                             " inputs; give one column per input (the others are held at the values in each row)");
        read = readNumericColumns(values, argument, ValueRule::positive, "input");
        bundles = Eigen::MatrixXd::Ones(read.values.rows(), 2);
        bundles.col(i) = read.values.col(0);
    } else if (static_cast<Eigen::Index>(values.columns()) == k) {
        // Column j is not read: its cells are replaced before the range is read (a header row,
        // text in every other column, keeps its text there).
        CellTable filled = values;
        bool header = true;
        for (std::size_t column = 0; column < values.columns(); ++column)
            if (column != static_cast<std::size_t>(j) &&
                !(values.isText(0, column) && !values.text(0, column).empty()))
                header = false;
        for (std::size_t row = 0; row < filled.rows(); ++row)
            filled.set(row, static_cast<std::size_t>(j),
                       (row == 0 && header) ? Cell(std::string("input j")) : Cell(1.0));
        read = readNumericColumns(filled, argument, ValueRule::positive, "input");
        bundles = read.values;
    } else {
        throw InputError(argument + ": has " + std::to_string(values.columns()) + " columns; give one column of values "
                         "of input i (a two-input model) or one column per model input (" + std::to_string(k) + ")");
    }

    CellTable column(static_cast<std::size_t>(bundles.rows()), 1);
    for (Eigen::Index row = 0; row < bundles.rows(); ++row) {
        Eigen::VectorXd bundle = bundles.row(row).transpose();
        bundle(j) = 1;
        const auto amount = amountForLevel(*technology.technology, bundle, j, logLevel);
        column.set(static_cast<std::size_t>(row), 0,
                   amount ? Cell(*amount)
                          : Cell("no amount of " + inputName(technology, j) + " gives this output with " +
                                 inputName(technology, i) + " at " + formatNumber(bundle(i))));
    }
    return column;
}

} // namespace isoquant
