// A translog whose βᵢⱼ are all 0 is the cobb-douglas of the same α₀ and αᵢ (translog.hpp). Typed
// with a covariance block that is the cobb-douglas's block padded with zero rows and columns for the
// βᵢⱼ, every figure of `what` must be the cobb-douglas's, though the two take different roads: the
// cobb-douglas's closed-form gradients (bound_functions.hpp), the translog's through its local shape
// (shape_gradients.hpp) and its plans' first-order conditions by the implicit function theorem
// (plan_gradients.hpp), where the cobb-douglas's plans have closed forms. A wrong partial in
// either road shows. Parameters, block, prices (4, 3), output 180, budget 1000 and the bundle
// (150, 200) with observed output 160 are invented.
//
// Tolerance 1e-9 relative (common practice, no source): both roads are exact to rounding, and
// the implicit function theorem solves a 3×3 system of condition near 10, so 1e-9 holds with room
// while a wrong term (of order 1e-2 relative at least) fails it. The elasticity of substitution,
// 1 whatever the α's, has std. error 0 by both roads: below 1e-12 (rounding).
#include "cell_tables.hpp"
#include "isoquant/sheet/functions/bound_functions.hpp"
#include "isoquant/sheet/functions/decision_functions.hpp"
#include "relative_error.hpp"

#include <boost/test/unit_test.hpp>

#include <functional>
#include <string>

namespace
{

using isoquant::Cell;
using isoquant::CellTable;

const Cell none{};

CellTable cobbDouglas()
{
    return isoquant::testing::typedRange({{std::string("form"), std::string("cobb-douglas"), none, none},
                                          {std::string("ln A"), 0.2, none, none},
                                          {std::string("L"), 0.6, none, none},
                                          {std::string("C"), 0.3, none, none},
                                          {std::string("covariance"), std::string("classical"), 20.0, 0.95},
                                          {std::string("ln A"), 0.04, -0.005, -0.006},
                                          {std::string("L"), -0.005, 0.01, -0.004},
                                          {std::string("C"), -0.006, -0.004, 0.012}});
}

CellTable translogWithoutInteractions(double capitalExponent = 0.3)
{
    return isoquant::testing::typedRange(
        {{std::string("form"), std::string("translog"), none, none, none, none, none},
         {std::string("ln A"), 0.2, none, none, none, none, none},
         {std::string("L"), 0.6, none, none, none, none, none},
         {std::string("C"), capitalExponent, none, none, none, none, none},
         {std::string("L*L"), 0.0, none, none, none, none, none},
         {std::string("L*C"), 0.0, none, none, none, none, none},
         {std::string("C*C"), 0.0, none, none, none, none, none},
         {std::string("covariance"), std::string("classical"), 20.0, 0.95, none, none, none},
         {std::string("ln A"), 0.04, -0.005, -0.006, 0.0, 0.0, 0.0},
         {std::string("L"), -0.005, 0.01, -0.004, 0.0, 0.0, 0.0},
         {std::string("C"), -0.006, -0.004, 0.012, 0.0, 0.0, 0.0},
         {std::string("L*L"), 0.0, 0.0, 0.0, 0.0, 0.0, 0.0},
         {std::string("L*C"), 0.0, 0.0, 0.0, 0.0, 0.0, 0.0},
         {std::string("C*C"), 0.0, 0.0, 0.0, 0.0, 0.0, 0.0}});
}

} // namespace

BOOST_AUTO_TEST_SUITE(translog_limit_bounds)

BOOST_AUTO_TEST_CASE(a_translog_without_interactions_has_the_cobb_douglas_bounds)
{
    const CellTable prices = isoquant::testing::typedRange({{4.0, 3.0}});
    const CellTable bundle = isoquant::testing::typedRange({{150.0, 200.0}});
    const CellTable observed = isoquant::testing::typedRange({{160.0}});
    const CellTable output = isoquant::testing::typedRange({{180.0}});
    using Figure = std::function<double(const CellTable&, const Cell&)>;
    const std::vector<std::pair<std::string, Figure>> figures{
        {"least-cost L",
         [&](const CellTable& m, const Cell& w) {
             return isoquant::leastCostRowWithBounds(m, 180.0, prices, w).number(0, 0);
         }},
        {"least-cost C",
         [&](const CellTable& m, const Cell& w) {
             return isoquant::leastCostRowWithBounds(m, 180.0, prices, w).number(0, 1);
         }},
        {"budget L", [&](const CellTable& m,
                         const Cell& w) { return isoquant::budgetRowWithBounds(m, 1000.0, prices, w).number(0, 0); }},
        {"budget output",
         [&](const CellTable& m, const Cell& w) {
             return isoquant::budgetRowWithBounds(m, 1000.0, prices, w).number(0, 2);
         }},
        {"total cost",
         [&](const CellTable& m, const Cell& w) {
             return isoquant::costColumnWithBounds(m, output, prices, std::string("total"), w).number(0, 0);
         }},
        {"marginal cost",
         [&](const CellTable& m, const Cell& w) {
             return isoquant::costColumnWithBounds(m, output, prices, std::string("marginal"), w).number(0, 0);
         }},
        {"cost elasticity",
         [&](const CellTable& m, const Cell& w) {
             return isoquant::costColumnWithBounds(m, output, prices, std::string("cost elasticity"), w).number(0, 0);
         }},
        {"returns to scale",
         [&](const CellTable& m, const Cell& w) {
             return isoquant::costColumnWithBounds(m, output, prices, std::string("returns to scale"), w).number(0, 0);
         }},
        {"second partial LC",
         [&](const CellTable& m, const Cell& w) {
             return isoquant::secondPartialColumnWithBounds(m, bundle, 1.0, 2.0, w).number(0, 0);
         }},
        {"second partial LL",
         [&](const CellTable& m, const Cell& w) {
             return isoquant::secondPartialColumnWithBounds(m, bundle, 1.0, Cell{}, w).number(0, 0);
         }},
        {"MRTS",
         [&](const CellTable& m, const Cell& w) {
             return isoquant::technicalRateColumnWithBounds(m, bundle, 1.0, 2.0, w).number(0, 0);
         }},
        {"TFP", [&](const CellTable& m, const Cell& w) {
             return isoquant::productivityColumnWithBounds(m, observed, bundle, {}, w).number(0, 0);
         }}};
    const CellTable closedForm = cobbDouglas(), throughConditions = translogWithoutInteractions();
    for (const auto& [name, figure] : figures)
        for (const char* word : {"std. error", "lower bound", "upper bound"}) {
            const double expected = figure(closedForm, std::string(word)),
                         found = figure(throughConditions, std::string(word));
            BOOST_TEST_CONTEXT(name << ", " << word)
            BOOST_TEST(isoquant::testing::closeTo(found, expected, 1e-9), found << " against " << expected);
        }
    const double spread =
        isoquant::substitutionColumnWithBounds(throughConditions, bundle, 1.0, 2.0, {}, std::string("std. error"))
            .number(0, 0);
    BOOST_TEST(spread < 1e-12);
}

// Where the value is undefined the word answers the value's own text: with αC = 0 the marginal
// product of C is 0 at the bundle (1, 1) (εC = αC + Σ βCj·ln xⱼ = 0), so the MRTS of L for C and the
// direct elasticity of substitution are undefined there.
BOOST_AUTO_TEST_CASE(an_undefined_value_keeps_its_text)
{
    const CellTable model = translogWithoutInteractions(0.0);
    const CellTable bundle = isoquant::testing::typedRange({{1.0, 1.0}});
    const CellTable rate = isoquant::technicalRateColumn(model, bundle, 1.0, 2.0);
    BOOST_TEST_REQUIRE(rate.isText(0, 0));
    BOOST_TEST(isoquant::technicalRateColumnWithBounds(model, bundle, 1.0, 2.0, std::string("std. error")).text(0, 0) ==
               rate.text(0, 0));
    const CellTable elasticity = isoquant::substitutionColumn(model, bundle, 1.0, 2.0, {});
    BOOST_TEST_REQUIRE(elasticity.isText(0, 0));
    BOOST_TEST(
        isoquant::substitutionColumnWithBounds(model, bundle, 1.0, 2.0, {}, std::string("upper bound")).text(0, 0) ==
        elasticity.text(0, 0));
}

BOOST_AUTO_TEST_SUITE_END()
