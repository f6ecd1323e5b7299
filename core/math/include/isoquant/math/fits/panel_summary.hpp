// What every fit with the panel options (groups, effects, a trend, cluster errors) shares, whatever
// its form: the checks that the options have their columns, and the table's account of them.
#pragma once

#include "isoquant/math/fits/fit_result.hpp"
#include "isoquant/math/messages/input_error.hpp"

namespace isoquant {

// The panel options need their columns, with one entry per row of the data (`rows`, of the range
// named by `rowsPart`): groups for effects and cluster errors (at least two groups for the latter),
// periods for two-way effects. Throws InputError naming the argument to fix.
void requirePanelColumns(const PanelColumns& panel, Eigen::Index rows, DataPart rowsPart, EffectsKind effects,
                         CovarianceKind covariance);

// The fit's PanelSummary from the panel regression `run` (panel_regression.hpp), whose
// coefficients are `regression`'s; `logScaleAtControlMeans` is the fit's constant at the controls'
// means, which the summary shifts to the latest period (trend, two-way) and to the row-weighted
// mean group effect (effects) for predictions.
PanelSummary summarisePanel(const PanelColumns& panel, EffectsKind effects, const PanelRegression& run,
                            const LeastSquaresResult& regression, double logScaleAtControlMeans);

} // namespace isoquant
