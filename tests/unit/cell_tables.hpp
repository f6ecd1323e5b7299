// Builds the cell ranges the core's cell functions take, as a user would select them in a sheet.
#pragma once

#include "isoquant/sheet/arguments/cells.hpp"

#include <Eigen/Dense>

#include <initializer_list>
#include <string>
#include <vector>

namespace isoquant::testing {

// The values as a range of numbers, under a header row of `labels` when labels are given.
CellTable numberRange(const Eigen::MatrixXd& values, const std::vector<std::string>& labels = {});

// A range typed cell by cell, row by row (rows must have equal lengths), e.g. a hand-typed model.
CellTable typedRange(std::initializer_list<std::initializer_list<Cell>> rows);

// The numbers of a one-column result range.
Eigen::VectorXd columnValues(const CellTable& column);

// The numbers of a column result under its header cell (model_inputs.hpp); throws
// std::invalid_argument when the first cell is not `title`.
Eigen::VectorXd columnValuesUnder(const CellTable& column, const std::string& title);

} // namespace isoquant::testing
