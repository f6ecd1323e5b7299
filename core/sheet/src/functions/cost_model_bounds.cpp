#include "functions/cost_model_bounds.hpp"

#include "isoquant/math/messages/input_error.hpp"
#include "isoquant/math/messages/text.hpp"
#include "isoquant/math/numerics/distributions.hpp"
#include "isoquant/sheet/arguments/decision_arguments.hpp"
#include "isoquant/sheet/functions/cost_functions.hpp"
#include "isoquant/sheet/tables/cost_table.hpp"
#include "isoquant/sheet/tables/table_labels.hpp"

#include <cmath>

namespace isoquant {

using delta_method::Linearised;
using delta_method::Statistic;

namespace {

Eigen::Index priceNamed(const CostModel& model, const std::string& label)
{
    for (std::size_t i = 0; i < model.priceLabels.size(); ++i)
        if (equalsIgnoringCase(model.priceLabels[i], label)) return static_cast<Eigen::Index>(i);
    return -1;
}

// The gradients in the parameters (in the model's row order) of ln C and of the cost elasticity
// ε = ∂ln C/∂ln y at (y, w): ln C is linear in them, with coefficients 1 (constant), ln y (output),
// ln wᵢ (a price), ½(ln y)² (output*output), ½(ln wᵢ)² or ln wᵢ·ln wⱼ (i*i, i*j: the symmetric pair
// counted twice in ½ΣΣ), ln wᵢ·ln y (i*output), 0 (a control, held at its mean); ε's are 1 (output),
// ln y (output*output) and ln wᵢ (i*output).
struct CostGradients {
    Eigen::VectorXd logCost;
    Eigen::VectorXd elasticity;
};

CostGradients gradientsAt(const CostModel& model, double level, const Eigen::VectorXd& prices)
{
    const auto p = static_cast<Eigen::Index>(model.parameterLabels.size());
    CostGradients gradients{Eigen::VectorXd::Zero(p), Eigen::VectorXd::Zero(p)};
    const double logOutput = std::log(level);
    auto logPrice = [&](const std::string& label) { return std::log(prices(priceNamed(model, label))); };
    for (Eigen::Index index = 0; index < p; ++index) {
        const std::string& label = model.parameterLabels[static_cast<std::size_t>(index)];
        const auto star = label.find('*');
        if (equalsIgnoringCase(label, costConstantLabel)) {
            gradients.logCost(index) = 1;
        } else if (equalsIgnoringCase(label, costOutputLabel)) {
            gradients.logCost(index) = logOutput;
            gradients.elasticity(index) = 1;
        } else if (endsWithIgnoringCase(label, controlSuffix)) {
            continue;
        } else if (star == std::string::npos) {
            gradients.logCost(index) = logPrice(label);
        } else {
            const std::string first = label.substr(0, star), second = label.substr(star + 1);
            const bool firstIsOutput = equalsIgnoringCase(first, costOutputLabel);
            if (firstIsOutput && equalsIgnoringCase(second, costOutputLabel)) {
                gradients.logCost(index) = 0.5 * logOutput * logOutput;
                gradients.elasticity(index) = logOutput;
            } else if (equalsIgnoringCase(second, costOutputLabel)) {
                gradients.logCost(index) = logPrice(first) * logOutput;
                gradients.elasticity(index) = logPrice(first);
            } else {
                gradients.logCost(index) =
                    (equalsIgnoringCase(first, second) ? 0.5 : 1.0) * logPrice(first) * logPrice(second);
            }
        }
    }
    return gradients;
}

// The figure `measure` at (y, w) with the gradient of what the bounds are taken on: ln of total,
// average and (positive) marginal cost; the elasticity ε and returns to scale 1/ε themselves.
Linearised linearised(const CostModel& model, CostMeasure measure, double level, const Eigen::VectorXd& prices,
                      double value)
{
    const CostGradients g = gradientsAt(model, level, prices);
    const double elasticity = model.costElasticity(level, prices);
    switch (measure) {
    case CostMeasure::total:
    case CostMeasure::average:
        return {value, g.logCost, true};
    case CostMeasure::marginal:
        // ln MC = ln ε + ln C − ln y; a marginal cost ≤ 0 (ε ≤ 0) gets value ± t·se instead.
        if (elasticity > 0) return {value, g.logCost + g.elasticity / elasticity, true};
        return {value, value / elasticity * g.elasticity + value * g.logCost, false};
    case CostMeasure::costElasticity:
        return {value, g.elasticity, false};
    case CostMeasure::returnsToScale:
        return {value, -g.elasticity / (elasticity * elasticity), false};
    }
    return {value, g.logCost, true};
}

// The gradient in the block's parameters: with the shifted constant s as the block's last row, the
// figure f(s, θ) has ∂f/∂s where the gradient above has ∂f/∂constant, and 0 at the constant itself
// and at the controls (held at their means, inside s).
Linearised onBlock(const CostModel& model, Linearised quantity)
{
    if (!model.covarianceCoversShiftedConstant) return quantity;
    const Eigen::Index last = quantity.gradient.size();
    quantity.gradient.conservativeResize(last + 1);
    quantity.gradient(last) = quantity.gradient(0);
    quantity.gradient(0) = 0;
    return quantity;
}

} // namespace

void requireCostBlock(const CostModel& model, const std::string& argumentName, Statistic statistic)
{
    if (!model.covariance)
        throw InputError(argumentName + ": \"" + delta_method::word(statistic) +
                         "\" needs the model's covariance block; this cost model has none (typed rows, or a "
                         "PRODCOSTFIT table made without covariance TRUE)");
}

CellTable costModelColumnWithBounds(const CellTable& modelCells, const CellTable& target, const CellTable& prices,
                                    const Cell& what, Statistic statistic, const CellTable& values)
{
    const CostModel model = readCostModel(modelCells);
    requireCostBlock(model, argument::statistic, statistic);
    const CostMeasure measure = readCostMeasure(what);
    const double critical = studentCriticalValue(model.covariance->level, model.covariance->degreesOfFreedom);
    return costColumnOfBounds(target, prices, model.prices.size(), values,
                              [&](double level, const Eigen::VectorXd& rowPrices, double value) {
                                  return delta_method::answer(
                                      onBlock(model, linearised(model, measure, level, rowPrices, value)),
                                      *model.covariance, critical, statistic, 0);
                              });
}

CellTable costColumnOfBounds(const CellTable& target, const CellTable& prices, Eigen::Index inputs,
                             const CellTable& values,
                             const std::function<double(double, const Eigen::VectorXd&, double)>& bound)
{
    const NumericColumns outputs =
        readNumericColumns(target, argument::targetOutput, ValueRule::positive, "target output");
    const Eigen::Index n = outputs.values.rows();
    const Eigen::MatrixXd priceRows = readPriceRows(prices, n, inputs, argument::targetOutput);
    CellTable column = values;
    for (Eigen::Index row = 0; row < n; ++row) {
        const auto cell = static_cast<std::size_t>(row);
        if (!values.isNumber(cell, 0)) continue;
        const Eigen::VectorXd rowPrices = priceRows.row(priceRows.rows() == 1 ? 0 : row).transpose();
        const double result = bound(outputs.values(row, 0), rowPrices, values.number(cell, 0));
        if (!std::isfinite(result))
            throw argumentError(argument::targetOutput, "row " + std::to_string(cell + outputs.firstDataRow()) +
                                                            " gives a result too large to represent");
        column.set(cell, 0, result);
    }
    return column;
}

double efficientScaleWithBounds(const CostModel& model, const Eigen::VectorXd& prices, double scale,
                                Statistic statistic)
{
    requireCostBlock(model, argument::what, statistic);
    // ln y* solves ε(ln y, θ) = 1; implicitly ∂ln y*/∂θ = −(∂ε/∂θ)/(∂ε/∂ln y) at y*, with ∂ε/∂ln y = β_yy
    // (> 0 where y* exists). y* > 0: bounds on the log scale.
    const Linearised quantity{scale, -gradientsAt(model, scale, prices).elasticity / model.outputSquared, true};
    const double critical = studentCriticalValue(model.covariance->level, model.covariance->degreesOfFreedom);
    const double result = delta_method::answer(onBlock(model, quantity), *model.covariance, critical, statistic, 0);
    if (!std::isfinite(result)) throw argumentError(argument::inputPrices, "give a result too large to represent");
    return result;
}

} // namespace isoquant
