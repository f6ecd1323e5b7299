// The quiet NaN that marks a figure that is not defined (a standard error at a boundary, an
// untested p-value); a table shows it as "n/a".
#pragma once

#include <limits>

namespace isoquant {

inline constexpr double notANumber = std::numeric_limits<double>::quiet_NaN();

} // namespace isoquant
