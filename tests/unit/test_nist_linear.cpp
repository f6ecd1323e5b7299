// NIST StRD linear least-squares sets through the core's general least-squares entry point.
// Source: NIST/ITL Statistical Reference Datasets, certified values in each tests/data/nist-strd/*.dat.
// Accuracy is graded by the log relative error (LRE, McCullough 1998): the targets are
// LRE ≥ 9 on every certified estimate, standard deviation, residual SD and R², and LRE ≥ 7 on Filip.
#include "isoquant/least_squares.hpp"
#include "nist_dataset.hpp"
#include "test_data.hpp"

#include <boost/test/data/test_case.hpp>
#include <boost/test/unit_test.hpp>

#include <algorithm>
#include <iostream>

namespace bdata = boost::unit_test::data;
using isoquant::testing::logRelativeError;

namespace {

struct NistCase {
    const char* file;
    double requiredLre;
};

std::ostream& operator<<(std::ostream& out, const NistCase& nistCase) { return out << nistCase.file; }

const NistCase nistCases[] = {
    {"Norris.dat", 9},   {"Pontius.dat", 9},  {"NoInt1.dat", 9},   {"NoInt2.dat", 9},
    {"Longley.dat", 9},  {"Wampler1.dat", 9}, {"Wampler2.dat", 9}, {"Wampler3.dat", 9},
    {"Wampler4.dat", 9}, {"Wampler5.dat", 9}, {"Filip.dat", 7},
};

} // namespace

namespace {

// Every certified value at the case's LRE, with the given options (which choose the factorisation).
void checkCertifiedValues(const NistCase& nistCase, const isoquant::LeastSquaresOptions& options)
{
    const auto dataset = isoquant::testing::readNistLinearDataset(isoquant::testing::dataPath("nist-strd/") + nistCase.file);
    const auto fit = isoquant::fitLeastSquares(dataset.design, dataset.response, dataset.interceptColumn, options);

    double worst = 15.0;
    for (Eigen::Index j = 0; j < dataset.certifiedEstimates.size(); ++j) {
        const double estimateLre = logRelativeError(fit.coefficients(j), dataset.certifiedEstimates(j));
        const double deviationLre = logRelativeError(fit.standardErrors(j), dataset.certifiedStandardDeviations(j));
        BOOST_TEST(estimateLre >= nistCase.requiredLre, nistCase.file << " B" << j << " estimate LRE " << estimateLre);
        BOOST_TEST(deviationLre >= nistCase.requiredLre, nistCase.file << " B" << j << " SD LRE " << deviationLre);
        worst = std::min({worst, estimateLre, deviationLre});
    }
    const double residualLre =
        logRelativeError(fit.residualStandardDeviation, dataset.certifiedResidualStandardDeviation);
    const double rSquaredLre = logRelativeError(fit.rSquared, dataset.certifiedRSquared);
    BOOST_TEST(residualLre >= nistCase.requiredLre, nistCase.file << " residual SD LRE " << residualLre);
    BOOST_TEST(rSquaredLre >= nistCase.requiredLre, nistCase.file << " R² LRE " << rSquaredLre);
    worst = std::min({worst, residualLre, rSquaredLre});
    std::cout << nistCase.file << (fit.factorisedInDouble ? " (double QR)" : " (long double QR)") << ": lowest LRE reached "
              << worst << " (required " << nistCase.requiredLre << ")\n";
}

} // namespace

// Default options: well-conditioned sets (Norris, for one) take the double route.
BOOST_DATA_TEST_CASE(nist_certified_values_are_reproduced, bdata::make(nistCases), nistCase)
{
    checkCertifiedValues(nistCase, {});
}

// Every set through the long double route alone, so that route stays checked on the easy sets too.
BOOST_DATA_TEST_CASE(nist_certified_values_in_extended_precision, bdata::make(nistCases), nistCase)
{
    isoquant::LeastSquaresOptions options;
    options.doublePrecisionErrorLimit = 0;
    checkCertifiedValues(nistCase, options);
}

// The double route folds the rows in blocks (TSQR); with two rows per block every set is folded in
// many steps, and every certified value must still be reached.
BOOST_DATA_TEST_CASE(nist_certified_values_with_two_rows_per_block, bdata::make(nistCases), nistCase)
{
    isoquant::LeastSquaresOptions options;
    options.rowsPerBlock = 2;
    checkCertifiedValues(nistCase, options);
}
