// NIST StRD linear least-squares sets through the core's general least-squares entry point.
// Source: NIST/ITL Statistical Reference Datasets, certified values in each tests/data/nist-strd/*.dat.
// Accuracy is graded by the log relative error (LRE, McCullough 1998) of every certified estimate,
// standard deviation, residual SD and R². Required: what DEVELOPERS.md ("Numerical choices") claims,
// LRE ≥ 9.7 on every set but Filip (lowest reached: Wampler5, 9.74) and ≥ 7.6 on Filip (7.61), by
// the automatic choice of route, with two rows per block and by the long double route alone. The
// double route alone is checked on the sets the automatic choice sends it (Norris, Pontius, NoInt1,
// NoInt2); forced onto Wampler5 it reaches only 6.4, which is why the error estimate exists.
// Every set also goes through the normal-equations route (which takes many rows only, by
// default): the sets it qualifies for (those of the double route) must reach the same LREs, the
// others must be left to the Householder routes.
#include "isoquant/math/numerics/least_squares.hpp"
#include "nist_dataset.hpp"
#include "test_data.hpp"

#include <boost/test/data/test_case.hpp>
#include <boost/test/unit_test.hpp>

#include <algorithm>
#include <iostream>
#include <iterator>
#include <limits>
#include <string>

namespace bdata = boost::unit_test::data;
using isoquant::testing::logRelativeError;

namespace {

struct NistCase {
    const char* file;
    double requiredLre;
};

std::ostream& operator<<(std::ostream& out, const NistCase& nistCase) { return out << nistCase.file; }

const NistCase nistCases[] = {
    {"Norris.dat", 9.7},   {"Pontius.dat", 9.7},  {"NoInt1.dat", 9.7},   {"NoInt2.dat", 9.7},
    {"Longley.dat", 9.7},  {"Wampler1.dat", 9.7}, {"Wampler2.dat", 9.7}, {"Wampler3.dat", 9.7},
    {"Wampler4.dat", 9.7}, {"Wampler5.dat", 9.7}, {"Filip.dat", 7.6},
};

// The sets whose automatic choice is the double route (checked below with that route forced).
const NistCase doubleRouteCases[] = {
    {"Norris.dat", 9.7}, {"Pontius.dat", 9.7}, {"NoInt1.dat", 9.7}, {"NoInt2.dat", 9.7}};

} // namespace

namespace {

const char* routeName(const isoquant::LeastSquaresResult& fit)
{
    if (fit.fromNormalEquations) return " (normal equations)";
    return fit.factorisedInDouble ? " (double QR)" : " (long double QR)";
}

// Every certified value at the case's LRE, with the given options (which choose the factorisation).
// Returns the fit, whose flags tell the route taken.
isoquant::LeastSquaresResult checkCertifiedValues(const NistCase& nistCase, const isoquant::LeastSquaresOptions& options)
{
    const auto dataset = isoquant::testing::readNistLinearDataset(isoquant::testing::dataPath("nist-strd/") + nistCase.file);
    const auto fit = isoquant::fitLeastSquares(dataset.design, dataset.response, dataset.interceptColumn, options);

    double worst = 15.0;
    for (Eigen::Index j = 0; j < dataset.certifiedEstimates.size(); ++j) {
        const double estimateLre = logRelativeError(fit.inference.estimates(j), dataset.certifiedEstimates(j));
        const double deviationLre = logRelativeError(fit.inference.standardErrors(j), dataset.certifiedStandardDeviations(j));
        BOOST_TEST(estimateLre >= nistCase.requiredLre, nistCase.file << " B" << j << " estimate LRE " << estimateLre);
        BOOST_TEST(deviationLre >= nistCase.requiredLre, nistCase.file << " B" << j << " SD LRE " << deviationLre);
        worst = std::min({worst, estimateLre, deviationLre});
    }
    const double residualLre =
        logRelativeError(fit.summary.residualStandardDeviation, dataset.certifiedResidualStandardDeviation);
    const double rSquaredLre = logRelativeError(fit.summary.rSquared, dataset.certifiedRSquared);
    BOOST_TEST(residualLre >= nistCase.requiredLre, nistCase.file << " residual SD LRE " << residualLre);
    BOOST_TEST(rSquaredLre >= nistCase.requiredLre, nistCase.file << " R² LRE " << rSquaredLre);
    worst = std::min({worst, residualLre, rSquaredLre});
    std::cout << nistCase.file << routeName(fit) << ": lowest LRE reached " << worst << " (required "
              << nistCase.requiredLre << ")\n";
    return fit;
}

bool takesTheDoubleRoute(const NistCase& nistCase)
{
    const auto sameFile = [&](const NistCase& other) { return std::string(other.file) == nistCase.file; };
    return std::any_of(std::begin(doubleRouteCases), std::end(doubleRouteCases), sameFile);
}

} // namespace

// Default options: well-conditioned sets (Norris, for one) take the double route.
// The route chosen is the one DEVELOPERS.md names (a documentation check).
BOOST_DATA_TEST_CASE(nist_certified_values_are_reproduced, bdata::make(nistCases), nistCase)
{
    const auto fit = checkCertifiedValues(nistCase, {});
    BOOST_TEST(fit.factorisedInDouble == takesTheDoubleRoute(nistCase), nistCase.file << " factorised in double");
    BOOST_TEST(!fit.fromNormalEquations, nistCase.file << " (too few rows for the normal equations)");
}

// The normal-equations route for sets of every size: taken exactly where the double route is.
BOOST_DATA_TEST_CASE(nist_certified_values_through_the_normal_equations, bdata::make(nistCases), nistCase)
{
    isoquant::LeastSquaresOptions options;
    options.normalEquationsFromRows = 0;
    const auto fit = checkCertifiedValues(nistCase, options);
    BOOST_TEST(fit.fromNormalEquations == takesTheDoubleRoute(nistCase), nistCase.file << " through the normal equations");
}

// Every set through the long double route alone, so that route stays checked on the easy sets too.
BOOST_DATA_TEST_CASE(nist_certified_values_in_extended_precision, bdata::make(nistCases), nistCase)
{
    isoquant::LeastSquaresOptions options;
    options.doublePrecisionErrorLimit = 0;
    BOOST_TEST(!checkCertifiedValues(nistCase, options).factorisedInDouble);
}

// The double route alone (the error estimate's limit out of the way) on the sets it is chosen for.
BOOST_DATA_TEST_CASE(nist_certified_values_in_double_precision, bdata::make(doubleRouteCases), nistCase)
{
    isoquant::LeastSquaresOptions options;
    options.doublePrecisionErrorLimit = std::numeric_limits<double>::infinity();
    options.normalEquationsFromRows = std::numeric_limits<Eigen::Index>::max();
    BOOST_TEST(checkCertifiedValues(nistCase, options).factorisedInDouble);
}

// The double route folds the rows in blocks (TSQR); with two rows per block every set is folded in
// many steps, and every certified value must still be reached.
BOOST_DATA_TEST_CASE(nist_certified_values_with_two_rows_per_block, bdata::make(nistCases), nistCase)
{
    isoquant::LeastSquaresOptions options;
    options.rowsPerBlock = 2;
    checkCertifiedValues(nistCase, options);
}
