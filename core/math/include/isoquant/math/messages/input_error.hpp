// Bad input from the user: the message names the argument and, where there is one, the row.
// Numerical failures of a well-posed problem are not input errors and are reported otherwise.
//
// The math layer knows data, not sheets: it says which part of the data is at fault (a DataPart),
// and the sheet layer names the argument that holds that part (sheet/arguments/argument_names.hpp).
// what() names the parts with the math layer's own words, for callers without a sheet.
#pragma once

#include <functional>
#include <stdexcept>
#include <string>
#include <vector>

namespace isoquant {

enum class DataPart {
    output,
    inputs,
    controls,
    groups,
    periods,         // the column of periods: a trend, or the periods of two-way effects
    effects,         // which group or period effects
    covarianceKind,  // which standard errors
    constantReturns, // whether constant returns are imposed
    start,           // a start for an iterative fit
    cost,
    prices,
    shares,
};

// The math layer's word for a part: "output", "periods", "covariance kind", ….
std::string dataPartWord(DataPart part);

class InputError : public std::runtime_error {
public:
    // A message that already names what it is about (the sheet layer's own checks).
    explicit InputError(const std::string& message) : std::runtime_error(message) {}

    // A fault in `parts` of the data. `detail` follows their names ("output: every row …"), unless it
    // places them itself: "{0}", "{1}", … for one part, "{parts}" for all in a list ("too few rows:
    // {parts} have 3 rows …", "{0}: has 5 rows of data but {1} has 6").
    InputError(std::vector<DataPart> parts, std::string detail);

    const std::vector<DataPart>& parts() const { return parts_; }

    // The message with every part named by `name`: what the sheet layer shows.
    std::string messageNaming(const std::function<std::string(DataPart)>& name) const;

private:
    std::vector<DataPart> parts_;
    std::string detail_;
};

} // namespace isoquant
