// The table PRODGROWTH returns.
//
// Layout (k inputs, n periods; n + 1 rows and k + 4 columns):
//   period | output growth | <input label 1> … <input label k> | scale effect | TFP growth   header
//   2      | g_Y           | c₁ … c_k                         | s            | r            one row per
//   …                                                                                      period 2…n
//   total  | ln Y_n − ln Y_1 | Σ c₁ … Σ c_k                   | Σ s          | residual     the span
// "period" is the position of the period in the ranges (the first data row is period 1), or its
// name when PRODGROWTH is given `periods`. Growth
// figures are natural-log differences (0.05 is about 5%); the formulas are in growth_accounting.hpp.
// In every row the columns after "output growth" add up to it, to rounding.
#pragma once

#include "isoquant/sheet/arguments/cells.hpp"
#include "isoquant/math/growth/growth_accounting.hpp"

#include <array>
#include <string>
#include <vector>

namespace isoquant {

inline constexpr const char* periodHeader = "period";
inline constexpr const char* outputGrowthHeader = "output growth";
inline constexpr const char* scaleEffectHeader = "scale effect";
inline constexpr const char* productivityGrowthHeader = "TFP growth";
inline constexpr const char* totalLabel = "total";

// `periodNames` (empty, or one per period) label the rows instead of the positions 2, 3, ….
CellTable growthTable(const GrowthAccount& account, const std::vector<std::string>& inputLabels,
                      const std::vector<Cell>& periodNames = {});

// Rows and columns growthTable produces for n periods and k inputs: n + 1 and k + 4.
inline std::size_t growthTableRows(std::size_t periods) { return periods + 1; }
inline std::size_t growthTableColumns(std::size_t inputs) { return inputs + 4; }

} // namespace isoquant
