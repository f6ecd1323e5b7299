// PRODENVELOPE with arbitrary shapes, values, options and names: every call must end in a column of
// finite numbers (or texts) or an InputError; anything else is a finding.
#include "fuzzed_cells.hpp"

#include "isoquant/math/messages/input_error.hpp"
#include "isoquant/sheet/functions/envelope_functions.hpp"

using namespace isoquant;
using namespace isoquant::fuzzing;

extern "C" int LLVMFuzzerTestOneInput(const std::uint8_t* bytes, std::size_t size)
{
    FuzzedDataProvider data(bytes, size);
    const std::vector<std::string> words{"visits", "nurses", "beds", "target nurses", "peers", "n/a", ""};
    const std::size_t rows = data.ConsumeIntegralInRange<std::size_t>(0, 30);
    const CellTable outputs = fuzzedTable(data, rows, data.ConsumeIntegralInRange<std::size_t>(1, 3), words);
    const CellTable inputs =
        fuzzedTable(data, rows + data.ConsumeIntegralInRange<std::size_t>(0, 1), data.ConsumeIntegralInRange<std::size_t>(1, 4), words);
    const std::vector<std::string> options{"constant", "variable", "non-increasing", "input", "output", "score",
                                           "scale efficiency", "peers", "target nurses", "target visits"};
    const Cell returns = fuzzedCell(data, options), orientation = fuzzedCell(data, options),
               what = fuzzedCell(data, options);
    const CellTable names = data.ConsumeBool() ? fuzzedTable(data, rows, 1, words) : CellTable();
    try {
        requireFiniteNumbers(envelopeColumn(outputs, inputs, returns, orientation, what, names));
    } catch (const InputError&) {
    }
    return 0;
}
