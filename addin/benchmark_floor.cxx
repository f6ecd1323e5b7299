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

namespace {

// A column of `rows` numbers, row r's being firstOf(r), as PRODMARGINAL's column goes back.
template <typename FirstOf> css::uno::Sequence<css::uno::Sequence<double>> numberColumn(sal_Int32 rows, FirstOf firstOf)
{
    css::uno::Sequence<css::uno::Sequence<double>> column(rows);
    auto* cells = column.getArray();
    for (sal_Int32 row = 0; row < rows; ++row) {
        const double number = firstOf(row);
        cells[row] = css::uno::Sequence<double>(&number, 1);
    }
    return column;
}

} // namespace

css::uno::Any BenchmarkProductionFunctions::benchFloorColumn(const AnyTable& inputs)
{
    // The least any function reading cells can do: each row's first cell tested for a number and read.
    return css::uno::Any(numberColumn(inputs.getLength(), [&](sal_Int32 row) {
        const auto& cells = inputs[row];
        return cells.getLength() > 0 && cells[0].getValueTypeClass() == css::uno::TypeClass_DOUBLE
                   ? *static_cast<const double*>(cells[0].getValue())
                   : 0.0;
    }));
}

css::uno::Sequence<css::uno::Sequence<double>>
BenchmarkProductionFunctions::benchFloorNumbers(const css::uno::Sequence<css::uno::Sequence<double>>& inputs)
{
    return numberColumn(inputs.getLength(),
                        [&](sal_Int32 row) { return inputs[row].getLength() > 0 ? inputs[row][0] : 0.0; });
}

double BenchmarkProductionFunctions::benchCacheBytes() { return static_cast<double>(fitCache().bytesHeld()); }

} // namespace isoquant::addin
