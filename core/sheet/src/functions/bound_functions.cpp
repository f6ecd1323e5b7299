#include "isoquant/sheet/functions/bound_functions.hpp"

#include "isoquant/sheet/arguments/argument_names.hpp"
#include "functions/delta_method.hpp"
#include "functions/form_gradients.hpp"
#include "functions/plan_gradients.hpp"

#include "isoquant/sheet/functions/production_functions.hpp"
#include "isoquant/math/forms/cobb_douglas.hpp"
#include "isoquant/sheet/arguments/decision_arguments.hpp"
#include "isoquant/sheet/functions/cost_decisions.hpp"
#include "isoquant/sheet/functions/decision_functions.hpp"
#include "isoquant/math/messages/input_error.hpp"
#include "isoquant/sheet/arguments/model_inputs.hpp"
#include "isoquant/sheet/arguments/option_arguments.hpp"
#include "isoquant/sheet/models/production_model.hpp"
#include "isoquant/sheet/tables/table_labels.hpp"
#include "isoquant/math/messages/text.hpp"

#include <cmath>

namespace isoquant {

namespace {

using namespace delta_method;

// The residual SD row of the table, for one new plant's interval.
double residualSd(const CellTable& range)
{
    for (std::size_t row = 0; row < range.rows(); ++row)
        if (range.isText(row, 0) && equalsIgnoringCase(range.text(row, 0), residualSdLabel) && range.columns() > 1 &&
            range.isNumber(row, 1) && range.number(row, 1) >= 0)
            return range.number(row, 1);
    throw argumentError(argument::what, "the prediction bounds need the table's \"residual SD\" row");
}

// ln xᵢ of the least-cost plan for y at prices w (homogeneous_cost.hpp, Cobb-Douglas):
//   ln xᵢ = ln bᵢ − ln wᵢ + S/ν,  S = ln y − ln A + Σⱼ bⱼ ln(wⱼ/bⱼ),  ν = Σⱼ bⱼ,
// so ∂/∂ln A = −1/ν and ∂/∂bₖ = [k = i]/bᵢ − S/ν² + (ln(wₖ/bₖ) − 1)/ν.
Linearised leastCostAmount(const BoundsModel& read, const Eigen::VectorXd& prices, double target, Eigen::Index input)
{
    const Eigen::VectorXd& exponents = read.form->exponents;
    const double nu = exponents.sum();
    const Eigen::ArrayXd logRatios = (prices.array() / exponents.array()).log();
    const double sum = std::log(target) - read.form->logScale + (exponents.array() * logRatios).sum();
    Eigen::VectorXd gradient = zeroGradient(read);
    gradient(0) = -1 / nu;
    for (Eigen::Index k = 0; k < exponents.size(); ++k)
        gradient(1 + k) = (k == input ? 1 / exponents(input) : 0.0) - sum / (nu * nu) + (logRatios(k) - 1) / nu;
    const double logAmount = std::log(exponents(input)) - std::log(prices(input)) + sum / nu;
    return Linearised{std::exp(logAmount), gradient, true};
}

} // namespace

CellTable leastCostRowWithBounds(const ModelTable& model, const Cell& target, const CellTable& prices, const Cell& what)
{
    const Statistic statistic = readWhat(what, false);
    if (statistic == Statistic::value) return leastCostAnyRow(model, target, prices); // production or cost model
    const BoundsModel read = readBoundsModel(model, statistic, argument::what, FormsAnswered::all);
    if (!read.form) { // translog, ces: the plain function's plan (a sentence, no plan, stays), plan_gradients.hpp
        const CellTable plan = leastCostAnyRow(model, target, prices);
        if (!plan.isNumber(0, 0)) return plan;
        const Eigen::Index k = read.technology->inputCount();
        const Eigen::VectorXd wages = readPrices(prices, argument::inputPrices, k);
        const Eigen::MatrixXd sensitivity = planSensitivity(read, planNumbers(plan, k), wages, PlanClosing::output);
        return planRowOfBounds(plan, read, statistic, sensitivity.topRows(k), argument::targetOutput,
                               "gives amounts too large to represent");
    }
    if ((read.form->exponents.array() <= 0).any())
        throw argumentError(argument::what,
                            "\"" + word(statistic) + "\" needs every exponent positive, as the least-cost plan does");
    const Eigen::VectorXd wages = readPrices(prices, argument::inputPrices, read.form->exponents.size());
    const double level = readPositiveNumber(target, argument::targetOutput);
    CellTable row(1, static_cast<std::size_t>(wages.size()));
    for (Eigen::Index input = 0; input < wages.size(); ++input) {
        const double result = answer(leastCostAmount(read, wages, level, input), read, statistic, 0);
        if (!std::isfinite(result)) throw argumentError(argument::targetOutput, "gives amounts too large to represent");
        row.set(0, static_cast<std::size_t>(input), result);
    }
    return row;
}

CellTable outputColumnWithBounds(const ModelTable& model, const CellTable& inputs, const Cell& mean, const Cell& what)
{
    const Statistic statistic = readWhat(what, true);
    if (statistic == Statistic::value) return outputColumn(model, inputs, mean);
    const BoundsModel read = readBoundsModel(model, statistic, argument::what, FormsAnswered::all);
    const bool prediction = statistic == Statistic::predictionLower || statistic == Statistic::predictionUpper;
    double factor = 1;
    if (readSwitchArgument(mean, argument::mean) && !prediction) {
        if (!read.model.smearingFactor) throw argumentError(argument::mean, "the model has no \"smearing factor\" row");
        factor = *read.model.smearingFactor;
    }
    const double sigma = prediction ? residualSd(model.cells()) : 0;
    return columnOfBounds(inputs, read, statistic, sigma * sigma, factor == 1 ? "output" : "mean output",
                          [&](const Eigen::VectorXd& bundle) { return outputLinearised(read, bundle, factor); });
}

CellTable marginalProductColumnWithBounds(const ModelTable& model, const CellTable& inputs, const Cell& input,
                                          const Cell& what)
{
    const Statistic statistic = readWhat(what, false);
    if (statistic == Statistic::value) return marginalProductColumn(model, inputs, input);
    const BoundsModel read = readBoundsModel(model, statistic, argument::what, FormsAnswered::all);
    const Eigen::Index chosen = readInputSelector(input, read.model, argument::input);
    return columnOfBounds(inputs, read, statistic, 0,
                          "marginal product of " + read.model.inputLabels[static_cast<std::size_t>(chosen)],
                          [&](const Eigen::VectorXd& bundle) { return marginalProductLinearised(read, bundle, chosen); });
}

CellTable elasticityColumnWithBounds(const ModelTable& model, const CellTable& inputs, const Cell& input,
                                     const Cell& what)
{
    const Statistic statistic = readWhat(what, false);
    if (statistic == Statistic::value) return elasticityColumn(model, inputs, input);
    const BoundsModel read = readBoundsModel(model, statistic, argument::what, FormsAnswered::all);
    const Eigen::Index chosen = readInputSelector(input, read.model, argument::input);
    return columnOfBounds(inputs, read, statistic, 0,
                          "output elasticity of " + read.model.inputLabels[static_cast<std::size_t>(chosen)],
                          [&](const Eigen::VectorXd& bundle) { return elasticityLinearised(read, bundle, chosen); });
}

CellTable scaleColumnWithBounds(const ModelTable& model, const CellTable& inputs, const Cell& what)
{
    const Statistic statistic = readWhat(what, false);
    if (statistic == Statistic::value) return scaleColumn(model, inputs);
    const BoundsModel read = readBoundsModel(model, statistic, argument::what, FormsAnswered::all);
    if (inputs.empty()) {
        // The translog's ν(x) = Σᵢ(αᵢ + Σⱼ βᵢⱼ ln xⱼ) and its gradient depend on the bundle.
        if (read.model.form == ProductionForm::translog)
            throw argumentError(argument::inputs, "the translog's returns to scale and their bounds vary with the "
                                                  "inputs; give a row of inputs");
        CellTable single(1, 1);
        single.set(0, 0, answer(scaleLinearised(read, Eigen::VectorXd()), read, statistic, 0));
        return single;
    }
    return columnOfBounds(inputs, read, statistic, 0, "returns to scale",
                          [&](const Eigen::VectorXd& bundle) { return scaleLinearised(read, bundle); });
}

} // namespace isoquant
