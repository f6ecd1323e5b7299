#include "fits/ces_columns.hpp"

#include "isoquant/math/forms/ces.hpp"

#include <algorithm>
#include <cmath>

namespace isoquant::ces_fit {

namespace {

// As in ces.cpp: below this |u| ∂H/∂ρ comes from the series of d/du[K(u)/u].
constexpr double seriesLimit = 1e-3;

struct Shape {
    double weight;        // δ
    double complement;    // 1 − δ
    double logWeight;     // ln δ
    double logComplement; // ln(1 − δ)
    double curvature;     // ρ
};

struct RowParts {
    double value;       // H
    double byLogit;     // ∂H/∂t
    double byWeight;    // ∂H/∂δ
    double byCurvature; // ∂H/∂ρ
};

// ∂H/∂ρ = −d²·(u·π − K)/u², or −d²·(κ₂/2 + κ₃u/3 + κ₄u²/8 + κ₅u³/30) below seriesLimit (ces.cpp).
double curvatureDerivative(double d, double u, double share, double cumulant, const Shape& shape)
{
    if (std::fabs(u) >= seriesLimit) return -d * d * (u * share - cumulant) / (u * u);
    const double q = shape.weight * shape.complement;
    const double skew = 1 - 2 * shape.weight;
    const double slope = q / 2 + q * skew * u / 3 + q * (1 - 6 * q) * u * u / 8 + q * skew * (1 - 12 * q) * u * u * u / 30;
    return -d * d * slope;
}

// One row, with two calls of exp/expm1 and log1p where CesCompositeCurve::at makes six: K, π and
// 1 − π share the exponential. The forms and branches are those of ces.cpp.
RowParts rowParts(double d, const Shape& shape)
{
    const double u = -shape.curvature * d;
    const double q = shape.weight * shape.complement; // dδ/dt
    if (u == 0) return {shape.weight * d, q * d, d, curvatureDerivative(d, u, 0, 0, shape)};
    double cumulant = 0; // K(u)
    double share = 0;    // π = δeᵘ/(δeᵘ + 1 − δ)
    double byWeight = 0;
    double byLogit = 0;
    if (std::fabs(u) <= 1) {
        // K = log1p(δ·expm1(u)), ∂H/∂δ = d·expm1(u)/(u·(δeᵘ + 1 − δ))
        const double expm1 = std::expm1(u);
        const double mix = 1 + shape.weight * expm1; // δeᵘ + 1 − δ
        cumulant = std::log1p(shape.weight * expm1);
        share = shape.weight * (1 + expm1) / mix;
        byWeight = d * expm1 / (u * mix);
        byLogit = q * byWeight;
    } else {
        // K = max(a, c) + log1p(e^(min − max)), a = ln δ + u, c = ln(1−δ); π = logistic(a − c)
        const double a = shape.logWeight + u;
        const double c = shape.logComplement;
        const double larger = std::max(a, c);
        const double ratio = std::exp(std::min(a, c) - larger); // e^(−|a − c|)
        cumulant = larger + std::log1p(ratio);
        share = a >= c ? 1 / (1 + ratio) : ratio / (1 + ratio);
        const double second = a >= c ? ratio / (1 + ratio) : 1 / (1 + ratio); // 1 − π
        // π − δ = π(1−δ) − δ(1−π) = δ(1−δ)(eᵘ − 1)/(δeᵘ + 1 − δ): the two products differ by the
        // factor eᵘ, at least e here, so their difference keeps its digits also where δ is near 1.
        const double shareGap = share * shape.complement - shape.weight * second;
        byLogit = d * shareGap / u;
        byWeight = d * (shareGap / q) / u;
    }
    return {d * cumulant / u, byLogit, byWeight, curvatureDerivative(d, u, share, cumulant, shape)};
}

} // namespace

void evaluateComposite(const Eigen::VectorXd& logRatio, double weight, double curvature, CesColumns& columns)
{
    const Eigen::Index n = logRatio.size();
    columns.value.resize(n);
    // Where δ is 0 or 1 (a boundary) the forms of CesCompositeCurve handle the infinite logs.
    const Shape shape{weight, 1 - weight, std::log(weight), std::log1p(-weight), curvature};
    const bool interior = weight > 0 && weight < 1;
    columns.byLogit.resize(n);
    columns.byWeight.resize(n);
    columns.byCurvature.resize(n);
    const CesCompositeCurve curve(weight, curvature);
    for (Eigen::Index i = 0; i < n; ++i) {
        if (interior) {
            const RowParts row = rowParts(logRatio(i), shape);
            columns.value(i) = row.value;
            columns.byLogit(i) = row.byLogit;
            columns.byWeight(i) = row.byWeight;
            columns.byCurvature(i) = row.byCurvature;
        } else {
            const CesComposite composite = curve.at(logRatio(i));
            columns.value(i) = composite.value;
            columns.byLogit(i) = composite.byWeightLogit;
            columns.byWeight(i) = composite.byWeight;
            columns.byCurvature(i) = composite.byCurvature;
        }
    }
}

} // namespace isoquant::ces_fit
