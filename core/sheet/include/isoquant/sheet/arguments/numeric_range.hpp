// Turns a range argument into numbers, with an optional header row of labels.
//
// Rows and columns in messages are counted 1-based from the top-left cell of the range the user
// selected, header row included, so "row 17" is the 17th row of the selection.
#pragma once

#include "isoquant/sheet/arguments/cells.hpp"

#include <Eigen/Dense>

#include <string>
#include <vector>

namespace isoquant {

enum class ValueRule {
    finite,  // any finite number (controls are entered as they are)
    positive // strictly positive: the value's logarithm is taken
};

struct NumericColumns {
    std::vector<std::string> labels; // from the header row, or "<prefix> 1", "<prefix> 2", …
    Eigen::MatrixXd values;          // data rows only
    bool hasHeader = false;
    // Names of the data rows for messages (the periods PRODGROWTH and PRODINDEX are given); empty
    // when the rows are only numbered.
    std::vector<std::string> rowNames;
    std::size_t firstDataRow() const { return hasHeader ? 2 : 1; } // 1-based, as in messages
};

// The first row is a header when every cell in it holds text; a text or empty cell anywhere else
// is an error naming `argument`, its row and column. Data rows i with skippedRows[i] set (when
// skippedRows is given; one flag per data row) are not read and not returned, and the rows in
// messages still count from the top of the range. Throws InputError.
NumericColumns readNumericColumns(const CellTable& range, const std::string& argument, ValueRule rule,
                                  const std::string& defaultLabelPrefix,
                                  const std::vector<bool>* skippedRows = nullptr);

// Whether the first row holds a non-empty text in every cell: the header rule above.
bool hasHeaderRow(const CellTable& range);

} // namespace isoquant
