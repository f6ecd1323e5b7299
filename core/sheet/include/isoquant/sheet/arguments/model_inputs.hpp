// The `inputs` argument of a function that evaluates a model, row by row, and the header cell its
// column result starts with.
//
// With a header row, the columns are found by their labels (case-insensitive) and taken in the
// model's input order, so "capital | labour" works for a model fitted on "labour | capital"; a
// label the model lacks, an input without a column or a label used twice is an error naming it. A
// model that names no inputs ("input 1", "input 2"…, a fit without a header row) and a range
// without a header row take the columns in the model's order.
#pragma once

#include "isoquant/sheet/arguments/cells.hpp"
#include "isoquant/sheet/arguments/numeric_range.hpp"
#include "isoquant/sheet/models/production_model.hpp"

#include <string>

namespace isoquant {

// Throws InputError naming "inputs".
NumericColumns readModelInputs(const CellTable& inputs, const ProductionModel& model);

// A column result of one cell per data row of `rows`, under a header cell `title` when `rows` came
// with a header row and more than one data row, so that the result lines up with the rows it
// belongs to when entered beside them. One data row under a header gives the plain value: that is
// a single-cell formula's answer.
CellTable underHeader(CellTable column, const NumericColumns& rows, const std::string& title);

} // namespace isoquant
