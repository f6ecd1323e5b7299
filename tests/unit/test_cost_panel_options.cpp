// PRODCOSTFIT with controls, groups, effects, a trend and cluster errors: properties that hold
// whatever the data (the within estimator equals the regression with one dummy per group; a trend
// is a column t − t_first), the table's layout and size formula, the constant PRODCOST and
// PRODEFFICIENCY read from it, and the messages for combinations not offered. Invented data; the
// figures against python3-statsmodels are in test_cost_panel_cross_check.cpp.
#include "isoquant/sheet/functions/cost_functions.hpp"
#include "isoquant/sheet/functions/frontier_functions.hpp"
#include "isoquant/sheet/models/cost_model.hpp"
#include "isoquant/sheet/tables/cost_table.hpp"
#include "cell_tables.hpp"
#include "input_error_message.hpp"
#include "relative_error.hpp"

#include <boost/test/unit_test.hpp>

#include <cmath>
#include <random>

using isoquant::Cell;
using isoquant::CellTable;
using isoquant::testing::closeTo;
using isoquant::testing::messageOf;
using isoquant::testing::numberRange;

namespace {

constexpr int bakeries = 6, years = 5;

// Six bakeries over five years (invented): ln C = α_g + 0.8 ln y + 0.7 ln w₁ + 0.3 ln w₂ − 0.02·t
// + 0.05·rain + v, σᵥ = 0.04, α_g spread over 0.5; y log-uniform over [500, 5000], prices over
// [1, 20]; rain (a control) uniform over [0, 10]. A cost frontier's data add half-normal u of
// σᵤ = `inefficiencySd` to ln C.
isoquant::CostFitArguments bakeryPanel(std::uint32_t seed, int bakeryCount = bakeries, double inefficiencySd = 0)
{
    std::mt19937 engine(seed);
    std::uniform_real_distribution<double> logOutput(std::log(500.0), std::log(5000.0)), logPrice(0.0, std::log(20.0)),
        rainfall(0.0, 10.0);
    std::normal_distribution<double> noise(0.0, 0.04), inefficiency(0.0, inefficiencySd > 0 ? inefficiencySd : 1.0);
    const int n = bakeryCount * years;
    Eigen::MatrixXd cost(n, 1), output(n, 1), prices(n, 2), rain(n, 1), year(n, 1), bakery(n, 1);
    for (int row = 0; row < n; ++row) {
        bakery(row, 0) = row / years + 1;
        year(row, 0) = 2019 + row % years;
        output(row, 0) = std::exp(logOutput(engine));
        prices(row, 0) = std::exp(logPrice(engine));
        prices(row, 1) = std::exp(logPrice(engine));
        rain(row, 0) = rainfall(engine);
        const double effect = 0.1 * ((row / years) % bakeries); // α_g: 0, 0.1, …, 0.5, then again
        cost(row, 0) = std::exp(effect + 0.8 * std::log(output(row, 0)) + 0.7 * std::log(prices(row, 0)) +
                                0.3 * std::log(prices(row, 1)) - 0.02 * (year(row, 0) - 2019) + 0.05 * rain(row, 0) +
                                noise(engine) + (inefficiencySd > 0 ? std::fabs(inefficiency(engine)) : 0.0));
    }
    isoquant::CostFitArguments arguments;
    arguments.cost = numberRange(cost, {"cost"});
    arguments.output = numberRange(output, {"loaves"});
    arguments.prices = numberRange(prices, {"bakers", "flour"});
    arguments.controls = numberRange(rain, {"rain"});
    arguments.groups = numberRange(bakery, {"bakery"});
    arguments.trend = numberRange(year, {"year"});
    return arguments;
}

std::vector<std::string> labelsOf(const CellTable& table)
{
    std::vector<std::string> labels;
    for (std::size_t row = 0; row < table.rows(); ++row)
        labels.push_back(table.isText(row, 0) ? table.text(row, 0) : "");
    return labels;
}

double valueOf(const CellTable& table, const std::string& label)
{
    for (std::size_t row = 0; row < table.rows(); ++row)
        if (table.isText(row, 0) && table.text(row, 0) == label) return table.number(row, 1);
    BOOST_FAIL("no row " + label);
    return 0;
}

std::string fitMessage(const isoquant::CostFitArguments& arguments)
{
    return messageOf([&] { isoquant::costFitFromArguments(arguments); });
}

} // namespace

BOOST_AUTO_TEST_SUITE(cost_panel_options)

BOOST_AUTO_TEST_CASE(fixed_effects_equal_one_dummy_per_group)
{
    isoquant::CostFitArguments within = bakeryPanel(7);
    within.effects = std::string("fixed");
    within.trend = {};
    const isoquant::CostFit fixed = isoquant::costFitFromArguments(within);

    isoquant::CostFitArguments dummies = bakeryPanel(7);
    dummies.groups = {};
    dummies.trend = {};
    Eigen::MatrixXd controls(bakeries * years, bakeries);
    for (int row = 0; row < bakeries * years; ++row) {
        controls(row, 0) = dummies.controls.number(static_cast<std::size_t>(row) + 1, 0); // under the header
        for (int g = 1; g < bakeries; ++g) controls(row, g) = row / years == g ? 1.0 : 0.0;
    }
    dummies.controls = numberRange(controls, {"rain", "b2", "b3", "b4", "b5", "b6"});
    const isoquant::CostFit dummy = isoquant::costFitFromArguments(dummies);

    // Output, both prices and rain: estimates and classical standard errors of the same least squares.
    const auto& a = fixed.summary.inference;
    const auto& b = dummy.summary.inference;
    for (Eigen::Index i : {1, 2, 3, 4}) {
        BOOST_TEST(closeTo(a.estimates(i), b.estimates(i), 1e-9), "parameter " << i);
        BOOST_TEST(closeTo(a.standardErrors(i), b.standardErrors(i), 1e-9), "standard error " << i);
    }
    // The constant is the mean group effect: the first bakery's plus the mean of the dummies.
    BOOST_TEST(closeTo(a.estimates(0), b.estimates(0) + b.estimates.tail(bakeries - 1).sum() / bakeries, 1e-9));
    BOOST_TEST(std::isnan(a.standardErrors(0)));
    BOOST_TEST(closeTo(fixed.summary.rSquared, dummy.summary.rSquared, 1e-9));
    BOOST_TEST(closeTo(fixed.costElasticity.standardError, dummy.costElasticity.standardError, 1e-9));
}

BOOST_AUTO_TEST_CASE(a_trend_is_the_column_of_periods_from_the_first)
{
    isoquant::CostFitArguments trend = bakeryPanel(8);
    trend.groups = {};
    const isoquant::CostFit withTrend = isoquant::costFitFromArguments(trend);
    isoquant::CostFitArguments column = bakeryPanel(8);
    column.groups = {};
    column.trend = {};
    Eigen::MatrixXd both(bakeries * years, 2);
    for (int row = 0; row < bakeries * years; ++row) {
        both(row, 0) = trend.controls.number(static_cast<std::size_t>(row) + 1, 0);
        both(row, 1) = row % years; // the year − 2019
    }
    column.controls = numberRange(both, {"rain", "years since 2019"});
    const isoquant::CostFit asControl = isoquant::costFitFromArguments(column);
    BOOST_TEST_REQUIRE(withTrend.summary.panel.technicalChange.has_value());
    const auto& change = *withTrend.summary.panel.technicalChange;
    BOOST_TEST(closeTo(change.estimate, asControl.summary.inference.estimates(5), 1e-10));
    BOOST_TEST(closeTo(change.standardError, asControl.summary.inference.standardErrors(5), 1e-10));
    BOOST_TEST(std::fabs(change.estimate + 0.02) < 4 * change.standardError); // the generating −0.02
    // Predictions at the latest period: the constant at the controls' means plus 4 years of change.
    const CellTable table = isoquant::costFitTable(withTrend);
    BOOST_TEST(closeTo(valueOf(table, "constant for predictions"),
                       valueOf(table, "constant at control means") + 4 * change.estimate, 1e-12));
    BOOST_TEST(valueOf(table, "latest period") == 2023.0);
}

BOOST_AUTO_TEST_CASE(the_table_lists_controls_and_options)
{
    isoquant::CostFitArguments arguments = bakeryPanel(9);
    arguments.effects = std::string("fixed");
    arguments.errors = std::string("cluster");
    const CellTable table = isoquant::costFitTable(isoquant::costFitFromArguments(arguments));
    const std::vector<std::string> expected{"Cobb-Douglas cost fit",
                                            "constant",
                                            "output",
                                            "bakers",
                                            "flour",
                                            "rain (control)",
                                            "",
                                            "observations",
                                            "R2",
                                            "adjusted R2",
                                            "residual SD",
                                            "F (slopes = 0)",
                                            "log-likelihood",
                                            "AIC",
                                            "BIC",
                                            "cost elasticity",
                                            "returns to scale",
                                            "verdict",
                                            "efficient scale",
                                            "regularity",
                                            "form",
                                            "constant at control means",
                                            "smearing factor",
                                            "groups",
                                            "effects",
                                            "within R2",
                                            "cost change per period",
                                            "constant for predictions",
                                            "latest period"};
    BOOST_TEST(labelsOf(table) == expected, boost::test_tools::per_element());
    BOOST_TEST(table.rows() == isoquant::costFitTableRows(isoquant::CostForm::cobbDouglas, 2) + 1 + 1 + 6);
    BOOST_TEST(table.text(1, 2) == "n/a"); // the mean group effect has no standard error
    BOOST_TEST(valueOf(table, "groups") == 6.0);
    BOOST_TEST(table.text(24, 1) == "fixed");
}

BOOST_AUTO_TEST_CASE(evaluators_use_the_constant_for_predictions)
{
    isoquant::CostFitArguments arguments = bakeryPanel(10);
    arguments.effects = std::string("fixed");
    const CellTable table = isoquant::costFitTable(isoquant::costFitFromArguments(arguments));
    const isoquant::CostModel model = isoquant::readCostModel(table);
    BOOST_TEST(model.constant == valueOf(table, "constant for predictions"));
    BOOST_TEST(model.constantAtZeroControls == valueOf(table, "constant"));
    BOOST_TEST(model.controlLabels == std::vector<std::string>{"rain"});
    BOOST_TEST(model.prices.size() == 2); // rain is no price
    const Eigen::Vector2d prices(12.0, 3.0);
    const double expected =
        std::exp(model.constant + valueOf(table, "output") * std::log(2000.0) +
                 valueOf(table, "bakers") * std::log(12.0) + valueOf(table, "flour") * std::log(3.0));
    const CellTable total =
        isoquant::costColumn(isoquant::ModelTable(table), numberRange(Eigen::MatrixXd::Constant(1, 1, 2000.0)),
                             numberRange(prices.transpose()), std::string("total"));
    BOOST_TEST(closeTo(total.number(0, 0), expected, 1e-12));
}

namespace {

// A typed cobb-douglas cost model (constant 1, output 0.8, labour 0.6, energy 0.4, a control rain
// 0.1) with `below` under its parameter rows.
CellTable typedCostModelWithControl(std::vector<std::vector<Cell>> below)
{
    std::vector<std::vector<Cell>> rows{{std::string("form"), std::string("cobb-douglas cost")},
                                        {std::string("constant"), 1.0},
                                        {std::string("output"), 0.8},
                                        {std::string("labour"), 0.6},
                                        {std::string("energy"), 0.4},
                                        {std::string("rain (control)"), 0.1}};
    rows.insert(rows.end(), below.begin(), below.end());
    CellTable range(rows.size(), 2);
    for (std::size_t row = 0; row < rows.size(); ++row)
        for (std::size_t column = 0; column < 2; ++column) range.set(row, column, rows[row][column]);
    return range;
}

} // namespace

BOOST_AUTO_TEST_CASE(a_typed_model_takes_control_rows)
{
    const CellTable typed =
        typedCostModelWithControl({{Cell{}, Cell{}}, {std::string("constant at control means"), 1.25}});
    const isoquant::CostModel model = isoquant::readCostModel(typed);
    BOOST_TEST(model.constant == 1.25);
    const Eigen::Vector2d prices(10.0, 2.0);
    const double rest = 0.8 * std::log(100.0) + 0.6 * std::log(10.0) + 0.4 * std::log(2.0);
    BOOST_TEST(closeTo(model.logCost(100.0, prices), 1.25 + rest, 1e-14));
    BOOST_TEST(closeTo(model.logCostAt(100.0, prices, Eigen::VectorXd::Constant(1, 3.0)), 1.0 + 0.3 + rest, 1e-14));
}

BOOST_AUTO_TEST_CASE(a_typed_model_reads_its_constant_rows_without_an_empty_row_before_them)
{
    // Typed straight under the parameters, the table's own rows are not read as input prices.
    const CellTable typed = typedCostModelWithControl(
        {{std::string("constant at control means"), 1.25}, {std::string("cost change per period"), 0.02}});
    const isoquant::CostModel model = isoquant::readCostModel(typed);
    BOOST_TEST(model.priceLabels == (std::vector<std::string>{"labour", "energy"}), boost::test_tools::per_element());
    BOOST_TEST(model.constant == 1.25);
    BOOST_TEST(model.controlLabels.size() == 1u);
}

BOOST_AUTO_TEST_CASE(a_cost_frontier_takes_controls)
{
    constexpr int chain = 40;
    isoquant::CostFitArguments arguments = bakeryPanel(11, chain, 0.3);
    arguments.groups = {};
    arguments.trend = {};
    arguments.inefficiency = std::string("half-normal");
    const CellTable table = isoquant::costFitTable(isoquant::costFitFromArguments(arguments));
    BOOST_TEST(table.text(5, 0) == "rain (control)");
    const std::size_t n = chain * years;
    CellTable columns(n + 1, 4);
    for (std::size_t row = 0; row <= n; ++row) {
        columns.set(row, 0, arguments.output.at(row, 0));
        columns.set(row, 1, arguments.prices.at(row, 0));
        columns.set(row, 2, arguments.prices.at(row, 1));
        columns.set(row, 3, arguments.controls.at(row, 0));
    }
    const Eigen::VectorXd efficiency = isoquant::testing::columnValuesUnder(
        isoquant::efficiencyColumn(table, arguments.cost, columns, Cell{}), "cost efficiency");
    BOOST_TEST((efficiency.array() > 0).all());
    BOOST_TEST((efficiency.array() <= 1).all());
    BOOST_TEST(messageOf([&] { isoquant::efficiencyColumn(table, arguments.cost, arguments.prices, Cell{}); }) ==
               "inputs: has 2 columns, but a cost frontier needs 4: the output column, then the 2 price columns in "
               "PRODCOSTFIT's order, then its 1 control");
}

BOOST_AUTO_TEST_CASE(combinations_not_offered_are_named)
{
    auto arguments = bakeryPanel(12);
    arguments.groups = {};
    arguments.effects = std::string("fixed");
    BOOST_TEST(fitMessage(arguments) ==
               "effects: \"fixed\" needs the groups argument, a column naming each row's plant or firm");
    arguments = bakeryPanel(12);
    arguments.trend = {};
    arguments.effects = std::string("two-way");
    BOOST_TEST(fitMessage(arguments) == "effects: \"two-way\" needs the trend argument, the column of periods (years)");
    arguments = bakeryPanel(12);
    arguments.inefficiency = std::string("half-normal");
    arguments.groups = {};
    BOOST_TEST(fitMessage(arguments) == "trend: not available with a cost frontier, which takes controls but no panel "
                                        "options (its inefficiency would mix with group effects or a trend); leave "
                                        "trend empty");
    arguments.trend = {};
    arguments.groups = bakeryPanel(12).groups;
    BOOST_TEST(fitMessage(arguments).rfind("groups: not available with a cost frontier", 0) == 0);
    arguments = bakeryPanel(12);
    arguments.effects = std::string("fixed");
    arguments.shares = numberRange(Eigen::MatrixXd::Constant(bakeries * years, 2, 0.5));
    BOOST_TEST(fitMessage(arguments) == "effects: not available with shares: the share equations would need group "
                                        "effects of their own; fit without shares for effects");
    arguments = bakeryPanel(12);
    arguments.groups = numberRange(Eigen::MatrixXd::Constant(bakeries * years, 1, 1.0), {"bakery"});
    arguments.errors = std::string("cluster");
    BOOST_TEST(fitMessage(arguments) ==
               "groups: every row is in the same group; cluster-robust errors need at least 2 groups");
    arguments = bakeryPanel(12);
    arguments.trend = numberRange(Eigen::MatrixXd::Constant(bakeries * years, 1, 2020.0), {"year"});
    BOOST_TEST(fitMessage(arguments) ==
               "trend: every row holds the same period; a trend needs at least two different periods");
    arguments = bakeryPanel(12);
    arguments.groups = numberRange(Eigen::MatrixXd::Constant(bakeries * years - 1, 1, 1.0));
    BOOST_TEST(fitMessage(arguments) ==
               "groups: has 29 rows but output has 30 rows of data; give one identifier per row "
               "(a header row may come first)");
}

BOOST_AUTO_TEST_SUITE_END()
