// expm1 of one packet of doubles, for both widths of the column kernels (column_kernels.cpp with
// two doubles, column_kernels_avx2.cpp with four) and the ces rows. Eigen 3.4 has packet exp and
// log for doubles but takes expm1 one double at a time; this is Kahan's correction on top of
// Eigen's packet exp and log, the form Eigen itself uses for floats (generic_expm1), and a series
// for |z| ≤ 1, written here in an unnamed namespace so that each kernel file
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

// eᶻ − 1 for |z| ≤ 1 with neither exp nor log nor division: z + z²·Σⱼ zʲ/(j + 2)!, cut after
// z¹⁶/18! (what is left, at most 1/19! ≈ 8e-18, is below a tenth of a unit in the last place of
// |eᶻ − 1| ≥ 0.63·|z|), by two Horner chains in z², one of the even and one of the odd
// coefficients, which run side by side (one chain of 16 dependent steps made the rows wait on its
// latency: 6 % of the ces fit). The factorials up to 18! < 2⁵³ are exact doubles, so every
// coefficient is correctly rounded. Against expm1l on 20 million points of [−1, 1]: 1.9 units in
// the last place at most (one chain: 1.5), where z and the tail partly cancel near z = −1.
template <typename Packet> Packet expm1OnUnitInterval(const Packet& z)
{
    using namespace Eigen::internal;
    static constexpr double inverseFactorials[] = {
        1.0 / 2,           1.0 / 6,           1.0 / 24,           1.0 / 120,           1.0 / 720,           1.0 / 5040,
        1.0 / 40320,       1.0 / 362880,      1.0 / 3628800,      1.0 / 39916800,      1.0 / 479001600,
        1.0 / 6227020800.0, 1.0 / 87178291200.0, 1.0 / 1307674368000.0, 1.0 / 20922789888000.0,
        1.0 / 355687428096000.0, 1.0 / 6402373705728000.0};
    const Packet square = pmul(z, z);
    Packet even = pset1<Packet>(inverseFactorials[16]);
    for (int j = 14; j >= 0; j -= 2) even = padd(pmul(even, square), pset1<Packet>(inverseFactorials[j]));
    Packet odd = pset1<Packet>(inverseFactorials[15]);
    for (int j = 13; j >= 1; j -= 2) odd = padd(pmul(odd, square), pset1<Packet>(inverseFactorials[j]));
    return padd(z, pmul(square, padd(even, pmul(z, odd))));
}

} // namespace
} // namespace isoquant::column_kernels
