// Bounds of derived numbers (issue 20, bound_functions.hpp): coverage on invented data from a known
// technology (a property test, seeded), and the messages for the words `what` cannot answer.
#include "isoquant/math/forms/cobb_douglas.hpp"
#include "isoquant/sheet/functions/production_functions.hpp"
#include "isoquant/sheet/tables/fit_table.hpp"
#include "isoquant/math/forms/homogeneous_cost.hpp"
#include "isoquant/sheet/models/production_model.hpp"
#include "isoquant/sheet/functions/bound_functions.hpp"
#include "isoquant/sheet/tables/covariance_block.hpp"
#include "generated_data.hpp"
#include "input_error_message.hpp"
#include "reference_data.hpp"

#include <boost/test/unit_test.hpp>

using isoquant::testing::messageOf;

namespace {

isoquant::CellTable oneBundle(double first, double second)
{
    isoquant::CellTable bundle(1, 2);
    bundle.set(0, 0, first);
    bundle.set(0, 1, second);
    return bundle;
}

isoquant::CellTable tableWithBlock(const isoquant::ProductionFit& fit)
{
    return isoquant::fitTableWithCovariance(isoquant::fitTable(fit), fit, 1.0);
}

} // namespace

BOOST_AUTO_TEST_SUITE(bounds_properties)

// 2,000 data sets of 30 rows from Y = e^0.5·x₁^0.6·x₂^0.3 with N(0, 0.1²) noise on ln Y (inputs
// log-uniform on [1, 100], generated_data.hpp, seeds 1 … 2000). The 95 % bounds of the marginal
// product of x₁ at (20, 50) must cover its true value 0.6·Y/20 in 93.5–96.5 % of them (the issue's
// band: about ±3 binomial standard errors, √(0.95·0.05/2000) = 0.49 %, around 95 %); so must the
// bounds of the least-cost amount of x₁ for 200 units at prices (2, 3) (PRODLEASTCOST).
BOOST_AUTO_TEST_CASE(marginal_product_and_least_cost_bounds_cover_the_true_value)
{
    isoquant::CellTable prices(1, 2);
    prices.set(0, 0, 2.0);
    prices.set(0, 1, 3.0);
    int amountCovered = 0;
    const isoquant::CobbDouglas technology(0.5, Eigen::Vector2d(0.6, 0.3));
    const Eigen::Vector2d point(20.0, 50.0);
    const double truth = technology.marginalProduct(point, 0);
    const double trueAmount =
        isoquant::leastCostPlan(isoquant::cobbDouglasCost(technology, Eigen::Vector2d(2.0, 3.0)), 200.0).inputs(0);
    const auto bundle = oneBundle(point(0), point(1));
    isoquant::ProductionFitOptions options;
    int covered = 0;
    const int dataSets = 2000;
    for (int seed = 1; seed <= dataSets; ++seed) {
        const auto fit = isoquant::fitProduction(
            isoquant::testing::generate(technology, 30, static_cast<std::uint32_t>(seed), 0.1), options);
        const auto table = tableWithBlock(fit);
        const double lower =
            isoquant::marginalProductColumnWithBounds(table, bundle, 1.0, std::string("lower bound")).number(0, 0);
        const double upper =
            isoquant::marginalProductColumnWithBounds(table, bundle, 1.0, std::string("upper bound")).number(0, 0);
        if (lower <= truth && truth <= upper) ++covered;
        const double lowest =
            isoquant::leastCostRowWithBounds(table, 200.0, prices, std::string("lower bound")).number(0, 0);
        const double highest =
            isoquant::leastCostRowWithBounds(table, 200.0, prices, std::string("upper bound")).number(0, 0);
        if (lowest <= trueAmount && trueAmount <= highest) ++amountCovered;
    }
    const double amountCoverage = static_cast<double>(amountCovered) / dataSets;
    BOOST_TEST_MESSAGE("coverage of the least-cost amount's 95 % bounds: " << amountCoverage);
    BOOST_TEST(amountCoverage >= 0.935);
    BOOST_TEST(amountCoverage <= 0.965);
    const double coverage = static_cast<double>(covered) / dataSets;
    BOOST_TEST_MESSAGE("coverage of the 95 % bounds: " << coverage);
    BOOST_TEST(coverage >= 0.935);
    BOOST_TEST(coverage <= 0.965);
}

BOOST_AUTO_TEST_CASE(words_without_a_covariance_block_get_a_message)
{
    isoquant::CellTable typed(4, 2);
    typed.set(0, 0, "form");
    typed.set(0, 1, "cobb-douglas");
    typed.set(1, 0, "ln A");
    typed.set(1, 1, 0.1);
    typed.set(2, 0, "L");
    typed.set(2, 1, 0.7);
    typed.set(3, 0, "C");
    typed.set(3, 1, 0.3);
    const auto bundle = oneBundle(150, 200);
    BOOST_TEST(messageOf([&] {
                   isoquant::marginalProductColumnWithBounds(typed, bundle, 1.0, std::string("std. error"));
               }) == "what: \"std. error\" needs the model's covariance block; this model has none (a typed model, or "
                     "a PRODFIT table made without covariance TRUE)");
    // "value" answers as before, also for a typed model.
    BOOST_TEST(isoquant::marginalProductColumnWithBounds(typed, bundle, 1.0, std::string("value")).number(0, 0) ==
               isoquant::marginalProductColumn(typed, bundle, 1.0).number(0, 0));
    BOOST_TEST(messageOf([&] { isoquant::scaleColumnWithBounds(typed, {}, std::string("upper")); }) ==
               "what: give \"value\", \"std. error\", \"lower bound\" or \"upper bound\"");
    BOOST_TEST(messageOf([&] { isoquant::outputColumnWithBounds(typed, bundle, {}, 2.0); }) ==
               "what: give \"value\", \"std. error\", \"lower bound\", \"upper bound\", \"prediction lower\" or "
               "\"prediction upper\"");
}

BOOST_AUTO_TEST_CASE(a_shifted_ln_a_is_answered_with_a_trend_and_under_effects)
{
    // Cobb & Douglas (1928) with a trend: the evaluators' ln A is "ln A for predictions", the block's
    // last row, so output is answered (on the log scale: lower < value < upper).
    auto arguments = isoquant::testing::cobbDouglas1928Arguments();
    isoquant::CellTable years(24, 1);
    for (std::size_t row = 0; row < 24; ++row) years.set(row, 0, 1899.0 + static_cast<double>(row));
    arguments.trend = years;
    const auto trended = tableWithBlock(isoquant::fitFromArguments(arguments));
    const auto bundle = oneBundle(150, 200);
    const double value = isoquant::outputColumn(trended, bundle).number(0, 0);
    BOOST_TEST(isoquant::outputColumnWithBounds(trended, bundle, {}, std::string("lower bound")).number(0, 0) < value);
    BOOST_TEST(isoquant::outputColumnWithBounds(trended, bundle, {}, std::string("upper bound")).number(0, 0) > value);
    // The rice farms (Feng and Horrace 2012, tests/data) under fixed effects: that ln A, the
    // row-weighted mean group effect, has its row too (its figures: test_effects_bounds_cross_check.cpp).
    auto farms = isoquant::testing::riceFarmsArguments();
    farms.effects = std::string("fixed");
    const auto effects = tableWithBlock(isoquant::fitFromArguments(farms));
    isoquant::CellTable farm(1, 4);
    for (std::size_t column = 0; column < 4; ++column) farm.set(0, column, 10.0 * static_cast<double>(column + 1));
    const double farmOutput = isoquant::outputColumn(effects, farm).number(0, 0);
    BOOST_TEST(isoquant::outputColumnWithBounds(effects, farm, {}, std::string("lower bound")).number(0, 0) < farmOutput);
    BOOST_TEST(isoquant::outputColumnWithBounds(effects, farm, {}, std::string("upper bound")).number(0, 0) > farmOutput);
    // The elasticities do not involve ln A: answered.
    BOOST_TEST(isoquant::elasticityColumnWithBounds(effects, farm, 2.0, std::string("std. error")).number(0, 0) > 0);
}

// Under cluster errors the block carries t(G − 1): the rice farms (Feng and Horrace 2012, 171 farms,
// tests/data) with errors "cluster" by farm. An elasticity's bounds by `what` are then the table's
// own bounds of that exponent (the same estimate, variance and t quantile; 1e-12 relative for the
// order of evaluation), and the block's degrees of freedom are G − 1 = 170.
BOOST_AUTO_TEST_CASE(cluster_errors_give_the_tables_own_bounds)
{
    auto arguments = isoquant::testing::riceFarmsArguments();
    arguments.errors = std::string("cluster");
    const auto fit = isoquant::fitFromArguments(arguments);
    const auto table = tableWithBlock(fit);
    const auto model = isoquant::readProductionModel(table);
    BOOST_REQUIRE(model.parameterCovariance.has_value());
    BOOST_TEST(model.parameterCovariance->degreesOfFreedom == 170.0);
    BOOST_TEST(isoquant::covarianceKindWord(model.parameterCovariance->kind) == "cluster");
    isoquant::CellTable bundle(1, 4);
    for (std::size_t i = 0; i < 4; ++i) bundle.set(0, i, 10.0);
    for (Eigen::Index input = 0; input < 4; ++input) {
        const isoquant::Cell selector = static_cast<double>(input + 1);
        const double lower =
            isoquant::elasticityColumnWithBounds(table, bundle, selector, std::string("lower bound")).number(0, 0);
        const double upper =
            isoquant::elasticityColumnWithBounds(table, bundle, selector, std::string("upper bound")).number(0, 0);
        BOOST_TEST(std::fabs(lower - fit.inference.lowerBounds(1 + input)) <= 1e-12 * std::fabs(fit.inference.lowerBounds(1 + input)));
        BOOST_TEST(std::fabs(upper - fit.inference.upperBounds(1 + input)) <= 1e-12 * std::fabs(fit.inference.upperBounds(1 + input)));
    }
}

BOOST_AUTO_TEST_SUITE_END()
