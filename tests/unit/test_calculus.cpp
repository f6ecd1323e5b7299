// Properties of the Cobb-Douglas calculus on seeded random technologies and bundles: the analytic
// derivatives agree with finite differences of the function itself, and Euler's theorem holds.
#include "isoquant/math/forms/cobb_douglas.hpp"
#include "relative_error.hpp"

#include <boost/test/unit_test.hpp>

#include <cmath>
#include <random>

using isoquant::testing::closeTo;

namespace {

// Exponents in [0.2, 0.9] keep every derivative well away from 0 (bᵢ and bᵢ − 1 both bounded
// away from 0), so relative comparisons are meaningful; bundles in [0.5, 50].
isoquant::CobbDouglas randomTechnology(std::mt19937& engine, int k)
{
    std::uniform_real_distribution<double> exponent(0.2, 0.9);
    std::uniform_real_distribution<double> logScale(-1.0, 2.0);
    isoquant::CobbDouglas cobbDouglas;
    cobbDouglas.logScale = logScale(engine);
    cobbDouglas.exponents.resize(k);
    for (int i = 0; i < k; ++i) cobbDouglas.exponents(i) = exponent(engine);
    return cobbDouglas;
}

Eigen::VectorXd randomBundle(std::mt19937& engine, int k)
{
    std::uniform_real_distribution<double> input(0.5, 50.0);
    Eigen::VectorXd x(k);
    for (int i = 0; i < k; ++i) x(i) = input(engine);
    return x;
}

// Central difference of f along input i with step h = 1e-6·xᵢ.
template <typename Function>
double centralDifference(Function f, Eigen::VectorXd x, int i)
{
    const double h = 1e-6 * x(i);
    const double base = x(i);
    x(i) = base + h;
    const double up = f(x);
    x(i) = base - h;
    const double down = f(x);
    return (up - down) / ((base + h) - (base - h)); // the step actually taken, after rounding
}

// Finite-difference tolerance. With h = 1e-6·x the truncation error is ~h²·|f'''/f'| ≈ 1e-12
// relative; rounding in f (a few ulps, ≤ 1e-15 relative here) is amplified by x/(h·b) for a first
// derivative and by x/(h·|b − 1|) or x/(h·b) for a second one: ≤ 1e-15/(1e-6·0.1) = 1e-8 for
// exponents in [0.2, 0.9]. 1e-7 is ten times that bound.
constexpr double differenceTolerance = 1e-7;

} // namespace

BOOST_AUTO_TEST_SUITE(calculus)

BOOST_AUTO_TEST_CASE(marginal_products_equal_central_differences_of_output)
{
    std::mt19937 engine(424242);
    for (int k = 1; k <= 20; ++k) {
        const auto cobbDouglas = randomTechnology(engine, k);
        const auto output = [&](const Eigen::VectorXd& x) { return cobbDouglas.output(x); };
        for (int trial = 0; trial < 3; ++trial) {
            const Eigen::VectorXd x = randomBundle(engine, k);
            for (int i = 0; i < k; ++i)
                BOOST_TEST(closeTo(cobbDouglas.marginalProduct(x, i), centralDifference(output, x, i),
                                   differenceTolerance));
        }
    }
}

BOOST_AUTO_TEST_CASE(second_partials_equal_central_differences_of_marginal_products)
{
    std::mt19937 engine(737373);
    for (int k = 1; k <= 8; ++k) {
        const auto cobbDouglas = randomTechnology(engine, k);
        for (int trial = 0; trial < 3; ++trial) {
            const Eigen::VectorXd x = randomBundle(engine, k);
            const Eigen::MatrixXd hessian = cobbDouglas.hessian(x);
            for (int i = 0; i < k; ++i) {
                const auto marginal = [&](const Eigen::VectorXd& at) { return cobbDouglas.marginalProduct(at, i); };
                for (int j = 0; j < k; ++j) {
                    BOOST_TEST(closeTo(cobbDouglas.secondPartial(x, i, j), centralDifference(marginal, x, j),
                                       differenceTolerance));
                    BOOST_TEST(hessian(i, j) == cobbDouglas.secondPartial(x, i, j));
                }
            }
        }
    }
}

// Euler's theorem for a function homogeneous of degree ν: Σ MPᵢ·xᵢ = ν·Y. Each term is bᵢ·Y to a
// few ulps and all terms are positive, so the sum is good to ~k·4·2⁻⁵³ ≤ 1e-14 for k ≤ 20.
BOOST_AUTO_TEST_CASE(euler_sum_of_marginal_products_times_inputs_is_nu_times_output)
{
    std::mt19937 engine(271828);
    for (int k = 1; k <= 20; ++k) {
        const auto cobbDouglas = randomTechnology(engine, k);
        for (int trial = 0; trial < 5; ++trial) {
            const Eigen::VectorXd x = randomBundle(engine, k);
            double sum = 0;
            for (int i = 0; i < k; ++i) sum += cobbDouglas.marginalProduct(x, i) * x(i);
            BOOST_TEST(closeTo(sum, cobbDouglas.scaleElasticity() * cobbDouglas.output(x), 1e-12));
        }
    }
}

// The elasticity ∂ln Y/∂ln xᵢ, by a central difference in logs, is the exponent at every bundle.
BOOST_AUTO_TEST_CASE(elasticities_equal_log_differences)
{
    std::mt19937 engine(161803);
    for (int k = 1; k <= 6; ++k) {
        const auto cobbDouglas = randomTechnology(engine, k);
        const auto logOutput = [&](const Eigen::VectorXd& x) { return std::log(cobbDouglas.output(x)); };
        const Eigen::VectorXd x = randomBundle(engine, k);
        for (int i = 0; i < k; ++i) {
            const double h = 1e-6;
            Eigen::VectorXd up = x, down = x;
            up(i) *= std::exp(h);
            down(i) *= std::exp(-h);
            const double difference = (logOutput(up) - logOutput(down)) / (std::log(up(i)) - std::log(down(i)));
            // ln Y is linear in ln x, so only rounding remains: |ln Y| ≲ 25 here, so the difference is
            // off by ≲ 25·2⁻⁵²/2e-6 ≈ 3e-9, ≤ 2e-8 relative to an exponent ≥ 0.2.
            BOOST_TEST(closeTo(cobbDouglas.elasticity(i), difference, 1e-7));
        }
    }
}

// Y = x^1.1 at x = 1e300 (1e-300) overflows (underflows), but ∂Y/∂x = 1.1·x^0.1 = 1.1e30 (1.1e-30)
// and ∂²Y/∂x² = 0.11·x^-0.9 = 1.1e-271 (1.1e269) are ordinary doubles; the evaluators must return
// them, not inf (reported as "too large to represent") or 0. Expected values by pow; 1e-13 relative
// covers a few roundings of logarithms of size ~700.
BOOST_AUTO_TEST_CASE(derivatives_do_not_overflow_or_underflow_before_their_value_does)
{
    isoquant::CobbDouglas cobbDouglas;
    cobbDouglas.logScale = 0.0;
    cobbDouglas.exponents = Eigen::VectorXd::Constant(1, 1.1);
    for (const double input : {1e300, 1e-300}) {
        const Eigen::VectorXd x = Eigen::VectorXd::Constant(1, input);
        BOOST_TEST(closeTo(cobbDouglas.marginalProduct(x, 0), 1.1 * std::pow(input, 0.1), 1e-13));
        BOOST_TEST(closeTo(cobbDouglas.secondPartial(x, 0, 0), 1.1 * 0.1 * std::pow(input, -0.9), 1e-13));
    }
}

BOOST_AUTO_TEST_SUITE_END()
