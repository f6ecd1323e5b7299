// A relative comparison without the special case Boost.Test makes for zero (there, `a == 0` with a
// tolerance passes whenever |a| is below the tolerance, which would hide an underflow to 0).
#pragma once

#include <boost/test/tools/assertion_result.hpp>

#include <cmath>
#include <iomanip>

namespace isoquant::testing {

// |actual − expected| ≤ tolerance·|expected|; false for NaN or inf. Carries both numbers.
inline boost::test_tools::assertion_result closeTo(double actual, double expected, double tolerance)
{
    const double difference = std::fabs(actual - expected);
    boost::test_tools::assertion_result result(std::isfinite(actual) && difference <= tolerance * std::fabs(expected));
    result.message() << std::setprecision(17) << actual << " vs " << expected << ": relative difference "
                     << difference / std::fabs(expected) << " > " << tolerance;
    return result;
}

} // namespace isoquant::testing
