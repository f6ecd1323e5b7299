// Reads the optional arguments of the cell functions. An empty cell or an omitted argument means
// the default; option words match exactly, ignoring case (no prefixes). Every error names the
// argument. Throws InputError.
#pragma once

#include "isoquant/sheet/arguments/cells.hpp"
#include "isoquant/math/numerics/least_squares.hpp"
#include "isoquant/math/forms/production_form.hpp"
#include "isoquant/math/messages/input_error.hpp"
#include "isoquant/math/messages/text.hpp"

#include <initializer_list>
#include <string>
#include <vector>

namespace isoquant {

// A cell as a message quotes it: 'text' in quotes, a number as Calc shows it, or "an empty cell".
std::string describe(const Cell& cell);

// One word an option argument accepts and the value it stands for. A word not `listed` (a second
// spelling, "törnqvist") is accepted but not offered in the message.
template <typename Value>
struct Choice {
    const char* word;
    Value value;
    bool listed = true;
};

// The message for a cell that is none of `words`: <argument>: <cell> is not <what>; use "a", "b" or "c".
std::string unknownChoiceMessage(const Cell& cell, const std::string& argument, const std::string& what,
                                 const std::vector<std::string>& words);

// An option word: `fallback` when the argument is omitted, else the value of the choice whose word
// equals the text ignoring case; anything else throws InputError (unknownChoiceMessage).
template <typename Value>
Value readChoice(const Cell& cell, const std::string& argument, const std::string& what,
                 std::initializer_list<Choice<Value>> choices, Value fallback)
{
    if (isOmitted(cell)) return fallback;
    std::vector<std::string> words;
    for (const Choice<Value>& choice : choices) {
        if (isText(cell) && equalsIgnoringCase(std::get<std::string>(cell), choice.word)) return choice.value;
        if (choice.listed) words.emplace_back(choice.word);
    }
    throw InputError(unknownChoiceMessage(cell, argument, what, words));
}

ProductionForm readFormArgument(const Cell& cell);                // default cobb-douglas
bool readSwitchArgument(const Cell& cell, const std::string& argument); // TRUE/FALSE or 1/0; default FALSE
CovarianceKind readErrorsArgument(const Cell& cell);             // default classical
double readLevelArgument(const Cell& cell, const std::string& argument); // in (0, 1); default 0.95

} // namespace isoquant
