// ModelCache and the evaluators that go through it: an equal model range is read once; a range
// that differs in any cell is read again and gives its own model, never the one kept; errors are
// not kept; the least recently used model goes beyond the capacity; huge ranges are not kept.
// Models are invented (typed Cobb-Douglas tables); the expected marginal products are
// b_K·A·K^b_K·L^b_L / K computed here.
#include "isoquant/sheet/functions/production_functions.hpp"
#include "isoquant/math/messages/input_error.hpp"
#include "isoquant/sheet/caches/model_cache.hpp"
#include "cell_tables.hpp"
#include "input_error_message.hpp"
#include "model_access.hpp"
#include "relative_error.hpp"

#include <boost/test/unit_test.hpp>

#include <cmath>
#include <string>

using isoquant::CellTable;
using isoquant::ModelCache;

namespace {

CellTable cobbDouglasModel(double logScale, double capital, double labour)
{
    return isoquant::testing::typedRange({{std::string("form"), std::string("cobb-douglas")},
                                          {std::string("ln A"), logScale},
                                          {std::string("capital"), capital},
                                          {std::string("labour"), labour}});
}

double expectedMarginalOfCapital(double logScale, double capital, double labour, double k, double l)
{
    return capital * std::exp(logScale) * std::pow(k, capital) * std::pow(l, labour) / k;
}

double marginalOfCapital(const CellTable& model, double k, double l)
{
    const CellTable column =
        isoquant::marginalProductColumn(model, isoquant::testing::numberRange(Eigen::RowVector2d(k, l)), 1.0);
    return column.number(0, 0);
}

} // namespace

BOOST_AUTO_TEST_SUITE(model_cache)

BOOST_AUTO_TEST_CASE(an_equal_range_is_read_once)
{
    ModelCache cache;
    const auto first = cache.model(cobbDouglasModel(0.5, 0.3, 0.6));
    for (int call = 0; call < 100; ++call) BOOST_TEST_REQUIRE(cache.model(cobbDouglasModel(0.5, 0.3, 0.6)) == first);
    BOOST_TEST(cache.modelsRead() == 1u);
    BOOST_TEST(isoquant::testing::cobbDouglasOf(*first).exponents(1) == 0.6);
}

BOOST_AUTO_TEST_CASE(a_changed_range_is_read_again)
{
    ModelCache cache;
    const auto original = cache.model(cobbDouglasModel(0.5, 0.3, 0.6));
    // One exponent changed in its last bit.
    const auto nudged = cache.model(cobbDouglasModel(0.5, 0.3, std::nextafter(0.6, 1.0)));
    BOOST_TEST(cache.modelsRead() == 2u);
    BOOST_TEST(isoquant::testing::cobbDouglasOf(*nudged).exponents(1) == std::nextafter(0.6, 1.0));
    BOOST_TEST(isoquant::testing::cobbDouglasOf(*original).exponents(1) == 0.6);
    // A label changed only in case reads to the same technology, but it is another range.
    auto renamed = cobbDouglasModel(0.5, 0.3, 0.6);
    renamed.set(2, 0, "Capital");
    const auto read = cache.model(renamed);
    BOOST_TEST(cache.modelsRead() == 3u);
    BOOST_TEST(read->inputLabels.front() == "Capital");
    // A row added below (an empty row, then nothing) is another range too.
    CellTable longer(5, 2);
    for (std::size_t row = 0; row < 4; ++row)
        for (std::size_t column = 0; column < 2; ++column) longer.set(row, column, renamed.at(row, column));
    cache.model(longer);
    BOOST_TEST(cache.modelsRead() == 4u);
}

// Through the evaluators (one cache for the whole process): each model gives its own numbers,
// whatever was evaluated before.
BOOST_AUTO_TEST_CASE(evaluators_never_answer_from_another_model)
{
    const double k = 3.0, l = 5.0;
    for (int round = 0; round < 3; ++round) {
        for (const double labour : {0.6, 0.7, 0.6, 0.2}) {
            const double value = marginalOfCapital(cobbDouglasModel(0.5, 0.3, labour), k, l);
            // The core works in long double, the check here in double: a few units in the last place.
            BOOST_TEST(isoquant::testing::closeTo(value, expectedMarginalOfCapital(0.5, 0.3, labour, k, l), 1e-14));
        }
    }
    // A model turned bad after a good read is refused, not answered from the kept good one.
    auto broken = cobbDouglasModel(0.5, 0.3, 0.6);
    marginalOfCapital(broken, k, l);
    broken.set(1, 1, "n/a");
    BOOST_TEST(isoquant::testing::messageOf([&] { marginalOfCapital(broken, k, l); }) ==
               "model: row 2 ('ln A') has no number in its second column");
}

BOOST_AUTO_TEST_CASE(errors_are_not_kept)
{
    ModelCache cache;
    auto noScale = cobbDouglasModel(0.5, 0.3, 0.6);
    noScale.set(1, 1, "n/a");
    for (int call = 0; call < 2; ++call)
        BOOST_TEST(isoquant::testing::messageOf([&] { cache.model(noScale); }) ==
                   "model: row 2 ('ln A') has no number in its second column");
    BOOST_TEST(cache.modelsRead() == 0u);
}

BOOST_AUTO_TEST_CASE(least_recently_used_model_goes_first)
{
    ModelCache cache(2);
    cache.model(cobbDouglasModel(0.1, 0.3, 0.6));
    cache.model(cobbDouglasModel(0.2, 0.3, 0.6));
    cache.model(cobbDouglasModel(0.1, 0.3, 0.6)); // kept: now the most recent
    cache.model(cobbDouglasModel(0.3, 0.3, 0.6)); // evicts ln A = 0.2
    BOOST_TEST(cache.modelsRead() == 3u);
    cache.model(cobbDouglasModel(0.1, 0.3, 0.6));
    BOOST_TEST(cache.modelsRead() == 3u);
    cache.model(cobbDouglasModel(0.2, 0.3, 0.6));
    BOOST_TEST(cache.modelsRead() == 4u);
}

BOOST_AUTO_TEST_CASE(huge_ranges_are_read_every_time)
{
    // The model on top of a tall range whose other rows are empty: 2 × 2049 cells > 4096.
    const CellTable model = cobbDouglasModel(0.5, 0.3, 0.6);
    CellTable tall(2049, 2);
    for (std::size_t row = 0; row < 4; ++row)
        for (std::size_t column = 0; column < 2; ++column) tall.set(row, column, model.at(row, column));
    BOOST_TEST_REQUIRE(tall.rows() * tall.columns() > ModelCache::largestKeptCells);
    ModelCache cache;
    const auto first = cache.model(tall);
    const auto second = cache.model(tall);
    BOOST_TEST(cache.modelsRead() == 2u);
    BOOST_TEST(isoquant::testing::cobbDouglasOf(*second).exponents(0) == 0.3);
    BOOST_TEST(first != second);
}

BOOST_AUTO_TEST_SUITE_END()
