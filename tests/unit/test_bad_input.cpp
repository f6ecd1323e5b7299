// Bad input through the cell functions gets an InputError whose message names the argument and,
// where there is one, the row (and column) of the user's selection, counted from 1 with the
// header row included (numeric_range.hpp). The data are the Cobb & Douglas (1928) ranges
// (tests/data/cobb_douglas_1928.csv) with one cell or option spoiled.
#include "isoquant/sheet/functions/production_functions.hpp"
#include "cell_tables.hpp"
#include "input_error_message.hpp"
#include "reference_data.hpp"

#include <boost/test/unit_test.hpp>

#include <cmath>
#include <limits>

using isoquant::Cell;
using isoquant::CellTable;
using isoquant::FitArguments;
using isoquant::testing::messageOf;

namespace {

std::string fitMessage(const FitArguments& arguments)
{
    return messageOf([&] { isoquant::fitFromArguments(arguments); });
}

FitArguments goodArguments() { return isoquant::testing::cobbDouglas1928Arguments(); }

// The first `rows` rows of a range.
CellTable firstRows(const CellTable& range, std::size_t rows)
{
    CellTable kept(rows, range.columns());
    for (std::size_t row = 0; row < rows; ++row)
        for (std::size_t column = 0; column < range.columns(); ++column) kept.set(row, column, range.at(row, column));
    return kept;
}

Cell text(const char* value) { return std::string(value); }

// The published 1928 function, typed by hand.
CellTable typedModel()
{
    return isoquant::testing::typedRange(
        {{text("form"), text("cobb-douglas")}, {text("A"), 1.01}, {text("labour"), 0.75}, {text("capital"), 0.25}});
}

const double notANumber = std::numeric_limits<double>::quiet_NaN();
const double infinity = std::numeric_limits<double>::infinity();

} // namespace

BOOST_AUTO_TEST_SUITE(bad_input)

BOOST_AUTO_TEST_CASE(the_unspoiled_arguments_fit)
{
    BOOST_TEST(isoquant::fitFromArguments(goodArguments()).inference.estimates.size() == 3);
}

BOOST_AUTO_TEST_CASE(text_and_empty_cells_are_named_by_row_and_column)
{
    auto arguments = goodArguments();
    arguments.inputs.set(5, 1, text("n.a."));
    BOOST_TEST(fitMessage(arguments) == "inputs: row 6, column 2 holds text 'n.a.'; every cell must hold a number");

    arguments = goodArguments();
    arguments.inputs.set(9, 0, Cell{});
    BOOST_TEST(fitMessage(arguments) == "inputs: row 10, column 1 is empty; every cell must hold a number");

    // A one-column range names the row only.
    arguments = goodArguments();
    arguments.output.set(3, 0, Cell{});
    BOOST_TEST(fitMessage(arguments) == "output: row 4 is empty; every cell must hold a number");
}

BOOST_AUTO_TEST_CASE(values_whose_log_is_taken_must_be_positive)
{
    auto arguments = goodArguments();
    arguments.inputs.set(2, 0, 0.0);
    BOOST_TEST(fitMessage(arguments) == "inputs: row 3, column 1 is 0; logs need positive values");

    arguments = goodArguments();
    arguments.output.set(7, 0, -5.0);
    BOOST_TEST(fitMessage(arguments) == "output: row 8 is -5; logs need positive values");

    // Controls are entered as they are, so a negative control is fine.
    arguments = goodArguments();
    Eigen::MatrixXd trend(24, 1);
    for (int row = 0; row < 24; ++row) trend(row, 0) = row - 12.0;
    arguments.controls = isoquant::testing::numberRange(trend, {"trend"});
    BOOST_TEST(isoquant::fitFromArguments(arguments).controlLabels.size() == 1u);
}

BOOST_AUTO_TEST_CASE(values_that_are_not_finite_are_named)
{
    auto arguments = goodArguments();
    arguments.inputs.set(4, 0, notANumber);
    BOOST_TEST(fitMessage(arguments) == "inputs: row 5, column 1 is not a finite number");

    arguments = goodArguments();
    arguments.output.set(12, 0, infinity);
    BOOST_TEST(fitMessage(arguments) == "output: row 13 is not a finite number");

    arguments = goodArguments();
    Eigen::MatrixXd control = Eigen::MatrixXd::Ones(24, 1);
    control(20, 0) = -infinity;
    control(0, 0) = 2.0;
    arguments.controls = isoquant::testing::numberRange(control, {"z"});
    BOOST_TEST(fitMessage(arguments) == "controls: row 22 is not a finite number");

    CellTable bundles = isoquant::testing::typedRange({{1.0, notANumber}});
    BOOST_TEST(messageOf([&] { isoquant::outputColumn(typedModel(), bundles); }) ==
               "inputs: row 1, column 2 is not a finite number");
}

BOOST_AUTO_TEST_CASE(ranges_of_the_wrong_shape)
{
    auto arguments = goodArguments();
    arguments.output = arguments.inputs;
    BOOST_TEST(fitMessage(arguments) == "output: must be one column; it has 2");

    arguments = goodArguments();
    arguments.inputs = firstRows(arguments.inputs, 24); // header and 23 data rows
    BOOST_TEST(fitMessage(arguments) == "inputs: has 23 rows of data but output has 24 rows");

    // Both selections are 25 rows tall, but only the output's first row is text: the hint says so.
    arguments = goodArguments();
    arguments.inputs.set(0, 0, 100.0);
    arguments.inputs.set(0, 1, 100.0);
    BOOST_TEST(fitMessage(arguments) ==
               "inputs: has 25 rows of data but output has 24 rows (a header row of text was found in output only)");

    arguments = goodArguments();
    arguments.inputs = CellTable();
    BOOST_TEST(fitMessage(arguments) == "inputs: the range is empty");

    arguments = goodArguments();
    arguments.inputs = firstRows(arguments.inputs, 1);
    BOOST_TEST(fitMessage(arguments) == "inputs: holds a header row but no data");
}

// Three data rows for three parameters: the core refuses, needing at least one more row than
// parameters.
BOOST_AUTO_TEST_CASE(too_few_rows)
{
    auto arguments = goodArguments();
    arguments.output = firstRows(arguments.output, 4);
    arguments.inputs = firstRows(arguments.inputs, 4);
    BOOST_TEST(fitMessage(arguments) ==
               "too few rows: output and inputs have 3 rows of data for 3 parameters to estimate; need at least 4");

    // One row: too few rows is the message, before "output does not vary" (one value never varies).
    arguments = goodArguments();
    arguments.output = firstRows(arguments.output, 2);
    arguments.inputs = firstRows(arguments.inputs, 2);
    BOOST_TEST(fitMessage(arguments) ==
               "too few rows: output and inputs have 1 row of data for 3 parameters to estimate; need at least 4");
}

BOOST_AUTO_TEST_CASE(collinear_inputs_are_named)
{
    // C = 2·L: ln C = ln 2 + ln L, collinear with the constant.
    auto arguments = goodArguments();
    for (std::size_t row = 1; row < arguments.inputs.rows(); ++row)
        arguments.inputs.set(row, 1, 2.0 * arguments.inputs.number(row, 0));
    BOOST_TEST(fitMessage(arguments) ==
               "inputs: 'L' and 'C' together with ln A are collinear (inputs taken in logs); drop one of them");

    // A constant column cannot be told apart from ln A.
    arguments = goodArguments();
    for (std::size_t row = 1; row < arguments.inputs.rows(); ++row) arguments.inputs.set(row, 1, 100.0);
    BOOST_TEST(fitMessage(arguments) == "inputs: 'C' does not vary, so it cannot be told apart from ln A");
}

// The same output in every row leaves nothing to explain, whatever the value (the mean of 24
// equal logarithms need not round back to the logarithm itself).
BOOST_AUTO_TEST_CASE(output_without_variation_is_refused)
{
    for (const double value : {100.0, 50.0}) {
        auto arguments = goodArguments();
        for (std::size_t row = 1; row < arguments.output.rows(); ++row) arguments.output.set(row, 0, value);
        BOOST_TEST_INFO("every output " << value);
        BOOST_TEST(fitMessage(arguments) == "output: every row holds the same value; there is no variation to explain");
    }
}

// A column that is 0 in every row after taking logs (an input of 1 in every row, inputs equal in
// every row under constant returns, a control of zeros or of subnormal numbers) is a column alone
// in the null direction, without ln A: it is named as not varying, once, in the singular. The
// translog names the input before its terms (its log, square and products all vanish at once).
BOOST_AUTO_TEST_CASE(columns_of_zero_logs_are_named_as_not_varying)
{
    auto arguments = goodArguments();
    for (std::size_t row = 1; row < arguments.inputs.rows(); ++row) arguments.inputs.set(row, 1, 1.0);
    BOOST_TEST(fitMessage(arguments) == "inputs: 'C' does not vary, so it cannot be told apart from ln A");
    arguments.form = std::string("translog");
    BOOST_TEST(fitMessage(arguments) == "inputs: 'C' does not vary, so it cannot be told apart from ln A");

    arguments = goodArguments();
    for (std::size_t row = 1; row < arguments.inputs.rows(); ++row)
        arguments.inputs.set(row, 1, arguments.inputs.number(row, 0));
    arguments.constantReturns = 1.0;
    BOOST_TEST(fitMessage(arguments) == "inputs: 'L' (as ratios to 'C', since constant returns are imposed) does "
                                        "not vary, so it cannot be told apart from ln A");

    for (const double tiny : {0.0, 1e-310}) {
        arguments = goodArguments();
        Eigen::MatrixXd control(24, 1);
        for (Eigen::Index row = 0; row < 24; ++row) control(row, 0) = (row % 3) * tiny;
        arguments.controls = isoquant::testing::numberRange(control, {"overtime"});
        BOOST_TEST_INFO("control values (0, 1, 2)·" << tiny);
        BOOST_TEST(fitMessage(arguments) == "controls: control 'overtime' does not vary (numbers below 2.2e-308 "
                                            "count as 0), so it cannot be told apart from ln A");
    }
    arguments.form = std::string("translog");
    arguments.controls = isoquant::testing::numberRange(Eigen::MatrixXd::Constant(24, 1, 5.0), {"unemp"});
    BOOST_TEST(fitMessage(arguments) == "controls: control 'unemp' does not vary, so it cannot be told apart from ln A");
}

// A control that does not vary is named as a control; one collinear with an input names both.
BOOST_AUTO_TEST_CASE(collinear_controls_are_named)
{
    auto arguments = goodArguments();
    arguments.controls = isoquant::testing::numberRange(Eigen::MatrixXd::Constant(24, 1, 5.0), {"unemp"});
    BOOST_TEST(fitMessage(arguments) == "controls: control 'unemp' does not vary, so it cannot be told apart from ln A");

    arguments = goodArguments();
    Eigen::MatrixXd logLabour(24, 1);
    for (std::size_t row = 1; row < arguments.inputs.rows(); ++row)
        logLabour(static_cast<Eigen::Index>(row - 1), 0) = 3.0 * std::log(arguments.inputs.number(row, 0));
    arguments.controls = isoquant::testing::numberRange(logLabour, {"log hours"});
    BOOST_TEST(fitMessage(arguments) ==
               "inputs and controls: 'L' and control 'log hours' are collinear (inputs taken in logs); drop one of them");
}

BOOST_AUTO_TEST_CASE(option_words_and_numbers)
{
    auto arguments = goodArguments();
    arguments.form = text("cobb");
    BOOST_TEST(fitMessage(arguments) == "form: 'cobb' is not a form; use \"cobb-douglas\", \"ces\" or \"translog\"");
    // Form words ignore case; an option the form cannot take is named.
    arguments.form = text("CES");
    arguments.constantReturns = 1.0;
    BOOST_TEST(fitMessage(arguments) == "constant returns: cannot be imposed on the ces form; leave the argument empty");
    arguments.form = text("Translog");
    BOOST_TEST(fitMessage(arguments) ==
               "constant returns: cannot be imposed on the translog form; leave the argument empty");

    arguments = goodArguments();
    arguments.errors = text("hc");
    BOOST_TEST(fitMessage(arguments) ==
               "errors: 'hc' is not a kind of standard error; use \"classical\", \"hc1\", \"hc3\" or \"cluster\"");

    arguments = goodArguments();
    arguments.level = 1.5;
    BOOST_TEST(fitMessage(arguments) ==
               "level: 1.5 is not a confidence level; give a number between 0 and 1, such as 0.95");
    arguments.level = 0.0;
    BOOST_TEST(fitMessage(arguments) ==
               "level: 0 is not a confidence level; give a number between 0 and 1, such as 0.95");

    arguments = goodArguments();
    arguments.constantReturns = text("yes");
    BOOST_TEST(fitMessage(arguments) == "constant returns: 'yes' is not TRUE or FALSE (1 or 0)");
    arguments.constantReturns = 2.0;
    BOOST_TEST(fitMessage(arguments) == "constant returns: 2 is not TRUE or FALSE (1 or 0)");

    BOOST_TEST(messageOf([&] { isoquant::returnsVerdictCell(typedModel(), 1.0); }) ==
               "level: 1 is not a confidence level; give a number between 0 and 1, such as 0.95");
}

BOOST_AUTO_TEST_CASE(input_selectors)
{
    const CellTable bundles = isoquant::testing::typedRange({{100.0, 120.0}});
    BOOST_TEST(messageOf([&] { isoquant::marginalProductColumn(typedModel(), bundles, 3.0); }) ==
               "input: 3 is not an input number; the model has 2 inputs");
    BOOST_TEST(messageOf([&] { isoquant::marginalProductColumn(typedModel(), bundles, 0.0); }) ==
               "input: 0 is not an input number; the model has 2 inputs");
    BOOST_TEST(messageOf([&] { isoquant::elasticityColumn(typedModel(), bundles, 1.5); }) ==
               "input: 1.5 is not an input number; the model has 2 inputs");
    BOOST_TEST(messageOf([&] { isoquant::elasticityColumn(typedModel(), bundles, text("land")); }) ==
               "input: 'land' is not an input of the model; its inputs are 'labour', 'capital'");
    BOOST_TEST(messageOf([&] { isoquant::marginalProductColumn(typedModel(), bundles, Cell{}); }) ==
               "input: give the input's number (1 for the first) or its label");
}

BOOST_AUTO_TEST_CASE(malformed_models)
{
    const CellTable bundles = isoquant::testing::typedRange({{100.0, 120.0}});
    const auto outputMessage = [&](const CellTable& model) {
        return messageOf([&] { isoquant::outputColumn(model, bundles); });
    };
    using isoquant::testing::typedRange;
    BOOST_TEST(outputMessage(typedRange({{text("A"), 1.01}, {text("labour"), 0.75}, {text("capital"), 0.25}})) ==
               "model: has no \"form\" row (for example: form | cobb-douglas)");
    BOOST_TEST(outputMessage(typedRange({{text("form"), text("cobb-douglas")},
                                         {text("A"), 1.01},
                                         {text("labour"), text("0.75x")},
                                         {text("capital"), 0.25}})) ==
               "model: row 3 ('labour') has no number in its second column");
    BOOST_TEST(outputMessage(typedRange({{text("form"), text("cobb-douglas")},
                                         {text("A"), 1.01},
                                         {0.75, 0.75},
                                         {text("capital"), 0.25}})) == "model: row 3 has no label in its first column");
    BOOST_TEST(outputMessage(typedRange({{text("form"), text("cobb-douglas")},
                                         {text("A"), -1.01},
                                         {text("labour"), 0.75}})) == "model: row 2 (A) must be positive");
    BOOST_TEST(outputMessage(typedRange(
                   {{text("form"), text("douglas")}, {text("A"), 1.01}, {text("labour"), 0.75}})) ==
               "model: row 1 (form) must hold \"cobb-douglas\", \"ces\" or \"translog\"");
    BOOST_TEST(outputMessage(typedRange({{text("form"), text("ces")}, {text("A"), 1.01}, {text("labour"), 0.75}})) ==
               "model: row 3 ('labour') is not a parameter of the ces form; its rows are delta, rho (or sigma) and nu");
    BOOST_TEST(outputMessage(typedRange({{text("form"), text("cobb-douglas")}, {text("labour"), 0.75}})) ==
               "model: row 2: 'labour' comes before the \"ln A\" (or \"A\") row; give ln A first, then one exponent "
               "row per input");
    BOOST_TEST(outputMessage(typedRange({{text("form"), text("cobb-douglas")}})) == "model: has no \"ln A\" (or \"A\") row");
    BOOST_TEST(outputMessage(typedRange({{text("form"), text("cobb-douglas")}, {text("ln A"), 0.01}})) ==
               "model: has no exponent rows, one per input after \"ln A\"");
    BOOST_TEST(outputMessage(typedRange({{text("form")}, {text("cobb-douglas")}})) ==
               "model: needs at least two columns, labels and values (a PRODFIT table or a typed model)");
    BOOST_TEST(outputMessage(typedRange({{text("form"), text("cobb-douglas")},
                                         {text("A"), 1.01},
                                         {text("labour"), 0.75},
                                         {Cell{}, Cell{}},
                                         {text("note"), 1.0}})) ==
               "model: row 5: 'note' is not a row of a model table");
}

BOOST_AUTO_TEST_CASE(bundles_for_a_model)
{
    // Three columns for a two-input model.
    const CellTable bundles = isoquant::testing::typedRange({{100.0, 120.0, 5.0}});
    BOOST_TEST(messageOf([&] { isoquant::outputColumn(typedModel(), bundles); }) ==
               "inputs: has 3 columns but the model has 2 inputs");
    const CellTable withText =
        isoquant::testing::typedRange({{text("L"), text("C")}, {100.0, 120.0}, {100.0, text("-")}});
    BOOST_TEST(messageOf([&] { isoquant::outputColumn(typedModel(), withText); }) ==
               "inputs: row 3, column 2 holds text '-'; every cell must hold a number");
}

// exp(400·ln 1e300) overflows a double: the evaluators say so rather than return inf.
BOOST_AUTO_TEST_CASE(results_too_large_to_represent)
{
    const CellTable model = isoquant::testing::typedRange(
        {{text("form"), text("cobb-douglas")}, {text("ln A"), 0.0}, {text("x"), 400.0}});
    const CellTable bundles = isoquant::testing::typedRange({{text("x")}, {2.0}, {1e300}});
    BOOST_TEST(messageOf([&] { isoquant::outputColumn(model, bundles); }) ==
               "inputs: row 3 gives a result too large to represent");
    BOOST_TEST(messageOf([&] { isoquant::marginalProductColumn(model, bundles, 1.0); }) ==
               "inputs: row 3 gives a result too large to represent");

    // Found by the fuzz target fuzz_evaluators: exponents summing past the largest double.
    const CellTable hugeExponents = isoquant::testing::typedRange(
        {{text("form"), text("cobb-douglas")}, {text("ln A"), 0.0}, {text("x"), 1e308}, {text("y"), 1e308}});
    BOOST_TEST(messageOf([&] { isoquant::scaleColumn(hugeExponents, CellTable()); }) ==
               "model: its returns to scale are too large to represent");
}

// From 100,000 rows a column is computed in two halves on two threads (production_functions.cpp):
// the same numbers as rows taken one by one, and the first row too large to represent is named, as
// if the rows were taken in order. Invented values: x from 1 to 2, 1e300 in the rows named.
BOOST_AUTO_TEST_CASE(a_long_column_names_its_first_row_too_large_to_represent)
{
    const CellTable model = isoquant::testing::typedRange(
        {{text("form"), text("cobb-douglas")}, {text("ln A"), 0.0}, {text("x"), 400.0}});
    const std::size_t rows = 150000; // and a header row: data row i is sheet row i + 2
    CellTable bundles(rows + 1, 1);
    bundles.set(0, 0, "x");
    for (std::size_t i = 0; i < rows; ++i) bundles.set(i + 1, 0, 1.0 + static_cast<double>(i) / rows);

    const CellTable whole = isoquant::marginalProductColumn(model, bundles, 1.0);
    BOOST_TEST_REQUIRE(whole.rows() == rows + 1);
    std::size_t differing = 0;
    for (std::size_t first = 0; first < rows; first += 50000) { // below the two-thread size: one thread
        CellTable piece(50001, 1);
        piece.set(0, 0, "x");
        for (std::size_t i = 0; i < 50000; ++i) piece.set(i + 1, 0, bundles.number(first + i + 1, 0));
        const CellTable part = isoquant::marginalProductColumn(model, piece, 1.0);
        for (std::size_t i = 0; i < 50000; ++i)
            differing += part.number(i + 1, 0) == whole.number(first + i + 1, 0) ? 0 : 1;
    }
    BOOST_TEST(differing == 0u);

    bundles.set(120001, 0, 1e300); // data row 120,000: in the second half
    bundles.set(130001, 0, 1e300);
    BOOST_TEST(messageOf([&] { isoquant::marginalProductColumn(model, bundles, 1.0); }) ==
               "inputs: row 120002 gives a result too large to represent");
    bundles.set(11, 0, 1e300); // data row 10: in the first half, named before the second half's
    BOOST_TEST(messageOf([&] { isoquant::marginalProductColumn(model, bundles, 1.0); }) ==
               "inputs: row 12 gives a result too large to represent");
}

BOOST_AUTO_TEST_SUITE_END()

// The panel options are built on the cobb-douglas fit; the other forms refuse them, never ignore them.
BOOST_AUTO_TEST_SUITE(panel_options_with_other_forms)

BOOST_AUTO_TEST_CASE(are_refused_by_name)
{
    auto arguments = isoquant::testing::statePanelWithPanelColumns();
    arguments.form = std::string("translog");
    arguments.effects = std::string("fixed");
    BOOST_TEST(messageOf([&] { isoquant::fitFromArguments(arguments); }) ==
               "effects: group or period effects work only with the cobb-douglas form, not with \"translog\"");
    arguments.effects = Cell{};
    BOOST_TEST(messageOf([&] { isoquant::fitFromArguments(arguments); }) ==
               "trend: a trend works only with the cobb-douglas form, not with \"translog\"");
    arguments.trend = CellTable{};
    arguments.form = std::string("ces");
    BOOST_TEST(messageOf([&] { isoquant::fitFromArguments(arguments); }) ==
               "groups: a group column works only with the cobb-douglas form, not with \"ces\"");
}

// Header rows: a gap in the labels and a label used twice are named (issue 14, items 6 and 12).
BOOST_AUTO_TEST_CASE(header_rows_give_every_column_its_own_label)
{
    auto arguments = goodArguments();
    arguments.inputs.set(0, 0, Cell{});
    BOOST_TEST(fitMessage(arguments) == "inputs: row 1, column 1 is an empty header; give every column a label or none");

    arguments = goodArguments();
    arguments.inputs.set(0, 1, text("l"));
    BOOST_TEST(fitMessage(arguments) == "inputs: the label 'l' heads two columns; give every column its own label");
}

// A last row holding the column sums (a totals row selected with the data) is refused, named by
// its row in the selection; a last row that is the total in output alone is data like any other.
BOOST_AUTO_TEST_CASE(a_totals_row_is_refused)
{
    auto arguments = goodArguments();
    const std::size_t rows = arguments.output.rows(); // header and 24 data rows
    CellTable output(rows + 1, 1), inputs(rows + 1, 2);
    for (std::size_t row = 0; row < rows; ++row) {
        output.set(row, 0, arguments.output.at(row, 0));
        for (std::size_t column = 0; column < 2; ++column) inputs.set(row, column, arguments.inputs.at(row, column));
    }
    double outputSum = 0, inputSums[2] = {0, 0};
    for (std::size_t row = 1; row < rows; ++row) {
        outputSum += output.number(row, 0);
        for (std::size_t column = 0; column < 2; ++column) inputSums[column] += inputs.number(row, column);
    }
    output.set(rows, 0, outputSum);
    inputs.set(rows, 0, inputSums[0]);
    inputs.set(rows, 1, inputSums[1] * (1 + 1e-12)); // typed sums agree to rounding
    arguments.output = output;
    arguments.inputs = inputs;
    BOOST_TEST(fitMessage(arguments) == "row 26 looks like a total of the rows above; leave it out of the ranges");

    arguments.inputs.set(rows, 1, inputSums[1] * 1.01);
    BOOST_TEST(isoquant::fitFromArguments(arguments).inference.estimates.size() == 3);
}

BOOST_AUTO_TEST_SUITE_END()
