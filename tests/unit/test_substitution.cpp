// Curvature verdicts and elasticities of substitution: facts of the trade on Cobb-Douglas and CES,
// and the generic formulas against finite differences and the literal cofactor definitions, on
// seeded random technologies (Cobb-Douglas, the test CES and the test translog) and bundles.
#include "solved_plan.hpp"
#include "isoquant/math/forms/cobb_douglas.hpp"
#include "isoquant/math/numerics/level_roots.hpp"
#include "isoquant/math/forms/local_shape.hpp"
#include "isoquant/math/decisions/numerical_decisions.hpp"
#include "isoquant/math/forms/substitution_elasticity.hpp"
#include "ces_test_technology.hpp"
#include "relative_error.hpp"
#include "translog_test_technology.hpp"

#include <boost/test/unit_test.hpp>

#include <cmath>
#include <random>

using isoquant::CobbDouglas;
using isoquant::SubstitutionKind;
using isoquant::testing::CesTestTechnology;
using isoquant::testing::closeTo;
using isoquant::testing::TranslogTestTechnology;

namespace {

// A constant elasticity computed from derivatives of order 1 in a dozen operations: 1e-12 relative.
constexpr double identityTolerance = 1e-12;

const std::string place = "inputs: row 1";

Eigen::VectorXd randomBundle(std::mt19937& engine, int k)
{
    std::uniform_real_distribution<double> input(0.5, 50.0);
    Eigen::VectorXd x(k);
    for (int i = 0; i < k; ++i) x(i) = input(engine);
    return x;
}

// Exponents in [0.2, 0.45] with second-order terms of at most ±0.01 keep every elasticity above
// 0.2 − 3·0.01·ln 50 ≈ 0.08 on bundles in [0.5, 50], and the isoquants convex there.
TranslogTestTechnology randomTranslog(std::mt19937& engine, int k)
{
    std::uniform_real_distribution<double> linear(0.2, 0.45), quadratic(-0.01, 0.01);
    Eigen::VectorXd a(k);
    Eigen::MatrixXd b(k, k);
    for (int i = 0; i < k; ++i) {
        a(i) = linear(engine);
        for (int j = 0; j <= i; ++j) b(i, j) = b(j, i) = quadratic(engine);
    }
    return TranslogTestTechnology(0.4, a, b);
}

double elasticityOf(const isoquant::Technology& technology, const Eigen::VectorXd& x, int i, int j,
                    SubstitutionKind kind)
{
    const auto value = isoquant::substitutionElasticity(isoquant::checkedLocalShape(technology, x, place), i, j, kind);
    BOOST_TEST_REQUIRE(value.has_value());
    return *value;
}

// Central difference of f along input i, step h = 1e-5·xᵢ (first derivatives: truncation about
// 1e-10, rounding about 1e-11 relative).
template <typename Function>
double partialDifference(Function f, Eigen::VectorXd x, int i, double relative = 1e-5)
{
    const double h = relative * x(i), base = x(i);
    x(i) = base + h;
    const double up = f(x);
    x(i) = base - h;
    const double down = f(x);
    return (up - down) / ((base + h) - (base - h));
}


// The price elasticities of the conditional demands, εᵢⱼ = ∂ln xᵢ/∂ln wⱼ at the least-cost bundle,
// by re-solving the least-cost problem numerically (solveLeastCost) at wⱼ·e^(±h), output held.
Eigen::MatrixXd demandElasticities(const isoquant::Technology& technology, double target, const Eigen::VectorXd& prices)
{
    // h = 1e-4: central differences carry a truncation error of about h² = 1e-8, and each solve
    // holds ln xᵢ to about 1e-12, 1e-8 once divided by 2h.
    constexpr double h = 1e-4;
    const Eigen::Index k = prices.size();
    Eigen::MatrixXd elasticities(k, k);
    for (Eigen::Index j = 0; j < k; ++j) {
        Eigen::VectorXd up = prices, down = prices;
        up(j) *= std::exp(h);
        down(j) *= std::exp(-h);
        const Eigen::VectorXd logUp = isoquant::testing::requireSolved(isoquant::solveLeastCost(technology, target, up)).inputs.array().log();
        const Eigen::VectorXd logDown = isoquant::testing::requireSolved(isoquant::solveLeastCost(technology, target, down)).inputs.array().log();
        elasticities.col(j) = (logUp - logDown) / (2 * h);
    }
    return elasticities;
}

// Allen σᵢⱼ = εᵢⱼ/sⱼ and Morishima Mᵢⱼ = εᵢⱼ − εⱼⱼ, with sⱼ = wⱼxⱼ/C the cost share of j: in both
// the price of j, the second input given, varies (Blackorby and Russell 1989, "Will the real
// elasticity of substitution please stand up?", American Economic Review 79(4); from memory).
// x is made the least-cost bundle of f(x) by pricing the inputs at their marginal products.
void checkAgainstDemandElasticities(const isoquant::Technology& technology, const Eigen::VectorXd& x)
{
    const Eigen::Index k = x.size();
    const Eigen::VectorXd prices = technology.gradient(x);
    const double target = technology.output(x);
    const Eigen::VectorXd solved = isoquant::testing::requireSolved(isoquant::solveLeastCost(technology, target, prices)).inputs;
    // The solve's own accuracy, 1e-9 relative (its residual tolerance), before differences are taken.
    for (Eigen::Index i = 0; i < k; ++i) BOOST_TEST_REQUIRE(closeTo(solved(i), x(i), 1e-9));
    const Eigen::MatrixXd epsilon = demandElasticities(technology, target, prices);
    const Eigen::VectorXd shares = prices.cwiseProduct(x) / prices.dot(x);
    // Against the finite differences' error of about 2e-8 (above): 1e-6 relative (the elasticities
    // here are near 1, far from 0).
    for (Eigen::Index i = 0; i < k; ++i)
        for (Eigen::Index j = 0; j < k; ++j) {
            if (i == j) continue;
            const auto ii = static_cast<int>(i), jj = static_cast<int>(j);
            BOOST_TEST(closeTo(elasticityOf(technology, x, ii, jj, SubstitutionKind::allen), epsilon(i, j) / shares(j), 1e-6));
            BOOST_TEST(closeTo(elasticityOf(technology, x, ii, jj, SubstitutionKind::morishima),
                               epsilon(i, j) - epsilon(j, j), 1e-6));
        }
}
} // namespace

BOOST_AUTO_TEST_SUITE(substitution_and_curvature)

BOOST_AUTO_TEST_CASE(diminishing_returns_to_each_input_with_increasing_returns_to_scale)
{
    // (common practice, no source) Y = A·L^0.7·K^0.5: fᵢᵢ = bᵢ(bᵢ−1)Y/xᵢ² < 0 for each input, while
    // ν = 1.2 > 1.
    const CobbDouglas technology(std::log(2.0), Eigen::Vector2d(0.7, 0.5));
    std::mt19937 engine(7);
    for (int n = 0; n < 100; ++n) {
        const Eigen::VectorXd x = randomBundle(engine, 2);
        const auto shape = isoquant::checkedLocalShape(technology, x, place);
        BOOST_TEST(isoquant::inputReturnsWord(shape, 0) == "diminishing");
        BOOST_TEST(isoquant::inputReturnsWord(shape, 1) == "diminishing");
        BOOST_TEST(shape.scale() > 1);
    }
    // An exponent of exactly 1 gives constant returns to that input, above 1 increasing, and a
    // negative one an uneconomic region (common practice, no source).
    const Eigen::Vector2d x(3, 8);
    const auto shape = [&](double b1) {
        return isoquant::checkedLocalShape(CobbDouglas(0, Eigen::Vector2d(b1, 0.3)), x, place);
    };
    BOOST_TEST(isoquant::inputReturnsWord(shape(1.0), 0) == "constant");
    BOOST_TEST(isoquant::inputReturnsWord(shape(1.3), 0) == "increasing");
    BOOST_TEST(isoquant::inputReturnsWord(shape(-0.2), 0).rfind("uneconomic", 0) == 0);
}

BOOST_AUTO_TEST_CASE(cobb_douglas_inputs_are_technical_complements_everywhere)
{
    // (common practice, no source) fᵢⱼ = bᵢbⱼY/(xᵢxⱼ) > 0 for positive exponents.
    std::mt19937 engine(11);
    std::uniform_real_distribution<double> exponent(0.05, 1.5);
    for (int n = 0; n < 100; ++n) {
        const CobbDouglas technology(0.1, Eigen::Vector3d(exponent(engine), exponent(engine), exponent(engine)));
        const auto shape = isoquant::checkedLocalShape(technology, randomBundle(engine, 3), place);
        for (int i = 0; i < 3; ++i)
            for (int j = 0; j < 3; ++j)
                if (i != j) BOOST_TEST(isoquant::inputPairWord(shape, i, j) == "complements");
    }
}

BOOST_AUTO_TEST_CASE(cobb_douglas_elasticity_of_substitution_is_one)
{
    // (common practice, no source) σ = 1 for Cobb-Douglas, by every definition and any number of inputs.
    std::mt19937 engine(13);
    std::uniform_real_distribution<double> exponent(0.1, 0.9);
    for (int k = 2; k <= 5; ++k) {
        Eigen::VectorXd b(k);
        for (int i = 0; i < k; ++i) b(i) = exponent(engine);
        const CobbDouglas technology(0.2, b);
        const Eigen::VectorXd x = randomBundle(engine, k);
        for (int i = 0; i < k; ++i)
            for (int j = 0; j < k; ++j) {
                if (i == j) continue;
                for (auto kind : {SubstitutionKind::direct, SubstitutionKind::allen, SubstitutionKind::morishima})
                    BOOST_TEST(closeTo(elasticityOf(technology, x, i, j, kind), 1.0, identityTolerance));
            }
    }
}

BOOST_AUTO_TEST_CASE(ces_elasticity_is_one_over_one_plus_rho_by_every_definition)
{
    // (common practice, no source) σ = 1/(1+ρ) for CES, at every bundle; with two inputs the
    // direct, Allen and Morishima elasticities coincide.
    std::mt19937 engine(17);
    std::uniform_real_distribution<double> weight(0.1, 0.9), rho(-0.8, 4.0), returns(0.4, 1.6);
    for (int n = 0; n < 100; ++n) {
        isoquant::CesParameters p{1.5, weight(engine), rho(engine), returns(engine)};
        if (std::fabs(p.rho) < 0.05) continue;
        const CesTestTechnology technology(p);
        const Eigen::VectorXd x = randomBundle(engine, 2);
        for (auto kind : {SubstitutionKind::direct, SubstitutionKind::allen, SubstitutionKind::morishima}) {
            BOOST_TEST(closeTo(elasticityOf(technology, x, 0, 1, kind), 1 / (1 + p.rho), identityTolerance));
            BOOST_TEST(closeTo(elasticityOf(technology, x, 1, 0, kind), 1 / (1 + p.rho), identityTolerance));
        }
    }
}

BOOST_AUTO_TEST_CASE(test_technologies_agree_with_finite_differences)
{
    // The test CES and translog derivatives (their own formulas) against central differences of
    // their output and marginal products: 1e-7 relative, a thousand times the bound on
    // truncation (h² ≈ 1e-10) and rounding (ε/h ≈ 1e-11) at h = 1e-5 relative.
    std::mt19937 engine(19);
    for (int n = 0; n < 20; ++n) {
        const TranslogTestTechnology translog = randomTranslog(engine, 3);
        const CesTestTechnology ces({1.2, 0.35, 0.8, 0.9});
        const Eigen::VectorXd x3 = randomBundle(engine, 3), x2 = randomBundle(engine, 2);
        for (const auto* technology : {static_cast<const isoquant::Technology*>(&translog),
                                       static_cast<const isoquant::Technology*>(&ces)}) {
            const Eigen::VectorXd& x = technology->inputCount() == 3 ? x3 : x2;
            for (int i = 0; i < x.size(); ++i) {
                BOOST_TEST(closeTo(technology->marginalProduct(x, i),
                                   partialDifference([&](const Eigen::VectorXd& z) { return technology->output(z); }, x, i),
                                   1e-7));
                for (int j = 0; j < x.size(); ++j)
                    BOOST_TEST(closeTo(technology->secondPartial(x, i, j),
                                       partialDifference([&](const Eigen::VectorXd& z) {
                                           return technology->marginalProduct(z, i);
                                       }, x, j),
                                       1e-7));
            }
        }
    }
}

BOOST_AUTO_TEST_CASE(direct_elasticity_equals_its_definition_along_the_isoquant)
{
    // The direct elasticity is d ln(xⱼ/xᵢ) / d ln(fᵢ/fⱼ) along the isoquant (Hicks' definition, from
    // memory). Two points on the isoquant at xᵢ·e^(±h), h = 1e-3, found by root-finding, with the
    // marginal products by central differences of output: the symmetric quotient is off by about
    // h² = 1e-6 (relative, times derivatives of order 1) and the differences' error 1e-10 over
    // Δln(fᵢ/fⱼ) ≈ 2h/σ adds 1e-7; 1e-4 is a hundred times the sum.
    std::mt19937 engine(23);
    for (int n = 0; n < 20; ++n) {
        const TranslogTestTechnology technology = randomTranslog(engine, 3);
        const Eigen::VectorXd x = randomBundle(engine, 3);
        const double logLevel = technology.logOutput(x);
        const auto output = [&](const Eigen::VectorXd& z) { return technology.output(z); };
        for (int i = 0; i < 3; ++i)
            for (int j = 0; j < 3; ++j) {
                if (i == j) continue;
                double logRatio[2], logRate[2];
                for (int side = 0; side < 2; ++side) {
                    Eigen::VectorXd point = x;
                    point(i) = x(i) * std::exp(side == 0 ? 1e-3 : -1e-3);
                    const auto amount = isoquant::amountForLevel(technology, point, j, logLevel);
                    BOOST_TEST_REQUIRE(amount.has_value());
                    point(j) = *amount;
                    logRatio[side] = std::log(point(j) / point(i));
                    logRate[side] = std::log(partialDifference(output, point, i) / partialDifference(output, point, j));
                }
                const double definition = (logRatio[0] - logRatio[1]) / (logRate[0] - logRate[1]);
                BOOST_TEST(closeTo(elasticityOf(technology, x, i, j, SubstitutionKind::direct), definition, 1e-4));
            }
    }
}

BOOST_AUTO_TEST_CASE(allen_and_morishima_equal_their_cofactor_definitions)
{
    // Allen σᵢⱼ = (Σₖxₖfₖ)/(xᵢxⱼ)·Fᵢⱼ/F and Morishima Mᵢⱼ = (fⱼ/xᵢ)·Fᵢⱼ/F − (fⱼ/xⱼ)·Fⱼⱼ/F with F
    // the bordered Hessian's determinant and Fᵢⱼ its cofactors, taken literally (minors'
    // determinants) from finite-difference derivatives: gradient from output, Hessian from the
    // marginal products, each to about 1e-10 relative (see above); the cofactor quotients amplify
    // this by the bordered Hessian's condition number (below 1e3 here), so 1e-6.
    std::mt19937 engine(29);
    for (int n = 0; n < 20; ++n) {
        const TranslogTestTechnology technology = randomTranslog(engine, 3);
        const Eigen::VectorXd x = randomBundle(engine, 3);
        const int k = 3;
        Eigen::MatrixXd bordered = Eigen::MatrixXd::Zero(k + 1, k + 1);
        Eigen::VectorXd gradient(k);
        for (int i = 0; i < k; ++i) {
            gradient(i) = partialDifference([&](const Eigen::VectorXd& z) { return technology.output(z); }, x, i);
            bordered(0, i + 1) = bordered(i + 1, 0) = gradient(i);
            for (int j = 0; j < k; ++j)
                bordered(i + 1, j + 1) =
                    partialDifference([&](const Eigen::VectorXd& z) { return technology.marginalProduct(z, i); }, x, j);
        }
        bordered = 0.5 * (bordered + bordered.transpose()).eval();
        const double determinant = bordered.determinant();
        const auto cofactor = [&](int row, int column) {
            Eigen::MatrixXd minor(k, k);
            for (int r = 0, mr = 0; r <= k; ++r) {
                if (r == row) continue;
                for (int c = 0, mc = 0; c <= k; ++c) {
                    if (c == column) continue;
                    minor(mr, mc++) = bordered(r, c);
                }
                ++mr;
            }
            return ((row + column) % 2 == 0 ? 1.0 : -1.0) * minor.determinant();
        };
        const double weightedSum = x.dot(gradient);
        for (int i = 0; i < k; ++i)
            for (int j = 0; j < k; ++j) {
                if (i == j) continue;
                const double ratio = cofactor(i + 1, j + 1) / determinant;
                const double own = cofactor(j + 1, j + 1) / determinant;
                const double allen = weightedSum / (x(i) * x(j)) * ratio;
                const double morishima = gradient(j) / x(i) * ratio - gradient(j) / x(j) * own;
                BOOST_TEST(closeTo(elasticityOf(technology, x, i, j, SubstitutionKind::allen), allen, 1e-6));
                BOOST_TEST(closeTo(elasticityOf(technology, x, i, j, SubstitutionKind::morishima), morishima, 1e-6));
            }
    }
}

BOOST_AUTO_TEST_CASE(allen_and_morishima_agree_with_resolved_least_cost_demands)
{
    // A 3-input translog (seeded random, convex isoquants on these bundles) and a CES of two inputs.
    std::mt19937 engine(31);
    for (int n = 0; n < 5; ++n) {
        const TranslogTestTechnology technology = randomTranslog(engine, 3);
        checkAgainstDemandElasticities(technology, randomBundle(engine, 3));
    }
    std::uniform_real_distribution<double> weight(0.2, 0.8), rho(-0.6, 2.0), returns(0.6, 1.3);
    for (int n = 0; n < 5; ++n) {
        const CesTestTechnology technology(isoquant::CesParameters{1.5, weight(engine), rho(engine), returns(engine)});
        checkAgainstDemandElasticities(technology, randomBundle(engine, 2));
    }
}

BOOST_AUTO_TEST_CASE(straight_isoquant_has_no_finite_elasticity)
{
    // A linear technology (perfect substitutes, fᵢⱼ = 0): the direct elasticity's denominator is 0
    // and the bordered Hessian [[0, eᵀ], [e, 0]] is singular; both are reported undefined, not inf.
    isoquant::LocalShape shape;
    shape.elasticities = Eigen::Vector2d(0.4, 0.6);
    shape.scaledHessian = Eigen::Matrix2d::Zero();
    BOOST_TEST(!isoquant::substitutionElasticity(shape, 0, 1, SubstitutionKind::direct).has_value());
    BOOST_TEST(!isoquant::substitutionElasticity(shape, 0, 1, SubstitutionKind::allen).has_value());
}

BOOST_AUTO_TEST_SUITE_END()
