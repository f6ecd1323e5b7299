// Fits with arbitrary shapes, values and options (the panel ones too: groups, effects, trend,
// incomplete rows, cluster errors): every call must end in a table of finite numbers or an
// InputError; anything else (a crash, another exception, a non-finite number) is a finding.
#include "fuzzed_cells.hpp"

#include "isoquant/sheet/functions/production_functions.hpp"
#include "isoquant/sheet/tables/fit_table.hpp"
#include "isoquant/math/messages/input_error.hpp"

using namespace isoquant;
using namespace isoquant::fuzzing;

namespace {

// A panel column of `rows` cells: mostly one of a few plants (numbers or names) or periods, so that
// groups repeat and periods vary within them; now and then any cell (blank, text, awkward number).
CellTable fuzzedPanelColumn(FuzzedDataProvider& data, std::size_t rows, bool periods)
{
    const std::vector<std::string> plants{"north", "south", "east", "west", "year", ""};
    CellTable column(rows, 1);
    for (std::size_t row = 0; row < rows; ++row) {
        const int choice = data.ConsumeIntegralInRange<int>(0, 7);
        const double small = data.ConsumeIntegralInRange<int>(0, 4);
        if (choice == 0) column.set(row, 0, fuzzedCell(data, plants));
        else if (periods) column.set(row, 0, 2000.0 + small + (choice == 1 ? 0.5 : 0.0));
        else if (choice <= 3) column.set(row, 0, plants[static_cast<std::size_t>(small)]);
        else column.set(row, 0, small);
    }
    return column;
}

} // namespace

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
    // The panel arguments: groups (clusters, effects), effects, trend and incomplete rows.
    const std::vector<std::string> panelWords{"none", "fixed", "two-way", "FIXED", "random", "cluster"};
    if (data.ConsumeBool())
        arguments.groups = fuzzedPanelColumn(data, rows + data.ConsumeIntegralInRange<std::size_t>(0, 1), false);
    if (data.ConsumeBool()) arguments.effects = fuzzedCell(data, panelWords);
    if (data.ConsumeBool())
        arguments.trend = fuzzedPanelColumn(data, rows + data.ConsumeIntegralInRange<std::size_t>(0, 1), true);
    if (data.ConsumeBool()) arguments.incompleteRows = data.ConsumeBool() ? Cell(1.0) : fuzzedCell(data, panelWords);
    if (data.ConsumeBool()) arguments.errors = std::string(data.ConsumeBool() ? "cluster" : "hc3");
    try {
        const CellTable table = fitTable(fitFromArguments(arguments));
        requireFiniteNumbers(table);
        const std::vector<std::string> labels{"R2",     "F",    "verdict", "returns to scale",
                                              "labour", "ln A", "groups",  "nothing"};
        requireFiniteNumbers(singleCell(lookUpFitTable(table, fuzzedCell(data, labels), fuzzedCell(data, {"t", "lower bound"}))));
    } catch (const InputError&) {
    }
    return 0;
}
