#include "isoquant/sheet/caches/fit_cache.hpp"
#include "isoquant/sheet/caches/cache_footprint.hpp"

#include <cstring>

namespace isoquant {

namespace {

void combine(std::size_t& seed, std::size_t value)
{
    // The boost::hash_combine mixing step.
    seed ^= value + 0x9e3779b97f4a7c15ULL + (seed << 6) + (seed >> 2);
}

void hashNumber(std::size_t& seed, double number)
{
    const double value = number == 0 ? 0.0 : number; // -0 == 0
    std::uint64_t bits = 0;
    std::memcpy(&bits, &value, sizeof bits);
    combine(seed, std::hash<std::uint64_t>{}(bits));
}

void hashCell(std::size_t& seed, const Cell& cell)
{
    combine(seed, cell.index());
    if (isNumber(cell))
        hashNumber(seed, std::get<double>(cell));
    else if (isText(cell))
        combine(seed, std::hash<std::string>{}(std::get<std::string>(cell)));
}

// Cell by cell as hashCell does (column by column), from the table's kinds and slots directly.
void hashTable(std::size_t& seed, const CellTable& table)
{
    combine(seed, table.rows());
    combine(seed, table.columns());
    for (std::size_t column = 0; column < table.columns(); ++column) {
        const CellKind* kinds = table.columnKinds(column);
        const double* slots = table.columnSlots(column);
        for (std::size_t row = 0; row < table.rows(); ++row) {
            combine(seed, static_cast<std::size_t>(kinds[row]));
            if (kinds[row] == CellKind::number)
                hashNumber(seed, slots[row]);
            else if (kinds[row] == CellKind::text)
                combine(seed, std::hash<std::string>{}(table.text(row, column)));
        }
    }
}

} // namespace

std::size_t hashArguments(const FitArguments& arguments)
{
    std::size_t seed = 0;
    hashTable(seed, arguments.output);
    hashTable(seed, arguments.inputs);
    hashTable(seed, arguments.controls);
    for (const Cell* option : {&arguments.form, &arguments.constantReturns, &arguments.errors, &arguments.level})
        hashCell(seed, *option);
    hashTable(seed, arguments.groups);
    hashTable(seed, arguments.trend);
    for (const Cell* option : {&arguments.effects, &arguments.incompleteRows}) hashCell(seed, *option);
    return seed;
}

std::shared_ptr<const ProductionFit> FitCache::fit(const FitArguments& arguments)
{
    return fitOrReuse(arguments, nullptr);
}

std::shared_ptr<const ProductionFit> FitCache::fit(FitArguments&& arguments)
{
    return fitOrReuse(arguments, &arguments);
}

std::shared_ptr<const ProductionFit> FitCache::fitOrReuse(const FitArguments& arguments, FitArguments* expendable)
{
    const std::size_t hash = hashArguments(arguments);
    // Held while fitting, so that equal arguments arriving together are fitted once (Calc
    // serialises its calls anyway, so nothing is lost).
    const std::lock_guard<std::mutex> lock(mutex_);
    if (const Entry* kept =
            entries_.find([&](const Entry& entry) { return entry.hash == hash && entry.arguments == arguments; }))
        return kept->fit;
    auto computed = std::make_shared<const ProductionFit>(fitter_(arguments));
    ++fitsComputed_;
    const std::size_t bytes = sizeof(Entry) + footprintBytes(arguments) + footprintBytes(*computed);
    entries_.add(Entry{hash, expendable ? std::move(*expendable) : arguments, computed}, bytes);
    return computed;
}

std::size_t FitCache::fitsComputed() const
{
    const std::lock_guard<std::mutex> lock(mutex_);
    return fitsComputed_;
}

std::size_t FitCache::size() const
{
    const std::lock_guard<std::mutex> lock(mutex_);
    return entries_.size();
}

std::size_t FitCache::bytesHeld() const
{
    const std::lock_guard<std::mutex> lock(mutex_);
    return entries_.bytes();
}

void FitCache::clear()
{
    const std::lock_guard<std::mutex> lock(mutex_);
    entries_.clear();
}

} // namespace isoquant
