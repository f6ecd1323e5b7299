// Fits with arbitrary shapes, values and options: every call must end in a table of finite numbers
// or an InputError; anything else (a crash, another exception, a non-finite number) is a finding.
#include "fuzzed_cells.hpp"

#include "isoquant/cell_functions.hpp"
#include "isoquant/fit_table.hpp"
#include "isoquant/input_error.hpp"

using namespace isoquant;
using namespace isoquant::fuzzing;

extern "C" int LLVMFuzzerTestOneInput(const std::uint8_t* bytes, std::size_t size)
{
    FuzzedDataProvider data(bytes, size);
    const std::vector<std::string> words{"labour", "capital", "output", "x (control)", "n/a", ""};
    const std::size_t rows = data.ConsumeIntegralInRange<std::size_t>(0, 40);
    const std::size_t inputs = data.ConsumeIntegralInRange<std::size_t>(1, 6);
    FitArguments arguments;
    arguments.output = fuzzedTable(data, rows, data.ConsumeBool() ? 1 : 2, words);
    arguments.inputs = fuzzedTable(data, rows + data.ConsumeIntegralInRange<std::size_t>(0, 1), inputs, words);
    if (data.ConsumeBool()) arguments.controls = fuzzedTable(data, rows, data.ConsumeIntegralInRange<std::size_t>(1, 2));
    const std::vector<std::string> options{"cobb-douglas", "ces", "translog", "classical", "hc1", "hc3", "HC1", "hc"};
    arguments.form = fuzzedCell(data, options);
    arguments.constantReturns = fuzzedCell(data, options);
    arguments.errors = fuzzedCell(data, options);
    arguments.level = fuzzedCell(data, options);
    try {
        const CellTable table = fitTable(fitFromArguments(arguments));
        requireFiniteNumbers(table);
        const std::vector<std::string> labels{"R2", "F", "verdict", "returns to scale", "labour", "ln A", "nothing"};
        requireFiniteNumbers(singleCell(lookUpFitTable(table, fuzzedCell(data, labels), fuzzedCell(data, {"t", "lower bound"}))));
    } catch (const InputError&) {
    }
    return 0;
}
