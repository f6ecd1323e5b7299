// Munnell (1990) US state panel with state fixed effects (the within estimator): ln gsp on ln pcap,
// ln pc, ln emp and the unemployment rate unemp as a control, groups = state.
// Source of the figures: tests/data/README.md, "computed (R 4.2.2 lm/plm 2.6; statsmodels
// agrees)", within (state fixed effects): estimates with classical SEs in brackets
// -0.026150 (0.029002), 0.292007 (0.025120), 0.768159 (0.030092), -0.005298 (0.000989);
// within R² 0.941336, RSS 1.111189. Compared at the six decimals given (half a unit in the sixth
// decimal). Cluster-robust errors are compared with statsmodels in test_statsmodels_cross_check.
#include "isoquant/sheet/functions/production_functions.hpp"
#include "isoquant/sheet/tables/fit_table.hpp"
#include "published_digits.hpp"
#include "reference_data.hpp"

#include <boost/test/unit_test.hpp>

#include <cmath>

using isoquant::testing::agreesToDigitsGiven;

namespace {

isoquant::ProductionFit withinFit()
{
    auto arguments = isoquant::testing::statePanelWithPanelColumns();
    arguments.trend = {};
    arguments.effects = std::string("fixed");
    return isoquant::fitFromArguments(arguments);
}

} // namespace

BOOST_AUTO_TEST_SUITE(state_panel_within)

BOOST_AUTO_TEST_CASE(within_estimates_match_computed_reference)
{
    const auto fit = withinFit();
    BOOST_TEST(fit.summary.observations == 816);
    BOOST_TEST(fit.panel.groups == 48); // 48 states (Munnell 1990)
    const char* estimates[] = {"-0.026150", "0.292007", "0.768159", "-0.005298"};
    const char* errors[] = {"0.029002", "0.025120", "0.030092", "0.000989"};
    for (Eigen::Index j = 0; j < 4; ++j) {
        BOOST_TEST(agreesToDigitsGiven(fit.inference.estimates(1 + j), estimates[j]), "parameter " << j + 1);
        BOOST_TEST(agreesToDigitsGiven(fit.inference.standardErrors(1 + j), errors[j]), "parameter " << j + 1);
    }
    BOOST_TEST(agreesToDigitsGiven(fit.panel.withinRSquared, "0.941336"));
    BOOST_TEST(agreesToDigitsGiven(fit.summary.residualSumOfSquares, "1.111189"));
}

// The classical degrees of freedom count the 48 absorbed state means: n − p = 816 − 4 − 48 = 764,
// as the within estimator requires (the reference SEs above are only reached with that count).
BOOST_AUTO_TEST_CASE(degrees_of_freedom_count_the_group_means)
{
    const auto fit = withinFit();
    BOOST_TEST(fit.summary.residualDegreesOfFreedom == 764.0);
    BOOST_TEST(fit.summary.inferenceDegreesOfFreedom == 764.0);
    BOOST_TEST(std::isnan(fit.inference.standardErrors(0))); // ln A, the mean state effect, has no standard error
}

// ln A is the mean of the group effects, and every group effect is ȳ_g − x̄_gᵀb: recomputed here
// from the data of Alabama, the first state (1e-12 relative: sums of 17 logs).
BOOST_AUTO_TEST_CASE(group_effects_are_group_means_of_the_residual)
{
    const auto fit = withinFit();
    BOOST_TEST(fit.panel.groupLabels.front() == "ALABAMA");
    BOOST_TEST(std::fabs(fit.inference.estimates(0) - fit.panel.groupEffects.mean()) <= 1e-12 * std::fabs(fit.inference.estimates(0)));
    const auto arguments = isoquant::testing::statePanelArguments();
    double sum = 0;
    for (std::size_t row = 1; row <= 17; ++row) {
        double value = std::log(arguments.output.number(row, 0));
        for (std::size_t i = 0; i < 3; ++i)
            value -= fit.inference.estimates(static_cast<Eigen::Index>(1 + i)) * std::log(arguments.inputs.number(row, i));
        value -= fit.inference.estimates(4) * arguments.controls.number(row, 0);
        sum += value;
    }
    const double alabama = sum / 17.0;
    BOOST_TEST(std::fabs(fit.panel.groupEffects(0) - alabama) <= 1e-12 * std::fabs(alabama));
    const auto cell = isoquant::lookUpFit(fit, std::string("effect of group alabama"), {});
    BOOST_TEST(std::get<double>(cell) == fit.panel.groupEffects(0));
    BOOST_TEST(std::get<std::string>(isoquant::lookUpFit(fit, std::string("effect of group ALABAMA"),
                                                         std::string("std. error"))) == "n/a");
}

BOOST_AUTO_TEST_SUITE_END()
