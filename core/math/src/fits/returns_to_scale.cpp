#include "isoquant/math/fits/returns_to_scale.hpp"
#include "isoquant/math/numerics/not_a_number.hpp"

#include <cmath>
#include <limits>

namespace isoquant {

std::string classifyReturnsToScale(double estimate, double pValue, double level, bool imposed)
{
    if (imposed) return "constant (imposed)";
    // Without a test, ν within this distance of 1 counts as 1: typed or exact-fit exponents carry rounding.
    constexpr double untestedTolerance = 1e-9;
    if (std::isnan(pValue)) {
        if (std::fabs(estimate - 1.0) <= untestedTolerance) return "constant";
        return estimate > 1 ? "increasing" : "decreasing";
    }
    if (pValue >= 1.0 - level) return "constant";
    return estimate > 1 ? "increasing" : "decreasing";
}

ReturnsToScale testReturnsToScale(const ProductionFit& fit, const LeastSquaresResult& regression, Eigen::Index k,
                                  bool constantReturns, double confidenceLevel)
{
    ReturnsToScale returns;
    returns.estimate = fit.inference.estimates.segment(1, k).sum();
    if (constantReturns) {
        returns.imposed = true;
        returns.standardError = 0.0;
        returns.fStatistic = notANumber;
        returns.pValue = notANumber;
        returns.verdict = classifyReturnsToScale(returns.estimate, returns.pValue, confidenceLevel, true);
        return returns;
    }
    returns.standardError = std::sqrt(fit.inference.covariance.block(1, 1, k, k).sum());
    Eigen::MatrixXd restriction = Eigen::MatrixXd::Zero(1, regression.summary.parameters);
    restriction.block(0, 1, 1, k).setOnes();
    const WaldTest test = testLinearRestrictions(regression, restriction, Eigen::VectorXd::Ones(1));
    // An exact fit leaves nothing to test: the verdict then follows ν alone.
    const bool testable = !regression.status.is(FitStatusKind::exactFit);
    returns.exceedsClusters = test.exceedsClusters;
    returns.fStatistic = testable ? test.fStatistic : notANumber;
    returns.pValue = testable ? test.pValue : notANumber;
    returns.verdict = classifyReturnsToScale(returns.estimate, returns.pValue, confidenceLevel, false);
    return returns;
}

} // namespace isoquant
