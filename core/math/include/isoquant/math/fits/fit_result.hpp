// What every production fit returns (cobb_douglas_fit.hpp, ces_fit.hpp, translog_fit.hpp), and
// the data and options it is fitted from.
//
// Conventions (the same for every covariance kind):
// - p counts the regression parameters actually estimated; inference uses t(n−p) and F(q, n−p).
// - R² = 1 − RSS/TSS of ln Y, also when constant returns are imposed.
// - Log-likelihood is Gaussian on ln Y; AIC = −2LL + 2p and BIC = −2LL + p·ln n (σ² not counted).
// - With constant returns imposed the regression run is ln(Y/x_k) on ln(xᵢ/x_k), i < k, and the
//   controls; its F tests that all of its slopes are zero.
// - The returns-to-scale verdict tests ν = Σ bᵢ = 1 at α = 1 − confidence level.
// - Groups, effects, a trend and cluster errors: see panel_regression.hpp. Under cluster errors
//   inference uses t(G−1) and F(q, G−1); under effects p counts the G group means, and ln A is
//   the mean group effect (no standard error; the evaluators' ln A has one: ShiftedLogScale).
#pragma once

#include "isoquant/math/fits/panel_regression.hpp"
#include "isoquant/math/forms/production_form.hpp"
#include "isoquant/math/numerics/fit_status.hpp"
#include "isoquant/math/numerics/least_squares.hpp"
#include "isoquant/math/numerics/parameter_inference.hpp"

#include <Eigen/Dense>

#include <memory>
#include <optional>
#include <string>
#include <vector>

namespace isoquant {

struct CesDetails;      // ces_fit.hpp
struct TranslogDetails; // translog_fit.hpp

struct ProductionData {
    Eigen::VectorXd output;          // n values, positive
    Eigen::MatrixXd inputs;          // n × k, positive
    Eigen::MatrixXd controls;        // n × m, finite (m may be 0)
    std::vector<std::string> inputLabels;
    std::vector<std::string> controlLabels;
    PanelColumns panel; // groups and periods, when given
};

struct ProductionFitOptions {
    ProductionForm form = ProductionForm::cobbDouglas;
    bool constantReturns = false;
    CovarianceKind covariance = CovarianceKind::classical;
    double confidenceLevel = 0.95;
    EffectsKind effects = EffectsKind::none;
};

// What groups, effects and a trend add to a fit.
struct PanelSummary {
    EffectsKind effects = EffectsKind::none;
    Eigen::Index groups = 0;           // G; 0 without groups
    double withinRSquared = 0;         // under effects
    std::vector<std::string> groupLabels;
    Eigen::VectorXd groupEffects;      // α_g under effects, in the order of groupLabels
    // Two-way: periods after the first and their effects relative to the first period.
    std::vector<double> periods;
    Eigen::VectorXd periodEffects;
    std::optional<ParameterEstimate> technicalChange; // λ per period, with a trend
    double latestPeriod = 0;                          // t_last, with a trend
    bool trendLooksLikeDates = false;                 // trendCountsDays: λ is then per day
    // ln A the evaluators use: ln A at the controls' means, plus λ·(t_last − t_first) with a
    // trend or the last period's effect under two-way effects. Under effects ln A is here the
    // mean group effect weighted by the groups' rows, Σ_g n_g·α_g / n, so that the log TFP of the
    // fitted rows averages 0 on an unbalanced panel too.
    double logScaleForPredictions = 0;
    bool shiftsLogScale = false;        // effects or a trend: the row above is shown
    Eigen::Index incompleteRowsDropped = 0;
    bool dropsIncompleteRows = false;   // the switch was on: the row count is shown
};

// Calc stores a date as a count of days (serial numbers near 45000 for 2023): a trend of dates,
// say year-ends, gives λ per day. Taken for dates when every distinct period lies above 3000
// (the serial of 1908-03-18; years stay below it) and consecutive ones are 28 days or more apart
// (months or longer; periods counted 1, 2, … are 1 apart).
bool trendCountsDays(const Eigen::VectorXd& periods);

struct ReturnsToScale {
    double estimate = 0;       // ν = Σ bᵢ
    double standardError = 0;  // √(1ᵀ V 1) over the exponents' covariance block
    double fStatistic = 0;     // Wald F of ν = 1 (NaN when imposed or undefined)
    double pValue = 0;
    bool imposed = false;
    bool exceedsClusters = false; // the test needs more than G − 1 restrictions (WaldTest)
    std::string verdict;       // "increasing", "constant", "decreasing" or "constant (imposed)"
};

// The evaluators' ln A when controls, a trend or effects shift it: s = aᵀβ (+ m under effects), a
// linear combination of the regression's coefficients β (a = 1 at ln A, z̄ⱼ at control j,
// t_last − t_first at the trend, 1 at the last period's effect under two-way effects; 0 at ln A
// under effects, where m, the row-weighted mean group effect of MeanEffectInference, takes its
// place). With W the regression's covariance, Cov(β, s) = W·a (+ Cov(β, m)) and
// Var(s) = aᵀWa (+ 2aᵀCov(β, m) + Var(m)), exact (no linearisation); θ = Mβ then has Cov(θ, s) =
// M·Cov(β, s). Under effects ln A (the plain mean effect) has no covariance: NaN there.
struct ShiftedLogScale {
    double estimate = 0;              // PanelSummary::logScaleForPredictions, or logScaleAtControlMeans
    Eigen::VectorXd withParameters;   // Cov(θ, s), in the order of ProductionFit::inference
    Eigen::VectorXd withColumns;      // Cov(β, s), in the regression's columns
    double variance = 0;              // Var(s)
    bool forPredictions = false;      // with a trend or effects: the table's "ln A for predictions" row
};

// `parameterMap` (p × c) maps the regression's coefficients to θ; `weights` (c) is a above;
// `covariance` (c × c) is W; `meanEffect` m under effects, else null.
ShiftedLogScale shiftedLogScale(const Eigen::MatrixXd& parameterMap, const Eigen::VectorXd& weights,
                                const Eigen::MatrixXd& covariance, double estimate, bool forPredictions,
                                const MeanEffectInference* meanEffect = nullptr);

// With a trend: λ's covariances with θ (NaN at ln A under effects) and with s, and its variance,
// from the regression's covariance W: M·W·e_λ, Cov(β, s)_λ and W_λλ.
struct TrendCovariance {
    Eigen::VectorXd withParameters;
    double withShiftedScale = 0;
    double variance = 0;
};

struct ProductionFit {
    ProductionForm form = ProductionForm::cobbDouglas;
    std::vector<std::string> inputLabels;
    std::vector<std::string> controlLabels;
    // Parameters in the order ln A, the k exponents, the m control coefficients (the ces: ln A, δ,
    // ρ, ν), with their inference on t(summary.inferenceDegreesOfFreedom).
    ParameterInference inference;
    // The Cobb-Douglas form's regression as run, whose columns differ from the form's parameters
    // under constant returns (ln(Y/x_k) on ln(xᵢ/x_k)) or with a trend or period effects (their
    // columns follow the base ones); empty for the other forms.
    ParameterInference regressionInference;
    // Of the regression actually run (least squares) or of the ces: n, p, RSS, F, log-likelihood,
    // AIC, BIC, condition number.
    FitSummary summary;
    // Of ln Y, one per row; empty for the Cobb-Douglas form, whose figures come from their sums
    // (a million rows would hold 8 MB in the fit cache, and forming them took a pass over the rows).
    Eigen::VectorXd residuals;
    // One verdict (fit_status.hpp): ok, illConditioned or exactFit for least squares; for the ces
    // also notConverged, stopped, boundary (where: CesDetails::boundary) or notIdentified, the
    // solver's account of how it ended in the reason.
    FitStatus status;
    double rSquared = 0;         // on ln Y
    double adjustedRSquared = 0; // 1 − (1 − R²)(n − 1)/(n − p)
    ReturnsToScale returns;
    // ln A + Σⱼ cⱼ·mean(zⱼ): the evaluators' ln A when there are controls.
    double logScaleAtControlMeans = 0;
    // Duan's smearing factor, mean of exp(residual of ln Y): multiplies exp(fitted ln Y), the
    // median prediction, into the mean prediction.
    double smearingFactor = 1;
    PanelSummary panel;
    // With controls, a trend or effects (cobb-douglas; translog with controls); empty otherwise.
    std::optional<ShiftedLogScale> shiftedScale;
    // With a trend (cobb-douglas); empty otherwise.
    std::optional<TrendCovariance> trendCovariance;
    // What only the "ces" or the "translog" form has; empty for the other forms.
    std::shared_ptr<const CesDetails> ces;
    std::shared_ptr<const TranslogDetails> translog;
};

} // namespace isoquant
