// The covariance block's row for a shifted ln A (issue 20, covariance_block.hpp): a cobb-douglas
// table with controls or a trend and no effects gets one more parameter row, "ln A at control means"
// or "ln A for predictions" (q = p + 1 rows, max(7, q + 1) columns), read back by the model reader;
// under effects the block keeps p rows. Data: Munnell's (1990) US state panel with the control unemp
// and the trend year (tests/data/README.md).
//
// The row's figures are checked by reparametrising the same regression, which OLS leaves
// unchanged but for the constant: with the control entered as unemp − mean(unemp) and the trend as
// −year (so the core's trend column t − t_first becomes 1986 − year), the refit's ln A is exactly the
// evaluators' ln A s = ln A + c·mean(unemp) + λ·(1986 − 1970) of the original fit, and its covariance
// row is Cov(s, θ). Both fits' rounding differs (different columns), so 1e-9 relative to
// √(Var(s)·Var(θⱼ)).
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
// (s, the exponents, c), so its row 0 (Var(s), Cov(s, bᵢ), Cov(s, c)) is the last row of `block` at
// the columns (s, b₁ … b₃, c), and its ln A is s.
void checkAgainstReparametrisedRefit(isoquant::FitArguments arguments, const isoquant::ShiftedLogScale& shifted,
                                     const Eigen::MatrixXd& block)
{
    const double meanRate = columnMean(arguments.controls);
    arguments.controls = changed(arguments.controls, [&](double rate) { return rate - meanRate; });
    arguments.trend = changed(arguments.trend, [](double year) { return -year; });
    const auto refit = isoquant::fitFromArguments(arguments);
    BOOST_TEST(std::fabs(refit.inference.estimates(0) - shifted.estimate) <= 1e-9 * std::fabs(shifted.estimate));
    const Eigen::Index last = block.rows() - 1;
    for (Eigen::Index j = 0; j < last; ++j) {
        const Eigen::Index column = j == 0 ? last : j;
        const double expected = refit.inference.covariance(0, j), actual = block(last, column);
        BOOST_TEST(std::fabs(actual - expected) <= 1e-9 * std::sqrt(block(last, last) * block(column, column)),
                   "parameter " << j << ": " << actual << " against " << expected);
    }
}

} // namespace

BOOST_AUTO_TEST_SUITE(shifted_covariance_block)

BOOST_AUTO_TEST_CASE(a_control_and_a_trend_add_the_row_of_ln_a_for_predictions)
{
    const auto fit = isoquant::fitFromArguments(trendedPanel());
    BOOST_TEST_REQUIRE(fit.shiftedScale.has_value());
    const auto table = tableWithBlock(fit);
    const std::size_t row = blockRow(table);
    // p = 1 + 3 inputs + 1 control = 5 parameters and the evaluators' ln A: q = 6 rows, max(7, 7) columns.
    BOOST_TEST(table.rows() == row + 1 + 6);
    BOOST_TEST(table.columns() == 7u);
    BOOST_TEST(table.text(row + 6, 0) == "ln A for predictions");
    const auto model = isoquant::readProductionModel(table);
    BOOST_TEST(model.covarianceCoversShiftedLogScale);
    BOOST_REQUIRE(model.parameterCovariance.has_value());
    BOOST_TEST((model.parameterCovariance->matrix == isoquant::testing::blockMatrixOf(fit)));
    BOOST_TEST(model.parameterCovariance->labels.back() == "ln A for predictions");

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
                   "with controls or a trend (and no effects) its last row is 'ln A at control means', the ln A "
                   "the evaluators use");
}

BOOST_AUTO_TEST_CASE(effects_keep_the_block_of_the_parameters)
{
    auto arguments = isoquant::testing::statePanelWithPanelColumns();
    arguments.effects = std::string("fixed");
    const auto fit = isoquant::fitFromArguments(arguments);
    BOOST_TEST(!fit.shiftedScale.has_value());
    const auto table = tableWithBlock(fit);
    BOOST_TEST(table.rows() == blockRow(table) + 1 + 5);
    const auto model = isoquant::readProductionModel(table);
    BOOST_TEST(!model.covarianceCoversShiftedLogScale);
    BOOST_TEST(model.parameterCovariance->labels.back() == "unemp (control)");
}

BOOST_AUTO_TEST_SUITE_END()
