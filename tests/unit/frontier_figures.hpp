// The figures of the frontier reference scripts (tests/reference/frontier_check.py and
// cost_frontier_check.py): one number per (dataset, form, quantity) and index, and the invented
// data rows the scripts write out (form "data", each row's numbers separated by spaces).
#pragma once

#include <map>
#include <string>
#include <tuple>
#include <vector>

namespace isoquant::testing {

struct FrontierFigures {
    std::map<std::tuple<std::string, std::string, std::string>, std::vector<double>> values;
    std::map<std::string, std::vector<std::vector<double>>> data;

    // Throws std::runtime_error naming a figure the file lacks (a failure of the calling test).
    const std::vector<double>& at(const std::string& dataset, const std::string& form, const std::string& quantity) const;
    double one(const std::string& dataset, const std::string& form, const std::string& quantity) const;
};

// The file named by the environment variable `variable` (reference_figures.hpp).
FrontierFigures readFrontierFigures(const char* variable);

} // namespace isoquant::testing
