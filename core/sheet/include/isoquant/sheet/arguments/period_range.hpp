// Reads ranges whose data rows are periods 1…n, in time order (output, input quantities, cost
// shares of PRODGROWTH and PRODINDEX). An optional first row of text names the columns, as in
// readNumericColumns. Messages name the period and the row of the selection, for example
// "inputs: period 4 (row 5), column 2 is 0; quantities must be positive".
#pragma once

#include "isoquant/sheet/arguments/cells.hpp"
#include "isoquant/sheet/arguments/numeric_range.hpp"

#include <string>
#include <vector>

namespace isoquant {

enum class PeriodValueRule {
    positive,   // quantities and output: their logarithms are taken
    nonNegative // cost shares
};

// Throws InputError naming `argument`, the period and the row (and column when there are several).
NumericColumns readPeriodColumns(const CellTable& range, const std::string& argument, PeriodValueRule rule,
                                 const std::string& defaultLabelPrefix);

// "period 4 (row 5)" for the data row at 0-based `index` of `columns`; "period 2019 (row 5)" when
// the rows are named (columns.rowNames).
std::string periodPlace(const NumericColumns& columns, Eigen::Index index);

// The `periods` argument of PRODGROWTH and PRODINDEX: one year or name (a number or a text) per
// data row of `rows`, read from `argument`, under an optional header row (there exactly when the
// column has one row more). Throws InputError naming "periods" and the row.
std::vector<Cell> readPeriodNames(const CellTable& periods, const NumericColumns& rows,
                                  const std::string& rowsArgument);

// A period's name as text: "2019", "Q3".
std::string periodNameText(const Cell& name);

// How far a period's shares may stray from summing to 1: 0.99 ≤ Σᵢ sᵢ ≤ 1.01, both ends included.
// The check only catches columns that are not shares at all, or shares of a different set of
// inputs; shares that pass are rescaled to sum to exactly 1, so that rounded shares (0.33, 0.33,
// 0.33) keep the indexes' identity and proportionality and leave no spurious scale effect.
inline constexpr double shareSumTolerance = 0.01;

// shares.values with each period's row divided by its sum. Throws InputError naming `argument`
// and the first period whose shares miss 1 by more than shareSumTolerance.
Eigen::MatrixXd sharesRescaledToOne(const NumericColumns& shares, const std::string& argument);

// Share columns line up with `referenceLabels` (the inputs' or items' header) by position; column
// i must be headed by label i itself or name it the natural way: the word "share" and the label as
// whole words ("labour share", "share of labour", "labour cost share" for "labour"). Throws
// InputError naming `argument` for a column that heads another label, or that names two.
void requireShareLabels(const std::string& argument, const std::vector<std::string>& shareLabels,
                        const std::string& referenceNoun, const std::vector<std::string>& referenceLabels);

// Throws InputError when `other` has a different number of periods than `reference`.
void requireSamePeriods(const NumericColumns& reference, const std::string& referenceArgument,
                        const NumericColumns& other, const std::string& otherArgument);

} // namespace isoquant
