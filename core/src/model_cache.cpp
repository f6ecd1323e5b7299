#include "isoquant/model_cache.hpp"

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
    for (auto entry = entries_.begin(); entry != entries_.end(); ++entry) {
        if (entry->range == range) {
            entries_.splice(entries_.begin(), entries_, entry);
            return entries_.front().model;
        }
    }
    auto read = std::make_shared<const ProductionModel>(readProductionModel(range));
    ++modelsRead_;
    entries_.push_front(Entry{range, read});
    if (entries_.size() > capacity_) entries_.pop_back();
    return read;
}

std::size_t ModelCache::modelsRead() const
{
    const std::lock_guard<std::mutex> lock(mutex_);
    return modelsRead_;
}

void ModelCache::clear()
{
    const std::lock_guard<std::mutex> lock(mutex_);
    entries_.clear();
}

ProductionModel cachedProductionModel(const CellTable& range)
{
    static ModelCache cache;
    return *cache.model(range);
}

} // namespace isoquant
