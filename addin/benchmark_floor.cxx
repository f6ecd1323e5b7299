#include "benchmark_floor.hxx"

#include "isoquant/sheet/arguments/argument_names.hpp"
#include "call_guards.hxx"
#include "cell_conversion.hxx"
#include "function_arguments.hxx"

namespace isoquant::addin {

std::vector<FunctionInfo> buildSpecificFunctions()
{
    // Only in the benchmark extension (tests/benchmarks): never in isoquant.oxt.
    return {{"benchFloor", "ISOQUANTFLOOR",
             "Benchmark only: receives the ranges of a fit and does nothing with them; returns the rows of output.",
             {outputArgument, inputsArgument}},
            {"benchFloorColumn", "ISOQUANTFLOORCOLUMN",
             "Benchmark only: returns the first column of inputs as a column, with no model and no arithmetic.",
             {inputsArgument}},
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

css::uno::Any BenchmarkProductionFunctions::benchFloorColumn(const AnyTable& inputs)
{
    // The same conversions as PRODMARGINAL's column (arguments to a CellTable, a column of numbers
    // back), so that what an array formula of it costs is the add-in interface's share alone.
    return guardedTable([&] {
        const CellTable table = toCellTable(inputs, argument::inputs);
        CellTable column(table.rows(), 1);
        for (std::size_t row = 0; row < table.rows(); ++row) column.set(row, 0, table.at(row, 0));
        return column;
    });
}

double BenchmarkProductionFunctions::benchCacheBytes() { return static_cast<double>(fitCache().bytesHeld()); }

} // namespace isoquant::addin
