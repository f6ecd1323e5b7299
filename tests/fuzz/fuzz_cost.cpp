// Cost fits (with and without shares, incomplete rows, as cost frontiers) and the evaluators over
// their tables (PRODCOST, PRODLEASTCOST, PRODEFFICIENTSCALE, PRODPRICEELASTICITY, PRODREGULAR,
// PRODEFFICIENCY) with arbitrary
// shapes, values and options: every call must end in a table of finite numbers (or texts) or an
// InputError; anything else is a finding.
#include "fuzzed_cells.hpp"

#include "isoquant/sheet/functions/cost_functions.hpp"
#include "isoquant/math/messages/input_error.hpp"
#include "isoquant/sheet/functions/cost_decisions.hpp"
#include "isoquant/sheet/functions/frontier_functions.hpp"
#include "isoquant/sheet/tables/cost_table.hpp"

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
    if (data.ConsumeBool()) arguments.shares = fuzzedTable(data, rows, prices, words);
    arguments.incompleteRows = fuzzedCell(data, {"TRUE", ""});
    arguments.inefficiency = fuzzedCell(data, {"half-normal", "exponential", "", "gamma"});
    const std::vector<std::string> measures{"total", "marginal", "average", "cost elasticity", "returns to scale"};
    try {
        const CellTable table = costFitTable(costFitFromArguments(arguments));
        requireFiniteNumbers(table);
        const std::size_t outputs = data.ConsumeIntegralInRange<std::size_t>(1, 4);
        requireFiniteNumbers(costColumn(table, fuzzedTable(data, outputs, 1), fuzzedTable(data, 1, prices),
                                        fuzzedCell(data, measures)));
        const CellTable pricesRow = fuzzedTable(data, 1, prices);
        requireFiniteNumbers(leastCostAnyRow(table, fuzzedCell(data, measures), pricesRow));
        requireFiniteNumbers(efficientScaleCell(table, pricesRow));
        const std::vector<std::string> kinds{"demand", "allen", "morishima", "labour", "1"};
        requireFiniteNumbers(priceElasticityColumn(table, fuzzedTable(data, outputs, 1), pricesRow,
                                                   fuzzedCell(data, kinds), fuzzedCell(data, kinds),
                                                   fuzzedCell(data, kinds)));
        requireFiniteNumbers(regularityAnyColumn(table, fuzzedTable(data, outputs, prices + 1)));
        const std::vector<std::string> efficiencyMeasures{"efficiency", "inefficiency", "lower bound", "upper bound"};
        requireFiniteNumbers(efficiencyColumn(table, fuzzedTable(data, outputs, 1), fuzzedTable(data, outputs, prices + 1),
                                              fuzzedCell(data, efficiencyMeasures)));
    } catch (const InputError&) {
    }
    return 0;
}
