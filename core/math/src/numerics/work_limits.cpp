#include "isoquant/math/numerics/work_limits.hpp"

#include "isoquant/math/messages/input_error.hpp"
#include "isoquant/math/messages/text.hpp"

#include <algorithm>

namespace isoquant {

std::size_t evaluationsPerRun(std::size_t rows, std::size_t runs, std::size_t requested)
{
    if (rows == 0 || runs == 0) return requested;
    return std::max<std::size_t>(1, std::min(requested, maximumRowEvaluations / rows / runs));
}

void checkDesignSize(std::size_t rows, std::size_t columns, DataPart part, const std::string& what,
                     const std::string& advice)
{
    if (columns > 0 && rows > maximumDesignValues / columns)
        throw InputError({part}, what + " on " + groupedCount(rows) + " rows needs " + groupedCount(rows) +
                         " × " + groupedCount(columns) + " design values, more than the " +
                         groupedCount(maximumDesignValues) + " one call may hold; " + advice);
}

} // namespace isoquant
