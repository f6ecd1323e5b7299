// Closed-form decisions of the two-input CES technology
//   Y = A·[δ·x₁^(−ρ) + (1−δ)·x₂^(−ρ)]^(−ν/ρ),   A > 0, 0 < δ < 1, ρ > −1, ρ ≠ 0, ν > 0,
// taking its parameters as plain numbers, so that a CES technology class can hand them over.
// Elasticity of substitution σ = 1/(1+ρ). Least cost follows from the tangency condition
// f₁/f₂ = w₁/w₂, i.e. δ·x₁^(−ρ−1) / ((1−δ)·x₂^(−ρ−1)) = w₁/w₂, so along the expansion path
//   x₁/x₂ = t = (δ·w₂ / ((1−δ)·w₁))^σ,
// and one unit of output needs [δ·x₁^(−ρ) + (1−δ)·x₂^(−ρ)]^(−1/ρ) = A^(−1/ν):
//   a₂ = A^(−1/ν)·[δ·t^(−ρ) + 1 − δ]^(1/ρ),   a₁ = t·a₂,   c = w₁·a₁ + w₂·a₂.
// The technology is homogeneous of degree ν, so budget and profit follow as in homogeneous_cost.hpp.
#pragma once

#include "isoquant/math/forms/homogeneous_cost.hpp"

namespace isoquant {

struct CesParameters {
    double scale = 1;  // A
    double weight = 0.5; // δ, the weight of input 1
    double rho = 0.5;  // ρ
    double returns = 1; // ν
    double substitutionElasticity() const { return 1 / (1 + rho); }
};

// Empty when the parameters are inside the domain above; else a sentence saying which is not.
std::string cesParameterProblem(const CesParameters& parameters);

// Two positive prices; the parameters inside the domain (checked by the caller).
HomogeneousCost cesCost(const CesParameters& parameters, const Eigen::Vector2d& prices);

} // namespace isoquant
