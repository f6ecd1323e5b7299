// Properties that define the index formulas in the literature, checked on invented, seeded
// quantities and shares (growth_series.hpp) through PRODINDEX's cell path and the core.
// Sources, named beside each check:
// - "Fisher (1922)": I. Fisher, The Making of Index Numbers (1922): the time reversal test
//   I(0→1)·I(1→0) = 1, and the ideal index as the geometric mean of Laspeyres and Paasche
//   (from memory).
// - "Diewert (1992)": W. E. Diewert, "Fisher ideal output, input and productivity indexes
//   revisited", Journal of Productivity Analysis 3, 211–248: the identity test (constant quantities
//   give 1), the proportionality test (quantities all multiplied by λ give λ) and time reversal,
//   all met by the Fisher and Törnqvist indexes (from memory).
// Tolerances: every index here is a chain of at most 40 links, each a sum of at most 6 products
// of numbers of order 1, formed in double precision; rounding stays below 1e-13 relative, and
// 1e-12 leaves margin while any formula slip (a share of the wrong period, a missing ½) moves the
// figures by 1e-3 or more.
#include "isoquant/sheet/functions/growth_functions.hpp"
#include "isoquant/math/growth/index_numbers.hpp"
#include "cell_tables.hpp"
#include "growth_series.hpp"
#include "relative_error.hpp"

#include <boost/test/unit_test.hpp>

#include <cmath>

using isoquant::IndexFormula;
using isoquant::testing::closeTo;
using isoquant::testing::columnValues;
using isoquant::testing::numberRange;

namespace {

constexpr double relativeTolerance = 1e-12;
constexpr IndexFormula allFormulas[] = {IndexFormula::tornqvist, IndexFormula::laspeyres, IndexFormula::paasche,
                                        IndexFormula::fisher};
const char* const methodWords[] = {"tornqvist", "laspeyres", "paasche", "fisher"};

// PRODINDEX through its cell path.
Eigen::VectorXd cellIndex(const Eigen::MatrixXd& quantities, const Eigen::MatrixXd& shares, const char* method,
                          isoquant::Cell base = {})
{
    return columnValues(isoquant::quantityIndexColumn(numberRange(quantities), numberRange(shares),
                                                      std::string(method), base));
}

// The same periods in reverse order, so the chain runs from the last period back to the first.
Eigen::MatrixXd reversed(const Eigen::MatrixXd& values) { return values.colwise().reverse(); }

struct Series {
    Eigen::MatrixXd quantities;
    Eigen::MatrixXd shares;
};

Series series(unsigned seed, Eigen::Index periods = 40, Eigen::Index items = 4)
{
    std::mt19937 engine(seed);
    Series made;
    made.quantities = isoquant::testing::wanderingQuantities(engine, periods, items);
    made.shares = isoquant::testing::driftingShares(engine, periods, items);
    return made;
}

} // namespace

BOOST_AUTO_TEST_SUITE(index_numbers)

// Time reversal (Fisher 1922; Diewert 1992): the index from period 1 to n times the index run
// back from n to 1 is 1, for Törnqvist and Fisher; for each link too (two periods).
BOOST_AUTO_TEST_CASE(tornqvist_and_fisher_pass_time_reversal)
{
    for (const unsigned seed : {11u, 12u, 13u}) {
        const Series data = series(seed);
        for (const char* method : {"tornqvist", "fisher"}) {
            const Eigen::VectorXd forward = cellIndex(data.quantities, data.shares, method);
            const Eigen::VectorXd backward = cellIndex(reversed(data.quantities), reversed(data.shares), method);
            BOOST_TEST_INFO(method << ", seed " << seed);
            BOOST_TEST(closeTo(forward(forward.size() - 1) * backward(backward.size() - 1), 1.0, relativeTolerance));
        }
        // Laspeyres is not time-reversible (Fisher 1922): the test can fail on these data.
        const Eigen::VectorXd forward = cellIndex(data.quantities, data.shares, "laspeyres");
        const Eigen::VectorXd backward = cellIndex(reversed(data.quantities), reversed(data.shares), "laspeyres");
        BOOST_TEST(std::fabs(forward(forward.size() - 1) * backward(backward.size() - 1) - 1) > 1e-6);
    }
}

// Identity (Diewert 1992): quantities that do not change give 1 in every period, whatever the
// shares do, for every method.
BOOST_AUTO_TEST_CASE(constant_quantities_give_one)
{
    const Series data = series(21);
    const Eigen::MatrixXd constant = data.quantities.row(0).replicate(data.quantities.rows(), 1);
    for (std::size_t m = 0; m < 4; ++m) {
        const Eigen::VectorXd index = cellIndex(constant, data.shares, methodWords[m]);
        for (Eigen::Index t = 0; t < index.size(); ++t) {
            BOOST_TEST_INFO(methodWords[m] << ", period " << t + 1);
            BOOST_TEST(closeTo(index(t), 1.0, relativeTolerance));
        }
    }
}

// Fisher is the geometric mean of Laspeyres and Paasche (Fisher 1922), link by link and so along
// the chain.
BOOST_AUTO_TEST_CASE(fisher_is_the_geometric_mean_of_laspeyres_and_paasche)
{
    const Series data = series(31);
    const Eigen::VectorXd laspeyres = cellIndex(data.quantities, data.shares, "laspeyres");
    const Eigen::VectorXd paasche = cellIndex(data.quantities, data.shares, "paasche");
    const Eigen::VectorXd fisher = cellIndex(data.quantities, data.shares, "fisher");
    for (Eigen::Index t = 0; t < fisher.size(); ++t) {
        BOOST_TEST_INFO("period " << t + 1);
        BOOST_TEST(closeTo(fisher(t), std::sqrt(laspeyres(t) * paasche(t)), relativeTolerance));
    }
    // Not the same three numbers: Laspeyres and Paasche differ on these data.
    BOOST_TEST(std::fabs(laspeyres(fisher.size() - 1) / paasche(fisher.size() - 1) - 1) > 1e-6);
}

// Proportionality (Diewert 1992): when every quantity grows by the same factor λ_t from one
// period to the next, every index grows by λ_t, so the chained index is Π λ (times the base).
BOOST_AUTO_TEST_CASE(common_growth_factor_is_the_index_growth)
{
    const Series data = series(41);
    std::mt19937 engine(42);
    std::uniform_real_distribution<double> factor(0.8, 1.25);
    Eigen::MatrixXd quantities(data.quantities.rows(), data.quantities.cols());
    Eigen::VectorXd expected(data.quantities.rows());
    quantities.row(0) = data.quantities.row(0);
    expected(0) = 100;
    for (Eigen::Index t = 1; t < quantities.rows(); ++t) {
        const double lambda = factor(engine);
        quantities.row(t) = lambda * quantities.row(t - 1);
        expected(t) = expected(t - 1) * lambda;
    }
    for (std::size_t m = 0; m < 4; ++m) {
        const Eigen::VectorXd index = cellIndex(quantities, data.shares, methodWords[m], 100.0);
        BOOST_TEST(index(0) == 100.0); // the base, exactly
        for (Eigen::Index t = 1; t < index.size(); ++t) {
            BOOST_TEST_INFO(methodWords[m] << ", period " << t + 1);
            BOOST_TEST(closeTo(index(t), expected(t), relativeTolerance));
        }
    }
}

// From the Törnqvist formula itself: with shares constant over time, ln L_t = Σ sᵢ Δln qᵢ
// telescopes, so the chained index is Πᵢ (qᵢ,t / qᵢ,1)^sᵢ, a Cobb-Douglas aggregate of the
// quantities; and the chain does not depend on the path between the two end periods.
BOOST_AUTO_TEST_CASE(tornqvist_with_constant_shares_is_a_geometric_aggregate)
{
    const Series data = series(51);
    const Eigen::MatrixXd constantShares = data.shares.row(0).replicate(data.shares.rows(), 1);
    const Eigen::VectorXd index = cellIndex(data.quantities, constantShares, "tornqvist");
    for (Eigen::Index t = 0; t < index.size(); ++t) {
        double expected = 1;
        for (Eigen::Index i = 0; i < data.quantities.cols(); ++i)
            expected *= std::pow(data.quantities(t, i) / data.quantities(0, i), constantShares(0, i));
        BOOST_TEST_INFO("period " << t + 1);
        BOOST_TEST(closeTo(index(t), expected, relativeTolerance));
    }
}

// Shares that sum to 0.995 or 1.008 in every period (within PRODINDEX's 0.01, so accepted) are
// rescaled to sum to 1 first: the identity and proportionality tests (Diewert 1992) hold for all
// four methods exactly as with shares summing to 1; used as given, Laspeyres would fall by 0.5% a
// link on constant quantities (0.995 per link), and Paasche too. Quantities × 1.1 every period:
// the index × 1.1 per link.
BOOST_AUTO_TEST_CASE(shares_off_by_less_than_the_tolerance_are_rescaled)
{
    const Series data = series(61, 11);
    const Eigen::MatrixXd constant = data.quantities.row(0).replicate(data.quantities.rows(), 1);
    Eigen::MatrixXd growing(data.quantities.rows(), data.quantities.cols());
    for (Eigen::Index t = 0; t < growing.rows(); ++t) growing.row(t) = std::pow(1.1, t) * data.quantities.row(0);
    for (const double sum : {0.995, 1.008}) {
        const Eigen::MatrixXd offShares = sum * data.shares;
        for (std::size_t m = 0; m < 4; ++m) {
            const Eigen::VectorXd identity = cellIndex(constant, offShares, methodWords[m], 100.0);
            const Eigen::VectorXd proportional = cellIndex(growing, offShares, methodWords[m], 100.0);
            const Eigen::VectorXd asIfSummingToOne = cellIndex(data.quantities, data.shares, methodWords[m]);
            const Eigen::VectorXd rescaled = cellIndex(data.quantities, offShares, methodWords[m]);
            for (Eigen::Index t = 1; t < identity.size(); ++t) {
                BOOST_TEST_INFO(methodWords[m] << ", shares summing to " << sum << ", period " << t + 1);
                BOOST_TEST(closeTo(identity(t), 100.0, relativeTolerance));
                BOOST_TEST(closeTo(proportional(t) / proportional(t - 1), 1.1, relativeTolerance));
                BOOST_TEST(closeTo(rescaled(t), asIfSummingToOne(t), relativeTolerance));
            }
        }
    }
}

// The chain carried in logs stays finite where the quantity relatives themselves are beyond the
// range of doubles but the index is not: one item jumps by 1e200 and back, with weight on it.
BOOST_AUTO_TEST_CASE(extreme_relatives_do_not_overflow_the_links)
{
    Eigen::MatrixXd quantities(3, 2);
    quantities << 1e-150, 1, 1e150, 1, 1e-150, 1;
    Eigen::MatrixXd shares(3, 2);
    shares << 0.5, 0.5, 0.5, 0.5, 0.5, 0.5;
    for (std::size_t m = 0; m < 4; ++m) {
        const Eigen::VectorXd logIndex =
            isoquant::chainedLogQuantityIndex(allFormulas[m], quantities, shares);
        BOOST_TEST_INFO(methodWords[m]);
        BOOST_TEST(logIndex.allFinite());
    }
    // Törnqvist: ½·ln 1e300 up and back: the identity across the round trip (Diewert 1992).
    const Eigen::VectorXd tornqvist = isoquant::chainedLogQuantityIndex(IndexFormula::tornqvist, quantities, shares);
    BOOST_TEST(std::fabs(tornqvist(2)) <= 1e-12 * std::log(1e300));
}

BOOST_AUTO_TEST_SUITE_END()
