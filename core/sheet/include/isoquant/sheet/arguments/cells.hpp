// A rectangle of spreadsheet cells as the core sees them: empty, a number or a text.
// The add-in converts Calc's arguments into this; the core never sees a UNO type.
#pragma once

#include <cstddef>
#include <cstdint>
#include <string>
#include <variant>
#include <vector>

namespace isoquant {

// One cell on its own (an option argument, say). A CellTable does not store these: see below.
using Cell = std::variant<std::monostate, double, std::string>;

inline bool isEmpty(const Cell& cell) { return std::holds_alternative<std::monostate>(cell); }
inline bool isNumber(const Cell& cell) { return std::holds_alternative<double>(cell); }
inline bool isText(const Cell& cell) { return std::holds_alternative<std::string>(cell); }
// An optional argument left out: an empty cell or an empty text (what Calc passes for a skipped one).
inline bool isOmitted(const Cell& cell) { return isEmpty(cell) || (isText(cell) && std::get<std::string>(cell).empty()); }

// In the order of Cell's alternatives, so that kind == Cell::index().
enum class CellKind : std::uint8_t { empty = 0, number = 1, text = 2 };

// Stored compactly, because ranges of a million rows are common: a kind byte and a double slot
// per cell, column by column (9 bytes a cell, and a column of numbers is one contiguous array),
// and the texts aside, so that only a text cell pays for a string. A text cell's slot holds the
// position of its text in `texts_`; an empty cell's slot holds 0.
class CellTable {
public:
    CellTable() = default;
    // Every cell empty.
    CellTable(std::size_t rows, std::size_t columns)
        : rows_(rows), columns_(columns), kinds_(rows * columns, CellKind::empty), slots_(rows * columns, 0.0)
    {
    }

    std::size_t rows() const { return rows_; }
    std::size_t columns() const { return columns_; }
    bool empty() const { return kinds_.empty(); }

    CellKind kind(std::size_t row, std::size_t column) const { return kinds_[place(row, column)]; }
    bool isEmpty(std::size_t row, std::size_t column) const { return kind(row, column) == CellKind::empty; }
    bool isNumber(std::size_t row, std::size_t column) const { return kind(row, column) == CellKind::number; }
    bool isText(std::size_t row, std::size_t column) const { return kind(row, column) == CellKind::text; }
    // The number of a number cell (only there: check isNumber first).
    double number(std::size_t row, std::size_t column) const { return slots_[place(row, column)]; }
    // The text of a text cell (only there: check isText first).
    const std::string& text(std::size_t row, std::size_t column) const
    {
        return texts_[static_cast<std::size_t>(slots_[place(row, column)])];
    }
    // A copy of one cell, for code that handles a cell whatever its kind.
    Cell at(std::size_t row, std::size_t column) const;

    // Column `column`'s kinds and slots, rows() of each, top to bottom: a slot is that cell's
    // number where the kind is CellKind::number, and means nothing elsewhere.
    const CellKind* columnKinds(std::size_t column) const { return kinds_.data() + column * rows_; }
    const double* columnSlots(std::size_t column) const { return slots_.data() + column * rows_; }

    void set(std::size_t row, std::size_t column, double number)
    {
        const std::size_t cell = place(row, column);
        if (kinds_[cell] == CellKind::text) releaseText(cell);
        kinds_[cell] = CellKind::number;
        slots_[cell] = number;
    }
    void set(std::size_t row, std::size_t column, std::string text);
    void set(std::size_t row, std::size_t column, const char* text) { set(row, column, std::string(text)); }
    void set(std::size_t row, std::size_t column, const Cell& cell);
    void setEmpty(std::size_t row, std::size_t column);

    // Equal shapes and equal cells: same kinds, numbers equal by ==, texts equal.
    bool operator==(const CellTable& other) const;
    bool operator!=(const CellTable& other) const { return !(*this == other); }

private:
    std::size_t place(std::size_t row, std::size_t column) const { return column * rows_ + row; }
    // Frees the text of the text cell at `cell` (its entry in texts_ stays, unused).
    void releaseText(std::size_t cell) { std::string().swap(texts_[static_cast<std::size_t>(slots_[cell])]); }

    std::size_t rows_ = 0;
    std::size_t columns_ = 0;
    std::vector<CellKind> kinds_; // column-major
    std::vector<double> slots_;   // column-major
    std::vector<std::string> texts_;
};

// A table holding one cell.
inline CellTable singleCell(const Cell& cell)
{
    CellTable table(1, 1);
    table.set(0, 0, cell);
    return table;
}

// The rows down to the last one that holds a number or a non-empty text in any column (0 when
// every cell is empty): a whole column selected as a range ends there.
std::size_t filledRows(const CellTable& table);

// The first `rows` rows of `table` (all of it when it has no more).
CellTable topRows(const CellTable& table, std::size_t rows);

} // namespace isoquant
