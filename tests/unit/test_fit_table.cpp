// The PRODFIT table's layout, reading it back as a model, hand-typed models, and PRODSTAT lookups.
// Fits are of the published data sets (sources in tests/data/README.md); what is checked here is
// the layout fit_table.hpp and production_model.hpp document, not the figures themselves.
#include "model_access.hpp"
#include "isoquant/sheet/functions/production_functions.hpp"
#include "isoquant/sheet/tables/fit_table.hpp"
#include "isoquant/sheet/models/production_model.hpp"
#include "cell_tables.hpp"
#include "input_error_message.hpp"
#include "csv_table.hpp"
#include "reference_data.hpp"
#include "test_data.hpp"
#include "relative_error.hpp"

#include <boost/test/unit_test.hpp>

#include <cmath>
#include <numeric>

using isoquant::testing::cobbDouglasOf;

using isoquant::testing::closeTo;
using isoquant::Cell;
using isoquant::CellTable;
using isoquant::testing::messageOf;

namespace {

isoquant::ProductionFit cobbDouglasFit(double constantReturns = 0.0)
{
    auto arguments = isoquant::testing::cobbDouglas1928Arguments();
    arguments.constantReturns = constantReturns;
    return isoquant::fitFromArguments(arguments);
}

isoquant::ProductionFit statePanelFit() { return isoquant::fitFromArguments(isoquant::testing::statePanelArguments()); }

std::string text(const Cell& cell)
{
    return std::holds_alternative<std::string>(cell) ? std::get<std::string>(cell) : "<not text>";
}
double number(const Cell& cell) { return std::holds_alternative<double>(cell) ? std::get<double>(cell) : std::nan(""); }

std::vector<std::string> firstColumn(const CellTable& table)
{
    std::vector<std::string> labels;
    for (std::size_t row = 0; row < table.rows(); ++row)
        labels.push_back(table.isEmpty(row, 0) ? "" : text(table.at(row, 0)));
    return labels;
}

} // namespace

BOOST_AUTO_TEST_SUITE(fit_table)

BOOST_AUTO_TEST_CASE(rows_and_columns_are_as_documented)
{
    BOOST_TEST(isoquant::fitTableRows(2, 0) == 17u); // k + m + 15
    BOOST_TEST(isoquant::fitTableRows(3, 1) == 20u); // k + m + 15 + 1 with controls
    BOOST_TEST(isoquant::fitTableRows(1, 0) == 16u);

    const auto table = isoquant::fitTable(cobbDouglasFit());
    BOOST_TEST(table.rows() == isoquant::fitTableRows(2, 0));
    BOOST_TEST(table.columns() == 7u);
    const std::vector<std::string> header{"Cobb-Douglas fit", "value",       "std. error", "t",
                                          "p-value",          "lower bound", "upper bound"};
    for (std::size_t column = 0; column < 7; ++column) BOOST_TEST(text(table.at(0, column)) == header[column]);

    const std::vector<std::string> labels{"Cobb-Douglas fit", "ln A", "L", "C", "", "observations", "R2", "adjusted R2",
                                          "residual SD", "F (slopes = 0)", "log-likelihood", "AIC", "BIC",
                                          "returns to scale", "verdict", "form", "smearing factor"};
    BOOST_TEST(firstColumn(table) == labels, boost::test_tools::per_element());
    for (std::size_t column = 0; column < 7; ++column) BOOST_TEST(table.isEmpty(4, column));
}

BOOST_AUTO_TEST_CASE(controls_add_their_rows_and_ln_a_at_control_means)
{
    const auto table = isoquant::fitTable(statePanelFit());
    BOOST_TEST(table.rows() == isoquant::fitTableRows(3, 1));
    const std::vector<std::string> labels{
        "Cobb-Douglas fit", "ln A",     "pcap",           "pc",  "emp", "unemp (control)", "", "observations",
        "R2",            "adjusted R2", "residual SD",    "F (slopes = 0)", "log-likelihood", "AIC", "BIC",
        "returns to scale", "verdict",  "form",           "ln A at control means", "smearing factor"};
    BOOST_TEST(firstColumn(table) == labels, boost::test_tools::per_element());
}

// Each parameter row holds value, SE, t, p, lower and upper bound; statistic rows put a value under
// "value" and a test statistic under "t" with its p-value beside it.
BOOST_AUTO_TEST_CASE(cells_hold_the_fit)
{
    const auto fit = cobbDouglasFit();
    const auto table = isoquant::fitTable(fit);
    for (Eigen::Index j = 0; j < 3; ++j) {
        const auto row = static_cast<std::size_t>(1 + j);
        BOOST_TEST(number(table.at(row, 1)) == fit.inference.estimates(j));
        BOOST_TEST(number(table.at(row, 2)) == fit.inference.standardErrors(j));
        BOOST_TEST(number(table.at(row, 3)) == fit.inference.tStatistics(j));
        BOOST_TEST(number(table.at(row, 4)) == fit.inference.pValues(j));
        BOOST_TEST(number(table.at(row, 5)) == fit.inference.lowerBounds(j));
        BOOST_TEST(number(table.at(row, 6)) == fit.inference.upperBounds(j));
    }
    BOOST_TEST(number(table.at(5, 1)) == 24.0);
    BOOST_TEST(number(table.at(6, 1)) == fit.rSquared);
    BOOST_TEST(table.isEmpty(9, 1));
    BOOST_TEST(number(table.at(9, 3)) == fit.summary.fStatistic);
    BOOST_TEST(number(table.at(9, 4)) == fit.summary.fPValue);
    BOOST_TEST(number(table.at(13, 1)) == fit.returns.estimate);
    BOOST_TEST(number(table.at(13, 2)) == fit.returns.standardError);
    BOOST_TEST(number(table.at(13, 3)) == fit.returns.fStatistic);
    BOOST_TEST(number(table.at(13, 4)) == fit.returns.pValue);
    BOOST_TEST(text(table.at(14, 1)) == "constant");
    BOOST_TEST(text(table.at(15, 1)) == "cobb-douglas");
}

BOOST_AUTO_TEST_CASE(imposed_constant_returns_are_marked_in_the_table)
{
    const auto table = isoquant::fitTable(cobbDouglasFit(1.0));
    BOOST_TEST(text(table.at(13, 0)) == "returns to scale");
    BOOST_TEST(number(table.at(13, 1)) == 1.0);
    BOOST_TEST(text(table.at(13, 2)) == "imposed");
    BOOST_TEST(text(table.at(14, 1)) == "constant (imposed)");
}

BOOST_AUTO_TEST_CASE(model_read_from_table_has_the_fitted_technology)
{
    const auto fit = cobbDouglasFit();
    const auto model = isoquant::readProductionModel(isoquant::fitTable(fit));
    BOOST_TEST((model.form == isoquant::ProductionForm::cobbDouglas));
    BOOST_TEST(model.inputLabels == (std::vector<std::string>{"L", "C"}), boost::test_tools::per_element());
    // Cells carry the doubles unchanged, so the round trip is exact.
    BOOST_TEST(cobbDouglasOf(model).logScale == fit.inference.estimates(0));
    BOOST_TEST(cobbDouglasOf(model).exponents(0) == fit.inference.estimates(1));
    BOOST_TEST(cobbDouglasOf(model).exponents(1) == fit.inference.estimates(2));
    BOOST_TEST_REQUIRE(model.scaleTest.has_value());
    BOOST_TEST(model.scaleTest->fStatistic == fit.returns.fStatistic);
    BOOST_TEST(model.scaleTest->pValue == fit.returns.pValue);
    BOOST_TEST(isoquant::returnsVerdict(model, 0.95) == fit.returns.verdict);
    // At level 0.3 the test's α is 0.7 > p = 0.663, so ν = 1.04 counts as increasing.
    BOOST_TEST(isoquant::returnsVerdict(model, 0.3) == "increasing");

    const auto imposed = isoquant::readProductionModel(isoquant::fitTable(cobbDouglasFit(1.0)));
    BOOST_TEST(isoquant::returnsVerdict(imposed, 0.95) == "constant (imposed)");
}

// With controls the evaluators use ln A + Σ cⱼ·mean(zⱼ); the mean of unemp is taken here from the
// data file directly. 1e-12 relative: one product and one sum of 816 terms apart.
BOOST_AUTO_TEST_CASE(model_with_controls_uses_ln_a_at_control_means)
{
    const auto fit = statePanelFit();
    const auto model = isoquant::readProductionModel(isoquant::fitTable(fit));
    BOOST_TEST(model.inputLabels == (std::vector<std::string>{"pcap", "pc", "emp"}), boost::test_tools::per_element());
    BOOST_TEST(cobbDouglasOf(model).exponents.size() == 3);
    for (Eigen::Index i = 0; i < 3; ++i) BOOST_TEST(cobbDouglasOf(model).exponents(i) == fit.inference.estimates(1 + i));
    BOOST_TEST(cobbDouglasOf(model).logScale == fit.logScaleAtControlMeans);

    const auto unemp = isoquant::testing::CsvTable::read(isoquant::testing::dataPath("us_states_produc_1970_1986.csv"))
                           .numbers("unemp");
    const double meanUnemp = std::accumulate(unemp.begin(), unemp.end(), 0.0) / static_cast<double>(unemp.size());
    BOOST_TEST(closeTo(cobbDouglasOf(model).logScale, fit.inference.estimates(0) + fit.inference.estimates(4) * meanUnemp, 1e-12));
}

// form | cobb-douglas; A | 1.01; labour | 0.75; capital | 0.25 — the published 1928 function typed
// by hand. Evaluated at the 1928 inputs; the core works in logs and the check uses pow, so they
// differ by a few roundings of a number of size ~10: 1e-13 relative.
BOOST_AUTO_TEST_CASE(hand_typed_model_works)
{
    const CellTable model = isoquant::testing::typedRange({{std::string("form"), std::string("cobb-douglas")},
                                                          {std::string("A"), 1.01},
                                                          {std::string("labour"), 0.75},
                                                          {std::string("capital"), 0.25}});
    const auto read = isoquant::readProductionModel(model);
    BOOST_TEST(read.inputLabels == (std::vector<std::string>{"labour", "capital"}), boost::test_tools::per_element());
    BOOST_TEST(cobbDouglasOf(read).logScale == std::log(1.01));
    BOOST_TEST(!read.scaleTest.has_value());

    // The 1928 ranges under the model's labels (in another case): each column result starts with a
    // header cell of its own, so that it lines up with the data rows when entered beside them.
    CellTable inputs = isoquant::testing::cobbDouglas1928Arguments().inputs;
    inputs.set(0, 0, "Labour");
    inputs.set(0, 1, "CAPITAL");
    using isoquant::testing::columnValuesUnder;
    const Eigen::VectorXd output = columnValuesUnder(isoquant::outputColumn(model, inputs), "output");
    const Eigen::VectorXd labourProduct = columnValuesUnder(
        isoquant::marginalProductColumn(model, inputs, std::string("Labour")), "marginal product of labour");
    const Eigen::VectorXd capitalProduct =
        columnValuesUnder(isoquant::marginalProductColumn(model, inputs, 2.0), "marginal product of capital");
    const Eigen::VectorXd elasticity = columnValuesUnder(
        isoquant::elasticityColumn(model, inputs, std::string("capital")), "output elasticity of capital");
    BOOST_TEST_REQUIRE(output.size() == 24);
    for (std::size_t row = 1; row < inputs.rows(); ++row) {
        const double labour = inputs.number(row, 0);
        const double capital = inputs.number(row, 1);
        const double expected = 1.01 * std::pow(labour, 0.75) * std::pow(capital, 0.25);
        const auto i = static_cast<Eigen::Index>(row - 1);
        BOOST_TEST(closeTo(output(i), expected, 1e-13));
        BOOST_TEST(closeTo(labourProduct(i), 0.75 * expected / labour, 1e-13));
        BOOST_TEST(closeTo(capitalProduct(i), 0.25 * expected / capital, 1e-13));
        BOOST_TEST(elasticity(i) == 0.25);
    }
    BOOST_TEST(number(isoquant::scaleColumn(model, CellTable()).at(0, 0)) == 1.0);
    // No test in a typed model: the verdict follows ν = 0.75 + 0.25 = 1 alone.
    BOOST_TEST(isoquant::returnsVerdictCell(model, Cell{}) == "constant");
}

// Input labels come from the user's header row and may be words the table itself uses ("A" for
// land area is natural). A table the core writes must read back as the same technology; a label
// it cannot carry must be refused when fitting (an InputError naming inputs), never misread later.
// Each label has one expected outcome: an empty refusal means it round trips.
BOOST_AUTO_TEST_CASE(round_trip_holds_whatever_the_input_labels)
{
    const std::pair<const char*, const char*> cases[] = {
        {"A", ""},
        {"r2", ""},
        {"land (control)", "inputs: column 2 is labelled 'land (control)'; the ending \"(control)\" marks controls "
                           "in the table, so rename it"},
        {"Form", ""},
    };
    for (const auto& labelCase : cases) {
        const std::string label = labelCase.first, refusal = labelCase.second; // a lambda below uses label
        BOOST_TEST_CONTEXT("input labelled '" << label << "'")
        {
            auto arguments = isoquant::testing::cobbDouglas1928Arguments();
            arguments.inputs.set(0, 1, std::string(label));
            const std::string fitMessage = messageOf([&] { isoquant::fitFromArguments(arguments); });
            if (!refusal.empty()) {
                BOOST_TEST(fitMessage == refusal);
                continue;
            }
            BOOST_TEST_REQUIRE(fitMessage == "<no InputError>");
            const auto fit = isoquant::fitFromArguments(arguments);
            const std::string message = messageOf([&] {
                const auto model = isoquant::readProductionModel(isoquant::fitTable(fit));
                BOOST_TEST(model.inputLabels.size() == 2u);
                BOOST_TEST(model.inputLabels.at(1) == label);
                BOOST_TEST(cobbDouglasOf(model).logScale == fit.inference.estimates(0));
                BOOST_TEST(cobbDouglasOf(model).exponents == fit.inference.estimates.tail(2), boost::test_tools::per_element());
            });
            BOOST_TEST(message == "<no InputError>");
        }
    }
}

BOOST_AUTO_TEST_CASE(lookups_find_rows_and_columns)
{
    const auto fit = statePanelFit();
    const auto table = isoquant::fitTable(fit);
    const Cell none;
    const auto look = [&](const std::string& row, const Cell& column) {
        return isoquant::lookUpFitTable(table, row, column);
    };
    BOOST_TEST(number(look("r2", none)) == fit.rSquared);
    BOOST_TEST(number(look("LN A", none)) == fit.inference.estimates(0));
    BOOST_TEST(number(look("PC", std::string("Std. Error"))) == fit.inference.standardErrors(2));
    BOOST_TEST(number(look("emp", std::string("UPPER BOUND"))) == fit.inference.upperBounds(3));
    // A control answers to its label with or without " (control)".
    BOOST_TEST(number(look("unemp", none)) == fit.inference.estimates(4));
    BOOST_TEST(number(look("Unemp (Control)", std::string("p-value"))) == fit.inference.pValues(4));
    // "F" is "F (slopes = 0)"; a row holding only a test statistic answers with it by default.
    BOOST_TEST(number(look("F", none)) == fit.summary.fStatistic);
    BOOST_TEST(number(look("f", std::string("p-value"))) == fit.summary.fPValue);
    BOOST_TEST(number(look("F (slopes = 0)", none)) == fit.summary.fStatistic);
    BOOST_TEST(number(look("returns to scale", std::string("t"))) == fit.returns.fStatistic);
    BOOST_TEST(text(look("Verdict", none)) == "increasing");
    BOOST_TEST(number(look("ln A at control means", none)) == fit.logScaleAtControlMeans);

    // Surrounding spaces (also a no-break space) do not count; "R²" is "R2".
    BOOST_TEST(number(look(" r2  ", none)) == fit.rSquared);
    BOOST_TEST(number(look("R\u00b2", none)) == fit.rSquared);
    BOOST_TEST(number(look("adjusted R\u00b2\u00a0", none)) == fit.adjustedRSquared);
    BOOST_TEST(number(look("pc", std::string(" p-value "))) == fit.inference.pValues(2));

    BOOST_TEST(messageOf([&] { look("capital", none); }) ==
               "row label: 'capital' is not a row of the table; its rows are 'ln A', 'pcap', 'pc', 'emp', "
               "'unemp (control)', 'observations', 'R2', 'adjusted R2', 'residual SD', 'F (slopes = 0)', "
               "'log-likelihood', 'AIC', 'BIC', 'returns to scale', 'verdict', 'form', 'ln A at control means', "
               "'smearing factor'");
    BOOST_TEST(messageOf([&] { look("pcap", std::string("se")); }) ==
               "column label: 'se' is not a column; use value, std. error, t, p-value, lower bound or upper bound");
    BOOST_TEST(messageOf([&] { isoquant::lookUpFitTable(table, 2.0, none); }) ==
               "row label: give the label of a row of the table, such as \"R2\" or an input's label");
    BOOST_TEST(messageOf([&] { look("pcap", 3.0); }) == "column label: give a column's label, such as \"p-value\"");
}

// PRODVALUE reads the table as the sheet holds it: the same answers as PRODSTAT's lookup for every
// row and column of a fitted table, and column words from the table's own header row.
BOOST_AUTO_TEST_CASE(table_values_match_the_lookup_and_read_any_header)
{
    const auto table = isoquant::fitTable(statePanelFit());
    const Cell none;
    for (std::size_t row = 1; row < table.rows(); ++row) {
        if (!table.isText(row, 0) || table.text(row, 0).empty()) continue;
        const Cell label = table.at(row, 0);
        BOOST_TEST((isoquant::tableValue(table, label, none) == isoquant::lookUpFitTable(table, label, none)));
        for (std::size_t column = 1; column < table.columns(); ++column)
            BOOST_TEST((isoquant::tableValue(table, label, table.at(0, column)) == table.at(row, column)));
    }

    CellTable other(2, 3);
    other.set(0, 0, std::string("price test"));
    other.set(0, 1, std::string("chi-squared"));
    other.set(0, 2, std::string("p"));
    other.set(1, 0, std::string("shift"));
    other.set(1, 1, 4.5);
    other.set(1, 2, 0.03);
    BOOST_TEST((isoquant::tableValue(other, std::string(" Shift "), std::string("P")) == Cell(0.03)));
    BOOST_TEST(messageOf([&] { isoquant::tableValue(other, std::string("shift"), std::string("value")); }) ==
               "column label: 'value' is not a column of the table; its columns are 'chi-squared', 'p'");

    CellTable headless(2, 2);
    headless.set(0, 0, 1.0);
    BOOST_TEST(messageOf([&] { isoquant::tableValue(headless, std::string("R2"), none); }) ==
               "table: give the whole table, its header row included (such as $I$1:$O$17 for a PRODFIT of two "
               "inputs)");
    BOOST_TEST(messageOf([&] { isoquant::tableValue(table, 2.0, std::string("t")); }) ==
               "row label: give the label of a row of the table, such as \"R2\" or an input's label");
}

BOOST_AUTO_TEST_SUITE_END()
