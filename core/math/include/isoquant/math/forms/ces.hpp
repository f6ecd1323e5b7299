// The CES technology of two inputs, Y = A·[δ·x₁^(−ρ) + (1−δ)·x₂^(−ρ)]^(−ν/ρ), δ ∈ [0, 1], ρ ≥ −1,
// and its calculus. σ = 1/(1+ρ) is the elasticity of substitution; ρ → 0 is the Cobb-Douglas
// limit A·x₁^(νδ)·x₂^(ν(1−δ)), ρ = −1 perfect substitutes, ρ → ∞ fixed proportions.
//
// Everything is computed in logs from b = ln x₂ and d = ln x₁ − ln x₂:
//   ln Y = ln A + ν·(b + H),  H = −K(u)/ρ = d·K(u)/u,  u = −ρ·d,
//   K(u) = ln(δ·eᵘ + 1 − δ), the cumulant generating function of a Bernoulli(δ) variable, so that
//   H → δ·d as ρ → 0 without 0/0 and nothing overflows for large |ρ·d|.
#pragma once

#include "isoquant/math/forms/technology.hpp"

namespace isoquant {

// H and its partial derivatives at (d, δ, ρ).
struct CesComposite {
    double value = 0;          // H
    double byWeight = 0;       // ∂H/∂δ (overflows where δ is 0 or 1 and |ρ·d| is beyond the range of exp)
    double byWeightLogit = 0;  // ∂H/∂t for δ = 1/(1 + e^(−t)): δ(1−δ)·∂H/∂δ = d·(π − δ)/u, always finite
    double byCurvature = 0;    // ∂H/∂ρ
    double firstShare = 0;     // π = ∂H/∂d = δ·x₁^(−ρ) / (δ·x₁^(−ρ) + (1−δ)·x₂^(−ρ))
    double secondShare = 0;    // 1 − π, formed on its own to keep its digits when π is near 1
};

CesComposite cesComposite(double logRatio, double weight, double curvature);

// H along d for one (δ, ρ), as a fit evaluates it on every row: ln δ and ln(1−δ) are taken once,
// and value() gives H alone (one expm1 and one log1p per row, or one exp and one log1p for |u| > 1).
// Both give bit for bit what cesComposite gives.
class CesCompositeCurve {
public:
    CesCompositeCurve(double weight, double curvature);
    double value(double logRatio) const;
    CesComposite at(double logRatio) const;

private:
    double cumulantAt(double u) const; // K(u) for u ≠ 0

    double weight_;
    double curvature_;
    double logWeight_;     // ln δ, −∞ at δ = 0
    double logComplement_; // ln(1 − δ), −∞ at δ = 1
};

class Ces : public Technology {
public:
    Ces(double logScale, double weight, double curvature, double returnsToScale)
        : logScale(logScale), weight(weight), curvature(curvature), returnsToScale(returnsToScale) {}

    double logScale;       // ln A
    double weight;         // δ, the weight of the first input
    double curvature;      // ρ
    double returnsToScale; // ν

    double substitutionElasticity() const { return 1.0 / (1.0 + curvature); } // σ

    ProductionForm form() const override { return ProductionForm::ces; }
    Eigen::Index inputCount() const override { return 2; }
    double logOutput(const Eigen::VectorXd& inputs) const override;
    double output(const Eigen::VectorXd& inputs) const override;
    // ∂Y/∂xᵢ = εᵢ·Y/xᵢ
    double marginalProduct(const Eigen::VectorXd& inputs, Eigen::Index input) const override;
    // ε₁ = ν·π, ε₂ = ν·(1−π)
    double elasticity(const Eigen::VectorXd& inputs, Eigen::Index input) const override;
    double scaleElasticity(const Eigen::VectorXd&) const override { return returnsToScale; }
    std::optional<double> constantScaleElasticity() const override { return returnsToScale; }
    // From the elasticities: ∂ε₁/∂ln x₁ = −ν·ρ·π·(1−π) = −∂ε₁/∂ln x₂, and ε₂ = ν − ε₁.
    double secondPartial(const Eigen::VectorXd& inputs, Eigen::Index first, Eigen::Index second) const override;
};

} // namespace isoquant
