// Facts every production economist uses about Cobb-Douglas technologies (common practice, no
// source), checked on the core's calculus: diminishing returns to each input can coexist with
// increasing returns to scale; inputs are complements (positive cross partials); exponents summing
// to 1 mean output scales exactly with the inputs.
#include "isoquant/math/forms/cobb_douglas.hpp"
#include "relative_error.hpp"

#include <boost/test/unit_test.hpp>

#include <cmath>
#include <random>

using isoquant::testing::closeTo;

namespace {

isoquant::CobbDouglas technology(std::initializer_list<double> exponents, double logScale = 0.0)
{
    isoquant::CobbDouglas cobbDouglas;
    cobbDouglas.logScale = logScale;
    cobbDouglas.exponents = Eigen::VectorXd::Map(exponents.begin(), static_cast<Eigen::Index>(exponents.size()));
    return cobbDouglas;
}

} // namespace

BOOST_AUTO_TEST_SUITE(facts_of_the_trade)

// Exponents 0.7 and 0.5: each own second partial bᵢ(bᵢ − 1)·Y/xᵢ² is negative (bᵢ < 1) at every
// bundle, yet ν = 1.2 > 1.
BOOST_AUTO_TEST_CASE(diminishing_returns_to_each_input_with_increasing_returns_to_scale)
{
    const auto cobbDouglas = technology({0.7, 0.5}, 0.3);
    // ν is the sum of the exponents; 0.7 + 0.5 in doubles is within one rounding of 1.2.
    BOOST_TEST(closeTo(cobbDouglas.scaleElasticity(), 1.2, 1e-15));
    const double bundles[][2] = {{1, 1}, {0.01, 250}, {3, 7}, {1e4, 2e-3}, {500, 500}};
    for (const auto& values : bundles) {
        const Eigen::Vector2d x(values[0], values[1]);
        BOOST_TEST(cobbDouglas.secondPartial(x, 0, 0) < 0, "labour at " << x.transpose());
        BOOST_TEST(cobbDouglas.secondPartial(x, 1, 1) < 0, "capital at " << x.transpose());
        // Doubling every input more than doubles output: the factor is 2^1.2 ≈ 2.297.
        BOOST_TEST(closeTo(cobbDouglas.output(2.0 * x) / cobbDouglas.output(x), std::pow(2.0, 1.2), 1e-13));
        BOOST_TEST(cobbDouglas.output(2.0 * x) > 2.0 * cobbDouglas.output(x));
    }
}

// ∂²Y/∂xᵢ∂xⱼ = bᵢbⱼ·Y/(xᵢxⱼ) > 0 for i ≠ j whenever the exponents are positive; checked at a
// seeded random sample of technologies (2 to 6 inputs) and bundles spanning six decades.
BOOST_AUTO_TEST_CASE(cross_partials_are_positive)
{
    std::mt19937 engine(19280101);
    std::uniform_real_distribution<double> exponent(0.01, 1.5);
    std::uniform_real_distribution<double> logInput(std::log(1e-3), std::log(1e3));
    std::uniform_int_distribution<int> inputs(2, 6);
    for (int sample = 0; sample < 200; ++sample) {
        const int k = inputs(engine);
        isoquant::CobbDouglas cobbDouglas;
        cobbDouglas.logScale = logInput(engine);
        cobbDouglas.exponents.resize(k);
        Eigen::VectorXd x(k);
        for (int i = 0; i < k; ++i) {
            cobbDouglas.exponents(i) = exponent(engine);
            x(i) = std::exp(logInput(engine));
        }
        const Eigen::MatrixXd hessian = cobbDouglas.hessian(x);
        for (int i = 0; i < k; ++i)
            for (int j = 0; j < k; ++j)
                if (i != j) BOOST_TEST(hessian(i, j) > 0, "sample " << sample << " (" << i << ", " << j << ")");
    }
}

// With Σbᵢ = 1, Y(t·x) = t·Y(x). The core forms Y = exp(ln A + Σbᵢ ln xᵢ); a few roundings in the
// exponent (|ln A + Σbᵢ ln xᵢ| ≲ 30 here) move Y by at most ~30·2⁻⁵² ≈ 7e-15 relative, so 1e-12
// holds with room to spare.
BOOST_AUTO_TEST_CASE(exponents_summing_to_one_scale_output_exactly)
{
    std::mt19937 engine(17760704);
    std::uniform_real_distribution<double> share(0.05, 1.0);
    std::uniform_real_distribution<double> logInput(std::log(1e-2), std::log(1e4));
    std::uniform_real_distribution<double> logFactor(std::log(1e-3), std::log(1e3));
    for (int k = 1; k <= 20; ++k) {
        isoquant::CobbDouglas cobbDouglas;
        cobbDouglas.logScale = 0.25;
        cobbDouglas.exponents.resize(k);
        for (int i = 0; i < k; ++i) cobbDouglas.exponents(i) = share(engine);
        cobbDouglas.exponents /= cobbDouglas.exponents.sum();
        BOOST_TEST_REQUIRE(closeTo(cobbDouglas.scaleElasticity(), 1.0, 1e-15));
        Eigen::VectorXd x(k);
        for (int i = 0; i < k; ++i) x(i) = std::exp(logInput(engine));
        for (int trial = 0; trial < 5; ++trial) {
            const double t = std::exp(logFactor(engine));
            BOOST_TEST(closeTo(cobbDouglas.output(t * x), t * cobbDouglas.output(x), 1e-12));
        }
    }
}

BOOST_AUTO_TEST_SUITE_END()
