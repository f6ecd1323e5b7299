#include "isoquant/sheet/arguments/incomplete_rows.hpp"

#include "isoquant/sheet/arguments/argument_names.hpp"
#include "isoquant/math/messages/input_error.hpp"
#include "isoquant/sheet/arguments/numeric_range.hpp"

#include <algorithm>

namespace isoquant {

namespace {

std::string rowsOfData(std::size_t count) { return std::to_string(count) + (count == 1 ? " row" : " rows") + " of data"; }

} // namespace

std::vector<bool> findIncompleteRowsIn(const std::vector<std::pair<const CellTable*, std::string>>& namedRanges)
{
    const auto& [first, firstName] = namedRanges.front();
    const std::size_t dataRows = first->rows() - (hasHeaderRow(*first) ? 1 : 0);
    std::vector<bool> incomplete(dataRows, false);
    for (const auto& [range, name] : namedRanges) {
        if (range->empty()) continue;
        const std::size_t headerRows = hasHeaderRow(*range) ? 1 : 0;
        if (range->rows() - headerRows != dataRows)
            throw InputError(name + ": has " + rowsOfData(range->rows() - headerRows) + " but " + firstName + " has " +
                             rowsOfData(dataRows));
        for (std::size_t row = 0; row < dataRows; ++row)
            for (std::size_t column = 0; column < range->columns(); ++column) {
                const CellKind kind = range->kind(row + headerRows, column);
                if (kind == CellKind::empty || kind == CellKind::text) incomplete[row] = true;
            }
    }
    if (std::all_of(incomplete.begin(), incomplete.end(), [](bool flag) { return flag; }))
        throw argumentError(argument::incompleteRows, "every row has a blank or text cell; no row is left to fit");
    return incomplete;
}

std::size_t dataRowOfKept(std::size_t kept, const std::vector<bool>& dropped)
{
    std::size_t row = 0;
    for (std::size_t seen = 0;; ++row) {
        const bool used = row >= dropped.size() || !dropped[row];
        if (used && seen++ == kept) return row;
    }
}

} // namespace isoquant
