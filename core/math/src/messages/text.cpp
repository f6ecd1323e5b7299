#include "isoquant/math/messages/text.hpp"

#include <charconv>
#include <cmath>

namespace isoquant {

namespace {

// 'A'..'Z' to 'a'..'z', every other byte as it is; not std::tolower, whose answer for bytes above
// 127 depends on the process's locale (and which costs a call per character).
char asciiLower(char character)
{
    return character >= 'A' && character <= 'Z' ? static_cast<char>(character - 'A' + 'a') : character;
}

} // namespace

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
    return std::string(buffer, written.ptr);
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

} // namespace isoquant
