// The triangular factor of a column-scaled design, by one of two routes (least_squares.cpp):
// Householder QR in double when its error estimate allows, else column-pivoting Householder QR in
// long double. Internal to the core.
#pragma once

#include <Eigen/Core>

#include <optional>

namespace isoquant {

struct LeastSquaresFactor {
    Eigen::PermutationMatrix<Eigen::Dynamic> permutation; // columns of the design as factorised
    Eigen::MatrixXd upper;                                // R (p × p) of design·P = Q·R
    Eigen::MatrixXd upperInverse;                         // R⁻¹, formed in the factor's precision
    Eigen::VectorXd coefficients;                         // minimiser of ‖response − design·b‖, scaled
    Eigen::VectorXd residuals;                            // response − design·b
    Eigen::VectorXd singularValues;                       // of R, largest first
    Eigen::VectorXd nullDirection;                        // right singular vector of the smallest one
};

// Householder QR in double (vectorised, no pivoting). Returns nothing when the first-order error
// estimate u·(κ + κ²·‖r‖/(‖X‖₂·‖b‖)) of that solution (Golub and Van Loan, Matrix Computations,
// §5.3.8; u = 2⁻⁵³, κ the 2-norm condition number) exceeds `errorLimit`: the caller then takes the
// extended route. Large residuals with a moderate κ (the NIST Wampler4 and Wampler5 sets) are
// refused by the κ² term.
std::optional<LeastSquaresFactor> factorInDouble(const Eigen::MatrixXd& scaledDesign,
                                                 const Eigen::VectorXd& response, double errorLimit);

// Column-pivoting Householder QR in long double (64-bit mantissa): the NIST StRD Wampler and Filip
// sets need the extra digits.
LeastSquaresFactor factorInExtendedPrecision(const Eigen::MatrixXd& scaledDesign, const Eigen::VectorXd& response);

} // namespace isoquant
