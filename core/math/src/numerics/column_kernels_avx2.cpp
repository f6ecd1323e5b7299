// Compiled with -mavx2 and without -mfma (core/math/CMakeLists.txt): see column_kernels.hpp for why.
// Only Eigen's packet functions of Packet4d (and column_kernels_packet.hpp's, which are this file's
// own) are used here, so that no inline function shared with
// the rest of the library (whose copies are SSE2) is instantiated in this file with AVX2 code: the
// linker could otherwise keep this file's copy for every caller. The test column_kernels_symbols
// checks what this object defines.
#include "numerics/column_kernels_packet.hpp"
#include "numerics/column_kernels_wide.hpp"
#include "numerics/packet_pair_avx2.hpp"

#include <Eigen/Core>

#include <limits>

#if !defined(__AVX2__) || defined(__FMA__)
#error "column_kernels_avx2.cpp must be built with -mavx2 and without -mfma"
#endif

namespace isoquant::column_kernels::avx2 {

namespace {

using Eigen::internal::Packet4d;

// Eight values a step (packet_pair_avx2.hpp: the same bits as two steps of four), the last four
// alone; `kernel` takes either.
template <typename Kernel> void eachPacket(const double* values, double* out, std::size_t count, Kernel kernel)
{
    std::size_t i = 0;
    for (; i + 8 <= count; i += 8) pstoreu(out + i, kernel(Eigen::internal::ploadu<PacketPair>(values + i)));
    if (i < count) Eigen::internal::pstoreu(out + i, kernel(Eigen::internal::ploadu<Packet4d>(values + i)));
}

} // namespace

void logs(const double* values, double* out, std::size_t count)
{
    eachPacket(values, out, count, [](const auto& x) {
        using Eigen::internal::plog;
        return plog(x);
    });
}

bool logsOfNormals(const double* values, double* out, std::size_t count)
{
    namespace packets = Eigen::internal;
    const Packet4d smallestNormal = packets::pset1<Packet4d>(std::numeric_limits<double>::min());
    Packet4d belowNormal = packets::pzero(smallestNormal); // lanes where a value was below it, or NaN
    const auto check = [&](const Packet4d& x) {
        belowNormal = packets::por(belowNormal, packets::pcmp_lt_or_nan(x, smallestNormal));
    };
    std::size_t i = 0;
    for (; i + 8 <= count; i += 8) {
        const PacketPair x = packets::ploadu<PacketPair>(values + i);
        check(x.low);
        check(x.high);
        pstoreu(out + i, plog(x));
    }
    if (i < count) {
        const Packet4d x = packets::ploadu<Packet4d>(values + i);
        check(x);
        packets::pstoreu(out + i, packets::plog(x));
    }
    return !packets::predux_any(belowNormal);
}

void exps(const double* values, double* out, std::size_t count)
{
    eachPacket(values, out, count, [](const auto& x) {
        using Eigen::internal::pexp;
        return pexp(x);
    });
}

void expsAndExpm1s(const double* values, double* exps, double* expm1s, std::size_t count)
{
    const auto step = [&](std::size_t i, auto packet) {
        using Eigen::internal::pstoreu;
        const auto pair = expAndExpm1(Eigen::internal::ploadu<decltype(packet)>(values + i));
        pstoreu(exps + i, pair.exp);
        pstoreu(expm1s + i, pair.expm1);
    };
    std::size_t i = 0;
    for (; i + 8 <= count; i += 8) step(i, PacketPair{});
    if (i < count) step(i, Packet4d{});
}

} // namespace isoquant::column_kernels::avx2
