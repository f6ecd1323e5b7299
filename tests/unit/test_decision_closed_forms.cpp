// The closed-form least cost, budget split and profit maximum of Cobb-Douglas and CES against
// textbook formulas, duality and optimality properties. Parameters and prices are invented
// (seeded draws), as property tests need; the formulas are named beside each check.
#include "isoquant/math/decisions/ces_closed_forms.hpp"
#include "isoquant/math/forms/homogeneous_cost.hpp"
#include "ces_test_technology.hpp"
#include "relative_error.hpp"

#include <boost/test/unit_test.hpp>

#include <cmath>
#include <random>

using isoquant::CesParameters;
using isoquant::CobbDouglas;
using isoquant::HomogeneousCost;
using isoquant::testing::closeTo;

namespace {

// Closed form against a textbook formula: both are a few dozen floating-point operations on
// numbers of moderate size, so they agree to about 1e-14; 1e-10 leaves room for that and for the
// powers' amplification of rounding, and any slip in an exponent moves them by far more.
constexpr double formulaTolerance = 1e-10;
// Central differences with step h = 1e-5 relative: truncation about h² = 1e-10, rounding about
// ε/h ≈ 2e-11 relative; 1e-7 is a thousand times the larger.
constexpr double differenceTolerance = 1e-7;
constexpr double relativeStep = 1e-5;

template <typename Function>
double centralDifference(Function f, double at)
{
    const double h = relativeStep * at;
    return (f(at + h) - f(at - h)) / ((at + h) - (at - h));
}

struct TwoInputCase {
    double a, b, scale, w1, w2, y;
};

std::vector<TwoInputCase> cobbDouglasCases()
{
    std::mt19937 engine(20240611);
    std::uniform_real_distribution<double> exponent(0.1, 0.9), price(0.5, 40.0), level(1.0, 500.0), scale(0.5, 3.0);
    std::vector<TwoInputCase> cases;
    for (int n = 0; n < 50; ++n) cases.push_back({exponent(engine), exponent(engine), scale(engine), price(engine),
                                                  price(engine), level(engine)});
    return cases;
}

HomogeneousCost cobbDouglasCostOf(const TwoInputCase& c)
{
    return isoquant::cobbDouglasCost(CobbDouglas(std::log(c.scale), Eigen::Vector2d(c.a, c.b)),
                                     Eigen::Vector2d(c.w1, c.w2));
}

std::vector<CesParameters> cesCases()
{
    std::mt19937 engine(8675309);
    std::uniform_real_distribution<double> weight(0.1, 0.9), rho(-0.8, 3.0), returns(0.4, 1.6), scale(0.5, 3.0);
    std::vector<CesParameters> cases;
    while (cases.size() < 50) {
        CesParameters p{scale(engine), weight(engine), rho(engine), returns(engine)};
        if (std::fabs(p.rho) > 0.05) cases.push_back(p);
    }
    return cases;
}

// (Varian, Microeconomic Analysis, 3rd ed. 1992, ch. 5; from memory) CES cost of y at w:
//   C = (y/A)^(1/ν)·[δ^σ·w₁^(1−σ) + (1−δ)^σ·w₂^(1−σ)]^(1/(1−σ)),  σ = 1/(1+ρ),
// and by Shephard's lemma xᵢ = (y/A)^(1/ν)·(δᵢ/wᵢ)^σ·[…]^(σ/(1−σ)).
double cesTextbookCost(const CesParameters& p, double w1, double w2, double y)
{
    const double s = p.substitutionElasticity();
    const double bracket = std::pow(p.weight, s) * std::pow(w1, 1 - s) + std::pow(1 - p.weight, s) * std::pow(w2, 1 - s);
    return std::pow(y / p.scale, 1 / p.returns) * std::pow(bracket, 1 / (1 - s));
}

double cesTextbookDemand(const CesParameters& p, double w1, double w2, double y, int input)
{
    const double s = p.substitutionElasticity();
    const double bracket = std::pow(p.weight, s) * std::pow(w1, 1 - s) + std::pow(1 - p.weight, s) * std::pow(w2, 1 - s);
    const double weight = input == 0 ? p.weight : 1 - p.weight;
    const double price = input == 0 ? w1 : w2;
    return std::pow(y / p.scale, 1 / p.returns) * std::pow(weight / price, s) * std::pow(bracket, s / (1 - s));
}

} // namespace

BOOST_AUTO_TEST_SUITE(decision_closed_forms)

BOOST_AUTO_TEST_CASE(cobb_douglas_cost_and_demands_match_the_textbook)
{
    // (Varian, Microeconomic Analysis, 3rd ed. 1992, ch. 4; from memory) for y = x₁^a·x₂^b:
    //   c(w, y) = [(a/b)^(b/(a+b)) + (a/b)^(−a/(a+b))]·w₁^(a/(a+b))·w₂^(b/(a+b))·y^(1/(a+b)),
    //   x₁ = (a·w₂/(b·w₁))^(b/(a+b))·y^(1/(a+b)),  x₂ = (b·w₁/(a·w₂))^(a/(a+b))·y^(1/(a+b));
    // a scale A enters as y/A in place of y.
    for (const auto& c : cobbDouglasCases()) {
        const double nu = c.a + c.b, y = c.y / c.scale;
        const double cost = (std::pow(c.a / c.b, c.b / nu) + std::pow(c.a / c.b, -c.a / nu)) *
                            std::pow(c.w1, c.a / nu) * std::pow(c.w2, c.b / nu) * std::pow(y, 1 / nu);
        const double x1 = std::pow(c.a * c.w2 / (c.b * c.w1), c.b / nu) * std::pow(y, 1 / nu);
        const double x2 = std::pow(c.b * c.w1 / (c.a * c.w2), c.a / nu) * std::pow(y, 1 / nu);
        const auto plan = isoquant::leastCostPlan(cobbDouglasCostOf(c), c.y);
        BOOST_TEST(closeTo(plan.cost, cost, formulaTolerance));
        BOOST_TEST(closeTo(plan.inputs(0), x1, formulaTolerance));
        BOOST_TEST(closeTo(plan.inputs(1), x2, formulaTolerance));
        // The bundle makes the target and costs what the cost function says (identities).
        BOOST_TEST(closeTo(c.scale * std::pow(plan.inputs(0), c.a) * std::pow(plan.inputs(1), c.b), c.y, formulaTolerance));
        BOOST_TEST(closeTo(c.w1 * plan.inputs(0) + c.w2 * plan.inputs(1), plan.cost, formulaTolerance));
    }
}

BOOST_AUTO_TEST_CASE(ces_cost_and_demands_match_the_textbook)
{
    std::mt19937 engine(31337);
    std::uniform_real_distribution<double> price(0.5, 40.0), level(1.0, 500.0);
    for (const auto& p : cesCases()) {
        BOOST_TEST(isoquant::cesParameterProblem(p).empty());
        const double w1 = price(engine), w2 = price(engine), y = level(engine);
        const auto plan = isoquant::leastCostPlan(isoquant::cesCost(p, Eigen::Vector2d(w1, w2)), y);
        BOOST_TEST(closeTo(plan.cost, cesTextbookCost(p, w1, w2, y), formulaTolerance));
        BOOST_TEST(closeTo(plan.inputs(0), cesTextbookDemand(p, w1, w2, y, 0), formulaTolerance));
        BOOST_TEST(closeTo(plan.inputs(1), cesTextbookDemand(p, w1, w2, y, 1), formulaTolerance));
        const isoquant::testing::CesTestTechnology technology(p);
        BOOST_TEST(closeTo(technology.output(plan.inputs), y, formulaTolerance));
    }
}

BOOST_AUTO_TEST_CASE(shephards_lemma_holds_by_finite_differences)
{
    // Shephard's lemma: ∂C/∂wᵢ = xᵢ(w, y); and ∂C/∂y is the marginal cost.
    for (const auto& c : cobbDouglasCases()) {
        const auto plan = isoquant::leastCostPlan(cobbDouglasCostOf(c), c.y);
        const auto costAtW1 = [&](double w1) {
            return isoquant::leastCostPlan(cobbDouglasCostOf({c.a, c.b, c.scale, w1, c.w2, c.y}), c.y).cost;
        };
        const auto costAtW2 = [&](double w2) {
            return isoquant::leastCostPlan(cobbDouglasCostOf({c.a, c.b, c.scale, c.w1, w2, c.y}), c.y).cost;
        };
        const auto costAtY = [&](double y) { return isoquant::leastCostPlan(cobbDouglasCostOf(c), y).cost; };
        BOOST_TEST(closeTo(centralDifference(costAtW1, c.w1), plan.inputs(0), differenceTolerance));
        BOOST_TEST(closeTo(centralDifference(costAtW2, c.w2), plan.inputs(1), differenceTolerance));
        BOOST_TEST(closeTo(centralDifference(costAtY, c.y), plan.marginalCost, differenceTolerance));
    }
    std::mt19937 engine(4711);
    std::uniform_real_distribution<double> price(0.5, 40.0), level(1.0, 500.0);
    for (const auto& p : cesCases()) {
        const double w1 = price(engine), w2 = price(engine), y = level(engine);
        const auto plan = isoquant::leastCostPlan(isoquant::cesCost(p, Eigen::Vector2d(w1, w2)), y);
        const auto costAtW1 = [&](double w) { return isoquant::leastCostPlan(isoquant::cesCost(p, Eigen::Vector2d(w, w2)), y).cost; };
        const auto costAtW2 = [&](double w) { return isoquant::leastCostPlan(isoquant::cesCost(p, Eigen::Vector2d(w1, w)), y).cost; };
        BOOST_TEST(closeTo(centralDifference(costAtW1, w1), plan.inputs(0), differenceTolerance));
        BOOST_TEST(closeTo(centralDifference(costAtW2, w2), plan.inputs(1), differenceTolerance));
    }
}

BOOST_AUTO_TEST_CASE(rate_of_substitution_equals_the_price_ratio_at_the_least_cost_bundle)
{
    // Tangency: f₁/f₂ = w₁/w₂ at the least-cost bundle. The marginal products come from the
    // technologies' own calculus (Cobb-Douglas; the test CES), not from the closed forms.
    for (const auto& c : cobbDouglasCases()) {
        const CobbDouglas technology(std::log(c.scale), Eigen::Vector2d(c.a, c.b));
        const auto plan = isoquant::leastCostPlan(cobbDouglasCostOf(c), c.y);
        BOOST_TEST(closeTo(technology.marginalProduct(plan.inputs, 0) / technology.marginalProduct(plan.inputs, 1),
                           c.w1 / c.w2, formulaTolerance));
        // and the multiplier: wᵢ/fᵢ is the marginal cost
        BOOST_TEST(closeTo(c.w1 / technology.marginalProduct(plan.inputs, 0), plan.marginalCost, formulaTolerance));
    }
    std::mt19937 engine(99);
    std::uniform_real_distribution<double> price(0.5, 40.0);
    for (const auto& p : cesCases()) {
        const double w1 = price(engine), w2 = price(engine);
        const isoquant::testing::CesTestTechnology technology(p);
        const auto plan = isoquant::leastCostPlan(isoquant::cesCost(p, Eigen::Vector2d(w1, w2)), 20.0);
        BOOST_TEST(closeTo(technology.marginalProduct(plan.inputs, 0) / technology.marginalProduct(plan.inputs, 1),
                           w1 / w2, formulaTolerance));
    }
}

BOOST_AUTO_TEST_CASE(cobb_douglas_budget_shares_are_exponent_over_returns_to_scale)
{
    // (common practice, no source) At the output-maximising split of a budget B, input i takes
    // the share bᵢ/Σb of the budget. Checked with three inputs.
    std::mt19937 engine(1234);
    std::uniform_real_distribution<double> exponent(0.1, 0.9), price(0.5, 40.0), budget(10.0, 1e5);
    for (int n = 0; n < 50; ++n) {
        const Eigen::Vector3d b(exponent(engine), exponent(engine), exponent(engine));
        const Eigen::Vector3d w(price(engine), price(engine), price(engine));
        const double spending = budget(engine);
        const CobbDouglas technology(0.3, b);
        const auto plan = isoquant::budgetPlan(isoquant::cobbDouglasCost(technology, w), spending);
        for (int i = 0; i < 3; ++i) BOOST_TEST(closeTo(w(i) * plan.inputs(i) / spending, b(i) / b.sum(), formulaTolerance));
        BOOST_TEST(closeTo(plan.output, technology.output(plan.inputs), formulaTolerance));
        BOOST_TEST(closeTo(plan.cost, spending, formulaTolerance));
    }
}

BOOST_AUTO_TEST_CASE(ces_budget_shares_match_the_textbook)
{
    // (Varian 1992, ch. 5, by Shephard's lemma on the CES cost function; from memory) the cost
    // share of input i is δᵢ^σ·wᵢ^(1−σ) / Σⱼ δⱼ^σ·wⱼ^(1−σ), whatever the budget.
    std::mt19937 engine(5678);
    std::uniform_real_distribution<double> price(0.5, 40.0), budget(10.0, 1e5);
    for (const auto& p : cesCases()) {
        const double w1 = price(engine), w2 = price(engine), spending = budget(engine);
        const double s = p.substitutionElasticity();
        const double first = std::pow(p.weight, s) * std::pow(w1, 1 - s);
        const double second = std::pow(1 - p.weight, s) * std::pow(w2, 1 - s);
        const auto plan = isoquant::budgetPlan(isoquant::cesCost(p, Eigen::Vector2d(w1, w2)), spending);
        BOOST_TEST(closeTo(w1 * plan.inputs(0) / spending, first / (first + second), formulaTolerance));
        BOOST_TEST(closeTo(w2 * plan.inputs(1) / spending, second / (first + second), formulaTolerance));
        BOOST_TEST(closeTo(plan.output, isoquant::testing::CesTestTechnology(p).output(plan.inputs), formulaTolerance));
    }
}

BOOST_AUTO_TEST_CASE(profit_maximum_satisfies_hotellings_lemma_and_price_equals_marginal_cost)
{
    // Hotelling's lemma: ∂π/∂p = y*, ∂π/∂wᵢ = −xᵢ*; at the maximum p·fᵢ = wᵢ and, for a technology
    // homogeneous of degree ν, profit is (1 − ν)·p·y (Euler's theorem).
    std::mt19937 engine(2468);
    std::uniform_real_distribution<double> exponent(0.1, 0.45), price(0.5, 10.0);
    for (int n = 0; n < 50; ++n) {
        const double a = exponent(engine), b = exponent(engine), p = price(engine);
        const Eigen::Vector2d w(price(engine), price(engine));
        const CobbDouglas technology(0.5, Eigen::Vector2d(a, b));
        const auto profitAt = [&](double outputPrice, const Eigen::Vector2d& prices) {
            const auto plan = isoquant::profitPlan(isoquant::cobbDouglasCost(technology, prices), outputPrice);
            return outputPrice * plan.output - plan.cost;
        };
        const auto plan = isoquant::profitPlan(isoquant::cobbDouglasCost(technology, w), p);
        BOOST_TEST(closeTo(p * technology.marginalProduct(plan.inputs, 0), w(0), formulaTolerance));
        BOOST_TEST(closeTo(p * technology.marginalProduct(plan.inputs, 1), w(1), formulaTolerance));
        BOOST_TEST(closeTo(p * plan.output - plan.cost, (1 - a - b) * p * plan.output, formulaTolerance));
        BOOST_TEST(closeTo(centralDifference([&](double q) { return profitAt(q, w); }, p), plan.output, differenceTolerance));
        BOOST_TEST(closeTo(-centralDifference([&](double q) { return profitAt(p, Eigen::Vector2d(q, w(1))); }, w(0)),
                           plan.inputs(0), differenceTolerance));
    }
    for (auto p : cesCases()) {
        p.returns = 0.3 + 0.6 * (p.weight - 0.1) / 0.8; // ν in [0.3, 0.9]: decreasing returns
        const isoquant::testing::CesTestTechnology technology(p);
        const Eigen::Vector2d w(3.0, 5.0);
        const auto plan = isoquant::profitPlan(isoquant::cesCost(p, w), 7.0);
        BOOST_TEST(closeTo(7.0 * technology.marginalProduct(plan.inputs, 0), w(0), formulaTolerance));
        BOOST_TEST(closeTo(7.0 * technology.marginalProduct(plan.inputs, 1), w(1), formulaTolerance));
        BOOST_TEST(closeTo(technology.output(plan.inputs), plan.output, formulaTolerance));
    }
}

BOOST_AUTO_TEST_CASE(no_profit_maximum_without_decreasing_returns)
{
    const auto messageFor = [](double a, double b, double p) -> std::string {
        const auto plan =
            isoquant::profitPlan(isoquant::cobbDouglasCost(CobbDouglas(0, Eigen::Vector2d(a, b)), Eigen::Vector2d(1, 1)), p);
        return plan.solved() ? "<a plan>" : plan.status.reason;
    };
    // Unit cost of x₁^0.5·x₂^0.5 at prices 1, 1 is 2 (the textbook cost above with a = b).
    BOOST_TEST(messageFor(0.5, 0.5, 3) ==
               "No finite profit maximum: returns to scale are constant (1), and at these prices one unit of output "
               "costs 2 to make and sells for 3, so profit grows without limit as every input is scaled up");
    BOOST_TEST(messageFor(0.5, 0.5, 1) ==
               "No finite profit maximum: returns to scale are constant (1), and at these prices one unit of output "
               "costs 2 to make and sells for 1, so every unit loses money and the best plan is to produce nothing");
    BOOST_TEST(messageFor(0.7, 0.5, 3) ==
               "No finite profit maximum: returns to scale are increasing (1.2), so profit grows without limit as "
               "every input is scaled up");
    BOOST_TEST(messageFor(0.4, 0.5, 3) == "<a plan>");
}

BOOST_AUTO_TEST_SUITE_END()
