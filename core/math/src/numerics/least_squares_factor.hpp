// The triangular factor of a column-scaled design, by one of two routes (least_squares.cpp):
// a blocked Householder QR in double when its error estimate allows, else column-pivoting
// Householder QR in long double on the whole design. Internal to the core.
#pragma once

#include "isoquant/math/numerics/regression_rows.hpp"

#include <Eigen/Core>

#include <algorithm>

namespace isoquant {

struct LeastSquaresFactor {
    Eigen::VectorXd columnScales;                         // D: powers of two, design·D has unit-order columns
    Eigen::PermutationMatrix<Eigen::Dynamic> permutation; // columns of design·D as factorised
    Eigen::MatrixXd upper;                                // R (p × p) of design·D·P = Q·R
    Eigen::MatrixXd upperInverse;                         // R⁻¹, formed in the factor's precision
    Eigen::VectorXd coefficients;                         // minimiser of ‖response − design·b‖ (b, unscaled)
    Eigen::VectorXd residuals;                            // response − design·b; empty until computed
    Eigen::VectorXd singularValues;                       // of R, largest first
    Eigen::VectorXd nullDirection;                        // right singular vector of the smallest one
};

// What one pass over the rows learns of the response, for TSS and the perfect-fit test.
struct ResponseMoments {
    double mean = 0;
    double centredSumOfSquares = 0; // Σ(y − ȳ)²
    double sumOfSquares = 0;        // Σy²
};

struct DoubleRouteFactor {
    LeastSquaresFactor factor;
    ResponseMoments response;
    // u·(κ + κ²·‖r‖/(‖X‖₂·‖b‖)), the first-order error estimate of the solution (Golub and Van
    // Loan, Matrix Computations, §5.3.8; u = 2⁻⁵³, κ the 2-norm condition number of design·D).
    double errorEstimate = 0;
};

// Calls visit(first, design, response) for consecutive blocks of at most rowsPerBlock rows.
template <typename Visit>
void forEachBlock(const RegressionRows& rows, Eigen::Index rowsPerBlock, Visit&& visit)
{
    const Eigen::Index n = rows.rows();
    const Eigen::Index blockRows = std::max<Eigen::Index>(1, std::min(rowsPerBlock, n));
    Eigen::MatrixXd design(blockRows, rows.columns());
    Eigen::VectorXd response(blockRows);
    for (Eigen::Index first = 0; first < n; first += blockRows) {
        const Eigen::Index count = std::min(blockRows, n - first);
        rows.fill(first, design.topRows(count), response.head(count));
        visit(first, design.topRows(count), response.head(count));
    }
}

// One pass over the rows, `rowsPerBlock` at a time: each block, scaled by powers of two, is stacked
// under the triangular factor so far and factorised again (TSQR), so memory stays O(rowsPerBlock·p)
// for any n. The response rides along as an extra column: its last diagonal entry is ±‖r‖.
// Householder QR commutes exactly with power-of-two column scaling, so rescaling the factor when a
// later block holds larger values changes no digit. Coefficients are formed; residuals are not (a
// second pass). The singular values and null direction are always filled, so the caller can decide
// rank first. Throws std::invalid_argument for a value that is not finite.
DoubleRouteFactor factorByBlocksInDouble(const RegressionRows& rows, Eigen::Index rowsPerBlock);

// Column-pivoting Householder QR in long double (64-bit mantissa) of the whole design, scaled by
// `columnScales`: the NIST StRD Wampler and Filip sets need the extra digits. Fills residuals.
LeastSquaresFactor factorInExtendedPrecision(const RegressionRows& rows, const Eigen::VectorXd& columnScales);

} // namespace isoquant
