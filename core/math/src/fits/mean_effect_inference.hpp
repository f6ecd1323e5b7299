// The covariance of the row-weighted mean group effect under fixed or two-way effects, internal to
// the panel regression (panel_regression.hpp, MeanEffectInference).
#pragma once

#include "isoquant/math/fits/panel_regression.hpp"

namespace isoquant {

// `withinDesign` (n × k) holds the columns run, demeaned within the groups; `columnMeans` (k) the
// means of those columns over all rows before demeaning; `run` the within regression fitted with
// `options` (its residuals, n − p and the kind of covariance); `responseMean` ȳ over all rows.
MeanEffectInference meanEffectInference(const Eigen::MatrixXd& withinDesign, const Eigen::VectorXd& columnMeans,
                                        double responseMean, const LeastSquaresResult& run,
                                        const LeastSquaresOptions& options);

} // namespace isoquant
