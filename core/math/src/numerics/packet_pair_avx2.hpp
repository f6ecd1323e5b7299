// Two packets of four doubles taken as one packet of eight, for the AVX2 kernels only (files built
// with -mavx2, see column_kernels.hpp). Every operation is Eigen's own on each half, so a kernel
// written once for packets (ces_rows_packet.hpp, column_kernels_packet.hpp) gives the same bits on a
// pair as on its two halves one after the other. What changes is the order of the instructions:
// the two halves' chains of dependent steps (a Horner series, Eigen's log) are interleaved, so the
// processor works on one while the other waits on a result. On the ces composite's rows: 9.1 ns a
// row in single packets, 7.1 in pairs (6.2 with -fschedule-insns, which the AVX2 objects are built
// with), same bits. In an unnamed namespace, as the kernels' own forms, so that nothing compiled
// here with AVX2 is shared with the rest of the library by name (test column_kernels_symbols).
// Internal to the math library.
#pragma once

#include <Eigen/Core>

#if !defined(__AVX2__)
#error "packet_pair_avx2.hpp is for the files built with -mavx2"
#endif

namespace isoquant::column_kernels {
namespace {

struct PacketPair {
    Eigen::internal::Packet4d low, high;
};

} // namespace
} // namespace isoquant::column_kernels

namespace Eigen::internal {

// What Eigen's pset1 and ploadu need to be specialised for the pair (their signatures name the
// scalar through unpacket_traits).
template <> struct unpacket_traits<isoquant::column_kernels::PacketPair> {
    using type = double;
    using half = isoquant::column_kernels::PacketPair;
    enum { size = 8, alignment = Unaligned, vectorizable = true, masked_load_available = false,
           masked_store_available = false };
};

template <> inline isoquant::column_kernels::PacketPair pset1<isoquant::column_kernels::PacketPair>(const double& value)
{
    return {pset1<Packet4d>(value), pset1<Packet4d>(value)};
}

template <> inline isoquant::column_kernels::PacketPair ploadu<isoquant::column_kernels::PacketPair>(const double* from)
{
    return {ploadu<Packet4d>(from), ploadu<Packet4d>(from + 4)};
}

} // namespace Eigen::internal

namespace isoquant::column_kernels {
namespace {

using Eigen::internal::Packet4d;

template <typename Operation> PacketPair eachHalf(const PacketPair& x, Operation operation)
{
    return {operation(x.low), operation(x.high)};
}

template <typename Operation> PacketPair eachHalf(const PacketPair& x, const PacketPair& y, Operation operation)
{
    return {operation(x.low, y.low), operation(x.high, y.high)};
}

// Found by argument-dependent lookup from the kernels' unqualified calls, and preferred there to
// Eigen's generic templates.
inline PacketPair pabs(const PacketPair& x) { return eachHalf(x, [](const Packet4d& h) { return Eigen::internal::pabs(h); }); }
inline PacketPair pzero(const PacketPair& x) { return eachHalf(x, [](const Packet4d& h) { return Eigen::internal::pzero(h); }); }
inline PacketPair ptrue(const PacketPair& x) { return eachHalf(x, [](const Packet4d& h) { return Eigen::internal::ptrue(h); }); }
inline PacketPair pexp(const PacketPair& x) { return eachHalf(x, [](const Packet4d& h) { return Eigen::internal::pexp(h); }); }
inline PacketPair plog(const PacketPair& x) { return eachHalf(x, [](const Packet4d& h) { return Eigen::internal::plog(h); }); }

inline PacketPair padd(const PacketPair& x, const PacketPair& y)
{
    return eachHalf(x, y, [](const Packet4d& a, const Packet4d& b) { return Eigen::internal::padd(a, b); });
}
inline PacketPair psub(const PacketPair& x, const PacketPair& y)
{
    return eachHalf(x, y, [](const Packet4d& a, const Packet4d& b) { return Eigen::internal::psub(a, b); });
}
inline PacketPair pmul(const PacketPair& x, const PacketPair& y)
{
    return eachHalf(x, y, [](const Packet4d& a, const Packet4d& b) { return Eigen::internal::pmul(a, b); });
}
inline PacketPair pdiv(const PacketPair& x, const PacketPair& y)
{
    return eachHalf(x, y, [](const Packet4d& a, const Packet4d& b) { return Eigen::internal::pdiv(a, b); });
}
inline PacketPair pmax(const PacketPair& x, const PacketPair& y)
{
    return eachHalf(x, y, [](const Packet4d& a, const Packet4d& b) { return Eigen::internal::pmax(a, b); });
}
inline PacketPair pandnot(const PacketPair& x, const PacketPair& y)
{
    return eachHalf(x, y, [](const Packet4d& a, const Packet4d& b) { return Eigen::internal::pandnot(a, b); });
}
inline PacketPair pcmp_le(const PacketPair& x, const PacketPair& y)
{
    return eachHalf(x, y, [](const Packet4d& a, const Packet4d& b) { return Eigen::internal::pcmp_le(a, b); });
}
inline PacketPair pcmp_lt(const PacketPair& x, const PacketPair& y)
{
    return eachHalf(x, y, [](const Packet4d& a, const Packet4d& b) { return Eigen::internal::pcmp_lt(a, b); });
}
inline PacketPair pcmp_eq(const PacketPair& x, const PacketPair& y)
{
    return eachHalf(x, y, [](const Packet4d& a, const Packet4d& b) { return Eigen::internal::pcmp_eq(a, b); });
}

inline PacketPair pselect(const PacketPair& mask, const PacketPair& x, const PacketPair& y)
{
    return {Eigen::internal::pselect(mask.low, x.low, y.low), Eigen::internal::pselect(mask.high, x.high, y.high)};
}

inline bool predux_any(const PacketPair& x)
{
    return Eigen::internal::predux_any(x.low) || Eigen::internal::predux_any(x.high);
}

inline void pstoreu(double* to, const PacketPair& x)
{
    Eigen::internal::pstoreu(to, x.low);
    Eigen::internal::pstoreu(to + 4, x.high);
}

} // namespace
} // namespace isoquant::column_kernels
