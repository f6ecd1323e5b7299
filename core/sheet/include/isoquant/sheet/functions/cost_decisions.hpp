// The decisions that read a cost model as well as a production model (cost_model.hpp,
// production_model.hpp): PRODLEASTCOST, PRODEFFICIENTSCALE, PRODPRICEELASTICITY and PRODREGULAR.
// A cost model answers from its own formulas (isoquant/math/forms/cost_duality.hpp); a production
// model by duality, through its least-cost plan. Every function throws InputError with a message
// naming the argument (and row) at fault; a well-posed question without an answer gives a sentence.
#pragma once

#include "isoquant/sheet/arguments/cells.hpp"
#include "isoquant/sheet/models/model_table.hpp"

namespace isoquant {

// PRODLEASTCOST: the cost-minimising amounts, a row of k. With a cost model by Shephard's lemma,
// xᵢ = sᵢ·C/wᵢ; with a production model as leastCostRow (decision_cell_functions.hpp).
CellTable leastCostAnyRow(const ModelTable& model, const Cell& target, const CellTable& prices);

// PRODEFFICIENTSCALE: the output at which average cost is lowest at these prices (one price per
// input, a row or a column). A cost model: ln y* = (1 − β_y − Σᵢβᵢ_y ln wᵢ)/β_yy when β_yy > 0. A
// production model: the output whose least-cost plan has cost elasticity 1, found on a grid of
// outputs from 1e-9 to 1e9 and refined by bisection in ln y. Else the sentence saying why none.
// `what`: "value" (empty: the default), "std. error", "lower bound" or "upper bound" — for a cost
// model with its covariance block (PRODCOSTFIT's covariance TRUE), by the delta method with the
// gradient of ln y* by implicit differentiation of ε(y*) = 1, ∂ln y*/∂θ = −(∂ε/∂θ)/β_yy, bounds
// y*·exp(∓t·se(ln y*)) at the block's level and t. Throws InputError naming `what` for a cost
// model without a block and for a production model; where there is no efficient scale, its sentence.
CellTable efficientScaleCell(const ModelTable& model, const CellTable& prices, const Cell& what = Cell{});

// PRODPRICEELASTICITY: per output (one, or a column with one row of prices per output or one for
// all) the "demand" (default) ∂ln xᵢ/∂ln wⱼ, "allen" or "morishima" elasticity.
CellTable priceElasticityColumn(const ModelTable& model, const CellTable& outputs, const CellTable& prices,
                                const Cell& first, const Cell& second, const Cell& kind);

// PRODREGULAR: with a cost model each row of `rows` holds the output then one price per input, and
// the answer is "regular" or what fails (costRegularityPhrase); with a production model, as
// regularityColumn (cell_functions.hpp).
CellTable regularityAnyColumn(const ModelTable& model, const CellTable& rows);

} // namespace isoquant
