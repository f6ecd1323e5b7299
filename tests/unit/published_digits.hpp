// Compares a computed figure with one published to a given number of digits.
#pragma once

#include <boost/test/tools/assertion_result.hpp>

#include <string>

namespace isoquant::testing {

// True when `actual`, rounded to as many decimals as `published` shows ("0.434293": six), gives
// the published figure: |actual − published| ≤ half a unit in its last digit. Plain decimal
// notation only. The result carries both numbers for the failure message.
boost::test_tools::assertion_result agreesToDigitsGiven(double actual, const std::string& published);

} // namespace isoquant::testing
