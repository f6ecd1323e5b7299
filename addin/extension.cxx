// What isoquant.oxt's build adds to the shared add-in sources: no function beyond the table, and
// the plain add-in object (the benchmark extension links benchmark_floor.cxx instead).
#include "function_table.hxx"
#include "production_functions.hxx"

namespace isoquant::addin {

std::vector<FunctionInfo> buildSpecificFunctions() { return {}; }

cppu::OWeakObject* createAddIn(const css::uno::Reference<css::uno::XComponentContext>& context)
{
    return new ProductionFunctions(context);
}

} // namespace isoquant::addin
