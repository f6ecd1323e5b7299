// NIST StRD linear least-squares sets through the core's general least-squares entry point.
// Source: NIST/ITL Statistical Reference Datasets, certified values in each tests/data/nist-strd/*.dat.
// Accuracy is graded by the log relative error (LRE, McCullough 1998) of every certified estimate,
// standard deviation, residual SD and R². Required: what DEVELOPERS.md ("Numerical choices") claims,
// LRE ≥ 9.7 on every set but Filip (lowest reached: Wampler5, 9.74) and ≥ 7.6 on Filip (7.61), by
// the automatic choice of route, with two rows per block and by the long double route alone. The
// double route alone is checked on the sets the automatic choice sends it (Norris, Pontius, NoInt1,
// NoInt2); forced onto Wampler5 it reaches only 6.4, which is why the error estimate exists.
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

// Every certified value at the case's LRE, with the given options (which choose the factorisation).
// Returns whether the fit was factorised in double.
bool checkCertifiedValues(const NistCase& nistCase, const isoquant::LeastSquaresOptions& options)
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
    std::cout << nistCase.file << (fit.factorisedInDouble ? " (double QR)" : " (long double QR)") << ": lowest LRE reached "
              << worst << " (required " << nistCase.requiredLre << ")\n";
    return fit.factorisedInDouble;
}

} // namespace

// Default options: well-conditioned sets (Norris, for one) take the double route.
// The route chosen is the one DEVELOPERS.md names (a documentation check).
BOOST_DATA_TEST_CASE(nist_certified_values_are_reproduced, bdata::make(nistCases), nistCase)
{
    const auto sameFile = [&](const NistCase& other) { return std::string(other.file) == nistCase.file; };
    const bool expectDouble = std::any_of(std::begin(doubleRouteCases), std::end(doubleRouteCases), sameFile);
    BOOST_TEST(checkCertifiedValues(nistCase, {}) == expectDouble, nistCase.file << " factorised in double");
}

// Every set through the long double route alone, so that route stays checked on the easy sets too.
BOOST_DATA_TEST_CASE(nist_certified_values_in_extended_precision, bdata::make(nistCases), nistCase)
{
    isoquant::LeastSquaresOptions options;
    options.doublePrecisionErrorLimit = 0;
    BOOST_TEST(!checkCertifiedValues(nistCase, options));
}

// The double route alone (the error estimate's limit out of the way) on the sets it is chosen for.
BOOST_DATA_TEST_CASE(nist_certified_values_in_double_precision, bdata::make(doubleRouteCases), nistCase)
{
    isoquant::LeastSquaresOptions options;
    options.doublePrecisionErrorLimit = std::numeric_limits<double>::infinity();
    BOOST_TEST(checkCertifiedValues(nistCase, options));
}

// The double route folds the rows in blocks (TSQR); with two rows per block every set is folded in
// many steps, and every certified value must still be reached.
BOOST_DATA_TEST_CASE(nist_certified_values_with_two_rows_per_block, bdata::make(nistCases), nistCase)
{
    isoquant::LeastSquaresOptions options;
    options.rowsPerBlock = 2;
    checkCertifiedValues(nistCase, options);
}
