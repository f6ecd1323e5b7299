// Fits to data generated from a known Cobb-Douglas technology with small seeded noise, for every
// number of inputs from 1 to 20, through the PRODFIT argument path (ranges without a header).
#include "model_access.hpp"
#include "isoquant/sheet/functions/production_functions.hpp"
#include "isoquant/sheet/tables/fit_table.hpp"
#include "isoquant/sheet/models/production_model.hpp"
#include "cell_tables.hpp"
#include "relative_error.hpp"

#include <boost/test/unit_test.hpp>

#include <cmath>
#include <random>

using isoquant::testing::cobbDouglasOf;

using isoquant::testing::closeTo;

namespace {

struct Generated {
    isoquant::FitArguments arguments;
    Eigen::VectorXd truth; // ln A, then the exponents
};

// n = 40 + 10k rows, inputs log-uniform over [1, 1000], exponents in [0.05, 0.6], noise on ln Y
// normal with SD 0.05.
Generated generate(std::mt19937& engine, int k)
{
    std::uniform_real_distribution<double> exponent(0.05, 0.6);
    std::uniform_real_distribution<double> logInput(0.0, std::log(1000.0));
    std::normal_distribution<double> noise(0.0, 0.05);
    const int n = 40 + 10 * k;
    Generated generated;
    generated.truth.resize(1 + k);
    generated.truth(0) = 0.7;
    for (int i = 1; i <= k; ++i) generated.truth(i) = exponent(engine);
    Eigen::MatrixXd inputs(n, k);
    Eigen::MatrixXd output(n, 1);
    for (int row = 0; row < n; ++row) {
        double logOutput = generated.truth(0) + noise(engine);
        for (int i = 0; i < k; ++i) {
            const double logX = logInput(engine);
            inputs(row, i) = std::exp(logX);
            logOutput += generated.truth(1 + i) * logX;
        }
        output(row, 0) = std::exp(logOutput);
    }
    generated.arguments.output = isoquant::testing::numberRange(output);
    generated.arguments.inputs = isoquant::testing::numberRange(inputs);
    return generated;
}

} // namespace

BOOST_AUTO_TEST_SUITE(recovery)

// Least squares on logs is unbiased here (the model is exactly right), so each estimate lies
// within 4 standard errors of the truth unless something is wrong: a 4-SE miss has probability
// 6e-5 per parameter, and the seed is fixed.
BOOST_AUTO_TEST_CASE(known_technology_is_recovered_for_1_to_20_inputs)
{
    std::mt19937 engine(1928);
    for (int k = 1; k <= 20; ++k) {
        const auto generated = generate(engine, k);
        const auto fit = isoquant::fitFromArguments(generated.arguments);
        BOOST_TEST_REQUIRE(fit.inference.estimates.size() == 1 + k);
        BOOST_TEST(fit.inputLabels.back() == "input " + std::to_string(k));
        for (int j = 0; j <= k; ++j) {
            const double miss = std::fabs(fit.inference.estimates(j) - generated.truth(j));
            BOOST_TEST(miss <= 4 * fit.inference.standardErrors(j),
                       k << " inputs, parameter " << j << ": off by " << miss << ", SE " << fit.inference.standardErrors(j));
        }
        const double nu = generated.truth.tail(k).sum();
        BOOST_TEST(std::fabs(fit.returns.estimate - nu) <= 4 * fit.returns.standardError, k << " inputs: ν");
        // The standard errors are not inflated: the residual SD estimates the noise SD 0.05 with
        // relative sampling error about 1/√(2(n − p)) ≤ 0.1 (n − p ≥ 48), so it lies in
        // [0.03, 0.07], at least 4 of those errors wide on either side.
        BOOST_TEST(fit.summary.residualStandardDeviation >= 0.03);
        BOOST_TEST(fit.summary.residualStandardDeviation <= 0.07);
    }
}

// SE(ν) = √(1ᵀV1) over the exponents' covariance block, checked two ways: from the fit's own
// covariance, and by refitting the same data reparameterised as
//   ln Y = ln A + Σ_{i<k} bᵢ ln(xᵢ/x_k) + ν ln x_k,
// whose last exponent is ν itself, so its standard error must be SE(ν). 1e-9 relative: two
// independent least-squares solutions of a well-conditioned problem.
BOOST_AUTO_TEST_CASE(standard_error_of_nu_is_that_of_the_sum_of_exponents)
{
    std::mt19937 engine(1990);
    for (int k = 1; k <= 20; ++k) {
        for (const char* errors : {"classical", "hc1", "hc3"}) {
            auto generated = generate(engine, k);
            generated.arguments.errors = std::string(errors);
            const auto fit = isoquant::fitFromArguments(generated.arguments);
            const double quadraticForm = fit.inference.covariance.block(1, 1, k, k).sum();
            BOOST_TEST(closeTo(fit.returns.standardError, std::sqrt(quadraticForm), 1e-12));

            isoquant::CellTable ratios = generated.arguments.inputs;
            for (std::size_t row = 0; row < ratios.rows(); ++row)
                for (std::size_t i = 0; i + 1 < ratios.columns(); ++i)
                    ratios.set(row, i, ratios.number(row, i) /
                                        ratios.number(row, ratios.columns() - 1));
            auto reparameterised = generated.arguments;
            reparameterised.inputs = ratios;
            const auto refit = isoquant::fitFromArguments(reparameterised);
            BOOST_TEST(closeTo(refit.inference.estimates(k), fit.returns.estimate, 1e-9));
            BOOST_TEST_INFO(k << " inputs, " << errors << " errors");
            BOOST_TEST(closeTo(refit.inference.standardErrors(k), fit.returns.standardError, 1e-9));
        }
    }
}

// The table and the model reader handle 20 inputs: fitTableRows(20, 0) = 35 rows, and the model
// read back holds the 20 exponents and ln A exactly (cells carry the doubles unchanged).
BOOST_AUTO_TEST_CASE(twenty_inputs_round_trip_through_the_table)
{
    std::mt19937 engine(2020);
    const auto generated = generate(engine, 20);
    const auto fit = isoquant::fitFromArguments(generated.arguments);
    const auto table = isoquant::fitTable(fit);
    BOOST_TEST(table.rows() == 35u);
    BOOST_TEST(table.rows() == isoquant::fitTableRows(20, 0));
    const auto model = isoquant::readProductionModel(table);
    BOOST_TEST_REQUIRE(cobbDouglasOf(model).exponents.size() == 20);
    BOOST_TEST(cobbDouglasOf(model).logScale == fit.inference.estimates(0));
    for (int i = 0; i < 20; ++i) BOOST_TEST(cobbDouglasOf(model).exponents(i) == fit.inference.estimates(1 + i));
}

BOOST_AUTO_TEST_SUITE_END()
