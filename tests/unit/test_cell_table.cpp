// CellTable: each cell keeps its kind (empty, number, text) and value through any sequence of
// writes; equality is by shape and content, whatever order the texts were written in; the rows
// and columns of readNumericColumns' messages are those of the range. Invented cells.
#include "isoquant/sheet/arguments/cells.hpp"
#include "isoquant/sheet/arguments/numeric_range.hpp"
#include "isoquant/math/messages/text.hpp"
#include "input_error_message.hpp"

#include <boost/test/unit_test.hpp>

#include <cmath>
#include <limits>
#include <string>

using isoquant::Cell;
using isoquant::CellKind;
using isoquant::CellTable;

namespace {

std::string readingMessage(const CellTable& range)
{
    return isoquant::testing::messageOf(
        [&] { isoquant::readNumericColumns(range, "inputs", isoquant::ValueRule::positive, "input"); });
}

} // namespace

BOOST_AUTO_TEST_SUITE(cell_table)

BOOST_AUTO_TEST_CASE(a_new_table_is_empty_everywhere)
{
    const CellTable table(3, 2);
    BOOST_TEST(table.rows() == 3u);
    BOOST_TEST(table.columns() == 2u);
    BOOST_TEST(!table.empty());
    for (std::size_t row = 0; row < 3; ++row)
        for (std::size_t column = 0; column < 2; ++column) {
            BOOST_TEST((table.kind(row, column) == CellKind::empty));
            BOOST_TEST(isoquant::isEmpty(table.at(row, column)));
        }
    BOOST_TEST(CellTable().empty());
    BOOST_TEST(CellTable(0, 4).empty());
}

BOOST_AUTO_TEST_CASE(cells_keep_kind_and_value_through_overwrites)
{
    CellTable table(2, 3);
    table.set(0, 0, 2.5);
    table.set(0, 1, std::string("capital"));
    table.set(1, 2, "labour");
    table.set(1, 0, Cell(std::string("été"))); // UTF-8 bytes are kept as they are
    BOOST_TEST(table.isNumber(0, 0));
    BOOST_TEST(table.number(0, 0) == 2.5);
    BOOST_TEST(table.isText(0, 1));
    BOOST_TEST(table.text(0, 1) == "capital");
    BOOST_TEST(table.text(1, 2) == "labour");
    BOOST_TEST(table.text(1, 0) == "été");
    BOOST_TEST(table.isEmpty(0, 2));
    BOOST_TEST((table.at(0, 0) == Cell(2.5)));
    BOOST_TEST((table.at(0, 1) == Cell(std::string("capital"))));

    // A text overwritten by a number, by an empty cell, by another text; the others untouched.
    table.set(0, 1, -7.0);
    BOOST_TEST(table.isNumber(0, 1));
    BOOST_TEST(table.number(0, 1) == -7.0);
    table.set(1, 2, Cell{});
    BOOST_TEST(table.isEmpty(1, 2));
    table.set(1, 0, std::string("materials"));
    BOOST_TEST(table.text(1, 0) == "materials");
    table.set(0, 1, std::string("energy")); // a number cell turned text again
    BOOST_TEST(table.text(0, 1) == "energy");
    table.setEmpty(0, 0);
    BOOST_TEST(table.isEmpty(0, 0));
    BOOST_TEST(table.text(1, 0) == "materials");
    // An empty text is a text cell, not an empty one (the add-in turns Calc's empty strings into
    // empty cells before they get here).
    table.set(1, 1, std::string());
    BOOST_TEST(table.isText(1, 1));
    BOOST_TEST(table.text(1, 1).empty());
}

BOOST_AUTO_TEST_CASE(a_column_of_numbers_is_contiguous)
{
    CellTable table(3, 2);
    table.set(0, 1, 1.0);
    table.set(1, 1, 2.0);
    table.set(2, 1, 3.0);
    table.set(1, 0, "text");
    const double* numbers = table.columnSlots(1);
    const CellKind* kinds = table.columnKinds(1);
    for (std::size_t row = 0; row < 3; ++row) {
        BOOST_TEST(numbers[row] == static_cast<double>(row + 1));
        BOOST_TEST((kinds[row] == CellKind::number));
    }
    BOOST_TEST((table.columnKinds(0)[1] == CellKind::text));
}

BOOST_AUTO_TEST_CASE(equality_is_by_shape_and_content)
{
    CellTable left(2, 2);
    left.set(0, 0, "ln A");
    left.set(0, 1, 0.6);
    left.set(1, 0, "capital");
    // The same content, texts written in the other order and one text written twice.
    CellTable right(2, 2);
    right.set(1, 0, "labour");
    right.set(1, 0, "capital");
    right.set(0, 0, "ln A");
    right.set(0, 1, 0.6);
    BOOST_TEST((left == right));

    CellTable number = right;
    number.set(0, 1, 0.6000000000000001);
    BOOST_TEST((left != number));
    CellTable text = right;
    text.set(1, 0, "Capital"); // case counts: the cells differ, whatever a reader makes of them
    BOOST_TEST((left != text));
    CellTable emptyText = right;
    emptyText.set(1, 1, std::string()); // an empty text is not an empty cell
    BOOST_TEST((left != emptyText));
    CellTable numberForText = right;
    numberForText.set(1, 0, 0.0);
    BOOST_TEST((left != numberForText));

    // Same cells in another shape.
    CellTable row(1, 4), column(4, 1);
    for (std::size_t i = 0; i < 4; ++i) {
        row.set(0, i, 1.0);
        column.set(i, 0, 1.0);
    }
    BOOST_TEST((row != column));
    BOOST_TEST((CellTable(0, 2) != CellTable(2, 0)));

    // Numbers compare by == as Cell does: -0 equals 0, and a NaN equals nothing.
    CellTable zero(1, 1), negativeZero(1, 1), nan(1, 1);
    zero.set(0, 0, 0.0);
    negativeZero.set(0, 0, -0.0);
    nan.set(0, 0, std::numeric_limits<double>::quiet_NaN());
    BOOST_TEST((zero == negativeZero));
    BOOST_TEST((nan != nan));
}

BOOST_AUTO_TEST_CASE(single_cell_tables)
{
    BOOST_TEST(isoquant::singleCell(3.0).number(0, 0) == 3.0);
    BOOST_TEST(isoquant::singleCell(std::string("n/a")).text(0, 0) == "n/a");
    BOOST_TEST(isoquant::singleCell(Cell{}).isEmpty(0, 0));
}

// The all-numbers read and the cell-by-cell read give the same numbers; a bad cell is reported
// by its place in the range, the first in reading order (row by row) when there are several.
BOOST_AUTO_TEST_CASE(numeric_columns_read_alike_either_way)
{
    CellTable range(4, 2);
    range.set(0, 0, "capital");
    range.set(0, 1, "labour");
    for (std::size_t row = 1; row < 4; ++row) {
        range.set(row, 0, static_cast<double>(row));
        range.set(row, 1, 10.0 * static_cast<double>(row));
    }
    const auto all = isoquant::readNumericColumns(range, "inputs", isoquant::ValueRule::positive, "input");
    const std::vector<bool> keepAll(3, false);
    const auto checked =
        isoquant::readNumericColumns(range, "inputs", isoquant::ValueRule::positive, "input", &keepAll);
    BOOST_TEST(all.hasHeader);
    BOOST_TEST((all.labels == std::vector<std::string>{"capital", "labour"}));
    BOOST_TEST(all.values.rows() == 3);
    BOOST_TEST(all.values(2, 1) == 30.0);
    BOOST_TEST((all.values == checked.values));

    CellTable bad = range;
    bad.set(3, 0, -1.0);
    bad.set(2, 1, std::string("n.a."));
    BOOST_TEST(readingMessage(bad) == "inputs: row 3, column 2 holds text 'n.a.'; every cell must hold a number");
    bad.set(2, 1, Cell{});
    BOOST_TEST(readingMessage(bad) == "inputs: row 3, column 2 is empty; every cell must hold a number");
    bad.set(2, 1, std::numeric_limits<double>::infinity());
    BOOST_TEST(readingMessage(bad) == "inputs: row 3, column 2 is not a finite number");
    bad.set(2, 1, 5.0);
    BOOST_TEST(readingMessage(bad) == "inputs: row 4, column 1 is -1; logs need positive values");
}

BOOST_AUTO_TEST_CASE(labels_compare_ignoring_ascii_case_only)
{
    BOOST_TEST(isoquant::equalsIgnoringCase("Smearing Factor", "smearing factor"));
    BOOST_TEST(!isoquant::equalsIgnoringCase("ln A", "ln A "));
    BOOST_TEST(!isoquant::equalsIgnoringCase("capital", "capitol"));
    // Bytes beyond ASCII are compared as they are: "É" (C3 89) and "é" (C3 A9) differ.
    BOOST_TEST(!isoquant::equalsIgnoringCase("\xC3\x89t\xC3\xA9", "\xC3\xA9t\xC3\xA9"));
    BOOST_TEST(isoquant::equalsIgnoringCase("\xC3\xA9T\xC3\xA9", "\xC3\xA9t\xC3\xA9"));
    BOOST_TEST(isoquant::lowerCase("CES @[Z]") == "ces @[z]");
}

// Numbers in messages read as Calc shows them (15 significant digits), shortest form.
BOOST_AUTO_TEST_CASE(numbers_in_messages_are_rounded_to_what_matters)
{
    BOOST_TEST(isoquant::formatNumber(0.6 + 0.3896) == "0.9896");
    BOOST_TEST(isoquant::formatNumber(0.1 + 0.2) == "0.3"); // 0.30000000000000004 in binary
    BOOST_TEST(isoquant::formatNumber(100) == "100");
    BOOST_TEST(isoquant::formatNumber(0.25) == "0.25");
    BOOST_TEST(isoquant::formatNumber(-0.1) == "-0.1");
    BOOST_TEST(isoquant::formatNumber(1e-300) == "1e-300");
    BOOST_TEST(isoquant::formatNumber(2015) == "2015");
    BOOST_TEST(isoquant::formatNumber(123456789.125) == "123456789.125");
}

// A German locale setting (the add-in passes the office's) writes "0,9896" and "1.048.576", in
// computed numbers, numbers written in the source and counts alike; the default comes back.
BOOST_AUTO_TEST_CASE(numbers_in_messages_follow_the_locale_punctuation)
{
    isoquant::setNumberPunctuation({",", "."});
    BOOST_TEST(isoquant::formatNumber(0.6 + 0.3896) == "0,9896");
    BOOST_TEST(isoquant::formatNumber(4.8e-17, 3) == "4,8e-17");
    BOOST_TEST(isoquant::localDecimal("1.8e308") == "1,8e308");
    BOOST_TEST(isoquant::groupedCount(1048576) == "1.048.576");
    BOOST_TEST(isoquant::groupedCount(999) == "999");
    // A French locale groups with a no-break space (UTF-8 C2 A0).
    isoquant::setNumberPunctuation({",", "\xC2\xA0"});
    BOOST_TEST(isoquant::groupedCount(33554432) == "33\xC2\xA0" "554\xC2\xA0" "432");
    isoquant::setNumberPunctuation({});
    BOOST_TEST(isoquant::formatNumber(0.25) == "0.25");
    BOOST_TEST(isoquant::groupedCount(1048576) == "1,048,576");
}

BOOST_AUTO_TEST_CASE(filled_rows_and_top_rows)
{
    CellTable table(10, 2);
    BOOST_TEST(isoquant::filledRows(table) == 0u);
    table.set(0, 0, "label");
    table.set(3, 1, 2.5);
    table.set(6, 0, std::string()); // an empty text is no value
    BOOST_TEST(isoquant::filledRows(table) == 4u);
    const CellTable top = isoquant::topRows(table, 4);
    BOOST_TEST((top.rows() == 4u && top.columns() == 2u));
    BOOST_TEST(top.text(0, 0) == "label");
    BOOST_TEST(top.number(3, 1) == 2.5);
    BOOST_TEST(top.isEmpty(3, 0));
    BOOST_TEST((isoquant::topRows(table, 20) == table));
}

BOOST_AUTO_TEST_SUITE_END()
