// Calculus of a Cobb-Douglas technology Y = A·Πᵢ xᵢ^bᵢ at an input bundle x (all xᵢ > 0).
#pragma once

#include <Eigen/Dense>

namespace isoquant {

struct CobbDouglas {
    double logScale = 0;      // ln A
    Eigen::VectorXd exponents; // bᵢ, the output elasticities

    // ln Y = ln A + Σ bᵢ ln xᵢ; every quantity below is formed from it in logs, so that it
    // overflows or underflows only when its own value does.
    double logOutput(const Eigen::VectorXd& inputs) const;
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
