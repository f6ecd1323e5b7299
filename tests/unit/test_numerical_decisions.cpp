// The numerical least-cost, budget and profit solves (numerical_decisions.hpp), which serve any
// smooth technology, against the closed forms on Cobb-Douglas and on the test CES, and against
// their own optimality conditions on the test translog. Parameters and prices are seeded draws.
#include "solved_plan.hpp"
#include "isoquant/math/decisions/ces_closed_forms.hpp"
#include "isoquant/math/forms/cobb_douglas.hpp"
#include "isoquant/math/forms/homogeneous_cost.hpp"
#include "isoquant/math/decisions/numerical_decisions.hpp"
#include "ces_test_technology.hpp"
#include "relative_error.hpp"
#include "translog_test_technology.hpp"

#include <boost/test/unit_test.hpp>

#include <cmath>
#include <random>

using isoquant::CobbDouglas;
using isoquant::ProductionPlan;
using isoquant::testing::closeTo;

namespace {

// The solver accepts an answer when each equation holds to 1e-9 (absolute, on quantities of
// order 1); the equations' Jacobian is well conditioned for these draws (exponents and weights
// away from 0), so each input is then right to well within 1e-7 relative. In practice the
// iteration runs on to rounding level.
constexpr double solveTolerance = 1e-7;

void requireSamePlan(const ProductionPlan& numerical, const ProductionPlan& closed)
{
    BOOST_TEST_REQUIRE(numerical.solved(), "no plan: " << numerical.status.reason);
    BOOST_TEST_REQUIRE(closed.solved(), "no plan: " << closed.status.reason);
    BOOST_TEST_REQUIRE(numerical.inputs.size() == closed.inputs.size());
    for (Eigen::Index i = 0; i < closed.inputs.size(); ++i)
        BOOST_TEST(closeTo(numerical.inputs(i), closed.inputs(i), solveTolerance));
    BOOST_TEST(closeTo(numerical.output, closed.output, solveTolerance));
    BOOST_TEST(closeTo(numerical.cost, closed.cost, solveTolerance));
    BOOST_TEST(closeTo(numerical.marginalCost, closed.marginalCost, solveTolerance));
}

// The reason a plan does not exist, or "<a plan>".
std::string statusOf(const std::function<ProductionPlan()>& solve)
{
    const ProductionPlan plan = solve();
    return plan.solved() ? "<a plan>" : plan.status.reason;
}

} // namespace

BOOST_AUTO_TEST_SUITE(numerical_decisions)

BOOST_AUTO_TEST_CASE(agree_with_the_cobb_douglas_closed_forms)
{
    std::mt19937 engine(31);
    std::uniform_real_distribution<double> exponent(0.1, 0.6), price(0.5, 40.0), level(1.0, 1e4);
    for (int k = 1; k <= 5; ++k)
        for (int n = 0; n < 10; ++n) {
            Eigen::VectorXd b(k), w(k);
            for (int i = 0; i < k; ++i) {
                b(i) = exponent(engine) / (k > 1 ? 1.2 : 1.0);
                w(i) = price(engine);
            }
            const CobbDouglas technology(0.7, b);
            const auto cost = isoquant::cobbDouglasCost(technology, w);
            const double target = level(engine);
            requireSamePlan(isoquant::solveLeastCost(technology, target, w), isoquant::leastCostPlan(cost, target));
            requireSamePlan(isoquant::solveBudget(technology, target, w), isoquant::budgetPlan(cost, target));
            if (b.sum() < 1)
                requireSamePlan(isoquant::solveProfit(technology, 3.0, w), isoquant::profitPlan(cost, 3.0));
        }
}

BOOST_AUTO_TEST_CASE(agree_with_the_ces_closed_forms)
{
    std::mt19937 engine(37);
    std::uniform_real_distribution<double> weight(0.15, 0.85), rho(-0.7, 3.0), returns(0.5, 0.95), price(0.5, 40.0);
    for (int n = 0; n < 50; ++n) {
        const isoquant::CesParameters p{1.3, weight(engine), rho(engine), returns(engine)};
        if (std::fabs(p.rho) < 0.05) continue;
        const isoquant::testing::CesTestTechnology technology(p);
        const Eigen::Vector2d w(price(engine), price(engine));
        const auto cost = isoquant::cesCost(p, w);
        requireSamePlan(isoquant::solveLeastCost(technology, 50.0, w), isoquant::leastCostPlan(cost, 50.0));
        requireSamePlan(isoquant::solveBudget(technology, 900.0, w), isoquant::budgetPlan(cost, 900.0));
        requireSamePlan(isoquant::solveProfit(technology, 40.0, w), isoquant::profitPlan(cost, 40.0));
    }
}

BOOST_AUTO_TEST_CASE(translog_answers_meet_their_conditions)
{
    // Tangency (fᵢ/wᵢ equal across inputs), the target or the budget met, and p·fᵢ = wᵢ at the
    // profit maximum, to the solver's acceptance rule carried into relative terms (1e-7).
    Eigen::Matrix3d b;
    b << -0.04, 0.01, 0.005, 0.01, -0.03, 0.01, 0.005, 0.01, -0.05;
    const isoquant::testing::TranslogTestTechnology technology(0.5, Eigen::Vector3d(0.35, 0.25, 0.2), b);
    const Eigen::Vector3d w(4.0, 9.0, 2.5);
    const auto leastCost = isoquant::testing::requireSolved(isoquant::solveLeastCost(technology, 20.0, w));
    BOOST_TEST(closeTo(technology.output(leastCost.inputs), 20.0, solveTolerance));
    const auto budget = isoquant::testing::requireSolved(isoquant::solveBudget(technology, 500.0, w));
    BOOST_TEST(closeTo(w.dot(budget.inputs), 500.0, solveTolerance));
    for (const auto* plan : {&leastCost, &budget})
        for (int i = 0; i < 3; ++i)
            BOOST_TEST(closeTo(w(i) / technology.marginalProduct(plan->inputs, i), plan->marginalCost, solveTolerance));
    const auto profit = isoquant::testing::requireSolved(isoquant::solveProfit(technology, 6.0, w));
    for (int i = 0; i < 3; ++i) BOOST_TEST(closeTo(6.0 * technology.marginalProduct(profit.inputs, i), w(i), solveTolerance));
}

BOOST_AUTO_TEST_CASE(report_no_profit_maximum_as_such)
{
    // A constant-returns CES: the same sentence as the closed form, with its unit cost.
    const isoquant::CesParameters constant{1.0, 0.5, 1.0, 1.0};
    const isoquant::testing::CesTestTechnology ces(constant);
    const Eigen::Vector2d w(1.0, 1.0);
    const double unitCost = std::exp(isoquant::cesCost(constant, w).logUnitCost);
    // With δ = ½, ρ = 1: [½/x + ½/x]⁻¹ = x, so one unit needs x₁ = x₂ = 1, at cost 2.
    BOOST_TEST(closeTo(unitCost, 2.0, 1e-12));
    BOOST_TEST(statusOf([&] { return isoquant::solveProfit(ces, 10.0, w); }).rfind(
                   "No finite profit maximum: returns to scale are constant (1)", 0) == 0);
    // A translog with increasing returns everywhere (ν = 1.3): its first-order point is a
    // profit minimum, not a maximum, and it is reported as such (not as a search that did not settle).
    const isoquant::testing::TranslogTestTechnology increasing(0.0, Eigen::Vector2d(0.6, 0.7), Eigen::Matrix2d::Zero());
    const std::string status = statusOf([&] { return isoquant::solveProfit(increasing, 2.0, w); });
    BOOST_TEST(status == "No profit maximum found: where price equals marginal value for every input, the profit "
                         "function is not concave, so that point is not a maximum");
}

BOOST_AUTO_TEST_SUITE_END()
