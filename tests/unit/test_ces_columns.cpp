// The CES composite over whole columns (forms/ces_columns.hpp) against the same formulas in long
// double (the C library's expl, expm1l, logl, log1pl: 11 more bits), over curvatures from near
// perfect substitutes to near fixed proportions, weights near both ends, and log ratios from 0
// through the series limit to the log-sum-exp branch; and the same bits at both widths and at
// every column length. Invented arguments (a property test).
#include "isoquant/math/forms/ces.hpp"
#include "isoquant/math/forms/ces_columns.hpp"

#include <boost/test/unit_test.hpp>

#include <algorithm>
#include <cmath>
#include <cstring>
#include <random>
#include <vector>

namespace {

using isoquant::column_kernels::Width;

Eigen::VectorXd logRatios()
{
    std::vector<double> values{0.0, 2.2e-16, -1e-12, 1e-5, -1e-3, 0.3, -0.7, 1.0, -2.5, 6.0, -40.0, 300.0};
    std::mt19937_64 generator(20261206u);
    std::normal_distribution<double> spread(0.0, 1.5);
    for (int i = 0; i < 2000; ++i) values.push_back(spread(generator));
    return Eigen::Map<const Eigen::VectorXd>(values.data(), static_cast<Eigen::Index>(values.size()));
}

constexpr double weights[] = {1e-7, 0.05, 0.4, 0.5, 0.93, 1 - 1e-7};
constexpr double curvatures[] = {-0.999, -0.5, -1e-4, 0.0, 3e-8, 0.002, 0.5, 2.0, 12.0, 60.0};

struct Reference {
    long double value, byWeight, byLogit, byCurvature;
};

// H = d·K/u, K = ln(δeᵘ + 1 − δ), u = −ρd; ∂H/∂t = d·(π − δ)/u,
// ∂H/∂δ = that over δ(1 − δ); ∂H/∂ρ = −d²·(uπ − K)/u², or its series (ces.cpp) for |u| < 10⁻³.
Reference referenceAt(double logRatio, double weight, double curvature)
{
    const long double d = logRatio, delta = weight, q = delta * (1 - delta);
    const long double u = -static_cast<long double>(curvature) * d;
    if (u == 0) return {delta * d, d, q * d, -d * d * q / 2};
    const long double a = logl(delta) + u, c = log1pl(-delta);
    const long double larger = std::max(a, c), ratio = expl(std::min(a, c) - larger);
    const long double cumulant = std::fabs(u) <= 1 ? log1pl(delta * expm1l(u)) : larger + log1pl(ratio);
    const long double share = a >= c ? 1 / (1 + ratio) : ratio / (1 + ratio);
    const long double second = a >= c ? ratio / (1 + ratio) : 1 / (1 + ratio); // 1 − π without cancellation
    // π − δ = δ(1 − δ)(eᵘ − 1)/(δeᵘ + 1 − δ): from expm1 for small |u|, else by the products.
    const long double gap = std::fabs(u) <= 1 ? q * expm1l(u) / (1 + delta * expm1l(u))
                                              : share * (1 - delta) - delta * second;
    long double byCurvature = 0;
    if (std::fabs(u) < 1e-3L) {
        const long double skew = 1 - 2 * delta;
        byCurvature = -d * d * (q / 2 + q * skew * u / 3 + q * (1 - 6 * q) * u * u / 8 + q * skew * (1 - 12 * q) * u * u * u / 30);
    } else {
        byCurvature = -d * d * (u * share - cumulant) / (u * u);
    }
    return {d * cumulant / u, d * gap / (q * u), d * gap / u, byCurvature};
}

bool sameBits(double a, double b) { return std::memcmp(&a, &b, sizeof a) == 0; }

// |a − b| relative to |b|, or to `scale` where |b| is smaller.
double relativeGap(double a, long double b, double scale)
{
    return static_cast<double>(std::fabs(a - b) / std::max(std::fabs(b), static_cast<long double>(scale)));
}

} // namespace

BOOST_AUTO_TEST_SUITE(ces_columns)

BOOST_AUTO_TEST_CASE(columns_agree_with_the_formulas_in_long_double)
{
    const Eigen::VectorXd d = logRatios();
    double worstValue = 0, worstWeight = 0, worstLogit = 0, worstCurvature = 0;
    for (const double weight : weights)
        for (const double curvature : curvatures) {
            isoquant::CesColumns columns;
            isoquant::evaluateComposite(d, weight, curvature, columns);
            for (Eigen::Index i = 0; i < d.size(); ++i) {
                const Reference row = referenceAt(d(i), weight, curvature);
                // Scales: H is about d (between d·min(π) and d·max(π)); the derivatives by δ and t
                // are about d, the one by ρ about d².
                const double scale = std::max(std::fabs(d(i)), 1e-300);
                worstValue = std::max(worstValue, relativeGap(columns.value(i), row.value, scale));
                worstWeight = std::max(worstWeight, relativeGap(columns.byWeight(i), row.byWeight, scale));
                worstLogit = std::max(worstLogit, relativeGap(columns.byLogit(i), row.byLogit, 1e-300));
                worstCurvature = std::max(worstCurvature, relativeGap(columns.byCurvature(i), row.byCurvature, scale * scale));
            }
        }
    BOOST_TEST_MESSAGE("largest relative gaps: H " << worstValue << ", dH/d(delta) " << worstWeight << ", dH/dt "
                                                   << worstLogit << ", dH/d(rho) " << worstCurvature);
    // Bounds: H within about 10 units of 2⁻⁵³ (the kernels' 4 ulp and the products' roundings;
    // measured 5.8e-16), ∂H/∂δ and ∂H/∂t within 1e-14 (measured 2.9e-15 and 3.0e-15), ∂H/∂ρ within
    // 1e-12 of d² (measured 4.3e-13): the direct form −d²(uπ − K)/u² loses about 2ε/|u| to
    // cancellation just above the series limit |u| = 10⁻³ (ces.cpp), in long double as in double,
    // but the reference keeps 11 more bits.
    BOOST_TEST(worstValue <= 2e-15);
    BOOST_TEST(worstWeight <= 1e-14);
    BOOST_TEST(worstLogit <= 1e-14);
    BOOST_TEST(worstCurvature <= 1e-12);
}

BOOST_AUTO_TEST_CASE(the_row_by_row_derivative_by_the_logit_agrees_with_the_formulas_in_long_double)
{
    // CesCompositeCurve::at (ces.cpp), which the single-cell functions use, against the same
    // reference: ∂H/∂t within 1e-14 relative (it formed π − δ directly for |u| > 1 and lost up to
    // 2e-9 at δ = 1 − 1e-7).
    const Eigen::VectorXd d = logRatios();
    double worst = 0;
    for (const double weight : weights)
        for (const double curvature : curvatures) {
            const isoquant::CesCompositeCurve curve(weight, curvature);
            for (Eigen::Index i = 0; i < d.size(); ++i)
                worst = std::max(worst, relativeGap(curve.at(d(i)).byWeightLogit,
                                                    referenceAt(d(i), weight, curvature).byLogit, 1e-300));
        }
    BOOST_TEST_MESSAGE("largest relative gap of dH/dt, row by row: " << worst);
    BOOST_TEST(worst <= 1e-14);
}

BOOST_AUTO_TEST_CASE(a_subnormal_weight_gives_finite_columns)
{
    // δ = 1e-310 is subnormal: 1/(δ(1 − δ)) overflows, so these rows take CesCompositeCurve's forms
    // (the packets would multiply by that infinity). Every column finite, and H, which is of the
    // order of d, within 1e-15 of the long double formulas; the derivatives by δ and t are
    // themselves near the subnormal range here and carry only its few significant bits.
    const Eigen::VectorXd d = logRatios();
    const double weight = 1e-310;
    for (const double curvature : curvatures) {
        isoquant::CesColumns columns;
        isoquant::evaluateComposite(d, weight, curvature, columns);
        BOOST_TEST(columns.value.allFinite());
        BOOST_TEST(columns.byWeight.allFinite());
        BOOST_TEST(columns.byLogit.allFinite());
        BOOST_TEST(columns.byCurvature.allFinite());
        double worstValue = 0;
        for (Eigen::Index i = 0; i < d.size(); ++i)
            worstValue = std::max(worstValue, relativeGap(columns.value(i), referenceAt(d(i), weight, curvature).value,
                                                          std::max(std::fabs(d(i)), 1e-300)));
        BOOST_TEST(worstValue <= 1e-15, "rho " << curvature);
    }
}

BOOST_AUTO_TEST_CASE(a_curvature_too_small_to_square_or_invert_gives_the_cobb_douglas_columns)
{
    // The packets take d/u = −1/ρ and 1/ρ² once. At |ρ| = 1e-200 the first is finite and the second
    // overflows (every row's |u| is then far below the series limit, so ∂H/∂ρ comes from the
    // series); at 1e-310 (subnormal) and the smallest double even 1/ρ would overflow, and ρ is
    // taken as 0 (u would be subnormal, and 1/u overflow). Either way the columns are
    // those of ρ = 0 to rounding: H = δ·d, ∂H/∂δ = d, ∂H/∂t = δ(1 − δ)·d, ∂H/∂ρ = −d²·δ(1 − δ)/2
    // (the series' first term; the next is of order u).
    const Eigen::VectorXd d = logRatios();
    for (const double weight : {0.05, 0.4, 0.93})
        for (const double curvature : {1e-200, -1e-200, 1e-310, -1e-310, 4.9e-324}) {
            isoquant::CesColumns columns;
            isoquant::evaluateComposite(d, weight, curvature, columns);
            const double q = weight * (1 - weight);
            double worst = 0;
            for (Eigen::Index i = 0; i < d.size(); ++i) {
                const double scale = std::max(std::fabs(d(i)), 1e-300);
                worst = std::max({worst, std::fabs(columns.value(i) - weight * d(i)) / scale,
                                  std::fabs(columns.byWeight(i) - d(i)) / scale,
                                  std::fabs(columns.byLogit(i) - q * d(i)) / scale,
                                  std::fabs(columns.byCurvature(i) + d(i) * d(i) * q / 2) / (scale * scale)});
            }
            BOOST_TEST(worst <= 4e-16, "delta " << weight << ", rho " << curvature << ": " << worst);
        }
}

BOOST_AUTO_TEST_CASE(both_widths_and_every_length_give_the_same_bits)
{
    if (!isoquant::column_kernels::fourDoublesAvailable())
        BOOST_TEST_MESSAGE("no AVX2 on this processor: both calls take the two-doubles rows");
    const Eigen::VectorXd d = logRatios();
    std::size_t differing = 0;
    for (const double weight : weights)
        for (const double curvature : curvatures) {
            isoquant::CesColumns narrow, wide;
            isoquant::evaluateComposite(d, weight, curvature, narrow, Width::twoDoubles);
            isoquant::evaluateComposite(d, weight, curvature, wide, Width::fourDoubles);
            for (Eigen::Index i = 0; i < d.size(); ++i)
                differing += sameBits(narrow.value(i), wide.value(i)) && sameBits(narrow.byLogit(i), wide.byLogit(i)) &&
                                     sameBits(narrow.byWeight(i), wide.byWeight(i)) &&
                                     sameBits(narrow.byCurvature(i), wide.byCurvature(i))
                                 ? 0
                                 : 1;
            // A column of 1 to 19 rows: the last rows (fewer than a pair of packets, or than a
            // packet) go through the same packet code.
            for (Eigen::Index length = 1; length <= 19; ++length) {
                isoquant::CesColumns part;
                isoquant::evaluateComposite(d.head(length), weight, curvature, part);
                for (Eigen::Index i = 0; i < length; ++i)
                    differing += sameBits(part.value(i), wide.value(i)) && sameBits(part.byCurvature(i), wide.byCurvature(i)) ? 0 : 1;
            }
        }
    BOOST_TEST(differing == 0u);
}

// cesNormalSums: the same bits at both widths and at every length up to 19 rows (a packet of four,
// and the rows after the last whole packet, in every combination), and each sum within
// 1e-15·Σ|term| of the same sum in long double (a sum of n terms in double is within about
// n·ε·Σ|term| in the worst case, √n·ε typically; here four lanes of 500).
BOOST_AUTO_TEST_CASE(normal_sums_agree_at_both_widths_and_with_long_double_sums)
{
    const Eigen::VectorXd d = logRatios();
    const Eigen::Index n = d.size();
    isoquant::CesColumns columns;
    isoquant::evaluateComposite(d, 0.4, 0.5, columns);
    std::mt19937_64 generator(20261203u);
    std::normal_distribution<double> spread(0.0, 1.0);
    Eigen::VectorXd second(n), residuals(n);
    for (Eigen::Index i = 0; i < n; ++i) second(i) = 1.5 + 0.6 * spread(generator), residuals(i) = 0.1 * spread(generator);

    const auto narrow = isoquant::cesNormalSums(columns, second, residuals, Width::twoDoubles);
    const auto wide = isoquant::cesNormalSums(columns, second, residuals, Width::fourDoubles);
    for (int k = 0; k < isoquant::cesNormalSumCount; ++k) BOOST_TEST(sameBits(narrow[k], wide[k]), "sum " << k);

    long double reference[isoquant::cesNormalSumCount] = {}, magnitude[isoquant::cesNormalSumCount] = {};
    for (Eigen::Index i = 0; i < n; ++i) {
        const long double g = columns.byLogit(i), c = columns.byCurvature(i), l = second(i) + columns.value(i),
                          r = residuals(i);
        const long double terms[] = {g, c, l, g * g, c * g, l * g, c * c, l * c, l * l, r, g * r, c * r, l * r};
        for (int k = 0; k < isoquant::cesNormalSumCount; ++k) reference[k] += terms[k], magnitude[k] += std::fabs(terms[k]);
    }
    for (int k = 0; k < isoquant::cesNormalSumCount; ++k)
        BOOST_TEST(std::fabs(wide[k] - reference[k]) <= 1e-15L * magnitude[k], "sum " << k);

    for (Eigen::Index length = 1; length <= 19; ++length) {
        isoquant::CesColumns part;
        isoquant::evaluateComposite(d.head(length), 0.4, 0.5, part);
        const auto partNarrow = isoquant::cesNormalSums(part, second.head(length), residuals.head(length), Width::twoDoubles);
        const auto partWide = isoquant::cesNormalSums(part, second.head(length), residuals.head(length));
        for (int k = 0; k < isoquant::cesNormalSumCount; ++k)
            BOOST_TEST(sameBits(partNarrow[k], partWide[k]), "length " << length << ", sum " << k);
    }
}

BOOST_AUTO_TEST_SUITE_END()
