// Properties of PRODFRONTIER and PRODEFFICIENCY on invented data (no outside figures: those are in
// test_frontier_cross_check.cpp): the analytic score against differences of the log-likelihood,
// E[exp(−u)|ε] on 100,000 rows against the true mean efficiency, the table's layout and lookups,
// the efficiency column's header rules, and bad input.
#include "isoquant/sheet/tables/fit_table.hpp"
#include "isoquant/math/frontier/normal_tail.hpp"
#include "isoquant/math/frontier/stochastic_frontier.hpp"
#include "isoquant/sheet/functions/frontier_functions.hpp"
#include "isoquant/sheet/tables/frontier_table.hpp"
#include "cell_tables.hpp"
#include "input_error_message.hpp"
#include "relative_error.hpp"

#include <boost/math/distributions/chi_squared.hpp>
#include <boost/test/unit_test.hpp>

#include <chrono>
#include <cmath>
#include <random>

namespace {

using isoquant::testing::closeTo;
using isoquant::testing::messageOf;
using isoquant::testing::numberRange;

struct Invented {
    Eigen::MatrixXd output; // n × 1
    Eigen::MatrixXd inputs; // n × 2
    double meanEfficiency = 0; // the mean of exp(−u) actually drawn
};

// ln y = 1 + 0.6 ln x1 + 0.3 ln x2 + v − u, x log-uniform on [1, 100], v ~ N(0, 0.2²), u half-normal
// of σᵤ = `inefficiencySd` or exponential of that mean; std::mt19937_64 seeded with `seed`.
Invented invent(Eigen::Index rows, isoquant::InefficiencyDistribution distribution, double inefficiencySd,
                unsigned seed, double sign = -1)
{
    std::mt19937_64 engine(seed);
    std::uniform_real_distribution<double> logInput(0.0, std::log(100.0));
    std::normal_distribution<double> noise(0.0, 0.2), halfNormal(0.0, inefficiencySd);
    std::exponential_distribution<double> exponential(1.0 / inefficiencySd);
    Invented data{Eigen::MatrixXd(rows, 1), Eigen::MatrixXd(rows, 2), 0};
    for (Eigen::Index row = 0; row < rows; ++row) {
        const double l1 = logInput(engine), l2 = logInput(engine);
        const double u = distribution == isoquant::InefficiencyDistribution::halfNormal ? std::fabs(halfNormal(engine))
                                                                                      : exponential(engine);
        data.inputs(row, 0) = std::exp(l1);
        data.inputs(row, 1) = std::exp(l2);
        data.output(row, 0) = std::exp(1 + 0.6 * l1 + 0.3 * l2 + noise(engine) + sign * u);
        data.meanEfficiency += std::exp(-u) / static_cast<double>(rows);
    }
    return data;
}

isoquant::FrontierArguments argumentsOf(const Invented& data, const std::string& inefficiency)
{
    return {numberRange(data.output, {"output"}), numberRange(data.inputs, {"labour", "capital"}),
            isoquant::Cell{}, inefficiency, isoquant::Cell{}, {}};
}

const char* words[] = {"half-normal", "exponential"};
const isoquant::InefficiencyDistribution distributions[] = {isoquant::InefficiencyDistribution::halfNormal,
                                                            isoquant::InefficiencyDistribution::exponential};

} // namespace

BOOST_AUTO_TEST_SUITE(frontier_properties)

// The score against central differences of ℓ (step 1e-5): 1e-6 relative to the largest component,
// the differences' truncation and rounding error on these data (common practice, no source).
BOOST_AUTO_TEST_CASE(score_is_the_gradient_of_the_log_likelihood)
{
    const Invented data = invent(300, isoquant::InefficiencyDistribution::halfNormal, 0.4, 3);
    const Eigen::MatrixXd design = isoquant::frontierDesign(isoquant::ProductionForm::cobbDouglas, data.inputs,
                                                            Eigen::MatrixXd(300, 0));
    const Eigen::VectorXd response = data.output.col(0).array().log().matrix();
    Eigen::VectorXd theta(5);
    theta << 1.1, 0.55, 0.35, std::log(0.25), std::log(0.3);
    for (const auto distribution : distributions) {
        const Eigen::VectorXd score = isoquant::frontierScore(distribution, {design, response}, theta);
        for (Eigen::Index j = 0; j < theta.size(); ++j) {
            Eigen::VectorXd ahead = theta, behind = theta;
            ahead(j) += 1e-5;
            behind(j) -= 1e-5;
            const double difference = (isoquant::frontierLogLikelihood(distribution, {design, response}, ahead) -
                                       isoquant::frontierLogLikelihood(distribution, {design, response}, behind)) / 2e-5;
            BOOST_TEST(std::fabs(score(j) - difference) <= 1e-6 * score.cwiseAbs().maxCoeff(), "component " << j);
        }
    }
}

// ln Φ has no jump where it switches from erfc to the asymptotic series (at −37): its central
// difference across the switch (step 1e-6) equals its slope φ/Φ there to 1e-6 relative; a jump of
// 1e-12 relative (7e-10) would change the difference by 3.5e-4 relative. The difference's own
// rounding error is about 1e-13/1e-6 = 1e-7 of the slope 37 (common practice, no source).
BOOST_AUTO_TEST_CASE(log_normal_cdf_is_continuous_at_its_switch)
{
    const double step = 1e-6;
    const double slope = (isoquant::logNormalCdf(-37.0 + step) - isoquant::logNormalCdf(-37.0 - step)) / (2 * step);
    BOOST_TEST(closeTo(slope, isoquant::inverseMillsRatio(-37.0), 1e-6));
    BOOST_TEST(std::isfinite(isoquant::logNormalCdf(-1e5)));
    BOOST_TEST(std::isfinite(isoquant::inverseMillsRatio(-1e5)));
}

// On 100,000 invented rows the mean of E[exp(−u)|ε] is within 0.005 of the mean of the exp(−u)
// drawn: the prediction error of each row (sd about 0.1 here) averages out to about 3e-4, and the
// estimation error of σᵤ, σᵥ and β moves the mean by about as much; 0.005 is over ten times both
// (a bound set from those sizes: common practice, no source).
BOOST_AUTO_TEST_CASE(mean_efficiency_approaches_the_true_mean_on_100000_rows)
{
    for (int d = 0; d < 2; ++d) {
        const Invented data = invent(100000, distributions[d], d == 0 ? 0.4 : 0.25, 11 + d);
        const isoquant::ProductionFrontier frontier = isoquant::frontierFromArguments(argumentsOf(data, words[d]));
        BOOST_TEST_CONTEXT(words[d])
        {
            BOOST_TEST(isoquant::frontierStatusWord(frontier.fit.status.kind) == "converged");
            BOOST_TEST(std::fabs(isoquant::meanEfficiency(frontier.fit) - data.meanEfficiency) <= 0.005,
                       isoquant::meanEfficiency(frontier.fit) << " vs " << data.meanEfficiency);
        }
    }
}

// The performance target (report, not assert): a frontier fit of 10,000 rows in the core.
BOOST_AUTO_TEST_CASE(time_of_a_10000_row_fit_is_reported)
{
    const Invented data = invent(10000, isoquant::InefficiencyDistribution::halfNormal, 0.4, 5);
    const auto arguments = argumentsOf(data, "half-normal");
    const auto start = std::chrono::steady_clock::now();
    const isoquant::ProductionFrontier frontier = isoquant::frontierFromArguments(arguments);
    const double seconds = std::chrono::duration<double>(std::chrono::steady_clock::now() - start).count();
    BOOST_TEST_MESSAGE("frontier fit, 10,000 rows, half-normal: " << seconds * 1000 << " ms, "
                                                                  << frontier.fit.evaluations << " score evaluations");
    BOOST_TEST(isoquant::frontierStatusWord(frontier.fit.status.kind) == "converged");
}

BOOST_AUTO_TEST_CASE(table_layout_and_lookups)
{
    const Invented data = invent(500, isoquant::InefficiencyDistribution::halfNormal, 0.4, 7);
    const isoquant::CellTable table = isoquant::frontierTable(isoquant::frontierFromArguments(argumentsOf(data, "")));
    BOOST_TEST(table.rows() == 18u); // k + m + 16 with k = 2, m = 0
    BOOST_TEST(table.rows() == isoquant::frontierTableRows(isoquant::ProductionForm::cobbDouglas, 2, 0));
    BOOST_TEST(table.columns() == 7u);
    const std::vector<std::string> labels{"half-normal frontier", "ln A", "labour", "capital", "",
                                          "noise SD", "inefficiency SD", "lambda", "observations", "log-likelihood",
                                          "AIC", "BIC", "inefficiency test", "mean efficiency", "returns to scale",
                                          "verdict", "convergence", "form"};
    for (std::size_t row = 0; row < labels.size(); ++row)
        BOOST_TEST((labels[row].empty() ? table.isEmpty(row, 0) : table.text(row, 0) == labels[row]), "row " << row);
    BOOST_TEST(table.text(0, 1) == "value");
    BOOST_TEST(table.text(17, 1) == "cobb-douglas");
    BOOST_TEST(table.text(16, 1) == "converged");
    // PRODSTAT's lookup reads the new rows: σᵥ, the test's p-value, λ = σᵤ/σᵥ to rounding (1e-14).
    const double noise = std::get<double>(isoquant::lookUpFitTable(table, std::string("noise SD"), isoquant::Cell{}));
    const double inefficiency = std::get<double>(isoquant::lookUpFitTable(table, std::string("inefficiency SD"), {}));
    const double lambda = std::get<double>(isoquant::lookUpFitTable(table, std::string("lambda"), {}));
    BOOST_TEST(closeTo(lambda, inefficiency / noise, 1e-14));
    // The test of σᵤ = 0: p = ½ P(χ²(1) > LR) (Kodde and Palm 1986), here by Boost's χ² directly: 1e-14.
    const double statistic = std::get<double>(isoquant::lookUpFitTable(table, std::string("inefficiency test"), {}));
    const double pValue = std::get<double>(isoquant::lookUpFitTable(table, std::string("inefficiency test"),
                                                                    std::string("p-value")));
    BOOST_TEST(statistic > 0.0);
    BOOST_TEST(closeTo(pValue, 0.5 * boost::math::cdf(boost::math::complement(
                                         boost::math::chi_squared_distribution<double>(1), statistic)), 1e-14));
    const isoquant::ProductionFrontier translog = isoquant::frontierFromArguments(
        {numberRange(data.output), numberRange(data.inputs), std::string("translog"), std::string("exponential"), 0.9, {}});
    const isoquant::CellTable translogTable = isoquant::frontierTable(translog);
    BOOST_TEST(translogTable.rows() == 21u); // k + k(k+1)/2 + m + 16 = 2 + 3 + 0 + 16
    BOOST_TEST(translogTable.text(0, 0) == "exponential frontier");
    BOOST_TEST(translogTable.text(4, 0) == "input 1*input 1");
}

BOOST_AUTO_TEST_CASE(efficiency_column_follows_the_header_rules)
{
    const Invented data = invent(200, isoquant::InefficiencyDistribution::halfNormal, 0.4, 9);
    const isoquant::CellTable model = isoquant::frontierTable(isoquant::frontierFromArguments(argumentsOf(data, "")));
    const isoquant::CellTable output = numberRange(data.output, {"output"});
    const isoquant::CellTable column =
        isoquant::efficiencyColumn(model, output, numberRange(data.inputs, {"labour", "capital"}), {});
    const Eigen::VectorXd efficiency = isoquant::testing::columnValuesUnder(column, "efficiency");
    BOOST_TEST(efficiency.size() == 200);
    BOOST_TEST(efficiency.maxCoeff() <= 1.0);
    BOOST_TEST(efficiency.minCoeff() > 0.0);
    // Columns matched by their labels in any order: the same numbers.
    Eigen::MatrixXd swapped(200, 2);
    swapped << data.inputs.col(1), data.inputs.col(0);
    const Eigen::VectorXd reordered = isoquant::testing::columnValuesUnder(
        isoquant::efficiencyColumn(model, output, numberRange(swapped, {"capital", "labour"}), {}), "efficiency");
    BOOST_TEST((reordered - efficiency).cwiseAbs().maxCoeff() == 0.0);
    const Eigen::VectorXd lower = isoquant::testing::columnValuesUnder(
        isoquant::efficiencyColumn(model, output, numberRange(data.inputs, {"labour", "capital"}), std::string("lower bound")),
        "efficiency lower bound");
    const Eigen::VectorXd upper = isoquant::testing::columnValuesUnder(
        isoquant::efficiencyColumn(model, output, numberRange(data.inputs, {"labour", "capital"}), std::string("upper bound")),
        "efficiency upper bound");
    BOOST_TEST((lower.array() <= efficiency.array()).all());
    BOOST_TEST((efficiency.array() <= upper.array()).all());
    // One row without a header: the plain value.
    const isoquant::CellTable single = isoquant::efficiencyColumn(
        model, numberRange(data.output.topRows(1)), numberRange(data.inputs.topRows(1)), std::string("inefficiency"));
    BOOST_TEST(single.rows() == 1u);
    BOOST_TEST(std::get<double>(single.at(0, 0)) > 0.0);
}

// A control enters the frontier as it is; PRODEFFICIENCY then takes it after the inputs, by position
// or by its header label. Its coefficient is near the 0.5 it was drawn with (within 4 standard
// errors: common practice, no source), and the efficiencies equal those from the columns reordered.
BOOST_AUTO_TEST_CASE(controls_enter_the_frontier_and_the_efficiency_column)
{
    Invented data = invent(400, isoquant::InefficiencyDistribution::halfNormal, 0.4, 21);
    Eigen::MatrixXd control(400, 1);
    for (Eigen::Index row = 0; row < 400; ++row) {
        control(row, 0) = row % 2;
        data.output(row, 0) *= std::exp(0.5 * control(row, 0));
    }
    isoquant::FrontierArguments arguments = argumentsOf(data, "");
    arguments.controls = numberRange(control, {"night shift"});
    const isoquant::ProductionFrontier frontier = isoquant::frontierFromArguments(arguments);
    const isoquant::CellTable table = isoquant::frontierTable(frontier);
    BOOST_TEST(table.rows() == 19u); // k + m + 16 = 2 + 1 + 16
    BOOST_TEST(table.text(4, 0) == "night shift (control)");
    BOOST_TEST(std::fabs(frontier.coefficients[3].estimate - 0.5) <= 4 * frontier.coefficients[3].standardError);
    Eigen::MatrixXd columns(400, 3), reordered(400, 3);
    columns << data.inputs, control;
    reordered << control, data.inputs.col(1), data.inputs.col(0);
    const Eigen::VectorXd byPosition = isoquant::testing::columnValues(
        isoquant::efficiencyColumn(table, numberRange(data.output), numberRange(columns), {}));
    const Eigen::VectorXd byLabel = isoquant::testing::columnValuesUnder(
        isoquant::efficiencyColumn(table, numberRange(data.output, {"output"}),
                                   numberRange(reordered, {"night shift", "capital", "labour"}), {}),
        "efficiency");
    BOOST_TEST((byPosition - byLabel).cwiseAbs().maxCoeff() == 0.0);
    BOOST_TEST(byPosition.maxCoeff() <= 1.0);
}

BOOST_AUTO_TEST_CASE(wrong_skew_table_and_efficiency)
{
    const Invented data = invent(300, isoquant::InefficiencyDistribution::halfNormal, 0.4, 13, +1);
    const isoquant::CellTable model = isoquant::frontierTable(isoquant::frontierFromArguments(argumentsOf(data, "")));
    BOOST_TEST(std::get<double>(isoquant::lookUpFitTable(model, std::string("inefficiency SD"), {})) == 0.0);
    BOOST_TEST(std::get<std::string>(isoquant::lookUpFitTable(model, std::string("form"), std::string("std. error"))) ==
               "no inefficiency found: residuals skewed the wrong way");
    const Eigen::VectorXd efficiency = isoquant::testing::columnValuesUnder(
        isoquant::efficiencyColumn(model, numberRange(data.output, {"output"}),
                                   numberRange(data.inputs, {"labour", "capital"}), {}),
        "efficiency");
    BOOST_TEST((efficiency.array() == 1.0).all());
}

// 40 invented rows (seed 15) whose half-normal likelihood rises toward σᵥ = 0 (scipy's BFGS from 9
// starts ends at σᵥ below 1e-5 on the same rows, checked by hand, not at test time): the fit says
// "boundary", never "converged", and PRODEFFICIENCY refuses the table.
BOOST_AUTO_TEST_CASE(likelihood_rising_toward_no_noise_is_reported_as_boundary)
{
    const Invented data = invent(40, isoquant::InefficiencyDistribution::halfNormal, 0.4, 15);
    const isoquant::ProductionFrontier frontier = isoquant::frontierFromArguments(argumentsOf(data, ""));
    BOOST_TEST(isoquant::frontierStatusWord(frontier.fit.status.kind) == "boundary");
    const isoquant::CellTable table = isoquant::frontierTable(frontier);
    BOOST_TEST(messageOf([&] {
                   isoquant::efficiencyColumn(table, numberRange(data.output), numberRange(data.inputs), {});
               }) == "model: the frontier did not converge; its estimates are not a maximum, so they are not used");
}

BOOST_AUTO_TEST_CASE(bad_input_names_argument_and_row)
{
    Invented data = invent(40, isoquant::InefficiencyDistribution::halfNormal, 0.4, 15);
    data.output(6, 0) = -2;
    BOOST_TEST(messageOf([&] { isoquant::frontierFromArguments(argumentsOf(data, "")); }) ==
               "output: row 8 is -2; logs need positive values");
    data = invent(40, isoquant::InefficiencyDistribution::halfNormal, 0.4, 15);
    data.inputs.col(1).setZero();
    BOOST_TEST(messageOf([&] { isoquant::frontierFromArguments(argumentsOf(data, "")); }) ==
               "inputs: row 2, column 2 is 0; logs need positive values");
    const Invented few = invent(5, isoquant::InefficiencyDistribution::halfNormal, 0.4, 15);
    BOOST_TEST(messageOf([&] { isoquant::frontierFromArguments(argumentsOf(few, "")); }) ==
               "too few rows: output and inputs have 5 rows of data for 5 parameters of the frontier (with noise SD "
               "and inefficiency SD); need at least 6");
    const Invented fine = invent(200, isoquant::InefficiencyDistribution::halfNormal, 0.4, 9);
    BOOST_TEST(messageOf([&] { isoquant::frontierFromArguments(argumentsOf(fine, "gamma")); }) ==
               "inefficiency: 'gamma' is not a distribution; use \"half-normal\" or \"exponential\"");
    auto ces = argumentsOf(fine, "");
    ces.form = std::string("ces");
    BOOST_TEST(messageOf([&] { isoquant::frontierFromArguments(ces); }) ==
               "form: a frontier takes \"cobb-douglas\" or \"translog\"; the ces form is not offered");
    const isoquant::CellTable model = isoquant::frontierTable(isoquant::frontierFromArguments(argumentsOf(fine, "")));
    Eigen::MatrixXd inputs = fine.inputs;
    inputs(3, 0) = 0;
    BOOST_TEST(messageOf([&] {
                   isoquant::efficiencyColumn(model, numberRange(fine.output, {"output"}),
                                              numberRange(inputs, {"labour", "capital"}), {});
               }) == "inputs: row 5, input 1 is 0; logs need positive values");
    BOOST_TEST(messageOf([&] {
                   isoquant::efficiencyColumn(model, numberRange(fine.output), numberRange(fine.inputs),
                                              std::string("mode"));
               }) == "what: 'mode' is not a measure; use \"efficiency\", \"inefficiency\", \"lower bound\" or "
                     "\"upper bound\"");
    const isoquant::CellTable notFrontier = isoquant::testing::typedRange({{std::string("form"), std::string("cobb-douglas")}});
    BOOST_TEST(messageOf([&] {
                   isoquant::efficiencyColumn(notFrontier, numberRange(fine.output), numberRange(fine.inputs), {});
               }) == "model: is not a PRODFRONTIER table; its first cell reads \"half-normal frontier\" or "
                     "\"exponential frontier\" (select the whole table)");
}

BOOST_AUTO_TEST_SUITE_END()
