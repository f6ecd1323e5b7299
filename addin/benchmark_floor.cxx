#include "benchmark_floor.hxx"

#include "function_arguments.hxx"

namespace isoquant::addin {

std::vector<FunctionInfo> buildSpecificFunctions()
{
    // Only in the benchmark extension (tests/benchmarks): never in isoquant.oxt.
    return {{"benchFloor", "ISOQUANTFLOOR",
             "Benchmark only: receives the ranges of a fit and does nothing with them; returns the rows of output.",
             {outputArgument, inputsArgument}},
            {"benchCacheBytes", "ISOQUANTCACHEBYTES", "Benchmark only: the bytes the fit cache holds now.", {}}};
}

cppu::OWeakObject* createAddIn(const css::uno::Reference<css::uno::XComponentContext>& context)
{
    return new BenchmarkProductionFunctions(context);
}

double BenchmarkProductionFunctions::benchFloor(const AnyTable& output, const AnyTable&)
{
    return static_cast<double>(output.getLength());
}

double BenchmarkProductionFunctions::benchCacheBytes() { return static_cast<double>(fitCache().bytesHeld()); }

} // namespace isoquant::addin
