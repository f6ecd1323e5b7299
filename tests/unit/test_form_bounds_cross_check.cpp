// Standard errors and bounds of derived numbers of a translog fit (issue 20: PRODOUTPUT,
// PRODMARGINAL, PRODELASTICITY, PRODSCALE with `what`) from a PRODFIT table with its covariance
// block, against python3-statsmodels 0.13.5 (the covariance of the same OLS regression, classical
// and HC1) and a numerical gradient of the same quantity in numpy, recomputed at test time by
// tests/reference/form_bounds_check.py on the Cobb & Douglas (1928) data (tests/data/README.md) at
// three invented bundles. At (100, 100) the fitted εC is negative, so the marginal product of C there
// takes the path for a quantity that is not positive (value ∓ t·se), checked as well.
//
// Tolerance: 1e-7 relative on every figure (the issue's). The core's gradients are analytic (ln Y
// and the elasticities are linear in θ); the script's central differences carry about 1e-10
// relative, and the two covariance matrices agree to about 1e-12 (two factorisations of the same
// least squares), so 1e-7 still catches a wrong gradient (a β term without its ½) or a wrong t.
//
// CTest runs the script first (test form_bounds_figures) and passes the file it wrote in the
// environment variable ISOQUANT_FORM_BOUNDS_FIGURES; without that file this test is skipped.
#include "isoquant/sheet/functions/bound_functions.hpp"
#include "isoquant/sheet/functions/production_functions.hpp"
#include "isoquant/sheet/tables/covariance_block.hpp"
#include "isoquant/sheet/tables/fit_table.hpp"
#include "reference_data.hpp"
#include "reference_figures.hpp"
#include "relative_error.hpp"

#include <boost/test/unit_test.hpp>

#include <array>
#include <map>

namespace {

boost::test_tools::assertion_result figuresAvailable(boost::unit_test::test_unit_id)
{
    return isoquant::testing::referenceFiguresAvailable("ISOQUANT_FORM_BOUNDS_FIGURES",
                                                        "statsmodels translog bounds figures");
}

// form_bounds_check.py's BUNDLES: (L, C).
constexpr std::array<std::array<double, 2>, 3> bundles{{{150.0, 200.0}, {250.0, 400.0}, {100.0, 100.0}}};

isoquant::CellTable translogTable(const std::string& errors)
{
    auto arguments = isoquant::testing::cobbDouglas1928Arguments();
    arguments.form = std::string("translog");
    arguments.errors = errors;
    const auto fit = isoquant::fitFromArguments(arguments);
    return isoquant::fitTableWithCovariance(isoquant::fitTable(fit), fit, 1.0);
}

// The core's figure for a quantity of form_bounds_check.py ("marginal_L_upper", "scale_se", …).
double coreFigure(const isoquant::CellTable& model, const std::string& quantity, std::size_t bundle)
{
    isoquant::CellTable inputs(1, 2);
    inputs.set(0, 0, bundles[bundle][0]);
    inputs.set(0, 1, bundles[bundle][1]);
    const std::map<std::string, std::string> words{
        {"se", "std. error"}, {"lower", "lower bound"}, {"upper", "upper bound"}};
    const auto split = quantity.rfind('_');
    const std::string name = quantity.substr(0, split), suffix = quantity.substr(split + 1);
    if (name == "prediction")
        return isoquant::outputColumnWithBounds(model, inputs, {}, "prediction " + suffix).number(0, 0);
    if (name == "output") return isoquant::outputColumnWithBounds(model, inputs, {}, words.at(suffix)).number(0, 0);
    if (name == "mean_output")
        return isoquant::outputColumnWithBounds(model, inputs, 1.0, words.at(suffix)).number(0, 0);
    if (name == "marginal_L" || name == "marginal_C")
        return isoquant::marginalProductColumnWithBounds(model, inputs, name.substr(9), words.at(suffix))
            .number(0, 0);
    if (name == "elasticity_L" || name == "elasticity_C")
        return isoquant::elasticityColumnWithBounds(model, inputs, name.substr(11), words.at(suffix)).number(0, 0);
    if (name == "scale") return isoquant::scaleColumnWithBounds(model, inputs, words.at(suffix)).number(0, 0);
    throw std::runtime_error("unknown quantity " + quantity);
}

} // namespace

BOOST_AUTO_TEST_SUITE(form_bounds_cross_check)

BOOST_AUTO_TEST_CASE(translog_bounds_agree_with_statsmodels_and_numpy, *boost::unit_test::precondition(figuresAvailable))
{
    const auto rows =
        isoquant::testing::readReferenceRows(isoquant::testing::referenceFiguresPath("ISOQUANT_FORM_BOUNDS_FIGURES"));
    // 2 kinds of errors × 3 bundles × (7 quantities × 3 + 2 prediction bounds).
    BOOST_TEST_REQUIRE(rows.size() == 2u * 3u * 23u);
    std::map<std::string, isoquant::CellTable> tables;
    for (const auto& fields : rows) {
        const std::string& errors = fields.at(0);
        if (!tables.count(errors)) tables.emplace(errors, translogTable(errors));
        const double expected = std::stod(fields.at(3));
        const double core = coreFigure(tables.at(errors), fields.at(1), std::stoul(fields.at(2)));
        BOOST_TEST_CONTEXT(errors << " " << fields.at(1) << " at bundle " << fields.at(2))
        BOOST_TEST(isoquant::testing::closeTo(core, expected, 1e-7), core << " against " << expected);
    }
}

BOOST_AUTO_TEST_SUITE_END()
