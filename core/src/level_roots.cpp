#include "isoquant/level_roots.hpp"

#include <boost/math/tools/toms748_solve.hpp>

#include <algorithm>
#include <cmath>
#include <cstdint>

namespace isoquant {

namespace {

// e^690 ≈ 1e300: roots are sought where the amounts themselves are still ordinary doubles.
constexpr double logLimit = 690;
// TOMS 748 narrows the bracket to a few ulps well within this many steps.
constexpr std::uintmax_t rootIterations = 200;

// A root of h, which is expected to rise with s, searched from `start`: upwards while h < 0,
// downwards while h > 0, with steps doubling from 1, until the sign changes; the bracket is then
// narrowed by TOMS 748 (Alefeld, Potra and Shi 1995, as in Boost.Math) to full precision.
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
    std::uintmax_t iterations = rootIterations;
    const auto bracket = boost::math::tools::toms748_solve(h, low, high, low == near ? nearValue : farValue,
                                                           low == near ? farValue : nearValue,
                                                           boost::math::tools::eps_tolerance<double>(), iterations);
    return 0.5 * (bracket.first + bracket.second);
}

} // namespace

std::optional<double> amountForLevel(const Technology& technology, Eigen::VectorXd bundle, Eigen::Index solved,
                                     double logLevel)
{
    const auto gap = [&](double logAmount) {
        bundle(solved) = std::exp(logAmount);
        return technology.logOutput(bundle) - logLevel;
    };
    const auto root = rootOfRising(gap, std::log(bundle(solved)));
    if (!root) return std::nullopt;
    return std::exp(*root);
}

std::optional<double> scaleForLevel(const Technology& technology, const Eigen::VectorXd& bundle, double logLevel)
{
    const Eigen::ArrayXd logBundle = bundle.array().log();
    const auto gap = [&](double logFactor) {
        return technology.logOutput((logBundle + logFactor).exp().matrix()) - logLevel;
    };
    const auto root = rootOfRising(gap, 0.0);
    if (!root) return std::nullopt;
    return std::exp(*root);
}

} // namespace isoquant
