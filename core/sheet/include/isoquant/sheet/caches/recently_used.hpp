// A short list of entries, most recently used first, holding at most `capacity` entries and, when
// the entries are added with their sizes, at most `byteBudget` bytes: what the caches (FitCache and
// the add-in's ModelRanges) keep. Not synchronised: each cache locks.
#pragma once

#include <cstddef>
#include <limits>
#include <list>

namespace isoquant {

template <typename Entry>
class RecentlyUsed {
public:
    explicit RecentlyUsed(std::size_t capacity, std::size_t byteBudget = std::numeric_limits<std::size_t>::max())
        : capacity_(capacity), byteBudget_(byteBudget)
    {
    }

    // The first entry `matches(entry)` accepts, made the most recent; nullptr when none does.
    template <typename Matches>
    const Entry* find(Matches matches)
    {
        for (auto slot = slots_.begin(); slot != slots_.end(); ++slot) {
            if (matches(slot->entry)) {
                slots_.splice(slots_.begin(), slots_, slot);
                return &slots_.front().entry;
            }
        }
        return nullptr;
    }

    // Adds `entry`, holding `bytes`, as the most recent, dropping the least recent beyond the
    // capacity or the byte budget. The entry just added is always kept, even alone over the
    // budget: a cache that could not hold its newest entry would recompute it on every call.
    void add(Entry entry, std::size_t bytes = 0)
    {
        slots_.push_front(Slot{std::move(entry), bytes});
        bytes_ += bytes;
        while (slots_.size() > 1 && (slots_.size() > capacity_ || bytes_ > byteBudget_)) {
            bytes_ -= slots_.back().bytes;
            slots_.pop_back();
        }
    }

    void clear()
    {
        slots_.clear();
        bytes_ = 0;
    }

    std::size_t size() const { return slots_.size(); }
    // The bytes of the entries held, as given to add().
    std::size_t bytes() const { return bytes_; }

private:
    struct Slot {
        Entry entry;
        std::size_t bytes;
    };

    std::size_t capacity_;
    std::size_t byteBudget_;
    std::size_t bytes_ = 0;
    std::list<Slot> slots_;
};

} // namespace isoquant
