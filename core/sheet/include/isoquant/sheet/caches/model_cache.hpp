// Remembers the models read most recently, by the full content of their ranges, compared exactly
// (never by hash alone). A column of single-cell formulas passes the same model range to every
// call, and reading it (matching every label, building the technology) would cost more than the
// evaluation itself. Safe to call from several threads.
#pragma once

#include "isoquant/sheet/arguments/cells.hpp"
#include "isoquant/sheet/models/production_model.hpp"
#include "isoquant/sheet/caches/recently_used.hpp"

#include <cstddef>
#include <memory>
#include <mutex>

namespace isoquant {

class ModelCache {
public:
    // Ranges of more than this many cells are read every time and not kept: a model is a few
    // dozen cells, and a copy of a huge range would only hold memory.
    static constexpr std::size_t largestKeptCells = 4096;

    explicit ModelCache(std::size_t capacity = 8) : entries_(capacity) {}

    // readProductionModel(range), or the model of an equal range read recently. Errors
    // (InputError) are not kept: a range that fails is read again, and fails again.
    std::shared_ptr<const ProductionModel> model(const CellTable& range);

    // Models read (not reused) since construction; a range that failed is not counted.
    std::size_t modelsRead() const;

private:
    struct Entry {
        CellTable range;
        std::shared_ptr<const ProductionModel> model;
    };

    mutable std::mutex mutex_;
    RecentlyUsed<Entry> entries_;
    std::size_t modelsRead_ = 0;
};

// The model of `range` through one cache shared by the whole process: what the evaluators use.
ProductionModel cachedProductionModel(const CellTable& range);

} // namespace isoquant
