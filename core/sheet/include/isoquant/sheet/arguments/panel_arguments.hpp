// Reads the panel arguments of PRODFIT and PRODSTAT: groups, effects, trend and the switch that
// drops incomplete rows. Every error names the argument and, where there is one, the row
// (counted from the top of the range, header included). Throws InputError.
#pragma once

#include "isoquant/sheet/arguments/cells.hpp"
#include "isoquant/math/fits/panel_regression.hpp"

#include <string>
#include <vector>

namespace isoquant {

// "none" (default), "fixed" or "two-way", ignoring case.
EffectsKind readEffectsArgument(const Cell& cell);

// The ranges whose rows are observations, as the user gave them (empty when omitted).
struct RowRanges {
    const CellTable& output;
    const CellTable& inputs;
    const CellTable& controls;
    const CellTable& groups;
    const CellTable& trend;
    // How a message names `output` and `inputs` (PRODCOSTFIT passes cost and input prices).
    std::string outputName = "output";
    std::string inputsName = "inputs";
};

// One flag per data row of output: set where output, inputs, controls or trend hold a blank or a
// text cell, or groups a blank. Every range must have output's number of data rows.
std::vector<bool> findIncompleteRows(const RowRanges& ranges);

// The groups column: one identifier per data row of output (a number or a text; equal numbers,
// or equal texts, are one group), optionally under one header row, which is there exactly when
// the column has one row more than output has data rows. Rows flagged in `skippedRows` (if
// given) are left out.
void readGroups(const CellTable& groups, std::size_t dataRows, const std::vector<bool>* skippedRows,
                PanelColumns& panel);

} // namespace isoquant
