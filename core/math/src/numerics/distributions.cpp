#include "isoquant/math/numerics/distributions.hpp"
#include "isoquant/math/numerics/not_a_number.hpp"

#include <boost/math/distributions/chi_squared.hpp>
#include <boost/math/distributions/fisher_f.hpp>
#include <boost/math/distributions/students_t.hpp>

#include <cmath>
#include <limits>

namespace isoquant {

namespace {
}

double studentTwoSidedPValue(double t, double degreesOfFreedom)
{
    if (std::isnan(t) || !(degreesOfFreedom > 0)) return notANumber;
    if (std::isinf(t)) return 0.0;
    const boost::math::students_t distribution(degreesOfFreedom);
    return 2.0 * boost::math::cdf(boost::math::complement(distribution, std::fabs(t)));
}

double studentCriticalValue(double level, double degreesOfFreedom)
{
    if (!(level > 0 && level < 1) || !(degreesOfFreedom > 0)) return notANumber;
    const boost::math::students_t distribution(degreesOfFreedom);
    return boost::math::quantile(boost::math::complement(distribution, (1.0 - level) / 2.0));
}

double fisherUpperPValue(double f, double numeratorDegreesOfFreedom, double denominatorDegreesOfFreedom)
{
    if (std::isnan(f) || !(numeratorDegreesOfFreedom > 0) || !(denominatorDegreesOfFreedom > 0))
        return notANumber;
    if (std::isinf(f)) return 0.0;
    if (f <= 0) return 1.0;
    const boost::math::fisher_f distribution(numeratorDegreesOfFreedom, denominatorDegreesOfFreedom);
    return boost::math::cdf(boost::math::complement(distribution, f));
}

double chiSquaredUpperPValue(double x, double degreesOfFreedom)
{
    if (std::isnan(x) || !(degreesOfFreedom > 0)) return notANumber;
    if (std::isinf(x)) return 0.0;
    if (x <= 0) return 1.0;
    const boost::math::chi_squared_distribution<double> distribution(degreesOfFreedom);
    return boost::math::cdf(boost::math::complement(distribution, x));
}

} // namespace isoquant
