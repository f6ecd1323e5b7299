// The evaluators' ln A under group effects ("fixed", "two-way") and PRODTFP with periods (issue 20:
// the covariance block's rows "ln A for predictions" and "technical change per period"), against
// python3-statsmodels OLS of the explicit dummy-variable regression (one dummy per state, and per
// year under two-way effects; classical, HC1, HC3 and cluster errors) recomputed at test time by
// tests/reference/effects_bounds_check.py on Munnell's (1990) US state panel (tests/data/README.md),
// balanced and unbalanced, with and without constant returns imposed: the evaluators' ln A s and its
// standard error, λ's standard error and Cov(λ, s) from the block, PRODOUTPUT's and PRODTFP's (with
// periods) standard errors and bounds at three invented bundles.
//
// Tolerance: 1e-7 relative on every figure (the issue's). The within estimator and the
// dummy-variable regression are two computations of the same fit, agreeing to about 1e-10; a
// missing term of Var(s) (σ²/n, or the covariance of the group means with b) is off by far more.
//
// CTest runs the script first (test effects_bounds_figures) and passes the file it wrote in the
// environment variable ISOQUANT_EFFECTS_BOUNDS_FIGURES; without that file this test is skipped.
#include "isoquant/sheet/functions/bound_functions.hpp"
#include "isoquant/sheet/functions/production_functions.hpp"
#include "covariance_tables.hpp"
#include "reference_data.hpp"
#include "reference_figures.hpp"
#include "relative_error.hpp"

#include <boost/test/unit_test.hpp>

#include <array>
#include <cmath>
#include <map>

namespace {

boost::test_tools::assertion_result figuresAvailable(boost::unit_test::test_unit_id)
{
    return isoquant::testing::referenceFiguresAvailable("ISOQUANT_EFFECTS_BOUNDS_FIGURES",
                                                        "statsmodels effects bounds figures");
}

// effects_bounds_check.py's BUNDLES (pcap, pc, emp), OBSERVED and PERIODS, numbered alike.
constexpr std::array<std::array<double, 3>, 3> bundles{
    {{15000.0, 35000.0, 1000.0}, {25000.0, 60000.0, 2000.0}, {8000.0, 20000.0, 500.0}}};
constexpr std::array<double, 3> observed{35000.0, 60000.0, 15000.0};
constexpr std::array<double, 3> periods{1975.0, 1980.0, 1986.0};

// The range without its data rows 1 … `dropped` (row 0 the header).
isoquant::CellTable withoutFirstRows(const isoquant::CellTable& range, std::size_t dropped)
{
    isoquant::CellTable kept(range.rows() - dropped, range.columns());
    for (std::size_t row = 0; row < kept.rows(); ++row)
        for (std::size_t column = 0; column < range.columns(); ++column)
            kept.set(row, column, range.at(row == 0 ? 0 : row + dropped, column));
    return kept;
}

// The script's model ("fixed_trend", "two_way", "trend", "fixed_unbalanced", "fixed_constant_returns")
// with `errors`, as PRODFIT's table with covariance TRUE: groups state, the control unemp, the trend
// (or periods) year.
isoquant::CellTable tableOf(const std::string& model, const std::string& errors)
{
    auto arguments = isoquant::testing::statePanelWithPanelColumns(); // the control unemp included
    if (model == "fixed_unbalanced") {
        constexpr std::size_t dropped = 100; // the script's DROPPED
        for (auto* range : {&arguments.output, &arguments.inputs, &arguments.controls, &arguments.groups, &arguments.trend})
            *range = withoutFirstRows(*range, dropped);
    }
    if (model == "fixed_constant_returns") arguments.constantReturns = 1.0; // TRUE
    if (model != "trend" && model != "two_way") arguments.effects = std::string("fixed");
    if (model == "two_way") arguments.effects = std::string("two-way");
    arguments.errors = errors;
    return isoquant::testing::tableWithBlock(isoquant::fitFromArguments(arguments));
}

// Column 2 of the table's row labelled `label`.
double valueInTable(const isoquant::CellTable& table, const std::string& label)
{
    for (std::size_t row = 0; row < table.rows(); ++row)
        if (table.isText(row, 0) && table.text(row, 0) == label) return table.number(row, 1);
    throw std::runtime_error("no row " + label);
}

// The block's entry in the rows labelled `row` and `column`.
double blockEntry(const isoquant::CellTable& table, const std::string& row, const std::string& column)
{
    const std::size_t header = isoquant::testing::blockRow(table);
    std::size_t rowIndex = 0, columnIndex = 0;
    for (std::size_t r = header + 1; r < table.rows(); ++r) {
        if (table.text(r, 0) == row) rowIndex = r;
        if (table.text(r, 0) == column) columnIndex = r - header;
    }
    return table.number(rowIndex, columnIndex);
}

double coreFigure(const isoquant::CellTable& table, const std::string& quantity, std::size_t bundle)
{
    if (quantity == "scale_value") return valueInTable(table, "ln A for predictions");
    if (quantity == "scale_se") return std::sqrt(blockEntry(table, "ln A for predictions", "ln A for predictions"));
    if (quantity == "trend_se")
        return std::sqrt(blockEntry(table, "technical change per period", "technical change per period"));
    if (quantity == "trend_scale_cov") return blockEntry(table, "technical change per period", "ln A for predictions");
    const isoquant::ModelTable model(table);
    isoquant::CellTable inputs(1, 3);
    for (std::size_t column = 0; column < 3; ++column) inputs.set(0, column, bundles[bundle][column]);
    const std::map<std::string, std::string> words{{"se", "std. error"}, {"lower", "lower bound"}, {"upper", "upper bound"}};
    const auto split = quantity.rfind('_');
    const std::string name = quantity.substr(0, split), word = words.at(quantity.substr(split + 1));
    if (name == "output") return isoquant::outputColumnWithBounds(model, inputs, {}, word).number(0, 0);
    if (name == "tfp_period")
        return isoquant::productivityColumnWithBounds(model, isoquant::singleCell(observed[bundle]), inputs,
                                                      isoquant::singleCell(periods[bundle]), word)
            .number(0, 0);
    throw std::runtime_error("unknown quantity " + quantity);
}

} // namespace

BOOST_AUTO_TEST_SUITE(effects_bounds_cross_check)

BOOST_AUTO_TEST_CASE(bounds_under_effects_and_with_periods_agree_with_the_dummy_variable_regression,
                     *boost::unit_test::precondition(figuresAvailable))
{
    const auto rows = isoquant::testing::readReferenceRows(
        isoquant::testing::referenceFiguresPath("ISOQUANT_EFFECTS_BOUNDS_FIGURES"));
    // Trend models (4 kinds fixed_trend, 2 trend, 2 fixed_unbalanced, 2 fixed_constant_returns) ×
    // (4 + 3 bundles × 6); two_way 3 kinds × (2 + 3 × 3).
    BOOST_TEST_REQUIRE(rows.size() == 10u * (4u + 18u) + 3u * (2u + 9u));
    std::map<std::string, isoquant::CellTable> tables;
    for (const auto& fields : rows) {
        const std::string key = fields.at(0) + " " + fields.at(1);
        if (!tables.count(key)) tables.emplace(key, tableOf(fields.at(0), fields.at(1)));
        const double expected = std::stod(fields.at(4));
        const double core = coreFigure(tables.at(key), fields.at(2), std::stoul(fields.at(3)));
        BOOST_TEST_CONTEXT(key << " " << fields.at(2) << " at bundle " << fields.at(3))
        BOOST_TEST(isoquant::testing::closeTo(core, expected, 1e-7), core << " against " << expected);
    }
}

BOOST_AUTO_TEST_SUITE_END()
