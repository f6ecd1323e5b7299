// The blocked (TSQR) factorisation against itself: results must not depend on the block size or
// on the units of the data. Invented data (property tests).
#include "isoquant/math/numerics/least_squares.hpp"
#include "invented_regression.hpp"

#include <boost/test/data/test_case.hpp>
#include <boost/test/unit_test.hpp>

#include <cmath>
#include <random>

namespace bdata = boost::unit_test::data;

namespace {

using isoquant::testing::relativeDifference;
using Regression = isoquant::testing::InventedRegression;

Regression invented(Eigen::Index rows) { return isoquant::testing::inventedRegression(rows, 20261202u, 1.0, 17); }

const int kinds[] = {static_cast<int>(isoquant::CovarianceKind::classical), static_cast<int>(isoquant::CovarianceKind::hc1),
                     static_cast<int>(isoquant::CovarianceKind::hc3), static_cast<int>(isoquant::CovarianceKind::cluster)};

} // namespace

BOOST_DATA_TEST_CASE(block_size_changes_no_result_beyond_rounding, bdata::make(kinds), kind)
{
    const Regression data = invented(1000);
    isoquant::LeastSquaresOptions options;
    options.covariance = static_cast<isoquant::CovarianceKind>(kind);
    options.clusters = data.clusters;
    options.rowsPerBlock = 100000; // one block
    const auto whole = isoquant::fitLeastSquares(data.design, data.response, 0, options);
    for (const Eigen::Index rowsPerBlock : {1, 7, 64}) {
        options.rowsPerBlock = rowsPerBlock;
        const auto blocked = isoquant::fitLeastSquares(data.design, data.response, 0, options);
        BOOST_TEST(blocked.factorisedInDouble);
        // 1e-12: a few hundred units of rounding for different orders of the same sums
        // (common practice, no source).
        BOOST_TEST(relativeDifference(blocked.inference.estimates, whole.inference.estimates) <= 1e-12);
        BOOST_TEST(relativeDifference(blocked.inference.standardErrors, whole.inference.standardErrors) <= 1e-12);
        BOOST_TEST(relativeDifference(blocked.residuals, whole.residuals) <= 1e-12);
        BOOST_TEST(std::fabs(blocked.summary.rSquared - whole.summary.rSquared) <= 1e-12);
    }
}

// Power-of-two units are exact: a column 2^1000 times larger (values near 1e301, whose squares
// overflow) must give the same fit with its coefficient 2^1000 times smaller, bit for bit.
BOOST_AUTO_TEST_CASE(huge_columns_are_scaled_before_any_square_is_taken)
{
    const Regression data = invented(300);
    Eigen::MatrixXd huge = data.design;
    const double factor = std::ldexp(1.0, 1000);
    huge.col(2) *= factor;
    isoquant::LeastSquaresOptions options;
    options.rowsPerBlock = 50;
    const auto plain = isoquant::fitLeastSquares(data.design, data.response, 0, options);
    const auto scaled = isoquant::fitLeastSquares(huge, data.response, 0, options);
    BOOST_TEST(scaled.inference.estimates.allFinite());
    BOOST_TEST(scaled.inference.estimates(2) * factor == plain.inference.estimates(2));
    BOOST_TEST(scaled.inference.estimates(1) == plain.inference.estimates(1));
    BOOST_TEST(scaled.inference.standardErrors(3) == plain.inference.standardErrors(3));
    BOOST_TEST(scaled.summary.conditionNumber == plain.summary.conditionNumber);
}

// A later block with much larger values than the first ones rescales the factor built so far.
BOOST_AUTO_TEST_CASE(a_later_block_of_larger_values_rescales_the_factor)
{
    Regression data = invented(400);
    data.design.col(3).tail(200) *= std::ldexp(1.0, 600); // the last 20 blocks of 10 rows near 1e181
    isoquant::LeastSquaresOptions options;
    options.rowsPerBlock = 100000;
    const auto whole = isoquant::fitLeastSquares(data.design, data.response, 0, options);
    options.rowsPerBlock = 10;
    const auto blocked = isoquant::fitLeastSquares(data.design, data.response, 0, options);
    BOOST_TEST(relativeDifference(blocked.inference.estimates, whole.inference.estimates) <= 1e-12);
    BOOST_TEST(blocked.inference.estimates.allFinite());
}

// Tiny columns are scaled the same way: 2^−1000 times smaller gives the coefficient 2^1000 times
// larger, bit for bit.
BOOST_AUTO_TEST_CASE(tiny_columns_are_scaled_up_exactly)
{
    const Regression data = invented(300);
    Eigen::MatrixXd tiny = data.design;
    const double factor = std::ldexp(1.0, -1000);
    tiny.col(2) *= factor;
    isoquant::LeastSquaresOptions options;
    options.rowsPerBlock = 50;
    const auto plain = isoquant::fitLeastSquares(data.design, data.response, 0, options);
    const auto scaled = isoquant::fitLeastSquares(tiny, data.response, 0, options);
    BOOST_TEST(scaled.inference.estimates(2) * factor == plain.inference.estimates(2));
    BOOST_TEST(scaled.inference.estimates(3) == plain.inference.estimates(3));
}

// A column of subnormal values (below 2.2e−308) cannot be brought to unit order (its scale 2^1074
// overflows) and its coefficient would overflow: it is refused as a zero column, naming it. The
// fuzzer found the old failure: a scale of +inf, then NaN in the factor.
BOOST_AUTO_TEST_CASE(a_column_of_subnormal_values_is_refused_as_collinear)
{
    const Regression data = invented(60);
    Eigen::MatrixXd subnormal = data.design;
    for (Eigen::Index i = 0; i < subnormal.rows(); ++i) subnormal(i, 2) = (i % 3 + 1) * 5e-324;
    for (const Eigen::Index rowsPerBlock : {Eigen::Index{10}, Eigen::Index{100000}}) {
        isoquant::LeastSquaresOptions options;
        options.rowsPerBlock = rowsPerBlock;
        try {
            isoquant::fitLeastSquares(subnormal, data.response, 0, options);
            BOOST_ERROR("a subnormal column was fitted");
        } catch (const isoquant::CollinearColumns& error) {
            BOOST_TEST(error.columns() == std::vector<Eigen::Index>{2}, boost::test_tools::per_element());
        }
    }
}
