#include "published_digits.hpp"

#include <cmath>
#include <iomanip>
#include <limits>
#include <stdexcept>

namespace isoquant::testing {

boost::test_tools::assertion_result agreesToDigitsGiven(double actual, const std::string& published)
{
    std::size_t used = 0;
    const double figure = std::stod(published, &used);
    if (used != published.size() || published.find_first_of("eE") != std::string::npos)
        throw std::invalid_argument("agreesToDigitsGiven: not a plain decimal figure: " + published);
    const auto point = published.find('.');
    const int decimals = point == std::string::npos ? 0 : static_cast<int>(published.size() - point - 1);
    // Half a unit in the last published digit; the tiny extra absorbs the binary representation
    // of the decimal figure and of the bound itself.
    const double halfUnit = 0.5 * std::pow(10.0, -decimals);
    const double bound = halfUnit + 4 * std::numeric_limits<double>::epsilon() * (std::fabs(figure) + halfUnit);
    const double difference = std::fabs(actual - figure);
    boost::test_tools::assertion_result result(difference <= bound);
    result.message() << std::setprecision(17) << "computed " << actual << ", published " << published
                     << ", difference " << difference << " > " << halfUnit;
    return result;
}

} // namespace isoquant::testing
