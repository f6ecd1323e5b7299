#include "isoquant/sheet/arguments/cells.hpp"

namespace isoquant {

Cell CellTable::at(std::size_t row, std::size_t column) const
{
    switch (kind(row, column)) {
    case CellKind::number: return number(row, column);
    case CellKind::text: return text(row, column);
    case CellKind::empty: break;
    }
    return Cell{};
}

void CellTable::set(std::size_t row, std::size_t column, std::string text)
{
    const std::size_t cell = place(row, column);
    if (kinds_[cell] == CellKind::text) {
        texts_[static_cast<std::size_t>(slots_[cell])] = std::move(text);
        return;
    }
    kinds_[cell] = CellKind::text;
    slots_[cell] = static_cast<double>(texts_.size()); // exact: a table has far fewer than 2^53 cells
    texts_.push_back(std::move(text));
}

void CellTable::set(std::size_t row, std::size_t column, const Cell& cell)
{
    if (isoquant::isNumber(cell))
        set(row, column, std::get<double>(cell));
    else if (isoquant::isText(cell))
        set(row, column, std::get<std::string>(cell));
    else
        setEmpty(row, column);
}

void CellTable::setEmpty(std::size_t row, std::size_t column)
{
    const std::size_t cell = place(row, column);
    if (kinds_[cell] == CellKind::text) releaseText(cell);
    kinds_[cell] = CellKind::empty;
    slots_[cell] = 0.0;
}

bool CellTable::operator==(const CellTable& other) const
{
    if (rows_ != other.rows_ || columns_ != other.columns_ || kinds_ != other.kinds_) return false;
    for (std::size_t cell = 0; cell < kinds_.size(); ++cell) {
        switch (kinds_[cell]) {
        case CellKind::number:
            if (slots_[cell] != other.slots_[cell]) return false;
            break;
        case CellKind::text:
            if (texts_[static_cast<std::size_t>(slots_[cell])] !=
                other.texts_[static_cast<std::size_t>(other.slots_[cell])])
                return false;
            break;
        case CellKind::empty: break;
        }
    }
    return true;
}

std::size_t filledRows(const CellTable& table)
{
    std::size_t filled = 0;
    for (std::size_t column = 0; column < table.columns(); ++column) {
        const CellKind* kinds = table.columnKinds(column);
        // From the bottom up: a whole column's empty tail costs one byte compare a cell.
        for (std::size_t row = table.rows(); row > filled; --row) {
            const CellKind kind = kinds[row - 1];
            if (kind == CellKind::number || (kind == CellKind::text && !table.text(row - 1, column).empty())) {
                filled = row;
                break;
            }
        }
    }
    return filled;
}

CellTable topRows(const CellTable& table, std::size_t rows)
{
    if (rows >= table.rows()) return table;
    CellTable top(rows, table.columns());
    for (std::size_t column = 0; column < table.columns(); ++column)
        for (std::size_t row = 0; row < rows; ++row) {
            switch (table.kind(row, column)) {
            case CellKind::number: top.set(row, column, table.number(row, column)); break;
            case CellKind::text: top.set(row, column, table.text(row, column)); break;
            case CellKind::empty: break;
            }
        }
    return top;
}

} // namespace isoquant
