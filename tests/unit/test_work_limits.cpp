// The cap on work per call (work_limits.hpp): beyond it a message naming the argument, never an
// allocation of gigabytes inside the user's office. Sizes are the limits themselves, plus one.
#include "isoquant/sheet/arguments/numeric_range.hpp"
#include "isoquant/math/fits/production_fit.hpp"
#include "isoquant/math/numerics/work_limits.hpp"
#include "isoquant/sheet/arguments/range_limits.hpp"

#include "input_error_message.hpp"

#include <boost/test/unit_test.hpp>

using isoquant::testing::messageOf;

BOOST_AUTO_TEST_CASE(counts_are_grouped_by_thousands)
{
    BOOST_TEST(isoquant::groupedCount(0) == "0");
    BOOST_TEST(isoquant::groupedCount(999) == "999");
    BOOST_TEST(isoquant::groupedCount(1000) == "1,000");
    BOOST_TEST(isoquant::groupedCount(1048576) == "1,048,576");
    BOOST_TEST(isoquant::groupedCount(33554432) == "33,554,432");
}

BOOST_AUTO_TEST_CASE(a_range_longer_than_a_sheet_column_is_refused)
{
    isoquant::CellTable range(isoquant::maximumRangeRows + 1, 1);
    BOOST_TEST(messageOf([&] { isoquant::readNumericColumns(range, "output", isoquant::ValueRule::positive, "output"); }) ==
               "output: the range has 1,048,577 rows; one call takes at most 1,048,576 (a whole sheet column)");
}

BOOST_AUTO_TEST_CASE(a_range_of_too_many_cells_is_refused_before_it_is_read)
{
    BOOST_TEST(messageOf([] { isoquant::checkRangeSize(100000, 200, "inputs"); }) ==
               "inputs: the range has 100,000 rows × 200 columns; one call takes at most 16,777,216 cells");
    BOOST_TEST(messageOf([] { isoquant::checkRangeSize(isoquant::maximumRangeRows, 16, "inputs"); }) == "<no InputError>");
}

namespace {

// Positive, varied values; only the shape matters here.
isoquant::ProductionData wideData(Eigen::Index rows, Eigen::Index inputs)
{
    isoquant::ProductionData data;
    data.output = Eigen::VectorXd::LinSpaced(rows, 1.0, 2.0);
    data.inputs = Eigen::MatrixXd::Constant(rows, inputs, 1.5);
    data.controls.resize(rows, 0);
    for (Eigen::Index j = 0; j < inputs; ++j) data.inputLabels.push_back("x" + std::to_string(j + 1));
    return data;
}

} // namespace

// 1 + 7 + 28 = 36 translog columns: 1,048,575 × 36 = 37.7 million values, above 2²⁵.
BOOST_AUTO_TEST_CASE(a_translog_design_beyond_the_limit_is_refused)
{
    const auto data = wideData(1048575, 7);
    isoquant::ProductionFitOptions options;
    options.form = isoquant::ProductionForm::translog;
    BOOST_TEST(messageOf([&] { isoquant::fitProduction(data, options); }) ==
               "inputs: the translog form of 7 inputs on 1,048,575 rows needs 1,048,575 × 36 design values, more than "
               "the 33,554,432 one call may hold; use fewer inputs or a sample of the rows");
}

// 200,000 rows in 400 periods: 3 base columns + 399 period dummies = 80 million values.
BOOST_AUTO_TEST_CASE(two_way_effects_over_too_many_periods_are_refused)
{
    const Eigen::Index rows = 200000;
    auto data = wideData(rows, 2);
    data.output = Eigen::VectorXd::LinSpaced(rows, 1.0, 3.0).array().exp().matrix();
    data.inputs.col(0) = Eigen::VectorXd::LinSpaced(rows, 1.0, 9.0);
    data.panel.periods.resize(rows);
    for (Eigen::Index i = 0; i < rows; ++i) {
        data.panel.periods(i) = static_cast<double>(2000 + i % 400);
        data.panel.groupOfRow.push_back(i / 400);
    }
    for (Eigen::Index g = 0; g < rows / 400; ++g) data.panel.groupLabels.push_back("plant " + std::to_string(g + 1));
    isoquant::ProductionFitOptions options;
    options.effects = isoquant::EffectsKind::twoWay;
    BOOST_TEST(messageOf([&] { isoquant::fitProduction(data, options); }) ==
               "trend: two-way effects with 400 periods on 200,000 rows needs 200,000 × 402 design values, more than "
               "the 33,554,432 one call may hold; use a trend instead of two-way effects, or fewer periods");
}

// 2²⁴ row evaluations shared: 3 runs on 1,000,000 rows get 5 each, on 10,000 rows 559 each;
// 1,000 rows keep the 4000 asked.
BOOST_AUTO_TEST_CASE(nonlinear_runs_share_the_row_evaluations)
{
    BOOST_TEST(isoquant::evaluationsPerRun(1000000, 3, 4000) == 5u);
    BOOST_TEST(isoquant::evaluationsPerRun(10000, 3, 4000) == 559u);
    BOOST_TEST(isoquant::evaluationsPerRun(1000, 3, 4000) == 4000u);
    BOOST_TEST(isoquant::evaluationsPerRun(isoquant::maximumRowEvaluations * 2, 1, 4000) == 1u);
    BOOST_TEST(isoquant::evaluationsPerRun(0, 3, 4000) == 4000u);
}
