// Cost fits and PRODCOST over their tables with arbitrary shapes, values and options: every call
// must end in a table of finite numbers or an InputError; anything else is a finding.
#include "fuzzed_cells.hpp"

#include "isoquant/sheet/functions/cost_functions.hpp"
#include "isoquant/sheet/tables/cost_table.hpp"
#include "isoquant/math/messages/input_error.hpp"

using namespace isoquant;
using namespace isoquant::fuzzing;

extern "C" int LLVMFuzzerTestOneInput(const std::uint8_t* bytes, std::size_t size)
{
    FuzzedDataProvider data(bytes, size);
    const std::vector<std::string> words{"labour", "energy", "output", "form", "a*b", "n/a", ""};
    const std::size_t rows = data.ConsumeIntegralInRange<std::size_t>(0, 30);
    const std::size_t prices = data.ConsumeIntegralInRange<std::size_t>(1, 4);
    CostFitArguments arguments;
    arguments.cost = fuzzedTable(data, rows, data.ConsumeBool() ? 1 : 2, words);
    arguments.output = fuzzedTable(data, rows + data.ConsumeIntegralInRange<std::size_t>(0, 1), 1, words);
    arguments.prices = fuzzedTable(data, rows, prices, words);
    const std::vector<std::string> options{"cobb-douglas", "translog", "ces", "classical", "hc1", "hc3", "cluster"};
    arguments.form = fuzzedCell(data, options);
    arguments.errors = fuzzedCell(data, options);
    arguments.level = fuzzedCell(data, options);
    const std::vector<std::string> measures{"total", "marginal", "average", "cost elasticity", "returns to scale"};
    try {
        const CellTable table = costFitTable(costFitFromArguments(arguments));
        requireFiniteNumbers(table);
        const std::size_t outputs = data.ConsumeIntegralInRange<std::size_t>(1, 4);
        requireFiniteNumbers(costColumn(table, fuzzedTable(data, outputs, 1), fuzzedTable(data, 1, prices),
                                        fuzzedCell(data, measures)));
    } catch (const InputError&) {
    }
    return 0;
}
