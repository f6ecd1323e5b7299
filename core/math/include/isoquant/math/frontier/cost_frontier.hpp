// The stochastic cost frontier (Kumbhakar and Lovell 2000, ch. 4):
//
//   ln C = xᵀβ + v + u,   ε = v + u = ln C − xᵀβ,   v ~ N(0, σᵥ²),   u ≥ 0 independent of v,
//
// u the extra cost of the row over the least cost. With ε's sign turned, −ε = (−v) − u, and −v is
// N(0, σᵥ²) like v: the cost frontier's density is the production frontier's at −ε,
// f_cost(ε) = f_production(−ε) (Kumbhakar and Lovell 2000, section 4.2), e.g. for half-normal u
//   ln f(ε) = ln 2 − ½ ln 2π − ln σ − ε²/(2σ²) + ln Φ(ελ/σ).
// So the cost frontier of ln C on x is fitted as the production frontier of −ln C on the same x
// (stochastic_frontier.hpp), whose coefficients are −β: its σᵥ, σᵤ, log-likelihood, inefficiency
// test and covariance of (ln σᵥ, ln σᵤ) are the cost frontier's; its residuals are −ε, so u given ε
// and the cost efficiency E[exp(−u)|ε] ≤ 1 (Battese and Coelli 1988) come from
// frontier_likelihood.hpp at −ε. Var(−β) = Var(β); only the covariances of β with ln σ change sign.
#pragma once

#include "isoquant/math/frontier/stochastic_frontier.hpp"

#include <Eigen/Dense>

namespace isoquant {

// The production frontier of −`logCost` on `design` (a constant column first) from the least-squares
// β of `logCost` on it, in the sign of that frontier (above): β = −coefficients.
StochasticFrontierFit fitMirroredCostFrontier(const Eigen::MatrixXd& design, const Eigen::VectorXd& logCost,
                                              const Eigen::VectorXd& leastSquaresCoefficients,
                                              InefficiencyDistribution distribution);

// The cost frontier's log-likelihood at θ = (β, ln σᵥ, ln σᵤ).
double costFrontierLogLikelihood(InefficiencyDistribution distribution, const Eigen::MatrixXd& design,
                                 const Eigen::VectorXd& logCost, const Eigen::VectorXd& theta);

// u given the cost residual ε = ln C − xᵀβ (frontier_likelihood.hpp's, at −ε).
TruncatedNormal costInefficiencyGivenResidual(InefficiencyDistribution distribution, double costResidual,
                                              double noiseSd, double inefficiencySd);

} // namespace isoquant
