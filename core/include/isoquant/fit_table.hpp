// The table PRODFIT returns, and lookups in it (PRODSTAT).
//
// Cobb-Douglas layout (7 columns; k inputs, m controls; the ces and translog layouts are in
// form_tables.hpp):
//   term | estimate | std. error | t | p-value | low | high       header
//   ln A | …                                                      the scale parameter
//   <input label> | …                                              one row per input: its exponent
//   <control label> (control) | …                                  one row per control
//   (empty row)
//   observations, R2, adjusted R2, residual SD, F (slopes = 0), log-likelihood, AIC, BIC,
//   returns to scale, verdict, form                                11 statistic rows
//   ln A at control means                                          only when m > 0
// so the table has k + m + 14 rows, plus one when there are controls.
// Statistic rows use the same columns: a value under "estimate", its standard error under
// "std. error", a test statistic under "t", its p-value under "p-value". A number that is not
// finite (an exact fit's t, say) is shown as the text "n/a".
#pragma once

#include "isoquant/cells.hpp"
#include "isoquant/production_fit.hpp"

#include <string>

namespace isoquant {

CellTable fitTable(const ProductionFit& fit);

// Number of rows fitTable produces.
std::size_t fitTableRows(std::size_t inputs, std::size_t controls);

// The cell at `rowLabel` (a term or statistic label, case-insensitive; a control also answers to
// its label without " (control)"; "F" answers for "F (slopes = 0)") and `columnLabel` (a header
// word; empty means "estimate", or "t" on the rows that hold only a test statistic).
// Throws InputError naming the argument when a label is not in the table.
Cell lookUpFitTable(const CellTable& table, const Cell& rowLabel, const Cell& columnLabel);

} // namespace isoquant
