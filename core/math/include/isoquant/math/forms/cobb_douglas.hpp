// Calculus of a Cobb-Douglas technology Y = A·Πᵢ xᵢ^bᵢ at an input bundle x (all xᵢ > 0).
#pragma once

#include "isoquant/math/forms/technology.hpp"

namespace isoquant {

class CobbDouglas : public Technology {
public:
    CobbDouglas() = default;
    CobbDouglas(double logScale, Eigen::VectorXd exponents) : logScale(logScale), exponents(std::move(exponents)) {}

    double logScale = 0;       // ln A
    Eigen::VectorXd exponents; // bᵢ, the output elasticities

    ProductionForm form() const override { return ProductionForm::cobbDouglas; }
    Eigen::Index inputCount() const override { return exponents.size(); }

    // ln Y = ln A + Σ bᵢ ln xᵢ; every quantity below is formed from it in logs, so that it
    // overflows or underflows only when its own value does.
    double logOutput(const Eigen::VectorXd& inputs) const override;
    double output(const Eigen::VectorXd& inputs) const override;
    // ∂Y/∂xᵢ = bᵢ·Y/xᵢ
    double marginalProduct(const Eigen::VectorXd& inputs, Eigen::Index input) const override;
    // bᵢ, the same at every bundle
    double elasticity(const Eigen::VectorXd&, Eigen::Index input) const override { return exponents(input); }
    double elasticity(Eigen::Index input) const { return exponents(input); }
    // ν = Σ bᵢ: output grows by the factor t^ν when every input grows by t
    double scaleElasticity(const Eigen::VectorXd&) const override { return scaleElasticity(); }
    double scaleElasticity() const { return exponents.sum(); }
    std::optional<double> constantScaleElasticity() const override { return scaleElasticity(); }
    // ∂²Y/∂xᵢ∂xⱼ = bᵢ·(bⱼ − δᵢⱼ)·Y/(xᵢ·xⱼ)
    double secondPartial(const Eigen::VectorXd& inputs, Eigen::Index first, Eigen::Index second) const override;
};

} // namespace isoquant
