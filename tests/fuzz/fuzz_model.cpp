// Model tables read back from arbitrary cells: a typed table may hold anything. Every read must
// give a model or an InputError.
#include "fuzzed_cells.hpp"

#include "isoquant/math/messages/input_error.hpp"
#include "isoquant/sheet/models/production_model.hpp"

using namespace isoquant;
using namespace isoquant::fuzzing;

extern "C" int LLVMFuzzerTestOneInput(const std::uint8_t* bytes, std::size_t size)
{
    FuzzedDataProvider data(bytes, size);
    const std::vector<std::string> words{"form", "cobb-douglas", "ces", "ln A", "A", "Cobb-Douglas fit", "ces fit", "translog fit", "returns to scale",
                                         "verdict", "labour", "capital", "x (control)", "ln A at control means",
                                         "imposed", "n/a", "R2", ""};
    const std::size_t rows = data.ConsumeIntegralInRange<std::size_t>(0, 24);
    const std::size_t columns = data.ConsumeIntegralInRange<std::size_t>(1, 7);
    try {
        const ProductionModel model = readProductionModel(fuzzedTable(data, rows, columns, words));
        if (!model.technology || model.technology->inputCount() != static_cast<Eigen::Index>(model.inputLabels.size()))
            std::abort();
        returnsVerdict(model, 0.95);
    } catch (const InputError&) {
    }
    return 0;
}
