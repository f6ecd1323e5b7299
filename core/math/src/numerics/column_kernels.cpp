#include "isoquant/math/numerics/column_kernels.hpp"

#include "numerics/column_kernels_wide.hpp"

#include <Eigen/Core>

#include <algorithm>

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

using WideKernel = void (*)(const double*, double*, std::size_t);
#if defined(ISOQUANT_HAVE_AVX2_KERNELS)
constexpr WideKernel wideLogs = &avx2::logs;
constexpr WideKernel wideExps = &avx2::exps;
#else
constexpr WideKernel wideLogs = nullptr;
constexpr WideKernel wideExps = nullptr;
#endif

// The whole packets of four in the AVX2 copy where the processor has it, the rest here.
template <typename Narrow>
void dispatch(const double* values, double* out, std::size_t count, Width width, WideKernel wide, Narrow narrow)
{
    std::size_t done = 0;
    if (wide && width != Width::twoDoubles && fourDoublesAvailable()) {
        done = count - count % 4;
        wide(values, out, done);
    }
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

void exps(const double* values, double* out, std::size_t count, Width width)
{
    dispatch(values, out, count, width, wideExps, packetExp);
}

} // namespace isoquant::column_kernels
