// The model ranges converted most recently, kept beside their cells. Single-cell formulas down a
// column pass the same model range to every call; comparing it with a kept one costs less than
// converting its texts to UTF-8 again. Safe to call from several threads.
#pragma once

#include "cell_conversion.hxx"

#include "isoquant/sheet/caches/recently_used.hpp"

#include <cstddef>
#include <memory>
#include <mutex>
#include <string>

namespace isoquant::addin {

class ModelRanges {
public:
    // Ranges of more than this many cells are converted every time and not kept (as in
    // isoquant::ModelCache: a model is a few dozen cells).
    static constexpr std::size_t largestKeptCells = 4096;

    explicit ModelRanges(std::size_t capacity = 4) : entries_(capacity) {}

    // toCellTable(range, argument), or the cells of a kept range equal to `range` cell by cell:
    // the same type, the same bits of a number, the same text. Conversion errors are not kept.
    std::shared_ptr<const CellTable> cells(const AnyTable& range, const std::string& argument);

private:
    struct Entry {
        AnyTable range; // reference-counted: keeping it copies no cell
        std::shared_ptr<const CellTable> cells;
    };

    mutable std::mutex mutex_;
    RecentlyUsed<Entry> entries_;
};

// Whether two ranges hold the same cells: the comparison ModelRanges uses.
bool sameCells(const AnyTable& left, const AnyTable& right);

} // namespace isoquant::addin
