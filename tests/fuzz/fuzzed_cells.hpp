// Turns fuzzer bytes into the cells a user could hand the cell functions, biased towards ranges
// that nearly make sense (so that the fuzzer reaches the numerical code, not only the first check).
#pragma once

#include "isoquant/sheet/arguments/cells.hpp"

#include <fuzzer/FuzzedDataProvider.h>

#include <cmath>
#include <cstdlib>
#include <initializer_list>
#include <limits>
#include <string>
#include <vector>

namespace isoquant::fuzzing {

inline double awkwardNumber(FuzzedDataProvider& data)
{
    static const double values[] = {0.0, -0.0, -1.0, 1.0, 1e-300, 1e300, 5e-324, -1e300,
                                    std::numeric_limits<double>::quiet_NaN(),
                                    std::numeric_limits<double>::infinity(),
                                    -std::numeric_limits<double>::infinity()};
    return values[data.ConsumeIntegralInRange<std::size_t>(0, std::size(values) - 1)];
}

inline Cell fuzzedCell(FuzzedDataProvider& data, const std::vector<std::string>& words = {})
{
    switch (data.ConsumeIntegralInRange<int>(0, 9)) {
    case 0: return Cell{};
    case 1: return data.ConsumeFloatingPoint<double>();
    case 2: return awkwardNumber(data);
    case 3: return static_cast<double>(data.ConsumeIntegralInRange<int>(-2, 30));
    case 4:
        if (!words.empty()) return words[data.ConsumeIntegralInRange<std::size_t>(0, words.size() - 1)];
        return data.ConsumeRandomLengthString(12);
    case 5: return data.ConsumeRandomLengthString(12);
    default: return 0.5 + 200.0 * data.ConsumeProbability<double>(); // a plausible positive amount
    }
}

inline CellTable fuzzedTable(FuzzedDataProvider& data, std::size_t rows, std::size_t columns,
                             const std::vector<std::string>& words = {})
{
    CellTable table(rows, columns);
    for (std::size_t row = 0; row < rows; ++row)
        for (std::size_t column = 0; column < columns; ++column) table.set(row, column, fuzzedCell(data, words));
    return table;
}

// A crash here is a finding: a number shown in a cell must be finite (Calc shows #NUM! otherwise).
inline void requireFiniteNumbers(const CellTable& table)
{
    for (std::size_t row = 0; row < table.rows(); ++row)
        for (std::size_t column = 0; column < table.columns(); ++column)
            if (table.isNumber(row, column) && !std::isfinite(table.number(row, column))) std::abort();
}

} // namespace isoquant::fuzzing
