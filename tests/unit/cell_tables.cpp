#include "cell_tables.hpp"

#include <stdexcept>

namespace isoquant::testing {

CellTable numberRange(const Eigen::MatrixXd& values, const std::vector<std::string>& labels)
{
    const std::size_t header = labels.empty() ? 0 : 1;
    if (header && labels.size() != static_cast<std::size_t>(values.cols()))
        throw std::invalid_argument("numberRange: one label per column");
    CellTable range(static_cast<std::size_t>(values.rows()) + header, static_cast<std::size_t>(values.cols()));
    for (std::size_t column = 0; column < labels.size(); ++column) range.set(0, column, labels[column]);
    for (Eigen::Index row = 0; row < values.rows(); ++row)
        for (Eigen::Index column = 0; column < values.cols(); ++column)
            range.set(static_cast<std::size_t>(row) + header, static_cast<std::size_t>(column), values(row, column));
    return range;
}

CellTable typedRange(std::initializer_list<std::initializer_list<Cell>> rows)
{
    const std::size_t columns = rows.size() == 0 ? 0 : rows.begin()->size();
    CellTable range(rows.size(), columns);
    std::size_t row = 0;
    for (const auto& cells : rows) {
        if (cells.size() != columns) throw std::invalid_argument("typedRange: rows of different lengths");
        std::size_t column = 0;
        for (const auto& cell : cells) range.set(row, column++, cell);
        ++row;
    }
    return range;
}

Eigen::VectorXd columnValues(const CellTable& column)
{
    if (column.columns() != 1) throw std::invalid_argument("columnValues: not one column");
    Eigen::VectorXd values(static_cast<Eigen::Index>(column.rows()));
    for (std::size_t row = 0; row < column.rows(); ++row)
        values(static_cast<Eigen::Index>(row)) = column.number(row, 0);
    return values;
}

Eigen::VectorXd columnValuesUnder(const CellTable& column, const std::string& title)
{
    if (column.rows() < 2 || !column.isText(0, 0) || column.text(0, 0) != title)
        throw std::invalid_argument("columnValuesUnder: the column does not start with '" + title + "'");
    CellTable below(column.rows() - 1, 1);
    for (std::size_t row = 1; row < column.rows(); ++row) below.set(row - 1, 0, column.at(row, 0));
    return columnValues(below);
}

} // namespace isoquant::testing
