// Copies a fit's parameter inference into a ProductionFit (internal to the core). Both
// LeastSquaresResult and NonlinearInference carry these fields under the same names.
#pragma once

#include "isoquant/math/fits/fit_result.hpp"

namespace isoquant {

template <typename Inference>
void setParameterInference(ProductionFit& fit, const Eigen::VectorXd& estimates, const Inference& inference)
{
    fit.estimates = estimates;
    fit.standardErrors = inference.standardErrors;
    fit.tStatistics = inference.tStatistics;
    fit.pValues = inference.pValues;
    fit.lowerBounds = inference.lowerBounds;
    fit.upperBounds = inference.upperBounds;
    fit.covariance = inference.covariance;
}

} // namespace isoquant
