// Reading the parameter rows of a ces or translog model (internal to the core; the layouts are
// described in production_model.hpp).
#pragma once

#include "isoquant/math/forms/technology.hpp"

#include <memory>
#include <optional>
#include <string>
#include <vector>

namespace isoquant {

// A parameter row of a model table: its label, its row in the range (0-based) and the number in
// its second column (NaN when that cell holds none, e.g. "n/a").
struct ParameterRow {
    std::string label;
    std::size_t row = 0;
    double value = 0;
};

struct FormModel {
    std::vector<std::string> inputLabels;
    std::shared_ptr<const Technology> technology;
};

// `inputLabels`: the labels of an "inputs" row, when the model has one.
FormModel readCesModel(double logScale, const std::vector<ParameterRow>& parameters,
                       const std::optional<std::vector<std::string>>& inputLabels);
FormModel readTranslogModel(double logScale, const std::vector<ParameterRow>& parameters);

} // namespace isoquant
