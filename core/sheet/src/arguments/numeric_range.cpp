#include "isoquant/sheet/arguments/numeric_range.hpp"

#include "isoquant/math/messages/input_error.hpp"
#include "isoquant/math/messages/text.hpp"
#include "isoquant/sheet/arguments/range_limits.hpp"

#include <algorithm>
#include <cmath>
#include <stdexcept>

namespace isoquant {

namespace {

bool rowIsAllText(const CellTable& range, std::size_t row)
{
    for (std::size_t column = 0; column < range.columns(); ++column)
        if (!range.isText(row, column) || range.text(row, column).empty()) return false;
    return true;
}

// A first row of labels with a gap ("labour | (empty) | energy") is a header the user meant to
// give: say which label is missing instead of reporting the labels as text in the data.
void refuseHeaderGap(const CellTable& range, const std::string& argument)
{
    bool anyLabel = false;
    std::size_t firstGap = range.columns();
    for (std::size_t column = 0; column < range.columns(); ++column) {
        if (range.kind(0, column) == CellKind::number) return;
        const bool label = range.isText(0, column) && !range.text(0, column).empty();
        anyLabel |= label;
        if (!label && firstGap == range.columns()) firstGap = column;
    }
    if (anyLabel && firstGap < range.columns())
        throw InputError(argument + ": row 1, column " + std::to_string(firstGap + 1) +
                         " is an empty header; give every column a label or none");
}

// Two columns under one label would make every later choice by label ambiguous.
void refuseDuplicateLabels(const std::vector<std::string>& labels, const std::string& argument)
{
    for (std::size_t i = 0; i < labels.size(); ++i)
        for (std::size_t j = i + 1; j < labels.size(); ++j)
            if (equalsIgnoringCase(labels[i], labels[j]))
                throw InputError(argument + ": the label " + quoted(labels[j]) +
                                 " heads two columns; give every column its own label");
}

std::string place(const std::string& argument, std::size_t row, std::size_t column, std::size_t columns)
{
    std::string text = argument + ": row " + std::to_string(row + 1);
    if (columns > 1) text += ", column " + std::to_string(column + 1);
    return text;
}

bool isValid(CellKind kind, double slot, ValueRule rule)
{
    return kind == CellKind::number && std::isfinite(slot) && (rule == ValueRule::finite || slot > 0);
}

// Whether every cell from `firstRow` down is a number `rule` accepts: one pass over each column's
// contiguous kinds and numbers, without the per-cell bookkeeping of the checking loop.
bool allValid(const CellTable& range, std::size_t firstRow, ValueRule rule)
{
    for (std::size_t column = 0; column < range.columns(); ++column) {
        const CellKind* kinds = range.columnKinds(column);
        const double* slots = range.columnSlots(column);
        bool valid = true;
        for (std::size_t row = firstRow; row < range.rows(); ++row) valid &= isValid(kinds[row], slots[row], rule);
        if (!valid) return false;
    }
    return true;
}

// Throws the message for the cell at (row, column) unless it holds a number `rule` accepts.
void requireValid(const CellTable& range, std::size_t row, std::size_t column, const std::string& argument,
                  ValueRule rule)
{
    const std::size_t columns = range.columns();
    switch (range.kind(row, column)) {
    case CellKind::empty:
        throw InputError(place(argument, row, column, columns) + " is empty; every cell must hold a number");
    case CellKind::text:
        throw InputError(place(argument, row, column, columns) + " holds text " + quoted(range.text(row, column)) +
                         "; every cell must hold a number");
    case CellKind::number: break;
    }
    const double value = range.number(row, column);
    if (!std::isfinite(value)) throw InputError(place(argument, row, column, columns) + " is not a finite number");
    if (rule == ValueRule::positive && value <= 0)
        throw InputError(place(argument, row, column, columns) + " is " + formatNumber(value) +
                         "; logs need positive values");
}

} // namespace

bool hasHeaderRow(const CellTable& range) { return !range.empty() && rowIsAllText(range, 0); }

NumericColumns readNumericColumns(const CellTable& range, const std::string& argument, ValueRule rule,
                                  const std::string& defaultLabelPrefix, const std::vector<bool>* skippedRows)
{
    if (range.empty()) throw InputError(argument + ": the range is empty");
    checkRangeSize(range.rows(), range.columns(), argument);

    NumericColumns result;
    result.hasHeader = rowIsAllText(range, 0);
    if (!result.hasHeader && range.columns() > 1) refuseHeaderGap(range, argument);
    const std::size_t firstRow = result.hasHeader ? 1 : 0;
    const std::size_t columns = range.columns();
    for (std::size_t column = 0; column < columns; ++column)
        result.labels.push_back(result.hasHeader ? range.text(0, column)
                                                 : defaultLabelPrefix + " " + std::to_string(column + 1));
    if (result.hasHeader) refuseDuplicateLabels(result.labels, argument);
    if (range.rows() == firstRow) throw InputError(argument + ": holds a header row but no data");

    if (skippedRows && skippedRows->size() != range.rows() - firstRow)
        throw std::invalid_argument("skippedRows: one flag per data row is needed");
    auto skipped = [&](std::size_t row) { return skippedRows && (*skippedRows)[row - firstRow]; };
    Eigen::Index kept = 0;
    for (std::size_t row = firstRow; row < range.rows(); ++row) kept += skipped(row) ? 0 : 1;
    result.values.resize(kept, static_cast<Eigen::Index>(columns));
    // The common case, every cell a valid number: copied column by column. Otherwise cell by
    // cell in reading order, so that the message names the first bad cell row by row.
    if (!skippedRows && allValid(range, firstRow, rule)) {
        for (std::size_t column = 0; column < columns; ++column)
            std::copy_n(range.columnSlots(column) + firstRow, kept,
                        result.values.col(static_cast<Eigen::Index>(column)).data());
        return result;
    }
    Eigen::Index target = 0;
    for (std::size_t row = firstRow; row < range.rows(); ++row) {
        if (skipped(row)) continue;
        for (std::size_t column = 0; column < columns; ++column) {
            requireValid(range, row, column, argument, rule);
            result.values(target, static_cast<Eigen::Index>(column)) = range.number(row, column);
        }
        ++target;
    }
    return result;
}

} // namespace isoquant
