// `what` of PRODTFP, PRODSECOND, PRODMRTS, PRODBUDGET and PRODSUBSTITUTION, and PRODCOST's
// `statistic` (bound_functions.hpp):
// the plain function answers first (its checks, messages and sentences unchanged), then each of
// its numbers is replaced by its standard error or bound (delta_method.hpp), with the gradient of
// the Cobb-Douglas form given beside each function; translog and ces models through
// form_gradients.hpp, shape_gradients.hpp and plan_gradients.hpp.
#include "isoquant/sheet/functions/bound_functions.hpp"

#include "isoquant/sheet/arguments/argument_names.hpp"
#include "functions/cost_model_bounds.hpp"
#include "functions/delta_method.hpp"
#include "functions/form_gradients.hpp"
#include "functions/plan_gradients.hpp"
#include "functions/shape_gradients.hpp"

#include "isoquant/sheet/arguments/decision_arguments.hpp"
#include "isoquant/sheet/functions/cost_functions.hpp"
#include "isoquant/sheet/functions/decision_functions.hpp"
#include "isoquant/sheet/functions/growth_functions.hpp"
#include "isoquant/sheet/models/cost_model.hpp"
#include "isoquant/math/messages/input_error.hpp"

#include <cmath>

namespace isoquant {

using namespace delta_method;

namespace {

// PRODCOST's figure of the cobb-douglas least cost at output y and prices w, linearised in θ.
// C = ν·(y/A)^(1/ν)·Π(wⱼ/bⱼ)^(bⱼ/ν), so with S = ln y − ln A + Σ bⱼ ln(wⱼ/bⱼ), ln C = ln ν + S/ν:
// ∂ln C/∂ln A = −1/ν, ∂ln C/∂bₘ = 1/ν + (ln(wₘ/bₘ) − 1)/ν − S/ν² = ln(wₘ/bₘ)/ν − S/ν² (S is
// the numerator of ln C = ln ν + S/ν, ∂S/∂bₘ = ln(wₘ/bₘ) − 1). Average cost C/y has that
// gradient; marginal cost C/(ν·y) subtracts a further 1/ν at each bₘ; all three on the log scale.
// Cost elasticity 1/ν (g = −1/ν² at each bₘ) and returns to scale ν (g = 1 at each bₘ) are
// linear in the exponents as PRODSCALE's ν is: bounds value ∓ t·se.
Linearised costFigureLinearised(const BoundsModel& read, CostMeasure measure, double level,
                                const Eigen::VectorXd& prices, double figure)
{
    const Eigen::VectorXd& b = read.form->exponents;
    const double scale = b.sum();
    Eigen::VectorXd gradient = zeroGradient(read);
    if (measure == CostMeasure::costElasticity || measure == CostMeasure::returnsToScale) {
        gradient.segment(1, b.size()).setConstant(measure == CostMeasure::returnsToScale ? 1 : -1 / (scale * scale));
        return Linearised{figure, gradient, false};
    }
    const Eigen::ArrayXd logPriceOverExponent = (prices.array() / b.array()).log();
    const double numerator = std::log(level) - read.form->logScale + (b.array() * logPriceOverExponent).sum();
    gradient(0) = -1 / scale;
    gradient.segment(1, b.size()) = (logPriceOverExponent / scale - numerator / (scale * scale)).matrix();
    if (measure == CostMeasure::marginal) gradient.segment(1, b.size()).array() -= 1 / scale;
    return Linearised{figure, gradient, true};
}

// The cobb-douglas budget plan (every bᵢ > 0, as the plain function requires): xᵢ = (bᵢ/ν)·B/wᵢ,
// so g of ln xᵢ (row i) is [m = i]/bᵢ − 1/ν at each bₘ and 0 at ln A. Its output Y = A·Π xⱼ^bⱼ: g
// of ln Y (row k) is 1 at ln A and ln xₘ at bₘ (the amounts' own change adds Σⱼ bⱼ·([m = j]/bⱼ −
// 1/ν) = 0). All positive by nature: bounds on the log scale.
Eigen::MatrixXd cobbDouglasBudgetGradients(const BoundsModel& read, const Eigen::VectorXd& amounts)
{
    const Eigen::VectorXd& b = read.form->exponents;
    const Eigen::Index k = b.size();
    Eigen::MatrixXd gradients = Eigen::MatrixXd::Zero(k + 1, zeroGradient(read).size());
    for (Eigen::Index cell = 0; cell < k; ++cell) {
        gradients.row(cell).segment(1, k).setConstant(-1 / b.sum());
        gradients(cell, 1 + cell) += 1 / b(cell);
    }
    gradients(k, 0) = 1;
    gradients.row(k).segment(1, k) = amounts.array().log().matrix().transpose();
    return gradients;
}

// PRODCOST's figure of a translog or ces least-cost plan (plan_gradients.hpp): the plan is the
// plain PRODLEASTCOST's at this output and these prices, the figure `figure` the plain PRODCOST's.
Linearised planCostFigureLinearised(const ModelTable& model, const BoundsModel& read, CostMeasure measure,
                                    double level, const Eigen::VectorXd& prices, double figure)
{
    CellTable priceRow(1, static_cast<std::size_t>(prices.size()));
    for (Eigen::Index i = 0; i < prices.size(); ++i) priceRow.set(0, static_cast<std::size_t>(i), prices(i));
    const Eigen::VectorXd amounts = planNumbers(leastCostRow(model, level, priceRow), prices.size());
    const Eigen::MatrixXd sensitivity = planSensitivity(read, amounts, prices, PlanClosing::output);
    const Eigen::VectorXd ofLogCost = logCostGradient(sensitivity, amounts, prices);
    const Eigen::VectorXd ofLogMultiplier = sensitivity.row(prices.size()).transpose(); // d ln μ = d ln λ
    switch (measure) {
    case CostMeasure::marginal:
        if (figure > 0) return {figure, ofLogMultiplier, true};
        return {figure, figure * ofLogMultiplier, false};
    case CostMeasure::costElasticity: return {figure, figure * (ofLogMultiplier - ofLogCost), false};
    case CostMeasure::returnsToScale: return {figure, figure * (ofLogCost - ofLogMultiplier), false};
    case CostMeasure::total:
    case CostMeasure::average: break;
    }
    return {figure, ofLogCost, true};
}

} // namespace

CellTable productivityColumnWithBounds(const ModelTable& model, const CellTable& output, const CellTable& inputs,
                                       const CellTable& periods, const Cell& what)
{
    const Statistic statistic = readWhat(what, false);
    const CellTable values = productivityColumn(model, output, inputs, periods);
    if (statistic == Statistic::value) return values;
    // TFP = Y/f(x) with Y observed: ln TFP = ln Y − ln f(x), so g of ln TFP is minus g of ln f(x):
    // (−1, −ln x₁ … −ln x_k, 0 …) for cobb-douglas, the translog's and ces's of form_gradients.hpp.
    // Positive by nature: bounds on the log scale.
    const BoundsModel read = readBoundsModel(model, statistic, argument::what, FormsAnswered::all);
    if (periods.empty())
        return boundsOfValueColumn(values, inputs, read, statistic, [&](const Eigen::VectorXd& bundle, double tfp) {
            return Linearised{tfp, -logOutputGradientOf(read, bundle), true};
        });
    // With periods row i's ln A is s + λ·(tᵢ − t_last): g of ln TFP gains −(tᵢ − t_last) at λ,
    // whose row the block holds with a trend (the plain function has refused periods without one).
    if (read.technicalChangeIndex < 0)
        throw argumentError(argument::what, "\"" + word(statistic) + "\" with periods needs the trend's row "
                                            "\"technical change per period\" in the covariance block; refit the "
                                            "table with PRODFIT and covariance TRUE");
    const Eigen::VectorXd sinceLatest =
        readNumericColumns(periods, argument::periods, ValueRule::finite, "period").values.col(0).array() -
        *read.model.latestPeriod;
    return boundsOfValueColumn(values, inputs, read, statistic,
                               [&](Eigen::Index row, const Eigen::VectorXd& bundle, double tfp) {
                                   Eigen::VectorXd gradient = -logOutputGradientOf(read, bundle);
                                   gradient(read.technicalChangeIndex) = -sinceLatest(row);
                                   return Linearised{tfp, gradient, true};
                               });
}

CellTable secondPartialColumnWithBounds(const ModelTable& model, const CellTable& inputs, const Cell& first,
                                        const Cell& second, const Cell& what)
{
    const Statistic statistic = readWhat(what, false);
    const CellTable values = secondPartialColumn(model, inputs, first, second);
    if (statistic == Statistic::value) return values;
    const BoundsModel read = readBoundsModel(model, statistic, argument::what, FormsAnswered::all);
    const Eigen::Index i = readInputSelector(first, read.model, argument::firstInput);
    const Eigen::Index j = isOmitted(second) ? i : readInputSelector(second, read.model, argument::secondInput);
    if (!read.form) // translog, ces: shape_gradients.hpp
        return boundsOfValueColumn(values, inputs, read, statistic, [&](const Eigen::VectorXd& bundle, double partial) {
            return secondPartialLinearised(read, bundle, i, j, partial);
        });
    const Eigen::VectorXd& b = read.form->exponents;
    // fᵢⱼ = c·Y/(xᵢxⱼ) with c = bᵢ(bⱼ − δᵢⱼ): g = fᵢⱼ·(g of ln Y) + Y/(xᵢxⱼ)·∂c/∂θ, where
    // ∂c/∂bᵢ = bⱼ − δᵢⱼ and ∂c/∂bⱼ = bᵢ (together 2bᵢ − 1 when i = j). Its sign varies with the
    // exponents (an own second partial is negative for bᵢ < 1): bounds fᵢⱼ ∓ t·se.
    return boundsOfValueColumn(values, inputs, read, statistic, [&](const Eigen::VectorXd& bundle, double partial) {
        const double scaled = std::exp(read.form->logOutput(bundle) - std::log(bundle(i)) - std::log(bundle(j)));
        Eigen::VectorXd gradient = partial * logOutputGradient(read, bundle);
        gradient(1 + i) += scaled * (b(j) - (i == j ? 1.0 : 0.0));
        gradient(1 + j) += scaled * b(i);
        return Linearised{partial, gradient, false};
    });
}

CellTable technicalRateColumnWithBounds(const ModelTable& model, const CellTable& inputs, const Cell& first,
                                        const Cell& second, const Cell& what)
{
    const Statistic statistic = readWhat(what, false);
    const CellTable values = technicalRateColumn(model, inputs, first, second);
    if (statistic == Statistic::value) return values;
    const BoundsModel read = readBoundsModel(model, statistic, argument::what, FormsAnswered::all);
    const Eigen::Index i = readInputSelector(first, read.model, argument::firstInput);
    const Eigen::Index j = readInputSelector(second, read.model, argument::secondInput);
    if (!read.form) // translog, ces: shape_gradients.hpp
        return boundsOfValueColumn(values, inputs, read, statistic, [&](const Eigen::VectorXd& bundle, double rate) {
            return technicalRateLinearised(read, bundle, i, j, rate);
        });
    const double bi = read.form->exponents(i), bj = read.form->exponents(j);
    // MRTS = (bᵢ/bⱼ)·(xⱼ/xᵢ), free of ln A. With both exponents positive (both marginal products
    // positive) it is positive by nature: ln MRTS = ln bᵢ − ln bⱼ + ln(xⱼ/xᵢ), g = 1/bᵢ at bᵢ and
    // −1/bⱼ at bⱼ, bounds on the log scale. Else the gradient of MRTS itself, (xⱼ/xᵢ)/bⱼ at bᵢ and
    // −MRTS/bⱼ at bⱼ, bounds MRTS ∓ t·se (bⱼ = 0 leaves the plain function's text).
    return boundsOfValueColumn(values, inputs, read, statistic, [&](const Eigen::VectorXd& bundle, double rate) {
        Eigen::VectorXd gradient = zeroGradient(read);
        if (bi > 0 && bj > 0) {
            gradient(1 + i) = 1 / bi;
            gradient(1 + j) = -1 / bj;
            return Linearised{rate, gradient, true};
        }
        gradient(1 + i) = bundle(j) / (bundle(i) * bj);
        gradient(1 + j) = -rate / bj;
        return Linearised{rate, gradient, false};
    });
}

CellTable budgetRowWithBounds(const ModelTable& model, const Cell& budget, const CellTable& prices, const Cell& what)
{
    const Statistic statistic = readWhat(what, false);
    const CellTable plan = budgetRow(model, budget, prices);
    if (statistic == Statistic::value || !plan.isNumber(0, 0)) return plan; // a sentence (no plan) stays
    const BoundsModel read = readBoundsModel(model, statistic, argument::what, FormsAnswered::all);
    const Eigen::Index k = read.technology->inputCount();
    const Eigen::VectorXd amounts = planNumbers(plan, k);
    Eigen::MatrixXd gradients(k + 1, zeroGradient(read).size());
    if (read.form) {
        gradients = cobbDouglasBudgetGradients(read, amounts);
    } else { // translog, ces: plan_gradients.hpp
        const Eigen::VectorXd wages = readPrices(prices, argument::inputPrices, k);
        const Eigen::MatrixXd sensitivity = planSensitivity(read, amounts, wages, PlanClosing::spending);
        gradients.topRows(k) = sensitivity.topRows(k);
        gradients.row(k) = budgetOutputGradient(read, sensitivity, amounts).transpose();
    }
    return planRowOfBounds(plan, read, statistic, gradients, argument::budget, "gives a plan too large to represent");
}

CellTable substitutionColumnWithBounds(const ModelTable& model, const CellTable& inputs, const Cell& first,
                                       const Cell& second, const Cell& kind, const Cell& what)
{
    const Statistic statistic = readWhat(what, false);
    const CellTable values = substitutionColumn(model, inputs, first, second, kind);
    if (statistic == Statistic::value) return values;
    const BoundsModel read = readBoundsModel(model, statistic, argument::what, FormsAnswered::all);
    if (!read.form) { // translog, ces: shape_gradients.hpp
        const Eigen::Index i = readInputSelector(first, read.model, argument::firstInput);
        const Eigen::Index j = readInputSelector(second, read.model, argument::secondInput);
        const SubstitutionKind chosen = readSubstitutionKind(kind);
        return boundsOfValueColumn(values, inputs, read, statistic, [&](const Eigen::VectorXd& bundle, double sigma) {
            return substitutionLinearised(read, bundle, i, j, chosen, sigma);
        });
    }
    // The cobb-douglas form fixes the direct, Allen and Morishima elasticities at 1 whatever its
    // parameters (σᵢⱼ = −fᵢfⱼ(xᵢfᵢ + xⱼfⱼ)/(xᵢxⱼ(fᵢᵢfⱼ² − 2fᵢⱼfᵢfⱼ + fⱼⱼfᵢ²)) = 1 for fᵢ = bᵢY/xᵢ):
    // the gradient is 0, so the std. error is 0 and both bounds are the value. The form allows the
    // data no say; only another form (ces, translog) lets them.
    return boundsOfValueColumn(values, inputs, read, statistic, [&](const Eigen::VectorXd&, double elasticity) {
        return Linearised{elasticity, zeroGradient(read), false};
    });
}

CellTable costColumnWithBounds(const ModelTable& model, const CellTable& target, const CellTable& prices,
                               const Cell& what, const Cell& statistic)
{
    const Statistic asked = readWhat(statistic, false, argument::statistic);
    const CellTable values = costColumn(model, target, prices, what);
    if (asked == Statistic::value) return values;
    if (isCostModel(model.cells()))
        return costModelColumnWithBounds(model.cells(), target, prices, what, asked, values);
    const CostMeasure measure = readCostMeasure(what);
    const BoundsModel read = readBoundsModel(model, asked, argument::statistic, FormsAnswered::all);
    // The plain function has read the outputs (one cell, or a column with an optional header) and
    // the prices; its column has one cell per output, a sentence where no plan exists.
    return costColumnOfBounds(target, prices, read.technology->inputCount(), values,
                              [&](double level, const Eigen::VectorXd& rowPrices, double value) {
                                  const Linearised figure =
                                      read.form ? costFigureLinearised(read, measure, level, rowPrices, value)
                                                : planCostFigureLinearised(model, read, measure, level, rowPrices,
                                                                           value);
                                  return answer(figure, read, asked, 0);
                              });
}

} // namespace isoquant
