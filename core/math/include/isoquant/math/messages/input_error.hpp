// Bad input from the user: the message names the argument and, where there is one, the row.
// Numerical failures of a well-posed problem are not input errors and are reported otherwise.
#pragma once

#include <stdexcept>
#include <string>

namespace isoquant {

class InputError : public std::runtime_error {
public:
    explicit InputError(const std::string& message) : std::runtime_error(message) {}
};

} // namespace isoquant
