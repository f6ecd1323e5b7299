#include "isoquant/math/numerics/level_roots.hpp"

#include "isoquant/math/numerics/exact_elementwise.hpp"

#include <boost/math/tools/toms748_solve.hpp>

#include <algorithm>
#include <cmath>
#include <cstdint>
#include <vector>

namespace isoquant {

namespace {

// e^690 ≈ 1e300: roots are sought where the amounts themselves are still ordinary doubles.
constexpr double logLimit = 690;
// TOMS 748 narrows the bracket to a few ulps well within this many steps.
constexpr std::uintmax_t rootIterations = 200;

// The root of h between low and high, where h(low) and h(high) differ in sign, narrowed by TOMS 748
// (Alefeld, Potra and Shi 1995, as in Boost.Math) to full precision.
template <typename Function>
double bracketedRoot(Function h, double low, double high, double lowValue, double highValue)
{
    std::uintmax_t iterations = rootIterations;
    const auto bracket = boost::math::tools::toms748_solve(h, low, high, lowValue, highValue,
                                                           boost::math::tools::eps_tolerance<double>(), iterations);
    return 0.5 * (bracket.first + bracket.second);
}

// A root of h, which is expected to rise with s, searched from `start`: upwards while h < 0,
// downwards while h > 0, with steps doubling from 1, until the sign changes; the bracket is then
// narrowed as above.
template <typename Function>
std::optional<double> rootOfRising(Function h, double start)
{
    double near = std::clamp(start, -logLimit, logLimit);
    double nearValue = h(near);
    if (!std::isfinite(nearValue)) return std::nullopt;
    if (nearValue == 0) return near;
    const double direction = nearValue < 0 ? 1 : -1;
    double step = 1;
    double far = near, farValue = nearValue;
    while (true) {
        far = std::clamp(near + direction * step, -logLimit, logLimit);
        farValue = h(far);
        if (!std::isfinite(farValue)) return std::nullopt;
        if (farValue == 0) return far;
        if ((farValue > 0) != (nearValue > 0)) break;
        if (std::fabs(far) == logLimit) return std::nullopt;
        near = far;
        nearValue = farValue;
        step *= 2;
    }
    const double low = std::min(near, far), high = std::max(near, far);
    return bracketedRoot(h, low, high, low == near ? nearValue : farValue, low == near ? farValue : nearValue);
}

// Splits [−logLimit, logLimit] where slope(s) changes sign, so that the function whose derivative
// it is is monotone on each piece: slope is read on a grid of step 1 and each change of sign is
// narrowed to the turning point. Assumes at most one change of sign between neighbouring grid
// points, which holds for the forms here: along one input the translog's elasticity is linear in
// its log, the CES's monotone and the Cobb-Douglas's constant.
template <typename Function>
std::vector<double> monotonePieces(Function slope)
{
    std::vector<double> ends{-logLimit};
    double previous = -logLimit, previousSlope = slope(previous);
    for (double point = -logLimit + 1; point <= logLimit; point += 1) {
        const double pointSlope = slope(point);
        if (std::isfinite(previousSlope) && std::isfinite(pointSlope) && previousSlope * pointSlope < 0)
            ends.push_back(bracketedRoot(slope, previous, point, previousSlope, pointSlope));
        else if (!std::isfinite(pointSlope) || pointSlope == 0)
            ends.push_back(point);
        previous = point;
        previousSlope = pointSlope;
    }
    if (ends.back() != logLimit) ends.push_back(logLimit);
    return ends;
}

} // namespace

std::optional<double> amountForLevel(const Technology& technology, Eigen::VectorXd bundle, Eigen::Index solved,
                                     double logLevel)
{
    const auto gap = [&](double logAmount) {
        bundle(solved) = std::exp(logAmount);
        return technology.logOutput(bundle) - logLevel;
    };
    // ∂ln Y/∂ln xⱼ, the derivative of the gap
    const auto slope = [&](double logAmount) {
        bundle(solved) = std::exp(logAmount);
        return technology.elasticity(bundle, solved);
    };
    const std::vector<double> ends = monotonePieces(slope);
    std::optional<double> falling;
    for (std::size_t piece = 0; piece + 1 < ends.size(); ++piece) {
        const double low = ends[piece], high = ends[piece + 1];
        const double lowGap = gap(low), highGap = gap(high);
        if (!std::isfinite(lowGap) || !std::isfinite(highGap) || lowGap == highGap) continue;
        if ((lowGap > 0 && highGap > 0) || (lowGap < 0 && highGap < 0)) continue;
        const double root = lowGap == 0 ? low : highGap == 0 ? high : bracketedRoot(gap, low, high, lowGap, highGap);
        if (highGap > lowGap) return std::exp(root); // output rises through the level here
        if (!falling) falling = root;
    }
    if (falling) return std::exp(*falling);
    return std::nullopt;
}

std::optional<double> scaleForLevel(const Technology& technology, const Eigen::VectorXd& bundle, double logLevel)
{
    const Eigen::ArrayXd logBundle = exactLog(bundle.array());
    const auto gap = [&](double logFactor) {
        return technology.logOutput(exactExp(logBundle + logFactor).matrix()) - logLevel;
    };
    const auto root = rootOfRising(gap, 0.0);
    if (!root) return std::nullopt;
    return std::exp(*root);
}

} // namespace isoquant
