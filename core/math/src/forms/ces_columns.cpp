#include "isoquant/math/forms/ces_columns.hpp"

#include "forms/ces_rows_wide.hpp"
#include "isoquant/math/forms/ces.hpp"

#include <algorithm>
#include <cmath>
#include <limits>

namespace isoquant {

namespace {

using Packet = Eigen::internal::packet_traits<double>::type; // two doubles on x86-64 (SSE2)
constexpr std::size_t packetSize = Eigen::internal::packet_traits<double>::size;

// The rows from `first` on in packets of the build's width; the last few (fewer than a packet)
// padded with d = 0 and taken by the same packet code.
void narrowRows(const double* logRatio, std::size_t first, std::size_t count, const ces_rows::Shape& shape,
                CesColumns& columns)
{
    const auto outputsAt = [&](std::size_t i) {
        return ces_rows::Outputs{columns.value.data() + i, columns.byLogit.data() + i, columns.byWeight.data() + i,
                                 columns.byCurvature.data() + i};
    };
    std::size_t i = first;
    for (; i + packetSize <= count; i += packetSize) ces_rows::compositePacket<Packet>(logRatio + i, shape, outputsAt(i));
    if (i == count) return;
    double padded[packetSize] = {}, value[packetSize], byLogit[packetSize], byWeight[packetSize], byCurvature[packetSize];
    std::copy(logRatio + i, logRatio + count, padded);
    ces_rows::compositePacket<Packet>(padded, shape, {value, byLogit, byWeight, byCurvature});
    const std::size_t rest = count - i;
    std::copy(value, value + rest, columns.value.data() + i);
    std::copy(byLogit, byLogit + rest, columns.byLogit.data() + i);
    std::copy(byWeight, byWeight + rest, columns.byWeight.data() + i);
    std::copy(byCurvature, byCurvature + rest, columns.byCurvature.data() + i);
}

} // namespace

void evaluateComposite(const Eigen::VectorXd& logRatio, double weight, double curvature, CesColumns& columns,
                       column_kernels::Width width)
{
    const Eigen::Index n = logRatio.size();
    columns.value.resize(n);
    columns.byLogit.resize(n);
    columns.byWeight.resize(n);
    columns.byCurvature.resize(n);
    // A subnormal ρ is taken as 0: H and its derivatives differ from their ρ = 0 values by a
    // relative O(ρ·d), below 1e-290, while u = −ρ·d would be subnormal too and carry only a few
    // bits (1/ρ, which the packets take once, would overflow). At ρ = 0 every u is 0 and the
    // packets take the forms for u = 0; 1/ρ² may overflow (|ρ| < 1.5e-154), but then every |u| is
    // below the series limit and ∂H/∂ρ comes from the series.
    if (std::fabs(curvature) < std::numeric_limits<double>::min()) curvature = 0;
    // The packets take 1/(δ(1 − δ)) once; a weight so near 0 or 1 that it overflows (δ subnormal)
    // goes through CesCompositeCurve's scalar forms, as δ = 0 or 1 does.
    if (weight > 0 && weight < 1 && std::isfinite(1 / (weight * (1 - weight)))) {
        const ces_rows::Shape shape{weight,    1 - weight,     std::log(weight), std::log1p(-weight),
                                    curvature, -1 / curvature, 1 / (curvature * curvature)};
        const auto count = static_cast<std::size_t>(n);
        std::size_t done = 0;
#if defined(ISOQUANT_HAVE_AVX2_KERNELS)
        if (width != column_kernels::Width::twoDoubles && column_kernels::fourDoublesAvailable()) {
            done = count - count % 4;
            ces_rows::avx2::composite(logRatio.data(), done, shape,
                                      {columns.value.data(), columns.byLogit.data(), columns.byWeight.data(),
                                       columns.byCurvature.data()});
        }
#endif
        narrowRows(logRatio.data(), done, count, shape, columns);
        return;
    }
    const CesCompositeCurve curve(weight, curvature);
    for (Eigen::Index i = 0; i < n; ++i) {
        const CesComposite composite = curve.at(logRatio(i));
        columns.value(i) = composite.value;
        columns.byLogit(i) = composite.byWeightLogit;
        columns.byWeight(i) = composite.byWeight;
        columns.byCurvature(i) = composite.byCurvature;
    }
}

std::array<double, cesNormalSumCount> cesNormalSums(const CesColumns& columns, const Eigen::VectorXd& logSecond,
                                                    const Eigen::VectorXd& residuals, column_kernels::Width width)
{
    static_assert(cesNormalSumCount == ces_rows::normalSumCount);
    constexpr int lanes = ces_rows::sumLanes;
    const auto n = static_cast<std::size_t>(logSecond.size());
    const ces_rows::NormalRows rows{columns.byLogit.data(), columns.byCurvature.data(), logSecond.data(),
                                    columns.value.data(), residuals.data()};
    double sums[cesNormalSumCount][lanes] = {};
    // Row i into lane `lane`: the same products and additions as the packets' (no fused
    // multiply-adds in either), so a lane's sum is the same bits whichever code took its rows.
    const auto addRow = [&](std::size_t i, int lane) {
        const double g = rows.logit[i], c = rows.curvature[i], l = rows.second[i] + rows.value[i], r = rows.residuals[i];
        const double terms[cesNormalSumCount] = {g, c, l, g * g, c * g, l * g, c * c, l * c, l * l, r, g * r, c * r, l * r};
        for (int k = 0; k < cesNormalSumCount; ++k) sums[k][lane] += terms[k];
    };
    std::size_t i = 0;
#if defined(ISOQUANT_HAVE_AVX2_KERNELS)
    if (width != column_kernels::Width::twoDoubles && column_kernels::fourDoublesAvailable()) {
        i = n - n % lanes;
        ces_rows::avx2::addNormalSums(rows, i, sums);
    }
#endif
    for (; i + lanes <= n; i += lanes)
        for (int lane = 0; lane < lanes; ++lane) addRow(i + static_cast<std::size_t>(lane), lane);
    for (int lane = 0; i < n; ++i, ++lane) addRow(i, lane);
    std::array<double, cesNormalSumCount> total{};
    for (int k = 0; k < cesNormalSumCount; ++k) total[static_cast<std::size_t>(k)] = (sums[k][0] + sums[k][1]) + (sums[k][2] + sums[k][3]);
    return total;
}

} // namespace isoquant
