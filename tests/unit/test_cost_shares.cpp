// PRODCOSTFIT with `shares`: invariance of the iterated SUR estimate to the share left out (shown
// here by reordering the inputs, so that another share is last and another price the numeraire;
// the estimate is maximum likelihood, which does not depend on either: Barten 1969, from memory),
// and the messages for bad shares. The agreement with an independent numpy implementation on
// published data is in test_cost_sur_cross_check.cpp. Invented data, seeded.
#include "isoquant/sheet/functions/cost_functions.hpp"
#include "isoquant/sheet/functions/cost_decisions.hpp"
#include "isoquant/sheet/tables/cost_table.hpp"
#include "cell_tables.hpp"
#include "input_error_message.hpp"
#include "relative_error.hpp"

#include <boost/test/unit_test.hpp>

#include <cmath>
#include <algorithm>
#include <random>

using isoquant::CellTable;
using isoquant::testing::closeTo;
using isoquant::testing::messageOf;
using isoquant::testing::numberRange;

namespace {

const std::vector<std::string> labels{"labour", "machines", "energy"};

// 60 laundries from an invented translog cost function (homogeneous in prices), ln C and each
// share with normal noise (SD 0.03 and 0.01; the last share is 1 minus the others).
isoquant::CostFitArguments laundries(const std::vector<int>& order)
{
    const Eigen::Vector3d first(0.35, 0.3, 0.35), byOutput(0.005, -0.002, -0.003);
    Eigen::Matrix3d pairs;
    pairs << 0.04, -0.02, -0.02, -0.02, 0.03, -0.01, -0.02, -0.01, 0.03;
    std::mt19937 engine(20261202);
    std::uniform_real_distribution<double> logOutput(std::log(2000.0), std::log(60000.0)), logPrice(-1.0, 1.5);
    std::normal_distribution<double> costNoise(0.0, 0.03), shareNoise(0.0, 0.01);
    const int n = 60;
    Eigen::MatrixXd cost(n, 1), output(n, 1), prices(n, 3), shares(n, 3);
    for (int row = 0; row < n; ++row) {
        const double ly = logOutput(engine);
        Eigen::Vector3d lw;
        for (int i = 0; i < 3; ++i) lw(i) = logPrice(engine);
        Eigen::Vector3d s = first + pairs * lw + byOutput * ly;
        s(0) += shareNoise(engine);
        s(1) += shareNoise(engine);
        s(2) = 1 - s(0) - s(1);
        const double logCost = -1.5 + 0.4 * ly + 0.03 * ly * ly + first.dot(lw) + 0.5 * lw.dot(pairs * lw) + ly * byOutput.dot(lw);
        cost(row, 0) = std::exp(logCost + costNoise(engine));
        output(row, 0) = std::exp(ly);
        for (int i = 0; i < 3; ++i) {
            prices(row, i) = std::exp(lw(order[static_cast<std::size_t>(i)]));
            shares(row, i) = s(order[static_cast<std::size_t>(i)]);
        }
    }
    std::vector<std::string> ordered, shareLabels;
    for (const int i : order) {
        ordered.push_back(labels[static_cast<std::size_t>(i)]);
        shareLabels.push_back(labels[static_cast<std::size_t>(i)] + " share");
    }
    isoquant::CostFitArguments arguments;
    arguments.cost = numberRange(cost, {"cost"});
    arguments.output = numberRange(output, {"washes"});
    arguments.prices = numberRange(prices, ordered);
    arguments.shares = numberRange(shares, shareLabels);
    arguments.form = std::string("translog");
    return arguments;
}

// The value in the row labelled `label`, or `a*b` written `b*a`.
double rowValue(const CellTable& table, const std::string& label, std::size_t column = 1)
{
    const auto star = label.find('*');
    const std::string swapped = star == std::string::npos ? label : label.substr(star + 1) + "*" + label.substr(0, star);
    for (std::size_t row = 0; row < table.rows(); ++row)
        if (table.isText(row, 0) && (table.text(row, 0) == label || table.text(row, 0) == swapped) &&
            table.isNumber(row, column))
            return table.number(row, column);
    return std::nan("");
}

CellTable fittedTable(const isoquant::CostFitArguments& arguments)
{
    return isoquant::costFitTable(isoquant::costFitFromArguments(arguments));
}

} // namespace

BOOST_AUTO_TEST_SUITE(cost_shares)

// Iterated to 1e-10 relative change, the two fits meet to about 1e-9; 1e-7 relative on every
// estimate and standard error, and on the log-likelihood.
BOOST_AUTO_TEST_CASE(share_system_does_not_depend_on_the_share_left_out)
{
    const CellTable original = fittedTable(laundries({0, 1, 2}));
    const CellTable reordered = fittedTable(laundries({2, 0, 1}));
    std::vector<std::string> rows{"constant", "output", "output*output", "log-likelihood", "R2", "cost elasticity"};
    for (const auto& a : labels) {
        rows.push_back(a);
        rows.push_back(a + "*output");
        for (const auto& b : labels) rows.push_back(a + "*" + b);
    }
    for (const auto& label : rows) {
        BOOST_TEST(closeTo(rowValue(reordered, label), rowValue(original, label), 1e-7), label);
        if (label.find('*') != std::string::npos || label == "constant")
            BOOST_TEST(closeTo(rowValue(reordered, label, 2), rowValue(original, label, 2), 1e-7), label << " se");
    }
    // The shares carry information: the system's standard error of a price coefficient is below
    // that of least squares on the cost equation alone (the point of adding them).
    isoquant::CostFitArguments alone = laundries({0, 1, 2});
    alone.shares = CellTable();
    BOOST_TEST(rowValue(original, "labour", 2) < rowValue(fittedTable(alone), "labour", 2));
}

BOOST_AUTO_TEST_CASE(bad_shares_name_the_argument_and_row)
{
    auto arguments = laundries({0, 1, 2});
    arguments.shares = numberRange(Eigen::MatrixXd::Constant(60, 2, 0.5));
    BOOST_TEST(messageOf([&] { isoquant::costFitFromArguments(arguments); }) ==
               "shares: has 2 columns but input prices has 3; give one share column per price, in the same order");
    arguments = laundries({0, 1, 2});
    arguments.shares.set(4, 1, 0.9); // row 5 of the range: header, then data row 4
    BOOST_TEST(messageOf([&] { isoquant::costFitFromArguments(arguments); }).rfind("shares: row 5: the shares sum to ", 0) == 0);
    arguments = laundries({0, 1, 2});
    arguments.shares = numberRange(Eigen::MatrixXd::Constant(59, 3, 1.0 / 3));
    BOOST_TEST(messageOf([&] { isoquant::costFitFromArguments(arguments); }) ==
               "shares: has 59 rows of data but cost has 60 rows");
    arguments = laundries({0, 1, 2});
    arguments.shares.set(3, 0, -0.2);
    arguments.shares.set(3, 2, 1.2 - arguments.shares.number(3, 1));
    BOOST_TEST(messageOf([&] { isoquant::costFitFromArguments(arguments); }) ==
               "shares: row 4, column 1 is -0.2; a cost share cannot be negative");
    arguments = laundries({0, 1, 2});
    arguments.errors = std::string("hc1");
    BOOST_TEST(messageOf([&] { isoquant::costFitFromArguments(arguments); }) ==
               "errors: with shares the system is fitted by iterated GLS, whose errors are classical; leave errors "
               "empty or fit without shares");
}

BOOST_AUTO_TEST_SUITE_END()

BOOST_AUTO_TEST_SUITE(cost_table_regularity)

// The table's `regularity` row counts the rows that PRODREGULAR over the same table calls
// irregular, and names the first. Data (invented, seeded) from a two-price translog cost function
// with βᵢᵢ = 0.2, s₁ = 0.5 + 0.2·ln(w₁/w₂): concave in prices where s₁s₂ ≥ 0.2 (shares near
// equal), not concave (or a share negative) where the prices differ much, so some rows pass and
// some fail.
BOOST_AUTO_TEST_CASE(regularity_row_agrees_with_prodregular)
{
    std::mt19937 engine(7);
    std::uniform_real_distribution<double> logOutput(0.0, 5.0), logPrice(-2.5, 2.5);
    std::normal_distribution<double> noise(0.0, 0.005);
    const int n = 40;
    Eigen::MatrixXd cost(n, 1), output(n, 1), prices(n, 2), rows(n, 3);
    for (int row = 0; row < n; ++row) {
        const double ly = logOutput(engine), l1 = logPrice(engine), l2 = logPrice(engine);
        const double logCost = 0.2 + 0.9 * ly + 0.05 * ly * ly + 0.5 * l1 + 0.5 * l2 + 0.5 * 0.2 * (l1 - l2) * (l1 - l2);
        cost(row, 0) = std::exp(logCost + noise(engine));
        output(row, 0) = std::exp(ly);
        prices(row, 0) = std::exp(l1);
        prices(row, 1) = std::exp(l2);
        rows.row(row) << output(row, 0), prices(row, 0), prices(row, 1);
    }
    isoquant::CostFitArguments arguments;
    arguments.cost = numberRange(cost, {"cost"});
    arguments.output = numberRange(output, {"washes"});
    arguments.prices = numberRange(prices, {"labour", "energy"});
    arguments.form = std::string("translog");
    const CellTable table = fittedTable(arguments);
    const CellTable perRow = isoquant::regularityAnyColumn(table, numberRange(rows, {"washes", "labour", "energy"}));
    std::size_t irregular = 0, first = 0;
    for (std::size_t row = 1; row < perRow.rows(); ++row)
        if (perRow.text(row, 0) != "regular" && irregular++ == 0) first = row + 1; // range row, header = 1
    BOOST_TEST_REQUIRE(irregular > 0u);
    BOOST_TEST_REQUIRE(irregular < static_cast<std::size_t>(n));
    BOOST_TEST(rowValue(table, "regularity") == static_cast<double>(irregular));
    for (std::size_t row = 0; row < table.rows(); ++row)
        if (table.isText(row, 0) && table.text(row, 0) == "regularity")
            BOOST_TEST(table.text(row, 2).rfind("first: row " + std::to_string(first) + " (", 0) == 0u);
}

BOOST_AUTO_TEST_SUITE_END()

BOOST_AUTO_TEST_SUITE(cost_incomplete_rows)

// With `incomplete rows` on, a row with a blank or a text cell in any range is left out: the fit
// equals the fit of the other rows (to the last bit: the same numbers in the same order), and the
// table says how many rows it left out.
BOOST_AUTO_TEST_CASE(incomplete_rows_are_left_out_and_counted)
{
    isoquant::CostFitArguments arguments = laundries({0, 1, 2});
    isoquant::CostFitArguments withGaps = arguments;
    withGaps.prices.set(5, 1, isoquant::Cell{});                  // data row 5: a blank price
    withGaps.shares.set(9, 0, isoquant::Cell(std::string("n/a"))); // data row 9: a text share
    withGaps.incompleteRows = 1.0; // TRUE in a cell
    auto without = [](const CellTable& range, std::initializer_list<std::size_t> rows) {
        CellTable kept(range.rows() - rows.size(), range.columns());
        for (std::size_t row = 0, to = 0; row < range.rows(); ++row) {
            if (std::find(rows.begin(), rows.end(), row) != rows.end()) continue;
            for (std::size_t column = 0; column < range.columns(); ++column) kept.set(to, column, range.at(row, column));
            ++to;
        }
        return kept;
    };
    isoquant::CostFitArguments kept = arguments;
    kept.cost = without(arguments.cost, {5, 9});
    kept.output = without(arguments.output, {5, 9});
    kept.prices = without(arguments.prices, {5, 9});
    kept.shares = without(arguments.shares, {5, 9});
    const CellTable gapped = fittedTable(withGaps), reference = fittedTable(kept);
    BOOST_TEST_REQUIRE(gapped.rows() == reference.rows() + 1);
    BOOST_TEST(rowValue(gapped, "incomplete rows dropped") == 2.0);
    BOOST_TEST(rowValue(gapped, "observations") == 58.0);
    for (const std::string label : {"constant", "output", "labour", "labour*energy", "log-likelihood", "R2"})
        BOOST_TEST(rowValue(gapped, label) == rowValue(reference, label), label);
    withGaps.incompleteRows = 0.0;
    BOOST_TEST(messageOf([&] { isoquant::costFitFromArguments(withGaps); }).rfind("input prices: row 6", 0) == 0);
}

BOOST_AUTO_TEST_SUITE_END()
