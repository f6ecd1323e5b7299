#include "model_ranges.hxx"

#include <cstring>

namespace isoquant::addin {

namespace {

bool sameCell(const css::uno::Any& left, const css::uno::Any& right)
{
    const css::uno::TypeClass kind = left.getValueTypeClass();
    if (kind != right.getValueTypeClass()) return false;
    switch (kind) {
    case css::uno::TypeClass_DOUBLE:
        // Bits, not ==: -0 and 0 are different cells to the core, and a NaN equals itself here.
        return std::memcmp(left.getValue(), right.getValue(), sizeof(double)) == 0;
    case css::uno::TypeClass_STRING:
        return *static_cast<const OUString*>(left.getValue()) == *static_cast<const OUString*>(right.getValue());
    case css::uno::TypeClass_VOID: return true;
    default: return left == right;
    }
}

} // namespace

bool sameCells(const AnyTable& left, const AnyTable& right)
{
    if (left.getLength() != right.getLength()) return false;
    for (sal_Int32 r = 0; r < left.getLength(); ++r) {
        const auto& leftRow = left[r];
        const auto& rightRow = right[r];
        if (leftRow.getLength() != rightRow.getLength()) return false;
        for (sal_Int32 c = 0; c < leftRow.getLength(); ++c)
            if (!sameCell(leftRow[c], rightRow[c])) return false;
    }
    return true;
}

ModelTable ModelRanges::table(const AnyTable& range, const std::string& argument)
{
    std::size_t cellCount = 0;
    for (const auto& row : range) cellCount += static_cast<std::size_t>(row.getLength());
    const bool kept = cellCount <= largestKeptCells;
    if (kept) {
        const std::lock_guard<std::mutex> lock(mutex_);
        if (const Entry* reused = entries_.find([&](const Entry& entry) { return sameCells(entry.range, range); }))
            return reused->table;
    }
    ModelTable converted(toCellTable(range, argument));
    const std::lock_guard<std::mutex> lock(mutex_);
    ++rangesConverted_;
    if (kept) entries_.add(Entry{range, converted});
    return converted;
}

std::size_t ModelRanges::rangesConverted() const
{
    const std::lock_guard<std::mutex> lock(mutex_);
    return rangesConverted_;
}

} // namespace isoquant::addin
