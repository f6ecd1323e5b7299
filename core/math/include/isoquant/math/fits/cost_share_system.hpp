// PRODCOSTFIT with `shares`: the cost equation and all but the last cost-share equation estimated
// jointly by iterated feasible GLS (seemingly_unrelated.hpp), the share equations
//   sᵢ = ∂ln C/∂ln wᵢ = βᵢ + Σⱼ<k βᵢⱼ ln(wⱼ/w_k) + βᵢ_y ln y      (i < k; translog)
//   sᵢ = βᵢ                                                       (Cobb-Douglas)
// sharing the coefficients of the homogeneity-normalised cost regression (cost_fit.hpp: columns 1,
// ln y, ln w̃ᵢ, then ½(ln y)², the halved squares and products of the ln w̃ᵢ in translogPairs order,
// and ln w̃ᵢ·ln y). With homogeneity imposed the last share is implied (the shares sum to 1), and at
// convergence the estimate is maximum likelihood and does not depend on which share is left out.
// The result is reported in the fields of a least-squares result, for the table:
//   coefficients, covariance   the system's b and (Σₐ,c wₐc XₐᵀX_c)⁻¹
//   residuals, RSS             of the cost equation; residual SD √(RSS/n) (Σ's divisor)
//   log-likelihood             the system's; AIC = −2LL + 2p, BIC = −2LL + p·ln n (p coefficients)
//   F (slopes = 0)             Wald F of every coefficient but the constant, on F(p − 1, m·n − p)
//   t and bounds               Student t with m·n − p degrees of freedom (m equations; common
//                              practice for system estimators, no source)
#pragma once

#include "isoquant/math/fits/cost_fit.hpp"
#include "isoquant/math/numerics/least_squares.hpp"
#include "isoquant/math/fits/seemingly_unrelated.hpp"

namespace isoquant {

// The share equations' designs (k − 1 of them) in the cost regression's columns.
std::vector<Eigen::MatrixXd> costShareDesigns(const Eigen::MatrixXd& relativeLogPrices, const Eigen::VectorXd& logOutput,
                                              CostForm form, Eigen::Index regressors);

// Fits the system; `shares` n × k, rows summing to 1. Throws InputError naming `shares` when the
// system cannot be estimated (a share equation fitted exactly, or no convergence).
LeastSquaresResult fitCostShareSystem(const Eigen::MatrixXd& design, const Eigen::VectorXd& response,
                                      const Eigen::MatrixXd& relativeLogPrices, const Eigen::VectorXd& logOutput,
                                      const Eigen::MatrixXd& shares, CostForm form, double confidenceLevel);

} // namespace isoquant
