// The two blocks every fit reports, declared once: the parameters with their inference
// (ParameterInference, built by inferParameters for least squares, the ces and the translog) and
// the fit's summary statistics (FitSummary, filled by least squares and by the ces alike).
#pragma once

#include <Eigen/Dense>

namespace isoquant {

enum class CovarianceKind {
    classical, // σ²·(XᵀX)⁻¹ with σ² = RSS/(n−p)
    hc1,       // White's sandwich scaled by n/(n−p)
    hc3,       // sandwich with squared residuals divided by (1−hᵢᵢ)²
    cluster    // CR1: Σ_g (X_gᵀe_g)(X_gᵀe_g)ᵀ in the sandwich, scaled by G/(G−1)·(n−1)/(n−p), p less
               // the absorbed parameters nested in the clusters (LeastSquaresOptions)
};

// One parameter: its estimate and inference (a row of ParameterInference, or a derived quantity).
struct ParameterEstimate {
    double estimate = 0;
    double standardError = 0;
    double tStatistic = 0;
    double pValue = 0;
    double lowerBound = 0;
    double upperBound = 0;
};

// Every parameter of a fit with its inference on Student t with `degreesOfFreedom`:
//   se = √diag(V),  t = b/se,  p = 2·P(T > |t|),  bounds b ∓ t_{(1+level)/2}(df)·se.
struct ParameterInference {
    Eigen::VectorXd estimates;
    Eigen::VectorXd standardErrors;
    Eigen::VectorXd tStatistics;
    Eigen::VectorXd pValues; // two-sided
    Eigen::VectorXd lowerBounds;
    Eigen::VectorXd upperBounds;
    Eigen::MatrixXd covariance;
    double degreesOfFreedom = 0; // of the t (and F) distributions used: n − p, or G − 1 under cluster errors
    double confidenceLevel = 0.95;

    Eigen::Index size() const { return estimates.size(); }
    ParameterEstimate at(Eigen::Index index) const;
};

// The one builder of the block, from the estimates b and their covariance V (NaN entries give NaN
// inference). Requires 0 < confidenceLevel < 1.
ParameterInference inferParameters(Eigen::VectorXd estimates, Eigen::MatrixXd covariance, double degreesOfFreedom,
                                   double confidenceLevel);

// What a fit's rows show about the fit as a whole; filled by least squares (least_squares.hpp)
// and by the ces (ces_fit.hpp) directly.
struct FitSummary {
    Eigen::Index observations = 0;
    Eigen::Index parameters = 0;         // columns of the design (least squares) or the ces's 4
    Eigen::Index absorbedParameters = 0; // LeastSquaresOptions; the p of n − p and of AIC/BIC is both
    double residualDegreesOfFreedom = 0; // n − p
    // Of the t and F distributions used for inference: n − p, or G − 1 under cluster errors.
    double inferenceDegreesOfFreedom = 0;
    CovarianceKind covarianceKind = CovarianceKind::classical;
    Eigen::Index clusterCount = 0; // G under cluster errors, else 0
    double residualSumOfSquares = 0;
    // Centred about the mean of y when the design has a constant column, uncentred otherwise.
    double totalSumOfSquares = 0;
    double rSquared = 0;                  // 1 − RSS/TSS
    double adjustedRSquared = 0;          // 1 − (1 − R²)·(n − c)/(n − p), c = 1 with a constant, else 0
    double residualStandardDeviation = 0; // √(RSS/(n−p))
    // Wald F of all coefficients but the constant being zero, on F(q, inferenceDegreesOfFreedom)
    // with the chosen covariance; NaN when there is nothing to test, the test is undefined
    // (overallTestExceedsClusters), or the fit has no such test (the ces).
    double fStatistic = 0;
    double fPValue = 0;
    Eigen::Index overallRestrictions = 0;    // q of that test
    bool overallTestExceedsClusters = false; // q > G − 1 under cluster errors (WaldTest)
    // Gaussian, from setGaussianLikelihood (the cost share system: its own likelihood).
    double logLikelihood = 0;
    double aic = 0;
    double bic = 0;
    double conditionNumber = 0; // of the column-scaled design; 0 where not computed (the ces)
};

// The Gaussian log-likelihood of a least-squares fit with n residuals and sum of squares RSS (σ²
// estimated as RSS/n and not counted among the parameters):
//   LL = −n/2·(ln 2π + ln(RSS/n) + 1),   AIC = −2LL + 2p,   BIC = −2LL + p·ln n,
// from summary.residualSumOfSquares, summary.observations and p = parameters + absorbedParameters.
// The one formula of every form (least squares, ces, translog), so their criteria compare.
void setGaussianLikelihood(FitSummary& summary);
double gaussianLogLikelihood(double residualSumOfSquares, double observations); // the LL above

// AIC and BIC from summary.logLikelihood, as above (also for a likelihood of another shape, the
// share system's).
void setInformationCriteria(FitSummary& summary);

// gᵀVg, the delta method's variance of a quantity with gradient g, summed over the parameters g
// involves only: a parameter without a variance (NaN in V: the constant under group effects) may
// stand in V where g is 0.
double varianceOfCombination(const Eigen::VectorXd& gradient, const Eigen::MatrixXd& covariance);

} // namespace isoquant
