#include "isoquant/math/fits/fit_result.hpp"

#include <algorithm>

namespace isoquant {

bool trendCountsDays(const Eigen::VectorXd& periods)
{
    constexpr double smallestDateSerial = 3000, shortestDateStep = 28;
    std::vector<double> distinct(periods.data(), periods.data() + periods.size());
    std::sort(distinct.begin(), distinct.end());
    distinct.erase(std::unique(distinct.begin(), distinct.end()), distinct.end());
    if (distinct.size() < 2 || distinct.front() <= smallestDateSerial) return false;
    for (std::size_t i = 1; i < distinct.size(); ++i)
        if (distinct[i] - distinct[i - 1] < shortestDateStep) return false;
    return true;
}

ShiftedLogScale shiftedLogScale(const Eigen::MatrixXd& parameterMap, const Eigen::VectorXd& weights,
                                const Eigen::MatrixXd& covariance, double estimate, bool forPredictions)
{
    ShiftedLogScale shifted;
    shifted.estimate = estimate;
    const Eigen::VectorXd covarianceWithCoefficients = covariance * weights; // W·a
    shifted.withParameters = parameterMap * covarianceWithCoefficients;
    shifted.variance = weights.dot(covarianceWithCoefficients);
    shifted.forPredictions = forPredictions;
    return shifted;
}

} // namespace isoquant
