// Values at the edges of the doubles and typed models that an adversarial run in Calc found
// mishandled: subnormal data (below 2.2e-308) in fits and plans, ln A = 1000 and A = 1e-320,
// translog isoquants whose level is reached only away from the old search's start, and typed
// models with a repeated row. Data: the Cobb & Douglas (1928) ranges (tests/data) with values moved
// to the edge; the typed models are invented.
#include "isoquant/sheet/functions/production_functions.hpp"
#include "isoquant/sheet/functions/decision_functions.hpp"
#include "isoquant/math/numerics/exact_elementwise.hpp"
#include "isoquant/math/fits/production_fit.hpp"
#include "cell_tables.hpp"
#include "input_error_message.hpp"
#include "reference_data.hpp"
#include "relative_error.hpp"

#include <boost/test/unit_test.hpp>

#include <cmath>
#include <cstdio>
#include <limits>

using isoquant::Cell;
using isoquant::CellTable;
using isoquant::testing::closeTo;
using isoquant::testing::messageOf;
using isoquant::testing::numberRange;
using isoquant::testing::typedRange;

namespace {

Cell text(const char* value) { return std::string(value); }

// The numbers of a range under its header row, as a matrix.
Eigen::MatrixXd valuesOf(const CellTable& range)
{
    Eigen::MatrixXd values(range.rows() - 1, range.columns());
    for (std::size_t row = 1; row < range.rows(); ++row)
        for (std::size_t column = 0; column < range.columns(); ++column)
            values(static_cast<Eigen::Index>(row - 1), static_cast<Eigen::Index>(column)) = range.number(row, column);
    return values;
}

// Least squares of ln Y on a constant and ln xᵢ, the logs taken one by one with std::log (exact on
// subnormals) and solved by Eigen's column-pivoting QR: an independent route to the same estimates.
Eigen::VectorXd logLinearLeastSquares(const Eigen::VectorXd& output, const Eigen::MatrixXd& inputs)
{
    Eigen::MatrixXd design(inputs.rows(), inputs.cols() + 1);
    design.col(0).setOnes();
    for (Eigen::Index row = 0; row < inputs.rows(); ++row)
        for (Eigen::Index column = 0; column < inputs.cols(); ++column)
            design(row, column + 1) = std::log(inputs(row, column));
    const Eigen::VectorXd response = output.unaryExpr([](double y) { return std::log(y); });
    return design.colPivHouseholderQr().solve(response);
}

// The fit's (ln A, bᵢ) against the independent route on the same doubles: two factorisations of a
// well-conditioned design, 1e-9 relative (the same tolerance class as the statsmodels checks).
void checkAgainstIndependentLeastSquares(const isoquant::FitArguments& arguments)
{
    const isoquant::ProductionFit fit = isoquant::fitFromArguments(arguments);
    const Eigen::VectorXd expected =
        logLinearLeastSquares(valuesOf(arguments.output).col(0), valuesOf(arguments.inputs));
    for (Eigen::Index j = 0; j < expected.size(); ++j) BOOST_TEST(closeTo(fit.inference.estimates(j), expected(j), 1e-9));
}

std::string textOf(const CellTable& table)
{
    BOOST_TEST_REQUIRE(table.isText(0, 0));
    return table.text(0, 0);
}

// A typed Cobb-Douglas of inputs labour and ovens; `scaleLabel` "ln A" or "A".
CellTable cobbDouglas(const char* scaleLabel, double scale, double labour, double ovens)
{
    return typedRange({{text("form"), text("cobb-douglas")},
                       {text(scaleLabel), scale},
                       {text("labour"), labour},
                       {text("ovens"), ovens}});
}

CellTable translog(double ownSecond)
{
    return typedRange({{text("form"), text("translog")},
                       {text("ln A"), 0.0},
                       {text("x1"), 0.3},
                       {text("x2"), 0.3},
                       {text("x1*x1"), 0.0},
                       {text("x1*x2"), -0.2},
                       {text("x2*x2"), ownSecond}});
}

// Cobb-Douglas unit cost at prices w: ln c = ln ν − ln A/ν + Σᵢ (bᵢ/ν)(ln wᵢ − ln bᵢ) (Varian,
// Microeconomic Analysis, 1992, ch. 5; from memory).
double logUnitCost(double logScale, const Eigen::VectorXd& b, const Eigen::VectorXd& w)
{
    const double nu = b.sum();
    double sum = std::log(nu) - logScale / nu;
    for (Eigen::Index i = 0; i < b.size(); ++i) sum += b(i) / nu * (std::log(w(i)) - std::log(b(i)));
    return sum;
}

std::string sixDigits(double value)
{
    char buffer[32];
    std::snprintf(buffer, sizeof buffer, "%.6g", value);
    return buffer;
}

} // namespace

BOOST_AUTO_TEST_SUITE(value_range_edges)

BOOST_AUTO_TEST_CASE(column_logs_and_exponentials_are_exact_below_the_normal_doubles)
{
    // std::log and std::exp of the C library are the reference, coefficient by coefficient; the
    // columns mix normal and subnormal values so that the scalar route must be taken.
    Eigen::ArrayXd values(6);
    values << 1e-310, 1e-318, 5e-324, 2e-308, 3.0, 1e300;
    const Eigen::ArrayXd logs = isoquant::exactLog(values);
    for (Eigen::Index i = 0; i < values.size(); ++i) BOOST_TEST(logs(i) == std::log(values(i)));
    // ln 1e-310 = −310·ln 10 (decimal arithmetic); the stored subnormal is within 2.5e-14 of 1e-310
    // relative, so 1e-12 absolute.
    BOOST_TEST(std::fabs(logs(0) + 310 * std::log(10.0)) <= 1e-12);
    Eigen::ArrayXd arguments(5);
    arguments << -720.0, -745.0, -800.0, -709.5, 2.0;
    const Eigen::ArrayXd exponentials = isoquant::exactExp(arguments);
    for (Eigen::Index i = 0; i < arguments.size(); ++i) BOOST_TEST(exponentials(i) == std::exp(arguments(i)));
    BOOST_TEST(exponentials(2) == 0.0);
}

BOOST_AUTO_TEST_CASE(fits_take_exact_logs_of_subnormal_data)
{
    // One labour value of 1e-310 (translog too), then every output scaled by 1e-318.
    isoquant::FitArguments labour = isoquant::testing::cobbDouglas1928Arguments();
    labour.inputs.set(5, 0, 1e-310);
    checkAgainstIndependentLeastSquares(labour);
    isoquant::FitArguments output = isoquant::testing::cobbDouglas1928Arguments();
    for (std::size_t row = 1; row < output.output.rows(); ++row) output.output.set(row, 0, output.output.number(row, 0) * 1e-318);
    checkAgainstIndependentLeastSquares(output);
    // Scaling Y by 2⁻¹⁰⁶⁰ (into the subnormals, exactly reversible) moves ln A by −1060·ln 2 and
    // nothing else (a log identity); 1e-9 relative on the rounded values.
    isoquant::FitArguments halved = isoquant::testing::cobbDouglas1928Arguments();
    isoquant::FitArguments restored = halved;
    for (std::size_t row = 1; row < halved.output.rows(); ++row) {
        const double small = std::ldexp(halved.output.number(row, 0), -1060);
        halved.output.set(row, 0, small);
        restored.output.set(row, 0, std::ldexp(small, 1060));
    }
    const isoquant::ProductionFit low = isoquant::fitFromArguments(halved);
    const isoquant::ProductionFit high = isoquant::fitFromArguments(restored);
    BOOST_TEST(closeTo(low.inference.estimates(0), high.inference.estimates(0) - 1060 * std::log(2.0), 1e-9));
    BOOST_TEST(closeTo(low.inference.estimates(1), high.inference.estimates(1), 1e-9));
    BOOST_TEST(closeTo(low.inference.estimates(2), high.inference.estimates(2), 1e-9));
}

BOOST_AUTO_TEST_CASE(least_cost_amounts_below_the_normal_doubles_are_refused)
{
    // A = 1, b = (0.5, 0.4), unit prices, y = 1e-290: xᵢ = (bᵢ/ν)·c/wᵢ·y^(1/ν) ≈ 6.6e-323 and 5.3e-323
    // by Varian's closed form (logUnitCost above), not representable at full precision.
    const CellTable model = cobbDouglas("A", 1.0, 0.5, 0.4);
    const CellTable prices = numberRange(Eigen::RowVector2d(1.0, 1.0));
    BOOST_TEST(messageOf([&] { isoquant::leastCostRow(model, 1e-290, prices); }) ==
               "target output: the plan is not representable: the amount of 'labour' would be below 2.2e-308, the "
               "smallest number a cell holds at full precision");
    // ln A = 1000: one unit needs amounts of about e^−1000; 1e300 units about e^−309 ≈ 1e-134.
    const CellTable huge = cobbDouglas("ln A", 1000.0, 0.6, 0.4);
    BOOST_TEST(messageOf([&] { isoquant::leastCostRow(huge, 1.0, prices); }) ==
               "target output: the plan is not representable: the amount of 'labour' would be below 2.2e-308, the "
               "smallest number a cell holds at full precision");
    const CellTable row = isoquant::leastCostRow(huge, 1e300, prices);
    const Eigen::Vector2d b(0.6, 0.4);
    const double logCost = logUnitCost(1000.0, b, Eigen::Vector2d(1.0, 1.0)) + std::log(1e300);
    // xᵢ = sᵢ·C/wᵢ with cost shares sᵢ = bᵢ/ν; e^(ln C) of |ln C| ≈ 310 carries 310·1e-16 relative: 1e-12.
    BOOST_TEST(closeTo(row.number(0, 0), 0.6 * std::exp(logCost), 1e-12));
    BOOST_TEST(closeTo(row.number(0, 1), 0.4 * std::exp(logCost), 1e-12));
}

BOOST_AUTO_TEST_CASE(profit_messages_say_when_the_unit_cost_is_beyond_the_doubles)
{
    const CellTable prices = numberRange(Eigen::RowVector2d(1.0, 1.0));
    const Eigen::Vector2d b(0.6, 0.4), w(1.0, 1.0);
    // ln A = 1000: the unit cost e^−999.3 is below every normal double; the price 2 exceeds it.
    const CellTable huge = cobbDouglas("ln A", 1000.0, 0.6, 0.4);
    BOOST_TEST(textOf(isoquant::profitRow(huge, 2.0, prices)) ==
               "No finite profit maximum: returns to scale are constant (1), and at these prices one unit of output "
               "costs less than 2.2e-308 (ln " + sixDigits(logUnitCost(1000.0, b, w)) +
                   ") to make and sells for 2, so profit grows without limit as every input is scaled up");
    // A = 1e-320: the unit cost e^737.5 is beyond the largest double; the price 2 is below it.
    const CellTable tiny = cobbDouglas("A", 1e-320, 0.6, 0.4);
    BOOST_TEST(textOf(isoquant::profitRow(tiny, 2.0, prices)) ==
               "No finite profit maximum: returns to scale are constant (1), and at these prices one unit of output "
               "costs more than 1.8e308 (ln " + sixDigits(logUnitCost(std::log(1e-320), b, w)) +
                   ") to make and sells for 2, so every unit loses money and the best plan is to produce nothing");
}

BOOST_AUTO_TEST_CASE(isoquant_searches_the_whole_range_and_reports_the_rising_root)
{
    // ln Y = 0.3 l₁ + 0.3 l₂ − 0.2 l₁l₂ + ½γ l₂² (lᵢ = ln xᵢ) is a quadratic in l₂:
    // ½γ l₂² + (0.3 − 0.2 l₁) l₂ + 0.3 l₁ − ln Y = 0, solved by the quadratic formula. The root
    // reported is where output rises with x₂, ∂ln Y/∂l₂ = 0.3 − 0.2 l₁ + γ l₂ > 0. TOMS 748 holds l₂
    // to a few ulps, so x₂ to 1e-12 relative.
    const auto rootOf = [](double gamma, double x1, double level, double sign) {
        const double l1 = std::log(x1), b = 0.3 - 0.2 * l1, c = 0.3 * l1 - std::log(level);
        return std::exp((-b + sign * std::sqrt(b * b - 2 * gamma * c)) / gamma);
    };
    const CellTable values = numberRange(Eigen::VectorXd::Constant(1, 148.41316));
    // γ = −0.1: output rises in x₂ up to l₂ = −7, then falls; the level is met at x₂ = 3.86e-5
    // (rising) and 0.0215 (falling); the old search from x₂ = 1 moved only uphill and found neither.
    const CellTable concave = isoquant::isoquantColumn(translog(-0.1), 31.50039, values, {}, {});
    BOOST_TEST_REQUIRE(concave.isNumber(0, 0));
    BOOST_TEST(closeTo(concave.number(0, 0), rootOf(-0.1, 148.41316, 31.50039, 1.0), 1e-12));
    BOOST_TEST(std::fabs(concave.number(0, 0) - 3.86e-5) < 0.01e-5);
    // γ = +0.1: output falls to l₂ = 7, then rises; of x₂ = 14.0 (falling) and 85,700 (rising), the rising.
    const CellTable convex = isoquant::isoquantColumn(translog(0.1), 1.0, values, {}, {});
    BOOST_TEST_REQUIRE(convex.isNumber(0, 0));
    BOOST_TEST(closeTo(convex.number(0, 0), rootOf(0.1, 148.41316, 1.0, 1.0), 1e-12));
    // γ = −0.0002: the rising root, l₂ ≈ −7000, lies below 1e-300; the falling one (x₂ ≈ 8.5) is reported.
    const CellTable falling = isoquant::isoquantColumn(translog(-0.0002), 1.0, values, {}, {});
    BOOST_TEST_REQUIRE(falling.isNumber(0, 0));
    BOOST_TEST(closeTo(falling.number(0, 0), rootOf(-0.0002, 148.41316, 1.0, -1.0), 1e-12));
    // Beyond the top of the hump (ln Y at most 3.95 at l₁ = 5): no amount, said in the cell.
    BOOST_TEST(textOf(isoquant::isoquantColumn(translog(-0.1), 60.0, values, {}, {})) ==
               "no amount of 'x2' gives this output with 'x1' at 148.41316");
}

BOOST_AUTO_TEST_CASE(typed_models_with_a_repeated_row_are_refused)
{
    const CellTable bundle = numberRange(Eigen::RowVector2d(2.0, 3.0));
    const auto outputMessage = [&](const CellTable& model) {
        return messageOf([&] { isoquant::outputColumn(model, bundle); });
    };
    BOOST_TEST(outputMessage(typedRange({{text("form"), text("cobb-douglas")},
                                         {text("ln A"), 0.1},
                                         {text("L"), 0.6},
                                         {text("L"), 0.3}})) ==
               "model: row 4: 'L' repeats the label of row 3; give each input or parameter one row, under a label of "
               "its own");
    BOOST_TEST(outputMessage(typedRange({{text("form"), text("ces")},
                                         {text("A"), 2.0},
                                         {text("delta"), 0.4},
                                         {text("rho"), 0.5},
                                         {text("Delta"), 0.6},
                                         {text("nu"), 0.9}})) ==
               "model: row 5: 'Delta' repeats the label of row 3; give each input or parameter one row, under a "
               "label of its own");
    BOOST_TEST(outputMessage(typedRange({{text("form"), text("translog")},
                                         {text("ln A"), 0.0},
                                         {text("x1"), 0.3},
                                         {text("x2"), 0.3},
                                         {text("x1"), 0.2},
                                         {text("x1*x1"), 0.0},
                                         {text("x1*x2"), -0.2},
                                         {text("x2*x2"), -0.1}})) ==
               "model: row 5: 'x1' repeats the label of row 3; give each input or parameter one row, under a label "
               "of its own");
}

BOOST_AUTO_TEST_SUITE_END()

BOOST_AUTO_TEST_SUITE(value_range_edges_messages)

BOOST_AUTO_TEST_CASE(period_effects_that_do_not_vary_within_groups_are_named_in_the_plural)
{
    // Invented plants, each observed in one year only (4 rows a plant): with two-way effects the
    // period effects are constant within every group, so the group effects absorb them.
    const int plants = 4, rows = 4, n = plants * rows;
    Eigen::MatrixXd output(n, 1), inputs(n, 2), periods(n, 1), groups(n, 1);
    for (int g = 0; g < plants; ++g)
        for (int r = 0; r < rows; ++r) {
            const int row = g * rows + r;
            inputs(row, 0) = 10.0 + 3 * r + g;
            inputs(row, 1) = 5.0 + r * r + 2 * g;
            output(row, 0) = std::pow(inputs(row, 0), 0.6) * std::pow(inputs(row, 1), 0.3) * (1 + 0.01 * ((row * 7) % 5));
            periods(row, 0) = 2015 + g;
            groups(row, 0) = 100 + g;
        }
    isoquant::FitArguments arguments;
    arguments.output = numberRange(output, {"output"});
    arguments.inputs = numberRange(inputs, {"labour", "capital"});
    arguments.groups = numberRange(groups, {"plant"});
    arguments.trend = numberRange(periods, {"year"});
    arguments.effects = std::string("two-way");
    BOOST_TEST(messageOf([&] { isoquant::fitFromArguments(arguments); }) ==
               "trend: the period effects do not vary within any group, so they cannot be told apart from the group "
               "effects");
}

BOOST_AUTO_TEST_SUITE_END()
