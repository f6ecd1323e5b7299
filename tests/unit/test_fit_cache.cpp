// FitCache: a fit is computed once for equal arguments, again for different ones; the least
// recently used fit is evicted beyond the capacity or the byte budget; errors are not cached.
// Arguments are the Cobb & Douglas (1928) ranges (tests/data/cobb_douglas_1928.csv).
#include "isoquant/sheet/caches/fit_cache.hpp"
#include "isoquant/math/messages/input_error.hpp"
#include "isoquant/sheet/caches/cache_footprint.hpp"
#include "reference_data.hpp"

#include <boost/test/unit_test.hpp>

#include <thread>

using isoquant::FitArguments;
using isoquant::FitCache;

namespace {

FitArguments withLevel(double level)
{
    auto arguments = isoquant::testing::cobbDouglas1928Arguments();
    arguments.level = level;
    return arguments;
}

} // namespace

BOOST_AUTO_TEST_SUITE(fit_cache)

BOOST_AUTO_TEST_CASE(equal_arguments_fit_once)
{
    FitCache cache;
    const auto first = cache.fit(withLevel(0.95));
    for (int call = 0; call < 1000; ++call) {
        // A fresh but equal copy each time: equality is by content, not identity.
        const auto again = cache.fit(withLevel(0.95));
        BOOST_TEST_REQUIRE(again == first);
    }
    BOOST_TEST(cache.fitsComputed() == 1u);
    // -0 and 0 are equal cells, so they must hash alike (fit_cache.hpp: equal arguments hash equal).
    auto negativeZero = withLevel(0.95);
    negativeZero.constantReturns = -0.0;
    auto zero = withLevel(0.95);
    zero.constantReturns = 0.0;
    BOOST_TEST(isoquant::hashArguments(negativeZero) == isoquant::hashArguments(zero));
}

// Arguments handed over (moved into the cache) and arguments only lent (copied) find each other.
BOOST_AUTO_TEST_CASE(moved_and_lent_arguments_find_the_same_fit)
{
    FitCache cache;
    const FitArguments lent = withLevel(0.95);
    const auto moved = cache.fit(withLevel(0.95));
    BOOST_TEST(cache.fit(lent) == moved);
    BOOST_TEST(cache.fitsComputed() == 1u);
    const FitArguments other = withLevel(0.9);
    const auto copied = cache.fit(other);
    BOOST_TEST(cache.fit(withLevel(0.9)) == copied);
    BOOST_TEST(cache.fitsComputed() == 2u);
}

BOOST_AUTO_TEST_CASE(different_arguments_fit_again)
{
    FitCache cache;
    const auto classical = cache.fit(withLevel(0.95));
    auto robust = withLevel(0.95);
    robust.errors = std::string("hc1");
    const auto hc1 = cache.fit(robust);
    BOOST_TEST(cache.fitsComputed() == 2u);
    BOOST_TEST(hc1->inference.standardErrors(1) != classical->inference.standardErrors(1));

    // One data cell changed is a different fit too.
    auto changed = withLevel(0.95);
    changed.output.set(24, 0, 230.0);
    cache.fit(changed);
    BOOST_TEST(cache.fitsComputed() == 3u);
    // Both earlier fits are still there.
    BOOST_TEST(cache.fit(withLevel(0.95)) == classical);
    BOOST_TEST(cache.fit(robust) == hc1);
    BOOST_TEST(cache.fitsComputed() == 3u);
}

BOOST_AUTO_TEST_CASE(least_recently_used_fit_is_evicted_beyond_capacity)
{
    FitCache cache(2);
    cache.fit(withLevel(0.90)); // A
    cache.fit(withLevel(0.95)); // B
    cache.fit(withLevel(0.90)); // A again: a hit, now the most recent
    BOOST_TEST(cache.fitsComputed() == 2u);
    cache.fit(withLevel(0.99)); // C evicts B, the least recently used
    BOOST_TEST(cache.fitsComputed() == 3u);
    cache.fit(withLevel(0.90)); // A is kept
    BOOST_TEST(cache.fitsComputed() == 3u);
    cache.fit(withLevel(0.95)); // B was evicted: fitted again
    BOOST_TEST(cache.fitsComputed() == 4u);

    cache.clear();
    cache.fit(withLevel(0.90));
    BOOST_TEST(cache.fitsComputed() == 5u);
}

BOOST_AUTO_TEST_CASE(byte_budget_holds_and_evicts_the_oldest_first)
{
    FitCache probe;
    probe.fit(withLevel(0.90));
    const std::size_t entryBytes = probe.bytesHeld();
    // Arguments (three 25-row tables) and fit: at least a kind and a slot per cell.
    BOOST_TEST(entryBytes > 3u * 25u * (sizeof(isoquant::CellKind) + sizeof(double)));

    // Room for two entries of this size, not three.
    const std::size_t budget = 2 * entryBytes + entryBytes / 2;
    FitCache cache(8, isoquant::fitFromArguments, budget);
    cache.fit(withLevel(0.90)); // A
    cache.fit(withLevel(0.95)); // B
    cache.fit(withLevel(0.99)); // C evicts A, the oldest
    BOOST_TEST(cache.size() == 2u);
    BOOST_TEST(cache.bytesHeld() <= budget);
    cache.fit(withLevel(0.95)); // B kept
    cache.fit(withLevel(0.99)); // C kept, now the most recent
    BOOST_TEST(cache.fitsComputed() == 3u);
    cache.fit(withLevel(0.90)); // A fitted again, evicting B (older than C)
    BOOST_TEST(cache.fitsComputed() == 4u);
    BOOST_TEST(cache.bytesHeld() <= budget);
    cache.fit(withLevel(0.99)); // C kept
    BOOST_TEST(cache.fitsComputed() == 4u);
    cache.fit(withLevel(0.95)); // B was evicted
    BOOST_TEST(cache.fitsComputed() == 5u);
    cache.clear();
    BOOST_TEST(cache.bytesHeld() == 0u);
}

// A budget below one entry still keeps the newest, so cells sharing one large fit fit it once.
BOOST_AUTO_TEST_CASE(newest_entry_is_kept_over_the_budget)
{
    FitCache cache(8, isoquant::fitFromArguments, 1);
    cache.fit(withLevel(0.90));
    cache.fit(withLevel(0.90));
    BOOST_TEST(cache.fitsComputed() == 1u);
    cache.fit(withLevel(0.95));
    BOOST_TEST(cache.size() == 1u);
}

// A million rows × 3 inputs count at least a kind and a slot per cell (27 MB); texts add theirs.
BOOST_AUTO_TEST_CASE(footprint_counts_cells_and_texts)
{
    isoquant::CellTable inputs(1000000, 3);
    const std::size_t numbers = isoquant::footprintBytes(inputs);
    BOOST_TEST(numbers >= 27000000u);
    inputs.set(7, 1, std::string(1000, 'x'));
    BOOST_TEST(isoquant::footprintBytes(inputs) >= numbers + 1000u);
}

// What the add-in relies on when a spreadsheet closes (addin/closing_documents.hxx): clear() gives
// back every byte, a fit handed out before stays usable, and clearing from another thread while
// cells are being fitted leaves a consistent cache.
BOOST_AUTO_TEST_CASE(clear_releases_every_entry)
{
    FitCache cache;
    const auto held = cache.fit(withLevel(0.90));
    cache.fit(withLevel(0.95));
    BOOST_TEST(cache.size() == 2u);
    cache.clear();
    BOOST_TEST(cache.size() == 0u);
    BOOST_TEST(cache.bytesHeld() == 0u);
    BOOST_TEST(held->inference.standardErrors(1) > 0.0);
    BOOST_TEST(cache.fit(withLevel(0.90)) != held); // fitted again, a new object
    BOOST_TEST(cache.fitsComputed() == 3u);

    std::thread closing([&] {
        for (int round = 0; round < 200; ++round) cache.clear();
    });
    for (int call = 0; call < 200; ++call) cache.fit(withLevel(call % 2 == 0 ? 0.90 : 0.95));
    closing.join();
    BOOST_TEST(cache.size() <= 2u);
    cache.clear();
    BOOST_TEST(cache.bytesHeld() == 0u);
}

BOOST_AUTO_TEST_CASE(errors_are_not_cached)
{
    int calls = 0;
    FitCache cache(8, [&](const FitArguments& arguments) {
        ++calls;
        return isoquant::fitFromArguments(arguments);
    });
    auto bad = withLevel(0.95);
    bad.inputs.set(3, 1, std::string("n.a."));
    BOOST_CHECK_THROW(cache.fit(bad), isoquant::InputError);
    BOOST_CHECK_THROW(cache.fit(bad), isoquant::InputError);
    BOOST_TEST(calls == 2);
    BOOST_TEST(cache.fitsComputed() == 0u);
    // A good fit after the errors is computed and then cached as usual.
    cache.fit(withLevel(0.95));
    cache.fit(withLevel(0.95));
    BOOST_TEST(calls == 3);
    BOOST_TEST(cache.fitsComputed() == 1u);
}

BOOST_AUTO_TEST_SUITE_END()
