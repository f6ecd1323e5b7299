// A cost fit's figure by the name the reference scripts give it (tests/reference/cost_check.py,
// cost_panel_check.py), for the cross-checks.
#pragma once

#include "isoquant/math/fits/cost_fit.hpp"

#include <cmath>
#include <limits>
#include <string>

namespace isoquant::testing {

// NaN for a name this function does not know (the check then fails, naming it).
inline double costFitFigure(const isoquant::CostFit& fit, const std::string& q, Eigen::Index i)
{
    const auto& summary = fit.summary;
    const auto& trend = summary.panel.technicalChange;
    if (q == "params") return summary.inference.estimates(i);
    if (q == "bse") return summary.inference.standardErrors(i);
    if (q == "pvalues") return summary.inference.pValues(i);
    if (q == "trend") return trend ? trend->estimate : std::nan("");
    if (q == "trend_se") return trend ? trend->standardError : std::nan("");
    if (q == "trend_pvalue") return trend ? trend->pValue : std::nan("");
    if (q == "rsquared") return summary.rSquared;
    if (q == "rsquared_adj") return summary.adjustedRSquared;
    if (q == "within_rsquared") return summary.panel.withinRSquared;
    if (q == "fvalue") return summary.summary.fStatistic;
    if (q == "llf") return summary.summary.logLikelihood;
    if (q == "aic") return summary.summary.aic;
    if (q == "bic") return summary.summary.bic;
    if (q == "smearing") return summary.smearingFactor;
    if (q == "elasticity") return fit.costElasticity.estimate;
    if (q == "elasticity_se") return fit.costElasticity.standardError;
    if (q == "unit_fvalue") return summary.returns.fStatistic;
    if (q == "unit_pvalue") return summary.returns.pValue;
    if (q == "efficient_scale_exists") return fit.efficientScale ? 1.0 : 0.0;
    if (q == "efficient_scale") return fit.efficientScale ? fit.efficientScale->estimate : std::nan("");
    if (q == "efficient_scale_se") return fit.efficientScale ? fit.efficientScale->standardError : std::nan("");
    return std::numeric_limits<double>::quiet_NaN();
}

} // namespace isoquant::testing
