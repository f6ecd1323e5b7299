// The translog's output elasticities and returns to scale at the sample mean of the logs, as fixed
// figures, so that the core tests alone catch an elasticity taken anywhere else (e.g. at ln of the
// mean inputs, which moves every figure below in its third or fourth digit) without the reference
// libraries the test-time cross-check (test_forms_cross_check.cpp) needs.
//
// One-off recomputation (python3-statsmodels 0.13.5, numpy 1.24.2, /usr/bin/python3, Debian 12):
// sm.OLS(ln Y, [1, ln xᵢ, ½(ln xᵢ)², ln xᵢ·ln xⱼ (i < j)]).fit(), then fit.t_test(G) with the
// gradient rows gᵢ of εᵢ = αᵢ + Σⱼ βᵢⱼ·mean(ln xⱼ) (1 at αᵢ, mean(ln xⱼ) at βᵢⱼ, at both βᵢⱼ's
// inputs when i ≠ j), and fit.t_test(Σᵢ gᵢ) for ν; printed with "%.7g" (estimates) and "%.6g"
// (standard errors), classical covariance. Each figure is compared at the digits printed (half a
// unit in the last one).
#include "isoquant/sheet/functions/production_functions.hpp"
#include "isoquant/math/fits/translog_fit.hpp"
#include "published_digits.hpp"
#include "reference_data.hpp"

#include <boost/test/unit_test.hpp>

using isoquant::testing::agreesToDigitsGiven;

namespace {

isoquant::ProductionFit translogFit(isoquant::FitArguments arguments)
{
    arguments.form = std::string("translog");
    return isoquant::fitFromArguments(arguments);
}

} // namespace

BOOST_AUTO_TEST_SUITE(translog_at_the_mean)

// Cobb & Douglas (1928), inputs L, C (data source in tests/data/README.md).
BOOST_AUTO_TEST_CASE(cobb_douglas_1928_matches_one_off_statsmodels_figures)
{
    const auto fit = translogFit(isoquant::testing::cobbDouglas1928Arguments());
    BOOST_TEST_REQUIRE(fit.translog);
    const auto& details = *fit.translog;
    BOOST_TEST_REQUIRE(details.elasticities.size() == 2);
    BOOST_TEST(agreesToDigitsGiven(details.elasticities.estimates(0), "1.058779"));
    BOOST_TEST(agreesToDigitsGiven(details.elasticities.estimates(1), "0.142601"));
    BOOST_TEST(agreesToDigitsGiven(details.elasticities.standardErrors(0), "0.248031"));
    BOOST_TEST(agreesToDigitsGiven(details.elasticities.standardErrors(1), "0.116226"));
    BOOST_TEST(agreesToDigitsGiven(fit.returns.estimate, "1.20138"));
    BOOST_TEST(agreesToDigitsGiven(fit.returns.standardError, "0.139388"));
}

// The rice-farm panel (Feng and Horrace 2012), inputs size, totlabor, seed, urea, pooled.
BOOST_AUTO_TEST_CASE(rice_farms_match_one_off_statsmodels_figures)
{
    const auto fit = translogFit(isoquant::testing::riceFarmArguments({"size", "totlabor", "seed", "urea"}));
    BOOST_TEST_REQUIRE(fit.translog);
    const auto& details = *fit.translog;
    BOOST_TEST_REQUIRE(details.elasticities.size() == 4);
    BOOST_TEST(agreesToDigitsGiven(details.elasticities.estimates(0), "0.4171517"));
    BOOST_TEST(agreesToDigitsGiven(details.elasticities.estimates(1), "0.2092847"));
    BOOST_TEST(agreesToDigitsGiven(details.elasticities.estimates(2), "0.141309"));
    BOOST_TEST(agreesToDigitsGiven(details.elasticities.estimates(3), "0.2761566"));
    BOOST_TEST(agreesToDigitsGiven(details.elasticities.standardErrors(0), "0.0345793"));
    BOOST_TEST(agreesToDigitsGiven(details.elasticities.standardErrors(1), "0.0289186"));
    BOOST_TEST(agreesToDigitsGiven(details.elasticities.standardErrors(2), "0.0302308"));
    BOOST_TEST(agreesToDigitsGiven(details.elasticities.standardErrors(3), "0.0231717"));
    BOOST_TEST(agreesToDigitsGiven(fit.returns.estimate, "1.043902"));
    BOOST_TEST(agreesToDigitsGiven(fit.returns.standardError, "0.0136869"));
}

BOOST_AUTO_TEST_SUITE_END()
