// What Calc's Function Wizard shows for each cell function: one row per function.
#pragma once

#include <string_view>
#include <vector>

namespace isoquant::addin {

struct ArgumentInfo {
    std::string_view name;
    std::string_view description;
};

struct FunctionInfo {
    std::string_view programmaticName; // the IDL method name
    std::string_view displayName;      // what the user types
    std::string_view description;
    std::vector<ArgumentInfo> arguments;
};

// The category every function is filed under. Calc 7.4 shows add-in functions whose category is
// not one of its own under "Add-In".
inline constexpr std::string_view categoryName = "Production Economics";

// The table: every cell function of isoquant.oxt, then buildSpecificFunctions().
const std::vector<FunctionInfo>& functionTable();
// What one build adds to the table: nothing for isoquant.oxt (extension.cxx); ISOQUANTFLOOR for the
// benchmark extension (benchmark_floor.cxx). Each shared library links exactly one of the two.
std::vector<FunctionInfo> buildSpecificFunctions();
const FunctionInfo* findByProgrammaticName(std::string_view name);
const FunctionInfo* findByDisplayName(std::string_view name); // case-insensitive

} // namespace isoquant::addin
