// The rows a frontier adds to a table, shared by PRODFRONTIER's and PRODCOSTFIT's (internal to the core).
#pragma once

#include "isoquant/math/frontier/stochastic_frontier.hpp"
#include "tables/table_writer.hpp"

namespace isoquant {

// noise SD, inefficiency SD, lambda
void frontierScaleRows(TableWriter& writer, const FrontierScaleEstimates& scales);
// log-likelihood, AIC = −2ℓ + 2(p + 2), BIC = −2ℓ + (p + 2) ln n (σᵥ and σᵤ counted)
void frontierLikelihoodRows(TableWriter& writer, const StochasticFrontierFit& fit);
// inefficiency test (LR and its p-value under "t" and "p-value"), mean efficiency
void frontierInefficiencyRows(TableWriter& writer, const StochasticFrontierFit& fit);
// convergence | word | "<n> evaluations; <reason>"
void frontierConvergenceRow(TableWriter& writer, const StochasticFrontierFit& fit);

} // namespace isoquant
