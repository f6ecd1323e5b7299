// A short list of entries, most recently used first, holding at most `capacity`: what the caches
// (FitCache, ModelCache, the add-in's ModelRanges) keep. Not synchronised: each cache locks.
#pragma once

#include <cstddef>
#include <list>

namespace isoquant {

template <typename Entry>
class RecentlyUsed {
public:
    explicit RecentlyUsed(std::size_t capacity) : capacity_(capacity) {}

    // The first entry `matches(entry)` accepts, made the most recent; nullptr when none does.
    template <typename Matches>
    const Entry* find(Matches matches)
    {
        for (auto entry = entries_.begin(); entry != entries_.end(); ++entry) {
            if (matches(*entry)) {
                entries_.splice(entries_.begin(), entries_, entry);
                return &entries_.front();
            }
        }
        return nullptr;
    }

    // Adds `entry` as the most recent, dropping the least recent beyond the capacity.
    void add(Entry entry)
    {
        entries_.push_front(std::move(entry));
        if (entries_.size() > capacity_) entries_.pop_back();
    }

    void clear() { entries_.clear(); }

private:
    std::size_t capacity_;
    std::list<Entry> entries_;
};

} // namespace isoquant
