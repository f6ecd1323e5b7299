// PRODTFP on the rows a PRODFIT table with a trend or group effects was fitted to, and its
// `periods` argument: each row compared with its own period's technology, ln A + λ·(t − t_last).
// Source: "least squares": the residuals of a least-squares fit sum to zero over the rows (normal
// equation of the constant), and within every group under group effects (normal equation of the
// group's dummy; the within estimator gives the same fit), so on the fitted rows the log TFP,
// a residual plus the row's group effect less the row-weighted mean effect, averages 0: the
// geometric mean is 1. Tolerance 1e-12 on the mean of ln TFP: ln Y and the fitted terms are below
// 20 in magnitude, each row's log TFP carries a few units in the last place of 20 (about 4e-15) and
// the least-squares normal equations hold to a few 1e-15 relative; the effects this corrects move
// the mean by 0.01 or more (checked below). Data: an invented, seeded, unbalanced panel.
#include "isoquant/sheet/functions/production_functions.hpp"
#include "isoquant/sheet/tables/fit_table.hpp"
#include "isoquant/sheet/functions/growth_functions.hpp"
#include "cell_tables.hpp"
#include "input_error_message.hpp"

#include <boost/test/unit_test.hpp>

#include <cmath>
#include <random>

using isoquant::CellTable;
using isoquant::testing::columnValuesUnder;
using isoquant::testing::messageOf;
using isoquant::testing::numberRange;

namespace {

constexpr double meanLogTolerance = 1e-12;

// Invented: 12 plants, each observed over its own run of 3 to 10 of the years 2011–2020 (an
// unbalanced panel), ln Y = α_g + 0.55 ln L + 0.35 ln K + 0.03·(t − 2011) + u, α_g uniform on
// [0, 1.5] and the inputs log-uniform over [1, 1000] and correlated with α_g, u ~ N(0, 0.05²).
struct Panel {
    isoquant::FitArguments arguments;
    Eigen::VectorXd years;
    std::vector<Eigen::Index> plantOfRow; // 0 … 11
};

Panel unbalancedPanel(unsigned seed)
{
    std::mt19937 engine(seed);
    std::uniform_real_distribution<double> unit(0.0, 1.0);
    std::uniform_int_distribution<int> length(3, 10);
    std::normal_distribution<double> noise(0.0, 0.05);
    Panel panel;
    std::vector<double> output, labour, capital, years, plants;
    for (int plant = 0; plant < 12; ++plant) {
        const double effect = 1.5 * unit(engine);
        const int span = length(engine);
        const int first = 2011 + std::uniform_int_distribution<int>(0, 10 - span)(engine);
        for (int year = first; year < first + span; ++year) {
            const double logLabour = std::log(1000.0) * unit(engine) + effect;
            const double logCapital = std::log(1000.0) * unit(engine) - effect;
            labour.push_back(std::exp(logLabour));
            capital.push_back(std::exp(logCapital));
            years.push_back(year);
            plants.push_back(plant + 1);
            panel.plantOfRow.push_back(plant);
            output.push_back(
                std::exp(effect + 0.55 * logLabour + 0.35 * logCapital + 0.03 * (year - 2011) + noise(engine)));
        }
    }
    const auto n = static_cast<Eigen::Index>(output.size());
    Eigen::MatrixXd inputs(n, 2);
    for (Eigen::Index row = 0; row < n; ++row) inputs.row(row) << labour[static_cast<std::size_t>(row)], capital[static_cast<std::size_t>(row)];
    panel.years = Eigen::Map<const Eigen::VectorXd>(years.data(), n);
    panel.arguments.output = numberRange(Eigen::Map<const Eigen::VectorXd>(output.data(), n), {"output"});
    panel.arguments.inputs = numberRange(inputs, {"labour", "capital"});
    panel.arguments.groups = numberRange(Eigen::Map<const Eigen::VectorXd>(plants.data(), n), {"plant"});
    panel.arguments.trend = numberRange(panel.years, {"year"});
    return panel;
}

// Mean of ln TFP over the fitted rows, with or without the periods column.
double meanLogProductivity(const isoquant::FitArguments& arguments, const CellTable& periods = {})
{
    const CellTable table = isoquant::fitTable(isoquant::fitFromArguments(arguments));
    // output has a header row, so the column starts with its header cell "TFP"
    return columnValuesUnder(isoquant::productivityColumn(table, arguments.output, arguments.inputs, periods), "TFP")
        .array()
        .log()
        .mean();
}

double tableValue(const CellTable& table, const std::string& label)
{
    for (std::size_t row = 0; row < table.rows(); ++row)
        if (table.isText(row, 0) && table.text(row, 0) == label) return table.number(row, 1);
    throw std::runtime_error("no row " + label);
}

} // namespace

BOOST_AUTO_TEST_SUITE(productivity_periods)

// Pooled fit with a trend: with periods, every row is judged by its own year and the geometric mean
// is 1; without, every row is judged by the latest year's technology, so the mean of ln TFP is
// λ·(mean year − latest year), about −0.1 here (least squares: the residuals average 0).
BOOST_AUTO_TEST_CASE(pooled_trend)
{
    Panel panel = unbalancedPanel(1);
    panel.arguments.groups = CellTable();
    const isoquant::ProductionFit fit = isoquant::fitFromArguments(panel.arguments);
    const double change = fit.panel.technicalChange->estimate;
    BOOST_TEST(std::fabs(meanLogProductivity(panel.arguments, panel.arguments.trend)) <= meanLogTolerance);
    const double withoutPeriods = meanLogProductivity(panel.arguments);
    BOOST_TEST(std::fabs(withoutPeriods - change * (panel.years.mean() - panel.years.maxCoeff())) <= meanLogTolerance);
    BOOST_TEST(withoutPeriods < -0.01);
}

// A pooled fit with a control and constant returns imposed, and a trend: the evaluators take the
// control at its mean (ln A at control means), so the log TFP of a row is its residual plus
// γ·(z − z̄); both average 0 over the fitted rows (least squares with a constant), so with periods
// the geometric mean is 1 again. The control is invented: a rate uniform on [0, 1].
BOOST_AUTO_TEST_CASE(pooled_trend_with_a_control_and_constant_returns)
{
    Panel panel = unbalancedPanel(5);
    panel.arguments.groups = CellTable();
    std::mt19937 engine(6);
    std::uniform_real_distribution<double> rate(0.0, 1.0);
    Eigen::VectorXd control(panel.years.size());
    for (Eigen::Index row = 0; row < control.size(); ++row) control(row) = rate(engine);
    panel.arguments.controls = numberRange(control, {"utilisation"});
    panel.arguments.constantReturns = 1.0; // TRUE() in a cell
    BOOST_TEST(isoquant::fitFromArguments(panel.arguments).returns.imposed);
    BOOST_TEST(std::fabs(meanLogProductivity(panel.arguments, panel.arguments.trend)) <= meanLogTolerance);
}

// Fixed effects on the unbalanced panel, no trend: ln A for predictions is the row-weighted mean of
// the group effects, Σ_g n_g·α_g / n (recomputed here from the fit's effects), so the geometric
// mean is 1 without periods; the plain mean of the effects (the ln A row) differs from it here.
BOOST_AUTO_TEST_CASE(fixed_effects_on_an_unbalanced_panel)
{
    Panel panel = unbalancedPanel(2);
    panel.arguments.trend = CellTable();
    panel.arguments.effects = std::string("fixed");
    const isoquant::ProductionFit fit = isoquant::fitFromArguments(panel.arguments);
    const CellTable table = isoquant::fitTable(fit);
    // Groups are numbered in order of first appearance, which is plant order here.
    double rowWeighted = 0;
    for (const Eigen::Index plant : panel.plantOfRow) rowWeighted += fit.panel.groupEffects(plant);
    rowWeighted /= static_cast<double>(panel.plantOfRow.size());
    BOOST_TEST(std::fabs(tableValue(table, "ln A for predictions") - rowWeighted) <= 1e-12);
    BOOST_TEST(std::fabs(tableValue(table, "ln A") - rowWeighted) > 1e-3);
    BOOST_TEST(std::fabs(meanLogProductivity(panel.arguments)) <= meanLogTolerance);
}

// Fixed effects and a trend on the unbalanced panel: the table's latest period is the last year
// of the trend column, ln A for predictions the row-weighted mean effect moved there by
// λ·(t_last − t_first); with periods the geometric mean is 1, without it is not.
BOOST_AUTO_TEST_CASE(fixed_effects_and_trend)
{
    Panel panel = unbalancedPanel(3);
    panel.arguments.effects = std::string("fixed");
    const isoquant::ProductionFit fit = isoquant::fitFromArguments(panel.arguments);
    const CellTable table = isoquant::fitTable(fit);
    BOOST_TEST(tableValue(table, "latest period") == panel.years.maxCoeff());
    BOOST_TEST(table.rows() == isoquant::fitTableRows(fit));
    BOOST_TEST(std::fabs(meanLogProductivity(panel.arguments, panel.arguments.trend)) <= meanLogTolerance);
    BOOST_TEST(std::fabs(meanLogProductivity(panel.arguments)) > 0.01);
}

// The periods argument is refused, with the argument named, where it cannot apply.
BOOST_AUTO_TEST_CASE(periods_are_refused_where_they_cannot_apply)
{
    Panel panel = unbalancedPanel(4);
    const CellTable& periods = panel.arguments.trend;
    const auto message = [&](const isoquant::FitArguments& arguments, const CellTable& model, const CellTable& column) {
        return messageOf([&] { isoquant::productivityColumn(model, arguments.output, arguments.inputs, column); });
    };
    panel.arguments.effects = std::string("two-way");
    const CellTable twoWay = isoquant::fitTable(isoquant::fitFromArguments(panel.arguments));
    BOOST_TEST(message(panel.arguments, twoWay, periods) ==
               "periods: the model has period effects (\"two-way\"), which its table does not hold; fit a trend "
               "instead, or leave periods out");

    isoquant::FitArguments pooled = panel.arguments;
    pooled.effects = {};
    pooled.groups = CellTable();
    pooled.trend = CellTable();
    const CellTable noTrend = isoquant::fitTable(isoquant::fitFromArguments(pooled));
    BOOST_TEST(message(pooled, noTrend, periods) ==
               "periods: the model has no trend (no \"technical change per period\" row), so every row has the same "
               "technology; leave periods out");

    pooled.trend = periods;
    const CellTable trend = isoquant::fitTable(isoquant::fitFromArguments(pooled));
    CellTable withoutLatest(trend.rows() - 1, trend.columns()); // the last row is "latest period"
    for (std::size_t row = 0; row + 1 < trend.rows(); ++row)
        for (std::size_t column = 0; column < trend.columns(); ++column)
            withoutLatest.set(row, column, trend.at(row, column));
    BOOST_TEST(trend.text(trend.rows() - 1, 0) == "latest period");
    BOOST_TEST(message(pooled, withoutLatest, periods) ==
               "periods: the model has no \"latest period\" row, the period its ln A refers to; refit it with "
               "PRODFIT, or add the row after an empty row");

    const auto n = static_cast<Eigen::Index>(panel.years.size());
    BOOST_TEST(message(pooled, trend, numberRange(panel.years.head(n - 1), {"year"})) ==
               "periods: has " + std::to_string(n - 1) + " rows of data but output has " + std::to_string(n) + " rows");
    BOOST_TEST(message(pooled, trend, numberRange(Eigen::MatrixXd::Ones(n, 2))) ==
               "periods: must be one column; it has 2");
}

BOOST_AUTO_TEST_SUITE_END()
