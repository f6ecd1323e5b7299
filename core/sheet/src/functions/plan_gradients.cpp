#include "functions/plan_gradients.hpp"

#include "functions/form_gradients.hpp"
#include "isoquant/math/forms/local_shape.hpp"
#include "isoquant/math/messages/input_error.hpp"
#include "isoquant/sheet/arguments/argument_names.hpp"

#include <cmath>

namespace isoquant::delta_method {

namespace {

// G_z is treated as singular below this reciprocal condition number: its solve would carry no
// correct digit (ε·cond ≥ 1e-16·1e12 = 1e-4 at best), as for the bordered Hessian
// (substitution_elasticity.cpp).
constexpr double singularReciprocalCondition = 1e-12;

// G_z (byPlan) and G_θ (byParameters) at a solved plan, as the header gives them.
struct PlanConditions {
    Eigen::MatrixXd byPlan, byParameters;
};

PlanConditions planConditions(const BoundsModel& read, const Eigen::VectorXd& amounts, const Eigen::VectorXd& prices,
                              PlanClosing closing)
{
    const Eigen::Index k = amounts.size(), p = zeroGradient(read).size();
    const LocalShape shape = localShape(*read.technology, amounts);
    const Eigen::VectorXd& e = shape.elasticities;
    const Eigen::VectorXd spent = prices.cwiseProduct(amounts); // wᵢxᵢ
    const double cost = spent.sum(), multiplier = cost / e.sum(); // C and μ
    PlanConditions conditions{Eigen::MatrixXd::Zero(k + 1, k + 1), Eigen::MatrixXd(k + 1, p)};
    Eigen::MatrixXd& byPlan = conditions.byPlan;
    for (Eigen::Index i = 0; i < k; ++i) {
        for (Eigen::Index j = 0; j < k; ++j) // ∂eᵢ/∂ln xⱼ = Sᵢⱼ − eᵢeⱼ + [i = j]·eᵢ
            byPlan(i, j) = -(shape.scaledHessian(i, j) - e(i) * e(j) + (i == j ? e(i) : 0.0));
        byPlan(i, i) += spent(i) / multiplier;
        byPlan(i, k) = -spent(i) / multiplier;
        conditions.byParameters.row(i) = -elasticityGradientOf(read, amounts, i).transpose();
    }
    if (closing == PlanClosing::output) {
        byPlan.block(k, 0, 1, k) = e.transpose();
        conditions.byParameters.row(k) = logOutputGradientOf(read, amounts).transpose();
    } else {
        byPlan.block(k, 0, 1, k) = spent.transpose() / cost;
        conditions.byParameters.row(k).setZero();
    }
    return conditions;
}

Eigen::FullPivLU<Eigen::MatrixXd> checkedFactors(const PlanConditions& conditions)
{
    const Eigen::FullPivLU<Eigen::MatrixXd> lu(conditions.byPlan);
    if (!conditions.byPlan.allFinite() || !conditions.byParameters.allFinite() || !lu.isInvertible() ||
        lu.rcond() < singularReciprocalCondition)
        throw argumentError(argument::what, "the plan's first-order conditions are singular here (a flat optimum), "
                                            "so the plan has no derivative in the parameters and no bounds");
    return lu;
}

} // namespace

Eigen::MatrixXd planSensitivity(const BoundsModel& read, const Eigen::VectorXd& amounts, const Eigen::VectorXd& prices,
                                PlanClosing closing)
{
    const PlanConditions conditions = planConditions(read, amounts, prices, closing);
    return -checkedFactors(conditions).solve(conditions.byParameters);
}

Eigen::VectorXd efficientScaleLogGradient(const BoundsModel& read, const Eigen::VectorXd& amounts,
                                          const Eigen::VectorXd& prices)
{
    const Eigen::Index k = amounts.size();
    const PlanConditions conditions = planConditions(read, amounts, prices, PlanClosing::output);
    const Eigen::FullPivLU<Eigen::MatrixXd> lu = checkedFactors(conditions);
    const Eigen::MatrixXd byParameters = -lu.solve(conditions.byParameters);
    const Eigen::VectorXd byLogOutput = lu.solve(Eigen::VectorXd::Unit(k + 1, k)); // −G_z⁻¹·(−e_k)
    const Eigen::VectorXd gapByParameters = byParameters.row(k).transpose() - logCostGradient(byParameters, amounts, prices);
    const double gapByLogOutput = byLogOutput(k) - logCostGradient(byLogOutput, amounts, prices)(0);
    // d ln ε/d ln y ≈ 0: ε touches 1 without crossing, and ln y* does not move smoothly with θ (the
    // cut-off 1e-12 against slopes of order 0.01 to 1: common practice, no source).
    if (!(std::fabs(gapByLogOutput) > 1e-12))
        throw argumentError(argument::what, "the cost elasticity only touches 1 at the efficient scale, so the "
                                            "efficient scale has no derivative in the parameters and no bounds");
    return -gapByParameters / gapByLogOutput;
}

Eigen::VectorXd logCostGradient(const Eigen::MatrixXd& sensitivity, const Eigen::VectorXd& amounts,
                                const Eigen::VectorXd& prices)
{
    const Eigen::VectorXd shares = prices.cwiseProduct(amounts) / prices.dot(amounts); // wᵢxᵢ/C
    return sensitivity.topRows(amounts.size()).transpose() * shares;
}

Eigen::VectorXd budgetOutputGradient(const BoundsModel& read, const Eigen::MatrixXd& sensitivity,
                                     const Eigen::VectorXd& amounts)
{
    Eigen::VectorXd elasticities(amounts.size());
    for (Eigen::Index i = 0; i < amounts.size(); ++i) elasticities(i) = read.technology->elasticity(amounts, i);
    return logOutputGradientOf(read, amounts) + sensitivity.topRows(amounts.size()).transpose() * elasticities;
}

Eigen::VectorXd planNumbers(const CellTable& plan, Eigen::Index count)
{
    Eigen::VectorXd numbers(count);
    for (Eigen::Index i = 0; i < count; ++i) numbers(i) = plan.number(0, static_cast<std::size_t>(i));
    return numbers;
}

CellTable planRowOfBounds(const CellTable& plan, const BoundsModel& read, Statistic statistic,
                          const Eigen::MatrixXd& logGradients, const std::string& argumentName,
                          const std::string& tooLarge)
{
    CellTable row(1, static_cast<std::size_t>(logGradients.rows()));
    for (Eigen::Index cell = 0; cell < logGradients.rows(); ++cell) {
        const auto column = static_cast<std::size_t>(cell);
        const Linearised quantity{plan.number(0, column), logGradients.row(cell).transpose(), true};
        const double result = answer(quantity, read, statistic, 0);
        if (!std::isfinite(result)) throw argumentError(argumentName, tooLarge);
        row.set(0, column, result);
    }
    return row;
}

} // namespace isoquant::delta_method
