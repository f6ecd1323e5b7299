// PRODENVELOPE with bad input: each message names the argument and, where there is one, the row
// (counted from the top of the range, header included). Invented data.
#include "isoquant/sheet/functions/envelope_functions.hpp"
#include "cell_tables.hpp"
#include "input_error_message.hpp"

#include <boost/test/unit_test.hpp>

#include <limits>

using isoquant::Cell;
using isoquant::CellTable;
using isoquant::testing::messageOf;
using isoquant::testing::numberRange;

namespace {

// Four clinics: visits and operations, from nurses and beds (invented figures).
CellTable clinicOutputs()
{
    Eigen::MatrixXd values(4, 2);
    values << 1200, 30, 900, 45, 1500, 20, 700, 10;
    return numberRange(values, {"visits", "operations"});
}

CellTable clinicInputs()
{
    Eigen::MatrixXd values(4, 2);
    values << 14, 20, 12, 25, 18, 15, 9, 12;
    return numberRange(values, {"nurses", "beds"});
}

std::string messageFor(const CellTable& outputs, const CellTable& inputs, const Cell& returns = Cell(),
                       const Cell& orientation = Cell(), const Cell& what = Cell(), const CellTable& names = {})
{
    return messageOf([&] { isoquant::envelopeColumn(outputs, inputs, returns, orientation, what, names); });
}

CellTable with(CellTable range, std::size_t row, std::size_t column, const Cell& cell)
{
    range.set(row, column, cell);
    return range;
}

} // namespace

BOOST_AUTO_TEST_SUITE(envelope_bad_input)

BOOST_AUTO_TEST_CASE(text_blanks_and_non_finite_values_name_the_cell)
{
    BOOST_TEST(messageFor(with(clinicOutputs(), 2, 1, Cell(std::string("n/a"))), clinicInputs()) ==
               "outputs: row 3, column 2 holds text 'n/a'; every cell must hold a number");
    BOOST_TEST(messageFor(clinicOutputs(), with(clinicInputs(), 4, 0, Cell())) ==
               "inputs: row 5, column 1 is empty; every cell must hold a number");
    BOOST_TEST(messageFor(clinicOutputs(), with(clinicInputs(), 1, 1, Cell(std::numeric_limits<double>::quiet_NaN()))) ==
               "inputs: row 2, column 2 is not a finite number");
}

BOOST_AUTO_TEST_CASE(negative_and_zero_amounts)
{
    BOOST_TEST(messageFor(clinicOutputs(), with(clinicInputs(), 3, 1, Cell(-4.0))) ==
               "inputs: row 4, column 2 is -4; amounts must be zero or positive");
    BOOST_TEST(messageFor(with(clinicOutputs(), 1, 0, Cell(-1.0)), clinicInputs()) ==
               "outputs: row 2, column 1 is -1; amounts must be zero or positive");
    CellTable zeroBeds = clinicInputs();
    for (std::size_t row = 1; row <= 4; ++row) zeroBeds.set(row, 1, 0.0);
    BOOST_TEST(messageFor(clinicOutputs(), zeroBeds) == "inputs: the column 'beds' is 0 in every row; leave it out");
    // Twelve orders of magnitude within a column is an error of units (maximumAmountRatio).
    BOOST_TEST(messageFor(clinicOutputs(), with(clinicInputs(), 2, 0, Cell(1.2e14))) ==
               "inputs: the column 'nurses' holds 9 and 1.2e+14, more than 1e12 times as much; check the units (or "
               "enter 0 for none)");
    CellTable idleClinic = clinicOutputs();
    idleClinic.set(3, 0, 0.0);
    idleClinic.set(3, 1, 0.0);
    BOOST_TEST(messageFor(idleClinic, clinicInputs()) ==
               "outputs: row 4 is 0 in every column; every plant needs a positive output");
    CellTable unstaffed = clinicInputs();
    unstaffed.set(2, 0, 0.0);
    unstaffed.set(2, 1, 0.0);
    BOOST_TEST(messageFor(clinicOutputs(), unstaffed) ==
               "inputs: row 3 is 0 in every column; every plant needs a positive input");
}

BOOST_AUTO_TEST_CASE(shapes_and_an_empty_frontier)
{
    Eigen::MatrixXd three(3, 2);
    three << 14, 20, 12, 25, 18, 15;
    BOOST_TEST(messageFor(clinicOutputs(), numberRange(three, {"nurses", "beds"})) ==
               "inputs: has 3 rows of data but outputs has 4 rows; give one row per plant in both");
    Eigen::MatrixXd oneOutput(1, 2), oneInput(1, 2);
    oneOutput << 1200, 30;
    oneInput << 14, 20;
    BOOST_TEST(messageFor(numberRange(oneOutput), numberRange(oneInput)) ==
               "outputs: has 1 row of data, so the frontier is that plant alone; an envelope compares at least 2 "
               "plants");
    BOOST_TEST(messageFor(isoquant::testing::typedRange({{Cell("visits")}}), clinicInputs()) ==
               "outputs: holds a header row but no data");
    BOOST_TEST(messageFor(CellTable(), clinicInputs()) == "outputs: the range is empty");
    // The work cap (isoquant/sheet/functions/envelope_functions.hpp), checked before any LP.
    const CellTable many = numberRange(Eigen::MatrixXd::Ones(2001, 1));
    BOOST_TEST(messageFor(many, many) == "outputs: has 2,001 rows of data; an envelope solves a linear program over "
                                         "all rows for every row, so one call compares at most 2,000 rows");
}

BOOST_AUTO_TEST_CASE(option_words_and_names)
{
    BOOST_TEST(messageFor(clinicOutputs(), clinicInputs(), Cell(std::string("increasing"))) ==
               "returns: 'increasing' is not a kind of returns to scale; use \"constant\", \"variable\" or "
               "\"non-increasing\"");
    BOOST_TEST(messageFor(clinicOutputs(), clinicInputs(), Cell(), Cell(2.0)) ==
               "orientation: 2 is not an orientation; use \"input\" or \"output\"");
    BOOST_TEST(messageFor(clinicOutputs(), clinicInputs(), Cell(), Cell(), Cell(std::string("rank"))) ==
               "what: 'rank' is not known; use \"score\", \"scale efficiency\", \"peers\" or \"target <input label>\"");
    BOOST_TEST(messageFor(clinicOutputs(), clinicInputs(), Cell(), Cell(), Cell(std::string("target doctors"))) ==
               "what: 'doctors' is not an input or output label; the inputs are 'nurses', 'beds'");
    const CellTable threeNames = isoquant::testing::typedRange({{Cell("North")}, {Cell("South")}, {Cell("East")}});
    BOOST_TEST(messageFor(clinicOutputs(), clinicInputs(), Cell(), Cell(), Cell(std::string("peers")), threeNames) ==
               "names: has 3 rows but outputs has 4 rows of data; give one name per plant (a header row may come "
               "first)");
    const CellTable gap =
        isoquant::testing::typedRange({{Cell("North")}, {Cell("South")}, {Cell()}, {Cell("West")}});
    BOOST_TEST(messageFor(clinicOutputs(), clinicInputs(), Cell(), Cell(), Cell(std::string("peers")), gap) ==
               "names: row 3 holds no name");
}

BOOST_AUTO_TEST_SUITE_END()
