// The table PRODFRONTIER returns (7 columns, PRODFIT's header and column words; k inputs,
// q = k(k+1)/2 second-order terms under translog and 0 under Cobb-Douglas, m controls):
//   half-normal frontier | value | std. error | t | p-value | lower bound | upper bound   header
//   ln A, <input label>…, [<label>*<label>…], <control label> (control)…   the frontier's parameters
//   (empty row)
//   noise SD | σᵥ | se | | | lower | upper      inefficiency SD (σᵤ; the exponential's mean), lambda (σᵤ/σᵥ)
//   observations, log-likelihood, AIC, BIC     AIC = −2ℓ + 2(p + 2), BIC = −2ℓ + (p + 2) ln n
//   inefficiency test | | | LR | p-value       LR of σᵤ = 0, p from ½χ²(0) + ½χ²(1) (Kodde and Palm 1986)
//   mean efficiency                            the mean of E[exp(−u)|ε] over the rows
//   returns to scale | ν | se | z of ν = 1 | p-value,  verdict
//   convergence | converged (or not converged, stopped, boundary) | "<n> evaluations; <reason>"
//   form | cobb-douglas (or translog) | notes
// so k + q + m + 16 rows: two inputs, Cobb-Douglas, no controls: 18 rows. The header's title is
// "exponential frontier" under exponential inefficiency.
#pragma once

#include "isoquant/sheet/arguments/cells.hpp"
#include "isoquant/sheet/functions/frontier_functions.hpp"

#include <array>

namespace isoquant {

inline constexpr const char* halfNormalFrontierTitle = "half-normal frontier";
inline constexpr const char* exponentialFrontierTitle = "exponential frontier";
inline constexpr const char* noiseSdLabel = "noise SD";
inline constexpr const char* inefficiencySdLabel = "inefficiency SD";
inline constexpr const char* lambdaLabel = "lambda";
inline constexpr const char* inefficiencyTestLabel = "inefficiency test";
inline constexpr const char* meanEfficiencyLabel = "mean efficiency";
inline constexpr const char* wrongSkewNote = "no inefficiency found: residuals skewed the wrong way";

inline constexpr std::array<const char*, 5> frontierStatisticLabels{
    noiseSdLabel, inefficiencySdLabel, lambdaLabel, inefficiencyTestLabel, meanEfficiencyLabel};

std::size_t frontierTableRows(ProductionForm form, std::size_t inputs, std::size_t controls);

CellTable frontierTable(const ProductionFrontier& frontier);

// PRODFRONTIER's table, with the covariance block (covariance_block.hpp) of its parameter rows —
// the frontier's coefficients, from the inverse observed information — when `covariance` is TRUE:
// its header row reads `covariance | likelihood | normal | <level>` (maximum likelihood: the
// normal's bounds). Noise SD and inefficiency SD keep their own rows' standard errors and bounds.
// The table is then max(7, p + 1) columns wide and 1 + p rows longer.
CellTable frontierTableWithCovariance(const ProductionFrontier& frontier, const Cell& covariance);

// The word of the inefficiency argument and of the title: "half-normal" or "exponential".
std::string inefficiencyWord(InefficiencyDistribution distribution);
// The convergence row's word: "converged", "not converged", "stopped" or "boundary".
std::string frontierStatusWord(FitStatusKind kind);
// The form row's note on the fit: wrong skew, a boundary or no convergence; empty when converged.
std::string frontierNote(const StochasticFrontierFit& fit);

} // namespace isoquant
