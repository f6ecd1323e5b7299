// PRODCOSTFIT's table of a cost fit (cost_fit.hpp), and the words of it that PRODCOST's model
// reader also reads.
#pragma once

#include "isoquant/math/fits/cost_fit.hpp"
#include "isoquant/sheet/arguments/cells.hpp"

#include <cstddef>
#include <string>
#include <vector>

namespace isoquant {

// The words of the cost table that PRODCOST's model reader also reads.
inline constexpr const char* cobbDouglasCostTitle = "Cobb-Douglas cost fit";
inline constexpr const char* translogCostTitle = "translog cost fit";
inline constexpr const char* halfNormalCostFrontierTitle = "half-normal cost frontier"; // the form row says which form
inline constexpr const char* exponentialCostFrontierTitle = "exponential cost frontier";
inline constexpr const char* cobbDouglasCostWord = "cobb-douglas cost"; // the form row
inline constexpr const char* translogCostWord = "translog cost";
inline constexpr const char* costConstantLabel = "constant";
inline constexpr const char* costOutputLabel = "output";
inline constexpr const char* costElasticityLabel = "cost elasticity";
inline constexpr const char* efficientScaleLabel = "efficient scale";
inline constexpr const char* costRegularityLabel = "regularity";
inline constexpr const char* costControlMeansLabel = "constant at control means";
inline constexpr const char* costTrendLabel = "cost change per period";
inline constexpr const char* costPredictionLabel = "constant for predictions";

// PRODCOSTFIT's table (7 columns). Rows: the header; constant; output; one per price (k); for the
// translog output*output, k(k+1)/2 price pairs and k price*output rows; an empty row; observations,
// R2, adjusted R2, residual SD, F (slopes = 0), log-likelihood, AIC, BIC; cost elasticity; returns
// to scale; verdict; efficient scale; regularity; form; smearing factor. Cobb-Douglas: k + 19 rows;
// translog: 2k + k(k+1)/2 + 20 rows; one more (`incomplete rows dropped`, after BIC) with
// `incomplete rows` on.
// A cost frontier (`inefficiency` given) has 6 rows more, those of PRODFRONTIER's table
// (frontier_table.hpp): the header reads "half-normal cost frontier" or "exponential cost
// frontier"; the parameter rows show z, normal p-values and bounds; noise SD, inefficiency SD and
// lambda after the empty row; R2, adjusted R2, residual SD and F (slopes = 0), least squares'
// figures, are n/a; log-likelihood, AIC and BIC are the frontier's (σᵥ and σᵤ counted);
// inefficiency test and mean efficiency (of cost, E[exp(−u)|ε] ≤ 1) after BIC (and after
// `incomplete rows dropped`); convergence before form; the smearing factor is n/a.
// With controls, groups, effects or a trend: one row per control after the form's parameter rows
// ("<label> (control)"), "constant at control means" (the constant plus the controls' coefficients
// times their means) before the smearing factor, and after it PRODFIT's option rows: groups and
// effects (with groups), within R2 (effects), periods (two-way), "cost change per period" (a
// trend: the change of ln C per period at given output and prices, with its inference),
// "constant for predictions" (effects or a trend: the constant PRODCOST and the other evaluators
// use — at the controls' means, the row-weighted mean group effect, the latest period) and latest
// period (a trend). The first overload counts the rows without these.
std::size_t costFitTableRows(CostForm form, std::size_t prices, bool dropsIncompleteRows = false,
                             bool frontier = false);
std::size_t costFitTableRows(const CostFit& fit);
CellTable costFitTable(const CostFit& fit);

// The parameters' row labels in table order: constant, output, the prices, the translog's
// second-order terms, the controls with " (control)".
std::vector<std::string> costParameterLabels(const CostFit& fit);

// The label of the block's row for the evaluators' constant: the table's own row for it,
// "constant for predictions" with effects or a trend, else "constant at control means".
std::string costShiftedConstantLabel(bool forPredictions);

// PRODCOSTFIT's table, with the covariance block of its parameters (covariance_block.hpp) when
// `covariance` is TRUE (a switch naming "covariance"): the kind of errors, the degrees of freedom
// of the table's t (n − p; G − 1 under cluster errors; m·n − p with shares) and its level; for a
// cost frontier "likelihood" and "normal" in their place (covariance_block.hpp). With controls,
// effects or a trend the block has one more row (and column) after the p parameters: the constant
// the evaluators use, s = constant + Σⱼ cⱼ·z̄ⱼ (+ λ·(t_last − t_first) with a trend, + the last
// period's effect under two-way effects), under effects with the row-weighted mean group effect
// Σ_g n_g·α_g / n in place of the constant (its variance and covariances exact, of the fit's kind
// of errors: MeanEffectInference), labelled as the table's row for it (costShiftedConstantLabel);
// so 1 + q rows and max(7, q + 1) columns, q = p + 1. Under effects the `constant` row (the plain
// mean of the group effects) has no covariance: n/a in its row and column.
CellTable costFitTableWithCovariance(const CostFit& fit, const Cell& covariance);

} // namespace isoquant
