// PRODFIT's covariance block (issue 20, core/sheet/include/isoquant/sheet/tables/covariance_block.hpp):
// written below the table, read back by the model reader, and refused when typed wrongly by hand.
// Data: Cobb & Douglas (1928), tests/data/cobb_douglas_1928.csv (source in tests/data/README.md);
// the block must hold the fit's own covariance matrix, cell for cell (exact: cells hold doubles).
#include "isoquant/sheet/functions/production_functions.hpp"
#include "isoquant/sheet/tables/fit_table.hpp"
#include "isoquant/sheet/models/production_model.hpp"
#include "isoquant/sheet/functions/bound_functions.hpp"
#include "isoquant/sheet/tables/covariance_block.hpp"
#include "covariance_tables.hpp"
#include "input_error_message.hpp"
#include "reference_data.hpp"

#include <boost/test/unit_test.hpp>

#include <cmath>

using isoquant::testing::blockRow;
using isoquant::testing::messageOf;
using isoquant::testing::tableWithBlock;

namespace {

isoquant::ProductionFit fit1928(isoquant::Cell errors = {})
{
    auto arguments = isoquant::testing::cobbDouglas1928Arguments();
    arguments.errors = std::move(errors);
    return isoquant::fitFromArguments(arguments);
}

} // namespace

BOOST_AUTO_TEST_SUITE(covariance_block)

BOOST_AUTO_TEST_CASE(block_follows_the_table_with_the_documented_size)
{
    const auto fit = fit1928();
    const auto plain = isoquant::fitTable(fit);
    const auto table = tableWithBlock(fit);
    // 1 + p rows more (p = 3: ln A, L, C), max(7, p + 1) = 7 columns.
    BOOST_TEST(table.rows() == plain.rows() + 4);
    BOOST_TEST(table.columns() == 7u);
    const std::size_t row = blockRow(table);
    BOOST_TEST(row == plain.rows());
    BOOST_TEST(table.text(row, 1) == "classical");
    BOOST_TEST(table.number(row, 2) == 21.0); // n − p = 24 − 3
    BOOST_TEST(table.number(row, 3) == 0.95);
    BOOST_TEST(table.text(row + 2, 0) == "L");
    for (Eigen::Index i = 0; i < 3; ++i)
        for (Eigen::Index j = 0; j < 3; ++j)
            BOOST_TEST(table.number(row + 1 + i, 1 + j) == fit.inference.covariance(i, j));
    // FALSE or empty: the table as before.
    BOOST_TEST(isoquant::fitTableWithCovariance(plain, fit, 0.0).rows() == plain.rows());
    BOOST_TEST(isoquant::fitTableWithCovariance(plain, fit, isoquant::Cell{}).rows() == plain.rows());
}

BOOST_AUTO_TEST_CASE(wide_block_names_its_extra_columns)
{
    isoquant::CovarianceBlock block;
    block.labels = {"ln A", "a", "b", "c", "d", "e", "f"};
    block.matrix = Eigen::MatrixXd::Identity(7, 7);
    const auto table = isoquant::withCovarianceBlock(isoquant::CellTable(2, 7), block);
    BOOST_TEST(table.columns() == 8u); // max(7, 7 + 1)
    BOOST_TEST(table.text(0, 7) == "f");
}

BOOST_AUTO_TEST_CASE(model_reader_reads_the_block_back)
{
    for (const char* errors : {"classical", "hc1", "hc3"}) {
        const auto fit = fit1928(std::string(errors));
        const auto model = isoquant::readProductionModel(tableWithBlock(fit));
        BOOST_REQUIRE(model.parameterCovariance.has_value());
        BOOST_TEST((model.parameterCovariance->matrix == fit.inference.covariance));
        BOOST_TEST(isoquant::covarianceKindWord(model.parameterCovariance->kind) == errors);
        BOOST_TEST(model.parameterCovariance->degreesOfFreedom == 21.0);
        BOOST_TEST(model.inputLabels == (std::vector<std::string>{"L", "C"}), boost::test_tools::per_element());
    }
}

BOOST_AUTO_TEST_CASE(evaluators_and_lookups_work_with_the_block)
{
    const auto fit = fit1928();
    const auto plain = isoquant::fitTable(fit);
    const auto table = tableWithBlock(fit);
    isoquant::CellTable bundle(1, 2);
    bundle.set(0, 0, 150.0);
    bundle.set(0, 1, 200.0);
    BOOST_TEST(isoquant::marginalProductColumn(table, bundle, 1.0).number(0, 0) ==
               isoquant::marginalProductColumn(plain, bundle, 1.0).number(0, 0));
    BOOST_TEST(isoquant::outputColumn(table, bundle).number(0, 0) == isoquant::outputColumn(plain, bundle).number(0, 0));
    BOOST_TEST(std::get<double>(isoquant::tableValue(table, std::string("C"), std::string("std. error"))) ==
               fit.inference.standardErrors(2));
    BOOST_TEST(std::get<double>(isoquant::tableValue(table, std::string("R2"), isoquant::Cell{})) == fit.rSquared);
}

BOOST_AUTO_TEST_CASE(block_typed_wrongly_gets_a_message)
{
    const auto table = tableWithBlock(fit1928());
    const std::size_t row = blockRow(table);
    // Row numbers in messages are 1-based rows of the model range.
    const std::string blockPlace = "model: row " + std::to_string(row + 1);

    auto asymmetric = table;
    asymmetric.set(row + 1, 2, table.number(row + 1, 2) + 0.01);
    BOOST_TEST(messageOf([&] { isoquant::readProductionModel(asymmetric); }) ==
               "model: row " + std::to_string(row + 3) +
                   ": the covariance block is not symmetric (column 2 differs from row " + std::to_string(row + 2) +
                   ", column 3)");

    auto negative = table; // a covariance of 2 between variances near 0.02 and 0.004: not PSD
    negative.set(row + 2, 3, 2.0);
    negative.set(row + 3, 2, 2.0);
    BOOST_TEST(messageOf([&] { isoquant::readProductionModel(negative); }).rfind(
                   blockPlace + ": the covariance block is not positive semidefinite", 0) == 0u);

    isoquant::CellTable short_(table.rows() - 1, table.columns());
    for (std::size_t r = 0; r + 1 < table.rows(); ++r)
        for (std::size_t c = 0; c < table.columns(); ++c)
            if (!table.isEmpty(r, c)) short_.set(r, c, table.at(r, c));
    BOOST_TEST(messageOf([&] { isoquant::readProductionModel(short_); }) ==
               blockPlace + ": the covariance block has 2 rows; it needs one row per parameter (3) and 3 numbers in each");

    auto wide = table;
    wide.set(row + 1, 4, 1.0);
    BOOST_TEST(messageOf([&] { isoquant::readProductionModel(wide); }) ==
               "model: row " + std::to_string(row + 2) +
                   ": the covariance block has a value in column 5; it needs one row per parameter (3) and 3 numbers "
                   "in each");

    auto text = table;
    text.set(row + 2, 2, "x");
    BOOST_TEST(messageOf([&] { isoquant::readProductionModel(text); }) ==
               "model: row " + std::to_string(row + 3) + " ('L' of the covariance block) needs a number in column 3");

    auto relabelled = table;
    relabelled.set(row + 3, 0, "K");
    BOOST_TEST(messageOf([&] { isoquant::readProductionModel(relabelled); }) ==
               "model: row " + std::to_string(row + 4) +
                   ": the covariance block's row 3 must be 'C', the parameters in the table's order");

    auto noLevel = table;
    noLevel.set(row, 3, 1.5);
    BOOST_TEST(messageOf([&] { isoquant::readProductionModel(noLevel); }) ==
               blockPlace + " (covariance) needs a confidence level between 0 and 1 in its fourth column");
}

// Constant returns imposed (a singular V: the last exponent is 1 minus the others) and fixed effects
// (ln A without a variance: its row and column "n/a") are read back; an elasticity's bounds by
// `what` are then the table's own bounds of that exponent (1e-12 relative, order of evaluation).
BOOST_AUTO_TEST_CASE(singular_and_partly_missing_blocks_are_read_back)
{
    auto imposed = isoquant::testing::cobbDouglas1928Arguments();
    imposed.constantReturns = 1.0;
    auto effects = isoquant::testing::riceFarmsArguments();
    effects.effects = std::string("fixed");
    for (const auto& arguments : {imposed, effects}) {
        const auto fit = isoquant::fitFromArguments(arguments);
        const auto table = tableWithBlock(fit);
        const auto model = isoquant::readProductionModel(table);
        BOOST_REQUIRE(model.parameterCovariance.has_value());
        isoquant::CellTable bundle(1, static_cast<std::size_t>(fit.inputLabels.size()));
        for (std::size_t i = 0; i < bundle.columns(); ++i) bundle.set(0, i, 10.0);
        const double upper =
            isoquant::elasticityColumnWithBounds(table, bundle, 1.0, std::string("upper bound")).number(0, 0);
        BOOST_TEST(std::fabs(upper - fit.inference.upperBounds(1)) <= 1e-12 * std::fabs(fit.inference.upperBounds(1)));
    }
    const auto withEffects = tableWithBlock(isoquant::fitFromArguments(effects));
    BOOST_TEST(withEffects.text(blockRow(withEffects) + 1, 1) == "n/a"); // ln A's variance under effects
}

BOOST_AUTO_TEST_CASE(a_switch_that_is_no_switch_gets_a_message)
{
    const auto fit = fit1928();
    BOOST_TEST(messageOf([&] { isoquant::fitTableWithCovariance(isoquant::fitTable(fit), fit, std::string("yes")); })
                   .rfind("covariance: ", 0) == 0u);
}

BOOST_AUTO_TEST_SUITE_END()
