// `what` of PRODTFP, PRODSECOND, PRODMRTS, PRODBUDGET and PRODSUBSTITUTION, and `statistic` of
// PRODCOST (issue 20, bound_functions.hpp) on the Cobb & Douglas (1928) data (tests/data/README.md)
// with a covariance block: "value" is the plain function's answer; log-scale bounds are symmetric
// around the value in logs (lower·upper = value², exactly so up to rounding: 1e-12 relative) and
// linear ones around the value itself; the words a model cannot answer get a message naming "what"
// (PRODCOST: "statistic"). The figures themselves are checked against statsmodels and numpy in
// test_bounds_cross_check.cpp.
#include "isoquant/sheet/functions/bound_functions.hpp"
#include "isoquant/sheet/functions/cost_functions.hpp"
#include "isoquant/sheet/functions/decision_functions.hpp"
#include "isoquant/sheet/functions/growth_functions.hpp"
#include "isoquant/sheet/functions/production_functions.hpp"
#include "isoquant/sheet/tables/covariance_block.hpp"
#include "isoquant/sheet/tables/fit_table.hpp"
#include "cell_tables.hpp"
#include "input_error_message.hpp"
#include "reference_data.hpp"

#include <boost/test/unit_test.hpp>

#include <cmath>
#include <string>

using isoquant::testing::messageOf;

namespace {

isoquant::CellTable tableWithBlock()
{
    const auto fit = isoquant::fitFromArguments(isoquant::testing::cobbDouglas1928Arguments());
    return isoquant::fitTableWithCovariance(isoquant::fitTable(fit), fit, 1.0);
}

isoquant::CellTable typedModel()
{
    return isoquant::testing::typedRange(
        {{std::string("form"), std::string("cobb-douglas")}, {std::string("ln A"), 0.1}, {std::string("L"), 0.7},
         {std::string("C"), 0.3}});
}

// A header row and two bundles (L, C), invented.
isoquant::CellTable twoBundles()
{
    return isoquant::testing::typedRange(
        {{std::string("L"), std::string("C")}, {150.0, 200.0}, {250.0, 400.0}});
}

const std::string noBlock = "needs the model's covariance block; this model has none (a typed model, or a PRODFIT "
                            "table made without covariance TRUE)";

bool close(double actual, double expected) { return std::fabs(actual - expected) <= 1e-12 * std::fabs(expected); }

// Each data row (below the header) of the three columns: lower < value < upper, and on the log scale
// lower·upper = value², else lower + upper = 2·value.
void checkAround(const isoquant::CellTable& value, const isoquant::CellTable& lower, const isoquant::CellTable& upper,
                 bool logScale)
{
    BOOST_REQUIRE(value.rows() == lower.rows() && value.rows() == upper.rows());
    for (std::size_t row = 0; row < value.rows(); ++row) {
        if (!value.isNumber(row, 0)) continue;
        const double v = value.number(row, 0), l = lower.number(row, 0), u = upper.number(row, 0);
        BOOST_TEST_CONTEXT("row " << row)
        {
            BOOST_TEST(l < v);
            BOOST_TEST(v < u);
            BOOST_TEST((logScale ? close(l * u, v * v) : close(l + u, 2 * v)));
        }
    }
}

} // namespace

BOOST_AUTO_TEST_SUITE(derived_bounds)

BOOST_AUTO_TEST_CASE(tfp_bounds_on_the_log_scale)
{
    const auto table = tableWithBlock();
    isoquant::CellTable output(3, 1);
    output.set(0, 0, "P");
    output.set(1, 0, 170.0); // invented
    output.set(2, 0, 260.0);
    const auto bundles = twoBundles();
    const auto plain = isoquant::productivityColumn(table, output, bundles);
    const auto at = [&](const char* word) {
        return isoquant::productivityColumnWithBounds(table, output, bundles, {}, std::string(word));
    };
    BOOST_TEST((at("value") == plain));
    BOOST_TEST(at("std. error").text(0, 0) == "std. error of TFP");
    checkAround(plain, at("lower bound"), at("upper bound"), true);
    BOOST_TEST(messageOf([&] {
                   isoquant::productivityColumnWithBounds(typedModel(), output, bundles, {}, std::string("std. error"));
               }) == "what: \"std. error\" " + noBlock);
}

// With a trend, PRODTFP's periods compare each row with s + λ·(t − t_last), λ the block's last row:
// "value" answers as before, the bounds lie around it, and a row of the latest period (where λ drops
// out) has the standard error of PRODTFP without periods (the figures against the dummy-variable
// regression: test_effects_bounds_cross_check.cpp).
BOOST_AUTO_TEST_CASE(tfp_with_periods_of_a_trend_is_answered)
{
    auto arguments = isoquant::testing::cobbDouglas1928Arguments();
    isoquant::CellTable years(24, 1);
    for (std::size_t row = 0; row < 24; ++row) years.set(row, 0, 1899.0 + static_cast<double>(row));
    arguments.trend = years;
    const auto fit = isoquant::fitFromArguments(arguments);
    const auto table = isoquant::fitTableWithCovariance(isoquant::fitTable(fit), fit, 1.0);
    isoquant::CellTable output(2, 1), bundles(2, 2), periods(2, 1);
    for (std::size_t row = 0; row < 2; ++row) {
        output.set(row, 0, 170.0 + 10.0 * static_cast<double>(row)); // invented
        bundles.set(row, 0, 150.0);
        bundles.set(row, 1, 200.0);
        periods.set(row, 0, row == 0 ? 1910.0 : 1922.0); // 1922 the latest period of the fit
    }
    BOOST_TEST((isoquant::productivityColumnWithBounds(table, output, bundles, periods, std::string("value")) ==
                isoquant::productivityColumn(table, output, bundles, periods)));
    const auto values = isoquant::productivityColumn(table, output, bundles, periods);
    const auto lower = isoquant::productivityColumnWithBounds(table, output, bundles, periods, std::string("lower bound"));
    const auto upper = isoquant::productivityColumnWithBounds(table, output, bundles, periods, std::string("upper bound"));
    for (std::size_t row = 0; row < 2; ++row) {
        BOOST_TEST(lower.number(row, 0) < values.number(row, 0));
        BOOST_TEST(upper.number(row, 0) > values.number(row, 0));
    }
    const auto errors = isoquant::productivityColumnWithBounds(table, output, bundles, periods, std::string("std. error"));
    const auto withoutPeriods = isoquant::productivityColumnWithBounds(table, output, bundles, {}, std::string("std. error"));
    BOOST_TEST(std::fabs(errors.number(1, 0) - withoutPeriods.number(1, 0)) <= 1e-12 * withoutPeriods.number(1, 0));
    BOOST_TEST(errors.number(0, 0) != withoutPeriods.number(0, 0));
}

BOOST_AUTO_TEST_CASE(second_partials_bounds_around_the_value)
{
    const auto table = tableWithBlock();
    const auto bundles = twoBundles();
    const isoquant::Cell labour = std::string("L"), capital = std::string("C");
    for (const isoquant::Cell& other : {isoquant::Cell{}, capital}) {
        const auto plain = isoquant::secondPartialColumn(table, bundles, labour, other);
        const auto at = [&](const char* word) {
            return isoquant::secondPartialColumnWithBounds(table, bundles, labour, other, std::string(word));
        };
        BOOST_TEST((at("value") == plain));
        BOOST_TEST(at("upper bound").text(0, 0) == "upper bound of " + plain.text(0, 0));
        checkAround(plain, at("lower bound"), at("upper bound"), false);
    }
    BOOST_TEST(messageOf([&] {
                   isoquant::secondPartialColumnWithBounds(typedModel(), bundles, labour, capital,
                                                           std::string("lower bound"));
               }) == "what: \"lower bound\" " + noBlock);
}

BOOST_AUTO_TEST_CASE(rate_of_substitution_bounds_and_an_undefined_rate)
{
    auto table = tableWithBlock();
    const auto bundles = twoBundles();
    const isoquant::Cell labour = std::string("L"), capital = std::string("C");
    const auto plain = isoquant::technicalRateColumn(table, bundles, labour, capital);
    const auto at = [&](const char* word) {
        return isoquant::technicalRateColumnWithBounds(table, bundles, labour, capital, std::string(word));
    };
    BOOST_TEST((at("value") == plain));
    checkAround(plain, at("lower bound"), at("upper bound"), true); // both exponents positive
    // The capital exponent's cell (row 4, column 2) set to 0, and returns to scale with it: the
    // marginal product of capital is 0, the rate undefined; the plain function's text stays.
    BOOST_REQUIRE(table.text(3, 0) == "C");
    table.set(3, 1, 0.0);
    for (std::size_t row = 0; row < table.rows(); ++row)
        if (table.isText(row, 0) && table.text(row, 0) == "returns to scale") table.set(row, 1, table.number(2, 1));
    const auto undefined = isoquant::technicalRateColumnWithBounds(table, bundles, labour, capital,
                                                                   std::string("std. error"));
    BOOST_TEST(undefined.text(1, 0) == isoquant::technicalRateColumn(table, bundles, labour, capital).text(1, 0));
    BOOST_TEST(messageOf([&] {
                   isoquant::technicalRateColumnWithBounds(typedModel(), bundles, labour, capital,
                                                           std::string("std. error"));
               }) == "what: \"std. error\" " + noBlock);
}

BOOST_AUTO_TEST_CASE(budget_plan_bounds_on_the_log_scale)
{
    const auto table = tableWithBlock();
    isoquant::CellTable prices(1, 2);
    prices.set(0, 0, 2.0); // invented
    prices.set(0, 1, 3.0);
    const auto plain = isoquant::budgetRow(table, 1000.0, prices);
    const auto at = [&](const char* word) {
        return isoquant::budgetRowWithBounds(table, 1000.0, prices, std::string(word));
    };
    BOOST_TEST((at("value") == plain));
    const auto lower = at("lower bound"), upper = at("upper bound");
    BOOST_REQUIRE(plain.columns() == 3u);
    for (std::size_t cell = 0; cell < 3; ++cell) {
        BOOST_TEST_CONTEXT("cell " << cell)
        {
            BOOST_TEST(lower.number(0, cell) < plain.number(0, cell));
            BOOST_TEST(plain.number(0, cell) < upper.number(0, cell));
            const double value = plain.number(0, cell);
            BOOST_TEST(close(lower.number(0, cell) * upper.number(0, cell), value * value));
        }
    }
    BOOST_TEST(messageOf([&] {
                   isoquant::budgetRowWithBounds(typedModel(), 1000.0, prices, std::string("upper bound"));
               }) == "what: \"upper bound\" " + noBlock);
}

// The cobb-douglas form fixes every elasticity of substitution at 1: no sampling error under it.
BOOST_AUTO_TEST_CASE(substitution_elasticity_of_cobb_douglas_has_no_sampling_error)
{
    const auto table = tableWithBlock();
    const auto bundles = twoBundles();
    const isoquant::Cell labour = std::string("L"), capital = std::string("C");
    for (const char* kind : {"direct", "allen", "morishima"}) {
        const isoquant::Cell chosen = std::string(kind);
        const auto plain = isoquant::substitutionColumn(table, bundles, labour, capital, chosen);
        const auto at = [&](const char* word) {
            return isoquant::substitutionColumnWithBounds(table, bundles, labour, capital, chosen, std::string(word));
        };
        BOOST_TEST_CONTEXT(kind)
        {
            BOOST_TEST((at("value") == plain));
            BOOST_TEST(at("std. error").number(1, 0) == 0.0);
            BOOST_TEST(at("lower bound").number(2, 0) == plain.number(2, 0));
            BOOST_TEST(at("upper bound").number(2, 0) == plain.number(2, 0));
        }
    }
    BOOST_TEST(messageOf([&] {
                   isoquant::substitutionColumnWithBounds(typedModel(), bundles, labour, capital, {},
                                                          std::string("std. error"));
               }) == "what: \"std. error\" " + noBlock);
}

// PRODCOST over a column of two outputs (a header, invented outputs and prices): every figure's
// "value" is the plain function's; total, marginal and average cost have log-scale bounds, the cost
// elasticity and returns to scale linear ones, and the returns to scale the std. error PRODSCALE gives ν.
BOOST_AUTO_TEST_CASE(cost_figures_bounds_by_statistic)
{
    const auto table = tableWithBlock();
    const auto outputs = isoquant::testing::typedRange({{std::string("P")}, {120.0}, {300.0}});
    const auto prices = isoquant::testing::typedRange({{2.0, 3.0}});
    for (const char* figure : {"total", "marginal", "average", "cost elasticity", "returns to scale"}) {
        const isoquant::Cell what = std::string(figure);
        const auto plain = isoquant::costColumn(table, outputs, prices, what);
        const auto at = [&](const char* word) {
            return isoquant::costColumnWithBounds(table, outputs, prices, what, std::string(word));
        };
        BOOST_TEST_CONTEXT(figure)
        {
            BOOST_TEST((at("value") == plain));
            BOOST_TEST((isoquant::costColumnWithBounds(table, outputs, prices, what, {}) == plain));
            const bool logScale = std::string(figure) == "total" || std::string(figure) == "marginal" ||
                                  std::string(figure) == "average";
            checkAround(plain, at("lower bound"), at("upper bound"), logScale);
        }
    }
    const auto scaleError = isoquant::scaleColumnWithBounds(table, twoBundles(), std::string("std. error"));
    const auto costScaleError = isoquant::costColumnWithBounds(table, outputs, prices, std::string("returns to scale"),
                                                               std::string("std. error"));
    BOOST_TEST(close(costScaleError.number(0, 0), scaleError.number(1, 0)));
}

// Munnell's (1990) state panel with its control (tests/data): the evaluators' ln A is shifted to the
// control's mean, and the block's last row "ln A at control means" carries it. Total, marginal and
// average cost are answered on the log scale (lower·upper = value², 1e-12 relative), and total cost's
// relative std. error is average cost's (C and C/y share the gradient of ln C); the cost elasticity
// and returns to scale do not involve ln A (ν's std. error as PRODSCALE's).
BOOST_AUTO_TEST_CASE(cost_with_a_shifted_ln_a)
{
    const auto fit = isoquant::fitFromArguments(isoquant::testing::statePanelArguments());
    const auto table = isoquant::fitTableWithCovariance(isoquant::fitTable(fit), fit, 1.0);
    const auto prices = isoquant::testing::typedRange({{2.0, 3.0, 5.0}}); // invented
    const auto target = isoquant::singleCell(150.0);
    auto figure = [&](const char* what, const char* statistic) {
        return isoquant::costColumnWithBounds(table, target, prices, std::string(what), std::string(statistic))
            .number(0, 0);
    };
    for (const char* cost : {"total", "marginal", "average"}) {
        const double value = figure(cost, "value"), lower = figure(cost, "lower bound"),
                     upper = figure(cost, "upper bound");
        BOOST_TEST((0 < lower && lower < value && value < upper), cost);
        BOOST_TEST(close(lower * upper, value * value), cost);
    }
    BOOST_TEST(close(figure("total", "std. error") / figure("total", "value"),
                     figure("average", "std. error") / figure("average", "value")));
    const auto scaleError = isoquant::scaleColumnWithBounds(table, {}, std::string("std. error"));
    BOOST_TEST(close(figure("returns to scale", "std. error"), scaleError.number(0, 0)));
}

BOOST_AUTO_TEST_CASE(cost_statistic_messages_name_statistic)
{
    const auto prices = isoquant::testing::typedRange({{2.0, 3.0}});
    const isoquant::Cell total = std::string("total");
    BOOST_TEST(messageOf([&] {
                   isoquant::costColumnWithBounds(typedModel(), isoquant::testing::typedRange({{100.0}}), prices,
                                                  total, std::string("lower bound"));
               }) == "statistic: \"lower bound\" " + noBlock);
    BOOST_TEST(messageOf([&] {
                   isoquant::costColumnWithBounds(tableWithBlock(), isoquant::testing::typedRange({{100.0}}), prices,
                                                  total, std::string("bounds"));
               }) == "statistic: give \"value\", \"std. error\", \"lower bound\" or \"upper bound\"");
    // A typed cost function (invented coefficients) has no covariance block.
    const auto costModel = isoquant::testing::typedRange(
        {{std::string("form"), std::string("cobb-douglas cost")}, {std::string("constant"), 0.5},
         {std::string("output"), 0.9}, {std::string("L"), 0.6}, {std::string("C"), 0.4}});
    BOOST_TEST(messageOf([&] {
                   isoquant::costColumnWithBounds(costModel, isoquant::testing::typedRange({{100.0}}), prices,
                                                  total, std::string("std. error"));
               }) == "statistic: \"std. error\" needs the model's covariance block; this cost model has none (typed "
                     "rows, or a PRODCOSTFIT table made without covariance TRUE)");
}

BOOST_AUTO_TEST_SUITE_END()
