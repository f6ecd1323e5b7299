// One packet of rows of the CES composite at an interior δ (forms/ces_columns.hpp), written once
// for both widths: ces_columns.cpp instantiates it with two doubles, ces_rows_avx2.cpp with four.
// In an unnamed namespace, so that each file has its own copy (see column_kernels_avx2.cpp).
// Internal to the math library.
#pragma once

#include "numerics/column_kernels_packet.hpp"

#include <Eigen/Core>

namespace isoquant::ces_rows {

// What the rows share at one (δ, ρ), δ ∈ (0, 1).
struct Shape {
    double weight;        // δ
    double complement;    // 1 − δ
    double logWeight;     // ln δ
    double logComplement; // ln(1 − δ)
    double curvature;     // ρ
    double slope;         // d/u = −1/ρ (unused at ρ = 0, where every u is 0)
    double slopeSquared;  // 1/ρ²
};

// The four output columns, each at the packet's first row.
struct Outputs {
    double* value;       // H
    double* byLogit;     // ∂H/∂t
    double* byWeight;    // ∂H/∂δ
    double* byCurvature; // ∂H/∂ρ
};

// The columns the normal equations' sums read (ces_columns.hpp, cesNormalSums), each at row 0.
struct NormalRows {
    const double* logit;     // ∂H/∂t
    const double* curvature; // ∂H/∂ρ
    const double* second;    // b = ln x₂
    const double* value;     // H
    const double* residuals; // r
};

// The normal equations' sums (cesNormalSums), and the lanes of each: row i in lane i mod 4, at
// both widths.
inline constexpr int normalSumCount = 13;
inline constexpr int sumLanes = 4;

// As in ces.cpp: below this |u| ∂H/∂ρ comes from the series of d/du[K(u)/u].
inline constexpr double seriesLimit = 1e-3;

namespace {

// Both branches of each formula are formed and each row's own is chosen. With a = ln δ + u,
// c = ln(1 − δ), and d/u = −1/ρ taken once for all rows (so no row divides by its u):
//   |u| ≤ 1: K = ln(1 + x), x = δ·expm1(u),  π = δ·eᵘ/m with m = 1 + x,  ∂H/∂δ = −expm1(u)/(ρ·m);
//   |u| > 1: K = max(a, c) + ln(1 + x), x = r = e^(−|a − c|),  π = logistic(a − c),
//            π − δ = π(1 − δ) − δ(1 − π) (the two products differ by the factor eᵘ, at least e, so
//            their difference keeps its digits also where δ is near 1),  ∂H/∂δ = −(π − δ)/(ρ·q);
//   H = −K/ρ, ∂H/∂t = q·∂H/∂δ (q = δ(1 − δ)), ∂H/∂ρ = −(u·π − K)/ρ², or below seriesLimit
//   −d²·(κ₂/2 + κ₃u/3 + κ₄u²/8 + κ₅u³/30) with the Bernoulli cumulants κ₂ = q, κ₃ = q(1 − 2δ),
//   κ₄ = q(1 − 6q), κ₅ = q(1 − 2δ)(1 − 12q); at u = 0: H = δ·d, ∂H/∂δ = d.
// ln(1 + x) = ln w + (x − (w − 1))/w with w = 1 + x rounded: the second term undoes the rounding
// of w to first order (its square, below ε², is left), and 1/w is the 1/m or 1/(1 + r) the
// derivatives need anyway, so K costs a log and no division of its own; where w rounds to 1 it
// gives x. Two divisions a row in all: 1/w, and the one inside Eigen's log.
template <typename Packet> void compositePacket(const double* logRatio, const Shape& shape, const Outputs& out)
{
    using namespace Eigen::internal;
    const Packet one = pset1<Packet>(1.0);
    const Packet minusOne = pset1<Packet>(-1.0); // −x as (−1)·x: Eigen's pnegate gives −0 or +0 for 0 by width
    const Packet weight = pset1<Packet>(shape.weight);
    const Packet complement = pset1<Packet>(shape.complement);
    const Packet slope = pset1<Packet>(shape.slope); // d/u
    const double q = shape.weight * shape.complement;
    const Packet d = ploadu<Packet>(logRatio);
    const Packet u = pmul(pset1<Packet>(-shape.curvature), d);
    const Packet small = pcmp_le(pabs(u), one);
    const Packet a = padd(pset1<Packet>(shape.logWeight), u);
    const Packet c = pset1<Packet>(shape.logComplement);
    // expm1(u) of the rows with |u| ≤ 1 by its series; r = e^(−|a − c|) only where some row of the
    // packet has |u| > 1 (or u NaN): on the benchmark's rows at ρ = 0.5, about one packet in ten.
    const Packet expm1 = column_kernels::expm1OnUnitInterval(pselect(small, u, pzero(u)));
    Packet exp = pzero(u);
    if (predux_any(pandnot(ptrue(u), small))) exp = pexp(pselect(small, pzero(u), pmul(minusOne, pabs(psub(a, c)))));
    const Packet argument = pselect(small, pmul(weight, expm1), exp); // x
    const Packet sum = padd(one, argument);                           // w: m, or 1 + r
    const Packet reciprocal = pdiv(one, sum);                         // 1/m or 1/(1 + r)
    const Packet logged = padd(plog(sum), pmul(psub(argument, psub(sum, one)), reciprocal));
    const Packet cumulant = pselect(small, logged, padd(pmax(a, c), logged)); // K

    const Packet firstLarger = pcmp_le(c, a);
    const Packet larger = reciprocal;             // 1/(1 + r)
    const Packet smaller = pmul(exp, reciprocal); // r/(1 + r)
    const Packet share = pselect(small, pmul(pmul(weight, padd(one, expm1)), reciprocal),
                                 pselect(firstLarger, larger, smaller));
    const Packet gap = psub(pmul(share, complement), pmul(weight, pselect(firstLarger, smaller, larger))); // π − δ

    const Packet zero = pcmp_eq(u, pzero(u));
    const Packet byWeight = pselect(small, pmul(pmul(slope, expm1), reciprocal), pmul(slope, pmul(gap, pset1<Packet>(1 / q))));
    pstoreu(out.value, pselect(zero, pmul(weight, d), pmul(slope, cumulant)));
    pstoreu(out.byWeight, pselect(zero, d, byWeight));
    pstoreu(out.byLogit, pselect(zero, pmul(pset1<Packet>(q), d),
                                 pselect(small, pmul(pset1<Packet>(q), byWeight), pmul(slope, gap))));

    const double skew = 1 - 2 * shape.weight;
    // κ₂/2 + u·(κ₃/3 + u·(κ₄/8 + u·κ₅/30))
    const Packet cumulants = padd(pset1<Packet>(q / 2),
                                  pmul(u, padd(pset1<Packet>(q * skew / 3),
                                               pmul(u, padd(pset1<Packet>(q * (1 - 6 * q) / 8),
                                                            pmul(u, pset1<Packet>(q * skew * (1 - 12 * q) / 30)))))));
    const Packet series = pcmp_lt(pabs(u), pset1<Packet>(seriesLimit));
    pstoreu(out.byCurvature, pselect(series, pmul(minusOne, pmul(pmul(d, d), cumulants)),
                                     pmul(psub(cumulant, pmul(u, share)), pset1<Packet>(shape.slopeSquared))));
}

} // namespace
} // namespace isoquant::ces_rows
