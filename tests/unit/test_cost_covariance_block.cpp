// PRODCOSTFIT's `covariance` TRUE: the block's shape and labels, PRODCOST reading it back, and the
// messages where it cannot serve (a shifted constant); a cost frontier's block (the likelihood's).
// The figures against python3-statsmodels are in test_cost_cross_check.cpp.
#include "isoquant/sheet/functions/bound_functions.hpp"
#include "isoquant/sheet/functions/cost_functions.hpp"
#include "isoquant/sheet/models/cost_model.hpp"
#include "isoquant/sheet/tables/cost_table.hpp"
#include "cell_tables.hpp"
#include "cost_test_data.hpp"
#include "input_error_message.hpp"
#include "reference_data.hpp"

#include <boost/test/unit_test.hpp>

#include <cmath>

using isoquant::CellTable;
using isoquant::testing::messageOf;

namespace {

CellTable oneCell(double value)
{
    CellTable cell(1, 1);
    cell.set(0, 0, value);
    return cell;
}

CellTable pricesRow(double first, double second, double third)
{
    CellTable row(1, 3);
    row.set(0, 0, first);
    row.set(0, 1, second);
    row.set(0, 2, third);
    return row;
}

} // namespace

BOOST_AUTO_TEST_SUITE(cost_covariance_block)

BOOST_AUTO_TEST_CASE(the_block_follows_the_parameter_rows)
{
    isoquant::CostFitArguments arguments = isoquant::testing::riceFarmCostArguments();
    arguments.form = std::string("translog");
    const isoquant::CostFit fit = isoquant::costFitFromArguments(arguments);
    const CellTable plain = isoquant::costFitTable(fit);
    const CellTable table = isoquant::costFitTableWithCovariance(fit, 1.0);
    const std::size_t p = 2 + 3 + 1 + 6 + 3; // constant, output, 3 prices, output*output, 6 pairs, 3 price*output
    BOOST_TEST(table.rows() == plain.rows() + 1 + p);
    BOOST_TEST(table.columns() == p + 1);
    BOOST_TEST(table.text(plain.rows(), 0) == "covariance");
    BOOST_TEST(table.text(plain.rows(), 1) == "classical");
    BOOST_TEST(table.number(plain.rows(), 2) == fit.summary.inference.degreesOfFreedom);
    const auto labels = isoquant::costParameterLabels(fit);
    for (std::size_t i = 0; i < p; ++i) {
        BOOST_TEST(table.text(plain.rows() + 1 + i, 0) == labels[i]);
        BOOST_TEST(table.text(i + 1, 0) == labels[i]); // the parameter rows, in the same order
        const double variance = table.number(plain.rows() + 1 + i, 1 + i);
        BOOST_TEST(std::fabs(std::sqrt(variance) - fit.summary.inference.standardErrors(
                                                       static_cast<Eigen::Index>(i))) <= 1e-12 * std::sqrt(variance));
    }
    const isoquant::CostModel model = isoquant::readCostModel(table);
    BOOST_TEST_REQUIRE(model.covariance.has_value());
    BOOST_TEST(model.covariance->matrix.rows() == static_cast<Eigen::Index>(p));
    // Read back, PRODCOST's value is unchanged and its bounds hold it.
    const isoquant::ModelTable withBlock(table);
    const auto figure = [&](const char* statistic) {
        return isoquant::costColumnWithBounds(withBlock, oneCell(5000.0), pricesRow(80.0, 75.0, 60.0),
                                              std::string("marginal"), std::string(statistic))
            .number(0, 0);
    };
    BOOST_TEST(figure("value") == isoquant::costColumn(isoquant::ModelTable(plain), oneCell(5000.0),
                                                       pricesRow(80.0, 75.0, 60.0), std::string("marginal"))
                                      .number(0, 0));
    BOOST_TEST(figure("lower bound") < figure("value"));
    BOOST_TEST(figure("upper bound") > figure("value"));
    BOOST_TEST(figure("std. error") > 0.0);
}

BOOST_AUTO_TEST_CASE(a_cost_frontier_block_is_the_likelihood_s)
{
    const isoquant::CostFitArguments arguments = isoquant::testing::depots(300, 41); // invented, of known inefficiency
    const isoquant::CostFit frontier = isoquant::costFitFromArguments(arguments);
    const CellTable plain = isoquant::costFitTable(frontier);
    const CellTable table = isoquant::costFitTableWithCovariance(frontier, 1.0);
    BOOST_TEST(table.rows() == plain.rows() + 1 + 4);
    BOOST_TEST(table.text(plain.rows(), 1) == "likelihood");
    BOOST_TEST(table.text(plain.rows(), 2) == "normal");
    const isoquant::CostModel model = isoquant::readCostModel(table);
    BOOST_TEST_REQUIRE(model.covariance.has_value());
    BOOST_TEST(std::isinf(model.covariance->degreesOfFreedom));
    // The elasticity's bounds are the table's own (normal, at its level): the row `cost elasticity`.
    const isoquant::ModelTable withBlock(table);
    CellTable twoPrices(1, 2);
    twoPrices.set(0, 0, 10.0);
    twoPrices.set(0, 1, 5.0);
    const double lower = isoquant::costColumnWithBounds(withBlock, oneCell(100.0), twoPrices,
                                                        std::string("cost elasticity"), std::string("lower bound"))
                             .number(0, 0);
    BOOST_TEST(std::fabs(lower - frontier.costElasticity.lowerBound) <= 1e-12 * std::fabs(lower));
}

BOOST_AUTO_TEST_CASE(where_the_block_cannot_serve_a_message_says_so)
{
    isoquant::CostFitArguments arguments = isoquant::testing::riceFarmCostPanelArguments();
    arguments.groups = {};
    arguments.trend = {};
    const isoquant::ModelTable shifted(
        isoquant::costFitTableWithCovariance(isoquant::costFitFromArguments(arguments), 1.0));
    BOOST_TEST(messageOf([&] {
                   isoquant::costColumnWithBounds(shifted, oneCell(5000.0), pricesRow(80.0, 75.0, 60.0),
                                                  std::string("total"), std::string("upper bound"));
               }) == "statistic: \"upper bound\" is not available when the model's constant is shifted (controls at "
                     "their means, effects or a trend): the covariance block does not cover that constant");
    // The elasticity does not use the constant: it has its bounds.
    const double lower = isoquant::costColumnWithBounds(shifted, oneCell(5000.0), pricesRow(80.0, 75.0, 60.0),
                                                        std::string("cost elasticity"), std::string("lower bound"))
                             .number(0, 0);
    BOOST_TEST(lower < isoquant::readCostModel(shifted.cells()).output);
}

BOOST_AUTO_TEST_SUITE_END()
