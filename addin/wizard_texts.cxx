#include "wizard_texts.hxx"

#include "isoquant/math/messages/text.hpp"

namespace isoquant::addin {

namespace {

const TranslatedFunction* findTranslated(const FunctionInfo& function, const Translation* translation)
{
    if (!translation) return nullptr;
    for (const auto& translated : translation->functions)
        if (translated.programmaticName == function.programmaticName) return &translated;
    return nullptr;
}

std::string_view orEnglish(std::string_view translated, std::string_view english)
{
    return translated.empty() ? english : translated;
}

std::string argumentLabel(const FunctionInfo& function, std::size_t argument)
{
    return std::string(function.displayName) + ": argument " + std::to_string(argument + 1) + " (" +
           std::string(function.arguments[argument].name) + ")";
}

} // namespace

const Translation* translationFor(std::string_view languageCode)
{
    if (equalsIgnoringCase(languageCode, "de")) return &germanTranslation();
    return nullptr;
}

std::string_view functionDescription(const FunctionInfo& function, const Translation* translation)
{
    const TranslatedFunction* translated = findTranslated(function, translation);
    return translated ? orEnglish(translated->description, function.description) : function.description;
}

ArgumentInfo argumentTexts(const FunctionInfo& function, std::size_t argument, const Translation* translation)
{
    if (argument >= function.arguments.size()) return {};
    const ArgumentInfo& english = function.arguments[argument];
    const TranslatedFunction* translated = findTranslated(function, translation);
    if (!translated || argument >= translated->arguments.size()) return english;
    const ArgumentInfo& texts = translated->arguments[argument];
    return {orEnglish(texts.name, english.name), orEnglish(texts.description, english.description)};
}

std::string_view categoryDisplayName(const Translation* translation)
{
    return translation ? orEnglish(translation->categoryName, categoryName) : categoryName;
}

std::vector<std::string> translationGaps(const Translation& translation)
{
    std::vector<std::string> gaps;
    if (translation.categoryName.empty()) gaps.push_back("the category has no name");
    for (const auto& function : functionTable()) {
        const TranslatedFunction* translated = findTranslated(function, &translation);
        if (!translated) {
            gaps.push_back(std::string(function.displayName) + ": no texts");
            continue;
        }
        if (translated->description.empty()) gaps.push_back(std::string(function.displayName) + ": no description");
        for (std::size_t k = 0; k < function.arguments.size(); ++k) {
            const bool present = k < translated->arguments.size();
            if (!present || translated->arguments[k].name.empty())
                gaps.push_back(argumentLabel(function, k) + " has no name");
            if (!present || translated->arguments[k].description.empty())
                gaps.push_back(argumentLabel(function, k) + " has no description");
        }
        if (translated->arguments.size() > function.arguments.size())
            gaps.push_back(std::string(function.displayName) + ": " + std::to_string(translated->arguments.size()) +
                           " arguments translated, the function has " + std::to_string(function.arguments.size()));
    }
    for (const auto& translated : translation.functions)
        if (!findByProgrammaticName(translated.programmaticName))
            gaps.push_back(std::string(translated.programmaticName) + ": translated but not in the function table");
    return gaps;
}

} // namespace isoquant::addin
