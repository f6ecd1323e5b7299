// The cell functions that turn a fitted or typed model into answers to business questions:
// curvature and substitution at given bundles, least cost, budget split, profit maximum and
// isoquants. `model` is read as for the evaluators (production_model.hpp); `inputs` holds one row
// of input values per bundle (an optional header row of text), one column per model input.
// Every function throws InputError with a message naming the argument (and row) at fault. A
// well-posed question without an answer (no finite profit maximum, a solve that did not converge,
// an undefined elasticity at one bundle) gives a text saying so instead of a number.
#pragma once

#include "isoquant/sheet/arguments/cells.hpp"
#include "isoquant/sheet/models/model_table.hpp"

namespace isoquant {

// PRODSECOND: ∂²Y/∂xᵢ∂xⱼ per row (the own second partial ∂²Y/∂xᵢ² when `second` is omitted).
CellTable secondPartialColumn(const ModelTable& model, const CellTable& inputs, const Cell& first, const Cell& second);

// PRODINPUTRETURNS: "diminishing", "constant" or "increasing" returns to one input per row.
CellTable inputReturnsColumn(const ModelTable& model, const CellTable& inputs, const Cell& input);

// PRODPAIR: "complements", "substitutes" or "independent" by the sign of fᵢⱼ, per row.
CellTable inputPairColumn(const ModelTable& model, const CellTable& inputs, const Cell& first, const Cell& second);

// PRODMRTS: the marginal rate of technical substitution fᵢ/fⱼ per row.
CellTable technicalRateColumn(const ModelTable& model, const CellTable& inputs, const Cell& first, const Cell& second);

// PRODSUBSTITUTION: the direct (default), Allen or Morishima elasticity of substitution per row.
CellTable substitutionColumn(const ModelTable& model, const CellTable& inputs, const Cell& first, const Cell& second,
                             const Cell& kind);

// PRODLEASTCOST: the cost-minimising bundle for `target` output at `prices`, a row of k amounts.
CellTable leastCostRow(const ModelTable& model, const Cell& target, const CellTable& prices);

// PRODCOST: "total" (default), "marginal" or "average" cost at that bundle.
CellTable costCell(const ModelTable& model, const Cell& target, const CellTable& prices, const Cell& what);

// PRODBUDGET: the output-maximising amounts that spend exactly `budget`, then the output: k + 1 cells.
CellTable budgetRow(const ModelTable& model, const Cell& budget, const CellTable& prices);

// PRODPROFIT: the profit-maximising amounts, then output and profit: k + 2 cells.
CellTable profitRow(const ModelTable& model, const Cell& outputPrice, const CellTable& inputPrices);

// PRODISOQUANT: for each value of input i, the amount of input j giving output `level`, a column.
// `values` is one column of values of input i (a two-input model), or one column per model input
// (the other inputs held at the values in each row; the column of input j is not read).
// i defaults to the first input, j to the first input other than i.
CellTable isoquantColumn(const ModelTable& model, const Cell& level, const CellTable& values, const Cell& first,
                         const Cell& second);

} // namespace isoquant
