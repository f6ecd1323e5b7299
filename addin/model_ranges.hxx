// The model ranges used most recently, each kept with its ModelTable (its cells and, once read,
// its production model). Single-cell formulas down a column pass the same model range to every
// call; comparing it with a kept one costs less than converting its texts to UTF-8 and reading
// the model again. The only place a model range is compared by content: the core keeps nothing.
// Safe to call from several threads.
#pragma once

#include "cell_conversion.hxx"

#include "isoquant/sheet/caches/recently_used.hpp"
#include "isoquant/sheet/models/model_table.hpp"

#include <cstddef>
#include <mutex>
#include <string>

namespace isoquant::addin {

class ModelRanges {
public:
    // Ranges of more than this many cells are converted (and read) every time and not kept: a
    // model is a few dozen cells, and a copy of a huge range would only hold memory.
    static constexpr std::size_t largestKeptCells = 4096;

    explicit ModelRanges(std::size_t capacity = 8) : entries_(capacity) {}

    // The ModelTable of toCellTable(range, argument), or the one kept for a range equal to `range`
    // cell by cell: the same type, the same bits of a number, the same text. Conversion errors
    // are not kept.
    ModelTable table(const AnyTable& range, const std::string& argument);

    // Ranges converted (not reused) since construction; a range that failed is not counted.
    std::size_t rangesConverted() const;

private:
    struct Entry {
        AnyTable range; // reference-counted: keeping it copies no cell
        ModelTable table;
    };

    mutable std::mutex mutex_;
    RecentlyUsed<Entry> entries_;
    std::size_t rangesConverted_ = 0;
};

// Whether two ranges hold the same cells: the comparison ModelRanges uses.
bool sameCells(const AnyTable& left, const AnyTable& right);

} // namespace isoquant::addin
