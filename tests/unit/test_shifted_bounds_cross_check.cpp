// Standard errors and bounds of PRODOUTPUT and PRODMARGINAL (and, for the Cobb-Douglas fits,
// PRODLEASTCOST, PRODCOST, PRODBUDGET, PRODTFP and PRODSECOND) over PRODFIT tables whose evaluators
// use a shifted ln A (issue 20: the covariance block's row "ln A at control means" or "ln A for
// predictions"), against python3-statsmodels (the covariance of the same OLS fit, classical and
// HC1) and a complex-step gradient of the same quantity in numpy, recomputed at test time by
// tests/reference/shifted_bounds_check.py on Munnell's (1990) US state panel (tests/data/README.md):
// a Cobb-Douglas with the control unemp and the trend year, the same without the trend, and a
// translog with the control, at three invented bundles.
//
// Tolerance: 1e-7 relative on every figure (the issue's); the two covariance matrices agree to
// about 1e-11 (two factorisations of the same least squares) and the gradients are exact to
// rounding, so a missing covariance term of the shifted ln A (its variance alone is off by far more
// than 1e-7) fails.
//
// CTest runs the script first (test shifted_bounds_figures) and passes the file it wrote in the
// environment variable ISOQUANT_SHIFTED_BOUNDS_FIGURES; without that file this test is skipped.
#include "isoquant/sheet/functions/bound_functions.hpp"
#include "isoquant/sheet/functions/production_functions.hpp"
#include "covariance_tables.hpp"
#include "reference_data.hpp"
#include "reference_figures.hpp"
#include "relative_error.hpp"

#include <boost/test/unit_test.hpp>

#include <array>
#include <map>

namespace {

boost::test_tools::assertion_result figuresAvailable(boost::unit_test::test_unit_id)
{
    return isoquant::testing::referenceFiguresAvailable("ISOQUANT_SHIFTED_BOUNDS_FIGURES",
                                                        "statsmodels shifted bounds figures");
}

// shifted_bounds_check.py's BUNDLES: (pcap, pc, emp).
constexpr std::array<std::array<double, 3>, 3> bundles{
    {{15000.0, 35000.0, 1000.0}, {25000.0, 60000.0, 2000.0}, {8000.0, 20000.0, 500.0}}};

// shifted_bounds_check.py's PLANS and BUDGETS: (target output or budget, the three prices), and
// OBSERVED, numbered as the bundles.
constexpr std::array<std::array<double, 4>, 3> plans{
    {{30000.0, 0.1, 0.1, 20.0}, {60000.0, 0.2, 0.1, 30.0}, {15000.0, 0.1, 0.2, 10.0}}};
constexpr std::array<std::array<double, 4>, 3> budgets{
    {{40000.0, 0.1, 0.1, 20.0}, {80000.0, 0.2, 0.1, 30.0}, {20000.0, 0.1, 0.2, 10.0}}};
constexpr std::array<double, 3> observed{35000.0, 60000.0, 15000.0};

isoquant::CellTable pricesOf(const std::array<double, 4>& plan)
{
    isoquant::CellTable prices(1, 3);
    for (std::size_t column = 0; column < 3; ++column) prices.set(0, column, plan[column + 1]);
    return prices;
}

// The script's model `model` ("cd_trend", "cd_control", "translog_control") with `errors`, as
// PRODFIT's table with covariance TRUE.
isoquant::CellTable tableOf(const std::string& model, const std::string& errors)
{
    auto arguments = isoquant::testing::statePanelArguments();
    if (model == "cd_trend") {
        arguments = isoquant::testing::statePanelWithPanelColumns();
        arguments.groups = {}; // the trend alone, no groups
    }
    if (model == "translog_control") arguments.form = std::string("translog");
    arguments.errors = errors;
    return isoquant::testing::tableWithBlock(isoquant::fitFromArguments(arguments));
}

// The core's figure for a quantity of the script ("output_se", "marginal_emp_upper", …).
double coreFigure(const isoquant::ModelTable& model, const std::string& quantity, std::size_t bundle)
{
    isoquant::CellTable inputs(1, 3);
    for (std::size_t column = 0; column < 3; ++column) inputs.set(0, column, bundles[bundle][column]);
    const std::map<std::string, std::string> words{{"se", "std. error"},
                                                   {"lower", "lower bound"},
                                                   {"upper", "upper bound"}};
    const auto split = quantity.rfind('_');
    const std::string name = quantity.substr(0, split), suffix = quantity.substr(split + 1);
    if (name == "prediction")
        return isoquant::outputColumnWithBounds(model, inputs, {}, "prediction " + suffix).number(0, 0);
    if (name == "output") return isoquant::outputColumnWithBounds(model, inputs, {}, words.at(suffix)).number(0, 0);
    const std::string& word = words.at(suffix);
    if (name == "marginal_emp")
        return isoquant::marginalProductColumnWithBounds(model, inputs, std::string("emp"), word).number(0, 0);
    if (name == "least_cost_emp")
        return isoquant::leastCostRowWithBounds(model, plans[bundle][0], pricesOf(plans[bundle]), word).number(0, 2);
    if (name == "cost_total")
        return isoquant::costColumnWithBounds(model, isoquant::singleCell(plans[bundle][0]), pricesOf(plans[bundle]),
                                              std::string("total"), word)
            .number(0, 0);
    if (name == "budget_output")
        return isoquant::budgetRowWithBounds(model, budgets[bundle][0], pricesOf(budgets[bundle]), word).number(0, 3);
    if (name == "tfp")
        return isoquant::productivityColumnWithBounds(model, isoquant::singleCell(observed[bundle]), inputs, {}, word)
            .number(0, 0);
    if (name == "second_pcap_emp")
        return isoquant::secondPartialColumnWithBounds(model, inputs, std::string("pcap"), std::string("emp"), word)
            .number(0, 0);
    throw std::runtime_error("unknown quantity " + quantity);
}

} // namespace

BOOST_AUTO_TEST_SUITE(shifted_bounds_cross_check)

BOOST_AUTO_TEST_CASE(bounds_with_a_shifted_ln_a_agree_with_statsmodels_and_numpy,
                     *boost::unit_test::precondition(figuresAvailable))
{
    const auto rows = isoquant::testing::readReferenceRows(
        isoquant::testing::referenceFiguresPath("ISOQUANT_SHIFTED_BOUNDS_FIGURES"));
    // 3 models × 2 kinds of errors × 3 bundles × (2 quantities × 3 + 2 prediction bounds), and for
    // the 2 Cobb-Douglas models × 2 × 3 bundles 5 decision figures × 3.
    BOOST_TEST_REQUIRE(rows.size() == 3u * 2u * 3u * 8u + 2u * 2u * 3u * 15u);
    std::map<std::string, isoquant::ModelTable> tables;
    for (const auto& fields : rows) {
        const std::string key = fields.at(0) + " " + fields.at(1);
        if (!tables.count(key)) tables.emplace(key, tableOf(fields.at(0), fields.at(1)));
        const double expected = std::stod(fields.at(4));
        const double core = coreFigure(tables.at(key), fields.at(2), std::stoul(fields.at(3)));
        BOOST_TEST_CONTEXT(key << " " << fields.at(2) << " at bundle " << fields.at(3))
        BOOST_TEST(isoquant::testing::closeTo(core, expected, 1e-7), core << " against " << expected);
    }
}

BOOST_AUTO_TEST_SUITE_END()
