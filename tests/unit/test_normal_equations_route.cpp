// The normal-equations route of the least-squares engine against the Householder route on the same
// rows (LeastSquaresOptions::normalEquationsFromRows). Invented data (property tests); the NIST
// StRD certified values through this route are in test_nist_linear.cpp.
#include "isoquant/math/fits/production_fit.hpp"
#include "isoquant/math/numerics/exact_elementwise.hpp"
#include "isoquant/math/numerics/least_squares.hpp"
#include "invented_regression.hpp"

#include <boost/test/data/test_case.hpp>
#include <boost/test/unit_test.hpp>

#include <cmath>
#include <limits>
#include <random>
#include <stdexcept>

namespace bdata = boost::unit_test::data;

namespace {

constexpr Eigen::Index manyRows = 20000; // above the default normalEquationsFromRows (16384)

using isoquant::testing::relativeDifference;
using Regression = isoquant::testing::InventedRegression;

// Slopes near 3 with a spread of 0.4: the constant and the slopes are collinear enough (κ ≈ 40) for
// the normal equations to lose digits before refinement; 23 clusters.
Regression invented(Eigen::Index rows) { return isoquant::testing::inventedRegression(rows, 20261203u, 0.4, 23); }

isoquant::LeastSquaresOptions householderOnly()
{
    isoquant::LeastSquaresOptions options;
    options.normalEquationsFromRows = std::numeric_limits<Eigen::Index>::max();
    return options;
}

// The same rows, not held in memory as far as the engine can tell: every pass copies blocks.
class RowsInBlocksOnly : public isoquant::MatrixRows {
public:
    using MatrixRows::MatrixRows;
    std::optional<isoquant::HeldColumns> heldColumns() const override { return std::nullopt; }
};

const int kinds[] = {static_cast<int>(isoquant::CovarianceKind::classical), static_cast<int>(isoquant::CovarianceKind::hc1),
                     static_cast<int>(isoquant::CovarianceKind::hc3), static_cast<int>(isoquant::CovarianceKind::cluster)};

} // namespace

// Against the long double Householder route (the most exact the engine has): the refined
// coefficients within 1e-15, the standard errors within 1e-13 (the normal equations' covariance
// carries u·κ², κ about 40 here), every covariance kind.
BOOST_DATA_TEST_CASE(the_normal_equations_agree_with_the_householder_routes, bdata::make(kinds), kind)
{
    const Regression data = invented(manyRows);
    isoquant::LeastSquaresOptions options;
    options.covariance = static_cast<isoquant::CovarianceKind>(kind);
    options.clusters = data.clusters;
    const auto normal = isoquant::fitLeastSquares(data.design, data.response, 0, options);
    BOOST_TEST(normal.fromNormalEquations);
    BOOST_TEST(normal.factorisedInDouble);

    isoquant::LeastSquaresOptions extendedOptions = householderOnly();
    extendedOptions.covariance = options.covariance;
    extendedOptions.clusters = data.clusters;
    extendedOptions.doublePrecisionErrorLimit = 0;
    const auto extended = isoquant::fitLeastSquares(data.design, data.response, 0, extendedOptions);
    BOOST_TEST(!extended.factorisedInDouble);
    // Tolerances (common practice, no source): a few units of rounding for the refined
    // coefficients and residuals; u·κ² with κ ≈ 40 and a few hundred units for the covariance.
    BOOST_TEST(relativeDifference(normal.inference.estimates, extended.inference.estimates) <= 1e-15);
    BOOST_TEST(relativeDifference(normal.residuals, extended.residuals) <= 1e-14);
    BOOST_TEST(relativeDifference(normal.inference.standardErrors, extended.inference.standardErrors) <= 1e-13);
    BOOST_TEST(std::fabs(normal.summary.rSquared - extended.summary.rSquared) <= 1e-15);
    BOOST_TEST(std::fabs(normal.summary.conditionNumber / extended.summary.conditionNumber - 1) <= 1e-12);

    isoquant::LeastSquaresOptions doubleOptions = householderOnly();
    doubleOptions.covariance = options.covariance;
    doubleOptions.clusters = data.clusters;
    const auto householder = isoquant::fitLeastSquares(data.design, data.response, 0, doubleOptions);
    BOOST_TEST(householder.factorisedInDouble);
    BOOST_TEST(!householder.fromNormalEquations);
    BOOST_TEST_MESSAGE("relative distance of the coefficients from the long double route: normal equations "
                       << relativeDifference(normal.inference.estimates, extended.inference.estimates)
                       << ", double Householder "
                       << relativeDifference(householder.inference.estimates, extended.inference.estimates));
}

// The passes that copy blocks (rows not held in memory) give the fit of the passes that read
// held columns in place, to rounding: Xᵀr and the Gram matrix are summed in another order (held
// columns of up to six go through column_products.hpp's four lanes, copied blocks through Eigen's
// products), so the refined coefficients may differ by what the refinement step itself rounds,
// about u·κ (κ ≈ 40 here: 9e-15), and the standard errors, which come from the Gram matrix's
// factor, by its rounding, u·κ² (2e-13; the bound the test above holds each route to against the
// long double route).
BOOST_AUTO_TEST_CASE(rows_in_blocks_give_the_same_fit_as_rows_held_in_memory)
{
    const Regression data = invented(manyRows);
    const auto held = isoquant::fitLeastSquares(isoquant::MatrixRows(data.design, data.response), 0);
    const auto blocks = isoquant::fitLeastSquares(RowsInBlocksOnly(data.design, data.response), 0);
    BOOST_TEST(held.fromNormalEquations);
    BOOST_TEST(blocks.fromNormalEquations);
    BOOST_TEST(relativeDifference(held.inference.estimates, blocks.inference.estimates) <= 1e-14);
    BOOST_TEST(relativeDifference(held.residuals, blocks.residuals) <= 1e-14);
    BOOST_TEST(relativeDifference(held.inference.standardErrors, blocks.inference.standardErrors) <= 1e-13);
}

// Rows filled in longer runs than they are summed (LeastSquaresOptions::rowsPerFill) give the same
// partial sums whenever the run is a whole number of summed blocks: every digit of the fit, the
// Cobb-Douglas fit's kept logs included, is that of 512-row blocks.
BOOST_AUTO_TEST_CASE(longer_fills_change_no_digit)
{
    const Regression data = invented(manyRows);
    isoquant::LeastSquaresOptions options;
    options.sumExpResiduals = true;
    options.keepResiduals = false;
    options.rowsPerFill = options.rowsPerBlock;
    const auto reference = isoquant::fitLeastSquares(data.design, data.response, 0, options);
    for (const Eigen::Index fill : {Eigen::Index{4096}, Eigen::Index{8192}, manyRows}) {
        options.rowsPerFill = fill;
        const auto fit = isoquant::fitLeastSquares(data.design, data.response, 0, options);
        BOOST_TEST(fit.fromNormalEquations);
        BOOST_TEST((fit.inference.estimates.array() == reference.inference.estimates.array()).all());
        BOOST_TEST((fit.inference.standardErrors.array() == reference.inference.standardErrors.array()).all());
        BOOST_TEST(fit.summary.residualSumOfSquares == reference.summary.residualSumOfSquares);
        BOOST_TEST(fit.sumOfExpResiduals == reference.sumOfExpResiduals);
    }
}

// Power-of-two units are exact on this route too: squares scale by powers of four, the scaled
// Gram matrix is the same bit for bit, and so is every digit of the fit.
BOOST_AUTO_TEST_CASE(power_of_two_units_change_no_digit)
{
    const Regression data = invented(manyRows);
    Eigen::MatrixXd scaled = data.design;
    const double factor = std::ldexp(1.0, 200);
    scaled.col(2) *= factor;
    const auto plain = isoquant::fitLeastSquares(data.design, data.response, 0);
    const auto wide = isoquant::fitLeastSquares(scaled, data.response, 0);
    BOOST_TEST(wide.fromNormalEquations);
    BOOST_TEST(wide.inference.estimates(2) * factor == plain.inference.estimates(2));
    BOOST_TEST(wide.inference.estimates(1) == plain.inference.estimates(1));
    BOOST_TEST(wide.inference.standardErrors(3) == plain.inference.standardErrors(3));
}

// Columns whose squares would overflow or underflow, and values that are not finite, leave the
// route to the Householder one, which scales first or names the value.
BOOST_AUTO_TEST_CASE(columns_beyond_the_gram_range_take_the_householder_route)
{
    const Regression data = invented(manyRows);
    for (const int exponent : {600, -600}) {
        Eigen::MatrixXd extreme = data.design;
        extreme.col(3) *= std::ldexp(1.0, exponent);
        const auto fit = isoquant::fitLeastSquares(extreme, data.response, 0);
        BOOST_TEST(!fit.fromNormalEquations);
        BOOST_TEST(fit.factorisedInDouble);
        BOOST_TEST(fit.inference.estimates.allFinite());
    }
    Eigen::MatrixXd withNaN = data.design;
    withNaN(manyRows / 2, 1) = std::numeric_limits<double>::quiet_NaN();
    BOOST_CHECK_THROW(isoquant::fitLeastSquares(withNaN, data.response, 0), std::invalid_argument);
}

// Ill-conditioned rows (κ far above what one refinement step repairs) stay on the Householder
// routes: here two slopes differ by noise of 1e-6 of their size.
BOOST_AUTO_TEST_CASE(ill_conditioned_rows_are_not_taken_through_the_normal_equations)
{
    Regression data = invented(manyRows);
    std::mt19937 generator(7u);
    std::normal_distribution<double> normal;
    for (Eigen::Index i = 0; i < manyRows; ++i) data.design(i, 3) = data.design(i, 2) * (1.0 + 1e-6 * normal(generator));
    const auto fit = isoquant::fitLeastSquares(data.design, data.response, 0);
    BOOST_TEST(!fit.fromNormalEquations);
    BOOST_TEST(!fit.factorisedInDouble);
}

// A Cobb-Douglas fit of many rows (its logs kept and read in place by the later passes, controls
// included) against the Householder route on the same logs.
BOOST_AUTO_TEST_CASE(a_cobb_douglas_fit_of_many_rows_agrees_with_the_householder_route)
{
    std::mt19937 generator(20261203u);
    std::normal_distribution<double> normal;
    isoquant::ProductionData data;
    data.output.resize(manyRows);
    data.inputs.resize(manyRows, 3);
    data.controls.resize(manyRows, 1);
    data.inputLabels = {"labour", "capital", "energy"};
    data.controlLabels = {"shift"};
    for (Eigen::Index i = 0; i < manyRows; ++i) {
        double logOutput = 0.4 + 0.1 * normal(generator);
        for (Eigen::Index j = 0; j < 3; ++j) {
            const double logInput = 4.0 + 0.6 * normal(generator);
            data.inputs(i, j) = std::exp(logInput);
            logOutput += (0.2 + 0.2 * static_cast<double>(j)) * logInput;
        }
        data.controls(i, 0) = static_cast<double>(i % 3);
        data.output(i) = std::exp(logOutput + 0.05 * data.controls(i, 0));
    }
    const isoquant::ProductionFit fit = isoquant::fitProduction(data, {});

    Eigen::MatrixXd design(manyRows, 5);
    Eigen::VectorXd response(manyRows);
    design.col(0).setOnes();
    for (Eigen::Index j = 0; j < 3; ++j) isoquant::exactLogs(&data.inputs(0, j), &design(0, 1 + j), manyRows);
    design.col(4) = data.controls.col(0);
    isoquant::exactLogs(data.output.data(), response.data(), manyRows);
    const auto householder = isoquant::fitLeastSquares(design, response, 0, householderOnly());
    BOOST_TEST(relativeDifference(fit.inference.estimates, householder.inference.estimates) <= 1e-14);
    BOOST_TEST(relativeDifference(fit.inference.standardErrors, householder.inference.standardErrors) <= 1e-13);
    // Its residuals are not kept; their sums come from the refinement's pass, to first order in the
    // step (least_squares_factor.hpp, refineWithResidualSums).
    BOOST_TEST(fit.residuals.size() == 0);
    BOOST_TEST(std::fabs(fit.summary.residualSumOfSquares / householder.summary.residualSumOfSquares - 1) <= 1e-13);
    BOOST_TEST(std::fabs(fit.smearingFactor / isoquant::meanOfExactExps(householder.residuals) - 1) <= 1e-14);
}

// Without residuals to keep, the pass that refines the coefficients also gives Σr² and Σe^r of the
// refined ones: against the same sums taken in long double over the residuals of the same
// coefficients (the most exact reference at hand), within a few units of rounding (common practice,
// no source), and the coefficients are those of the route that keeps the residuals, bit for bit.
BOOST_AUTO_TEST_CASE(the_residual_sums_without_residuals_match_long_double_sums)
{
    const Regression data = invented(manyRows);
    isoquant::LeastSquaresOptions options;
    options.sumExpResiduals = true;
    const auto kept = isoquant::fitLeastSquares(data.design, data.response, 0, options);
    options.keepResiduals = false;
    const auto summed = isoquant::fitLeastSquares(data.design, data.response, 0, options);
    BOOST_TEST(summed.fromNormalEquations);
    BOOST_TEST(summed.residuals.size() == 0);
    BOOST_TEST(kept.residuals.size() == manyRows);
    BOOST_TEST((summed.inference.estimates.array() == kept.inference.estimates.array()).all());

    const Eigen::VectorXd& b = summed.inference.estimates;
    long double squares = 0;
    long double exps = 0;
    for (Eigen::Index i = 0; i < manyRows; ++i) {
        long double residual = data.response(i);
        for (Eigen::Index j = 0; j < b.size(); ++j) residual -= static_cast<long double>(b(j)) * data.design(i, j);
        squares += residual * residual;
        exps += std::exp(residual);
    }
    BOOST_TEST(std::fabs(summed.summary.residualSumOfSquares / static_cast<double>(squares) - 1) <= 4e-16);
    BOOST_TEST(std::fabs(summed.sumOfExpResiduals / static_cast<double>(exps) - 1) <= 4e-16);
    BOOST_TEST(std::fabs(kept.summary.residualSumOfSquares / summed.summary.residualSumOfSquares - 1) <= 1e-14);
    BOOST_TEST(std::fabs(kept.sumOfExpResiduals / summed.sumOfExpResiduals - 1) <= 1e-14);
}
