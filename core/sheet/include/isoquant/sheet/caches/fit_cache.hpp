// Remembers recent fits by the full content of their arguments, so that a fit referenced from
// many cells (PRODSTAT down a column, say) is computed once. Safe to call from several threads.
#pragma once

#include "isoquant/sheet/functions/production_functions.hpp"
#include "isoquant/sheet/caches/recently_used.hpp"

#include <cstddef>
#include <functional>
#include <memory>
#include <mutex>

namespace isoquant {

class FitCache {
public:
    using Fitter = std::function<ProductionFit(const FitArguments&)>;

    explicit FitCache(std::size_t capacity = 8, Fitter fitter = fitFromArguments)
        : fitter_(std::move(fitter)), entries_(capacity) {}

    // The fit for these arguments: from the cache when equal arguments were fitted recently.
    // Errors (InputError) are not cached: they are cheap to find again.
    std::shared_ptr<const ProductionFit> fit(const FitArguments& arguments);
    // The same, keeping `arguments` themselves when they are fitted: no copy of a million-row range.
    std::shared_ptr<const ProductionFit> fit(FitArguments&& arguments);

    // Fits computed since construction (clear() empties the cache, not this count).
    std::size_t fitsComputed() const;
    void clear();

private:
    // `expendable`, when given, is `arguments` and may be moved into the cache.
    std::shared_ptr<const ProductionFit> fitOrReuse(const FitArguments& arguments, FitArguments* expendable);

    struct Entry {
        std::size_t hash;
        FitArguments arguments;
        std::shared_ptr<const ProductionFit> fit;
    };

    Fitter fitter_;
    mutable std::mutex mutex_;
    RecentlyUsed<Entry> entries_;
    std::size_t fitsComputed_ = 0;
};

// Hash of every cell and option; equal arguments hash equal.
std::size_t hashArguments(const FitArguments& arguments);

} // namespace isoquant
