// The covariance block's rows for a shifted ln A and a trend (issue 20, covariance_block.hpp): a
// cobb-douglas table with controls, effects or a trend gets one more parameter row, "ln A at control
// means" or "ln A for predictions", and with a trend one more, "technical change per period"
// (q = p + 1 or p + 2 rows, max(7, q + 1) columns), read back by the model reader. Data: Munnell's
// (1990) US state panel with the control unemp and the trend year (tests/data/README.md).
//
// The row's figures are checked by reparametrising the same regression, which OLS leaves
// unchanged but for the constant: with the control entered as unemp − mean(unemp) and the trend as
// −year (so the core's trend column t − t_first becomes 1986 − year), the refit's ln A is exactly the
// evaluators' ln A s = ln A + c·mean(unemp) + λ·(1986 − 1970) of the original fit, and its covariance
// row is Cov(s, θ); its trend coefficient is −λ, so Cov(s, λ) and Var(λ) are minus its
// Cov(ln A, trend) and its Var(trend). Both fits' rounding differs (different columns), so 1e-9
// relative to √(Var(s)·Var(θⱼ)).
#include "isoquant/sheet/functions/bound_functions.hpp"
#include "isoquant/sheet/functions/production_functions.hpp"
#include "isoquant/sheet/models/production_model.hpp"
#include "covariance_tables.hpp"
#include "input_error_message.hpp"
#include "reference_data.hpp"

#include <boost/test/unit_test.hpp>

#include <cmath>

using isoquant::testing::blockRow;
using isoquant::testing::messageOf;
using isoquant::testing::tableWithBlock;

namespace {

isoquant::FitArguments trendedPanel()
{
    auto arguments = isoquant::testing::statePanelWithPanelColumns();
    arguments.groups = {};
    return arguments;
}

// The numbers of a one-column range under its header, each as `change` makes it.
template <class Change> isoquant::CellTable changed(isoquant::CellTable column, Change change)
{
    for (std::size_t row = 0; row < column.rows(); ++row)
        if (column.isNumber(row, 0)) column.set(row, 0, change(column.number(row, 0)));
    return column;
}

double columnMean(const isoquant::CellTable& column)
{
    double sum = 0, count = 0;
    for (std::size_t row = 0; row < column.rows(); ++row)
        if (column.isNumber(row, 0)) sum += column.number(row, 0), count += 1;
    return sum / count;
}

// The refit of `arguments` (a control and a trend) reparametrised as at the top of the file: its θ' =
// (s, the exponents, c), so its row 0 (Var(s), Cov(s, bᵢ), Cov(s, c)) is the row of s in `block`
// (the one before λ's, the last) at the columns (s, b₁ … b₃, c), and its ln A is s.
void checkAgainstReparametrisedRefit(isoquant::FitArguments arguments, const isoquant::ShiftedLogScale& shifted,
                                     const Eigen::MatrixXd& block)
{
    const double meanRate = columnMean(arguments.controls);
    arguments.controls = changed(arguments.controls, [&](double rate) { return rate - meanRate; });
    arguments.trend = changed(arguments.trend, [](double year) { return -year; });
    const auto refit = isoquant::fitFromArguments(arguments);
    BOOST_TEST(std::fabs(refit.inference.estimates(0) - shifted.estimate) <= 1e-9 * std::fabs(shifted.estimate));
    const Eigen::Index trend = block.rows() - 1, scale = trend - 1;
    for (Eigen::Index j = 0; j < scale; ++j) {
        const Eigen::Index column = j == 0 ? scale : j;
        const double expected = refit.inference.covariance(0, j), actual = block(scale, column);
        BOOST_TEST(std::fabs(actual - expected) <= 1e-9 * std::sqrt(block(scale, scale) * block(column, column)),
                   "parameter " << j << ": " << actual << " against " << expected);
    }
    const Eigen::MatrixXd& regression = refit.regressionInference.covariance;
    const Eigen::Index refitTrend = regression.rows() - 1;
    BOOST_TEST(std::fabs(block(trend, scale) + regression(0, refitTrend)) <=
               1e-9 * std::sqrt(block(scale, scale) * block(trend, trend)));
    BOOST_TEST(std::fabs(block(trend, trend) - regression(refitTrend, refitTrend)) <= 1e-9 * block(trend, trend));
}

} // namespace

BOOST_AUTO_TEST_SUITE(shifted_covariance_block)

BOOST_AUTO_TEST_CASE(a_control_and_a_trend_add_the_row_of_ln_a_for_predictions)
{
    const auto fit = isoquant::fitFromArguments(trendedPanel());
    BOOST_TEST_REQUIRE(fit.shiftedScale.has_value());
    const auto table = tableWithBlock(fit);
    const std::size_t row = blockRow(table);
    // p = 1 + 3 inputs + 1 control = 5 parameters, the evaluators' ln A and λ: q = 7 rows, max(7, 8)
    // columns, the eighth headed by λ's label.
    BOOST_TEST(table.rows() == row + 1 + 7);
    BOOST_TEST(table.columns() == 8u);
    BOOST_TEST(table.text(row + 6, 0) == "ln A for predictions");
    BOOST_TEST(table.text(row + 7, 0) == "technical change per period");
    BOOST_TEST(table.text(0, 7) == "technical change per period");
    const auto model = isoquant::readProductionModel(table);
    BOOST_TEST(model.covarianceCoversShiftedLogScale);
    BOOST_REQUIRE(model.parameterCovariance.has_value());
    BOOST_TEST((model.parameterCovariance->matrix == isoquant::testing::blockMatrixOf(fit)));
    BOOST_TEST(model.parameterCovariance->labels.back() == "technical change per period");

    checkAgainstReparametrisedRefit(trendedPanel(), *fit.shiftedScale, model.parameterCovariance->matrix);
}

// Under constant returns θ = T·β + offset maps the regression's coefficients (ln(Y/x_k) on ln(xᵢ/x_k))
// to the parameters; the row of s goes through the same map.
BOOST_AUTO_TEST_CASE(the_row_under_constant_returns_and_hc1_errors)
{
    auto arguments = trendedPanel();
    arguments.constantReturns = 1.0; // TRUE
    arguments.errors = std::string("hc1");
    const auto fit = isoquant::fitFromArguments(arguments);
    BOOST_TEST_REQUIRE(fit.shiftedScale.has_value());
    const auto model = isoquant::readProductionModel(tableWithBlock(fit));
    checkAgainstReparametrisedRefit(arguments, *fit.shiftedScale, model.parameterCovariance->matrix);
}

BOOST_AUTO_TEST_CASE(a_control_alone_adds_the_row_of_ln_a_at_control_means)
{
    const auto fit = isoquant::fitFromArguments(isoquant::testing::statePanelArguments());
    const auto table = tableWithBlock(fit);
    const std::size_t row = blockRow(table);
    BOOST_TEST(table.rows() == row + 1 + 6);
    BOOST_TEST(table.text(row + 6, 0) == "ln A at control means");
    // Var(s) from the refit with the control centred: its ln A is s, its variance the same.
    auto arguments = isoquant::testing::statePanelArguments();
    const double meanRate = columnMean(arguments.controls);
    arguments.controls = changed(arguments.controls, [&](double rate) { return rate - meanRate; });
    const double variance = isoquant::fitFromArguments(arguments).inference.covariance(0, 0);
    BOOST_TEST(std::fabs(table.number(row + 6, 6) - variance) <= 1e-9 * variance);
}

BOOST_AUTO_TEST_CASE(a_block_without_the_row_gets_a_message_naming_model)
{
    const auto fit = isoquant::fitFromArguments(isoquant::testing::statePanelArguments());
    auto table = tableWithBlock(fit);
    const std::size_t row = blockRow(table);
    // The block as a table without the control's row would have it: the last row cleared.
    for (std::size_t column = 0; column < table.columns(); ++column) table.set(row + 6, column, isoquant::Cell{});
    BOOST_TEST(messageOf([&] { isoquant::readProductionModel(table); }) ==
               "model: row " + std::to_string(row + 1) +
                   ": the covariance block has 5 rows; it needs one row per parameter (6) and 6 numbers in each; "
                   "with controls, effects or a trend a row 'ln A at control means' follows the parameters, the "
                   "ln A the evaluators use");
}

// Under effects ln A (the plain mean effect) keeps n/a; the evaluators' ln A, which weights the
// group effects by their rows, has its row (its figures: test_effects_bounds_cross_check.cpp).
BOOST_AUTO_TEST_CASE(effects_add_the_row_of_ln_a_for_predictions)
{
    auto arguments = isoquant::testing::statePanelWithPanelColumns();
    arguments.effects = std::string("fixed");
    const auto fit = isoquant::fitFromArguments(arguments);
    BOOST_TEST(fit.shiftedScale.has_value());
    const auto table = tableWithBlock(fit);
    const std::size_t row = blockRow(table);
    BOOST_TEST(table.rows() == row + 1 + 7);
    BOOST_TEST(table.text(row + 1, 1) == "n/a");
    BOOST_TEST(table.text(row + 6, 1) == "n/a");
    BOOST_TEST(table.number(row + 6, 6) > 0);
    const auto model = isoquant::readProductionModel(table);
    BOOST_TEST(model.covarianceCoversShiftedLogScale);
    BOOST_TEST(model.covarianceCoversTechnicalChange);
    BOOST_TEST((model.parameterCovariance->labels.at(5) == "ln A for predictions"));
    // Two-way effects: no trend (the period effects absorb it), so no row for λ.
    arguments.effects = std::string("two-way");
    const auto twoWay = tableWithBlock(isoquant::fitFromArguments(arguments));
    BOOST_TEST(twoWay.rows() == blockRow(twoWay) + 1 + 6);
    BOOST_TEST(isoquant::readProductionModel(twoWay).parameterCovariance->labels.back() == "ln A for predictions");
}

BOOST_AUTO_TEST_SUITE_END()
