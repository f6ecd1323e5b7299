// The cell functions of cost functions: PRODCOSTFIT, and PRODCOST over a cost model.
// Every function throws InputError with a message naming the argument (and row) at fault.
#pragma once

#include "isoquant/sheet/arguments/cells.hpp"
#include "isoquant/sheet/models/model_table.hpp"
#include "isoquant/math/fits/cost_fit.hpp"

namespace isoquant {

// The arguments of PRODCOSTFIT as the user gave them. `controls`, `groups`, `effects`, `trend` and
// `incomplete rows` are part of the signature but not yet available: given, they are refused with a
// message saying so. `shares` (one column per price, rows summing to 1 within 0.01, rescaled to 1)
// fits the cost and share equations jointly (cost_share_system.hpp), with classical errors only.
struct CostFitArguments {
    CellTable cost;
    CellTable output;
    CellTable prices;
    Cell form;
    CellTable shares;
    Cell errors;
    Cell level;
    CellTable controls;
    CellTable groups;
    Cell effects;
    CellTable trend;
    Cell incompleteRows;
};

CostFit costFitFromArguments(const CostFitArguments& arguments);

// PRODCOST with a cost model (cost_model.hpp): per row of `target` (one output, or a column of
// outputs with an optional header) the figure `what` at that row's prices: `prices` is one price
// per input (a row or a column, for one output), or one row of prices per output (a single row
// serves every output). Figures: "total" exp(ln C) (the median prediction: no smearing factor),
// "marginal" ε·C/y, "average" C/y, "cost elasticity" ε, "returns to scale" 1/ε. A column.
CellTable costModelColumn(const CellTable& model, const CellTable& target, const CellTable& prices, const Cell& what);

// The prices of every output row: one vector for a single output (a row or a column), else one row
// per output or one row for all; `outputArgument` names the outputs in a message.
Eigen::MatrixXd readPriceRows(const CellTable& range, Eigen::Index outputs, Eigen::Index inputs,
                              const std::string& outputArgument);

// PRODCOST for any model: a cost model as above; a production model as costCell
// (decision_cell_functions.hpp) for one output, and for a column of outputs one least-cost figure
// per row, with prices as above.
CellTable costColumn(const ModelTable& model, const CellTable& target, const CellTable& prices, const Cell& what);

} // namespace isoquant
