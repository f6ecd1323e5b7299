// The `incomplete rows` switch for fits whose ranges are not PRODFIT's (PRODCOSTFIT): which data
// rows to leave out, and where a kept row lies in the ranges the user selected.
#pragma once

#include "isoquant/sheet/arguments/cells.hpp"

#include <string>
#include <utility>
#include <vector>

namespace isoquant {

// One flag per data row of the first range: set where any range holds a blank or a text cell in
// that row (below each range's own header row). Empty ranges (omitted options) are not read. Every
// range must have the first one's number of data rows (else InputError naming it); when every row
// is flagged, InputError naming `incomplete rows`.
std::vector<bool> findIncompleteRowsIn(const std::vector<std::pair<const CellTable*, std::string>>& namedRanges);

// The data row (0-based, counting dropped rows) of the `kept`-th row that was not dropped.
std::size_t dataRowOfKept(std::size_t kept, const std::vector<bool>& dropped);

} // namespace isoquant
