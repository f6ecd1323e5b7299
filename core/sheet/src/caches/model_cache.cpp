#include "isoquant/sheet/caches/model_cache.hpp"

namespace isoquant {

std::shared_ptr<const ProductionModel> ModelCache::model(const CellTable& range)
{
    if (range.rows() * range.columns() > largestKeptCells) {
        auto read = std::make_shared<const ProductionModel>(readProductionModel(range));
        const std::lock_guard<std::mutex> lock(mutex_);
        ++modelsRead_;
        return read;
    }
    const std::lock_guard<std::mutex> lock(mutex_);
    if (const Entry* kept = entries_.find([&](const Entry& entry) { return entry.range == range; }))
        return kept->model;
    auto read = std::make_shared<const ProductionModel>(readProductionModel(range));
    ++modelsRead_;
    entries_.add(Entry{range, read});
    return read;
}

std::size_t ModelCache::modelsRead() const
{
    const std::lock_guard<std::mutex> lock(mutex_);
    return modelsRead_;
}

ProductionModel cachedProductionModel(const CellTable& range)
{
    static ModelCache cache;
    return *cache.model(range);
}

} // namespace isoquant
