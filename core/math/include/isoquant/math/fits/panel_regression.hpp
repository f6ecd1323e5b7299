// Least squares on rows that belong to groups (plants, firms) and periods: group fixed effects by
// the within estimator, period effects, a linear trend and cluster-robust errors by group.
//
// It takes the design of any log-linear form (Cobb-Douglas, translog…) with the constant in
// column 0 and returns the fit in that form's column space, extended by the panel's own columns:
//   [base columns 0 … c−1 | trend, when there is one | period effects, under two-way effects].
//
// Effects:
// - none: the design as it is; groups, if given, only define the clusters.
// - fixed: y and every column but the constant are demeaned within each group and the regression
//   is run without the constant (the within estimator). Its slopes equal those of the regression
//   with one dummy per group. The G group means count as parameters: p = (columns run) + G, so
//   n − p, σ² and the HC1 factor n/(n − p) are exactly those of that dummy-variable regression
//   (HC3 adds 1/n_g to every leverage for the same reason). The CR1 factor does not count the
//   G − 1 group effects beyond the mean, which are nested in the clusters (the groups):
//   G/(G−1)·(n−1)/(n − k − 1), k the columns run (least_squares.hpp, absorbedNestedInClusters).
// - two-way: as fixed, with one dummy per period after the first (demeaned within groups too),
//   so unbalanced panels are handled exactly; the periods come from the trend column and no
//   trend is estimated (the period effects absorb it). The period effects are not nested in the
//   groups: they stay in the k of the CR1 factor. The overall F tests the inputs and controls
//   only, the period effects kept.
// Under fixed or two-way effects, column 0 of the returned regression carries the mean of the
// group effects, (1/G)·Σ_g α_g with α_g = ȳ_g − x̄_gᵀ·b (group means of the columns run), with
// zero variance in the covariance and NaN standard error, t, p and bounds: the group effects are
// nuisance parameters estimated from each group's few rows, and no standard error is reported. The
// row-weighted mean effect, which the evaluators use, has one (MeanEffectInference).
//
// Trend: the column t − t_first (t_first the earliest period), so that ln A refers to the first
// period and the coefficient λ is the rate of Hicks-neutral technical change per period.
#pragma once

#include "isoquant/math/numerics/least_squares.hpp"

#include <Eigen/Dense>

#include <optional>
#include <string>
#include <vector>

namespace isoquant {

enum class EffectsKind { none, fixed, twoWay };

// The word a user types: "none", "fixed", "two-way".
std::string effectsWord(EffectsKind effects);

struct PanelColumns {
    // The group (0 … G−1) of every row, and each group's label, in order of first appearance;
    // both empty without groups.
    std::vector<Eigen::Index> groupOfRow;
    std::vector<std::string> groupLabels;
    // The period of every row (a year, say); empty without a trend column.
    Eigen::VectorXd periods;

    bool hasGroups() const { return !groupLabels.empty(); }
    bool hasPeriods() const { return periods.size() > 0; }
};

// Under effects: the group effects weighted by their rows, m = Σ_g n_g·α_g / n = ȳ − x̄ᵀb (x̄ the
// means of the columns run over all rows), a linear estimator of the regression with one dummy per
// group, so its variance and its covariances with b are exact, of the covariance kind of the fit:
// classically σ²/n + x̄ᵀVx̄ and −Vx̄; robust ones from that regression's own sandwich
// (mean_effect_inference.cpp).
struct MeanEffectInference {
    double estimate = 0;
    Eigen::VectorXd withColumns; // Cov(column j, m) in the extended column space, 0 at column 0
    double variance = 0;
};

struct PanelRegression {
    // In the extended column space described above.
    LeastSquaresResult regression;
    Eigen::Index baseColumns = 0;
    bool effectsAbsorbConstant = false;
    std::optional<Eigen::Index> trendColumn;
    double trendOrigin = 0; // t_first
    // Two-way: the distinct periods in increasing order; the effect of periodValues[i], i ≥ 1,
    // relative to the first is the coefficient of column firstPeriodColumn + i − 1.
    std::vector<double> periodValues;
    Eigen::Index firstPeriodColumn = 0;
    // Under effects: α_g of every group, and the within R² = 1 − RSS / Σ(y − ȳ_g)².
    Eigen::VectorXd groupEffects;
    double withinRSquared = 0;
    MeanEffectInference meanEffect;
    // What moves ln A to the latest period: λ·(t_last − t_first) with a trend, the last period's
    // effect under two-way effects, 0 otherwise.
    double latestPeriodShift = 0;
    // Duan's smearing factor, the mean of exp(residual): E[Y | x] = exp(fitted ln Y)·factor when
    // the errors are independent of x, whereas exp(fitted ln Y) alone is the median.
    double smearingFactor = 1;
};

// Thrown instead of CollinearColumns, with the columns in the extended space; under effects
// column 0 stands for the group effects.
class CollinearPanelColumns : public CollinearColumns {
public:
    using CollinearColumns::CollinearColumns;
};

// Parameters the panel adds to a form's design: 1 for a trend, T − 1 period effects under
// two-way effects, and under effects the G − 1 group effects beyond the constant they replace.
Eigen::Index panelParameterCount(const PanelColumns& panel, EffectsKind effects);

// `base` has the constant in column 0; without a trend and effects it is visited a block at a
// time and never held in full. options.covariance = cluster clusters by the groups;
// the caller has checked that the panel columns needed are there (groups for effects and
// clusters, periods for a trend and two-way effects) and have one entry per row. Throws
// InputError when the periods do not vary (trend) or there is only one (two-way), and
// CollinearPanelColumns at rank deficiency.
PanelRegression fitPanelRegression(const RegressionRows& base, const PanelColumns& panel, EffectsKind effects,
                                   LeastSquaresOptions options);

} // namespace isoquant
