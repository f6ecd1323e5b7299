#include "isoquant/sheet/models/model_table.hpp"

#include <mutex>

namespace isoquant {

struct ModelTable::Shared {
    explicit Shared(CellTable table) : cells(std::move(table)) {}

    const CellTable cells;
    std::mutex mutex;
    std::unique_ptr<const ProductionModel> production; // set once, never replaced
};

ModelTable::ModelTable(CellTable cells) : shared_(std::make_shared<Shared>(std::move(cells))) {}

const CellTable& ModelTable::cells() const { return shared_->cells; }

const ProductionModel& ModelTable::production() const
{
    // Held while reading, so that calls arriving together over one range read it once.
    const std::lock_guard<std::mutex> lock(shared_->mutex);
    if (!shared_->production)
        shared_->production = std::make_unique<const ProductionModel>(readProductionModel(shared_->cells));
    return *shared_->production;
}

} // namespace isoquant
