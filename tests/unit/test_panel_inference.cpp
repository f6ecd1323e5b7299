// Inference under effects and cluster errors on the Munnell (1990) US state panel
// (tests/data/README.md: as distributed in R plm 2.6, dataset Produc): ln gsp on ln pcap, ln pc,
// ln emp and the control unemp, groups = state, trend = year. Subsets are taken by blanking the
// output of the rows left out and dropping incomplete rows.
//
// Fixed figures (so that these checks run without Python): printed once by python3-statsmodels
// 0.13.5 (Debian) with "%.8g", by a script that fits sm.OLS of ln gsp on a constant, the four
// regressors and one dummy per state after the first, then
//   CR1:  fit(cov_type="cluster", cov_kwds={"groups": state}, use_t=True), standard errors
//         sqrt(diag(cov_params()) · df_resid / (df_resid + G − 1)) (the group effects, nested in
//         the clusters, left out of the factor: README, "Estimation options");
//   HC3:  fit(cov_type="HC3").bse;
//   two-way F: the same with one dummy per year after 1970, f_test of the four slopes (classical).
// They are compared at the digits printed (half a unit in the last); a wrong CR1 factor (3% here),
// HC3 turned into HC2 or stripped of the 1/n_g leverage of the state means (about 6%) is caught.
#include "isoquant/sheet/functions/production_functions.hpp"
#include "isoquant/sheet/tables/fit_table.hpp"
#include "input_error_message.hpp"
#include "published_digits.hpp"
#include "reference_data.hpp"

#include <boost/test/unit_test.hpp>

#include <cmath>
#include <functional>

using isoquant::testing::agreesToDigitsGiven;
using isoquant::testing::messageOf;

namespace {

// The state panel with groups and trend, keeping the data rows (1-based below the header) for
// which keep(row) holds; the others are dropped as incomplete.
isoquant::FitArguments statePanelKeeping(const std::function<bool(std::size_t)>& keep)
{
    auto arguments = isoquant::testing::statePanelWithPanelColumns();
    for (std::size_t row = 1; row < arguments.output.rows(); ++row)
        if (!keep(row)) arguments.output.set(row, 0, isoquant::Cell{});
    arguments.incompleteRows = 1.0;
    return arguments;
}

// The first `states` states, all 17 years (the file is sorted by state, then year).
isoquant::FitArguments firstStates(std::size_t states)
{
    return statePanelKeeping([states](std::size_t row) { return row <= 17 * states; });
}

isoquant::FitArguments withinArguments(const char* errors)
{
    auto arguments = isoquant::testing::statePanelWithPanelColumns();
    arguments.trend = {};
    arguments.effects = std::string("fixed");
    arguments.errors = std::string(errors);
    return arguments;
}

std::string formNote(const isoquant::ProductionFit& fit)
{
    const auto cell = isoquant::lookUpFit(fit, std::string("form"), std::string("std. error"));
    return isoquant::isText(cell) ? std::get<std::string>(cell) : std::string();
}

bool isNotAvailable(const isoquant::Cell& cell)
{
    return isoquant::isText(cell) && std::get<std::string>(cell) == "n/a";
}

} // namespace

BOOST_AUTO_TEST_SUITE(panel_inference)

// Item: the G cluster scores sum to zero, so a Wald test of q > G − 1 restrictions is undefined
// (algebra: Xᵀe = 0). Fixed effects, a trend and a control on 3 and 4 states: F (slopes = 0) tests
// 5 restrictions (3 inputs, unemp, trend) and shows n/a with the reason in the form row.
BOOST_AUTO_TEST_CASE(wald_tests_beyond_the_cluster_rank_are_not_available)
{
    for (const std::size_t states : {3u, 4u}) {
        auto arguments = firstStates(states);
        arguments.effects = std::string("fixed");
        arguments.errors = std::string("cluster");
        const auto fit = isoquant::fitFromArguments(arguments);
        BOOST_TEST(fit.panel.groups == static_cast<Eigen::Index>(states));
        BOOST_TEST(fit.summary.overallRestrictions == 5);
        BOOST_TEST(fit.summary.overallTestExceedsClusters);
        BOOST_TEST(std::isnan(fit.summary.fStatistic));
        BOOST_TEST(isNotAvailable(isoquant::lookUpFit(fit, std::string("F"), std::string("t"))));
        BOOST_TEST(isNotAvailable(isoquant::lookUpFit(fit, std::string("F"), std::string("p-value"))));
        const std::string expected = "note: too few groups for F (slopes = 0): its 5 restrictions exceed the " +
                                     std::to_string(states - 1) + " that cluster errors on " +
                                     std::to_string(states) + " groups can carry, so it is n/a";
        BOOST_TEST(formNote(fit) == expected);
        // One restriction (ν = 1) and the standard errors are still defined.
        BOOST_TEST(std::isfinite(fit.returns.fStatistic));
        BOOST_TEST(std::isfinite(fit.inference.standardErrors(1)));
        // The same rows with classical errors: the F is a number and the form row has no note.
        arguments.errors = std::string("classical");
        const auto classical = isoquant::fitFromArguments(arguments);
        BOOST_TEST(std::isfinite(classical.summary.fStatistic));
        BOOST_TEST(formNote(classical).empty());
    }
    // 6 states carry 5 restrictions: the test is a number again.
    auto arguments = firstStates(6);
    arguments.effects = std::string("fixed");
    arguments.errors = std::string("cluster");
    BOOST_TEST(std::isfinite(isoquant::fitFromArguments(arguments).summary.fStatistic));
}

// statsmodels 0.13.5, one dummy per state, CR1 scaled as in the header: the four slopes' errors.
BOOST_AUTO_TEST_CASE(within_cr1_errors_match_fixed_statsmodels_figures)
{
    const auto fit = isoquant::fitFromArguments(withinArguments("cluster"));
    const char* errors[] = {"0.061114767", "0.062549556", "0.082732715", "0.0025284645"};
    for (Eigen::Index j = 0; j < 4; ++j)
        BOOST_TEST(agreesToDigitsGiven(fit.inference.standardErrors(1 + j), errors[j]), "parameter " << j + 1);
}

// statsmodels 0.13.5, one dummy per state, cov_type="HC3": its leverages are those of the
// dummy-variable regression, the within ones plus 1/17.
BOOST_AUTO_TEST_CASE(within_hc3_errors_match_fixed_statsmodels_figures)
{
    const auto fit = isoquant::fitFromArguments(withinArguments("hc3"));
    const char* errors[] = {"0.033635041", "0.032871865", "0.042989094", "0.0011760356"};
    for (Eigen::Index j = 0; j < 4; ++j)
        BOOST_TEST(agreesToDigitsGiven(fit.inference.standardErrors(1 + j), errors[j]), "parameter " << j + 1);
}

// statsmodels 0.13.5: state and year dummies, f_test of the four slopes = 0 (classical), printed
// 576.1340922531492; F (slopes = 0) keeps the year effects out of the test.
BOOST_AUTO_TEST_CASE(two_way_f_tests_the_slopes_only)
{
    auto arguments = isoquant::testing::statePanelWithPanelColumns();
    arguments.effects = std::string("two-way");
    const auto fit = isoquant::fitFromArguments(arguments);
    BOOST_TEST(fit.summary.overallRestrictions == 4);
    BOOST_TEST(agreesToDigitsGiven(fit.summary.fStatistic, "576.13409"));
}

// Item: CR1 under fixed effects against the old factor, with T = 2 (1970 and 1971, 96 rows, 48
// states), where the two differ most. The old factor is that of the same regression run with one
// dummy per state (fitLeastSquares, nothing absorbed): (n − 1)/(n − k − G) against the new
// (n − 1)/(n − k − 1), so the errors differ by √((n − k − G)/(n − k − 1)) = √(44/91) (algebra; 1e-10
// relative: the same residuals and bread by two factorisations).
BOOST_AUTO_TEST_CASE(cr1_with_two_periods_differs_from_the_dummy_factor_by_the_ratio)
{
    auto arguments = statePanelKeeping([](std::size_t row) { return (row - 1) % 17 < 2; });
    arguments.trend = {};
    arguments.effects = std::string("fixed");
    arguments.errors = std::string("cluster");
    const auto fit = isoquant::fitFromArguments(arguments);
    BOOST_TEST_REQUIRE(fit.summary.observations == 96);

    const auto all = isoquant::testing::statePanelWithPanelColumns();
    const Eigen::Index n = 96, k = 4, groups = 48;
    Eigen::MatrixXd design = Eigen::MatrixXd::Zero(n, 1 + k + groups - 1);
    Eigen::VectorXd response(n);
    isoquant::LeastSquaresOptions options;
    options.covariance = isoquant::CovarianceKind::cluster;
    for (Eigen::Index i = 0; i < n; ++i) {
        const auto row = static_cast<std::size_t>(1 + 17 * (i / 2) + i % 2);
        const Eigen::Index state = i / 2;
        response(i) = std::log(all.output.number(row, 0));
        design(i, 0) = 1.0;
        for (std::size_t j = 0; j < 3; ++j) design(i, 1 + static_cast<Eigen::Index>(j)) = std::log(all.inputs.number(row, j));
        design(i, 4) = all.controls.number(row, 0);
        if (state > 0) design(i, k + state) = 1.0;
        options.clusters.push_back(state);
    }
    const auto dummies = isoquant::fitLeastSquares(design, response, 0, options);
    const double ratio = std::sqrt(static_cast<double>(n - k - groups) / static_cast<double>(n - k - 1));
    for (Eigen::Index j = 1; j <= k; ++j) {
        const double expected = dummies.inference.standardErrors(j) * ratio;
        BOOST_TEST(std::fabs(fit.inference.standardErrors(j) - expected) <= 1e-10 * expected, "parameter " << j);
    }
}

// Item: heteroskedasticity-robust errors under fixed effects with few rows per group are flagged
// (Stock and Watson, Econometrica 2008; the threshold of 10 rows per group: common practice, no
// source). 17 years per state: no note; 1970–1971 only: 2 rows per state, noted; cluster: never.
BOOST_AUTO_TEST_CASE(robust_errors_with_few_rows_per_group_are_noted)
{
    const std::string advice = "heteroskedasticity-robust errors with fixed effects: prefer cluster";
    BOOST_TEST(formNote(isoquant::fitFromArguments(withinArguments("hc1"))).empty());
    auto arguments = statePanelKeeping([](std::size_t row) { return (row - 1) % 17 < 2; });
    arguments.trend = {};
    arguments.effects = std::string("fixed");
    for (const char* errors : {"hc1", "hc3"}) {
        arguments.errors = std::string(errors);
        BOOST_TEST(formNote(isoquant::fitFromArguments(arguments)) ==
                   "note: " + advice + " (2 rows per group; below 10 they are inconsistent)", errors);
    }
    arguments.errors = std::string("cluster");
    BOOST_TEST(formNote(isoquant::fitFromArguments(arguments)).empty());
    arguments.effects = std::string("none");
    arguments.errors = std::string("hc1");
    BOOST_TEST(formNote(isoquant::fitFromArguments(arguments)).empty()); // pooled: no fixed effects
}

// Item: a state reduced to one row (Alabama 1986, sheet row 18) has leverage 1 under fixed
// effects (its own mean, 1/n_g = 1): HC3 is undefined there, and the message names the row.
// HC1 and cluster errors stay defined (they are checked against statsmodels in
// test_statsmodels_cross_check, model fixed_singleton).
BOOST_AUTO_TEST_CASE(hc3_names_a_row_of_leverage_one)
{
    auto arguments = statePanelKeeping([](std::size_t row) { return row >= 17; });
    arguments.trend = {};
    arguments.effects = std::string("fixed");
    arguments.errors = std::string("hc3");
    BOOST_TEST(messageOf([&] { isoquant::fitFromArguments(arguments); }) ==
               "errors: row 18 has leverage 1 (its group has one row); hc3 is undefined here — use hc1 or cluster");
    for (const char* errors : {"hc1", "cluster"}) {
        arguments.errors = std::string(errors);
        const auto fit = isoquant::fitFromArguments(arguments);
        BOOST_TEST(fit.inference.standardErrors.tail(4).allFinite(), errors);
    }
}

// Without groups: a control that is 1 in one row only (invented on Cobb & Douglas 1928, row 10 of
// the sheet) fits that row exactly, leverage 1 (algebra), and HC3 names the row.
BOOST_AUTO_TEST_CASE(hc3_names_a_row_of_leverage_one_without_groups)
{
    auto arguments = isoquant::testing::cobbDouglas1928Arguments();
    isoquant::CellTable marker(arguments.output.rows(), 1);
    marker.set(0, 0, std::string("marker"));
    for (std::size_t row = 1; row < marker.rows(); ++row) marker.set(row, 0, row == 9 ? 1.0 : 0.0);
    arguments.controls = marker;
    arguments.errors = std::string("hc3");
    BOOST_TEST(messageOf([&] { isoquant::fitFromArguments(arguments); }) ==
               "errors: row 10 has leverage 1 (the fit passes through it exactly); hc3 is undefined here — use hc1");
}

BOOST_AUTO_TEST_SUITE_END()
