// The word `what` of the evaluators and decisions (std. errors and bounds, issue 20) over a fitted
// table with its covariance block — of any form, with controls, group effects or a trend — that a
// user may then have edited by hand (one cell of the table or its block replaced by anything).
// Every call must end in a column of finite numbers (or texts) or an InputError.
#include "fuzzed_cells.hpp"

#include "isoquant/math/messages/input_error.hpp"
#include "isoquant/sheet/functions/bound_functions.hpp"
#include "isoquant/sheet/functions/production_functions.hpp"
#include "isoquant/sheet/tables/covariance_block.hpp"
#include "isoquant/sheet/tables/fit_table.hpp"

using namespace isoquant;
using namespace isoquant::fuzzing;

namespace {

// Mostly positive amounts that vary by row and column even when the fuzzer's bytes run out (so that
// most inputs reach a fit and the bounds), now and then any cell.
CellTable plausibleTable(FuzzedDataProvider& data, std::size_t rows, std::size_t columns)
{
    CellTable table(rows, columns);
    for (std::size_t row = 0; row < rows; ++row)
        for (std::size_t column = 0; column < columns; ++column) {
            if (data.ConsumeIntegralInRange<int>(0, 15) == 15) table.set(row, column, fuzzedCell(data));
            else table.set(row, column, std::exp(std::sin(1.3 * row + 2.1 * column) + data.ConsumeProbability<double>()));
        }
    return table;
}

// PRODFIT's table with its block, from fuzzed data and options; throws InputError as PRODFIT does.
CellTable fittedTableWithBlock(FuzzedDataProvider& data, std::size_t inputs)
{
    const std::size_t rows = 30 - data.ConsumeIntegralInRange<std::size_t>(0, 30);
    FitArguments arguments;
    arguments.output = plausibleTable(data, rows, 1);
    arguments.inputs = plausibleTable(data, rows, inputs);
    arguments.form = fuzzedCell(data, {"cobb-douglas", "translog", "ces"});
    if (data.ConsumeBool()) arguments.controls = plausibleTable(data, rows, 1);
    if (data.ConsumeBool()) arguments.errors = fuzzedCell(data, {"classical", "hc1", "hc3", "cluster"});
    if (data.ConsumeBool()) {
        arguments.groups = CellTable(rows, 1);
        for (std::size_t row = 0; row < rows; ++row)
            arguments.groups.set(row, 0, static_cast<double>(data.ConsumeIntegralInRange<int>(1, 4)));
        arguments.effects = fuzzedCell(data, {"none", "fixed", "two-way"});
    }
    if (data.ConsumeBool()) {
        arguments.trend = CellTable(rows, 1);
        for (std::size_t row = 0; row < rows; ++row)
            arguments.trend.set(row, 0, 2000.0 + data.ConsumeIntegralInRange<int>(0, 5));
    }
    const ProductionFit fit = fitFromArguments(arguments);
    CellTable table = fitTableWithCovariance(fitTable(fit), fit, Cell(1.0));
    if (data.ConsumeBool() && table.rows() > 0 && table.columns() > 0) {
        const std::size_t row = data.ConsumeIntegralInRange<std::size_t>(0, table.rows() - 1);
        const std::size_t column = data.ConsumeIntegralInRange<std::size_t>(0, table.columns() - 1);
        table.set(row, column, fuzzedCell(data, {"covariance", "ln A", "input 1", "n/a"}));
    }
    return table;
}

} // namespace

extern "C" int LLVMFuzzerTestOneInput(const std::uint8_t* bytes, std::size_t size)
{
    FuzzedDataProvider data(bytes, size);
    const std::size_t inputs = data.ConsumeIntegralInRange<std::size_t>(1, 3);
    try {
        const ModelTable model(fittedTableWithBlock(data, inputs));
        const std::vector<std::string> words{"value",           "std. error",       "lower bound", "upper bound",
                                             "prediction lower", "prediction upper", "",            "bounds"};
        const Cell what = fuzzedCell(data, words);
        const std::vector<std::string> labels{"input 1", "input 2", "input 3", "ln A", "direct", "allen", "morishima"};
        const Cell first = fuzzedCell(data, labels);
        const Cell second = fuzzedCell(data, labels);
        const std::size_t rows = data.ConsumeIntegralInRange<std::size_t>(0, 4);
        const CellTable bundles = plausibleTable(data, rows, inputs + data.ConsumeIntegralInRange<std::size_t>(0, 1));
        const CellTable prices = plausibleTable(data, 1, inputs);
        switch (data.ConsumeIntegralInRange<int>(0, 10)) {
        case 0: requireFiniteNumbers(outputColumnWithBounds(model, bundles, fuzzedCell(data), what)); break;
        case 1: requireFiniteNumbers(marginalProductColumnWithBounds(model, bundles, first, what)); break;
        case 2: requireFiniteNumbers(elasticityColumnWithBounds(model, bundles, first, what)); break;
        case 3: requireFiniteNumbers(scaleColumnWithBounds(model, bundles, what)); break;
        case 4: requireFiniteNumbers(leastCostRowWithBounds(model, fuzzedCell(data), prices, what)); break;
        case 5:
            requireFiniteNumbers(productivityColumnWithBounds(model, fuzzedTable(data, rows, 1), bundles,
                                                              data.ConsumeBool() ? fuzzedTable(data, rows, 1) : CellTable(), what));
            break;
        case 6: requireFiniteNumbers(secondPartialColumnWithBounds(model, bundles, first, second, what)); break;
        case 7: requireFiniteNumbers(technicalRateColumnWithBounds(model, bundles, first, second, what)); break;
        case 8: requireFiniteNumbers(budgetRowWithBounds(model, fuzzedCell(data), prices, what)); break;
        case 9:
            requireFiniteNumbers(costColumnWithBounds(model, fuzzedTable(data, 1, 1), prices,
                                                      fuzzedCell(data, {"total", "marginal", "average"}), what));
            break;
        default:
            requireFiniteNumbers(substitutionColumnWithBounds(model, bundles, first, second,
                                                              fuzzedCell(data, labels), what));
            break;
        }
    } catch (const InputError&) {
    }
    return 0;
}
