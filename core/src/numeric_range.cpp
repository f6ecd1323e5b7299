#include "isoquant/numeric_range.hpp"

#include "isoquant/input_error.hpp"
#include "isoquant/text.hpp"

#include <cmath>

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

NumericColumns readNumericColumns(const CellTable& range, const std::string& argument, ValueRule rule,
                                  const std::string& defaultLabelPrefix)
{
    if (range.empty()) throw InputError(argument + ": the range is empty");

    NumericColumns result;
    result.hasHeader = rowIsAllText(range, 0);
    const std::size_t firstRow = result.hasHeader ? 1 : 0;
    const std::size_t columns = range.columns();
    for (std::size_t column = 0; column < columns; ++column)
        result.labels.push_back(result.hasHeader ? std::get<std::string>(range.at(0, column))
                                                 : defaultLabelPrefix + " " + std::to_string(column + 1));
    if (range.rows() == firstRow) throw InputError(argument + ": holds a header row but no data");

    result.values.resize(static_cast<Eigen::Index>(range.rows() - firstRow), static_cast<Eigen::Index>(columns));
    for (std::size_t row = firstRow; row < range.rows(); ++row) {
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
            result.values(static_cast<Eigen::Index>(row - firstRow), static_cast<Eigen::Index>(column)) = value;
        }
    }
    return result;
}

} // namespace isoquant
