// The message of the InputError an action throws as a cell shows it (sheetMessage), for comparing
// with the exact wording.
#pragma once

#include "isoquant/sheet/arguments/argument_names.hpp"

#include <string>

namespace isoquant::testing {

// Runs `action`; returns the InputError's message, or "<no InputError>" when none is thrown
// (any other exception propagates and fails the test).
template <typename Action>
std::string messageOf(Action action)
{
    try {
        action();
    } catch (const InputError& error) {
        return sheetMessage(error);
    }
    return "<no InputError>";
}

} // namespace isoquant::testing
