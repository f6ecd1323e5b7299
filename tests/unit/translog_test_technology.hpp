// A translog technology for the tests only, from its defining formula
//   ln Y = a₀ + Σᵢ aᵢ·ln xᵢ + ½·Σᵢ Σⱼ bᵢⱼ·ln xᵢ·ln xⱼ   (b symmetric),
// whose derivatives follow by the chain rule:
//   eᵢ = xᵢ·fᵢ/Y = aᵢ + Σⱼ bᵢⱼ·ln xⱼ,   xᵢ·xⱼ·fᵢⱼ/Y = eᵢ·eⱼ + bᵢⱼ − [i = j]·eᵢ.
// Its substitution elasticities and returns to scale vary from bundle to bundle, which is what
// the generic calculus and solvers are checked on (the derivatives themselves by finite differences).
#pragma once

#include "isoquant/math/forms/technology.hpp"

#include <cmath>

namespace isoquant::testing {

class TranslogTestTechnology : public Technology {
public:
    TranslogTestTechnology(double constant, Eigen::VectorXd linear, Eigen::MatrixXd quadratic)
        : a0(constant), a(std::move(linear)), b(std::move(quadratic))
    {
    }

    ProductionForm form() const override { return ProductionForm::translog; }
    Eigen::Index inputCount() const override { return a.size(); }

    double logOutput(const Eigen::VectorXd& x) const override
    {
        const Eigen::VectorXd l = x.array().log();
        return a0 + a.dot(l) + 0.5 * l.dot(b * l);
    }
    double output(const Eigen::VectorXd& x) const override { return std::exp(logOutput(x)); }
    double elasticity(const Eigen::VectorXd& x, Eigen::Index i) const override
    {
        return a(i) + b.row(i).dot(Eigen::VectorXd(x.array().log()));
    }
    double marginalProduct(const Eigen::VectorXd& x, Eigen::Index i) const override
    {
        return elasticity(x, i) * output(x) / x(i);
    }
    double scaleElasticity(const Eigen::VectorXd& x) const override
    {
        double sum = 0;
        for (Eigen::Index i = 0; i < a.size(); ++i) sum += elasticity(x, i);
        return sum;
    }
    std::optional<double> constantScaleElasticity() const override { return std::nullopt; }
    double secondPartial(const Eigen::VectorXd& x, Eigen::Index i, Eigen::Index j) const override
    {
        const double ei = elasticity(x, i), ej = elasticity(x, j);
        const double scaled = ei * ej + b(i, j) - (i == j ? ei : 0.0);
        return scaled * output(x) / (x(i) * x(j));
    }

private:
    double a0;
    Eigen::VectorXd a;
    Eigen::MatrixXd b;
};

} // namespace isoquant::testing
