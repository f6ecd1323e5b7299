// A two-input CES technology for the tests only, written from its textbook formula
//   Y = A·G^(−ν/ρ),  G = δ·x₁^(−ρ) + (1−δ)·x₂^(−ρ),
// with its derivatives in terms of the shares sᵢ = δᵢ·xᵢ^(−ρ)/G (δ₁ = δ, δ₂ = 1 − δ):
//   xᵢ·fᵢ/Y = ν·sᵢ,   xᵢ·xⱼ·fᵢⱼ/Y = ν·sᵢ·((ν+ρ)·sⱼ − (1+ρ)·[i = j]).
// It lets the generic calculus and solvers be checked on a technology other than Cobb-Douglas,
// against the CES closed forms; the derivatives themselves are checked by finite differences.
#pragma once

#include "isoquant/math/decisions/ces_closed_forms.hpp"
#include "isoquant/math/forms/technology.hpp"

#include <cmath>

namespace isoquant::testing {

class CesTestTechnology : public Technology {
public:
    explicit CesTestTechnology(CesParameters parameters) : p(parameters) {}

    ProductionForm form() const override { return ProductionForm::ces; }
    Eigen::Index inputCount() const override { return 2; }

    double logOutput(const Eigen::VectorXd& x) const override
    {
        return std::log(p.scale) - p.returns / p.rho * std::log(sum(x));
    }
    double output(const Eigen::VectorXd& x) const override { return std::exp(logOutput(x)); }
    double elasticity(const Eigen::VectorXd& x, Eigen::Index i) const override { return p.returns * share(x, i); }
    double marginalProduct(const Eigen::VectorXd& x, Eigen::Index i) const override
    {
        return elasticity(x, i) * output(x) / x(i);
    }
    double scaleElasticity(const Eigen::VectorXd&) const override { return p.returns; }
    std::optional<double> constantScaleElasticity() const override { return p.returns; }
    double secondPartial(const Eigen::VectorXd& x, Eigen::Index i, Eigen::Index j) const override
    {
        const double own = i == j ? 1.0 : 0.0;
        const double scaled = p.returns * share(x, i) * ((p.returns + p.rho) * share(x, j) - (1 + p.rho) * own);
        return scaled * output(x) / (x(i) * x(j));
    }

private:
    double weight(Eigen::Index i) const { return i == 0 ? p.weight : 1 - p.weight; }
    double sum(const Eigen::VectorXd& x) const
    {
        return p.weight * std::pow(x(0), -p.rho) + (1 - p.weight) * std::pow(x(1), -p.rho);
    }
    double share(const Eigen::VectorXd& x, Eigen::Index i) const { return weight(i) * std::pow(x(i), -p.rho) / sum(x); }

    CesParameters p;
};

} // namespace isoquant::testing
