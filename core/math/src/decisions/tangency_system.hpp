// The tangency system shared by the least-cost and budget solves (numerical_decisions.hpp), the
// Levenberg–Marquardt run used by every numerical decision, and the continuation that reaches a
// tangency the direct start does not (tangency_continuation.cpp). Private to core/math.
#pragma once

#include "isoquant/math/decisions/numerical_decisions.hpp"
#include "isoquant/math/forms/local_shape.hpp"
#include "isoquant/math/numerics/exact_elementwise.hpp"
#include "isoquant/math/numerics/log_sum.hpp"

#include <unsupported/Eigen/LevenbergMarquardt>

#include <cmath>
#include <functional>
#include <optional>

namespace isoquant::decisions_detail {

// Returned for a trial point outside the doubles: Levenberg–Marquardt then rejects the step and
// shortens its trust region, instead of stopping.
constexpr double offDomainResidual = 1e50;
// |ln x| beyond this leaves the ordinary doubles (e^700 ≈ 1e304).
constexpr double logBound = 700;

enum class Closing { output, spending };

// The tangency system of the least-cost and budget problems (numerical_decisions.hpp).
struct TangencySystem : Eigen::DenseFunctor<double> {
    TangencySystem(const Technology& technology, const Eigen::VectorXd& prices, Closing closing, double logLevel)
        : Eigen::DenseFunctor<double>(static_cast<int>(prices.size()) + 1, static_cast<int>(prices.size()) + 1),
          technology(technology), logPrices(exactLog(prices.array())), closing(closing), logLevel(logLevel)
    {
    }

    const Technology& technology;
    Eigen::ArrayXd logPrices;
    Closing closing;
    double logLevel;

    Eigen::Index k() const { return logPrices.size(); }

    bool inDomain(const Eigen::VectorXd& u) const
    {
        return u.allFinite() && u.head(k()).cwiseAbs().maxCoeff() <= logBound && std::fabs(u(k())) <= 2 * logBound;
    }

    // wᵢxᵢ/μ
    Eigen::ArrayXd spendingOverMu(const Eigen::VectorXd& u) const
    {
        return exactExp(u.head(k()).array() + logPrices - u(k()));
    }

    int operator()(const Eigen::VectorXd& u, Eigen::VectorXd& residuals) const
    {
        residuals.setConstant(offDomainResidual);
        if (!inDomain(u)) return 0;
        const Eigen::VectorXd x = u.head(k()).array().exp();
        for (Eigen::Index i = 0; i < k(); ++i) residuals(i) = spendingOverMu(u)(i) - technology.elasticity(x, i);
        residuals(k()) = closing == Closing::output ? technology.logOutput(x) - logLevel
                                                    : logSumExp(u.head(k()).array() + logPrices) - logLevel;
        if (!residuals.allFinite()) residuals.setConstant(offDomainResidual);
        return 0;
    }

    // ∂(wᵢxᵢ/μ − eᵢ)/∂ln xⱼ = δᵢⱼ·wᵢxᵢ/μ − (δᵢⱼeᵢ + Sᵢⱼ − eᵢeⱼ);  ∂/∂ln μ = −wᵢxᵢ/μ;
    // ∂ln f/∂ln xⱼ = eⱼ;  ∂ln Σwx/∂ln xⱼ = wⱼxⱼ/Σwx.
    int df(const Eigen::VectorXd& u, Eigen::MatrixXd& jacobian) const
    {
        const Eigen::VectorXd x = u.head(k()).array().exp();
        const LocalShape shape = localShape(technology, x);
        if (!isFinite(shape)) return -1;
        const Eigen::VectorXd& e = shape.elasticities;
        const Eigen::VectorXd spending = spendingOverMu(u).matrix();
        jacobian.setZero(k() + 1, k() + 1);
        jacobian.topLeftCorner(k(), k()) = Eigen::MatrixXd(spending.asDiagonal()) -
                                           (Eigen::MatrixXd(e.asDiagonal()) + shape.scaledHessian - e * e.transpose());
        jacobian.col(k()).head(k()) = -spending;
        if (closing == Closing::output) {
            jacobian.row(k()).head(k()) = e.transpose();
        } else {
            const Eigen::ArrayXd logSpending = u.head(k()).array() + logPrices;
            jacobian.row(k()).head(k()) = (logSpending - logSumExp(logSpending)).exp().matrix().transpose();
        }
        return jacobian.allFinite() ? 0 : -1;
    }
};

// Runs Levenberg–Marquardt from `start` (overwritten with the answer); returns the largest
// |residual| there.
template <typename System>
double solveSystem(System& system, Eigen::VectorXd& start, const NumericalSolveOptions& options)
{
    Eigen::LevenbergMarquardt<System> solver(system);
    solver.setMaxfev(options.maxEvaluations);
    // Stop on the step size or the reduction only when they reach rounding level; acceptance is
    // judged by the caller on the residuals themselves.
    solver.setXtol(1e-14);
    solver.setFtol(1e-14);
    solver.minimize(start);
    Eigen::VectorXd residuals(system.values());
    system(start, residuals);
    return residuals.cwiseAbs().maxCoeff();
}

// u = (ln x, ln μ) solving the tangency system at `logLevel` that `acceptable` takes, reached from
// a point where every elasticity is positive by continuation in the prices and the level; empty
// where no path tried ends in one.
std::optional<Eigen::VectorXd> tangencyByContinuation(const Technology& technology, const Eigen::VectorXd& prices,
                                                      Closing closing, double logLevel,
                                                      const NumericalSolveOptions& options,
                                                      const std::function<bool(const Eigen::VectorXd&)>& acceptable);

} // namespace isoquant::decisions_detail
