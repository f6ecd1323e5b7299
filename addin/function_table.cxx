#include "function_table.hxx"

#include "function_arguments.hxx"

#include "isoquant/math/messages/text.hpp"

#include <utility>

namespace isoquant::addin {

const std::vector<FunctionInfo>& functionTable()
{
    static const std::vector<FunctionInfo> table = [] {
        std::vector<FunctionInfo> functions;
        for (auto family :
             {productionFitFunctions, evaluatorFunctions, growthFunctions, shapeFunctions, decisionFunctions,
              costModelFunctions, costFitFunctions, efficiencyFunctions, buildSpecificFunctions})
            for (FunctionInfo& function : family()) functions.push_back(std::move(function));
        return functions;
    }();
    return table;
}

const FunctionInfo* findByProgrammaticName(std::string_view name)
{
    for (const auto& function : functionTable())
        if (function.programmaticName == name) return &function;
    return nullptr;
}

const FunctionInfo* findByDisplayName(std::string_view name)
{
    for (const auto& function : functionTable())
        if (equalsIgnoringCase(function.displayName, name)) return &function;
    return nullptr;
}

} // namespace isoquant::addin
