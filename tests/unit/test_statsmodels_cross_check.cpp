// The core's fits of the reference data sets against statsmodels OLS recomputed at test time
// (python3-statsmodels 0.13.5 from Debian): every figure tests/reference/statsmodels_check.py
// writes — estimates, standard errors (classical, HC1, HC3), p-values, bounds, R², adjusted R²,
// RSS, overall F, log-likelihood, AIC, BIC and the Wald test of ν = 1 — agrees to 1e-8 relative.
// Panel models (Munnell state panel, Feng & Horrace rice farms) are compared with statsmodels'
// regression with one dummy per group (and per period for two-way effects): slopes, their
// classical, HC1, HC3 and cluster-robust (CR1, t(G−1)) errors, p-values and bounds, F (slopes = 0)
// (statsmodels' f_test of the inputs, controls and trend), the group effects and their mean
// (ln A), within R², the trend, the test of ν = 1 and the smearing factor (numpy's mean of
// exp(residual)). Under effects the script scales statsmodels' CR1 covariance by
// (n − k − G)/(n − k − 1), the group effects being nested in the clusters. Two subsets of the state
// panel, left out here as incomplete rows (blank output): 1970–1971 only (T = 2), and Alabama
// reduced to its 1986 row (a group of one row).
// 1e-8 leaves room for the two libraries' different factorisations and distribution functions
// (both are good to about 1e-12 on these well-conditioned designs) while catching any formula slip.
//
// CTest runs the script first (test statsmodels_figures) and passes the file it wrote in the
// environment variable ISOQUANT_STATSMODELS_FIGURES; without that file this test is skipped.
#include "isoquant/sheet/functions/production_functions.hpp"
#include "reference_data.hpp"

#include "reference_figures.hpp"

#include <boost/test/unit_test.hpp>

#include <cmath>
#include <cstdlib>
#include <filesystem>
#include <fstream>
#include <iomanip>
#include <iostream>
#include <limits>
#include <map>
#include <sstream>

namespace {

constexpr double relativeTolerance = 1e-8;

const char* figuresPath() { return isoquant::testing::referenceFiguresPath("ISOQUANT_STATSMODELS_FIGURES"); }

boost::test_tools::assertion_result figuresAvailable(boost::unit_test::test_unit_id)
{
    return isoquant::testing::referenceFiguresAvailable("ISOQUANT_STATSMODELS_FIGURES", "statsmodels figures");
}

struct Figure {
    std::string dataset, model, covariance, level, quantity;
    Eigen::Index index = 0;
    double value = 0;
};

std::vector<Figure> readFigures(const std::string& path)
{
    std::vector<Figure> figures;
    for (const auto& fields : isoquant::testing::readReferenceRows(path))
        figures.push_back({fields.at(0), fields.at(1), fields.at(2), fields.at(3), fields.at(4), std::stol(fields.at(5)),
                           std::stod(fields.at(6))});
    return figures;
}

// The panel models of the script: groups always given (they cluster the errors), effects by
// the model's name, the trend (the state panel's year) only where the name says so; two-way
// effects take their periods from the same column.
isoquant::FitArguments panelArguments(const Figure& figure)
{
    auto arguments = figure.dataset == "rice_farms" ? isoquant::testing::riceFarmsArguments()
                                                    : isoquant::testing::statePanelWithPanelColumns();
    const std::string& model = figure.model;
    const bool trend = model == "fixed_trend" || model == "pooled_trend" || model == "two_way";
    if (!trend) arguments.trend = {};
    if (model.rfind("fixed", 0) == 0) arguments.effects = std::string("fixed");
    if (model == "two_way") arguments.effects = std::string("two-way");
    const bool twoYears = model == "fixed_two_years", singleton = model == "fixed_singleton";
    if (twoYears || singleton) {
        // The script's subsets: rows it leaves out get a blank output and are dropped.
        const auto withYears = isoquant::testing::statePanelWithPanelColumns();
        for (std::size_t row = 1; row < arguments.output.rows(); ++row) {
            const double year = withYears.trend.number(row, 0);
            const bool alabama = withYears.groups.text(row, 0) == "ALABAMA";
            if ((twoYears && year > 1971) || (singleton && alabama && year != 1986))
                arguments.output.set(row, 0, isoquant::Cell{});
        }
        arguments.incompleteRows = 1.0;
    }
    return arguments;
}

isoquant::ProductionFit coreFit(const Figure& figure)
{
    const bool panel = figure.dataset == "rice_farms" || (figure.model != "unrestricted" && figure.model != "constant_returns");
    auto arguments = !panel ? (figure.dataset == "cobb_douglas_1928" ? isoquant::testing::cobbDouglas1928Arguments()
                                                                     : isoquant::testing::statePanelArguments())
                            : panelArguments(figure);
    arguments.constantReturns = figure.model == "constant_returns" ? 1.0 : 0.0;
    arguments.errors = figure.covariance;
    return isoquant::fitFromArguments(arguments);
}

// The core's figure matching a statsmodels quantity; NaN when the quantity is unknown.
double coreFigure(const isoquant::ProductionFit& fit, const Figure& figure)
{
    const auto& r = fit.summary;
    const Eigen::Index i = figure.index;
    const std::string& q = figure.quantity;
    if (figure.level == "regression") {
        const isoquant::ParameterInference& run = fit.regressionInference;
        if (q == "params") return run.estimates(i);
        if (q == "bse") return run.standardErrors(i);
        if (q == "pvalues") return run.pValues(i);
        if (q == "low") return run.lowerBounds(i);
        if (q == "high") return run.upperBounds(i);
        if (q == "rsquared") return r.rSquared;
        if (q == "rsquared_adj") return r.adjustedRSquared;
        if (q == "ssr") return r.residualSumOfSquares;
        if (q == "fvalue") return r.fStatistic;
        if (q == "f_pvalue") return r.fPValue;
        if (q == "llf") return r.logLikelihood;
        if (q == "aic") return r.aic;
        if (q == "bic") return r.bic;
    } else if (figure.level == "production") {
        if (q == "params") return fit.inference.estimates(i);
        if (q == "bse") return fit.inference.standardErrors(i);
        if (q == "tvalues") return fit.inference.tStatistics(i);
        if (q == "pvalues") return fit.inference.pValues(i);
        if (q == "low") return fit.inference.lowerBounds(i);
        if (q == "high") return fit.inference.upperBounds(i);
        if (q == "rsquared") return fit.rSquared;
        if (q == "rsquared_adj") return fit.adjustedRSquared;
        if (q == "fvalue") return r.fStatistic;
        if (q == "f_pvalue") return r.fPValue;
        if (q == "nu") return fit.returns.estimate;
        if (q == "nu_se") return fit.returns.standardError;
        if (q == "nu_fvalue") return fit.returns.fStatistic;
        if (q == "nu_pvalue") return fit.returns.pValue;
        if (q == "ssr") return r.residualSumOfSquares;
        if (q == "llf") return r.logLikelihood;
        if (q == "aic") return r.aic;
        if (q == "bic") return r.bic;
        if (q == "smearing") return fit.smearingFactor;
        if (q == "within_rsquared") return fit.panel.withinRSquared;
        if (q == "group_effect") return fit.panel.groupEffects(i);
        if (fit.panel.technicalChange) {
            if (q == "trend") return fit.panel.technicalChange->estimate;
            if (q == "trend_se") return fit.panel.technicalChange->standardError;
            if (q == "trend_pvalue") return fit.panel.technicalChange->pValue;
        }
    }
    return std::numeric_limits<double>::quiet_NaN();
}

bool agrees(double actual, double reference)
{
    // statsmodels prints 0 for a p-value below the range of doubles: the core must underflow too.
    if (reference == 0) return std::fabs(actual) < std::numeric_limits<double>::min();
    return std::fabs(actual - reference) <= relativeTolerance * std::fabs(reference);
}

} // namespace

BOOST_AUTO_TEST_SUITE(statsmodels_cross_check)

BOOST_AUTO_TEST_CASE(core_agrees_with_statsmodels, *boost::unit_test::precondition(figuresAvailable))
{
    const auto figures = readFigures(figuresPath());
    // Exactly the figures statsmodels_check.py writes for its 36 fits (3 data sets; models and
    // covariance kinds as listed there, the panel variants' overall F tests included): a script
    // that silently writes fewer must fail. Update with the script.
    BOOST_TEST_REQUIRE(figures.size() == 2712u);

    std::string fittedKey;
    isoquant::ProductionFit fit;
    std::size_t compared = 0;
    // statsmodels' estimates of the current fit, by level and index (the script writes them
    // before the bounds).
    std::map<std::pair<std::string, Eigen::Index>, double> estimates;
    for (const auto& figure : figures) {
        const std::string key = figure.dataset + "/" + figure.model + "/" + figure.covariance;
        if (key != fittedKey) {
            fit = coreFit(figure);
            fittedKey = key;
            estimates.clear();
        }
        double actual = coreFigure(fit, figure);
        double reference = figure.value;
        if (figure.quantity == "params") estimates[{figure.level, figure.index}] = figure.value;
        const auto estimate = estimates.find({figure.level, figure.index});
        if ((figure.quantity == "low" || figure.quantity == "high") && estimate != estimates.end()) {
            // A bound is estimate ∓ t·se, and both terms are checked on their own; compared here is
            // the half-width t·se, since a bound near 0 (a small estimate just significant) is a
            // difference of nearly equal terms whose relative error is not that of either term.
            Figure estimateFigure = figure;
            estimateFigure.quantity = "params";
            actual -= coreFigure(fit, estimateFigure);
            reference -= estimate->second;
        }
        BOOST_TEST(agrees(actual, reference), std::setprecision(17)
                                                     << key << " " << figure.level << " " << figure.quantity << "["
                                                     << figure.index << "]: core " << actual << ", statsmodels "
                                                     << figure.value);
        ++compared;
    }
    BOOST_TEST_MESSAGE("compared " << compared << " figures with statsmodels");
}

BOOST_AUTO_TEST_SUITE_END()
