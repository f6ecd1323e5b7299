// Small text helpers shared by the option, label and table code.
#pragma once

#include <cstddef>
#include <string>
#include <string_view>

namespace isoquant {

// ASCII lower case; labels and option words compare case-insensitively.
std::string lowerCase(std::string_view text);
bool equalsIgnoringCase(std::string_view left, std::string_view right);
bool endsWithIgnoringCase(std::string_view text, std::string_view ending);

// A number in a message: rounded to 15 significant digits (as Calc shows it), then the shortest
// text of that value ("0", "17", "0.25", "0.9896" for 0.9896000000000001, "1e-300").
std::string formatNumber(double value);

// "1 row", "2 rows": the count and the noun, with an s unless the count is 1.
std::string plural(std::size_t count, const std::string& noun);

// 'text' in single quotes, cut to a readable length.
std::string quoted(std::string_view text);

} // namespace isoquant
