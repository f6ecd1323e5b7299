#include "isoquant/math/numerics/column_kernels.hpp"

#include "numerics/column_kernels_packet.hpp"
#include "numerics/column_kernels_wide.hpp"

#include <Eigen/Core>

#include <algorithm>
#include <limits>

namespace isoquant::column_kernels {

namespace {

// The build's own packet of doubles: two on x86-64 (SSE2).
using Packet = Eigen::internal::packet_traits<double>::type;
constexpr std::size_t packetSize = Eigen::internal::packet_traits<double>::size;

// A packet a step; the last values (fewer than a packet) are padded with 1 (ln 1 = 0, exp 1 = e:
// both harmless) and taken by the same packet kernel.
template <typename Kernel> void eachPacket(const double* values, double* out, std::size_t count, Kernel kernel)
{
    std::size_t i = 0;
    for (; i + packetSize <= count; i += packetSize)
        Eigen::internal::pstoreu(out + i, kernel(Eigen::internal::ploadu<Packet>(values + i)));
    if (i == count) return;
    double padded[packetSize];
    std::fill(padded, padded + packetSize, 1.0);
    std::copy(values + i, values + count, padded);
    Eigen::internal::pstoreu(padded, kernel(Eigen::internal::ploadu<Packet>(padded)));
    std::copy(padded, padded + (count - i), out + i);
}

Packet packetLog(const Packet& x) { return Eigen::internal::plog(x); }
Packet packetExp(const Packet& x) { return Eigen::internal::pexp(x); }

// eᶻ and eᶻ − 1 of a packet, stored; the last values padded likewise.
void packetExpPairs(const double* values, double* exps, double* expm1s, std::size_t count)
{
    const auto store = [](const Packet& z, double* exp, double* expm1) {
        const ExpPair<Packet> pair = expAndExpm1(z);
        Eigen::internal::pstoreu(exp, pair.exp);
        Eigen::internal::pstoreu(expm1, pair.expm1);
    };
    std::size_t i = 0;
    for (; i + packetSize <= count; i += packetSize) store(Eigen::internal::ploadu<Packet>(values + i), exps + i, expm1s + i);
    if (i == count) return;
    double padded[packetSize], paddedExps[packetSize], paddedExpm1s[packetSize];
    std::fill(padded, padded + packetSize, 1.0);
    std::copy(values + i, values + count, padded);
    store(Eigen::internal::ploadu<Packet>(padded), paddedExps, paddedExpm1s);
    std::copy(paddedExps, paddedExps + (count - i), exps + i);
    std::copy(paddedExpm1s, paddedExpm1s + (count - i), expm1s + i);
}

using WideKernel = void (*)(const double*, double*, std::size_t);
#if defined(ISOQUANT_HAVE_AVX2_KERNELS)
constexpr bool wideKernelsBuilt = true;
constexpr WideKernel wideLogs = &avx2::logs;
constexpr auto wideLogsOfNormals = &avx2::logsOfNormals;
constexpr WideKernel wideExps = &avx2::exps;
constexpr auto wideExpPairs = &avx2::expsAndExpm1s;
#else
constexpr bool wideKernelsBuilt = false;
constexpr WideKernel wideLogs = nullptr;
constexpr bool (*wideLogsOfNormals)(const double*, double*, std::size_t) = nullptr;
constexpr WideKernel wideExps = nullptr;
constexpr void (*wideExpPairs)(const double*, double*, double*, std::size_t) = nullptr;
#endif

// How many leading values (whole packets of four) the AVX2 copy takes: all it can where the
// processor has it; the rest are taken here.
std::size_t wideShare(std::size_t count, Width width, bool wideBuilt)
{
    return wideBuilt && width != Width::twoDoubles && fourDoublesAvailable() ? count - count % 4 : 0;
}

template <typename Narrow>
void dispatch(const double* values, double* out, std::size_t count, Width width, WideKernel wide, Narrow narrow)
{
    const std::size_t done = wideShare(count, width, wide != nullptr);
    if (done > 0) wide(values, out, done);
    eachPacket(values + done, out + done, count - done, narrow);
}

} // namespace

bool fourDoublesAvailable()
{
#if defined(ISOQUANT_HAVE_AVX2_KERNELS)
    static const bool available = __builtin_cpu_supports("avx2");
    return available;
#else
    return false;
#endif
}

void logs(const double* values, double* out, std::size_t count, Width width)
{
    dispatch(values, out, count, width, wideLogs, packetLog);
}

bool logsOfNormals(const double* values, double* out, std::size_t count, Width width)
{
    using namespace Eigen::internal;
    const std::size_t done = wideShare(count, width, wideKernelsBuilt);
    const bool wideNormal = done == 0 || wideLogsOfNormals(values, out, done);
    const Packet smallestNormal = pset1<Packet>(std::numeric_limits<double>::min());
    Packet belowNormal = pzero(smallestNormal); // lanes where a value was below it, or NaN (padding is 1)
    eachPacket(values + done, out + done, count - done, [&](const Packet& x) {
        belowNormal = por(belowNormal, pcmp_lt_or_nan(x, smallestNormal));
        return plog(x);
    });
    return wideNormal && !predux_any(belowNormal);
}

void exps(const double* values, double* out, std::size_t count, Width width)
{
    dispatch(values, out, count, width, wideExps, packetExp);
}

void expsAndExpm1s(const double* values, double* exps, double* expm1s, std::size_t count, Width width)
{
    const std::size_t done = wideShare(count, width, wideKernelsBuilt);
    if (done > 0) wideExpPairs(values, exps, expm1s, done);
    packetExpPairs(values + done, exps + done, expm1s + done, count - done);
}

} // namespace isoquant::column_kernels
