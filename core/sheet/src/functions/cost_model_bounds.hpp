// PRODCOST's `statistic` over a cost model that carries a covariance block (PRODCOSTFIT's
// `covariance` TRUE), internal to the sheet library: the delta method of delta_method.hpp with the
// gradient of the figure in the cost model's parameters (cost_model_bounds.cpp gives them).
#pragma once

#include "functions/delta_method.hpp"
#include "isoquant/sheet/arguments/cells.hpp"
#include "isoquant/sheet/models/cost_model.hpp"

#include <functional>

namespace isoquant {

// `values` is the plain PRODCOST column of the same arguments (one number per output). Total,
// marginal and average cost get their bounds on the log scale (a marginal cost ≤ 0: value ± t·se),
// the cost elasticity and returns to scale value ± t·se, at the block's level on t(block's degrees
// of freedom). With controls, effects or a trend the block's last row is the constant the
// evaluators use (cost_table.hpp). Throws InputError naming `statistic` for a model without a block.
CellTable costModelColumnWithBounds(const CellTable& modelCells, const CellTable& target, const CellTable& prices,
                                    const Cell& what, delta_method::Statistic statistic, const CellTable& values);

// Throws InputError naming `argumentName` and the word when `model` has no covariance block.
void requireCostBlock(const CostModel& model, const std::string& argumentName, delta_method::Statistic statistic);

// PRODEFFICIENTSCALE's `statistic` of the efficient scale y* = `scale` of a translog cost model at
// `prices` (β_yy > 0): the gradient of ln y* by implicit differentiation of ε(y*) = 1, bounds on the
// log scale at the block's level and t. Throws InputError naming `what` for a model without a block.
double efficientScaleWithBounds(const CostModel& model, const Eigen::VectorXd& prices, double scale,
                                delta_method::Statistic statistic);

// PRODCOST's plain column `values` with each number replaced by bound(output, the row's prices,
// number), the outputs and prices read as PRODCOST reads them (`inputs` prices a row); a sentence
// (no plan) stays. Throws InputError naming the row of a result too large to represent.
CellTable costColumnOfBounds(const CellTable& target, const CellTable& prices, Eigen::Index inputs,
                             const CellTable& values,
                             const std::function<double(double, const Eigen::VectorXd&, double)>& bound);

} // namespace isoquant
