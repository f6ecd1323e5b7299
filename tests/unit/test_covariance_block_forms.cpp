// The covariance block of the translog and ces tables (issue 20, covariance_block.hpp): its size
// (the formulas there), its labels in the table's parameter order, the fit's own covariance cell for
// cell (exact: cells hold doubles), and the round trip through the model reader and PRODVALUE.
// Data: Cobb & Douglas (1928) and the Munnell (1990) state panel with its control (tests/data,
// sources in tests/data/README.md).
#include "isoquant/sheet/functions/production_functions.hpp"
#include "isoquant/sheet/models/production_model.hpp"
#include "isoquant/sheet/tables/covariance_block.hpp"
#include "isoquant/sheet/tables/fit_table.hpp"
#include "isoquant/sheet/tables/form_tables.hpp"
#include "covariance_tables.hpp"
#include "input_error_message.hpp"
#include "reference_data.hpp"

#include <boost/test/unit_test.hpp>

#include <cmath>

using isoquant::testing::blockRow;
using isoquant::testing::messageOf;
using isoquant::testing::tableWithBlock;

namespace {

isoquant::ProductionFit fitOf(isoquant::FitArguments arguments, const std::string& form, isoquant::Cell errors = {})
{
    arguments.form = form;
    arguments.errors = std::move(errors);
    return isoquant::fitFromArguments(arguments);
}

// The block below `row` holds `labels` and the fit's covariance exactly; the model reader returns it.
void checkBlock(const isoquant::CellTable& table, const isoquant::ProductionFit& fit,
                const std::vector<std::string>& labels)
{
    const std::size_t row = blockRow(table);
    const auto p = static_cast<Eigen::Index>(labels.size());
    const Eigen::MatrixXd covariance = isoquant::testing::blockMatrixOf(fit);
    BOOST_TEST_REQUIRE(covariance.rows() == p);
    BOOST_TEST(table.rows() == row + 1 + labels.size());
    BOOST_TEST(table.columns() == std::max<std::size_t>(7, labels.size() + 1));
    for (Eigen::Index i = 0; i < p; ++i) {
        BOOST_TEST(table.text(row + 1 + static_cast<std::size_t>(i), 0) == labels[static_cast<std::size_t>(i)]);
        for (Eigen::Index j = 0; j < p; ++j)
            BOOST_TEST(table.number(row + 1 + static_cast<std::size_t>(i), 1 + static_cast<std::size_t>(j)) ==
                       covariance(i, j));
    }
    const auto model = isoquant::readProductionModel(table);
    BOOST_REQUIRE(model.parameterCovariance.has_value());
    BOOST_TEST((model.parameterCovariance->matrix == covariance));
    BOOST_TEST(model.parameterCovariance->labels == labels, boost::test_tools::per_element());
    BOOST_TEST(model.parameterCovariance->degreesOfFreedom == fit.inference.degreesOfFreedom);
}

} // namespace

BOOST_AUTO_TEST_SUITE(covariance_block_forms)

BOOST_AUTO_TEST_CASE(translog_block_of_two_inputs)
{
    const auto fit = fitOf(isoquant::testing::cobbDouglas1928Arguments(), "translog");
    const auto table = tableWithBlock(fit);
    // 23 rows (form_tables.hpp) and 1 + p = 7 more; p = 1 + 2 + 3 = 6, so max(7, 7) = 7 columns.
    BOOST_TEST(isoquant::translogFitTableRows(2, 0) == 23u);
    BOOST_TEST(blockRow(table) == 23u);
    BOOST_TEST(table.rows() == 30u);
    checkBlock(table, fit, {"ln A", "L", "C", "L*L", "L*C", "C*C"});
    BOOST_TEST(table.number(23, 2) == 24.0 - 6.0); // n − p
    // PRODVALUE reads the table's own rows, above the block, and the evaluators use the table as before.
    BOOST_TEST(std::get<double>(isoquant::tableValue(table, std::string("L*C"), std::string("std. error"))) ==
               fit.inference.standardErrors(4));
    isoquant::CellTable bundle(1, 2);
    bundle.set(0, 0, 150.0);
    bundle.set(0, 1, 200.0);
    BOOST_TEST(isoquant::outputColumn(table, bundle).number(0, 0) ==
               isoquant::outputColumn(isoquant::fitTable(fit), bundle).number(0, 0));
}

BOOST_AUTO_TEST_CASE(translog_block_with_a_control_is_wider_than_the_table)
{
    const auto fit = fitOf(isoquant::testing::statePanelArguments(), "translog", std::string("hc1"));
    const auto table = tableWithBlock(fit);
    // 3 inputs, 1 control: p = 1 + 3 + 6 + 1 = 11, and the control adds the row of the evaluators'
    // ln A: q = 12 parameter rows, so 13 columns; the header names columns 8 to 13.
    checkBlock(table, fit,
               {"ln A", "pcap", "pc", "emp", "pcap*pcap", "pcap*pc", "pcap*emp", "pc*pc", "pc*emp", "emp*emp",
                "unemp (control)", "ln A at control means"});
    BOOST_TEST(table.text(0, 7) == "pcap*emp"); // column 8 holds the covariances of parameter 7
    BOOST_TEST(table.text(0, 11) == "unemp (control)");
    BOOST_TEST(table.text(0, 12) == "ln A at control means");
    BOOST_TEST(table.text(blockRow(table), 1) == "hc1");
    BOOST_TEST(std::get<double>(isoquant::tableValue(table, std::string("R2"), std::string("value"))) ==
               fit.rSquared);
}

BOOST_AUTO_TEST_CASE(ces_block_holds_its_own_inference)
{
    const auto fit = fitOf(isoquant::testing::cobbDouglas1928Arguments(), "ces");
    BOOST_TEST_REQUIRE(fit.status.is(isoquant::FitStatusKind::ok));
    const auto table = tableWithBlock(fit);
    // 20 rows and 1 + 4 more, 7 columns.
    BOOST_TEST(blockRow(table) == isoquant::cesFitTableRows());
    BOOST_TEST(table.rows() == 25u);
    checkBlock(table, fit, {"ln A", "delta", "rho", "nu"});
    // The block's diagonal is the square of the table's standard errors (1e-12 relative: a square root).
    for (std::size_t i = 0; i < 4; ++i) {
        const double error = table.number(1 + i, 2), variance = table.number(21 + i, 1 + i);
        BOOST_TEST(std::fabs(std::sqrt(variance) - error) <= 1e-12 * error);
    }
    BOOST_TEST(table.text(20, 1) == "classical");
    BOOST_TEST(std::get<double>(isoquant::tableValue(table, std::string("nu"), std::string("value"))) ==
               fit.inference.estimates(3));
}

BOOST_AUTO_TEST_CASE(translog_block_of_the_wrong_size_gets_a_message)
{
    const auto translog = tableWithBlock(fitOf(isoquant::testing::cobbDouglas1928Arguments(), "translog"));
    const std::size_t row = blockRow(translog);
    // A Cobb-Douglas block (3 parameters) typed under the translog table: the rows below the
    // third cleared.
    auto cobbDouglasSized = translog;
    for (std::size_t r = row + 4; r < translog.rows(); ++r)
        for (std::size_t c = 0; c < translog.columns(); ++c) cobbDouglasSized.set(r, c, isoquant::Cell{});
    BOOST_TEST(messageOf([&] { isoquant::readProductionModel(cobbDouglasSized); }) ==
               "model: row 24: the covariance block has 3 rows; it needs one row per parameter (6) and 6 numbers in "
               "each");
    // The pairs labelled in another order than the table's.
    auto swapped = translog;
    swapped.set(row + 5, 0, "C*L");
    BOOST_TEST(messageOf([&] { isoquant::readProductionModel(swapped); }) ==
               "model: row 29: the covariance block's row 5 must be 'L*C', the parameters in the table's order");
    // A ces table whose block lost its column for nu.
    auto ces = tableWithBlock(fitOf(isoquant::testing::cobbDouglas1928Arguments(), "ces"));
    for (std::size_t r = 21; r < 25; ++r) ces.set(r, 4, isoquant::Cell{});
    BOOST_TEST(messageOf([&] { isoquant::readProductionModel(ces); }) ==
               "model: row 22 ('ln A' of the covariance block) needs a number in column 5");
}

BOOST_AUTO_TEST_SUITE_END()
