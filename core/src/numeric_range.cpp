#include "isoquant/numeric_range.hpp"

#include "isoquant/input_error.hpp"
#include "isoquant/text.hpp"
#include "isoquant/work_limits.hpp"

#include <cmath>
#include <stdexcept>

namespace isoquant {

namespace {

bool rowIsAllText(const CellTable& range, std::size_t row)
{
    for (std::size_t column = 0; column < range.columns(); ++column)
        if (!isText(range.at(row, column)) || std::get<std::string>(range.at(row, column)).empty()) return false;
    return true;
}

std::string place(const std::string& argument, std::size_t row, std::size_t column, std::size_t columns)
{
    std::string text = argument + ": row " + std::to_string(row + 1);
    if (columns > 1) text += ", column " + std::to_string(column + 1);
    return text;
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
    const std::size_t firstRow = result.hasHeader ? 1 : 0;
    const std::size_t columns = range.columns();
    for (std::size_t column = 0; column < columns; ++column)
        result.labels.push_back(result.hasHeader ? std::get<std::string>(range.at(0, column))
                                                 : defaultLabelPrefix + " " + std::to_string(column + 1));
    if (range.rows() == firstRow) throw InputError(argument + ": holds a header row but no data");

    if (skippedRows && skippedRows->size() != range.rows() - firstRow)
        throw std::invalid_argument("skippedRows: one flag per data row is needed");
    auto skipped = [&](std::size_t row) { return skippedRows && (*skippedRows)[row - firstRow]; };
    Eigen::Index kept = 0;
    for (std::size_t row = firstRow; row < range.rows(); ++row) kept += skipped(row) ? 0 : 1;
    result.values.resize(kept, static_cast<Eigen::Index>(columns));
    Eigen::Index target = 0;
    for (std::size_t row = firstRow; row < range.rows(); ++row) {
        if (skipped(row)) continue;
        for (std::size_t column = 0; column < columns; ++column) {
            const Cell& cell = range.at(row, column);
            if (isEmpty(cell))
                throw InputError(place(argument, row, column, columns) + " is empty; every cell must hold a number");
            if (isText(cell))
                throw InputError(place(argument, row, column, columns) + " holds text " +
                                 quoted(std::get<std::string>(cell)) + "; every cell must hold a number");
            const double value = std::get<double>(cell);
            if (!std::isfinite(value))
                throw InputError(place(argument, row, column, columns) + " is not a finite number");
            if (rule == ValueRule::positive && value <= 0)
                throw InputError(place(argument, row, column, columns) + " is " + formatNumber(value) +
                                 "; logs need positive values");
            result.values(target, static_cast<Eigen::Index>(column)) = value;
        }
        ++target;
    }
    return result;
}

} // namespace isoquant
