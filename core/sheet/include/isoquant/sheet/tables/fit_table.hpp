// The table PRODFIT returns, and lookups in it (PRODSTAT).
//
// Cobb-Douglas layout (7 columns; k inputs, m controls; the ces and translog layouts are in
// form_tables.hpp):
//   Cobb-Douglas fit | value | std. error | t | p-value | lower bound | upper bound   header
//   ln A | …                                                      the scale parameter (under fixed
//                                                                  or two-way effects the mean group
//                                                                  effect, its other cells n/a)
//   <input label> | …                                              one row per input: its exponent
//   <control label> (control) | …                                  one row per control
//   (empty row)
//   observations, R2, adjusted R2, residual SD, F (slopes = 0), log-likelihood, AIC, BIC,
//   returns to scale, verdict, form                                11 statistic rows
//   ln A at control means                                          only when m > 0
//   smearing factor                                                always: mean of exp(residual)
// then the rows of the estimation options, each only when it applies, in this order:
//   groups (G), effects (the word)                                 when groups are given
//   within R2                                                      effects "fixed" or "two-way"
//   periods (T)                                                    effects "two-way"
//   technical change per period | λ with its std. error … bounds    a trend (effects not two-way)
//   ln A for predictions                                           effects or a trend: the ln A
//                                                                  the evaluators use
//   latest period                                                  a trend: t_last, the period
//                                                                  "ln A for predictions" is at
//   incomplete rows dropped                                        the switch is on (even at 0)
// so the table has k + m + 15 rows, plus 1 with controls, plus 2 with groups, 1 under effects,
// 1 more under two-way effects, 2 for a trend, 1 for "ln A for predictions" (effects or a trend)
// and 1 when incomplete rows are dropped. Two inputs, no options: 17 rows.
// With PRODFIT's covariance TRUE the covariance block follows (covariance_block.hpp): 1 + q rows
// more and max(7, q + 1) columns, q = p (1 + k + m parameters) + 1 with controls, effects or a trend
// (the evaluators' ln A) + 1 with a trend (λ) (the other forms: form_tables.hpp).
// Statistic rows use the same columns: a value under "value", its standard error under
// "std. error", a test statistic under "t", its p-value under "p-value". A number that is not
// finite (an exact fit's t, say) is shown as the text "n/a". The form row's third cell holds notes
// (table_writer.hpp, statusNote): a nearly collinear or exact fit, a Wald test n/a because cluster
// errors on G groups carry at most G − 1 restrictions, hc1/hc3 under effects with under 10 rows
// per group.
// Group and period effects are not rows of the table; PRODSTAT answers "effect of group <label>"
// and "effect of period <period>" from the fit itself (lookUpFit).
#pragma once

#include "isoquant/sheet/arguments/cells.hpp"
#include "isoquant/math/fits/fit_result.hpp"

#include <string>

namespace isoquant {

CellTable fitTable(const ProductionFit& fit);

// Number of rows fitTable produces: without the options' rows, and for a given fit.
std::size_t fitTableRows(std::size_t inputs, std::size_t controls);
std::size_t fitTableRows(const ProductionFit& fit);

// The cell at `rowLabel` (a term or statistic label, case-insensitive; a control also answers to
// its label without " (control)"; "F" answers for "F (slopes = 0)") and `columnLabel` (a header
// word; empty means "value", or "t" on the rows that hold only a test statistic).
// Throws InputError naming the argument when a label is not in the table.
Cell lookUpFitTable(const CellTable& table, const Cell& rowLabel, const Cell& columnLabel);

// PRODVALUE: the cell of a whole table range (its header row included: a PRODFIT, PRODCOSTFIT or
// other table in the 7-column layout, as the sheet holds it) at `rowLabel` and `columnLabel`, with
// PRODSTAT's rules for rows; a column label is matched against the table's own header row, so that
// any table with a header row of column words answers.
Cell tableValue(const CellTable& table, const Cell& rowLabel, const Cell& columnLabel);

// As lookUpFitTable on fitTable(fit), and also "effect of group <label>" (under effects) and
// "effect of period <period>" (two-way, relative to the first period, whose effect is 0): the
// estimate, and "n/a" in the other columns (no standard errors are reported for effects).
Cell lookUpFit(const ProductionFit& fit, const Cell& rowLabel, const Cell& columnLabel);

} // namespace isoquant
