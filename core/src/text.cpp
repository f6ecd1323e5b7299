#include "isoquant/text.hpp"

#include <cctype>
#include <charconv>

namespace isoquant {

std::string lowerCase(std::string_view text)
{
    std::string lowered(text);
    for (char& character : lowered)
        character = static_cast<char>(std::tolower(static_cast<unsigned char>(character)));
    return lowered;
}

bool equalsIgnoringCase(std::string_view left, std::string_view right)
{
    return lowerCase(left) == lowerCase(right);
}

bool endsWithIgnoringCase(std::string_view text, std::string_view ending)
{
    return text.size() >= ending.size() && equalsIgnoringCase(text.substr(text.size() - ending.size()), ending);
}

std::string formatNumber(double value)
{
    // The shortest text that reads back as the same double, in plain notation where that is the
    // shorter ("100", "0.25", "1e-300").
    char buffer[32];
    const auto written = std::to_chars(buffer, buffer + sizeof buffer, value);
    return std::string(buffer, written.ptr);
}

std::string quoted(std::string_view text)
{
    constexpr std::size_t longest = 40;
    if (text.size() > longest) return "'" + std::string(text.substr(0, longest)) + "…'";
    return "'" + std::string(text) + "'";
}

} // namespace isoquant
