#include "isoquant/math/fits/seemingly_unrelated.hpp"

#include <cmath>

namespace isoquant {

namespace {

constexpr double twoPi = 6.283185307179586;
// A Σ or a weighted cross-product whose reciprocal condition is below this is treated as singular
// (an equation fitted exactly, or collinear terms): its inverse would carry no correct digit
// (common practice, no source).
constexpr double singularReciprocalCondition = 1e-13;

Eigen::MatrixXd residualsOf(const std::vector<Eigen::MatrixXd>& designs, const std::vector<Eigen::VectorXd>& responses,
                            const Eigen::VectorXd& coefficients)
{
    Eigen::MatrixXd residuals(responses.front().size(), static_cast<Eigen::Index>(responses.size()));
    for (std::size_t e = 0; e < designs.size(); ++e)
        residuals.col(static_cast<Eigen::Index>(e)) = responses[e] - designs[e] * coefficients;
    return residuals;
}

double reciprocalCondition(const Eigen::MatrixXd& symmetric)
{
    const Eigen::SelfAdjointEigenSolver<Eigen::MatrixXd> eigen(symmetric, Eigen::EigenvaluesOnly);
    const double largest = eigen.eigenvalues().maxCoeff();
    return largest > 0 ? eigen.eigenvalues().minCoeff() / largest : 0.0;
}

// The weighted normal equations Σₐ,c wₐc XₐᵀX_c b = Σₐ,c wₐc Xₐᵀy_c.
struct NormalEquations {
    Eigen::MatrixXd matrix;
    Eigen::VectorXd right;
};

NormalEquations normalEquations(const std::vector<Eigen::MatrixXd>& designs, const std::vector<Eigen::VectorXd>& responses,
                                const Eigen::MatrixXd& weights)
{
    const Eigen::Index p = designs.front().cols();
    NormalEquations normal{Eigen::MatrixXd::Zero(p, p), Eigen::VectorXd::Zero(p)};
    for (std::size_t a = 0; a < designs.size(); ++a)
        for (std::size_t c = 0; c < designs.size(); ++c) {
            const double w = weights(static_cast<Eigen::Index>(a), static_cast<Eigen::Index>(c));
            normal.matrix.noalias() += w * designs[a].transpose() * designs[c];
            normal.right.noalias() += w * designs[a].transpose() * responses[c];
        }
    return normal;
}

} // namespace

SystemFit iteratedSeeminglyUnrelated(const std::vector<Eigen::MatrixXd>& designs,
                                     const std::vector<Eigen::VectorXd>& responses, const SystemOptions& options)
{
    const auto m = static_cast<Eigen::Index>(designs.size());
    const auto n = static_cast<double>(responses.front().size());
    SystemFit fit;
    NormalEquations normal = normalEquations(designs, responses, Eigen::MatrixXd::Identity(m, m));
    if (reciprocalCondition(normal.matrix) < singularReciprocalCondition * singularReciprocalCondition) {
        fit.status = SystemStatus::singularDesign;
        return fit;
    }
    fit.coefficients = normal.matrix.ldlt().solve(normal.right);
    fit.status = SystemStatus::notConverged;
    for (fit.iterations = 1; fit.iterations <= options.maxIterations; ++fit.iterations) {
        fit.residuals = residualsOf(designs, responses, fit.coefficients);
        fit.disturbanceCovariance = fit.residuals.transpose() * fit.residuals / n;
        if (reciprocalCondition(fit.disturbanceCovariance) < singularReciprocalCondition) {
            fit.status = SystemStatus::singularCovariance;
            return fit;
        }
        normal = normalEquations(designs, responses, fit.disturbanceCovariance.inverse());
        const Eigen::VectorXd next = normal.matrix.ldlt().solve(normal.right);
        const double change = (next - fit.coefficients).cwiseAbs().maxCoeff();
        fit.coefficients = next;
        if (change <= options.tolerance * (1.0 + next.cwiseAbs().maxCoeff())) {
            fit.status = SystemStatus::converged;
            break;
        }
    }
    // Σ, the covariance and the likelihood at the final b.
    fit.residuals = residualsOf(designs, responses, fit.coefficients);
    fit.disturbanceCovariance = fit.residuals.transpose() * fit.residuals / n;
    normal = normalEquations(designs, responses, fit.disturbanceCovariance.inverse());
    fit.covariance = normal.matrix.inverse();
    // ln|Σ| as the sum of the logs of LDLᵀ's pivots: a determinant of tiny residuals' Σ could underflow.
    const double logDeterminant = fit.disturbanceCovariance.ldlt().vectorD().array().log().sum();
    fit.logLikelihood = -0.5 * n * static_cast<double>(m) * (1.0 + std::log(twoPi)) - 0.5 * n * logDeterminant;
    return fit;
}

} // namespace isoquant
