// Properties of the estimation options on invented seeded data (a trend recovered, group effects
// recovered) and checks against formulas: Duan's smearing factor as the mean of exp(residual) on
// Cobb & Douglas (1928) (tests/data/README.md), and dropping incomplete rows.
#include "isoquant/sheet/functions/production_functions.hpp"
#include "isoquant/sheet/tables/fit_table.hpp"
#include "isoquant/math/messages/text.hpp"
#include "cell_tables.hpp"
#include "input_error_message.hpp"
#include "reference_data.hpp"

#include <boost/test/unit_test.hpp>

#include <cmath>
#include <random>

using isoquant::testing::messageOf;
using isoquant::testing::numberRange;

namespace {

// Invented: 30 plants × 8 years (2015–2022), ln Y = α_g + 0.6 ln L + 0.3 ln K + 0.02·(t − 2015) + u,
// α_g uniform on [0, 1], inputs log-uniform over [1, 1000] and correlated with α_g, u ~ N(0, 0.05²).
struct PlantPanel {
    isoquant::FitArguments arguments;
    Eigen::VectorXd plantEffects;
};

PlantPanel plantPanel(unsigned seed)
{
    std::mt19937 engine(seed);
    std::uniform_real_distribution<double> unit(0.0, 1.0);
    std::normal_distribution<double> noise(0.0, 0.05);
    const int plants = 30, years = 8, n = plants * years;
    PlantPanel panel;
    panel.plantEffects.resize(plants);
    Eigen::MatrixXd output(n, 1), inputs(n, 2), periods(n, 1), groups(n, 1);
    for (int g = 0; g < plants; ++g) {
        panel.plantEffects(g) = unit(engine);
        for (int t = 0; t < years; ++t) {
            const int row = g * years + t;
            const double logLabour = std::log(1000.0) * unit(engine) + panel.plantEffects(g);
            const double logCapital = std::log(1000.0) * unit(engine) - panel.plantEffects(g);
            inputs(row, 0) = std::exp(logLabour);
            inputs(row, 1) = std::exp(logCapital);
            periods(row, 0) = 2015 + t;
            groups(row, 0) = 100 + g;
            output(row, 0) = std::exp(panel.plantEffects(g) + 0.6 * logLabour + 0.3 * logCapital + 0.02 * t + noise(engine));
        }
    }
    panel.arguments.output = numberRange(output, {"output"});
    panel.arguments.inputs = numberRange(inputs, {"labour", "capital"});
    panel.arguments.groups = numberRange(groups, {"plant"});
    panel.arguments.trend = numberRange(periods, {"year"});
    panel.arguments.effects = std::string("fixed");
    return panel;
}

} // namespace

BOOST_AUTO_TEST_SUITE(panel_options)

// Property (invented, seeded): the trend and the exponents come back within 3 standard errors
// (a 3-SE band fails about 0.3% of the time for a correct estimator: common practice, no source),
// and the plant effects within 0.1 of the truth (their sampling SD is about 0.05/√8 ≈ 0.018 plus
// the slopes' share).
BOOST_AUTO_TEST_CASE(trend_and_effects_are_recovered)
{
    for (const unsigned seed : {11u, 12u, 13u}) {
        const auto panel = plantPanel(seed);
        const auto fit = isoquant::fitFromArguments(panel.arguments);
        BOOST_TEST_REQUIRE(fit.panel.technicalChange.has_value());
        const auto& change = *fit.panel.technicalChange;
        BOOST_TEST(std::fabs(change.estimate - 0.02) <= 3 * change.standardError, "seed " << seed << ": " << change.estimate);
        BOOST_TEST(std::fabs(fit.inference.estimates(1) - 0.6) <= 3 * fit.inference.standardErrors(1), "seed " << seed);
        BOOST_TEST(std::fabs(fit.inference.estimates(2) - 0.3) <= 3 * fit.inference.standardErrors(2), "seed " << seed);
        BOOST_TEST((fit.panel.groupEffects - panel.plantEffects).cwiseAbs().maxCoeff() <= 0.1, "seed " << seed);
        // ln A for predictions: the mean plant effect moved to 2022 by 7 years of the trend.
        BOOST_TEST(std::fabs(fit.panel.logScaleForPredictions - (fit.panel.groupEffects.mean() + 7 * change.estimate)) <=
                   1e-12);
    }
}

// Formula (Duan 1983, as in the header): smearing factor = mean of exp(ln P − fitted ln P), the
// residuals recomputed here from the table's estimates on Cobb & Douglas (1928); 1e-12 relative
// (24 terms, rounding only).
BOOST_AUTO_TEST_CASE(smearing_factor_is_mean_of_exp_residual)
{
    const auto arguments = isoquant::testing::cobbDouglas1928Arguments();
    const auto fit = isoquant::fitFromArguments(arguments);
    double sum = 0;
    for (std::size_t row = 1; row < arguments.output.rows(); ++row) {
        const double fitted = fit.inference.estimates(0) + fit.inference.estimates(1) * std::log(arguments.inputs.number(row, 0)) +
                              fit.inference.estimates(2) * std::log(arguments.inputs.number(row, 1));
        sum += std::exp(std::log(arguments.output.number(row, 0)) - fitted);
    }
    const double expected = sum / 24.0;
    BOOST_TEST(std::fabs(fit.smearingFactor - expected) <= 1e-12 * expected);
    BOOST_TEST(fit.smearingFactor > 1.0); // Jensen: the mean of exp(u) exceeds exp(mean u) = 1
}

BOOST_AUTO_TEST_CASE(incomplete_rows_are_dropped_only_when_asked)
{
    auto arguments = isoquant::testing::cobbDouglas1928Arguments();
    arguments.inputs.set(5, 1, std::string("missing"));
    arguments.output.set(9, 0, isoquant::Cell{});
    BOOST_TEST(messageOf([&] { isoquant::fitFromArguments(arguments); }) ==
               "output: row 10 is empty; every cell must hold a number");
    arguments.incompleteRows = 1.0;
    const auto fit = isoquant::fitFromArguments(arguments);
    BOOST_TEST(fit.panel.incompleteRowsDropped == 2);
    BOOST_TEST(fit.summary.observations == 22);
    // A zero is not missing: it is still an error, at its own row.
    arguments.inputs.set(7, 0, 0.0);
    BOOST_TEST(messageOf([&] { isoquant::fitFromArguments(arguments); }) ==
               "inputs: row 8, column 1 is 0; logs need positive values");
}

BOOST_AUTO_TEST_CASE(panel_arguments_are_checked)
{
    auto panel = plantPanel(11);
    auto arguments = panel.arguments;
    arguments.trend = {};
    arguments.effects = std::string("two-way");
    BOOST_TEST(messageOf([&] { isoquant::fitFromArguments(arguments); }) ==
               "effects: \"two-way\" needs the trend argument, the column of periods (years)");
    arguments = panel.arguments;
    arguments.groups.set(3, 0, isoquant::Cell{});
    BOOST_TEST(messageOf([&] { isoquant::fitFromArguments(arguments); }) ==
               "groups: row 4 is empty; every row needs the identifier of its plant or firm");
    // An input that is constant within every plant cannot be told apart from the plant effects.
    arguments = panel.arguments;
    for (std::size_t row = 1; row < arguments.inputs.rows(); ++row)
        arguments.inputs.set(row, 1, arguments.groups.number(row, 0));
    BOOST_TEST(messageOf([&] { isoquant::fitFromArguments(arguments); }) ==
               "inputs: 'capital' does not vary within any group, so it cannot be told apart from the group effects");
}

// Whole columns (B:B): rows empty in every range below the data end it, so the fit is the one on
// the exact range (Cobb & Douglas (1928), tests/data/README.md), equal to the last bit; a blank row
// inside the data still needs the switch.
BOOST_AUTO_TEST_CASE(whole_columns_end_at_their_last_value)
{
    const auto exact = isoquant::testing::cobbDouglas1928Arguments();
    auto whole = exact;
    const std::size_t rows = 1000; // 25 rows of data and header, then an empty tail
    for (isoquant::CellTable* range : {&whole.output, &whole.inputs}) {
        isoquant::CellTable longer(rows, range->columns());
        for (std::size_t row = 0; row < range->rows(); ++row)
            for (std::size_t column = 0; column < range->columns(); ++column) longer.set(row, column, range->at(row, column));
        *range = longer;
    }
    const auto cut = isoquant::withoutTrailingEmptyRows(whole);
    BOOST_TEST(cut.output.rows() == exact.output.rows());
    BOOST_TEST((cut.inputs == exact.inputs));
    const auto fromWhole = isoquant::fitFromArguments(whole);
    const auto fromExact = isoquant::fitFromArguments(exact);
    BOOST_TEST((fromWhole.inference.estimates == fromExact.inference.estimates));
    BOOST_TEST(fromWhole.summary.observations == 24);
    // A blank row inside the data is not a tail.
    whole.output.setEmpty(9, 0);
    whole.inputs.setEmpty(9, 0);
    whole.inputs.setEmpty(9, 1);
    BOOST_TEST(messageOf([&] { isoquant::fitFromArguments(whole); }) ==
               "output: row 10 is empty; every cell must hold a number");
    // Ranges of different heights are not cut: the shape check names them.
    auto uneven = exact;
    uneven.inputs = whole.inputs;
    BOOST_TEST(isoquant::withoutTrailingEmptyRows(uneven).inputs.rows() == rows);
}

// A trend of dates (Calc's day counts, year-ends 31 Dec 2015…2022 = 42369…44926) gives λ per day:
// the form row says so. Years and periods 1, 2, … get no such note, nor do dates a day apart.
BOOST_AUTO_TEST_CASE(a_trend_of_dates_is_noted_on_the_form_row)
{
    auto panel = plantPanel(11);
    const auto byYear = isoquant::fitFromArguments(panel.arguments);
    BOOST_TEST(!byYear.panel.trendLooksLikeDates);
    const double yearEnds[] = {42369, 42735, 43100, 43465, 43830, 44196, 44561, 44926};
    for (std::size_t row = 1; row < panel.arguments.trend.rows(); ++row)
        panel.arguments.trend.set(row, 0, yearEnds[static_cast<int>(panel.arguments.trend.number(row, 0)) - 2015]);
    const auto byDate = isoquant::fitFromArguments(panel.arguments);
    BOOST_TEST(byDate.panel.trendLooksLikeDates);
    const auto table = isoquant::fitTable(byDate);
    std::size_t formRow = 0;
    while (formRow < table.rows() && !(table.isText(formRow, 0) && table.text(formRow, 0) == "form")) ++formRow;
    BOOST_TEST_REQUIRE((formRow < table.rows() && table.isText(formRow, 2)));
    BOOST_TEST(table.text(formRow, 2) ==
               "note: the trend counts days (dates?), so technical change is per day; for years use =YEAR(date)");
    BOOST_TEST(!isoquant::trendCountsDays(Eigen::Vector3d(44926, 44927, 44928)));
    BOOST_TEST(!isoquant::trendCountsDays(Eigen::Vector3d(1, 2, 3)));
    BOOST_TEST(isoquant::trendCountsDays(Eigen::Vector3d(44926, 44957, 44985))); // month-ends, 28 days apart at least
}

BOOST_AUTO_TEST_SUITE_END()
