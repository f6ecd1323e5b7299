#include "isoquant/math/frontier/normal_tail.hpp"

#include <boost/math/distributions/normal.hpp>

#include <cmath>

namespace isoquant {

namespace {

constexpr double logSqrtTwoPi = 0.91893853320467274178; // ½ ln 2π
constexpr double lowestErfcArgument = -37.0;

double logNormalDensity(double z) { return -0.5 * z * z - logSqrtTwoPi; }

} // namespace

double logNormalCdf(double z)
{
    if (std::isnan(z)) return z;
    // Near Φ = 1 take log1p of the small upper tail; elsewhere the log of the lower tail.
    if (z > 0) return std::log1p(-0.5 * std::erfc(z / std::sqrt(2.0)));
    if (z >= lowestErfcArgument) return std::log(0.5 * std::erfc(-z / std::sqrt(2.0)));
    const double inverseSquare = 1.0 / (z * z);
    const double series =
        1.0 + inverseSquare * (-1.0 + inverseSquare * (3.0 + inverseSquare * (-15.0 + inverseSquare *
                                                       (105.0 + inverseSquare * -945.0))));
    return logNormalDensity(z) - std::log(-z) + std::log(series);
}

double inverseMillsRatio(double z) { return std::exp(logNormalDensity(z) - logNormalCdf(z)); }

double normalQuantile(double probability)
{
    return boost::math::quantile(boost::math::normal_distribution<double>(), probability);
}

} // namespace isoquant
