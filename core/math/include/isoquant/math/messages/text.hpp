// Small text helpers shared by the option, label and table code.
#pragma once

#include <cstddef>
#include <string>
#include <string_view>
#include <vector>

namespace isoquant {

// ASCII lower case; labels and option words compare case-insensitively.
std::string lowerCase(std::string_view text);
bool equalsIgnoringCase(std::string_view left, std::string_view right);
bool endsWithIgnoringCase(std::string_view text, std::string_view ending);

// How numbers in messages and table notes are punctuated: as the office's locale setting writes
// them (a German locale: "0,9896" and "1.048.576"). UTF-8; '.' and ',' until the add-in says
// otherwise. Process-wide, as the office's locale setting is; the add-in keeps it in step.
struct NumberPunctuation {
    std::string decimal = ".";
    std::string thousands = ",";
};
void setNumberPunctuation(NumberPunctuation punctuation);
NumberPunctuation numberPunctuation();

// A number in a message: rounded to 15 significant digits (as Calc shows it), then the shortest
// text of that value ("0", "17", "0.25", "0.9896" for 0.9896000000000001, "1e-300").
std::string formatNumber(double value);
// The same with at most `significantDigits` digits ("4.8e-17" for 3): for sizes read, not reused.
std::string formatNumber(double value, int significantDigits);
// A number written in the source ("0.99", "1.8e308") with the decimal separator of the locale.
std::string localDecimal(std::string_view plainNumber);
// A count with its digits grouped in thousands ("1,048,576").
std::string groupedCount(std::size_t count);

// "1 row", "2 rows": the count and the noun, with an s unless the count is 1.
std::string plural(std::size_t count, const std::string& noun);

// "a", "a and b", "a, b and c": names in a sentence.
std::string listOfNames(const std::vector<std::string>& names);

// 'text' in single quotes, cut to a readable length.
std::string quoted(std::string_view text);

} // namespace isoquant
