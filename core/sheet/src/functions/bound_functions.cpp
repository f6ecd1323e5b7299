#include "isoquant/sheet/functions/bound_functions.hpp"

#include "isoquant/sheet/functions/production_functions.hpp"
#include "isoquant/math/forms/cobb_douglas.hpp"
#include "isoquant/sheet/arguments/decision_arguments.hpp"
#include "isoquant/sheet/functions/cost_decisions.hpp"
#include "isoquant/sheet/functions/decision_functions.hpp"
#include "isoquant/math/numerics/distributions.hpp"
#include "isoquant/math/messages/input_error.hpp"
#include "isoquant/sheet/arguments/model_inputs.hpp"
#include "isoquant/sheet/arguments/option_arguments.hpp"
#include "isoquant/sheet/models/production_model.hpp"
#include "isoquant/sheet/tables/table_labels.hpp"
#include "isoquant/math/messages/text.hpp"

#include <array>
#include <cmath>
#include <functional>

namespace isoquant {

namespace {

enum class Statistic { value, standardError, lowerBound, upperBound, predictionLower, predictionUpper };

constexpr std::array<const char*, 6> statisticWords{"value",       "std. error",       "lower bound",
                                                    "upper bound", "prediction lower", "prediction upper"};

Statistic readWhat(const Cell& what, bool allowsPrediction)
{
    if (isEmpty(what)) return Statistic::value;
    const std::size_t known = allowsPrediction ? statisticWords.size() : 4;
    if (isText(what))
        for (std::size_t word = 0; word < known; ++word)
            if (equalsIgnoringCase(std::get<std::string>(what), statisticWords[word])) return Statistic(word);
    std::string list;
    for (std::size_t word = 0; word < known; ++word)
        list += std::string(word == 0 ? "" : word + 1 == known ? " or " : ", ") + "\"" + statisticWords[word] + "\"";
    throw InputError("what: give " + list);
}

std::string word(Statistic statistic) { return statisticWords[static_cast<std::size_t>(statistic)]; }

// A quantity at one bundle: its value and the gradient in θ of ln(value) (log scale) or of value.
struct Linearised {
    double value = 0;
    Eigen::VectorXd gradient;
    bool logScale = false;
};

struct BoundsModel {
    ProductionModel model;
    const CobbDouglas* form = nullptr;
    const CovarianceBlock* block = nullptr;
    double critical = 0;
};

BoundsModel readBoundsModel(const ModelTable& range, Statistic statistic, bool needsLogScale)
{
    BoundsModel read{range.production()};
    const std::string asked = "what: \"" + word(statistic) + "\" ";
    if (!read.model.parameterCovariance)
        throw InputError(asked + "needs the model's covariance block; this model has none (a typed model, or a "
                                 "PRODFIT table made without covariance TRUE)");
    read.form = dynamic_cast<const CobbDouglas*>(read.model.technology.get());
    if (!read.form) throw InputError(asked + "is available for the cobb-douglas form only so far");
    if (needsLogScale && read.model.logScaleShifted)
        throw InputError(asked + "is not available when the model's ln A is shifted (controls at their means, "
                                 "effects or a trend): the covariance block does not cover that ln A");
    read.block = &*read.model.parameterCovariance;
    read.critical = studentCriticalValue(read.block->level, read.block->degreesOfFreedom);
    return read;
}

// The residual SD row of the table, for one new plant's interval.
double residualSd(const CellTable& range)
{
    for (std::size_t row = 0; row < range.rows(); ++row)
        if (range.isText(row, 0) && equalsIgnoringCase(range.text(row, 0), residualSdLabel) && range.columns() > 1 &&
            range.isNumber(row, 1) && range.number(row, 1) >= 0)
            return range.number(row, 1);
    throw InputError("what: the prediction bounds need the table's \"residual SD\" row");
}

double answer(const Linearised& quantity, const BoundsModel& read, Statistic statistic, double residualVariance)
{
    // gᵀVg over the parameters the quantity depends on: a parameter without a variance ("n/a", ln A
    // under effects) may stand in V where g is 0.
    double variance = 0;
    const Eigen::VectorXd& g = quantity.gradient;
    for (Eigen::Index i = 0; i < g.size(); ++i)
        for (Eigen::Index j = 0; j < g.size(); ++j)
            if (g(i) != 0 && g(j) != 0) variance += g(i) * read.block->matrix(i, j) * g(j);
    if (!std::isfinite(variance))
        throw InputError("what: the covariance block has no variance for a parameter this quantity uses");
    const double spread = std::sqrt(variance);
    const double t = read.critical;
    if (!quantity.logScale) {
        switch (statistic) {
        case Statistic::standardError: return spread;
        case Statistic::lowerBound: return quantity.value - t * spread;
        case Statistic::upperBound: return quantity.value + t * spread;
        default: return quantity.value;
        }
    }
    const double predictionSpread = std::sqrt(variance + residualVariance);
    switch (statistic) {
    case Statistic::standardError: return quantity.value * spread;
    case Statistic::lowerBound: return quantity.value * std::exp(-t * spread);
    case Statistic::upperBound: return quantity.value * std::exp(t * spread);
    case Statistic::predictionLower: return quantity.value * std::exp(-t * predictionSpread);
    case Statistic::predictionUpper: return quantity.value * std::exp(t * predictionSpread);
    default: return quantity.value;
    }
}

CellTable columnOfBounds(const CellTable& inputs, const BoundsModel& read, Statistic statistic,
                         double residualVariance, const std::string& title,
                         const std::function<Linearised(const Eigen::VectorXd&)>& linearise)
{
    const NumericColumns bundles = readModelInputs(inputs, read.model);
    CellTable column(static_cast<std::size_t>(bundles.values.rows()), 1);
    for (Eigen::Index row = 0; row < bundles.values.rows(); ++row) {
        const double result = answer(linearise(bundles.values.row(row).transpose()), read, statistic, residualVariance);
        if (!std::isfinite(result))
            throw InputError("inputs: row " + std::to_string(static_cast<std::size_t>(row) + bundles.firstDataRow()) +
                             " gives a result too large to represent");
        column.set(static_cast<std::size_t>(row), 0, result);
    }
    return underHeader(std::move(column), bundles, word(statistic) + " of " + title);
}

// g of ln Y: 1 for ln A, ln xᵢ for bᵢ, 0 for the controls.
Eigen::VectorXd logOutputGradient(const BoundsModel& read, const Eigen::VectorXd& bundle)
{
    Eigen::VectorXd gradient = Eigen::VectorXd::Zero(read.block->matrix.rows());
    gradient(0) = 1;
    gradient.segment(1, bundle.size()) = bundle.array().log().matrix();
    return gradient;
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
    Eigen::VectorXd gradient = Eigen::VectorXd::Zero(read.block->matrix.rows());
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
    const BoundsModel read = readBoundsModel(model, statistic, true);
    if ((read.form->exponents.array() <= 0).any())
        throw InputError("what: \"" + word(statistic) + "\" needs every exponent positive, as the least-cost plan does");
    const Eigen::VectorXd wages = readPrices(prices, "input prices", read.form->exponents.size());
    const double level = readPositiveNumber(target, "target output");
    CellTable row(1, static_cast<std::size_t>(wages.size()));
    for (Eigen::Index input = 0; input < wages.size(); ++input) {
        const double result = answer(leastCostAmount(read, wages, level, input), read, statistic, 0);
        if (!std::isfinite(result)) throw InputError("target output: gives amounts too large to represent");
        row.set(0, static_cast<std::size_t>(input), result);
    }
    return row;
}

CellTable outputColumnWithBounds(const ModelTable& model, const CellTable& inputs, const Cell& mean, const Cell& what)
{
    const Statistic statistic = readWhat(what, true);
    if (statistic == Statistic::value) return outputColumn(model, inputs, mean);
    const BoundsModel read = readBoundsModel(model, statistic, true);
    const bool prediction = statistic == Statistic::predictionLower || statistic == Statistic::predictionUpper;
    double factor = 1;
    if (readSwitchArgument(mean, "mean") && !prediction) {
        if (!read.model.smearingFactor) throw InputError("mean: the model has no \"smearing factor\" row");
        factor = *read.model.smearingFactor;
    }
    const double sigma = prediction ? residualSd(model.cells()) : 0;
    return columnOfBounds(inputs, read, statistic, sigma * sigma, factor == 1 ? "output" : "mean output",
                          [&](const Eigen::VectorXd& bundle) {
                              return Linearised{factor * read.form->output(bundle), logOutputGradient(read, bundle),
                                                true};
                          });
}

CellTable marginalProductColumnWithBounds(const ModelTable& model, const CellTable& inputs, const Cell& input,
                                          const Cell& what)
{
    const Statistic statistic = readWhat(what, false);
    if (statistic == Statistic::value) return marginalProductColumn(model, inputs, input);
    const BoundsModel read = readBoundsModel(model, statistic, true);
    const Eigen::Index chosen = readInputSelector(input, read.model, "input");
    const double exponent = read.form->exponents(chosen);
    return columnOfBounds(
        inputs, read, statistic, 0, "marginal product of " + read.model.inputLabels[static_cast<std::size_t>(chosen)],
        [&](const Eigen::VectorXd& bundle) {
            // ln MPᵢ = ln bᵢ + ln Y − ln xᵢ: ∂/∂bᵢ adds 1/bᵢ. Not positive by nature when bᵢ ≤ 0: then
            // the gradient of MPᵢ itself, MPᵢ·(g of ln Y) + Y/xᵢ at bᵢ.
            const double marginal = read.form->marginalProduct(bundle, chosen);
            Eigen::VectorXd gradient = logOutputGradient(read, bundle);
            if (exponent > 0) {
                gradient(1 + chosen) += 1 / exponent;
                return Linearised{marginal, gradient, true};
            }
            gradient *= marginal;
            gradient(1 + chosen) += read.form->output(bundle) / bundle(chosen);
            return Linearised{marginal, gradient, false};
        });
}

CellTable elasticityColumnWithBounds(const ModelTable& model, const CellTable& inputs, const Cell& input,
                                     const Cell& what)
{
    const Statistic statistic = readWhat(what, false);
    if (statistic == Statistic::value) return elasticityColumn(model, inputs, input);
    const BoundsModel read = readBoundsModel(model, statistic, false);
    const Eigen::Index chosen = readInputSelector(input, read.model, "input");
    Eigen::VectorXd gradient = Eigen::VectorXd::Zero(read.block->matrix.rows());
    gradient(1 + chosen) = 1;
    return columnOfBounds(inputs, read, statistic, 0,
                          "output elasticity of " + read.model.inputLabels[static_cast<std::size_t>(chosen)],
                          [&](const Eigen::VectorXd&) { return Linearised{read.form->exponents(chosen), gradient}; });
}

CellTable scaleColumnWithBounds(const ModelTable& model, const CellTable& inputs, const Cell& what)
{
    const Statistic statistic = readWhat(what, false);
    if (statistic == Statistic::value) return scaleColumn(model, inputs);
    const BoundsModel read = readBoundsModel(model, statistic, false);
    Eigen::VectorXd gradient = Eigen::VectorXd::Zero(read.block->matrix.rows());
    gradient.segment(1, read.form->exponents.size()).setOnes();
    const Linearised scale{read.form->scaleElasticity(), gradient};
    if (inputs.empty()) {
        CellTable single(1, 1);
        single.set(0, 0, answer(scale, read, statistic, 0));
        return single;
    }
    return columnOfBounds(inputs, read, statistic, 0, "returns to scale",
                          [&](const Eigen::VectorXd&) { return scale; });
}

} // namespace isoquant
