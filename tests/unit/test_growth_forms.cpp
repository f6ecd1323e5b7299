// PRODGROWTH and PRODTFP with translog and ces models through the cell path (a model typed into
// cells or a PRODFIT table, read by the model reader), on invented, seeded data made by a known
// technology and TFP path (growth_series.hpp). Sources, named beside each check:
// - "quadratic lemma": W. E. Diewert, "Exact and superlative index numbers", Journal of
//   Econometrics 4 (1976), 115–145: for a quadratic function in logs (a translog), the change in
//   ln f between two points is exactly the mean of the two points' log-derivatives times the change
//   in the logs (from memory). So the Törnqvist account of a translog recovers TFP growth exactly.
// - "least squares": the residuals of a least-squares fit with a constant sum to zero (normal
//   equation of the constant), so on the fitting sample the mean of ln(Y/f(x)) is 0.
// Tolerances: recoveryTolerance (growth_checks.hpp).
#include "isoquant/sheet/functions/production_functions.hpp"
#include "isoquant/sheet/tables/fit_table.hpp"
#include "isoquant/sheet/functions/growth_functions.hpp"
#include "isoquant/math/messages/input_error.hpp"
#include "ces_test_technology.hpp"
#include "cell_tables.hpp"
#include "growth_checks.hpp"
#include "growth_series.hpp"

#include <boost/test/unit_test.hpp>

#include <cmath>

using isoquant::CellTable;
using isoquant::testing::checkRowsAddUp;
using isoquant::testing::generate;
using isoquant::testing::Generated;
using isoquant::testing::labelledOutput;
using isoquant::testing::labels;
using isoquant::testing::number;
using isoquant::testing::numberRange;
using isoquant::testing::recoveryTolerance;

namespace {

// A typed translog model (production_model.hpp): form, ln A, one αᵢ row per label, then one
// "<label i>*<label j>" row per pair i ≤ j holding βᵢⱼ (the ½ convention of translog.hpp).
CellTable typedTranslog(double logScale, const Eigen::VectorXd& firstOrder, const Eigen::MatrixXd& interactions)
{
    const auto k = static_cast<std::size_t>(firstOrder.size());
    CellTable model(2 + k + k * (k + 1) / 2, 2);
    model.set(0, 0, std::string("form"));
    model.set(0, 1, std::string("translog"));
    model.set(1, 0, std::string("ln A"));
    model.set(1, 1, logScale);
    std::size_t row = 2;
    for (std::size_t i = 0; i < k; ++i, ++row) {
        model.set(row, 0, labels[i]);
        model.set(row, 1, firstOrder(static_cast<Eigen::Index>(i)));
    }
    for (std::size_t i = 0; i < k; ++i)
        for (std::size_t j = i; j < k; ++j, ++row) {
            model.set(row, 0, labels[i] + "*" + labels[j]);
            model.set(row, 1, interactions(static_cast<Eigen::Index>(i), static_cast<Eigen::Index>(j)));
        }
    return model;
}

// A typed ces model of labour and capital: form, an "inputs" row naming them, ln A, delta, rho, nu.
CellTable typedCes(const isoquant::CesParameters& parameters)
{
    const isoquant::Cell none;
    return isoquant::testing::typedRange({{std::string("form"), std::string("ces"), none},
                                          {std::string("inputs"), std::string("labour"), std::string("capital")},
                                          {std::string("ln A"), std::log(parameters.scale), none},
                                          {std::string("delta"), parameters.weight, none},
                                          {std::string("rho"), parameters.rho, none},
                                          {std::string("nu"), parameters.returns, none}});
}

// PRODTFP over the rows a PRODFIT table of `form` was fitted to: 150 invented plants (seeded), both
// inputs log-uniform on [1, 500], ln Y = the technology's plus noise of SD 0.05.
template <typename Technology>
Eigen::VectorXd productivityOnFittedRows(const Technology& technology, unsigned seed, const char* form)
{
    std::mt19937 engine(seed);
    std::uniform_real_distribution<double> logInput(0.0, std::log(500.0));
    std::normal_distribution<double> noise(0.0, 0.05);
    Eigen::MatrixXd inputs(150, 2);
    Eigen::VectorXd output(150);
    for (Eigen::Index row = 0; row < 150; ++row) {
        inputs(row, 0) = std::exp(logInput(engine));
        inputs(row, 1) = std::exp(logInput(engine));
        output(row) = std::exp(technology.logOutput(inputs.row(row).transpose()) + noise(engine));
    }
    isoquant::FitArguments arguments;
    arguments.output = numberRange(output, {"output"});
    arguments.inputs = numberRange(inputs, {"labour", "capital"});
    arguments.form = std::string(form);
    const CellTable model = isoquant::fitTable(isoquant::fitFromArguments(arguments));
    return isoquant::testing::columnValuesUnder(isoquant::productivityColumn(model, arguments.output, arguments.inputs),
                                                "TFP");
}

} // namespace

BOOST_AUTO_TEST_SUITE(growth_forms)

// A translog model typed into cells, through PRODGROWTH's and PRODTFP's cell path (the model
// reader, the core's translog form): by the quadratic lemma (Diewert 1976) the Törnqvist account
// recovers TFP growth exactly, with returns to scale that vary (ν ≠ 1, so the scale effect is not
// zero); PRODTFP gives A_t itself. The data come from TranslogStandIn, an implementation apart.
BOOST_AUTO_TEST_CASE(typed_translog_model_through_the_cell_path)
{
    Eigen::Matrix3d quadratic;
    quadratic << -0.05, 0.02, 0.01, 0.02, -0.04, 0.015, 0.01, 0.015, -0.03;
    const Eigen::Vector3d linear(0.6, 0.35, 0.2);
    const isoquant::testing::TranslogStandIn technology(0.4, linear, quadratic);
    const Generated data = generate(8, technology, 25);
    const CellTable model = typedTranslog(0.4, linear, quadratic);
    const CellTable table = isoquant::growthAccountTable(labelledOutput(data.output),
                                                         numberRange(data.quantities, labels), model, {});
    checkRowsAddUp(table);
    const Eigen::VectorXd levels = isoquant::testing::columnValuesUnder(
        isoquant::productivityColumn(model, labelledOutput(data.output), numberRange(data.quantities, labels)), "TFP");
    double largestScaleEffect = 0;
    for (Eigen::Index t = 1; t < 25; ++t) {
        const auto row = static_cast<std::size_t>(t);
        BOOST_TEST_INFO("period " << t + 1);
        BOOST_TEST(std::fabs(number(table, row, 6) - (data.logProductivity(t) - data.logProductivity(t - 1))) <=
                   recoveryTolerance);
        largestScaleEffect = std::max(largestScaleEffect, std::fabs(number(table, row, 5)));
    }
    BOOST_TEST(largestScaleEffect > 1e-4);
    for (Eigen::Index t = 0; t < 25; ++t) {
        BOOST_TEST_INFO("period " << t + 1);
        BOOST_TEST(std::fabs(std::log(levels(t)) - data.logProductivity(t)) <= recoveryTolerance);
    }
    // Its elasticities vary by period: "fixed" is refused.
    BOOST_CHECK_THROW(isoquant::growthAccountTable(labelledOutput(data.output), numberRange(data.quantities, labels),
                                                   model, std::string("fixed")),
                      isoquant::InputError);
}

// A ces model typed into cells (ν = 1.1, σ = 1/1.6): PRODGROWTH weighs each interval by the mean of
// its two periods' elasticities εᵢ = ν·sᵢ, recomputed here from CesTestTechnology (the textbook
// formula, an implementation apart), each contribution is ε̄ᵢ/ν̄·Δln xᵢ and the scale effect
// (ν − 1)·Σ(ε̄ᵢ/ν)·Δln xᵢ (growth_accounting.hpp); PRODTFP gives A_t. A ces ln f is not quadratic in
// logs, so the Törnqvist account is not exact for it: only the formula is checked here.
BOOST_AUTO_TEST_CASE(typed_ces_model_through_the_cell_path)
{
    isoquant::CesParameters parameters;
    parameters.scale = 2.5;
    parameters.weight = 0.35;
    parameters.rho = 0.6;
    parameters.returns = 1.1;
    const isoquant::testing::CesTestTechnology technology(parameters);
    const Generated data = generate(9, technology, 20);
    const std::vector<std::string> twoLabels{"labour", "capital"};
    const CellTable model = typedCes(parameters);
    const CellTable table = isoquant::growthAccountTable(labelledOutput(data.output),
                                                         numberRange(data.quantities, twoLabels), model, {});
    checkRowsAddUp(table);
    for (Eigen::Index t = 1; t < 20; ++t) {
        const auto row = static_cast<std::size_t>(t);
        const Eigen::VectorXd before = data.quantities.row(t - 1).transpose();
        const Eigen::VectorXd after = data.quantities.row(t).transpose();
        double contributions = 0;
        for (Eigen::Index i = 0; i < 2; ++i) {
            const double meanElasticity = 0.5 * (technology.elasticity(before, i) + technology.elasticity(after, i));
            const double contribution = meanElasticity / 1.1 * std::log(after(i) / before(i));
            contributions += contribution;
            BOOST_TEST_INFO("period " << t + 1 << ", input " << i + 1);
            BOOST_TEST(std::fabs(number(table, row, 2 + static_cast<std::size_t>(i)) - contribution) <= recoveryTolerance);
        }
        BOOST_TEST_INFO("period " << t + 1);
        BOOST_TEST(std::fabs(number(table, row, 4) - 0.1 * contributions) <= recoveryTolerance);
    }
    const Eigen::VectorXd levels = isoquant::testing::columnValuesUnder(
        isoquant::productivityColumn(model, labelledOutput(data.output), numberRange(data.quantities, twoLabels)), "TFP");
    for (Eigen::Index t = 0; t < 20; ++t) {
        BOOST_TEST_INFO("period " << t + 1);
        BOOST_TEST(std::fabs(std::log(levels(t)) - data.logProductivity(t)) <= recoveryTolerance);
    }
}

// PRODTFP on the rows a translog PRODFIT table was fitted to (least squares with a constant, so
// the log residuals average 0): geometric mean 1, to 1e-12 as above. Invented plants (seeded) from
// TranslogStandIn with noise of SD 0.05 on ln Y.
BOOST_AUTO_TEST_CASE(translog_fit_productivity_has_geometric_mean_one)
{
    Eigen::Matrix2d quadratic;
    quadratic << -0.04, 0.02, 0.02, -0.03;
    const isoquant::testing::TranslogStandIn technology(0.8, Eigen::Vector2d(0.55, 0.4), quadratic);
    const Eigen::VectorXd levels = productivityOnFittedRows(technology, 10, "translog");
    BOOST_TEST(std::fabs(levels.array().log().mean()) <= 1e-12);
    BOOST_TEST(levels.minCoeff() < 0.95); // the plants do differ
}

// PRODTFP on the rows a ces PRODFIT table was fitted to: ln A is a free parameter of the nonlinear
// least squares, so at the optimum the derivative of the sum of squares in ln A, −2·Σ residuals,
// is 0 and the geometric mean is 1 to the fit's convergence. Invented plants (seeded) from
// CesTestTechnology with noise of SD 0.05 on ln Y. Tolerance 1e-9 on the mean of ln TFP: the fit
// ends with Gauss–Newton steps that bring the estimates to within about 2e-10 of the optimum
// (core/math/src/fits/ces_fit.cpp), and the mean residual moves by at most that much per unit of parameter
// (its derivatives in ln A, δ, ρ and ν are of order 1 here).
BOOST_AUTO_TEST_CASE(ces_fit_productivity_has_geometric_mean_one)
{
    isoquant::CesParameters parameters;
    parameters.scale = 1.8;
    parameters.weight = 0.4;
    parameters.rho = 0.8;
    parameters.returns = 0.95;
    const isoquant::testing::CesTestTechnology technology(parameters);
    const Eigen::VectorXd levels = productivityOnFittedRows(technology, 11, "ces");
    BOOST_TEST(std::fabs(levels.array().log().mean()) <= 1e-9);
    BOOST_TEST(levels.minCoeff() < 0.95); // the plants do differ
}

BOOST_AUTO_TEST_SUITE_END()
