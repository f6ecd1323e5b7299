// Remembers recent fits by the full content of their arguments, so that a fit referenced from
// many cells (PRODSTAT down a column, say) is computed once. Safe to call from several threads.
// Bounded by entries and by bytes (each entry's arguments and fit, cache_footprint.hpp): the least
// recently used entries go first; the newest is kept even when it alone exceeds the bytes.
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

    // 256 MiB: six 1M × 3 fits with their arguments (44 MB each: 36 MB of cells, 8 MB of
    // residuals), a small share of a desktop's memory (common practice, no source).
    static constexpr std::size_t defaultByteBudget = std::size_t{256} << 20;

    explicit FitCache(std::size_t capacity = 8, Fitter fitter = fitFromArguments,
                      std::size_t byteBudget = defaultByteBudget)
        : fitter_(std::move(fitter)), entries_(capacity, byteBudget) {}

    // The fit for these arguments: from the cache when equal arguments were fitted recently.
    // Errors (InputError) are not cached: they are cheap to find again.
    std::shared_ptr<const ProductionFit> fit(const FitArguments& arguments);
    // The same, keeping `arguments` themselves when they are fitted: no copy of a million-row range.
    std::shared_ptr<const ProductionFit> fit(FitArguments&& arguments);

    // Fits computed since construction (clear() empties the cache, not this count).
    std::size_t fitsComputed() const;
    // Entries held and the bytes they count against the budget.
    std::size_t size() const;
    std::size_t bytesHeld() const;
    // Drops every entry (the add-in does when a spreadsheet closes); fits already handed out stay
    // valid for whoever holds them. Safe while other threads fit.
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
