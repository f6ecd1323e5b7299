// Standard errors and bounds of the plans of translog and ces models (issue 20: PRODLEASTCOST,
// PRODBUDGET with `what`, PRODCOST with `statistic`), against tests/reference/plan_bounds_check.py,
// recomputed at test time on the models of test_decision_bounds_cross_check.cpp (the translog of
// Cobb & Douglas (1928) with python3-statsmodels' covariance, classical and HC1; the typed ces with
// its typed block), at invented prices (4, 3), outputs 180 and 240 and budget 1000:
// - translog: the script solves each plan with scipy.optimize.root on the textbook conditions in
//   levels (w_i = λ·f_i, f(x) = y; f_i = κ·w_i, w·x = B) and differentiates it by the implicit
//   function theorem with complex-step Jacobians; the core uses its own logged conditions with
//   analytic partials (plan_gradients.hpp);
// - ces: the script differentiates the textbook closed form of the plan by the complex step; the
//   core goes through the first-order conditions all the same, so this checks those too.
//
// Tolerance: 1e-7 relative on every figure (the issue's). Both gradients are exact to rounding (the
// script's plan is polished by Newton steps to rounding); the covariance matrices agree to 1e-12.
#include "isoquant/sheet/functions/bound_functions.hpp"
#include "cell_tables.hpp"
#include "form_figures.hpp"
#include "reference_figures.hpp"

#include <boost/test/unit_test.hpp>

#include <array>
#include <map>
#include <string>

namespace {

boost::test_tools::assertion_result figuresAvailable(boost::unit_test::test_unit_id)
{
    return isoquant::testing::referenceFiguresAvailable("ISOQUANT_PLAN_BOUNDS_FIGURES",
                                                        "translog and ces plan bounds figures");
}

// plan_bounds_check.py's TARGETS (cases 0 and 1) and BUDGET (case 2).
constexpr std::array<double, 2> targets{180.0, 240.0};
constexpr double budget = 1000.0;

// The core's figure for a quantity of plan_bounds_check.py ("amount_L_se", "marginal_upper", …).
double coreFigure(const isoquant::CellTable& model, const std::string& quantity, std::size_t planCase)
{
    const isoquant::CellTable prices = isoquant::testing::typedRange({{4.0, 3.0}});
    const std::map<std::string, std::string> words{
        {"se", "std. error"}, {"lower", "lower bound"}, {"upper", "upper bound"}};
    const auto split = quantity.rfind('_');
    const std::string name = quantity.substr(0, split);
    const isoquant::Cell word = words.at(quantity.substr(split + 1));
    const std::map<std::string, std::size_t> cells{{"amount_L", 0}, {"amount_C", 1}, {"output", 2}};
    if (planCase == 2) return isoquant::budgetRowWithBounds(model, budget, prices, word).number(0, cells.at(name));
    const double level = targets.at(planCase);
    if (cells.count(name)) return isoquant::leastCostRowWithBounds(model, level, prices, word).number(0, cells.at(name));
    const std::map<std::string, std::string> figures{{"total", "total"},
                                                     {"average", "average"},
                                                     {"marginal", "marginal"},
                                                     {"cost_elasticity", "cost elasticity"},
                                                     {"returns_to_scale", "returns to scale"}};
    const isoquant::CellTable output = isoquant::testing::typedRange({{level}});
    return isoquant::costColumnWithBounds(model, output, prices, figures.at(name), word).number(0, 0);
}

} // namespace

BOOST_AUTO_TEST_SUITE(plan_bounds_cross_check)

BOOST_AUTO_TEST_CASE(translog_and_ces_plan_bounds_agree_with_scipy_and_numpy,
                     *boost::unit_test::precondition(figuresAvailable))
{
    const auto rows = isoquant::testing::readReferenceRows(
        isoquant::testing::referenceFiguresPath("ISOQUANT_PLAN_BOUNDS_FIGURES"));
    // (translog classical, translog hc1, typed ces) × (2 outputs × 7 figures + 1 budget × 3 cells) × 3 words.
    BOOST_TEST_REQUIRE(rows.size() == 3u * 17u * 3u);
    isoquant::testing::checkFormFigures(rows, coreFigure);
}

BOOST_AUTO_TEST_SUITE_END()
