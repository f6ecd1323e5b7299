// PRODCOSTFIT's `covariance` TRUE: the block's shape and labels, its row for a constant shifted by
// controls, effects or a trend, PRODCOST reading it back, and the message where it cannot serve (a
// typed block without the shifted row); a cost frontier's block.
// The figures against python3-statsmodels are in test_cost_cross_check.cpp.
#include "isoquant/sheet/functions/bound_functions.hpp"
#include "isoquant/sheet/functions/cost_decisions.hpp"
#include "isoquant/sheet/functions/cost_functions.hpp"
#include "isoquant/sheet/models/cost_model.hpp"
#include "isoquant/sheet/tables/cost_table.hpp"
#include "cell_tables.hpp"
#include "cost_test_data.hpp"
#include "input_error_message.hpp"
#include "reference_data.hpp"

#include <boost/test/unit_test.hpp>

#include <cmath>

using isoquant::Cell;
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

BOOST_AUTO_TEST_CASE(a_shifted_constant_is_the_block_s_last_row)
{
    // Controls alone: "constant at control means"; a trend too: "constant for predictions"
    // (cost_table.hpp). s = constant + c·mean(size) (+ λ·(6 − 1)), so Cov(θ, s) = V·a with
    // a = (1, 0 …, mean(size)) on θ; the trend's share is checked against statsmodels in
    // test_cost_scale_cross_check.cpp.
    isoquant::CostFitArguments arguments = isoquant::testing::riceFarmCostPanelArguments();
    arguments.groups = {};
    arguments.trend = {};
    const isoquant::CostFit fit = isoquant::costFitFromArguments(arguments);
    const CellTable plain = isoquant::costFitTable(fit);
    const CellTable table = isoquant::costFitTableWithCovariance(fit, 1.0);
    const std::size_t p = 2 + 3 + 1; // constant, output, 3 prices, size (control)
    BOOST_TEST(table.rows() == plain.rows() + 1 + p + 1);
    BOOST_TEST(table.text(plain.rows() + 1 + p, 0) == "constant at control means");
    const Eigen::MatrixXd& v = fit.summary.inference.covariance;
    Eigen::VectorXd weights = Eigen::VectorXd::Zero(static_cast<Eigen::Index>(p));
    weights(0) = 1.0;
    double sizeSum = 0;
    for (std::size_t row = 1; row < arguments.controls.rows(); ++row) sizeSum += arguments.controls.number(row, 0);
    weights(5) = sizeSum / static_cast<double>(arguments.controls.rows() - 1); // under the header "size"
    const double variance = weights.dot(v * weights);
    const double read = table.number(plain.rows() + 1 + p, 1 + p);
    BOOST_TEST(std::fabs(read - variance) <= 1e-10 * variance);
    for (std::size_t i = 0; i < p; ++i) {
        const double covariance = (v * weights)(static_cast<Eigen::Index>(i));
        BOOST_TEST(std::fabs(table.number(plain.rows() + 1 + p, 1 + i) - covariance) <= 1e-10 * std::sqrt(variance * v(i, i)));
    }
    const isoquant::CostModel model = isoquant::readCostModel(table);
    BOOST_TEST(model.covarianceCoversShiftedConstant);
    // The evaluators' constant is the table's row, not the block's row of the same label.
    BOOST_TEST(model.constant == isoquant::readCostModel(plain).constant);
    // PRODCOST's total cost now has bounds around its value.
    const isoquant::ModelTable withBlock(table);
    const auto figure = [&](const char* statistic) {
        return isoquant::costColumnWithBounds(withBlock, oneCell(5000.0), pricesRow(80.0, 75.0, 60.0),
                                              std::string("total"), std::string(statistic))
            .number(0, 0);
    };
    BOOST_TEST(figure("lower bound") < figure("value"));
    BOOST_TEST(figure("upper bound") > figure("value"));

    arguments.trend = isoquant::testing::riceFarmCostPanelArguments().trend;
    const CellTable withTrend = isoquant::costFitTableWithCovariance(isoquant::costFitFromArguments(arguments), 1.0);
    BOOST_TEST(withTrend.text(withTrend.rows() - 1, 0) == "constant for predictions");
}

BOOST_AUTO_TEST_CASE(a_cost_frontier_with_a_control_has_the_shifted_row_too)
{
    // The depots with an invented control outside the cost (a weekday share): s = constant + c·z̄ on
    // the frontier's own θ, so Var(s) = aᵀV a, a = (1, 0, 0, 0, z̄) (no trend: a frontier takes none).
    isoquant::CostFitArguments arguments = isoquant::testing::depots(300, 41);
    Eigen::MatrixXd weekdays(300, 1);
    for (Eigen::Index row = 0; row < 300; ++row) weekdays(row, 0) = static_cast<double>((row * 7) % 11) / 10.0;
    arguments.controls = isoquant::testing::numberRange(weekdays, {"weekday share"});
    const isoquant::CostFit frontier = isoquant::costFitFromArguments(arguments);
    const CellTable table = isoquant::costFitTableWithCovariance(frontier, 1.0);
    BOOST_TEST(table.text(table.rows() - 1, 0) == "constant at control means");
    Eigen::VectorXd weights = Eigen::VectorXd::Zero(5);
    weights(0) = 1.0;
    weights(4) = weekdays.mean();
    const double variance = weights.dot(frontier.summary.inference.covariance * weights);
    BOOST_TEST(std::fabs(table.number(table.rows() - 1, 6) - variance) <= 1e-10 * variance);
    const isoquant::ModelTable withBlock(table);
    CellTable twoPrices(1, 2);
    twoPrices.set(0, 0, 10.0);
    twoPrices.set(0, 1, 5.0);
    const double se = isoquant::costColumnWithBounds(withBlock, oneCell(100.0), twoPrices, std::string("total"),
                                                     std::string("std. error"))
                          .number(0, 0);
    BOOST_TEST(se > 0.0);
    BOOST_TEST(std::isfinite(se));
}

BOOST_AUTO_TEST_CASE(under_effects_the_block_ends_with_the_constant_for_predictions)
{
    isoquant::CostFitArguments arguments = isoquant::testing::riceFarmCostPanelArguments();
    arguments.effects = std::string("fixed");
    arguments.trend = {};
    const isoquant::CostFit fit = isoquant::costFitFromArguments(arguments);
    const CellTable table = isoquant::costFitTableWithCovariance(fit, 1.0);
    BOOST_TEST(table.text(table.rows() - 1, 0) == "constant for predictions");
    // The plain mean of the group effects (the `constant` row) has no covariance; the row-weighted
    // one the evaluators use has a variance (its figures: test_cost_effects_bounds_cross_check.cpp).
    BOOST_TEST(!table.isNumber(table.rows() - 1, 1));
    BOOST_TEST(table.number(table.rows() - 1, table.columns() - 1) > 0.0); // q = 7 parameters: 8 columns
    const isoquant::ModelTable shifted(table);
    const auto bound = [&](const char* what, const char* statistic) {
        return isoquant::costColumnWithBounds(shifted, oneCell(5000.0), pricesRow(80.0, 75.0, 60.0),
                                              std::string(what), std::string(statistic))
            .number(0, 0);
    };
    const double total = isoquant::costColumn(shifted, oneCell(5000.0), pricesRow(80.0, 75.0, 60.0),
                                              std::string("total"))
                             .number(0, 0);
    BOOST_TEST(bound("total", "lower bound") < total);
    BOOST_TEST(bound("total", "upper bound") > total);
    BOOST_TEST(bound("marginal", "std. error") > 0.0);
    BOOST_TEST(bound("cost elasticity", "lower bound") < isoquant::readCostModel(shifted.cells()).output);
}

BOOST_AUTO_TEST_CASE(a_typed_block_without_the_shifted_constant_s_row_is_refused)
{
    // A typed model with "constant at control means" needs that row last in its block.
    const Cell none;
    const CellTable typed = isoquant::testing::typedRange(
        {{"form", "cobb-douglas cost", none, none, none, none},
         {"constant", 1.0, none, none, none, none},
         {"output", 0.8, none, none, none, none},
         {"labour", 0.6, none, none, none, none},
         {"capital", 0.4, none, none, none, none},
         {"size (control)", 0.1, none, none, none, none},
         {none, none, none, none, none, none}, // the parameter rows end here, as in a table
         {"constant at control means", 1.2, none, none, none, none},
         {"covariance", "classical", 50.0, 0.95, none, none},
         {"constant", 0.01, 0.0, 0.0, 0.0, 0.0},
         {"output", 0.0, 0.01, 0.0, 0.0, 0.0},
         {"labour", 0.0, 0.0, 0.01, 0.0, 0.0},
         {"capital", 0.0, 0.0, 0.0, 0.01, 0.0},
         {"size (control)", 0.0, 0.0, 0.0, 0.0, 0.01}});
    BOOST_TEST(messageOf([&] { isoquant::readCostModel(typed); }) ==
               "model: row 9: the covariance block has 5 rows; it needs one row per parameter (6) and 6 numbers in "
               "each; with controls, effects or a trend its last row is 'constant at control means', the "
               "constant the evaluators use");
}

// PRODEFFICIENTSCALE's `what`: a message naming `what` where there is no covariance (a typed cost
// model, a typed production model), the value route's sentence where there is no efficient scale, and
// bounds under effects too (ln y* does not involve the constant).
BOOST_AUTO_TEST_CASE(efficient_scale_words_answer_or_say_why_not)
{
    const CellTable prices = pricesRow(80.0, 75.0, 60.0);
    isoquant::CostFitArguments arguments = isoquant::testing::riceFarmCostArguments();
    arguments.form = std::string("translog");
    const isoquant::ModelTable plain(isoquant::costFitTable(isoquant::costFitFromArguments(arguments)));
    BOOST_TEST(messageOf([&] { isoquant::efficientScaleCell(plain, prices, std::string("std. error")); }) ==
               "what: \"std. error\" needs the model's covariance block; this cost model has none (typed rows, or a "
               "PRODCOSTFIT table made without covariance TRUE)");
    BOOST_TEST(messageOf([&] { isoquant::efficientScaleCell(plain, prices, std::string("median")); }) ==
               "what: give \"value\", \"std. error\", \"lower bound\" or \"upper bound\"");
    const isoquant::ModelTable production(isoquant::testing::typedRange(
        {{"form", "cobb-douglas"}, {"ln A", 0.5}, {"labour", 0.7}, {"capital", 0.2}}));
    BOOST_TEST(messageOf([&] {
                   isoquant::efficientScaleCell(production, pricesRow(1.0, 2.0, 3.0), std::string("lower bound"));
               }) == "what: \"lower bound\" needs the model's covariance block; this model has none (a typed model, "
                     "or a PRODFIT table made without covariance TRUE)");
    arguments.form = std::string("cobb-douglas");
    const isoquant::ModelTable cobbDouglas(
        isoquant::costFitTableWithCovariance(isoquant::costFitFromArguments(arguments), 1.0));
    BOOST_TEST(isoquant::efficientScaleCell(cobbDouglas, prices, std::string("upper bound")).text(0, 0) ==
               isoquant::efficientScaleCell(cobbDouglas, prices).text(0, 0));

    arguments = isoquant::testing::riceFarmCostPanelArguments();
    arguments.form = std::string("translog");
    arguments.effects = std::string("fixed");
    arguments.controls = {};
    arguments.trend = {};
    const isoquant::ModelTable effects(
        isoquant::costFitTableWithCovariance(isoquant::costFitFromArguments(arguments), 1.0));
    const CellTable value = isoquant::efficientScaleCell(effects, prices);
    BOOST_TEST_REQUIRE(value.isNumber(0, 0));
    const double lower = isoquant::efficientScaleCell(effects, prices, std::string("lower bound")).number(0, 0);
    const double upper = isoquant::efficientScaleCell(effects, prices, std::string("upper bound")).number(0, 0);
    BOOST_TEST(lower > 0.0);
    BOOST_TEST(lower < value.number(0, 0));
    BOOST_TEST(upper > value.number(0, 0));
    // Log-scale bounds: the value is their geometric mean.
    BOOST_TEST(std::fabs(std::sqrt(lower * upper) - value.number(0, 0)) <= 1e-12 * value.number(0, 0));
}

BOOST_AUTO_TEST_SUITE_END()
