// PRODCOSTFIT and PRODCOST over a cost model with bad input: each message names the argument and,
// where there is one, the row (counted from the top of the range, header included). Invented data.
#include "isoquant/sheet/functions/production_functions.hpp"
#include "isoquant/sheet/functions/cost_functions.hpp"
#include "cell_tables.hpp"
#include "input_error_message.hpp"

#include <boost/test/unit_test.hpp>

using isoquant::CellTable;
using isoquant::testing::messageOf;
using isoquant::testing::numberRange;
using isoquant::testing::typedRange;

namespace {

// Six laundries: cost, washes, and the prices of labour and energy (invented figures).
isoquant::CostFitArguments sixLaundries()
{
    Eigen::MatrixXd cost(6, 1), output(6, 1), prices(6, 2);
    cost << 410, 655, 300, 980, 520, 760;
    output << 1200, 2100, 800, 3500, 1500, 2600;
    prices << 14, 0.31, 15, 0.29, 13, 0.35, 16, 0.27, 14.5, 0.33, 15.5, 0.30;
    isoquant::CostFitArguments arguments;
    arguments.cost = numberRange(cost, {"cost"});
    arguments.output = numberRange(output, {"washes"});
    arguments.prices = numberRange(prices, {"labour", "energy"});
    return arguments;
}

std::string fitMessage(const isoquant::CostFitArguments& arguments)
{
    return messageOf([&] { isoquant::costFitFromArguments(arguments); });
}

CellTable withNumber(CellTable range, std::size_t row, std::size_t column, double value)
{
    range.set(row, column, value);
    return range;
}

} // namespace

BOOST_AUTO_TEST_SUITE(cost_bad_input)

BOOST_AUTO_TEST_CASE(non_positive_values_name_the_argument_and_row)
{
    auto arguments = sixLaundries();
    arguments.cost = withNumber(arguments.cost, 3, 0, 0.0);
    BOOST_TEST(fitMessage(arguments) == "cost: row 4 is 0; logs need positive values");
    arguments = sixLaundries();
    arguments.output = withNumber(arguments.output, 2, 0, -5.0);
    BOOST_TEST(fitMessage(arguments) == "output: row 3 is -5; logs need positive values");
    arguments = sixLaundries();
    arguments.prices = withNumber(arguments.prices, 6, 1, 0.0);
    BOOST_TEST(fitMessage(arguments) == "input prices: row 7, column 2 is 0; logs need positive values");
}

BOOST_AUTO_TEST_CASE(shapes_and_options_are_checked)
{
    auto arguments = sixLaundries();
    arguments.output = numberRange(Eigen::MatrixXd::Constant(5, 1, 3.0), {"washes"});
    BOOST_TEST(fitMessage(arguments) == "output: has 5 rows of data but cost has 6 rows");
    arguments = sixLaundries();
    arguments.prices = numberRange(Eigen::MatrixXd::Constant(7, 2, 3.0), {"labour", "energy"});
    BOOST_TEST(fitMessage(arguments) == "input prices: has 7 rows of data but cost has 6 rows");
    arguments = sixLaundries();
    arguments.form = std::string("translog"); // 1 + 1 + 1 + 1 + 1 + 1 = 6 parameters for 2 prices
    BOOST_TEST(fitMessage(arguments) ==
               "too few rows: cost, output and input prices have 6 rows of data for 6 parameters to estimate; need at least 7");
    arguments = sixLaundries(); // row 5 alone has another price ratio: its own dummy, so leverage 1
    arguments.prices = numberRange((Eigen::MatrixXd(6, 2) << 14, 0.3, 14, 0.3, 14, 0.3, 16, 0.3, 14, 0.3, 14, 0.3)
                                       .finished(),
                                   {"labour", "energy"});
    arguments.errors = std::string("hc3");
    BOOST_TEST(fitMessage(arguments) ==
               "errors: row 5 has leverage 1 (the fit passes through it exactly); hc3 is undefined here — use hc1");
    arguments = sixLaundries();
    arguments.form = std::string("ces");
    BOOST_TEST(fitMessage(arguments) == "form: 'ces' is not a cost form; use \"cobb-douglas\" or \"translog\"");
    arguments = sixLaundries();
    arguments.errors = std::string("cluster");
    BOOST_TEST(fitMessage(arguments) ==
               "errors: \"cluster\" needs the groups argument, a column naming each row's plant or firm");
    arguments = sixLaundries();
    arguments.controls = numberRange(Eigen::MatrixXd::Constant(6, 1, 1.0));
    BOOST_TEST(fitMessage(arguments) ==
               "controls: control 'control 1' does not vary, so it cannot be told apart from the constant");
    // A price equal to the last one in every row: its normalised log is 0 in every row.
    arguments = sixLaundries();
    for (std::size_t row = 1; row < arguments.prices.rows(); ++row)
        arguments.prices.set(row, 0, arguments.prices.number(row, 1));
    BOOST_TEST(fitMessage(arguments) ==
               "input prices: ln(labour/energy) does not vary, so it cannot be told apart from the constant");
    arguments = sixLaundries();
    arguments.controls = numberRange(Eigen::MatrixXd::Zero(6, 1));
    BOOST_TEST(fitMessage(arguments) == "controls: control 'control 1' does not vary (numbers below 2.2e-308 count "
                                        "as 0), so it cannot be told apart from the constant");
    arguments = sixLaundries();
    arguments.shares = numberRange(Eigen::MatrixXd::Constant(6, 2, 0.5));
    BOOST_TEST(fitMessage(arguments) == "shares: a share equation fits exactly (or two equations' errors move "
                                        "together exactly), so the system cannot weigh them; fit without shares");
    arguments = sixLaundries();
    arguments.prices = numberRange(Eigen::MatrixXd::Constant(6, 2, 3.0), {"labour", "output"});
    BOOST_TEST(fitMessage(arguments) == "input prices: column 2 is labelled 'output'; the cost table uses \"constant\", "
                                        "\"output\", \"form\" and \"*\" itself, so rename it");
}

BOOST_AUTO_TEST_CASE(cost_models_and_their_arguments_are_checked)
{
    const CellTable noOutput = typedRange({{std::string("form"), std::string("cobb-douglas cost")},
                                           {std::string("constant"), 1.0},
                                           {std::string("labour"), 1.0}});
    const CellTable one = numberRange(Eigen::MatrixXd::Constant(1, 1, 100.0));
    const CellTable price = numberRange(Eigen::MatrixXd::Constant(1, 1, 14.0));
    BOOST_TEST(messageOf([&] { isoquant::costModelColumn(noOutput, one, price, {}); }) ==
               "model: has no \"output\" row; a cost model needs \"constant\", \"output\" and one row per input price");
    const CellTable repeated = typedRange({{std::string("form"), std::string("cobb-douglas cost")},
                                           {std::string("constant"), 1.0},
                                           {std::string("output"), 0.8},
                                           {std::string("labour"), 0.5},
                                           {std::string("Labour"), 0.5}});
    BOOST_TEST(messageOf([&] { isoquant::costModelColumn(repeated, one, price, {}); }) ==
               "model: row 5 ('Labour') repeats a price row's label; give each input one row");
    const CellTable model = typedRange({{std::string("form"), std::string("cobb-douglas cost")},
                                        {std::string("constant"), 1.0},
                                        {std::string("output"), 0.8},
                                        {std::string("labour"), 0.6},
                                        {std::string("energy"), 0.4}});
    // A cost model where a production model is needed says so (PRODOUTPUT, PRODLEASTCOST, …).
    BOOST_TEST(messageOf([&] { isoquant::outputColumn(model, numberRange(Eigen::RowVector2d(3.0, 4.0))); }) ==
               "model: is a cost model (a PRODCOSTFIT table or form \"... cost\"); this function needs a production "
               "model, a PRODFIT table or a typed one (PRODCOST takes both)");
    Eigen::MatrixXd outputs(3, 1), prices(2, 2);
    outputs << 100, 0, 300;
    prices << 14, 0.3, 15, 0.3;
    BOOST_TEST(messageOf([&] { isoquant::costModelColumn(model, numberRange(outputs), numberRange(prices.topRows(1)), {}); }) ==
               "target output: row 2 is 0; logs need positive values");
    outputs(1, 0) = 200;
    BOOST_TEST(messageOf([&] { isoquant::costModelColumn(model, numberRange(outputs), numberRange(prices), {}); }) ==
               "input prices: has 2 rows of data but target output has 3 rows; give one row of prices per output, or "
               "one row for all");
    prices(1, 1) = -0.3;
    BOOST_TEST(messageOf([&] {
                   isoquant::costModelColumn(model, numberRange(outputs.topRows(2)), numberRange(prices), {});
               }) == "input prices: row 2, column 2 is -0.3; logs need positive values");
}

BOOST_AUTO_TEST_SUITE_END()
