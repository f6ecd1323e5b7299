#include "isoquant/math/messages/text.hpp"

#include <charconv>
#include <cmath>
#include <mutex>

namespace isoquant {

namespace {

// 'A'..'Z' to 'a'..'z', every other byte as it is; not std::tolower, whose answer for bytes above
// 127 depends on the process's locale (and which costs a call per character).
char asciiLower(char character)
{
    return character >= 'A' && character <= 'Z' ? static_cast<char>(character - 'A' + 'a') : character;
}

std::mutex punctuationMutex;
NumberPunctuation currentPunctuation;

} // namespace

void setNumberPunctuation(NumberPunctuation punctuation)
{
    // The add-in's change listener may run on another thread than the cell calls.
    const std::lock_guard<std::mutex> lock(punctuationMutex);
    currentPunctuation = std::move(punctuation);
}

NumberPunctuation numberPunctuation()
{
    const std::lock_guard<std::mutex> lock(punctuationMutex);
    return currentPunctuation;
}

std::string localDecimal(std::string_view plainNumber)
{
    const std::string decimal = numberPunctuation().decimal;
    std::string text;
    for (char character : plainNumber) {
        if (character == '.') text += decimal;
        else text += character;
    }
    return text;
}

std::string groupedCount(std::size_t count)
{
    const std::string separator = numberPunctuation().thousands;
    const std::string digits = std::to_string(count);
    std::string text;
    for (std::size_t i = 0; i < digits.size(); ++i) {
        if (i > 0 && (digits.size() - i) % 3 == 0) text += separator;
        text += digits[i];
    }
    return text;
}

std::string lowerCase(std::string_view text)
{
    std::string lowered(text);
    for (char& character : lowered) character = asciiLower(character);
    return lowered;
}

bool equalsIgnoringCase(std::string_view left, std::string_view right)
{
    if (left.size() != right.size()) return false;
    for (std::size_t i = 0; i < left.size(); ++i)
        if (asciiLower(left[i]) != asciiLower(right[i])) return false;
    return true;
}

bool endsWithIgnoringCase(std::string_view text, std::string_view ending)
{
    return text.size() >= ending.size() && equalsIgnoringCase(text.substr(text.size() - ending.size()), ending);
}

std::string formatNumber(double value)
{
    // Rounded to 15 significant digits, as Calc shows a number, so that sums of typed values read
    // as typed ("0.9896", not "0.9896000000000001"); then the shortest text of that double, in
    // plain notation where that is the shorter ("100", "0.25", "1e-300").
    // to_chars and from_chars, unlike printf and strtod, ignore the process's locale.
    char rounded[32];
    const auto end = std::to_chars(rounded, rounded + sizeof rounded, value, std::chars_format::general, 15).ptr;
    double shown = value;
    if (std::isfinite(value)) std::from_chars(rounded, end, shown);
    char buffer[32];
    const auto written = std::to_chars(buffer, buffer + sizeof buffer, shown);
    return localDecimal(std::string_view(buffer, static_cast<std::size_t>(written.ptr - buffer)));
}

std::string formatNumber(double value, int significantDigits)
{
    char buffer[32];
    const auto written = std::to_chars(buffer, buffer + sizeof buffer, value, std::chars_format::general,
                                       significantDigits);
    return localDecimal(std::string_view(buffer, static_cast<std::size_t>(written.ptr - buffer)));
}

std::string quoted(std::string_view text)
{
    constexpr std::size_t longest = 40;
    if (text.size() > longest) return "'" + std::string(text.substr(0, longest)) + "…'";
    return "'" + std::string(text) + "'";
}

std::string plural(std::size_t count, const std::string& noun)
{
    return std::to_string(count) + " " + noun + (count == 1 ? "" : "s");
}

std::string listOfNames(const std::vector<std::string>& names)
{
    std::string text;
    for (std::size_t i = 0; i < names.size(); ++i) {
        if (i > 0) text += i + 1 == names.size() ? " and " : ", ";
        text += names[i];
    }
    return text;
}

} // namespace isoquant
