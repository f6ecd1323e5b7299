// PRODEFFICIENTSCALE's y* of a translog production table with its standard error and bounds (issue
// 20, `what`), against tests/reference/scale_bounds_check.py, recomputed at test time: the translog
// of the rice-farm panel's goutput on seed, urea and totlabor (the "translog3" table of
// form_figures.hpp, python3-statsmodels' covariance, classical and HC1) at the panel's mean prices
// rounded, (112, 79, 80). The script finds y* with scipy (least-cost plans by optimize.root on the
// textbook conditions in levels, cost elasticity 1 by optimize.brentq, polished by Newton steps) and
// differentiates it by the implicit function theorem on those conditions with marginal cost = average
// cost added, complex-step Jacobians; the core finds y* on its grid and by bisection and
// differentiates F = ln μ − ln C in its own logged conditions with analytic partials
// (plan_gradients.hpp).
//
// A second case: the cobb-douglas and ces, whose scale elasticity is constant, keep the value's
// sentence under the words.
//
// Tolerance: 1e-7 relative on every figure (the issue's). The core's bisection leaves ln y* within
// about 1e-15 and the script polishes to rounding; both gradients are exact to rounding.
#include "isoquant/sheet/functions/cost_decisions.hpp"
#include "cell_tables.hpp"
#include "form_figures.hpp"
#include "reference_figures.hpp"

#include <boost/test/unit_test.hpp>

#include <map>
#include <string>

namespace {

boost::test_tools::assertion_result figuresAvailable(boost::unit_test::test_unit_id)
{
    return isoquant::testing::referenceFiguresAvailable("ISOQUANT_SCALE_BOUNDS_FIGURES",
                                                        "translog efficient scale bounds figures");
}

// The core's figure for a quantity of scale_bounds_check.py ("scale_value", "scale_se", …).
double coreFigure(const isoquant::CellTable& table, const std::string& quantity, std::size_t)
{
    const isoquant::CellTable prices = isoquant::testing::typedRange({{112.0, 79.0, 80.0}});
    const std::map<std::string, std::string> words{{"scale_value", "value"},
                                                   {"scale_se", "std. error"},
                                                   {"scale_lower", "lower bound"},
                                                   {"scale_upper", "upper bound"}};
    const isoquant::CellTable answer =
        isoquant::efficientScaleCell(isoquant::ModelTable(table), prices, words.at(quantity));
    BOOST_TEST_REQUIRE(answer.isNumber(0, 0));
    return answer.number(0, 0);
}

} // namespace

BOOST_AUTO_TEST_SUITE(scale_bounds_cross_check)

BOOST_AUTO_TEST_CASE(translog_efficient_scale_bounds_agree_with_scipy_and_numpy,
                     *boost::unit_test::precondition(figuresAvailable))
{
    const auto rows = isoquant::testing::readReferenceRows(
        isoquant::testing::referenceFiguresPath("ISOQUANT_SCALE_BOUNDS_FIGURES"));
    // (classical, hc1) × (value, se, lower, upper).
    BOOST_TEST_REQUIRE(rows.size() == 2u * 4u);
    isoquant::testing::checkFormFigures(rows, coreFigure);
}

// A form of constant scale elasticity has no interior y*: the words keep the value's sentence (the
// cobb-douglas of Cobb & Douglas (1928) with its block, and the typed ces with its typed block).
BOOST_AUTO_TEST_CASE(constant_scale_forms_keep_the_value_sentence)
{
    const isoquant::CellTable prices = isoquant::testing::typedRange({{4.0, 3.0}});
    const isoquant::CellTable cobbDouglas =
        isoquant::testing::tableWithBlock(isoquant::fitFromArguments(isoquant::testing::cobbDouglas1928Arguments()));
    for (const auto& table : {cobbDouglas, isoquant::testing::typedCesWithBlock()}) {
        const isoquant::CellTable value = isoquant::efficientScaleCell(table, prices);
        BOOST_TEST_REQUIRE(value.isText(0, 0));
        BOOST_TEST(value.text(0, 0).rfind("No efficient scale", 0) == 0u, value.text(0, 0));
        for (const char* word : {"std. error", "lower bound", "upper bound"})
            BOOST_TEST(isoquant::efficientScaleCell(table, prices, std::string(word)).text(0, 0) == value.text(0, 0));
    }
}

BOOST_AUTO_TEST_SUITE_END()
