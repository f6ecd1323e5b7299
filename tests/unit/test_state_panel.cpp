// Munnell (1990) US state panel, 48 states × 17 years, pooled: ln gsp on ln pcap, ln pc, ln emp,
// with the unemployment rate unemp as a control entered as it is.
// Sources (tests/data/README.md): data as distributed in R plm 2.6 (dataset Produc); published
// elasticities 0.15/0.31/0.59 (Munnell 1990, as quoted by Eisner 1991); "computed" figures from
// R 4.2.2 lm / plm 2.6 (statsmodels agrees); all figures are listed in tests/data/README.md.
// Computed figures are compared at the digits they are given to (six decimals, so 4 to 7
// significant digits); the statsmodels cross-check covers the same fit to 1e-8 relative.
#include "isoquant/sheet/functions/production_functions.hpp"
#include "published_digits.hpp"
#include "reference_data.hpp"

#include <boost/test/unit_test.hpp>

#include <cmath>

using isoquant::testing::agreesToDigitsGiven;

namespace {

isoquant::ProductionFit pooledFit(isoquant::Cell errors = {})
{
    auto arguments = isoquant::testing::statePanelArguments();
    arguments.errors = std::move(errors);
    return isoquant::fitFromArguments(arguments);
}

} // namespace

BOOST_AUTO_TEST_SUITE(state_panel)

// Published (Munnell 1990, as quoted by Eisner 1991): about 0.15, 0.31, 0.59. "About" is read as
// within 0.01, the criterion.
BOOST_AUTO_TEST_CASE(pooled_elasticities_are_near_published)
{
    const auto fit = pooledFit();
    BOOST_TEST(fit.summary.observations == 816);
    BOOST_TEST(std::fabs(fit.inference.estimates(1) - 0.15) <= 0.01, "pcap " << fit.inference.estimates(1));
    BOOST_TEST(std::fabs(fit.inference.estimates(2) - 0.31) <= 0.01, "pc " << fit.inference.estimates(2));
    BOOST_TEST(std::fabs(fit.inference.estimates(3) - 0.59) <= 0.01, "emp " << fit.inference.estimates(3));
}

// Computed reference (R 4.2.2 lm, pooled OLS): estimates with classical SEs in brackets,
// 1.643302 (0.057587), 0.155007 (0.017154), 0.309190 (0.010272), 0.593935 (0.013747),
// -0.006733 (0.001416); R² 0.992593, residual SD 0.088096, RSS 6.294154.
BOOST_AUTO_TEST_CASE(pooled_fit_matches_computed_reference)
{
    const auto fit = pooledFit();
    BOOST_TEST(fit.controlLabels == (std::vector<std::string>{"unemp"}), boost::test_tools::per_element());
    const char* estimates[] = {"1.643302", "0.155007", "0.309190", "0.593935", "-0.006733"};
    const char* errors[] = {"0.057587", "0.017154", "0.010272", "0.013747", "0.001416"};
    for (Eigen::Index j = 0; j < 5; ++j) {
        BOOST_TEST(agreesToDigitsGiven(fit.inference.estimates(j), estimates[j]), "parameter " << j);
        BOOST_TEST(agreesToDigitsGiven(fit.inference.standardErrors(j), errors[j]), "parameter " << j);
    }
    BOOST_TEST(agreesToDigitsGiven(fit.rSquared, "0.992593"));
    BOOST_TEST(agreesToDigitsGiven(fit.summary.residualStandardDeviation, "0.088096"));
    BOOST_TEST(agreesToDigitsGiven(fit.summary.residualSumOfSquares, "6.294154"));
}

// Computed reference (R 4.2.2, sandwich HC1): 0.070989, 0.018574, 0.012517, 0.019594, 0.001341.
BOOST_AUTO_TEST_CASE(pooled_hc1_errors_match_computed_reference)
{
    const auto fit = pooledFit(std::string("hc1"));
    const char* errors[] = {"0.070989", "0.018574", "0.012517", "0.019594", "0.001341"};
    for (Eigen::Index j = 0; j < 5; ++j)
        BOOST_TEST(agreesToDigitsGiven(fit.inference.standardErrors(j), errors[j]), "parameter " << j);
}

// Computed reference (R 4.2.2): F test that the three elasticities sum to 1, classical: 270.9.
BOOST_AUTO_TEST_CASE(constant_returns_rejected_with_computed_f)
{
    const auto fit = pooledFit();
    BOOST_TEST(agreesToDigitsGiven(fit.returns.fStatistic, "270.9"));
    // ν = 1.058 with F = 270.9 on (1, 811): p is far below 0.05, so the verdict is "increasing".
    BOOST_TEST(fit.returns.verdict == "increasing");
}

BOOST_AUTO_TEST_SUITE_END()
