// Calculus of a Cobb-Douglas technology Y = A·Πᵢ xᵢ^bᵢ at an input bundle x (all xᵢ > 0).
#pragma once

#include <Eigen/Dense>

namespace isoquant {

struct CobbDouglas {
    double logScale = 0;      // ln A
    Eigen::VectorXd exponents; // bᵢ, the output elasticities

    // Y = exp(ln A + Σ bᵢ ln xᵢ), formed in logs so that large bundles do not overflow early.
    double output(const Eigen::VectorXd& inputs) const;
    // ∂Y/∂xᵢ = bᵢ·Y/xᵢ
    double marginalProduct(const Eigen::VectorXd& inputs, Eigen::Index input) const;
    // ∂ln Y/∂ln xᵢ = bᵢ, the same at every bundle
    double elasticity(Eigen::Index input) const { return exponents(input); }
    // ν = Σ bᵢ: output grows by the factor t^ν when every input grows by t
    double scaleElasticity() const { return exponents.sum(); }
    // ∂²Y/∂xᵢ∂xⱼ = bᵢ·(bⱼ − δᵢⱼ)·Y/(xᵢ·xⱼ)
    double secondPartial(const Eigen::VectorXd& inputs, Eigen::Index first, Eigen::Index second) const;
    Eigen::MatrixXd hessian(const Eigen::VectorXd& inputs) const;
};

} // namespace isoquant
