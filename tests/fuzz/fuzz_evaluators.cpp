// Evaluators with arbitrary arguments on a well-formed model with arbitrary parameters: every call
// gives a column of finite numbers or an InputError.
#include "fuzzed_cells.hpp"

#include "isoquant/sheet/functions/production_functions.hpp"
#include "isoquant/math/messages/input_error.hpp"

using namespace isoquant;
using namespace isoquant::fuzzing;

extern "C" int LLVMFuzzerTestOneInput(const std::uint8_t* bytes, std::size_t size)
{
    FuzzedDataProvider data(bytes, size);
    const std::size_t inputs = data.ConsumeIntegralInRange<std::size_t>(1, 4);
    CellTable model(2 + inputs, 2);
    model.set(0, 0, std::string("form"));
    model.set(0, 1, std::string("cobb-douglas"));
    model.set(1, 0, std::string(data.ConsumeBool() ? "ln A" : "A"));
    model.set(1, 1, fuzzedCell(data));
    for (std::size_t i = 0; i < inputs; ++i) {
        model.set(2 + i, 0, "input " + std::to_string(i + 1));
        model.set(2 + i, 1, fuzzedCell(data));
    }
    const std::size_t rows = data.ConsumeIntegralInRange<std::size_t>(0, 8);
    const CellTable bundles = fuzzedTable(data, rows, inputs + data.ConsumeIntegralInRange<std::size_t>(0, 1),
                                          {"input 1", "input 2"});
    const Cell selector = fuzzedCell(data, {"input 1", "input 2", "input 9"});
    try {
        switch (data.ConsumeIntegralInRange<int>(0, 4)) {
        case 0: requireFiniteNumbers(outputColumn(model, bundles)); break;
        case 1: requireFiniteNumbers(marginalProductColumn(model, bundles, selector)); break;
        case 2: requireFiniteNumbers(elasticityColumn(model, bundles, selector)); break;
        case 3: requireFiniteNumbers(scaleColumn(model, data.ConsumeBool() ? bundles : CellTable())); break;
        default: returnsVerdictCell(model, fuzzedCell(data)); break;
        }
    } catch (const InputError&) {
    }
    return 0;
}
