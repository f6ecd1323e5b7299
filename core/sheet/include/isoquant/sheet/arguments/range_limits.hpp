// Limits on the size of one range argument. Calc runs add-in calls on its main thread, inside the
// user's office: a range beyond these is refused with a message naming the argument before any
// copy of it is made (the limits on the work of a fit: math/numerics/work_limits.hpp).
#pragma once

#include <cstddef>
#include <string>

namespace isoquant {

// Rows of one range argument: 2²⁰ = 1,048,576, a whole column of a Calc 7.4 sheet.
constexpr std::size_t maximumRangeRows = std::size_t{1} << 20;
// Cells of one range argument: 2²⁴ ≈ 16.8 million (16 full columns); the core's copy of them is
// about 9 bytes a cell, beside Calc's own.
constexpr std::size_t maximumRangeCells = std::size_t{1} << 24;

// Throws InputError naming `argument` when a range has more rows or cells than allowed.
void checkRangeSize(std::size_t rows, std::size_t columns, const std::string& argument);

} // namespace isoquant
