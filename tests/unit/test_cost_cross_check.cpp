// PRODCOSTFIT's Cobb-Douglas and translog cost functions of the rice-farm panel (Feng and Horrace
// 2012, as in plm 2.6 RiceFarms; cost = pseed·seed + purea·urea + wage·totlabor, output goutput,
// prices pseed, purea, wage) against python3-statsmodels 0.13.5 OLS of the homogeneity-normalised
// regression, recomputed at test time by tests/reference/cost_check.py: every parameter of the full
// form (the implied ones through statsmodels' t_test), R² of ln C, F, log-likelihood, AIC, BIC,
// the cost elasticity and its test of 1, the translog's efficient scale and the smearing factor;
// classical errors and HC1 (Cobb-Douglas), HC3 (translog).
// PRODCOST's statistic from the table's covariance block (PRODCOSTFIT's covariance TRUE): the
// standard errors of total, average and marginal cost, cost elasticity and returns to scale, and
// the lower bound of total cost at three rows of the data, against the same statsmodels covariance
// with a numpy numerical gradient (cost_check.py), to 1e-7 relative (the tolerance: the
// central differences are good to about 1e-10).
//
// Tolerance: 1e-8 relative on every figure, as for the other statsmodels cross-checks: the same
// linear least squares by two factorisations, each good to about 1e-12 on these designs, and the
// p-values through the same t and F distributions (Boost.Math and scipy).
//
// CTest runs the script first (test cost_figures) and passes the file it wrote in the environment
// variable ISOQUANT_COST_FIGURES; without that file this test is skipped.
#include "isoquant/sheet/functions/bound_functions.hpp"
#include "isoquant/sheet/functions/cost_functions.hpp"
#include "isoquant/sheet/tables/cost_table.hpp"
#include "cell_tables.hpp"
#include "cost_figures.hpp"
#include "reference_data.hpp"
#include "reference_figures.hpp"
#include "relative_error.hpp"

#include <boost/test/unit_test.hpp>

#include <array>
#include <cmath>
#include <limits>
#include <map>

using isoquant::testing::closeTo;

namespace {

constexpr double statsmodelsTolerance = 1e-8;
constexpr double numericalGradientTolerance = 1e-7;
constexpr std::array<int, 3> boundPoints{0, 100, 500}; // cost_check.py's POINTS

boost::test_tools::assertion_result figuresAvailable(boost::unit_test::test_unit_id)
{
    return isoquant::testing::referenceFiguresAvailable("ISOQUANT_COST_FIGURES", "cost figures");
}

// "bound_se_<what>" or "bound_lower_total" at the point-th row of POINTS, through PRODCOST on the
// table with its covariance block.
double boundFigure(const isoquant::CostFit& fit, const std::string& quantity, Eigen::Index point)
{
    const isoquant::ModelTable table(isoquant::costFitTableWithCovariance(fit, 1.0));
    const isoquant::CostFitArguments data = isoquant::testing::riceFarmCostArguments();
    const auto row = static_cast<std::size_t>(boundPoints[static_cast<std::size_t>(point)]) + 1; // under the header
    isoquant::CellTable output(1, 1), prices(1, 3);
    output.set(0, 0, data.output.at(row, 0));
    for (std::size_t i = 0; i < 3; ++i) prices.set(0, i, data.prices.at(row, i));
    const bool lower = quantity == "bound_lower_total";
    const std::string what = lower ? "total" : quantity.substr(std::string("bound_se_").size());
    const isoquant::CellTable answer =
        isoquant::costColumnWithBounds(table, output, prices, what, std::string(lower ? "lower bound" : "std. error"));
    return answer.number(0, 0);
}

} // namespace

BOOST_AUTO_TEST_SUITE(cost_cross_check)

BOOST_AUTO_TEST_CASE(cost_functions_agree_with_statsmodels, *boost::unit_test::precondition(figuresAvailable))
{
    const auto rows = isoquant::testing::readReferenceRows(isoquant::testing::referenceFiguresPath("ISOQUANT_COST_FIGURES"));
    BOOST_TEST_REQUIRE(rows.size() > 100u);
    std::map<std::string, isoquant::CostFit> fits;
    for (const auto& fields : rows) {
        const std::string& form = fields.at(1);
        if (!fits.count(form)) {
            isoquant::CostFitArguments arguments = isoquant::testing::riceFarmCostArguments();
            const auto separator = form.find('_');
            arguments.form = form.substr(0, separator);
            if (separator != std::string::npos) arguments.errors = form.substr(separator + 1);
            fits.emplace(form, isoquant::costFitFromArguments(arguments));
        }
        const double expected = std::stod(fields.at(4));
        const std::string& quantity = fields.at(2);
        if (quantity.rfind("bound_", 0) == 0) {
            const double actual = boundFigure(fits.at(form), quantity, std::stol(fields.at(3)));
            BOOST_TEST(closeTo(actual, expected, numericalGradientTolerance),
                       form << " " << quantity << " " << fields.at(3));
            continue;
        }
        const double actual = isoquant::testing::costFitFigure(fits.at(form), quantity, std::stol(fields.at(3)));
        BOOST_TEST(closeTo(actual, expected, statsmodelsTolerance), form << " " << quantity << " " << fields.at(3));
    }
}

BOOST_AUTO_TEST_SUITE_END()
