// Shared by the PRODGROWTH and PRODTFP tests: series made by a known technology and TFP path
// (growth_series.hpp), the recovery tolerance and the check that every row of a growth table
// adds up.
#pragma once

#include "cell_tables.hpp"
#include "growth_series.hpp"

#include <boost/test/unit_test.hpp>

#include <cmath>
#include <limits>
#include <string>
#include <vector>

namespace isoquant::testing {

inline constexpr double epsilon = std::numeric_limits<double>::epsilon();

// Recovery tolerance: ln Y and ln xᵢ are below 20 in magnitude here, each log and difference
// carries a few units in the last place of 20 (about 4e-15), and a period's residual combines
// k + 2 ≤ 6 such terms with weights below 1: well under 1e-13. 1e-12 is the margin; a wrong
// weight moves TFP growth by about 1e-3 (input growth of SD 0.08 times weight errors of 0.01+).
inline constexpr double recoveryTolerance = 1e-12;

inline double number(const CellTable& table, std::size_t row, std::size_t column)
{
    return table.number(row, column);
}

// Every row of a PRODGROWTH table adds up (identity): output growth against the sum of the
// columns after it. The residual r = g − Σc − s is k + 1 roundings away from exact and the
// re-addition another k + 2, each bounded by u = ε/2 times the sum of magnitudes (recursive
// summation; N. J. Higham, Accuracy and Stability of Numerical Algorithms, 2nd ed., §4.2 (from
// memory)), so |g − (Σc + s + r)| ≤ (2k + 3)·u·Σ|terms| < (k + 2)·ε·Σ|terms|.
inline void checkRowsAddUp(const CellTable& table)
{
    const std::size_t columns = table.columns();
    const std::size_t k = columns - 4;
    for (std::size_t row = 1; row < table.rows(); ++row) {
        const double outputGrowth = number(table, row, 1);
        double sum = 0, magnitudes = std::fabs(outputGrowth);
        for (std::size_t column = 2; column < columns; ++column) {
            sum += number(table, row, column);
            magnitudes += std::fabs(number(table, row, column));
        }
        BOOST_TEST_INFO("row " << row + 1);
        BOOST_TEST(std::fabs(outputGrowth - sum) <= static_cast<double>(k + 2) * epsilon * magnitudes);
    }
}

struct Generated {
    Eigen::MatrixXd quantities;
    Eigen::VectorXd logProductivity;
    Eigen::VectorXd output;
};

inline Generated generate(unsigned seed, const isoquant::Technology& technology, Eigen::Index periods)
{
    std::mt19937 engine(seed);
    Generated made;
    made.quantities = wanderingQuantities(engine, periods, technology.inputCount());
    made.logProductivity = productivityPath(engine, periods);
    made.output = outputOf(technology, made.logProductivity, made.quantities);
    return made;
}

inline const std::vector<std::string> labels{"labour", "capital", "energy"};

inline CellTable labelledOutput(const Eigen::VectorXd& output) { return numberRange(output, {"output"}); }

} // namespace isoquant::testing
