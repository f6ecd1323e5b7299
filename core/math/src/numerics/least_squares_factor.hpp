// The triangular factor of a column-scaled design, by one of three routes (least_squares.cpp):
// the normal equations for many well-conditioned rows, a blocked Householder QR in double when its
// error estimate allows, else column-pivoting Householder QR in long double on the whole design.
// Internal to the core.
#pragma once

#include "isoquant/math/numerics/regression_rows.hpp"

#include <Eigen/Core>

#include <algorithm>
#include <cmath>
#include <limits>
#include <optional>

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

// 2^−e with 2^e ≤ |value| < 2^(e+1): the power of two that brings `value` into [1, 2). Only for
// normal numbers: below DBL_MIN, 2^−e overflows (2^1074 for the smallest subnormal).
double unitScale(double value);

// A column whose largest magnitude is subnormal cannot be scaled to unit order, and a coefficient on
// it would overflow: it counts as a zero column, which the factor refuses as collinear.
bool negligible(double magnitude);

// Fills the singular values of factor.upper and the right singular vector of the smallest.
void addSingularValues(LeastSquaresFactor& factor);

// Adds a block of the response to the moments of the blocks before it (`counted` rows so far).
void addToMoments(ResponseMoments& moments, double& counted, const Eigen::Ref<const Eigen::VectorXd>& response);

// u = 2⁻⁵³, the unit roundoff of double.
inline const double unitRoundoff = std::ldexp(1.0, -53);

// DoubleRouteFactor::errorEstimate from the condition number κ, σ₁ = ‖X‖₂, ‖r‖ and ‖b‖, all in
// the column-scaled units.
double householderErrorEstimate(double condition, double largestSingularValue, double residualNorm,
                                double coefficientNorm);

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

// One pass over the rows forms the Gram matrix [X y]ᵀ[X y] a block at a time (no Householder
// steps: half the flops of the TSQR, and vectorised); scaled by powers of two to unit diagonal,
// its Cholesky factor R stands for the QR's R (RᵀR = D·XᵀX·D, the same matrix in exact
// arithmetic) and gives the coefficients of the normal equations, whose error is of order u·κ²
// rather than the QR's u·κ; refineCoefficients brings them back to the QR's accuracy. The error
// estimate is the Householder route's, so that both routes are held to the same rule. Nothing is
// returned, and the caller takes the Householder route, when a column holds a value that is not
// finite or values too large or too small to square unscaled, when the Cholesky factorisation
// fails, or when u·κ² is too large for one step of refinement to suffice
// (normal_equations_factor.cpp).
// The rows are filled `rowsPerFill` at a time and summed `rowsPerSum` at a time (the partial sums
// of a longer run would carry more rounding).
std::optional<DoubleRouteFactor> factorByNormalEquations(const RegressionRows& rows, Eigen::Index rowsPerFill,
                                                         Eigen::Index rowsPerSum);

// r = y − X·b for the rows first … first + residuals.size() − 1 of held columns: each row's terms
// subtracted in column order, whatever the block, so the result does not depend on how the rows
// are cut.
void residualsOfHeldRows(const HeldColumns& held, Eigen::Index first, const Eigen::VectorXd& coefficients,
                         Eigen::Ref<Eigen::VectorXd> residuals);

// Calls visit(first, residuals) for consecutive blocks of at most rowsPerBlock held rows, with
// residuals = y − X·b of the block (residualsOfHeldRows) written into `out` (n values, or one block).
template <typename Visit>
void forEachHeldBlock(const HeldColumns& held, Eigen::Index rows, Eigen::Index rowsPerBlock,
                      const Eigen::VectorXd& coefficients, Eigen::Ref<Eigen::VectorXd> out, Visit&& visit)
{
    const Eigen::Index blockRows = std::max<Eigen::Index>(1, std::min(rowsPerBlock, rows));
    const bool wholeColumn = out.size() == rows;
    for (Eigen::Index first = 0; first < rows; first += blockRows) {
        const Eigen::Index count = std::min(blockRows, rows - first);
        auto residuals = out.segment(wholeColumn ? first : 0, count);
        residualsOfHeldRows(held, first, coefficients, residuals);
        visit(first, residuals);
    }
}

// One step of iterative refinement of factor.coefficients: a pass forms r = y − X·b and Xᵀr, and
// b += (XᵀX)⁻¹·Xᵀr through the factor. The residuals are not kept (the caller's residual pass
// forms them from the refined b).
// Held rows are visited `rowsPerFill` at a time and summed `rowsPerBlock` at a time; rows that are
// not held, `rowsPerBlock` at a time.
void refineCoefficients(const RegressionRows& rows, Eigen::Index rowsPerFill, Eigen::Index rowsPerBlock, LeastSquaresFactor& factor);

// Σr² and Σe^r of the residuals r of the refined coefficients (exps: NaN unless asked for).
struct ResidualSums {
    double squares = 0;
    double exps = std::numeric_limits<double>::quiet_NaN();
};

// refineCoefficients over held columns, for a caller that keeps no residuals: the refinement's pass
// also yields their sums, so the rows are read once after the Gram pass instead of twice. With r the
// residuals of b before the step δ, r' = r − X·δ those after it, and z = R⁻ᵀ·D·Xᵀr (δ = D·R⁻¹·z):
//   Σr'² = Σr² − ‖z‖²   (δ solves the normal equations of r: Xᵀr' = 0, so ‖X·δ‖² = δᵀXᵀr = ‖z‖²);
//   Σe^{r'} = Σe^r·e^{−xᵢᵀδ} = Σe^r − δᵀ·Σxᵢe^{rᵢ} + E,  0 ≤ E ≤ ½·m²·e^m·Σe^r,  m = maxᵢ|xᵢᵀδ|,
// with m ≤ Σⱼ|δⱼ|·‖X·eⱼ‖. The coefficients are always refined; nothing is returned, and the caller
// forms the residuals of the refined b in a pass of its own, when that bound on E exceeds 2⁻⁶⁰ of
// the sum (δ is of order u·κ² relative, so it never does on the designs this route accepts).
std::optional<ResidualSums> refineWithResidualSums(const HeldColumns& held, Eigen::Index rows, Eigen::Index rowsPerFill,
                                                   Eigen::Index rowsPerBlock, LeastSquaresFactor& factor, bool sumExps);

// Column-pivoting Householder QR in long double (64-bit mantissa) of the whole design, scaled by
// `columnScales`: the NIST StRD Wampler and Filip sets need the extra digits. Fills residuals.
LeastSquaresFactor factorInExtendedPrecision(const RegressionRows& rows, const Eigen::VectorXd& columnScales);

} // namespace isoquant
