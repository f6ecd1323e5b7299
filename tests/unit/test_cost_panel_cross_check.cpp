// PRODCOSTFIT with controls, groups, effects, a trend and cluster errors on the rice-farm panel
// (Feng and Horrace 2012, as in plm 2.6 RiceFarms; cost = pseed·seed + purea·urea + wage·totlabor,
// output goutput, prices pseed, purea, wage; groups id, control size, trend the farm's season)
// against python3-statsmodels 0.13.5 OLS of the dummy-variable regression, recomputed at test time
// by tests/reference/cost_panel_check.py: every parameter of the full form, the control, the
// trend, R², adjusted R², within R², F, log-likelihood, AIC, BIC, the cost elasticity and its test
// of 1, the translog's efficient scale and the smearing factor.
//
// Tolerance: 1e-8 relative, as the other statsmodels cross-checks: the within estimator and the
// dummy-variable regression are the same least squares by two routes, each good to about 1e-11
// here (171 farm dummies).
//
// CTest runs the script first (test cost_panel_figures) and passes the file it wrote in the
// environment variable ISOQUANT_COST_PANEL_FIGURES; without that file this test is skipped.
#include "isoquant/sheet/functions/cost_functions.hpp"
#include "cost_figures.hpp"
#include "reference_data.hpp"
#include "reference_figures.hpp"
#include "relative_error.hpp"

#include <boost/test/unit_test.hpp>

#include <cmath>
#include <limits>
#include <map>
#include <string>

using isoquant::testing::closeTo;

namespace {

constexpr double statsmodelsTolerance = 1e-8;

boost::test_tools::assertion_result figuresAvailable(boost::unit_test::test_unit_id)
{
    return isoquant::testing::referenceFiguresAvailable("ISOQUANT_COST_PANEL_FIGURES", "cost panel figures");
}

struct ModelOptions {
    const char* form;
    bool control;
    const char* effects; // "" for none: groups are then given only for cluster errors
    bool groups;
    bool trend;
    const char* errors;
};

// The models of cost_panel_check.py, by name.
const std::map<std::string, ModelOptions> models{
    {"cd_control", {"cobb-douglas", true, "", false, false, "classical"}},
    {"cd_pooled_cluster", {"cobb-douglas", false, "", true, false, "cluster"}},
    {"cd_fixed", {"cobb-douglas", false, "fixed", true, false, "classical"}},
    {"cd_fixed_cluster", {"cobb-douglas", true, "fixed", true, false, "cluster"}},
    {"cd_fixed_trend_hc1", {"cobb-douglas", false, "fixed", true, true, "hc1"}},
    {"cd_two_way", {"cobb-douglas", false, "two-way", true, true, "classical"}},
    {"translog_fixed_cluster", {"translog", false, "fixed", true, false, "cluster"}},
    {"translog_trend_control", {"translog", true, "", false, true, "classical"}},
};

isoquant::CostFit fitModel(const ModelOptions& options)
{
    isoquant::CostFitArguments arguments = isoquant::testing::riceFarmCostPanelArguments();
    arguments.form = std::string(options.form);
    arguments.errors = std::string(options.errors);
    if (*options.effects) arguments.effects = std::string(options.effects);
    if (!options.control) arguments.controls = {};
    if (!options.groups) arguments.groups = {};
    if (!options.trend) arguments.trend = {};
    return isoquant::costFitFromArguments(arguments);
}

} // namespace

BOOST_AUTO_TEST_SUITE(cost_panel_cross_check)

BOOST_AUTO_TEST_CASE(cost_panel_fits_agree_with_statsmodels, *boost::unit_test::precondition(figuresAvailable))
{
    const auto rows =
        isoquant::testing::readReferenceRows(isoquant::testing::referenceFiguresPath("ISOQUANT_COST_PANEL_FIGURES"));
    BOOST_TEST_REQUIRE(rows.size() > 250u);
    std::map<std::string, isoquant::CostFit> fits;
    for (const auto& fields : rows) {
        const std::string& model = fields.at(1);
        if (!fits.count(model)) fits.emplace(model, fitModel(models.at(model)));
        const double expected = std::stod(fields.at(4));
        const double actual = isoquant::testing::costFitFigure(fits.at(model), fields.at(2), std::stol(fields.at(3)));
        BOOST_TEST(closeTo(actual, expected, statsmodelsTolerance),
                   model << " " << fields.at(2) << " " << fields.at(3) << ": " << actual << " vs " << expected);
    }
    BOOST_TEST(fits.size() == models.size());
}

BOOST_AUTO_TEST_SUITE_END()
