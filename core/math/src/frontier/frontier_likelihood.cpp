#include "isoquant/math/frontier/frontier_likelihood.hpp"

#include "isoquant/math/frontier/normal_tail.hpp"

#include <cmath>

namespace isoquant {

namespace {

constexpr double logSqrtTwoPi = 0.91893853320467274178; // ½ ln 2π

struct Scales {
    double noise;       // σᵥ
    double inefficiency; // σᵤ
};

Scales scalesOf(const Eigen::VectorXd& theta)
{
    const Eigen::Index p = theta.size() - 2;
    return {std::exp(theta(p)), std::exp(theta(p + 1))};
}

Eigen::VectorXd residualsOf(const FrontierData& data, const Eigen::VectorXd& theta)
{
    return data.response - data.design * theta.head(data.design.cols());
}

double halfNormalRow(double residual, const Scales& s, double& dResidual, double& dNoise, double& dInefficiency)
{
    const double sigmaSquared = s.noise * s.noise + s.inefficiency * s.inefficiency;
    const double sigma = std::sqrt(sigmaSquared);
    const double argument = -residual * s.inefficiency / (s.noise * sigma); // −ελ/σ
    const double mills = inverseMillsRatio(argument);
    const double quadratic = residual * residual / (sigmaSquared * sigmaSquared);
    dResidual = -residual / sigmaSquared - mills * s.inefficiency / (s.noise * sigma);
    dInefficiency = -s.inefficiency / sigmaSquared + quadratic * s.inefficiency -
                    mills * residual * s.noise / (sigmaSquared * sigma);
    dNoise = -s.noise / sigmaSquared + quadratic * s.noise +
             mills * residual * s.inefficiency * (sigmaSquared + s.noise * s.noise) /
                 (s.noise * s.noise * sigmaSquared * sigma);
    return std::log(2.0) - logSqrtTwoPi - std::log(sigma) - residual * residual / (2 * sigmaSquared) +
           logNormalCdf(argument);
}

double exponentialRow(double residual, const Scales& s, double& dResidual, double& dNoise, double& dInefficiency)
{
    const double ratio = s.noise / s.inefficiency;
    const double argument = -residual / s.noise - ratio; // −ε/σᵥ − σᵥ/σᵤ
    const double mills = inverseMillsRatio(argument);
    dResidual = 1.0 / s.inefficiency - mills / s.noise;
    dInefficiency = (-1.0 - residual / s.inefficiency - ratio * ratio + mills * ratio) / s.inefficiency;
    dNoise = ratio / s.inefficiency + mills * (residual / (s.noise * s.noise) - 1.0 / s.inefficiency);
    return -std::log(s.inefficiency) + residual / s.inefficiency + 0.5 * ratio * ratio + logNormalCdf(argument);
}

double rowLikelihood(InefficiencyDistribution distribution, double residual, const Scales& s, double& dResidual,
                     double& dNoise, double& dInefficiency)
{
    return distribution == InefficiencyDistribution::halfNormal
               ? halfNormalRow(residual, s, dResidual, dNoise, dInefficiency)
               : exponentialRow(residual, s, dResidual, dNoise, dInefficiency);
}

} // namespace

double frontierLogLikelihood(InefficiencyDistribution distribution, const FrontierData& data,
                             const Eigen::VectorXd& theta)
{
    const Scales scales = scalesOf(theta);
    const Eigen::VectorXd residuals = residualsOf(data, theta);
    double sum = 0, dResidual = 0, dNoise = 0, dInefficiency = 0;
    for (Eigen::Index row = 0; row < residuals.size(); ++row)
        sum += rowLikelihood(distribution, residuals(row), scales, dResidual, dNoise, dInefficiency);
    return sum;
}

// ∂ℓ/∂β = −Xᵀ(∂ ln f/∂ε); ∂ℓ/∂ln σ = σ Σ ∂ ln f/∂σ.
Eigen::VectorXd frontierScore(InefficiencyDistribution distribution, const FrontierData& data,
                              const Eigen::VectorXd& theta)
{
    const Scales scales = scalesOf(theta);
    const Eigen::VectorXd residuals = residualsOf(data, theta);
    Eigen::VectorXd residualSlopes(residuals.size());
    double noiseSum = 0, inefficiencySum = 0;
    for (Eigen::Index row = 0; row < residuals.size(); ++row) {
        double dNoise = 0, dInefficiency = 0;
        rowLikelihood(distribution, residuals(row), scales, residualSlopes(row), dNoise, dInefficiency);
        noiseSum += dNoise;
        inefficiencySum += dInefficiency;
    }
    const Eigen::Index p = data.design.cols();
    Eigen::VectorXd score(p + 2);
    score.head(p) = -(data.design.transpose() * residualSlopes);
    score(p) = scales.noise * noiseSum;
    score(p + 1) = scales.inefficiency * inefficiencySum;
    return score;
}

TruncatedNormal inefficiencyGivenResidual(InefficiencyDistribution distribution, double residual, double noiseSd,
                                          double inefficiencySd)
{
    if (distribution == InefficiencyDistribution::exponential)
        return {-residual - noiseSd * noiseSd / inefficiencySd, noiseSd};
    const double sigmaSquared = noiseSd * noiseSd + inefficiencySd * inefficiencySd;
    return {-residual * inefficiencySd * inefficiencySd / sigmaSquared,
            inefficiencySd * noiseSd / std::sqrt(sigmaSquared)};
}

double expectedInefficiency(const TruncatedNormal& conditional)
{
    const double z = conditional.location / conditional.scale;
    return conditional.location + conditional.scale * inverseMillsRatio(z);
}

double expectedEfficiency(const TruncatedNormal& conditional)
{
    const double z = conditional.location / conditional.scale;
    return std::exp(-conditional.location + 0.5 * conditional.scale * conditional.scale +
                    logNormalCdf(z - conditional.scale) - logNormalCdf(z));
}

namespace {

constexpr double lowestLogProbability = -700.0; // exp(−700) ≈ 1e−304, still a normal double

// Φ⁻¹(p) from ln p. Where p would underflow (a row far on the efficient side of the frontier, where
// Φ(z) does), Newton's method on ln Φ(x) = ln p, whose step (ln Φ(x) − ln p)/(φ(x)/Φ(x)) uses the
// tail-accurate ln Φ and Mills ratio; from x₀ = −√(−2 ln p), left of the root since
// ln Φ(x) < −x²/2 there, the iterates of this concave increasing function rise to it monotonically.
double normalQuantileFromLog(double logProbability)
{
    if (logProbability > lowestLogProbability) return normalQuantile(std::exp(logProbability));
    double x = -std::sqrt(-2.0 * logProbability);
    for (int iteration = 0; iteration < 100; ++iteration) {
        const double step = (logNormalCdf(x) - logProbability) / inverseMillsRatio(x);
        x -= step;
        if (std::fabs(step) <= 1e-15 * std::fabs(x)) break;
    }
    return x;
}

// μ* + σ* Φ⁻¹(1 − q Φ(z)) = μ* − σ* Φ⁻¹(q Φ(z)), the second form accurate when q Φ(z) is small.
double inefficiencyQuantile(const TruncatedNormal& conditional, double tailShare)
{
    const double z = conditional.location / conditional.scale;
    return conditional.location - conditional.scale * normalQuantileFromLog(std::log(tailShare) + logNormalCdf(z));
}

} // namespace

double efficiencyLowerBound(const TruncatedNormal& conditional, double level)
{
    return std::exp(-inefficiencyQuantile(conditional, (1.0 - level) / 2.0));
}

double efficiencyUpperBound(const TruncatedNormal& conditional, double level)
{
    return std::exp(-inefficiencyQuantile(conditional, 1.0 - (1.0 - level) / 2.0));
}

} // namespace isoquant
