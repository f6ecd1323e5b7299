#include "benchmark_floor.hxx"

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
            {"benchFloorNumbers", "ISOQUANTFLOORNUMBERS",
             "Benchmark only: as ISOQUANTFLOORCOLUMN, with ranges taken as numbers (text and empty cells as 0).",
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
    // The least any function reading cells can do: each row's first cell tested for a number and
    // read, and a column of numbers back (as PRODMARGINAL's goes back).
    css::uno::Sequence<css::uno::Sequence<double>> column(inputs.getLength());
    auto* rows = column.getArray();
    for (sal_Int32 row = 0; row < inputs.getLength(); ++row) {
        double number = 0;
        if (inputs[row].getLength() > 0 && inputs[row][0].getValueTypeClass() == css::uno::TypeClass_DOUBLE)
            number = *static_cast<const double*>(inputs[row][0].getValue());
        rows[row] = css::uno::Sequence<double>(&number, 1);
    }
    return css::uno::Any(column);
}

css::uno::Sequence<css::uno::Sequence<double>>
BenchmarkProductionFunctions::benchFloorNumbers(const css::uno::Sequence<css::uno::Sequence<double>>& inputs)
{
    css::uno::Sequence<css::uno::Sequence<double>> column(inputs.getLength());
    auto* rows = column.getArray();
    for (sal_Int32 row = 0; row < inputs.getLength(); ++row)
        rows[row] = css::uno::Sequence<double>(inputs[row].getLength() > 0 ? &inputs[row][0] : nullptr,
                                               inputs[row].getLength() > 0 ? 1 : 0);
    return column;
}

double BenchmarkProductionFunctions::benchCacheBytes() { return static_cast<double>(fitCache().bytesHeld()); }

} // namespace isoquant::addin
