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
                                const Eigen::MatrixXd& covariance, double estimate, bool forPredictions,
                                const MeanEffectInference* meanEffect)
{
    ShiftedLogScale shifted;
    shifted.estimate = estimate;
    shifted.withColumns = covariance * weights; // W·a
    shifted.variance = weights.dot(shifted.withColumns);
    if (meanEffect) {
        shifted.variance += 2.0 * weights.dot(meanEffect->withColumns) + meanEffect->variance;
        shifted.withColumns += meanEffect->withColumns;
    }
    shifted.withParameters = parameterMap * shifted.withColumns;
    shifted.forPredictions = forPredictions;
    return shifted;
}

} // namespace isoquant
