// PRODCOST's statistic on cost tables fitted under group effects (issue 20), read from the
// covariance block's last row "constant for predictions" (the row-weighted mean farm effect, plus
// the control at its mean, the trend to the latest season or the last season's effect), on the
// rice-farm panel (Feng and Horrace 2012, as in plm 2.6 RiceFarms; groups = farm, periods = season,
// control size) under fixed and two-way effects, classical and cluster errors (and fixed effects on
// an unbalanced panel, the first farm's first 3 rows dropped as incomplete rows), against
// python3-statsmodels 0.13.5 OLS of the explicit dummy-variable cost regression with a numpy
// complex-step gradient, recomputed at test time by tests/reference/cost_effects_bounds_check.py:
// that constant and its standard error, and at three rows of the data the standard errors of total,
// average and marginal cost, cost elasticity and returns to scale and the lower bound of total cost.
// The script rescales statsmodels' cluster covariance by (n − K)/(n − K + G − 1), the farm effects
// being nested in the clusters (least_squares.hpp, absorbedNestedInClusters).
//
// Tolerance: 1e-7 relative (the tolerance for delta-method figures; the complex step is
// exact to rounding and both covariances come from the same least squares, good to about 1e-11).
//
// CTest runs the script first (test cost_effects_bounds_figures) and passes the file it wrote in the
// environment variable ISOQUANT_COST_EFFECTS_BOUNDS_FIGURES; without that file this test is skipped.
#include "isoquant/sheet/functions/bound_functions.hpp"
#include "isoquant/sheet/functions/cost_functions.hpp"
#include "isoquant/sheet/models/cost_model.hpp"
#include "isoquant/sheet/tables/cost_table.hpp"
#include "reference_data.hpp"
#include "reference_figures.hpp"
#include "relative_error.hpp"

#include <boost/test/unit_test.hpp>

#include <array>
#include <cmath>
#include <map>
#include <string>

using isoquant::testing::closeTo;

namespace {

constexpr double deltaMethodTolerance = 1e-7;
constexpr std::array<int, 3> points{0, 100, 500}; // cost_check.py's POINTS

boost::test_tools::assertion_result figuresAvailable(boost::unit_test::test_unit_id)
{
    return isoquant::testing::referenceFiguresAvailable("ISOQUANT_COST_EFFECTS_BOUNDS_FIGURES",
                                                        "cost effects bounds figures");
}

struct ModelOptions {
    const char* form;
    bool control;
    const char* effects;
    bool trend; // estimated under fixed effects; two-way effects take their periods from it
    const char* errors;
};

// The models of cost_effects_bounds_check.py, by name.
const std::map<std::string, ModelOptions> models{
    {"cd_fixed", {"cobb-douglas", false, "fixed", false, "classical"}},
    {"cd_fixed_control_cluster", {"cobb-douglas", true, "fixed", false, "cluster"}},
    {"cd_two_way", {"cobb-douglas", false, "two-way", true, "classical"}},
    {"cd_two_way_cluster", {"cobb-douglas", true, "two-way", true, "cluster"}},
    {"translog_fixed_trend", {"translog", false, "fixed", true, "classical"}},
    {"translog_fixed_trend_cluster", {"translog", true, "fixed", true, "cluster"}},
    {"cd_fixed_unbalanced_cluster", {"cobb-douglas", true, "fixed", false, "cluster"}},
};
constexpr std::size_t droppedRows = 3; // the unbalanced model's: the first farm keeps 3 of its 6 rows

isoquant::ModelTable modelNamed(const std::string& name)
{
    const ModelOptions& options = models.at(name);
    isoquant::CostFitArguments arguments = isoquant::testing::riceFarmCostPanelArguments();
    arguments.form = std::string(options.form);
    arguments.errors = std::string(options.errors);
    arguments.effects = std::string(options.effects);
    if (!options.control) arguments.controls = {};
    if (!options.trend) arguments.trend = {};
    if (name == "cd_fixed_unbalanced_cluster") { // dropped as incomplete rows
        for (std::size_t row = 1; row <= droppedRows; ++row) arguments.cost.setEmpty(row, 0); // under the header
        arguments.incompleteRows = 1.0;
    }
    return isoquant::ModelTable(isoquant::costFitTableWithCovariance(isoquant::costFitFromArguments(arguments), 1.0));
}

// The figure `quantity` of cost_effects_bounds_check.py: the block's last row (the constant for
// predictions) or a "bound_se_<what>" / "bound_lower_total" through PRODCOST.
double figure(const isoquant::ModelTable& table, const std::string& quantity, long index)
{
    if (quantity.rfind("constant_for_predictions", 0) == 0) {
        const isoquant::CostModel model = isoquant::readCostModel(table.cells());
        const Eigen::MatrixXd& covariance = model.covariance->matrix;
        return quantity == "constant_for_predictions" ? model.constant
                                                      : std::sqrt(covariance(covariance.rows() - 1,
                                                                             covariance.cols() - 1));
    }
    return isoquant::testing::riceFarmCostBound(table, quantity,
                                                static_cast<std::size_t>(points.at(static_cast<std::size_t>(index))));
}

} // namespace

BOOST_AUTO_TEST_SUITE(cost_effects_bounds_cross_check)

BOOST_AUTO_TEST_CASE(cost_bounds_under_effects_agree_with_statsmodels,
                     *boost::unit_test::precondition(figuresAvailable))
{
    const auto rows = isoquant::testing::readReferenceRows(
        isoquant::testing::referenceFiguresPath("ISOQUANT_COST_EFFECTS_BOUNDS_FIGURES"));
    std::map<std::string, isoquant::ModelTable> tables;
    std::size_t checked = 0;
    for (const auto& fields : rows) {
        const std::string& model = fields.at(1);
        const std::string& quantity = fields.at(2);
        if (!tables.count(model)) tables.emplace(model, modelNamed(model));
        const double expected = std::stod(fields.at(4));
        const double actual = figure(tables.at(model), quantity, std::stol(fields.at(3)));
        BOOST_TEST(closeTo(actual, expected, deltaMethodTolerance),
                   model << " " << quantity << " " << fields.at(3) << ": " << actual << " vs " << expected);
        ++checked;
    }
    // 7 models × (the constant and its standard error + 3 rows × 6 bound figures).
    BOOST_TEST(checked == 7u * (2u + 3u * 6u));
}

BOOST_AUTO_TEST_SUITE_END()
