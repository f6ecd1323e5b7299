// Bad input to PRODGROWTH, PRODINDEX and PRODTFP gets an InputError whose message names the
// argument and the period (with its row in the selection, header included) or the row; the exact
// wording is that of core/sheet/src/arguments/period_range.cpp and core/sheet/src/functions/growth_functions.cpp. The data
// are small invented ranges with one cell, shape or option spoiled.
#include "isoquant/sheet/functions/growth_functions.hpp"
#include "cell_tables.hpp"
#include "growth_series.hpp"
#include "input_error_message.hpp"

#include <boost/test/unit_test.hpp>

#include <limits>
#include <utility>
#include <vector>

using isoquant::Cell;
using isoquant::CellTable;
using isoquant::testing::messageOf;
using isoquant::testing::numberRange;
using isoquant::testing::typedRange;

namespace {

Cell text(const char* value) { return std::string(value); }

// Four periods of output, labour and capital, with their cost shares; headers in the first row.
CellTable output() { return typedRange({{text("output")}, {100.0}, {104.0}, {109.0}, {113.0}}); }
CellTable inputs()
{
    return typedRange({{text("labour"), text("capital")}, {50.0, 80.0}, {51.0, 83.0}, {53.0, 85.0}, {54.0, 88.0}});
}
CellTable shares()
{
    return typedRange({{text("labour"), text("capital")}, {0.6, 0.4}, {0.62, 0.38}, {0.61, 0.39}, {0.6, 0.4}});
}
CellTable model()
{
    return typedRange({{text("form"), text("cobb-douglas")}, {text("ln A"), 0.1}, {text("labour"), 0.6},
                       {text("capital"), 0.3}});
}

std::string growthMessage(const CellTable& out, const CellTable& in, const CellTable& weights, Cell method = {})
{
    return messageOf([&] { isoquant::growthAccountTable(out, in, weights, method); });
}

std::string indexMessage(const CellTable& quantities, const CellTable& weights, Cell method = {}, Cell base = {})
{
    return messageOf([&] { isoquant::quantityIndexColumn(quantities, weights, method, base); });
}

CellTable with(CellTable range, std::size_t row, std::size_t column, Cell value)
{
    range.set(row, column, std::move(value));
    return range;
}

CellTable firstRows(const CellTable& range, std::size_t rows)
{
    CellTable kept(rows, range.columns());
    for (std::size_t row = 0; row < rows; ++row)
        for (std::size_t column = 0; column < range.columns(); ++column) kept.set(row, column, range.at(row, column));
    return kept;
}

} // namespace

BOOST_AUTO_TEST_SUITE(growth_bad_input)

BOOST_AUTO_TEST_CASE(the_unspoiled_ranges_work)
{
    BOOST_TEST(isoquant::growthAccountTable(output(), inputs(), shares(), {}).rows() == 5u);
    BOOST_TEST(isoquant::growthAccountTable(output(), inputs(), model(), text("fixed")).rows() == 5u);
    // Under a header row, a column result starts with a header cell of its own.
    BOOST_TEST(isoquant::quantityIndexColumn(inputs(), shares(), {}, 100.0).rows() == 5u);
    BOOST_TEST(isoquant::productivityColumn(model(), output(), inputs()).rows() == 5u);
}

BOOST_AUTO_TEST_CASE(missing_and_non_positive_values_name_the_period)
{
    BOOST_TEST(growthMessage(output(), with(inputs(), 3, 1, 0.0), shares()) ==
               "inputs: period 3 (row 4), column 2 is 0; quantities must be positive (growth is a difference of logs)");
    BOOST_TEST(growthMessage(with(output(), 2, 0, -4.0), inputs(), shares()) ==
               "output: period 2 (row 3) is -4; quantities must be positive (growth is a difference of logs)");
    BOOST_TEST(growthMessage(output(), with(inputs(), 4, 0, Cell{}), shares()) ==
               "inputs: period 4 (row 5), column 1 is empty; every period needs a number");
    BOOST_TEST(growthMessage(output(), inputs(), with(shares(), 2, 1, text("n.a."))) ==
               "weights: period 2 (row 3), column 2 holds text 'n.a.'; every period needs a number");
    BOOST_TEST(growthMessage(output(), inputs(), with(shares(), 1, 0, std::numeric_limits<double>::quiet_NaN())) ==
               "weights: period 1 (row 2), column 1 is not a finite number");
    BOOST_TEST(indexMessage(with(inputs(), 2, 0, 0.0), shares()) ==
               "quantities: period 2 (row 3), column 1 is 0; quantities must be positive (growth is a difference of logs)");
    BOOST_TEST(indexMessage(inputs(), with(with(shares(), 3, 0, -0.1), 3, 1, 1.1)) ==
               "shares: period 3 (row 4), column 1 is -0.1; cost shares cannot be negative");
    // Without a header row, period and row are the same number.
    BOOST_TEST(indexMessage(numberRange(Eigen::Matrix2d::Constant(5.0)), typedRange({{0.5, 0.5}, {0.5, -0.5}})) ==
               "shares: period 2 (row 2), column 2 is -0.5; cost shares cannot be negative");
}

BOOST_AUTO_TEST_CASE(shares_that_do_not_sum_to_one)
{
    const std::string rule = "; the cost shares of a period must sum to 1 within 0.01 (0.99 to 1.01, both included)";
    BOOST_TEST(growthMessage(output(), inputs(), with(shares(), 3, 1, 0.37)) ==
               "weights: period 3 (row 4): the shares sum to 0.98" + rule);
    BOOST_TEST(indexMessage(inputs(), with(shares(), 1, 0, 60.0)) ==
               "shares: period 1 (row 2): the shares sum to 60.4" + rule);
    // Within 0.01 they are accepted (and rescaled: test_index_numbers.cpp checks the values).
    BOOST_TEST(isoquant::quantityIndexColumn(inputs(), with(shares(), 3, 1, 0.385), {}, {}).rows() == 5u);
}

// The bounds are included: shares typed to sum to 0.99 or 1.01 pass although their binary sum may
// land a hair outside (0.6 + 0.41 need not be the double nearest 1.01), as do sums within 1e-8 of
// a bound; a hundredth of a percent beyond, they are refused.
BOOST_AUTO_TEST_CASE(the_share_tolerance_includes_its_bounds)
{
    for (const double capital : {0.39, 0.41, 0.3899999999, 0.4100000001}) {
        BOOST_TEST(isoquant::quantityIndexColumn(inputs(), with(shares(), 1, 1, capital), {}, {}).rows() == 5u);
        BOOST_TEST(isoquant::growthAccountTable(output(), inputs(), with(shares(), 1, 1, capital), {}).rows() == 5u);
    }
    const std::string refused = "shares: period 1 (row 2): the shares sum to ";
    BOOST_TEST(indexMessage(inputs(), with(shares(), 1, 1, 0.3899)).rfind(refused, 0) == 0u);
    BOOST_TEST(indexMessage(inputs(), with(shares(), 1, 1, 0.4101)).rfind(refused, 0) == 0u);
    BOOST_TEST(growthMessage(output(), inputs(), with(shares(), 1, 1, 0.4101)).rfind("weights: period 1 (row 2)", 0) ==
               0u);
}

BOOST_AUTO_TEST_CASE(ranges_that_do_not_line_up)
{
    BOOST_TEST(growthMessage(output(), firstRows(inputs(), 4), shares()) ==
               "inputs: has 3 periods but output has 4 periods");
    BOOST_TEST(growthMessage(output(), inputs(), firstRows(shares(), 3)) ==
               "weights: has 2 periods but inputs has 4 periods");
    CellTable bareShares(4, 2);
    for (std::size_t row = 0; row < 4; ++row)
        for (std::size_t column = 0; column < 2; ++column) bareShares.set(row, column, shares().at(row + 1, column));
    BOOST_TEST(growthMessage(output(), inputs(), firstRows(bareShares, 3)) ==
               "weights: has 3 periods but inputs has 4 periods (a header row of text was found in inputs only)");
    const CellTable oneShareColumn = typedRange({{text("labour")}, {1.0}, {1.0}, {1.0}, {1.0}});
    BOOST_TEST(growthMessage(output(), inputs(), oneShareColumn) == "weights: has 1 column but inputs has 2");
    BOOST_TEST(indexMessage(inputs(), oneShareColumn) == "shares: has 1 column but quantities has 2");
    // Shares in another order than the inputs.
    CellTable swapped = shares();
    for (std::size_t row = 0; row < swapped.rows(); ++row) {
        const Cell first = swapped.at(row, 0);
        swapped.set(row, 0, swapped.at(row, 1));
        swapped.set(row, 1, first);
    }
    BOOST_TEST(growthMessage(output(), inputs(), swapped) ==
               "weights: column 1 is 'capital' but inputs column 1 is 'labour'; give them the same labels, in the same order");
    BOOST_TEST(indexMessage(inputs(), swapped) ==
               "shares: column 1 is 'capital' but quantities column 1 is 'labour'; give them the same labels, in the same "
               "order");
    BOOST_TEST(growthMessage(output(), inputs(), with(model(), 2, 0, text("hours"))) ==
               "weights: the model's input 1 is 'hours' but inputs column 1 is 'labour'; give them the same labels, in "
               "the same order");
    BOOST_TEST(growthMessage(typedRange({{text("output")}, {100.0}}), firstRows(inputs(), 2), shares()) ==
               "output: growth needs at least 2 periods; it has 1");
    BOOST_TEST(growthMessage(inputs(), inputs(), shares()) == "output: must be one column; it has 2");
    BOOST_TEST(messageOf([&] { isoquant::productivityColumn(model(), output(), firstRows(inputs(), 4)); }) ==
               "inputs: has 3 rows of data but output has 4 rows");
    // Columns headed in another order are taken by their labels, as for every function with a model
    // (the shares serve here as positive input amounts).
    BOOST_TEST((isoquant::productivityColumn(model(), output(), swapped) ==
                isoquant::productivityColumn(model(), output(), shares())));
}

BOOST_AUTO_TEST_CASE(models_as_weights)
{
    const CellTable oneInputModel =
        typedRange({{text("form"), text("cobb-douglas")}, {text("ln A"), 0.1}, {text("labour"), 0.6}});
    BOOST_TEST(growthMessage(output(), inputs(), oneInputModel) == "weights: the model has 1 input but inputs has 2 columns");
    // The model reader's messages name the argument "weights" here.
    BOOST_TEST(growthMessage(output(), inputs(), with(model(), 0, 1, text("ces"))) ==
               "weights: row 3 ('labour') is not a parameter of the ces form; its rows are delta, rho (or sigma) and nu");
    // A ces model's elasticities vary with the inputs: "fixed" has none to use.
    const CellTable cesModel = typedRange({{text("form"), text("ces"), Cell{}},
                                           {text("ln A"), 0.1, Cell{}},
                                           {text("delta"), 0.4, Cell{}},
                                           {text("rho"), 0.5, Cell{}},
                                           {text("nu"), 0.9, Cell{}},
                                           {text("inputs"), text("labour"), text("capital")}});
    BOOST_TEST(growthMessage(output(), inputs(), cesModel, text("fixed")) ==
               "method: \"fixed\" needs elasticities that are the same in every period (a cobb-douglas model); this "
               "model is ces, so use \"tornqvist\"");
    BOOST_TEST(growthMessage(output(), inputs(), with(model(), 3, 1, -0.6)) ==
               "weights: from period 1 (row 2) to period 2 (row 3) the elasticities sum to 0; the decomposition divides "
               "by this returns to scale, so it must be positive");
    BOOST_TEST(growthMessage(output(), inputs(), with(with(model(), 2, 1, 1e308), 3, 1, 1e308), text("fixed")) ==
               "weights: from period 1 (row 2) to period 2 (row 3) the elasticities sum to inf; the decomposition "
               "divides by this returns to scale, so it must be positive");
}

BOOST_AUTO_TEST_CASE(options)
{
    BOOST_TEST(growthMessage(output(), inputs(), shares(), text("fixed")) ==
               "method: \"fixed\" uses a model's constant elasticities; with cost shares as weights use \"tornqvist\"");
    BOOST_TEST(growthMessage(output(), inputs(), shares(), text("fisher")) ==
               "method: 'fisher' is not a method; use \"tornqvist\" or \"fixed\"");
    BOOST_TEST(growthMessage(output(), inputs(), shares(), 1.0) == "method: 1 is not a method; use \"tornqvist\" or \"fixed\"");
    BOOST_TEST(indexMessage(inputs(), shares(), text("torn")) ==
               "method: 'torn' is not an index method; use \"tornqvist\", \"laspeyres\", \"paasche\" or \"fisher\"");
    BOOST_TEST(indexMessage(inputs(), shares(), {}, -5.0) ==
               "base: -5 is not a base value; give a positive number such as 1 or 100");
    BOOST_TEST(indexMessage(inputs(), shares(), {}, text("100")) ==
               "base: '100' is not a base value; give a positive number such as 1 or 100");
    // Option words ignore case; Törnqvist may keep its ö.
    for (const char* word : {"TORNQVIST", "Törnqvist", "Laspeyres", "PAASCHE", "Fisher"})
        BOOST_TEST(isoquant::quantityIndexColumn(inputs(), shares(), text(word), {}).rows() == 5u, word);
}

BOOST_AUTO_TEST_CASE(results_too_large_are_reported)
{
    // Quantities of 1e-300 then 1e300 with the whole share on them: an index of 1e600.
    const CellTable quantities = typedRange({{1e-300}, {1e300}});
    const CellTable weights = typedRange({{1.0}, {1.0}});
    BOOST_TEST(indexMessage(quantities, weights) ==
               "quantities: period 2 (row 2): the index is too large or too small to represent");
}

// Shares typed in percent get told to divide by 100; sums print as typed (0.5 + 0.3796 is
// 0.8795999999999999 in binary, shown 0.8796).
BOOST_AUTO_TEST_CASE(shares_in_percent_and_sums_as_typed)
{
    const CellTable percent =
        typedRange({{text("labour"), text("capital")}, {60.0, 40.0}, {62.0, 38.0}, {61.0, 39.0}, {60.0, 40.0}});
    const std::string divide = "period 1 (row 2): the shares sum to 100: give them as fractions (divide by 100)";
    BOOST_TEST(growthMessage(output(), inputs(), percent) == "weights: " + divide);
    BOOST_TEST(indexMessage(inputs(), percent) == "shares: " + divide);
    BOOST_TEST(indexMessage(inputs(), with(with(shares(), 1, 0, 0.5), 1, 1, 0.3796)) ==
               "shares: period 1 (row 2): the shares sum to 0.8796; the cost shares of a period must sum to 1 within "
               "0.01 (0.99 to 1.01, both included)");
}

// Share columns headed the natural way match their input; one that names two inputs is refused.
BOOST_AUTO_TEST_CASE(share_columns_headed_the_natural_way)
{
    const CellTable plain = isoquant::growthAccountTable(output(), inputs(), shares(), {});
    for (const auto& [labour, capital] : std::vector<std::pair<const char*, const char*>>{
             {"labour share", "capital share"}, {"share of labour", "share of capital"},
             {"Labour cost share", "capital cost share"}}) {
        CellTable headed = shares();
        headed.set(0, 0, text(labour));
        headed.set(0, 1, text(capital));
        BOOST_TEST((isoquant::growthAccountTable(output(), inputs(), headed, {}) == plain), labour);
        BOOST_TEST(isoquant::quantityIndexColumn(inputs(), headed, {}, {}).rows() == 5u);
    }
    CellTable swapped = shares();
    swapped.set(0, 0, text("capital share"));
    swapped.set(0, 1, text("labour share"));
    BOOST_TEST(growthMessage(output(), inputs(), swapped) ==
               "weights: column 1 is 'capital share' but inputs column 1 is 'labour'; give them the same labels, in "
               "the same order");
    CellTable both = shares();
    both.set(0, 0, text("labour and capital share"));
    BOOST_TEST(growthMessage(output(), inputs(), both) ==
               "weights: column 1 is 'labour and capital share', which names both 'labour' and 'capital'; head it "
               "with one label only");
    // "labourer" is not the word "labour", and a label without the word "share" is not a share's.
    CellTable near = shares();
    near.set(0, 0, text("labourer share"));
    BOOST_TEST(growthMessage(output(), inputs(), near).find("column 1 is 'labourer share' but") != std::string::npos);
    near.set(0, 0, text("labour cost"));
    BOOST_TEST(growthMessage(output(), inputs(), near).find("column 1 is 'labour cost' but") != std::string::npos);
}

BOOST_AUTO_TEST_SUITE_END()
