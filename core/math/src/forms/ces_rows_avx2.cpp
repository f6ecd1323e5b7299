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

} // namespace isoquant::ces_rows::avx2
