// A rectangle of spreadsheet cells as the core sees them: empty, a number or a text.
// The add-in converts Calc's arguments into this; the core never sees a UNO type.
#pragma once

#include <cstddef>
#include <string>
#include <variant>
#include <vector>

namespace isoquant {

using Cell = std::variant<std::monostate, double, std::string>;

inline bool isEmpty(const Cell& cell) { return std::holds_alternative<std::monostate>(cell); }
inline bool isNumber(const Cell& cell) { return std::holds_alternative<double>(cell); }
inline bool isText(const Cell& cell) { return std::holds_alternative<std::string>(cell); }

class CellTable {
public:
    CellTable() = default;
    CellTable(std::size_t rows, std::size_t columns) : rows_(rows), columns_(columns), cells_(rows * columns) {}

    std::size_t rows() const { return rows_; }
    std::size_t columns() const { return columns_; }
    bool empty() const { return cells_.empty(); }

    const Cell& at(std::size_t row, std::size_t column) const { return cells_[row * columns_ + column]; }
    Cell& at(std::size_t row, std::size_t column) { return cells_[row * columns_ + column]; }

    bool operator==(const CellTable& other) const
    {
        return rows_ == other.rows_ && columns_ == other.columns_ && cells_ == other.cells_;
    }

private:
    std::size_t rows_ = 0;
    std::size_t columns_ = 0;
    std::vector<Cell> cells_; // row-major
};

// A table holding one cell.
inline CellTable singleCell(Cell cell)
{
    CellTable table(1, 1);
    table.at(0, 0) = std::move(cell);
    return table;
}

} // namespace isoquant
