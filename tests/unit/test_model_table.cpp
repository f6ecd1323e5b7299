// ModelTable and the evaluators that take it: a table reads its model once, however many calls
// and copies use it, also from several threads at once; errors are not kept; each model gives
// its own numbers. (Which ranges share a table is the add-in's ModelRanges: test_model_ranges.cxx.)
// Models are invented (typed Cobb-Douglas tables); the expected marginal products are
// b_K·A·K^b_K·L^b_L / K computed here.
#include "isoquant/sheet/functions/production_functions.hpp"
#include "isoquant/math/messages/input_error.hpp"
#include "isoquant/sheet/models/model_table.hpp"
#include "cell_tables.hpp"
#include "input_error_message.hpp"
#include "model_access.hpp"
#include "relative_error.hpp"

#include <boost/test/unit_test.hpp>

#include <cmath>
#include <string>
#include <thread>
#include <vector>

using isoquant::CellTable;
using isoquant::ModelTable;
using isoquant::ProductionModel;

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

double marginalOfCapital(const ModelTable& model, double k, double l)
{
    const CellTable column =
        isoquant::marginalProductColumn(model, isoquant::testing::numberRange(Eigen::RowVector2d(k, l)), 1.0);
    return column.number(0, 0);
}

} // namespace

BOOST_AUTO_TEST_SUITE(model_table)

// Each read makes a new ProductionModel: the same address on every call means one read.
BOOST_AUTO_TEST_CASE(a_table_reads_its_model_once)
{
    const ModelTable table(cobbDouglasModel(0.5, 0.3, 0.6));
    const ProductionModel* first = &table.production();
    for (int call = 0; call < 100; ++call) {
        BOOST_TEST_REQUIRE(marginalOfCapital(table, 3.0, 5.0) == marginalOfCapital(table, 3.0, 5.0));
        BOOST_TEST_REQUIRE(&table.production() == first);
    }
    const ModelTable copy = table;
    BOOST_TEST(&copy.production() == first);
    BOOST_TEST(isoquant::testing::cobbDouglasOf(*first).exponents(1) == 0.6);
    // Another table of equal cells is another range to the core: the core compares nothing.
    const ModelTable equal(cobbDouglasModel(0.5, 0.3, 0.6));
    BOOST_TEST(&equal.production() != first);
}

BOOST_AUTO_TEST_CASE(threads_arriving_together_share_one_read)
{
    const ModelTable table(cobbDouglasModel(0.5, 0.3, 0.6));
    std::vector<const ProductionModel*> seen(8, nullptr);
    std::vector<std::thread> threads;
    for (std::size_t thread = 0; thread < seen.size(); ++thread)
        threads.emplace_back([&, thread] { seen[thread] = &table.production(); });
    for (std::thread& thread : threads) thread.join();
    for (const ProductionModel* model : seen) BOOST_TEST(model == &table.production());
}

// Through the evaluators, each call with a table of its own: each model gives its own numbers,
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
    // A model turned bad after a good read is refused.
    auto broken = cobbDouglasModel(0.5, 0.3, 0.6);
    marginalOfCapital(broken, k, l);
    broken.set(1, 1, "n/a");
    BOOST_TEST(isoquant::testing::messageOf([&] { marginalOfCapital(broken, k, l); }) ==
               "model: row 2 ('ln A') has no number in its second column");
}

BOOST_AUTO_TEST_CASE(errors_are_not_kept)
{
    auto noScale = cobbDouglasModel(0.5, 0.3, 0.6);
    noScale.set(1, 1, "n/a");
    const ModelTable table(noScale);
    for (int call = 0; call < 2; ++call)
        BOOST_TEST(isoquant::testing::messageOf([&] { table.production(); }) ==
                   "model: row 2 ('ln A') has no number in its second column");
    BOOST_TEST((table.cells() == noScale));
}

BOOST_AUTO_TEST_SUITE_END()
