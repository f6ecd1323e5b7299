// The evaluators' optional last argument `what` (issue 20): a derived number with its standard
// error or its bounds, from the covariance block of a PRODFIT table (covariance_block.hpp).
//
// "value" (default) answers as before. "std. error", "lower bound" and "upper bound" come by the
// delta method with the analytic gradient of the quantity in the parameters θ = (ln A, b₁ … b_k,
// controls) of the Cobb-Douglas form: se = √(gᵀ V g), bounds at the block's level with its t
// distribution (t(n − p), or t(G − 1) under cluster errors: the block's degrees of freedom).
// Every function below answers these words for translog and ces tables too, with the gradients of
// form_gradients.hpp (output, marginal products, elasticities, scale, TFP), shape_gradients.hpp
// (second partials, MRTS, elasticities of substitution) and plan_gradients.hpp (the least-cost and
// budget plans and PRODCOST's figures, by the implicit function theorem on the plan's first-order
// conditions), all in src/functions; the formulas below are the cobb-douglas form's.
// - output Y = exp(ln A + Σ bᵢ ln xᵢ): g of ln Y = (1, ln x₁ … ln x_k, 0 …); se(Y) = Y·s with
//   s = √(gᵀVg); bounds exp(ln Y ± t·s), on the log scale so that they never cross 0. The mean
//   prediction (mean TRUE) is S·Y with the smearing factor S taken as known: every figure times S.
//   "prediction lower"/"prediction upper": one new plant's output, exp(ln Y ± t·√(s² + σ²)) with
//   σ the table's residual SD; the same for mean TRUE or FALSE (an interval for one plant's Y, not
//   for its mean, so no smearing factor).
// - marginal product MPᵢ = bᵢ·Y/xᵢ: g of ln MPᵢ adds 1/bᵢ at bᵢ; se = MPᵢ·s; bounds on the log scale
//   when bᵢ > 0 (positive by nature), else MPᵢ ± t·se.
// - least-cost amount xᵢ of target y at prices w (PRODLEASTCOST; every bᵢ > 0): g of ln xᵢ in
//   bound_functions.cpp (leastCostAmount); bounds on the log scale.
// - output elasticity bᵢ and returns to scale ν = Σ bᵢ: linear in θ, bounds estimate ± t·se.
// - TFP = Y/f(x) of an observed Y (PRODTFP): g of ln TFP = −(1, ln x₁ … ln x_k, 0 …); log scale.
// - second partial fᵢⱼ = bᵢ(bⱼ − δᵢⱼ)·Y/(xᵢxⱼ) (PRODSECOND): its sign varies, bounds fᵢⱼ ∓ t·se.
// - MRTS = (bᵢ/bⱼ)·(xⱼ/xᵢ) (PRODMRTS): log scale when bᵢ, bⱼ > 0 (positive by nature), else ∓ t·se.
// - the budget plan xᵢ = (bᵢ/ν)·B/wᵢ and its output (PRODBUDGET): log scale.
// - PRODCOST's total, marginal and average least cost: log scale; its cost elasticity 1/ν and
//   returns to scale ν: value ∓ t·se. There the word is the argument `statistic` (`what` already
//   chooses the figure), and a cost model (PRODCOSTFIT, no covariance block) gets a message.
// - elasticity of substitution (PRODSUBSTITUTION): 1 for every cobb-douglas parameter, so se 0 and
//   both bounds the value (the form, not the data, fixes it).
// Output and marginal products need ln A itself: a model whose evaluators use a shifted ln A
// (controls at their means, effects or a trend) answers a message for these words, as does a
// model without a covariance block (a typed model). Every message names "what".
#pragma once

#include "isoquant/sheet/arguments/cells.hpp"
#include "isoquant/sheet/models/model_table.hpp"

namespace isoquant {

CellTable outputColumnWithBounds(const ModelTable& model, const CellTable& inputs, const Cell& mean, const Cell& what);
CellTable marginalProductColumnWithBounds(const ModelTable& model, const CellTable& inputs, const Cell& input,
                                          const Cell& what);
CellTable elasticityColumnWithBounds(const ModelTable& model, const CellTable& inputs, const Cell& input,
                                     const Cell& what);
CellTable scaleColumnWithBounds(const ModelTable& model, const CellTable& inputs, const Cell& what);
// PRODLEASTCOST: a row of the amounts' standard errors or bounds (positive: log scale).
CellTable leastCostRowWithBounds(const ModelTable& model, const Cell& target, const CellTable& prices, const Cell& what);

// The decisions and productivity (derived_bounds.cpp): the plain function's answer, each number
// replaced by the word's figure; a text it gives (a value undefined at a bundle) stays.
// PRODTFP: as productivityColumn (growth_functions.hpp), then `what`.
CellTable productivityColumnWithBounds(const ModelTable& model, const CellTable& output, const CellTable& inputs,
                                       const CellTable& periods, const Cell& what);
// PRODSECOND: as secondPartialColumn (decision_functions.hpp), then `what`.
CellTable secondPartialColumnWithBounds(const ModelTable& model, const CellTable& inputs, const Cell& first,
                                        const Cell& second, const Cell& what);
// PRODMRTS: as technicalRateColumn (decision_functions.hpp), then `what`.
CellTable technicalRateColumnWithBounds(const ModelTable& model, const CellTable& inputs, const Cell& first,
                                        const Cell& second, const Cell& what);
// PRODBUDGET: as budgetRow (decision_functions.hpp), then `what` for the k amounts and the output.
CellTable budgetRowWithBounds(const ModelTable& model, const Cell& budget, const CellTable& prices, const Cell& what);
// PRODCOST: as costColumn (cost_functions.hpp) with the figure `what`, then `statistic`.
CellTable costColumnWithBounds(const ModelTable& model, const CellTable& target, const CellTable& prices,
                               const Cell& what, const Cell& statistic);
// PRODSUBSTITUTION: as substitutionColumn (decision_functions.hpp), then `what`.
CellTable substitutionColumnWithBounds(const ModelTable& model, const CellTable& inputs, const Cell& first,
                                       const Cell& second, const Cell& kind, const Cell& what);

} // namespace isoquant
