// PRODFRONTIER's maximum-likelihood fits against python3-scipy 1.10.1, recomputed at test time by
// tests/reference/frontier_check.py from the published log-likelihoods (Aigner, Lovell and Schmidt
// 1977, half-normal; Meeusen and van den Broeck 1977, exponential), maximised by BFGS from 9 starts
// and polished by Nelder-Mead, on the rice-farm panel (Feng and Horrace 2012, tests/data) and on
// invented data of known σᵤ, σᵥ (numpy default_rng(17), rows written out by the script).
//
// Tolerances:
// - log-likelihood at given parameters and the per-row E[exp(−u)|ε], E[u|ε] and the bounds of
//   Horrace and Schmidt there: 1e-12 relative (the same closed forms; scipy's log_ndtr and ndtri
//   against the core's erfc and Boost's quantile, each good to a few ulp).
// - the maximised log-likelihood: 1e-9 relative. ℓ is stationary at the maximum, so two solvers
//   stopping within their tolerances agree far closer than their parameters do.
// - parameters (β, ln σᵥ, ln σᵤ): within 1e-3 of scipy's standard error of each. On the rice data
//   the likelihood is flat in σᵤ (se of ln σᵤ up to 2.5), so where two solvers stop differs in
//   absolute terms; a thousandth of a standard error is far below anything a user would read.
// - standard errors: 1e-3 relative, the covariance block's entries within 1e-3·seᵢ·seⱼ. Both
//   are inverses of finite-difference Hessians (the core's
//   by central differences of its analytic score, scipy's by second differences of ℓ with step
//   1e-4) at optima differing as above.
// - wrong skew: the least-squares coefficients 1e-9 relative (two factorisations) and the Gaussian
//   log-likelihood 1e-10; scipy's best half-normal ℓ from 9 starts must not exceed it by more than
//   1e-9 relative (the premise: the maximum is at σᵤ = 0).
//
// CTest runs the script first (test frontier_figures) and passes the file it wrote in
// ISOQUANT_FRONTIER_FIGURES; without that file this test is reported skipped.
#include "isoquant/math/frontier/stochastic_frontier.hpp"
#include "isoquant/sheet/functions/frontier_functions.hpp"
#include "isoquant/sheet/tables/frontier_table.hpp"
#include "isoquant/sheet/arguments/numeric_range.hpp"
#include "cell_tables.hpp"
#include "frontier_figures.hpp"
#include "reference_data.hpp"
#include "reference_figures.hpp"
#include "relative_error.hpp"

#include <boost/test/unit_test.hpp>

#include <cmath>
#include <tuple>

namespace {

using isoquant::testing::closeTo;
using Figures = isoquant::testing::FrontierFigures;

const Figures& figures()
{
    static const Figures read = isoquant::testing::readFrontierFigures("ISOQUANT_FRONTIER_FIGURES");
    return read;
}

boost::test_tools::assertion_result figuresAvailable(boost::unit_test::test_unit_id)
{
    return isoquant::testing::referenceFiguresAvailable("ISOQUANT_FRONTIER_FIGURES", "scipy frontier figures");
}

isoquant::FrontierArguments riceArguments(const std::string& form, const std::string& inefficiency,
                                          const std::vector<std::string>& inputs)
{
    const isoquant::FitArguments fit = isoquant::testing::riceFarmArguments(inputs);
    return {fit.output, fit.inputs, form, inefficiency, isoquant::Cell{}, {}};
}

isoquant::FrontierArguments inventedArguments(const std::string& dataset, const std::string& inefficiency)
{
    const auto& rows = figures().data.at(dataset);
    Eigen::MatrixXd output(rows.size(), 1), inputs(rows.size(), 2);
    for (std::size_t r = 0; r < rows.size(); ++r) {
        const auto row = static_cast<Eigen::Index>(r);
        output(row, 0) = rows[r][0];
        inputs(row, 0) = rows[r][1];
        inputs(row, 1) = rows[r][2];
    }
    return {isoquant::testing::numberRange(output, {"y"}), isoquant::testing::numberRange(inputs, {"x1", "x2"}),
            std::string("cobb-douglas"), inefficiency, isoquant::Cell{}, {}};
}

// The checks of a maximum against scipy's (tolerances in the header).
void compareMaximum(const isoquant::ProductionFrontier& frontier, const std::string& dataset, const std::string& form)
{
    const Figures& f = figures();
    const isoquant::StochasticFrontierFit& fit = frontier.fit;
    BOOST_TEST_CONTEXT(dataset << " " << form)
    {
        BOOST_TEST(isoquant::frontierStatusWord(fit.status.kind) == "converged", fit.status.reason);
        BOOST_TEST(closeTo(fit.logLikelihood, f.one(dataset, form, "llf"), 1e-9));
        const auto& coefficients = f.at(dataset, form, "coefficients");
        const auto& errors = f.at(dataset, form, "coefficient_se");
        BOOST_REQUIRE_EQUAL(static_cast<std::size_t>(fit.coefficients.size()), coefficients.size());
        for (std::size_t j = 0; j < coefficients.size(); ++j) {
            const auto index = static_cast<Eigen::Index>(j);
            BOOST_TEST(std::fabs(fit.coefficients(index) - coefficients[j]) <= 1e-3 * errors[j],
                       "coefficient " << j << ": " << fit.coefficients(index) << " vs " << coefficients[j]);
            BOOST_TEST(closeTo(std::sqrt(fit.covariance(index, index)), errors[j], 1e-3));
        }
        const Eigen::Index p = fit.coefficients.size();
        const double noiseError = f.one(dataset, form, "log_noise_sd_se");
        const double inefficiencyError = f.one(dataset, form, "log_inefficiency_sd_se");
        BOOST_TEST(std::fabs(std::log(fit.noiseSd / f.one(dataset, form, "noise_sd"))) <= 1e-3 * noiseError);
        BOOST_TEST(std::fabs(std::log(fit.inefficiencySd / f.one(dataset, form, "inefficiency_sd"))) <=
                   1e-3 * inefficiencyError);
        BOOST_TEST(closeTo(std::sqrt(fit.covariance(p, p)), noiseError, 1e-3));
        BOOST_TEST(closeTo(std::sqrt(fit.covariance(p + 1, p + 1)), inefficiencyError, 1e-3));
        // PRODFRONTIER's covariance block (covariance TRUE): every entry of the coefficients' block
        // within 1e-3·seᵢ·seⱼ of scipy's, the standard errors' tolerance (a correlation to 1e-3).
        const isoquant::CellTable plain = isoquant::frontierTable(frontier);
        const isoquant::CellTable table = isoquant::frontierTableWithCovariance(frontier, 1.0);
        BOOST_TEST(table.text(plain.rows(), 1) == "likelihood");
        const auto& covariance = f.at(dataset, form, "coefficient_covariance");
        BOOST_REQUIRE_EQUAL(covariance.size(), coefficients.size() * coefficients.size());
        for (std::size_t i = 0; i < coefficients.size(); ++i)
            for (std::size_t j = 0; j < coefficients.size(); ++j)
                BOOST_TEST(std::fabs(table.number(plain.rows() + 1 + i, 1 + j) -
                                     covariance[i * coefficients.size() + j]) <= 1e-3 * errors[i] * errors[j],
                           "covariance " << i << ", " << j);
    }
}

// ℓ and the per-row measures at scipy's given parameters (b from least squares, σᵥ = 0.21, σᵤ = 0.33).
void compareGiven(const isoquant::ProductionFrontier& frontier, const Eigen::MatrixXd& design,
                  const Eigen::VectorXd& response, const std::string& dataset, const std::string& form)
{
    const Figures& f = figures();
    const auto& given = f.at(dataset, form, "given_b");
    const auto p = static_cast<Eigen::Index>(given.size());
    Eigen::VectorXd theta(p + 2);
    for (Eigen::Index j = 0; j < p; ++j) theta(j) = given[static_cast<std::size_t>(j)];
    theta(p) = std::log(0.21);
    theta(p + 1) = std::log(0.33);
    BOOST_TEST_CONTEXT(dataset << " " << form << " at given parameters")
    {
        BOOST_TEST(closeTo(isoquant::frontierLogLikelihood(frontier.fit.distribution, {design, response}, theta),
                           f.one(dataset, form, "given_llf"), 1e-12));
        const Eigen::VectorXd residuals = response - design * theta.head(p);
        const auto& efficiency = f.at(dataset, form, "given_te");
        const auto& inefficiency = f.at(dataset, form, "given_u");
        const auto& lower = f.at(dataset, form, "given_lower");
        const auto& upper = f.at(dataset, form, "given_upper");
        for (Eigen::Index row = 0; row < residuals.size(); ++row) {
            const auto r = static_cast<std::size_t>(row);
            const auto conditional =
                isoquant::inefficiencyGivenResidual(frontier.fit.distribution, residuals(row), 0.21, 0.33);
            BOOST_TEST(closeTo(isoquant::expectedEfficiency(conditional), efficiency[r], 1e-12));
            BOOST_TEST(closeTo(isoquant::expectedInefficiency(conditional), inefficiency[r], 1e-12));
            BOOST_TEST(closeTo(isoquant::efficiencyLowerBound(conditional, 0.95), lower[r], 1e-12));
            BOOST_TEST(closeTo(isoquant::efficiencyUpperBound(conditional, 0.95), upper[r], 1e-12));
        }
    }
}

struct DesignOf {
    Eigen::MatrixXd design;
    Eigen::VectorXd response;
};

DesignOf designOf(const isoquant::FrontierArguments& arguments, isoquant::ProductionForm form)
{
    const Eigen::MatrixXd inputs =
        isoquant::readNumericColumns(arguments.inputs, "inputs", isoquant::ValueRule::positive, "input").values;
    const Eigen::VectorXd output =
        isoquant::readNumericColumns(arguments.output, "output", isoquant::ValueRule::positive, "output").values.col(0);
    return {isoquant::frontierDesign(form, inputs, Eigen::MatrixXd(inputs.rows(), 0)), output.array().log().matrix()};
}

void checkCase(const isoquant::FrontierArguments& arguments, const std::string& dataset, const std::string& form,
               isoquant::ProductionForm productionForm)
{
    const isoquant::ProductionFrontier frontier = isoquant::frontierFromArguments(arguments);
    compareMaximum(frontier, dataset, form);
    const DesignOf data = designOf(arguments, productionForm);
    compareGiven(frontier, data.design, data.response, dataset, form);
}

const std::vector<std::string> riceInputs{"size", "totlabor", "seed", "urea"};

} // namespace

BOOST_AUTO_TEST_SUITE(frontier_cross_check, *boost::unit_test::precondition(figuresAvailable))

BOOST_AUTO_TEST_CASE(rice_farms_half_normal_and_exponential_match_scipy)
{
    checkCase(riceArguments("cobb-douglas", "half-normal", riceInputs), "rice_farms", "half-normal",
              isoquant::ProductionForm::cobbDouglas);
    checkCase(riceArguments("cobb-douglas", "exponential", riceInputs), "rice_farms", "exponential",
              isoquant::ProductionForm::cobbDouglas);
}

BOOST_AUTO_TEST_CASE(rice_farms_translog_half_normal_matches_scipy)
{
    checkCase(riceArguments("translog", "half-normal", riceInputs), "rice_farms", "translog-half-normal",
              isoquant::ProductionForm::translog);
}

BOOST_AUTO_TEST_CASE(invented_frontiers_match_scipy_and_their_generating_values)
{
    checkCase(inventedArguments("invented_half_normal", "half-normal"), "invented_half_normal", "half-normal",
              isoquant::ProductionForm::cobbDouglas);
    checkCase(inventedArguments("invented_exponential", "exponential"), "invented_exponential", "exponential",
              isoquant::ProductionForm::cobbDouglas);
    // The generating σᵥ = 0.2 and σᵤ (0.4 half-normal, 0.25 exponential) within 3 standard errors of
    // their estimates in ln σ (a 3-sigma band: common practice, no source).
    for (const auto& [dataset, inefficiency, trueInefficiency] :
         {std::tuple{"invented_half_normal", "half-normal", 0.4}, std::tuple{"invented_exponential", "exponential", 0.25}}) {
        const isoquant::StochasticFrontierFit fit = isoquant::frontierFromArguments(inventedArguments(dataset, inefficiency)).fit;
        const Eigen::Index p = fit.coefficients.size();
        BOOST_TEST(std::fabs(std::log(fit.noiseSd / 0.2)) <= 3 * std::sqrt(fit.covariance(p, p)));
        BOOST_TEST(std::fabs(std::log(fit.inefficiencySd / trueInefficiency)) <= 3 * std::sqrt(fit.covariance(p + 1, p + 1)));
    }
}

BOOST_AUTO_TEST_CASE(wrong_skew_gives_least_squares)
{
    const Figures& f = figures();
    const std::vector<std::tuple<isoquant::FrontierArguments, std::string, std::string>> cases{
        {inventedArguments("wrong_skew", "half-normal"), "wrong_skew", "ols"},
        {riceArguments("translog", "half-normal", {"size", "totlabor"}), "rice_farms", "translog-ols"}};
    for (const auto& [arguments, dataset, form] : cases) {
        BOOST_TEST_CONTEXT(dataset << " " << form)
        {
            BOOST_TEST(f.one(dataset, form, "third_moment") > 0); // the premise: skewed the wrong way
            const isoquant::ProductionFrontier frontier = isoquant::frontierFromArguments(arguments);
            BOOST_TEST(frontier.fit.wrongSkew);
            BOOST_TEST(frontier.fit.inefficiencySd == 0);
            const auto& coefficients = f.at(dataset, form, "coefficients");
            for (std::size_t j = 0; j < coefficients.size(); ++j)
                BOOST_TEST(closeTo(frontier.fit.coefficients(static_cast<Eigen::Index>(j)), coefficients[j], 1e-9));
            BOOST_TEST(closeTo(frontier.fit.logLikelihood, f.one(dataset, form, "llf"), 1e-10));
            const isoquant::CellTable table = isoquant::frontierTable(frontier);
            BOOST_TEST(table.text(table.rows() - 1, 2) == isoquant::wrongSkewNote);
        }
    }
    const double ols = f.one("wrong_skew", "ols", "llf");
    BOOST_TEST(f.one("wrong_skew", "half-normal", "best_llf") <= ols + 1e-9 * std::fabs(ols));
}

BOOST_AUTO_TEST_SUITE_END()
