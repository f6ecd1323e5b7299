// Maximum likelihood fit of the stochastic production frontier of frontier_likelihood.hpp.
//
// Start: least squares, corrected by the method of moments (Olson, Schmidt and Waldman 1980): from
// the second and third central moments m₂, m₃ of the least-squares residuals,
//   half-normal:  σᵤ = [m₃ / (√(2/π)(1 − 4/π))]^⅓,  σᵥ² = m₂ − (1 − 2/π)σᵤ²,  intercept + σᵤ√(2/π);
//   exponential:  σᵤ = (−m₃/2)^⅓,                 σᵥ² = m₂ − σᵤ²,            intercept + σᵤ;
// σᵤ capped where σᵥ² would fall below a tenth of m₂ (the moments do not always fit the model).
// Maximum: the score equations ∂ℓ/∂θ = 0 solved by Eigen's HybridNonLinearSolver (MINPACK's hybrj,
// Powell's dogleg) with the Jacobian, the Hessian of ℓ, by central differences of the analytic
// score; a root counts as a maximum only where that Hessian is negative definite and ℓ is not below
// its value at the start.
// Wrong skew: when m₃ ≥ 0 (residuals skewed the wrong way for a production frontier) the likelihood
// is largest at σᵤ = 0 (Waldman 1982 for the half-normal): the fit is least squares, σᵥ² = RSS/n.
#pragma once

#include "isoquant/math/fits/fit_result.hpp" // ParameterEstimate
#include "isoquant/math/frontier/frontier_likelihood.hpp"

#include "isoquant/math/numerics/fit_status.hpp"

#include <Eigen/Dense>

#include <string>

namespace isoquant {


struct StochasticFrontierFit {
    InefficiencyDistribution distribution = InefficiencyDistribution::halfNormal;
    Eigen::VectorXd coefficients; // β
    double noiseSd = 0;           // σᵥ
    double inefficiencySd = 0;    // σᵤ (for the exponential its mean, the scale)
    // Covariance of θ = (β, ln σᵥ, ln σᵤ): the inverse observed information, (−∇²ℓ)⁻¹. Under wrong
    // skew the least-squares covariance of β with σ̂² = RSS/n and var(ln σᵥ) = 1/(2n); ln σᵤ NaN.
    Eigen::MatrixXd covariance;
    double logLikelihood = 0;
    double leastSquaresLogLikelihood = 0; // Gaussian, at σᵥ² = RSS/n: ℓ under σᵤ = 0
    double thirdMoment = 0;               // m₃ of the least-squares residuals
    bool wrongSkew = false;
    // One status (fit_status.hpp), its reason in words for the table: ok (the score vanished
    // within tolerance at a maximum, or the wrong-skew least squares), notConverged (the
    // evaluation limit came first), stopped (no progress, or a root that is not a maximum) or
    // boundary (stopped where ℓ still rises as σᵥ falls: the supremum lies toward σᵥ = 0, a
    // frontier without noise, which the model does not reach).
    FitStatus status;
    long evaluations = 0; // of the score
    Eigen::VectorXd residuals; // ε = ln y − xᵀβ at the estimate
};

// `design` n × p with a constant first column, `leastSquaresCoefficients` the least-squares β of
// `response` on it. Requires n > p + 2.
StochasticFrontierFit fitStochasticFrontier(const Eigen::MatrixXd& design, const Eigen::VectorXd& response,
                                            const Eigen::VectorXd& leastSquaresCoefficients,
                                            InefficiencyDistribution distribution);

// The likelihood-ratio statistic of σᵤ = 0, 2(ℓ − ℓ_LS), and its p-value under the mixture
// ½χ²(0) + ½χ²(1) of Kodde and Palm (1986): ½ P(χ²(1) > LR) for LR > 0, else 1.
double inefficiencyTestStatistic(const StochasticFrontierFit& fit);
double inefficiencyTestPValue(double statistic);

// The mean over the fitted rows of E[exp(−u)|ε] (Battese and Coelli 1988); 1 under wrong skew.
double meanEfficiency(const StochasticFrontierFit& fit);

// σᵥ, σᵤ and λ = σᵤ/σᵥ at confidence `level`: standard errors by the delta method from their logs,
// se(σ) = σ·se(ln σ), bounds exp(ln σ ± z·se(ln σ)), z the normal quantile, which stay positive;
// no test (σᵤ = 0 lies on the boundary: see the inefficiency test). Under wrong skew σᵤ and λ are
// 0 with no standard error or bounds.
struct FrontierScaleEstimates {
    ParameterEstimate noiseSd, inefficiencySd, lambda;
};
FrontierScaleEstimates frontierScaleEstimates(const StochasticFrontierFit& fit, double level);

} // namespace isoquant
