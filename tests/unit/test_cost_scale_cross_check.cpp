// PRODCOST's statistic on cost tables whose constant is shifted by a control (size) or by a control
// and a trend (the farm's season), read from the covariance block's last row ("constant at control
// means", "constant for predictions"; a translog with the trend alone too), on the rice-farm panel (Feng and Horrace 2012, as in plm 2.6
// RiceFarms; cost = pseed·seed + purea·urea + wage·totlabor, output goutput, prices pseed, purea,
// wage) against python3-statsmodels 0.13.5 OLS of the same regression with the shifted constant's
// covariance taken from statsmodels' V_b and a numpy complex-step gradient, recomputed at test time
// by tests/reference/cost_scale_check.py: the standard errors of total, average and marginal cost,
// cost elasticity and returns to scale, and the lower bound of total cost at three rows of the data.
// PRODEFFICIENTSCALE's `what` on the translog (classical and HC3 errors, and with the control and
// the trend) at the prices of the same rows: y* by the closed form, its standard error and bounds
// with the complex-step gradient of ln y* (the core's is analytic, by implicit differentiation).
//
// Tolerance: 1e-7 relative (the tolerance for delta-method figures; the complex step is
// exact to rounding and both covariances come from the same least squares, good to about 1e-11).
//
// CTest runs the script first (test cost_scale_figures) and passes the file it wrote in the
// environment variable ISOQUANT_COST_SCALE_FIGURES; without that file this test is skipped.
#include "isoquant/sheet/functions/bound_functions.hpp"
#include "isoquant/sheet/functions/cost_decisions.hpp"
#include "isoquant/sheet/functions/cost_functions.hpp"
#include "isoquant/sheet/tables/cost_table.hpp"
#include "reference_data.hpp"
#include "reference_figures.hpp"
#include "relative_error.hpp"

#include <boost/test/unit_test.hpp>

#include <array>
#include <map>
#include <string>

using isoquant::testing::closeTo;

namespace {

constexpr double deltaMethodTolerance = 1e-7;
constexpr std::array<int, 3> points{0, 100, 500}; // cost_check.py's POINTS

boost::test_tools::assertion_result figuresAvailable(boost::unit_test::test_unit_id)
{
    return isoquant::testing::referenceFiguresAvailable("ISOQUANT_COST_SCALE_FIGURES", "cost scale figures");
}

// The models of cost_scale_check.py, by name: the panel arguments without groups, the trend kept
// for "translog_trend_control"; the plain translog of cost_check.py with its errors.
isoquant::ModelTable modelNamed(const std::string& name)
{
    isoquant::CostFitArguments arguments = isoquant::testing::riceFarmCostPanelArguments();
    arguments.groups = {};
    if (name == "cd_control") arguments.trend = {};
    if (name == "translog_trend") arguments.controls = {};
    if (name != "cd_control") arguments.form = std::string("translog");
    if (name == "translog" || name == "translog_hc3") {
        arguments = isoquant::testing::riceFarmCostArguments();
        arguments.form = std::string("translog");
        if (name == "translog_hc3") arguments.errors = std::string("hc3");
    }
    return isoquant::ModelTable(isoquant::costFitTableWithCovariance(isoquant::costFitFromArguments(arguments), 1.0));
}

// The output and the prices of the data row at points[index].
isoquant::testing::CostPoint pointAt(long index)
{
    return isoquant::testing::riceFarmCostPoint(static_cast<std::size_t>(points.at(static_cast<std::size_t>(index))));
}

// "bound_se_<what>" or "bound_lower_total" through PRODCOST on the table with its block.
double boundFigure(const isoquant::ModelTable& table, const std::string& quantity, long index)
{
    return isoquant::testing::riceFarmCostBound(table, quantity,
                                                static_cast<std::size_t>(points.at(static_cast<std::size_t>(index))));
}

// "scale_value", "scale_se", "scale_lower" or "scale_upper" through PRODEFFICIENTSCALE.
double scaleFigure(const isoquant::ModelTable& table, const std::string& quantity, long index)
{
    static const std::map<std::string, std::string> words{{"scale_value", "value"},
                                                          {"scale_se", "std. error"},
                                                          {"scale_lower", "lower bound"},
                                                          {"scale_upper", "upper bound"}};
    if (quantity == "scale_exists") // a number, or the sentence saying there is none
        return isoquant::efficientScaleCell(table, pointAt(index).prices).isNumber(0, 0) ? 1.0 : 0.0;
    return isoquant::efficientScaleCell(table, pointAt(index).prices, words.at(quantity)).number(0, 0);
}

} // namespace

BOOST_AUTO_TEST_SUITE(cost_scale_cross_check)

BOOST_AUTO_TEST_CASE(cost_bounds_agree_with_statsmodels, *boost::unit_test::precondition(figuresAvailable))
{
    const auto rows =
        isoquant::testing::readReferenceRows(isoquant::testing::referenceFiguresPath("ISOQUANT_COST_SCALE_FIGURES"));
    BOOST_TEST_REQUIRE(rows.size() > 60u);
    std::map<std::string, isoquant::ModelTable> tables;
    std::size_t checked = 0;
    long scalesFound = 0;
    for (const auto& fields : rows) {
        const std::string& model = fields.at(1);
        const std::string& quantity = fields.at(2);
        if (!tables.count(model)) tables.emplace(model, modelNamed(model));
        const double expected = std::stod(fields.at(4));
        const bool bound = quantity.rfind("bound_", 0) == 0;
        const double actual = bound ? boundFigure(tables.at(model), quantity, std::stol(fields.at(3)))
                                    : scaleFigure(tables.at(model), quantity, std::stol(fields.at(3)));
        if (quantity == "scale_exists") scalesFound += expected == 1.0 ? 1 : 0;
        BOOST_TEST(closeTo(actual, expected, deltaMethodTolerance),
                   model << " " << quantity << " " << fields.at(3) << ": " << actual << " vs " << expected);
        ++checked;
    }
    // 3 models × 3 rows × 6 bound figures; 4 translog models × 3 rows whether y* exists (not with the
    // control and the trend, whose cost elasticity falls with output), and 4 figures where it does.
    BOOST_TEST(scalesFound == 9);
    BOOST_TEST(checked == 54u + 12u + 36u);
}

BOOST_AUTO_TEST_SUITE_END()
