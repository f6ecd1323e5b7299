// The cell functions of productivity and growth on plain cells: PRODTFP, PRODGROWTH, PRODINDEX.
// Every function throws InputError with a message that names the argument, and the period (or
// row) at fault. Ranges whose rows are periods list them in time order, first period first.
#pragma once

#include "isoquant/sheet/arguments/cells.hpp"
#include "isoquant/sheet/models/model_table.hpp"

namespace isoquant {

// PRODTFP: total factor productivity Y / f(x) of each row (growth_accounting.hpp), a column.
// `model` as for the evaluators (a PRODFIT table or a typed model); `output` one column;
// `inputs` one column per model input, as many rows as output, matched by header labels as for
// the evaluators; with a header row in output and two or more rows, the column starts with "TFP". `periods` (empty when omitted):
// the period of each row, for a model with a trend (rows "technical change per period" and
// "latest period"): row i is then compared with the technology of its period tᵢ, whose ln A is
// the model's ln A + λ·(tᵢ − t_last).
CellTable productivityColumn(const ModelTable& model, const CellTable& output, const CellTable& inputs,
                             const CellTable& periods = {});

// PRODGROWTH: the growth account of every period (layout in growth_table.hpp).
// `weights` is read as a model when every cell of its first column below the first row holds a
// label or is empty (a PRODFIT table or a typed model: its elasticities at each period's inputs);
// otherwise as cost shares, one column per input and one row per period (an optional header row),
// each period's summing to 1 within 0.01 and rescaled to sum to exactly 1.
// `method`: "tornqvist" (default; each interval weighs by the mean of its two periods' weights)
// or "fixed" (the constant elasticities of a Cobb-Douglas model).
// `periods` (empty when omitted): a year or name per period, labelling the table's rows and the
// messages instead of the positions 2, 3, ….
CellTable growthAccountTable(const CellTable& output, const CellTable& inputs, const CellTable& weights,
                             const Cell& method, const CellTable& periods = {});

// PRODINDEX: the chained quantity index of every period (index_numbers.hpp), a column. Each
// period's shares must sum to 1 within 0.01 and are rescaled to sum to exactly 1.
// `method`: "tornqvist" (default), "laspeyres", "paasche" or "fisher"; `base`: the first period's
// value, a positive number (default 1).
// `periods` as for PRODGROWTH, naming the periods in messages. With a header row and two or more
// periods, the column starts with the header cell "quantity index" (model_inputs.hpp).
CellTable quantityIndexColumn(const CellTable& quantities, const CellTable& shares, const Cell& method,
                              const Cell& base, const CellTable& periods = {});

} // namespace isoquant
