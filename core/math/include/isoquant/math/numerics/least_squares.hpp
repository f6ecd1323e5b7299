// General linear least squares with classical or heteroskedasticity-robust inference.
//
// This is the numerical engine under every log-linear production fit, and the entry point the
// NIST StRD linear checks call directly (any design matrix, with or without a constant column).
#pragma once

#include "isoquant/math/numerics/fit_status.hpp"
#include "isoquant/math/numerics/parameter_inference.hpp"
#include "isoquant/math/numerics/regression_rows.hpp"

#include <Eigen/Dense>

#include <limits>
#include <optional>
#include <stdexcept>
#include <vector>

namespace isoquant {

struct LeastSquaresOptions {
    CovarianceKind covariance = CovarianceKind::classical;
    // Bounds are b ∓ t_{(1+level)/2}(n−p)·se.
    double confidenceLevel = 0.95;
    // The design counts as rank deficient when the smallest singular value of the column-scaled
    // design (every column scaled to unit Euclidean norm) is at most this fraction of the largest.
    double rankTolerance = 1e-13;
    // Above this 2-norm condition number of the column-scaled design the status becomes
    // FitStatusKind::illConditioned; the numbers are still returned.
    double conditionWarning = 1e10;
    // The QR factorisation runs in double (vectorised; 2.7× faster at 1M rows in the benchmark) when
    // the first-order error estimate of that solution, u·(κ + κ²·‖r‖/(‖X‖₂·‖b‖)) with u = 2⁻⁵³ and κ
    // the 2-norm condition number of the column-scaled design X (Golub and Van Loan, Matrix
    // Computations, §5.3.8), is at most this; otherwise, and for every rank decision, in long double
    // with column pivoting. The estimate leaves out the growth factors in n and p: with 1e-12,
    // NIST Wampler1 and Wampler3 took the double route and reached only LRE 9.5 and 9.6, so the
    // limit is 1e-13. 0 sends every fit the extended way.
    double doublePrecisionErrorLimit = 1e-13;
    // From this many rows up, the double route is first tried through the normal equations: one
    // pass forms the Gram matrix of the design (half the flops of the Householder QR, vectorised),
    // its Cholesky factor stands for the QR's R, and one step of iterative refinement in the
    // residual pass gives the coefficients the QR's accuracy (least_squares_factor.hpp). It is
    // held to the same doublePrecisionErrorLimit, and left for the Householder route when the
    // Cholesky factorisation fails, when a column's squared norm is below 2^−900 or not finite (a
    // value that is not finite, or squares that overflow), or when u·κ² exceeds 1e-9. Below this many rows the Householder QR costs under a millisecond, and it is kept there
    // so that the NIST StRD sets and the published-data checks keep its digits. 0 sends every fit
    // that qualifies this way (the tests); the largest Eigen::Index sends none.
    Eigen::Index normalEquationsFromRows = 16384;
    // The fit counts as exact (FitStatusKind::exactFit) when ‖residuals‖ ≤ perfectFitTolerance·‖y‖.
    double perfectFitTolerance = 1e-12;
    // Parameters removed before the fit by demeaning within groups (the group means of a within
    // estimator): they count in p, so n − p, σ² and the HC1 factor are those of the regression
    // with one dummy per group (the CR1 factor: see the next option). 0 for an ordinary regression.
    Eigen::Index absorbedParameters = 0;
    // Of the absorbed parameters, those nested within the clusters beyond one overall level (the
    // G − 1 group effects beyond the mean when the clusters are the groups). They use up no
    // cluster degrees of freedom, so the CR1 factor leaves them out of p (Cameron and Miller,
    // "A Practitioner's Guide to Cluster-Robust Inference", J. Human Resources 50(2), 2015, on
    // fixed effects nested in clusters; from memory): G/(G−1)·(n−1)/(n − p + nested). σ², n − p
    // and every other figure still count them.
    Eigen::Index absorbedNestedInClusters = 0;
    // Leverage of the absorbed parameters, added to every row's hᵢᵢ for HC3 (1/n_g for the
    // group means: the leverage of the dummy-variable regression is that of the within one plus
    // 1/n_g). Empty means none.
    Eigen::VectorXd absorbedLeverage;
    // For CovarianceKind::cluster: the cluster (0 … G−1) of every row; ignored otherwise.
    std::vector<Eigen::Index> clusters;
    // When set, the pass that forms the residuals also sums e^rᵢ while each block of them is in
    // cache (LeastSquaresResult::sumOfExpResiduals; Duan's smearing factor is its mean).
    bool sumExpResiduals = false;
    // When false, LeastSquaresResult::residuals comes back empty (a million rows: 8 MB less), and on
    // the normal-equations route over held columns with classical errors the refinement's pass also
    // forms Σr² and Σe^r, so the rows are read once after the Gram pass instead of twice
    // (least_squares_factor.hpp, refineWithResidualSums).
    bool keepResiduals = true;
    // Rows factorised at a time by the double route (a TSQR: each block is stacked under the
    // triangular factor so far), and visited at a time by the passes for residuals and robust
    // errors. Memory beyond the results stays O(rowsPerBlock·p) for any n; results do not depend
    // on it beyond rounding. At least 1.
    Eigen::Index rowsPerBlock = 512;
    // Rows filled (logs taken) or formed (residuals) at a time by the passes of the normal-equations
    // route, the Gram matrix's and the refinement's; their sums are still taken rowsPerBlock rows at
    // a time, so the partial sums, and every digit of the result, are those of rowsPerBlock-row
    // blocks. Longer runs of each column (64 kB rather than 4 kB) let the processor's prefetching run
    // ahead: on the benchmark's 1M × 3 fit about 7 % off the time (tests/benchmarks/RESULTS.md);
    // 8,192 rows of the usual few columns stay in a core's L2 cache. At least 1.
    Eigen::Index rowsPerFill = 8192;
};

// The parameter block and the summary are those of every fit (parameter_inference.hpp); the
// status is ok, illConditioned or exactFit (fit_status.hpp).
struct LeastSquaresResult {
    bool factorisedInDouble = false; // which route doublePrecisionErrorLimit chose
    bool fromNormalEquations = false; // the double route through the normal equations (then also in double)
    // Coefficients in inference.estimates; t and p on summary.inferenceDegreesOfFreedom.
    ParameterInference inference;
    FitSummary summary;
    Eigen::VectorXd residuals; // empty unless LeastSquaresOptions::keepResiduals
    double sumOfExpResiduals = std::numeric_limits<double>::quiet_NaN(); // Σ e^rᵢ, with sumExpResiduals
    std::optional<Eigen::Index> interceptColumn;
    FitStatus status;
};

// Thrown for HC3 errors when row `row` (0-based in the regression) has leverage 1: its weight
// e²/(1 − h)² is 0/0, and the HC3 covariance is undefined.
class UnitLeverage : public std::runtime_error {
public:
    explicit UnitLeverage(Eigen::Index row);
    Eigen::Index row() const { return row_; }

private:
    Eigen::Index row_;
};

// Fits y = X·b on the column-scaled design: for many rows through the normal equations with a
// refinement step, else by Householder QR, blocked in double, when the error estimate allows; else
// with column pivoting in long double (see LeastSquaresOptions).
// `interceptColumn` names the constant column, if any: it decides how TSS, R² and the overall F
// are formed. Requires rows(X) > cols(X) + absorbedParameters, cols(X) ≥ 1, finite data and, for
// cluster errors, a cluster for every row and at least 2 clusters (std::invalid_argument
// otherwise); throws CollinearColumns at numerical rank deficiency and UnitLeverage (HC3 only).
LeastSquaresResult fitLeastSquares(const RegressionRows& rows, std::optional<Eigen::Index> interceptColumn,
                                   const LeastSquaresOptions& options = {});
LeastSquaresResult fitLeastSquares(const Eigen::MatrixXd& design, const Eigen::VectorXd& response,
                                   std::optional<Eigen::Index> interceptColumn,
                                   const LeastSquaresOptions& options = {});

struct WaldTest {
    double fStatistic = 0;
    double numeratorDegreesOfFreedom = 0;
    double denominatorDegreesOfFreedom = 0;
    double pValue = 0; // upper tail of F(q, inferenceDegreesOfFreedom)
    // Under cluster errors the G cluster scores sum to zero (Xᵀe = 0), so the covariance has rank
    // at most G − 1: with q > G − 1 restrictions R V Rᵀ is singular and F (a ratio of rounding
    // errors) is undefined. Then this is set and the statistic and p-value are NaN.
    bool exceedsClusters = false;
};

// Wald F test of the q linear restrictions R·b = r with the fit's own covariance:
// F = (Rb − r)ᵀ (R V Rᵀ)⁻¹ (Rb − r) / q; NaN when R V Rᵀ is singular (see WaldTest).
WaldTest testLinearRestrictions(const LeastSquaresResult& fit, const Eigen::MatrixXd& restrictions,
                                const Eigen::VectorXd& values);

} // namespace isoquant
