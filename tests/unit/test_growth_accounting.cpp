// PRODGROWTH and PRODTFP on invented, seeded data made by a known technology and a known TFP path
// (growth_series.hpp), and on the Cobb & Douglas (1928) data (tests/data/cobb_douglas_1928.csv).
// Sources, named beside each check:
// - "identity": the growth account is defined with TFP growth as the residual (the Solow residual,
//   R. M. Solow, "Technical change and the aggregate production function", Review of Economics and
//   Statistics 39 (1957), 312–320 (from memory)), so each row adds up to output growth.
// - "quadratic lemma": W. E. Diewert, "Exact and superlative index numbers", Journal of
//   Econometrics 4 (1976), 115–145: for a quadratic function in logs (a translog), the change in
//   ln f between two points is exactly the mean of the two points' log-derivatives times the change
//   in the logs (from memory). So the Törnqvist account of a translog technology recovers TFP growth
//   exactly.
// - "least squares": the residuals of a least-squares fit with a constant sum to zero (normal
//   equation of the constant), so on the fitting sample the mean of ln(Y/f(x)) is 0.
#include "isoquant/sheet/functions/production_functions.hpp"
#include "isoquant/math/forms/cobb_douglas.hpp"
#include "isoquant/sheet/tables/fit_table.hpp"
#include "isoquant/math/growth/growth_accounting.hpp"
#include "isoquant/sheet/functions/growth_functions.hpp"
#include "isoquant/sheet/tables/growth_table.hpp"
#include "cell_tables.hpp"
#include "growth_checks.hpp"
#include "growth_series.hpp"
#include "reference_data.hpp"

#include <boost/test/unit_test.hpp>

#include <cmath>
#include <limits>

using isoquant::CellTable;
using isoquant::testing::checkRowsAddUp;
using isoquant::testing::epsilon;
using isoquant::testing::generate;
using isoquant::testing::Generated;
using isoquant::testing::labelledOutput;
using isoquant::testing::labels;
using isoquant::testing::number;
using isoquant::testing::numberRange;
using isoquant::testing::recoveryTolerance;

BOOST_AUTO_TEST_SUITE(growth_accounting)

// The header row and the size formula of growth_table.hpp: n + 1 rows, k + 4 columns, periods
// numbered 2…n, then "total".
BOOST_AUTO_TEST_CASE(table_layout)
{
    const isoquant::CobbDouglas technology(0.3, Eigen::Vector3d(0.5, 0.3, 0.1));
    const Generated data = generate(1, technology, 12);
    const CellTable table = isoquant::growthAccountTable(
        labelledOutput(data.output), numberRange(data.quantities, labels),
        isoquant::testing::typedCobbDouglas(0.3, technology.exponents, labels), {});
    BOOST_TEST_REQUIRE(table.rows() == isoquant::growthTableRows(12));
    BOOST_TEST_REQUIRE(table.columns() == isoquant::growthTableColumns(3));
    BOOST_TEST(table.rows() == 13u);
    BOOST_TEST(table.columns() == 7u);
    const std::vector<std::string> header{"period", "output growth", "labour", "capital", "energy", "scale effect",
                                          "TFP growth"};
    for (std::size_t column = 0; column < header.size(); ++column)
        BOOST_TEST(table.text(0, column) == header[column]);
    for (std::size_t row = 1; row < 12; ++row) BOOST_TEST(number(table, row, 0) == static_cast<double>(row + 1));
    BOOST_TEST(table.text(12, 0) == "total");
}

// A known Cobb-Douglas technology with decreasing returns (ν = 0.9, so the scale effect is not
// zero) and a known TFP path: PRODGROWTH with the typed model recovers Δln A_t in every period,
// by either method (identical for Cobb-Douglas), and every row adds up (identity).
BOOST_AUTO_TEST_CASE(cobb_douglas_model_recovers_the_tfp_path)
{
    const Eigen::Vector3d exponents(0.5, 0.3, 0.1);
    const isoquant::CobbDouglas technology(0.3, exponents);
    const Generated data = generate(2, technology, 30);
    const CellTable model = isoquant::testing::typedCobbDouglas(0.3, exponents, labels);
    for (const char* method : {"tornqvist", "fixed", ""}) {
        const CellTable table = isoquant::growthAccountTable(labelledOutput(data.output),
                                                             numberRange(data.quantities, labels), model,
                                                             std::string(method));
        checkRowsAddUp(table);
        for (Eigen::Index t = 1; t < 30; ++t) {
            const auto row = static_cast<std::size_t>(t);
            BOOST_TEST_INFO(method << ", period " << t + 1);
            BOOST_TEST(std::fabs(number(table, row, 6) - (data.logProductivity(t) - data.logProductivity(t - 1))) <=
                       recoveryTolerance);
            // Scale effect (ν − 1)·Σ(εᵢ/ν)·Δln xᵢ with ν = 0.9, from the quantities directly.
            const Eigen::Vector3d growth =
                (data.quantities.row(t).array().log() - data.quantities.row(t - 1).array().log()).transpose();
            BOOST_TEST(std::fabs(number(table, row, 5) - (0.9 - 1) * exponents.dot(growth) / 0.9) <= recoveryTolerance);
        }
        BOOST_TEST(std::fabs(number(table, 30, 6) - data.logProductivity(29)) <= 30 * recoveryTolerance);
        BOOST_TEST(std::fabs(number(table, 30, 1) - std::log(data.output(29) / data.output(0))) <= recoveryTolerance);
    }
}

// Cost shares equal to the exponents of a constant-returns technology (cost shares equal output
// elasticities under cost minimisation and constant returns (from memory)): the scale effect is
// zero and the TFP path is recovered again.
BOOST_AUTO_TEST_CASE(cost_shares_recover_the_tfp_path_under_constant_returns)
{
    const Eigen::Vector3d exponents(0.55, 0.35, 0.10);
    const isoquant::CobbDouglas technology(-0.2, exponents);
    const Generated data = generate(3, technology, 25);
    const Eigen::MatrixXd shares = exponents.transpose().replicate(25, 1);
    const CellTable table = isoquant::growthAccountTable(labelledOutput(data.output),
                                                         numberRange(data.quantities, labels),
                                                         numberRange(shares, labels), {});
    checkRowsAddUp(table);
    for (Eigen::Index t = 1; t < 25; ++t) {
        const auto row = static_cast<std::size_t>(t);
        BOOST_TEST_INFO("period " << t + 1);
        BOOST_TEST(std::fabs(number(table, row, 5)) <= recoveryTolerance); // ν = 1: no scale effect
        BOOST_TEST(std::fabs(number(table, row, 6) - (data.logProductivity(t) - data.logProductivity(t - 1))) <=
                   recoveryTolerance);
    }
}

// Cost shares that sum to 0.995 or 1.008 in every period (accepted: within 0.01) are rescaled to
// sum to 1, so when output and every input grow by 10% a period there is no scale effect and no
// TFP growth, and the inputs' contributions add up to ln 1.1 (identity: shares summing to 1 carry
// equal input growth through unchanged). Used as given, 0.995 would leave a scale effect of
// −0.005·ln 1.1 ≈ −4.8e-4 per period, far outside the 1e-12 of recoveryTolerance.
BOOST_AUTO_TEST_CASE(shares_off_by_less_than_the_tolerance_leave_no_scale_effect)
{
    std::mt19937 engine(12);
    const Eigen::MatrixXd shares = isoquant::testing::driftingShares(engine, 10, 3);
    Eigen::MatrixXd quantities(10, 3);
    Eigen::VectorXd output(10);
    for (Eigen::Index t = 0; t < 10; ++t) {
        quantities.row(t) = std::pow(1.1, t) * Eigen::RowVector3d(40.0, 75.0, 12.0);
        output(t) = std::pow(1.1, t) * 90.0;
    }
    for (const double sum : {0.995, 1.008}) {
        const CellTable table = isoquant::growthAccountTable(numberRange(output), numberRange(quantities),
                                                             numberRange(sum * shares), {});
        checkRowsAddUp(table);
        for (std::size_t row = 1; row < table.rows(); ++row) {
            const double periods = row + 1 < table.rows() ? 1.0 : 9.0; // the total row spans 9 periods
            BOOST_TEST_INFO("shares summing to " << sum << ", row " << row + 1);
            BOOST_TEST(std::fabs(number(table, row, 5)) <= periods * recoveryTolerance); // scale effect
            BOOST_TEST(std::fabs(number(table, row, 6)) <= periods * recoveryTolerance); // TFP growth
            BOOST_TEST(std::fabs(number(table, row, 2) + number(table, row, 3) + number(table, row, 4) -
                                 periods * std::log(1.1)) <= periods * recoveryTolerance);
        }
    }
}

// Drifting cost shares: each contribution is ½(sᵢ,t−1 + sᵢ,t)/ν̄·Δln xᵢ, and the inputs' total
// (contributions plus scale effect, Σ s̄ᵢ Δln xᵢ) is the growth of PRODINDEX's Törnqvist index of
// the same quantities and shares (index_numbers.hpp): the two functions agree.
BOOST_AUTO_TEST_CASE(drifting_shares_match_the_tornqvist_input_index)
{
    std::mt19937 engine(4);
    const Eigen::MatrixXd quantities = isoquant::testing::wanderingQuantities(engine, 20, 3);
    const Eigen::MatrixXd shares = isoquant::testing::driftingShares(engine, 20, 3);
    const Eigen::VectorXd output = isoquant::testing::productivityPath(engine, 20).array().exp() * 50.0;
    const CellTable table = isoquant::growthAccountTable(numberRange(output), numberRange(quantities),
                                                         numberRange(shares), std::string("Tornqvist"));
    checkRowsAddUp(table);
    const Eigen::VectorXd index = isoquant::testing::columnValues(
        isoquant::quantityIndexColumn(numberRange(quantities), numberRange(shares), {}, {}));
    for (Eigen::Index t = 1; t < 20; ++t) {
        const auto row = static_cast<std::size_t>(t);
        double inputs = 0;
        for (std::size_t column = 2; column <= 5; ++column) inputs += number(table, row, column);
        BOOST_TEST_INFO("period " << t + 1);
        BOOST_TEST(std::fabs(inputs - std::log(index(t) / index(t - 1))) <= recoveryTolerance);
        const double averageShare = 0.5 * (shares(t - 1, 0) + shares(t, 0));
        const double scale = 0.5 * (shares.row(t - 1).sum() + shares.row(t).sum());
        BOOST_TEST(std::fabs(number(table, row, 2) -
                             averageShare / scale * std::log(quantities(t, 0) / quantities(t - 1, 0))) <=
                   recoveryTolerance);
    }
    // Without a header the inputs are "input 1"…
    BOOST_TEST(table.text(0, 2) == "input 1");
}

// Elasticities that vary by period, through the Technology interface, as a translog model will
// give them (TranslogStandIn): the Törnqvist account weighs each interval by the mean of its two
// periods' elasticities and, by the quadratic lemma, recovers the TFP path exactly. Elasticities
// of one period alone (the later one) miss it: the check can tell the two apart.
BOOST_AUTO_TEST_CASE(per_period_elasticities_of_a_translog_recover_the_tfp_path)
{
    Eigen::Matrix3d quadratic;
    quadratic << -0.05, 0.02, 0.01, 0.02, -0.04, 0.015, 0.01, 0.015, -0.03;
    const isoquant::testing::TranslogStandIn technology(0.4, Eigen::Vector3d(0.6, 0.35, 0.2), quadratic);
    const Generated data = generate(5, technology, 30);

    const Eigen::MatrixXd elasticities = isoquant::periodElasticities(technology, data.quantities);
    BOOST_TEST(elasticities.col(0).maxCoeff() - elasticities.col(0).minCoeff() > 0.01); // they do vary
    const isoquant::GrowthAccount account =
        isoquant::accountForGrowth(data.output, data.quantities, isoquant::tornqvistIntervalWeights(elasticities));
    const isoquant::GrowthAccount laterOnly =
        isoquant::accountForGrowth(data.output, data.quantities, elasticities.bottomRows(29));
    double largestMiss = 0;
    for (Eigen::Index t = 1; t < 30; ++t) {
        const double truth = data.logProductivity(t) - data.logProductivity(t - 1);
        const auto& period = account.periods[static_cast<std::size_t>(t - 1)];
        BOOST_TEST_INFO("period " << t + 1);
        BOOST_TEST(std::fabs(period.productivity - truth) <= recoveryTolerance);
        BOOST_TEST(std::fabs(period.output - (period.inputs.sum() + period.scaleEffect + period.productivity)) <=
                   5 * epsilon * (std::fabs(period.output) + period.inputs.cwiseAbs().sum() +
                                  std::fabs(period.scaleEffect) + std::fabs(period.productivity)));
        largestMiss = std::max(largestMiss, std::fabs(laterOnly.periods[static_cast<std::size_t>(t - 1)].productivity - truth));
    }
    BOOST_TEST(largestMiss > 1e-5);
}

// PRODTFP with the true technology typed in: Y_t / f(x_t) = A_t (ln A_1 = 0 here), and its
// log-differences are PRODGROWTH's TFP growth.
BOOST_AUTO_TEST_CASE(productivity_levels_are_the_tfp_path)
{
    const Eigen::Vector3d exponents(0.5, 0.3, 0.1);
    const isoquant::CobbDouglas technology(0.3, exponents);
    const Generated data = generate(6, technology, 20);
    const CellTable model = isoquant::testing::typedCobbDouglas(0.3, exponents, labels);
    const Eigen::VectorXd levels = isoquant::testing::columnValuesUnder(
        isoquant::productivityColumn(model, labelledOutput(data.output), numberRange(data.quantities, labels)), "TFP");
    const CellTable table = isoquant::growthAccountTable(labelledOutput(data.output),
                                                         numberRange(data.quantities, labels), model, {});
    for (Eigen::Index t = 0; t < 20; ++t) {
        BOOST_TEST_INFO("period " << t + 1);
        BOOST_TEST(std::fabs(std::log(levels(t)) - data.logProductivity(t)) <= recoveryTolerance);
        if (t > 0)
            BOOST_TEST(std::fabs(std::log(levels(t) / levels(t - 1)) - number(table, static_cast<std::size_t>(t), 6)) <=
                       recoveryTolerance);
    }
}

// PRODTFP on the sample a PRODFIT table was fitted to: invented plants (seeded) with noise u of
// SD 0.05 on ln Y. The geometric mean is 1 (least squares, to rounding: 1e-12 on ln values of order
// 10); the arithmetic mean is about exp(σ²/2) ≈ 1.001 with sampling SD about 0.05/√200 ≈ 0.0035,
// so it lies within 0.02 of 1 (over 5 SD).
BOOST_AUTO_TEST_CASE(productivity_averages_one_on_the_fitting_sample)
{
    std::mt19937 engine(7);
    std::uniform_real_distribution<double> logInput(0.0, std::log(1000.0));
    std::normal_distribution<double> noise(0.0, 0.05);
    const Eigen::Index plants = 200;
    Eigen::MatrixXd inputs(plants, 2);
    Eigen::VectorXd output(plants);
    for (Eigen::Index row = 0; row < plants; ++row) {
        inputs(row, 0) = std::exp(logInput(engine));
        inputs(row, 1) = std::exp(logInput(engine));
        output(row) = std::exp(1.1 + 0.6 * std::log(inputs(row, 0)) + 0.3 * std::log(inputs(row, 1)) + noise(engine));
    }
    isoquant::FitArguments arguments;
    arguments.output = numberRange(output, {"output"});
    arguments.inputs = numberRange(inputs, {"labour", "capital"});
    const CellTable model = isoquant::fitTable(isoquant::fitFromArguments(arguments));
    const Eigen::VectorXd levels =
        isoquant::testing::columnValuesUnder(isoquant::productivityColumn(model, arguments.output, arguments.inputs), "TFP");
    BOOST_TEST(std::fabs(levels.array().log().mean()) <= 1e-12);
    BOOST_TEST(std::fabs(levels.mean() - 1) <= 0.02);
    BOOST_TEST(levels.minCoeff() < 0.95); // the plants do differ
}

// Cobb & Douglas (1928) data, fitted here (least squares with a constant): PRODTFP's geometric
// mean over the 24 years is 1, to rounding (least squares).
BOOST_AUTO_TEST_CASE(cobb_douglas_1928_productivity_has_geometric_mean_one)
{
    const auto arguments = isoquant::testing::cobbDouglas1928Arguments();
    const CellTable model = isoquant::fitTable(isoquant::fitFromArguments(arguments));
    const Eigen::VectorXd levels =
        isoquant::testing::columnValuesUnder(isoquant::productivityColumn(model, arguments.output, arguments.inputs), "TFP");
    BOOST_TEST(levels.size() == 24);
    BOOST_TEST(std::fabs(levels.array().log().mean()) <= 1e-12);
}

BOOST_AUTO_TEST_SUITE_END()
