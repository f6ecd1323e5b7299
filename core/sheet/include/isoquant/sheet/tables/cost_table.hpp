// PRODCOSTFIT's table of a cost fit (cost_fit.hpp), and the words of it that PRODCOST's model
// reader also reads.
#pragma once

#include "isoquant/math/fits/cost_fit.hpp"
#include "isoquant/sheet/arguments/cells.hpp"

#include <cstddef>

namespace isoquant {

// The words of the cost table that PRODCOST's model reader also reads.
inline constexpr const char* cobbDouglasCostTitle = "Cobb-Douglas cost fit";
inline constexpr const char* translogCostTitle = "translog cost fit";
inline constexpr const char* cobbDouglasCostWord = "cobb-douglas cost"; // the form row
inline constexpr const char* translogCostWord = "translog cost";
inline constexpr const char* costConstantLabel = "constant";
inline constexpr const char* costOutputLabel = "output";
inline constexpr const char* costElasticityLabel = "cost elasticity";
inline constexpr const char* efficientScaleLabel = "efficient scale";
inline constexpr const char* costRegularityLabel = "regularity";

// PRODCOSTFIT's table (7 columns). Rows: the header; constant; output; one per price (k); for the
// translog output*output, k(k+1)/2 price pairs and k price*output rows; an empty row; observations,
// R2, adjusted R2, residual SD, F (slopes = 0), log-likelihood, AIC, BIC; cost elasticity; returns
// to scale; verdict; efficient scale; regularity; form; smearing factor. Cobb-Douglas: k + 19 rows;
// translog: 2k + k(k+1)/2 + 20 rows; one more (`incomplete rows dropped`, after BIC) with
// `incomplete rows` on.
std::size_t costFitTableRows(CostForm form, std::size_t prices, bool dropsIncompleteRows = false);
CellTable costFitTable(const CostFit& fit);

} // namespace isoquant
