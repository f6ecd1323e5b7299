// Chained quantity indexes of several inputs (or outputs) weighted by their cost (value) shares.
//
// Between adjacent periods t−1 and t, with quantity relatives rᵢ = qᵢ,t / qᵢ,t−1 and the cost
// shares sᵢ,t of each period, the link L_t of the chain is
//   Törnqvist:  ln L_t = Σᵢ ½(sᵢ,t−1 + sᵢ,t)·ln rᵢ
//   Laspeyres:  L_t = Σᵢ sᵢ,t−1·rᵢ        (= Σ p_{t−1}q_t / Σ p_{t−1}q_{t−1} when s are value shares)
//   Paasche:    L_t = 1 / Σᵢ sᵢ,t / rᵢ     (= Σ p_t q_t / Σ p_t q_{t−1})
//   Fisher:     L_t = √(Laspeyres·Paasche)
// and the chained index is I_1 = base, I_t = I_{t−1}·L_t. Shares enter as given here; PRODINDEX
// rescales each period's shares to sum to 1 first (period_range.hpp). The chain is carried in
// logs (ln I_t = ln base + Σ ln L), so an index overflows only when its own value does.
#pragma once

#include <Eigen/Dense>

namespace isoquant {

enum class IndexFormula { tornqvist, laspeyres, paasche, fisher };

// ln L_t of one link. Quantities positive, shares non-negative with a positive sum (the caller
// checks them and names the period).
double logQuantityLink(IndexFormula formula, const Eigen::VectorXd& previousQuantities,
                       const Eigen::VectorXd& currentQuantities, const Eigen::VectorXd& previousShares,
                       const Eigen::VectorXd& currentShares);

// ln I_t − ln I_1 for every period (0 in the first): one row of `quantities` and `shares` per
// period, one column per item.
Eigen::VectorXd chainedLogQuantityIndex(IndexFormula formula, const Eigen::MatrixXd& quantities,
                                        const Eigen::MatrixXd& shares);

} // namespace isoquant
