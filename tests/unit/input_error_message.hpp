// The message of the InputError an action throws, for comparing with the exact wording.
#pragma once

#include "isoquant/math/messages/input_error.hpp"

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
        return error.what();
    }
    return "<no InputError>";
}

} // namespace isoquant::testing
