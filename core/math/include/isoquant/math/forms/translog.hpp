// The translog technology of k inputs, with the ½ convention and a symmetric β:
//   ln Y = α₀ + Σᵢ αᵢ·ln xᵢ + ½·Σᵢ Σⱼ βᵢⱼ·ln xᵢ·ln xⱼ,
// so that the output elasticities εᵢ = αᵢ + Σⱼ βᵢⱼ·ln xⱼ vary with the bundle, and with them the
// marginal products εᵢ·Y/xᵢ and the local returns to scale ν(x) = Σᵢ εᵢ. All βᵢⱼ = 0 is Cobb-Douglas.
#pragma once

#include "isoquant/math/forms/technology.hpp"

namespace isoquant {

class Translog : public Technology {
public:
    // `interactions` must be square and symmetric, of the size of `firstOrder`.
    Translog(double logScale, Eigen::VectorXd firstOrder, Eigen::MatrixXd interactions)
        : logScale(logScale), firstOrder(std::move(firstOrder)), interactions(std::move(interactions)) {}

    double logScale;            // α₀
    Eigen::VectorXd firstOrder; // αᵢ
    Eigen::MatrixXd interactions; // βᵢⱼ

    ProductionForm form() const override { return ProductionForm::translog; }
    Eigen::Index inputCount() const override { return firstOrder.size(); }
    double logOutput(const Eigen::VectorXd& inputs) const override;
    double output(const Eigen::VectorXd& inputs) const override;
    double marginalProduct(const Eigen::VectorXd& inputs, Eigen::Index input) const override;
    double elasticity(const Eigen::VectorXd& inputs, Eigen::Index input) const override;
    double scaleElasticity(const Eigen::VectorXd& inputs) const override;
    // ∂εⱼ/∂ln xᵢ = βᵢⱼ
    double secondPartial(const Eigen::VectorXd& inputs, Eigen::Index first, Eigen::Index second) const override;
    // Σ αᵢ when every row of β sums to 0 (then ν is the same everywhere); empty otherwise.
    std::optional<double> constantScaleElasticity() const override;

private:
    long double extendedLogOutput(const Eigen::VectorXd& logInputs) const;
};

} // namespace isoquant
