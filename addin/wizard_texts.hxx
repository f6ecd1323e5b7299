// The Function Wizard's texts in the office's UI language. Names, English texts and the argument
// lists live in function_table.cxx; a translation is a second table keyed by programmatic name
// (function_texts_de.cxx for German). Whatever a translation lacks is shown in English.
#pragma once

#include "function_table.hxx"

#include <string>
#include <string_view>
#include <vector>

namespace isoquant::addin {

// One function's texts in another language: its description, then each argument's name and
// description in the order of the English table.
struct TranslatedFunction {
    std::string_view programmaticName;
    std::string_view description;
    std::vector<ArgumentInfo> arguments;
};

struct Translation {
    std::string_view categoryName;
    std::vector<TranslatedFunction> functions;
};

const Translation& germanTranslation(); // function_texts_de.cxx

// The translation for a UI language (the ISO 639 code Calc passes to setLocale, "de" for German in
// Germany, Austria and Switzerland alike); null for English and every language without one.
const Translation* translationFor(std::string_view languageCode);

// The texts to show; English for a null translation and for any text it lacks or leaves empty.
std::string_view functionDescription(const FunctionInfo& function, const Translation* translation);
ArgumentInfo argumentTexts(const FunctionInfo& function, std::size_t argument, const Translation* translation);
std::string_view categoryDisplayName(const Translation* translation);

// What a translation lacks or has in excess, one line each ("PRODFIT: argument 3 (form) has no
// name"), for the check that every function is translated; empty when complete.
std::vector<std::string> translationGaps(const Translation& translation);

} // namespace isoquant::addin
