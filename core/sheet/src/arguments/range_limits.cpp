#include "isoquant/sheet/arguments/range_limits.hpp"

#include "isoquant/math/messages/input_error.hpp"
#include "isoquant/math/messages/text.hpp"

namespace isoquant {

void checkRangeSize(std::size_t rows, std::size_t columns, const std::string& argument)
{
    if (rows > maximumRangeRows)
        throw InputError(argument + ": the range has " + groupedCount(rows) + " rows; one call takes at most " +
                         groupedCount(maximumRangeRows) + " (a whole sheet column)");
    // Checked as rows > cells / columns, so that the product cannot overflow.
    if (columns > 0 && rows > maximumRangeCells / columns)
        throw InputError(argument + ": the range has " + groupedCount(rows) + " rows × " + groupedCount(columns) +
                         " columns; one call takes at most " + groupedCount(maximumRangeCells) + " cells");
}

} // namespace isoquant
