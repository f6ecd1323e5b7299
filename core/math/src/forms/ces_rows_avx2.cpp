// Compiled with -mavx2 and without -mfma, like numerics/column_kernels_avx2.cpp and for the same
// reasons: only Eigen's packet functions of Packet4d and this file's own copies of the packet forms
// are used here (the test column_kernels_symbols checks what this object defines).
#include "forms/ces_rows_wide.hpp"
#include "numerics/packet_pair_avx2.hpp"

#if !defined(__AVX2__) || defined(__FMA__)
#error "ces_rows_avx2.cpp must be built with -mavx2 and without -mfma"
#endif

namespace isoquant::ces_rows::avx2 {

// Eight rows a step (packet_pair_avx2.hpp: the same bits as two steps of four), the last four alone.
void composite(const double* logRatio, std::size_t count, const Shape& shape, const Outputs& out)
{
    const auto outputsAt = [&](std::size_t i) {
        return Outputs{out.value + i, out.byLogit + i, out.byWeight + i, out.byCurvature + i};
    };
    std::size_t i = 0;
    for (; i + 8 <= count; i += 8) compositePacket<column_kernels::PacketPair>(logRatio + i, shape, outputsAt(i));
    if (i < count) compositePacket<Eigen::internal::Packet4d>(logRatio + i, shape, outputsAt(i));
}

void addNormalSums(const NormalRows& rows, std::size_t count, double (&sums)[normalSumCount][sumLanes])
{
    using namespace Eigen::internal;
    Packet4d total[normalSumCount];
    for (int k = 0; k < normalSumCount; ++k) total[k] = ploadu<Packet4d>(sums[k]);
    for (std::size_t i = 0; i < count; i += 4) {
        const Packet4d g = ploadu<Packet4d>(rows.logit + i);
        const Packet4d c = ploadu<Packet4d>(rows.curvature + i);
        const Packet4d l = padd(ploadu<Packet4d>(rows.second + i), ploadu<Packet4d>(rows.value + i));
        const Packet4d r = ploadu<Packet4d>(rows.residuals + i);
        const Packet4d terms[normalSumCount] = {g,          c,          l,          pmul(g, g), pmul(c, g), pmul(l, g), pmul(c, c),
                                    pmul(l, c), pmul(l, l), r,          pmul(g, r), pmul(c, r), pmul(l, r)};
        for (int k = 0; k < normalSumCount; ++k) total[k] = padd(total[k], terms[k]);
    }
    for (int k = 0; k < normalSumCount; ++k) pstoreu(sums[k], total[k]);
}

} // namespace isoquant::ces_rows::avx2
