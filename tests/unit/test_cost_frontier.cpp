// PRODCOSTFIT with `inefficiency` (the cost frontier) and PRODEFFICIENCY on its table: the table's
// layout and size formula, the cost model PRODCOST reads from it, and the messages for bad input.
// The cross-check against python3-scipy is in test_cost_frontier_cross_check.cpp.
#include "isoquant/math/frontier/cost_frontier.hpp"
#include "isoquant/sheet/functions/cost_functions.hpp"
#include "isoquant/sheet/functions/frontier_functions.hpp"
#include "isoquant/sheet/models/cost_model.hpp"
#include "isoquant/sheet/tables/cost_table.hpp"
#include "cell_tables.hpp"
#include "cost_test_data.hpp"
#include "input_error_message.hpp"
#include "relative_error.hpp"

#include <boost/test/unit_test.hpp>

#include <cmath>
#include <random>

using isoquant::Cell;
using isoquant::CellTable;
using isoquant::testing::depots;
using isoquant::testing::messageOf;
using isoquant::testing::numberRange;

namespace {

std::vector<std::string> labelsOf(const CellTable& table)
{
    std::vector<std::string> labels;
    for (std::size_t row = 0; row < table.rows(); ++row) labels.push_back(table.isText(row, 0) ? table.text(row, 0) : "");
    return labels;
}

// The output column followed by the price columns, as PRODEFFICIENCY takes them for a cost frontier.
CellTable outputAndPrices(const isoquant::CostFitArguments& arguments, std::size_t priceColumns)
{
    CellTable range(arguments.output.rows(), 1 + priceColumns);
    for (std::size_t row = 0; row < range.rows(); ++row) {
        range.set(row, 0, arguments.output.at(row, 0));
        for (std::size_t column = 0; column < priceColumns; ++column)
            range.set(row, 1 + column, arguments.prices.at(row, column));
    }
    return range;
}

} // namespace

BOOST_AUTO_TEST_SUITE(cost_frontier)

BOOST_AUTO_TEST_CASE(the_table_gains_the_frontier_rows)
{
    const isoquant::CostFitArguments arguments = depots(300, 41);
    const CellTable table = isoquant::costFitTable(isoquant::costFitFromArguments(arguments));
    BOOST_TEST(table.rows() == isoquant::costFitTableRows(isoquant::CostForm::cobbDouglas, 2, false, true));
    BOOST_TEST(table.rows() == isoquant::costFitTableRows(isoquant::CostForm::cobbDouglas, 2) + 6);
    const std::vector<std::string> expected{
        "half-normal cost frontier", "constant", "output", "drivers", "fuel", "", "noise SD", "inefficiency SD",
        "lambda", "observations", "R2", "adjusted R2", "residual SD", "F (slopes = 0)", "log-likelihood", "AIC", "BIC",
        "inefficiency test", "mean efficiency", "cost elasticity", "returns to scale", "verdict", "efficient scale",
        "regularity", "convergence", "form", "smearing factor"};
    BOOST_TEST(labelsOf(table) == expected, boost::test_tools::per_element());
    BOOST_TEST(table.text(24, 1) == "converged");
    BOOST_TEST(table.text(25, 1) == "cobb-douglas cost");
    BOOST_TEST(table.text(10, 1) == "n/a"); // R2 belongs to least squares
    BOOST_TEST(table.text(26, 1) == "n/a"); // no smearing for a frontier
    // The generating values (σᵤ = 0.25, output 0.9, drivers 0.6) within 4 standard errors (a loose
    // band: common practice, no source); the price coefficients sum to 1 (homogeneity).
    BOOST_TEST(std::fabs(table.number(7, 1) - 0.25) <= 4 * table.number(7, 2));
    BOOST_TEST(std::fabs(table.number(2, 1) - 0.9) <= 4 * table.number(2, 2));
    BOOST_TEST(std::fabs(table.number(3, 1) - 0.6) <= 4 * table.number(3, 2));
    BOOST_TEST(std::fabs(table.number(3, 1) + table.number(4, 1) - 1) <= 1e-12);
    BOOST_TEST(table.number(18, 1) < 1.0); // mean cost efficiency
    BOOST_TEST(table.number(17, 4) < 0.01); // the test rejects "no inefficiency" on 300 rows
}

BOOST_AUTO_TEST_CASE(the_translog_and_exponential_tables_have_their_sizes)
{
    isoquant::CostFitArguments arguments = depots(300, 42);
    arguments.form = std::string("translog");
    arguments.inefficiency = std::string("exponential");
    arguments.incompleteRows = 1.0; // TRUE
    const CellTable table = isoquant::costFitTable(isoquant::costFitFromArguments(arguments));
    BOOST_TEST(table.rows() == isoquant::costFitTableRows(isoquant::CostForm::translog, 2, true, true));
    BOOST_TEST(table.text(0, 0) == "exponential cost frontier");
    BOOST_TEST(table.text(table.rows() - 2, 1) == "translog cost");
}

BOOST_AUTO_TEST_CASE(prodcost_reads_the_frontier_as_the_least_cost)
{
    const isoquant::CostFitArguments arguments = depots(300, 43);
    const isoquant::CostFit fit = isoquant::costFitFromArguments(arguments);
    const CellTable table = isoquant::costFitTable(fit);
    BOOST_TEST(isoquant::isCostModel(table));
    const isoquant::CostModel model = isoquant::readCostModel(table);
    BOOST_TEST(model.constant == fit.summary.inference.estimates(0));
    BOOST_TEST(model.output == fit.summary.inference.estimates(1));
    // Each row's cost lies above the frontier's by exp(ε), and E[exp(−u)|ε] ≤ 1.
    const Eigen::VectorXd efficiency = isoquant::testing::columnValuesUnder(
        isoquant::efficiencyColumn(table, arguments.cost, outputAndPrices(arguments, 2), Cell{}), "cost efficiency");
    BOOST_TEST((efficiency.array() > 0).all());
    BOOST_TEST((efficiency.array() <= 1).all());
    const Eigen::VectorXd lower = isoquant::testing::columnValuesUnder(
        isoquant::efficiencyColumn(table, arguments.cost, outputAndPrices(arguments, 2), std::string("lower bound")),
        "cost efficiency lower bound");
    BOOST_TEST((lower.array() <= efficiency.array()).all());
}

BOOST_AUTO_TEST_CASE(bad_input_names_the_argument)
{
    isoquant::CostFitArguments arguments = depots(300, 41);
    arguments.inefficiency = std::string("gamma");
    BOOST_TEST(messageOf([&] { isoquant::costFitFromArguments(arguments); }) ==
               "inefficiency: 'gamma' is not a distribution; use \"half-normal\" or \"exponential\"");

    arguments.inefficiency = std::string("half-normal");
    arguments.errors = std::string("hc1");
    BOOST_TEST(messageOf([&] { isoquant::costFitFromArguments(arguments); }).rfind("errors: ", 0) == 0);
    arguments.errors = Cell{};
    arguments.shares = numberRange(Eigen::MatrixXd::Constant(300, 2, 0.5), {"drivers", "fuel"});
    BOOST_TEST(messageOf([&] { isoquant::costFitFromArguments(arguments); }).rfind("shares: not available with a cost frontier", 0) == 0);
    arguments.shares = CellTable{};

    const isoquant::CostFitArguments few = depots(5, 45);
    BOOST_TEST(messageOf([&] { isoquant::costFitFromArguments(few); }) ==
               "too few rows: cost, output and input prices have 5 rows of data for 5 parameters to estimate (with noise SD "
               "and inefficiency SD); need at least 6");

    const CellTable table = isoquant::costFitTable(isoquant::costFitFromArguments(arguments));
    BOOST_TEST(messageOf([&] { isoquant::efficiencyColumn(table, arguments.cost, arguments.prices, Cell{}); }) ==
               "inputs: has 2 columns, but a cost frontier needs 3: the output column, then the 2 price columns in "
               "PRODCOSTFIT's order");
    arguments.inefficiency = Cell{};
    const CellTable average = isoquant::costFitTable(isoquant::costFitFromArguments(arguments));
    BOOST_TEST(messageOf([&] {
                   isoquant::efficiencyColumn(average, arguments.cost, outputAndPrices(arguments, 2), Cell{});
               }).rfind("model: is a cost function without a frontier", 0) == 0);
}

BOOST_AUTO_TEST_CASE(bounds_of_a_row_far_on_the_efficient_side_are_finite)
{
    // A row whose cost lies far below the frontier (or output far above a production frontier): u
    // given ε is N(μ*, σ*²) truncated at 0 with z = μ*/σ* ≪ 0, and Φ(z) underflows. There the
    // truncated normal's density ∝ exp(uμ*/σ*² − u²/(2σ*²)) is that of an exponential of rate
    // |μ*|/σ*² up to the u² term, so u's quantile q is −ln(1 − q)·σ*²/|μ*| (derived here); the neglected
    // term, u²/(2σ*²), is below 1e-5 at these quantiles, so 1e-3 relative.
    const isoquant::TruncatedNormal far{-50.0, 0.05}; // z = −1000
    const double rate = 50.0 / (0.05 * 0.05);
    const double lower = isoquant::efficiencyLowerBound(far, 0.95), upper = isoquant::efficiencyUpperBound(far, 0.95);
    BOOST_TEST(isoquant::testing::closeTo(-std::log(lower), -std::log(0.025) / rate, 1e-3)); // u at 0.975
    BOOST_TEST(isoquant::testing::closeTo(-std::log(upper), -std::log(0.975) / rate, 1e-3)); // u at 0.025
    BOOST_TEST(lower <= isoquant::expectedEfficiency(far));
    BOOST_TEST(isoquant::expectedEfficiency(far) <= upper);
    // The same through the cost frontier: a cost 50 log points below it, σᵥ = 0.05, σᵤ = 0.3.
    const auto conditional =
        isoquant::costInefficiencyGivenResidual(isoquant::InefficiencyDistribution::halfNormal, -50.0, 0.05, 0.3);
    BOOST_TEST(std::isfinite(isoquant::efficiencyLowerBound(conditional, 0.95)));
    BOOST_TEST(isoquant::efficiencyUpperBound(conditional, 0.95) <= 1.0);
}

BOOST_AUTO_TEST_SUITE_END()
