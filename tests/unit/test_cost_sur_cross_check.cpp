// PRODCOSTFIT with `shares` (cost equation and all but the last share equation by iterated SUR) on
// the rice-farm panel (Feng and Horrace 2012, as in plm 2.6 RiceFarms; cost = pseed·seed +
// purea·urea + wage·totlabor, shares wᵢxᵢ/C) against an independent numpy implementation,
// recomputed at test time by tests/reference/cost_sur_check.py: restricted GLS in the full form's
// parameters through the bordered normal equations, dropping each of the three shares in turn.
// The core drops the last share; agreeing with all three is the invariance to the dropped share.
// Figures: every parameter and its standard error, the system log-likelihood, R² of ln C;
// Cobb-Douglas and translog.
//
// Tolerance: 1e-7 relative. Both iterations stop when the parameters move by less than 1e-10
// relative, and the rounding floor of the weighted normal equations on these data is near 1e-11
// (seen in the script's iterations), so the two fixed points agree to about 1e-9; 1e-7 leaves room
// for the standard errors, computed through two different inverses.
//
// CTest runs the script first (test cost_sur_figures) and passes the file it wrote in the
// environment variable ISOQUANT_COST_SUR_FIGURES; without that file this test is skipped.
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

constexpr double systemTolerance = 1e-7;

boost::test_tools::assertion_result figuresAvailable(boost::unit_test::test_unit_id)
{
    return isoquant::testing::referenceFiguresAvailable("ISOQUANT_COST_SUR_FIGURES", "cost system figures");
}

isoquant::CostFitArguments riceFarmCostsWithShares(const std::string& form)
{
    isoquant::CostFitArguments arguments = isoquant::testing::riceFarmCostArguments(true);
    arguments.form = form;
    return arguments;
}

double coreFigure(const isoquant::CostFit& fit, const std::string& q, Eigen::Index i)
{
    const auto& summary = fit.summary;
    if (q == "params") return summary.inference.estimates(i);
    if (q == "bse") return summary.inference.standardErrors(i);
    if (q == "llf") return summary.summary.logLikelihood;
    if (q == "rsquared") return summary.rSquared;
    return std::numeric_limits<double>::quiet_NaN();
}

} // namespace

BOOST_AUTO_TEST_SUITE(cost_sur_cross_check)

BOOST_AUTO_TEST_CASE(share_systems_agree_with_numpy, *boost::unit_test::precondition(figuresAvailable))
{
    const auto rows =
        isoquant::testing::readReferenceRows(isoquant::testing::referenceFiguresPath("ISOQUANT_COST_SUR_FIGURES"));
    // 3 dropped shares × (Cobb-Douglas 2·5 + 2 figures, translog 2·15 + 2): 3·(12 + 32) = 132.
    BOOST_TEST_REQUIRE(rows.size() == 132u);
    std::map<std::string, isoquant::CostFit> fits;
    for (const auto& fields : rows) {
        const std::string form = fields.at(1).substr(0, fields.at(1).find('_'));
        if (!fits.count(form)) fits.emplace(form, isoquant::costFitFromArguments(riceFarmCostsWithShares(form)));
        const double expected = std::stod(fields.at(4));
        const double actual = coreFigure(fits.at(form), fields.at(2), std::stol(fields.at(3)));
        BOOST_TEST(closeTo(actual, expected, systemTolerance), fields.at(1) << " " << fields.at(2) << " " << fields.at(3));
    }
}

BOOST_AUTO_TEST_SUITE_END()
