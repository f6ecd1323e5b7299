// PRODCOSTFIT's Cobb-Douglas and translog cost functions of the rice-farm panel (Feng and Horrace
// 2012, as in plm 2.6 RiceFarms; cost = pseed·seed + purea·urea + wage·totlabor, output goutput,
// prices pseed, purea, wage) against python3-statsmodels 0.13.5 OLS of the homogeneity-normalised
// regression, recomputed at test time by tests/reference/cost_check.py: every parameter of the full
// form (the implied ones through statsmodels' t_test), R² of ln C, F, log-likelihood, AIC, BIC,
// the cost elasticity and its test of 1, the translog's efficient scale and the smearing factor;
// classical errors and HC1 (Cobb-Douglas), HC3 (translog).
//
// Tolerance: 1e-8 relative on every figure, as for the other statsmodels cross-checks: the same
// linear least squares by two factorisations, each good to about 1e-12 on these designs, and the
// p-values through the same t and F distributions (Boost.Math and scipy).
//
// CTest runs the script first (test cost_figures) and passes the file it wrote in the environment
// variable ISOQUANT_COST_FIGURES; without that file this test is skipped.
#include "isoquant/sheet/functions/cost_functions.hpp"
#include "cell_tables.hpp"
#include "reference_data.hpp"
#include "reference_figures.hpp"
#include "relative_error.hpp"

#include <boost/test/unit_test.hpp>

#include <cmath>
#include <limits>
#include <map>

using isoquant::testing::closeTo;

namespace {

constexpr double statsmodelsTolerance = 1e-8;

boost::test_tools::assertion_result figuresAvailable(boost::unit_test::test_unit_id)
{
    return isoquant::testing::referenceFiguresAvailable("ISOQUANT_COST_FIGURES", "cost figures");
}

double coreFigure(const isoquant::CostFit& fit, const std::string& q, Eigen::Index i)
{
    const auto& summary = fit.summary;
    if (q == "params") return summary.inference.estimates(i);
    if (q == "bse") return summary.inference.standardErrors(i);
    if (q == "pvalues") return summary.inference.pValues(i);
    if (q == "rsquared") return summary.rSquared;
    if (q == "fvalue") return summary.summary.fStatistic;
    if (q == "llf") return summary.summary.logLikelihood;
    if (q == "aic") return summary.summary.aic;
    if (q == "bic") return summary.summary.bic;
    if (q == "smearing") return summary.smearingFactor;
    if (q == "elasticity") return fit.costElasticity.estimate;
    if (q == "elasticity_se") return fit.costElasticity.standardError;
    if (q == "unit_fvalue") return summary.returns.fStatistic;
    if (q == "unit_pvalue") return summary.returns.pValue;
    if (q == "efficient_scale") return fit.efficientScale ? fit.efficientScale->estimate : std::nan("");
    if (q == "efficient_scale_se") return fit.efficientScale ? fit.efficientScale->standardError : std::nan("");
    return std::numeric_limits<double>::quiet_NaN();
}

} // namespace

BOOST_AUTO_TEST_SUITE(cost_cross_check)

BOOST_AUTO_TEST_CASE(cost_functions_agree_with_statsmodels, *boost::unit_test::precondition(figuresAvailable))
{
    const auto rows = isoquant::testing::readReferenceRows(isoquant::testing::referenceFiguresPath("ISOQUANT_COST_FIGURES"));
    BOOST_TEST_REQUIRE(rows.size() > 100u);
    std::map<std::string, isoquant::CostFit> fits;
    for (const auto& fields : rows) {
        const std::string& form = fields.at(1);
        if (!fits.count(form)) {
            isoquant::CostFitArguments arguments = isoquant::testing::riceFarmCostArguments();
            const auto separator = form.find('_');
            arguments.form = form.substr(0, separator);
            if (separator != std::string::npos) arguments.errors = form.substr(separator + 1);
            fits.emplace(form, isoquant::costFitFromArguments(arguments));
        }
        const double expected = std::stod(fields.at(4));
        const double actual = coreFigure(fits.at(form), fields.at(2), std::stol(fields.at(3)));
        BOOST_TEST(closeTo(actual, expected, statsmodelsTolerance), form << " " << fields.at(2) << " " << fields.at(3));
    }
}

BOOST_AUTO_TEST_SUITE_END()
