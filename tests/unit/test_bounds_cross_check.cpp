// Standard errors and bounds of derived numbers (issue 20: PRODOUTPUT, PRODMARGINAL,
// PRODELASTICITY, PRODSCALE, PRODLEASTCOST, PRODTFP, PRODSECOND, PRODMRTS, PRODBUDGET with `what`)
// from a PRODFIT table with its covariance block, against python3-statsmodels 0.13.5 (the
// covariance of the same OLS fit, classical and HC1) and a numerical gradient of the same quantity
// in numpy, recomputed at test time by tests/reference/bounds_check.py on the Cobb & Douglas (1928)
// data (tests/data/README.md) at three invented bundles, plans, budgets and observed outputs (the
// least-cost amounts and budget plans solved there from first-order conditions, independently of
// the core's closed forms).
//
// Tolerance: 1e-7 relative on every figure (the issue's). The covariance matrices agree to about
// 1e-12 (two factorisations of the same least squares) and the central-difference gradient to
// about 1e-10, so 1e-7 still catches a wrong gradient or a wrong t quantile (the t(21) and normal
// 0.975 quantiles differ by 6 %).
//
// CTest runs the script first (test bounds_figures) and passes the file it wrote in the environment
// variable ISOQUANT_BOUNDS_FIGURES; without that file this test is skipped.
#include "isoquant/sheet/functions/production_functions.hpp"
#include "isoquant/sheet/tables/fit_table.hpp"
#include "isoquant/sheet/functions/bound_functions.hpp"
#include "isoquant/sheet/tables/covariance_block.hpp"
#include "reference_data.hpp"
#include "reference_figures.hpp"
#include "relative_error.hpp"

#include <boost/test/unit_test.hpp>

#include <array>
#include <cmath>
#include <map>

namespace {

boost::test_tools::assertion_result figuresAvailable(boost::unit_test::test_unit_id)
{
    return isoquant::testing::referenceFiguresAvailable("ISOQUANT_BOUNDS_FIGURES", "statsmodels bounds figures");
}

// The same bundles as bounds_check.py's BUNDLES: (L, C).
constexpr std::array<std::array<double, 2>, 3> bundles{{{150.0, 200.0}, {250.0, 400.0}, {100.0, 100.0}}};
// bounds_check.py's PLANS: (target output, wL, wC), numbered as the bundles.
constexpr std::array<std::array<double, 3>, 3> plans{{{180.0, 2.0, 3.0}, {300.0, 1.0, 1.0}, {120.0, 5.0, 2.0}}};
// bounds_check.py's BUDGETS: (budget, wL, wC), numbered as the bundles.
constexpr std::array<std::array<double, 3>, 3> budgets{{{1000.0, 2.0, 3.0}, {500.0, 1.0, 4.0}, {2000.0, 5.0, 2.0}}};
// bounds_check.py's OBSERVED: one plant's output at each bundle, for its TFP.
constexpr std::array<double, 3> observed{170.0, 260.0, 105.0};

isoquant::CellTable tableWithBlock(const std::string& errors)
{
    auto arguments = isoquant::testing::cobbDouglas1928Arguments();
    arguments.errors = errors;
    const auto fit = isoquant::fitFromArguments(arguments);
    return isoquant::fitTableWithCovariance(isoquant::fitTable(fit), fit, 1.0);
}

// The core's figure for a quantity of bounds_check.py ("marginal_L_upper", "scale_se", …).
double coreFigure(const isoquant::CellTable& model, const std::string& quantity, std::size_t bundle)
{
    isoquant::CellTable inputs(1, 2);
    inputs.set(0, 0, bundles[bundle][0]);
    inputs.set(0, 1, bundles[bundle][1]);
    const std::map<std::string, std::string> words{{"se", "std. error"},
                                                   {"lower", "lower bound"},
                                                   {"upper", "upper bound"}};
    const auto split = quantity.rfind('_');
    const std::string name = quantity.substr(0, split), suffix = quantity.substr(split + 1);
    isoquant::CellTable result;
    if (name == "prediction")
        result = isoquant::outputColumnWithBounds(model, inputs, {}, "prediction " + suffix);
    else if (name == "output")
        result = isoquant::outputColumnWithBounds(model, inputs, {}, words.at(suffix));
    else if (name == "mean_output")
        result = isoquant::outputColumnWithBounds(model, inputs, 1.0, words.at(suffix));
    else if (name == "marginal_L" || name == "marginal_C")
        result = isoquant::marginalProductColumnWithBounds(model, inputs, name.substr(9), words.at(suffix));
    else if (name == "elasticity_C")
        result = isoquant::elasticityColumnWithBounds(model, inputs, std::string("C"), words.at(suffix));
    else if (name == "least_cost_L" || name == "least_cost_C") {
        isoquant::CellTable prices(1, 2);
        prices.set(0, 0, plans[bundle][1]);
        prices.set(0, 1, plans[bundle][2]);
        return isoquant::leastCostRowWithBounds(model, plans[bundle][0], prices, words.at(suffix))
            .number(0, name == "least_cost_L" ? 0 : 1);
    } else if (name == "budget_L" || name == "budget_C" || name == "budget_output") {
        isoquant::CellTable prices(1, 2);
        prices.set(0, 0, budgets[bundle][1]);
        prices.set(0, 1, budgets[bundle][2]);
        const std::size_t cell = name == "budget_L" ? 0 : name == "budget_C" ? 1 : 2;
        return isoquant::budgetRowWithBounds(model, budgets[bundle][0], prices, words.at(suffix)).number(0, cell);
    } else if (name == "tfp")
        result = isoquant::productivityColumnWithBounds(model, isoquant::singleCell(observed[bundle]), inputs, {},
                                                        words.at(suffix));
    else if (name == "second_LC")
        result = isoquant::secondPartialColumnWithBounds(model, inputs, std::string("L"), std::string("C"),
                                                         words.at(suffix));
    else if (name == "second_LL")
        result = isoquant::secondPartialColumnWithBounds(model, inputs, std::string("L"), {}, words.at(suffix));
    else if (name == "mrts_LC")
        result = isoquant::technicalRateColumnWithBounds(model, inputs, std::string("L"), std::string("C"),
                                                         words.at(suffix));
    else if (name == "scale")
        result = isoquant::scaleColumnWithBounds(model, inputs, words.at(suffix));
    else
        throw std::runtime_error("unknown quantity " + quantity);
    return result.number(0, 0);
}

} // namespace

BOOST_AUTO_TEST_SUITE(bounds_cross_check)

BOOST_AUTO_TEST_CASE(standard_errors_and_bounds_agree_with_statsmodels_and_numpy,
                     *boost::unit_test::precondition(figuresAvailable))
{
    const auto rows = isoquant::testing::readReferenceRows(
        isoquant::testing::referenceFiguresPath("ISOQUANT_BOUNDS_FIGURES"));
    // 2 kinds of errors × 3 bundles × (11 positive quantities × 3 + 2 prediction bounds + 4 linear × 3).
    BOOST_TEST_REQUIRE(rows.size() == 2u * 3u * 47u);
    std::map<std::string, isoquant::CellTable> tables;
    for (const auto& fields : rows) {
        const std::string& errors = fields.at(0);
        if (!tables.count(errors)) tables.emplace(errors, tableWithBlock(errors));
        const double expected = std::stod(fields.at(3));
        const double core = coreFigure(tables.at(errors), fields.at(1), std::stoul(fields.at(2)));
        BOOST_TEST_CONTEXT(errors << " " << fields.at(1) << " at bundle " << fields.at(2))
        BOOST_TEST(isoquant::testing::closeTo(core, expected, 1e-7), core << " against " << expected);
    }
}

BOOST_AUTO_TEST_SUITE_END()
