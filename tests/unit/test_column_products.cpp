// The sums of products of the normal-equations route (numerics/column_products.hpp): row i in lane
// i mod 4 at both widths, so the same bits whichever processor; each lane the plain sum of its rows'
// products in row order; residuals y − Σⱼ bⱼxⱼ subtracted in column order.
#include "isoquant/math/numerics/column_products.hpp"

#include <boost/test/unit_test.hpp>

#include <cmath>
#include <cstring>
#include <random>
#include <vector>

namespace {

namespace products = isoquant::column_products;
using isoquant::column_kernels::Width;
using Lanes = double[products::lanes];

// (An empty vector's data() may be null, which memcmp may not be given even for no bytes.)
bool sameBits(const double* a, const double* b, std::size_t count)
{
    return count == 0 || std::memcmp(a, b, count * sizeof(double)) == 0;
}

// Columns of `rows` values spread over several orders of magnitude and both signs (invented).
std::vector<std::vector<double>> inventedColumns(int count, std::size_t rows, unsigned seed)
{
    std::mt19937_64 generator(seed);
    std::uniform_real_distribution<double> exponent(-3.0, 3.0);
    std::bernoulli_distribution negative(0.3);
    std::vector<std::vector<double>> columns(static_cast<std::size_t>(count), std::vector<double>(rows));
    for (auto& column : columns)
        for (double& value : column) value = (negative(generator) ? -1.0 : 1.0) * std::exp(exponent(generator));
    return columns;
}

std::vector<const double*> pointers(const std::vector<std::vector<double>>& columns)
{
    std::vector<const double*> result;
    for (const auto& column : columns) result.push_back(column.data());
    return result;
}

// The lengths every test takes: none, fewer than a packet, pairs of packets and the rest, and
// blocks of the sizes the route uses.
std::vector<std::size_t> lengths()
{
    std::vector<std::size_t> result;
    for (std::size_t n = 0; n <= 19; ++n) result.push_back(n);
    result.push_back(512);
    result.push_back(1001);
    return result;
}

struct CrossProducts {
    std::vector<double> sums; // pairs × lanes
};

CrossProducts crossProducts(const std::vector<std::vector<double>>& columns, std::size_t rows, Width width)
{
    const int count = static_cast<int>(columns.size());
    std::vector<Lanes> sums(static_cast<std::size_t>(count * (count + 1) / 2));
    for (auto& sum : sums)
        for (double& lane : sum) lane = 0.25; // the kernels add to what is there
    products::addCrossProducts(pointers(columns).data(), count, rows, sums.data(), width);
    CrossProducts result;
    for (const auto& sum : sums) result.sums.insert(result.sums.end(), sum, sum + products::lanes);
    return result;
}

struct ResidualProducts {
    std::vector<double> residuals;
    std::vector<double> sums; // columns × lanes, then the squares' lanes
};

ResidualProducts residualProducts(const std::vector<std::vector<double>>& design, const std::vector<double>& response,
                                  const std::vector<double>& coefficients, std::size_t rows, Width width)
{
    const int count = static_cast<int>(design.size());
    std::vector<Lanes> sums(static_cast<std::size_t>(count));
    for (auto& sum : sums)
        for (double& lane : sum) lane = 0.0;
    double squares[products::lanes] = {};
    ResidualProducts result;
    result.residuals.assign(rows, 0.0);
    products::addResidualProducts(pointers(design).data(), count, response.data(), coefficients.data(), rows,
                                  result.residuals.data(), sums.data(), squares, width);
    for (const auto& sum : sums) result.sums.insert(result.sums.end(), sum, sum + products::lanes);
    result.sums.insert(result.sums.end(), squares, squares + products::lanes);
    return result;
}

std::vector<double> weightedSums(const std::vector<std::vector<double>>& design, const std::vector<double>& values,
                                 std::size_t rows, Width width)
{
    const int count = static_cast<int>(design.size());
    std::vector<Lanes> sums(static_cast<std::size_t>(count + 1));
    for (auto& sum : sums)
        for (double& lane : sum) lane = 0.0;
    products::addWeightedSums(pointers(design).data(), count, values.data(), rows, sums.data(), width);
    std::vector<double> result;
    for (const auto& sum : sums) result.insert(result.end(), sum, sum + products::lanes);
    return result;
}

} // namespace

BOOST_AUTO_TEST_SUITE(column_products)

BOOST_AUTO_TEST_CASE(both_widths_give_the_same_bits_at_every_length_and_column_count)
{
    if (!isoquant::column_kernels::fourDoublesAvailable())
        BOOST_TEST_MESSAGE("no AVX2 on this processor: both calls take the two-doubles kernels");
    for (int count = 1; count <= products::maxColumns; ++count) {
        for (std::size_t rows : lengths()) {
            const auto columns = inventedColumns(count + 1, rows, 20261203u + static_cast<unsigned>(count));
            const std::vector<std::vector<double>> design(columns.begin(), columns.begin() + count);
            const auto narrowCross = crossProducts(design, rows, Width::twoDoubles);
            const auto wideCross = crossProducts(design, rows, Width::fourDoubles);
            BOOST_TEST(sameBits(narrowCross.sums.data(), wideCross.sums.data(), narrowCross.sums.size()),
                       "cross products, " << count << " columns, " << rows << " rows");

            const std::vector<double> coefficients = inventedColumns(1, static_cast<std::size_t>(count), 7u).front();
            const auto narrow = residualProducts(design, columns.back(), coefficients, rows, Width::twoDoubles);
            const auto wide = residualProducts(design, columns.back(), coefficients, rows, Width::fourDoubles);
            BOOST_TEST(sameBits(narrow.residuals.data(), wide.residuals.data(), rows));
            BOOST_TEST(sameBits(narrow.sums.data(), wide.sums.data(), narrow.sums.size()),
                       "residual products, " << count << " columns, " << rows << " rows");

            const auto narrowWeighted = weightedSums(design, columns.back(), rows, Width::twoDoubles);
            const auto wideWeighted = weightedSums(design, columns.back(), rows, Width::fourDoubles);
            BOOST_TEST(sameBits(narrowWeighted.data(), wideWeighted.data(), narrowWeighted.size()),
                       "weighted sums, " << count << " columns, " << rows << " rows");
        }
    }
}

// What the header promises, written out one row at a time: lane l adds the rows i ≡ l (mod 4) in
// order, each product x_k·x_j (k ≥ j, pairs row by row of the triangle), starting from what the
// sum held; residuals subtract bⱼ·xⱼ in column order.
BOOST_AUTO_TEST_CASE(each_lane_is_the_plain_sum_of_its_rows)
{
    const int count = 4;
    for (std::size_t rows : {std::size_t{13}, std::size_t{512}, std::size_t{1001}}) {
        const auto columns = inventedColumns(count + 1, rows, 20261204u);
        const auto cross = crossProducts(columns, rows, Width::automatic);
        std::vector<double> expected(static_cast<std::size_t>((count + 1) * (count + 2) / 2 * products::lanes), 0.25);
        for (std::size_t i = 0; i < rows; ++i) {
            std::size_t t = 0;
            for (int j = 0; j <= count; ++j)
                for (int k = j; k <= count; ++k, ++t)
                    expected[t * products::lanes + i % products::lanes] += columns[k][i] * columns[j][i];
        }
        BOOST_TEST(sameBits(cross.sums.data(), expected.data(), expected.size()), rows << " rows");

        const std::vector<std::vector<double>> design(columns.begin(), columns.begin() + count);
        const std::vector<double> coefficients = {0.5, -1.25, 3.0, 0.125};
        const auto residual = residualProducts(design, columns.back(), coefficients, rows, Width::automatic);
        std::vector<double> residuals(rows);
        std::vector<double> sums(static_cast<std::size_t>((count + 1) * products::lanes), 0.0);
        for (std::size_t i = 0; i < rows; ++i) {
            double r = columns.back()[i];
            for (int j = 0; j < count; ++j) r -= coefficients[static_cast<std::size_t>(j)] * design[j][i];
            residuals[i] = r;
            for (int j = 0; j < count; ++j) sums[static_cast<std::size_t>(j) * products::lanes + i % products::lanes] += design[j][i] * r;
            sums[static_cast<std::size_t>(count) * products::lanes + i % products::lanes] += r * r;
        }
        BOOST_TEST(sameBits(residual.residuals.data(), residuals.data(), rows));
        BOOST_TEST(sameBits(residual.sums.data(), sums.data(), sums.size()), rows << " rows");
    }
}

// The lanes' total against the sum in long double: within the rounding of a sum of n terms,
// n·u·Σ|terms| (Higham, Accuracy and Stability of Numerical Algorithms, §4.2, from memory), here
// with n = 1001.
BOOST_AUTO_TEST_CASE(the_lanes_total_is_the_sum_to_rounding)
{
    const std::size_t rows = 1001;
    const auto columns = inventedColumns(2, rows, 20261205u);
    const std::vector<std::vector<double>> design(columns.begin(), columns.begin() + 1);
    const std::vector<double> sums = weightedSums(design, columns.back(), rows, Width::automatic);
    Lanes weighted;
    std::memcpy(weighted, sums.data() + products::lanes, sizeof weighted);
    long double exact = 0, magnitude = 0;
    for (std::size_t i = 0; i < rows; ++i) {
        const long double term = static_cast<long double>(design[0][i]) * columns.back()[i];
        exact += term;
        magnitude += std::fabs(term);
    }
    const double bound = static_cast<double>(rows) * std::ldexp(1.0, -53) * static_cast<double>(magnitude);
    BOOST_TEST(std::fabs(static_cast<double>(static_cast<long double>(products::laneTotal(weighted)) - exact)) <= bound);
}

BOOST_AUTO_TEST_SUITE_END()
