// expm1 and log1p of one packet of doubles, for both widths of the column kernels
// (column_kernels.cpp with two doubles, column_kernels_avx2.cpp with four). Eigen 3.4 has packet
// exp and log for doubles but takes expm1 and log1p one double at a time; these are Kahan's
// corrections on top of Eigen's packet exp and log, the forms Eigen itself uses for floats
// (generic_expm1, generic_plog1p), written here in an unnamed namespace so that each kernel file
// has its own copy (column_kernels_avx2.cpp may define no function shared with the rest of the
// library). Separate multiplies and adds only, so both widths give the same bits.
#pragma once

#include <Eigen/Core>

namespace isoquant::column_kernels {
namespace {

template <typename Packet> struct ExpPair {
    Packet exp;   // eᶻ
    Packet expm1; // eᶻ − 1
};

// v = eᶻ rounded; eᶻ − 1 = (v − 1)·z/ln v, which cancels the rounding of v (Kahan), except where v
// rounds to 1 (then z) or v − 1 to −1 (then −1). A few units in the last place.
template <typename Packet> ExpPair<Packet> expAndExpm1(const Packet& z)
{
    using namespace Eigen::internal;
    const Packet one = pset1<Packet>(1.0);
    const Packet minusOne = pset1<Packet>(-1.0);
    const Packet v = pexp(z);
    const Packet shifted = psub(v, one);
    const Packet corrected = pmul(shifted, pdiv(z, plog(v)));
    Packet expm1 = pselect(pcmp_eq(shifted, minusOne), minusOne, corrected);
    expm1 = pselect(pcmp_eq(v, one), z, expm1);
    return {v, expm1};
}

// ln(1 + w) = w·ln(1 + w)/((1 + w) − 1) with 1 + w rounded, which cancels its rounding (Kahan),
// except where 1 + w rounds to 1 (then w). For w > −1 finite. A few units in the last place.
template <typename Packet> Packet log1p(const Packet& w)
{
    using namespace Eigen::internal;
    const Packet one = pset1<Packet>(1.0);
    const Packet sum = padd(w, one);
    const Packet corrected = pmul(w, pdiv(plog(sum), psub(sum, one)));
    return pselect(pcmp_eq(sum, one), w, corrected);
}

} // namespace
} // namespace isoquant::column_kernels
