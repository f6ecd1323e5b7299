// Cobb & Douglas (1928) US manufacturing data, 1899–1922, through the PRODFIT argument path.
// Sources (tests/data/README.md): the data and the published fit P = 1.01·L^0.75·C^0.25 are from
// Cobb & Douglas (1928), AER 18(1) Suppl., Tables II and III; the "computed" figures are from
// R 4.2.2 lm (statsmodels 0.13.5 agrees); all figures are listed in tests/data/README.md.
// Each figure is compared at the digits it is given to (half a unit in its last digit).
#include "isoquant/sheet/functions/production_functions.hpp"
#include "published_digits.hpp"
#include "reference_data.hpp"
#include "relative_error.hpp"

#include <boost/test/unit_test.hpp>

#include <cmath>

using isoquant::testing::closeTo;
using isoquant::testing::agreesToDigitsGiven;

namespace {

isoquant::ProductionFit fit1928(isoquant::Cell constantReturns, isoquant::Cell errors = {})
{
    auto arguments = isoquant::testing::cobbDouglas1928Arguments();
    arguments.constantReturns = std::move(constantReturns);
    arguments.errors = std::move(errors);
    return isoquant::fitFromArguments(arguments);
}

} // namespace

BOOST_AUTO_TEST_SUITE(cobb_douglas_1928)

// Computed reference (R 4.2.2 lm): ln P = b0 + bL ln L + bC ln C, classical standard errors.
BOOST_AUTO_TEST_CASE(unrestricted_fit_matches_computed_reference)
{
    const auto fit = fit1928(0.0);
    BOOST_TEST(fit.inputLabels == (std::vector<std::string>{"L", "C"}), boost::test_tools::per_element());
    BOOST_TEST(fit.summary.observations == 24);
    BOOST_TEST(agreesToDigitsGiven(fit.inference.estimates(0), "-0.1773097"));
    BOOST_TEST(agreesToDigitsGiven(fit.inference.estimates(1), "0.8072782"));
    BOOST_TEST(agreesToDigitsGiven(fit.inference.estimates(2), "0.2330535"));
    BOOST_TEST(agreesToDigitsGiven(fit.inference.standardErrors(0), "0.434293"));
    BOOST_TEST(agreesToDigitsGiven(fit.inference.standardErrors(1), "0.1450762"));
    BOOST_TEST(agreesToDigitsGiven(fit.inference.standardErrors(2), "0.0635297"));
    BOOST_TEST(agreesToDigitsGiven(fit.rSquared, "0.957425"));
    BOOST_TEST(agreesToDigitsGiven(fit.summary.residualStandardDeviation, "0.0581384"));
    BOOST_TEST(agreesToDigitsGiven(fit.summary.residualSumOfSquares, "0.0709816"));
}

// Computed reference (R 4.2.2): F test of bL + bC = 1, F = 0.1956, p = 0.663. The core's test is a
// Wald F of ν = 1; with classical covariance it is the same F.
BOOST_AUTO_TEST_CASE(returns_to_scale_test_matches_computed_reference)
{
    const auto fit = fit1928(0.0);
    // ν = bL + bC; the two figures are rounded to 7 decimals, so their sum is within 1e-7 of ν ≈ 1.04.
    BOOST_TEST(closeTo(fit.returns.estimate, 0.8072782 + 0.2330535, 1e-6));
    BOOST_TEST(agreesToDigitsGiven(fit.returns.fStatistic, "0.1956"));
    BOOST_TEST(agreesToDigitsGiven(fit.returns.pValue, "0.663"));
    BOOST_TEST(!fit.returns.imposed);
}

// The classical Wald F of one linear restriction equals the F from the restricted and unrestricted
// residual sums of squares, ((RSS_r − RSS_u)/1)/(RSS_u/(n − p)) (an identity of least squares, e.g.
// Greene, Econometric Analysis, ch. 5 (from memory)). Both fits are independent runs of the core,
// so 1e-10 relative leaves room for rounding only.
BOOST_AUTO_TEST_CASE(wald_f_equals_f_from_restricted_fit)
{
    const auto unrestricted = fit1928(0.0);
    const auto restricted = fit1928(1.0);
    const double rssU = unrestricted.summary.residualSumOfSquares;
    const double rssR = restricted.summary.residualSumOfSquares;
    const double fromFits = (rssR - rssU) / (rssU / unrestricted.summary.residualDegreesOfFreedom);
    BOOST_TEST(closeTo(unrestricted.returns.fStatistic, fromFits, 1e-10));
}

// Computed reference (R 4.2.2, sandwich HC1): SEs 0.547223, 0.215936, 0.105406; Wald F of
// bL + bC = 1: 0.11904 (p = 0.7335). Estimates do not depend on the kind of error.
BOOST_AUTO_TEST_CASE(hc1_errors_match_computed_reference)
{
    const auto fit = fit1928(0.0, std::string("HC1"));
    BOOST_TEST((fit.summary.covarianceKind == isoquant::CovarianceKind::hc1));
    BOOST_TEST(agreesToDigitsGiven(fit.inference.estimates(1), "0.8072782"));
    BOOST_TEST(agreesToDigitsGiven(fit.inference.standardErrors(0), "0.547223"));
    BOOST_TEST(agreesToDigitsGiven(fit.inference.standardErrors(1), "0.215936"));
    BOOST_TEST(agreesToDigitsGiven(fit.inference.standardErrors(2), "0.105406"));
    BOOST_TEST(agreesToDigitsGiven(fit.returns.fStatistic, "0.11904"));
    BOOST_TEST(agreesToDigitsGiven(fit.returns.pValue, "0.7335"));
}

// Computed reference (R 4.2.2): ln(P/C) on ln(L/C): intercept 0.0145446 (SE 0.019979), slope
// 0.7458658 (SE 0.041224), RSS 0.0716427; so A = 1.014651 and the capital exponent 0.2541342.
BOOST_AUTO_TEST_CASE(constant_returns_fit_matches_computed_reference)
{
    const auto fit = fit1928(1.0);
    BOOST_TEST(agreesToDigitsGiven(fit.inference.estimates(0), "0.0145446"));
    BOOST_TEST(agreesToDigitsGiven(fit.inference.standardErrors(0), "0.019979"));
    BOOST_TEST(agreesToDigitsGiven(fit.inference.estimates(1), "0.7458658"));
    BOOST_TEST(agreesToDigitsGiven(fit.inference.standardErrors(1), "0.041224"));
    BOOST_TEST(agreesToDigitsGiven(fit.inference.estimates(2), "0.2541342"));
    // b_C = 1 − b_L, so its standard error is that of b_L (the reference gives it as 0.041224).
    BOOST_TEST(agreesToDigitsGiven(fit.inference.standardErrors(2), "0.041224"));
    BOOST_TEST(agreesToDigitsGiven(fit.summary.residualSumOfSquares, "0.0716427"));
    BOOST_TEST(agreesToDigitsGiven(std::exp(fit.inference.estimates(0)), "1.014651"));
}

// Published (Cobb & Douglas 1928): P = 1.01·L^0.75·C^0.25, given to two decimals.
BOOST_AUTO_TEST_CASE(constant_returns_fit_reproduces_published_function)
{
    const auto fit = fit1928(1.0);
    BOOST_TEST(agreesToDigitsGiven(std::exp(fit.inference.estimates(0)), "1.01"));
    BOOST_TEST(agreesToDigitsGiven(fit.inference.estimates(1), "0.75"));
    BOOST_TEST(agreesToDigitsGiven(fit.inference.estimates(2), "0.25"));
}

// Imposed constant returns: ν is 1 by construction (b_C is formed as 1 − b_L) and nothing is tested.
BOOST_AUTO_TEST_CASE(constant_returns_verdict_is_imposed)
{
    const auto fit = fit1928(1.0);
    BOOST_TEST(fit.returns.imposed);
    BOOST_TEST(fit.returns.verdict == "constant (imposed)");
    BOOST_TEST(fit.returns.estimate == 1.0);
    BOOST_TEST(std::isnan(fit.returns.fStatistic));
}

// Computed reference p = 0.663 > α = 0.05 at the default level 0.95: ν = 1 is not rejected.
BOOST_AUTO_TEST_CASE(unrestricted_verdict_at_default_level_is_constant)
{
    const auto fit = fit1928(isoquant::Cell{});
    BOOST_TEST(fit.returns.verdict == "constant");
}

BOOST_AUTO_TEST_SUITE_END()
