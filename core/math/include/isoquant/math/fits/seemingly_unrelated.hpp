// Seemingly unrelated regressions sharing one coefficient vector b (cross-equation restrictions
// written into the designs): equation e is y_e = X_e·b + u_e, e = 1…m, each n rows, with the m
// disturbances of a row correlated (covariance Σ) and rows independent. Iterated feasible GLS:
//   b⁽⁰⁾ from least squares on the stacked equations (Σ = I);
//   Σ⁽ʳ⁾ = EᵀE/n from the residuals E (n × m) of b⁽ʳ⁾ (divisor n);
//   b⁽ʳ⁺¹⁾ = (Σₐ,c wₐc XₐᵀX_c)⁻¹ Σₐ,c wₐc Xₐᵀy_c,   W = (Σ⁽ʳ⁾)⁻¹,
// until b changes by less than tolerance·(1 + max|b|). At convergence this is the Gaussian maximum
// likelihood estimate (Oberhofer and Kmenta 1974; Greene, Econometric Analysis, ch. 10; from memory)
// with covariance (Σₐ,c wₐc XₐᵀX_c)⁻¹ and log-likelihood −(n·m/2)(1 + ln 2π) − (n/2) ln|Σ|.
#pragma once

#include <Eigen/Dense>

#include <vector>

namespace isoquant {

enum class SystemStatus { converged, notConverged, singularCovariance, singularDesign };

struct SystemFit {
    SystemStatus status = SystemStatus::converged;
    Eigen::VectorXd coefficients;
    Eigen::MatrixXd covariance; // of the coefficients
    Eigen::MatrixXd residuals;  // n × m, one column per equation
    Eigen::MatrixXd disturbanceCovariance; // Σ, divisor n
    double logLikelihood = 0;
    int iterations = 0;
};

struct SystemOptions {
    // Relative change of b that ends the iteration: the rounding floor of the weighted normal
    // equations is near 1e-12 on real data, and each round shrinks the error by a factor well below 1
    // (common practice, no source).
    double tolerance = 1e-10;
    int maxIterations = 2000;
};

SystemFit iteratedSeeminglyUnrelated(const std::vector<Eigen::MatrixXd>& designs,
                                     const std::vector<Eigen::VectorXd>& responses, const SystemOptions& options = {});

} // namespace isoquant
