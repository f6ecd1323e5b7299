// A production technology Y = f(x) as the evaluators and decision functions see it, whatever its
// functional form. Every input bundle holds strictly positive amounts, in the model's input order.
#pragma once

#include "isoquant/math/forms/production_form.hpp"

#include <Eigen/Dense>

#include <optional>

namespace isoquant {

class Technology {
public:
    virtual ~Technology() = default;

    virtual ProductionForm form() const = 0;
    virtual Eigen::Index inputCount() const = 0;

    virtual double logOutput(const Eigen::VectorXd& inputs) const = 0;
    virtual double output(const Eigen::VectorXd& inputs) const = 0;
    // ∂Y/∂xᵢ
    virtual double marginalProduct(const Eigen::VectorXd& inputs, Eigen::Index input) const = 0;
    // ∂ln Y/∂ln xᵢ
    virtual double elasticity(const Eigen::VectorXd& inputs, Eigen::Index input) const = 0;
    // ν = Σᵢ ∂ln Y/∂ln xᵢ: output grows by about ν% when every input grows by 1%
    virtual double scaleElasticity(const Eigen::VectorXd& inputs) const = 0;
    // ∂²Y/∂xᵢ∂xⱼ
    virtual double secondPartial(const Eigen::VectorXd& inputs, Eigen::Index first, Eigen::Index second) const = 0;
    // ν when it is the same at every bundle (Cobb-Douglas, CES); empty when it varies (translog).
    virtual std::optional<double> constantScaleElasticity() const = 0;

    Eigen::VectorXd gradient(const Eigen::VectorXd& inputs) const;
    Eigen::MatrixXd hessian(const Eigen::VectorXd& inputs) const;

protected:
    // c·exp(L) in extended precision, so that it overflows or underflows only when the result does
    // (for |L| beyond the long double's safe range, formed in logs).
    static double scaledExponential(double coefficient, long double logMagnitude);
    // ∂²Y/∂xᵢ∂xⱼ = Y/(xᵢ·xⱼ)·(εᵢ·εⱼ + ∂εⱼ/∂ln xᵢ − [i = j]·εⱼ), from ln Y, the elasticities εᵢ, εⱼ
    // and the derivative of εⱼ by ln xᵢ.
    static double secondPartialFromElasticities(long double logOutput, const Eigen::VectorXd& inputs,
                                                Eigen::Index first, Eigen::Index second, double firstElasticity,
                                                double secondElasticity, double elasticityDerivative);
};

} // namespace isoquant
