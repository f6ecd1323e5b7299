#include "isoquant/math/forms/ces.hpp"

#include <algorithm>
#include <cmath>
#include <limits>

namespace isoquant {

namespace {

// Below this |u| the derivative of K(u)/u comes from its series: the direct form (u·K′ − K)/u²
// loses about 2ε/((1−δ)·|u|) relative to cancellation, the series truncated after κ₅ about u⁴/144.
constexpr double seriesLimit = 1e-3;

// ln(eᵖ + e^q), with −∞ for a weight of 0.
double logSumExp(double p, double q)
{
    const double larger = std::max(p, q);
    if (larger == -std::numeric_limits<double>::infinity()) return larger;
    return larger + std::log1p(std::exp(std::min(p, q) - larger));
}

double logistic(double z) { return z >= 0 ? 1.0 / (1.0 + std::exp(-z)) : std::exp(z) / (1.0 + std::exp(z)); }

} // namespace

CesCompositeCurve::CesCompositeCurve(double weight, double curvature)
    : weight_(weight), curvature_(curvature), logWeight_(std::log(weight)), logComplement_(std::log1p(-weight))
{
}

double CesCompositeCurve::cumulantAt(double u) const
{
    // K(u) = ln(1 + δ·(eᵘ − 1)): log1p/expm1 keep its relative accuracy for small |u|.
    return std::fabs(u) <= 1 ? std::log1p(weight_ * std::expm1(u)) : logSumExp(logWeight_ + u, logComplement_);
}

double CesCompositeCurve::value(double logRatio) const
{
    const double d = logRatio;
    const double u = -curvature_ * d;
    return u == 0 ? weight_ * d : d * cumulantAt(u) / u;
}

CesComposite CesCompositeCurve::at(double logRatio) const
{
    const double d = logRatio;
    const double u = -curvature_ * d;
    const double weight = weight_;
    CesComposite composite;
    double cumulant = 0; // K(u)
    // π = K′(u) = δeᵘ/(δeᵘ + 1 − δ)
    composite.firstShare = logistic(u + logWeight_ - logComplement_);
    composite.secondShare = logistic(-(u + logWeight_ - logComplement_));
    if (u == 0) {
        composite.value = weight * d;
        composite.byWeight = d;
        composite.byWeightLogit = weight * (1 - weight) * d;
    } else {
        cumulant = cumulantAt(u);
        composite.value = d * cumulant / u;
        // ∂H/∂δ = d·(eᵘ − 1)/(u·(δeᵘ + 1 − δ)), written without eᵘ for u > 0
        composite.byWeight = u > 0 ? d * -std::expm1(-u) / (u * (weight + (1 - weight) * std::exp(-u)))
                                   : d * std::expm1(u) / (u * (weight * std::exp(u) + 1 - weight));
        // δ(1−δ)(eᵘ − 1)/(δeᵘ + 1 − δ) = π − δ = π(1 − δ) − δ(1 − π): for |u| > 1 the two products
        // differ by the factor eᵘ, at least e, so their difference keeps its digits also where δ is
        // near 1 (π − δ itself lost up to 2e-9 relative at δ = 1 − 1e-7; test_ces_columns.cpp)
        composite.byWeightLogit =
            std::fabs(u) <= 1 ? weight * (1 - weight) * composite.byWeight
                              : d * (composite.firstShare * (1 - weight) - weight * composite.secondShare) / u;
    }
    // ∂H/∂ρ = −d²·(u·K′(u) − K(u))/u² = −d²·d/du[K(u)/u]
    if (std::fabs(u) < seriesLimit) {
        // Bernoulli(δ) cumulants with q = δ(1−δ): κ₂ = q, κ₃ = q(1−2δ), κ₄ = q(1−6q), κ₅ = q(1−2δ)(1−12q);
        // d/du[K/u] = κ₂/2 + κ₃u/3 + κ₄u²/8 + κ₅u³/30 + …
        const double q = weight * (1 - weight);
        const double skew = 1 - 2 * weight;
        const double slope = q / 2 + q * skew * u / 3 + q * (1 - 6 * q) * u * u / 8 +
                             q * skew * (1 - 12 * q) * u * u * u / 30;
        composite.byCurvature = -d * d * slope;
    } else {
        composite.byCurvature = -d * d * (u * composite.firstShare - cumulant) / (u * u);
    }
    return composite;
}

CesComposite cesComposite(double logRatio, double weight, double curvature)
{
    return CesCompositeCurve(weight, curvature).at(logRatio);
}

namespace {

struct CesPoint {
    long double logOutput;
    double elasticities[2]; // ν·π, ν·(1−π)
    double shareProduct;    // π·(1−π)
};

CesPoint evaluate(const Ces& ces, const Eigen::VectorXd& inputs)
{
    const long double logFirst = std::log(static_cast<long double>(inputs(0)));
    const long double logSecond = std::log(static_cast<long double>(inputs(1)));
    const CesComposite composite = cesComposite(static_cast<double>(logFirst - logSecond), ces.weight, ces.curvature);
    CesPoint point;
    point.logOutput = ces.logScale + static_cast<long double>(ces.returnsToScale) * (logSecond + composite.value);
    point.elasticities[0] = ces.returnsToScale * composite.firstShare;
    point.elasticities[1] = ces.returnsToScale * composite.secondShare;
    point.shareProduct = composite.firstShare * composite.secondShare;
    return point;
}

} // namespace

double Ces::logOutput(const Eigen::VectorXd& inputs) const { return static_cast<double>(evaluate(*this, inputs).logOutput); }

double Ces::output(const Eigen::VectorXd& inputs) const
{
    return static_cast<double>(std::exp(evaluate(*this, inputs).logOutput));
}

double Ces::elasticity(const Eigen::VectorXd& inputs, Eigen::Index input) const
{
    return evaluate(*this, inputs).elasticities[input];
}

double Ces::marginalProduct(const Eigen::VectorXd& inputs, Eigen::Index input) const
{
    const CesPoint point = evaluate(*this, inputs);
    return scaledExponential(point.elasticities[input], point.logOutput - std::log(static_cast<long double>(inputs(input))));
}

double Ces::secondPartial(const Eigen::VectorXd& inputs, Eigen::Index first, Eigen::Index second) const
{
    const CesPoint point = evaluate(*this, inputs);
    const double cross = returnsToScale * curvature * point.shareProduct;
    return secondPartialFromElasticities(point.logOutput, inputs, first, second, point.elasticities[first],
                                         point.elasticities[second], first == second ? -cross : cross);
}

} // namespace isoquant
