// The add-in's ModelRanges, the one place a model range is compared by content: an equal range
// (the same cell types, bits and texts) gets the kept ModelTable, so its model is read once; a
// range that differs in any cell gets its own table and its own model, never the one kept;
// conversion errors are not kept; the least recently used range goes beyond the capacity; huge
// ranges are not kept. No office needed: only UNO's value types (Any, Sequence, OUString).
// Models are invented (typed Cobb-Douglas ranges).
#define BOOST_TEST_MODULE isoquant model ranges
#include <boost/test/unit_test.hpp>

#include "model_ranges.hxx"

#include "isoquant/math/forms/cobb_douglas.hpp"
#include "isoquant/math/messages/input_error.hpp"
#include "input_error_message.hpp"

#include <cmath>
#include <initializer_list>
#include <string>

using css::uno::Any;
using css::uno::Sequence;
using isoquant::addin::AnyTable;
using isoquant::addin::ModelRanges;
using isoquant::testing::messageOf;
using rtl::OUString;

namespace {

AnyTable cobbDouglasRange(double logScale, double capital, double labour, const char* capitalLabel = "capital")
{
    const Any rows[4][2] = {{Any(OUString("form")), Any(OUString("cobb-douglas"))},
                            {Any(OUString("ln A")), Any(logScale)},
                            {Any(OUString::createFromAscii(capitalLabel)), Any(capital)},
                            {Any(OUString("labour")), Any(labour)}};
    AnyTable range(4);
    for (sal_Int32 r = 0; r < 4; ++r) range.getArray()[r] = Sequence<Any>(rows[r], 2);
    return range;
}

// `range` with `extra` rows of two empty cells below.
AnyTable withEmptyRows(const AnyTable& range, sal_Int32 extra)
{
    AnyTable longer(range.getLength() + extra);
    for (sal_Int32 r = 0; r < longer.getLength(); ++r)
        longer.getArray()[r] = r < range.getLength() ? range[r] : Sequence<Any>(2);
    return longer;
}

double labourExponent(const isoquant::ModelTable& table)
{
    return dynamic_cast<const isoquant::CobbDouglas&>(*table.production().technology).exponents(1);
}

} // namespace

BOOST_AUTO_TEST_SUITE(model_ranges)

BOOST_AUTO_TEST_CASE(an_equal_range_is_converted_and_read_once)
{
    ModelRanges ranges;
    const isoquant::ModelTable first = ranges.table(cobbDouglasRange(0.5, 0.3, 0.6), "model");
    const isoquant::ProductionModel* model = &first.production();
    // A new sequence each call, as Calc passes: equal by content, not the same object.
    for (int call = 0; call < 100; ++call)
        BOOST_TEST_REQUIRE(&ranges.table(cobbDouglasRange(0.5, 0.3, 0.6), "model").production() == model);
    BOOST_TEST(ranges.rangesConverted() == 1u);
    BOOST_TEST(labourExponent(first) == 0.6);
}

BOOST_AUTO_TEST_CASE(a_changed_range_is_converted_and_read_again)
{
    ModelRanges ranges;
    const auto original = ranges.table(cobbDouglasRange(0.5, 0.3, 0.6), "model");
    // One exponent changed in its last bit.
    const auto nudged = ranges.table(cobbDouglasRange(0.5, 0.3, std::nextafter(0.6, 1.0)), "model");
    BOOST_TEST(ranges.rangesConverted() == 2u);
    BOOST_TEST(labourExponent(nudged) == std::nextafter(0.6, 1.0));
    BOOST_TEST(labourExponent(original) == 0.6);
    // A label changed only in case reads to the same technology, but it is another range.
    const auto renamed = ranges.table(cobbDouglasRange(0.5, 0.3, 0.6, "Capital"), "model");
    BOOST_TEST(ranges.rangesConverted() == 3u);
    BOOST_TEST(renamed.production().inputLabels.front() == "Capital");
    // A row added below (an empty row, then nothing) is another range too.
    ranges.table(withEmptyRows(cobbDouglasRange(0.5, 0.3, 0.6, "Capital"), 1), "model");
    BOOST_TEST(ranges.rangesConverted() == 4u);
    // -0 and 0 are different cells to the core (bits are compared, not values).
    ranges.table(cobbDouglasRange(0.0, 0.3, 0.6), "model");
    ranges.table(cobbDouglasRange(-0.0, 0.3, 0.6), "model");
    BOOST_TEST(ranges.rangesConverted() == 6u);
}

BOOST_AUTO_TEST_CASE(conversion_errors_are_not_kept)
{
    ModelRanges ranges;
    AnyTable unreadable = cobbDouglasRange(0.5, 0.3, 0.6);
    unreadable.getArray()[1].getArray()[1] = Any(Sequence<sal_Int8>(3));
    for (int call = 0; call < 2; ++call)
        BOOST_TEST(messageOf([&] { ranges.table(unreadable, "model"); }) ==
                   "model: holds a value of a kind Isoquant cannot read");
    BOOST_TEST(ranges.rangesConverted() == 0u);
}

BOOST_AUTO_TEST_CASE(model_errors_are_not_kept)
{
    ModelRanges ranges;
    AnyTable noScale = cobbDouglasRange(0.5, 0.3, 0.6);
    noScale.getArray()[1].getArray()[1] = Any(OUString("n/a"));
    for (int call = 0; call < 2; ++call)
        BOOST_TEST(messageOf([&] { ranges.table(noScale, "model").production(); }) ==
                   "model: row 2 ('ln A') has no number in its second column");
    // The range is kept (its cells convert); its model is read again on each use, and fails again.
    BOOST_TEST(ranges.rangesConverted() == 1u);
}

BOOST_AUTO_TEST_CASE(least_recently_used_range_goes_first)
{
    ModelRanges ranges(2);
    ranges.table(cobbDouglasRange(0.1, 0.3, 0.6), "model");
    ranges.table(cobbDouglasRange(0.2, 0.3, 0.6), "model");
    ranges.table(cobbDouglasRange(0.1, 0.3, 0.6), "model"); // kept: now the most recent
    ranges.table(cobbDouglasRange(0.3, 0.3, 0.6), "model"); // evicts ln A = 0.2
    BOOST_TEST(ranges.rangesConverted() == 3u);
    ranges.table(cobbDouglasRange(0.1, 0.3, 0.6), "model");
    BOOST_TEST(ranges.rangesConverted() == 3u);
    ranges.table(cobbDouglasRange(0.2, 0.3, 0.6), "model");
    BOOST_TEST(ranges.rangesConverted() == 4u);
}

BOOST_AUTO_TEST_CASE(huge_ranges_are_converted_every_time)
{
    // The model on top of a tall range whose other rows are empty: 2 × 2049 cells > 4096.
    const AnyTable tall = withEmptyRows(cobbDouglasRange(0.5, 0.3, 0.6), 2045);
    BOOST_TEST_REQUIRE(static_cast<std::size_t>(tall.getLength()) * 2 > ModelRanges::largestKeptCells);
    ModelRanges ranges;
    const auto first = ranges.table(tall, "model");
    const auto second = ranges.table(tall, "model");
    BOOST_TEST(ranges.rangesConverted() == 2u);
    BOOST_TEST(labourExponent(second) == 0.6);
    BOOST_TEST(&first.production() != &second.production());
}

BOOST_AUTO_TEST_CASE(same_cells_compares_types_bits_and_texts)
{
    using isoquant::addin::sameCells;
    // One row of the given cells.
    const auto row = [](std::initializer_list<Any> cells) {
        AnyTable range(1);
        range.getArray()[0] = Sequence<Any>(cells.begin(), static_cast<sal_Int32>(cells.size()));
        return range;
    };
    const auto one = [&](const Any& cell) { return row({cell}); };
    BOOST_TEST(sameCells(one(Any(0.6)), one(Any(0.6))));
    BOOST_TEST(!sameCells(one(Any(0.0)), one(Any(-0.0))));
    BOOST_TEST(sameCells(one(Any(std::nan(""))), one(Any(std::nan("")))));
    BOOST_TEST(!sameCells(one(Any(OUString("1"))), one(Any(1.0))));
    BOOST_TEST(!sameCells(one(Any(OUString("labour"))), one(Any(OUString("Labour")))));
    BOOST_TEST(sameCells(one(Any()), one(Any())));
    BOOST_TEST(!sameCells(one(Any()), row({Any(), Any()})));
}

BOOST_AUTO_TEST_SUITE_END()
