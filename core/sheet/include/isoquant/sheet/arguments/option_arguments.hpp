// Reads the optional arguments of the cell functions. An empty cell or an omitted argument means
// the default; option words match exactly, ignoring case (no prefixes). Every error names the
// argument. Throws InputError.
#pragma once

#include "isoquant/sheet/arguments/cells.hpp"
#include "isoquant/math/numerics/least_squares.hpp"
#include "isoquant/math/forms/production_form.hpp"

#include <string>

namespace isoquant {

ProductionForm readFormArgument(const Cell& cell);                // default cobb-douglas
bool readSwitchArgument(const Cell& cell, const std::string& argument); // TRUE/FALSE or 1/0; default FALSE
CovarianceKind readErrorsArgument(const Cell& cell);             // default classical
double readLevelArgument(const Cell& cell, const std::string& argument); // in (0, 1); default 0.95

} // namespace isoquant
