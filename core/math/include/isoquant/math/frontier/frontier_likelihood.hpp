// The log-likelihood of the stochastic production frontier and its score.
//
//   ln y = xᵀβ + v − u,   ε = v − u = ln y − xᵀβ,   v ~ N(0, σᵥ²),   u ≥ 0 independent of v.
//
// Half-normal u, |N(0, σᵤ²)| (Aigner, Lovell and Schmidt 1977), with σ² = σᵤ² + σᵥ², λ = σᵤ/σᵥ:
//   ln f(ε) = ln 2 − ½ ln 2π − ln σ − ε²/(2σ²) + ln Φ(−ελ/σ).
// Exponential u of mean σᵤ (Meeusen and van den Broeck 1977):
//   ln f(ε) = −ln σᵤ + ε/σᵤ + σᵥ²/(2σᵤ²) + ln Φ(−ε/σᵥ − σᵥ/σᵤ).
// The log-likelihood is the sum over rows. The score is taken in θ = (β, ln σᵥ, ln σᵤ), so that
// a solver works without bounds; ∂ℓ/∂ln σ = σ·∂ℓ/∂σ.
#pragma once

#include <Eigen/Dense>

namespace isoquant {

enum class InefficiencyDistribution { halfNormal, exponential };

struct FrontierData {
    const Eigen::MatrixXd& design; // n × p regressors of the frontier, a constant column first
    const Eigen::VectorXd& response; // ln y
};

// θ = (β, ln σᵥ, ln σᵤ).
double frontierLogLikelihood(InefficiencyDistribution distribution, const FrontierData& data,
                             const Eigen::VectorXd& theta);
Eigen::VectorXd frontierScore(InefficiencyDistribution distribution, const FrontierData& data,
                              const Eigen::VectorXd& theta);

// u given ε is N(μ*, σ*²) truncated below at 0 (Jondrow, Lovell, Materov and Schmidt 1982):
//   half-normal:  μ* = −ε σᵤ²/σ²,  σ* = σᵤσᵥ/σ;   exponential:  μ* = −ε − σᵥ²/σᵤ,  σ* = σᵥ.
struct TruncatedNormal {
    double location = 0; // μ*
    double scale = 0;    // σ*
};
TruncatedNormal inefficiencyGivenResidual(InefficiencyDistribution distribution, double residual, double noiseSd,
                                          double inefficiencySd);

// E[u|ε] = μ* + σ* φ(μ*/σ*)/Φ(μ*/σ*) (Jondrow et al. 1982).
double expectedInefficiency(const TruncatedNormal& conditional);
// E[exp(−u)|ε] = exp(−μ* + σ*²/2) Φ(μ*/σ* − σ*)/Φ(μ*/σ*) (Battese and Coelli 1988).
double expectedEfficiency(const TruncatedNormal& conditional);
// Bounds on exp(−u) at confidence `level` from the bounds on u (Horrace and Schmidt 1996):
//   u_low = μ* + σ* Φ⁻¹(1 − (1 − α/2) Φ(μ*/σ*)),  u_high = μ* + σ* Φ⁻¹(1 − (α/2) Φ(μ*/σ*)),  α = 1 − level;
// efficiency lies in [exp(−u_high), exp(−u_low)].
double efficiencyLowerBound(const TruncatedNormal& conditional, double level);
double efficiencyUpperBound(const TruncatedNormal& conditional, double level);

} // namespace isoquant
