// Properties of the ces and translog technologies on seeded random parameters and bundles:
// marginal products and second partials equal central differences of the function itself, the
// CES composite's parameter derivatives equal differences of the composite (on both sides of its
// series switch and for large |ρ·d|), CES tends to Cobb-Douglas as ρ → 0, and a translog with all
// βᵢⱼ = 0 is the Cobb-Douglas with the same exponents.
#include "isoquant/math/forms/ces.hpp"
#include "isoquant/math/forms/cobb_douglas.hpp"
#include "isoquant/math/forms/translog.hpp"
#include "relative_error.hpp"

#include <boost/test/unit_test.hpp>

#include <cmath>
#include <random>

using isoquant::testing::closeTo;

namespace {

// Central difference of f along coordinate i with step h = 1e-6·|xᵢ| (the step actually taken).
template <typename Function>
double centralDifference(Function f, Eigen::VectorXd x, int i)
{
    const double h = 1e-6 * std::fabs(x(i));
    const double base = x(i);
    x(i) = base + h;
    const double up = f(x);
    x(i) = base - h;
    const double down = f(x);
    return (up - down) / ((base + h) - (base - h));
}

// With h = 1e-6·x the truncation error is ~h² relative to the natural scale (Y/xᵢ for a marginal
// product, Y/(xᵢxⱼ) for a second partial) and rounding in Y (a few ulps) is amplified by 1/h:
// about 1e-15/1e-6 = 1e-9 of that scale. 1e-7 of the scale is a hundred times that bound and is
// used in place of a relative tolerance because a translog second partial can pass through 0.
constexpr double scaledTolerance = 1e-7;

Eigen::VectorXd randomBundle(std::mt19937& engine, int k)
{
    std::uniform_real_distribution<double> input(0.5, 50.0);
    Eigen::VectorXd x(k);
    for (int i = 0; i < k; ++i) x(i) = input(engine);
    return x;
}

// Curvatures on both sides of the composite's series switch (|ρ·d| = 1e-3), at 0, near −1 and large.
const double curvatures[] = {-0.999, -0.9, -0.5, -2e-4, -1e-9, 0.0, 1e-9, 2e-4, 0.5, 2.0, 8.0, 60.0};

isoquant::Translog randomTranslog(std::mt19937& engine, int k)
{
    std::uniform_real_distribution<double> firstOrder(0.3, 0.6);
    std::uniform_real_distribution<double> interaction(-0.02, 0.02);
    Eigen::VectorXd alpha(k);
    Eigen::MatrixXd beta(k, k);
    for (int i = 0; i < k; ++i) {
        alpha(i) = firstOrder(engine);
        for (int j = 0; j <= i; ++j) beta(i, j) = beta(j, i) = interaction(engine);
    }
    return isoquant::Translog(0.4, alpha, beta);
}

void checkDerivatives(const isoquant::Technology& technology, const Eigen::VectorXd& x)
{
    const auto output = [&](const Eigen::VectorXd& bundle) { return technology.output(bundle); };
    const double y = technology.output(x);
    for (int i = 0; i < x.size(); ++i) {
        const double scale = y / x(i);
        BOOST_TEST(std::fabs(technology.marginalProduct(x, i) - centralDifference(output, x, i)) <= scaledTolerance * scale,
                   "marginal product " << i << ": " << technology.marginalProduct(x, i) << " vs "
                                       << centralDifference(output, x, i));
        for (int j = 0; j < x.size(); ++j) {
            const auto marginal = [&](const Eigen::VectorXd& bundle) { return technology.marginalProduct(bundle, j); };
            const double second = technology.secondPartial(x, i, j);
            BOOST_TEST(std::fabs(second - centralDifference(marginal, x, i)) <= scaledTolerance * y / (x(i) * x(j)),
                       "second partial " << i << "," << j << ": " << second << " vs "
                                         << centralDifference(marginal, x, i));
        }
        // εᵢ = MPᵢ·xᵢ/Y, the definition of the elasticity
        BOOST_TEST(closeTo(technology.elasticity(x, i), technology.marginalProduct(x, i) * x(i) / y, 1e-13));
    }
    BOOST_TEST(closeTo(technology.scaleElasticity(x), (technology.gradient(x).array() * x.array()).sum() / y, 1e-12));
}

} // namespace

BOOST_AUTO_TEST_SUITE(forms_calculus)

BOOST_AUTO_TEST_CASE(ces_derivatives_equal_differences)
{
    std::mt19937 engine(20260301);
    std::uniform_real_distribution<double> weight(0.2, 0.8);
    std::uniform_real_distribution<double> nu(0.6, 1.3);
    for (const double rho : curvatures) {
        for (int draw = 0; draw < 4; ++draw) {
            const isoquant::Ces ces(0.3, weight(engine), rho, nu(engine));
            BOOST_TEST_CONTEXT("rho " << rho << ", delta " << ces.weight) { checkDerivatives(ces, randomBundle(engine, 2)); }
        }
    }
}

BOOST_AUTO_TEST_CASE(translog_derivatives_equal_differences)
{
    std::mt19937 engine(20260302);
    for (int k = 1; k <= 4; ++k)
        for (int draw = 0; draw < 5; ++draw) checkDerivatives(randomTranslog(engine, k), randomBundle(engine, k));
}

BOOST_AUTO_TEST_CASE(ces_composite_parameter_derivatives_equal_differences)
{
    // Steps: 1e-6 in δ, 1e-6·max(|ρ|, 1) in ρ (straddling ρ = 0 and the series switch where ρ is
    // small); error bound as above, on the scale |d| (for ∂H/∂δ) and d² (for ∂H/∂ρ, which is
    // −d²·δ(1−δ)/2 at ρ = 0).
    for (const double d : {-4.0, -0.6, 0.3, 2.5}) {
        for (const double rho : curvatures) {
            for (const double delta : {0.1, 0.5, 0.93}) {
                const auto composite = isoquant::cesComposite(d, delta, rho);
                const double hDelta = 1e-6;
                const double byWeight = (isoquant::cesComposite(d, delta + hDelta, rho).value -
                                         isoquant::cesComposite(d, delta - hDelta, rho).value) / (2 * hDelta);
                const double hRho = 1e-6 * std::max(std::fabs(rho), 1.0);
                const double byCurvature = (isoquant::cesComposite(d, delta, rho + hRho).value -
                                            isoquant::cesComposite(d, delta, rho - hRho).value) / (2 * hRho);
                BOOST_TEST_CONTEXT("d " << d << ", rho " << rho << ", delta " << delta)
                {
                    BOOST_TEST(std::fabs(composite.byWeight - byWeight) <= scaledTolerance * std::fabs(d));
                    BOOST_TEST(std::fabs(composite.byWeightLogit - delta * (1 - delta) * byWeight) <=
                               scaledTolerance * std::fabs(d));
                    BOOST_TEST(std::fabs(composite.byCurvature - byCurvature) <= scaledTolerance * d * d,
                               composite.byCurvature << " vs " << byCurvature);
                    BOOST_TEST(std::isfinite(composite.value));
                }
            }
        }
    }
}

BOOST_AUTO_TEST_CASE(ces_has_no_nans_at_the_edges)
{
    // ρ = −1 (perfect substitutes), δ on its bounds, |ρ·d| far beyond the range of exp.
    for (const double rho : {-1.0, 0.0, 1e3, 1e6})
        for (const double delta : {0.0, 1e-12, 0.5, 1.0 - 1e-12, 1.0})
            for (const double d : {-700.0, -1.0, 0.0, 1.0, 700.0}) {
                const auto composite = isoquant::cesComposite(d, delta, rho);
                BOOST_TEST_CONTEXT("d " << d << ", rho " << rho << ", delta " << delta)
                {
                    BOOST_TEST(std::isfinite(composite.value));
                    BOOST_TEST(std::isfinite(composite.byWeightLogit));
                    BOOST_TEST(std::isfinite(composite.byCurvature));
                    BOOST_TEST(std::isfinite(composite.firstShare));
                }
            }
}

BOOST_AUTO_TEST_CASE(ces_tends_to_cobb_douglas_as_rho_tends_to_zero)
{
    // ln Y_CES − ln Y_CD = ν·(H − δd) = −ν·ρ·δ(1−δ)·d²/2 + O(ρ²): within ν·|ρ|·d² for small ρ,
    // and exactly the Cobb-Douglas A·x₁^(νδ)·x₂^(ν(1−δ)) at ρ = 0.
    std::mt19937 engine(20260303);
    const double delta = 0.35, nu = 0.9;
    const isoquant::CobbDouglas cobbDouglas(0.2, Eigen::Vector2d(nu * delta, nu * (1 - delta)));
    for (int draw = 0; draw < 20; ++draw) {
        const Eigen::VectorXd x = randomBundle(engine, 2);
        const double d = std::log(x(0) / x(1));
        for (const double rho : {1e-2, 1e-4, 1e-6, -1e-6, -1e-4}) {
            const isoquant::Ces ces(0.2, delta, rho, nu);
            BOOST_TEST(std::fabs(ces.logOutput(x) - cobbDouglas.logOutput(x)) <= nu * std::fabs(rho) * d * d);
        }
        const isoquant::Ces limit(0.2, delta, 0.0, nu);
        BOOST_TEST(closeTo(limit.output(x), cobbDouglas.output(x), 1e-14));
        for (int i = 0; i < 2; ++i) {
            BOOST_TEST(closeTo(limit.marginalProduct(x, i), cobbDouglas.marginalProduct(x, i), 1e-14));
            for (int j = 0; j < 2; ++j)
                BOOST_TEST(closeTo(limit.secondPartial(x, i, j), cobbDouglas.secondPartial(x, i, j), 1e-13));
        }
    }
}

BOOST_AUTO_TEST_CASE(translog_without_interactions_is_cobb_douglas)
{
    std::mt19937 engine(20260304);
    for (int k = 1; k <= 4; ++k) {
        isoquant::Translog translog = randomTranslog(engine, k);
        translog.interactions.setZero();
        const isoquant::CobbDouglas cobbDouglas(translog.logScale, translog.firstOrder);
        BOOST_TEST(translog.constantScaleElasticity().value() == cobbDouglas.scaleElasticity());
        const Eigen::VectorXd x = randomBundle(engine, k);
        BOOST_TEST(closeTo(translog.output(x), cobbDouglas.output(x), 1e-14));
        for (int i = 0; i < k; ++i) {
            BOOST_TEST(closeTo(translog.marginalProduct(x, i), cobbDouglas.marginalProduct(x, i), 1e-14));
            BOOST_TEST(translog.elasticity(x, i) == cobbDouglas.elasticity(i));
            for (int j = 0; j < k; ++j)
                BOOST_TEST(closeTo(translog.secondPartial(x, i, j), cobbDouglas.secondPartial(x, i, j), 1e-13));
        }
    }
}

BOOST_AUTO_TEST_SUITE_END()
